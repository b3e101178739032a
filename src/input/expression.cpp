// muparser behind a small interface: defines the names, adds degree-based
// trigonometry, and turns muparser's errors into ExpressionError.
#include "input/expression.hpp"

#include <cmath>
#include <muParser.h>
#include <numbers>

namespace lapwing::input {

namespace {

constexpr double degree = std::numbers::pi / 180.0;

double sind(double a) {
    return std::sin(a * degree);
}
double cosd(double a) {
    return std::cos(a * degree);
}
double tand(double a) {
    return std::tan(a * degree);
}
double atan2d(double y, double x) {
    return std::atan2(y, x) / degree;
}

} // namespace

const std::vector<std::string>& builtin_names() {
    static const std::vector<std::string> names{
        "sin",  "cos",   "tan",   "asin",  "acos",   "atan",  "sinh", "cosh",
        "tanh", "asinh", "acosh", "atanh", "log2",   "log10", "log",  "ln",
        "exp",  "sqrt",  "sign",  "rint",  "abs",    "min",   "max",  "sum",
        "avg",  "sind",  "cosd",  "tand",  "atan2d", "pi",    "_pi",  "_e"};
    return names;
}

double evaluate(std::string_view expression, const std::map<std::string, double>& names) {
    mu::Parser parser;
    double result = 0.0;
    try {
        // muparser 2.3's own _pi and _e are short of double precision
        // (sin(_pi/6) is off by 1e-13): define them exactly, and plain pi too.
        parser.DefineConst("_pi", std::numbers::pi);
        parser.DefineConst("pi", std::numbers::pi);
        parser.DefineConst("_e", std::numbers::e);
        parser.DefineFun("sind", sind);
        parser.DefineFun("cosd", cosd);
        parser.DefineFun("tand", tand);
        parser.DefineFun("atan2d", atan2d);
        for (const auto& [name, value] : names) parser.DefineConst(name, value);
        parser.SetExpr(std::string(expression));
        result = parser.Eval();
    } catch (const mu::Parser::exception_type& e) {
        std::string unknown;
        std::string message = e.GetMsg();
        if (e.GetCode() == mu::ecUNASSIGNABLE_TOKEN) {
            unknown = e.GetToken();
            message = "unknown name \"" + unknown + "\"";
        }
        const int position = e.GetPos() >= 0 ? e.GetPos() + 1 : 0;
        throw ExpressionError(message, position, unknown);
    }
    if (!std::isfinite(result)) {
        throw ExpressionError(std::isnan(result)
                                  ? "the result is not a number (e.g. sqrt of a negative)"
                                  : "the result is infinite (division by zero or overflow)",
                              0, "");
    }
    return result;
}

} // namespace lapwing::input
