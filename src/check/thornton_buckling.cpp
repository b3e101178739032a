// Whitmore-section buckling (Thornton 1984): the slenderness of the
// equivalent column and the two published column curves applied to it.
#include "check/limit_states.hpp"
#include "core/error.hpp"

#include <algorithm>
#include <cassert>
#include <cmath>
#include <fmt/format.h>
#include <numbers>

namespace lapwing::check {

namespace {
std::string num(double x) {
    return fmt::format("{:.6g}", x);
}
} // namespace

Slenderness thornton_slenderness(const std::vector<double>& lengths, double t, double K, double E,
                                 UnitSystem units) {
    // BucklingLengths::reaching can be empty (no line reaches a support):
    // the caller must not ask for a column then; say so rather than divide by 0.
    if (lengths.empty())
        throw AnalysisError("Whitmore buckling (Thornton 1984): no length from the Whitmore line "
                            "reaches a supported edge");
    assert(lengths.size() <= 3);
    Slenderness s;
    double sum = 0;
    std::string terms;
    for (size_t i = 0; i < lengths.size(); ++i) {
        sum += lengths[i];
        terms += (i ? " + " : "") + num(from_internal(lengths[i], Quantity::length, units));
    }
    s.L = sum / static_cast<double>(lengths.size());
    s.r = t / std::sqrt(12.0); // I/A = (b t³/12)/(b t) for bending out of the plate's plane
    s.K = K;
    s.KL_over_r = K * s.L / s.r;
    s.Fe = std::numbers::pi * std::numbers::pi * E / (s.KL_over_r * s.KL_over_r);
    // The text in the template's units (K·L/r is the same number in any).
    const auto len = [&](double mm) { return num(from_internal(mm, Quantity::length, units)); };
    const auto str = [&](double mpa) { return num(from_internal(mpa, Quantity::stress, units)); };
    const auto L_unit = unit_label(Quantity::length, units);
    const auto S_unit = unit_label(Quantity::stress, units);
    s.lengths = fmt::format("L = ({})/{} = {} {}; r = t/√12 = {}/√12 = {} {}; K·L/r = {}·{}/{} = "
                            "{}; Fe = π²·E/(K·L/r)² = π²·{}/{}² = {} {}",
                            terms, lengths.size(), len(s.L), L_unit, len(t), len(s.r), L_unit,
                            num(K), len(s.L), len(s.r), num(s.KL_over_r), str(E), num(s.KL_over_r),
                            str(s.Fe), S_unit);
    return s;
}

Capacity buckling_aisc(const Slenderness& s, double Fy, double E, double Lw, double t, double phi) {
    // AISC 360-16 Eq. E3-2 (inelastic) and E3-3 (elastic), split at
    // KL/r = 4.71 √(E/Fy) (equivalently Fy/Fe = 2.25).
    const double limit = 4.71 * std::sqrt(E / Fy);
    const bool inelastic = s.KL_over_r <= limit;
    const double Fcr = inelastic ? std::pow(0.658, Fy / s.Fe) * Fy : 0.877 * s.Fe;
    const double area = Lw * t;
    Capacity c;
    c.value = phi * Fcr * area;
    c.method = "Thornton (1984) with AISC 360-16 §E3 column curve";
    const std::string curve =
        inelastic
            ? fmt::format("K·L/r = {} ≤ 4.71·√(E/Fy) = {}: Fcr = 0.658^(Fy/Fe)·Fy = "
                          "0.658^({}/{})·{} = {} MPa",
                          num(s.KL_over_r), num(limit), num(Fy), num(s.Fe), num(Fy), num(Fcr))
            : fmt::format("K·L/r = {} > 4.71·√(E/Fy) = {}: Fcr = 0.877·Fe = 0.877·{} = {} MPa",
                          num(s.KL_over_r), num(limit), num(s.Fe), num(Fcr));
    c.formula = fmt::format("{}; {}; φ·Fcr·Lw·t = {}·{}·{}·{} = {} N", s.lengths, curve, num(phi),
                            num(Fcr), num(Lw), num(t), num(c.value));
    return c;
}

Capacity buckling_en(const Slenderness& s, double fy, double Lw, double t, double gamma_M1) {
    // EN 1993-1-1 Eq. 6.47 and 6.49 with λ̄ = √(A fy / Ncr) = √(fy / Fe).
    constexpr double alpha = 0.49; // Table 6.1, curve c
    const double lambda = std::sqrt(fy / s.Fe);
    const double Phi = 0.5 * (1.0 + alpha * (lambda - 0.2) + lambda * lambda);
    const double chi = std::min(1.0, 1.0 / (Phi + std::sqrt(Phi * Phi - lambda * lambda)));
    const double area = Lw * t;
    Capacity c;
    c.value = chi * area * fy / gamma_M1;
    c.method = "Thornton (1984) with EN 1993-1-1 §6.3.1 curve c";
    c.formula = fmt::format("{}; λ̄ = √(fy/Fe) = √({}/{}) = {}; Φ = 0.5·(1 + 0.49·(λ̄ − 0.2) + λ̄²) "
                            "= {}; χ = min(1, 1/(Φ + √(Φ² − λ̄²))) = {}; Nb,Rd = χ·Lw·t·fy/γM1 = "
                            "{}·{}·{}·{}/{} = {} N",
                            s.lengths, num(fy), num(s.Fe), num(lambda), num(Phi), num(chi),
                            num(chi), num(Lw), num(t), num(fy), num(gamma_M1), num(c.value));
    return c;
}

TwoForms buckling_forms(const Slenderness& s, const model::Material& m, double Lw, double t,
                        const model::WhitmoreBuckling& buckling,
                        model::BlockShearAllowable::Style style, double gamma_M1) {
    Capacity factor = buckling_aisc(s, m.Fy, m.E, Lw, t, buckling.resistance_factor);
    Capacity partial = buckling_en(s, m.Fy, Lw, t, gamma_M1);
    if (style == model::BlockShearAllowable::Style::factor)
        return {std::move(factor), std::move(partial)};
    return {std::move(partial), std::move(factor)};
}

} // namespace lapwing::check
