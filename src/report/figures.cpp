// Which case the figures show, their scales, and the list of figures with
// their captions.
#include "report/figures.hpp"

#include "report/svg_canvas.hpp"
#include "report/text_format.hpp"

#include <algorithm>
#include <cctype>
#include <cmath>
#include <fmt/format.h>
#include <set>

namespace lapwing::report {

// Section ids and case names carry names as typed ("east diagonal L3-U4",
// "1.2D + 1.6L").
std::string file_safe(std::string name) {
    for (char& ch : name)
        if (!(std::isalnum(static_cast<unsigned char>(ch)) || ch == '.' || ch == '-' || ch == '_'))
            ch = '_';
    return name;
}

namespace {
// Two names as typed can map to one file name ("D+L" and "D L" are both
// "D_L"): the later one gets "-2", "-3", … so that no file overwrites another.
class FileNames {
public:
    std::string take(const std::string& stem) {
        std::string name = stem + ".svg";
        for (int n = 2; used_.count(name); ++n) name = fmt::format("{}-{}.svg", stem, n);
        used_.insert(name);
        return name;
    }

private:
    std::set<std::string> used_;
};
} // namespace

int figure_case(const check::CheckOutcome& outcome) {
    const auto& cases = outcome.results.cases;
    const int g = outcome.table.governing;
    if (g >= 0) {
        const std::string& name = outcome.table.rows[static_cast<size_t>(g)].load_case;
        for (size_t i = 0; i < cases.size(); ++i)
            if (cases[i].name == name) return static_cast<int>(i);
    }
    return cases.empty() ? -1 : 0;
}

double von_mises(const fe::Stress& s) {
    return std::sqrt(std::max(0.0, s[0] * s[0] - s[0] * s[1] + s[1] * s[1] + 3 * s[2] * s[2]));
}

double deformed_scale(const check::CheckOutcome& outcome, int case_index) {
    if (outcome.connection.report.deformed_scale > 0)
        return outcome.connection.report.deformed_scale;
    if (case_index < 0) return 0;
    const auto& u = outcome.results.cases[static_cast<size_t>(case_index)].u;
    double largest = 0;
    const int n = static_cast<int>(outcome.mesh.nodes.size());
    for (int i = 0; i < n && 2 * i + 1 < u.size(); ++i)
        largest = std::max(largest, std::hypot(u[2 * i], u[2 * i + 1]));
    Eigen::Vector2d lo, hi;
    bounds(outcome.mesh, lo, hi);
    const double size = (hi - lo).maxCoeff();
    if (largest <= 0) return 0;
    // A round number (1, 2 or 5 times a power of ten) just below the target.
    const double target = 0.06 * size / largest;
    const double decade = std::pow(10.0, std::floor(std::log10(target)));
    for (double step : {5.0, 2.0, 1.0})
        if (step * decade <= target) return step * decade;
    return decade;
}

std::vector<Figure> all_figures(const check::CheckOutcome& outcome) {
    const model::Connection& c = outcome.connection;
    const UnitSystem units = c.units;
    const mesh::QualitySummary& q = outcome.mesh.quality_summary;
    FileNames names;
    std::vector<Figure> figures;
    figures.push_back({names.take("geometry"), "geometry", "Geometry",
                       "Plate outline with overall dimensions, bolt groups, member axes (arrows "
                       "from the work point along each member), welded edges (heavy) and section "
                       "lines (dashed).",
                       "", geometry_svg(outcome)});
    figures.push_back(
        {names.take("mesh"), "mesh", "Mesh",
         fmt::format("{} {} elements, {} nodes; element size {}. Scaled Jacobian min {:.2f}, "
                     "median {:.2f}; corner angles {:.0f}° to {:.0f}°; {:.0f} % of elements with "
                     "every angle in 30°–150°; {} inverted.",
                     outcome.mesh.n_elements(), fe::name(outcome.mesh.kind),
                     outcome.mesh.nodes.size(),
                     with_unit(outcome.element_size, Quantity::length, units),
                     q.scaled_jacobian.min, q.scaled_jacobian.median, q.min_angle_deg.min,
                     q.max_angle_deg.max, 100 * q.fraction_angles_ok, q.n_inverted),
         "", mesh_svg(outcome)});
    const int governing = figure_case(outcome);
    for (size_t k = 0; k < outcome.results.cases.size(); ++k) {
        const int ki = static_cast<int>(k);
        const std::string& name = outcome.results.cases[k].name;
        const std::string stem = file_safe(name);
        const std::string which = ki == governing && outcome.table.governing >= 0
                                      ? " (the case of the governing row)"
                                      : "";
        figures.push_back({names.take("contour-" + stem), "contour", "Von Mises stress",
                           fmt::format("Von Mises stress from the recovered nodal stresses, load "
                                       "case {}{}. Colour scale from zero to this case's largest "
                                       "nodal value. Peaks are local and mesh dependent.",
                                       name, which),
                           name, contour_svg(outcome, ki)});
        const double scale = deformed_scale(outcome, ki);
        figures.push_back({names.take("deformed-" + stem), "deformed", "Deformed shape",
                           fmt::format("Deformed mesh, load case {}, displacements magnified {:g} "
                                       "times; the undeformed outline in grey.",
                                       name, scale),
                           name, deformed_svg(outcome, ki, scale)});
        if (!outcome.results.problem.bolts.empty())
            figures.push_back({names.take("bolt-forces-" + stem), "bolt-forces", "Bolt forces",
                               fmt::format("Force each bolt puts on the plate, load case {}; "
                                           "arrow length proportional to the force, the largest "
                                           "a tenth of the drawing's width.",
                                           name),
                               name, bolt_forces_svg(outcome, ki)});
    }
    if (governing < 0) return figures;
    const std::string& case_name = outcome.results.cases[static_cast<size_t>(governing)].name;
    for (size_t s = 0; s < outcome.sections.size(); ++s)
        figures.push_back(
            {names.take("section-" + file_safe(outcome.sections[s].id)), "section",
             "Section " + outcome.sections[s].id,
             fmt::format("Normal, shear and von Mises stress along {}, load case {}, against "
                         "the distance from its start.",
                         outcome.sections[s].label, case_name),
             case_name, section_profile_svg(outcome, governing, static_cast<int>(s))});
    return figures;
}

} // namespace lapwing::report
