// Unit systems the user picks by name, and the conversions between them and
// the internal N·mm·MPa system. Conversion happens only at input and output.
#pragma once

#include <optional>
#include <string>
#include <string_view>
#include <vector>

namespace lapwing {

// Exact factors from NIST SP 811 (2008), appendix B: 1 in = 25.4 mm exactly,
// 1 lbf = 4.448 221 615 260 5 N exactly, so 1 kip = 1000 lbf.
inline constexpr double mm_per_inch = 25.4;
inline constexpr double newton_per_lbf = 4.4482216152605;
inline constexpr double newton_per_kip = 1000.0 * newton_per_lbf;
inline constexpr double mpa_per_ksi = newton_per_kip / (mm_per_inch * mm_per_inch);

// A consistent set of units for everything the user types and reads.
enum class UnitSystem {
    n_mm,   // N, mm, MPa
    kn_mm,  // kN, mm; stresses and moduli shown in MPa
    kip_in, // kip, in, ksi
};

// What a number measures; decides its conversion factor.
enum class Quantity {
    none,             // a pure number (ratios, factors, angles in degrees)
    length,           // mm | mm | in
    force,            // N | kN | kip
    stress,           // MPa | MPa | ksi (also moduli)
    moment,           // N·mm | kN·mm | kip·in
    force_per_length, // N/mm | kN/mm | kip/in (weld force, edge traction, spring stiffness)
};

// "N-mm", "kN-mm", "kip-in": the names the template's [units] system takes.
std::string_view name(UnitSystem system);
std::optional<UnitSystem> parse_unit_system(std::string_view text);
std::vector<std::string> unit_system_names();

// Label of a quantity in a system, e.g. "kN", "MPa", "kip·in"; empty for none.
std::string_view unit_label(Quantity quantity, UnitSystem system);

// Internal value (N, mm, MPa) of one unit of `quantity` in `system`.
double internal_per_unit(Quantity quantity, UnitSystem system);

inline double to_internal(double value, Quantity quantity, UnitSystem system) {
    return value * internal_per_unit(quantity, system);
}
inline double from_internal(double value, Quantity quantity, UnitSystem system) {
    return value / internal_per_unit(quantity, system);
}

} // namespace lapwing
