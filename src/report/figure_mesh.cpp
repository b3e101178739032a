// The mesh figure: every element (curved edges through mid-side nodes) and
// the boundary drawn heavier.
#include "report/figures.hpp"
#include "report/svg_canvas.hpp"

#include <fmt/format.h>

namespace lapwing::report {

std::string mesh_svg(const check::CheckOutcome& o) {
    Eigen::Vector2d lo, hi;
    bounds(o.mesh, lo, hi);
    const Canvas canvas(lo, hi, 760, 20);
    std::string svg = canvas.open("Finite-element mesh");
    std::string d;
    for (int e = 0; e < o.mesh.n_elements(); ++e) d += element_path(o.mesh, e, canvas);
    svg += fmt::format("<path d=\"{}\" fill=\"#eef2f7\" stroke=\"#4a5a70\" "
                       "stroke-width=\"0.35\"/>\n",
                       d);
    svg += fmt::format("<path d=\"{}\" fill=\"none\" stroke=\"#111\" stroke-width=\"1.2\"/>\n",
                       boundary_path(o.mesh, canvas));
    return svg + Canvas::close();
}

} // namespace lapwing::report
