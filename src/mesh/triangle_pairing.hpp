// Pairs neighbouring triangles into quadrilaterals before the split, so that
// most elements come from a quadrilateral cut in four (near-parallelograms,
// det J nearly constant) rather than a triangle cut in three (whose corner
// det J differ by a factor of three even when the triangle is equilateral).
#pragma once

#include "mesh/triangulation.hpp"

#include <vector>

namespace lapwing::mesh::detail {

// partner[t] = the triangle merged with t across its edge partner_edge[t]
// (the edge opposite v[partner_edge[t]]), or -1. Indices are triangle ids.
struct Pairing {
    std::vector<int> partner;
    std::vector<int> partner_edge;
};

Pairing pair_triangles(const Triangulation& tri);

} // namespace lapwing::mesh::detail
