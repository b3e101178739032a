// The von Mises contour: each element split into four sub-quadrilaterals
// (corner, mid-side, centre, mid-side) filled with the colour of their mean
// nodal value, on a viridis scale from zero to the case's largest nodal
// value, with a labelled legend in the user's stress unit.
#include "report/colour_map.hpp"
#include "report/figures.hpp"
#include "report/svg_canvas.hpp"
#include "report/text_format.hpp"

#include <algorithm>
#include <array>
#include <fmt/format.h>
#include <map>

namespace lapwing::report {

namespace {

constexpr int legend_bands = 10;

std::string legend(const Canvas& canvas, double max_value, UnitSystem units) {
    const double x = canvas.width() - 95, top = 30, height = std::min(240.0, canvas.height() - 60);
    std::string svg = fmt::format("<g><text x=\"{:.1f}\" y=\"{:.1f}\">von Mises, {}</text>\n", x,
                                  top - 10, escape(unit(Quantity::stress, units)));
    for (int b = 0; b < legend_bands; ++b) {
        const double t = (b + 0.5) / legend_bands;
        const double y = top + height * (1 - static_cast<double>(b + 1) / legend_bands);
        svg += fmt::format("<rect x=\"{:.1f}\" y=\"{:.1f}\" width=\"18\" height=\"{:.1f}\" "
                           "fill=\"{}\"/>\n",
                           x, y, height / legend_bands + 0.3, hex(viridis(t)));
    }
    for (int b = 0; b <= legend_bands; b += 2) {
        const double y = top + height * (1 - static_cast<double>(b) / legend_bands);
        svg += fmt::format("<text x=\"{:.1f}\" y=\"{:.1f}\">{}</text>\n", x + 24, y + 4,
                           number(max_value * b / legend_bands, Quantity::stress, units));
    }
    return svg + fmt::format("<rect x=\"{:.1f}\" y=\"{:.1f}\" width=\"18\" height=\"{:.1f}\" "
                             "fill=\"none\" stroke=\"#333\" stroke-width=\"0.6\"/></g>\n",
                             x, top, height);
}

} // namespace

std::string contour_svg(const check::CheckOutcome& o, int case_index) {
    const mesh::Mesh& mesh = o.mesh;
    const auto& stress = o.results.cases[static_cast<size_t>(case_index)].nodal_stress;
    std::vector<double> vm(mesh.nodes.size(), 0.0);
    double largest = 0;
    for (size_t i = 0; i < vm.size() && i < stress.size(); ++i) {
        vm[i] = von_mises(stress[i]);
        largest = std::max(largest, vm[i]);
    }
    const double range = largest > 0 ? largest : 1;
    Eigen::Vector2d lo, hi;
    bounds(mesh, lo, hi);
    const Canvas canvas(lo, hi, 760, 20, 110);
    std::string svg = canvas.open("Von Mises stress contour");
    // One path per colour holding all its cells: the same picture as a path
    // per cell at about a third of the bytes (a sheet carries one contour
    // per load case). The map keeps the output order fixed (--reproducible).
    std::map<std::string, std::string> cells_by_colour;
    const auto cell = [&](const std::array<Eigen::Vector2d, 4>& p, double value) {
        std::string& d = cells_by_colour[hex(viridis(value / range))];
        for (int k = 0; k < 4; ++k) d.append(k == 0 ? "M" : "L").append(canvas.point(p[k]));
        d.push_back('Z');
    };
    for (int e = 0; e < mesh.n_elements(); ++e) {
        const auto el = mesh.element(e);
        const auto at = [&](int k) { return mesh.nodes[static_cast<size_t>(el[k])]; };
        const auto v = [&](int k) { return vm[static_cast<size_t>(el[k])]; };
        if (el.size() < 8) {
            cell({at(0), at(1), at(2), at(3)}, 0.25 * (v(0) + v(1) + v(2) + v(3)));
            continue;
        }
        // Centre point and value: node 8 for Q9; for Q8 the serendipity
        // interpolation at ξ = η = 0, −¼ Σ corners + ½ Σ mid-sides.
        Eigen::Vector2d centre = Eigen::Vector2d::Zero();
        double centre_value = 0;
        if (el.size() >= 9) {
            centre = at(8);
            centre_value = v(8);
        } else {
            for (int k = 0; k < 4; ++k) {
                centre += -0.25 * at(k) + 0.5 * at(4 + k);
                centre_value += -0.25 * v(k) + 0.5 * v(4 + k);
            }
        }
        for (int k = 0; k < 4; ++k) {
            const int before = 4 + (k + 3) % 4, after = 4 + k;
            cell({at(k), at(after), centre, at(before)},
                 0.25 * (v(k) + v(after) + centre_value + v(before)));
        }
    }
    // The stroke in the fill's colour closes the hairline seams between cells.
    for (const auto& [colour, d] : cells_by_colour)
        svg += fmt::format("<path d=\"{}\" fill=\"{}\" stroke=\"{}\" stroke-width=\"0.4\" "
                           "stroke-linejoin=\"round\"/>\n",
                           d, colour, colour);
    svg += fmt::format("<path d=\"{}\" fill=\"none\" stroke=\"#111\" stroke-width=\"0.9\"/>\n",
                       boundary_path(mesh, canvas));
    svg += legend(canvas, largest, o.connection.units);
    return svg + Canvas::close();
}

} // namespace lapwing::report
