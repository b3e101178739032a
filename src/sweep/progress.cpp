// Progress text: a bar on a terminal, plain lines in a log.
#include "sweep/progress.hpp"

#include <cmath>
#include <fmt/format.h>

namespace lapwing::sweep {

std::string clock_text(double seconds) {
    if (!std::isfinite(seconds) || seconds < 0) return "?";
    const long s = std::lround(seconds);
    if (s >= 3600) return fmt::format("{}:{:02}:{:02}", s / 3600, (s / 60) % 60, s % 60);
    return fmt::format("{}:{:02}", s / 60, s % 60);
}

std::string Progress::update(int done, int failed, double seconds) {
    const double rate = seconds > 0 ? done / seconds : 0; // variants per second
    const double left = rate > 0 ? (total_ - done) / rate : NAN;
    const std::string failures = failed ? fmt::format(", {} did not build", failed) : "";
    if (terminal_) {
        constexpr int width = 30;
        const int filled = total_ > 0 ? width * done / total_ : width;
        printed_ = true;
        return fmt::format("\r[{}{}] {}/{}  {:.2f}/s  {} left{}   ", std::string(filled, '#'),
                           std::string(width - filled, '.'), done, total_, rate, clock_text(left),
                           failures);
    }
    const int step = total_ > 0 ? 20 * done / total_ : 20;
    if (step == last_step_ && done != total_) return "";
    last_step_ = step;
    return fmt::format("sweep: {}/{} variants done, {:.2f} per second, about {} left{}\n", done,
                       total_, rate, clock_text(left), failures);
}

} // namespace lapwing::sweep
