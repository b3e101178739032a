// Fuzz target: the whole pipeline on arbitrary bytes, load → resource guard
// → plate layout → mesh → analysis, with the guard capped at a few thousand
// dofs so each input runs in milliseconds. Allowed outcomes: success,
// lapwing::InputError (bad input) or lapwing::AnalysisError (a model that
// cannot be solved, or one above the cap). Anything else, and any NaN or
// infinity in the results, is a defect.
#include "analysis/analyse.hpp"
#include "analysis/plate_region.hpp"
#include "analysis/resource_estimate.hpp"
#include "core/error.hpp"
#include "input/load_connection.hpp"
#include "mesh/mesh.hpp"

#include <cstddef>
#include <cstdint>
#include <cstdio>
#include <cstdlib>
#include <string_view>

namespace {

// The templates mesh to 2e4–3e4 dofs; the cap keeps a run to milliseconds,
// so inputs are coarsened first (see below) rather than refused outright.
constexpr long max_dofs = 4000;

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
        const auto connection = input::load_connection(text, "fuzz.toml");
        auto settings = analysis::mesh_settings(connection);
        // Coarsen a template-sized mesh to the cap so the seeds themselves
        // get past the guard: four times the element size, 8 per hole.
        settings.element_size *= 4;
        settings.elements_around_hole = 8;
        analysis::check_resources(analysis::estimate_resources(connection, settings), settings,
                                  max_dofs);
        const auto layout = analysis::plate_layout(connection);
        const auto m = mesh::build_mesh(layout.region, settings);
        const auto r = analysis::analyse(connection, m, layout);
        for (const auto& c : r.cases) {
            require(c.u.allFinite(), "displacements not finite");
            for (const auto& s : c.nodal_stress) require(s.allFinite(), "stress not finite");
            for (const auto& b : c.bolts) require(b.force.allFinite(), "bolt force not finite");
        }
    } catch (const InputError&) {
    } catch (const AnalysisError&) {
    }
    return 0;
}
