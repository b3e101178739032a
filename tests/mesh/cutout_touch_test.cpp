// Cut-outs that touch or cross the outline (copes, notches) are normal in
// connection plates (common practice: a beam cope, a notch for a flange) and
// must mesh: a cope sharing edges with the outline, a notch touching it at a
// single point, cut-outs crossing it. Each mesh is conforming, meets the
// quality targets and reproduces the exact area, worked out by hand below,
// within 1e-5 (the bound for quadratic curved meshes; the only curved
// edge is the hole, whose 15° quadratic arcs are far inside it).
#include "core/error.hpp"
#include "geometry/region_boundary.hpp"
#include "mesh/mesh.hpp"
#include "mesh_checks.hpp"
#include "support/approx.hpp"

#include <doctest/doctest.h>
#include <numbers>
#include <string>

using namespace lapwing;
using geometry::Point;

namespace {

// 300 × 200 plate with one d 22 hole at (100, 100), minus the cut-out.
geometry::PlateRegion plate_with(std::vector<Point> cut) {
    geometry::PlateRegion r;
    r.outline = {{{0, 0}}, {{300, 0}}, {{300, 200}}, {{0, 200}}};
    r.holes = {geometry::Hole::circle({100, 100}, 22)};
    r.cutouts = {{std::move(cut)}};
    return r;
}

constexpr double hole_area = std::numbers::pi * 11.0 * 11.0;

// Meshes the region and checks area, conformity and the quality targets.
void check_meshes(const geometry::PlateRegion& r, double removed, int n_loops) {
    const double exact = 300.0 * 200.0 - hole_area - removed;
    for (auto kind : {fe::ElementKind::Q8, fe::ElementKind::Q9}) {
        CAPTURE(fe::name(kind));
        mesh::MeshSettings s;
        s.kind = kind;
        s.element_size = 20;
        const mesh::Mesh m = mesh::build_mesh(r, s);
        CHECK(test::mesh_area(m) == test::approx(exact, 1e-5));
        CHECK(test::conformity_problem(m, n_loops) == "");
        CHECK(m.quality_summary.n_inverted == 0);
        CHECK(m.quality_summary.scaled_jacobian.min >= 0.3);
        CHECK(m.quality_summary.fraction_angles_ok >= 0.99);
    }
}

std::string problem(const geometry::PlateRegion& r) {
    try {
        geometry::validate(r);
    } catch (const InputError& e) {
        return e.diagnostics().front().key_path + " " + e.diagnostics().front().message;
    }
    return "";
}

} // namespace

TEST_CASE("a cope sharing edges with the outline meshes") {
    // 50 × 50 cope drawn exactly on the top-right corner: two of its edges lie
    // on outline edges 1 and 2, one of its corners on outline corner 2.
    check_meshes(plate_with({{250, 150}, {300, 150}, {300, 200}, {250, 200}}), 50.0 * 50.0, 2);
    // A notch flush with the bottom edge (one edge along it), 50 wide, 30 deep.
    check_meshes(plate_with({{150, 0}, {200, 0}, {200, 30}, {150, 30}}), 50.0 * 30.0, 2);
}

TEST_CASE("a notch touching the outline at a single point meshes") {
    // A triangle inside the plate whose corner (230, 0) lies on the bottom
    // edge: the outer boundary passes that point twice (one loop, no hole
    // loop). Area ½ · 60 · 40.
    check_meshes(plate_with({{230, 0}, {260, 40}, {200, 40}}), 0.5 * 60.0 * 40.0, 2);
    // A triangle crossing the top edge whose corner is outline corner 2:
    // the part on the plate is the triangle (300, 200), (240, 170),
    // (240, 200), ½ · 60 · 30.
    check_meshes(plate_with({{300, 200}, {240, 230}, {240, 170}}), 0.5 * 60.0 * 30.0, 2);
}

TEST_CASE("cut-outs crossing the outline mesh") {
    // A notch across the bottom edge: 50 × 30 on the plate.
    check_meshes(plate_with({{150, -20}, {200, -20}, {200, 30}, {150, 30}}), 50.0 * 30.0, 2);
    // A cope across the top-right corner: 50 × 50 on the plate.
    check_meshes(plate_with({{250, 150}, {320, 150}, {320, 220}, {250, 220}}), 50.0 * 50.0, 2);
    // A slanted notch across the left edge: the quadrilateral (−20, 60),
    // (40, 80), (40, 120), (−20, 140) cut at x = 0 keeps the trapezoid with
    // parallel sides at x = 0 (y 66.67–133.33, 66.67 long) and x = 40 (40 long),
    // 40 apart: area (66.67 + 40) / 2 · 40.
    check_meshes(plate_with({{-20, 60}, {40, 80}, {40, 120}, {-20, 140}}),
                 (200.0 / 3.0 + 40.0) / 2.0 * 40.0, 2);
}

TEST_CASE("cut-outs that split the plate or remove it all are clear input errors") {
    CHECK(problem(plate_with({{150, -20}, {200, -20}, {200, 220}, {150, 220}})) ==
          "cutouts[0] cuts the plate into 2 separate pieces");
    // Pinched into two pieces that touch only at (175, 200).
    CHECK(problem(plate_with({{150, -20}, {200, -20}, {175, 200}})) ==
          "cutouts[0] cuts the plate into 2 separate pieces");
    CHECK(problem(plate_with({{-10, -10}, {310, -10}, {310, 210}, {-10, 210}})) ==
          "cutouts[0] removes the whole plate");
    CHECK(problem(plate_with({{0, 0}, {300, 0}, {300, 200}, {0, 200}})) ==
          "cutouts[0] removes the whole plate");
}
