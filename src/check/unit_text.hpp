// Numbers in the words of a check row (where, what, notes) in the
// template's unit system, so that a kip-in template reads inches and ksi
// everywhere rather than a mix with the internal millimetres.
#pragma once

#include "core/units.hpp"

#include <Eigen/Core>
#include <string>

namespace lapwing::check {

// "120.0 mm" or "4.72 in": a tenth of a millimetre, a hundredth of an inch
// (0.25 mm); `coarse` drops one decimal (a position along a weld).
std::string length_text(double mm, UnitSystem units, bool coarse = false);
// "(120.0, 40.0) mm" or "(4.72, 1.57) in".
std::string point_text(const Eigen::Vector2d& mm, UnitSystem units);
// An internal value (N, mm, MPa) in `units`, 4 significant digits, with its
// label: "310.5 MPa", "45.03 ksi", "12.4 kip".
std::string value_text(double internal, Quantity quantity, UnitSystem units);

} // namespace lapwing::check
