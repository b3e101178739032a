// Check rows from the stress field: local peaks and weld forces against the
// user's allowables (section rows join once the section lines exist).
#include "check/evaluation.hpp"
#include "check/unit_text.hpp"

#include <fmt/format.h>

namespace lapwing::check {

namespace {

// "peak_von_mises = 0.9*Fy = 310.5 MPa": the key, what the user typed and
// its value, so the reviewer sees where the capacity came from.
std::string allowable_text(const char* key, const model::Allowable& a, Quantity quantity,
                           UnitSystem units) {
    if (!a.given) return fmt::format("{} not set: shown for information", key);
    const std::string value = value_text(a.value, quantity, units);
    if (a.source.empty()) return fmt::format("{} = {}", key, value);
    return fmt::format("{} = {} = {}", key, a.source, value);
}

CheckRow user_row(std::string id, Family family, std::string what, std::string where,
                  const std::string& load_case, const char* key, const model::Allowable& a,
                  Quantity quantity, double demand, UnitSystem units) {
    CheckRow r;
    r.id = std::move(id);
    r.family = family;
    r.what = std::move(what);
    r.where = std::move(where);
    r.load_case = load_case;
    r.method = "user allowable";
    r.formula = allowable_text(key, a, quantity, units);
    r.quantity = quantity;
    r.demand = demand;
    r.capacity = a.given ? a.value : 0.0;
    return r;
}

} // namespace

std::vector<CheckRow> stress_rows(const model::Connection& c, const Evaluation& e) {
    std::vector<CheckRow> rows;
    const model::Allowables& al = c.allowables;
    for (size_t k = 0; k < e.results.cases.size(); ++k) {
        const std::string& lc = e.results.cases[k].name;
        const PeakStress& p = e.peaks[k];
        rows.push_back(user_row(fmt::format("peak:{}", lc), Family::peak_stress,
                                "peak von Mises stress away from bolt holes (local, mesh "
                                "dependent)",
                                p.near_away, lc, "peak_von_mises", al.peak_von_mises,
                                Quantity::stress, p.von_mises_away, c.units));
        if (p.has_hole_zone) {
            CheckRow r = user_row(fmt::format("peak-at-holes:{}", lc), Family::peak_stress,
                                  "peak von Mises stress at bolt holes (elastic bearing peak, "
                                  "local, mesh dependent)",
                                  p.near_at_holes, lc, "peak_von_mises_at_bolt_holes",
                                  al.peak_von_mises_at_bolt_holes, Quantity::stress,
                                  p.von_mises_at_holes, c.units);
            if (!al.peak_von_mises_at_bolt_holes.given)
                r.formula += "; the bearing and tear-out rows check the bolt holes";
            rows.push_back(std::move(r));
        }
        // Sections: linearized stresses against the user's allowables; a
        // family left out of [allowables] gives no rows (the profiles and
        // resultants are still on the calc sheet).
        for (size_t s = 0; s < e.sections.size(); ++s) {
            const SectionLine& line = e.sections[s];
            const SectionStress& ss = e.section_stress[k][s];
            const auto add = [&](const char* id, const char* what, const char* key,
                                 const model::Allowable& a, double demand) {
                if (!a.given) return;
                rows.push_back(user_row(fmt::format("{}:{}:{}", id, line.id, lc), Family::section,
                                        what, line.label, lc, key, a, Quantity::stress, demand,
                                        c.units));
            };
            add("membrane", "membrane stress (linearized, largest over the pieces)",
                "section_membrane", al.section_membrane, ss.max_membrane);
            add("membrane-bending", "membrane + bending stress (linearized)",
                "membrane_plus_bending", al.membrane_plus_bending, ss.max_membrane_plus_bending);
            add("shear", "average shear stress along the line", "section_shear", al.section_shear,
                std::abs(ss.average_shear));
        }
        for (size_t w = 0; w < e.welds.size(); ++w) {
            const WeldLine& line = e.welds[w];
            const WeldForces& f = e.weld_forces[k][w];
            rows.push_back(user_row(fmt::format("{}:average:{}", line.id, lc), Family::weld,
                                    "weld force per length, average over the weld", line.label, lc,
                                    "weld_per_length", al.weld_per_length,
                                    Quantity::force_per_length, f.average, c.units));
            rows.push_back(user_row(fmt::format("{}:peak:{}", line.id, lc), Family::weld,
                                    "weld force per length, highest element-edge average (local)",
                                    fmt::format("{}, {} from its start", line.label,
                                                length_text(f.peak_s, c.units, true)),
                                    lc, "weld_per_length", al.weld_per_length,
                                    Quantity::force_per_length, f.peak_edge_average, c.units));
        }
    }
    return rows;
}

} // namespace lapwing::check
