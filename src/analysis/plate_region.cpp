// Connection → plate region: the outline and cut-outs as drawn, a hole at
// every bolt (round, or a slot along or across its group's axis).
#include "analysis/plate_region.hpp"

#include "model/bolts.hpp"

namespace lapwing::analysis {

PlateLayout plate_layout(const model::Connection& c) {
    PlateLayout out;
    for (const model::Corner& corner : c.plate.outline) {
        geometry::OutlineVertex v;
        v.point = {corner.at.x, corner.at.y};
        if (corner.kind == model::CornerKind::chamfer) v.chamfer = corner.size;
        if (corner.kind == model::CornerKind::fillet) v.fillet_radius = corner.size;
        out.region.outline.push_back(v);
    }
    for (const model::Cutout& cut : c.plate.cutouts) {
        geometry::Polygon p;
        for (const model::Point& q : cut.points) p.points.emplace_back(q.x, q.y);
        out.region.cutouts.push_back(p);
    }
    for (int g = 0; g < static_cast<int>(c.bolt_groups.size()); ++g) {
        const model::BoltGroup& group = c.bolt_groups[static_cast<size_t>(g)];
        const auto positions = model::bolt_positions(group);
        for (int b = 0; b < static_cast<int>(positions.size()); ++b) {
            const Eigen::Vector2d centre(positions[static_cast<size_t>(b)].centre.x,
                                         positions[static_cast<size_t>(b)].centre.y);
            const model::Hole& h = group.hole;
            if (h.length > h.width) {
                const double angle =
                    group.angle + (h.direction == model::SlotDirection::across ? 90.0 : 0.0);
                out.region.holes.push_back(geometry::Hole::slot(centre, h.length, h.width, angle));
            } else {
                out.region.holes.push_back(geometry::Hole::circle(centre, h.width));
            }
            out.bolts.push_back({g, b, centre});
        }
    }
    return out;
}

mesh::MeshSettings mesh_settings(const model::Connection& c) {
    mesh::MeshSettings s;
    switch (c.mesh.element) {
    case model::ElementChoice::Q4:
        s.kind = fe::ElementKind::Q4;
        break;
    case model::ElementChoice::Q4i:
        s.kind = fe::ElementKind::Q4i;
        break;
    case model::ElementChoice::Q8:
        s.kind = fe::ElementKind::Q8;
        break;
    case model::ElementChoice::Q9:
        s.kind = fe::ElementKind::Q9;
        break;
    }
    s.element_size = c.mesh.size;
    s.elements_around_hole = c.mesh.around_hole;
    return s;
}

} // namespace lapwing::analysis
