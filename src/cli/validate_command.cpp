// `lapwing validate`: resolves and checks a template, prints the summary.
#include "cli/commands.hpp"
#include "cli/files.hpp"
#include "core/error.hpp"
#include "input/load_connection.hpp"

#include <ostream>

namespace lapwing::cli {

int report_failure(std::ostream& err) {
    try {
        throw;
    } catch (const InputError& e) {
        err << input::format_problems(e);
        return static_cast<int>(ExitCode::bad_input);
    } catch (const OutputError& e) {
        err << "error: " << e.what() << "\n";
        return static_cast<int>(ExitCode::output_failed);
    } catch (const AnalysisError& e) {
        err << "error: " << e.what() << "\n";
        return static_cast<int>(ExitCode::bad_input);
    } catch (const std::exception& e) {
        err << "error: " << e.what() << "\n";
        return static_cast<int>(ExitCode::bad_input);
    }
}

int run_validate(const std::string& file, const std::vector<std::string>& sets, bool resolved,
                 std::ostream& out, std::ostream& err) {
    try {
        const std::string text = read_input_file(file);
        const auto connection = input::load_connection(text, file, sets);
        if (resolved) {
            out << input::write_resolved(connection);
        } else {
            out << input::summarize(connection);
            out << file << ": valid\n";
        }
        return 0;
    } catch (...) {
        return report_failure(err);
    }
}

} // namespace lapwing::cli
