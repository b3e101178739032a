// [plate] (thickness, outline corners, cut-outs) and [[bolt_group]].
#include "input/sections.hpp"
#include "input/suggest.hpp"
#include "model/bolts.hpp"

#include <fmt/format.h>
#include <set>

namespace lapwing::input {

std::optional<int> read_edge(const Node& node, const std::string& key_path,
                             const model::Plate& plate, Context& context) {
    const int n = static_cast<int>(plate.outline.size());
    std::vector<std::string> names;
    for (const auto& c : plate.outline) {
        if (!c.edge_name.empty()) names.push_back(c.edge_name);
    }
    if (node.kind == Node::Kind::integer) {
        if (node.integer >= 0 && node.integer < n) return static_cast<int>(node.integer);
        context.report(
            node.origin, key_path,
            fmt::format("= {}: the outline has segments 0 to {} (segment i runs from corner i to "
                        "corner i+1)",
                        node.integer, n - 1));
        return std::nullopt;
    }
    if (node.kind == Node::Kind::string) {
        for (int i = 0; i < n; ++i) {
            if (plate.outline[static_cast<size_t>(i)].edge_name == node.text) return i;
        }
        context.report(node.origin, key_path,
                       fmt::format("= {}: no outline segment has that name{}{}", show(node),
                                   did_you_mean(node.text, names),
                                   names.empty() ? "; name segments with edge = \"...\" on a corner"
                                                 : "; named segments: " + one_of(names)));
        return std::nullopt;
    }
    context.report(
        node.origin, key_path,
        fmt::format("= {}: must name an outline segment, by its edge name in quotes or its "
                    "number (0 to {})",
                    show(node), n - 1));
    return std::nullopt;
}

void read_plate(Table& root, model::Plate& plate, PlateOrigins& origins) {
    Context& context = root.context();
    const size_t before = context.problems.size();
    Table t = root.table("plate", true);
    origins.plate = t.origin();
    if (!t.present()) {
        origins.plate_ok = false;
        return;
    }
    plate.thickness = t.number("thickness", Quantity::length, Bound::positive()).value_or(0.0);

    const Node* outline = t.get("outline");
    if (!outline) {
        t.missing("outline", "a list of at least 3 corners, e.g. [{ x = 0, y = 0 }, ...]");
    } else if (outline->kind != Node::Kind::array || outline->items.size() < 3) {
        context.report(outline->origin, t.path_of("outline"),
                       fmt::format("= {}: must list at least 3 corners {{ x = ..., y = ... }}",
                                   show(*outline)));
    } else if (outline->items.size() > max_polygon_points) {
        context.report(outline->origin, t.path_of("outline"),
                       fmt::format("lists {} corners: lapwing takes at most {} per outline",
                                   outline->items.size(), max_polygon_points));
    } else {
        std::set<std::string> edge_names;
        for (size_t i = 0; i < outline->items.size(); ++i) {
            const Node& item = outline->items[i];
            const std::string path = fmt::format("{}[{}]", t.path_of("outline"), i);
            if (item.kind != Node::Kind::table) {
                context.report(
                    item.origin, path,
                    fmt::format("= {}: a corner is written {{ x = 0, y = 0 }}", show(item)));
                continue;
            }
            Table c(&item, path, context);
            model::Corner corner;
            corner.at.x = c.number("x", Quantity::length, Bound::any()).value_or(0.0);
            corner.at.y = c.number("y", Quantity::length, Bound::any()).value_or(0.0);
            const Node* chamfer = c.get("chamfer");
            const Node* fillet = c.get("fillet");
            if (chamfer && fillet) {
                context.report(fillet->origin, c.path_of("fillet"),
                               "cannot go with chamfer on the same corner: choose one");
            } else if (chamfer || fillet) {
                corner.kind = chamfer ? model::CornerKind::chamfer : model::CornerKind::fillet;
                corner.size =
                    c.number(chamfer ? "chamfer" : "fillet", Quantity::length, Bound::positive())
                        .value_or(0.0);
            }
            corner.edge_name = c.text("edge", "").value_or("");
            if (!corner.edge_name.empty() && !edge_names.insert(corner.edge_name).second) {
                context.report(c.get("edge")->origin, c.path_of("edge"),
                               fmt::format("= \"{}\": another segment already has this name",
                                           corner.edge_name));
            }
            c.finish();
            plate.outline.push_back(corner);
            origins.corners.push_back(item.origin);
        }
    }

    for (auto& c : t.tables("cutout")) {
        model::Cutout cutout;
        cutout.name = c.text("name", "").value_or("");
        const Node* points = c.get("points");
        if (!points) {
            c.missing("points", "a list of at least 3 points [x, y]");
        } else if (points->kind != Node::Kind::array || points->items.size() < 3) {
            context.report(points->origin, c.path_of("points"),
                           fmt::format("= {}: must list at least 3 points [x, y]", show(*points)));
        } else if (points->items.size() > max_polygon_points) {
            context.report(points->origin, c.path_of("points"),
                           fmt::format("lists {} points: lapwing takes at most {} per cut-out",
                                       points->items.size(), max_polygon_points));
        } else {
            for (size_t i = 0; i < points->items.size(); ++i) {
                if (auto p = read_point(points->items[i],
                                        fmt::format("{}[{}]", c.path_of("points"), i), context))
                    cutout.points.push_back(*p);
            }
        }
        c.finish();
        plate.cutouts.push_back(cutout);
        origins.cutouts.push_back(c.origin());
    }
    t.finish();
    origins.plate_ok = context.problems.size() == before;
}

void read_bolt_groups(Table& root, model::Connection& connection, PlateOrigins& origins) {
    Context& context = root.context();
    const size_t before = context.problems.size();
    std::set<std::string> names;
    long n_bolts = 0;
    bool too_many_reported = false;
    for (auto& g : root.tables("bolt_group")) {
        model::BoltGroup group;
        group.name = g.text("name", std::nullopt).value_or("");
        if (!group.name.empty() && !names.insert(group.name).second) {
            g.report(g.get("name")->origin, g.path_of("name"),
                     fmt::format("= \"{}\": another bolt group already has this name", group.name));
        }
        group.origin = g.point("origin", std::nullopt).value_or(model::Point{});
        group.angle =
            g.number("angle", Quantity::none, Bound::range(-360.0, 360.0), 0.0).value_or(0.0);
        group.rows = g.whole("rows", 1, 100, 1).value_or(1);
        group.lines = g.whole("lines", 1, 100, 1).value_or(1);
        group.pitch = g.number("pitch", Quantity::length, Bound::positive(),
                               group.rows > 1 ? std::nullopt : std::optional(0.0))
                          .value_or(0.0);
        group.gauge = g.number("gauge", Quantity::length, Bound::positive(),
                               group.lines > 1 ? std::nullopt : std::optional(0.0))
                          .value_or(0.0);
        group.stagger = g.flag("stagger", false).value_or(false);
        if (group.stagger && (group.rows < 2 || group.lines < 2)) {
            g.report(g.get("stagger")->origin, g.path_of("stagger"),
                     "= true: a staggered pattern needs at least 2 rows and 2 lines");
        }
        group.diameter = g.number("diameter", Quantity::length, Bound::positive()).value_or(0.0);

        const auto kind = g.choice("hole", model::hole_kind_words, 0);
        const int default_rule = connection.units == UnitSystem::kip_in ? 1 : 0;
        const auto rule = g.choice("hole_rule", model::hole_rule_words, default_rule);
        const auto direction = g.choice("slot_direction", model::slot_direction_words, 0);
        group.hole = model::hole_from_rule(
            static_cast<model::HoleKind>(kind.value_or(0)),
            static_cast<model::HoleRule>(rule.value_or(default_rule)), group.diameter,
            static_cast<model::SlotDirection>(direction.value_or(0)));
        const bool slot = group.hole.kind == model::HoleKind::short_slot ||
                          group.hole.kind == model::HoleKind::long_slot;
        const Node* hole_diameter = g.get("hole_diameter");
        const Node* slot_width = g.get("slot_width");
        const Node* slot_length = g.get("slot_length");
        auto larger_than_bolt = [&](const char* key, double value, const Node* at) {
            if (group.diameter > 0.0 && value <= group.diameter) {
                g.report(at->origin, g.path_of(key),
                         fmt::format("= {}: must be larger than the bolt diameter {} {}", show(*at),
                                     from_internal(group.diameter, Quantity::length, context.units),
                                     unit_label(Quantity::length, context.units)));
            }
        };
        if (hole_diameter) {
            if (slot) {
                g.report(hole_diameter->origin, g.path_of("hole_diameter"),
                         "is for round holes: give slot_width and slot_length for a slot");
            } else if (auto d = g.number("hole_diameter", Quantity::length, Bound::positive())) {
                larger_than_bolt("hole_diameter", *d, hole_diameter);
                group.hole.width = group.hole.length = *d;
                group.hole.user_given = true;
            }
        }
        if ((slot_width || slot_length) && !slot) {
            const Node* at = slot_width ? slot_width : slot_length;
            g.report(
                at->origin, g.path_of(slot_width ? "slot_width" : "slot_length"),
                "is for slotted holes: set hole = \"short_slot\" or \"long_slot\", or remove it");
        } else if (slot) {
            if (slot_width) {
                if (auto w = g.number("slot_width", Quantity::length, Bound::positive())) {
                    larger_than_bolt("slot_width", *w, slot_width);
                    group.hole.width = *w;
                    group.hole.user_given = true;
                }
            }
            if (slot_length) {
                if (auto l = g.number("slot_length", Quantity::length, Bound::positive())) {
                    group.hole.length = *l;
                    group.hole.user_given = true;
                }
            }
            if (group.hole.length < group.hole.width && (slot_width || slot_length)) {
                const Node* at = slot_length ? slot_length : slot_width;
                g.report(
                    at->origin, g.path_of(slot_length ? "slot_length" : "slot_width"),
                    "makes the slot shorter than it is wide: slot_length must be ≥ slot_width");
            }
        }
        group.shear_planes = g.whole("shear_planes", 1, 4, 1).value_or(1);
        group.tie = static_cast<model::TieKind>(g.choice("tie", model::tie_words, 0).value_or(0));
        group.stiffness = static_cast<model::StiffnessKind>(
            g.choice("stiffness", model::stiffness_words, 0).value_or(0));
        const Node* spring = g.get("spring");
        if (group.stiffness == model::StiffnessKind::given) {
            group.spring =
                g.number("spring", Quantity::force_per_length, Bound::positive()).value_or(0.0);
        } else if (spring) {
            g.report(
                spring->origin, g.path_of("spring"),
                "is used only with stiffness = \"given\": remove it or set stiffness = \"given\"");
        }
        g.finish();
        // Refused here, before the pairwise hole checks and the mesher see
        // them: no connection plate has this many holes, and the refusal
        // names the group that crosses the limit.
        n_bolts += static_cast<long>(group.rows) * group.lines;
        if (n_bolts > max_bolts && !too_many_reported) {
            too_many_reported = true;
            g.report(g.origin(), g.path(),
                     fmt::format("brings the bolt count to {}: lapwing takes at most {} bolts in "
                                 "all (check rows and lines)",
                                 n_bolts, max_bolts));
        }
        connection.bolt_groups.push_back(group);
        origins.bolt_groups.push_back(g.origin());
    }
    origins.bolts_ok = context.problems.size() == before;
}

} // namespace lapwing::input
