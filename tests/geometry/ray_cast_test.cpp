// Ray casting against exact geometry: distances to straight edges, chamfers,
// fillets, cut-outs, round and slotted holes worked out by hand (plane
// geometry, each noted beside its check), and the Whitmore-width clipping
// example of shared REFERENCES ("Plate checks", Whitmore 1952).
#include "core/error.hpp"
#include "core/units.hpp"
#include "geometry/ray_cast.hpp"
#include "geometry/region_boundary.hpp"
#include "support/approx.hpp"

#include <cmath>
#include <doctest/doctest.h>

using namespace lapwing;
using geometry::BoundaryKind;
using geometry::Point;
using lapwing::test::approx;

namespace {
// 300 × 200 plate; corner 2 (300, 200) chamfered 40, corner 3 (0, 200)
// filleted r = 40; a round hole d = 22 at (150, 50), a 50 × 22 slot along x
// at (200, 120), a notch 20 × 15 cut into the bottom edge.
geometry::PlateRegion plate() {
    geometry::PlateRegion r;
    r.outline = {{{0, 0}}, {{300, 0}}, {{300, 200}, 40, 0}, {{0, 200}, 0, 40}};
    r.holes = {geometry::Hole::circle({150, 50}, 22), geometry::Hole::slot({200, 120}, 50, 22, 0)};
    r.cutouts = {{{{100, -5}, {120, -5}, {120, 15}, {100, 15}}}};
    return r;
}
// Tolerance: the answers are closed-form; the ray arithmetic is a few
// floating-point operations on numbers of size ~300, so 1e-12 relative.
constexpr double tight = 1e-12;
} // namespace

TEST_CASE("ray cast: straight edges and holes, with the hit named") {
    const auto b = geometry::build_region_boundary(plate());
    // Straight back to the left edge x = 0 from (50, 50): 50 exactly.
    auto h = geometry::cast_ray(b, {50, 50}, {-1, 0});
    REQUIRE(h.hit);
    CHECK(h.distance == approx(50, tight));
    CHECK(h.tag.kind == BoundaryKind::outline_edge);
    CHECK(h.tag.index == 3);
    // On the hole's centre line: centre at 100 ahead, radius 11 → 89.
    h = geometry::cast_ray(b, {50, 50}, {2, 0}); // direction need not be unit length
    REQUIRE(h.hit);
    CHECK(h.distance == approx(89, tight));
    CHECK(h.tag.kind == BoundaryKind::hole);
    CHECK(h.tag.index == 0);
    CHECK(h.at.x() == approx(139, tight));
    // 5 off the centre line: the circle is met at 100 − √(11² − 5²).
    h = geometry::cast_ray(b, {50, 55}, {1, 0});
    CHECK(h.distance == approx(100 - std::sqrt(121.0 - 25.0), tight));
    // Passing through the excluded hole (or all holes) to the right edge x = 300.
    h = geometry::cast_ray(b, {50, 50}, {1, 0}, {.stop_at_holes = true, .excluded_hole = 0});
    CHECK(h.distance == approx(250, tight));
    CHECK(h.tag.kind == BoundaryKind::outline_edge);
    CHECK(h.tag.index == 1);
    CHECK(geometry::cast_ray(b, {50, 50}, {1, 0}, {.stop_at_holes = false}).distance ==
          approx(250, tight));
    // A zero direction meets nothing.
    CHECK(!geometry::cast_ray(b, {50, 50}, {0, 0}).hit);
}

TEST_CASE("ray cast: chamfer, fillet and cut-out edges") {
    const auto b = geometry::build_region_boundary(plate());
    // Chamfer at (300, 200), legs 40: the line x + y = 460 from (260, 200) to
    // (300, 160). From (250, 150) at 45°: 400 + 2s/√2 = 460 → s = 30√2.
    auto h = geometry::cast_ray(b, {250, 150}, {1, 1});
    REQUIRE(h.hit);
    CHECK(h.distance == approx(30 * std::sqrt(2.0), tight));
    CHECK(h.tag.kind == BoundaryKind::outline_corner);
    CHECK(h.tag.index == 2);
    // Fillet r = 40 at (0, 200): arc centre (40, 160); from the centre at
    // 135° the arc is exactly r away.
    h = geometry::cast_ray(b, {40, 160}, {-1, 1});
    REQUIRE(h.hit);
    CHECK(h.distance == approx(40, tight));
    CHECK(h.tag.kind == BoundaryKind::outline_corner);
    CHECK(h.tag.index == 3);
    // From (110, 100) straight down: the notch's top edge y = 15, i.e. 85;
    // that edge is the cut-out's edge 2, from (120, 15) to (100, 15).
    h = geometry::cast_ray(b, {110, 100}, {0, -1});
    REQUIRE(h.hit);
    CHECK(h.distance == approx(85, tight));
    CHECK(h.tag.kind == BoundaryKind::cutout);
    CHECK(h.tag.index == 0);
    CHECK(h.tag.part == 2);
    // Beside the notch, straight down to the bottom edge y = 0.
    h = geometry::cast_ray(b, {130, 100}, {0, -1});
    CHECK(h.distance == approx(100, tight));
    CHECK(h.tag.kind == BoundaryKind::outline_edge);
    CHECK(h.tag.index == 0);
}

TEST_CASE("ray cast: own hole extent and clear distance (tear-out lc geometry)") {
    const auto b = geometry::build_region_boundary(plate());
    // Round hole d0 = 22: extent d0/2 in any direction from its centre.
    CHECK(geometry::hole_extent(b, 0, {150, 50}, {0.6, 0.8}) == approx(11, tight));
    // Slot 50 × 22 along x: half the length along x, half the width across,
    // and at 45° the straight flank y = 11 is met at 11√2 (within the
    // flank, since 11 < 25 − 11).
    CHECK(geometry::hole_extent(b, 1, {200, 120}, {1, 0}) == approx(25, tight));
    CHECK(geometry::hole_extent(b, 1, {200, 120}, {0, -1}) == approx(11, tight));
    CHECK(geometry::hole_extent(b, 1, {200, 120}, {1, 1}) == approx(11 * std::sqrt(2.0), tight));
    // Round hole to the bottom edge: centre 50 above y = 0 → lc = 50 − 11.
    auto c = geometry::clear_distance(b, 0, {150, 50}, {0, -1});
    CHECK(c.clear == approx(39, tight));
    CHECK(c.hit.tag.kind == BoundaryKind::outline_edge);
    // Slot's right end to the right edge: 100 − 25 = 75 (x = 225 to 300).
    c = geometry::clear_distance(b, 1, {200, 120}, {1, 0});
    CHECK(c.clear == approx(75, tight));
    CHECK(c.own_extent == approx(25, tight));
    // Slot towards the round hole: straight down from (200, 120) misses the
    // hole at (150, 50); from the round hole towards the slot's left tip
    // (175, 120): the ray direction (25, 70) meets the slot's left end arc,
    // centre (186, 120) r = 11 — solved here in closed form.
    const Point u = Point(25, 70).normalized();
    const Point q = Point(150, 50) - Point(186, 120);
    const double bq = q.dot(u);
    const double s = -bq - std::sqrt(bq * bq - (q.squaredNorm() - 121.0));
    c = geometry::clear_distance(b, 0, {150, 50}, {25, 70});
    CHECK(c.hit.tag.kind == BoundaryKind::hole);
    CHECK(c.hit.tag.index == 1);
    CHECK(c.clear == approx(s - 11, tight));
}

TEST_CASE("ray cast: Whitmore width clipped by a plate edge (REFERENCES example)") {
    // shared REFERENCES "Plate checks" (Whitmore 1952): g = 3 in, 4 rows at
    // 3 in → Lw = g + 2·(9 in)·tan 30° = 13.392 in; an edge 5 in from the
    // axis clips one side → 11.696 in. Here the member axis is +x, the
    // Whitmore line is x = 400 mm, the plate edge y = 5 in above the axis and
    // 20 in below it; the clipped width is min(Lw/2, distance) on each side.
    const double in = mm_per_inch;
    geometry::PlateRegion r;
    r.outline = {{{0, -20 * in}}, {{600, -20 * in}}, {{600, 5 * in}}, {{0, 5 * in}}};
    const auto b = geometry::build_region_boundary(r);
    const double half = 0.5 * (3 * in + 2 * 9 * in * std::tan(std::numbers::pi / 6));
    const double up = geometry::cast_ray(b, {400, 0}, {0, 1}).distance;
    const double down = geometry::cast_ray(b, {400, 0}, {0, -1}).distance;
    CHECK(up == approx(5 * in, tight));
    // The example prints three decimals: agree to half a unit of the last.
    CHECK(std::abs(2 * half / in - 13.392) <= 0.0005);
    CHECK(std::abs((std::min(half, up) + std::min(half, down)) / in - 11.696) <= 0.0005);
}

TEST_CASE("ray cast: a region that cannot be built is an input error") {
    geometry::PlateRegion r;
    r.outline = {{{0, 0}}, {{100, 0}}}; // two corners are no plate
    CHECK_THROWS_AS(geometry::cast_ray(r, {10, 10}, {1, 0}), InputError);
}
