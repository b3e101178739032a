// Gauss–Legendre quadrature: line rules with 1–5 points and their tensor
// products on the reference square.
#pragma once

#include <array>

namespace lapwing::fe {

inline constexpr int max_gauss_points = 5;

// Points and weights on [-1,1]; exact for polynomials of degree 2n-1
// (Abramowitz & Stegun 1964, Table 25.4).
struct LineRule {
    int n = 0;
    std::array<double, max_gauss_points> x{};
    std::array<double, max_gauss_points> w{};
};

struct SquarePoint {
    double xi = 0, eta = 0, w = 0;
};

// n×n tensor rule on [-1,1]²; points ordered with ξ fastest.
struct SquareRule {
    int n_points = 0;
    std::array<SquarePoint, max_gauss_points * max_gauss_points> points{};
};

// n in 1..5; anything else is a programmer error.
const LineRule& gauss_legendre(int n);
SquareRule gauss_square(int n);

} // namespace lapwing::fe
