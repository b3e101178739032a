// The sweep's progress line: done/total, the rate and the time left. On a
// terminal one line redrawn in place (a bar); otherwise plain lines, at most
// one per 5 % of the sweep, so a batch log stays short.
#pragma once

#include <string>

namespace lapwing::sweep {

class Progress {
public:
    Progress(int total, bool terminal) : total_(total), terminal_(terminal) {}

    // The text to print after `done` variants in `seconds` (empty: nothing
    // new to print). On a terminal it starts with '\r' and has no line end.
    std::string update(int done, int failed, double seconds);
    // The final line end on a terminal (empty otherwise).
    std::string finish() const { return terminal_ && printed_ ? "\n" : ""; }

private:
    int total_;
    bool terminal_;
    bool printed_ = false;
    int last_step_ = -1;
};

// "1:05" style, "?" for a time not yet known.
std::string clock_text(double seconds);

} // namespace lapwing::sweep
