// Element stiffness by Gauss quadrature; reads like the formulation in
// docs/theory.md §3–4.
#include "fe/element_stiffness.hpp"

#include "core/error.hpp"
#include "fe/element_kind.hpp"
#include "fe/isoparametric_map.hpp"
#include "fe/reference_element.hpp"
#include "fe/strain_operator.hpp"

#include <Eigen/LU>
#include <algorithm>
#include <array>
#include <cmath>
#include <fmt/format.h>

namespace lapwing::fe {

namespace {

// An element whose det J falls below this fraction of its mean somewhere is
// degenerate (collapsed corner, sliver) even if not inverted.
constexpr double min_det_J_fraction = 1e-6;

// Throws the detailed error (element, point, value) for an element whose map
// is not positive somewhere.
template <int n>
constexpr ElementKind standard_kind() {
    return n == 4 ? ElementKind::Q4 : n == 8 ? ElementKind::Q8 : ElementKind::Q9;
}

// Full det J check of an element (reference nodes and Gauss points).
template <int n>
void check_map(const NodeCoords<n>& X, ElementKind kind, int element_id) {
    std::array<Vector2, 9> coords;
    for (int i = 0; i < n; ++i) coords[static_cast<size_t>(i)] = X.row(i).transpose();
    check_element_map(kind, std::span<const Vector2>(coords.data(), n), element_id,
                      min_det_J_fraction);
}

template <int n>
[[noreturn]] void report_bad_map(const NodeCoords<n>& X, int element_id,
                                 ElementKind kind = standard_kind<n>()) {
    check_map<n>(X, kind, element_id);
    throw AnalysisError(fmt::format("element {} has a non-positive Jacobian", element_id));
}

// The Gauss points can all be positive while a reflex corner of a Q4 is not;
// det J of a Q4 is linear in ξ and η, so its corner values decide. At corner
// i it is ¼ of the cross product of the two edges meeting there, and the
// mean det J is ¼ of the area.
bool q4_corners_positive(const NodeCoords<4>& X) {
    double area = 0;
    for (int i = 0; i < 4; ++i) area += X(i, 0) * X((i + 1) % 4, 1) - X((i + 1) % 4, 0) * X(i, 1);
    area *= 0.5;
    for (int i = 0; i < 4; ++i) {
        const Vector2 a = X.row((i + 1) % 4) - X.row(i);
        const Vector2 b = X.row((i + 3) % 4) - X.row(i);
        if (a.x() * b.y() - a.y() * b.x() <= min_det_J_fraction * area) return false;
    }
    return true;
}

} // namespace

template <int n>
ElementMatrix<n> stiffness(const NodeCoords<n>& X, const Matrix3& D, double t, int element_id) {
    const auto& ref = ReferenceElement<n>::get();
    if constexpr (n == 4) {
        if (!q4_corners_positive(X)) report_bad_map<n>(X, element_id);
    } else {
        // det J of a quadratic element is not linear: its extremes can sit at
        // corners or mid-sides between the Gauss points, so sample them.
        check_map<n>(X, standard_kind<n>(), element_id);
    }
    ElementMatrix<n> k = ElementMatrix<n>::Zero();
    double min_det_J = INFINITY, area = 0;
    for (int q = 0; q < ref.rule.n_points; ++q) {
        const auto& s = ref.at_points[static_cast<size_t>(q)];
        const Jacobian J = jacobian<n>(X, s.dN_dxi);
        if (J.det() <= 0) report_bad_map<n>(X, element_id);
        min_det_J = std::min(min_det_J, J.det());
        area += J.det() * ref.rule.points[static_cast<size_t>(q)].w;
        const StrainOperator<n> B = strain_operator<n>(physical_derivatives<n>(s.dN_dxi, J));
        const double w = ref.rule.points[static_cast<size_t>(q)].w;
        // Bᵀ (D B) as a coefficient-wise product of fixed size: Eigen's
        // general matrix product (chosen for 2n×3×2n) costs several times
        // more for matrices this small.
        const StrainOperator<n> DB = D * B * (t * J.det() * w);
        k.noalias() += B.transpose().lazyProduct(DB);
    }
    if (min_det_J < min_det_J_fraction * area / 4.0) report_bad_map<n>(X, element_id);
    return k;
}

template ElementMatrix<4> stiffness<4>(const NodeCoords<4>&, const Matrix3&, double, int);
template ElementMatrix<8> stiffness<8>(const NodeCoords<8>&, const Matrix3&, double, int);
template ElementMatrix<9> stiffness<9>(const NodeCoords<9>&, const Matrix3&, double, int);

template <int n>
void internal_forces(const NodeCoords<n>& X, const Matrix3& D, double t,
                     const Eigen::Ref<const Eigen::MatrixXd>& u_e,
                     Eigen::Ref<Eigen::MatrixXd> f_e) {
    const auto& ref = ReferenceElement<n>::get();
    f_e.setZero();
    for (int q = 0; q < ref.rule.n_points; ++q) {
        const auto& s = ref.at_points[static_cast<size_t>(q)];
        const Jacobian J = jacobian<n>(X, s.dN_dxi);
        const StrainOperator<n> B = strain_operator<n>(physical_derivatives<n>(s.dN_dxi, J));
        const double scale = t * J.det() * ref.rule.points[static_cast<size_t>(q)].w;
        for (Eigen::Index c = 0; c < u_e.cols(); ++c) {
            const Stress sigma = D * (B * u_e.col(c)) * scale;
            f_e.col(c).noalias() += B.transpose() * sigma;
        }
    }
}

template void internal_forces<4>(const NodeCoords<4>&, const Matrix3&, double,
                                 const Eigen::Ref<const Eigen::MatrixXd>&,
                                 Eigen::Ref<Eigen::MatrixXd>);
template void internal_forces<8>(const NodeCoords<8>&, const Matrix3&, double,
                                 const Eigen::Ref<const Eigen::MatrixXd>&,
                                 Eigen::Ref<Eigen::MatrixXd>);
template void internal_forces<9>(const NodeCoords<9>&, const Matrix3&, double,
                                 const Eigen::Ref<const Eigen::MatrixXd>&,
                                 Eigen::Ref<Eigen::MatrixXd>);

Eigen::Matrix<double, 3, 4> incompatible_strain_operator(const NodeCoords<4>& X, double xi,
                                                         double eta) {
    const Jacobian J0 = jacobian<4>(X, shape_q4(0, 0).dN_dxi);
    const Jacobian J = jacobian<4>(X, shape_q4(xi, eta).dN_dxi);
    // dP/dξ for P1 = 1−ξ², P2 = 1−η²: rows are modes.
    Eigen::Matrix<double, 2, 2> dP_dxi;
    dP_dxi << -2 * xi, 0, //
        0, -2 * eta;
    const Eigen::Matrix<double, 2, 2> dP_dx = dP_dxi * J0.inverse() * (J0.det() / J.det());
    return strain_operator<2>(dP_dx);
}

IncompatibleQ4 stiffness_q4i(const NodeCoords<4>& X, const Matrix3& D, double t, int element_id) {
    if (!q4_corners_positive(X)) report_bad_map<4>(X, element_id, ElementKind::Q4i);
    const auto& ref = ReferenceElement<4>::get();
    const Jacobian J0 = jacobian<4>(X, shape_q4(0, 0).dN_dxi);
    ElementMatrix<4> k_uu = ElementMatrix<4>::Zero();
    Eigen::Matrix<double, 8, 4> k_ua = Eigen::Matrix<double, 8, 4>::Zero();
    Eigen::Matrix<double, 4, 4> k_aa = Eigen::Matrix<double, 4, 4>::Zero();
    for (int q = 0; q < ref.rule.n_points; ++q) {
        const auto& p = ref.rule.points[static_cast<size_t>(q)];
        const auto& s = ref.at_points[static_cast<size_t>(q)];
        const Jacobian J = jacobian<4>(X, s.dN_dxi);
        if (J.det() <= 0) report_bad_map<4>(X, element_id, ElementKind::Q4i);
        const StrainOperator<4> B = strain_operator<4>(physical_derivatives<4>(s.dN_dxi, J));
        Eigen::Matrix<double, 2, 2> dP_dxi;
        dP_dxi << -2 * p.xi, 0, //
            0, -2 * p.eta;
        const Eigen::Matrix<double, 3, 4> B_a = strain_operator<2>(
            Eigen::Matrix<double, 2, 2>(dP_dxi * J0.inverse() * (J0.det() / J.det())));
        const double scale = t * J.det() * p.w;
        k_uu.noalias() += B.transpose() * (D * B) * scale;
        k_ua.noalias() += B.transpose() * (D * B_a) * scale;
        k_aa.noalias() += B_a.transpose() * (D * B_a) * scale;
    }
    const Eigen::Matrix<double, 4, 4> k_aa_inv = k_aa.inverse();
    IncompatibleQ4 out;
    out.alpha_from_u = -k_aa_inv * k_ua.transpose();
    out.k = k_uu + k_ua * out.alpha_from_u;
    out.k = (0.5 * (out.k + out.k.transpose())).eval(); // remove round-off asymmetry
    return out;
}

} // namespace lapwing::fe
