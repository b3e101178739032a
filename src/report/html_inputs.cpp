// The sheet's "Resolved inputs": every value the run used, after parameters
// and expressions were resolved, in the user's units: parameters, material,
// plate, bolt groups, members and their forces per load case, supports,
// load cases and combinations, allowables, mesh settings.
#include "report/html_parts.hpp"
#include "report/text_format.hpp"

#include <fmt/format.h>

namespace lapwing::report {

std::string row(const std::vector<std::string>& cells, const char* cls) {
    std::string out = cls ? fmt::format("<tr class=\"{}\">", cls) : std::string("<tr>");
    for (const std::string& c : cells) out += c.starts_with("<td") ? c : "<td>" + c + "</td>";
    return out + "</tr>\n";
}

std::string header_row(const std::vector<std::string>& cells) {
    std::string out = "<thead><tr>";
    for (const std::string& c : cells) out += "<th>" + c + "</th>";
    return out + "</tr></thead>\n";
}

namespace {

std::string num(const std::string& text) {
    return "<td class=\"n\">" + text + "</td>";
}

} // namespace

std::string inputs_html(const check::CheckOutcome& o) {
    const model::Connection& c = o.connection;
    const UnitSystem u = c.units;
    const auto L = [&](double v) { return num(escape(with_unit(v, Quantity::length, u))); };
    const auto S = [&](double v) { return num(escape(with_unit(v, Quantity::stress, u))); };
    const auto F = [&](double v) { return num(escape(with_unit(v, Quantity::force, u))); };
    const auto M = [&](double v) { return num(escape(with_unit(v, Quantity::moment, u))); };
    std::string h = "<h2>Resolved inputs</h2>\n";
    h += fmt::format("<p>Unit system: <b>{}</b>. Every value below is the one the analysis used, "
                     "after parameters, expressions and overrides were resolved.</p>\n",
                     escape(name(u)));

    if (!c.parameters.empty()) {
        h += "<h3>Parameters</h3><table>" + header_row({"name", "value"});
        for (const auto& [key, value] : c.parameters)
            h += row({escape(key), num(fmt::format("{:.6g}", value))});
        h += "</table>\n";
    }
    h += "<h3>Material and plate</h3><table>" + header_row({"item", "value"});
    h += row({"grade", escape(c.material.grade)});
    h += row({"Young's modulus E", S(c.material.E)});
    h += row({"Poisson's ratio ν", num(fmt::format("{:.4g}", c.material.nu))});
    h += row({"yield stress Fy", S(c.material.Fy)});
    h += row({"tensile strength Fu", S(c.material.Fu)});
    h += row({"plate thickness", L(c.plate.thickness)});
    std::string corners;
    for (const model::Corner& k : c.plate.outline)
        corners +=
            fmt::format("{}({}, {}){}", corners.empty() ? "" : " ",
                        number(k.at.x, Quantity::length, u), number(k.at.y, Quantity::length, u),
                        k.kind == model::CornerKind::sharp
                            ? ""
                            : (k.kind == model::CornerKind::fillet ? " fillet " : " chamfer ") +
                                  number(k.size, Quantity::length, u));
    h += row({"outline corners (" + escape(unit(Quantity::length, u)) + ")", escape(corners)});
    h += row({"cut-outs", fmt::format("{}", c.plate.cutouts.size())});
    h += "</table>\n";

    if (!c.bolt_groups.empty()) {
        h += "<h3>Bolt groups</h3><table>" +
             header_row({"group", "origin", "axis", "rows × lines", "pitch", "gauge", "bolt",
                         "hole", "tie", "shear planes"});
        for (const model::BoltGroup& g : c.bolt_groups)
            h += row(
                {escape(g.name),
                 num(escape(fmt::format("({}, {})", number(g.origin.x, Quantity::length, u),
                                        number(g.origin.y, Quantity::length, u)))),
                 num(fmt::format("{:g}°", g.angle)),
                 num(fmt::format("{} × {}{}", g.rows, g.lines, g.stagger ? " staggered" : "")),
                 L(g.pitch), L(g.gauge), L(g.diameter),
                 num(escape(g.hole.length > g.hole.width
                                ? fmt::format("{} × {}", number(g.hole.width, Quantity::length, u),
                                              with_unit(g.hole.length, Quantity::length, u))
                                : with_unit(g.hole.width, Quantity::length, u))),
                 escape(model::word(model::tie_words, g.tie)),
                 num(fmt::format("{}", g.shear_planes))});
        h += "</table>\n";
    }
    if (!c.members.empty()) {
        h += "<h3>Members and their forces per load case</h3><table>" +
             header_row({"member", "carried by", "axis", "load case", "axial (+ tension)", "shear",
                         "moment"});
        for (const model::Member& m : c.members) {
            std::string by = m.bolt_group.empty() ? "welded edges" : "bolt group " + m.bolt_group;
            if (m.forces.empty())
                h += row({escape(m.name), escape(by), num(fmt::format("{:g}°", m.angle)), "—", "",
                          "", ""});
            for (const auto& [lc, f] : m.forces)
                h += row({escape(m.name), escape(by), num(fmt::format("{:g}°", m.angle)),
                          escape(lc), F(f.axial), F(f.shear), M(f.moment)});
        }
        h += "</table>\n";
    }
    h += "<h3>Supports</h3><table>" + header_row({"support", "kind", "where"});
    for (const model::Support& s : c.supports) {
        std::string where;
        if (s.kind == model::SupportKind::bolted)
            where = "bolt group " + s.bolt_group;
        else if (s.kind == model::SupportKind::symmetry)
            where = fmt::format(
                "line ({}, {}) to ({}, {})", number(s.line_from.x, Quantity::length, u),
                number(s.line_from.y, Quantity::length, u),
                number(s.line_to.x, Quantity::length, u), number(s.line_to.y, Quantity::length, u));
        else
            for (int e : s.edges)
                where += fmt::format("{}outline edge {}", where.empty() ? "" : ", ", e);
        h +=
            row({escape(s.name), escape(model::word(model::support_words, s.kind)), escape(where)});
    }
    h += "</table>\n";
    h += "<h3>Load cases and combinations</h3><table>" +
         header_row({"name", "description or factors"});
    for (const model::LoadCase& l : c.load_cases) h += row({escape(l.name), escape(l.description)});
    for (const model::Combination& k : c.combinations) {
        std::string f;
        for (const auto& [lc, factor] : k.factors)
            f += fmt::format("{}{:g} × {}", f.empty() ? "" : " + ", factor, lc);
        h += row({escape(k.name), escape(f)});
    }
    h += "</table>\n";
    h += "<h3>Allowables (capacities entered by the user)</h3><table>" +
         header_row({"allowable", "value", "as entered"});
    for (const model::AllowableEntry& e : model::allowable_entries) {
        const model::Allowable& a = c.allowables.*e.member;
        h +=
            row({escape(e.label),
                 a.given ? num(escape(with_unit(a.value, e.quantity, u)))
                         : std::string("<td class=\"muted\">not given (rows for information)</td>"),
                 escape(a.source)});
    }
    h += "</table>\n";
    h += "<h3>Mesh settings</h3><table>" + header_row({"setting", "value"});
    h += row({"element", escape(model::word(model::element_words, c.mesh.element))});
    h += row({"element size (as entered; 0 = automatic)", L(c.mesh.size)});
    h += row({"element size used", L(o.element_size)});
    h += row({"elements around each hole", num(fmt::format("{}", c.mesh.around_hole))});
    h += row({"element size next to holes", L(c.mesh.near_hole_size)});
    h += "</table>\n";
    return h;
}

} // namespace lapwing::report
