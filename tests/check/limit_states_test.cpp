// The classical limit-state formulas against published and hand-derived
// numbers: the AISC 360-16 §J4.3 / §J3.10 arithmetic example and the
// Thornton (1984) slenderness example of shared REFERENCES ("Plate
// checks"), and EN 1993-1-8 / EN 1993-1-1 examples derived by hand below
// (no published worked example is used: none is recalled reliably enough to
// quote its numbers).
#include "check/limit_states.hpp"
#include "core/error.hpp"
#include "core/units.hpp"
#include "support/approx.hpp"

#include <cmath>
#include <doctest/doctest.h>

using namespace lapwing;
using namespace lapwing::check;
using lapwing::test::approx;

namespace {
constexpr double in = mm_per_inch;
constexpr double in2 = mm_per_inch * mm_per_inch;
constexpr double kip = newton_per_kip;
constexpr double ksi = mpa_per_ksi;

// A value printed to `digits` decimals agrees when it rounds to it: within
// half a unit of the last printed digit.
bool as_printed(double value, double printed, int digits) {
    return std::abs(value - printed) <= 0.5 * std::pow(10.0, -digits) * (1 + 1e-9);
}

// REFERENCES example areas (t = 0.5 in; 2 lines at g = 3 in, 3 rows at 3 in,
// end distance 1.5 in; holes 13/16 + 1/16 in).
BlockShearAreas reference_areas() {
    return {7.5 * in2, 5.3125 * in2, 1.5 * in2, 1.0625 * in2};
}
} // namespace

TEST_CASE("block shear, AISC 360-16 §J4.3 form: the REFERENCES arithmetic example") {
    // Rn = min(0.6·65·5.3125 + 1·65·1.0625, 0.6·50·7.5 + 1·65·1.0625)
    //    = min(207.1875 + 69.0625, 225 + 69.0625) = 276.25 kips (REFERENCES).
    // Unit conversions are exact (NIST SP 811), the arithmetic is exact in
    // the example, so only round-off separates the two: 1e-12 relative.
    const Capacity nominal = block_shear_aisc(reference_areas(), 50 * ksi, 65 * ksi, 1.0, 1.0);
    CHECK(nominal.value / kip == approx(276.25, 1e-12));
    CHECK(nominal.method == "AISC 360-16 §J4.3 form");
    const Capacity design = block_shear_aisc(reference_areas(), 50 * ksi, 65 * ksi, 1.0, 0.75);
    CHECK(design.value / kip == approx(0.75 * 276.25, 1e-12));
    // The yield cap governs when Anv = Agv (hand arithmetic on the same
    // form): min(0.6·65·7.5 + 69.0625, 0.6·50·7.5 + 69.0625) = 294.0625.
    BlockShearAreas no_holes = reference_areas();
    no_holes.Anv = no_holes.Agv;
    CHECK(block_shear_aisc(no_holes, 50 * ksi, 65 * ksi, 1.0, 1.0).value / kip ==
          approx(294.0625, 1e-12));
    // Ubs = 0.5 halves the tension term: 207.1875 + 0.5·69.0625 = 241.71875.
    CHECK(block_shear_aisc(reference_areas(), 50 * ksi, 65 * ksi, 0.5, 1.0).value / kip ==
          approx(241.71875, 1e-12));
}

TEST_CASE("bearing and tear-out, AISC 360-16 §J3.10 form: the REFERENCES example") {
    // 3/4 in bolt, t = 0.5 in, Fu = 65 ksi: 2.4·0.75·0.5·65 = 58.50 kips;
    // edge bolt lc = 1.5 − 13/32 = 1.09375 in: 1.2·1.09375·0.5·65 = 42.66;
    // interior lc = 3 − 13/16 = 2.1875 in: 85.31 kips (REFERENCES, printed
    // to two decimals; exact here: 58.5, 42.65625, 85.3125).
    const double t = 0.5 * in, Fu = 65 * ksi;
    CHECK(bearing_aisc(0.75 * in, t, Fu, 2.4, 1.0).value / kip == approx(58.5, 1e-12));
    CHECK(tearout_aisc(1.09375 * in, t, Fu, 1.2, 1.0).value / kip == approx(42.65625, 1e-12));
    CHECK(tearout_aisc(2.1875 * in, t, Fu, 1.2, 1.0).value / kip == approx(85.3125, 1e-12));
    CHECK(as_printed(tearout_aisc(1.09375 * in, t, Fu, 1.2, 1.0).value / kip, 42.66, 2));
    CHECK(as_printed(tearout_aisc(2.1875 * in, t, Fu, 1.2, 1.0).value / kip, 85.31, 2));

    // The bolt's capacity is the smaller, times the user's φ = 0.75: the
    // edge bolt by tear-out, the interior bolt by bearing (58.5 < 85.31).
    model::BearingAllowable a; // defaults 2.4, 1.2, φ = 0.75 (AISC 360-16 §J3.10)
    BoltClearances edge;
    edge.d = 0.75 * in;
    edge.d0 = 13.0 / 16 * in;
    edge.lc = 1.09375 * in;
    edge.ahead = "outline.edge[1]";
    const Capacity c_edge = bearing_tearout_aisc(edge, t, Fu, a);
    CHECK(c_edge.value / kip == approx(0.75 * 42.65625, 1e-12));
    CHECK(c_edge.formula.find("tear-out governs") != std::string::npos);
    BoltClearances inner = edge;
    inner.lc = 2.1875 * in;
    CHECK(bearing_tearout_aisc(inner, t, Fu, a).value / kip == approx(0.75 * 58.5, 1e-12));
    // Demand side: bearing stress F/(d t); 58.5 kips on 3/4 × 1/2 in is
    // 2.4 Fu = 156 ksi.
    CHECK(bearing_stress(58.5 * kip, 0.75 * in, t) / ksi == approx(156, 1e-12));
}

// EN 1993-1-8 example, derived by hand (this project): plate t = 10 mm,
// S355 (fy = 355, fu = 490 MPa, EN 10025-2 for t ≤ 40 mm, from memory),
// M20 8.8 bolts (fub = 800) in d0 = 22 mm holes, 2 lines at p2 = 70 mm,
// 3 rows at p1 = 70 mm, end distance e1 = 40 mm, side distance e2 = 40 mm;
// γM0 = 1.0, γM2 = 1.25 (EN 1993-1-8 Table 2.1 recommended values).
namespace {
BoltClearances en_end_edge_bolt() {
    BoltClearances g;
    g.d = 20;
    g.d0 = 22;
    g.e1 = 40;
    g.e2 = 40;
    g.p2 = 70;
    g.lc = 40 - 11;
    return g;
}
} // namespace

TEST_CASE("bearing, EN 1993-1-8 Table 3.4 form: k1 and αb from the geometry, hand example") {
    model::BearingAllowable a; // k1 2.5, alpha_b 1.0 (no limit), γM2 1.25
    // End, edge bolt: αd = e1/(3 d0) = 40/66 = 0.606061; fub/fu = 800/490
    // = 1.633; αb = 0.606061. k1 = min(2.8·40/22 − 1.7 = 3.391, 1.4·70/22 −
    // 1.7 = 2.755, 2.5) = 2.5. Fb,Rd = 2.5·0.606061·490·20·10/1.25
    // = 1.515152·98 000/1.25 = 118 787.9 N.
    const Capacity end = bearing_en(en_end_edge_bolt(), 10, 490, 800, a);
    CHECK(end.value == approx(2.5 * (40.0 / 66) * 490 * 20 * 10 / 1.25, 1e-12));
    CHECK(as_printed(end.value, 118787.9, 1));
    CHECK(end.method == "EN 1993-1-8 Table 3.4 form");
    // Inner bolt (the next hole 70 ahead): αd = p1/(3 d0) − 1/4 = 70/66 −
    // 0.25 = 0.810606; Fb,Rd = 2.5·0.810606·490·200/1.25 = 158 878.8 N.
    BoltClearances inner = en_end_edge_bolt();
    inner.e1 = no_distance;
    inner.p1 = 70;
    inner.lc = 70 - 22;
    CHECK(as_printed(bearing_en(inner, 10, 490, 800, a).value, 158878.8, 1));
    // A tight edge distance e2 = 25 governs k1: 2.8·25/22 − 1.7 = 1.481818;
    // Fb,Rd = 1.481818·0.606061·98 000/1.25 = 0.898072·78 400 = 70 408.8 N.
    BoltClearances tight = en_end_edge_bolt();
    tight.e2 = 25;
    CHECK(as_printed(bearing_en(tight, 10, 490, 800, a).value, 70408.8, 1));
    // The user's alpha_b = 0.5 limits αb below the geometry's 0.606061:
    // 2.5·0.5·98 000/1.25 = 98 000 N.
    a.alpha_b = 0.5;
    CHECK(bearing_en(en_end_edge_bolt(), 10, 490, 800, a).value == approx(98000, 1e-12));
    // Without the bolt grade the fub/fu term is left out (it would not
    // govern here) and the formula says so.
    a.alpha_b = 1.0;
    const Capacity no_grade = bearing_en(en_end_edge_bolt(), 10, 490, 0, a);
    CHECK(no_grade.value == approx(end.value, 1e-12));
    CHECK(no_grade.formula.find("bolt grade not given") != std::string::npos);
    // fub/fu governs αb for a weak bolt: fub = 400 → 400/490 = 0.816 > 0.606,
    // still αd; an inner bolt with p1 = 100: αd = 100/66 − 0.25 = 1.265 → αb
    // = min(1.265, 0.8163, 1) = 0.816327: 2.5·0.816327·98 000/1.25 = 160 000 N.
    inner.p1 = 100;
    CHECK(bearing_en(inner, 10, 490, 400, a).value == approx(160000, 1e-12));
}

TEST_CASE("block tearing, EN 1993-1-8 §3.10.2 form: hand example") {
    // Same plate (t = 10, fy = 355, fu = 490, d0 = 22), the block between
    // the two lines: Anv = 2·(e1 + 2 p1 − 2.5 d0)·t = 2·(40 + 140 − 55)·10
    // = 2500 mm²; Ant = (p2 − d0)·t = (70 − 22)·10 = 480 mm².
    // Concentric (Eq. 3.9): 490·480/1.25 + 355·2500/(√3·1.0)
    //   = 188 160 + 887 500/1.7320508 = 188 160 + 512 398.4 = 700 558.4 N.
    // Eccentric (Eq. 3.10): 0.5·188 160 + 512 398.4 = 606 478.4 N.
    const BlockShearAreas a{2 * 180.0 * 10, 2500, 700, 480};
    CHECK(as_printed(block_shear_en(a, 355, 490, 1.0, 1.0, 1.25).value, 700558.4, 1));
    CHECK(as_printed(block_shear_en(a, 355, 490, 0.5, 1.0, 1.25).value, 606478.4, 1));
    CHECK(block_shear_en(a, 355, 490, 1.0, 1.0, 1.25).method == "EN 1993-1-8 §3.10.2 form");
}

TEST_CASE("block shear forms: the user's style picks the row, Ubs only lowers the tension term") {
    model::Material m;
    m.Fy = 50 * ksi;
    m.Fu = 65 * ksi;
    model::BlockShearAllowable allow; // factor style, φ 0.75, Ubs 1.0
    allow.resistance_factor = 1.0;
    // Uniform tension: Ubs 1 → 276.25 kips (REFERENCES); the EN form is the
    // information row.
    TwoForms f = block_shear_forms(reference_areas(), reference_areas(), true, m, allow);
    CHECK(f.chosen.value / kip == approx(276.25, 1e-12));
    CHECK(f.other.method == "EN 1993-1-8 §3.10.2 form");
    // Non-uniform tension on the path: Ubs 0.5 → 241.71875 (hand, above).
    f = block_shear_forms(reference_areas(), reference_areas(), false, m, allow);
    CHECK(f.chosen.value / kip == approx(241.71875, 1e-12));
    // Partial style: the EN form becomes the row.
    allow.style = model::BlockShearAllowable::Style::partial;
    f = block_shear_forms(reference_areas(), reference_areas(), true, m, allow);
    CHECK(f.chosen.method == "EN 1993-1-8 §3.10.2 form");
    CHECK(f.other.method == "AISC 360-16 §J4.3 form");
}

TEST_CASE("Thornton slenderness: the REFERENCES example, and both column curves") {
    // REFERENCES (Thornton 1984, memory there): t = 0.5 in, K = 0.65,
    // L = 12 in, E = 29 000 ksi → KL/r = 54.04, Fe = 98.01 ksi, each checked
    // to the digits printed. Three equal lengths average to 12 in.
    const double E = 29000 * ksi;
    const Slenderness s = thornton_slenderness({10 * in, 12 * in, 14 * in}, 0.5 * in, 0.65, E);
    CHECK(s.L / in == approx(12, 1e-12));
    CHECK(s.r / in == approx(0.5 / std::sqrt(12.0), 1e-12));
    CHECK(as_printed(s.KL_over_r, 54.04, 2));
    CHECK(as_printed(s.Fe / ksi, 98.01, 2));

    // AISC 360-16 §E3 with Fy = 50 ksi (hand): 54.04 ≤ 4.71·√(29 000/50)
    // = 113.4, so Fcr = 0.658^(50/98.0093)·50 = exp(0.510156·ln 0.658)·50 =
    // exp(−0.213525)·50 = 0.807731·50 = 40.387 ksi; per inch of width of a
    // 1/2 in plate, φ = 0.9: 0.9·40.387·0.5 = 18.17 kips.
    const Capacity aisc = buckling_aisc(s, 50 * ksi, E, 1 * in, 0.5 * in, 0.9);
    CHECK(as_printed(aisc.value / kip / (0.9 * 0.5), 40.387, 3));
    CHECK(aisc.method == "Thornton (1984) with AISC 360-16 §E3 column curve");
    // Past the limit the elastic branch 0.877 Fe applies: KL/r = 150
    // (L = 150·r/K): Fe = π²·29 000/150² = 286 220.5/22 500 = 12.7208 ksi, Fcr = 0.877·12.7208
    // = 11.1562 ksi.
    const Slenderness slender =
        thornton_slenderness({150 * (0.5 * in / std::sqrt(12.0)) / 0.65}, 0.5 * in, 0.65, E);
    CHECK(as_printed(buckling_aisc(slender, 50 * ksi, E, 1 * in, 0.5 * in, 1.0).value / kip / 0.5,
                     11.1562, 4));

    // EN 1993-1-1 §6.3.1.2 curve c (hand): λ̄ = √(50/98.0093) = 0.714252;
    // Φ = 0.5·(1 + 0.49·0.514252 + 0.510156) = 0.881070; χ = 1/(0.881070 +
    // √(0.776284 − 0.510156)) = 1/(0.881070 + 0.515876) = 0.715848;
    // χ·fy = 35.792 ksi (γM1 = 1.0).
    const Capacity en = buckling_en(s, 50 * ksi, 1 * in, 0.5 * in, 1.0);
    CHECK(as_printed(en.value / kip / 0.5, 35.792, 3));
    CHECK(en.method == "Thornton (1984) with EN 1993-1-1 §6.3.1 curve c");
    // A stocky strip (λ̄ ≤ 0.2) gets χ = 1: the squash load.
    const Slenderness stocky = thornton_slenderness({5}, 20, 0.65, 200000);
    CHECK(buckling_en(stocky, 355, 100, 20, 1.0).value == approx(355.0 * 100 * 20, 1e-12));
    // No length reaching the support: a clear error, not a division by zero.
    CHECK_THROWS_AS(thornton_slenderness({}, 20, 0.65, 200000), AnalysisError);
}

TEST_CASE("Whitmore yielding and section capacities: the user's allowable times the area") {
    // REFERENCES Whitmore width 13.392 in, t = 0.5 in, allowable 0.9·Fy
    // with Fy = 50 ksi: 45·13.392·0.5 = 301.32 kips (hand).
    model::Allowable fa{true, 45 * ksi, "0.9*Fy"};
    const Capacity w = whitmore_yield(fa, 13.392 * in, 0.5 * in);
    CHECK(w.value / kip == approx(301.32, 1e-12));
    CHECK(w.formula.find("0.9*Fy") != std::string::npos);
    model::Allowable net{true, 200, ""};
    const Capacity s = section_capacity(net, "net section tension", 150, 12);
    CHECK(s.value == approx(360000, 1e-15));
    CHECK(s.formula.rfind("net section tension", 0) == 0);
}
