// Every shipped template and the demo project analyse, and every load case
// and combination is in equilibrium: |Σ applied + Σ reactions| / |Σ applied|
// ≤ 1e-9 (statics).
#include "run_connection.hpp"

#include <doctest/doctest.h>
#include <filesystem>
#include <fstream>
#include <sstream>

TEST_CASE("every template and the demo project: equilibrium residual <= 1e-9 in every case") {
    std::vector<std::filesystem::path> files;
    for (const auto& e : std::filesystem::directory_iterator(
             std::filesystem::path(LAPWING_SOURCE_DIR) / "templates"))
        if (e.path().extension() == ".toml") files.push_back(e.path());
    for (const auto& e : std::filesystem::recursive_directory_iterator(
             std::filesystem::path(LAPWING_SOURCE_DIR) / "projects"))
        if (e.path().extension() == ".toml") files.push_back(e.path());
    std::sort(files.begin(), files.end());
    REQUIRE(files.size() >= 6);
    for (const auto& path : files) {
        CAPTURE(path.filename().string());
        std::ifstream in(path);
        std::stringstream text;
        text << in.rdbuf();
        const auto run = lapwing::test::run_connection(text.str());
        REQUIRE(!run.results.cases.empty());
        for (const auto& c : run.results.cases) {
            CAPTURE(c.name);
            MESSAGE(path.filename().string()
                    << " / " << c.name << ": residual " << c.equilibrium_residual << ", passes "
                    << c.contact_iterations);
            CHECK(c.equilibrium_residual <= 1e-9);
            CHECK(c.solver_residual <= 1e-9);
        }
    }
}
