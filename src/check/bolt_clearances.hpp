// The distances around one bolt seen along its force, measured on the real
// plate: the clear distance lc for tear-out, and EN 1993-1-8's e1 / p1
// (along the force) and e2 / p2 (across it) for the Table 3.4 factors.
#pragma once

#include "check/limit_states.hpp"
#include "geometry/curve.hpp"
#include "geometry/plate_region.hpp"

#include <Eigen/Core>

namespace lapwing::check {

// Bolt in hole `hole` of `region` (its centre is the hole's), nominal
// diameter `d`, carrying a force along `force` (the force the bolt puts on
// the plate; only its direction is used; a zero force gives lc = 0 and
// ahead = "no force on the bolt").
//  - lc: from the hole's edge along the force to the next hole or edge;
//  - ahead a hole: p1 = centre-to-centre distance along the force; ahead an
//    edge: e1 = centre to that edge along the force;
//  - across the force, both ways from the centre: the nearest hole gives p2
//    (its centre's distance across the force), the nearest edge e2;
//  - hole_factor 0.6 for a slot with its long side across the force (an
//    oversized round hole cannot be told from the geometry: the caller sets
//    0.8 from the hole kind).
// `boundary` is build_region_boundary(region).
BoltClearances bolt_clearances(const geometry::PlateRegion& region,
                               const geometry::RegionBoundary& boundary, int hole, double d,
                               const Eigen::Vector2d& force);

} // namespace lapwing::check
