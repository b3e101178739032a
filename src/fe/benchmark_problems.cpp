// Set-up of the published benchmark problems.
#include "fe/benchmark_problems.hpp"

#include "fe/linear_static.hpp"
#include "fe/structured_grid.hpp"

namespace lapwing::fe {

namespace {
// Clamps side 3 (s = 0) and loads side 1 (s = 1) with a uniform traction of
// the given resultant per unit thickness.
Solution clamp_and_load(const Model& model, const StructuredGrid& grid, const Vector2& resultant,
                        double edge_length) {
    Constraints clamp;
    for (int node : grid.side_nodes[3]) {
        clamp.prescribed.push_back({dof_ux(node), 0.0});
        clamp.prescribed.push_back({dof_uy(node), 0.0});
    }
    const double t = model.elements.front().thickness;
    const Vector2 traction = resultant / (edge_length * t);
    Loads loads;
    for (const GridEdge& e : grid.side_edges[1])
        loads.edges.push_back({e.element, e.edge, TractionFrame::global, traction, traction});
    const LinearStaticProblem problem(model, clamp);
    return problem.solve(loads);
}
} // namespace

double cook_membrane_uy(ElementKind kind, int n) {
    const auto grid =
        make_structured_grid(kind, n, n, bilinear_map({0, 0}, {48, 44}, {48, 60}, {0, 44}));
    const Model model = model_from_grid(grid, {1.0, 1.0 / 3.0}, 1.0);
    const Solution s = clamp_and_load(model, grid, {0.0, 1.0}, 16.0);
    // The loaded edge's nodes run from (48,44) to (48,60); (48,52) is the middle one.
    const auto& side = grid.side_nodes[1];
    return s.u(dof_uy(side[side.size() / 2]));
}

double macneal_harder_cantilever_tip(ElementKind kind, TipLoad load) {
    const auto grid =
        make_structured_grid(kind, 6, 1, bilinear_map({0, 0}, {6, 0}, {6, 0.2}, {0, 0.2}));
    const Model model = model_from_grid(grid, {1e7, 0.3}, 0.1);
    // A uniform traction of unit resultant: equal tip shares for 2-node edges,
    // the consistent 1/6–2/3–1/6 for 3-node ones.
    const Vector2 resultant = load == TipLoad::shear ? Vector2(0, 1) : Vector2(1, 0);
    const Solution s = clamp_and_load(model, grid, resultant, 0.2);
    const auto& tip = grid.side_nodes[1];
    double sum = 0;
    for (int node : tip) sum += load == TipLoad::shear ? s.u(dof_uy(node)) : s.u(dof_ux(node));
    return sum / static_cast<double>(tip.size()); // mean tip displacement
}

} // namespace lapwing::fe
