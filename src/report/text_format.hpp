// Small text helpers shared by the renderers: HTML/XML escaping, CSV fields,
// and numbers in the user's unit system with their unit label.
#pragma once

#include "core/units.hpp"

#include <string>
#include <string_view>

namespace lapwing::report {

// &, <, >, " and ' escaped for HTML and XML text and attributes.
std::string escape(std::string_view text);

// An internal value (N, mm, MPa) shown in `units`, 4 significant digits,
// with its unit label: "1.525 kN/mm".
std::string with_unit(double internal_value, Quantity quantity, UnitSystem units);
// The same number without the label.
std::string number(double internal_value, Quantity quantity, UnitSystem units);
// The label alone, e.g. "MPa"; empty for Quantity::none.
std::string unit(Quantity quantity, UnitSystem units);

// One CSV field (RFC 4180), quoted when it holds a comma, a quote or a line
// end, with its quotes doubled.
std::string csv_field(std::string_view text);

} // namespace lapwing::report
