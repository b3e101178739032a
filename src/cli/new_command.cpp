// `lapwing new`: writes a fully commented starting template.
#include "cli/commands.hpp"
#include "cli/files.hpp"
#include "core/error.hpp"

#include <filesystem>
#include <ostream>

namespace lapwing::cli {

int run_new(const std::string& kind, const std::string& file, bool force, std::ostream& out,
            std::ostream& err) {
    const TemplateKind* chosen = nullptr;
    for (const auto& k : template_kinds()) {
        if (k.name == kind) chosen = &k;
    }
    if (!chosen) {
        err << "lapwing new: unknown kind \"" << kind << "\"; the kinds are:\n";
        for (const auto& k : template_kinds())
            err << "  " << k.name << "  " << k.description << "\n";
        return static_cast<int>(ExitCode::bad_input);
    }
    if (file.empty() || file == "-") {
        out << chosen->text;
        return 0;
    }
    if (std::filesystem::exists(file) && !force) {
        err << "lapwing new: " << file
            << " already exists; it is left as it is (use --force to replace it)\n";
        return static_cast<int>(ExitCode::bad_input);
    }
    try {
        write_atomically(file, chosen->text);
    } catch (const OutputError& e) {
        err << "lapwing new: " << e.what() << "\n";
        return static_cast<int>(ExitCode::output_failed);
    }
    err << "wrote " << file << " (" << chosen->description << ")\n";
    return 0;
}

} // namespace lapwing::cli
