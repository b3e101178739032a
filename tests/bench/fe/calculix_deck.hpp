// The plate-with-hole model as a plain-text input deck for CalculiX
// (calculix-ccx), and readers for the two result files it writes: nodal
// displacements from the .dat file (*NODE PRINT) and extrapolated, averaged
// nodal stresses from the .frd file (*NODE FILE). Same nodes, elements,
// supports and consistent nodal loads as lapwing's model; Q4 becomes CPS4
// and Q8 CPS8, CalculiX's full-integration plane-stress elements (2×2 and
// 3×3 Gauss points, as lapwing's).
#pragma once

#include "fe/linear_static.hpp"
#include "fe/model.hpp"

#include <Eigen/Core>
#include <string>

namespace lapwing::bench {

// The deck: every load as the nodal forces fe::applied_forces gives (so
// both programs see identical loads), every prescribed dof as a *BOUNDARY
// line (values must be zero), one material and one thickness.
std::string calculix_deck(const fe::Model& model, const fe::Constraints& constraints,
                          const fe::Loads& loads);

// ux, uy of every node (row = lapwing node) from the text of the .dat file.
// Throws std::runtime_error when a node is missing.
Eigen::MatrixX2d read_calculix_displacements(const std::string& dat, int n_nodes);

// σxx, σyy, τxy of every node from the text of the .frd file.
Eigen::MatrixX3d read_calculix_stresses(const std::string& frd, int n_nodes);

} // namespace lapwing::bench
