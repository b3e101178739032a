// Cook's membrane (R. D. Cook 1974, "Improved two-dimensional finite
// element", J. Struct. Div. ASCE 100:1851): a tapered cantilever with
// shear-dominated bending; vertical displacement at the midpoint of the
// loaded edge (48, 52) converges to 23.96. Plain-Q4 values on n × n meshes
// 11.85, 18.30, 22.08, 23.43 are the classic table (from memory, as noted in
// ../shared/REFERENCES.md); hence the 0.02 tolerance.
#include "fe/benchmark_problems.hpp"
#include "support/approx.hpp"

#include <cmath>
#include <doctest/doctest.h>

using namespace lapwing::fe;

TEST_CASE("Cook's membrane, plain Q4: the classic 2, 4, 8, 16 mesh sequence") {
    const std::array<std::pair<int, double>, 4> table = {
        {{2, 11.85}, {4, 18.30}, {8, 22.08}, {16, 23.43}}};
    // Not a structured binding: clang 14 cannot capture one in CAPTURE's lambda.
    for (const auto& row : table) {
        const int n = row.first;
        const double expected = row.second;
        CAPTURE(n);
        const double uy = cook_membrane_uy(ElementKind::Q4, n);
        MESSAGE("Q4 " << n << "x" << n << ": " << uy);
        CHECK(std::abs(uy - expected) <= 0.02);
    }
}

TEST_CASE("Cook's membrane at 16 x 16: Q4i, Q8 and Q9 within 0.5 % of the converged 23.96") {
    for (ElementKind kind : {ElementKind::Q4i, ElementKind::Q8, ElementKind::Q9}) {
        CAPTURE(name(kind));
        const double uy = cook_membrane_uy(kind, 16);
        MESSAGE(name(kind) << " 16x16: " << uy);
        CHECK(uy == lapwing::test::approx(23.96, 0.005));
    }
}
