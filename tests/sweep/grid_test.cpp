// --vary and --shard parsing and the grid layout, against values counted by
// hand from the definition of a range (start, start+step, ... ≤ stop).
#include "core/error.hpp"
#include "sweep/grid.hpp"

#include <doctest/doctest.h>
#include <set>

using namespace lapwing;
using namespace lapwing::sweep;

TEST_CASE("a range includes its stop and names a parameter by its bare name") {
    const Axis a = parse_axis("t=8:30:2");
    CHECK(a.key == "parameters.t");
    // (30 − 8) / 2 + 1 = 12 values: 8, 10, …, 30.
    REQUIRE(a.values.size() == 12);
    CHECK(a.values.front() == 8);
    CHECK(a.values.back() == 30);
    CHECK(a.texts[1] == "10");
}

TEST_CASE("decimal steps print as typed, without round-off digits") {
    // 0.1 + 0.1 + 0.1 is 0.30000000000000004 in binary floating point.
    const Axis a = parse_axis("plate.thickness=0.1:0.5:0.1");
    CHECK(a.key == "plate.thickness");
    REQUIRE(a.texts.size() == 5);
    CHECK(a.texts[2] == "0.3");
    CHECK(a.values[2] == 0.3);
}

TEST_CASE("a stop off the grid is not passed") {
    const Axis a = parse_axis("e=30:41:4"); // 30, 34, 38; 42 > 41
    REQUIRE(a.values.size() == 3);
    CHECK(a.values.back() == 38);
}

TEST_CASE("a list keeps its order and its texts") {
    const Axis a = parse_axis("bolt_group[0].pitch=80,70,75");
    CHECK(a.key == "bolt_group[0].pitch");
    CHECK(a.texts == std::vector<std::string>{"80", "70", "75"});
}

TEST_CASE("bad --vary arguments name the argument and the problem") {
    auto message = [](const char* arg) {
        try {
            parse_axis(arg);
        } catch (const InputError& e) {
            return e.diagnostics().front().format();
        }
        return std::string("no error");
    };
    CHECK(message("t") == "--vary t: expected KEY=START:STOP:STEP or KEY=A,B,C, e.g. t=8:30:2");
    CHECK(message("t=8:30:0") == "--vary t=8:30:0: the step must be > 0");
    CHECK(message("t=30:8:2") == "--vary t=30:8:2: the stop is below the start");
    CHECK(message("t=8:x:2") == "--vary t=8:x:2: the stop \"x\" is not a number");
    CHECK(message("t=8,ten") ==
          "--vary t=8,ten: \"ten\" is not a number (list values are plain numbers)");
    CHECK(message("t=1:1000000:1").find("more than 100000 values") != std::string::npos);
}

TEST_CASE("the grid varies the first axis slowest") {
    const std::vector<Axis> axes = {parse_axis("t=10,12"), parse_axis("w=1,2,3")};
    const auto grid = make_grid(axes);
    REQUIRE(grid.size() == 6); // 2 × 3
    CHECK(grid[0].sets == std::vector<std::string>{"parameters.t=10", "parameters.w=1"});
    CHECK(grid[2].sets == std::vector<std::string>{"parameters.t=10", "parameters.w=3"});
    CHECK(grid[3].sets == std::vector<std::string>{"parameters.t=12", "parameters.w=1"});
    CHECK(grid[5].index == 5);
    CHECK_THROWS_AS(make_grid({parse_axis("t=1,2"), parse_axis("parameters.t=3")}), InputError);
}

TEST_CASE("shards partition the grid: every variant in exactly one") {
    const auto grid = make_grid({parse_axis("t=1:23:1")}); // 23 variants, not a multiple of 4
    std::multiset<int> seen;
    for (int i = 1; i <= 4; ++i)
        for (const Variant& v : shard_of(grid, parse_shard(std::to_string(i) + "/4")))
            seen.insert(v.index);
    CHECK(seen.size() == 23);
    for (int i = 0; i < 23; ++i) CHECK(seen.count(i) == 1);
    CHECK(shard_of(grid, parse_shard("1/4")).front().index == 0);
    CHECK(shard_of(grid, parse_shard("2/4"))[1].index == 5);
    CHECK_THROWS_AS(parse_shard("0/4"), InputError);
    CHECK_THROWS_AS(parse_shard("5/4"), InputError);
    CHECK_THROWS_AS(parse_shard("2"), InputError);
}
