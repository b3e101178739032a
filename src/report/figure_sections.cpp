// A section's stress profile: normal, shear and von Mises stress against
// the distance along the line, in the user's units, with the membrane
// (average) normal stress as a horizontal reference.
#include "report/figures.hpp"
#include "report/text_format.hpp"

#include <algorithm>
#include <cmath>
#include <fmt/format.h>

namespace lapwing::report {

namespace {

// About five round tick values covering [lo, hi].
std::vector<double> ticks(double lo, double hi) {
    const double span = hi - lo > 0 ? hi - lo : 1;
    const double raw = span / 5;
    const double decade = std::pow(10.0, std::floor(std::log10(raw)));
    double step = decade;
    for (double m : {1.0, 2.0, 5.0, 10.0})
        if (m * decade >= raw) {
            step = m * decade;
            break;
        }
    std::vector<double> out;
    for (double v = std::ceil(lo / step) * step; v <= hi + 1e-9 * span; v += step)
        out.push_back(std::abs(v) < 1e-12 * span ? 0 : v);
    return out;
}

} // namespace

std::string section_profile_svg(const check::CheckOutcome& o, int case_index, int section) {
    const UnitSystem units = o.connection.units;
    const check::SectionLine& line = o.sections[static_cast<size_t>(section)];
    const auto& stresses = o.section_stress;
    const check::SectionStress* st = nullptr;
    if (static_cast<size_t>(case_index) < stresses.size())
        for (const check::SectionStress& s : stresses[static_cast<size_t>(case_index)])
            if (s.section == section) st = &s;

    const double W = 620, H = 240, left = 64, right = 130, top = 16, bottom = 40;
    std::string svg = fmt::format(
        "<svg xmlns=\"http://www.w3.org/2000/svg\" viewBox=\"0 0 {0:.0f} {1:.0f}\" "
        "width=\"{0:.0f}\" "
        "height=\"{1:.0f}\" font-family=\"Helvetica, Arial, sans-serif\" font-size=\"11\">\n"
        "<title>{2}</title>\n",
        W, H, escape("Stress profile along " + line.id));
    if (!st || st->profile.empty()) {
        svg += "<text x=\"20\" y=\"40\">No profile for this section.</text>\n";
        return svg + "</svg>\n";
    }
    // Values in the user's units from here on.
    const auto len = [&](double v) { return from_internal(v, Quantity::length, units); };
    const auto str = [&](double v) { return from_internal(v, Quantity::stress, units); };
    double s_max = len(line.length()), y_lo = 0, y_hi = 0;
    for (const check::ProfilePoint& p : st->profile) {
        s_max = std::max(s_max, len(p.s));
        for (double v : {str(p.normal), str(p.shear), str(p.von_mises)}) {
            y_lo = std::min(y_lo, v);
            y_hi = std::max(y_hi, v);
        }
    }
    if (y_hi - y_lo <= 0) y_hi = y_lo + 1;
    const double pw = W - left - right, ph = H - top - bottom;
    const auto X = [&](double s) { return left + pw * s / (s_max > 0 ? s_max : 1); };
    const auto Y = [&](double v) { return top + ph * (y_hi - v) / (y_hi - y_lo); };

    svg += "<g stroke=\"#ddd\" stroke-width=\"0.6\">";
    for (double v : ticks(y_lo, y_hi))
        svg += fmt::format("<line x1=\"{:.1f}\" y1=\"{:.1f}\" x2=\"{:.1f}\" y2=\"{:.1f}\"/>", left,
                           Y(v), left + pw, Y(v));
    svg += "</g>\n";
    for (double v : ticks(y_lo, y_hi))
        svg += fmt::format("<text x=\"{:.1f}\" y=\"{:.1f}\" text-anchor=\"end\">{:g}</text>\n",
                           left - 5, Y(v) + 4, v);
    for (double s : ticks(0, s_max))
        svg += fmt::format("<text x=\"{:.1f}\" y=\"{:.1f}\" text-anchor=\"middle\">{:g}</text>\n",
                           X(s), top + ph + 14, s);
    svg += fmt::format("<rect x=\"{:.1f}\" y=\"{:.1f}\" width=\"{:.1f}\" height=\"{:.1f}\" "
                       "fill=\"none\" stroke=\"#333\" stroke-width=\"0.8\"/>\n",
                       left, top, pw, ph);
    svg += fmt::format("<text x=\"{:.1f}\" y=\"{:.1f}\" text-anchor=\"middle\">distance along "
                       "the line, {}</text>\n",
                       left + pw / 2, H - 6, escape(unit(Quantity::length, units)));
    svg += fmt::format("<text x=\"14\" y=\"{0:.1f}\" text-anchor=\"middle\" transform=\"rotate(-90 "
                       "14 {0:.1f})\">stress, {1}</text>\n",
                       top + ph / 2, escape(unit(Quantity::stress, units)));

    struct Series {
        const char* name;
        const char* colour;
        double check::ProfilePoint::*value;
        const char* dash;
    };
    const Series series[] = {{"normal", "#1f5fa8", &check::ProfilePoint::normal, ""},
                             {"shear", "#d95f02", &check::ProfilePoint::shear, "5 3"},
                             {"von Mises", "#222", &check::ProfilePoint::von_mises, "2 2"}};
    int row = 0;
    for (const Series& s : series) {
        std::string d;
        for (const check::ProfilePoint& p : st->profile)
            d += fmt::format("{}{:.1f},{:.1f}", d.empty() ? "M" : "L", X(len(p.s)),
                             Y(str(p.*s.value)));
        svg += fmt::format("<path d=\"{}\" fill=\"none\" stroke=\"{}\" stroke-width=\"1.5\" "
                           "stroke-dasharray=\"{}\"/>\n",
                           d, s.colour, s.dash);
        const double ly = top + 12 + 16 * row++;
        svg += fmt::format("<line x1=\"{0:.1f}\" y1=\"{1:.1f}\" x2=\"{2:.1f}\" y2=\"{1:.1f}\" "
                           "stroke=\"{3}\" stroke-width=\"1.5\" stroke-dasharray=\"{4}\"/>"
                           "<text x=\"{5:.1f}\" y=\"{6:.1f}\">{7}</text>\n",
                           left + pw + 10, ly, left + pw + 34, s.colour, s.dash, left + pw + 40,
                           ly + 4, s.name);
    }
    const double avg = str(st->average_normal);
    svg += fmt::format("<line x1=\"{0:.1f}\" y1=\"{1:.1f}\" x2=\"{2:.1f}\" y2=\"{1:.1f}\" "
                       "stroke=\"#1f5fa8\" stroke-width=\"0.8\" stroke-opacity=\"0.6\"/>"
                       "<text x=\"{3:.1f}\" y=\"{4:.1f}\">average normal</text>\n",
                       left, Y(avg), left + pw, left + pw + 10, top + 12 + 16 * row + 4);
    return svg + "</svg>\n";
}

} // namespace lapwing::report
