// `lapwing mesh FILE [-o DIR]`: validates the template, meshes the plate and
// writes mesh.svg and mesh.vtu (atomically) into DIR; nothing is written
// when the input is bad or the mesher fails.
#include "cli/commands.hpp"
#include "cli/files.hpp"
#include "core/error.hpp"
#include "input/load_connection.hpp"
#include "mesh/mesh.hpp"
#include "mesh/writers.hpp"
#include "model/bolts.hpp"

#include <filesystem>
#include <fmt/format.h>
#include <ostream>

namespace lapwing::cli {

namespace {

// The plate of a resolved connection as the mesher's region: outline
// corners with their finishes, every bolt hole (slots along their long
// side), the cut-outs. All in mm.
geometry::PlateRegion plate_region(const model::Connection& c) {
    geometry::PlateRegion region;
    for (const auto& corner : c.plate.outline) {
        geometry::OutlineVertex v;
        v.point = geometry::Point(corner.at.x, corner.at.y);
        if (corner.kind == model::CornerKind::chamfer) v.chamfer = corner.size;
        if (corner.kind == model::CornerKind::fillet) v.fillet_radius = corner.size;
        region.outline.push_back(v);
    }
    for (const auto& group : c.bolt_groups) {
        const double long_side =
            group.angle + (group.hole.direction == model::SlotDirection::across ? 90.0 : 0.0);
        for (const auto& bolt : model::bolt_positions(group)) {
            const geometry::Point centre(bolt.centre.x, bolt.centre.y);
            region.holes.push_back(
                group.hole.length > group.hole.width
                    ? geometry::Hole::slot(centre, group.hole.length, group.hole.width, long_side)
                    : geometry::Hole::circle(centre, group.hole.width));
        }
    }
    for (const auto& cut : c.plate.cutouts) {
        geometry::Polygon p;
        for (const auto& q : cut.points) p.points.emplace_back(q.x, q.y);
        region.cutouts.push_back(p);
    }
    return region;
}

mesh::MeshSettings mesh_settings(const model::MeshControls& controls) {
    mesh::MeshSettings s;
    const fe::ElementKind kinds[] = {fe::ElementKind::Q4, fe::ElementKind::Q4i, fe::ElementKind::Q8,
                                     fe::ElementKind::Q9};
    s.kind = kinds[static_cast<int>(controls.element)];
    s.element_size = controls.size;
    s.elements_around_hole = controls.around_hole;
    return s;
}

} // namespace

int run_mesh(const std::string& file, const std::vector<std::string>& sets,
             const std::string& folder, std::ostream& out, std::ostream& err) {
    try {
        const auto connection = input::load_connection(read_input_file(file), file, sets);
        // near_hole_size has no counterpart in the mesher yet: its size field
        // grades from the hole edges by itself (see mesh/mesh.hpp).
        const auto m = mesh::build_mesh(plate_region(connection), mesh_settings(connection.mesh));
        const std::filesystem::path dir =
            folder.empty() ? std::filesystem::path(".") : std::filesystem::path(folder);
        std::filesystem::create_directories(dir); // only now: bad input leaves no folder behind
        write_atomically(dir / "mesh.svg", mesh::mesh_to_svg(m));
        write_atomically(dir / "mesh.vtu", mesh::mesh_to_vtu(m));
        const auto& q = m.quality_summary;
        out << fmt::format("{} {} elements, {} nodes; scaled Jacobian min {:.3g}, median {:.3g}; "
                           "{} inverted\n",
                           m.n_elements(), fe::name(m.kind), m.nodes.size(), q.scaled_jacobian.min,
                           q.scaled_jacobian.median, q.n_inverted);
        out << "wrote " << (dir / "mesh.svg").string() << " and " << (dir / "mesh.vtu").string()
            << "\n";
        return 0;
    } catch (...) {
        return report_failure(err);
    }
}

} // namespace lapwing::cli
