// --find-min against the brute-force answer: the smallest passing value of
// the full grid, found by running every variant. On the lap-splice template
// the brute force runs once and the search reads its results (the pipeline
// is deterministic, as the runner tests show), so the search is checked
// without paying for its runs twice; on the web-splice template the search
// runs its own variants through a runner. The non-monotone case is constructed:
// a ratio that dips below 1 at a thin plate, rises, then falls again, so
// bisection alone would miss the first passing value.
#include "core/error.hpp"
#include "sweep/find_min.hpp"
#include "sweep_fixture.hpp"

#include <cmath>
#include <doctest/doctest.h>
#include <map>

using namespace lapwing;
using namespace lapwing::sweep;

namespace {

// An evaluator from a table of governing ratios by grid index.
struct TableEvaluate {
    std::map<int, VariantResult> table;
    int n_calls = 0, n_variants = 0;
    std::vector<VariantResult> operator()(std::span<const Variant> batch) {
        ++n_calls;
        std::vector<VariantResult> out;
        for (const Variant& v : batch) {
            ++n_variants;
            out.push_back(table.at(v.index));
        }
        return out;
    }
};

VariantResult ratio_result(const Variant& v, double ratio) {
    VariantResult r;
    r.index = v.index;
    r.values = v.values;
    r.built = r.has_ratio = true;
    r.governing_ratio = ratio;
    r.passes = ratio <= 1;
    return r;
}

std::optional<double> brute_force(const std::vector<VariantResult>& all, size_t axis) {
    std::optional<double> best;
    for (const VariantResult& r : all)
        if (r.built && r.passes && (!best || r.values[axis] < *best)) best = r.values[axis];
    return best;
}

} // namespace

TEST_CASE("find-min equals the brute-force grid answer on the lap-splice template") {
    const std::string text = test::read_template("lap-splice.toml");
    const std::vector<Axis> axes = {parse_axis("t=8:32:4")}; // 7 values
    const auto grid = make_grid(axes);
    RunOptions o;
    o.threads = 2;
    o.two_mesh = false;
    Runner runner(text, "lap-splice.toml", test::coarse_lap_splice(), o);
    const auto all = runner.run(grid);
    const auto expected = brute_force(all, 0);
    REQUIRE(expected.has_value());
    // The answer must lie inside the grid for the test to exercise bisection.
    CHECK(*expected > axes[0].values.front());
    TableEvaluate evaluate;
    for (const VariantResult& r : all) evaluate.table[r.index] = r;
    const FindMinResult found = find_min(axes, grid, 0, std::ref(evaluate));
    REQUIRE(found.lines.size() == 1);
    CHECK(found.lines[0].smallest == expected);
    CHECK(found.lines[0].warning.empty());
    // Both ends, then ⌈log2(6)⌉ = 3 midpoints at most.
    CHECK(evaluate.n_variants <= 5);
}

TEST_CASE("find-min through the runner equals the brute-force answer on the web-splice template") {
    // The search runs its own variants here (through a runner with the reuse
    // cache, as `lapwing sweep --find-min` does); the brute force is every
    // variant of the grid run afresh, without a cache.
    const std::string text = test::read_template("web-splice.toml");
    const std::vector<std::string> coarse = {"mesh.size=30", "mesh.near_hole_size=10"};
    const std::vector<Axis> axes = {parse_axis("t=4:16:2")}; // 7 values
    const auto grid = make_grid(axes);
    RunOptions fresh;
    fresh.threads = 2;
    fresh.two_mesh = false;
    fresh.reuse = false;
    const auto all = Runner(text, "web-splice.toml", coarse, fresh).run(grid);
    const auto expected = brute_force(all, 0);
    REQUIRE(expected.has_value());
    CHECK(*expected > axes[0].values.front()); // inside the grid: bisection has work to do
    RunOptions cached = fresh;
    cached.reuse = true;
    Runner runner(text, "web-splice.toml", coarse, cached);
    int n_run = 0;
    const FindMinResult found = find_min(axes, grid, 0, [&](std::span<const Variant> batch) {
        n_run += static_cast<int>(batch.size());
        return runner.run(batch);
    });
    REQUIRE(found.lines.size() == 1);
    CHECK(found.lines[0].smallest == expected);
    CHECK(found.lines[0].warning.empty());
    CHECK(n_run < static_cast<int>(grid.size())); // fewer runs than the brute force
}

TEST_CASE("find-min per line of a two-key grid, monotone ratios") {
    // ratio = c / t for c = 30 and 50 (a plate's stress falls as 1/t):
    // smallest passing t is the first t ≥ c.
    const std::vector<Axis> axes = {parse_axis("c=30,50"), parse_axis("t=10:60:2")};
    const auto grid = make_grid(axes);
    TableEvaluate evaluate;
    for (const Variant& v : grid)
        evaluate.table[v.index] = ratio_result(v, v.values[0] / v.values[1]);
    const FindMinResult found = find_min(axes, grid, 1, std::ref(evaluate));
    REQUIRE(found.lines.size() == 2);
    CHECK(found.lines[0].others == std::vector<double>{30});
    CHECK(found.lines[0].smallest == 30.0);
    CHECK(found.lines[1].smallest == 50.0);
    // 26 values per line: 2 ends + at most ⌈log2(25)⌉ = 5 midpoints.
    for (const MinimumOnLine& m : found.lines) CHECK(m.n_sampled <= 7);
    // Rounds batch both lines together: 1 round of ends + at most 5 of midpoints.
    CHECK(evaluate.n_calls <= 6);
}

TEST_CASE("a ratio that is not monotone is caught and the full line decides") {
    const std::vector<Axis> axes = {parse_axis("t=1:9:1")};
    const auto grid = make_grid(axes);
    // Passing first at t = 3, failing again at 4 and 5: bisection from the ends
    // samples t = 5 (1.6, above the 1.5 at t = 1) and would settle on t = 7.
    const double ratio[] = {1.5, 1.2, 0.9, 1.1, 1.6, 1.1, 0.8, 0.7, 0.5};
    TableEvaluate evaluate;
    for (const Variant& v : grid) evaluate.table[v.index] = ratio_result(v, ratio[v.index]);
    const FindMinResult found = find_min(axes, grid, 0, std::ref(evaluate));
    REQUIRE(found.lines.size() == 1);
    const MinimumOnLine& m = found.lines[0];
    CHECK_FALSE(m.monotone);
    CHECK(m.full_line);
    CHECK(m.warning.find("not monotone in t") != std::string::npos);
    CHECK(m.smallest == 3.0); // the brute-force answer
    CHECK(found.evaluated.size() == 9);
}

TEST_CASE("no passing value, a passing first value, and a bad name") {
    const std::vector<Axis> axes = {parse_axis("t=1:5:1")};
    const auto grid = make_grid(axes);
    TableEvaluate all_fail, all_pass;
    for (const Variant& v : grid) {
        all_fail.table[v.index] = ratio_result(v, 3.0 - 0.1 * v.values[0]);
        all_pass.table[v.index] = ratio_result(v, 0.9 - 0.1 * v.values[0]);
    }
    CHECK_FALSE(find_min(axes, grid, 0, std::ref(all_fail)).lines[0].smallest.has_value());
    CHECK(all_fail.n_variants == 2);
    CHECK(find_min(axes, grid, 0, std::ref(all_pass)).lines[0].smallest == 1.0);
    CHECK(axis_index(axes, "parameters.t") == 0);
    CHECK_THROWS_AS(axis_index(axes, "w"), InputError);
}

TEST_CASE("a sampled variant that does not build sends the line to the full grid") {
    const std::vector<Axis> axes = {parse_axis("t=1:9:1")};
    const auto grid = make_grid(axes);
    TableEvaluate evaluate;
    for (const Variant& v : grid) evaluate.table[v.index] = ratio_result(v, 5.0 / v.values[0]);
    evaluate.table[4].built = false; // t = 5, the first midpoint
    evaluate.table[4].error = "cannot be solved: test";
    const FindMinResult found = find_min(axes, grid, 0, std::ref(evaluate));
    CHECK(found.lines[0].full_line);
    CHECK(found.lines[0].warning.find("did not build") != std::string::npos);
    CHECK(found.lines[0].smallest == 6.0); // 5/5 = 1 passes but did not build; 5/6 < 1
}
