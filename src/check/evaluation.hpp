// One connection solved on one mesh and measured: the mesh, the analysis,
// the section stresses, peaks and weld forces of every case. The pipeline
// evaluates the model's mesh and the finer convergence mesh the same way.
#pragma once

#include "analysis/contact_seed.hpp"
#include "check/pipeline.hpp"
#include "check/weld_lines.hpp"

#include <map>
#include <string>

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

// With a cache (sweeps), the mesh and the solver state come from it when
// the plate region, settings and topology match an earlier run. `contact`
// passes bearing-contact seeds to or from another evaluation
// (analysis::analyse); it may be null.
Evaluation evaluate(const model::Connection& connection, const mesh::MeshSettings& settings,
                    ReuseCache* cache = nullptr, const analysis::ContactHooks* contact = nullptr);

// Rows from the stress field: peaks, section stresses, welds.
std::vector<CheckRow> stress_rows(const model::Connection& connection, const Evaluation& e);

// Rows of the classical limit states on this geometry with the computed
// forces: bolt bearing and tear-out, block shear, Whitmore yielding and
// buckling, gross and net sections (classical_rows.cpp).
std::vector<CheckRow> classical_rows(const model::Connection& connection, const Evaluation& e);

// The load-case factors of Results::cases[k]: a load case alone, or a
// combination's factors.
std::map<std::string, double> case_factors(const model::Connection& connection, size_t k);

} // namespace lapwing::check
