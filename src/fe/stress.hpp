// Stresses from a displacement solution: σ = D (B u_e + B_α α) inside an
// element (the α term only for Q4i), sampled at Gauss points, and the
// derived von Mises and principal values.
#pragma once

#include "fe/model.hpp"

#include <Eigen/Core>
#include <cmath>
#include <span>
#include <vector>

namespace lapwing::fe {

// Stress in element e at (ξ, η) from the full displacement vector u.
Stress element_stress(const Model& model, int e, const Eigen::VectorXd& u, double xi, double eta);

// Stresses at an n×n Gauss rule of every element.
struct SampledStresses {
    int points_per_element = 0;
    std::vector<Vector2> reference; // the rule's (ξ, η), points_per_element entries
    std::vector<Vector2> point;     // physical position, element-major
    std::vector<Stress> stress;     // element-major
    std::vector<double> weight;     // t · det J · w (the point's share of the volume)
};
SampledStresses sample_stresses(const Model& model, const Eigen::VectorXd& u,
                                int gauss_points_per_direction);
// The same for several displacement fields (load cases) at once, one result
// per field: the points, weights and strain operators are computed once.
std::vector<SampledStresses> sample_stresses(const Model& model,
                                             std::span<const Eigen::VectorXd* const> u,
                                             int gauss_points_per_direction);

// Plane-stress von Mises: √(σx² − σxσy + σy² + 3τ²).
double von_mises(const Stress& s);

struct PrincipalValues {
    double s1 = 0, s2 = 0; // s1 ≥ s2
};
// Mohr's circle: c ± r, c = (σx+σy)/2, r = √(((σx−σy)/2)² + τ²). Inline:
// the peak search takes it at every sample point.
inline PrincipalValues principal_values(const Stress& s) {
    const double c = 0.5 * (s(0) + s(1));
    const double r = std::hypot(0.5 * (s(0) - s(1)), s(2));
    return {c + r, c - r};
}

struct Principal {
    double s1 = 0, s2 = 0; // s1 ≥ s2
    double angle_rad = 0;  // direction of s1 from the x axis
};
// principal_values with the direction: tan 2θ = 2τ / (σx − σy).
Principal principal(const Stress& s);

} // namespace lapwing::fe
