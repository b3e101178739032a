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
// neighbours only if the worst of its elements does not get worse; then a
// compass search on the corners of elements still short of the quality
// targets. curved_mid (empty, or four per quadrilateral) holds the mid-side
// point of each edge on a curve (NaN for straight edges) so that quadratic
// elements are judged by their true det J.
void smooth(std::vector<Eigen::Vector2d>& nodes, const std::vector<int>& quads,
            const std::vector<bool>& fixed, const std::vector<Eigen::Vector2d>& curved_mid,
            int passes);

} // namespace lapwing::mesh::detail
