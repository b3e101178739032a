// The geometry figure: outline and holes, overall dimensions, bolt centres
// by group, member axes, welded edges and section lines.
#include "report/figures.hpp"
#include "report/svg_canvas.hpp"
#include "report/text_format.hpp"

#include <algorithm>
#include <cmath>
#include <fmt/format.h>
#include <numbers>

namespace lapwing::report {

namespace {

// The part of the line p + s·d inside the box [lo, hi] (slab clipping);
// false when the line misses the box.
bool clip(const Eigen::Vector2d& p, const Eigen::Vector2d& d, const Eigen::Vector2d& lo,
          const Eigen::Vector2d& hi, double& s0, double& s1) {
    s0 = -1e300;
    s1 = 1e300;
    for (int k = 0; k < 2; ++k) {
        if (std::abs(d[k]) < 1e-12) {
            if (p[k] < lo[k] || p[k] > hi[k]) return false;
            continue;
        }
        double a = (lo[k] - p[k]) / d[k], b = (hi[k] - p[k]) / d[k];
        if (a > b) std::swap(a, b);
        s0 = std::max(s0, a);
        s1 = std::min(s1, b);
    }
    return s0 < s1;
}

std::string text(double x, double y, const std::string& words, const char* anchor = "middle",
                 const char* colour = "#222") {
    return fmt::format("<text x=\"{:.1f}\" y=\"{:.1f}\" text-anchor=\"{}\" fill=\"{}\">{}</text>\n",
                       x, y, anchor, colour, escape(words));
}

} // namespace

std::string geometry_svg(const check::CheckOutcome& o) {
    const model::Connection& c = o.connection;
    Eigen::Vector2d lo, hi;
    bounds(o.mesh, lo, hi);
    const Canvas canvas(lo, hi, 760, 60);
    std::string svg = canvas.open("Plate geometry");
    svg += fmt::format("<path d=\"{}\" fill=\"none\" stroke=\"#222\" stroke-width=\"1.4\"/>\n",
                       boundary_path(o.mesh, canvas));

    // Overall dimensions, below and left of the plate.
    const double yb = canvas.y(lo.y()) + 30, xl = canvas.x(lo.x()) - 30;
    svg += fmt::format("<g stroke=\"#555\" stroke-width=\"0.8\">"
                       "<line x1=\"{0:.1f}\" y1=\"{2:.1f}\" x2=\"{1:.1f}\" y2=\"{2:.1f}\"/>"
                       "<line x1=\"{0:.1f}\" y1=\"{3:.1f}\" x2=\"{0:.1f}\" y2=\"{4:.1f}\"/>"
                       "<line x1=\"{1:.1f}\" y1=\"{3:.1f}\" x2=\"{1:.1f}\" y2=\"{4:.1f}\"/>",
                       canvas.x(lo.x()), canvas.x(hi.x()), yb, yb - 6, yb + 6);
    svg += fmt::format("<line x1=\"{2:.1f}\" y1=\"{0:.1f}\" x2=\"{2:.1f}\" y2=\"{1:.1f}\"/>"
                       "<line x1=\"{3:.1f}\" y1=\"{0:.1f}\" x2=\"{4:.1f}\" y2=\"{0:.1f}\"/>"
                       "<line x1=\"{3:.1f}\" y1=\"{1:.1f}\" x2=\"{4:.1f}\" y2=\"{1:.1f}\"/></g>\n",
                       canvas.y(hi.y()), canvas.y(lo.y()), xl, xl - 6, xl + 6);
    svg += text(0.5 * (canvas.x(lo.x()) + canvas.x(hi.x())), yb + 16,
                with_unit(hi.x() - lo.x(), Quantity::length, c.units));
    svg += fmt::format("<text x=\"{0:.1f}\" y=\"{1:.1f}\" text-anchor=\"middle\" fill=\"#222\" "
                       "transform=\"rotate(-90 {0:.1f} {1:.1f})\">{2}</text>\n",
                       xl - 8, 0.5 * (canvas.y(lo.y()) + canvas.y(hi.y())),
                       escape(with_unit(hi.y() - lo.y(), Quantity::length, c.units)));

    // Welded edges, heavy.
    for (const check::WeldLine& w : o.welds)
        svg += fmt::format("<line x1=\"{:.1f}\" y1=\"{:.1f}\" x2=\"{:.1f}\" y2=\"{:.1f}\" "
                           "stroke=\"#b35806\" stroke-width=\"5\" stroke-opacity=\"0.7\"/>\n",
                           canvas.x(w.from.x()), canvas.y(w.from.y()), canvas.x(w.to.x()),
                           canvas.y(w.to.y()));

    // Member axes inside a box a little larger than the plate.
    const Eigen::Vector2d pad = 0.08 * (hi - lo);
    for (const model::Member& m : c.members) {
        const double a = m.angle * std::numbers::pi / 180;
        const Eigen::Vector2d p(m.work_point.x, m.work_point.y), d(std::cos(a), std::sin(a));
        double s0 = 0, s1 = 0;
        if (!clip(p, d, lo - pad, hi + pad, s0, s1)) continue;
        const Eigen::Vector2d A = p + s0 * d, B = p + s1 * d;
        svg +=
            fmt::format("<line x1=\"{:.1f}\" y1=\"{:.1f}\" x2=\"{:.1f}\" y2=\"{:.1f}\" "
                        "stroke=\"#1f5fa8\" stroke-width=\"1\" stroke-dasharray=\"10 3 2 3\"/>\n",
                        canvas.x(A.x()), canvas.y(A.y()), canvas.x(B.x()), canvas.y(B.y()));
        const Eigen::Vector2d tip(canvas.x(B.x()), canvas.y(B.y()));
        const Eigen::Vector2d dir(d.x(), -d.y());
        svg += arrow(tip - 30 * dir, tip, "#1f5fa8", 1.5);
        svg += text(tip.x() + 6, tip.y() - 6, "member " + m.name, "start", "#1f5fa8");
    }

    // Bolt centres: a cross each, the group's name at its first bolt.
    std::vector<bool> named(c.bolt_groups.size(), false);
    for (const analysis::BoltRef& b : o.layout.bolts) {
        const double x = canvas.x(b.centre.x()), y = canvas.y(b.centre.y());
        svg += fmt::format("<path d=\"M{:.1f},{:.1f}h8M{:.1f},{:.1f}v8\" stroke=\"#222\" "
                           "stroke-width=\"0.8\"/>\n",
                           x - 4, y, x, y - 4);
        if (b.group >= 0 && static_cast<size_t>(b.group) < named.size() && !named[b.group]) {
            named[b.group] = true;
            svg += text(x + 8, y + 14, c.bolt_groups[b.group].name, "start", "#444");
        }
    }

    // Section lines, dashed, with their ids.
    for (const check::SectionLine& s : o.sections) {
        svg += fmt::format("<line x1=\"{:.1f}\" y1=\"{:.1f}\" x2=\"{:.1f}\" y2=\"{:.1f}\" "
                           "stroke=\"#7b3294\" stroke-width=\"1.3\" stroke-dasharray=\"5 3\"/>\n",
                           canvas.x(s.from.x()), canvas.y(s.from.y()), canvas.x(s.to.x()),
                           canvas.y(s.to.y()));
        svg += text(canvas.x(s.to.x()) + 4, canvas.y(s.to.y()) - 4, s.id, "start", "#7b3294");
    }
    return svg + Canvas::close();
}

} // namespace lapwing::report
