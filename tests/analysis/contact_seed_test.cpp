// Starting the bearing-contact iteration from another mesh's settled set.
// Reference: the same analysis started cold (all hole nodes closed, then
// each case from the previous case's set). For a fixed contact set each pass
// solves one positive-definite linear system, so the settled set is the
// fixed point of the iteration and its solution is unique: the start may
// change the number of passes, never the answer. Bolt forces must agree to
// 1e-9 relative (round-off of a differently modified factor: the solver
// residual of each case is held at 1e-10 by analyse()).
#include "analysis/analyse.hpp"
#include "analysis/contact_seed.hpp"
#include "mesh/mesh.hpp"
#include "support/templates.hpp"

#include <doctest/doctest.h>

using namespace lapwing;

namespace {

using test::load_template;

// The model's mesh and one with half the element size and twice the
// elements round each hole, as the check's convergence mesh.
struct TwoMeshes {
    model::Connection c;
    analysis::PlateLayout layout;
    mesh::Mesh coarse, fine;
};

TwoMeshes two_meshes(const std::string& name, const std::vector<std::string>& sets) {
    TwoMeshes t;
    t.c = load_template(name, sets);
    t.layout = analysis::plate_layout(t.c);
    mesh::MeshSettings s = analysis::mesh_settings(t.c);
    t.coarse = mesh::build_mesh(t.layout.region, s);
    s.element_size *= 0.5;
    s.elements_around_hole *= 2;
    t.fine = mesh::build_mesh(t.layout.region, s);
    return t;
}

void check_same(const analysis::Results& cold, const analysis::Results& warm) {
    REQUIRE(cold.cases.size() == warm.cases.size());
    for (size_t i = 0; i < cold.cases.size(); ++i) {
        CAPTURE(cold.cases[i].name);
        CHECK(cold.cases[i].contact_closed == warm.cases[i].contact_closed);
        double scale = 0;
        for (const auto& b : cold.cases[i].bolts) scale = std::max(scale, b.magnitude);
        REQUIRE(scale > 0);
        REQUIRE(cold.cases[i].bolts.size() == warm.cases[i].bolts.size());
        for (size_t b = 0; b < cold.cases[i].bolts.size(); ++b)
            CHECK((cold.cases[i].bolts[b].force - warm.cases[i].bolts[b].force).norm() <=
                  1e-9 * scale);
        CHECK((cold.cases[i].u - warm.cases[i].u).lpNorm<Eigen::Infinity>() <=
              1e-9 * cold.cases[i].u.lpNorm<Eigen::Infinity>());
        // The recovered nodal stresses (recovered two cases at a time with
        // two threads) follow the displacements, to the same round-off.
        const auto& a = cold.cases[i].nodal_stress;
        const auto& b = warm.cases[i].nodal_stress;
        REQUIRE(a.size() == b.size());
        REQUIRE(!a.empty());
        double peak = 0, worst = 0;
        for (size_t n = 0; n < a.size(); ++n)
            peak = std::max(peak, a[n].cwiseAbs().maxCoeff()),
            worst = std::max(worst, (a[n] - b[n]).cwiseAbs().maxCoeff());
        CHECK(peak > 0);
        CHECK(worst <= 1e-8 * peak);
    }
}

} // namespace

TEST_CASE("contact seed: a settled set carried to the same mesh is reproduced in one pass") {
    // The exact set as the start: the first pass finds no node to change.
    TwoMeshes t = two_meshes("lap-splice.toml", {"mesh.size=20", "mesh.around_hole=12"});
    const analysis::Results cold = analysis::analyse(t.c, t.coarse, t.layout);
    REQUIRE(cold.problem.has_contact);
    analysis::ContactBoard board(cold.cases.size());
    for (size_t i = 0; i < cold.cases.size(); ++i) {
        const std::vector<bool> closed(cold.cases[i].contact_closed.begin(),
                                       cold.cases[i].contact_closed.end());
        const analysis::ContactSeed seed =
            analysis::contact_seed(cold.problem, closed, cold.cases[i].u);
        CHECK(analysis::seeded_active_set(cold.problem, seed) == closed);
        board.publish(i, seed);
    }
    board.finish();
    const analysis::ContactHooks read = board.reader();
    const analysis::Results warm = analysis::analyse(t.c, t.coarse, t.layout, nullptr, &read);
    for (const auto& r : warm.cases) CHECK(r.contact_iterations == 1);
    check_same(cold, warm);
}

TEST_CASE("contact seed: the finer mesh started from the model mesh's sets settles on the cold "
          "start's sets, bolt forces within 1e-9") {
    for (const char* name : {"lap-splice.toml", "truss-gusset.toml", "corner-gusset.toml"}) {
        CAPTURE(name);
        TwoMeshes t = two_meshes(name, {"mesh.size=24", "mesh.around_hole=8"});
        const size_t n_cases = t.c.load_cases.size() + t.c.combinations.size();
        analysis::ContactBoard board(n_cases);
        const analysis::ContactHooks publish = board.publisher(), read = board.reader();
        const analysis::Results coarse =
            analysis::analyse(t.c, t.coarse, t.layout, nullptr, &publish);
        board.finish();
        REQUIRE(coarse.problem.has_contact);
        const analysis::Results cold = analysis::analyse(t.c, t.fine, t.layout);
        const analysis::Results warm = analysis::analyse(t.c, t.fine, t.layout, nullptr, &read);
        check_same(cold, warm);
        int cold_passes = 0, warm_passes = 0;
        for (size_t i = 0; i < n_cases; ++i)
            cold_passes += cold.cases[i].contact_iterations,
                warm_passes += warm.cases[i].contact_iterations;
        MESSAGE(std::string(name) << ": passes cold " << cold_passes << ", warm " << warm_passes);
    }
}

TEST_CASE("contact seed: the finer mesh's cases settled as two chains on two threads give the "
          "cold start's sets, bolt forces within 1e-9") {
    // The second chain starts on a copy of the first factorization: a
    // different history of factor modifications, the same settled sets.
    // (The templates with bearing ties and more than one case.)
    for (const char* name : {"truss-gusset.toml", "corner-gusset.toml"}) {
        CAPTURE(name);
        TwoMeshes t = two_meshes(name, {"mesh.size=24", "mesh.around_hole=8"});
        const size_t n_cases = t.c.load_cases.size() + t.c.combinations.size();
        REQUIRE(n_cases >= 2);
        analysis::ContactBoard board(n_cases);
        const analysis::ContactHooks publish = board.publisher();
        analysis::ContactHooks read = board.reader();
        read.threads = 2;
        analysis::analyse(t.c, t.coarse, t.layout, nullptr, &publish);
        board.finish();
        const analysis::Results cold = analysis::analyse(t.c, t.fine, t.layout);
        const analysis::Results two = analysis::analyse(t.c, t.fine, t.layout, nullptr, &read);
        CHECK(cold.contact_chains == 1);
#ifdef LAPWING_HAVE_CHOLMOD
        CHECK(two.contact_chains == 2);
#else
        CHECK(two.contact_chains == 1); // Eigen's LDLT cannot copy its factor: one chain
#endif
        check_same(cold, two);
    }
}

TEST_CASE("contact board: a case never published is released by finish() without a seed") {
    analysis::ContactBoard board(2);
    board.publish(0, analysis::ContactSeed{});
    board.finish();
    CHECK(board.wait(0).has_value());
    CHECK(!board.wait(1).has_value());
    CHECK(!board.wait(7).has_value()); // out of range: no seed, no wait
}
