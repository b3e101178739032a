// The benchmarks' --kernels flag: which dense kernels lapwing's numeric
// factorization uses (fe::SolverOptions::dense_kernels), so both can be
// timed in the same build and the same run.
#pragma once

#include "fe/supernodal_numeric.hpp"

#include <stdexcept>
#include <string>

namespace lapwing::bench {

inline fe::DenseKernels parse_kernels(const std::string& s) {
    if (s == "automatic") return fe::DenseKernels::automatic;
    if (s == "eigen") return fe::DenseKernels::eigen;
    if (s == "blas") return fe::DenseKernels::blas;
    throw std::invalid_argument("--kernels " + s + ": expected automatic, eigen or blas");
}

inline const char* kernels_name(fe::DenseKernels k) {
    switch (k) {
    case fe::DenseKernels::eigen:
        return "eigen";
    case fe::DenseKernels::blas:
        return "blas";
    case fe::DenseKernels::automatic:
        break;
    }
    return "automatic";
}

} // namespace lapwing::bench
