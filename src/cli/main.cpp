// lapwing: the executable. Everything happens in cli::run.
#include "cli/app.hpp"

int main(int argc, char** argv) {
    return lapwing::cli::run(argc, argv);
}
