// Gauss–Legendre abscissae and weights in closed form (Abramowitz & Stegun
// 1964, Table 25.4), to full double precision.
#include "fe/quadrature.hpp"

#include <cassert>
#include <cmath>

namespace lapwing::fe {

namespace {

std::array<LineRule, max_gauss_points + 1> make_rules() {
    std::array<LineRule, max_gauss_points + 1> r{};
    r[1] = {1, {0.0}, {2.0}};
    const double a2 = 1.0 / std::sqrt(3.0);
    r[2] = {2, {-a2, a2}, {1.0, 1.0}};
    const double a3 = std::sqrt(0.6);
    r[3] = {3, {-a3, 0.0, a3}, {5.0 / 9.0, 8.0 / 9.0, 5.0 / 9.0}};
    const double s = 2.0 / 7.0 * std::sqrt(1.2);
    const double x4a = std::sqrt(3.0 / 7.0 - s), x4b = std::sqrt(3.0 / 7.0 + s);
    const double w4a = (18.0 + std::sqrt(30.0)) / 36.0, w4b = (18.0 - std::sqrt(30.0)) / 36.0;
    r[4] = {4, {-x4b, -x4a, x4a, x4b}, {w4b, w4a, w4a, w4b}};
    const double t = 2.0 * std::sqrt(10.0 / 7.0);
    const double x5a = std::sqrt(5.0 - t) / 3.0, x5b = std::sqrt(5.0 + t) / 3.0;
    const double w5a = (322.0 + 13.0 * std::sqrt(70.0)) / 900.0;
    const double w5b = (322.0 - 13.0 * std::sqrt(70.0)) / 900.0;
    r[5] = {5, {-x5b, -x5a, 0.0, x5a, x5b}, {w5b, w5a, 128.0 / 225.0, w5a, w5b}};
    return r;
}

const std::array<LineRule, max_gauss_points + 1> rules = make_rules();

} // namespace

const LineRule& gauss_legendre(int n) {
    assert(n >= 1 && n <= max_gauss_points);
    return rules[static_cast<size_t>(n)];
}

SquareRule gauss_square(int n) {
    const LineRule& line = gauss_legendre(n);
    SquareRule rule;
    for (int j = 0; j < n; ++j)
        for (int i = 0; i < n; ++i)
            rule.points[static_cast<size_t>(rule.n_points++)] = {line.x[i], line.x[j],
                                                                 line.w[i] * line.w[j]};
    return rule;
}

} // namespace lapwing::fe
