// Independent measurements of a mesh for the tests: its area and boundary
// lengths by quadrature of the element maps, and its conformity.
#pragma once

#include "mesh/mesh.hpp"

#include <string>

namespace lapwing::test {

// ∫ det J over every element (3×3 Gauss, exact for the polynomial det J of
// straight Q4 and Q8 elements; curved ones to quadrature accuracy).
double mesh_area(const mesh::Mesh& m);

// Length of the boundary edges carrying kind/index, each edge measured along
// its own interpolation (5-point Gauss on |dx/ds| for quadratic edges).
double boundary_length(const mesh::Mesh& m, geometry::BoundaryKind kind, int index);

// Empty if the mesh is conforming: every element edge is shared by two
// elements or listed once in boundary_edges; boundary edges form closed
// loops (n_loops of them); no two nodes coincide; every node is used.
// Otherwise a description of the first problem found.
std::string conformity_problem(const mesh::Mesh& m, int n_loops);

} // namespace lapwing::test
