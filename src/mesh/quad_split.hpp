// Quadrilateral stage: each triangle splits into three quadrilaterals, the
// interior nodes are smoothed, then quadratic elements get their mid-side
// (and centre) nodes, on the true curve along the boundary.
#pragma once

#include "mesh/mesh.hpp"
#include "mesh/refine.hpp"

namespace lapwing::mesh::detail {

// Builds nodes, connectivity, boundary edges and hole node sets.
Mesh split_into_quads(const TriangleMesh& triangles, fe::ElementKind kind, int smoothing_passes,
                      int n_holes);

// Constrained Laplacian smoothing of the nodes not flagged `fixed`, on a
// four-node quadrilateral connectivity: a node moves to the mean of its edge
// neighbours only if the worst corner of its elements does not get worse.
void smooth(std::vector<Eigen::Vector2d>& nodes, const std::vector<int>& quads,
            const std::vector<bool>& fixed, int passes);

} // namespace lapwing::mesh::detail
