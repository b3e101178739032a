// Benchmark of the convergence mesh's contact start and of the concurrent
// check, on every shipped template and project with bearing ties:
//   - contact passes per case on the model's mesh, and on the finer
//     convergence mesh started cold (all hole nodes closed, then the previous
//     case's set) and warm (each case from the model mesh's settled set);
//     analysis seconds of each, and the largest relative difference of the
//     bolt forces between cold and warm (round-off only: the settled sets
//     must be equal, which is checked);
//   - check_connection seconds, sequential and concurrent.
//   bench_contact_start [--repeats N]   (medians of N runs, default 3)
//   bench_contact_start --smoke         (one run of templates/lap-splice.toml)
#include "analysis/analyse.hpp"
#include "analysis/contact_seed.hpp"
#include "check/pipeline.hpp"
#include "input/load_connection.hpp"

#include <algorithm>
#include <chrono>
#include <cstdio>
#include <cstring>
#include <filesystem>
#include <fstream>
#include <functional>
#include <sstream>
#include <string>
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
std::string passes(const analysis::Results& r) {
    char buffer[256] = "";
    size_t used = 0;
    for (const auto& c : r.cases)
        if (used < sizeof buffer)
            used += static_cast<size_t>(std::snprintf(buffer + used, sizeof buffer - used, "%s%d",
                                                      used ? "," : "", c.contact_iterations));
    return buffer;
}
} // namespace

int main(int argc, char** argv) {
    int repeats = 3;
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

    int failures = 0;
    for (const auto& path : files) {
        std::ifstream in(path);
        std::stringstream text;
        text << in.rdbuf();
        const model::Connection c = input::load_connection(text.str(), path.filename().string());
        const analysis::PlateLayout layout = analysis::plate_layout(c);
        const mesh::MeshSettings settings = analysis::mesh_settings(c);
        const mesh::MeshSettings fine_settings = check::fine_mesh_settings(layout.region, settings);
        const mesh::Mesh coarse = mesh::build_mesh(layout.region, settings);
        const mesh::Mesh fine = mesh::build_mesh(layout.region, fine_settings);
        const size_t n_cases = c.load_cases.size() + c.combinations.size();

        analysis::Results rc, cold, warm;
        std::vector<double> t_coarse, t_cold, t_warm, t_seq, t_conc;
        for (int k = 0; k < repeats; ++k) {
            analysis::ContactBoard board(n_cases);
            const analysis::ContactHooks publish = board.publisher(), read = board.reader();
            t_coarse.push_back(
                seconds([&] { rc = analysis::analyse(c, coarse, layout, nullptr, &publish); }));
            board.finish();
            t_cold.push_back(seconds([&] { cold = analysis::analyse(c, fine, layout); }));
            t_warm.push_back(
                seconds([&] { warm = analysis::analyse(c, fine, layout, nullptr, &read); }));
            check::CheckOptions options;
            options.concurrent = false;
            t_seq.push_back(seconds([&] { (void)check::check_connection(c, options); }));
            options.concurrent = true;
            t_conc.push_back(seconds([&] { (void)check::check_connection(c, options); }));
        }
        if (!rc.problem.has_contact) {
            std::printf("%-22s no bearing contact\n", path.filename().string().c_str());
            continue;
        }
        double largest = 0;
        bool same_sets = true;
        for (size_t i = 0; i < cold.cases.size(); ++i) {
            same_sets = same_sets && cold.cases[i].contact_closed == warm.cases[i].contact_closed;
            double scale = 0;
            for (const auto& b : cold.cases[i].bolts) scale = std::max(scale, b.magnitude);
            for (size_t b = 0; b < cold.cases[i].bolts.size(); ++b)
                largest = std::max(
                    largest,
                    (cold.cases[i].bolts[b].force - warm.cases[i].bolts[b].force).norm() / scale);
        }
        if (!same_sets) ++failures;
        std::printf("%-22s coarse %6d dofs passes %-12s %7.3f s | fine %6d dofs cold %-12s "
                    "%7.3f s  warm %-12s %7.3f s | sets %s, bolt forces differ %.1e | check "
                    "sequential %7.3f s concurrent %7.3f s\n",
                    path.filename().string().c_str(), rc.problem.model.n_dofs(), passes(rc).c_str(),
                    median(t_coarse), cold.problem.model.n_dofs(), passes(cold).c_str(),
                    median(t_cold), passes(warm).c_str(), median(t_warm),
                    same_sets ? "equal" : "DIFFER", largest, median(t_seq), median(t_conc));
    }
    return failures == 0 ? 0 : 1;
}
