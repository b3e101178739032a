// The strain operator B: ε = B u_e with rows εxx, εyy, γxy and interleaved
// dof columns u1 v1 u2 v2 … (Hughes 1987, eq. 2.8.25).
#pragma once

#include "fe/notation.hpp"

namespace lapwing::fe {

template <int n>
StrainOperator<n> strain_operator(const ShapeDerivatives<n>& dN_dx) {
    StrainOperator<n> B = StrainOperator<n>::Zero();
    for (int i = 0; i < n; ++i) {
        B(0, 2 * i) = dN_dx(i, 0);
        B(1, 2 * i + 1) = dN_dx(i, 1);
        B(2, 2 * i) = dN_dx(i, 1);
        B(2, 2 * i + 1) = dN_dx(i, 0);
    }
    return B;
}

} // namespace lapwing::fe
