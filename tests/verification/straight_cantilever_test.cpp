// MacNeal & Harder (1985), straight cantilever beam, rectangular elements:
// 6 × 0.2, t = 0.1, E = 1e7, ν = 0.3, six elements; tip deflection 0.1081
// under unit in-plane shear and 3.0e-5 under unit extension (their Table 3;
// values from ../shared/REFERENCES.md). Plain Q4 locks in bending (≈ 0.010,
// MacNeal & Harder report 0.093 of the answer); the incompatible-mode Q4
// must reach ≥ 0.99 of it on rectangles.
#include "fe/benchmark_problems.hpp"
#include "support/approx.hpp"

#include <doctest/doctest.h>

using namespace lapwing::fe;

TEST_CASE("straight cantilever, in-plane shear: Q4 locks, Q4i reaches 99 % of 0.1081") {
    const double q4 = macneal_harder_cantilever_tip(ElementKind::Q4, TipLoad::shear);
    const double q4i = macneal_harder_cantilever_tip(ElementKind::Q4i, TipLoad::shear);
    MESSAGE("Q4 tip " << q4 << " (" << q4 / 0.1081 << " of 0.1081), Q4i tip " << q4i << " ("
                      << q4i / 0.1081 << ")");
    CHECK(q4 / 0.1081 < 0.15); // locked: MacNeal & Harder report 0.093
    CHECK(q4 / 0.1081 > 0.05);
    CHECK(q4i >= 0.99 * 0.1081);
    CHECK(q4i <= 1.01 * 0.1081);
    // Quadratic elements are not part of the published claim; on this
    // six-element mesh they are within 2 % (measured 0.1062 Q8, 0.1070 Q9).
    for (ElementKind kind : {ElementKind::Q8, ElementKind::Q9})
        CHECK(macneal_harder_cantilever_tip(kind, TipLoad::shear) ==
              lapwing::test::approx(0.1081, 0.02));
}

TEST_CASE("straight cantilever, extension: every element gives PL/(EA) = 3.0e-5") {
    for (ElementKind kind : {ElementKind::Q4, ElementKind::Q4i, ElementKind::Q8, ElementKind::Q9}) {
        CAPTURE(name(kind));
        // A clamped root restrains the Poisson contraction locally, so the
        // mean tip value is within 1 % of the bar formula 6 / (1e7 · 0.02).
        CHECK(macneal_harder_cantilever_tip(kind, TipLoad::extension) ==
              lapwing::test::approx(3.0e-5, 0.01));
    }
}
