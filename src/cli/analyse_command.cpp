// `lapwing analyse FILE [--set ...]`: validates, meshes and solves the
// connection and prints, per load case and combination, the bolt forces,
// the support reactions and the equilibrium figures. The checks and the
// calc sheet build on this stage.
#include "analysis/analyse.hpp"
#include "analysis/resource_estimate.hpp"
#include "cli/commands.hpp"
#include "cli/files.hpp"
#include "core/error.hpp"
#include "core/units.hpp"
#include "input/load_connection.hpp"

#include <fmt/format.h>
#include <ostream>

namespace lapwing::cli {

int run_analyse(const std::string& file, const std::vector<std::string>& sets, long max_dofs,
                std::ostream& out, std::ostream& err) {
    try {
        const auto c = input::load_connection(read_input_file(file), file, sets);
        const auto settings = analysis::mesh_settings(c);
        analysis::check_resources(analysis::estimate_resources(c, settings), settings, max_dofs);
        const auto layout = analysis::plate_layout(c);
        const auto m = mesh::build_mesh(layout.region, settings);
        const auto r = analysis::analyse(c, m, layout);
        const auto force = [&](double newton) {
            return from_internal(newton, Quantity::force, c.units);
        };
        const std::string force_unit(unit_label(Quantity::force, c.units));
        out << fmt::format("{}: {} {} elements, {} dofs; solved in {:.2f} s\n", file,
                           m.n_elements(), fe::name(m.kind), r.problem.model.n_dofs(),
                           r.seconds_solve);
        out << "Linear-elastic plane-stress model: results are for review by the engineer of "
               "record.\n";
        for (const auto& w : r.warnings) out << "warning: " << w << "\n";
        for (const auto& cr : r.cases) {
            out << fmt::format("\n{} {}: equilibrium residual {:.1e}, solver residual {:.1e}{}\n",
                               cr.combination ? "combination" : "load case", cr.name,
                               cr.equilibrium_residual, cr.solver_residual,
                               cr.contact_iterations ? fmt::format(", bearing contact in {} passes",
                                                                   cr.contact_iterations)
                                                     : "");
            for (const auto& b : cr.bolts) {
                const auto& bolt = r.problem.bolts[static_cast<size_t>(b.bolt)];
                out << fmt::format(
                    "  bolt {}[{}] at ({:.1f}, {:.1f}) mm: {:.3g} {} at {:+.1f} deg to the axis\n",
                    c.bolt_groups[static_cast<size_t>(bolt.group)].name, bolt.bolt, bolt.centre.x(),
                    bolt.centre.y(), force(b.magnitude), force_unit, b.angle_to_axis_deg);
            }
            for (size_t k = 0; k < cr.reactions.size(); ++k)
                out << fmt::format("  support {}: Fx {:.4g} {}, Fy {:.4g} {}\n", c.supports[k].name,
                                   force(cr.reactions[k].force.x()), force_unit,
                                   force(cr.reactions[k].force.y()), force_unit);
        }
        return 0;
    } catch (...) {
        return report_failure(err);
    }
}

} // namespace lapwing::cli
