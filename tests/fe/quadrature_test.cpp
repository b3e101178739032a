// Gauss–Legendre rules integrate polynomials of degree 2n−1 exactly
// (Abramowitz & Stegun 1964, §25.4.29).
#include "fe/quadrature.hpp"
#include "support/approx.hpp"

#include <cmath>
#include <doctest/doctest.h>

using namespace lapwing::fe;

TEST_CASE("an n-point Gauss rule integrates x^k exactly for k <= 2n-1 and not for 2n") {
    for (int n = 1; n <= 5; ++n) {
        const LineRule& rule = gauss_legendre(n);
        CHECK(rule.n == n);
        for (int k = 0; k <= 2 * n; ++k) {
            double sum = 0;
            for (int q = 0; q < n; ++q) sum += rule.w[q] * std::pow(rule.x[q], k);
            const double exact = k % 2 == 1 ? 0.0 : 2.0 / (k + 1);
            if (k <= 2 * n - 1)
                CHECK(std::abs(sum - exact) < 1e-14);
            else
                CHECK(std::abs(sum - exact) > 1e-6); // degree 2n is not exact
        }
    }
}

TEST_CASE("the tensor rule on the square integrates x^a y^b exactly for a, b <= 2n-1") {
    for (int n = 1; n <= 5; ++n) {
        const SquareRule rule = gauss_square(n);
        CHECK(rule.n_points == n * n);
        for (int a = 0; a <= 2 * n - 1; ++a)
            for (int b = 0; b <= 2 * n - 1; ++b) {
                double sum = 0;
                for (int q = 0; q < rule.n_points; ++q)
                    sum += rule.points[q].w * std::pow(rule.points[q].xi, a) *
                           std::pow(rule.points[q].eta, b);
                const double ex = (a % 2 ? 0.0 : 2.0 / (a + 1)) * (b % 2 ? 0.0 : 2.0 / (b + 1));
                CHECK(std::abs(sum - ex) < 1e-13);
            }
    }
}
