// Progress line text: ANSI/ECMA-48 control sequences CR (return to column
// 1) and CSI 2 K (erase the whole line), which every terminal emulator in
// use understands (ECMA-48, 5th ed., 8.3.41 EL).
#include "report/progress_line.hpp"

#include <cmath>
#include <fmt/format.h>

namespace lapwing::report {

namespace {
constexpr std::string_view erase_sequence = "\r\x1b[2K";

// Bytes of the first `n` UTF-8 code points of `text` (the stage words hold
// "…" and "—"; cutting inside one would print a broken character).
size_t prefix_bytes(std::string_view text, size_t n) {
    size_t i = 0, points = 0;
    while (i < text.size() && points < n) {
        ++i;
        while (i < text.size() && (static_cast<unsigned char>(text[i]) & 0xC0) == 0x80) ++i;
        ++points;
    }
    return i;
}

size_t code_points(std::string_view text) {
    size_t points = 0;
    for (char ch : text)
        if ((static_cast<unsigned char>(ch) & 0xC0) != 0x80) ++points;
    return points;
}
} // namespace

std::string elapsed_text(double seconds) {
    const long whole = seconds > 0 ? static_cast<long>(std::floor(seconds)) : 0;
    if (whole < 60) return fmt::format("{} s", whole);
    return fmt::format("{} min {:02} s", whole / 60, whole % 60);
}

std::string progress_line(std::string_view stage, double seconds, int width) {
    const std::string tail = " … " + elapsed_text(seconds);
    const size_t room =
        width > 0 ? static_cast<size_t>(width) - 1 : 0; // the last column wraps on some terminals
    std::string head(stage);
    const size_t tail_points = code_points(tail);
    if (code_points(head) + tail_points > room) {
        const size_t keep = room > tail_points + 1 ? room - tail_points - 1 : 0;
        head = head.substr(0, prefix_bytes(head, keep)) + "…";
    }
    return std::string(erase_sequence) + head + tail;
}

std::string progress_erase() {
    return std::string(erase_sequence);
}

} // namespace lapwing::report
