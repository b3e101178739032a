// Stress linearization along a piece: membrane, bending and peak parts
// (ASME BPVC VIII-2 Annex 5-A form; REFERENCES "Section linearization").
#include "check/linearize.hpp"
#include "fe/quadrature.hpp"
#include "support/approx.hpp"

#include <cmath>
#include <doctest/doctest.h>
#include <functional>
#include <vector>

using lapwing::check::linearize;
using lapwing::check::StressSample;

namespace {
// A 5-point Gauss rule on [0, ℓ] (exact to degree 9) plus `extra` evenly
// spaced points, ends included, for the peak.
std::vector<StressSample> sample(double length, const std::function<double(double)>& stress,
                                 int extra = 11) {
    std::vector<StressSample> out;
    const auto& rule = lapwing::fe::gauss_legendre(5);
    for (int g = 0; g < rule.n; ++g) {
        const double s = 0.5 * length * (1 + rule.x[static_cast<size_t>(g)]);
        out.push_back({s, stress(s), 0.5 * length * rule.w[static_cast<size_t>(g)]});
    }
    for (int i = 0; i < extra; ++i) {
        const double s = length * i / (extra - 1);
        out.push_back({s, stress(s), 0.0});
    }
    return out;
}
} // namespace

TEST_CASE("linearization of σ = (s − 1)² over t = 2: σm = 1/3, σb = 0, peak 2/3 at the ends") {
    // REFERENCES (ASME BPVC VIII-2 Annex 5-A form, memory): σm = (1/t)∫σ ds = 1/3,
    // σb = (6/t²)∫σ(t/2 − s) ds = 0 by symmetry, peak = σ − σm − σb(1 − 2s/t):
    // 2/3 at s = 0 and s = 2, −1/3 at s = 1.
    const auto stress = [](double s) { return (s - 1) * (s - 1); };
    const auto lin = linearize(2.0, sample(2.0, stress));
    CHECK(lin.membrane == lapwing::test::approx(1.0 / 3.0, 1e-14));
    CHECK(std::abs(lin.bending) <= 1e-14);
    CHECK(lin.peak == lapwing::test::approx(2.0 / 3.0, 1e-14));
    // The non-linear part in the middle, from the linearized values: −1/3.
    CHECK(stress(1.0) - lin.membrane - lin.bending * (1 - 2 * 1.0 / 2.0) ==
          lapwing::test::approx(-1.0 / 3.0, 1e-14));
}

TEST_CASE("a linear stress field has zero peak; membrane and bending are its mean and end value") {
    // σ = 50 + 30 (1 − 2s/ℓ): membrane 50, bending 30 at s = 0 (REFERENCES:
    // "a linear field has zero peak").
    const double length = 7.5;
    const auto lin =
        linearize(length, sample(length, [&](double s) { return 50 + 30 * (1 - 2 * s / length); }));
    CHECK(lin.membrane == lapwing::test::approx(50.0, 1e-13));
    CHECK(lin.bending == lapwing::test::approx(30.0, 1e-13));
    CHECK(lin.peak <= 1e-12);
}
