// Bolt patterns against independently computed geometry, and hole sizes
// against the clearance tables they state.
#include "model/bolts.hpp"

#include <cmath>
#include <doctest/doctest.h>

using namespace lapwing::model;

namespace {

BoltGroup group(double angle, int rows, int lines, double pitch, double gauge,
                bool stagger = false) {
    BoltGroup g;
    g.origin = {100.0, 50.0};
    g.angle = angle;
    g.rows = rows;
    g.lines = lines;
    g.pitch = pitch;
    g.gauge = gauge;
    g.stagger = stagger;
    g.diameter = 20.0;
    return g;
}

double distance(Point a, Point b) {
    return std::hypot(a.x - b.x, a.y - b.y);
}

} // namespace

TEST_CASE("an axis-aligned 3 x 2 pattern puts rows along x and lines along +y") {
    const auto bolts = bolt_positions(group(0.0, 3, 2, 75.0, 60.0));
    REQUIRE(bolts.size() == 6);
    // Row-major order: (row 0, line 0), (row 0, line 1), (row 1, line 0), ...
    CHECK(bolts[0].centre == Point{100.0, 50.0});
    CHECK(bolts[1].centre == Point{100.0, 110.0});
    CHECK(bolts[2].centre == Point{175.0, 50.0});
    CHECK(bolts[5].centre == Point{250.0, 110.0});
    CHECK(bolts[5].row == 2);
    CHECK(bolts[5].line == 1);
}

TEST_CASE("a rotated pattern keeps pitch and gauge as distances and turns with the axis") {
    // Geometry by hand: at 30°, row 1 sits pitch·(cos 30°, sin 30°) from row 0,
    // and line 1 sits gauge·(−sin 30°, cos 30°) from line 0.
    const auto bolts = bolt_positions(group(30.0, 2, 2, 80.0, 50.0));
    REQUIRE(bolts.size() == 4);
    const double tol = 1e-12;
    CHECK(distance(bolts[0].centre, bolts[2].centre) == doctest::Approx(80.0).epsilon(tol));
    CHECK(distance(bolts[0].centre, bolts[1].centre) == doctest::Approx(50.0).epsilon(tol));
    CHECK(bolts[2].centre.x - 100.0 == doctest::Approx(80.0 * std::sqrt(3.0) / 2).epsilon(tol));
    CHECK(bolts[2].centre.y - 50.0 == doctest::Approx(40.0).epsilon(tol));
    CHECK(bolts[1].centre.x - 100.0 == doctest::Approx(-25.0).epsilon(tol));
    CHECK(bolts[1].centre.y - 50.0 == doctest::Approx(25.0 * std::sqrt(3.0)).epsilon(tol));
}

TEST_CASE("a 90° axis runs rows up +y and lines to −x") {
    const auto bolts = bolt_positions(group(90.0, 2, 2, 80.0, 70.0));
    CHECK(bolts[2].centre.x == doctest::Approx(100.0).epsilon(1e-12));
    CHECK(bolts[2].centre.y == doctest::Approx(130.0).epsilon(1e-12));
    CHECK(bolts[1].centre.x == doctest::Approx(30.0).epsilon(1e-12));
    CHECK(bolts[1].centre.y == doctest::Approx(50.0).epsilon(1e-12));
}

TEST_CASE("a staggered pattern shifts odd lines by half a pitch") {
    const auto bolts = bolt_positions(group(0.0, 2, 3, 60.0, 40.0, true));
    REQUIRE(bolts.size() == 6);
    CHECK(bolts[0].centre == Point{100.0, 50.0});  // line 0
    CHECK(bolts[1].centre == Point{130.0, 90.0});  // line 1, shifted 30
    CHECK(bolts[2].centre == Point{100.0, 130.0}); // line 2, not shifted
    CHECK(bolts[4].centre == Point{190.0, 90.0});
}

TEST_CASE("metric holes follow the stated nominal clearances (common practice, from memory)") {
    auto width = [](HoleKind k, double d) {
        return hole_from_rule(k, HoleRule::metric, d, SlotDirection::across).width;
    };
    auto length = [](HoleKind k, double d) {
        return hole_from_rule(k, HoleRule::metric, d, SlotDirection::across).length;
    };
    CHECK(width(HoleKind::standard, 16) == 18.0); // d + 2 for d ≤ 24
    CHECK(width(HoleKind::standard, 24) == 26.0);
    CHECK(width(HoleKind::standard, 27) == 30.0); // d + 3 above
    CHECK(width(HoleKind::oversized, 12) == 15.0);
    CHECK(width(HoleKind::oversized, 20) == 24.0);
    CHECK(width(HoleKind::oversized, 24) == 30.0);
    CHECK(width(HoleKind::oversized, 30) == 38.0);
    CHECK(width(HoleKind::short_slot, 20) == 22.0); // slot width = standard hole
    CHECK(length(HoleKind::short_slot, 20) == 26.0);
    CHECK(length(HoleKind::long_slot, 20) == 30.0); // 1.5 d
}

TEST_CASE("inch holes follow AISC 360-16 Table J3.3 nominal dimensions (from memory)") {
    const double in = 25.4, tol = 1e-12;
    auto hole = [&](HoleKind k, double d_in) {
        return hole_from_rule(k, HoleRule::inch, d_in * in, SlotDirection::along);
    };
    CHECK(hole(HoleKind::standard, 0.75).width / in == doctest::Approx(13.0 / 16).epsilon(tol));
    CHECK(hole(HoleKind::standard, 0.875).width / in == doctest::Approx(15.0 / 16).epsilon(tol));
    CHECK(hole(HoleKind::standard, 1.0).width / in == doctest::Approx(1.125).epsilon(tol));
    CHECK(hole(HoleKind::oversized, 0.75).width / in == doctest::Approx(15.0 / 16).epsilon(tol));
    CHECK(hole(HoleKind::oversized, 1.0).width / in == doctest::Approx(1.25).epsilon(tol));
    CHECK(hole(HoleKind::oversized, 1.25).width / in == doctest::Approx(1.5625).epsilon(tol));
    CHECK(hole(HoleKind::short_slot, 0.75).width / in == doctest::Approx(13.0 / 16).epsilon(tol));
    CHECK(hole(HoleKind::short_slot, 0.75).length / in == doctest::Approx(1.0).epsilon(tol));
    CHECK(hole(HoleKind::long_slot, 0.75).length / in == doctest::Approx(1.875).epsilon(tol));
    CHECK(hole(HoleKind::long_slot, 0.75).direction == SlotDirection::along);
}
