// How a bolt's node is tied to the edge of its hole.
//  spread:  the node moves with the weighted mean of the hole-edge nodes,
//           u_b = Σ w_i u_i, weights the nodes' arc-length shares; the bolt
//           force is then spread over the edge in proportion to w_i, pull
//           side included, and the hole stays free to deform (the
//           distributing constraint of general FE practice, common practice).
//  bearing: stiff contact springs along each node's outward normal, active
//           only in compression, found by an active-set iteration
//           (Wriggers 2006, Computational Contact Mechanics, ch. 6).
#pragma once

#include "fe/constraints.hpp"
#include "fe/model.hpp"
#include "geometry/plate_region.hpp"
#include "mesh/mesh.hpp"

#include <vector>

namespace lapwing::analysis {

struct HoleEdge {
    std::vector<int> nodes;
    std::vector<double> weights;          // Σ = 1
    std::vector<Eigen::Vector2d> normals; // unit, from the bolt centre to the node
};

// Nodes of hole h with their arc-length shares (consistent for quadratic
// edges: 1/6, 2/3, 1/6 of each edge, corrected so their weighted centroid is
// the hole centre) and the directions from the centre to each node.
HoleEdge hole_edge(const mesh::Mesh& mesh, const geometry::Hole& hole, int h);

// u_b = Σ w_i u_i for both directions.
void add_spread_tie(int bolt_node, const HoleEdge& edge, fe::Constraints& constraints);

// Contact springs per node of the hole edge; returns the index of the first.
// Stiffness per node: `penalty` · w_i (N/mm), all initially active.
int add_bearing_contact(int bolt_node, const HoleEdge& edge, double penalty, fe::Model& model,
                        std::vector<double>& stiffness);

} // namespace lapwing::analysis
