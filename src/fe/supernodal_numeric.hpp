// The numeric part of CHOLMOD's supernodal LLᵀ, done with Eigen's dense
// kernels instead of the BLAS. CHOLMOD's own (cholmod_super_numeric) calls
// dsyrk, dgemm, dpotrf and dtrsm for every supernode; with Debian's
// reference BLAS those run at 2–3 GFLOP/s on this project's machines, where
// Eigen's blocked products reach 10–16 (docs/benchmarks.md). The symbolic
// analysis, the factor's layout and everything after the factorization
// (solves, updates, copies, condition estimates) stay CHOLMOD's.
#pragma once

#include <string>

struct cholmod_sparse_struct;
struct cholmod_factor_struct;
struct cholmod_common_struct;

namespace lapwing::fe {

// Which dense kernels the CHOLMOD back end factorizes with.
enum class DenseKernels {
    automatic, // Eigen's where the BLAS in use is the reference BLAS, else the BLAS
    blas,      // CHOLMOD's own numeric factorization, through the BLAS
    eigen,     // supernodal_numeric below
};

// Whether the library that provides dgemm_ to this process is the reference
// BLAS (Debian's libblas3, installed as .../blas/libblas.so.3), and its path.
struct BlasInUse {
    bool reference = false;
    std::string path; // empty where dgemm_ is not found
};
const BlasInUse& blas_in_use();

// The supernodal numeric factorization LLᵀ = P A Pᵀ of the symmetric A (its
// lower triangle, stype −1) into L, a supernodal analysis made by
// cholmod_analyze for A's pattern, or a supernodal factor of it. Left-looking
// over the supernodes in order, as Ng & Peyton 1993 (SIAM J. Sci. Comput.
// 14:1034–1056) and CHOLMOD (Chen, Davis, Hager & Rajamanickam 2008, ACM
// TOMS 35:22): each supernode gathers the updates of its descendants, then
// factors its diagonal block and solves for the block below it. Returns
// false where CHOLMOD could not make L numeric (its status says why). A pivot
// that is not positive stops the factorization as in CHOLMOD: L->minor is its
// column and the status CHOLMOD_NOT_POSDEF; otherwise L->minor = n.
bool supernodal_numeric(const cholmod_sparse_struct& A, cholmod_factor_struct* L,
                        cholmod_common_struct* common);

} // namespace lapwing::fe
