// Constraints on dofs and the map from the model's dofs to the unknowns of
// the reduced system. Every dof is either free (an unknown), prescribed
// (u = g) or a slave of a linear multipoint constraint u_s = Σ c_m u_m + g.
// Eliminating prescribed and slave dofs, u = T ũ + g, gives K̃ = Tᵀ K T,
// which stays symmetric positive definite (Cook, Malkus, Plesha & Witt 2002,
// §9.2 "transformation" method): no penalty numbers, no Lagrange multipliers.
#pragma once

#include "fe/model.hpp"

#include <span>
#include <utility>
#include <vector>

namespace lapwing::fe {

struct PrescribedDof {
    int dof = -1;
    double value = 0;
};

struct LinearConstraint {
    int slave = -1;
    std::vector<std::pair<int, double>> masters; // (dof, coefficient)
    double offset = 0;
};

struct Constraints {
    std::vector<PrescribedDof> prescribed;
    std::vector<LinearConstraint> linear;
};

// Small-rotation rigid link: the point dofs (ux, uy) of node `point` follow
// the reference node (ux, uy, θ):  ux_p = ux_r − (y_p − y_r) θ,
// uy_p = uy_r + (x_p − x_r) θ. The reference node must be a rotation node.
// Rotation dofs are numbered after every node (model.hpp), so add all nodes
// before the links: a node added later shifts the θ dof this link names.
void add_rigid_link(const Model& model, int reference_node, int point_node,
                    Constraints& constraints);

// u_full = T ũ + g, stored row by row (compressed): full dof d expands to
// the terms [start[d], start[d+1]) of (unknown, coefficient), plus offset[d].
class DofMap {
public:
    DofMap() = default;
    // Throws AnalysisError for a dof constrained twice, a
    // cycle of slaves, or a dof out of range.
    DofMap(int n_dofs, const Constraints& constraints);

    int n_full() const { return static_cast<int>(offset_.size()); }
    int n_unknowns() const { return n_unknowns_; }

    struct Term {
        int unknown;
        double coefficient;
    };
    std::span<const Term> terms(int dof) const {
        return {terms_.data() + start_[static_cast<size_t>(dof)],
                static_cast<size_t>(start_[static_cast<size_t>(dof) + 1] -
                                    start_[static_cast<size_t>(dof)])};
    }
    double offset(int dof) const { return offset_[static_cast<size_t>(dof)]; }
    // The unknown of a free dof, or -1.
    int unknown_of(int dof) const { return unknown_of_[static_cast<size_t>(dof)]; }
    // The full dof of an unknown.
    int dof_of(int unknown) const { return dof_of_[static_cast<size_t>(unknown)]; }
    bool is_free(int dof) const { return unknown_of(dof) >= 0; }

    // u_full = T ũ + g.
    Eigen::VectorXd expand(const Eigen::VectorXd& reduced) const;
    // Tᵀ f_full.
    Eigen::VectorXd restrict_to_unknowns(const Eigen::VectorXd& full) const;

private:
    int n_unknowns_ = 0;
    std::vector<int> start_;
    std::vector<Term> terms_;
    std::vector<double> offset_;
    std::vector<int> unknown_of_;
    std::vector<int> dof_of_;
};

} // namespace lapwing::fe
