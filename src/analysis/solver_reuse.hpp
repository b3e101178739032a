// Solver state kept from one analysis to the next, for sweeps: when the next
// model has the same topology and the same constraints as the last, its
// stiffness is refilled into the kept sparse pattern and refactorized with
// the kept fill-reducing ordering (fe::LinearStaticProblem::refactorize)
// instead of building both again. One per worker thread: not shared.
#pragma once

#include "fe/constraints.hpp"
#include "fe/linear_static.hpp"
#include "fe/model.hpp"

#include <functional>
#include <memory>
#include <string>

namespace lapwing::analysis {

class SolverReuse {
public:
    // The problem for `model` under `constraints`, factorized with the
    // model's values. The kept problem is reused when the topology (elements,
    // springs, link springs, rotation dofs) and the constraints equal those
    // it was built for; otherwise a new one replaces it. The problem refers
    // to `model` until the next call. `before_values` may change the link
    // springs' stiffness before the factorization: a new problem calls it as
    // the LinearStaticProblem constructor does, a kept one before it
    // refactorizes. Throws AnalysisError as that constructor does.
    fe::LinearStaticProblem& problem_for(const fe::Model& model, const fe::Constraints& constraints,
                                         const std::function<void()>& before_values = {});

    int n_built() const { return n_built_; }
    int n_reused() const { return n_reused_; }

private:
    std::string key_; // topology and constraints of the kept problem, as bytes
    std::unique_ptr<fe::LinearStaticProblem> problem_;
    int n_built_ = 0, n_reused_ = 0;
};

// The bytes that decide the sparse pattern and the dof map: equal keys mean
// the pattern and ordering of one model serve the other.
std::string topology_key(const fe::Model& model, const fe::Constraints& constraints);

} // namespace lapwing::analysis
