// The worker pool: std::jthread workers take the next variant from a shared
// counter; the calling thread hands each finished result to on_done. A pool
// of a few lines is enough here (one task per variant, seconds each), so no
// library is needed.
#include "sweep/runner.hpp"

#include "core/error.hpp"
#include "input/load_connection.hpp"

#include <algorithm>
#include <chrono>
#include <condition_variable>
#include <deque>
#include <mutex>
#include <thread>

namespace lapwing::sweep {

namespace {

// One line per problem, joined: a CSV cell cannot hold the caret drawing.
std::string one_line(const InputError& e) {
    constexpr size_t shown = 3; // the rest counted: a CSV cell, not a report
    std::string out;
    const auto& all = e.diagnostics();
    for (size_t i = 0; i < std::min(all.size(), shown); ++i) {
        std::string text = all[i].format();
        text = text.substr(0, text.find('\n'));
        out += (out.empty() ? "" : "; ") + text;
    }
    if (all.size() > shown) out += "; and " + std::to_string(all.size() - shown) + " more";
    return out.empty() ? std::string(e.what()) : out;
}

std::string flatten(std::string s) {
    for (char& ch : s)
        if (ch == '\n' || ch == '\r') ch = ' ';
    return s;
}

} // namespace

int default_threads() {
    return static_cast<int>(std::max(1u, std::thread::hardware_concurrency()));
}

void summarise(const check::CheckTable& table, VariantResult& out) {
    out.passes = table.passes();
    out.has_ratio = table.governing >= 0;
    if (out.has_ratio) {
        const check::CheckRow& g = table.rows[static_cast<size_t>(table.governing)];
        out.governing_ratio = g.ratio;
        out.governing_id = g.id;
        out.governing_family = check::word(g.family);
    }
    for (size_t f = 0; f < n_families; ++f) {
        const int r = table.governing_by_family[f];
        if (r >= 0) out.family_ratio[f] = table.rows[static_cast<size_t>(r)].ratio;
    }
}

Runner::Runner(std::string text, std::string file, std::vector<std::string> sets,
               RunOptions options)
    : text_(std::move(text)), file_(std::move(file)), sets_(std::move(sets)),
      options_(std::move(options)) {
    caches_.resize(static_cast<size_t>(std::max(1, options_.threads)));
}

bool Runner::stopped() const {
    return options_.stop && options_.stop->load();
}

VariantResult Runner::run_one(const Variant& variant, check::ReuseCache* cache) const {
    const auto start = std::chrono::steady_clock::now();
    VariantResult out;
    out.index = variant.index;
    out.values = variant.values;
    try {
        std::vector<std::string> sets = sets_;
        sets.insert(sets.end(), variant.sets.begin(), variant.sets.end());
        const model::Connection c = input::load_connection(text_, file_, sets);
        check::CheckOptions options;
        options.two_mesh = options_.two_mesh;
        options.max_dofs = options_.max_dofs;
        options.cache = cache;
        // With several workers the cores are taken already; a second thread
        // per variant would only double the memory of each.
        options.concurrent = options_.threads <= 1;
        const check::CheckOutcome outcome = check::check_connection(c, options);
        out.built = true;
        summarise(outcome.table, out);
        if (options_.on_outcome) {
            try {
                out.report = flatten(options_.on_outcome(variant, outcome));
            } catch (const std::exception& e) {
                out.report_error = flatten(e.what());
            }
        }
    } catch (const InputError& e) {
        out.error = flatten("bad input: " + one_line(e));
    } catch (const AnalysisError& e) {
        out.error = flatten(std::string("cannot be solved: ") + e.what());
    } catch (const std::exception& e) {
        out.error = flatten(std::string("error: ") + e.what());
    }
    out.seconds = std::chrono::duration<double>(std::chrono::steady_clock::now() - start).count();
    return out;
}

std::vector<VariantResult> Runner::run(std::span<const Variant> variants) {
    const size_t n = variants.size();
    std::vector<std::optional<VariantResult>> slots(n);
    std::mutex mutex;
    std::condition_variable done_cv;
    std::deque<size_t> finished; // positions, in completion order
    std::atomic<size_t> next{0};
    size_t n_running_workers = std::min(caches_.size(), n);
    {
        std::vector<std::jthread> workers;
        for (size_t w = 0; w < n_running_workers; ++w)
            workers.emplace_back([&, w] {
                check::ReuseCache* cache = options_.reuse ? &caches_[w] : nullptr;
                while (!stopped()) {
                    const size_t i = next.fetch_add(1);
                    if (i >= n) break;
                    VariantResult r = run_one(variants[i], cache);
                    std::lock_guard lock(mutex);
                    slots[i] = std::move(r);
                    finished.push_back(i);
                    done_cv.notify_one();
                }
                std::lock_guard lock(mutex);
                --n_running_workers;
                done_cv.notify_one();
            });
        // The calling thread reports completions until every worker is done.
        std::unique_lock lock(mutex);
        while (true) {
            done_cv.wait(lock, [&] { return !finished.empty() || n_running_workers == 0; });
            while (!finished.empty()) {
                const size_t i = finished.front();
                finished.pop_front();
                if (options_.on_done) {
                    const VariantResult copy = *slots[i];
                    lock.unlock();
                    options_.on_done(copy);
                    lock.lock();
                }
            }
            if (n_running_workers == 0) break;
        }
    } // the jthreads join here
    std::vector<VariantResult> out;
    for (auto& s : slots)
        if (s) out.push_back(std::move(*s));
    return out;
}

check::ReuseStats Runner::reuse_stats() const {
    check::ReuseStats total;
    for (const check::ReuseCache& c : caches_) {
        const check::ReuseStats s = c.stats();
        total.meshes_built += s.meshes_built;
        total.meshes_reused += s.meshes_reused;
        total.solvers_built += s.solvers_built;
        total.solvers_reused += s.solvers_reused;
    }
    return total;
}

} // namespace lapwing::sweep
