// The highest local stresses of a solution and where they sit, in words a
// reviewer can find on the drawing ("edge of hole brace[2]").
#pragma once

#include "analysis/plate_region.hpp"
#include "analysis/results.hpp"
#include "check/pipeline.hpp"
#include "fe/stress.hpp"

namespace lapwing::check {

// The zone round each bolt hole whose von Mises peak is kept apart from the
// plate's other peaks is model::PeakZones::bolt_hole_zone times the hole
// diameter (a slot: its width) wide, 0.5 unless the template says otherwise
// ([allowables.peak]). Under bearing, the elastic peak of a pin-loaded hole is
// confined to the hole's neighbourhood (Frocht and Hill 1940 measured it
// photoelastically; from memory) and stands in for a contact pressure that the
// bearing and tear-out rows check against published resistances. That
// bearing field decays smoothly (as 1/r from a point load, Flamant), so any
// zone edge is a judgement: half a diameter is lapwing's default, stated on
// the calc sheet, and the engineer may widen it.

// From the recovered nodal stresses and the Gauss-point stresses of the
// plate elements, whichever is higher (recovery can overshoot or undershoot
// at a free edge; both are shown to the same mesh).
// `gauss` holds the case's stresses at the 3×3 Gauss points of every element
// (fe::sample_stresses with 3 points per direction).
PeakStress find_peaks(const analysis::FeProblem& problem, const analysis::PlateLayout& layout,
                      const model::Connection& connection, const analysis::CaseResult& result,
                      const fe::SampledStresses& gauss);

// "edge of hole brace[2]", "outline edge 3", or "(x, y) mm": the nearest
// feature within a few element sizes of the point.
std::string describe_location(const analysis::PlateLayout& layout,
                              const model::Connection& connection, const Eigen::Vector2d& at);

} // namespace lapwing::check
