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
    std::string file;      // e.g. "contour-D_L.svg": distinct, no spaces
    std::string kind;      // "geometry", "mesh", "contour", "deformed", "bolt-forces", "section"
    std::string title;     // heading on the sheet
    std::string caption;   // what the figure shows, with its scale or case
    std::string load_case; // the case or combination shown; empty for geometry and mesh
    std::string svg;
};

// The load case the section profiles show: the one of the governing row,
// else the first.
int figure_case(const check::CheckOutcome& outcome);

// A file-name piece from a name as typed: letters, digits, '.', '-' and '_'
// kept, anything else '_', so the name needs no quoting in a shell.
std::string file_safe(std::string name);

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

// Every figure of the sheet in order: geometry and mesh; for every load case
// and combination its contour, deformed shape and bolt forces; then one
// stress profile per section line for the governing case.
std::vector<Figure> all_figures(const check::CheckOutcome& outcome);

} // namespace lapwing::report
