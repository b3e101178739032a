// `lapwing sweep` and `lapwing merge`: their arguments and entry points
// (the CLI11 wiring is in app.cpp).
#pragma once

#include <iosfwd>
#include <string>
#include <vector>

namespace lapwing::cli {

struct SweepArgs {
    std::string file;
    std::vector<std::string> vary; // KEY=START:STOP:STEP or KEY=A,B,C
    std::vector<std::string> sets;
    int threads = 0;                 // 0: every core
    std::string output_folder = "."; // sweep.csv and sweep.html
    std::string find_min;            // the axis to search, empty: the full grid
    std::string shard;               // "I/N", empty: the whole grid
    bool single_mesh = false;        // no convergence mesh per variant
    bool no_reuse = false;           // mesh and factorize every variant afresh
    bool reports = false;            // each variant's calc sheet in DIR/variants/NAME/
    bool reproducible = false;       // reports with a fixed date and no timings
    bool quiet = false;
    long max_dofs = 5'000'000; // analysis::default_max_dofs, for every variant's meshes
    std::string command_line;
};
// Exit codes: 0 the sweep was written, 2 bad input or no variant could be
// built, 3 an output could not be written (sweep.csv, sweep.html, or with
// --reports the files of some variant: the others and the sweep are still
// written), 130 interrupted (the completed rows in sweep-interrupted.csv).
int run_sweep(const SweepArgs& args, std::ostream& out, std::ostream& err);

// `lapwing merge SHARD.csv... [-o FILE] [--expect N]`: one sweep.csv from shard files.
int run_merge(const std::vector<std::string>& files, const std::string& output, int expect,
              std::ostream& out, std::ostream& err);

} // namespace lapwing::cli
