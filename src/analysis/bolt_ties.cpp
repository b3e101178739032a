// Spread and bearing ties of a bolt to its hole.
#include "analysis/bolt_ties.hpp"

#include <Eigen/Cholesky>
#include <algorithm>
#include <cmath>
#include <map>
#include <numbers>

namespace lapwing::analysis {

HoleEdge hole_edge(const mesh::Mesh& mesh, const geometry::Hole& hole, int h) {
    std::map<int, double> share;
    double perimeter = 0;
    for (const mesh::BoundaryEdge& e : mesh.boundary_edges) {
        if (e.tag.kind != geometry::BoundaryKind::hole || e.tag.index != h) continue;
        const bool quadratic = e.nodes[2] >= 0;
        const int a = e.nodes[0], b = quadratic ? e.nodes[2] : e.nodes[1];
        double length =
            (mesh.nodes[static_cast<size_t>(b)] - mesh.nodes[static_cast<size_t>(a)]).norm();
        if (quadratic) {
            const auto& m = mesh.nodes[static_cast<size_t>(e.nodes[1])];
            length = (m - mesh.nodes[static_cast<size_t>(a)]).norm() +
                     (mesh.nodes[static_cast<size_t>(b)] - m).norm();
            share[a] += length / 6, share[e.nodes[1]] += 2 * length / 3, share[b] += length / 6;
        } else {
            share[a] += length / 2, share[b] += length / 2;
        }
        perimeter += length;
    }
    HoleEdge out;
    for (const auto& [node, s] : share) {
        out.nodes.push_back(node);
        out.weights.push_back(s / perimeter);
        // Contact acts between the bolt's round shank and the edge, so its line
        // passes through the bolt centre: radial from the centre.
        out.normals.push_back((mesh.nodes[static_cast<size_t>(node)] - hole.centre).normalized());
    }
    // The tie must not resist a rigid rotation about the bolt centre, or it
    // would carry a spurious moment: the weighted centroid Σ w_i x_i must be
    // the centre exactly. A mesh whose hole nodes are not evenly spaced moves
    // it slightly, so correct the weights by the least weighted change,
    // w_i = w0_i (1 + a + b · d_i), d_i = x_i − c, with Σ w_i = 1 and
    // Σ w_i d_i = 0 (a 3 × 3 system for a, b).
    Eigen::Matrix3d M = Eigen::Matrix3d::Zero();
    Eigen::Vector3d rhs = Eigen::Vector3d::Zero();
    for (size_t i = 0; i < out.nodes.size(); ++i) {
        const Eigen::Vector2d d = mesh.nodes[static_cast<size_t>(out.nodes[i])] - hole.centre;
        const Eigen::Vector3d e(1.0, d.x(), d.y());
        M += out.weights[i] * e * e.transpose();
        rhs -= out.weights[i] * Eigen::Vector3d(0.0, d.x(), d.y());
    }
    const Eigen::Vector3d ab = M.ldlt().solve(rhs);
    for (size_t i = 0; i < out.nodes.size(); ++i) {
        const Eigen::Vector2d d = mesh.nodes[static_cast<size_t>(out.nodes[i])] - hole.centre;
        out.weights[i] *= 1.0 + ab(0) + ab(1) * d.x() + ab(2) * d.y();
    }
    return out;
}

void add_spread_tie(int bolt_node, const HoleEdge& edge, fe::Constraints& constraints) {
    fe::LinearConstraint x{fe::dof_ux(bolt_node), {}, 0.0}, y{fe::dof_uy(bolt_node), {}, 0.0};
    for (size_t i = 0; i < edge.nodes.size(); ++i) {
        x.masters.emplace_back(fe::dof_ux(edge.nodes[i]), edge.weights[i]);
        y.masters.emplace_back(fe::dof_uy(edge.nodes[i]), edge.weights[i]);
    }
    constraints.linear.push_back(std::move(x));
    constraints.linear.push_back(std::move(y));
}

int add_bearing_contact(int bolt_node, const HoleEdge& edge, double penalty, fe::Model& model,
                        std::vector<double>& stiffness) {
    const int first = static_cast<int>(model.link_springs.size());
    for (size_t i = 0; i < edge.nodes.size(); ++i) {
        const double k = penalty * edge.weights[i];
        model.link_springs.push_back({bolt_node, edge.nodes[i], edge.normals[i], k});
        stiffness.push_back(k);
    }
    return first;
}

} // namespace lapwing::analysis
