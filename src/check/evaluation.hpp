// One connection solved on one mesh and measured: the mesh, the analysis,
// the section stresses, peaks and weld forces of every case. The pipeline
// evaluates the model's mesh and the finer convergence mesh the same way.
#pragma once

#include "check/pipeline.hpp"
#include "check/weld_lines.hpp"

namespace lapwing::check {

struct Evaluation {
    analysis::PlateLayout layout;
    mesh::MeshSettings settings;
    double element_size = 0; // the size the mesher used, mm
    mesh::Mesh mesh;
    analysis::Results results;
    std::vector<SectionLine> sections;
    std::vector<std::vector<SectionStress>> section_stress; // [case][section]
    std::vector<PeakStress> peaks;                          // [case]
    std::vector<WeldLine> welds;
    std::vector<std::vector<WeldForces>> weld_forces; // [case][weld line]
    double seconds_mesh = 0, seconds_analysis = 0, seconds_measure = 0;
};

Evaluation evaluate(const model::Connection& connection, const mesh::MeshSettings& settings);

// Rows from the stress field: peaks, section stresses, welds.
std::vector<CheckRow> stress_rows(const model::Connection& connection, const Evaluation& e);

} // namespace lapwing::check
