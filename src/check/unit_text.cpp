// Check-row words in the template's units (core/units.hpp converts).
#include "check/unit_text.hpp"

#include <cmath>
#include <fmt/format.h>

namespace lapwing::check {

namespace {
int decimals(UnitSystem units, bool coarse) {
    const int fine = units == UnitSystem::kip_in ? 2 : 1;
    return coarse ? fine - 1 : fine;
}
// No "-0.0" for a coordinate that rounds to zero.
double tidy(double v, int places) {
    const double step = places >= 2 ? 0.005 : places == 1 ? 0.05 : 0.5;
    return std::abs(v) < step ? 0.0 : v;
}
} // namespace

std::string length_text(double mm, UnitSystem units, bool coarse) {
    const int d = decimals(units, coarse);
    const double v = from_internal(mm, Quantity::length, units);
    return fmt::format("{:.{}f} {}", tidy(v, d), d, unit_label(Quantity::length, units));
}

std::string point_text(const Eigen::Vector2d& mm, UnitSystem units) {
    const int d = decimals(units, false);
    const double x = from_internal(mm.x(), Quantity::length, units);
    const double y = from_internal(mm.y(), Quantity::length, units);
    return fmt::format("({:.{}f}, {:.{}f}) {}", tidy(x, d), d, tidy(y, d), d,
                       unit_label(Quantity::length, units));
}

std::string value_text(double internal, Quantity quantity, UnitSystem units) {
    const double v = from_internal(internal, quantity, units);
    const std::string label(unit_label(quantity, units));
    const std::string n = fmt::format("{:.4g}", v == 0 ? 0.0 : v);
    return label.empty() ? n : n + " " + label;
}

} // namespace lapwing::check
