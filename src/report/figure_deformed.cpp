// The deformed shape: the mesh moved by its magnified displacements over
// the undeformed outline in grey.
#include "report/figures.hpp"
#include "report/svg_canvas.hpp"

#include <fmt/format.h>

namespace lapwing::report {

std::string deformed_svg(const check::CheckOutcome& o, int case_index, double scale) {
    const Eigen::VectorXd& u = o.results.cases[static_cast<size_t>(case_index)].u;
    Eigen::Vector2d lo, hi;
    bounds(o.mesh, lo, hi);
    for (size_t n = 0; n < o.mesh.nodes.size(); ++n) {
        const Eigen::Vector2d p = placed(o.mesh, static_cast<int>(n), &u, scale);
        lo = lo.cwiseMin(p);
        hi = hi.cwiseMax(p);
    }
    const Canvas canvas(lo, hi, 760, 20);
    std::string svg = canvas.open(fmt::format("Deformed shape, displacements times {:g}", scale));
    svg += fmt::format("<path d=\"{}\" fill=\"none\" stroke=\"#aaa\" stroke-width=\"1.2\"/>\n",
                       boundary_path(o.mesh, canvas));
    std::string d;
    for (int e = 0; e < o.mesh.n_elements(); ++e) d += element_path(o.mesh, e, canvas, &u, scale);
    svg += fmt::format("<path d=\"{}\" fill=\"#dfe8f3\" fill-opacity=\"0.7\" stroke=\"#2d4b73\" "
                       "stroke-width=\"0.3\"/>\n",
                       d);
    svg += fmt::format("<path d=\"{}\" fill=\"none\" stroke=\"#111\" stroke-width=\"1\"/>\n",
                       boundary_path(o.mesh, canvas, &u, scale));
    return svg + Canvas::close();
}

} // namespace lapwing::report
