// The progress line's text. The control sequences are ECMA-48 (5th edition,
// 1991): CR (0x0D) returns to the line's first column, CSI 2 K ("ESC [ 2 K",
// 8.3.41 EL with parameter 2) erases the whole line, so each redraw replaces
// the previous one and the final erase leaves a clean line.
#include "report/progress_line.hpp"

#include <doctest/doctest.h>
#include <string>

using namespace lapwing;

namespace {
const std::string erase = "\r\x1b[2K";

size_t code_points(const std::string& text) {
    size_t n = 0;
    for (char ch : text)
        if ((static_cast<unsigned char>(ch) & 0xC0) != 0x80) ++n;
    return n;
}
} // namespace

TEST_CASE("progress line: erase, the stage, then the elapsed whole seconds") {
    CHECK(report::progress_line("checking", 3.7) == erase + "checking … 3 s");
    CHECK(report::progress_line("meshing and solving the load cases", 0.2) ==
          erase + "meshing and solving the load cases … 0 s");
    CHECK(report::progress_erase() == erase);
}

TEST_CASE("progress line: minutes past a minute, seconds two digits") {
    CHECK(report::elapsed_text(59.9) == "59 s");
    CHECK(report::elapsed_text(60.0) == "1 min 00 s");
    CHECK(report::elapsed_text(125.0) == "2 min 05 s");
    CHECK(report::elapsed_text(-1.0) == "0 s"); // a clock step back shows 0, not garbage
}

TEST_CASE("progress line: cut to the terminal width so it never wraps") {
    // A line that wraps leaves its first row behind when CSI 2 K erases
    // the second: the text must stay under the width (the last column is
    // kept free, as some terminals wrap on writing it).
    const std::string stage = "convergence mesh: meshing, solving and measuring";
    const std::string line = report::progress_line(stage, 12, 30);
    REQUIRE(line.rfind(erase, 0) == 0);
    const std::string text = line.substr(erase.size());
    CHECK(code_points(text) <= 29);
    CHECK(text.find("… 12 s") != std::string::npos); // the time is never the part cut
    CHECK(text.rfind("convergence", 0) == 0);
    // Cut at a code point boundary: no stray continuation byte after the cut.
    const std::string wide = report::progress_line("ééééééééééééééééééééééé", 1, 16);
    CHECK(code_points(wide.substr(erase.size())) <= 15);
    for (size_t i = erase.size(); i + 1 < wide.size(); ++i)
        if (static_cast<unsigned char>(wide[i]) == 0xC3)
            CHECK((static_cast<unsigned char>(wide[i + 1]) & 0xC0) == 0x80);
    // Wide enough: nothing cut.
    CHECK(report::progress_line(stage, 12, 200) == erase + stage + " … 12 s");
}
