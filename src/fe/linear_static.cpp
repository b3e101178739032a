// Assemble, check supports, factorize, solve, and report the residual.
#include "fe/linear_static.hpp"

#include "core/error.hpp"
#include "fe/restraint_check.hpp"

#include <chrono>
#include <cmath>
#include <fmt/format.h>

namespace lapwing::fe {

namespace {
double seconds_since(std::chrono::steady_clock::time_point start) {
    return std::chrono::duration<double>(std::chrono::steady_clock::now() - start).count();
}

std::string describe_dof(const Model& model, int dof) {
    if (dof >= 2 * model.n_nodes()) {
        const int node = model.rotation_nodes[static_cast<size_t>(dof - 2 * model.n_nodes())];
        const Vector2& x = model.nodes[static_cast<size_t>(node)];
        return fmt::format("the rotation of node {} at ({:.4g}, {:.4g})", node, x.x(), x.y());
    }
    const Vector2& x = model.nodes[static_cast<size_t>(dof / 2)];
    return fmt::format("{} of node {} at ({:.4g}, {:.4g})", dof % 2 == 0 ? "ux" : "uy", dof / 2,
                       x.x(), x.y());
}
} // namespace

Eigen::VectorXd applied_forces(const Model& model, const Loads& loads) {
    Eigen::VectorXd f = Eigen::VectorXd::Zero(model.n_dofs());
    for (const auto& [dof, value] : loads.nodal) f(dof) += value;
    for (const EdgeLoad& load : loads.edges)
        for (const auto& [dof, value] : edge_load_forces(model, load)) f(dof) += value;
    return f;
}

LinearStaticProblem::LinearStaticProblem(const Model& model, Constraints constraints,
                                         SolverOptions options,
                                         const std::function<void()>& before_values)
    : model_(&model), constraints_(std::move(constraints)), map_(model.n_dofs(), constraints_),
      cholesky_(make_sparse_cholesky(options)) {
    if (map_.n_unknowns() == 0)
        throw AnalysisError("every dof of the model is constrained: nothing to solve");
    const auto start = std::chrono::steady_clock::now();
    assembler_ = std::make_unique<Assembler>(model, map_);
    stats_.seconds_pattern = seconds_since(start);
    stats_.n_dofs = model.n_dofs();
    stats_.n_unknowns = map_.n_unknowns();
    cholesky_->analyse(assembler_->pattern());
    if (!before_values) {
        assemble_and_factorize();
        return;
    }
    // The values that before_values cannot change are assembled first, so
    // that a wait in it overlaps them too.
    const auto assembly = std::chrono::steady_clock::now();
    assembler_->assemble_all_but_links(model, values_, prescribed_load_);
    const double seconds = seconds_since(assembly);
    before_values();
    const auto links = std::chrono::steady_clock::now();
    assembler_->add_link_springs(model, values_, prescribed_load_);
    stats_.seconds_assemble = seconds + seconds_since(links);
    check_and_factorize();
}

LinearStaticProblem::LinearStaticProblem(const LinearStaticProblem& other, const Model& model,
                                         std::unique_ptr<SparseCholesky> cholesky)
    : model_(&model), constraints_(other.constraints_), map_(other.map_),
      assembler_(std::make_unique<Assembler>(*other.assembler_, map_)), values_(other.values_),
      prescribed_load_(other.prescribed_load_), cholesky_(std::move(cholesky)),
      factored_link_k_(other.factored_link_k_), stats_(other.stats_) {}

std::unique_ptr<LinearStaticProblem> LinearStaticProblem::copy_for(const Model& model) const {
    std::unique_ptr<SparseCholesky> cholesky = cholesky_->clone();
    if (!cholesky) return nullptr;
    return std::unique_ptr<LinearStaticProblem>(
        new LinearStaticProblem(*this, model, std::move(cholesky)));
}

void LinearStaticProblem::refactorize(const Model& model) {
    model_ = &model;
    assemble_and_factorize();
}

void LinearStaticProblem::assemble_and_factorize() {
    const auto start = std::chrono::steady_clock::now();
    assembler_->assemble(*model_, values_, prescribed_load_);
    stats_.seconds_assemble = seconds_since(start);
    check_and_factorize();
}

void LinearStaticProblem::check_and_factorize() {
    const auto free =
        free_rigid_motions(*model_, map_, constraints_, assembler_->pattern(), values_);
    if (!free.empty()) {
        std::string what;
        if (free.size() == 3)
            what = "it has no supports at all: it can translate in x and y and rotate";
        else
            for (const auto& m : free) what += (what.empty() ? "" : "; ") + m.describe();
        throw AnalysisError("the model is not restrained against rigid-body motion: " + what);
    }
    try {
        cholesky_->factorize(assembler_->pattern(), values_);
    } catch (const NotPositiveDefinite& e) {
        throw AnalysisError(fmt::format("the stiffness matrix is singular: part of the model is a "
                                        "mechanism or is not connected "
                                        "to the supports (the factorization failed at {})",
                                        describe_dof(*model_, map_.dof_of(e.unknown()))));
    }
    stats_.factor = cholesky_->stats();
    factored_link_k_.resize(model_->link_springs.size());
    for (size_t j = 0; j < factored_link_k_.size(); ++j)
        factored_link_k_[j] = model_->link_springs[j].k;
    // A positive but vanishing pivot: singular in all but round-off.
    if (stats_.factor.rcond < 1e-15)
        throw AnalysisError(
            fmt::format("the stiffness matrix is singular to working precision (reciprocal "
                        "condition {:.2g}): part "
                        "of the model is a mechanism or is not connected to the supports",
                        stats_.factor.rcond));
}

bool LinearStaticProblem::update_link_springs(const Model& model, int max_rank) {
    model_ = &model;
    // Stiffness added and removed, one column sqrt|dk| c̃ per changed spring.
    std::vector<Eigen::Triplet<double>> added, removed;
    int n_added = 0, n_removed = 0;
    // values_ is updated in place: a refactorization assembles it anew.
    std::vector<std::pair<int, double>> column;
    for (size_t j = 0; j < factored_link_k_.size(); ++j) {
        const double dk = model.link_springs[j].k - factored_link_k_[j];
        if (dk == 0.0) continue;
        if (!assembler_->link_column(model, static_cast<int>(j), column) ||
            n_added + n_removed >= max_rank) {
            refactorize(model);
            return false;
        }
        assembler_->add_outer(column, dk, values_);
        auto& entries = dk > 0 ? added : removed;
        const int col = dk > 0 ? n_added++ : n_removed++;
        for (const auto& [unknown, c] : column)
            entries.emplace_back(unknown, col, std::sqrt(std::abs(dk)) * c);
    }
    if (n_added + n_removed == 0) return true;
    const auto as_matrix = [&](const std::vector<Eigen::Triplet<double>>& entries, int cols) {
        Eigen::SparseMatrix<double> m(map_.n_unknowns(), cols);
        m.setFromTriplets(entries.begin(), entries.end());
        return m;
    };
    // Additions first: a downdate of the larger matrix loses less.
    const bool ok = (n_added == 0 || cholesky_->modify(as_matrix(added, n_added), true)) &&
                    (n_removed == 0 || cholesky_->modify(as_matrix(removed, n_removed), false));
    if (!ok || cholesky_->stats().rcond < 1e-15) {
        refactorize(model); // and its messages, should the matrix be singular
        return false;
    }
    for (size_t j = 0; j < factored_link_k_.size(); ++j)
        factored_link_k_[j] = model.link_springs[j].k;
    stats_.factor = cholesky_->stats();
    return true;
}

Eigen::VectorXd LinearStaticProblem::unknowns(const Loads& loads) const {
    return cholesky_->solve(map_.restrict_to_unknowns(applied_forces(*model_, loads)) +
                            prescribed_load_);
}

Eigen::VectorXd LinearStaticProblem::displacements(const Loads& loads) const {
    return map_.expand(unknowns(loads));
}

Solution LinearStaticProblem::solve(const Loads& loads) const {
    return solve(std::span<const Loads>(&loads, 1)).front();
}

std::vector<Solution> LinearStaticProblem::solve(std::span<const Loads> load_cases) const {
    const auto n_cases = static_cast<int>(load_cases.size());
    Eigen::MatrixXd f_full(model_->n_dofs(), n_cases);
    Eigen::MatrixXd f_reduced(map_.n_unknowns(), n_cases);
    for (int c = 0; c < n_cases; ++c) {
        f_full.col(c) = applied_forces(*model_, load_cases[static_cast<size_t>(c)]);
        f_reduced.col(c) = map_.restrict_to_unknowns(f_full.col(c)) + prescribed_load_;
    }
    return solutions(f_full, f_reduced, cholesky_->solve(f_reduced));
}

Solution LinearStaticProblem::solution_of(const Loads& loads,
                                          const Eigen::VectorXd& unknowns) const {
    const Eigen::VectorXd f_full = applied_forces(*model_, loads);
    const Eigen::VectorXd f_reduced = map_.restrict_to_unknowns(f_full) + prescribed_load_;
    return solutions(f_full, f_reduced, unknowns).front();
}

std::vector<Solution> LinearStaticProblem::solutions(const Eigen::MatrixXd& f_full,
                                                     const Eigen::MatrixXd& f_reduced,
                                                     const Eigen::MatrixXd& u_reduced) const {
    const auto n_cases = static_cast<int>(f_full.cols());
    const Eigen::MatrixXd residual =
        symmetric_multiply(assembler_->pattern(), values_, u_reduced) - f_reduced;

    Eigen::MatrixXd u_full(model_->n_dofs(), n_cases);
    for (int c = 0; c < n_cases; ++c) u_full.col(c) = map_.expand(u_reduced.col(c));
    const Eigen::MatrixXd internal = assembler_->internal_forces(*model_, u_full);

    std::vector<Solution> out(static_cast<size_t>(n_cases));
    for (int c = 0; c < n_cases; ++c) {
        Solution& s = out[static_cast<size_t>(c)];
        s.u = u_full.col(c);
        s.applied = f_full.col(c);
        s.reactions = internal.col(c) - f_full.col(c);
        const double norm_f = f_reduced.col(c).norm();
        s.relative_residual = norm_f > 0 ? residual.col(c).norm() / norm_f : residual.col(c).norm();
        if (!s.u.allFinite())
            throw AnalysisError(
                "the solution contains values that are not finite: the model is singular");
    }
    return out;
}

} // namespace lapwing::fe
