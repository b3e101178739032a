// The check table's ratios, statuses and governing rows.
#include "check/check_table.hpp"
#include "support/approx.hpp"

#include <doctest/doctest.h>

using namespace lapwing::check;
using lapwing::test::approx;

namespace {
CheckRow row(Family family, double demand, double capacity) {
    CheckRow r;
    r.family = family;
    r.demand = demand;
    r.capacity = capacity;
    return r;
}
} // namespace

TEST_CASE("check table: ratio, status and the governing row overall and per family") {
    const CheckTable t =
        make_table({row(Family::peak_stress, 200, 250), row(Family::bearing, 90, 80),
                    row(Family::bearing, -50, 100), row(Family::weld, 10, 0)});
    CHECK(t.rows[0].ratio == approx(0.8, 1e-15));
    CHECK(t.rows[0].status == Status::pass);
    CHECK(t.rows[1].ratio == approx(1.125, 1e-15));
    CHECK(t.rows[1].status == Status::fail);
    CHECK(t.rows[2].ratio == approx(0.5, 1e-15)); // a compressive demand counts by its size
    CHECK(t.rows[3].status == Status::info);      // no capacity given: shown, not compared
    CHECK(t.governing == 1);
    CHECK(t.governing_in(Family::bearing) == 1);
    CHECK(t.governing_in(Family::peak_stress) == 0);
    CHECK(t.governing_in(Family::weld) == -1);
    CHECK(!t.passes());
    CHECK(t.max_ratio() == approx(1.125, 1e-15));
}

TEST_CASE("check table: a ratio of exactly 1 passes; an empty table passes with no governing row") {
    CHECK(make_table({row(Family::section, 5, 5)}).passes());
    const CheckTable empty = make_table({});
    CHECK(empty.passes());
    CHECK(empty.governing == -1);
    CHECK(empty.max_ratio() == 0.0);
}
