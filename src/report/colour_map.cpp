// Viridis by linear interpolation between ten samples at t = i/9 (the
// ten-colour viridis palette as published with matplotlib and R's viridis
// package, from memory; tests check the end points and that lightness rises
// monotonically, the property that makes the scale readable).
#include "report/colour_map.hpp"

#include <algorithm>
#include <cmath>
#include <fmt/format.h>

namespace lapwing::report {

namespace {
constexpr std::array<Rgb, 10> samples = {{{0x44, 0x01, 0x54},
                                          {0x48, 0x28, 0x78},
                                          {0x3e, 0x4a, 0x89},
                                          {0x31, 0x68, 0x8e},
                                          {0x26, 0x82, 0x8e},
                                          {0x1f, 0x9e, 0x89},
                                          {0x35, 0xb7, 0x79},
                                          {0x6d, 0xcd, 0x59},
                                          {0xb4, 0xde, 0x2c},
                                          {0xfd, 0xe7, 0x25}}};
} // namespace

Rgb viridis(double t) {
    if (!std::isfinite(t)) t = 0;
    t = std::clamp(t, 0.0, 1.0);
    const double x = t * (samples.size() - 1);
    const auto i = std::min(static_cast<size_t>(x), samples.size() - 2);
    const double f = x - static_cast<double>(i);
    const auto mix = [f](int a, int b) { return static_cast<int>(std::lround(a + f * (b - a))); };
    const Rgb& a = samples[i];
    const Rgb& b = samples[i + 1];
    return {mix(a.r, b.r), mix(a.g, b.g), mix(a.b, b.b)};
}

std::string hex(Rgb colour) {
    // "#{:02x}{:02x}{:02x}" by hand: one per contour cell.
    const auto byte = [](int v) { return v >= 0 && v <= 255; };
    if (!byte(colour.r) || !byte(colour.g) || !byte(colour.b))
        return fmt::format("#{:02x}{:02x}{:02x}", colour.r, colour.g, colour.b);
    static constexpr char digits[] = "0123456789abcdef";
    std::string s(7, '#');
    int k = 1;
    for (const unsigned v : {unsigned(colour.r), unsigned(colour.g), unsigned(colour.b)}) {
        s[static_cast<size_t>(k++)] = digits[(v >> 4) & 15];
        s[static_cast<size_t>(k++)] = digits[v & 15];
    }
    return s;
}

} // namespace lapwing::report
