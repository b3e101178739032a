// `lapwing check FILE [-o DIR]`: the whole pipeline, then the report stage's
// outputs written to DIR (each through a temporary file and a rename), and
// the terminal summary (or its JSON form). The renderers live in
// src/report/; this file only touches the disk, the clock and the terminal.
#include "check/pipeline.hpp"
#include "cli/commands.hpp"
#include "cli/files.hpp"
#include "core/error.hpp"
#include "input/load_connection.hpp"
#include "report/figures.hpp"
#include "report/output_folder.hpp"
#include "report/outputs.hpp"
#include "report/sha256.hpp"
#include "report/terminal_summary.hpp"

#include <algorithm>
#include <chrono>
#include <condition_variable>
#include <ctime>
#include <filesystem>
#include <fmt/format.h>
#include <iostream>
#include <mutex>
#include <ostream>
#include <stdexcept>
#include <thread>
#include <unistd.h>

namespace lapwing::cli {

namespace {

namespace fs = std::filesystem;

bool is_terminal(const std::ostream& out) {
    return &out == &std::cout && ::isatty(STDOUT_FILENO);
}

// "working: meshing, solving and checking … 3 s" on one terminal line,
// shown only when the step takes longer than a second, erased when done.
class Progress {
public:
    Progress(bool enabled, std::string what) {
        if (!enabled) return;
        thread_ = std::jthread([this, what = std::move(what)](std::stop_token stop) {
            const auto start = std::chrono::steady_clock::now();
            std::mutex m;
            std::condition_variable_any cv;
            std::unique_lock lock(m);
            if (cv.wait_for(lock, stop, std::chrono::seconds(1), [] { return false; }) ||
                stop.stop_requested())
                return;
            while (!stop.stop_requested()) {
                const auto seconds = std::chrono::duration_cast<std::chrono::seconds>(
                                         std::chrono::steady_clock::now() - start)
                                         .count();
                std::cout << fmt::format("\r\x1b[2K{} … {} s", what, seconds) << std::flush;
                shown_ = true;
                cv.wait_for(lock, stop, std::chrono::milliseconds(500), [] { return false; });
            }
        });
    }
    ~Progress() { done(); }
    void done() {
        if (!thread_.joinable()) return;
        thread_.request_stop();
        thread_.join();
        if (shown_) std::cout << "\r\x1b[2K" << std::flush;
    }

private:
    std::jthread thread_;
    bool shown_ = false;
};

std::string utc_now() {
    const std::time_t now = std::time(nullptr);
    std::tm tm{};
    gmtime_r(&now, &tm);
    char text[32];
    std::strftime(text, sizeof text, "%Y-%m-%d %H:%M:%S UTC", &tm);
    return text;
}

// Creates the folder, or checks that an existing one may be written into.
void prepare_folder(const fs::path& folder, bool force) {
    std::error_code ec;
    if (!fs::exists(folder, ec)) {
        fs::create_directories(folder, ec);
        if (ec)
            throw std::runtime_error("cannot create output folder " + folder.string() + ": " +
                                     ec.message());
        return;
    }
    if (!fs::is_directory(folder, ec))
        throw std::runtime_error("output folder " + folder.string() +
                                 " exists and is not a folder");
    std::vector<std::string> entries;
    for (const auto& entry : fs::directory_iterator(folder, ec))
        entries.push_back(entry.path().filename().string());
    std::sort(entries.begin(), entries.end());
    if (auto refusal = report::refuse_folder(folder.string(), entries, force))
        throw std::runtime_error(*refusal);
}

bool wants(const model::Connection& c, const char* format) {
    return std::find(c.report.formats.begin(), c.report.formats.end(), format) !=
           c.report.formats.end();
}

} // namespace

int run_check(const CheckArgs& args, std::ostream& out, std::ostream& err) {
    try {
        const std::string text = read_input_file(args.file);
        const auto c = input::load_connection(text, args.file, args.sets);
        // Before anything is meshed or made on disk (the pipeline checks again).
        check::check_resources(c, !args.single_mesh, args.max_dofs);
        const bool writing = !args.output_folder.empty();
        const fs::path folder(args.output_folder);
        if (writing) prepare_folder(folder, args.force);

        check::CheckOptions options;
        options.two_mesh = !args.single_mesh;
        options.max_dofs = args.max_dofs;
        const bool show_progress = !args.quiet && !args.json && is_terminal(out);
        Progress progress(show_progress, options.two_mesh
                                             ? "meshing, solving and checking (two meshes)"
                                             : "meshing, solving and checking");
        const check::CheckOutcome o = check::check_connection(c, options);
        progress.done();

        report::SummaryOptions summary;
        summary.input_file = args.file;
        summary.colour = is_terminal(out);
        if (writing) {
            Progress writing_progress(show_progress, "writing the calc sheet and data files");
            report::RunInfo run;
            run.version = LAPWING_VERSION;
            run.build_id = LAPWING_BUILD_ID;
            run.command_line = args.command_line;
            run.input_file = args.file;
            run.input_sha256 = report::sha256_hex(text);
            run.resolved_model = input::write_resolved(c);
            run.resolved_sha256 = report::sha256_hex(run.resolved_model);
            run.reproducible = args.reproducible;
            run.date = args.reproducible ? report::reproducible_date : utc_now();
            run.two_mesh = options.two_mesh;

            const std::vector<report::Figure> figures = report::all_figures(o);
            const auto put = [&](const std::string& name, const std::string& content) {
                write_atomically(folder / name, content);
                summary.files.push_back(name);
            };
            if (wants(c, "html")) put("report.html", report::calc_sheet_html(o, run, figures));
            if (wants(c, "json")) put("results.json", report::results_json(o, run));
            if (wants(c, "vtu")) put("model.vtu", report::model_vtu(o));
            if (c.report.figures)
                for (const report::Figure& f : figures) put(f.file, f.svg);
            summary.folder = folder.string();
        }
        if (args.json)
            out << report::summary_json(o, summary);
        else if (!args.quiet)
            out << report::terminal_summary(o, summary);
        return static_cast<int>(o.table.passes() ? ExitCode::all_pass : ExitCode::check_failed);
    } catch (...) {
        return report_failure(err);
    }
}

} // namespace lapwing::cli
