// Block shear, bolt bearing and tear-out, Whitmore yielding and section
// capacities: each published formula written out once, with the numbers
// substituted into the formula text (the calc sheet prints it).
#include "check/limit_states.hpp"

#include <algorithm>
#include <cmath>
#include <fmt/format.h>

namespace lapwing::check {

namespace {

// Six significant figures: enough to redo a line by hand and match it.
std::string num(double x) {
    return fmt::format("{:.6g}", x);
}

bool is_distance(double x) {
    return std::isfinite(x);
}

} // namespace

// ---------------------------------------------------------------- block shear

Capacity block_shear_aisc(const BlockShearAreas& a, double Fy, double Fu, double Ubs, double phi) {
    const double rupture = 0.6 * Fu * a.Anv + Ubs * Fu * a.Ant;
    const double yielding = 0.6 * Fy * a.Agv + Ubs * Fu * a.Ant;
    const double Rn = std::min(rupture, yielding);
    Capacity c;
    c.value = phi * Rn;
    c.method = "AISC 360-16 §J4.3 form";
    c.formula = fmt::format(
        "Rn = min(0.6·Fu·Anv + Ubs·Fu·Ant, 0.6·Fy·Agv + Ubs·Fu·Ant) = min(0.6·{0}·{2} + "
        "{4}·{0}·{3}, 0.6·{1}·{5} + {4}·{0}·{3}) = min({6}, {7}) = {8} N; φRn = {9}·{8} = {10} N",
        num(Fu), num(Fy), num(a.Anv), num(a.Ant), num(Ubs), num(a.Agv), num(rupture), num(yielding),
        num(Rn), num(phi), num(c.value));
    return c;
}

Capacity block_shear_en(const BlockShearAreas& a, double fy, double fu, double tension_factor,
                        double gamma_M0, double gamma_M2) {
    const double tension = tension_factor * fu * a.Ant / gamma_M2;
    const double shear = fy * a.Anv / (std::sqrt(3.0) * gamma_M0);
    Capacity c;
    c.value = tension + shear;
    c.method = "EN 1993-1-8 §3.10.2 form";
    c.formula =
        fmt::format("Veff,Rd = k·fu·Ant/γM2 + fy·Anv/(√3·γM0) = {}·{}·{}/{} + {}·{}/(√3·{}) "
                    "= {} + {} = {} N",
                    num(tension_factor), num(fu), num(a.Ant), num(gamma_M2), num(fy), num(a.Anv),
                    num(gamma_M0), num(tension), num(shear), num(c.value));
    return c;
}

TwoForms block_shear_forms(const BlockShearAreas& aisc, const BlockShearAreas& en,
                           bool uniform_tension, const model::Material& m,
                           const model::BlockShearAllowable& allowable) {
    // Ubs = 1.0 where the tension stress is uniform, 0.5 where it is not
    // (AISC 360-16 Commentary §J4.3; EN 1993-1-8 §3.10.2(2) and (3)). The
    // user's Ubs can lower it for every path, never raise it.
    const double k = std::min(allowable.Ubs, uniform_tension ? 1.0 : 0.5);
    Capacity factor = block_shear_aisc(aisc, m.Fy, m.Fu, k, allowable.resistance_factor);
    Capacity partial = block_shear_en(en, m.Fy, m.Fu, k, allowable.gamma_M0, allowable.gamma_M2);
    if (allowable.style == model::BlockShearAllowable::Style::factor)
        return {std::move(factor), std::move(partial)};
    return {std::move(partial), std::move(factor)};
}

// ------------------------------------------------------ bolt bearing, tear-out

double bearing_stress(double force, double d, double t) {
    return std::abs(force) / (d * t);
}

Capacity bearing_aisc(double d, double t, double Fu, double bearing_factor, double phi) {
    const double Rn = bearing_factor * d * t * Fu;
    Capacity c;
    c.value = phi * Rn;
    c.method = "AISC 360-16 §J3.10 form";
    c.formula = fmt::format("bearing Rn = {}·d·t·Fu = {}·{}·{}·{} = {} N; φRn = {}·{} = {} N",
                            num(bearing_factor), num(bearing_factor), num(d), num(t), num(Fu),
                            num(Rn), num(phi), num(Rn), num(c.value));
    return c;
}

Capacity tearout_aisc(double lc, double t, double Fu, double tearout_factor, double phi) {
    const double Rn = tearout_factor * std::max(lc, 0.0) * t * Fu;
    Capacity c;
    c.value = phi * Rn;
    c.method = "AISC 360-16 §J3.10 form";
    c.formula = fmt::format("tear-out Rn = {}·lc·t·Fu = {}·{}·{}·{} = {} N; φRn = {}·{} = {} N",
                            num(tearout_factor), num(tearout_factor), num(lc), num(t), num(Fu),
                            num(Rn), num(phi), num(Rn), num(c.value));
    if (lc <= 0) c.formula += " (the hole meets the next hole or edge: no clear distance)";
    return c;
}

Capacity bearing_tearout_aisc(const BoltClearances& g, double t, double Fu,
                              const model::BearingAllowable& a) {
    const Capacity bearing = bearing_aisc(g.d, t, Fu, a.bearing_factor, a.resistance_factor);
    const Capacity tearout = tearout_aisc(g.lc, t, Fu, a.tearout_factor, a.resistance_factor);
    const bool tearout_governs = tearout.value < bearing.value;
    Capacity c = tearout_governs ? tearout : bearing;
    c.formula = fmt::format("min of {}; {} (lc to {}) → {} governs", bearing.formula,
                            tearout.formula, g.ahead.empty() ? "the next boundary" : g.ahead,
                            tearout_governs ? "tear-out" : "bearing");
    return c;
}

Capacity bearing_en(const BoltClearances& g, double t, double fu, double fub,
                    const model::BearingAllowable& a) {
    // αd: end bolts (the force runs to an edge) by e1, inner bolts by p1.
    const bool end_bolt = is_distance(g.e1);
    const double alpha_d =
        end_bolt ? g.e1 / (3.0 * g.d0) : (is_distance(g.p1) ? g.p1 / (3.0 * g.d0) - 0.25 : 1.0);
    const std::string alpha_d_text =
        end_bolt
            ? fmt::format("αd = e1/(3·d0) = {}/(3·{}) = {}", num(g.e1), num(g.d0), num(alpha_d))
        : is_distance(g.p1) ? fmt::format("αd = p1/(3·d0) − 1/4 = {}/(3·{}) − 0.25 = {}", num(g.p1),
                                          num(g.d0), num(alpha_d))
                            : std::string("αd: no edge or hole ahead, taken as 1");
    double alpha_b = std::min({alpha_d, 1.0, a.alpha_b});
    std::string alpha_b_text = fmt::format("αb = min(αd, 1.0, user {}", num(a.alpha_b));
    if (fub > 0) {
        alpha_b = std::min(alpha_b, fub / fu);
        alpha_b_text += fmt::format(", fub/fu = {}/{} = {}", num(fub), num(fu), num(fub / fu));
    } else {
        alpha_b_text += ", fub/fu left out: bolt grade not given";
    }
    alpha_b_text += fmt::format(") = {}", num(alpha_b));

    // k1: the e2 term for edge bolts, the p2 term where a neighbour is across.
    double k1 = std::min(2.5, a.k1);
    std::string k1_text = fmt::format("k1 = min(2.5, user {}", num(a.k1));
    if (is_distance(g.e2)) {
        k1 = std::min(k1, 2.8 * g.e2 / g.d0 - 1.7);
        k1_text += fmt::format(", 2.8·e2/d0 − 1.7 = 2.8·{}/{} − 1.7", num(g.e2), num(g.d0));
    }
    if (is_distance(g.p2)) {
        k1 = std::min(k1, 1.4 * g.p2 / g.d0 - 1.7);
        k1_text += fmt::format(", 1.4·p2/d0 − 1.7 = 1.4·{}/{} − 1.7", num(g.p2), num(g.d0));
    }
    k1_text += fmt::format(") = {}", num(k1));
    // A spacing so tight that k1 ≤ 0 is below Table 3.3's minimum: no capacity.
    const double k1_used = std::max(k1, 0.0);
    const double alpha_used = std::max(alpha_b, 0.0);

    Capacity c;
    c.value = g.hole_factor * k1_used * alpha_used * fu * g.d * t / a.gamma_M2;
    c.method = "EN 1993-1-8 Table 3.4 form";
    const std::string hole = g.hole_factor == 1.0 ? "" : fmt::format("{}·", num(g.hole_factor));
    c.formula = fmt::format(
        "{}; {}; {}; Fb,Rd = {}k1·αb·fu·d·t/γM2 = {}{}·{}·{}·{}·{}/{} = {} N", alpha_d_text,
        alpha_b_text, k1_text, g.hole_factor == 1.0 ? "" : "(hole factor)·", hole, num(k1_used),
        num(alpha_used), num(fu), num(g.d), num(t), num(a.gamma_M2), num(c.value));
    if (k1 <= 0 || alpha_b <= 0)
        c.formula += " (spacing below the EN 1993-1-8 Table 3.3 minimum: no bearing capacity)";
    return c;
}

TwoForms bearing_forms(const BoltClearances& g, double t, const model::Material& m, double fub,
                       const model::BearingAllowable& a) {
    Capacity factor = bearing_tearout_aisc(g, t, m.Fu, a);
    Capacity partial = bearing_en(g, t, m.Fu, fub, a);
    if (a.style == model::BearingAllowable::Style::factor)
        return {std::move(factor), std::move(partial)};
    return {std::move(partial), std::move(factor)};
}

// ------------------------------------------------------- Whitmore yielding

Capacity whitmore_yield(const model::Allowable& allowable, double Lw, double t) {
    Capacity c;
    c.value = allowable.value * Lw * t;
    c.method = "Whitmore (1952) section, user allowable";
    c.formula = fmt::format("Fa·Lw·t = {}{}·{}·{} = {} N", num(allowable.value),
                            allowable.source.empty() ? "" : " (" + allowable.source + ")", num(Lw),
                            num(t), num(c.value));
    return c;
}

// --------------------------------------------------- gross and net sections

Capacity section_capacity(const model::Allowable& allowable, const std::string& what, double length,
                          double t) {
    Capacity c;
    c.value = allowable.value * length * t;
    c.method = "user allowable × area";
    c.formula = fmt::format("{}: Fa·L·t = {}{}·{}·{} = {} N", what, num(allowable.value),
                            allowable.source.empty() ? "" : " (" + allowable.source + ")",
                            num(length), num(t), num(c.value));
    return c;
}

} // namespace lapwing::check
