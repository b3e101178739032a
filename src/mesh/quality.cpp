// Quality figures. det J comes from the isoparametric map x(ξ,η) = Σ N_i x_i
// at sample points; the scaled Jacobian min det J / max det J is 1 for a
// parallelogram and <= 0 for an inverted element (Knupp 2000 uses the same
// ratio at the nodes).
#include "mesh/quality.hpp"

#include "mesh/shape_derivatives.hpp"

#include <algorithm>
#include <cmath>
#include <numbers>

namespace lapwing::mesh {

ElementQuality element_quality(const Mesh& mesh, int e) {
    const auto nodes = mesh.element(e);
    const int n = static_cast<int>(nodes.size());
    Eigen::Matrix<double, 2, 9> x = Eigen::Matrix<double, 2, 9>::Zero();
    for (int i = 0; i < n; ++i) x.col(i) = mesh.nodes[nodes[i]];

    // Sample points: the nine points of the 3×3 Gauss rule and the nine node
    // positions of the reference square (corners, mid-sides, centre).
    const double g = std::sqrt(0.6);
    double lo = HUGE_VAL, hi = -HUGE_VAL;
    for (double xi : {-1.0, -g, 0.0, g, 1.0}) {
        for (double eta : {-1.0, -g, 0.0, g, 1.0}) {
            const bool gauss = std::abs(xi) != 1.0 && std::abs(eta) != 1.0;
            const bool node =
                (xi == 0.0 || std::abs(xi) == 1.0) && (eta == 0.0 || std::abs(eta) == 1.0);
            if (!gauss && !node) continue;
            const double det = detail::jacobian_determinant(mesh.kind, x, xi, eta);
            lo = std::min(lo, det);
            hi = std::max(hi, det);
        }
    }
    ElementQuality q;
    q.scaled_jacobian = hi > 0 ? lo / hi : -1.0;
    double min_angle = 360.0, max_angle = 0.0, min_edge = HUGE_VAL, max_edge = 0.0;
    for (int k = 0; k < 4; ++k) {
        const Eigen::Vector2d p = x.col(k);
        const Eigen::Vector2d a = x.col((k + 1) % 4) - p, b = x.col((k + 3) % 4) - p;
        const double angle =
            std::atan2(a.x() * b.y() - a.y() * b.x(), a.dot(b)) * 180.0 / std::numbers::pi;
        const double interior = angle < 0 ? angle + 360.0 : angle;
        min_angle = std::min(min_angle, interior);
        max_angle = std::max(max_angle, interior);
        min_edge = std::min(min_edge, a.norm());
        max_edge = std::max(max_edge, a.norm());
    }
    q.min_angle_deg = min_angle;
    q.max_angle_deg = max_angle;
    q.aspect_ratio = min_edge > 0 ? max_edge / min_edge : HUGE_VAL;
    return q;
}

Summary summarize(std::vector<double> v) {
    Summary s;
    if (v.empty()) return s;
    std::sort(v.begin(), v.end());
    const auto at = [&](double f) {
        return v[static_cast<size_t>(std::floor(f * static_cast<double>(v.size() - 1)))];
    };
    s.min = v.front();
    s.p05 = at(0.05);
    s.median = at(0.5);
    s.max = v.back();
    return s;
}

void compute_quality(Mesh& mesh) {
    const int n = mesh.n_elements();
    mesh.quality.resize(n);
    std::vector<double> sj(n), amin(n), amax(n), ar(n);
    int ok = 0, inverted = 0;
    for (int e = 0; e < n; ++e) {
        const ElementQuality q = element_quality(mesh, e);
        mesh.quality[e] = q;
        sj[e] = q.scaled_jacobian;
        amin[e] = q.min_angle_deg;
        amax[e] = q.max_angle_deg;
        ar[e] = q.aspect_ratio;
        if (q.min_angle_deg >= 30.0 && q.max_angle_deg <= 150.0) ++ok;
        if (q.scaled_jacobian <= 0.0) ++inverted;
    }
    QualitySummary& s = mesh.quality_summary;
    s.scaled_jacobian = summarize(sj);
    s.min_angle_deg = summarize(amin);
    s.max_angle_deg = summarize(amax);
    s.aspect_ratio = summarize(ar);
    s.n_inverted = inverted;
    s.fraction_angles_ok = n > 0 ? static_cast<double>(ok) / n : 1.0;
}

} // namespace lapwing::mesh
