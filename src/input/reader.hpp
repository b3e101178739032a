// Walking the template tree: typed look-ups that record every problem as a
// Diagnostic (and carry on), expressions, unit conversion, unknown keys.
#pragma once

#include "core/error.hpp"
#include "core/units.hpp"
#include "input/document.hpp"
#include "model/connection.hpp"

#include <map>
#include <optional>
#include <set>
#include <string>
#include <utility>
#include <vector>

namespace lapwing::input {

// What the loader knows while it reads: the problems so far, the user's unit
// system, and the names expressions may use (parameters and material values,
// in the user's units).
struct Context {
    std::vector<Diagnostic> problems;
    UnitSystem units = UnitSystem::n_mm;
    std::map<std::string, double> names;
    // Names whose own definition was bad (already reported): expressions
    // using them fail quietly instead of repeating the problem.
    std::set<std::string> failed;

    void report(const Origin& at, const std::string& key_path, const std::string& message);
};

// Allowed range of a number, in the user's units, with the words for messages.
struct Bound {
    double low = -1e300;
    bool low_open = false; // true: must be > low, false: ≥ low
    double high = 1e300;
    bool high_open = false;

    static Bound any() { return {}; }
    static Bound positive() { return {0.0, true}; }
    static Bound non_negative() { return {0.0, false}; }
    static Bound range(double a, double b) { return {a, false, b, false}; }
    static Bound open_range(double a, double b) { return {a, true, b, true}; }
    bool holds(double v) const;
    std::string describe(std::string_view unit) const;
};

// A number typed as TOML or as an expression string, resolved and checked;
// nullopt (with a problem recorded) when it is bad.
std::optional<double> read_number(const Node& node, const std::string& key_path, Quantity quantity,
                                  Bound bound, Context& context);

// One table of the tree. Every key a caller asks for is marked known;
// finish() reports the others as unknown, with a suggestion.
class Table {
public:
    Table(const Node* node, std::string path, Context& context);

    bool present() const { return node_ != nullptr; }
    const std::string& path() const { return path_; }
    const Origin& origin() const;
    std::string path_of(std::string_view key) const;
    Context& context() { return context_; }

    // The raw node of a key (marked known), or nullptr.
    const Node* get(std::string_view key);

    // Missing keys: with a fallback, the fallback (already internal);
    // without, a "missing" problem and nullopt.
    std::optional<double> number(std::string_view key, Quantity quantity, Bound bound,
                                 std::optional<double> fallback = std::nullopt);
    std::optional<int> whole(std::string_view key, int low, int high, std::optional<int> fallback);
    std::optional<std::string> text(std::string_view key, std::optional<std::string> fallback);
    std::optional<bool> flag(std::string_view key, bool fallback);
    std::optional<model::Point> point(std::string_view key, std::optional<model::Point> fallback);
    // A keyword from a fixed list; returns its index in `choices`.
    std::optional<int> choice(std::string_view key, const std::vector<std::string>& choices,
                              std::optional<int> fallback);

    // A sub-table; `required` reports it when missing.
    Table table(std::string_view key, bool required);
    // `[[key]]` entries (or an empty list).
    std::vector<Table> tables(std::string_view key);

    // Reports every key of this table that nobody asked for.
    void finish();

    void report(const Origin& at, const std::string& key_path, const std::string& message) {
        context_.report(at, key_path, message);
    }
    void missing(std::string_view key, const std::string& what);

private:
    const Node* node_;
    std::string path_;
    Context& context_;
    std::set<std::string, std::less<>> known_;
};

// A point written as [x, y] (numbers or expressions), in mm.
std::optional<model::Point> read_point(const Node& node, const std::string& key_path,
                                       Context& context);

} // namespace lapwing::input
