// Before meshing: how many elements, nodes and dofs a plate will have and how
// much memory its analysis will take, and the guard that refuses a model too
// large for the machine with a message that says what to change.
#pragma once

#include "core/error.hpp"
#include "geometry/plate_region.hpp"
#include "mesh/mesh.hpp"
#include "model/connection.hpp"

#include <string>
#include <string_view>

namespace lapwing::analysis {

// Peak resident memory of `lapwing analyse` per dof, measured on
// templates/web-splice.toml (Q8) refined with --set mesh.size: 2.09 kB/dof at
// 1.5e5 dofs, 2.16 kB/dof at 5.9e5, 2.56 kB/dof at 2.3e6 (GNU time, maximum
// resident set size; docs/hardening.md). The sparse factor grows slightly
// faster than the dofs (the Cholesky fill of a 2-D mesh is n log n), so the
// guard rounds up to 2.8 kB. (The 2.3e6-dof run took 44 min on a loaded
// 2-core machine: time, not memory, is what the user notices first.)
inline constexpr double bytes_per_dof = 2800.0;

// The default limit: what a 24 GiB machine holds with 4 GiB left to the
// system, divided by the measured bytes per dof and by the estimate's
// factor (estimated dofs are within ×1.5 of the real mesh; see
// tests/analysis/resource_estimate_test.cpp): 20 GiB / 2.8 kB / 1.5 = 5.1e6,
// rounded down to 5 million dofs.
inline constexpr long default_max_dofs = 5'000'000;

struct ResourceEstimate {
    double elements = 0;
    double nodes = 0;
    double dofs = 0;
    double bytes = 0;        // peak memory of the analysis
    double element_size = 0; // mm, the size the mesher will aim for away from holes
};

// From the region's area, the size field the mesher uses (element size away
// from holes, `around` elements at each hole edge growing by the grading
// rate, finer at re-entrant corners) and the element kind. Cost: one pass
// over the outline, cut-outs and holes; no mesh is built.
ResourceEstimate estimate_resources(const geometry::PlateRegion& region,
                                    const mesh::MeshSettings& settings, int n_extra_dofs = 0);

// The estimate for a connection with its own mesh controls (bolt nodes and
// member rigid bodies counted as extra dofs).
ResourceEstimate estimate_resources(const model::Connection& connection,
                                    const mesh::MeshSettings& settings);

// A model above the dof limit: refused before meshing.
class ResourceLimitError : public AnalysisError {
public:
    using AnalysisError::AnalysisError;
};

// Throws ResourceLimitError when the estimate exceeds `max_dofs`, naming the
// estimate, the limit and what to change (mesh.size, mesh.around_hole,
// --max-dofs). `subject` starts the message ("the model is too large: …").
void check_resources(const ResourceEstimate& estimate, const mesh::MeshSettings& settings,
                     long max_dofs = default_max_dofs, std::string_view subject = "the model");

} // namespace lapwing::analysis
