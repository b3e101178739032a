// What the analysis gives per load case or combination: displacements,
// recovered stresses, bolt forces, support reactions, and the figures that
// show the solution can be trusted (equilibrium and solver residuals).
#pragma once

#include "analysis/fe_problem.hpp"
#include "fe/notation.hpp"

#include <string>
#include <vector>

namespace lapwing::analysis {

struct BoltForce {
    int bolt = -1;                // FeProblem::bolts index
    Eigen::Vector2d force;        // N, the force the bolt puts on the plate
    double magnitude = 0;         // N
    double angle_to_axis_deg = 0; // direction relative to the member (or group) axis
};

struct SupportReaction {
    Eigen::Vector2d force{0, 0}; // N, from the support on the plate
    double moment = 0;           // N·mm about SupportModel::about
};

struct CaseResult {
    std::string name;
    bool combination = false;
    Eigen::VectorXd u;                    // every dof of FeProblem::model
    Eigen::VectorXd dof_reactions;        // K u − f per dof: the support forces on the plate, N
    std::vector<fe::Stress> nodal_stress; // plate nodes, by superconvergent patch recovery
    std::vector<BoltForce> bolts;
    std::vector<SupportReaction> reactions; // Connection::supports order
    Eigen::Vector2d applied_force{0, 0};    // Σ of member and edge loads, N
    double applied_moment = 0;              // about the origin, N·mm
    double equilibrium_residual = 0;        // |Σ applied + Σ reactions| / |Σ applied|
    double solver_residual = 0;             // ‖K̃ũ − f̃‖ / ‖f̃‖
    double strain_energy = 0;               // N·mm
    int contact_iterations = 0;             // active-set passes (0: linear model)
    std::vector<char> contact_closed;       // per link spring: in contact at the solution
};

struct Results {
    FeProblem problem;
    std::vector<CaseResult> cases; // load cases in template order, then combinations
    double seconds_solve = 0;
    // Numerical cautions for the calc sheet (ill-conditioning, a large
    // residual); analysis/solution_checks.hpp gives the thresholds.
    std::vector<std::string> warnings;
    double reciprocal_condition = 0; // smallest estimate over the factorizations
    int contact_chains = 0;          // chains of contact cases solved side by side (0: none)
};

} // namespace lapwing::analysis
