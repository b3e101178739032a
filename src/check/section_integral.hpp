// The FE stress field integrated along a section line: force resultants,
// average and linearized stresses, and the profile for the calc sheet.
#pragma once

#include "check/free_body.hpp"
#include "check/section.hpp"
#include "fe/model.hpp"
#include "fe/point_locator.hpp"

#include <Eigen/Core>
#include <span>
#include <vector>

namespace lapwing::check {

// Splits each material piece of `line` where it crosses an element edge
// (exact crossings of the straight or quadratic edges), integrates every
// sub-piece with a 4-point Gauss rule (exact to degree 7 along the line) and
// evaluates the stresses there through the inverse isoparametric map. A
// point on the plate boundary that the locator misses (weld lines lie on an
// edge) is nudged 1e-7 of the line's length along ± the line's normal; a
// point of true material outside the mesh next to a curved edge (beyond a
// straight Q4 chord of an arc, or a quadratic edge between its nodes) takes
// the extrapolated field of the element of its sub-piece (counted in
// `extrapolated_points`). Also computes the free-body resultant when the
// line cuts the plate in two or lies on its edge (free_body.hpp).
// `u` is the full displacement vector of `model`; `thickness` in mm.
SectionStress integrate_section(const SectionLine& line, const fe::Model& model,
                                const fe::PointLocator& locator, const Eigen::VectorXd& u,
                                double thickness);

// The same for several displacement vectors (load cases) of one model: the
// crossings, the points' elements and the free body's cut are found once.
// `neighbours`, the model's element_neighbours() for many lines, or null.
std::vector<SectionStress> integrate_section(const SectionLine& line, const fe::Model& model,
                                             const fe::PointLocator& locator,
                                             std::span<const Eigen::VectorXd* const> u,
                                             double thickness,
                                             const ElementNeighbours* neighbours = nullptr);

// Distance along the line of the material's centroid (the point M is taken
// about), mm from `from`.
double material_centroid(const SectionLine& line);

} // namespace lapwing::check
