// The folded-mesh check before a mesh becomes a finite-element model.
#include "analysis/mesh_check.hpp"

#include "core/error.hpp"

#include <fmt/format.h>
#include <limits>

namespace lapwing::analysis {

void check_mesh_not_folded(const model::Connection& c, const mesh::Mesh& mesh,
                           const PlateLayout& layout) {
    const int n_inverted = mesh.quality_summary.n_inverted;
    if (n_inverted == 0) return;
    int first = 0;
    while (first < mesh.n_elements() &&
           mesh.quality[static_cast<size_t>(first)].scaled_jacobian > 0.0)
        ++first;
    Eigen::Vector2d at(0, 0);
    const auto nodes = mesh.element(first);
    for (int n : nodes) at += mesh.nodes[static_cast<size_t>(n)];
    at /= static_cast<double>(nodes.size());

    // The nearest bolt hole, if the element is within a hole's size of its edge.
    std::string beside;
    double nearest = std::numeric_limits<double>::infinity();
    for (size_t h = 0; h < layout.region.holes.size(); ++h) {
        const geometry::Hole& hole = layout.region.holes[h];
        const double size = hole.shape == geometry::HoleShape::circle ? hole.diameter : hole.length;
        const double gap = (at - hole.centre).norm() - 0.5 * size;
        if (gap < size && gap < nearest) {
            nearest = gap;
            const BoltRef& ref = layout.bolts[h];
            beside = fmt::format(", beside the hole of bolt {}[{}]",
                                 c.bolt_groups[static_cast<size_t>(ref.group)].name, ref.bolt);
        }
    }
    throw AnalysisError(fmt::format(
        "the mesher folded {} element{} with these mesh settings (the first, element {}, "
        "near ({:.1f}, {:.1f}) mm{}); this is the mesh, not the connection: {}",
        n_inverted, n_inverted == 1 ? "" : "s", first, at.x(), at.y(), beside,
        beside.empty()
            ? (c.mesh.size > 0 ? fmt::format("use a smaller [mesh] size (now {:g} mm)", c.mesh.size)
                               : std::string("give a [mesh] size smaller than the automatic one"))
            : fmt::format("use more elements around each hole, [mesh] around_hole (now {}; "
                          "16 by default, 8 to 256), or a smaller near_hole_size",
                          c.mesh.around_hole)));
}

} // namespace lapwing::analysis
