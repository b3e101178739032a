// Consistent edge loads: resultants and the classical nodal shares (Cook,
// Malkus, Plesha & Witt 2002, §3.9: a uniform traction on a 3-node edge gives
// 1/6, 2/3, 1/6 of the total; on a 2-node edge 1/2, 1/2).
#include "fe/edge_load.hpp"
#include "support/approx.hpp"
#include "support/fe_models.hpp"

#include <cmath>
#include <doctest/doctest.h>
#include <numbers>

using namespace lapwing::fe;

TEST_CASE(
    "a uniform traction on a straight edge splits 1/2-1/2 (linear) and 1/6-2/3-1/6 (quadratic)") {
    for (ElementKind kind : lapwing::test::all_kinds) {
        const Model m = lapwing::test::promote({{0, 0}, {4, 0}, {4, 2}, {0, 2}}, {{0, 1, 2, 3}},
                                               kind, {1.0, 0.3}, 2.0);
        const auto f = edge_load_forces(
            m, {0, 1, TractionFrame::global, {0, 3.0}, {0, 3.0}}); // right edge, length 2
        const double total = 3.0 * 2.0 * 2.0;
        double sum = 0;
        for (const auto& [dof, v] : f) sum += v;
        CHECK(sum == lapwing::test::approx(total, 1e-14));
        if (is_quadratic(kind)) {
            CHECK(f[1].second == lapwing::test::approx(total / 6));
            CHECK(f[3].second == lapwing::test::approx(2 * total / 3));
            CHECK(f[5].second == lapwing::test::approx(total / 6));
        } else {
            CHECK(f[1].second == lapwing::test::approx(total / 2));
        }
    }
}

TEST_CASE("a linearly varying traction gives the triangle-load shares 1/3, 2/3 on a linear edge") {
    const Model m = lapwing::test::promote({{0, 0}, {3, 0}, {3, 1}, {0, 1}}, {{0, 1, 2, 3}},
                                           ElementKind::Q4, {1.0, 0.3}, 1.0);
    // Bottom edge (0,0)→(3,0), traction 0 at the start rising to 6: resultant 9.
    const auto f = edge_load_forces(m, {0, 0, TractionFrame::global, {0, 0}, {0, 6.0}});
    CHECK(f[1].second == lapwing::test::approx(3.0));
    CHECK(f[3].second == lapwing::test::approx(6.0));
}

TEST_CASE("pressure on a curved quadratic edge has the resultant p x chord x t, pushing inwards") {
    // A half annulus r ∈ [1, 2], θ ∈ [0, π], as one Q9 whose inner edge is the
    // arc r = 1; normal traction −p (pressure) on the inner edge, outward
    // normal pointing towards the centre. Resultant: p · 2r · t along +y
    // (elementary: pressure on a semicircle).
    Model m;
    m.materials = {{1.0, 0.3}};
    auto polar = [](double r, double th) { return Vector2(r * std::cos(th), r * std::sin(th)); };
    const double pi = std::numbers::pi;
    // s along θ from π to 0 so the element runs counter-clockwise; t radial 1→2.
    const auto grid = make_structured_grid(
        ElementKind::Q9, 1, 1, [&](double s, double t) { return polar(2.0 - t, pi * s); });
    m = model_from_grid(grid, {1.0, 0.3}, 0.5);
    // Edge 0 (t = 0) is r = 2, edge 2 (t = 1) is r = 1. Pressure 4 on r = 1.
    const auto f =
        edge_load_forces(m, {0, 2, TractionFrame::normal_tangential, {-4.0, 0}, {-4.0, 0}});
    Vector2 sum(0, 0);
    for (const auto& [dof, v] : f) sum(dof % 2) += v;
    // A uniform pressure on any curve has the resultant p × chord × t (the
    // integral of the normal is the rotated chord), so although one 3-node
    // edge only approximates the half circle, the resultant is exact.
    CHECK(std::abs(sum.x()) < 1e-12);
    CHECK(sum.y() == lapwing::test::approx(4.0 * 2.0 * 0.5, 1e-12));
}

TEST_CASE("a traction field equal to a linear traction gives the same nodal forces") {
    const Model m = lapwing::test::promote({{0, 0}, {3, 0}, {3, 1}, {0, 1}}, {{0, 1, 2, 3}},
                                           ElementKind::Q8, {1.0, 0.3}, 2.0);
    const auto linear = edge_load_forces(m, {0, 0, TractionFrame::global, {1.0, 0}, {1.0, 6.0}});
    const auto field = edge_traction_forces(
        m, 0, 0, [](const Vector2& x, const Vector2&) { return Vector2(1.0, 2.0 * x.x()); });
    REQUIRE(linear.size() == field.size());
    for (size_t i = 0; i < linear.size(); ++i) {
        CHECK(linear[i].first == field[i].first);
        CHECK(std::abs(linear[i].second - field[i].second) < 1e-12);
    }
}
