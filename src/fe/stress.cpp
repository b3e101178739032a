// Element stress evaluation.
#include "fe/stress.hpp"

#include "fe/element_stiffness.hpp"
#include "fe/isoparametric_map.hpp"
#include "fe/quadrature.hpp"
#include "fe/strain_operator.hpp"

#include <cmath>

namespace lapwing::fe {

namespace {

template <int n>
ElementVector<n> gather_u(const Element& el, const Eigen::VectorXd& u) {
    ElementVector<n> u_e;
    for (int i = 0; i < n; ++i) {
        u_e(2 * i) = u(dof_ux(el.nodes[static_cast<size_t>(i)]));
        u_e(2 * i + 1) = u(dof_uy(el.nodes[static_cast<size_t>(i)]));
    }
    return u_e;
}

template <int n>
Strain strain_at(const NodeCoords<n>& X, const ElementVector<n>& u_e, double xi, double eta) {
    const ShapeAt<n> s = shape<n>(xi, eta);
    const Jacobian J = jacobian<n>(X, s.dN_dxi);
    return strain_operator<n>(physical_derivatives<n>(s.dN_dxi, J)) * u_e;
}

// Calls f(strain at (ξ, η)) for each of `points`, with element data computed once.
template <typename F>
void for_each_strain(const Model& model, int e, const Eigen::VectorXd& u,
                     const std::vector<Vector2>& points, const Matrix3& D, F&& f) {
    const Element& el = model.elements[static_cast<size_t>(e)];
    const std::span<const int> nodes(el.nodes.data(), static_cast<size_t>(node_count(el.kind)));
    switch (el.kind) {
    case ElementKind::Q4: {
        const auto X = gather_coords<4>(model.nodes, nodes);
        const auto u_e = gather_u<4>(el, u);
        for (const Vector2& p : points) f(strain_at<4>(X, u_e, p.x(), p.y()));
        break;
    }
    case ElementKind::Q4i: {
        const auto X = gather_coords<4>(model.nodes, nodes);
        const auto u_e = gather_u<4>(el, u);
        const Eigen::Vector4d alpha = stiffness_q4i(X, D, el.thickness, e).alpha_from_u * u_e;
        for (const Vector2& p : points)
            f(Strain(strain_at<4>(X, u_e, p.x(), p.y()) +
                     incompatible_strain_operator(X, p.x(), p.y()) * alpha));
        break;
    }
    case ElementKind::Q8: {
        const auto X = gather_coords<8>(model.nodes, nodes);
        const auto u_e = gather_u<8>(el, u);
        for (const Vector2& p : points) f(strain_at<8>(X, u_e, p.x(), p.y()));
        break;
    }
    case ElementKind::Q9: {
        const auto X = gather_coords<9>(model.nodes, nodes);
        const auto u_e = gather_u<9>(el, u);
        for (const Vector2& p : points) f(strain_at<9>(X, u_e, p.x(), p.y()));
        break;
    }
    }
}

} // namespace

Stress element_stress(const Model& model, int e, const Eigen::VectorXd& u, double xi, double eta) {
    const Element& el = model.elements[static_cast<size_t>(e)];
    const Matrix3 D = plane_stress_D(model.materials[static_cast<size_t>(el.material)]);
    Stress out = Stress::Zero();
    for_each_strain(model, e, u, {Vector2(xi, eta)}, D, [&](const Strain& eps) { out = D * eps; });
    return out;
}

SampledStresses sample_stresses(const Model& model, const Eigen::VectorXd& u, int n) {
    SampledStresses s;
    const SquareRule rule = gauss_square(n);
    s.points_per_element = rule.n_points;
    for (int q = 0; q < rule.n_points; ++q)
        s.reference.emplace_back(rule.points[static_cast<size_t>(q)].xi,
                                 rule.points[static_cast<size_t>(q)].eta);
    const size_t total = model.elements.size() * static_cast<size_t>(rule.n_points);
    s.point.reserve(total);
    s.stress.reserve(total);
    s.weight.reserve(total);
    for (int e = 0; e < static_cast<int>(model.elements.size()); ++e) {
        const Element& el = model.elements[static_cast<size_t>(e)];
        const Matrix3 D = plane_stress_D(model.materials[static_cast<size_t>(el.material)]);
        for_each_strain(model, e, u, s.reference, D,
                        [&](const Strain& eps) { s.stress.push_back(D * eps); });
        std::array<Vector2, 9> coords;
        for (int i = 0; i < node_count(el.kind); ++i)
            coords[static_cast<size_t>(i)] =
                model.nodes[static_cast<size_t>(el.nodes[static_cast<size_t>(i)])];
        const std::span<const Vector2> c(coords.data(), static_cast<size_t>(node_count(el.kind)));
        for (int q = 0; q < rule.n_points; ++q) {
            const auto& p = rule.points[static_cast<size_t>(q)];
            s.point.push_back(map_point(el.kind, c, p.xi, p.eta));
            s.weight.push_back(el.thickness * det_J_at(el.kind, c, p.xi, p.eta) * p.w);
        }
    }
    return s;
}

double von_mises(const Stress& s) {
    return std::sqrt(s(0) * s(0) - s(0) * s(1) + s(1) * s(1) + 3.0 * s(2) * s(2));
}

Principal principal(const Stress& s) {
    const double c = 0.5 * (s(0) + s(1));
    const double r = std::hypot(0.5 * (s(0) - s(1)), s(2));
    return {c + r, c - r, 0.5 * std::atan2(2.0 * s(2), s(0) - s(1))};
}

} // namespace lapwing::fe
