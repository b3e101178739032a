// A template whose cut-out is a notch across a plate corner (a cope, crossing
// two outline edges) validates, meshes and analyses: the whole pipeline from
// the template text, not only the mesher on a region built in code.
#include "analysis/analyse.hpp"
#include "analysis/plate_region.hpp"
#include "input/load_connection.hpp"
#include "mesh/mesh.hpp"
#include "mesh_checks.hpp"
#include "support/approx.hpp"

#include <cmath>
#include <doctest/doctest.h>
#include <numbers>
#include <string>

using namespace lapwing;

namespace {

// A 300 × 120 plate welded along its bottom edge, a member bolted to it
// pulling along x, and a 60 × 50 cope over the top-right corner of which
// 40 × 30 lies on the plate (x 260–300, y 90–120).
const char* const notched_plate = R"(
[units]
system = "N-mm"

[material]
E = 200000
Fy = 355
Fu = 490

[plate]
thickness = 10
outline = [{ x = 0, y = 0, edge = "weld" }, { x = 300, y = 0 }, { x = 300, y = 120 },
  { x = 0, y = 120, chamfer = 10 }]
cutout = [{ name = "cope", points = [[260, 90], [320, 90], [320, 140], [260, 140]] }]

[[bolt_group]]
name = "bolts"
origin = [150, 30]
rows = 2
lines = 2
pitch = 60
gauge = 60
diameter = 20

[[load_case]]
name = "pull"

[[member]]
name = "bar"
bolt_group = "bolts"
work_point = [300, 60]
angle = 0
forces.pull = { axial = 100000 }

[[support]]
kind = "welded"
edges = ["weld"]

[allowables]
peak_von_mises = "Fy"
)";

} // namespace

TEST_CASE("a template with a notch across a plate corner validates, meshes and analyses") {
    const model::Connection c = input::load_connection(notched_plate, "notch.toml");
    const analysis::PlateLayout layout = analysis::plate_layout(c);
    REQUIRE(layout.region.holes.size() == 4);
    const mesh::Mesh m = mesh::build_mesh(layout.region, analysis::mesh_settings(c));
    REQUIRE(fe::is_quadratic(m.kind)); // the default element, so the hole arcs are exact

    // Area by hand: rectangle − the cope's part on the plate (40 × 30) − the
    // chamfer triangle (10²/2) − four holes. Quadratic arcs of 15° keep the
    // hole areas within 1e-5 (docs/mesher.md); the rest is straight.
    const double hole_d = c.bolt_groups[0].hole.width;
    const double exact = 300.0 * 120.0 - 40.0 * 30.0 - 0.5 * 10.0 * 10.0 -
                         4 * std::numbers::pi * hole_d * hole_d / 4;
    CHECK(test::mesh_area(m) == test::approx(exact, 1e-5));
    // One outer loop and four hole loops; the notch opens the outer loop.
    CHECK(test::conformity_problem(m, 5) == "");
    // The cope's two edges inside the plate carry its tag and lie on x = 260
    // or y = 90; no node lies inside the removed corner.
    const auto cope = m.nodes_on(geometry::BoundaryKind::cutout, 0);
    CHECK(cope.size() >= 4);
    for (int n : cope) {
        const Eigen::Vector2d p = m.nodes[n];
        CHECK(std::min(std::abs(p.x() - 260.0), std::abs(p.y() - 90.0)) < 1e-9);
    }
    for (const Eigen::Vector2d& p : m.nodes) CHECK_FALSE((p.x() > 260 + 1e-9 && p.y() > 90 + 1e-9));
    // The issue's quality targets.
    CHECK(m.quality_summary.n_inverted == 0);
    CHECK(m.quality_summary.scaled_jacobian.min >= 0.3);

    // Statics: the reactions balance the member force.
    const analysis::Results r = analysis::analyse(c, m, layout);
    REQUIRE(r.cases.size() == 1);
    CHECK(r.cases[0].equilibrium_residual <= 1e-9);
    CHECK(r.cases[0].solver_residual <= 1e-9);
}

// The same plate with cut-outs that touch the outline (a cope drawn flush on
// the corner, sharing two edges with the outline; a V-notch whose tip touches
// the top edge at one point) or cross it: the template validates and meshes,
// and the area matches the hand calculation within 1e-5.
TEST_CASE("templates with cut-outs touching or crossing the outline validate and mesh") {
    struct Case {
        const char* what;
        const char* points;
        double removed; // cut-out area on the plate, by hand
    };
    const Case cases[] = {
        {"flush cope", "[[260, 90], [300, 90], [300, 120], [260, 120]]", 40.0 * 30.0},
        {"notch touching at a point", "[[100, 120], [115, 100], [85, 100]]", 0.5 * 30.0 * 20.0},
        {"notch crossing the top edge", "[[90, 100], [110, 100], [110, 130], [90, 130]]",
         20.0 * 20.0},
    };
    for (const Case& k : cases) {
        CAPTURE(k.what);
        std::string text = notched_plate;
        const std::string old = "[[260, 90], [320, 90], [320, 140], [260, 140]]";
        text.replace(text.find(old), old.size(), k.points);
        const model::Connection c = input::load_connection(text, "touch.toml");
        const analysis::PlateLayout layout = analysis::plate_layout(c);
        const mesh::Mesh m = mesh::build_mesh(layout.region, analysis::mesh_settings(c));
        const double hole_d = c.bolt_groups[0].hole.width;
        const double exact = 300.0 * 120.0 - k.removed - 0.5 * 10.0 * 10.0 -
                             4 * std::numbers::pi * hole_d * hole_d / 4;
        CHECK(test::mesh_area(m) == test::approx(exact, 1e-5));
        CHECK(test::conformity_problem(m, 5) == "");
        CHECK(m.quality_summary.n_inverted == 0);
        CHECK(m.quality_summary.scaled_jacobian.min >= 0.3);
    }
}
