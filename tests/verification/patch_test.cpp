// MacNeal & Harder (1985), "A proposed standard set of problems to test
// finite element accuracy", Finite Elements in Analysis and Design 1:3–20,
// membrane patch test (geometry from ../shared/REFERENCES.md, from memory):
// rectangle 0.24 × 0.12 with interior nodes (0.04,0.02) (0.18,0.03)
// (0.16,0.08) (0.08,0.08); E = 1e6, ν = 0.25, t = 0.001; boundary
// u = 1e-3 (x + y/2), v = 1e-3 (y + x/2). Exact: εx = εy = γxy = 1e-3,
// σx = σy = 1333.33, τxy = 400 everywhere.
#include "fe/linear_static.hpp"
#include "fe/recovery.hpp"
#include "support/fe_models.hpp"

#include <doctest/doctest.h>
#include <set>

using namespace lapwing::fe;

namespace {

const std::vector<Vector2> patch_nodes = {{0, 0},       {0.24, 0},    {0.24, 0.12}, {0, 0.12},
                                          {0.04, 0.02}, {0.18, 0.03}, {0.16, 0.08}, {0.08, 0.08}};
const std::vector<std::array<int, 4>> patch_quads = {
    {0, 1, 5, 4}, {1, 2, 6, 5}, {2, 3, 7, 6}, {3, 0, 4, 7}, {4, 5, 6, 7}};

Vector2 exact_u(const Vector2& x) {
    return 1e-3 * Vector2(x.x() + x.y() / 2, x.y() + x.x() / 2);
}
const Stress exact_stress(1333.333333333333, 1333.333333333333, 400.0);

bool on_boundary(const Vector2& x) {
    const double tol = 1e-12;
    return std::abs(x.x()) < tol || std::abs(x.y()) < tol || std::abs(x.x() - 0.24) < tol ||
           std::abs(x.y() - 0.12) < tol;
}

} // namespace

TEST_CASE("MacNeal-Harder patch test: every element reproduces the constant strain state exactly") {
    for (ElementKind kind : lapwing::test::all_kinds) {
        CAPTURE(name(kind));
        const Model m = lapwing::test::promote(patch_nodes, patch_quads, kind, {1e6, 0.25}, 0.001);
        Constraints c;
        for (int i = 0; i < m.n_nodes(); ++i)
            if (on_boundary(m.nodes[i])) {
                const Vector2 u = exact_u(m.nodes[i]);
                c.prescribed.push_back({dof_ux(i), u.x()});
                c.prescribed.push_back({dof_uy(i), u.y()});
            }
        const LinearStaticProblem problem(m, c);
        const Solution s = problem.solve(Loads{});
        // Interior displacements exact to round-off.
        int n_interior = 0;
        for (int i = 0; i < m.n_nodes(); ++i)
            if (!on_boundary(m.nodes[i])) {
                ++n_interior;
                const Vector2 u(s.u(dof_ux(i)), s.u(dof_uy(i)));
                CHECK((u - exact_u(m.nodes[i])).norm() <= 1e-10 * exact_u(m.nodes[i]).norm());
            }
        CHECK(n_interior >= 4);
        // Stresses at the Gauss points and recovered at the nodes: constant to 1e-10 relative.
        const SampledStresses g = sample_stresses(m, s.u, 3);
        double worst = 0;
        for (const Stress& sigma : g.stress)
            worst = std::max(worst, (sigma - exact_stress).norm() / exact_stress.norm());
        CHECK(worst < 1e-10);
        const auto spr = recover_spr(m, spr_samples(m, s.u));
        const auto averaged = recover_by_averaging(m, s.u);
        double worst_nodal = 0;
        for (int i = 0; i < m.n_nodes(); ++i)
            worst_nodal =
                std::max({worst_nodal, (spr[i] - exact_stress).norm() / exact_stress.norm(),
                          (averaged[i] - exact_stress).norm() / exact_stress.norm()});
        CHECK(worst_nodal < 1e-10);
        // The ZZ estimate of an exact solution is zero.
        CHECK(zz_error_estimate(m, s.u, spr).relative < 1e-9);
    }
}

TEST_CASE(
    "MacNeal-Harder patch under boundary tractions: the same constant stress, supports minimal") {
    // Same patch, loaded by the exact tractions σ·n on its four sides and held
    // only against rigid motion (three dofs): the stress state must still be
    // the exact constant one (a stronger form of the test, Taylor, Simo,
    // Zienkiewicz & Chan 1986 "The patch test – a condition for assessing FEM
    // convergence", IJNME 22:39).
    for (ElementKind kind : lapwing::test::all_kinds) {
        CAPTURE(name(kind));
        const Model m = lapwing::test::promote(patch_nodes, patch_quads, kind, {1e6, 0.25}, 0.001);
        Loads loads;
        const Stress& s0 = exact_stress;
        for (int e = 0; e < static_cast<int>(m.elements.size()); ++e)
            for (int edge = 0; edge < 4; ++edge) {
                const auto local = edge_nodes(kind, edge);
                const Vector2 a = m.nodes[m.elements[e].nodes[local[0]]];
                const Vector2 b =
                    m.nodes[m.elements[e].nodes[edge_node_count(kind) == 3 ? local[2] : local[1]]];
                if (!(on_boundary(a) && on_boundary(b) && on_boundary(0.5 * (a + b)))) continue;
                const Vector2 t = (b - a).normalized();
                const Vector2 n(t.y(), -t.x());
                const Vector2 traction(s0(0) * n.x() + s0(2) * n.y(),
                                       s0(2) * n.x() + s0(1) * n.y());
                loads.edges.push_back({e, edge, TractionFrame::global, traction, traction});
            }
        Constraints c; // pin node 0 (0,0); roller in y at node 1 (0.24, 0)
        const Vector2 u0 = exact_u(m.nodes[0]), u1 = exact_u(m.nodes[1]);
        c.prescribed = {{dof_ux(0), u0.x()}, {dof_uy(0), u0.y()}, {dof_uy(1), u1.y()}};
        const LinearStaticProblem problem(m, c);
        const Solution s = problem.solve(loads);
        const SampledStresses g = sample_stresses(m, s.u, 3);
        double worst = 0;
        for (const Stress& sigma : g.stress)
            worst = std::max(worst, (sigma - exact_stress).norm() / exact_stress.norm());
        CHECK(worst < 1e-9);
        // Reactions balance: the boundary tractions are self-equilibrated.
        CHECK(s.reactions.cwiseAbs().maxCoeff() < 1e-9 * s.applied.cwiseAbs().maxCoeff());
    }
}
