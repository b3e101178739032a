// Fuzz target: the whole check on arbitrary bytes, load → coarsened mesh
// controls → check::check_connection (resource guard, mesh, analysis,
// sections, peaks, classical limit states, check table) → every report
// renderer in memory (calc sheet, results.json, model.vtu, figures, the
// terminal and JSON summaries). One mesh, coarse, the guard capped at a few
// thousand dofs, so each input runs in milliseconds. Allowed outcomes:
// success, lapwing::InputError (bad input) or lapwing::AnalysisError (a model
// that cannot be solved, or one above the cap). Anything else, any NaN or
// infinity in the results or check rows, and a results.json that does not
// parse is a defect.
#include "analysis/plate_region.hpp"
#include "analysis/resource_estimate.hpp"
#include "check/pipeline.hpp"
#include "core/error.hpp"
#include "input/load_connection.hpp"
#include "mesh/size_field.hpp"
#include "report/figures.hpp"
#include "report/outputs.hpp"
#include "report/terminal_summary.hpp"

#include <algorithm>
#include <cmath>
#include <cstddef>
#include <cstdint>
#include <cstdio>
#include <cstdlib>
#include <nlohmann/json.hpp>
#include <string>
#include <string_view>

namespace {

// The templates mesh to 2e4–3e4 dofs. Coarsened (below) they mesh to
// 2.7e3–4.7e3 dofs in Q4 (measured with `lapwing analyse --set mesh.size=…
// --set mesh.around_hole=8 --set mesh.element="Q4"` on every template and the
// demo project; the lap and web splices stop there at an inverted element,
// an AnalysisError), which the estimate puts at 4e3–1.1e4: it counts the
// refined rings of neighbouring holes twice at coarse sizes. The cap lets
// most through and refuses anything much larger. Quadratic elements are kept
// only up to half the cap: the truss gusset in Q8 at 8.7e3 dofs took 0.17 s
// of CPU in `lapwing analyse` (release build), too slow for fuzzing.
constexpr long max_dofs = 10000;
constexpr long max_quadratic_dofs = max_dofs / 2;

void require(bool ok, const char* what) {
    if (!ok) {
        std::fprintf(stderr, "fuzz_pipeline: %s\n", what);
        std::abort();
    }
}

} // namespace

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size) {
    using namespace lapwing;
    const std::string_view text(reinterpret_cast<const char*>(data), size);
    try {
        auto connection = input::load_connection(text, "fuzz.toml");
        // Coarsen a template-sized mesh so the seeds themselves get past the
        // cap: four times the element size the mesher would use (its own
        // default when the template gives none), 8 elements per hole (the
        // mesher's least).
        const auto settings = analysis::mesh_settings(connection);
        const double h =
            mesh::detail::element_size(analysis::plate_layout(connection).region, settings);
        connection.mesh.size = 4 * h;
        connection.mesh.near_hole_size = std::max(connection.mesh.near_hole_size, 4 * h);
        connection.mesh.around_hole = 8;
        // Quadratic elements where they are small, else Q4 (about a third of
        // the nodes), so both families are fuzzed.
        const auto coarse = analysis::mesh_settings(connection);
        if (analysis::estimate_resources(connection, coarse).dofs > max_quadratic_dofs)
            connection.mesh.element = model::ElementChoice::Q4;

        check::CheckOptions options;
        options.two_mesh = false;
        options.max_dofs = max_dofs;
        const check::CheckOutcome o = check::check_connection(connection, options);
        for (const auto& c : o.results.cases) {
            require(c.u.allFinite(), "displacements not finite");
            for (const auto& s : c.nodal_stress) require(s.allFinite(), "stress not finite");
            for (const auto& b : c.bolts) require(b.force.allFinite(), "bolt force not finite");
        }
        for (const auto& row : o.table.rows)
            require(std::isfinite(row.demand) && std::isfinite(row.ratio),
                    "check row demand or ratio not finite");

        report::RunInfo run;
        run.version = "fuzz";
        run.input_file = "fuzz.toml";
        run.resolved_model = input::write_resolved(connection);
        run.reproducible = true;
        run.date = report::reproducible_date;
        run.two_mesh = false;
        const auto figures = report::all_figures(o);
        require(!report::calc_sheet_html(o, run, figures).empty(), "empty calc sheet");
        // nlohmann::json writes a non-finite number as null: it must parse
        // back, and the check values above were already required finite.
        require(nlohmann::json::accept(report::results_json(o, run)),
                "results.json does not parse");
        require(!report::model_vtu(o).empty(), "empty model.vtu");
        report::SummaryOptions summary;
        summary.input_file = "fuzz.toml";
        require(!report::terminal_summary(o, summary).empty(), "empty summary");
        require(!report::summary_json(o, summary).empty(), "empty JSON summary");
    } catch (const InputError&) {
    } catch (const AnalysisError&) {
    }
    return 0;
}
