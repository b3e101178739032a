// Thornton's (1984) column lengths for Whitmore-section buckling, measured
// on the real plate: from the Whitmore line's centre and its two ends, back
// along the member axis (towards the joint) to the supported edge.
#pragma once

#include "geometry/curve.hpp"

#include <Eigen/Core>
#include <string>
#include <vector>

namespace lapwing::check {

struct BucklingLength {
    std::string label;          // "L1 (centre)", "L2 (end at from)", "L3 (end at to)"
    Eigen::Vector2d from{0, 0}; // on the Whitmore line, mm
    Eigen::Vector2d to{0, 0};   // on the supported edge, mm
    double length = 0;          // mm
};

struct BucklingLengths {
    std::vector<BucklingLength> reaching; // the lengths that reach a supported edge
    std::vector<std::string> notes;       // the ones that do not, and where they end instead

    std::vector<double> lengths() const; // reaching[i].length, for thornton_slenderness
};

// `whitmore_from` / `whitmore_to`: the Whitmore line's ends after clipping
// to the plate; `axis`: the member axis pointing away from the joint;
// `supported_edges`: outline edge indices that are supported (welded).
// The rays pass through holes (the column is the plate strip, holes and
// all). A ray that leaves the plate through a free edge, a corner finish or
// a cut-out does not reach the support: it is left out of the average and
// noted (common practice varies here; see docs/checks.md).
BucklingLengths thornton_lengths(const geometry::RegionBoundary& boundary,
                                 const Eigen::Vector2d& whitmore_from,
                                 const Eigen::Vector2d& whitmore_to, const Eigen::Vector2d& axis,
                                 const std::vector<int>& supported_edges);

} // namespace lapwing::check
