// A connection on its mesh as a finite-element problem (DESIGN: Connection
// modelling): the plate's elements; a node at every bolt centre tied to its
// hole; a shear spring from that node to the member's rigid body (or to the
// ground for a bolt group fixed to a support); member ends as rigid bodies
// (ux, uy, θ at the work point) carrying their forces; welded edges fixed;
// symmetry lines; edge loads.
#pragma once

#include "analysis/plate_region.hpp"
#include "fe/constraints.hpp"
#include "fe/linear_static.hpp"
#include "fe/model.hpp"
#include "mesh/mesh.hpp"
#include "model/connection.hpp"

#include <map>
#include <string>
#include <vector>

namespace lapwing::analysis {

struct BoltModel {
    int group = -1; // Connection::bolt_groups index
    int bolt = -1;  // position in the group
    int hole = -1;  // region hole = mesh hole index
    Eigen::Vector2d centre;
    int plate_node = -1; // the bolt's node on the plate side, tied to the hole
    int member = -1;     // carrying member, or -1
    int support = -1;    // bolted support, or -1
    model::TieKind tie = model::TieKind::spread;
    double stiffness = 0;  // shear spring, N/mm per direction; 0 when rigid by constraint
    int first_spring = -1; // the x and y springs in fe::Model::springs, or -1
    int other_node = -1;   // member-side node at the bolt (rigidly linked), or -1
    std::vector<int> hole_nodes;
    std::vector<double> hole_weights;          // arc-length shares, Σ = 1
    std::vector<Eigen::Vector2d> hole_normals; // outward normals of the hole edge at its nodes
    int first_contact = -1;                    // bearing ties: the link springs, one per hole node
    bool prescribed = false; // cosine tie: the force is the member's equal share, applied as a load
    std::vector<double> contact_stiffness;
};

struct MemberModel {
    int reference_node = -1; // at the work point; -1 when its bolts take prescribed shares
    int rotation = -1;       // index into fe::Model::rotation_nodes, -1 for a single-bolt member
    std::vector<int> bolts;  // BoltModel indices
};

struct SupportModel {
    std::vector<int> nodes; // supported plate nodes (welded edges, symmetry line)
    std::vector<int> bolts; // BoltModel indices (bolted support)
    Eigen::Vector2d about;  // point the reaction moment is taken about
};

struct FeProblem {
    fe::Model model;
    fe::Constraints constraints;
    int n_plate_nodes = 0;
    std::vector<BoltModel> bolts;
    std::vector<MemberModel> members;   // Connection::members order
    std::vector<SupportModel> supports; // Connection::supports order
    bool has_contact = false;
    double size = 1; // plate size, mm (for moments in residuals)
};

// Throws InputError for connection data that cannot be modelled (a member
// and a support on one bolt group, a moment on a one-bolt member, a welded
// member edge that is also a support).
FeProblem build_fe_problem(const model::Connection& connection, const mesh::Mesh& mesh,
                           const PlateLayout& layout);

// The force each bolt of a member with the cosine tie puts on the plate
// (equal share + elastic moment share), by FeProblem::bolts index; zero for
// every other bolt.
std::vector<Eigen::Vector2d> prescribed_bolt_forces(const model::Connection& connection,
                                                    const FeProblem& problem,
                                                    const std::map<std::string, double>& factors);

// The loads of a factored combination of load cases (case name → factor).
fe::Loads loads_for(const model::Connection& connection, const mesh::Mesh& mesh,
                    const FeProblem& problem, const std::map<std::string, double>& factors);

} // namespace lapwing::analysis
