// Error types shared by every stage: what went wrong, where, and which exit
// code the command line gives it. Only cli/ catches these.
#pragma once

#include <stdexcept>
#include <string>
#include <vector>

namespace lapwing {

// Exit codes of every lapwing command (DESIGN: "Exit status").
enum class ExitCode : int {
    all_pass = 0,     // every check passed
    check_failed = 1, // at least one demand/capacity ratio exceeds 1
    bad_input = 2,    // bad input, or a model that cannot be solved
    // An output could not be written (no such folder, no permission, disk
    // full): the analysis may be fine, but nothing half-written is left.
    output_failed = 3,
};

// One problem in the input, located as precisely as the stage knows it.
struct Diagnostic {
    std::string file;        // input file name, empty when not from a file
    int line = 0;            // 1-based, 0 when unknown
    int column = 0;          // 1-based, 0 when unknown
    std::string key_path;    // e.g. "bolt_group[2].hole"
    std::string message;     // e.g. "= -22: must be > 0"
    std::string source_line; // the offending line of the file, if known

    // "file:line:column: key_path message", followed by the source line and
    // a caret when the source line is known.
    std::string format() const;
};

// Bad input: carries every problem found, not only the first.
class InputError : public std::runtime_error {
public:
    explicit InputError(std::vector<Diagnostic> diagnostics);
    explicit InputError(Diagnostic diagnostic);
    const std::vector<Diagnostic>& diagnostics() const { return diagnostics_; }

private:
    std::vector<Diagnostic> diagnostics_;
};

// A model that cannot be analysed: an inverted element, an unrestrained or
// singular system, a mesher failure. The message names the element, node or
// region.
class AnalysisError : public std::runtime_error {
public:
    using std::runtime_error::runtime_error;
};

// An output file that could not be written; the message names the file and
// why. Gives ExitCode::output_failed.
class OutputError : public std::runtime_error {
public:
    using std::runtime_error::runtime_error;
};

} // namespace lapwing
