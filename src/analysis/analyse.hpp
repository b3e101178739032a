// The analysis stage: a connection and its mesh in, results of every load
// case and combination out. Linear models share one factorization for all
// cases; bearing-only ties make the model non-linear, and each case and
// combination is then solved by its own active-set iteration.
#pragma once

#include "analysis/plate_region.hpp"
#include "analysis/results.hpp"
#include "analysis/solver_reuse.hpp"
#include "mesh/mesh.hpp"
#include "model/connection.hpp"

namespace lapwing::analysis {

// Throws InputError for connection data that cannot be modelled and
// AnalysisError, in words, for a model that cannot be solved (unsupported,
// a mechanism, contact that does not settle).
Results analyse(const model::Connection& connection, const mesh::Mesh& mesh,
                const PlateLayout& layout);

// The same, keeping the sparse pattern and the ordering in `reuse` for the
// next analysis of a model with the same topology (sweeps); the results
// are those of the overload above. `reuse` may be null.
Results analyse(const model::Connection& connection, const mesh::Mesh& mesh,
                const PlateLayout& layout, SolverReuse* reuse);

} // namespace lapwing::analysis
