// The report stage's entry points: each output as a string (cli/ writes
// them). Keys, file names and layout are documented in docs/results.md.
#pragma once

#include "check/pipeline.hpp"
#include "report/figures.hpp"
#include "report/run_info.hpp"

#include <string>
#include <vector>

namespace lapwing::report {

// report.html: the calc sheet, self-contained (inline CSS and SVG, no script).
std::string calc_sheet_html(const check::CheckOutcome& outcome, const RunInfo& run,
                            const std::vector<Figure>& figures);

// results.json: everything on the sheet as data (schema: docs/results.schema.json),
// with the list of `figures` (all_figures) under "figures".
std::string results_json(const check::CheckOutcome& outcome, const RunInfo& run,
                         const std::vector<Figure>& figures = {});

// model.vtu: the mesh with displacements, stresses and von Mises per case.
std::string model_vtu(const check::CheckOutcome& outcome);

// checks.csv: the check table, one line per row (RFC 4180, CRLF line ends):
// id, family, what, where, load_case, method, unit, demand, capacity, ratio
// (both empty for an information row), status, governing ("yes" or empty).
std::string checks_csv(const check::CheckOutcome& outcome);

} // namespace lapwing::report
