// Formatting of diagnostics in the compiler-style "file:line:col: message" form.
#include "core/error.hpp"

#include <fmt/format.h>

namespace lapwing {

std::string Diagnostic::format() const {
    std::string where;
    if (!file.empty()) where = file;
    if (line > 0) where += fmt::format(":{}", line);
    if (line > 0 && column > 0) where += fmt::format(":{}", column);
    std::string out = where.empty() ? "" : where + ": ";
    if (!key_path.empty()) out += key_path + " ";
    out += message;
    if (!source_line.empty()) {
        out += "\n    " + source_line;
        if (column > 0) out += "\n    " + std::string(static_cast<size_t>(column - 1), ' ') + "^";
    }
    return out;
}

namespace {
std::string join(const std::vector<Diagnostic>& diagnostics) {
    std::string out;
    for (const auto& d : diagnostics) {
        if (!out.empty()) out += "\n";
        out += d.format();
    }
    return out;
}
} // namespace

InputError::InputError(std::vector<Diagnostic> diagnostics)
    : std::runtime_error(join(diagnostics)), diagnostics_(std::move(diagnostics)) {}

InputError::InputError(Diagnostic diagnostic)
    : InputError(std::vector<Diagnostic>{std::move(diagnostic)}) {}

} // namespace lapwing
