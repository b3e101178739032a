// Section lines against exact geometry computed here independently: the
// Whitmore example of REFERENCES on a real plate, net-section chords of
// convex and non-convex outlines, slots and cut-outs deducted, a cut
// line ending on a fillet and crossing a hole off-centre, weld lines.
#include "check/section_lines.hpp"
#include "core/error.hpp"
#include "plates.hpp"
#include "support/approx.hpp"

#include <cmath>
#include <doctest/doctest.h>
#include <numbers>

using namespace lapwing;
using Eigen::Vector2d;
using test::approx;

namespace {
constexpr double inch = 25.4; // mm

const check::SectionLine& find(const std::vector<check::SectionLine>& lines,
                               const std::string& id) {
    for (const auto& l : lines)
        if (l.id == id) return l;
    FAIL("no section line " << id);
    return lines.front();
}

// The REFERENCES Whitmore example in mm: 2 lines at g = 3 in, 4 rows at
// 3 in, the member axis on y = 0 pointing +x (out of the joint), the plate's
// lower edge 5 in from the axis, its upper edge far enough not to clip;
// turned by `turn` degrees about the origin. Welded along its left edge.
model::Connection whitmore_plate(double turn, double hole) {
    std::vector<Vector2d> corners{{0, -5 * inch}, {500, -5 * inch}, {500, 300}, {0, 300}};
    for (auto& p : corners) p = test::rotated(p, turn);
    auto c = test::plate_with(corners);
    c.bolt_groups.push_back(test::bolt_group("brace bolts", test::rotated({100, -1.5 * inch}, turn),
                                             turn, 4, 2, 3 * inch, 3 * inch, hole));
    c.members.push_back(test::member("brace", "brace bolts", turn));
    model::Support base;
    base.name = "base";
    base.edges = {3};
    c.supports.push_back(base);
    return c;
}
} // namespace

TEST_CASE(
    "Whitmore line on a plate: 13.392 in, clipped to 11.696 in by an edge 5 in from the axis") {
    for (const double turn : {0.0, 30.0, -115.0}) {
        CAPTURE(turn);
        const double hole = 22;
        const auto c = whitmore_plate(turn, hole);
        const auto lines = check::make_section_lines(c, analysis::plate_layout(c));
        const auto& w = find(lines, "whitmore-brace");
        CHECK(w.kind == check::SectionKind::whitmore);
        // REFERENCES (Whitmore 1952): the published figures have three
        // decimals, hence ±0.0005 in.
        CHECK(std::abs(w.unclipped_length / inch - 13.392) <= 5e-4);
        CHECK(std::abs(w.length() / inch - 11.696) <= 5e-4);
        // Exactly: 5 in below the axis, (3 + 6√3)/2 in above it.
        CHECK(w.length() == approx((5 + (3 + 6 * std::sqrt(3.0)) / 2) * inch, 1e-12));
        // It lies at the last row (x = 100 before turning) and starts on the clipping edge.
        CHECK((w.from - test::rotated({100, -5 * inch}, turn)).norm() <= 1e-9);
        // Both last-row holes lie on it and are deducted (two full diameters).
        REQUIRE(w.material.size() == 3);
        CHECK(w.material_length() == approx(w.length() - 2 * hole, 1e-12));
        CHECK(w.material[0].end == approx(3.5 * inch - hole / 2, 1e-12));
    }
}

TEST_CASE("section lines come in the documented order with stable ids") {
    const auto c = whitmore_plate(0.0, 22);
    const auto lines = check::make_section_lines(c, analysis::plate_layout(c));
    std::vector<std::string> ids;
    for (const auto& l : lines) ids.push_back(l.id);
    CHECK(ids == std::vector<std::string>{"whitmore-brace", "net-brace-row1", "net-brace-row2",
                                          "net-brace-row3", "net-brace-row4", "weld-base"});
    // Net sections run edge to edge through their row, holes deducted.
    const auto& row1 = find(lines, "net-brace-row1");
    CHECK(row1.row == 0);
    CHECK((row1.from - Vector2d(100, -5 * inch)).norm() <= 1e-9);
    CHECK((row1.to - Vector2d(100, 300)).norm() <= 1e-9);
    REQUIRE(row1.material.size() == 3);
    const double y0 = -5 * inch;
    CHECK(row1.material[0].end == approx(-1.5 * inch - 11 - y0, 1e-12));
    CHECK(row1.material[1].begin == approx(-1.5 * inch + 11 - y0, 1e-12));
    CHECK(row1.material[2].begin == approx(1.5 * inch + 11 - y0, 1e-12));
    CHECK(row1.material_length() == approx(300 - y0 - 44, 1e-12));
    const auto& row4 = find(lines, "net-brace-row4");
    CHECK(row4.from.x() == approx(100 + 9 * inch, 1e-12));
    // The weld runs along the left edge, (0, 300) to (0, −5 in), plate on its left.
    const auto& weld = find(lines, "weld-base");
    CHECK((weld.from - Vector2d(0, 300)).norm() <= 1e-9);
    CHECK(weld.length() == approx(300 + 5 * inch, 1e-12));
    CHECK(weld.normal().x() == approx(1.0, 1e-12));
}

TEST_CASE("net section of a non-convex plate: only the chord holding the row") {
    // A C-shaped plate open to the right; the line x = 200 crosses both
    // arms, the bolts sit in the lower arm (0 ≤ y ≤ 100).
    auto c = test::plate_with(
        {{0, 0}, {300, 0}, {300, 100}, {100, 100}, {100, 200}, {300, 200}, {300, 300}, {0, 300}});
    c.bolt_groups.push_back(test::bolt_group("g", {200, 30}, 0, 1, 2, 60, 40, 18));
    c.members.push_back(test::member("tie", "g", 0));
    const auto lines = check::make_section_lines(c, analysis::plate_layout(c));
    const auto& net = find(lines, "net-tie-row1");
    CHECK((net.from - Vector2d(200, 0)).norm() <= 1e-9);
    CHECK((net.to - Vector2d(200, 100)).norm() <= 1e-9);
    CHECK(net.material_length() == approx(100 - 2 * 18, 1e-12));
}

TEST_CASE("net section deducts slots along the line and a cut-out notch exactly") {
    auto c = test::plate_with({{0, 0}, {300, 0}, {300, 150}, {0, 150}});
    auto g = test::bolt_group("g", {200, 40}, 0, 2, 2, 60, 70, 22);
    g.hole.kind = model::HoleKind::long_slot;
    g.hole.length = 50; // long side across the axis: along the net section
    g.hole.direction = model::SlotDirection::across;
    c.bolt_groups.push_back(g);
    c.members.push_back(test::member("tie", "g", 0));
    c.plate.cutouts.push_back({"notch", {{190, 140}, {230, 140}, {230, 200}, {190, 200}}});
    const auto lines = check::make_section_lines(c, analysis::plate_layout(c));
    // Row 1 at x = 200: slots over y ∈ [15, 65] and [85, 135], the notch over [140, 150].
    const auto& row1 = find(lines, "net-tie-row1");
    CHECK(row1.length() == approx(150.0, 1e-12)); // the outline's chord
    REQUIRE(row1.material.size() == 3);
    CHECK(row1.material[0].end == approx(15.0, 1e-12));
    CHECK(row1.material[2].begin == approx(135.0, 1e-12));
    CHECK(row1.material[2].end == approx(140.0, 1e-12));
    CHECK(row1.material_length() == approx(40.0, 1e-12));
    // Row 2 at x = 260 misses the notch.
    CHECK(find(lines, "net-tie-row2").material_length() == approx(50.0, 1e-12));
}

TEST_CASE("a cut line ends on a fillet and loses the chord of a hole it passes off-centre") {
    auto c = test::plate_with({{0, 0}, {200, 0}, {200, 100}, {0, 100}});
    c.plate.outline[2].kind = model::CornerKind::fillet;
    c.plate.outline[2].size = 30;
    c.bolt_groups.push_back(test::bolt_group("g", {100, 80}, 0, 1, 1, 0, 0, 22));
    c.section_lines.push_back({"cut", {0, 90}, {250, 90}});
    const auto lines = check::make_section_lines(c, analysis::plate_layout(c));
    REQUIRE(lines.size() == 1);
    const auto& cut = lines[0];
    CHECK(cut.id == "user-cut");
    // Fillet centre (170, 70), r = 30: the line y = 90 leaves at x = 170 + √(30² − 20²).
    const double end = 170 + std::sqrt(900.0 - 400.0);
    CHECK((cut.to - Vector2d(end, 90)).norm() <= 1e-9);
    CHECK(cut.unclipped_length == approx(250.0));
    // Hole r = 11 at distance 10 from the line: chord 2√(11² − 10²).
    CHECK(cut.material_length() == approx(end - 2 * std::sqrt(21.0), 1e-12));
}

TEST_CASE("weld lines follow the straight part of the edge left by a chamfer") {
    auto c = test::plate_with({{0, 0}, {300, 0}, {300, 200}, {0, 200}});
    c.plate.outline[1].kind = model::CornerKind::chamfer;
    c.plate.outline[1].size = 20;
    model::Support s;
    s.name = "flange";
    s.edges = {0, 3};
    c.supports.push_back(s);
    const auto lines = check::make_section_lines(c, analysis::plate_layout(c));
    REQUIRE(lines.size() == 2);
    CHECK(lines[0].id == "weld-flange-edge0");
    CHECK(lines[0].length() == approx(280.0, 1e-12));
    CHECK(lines[0].material_length() == approx(280.0, 1e-12));
    CHECK(lines[1].id == "weld-flange-edge3");
    CHECK(lines[1].length() == approx(200.0, 1e-12));
}

TEST_CASE("a cut line that misses the plate is bad input naming the line") {
    auto c = test::plate_with({{0, 0}, {200, 0}, {200, 100}, {0, 100}});
    c.section_lines.push_back({"far", {300, 0}, {400, 100}});
    try {
        check::make_section_lines(c, analysis::plate_layout(c));
        FAIL("expected an InputError");
    } catch (const InputError& e) {
        REQUIRE(e.diagnostics().size() == 1);
        CHECK(e.diagnostics()[0].key_path == "section[0]");
        CHECK(e.diagnostics()[0].message.find("does not cross the plate") != std::string::npos);
    }
}

TEST_CASE("staggered rows: the net section passes the even lines' bolts; bolted supports follow "
          "members") {
    // Lines at y = 40, 100, 160; the middle line sits half a pitch (40 mm)
    // further along, so the straight section through row 1 at x = 100 meets
    // two 20 mm holes, not three. The support's group comes after the member's.
    auto c = test::plate_with({{0, 0}, {500, 0}, {500, 200}, {0, 200}});
    auto g = test::bolt_group("g", {100, 40}, 0, 2, 3, 80, 60, 20);
    g.stagger = true;
    c.bolt_groups.push_back(g);
    c.bolt_groups.push_back(test::bolt_group("anchor bolts", {400, 70}, 90, 1, 2, 60, 60, 20));
    c.members.push_back(test::member("tie", "g", 180));
    model::Support anchor;
    anchor.name = "anchor";
    anchor.kind = model::SupportKind::bolted;
    anchor.bolt_group = "anchor bolts";
    c.supports.push_back(anchor);
    const auto lines = check::make_section_lines(c, analysis::plate_layout(c));
    std::vector<std::string> ids;
    for (const auto& l : lines) ids.push_back(l.id);
    CHECK(ids == std::vector<std::string>{"whitmore-tie", "net-tie-row1", "net-tie-row2",
                                          "net-anchor-row1"});
    const auto& row1 = find(lines, "net-tie-row1");
    CHECK(row1.from.x() == test::approx(100.0, 1e-12));
    CHECK(row1.material_length() == test::approx(200 - 2 * 20, 1e-12));
    // The support's group runs along +y (angle 90°): its row is the line
    // y = 70 across the plate, through both of its holes.
    const auto& anchor_row = find(lines, "net-anchor-row1");
    CHECK(anchor_row.support == 0);
    CHECK(anchor_row.from.y() == test::approx(70.0, 1e-12));
    CHECK(anchor_row.length() == test::approx(500.0, 1e-12));
    // It crosses the support's two holes (at x = 400 and 340); the member's
    // holes at y = 40 and 100 lie 30 mm off it.
    CHECK(anchor_row.material_length() == test::approx(500 - 2 * 20, 1e-12));
}
