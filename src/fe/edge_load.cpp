// Edge tractions to nodal forces. The element's shape functions restricted to
// an edge are the 1-D Lagrange functions of the edge's 2 or 3 nodes, so the
// edge is integrated on its own.
#include "fe/edge_load.hpp"

#include "fe/quadrature.hpp"

#include <array>

namespace lapwing::fe {

namespace {

// ∫ N_a t(x, n) · thickness · |dx/ds| ds over one edge by 5 Gauss points.
std::vector<std::pair<int, double>>
integrate_edge(const Model& model, int element, int edge,
               const std::function<Vector2(double s, const Vector2& x, const Vector2& normal,
                                           const Vector2& tangent)>& traction) {
    const Element& el = model.elements[static_cast<size_t>(element)];
    const auto local = edge_nodes(el.kind, edge);
    const int n = edge_node_count(el.kind);
    std::array<int, 3> node{};
    std::array<Vector2, 3> x{};
    for (int i = 0; i < n; ++i) {
        node[static_cast<size_t>(i)] = el.nodes[static_cast<size_t>(local[static_cast<size_t>(i)])];
        x[static_cast<size_t>(i)] = model.nodes[static_cast<size_t>(node[static_cast<size_t>(i)])];
    }
    std::array<Vector2, 3> f{Vector2::Zero(), Vector2::Zero(), Vector2::Zero()};
    const LineRule& rule = gauss_legendre(5);
    for (int q = 0; q < rule.n; ++q) {
        const double s = rule.x[static_cast<size_t>(q)];
        std::array<double, 3> N{}, dN{};
        if (n == 2) {
            N = {0.5 * (1 - s), 0.5 * (1 + s), 0};
            dN = {-0.5, 0.5, 0};
        } else { // nodes in order start, middle, end
            N = {0.5 * s * (s - 1), 1 - s * s, 0.5 * s * (s + 1)};
            dN = {s - 0.5, -2 * s, s + 0.5};
        }
        Vector2 point(0, 0), dx_ds(0, 0);
        for (int i = 0; i < n; ++i) {
            point += N[static_cast<size_t>(i)] * x[static_cast<size_t>(i)];
            dx_ds += dN[static_cast<size_t>(i)] * x[static_cast<size_t>(i)];
        }
        const double length_scale = dx_ds.norm();
        const Vector2 tangent = dx_ds / length_scale;
        const Vector2 normal(tangent.y(), -tangent.x()); // outward for a counter-clockwise element
        const Vector2 t = traction(s, point, normal, tangent);
        const double w = rule.w[static_cast<size_t>(q)] * length_scale * el.thickness;
        for (int i = 0; i < n; ++i) f[static_cast<size_t>(i)] += N[static_cast<size_t>(i)] * w * t;
    }
    std::vector<std::pair<int, double>> out;
    for (int i = 0; i < n; ++i) {
        out.emplace_back(dof_ux(node[static_cast<size_t>(i)]), f[static_cast<size_t>(i)].x());
        out.emplace_back(dof_uy(node[static_cast<size_t>(i)]), f[static_cast<size_t>(i)].y());
    }
    return out;
}

} // namespace

std::vector<std::pair<int, double>> edge_load_forces(const Model& model, const EdgeLoad& load) {
    return integrate_edge(
        model, load.element, load.edge,
        [&](double s, const Vector2&, const Vector2& normal, const Vector2& tangent) {
            const Vector2 t_local = 0.5 * (1 - s) * load.at_start + 0.5 * (1 + s) * load.at_end;
            return load.frame == TractionFrame::global
                       ? t_local
                       : Vector2(t_local.x() * normal + t_local.y() * tangent);
        });
}

std::vector<std::pair<int, double>> edge_traction_forces(const Model& model, int element, int edge,
                                                         const TractionField& traction) {
    return integrate_edge(model, element, edge,
                          [&](double, const Vector2& x, const Vector2& normal, const Vector2&) {
                              return traction(x, normal);
                          });
}

} // namespace lapwing::fe
