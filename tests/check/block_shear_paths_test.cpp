// Block shear paths built on a real plate: the REFERENCES "Plate checks"
// example (AISC 360-16 §J4.3 arithmetic: 2 lines at g = 3 in, 3 rows at
// 3 in, end distance 1.5 in, 13/16 in holes + 1/16 in, t = 1/2 in, Fy = 50,
// Fu = 65 ksi → Agv = 7.5, Anv = 5.3125, Ant = 1.0625 in², Rn = 276.25 kips)
// set out in mm, and the other candidate paths checked against lengths
// worked out by hand on the same plate.
#include "check/block_shear_check.hpp"
#include "check/block_shear_paths.hpp"
#include "core/units.hpp"
#include "geometry/region_boundary.hpp"
#include "support/approx.hpp"

#include <algorithm>
#include <doctest/doctest.h>

using namespace lapwing;
using namespace lapwing::check;
using lapwing::test::approx;

namespace {
constexpr double in = mm_per_inch;
constexpr double in2 = in * in;
constexpr double kip = newton_per_kip;
constexpr double ksi = mpa_per_ksi;
// The member pulls along +x, away from the joint. Rows at x = 4, 7, 10 in,
// lines at y = 0 and 3 in; the plate's end edge 1.5 in past the last row
// (x = 11.5 in), its side edges at y = −10 in and y = +13 in, and it runs
// back towards the joint to x = −8 in.
const std::vector<Eigen::Vector2d> centres = {
    {4 * in, 0}, {4 * in, 3 * in}, {7 * in, 0}, {7 * in, 3 * in}, {10 * in, 0}, {10 * in, 3 * in}};
geometry::RegionBoundary reference_plate() {
    geometry::PlateRegion r;
    r.outline = {{{-8 * in, -10 * in}},
                 {{11.5 * in, -10 * in}},
                 {{11.5 * in, 13 * in}},
                 {{-8 * in, 13 * in}}};
    for (const auto& c : centres) r.holes.push_back(geometry::Hole::circle(c, 13.0 / 16 * in));
    return geometry::build_region_boundary(r);
}
const BlockShearPath& find(const BlockShearPaths& all, const std::string& id) {
    const auto it = std::find_if(all.paths.begin(), all.paths.end(),
                                 [&](const BlockShearPath& p) { return p.id == id; });
    REQUIRE(it != all.paths.end());
    return *it;
}
// Lengths come from ray casts on straight edges at exact inch positions,
// areas from a few products: round-off only, 1e-12 relative.
constexpr double tight = 1e-12;
const double t = 0.5 * in;
const double aisc_hole = 13.0 / 16 * in + aisc_hole_allowance; // 7/8 in
} // namespace

TEST_CASE("block shear paths: the REFERENCES example on a real plate gives its areas and Rn") {
    const BlockShearPaths all = block_shear_paths(centres, {1, 0}, reference_plate());
    CHECK(all.notes.empty());
    const BlockShearPath& p = find(all, "along:between-outer-lines");
    // Two shear planes of 2·3 + 1.5 = 7.5 in each, 2.5 holes on each; the
    // tension plane 3 in between the lines, two half holes.
    CHECK(p.shear_length / in == approx(15, tight));
    CHECK(p.shear_holes == 5.0);
    CHECK(p.tension_length / in == approx(3, tight));
    CHECK(p.tension_holes == 1.0);
    CHECK(p.uniform_tension);
    CHECK(p.bolts.size() == 6);
    const BlockShearAreas a = areas(p, t, aisc_hole, aisc_hole);
    CHECK(a.Agv / in2 == approx(7.5, tight));
    CHECK(a.Anv / in2 == approx(5.3125, tight));
    CHECK(a.Agt / in2 == approx(1.5, tight));
    CHECK(a.Ant / in2 == approx(1.0625, tight));
    const Capacity c = block_shear_aisc(a, 50 * ksi, 65 * ksi, 1.0, 1.0);
    CHECK(c.value / kip == approx(276.25, tight));
    // The figure's tear line: end edge, innermost row across, end edge.
    REQUIRE(p.polyline.size() == 4);
    CHECK(p.polyline[0].x() / in == approx(11.5, tight));
    CHECK(p.polyline[1].x() / in == approx(4, tight));
    CHECK(p.polyline[2].y() / in == approx(3, tight));
}

TEST_CASE("block shear paths: one-sided blocks to the side edges (hand lengths)") {
    const BlockShearPaths all = block_shear_paths(centres, {1, 0}, reference_plate(), false);
    // (a) plus, per side, one block per line: 1 + 2·2 paths along the axis.
    CHECK(all.paths.size() == 5);
    // Line y = 0 (line 1, right of the pull) to the right edge y = −10 in:
    // shear 7.5 in with 2.5 holes, tension 10 in with a half hole; only that
    // line's three bolts; uniform tension.
    const BlockShearPath& right = find(all, "along:line1-to-right-edge");
    CHECK(right.shear_length / in == approx(7.5, tight));
    CHECK(right.shear_holes == 2.5);
    CHECK(right.tension_length / in == approx(10, tight));
    CHECK(right.tension_holes == 0.5);
    CHECK(right.uniform_tension);
    CHECK(right.bolts == std::vector<int>{0, 2, 4});
    // Line 1 to the left edge y = 13 in: the tension plane crosses line 2
    // (1.5 holes) and the block holds both lines: non-uniform (Ubs = 0.5).
    const BlockShearPath& left = find(all, "along:line1-to-left-edge");
    CHECK(left.tension_length / in == approx(13, tight));
    CHECK(left.tension_holes == 1.5);
    CHECK(!left.uniform_tension);
    CHECK(left.bolts.size() == 6);
    // Demand: the pull of the block's bolts along +x; bolt forces of 10 kN
    // each along +x and 3 kN across give 30 kN on line 1's block.
    const std::vector<Eigen::Vector2d> forces(6, Eigen::Vector2d(10000, 3000));
    CHECK(path_demand(right, forces) == approx(30000, tight));
    CHECK(path_demand(left, forces) == approx(60000, tight));
}

TEST_CASE("block shear paths: pulled across the member axis (shear across, tension along)") {
    const BlockShearPaths all = block_shear_paths(centres, {1, 0}, reference_plate());
    // Pulled to +y (left of the axis): shear planes along the outer rows x =
    // 4 and x = 10 in from y = 0 to the edge y = 13 in, each 13 in with 0.5
    // + 1 holes; tension along the axis from row 1 to row 3 at y = 0: 6 in,
    // two half holes and row 2 whole.
    const BlockShearPath& p = find(all, "across-left:between-outer-lines");
    CHECK(p.direction.y() == approx(1, tight));
    CHECK(p.shear_length / in == approx(26, tight));
    CHECK(p.shear_holes == 3.0);
    CHECK(p.tension_length / in == approx(6, tight));
    CHECK(p.tension_holes == 2.0);
    // Pulled to −y: shear from y = 3 in down to −10 in, 13 in each.
    const BlockShearPath& q = find(all, "across-right:between-outer-lines");
    CHECK(q.shear_length / in == approx(26, tight));
    CHECK(q.polyline[1].y() / in == approx(3, tight));
}

TEST_CASE("block shear paths: a skewed end edge") {
    // The end edge cut on a slope, x = 11.5 in + y/3: line 1 (y = 0) still
    // ends at x = 11.5 in (shear 7.5 in), line 2 (y = 3 in) at x = 12.5 in
    // (shear 8.5 in); together 16 in (plane geometry, by hand).
    geometry::PlateRegion r;
    r.outline = {{{-8 * in, -10 * in}},
                 {{(11.5 - 10.0 / 3) * in, -10 * in}},
                 {{(11.5 + 13.0 / 3) * in, 13 * in}},
                 {{-8 * in, 13 * in}}};
    const auto boundary = geometry::build_region_boundary(r);
    const BlockShearPaths all = block_shear_paths(centres, {1, 0}, boundary, false);
    CHECK(find(all, "along:between-outer-lines").shear_length / in == approx(16, 1e-12));
    CHECK(find(all, "along:between-outer-lines").shear_holes == 5.0);
}

TEST_CASE("block shear check: the weakest loaded path is the REFERENCES block") {
    // Six bolts share 276.25 kips along +x, φ = 1: the block between the
    // lines is exactly at capacity (ratio 1, REFERENCES). By hand the
    // one-sided blocks are stronger: line 1 to the right edge holds half the
    // load against min(0.6·65·2.65625 + 65·4.78125, 0.6·50·3.75 + 65·4.78125)
    // = 414.375 kips; line 1 to the left edge (Ubs 0.5) holds all of it
    // against 0.6·65·2.65625 + 0.5·65·5.84375 = 293.516 kips. Paths across
    // the axis are not pulled (no force across).
    const geometry::RegionBoundary b = reference_plate();
    const BlockShearPaths all = block_shear_paths(centres, {1, 0}, b);
    const std::vector<Eigen::Vector2d> forces(6, Eigen::Vector2d(276.25 * kip / 6, 0));
    model::Hole hole;
    hole.width = hole.length = 13.0 / 16 * in;
    model::Material m;
    m.Fy = 50 * ksi;
    m.Fu = 65 * ksi;
    model::BlockShearAllowable allow;
    allow.resistance_factor = 1.0;
    const std::vector<PathCheck> checks = check_paths(all, forces, t, hole, 0.0, m, allow);
    const int w = weakest(checks);
    REQUIRE(w >= 0);
    CHECK(all.paths[static_cast<size_t>(checks[static_cast<size_t>(w)].path)].id ==
          "along:between-outer-lines");
    CHECK(checks[static_cast<size_t>(w)].ratio() == approx(1.0, tight));
    for (const PathCheck& c : checks) {
        const std::string& id = all.paths[static_cast<size_t>(c.path)].id;
        if (id == "along:line1-to-right-edge")
            CHECK(c.capacity.chosen.value / kip == approx(414.375, tight));
        if (id == "along:line1-to-left-edge")
            CHECK(c.capacity.chosen.value / kip == approx(293.515625, tight));
        if (id.rfind("across", 0) == 0) CHECK(c.demand == 0.0);
    }
    // A slot 13/16 × 2 in with its long side across the axis deducts its
    // length from the tension plane and its width from the shear planes.
    model::Hole slot = hole;
    slot.length = 2 * in;
    slot.direction = model::SlotDirection::across;
    const HoleWidths hw = hole_widths(slot, 0.0, {1, 0});
    CHECK(hw.shear == approx(13.0 / 16 * in, tight));
    CHECK(hw.tension == approx(2 * in, tight));
}

TEST_CASE("block shear paths: a staggered pattern gives a zig-zag tension plane with s²/4g") {
    // Hand example (this project), metric: 3 lines at g = 40 mm (y = 25, 65,
    // 105), 3 rows at p = 60 mm, the middle line shifted half a pitch
    // (x = 70, 130, 190; the outer lines at x = 40, 100, 160); end edge
    // x = 230, side edges y = 0 and 130; d0 = 22, t = 10, pulled along +x.
    std::vector<Eigen::Vector2d> c;
    for (const double x : {40.0, 100.0, 160.0})
        c.insert(c.end(), {{x, 25}, {x + 30, 65}, {x, 105}});
    geometry::PlateRegion r;
    r.outline = {{{-100, 0}}, {{230, 0}}, {{230, 130}}, {{-100, 130}}};
    for (const auto& p : c) r.holes.push_back(geometry::Hole::circle(p, 22));
    const BlockShearPaths all =
        block_shear_paths(c, {1, 0}, geometry::build_region_boundary(r), false);
    CHECK(all.notes.empty());
    // Between the outer lines: shear planes x = 40 → 230, 190 mm with
    // 0.5 + 2 holes each; tension zig-zag (40, 25) → (70, 65) → (40, 105):
    // across 80 mm, 2 holes, stagger 2·30²/(4·40) = 11.25 mm (AISC 360-16
    // §B4.3b). Net tension 80 − 44 + 11.25 = 47.25 mm → Ant = 472.5 mm²;
    // Anv = (380 − 5·22)·10 = 2700 mm².
    const BlockShearPath& p = find(all, "along:between-outer-lines");
    CHECK(p.tension_length == approx(80, tight));
    CHECK(p.tension_holes == 2.0);
    CHECK(p.tension_stagger == approx(11.25, tight));
    CHECK(p.bolts.size() == 9);
    CHECK(p.polyline.size() == 5);
    const BlockShearAreas a = areas(p, 10, 22, 22);
    CHECK(a.Ant == approx(472.5, tight));
    CHECK(a.Anv == approx(2700, tight));
    // EN 1993-1-8 §3.10.2 (S355, γM0 = 1.0, γM2 = 1.25), by hand:
    // 490·472.5/1.25 + 355·2700/√3 = 185 220 + 958 500/1.7320508
    // = 185 220 + 553 390.2 = 738 610.2 N.
    const double en = block_shear_en(a, 355, 490, 1.0, 1.0, 1.25).value;
    CHECK(std::abs(en - 738610.2) <= 0.05);
    // Middle line to the left edge: shear x = 70 → 230 (160 mm, 2.5 holes);
    // tension (70, 65) → (40, 105) then up to y = 130: 40 + 25 = 65 mm,
    // 1.5 holes, stagger 30²/160 = 5.625 mm; two lines held: not uniform.
    const BlockShearPath& q = find(all, "along:line2-to-left-edge");
    CHECK(q.shear_length == approx(160, tight));
    CHECK(q.shear_holes == 2.5);
    CHECK(q.tension_length == approx(65, tight));
    CHECK(q.tension_holes == 1.5);
    CHECK(q.tension_stagger == approx(5.625, tight));
    CHECK(!q.uniform_tension);
    CHECK(q.bolts.size() == 6);
}

TEST_CASE("block shear paths: the EN 1993-1-8 hand example set out as a plate") {
    // limit_states_test's hand example: 2 lines at p2 = 70 (y = 40, 110),
    // 3 rows at p1 = 70 (x = 0, 70, 140), e1 = 40 to the end edge x = 180;
    // d0 = 22, t = 10, S355. The block between the lines must give
    // Anv = 2·(180 − 2.5·22)·10 = 2500 mm², Ant = (70 − 22)·10 = 480 mm²
    // and Veff,1,Rd = 700 558.4 N (Eq. 3.9, γM0 = 1.0, γM2 = 1.25).
    std::vector<Eigen::Vector2d> c;
    geometry::PlateRegion r;
    r.outline = {{{-300, 0}}, {{180, 0}}, {{180, 150}}, {{-300, 150}}};
    for (const double x : {0.0, 70.0, 140.0})
        for (const double y : {40.0, 110.0}) {
            c.emplace_back(x, y);
            r.holes.push_back(geometry::Hole::circle({x, y}, 22));
        }
    const BlockShearPaths all =
        block_shear_paths(c, {1, 0}, geometry::build_region_boundary(r), false);
    const BlockShearAreas a = areas(find(all, "along:between-outer-lines"), 10, 22, 22);
    CHECK(a.Anv == approx(2500, tight));
    CHECK(a.Ant == approx(480, tight));
    CHECK(std::abs(block_shear_en(a, 355, 490, 1.0, 1.0, 1.25).value - 700558.4) <= 0.05);
}
