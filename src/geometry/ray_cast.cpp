// Ray against the region's boundary curves: a line-segment and a circle-arc
// intersection per curve, the nearest one ahead of the start wins.
#include "geometry/ray_cast.hpp"

#include "geometry/region_boundary.hpp"

#include <algorithm>
#include <cmath>
#include <limits>
#include <numbers>
#include <optional>

namespace lapwing::geometry {

namespace {

double cross(const Point& a, const Point& b) {
    return a.x() * b.y() - a.y() * b.x();
}

// Size of the boundary (largest coordinate), for the "same point" tolerance;
// the same billionth-of-the-size rule as geometric_tolerance().
double boundary_tolerance(const RegionBoundary& boundary) {
    double extent = 1.0;
    for (const BoundaryLoop& loop : boundary.loops)
        for (const Curve& c : loop.curves) extent = std::max(extent, c.start.cwiseAbs().maxCoeff());
    return 1e-9 * extent;
}

// Ray parameter s (along the unit direction u) where the ray meets the
// segment a–b, if it does ahead of `tol`; parallel segments are not met (a
// ray running along an edge meets the edge's neighbours instead).
std::optional<double> meet_line(const Point& p, const Point& u, const Point& a, const Point& b,
                                double tol) {
    const Point e = b - a;
    const double den = cross(u, e);
    if (std::abs(den) <= 1e-14 * e.norm()) return std::nullopt;
    const Point w = a - p;
    const double s = cross(w, e) / den; // along the ray
    const double r = cross(w, u) / den; // along the segment, 0..1
    const double slack = tol / std::max(e.norm(), tol);
    if (s <= tol || r < -slack || r > 1.0 + slack) return std::nullopt;
    return s;
}

// Is polar angle `angle` inside the arc's sweep (with a tolerance in radians)?
bool within_sweep(const Curve& c, double angle, double slack) {
    const double two_pi = 2.0 * std::numbers::pi;
    double a = angle - c.start_angle;
    if (c.sweep < 0) a = -a;
    a = std::fmod(a, two_pi);
    if (a < 0) a += two_pi;
    return a <= std::abs(c.sweep) + slack || a >= two_pi - slack;
}

// Nearest meeting of the ray with the circle arc ahead of `tol`:
// |p + s u − c|² = r² gives s² + 2 s (p − c)·u + |p − c|² − r² = 0.
std::optional<double> meet_arc(const Point& p, const Point& u, const Curve& c, double tol) {
    const Point q = p - c.centre;
    const double b = q.dot(u);
    const double disc = b * b - (q.squaredNorm() - c.radius * c.radius);
    if (disc < 0) return std::nullopt;
    const double root = std::sqrt(disc);
    const double slack = tol / c.radius;
    for (const double s : {-b - root, -b + root}) {
        if (s <= tol) continue;
        const Point at = q + s * u;
        if (within_sweep(c, std::atan2(at.y(), at.x()), slack)) return s;
    }
    return std::nullopt;
}

std::optional<double> meet(const Point& p, const Point& u, const Curve& c, double tol) {
    return c.kind == CurveKind::line ? meet_line(p, u, c.start, c.end, tol)
                                     : meet_arc(p, u, c, tol);
}

} // namespace

RayHit cast_ray(const RegionBoundary& boundary, const Point& from, const Point& direction,
                const RayOptions& options) {
    RayHit best;
    const double length = direction.norm();
    if (!(length > 0) || !std::isfinite(length)) return best;
    const Point u = direction / length;
    const double tol = boundary_tolerance(boundary);
    best.distance = std::numeric_limits<double>::infinity();
    for (const BoundaryLoop& loop : boundary.loops) {
        for (const Curve& c : loop.curves) {
            if (c.tag.kind == BoundaryKind::hole &&
                (!options.stop_at_holes || c.tag.index == options.excluded_hole))
                continue;
            const auto s = meet(from, u, c, tol);
            if (s && *s < best.distance) {
                best.hit = true;
                best.distance = *s;
                best.tag = c.tag;
            }
        }
    }
    if (!best.hit) return RayHit{};
    best.at = from + best.distance * u;
    return best;
}

RayHit cast_ray(const PlateRegion& region, const Point& from, const Point& direction,
                const RayOptions& options) {
    return cast_ray(build_region_boundary(region), from, direction, options);
}

double hole_extent(const RegionBoundary& boundary, int hole, const Point& inside,
                   const Point& direction) {
    const double length = direction.norm();
    if (!(length > 0)) return 0.0;
    const Point u = direction / length;
    const double tol = boundary_tolerance(boundary);
    double extent = std::numeric_limits<double>::infinity();
    for (const BoundaryLoop& loop : boundary.loops)
        for (const Curve& c : loop.curves)
            if (c.tag.kind == BoundaryKind::hole && c.tag.index == hole)
                if (const auto s = meet(inside, u, c, tol)) extent = std::min(extent, *s);
    return std::isfinite(extent) ? extent : 0.0;
}

ClearDistance clear_distance(const RegionBoundary& boundary, int hole, const Point& centre,
                             const Point& direction) {
    ClearDistance out;
    out.own_extent = hole_extent(boundary, hole, centre, direction);
    out.hit = cast_ray(boundary, centre, direction, {.stop_at_holes = true, .excluded_hole = hole});
    if (out.hit.hit) out.clear = out.hit.distance - out.own_extent;
    return out;
}

} // namespace lapwing::geometry
