// Pairs neighbouring triangles into quadrilaterals before the split, so that
// most elements come from a quadrilateral cut in four (near-parallelograms,
// det J nearly constant) rather than a triangle cut in three (whose corner
// det J differ by a factor of three even when the triangle is equilateral).
#pragma once

#include "geometry/curve.hpp"
#include "mesh/triangulation.hpp"

#include <span>
#include <vector>

namespace lapwing::mesh::detail {

// partner[t] = the triangle merged with t across its edge partner_edge[t]
// (the edge opposite v[partner_edge[t]]), or -1. Indices are triangle ids.
struct Pairing {
    std::vector<int> partner;
    std::vector<int> partner_edge;
};

// curves: the boundary curves the segments refer to (split points of
// boundary edges lie on them).
// Quality of cutting the polygon p (counter-clockwise) into quadrilaterals
// through the points edge_point[k] on its edges k (p[k] to p[k+1]) and the
// mean of its corners: the worst quadrilateral's corner det J ratio (min /
// max of its corner cross products; 1 for a parallelogram), or -1 if an angle
// falls outside [30°, 150°].
double polygon_split_score(std::span<const Point> p, std::span<const Point> edge_point);

Pairing pair_triangles(const Triangulation& tri, const std::vector<geometry::Curve>& curves);

} // namespace lapwing::mesh::detail
