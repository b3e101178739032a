// Huth (1986) fastener flexibility against the worked value in
// ../shared/REFERENCES.md (arithmetic on the published form, from memory):
// d = 20 mm, t1 = t2 = 10 mm, all E = 200 GPa, single shear →
// C = 2.835e-6 mm/N, k = 352.8 kN/mm.
#include "analysis/fastener_stiffness.hpp"
#include "support/approx.hpp"

#include <doctest/doctest.h>

using namespace lapwing::analysis;

TEST_CASE("Huth flexibility of a single-shear 20 mm bolt through two 10 mm steel plies") {
    const FastenerPlies p{10, 200000, 10, 200000, 200000, 20, 1};
    // (20/40)^(2/3) · 3 · 1.5e-6 = 2.8348e-6; the reference rounds to 2.835e-6.
    CHECK(huth_flexibility(p) == lapwing::test::approx(2.835e-6, 2e-4));
    CHECK(huth_stiffness(p) == lapwing::test::approx(352.8e3, 2e-4));
}

TEST_CASE("a second shear plane stiffens the bolt (Huth's n = 2 terms)") {
    const FastenerPlies single{10, 200000, 10, 200000, 200000, 20, 1};
    FastenerPlies twice = single;
    twice.shear_planes = 2;
    // n = 2: b/n = 1.5 and the bracket is 5e-7 + 2.5e-7 + 2.5e-7 + 1.25e-7 =
    // 1.125e-6 against 3 · 1.5e-6 for n = 1, so C2/C1 = 0.375.
    const double expected_ratio = (1.5 * 1.125e-6) / (3.0 * 1.5e-6);
    CHECK(huth_flexibility(twice) / huth_flexibility(single) ==
          lapwing::test::approx(expected_ratio, 1e-12));
}
