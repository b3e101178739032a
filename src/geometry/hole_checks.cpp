// Holes: size checks, placement inside the region with a minimum ligament,
// and their boundary loops (a circle, or a slot of two half-circles and two
// straight edges).
#include "core/error.hpp"
#include "geometry/polygon_ops.hpp"
#include "geometry/region_detail.hpp"

#include <algorithm>
#include <cmath>
#include <fmt/format.h>
#include <numbers>

namespace lapwing::geometry::detail {

namespace {

constexpr double pi = std::numbers::pi;

// A hole as the set of points within `radius` of the segment a–b (a == b
// for a circle): distances to it are distances to a–b minus the radius.
struct Capsule {
    Point a, b;
    double radius;
};

Capsule capsule(const Hole& h) {
    if (h.shape == HoleShape::circle) return {h.centre, h.centre, h.diameter / 2};
    const double a = std::max(0.0, (h.length - h.width) / 2);
    const double angle = h.angle_deg * pi / 180.0;
    const Point u(std::cos(angle), std::sin(angle));
    return {h.centre - a * u, h.centre + a * u, h.width / 2};
}

std::string describe_hole(const Hole& h) {
    if (h.shape == HoleShape::circle)
        return fmt::format("hole at {}, d = {:g},", fmt_point(h.centre), h.diameter);
    return fmt::format("slot at {}, {:g} x {:g} at {:g} deg,", fmt_point(h.centre), h.length,
                       h.width, h.angle_deg);
}

// Clear distance between the hole's core segment and a boundary curve.
double core_distance(const Capsule& c, const Curve& curve) {
    if (curve.kind == CurveKind::line)
        return segment_segment_distance(c.a, c.b, curve.start, curve.end);
    // Arc: sample the core, then refine around the best sample.
    const int n = (c.a - c.b).norm() > 0 ? 64 : 0;
    double best = distance_to_curve(curve, c.a);
    double best_t = 0.0;
    for (int i = 1; i <= n; ++i) {
        const double t = static_cast<double>(i) / n;
        const double d = distance_to_curve(curve, c.a + t * (c.b - c.a));
        if (d < best) best = d, best_t = t;
    }
    for (double step = 1.0 / 64; n > 0 && step > 1e-9; step /= 2) {
        for (double t : {best_t - step, best_t + step}) {
            if (t < 0 || t > 1) continue;
            const double d = distance_to_curve(curve, c.a + t * (c.b - c.a));
            if (d < best) best = d, best_t = t;
        }
    }
    return best;
}

BoundaryLoop hole_loop(const Hole& h, int index) {
    const BoundaryTag tag{BoundaryKind::hole, index, 0};
    BoundaryLoop loop;
    if (h.shape == HoleShape::circle) {
        // Clockwise, so the plate is on the left; starts on +x.
        loop.curves.push_back(Curve::arc(h.centre, h.diameter / 2, 0.0, -2 * pi, tag));
        loop.curves.back().end = loop.curves.back().start;
        return loop;
    }
    const Capsule c = capsule(h);
    const double r = c.radius;
    const double angle = h.angle_deg * pi / 180.0;
    const Point n(-std::sin(angle), std::cos(angle)); // left of the long axis
    // Clockwise: along the +n side from end a to end b, round end b, back
    // along the −n side, round end a.
    BoundaryTag t0 = tag, t1 = tag, t2 = tag, t3 = tag;
    t0.part = 0, t1.part = 1, t2.part = 2, t3.part = 3;
    Curve top = Curve::line(c.a + r * n, c.b + r * n, t0);
    Curve end_b = Curve::arc(c.b, r, angle + pi / 2, -pi, t1);
    Curve bottom = Curve::line(c.b - r * n, c.a - r * n, t2);
    Curve end_a = Curve::arc(c.a, r, angle - pi / 2, -pi, t3);
    end_b.start = top.end, end_b.end = bottom.start;
    end_a.start = bottom.end, end_a.end = top.start;
    loop.curves = {top, end_b, bottom, end_a};
    return loop;
}

} // namespace

void add_holes(const PlateRegion& region, double tol, RegionBoundary& boundary,
               std::vector<Diagnostic>& problems) {
    const auto bad = [&](size_t i, std::string msg) {
        problems.push_back({"", 0, 0, fmt::format("holes[{}]", i), std::move(msg), ""});
    };
    std::vector<std::vector<Point>> polylines;
    double extent = 0.0;
    for (const BoundaryLoop& loop : boundary.loops) {
        polylines.push_back(polyline(loop, tol * 1e3));
        for (const Point& p : polylines.back()) extent = std::max(extent, p.cwiseAbs().maxCoeff());
    }
    const double lig = region.min_ligament;
    std::vector<bool> ok(region.holes.size(), false);
    for (size_t i = 0; i < region.holes.size(); ++i) {
        const Hole& h = region.holes[i];
        if (!std::isfinite(h.centre.x()) || !std::isfinite(h.centre.y())) {
            bad(i, "centre is not a finite number");
            continue;
        }
        if (h.shape == HoleShape::circle) {
            if (!(h.diameter > tol) || !std::isfinite(h.diameter)) {
                bad(i, fmt::format("hole at {}: diameter = {:g}, must be > 0", fmt_point(h.centre),
                                   h.diameter));
                continue;
            }
        } else {
            if (!(h.width > tol) || !std::isfinite(h.width) || !std::isfinite(h.angle_deg)) {
                bad(i, fmt::format("slot at {}: width = {:g}, must be > 0", fmt_point(h.centre),
                                   h.width));
                continue;
            }
            if (!(h.length > h.width + tol) || !std::isfinite(h.length)) {
                bad(i,
                    fmt::format("slot at {}: length = {:g} must exceed its width {:g} (length is "
                                "tip to tip); use a circular hole for equal sizes",
                                fmt_point(h.centre), h.length, h.width));
                continue;
            }
        }
        const Capsule c = capsule(h);
        // Inside: the centre lies inside the outer loop and outside every cut-out.
        int count = 0;
        for (const auto& pl : polylines) count += point_in_polygon(h.centre, pl) ? 1 : 0;
        if (count % 2 == 0) {
            bad(i,
                fmt::format("{} lies outside the plate (or inside a cut-out)", describe_hole(h)));
            continue;
        }
        // Clearance to every boundary curve.
        bool placed = true;
        for (const BoundaryLoop& loop : boundary.loops) {
            for (const Curve& curve : loop.curves) {
                const double clear = core_distance(c, curve) - c.radius;
                if (clear < 0) {
                    bad(i, fmt::format("{} crosses {}; keep it at least {:g} inside",
                                       describe_hole(h), describe(curve), lig));
                    placed = false;
                } else if (clear < lig) {
                    bad(i, fmt::format("{} is {:g} from {}, less than the minimum ligament {:g}",
                                       describe_hole(h), clear, describe(curve), lig));
                    placed = false;
                }
                if (!placed) break;
            }
            if (!placed) break;
        }
        ok[i] = placed;
    }
    for (size_t i = 0; i < region.holes.size(); ++i) {
        if (!ok[i]) continue;
        const Capsule ci = capsule(region.holes[i]);
        for (size_t j = i + 1; j < region.holes.size(); ++j) {
            if (!ok[j]) continue;
            const Capsule cj = capsule(region.holes[j]);
            const double clear =
                segment_segment_distance(ci.a, ci.b, cj.a, cj.b) - ci.radius - cj.radius;
            if (clear < 0) {
                bad(j, fmt::format("{} overlaps holes[{}] at {}", describe_hole(region.holes[j]), i,
                                   fmt_point(region.holes[i].centre)));
            } else if (clear < lig) {
                bad(j, fmt::format(
                           "{} is {:g} from holes[{}] at {}, less than the minimum ligament {:g}",
                           describe_hole(region.holes[j]), clear, i,
                           fmt_point(region.holes[i].centre), lig));
            }
        }
    }
    if (!problems.empty()) return;
    for (size_t i = 0; i < region.holes.size(); ++i)
        boundary.loops.push_back(hole_loop(region.holes[i], static_cast<int>(i)));
}

} // namespace lapwing::geometry::detail
