// Geometry checks on reading: the outline is a simple counter-clockwise
// polygon whose corner finishes fit, every hole lies inside the plate, clear
// of the edges, the cut-outs and the other holes; then the region the mesher
// will see (outline minus cut-outs, which may cross the outline as copes and
// notches) goes through geometry::validate, whose findings are reported here
// with the template's file, line and key.
#include "geometry/region_boundary.hpp"
#include "input/sections.hpp"
#include "model/bolts.hpp"

#include <algorithm>
#include <cmath>
#include <cstdio>
#include <fmt/format.h>
#include <numbers>

namespace lapwing::input {

namespace {

using model::Point;
using Polygon = std::vector<Point>;

Point operator-(Point a, Point b) {
    return {a.x - b.x, a.y - b.y};
}
Point operator+(Point a, Point b) {
    return {a.x + b.x, a.y + b.y};
}
Point operator*(double s, Point a) {
    return {s * a.x, s * a.y};
}
double dot(Point a, Point b) {
    return a.x * b.x + a.y * b.y;
}
double cross(Point a, Point b) {
    return a.x * b.y - a.y * b.x;
}
double length(Point a) {
    return std::hypot(a.x, a.y);
}

double signed_area(const Polygon& p) {
    double a = 0.0;
    for (size_t i = 0; i < p.size(); ++i) a += cross(p[i], p[(i + 1) % p.size()]);
    return 0.5 * a;
}

// Proper crossing (touching at an end point does not count).
bool segments_cross(Point a, Point b, Point c, Point d) {
    const double d1 = cross(b - a, c - a), d2 = cross(b - a, d - a);
    const double d3 = cross(d - c, a - c), d4 = cross(d - c, b - c);
    return d1 * d2 < 0 && d3 * d4 < 0;
}

bool inside(const Polygon& p, Point q) { // even-odd rule
    bool in = false;
    for (size_t i = 0, j = p.size() - 1; i < p.size(); j = i++) {
        if ((p[i].y > q.y) != (p[j].y > q.y) &&
            q.x < (p[j].x - p[i].x) * (q.y - p[i].y) / (p[j].y - p[i].y) + p[i].x)
            in = !in;
    }
    return in;
}

double point_segment(Point p, Point a, Point b) {
    const Point ab = b - a;
    const double l2 = dot(ab, ab);
    const double s = l2 > 0 ? std::clamp(dot(p - a, ab) / l2, 0.0, 1.0) : 0.0;
    return length(p - (a + s * ab));
}

double segment_segment(Point a, Point b, Point c, Point d) {
    if (segments_cross(a, b, c, d)) return 0.0;
    return std::min({point_segment(a, c, d), point_segment(b, c, d), point_segment(c, a, b),
                     point_segment(d, a, b)});
}

double boundary_distance(const Polygon& p, Point a, Point b) {
    double best = 1e300;
    for (size_t i = 0; i < p.size(); ++i)
        best = std::min(best, segment_segment(a, b, p[i], p[(i + 1) % p.size()]));
    return best;
}

// Distance from a corner along each edge where its chamfer or fillet starts.
double corner_trim(const model::Corner& c, Point previous, Point next) {
    if (c.kind == model::CornerKind::chamfer) return c.size;
    if (c.kind == model::CornerKind::sharp) return 0.0;
    const Point u = previous - c.at, v = next - c.at;
    const double angle = std::acos(std::clamp(dot(u, v) / (length(u) * length(v)), -1.0, 1.0));
    return c.size / std::tan(angle / 2); // tangent length of a circle in a wedge
}

// The outline with chamfers cut and fillets drawn as 8-segment arcs.
Polygon finished_outline(const model::Plate& plate) {
    Polygon out;
    const size_t n = plate.outline.size();
    for (size_t i = 0; i < n; ++i) {
        const auto& c = plate.outline[i];
        const Point prev = plate.outline[(i + n - 1) % n].at, next = plate.outline[(i + 1) % n].at;
        const double trim = corner_trim(c, prev, next);
        if (trim <= 0.0) {
            out.push_back(c.at);
            continue;
        }
        const Point a = c.at + (trim / length(prev - c.at)) * (prev - c.at);
        const Point b = c.at + (trim / length(next - c.at)) * (next - c.at);
        if (c.kind == model::CornerKind::chamfer) {
            out.push_back(a);
            out.push_back(b);
            continue;
        }
        // Quadratic Bézier through the tangent points stays within the fillet's
        // wedge; close enough for containment checks.
        for (int k = 0; k <= 8; ++k) {
            const double s = k / 8.0;
            out.push_back((1 - s) * (1 - s) * a + 2 * s * (1 - s) * c.at + s * s * b);
        }
    }
    return out;
}

struct HoleShape {
    Point a, b;    // ends of the slot's centre line (equal for a round hole)
    double radius; // half the width
};

HoleShape hole_shape(const model::BoltGroup& g, Point centre) {
    const double half = 0.5 * (g.hole.length - g.hole.width);
    const double angle =
        (g.angle + (g.hole.direction == model::SlotDirection::across ? 90.0 : 0.0)) *
        std::numbers::pi / 180;
    const Point d{half * std::cos(angle), half * std::sin(angle)};
    return {centre - d, centre + d, 0.5 * g.hole.width};
}

// The plate as the mesher's region (as analysis::plate_layout builds it):
// the outline with its corner finishes, the cut-outs, one hole per bolt.
// `bolts[h]` is the group and bolt of hole h.
geometry::PlateRegion plate_region(const model::Connection& c,
                                   std::vector<std::pair<size_t, model::BoltPosition>>& bolts) {
    geometry::PlateRegion region;
    for (const model::Corner& corner : c.plate.outline) {
        geometry::OutlineVertex v;
        v.point = {corner.at.x, corner.at.y};
        if (corner.kind == model::CornerKind::chamfer) v.chamfer = corner.size;
        if (corner.kind == model::CornerKind::fillet) v.fillet_radius = corner.size;
        region.outline.push_back(v);
    }
    for (const model::Cutout& cut : c.plate.cutouts) {
        geometry::Polygon p;
        for (const Point& q : cut.points) p.points.emplace_back(q.x, q.y);
        region.cutouts.push_back(p);
    }
    for (size_t g = 0; g < c.bolt_groups.size(); ++g) {
        const model::BoltGroup& group = c.bolt_groups[g];
        for (const model::BoltPosition& b : model::bolt_positions(group)) {
            const geometry::Point centre(b.centre.x, b.centre.y);
            const model::Hole& h = group.hole;
            if (h.length > h.width) {
                const double angle =
                    group.angle + (h.direction == model::SlotDirection::across ? 90.0 : 0.0);
                region.holes.push_back(geometry::Hole::slot(centre, h.length, h.width, angle));
            } else {
                region.holes.push_back(geometry::Hole::circle(centre, h.width));
            }
            bolts.emplace_back(g, b);
        }
    }
    return region;
}

// What remains of the plate once the cut-outs are removed: one piece with
// area, every corner finish still on a corner, every hole clear of every
// edge by the minimum ligament. geometry::validate decides (so a template
// that validates also meshes); its findings are placed on the template's
// lines here. Its lengths are in mm, which the message says when the
// template works in other units.
void check_region(const model::Connection& connection, const PlateOrigins& origins,
                  Context& context) {
    std::vector<std::pair<size_t, model::BoltPosition>> bolts;
    const geometry::PlateRegion region = plate_region(connection, bolts);
    try {
        geometry::validate(region);
    } catch (const InputError& e) {
        const bool in_mm = unit_label(Quantity::length, context.units) == "mm";
        for (const Diagnostic& d : e.diagnostics()) {
            const std::string note = in_mm ? "" : " (lengths in mm)";
            int index = -1;
            if (std::sscanf(d.key_path.c_str(), "cutouts[%d]", &index) == 1 && index >= 0 &&
                static_cast<size_t>(index) < origins.cutouts.size()) {
                std::string why = d.message;
                if (why.find("separate pieces") != std::string::npos)
                    why += ": what remains of the plate must be one piece";
                else if (why.find("removes nothing") != std::string::npos)
                    why += " (a cut-out may cross the outline, as a cope or notch does, but must "
                           "overlap the plate)";
                else if (why.find("whole plate") != std::string::npos)
                    why += ": nothing is left to analyse";
                context.report(origins.cutouts[static_cast<size_t>(index)],
                               fmt::format("plate.cutout[{}]", index), why + note);
            } else if (std::sscanf(d.key_path.c_str(), "outline[%d]", &index) == 1 && index >= 0 &&
                       static_cast<size_t>(index) < origins.corners.size()) {
                context.report(origins.corners[static_cast<size_t>(index)],
                               fmt::format("plate.outline[{}]", index), d.message + note);
            } else if (std::sscanf(d.key_path.c_str(), "holes[%d]", &index) == 1 && index >= 0 &&
                       static_cast<size_t>(index) < bolts.size()) {
                const auto& [g, b] = bolts[static_cast<size_t>(index)];
                context.report(
                    origins.bolt_groups[g], fmt::format("bolt_group[{}]", g),
                    fmt::format("(\"{}\"): the hole of the bolt at row {}, line {}: {}{}",
                                connection.bolt_groups[g].name, b.row, b.line, d.message, note));
            } else {
                context.report(origins.plate, "plate", d.key_path + " " + d.message + note);
            }
        }
    }
}

} // namespace

void check_plate_geometry(const model::Connection& connection, const PlateOrigins& origins,
                          Context& context) {
    const auto& plate = connection.plate;
    const size_t n = plate.outline.size();
    const auto mm = [&](double v) { return from_internal(v, Quantity::length, context.units); };
    const auto unit = unit_label(Quantity::length, context.units);
    // The plate the mesher and the analysis see keeps this much between a
    // hole and any edge (geometry::PlateRegion's default).
    const double min_ligament = geometry::PlateRegion{}.min_ligament;
    const size_t problems_before = context.problems.size();

    // Outline: no zero-length segment, no self-crossing, counter-clockwise.
    bool outline_ok = true;
    for (size_t i = 0; i < n; ++i) {
        if (length(plate.outline[(i + 1) % n].at - plate.outline[i].at) == 0.0) {
            context.report(origins.corners[(i + 1) % n],
                           fmt::format("plate.outline[{}]", (i + 1) % n),
                           fmt::format("repeats corner {}: segment {} has zero length", i, i));
            outline_ok = false;
        }
    }
    for (size_t i = 0; i < n && outline_ok; ++i) {
        for (size_t j = i + 2; j < n; ++j) {
            if (i == 0 && j == n - 1) continue; // neighbours through the closing segment
            if (segments_cross(plate.outline[i].at, plate.outline[(i + 1) % n].at,
                               plate.outline[j].at, plate.outline[(j + 1) % n].at)) {
                context.report(
                    origins.corners[j], fmt::format("plate.outline[{}]", j),
                    fmt::format("segment {} crosses segment {}: the outline must not cross itself",
                                j, i));
                outline_ok = false;
            }
        }
    }
    if (!outline_ok) return;
    if (signed_area(finished_outline(plate)) <= 0.0) {
        context.report(origins.corners[0], "plate.outline",
                       "runs clockwise: list the corners counter-clockwise (plate on the left of "
                       "each segment)");
        return;
    }
    for (size_t i = 0; i < n; ++i) {
        const auto& c0 = plate.outline[i];
        const auto& c1 = plate.outline[(i + 1) % n];
        const double t0 = corner_trim(c0, plate.outline[(i + n - 1) % n].at, c1.at);
        const double t1 = corner_trim(c1, c0.at, plate.outline[(i + 2) % n].at);
        const double l = length(c1.at - c0.at);
        if (t0 + t1 > l * (1 + 1e-9)) {
            context.report(
                origins.corners[(i + 1) % n], fmt::format("plate.outline[{}]", (i + 1) % n),
                fmt::format("the corner finishes at both ends of segment {} need {:.4g} {} but the "
                            "segment is {:.4g} {} long: make the chamfer or fillet smaller",
                            i, mm(t0 + t1), unit, mm(l), unit));
            outline_ok = false;
        }
    }
    if (!outline_ok) return;
    const Polygon outline = finished_outline(plate);

    std::vector<Polygon> cutouts;
    for (size_t k = 0; k < plate.cutouts.size(); ++k) {
        Polygon p = plate.cutouts[k].points;
        const std::string path = fmt::format("plate.cutout[{}]", k);
        bool ok = std::abs(signed_area(p)) > 0.0;
        if (!ok)
            context.report(origins.cutouts[k], path, "has no area: its points lie on one line");
        cutouts.push_back(ok ? p : Polygon{});
    }

    struct PlacedHole {
        size_t group;
        model::BoltPosition bolt;
        HoleShape shape;
    };
    std::vector<PlacedHole> holes;
    for (size_t g = 0; g < connection.bolt_groups.size(); ++g) {
        const auto& group = connection.bolt_groups[g];
        const std::string path = fmt::format("bolt_group[{}]", g);
        int reported = 0;
        auto report = [&](const model::BoltPosition& b, const std::string& what) {
            if (++reported > 6) return; // the first few say enough
            context.report(
                origins.bolt_groups[g], path,
                fmt::format(
                    "(\"{}\"): the hole of the bolt at row {}, line {}, centre ({:.4g}, {:.4g}) "
                    "{}, {}",
                    group.name, b.row, b.line, mm(b.centre.x), mm(b.centre.y), unit, what));
        };
        for (const auto& b : model::bolt_positions(group)) {
            const HoleShape s = hole_shape(group, b.centre);
            if (!inside(outline, b.centre)) {
                report(b, "lies outside the plate outline");
            } else if (boundary_distance(outline, s.a, s.b) < s.radius) {
                report(b, fmt::format(
                              "crosses the plate edge: the hole edge must stay inside the plate "
                              "(distance to the edge {:.4g} {} < hole radius {:.4g} {})",
                              mm(boundary_distance(outline, s.a, s.b)), unit, mm(s.radius), unit));
            }
            for (size_t k = 0; k < cutouts.size(); ++k) {
                if (cutouts[k].empty()) continue;
                const std::string name = plate.cutouts[k].name.empty()
                                             ? fmt::format("cutout[{}]", k)
                                             : "\"" + plate.cutouts[k].name + "\"";
                const double gap = boundary_distance(cutouts[k], s.a, s.b) - s.radius;
                if (inside(cutouts[k], b.centre))
                    report(b, "lies inside cut-out " + name);
                else if (gap < 0)
                    report(b, "crosses the edge of cut-out " + name);
                else if (gap < min_ligament)
                    report(b, fmt::format("is {:.4g} {} from the edge of cut-out {}: keep at least "
                                          "the minimum ligament of {:.4g} {} of plate between them",
                                          mm(gap), unit, name, mm(min_ligament), unit));
            }
            for (const auto& other : holes) {
                const double gap = segment_segment(s.a, s.b, other.shape.a, other.shape.b);
                if (gap < s.radius + other.shape.radius) {
                    report(
                        b,
                        fmt::format(
                            "overlaps the hole of bolt_group[{}] (\"{}\") row {}, line {}: centres "
                            "{:.4g} {} apart, the holes need {:.4g} {}",
                            other.group, connection.bolt_groups[other.group].name, other.bolt.row,
                            other.bolt.line, mm(gap), unit, mm(s.radius + other.shape.radius),
                            unit));
                }
            }
            holes.push_back({g, b, s});
        }
    }
    if (context.problems.size() == problems_before) check_region(connection, origins, context);
}

} // namespace lapwing::input
