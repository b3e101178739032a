// [allowables], [mesh], [[section]] and [report].
#include "input/sections.hpp"

#include <algorithm>
#include <fmt/format.h>
#include <set>

namespace lapwing::input {

namespace {

model::Allowable read_allowable(Table& t, const char* key, Quantity quantity) {
    model::Allowable a;
    const Node* n = t.get(key);
    if (!n) return a;
    if (auto v = t.number(key, quantity, Bound::positive())) {
        a.given = true;
        a.value = *v;
        a.source = n->kind == Node::Kind::string ? n->text : ""; // a plain number needs no source
    }
    return a;
}

} // namespace

void read_allowables(Table& root, model::Allowables& allowables) {
    Table t = root.table("allowables", true);
    for (const auto& entry : model::allowable_entries)
        allowables.*entry.member = read_allowable(t, entry.key, entry.quantity);

    const Bound factor = Bound::open_range(0.0, 1.0e3);
    const Bound reduction = Bound::range(0.0, 1.0); // resistance factors φ
    {
        Table b = t.table("bearing", false);
        auto& out = allowables.bearing;
        const model::BearingAllowable d;
        out.style = static_cast<model::BearingAllowable::Style>(
            b.choice("style", model::style_words, 0).value_or(0));
        out.bearing_factor = b.number("bearing_factor", Quantity::none, factor, d.bearing_factor)
                                 .value_or(d.bearing_factor);
        out.tearout_factor = b.number("tearout_factor", Quantity::none, factor, d.tearout_factor)
                                 .value_or(d.tearout_factor);
        out.resistance_factor =
            b.number("resistance_factor", Quantity::none, reduction, d.resistance_factor)
                .value_or(d.resistance_factor);
        out.k1 = b.number("k1", Quantity::none, factor, d.k1).value_or(d.k1);
        out.alpha_b = b.number("alpha_b", Quantity::none, Bound::range(0.0, 1.0), d.alpha_b)
                          .value_or(d.alpha_b);
        out.gamma_M2 = b.number("gamma_M2", Quantity::none, Bound::range(1.0, 10.0), d.gamma_M2)
                           .value_or(d.gamma_M2);
        b.finish();
    }
    {
        Table b = t.table("block_shear", false);
        auto& out = allowables.block_shear;
        const model::BlockShearAllowable d;
        out.style = static_cast<model::BlockShearAllowable::Style>(
            b.choice("style", model::style_words, 0).value_or(0));
        out.resistance_factor =
            b.number("resistance_factor", Quantity::none, reduction, d.resistance_factor)
                .value_or(d.resistance_factor);
        out.Ubs = b.number("Ubs", Quantity::none, Bound::range(0.0, 1.0), d.Ubs).value_or(d.Ubs);
        out.gamma_M0 = b.number("gamma_M0", Quantity::none, Bound::range(1.0, 10.0), d.gamma_M0)
                           .value_or(d.gamma_M0);
        out.gamma_M2 = b.number("gamma_M2", Quantity::none, Bound::range(1.0, 10.0), d.gamma_M2)
                           .value_or(d.gamma_M2);
        b.finish();
    }
    {
        Table b = t.table("whitmore_buckling", false);
        auto& out = allowables.whitmore_buckling;
        const model::WhitmoreBuckling d;
        // K outside 0.3–2.1 is almost surely a typing slip (common practice: 0.5–0.65 for gussets).
        out.K = b.number("K", Quantity::none, Bound::range(0.3, 2.1), d.K).value_or(d.K);
        out.resistance_factor =
            b.number("resistance_factor", Quantity::none, reduction, d.resistance_factor)
                .value_or(d.resistance_factor);
        b.finish();
    }
    {
        Table b = t.table("peak", false);
        const model::PeakZones d;
        // Beyond two diameters the zone would swallow whole bolt patterns
        // and the corners next to them.
        allowables.peak.bolt_hole_zone =
            b.number("bolt_hole_zone", Quantity::none, Bound::range(0.0, 2.0), d.bolt_hole_zone)
                .value_or(d.bolt_hole_zone);
        b.finish();
    }
    t.finish();
}

void read_mesh_and_report(Table& root, model::Connection& connection) {
    {
        Table t = root.table("mesh", false);
        auto& mesh = connection.mesh;
        mesh.element = static_cast<model::ElementChoice>(
            t.choice("element", model::element_words, 2).value_or(2));
        // Without a size, one plate thickness is a reasonable first mesh
        // for a plate whose holes are a few thicknesses across (common practice).
        const double fallback =
            connection.plate.thickness > 0.0 ? connection.plate.thickness : 10.0;
        mesh.size =
            t.number("size", Quantity::length, Bound::positive(), fallback).value_or(fallback);
        mesh.around_hole = t.whole("around_hole", 8, 256, 16).value_or(16);
        mesh.near_hole_size =
            t.number("near_hole_size", Quantity::length, Bound::positive(), mesh.size / 2)
                .value_or(mesh.size / 2);
        if (const Node* n = t.get("near_hole_size"); n && mesh.near_hole_size > mesh.size) {
            t.report(n->origin, t.path_of("near_hole_size"),
                     fmt::format("= {}: must not exceed the element size {} {}", show(*n),
                                 from_internal(mesh.size, Quantity::length, connection.units),
                                 unit_label(Quantity::length, connection.units)));
        }
        t.finish();
    }
    std::set<std::string> names;
    for (auto& t : root.tables("section")) {
        model::SectionLine s;
        s.name = t.text("name", std::nullopt).value_or("");
        if (!s.name.empty() && !names.insert(s.name).second) {
            t.report(t.get("name")->origin, t.path_of("name"),
                     fmt::format("= \"{}\": another section already has this name", s.name));
        }
        s.from = t.point("from", std::nullopt).value_or(model::Point{});
        s.to = t.point("to", std::nullopt).value_or(model::Point{});
        if (t.get("from") && t.get("to") && s.from == s.to) {
            t.report(t.get("to")->origin, t.path_of("to"),
                     "is the same point as from: a section needs two points");
        }
        t.finish();
        connection.section_lines.push_back(s);
    }
    {
        Table t = root.table("report", false);
        auto& report = connection.report;
        const std::vector<std::string> known{"html", "json", "vtu", "csv"};
        if (const Node* f = t.get("formats")) {
            report.formats.clear();
            if (f->kind != Node::Kind::array) {
                t.report(f->origin, t.path_of("formats"),
                         fmt::format("= {}: must be a list, e.g. [\"html\", \"json\"]", show(*f)));
            } else {
                for (size_t i = 0; i < f->items.size(); ++i) {
                    const Node& item = f->items[i];
                    if (item.kind == Node::Kind::string &&
                        std::find(known.begin(), known.end(), item.text) != known.end()) {
                        report.formats.push_back(item.text);
                    } else {
                        t.report(item.origin, fmt::format("{}[{}]", t.path_of("formats"), i),
                                 fmt::format("= {}: must be \"html\", \"json\", \"vtu\" or \"csv\"",
                                             show(item)));
                    }
                }
            }
        }
        report.figures = t.flag("figures", true).value_or(true);
        report.deformed_scale =
            t.number("deformed_scale", Quantity::none, Bound::non_negative(), 0.0).value_or(0.0);
        t.finish();
    }
}

} // namespace lapwing::input
