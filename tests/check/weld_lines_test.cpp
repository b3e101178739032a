// Weld force per length recovered from nodal forces along a welded edge.
#include "check/weld_lines.hpp"
#include "fe/edge_load.hpp"
#include "mesh/mesh.hpp"
#include "support/approx.hpp"

#include <doctest/doctest.h>

using namespace lapwing;
using lapwing::test::approx;

namespace {

fe::Model model_of(const mesh::Mesh& m, double thickness) {
    fe::Model model;
    model.nodes = m.nodes;
    model.materials = {{200000.0, 0.3}};
    const int n = fe::node_count(m.kind);
    for (int e = 0; e < m.n_elements(); ++e) {
        fe::Element el;
        el.kind = m.kind;
        el.thickness = thickness;
        for (int a = 0; a < n; ++a)
            el.nodes[static_cast<size_t>(a)] = m.element(e)[static_cast<size_t>(a)];
        model.elements.push_back(el);
    }
    return model;
}

} // namespace

// Source: consistent nodal forces f_a = ∫ N_a t ds (Zienkiewicz, Taylor & Zhu
// 2013, §6.6) computed by the FE core's edge-load code; inverting the edge's
// ∫ N_a N_b ds system must give back any traction the edge shape functions
// represent, here a linear one, to round-off.
TEST_CASE("weld force per length: a linear traction comes back exactly from its nodal forces") {
    for (const fe::ElementKind kind : {fe::ElementKind::Q4, fe::ElementKind::Q8}) {
        CAPTURE(fe::name(kind));
        geometry::PlateRegion region;
        region.outline = {{{0, 0}}, {{200, 0}}, {{200, 100}}, {{0, 100}}};
        mesh::MeshSettings settings;
        settings.kind = kind;
        settings.element_size = 17;
        const mesh::Mesh m = mesh::build_mesh(region, settings);
        const double t = 12;
        const fe::Model model = model_of(m, t);
        // Traction on edge 0 (y = 0, x from 0 to 200): (3 + 0.01 x, −2 + 0.02 x) MPa.
        const auto traction = [](double x) { return Eigen::Vector2d(3 + 0.01 * x, -2 + 0.02 * x); };
        Eigen::VectorXd f = Eigen::VectorXd::Zero(model.n_dofs());
        std::vector<int> held;
        for (const mesh::BoundaryEdge& b : m.boundary_edges) {
            if (b.tag.kind != geometry::BoundaryKind::outline_edge || b.tag.index != 0) continue;
            const int first = b.nodes[0];
            const int last = fe::is_quadratic(kind) ? b.nodes[2] : b.nodes[1];
            fe::EdgeLoad load;
            load.element = b.element;
            load.edge = b.local_edge;
            load.at_start = traction(m.nodes[static_cast<size_t>(first)].x());
            load.at_end = traction(m.nodes[static_cast<size_t>(last)].x());
            for (const auto& [dof, value] : fe::edge_load_forces(model, load)) {
                f(dof) += value;
                held.push_back(dof / 2);
            }
        }
        std::sort(held.begin(), held.end());
        held.erase(std::unique(held.begin(), held.end()), held.end());

        check::WeldLine line;
        line.edge = 0;
        line.from = {0, 0};
        line.to = {200, 0};
        const check::WeldForces w = check::weld_forces(line, m, f, held);
        REQUIRE(w.profile.size() == held.size());
        // Compared against the largest traction (t·|(5, 2)|) as the scale, since
        // one component passes through zero.
        const double scale = t * std::hypot(5.0, 2.0);
        for (const check::WeldPoint& p : w.profile)
            CHECK((p.q - t * traction(p.s)).norm() < 1e-9 * scale);
        // Resultant: t ∫ (3 + 0.01x, −2 + 0.02x) dx over [0, 200] = t (800, 0).
        CHECK(w.resultant.x() == approx(t * 800, 1e-12));
        CHECK(std::abs(w.resultant.y()) < 1e-9 * t * 800);
        CHECK(w.average == approx(t * 800 / 200, 1e-12));
        // The largest |q| is at x = 200: t·|(5, 2)|.
        CHECK(w.peak == approx(t * std::hypot(5.0, 2.0), 1e-9));
    }
}
