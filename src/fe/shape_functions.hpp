// Shape functions N(ξ, η) and their reference derivatives ∂N/∂ξ, ∂N/∂η for
// the Q4, Q8 and Q9 reference elements, node order as in element_kind.hpp.
// Written out by hand (Zienkiewicz, Taylor & Zhu 2013, §6.4; Hughes 1987,
// §3.2), fixed size so nothing allocates.
#pragma once

#include "fe/element_kind.hpp"
#include "fe/notation.hpp"

namespace lapwing::fe {

template <int n>
struct ShapeAt {
    ShapeValues<n> N;
    ShapeDerivatives<n> dN_dxi;
};

// Reference coordinates of node i (0..8) of the 9-node lattice.
Vector2 reference_node(int i);

ShapeAt<4> shape_q4(double xi, double eta);
ShapeAt<8> shape_q8(double xi, double eta);
ShapeAt<9> shape_q9(double xi, double eta);

// Compile-time choice of the shape functions by node count.
template <int n>
ShapeAt<n> shape(double xi, double eta) {
    if constexpr (n == 4)
        return shape_q4(xi, eta);
    else if constexpr (n == 8)
        return shape_q8(xi, eta);
    else
        return shape_q9(xi, eta);
}

} // namespace lapwing::fe
