// The whole check of one connection: mesh, analysis, sections, peaks, the
// classical limit states and the check table, plus the same model solved on
// a finer mesh as evidence of mesh convergence. A function of its inputs
// only, so a sweep can run many of them in parallel.
#pragma once

#include "analysis/plate_region.hpp"
#include "analysis/resource_estimate.hpp"
#include "analysis/results.hpp"
#include "check/check_table.hpp"
#include "check/section.hpp"
#include "check/weld_lines.hpp"
#include "mesh/mesh.hpp"
#include "model/connection.hpp"

#include <functional>
#include <future>
#include <string>
#include <vector>

namespace lapwing::check {

struct ReuseCache; // src/check/reuse_cache.hpp (sweeps)
struct CheckOutcome;

// The steps of check_connection in the order they run, for a progress
// display. Meshing and solving share a step because both happen inside one
// evaluation of the model (src/check/evaluation.cpp).
enum class Stage {
    model,       // meshing the plate and solving every load case
    checks,      // sections, peaks, the classical limit states, the check table
    convergence, // the finer convergence mesh: meshing, solving, measuring
    comparison,  // comparing the two meshes
};
// Words for a progress line, e.g. "meshing and solving the load cases".
const char* words(Stage stage);

struct CheckOptions {
    // Also solve on a mesh with half the element size everywhere (twice the
    // elements around each hole) and report how every peak and section value
    // moves. Off only for quick looks; the calc sheet says so.
    bool two_mesh = true;
    // For sweeps: a per-worker cache that reuses the mesh, the sparse pattern
    // and the fill-reducing ordering when only values change between runs.
    ReuseCache* cache = nullptr;
    // Called as each stage starts, on the calling thread. The pipeline
    // itself prints nothing; cli/ turns these into the terminal's progress
    // line.
    std::function<void(Stage)> on_stage;
    // With two_mesh, solve the convergence mesh on a second thread while the
    // model's mesh is solved and checked. The model mesh's results are those
    // of the sequential order bit for bit: the convergence mesh starts each
    // load case's contact iteration from the model mesh's settled set in
    // either order (analysis::ContactBoard). The convergence mesh's agree to
    // round-off: once the model's mesh is done, its contact cases may settle
    // as two chains on the two cores (analysis::ContactHooks::threads), where
    // memory holds a second copy of its factor. Used only without a cache, on a
    // machine with two or more cores, and when both meshes' estimated memory
    // fits the budget the default dof limit stands for.
    bool concurrent = true;
    // Refuse, before meshing, a model whose mesh (or, with two_mesh, whose
    // finer convergence mesh) is estimated above this many dofs.
    long max_dofs = analysis::default_max_dofs;
    // Called once the model's mesh is solved and checked, before the
    // convergence mesh is awaited, with the outcome complete but for
    // `convergence` and `seconds`: for work that can overlap the convergence
    // mesh, such as rendering the figures (cli/check_command.cpp). The
    // future it returns is waited for before check_connection returns or
    // throws, so the outcome is not moved or destroyed while still read.
    std::function<std::future<void>(const CheckOutcome&)> on_model_outcome;
};

// The highest local stresses of one load case, from the recovered nodal and
// the Gauss-point values (whichever is higher): local, mesh dependent peaks.
struct PeakStress {
    double von_mises = 0;
    Eigen::Vector2d von_mises_at{0, 0};
    double max_principal = 0; // largest σ1, MPa
    Eigen::Vector2d max_principal_at{0, 0};
    double min_principal = 0; // smallest σ2 (most compressive), MPa
    Eigen::Vector2d min_principal_at{0, 0};
    std::string near; // words for the location, e.g. "edge of hole brace[2]"
    // The same search outside the bolt-hole zones (points closer than half a
    // hole diameter to a bolt hole's edge are left out): there the elastic
    // bearing peak stands in for a contact pressure that the bearing and
    // tear-out rows check; elsewhere (re-entrant corners, copes, free edges)
    // a peak is what the peak row is for. Equal to von_mises when the plate
    // has no holes.
    double von_mises_away = 0;
    Eigen::Vector2d von_mises_away_at{0, 0};
    std::string near_away;
    bool has_hole_zone = false;    // some sample point fell inside a bolt-hole zone
    double von_mises_at_holes = 0; // highest von Mises inside the zones
    Eigen::Vector2d von_mises_at_holes_at{0, 0};
    std::string near_at_holes;
};

// One value on the model's mesh and on the finer mesh.
struct ConvergenceRow {
    std::string quantity; // e.g. "peak von Mises", "membrane on whitmore-brace"
    std::string load_case;
    Quantity unit = Quantity::stress;
    double coarse = 0, fine = 0;
    // Values this small are not compared relative to themselves: a shear
    // force near zero on a line in tension would show a meaningless 100 %.
    // Set to 10 % of the largest value of the same unit in the same case.
    double floor = 0;
    // (fine − coarse) / max(|fine|, |coarse|, floor); 0 when all vanish.
    double change() const;
};

struct Convergence {
    bool done = false;
    double coarse_size = 0, fine_size = 0; // element sizes, mm
    int coarse_elements = 0, fine_elements = 0;
    int coarse_dofs = 0, fine_dofs = 0;
    std::vector<ConvergenceRow> rows;
    double largest_change() const; // largest |change()|
};

// Wall seconds of each stage on its own thread: fine_mesh (the convergence
// mesh's meshing, solving and measuring) overlaps the others when it runs
// concurrently.
struct Timings {
    double mesh = 0, analysis = 0, checks = 0, fine_mesh = 0; // seconds
};

// Everything the calc sheet, results.json and a sweep need about one run.
struct CheckOutcome {
    model::Connection connection;
    analysis::PlateLayout layout;
    mesh::Mesh mesh;
    analysis::Results results;
    std::vector<SectionLine> sections;
    std::vector<std::vector<SectionStress>> section_stress; // [case][section], Results::cases order
    std::vector<PeakStress> peaks;                          // per case
    std::vector<WeldLine> welds;
    std::vector<std::vector<WeldForces>> weld_forces; // [case][weld line]
    double element_size = 0;                          // the size the mesher used, mm
    CheckTable table;
    Convergence convergence;
    Timings seconds;
};

// The convergence mesh's settings: half the element size the model's mesh
// uses everywhere, twice the elements round each hole.
mesh::MeshSettings fine_mesh_settings(const geometry::PlateRegion& region,
                                      const mesh::MeshSettings& settings);

// Whether check_connection solves the two meshes concurrently (see
// CheckOptions::concurrent).
bool solves_concurrently(const model::Connection& connection, const CheckOptions& options);

// The resource guard of a check, before anything is meshed: the model's
// mesh and, when `two_mesh`, the finer convergence mesh (about four times
// the dofs) against `max_dofs`. Throws analysis::ResourceLimitError naming
// the mesh, the estimate and what to change (--single-mesh for the second).
void check_resources(const model::Connection& connection, bool two_mesh, long max_dofs);

// Throws InputError for connection data that cannot be modelled and
// AnalysisError for a model that cannot be solved or one above
// options.max_dofs (checked before meshing).
CheckOutcome check_connection(const model::Connection& connection, const CheckOptions& options);

} // namespace lapwing::check
