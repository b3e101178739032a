// Linux memory probes and small statistics for the benchmarks.
#include "measure.hpp"

#include <algorithm>
#include <cstdio>
#include <ctime>
#include <fmt/format.h>
#include <fstream>
#include <sstream>
#include <stdexcept>
#include <sys/resource.h>
#include <unistd.h>

namespace lapwing::bench {

double process_cpu_seconds() {
    timespec t{};
    clock_gettime(CLOCK_PROCESS_CPUTIME_ID, &t);
    return static_cast<double>(t.tv_sec) + 1e-9 * static_cast<double>(t.tv_nsec);
}

double current_rss_mb() {
    std::ifstream statm("/proc/self/statm");
    long size_pages = 0, resident_pages = 0;
    statm >> size_pages >> resident_pages;
    return static_cast<double>(resident_pages) * static_cast<double>(sysconf(_SC_PAGESIZE)) /
           (1024.0 * 1024.0);
}

double lifetime_peak_rss_mb() {
    rusage usage{};
    getrusage(RUSAGE_SELF, &usage);
    return static_cast<double>(usage.ru_maxrss) / 1024.0; // kB on Linux
}

void reset_peak_rss() {
    std::ofstream clear("/proc/self/clear_refs");
    clear << "5";
}

double peak_rss_since_reset_mb() {
    std::ifstream status("/proc/self/status");
    std::string line;
    while (std::getline(status, line))
        if (line.rfind("VmHWM:", 0) == 0) {
            std::istringstream fields(line.substr(6));
            double kb = 0;
            fields >> kb;
            return kb / 1024.0;
        }
    return lifetime_peak_rss_mb();
}

double median(std::vector<double> values) {
    if (values.empty()) throw std::invalid_argument("median of an empty sample");
    std::sort(values.begin(), values.end());
    const size_t n = values.size();
    return n % 2 == 1 ? values[n / 2] : 0.5 * (values[n / 2 - 1] + values[n / 2]);
}

std::string format_seconds(double s) {
    if (s < 1e-3) return fmt::format("{:.3f} ms", s * 1e3);
    if (s < 1) return fmt::format("{:.1f} ms", s * 1e3);
    return fmt::format("{:.2f} s", s);
}

} // namespace lapwing::bench
