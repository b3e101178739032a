// The isoparametric map x(ξ) = Σ N_i(ξ) x_i of one element at one point: its
// Jacobian, determinant and the physical shape derivatives; and the inverse
// map x → ξ by Newton iteration (docs/theory.md §2).
#pragma once

#include "fe/element_kind.hpp"
#include "fe/notation.hpp"
#include "fe/shape_functions.hpp"

#include <Eigen/LU>
#include <optional>
#include <span>

namespace lapwing::fe {

// An immutable Jacobian value: J(i,j) = ∂x_i/∂ξ_j, its determinant and inverse.
class Jacobian {
public:
    Jacobian() = default;
    explicit Jacobian(const Matrix2& J) : J_(J), det_J_(J.determinant()) {
        if (det_J_ != 0) J_inv_ = J.inverse();
    }
    const Matrix2& matrix() const { return J_; }
    double det() const { return det_J_; }
    const Matrix2& inverse() const { return J_inv_; }

private:
    Matrix2 J_ = Matrix2::Zero();
    double det_J_ = 0;
    Matrix2 J_inv_ = Matrix2::Zero();
};

// J = Σ x_i ⊗ ∂N_i/∂ξ, i.e. Xᵀ · dN_dxi.
template <int n>
Jacobian jacobian(const NodeCoords<n>& X, const ShapeDerivatives<n>& dN_dxi) {
    return Jacobian(X.transpose() * dN_dxi);
}

// Chain rule: ∂N/∂x_k = Σ_j ∂N/∂ξ_j ∂ξ_j/∂x_k, i.e. dN_dx = dN_dxi · J⁻¹.
template <int n>
ShapeDerivatives<n> physical_derivatives(const ShapeDerivatives<n>& dN_dxi, const Jacobian& J) {
    return dN_dxi * J.inverse();
}

// Nodal coordinates of an element gathered into the fixed-size matrix.
template <int n>
NodeCoords<n> gather_coords(std::span<const Vector2> nodes, std::span<const int> element_nodes) {
    NodeCoords<n> X;
    for (int i = 0; i < n; ++i) X.row(i) = nodes[static_cast<size_t>(element_nodes[i])].transpose();
    return X;
}

// det J at a point, for any element kind (used by mesh quality and checks).
double det_J_at(ElementKind kind, std::span<const Vector2> element_coords, double xi, double eta);

// x(ξ, η) for any element kind.
Vector2 map_point(ElementKind kind, std::span<const Vector2> element_coords, double xi, double eta);

// Checks det J at the reference nodes and the stiffness quadrature points;
// throws AnalysisError naming the element, the point and the value when
// det J ≤ 0 or below `min_fraction` of the element's mean det J.
void check_element_map(ElementKind kind, std::span<const Vector2> element_coords, int element_id,
                       double min_fraction = 1e-6);

// Inverse map: the (ξ, η) with x(ξ, η) = point, by Newton iteration from the
// centre. Returns nothing when Newton does not converge or the point lies
// outside the element by more than `tolerance` in reference coordinates.
std::optional<Vector2> inverse_map(ElementKind kind, std::span<const Vector2> element_coords,
                                   const Vector2& point, double tolerance = 1e-9);

} // namespace lapwing::fe
