// Output-folder reuse: a folder is reused only when it holds nothing but
// lapwing's own outputs (or with --force), and the refusal names the
// foreign files.
#include "report/output_folder.hpp"

#include <doctest/doctest.h>

using namespace lapwing::report;

TEST_CASE("output folder: lapwing's own files and leftovers are recognised") {
    for (const char* name :
         {"report.html", "results.json", "model.vtu", "checks.csv", "contour.svg",
          "section-whitmore-brace.svg", "contour-1.2D_1.6L.svg", "bolt-forces-wind-2.svg",
          ".deformed-D.svg.tmp-77", ".report.html.tmp-1234"})
        CHECK(is_lapwing_output(name));
    for (const char* name :
         {"notes.txt", "G3.toml", "report.html.bak", ".bashrc", "x.svg", "contour-D.png"})
        CHECK_FALSE(is_lapwing_output(name));
}

TEST_CASE("output folder: refusal names the foreign files, --force overrides") {
    CHECK_FALSE(refuse_folder("out", {}, false));
    CHECK_FALSE(refuse_folder("out", {"report.html", "mesh.svg"}, false));
    const auto refusal = refuse_folder("out", {"a.toml", "report.html", "b.txt"}, false);
    REQUIRE(refusal);
    CHECK(refusal->find("a.toml, b.txt") != std::string::npos);
    CHECK(refusal->find("--force") != std::string::npos);
    CHECK_FALSE(refuse_folder("out", {"a.toml"}, true));
    const auto many = refuse_folder("out", {"1", "2", "3", "4", "5"}, false);
    REQUIRE(many);
    CHECK(many->find("and 2 more") != std::string::npos);
}
