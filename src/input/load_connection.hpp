// The input stage: template text → resolved, validated model::Connection.
#pragma once

#include "core/error.hpp"
#include "model/connection.hpp"

#include <string>
#include <string_view>
#include <vector>

namespace lapwing::input {

// Parses `toml_text` (named `file_name` in messages), applies the
// `KEY=VALUE` overrides in order, resolves parameters and expressions,
// converts to N·mm·MPa and validates everything. Throws one
// lapwing::InputError carrying every problem found.
model::Connection load_connection(std::string_view toml_text, std::string_view file_name,
                                  const std::vector<std::string>& set_overrides = {});

// Every diagnostic of an input error, one per line (with its source line and
// caret), then "N problems found; nothing was written".
std::string format_problems(const InputError& error);

// The readable summary `lapwing validate` prints: every resolved value, in
// the user's unit system, in a stable order and number format.
std::string summarize(const model::Connection& connection);

// The resolved model as a template of plain numbers in the user's units
// (expressions of allowables kept as typed): load_connection of this text
// gives the same model. `lapwing validate --resolved` prints it.
std::string write_resolved(const model::Connection& connection);

} // namespace lapwing::input
