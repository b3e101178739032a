// Expressions: operator precedence and associativity as in ordinary
// arithmetic, the functions offered, parameter references and errors.
#include "input/expression.hpp"

#include <cmath>
#include <doctest/doctest.h>

using lapwing::input::evaluate;
using lapwing::input::ExpressionError;

TEST_CASE("precedence and associativity follow ordinary arithmetic") {
    CHECK(evaluate("2 + 3*4", {}) == 14.0);
    CHECK(evaluate("(2 + 3)*4", {}) == 20.0);
    CHECK(evaluate("2*3^2", {}) == 18.0);     // power binds tighter than *
    CHECK(evaluate("10 - 4 - 3", {}) == 3.0); // left to right
    CHECK(evaluate("12/3/2", {}) == 2.0);
    CHECK(evaluate("1.5e2 + 0.5", {}) == 150.5);
}

TEST_CASE("functions: roots, degrees-based trigonometry, min and max") {
    CHECK(evaluate("sqrt(16)", {}) == 4.0);
    // Exact values of the trigonometric functions at 30°, 60°, 45° (tolerance: a few ulp).
    CHECK(evaluate("sind(30)", {}) == doctest::Approx(0.5).epsilon(1e-15));
    CHECK(evaluate("cosd(60)", {}) == doctest::Approx(0.5).epsilon(1e-15));
    CHECK(evaluate("tand(45)", {}) == doctest::Approx(1.0).epsilon(1e-15));
    CHECK(evaluate("atan2d(1, 1)", {}) == doctest::Approx(45.0).epsilon(1e-15));
    CHECK(evaluate("sin(_pi/6)", {}) == doctest::Approx(0.5).epsilon(1e-15));
    CHECK(evaluate("min(3, 1, 2)", {}) == 1.0);
    CHECK(evaluate("max(3, 1, 2)", {}) == 3.0);
    CHECK(evaluate("abs(-2.5)", {}) == 2.5);
}

TEST_CASE("names given to the evaluator are usable, e.g. parameters and Fy") {
    const std::map<std::string, double> names{{"t", 10.0}, {"Fy", 355.0}, {"gauge_2", 80.0}};
    CHECK(evaluate("2*t + 1", names) == 21.0);
    CHECK(evaluate("0.9*Fy", names) == doctest::Approx(319.5).epsilon(1e-15));
    CHECK(evaluate("gauge_2/2", names) == 40.0);
}

TEST_CASE("an unknown name is an error that names it and where it starts") {
    try {
        evaluate("2*tt + 1", {{"t", 10.0}});
        FAIL("no error");
    } catch (const ExpressionError& e) {
        CHECK(e.unknown_name() == "tt");
        CHECK(e.position() == 3); // 1-based: "2*" then "tt"
    }
}

TEST_CASE("division by zero, a negative root and bad syntax are errors") {
    CHECK_THROWS_AS(evaluate("1/0", {}), ExpressionError);
    CHECK_THROWS_AS(evaluate("sqrt(-1)", {}), ExpressionError);
    CHECK_THROWS_AS(evaluate("2*(3", {}), ExpressionError);
    CHECK_THROWS_AS(evaluate("2 +", {}), ExpressionError);
    CHECK_THROWS_AS(evaluate("", {}), ExpressionError);
    CHECK_THROWS_WITH_AS(evaluate("1/0", {}), doctest::Contains("division by zero"),
                         ExpressionError);
}
