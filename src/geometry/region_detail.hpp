// Internal steps of build_region_boundary, shared by its two source files.
#pragma once

#include "core/error.hpp"
#include "geometry/curve.hpp"

#include <string>
#include <vector>

namespace lapwing::geometry::detail {

std::string fmt_point(const Point& p);
std::string describe(const Curve& c); // "outline.edge[2] (from (0, 0) to (300, 0))"

// Records a problem for each cut-out edge that crosses or touches a chamfer
// or fillet of the outline (corner_checks.cpp).
void check_corner_finishes(const RegionBoundary& boundary, double tol,
                           std::vector<Diagnostic>& problems);

// Appends one clockwise loop per valid hole to `boundary`; records problems.
void add_holes(const PlateRegion& region, double tol, RegionBoundary& boundary,
               std::vector<Diagnostic>& problems);

} // namespace lapwing::geometry::detail
