// The linear static problem end to end on small models: both factorization
// back ends agree, load cases share one factorization, reactions balance the
// loads, and unsupported models are reported in words.
#include "core/error.hpp"
#include "fe/linear_static.hpp"
#include "fe/structured_grid.hpp"
#include "support/approx.hpp"

#include <Eigen/LU>
#include <doctest/doctest.h>

using namespace lapwing::fe;

namespace {

// A 10 × 2 strip of Q4 on [0,100]×[0,20], t = 5, E = 200 000, ν = 0.3.
Model strip(ElementKind kind = ElementKind::Q4) {
    const auto grid =
        make_structured_grid(kind, 10, 2, bilinear_map({0, 0}, {100, 0}, {100, 20}, {0, 20}));
    return model_from_grid(grid, {200000.0, 0.3}, 5.0);
}

// Left end fixed; a total force along x spread over the right end by an edge traction.
struct Cantilever {
    Model model = strip();
    StructuredGrid grid = make_structured_grid(ElementKind::Q4, 10, 2,
                                               bilinear_map({0, 0}, {100, 0}, {100, 20}, {0, 20}));
    Constraints constraints() const {
        Constraints c;
        for (int node : grid.side_nodes[3])
            c.prescribed.push_back({dof_ux(node), 0}), c.prescribed.push_back({dof_uy(node), 0});
        return c;
    }
    Loads traction(Vector2 t) const {
        Loads l;
        for (const auto& e : grid.side_edges[1])
            l.edges.push_back({e.element, e.edge, TractionFrame::global, t, t});
        return l;
    }
};

} // namespace

TEST_CASE("a uniform end traction on a bar gives uniform stretch PL/(EA) and balanced reactions") {
    // Uniaxial stress σ = 10 MPa in a bar free to contract laterally: one
    // corner pinned, the left end on rollers (elementary; Timoshenko & Goodier §3).
    Cantilever c;
    Constraints k;
    for (int node : c.grid.side_nodes[3]) k.prescribed.push_back({dof_ux(node), 0});
    k.prescribed.push_back({dof_uy(c.grid.side_nodes[3][0]), 0});
    const LinearStaticProblem problem(c.model, k);
    const Solution s = problem.solve(c.traction({10.0, 0.0}));
    const double expected = 10.0 * 100.0 / 200000.0; // σ L / E
    for (int node : c.grid.side_nodes[1])
        CHECK(s.u(dof_ux(node)) == lapwing::test::approx(expected, 1e-12));
    CHECK(s.relative_residual < 1e-12);
    const double total_reaction = [&] {
        double r = 0;
        for (int node : c.grid.side_nodes[3]) r += s.reactions(dof_ux(node));
        return r;
    }();
    CHECK(total_reaction == lapwing::test::approx(-10.0 * 20.0 * 5.0, 1e-12));
}

TEST_CASE("CHOLMOD and Eigen's LDLT give the same displacements; many load cases share one "
          "factorization") {
    Cantilever c;
    SolverOptions eigen;
    eigen.backend = SolverBackend::eigen_ldlt;
    const LinearStaticProblem a(c.model, c.constraints());
    const LinearStaticProblem b(c.model, c.constraints(), eigen);
    const std::vector<Loads> cases = {c.traction({1.0, 0.0}), c.traction({0.0, 1.0}),
                                      c.traction({2.0, -3.0})};
    const auto sa = a.solve(cases);
    const auto sb = b.solve(cases);
    for (int i = 0; i < 3; ++i) {
        CHECK((sa[i].u - sb[i].u).norm() <= 1e-10 * sa[i].u.norm());
        CHECK(sa[i].relative_residual < 1e-12);
    }
    // Linearity: case 3 = 2·case 1 − 3·case 2.
    CHECK((sa[2].u - (2 * sa[0].u - 3 * sa[1].u)).norm() <= 1e-12 * sa[2].u.norm());
}

TEST_CASE("refactorizing with a new thickness reuses the pattern and scales the answer") {
    Cantilever c;
    const LinearStaticProblem fixed_problem(c.model, c.constraints());
    Model thicker = c.model;
    for (Element& el : thicker.elements) el.thickness = 10.0;
    LinearStaticProblem problem(c.model, c.constraints());
    const Solution before = problem.solve(c.traction({0, 1.0}));
    problem.refactorize(thicker);
    // Same traction on a plate twice as thick: twice the force, twice the stiffness.
    const Solution after = problem.solve(c.traction({0, 1.0}));
    CHECK((after.u - before.u).norm() <= 1e-12 * before.u.norm());

    // The first assembly finds each position in the pattern, later ones use
    // the positions stored by the second: the same values, to the last bit.
    problem.refactorize(c.model);
    const Solution again = problem.solve(c.traction({0, 1.0}));
    CHECK((again.u - before.u).cwiseAbs().maxCoeff() == 0.0);
    CHECK((again.reactions - before.reactions).cwiseAbs().maxCoeff() == 0.0);
}

TEST_CASE("an unsupported model is reported as free to translate and rotate, not as NaN") {
    Cantilever c;
    CHECK_THROWS_WITH_AS(
        LinearStaticProblem(c.model, Constraints{}),
        doctest::Contains("not restrained against rigid-body motion: it has no supports at all"),
        lapwing::AnalysisError);
}

TEST_CASE("a single pinned node leaves the rotation about that node free") {
    Cantilever c;
    Constraints k;
    const int node = c.grid.side_nodes[3][0]; // (0, 0)
    k.prescribed = {{dof_ux(node), 0}, {dof_uy(node), 0}};
    CHECK_THROWS_WITH_AS(LinearStaticProblem(c.model, k),
                         doctest::Contains("free to rotate about (0, 0)"), lapwing::AnalysisError);
}

TEST_CASE("rollers in one direction only leave the other translation free") {
    Cantilever c;
    Constraints k;
    for (int node : c.grid.side_nodes[3]) k.prescribed.push_back({dof_ux(node), 0});
    CHECK_THROWS_WITH_AS(LinearStaticProblem(c.model, k),
                         doctest::Contains("free to translate along (0.000, 1.000)"),
                         lapwing::AnalysisError);
}

TEST_CASE("a part that is not connected to the supports is a mechanism, named at a node") {
    Cantilever c;
    // A second, separate element floating beside the strip.
    Model m = c.model;
    const int base = m.n_nodes();
    for (const Vector2& x : {Vector2(200, 0), Vector2(210, 0), Vector2(210, 10), Vector2(200, 10)})
        m.nodes.push_back(x);
    Element el;
    el.kind = ElementKind::Q4;
    el.nodes = {base, base + 1, base + 2, base + 3};
    el.thickness = 5;
    m.elements.push_back(el);
    CHECK_THROWS_WITH_AS(LinearStaticProblem(m, c.constraints()), doctest::Contains("singular"),
                         lapwing::AnalysisError);
}

TEST_CASE("springs to ground restrain a model and carry its reaction") {
    Cantilever c;
    Model m = c.model;
    // Ground springs at the left end instead of fixed supports.
    for (int node : c.grid.side_nodes[3]) {
        m.springs.push_back({dof_ux(node), -1, 1e6});
        m.springs.push_back({dof_uy(node), -1, 1e6});
    }
    const LinearStaticProblem problem(m, Constraints{});
    const Solution s = problem.solve(c.traction({3.0, 0.0}));
    // The ground springs carry the whole end load 3 MPa · 20 mm · 5 mm = 300 N.
    double ground = 0;
    for (const Spring& sp : m.springs)
        if (sp.dof_a % 2 == 0) ground += sp.k * s.u(sp.dof_a);
    CHECK(ground == lapwing::test::approx(300.0, 1e-9));
    // No dof is constrained, so K u − f vanishes everywhere.
    CHECK(s.reactions.cwiseAbs().maxCoeff() < 1e-9 * 300.0);
}

TEST_CASE("link springs act along their direction only, to the ground and between nodes") {
    // Node 0 held by a spring k1 along x to the ground and a spring k2 along
    // 45° to node 1, which is pinned; a force F at node 0. Exact answer from
    // the 2×2 system (k1 e_x e_xᵀ + k2 n nᵀ) u = F (elementary statics).
    Model m;
    m.nodes = {Vector2(0, 0), Vector2(5, 5)};
    const double k1 = 300, k2 = 500;
    const Vector2 n = Vector2(1, 1).normalized();
    m.link_springs = {{0, -1, Vector2(1, 0), k1}, {0, 1, n, k2}};
    Constraints c;
    c.prescribed = {{dof_ux(1), 0}, {dof_uy(1), 0}};
    const LinearStaticProblem problem(m, c);
    Loads loads;
    loads.nodal = {{dof_ux(0), 7.0}, {dof_uy(0), -2.0}};
    const Solution s = problem.solve(loads);
    Eigen::Matrix2d K = k1 * Vector2(1, 0) * Vector2(1, 0).transpose() + k2 * n * n.transpose();
    const Vector2 exact = K.inverse() * Vector2(7.0, -2.0);
    CHECK(s.u(0) == lapwing::test::approx(exact.x(), 1e-12));
    CHECK(s.u(1) == lapwing::test::approx(exact.y(), 1e-12));
    // The pinned node carries the 45° spring's force, along n.
    const double tension = k2 * (Vector2(0, 0) - Vector2(s.u(0), s.u(1))).dot(n);
    CHECK(s.reactions(dof_ux(1)) == lapwing::test::approx(tension * n.x(), 1e-12));
    // A spring switched off (k = 0) keeps the pattern but leaves x free here.
    Model off = m;
    off.link_springs[0].k = 0;
    CHECK_THROWS_AS(LinearStaticProblem(off, c), lapwing::AnalysisError);
}
