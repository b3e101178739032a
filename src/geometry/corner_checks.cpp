// Corner finishes against cut-outs. Cut-outs are removed from the straight
// outline before the chamfers and fillets are cut at the surviving corners,
// so a cut-out whose edge reaches into a corner finish (crosses or touches
// the chamfer line or the fillet arc) would leave two boundary curves
// crossing each other: a region that no mesh can fill. A cut-out may cross
// the outline's straight edges anywhere (copes, notches); near a finished
// corner it must keep clear of the finish, as it must not remove the corner
// (region_boundary.cpp).
#include "core/error.hpp"
#include "geometry/polygon_ops.hpp"
#include "geometry/region_detail.hpp"

#include <algorithm>
#include <cmath>
#include <fmt/format.h>
#include <numbers>

namespace lapwing::geometry::detail {

namespace {

// True if the angle of v (from the arc's centre) lies within the arc's sweep.
bool within_sweep(const Curve& arc, const Point& v) {
    const double two_pi = 2.0 * std::numbers::pi;
    double a = std::atan2(v.y(), v.x()) - arc.start_angle;
    if (arc.sweep < 0) a = -a;
    a = std::fmod(a, two_pi);
    if (a < 0) a += two_pi;
    return a <= std::abs(arc.sweep);
}

// Exact distance between the segment a–b and an arc: zero where the segment
// meets the arc's circle within the sweep; otherwise the nearest pair is an
// end of one of them or lies on the normal through the centre.
double segment_arc_distance(const Point& a, const Point& b, const Curve& arc) {
    const Point d = b - a, f = a - arc.centre;
    const double A = d.squaredNorm(), B = 2 * f.dot(d),
                 C = f.squaredNorm() - arc.radius * arc.radius;
    const double disc = B * B - 4 * A * C;
    if (A > 0 && disc >= 0) {
        for (double s : {-1.0, 1.0}) {
            const double t = (-B + s * std::sqrt(disc)) / (2 * A);
            if (t >= 0 && t <= 1 && within_sweep(arc, f + t * d)) return 0.0;
        }
    }
    const double t = A > 0 ? std::clamp(-f.dot(d) / A, 0.0, 1.0) : 0.0;
    return std::min({distance_to_curve(arc, a), distance_to_curve(arc, b),
                     distance_to_curve(arc, a + t * d), point_segment_distance(arc.start, a, b),
                     point_segment_distance(arc.end, a, b)});
}

} // namespace

void check_corner_finishes(const RegionBoundary& boundary, double tol,
                           std::vector<Diagnostic>& problems) {
    for (const BoundaryLoop& corner_loop : boundary.loops) {
        for (const Curve& corner : corner_loop.curves) {
            if (corner.tag.kind != BoundaryKind::outline_corner) continue;
            for (const BoundaryLoop& loop : boundary.loops) {
                for (const Curve& cut : loop.curves) {
                    if (cut.tag.kind != BoundaryKind::cutout) continue;
                    const double gap = corner.kind == CurveKind::arc
                                           ? segment_arc_distance(cut.start, cut.end, corner)
                                           : segment_segment_distance(cut.start, cut.end,
                                                                      corner.start, corner.end);
                    if (gap > tol) continue;
                    problems.push_back(
                        {"", 0, 0, fmt::format("cutouts[{}]", cut.tag.index),
                         fmt::format(
                             "edge {} reaches the {} at outline[{}] (from {} to {}): a "
                             "cut-out may cross the outline's straight edges but must keep "
                             "clear of its chamfers and fillets; move the cut-out or drop "
                             "the corner finish",
                             cut.tag.part, corner.kind == CurveKind::arc ? "fillet" : "chamfer",
                             corner.tag.index, fmt_point(corner.start), fmt_point(corner.end)),
                         ""});
                    return; // one is enough: the boundary is not usable past it
                }
            }
        }
    }
}

} // namespace lapwing::geometry::detail
