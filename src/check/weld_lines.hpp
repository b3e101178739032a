// Welded edges as lines of force: the support (or member) forces on the
// nodes of a welded outline edge turned back into a force per unit length
// along the weld, by the edge's consistent "mass" system ∫ N_i N_j ds · q_j
// = f_i, the inverse of how a traction becomes consistent nodal forces
// (Zienkiewicz & Taylor, The Finite Element Method, vol. 1, §: equivalent
// nodal forces; exact for any traction the edge's shape functions represent).
#pragma once

#include "analysis/results.hpp"
#include "mesh/mesh.hpp"
#include "model/connection.hpp"

#include <Eigen/Core>
#include <string>
#include <vector>

namespace lapwing::check {

struct WeldLine {
    std::string id;    // "weld-<support>-e<edge>" or "weld-<member>-e<edge>"
    std::string label; // words for the calc sheet
    int support = -1;  // Connection::supports index, or -1
    int member = -1;   // Connection::members index (a welded member end), or -1
    int edge = -1;     // outline segment
    Eigen::Vector2d from{0, 0}, to{0, 0};
    double length() const { return (to - from).norm(); }
};

// Every welded support edge, then every welded member edge, in template order.
std::vector<WeldLine> weld_lines(const model::Connection& connection);

struct WeldPoint {
    double s = 0;            // distance from WeldLine::from, mm
    Eigen::Vector2d q{0, 0}; // force per length the weld puts on the plate, N/mm
    double magnitude() const { return q.norm(); }
};

struct WeldForces {
    Eigen::Vector2d resultant{0, 0}; // Σ of the nodal forces, N
    double average = 0;              // |resultant| / length, N/mm
    double peak_edge_average = 0;    // the largest element-edge average of |q|, N/mm (local)
    double peak = 0;                 // the largest nodal |q|, N/mm (local, mesh dependent)
    double peak_s = 0;               // where the peak edge average sits (its middle), mm
    std::vector<WeldPoint> profile;  // by s
};

// `dof_reactions` is CaseResult::dof_reactions; `held` says which nodes this
// line's support holds in the analysis (a corner shared by two welded edges
// is held by the first, and counted there).
WeldForces weld_forces(const WeldLine& line, const mesh::Mesh& mesh,
                       const Eigen::VectorXd& dof_reactions, const std::vector<int>& held);

} // namespace lapwing::check
