// The plate-check geometry on every shipped template, as the check stage
// will use it (robustness, not a published value): each bolted member's
// group gets its block shear paths without a note, the block between the
// outer lines wherever there are two or more lines, and every bolt a
// positive clear distance ending at an edge (e1) or a hole (p1).
#include "analysis/plate_region.hpp"
#include "check/block_shear_paths.hpp"
#include "check/bolt_clearances.hpp"
#include "geometry/region_boundary.hpp"
#include "model/bolts.hpp"
#include "support/templates.hpp"

#include <algorithm>
#include <cmath>
#include <doctest/doctest.h>
#include <numbers>

using namespace lapwing;
using check::BlockShearPaths;

TEST_CASE("plate-check geometry on every template: paths and clearances") {
    for (const char* name :
         {"corner-gusset", "truss-gusset", "lap-splice", "flange-splice", "web-splice"}) {
        CAPTURE(name);
        const model::Connection c = test::load_template(std::string(name) + ".toml");
        const analysis::PlateLayout layout = analysis::plate_layout(c);
        const auto boundary = geometry::build_region_boundary(layout.region);
        for (const model::Member& m : c.members) {
            if (m.bolt_group.empty()) continue;
            CAPTURE(m.name);
            const auto it = std::find_if(c.bolt_groups.begin(), c.bolt_groups.end(),
                                         [&](const auto& g) { return g.name == m.bolt_group; });
            REQUIRE(it != c.bolt_groups.end());
            const int group = static_cast<int>(it - c.bolt_groups.begin());
            std::vector<Eigen::Vector2d> centres;
            for (const auto& p : model::bolt_positions(*it))
                centres.emplace_back(p.centre.x, p.centre.y);
            const double a = m.angle * std::numbers::pi / 180;
            const Eigen::Vector2d axis(std::cos(a), std::sin(a));
            const BlockShearPaths paths = check::block_shear_paths(centres, axis, boundary);
            CHECK(paths.notes.empty());
            const bool between =
                std::any_of(paths.paths.begin(), paths.paths.end(),
                            [](const auto& p) { return p.id == "along:between-outer-lines"; });
            CHECK(between == (it->lines >= 2));
            for (size_t h = 0; h < layout.bolts.size(); ++h) {
                if (layout.bolts[h].group != group) continue;
                const check::BoltClearances g = check::bolt_clearances(
                    layout.region, boundary, static_cast<int>(h), it->diameter, axis);
                CHECK(g.lc > 0);
                CHECK(std::isfinite(g.e1) != std::isfinite(g.p1));
            }
        }
    }
}
