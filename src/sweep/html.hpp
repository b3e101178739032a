// sweep.html: one self-contained page (inline CSS and SVG, no scripts):
// the governing ratio against the swept value with the limit line at 1 and
// the lightest passing value marked, one curve per check family, one chart
// per combination of the other varied keys, then the table of every variant.
#pragma once

#include "sweep/find_min.hpp"
#include "sweep/grid.hpp"
#include "sweep/runner.hpp"

#include <optional>
#include <string>
#include <vector>

namespace lapwing::sweep {

struct SweepPage {
    std::string title;        // e.g. the template file name
    std::string command_line; // as typed
    std::vector<Axis> axes;
    std::vector<Variant> variants;      // those run, grid order
    std::vector<VariantResult> results; // same order as variants
    int plot_axis = 0;                  // the x axis of the charts
    std::optional<FindMinResult> find_min;
    bool reports = false; // --reports: a column linking each variant's folder
};

std::string render_sweep_html(const SweepPage& page);

// The lightest passing value of the plot axis per line of the results, as
// the page marks it (smallest value whose variant passes); used when no
// --find-min was asked for.
std::optional<double> smallest_passing(const std::vector<const VariantResult*>& line, int axis);

} // namespace lapwing::sweep
