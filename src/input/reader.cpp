// Typed look-ups over the template tree; every problem is recorded and the
// reading carries on, so one run reports them all.
#include "input/reader.hpp"

#include "input/expression.hpp"
#include "input/suggest.hpp"

#include <cmath>
#include <fmt/format.h>
#include <vector>

namespace lapwing::input {

void Context::report(const Origin& at, const std::string& key_path, const std::string& message) {
    problems.push_back(Diagnostic{at.file, at.line, at.column, key_path, message, at.source_line});
}

bool Bound::holds(double v) const {
    const bool low_ok = low_open ? v > low : v >= low;
    const bool high_ok = high_open ? v < high : v <= high;
    return low_ok && high_ok;
}

std::string Bound::describe(std::string_view unit) const {
    const std::string u = unit.empty() ? std::string() : fmt::format(" {}", unit);
    const bool has_low = low > -1e299, has_high = high < 1e299;
    if (has_low && has_high) {
        return fmt::format("must be from {} to {}{}{}", low, high, u,
                           low_open || high_open ? " (ends excluded)" : "");
    }
    if (has_low) return fmt::format("must be {} {}{}", low_open ? ">" : "≥", low, u);
    if (has_high) return fmt::format("must be {} {}{}", high_open ? "<" : "≤", high, u);
    return "";
}

namespace {

// Names first; functions only when no name is close.
std::string suggestion(const std::string& unknown, const Context& context) {
    std::vector<std::string> names;
    for (const auto& [name, value] : context.names) names.push_back(name);
    if (std::string hint = did_you_mean(unknown, names); !hint.empty()) return hint;
    return did_you_mean(unknown, builtin_names());
}

} // namespace

std::optional<double> read_number(const Node& node, const std::string& key_path, Quantity quantity,
                                  Bound bound, Context& context) {
    double value = 0.0;
    std::string shown = show(node);
    if (node.is_number()) {
        value = node.number();
        if (!std::isfinite(value)) {
            context.report(node.origin, key_path, "= " + shown + ": must be a finite number");
            return std::nullopt;
        }
    } else if (node.kind == Node::Kind::string) {
        try {
            value = evaluate(node.text, context.names);
        } catch (const ExpressionError& e) {
            if (context.failed.count(e.unknown_name()))
                return std::nullopt; // reported at its definition
            std::string message = fmt::format("= {}: expression error", shown);
            if (e.position() > 0) message += fmt::format(" at character {}", e.position());
            message += ": ";
            message += e.what();
            if (!e.unknown_name().empty()) {
                message += suggestion(e.unknown_name(), context);
                message += "; names defined: parameters, E, nu, Fy, Fu";
            }
            context.report(node.origin, key_path, message);
            return std::nullopt;
        }
        shown += fmt::format(" (= {})", value);
    } else {
        context.report(node.origin, key_path,
                       fmt::format("= {}: must be a number, or an expression in quotes, not {}",
                                   shown, with_article(node.kind)));
        return std::nullopt;
    }
    // Every bound stops at ±1e300 so that unit conversion cannot overflow;
    // a number past it gets its own words rather than an empty range.
    if (std::abs(value) > 1e300) {
        context.report(node.origin, key_path,
                       fmt::format("= {}: is out of range (at most 1e300 in size)", shown));
        return std::nullopt;
    }
    if (!bound.holds(value)) {
        context.report(
            node.origin, key_path,
            fmt::format("= {}: {}", shown, bound.describe(unit_label(quantity, context.units))));
        return std::nullopt;
    }
    return to_internal(value, quantity, context.units);
}

std::optional<model::Point> read_point(const Node& node, const std::string& key_path,
                                       Context& context) {
    if (node.kind != Node::Kind::array || node.items.size() != 2) {
        context.report(node.origin, key_path,
                       fmt::format("= {}: must be a point [x, y] of two numbers", show(node)));
        return std::nullopt;
    }
    const auto x =
        read_number(node.items[0], key_path + "[0]", Quantity::length, Bound::any(), context);
    const auto y =
        read_number(node.items[1], key_path + "[1]", Quantity::length, Bound::any(), context);
    if (!x || !y) return std::nullopt;
    return model::Point{*x, *y};
}

Table::Table(const Node* node, std::string path, Context& context)
    : node_(node), path_(std::move(path)), context_(context) {}

const Origin& Table::origin() const {
    static const Origin nowhere;
    return node_ ? node_->origin : nowhere;
}

std::string Table::path_of(std::string_view key) const {
    return path_.empty() ? std::string(key) : path_ + "." + std::string(key);
}

const Node* Table::get(std::string_view key) {
    known_.emplace(key);
    return node_ ? node_->find(key) : nullptr;
}

void Table::missing(std::string_view key, const std::string& what) {
    report(origin(), path_of(key), "is missing: " + what);
}

std::optional<double> Table::number(std::string_view key, Quantity quantity, Bound bound,
                                    std::optional<double> fallback) {
    const Node* n = get(key);
    if (!n) {
        if (!fallback) {
            const std::string rule = bound.describe(unit_label(quantity, context_.units));
            missing(key, rule.empty() ? "give a number" : fmt::format("give a number ({})", rule));
        }
        return fallback;
    }
    return read_number(*n, path_of(key), quantity, bound, context_);
}

std::optional<int> Table::whole(std::string_view key, int low, int high,
                                std::optional<int> fallback) {
    const Node* n = get(key);
    if (!n) {
        if (!fallback) missing(key, fmt::format("a whole number from {} to {}", low, high));
        return fallback;
    }
    std::optional<double> v;
    if (n->kind == Node::Kind::floating) {
        report(n->origin, path_of(key),
               fmt::format("= {}: must be a whole number written without a decimal point (e.g. {})",
                           show(*n), static_cast<long long>(std::lround(n->floating))));
        return std::nullopt;
    }
    v = read_number(*n, path_of(key), Quantity::none, Bound::range(low, high), context_);
    if (!v) return std::nullopt;
    if (std::abs(*v - std::round(*v)) > 1e-9) {
        report(n->origin, path_of(key),
               fmt::format("= {} (= {}): must be a whole number", show(*n), *v));
        return std::nullopt;
    }
    return static_cast<int>(std::lround(*v));
}

std::optional<std::string> Table::text(std::string_view key, std::optional<std::string> fallback) {
    const Node* n = get(key);
    if (!n) {
        if (!fallback) missing(key, "a text in quotes is required");
        return fallback;
    }
    if (n->kind != Node::Kind::string) {
        report(
            n->origin, path_of(key),
            fmt::format("= {}: must be a text in quotes, not {}", show(*n), with_article(n->kind)));
        return std::nullopt;
    }
    return n->text;
}

std::optional<bool> Table::flag(std::string_view key, bool fallback) {
    const Node* n = get(key);
    if (!n) return fallback;
    if (n->kind != Node::Kind::boolean) {
        report(n->origin, path_of(key), fmt::format("= {}: must be true or false", show(*n)));
        return std::nullopt;
    }
    return n->boolean;
}

std::optional<model::Point> Table::point(std::string_view key,
                                         std::optional<model::Point> fallback) {
    const Node* n = get(key);
    if (!n) {
        if (!fallback) missing(key, "a point [x, y] is required");
        return fallback;
    }
    return read_point(*n, path_of(key), context_);
}

std::optional<int> Table::choice(std::string_view key, const std::vector<std::string>& choices,
                                 std::optional<int> fallback) {
    const Node* n = get(key);
    if (!n) {
        if (!fallback) missing(key, "one of " + one_of(choices));
        return fallback;
    }
    if (n->kind == Node::Kind::string) {
        for (size_t i = 0; i < choices.size(); ++i) {
            if (n->text == choices[i]) return static_cast<int>(i);
        }
    }
    report(n->origin, path_of(key),
           fmt::format("= {}: must be {}{}", show(*n), one_of(choices),
                       n->kind == Node::Kind::string ? did_you_mean(n->text, choices) : ""));
    return std::nullopt;
}

Table Table::table(std::string_view key, bool required) {
    const Node* n = get(key);
    if (!n) {
        if (required) {
            report(origin(), path_of(key),
                   fmt::format("is missing: the table [{}] is required", path_of(key)));
        }
        return Table(nullptr, path_of(key), context_);
    }
    if (n->kind != Node::Kind::table) {
        report(n->origin, path_of(key), fmt::format("= {}: must be a table", show(*n)));
        return Table(nullptr, path_of(key), context_);
    }
    return Table(n, path_of(key), context_);
}

std::vector<Table> Table::tables(std::string_view key) {
    std::vector<Table> out;
    const Node* n = get(key);
    if (!n) return out;
    if (n->kind != Node::Kind::array) {
        report(
            n->origin, path_of(key),
            fmt::format("= {}: must be a list of tables, written [[{}]]", show(*n), path_of(key)));
        return out;
    }
    for (size_t i = 0; i < n->items.size(); ++i) {
        const std::string path = fmt::format("{}[{}]", path_of(key), i);
        if (n->items[i].kind != Node::Kind::table) {
            report(n->items[i].origin, path,
                   fmt::format("= {}: must be a table", show(n->items[i])));
            continue;
        }
        out.emplace_back(&n->items[i], path, context_);
    }
    return out;
}

void Table::finish() {
    if (!node_) return;
    std::vector<std::string> valid(known_.begin(), known_.end());
    for (const auto& [key, value] : node_->entries) {
        if (known_.count(key)) continue;
        std::string hint = did_you_mean(key, valid);
        if (hint.empty()) hint = "; valid keys here: " + one_of(valid);
        report(value.origin, path_of(key), "is an unknown key" + hint);
    }
}

} // namespace lapwing::input
