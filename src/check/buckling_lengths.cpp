// Thornton lengths by ray casts from three points of the Whitmore line.
#include "check/buckling_lengths.hpp"

#include "geometry/ray_cast.hpp"

#include <algorithm>
#include <fmt/format.h>

namespace lapwing::check {

std::vector<double> BucklingLengths::lengths() const {
    std::vector<double> out;
    for (const BucklingLength& l : reaching) out.push_back(l.length);
    return out;
}

BucklingLengths thornton_lengths(const geometry::RegionBoundary& boundary,
                                 const Eigen::Vector2d& whitmore_from,
                                 const Eigen::Vector2d& whitmore_to, const Eigen::Vector2d& axis,
                                 const std::vector<int>& supported_edges) {
    BucklingLengths out;
    const Eigen::Vector2d back = -axis;
    const struct {
        const char* label;
        Eigen::Vector2d at;
    } points[] = {{"L1 (centre)", 0.5 * (whitmore_from + whitmore_to)},
                  {"L2 (end at from)", whitmore_from},
                  {"L3 (end at to)", whitmore_to}};
    for (const auto& p : points) {
        const geometry::RayHit hit =
            geometry::cast_ray(boundary, p.at, back, {.stop_at_holes = false});
        const bool supported = hit.hit && hit.tag.kind == geometry::BoundaryKind::outline_edge &&
                               std::find(supported_edges.begin(), supported_edges.end(),
                                         hit.tag.index) != supported_edges.end();
        if (supported) {
            out.reaching.push_back({p.label, p.at, hit.at, hit.distance});
        } else if (hit.hit) {
            out.notes.push_back(fmt::format("{}: from ({:.6g}, {:.6g}) the line back along the "
                                            "member axis leaves the plate at {} ({:.6g} mm), not "
                                            "at a supported edge: left out of the average",
                                            p.label, p.at.x(), p.at.y(), hit.tag.name(),
                                            hit.distance));
        } else {
            out.notes.push_back(fmt::format("{}: from ({:.6g}, {:.6g}) the line back along the "
                                            "member axis meets no edge: left out of the average",
                                            p.label, p.at.x(), p.at.y()));
        }
    }
    return out;
}

} // namespace lapwing::check
