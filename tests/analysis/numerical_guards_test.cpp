// Numerical guards: an ill-conditioned system is warned about or refused,
// and no NaN or infinity reaches the results. Thresholds and their reasons
// are in analysis/solution_checks.hpp.
#include "analysis/solution_checks.hpp"
#include "core/error.hpp"
#include "fe/linear_static.hpp"
#include "fe/structured_grid.hpp"
#include "run_connection.hpp"

#include <string>
#include <doctest/doctest.h>
#include <filesystem>
#include <fmt/format.h>
#include <fstream>
#include <limits>
#include <sstream>

namespace {

std::string web_splice() {
    std::ifstream in(std::filesystem::path(LAPWING_SOURCE_DIR) / "templates" / "web-splice.toml");
    std::stringstream s;
    s << in.rdbuf();
    return s.str();
}

// Both web bolt groups on a given spring `ratio` times the plate's in-plane
// stiffness scale E·t (200 000 MPa × 10 mm = 2e6 N/mm in the template,
// whose units are kN and mm), on a coarse mesh so each solve takes well
// under a second.
std::vector<std::string> stiff_springs(double ratio) {
    const double k = ratio * 200000.0 * 10.0 / 1000.0; // kN/mm
    std::vector<std::string> sets{"mesh.size=30", "mesh.near_hole_size=10"};
    for (int g = 0; g < 2; ++g) {
        sets.push_back(fmt::format("bolt_group[{}].stiffness=\"given\"", g));
        sets.push_back(fmt::format("bolt_group[{}].spring={:.6e}", g, k));
    }
    return sets;
}

} // namespace

// Measured relative residuals of the solve (lapwing analyse
// templates/web-splice.toml with these overrides): 3.3e-7 at a ratio 1e8,
// 1e-6 at 1e9, 3.7e-5 at 1e10, 1.9e-4 at 1e11, 3.5e-3 at 1e12; at 1e15 the
// factorization fails outright.
TEST_CASE("springs 1e12 times stiffer than the plate: refused as too ill-conditioned") {
    CHECK_THROWS_WITH_AS(lapwing::test::run_connection(web_splice(), stiff_springs(1e12)),
                         doctest::Contains("the model is too ill-conditioned to trust"),
                         lapwing::AnalysisError);
}

// Whether the factorization breaks down (and the message names the spring)
// or completes with a useless residual depends on round-off in the
// factorization (it differs between builds); either way the model is refused.
TEST_CASE("springs 1e15 times stiffer than the plate: refused") {
    std::string message;
    try {
        (void)lapwing::test::run_connection(web_splice(), stiff_springs(1e15));
    } catch (const lapwing::AnalysisError& e) {
        message = e.what();
    }
    CAPTURE(message);
    CHECK((message.find("is 1.0e+15 times the plate's in-plane stiffness") != std::string::npos ||
           message.find("the model is too ill-conditioned to trust") != std::string::npos));
}

TEST_CASE("springs 1e9 times stiffer than the plate: solved, with a warning") {
    const auto run = lapwing::test::run_connection(web_splice(), stiff_springs(1e9));
    REQUIRE(run.results.warnings.size() >= 1);
    CHECK(run.results.warnings[0].find("relative residual of the solve") != std::string::npos);
    // Statics still holds to the accuracy the warning admits.
    for (const auto& c : run.results.cases) CHECK(c.equilibrium_residual <= 1e-4);
}

TEST_CASE("the template's own springs: no warning") {
    const auto run =
        lapwing::test::run_connection(web_splice(), {"mesh.size=30", "mesh.near_hole_size=10"});
    CHECK(run.results.warnings.empty());
    CHECK(run.results.reciprocal_condition > lapwing::analysis::rcond_warning);
}

TEST_CASE("a sliver element (width 1e-7 of its height) drives rcond below the warning") {
    using namespace lapwing::fe;
    // A 10 × 2 strip [0,100] × [0,20] whose sixth column is squeezed to a
    // width of 1e-6 mm: a Q4 of aspect ratio 1e7, stiff as k ≈ E t h / w
    // across it, beside neighbours of stiffness ≈ E t.
    const double w = 1e-6;
    const auto map = [w](double s, double t) {
        const double x = s < 0.5   ? 100 * s
                         : s < 0.6 ? 50 + (s - 0.5) / 0.1 * w
                                   : 50 + w + 100 * (s - 0.6);
        return Vector2(x, 20 * t);
    };
    const auto grid = make_structured_grid(ElementKind::Q4, 10, 2, map);
    const Model model = model_from_grid(grid, {200000.0, 0.3}, 5.0);
    Constraints k;
    for (int node : grid.side_nodes[3])
        k.prescribed.push_back({dof_ux(node), 0}), k.prescribed.push_back({dof_uy(node), 0});
    const LinearStaticProblem problem(model, k);
    const double rcond = problem.stats().factor.rcond;
    MESSAGE("sliver: reciprocal condition estimate " << rcond);
    CHECK(rcond < lapwing::analysis::rcond_warning);
    lapwing::analysis::Results results;
    try {
        lapwing::analysis::check_accuracy(results, rcond);
        REQUIRE(results.warnings.size() == 1);
        CHECK(results.warnings[0].find("sliver element") != std::string::npos);
    } catch (const lapwing::AnalysisError& e) {
        CHECK(std::string(e.what()).find("sliver element") != std::string::npos);
    }
}

TEST_CASE("a NaN or an infinity in a case's results is an error naming the case") {
    lapwing::analysis::CaseResult r;
    r.name = "wind";
    r.u = Eigen::VectorXd::Zero(4);
    r.nodal_stress.assign(3, lapwing::fe::Stress::Zero());
    CHECK_NOTHROW(lapwing::analysis::check_finite(r));
    r.nodal_stress[1](2) = std::numeric_limits<double>::quiet_NaN();
    CHECK_THROWS_WITH_AS(lapwing::analysis::check_finite(r),
                         doctest::Contains("load case \"wind\": the stresses contain values that "
                                           "are not finite"),
                         lapwing::AnalysisError);
    r.nodal_stress[1](2) = 0;
    r.combination = true;
    r.u(3) = std::numeric_limits<double>::infinity();
    CHECK_THROWS_WITH_AS(lapwing::analysis::check_finite(r),
                         doctest::Contains("combination \"wind\": the displacements"),
                         lapwing::AnalysisError);
}

TEST_CASE("forces of 1e300 kN end in an error naming the load case, not in NaN results") {
    CHECK_THROWS_WITH_AS(
        lapwing::test::run_connection(
            web_splice(), {"mesh.size=30", "mesh.near_hole_size=10", "parameters.web_shear=1e300"}),
        doctest::Contains("load case \"design\""), lapwing::AnalysisError);
}
