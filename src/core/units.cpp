// Names, labels and factors of the unit systems.
#include "core/units.hpp"

namespace lapwing {

std::string_view name(UnitSystem system) {
    switch (system) {
    case UnitSystem::n_mm:
        return "N-mm";
    case UnitSystem::kn_mm:
        return "kN-mm";
    case UnitSystem::kip_in:
        return "kip-in";
    }
    return "?";
}

std::optional<UnitSystem> parse_unit_system(std::string_view text) {
    for (UnitSystem s : {UnitSystem::n_mm, UnitSystem::kn_mm, UnitSystem::kip_in}) {
        if (text == name(s)) return s;
    }
    return std::nullopt;
}

std::vector<std::string> unit_system_names() {
    return {"N-mm", "kN-mm", "kip-in"};
}

std::string_view unit_label(Quantity quantity, UnitSystem system) {
    const int s = static_cast<int>(system);
    switch (quantity) {
    case Quantity::none:
        return "";
    case Quantity::length:
        return s == 2 ? "in" : "mm";
    case Quantity::force:
        return s == 0 ? "N" : s == 1 ? "kN" : "kip";
    case Quantity::stress:
        return s == 2 ? "ksi" : "MPa";
    case Quantity::moment:
        return s == 0 ? "N·mm" : s == 1 ? "kN·mm" : "kip·in";
    case Quantity::force_per_length:
        return s == 0 ? "N/mm" : s == 1 ? "kN/mm" : "kip/in";
    }
    return "";
}

double internal_per_unit(Quantity quantity, UnitSystem system) {
    double length = 1.0, force = 1.0;
    if (system == UnitSystem::kn_mm) force = 1000.0;
    if (system == UnitSystem::kip_in) {
        length = mm_per_inch;
        force = newton_per_kip;
    }
    switch (quantity) {
    case Quantity::none:
        return 1.0;
    case Quantity::length:
        return length;
    case Quantity::force:
        return force;
    // kN-mm shows stresses in MPa (N/mm²), not kN/mm², as engineers read them.
    case Quantity::stress:
        return system == UnitSystem::kn_mm ? 1.0 : force / (length * length);
    case Quantity::moment:
        return force * length;
    case Quantity::force_per_length:
        return force / length;
    }
    return 1.0;
}

} // namespace lapwing
