// Benchmark of the analysis stage on the shipped templates: meshing and
// analysis time per template at its default mesh, time per load case, the
// cost of 1, 10 and 100 load cases on one factorization, and the bearing
// contact iteration count and cost relative to one linear solve.
//   bench_analysis [--repeats N]      (medians of N runs, default 5)
//   bench_analysis --smoke            (one run of templates/lap-splice.toml only)
#include "analysis/analyse.hpp"
#include "analysis/fe_problem.hpp"
#include "fe/linear_static.hpp"
#include "input/load_connection.hpp"

#include <algorithm>
#include <chrono>
#include <cstdio>
#include <cstring>
#include <filesystem>
#include <fstream>
#include <functional>
#include <sstream>
#include <vector>

using namespace lapwing;

namespace {
double seconds(const std::function<void()>& f) {
    const auto start = std::chrono::steady_clock::now();
    f();
    return std::chrono::duration<double>(std::chrono::steady_clock::now() - start).count();
}
double median(std::vector<double> v) {
    std::sort(v.begin(), v.end());
    return v[v.size() / 2];
}
} // namespace

int main(int argc, char** argv) {
    int repeats = 5;
    bool smoke = false;
    for (int i = 1; i < argc; ++i) {
        if (std::strcmp(argv[i], "--smoke") == 0) smoke = true, repeats = 1;
        if (i + 1 < argc && std::strcmp(argv[i], "--repeats") == 0)
            repeats = std::max(1, std::atoi(argv[i + 1]));
    }
    std::vector<std::filesystem::path> files;
    for (const auto& e : std::filesystem::directory_iterator(
             std::filesystem::path(LAPWING_SOURCE_DIR) / "templates"))
        if (e.path().extension() == ".toml") files.push_back(e.path());
    for (const auto& e : std::filesystem::recursive_directory_iterator(
             std::filesystem::path(LAPWING_SOURCE_DIR) / "projects"))
        if (e.path().extension() == ".toml") files.push_back(e.path());
    std::sort(files.begin(), files.end());
    if (smoke)
        std::erase_if(files, [](const auto& f) { return f.filename() != "lap-splice.toml"; });

    std::printf("%-22s %7s %6s %5s %9s %9s %9s %8s | %9s %9s %9s %9s\n", "template", "dofs",
                "cases", "tie", "mesh s", "analyse s", "per case", "passes", "factor s", "1 rhs s",
                "10 rhs s", "100 rhs s");
    for (const auto& path : files) {
        std::ifstream in(path);
        std::stringstream text;
        text << in.rdbuf();
        const model::Connection c = input::load_connection(text.str(), path.filename().string());
        const analysis::PlateLayout layout = analysis::plate_layout(c);
        mesh::Mesh m;
        std::vector<double> t_mesh, t_analyse;
        analysis::Results r;
        for (int k = 0; k < repeats; ++k) {
            t_mesh.push_back(
                seconds([&] { m = mesh::build_mesh(layout.region, analysis::mesh_settings(c)); }));
            t_analyse.push_back(seconds([&] { r = analysis::analyse(c, m, layout); }));
        }
        int passes = 0;
        for (const auto& cr : r.cases) passes = std::max(passes, cr.contact_iterations);
        const size_t n_cases = r.cases.size();

        // One factorization, many right-hand sides (the contact springs held
        // at their initial, all-closed state so the model is linear).
        const analysis::FeProblem& p = r.problem;
        std::vector<double> t_factor, t1, t10, t100;
        for (int k = 0; k < repeats; ++k) {
            std::optional<fe::LinearStaticProblem> solver;
            t_factor.push_back(seconds([&] { solver.emplace(p.model, p.constraints); }));
            const fe::Loads loads =
                analysis::loads_for(c, m, p, {{c.load_cases.front().name, 1.0}});
            for (int n : {1, 10, 100}) {
                std::vector<fe::Loads> many(static_cast<size_t>(n), loads);
                const double t = seconds([&] { solver->solve(many); });
                (n == 1 ? t1 : n == 10 ? t10 : t100).push_back(t);
            }
        }
        std::printf("%-22s %7d %6zu %5s %9.4f %9.4f %9.4f %8d | %9.4f %9.4f %9.4f %9.4f\n",
                    path.filename().string().c_str(), p.model.n_dofs(), n_cases,
                    p.has_contact ? "bear" : "sprd", median(t_mesh), median(t_analyse),
                    median(t_analyse) / static_cast<double>(n_cases), passes, median(t_factor),
                    median(t1), median(t10), median(t100));
    }
    std::printf("(medians of %d runs; wall seconds; 'passes' is the largest active-set count of "
                "any case)\n",
                repeats);
    return 0;
}
