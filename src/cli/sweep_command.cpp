// `lapwing sweep FILE --vary ...`: the grid through the worker pool with a
// progress line, then sweep.csv and sweep.html written atomically; and
// `lapwing merge`, which joins shard CSVs.
//
// --reports: each built variant's files, exactly as `lapwing check -o` writes
// them (check_outputs.cpp), in DIR/variants/NAME/, written on the worker
// thread as the variant finishes. A variant whose files cannot be written
// is noted in sweep.csv's report column; the sweep goes on, and ends with
// exit code 3.
//
// Interrupt (SIGINT): no new variant starts, the running ones finish, and
// the completed rows are written, in variant order, to
// sweep-interrupted.csv (temporary file, then rename); sweep.csv and
// sweep.html are not written, so neither is ever partial or stale-mixed.
// A second SIGINT ends the program at once (nothing half-written either).
#include "cli/sweep_command.hpp"

#include "cli/check_outputs.hpp"
#include "check/pipeline.hpp"
#include "cli/commands.hpp"
#include "cli/files.hpp"
#include "core/error.hpp"
#include "input/load_connection.hpp"
#include "sweep/csv.hpp"
#include "sweep/find_min.hpp"
#include "sweep/grid.hpp"
#include "sweep/html.hpp"
#include "sweep/progress.hpp"
#include "sweep/runner.hpp"

#include <algorithm>
#include <atomic>
#include <chrono>
#include <csignal>
#include <filesystem>
#include <fmt/format.h>
#include <map>
#include <optional>
#include <ostream>
#include <unistd.h>

namespace lapwing::cli {

namespace {

std::atomic<bool> interrupted{false};
static_assert(std::atomic<bool>::is_always_lock_free,
              "a signal handler may only touch lock-free atomics");

extern "C" void on_interrupt(int) {
    static const char message[] =
        "\nlapwing sweep: interrupted; finishing the variants running now (Ctrl-C again to "
        "stop at once)\n";
    if (interrupted.exchange(true)) {
        std::signal(SIGINT, SIG_DFL);
        std::raise(SIGINT);
        return;
    }
    [[maybe_unused]] const auto n = ::write(STDERR_FILENO, message, sizeof message - 1);
}

// Restores the previous handler when the sweep ends.
struct InterruptGuard {
    InterruptGuard() {
        interrupted = false;
        previous = std::signal(SIGINT, on_interrupt);
    }
    ~InterruptGuard() { std::signal(SIGINT, previous); }
    InterruptGuard(const InterruptGuard&) = delete;
    InterruptGuard& operator=(const InterruptGuard&) = delete;
    void (*previous)(int) = SIG_DFL;
};

std::string csv_text(const std::vector<sweep::Axis>& axes,
                     const std::map<int, std::pair<sweep::Variant, sweep::VariantResult>>& rows,
                     bool with_reports) {
    std::string text = sweep::csv_header(axes, with_reports);
    for (const auto& [index, row] : rows)
        text += sweep::csv_row(axes, row.first, row.second, with_reports);
    return text;
}

// The calc sheet records how it was made: the sweep's command line as typed
// and which variant this is, so the sheet of a variant never claims to come
// from a `lapwing check` that was not run.
std::string variant_command_line(const std::string& sweep_command, const sweep::Variant& v,
                                 size_t grid_size) {
    std::string sets;
    for (const std::string& s : v.sets) sets += " --set " + s;
    return fmt::format("{} [variant {} of {}:{}]", sweep_command, v.index + 1, grid_size, sets);
}

// The resource guard of `lapwing check` for every variant, before any is
// meshed: one too large refuses the whole sweep, naming it. A variant that
// does not load is left to the run, which records why.
void check_variant_resources(const std::string& text, const SweepArgs& args,
                             const std::vector<sweep::Variant>& variants) {
    for (const sweep::Variant& v : variants) {
        std::vector<std::string> sets = args.sets;
        sets.insert(sets.end(), v.sets.begin(), v.sets.end());
        std::optional<model::Connection> c;
        try {
            c = input::load_connection(text, args.file, sets);
        } catch (const InputError&) {
            continue;
        }
        try {
            check::check_resources(*c, !args.single_mesh, args.max_dofs);
        } catch (const analysis::ResourceLimitError& e) {
            std::string which;
            for (const std::string& s : v.sets) which += (which.empty() ? "" : ", ") + s;
            throw analysis::ResourceLimitError(
                fmt::format("variant {} ({}): {}", v.index + 1, which, e.what()));
        }
    }
}

} // namespace

int run_sweep(const SweepArgs& args, std::ostream& out, std::ostream& err) {
    namespace fs = std::filesystem;
    try {
        const auto start = std::chrono::steady_clock::now();
        const std::string text = read_input_file(args.file);
        // The template with the user's own overrides must be valid by itself:
        // a typo there would otherwise fail every variant the same way.
        (void)input::load_connection(text, args.file, args.sets);
        std::vector<sweep::Axis> axes;
        for (const std::string& v : args.vary) axes.push_back(sweep::parse_axis(v));
        if (axes.empty())
            throw InputError(Diagnostic{"", 0, 0, "--vary",
                                        "is needed at least once, e.g. --vary t=8:30:2", ""});
        const std::vector<sweep::Variant> grid = sweep::make_grid(axes);
        const int search_axis = args.find_min.empty() ? -1 : sweep::axis_index(axes, args.find_min);
        std::vector<sweep::Variant> variants = grid;
        if (!args.shard.empty()) {
            // The search picks each round's variants from the last round's
            // ratios, so it cannot be dealt out by variant number; and one
            // line of a thickness search is a handful of runs, not worth
            // spreading. What is worth spreading is the other axes.
            if (search_axis >= 0)
                throw InputError(Diagnostic{
                    "", 0, 0, "--shard",
                    fmt::format(
                        "cannot be combined with --find-min: the search chooses its next "
                        "variants from the ratios found so far, so it cannot be split by "
                        "variant number. To spread it over machines, give each job its own "
                        "values of the other keys and the whole range of {0} (job 1: --vary "
                        "pitch=70 --vary {0}=..., job 2: --vary pitch=75 ...), each into its own "
                        "-o folder; or run the full grid with --shard I/N and no --find-min, "
                        "join the parts with lapwing merge, and read the smallest passing {0} "
                        "from sweep.csv (see docs/sweep.md)",
                        args.find_min),
                    ""});
            variants = sweep::shard_of(grid, sweep::parse_shard(args.shard));
        }
        if (std::error_code ec; !fs::is_directory(args.output_folder, ec))
            throw InputError(
                Diagnostic{"", 0, 0, "-o", args.output_folder + ": there is no such folder", ""});
        check_variant_resources(text, args, search_axis >= 0 ? grid : variants);

        sweep::RunOptions options;
        options.threads = args.threads > 0 ? args.threads : sweep::default_threads();
        options.two_mesh = !args.single_mesh;
        options.max_dofs = args.max_dofs;
        options.reuse = !args.no_reuse;
        options.stop = &interrupted;
        const fs::path folder(args.output_folder);
        if (args.reports) {
            std::error_code ec;
            fs::create_directories(folder / "variants", ec);
            if (ec || !fs::is_directory(folder / "variants", ec))
                throw OutputError("cannot make the folder " + (folder / "variants").string() +
                                  (ec ? ": " + ec.message() : ": a file of that name is there"));
            options.on_outcome = [&](const sweep::Variant& v, const check::CheckOutcome& o) {
                const std::string name = sweep::variant_folder_name(axes, v, grid.size());
                const fs::path into = folder / "variants" / name;
                prepare_folder(into, false);
                const report::RunInfo run =
                    make_run_info(args.file, text, o.connection,
                                  variant_command_line(args.command_line, v, grid.size()),
                                  args.reproducible, options.two_mesh);
                write_check_outputs(into, o.connection, o, run);
                return (fs::path("variants") / name).generic_string();
            };
        }
        const bool terminal = ::isatty(STDERR_FILENO) == 1;
        int n_done = 0, n_failed = 0, n_total = static_cast<int>(variants.size());
        sweep::Progress progress(n_total, terminal);
        std::map<int, std::pair<sweep::Variant, sweep::VariantResult>> rows;
        options.on_done = [&](const sweep::VariantResult& r) {
            rows[r.index] = {grid[static_cast<size_t>(r.index)], r};
            ++n_done;
            if (!r.built) ++n_failed;
            if (!args.quiet)
                err << progress.update(
                           n_done, n_failed,
                           std::chrono::duration<double>(std::chrono::steady_clock::now() - start)
                               .count())
                    << std::flush;
        };
        InterruptGuard guard;
        sweep::Runner runner(text, args.file, args.sets, options);
        if (!args.quiet)
            err << fmt::format("sweep: {} variants of {} on {} thread{}{}\n",
                               search_axis >= 0 ? "up to " + std::to_string(grid.size())
                                                : std::to_string(variants.size()),
                               args.file, options.threads, options.threads == 1 ? "" : "s",
                               args.shard.empty() ? "" : ", shard " + args.shard);

        std::optional<sweep::FindMinResult> found;
        std::vector<sweep::VariantResult> results;
        if (search_axis >= 0) {
            found = sweep::find_min(
                axes, grid, search_axis,
                [&](std::span<const sweep::Variant> batch) { return runner.run(batch); });
            results = found->evaluated;
        } else {
            results = runner.run(variants);
        }
        if (!args.quiet) err << progress.finish();

        if (interrupted) {
            const fs::path partial = folder / "sweep-interrupted.csv";
            write_atomically(partial, csv_text(axes, rows, args.reports));
            err << fmt::format("lapwing sweep: interrupted after {} of {} variants; their rows "
                               "are in {}; sweep.csv and sweep.html were not written\n",
                               rows.size(), n_total, partial.string());
            return 130;
        }

        sweep::SweepPage page;
        page.title = fs::path(args.file).filename().string();
        page.command_line = args.command_line;
        page.axes = axes;
        page.plot_axis = search_axis >= 0 ? search_axis : 0;
        for (size_t k = 0; k < axes.size() && search_axis < 0; ++k)
            if (axes[k].values.size() > 1) {
                page.plot_axis = static_cast<int>(k);
                break;
            }
        for (const sweep::VariantResult& r : results) {
            page.variants.push_back(grid[static_cast<size_t>(r.index)]);
            page.results.push_back(r);
        }
        page.find_min = found;
        page.reports = args.reports;
        write_atomically(folder / "sweep.csv", csv_text(axes, rows, args.reports));
        write_atomically(folder / "sweep.html", sweep::render_sweep_html(page));

        int n_built = 0, n_pass = 0;
        for (const auto& r : results) n_built += r.built, n_pass += r.built && r.passes;
        if (found)
            for (const sweep::MinimumOnLine& m : found->lines) {
                std::string where;
                for (size_t k = 0, j = 0; k < axes.size(); ++k)
                    if (static_cast<int>(k) != search_axis)
                        where += fmt::format("{}{}={:g}", where.empty() ? " at " : ", ",
                                             axes[k].name, m.others[j++]);
                if (!m.warning.empty()) err << "warning: " << m.warning << "; ran the full line\n";
                out << fmt::format("smallest passing {}{}: {} ({} variants run)\n",
                                   axes[static_cast<size_t>(search_axis)].name, where,
                                   m.smallest ? fmt::format("{:g}", *m.smallest) : "none passes",
                                   m.n_sampled);
            }
        const check::ReuseStats reuse = runner.reuse_stats();
        const double seconds =
            std::chrono::duration<double>(std::chrono::steady_clock::now() - start).count();
        if (!args.quiet)
            out << fmt::format("{} variants: {} pass, {} fail, {} could not be built; "
                               "{:.1f} s; meshes reused {} of {}, factorizations reused {} of "
                               "{}\nwrote {} and {}\n",
                               results.size(), n_pass, n_built - n_pass,
                               static_cast<int>(results.size()) - n_built, seconds,
                               reuse.meshes_reused, reuse.meshes_reused + reuse.meshes_built,
                               reuse.solvers_reused, reuse.solvers_reused + reuse.solvers_built,
                               (folder / "sweep.csv").string(), (folder / "sweep.html").string());
        int n_unwritten = 0;
        for (const auto& r : results) n_unwritten += !r.report_error.empty();
        if (args.reports && !args.quiet)
            out << fmt::format("wrote the files of {} variants under {}\n", n_built - n_unwritten,
                               (folder / "variants").string());
        if (n_unwritten > 0) {
            const auto first = std::find_if(results.begin(), results.end(),
                                            [](const auto& r) { return !r.report_error.empty(); });
            err << fmt::format("error: the files of {} variant{} could not be written (the report "
                               "column of sweep.csv says which); the first: {}\n",
                               n_unwritten, n_unwritten == 1 ? "" : "s", first->report_error);
        }
        if (n_built == 0 && !results.empty()) {
            err << "error: no variant could be built; the first says: " << results.front().error
                << "\n";
            return static_cast<int>(ExitCode::bad_input);
        }
        return n_unwritten > 0 ? static_cast<int>(ExitCode::output_failed) : 0;
    } catch (...) {
        return report_failure(err);
    }
}

int run_merge(const std::vector<std::string>& files, const std::string& output, int expect,
              std::ostream& out, std::ostream& err) {
    try {
        std::vector<sweep::NamedCsv> shards;
        for (const std::string& f : files) shards.push_back({f, read_input_file(f)});
        const std::string merged = sweep::merge_sweep_csvs(shards, expect);
        if (output.empty()) {
            out << merged;
        } else {
            write_atomically(output, merged);
            err << fmt::format("wrote {} from {} files\n", output, files.size());
        }
        return 0;
    } catch (...) {
        return report_failure(err);
    }
}

} // namespace lapwing::cli
