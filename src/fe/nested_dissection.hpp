// Geometric nested dissection of a mesh graph (recursive coordinate
// bisection): the vertices are split at the median of their wider
// coordinate, the vertices of one side that touch the other side are the
// separator, and both halves are dissected again. Eliminating each part
// before the separator that cuts it off bounds the fill of 2-D meshes
// (George 1973, "Nested dissection of a regular finite element mesh", SIAM
// J. Numer. Anal. 10(2):345–363: O(n log n) factor entries, O(n^{3/2})
// operations on a k × k grid). The result is the constraint set of each
// vertex for a constrained minimum-degree ordering (CAMD), which orders the
// leaves and separators among themselves.
#pragma once

#include "fe/notation.hpp"

#include <span>
#include <vector>

namespace lapwing::fe {

// A symmetric graph in compressed adjacency form: the neighbours of vertex v
// are adj[start[v] .. start[v+1]), self loops left out.
struct AdjacencyGraph {
    int n = 0;
    std::vector<int> start; // n + 1 entries
    std::vector<int> adj;
};

// Constraint set of each vertex (0 = leaf, eliminated first; a separator at
// dissection depth d gets depth_max + 1 − d, so every separator follows the
// parts it separates and the top one comes last). Parts of at most
// `leaf_size` vertices are not split. `xy` holds one position per vertex.
std::vector<int> coordinate_dissection_sets(const AdjacencyGraph& graph,
                                            std::span<const Vector2> xy, int leaf_size);

} // namespace lapwing::fe
