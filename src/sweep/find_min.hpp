// `--find-min PARAM`: the smallest value of one axis at which the variant
// passes, for every combination of the other axes, by bisection on the grid.
// Bisection assumes the governing ratio falls as the value grows (a thicker
// plate, a longer edge distance). The sampled ratios are checked for that;
// when they rise anywhere, or a sampled variant fails to build, the whole
// line is run instead and the answer is the brute-force one, with a warning.
#pragma once

#include "sweep/grid.hpp"
#include "sweep/runner.hpp"

#include <functional>
#include <optional>
#include <span>
#include <string>
#include <vector>

namespace lapwing::sweep {

struct MinimumOnLine {
    std::vector<double> others;     // values of the other axes, in axis order
    std::optional<double> smallest; // smallest passing value; none passes: nullopt
    bool monotone = true;           // the sampled ratios never rose with the value
    bool full_line = false;         // every value was run (fallback)
    std::string warning;            // why the fallback ran, empty otherwise
    int n_sampled = 0;
};

struct FindMinResult {
    int axis = -1;
    std::vector<MinimumOnLine> lines;     // one per combination of the other axes, grid order
    std::vector<VariantResult> evaluated; // every variant run, in grid order
};

// Runs the variants given in one batch (in parallel) and returns their
// results; the search calls it once per round.
using Evaluate = std::function<std::vector<VariantResult>(std::span<const Variant>)>;

// Throws InputError when `param` names no axis.
int axis_index(const std::vector<Axis>& axes, const std::string& param);

// Rounds: both ends of every line, then the midpoint of every open bracket,
// all lines in one batch per round; the variants run do not depend on the
// number of threads. A stop (empty batch result) ends the search early.
FindMinResult find_min(const std::vector<Axis>& axes, const std::vector<Variant>& grid, int axis,
                       const Evaluate& evaluate);

// Relative slack when comparing sampled ratios for monotonicity: round-off
// in the solve, far below any engineering difference.
inline constexpr double monotone_tolerance = 1e-9;

} // namespace lapwing::sweep
