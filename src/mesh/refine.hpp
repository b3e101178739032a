// Triangle stage of the mesher: boundary discretization, conforming Delaunay
// triangulation of the boundary, carving, then Delaunay refinement to the size
// field with a minimum angle.
#pragma once

#include "geometry/curve.hpp"
#include "mesh/size_field.hpp"
#include "mesh/triangulation.hpp"

#include <vector>

namespace lapwing::mesh::detail {

struct TriangleMesh {
    Triangulation tri;
    std::vector<geometry::Curve> curves; // every boundary curve, loop by loop
};

// Triangulates the region with triangles about twice the quadrilateral size
// (each triangle later splits into three quadrilaterals).
TriangleMesh triangulate(const geometry::RegionBoundary& boundary, const SizeField& size,
                         int around);

} // namespace lapwing::mesh::detail
