// The sheet's check table, grouped by family in the table's own order (any
// family the check stage fills appears without change here), with a ratio
// bar per row and the governing row highlighted; and the mesh-convergence
// evidence.
#include "report/html_parts.hpp"
#include "report/text_format.hpp"

#include <algorithm>
#include <cmath>
#include <fmt/format.h>

namespace lapwing::report {

namespace {

std::string num(const std::string& text) {
    return "<td class=\"n\">" + text + "</td>";
}

// A bar 0..1.2 wide: the tick at 1.0 (83.3 % of the bar) is the capacity.
std::string ratio_bar(const check::CheckRow& r) {
    if (r.status == check::Status::info) return "<td class=\"muted\">—</td>";
    const double width = std::clamp(r.ratio / 1.2, 0.0, 1.0) * 100;
    return fmt::format("<td><div class=\"bar{}\"><i style=\"width:{:.1f}%\"></i><b></b></div></td>",
                       r.status == check::Status::fail ? " fail" : "", width);
}

// The published forms' worked formulas (src/check/limit_states.cpp) carry
// the program's internal N, mm and MPa, each number with its unit; outside
// N-mm the sheet says so once rather than leave a silent mix.
std::string formula_units(UnitSystem u) {
    if (u == UnitSystem::n_mm) return "";
    return "; the worked formulas of the published forms are evaluated in N, mm and MPa, the "
           "program's internal units, and say so beside each number (1 in = 25.4 mm, "
           "1 kip = 4.448 kN, 1 ksi = 6.895 MPa; NIST SP 811)";
}

} // namespace

std::string check_table_html(const check::CheckOutcome& o) {
    const check::CheckTable& t = o.table;
    const UnitSystem u = o.connection.units;
    std::string h = "<h2>Checks</h2>\n";
    if (t.rows.empty()) return h + "<p>The check stage produced no rows.</p>\n";
    h += "<p>Each row sets a demand from this analysis against a capacity: the user's allowable "
         "or a published form evaluated with the user's values, as named under <i>method</i>. "
         "Ratio = demand / capacity; the bar's tick marks 1.0. Rows without a capacity are for "
         "information.</p>\n";
    h += fmt::format("<p>Demands, capacities and locations are in {}{}.</p>\n",
                     escape(std::string(name(u))), formula_units(u));
    for (const check::Family family : check::all_families) {
        bool any = false;
        for (const check::CheckRow& r : t.rows) any = any || r.family == family;
        if (!any) continue;
        h += fmt::format("<h3>{}</h3><table class=\"checks\">", escape(check::title(family)));
        h += header_row({"id", "check", "where", "case", "method and formula", "demand", "capacity",
                         "ratio", "", "status"});
        for (size_t i = 0; i < t.rows.size(); ++i) {
            const check::CheckRow& r = t.rows[i];
            if (r.family != family) continue;
            const bool governing = static_cast<int>(i) == t.governing;
            const bool info = r.status == check::Status::info;
            h += row({escape(r.id) + (governing ? " <b>◀ governing</b>" : ""), escape(r.what),
                      escape(r.where), escape(r.load_case),
                      escape(r.method) + (r.formula.empty() ? ""
                                                            : "<br><span class=\"muted\">" +
                                                                  escape(r.formula) + "</span>"),
                      num(escape(with_unit(r.demand, r.quantity, u))),
                      info ? "<td class=\"muted\">not given</td>"
                           : num(escape(with_unit(r.capacity, r.quantity, u))),
                      info ? "<td></td>" : num(fmt::format("{:.3f}", r.ratio)), ratio_bar(r),
                      fmt::format("<td class=\"status-{0}\">{0}</td>", check::word(r.status))},
                     governing ? "governing" : nullptr);
        }
        h += "</table>\n";
    }
    return h;
}

std::string convergence_html(const check::CheckOutcome& o) {
    const check::Convergence& c = o.convergence;
    const UnitSystem u = o.connection.units;
    std::string h = "<h3>Mesh convergence</h3>\n";
    if (!c.done)
        return h + "<p><b>Not run</b> (single mesh): there is no evidence here that the values "
                   "have converged with the mesh. Run without <code>--single-mesh</code> before "
                   "relying on this sheet.</p>\n";
    h += fmt::format("<p>The model was solved again with half the element size everywhere: "
                     "{} → {} elements, {} → {} degrees of freedom, element size {} → {}. "
                     "Largest change of a reported value: <b>{:.1f} %</b>.</p>\n",
                     c.coarse_elements, c.fine_elements, c.coarse_dofs, c.fine_dofs,
                     escape(with_unit(c.coarse_size, Quantity::length, u)),
                     escape(with_unit(c.fine_size, Quantity::length, u)), 100 * c.largest_change());
    h += "<table>" + header_row({"value", "case", "this mesh", "finer mesh", "change"});
    for (const check::ConvergenceRow& r : c.rows)
        h += row({escape(r.quantity), escape(r.load_case),
                  num(escape(with_unit(r.coarse, r.unit, u))),
                  num(escape(with_unit(r.fine, r.unit, u))),
                  num(fmt::format("{:+.1f} %", 100 * r.change()))});
    return h + "</table>\n";
}

} // namespace lapwing::report
