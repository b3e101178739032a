// HTML escaping and unit-aware number formatting for the calc sheet.
#include "report/text_format.hpp"

#include <fmt/format.h>

namespace lapwing::report {

std::string escape(std::string_view text) {
    std::string out;
    out.reserve(text.size());
    for (char c : text) {
        switch (c) {
        case '&':
            out += "&amp;";
            break;
        case '<':
            out += "&lt;";
            break;
        case '>':
            out += "&gt;";
            break;
        case '"':
            out += "&quot;";
            break;
        case '\'':
            out += "&#39;";
            break;
        default:
            out += c;
        }
    }
    return out;
}

std::string number(double internal_value, Quantity quantity, UnitSystem units) {
    const double v = from_internal(internal_value, quantity, units);
    return fmt::format("{:.4g}", v == 0 ? 0.0 : v); // no "-0"
}

std::string unit(Quantity quantity, UnitSystem units) {
    return std::string(unit_label(quantity, units));
}

std::string with_unit(double internal_value, Quantity quantity, UnitSystem units) {
    const std::string label = unit(quantity, units);
    const std::string n = number(internal_value, quantity, units);
    return label.empty() ? n : n + " " + label;
}

std::string csv_field(std::string_view text) {
    if (text.find_first_of(",\"\n\r") == std::string_view::npos) return std::string(text);
    std::string out = "\"";
    for (char ch : text) {
        if (ch == '"') out += '"';
        out += ch;
    }
    return out + "\"";
}

} // namespace lapwing::report
