// Outline and cut-out checks, cut-out removal, chamfers and fillets: the
// straight-edged part of build_region_boundary.
#include "geometry/region_boundary.hpp"

#include "core/error.hpp"
#include "geometry/polygon_ops.hpp"
#include "geometry/region_detail.hpp"

#include <algorithm>
#include <cmath>
#include <fmt/format.h>
#include <numbers>

namespace lapwing::geometry {

namespace detail {

std::string fmt_point(const Point& p) {
    return fmt::format("({:g}, {:g})", p.x(), p.y());
}

std::string describe(const Curve& c) {
    if (c.kind == CurveKind::arc)
        return fmt::format("{} (arc r = {:g} about {})", c.tag.name(), c.radius,
                           fmt_point(c.centre));
    return fmt::format("{} (from {} to {})", c.tag.name(), fmt_point(c.start), fmt_point(c.end));
}

} // namespace detail

using detail::fmt_point;

namespace {

double cross(const Point& a, const Point& b) {
    return a.x() * b.y() - a.y() * b.x();
}
bool finite(const Point& p) {
    return std::isfinite(p.x()) && std::isfinite(p.y());
}

void check_polygon(const std::vector<Point>& pts, const std::string& key, double tol,
                   std::vector<Diagnostic>& problems) {
    const auto bad = [&](std::string msg) {
        problems.push_back({"", 0, 0, key, std::move(msg), ""});
    };
    if (pts.size() < 3) {
        bad(fmt::format("has {} points: a polygon needs at least 3", pts.size()));
        return;
    }
    for (size_t i = 0; i < pts.size(); ++i) {
        if (!finite(pts[i])) {
            bad(fmt::format("point {} is not a finite number", i));
            return;
        }
    }
    for (size_t i = 0; i < pts.size(); ++i) {
        const Point& a = pts[i];
        const Point& b = pts[(i + 1) % pts.size()];
        if ((b - a).norm() <= tol) {
            bad(fmt::format("points {} and {} coincide at {}: remove one", i, (i + 1) % pts.size(),
                            fmt_point(a)));
            return;
        }
    }
    if (auto hit = self_intersection(pts, tol)) {
        const auto [i, j] = *hit;
        const size_t n = pts.size();
        bad(fmt::format("crosses itself: edge {} (from {} to {}) meets edge {} (from {} to {})", i,
                        fmt_point(pts[i]), fmt_point(pts[(i + 1) % n]), j, fmt_point(pts[j]),
                        fmt_point(pts[(j + 1) % n])));
        return;
    }
    if (std::abs(polygon_signed_area(pts)) <= tol * tol * 1e6) bad("encloses no area");
}

// Corner treatment of one outer-loop vertex: the setback along each
// adjoining edge and the curve that replaces the corner.
struct Corner {
    double setback = 0.0;
    bool is_fillet = false;
    double radius = 0.0;
};

} // namespace

double geometric_tolerance(const PlateRegion& region) {
    double extent = 0.0;
    for (const OutlineVertex& v : region.outline)
        if (finite(v.point)) extent = std::max(extent, v.point.cwiseAbs().maxCoeff());
    return 1e-9 * std::max(extent, 1.0);
}

RegionBoundary build_region_boundary(const PlateRegion& region) {
    const double tol = geometric_tolerance(region);
    std::vector<Diagnostic> problems;
    const auto bad = [&](std::string key, std::string msg) {
        problems.push_back({"", 0, 0, std::move(key), std::move(msg), ""});
    };

    // --- outline and cut-outs as polygons
    std::vector<Point> outline;
    for (const OutlineVertex& v : region.outline) outline.push_back(v.point);
    check_polygon(outline, "outline", tol, problems);
    if (problems.empty() && polygon_signed_area(outline) < 0)
        bad("outline", fmt::format("runs clockwise (signed area {:g}): list its vertices "
                                   "counter-clockwise so that edge ids go round the plate",
                                   polygon_signed_area(outline)));
    for (size_t i = 0; i < region.outline.size(); ++i) {
        const OutlineVertex& v = region.outline[i];
        const std::string key = fmt::format("outline[{}]", i);
        if (!(v.chamfer >= 0) || !std::isfinite(v.chamfer))
            bad(key,
                fmt::format("chamfer = {:g} at {}: must be >= 0", v.chamfer, fmt_point(v.point)));
        if (!(v.fillet_radius >= 0) || !std::isfinite(v.fillet_radius))
            bad(key, fmt::format("fillet radius = {:g} at {}: must be >= 0", v.fillet_radius,
                                 fmt_point(v.point)));
        if (v.chamfer > 0 && v.fillet_radius > 0)
            bad(key,
                fmt::format("has both a chamfer and a fillet at {}: give one", fmt_point(v.point)));
    }
    if (!(region.min_ligament >= 0))
        bad("min_ligament", fmt::format("= {:g}: must be >= 0", region.min_ligament));
    std::vector<std::vector<Point>> cuts;
    for (size_t c = 0; c < region.cutouts.size(); ++c) {
        std::vector<Point> pts = region.cutouts[c].points;
        const size_t before = problems.size();
        check_polygon(pts, fmt::format("cutouts[{}]", c), tol, problems);
        if (problems.size() == before && polygon_signed_area(pts) < 0)
            std::reverse(pts.begin() + 1, pts.end()); // keep point 0 first; edge j becomes n-1-j
        cuts.push_back(std::move(pts));
    }
    if (!problems.empty()) throw InputError(problems);

    // --- outline minus cut-outs
    std::vector<TaggedLoop> loops(1);
    for (size_t i = 0; i < outline.size(); ++i) {
        loops[0].points.push_back(outline[i]);
        loops[0].tags.push_back({BoundaryKind::outline_edge, static_cast<int>(i), 0});
        loops[0].outline_vertex.push_back(static_cast<int>(i));
    }
    for (size_t c = 0; c < cuts.size(); ++c) {
        const std::vector<Point>& pts = cuts[c];
        const bool reversed = polygon_signed_area(region.cutouts[c].points) < 0;
        std::vector<BoundaryTag> tags;
        for (size_t j = 0; j < pts.size(); ++j) {
            // Edge ids follow the user's point order whichever way it runs.
            const size_t user_edge = reversed ? pts.size() - 1 - j : j;
            tags.push_back(
                {BoundaryKind::cutout, static_cast<int>(c), static_cast<int>(user_edge)});
        }
        double area_before = 0.0;
        for (const TaggedLoop& l : loops) area_before += polygon_signed_area(l.points);
        std::vector<TaggedLoop> next = subtract_polygon(loops, pts, tags, tol * 100);
        double area_after = 0.0;
        for (const TaggedLoop& l : next) area_after += polygon_signed_area(l.points);
        const std::string key = fmt::format("cutouts[{}]", c);
        if (next.empty() || area_after <= tol) {
            bad(key, "removes the whole plate");
            break;
        }
        if (std::abs(area_after - area_before) <= 1e-9 * area_before) {
            bad(key, fmt::format("(first point {}) lies outside the plate: it removes nothing",
                                 fmt_point(pts[0])));
            continue;
        }
        loops = std::move(next);
        const auto n_outer = std::count_if(loops.begin(), loops.end(), [](const TaggedLoop& l) {
            return polygon_signed_area(l.points) > 0;
        });
        if (n_outer > 1) {
            bad(key, fmt::format("cuts the plate into {} separate pieces", n_outer));
            break;
        }
    }
    if (!problems.empty()) throw InputError(problems);

    // --- chamfers and fillets on surviving outline vertices
    std::vector<bool> corner_present(region.outline.size(), false);
    for (int v : loops[0].outline_vertex)
        if (v >= 0) corner_present[v] = true;
    for (size_t i = 0; i < region.outline.size(); ++i) {
        const OutlineVertex& v = region.outline[i];
        if (!corner_present[i] && (v.chamfer > 0 || v.fillet_radius > 0))
            bad(fmt::format("outline[{}]", i),
                fmt::format("corner at {} has a chamfer or fillet but a cut-out removes the corner",
                            fmt_point(v.point)));
    }
    RegionBoundary boundary;
    for (size_t l = 0; l < loops.size(); ++l) {
        const TaggedLoop& loop = loops[l];
        const size_t n = loop.points.size();
        std::vector<Corner> corners(n);
        for (size_t k = 0; k < n; ++k) {
            const int ov = loop.outline_vertex[k];
            if (ov < 0) continue;
            const OutlineVertex& spec = region.outline[ov];
            const Point d_in = (loop.points[k] - loop.points[(k + n - 1) % n]).normalized();
            const Point d_out = (loop.points[(k + 1) % n] - loop.points[k]).normalized();
            const double turn = std::atan2(cross(d_in, d_out), d_in.dot(d_out));
            if (spec.fillet_radius > 0) {
                corners[k] = {spec.fillet_radius * std::tan(std::abs(turn) / 2), true,
                              spec.fillet_radius};
            } else if (spec.chamfer > 0) {
                corners[k] = {spec.chamfer, false, 0.0};
            }
        }
        for (size_t k = 0; k < n; ++k) {
            const size_t k1 = (k + 1) % n;
            const double len = (loop.points[k1] - loop.points[k]).norm();
            const double need = corners[k].setback + corners[k1].setback;
            if (need > 0 && need >= len - tol * 10) {
                const int ov = loop.outline_vertex[corners[k].setback > 0 ? k : k1];
                bad(fmt::format("outline[{}]", ov),
                    fmt::format(
                        "chamfer or fillet needs {:g} along {} (from {} to {}), which is only "
                        "{:g} long: make it smaller",
                        need, loop.tags[k].name(), fmt_point(loop.points[k]),
                        fmt_point(loop.points[k1]), len));
            }
        }
        if (!problems.empty()) continue;
        BoundaryLoop out;
        for (size_t k = 0; k < n; ++k) {
            const size_t k1 = (k + 1) % n;
            const Point a = loop.points[k], b = loop.points[k1];
            const Point d = (b - a).normalized();
            const Point start = a + corners[k].setback * d;
            const Point end = b - corners[k1].setback * d;
            out.curves.push_back(Curve::line(start, end, loop.tags[k]));
            if (corners[k1].setback > 0) {
                const Point d_next = (loop.points[(k1 + 1) % n] - b).normalized();
                const Point t2 = b + corners[k1].setback * d_next;
                const BoundaryTag tag{BoundaryKind::outline_corner, loop.outline_vertex[k1], 0};
                if (corners[k1].is_fillet) {
                    const double turn = std::atan2(cross(d, d_next), d.dot(d_next));
                    const Point left(-d.y(), d.x());
                    const double r = corners[k1].radius;
                    const Point centre = end + (turn > 0 ? r : -r) * left;
                    const Point v = end - centre;
                    Curve arc = Curve::arc(centre, r, std::atan2(v.y(), v.x()), turn, tag);
                    arc.start = end; // exact tangent points as shared ends
                    arc.end = t2;
                    out.curves.push_back(arc);
                } else {
                    out.curves.push_back(Curve::line(end, t2, tag));
                }
            }
        }
        boundary.loops.push_back(std::move(out));
    }
    if (!problems.empty()) throw InputError(problems);
    detail::check_corner_finishes(boundary, tol * 100, problems);
    if (!problems.empty()) throw InputError(problems);

    detail::add_holes(region, tol, boundary, problems);
    if (!problems.empty()) throw InputError(problems);

    // --- re-entrant corners: a right turn with the region on the left
    for (const BoundaryLoop& loop : boundary.loops) {
        const size_t n = loop.curves.size();
        for (size_t k = 0; k < n; ++k) {
            const Curve& c0 = loop.curves[k];
            const Curve& c1 = loop.curves[(k + 1) % n];
            if (cross(c0.tangent_at(1.0), c1.tangent_at(0.0)) < -1e-6)
                boundary.reentrant_corners.push_back(c0.end);
        }
    }
    return boundary;
}

void validate(const PlateRegion& region) {
    (void)build_region_boundary(region);
}

} // namespace lapwing::geometry
