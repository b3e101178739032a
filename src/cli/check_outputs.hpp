// The files of one `lapwing check -o DIR` run: the calc sheet, results.json,
// model.vtu and the figures, as the template's [report] asks, each written
// atomically. Shared by `lapwing check` and `lapwing sweep --reports`, so a
// variant's folder holds exactly what a single check of it would write.
#pragma once

#include "check/pipeline.hpp"
#include "model/connection.hpp"
#include "report/figures.hpp"
#include "report/run_info.hpp"

#include <filesystem>
#include <string>
#include <vector>

namespace lapwing::cli {

// Creates the folder, or checks that an existing one holds only lapwing
// outputs (any files with `force`). Throws OutputError saying why not.
void prepare_folder(const std::filesystem::path& folder, bool force);

// What the outputs record about the run. `text` is the input file's content
// (hashed), `c` the resolved connection; the date is the fixed one when
// `reproducible`, the current UTC time otherwise.
report::RunInfo make_run_info(const std::string& input_file, const std::string& text,
                              const model::Connection& c, const std::string& command_line,
                              bool reproducible, bool two_mesh);

// The outputs that need only the model's mesh, not the convergence mesh:
// the figures and model.vtu (as `c.report` asks), rendered in memory, the
// two on two threads. `lapwing check` makes them while the convergence mesh
// is still being solved (check::CheckOptions::on_model_outcome).
struct ModelParts {
    std::vector<report::Figure> figures;
    std::string vtu; // empty unless model.vtu is asked for
};
ModelParts render_model_parts(const model::Connection& c, const check::CheckOutcome& o);

// Writes the outputs `c.report` asks for into `folder` (which exists) and
// returns their file names in the order written. Throws OutputError naming
// the file that could not be written.
std::vector<std::string> write_check_outputs(const std::filesystem::path& folder,
                                             const model::Connection& c,
                                             const check::CheckOutcome& o,
                                             const report::RunInfo& run);
// The same with the model's parts already rendered from this outcome's model
// mesh.
std::vector<std::string> write_check_outputs(const std::filesystem::path& folder,
                                             const model::Connection& c,
                                             const check::CheckOutcome& o,
                                             const report::RunInfo& run, const ModelParts& parts);

} // namespace lapwing::cli
