// Stable, human-readable names of boundary pieces.
#include "geometry/plate_region.hpp"

#include <fmt/format.h>

namespace lapwing::geometry {

std::string BoundaryTag::name() const {
    switch (kind) {
    case BoundaryKind::outline_edge:
        return fmt::format("outline.edge[{}]", index);
    case BoundaryKind::outline_corner:
        return fmt::format("outline.corner[{}]", index);
    case BoundaryKind::hole:
        return fmt::format("holes[{}]", index);
    case BoundaryKind::cutout:
        return fmt::format("cutouts[{}].edge[{}]", index, part);
    }
    return "?";
}

} // namespace lapwing::geometry
