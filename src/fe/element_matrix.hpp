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

// Element `e`'s nodal forces k_e u_e for each column of `u_e` (2n × c, the
// element's dofs in element order) into `f_e` (same shape), without forming
// k_e where the kind allows.
void element_forces(const Model& model, int e, const Matrix3& D,
                    const Eigen::Ref<const Eigen::MatrixXd>& u_e, Eigen::Ref<Eigen::MatrixXd> f_e);

} // namespace lapwing::fe
