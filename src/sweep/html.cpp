// The sweep summary page.
#include "sweep/html.hpp"

#include "report/text_format.hpp"
#include "sweep/csv.hpp"

#include <algorithm>
#include <cmath>
#include <fmt/format.h>
#include <map>

namespace lapwing::sweep {

namespace {

// Okabe & Ito (2008) colour-blind safe palette, one colour per family.
constexpr const char* family_colour[] = {"#E69F00", "#56B4E9", "#009E73", "#F0E442",
                                         "#0072B2", "#D55E00", "#CC79A7", "#999999"};

using report::escape; // the calc sheet's escaping, one rule for every page

struct Frame {
    double x0, x1, y1; // data ranges (y from 0)
    double left = 60, right = 20, top = 20, bottom = 45, width = 640, height = 300;
    double px(double x) const {
        return left + (x1 > x0 ? (x - x0) / (x1 - x0) : 0.5) * (width - left - right);
    }
    double py(double y) const { return height - bottom - y / y1 * (height - top - bottom); }
};

std::string polyline(const Frame& f, const std::vector<std::pair<double, double>>& points,
                     const char* colour, double stroke) {
    std::string out;
    // Split at gaps (a variant that did not build): NaN ends a piece.
    std::string piece;
    int n = 0;
    auto flush = [&] {
        if (n > 1)
            out += fmt::format(
                "<polyline fill=\"none\" stroke=\"{}\" stroke-width=\"{}\" points=\"{}\"/>\n",
                colour, stroke, piece);
        piece.clear();
        n = 0;
    };
    for (const auto& [x, y] : points) {
        if (std::isnan(y)) {
            flush();
            continue;
        }
        piece += fmt::format("{:.1f},{:.1f} ", f.px(x), f.py(y));
        ++n;
    }
    flush();
    for (const auto& [x, y] : points)
        if (!std::isnan(y))
            out += fmt::format("<circle cx=\"{:.1f}\" cy=\"{:.1f}\" r=\"{}\" fill=\"{}\"/>\n",
                               f.px(x), f.py(y), stroke + 1, colour);
    return out;
}

std::string chart(const SweepPage& page, const std::vector<const VariantResult*>& line,
                  std::optional<double> lightest) {
    const auto a = static_cast<size_t>(page.plot_axis);
    Frame f{};
    f.x0 = INFINITY, f.x1 = -INFINITY, f.y1 = 1.2;
    for (const VariantResult* r : line) {
        f.x0 = std::min(f.x0, r->values[a]);
        f.x1 = std::max(f.x1, r->values[a]);
        if (r->built && r->has_ratio) f.y1 = std::max(f.y1, 1.1 * r->governing_ratio);
    }
    std::string svg = fmt::format(
        "<svg xmlns=\"http://www.w3.org/2000/svg\" width=\"{0}\" height=\"{1}\" viewBox=\"0 0 {0} "
        "{1}\" role=\"img\">\n",
        f.width, f.height);
    // Axes, ticks and the limit line.
    svg += fmt::format("<rect x=\"{}\" y=\"{}\" width=\"{}\" height=\"{}\" fill=\"none\" "
                       "stroke=\"#444\"/>\n",
                       f.left, f.top, f.width - f.left - f.right, f.height - f.top - f.bottom);
    for (int i = 0; i <= 5; ++i) {
        const double y = f.y1 * i / 5;
        svg += fmt::format("<text x=\"{:.1f}\" y=\"{:.1f}\" text-anchor=\"end\">{:.2f}</text>\n",
                           f.left - 6, f.py(y) + 4, y);
    }
    std::vector<double> xs;
    for (const VariantResult* r : line) xs.push_back(r->values[a]);
    const size_t stride = std::max<size_t>(1, xs.size() / 10);
    for (size_t i = 0; i < xs.size(); i += stride)
        svg += fmt::format("<text x=\"{:.1f}\" y=\"{:.1f}\" text-anchor=\"middle\">{:g}</text>\n",
                           f.px(xs[i]), f.height - f.bottom + 16, xs[i]);
    svg += fmt::format("<text x=\"{:.1f}\" y=\"{:.1f}\" text-anchor=\"middle\">{}</text>\n",
                       (f.left + f.width - f.right) / 2, f.height - 6, escape(page.axes[a].name));
    svg += fmt::format("<line x1=\"{}\" x2=\"{}\" y1=\"{:.1f}\" y2=\"{:.1f}\" stroke=\"#c00\" "
                       "stroke-dasharray=\"6 4\"/>\n<text x=\"{}\" y=\"{:.1f}\" "
                       "fill=\"#c00\">limit 1.0</text>\n",
                       f.left, f.width - f.right, f.py(1), f.py(1), f.left + 4, f.py(1) - 4);
    // One curve per family, then the governing ratio on top.
    for (size_t k = 0; k < n_families; ++k) {
        std::vector<std::pair<double, double>> points;
        bool any = false;
        for (const VariantResult* r : line) {
            const bool has = r->built && r->family_ratio[k].has_value();
            any = any || has;
            points.push_back({r->values[a], has ? *r->family_ratio[k] : NAN});
        }
        if (any) svg += polyline(f, points, family_colour[k], 1.5);
    }
    std::vector<std::pair<double, double>> governing;
    for (const VariantResult* r : line)
        governing.push_back({r->values[a], r->built && r->has_ratio ? r->governing_ratio : NAN});
    svg += polyline(f, governing, "#000", 2.5);
    for (const VariantResult* r : line)
        if (!r->built)
            svg += fmt::format("<text x=\"{:.1f}\" y=\"{:.1f}\" text-anchor=\"middle\" "
                               "fill=\"#c00\">×</text>\n",
                               f.px(r->values[a]), f.py(0) - 4);
    if (lightest)
        svg += fmt::format("<line x1=\"{0:.1f}\" x2=\"{0:.1f}\" y1=\"{1}\" y2=\"{2:.1f}\" "
                           "stroke=\"#090\" stroke-width=\"2\"/>\n<text x=\"{3:.1f}\" "
                           "y=\"{4}\" fill=\"#090\">lightest passing: {5:g}</text>\n",
                           f.px(*lightest), f.top, f.py(0), f.px(*lightest) + 4, f.top + 14,
                           *lightest);
    return svg + "</svg>\n";
}

} // namespace

std::optional<double> smallest_passing(const std::vector<const VariantResult*>& line, int axis) {
    std::optional<double> best;
    for (const VariantResult* r : line)
        if (r->built && r->passes) {
            const double v = r->values[static_cast<size_t>(axis)];
            if (!best || v < *best) best = v;
        }
    return best;
}

std::string render_sweep_html(const SweepPage& page) {
    const auto a = static_cast<size_t>(page.plot_axis);
    std::string out = fmt::format(
        "<!DOCTYPE html>\n<html lang=\"en\"><head><meta charset=\"utf-8\">\n<title>Sweep: "
        "{}</title>\n<style>\nbody{{font-family:sans-serif;max-width:60em;margin:1em "
        "auto;color:#222}}\nsvg text{{font-size:12px}}\ntable{{border-collapse:collapse;font-size:"
        "12px}}\ntd,th{{border:1px solid #bbb;padding:2px 6px;text-align:right}}\n"
        "tr.fail td{{background:#fde8e8}}\ntr.nobuild td{{background:#eee;color:#777}}\n"
        ".key span{{display:inline-block;width:1.5em;height:.4em;margin:0 .3em 0 1em}}\n"
        "</style></head><body>\n<h1>Sweep: {}</h1>\n<p>Command: <code>{}</code></p>\n",
        escape(page.title), escape(page.title), escape(page.command_line));
    out += "<p>Ratios are demand / capacity of the governing check row (black) and the highest "
           "ratio of each check family (colours); a variant passes when no row exceeds 1. "
           "Capacities are the allowables of the template; local codes and licensed practice "
           "govern.</p>\n<p class=\"key\"><span style=\"background:#000\"></span>governing";
    for (size_t k = 0; k < n_families; ++k)
        out += fmt::format("<span style=\"background:{}\"></span>{}", family_colour[k],
                           check::word(check::all_families[k]));
    out += "</p>\n";

    // Lines: results that agree on every axis but the plot axis.
    std::map<std::vector<double>, std::vector<const VariantResult*>> lines;
    std::vector<std::vector<double>> order;
    for (const VariantResult& r : page.results) {
        std::vector<double> others = r.values;
        others.erase(others.begin() + static_cast<long>(a));
        auto [it, fresh] = lines.try_emplace(others);
        if (fresh) order.push_back(others);
        it->second.push_back(&r);
    }
    size_t n_line = 0;
    for (const auto& others : order) {
        auto line = lines[others];
        std::stable_sort(line.begin(), line.end(),
                         [&](const auto* x, const auto* y) { return x->values[a] < y->values[a]; });
        std::optional<double> lightest = smallest_passing(line, page.plot_axis);
        std::string caption;
        if (page.find_min && n_line < page.find_min->lines.size()) {
            const MinimumOnLine& m = page.find_min->lines[n_line];
            lightest = m.smallest;
            if (!m.warning.empty()) caption = "Warning: " + m.warning + "; the full line was run.";
        }
        std::string heading;
        for (size_t k = 0, j = 0; k < page.axes.size(); ++k)
            if (k != a)
                heading += fmt::format("{}{} = {:g}", heading.empty() ? "" : ", ",
                                       page.axes[k].name, others[j++]);
        out += fmt::format("<h2>{}</h2>\n", heading.empty() ? "Governing ratio" : escape(heading));
        out += chart(page, line, lightest);
        out += fmt::format("<p>{}{}</p>\n",
                           lightest ? fmt::format("Lightest passing {}: {:g}.",
                                                  escape(page.axes[a].name), *lightest)
                                    : "No value on this line passes.",
                           caption.empty() ? "" : " " + escape(caption));
        ++n_line;
    }

    // The table, as in sweep.csv.
    out += "<h2>Variants</h2>\n<table>\n<tr><th>variant</th>";
    for (const Axis& ax : page.axes) out += "<th>" + escape(ax.name) + "</th>";
    out += "<th>passes</th><th>governing ratio</th><th>governing check</th>";
    for (check::Family f : check::all_families)
        out += std::string("<th>") + check::word(f) + "</th>";
    out += page.reports ? "<th>error</th><th>files</th></tr>\n" : "<th>error</th></tr>\n";
    for (size_t i = 0; i < page.results.size(); ++i) {
        const VariantResult& r = page.results[i];
        const Variant& v = page.variants[i];
        out += fmt::format("<tr class=\"{}\"><td>{}</td>",
                           !r.built ? "nobuild" : (r.passes ? "pass" : "fail"), v.index + 1);
        for (size_t k = 0; k < page.axes.size(); ++k)
            out += "<td>" + escape(page.axes[k].texts[static_cast<size_t>(v.at[k])]) + "</td>";
        out += fmt::format("<td>{}</td>", !r.built ? "" : (r.passes ? "yes" : "no"));
        out += r.built && r.has_ratio ? fmt::format("<td>{:.3f}</td><td>{}</td>", r.governing_ratio,
                                                    escape(r.governing_id))
                                      : "<td></td><td></td>";
        for (const auto& ratio : r.family_ratio)
            out += ratio ? fmt::format("<td>{:.3f}</td>", *ratio) : "<td></td>";
        out += "<td style=\"text-align:left\">" + escape(r.error) + "</td>";
        if (page.reports) {
            // Relative links, so the sweep folder can be moved or zipped whole.
            if (!r.report_error.empty())
                out += "<td style=\"text-align:left\">not written: " + escape(r.report_error) +
                       "</td>";
            else if (!r.report.empty())
                out += "<td style=\"text-align:left\"><a href=\"" + escape(r.report) + "/\">" +
                       escape(r.report) + "</a></td>";
            else
                out += "<td></td>";
        }
        out += "</tr>\n";
    }
    return out + "</table>\n</body></html>\n";
}

} // namespace lapwing::sweep
