// Rigid-motion test: a rigid motion r (translation or small rotation of every
// node, rotation dofs included) that satisfies the homogeneous constraints
// and has zero strain energy rᵀ K̃ r is a null vector of K̃. Testing the three
// basic motions and their combinations finds exactly the supports that are
// missing (e.g. a single pinned point leaves the rotation about it free).
#include "fe/restraint_check.hpp"

#include "fe/sparse_cholesky.hpp"

#include <Eigen/Eigenvalues>
#include <cmath>
#include <fmt/format.h>

namespace lapwing::fe {

std::string FreeRigidMotion::describe() const {
    if (is_rotation)
        return fmt::format("free to rotate about ({:.4g}, {:.4g})", centre.x(), centre.y());
    return fmt::format("free to translate along ({:.3f}, {:.3f})", direction.x(), direction.y());
}

std::vector<FreeRigidMotion> free_rigid_motions(const Model& model, const DofMap& map,
                                                const Constraints& constraints,
                                                const SparsePattern& pattern,
                                                std::span<const double> values) {
    const int n_dofs = model.n_dofs();
    Vector2 centre(0, 0);
    for (const Vector2& x : model.nodes) centre += x;
    if (model.n_nodes() > 0) centre /= model.n_nodes();
    double size = 0;
    for (const Vector2& x : model.nodes) size = std::max(size, (x - centre).norm());
    if (size == 0) size = 1;

    // Basic motions as columns: translation x, translation y, rotation about
    // the centroid (scaled by the model size so the three are comparable).
    Eigen::MatrixXd r = Eigen::MatrixXd::Zero(n_dofs, 3);
    for (int i = 0; i < model.n_nodes(); ++i) {
        const Vector2 d = (model.nodes[static_cast<size_t>(i)] - centre) / size;
        r(dof_ux(i), 0) = 1;
        r(dof_uy(i), 1) = 1;
        r(dof_ux(i), 2) = -d.y();
        r(dof_uy(i), 2) = d.x();
    }
    for (int k = 0; k < static_cast<int>(model.rotation_nodes.size()); ++k)
        r(dof_rotation(model, k), 2) = 1.0 / size;

    // Homogeneous constraints on the combination a: prescribed dofs do not
    // move, slaves follow their masters. Accumulate CᵀC (3×3).
    Eigen::Matrix3d CtC = Eigen::Matrix3d::Zero();
    for (const auto& p : constraints.prescribed) {
        const Eigen::RowVector3d c = r.row(p.dof);
        CtC += c.transpose() * c;
    }
    for (const auto& lc : constraints.linear) {
        Eigen::RowVector3d c = r.row(lc.slave);
        for (const auto& [m, coefficient] : lc.masters) c -= coefficient * r.row(m);
        CtC += c.transpose() * c;
    }
    const Eigen::SelfAdjointEigenSolver<Eigen::Matrix3d> constraint_modes(CtC);
    const double c_scale = std::max(1.0, CtC.trace());
    Eigen::MatrixXd basis(3, 0);
    for (int k = 0; k < 3; ++k)
        if (constraint_modes.eigenvalues()(k) <= 1e-12 * c_scale) {
            basis.conservativeResize(3, basis.cols() + 1);
            basis.col(basis.cols() - 1) = constraint_modes.eigenvectors().col(k);
        }
    if (basis.cols() == 0) return {};

    // Energy of the allowed motions in the reduced system, against a scale
    // that any restrained motion exceeds by far: Σ K̃_ii r̃_i².
    const Eigen::MatrixXd motions = r * basis; // n_dofs × m
    Eigen::MatrixXd reduced = Eigen::MatrixXd::Zero(map.n_unknowns(), motions.cols());
    for (int u = 0; u < map.n_unknowns(); ++u) reduced.row(u) = motions.row(map.dof_of(u));
    const Eigen::MatrixXd K_r = symmetric_multiply(pattern, values, reduced);
    const Eigen::MatrixXd energy = reduced.transpose() * K_r;
    Eigen::VectorXd diagonal = Eigen::VectorXd::Zero(map.n_unknowns());
    for (int j = 0; j < pattern.n; ++j) {
        const long p = pattern.find(j, j);
        if (p >= 0) diagonal(j) = values[static_cast<size_t>(p)];
    }
    Eigen::MatrixXd scale = reduced.transpose() * diagonal.asDiagonal() * reduced;
    const Eigen::GeneralizedSelfAdjointEigenSolver<Eigen::MatrixXd> energy_modes(energy, scale);

    std::vector<FreeRigidMotion> free;
    for (int k = 0; k < energy_modes.eigenvalues().size(); ++k) {
        if (energy_modes.eigenvalues()(k) > 1e-12) continue; // round-off energy is ~1e-16
        const Eigen::Vector3d a = basis * energy_modes.eigenvectors().col(k);
        FreeRigidMotion m;
        const double translation = std::hypot(a(0), a(1));
        if (std::abs(a(2)) > 1e-6 * std::max(translation, 1e-300)) {
            // u = t + θ ẑ × (x − c) vanishes at x − c = (−t_y, t_x)/θ (θ = a2/size).
            m.is_rotation = true;
            m.centre = centre + Vector2(-a(1), a(0)) * size / a(2);
            // Round-off relative to the model size is not information.
            for (int i = 0; i < 2; ++i)
                if (std::abs(m.centre(i)) < 1e-9 * size) m.centre(i) = 0;
        } else {
            m.direction = Vector2(a(0), a(1)) / translation;
        }
        free.push_back(m);
    }
    return free;
}

} // namespace lapwing::fe
