// `lapwing check FILE [-o DIR]`: the whole pipeline, then the report stage's
// outputs written to DIR (check_outputs.cpp: each through a temporary file
// and a rename), and the terminal summary (or its JSON form).
#include "check/pipeline.hpp"
#include "cli/check_outputs.hpp"
#include "cli/commands.hpp"
#include "cli/files.hpp"
#include "core/error.hpp"
#include "input/load_connection.hpp"
#include "report/progress_line.hpp"
#include "report/terminal_summary.hpp"

#include <chrono>
#include <condition_variable>
#include <filesystem>
#include <fmt/format.h>
#include <future>
#include <iostream>
#include <mutex>
#include <ostream>
#include <sys/ioctl.h>
#include <thread>
#include <unistd.h>

namespace lapwing::cli {

namespace {

namespace fs = std::filesystem;

bool is_terminal(const std::ostream& out) {
    return &out == &std::cout && ::isatty(STDOUT_FILENO);
}

// The stage that is running and the time since the run started, on one
// terminal line redrawn twice a second; nothing for runs under a second;
// erased when done. The text comes from report/progress_line.hpp.
class Progress {
public:
    explicit Progress(bool enabled) {
        if (!enabled) return;
        const auto start = std::chrono::steady_clock::now();
        thread_ = std::jthread([this, start](std::stop_token stop) {
            std::unique_lock lock(mutex_);
            const auto elapsed = [&] {
                return std::chrono::duration<double>(std::chrono::steady_clock::now() - start)
                    .count();
            };
            const auto delay = std::chrono::duration<double>(report::progress_delay_seconds);
            if (wake_.wait_for(lock, stop, delay, [] { return false; }) || stop.stop_requested())
                return;
            while (!stop.stop_requested()) {
                std::cout << report::progress_line(stage_, elapsed(), terminal_columns())
                          << std::flush;
                shown_ = true;
                wake_.wait_for(lock, stop, std::chrono::milliseconds(500), [] { return false; });
            }
        });
    }
    ~Progress() { done(); }
    // The stage now running (shown from the next redraw on).
    void stage(std::string words) {
        const std::lock_guard lock(mutex_);
        stage_ = std::move(words);
    }
    void done() {
        if (!thread_.joinable()) return;
        thread_.request_stop();
        thread_.join();
        if (shown_) std::cout << report::progress_erase() << std::flush;
    }

private:
    static int terminal_columns() {
        winsize size{};
        if (::ioctl(STDOUT_FILENO, TIOCGWINSZ, &size) == 0 && size.ws_col > 0) return size.ws_col;
        return 80;
    }
    std::mutex mutex_;
    std::condition_variable_any wake_;
    std::string stage_ = "starting";
    bool shown_ = false;
    std::jthread thread_; // started in the constructor's body, after every member above
};

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
        Progress progress(show_progress);
        options.on_stage = [&](check::Stage s) { progress.stage(check::words(s)); };
        // The figures and model.vtu need only the model's mesh: rendered while
        // the convergence mesh is solved.
        ModelParts parts;
        if (writing)
            options.on_model_outcome = [&](const check::CheckOutcome& model_only) {
                return std::async(std::launch::async,
                                  [&] { parts = render_model_parts(c, model_only); });
            };
        const check::CheckOutcome o = check::check_connection(c, options);

        report::SummaryOptions summary;
        summary.input_file = args.file;
        summary.colour = is_terminal(out);
        if (writing) {
            progress.stage("writing the calc sheet and data files");
            const report::RunInfo run = make_run_info(args.file, text, c, args.command_line,
                                                      args.reproducible, options.two_mesh);
            summary.files = write_check_outputs(folder, c, o, run, parts);
            summary.folder = folder.string();
        }
        progress.done();
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
