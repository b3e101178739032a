// Bearing-only ties: the bolt pushes the hole edge on its loaded side and
// pulls nowhere (contact, Wriggers 2006 ch. 6), settling in a few active-set
// passes; against the spread tie, which also pulls the far side, the bearing
// tie concentrates the force and raises the peak at the hole (common practice).
#include "fe/stress.hpp"
#include "run_connection.hpp"
#include "support/approx.hpp"

#include <doctest/doctest.h>
#include <fmt/format.h>

using lapwing::test::run_connection;

namespace {
std::string one_bolt(const std::string& tie) {
    return fmt::format(R"(
[units]
system = "N-mm"
[material]
E = 200000
nu = 0.3
Fy = 355
Fu = 510
[plate]
thickness = 10
outline = [{{ x = 0, y = 0 }}, {{ x = 240, y = 0, edge = "weld" }}, {{ x = 240, y = 100 }}, {{ x = 0, y = 100 }}]
[[bolt_group]]
name = "pin"
origin = [60, 50]
angle = 0
rows = 1
lines = 1
diameter = 20
hole = "standard"
tie = "{}"
[[load_case]]
name = "pull"
[[member]]
name = "strap"
bolt_group = "pin"
work_point = [0, 50]
angle = 180
forces.pull = {{ axial = 40000 }}
[[support]]
name = "weld"
kind = "welded"
edges = ["weld"]
[allowables]
peak_von_mises = "Fy"
[mesh]
element = "Q8"
size = 10
)",
                       tie);
}

double peak_von_mises_on_hole(const lapwing::test::Run& run) {
    double peak = 0;
    for (int node : run.mesh.hole_nodes[0].nodes)
        peak = std::max(peak, lapwing::fe::von_mises(
                                  run.results.cases[0].nodal_stress[static_cast<size_t>(node)]));
    return peak;
}
} // namespace

TEST_CASE(
    "a bearing tie pushes only: no contact spring is in tension, and it settles in a few passes") {
    const auto run = run_connection(one_bolt("bearing"));
    const auto& result = run.results.cases[0];
    const auto& bolt = run.results.problem.bolts[0];
    int in_contact = 0;
    for (size_t j = 0; j < bolt.hole_nodes.size(); ++j) {
        const size_t spring = static_cast<size_t>(bolt.first_contact) + j;
        const auto& s = run.results.problem.model.link_springs[spring];
        const Eigen::Vector2d u_hole(result.u(2 * s.node_b), result.u(2 * s.node_b + 1));
        const Eigen::Vector2d u_bolt(result.u(2 * s.node_a), result.u(2 * s.node_a + 1));
        const double gap = (u_hole - u_bolt).dot(s.direction);
        const double tol = 1e-9 * result.u.cwiseAbs().maxCoeff();
        // Closed nodes press (gap ≤ 0, a compressive contact force k·gap);
        // open ones carry nothing and do not overlap the bolt (gap ≥ 0).
        if (result.contact_closed[spring]) {
            CHECK(gap <= tol);
            ++in_contact;
        } else {
            CHECK(gap >= -tol);
        }
    }
    // The strap pulls to the left: the bolt bears on the left half of the hole.
    CHECK(in_contact > 0);
    CHECK(in_contact < static_cast<int>(bolt.hole_nodes.size()));
    CHECK(result.contact_iterations >= 2);
    CHECK(result.contact_iterations <= 10);
    MESSAGE("active-set passes: " << result.contact_iterations << ", nodes in contact "
                                  << in_contact << " of " << bolt.hole_nodes.size());
    CHECK(result.bolts[0].magnitude == lapwing::test::approx(40000, 1e-6));
    CHECK(result.equilibrium_residual < 1e-9);
}

TEST_CASE("the bearing tie gives a higher peak at the hole than the spread tie") {
    const double bearing = peak_von_mises_on_hole(run_connection(one_bolt("bearing")));
    const double spread = peak_von_mises_on_hole(run_connection(one_bolt("spread")));
    MESSAGE("peak von Mises at the hole: bearing " << bearing << " MPa, spread " << spread
                                                   << " MPa");
    CHECK(bearing > 1.1 * spread);
}
