// Changing link-spring stiffness on a factored problem by modifying the
// factor (LinearStaticProblem::update_link_springs): the answers equal the
// springs-in-parallel formula and a fresh factorization of the changed
// model, and a change that leaves a mechanism is still reported in words.
#include "core/error.hpp"
#include "fe/linear_static.hpp"
#include "fe/structured_grid.hpp"
#include "support/approx.hpp"

#include <doctest/doctest.h>

using namespace lapwing::fe;

namespace {

// Node 0 held to the pinned node 1 by three springs along x and one along y.
Model parallel_springs(double k1, double k2, double k3, double k4) {
    Model m;
    m.nodes = {Vector2(0, 0), Vector2(10, 0)};
    m.link_springs = {{0, 1, Vector2(1, 0), k1},
                      {0, 1, Vector2(1, 0), k2},
                      {0, 1, Vector2(1, 0), k3},
                      {0, 1, Vector2(0, 1), k4}};
    return m;
}

Constraints pinned() {
    Constraints c;
    c.prescribed = {{dof_ux(1), 0}, {dof_uy(1), 0}};
    return c;
}

// A 20 × 4 strip of Q4 on [0,100]×[0,20], left end fixed, and a "bolt" node
// at (90, 10) tied to every node of the right half by a link spring along
// the line between them, loaded at the bolt.
struct StripWithBolt {
    Model model;
    Constraints constraints;
    int bolt = -1;
    StripWithBolt() {
        const auto grid = make_structured_grid(ElementKind::Q4, 20, 4,
                                               bilinear_map({0, 0}, {100, 0}, {100, 20}, {0, 20}));
        model = model_from_grid(grid, {200000.0, 0.3}, 5.0);
        for (int node : grid.side_nodes[3])
            constraints.prescribed.push_back({dof_ux(node), 0}),
                constraints.prescribed.push_back({dof_uy(node), 0});
        const int n_plate = model.n_nodes();
        bolt = n_plate;
        model.nodes.push_back(Vector2(90.5, 10.5));
        for (int node = 0; node < n_plate; ++node) {
            const Vector2 d = model.nodes[static_cast<size_t>(node)] - model.nodes.back();
            if (model.nodes[static_cast<size_t>(node)].x() > 50)
                model.link_springs.push_back({bolt, node, d.normalized(), 1e5});
        }
    }
    Loads load() const {
        Loads l;
        l.nodal = {{dof_ux(bolt), 1000.0}, {dof_uy(bolt), -400.0}};
        return l;
    }
};

} // namespace

TEST_CASE("switching parallel springs by modifying the factor gives u = F / Σk") {
    // Springs in parallel add (elementary statics): u_x = F / (sum of the x
    // springs switched on), u_y = G / k4.
    const double k1 = 300, k2 = 500, k3 = 700, k4 = 1100, F = 7, G = -2;
    Model m = parallel_springs(k1, k2, k3, k4);
    LinearStaticProblem problem(m, pinned());
    Loads loads;
    loads.nodal = {{dof_ux(0), F}, {dof_uy(0), G}};
    CHECK(problem.solve(loads).u(0) == lapwing::test::approx(F / (k1 + k2 + k3), 1e-12));

    m.link_springs[1].k = 0; // a downdate
    CHECK(problem.update_link_springs(m));
    Solution s = problem.solve(loads);
    CHECK(s.u(0) == lapwing::test::approx(F / (k1 + k3), 1e-12));
    CHECK(s.u(1) == lapwing::test::approx(G / k4, 1e-12));
    CHECK(s.relative_residual < 1e-12);

    m.link_springs[1].k = k2; // an update and a downdate at once
    m.link_springs[2].k = 0;
    CHECK(problem.update_link_springs(m));
    s = problem.solve(loads);
    CHECK(s.u(0) == lapwing::test::approx(F / (k1 + k2), 1e-12));
    CHECK(problem.displacements(loads)(0) == lapwing::test::approx(F / (k1 + k2), 1e-12));

    // Nothing changed: nothing to do, the factor stands.
    CHECK(problem.update_link_springs(m));
    CHECK(problem.solve(loads).u(0) == lapwing::test::approx(F / (k1 + k2), 1e-12));

    // A later refactorization (new stiffness everywhere) starts afresh.
    m.link_springs[0].k = 2 * k1;
    problem.refactorize(m);
    CHECK(problem.solve(loads).u(0) == lapwing::test::approx(F / (2 * k1 + k2), 1e-12));
}

TEST_CASE("a modified factor of a plate with contact springs agrees with a fresh factorization") {
    StripWithBolt p;
    Model working = p.model;
    LinearStaticProblem problem(working, p.constraints);
    // Switch off every other spring, as a contact pass does.
    for (size_t j = 0; j < working.link_springs.size(); j += 2) working.link_springs[j].k = 0;
    CHECK(problem.update_link_springs(working));
    const Solution updated = problem.solve(p.load());

    const LinearStaticProblem fresh(working, p.constraints);
    const Solution reference = fresh.solve(p.load());
    const double scale = reference.u.cwiseAbs().maxCoeff();
    CHECK(scale > 0);
    CHECK((updated.u - reference.u).cwiseAbs().maxCoeff() < 1e-10 * scale);
    CHECK(updated.relative_residual < 1e-10);
    // Equilibrium (statics): the support reactions balance the bolt load.
    double rx = 0, ry = 0;
    for (const auto& d : p.constraints.prescribed)
        (d.dof % 2 == 0 ? rx : ry) += updated.reactions(d.dof);
    CHECK(rx == lapwing::test::approx(-1000.0, 1e-9));
    CHECK(ry == lapwing::test::approx(400.0, 1e-9));

    // A contact pass's own unknowns make the same solution without solving
    // again (solution_of): the same numbers, since it is the same solve.
    const Solution from_pass = problem.solution_of(p.load(), problem.unknowns(p.load()));
    CHECK((from_pass.u - updated.u).cwiseAbs().maxCoeff() == 0.0);
    CHECK((from_pass.reactions - updated.reactions).cwiseAbs().maxCoeff() == 0.0);
    CHECK(from_pass.relative_residual == updated.relative_residual);
    CHECK(problem.dof_map().expand(problem.unknowns(p.load())) == problem.displacements(p.load()));
}

TEST_CASE("a rank above the limit refactorizes instead, with the same answer") {
    StripWithBolt p;
    Model working = p.model;
    LinearStaticProblem problem(working, p.constraints);
    for (size_t j = 1; j < working.link_springs.size(); j += 2) working.link_springs[j].k = 0;
    CHECK_FALSE(problem.update_link_springs(working, 2));
    const LinearStaticProblem fresh(working, p.constraints);
    const double scale = fresh.solve(p.load()).u.cwiseAbs().maxCoeff();
    CHECK((problem.solve(p.load()).u - fresh.solve(p.load()).u).cwiseAbs().maxCoeff() <
          1e-12 * scale);
}

TEST_CASE("removing the only spring that holds a direction is reported as a mechanism") {
    Model m = parallel_springs(300, 500, 700, 1100);
    LinearStaticProblem problem(m, pinned());
    m.link_springs[3].k = 0; // nothing holds uy now
    CHECK_THROWS_AS(problem.update_link_springs(m), lapwing::AnalysisError);
}

TEST_CASE("the Eigen back end refactorizes instead, with the same answer") {
    const double k1 = 300, k2 = 500, k3 = 700, k4 = 1100;
    Model m = parallel_springs(k1, k2, k3, k4);
    SolverOptions options;
    options.backend = SolverBackend::eigen_ldlt;
    LinearStaticProblem problem(m, pinned(), options);
    m.link_springs[0].k = 0;
    CHECK_FALSE(problem.update_link_springs(m));
    Loads loads;
    loads.nodal = {{dof_ux(0), 7.0}};
    CHECK(problem.solve(loads).u(0) == lapwing::test::approx(7.0 / (k2 + k3), 1e-12));
}

TEST_CASE("link-spring stiffness set late, once the pattern exists, gives the same factor "
          "bit for bit as when set first") {
    // The stiffness a contact start set gives, set before the constructor
    // and set from its before_values callback: the same model, so the same
    // numbers to the last bit (the link springs are assembled last either
    // way). Springs in parallel check the value itself: u = F / Σk.
    const double k1 = 300, k2 = 500, k3 = 700, k4 = 1100, F = 7;
    Loads loads;
    loads.nodal = {{dof_ux(0), F}};
    Model late = parallel_springs(k1, k2, k3, k4);
    int calls = 0;
    const LinearStaticProblem problem(late, pinned(), {}, [&] {
        ++calls;
        late.link_springs[1].k = 0;
    });
    CHECK(calls == 1);
    CHECK(problem.solve(loads).u(0) == lapwing::test::approx(F / (k1 + k3), 1e-12));

    StripWithBolt p;
    Model early = p.model, working = p.model;
    for (size_t j = 0; j < early.link_springs.size(); j += 3) early.link_springs[j].k = 0;
    const LinearStaticProblem reference(early, p.constraints);
    const LinearStaticProblem seeded(working, p.constraints, {},
                                     [&] { working.link_springs = early.link_springs; });
    const Solution a = reference.solve(p.load()), b = seeded.solve(p.load());
    CHECK((a.u - b.u).cwiseAbs().maxCoeff() == 0.0);
    CHECK((a.reactions - b.reactions).cwiseAbs().maxCoeff() == 0.0);
    CHECK(b.relative_residual < 1e-10);
}
