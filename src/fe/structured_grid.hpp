// Structured meshes of a mapped square: the node lattice of an nx × ny grid
// on (s, t) ∈ [0,1]² pushed through a map x(s, t). Used for verification
// problems and benchmarks (a curved map gives curved quadratic edges, since
// every node, mid-side ones included, lies on the mapped geometry).
#pragma once

#include "fe/model.hpp"

#include <functional>
#include <vector>

namespace lapwing::fe {

struct GridEdge {
    int element = -1;
    int edge = 0; // local edge number (element_kind.hpp)
};

struct StructuredGrid {
    std::vector<Vector2> nodes;
    std::vector<Element> elements; // material 0, thickness 1
    // Boundary of the mapped square, side by side: t = 0, s = 1, t = 1, s = 0.
    std::array<std::vector<GridEdge>, 4> side_edges;
    // Nodes on each side in increasing s (sides 0, 2) or t (sides 1, 3).
    std::array<std::vector<int>, 4> side_nodes;
};

using GridMap = std::function<Vector2(double s, double t)>;

StructuredGrid make_structured_grid(ElementKind kind, int nx, int ny, const GridMap& map);

// The bilinear map of a quadrilateral with corners p0..p3 (counter-clockwise).
GridMap bilinear_map(const Vector2& p0, const Vector2& p1, const Vector2& p2, const Vector2& p3);

// A model made of a grid: its nodes and elements with one material and a thickness.
Model model_from_grid(const StructuredGrid& grid, const Material& material, double thickness);

} // namespace lapwing::fe
