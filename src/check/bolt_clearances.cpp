// Bolt clearances by ray casts from the hole centre: along the force for lc
// and e1 / p1, both ways across it for e2 / p2.
#include "check/bolt_clearances.hpp"

#include "geometry/ray_cast.hpp"

#include <algorithm>
#include <cassert>
#include <cmath>
#include <numbers>

namespace lapwing::check {

BoltClearances bolt_clearances(const geometry::PlateRegion& region,
                               const geometry::RegionBoundary& boundary, int hole, double d,
                               const Eigen::Vector2d& force) {
    assert(hole >= 0 && hole < static_cast<int>(region.holes.size()));
    const geometry::Hole& h = region.holes[static_cast<size_t>(hole)];
    BoltClearances g;
    g.d = d;
    g.d0 = h.shape == geometry::HoleShape::circle ? h.diameter : h.width;
    if (!(force.norm() > 0)) {
        g.ahead = "no force on the bolt"; // lc = 0: no tear-out capacity is claimed
        return g;
    }
    const Eigen::Vector2d u = force.normalized();
    const Eigen::Vector2d across(-u.y(), u.x());
    const auto centre_of = [&](int j) { return region.holes[static_cast<size_t>(j)].centre; };

    if (h.shape == geometry::HoleShape::slot) {
        // The slot's long side across the force (nearer across than along).
        const double a = h.angle_deg * std::numbers::pi / 180.0;
        const Eigen::Vector2d long_side(std::cos(a), std::sin(a));
        if (std::abs(long_side.dot(u)) < std::sqrt(0.5)) g.hole_factor = 0.6;
    }
    const geometry::ClearDistance ahead = geometry::clear_distance(boundary, hole, h.centre, u);
    if (ahead.hit.hit) {
        g.lc = ahead.clear;
        g.ahead = ahead.hit.tag.name();
        if (ahead.hit.tag.kind == geometry::BoundaryKind::hole)
            g.p1 = (centre_of(ahead.hit.tag.index) - h.centre).dot(u);
        else
            g.e1 = ahead.hit.distance;
    }
    for (const double side : {1.0, -1.0}) {
        const geometry::RayHit hit = geometry::cast_ray(
            boundary, h.centre, side * across, {.stop_at_holes = true, .excluded_hole = hole});
        if (!hit.hit) continue;
        if (hit.tag.kind == geometry::BoundaryKind::hole)
            g.p2 = std::min(g.p2, std::abs((centre_of(hit.tag.index) - h.centre).dot(across)));
        else
            g.e2 = std::min(g.e2, hit.distance);
    }
    return g;
}

} // namespace lapwing::check
