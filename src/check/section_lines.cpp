// Section lines: the Whitmore construction at each member's group, net
// sections through every bolt row, the welded edges and the user's cuts,
// each clipped against the exact region boundary (lines and arcs).
#include "check/section_lines.hpp"

#include "check/line_clip.hpp"
#include "check/whitmore.hpp"
#include "core/error.hpp"
#include "geometry/region_boundary.hpp"
#include "model/bolts.hpp"

#include <algorithm>
#include <cmath>
#include <fmt/format.h>
#include <numbers>

namespace lapwing::check {

namespace {

using Eigen::Vector2d;

// The three boundaries a line is clipped against: the outline alone (the
// chord of a net section), the outline minus cut-outs (the extent of a
// Whitmore or user line) and the full region with holes (its material).
struct Boundaries {
    geometry::RegionBoundary outline, solid, full;
    double tolerance = 0;
    double size = 0; // bounding-box diagonal of the outline, mm
};

Boundaries boundaries_of(const geometry::PlateRegion& region) {
    Boundaries b;
    geometry::PlateRegion solid = region;
    solid.holes.clear();
    geometry::PlateRegion outline = solid;
    outline.cutouts.clear();
    b.full = geometry::build_region_boundary(region);
    b.solid = geometry::build_region_boundary(solid);
    b.outline = geometry::build_region_boundary(outline);
    b.tolerance = geometry::geometric_tolerance(region);
    Vector2d lo = Vector2d::Constant(INFINITY), hi = Vector2d::Constant(-INFINITY);
    for (const auto& v : region.outline) {
        lo = lo.cwiseMin(v.point);
        hi = hi.cwiseMax(v.point);
    }
    b.size = (hi - lo).norm();
    return b;
}

Vector2d unit_at(double angle_deg) {
    const double a = angle_deg * std::numbers::pi / 180.0;
    return {std::cos(a), std::sin(a)};
}

// Makes `line` run over [s_begin, s_end] of origin + s·direction and fills
// its material from the full region, as distances from the new `from`.
void set_extent(SectionLine& line, const Boundaries& b, const Vector2d& origin,
                const Vector2d& direction, double s_begin, double s_end) {
    line.from = origin + s_begin * direction;
    line.to = origin + s_end * direction;
    line.material.clear();
    for (const Interval& piece :
         pieces_inside(b.full, origin, direction, s_begin, s_end, b.tolerance))
        line.material.push_back({piece.begin - s_begin, piece.end - s_begin});
}

std::vector<Vector2d> centres(const model::BoltGroup& group) {
    std::vector<Vector2d> out;
    for (const auto& p : model::bolt_positions(group)) out.emplace_back(p.centre.x, p.centre.y);
    return out;
}

int group_index(const model::Connection& c, const std::string& name) {
    for (size_t g = 0; g < c.bolt_groups.size(); ++g)
        if (c.bolt_groups[g].name == name) return static_cast<int>(g);
    return -1;
}

[[noreturn]] void no_material(const std::string& key, const std::string& what) {
    throw InputError(Diagnostic{"", 0, 0, key, what, ""});
}

SectionLine whitmore_section(const model::Connection& c, const Boundaries& b, int m, int g) {
    const model::Member& member = c.members[static_cast<size_t>(m)];
    const model::BoltGroup& group = c.bolt_groups[static_cast<size_t>(g)];
    const WhitmoreLine w = whitmore_line(centres(group), member.angle);
    SectionLine line;
    line.id = "whitmore-" + member.name;
    line.kind = SectionKind::whitmore;
    line.label = fmt::format("Whitmore section of member {}", member.name);
    line.member = m;
    line.group = g;
    line.unclipped_length = w.width;
    line.whitmore_gauge = w.gauge;
    line.whitmore_length = w.length;
    const Vector2d direction = unit_at(member.angle + 90.0);
    // Only the part inside the outline and outside the cut-outs counts
    // (Whitmore 1952; common practice); holes on it are deducted below.
    const auto solid = pieces_inside(b.solid, w.from, direction, 0.0, w.width, b.tolerance);
    if (solid.empty())
        no_material(fmt::format("member[{}]", m),
                    fmt::format("(\"{}\"): the Whitmore line of bolt group \"{}\" lies outside "
                                "the plate",
                                member.name, group.name));
    set_extent(line, b, w.from, direction, solid.front().begin, solid.back().end);
    return line;
}

// One net section per bolt row: the chord of the outline through the row,
// normal to `axis_deg`, with holes and cut-outs removed. With a stagger the
// row's even lines fix the line (the odd ones sit half a pitch further on).
void net_sections(const model::BoltGroup& group, double axis_deg, const std::string& owner,
                  int member, int support, int g, const Boundaries& b,
                  std::vector<SectionLine>& out) {
    const auto positions = model::bolt_positions(group);
    const Vector2d direction = unit_at(axis_deg + 90.0);
    for (int row = 0; row < group.rows; ++row) {
        Vector2d sum(0, 0);
        int n = 0;
        for (const auto& p : positions) {
            if (p.row != row || (group.stagger && p.line % 2 == 1)) continue;
            sum += Vector2d(p.centre.x, p.centre.y);
            ++n;
        }
        const Vector2d at = sum / std::max(n, 1);
        const double reach = 4.0 * b.size + at.norm();
        const auto chords = pieces_inside(b.outline, at, direction, -reach, reach, b.tolerance);
        if (chords.empty()) continue; // a row outside the plate is reported by the region checks
        // The chord that holds the row (the outline may be non-convex), or
        // the nearest one.
        const Interval* chord = &chords.front();
        double best = INFINITY;
        for (const Interval& piece : chords) {
            const double gap = std::max({piece.begin, -piece.end, 0.0});
            if (gap < best) {
                best = gap;
                chord = &piece;
            }
        }
        SectionLine line;
        line.id = fmt::format("net-{}-row{}", owner, row + 1);
        line.kind = SectionKind::net;
        line.label =
            fmt::format("Net section of {} through bolt row {} of group {}",
                        member >= 0 ? "member " + owner : "support " + owner, row + 1, group.name);
        line.member = member;
        line.support = support;
        line.group = g;
        line.row = row;
        set_extent(line, b, at, direction, chord->begin, chord->end);
        line.unclipped_length = line.length();
        out.push_back(line);
    }
}

// The straight part of outline segment `edge` that is left after corner
// finishes and cut-outs, as a line along the outline direction.
SectionLine weld_section(const Boundaries& b, int edge, const std::string& key,
                         const std::string& owner, const std::string& label) {
    Vector2d origin(0, 0), direction(1, 0);
    std::vector<Interval> pieces;
    bool found = false;
    for (const auto& loop : b.full.loops) {
        for (const auto& curve : loop.curves) {
            if (curve.tag.kind != geometry::BoundaryKind::outline_edge || curve.tag.index != edge)
                continue;
            if (!found) {
                origin = curve.start;
                direction = (curve.end - curve.start).normalized();
                found = true;
            }
            pieces.push_back(
                {(curve.start - origin).dot(direction), (curve.end - origin).dot(direction)});
        }
    }
    if (!found)
        no_material(key,
                    fmt::format("(\"{}\"): outline edge {} is cut away entirely", owner, edge));
    std::sort(pieces.begin(), pieces.end(),
              [](const Interval& x, const Interval& y) { return x.begin < y.begin; });
    SectionLine line;
    line.kind = SectionKind::weld;
    line.label = label;
    const double s0 = pieces.front().begin;
    line.from = origin + s0 * direction;
    line.to = origin + pieces.back().end * direction;
    for (const Interval& p : pieces) {
        if (!line.material.empty() && p.begin - s0 - line.material.back().end <= b.tolerance)
            line.material.back().end = p.end - s0;
        else
            line.material.push_back({p.begin - s0, p.end - s0});
    }
    line.unclipped_length = line.length();
    return line;
}

std::string weld_id(const std::string& owner, size_t n_edges, int edge) {
    return n_edges == 1 ? "weld-" + owner : fmt::format("weld-{}-edge{}", owner, edge);
}

} // namespace

std::vector<SectionLine> make_section_lines(const model::Connection& c,
                                            const analysis::PlateLayout& layout) {
    const Boundaries b = boundaries_of(layout.region);
    std::vector<SectionLine> out;
    const auto n_members = static_cast<int>(c.members.size());
    const auto n_supports = static_cast<int>(c.supports.size());

    for (int m = 0; m < n_members; ++m) {
        const int g = group_index(c, c.members[static_cast<size_t>(m)].bolt_group);
        if (g >= 0) out.push_back(whitmore_section(c, b, m, g));
    }
    for (int m = 0; m < n_members; ++m) {
        const model::Member& member = c.members[static_cast<size_t>(m)];
        const int g = group_index(c, member.bolt_group);
        if (g >= 0)
            net_sections(c.bolt_groups[static_cast<size_t>(g)], member.angle, member.name, m, -1, g,
                         b, out);
    }
    for (int s = 0; s < n_supports; ++s) {
        const model::Support& support = c.supports[static_cast<size_t>(s)];
        const int g = group_index(c, support.bolt_group);
        if (support.kind != model::SupportKind::bolted || g < 0) continue;
        // A support has no member axis: the group's own axis orders its rows.
        const model::BoltGroup& group = c.bolt_groups[static_cast<size_t>(g)];
        net_sections(group, group.angle, support.name, -1, s, g, b, out);
    }
    for (int s = 0; s < n_supports; ++s) {
        const model::Support& support = c.supports[static_cast<size_t>(s)];
        if (support.kind != model::SupportKind::welded) continue;
        for (const int edge : support.edges) {
            SectionLine line =
                weld_section(b, edge, fmt::format("support[{}]", s), support.name,
                             fmt::format("Welded interface of support {} (outline edge {})",
                                         support.name, edge));
            line.id = weld_id(support.name, support.edges.size(), edge);
            line.support = s;
            out.push_back(line);
        }
    }
    for (int m = 0; m < n_members; ++m) {
        const model::Member& member = c.members[static_cast<size_t>(m)];
        for (const int edge : member.welded_edges) {
            SectionLine line = weld_section(
                b, edge, fmt::format("member[{}]", m), member.name,
                fmt::format("Welded edge of member {} (outline edge {})", member.name, edge));
            line.id = weld_id(member.name, member.welded_edges.size(), edge);
            line.member = m;
            out.push_back(line);
        }
    }
    for (size_t i = 0; i < c.section_lines.size(); ++i) {
        const model::SectionLine& cut = c.section_lines[i];
        const Vector2d from(cut.from.x, cut.from.y), to(cut.to.x, cut.to.y);
        const double length = (to - from).norm();
        const std::string name = cut.name.empty() ? std::to_string(i + 1) : cut.name;
        if (length <= b.tolerance)
            no_material(fmt::format("section[{}]", i), "has no length: from and to coincide");
        const Vector2d direction = (to - from) / length;
        const auto solid = pieces_inside(b.solid, from, direction, 0.0, length, b.tolerance);
        if (solid.empty())
            no_material(fmt::format("section[{}]", i),
                        fmt::format("(\"{}\"): the line from ({:g}, {:g}) to ({:g}, {:g}) mm "
                                    "does not cross the plate",
                                    name, from.x(), from.y(), to.x(), to.y()));
        SectionLine line;
        line.id = "user-" + name;
        line.kind = SectionKind::user;
        line.label = fmt::format("Cut line {}", name);
        set_extent(line, b, from, direction, solid.front().begin, solid.back().end);
        line.unclipped_length = length;
        out.push_back(line);
    }
    return out;
}

} // namespace lapwing::check

namespace lapwing::check {

const char* word(SectionKind kind) {
    switch (kind) {
    case SectionKind::whitmore:
        return "whitmore";
    case SectionKind::net:
        return "net";
    case SectionKind::weld:
        return "weld";
    case SectionKind::user:
        return "user";
    }
    return "?";
}

} // namespace lapwing::check
