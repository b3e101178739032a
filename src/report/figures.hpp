// The calc sheet's figures, each an SVG string: geometry with dimensions,
// the mesh, the von Mises contour, the deformed shape, bolt force vectors and
// the section stress profiles. The same strings go inline into report.html
// and to separate .svg files.
#pragma once

#include "check/pipeline.hpp"

#include <string>
#include <vector>

namespace lapwing::report {

struct Figure {
    std::string file;    // e.g. "contour.svg"
    std::string title;   // heading on the sheet
    std::string caption; // what the figure shows, with its scale or case
    std::string svg;
};

// The load case the figures show: the one of the governing row, else the first.
int figure_case(const check::CheckOutcome& outcome);

double von_mises(const fe::Stress& s); // plane stress: √(σx² − σxσy + σy² + 3τ²)

// Displacement magnification for the deformed shape: the template's
// report.deformed_scale, or one that makes the largest displacement 6 % of
// the plate's larger side.
double deformed_scale(const check::CheckOutcome& outcome, int case_index);

std::string geometry_svg(const check::CheckOutcome& outcome);
std::string mesh_svg(const check::CheckOutcome& outcome);
std::string contour_svg(const check::CheckOutcome& outcome, int case_index);
std::string deformed_svg(const check::CheckOutcome& outcome, int case_index, double scale);
std::string bolt_forces_svg(const check::CheckOutcome& outcome, int case_index);
std::string section_profile_svg(const check::CheckOutcome& outcome, int case_index, int section);

// Every figure of the sheet in order (one profile per section line).
std::vector<Figure> all_figures(const check::CheckOutcome& outcome);

} // namespace lapwing::report
