// The classical alternative to letting the model share a member's force
// among its bolts (issue: prescribed bolt forces): each bolt takes an equal
// share of the force plus the elastic-method share of the moment about the
// group's centroid, and puts it on the plate as a cosine bearing pressure on
// the loaded half of its hole, p(θ) = 4P/(π d t) cos θ (common practice;
// resultant P, peak 4/π · P/(d t) ≈ 1.273 P/(d t)).
#pragma once

#include "fe/linear_static.hpp"
#include "fe/model.hpp"
#include "mesh/mesh.hpp"

#include <Eigen/Core>
#include <vector>

namespace lapwing::analysis {

// Bolt forces on the plate for a member force F (N) and a moment M (N·mm,
// counter-clockwise) acting about `about`: F/n + M × r_i / Σ|r_j|² with r_i
// from the centroid (elastic method of bolt groups, e.g. Salmon & Johnson,
// Steel Structures, from memory: common practice).
std::vector<Eigen::Vector2d> elastic_shares(const std::vector<Eigen::Vector2d>& centres,
                                            const Eigen::Vector2d& force, double moment,
                                            const Eigen::Vector2d& about);

// Peak of the cosine pressure for a bolt force of magnitude P on a hole of
// diameter d in a plate of thickness t: 4P/(π d t), MPa.
double cosine_peak_pressure(double P, double d, double t);

// Consistent nodal forces of the cosine pressure of bolt force `force` (N,
// on the plate) on the edge of round hole `hole` (centre, diameter d),
// integrated by the FE core's edge-traction rule on each element edge of the
// hole, then scaled and turned by the small angle that makes their resultant
// exactly `force` (the pressure has kinks at ±90°, which a Gauss rule on an
// element edge that straddles them does not integrate exactly).
std::vector<std::pair<int, double>> cosine_bearing_forces(const fe::Model& model,
                                                          const mesh::Mesh& mesh, int hole,
                                                          const Eigen::Vector2d& centre, double d,
                                                          double thickness,
                                                          const Eigen::Vector2d& force);

} // namespace lapwing::analysis
