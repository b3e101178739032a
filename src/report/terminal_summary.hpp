// What `lapwing check` prints: the governing row per family and overall,
// the verdict and where the files went; coloured only when asked (cli/
// asks when standard output is a terminal). And the same as one JSON
// object for scripts (--json).
#pragma once

#include "check/pipeline.hpp"

#include <string>
#include <vector>

namespace lapwing::report {

struct SummaryOptions {
    bool colour = false;
    std::string input_file;
    std::string folder;             // where the files went; empty: none written
    std::vector<std::string> files; // names written, in order
};

std::string terminal_summary(const check::CheckOutcome& outcome, const SummaryOptions& options);
std::string summary_json(const check::CheckOutcome& outcome, const SummaryOptions& options);

} // namespace lapwing::report
