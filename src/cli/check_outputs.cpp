// The output-writing stage of `lapwing check`, also used per variant by
// `lapwing sweep --reports`. The renderers live in src/report/; this file
// only touches the disk and the clock.
#include "cli/check_outputs.hpp"

#include "cli/files.hpp"
#include "core/error.hpp"
#include "input/load_connection.hpp"
#include "report/figures.hpp"
#include "report/output_folder.hpp"
#include "report/outputs.hpp"
#include "report/sha256.hpp"

#include <algorithm>
#include <ctime>
#include <future>
#include <stdexcept>

namespace lapwing::cli {

namespace {

namespace fs = std::filesystem;

std::string utc_now() {
    const std::time_t now = std::time(nullptr);
    std::tm tm{};
    gmtime_r(&now, &tm);
    char text[32];
    std::strftime(text, sizeof text, "%Y-%m-%d %H:%M:%S UTC", &tm);
    return text;
}

bool wants(const model::Connection& c, const char* format) {
    return std::find(c.report.formats.begin(), c.report.formats.end(), format) !=
           c.report.formats.end();
}

} // namespace

// Each refusal is an output failure (exit code 3, as for `lapwing mesh`),
// raised before any work is done.
void prepare_folder(const fs::path& folder, bool force) {
    std::error_code ec;
    if (!fs::exists(folder, ec)) {
        fs::create_directories(folder, ec);
        if (ec)
            throw OutputError("cannot create output folder " + folder.string() + ": " +
                              ec.message());
        return;
    }
    if (!fs::is_directory(folder, ec))
        throw OutputError("output folder " + folder.string() + " exists and is not a folder");
    std::vector<std::string> entries;
    for (const auto& entry : fs::directory_iterator(folder, ec))
        entries.push_back(entry.path().filename().string());
    std::sort(entries.begin(), entries.end());
    if (auto refusal = report::refuse_folder(folder.string(), entries, force))
        throw OutputError(*refusal);
}

report::RunInfo make_run_info(const std::string& input_file, const std::string& text,
                              const model::Connection& c, const std::string& command_line,
                              bool reproducible, bool two_mesh) {
    report::RunInfo run;
    run.version = LAPWING_VERSION;
    run.build_id = LAPWING_BUILD_ID;
    run.command_line = command_line;
    run.input_file = input_file;
    run.input_sha256 = report::sha256_hex(text);
    run.resolved_model = input::write_resolved(c);
    run.resolved_sha256 = report::sha256_hex(run.resolved_model);
    run.reproducible = reproducible;
    run.date = reproducible ? report::reproducible_date : utc_now();
    run.two_mesh = two_mesh;
    return run;
}

ModelParts render_model_parts(const model::Connection& c, const check::CheckOutcome& o) {
    ModelParts parts;
    std::future<std::string> vtu;
    if (wants(c, "vtu")) vtu = std::async(std::launch::async, [&] { return report::model_vtu(o); });
    parts.figures = report::all_figures(o);
    if (vtu.valid()) parts.vtu = vtu.get();
    return parts;
}

std::vector<std::string> write_check_outputs(const fs::path& folder, const model::Connection& c,
                                             const check::CheckOutcome& o,
                                             const report::RunInfo& run) {
    return write_check_outputs(folder, c, o, run, render_model_parts(c, o));
}

std::vector<std::string> write_check_outputs(const fs::path& folder, const model::Connection& c,
                                             const check::CheckOutcome& o,
                                             const report::RunInfo& run, const ModelParts& parts) {
    std::vector<std::string> written;
    const auto put = [&](const std::string& name, const std::string& content) {
        write_atomically(folder / name, content);
        written.push_back(name);
    };
    if (wants(c, "html")) put("report.html", report::calc_sheet_html(o, run, parts.figures));
    if (wants(c, "json")) put("results.json", report::results_json(o, run, parts.figures));
    if (wants(c, "vtu")) put("model.vtu", parts.vtu);
    if (wants(c, "csv")) put("checks.csv", report::checks_csv(o));
    if (c.report.figures)
        for (const report::Figure& f : parts.figures) put(f.file, f.svg);
    return written;
}

} // namespace lapwing::cli
