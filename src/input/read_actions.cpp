// [[load_case]], [[member]], [[support]], [[edge_load]], [[combination]]:
// what acts on the plate and what holds it, with their cross-references.
#include "input/sections.hpp"
#include "input/suggest.hpp"

#include <algorithm>
#include <fmt/format.h>
#include <map>
#include <set>

namespace lapwing::input {

namespace {

std::vector<std::string> case_names(const model::Connection& c) {
    std::vector<std::string> out;
    for (const auto& lc : c.load_cases) out.push_back(lc.name);
    return out;
}

std::vector<std::string> group_names(const model::Connection& c) {
    std::vector<std::string> out;
    for (const auto& g : c.bolt_groups) out.push_back(g.name);
    return out;
}

// A name that must be one of `names`; reports "no X named ..." otherwise.
bool check_reference(const Node& node, const std::string& path,
                     const std::vector<std::string>& names, const char* what, Context& context) {
    if (node.kind == Node::Kind::string &&
        std::find(names.begin(), names.end(), node.text) != names.end())
        return true;
    context.report(
        node.origin, path,
        fmt::format("= {}: there is no {} of that name{}; defined: {}", show(node), what,
                    node.kind == Node::Kind::string ? did_you_mean(node.text, names) : "",
                    names.empty() ? "none" : one_of(names)));
    return false;
}

std::vector<int> read_edges(Table& t, const char* key, const model::Plate& plate) {
    std::vector<int> edges;
    const Node* n = t.get(key);
    if (!n) {
        t.missing(key, "a list of outline segments, by edge name or number");
        return edges;
    }
    if (n->kind != Node::Kind::array || n->items.empty()) {
        t.report(n->origin, t.path_of(key),
                 fmt::format("= {}: must be a list of outline segments, e.g. [\"beam_flange\"]",
                             show(*n)));
        return edges;
    }
    for (size_t i = 0; i < n->items.size(); ++i) {
        if (auto e = read_edge(n->items[i], fmt::format("{}[{}]", t.path_of(key), i), plate,
                               t.context()))
            edges.push_back(*e);
    }
    return edges;
}

void read_load_cases(Table& root, model::Connection& connection) {
    std::set<std::string> seen;
    for (auto& t : root.tables("load_case")) {
        model::LoadCase lc;
        lc.name = t.text("name", std::nullopt).value_or("");
        lc.description = t.text("description", "").value_or("");
        if (!lc.name.empty() && !seen.insert(lc.name).second) {
            t.report(t.get("name")->origin, t.path_of("name"),
                     fmt::format("= \"{}\": another load case already has this name", lc.name));
        }
        t.finish();
        connection.load_cases.push_back(lc);
    }
    if (connection.load_cases.empty()) {
        root.report(root.origin(), "load_case",
                    "is missing: at least one [[load_case]] with a name is required");
    }
}

void read_members(Table& root, model::Connection& connection) {
    std::set<std::string> seen;
    const auto cases = case_names(connection);
    const auto groups = group_names(connection);
    for (auto& t : root.tables("member")) {
        model::Member m;
        m.name = t.text("name", std::nullopt).value_or("");
        if (!m.name.empty() && !seen.insert(m.name).second) {
            t.report(t.get("name")->origin, t.path_of("name"),
                     fmt::format("= \"{}\": another member already has this name", m.name));
        }
        const Node* group = t.get("bolt_group");
        const Node* welded = t.get("welded_edges");
        if (group && welded) {
            t.report(
                welded->origin, t.path_of("welded_edges"),
                "cannot go with bolt_group: a member is carried by bolts or by welds, not both");
        } else if (group) {
            if (check_reference(*group, t.path_of("bolt_group"), groups, "bolt group", t.context()))
                m.bolt_group = group->text;
        } else if (welded) {
            m.welded_edges = read_edges(t, "welded_edges", connection.plate);
        } else {
            t.missing("bolt_group",
                      "name the bolt group that carries the member (or give welded_edges)");
        }
        m.work_point = t.point("work_point", std::nullopt).value_or(model::Point{});
        m.angle = t.number("angle", Quantity::none, Bound::range(-360.0, 360.0)).value_or(0.0);
        m.ply_thickness = t.number("ply_thickness", Quantity::length, Bound::positive(),
                                   connection.plate.thickness)
                              .value_or(0.0);
        m.ply_modulus =
            t.number("ply_modulus", Quantity::stress, Bound::positive(), connection.material.E)
                .value_or(0.0);
        Table forces = t.table("forces", true);
        if (forces.present()) {
            for (const auto& [name, node] : t.get("forces")->entries) {
                const std::string path = forces.path_of(name);
                forces.get(name);
                if (std::find(cases.begin(), cases.end(), name) == cases.end()) {
                    t.report(node.origin, path,
                             fmt::format("names no load case{}; defined: {}",
                                         did_you_mean(name, cases),
                                         cases.empty() ? "none" : one_of(cases)));
                    continue;
                }
                if (node.kind != Node::Kind::table) {
                    t.report(
                        node.origin, path,
                        fmt::format(
                            "= {}: must be a table {{ axial = ..., shear = ..., moment = ... }}",
                            show(node)));
                    continue;
                }
                Table f(&node, path, t.context());
                model::MemberForces mf;
                mf.axial = f.number("axial", Quantity::force, Bound::any(), 0.0).value_or(0.0);
                mf.shear = f.number("shear", Quantity::force, Bound::any(), 0.0).value_or(0.0);
                mf.moment = f.number("moment", Quantity::moment, Bound::any(), 0.0).value_or(0.0);
                mf.moment_point = f.point("about", m.work_point).value_or(m.work_point);
                f.finish();
                m.forces[name] = mf;
            }
        }
        t.finish();
        connection.members.push_back(m);
    }
}

void read_supports(Table& root, model::Connection& connection) {
    const auto groups = group_names(connection);
    for (auto& t : root.tables("support")) {
        model::Support s;
        s.name = t.text("name", "").value_or("");
        const auto kind = t.choice("kind", {"welded", "bolted", "symmetry"}, std::nullopt);
        const Node* edges = t.get("edges");
        const Node* group = t.get("bolt_group");
        const Node* line = t.get("line");
        if (kind) s.kind = static_cast<model::SupportKind>(*kind);
        auto not_here = [&](const Node* n, const char* key, const char* needs) {
            if (n)
                t.report(n->origin, t.path_of(key),
                         fmt::format("is used only with kind = \"{}\"", needs));
        };
        if (kind && s.kind == model::SupportKind::welded) {
            s.edges = read_edges(t, "edges", connection.plate);
            not_here(group, "bolt_group", "bolted");
            not_here(line, "line", "symmetry");
        } else if (kind && s.kind == model::SupportKind::bolted) {
            if (!group)
                t.missing("bolt_group", "the bolt group fixed to the support");
            else if (check_reference(*group, t.path_of("bolt_group"), groups, "bolt group",
                                     t.context()))
                s.bolt_group = group->text;
            not_here(edges, "edges", "welded");
            not_here(line, "line", "symmetry");
        } else if (kind) {
            if (!line) {
                t.missing("line", "two points [[x1, y1], [x2, y2]] on the symmetry line");
            } else if (line->kind != Node::Kind::array || line->items.size() != 2) {
                t.report(line->origin, t.path_of("line"),
                         fmt::format("= {}: must be two points [[x1, y1], [x2, y2]]", show(*line)));
            } else {
                const auto a = read_point(line->items[0], t.path_of("line") + "[0]", t.context());
                const auto b = read_point(line->items[1], t.path_of("line") + "[1]", t.context());
                if (a && b && *a == *b) {
                    t.report(line->origin, t.path_of("line"),
                             "has two equal points: they must differ");
                }
                s.line_from = a.value_or(model::Point{});
                s.line_to = b.value_or(model::Point{});
            }
            not_here(edges, "edges", "welded");
            not_here(group, "bolt_group", "bolted");
        }
        t.finish();
        connection.supports.push_back(s);
    }
}

void read_edge_loads(Table& root, model::Connection& connection) {
    const auto cases = case_names(connection);
    for (auto& t : root.tables("edge_load")) {
        model::EdgeLoad load;
        if (const Node* e = t.get("edge")) {
            load.edge = read_edge(*e, t.path_of("edge"), connection.plate, t.context()).value_or(0);
        } else {
            t.missing("edge", "the outline segment loaded, by edge name or number");
        }
        if (const Node* lc = t.get("load_case")) {
            if (check_reference(*lc, t.path_of("load_case"), cases, "load case", t.context()))
                load.load_case = lc->text;
        } else {
            t.missing("load_case", "the load case this load belongs to");
        }
        const Node* traction = t.get("traction");
        const Node* total = t.get("total");
        if (traction && total) {
            t.report(total->origin, t.path_of("total"),
                     "cannot go with traction: give one of them");
        } else if (!traction && !total) {
            t.missing("traction",
                      "give traction = [qx, qy] (force per length) or total = [Fx, Fy]");
        } else {
            const Node& v = traction ? *traction : *total;
            const std::string path = t.path_of(traction ? "traction" : "total");
            const Quantity q = traction ? Quantity::force_per_length : Quantity::force;
            load.total = total != nullptr;
            if (v.kind != Node::Kind::array || v.items.size() != 2) {
                t.report(v.origin, path,
                         fmt::format("= {}: must be two components [x, y]", show(v)));
            } else {
                load.fx = read_number(v.items[0], path + "[0]", q, Bound::any(), t.context())
                              .value_or(0.0);
                load.fy = read_number(v.items[1], path + "[1]", q, Bound::any(), t.context())
                              .value_or(0.0);
            }
        }
        t.finish();
        connection.edge_loads.push_back(load);
    }
}

void read_combinations(Table& root, model::Connection& connection) {
    const auto cases = case_names(connection);
    std::set<std::string> seen(cases.begin(), cases.end());
    for (auto& t : root.tables("combination")) {
        model::Combination c;
        c.name = t.text("name", std::nullopt).value_or("");
        if (!c.name.empty() && !seen.insert(c.name).second) {
            t.report(
                t.get("name")->origin, t.path_of("name"),
                fmt::format("= \"{}\": a load case or combination already has this name", c.name));
        }
        Table f = t.table("factors", true);
        if (f.present()) {
            for (const auto& [name, node] : t.get("factors")->entries) {
                f.get(name);
                if (std::find(cases.begin(), cases.end(), name) == cases.end()) {
                    t.report(node.origin, f.path_of(name),
                             fmt::format("names no load case{}; defined: {}",
                                         did_you_mean(name, cases),
                                         cases.empty() ? "none" : one_of(cases)));
                    continue;
                }
                if (auto v = read_number(node, f.path_of(name), Quantity::none, Bound::any(),
                                         t.context()))
                    c.factors[name] = *v;
            }
            if (c.factors.empty())
                f.report(f.origin(), f.path_of(""), "is empty: give at least one factor");
        }
        t.finish();
        connection.combinations.push_back(c);
    }
}

// Each bolt group carries one member or is fixed to one support; a group
// that does both (or two members) is a modelling mistake.
void check_group_use(Table& root, const model::Connection& connection) {
    std::map<std::string, std::string> user;
    auto claim = [&](const std::string& group, const std::string& who) {
        if (group.empty()) return;
        auto [it, fresh] = user.emplace(group, who);
        if (!fresh) {
            root.report(
                root.origin(), who,
                fmt::format("uses bolt group \"{}\", already used by {}: each group carries one "
                            "member or one support",
                            group, it->second));
        }
    };
    for (size_t i = 0; i < connection.members.size(); ++i)
        claim(connection.members[i].bolt_group, fmt::format("member[{}]", i));
    for (size_t i = 0; i < connection.supports.size(); ++i)
        claim(connection.supports[i].bolt_group, fmt::format("support[{}]", i));
}

} // namespace

void read_actions(Table& root, model::Connection& connection) {
    read_load_cases(root, connection);
    read_members(root, connection);
    read_supports(root, connection);
    read_edge_loads(root, connection);
    read_combinations(root, connection);
    check_group_use(root, connection);
}

} // namespace lapwing::input
