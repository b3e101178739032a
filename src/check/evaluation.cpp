// Meshing, solving and measuring one connection on one mesh.
#include "check/evaluation.hpp"

#include "analysis/analyse.hpp"
#include "check/peaks.hpp"
#include "check/reuse_cache.hpp"
#include "check/section_integral.hpp"
#include "check/section_lines.hpp"
#include "fe/point_locator.hpp"
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

std::map<std::string, double> case_factors(const model::Connection& c, size_t k) {
    if (k < c.load_cases.size()) return {{c.load_cases[k].name, 1.0}};
    return c.combinations.at(k - c.load_cases.size()).factors;
}

Evaluation evaluate(const model::Connection& c, const mesh::MeshSettings& settings,
                    ReuseCache* cache, const analysis::ContactHooks* contact) {
    Evaluation e;
    auto start = std::chrono::steady_clock::now();
    e.layout = analysis::plate_layout(c);
    e.settings = settings;
    e.element_size = mesh::detail::element_size(e.layout.region, settings);
    ReuseCache::Slot* slot = cache ? &cache->slot(e.layout.region, settings) : nullptr;
    e.mesh = slot ? slot->mesh : mesh::build_mesh(e.layout.region, settings);
    e.seconds_mesh = seconds_since(start);

    start = std::chrono::steady_clock::now();
    e.results = analysis::analyse(c, e.mesh, e.layout, slot ? &slot->solver : nullptr, contact);
    e.seconds_analysis = seconds_since(start);

    start = std::chrono::steady_clock::now();
    const analysis::FeProblem& p = e.results.problem;
    e.sections = make_section_lines(c, e.layout);
    const fe::PointLocator locator(p.model);
    e.welds = weld_lines(c);
    const auto held = held_nodes(c, e.mesh, p, e.welds);
    std::vector<const Eigen::VectorXd*> displacements;
    for (const analysis::CaseResult& r : e.results.cases) displacements.push_back(&r.u);
    // Every case's 3×3 Gauss-point stresses in one pass over the elements.
    const std::vector<fe::SampledStresses> gauss = fe::sample_stresses(p.model, displacements, 3);
    for (size_t k = 0; k < e.results.cases.size(); ++k) {
        const analysis::CaseResult& r = e.results.cases[k];
        e.peaks.push_back(find_peaks(p, e.layout, c, r, gauss[k]));
        std::vector<WeldForces> wf;
        for (size_t w = 0; w < e.welds.size(); ++w)
            wf.push_back(weld_forces(e.welds[w], e.mesh, r.dof_reactions, held[w]));
        e.weld_forces.push_back(std::move(wf));
    }
    // Each line's geometry (crossings, located points, free-body cut) once,
    // for every case; the elements' neighbours once for every line.
    e.section_stress.assign(e.results.cases.size(), {});
    const ElementNeighbours neighbours = element_neighbours(p.model);
    for (size_t s = 0; s < e.sections.size(); ++s) {
        std::vector<SectionStress> per_case = integrate_section(
            e.sections[s], p.model, locator, displacements, c.plate.thickness, &neighbours);
        for (size_t k = 0; k < per_case.size(); ++k) {
            per_case[k].section = static_cast<int>(s);
            e.section_stress[k].push_back(std::move(per_case[k]));
        }
    }
    e.seconds_measure = seconds_since(start);
    return e;
}

} // namespace lapwing::check
