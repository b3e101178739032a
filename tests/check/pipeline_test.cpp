// The whole check on shipped templates: the table's rows and the two-mesh
// evidence. Converged quantities (bolt forces, section resultants) must move
// little when the element size is halved; local peaks may move more and are
// reported, not held.
#include "check/pipeline.hpp"
#include "support/templates.hpp"

#include <algorithm>
#include <atomic>
#include <chrono>
#include <doctest/doctest.h>
#include <future>
#include <memory>
#include <thread>

using namespace lapwing;

namespace {

using test::load_template;

} // namespace

TEST_CASE("check pipeline: every family of the web splice, and convergence of bolt forces and "
          "section forces within 2 % on halving the element size") {
    const model::Connection c = load_template("web-splice.toml", {});
    const check::CheckOutcome o = check::check_connection(c, {});
    REQUIRE(o.convergence.done);
    CHECK(o.convergence.fine_elements > 2 * o.convergence.coarse_elements);
    for (const check::Family f :
         {check::Family::peak_stress, check::Family::section, check::Family::bearing,
          check::Family::block_shear, check::Family::net_section})
        CHECK_MESSAGE(o.table.governing_in(f) >= 0, check::word(f));
    for (const check::CheckRow& r : o.table.rows) {
        CHECK(std::isfinite(r.demand));
        CHECK(std::isfinite(r.ratio));
        CHECK(!r.method.empty());
    }
    // Mesh convergence (common practice: a converged quantity changes little
    // when the mesh is refined). Bolt forces and section forces are
    // integral quantities and converge fast; peaks are local.
    std::vector<check::ConvergenceRow> rows = o.convergence.rows;
    std::sort(rows.begin(), rows.end(), [](const auto& a, const auto& b) {
        return std::abs(a.change()) > std::abs(b.change());
    });
    for (size_t i = 0; i < std::min<size_t>(5, rows.size()); ++i)
        MESSAGE(rows[i].quantity << " (" << rows[i].load_case << "): " << rows[i].coarse << " → "
                                 << rows[i].fine << ", " << 100 * rows[i].change() << " %");
    // Section forces are compared against the largest force of the case (the
    // floor), so a near-zero N on a line in shear does not count as 100 %.
    for (const check::ConvergenceRow& r : o.convergence.rows)
        if (r.quantity.rfind("bolt force", 0) == 0 || r.quantity.rfind("normal force N", 0) == 0 ||
            r.quantity.rfind("shear force V", 0) == 0)
            CHECK_MESSAGE(std::abs(r.change()) < 0.02, r.quantity);
}

TEST_CASE("check pipeline: the stage callback sees every stage once, in the order they run") {
    // A coarse mesh keeps this quick; the stages do not depend on it.
    const model::Connection c =
        load_template("web-splice.toml", {"mesh.size=30", "mesh.near_hole_size=10"});
    std::vector<check::Stage> seen;
    check::CheckOptions options;
    options.on_stage = [&](check::Stage s) { seen.push_back(s); };
    const check::CheckOutcome o = check::check_connection(c, options);
    REQUIRE(o.convergence.done);
    const std::vector<check::Stage> expected = {check::Stage::model, check::Stage::checks,
                                                check::Stage::convergence,
                                                check::Stage::comparison};
    CHECK(seen == expected);
    for (const check::Stage s : expected) CHECK(std::string(check::words(s)).size() > 3);

    // Without the convergence mesh its two stages do not appear.
    seen.clear();
    options.two_mesh = false;
    check::check_connection(c, options);
    CHECK(seen == std::vector<check::Stage>{check::Stage::model, check::Stage::checks});
}

TEST_CASE("check pipeline: the model-mesh callback sees the final outcome but for the "
          "convergence, and its work is awaited before the pipeline returns") {
    const model::Connection c =
        load_template("web-splice.toml", {"mesh.size=30", "mesh.near_hole_size=10"});
    check::CheckOptions options;
    auto finished = std::make_shared<std::atomic<bool>>(false);
    std::vector<double> ratios;
    int calls = 0;
    bool convergence_seen = true;
    options.on_model_outcome = [&, finished](const check::CheckOutcome& partial) {
        ++calls;
        convergence_seen = partial.convergence.done;
        for (const check::CheckRow& r : partial.table.rows) ratios.push_back(r.ratio);
        // Work that ends well after the rest of the pipeline would, on a
        // thread of its own: a future that does not wait when destroyed, so
        // only the pipeline's own wait can make it finish first.
        std::promise<void> done;
        std::future<void> future = done.get_future();
        std::thread([finished, done = std::move(done)]() mutable {
            std::this_thread::sleep_for(std::chrono::milliseconds(300));
            *finished = true;
            done.set_value();
        }).detach();
        return future;
    };
    const check::CheckOutcome o = check::check_connection(c, options);
    CHECK(calls == 1);
    CHECK_FALSE(convergence_seen); // called before the convergence mesh is compared
    REQUIRE(o.convergence.done);
    REQUIRE(ratios.size() == o.table.rows.size());
    for (size_t i = 0; i < ratios.size(); ++i) CHECK(ratios[i] == o.table.rows[i].ratio);
    CHECK(*finished);

    // Without the convergence mesh little is left after the callback.
    *finished = false;
    options.two_mesh = false;
    check::check_connection(c, options);
    CHECK(*finished);
}

TEST_CASE("check pipeline: the concurrent convergence mesh gives the sequential results (the "
          "model mesh's bit for bit), and the stage callback stays on the calling thread") {
    // The model's mesh runs the same arithmetic in both orders (each case's
    // contact start on the finer mesh comes from the model mesh's settled
    // set either way), so its results are equal exactly. Run concurrently,
    // the finer mesh's cases may settle as two chains on two threads, the
    // second on a copy of the first factorization: the same settled sets,
    // reached through other factor modifications, so its numbers agree to
    // the round-off the contact iteration holds (residual 1e-10; 1e-9
    // relative, as tests/analysis/contact_seed_test.cpp).
    const model::Connection c = load_template("truss-gusset.toml", {"mesh.size=24"});
    check::CheckOptions options;
    options.concurrent = false;
    const check::CheckOutcome sequential = check::check_connection(c, options);
    options.concurrent = true;
    const std::thread::id caller = std::this_thread::get_id();
    bool on_caller = true;
    options.on_stage = [&](check::Stage) {
        on_caller = on_caller && std::this_thread::get_id() == caller;
    };
    REQUIRE(check::solves_concurrently(c, options) == (std::thread::hardware_concurrency() >= 2));
    const check::CheckOutcome concurrent = check::check_connection(c, options);
    CHECK(on_caller);
    REQUIRE(sequential.results.problem.has_contact);
    REQUIRE(sequential.convergence.done);
    REQUIRE(concurrent.convergence.rows.size() == sequential.convergence.rows.size());
    for (size_t k = 0; k < sequential.convergence.rows.size(); ++k) {
        const check::ConvergenceRow& a = sequential.convergence.rows[k];
        const check::ConvergenceRow& b = concurrent.convergence.rows[k];
        CAPTURE(a.quantity);
        CHECK(a.coarse == b.coarse);
        CHECK(std::abs(a.fine - b.fine) <= 1e-9 * std::max(1.0, std::abs(a.fine)));
    }
    CHECK(concurrent.convergence.fine_dofs == sequential.convergence.fine_dofs);
    REQUIRE(concurrent.results.cases.size() == sequential.results.cases.size());
    for (size_t i = 0; i < sequential.results.cases.size(); ++i) {
        CHECK(concurrent.results.cases[i].u == sequential.results.cases[i].u);
        CHECK(concurrent.results.cases[i].contact_iterations ==
              sequential.results.cases[i].contact_iterations);
    }
    REQUIRE(concurrent.table.rows.size() == sequential.table.rows.size());
    for (size_t k = 0; k < sequential.table.rows.size(); ++k)
        CHECK(concurrent.table.rows[k].ratio == sequential.table.rows[k].ratio);
}

TEST_CASE("check pipeline: no concurrency with a sweep's cache or without the convergence mesh") {
    const model::Connection c = load_template("truss-gusset.toml", {"mesh.size=24"});
    check::CheckOptions options;
    options.two_mesh = false;
    CHECK(!check::solves_concurrently(c, options));
    options.two_mesh = true;
    options.concurrent = false;
    CHECK(!check::solves_concurrently(c, options));
}
