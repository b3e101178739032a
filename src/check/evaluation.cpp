// Meshing, solving and measuring one connection on one mesh.
#include "check/evaluation.hpp"

#include "analysis/analyse.hpp"
#include "check/peaks.hpp"
#include "mesh/size_field.hpp"

#include <algorithm>
#include <chrono>
#include <set>

namespace lapwing::check {

namespace {

double seconds_since(std::chrono::steady_clock::time_point start) {
    return std::chrono::duration<double>(std::chrono::steady_clock::now() - start).count();
}

// Which plate nodes each weld line counts: those its support (or member)
// holds, each node once, to the first line that holds it.
std::vector<std::vector<int>> held_nodes(const model::Connection& c, const mesh::Mesh& mesh,
                                         const analysis::FeProblem& p,
                                         const std::vector<WeldLine>& lines) {
    std::set<int> claimed;
    std::vector<std::vector<int>> out;
    for (const WeldLine& w : lines) {
        std::vector<int> held;
        const std::vector<int> on_edge =
            mesh.nodes_on(geometry::BoundaryKind::outline_edge, w.edge);
        std::set<int> holder;
        if (w.support >= 0) {
            const auto& nodes = p.supports[static_cast<size_t>(w.support)].nodes;
            holder.insert(nodes.begin(), nodes.end());
        } else {
            holder.insert(on_edge.begin(), on_edge.end());
        }
        for (int n : on_edge)
            if (holder.count(n) && claimed.insert(n).second) held.push_back(n);
        std::sort(held.begin(), held.end());
        out.push_back(std::move(held));
    }
    (void)c;
    return out;
}

} // namespace

Evaluation evaluate(const model::Connection& c, const mesh::MeshSettings& settings) {
    Evaluation e;
    auto start = std::chrono::steady_clock::now();
    e.layout = analysis::plate_layout(c);
    e.settings = settings;
    e.element_size = mesh::detail::element_size(e.layout.region, settings);
    e.mesh = mesh::build_mesh(e.layout.region, settings);
    e.seconds_mesh = seconds_since(start);

    start = std::chrono::steady_clock::now();
    e.results = analysis::analyse(c, e.mesh, e.layout);
    e.seconds_analysis = seconds_since(start);

    start = std::chrono::steady_clock::now();
    const analysis::FeProblem& p = e.results.problem;
    e.welds = weld_lines(c);
    const auto held = held_nodes(c, e.mesh, p, e.welds);
    for (const analysis::CaseResult& r : e.results.cases) {
        e.peaks.push_back(find_peaks(p, e.layout, c, r));
        std::vector<WeldForces> wf;
        for (size_t w = 0; w < e.welds.size(); ++w)
            wf.push_back(weld_forces(e.welds[w], e.mesh, r.dof_reactions, held[w]));
        e.weld_forces.push_back(std::move(wf));
        e.section_stress.emplace_back();
    }
    e.seconds_measure = seconds_since(start);
    return e;
}

} // namespace lapwing::check
