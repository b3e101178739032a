// The analysis stage: a connection and its mesh in, results of every load
// case and combination out. Linear models share one factorization for all
// cases; bearing-only ties make the model non-linear, and each case and
// combination is then solved by its own active-set iteration.
#pragma once

#include "analysis/contact_seed.hpp"
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

// The same, exchanging contact seeds through `hooks` (may be null): each
// settled case is reported, and a case with a seed starts its active-set
// iteration from the seed mapped onto this mesh (the first case's seed also
// sets the springs of the first factorization). The settled sets, and so the
// results to round-off, are those of a start without seeds; only the number
// of passes changes.
Results analyse(const model::Connection& connection, const mesh::Mesh& mesh,
                const PlateLayout& layout, SolverReuse* reuse, const ContactHooks* hooks);

} // namespace lapwing::analysis
