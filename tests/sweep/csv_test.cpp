// sweep.csv quoting (RFC 4180: fields with commas, quotes or line ends are
// quoted, quotes doubled) and `lapwing merge`: shards of a real sweep merged
// equal the sweep run in one piece.
#include "core/error.hpp"
#include "sweep/csv.hpp"
#include "sweep/runner.hpp"
#include "sweep_fixture.hpp"

#include <doctest/doctest.h>

using namespace lapwing;
using namespace lapwing::sweep;

TEST_CASE("fields are quoted as RFC 4180 says") {
    CHECK(csv_field("plain") == "plain");
    CHECK(csv_field("a,b") == "\"a,b\"");
    CHECK(csv_field("say \"x\"") == "\"say \"\"x\"\"\"");
    CHECK(csv_field("two\nlines") == "\"two\nlines\"");
}

TEST_CASE("ratios are written to read back to the same double") {
    VariantResult r;
    r.built = r.passes = r.has_ratio = true;
    r.governing_ratio = 0.1 + 0.2; // 0.30000000000000004
    r.governing_id = "peak:x";
    r.governing_family = "peak_stress";
    const std::vector<Axis> axes = {parse_axis("t=10")};
    const auto grid = make_grid(axes);
    const std::string row = csv_row(axes, grid[0], r);
    CHECK(row.find(",0.30000000000000004,") != std::string::npos);
    CHECK(std::stod("0.30000000000000004") == r.governing_ratio);
}

TEST_CASE("shards of a real sweep, merged, equal the sweep run in one piece") {
    const std::string text = test::read_template("lap-splice.toml");
    const std::vector<Axis> axes = {parse_axis("t=10:22:4")};
    const auto grid = make_grid(axes);
    RunOptions o;
    o.threads = 2;
    o.two_mesh = false;
    auto csv_of = [&](const std::vector<Variant>& variants) {
        Runner runner(text, "lap-splice.toml", test::coarse_lap_splice(), o);
        const auto results = runner.run(variants);
        std::string out = csv_header(axes);
        for (size_t i = 0; i < variants.size(); ++i) out += csv_row(axes, variants[i], results[i]);
        return out;
    };
    const std::string full = csv_of(grid);
    // Given in reverse order: merge sorts by the variant column.
    const std::string merged =
        merge_sweep_csvs({{"b.csv", csv_of(shard_of(grid, parse_shard("2/2")))},
                          {"a.csv", csv_of(shard_of(grid, parse_shard("1/2")))}},
                         4);
    CHECK(merged == full);
}

TEST_CASE("merge refuses overlapping, incomplete or foreign shards") {
    const std::string header = "variant,t,built,passes,governing_ratio,governing_check\n";
    const std::string a = header + "1,10,yes,yes,0.5,x\n3,14,yes,yes,0.4,x\n";
    const std::string b = header + "2,12,yes,yes,0.45,x\n";
    CHECK(merge_sweep_csvs({{"a", a}, {"b", b}}) ==
          header + "1,10,yes,yes,0.5,x\n2,12,yes,yes,0.45,x\n3,14,yes,yes,0.4,x\n");
    auto message = [](const std::vector<NamedCsv>& files, int expect = 0) {
        try {
            merge_sweep_csvs(files, expect);
        } catch (const InputError& e) {
            return e.diagnostics().front().format();
        }
        return std::string("no error");
    };
    CHECK(message({{"a", a}, {"a2", a}}) == "a2: variant 1 is also in a: shards overlap");
    CHECK(message({{"a", a}}).find("variants 2 are in none of the files") != std::string::npos);
    CHECK(message({{"a", a}, {"b", b}}, 5).find("variants 4, 5 are in none") != std::string::npos);
    CHECK(message({{"a", a}, {"c", "variant,x,governing_ratio,\n2,1,1,\n"}})
              .find("its columns differ from those of a") != std::string::npos);
    CHECK(message({{"d", "not,a,sweep\n"}}).find("not a lapwing sweep header") !=
          std::string::npos);
}
