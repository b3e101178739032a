// Notation used throughout fe/ (and only here: elsewhere, words).
//
//   xi, eta      reference coordinates ξ, η on the square [-1,1]²
//   n            nodes per element (4, 8 or 9)
//   X            nodal coordinates, n×2, row i = (x_i, y_i)
//   N            shape function values, n×1
//   dN_dxi       shape derivatives, n×2, columns ∂N/∂ξ, ∂N/∂η
//   J            Jacobian of the map, 2×2, J(i,j) = ∂x_i/∂ξ_j = Σ_k X(k,i) dN_dxi(k,j)
//   det_J        det J; > 0 for an element numbered counter-clockwise
//   dN_dx        physical derivatives, n×2, dN_dx = dN_dxi · J⁻¹
//   B            strain operator, 3×2n, rows εxx, εyy, γxy; columns u1 v1 u2 v2 …
//   D            plane-stress elasticity, 3×3 (Voigt: σxx, σyy, τxy)
//   w            quadrature weight on the reference square
//   t            plate thickness
//   k            element stiffness, 2n×2n: k = Σ_gp Bᵀ D B · t · det_J · w
//
// Dofs are interleaved: node i owns dofs 2i (ux) and 2i+1 (uy). The
// formulation, with sources, is in docs/theory.md.
#pragma once

#include <Eigen/Core>

namespace lapwing::fe {

using Vector2 = Eigen::Vector2d;
using Matrix2 = Eigen::Matrix2d;
using Matrix3 = Eigen::Matrix3d;
using Stress = Eigen::Vector3d; // σxx, σyy, τxy
using Strain = Eigen::Vector3d; // εxx, εyy, γxy

template <int n>
using NodeCoords = Eigen::Matrix<double, n, 2>;
template <int n>
using ShapeValues = Eigen::Matrix<double, n, 1>;
template <int n>
using ShapeDerivatives = Eigen::Matrix<double, n, 2>;
template <int n>
using StrainOperator = Eigen::Matrix<double, 3, 2 * n>;
template <int n>
using ElementMatrix = Eigen::Matrix<double, 2 * n, 2 * n>;
template <int n>
using ElementVector = Eigen::Matrix<double, 2 * n, 1>;

} // namespace lapwing::fe
