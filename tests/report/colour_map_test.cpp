// The contour colour scale against the published viridis end colours
// (#440154 and #fde725, matplotlib's viridis, from memory) and the property
// that makes it perceptually ordered: lightness rises monotonically from
// one end to the other (CIE L* from sRGB, IEC 61966-2-1 and CIE 15:2004).
#include "report/colour_map.hpp"
#include "report/svg_canvas.hpp"

#include <cmath>
#include <doctest/doctest.h>
#include <fmt/format.h>
#include <vector>

using namespace lapwing::report;

namespace {

double lightness(Rgb c) {
    const auto linear = [](int v) {
        const double s = v / 255.0;
        return s <= 0.04045 ? s / 12.92 : std::pow((s + 0.055) / 1.055, 2.4);
    };
    const double Y = 0.2126 * linear(c.r) + 0.7152 * linear(c.g) + 0.0722 * linear(c.b);
    return Y > 216.0 / 24389 ? 116 * std::cbrt(Y) - 16 : Y * 24389.0 / 27;
}

} // namespace

TEST_CASE("colour map: viridis end points and clamping") {
    CHECK(hex(viridis(0)) == "#440154");
    CHECK(hex(viridis(1)) == "#fde725");
    CHECK(hex(viridis(-3)) == "#440154");
    CHECK(hex(viridis(7)) == "#fde725");
    CHECK(hex(viridis(std::nan(""))) == "#440154");
}

TEST_CASE("colour map: lightness rises monotonically") {
    double previous = -1;
    for (int i = 0; i <= 200; ++i) {
        const double L = lightness(viridis(i / 200.0));
        CHECK(L > previous - 0.2); // 0.2 L*: rounding of 8-bit channels
        previous = L;
    }
    // Dark purple to bright yellow: L* about 16 to 92 (CIE L* of the end
    // colours, computed by the function above from their sRGB values).
    CHECK(lightness(viridis(0)) < 20);
    CHECK(lightness(viridis(1)) > 85);
}

TEST_CASE("svg numbers: append_fixed1 writes what fmt's {:.1f} writes") {
    // Reference: fmt's own "{:.1f}" (correctly rounded from the exact binary
    // value, ties to even, as printf's %.1f) on ties, near-ties, signs and
    // a sweep of ordinary pixel coordinates.
    std::vector<double> values = {0.0,  -0.0,  0.25,   0.35,    -0.25, 0.05,   -0.05, 0.15,
                                  2.5,  1.45,  -1.45,  0.95,    9.95,  99.95,  -0.04, 1e13,
                                  1e15, -1e16, 123.45, 760.049, 0.049, -0.051, 5e-324};
    for (int k = 0; k <= 200000; ++k) values.push_back(-1000.0 + k * 0.01);
    for (int k = 0; k <= 20000; ++k) values.push_back(k * 0.05), values.push_back(-k * 0.05);
    for (const double v : values) {
        std::string mine;
        lapwing::report::append_fixed1(mine, v);
        REQUIRE_MESSAGE(mine == fmt::format("{:.1f}", v), v);
    }
}
