// The subcommands, each a function from its arguments to an exit code; the
// CLI11 wiring lives in app.cpp.
#pragma once

#include <iosfwd>
#include <string>
#include <vector>

namespace lapwing::cli {

// Kinds `lapwing new` can write, with a one-line description each.
struct TemplateKind {
    std::string name;
    std::string description;
    std::string text; // the commented template
};
const std::vector<TemplateKind>& template_kinds();

// `lapwing new KIND [-o FILE] [--force]`: the template to FILE, or to `out`
// when FILE is empty.
int run_new(const std::string& kind, const std::string& file, bool force, std::ostream& out,
            std::ostream& err);

// `lapwing validate FILE [--set KEY=VALUE ...] [--resolved]`: the resolved
// summary (or, with `resolved`, the resolved template) to `out`.
int run_validate(const std::string& file, const std::vector<std::string>& sets, bool resolved,
                 std::ostream& out, std::ostream& err);

// `lapwing mesh FILE [--set ...] [-o DIR] [--max-dofs N]`: meshes the plate
// and writes DIR/mesh.svg and DIR/mesh.vtu atomically (DIR defaults to ".").
// A model estimated above `max_dofs` is refused before meshing (exit 2).
int run_mesh(const std::string& file, const std::vector<std::string>& sets,
             const std::string& folder, long max_dofs, std::ostream& out, std::ostream& err);

// `lapwing analyse FILE [--set ...] [--max-dofs N]`: meshes and solves every
// load case and combination; prints bolt forces, reactions, equilibrium
// residuals and any numerical warnings. Exit 2 for bad input, a model that
// cannot be solved or one estimated above `max_dofs`.
int run_analyse(const std::string& file, const std::vector<std::string>& sets, long max_dofs,
                std::ostream& out, std::ostream& err);

// `lapwing check FILE [--set ...] [-o DIR] ...`: the whole check; the
// table's summary to `out`; the calc sheet and data files to DIR.
// Exit 0 when every check passes, 1 when one fails, 2 for bad input.
struct CheckArgs {
    std::string file;
    std::vector<std::string> sets;
    std::string output_folder; // empty: no files, the terminal summary only
    bool single_mesh = false;  // skip the convergence mesh
    bool quiet = false;        // no summary, only errors
    bool json = false;         // the summary as JSON on standard output
    bool reproducible = false; // fixed date in outputs: two runs give identical files
    bool force = false;        // reuse an output folder that holds other files
    long max_dofs = 5'000'000; // analysis::default_max_dofs; refused before meshing (exit 2)
    std::string command_line;  // as typed, for the calc sheet's traceability
};
int run_check(const CheckArgs& args, std::ostream& out, std::ostream& err);

// Prints every diagnostic of a lapwing::InputError (or any exception) and
// gives the exit code. Used by every command.
int report_failure(std::ostream& err);

} // namespace lapwing::cli
