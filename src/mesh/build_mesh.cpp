// build_mesh: the mesher's table of contents.
#include "geometry/region_boundary.hpp"
#include "mesh/mesh.hpp"
#include "mesh/quad_split.hpp"
#include "mesh/quality.hpp"
#include "mesh/refine.hpp"
#include "mesh/size_field.hpp"

#include <algorithm>

namespace lapwing::mesh {

Mesh build_mesh(const geometry::PlateRegion& region, const MeshSettings& settings) {
    const geometry::RegionBoundary boundary = geometry::build_region_boundary(region);
    const int around = detail::elements_around_hole(settings);
    const double h = detail::element_size(region, settings);
    const detail::SizeField size(region, boundary, settings, h, around);
    const detail::TriangleMesh triangles = detail::triangulate(boundary, size, around);
    Mesh mesh =
        detail::split_into_quads(triangles, settings.kind, std::max(0, settings.smoothing_passes),
                                 static_cast<int>(region.holes.size()));
    compute_quality(mesh);
    return mesh;
}

std::vector<int> Mesh::nodes_on(const geometry::BoundaryTag& tag) const {
    std::vector<int> out;
    for (const BoundaryEdge& e : boundary_edges) {
        if (!(e.tag == tag)) continue;
        for (int n : e.nodes)
            if (n >= 0) out.push_back(n);
    }
    std::sort(out.begin(), out.end());
    out.erase(std::unique(out.begin(), out.end()), out.end());
    return out;
}

std::vector<int> Mesh::nodes_on(geometry::BoundaryKind piece_kind, int index) const {
    std::vector<int> out;
    for (const BoundaryEdge& e : boundary_edges) {
        if (e.tag.kind != piece_kind || e.tag.index != index) continue;
        for (int n : e.nodes)
            if (n >= 0) out.push_back(n);
    }
    std::sort(out.begin(), out.end());
    out.erase(std::unique(out.begin(), out.end()), out.end());
    return out;
}

} // namespace lapwing::mesh
