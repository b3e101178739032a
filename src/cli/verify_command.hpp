// `lapwing verify [EXAMPLE]`: runs a shipped verification example (a
// published benchmark) through the finite-element core and prints the
// computed value beside the published one.
#pragma once

#include <iosfwd>
#include <string>
#include <vector>

namespace lapwing::cli {

// Names of the shipped examples, in the order `verify` runs them.
std::vector<std::string> verify_examples();

// Runs one example ("all" runs every one); returns the process exit code
// (0 when every computed value is within its stated tolerance, 1 otherwise,
// 2 for an unknown example name).
int run_verify(const std::string& example, std::ostream& out);

} // namespace lapwing::cli
