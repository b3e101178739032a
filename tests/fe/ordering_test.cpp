// The geometric nested-dissection ordering (fe/nested_dissection.hpp): its
// separators cut a grid in two, its factor on a structured grid is no larger
// than AMD's and within George's bound, and it changes solutions by
// round-off only (it is a permutation of the same system).
#include "fe/linear_static.hpp"
#include "fe/nested_dissection.hpp"
#include "fe/structured_grid.hpp"

#include <algorithm>
#include <cmath>
#include <doctest/doctest.h>
#include <vector>

using namespace lapwing::fe;

namespace {

// The node graph of a k × k grid of Q4 elements (k + 1 nodes a side): every
// node is joined to the nodes of the elements around it, its 8 neighbours.
struct GridGraph {
    AdjacencyGraph graph;
    std::vector<Vector2> xy;
};

GridGraph node_grid(int k) {
    GridGraph g;
    const int side = k + 1;
    g.graph.n = side * side;
    g.graph.start.push_back(0);
    for (int j = 0; j < side; ++j)
        for (int i = 0; i < side; ++i) {
            g.xy.emplace_back(i, j);
            for (int dj = -1; dj <= 1; ++dj)
                for (int di = -1; di <= 1; ++di) {
                    const int ii = i + di, jj = j + dj;
                    if ((di != 0 || dj != 0) && ii >= 0 && jj >= 0 && ii < side && jj < side)
                        g.graph.adj.push_back(jj * side + ii);
                }
            g.graph.start.push_back(static_cast<int>(g.graph.adj.size()));
        }
    return g;
}

// Sizes of the connected components left when the vertices with set ≥ s
// are taken out.
std::vector<int> components_below(const AdjacencyGraph& g, const std::vector<int>& sets, int s) {
    std::vector<int> label(static_cast<size_t>(g.n), -1), sizes, queue;
    for (int root = 0; root < g.n; ++root) {
        if (sets[static_cast<size_t>(root)] >= s || label[static_cast<size_t>(root)] >= 0) continue;
        const int c = static_cast<int>(sizes.size());
        sizes.push_back(0);
        queue = {root};
        label[static_cast<size_t>(root)] = c;
        while (!queue.empty()) {
            const int u = queue.back();
            queue.pop_back();
            ++sizes.back();
            for (int k = g.start[static_cast<size_t>(u)]; k < g.start[static_cast<size_t>(u) + 1];
                 ++k) {
                const int w = g.adj[static_cast<size_t>(k)];
                if (sets[static_cast<size_t>(w)] < s && label[static_cast<size_t>(w)] < 0)
                    label[static_cast<size_t>(w)] = c, queue.push_back(w);
            }
        }
    }
    return sizes;
}

Model square(ElementKind kind, int k) {
    const auto grid =
        make_structured_grid(kind, k, k, bilinear_map({0, 0}, {100, 0}, {100, 100}, {0, 100}));
    return model_from_grid(grid, {200000.0, 0.3}, 5.0);
}

// A k × k Q4 square on rollers along x = 0 (one pin) under uniaxial tension
// σ on x = 100: ux = σ x / E exactly for bilinear elements (a patch test).
struct PatchTest {
    Model model;
    Constraints constraints;
    Loads loads;
    double sigma;
};

PatchTest tension_patch_test(int k, double sigma) {
    PatchTest t{square(ElementKind::Q4, k), {}, {}, sigma};
    for (int i = 0; i < t.model.n_nodes(); ++i)
        if (t.model.nodes[static_cast<size_t>(i)].x() == 0.0) {
            t.constraints.prescribed.push_back({dof_ux(i), 0});
            if (t.model.nodes[static_cast<size_t>(i)].y() == 0.0)
                t.constraints.prescribed.push_back({dof_uy(i), 0});
        }
    const auto grid = make_structured_grid(ElementKind::Q4, k, k,
                                           bilinear_map({0, 0}, {100, 0}, {100, 100}, {0, 100}));
    for (const auto& e : grid.side_edges[1])
        t.loads.edges.push_back({e.element, e.edge, TractionFrame::global, {sigma, 0}, {sigma, 0}});
    return t;
}

// The patch test's exact answer, ux = σ x / E at every node, to round-off.
void check_exact_tension(const PatchTest& t, const Eigen::VectorXd& u) {
    for (int i = 0; i < t.model.n_nodes(); ++i) {
        const double expected = t.sigma * t.model.nodes[static_cast<size_t>(i)].x() / 200000.0;
        CHECK(std::abs(u(dof_ux(i)) - expected) <= 1e-10 * t.sigma * 100 / 200000.0);
    }
}

// George (1973), SIAM J. Numer. Anal. 10(2): nested dissection of the
// k × k 9-point grid gives (31/4) k² log₂ k + O(k²) factor entries. With two
// unknowns a node, each is a 2 × 2 block: at most 4 · 31/4 = 31 k² log₂ k,
// k the nodes a side (the O(k²) term is negative here).
double george_bound(int elements_a_side) {
    const double nodes_a_side = elements_a_side + 1;
    return 31 * nodes_a_side * nodes_a_side * std::log2(nodes_a_side);
}

} // namespace

TEST_CASE("coordinate dissection: the top separator is the middle grid line and halves the grid") {
    // George (1973): on a grid the first separator is one grid line of k + 1
    // nodes, and taking it out leaves two halves of k/2 · (k + 1) nodes.
    const int k = 32;
    const GridGraph g = node_grid(k);
    const std::vector<int> sets = coordinate_dissection_sets(g.graph, g.xy, 16);
    const int top = *std::max_element(sets.begin(), sets.end());
    REQUIRE(top >= 2);
    std::vector<Vector2> line;
    for (int u = 0; u < g.graph.n; ++u)
        if (sets[static_cast<size_t>(u)] == top) line.push_back(g.xy[static_cast<size_t>(u)]);
    CHECK(line.size() == static_cast<size_t>(k + 1));
    const bool on_x = std::all_of(line.begin(), line.end(),
                                  [&](const Vector2& p) { return p.x() == line.front().x(); });
    const bool on_y = std::all_of(line.begin(), line.end(),
                                  [&](const Vector2& p) { return p.y() == line.front().y(); });
    CHECK((on_x || on_y));
    std::vector<int> halves = components_below(g.graph, sets, top);
    std::sort(halves.begin(), halves.end());
    CHECK(halves == std::vector<int>{k / 2 * (k + 1), k / 2 * (k + 1)});
    // With every separator out, the parts left (set 0) are at most the leaf
    // size: each larger part was cut again.
    for (const int size : components_below(g.graph, sets, 1)) CHECK(size <= 16);
}

TEST_CASE("nested dissection on a k × k Q4 grid: nnz(L) no worse than AMD and under George's "
          "bound; the same solution to round-off") {
    // George's bound: george_bound above.
    const int k = 120;
    const PatchTest t = tension_patch_test(k, 50.0);
    const Model& m = t.model;
    const Constraints& c = t.constraints;

    SolverOptions amd, nd;
    amd.ordering = Ordering::amd;
    nd.ordering = Ordering::nested_dissection;
    const LinearStaticProblem pa(m, c, amd), pn(m, c, nd);
    CHECK(pn.stats().factor.ordering == "nested dissection on nodes");
    CHECK(pn.stats().factor.nnz_L <= pa.stats().factor.nnz_L);
    CHECK(pn.stats().factor.nnz_L <= george_bound(k));

    const Solution sa = pa.solve(t.loads), sn = pn.solve(t.loads);
    CHECK((sn.u - sa.u).norm() <= 1e-10 * sa.u.norm());
    check_exact_tension(t, sn.u);
}

TEST_CASE("nested dissection on a Q8 mesh matches AMD; without positions it falls back to AMD "
          "on nodes") {
    const Model m = square(ElementKind::Q8, 20);
    Constraints c;
    for (int i = 0; i < m.n_nodes(); ++i)
        if (m.nodes[static_cast<size_t>(i)].x() == 0.0)
            c.prescribed.push_back({dof_ux(i), 0}), c.prescribed.push_back({dof_uy(i), 0});
    Loads loads;
    for (int i = 0; i < m.n_nodes(); ++i)
        if (m.nodes[static_cast<size_t>(i)].x() == 100.0) loads.nodal.push_back({dof_uy(i), -1.0});
    SolverOptions amd, nd;
    amd.ordering = Ordering::amd;
    nd.ordering = Ordering::nested_dissection;
    const LinearStaticProblem pa(m, c, amd), pn(m, c, nd);
    const Solution sa = pa.solve(loads), sn = pn.solve(loads);
    CHECK((sn.u - sa.u).norm() <= 1e-10 * sa.u.norm());

    // The same pattern without positions: node AMD, same solution.
    const DofMap map(m.n_dofs(), c);
    Assembler assembler(m, map);
    SparsePattern bare = assembler.pattern();
    bare.position.clear();
    std::vector<double> values;
    Eigen::VectorXd prescribed;
    assembler.assemble(m, values, prescribed);
    const Eigen::VectorXd b = map.restrict_to_unknowns(applied_forces(m, loads)) + prescribed;
    auto with = make_sparse_cholesky(nd), without = make_sparse_cholesky(nd);
    with->analyse(assembler.pattern());
    without->analyse(bare);
    with->factorize(assembler.pattern(), values);
    without->factorize(bare, values);
    CHECK(with->stats().ordering == "nested dissection on nodes");
    CHECK(without->stats().ordering == "AMD on nodes");
    const Eigen::VectorXd x1 = with->solve(b), x2 = without->solve(b);
    CHECK((x1 - x2).norm() <= 1e-10 * x2.norm());
}

TEST_CASE("METIS on the node graph: the same solution as AMD, fill under George's bound; "
          "node_best keeps AMD where its fill is not poor") {
    // The same grid and patch test as above (George 1973 for the bound).
    const int k = 120;
    const PatchTest t = tension_patch_test(k, 50.0);
    const Model& m = t.model;
    const Constraints& c = t.constraints;

    SolverOptions amd, node_amd, metis, best;
    amd.ordering = Ordering::amd;
    node_amd.ordering = Ordering::node_amd;
    metis.ordering = Ordering::node_metis;
    best.ordering = Ordering::node_best;
    const LinearStaticProblem pa(m, c, amd), pna(m, c, node_amd), pm(m, c, metis), pb(m, c, best);
    CHECK(pm.stats().factor.ordering == "METIS on nodes");
    CHECK(pm.stats().factor.nnz_L <= george_bound(k));
    MESSAGE("nnz(L): AMD " << pa.stats().factor.nnz_L << ", METIS on nodes "
                           << pm.stats().factor.nnz_L);

    const Solution sa = pa.solve(t.loads), sm = pm.solve(t.loads);
    CHECK((sm.u - sa.u).norm() <= 1e-10 * sa.u.norm());
    check_exact_tension(t, sm.u);

    // CHOLMOD's poor-fill test (flops ≥ 500 nnz(L)) fails on so small a
    // grid (flops / nnz(L) is a few tens here): node_best is AMD on nodes.
    CHECK(pna.stats().factor.flops < 500 * pna.stats().factor.nnz_L);
    CHECK(pb.stats().factor.ordering == "AMD on nodes");
    CHECK(pb.stats().factor.nnz_L == pna.stats().factor.nnz_L);
}

TEST_CASE("adaptive ordering: exactly AMD where AMD's fill is not poor; where the threshold "
          "says it is, the ordering with fewer flops of AMD and METIS on the nodes") {
    // The 120 × 120 patch test of the cases above: flops / nnz(L) is a few
    // tens, under CHOLMOD's 500 (cholmod_analyze's default strategy).
    const int k = 120;
    const PatchTest t = tension_patch_test(k, 50.0);
    SolverOptions amd, adaptive, eager, metis;
    amd.ordering = Ordering::amd;
    adaptive.ordering = Ordering::adaptive;
    CHECK(SolverOptions{}.ordering == Ordering::adaptive); // lapwing's default
    metis.ordering = Ordering::node_metis;
    eager.ordering = Ordering::adaptive;
    eager.poor_fill_flops_per_entry = 1; // every fill counts as poor: METIS is tried
    const LinearStaticProblem pa(t.model, t.constraints, amd), pd(t.model, t.constraints, adaptive),
        pe(t.model, t.constraints, eager), pm(t.model, t.constraints, metis);
    const FactorStats& fa = pa.stats().factor;
    const FactorStats& fd = pd.stats().factor;
    CHECK(fd.ordering == "AMD");
    CHECK(fd.nnz_L == fa.nnz_L);
    CHECK(fd.flops == fa.flops);
    const Solution sa = pa.solve(t.loads), sd = pd.solve(t.loads);
    CHECK(sd.u == sa.u); // the same ordering: the same arithmetic, bit for bit

    const FactorStats& fe_ = pe.stats().factor;
    const FactorStats& fm = pm.stats().factor;
    const bool metis_fewer = fm.flops < fa.flops;
    CHECK(fe_.ordering ==
          (metis_fewer ? "METIS on nodes (AMD's fill poor)" : "AMD (METIS on nodes tried)"));
    CHECK(fe_.flops == std::min(fa.flops, fm.flops));
    CHECK(fe_.nnz_L == (metis_fewer ? fm.nnz_L : fa.nnz_L));
    const Solution se = pe.solve(t.loads);
    CHECK((se.u - sa.u).norm() <= 1e-10 * sa.u.norm());
    check_exact_tension(t, se.u);
}
