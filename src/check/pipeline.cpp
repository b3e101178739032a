// The check pipeline: evaluate on the model's mesh, build the check table,
// evaluate again on a mesh with half the element size and compare.
#include "check/pipeline.hpp"

#include "analysis/plate_region.hpp"
#include "check/evaluation.hpp"
#include "mesh/size_field.hpp"

#include <algorithm>
#include <chrono>
#include <cmath>
#include <fmt/format.h>
#include <future>
#include <thread>

namespace lapwing::check {

double ConvergenceRow::change() const {
    const double scale = std::max({std::abs(fine), std::abs(coarse), floor});
    return scale > 0 ? (fine - coarse) / scale : 0.0;
}

double Convergence::largest_change() const {
    double largest = 0;
    for (const ConvergenceRow& r : rows) largest = std::max(largest, std::abs(r.change()));
    return largest;
}

const char* words(Stage stage) {
    switch (stage) {
    case Stage::model:
        return "meshing and solving the load cases";
    case Stage::checks:
        return "checking";
    case Stage::convergence:
        return "convergence mesh: meshing, solving and measuring";
    case Stage::comparison:
        return "convergence mesh: comparing with the model's mesh";
    }
    return "working";
}

namespace {

// The values compared between the two meshes: every peak, weld and section
// figure that a check row uses.
void compare(const CheckOutcome& coarse, const Evaluation& fine, Convergence& out) {
    for (size_t k = 0; k < coarse.results.cases.size(); ++k) {
        const std::string& lc = coarse.results.cases[k].name;
        out.rows.push_back({"peak von Mises away from bolt holes", lc, Quantity::stress,
                            coarse.peaks[k].von_mises_away, fine.peaks[k].von_mises_away});
        if (coarse.peaks[k].has_hole_zone && fine.peaks[k].has_hole_zone)
            out.rows.push_back({"peak von Mises at bolt holes", lc, Quantity::stress,
                                coarse.peaks[k].von_mises_at_holes,
                                fine.peaks[k].von_mises_at_holes});
        out.rows.push_back({"largest principal stress", lc, Quantity::stress,
                            coarse.peaks[k].max_principal, fine.peaks[k].max_principal});
        for (size_t s = 0; s < coarse.sections.size() && s < fine.sections.size(); ++s) {
            const SectionStress& a = coarse.section_stress[k][s];
            const SectionStress& b = fine.section_stress[k][s];
            const std::string& id = coarse.sections[s].id;
            out.rows.push_back(
                {fmt::format("normal force N, {}", id), lc, Quantity::force, a.N, b.N});
            out.rows.push_back(
                {fmt::format("shear force V, {}", id), lc, Quantity::force, a.V, b.V});
            out.rows.push_back({fmt::format("membrane stress, {}", id), lc, Quantity::stress,
                                a.max_membrane, b.max_membrane});
            out.rows.push_back({fmt::format("membrane + bending, {}", id), lc, Quantity::stress,
                                a.max_membrane_plus_bending, b.max_membrane_plus_bending});
        }
        for (size_t k2 = 0;
             k2 < coarse.results.cases[k].bolts.size() && k2 < fine.results.cases[k].bolts.size();
             ++k2)
            out.rows.push_back({fmt::format("bolt force, bolt {}", k2), lc, Quantity::force,
                                coarse.results.cases[k].bolts[k2].magnitude,
                                fine.results.cases[k].bolts[k2].magnitude});
        for (size_t w = 0; w < coarse.welds.size(); ++w) {
            const WeldForces& a = coarse.weld_forces[k][w];
            const WeldForces& b = fine.weld_forces[k][w];
            out.rows.push_back({fmt::format("average force per length, {}", coarse.welds[w].id), lc,
                                Quantity::force_per_length, a.average, b.average});
            out.rows.push_back(
                {fmt::format("highest edge-average force per length, {}", coarse.welds[w].id), lc,
                 Quantity::force_per_length, a.peak_edge_average, b.peak_edge_average});
        }
    }
}

} // namespace

mesh::MeshSettings fine_mesh_settings(const geometry::PlateRegion& region,
                                      const mesh::MeshSettings& settings) {
    mesh::MeshSettings fine = settings;
    fine.element_size = 0.5 * mesh::detail::element_size(region, settings);
    fine.elements_around_hole = 2 * mesh::detail::elements_around_hole(settings);
    return fine;
}

void check_resources(const model::Connection& c, bool two_mesh, long max_dofs) {
    const mesh::MeshSettings settings = analysis::mesh_settings(c);
    analysis::check_resources(analysis::estimate_resources(c, settings), settings, max_dofs);
    if (!two_mesh) return;
    const mesh::MeshSettings fine = fine_mesh_settings(analysis::plate_layout(c).region, settings);
    // The model's own mesh fits: the message names the second one and the
    // quickest way out.
    analysis::check_resources(analysis::estimate_resources(c, fine), fine, max_dofs,
                              "the convergence mesh (half the element size, solved after the "
                              "model's own mesh; --single-mesh skips it)");
}

// Whether a second core is there for the convergence mesh, and memory for
// both meshes and `fine_factors` copies of the finer mesh's factor at once.
bool room_beside(const model::Connection& c, const CheckOptions& options, int fine_factors) {
    if (!options.two_mesh || !options.concurrent || options.cache) return false;
    if (std::thread::hardware_concurrency() < 2) return false;
    // The model's mesh is about a quarter of the finer one; each estimate is
    // a mesh's whole peak, so a second factor is counted as a second peak.
    const mesh::MeshSettings settings = analysis::mesh_settings(c);
    const mesh::MeshSettings fine = fine_mesh_settings(analysis::plate_layout(c).region, settings);
    const double bytes = analysis::estimate_resources(c, settings).bytes +
                         fine_factors * analysis::estimate_resources(c, fine).bytes;
    return bytes <= static_cast<double>(analysis::default_max_dofs) * analysis::bytes_per_dof;
}

bool solves_concurrently(const model::Connection& c, const CheckOptions& options) {
    return room_beside(c, options, 1);
}

// The convergence mesh's contact cases settle on two threads where there is
// room for a second factor: its factorization outlasts the model's mesh, so
// the second core is idle by then.
int fine_contact_threads(const model::Connection& c, const CheckOptions& options) {
    return room_beside(c, options, 2) ? 2 : 1;
}

CheckOutcome check_connection(const model::Connection& c, const CheckOptions& options) {
    check_resources(c, options.two_mesh, options.max_dofs);
    CheckOutcome out;
    out.connection = c;
    const auto seconds_since = [](std::chrono::steady_clock::time_point t) {
        return std::chrono::duration<double>(std::chrono::steady_clock::now() - t).count();
    };
    const auto stage = [&](Stage s) {
        if (options.on_stage) options.on_stage(s);
    };
    const mesh::MeshSettings settings = analysis::mesh_settings(c);
    // The convergence mesh starts each case's contact iteration from the
    // model mesh's settled set (fewer passes, the same settled set), in
    // either order of running.
    analysis::ContactBoard board(c.load_cases.size() + c.combinations.size());
    const analysis::ContactHooks publish = board.publisher();
    analysis::ContactHooks read = board.reader();
    read.threads = fine_contact_threads(c, options);
    mesh::MeshSettings fine_settings;
    if (options.two_mesh)
        fine_settings = fine_mesh_settings(analysis::plate_layout(c).region, settings);
    const bool concurrent = solves_concurrently(c, options);
    // Declared after the board it reads: destroyed (joined) first.
    std::future<Evaluation> fine_future;
    if (concurrent)
        fine_future = std::async(std::launch::async,
                                 [&] { return evaluate(c, fine_settings, nullptr, &read); });

    stage(Stage::model);
    Evaluation e;
    try {
        e = evaluate(c, settings, options.cache, options.two_mesh ? &publish : nullptr);
    } catch (...) {
        board.finish(); // release the other thread; its outcome is not wanted
        throw;
    }
    board.finish();
    stage(Stage::checks);
    auto start = std::chrono::steady_clock::now();
    std::vector<CheckRow> rows = stress_rows(c, e);
    std::vector<CheckRow> classical = classical_rows(c, e);
    rows.insert(rows.end(), std::make_move_iterator(classical.begin()),
                std::make_move_iterator(classical.end()));
    out.table = make_table(std::move(rows));
    out.seconds.mesh = e.seconds_mesh;
    out.seconds.analysis = e.seconds_analysis;
    out.seconds.checks = e.seconds_measure + seconds_since(start);
    out.layout = std::move(e.layout);
    out.mesh = std::move(e.mesh);
    out.results = std::move(e.results);
    out.sections = std::move(e.sections);
    out.section_stress = std::move(e.section_stress);
    out.peaks = std::move(e.peaks);
    out.welds = std::move(e.welds);
    out.weld_forces = std::move(e.weld_forces);
    out.element_size = e.element_size;
    // Declared after `out`, which it may read: waited for first, also when
    // the convergence mesh throws.
    struct WaitOnExit {
        std::future<void> work;
        ~WaitOnExit() {
            if (work.valid()) work.wait();
        }
    } model_outcome;
    if (options.on_model_outcome) model_outcome.work = options.on_model_outcome(out);

    if (options.two_mesh) {
        // Globally refined rather than only near the governing regions: simpler
        // to state, and every row gets its evidence (the cost is about four
        // times the model's own solve).
        stage(Stage::convergence);
        const Evaluation f =
            concurrent ? fine_future.get() : evaluate(c, fine_settings, options.cache, &read);
        stage(Stage::comparison);
        start = std::chrono::steady_clock::now();
        Convergence& cv = out.convergence;
        cv.done = true;
        cv.coarse_size = out.element_size;
        cv.fine_size = f.element_size;
        cv.coarse_elements = out.mesh.n_elements();
        cv.fine_elements = f.mesh.n_elements();
        cv.coarse_dofs = out.results.problem.model.n_dofs();
        cv.fine_dofs = f.results.problem.model.n_dofs();
        compare(out, f, cv);
        for (ConvergenceRow& r : cv.rows) {
            double largest = 0;
            for (const ConvergenceRow& o : cv.rows)
                if (o.unit == r.unit && o.load_case == r.load_case)
                    largest = std::max({largest, std::abs(o.coarse), std::abs(o.fine)});
            r.floor = 0.1 * largest;
        }
        out.seconds.checks += seconds_since(start);
        // The finer mesh's own time, whether or not it overlapped the above.
        out.seconds.fine_mesh = f.seconds_mesh + f.seconds_analysis + f.seconds_measure;
    }
    if (model_outcome.work.valid()) model_outcome.work.get(); // its exceptions are ours
    return out;
}

} // namespace lapwing::check
