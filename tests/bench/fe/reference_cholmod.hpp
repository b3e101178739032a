// The reference the lapwing solve path is held to: CHOLMOD called directly,
// with its default settings (cholmod_start, nothing changed), on a copy of
// the very matrix lapwing assembled: cholmod_analyze + cholmod_factorize +
// cholmod_solve, each timed.
#pragma once

#include "fe/assembly.hpp"

#include <Eigen/Core>
#include <span>
#include <string>

namespace lapwing::bench {

struct ReferenceRun {
    double seconds_analyse = 0;
    double seconds_factorize = 0;
    double seconds_solve = 0;
    double cpu_seconds_analyse = 0;
    double cpu_seconds_factorize = 0;
    double cpu_seconds_solve = 0;
    double nnz_L = 0;
    double flops = 0;
    std::string ordering; // the ordering CHOLMOD's default strategy settled on
    bool supernodal = false;
    Eigen::VectorXd x; // solution of A x = b
    double total() const { return seconds_analyse + seconds_factorize + seconds_solve; }
};

// A = the symmetric matrix whose lower triangle is (pattern, values).
// Throws std::runtime_error when CHOLMOD fails.
ReferenceRun run_reference_cholmod(const fe::SparsePattern& pattern, std::span<const double> values,
                                   const Eigen::VectorXd& b);

} // namespace lapwing::bench
