// The highest local stresses of a solution and where they sit, in words a
// reviewer can find on the drawing ("edge of hole brace[2]").
#pragma once

#include "analysis/plate_region.hpp"
#include "analysis/results.hpp"
#include "check/pipeline.hpp"

namespace lapwing::check {

// From the recovered nodal stresses and the Gauss-point stresses of the
// plate elements, whichever is higher (recovery can overshoot or undershoot
// at a free edge; both are shown to the same mesh).
PeakStress find_peaks(const analysis::FeProblem& problem, const analysis::PlateLayout& layout,
                      const model::Connection& connection, const analysis::CaseResult& result);

// "edge of hole brace[2]", "outline edge 3", or "(x, y) mm": the nearest
// feature within a few element sizes of the point.
std::string describe_location(const analysis::PlateLayout& layout,
                              const model::Connection& connection, const Eigen::Vector2d& at);

} // namespace lapwing::check
