// Parsing --vary and --shard, and laying out the grid.
#include "sweep/grid.hpp"

#include "core/error.hpp"

#include <algorithm>
#include <cctype>
#include <charconv>
#include <cmath>
#include <fmt/format.h>
#include <set>

namespace lapwing::sweep {

namespace {

[[noreturn]] void bad(std::string_view option, std::string_view argument, const std::string& why) {
    Diagnostic d;
    d.key_path = std::string(option);
    d.message = fmt::format("{}: {}", argument, why);
    throw InputError(d);
}

std::string trim(std::string_view s) {
    while (!s.empty() && (s.front() == ' ' || s.front() == '\t')) s.remove_prefix(1);
    while (!s.empty() && (s.back() == ' ' || s.back() == '\t')) s.remove_suffix(1);
    return std::string(s);
}

// A plain decimal number (no expression); nullopt-like flag on failure.
bool to_number(const std::string& text, double& value) {
    if (text.empty()) return false;
    const char* first = text.data();
    const char* last = first + text.size();
    if (*first == '+') ++first;
    const auto [end, ec] = std::from_chars(first, last, value);
    return ec == std::errc() && end == last && std::isfinite(value);
}

// Digits after the decimal point, so that 0.1 steps print as 0.3, not
// 0.30000000000000004.
int decimals(const std::string& text) {
    const auto dot = text.find('.');
    if (dot == std::string::npos) return 0;
    const auto e = text.find_first_of("eE");
    if (e != std::string::npos) return 12; // rare: leave round-off to the %g below
    return static_cast<int>(text.size() - dot - 1);
}

std::string number_text(double v, int n_decimals) {
    if (std::abs(v) < 0.5 * std::pow(10.0, -n_decimals)) v = 0; // no "-0.0"
    if (n_decimals >= 12) return fmt::format("{:.12g}", v);
    return fmt::format("{:.{}f}", v, n_decimals);
}

std::vector<std::string> split(const std::string& s, char sep) {
    std::vector<std::string> out;
    size_t start = 0;
    while (true) {
        const auto at = s.find(sep, start);
        out.push_back(trim(std::string_view(s).substr(start, at - start)));
        if (at == std::string::npos) break;
        start = at + 1;
    }
    return out;
}

} // namespace

Axis parse_axis(std::string_view argument) {
    const auto eq = argument.find('=');
    if (eq == std::string_view::npos)
        bad("--vary", argument, "expected KEY=START:STOP:STEP or KEY=A,B,C, e.g. t=8:30:2");
    Axis axis;
    axis.name = trim(argument.substr(0, eq));
    if (axis.name.empty()) bad("--vary", argument, "the key before '=' is empty");
    axis.key = axis.name.find('.') == std::string::npos && axis.name.find('[') == std::string::npos
                   ? "parameters." + axis.name
                   : axis.name;
    const std::string spec = trim(argument.substr(eq + 1));
    if (spec.empty()) bad("--vary", argument, "no values after '='");

    if (spec.find(':') != std::string::npos) {
        const auto parts = split(spec, ':');
        if (parts.size() != 3) bad("--vary", argument, "a range is START:STOP:STEP, e.g. 8:30:2");
        double start = 0, stop = 0, step = 0;
        static constexpr const char* names[] = {"start", "stop", "step"};
        double* slots[] = {&start, &stop, &step};
        for (int i = 0; i < 3; ++i)
            if (!to_number(parts[static_cast<size_t>(i)], *slots[i]))
                bad("--vary", argument,
                    fmt::format("the {} \"{}\" is not a number", names[i],
                                parts[static_cast<size_t>(i)]));
        if (!(step > 0)) bad("--vary", argument, "the step must be > 0");
        if (stop < start) bad("--vary", argument, "the stop is below the start");
        // The stop is included when it lies on the grid (within round-off).
        const double span = (stop - start) / step;
        if (span + 1 > max_values)
            bad("--vary", argument, fmt::format("more than {} values", max_values));
        const int n = static_cast<int>(std::floor(span + 1e-9)) + 1;
        const int d = std::max({decimals(parts[0]), decimals(parts[2])});
        for (int i = 0; i < n; ++i) {
            double v = start + i * step;
            if (d < 12) v = std::round(v * std::pow(10.0, d)) / std::pow(10.0, d);
            axis.values.push_back(v);
            axis.texts.push_back(number_text(v, d));
        }
    } else {
        for (const std::string& item : split(spec, ',')) {
            double v = 0;
            if (!to_number(item, v))
                bad("--vary", argument,
                    fmt::format("\"{}\" is not a number (list values are plain numbers)", item));
            axis.values.push_back(v);
            axis.texts.push_back(item.starts_with('+') ? item.substr(1) : item);
        }
        if (axis.values.size() > static_cast<size_t>(max_values))
            bad("--vary", argument, fmt::format("more than {} values", max_values));
    }
    return axis;
}

std::vector<Variant> make_grid(const std::vector<Axis>& axes) {
    std::set<std::string> keys;
    long n = axes.empty() ? 0 : 1;
    for (const Axis& a : axes) {
        if (!keys.insert(a.key).second)
            bad("--vary", a.name, "this key is varied twice: give its values in one --vary");
        n *= static_cast<long>(a.values.size());
        if (n > max_values)
            bad("--vary", a.name, fmt::format("the grid has more than {} variants", max_values));
    }
    std::vector<Variant> grid(static_cast<size_t>(n));
    for (long i = 0; i < n; ++i) {
        Variant& v = grid[static_cast<size_t>(i)];
        v.index = static_cast<int>(i);
        v.at.resize(axes.size());
        long rest = i;
        for (size_t k = axes.size(); k-- > 0;) {
            const long m = static_cast<long>(axes[k].values.size());
            v.at[k] = static_cast<int>(rest % m);
            rest /= m;
        }
        for (size_t k = 0; k < axes.size(); ++k) {
            const auto j = static_cast<size_t>(v.at[k]);
            v.values.push_back(axes[k].values[j]);
            v.sets.push_back(axes[k].key + "=" + axes[k].texts[j]);
        }
    }
    return grid;
}

Shard parse_shard(std::string_view argument) {
    const auto slash = argument.find('/');
    Shard s;
    if (slash == std::string_view::npos)
        bad("--shard", argument, "expected I/N, e.g. 3/8 for the third of eight parts");
    const std::string a = trim(argument.substr(0, slash)), b = trim(argument.substr(slash + 1));
    const auto [pa, ea] = std::from_chars(a.data(), a.data() + a.size(), s.part);
    const auto [pb, eb] = std::from_chars(b.data(), b.data() + b.size(), s.of);
    if (ea != std::errc() || eb != std::errc() || pa != a.data() + a.size() ||
        pb != b.data() + b.size() || a.empty() || b.empty())
        bad("--shard", argument, "I and N must be whole numbers, e.g. 3/8");
    if (s.of < 1 || s.part < 1 || s.part > s.of) bad("--shard", argument, "needs 1 ≤ I ≤ N");
    return s;
}

std::vector<Variant> shard_of(const std::vector<Variant>& grid, Shard shard) {
    std::vector<Variant> out;
    for (const Variant& v : grid)
        if (v.index % shard.of == shard.part - 1) out.push_back(v);
    return out;
}

std::string variant_folder_name(const std::vector<Axis>& axes, const Variant& variant,
                                size_t grid_size) {
    const auto safe = [](std::string_view text) {
        std::string out(text);
        for (char& ch : out)
            if (!std::isalnum(static_cast<unsigned char>(ch)) && ch != '.' && ch != '+' &&
                ch != '-')
                ch = '_';
        return out;
    };
    const size_t width = std::to_string(std::max<size_t>(grid_size, 1)).size();
    std::string number = std::to_string(variant.index + 1);
    std::string out = std::string(width > number.size() ? width - number.size() : 0, '0') + number;
    for (size_t k = 0; k < axes.size(); ++k)
        out += "_" + safe(axes[k].name) + "-" +
               safe(axes[k].texts[static_cast<size_t>(variant.at[k])]);
    return out;
}

} // namespace lapwing::sweep
