// det J of the isoparametric map of a Q4, Q8 or Q9 element at (ξ, η), for the
// quality figures. Interim: to be replaced by fe/shape_functions.hpp and
// fe/isoparametric_map.hpp once the element library lands, so that lapwing has
// one implementation of the shape functions.
#pragma once

#include "fe/element_kind.hpp"

#include <Eigen/Core>
#include <Eigen/LU>

namespace lapwing::mesh::detail {

// x: nodal coordinates as columns, in fe/element_kind.hpp order.
inline double jacobian_determinant(fe::ElementKind kind, const Eigen::Matrix<double, 2, 9>& x,
                                   double xi, double eta) {
    // ∂N_i/∂ξ and ∂N_i/∂η (Zienkiewicz & Taylor, The Finite Element Method,
    // vol. 1, §8.5: serendipity and Lagrange quadrilaterals).
    Eigen::Matrix<double, 9, 2> d = Eigen::Matrix<double, 9, 2>::Zero();
    const double xs[4] = {-1, 1, 1, -1}, es[4] = {-1, -1, 1, 1};
    if (kind == fe::ElementKind::Q4 || kind == fe::ElementKind::Q4i) {
        for (int i = 0; i < 4; ++i) {
            d(i, 0) = 0.25 * xs[i] * (1 + es[i] * eta);
            d(i, 1) = 0.25 * es[i] * (1 + xs[i] * xi);
        }
    } else if (kind == fe::ElementKind::Q8) {
        for (int i = 0; i < 4; ++i) {
            const double a = xs[i], b = es[i];
            d(i, 0) = 0.25 * a * (1 + b * eta) * (2 * a * xi + b * eta);
            d(i, 1) = 0.25 * b * (1 + a * xi) * (a * xi + 2 * b * eta);
        }
        d(4, 0) = -xi * (1 - eta), d(4, 1) = -0.5 * (1 - xi * xi);
        d(5, 0) = 0.5 * (1 - eta * eta), d(5, 1) = -eta * (1 + xi);
        d(6, 0) = -xi * (1 + eta), d(6, 1) = 0.5 * (1 - xi * xi);
        d(7, 0) = -0.5 * (1 - eta * eta), d(7, 1) = -eta * (1 - xi);
    } else {
        // Products of 1D quadratic Lagrange polynomials on nodes -1, 0, 1.
        const auto l = [](int k, double s) {
            return k == 0 ? 0.5 * s * (s - 1) : k == 1 ? 1 - s * s : 0.5 * s * (s + 1);
        };
        const auto dl = [](int k, double s) {
            return k == 0 ? s - 0.5 : k == 1 ? -2 * s : s + 0.5;
        };
        // Node i sits at 1D indices (ix, iy) with 0 ↔ −1, 1 ↔ 0, 2 ↔ +1.
        const int ix[9] = {0, 2, 2, 0, 1, 2, 1, 0, 1}, iy[9] = {0, 0, 2, 2, 0, 1, 2, 1, 1};
        for (int i = 0; i < 9; ++i) {
            d(i, 0) = dl(ix[i], xi) * l(iy[i], eta);
            d(i, 1) = l(ix[i], xi) * dl(iy[i], eta);
        }
    }
    const Eigen::Matrix2d J = x * d; // J = Σ x_i ⊗ ∂N_i/∂ξ
    return J.determinant();
}

} // namespace lapwing::mesh::detail
