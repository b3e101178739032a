// `lapwing check FILE [-o DIR]`: the whole pipeline, then the report stage's
// outputs written to DIR (check_outputs.cpp: each through a temporary file
// and a rename), and the terminal summary (or its JSON form).
#include "check/pipeline.hpp"
#include "cli/check_outputs.hpp"
#include "cli/commands.hpp"
#include "cli/files.hpp"
#include "core/error.hpp"
#include "input/load_connection.hpp"
#include "report/terminal_summary.hpp"

#include <chrono>
#include <condition_variable>
#include <filesystem>
#include <fmt/format.h>
#include <iostream>
#include <mutex>
#include <ostream>
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

} // namespace

int run_check(const CheckArgs& args, std::ostream& out, std::ostream& err) {
    try {
        const std::string text = read_input_file(args.file);
        const auto c = input::load_connection(text, args.file, args.sets);
        const bool writing = !args.output_folder.empty();
        const fs::path folder(args.output_folder);
        if (writing) prepare_folder(folder, args.force);

        check::CheckOptions options;
        options.two_mesh = !args.single_mesh;
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
            const report::RunInfo run = make_run_info(args.file, text, c, args.command_line,
                                                      args.reproducible, options.two_mesh);
            summary.files = write_check_outputs(folder, c, o, run);
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
