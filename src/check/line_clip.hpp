// Exact pieces of a straight line inside a plate region whose boundary is
// made of straight edges and circular arcs (outline, chamfers, fillets,
// cut-outs, round and slotted holes): no polygon approximation.
#pragma once

#include "check/section.hpp"
#include "geometry/curve.hpp"

#include <Eigen/Core>
#include <vector>

namespace lapwing::check {

// Pieces of p(s) = origin + s·direction (direction a unit vector), s in
// [s_min, s_max], that lie inside the region bounded by `boundary`, as
// intervals of s in increasing order. Touching points (a tangent to a hole,
// a line through a corner) split nothing; pieces shorter than `tolerance`
// are dropped. A line running exactly along a boundary edge gets an
// unspecified answer there (weld lines are taken from the boundary curves
// themselves, not from this function).
std::vector<Interval> pieces_inside(const geometry::RegionBoundary& boundary,
                                    const Eigen::Vector2d& origin, const Eigen::Vector2d& direction,
                                    double s_min, double s_max, double tolerance);

// Winding number of the region's boundary about p: 1 inside, 0 outside
// (exact for arcs; undefined on the boundary itself).
int winding_number(const geometry::RegionBoundary& boundary, const Eigen::Vector2d& p);

} // namespace lapwing::check
