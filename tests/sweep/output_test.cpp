// The progress text and the summary page: a page that needs no other file
// (no script, stylesheet or image fetched), with the limit line, the
// lightest passing value and one curve per family that has ratios.
#include "sweep/html.hpp"
#include "sweep/progress.hpp"

#include <doctest/doctest.h>

using namespace lapwing;
using namespace lapwing::sweep;

namespace {
size_t count(const std::string& s, const std::string& what) {
    size_t n = 0;
    for (size_t at = s.find(what); at != std::string::npos; at = s.find(what, at + 1)) ++n;
    return n;
}
} // namespace

TEST_CASE("progress: a bar on a terminal, at most 21 plain lines in a log") {
    Progress bar(50, true);
    const std::string line = bar.update(10, 0, 5.0);
    CHECK(line.starts_with("\r[######"));
    CHECK(line.find("10/50") != std::string::npos);
    CHECK(line.find("2.00/s") != std::string::npos);    // 10 variants in 5 s
    CHECK(line.find("0:20 left") != std::string::npos); // 40 more at 2 per second
    CHECK(bar.finish() == "\n");

    Progress log(1000, false);
    int lines = 0;
    for (int done = 1; done <= 1000; ++done) lines += !log.update(done, 0, done * 0.1).empty();
    CHECK(lines == 21); // one per 5 %, plus the first
    CHECK(clock_text(3725) == "1:02:05");
    CHECK(clock_text(NAN) == "?");
}

TEST_CASE("the page is self-contained and marks the limit and the lightest passing value") {
    SweepPage page;
    page.title = "G3.toml";
    page.command_line = "lapwing sweep G3.toml --vary t=8:14:2";
    page.axes = {parse_axis("t=8:14:2")};
    page.variants = make_grid(page.axes);
    const double ratios[] = {1.6, 1.2, 0.95, 0.8};
    for (const Variant& v : page.variants) {
        VariantResult r;
        r.index = v.index;
        r.values = v.values;
        r.built = r.has_ratio = true;
        r.governing_ratio = ratios[v.index];
        r.passes = r.governing_ratio <= 1;
        r.governing_id = "peak:x";
        r.family_ratio[0] = r.governing_ratio;
        r.family_ratio[2] = 0.5 * r.governing_ratio;
        page.results.push_back(r);
    }
    page.results[1].built = false;
    page.results[1].error = "bad input: <holes>";
    const std::string html = render_sweep_html(page);
    CHECK(html.starts_with("<!DOCTYPE html>"));
    CHECK(count(html, "<script") == 0);
    CHECK(count(html, "src=") == 0);
    CHECK(count(html, "href=") == 0);
    CHECK(html.find("limit 1.0") != std::string::npos);
    CHECK(html.find("lightest passing: 12") != std::string::npos);
    // Two families and the governing curve; the gap at t = 10 splits each in two pieces
    // of which only the one with 2 points is drawn as a line.
    CHECK(count(html, "<polyline") == 3);
    CHECK(html.find("bad input: &lt;holes&gt;") != std::string::npos);
    CHECK(count(html, "<tr class=") == 4);
}
