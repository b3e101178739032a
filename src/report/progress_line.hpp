// The text of the one-line stage progress `lapwing check` shows on a
// terminal: the stage that is running and the time since the run started,
// redrawn in place and erased when the run is done. Only the text lives
// here; cli/ owns the terminal, the clock and the thread that redraws it.
#pragma once

#include <string>
#include <string_view>

namespace lapwing::report {

// Runs shorter than this show no progress at all (a line that flashes and
// vanishes is noise).
inline constexpr double progress_delay_seconds = 1.0;

// "3 s", "59 s", "1 min 05 s": whole seconds, rounded down.
std::string elapsed_text(double seconds);

// Return to the line start, erase the line, then "STAGE … ELAPSED": drawn
// over the previous one. The line is cut to `width` columns (counted in
// code points) so that it never wraps, which would leave a line behind that
// the erase cannot reach.
std::string progress_line(std::string_view stage, double seconds, int width = 80);

// Erases the progress line and leaves the cursor at its start.
std::string progress_erase();

} // namespace lapwing::report
