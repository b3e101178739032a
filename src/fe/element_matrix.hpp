// The stiffness of one element of a model, whatever its kind, as a dynamic
// matrix view over fixed-size storage: the one place that dispatches on the
// element kind for assembly and reactions.
#pragma once

#include "fe/model.hpp"

namespace lapwing::fe {

// Largest element matrix: Q9, 18×18.
using ElementMatrixStorage = Eigen::Matrix<double, 18, 18>;

// Fills the top-left 2n×2n block of `k` with element `e`'s stiffness; D is
// its material's plane-stress matrix. Returns 2n.
int element_stiffness(const Model& model, int e, const Matrix3& D, ElementMatrixStorage& k);

} // namespace lapwing::fe
