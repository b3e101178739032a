// A sweep row must be exactly what `lapwing check` gives for the same --set
// values (the acceptance test): the reference here is a separate
// check_connection run of each variant, fresh, without any cache. Ratios to
// 1e-12 relative: reuse repeats the same floating-point operations, so only
// a bug (a stale value, the wrong mesh) can move them.
#include "check/pipeline.hpp"
#include "input/load_connection.hpp"
#include "support/approx.hpp"
#include "sweep/csv.hpp"
#include "sweep/runner.hpp"
#include "sweep_fixture.hpp"

#include <algorithm>
#include <doctest/doctest.h>

using namespace lapwing;
using namespace lapwing::sweep;
using lapwing::test::approx;

namespace {

RunOptions options(int threads) {
    RunOptions o;
    o.threads = threads;
    o.two_mesh = false;
    return o;
}

void check_against_single_runs(const std::string& text, const std::vector<std::string>& base,
                               const std::vector<Variant>& variants,
                               const std::vector<VariantResult>& results) {
    REQUIRE(results.size() == variants.size());
    for (size_t i = 0; i < variants.size(); ++i) {
        CAPTURE(variants[i].sets.front());
        std::vector<std::string> sets = base;
        sets.insert(sets.end(), variants[i].sets.begin(), variants[i].sets.end());
        const auto c = input::load_connection(text, "lap-splice.toml", sets);
        check::CheckOptions single;
        single.two_mesh = false;
        const check::CheckOutcome o = check::check_connection(c, single);
        const VariantResult& r = results[i];
        REQUIRE(r.built);
        CHECK(r.index == variants[i].index);
        CHECK(r.passes == o.table.passes());
        REQUIRE(o.table.governing >= 0);
        CHECK(r.governing_ratio == approx(o.table.max_ratio()));
        CHECK(r.governing_id == o.table.rows[static_cast<size_t>(o.table.governing)].id);
        for (size_t f = 0; f < n_families; ++f) {
            const int g = o.table.governing_by_family[f];
            REQUIRE(r.family_ratio[f].has_value() == (g >= 0));
            if (g >= 0)
                CHECK(*r.family_ratio[f] == approx(o.table.rows[static_cast<size_t>(g)].ratio));
        }
    }
}

} // namespace

TEST_CASE("thickness sweep rows equal single check runs (mesh and factorization reused)") {
    const std::string text = test::read_template("lap-splice.toml");
    const auto base = test::coarse_lap_splice();
    const std::vector<Axis> axes = {parse_axis("t=10:22:6")}; // 10, 16, 22
    const auto grid = make_grid(axes);
    Runner runner(text, "lap-splice.toml", base, options(1));
    const auto results = runner.run(grid);
    check_against_single_runs(text, base, grid, results);
    // One worker, one geometry: the mesh and the pattern are built once.
    const check::ReuseStats s = runner.reuse_stats();
    CHECK(s.meshes_built == 1);
    CHECK(s.meshes_reused == 2);
    CHECK(s.solvers_built == 1);
    CHECK(s.solvers_reused == 2);
}

TEST_CASE("geometry sweep rows equal single check runs (re-meshed when the plate changes)") {
    const std::string text = test::read_template("lap-splice.toml");
    const auto base = test::coarse_lap_splice();
    // The plate width moves the outline: every variant needs its own mesh.
    const std::vector<Axis> axes = {parse_axis("width=130,150")};
    const auto grid = make_grid(axes);
    Runner runner(text, "lap-splice.toml", base, options(1));
    const auto results = runner.run(grid);
    check_against_single_runs(text, base, grid, results);
    CHECK(runner.reuse_stats().meshes_built == 2);
    CHECK(runner.reuse_stats().meshes_reused == 0);
}

TEST_CASE("-j 1 and -j 2 give identical CSVs") {
    const std::string text = test::read_template("lap-splice.toml");
    const auto base = test::coarse_lap_splice();
    const std::vector<Axis> axes = {parse_axis("t=10:22:4")}; // 4 variants
    const auto grid = make_grid(axes);
    auto csv = [&](int threads) {
        Runner r(text, "lap-splice.toml", base, options(threads));
        std::string out = csv_header(axes);
        const auto results = r.run(grid);
        for (size_t i = 0; i < grid.size(); ++i) out += csv_row(axes, grid[i], results[i]);
        return out;
    };
    const std::string one = csv(1), two = csv(2);
    CHECK(one == two);
    CHECK(std::count(one.begin(), one.end(), '\n') == 5); // header + 4 rows
}

TEST_CASE("a variant that cannot be built is recorded and the others complete") {
    const std::string text = test::read_template("lap-splice.toml");
    // A 40 mm wide plate puts the bolt holes outside the outline.
    const std::vector<Axis> axes = {parse_axis("width=40,130")};
    const auto grid = make_grid(axes);
    Runner runner(text, "lap-splice.toml", test::coarse_lap_splice(), options(2));
    const auto results = runner.run(grid);
    REQUIRE(results.size() == 2);
    CHECK_FALSE(results[0].built);
    CHECK(results[0].error.find("lies outside the plate outline") != std::string::npos);
    CHECK(results[0].error.find('\n') == std::string::npos);
    CHECK(results[1].built);
    CHECK(results[1].has_ratio);
    const std::string row = csv_row(axes, grid[0], results[0]);
    CHECK(row.starts_with("1,40,no,,"));
}

TEST_CASE("each variant's pipeline uses the run's dof limit") {
    const std::string text = test::read_template("lap-splice.toml");
    const std::vector<Axis> axes = {parse_axis("t=10,12")};
    const auto grid = make_grid(axes);
    RunOptions tight = options(1);
    tight.max_dofs = 100; // far below the coarse lap splice's few thousand dofs
    const auto refused =
        Runner(text, "lap-splice.toml", test::coarse_lap_splice(), tight).run(grid);
    REQUIRE(refused.size() == 2);
    for (const VariantResult& r : refused) {
        CHECK_FALSE(r.built);
        CHECK(r.error.find("too large") != std::string::npos);
    }
    RunOptions roomy = options(1);
    roomy.max_dofs = 2 * analysis::default_max_dofs; // above the default is allowed
    const auto built = Runner(text, "lap-splice.toml", test::coarse_lap_splice(), roomy).run(grid);
    REQUIRE(built.size() == 2);
    CHECK(built[0].built);
    CHECK(built[1].built);
}

TEST_CASE("a stop request ends the sweep before the next variant") {
    const std::string text = test::read_template("lap-splice.toml");
    const auto grid = make_grid({parse_axis("t=10:20:2")});
    std::atomic<bool> stop{false};
    RunOptions o = options(1);
    o.stop = &stop;
    o.on_done = [&](const VariantResult&) { stop = true; };
    Runner runner(text, "lap-splice.toml", test::coarse_lap_splice(), o);
    const auto results = runner.run(grid);
    // One worker: the first variant, and at most the one it had started when the
    // stop came (running variants finish); never the rest of the six.
    REQUIRE(results.size() >= 1);
    CHECK(results.size() <= 2);
    CHECK(results[0].index == 0);
    // Stopped before it starts: nothing runs.
    Runner idle(text, "lap-splice.toml", test::coarse_lap_splice(), o);
    CHECK(idle.run(grid).empty());
}
