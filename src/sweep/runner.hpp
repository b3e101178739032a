// Running the variants of a sweep over a pool of worker threads: each
// variant is the template with the user's --set overrides and its own, run
// through the whole check pipeline. A variant that cannot be built or solved
// is recorded with its error. Results come back in variant order whatever
// the number of threads.
#pragma once

#include "check/check_table.hpp"
#include "check/pipeline.hpp"
#include "check/reuse_cache.hpp"
#include "sweep/grid.hpp"

#include <array>
#include <atomic>
#include <cstddef>
#include <functional>
#include <optional>
#include <span>
#include <string>
#include <vector>

namespace lapwing::sweep {

inline constexpr size_t n_families = std::size(check::all_families);

struct VariantResult {
    int index = 0;
    std::vector<double> values; // per axis
    bool built = false;         // false: the error says why
    std::string error;          // one line
    bool passes = false;        // built and no row fails
    bool has_ratio = false;     // some row has a capacity
    double governing_ratio = 0;
    std::string governing_id;     // check row id
    std::string governing_family; // check::word(family)
    // Highest ratio per family (all_families order); nullopt: no row with a capacity.
    std::array<std::optional<double>, n_families> family_ratio{};
    double seconds = 0; // wall time of this variant (not written to the CSV)
    // With on_outcome (--reports): what it returned (the variant's folder),
    // or the message of what it threw (why the files could not be written).
    std::string report, report_error;
};

struct RunOptions {
    int threads = 1;
    bool two_mesh = true;                       // the convergence mesh, as in `lapwing check`
    bool reuse = true;                          // per-worker ReuseCache
    long max_dofs = analysis::default_max_dofs; // each variant's resource guard
    // Set from a signal handler: no new variant starts; running ones finish.
    const std::atomic<bool>* stop = nullptr;
    // Called on the calling thread, in completion order, as variants finish.
    std::function<void(const VariantResult&)> on_done;
    // Called on the worker thread with the full outcome of a built variant
    // (to write each variant's calc sheet); must be thread-safe. Its return
    // value goes to VariantResult::report; an exception it throws is caught
    // into report_error, and the variant still counts as built.
    std::function<std::string(const Variant&, const check::CheckOutcome&)> on_outcome;
};

class Runner {
public:
    // `text` is the template (named `file` in messages); `sets` the user's
    // --set overrides, applied before each variant's own.
    Runner(std::string text, std::string file, std::vector<std::string> sets, RunOptions options);

    // Runs the variants; returns one result per variant, in the order given.
    // Stopped early (options.stop), the variants never started are absent.
    std::vector<VariantResult> run(std::span<const Variant> variants);

    // One variant on this thread with the given cache (null: none).
    VariantResult run_one(const Variant& variant, check::ReuseCache* cache) const;

    check::ReuseStats reuse_stats() const; // summed over the workers' caches
    bool stopped() const;

private:
    std::string text_, file_;
    std::vector<std::string> sets_;
    RunOptions options_;
    std::vector<check::ReuseCache> caches_; // one per worker, kept between run() calls
};

// The summary a sweep keeps of one pipeline outcome.
void summarise(const check::CheckTable& table, VariantResult& out);

// Default worker count: every core the machine reports (at least 1).
int default_threads();

} // namespace lapwing::sweep
