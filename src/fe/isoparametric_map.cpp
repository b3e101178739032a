// The isoparametric map for any element kind, dispatched on the node count.
#include "fe/isoparametric_map.hpp"

#include "core/error.hpp"
#include "fe/quadrature.hpp"

#include <algorithm>
#include <cmath>
#include <fmt/format.h>

namespace lapwing::fe {

namespace {

template <int n>
NodeCoords<n> to_matrix(std::span<const Vector2> coords) {
    NodeCoords<n> X;
    for (int i = 0; i < n; ++i) X.row(i) = coords[static_cast<size_t>(i)].transpose();
    return X;
}

template <int n>
double det_J_impl(std::span<const Vector2> coords, double xi, double eta) {
    return jacobian<n>(to_matrix<n>(coords), shape<n>(xi, eta).dN_dxi).det();
}

template <int n>
std::optional<Vector2> inverse_impl(std::span<const Vector2> coords, const Vector2& point,
                                    double tolerance) {
    const NodeCoords<n> X = to_matrix<n>(coords);
    const double size = (X.colwise().maxCoeff() - X.colwise().minCoeff()).norm();
    Vector2 xi(0, 0);
    for (int iteration = 0; iteration < 30; ++iteration) {
        const ShapeAt<n> s = shape<n>(xi.x(), xi.y());
        const Vector2 residual = X.transpose() * s.N - point;
        const Jacobian J = jacobian<n>(X, s.dN_dxi);
        if (J.det() <= 0) return std::nullopt;
        const Vector2 step = J.inverse() * residual;
        xi -= step;
        // Keep the iterate bounded: far outside the element the map is not
        // invertible and the point is not in this element anyway.
        if (xi.cwiseAbs().maxCoeff() > 3.0) return std::nullopt;
        if (step.norm() < 1e-14 || residual.norm() < 1e-13 * size) {
            if (xi.cwiseAbs().maxCoeff() > 1.0 + tolerance) return std::nullopt;
            return xi.cwiseMax(-1.0).cwiseMin(1.0);
        }
    }
    return std::nullopt;
}

template <typename F>
auto dispatch(ElementKind kind, F&& f) {
    switch (node_count(kind)) {
    case 4:
        return f(std::integral_constant<int, 4>{});
    case 8:
        return f(std::integral_constant<int, 8>{});
    default:
        return f(std::integral_constant<int, 9>{});
    }
}

} // namespace

double det_J_at(ElementKind kind, std::span<const Vector2> coords, double xi, double eta) {
    return dispatch(kind, [&](auto n) { return det_J_impl<n()>(coords, xi, eta); });
}

Vector2 map_point(ElementKind kind, std::span<const Vector2> coords, double xi, double eta) {
    return dispatch(kind, [&](auto n) -> Vector2 {
        return to_matrix<n()>(coords).transpose() * shape<n()>(xi, eta).N;
    });
}

void check_element_map(ElementKind kind, std::span<const Vector2> coords, int element_id,
                       double min_fraction) {
    // Sample at the 9-node lattice (det J of a Q4 is linear in ξ and η, so its
    // extremes are at the corners) and at the quadrature points.
    struct Sample {
        double xi, eta, det_J;
    };
    std::array<Sample, 9 + 9> samples{};
    int n_samples = 0;
    for (int i = 0; i < 9; ++i) {
        const Vector2 r = reference_node(i);
        samples[static_cast<size_t>(n_samples++)] = {r.x(), r.y(),
                                                     det_J_at(kind, coords, r.x(), r.y())};
    }
    const SquareRule rule = gauss_square(gauss_order(kind));
    double area = 0;
    for (int q = 0; q < rule.n_points; ++q) {
        const auto& p = rule.points[static_cast<size_t>(q)];
        const double d = det_J_at(kind, coords, p.xi, p.eta);
        samples[static_cast<size_t>(n_samples++)] = {p.xi, p.eta, d};
        area += d * p.w;
    }
    const double mean = area / 4.0;
    for (int i = 0; i < n_samples; ++i) {
        const Sample& s = samples[static_cast<size_t>(i)];
        if (s.det_J <= 0 || s.det_J < min_fraction * std::abs(mean)) {
            const Vector2 x = map_point(kind, coords, s.xi, s.eta);
            throw AnalysisError(fmt::format(
                "element {} ({}) is {}: det J = {:.4g} at (xi, eta) = ({:.3f}, {:.3f}), "
                "point ({:.4g}, {:.4g}); the element's mean det J is {:.4g}. Check that its nodes "
                "run counter-clockwise and that it is not folded or collapsed",
                element_id, name(kind), s.det_J < 0 ? "inverted" : "degenerate", s.det_J, s.xi,
                s.eta, x.x(), x.y(), mean));
        }
    }
}

std::optional<Vector2> inverse_map(ElementKind kind, std::span<const Vector2> coords,
                                   const Vector2& point, double tolerance) {
    return dispatch(kind, [&](auto n) { return inverse_impl<n()>(coords, point, tolerance); });
}

} // namespace lapwing::fe
