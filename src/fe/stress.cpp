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

// One element's stresses at `points` for every field: the strain operator B
// at each point once, then σ = D B u_e per field (plus D B_α α for Q4i,
// whose α depends on the field). Calls f(field, point, σ), point by point.
template <int n, typename F>
void element_stresses(const Model& model, int e, std::span<const Eigen::VectorXd* const> u,
                      const std::vector<Vector2>& points, const Matrix3& D, bool incompatible,
                      F&& f) {
    const Element& el = model.elements[static_cast<size_t>(e)];
    const auto X = gather_coords<n>(model.nodes, std::span<const int>(el.nodes.data(), n));
    std::vector<ElementVector<n>> u_e;
    std::vector<Eigen::Vector4d> alpha;
    for (const Eigen::VectorXd* field : u) {
        u_e.push_back(gather_u<n>(el, *field));
        if constexpr (n == 4)
            if (incompatible)
                alpha.push_back(stiffness_q4i(X, D, el.thickness, e).alpha_from_u * u_e.back());
    }
    for (size_t q = 0; q < points.size(); ++q) {
        const Vector2& p = points[q];
        const ShapeAt<n> s = shape<n>(p.x(), p.y());
        const StrainOperator<n> B =
            strain_operator<n>(physical_derivatives<n>(s.dN_dxi, jacobian<n>(X, s.dN_dxi)));
        Eigen::Matrix<double, 3, 4> B_alpha = Eigen::Matrix<double, 3, 4>::Zero();
        if constexpr (n == 4)
            if (incompatible) B_alpha = incompatible_strain_operator(X, p.x(), p.y());
        for (size_t c = 0; c < u.size(); ++c) {
            Strain eps = B * u_e[c];
            if constexpr (n == 4)
                if (incompatible) eps = Strain(eps + B_alpha * alpha[c]);
            f(c, q, Stress(D * eps));
        }
    }
}

// element_stresses for the element's kind.
template <typename F>
void element_stresses(const Model& model, int e, std::span<const Eigen::VectorXd* const> u,
                      const std::vector<Vector2>& points, F&& f) {
    const Element& el = model.elements[static_cast<size_t>(e)];
    const Matrix3 D = plane_stress_D(model.materials[static_cast<size_t>(el.material)]);
    switch (el.kind) {
    case ElementKind::Q4:
    case ElementKind::Q4i:
        element_stresses<4>(model, e, u, points, D, el.kind == ElementKind::Q4i, f);
        break;
    case ElementKind::Q8:
        element_stresses<8>(model, e, u, points, D, false, f);
        break;
    case ElementKind::Q9:
        element_stresses<9>(model, e, u, points, D, false, f);
        break;
    }
}

} // namespace

Stress element_stress(const Model& model, int e, const Eigen::VectorXd& u, double xi, double eta) {
    const Eigen::VectorXd* field = &u;
    Stress out = Stress::Zero();
    element_stresses(model, e, std::span(&field, 1), {Vector2(xi, eta)},
                     [&](size_t, size_t, const Stress& sigma) { out = sigma; });
    return out;
}

SampledStresses sample_stresses(const Model& model, const Eigen::VectorXd& u, int n) {
    const Eigen::VectorXd* field = &u;
    return std::move(sample_stresses(model, std::span(&field, 1), n).front());
}

std::vector<SampledStresses> sample_stresses(const Model& model,
                                             std::span<const Eigen::VectorXd* const> u, int n) {
    SampledStresses geometry;
    const SquareRule rule = gauss_square(n);
    geometry.points_per_element = rule.n_points;
    for (int q = 0; q < rule.n_points; ++q)
        geometry.reference.emplace_back(rule.points[static_cast<size_t>(q)].xi,
                                        rule.points[static_cast<size_t>(q)].eta);
    const size_t total = model.elements.size() * static_cast<size_t>(rule.n_points);
    geometry.point.reserve(total);
    geometry.weight.reserve(total);
    for (const Element& el : model.elements) {
        std::array<Vector2, 9> coords;
        for (int i = 0; i < node_count(el.kind); ++i)
            coords[static_cast<size_t>(i)] =
                model.nodes[static_cast<size_t>(el.nodes[static_cast<size_t>(i)])];
        const std::span<const Vector2> c(coords.data(), static_cast<size_t>(node_count(el.kind)));
        for (int q = 0; q < rule.n_points; ++q) {
            const auto& p = rule.points[static_cast<size_t>(q)];
            geometry.point.push_back(map_point(el.kind, c, p.xi, p.eta));
            geometry.weight.push_back(el.thickness * det_J_at(el.kind, c, p.xi, p.eta) * p.w);
        }
    }
    std::vector<SampledStresses> out(u.size(), geometry);
    for (SampledStresses& s : out) s.stress.reserve(total);
    for (int e = 0; e < static_cast<int>(model.elements.size()); ++e)
        element_stresses(
            model, e, u, geometry.reference,
            [&](size_t c, size_t, const Stress& sigma) { out[c].stress.push_back(sigma); });
    return out;
}

double von_mises(const Stress& s) {
    return std::sqrt(s(0) * s(0) - s(0) * s(1) + s(1) * s(1) + 3.0 * s(2) * s(2));
}

Principal principal(const Stress& s) {
    const PrincipalValues v = principal_values(s);
    return {v.s1, v.s2, 0.5 * std::atan2(2.0 * s(2), s(0) - s(1))};
}

} // namespace lapwing::fe
