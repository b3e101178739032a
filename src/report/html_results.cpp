// The sheet's "Results" per load case: applied load, support reactions and
// the equilibrium residual, peak stresses, the bolt-force table, section
// resultants and weld forces.
#include "report/html_parts.hpp"
#include "report/text_format.hpp"

#include <fmt/format.h>

namespace lapwing::report {

namespace {

std::string num(const std::string& text) {
    return "<td class=\"n\">" + text + "</td>";
}

} // namespace

std::string results_html(const check::CheckOutcome& o) {
    const model::Connection& c = o.connection;
    const UnitSystem u = c.units;
    const auto val = [&](double v, Quantity q) { return num(escape(number(v, q, u))); };
    const auto lbl = [&](const char* words, Quantity q) {
        return std::string(words) + " (" + escape(unit(q, u)) + ")";
    };
    std::string h = "<h2>Results</h2>\n";
    for (size_t k = 0; k < o.results.cases.size(); ++k) {
        const analysis::CaseResult& r = o.results.cases[k];
        h += fmt::format("<h3>{} {}</h3>\n", r.combination ? "Combination" : "Load case",
                         escape(r.name));
        h += "<table>" + header_row({"support", lbl("Fx", Quantity::force),
                                     lbl("Fy", Quantity::force), lbl("moment", Quantity::moment)});
        for (size_t s = 0; s < r.reactions.size(); ++s)
            h += row({escape(s < c.supports.size() ? c.supports[s].name : "?"),
                      val(r.reactions[s].force.x(), Quantity::force),
                      val(r.reactions[s].force.y(), Quantity::force),
                      val(r.reactions[s].moment, Quantity::moment)});
        h += row({"applied (members and edge loads)", val(r.applied_force.x(), Quantity::force),
                  val(r.applied_force.y(), Quantity::force),
                  val(r.applied_moment, Quantity::moment)});
        h += "</table>\n";
        h += fmt::format(
            "<p>Equilibrium residual |Σ applied + Σ reactions| / |Σ applied| = "
            "<b>{:.2e}</b>; solver residual {:.2e}{}.</p>\n",
            r.equilibrium_residual, r.solver_residual,
            r.contact_iterations > 0
                ? fmt::format("; bearing contact settled in {} passes", r.contact_iterations)
                : "");
        if (k < o.peaks.size()) {
            const check::PeakStress& p = o.peaks[k];
            const auto at = [&](const Eigen::Vector2d& x) {
                return fmt::format("({}, {})", number(x.x(), Quantity::length, u),
                                   number(x.y(), Quantity::length, u));
            };
            h += "<table>" +
                 header_row({"local peak (mesh dependent)", lbl("value", Quantity::stress),
                             lbl("at", Quantity::length)});
            h += row({"von Mises" + (p.near.empty() ? "" : ", " + escape(p.near)),
                      val(p.von_mises, Quantity::stress), escape(at(p.von_mises_at))});
            h += row({"von Mises away from bolt holes" +
                          (p.near_away.empty() ? "" : ", " + escape(p.near_away)),
                      val(p.von_mises_away, Quantity::stress), escape(at(p.von_mises_away_at))});
            if (p.has_hole_zone)
                h += row({fmt::format("von Mises at bolt holes (within {:.3g} diameters of "
                                      "the edge)",
                                      o.connection.allowables.peak.bolt_hole_zone) +
                              (p.near_at_holes.empty() ? "" : ", " + escape(p.near_at_holes)),
                          val(p.von_mises_at_holes, Quantity::stress),
                          escape(at(p.von_mises_at_holes_at))});
            h += row({"largest principal σ1", val(p.max_principal, Quantity::stress),
                      escape(at(p.max_principal_at))});
            h += row({"smallest principal σ2", val(p.min_principal, Quantity::stress),
                      escape(at(p.min_principal_at))});
            h += "</table>\n";
        }
        if (!r.bolts.empty()) {
            h += "<table>" +
                 header_row({"bolt", lbl("x", Quantity::length), lbl("y", Quantity::length),
                             lbl("Fx", Quantity::force), lbl("Fy", Quantity::force),
                             lbl("|F|", Quantity::force), "angle to axis"});
            for (const analysis::BoltForce& b : r.bolts) {
                std::string name = "?";
                Eigen::Vector2d at(0, 0);
                if (b.bolt >= 0 && static_cast<size_t>(b.bolt) < o.results.problem.bolts.size()) {
                    const analysis::BoltModel& m =
                        o.results.problem.bolts[static_cast<size_t>(b.bolt)];
                    at = m.centre;
                    if (m.group >= 0 && static_cast<size_t>(m.group) < c.bolt_groups.size())
                        name = fmt::format(
                            "{}[{}]", c.bolt_groups[static_cast<size_t>(m.group)].name, m.bolt);
                }
                h += row({escape(name), val(at.x(), Quantity::length),
                          val(at.y(), Quantity::length), val(b.force.x(), Quantity::force),
                          val(b.force.y(), Quantity::force), val(b.magnitude, Quantity::force),
                          num(fmt::format("{:.1f}°", b.angle_to_axis_deg))});
            }
            h += "</table>\n";
        }
        if (k < o.section_stress.size() && !o.section_stress[k].empty()) {
            h += "<table>" +
                 header_row({"section", lbl("N", Quantity::force), lbl("V", Quantity::force),
                             lbl("M", Quantity::moment), lbl("avg normal", Quantity::stress),
                             lbl("avg shear", Quantity::stress), lbl("membrane", Quantity::stress),
                             lbl("membrane + bending", Quantity::stress)});
            for (const check::SectionStress& s : o.section_stress[k]) {
                const bool known =
                    s.section >= 0 && static_cast<size_t>(s.section) < o.sections.size();
                h += row({escape(known ? o.sections[static_cast<size_t>(s.section)].id : "?"),
                          val(s.N, Quantity::force), val(s.V, Quantity::force),
                          val(s.M, Quantity::moment), val(s.average_normal, Quantity::stress),
                          val(s.average_shear, Quantity::stress),
                          val(s.max_membrane, Quantity::stress),
                          val(s.max_membrane_plus_bending, Quantity::stress)});
            }
            h += "</table>\n";
        }
        if (k < o.weld_forces.size() && !o.weld_forces[k].empty()) {
            h += "<table>" +
                 header_row({"weld line", lbl("resultant |R|", Quantity::force),
                             lbl("average", Quantity::force_per_length),
                             lbl("largest element-edge average", Quantity::force_per_length),
                             lbl("largest nodal", Quantity::force_per_length)});
            for (size_t w = 0; w < o.weld_forces[k].size(); ++w) {
                const check::WeldForces& f = o.weld_forces[k][w];
                h += row({escape(w < o.welds.size() ? o.welds[w].label : "?"),
                          val(f.resultant.norm(), Quantity::force),
                          val(f.average, Quantity::force_per_length),
                          val(f.peak_edge_average, Quantity::force_per_length),
                          val(f.peak, Quantity::force_per_length)});
            }
            h += "</table>\n";
        }
    }
    return h;
}

} // namespace lapwing::report
