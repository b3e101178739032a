// What the outputs say about the run itself, for traceability: the program,
// the command line, the date and the digests of the input and the resolved
// model. Filled by cli/ (which reads the file and the clock).
#pragma once

#include <string>

namespace lapwing::report {

struct RunInfo {
    std::string program = "lapwing";
    std::string version;      // e.g. "0.1.0"
    std::string build_id;     // git description of the build
    std::string command_line; // as typed
    std::string input_file;   // as named on the command line
    std::string input_sha256;
    std::string resolved_model; // input::write_resolved text
    std::string resolved_sha256;
    std::string date;          // UTC, "YYYY-MM-DD HH:MM:SS UTC"; fixed when reproducible
    bool reproducible = false; // no timings, fixed date
    bool two_mesh = true;      // the convergence mesh was solved
};

// The date written with --reproducible (a fixed instant, so two runs give
// byte-identical files).
inline constexpr const char* reproducible_date = "2000-01-01 00:00:00 UTC";

} // namespace lapwing::report
