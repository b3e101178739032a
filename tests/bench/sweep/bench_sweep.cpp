// Benchmark of `lapwing sweep` (issue 8): a thickness sweep of the demo
// project (projects/brackenfold-footbridge/L3-gusset.toml), 50 variants
// t = 8, 8.5, ..., 32.5 mm, through the sweep's own Runner (what the
// command runs, without the terminal and the file writing), in four
// configurations in one process:
//   -j 1 with reuse, -j 2 with reuse, -j 1 without reuse
//   (and -j 2 without reuse with --all)
// Rounds interleave the configurations (A B C, A B C, ...) so slow spells
// of this shared machine fall on all of them alike; each figure is the
// median over the rounds. Besides the wall time, the process CPU time of
// each sweep is measured: on a machine shared with other work the wall
// time of one thread stretches with the load, its CPU time much less, so
// the reuse saving is also given in CPU time. Parallel efficiency needs
// wall time and is only meaningful when the machine is otherwise idle
// (the load average is printed at the start and the end). Every configuration's runner starts with
// an empty cache, as a fresh `lapwing sweep` does. The CSVs of all runs must be identical (the
// benchmark exits 1 otherwise), so the timings are of runs that gave the same answers.
//   bench_sweep [--repeats N] [--single-mesh] [--variants N] [--all]
//     --repeats N    rounds (default 3)
//     --single-mesh  skip each variant's convergence mesh (quicker)
//     --variants N   the first N thicknesses only (default 50; a smoke run: 4)
//     --all          also -j 2 without reuse
#include "sweep/csv.hpp"
#include "sweep/grid.hpp"
#include "sweep/runner.hpp"

#include <algorithm>
#include <chrono>
#include <cstdio>
#include <cstdlib>
#include <cstring>
#include <fstream>
#include <mutex>
#include <sstream>
#include <string>
#include <thread>
#include <time.h>
#include <vector>

using namespace lapwing;

namespace {

double median(std::vector<double> v) {
    std::sort(v.begin(), v.end());
    const size_t n = v.size();
    return n % 2 ? v[n / 2] : 0.5 * (v[n / 2 - 1] + v[n / 2]);
}

std::string first_line_of(const char* path, const char* prefix) {
    std::ifstream in(path);
    for (std::string line; std::getline(in, line);)
        if (line.rfind(prefix, 0) == 0) return line;
    return "";
}

double cpu_seconds() {
    timespec t{};
    clock_gettime(CLOCK_PROCESS_CPUTIME_ID, &t);
    return static_cast<double>(t.tv_sec) + 1e-9 * static_cast<double>(t.tv_nsec);
}

struct Config {
    const char* name;
    int threads;
    bool reuse;
    std::vector<double> wall;                   // per round, s
    std::vector<double> cpu;                    // per round: process CPU time, s
    std::vector<double> sum_variant;            // per round: Σ per-variant seconds
    std::vector<double> sum_mesh, sum_analysis; // per round: Σ of those stages' seconds
    check::ReuseStats reuse_stats;
};

} // namespace

int main(int argc, char** argv) {
    int repeats = 3, n_variants = 50;
    bool single_mesh = false, all = false;
    for (int i = 1; i < argc; ++i) {
        if (std::strcmp(argv[i], "--repeats") == 0 && i + 1 < argc)
            repeats = std::max(1, std::atoi(argv[++i]));
        else if (std::strcmp(argv[i], "--variants") == 0 && i + 1 < argc)
            n_variants = std::clamp(std::atoi(argv[++i]), 1, 50);
        else if (std::strcmp(argv[i], "--single-mesh") == 0)
            single_mesh = true;
        else if (std::strcmp(argv[i], "--all") == 0)
            all = true;
        else {
            std::fprintf(
                stderr,
                "usage: bench_sweep [--repeats N] [--single-mesh] [--variants N] [--all]\n");
            return 2;
        }
    }
    const std::string file =
        std::string(LAPWING_SOURCE_DIR) + "/projects/brackenfold-footbridge/L3-gusset.toml";
    std::ifstream in(file);
    std::stringstream buffer;
    buffer << in.rdbuf();
    const std::string text = buffer.str();
    if (text.empty()) {
        std::fprintf(stderr, "cannot read %s\n", file.c_str());
        return 2;
    }
    // 8 + 0.5 k for k = 0..49: 8 to 32.5 mm, 50 variants.
    char vary[64];
    std::snprintf(vary, sizeof vary, "t=8:%g:0.5", 8 + 0.5 * (n_variants - 1));
    const std::vector<sweep::Axis> axes = {sweep::parse_axis(vary)};
    const std::vector<sweep::Variant> grid = sweep::make_grid(axes);

    std::printf("bench_sweep: build %s; %s; %u hardware threads\n", LAPWING_BUILD_ID,
                first_line_of("/proc/cpuinfo", "model name").c_str(),
                std::thread::hardware_concurrency());
    std::printf("L3-gusset.toml --vary t=8:%g:0.5 (%zu variants), %s, %d round%s\n",
                axes[0].values.back(), grid.size(),
                single_mesh ? "--single-mesh" : "two meshes per variant (the default)", repeats,
                repeats == 1 ? "" : "s");
    std::printf("load average at start: %s\n", first_line_of("/proc/loadavg", "").c_str());

    std::vector<Config> configs = {{"-j 1, reuse", 1, true, {}, {}, {}, {}, {}, {}},
                                   {"-j 2, reuse", 2, true, {}, {}, {}, {}, {}, {}},
                                   {"-j 1, no reuse", 1, false, {}, {}, {}, {}, {}, {}}};
    if (all) configs.push_back({"-j 2, no reuse", 2, false, {}, {}, {}, {}, {}, {}});
    std::string reference_csv;
    int n_pass = 0;
    for (int round = 0; round < repeats; ++round)
        for (Config& cfg : configs) {
            sweep::RunOptions options;
            options.threads = cfg.threads;
            options.two_mesh = !single_mesh;
            options.reuse = cfg.reuse;
            // Where a variant's time goes (the pipeline's own stage timers):
            // reuse can save at most the meshing and the symbolic analysis.
            std::mutex stage_mutex;
            double mesh_s = 0, analysis_s = 0;
            options.on_outcome = [&](const sweep::Variant&, const check::CheckOutcome& o) {
                std::lock_guard lock(stage_mutex);
                mesh_s += o.seconds.mesh;
                analysis_s += o.seconds.analysis;
                return std::string();
            };
            sweep::Runner runner(text, "L3-gusset.toml", {}, options);
            const double cpu_start = cpu_seconds();
            const auto start = std::chrono::steady_clock::now();
            const std::vector<sweep::VariantResult> results = runner.run(grid);
            const double wall =
                std::chrono::duration<double>(std::chrono::steady_clock::now() - start).count();
            const double cpu = cpu_seconds() - cpu_start;
            double sum = 0;
            std::string csv = sweep::csv_header(axes);
            n_pass = 0;
            for (size_t i = 0; i < results.size(); ++i) {
                sum += results[i].seconds;
                n_pass += results[i].built && results[i].passes;
                csv += sweep::csv_row(axes, grid[i], results[i]);
            }
            if (reference_csv.empty()) reference_csv = csv;
            if (results.size() != grid.size() || csv != reference_csv) {
                std::fprintf(stderr, "FAIL: %s gave a different sweep.csv\n", cfg.name);
                return 1;
            }
            cfg.wall.push_back(wall);
            cfg.cpu.push_back(cpu);
            cfg.sum_variant.push_back(sum);
            cfg.sum_mesh.push_back(mesh_s);
            cfg.sum_analysis.push_back(analysis_s);
            cfg.reuse_stats = runner.reuse_stats();
            std::printf("round %d  %-15s wall %8.2f s  cpu %8.2f s\n", round + 1, cfg.name, wall,
                        cpu);
            std::fflush(stdout);
        }
    std::printf("load average at end: %s\n", first_line_of("/proc/loadavg", "").c_str());
    std::printf("%d of %zu variants pass; all %zu runs gave byte-identical CSVs\n\n", n_pass,
                grid.size(), configs.size() * static_cast<size_t>(repeats));

    const double n = static_cast<double>(grid.size());
    std::printf("%-15s %9s %11s %9s %11s %12s %s\n", "configuration", "wall s", "wall s/var",
                "cpu s", "cpu s/var", "Σ variant s", "meshes/factorizations built");
    for (const Config& c : configs)
        std::printf("%-15s %9.2f %11.3f %9.2f %11.3f %12.2f %s\n", c.name, median(c.wall),
                    median(c.wall) / n, median(c.cpu), median(c.cpu) / n, median(c.sum_variant),
                    c.reuse ? (std::to_string(c.reuse_stats.meshes_built) + " / " +
                               std::to_string(c.reuse_stats.solvers_built))
                                  .c_str()
                            : "every variant (no cache)");
    std::printf("\n%-15s %12s %12s   (Σ over the variants, s; the rest is the checks)\n",
                "configuration", "mesh", "analysis");
    for (const Config& c : configs)
        std::printf("%-15s %12.2f %12.2f\n", c.name, median(c.sum_mesh), median(c.sum_analysis));
    const double a = median(configs[0].wall), b = median(configs[1].wall),
                 c = median(configs[2].wall);
    std::printf("\nparallel efficiency T(-j 1) / (2 T(-j 2)), reuse on: %.2f\n", a / (2 * b));
    std::printf(
        "saving from reuse at -j 1, 1 - T(reuse) / T(no reuse): wall %.1f %%, cpu %.1f %%\n",
        100 * (1 - a / c), 100 * (1 - median(configs[0].cpu) / median(configs[2].cpu)));
    if (configs.size() > 3)
        std::printf("saving from reuse at -j 2: wall %.1f %%, cpu %.1f %%\n",
                    100 * (1 - b / median(configs[3].wall)),
                    100 * (1 - median(configs[1].cpu) / median(configs[3].cpu)));
    return 0;
}
