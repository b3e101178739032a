// Boundary loops against closed-form geometry: areas by Green's theorem
// against hand formulas, tags and orientation, cut-out removal.
#include "geometry/region_boundary.hpp"

#include <cmath>
#include <doctest/doctest.h>
#include <numbers>

using namespace lapwing;
using geometry::BoundaryKind;

namespace {
constexpr double pi = std::numbers::pi;
double total_area(const geometry::RegionBoundary& b) {
    double a = 0;
    for (const auto& l : b.loops) a += geometry::signed_area(l);
    return a;
}
} // namespace

TEST_CASE("areas: rectangle minus circle, slot, fillet and chamfer corners, flush notch") {
    geometry::PlateRegion r;
    r.outline = {{{0, 0}}, {{300, 0}}, {{300, 200}, 0, 40}, {{0, 200}, 20, 0}};
    r.holes = {geometry::Hole::circle({100, 100}, 22),
               geometry::Hole::slot({200, 100}, 50, 22, 30)};
    // A notch drawn flush with edge 0 (collinear edges) and crossing it.
    r.cutouts = {{{{150, 0}, {170, 0}, {170, 15}, {150, 15}}}};
    const auto b = geometry::build_region_boundary(r);
    // Hand formulas: fillet removes R² − πR²/4, chamfer c²/2, slot (L − w) w + πw²/4.
    const double exact =
        300.0 * 200 - (1600 - pi * 1600 / 4) - 200 - pi * 121 - (28.0 * 22 + pi * 121) - 300;
    CHECK(total_area(b) == doctest::Approx(exact).epsilon(1e-12));
    REQUIRE(b.loops.size() == 3);
    CHECK(geometry::signed_area(b.loops[0]) > 0); // outer counter-clockwise
    CHECK(geometry::signed_area(b.loops[1]) < 0); // holes clockwise
    // Loops are closed and consecutive.
    for (const auto& l : b.loops)
        for (size_t k = 0; k < l.curves.size(); ++k)
            CHECK((l.curves[k].end - l.curves[(k + 1) % l.curves.size()].start).norm() < 1e-12);
    // The notch's two inner corners are re-entrant.
    int reentrant = 0;
    for (const auto& p : b.reentrant_corners)
        reentrant += ((p - Eigen::Vector2d(150, 15)).norm() < 1e-9 ||
                      (p - Eigen::Vector2d(170, 15)).norm() < 1e-9);
    CHECK(reentrant == 2);
}

TEST_CASE("tags name the outline edges, corners, holes and cut-out edges in the user's numbering") {
    geometry::PlateRegion r;
    r.outline = {{{0, 0}}, {{300, 0}}, {{300, 200}, 0, 40}, {{0, 200}}};
    // Cut-out given clockwise: its edge ids still follow the user's point order.
    r.cutouts = {{{{-10, 50}, {-10, 150}, {40, 150}, {40, 50}}}};
    const auto b = geometry::build_region_boundary(r);
    bool corner = false, cut_edge_1 = false;
    for (const auto& c : b.loops[0].curves) {
        if (c.tag.kind == BoundaryKind::outline_corner)
            corner = c.tag.index == 2 && c.kind == geometry::CurveKind::arc;
        if (c.tag.kind == BoundaryKind::cutout && c.tag.part == 1) {
            // user edge 1 runs (-10,150) → (40,150)
            cut_edge_1 = std::abs(c.start.y() - 150) < 1e-12 && std::abs(c.end.y() - 150) < 1e-12;
        }
    }
    CHECK(corner);
    CHECK(cut_edge_1);
    CHECK(geometry::BoundaryTag{BoundaryKind::cutout, 0, 1}.name() == "cutouts[0].edge[1]");
    CHECK(geometry::BoundaryTag{BoundaryKind::hole, 3, 0}.name() == "holes[3]");
}
