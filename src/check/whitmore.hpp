// The Whitmore construction of one bolt group on its own, without a plate:
// the width g + 2 L tan 30° at the last bolt row (Whitmore 1952).
#pragma once

#include <Eigen/Core>
#include <vector>

namespace lapwing::check {

struct WhitmoreLine {
    double gauge = 0;             // g: distance between the outer bolt lines at the first row, mm
    double length = 0;            // L: first row to last row along the member axis, mm
    double width = 0;             // g + 2 L tan 30°, mm
    Eigen::Vector2d centre{0, 0}; // on the last row, midway between the first row's outer lines
    // Ends of the unclipped line: `from` to the right of the axis (looking out
    // along the member), `to` to its left, so the line's normal (90° counter-
    // clockwise from from→to) points back towards the joint.
    Eigen::Vector2d from{0, 0}, to{0, 0};
};

// `bolts` are the group's bolt centres (mm), `axis_deg` the member's
// direction from the joint out along the member (degrees from +x). The first
// row is the one farthest from the joint (largest coordinate along the
// axis), the last the nearest; the 30° spread starts at the first row's
// outer bolts and is measured at the last row, normal to the axis (Whitmore
// 1952; the construction as commonly drawn in gusset design). Bolts whose
// axis coordinates differ by less than `row_tolerance` (mm) share a row.
// A single row gives L = 0 and width g. Asserts on an empty group.
WhitmoreLine whitmore_line(const std::vector<Eigen::Vector2d>& bolts, double axis_deg,
                           double row_tolerance = 1e-6);

} // namespace lapwing::check
