// Shape functions of the quadrilateral family.
//  Q4:  N_i = ¼(1+ξξ_i)(1+ηη_i)
//  Q8:  corners ¼(1+ξξ_i)(1+ηη_i)(ξξ_i+ηη_i−1); mid-sides ½(1−ξ²)(1+ηη_i) or
//       ½(1+ξξ_i)(1−η²)            (Zienkiewicz, Taylor & Zhu 2013, §6.4.2)
//  Q9:  products of 1-D quadratic Lagrange polynomials l_a(ξ) l_b(η)
//                                    (Zienkiewicz, Taylor & Zhu 2013, §6.4.1)
#include "fe/shape_functions.hpp"

#include <array>

namespace lapwing::fe {

namespace {
constexpr std::array<double, 9> node_xi = {-1, 1, 1, -1, 0, 1, 0, -1, 0};
constexpr std::array<double, 9> node_eta = {-1, -1, 1, 1, -1, 0, 1, 0, 0};

// 1-D quadratic Lagrange polynomial through −1, 0, 1 that is 1 at `at`.
double lagrange(double at, double s) {
    if (at < 0) return 0.5 * s * (s - 1.0);
    if (at > 0) return 0.5 * s * (s + 1.0);
    return 1.0 - s * s;
}
double lagrange_ds(double at, double s) {
    if (at < 0) return s - 0.5;
    if (at > 0) return s + 0.5;
    return -2.0 * s;
}
} // namespace

Vector2 reference_node(int i) {
    return {node_xi[static_cast<size_t>(i)], node_eta[static_cast<size_t>(i)]};
}

ShapeAt<4> shape_q4(double xi, double eta) {
    ShapeAt<4> s;
    for (int i = 0; i < 4; ++i) {
        const double a = node_xi[static_cast<size_t>(i)], b = node_eta[static_cast<size_t>(i)];
        s.N(i) = 0.25 * (1 + a * xi) * (1 + b * eta);
        s.dN_dxi(i, 0) = 0.25 * a * (1 + b * eta);
        s.dN_dxi(i, 1) = 0.25 * b * (1 + a * xi);
    }
    return s;
}

ShapeAt<8> shape_q8(double xi, double eta) {
    ShapeAt<8> s;
    for (int i = 0; i < 4; ++i) {
        const double a = node_xi[static_cast<size_t>(i)], b = node_eta[static_cast<size_t>(i)];
        s.N(i) = 0.25 * (1 + a * xi) * (1 + b * eta) * (a * xi + b * eta - 1);
        s.dN_dxi(i, 0) = 0.25 * a * (1 + b * eta) * (2 * a * xi + b * eta);
        s.dN_dxi(i, 1) = 0.25 * b * (1 + a * xi) * (a * xi + 2 * b * eta);
    }
    for (int i = 4; i < 8; ++i) {
        const double a = node_xi[static_cast<size_t>(i)], b = node_eta[static_cast<size_t>(i)];
        if (a == 0) { // on η = ±1
            s.N(i) = 0.5 * (1 - xi * xi) * (1 + b * eta);
            s.dN_dxi(i, 0) = -xi * (1 + b * eta);
            s.dN_dxi(i, 1) = 0.5 * b * (1 - xi * xi);
        } else { // on ξ = ±1
            s.N(i) = 0.5 * (1 + a * xi) * (1 - eta * eta);
            s.dN_dxi(i, 0) = 0.5 * a * (1 - eta * eta);
            s.dN_dxi(i, 1) = -eta * (1 + a * xi);
        }
    }
    return s;
}

ShapeAt<9> shape_q9(double xi, double eta) {
    ShapeAt<9> s;
    for (int i = 0; i < 9; ++i) {
        const double a = node_xi[static_cast<size_t>(i)], b = node_eta[static_cast<size_t>(i)];
        const double lx = lagrange(a, xi), ly = lagrange(b, eta);
        s.N(i) = lx * ly;
        s.dN_dxi(i, 0) = lagrange_ds(a, xi) * ly;
        s.dN_dxi(i, 1) = lx * lagrange_ds(b, eta);
    }
    return s;
}

} // namespace lapwing::fe
