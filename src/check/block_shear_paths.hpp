// Candidate block shear (block tearing) paths of one bolt group on the
// plate: the classical blocks torn out along the member axis and across it,
// each with its gross lengths, its hole deductions, whether the tension
// stress on it is uniform, the bolts it holds and its outline for the calc
// sheet. Lengths to the plate's edges are measured on the real plate (ray
// casts), so skewed edges, chamfers and cut-outs count. Rules and sources:
// docs/checks.md ("Block shear paths").
#pragma once

#include "check/limit_states.hpp"
#include "geometry/curve.hpp"

#include <Eigen/Core>
#include <string>
#include <vector>

namespace lapwing::check {

// AISC 360-16 §B4.3b: for net areas the width of a bolt hole is taken 1/16 in
// larger than its nominal size (AISC's SI edition says 2 mm; from memory).
// EN 1993-1-8 deducts the hole diameter d0 itself.
inline constexpr double aisc_hole_allowance = 25.4 / 16.0; // mm

struct BlockShearPath {
    std::string id;   // stable within a group, e.g. "along:between-outer-lines"
    std::string name; // words for the calc sheet
    // Unit vector: the way the block is pulled out.
    Eigen::Vector2d direction{1, 0};
    // Total gross length of the shear planes, mm, and the hole widths
    // deducted along them (half a hole where a plane ends in one).
    double shear_length = 0;
    double shear_holes = 0;
    // The tension plane: its length across the pull, mm, the hole widths
    // deducted across it, and Σ s²/(4g) added back for staggered steps, mm.
    double tension_length = 0;
    double tension_holes = 0;
    double tension_stagger = 0;
    // false: Ubs = 0.5 (the tension plane crosses several loaded lines).
    bool uniform_tension = true;
    // Indices into the given bolt centres: the bolts on or in the block.
    std::vector<int> bolts;
    // The tear line for the figure: shear plane, tension plane, shear plane, mm.
    std::vector<Eigen::Vector2d> polyline;
};

struct BlockShearPaths {
    std::vector<BlockShearPath> paths;
    std::vector<std::string> notes; // paths that could not be built, and why
};

// The paths of one group. `axis` is the member's axis, pointing away from
// the joint (the way a tension member pulls its bolts); `centres` are the
// group's bolt centres (mm). Built for the pull along the axis and, with
// `across`, for pulls both ways across it (a member shear or a bolt force
// with a component across the axis). Staggered patterns give zig-zag
// tension planes through each line's innermost bolt, with the s²/(4g)
// allowance per diagonal step.
BlockShearPaths block_shear_paths(const std::vector<Eigen::Vector2d>& centres,
                                  const Eigen::Vector2d& axis,
                                  const geometry::RegionBoundary& boundary, bool across = true);

// The path's areas for plate thickness t (Ant with the stagger allowance
// added back, Agt the tension plane's length across the pull), deducting `shear_hole` (the
// hole's size along the shear planes) and `tension_hole` (across the
// tension plane) per hole width counted, e.g. d0 + aisc_hole_allowance for
// the AISC form, d0 for the EN form.
BlockShearAreas areas(const BlockShearPath& path, double t, double shear_hole, double tension_hole);

// Demand on the path: the part along `direction` of the forces the path's
// bolts put on the plate (`forces[i]` for centre i), N. Negative when the
// bolts push the block the other way: the path is not loaded.
double path_demand(const BlockShearPath& path, const std::vector<Eigen::Vector2d>& forces);

} // namespace lapwing::check
