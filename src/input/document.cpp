// TOML text → located Node tree (the only translation unit that sees toml11).
#include "input/document.hpp"

#include "core/error.hpp"

#include <algorithm>
#include <fmt/format.h>
#include <sstream>
#include <toml.hpp>

namespace lapwing::input {

const Node* Node::find(std::string_view key) const {
    for (const auto& [k, v] : entries) {
        if (k == key) return &v;
    }
    return nullptr;
}

Node* Node::find(std::string_view key) {
    for (auto& [k, v] : entries) {
        if (k == key) return &v;
    }
    return nullptr;
}

std::string_view kind_name(Node::Kind kind) {
    switch (kind) {
    case Node::Kind::table:
        return "table";
    case Node::Kind::array:
        return "array";
    case Node::Kind::string:
        return "string";
    case Node::Kind::integer:
        return "integer";
    case Node::Kind::floating:
        return "float";
    case Node::Kind::boolean:
        return "boolean";
    case Node::Kind::datetime:
        return "date-time";
    }
    return "?";
}

std::string_view with_article(Node::Kind kind) {
    switch (kind) {
    case Node::Kind::table:
        return "a table";
    case Node::Kind::array:
        return "an array";
    case Node::Kind::string:
        return "a text";
    case Node::Kind::integer:
        return "an integer";
    case Node::Kind::floating:
        return "a float";
    case Node::Kind::boolean:
        return "a boolean";
    case Node::Kind::datetime:
        return "a date-time";
    }
    return "?";
}

std::string show(const Node& node) {
    switch (node.kind) {
    case Node::Kind::table:
        return "{...}";
    case Node::Kind::array: {
        std::string out = "[";
        for (size_t i = 0; i < node.items.size() && i < 4; ++i) {
            if (i > 0) out += ", ";
            out += show(node.items[i]);
        }
        if (node.items.size() > 4) out += ", ...";
        return out + "]";
    }
    case Node::Kind::string:
        return fmt::format("\"{}\"", node.text);
    case Node::Kind::integer:
        return std::to_string(node.integer);
    case Node::Kind::floating: {
        // Keep the decimal point, so 2.0 does not read as the integer 2.
        std::string text = fmt::format("{}", node.floating);
        if (text.find_first_of(".eEn") == std::string::npos) text += ".0";
        return text;
    }
    case Node::Kind::boolean:
        return node.boolean ? "true" : "false";
    case Node::Kind::datetime:
        return node.text;
    }
    return "?";
}

namespace {

Origin origin_of(const toml::value& v, std::string_view file_name) {
    const auto loc = v.location();
    Origin o;
    o.file = std::string(file_name);
    o.line = static_cast<int>(loc.line());
    o.column = static_cast<int>(loc.column());
    o.source_line = loc.line_str();
    if (o.line <= 0) o.column = 0;
    return o;
}

Node convert(const toml::value& v, std::string_view file_name) {
    Node n;
    n.origin = origin_of(v, file_name);
    switch (v.type()) {
    case toml::value_t::table: {
        n.kind = Node::Kind::table;
        for (const auto& [key, child] : v.as_table())
            n.entries.push_back({key, convert(child, file_name)});
        // toml11 keeps tables unordered; file order makes messages and summaries stable.
        std::sort(n.entries.begin(), n.entries.end(), [](const auto& a, const auto& b) {
            if (a.second.origin.line != b.second.origin.line)
                return a.second.origin.line < b.second.origin.line;
            if (a.second.origin.column != b.second.origin.column)
                return a.second.origin.column < b.second.origin.column;
            return a.first < b.first;
        });
        break;
    }
    case toml::value_t::array:
        n.kind = Node::Kind::array;
        for (const auto& child : v.as_array()) n.items.push_back(convert(child, file_name));
        break;
    case toml::value_t::string:
        n.kind = Node::Kind::string;
        n.text = v.as_string().str;
        break;
    case toml::value_t::integer:
        n.kind = Node::Kind::integer;
        n.integer = v.as_integer();
        break;
    case toml::value_t::floating:
        n.kind = Node::Kind::floating;
        n.floating = v.as_floating();
        break;
    case toml::value_t::boolean:
        n.kind = Node::Kind::boolean;
        n.boolean = v.as_boolean();
        break;
    default:
        n.kind = Node::Kind::datetime;
        n.text = toml::format(v);
        break;
    }
    return n;
}

// toml11 messages read "[error] toml::parse_xxx: what\n --> file\n ...": keep "what".
std::string first_line(const std::string& what) {
    std::string line = what.substr(0, what.find('\n'));
    if (line.rfind("[error] ", 0) == 0) line = line.substr(8);
    if (line.rfind("toml::", 0) == 0) {
        const auto colon = line.find(": ");
        if (colon != std::string::npos) line = line.substr(colon + 2);
    }
    return line;
}

toml::value parse_text(std::string_view text, const std::string& file_name) {
    std::istringstream stream{std::string(text)};
    return toml::parse(stream, file_name);
}

} // namespace

// Offset of the first byte that does not start or continue a valid UTF-8
// sequence (RFC 3629: no overlong forms, no surrogates, at most U+10FFFF),
// or npos. Checked before toml11 sees the text: toml11 3.7.1 reads past the
// end of its buffer when it reports invalid UTF-8 inside a multi-line
// literal string (found by tests/fuzz/fuzz_pipeline).
static size_t invalid_utf8_at(std::string_view text) {
    size_t i = 0;
    while (i < text.size()) {
        const auto c = static_cast<unsigned char>(text[i]);
        size_t n = 0;
        unsigned low = 0x80, high = 0xBF;
        if (c < 0x80)
            n = 0;
        else if (c >= 0xC2 && c <= 0xDF)
            n = 1;
        else if (c == 0xE0)
            n = 2, low = 0xA0;
        else if (c >= 0xE1 && c <= 0xEC)
            n = 2;
        else if (c == 0xED)
            n = 2, high = 0x9F;
        else if (c >= 0xEE && c <= 0xEF)
            n = 2;
        else if (c == 0xF0)
            n = 3, low = 0x90;
        else if (c >= 0xF1 && c <= 0xF3)
            n = 3;
        else if (c == 0xF4)
            n = 3, high = 0x8F;
        else
            return i;
        for (size_t k = 1; k <= n; ++k) {
            if (i + k >= text.size()) return i;
            const auto d = static_cast<unsigned char>(text[i + k]);
            if (d < (k == 1 ? low : 0x80) || d > (k == 1 ? high : 0xBF)) return i;
        }
        i += n + 1;
    }
    return std::string_view::npos;
}

Node parse_document(std::string_view text, std::string_view file_name) {
    const std::string name(file_name);
    if (const size_t bad = invalid_utf8_at(text); bad != std::string_view::npos) {
        const size_t line_start = text.rfind('\n', bad == 0 ? 0 : bad - 1);
        const size_t begin = line_start == std::string_view::npos || bad == 0 ? 0 : line_start + 1;
        Diagnostic d;
        d.file = name;
        d.line = 1 + static_cast<int>(
                         std::count(text.begin(), text.begin() + static_cast<long>(bad), '\n'));
        d.column = 1 + static_cast<int>(bad - begin);
        d.message = "is not valid UTF-8 text here (a template must be UTF-8)";
        throw InputError(d);
    }
    toml::value root;
    try {
        root = parse_text(text, name);
    } catch (const toml::exception& e) {
        Diagnostic d;
        d.file = name;
        d.line = static_cast<int>(e.location().line());
        d.column = static_cast<int>(e.location().column());
        d.source_line = e.location().line_str();
        d.message = "TOML syntax error: " + first_line(e.what());
        throw InputError(d);
    } catch (const std::exception& e) {
        throw InputError(
            Diagnostic{name, 0, 0, "", std::string("cannot be read as TOML: ") + e.what(), ""});
    }
    Node tree = convert(root, file_name);
    tree.origin = Origin{name, 0, 0, ""};
    if (tree.entries.empty()) {
        throw InputError(
            Diagnostic{name, 0, 0, "",
                       "is empty: a template needs at least [units], [material] and [plate] "
                       "(`lapwing new` writes a complete one)",
                       ""});
    }
    return tree;
}

Node parse_override_value(std::string_view text, const Origin& origin) {
    Node value;
    try {
        if (invalid_utf8_at(text) != std::string_view::npos)
            throw std::runtime_error("not UTF-8"); // taken as plain text, like any non-TOML value
        const auto root = parse_text(std::string("value = ") + std::string(text), origin.file);
        value = convert(toml::find(root, "value"), origin.file);
    } catch (const std::exception&) {
        value.kind = Node::Kind::string;
        value.text = std::string(text);
    }
    auto relocate = [&](auto& self, Node& n) -> void {
        n.origin = origin;
        for (auto& [k, child] : n.entries) self(self, child);
        for (auto& child : n.items) self(self, child);
    };
    relocate(relocate, value);
    return value;
}

} // namespace lapwing::input
