// Equal-share bolt forces and their cosine bearing pressures.
#include "analysis/bearing_share.hpp"

#include "fe/edge_load.hpp"

#include <cmath>
#include <map>
#include <numbers>

namespace lapwing::analysis {

std::vector<Eigen::Vector2d> elastic_shares(const std::vector<Eigen::Vector2d>& centres,
                                            const Eigen::Vector2d& force, double moment,
                                            const Eigen::Vector2d& about) {
    const auto n = static_cast<double>(centres.size());
    std::vector<Eigen::Vector2d> out;
    if (centres.empty()) return out;
    Eigen::Vector2d c(0, 0);
    for (const auto& x : centres) c += x;
    c /= n;
    // The moment about the centroid: M plus the moment of F acting at `about`.
    const Eigen::Vector2d arm = about - c;
    const double m = moment + arm.x() * force.y() - arm.y() * force.x();
    double polar = 0;
    for (const auto& x : centres) polar += (x - c).squaredNorm();
    for (const auto& x : centres) {
        Eigen::Vector2d f = force / n;
        if (polar > 0) {
            const Eigen::Vector2d r = x - c;
            f += m / polar * Eigen::Vector2d(-r.y(), r.x());
        }
        out.push_back(f);
    }
    return out;
}

double cosine_peak_pressure(double P, double d, double t) {
    return 4.0 * P / (std::numbers::pi * d * t);
}

std::vector<std::pair<int, double>> cosine_bearing_forces(const fe::Model& model,
                                                          const mesh::Mesh& mesh, int hole,
                                                          const Eigen::Vector2d& centre, double d,
                                                          double thickness,
                                                          const Eigen::Vector2d& force) {
    std::vector<std::pair<int, double>> out;
    const double P = force.norm();
    if (P <= 0) return out;
    const Eigen::Vector2d along = force / P;
    const double p0 = cosine_peak_pressure(P, d, thickness);
    // The bolt pushes the material ahead of it: on the plate the traction is
    // p(θ) along the radius from the centre (into the material), where
    // cos θ = r̂ · along > 0, and zero on the other half.
    const fe::TractionField pressure = [&](const fe::Vector2& x, const fe::Vector2&) {
        const Eigen::Vector2d r = (x - centre).normalized();
        const double cos_theta = r.dot(along);
        return cos_theta > 0 ? Eigen::Vector2d(p0 * cos_theta * r) : Eigen::Vector2d(0, 0);
    };
    std::map<int, double> sum;
    for (const mesh::BoundaryEdge& e : mesh.boundary_edges) {
        if (e.tag.kind != geometry::BoundaryKind::hole || e.tag.index != hole) continue;
        for (const auto& [dof, value] :
             fe::edge_traction_forces(model, e.element, e.local_edge, pressure))
            sum[dof] += value;
    }
    Eigen::Vector2d resultant(0, 0);
    for (const auto& [dof, value] : sum) resultant[dof % 2] += value;
    if (resultant.norm() <= 0) return out;
    // Scale and turn so the resultant is exactly `force` (a correction of the
    // order of the quadrature error at the kinks, well under 1 %).
    const double angle =
        std::atan2(force.y(), force.x()) - std::atan2(resultant.y(), resultant.x());
    const double s = P / resultant.norm();
    const double c = s * std::cos(angle), sn = s * std::sin(angle);
    std::map<int, Eigen::Vector2d> by_node;
    for (const auto& [dof, value] : sum)
        by_node.try_emplace(dof / 2, Eigen::Vector2d::Zero()).first->second[dof % 2] = value;
    for (auto& [node, f] : by_node) {
        const Eigen::Vector2d g(c * f.x() - sn * f.y(), sn * f.x() + c * f.y());
        out.push_back({fe::dof_ux(node), g.x()});
        out.push_back({fe::dof_uy(node), g.y()});
    }
    return out;
}

} // namespace lapwing::analysis
