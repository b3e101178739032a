// Arithmetic expressions in templates ("2*t + 5", "0.9*Fy", "sqrt(a^2+b^2)"),
// evaluated by muparser (kept inside expression.cpp).
#pragma once

#include <map>
#include <stdexcept>
#include <string>
#include <string_view>
#include <vector>

namespace lapwing::input {

// Why an expression could not be evaluated. `position` is the 1-based
// character of the expression where the problem was found (0 when the whole
// expression is at fault); `unknown_name` is set when a name is not defined.
class ExpressionError : public std::runtime_error {
public:
    ExpressionError(std::string message, int position, std::string unknown_name)
        : std::runtime_error(std::move(message)), position_(position),
          unknown_name_(std::move(unknown_name)) {}
    int position() const { return position_; }
    const std::string& unknown_name() const { return unknown_name_; }

private:
    int position_;
    std::string unknown_name_;
};

// Evaluates `expression` with the given names defined. Operators + - * / ^,
// parentheses, comparison and ?: as in muparser; functions sin cos tan (radians),
// asin acos atan, sqrt, abs, exp, ln, log10, min, max, sum, avg, rint, sign;
// constants pi (also _pi) and _e; plus sind/cosd/tand (degrees) and atan2d(y, x).
// A result that is not finite (division by zero, overflow) is an error.
double evaluate(std::string_view expression, const std::map<std::string, double>& names);

// Names the evaluator already uses (functions and constants), which
// parameters may not take.
const std::vector<std::string>& builtin_names();

} // namespace lapwing::input
