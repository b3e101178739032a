// Sparse Cholesky factorization of the reduced stiffness: CHOLMOD's
// supernodal LLᵀ by default (Chen, Davis, Hager & Rajamanickam 2008, ACM TOMS
// 35:22), Eigen's SimplicialLDLT as the fallback. The symbolic analysis (the
// fill-reducing ordering) is done once per pattern and reused by every
// numeric factorization of new values.
#pragma once

#include "fe/assembly.hpp"
#include "fe/supernodal_numeric.hpp"

#include <Eigen/Core>
#include <Eigen/SparseCore>
#include <memory>
#include <span>
#include <stdexcept>
#include <string>

namespace lapwing::fe {

enum class SolverBackend { cholmod, eigen_ldlt };
// node_amd: AMD on the graph of groups of consecutive unknowns with the same
// adjacency (the ux, uy of a node), expanded to the unknowns; a quarter of
// the edges of the unknowns' graph for plane elements. nested_dissection:
// geometric nested dissection of the same node graph from the positions in
// SparsePattern::position (fe/nested_dissection.hpp), leaves and separators
// ordered by CAMD; node_amd where the positions are missing. node_metis:
// METIS's multilevel nested dissection (Karypis & Kumar 1998, SIAM J. Sci.
// Comput. 20:359–392) of the node graph. node_best: AMD on the nodes, and
// where that fill is poor (CHOLMOD's own test: flops ≥ 500 nnz(L)) METIS on
// the nodes as well, keeping the one with fewer flops. adaptive: the same
// rule with AMD on the unknowns as the first ordering, so that wherever its
// fill is not poor (every gusset-sized model) it is exactly `amd`; at
// 2·10⁶ dofs it switches to METIS on the nodes (docs/benchmarks.md).
enum class Ordering {
    automatic,
    amd,
    metis,
    natural,
    node_amd,
    nested_dissection,
    node_metis,
    node_best,
    adaptive
};

struct SolverOptions {
#ifdef LAPWING_HAVE_CHOLMOD
    SolverBackend backend = SolverBackend::cholmod;
#else
    SolverBackend backend = SolverBackend::eigen_ldlt;
#endif
    // automatic: CHOLMOD's own choice (AMD, then METIS on the unknowns when
    // AMD's fill is poor); adaptive does the same with METIS on the nodes.
    Ordering ordering = Ordering::adaptive;
    // node_best and adaptive try METIS where the first ordering's
    // factorization takes at least this many flops per entry of L (and L
    // has at least 5 entries per entry of A). 500 is CHOLMOD's own threshold
    // (cholmod_analyze, Common->method[0].fl_ratio... in its user guide).
    double poor_fill_flops_per_entry = 500;
    // CHOLMOD's numeric factorization through the BLAS, or the same
    // supernodal algorithm with Eigen's dense kernels (fe/supernodal_numeric.hpp);
    // automatic takes Eigen's where the reference BLAS is the one loaded,
    // about 5 times slower than Eigen's products on this project's machines
    // (docs/benchmarks.md), and leaves any other BLAS to CHOLMOD.
    DenseKernels dense_kernels = DenseKernels::automatic;
};

struct FactorStats {
    std::string backend;
    std::string ordering;  // the ordering actually used
    std::string kernels{}; // the dense kernels of the numeric factorization
    double nnz_A = 0;      // lower triangle of the reduced matrix
    double nnz_L = 0;      // factor non-zeros
    double flops = 0;      // floating-point operations of the numeric factorization
    double rcond = 0;      // reciprocal condition estimate (min/max diag of L)²
    double seconds_analyse = 0;
    double seconds_factorize = 0;
};

// The factorization stopped at a pivot that is not positive: the matrix is
// singular (unrestrained) or not positive definite.
class NotPositiveDefinite : public std::runtime_error {
public:
    NotPositiveDefinite(int unknown, const std::string& what)
        : std::runtime_error(what), unknown_(unknown) {}
    int unknown() const { return unknown_; } // the unknown at the failed pivot
private:
    int unknown_;
};

class SparseCholesky {
public:
    virtual ~SparseCholesky() = default;
    virtual void analyse(const SparsePattern& pattern) = 0;
    // Throws NotPositiveDefinite.
    virtual void factorize(const SparsePattern& pattern, std::span<const double> values) = 0;
    // Solves for every column of b.
    virtual Eigen::MatrixXd solve(const Eigen::MatrixXd& b) const = 0;
    // The factor of A ± Σ c cᵀ over the columns c of `columns` (unknowns ×
    // rank), made by modifying the current factor rather than factorizing
    // again: a few changed springs cost a few paths of the elimination tree.
    // False where the back end cannot, or the modified factor is no longer
    // safely positive definite; the factor is then unusable until the next
    // factorize().
    virtual bool modify(const Eigen::SparseMatrix<double>& columns, bool add) {
        (void)columns;
        (void)add;
        return false;
    }
    virtual FactorStats stats() const = 0;
    // An independent copy of the analysis and the factor, to modify and
    // solve on another thread; nullptr where the back end cannot copy.
    virtual std::unique_ptr<SparseCholesky> clone() const { return nullptr; }
};

std::unique_ptr<SparseCholesky> make_sparse_cholesky(const SolverOptions& options);

// y = A x for the symmetric matrix stored as its lower triangle.
Eigen::MatrixXd symmetric_multiply(const SparsePattern& pattern, std::span<const double> values,
                                   const Eigen::MatrixXd& x);

} // namespace lapwing::fe
