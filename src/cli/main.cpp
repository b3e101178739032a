// lapwing command line. The subcommands are added as their stages land; for
// now `verify` runs the shipped benchmark examples through the FE core.
#include "cli/verify_command.hpp"

#include <cstdio>
#include <iostream>
#include <string>

int main(int argc, char** argv) {
    const std::string command = argc > 1 ? argv[1] : "";
    if (command == "--version") {
        std::printf("lapwing %s (%s)\n", LAPWING_VERSION, LAPWING_BUILD_ID);
        return 0;
    }
    if (command == "verify") return lapwing::cli::run_verify(argc > 2 ? argv[2] : "all", std::cout);
    std::fprintf(stderr, "usage: lapwing verify [all|cook|cantilever]   run published benchmarks "
                         "through the solver\n"
                         "       lapwing --version\n");
    return command.empty() || command == "--help" ? 0 : 2;
}
