// The Whitmore construction alone: width g + 2 L tan 30° from the bolt
// centres, for the published example and for rotated and staggered groups.
#include "check/whitmore.hpp"
#include "support/approx.hpp"

#include <cmath>
#include <doctest/doctest.h>
#include <numbers>

using Eigen::Vector2d;
using lapwing::check::whitmore_line;
using lapwing::test::approx;

namespace {
constexpr double inch = 25.4; // mm

// rows × lines at pitch p and gauge g, rows along `angle_deg` from `origin`.
std::vector<Vector2d> grid(int rows, int lines, double p, double g, double angle_deg,
                           Vector2d origin = {0, 0}) {
    const double a = angle_deg * std::numbers::pi / 180.0;
    const Vector2d along(std::cos(a), std::sin(a)), left(-along.y(), along.x());
    std::vector<Vector2d> out;
    for (int r = 0; r < rows; ++r)
        for (int l = 0; l < lines; ++l) out.push_back(origin + r * p * along + l * g * left);
    return out;
}
} // namespace

TEST_CASE(
    "Whitmore width: g = 3 in, 4 rows at 3 in gives Lw = 13.392 in (REFERENCES, Whitmore 1952)") {
    const auto w = whitmore_line(grid(4, 2, 3 * inch, 3 * inch, 0.0), 0.0);
    CHECK(w.gauge == approx(3 * inch));
    CHECK(w.length == approx(9 * inch));
    // The published figure has three decimals: ±0.0005 in.
    CHECK(std::abs(w.width / inch - 13.392) <= 5e-4);
    // The line lies at the last row (nearest the joint), centred on the lines.
    CHECK((w.centre - Vector2d(0, 1.5 * inch)).norm() <= 1e-9);
    CHECK((w.to - w.from).norm() == approx(w.width));
}

TEST_CASE("Whitmore line of a rotated group: same width, at the row nearest the joint") {
    // The group's rows run towards the joint here (angle 217° against the
    // member's 37°): the first row is still the one farthest out.
    const double member = 37.0;
    const Vector2d origin(120, -40);
    const auto bolts = grid(3, 3, 70, 60, member + 180.0, origin);
    const auto w = whitmore_line(bolts, member);
    const double expected = 120 + 2 * 140 * std::tan(std::numbers::pi / 6); // g = 2·60, L = 2·70
    CHECK(w.width == approx(expected));
    // Nearest the joint is the last row of the list (farthest along 217°):
    // its middle bolt is the centre.
    CHECK((w.centre - bolts[7]).norm() <= 1e-9);
    // The line is normal to the member axis.
    const double a = member * std::numbers::pi / 180.0;
    CHECK(std::abs((w.to - w.from).dot(Vector2d(std::cos(a), std::sin(a)))) <= 1e-9);
}

TEST_CASE("Whitmore line with one row is the gauge of that row, with one bolt it has no width") {
    const auto row = whitmore_line(grid(1, 3, 70, 50, 0.0), 0.0);
    CHECK(row.length == 0.0);
    CHECK(row.width == approx(100.0));
    const auto single = whitmore_line({Vector2d(5, 5)}, 90.0);
    CHECK(single.width == 0.0);
}

TEST_CASE("Whitmore spread starts at the first row's own outer bolts (staggered group)") {
    // Lines at y = 0, 40, 80; the middle line is shifted half a pitch out, so
    // the first row (x = 150) holds only the middle bolt: g = 0 there.
    std::vector<Vector2d> bolts{{0, 0}, {100, 0}, {50, 40}, {150, 40}, {0, 80}, {100, 80}};
    const auto w = whitmore_line(bolts, 0.0);
    CHECK(w.gauge == 0.0);
    CHECK(w.length == approx(150.0));
    CHECK(w.width == approx(2 * 150 * std::tan(std::numbers::pi / 6)));
    CHECK((w.centre - Vector2d(0, 40)).norm() <= 1e-9);
}
