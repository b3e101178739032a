// The two peak rows: at bolt holes (within [allowables.peak] bolt_hole_zone
// hole diameters of a bolt hole's edge) and away from them. Checked on the
// shipped web splice, a bolted plate whose highest stress sits at a loaded
// hole, with one mesh and three zone widths. Its bolts are switched to the
// bearing tie (a pin pressing on its hole), the model the physical check
// below is about.
#include "check/pipeline.hpp"
#include "input/load_connection.hpp"

#include <algorithm>
#include <cmath>
#include <doctest/doctest.h>
#include <fstream>
#include <limits>
#include <sstream>

using namespace lapwing;

namespace {

check::CheckOutcome run(const std::string& zone) {
    const std::string path = std::string(LAPWING_SOURCE_DIR) + "/templates/web-splice.toml";
    std::ifstream in(path);
    std::stringstream text;
    text << in.rdbuf();
    const model::Connection c =
        input::load_connection(text.str(), path,
                               {"allowables.peak.bolt_hole_zone=" + zone,
                                "bolt_group[0].tie=\"bearing\"", "bolt_group[1].tie=\"bearing\""});
    check::CheckOptions options;
    options.two_mesh = false;
    return check::check_connection(c, options);
}

// Clear distance from a point to the nearest hole edge, in hole diameters.
double diameters_from_nearest_hole(const check::CheckOutcome& o, const Eigen::Vector2d& p) {
    double best = std::numeric_limits<double>::infinity();
    for (const geometry::Hole& h : o.layout.region.holes) {
        REQUIRE(h.shape == geometry::HoleShape::circle); // the web splice has round holes
        best = std::min(best, ((p - h.centre).norm() - 0.5 * h.diameter) / h.diameter);
    }
    return best;
}

} // namespace

TEST_CASE("peak rows: the bolt-hole zone splits the peak search, the overall peak is the larger "
          "of the two, and the hole-edge peak exceeds the nominal bearing stress") {
    const check::CheckOutcome half = run("0.5");
    const check::CheckOutcome whole = run("1.0");
    const check::CheckOutcome none = run("0");
    REQUIRE(!half.peaks.empty());
    const double t = half.connection.plate.thickness;
    double widest_hole = 0;
    for (const geometry::Hole& h : half.layout.region.holes)
        widest_hole = std::max(widest_hole, h.diameter);
    for (size_t k = 0; k < half.peaks.size(); ++k) {
        const check::PeakStress& p = half.peaks[k];
        REQUIRE(p.has_hole_zone);
        // Both searches run over the same sample points, so the overall
        // maximum is one of them exactly.
        CHECK(std::max(p.von_mises_away, p.von_mises_at_holes) == p.von_mises);
        CHECK(diameters_from_nearest_hole(half, p.von_mises_at_holes_at) < 0.5 + 1e-12);
        CHECK(diameters_from_nearest_hole(half, p.von_mises_away_at) >= 0.5 - 1e-12);
        // A wider zone leaves out more points: the peak away cannot rise.
        CHECK(whole.peaks[k].von_mises_away <= p.von_mises_away);
        CHECK(diameters_from_nearest_hole(whole, whole.peaks[k].von_mises_away_at) >= 1.0 - 1e-12);
        // No zone: one search, every point away from the holes.
        CHECK(!none.peaks[k].has_hole_zone);
        CHECK(none.peaks[k].von_mises_away == p.von_mises);
        // A pin-loaded hole's elastic edge peak exceeds the nominal bearing
        // stress F/(d t) (Frocht and Hill 1940, photoelastic tests of
        // pin-loaded plates, from memory; common practice). The widest hole
        // gives the smallest nominal stress, a safe lower bound.
        double largest_bolt = 0;
        for (const analysis::BoltForce& b : half.results.cases[k].bolts)
            largest_bolt = std::max(largest_bolt, b.magnitude);
        if (largest_bolt > 0) CHECK(p.von_mises_at_holes > largest_bolt / (widest_hole * t));
        MESSAGE(half.results.cases[k].name
                << ": at holes " << p.von_mises_at_holes << " MPa, away (0.5 d) "
                << p.von_mises_away << ", away (1.0 d) " << whole.peaks[k].von_mises_away
                << ", nominal bearing " << largest_bolt / (widest_hole * t));
    }
    // The rows: one of each per case, the at-holes one for information.
    int away_rows = 0, hole_rows = 0;
    for (const check::CheckRow& r : half.table.rows) {
        if (r.id.rfind("peak:", 0) == 0) ++away_rows;
        if (r.id.rfind("peak-at-holes:", 0) == 0) {
            ++hole_rows;
            CHECK(r.capacity == 0); // the template leaves peak_von_mises_at_bolt_holes unset
        }
    }
    CHECK(away_rows == static_cast<int>(half.peaks.size()));
    CHECK(hole_rows == static_cast<int>(half.peaks.size()));
}
