// `lapwing mesh FILE [-o DIR]`: validates the template, meshes the plate and
// writes mesh.svg and mesh.vtu (atomically) into DIR; nothing is written
// when the input is bad or the mesher fails.
#include "analysis/plate_region.hpp"
#include "analysis/resource_estimate.hpp"
#include "cli/commands.hpp"
#include "cli/files.hpp"
#include "core/error.hpp"
#include "input/load_connection.hpp"
#include "mesh/mesh.hpp"
#include "mesh/writers.hpp"

#include <filesystem>
#include <fmt/format.h>
#include <ostream>

namespace lapwing::cli {

int run_mesh(const std::string& file, const std::vector<std::string>& sets,
             const std::string& folder, long max_dofs, std::ostream& out, std::ostream& err) {
    try {
        const auto connection = input::load_connection(read_input_file(file), file, sets);
        // near_hole_size has no counterpart in the mesher yet: its size field
        // grades from the hole edges by itself (see mesh/mesh.hpp).
        const auto settings = analysis::mesh_settings(connection);
        analysis::check_resources(analysis::estimate_resources(connection, settings), settings,
                                  max_dofs);
        const auto m = mesh::build_mesh(analysis::plate_layout(connection).region, settings);
        const std::filesystem::path dir =
            folder.empty() ? std::filesystem::path(".") : std::filesystem::path(folder);
        // Only now: bad input leaves no folder behind.
        if (std::error_code ec; !std::filesystem::create_directories(dir, ec) && ec)
            throw OutputError("cannot make the folder " + dir.string() + ": " + ec.message());
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
