// Quality figures. det J comes from the isoparametric map x(ξ,η) = Σ N_i x_i
// at sample points; the scaled Jacobian min det J / max det J is 1 for a
// parallelogram and <= 0 for an inverted element (Knupp 2000 uses the same
// ratio at the nodes).
#include "mesh/quality.hpp"

#include "fe/isoparametric_map.hpp"
#include "fe/quadrature.hpp"
#include "fe/shape_functions.hpp"

#include <algorithm>
#include <array>
#include <cmath>
#include <numbers>
#include <vector>

namespace lapwing::mesh {

namespace {

// Reference derivatives of the n-node shape functions at the sample points
// (the 9-node lattice of the reference square and the element's stiffness
// quadrature points, as fe::check_element_map), computed once per kind.
template <int n>
struct Samples {
    std::vector<fe::ShapeDerivatives<n>> dN_dxi;
    Samples() {
        for (int i = 0; i < 9; ++i) {
            const fe::Vector2 r = fe::reference_node(i);
            dN_dxi.push_back(fe::shape<n>(r.x(), r.y()).dN_dxi);
        }
        const fe::SquareRule rule = fe::gauss_square(n == 4 ? 2 : 3); // fe::gauss_order
        for (int q = 0; q < rule.n_points; ++q)
            dN_dxi.push_back(fe::shape<n>(rule.points[q].xi, rule.points[q].eta).dN_dxi);
    }
};

// min det J / max det J over the samples; -1 if det J is nowhere positive.
template <int n>
double scaled_jacobian(const std::array<fe::Vector2, 9>& coords) {
    static const Samples<n> samples;
    fe::NodeCoords<n> X;
    for (int i = 0; i < n; ++i) X.row(i) = coords[i].transpose();
    double lo = HUGE_VAL, hi = -HUGE_VAL;
    for (const auto& dN : samples.dN_dxi) {
        const double det = (X.transpose() * dN).determinant(); // J = Xᵀ · dN_dxi
        lo = std::min(lo, det);
        hi = std::max(hi, det);
    }
    return hi > 0 ? lo / hi : -1.0;
}

} // namespace

ElementQuality element_quality(const Mesh& mesh, int e) {
    const auto nodes = mesh.element(e);
    const int n = static_cast<int>(nodes.size());
    std::array<fe::Vector2, 9> coords;
    for (int i = 0; i < n; ++i) coords[i] = mesh.nodes[nodes[i]];

    ElementQuality q;
    q.scaled_jacobian = n == 4   ? scaled_jacobian<4>(coords)
                        : n == 8 ? scaled_jacobian<8>(coords)
                                 : scaled_jacobian<9>(coords);
    double min_angle = 360.0, max_angle = 0.0, min_edge = HUGE_VAL, max_edge = 0.0;
    for (int k = 0; k < 4; ++k) {
        const Eigen::Vector2d p = coords[k];
        const Eigen::Vector2d a = coords[(k + 1) % 4] - p, b = coords[(k + 3) % 4] - p;
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
    // Nearest rank by selection, not a full sort.
    const auto at = [&](double f) {
        const auto k =
            static_cast<std::ptrdiff_t>(std::floor(f * static_cast<double>(v.size() - 1)));
        std::nth_element(v.begin(), v.begin() + k, v.end());
        return v[static_cast<size_t>(k)];
    };
    s.min = *std::min_element(v.begin(), v.end());
    s.p05 = at(0.05);
    s.median = at(0.5);
    s.max = *std::max_element(v.begin(), v.end());
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
