// The dof map u = T ũ + g: prescribed values, multipoint constraints,
// chains, cycles, and the rigid link's kinematics (small rotations).
#include "core/error.hpp"
#include "fe/constraints.hpp"
#include "support/approx.hpp"

#include <doctest/doctest.h>

using namespace lapwing::fe;

TEST_CASE("free, prescribed and slave dofs expand to the right unknowns and offsets") {
    Constraints c;
    c.prescribed.push_back({1, 0.5});
    c.linear.push_back({3, {{0, 2.0}, {1, 1.0}}, 0.25}); // u3 = 2 u0 + u1 + 0.25 = 2 u0 + 0.75
    c.linear.push_back({4, {{3, -1.0}}, 0.0});           // chain: u4 = −u3
    const DofMap map(6, c);
    CHECK(map.n_unknowns() == 3); // dofs 0, 2, 5
    CHECK(map.unknown_of(0) == 0);
    CHECK(map.unknown_of(2) == 1);
    CHECK(map.unknown_of(5) == 2);
    Eigen::VectorXd r(3);
    r << 1.0, 2.0, 3.0;
    const Eigen::VectorXd u = map.expand(r);
    CHECK(u(1) == lapwing::test::approx(0.5));
    CHECK(u(3) == lapwing::test::approx(2.75));
    CHECK(u(4) == lapwing::test::approx(-2.75));
    // Tᵀ f: a force on the slave u3 goes to its master u0 with weight 2.
    Eigen::VectorXd f = Eigen::VectorXd::Zero(6);
    f(3) = 1.0;
    CHECK(map.restrict_to_unknowns(f)(0) == lapwing::test::approx(2.0));
}

TEST_CASE("a dof constrained twice, a cycle of slaves and an out-of-range dof are errors") {
    Constraints twice;
    twice.prescribed = {{2, 0.0}, {2, 1.0}};
    CHECK_THROWS_WITH_AS(DofMap(4, twice), doctest::Contains("constrained twice"),
                         lapwing::AnalysisError);
    Constraints cycle;
    cycle.linear = {{0, {{1, 1.0}}, 0.0}, {1, {{0, 1.0}}, 0.0}};
    CHECK_THROWS_WITH_AS(DofMap(4, cycle), doctest::Contains("cycle"), lapwing::AnalysisError);
    Constraints range;
    range.prescribed = {{9, 0.0}};
    CHECK_THROWS_WITH_AS(DofMap(4, range), doctest::Contains("has 4 dofs"), lapwing::AnalysisError);
}

TEST_CASE("a rigid link moves a point with the reference node's translation and rotation") {
    Model m;
    m.nodes = {Vector2(10, 20), Vector2(13, 24)}; // reference, point: offset (3, 4)
    m.rotation_nodes = {0};
    Constraints c;
    add_rigid_link(m, 0, 1, c);
    const DofMap map(m.n_dofs(), c);
    CHECK(map.n_unknowns() == 3);
    Eigen::VectorXd r(3);
    r << 0.1, 0.2, 0.01; // ux, uy, θ of the reference
    const Eigen::VectorXd u = map.expand(r);
    // Small rotation: u_p = u_r + θ ẑ × (x_p − x_r) = (0.1 − 0.04, 0.2 + 0.03).
    CHECK(u(dof_ux(1)) == lapwing::test::approx(0.06));
    CHECK(u(dof_uy(1)) == lapwing::test::approx(0.23));
}
