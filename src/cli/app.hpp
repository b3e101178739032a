// Entry point of the command line: parses argv and runs one subcommand.
#pragma once

namespace lapwing::cli {

// Returns the process exit code (0 ok, 2 bad input; see core/error.hpp).
int run(int argc, char** argv);

} // namespace lapwing::cli
