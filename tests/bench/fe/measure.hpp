// Stopwatch, resident-memory probes and medians for the benchmarks. Memory
// comes from Linux: current RSS from /proc/self/statm, the high-water mark
// from /proc/self/status (VmHWM), which writing "5" to /proc/self/clear_refs
// resets so each stage gets its own peak (proc(5)).
#pragma once

#include <algorithm>
#include <chrono>
#include <string>
#include <vector>

namespace lapwing::bench {

// CPU seconds of the whole process (every thread), CLOCK_PROCESS_CPUTIME_ID.
// On a shared machine wall time includes the time other jobs held the core;
// CPU time does not (it still feels their cache and memory traffic).
double process_cpu_seconds();

// Wall and CPU time since construction.
class Stopwatch {
public:
    Stopwatch() : start_(std::chrono::steady_clock::now()), cpu_start_(process_cpu_seconds()) {}
    double seconds() const {
        return std::chrono::duration<double>(std::chrono::steady_clock::now() - start_).count();
    }
    double cpu_seconds() const { return process_cpu_seconds() - cpu_start_; }

private:
    std::chrono::steady_clock::time_point start_;
    double cpu_start_;
};

double current_rss_mb();
// getrusage(RUSAGE_SELF).ru_maxrss: the process's peak since it started.
double lifetime_peak_rss_mb();

// Time and memory of one stage: wall seconds, the peak resident memory
// above the level at its start, and what it left resident.
struct StageSample {
    double seconds = 0;     // wall
    double cpu_seconds = 0; // process CPU
    double peak_mb = 0;     // VmHWM during the stage − RSS at its start
    double retained_mb = 0; // RSS at its end − RSS at its start
};

// Measures one stage: resets the high-water mark, runs f, reads it back.
template <typename F>
StageSample measure(F&& f);

// Median of a non-empty sample (mean of the middle two for an even count).
double median(std::vector<double> values);

std::string format_seconds(double s);

// --- implementation of the template --------------------------------------
void reset_peak_rss();
double peak_rss_since_reset_mb();

template <typename F>
StageSample measure(F&& f) {
    const double before = current_rss_mb();
    reset_peak_rss();
    const Stopwatch clock;
    f();
    StageSample s;
    s.seconds = clock.seconds();
    s.cpu_seconds = clock.cpu_seconds();
    s.peak_mb = std::max(0.0, peak_rss_since_reset_mb() - before);
    s.retained_mb = current_rss_mb() - before;
    return s;
}

} // namespace lapwing::bench
