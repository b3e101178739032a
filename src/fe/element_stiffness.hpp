// Element stiffness matrices of the plane-stress elements:
//   k = Σ_gp Bᵀ D B · t · det J · w                     (Q4, Q8, Q9)
// and the Q4 with incompatible bending modes, condensed (Q4i).
#pragma once

#include "fe/notation.hpp"

namespace lapwing::fe {

// Standard displacement element with full Gauss integration (2×2 for Q4,
// 3×3 for Q8 and Q9). `element_id` only serves the error message when the
// map is inverted.
template <int n>
ElementMatrix<n> stiffness(const NodeCoords<n>& X, const Matrix3& D, double t, int element_id);

// The nodal forces k u_e of the same element for each column of u_e (2n × c),
// as Σ_gp Bᵀ (D B u_e) · t · det J · w without forming k: the same sum in
// another order, about a tenth of the work. The map is not checked (the
// stiffness was, when the element was assembled).
template <int n>
void internal_forces(const NodeCoords<n>& X, const Matrix3& D, double t,
                     const Eigen::Ref<const Eigen::MatrixXd>& u_e, Eigen::Ref<Eigen::MatrixXd> f_e);

// Q4 plus the incompatible modes P1 = 1−ξ², P2 = 1−η² (Wilson, Taylor,
// Doherty & Ghaboussi 1973) with the mode derivatives taken through the
// centre Jacobian J0 and scaled by det J0 / det J (Taylor, Beresford &
// Wilson 1976), so the element passes the patch test on any convex quad.
// The four internal parameters α are condensed statically:
//   k = k_uu − k_uα k_αα⁻¹ k_αu,     α = −k_αα⁻¹ k_αu u_e.
struct IncompatibleQ4 {
    ElementMatrix<4> k;                       // condensed stiffness, 8×8
    Eigen::Matrix<double, 4, 8> alpha_from_u; // α = alpha_from_u · u_e
};
IncompatibleQ4 stiffness_q4i(const NodeCoords<4>& X, const Matrix3& D, double t, int element_id);

// Strain operator of the incompatible modes at (ξ, η), 3×4 (columns α1x α1y
// α2x α2y), including the det J0 / det J factor.
Eigen::Matrix<double, 3, 4> incompatible_strain_operator(const NodeCoords<4>& X, double xi,
                                                         double eta);

} // namespace lapwing::fe
