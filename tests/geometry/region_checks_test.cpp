// Geometry checks: every kind of bad plate region gives an InputError whose
// diagnostic names the item (key path) and says what is wrong and where.
#include "core/error.hpp"
#include "geometry/region_boundary.hpp"

#include <doctest/doctest.h>
#include <string>

using namespace lapwing;
using geometry::Hole;
using geometry::PlateRegion;

namespace {

PlateRegion rectangle() {
    PlateRegion r;
    r.outline = {{{0, 0}}, {{300, 0}}, {{300, 200}}, {{0, 200}}};
    return r;
}

// The first diagnostic of the error the region raises ("" key and message if none).
Diagnostic first_problem(const PlateRegion& r) {
    try {
        geometry::validate(r);
    } catch (const InputError& e) {
        REQUIRE(!e.diagnostics().empty());
        return e.diagnostics().front();
    }
    return {};
}

bool contains(const std::string& s, const std::string& part) {
    return s.find(part) != std::string::npos;
}

} // namespace

TEST_CASE("a valid region passes") {
    PlateRegion r = rectangle();
    r.holes = {Hole::circle({100, 100}, 22), Hole::slot({200, 100}, 50, 22, 90)};
    r.cutouts = {{{{250, 150}, {310, 150}, {310, 210}, {250, 210}}}};
    CHECK_NOTHROW(geometry::validate(r));
}

TEST_CASE("outline: too few points, repeated points, self-intersection, clockwise order") {
    PlateRegion r;
    r.outline = {{{0, 0}}, {{1, 0}}};
    CHECK(contains(first_problem(r).message, "at least 3"));
    r = rectangle();
    r.outline.insert(r.outline.begin() + 1, {{0, 0}});
    auto d = first_problem(r);
    CHECK(d.key_path == "outline");
    CHECK(contains(d.message, "coincide at (0, 0)"));
    r = rectangle();
    std::swap(r.outline[1], r.outline[2]); // bow tie
    d = first_problem(r);
    CHECK(contains(d.message, "crosses itself"));
    CHECK(contains(d.message, "edge 0"));
    r = rectangle();
    std::swap(r.outline[1], r.outline[3]); // same square, clockwise
    d = first_problem(r);
    CHECK(contains(d.message, "runs clockwise"));
}

TEST_CASE("holes: outside, crossing an edge, too close to an edge, overlapping, too close to each "
          "other") {
    PlateRegion r = rectangle();
    r.holes = {Hole::circle({400, 100}, 22)};
    auto d = first_problem(r);
    CHECK(d.key_path == "holes[0]");
    CHECK(contains(d.message, "outside the plate"));

    r.holes = {Hole::circle({120, 5}, 22)};
    d = first_problem(r);
    CHECK(d.key_path == "holes[0]");
    CHECK(contains(d.message,
                   "hole at (120, 5), d = 22, crosses outline.edge[0] (from (0, 0) to (300, 0))"));

    r.holes = {Hole::circle({120, 11.5}, 22)}; // 0.5 clear of the edge, ligament 1
    d = first_problem(r);
    CHECK(contains(d.message, "less than the minimum ligament 1"));

    r.holes = {Hole::circle({100, 100}, 22), Hole::circle({110, 100}, 22)};
    d = first_problem(r);
    CHECK(d.key_path == "holes[1]");
    CHECK(contains(d.message, "overlaps holes[0]"));

    r.holes = {Hole::circle({100, 100}, 22), Hole::circle({122.5, 100}, 22)}; // 0.5 apart
    r.min_ligament = 2;
    d = first_problem(r);
    CHECK(contains(d.message, "from holes[0]"));
    CHECK(contains(d.message, "minimum ligament 2"));
}

TEST_CASE("holes: degenerate sizes and slots") {
    PlateRegion r = rectangle();
    r.holes = {Hole::circle({100, 100}, 0)};
    CHECK(contains(first_problem(r).message, "diameter = 0, must be > 0"));
    r.holes = {Hole::slot({100, 100}, 20, 22, 0)};
    CHECK(contains(first_problem(r).message, "must exceed its width"));
    // An upright slot reaching the edge: the check uses its true shape.
    r.holes = {Hole::slot({100, 25}, 60, 20, 90)};
    CHECK(contains(first_problem(r).message, "crosses outline.edge[0]"));
}

TEST_CASE("holes in or across a cut-out are rejected") {
    PlateRegion r = rectangle();
    r.cutouts = {{{{50, 50}, {150, 50}, {150, 150}, {50, 150}}}};
    r.holes = {Hole::circle({100, 100}, 22)};
    CHECK(contains(first_problem(r).message, "inside a cut-out"));
    r.holes = {Hole::circle({155, 100}, 22)};
    CHECK(contains(first_problem(r).message, "crosses cutouts[0].edge[1]"));
}

TEST_CASE("cut-outs: outside the plate, splitting it, removing it") {
    PlateRegion r = rectangle();
    r.cutouts = {{{{400, 0}, {500, 0}, {500, 100}}}};
    auto d = first_problem(r);
    CHECK(d.key_path == "cutouts[0]");
    CHECK(contains(d.message, "lies outside the plate"));
    r.cutouts = {{{{100, -10}, {120, -10}, {120, 210}, {100, 210}}}};
    CHECK(contains(first_problem(r).message, "cuts the plate into 2 separate pieces"));
    r.cutouts = {{{{-10, -10}, {310, -10}, {310, 210}, {-10, 210}}}};
    CHECK(contains(first_problem(r).message, "removes the whole plate"));
}

TEST_CASE("chamfers and fillets: negative, both, too big for their edges") {
    PlateRegion r = rectangle();
    r.outline[2].fillet_radius = -5;
    CHECK(first_problem(r).key_path == "outline[2]");
    r = rectangle();
    r.outline[2].fillet_radius = 10;
    r.outline[2].chamfer = 10;
    CHECK(contains(first_problem(r).message, "both a chamfer and a fillet"));
    r = rectangle();
    r.outline[2].fillet_radius = 120;
    r.outline[1].fillet_radius = 120; // edge 1 is 200 long, needs 240
    CHECK(contains(first_problem(r).message, "needs 240 along outline.edge[1]"));
}

// Cut-outs are removed before the corners are finished, so one reaching into
// a chamfer or fillet would leave crossing boundary curves (random plates 1597,
// 2162, 2187 of tests/mesh did, and the mesher could not recover them).
TEST_CASE("a cut-out reaching into a chamfer or fillet is rejected; one clear of it passes") {
    PlateRegion r = rectangle();
    r.outline[2].chamfer = 40; // chamfer from (300, 160) to (260, 200)
    // An opening whose corner (285, 185) lies beyond the chamfer line x + y = 460.
    r.cutouts = {{{{240, 150}, {285, 150}, {285, 185}, {240, 185}}}};
    auto d = first_problem(r);
    CHECK(d.key_path == "cutouts[0]");
    CHECK(contains(d.message, "reaches the chamfer at outline[2]"));
    r.cutouts = {{{{240, 150}, {270, 150}, {270, 180}, {240, 180}}}}; // 270 + 180 < 460
    CHECK_NOTHROW(geometry::validate(r));
    r = rectangle();
    r.outline[2].fillet_radius = 40; // centre (260, 160), arc in x, y > 260, 160
    // Corner (290, 190) is 42.4 from the centre: outside the arc, in the
    // rounded-off corner.
    r.cutouts = {{{{250, 150}, {290, 150}, {290, 190}, {250, 190}}}};
    d = first_problem(r);
    CHECK(d.key_path == "cutouts[0]");
    CHECK(contains(d.message, "reaches the fillet at outline[2]"));
    r.cutouts = {{{{250, 150}, {285, 150}, {285, 185}, {250, 185}}}}; // 35.4 < 40
    CHECK_NOTHROW(geometry::validate(r));
}

TEST_CASE("every problem is reported, not only the first") {
    PlateRegion r = rectangle();
    r.holes = {Hole::circle({400, 100}, 22), Hole::circle({100, 100}, -1)};
    try {
        geometry::validate(r);
        FAIL("no error");
    } catch (const InputError& e) {
        CHECK(e.diagnostics().size() == 2);
    }
}
