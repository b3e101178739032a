// A mesh the mesher folded is reported in terms of the mesh settings that
// made it, not as an element with its nodes in the wrong order.
#include "analysis/fe_problem.hpp"
#include "analysis/plate_region.hpp"
#include "core/error.hpp"
#include "mesh/mesh.hpp"
#include "support/templates.hpp"

#include <doctest/doctest.h>
#include <string>

using namespace lapwing;

TEST_CASE("a folded mesh names the hole beside it and the [mesh] key that changes it") {
    // The web splice meshed with the fewest elements around each hole the
    // reader allows folds one element beside a hole (found by running every
    // template and demo at around_hole = 8, 10 and 12; this was the only one).
    const model::Connection c = test::load_template("web-splice.toml", {"mesh.around_hole=8"});
    const analysis::PlateLayout layout = analysis::plate_layout(c);
    const mesh::Mesh m = mesh::build_mesh(layout.region, analysis::mesh_settings(c));
    REQUIRE(m.quality_summary.n_inverted > 0);
    std::string what;
    try {
        analysis::build_fe_problem(c, m, layout);
    } catch (const AnalysisError& e) {
        what = e.what();
    }
    CHECK(what.find("the mesher folded") != std::string::npos);
    CHECK(what.find("beside the hole of bolt left_web[") != std::string::npos);
    CHECK(what.find("around_hole (now 8") != std::string::npos);
    CHECK(what.find("counter-clockwise") == std::string::npos);

    // The default mesh of the same template is not folded and builds.
    const model::Connection plain = test::load_template("web-splice.toml", {});
    const analysis::PlateLayout plain_layout = analysis::plate_layout(plain);
    const mesh::Mesh good = mesh::build_mesh(plain_layout.region, analysis::mesh_settings(plain));
    CHECK(good.quality_summary.n_inverted == 0);
    CHECK_NOTHROW(analysis::build_fe_problem(plain, good, plain_layout));
}
