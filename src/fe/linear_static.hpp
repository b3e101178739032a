// A linear static problem K u = f under constraints: assemble once, check the
// supports, factorize once, then solve any number of load cases. A new set of
// values on the same topology (another thickness) refills and refactorizes
// without rebuilding the pattern or the ordering.
#pragma once

#include "fe/assembly.hpp"
#include "fe/constraints.hpp"
#include "fe/edge_load.hpp"
#include "fe/model.hpp"
#include "fe/sparse_cholesky.hpp"

#include <functional>
#include <memory>
#include <span>
#include <vector>

namespace lapwing::fe {

struct Loads {
    std::vector<std::pair<int, double>> nodal; // (dof, force in N)
    std::vector<EdgeLoad> edges;
};

struct Solution {
    Eigen::VectorXd u;            // every dof of the model
    Eigen::VectorXd reactions;    // K u − f at every dof: support and constraint forces
    Eigen::VectorXd applied;      // f at every dof (nodal and edge loads)
    double relative_residual = 0; // ‖K̃ũ − f̃‖ / ‖f̃‖ of the reduced system
};

struct ProblemStats {
    int n_dofs = 0;
    int n_unknowns = 0;
    double seconds_pattern = 0;
    double seconds_assemble = 0;
    FactorStats factor;
};

class LinearStaticProblem {
public:
    // Keeps a reference to `model`, which must outlive the problem (and
    // refers to its own members, so it is neither copied nor moved). Throws
    // AnalysisError when the model is not restrained against rigid-body
    // motion, has a mechanism, or has an inverted element.
    //
    // `before_values`, when given, is called once the sparse pattern, the
    // fill-reducing ordering (both depend on the topology alone) and every
    // value but the link springs' are made, before the factorization: it
    // may change the link springs' stiffness, and nothing else, and may
    // block, e.g. until a contact start set computed on another thread
    // exists, so that the work before it overlaps the wait.
    LinearStaticProblem(const Model& model, Constraints constraints, SolverOptions options = {},
                        const std::function<void()>& before_values = {});

    // Same topology, new values (coordinates, thickness, materials, springs):
    // reassemble and refactorize, reusing the pattern and the ordering.
    // The constraints are kept as given: a rigid link's coefficients stay
    // those of the coordinates at construction.
    void refactorize(const Model& model);

    // refactorize() for a model whose only change since the last
    // factorization is the stiffness of some link springs (contact by an
    // active set): up to `max_rank` changed springs modify the factor
    // (SparseCholesky::modify) instead of factorizing it again. Skips the
    // restraint check, which removing springs cannot fail before the
    // factorization does. Returns false when it refactorized instead. The
    // default rank: on the demo gusset's finer mesh (10⁵ unknowns) a
    // rank-600 modification cost less CPU time than the refactorization it
    // replaced (tests/bench, docs/benchmarks.md).
    bool update_link_springs(const Model& model, int max_rank = 2048);

    LinearStaticProblem(const LinearStaticProblem&) = delete;
    LinearStaticProblem& operator=(const LinearStaticProblem&) = delete;

    // An independent copy of this problem in its current state (values and
    // factor), over `model`, which has this problem's topology and must
    // outlive the copy: to change springs and solve on another thread.
    // nullptr where the solver back end cannot copy its factor.
    std::unique_ptr<LinearStaticProblem> copy_for(const Model& model) const;

    Solution solve(const Loads& loads) const;
    // One factorization, many right-hand sides.
    std::vector<Solution> solve(std::span<const Loads> load_cases) const;
    // The displacements of every dof alone, without reactions and residual.
    Eigen::VectorXd displacements(const Loads& loads) const;
    // The unknowns ũ of the reduced system alone (u = dof_map().expand(ũ)).
    Eigen::VectorXd unknowns(const Loads& loads) const;
    // What solve(loads) returns, from the unknowns that unknowns(loads) has
    // just returned on the current factor: the reactions and the residual
    // without solving again (a contact iteration's settled pass).
    Solution solution_of(const Loads& loads, const Eigen::VectorXd& unknowns) const;

    const Model& model() const { return *model_; }
    const DofMap& dof_map() const { return map_; }
    const Constraints& constraints() const { return constraints_; }
    const ProblemStats& stats() const { return stats_; }

private:
    LinearStaticProblem(const LinearStaticProblem& other, const Model& model,
                        std::unique_ptr<SparseCholesky> cholesky);
    void assemble_and_factorize();
    // The support check and the factorization of the assembled values.
    void check_and_factorize();
    std::vector<Solution> solutions(const Eigen::MatrixXd& f_full, const Eigen::MatrixXd& f_reduced,
                                    const Eigen::MatrixXd& u_reduced) const;

    const Model* model_;
    Constraints constraints_;
    DofMap map_;
    std::unique_ptr<Assembler> assembler_;
    std::vector<double> values_;
    Eigen::VectorXd prescribed_load_;
    std::unique_ptr<SparseCholesky> cholesky_;
    std::vector<double> factored_link_k_; // link spring stiffness in the factor
    ProblemStats stats_;
};

// Applied forces of a load set on every dof of the model.
Eigen::VectorXd applied_forces(const Model& model, const Loads& loads);

} // namespace lapwing::fe
