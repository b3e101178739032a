// The template as a tree of located values, independent of the TOML library
// (which stays in document.cpp: its headers are slow to compile).
#pragma once

#include <cstdint>
#include <string>
#include <string_view>
#include <utility>
#include <vector>

namespace lapwing::input {

// Where a value came from: a line of the file, or one --set argument.
struct Origin {
    std::string file; // file name, or "--set KEY=VALUE" for an override
    int line = 0;     // 1-based; 0 for an override or the whole file
    int column = 0;
    std::string source_line;
};

struct Node {
    struct Entry; // (key, value); a struct, as std::pair of an incomplete Node is not portable
    enum class Kind { table, array, string, integer, floating, boolean, datetime };
    Kind kind = Kind::table;
    std::string text; // string value, or the TOML text of a date-time
    std::int64_t integer = 0;
    double floating = 0.0;
    bool boolean = false;
    std::vector<Entry> entries; // tables, in file order
    std::vector<Node> items;    // arrays
    Origin origin;

    const Node* find(std::string_view key) const;
    Node* find(std::string_view key);
    bool is_number() const { return kind == Kind::integer || kind == Kind::floating; }
    double number() const {
        return kind == Kind::integer ? static_cast<double>(integer) : floating;
    }
};

struct Node::Entry {
    std::string first; // key
    Node second;       // value
};

// "table", "integer", … for messages.
std::string_view kind_name(Node::Kind kind);
// "an integer", "a table", … for "not a …" messages.
std::string_view with_article(Node::Kind kind);

// The value as it would be written in TOML, shortened for messages.
std::string show(const Node& node);

// Parses a whole template. Syntax errors throw lapwing::InputError with the
// line and column; an empty (or all-comment) text is an error too.
Node parse_document(std::string_view text, std::string_view file_name);

// Parses the VALUE of a `--set KEY=VALUE` override: any TOML value, or, when
// it is not valid TOML, the text itself as a string.
Node parse_override_value(std::string_view text, const Origin& origin);

} // namespace lapwing::input
