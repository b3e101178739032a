// [job], [parameters], [material] and --set overrides.
#include "core/error.hpp"
#include "input/expression.hpp"
#include "input/reader.hpp"
#include "input/sections.hpp"
#include "input/suggest.hpp"

#include <algorithm>
#include <cctype>
#include <fmt/format.h>
#include <set>

namespace lapwing::input {

namespace {

bool is_identifier(std::string_view s) {
    if (s.empty() || !(std::isalpha(static_cast<unsigned char>(s[0])) || s[0] == '_')) return false;
    for (char c : s) {
        if (!(std::isalnum(static_cast<unsigned char>(c)) || c == '_')) return false;
    }
    return true;
}

const std::vector<std::string> material_names{"E", "nu", "Fy", "Fu"};

} // namespace

void apply_override(Node& root, const std::string& argument, Context& context) {
    const Origin origin{"--set " + argument, 0, 0, ""};
    const auto equals = argument.find('=');
    if (equals == std::string::npos || equals == 0) {
        context.report(origin, "", "must be KEY=VALUE, e.g. --set parameters.t=14");
        return;
    }
    // Spaces around the key and the value ("t = 14" typed in quotes) do not count.
    auto trim = [](std::string text) {
        const auto first = text.find_first_not_of(" \t");
        if (first == std::string::npos) return std::string();
        return text.substr(first, text.find_last_not_of(" \t") - first + 1);
    };
    const std::string key = trim(argument.substr(0, equals));
    const std::string value = trim(argument.substr(equals + 1));
    Node* at = &root;
    std::string walked;
    size_t start = 0;
    while (start <= key.size()) {
        size_t dot = key.find('.', start);
        if (dot == std::string::npos) dot = key.size();
        std::string part = key.substr(start, dot - start);
        std::optional<size_t> index;
        if (const auto bracket = part.find('['); bracket != std::string::npos) {
            const auto close = part.find(']', bracket);
            const std::string digits =
                close == std::string::npos ? "" : part.substr(bracket + 1, close - bracket - 1);
            if (digits.empty() || digits.find_first_not_of("0123456789") != std::string::npos) {
                context.report(origin, key, "has a bad index: write e.g. bolt_group[0].rows");
                return;
            }
            index = std::stoul(digits);
            part = part.substr(0, bracket);
        }
        if (part.empty()) {
            context.report(origin, key, "has an empty key part: write e.g. parameters.t=14");
            return;
        }
        if (at->kind != Node::Kind::table) {
            context.report(origin, key, "cannot be set: " + walked + " is not a table");
            return;
        }
        walked += (walked.empty() ? "" : ".") + part;
        Node* next = at->find(part);
        const bool last = dot == key.size();
        if (!next) {
            if (index) {
                context.report(origin, key,
                               fmt::format("cannot be set: there is no list {}", walked));
                return;
            }
            Node fresh;
            fresh.kind = Node::Kind::table;
            fresh.origin = origin;
            at->entries.push_back({part, std::move(fresh)});
            next = &at->entries.back().second;
        }
        if (index) {
            if (next->kind != Node::Kind::array || *index >= next->items.size()) {
                context.report(
                    origin, key,
                    fmt::format("cannot be set: {} has {} entries (indices from 0)", walked,
                                next->kind == Node::Kind::array ? next->items.size() : 0));
                return;
            }
            next = &next->items[*index];
            walked += fmt::format("[{}]", *index);
        }
        if (last) {
            *next = parse_override_value(value, origin);
            return;
        }
        at = next;
        start = dot + 1;
    }
}

void read_job(Table& root, model::Job& job) {
    Table t = root.table("job", false);
    auto text = [&](const char* key, std::string& out) { out = t.text(key, "").value_or(""); };
    text("title", job.title);
    text("project", job.project);
    text("mark", job.mark);
    text("prepared_by", job.prepared_by);
    text("checked_by", job.checked_by);
    text("revision", job.revision);
    text("notes", job.notes);
    t.finish();
}

// Parameters may refer to each other in any order: resolve in rounds, each
// round evaluating what the previous rounds made available.
void read_parameters(Table& root, Context& context, std::map<std::string, double>& parameters) {
    Table t = root.table("parameters", false);
    if (!t.present()) return;
    std::vector<std::pair<std::string, const Node*>> pending;
    for (const auto& [key, value] : root.get("parameters")->entries) {
        const std::string path = t.path_of(key);
        if (!is_identifier(key)) {
            context.report(value.origin, path,
                           "is not a usable parameter name: use letters, digits and _, starting "
                           "with a letter");
            continue;
        }
        if (std::find(material_names.begin(), material_names.end(), key) != material_names.end()) {
            context.report(value.origin, path,
                           "is reserved for the material value of that name: rename the parameter");
            context.failed.insert(key);
            continue;
        }
        const auto& builtin = builtin_names();
        if (std::find(builtin.begin(), builtin.end(), key) != builtin.end()) {
            context.report(
                value.origin, path,
                "is the name of an expression function or constant: rename the parameter");
            context.failed.insert(key);
            continue;
        }
        if (value.is_number()) {
            if (auto v = read_number(value, path, Quantity::none, Bound::any(), context))
                context.names[key] = *v;
            else
                context.failed.insert(key);
        } else if (value.kind == Node::Kind::string) {
            pending.emplace_back(key, &value);
        } else {
            context.report(
                value.origin, path,
                fmt::format("= {}: must be a number or an expression in quotes", show(value)));
            context.failed.insert(key);
        }
    }
    std::set<std::string> waiting;
    for (const auto& [key, value] : pending) waiting.insert(key);
    bool progress = true;
    while (progress && !waiting.empty()) {
        progress = false;
        for (const auto& [key, value] : pending) {
            if (!waiting.count(key)) continue;
            try {
                context.names[key] = evaluate(value->text, context.names);
                waiting.erase(key);
                progress = true;
            } catch (const ExpressionError& e) {
                if (!waiting.count(e.unknown_name())) {
                    // A real error (or one inherited from a bad parameter, which
                    // read_number keeps quiet): report it through the common path.
                    read_number(*value, t.path_of(key), Quantity::none, Bound::any(), context);
                    context.failed.insert(key);
                    waiting.erase(key);
                    progress = true;
                }
            }
        }
    }
    for (const auto& [key, value] : pending) {
        if (!waiting.count(key)) continue;
        std::string cycle;
        for (const auto& w : waiting) cycle += (cycle.empty() ? "" : ", ") + w;
        context.report(value->origin, t.path_of(key),
                       fmt::format("= {}: parameters refer to each other in a circle ({})",
                                   show(*value), cycle));
        context.failed.insert(key);
    }
    for (const auto& [name, v] : context.names) parameters[name] = v;
}

void read_material(Table& root, model::Material& material) {
    Table t = root.table("material", true);
    Context& context = t.context();
    const bool here = t.present();
    material.grade = t.text("grade", "").value_or("");
    const auto E = t.number("E", Quantity::stress, Bound::positive(),
                            here ? std::nullopt : std::optional(0.0));
    const auto nu = t.number("nu", Quantity::none, Bound::open_range(-1.0, 0.5), 0.3);
    const auto Fy = t.number("Fy", Quantity::stress, Bound::positive(),
                             here ? std::nullopt : std::optional(0.0));
    const auto Fu = t.number("Fu", Quantity::stress, Bound::positive(),
                             here ? std::nullopt : std::optional(0.0));
    if (E) material.E = *E;
    if (nu) material.nu = *nu;
    if (Fy) material.Fy = *Fy;
    if (Fu) material.Fu = *Fu;
    if (here && Fy && Fu && *Fu < *Fy) {
        const Node* n = t.get("Fu");
        context.report(n->origin, t.path_of("Fu"),
                       fmt::format("= {}: the tensile strength must not be below Fy = {} {}",
                                   show(*n), from_internal(*Fy, Quantity::stress, context.units),
                                   unit_label(Quantity::stress, context.units)));
    }
    // Expressions further on may use the material values, in the user's units.
    // A bad value is left undefined (and marked failed) so that expressions
    // using it do not repeat the problem.
    auto define = [&](const char* key, const std::optional<double>& v, double shown) {
        if (v && here)
            context.names[key] = shown;
        else
            context.failed.insert(key);
    };
    define("E", E, from_internal(material.E, Quantity::stress, context.units));
    define("nu", nu, material.nu);
    define("Fy", Fy, from_internal(material.Fy, Quantity::stress, context.units));
    define("Fu", Fu, from_internal(material.Fu, Quantity::stress, context.units));
    t.finish();
}

} // namespace lapwing::input
