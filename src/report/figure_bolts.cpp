// Bolt force vectors: an arrow at each bolt centre along the force the bolt
// puts on the plate, length proportional to its magnitude, the largest
// labelled.
#include "report/figures.hpp"
#include "report/svg_canvas.hpp"
#include "report/text_format.hpp"

#include <algorithm>
#include <fmt/format.h>

namespace lapwing::report {

std::string bolt_forces_svg(const check::CheckOutcome& o, int case_index) {
    const auto& bolts = o.results.cases[static_cast<size_t>(case_index)].bolts;
    const auto& models = o.results.problem.bolts;
    Eigen::Vector2d lo, hi;
    bounds(o.mesh, lo, hi);
    const Canvas canvas(lo, hi, 760, 30);
    std::string svg = canvas.open("Bolt force vectors");
    svg += fmt::format("<path d=\"{}\" fill=\"#f4f4f4\" stroke=\"#666\" stroke-width=\"1\"/>\n",
                       boundary_path(o.mesh, canvas));
    double largest = 0;
    for (const analysis::BoltForce& b : bolts) largest = std::max(largest, b.magnitude);
    // The largest arrow is as long as a tenth of the drawing's width.
    const double px_per_newton = largest > 0 ? 0.1 * canvas.width() / largest : 0;
    for (const analysis::BoltForce& b : bolts) {
        if (b.bolt < 0 || static_cast<size_t>(b.bolt) >= models.size()) continue;
        const Eigen::Vector2d c = models[static_cast<size_t>(b.bolt)].centre;
        const Eigen::Vector2d from(canvas.x(c.x()), canvas.y(c.y()));
        const Eigen::Vector2d to =
            from + px_per_newton * Eigen::Vector2d(b.force.x(), -b.force.y());
        svg += fmt::format("<circle cx=\"{:.1f}\" cy=\"{:.1f}\" r=\"2.5\" fill=\"#222\"/>\n",
                           from.x(), from.y());
        svg += arrow(from, to, "#c0392b", 1.6);
        svg += fmt::format("<text x=\"{:.1f}\" y=\"{:.1f}\" font-size=\"13\" fill=\"#7a1f14\">{}"
                           "</text>\n",
                           to.x() + 3, to.y() - 3,
                           escape(number(b.magnitude, Quantity::force, o.connection.units)));
    }
    svg += fmt::format("<text x=\"10\" y=\"{:.1f}\" font-size=\"13\">Labels: force per bolt, "
                       "{}</text>\n",
                       canvas.height() - 8, escape(unit(Quantity::force, o.connection.units)));
    return svg + Canvas::close();
}

} // namespace lapwing::report
