// The pieces of report.html, each rendering one part of the sheet to HTML
// text; html_sheet.cpp puts them in order.
#pragma once

#include "check/pipeline.hpp"
#include "report/figures.hpp"
#include "report/run_info.hpp"

#include <string>
#include <vector>

namespace lapwing::report {

std::string sheet_style(const model::Job& job);                   // html_style.cpp
std::string inputs_html(const check::CheckOutcome& outcome);      // html_inputs.cpp
std::string results_html(const check::CheckOutcome& outcome);     // html_results.cpp
std::string check_table_html(const check::CheckOutcome& outcome); // html_checks.cpp
std::string convergence_html(const check::CheckOutcome& outcome); // html_checks.cpp

// A table row of cells already escaped (or built) as HTML.
std::string row(const std::vector<std::string>& cells, const char* cls = nullptr);
std::string header_row(const std::vector<std::string>& cells);

} // namespace lapwing::report
