// The supernodal factorization with Eigen's dense kernels
// (fe/supernodal_numeric.hpp) against closed forms and against CHOLMOD's own
// numeric factorization through the BLAS, on the same analysis.
#ifdef LAPWING_HAVE_CHOLMOD
#include "fe/linear_static.hpp"
#include "fe/sparse_cholesky.hpp"
#include "fe/structured_grid.hpp"

#include <cmath>
#include <doctest/doctest.h>
#include <limits>
#include <vector>

using namespace lapwing::fe;

namespace {

// The n × n second-difference matrix tridiag(−1, 2, −1), lower triangle,
// with diagonal entry `at` set to `value`.
struct Lower {
    SparsePattern pattern;
    std::vector<double> values;
};

Lower second_difference(int n, int at = -1, double value = 2) {
    Lower m;
    m.pattern.n = n;
    m.pattern.col_start.push_back(0);
    for (int j = 0; j < n; ++j) {
        m.pattern.row.push_back(j);
        m.values.push_back(j == at ? value : 2.0);
        if (j + 1 < n) m.pattern.row.push_back(j + 1), m.values.push_back(-1.0);
        m.pattern.col_start.push_back(static_cast<int>(m.pattern.row.size()));
    }
    return m;
}

std::unique_ptr<SparseCholesky> factor(const Lower& m, DenseKernels kernels, Ordering ordering) {
    SolverOptions options;
    options.backend = SolverBackend::cholmod;
    options.ordering = ordering;
    options.dense_kernels = kernels;
    auto f = make_sparse_cholesky(options);
    f->analyse(m.pattern);
    f->factorize(m.pattern, m.values);
    return f;
}

// The lower triangle of K̃ for a k × k Q8 square on [0,100]², t = 5,
// E = 200 000, ν = 0.3, the edge x = 0 fixed.
Lower plate(int k) {
    const auto grid = make_structured_grid(ElementKind::Q8, k, k,
                                           bilinear_map({0, 0}, {100, 0}, {100, 100}, {0, 100}));
    const Model model = model_from_grid(grid, {200000.0, 0.3}, 5.0);
    Constraints c;
    for (int node : grid.side_nodes[3])
        c.prescribed.push_back({dof_ux(node), 0}), c.prescribed.push_back({dof_uy(node), 0});
    const DofMap map(model.n_dofs(), c);
    Assembler assembler(model, map);
    Lower m;
    m.pattern = assembler.pattern();
    Eigen::VectorXd prescribed;
    assembler.assemble(model, m.values, prescribed);
    return m;
}

double relative_difference(const Eigen::MatrixXd& a, const Eigen::MatrixXd& b) {
    return (a - b).cwiseAbs().maxCoeff() / b.cwiseAbs().maxCoeff();
}

} // namespace

TEST_CASE("Eigen kernels: the second-difference system gives the discrete Green's function") {
    // tridiag(−1, 2, −1) x = 1 has x_i = i (n + 1 − i) / 2, i = 1..n: the
    // exact solution of the discrete Poisson problem (the quadratic is
    // reproduced exactly by the second difference; common practice).
    const int n = 200;
    const Lower m = second_difference(n);
    for (const Ordering ordering : {Ordering::natural, Ordering::amd}) {
        const auto f = factor(m, DenseKernels::eigen, ordering);
        CHECK(f->stats().kernels == "Eigen");
        const Eigen::MatrixXd x = f->solve(Eigen::MatrixXd::Ones(n, 1));
        for (int i = 1; i <= n; ++i)
            CHECK(std::abs(x(i - 1, 0) - 0.5 * i * (n + 1 - i)) <= 1e-12 * 0.25 * n * n);
        // Its Cholesky pivots are (k + 1)/k: det = n + 1, so rcond follows
        // (min/max diagonal of L)² = (n + 1)/n / 2 for the natural order.
        if (ordering == Ordering::natural)
            CHECK(f->stats().rcond == doctest::Approx((n + 1.0) / n / 2.0).epsilon(1e-12));
    }
}

TEST_CASE("Eigen kernels agree with CHOLMOD's numeric factorization through the BLAS") {
    // Same analysis, same supernodes: only the order of the dense
    // operations differs, so the solutions agree to round-off (1e-12 of the
    // largest displacement; the plate's condition number is about 10⁵).
    const Lower m = plate(24);
    Eigen::MatrixXd b = Eigen::MatrixXd::Zero(m.pattern.n, 2);
    for (int i = 0; i < m.pattern.n; ++i) b(i, 0) = 1.0 + i % 7, b(i, 1) = (i % 2 ? -1.0 : 2.0);
    for (const Ordering ordering : {Ordering::amd, Ordering::node_metis, Ordering::natural}) {
        CAPTURE(static_cast<int>(ordering));
        const auto eigen = factor(m, DenseKernels::eigen, ordering);
        const auto blas = factor(m, DenseKernels::blas, ordering);
        CHECK(eigen->stats().kernels == "Eigen");
        CHECK(blas->stats().kernels == "BLAS");
        CHECK(eigen->stats().nnz_L == blas->stats().nnz_L);
        CHECK(eigen->stats().flops == blas->stats().flops);
        const Eigen::MatrixXd xe = eigen->solve(b), xb = blas->solve(b);
        CHECK(relative_difference(xe, xb) < 1e-12);
        CHECK(eigen->stats().rcond == doctest::Approx(blas->stats().rcond).epsilon(1e-10));
        // The residual of the Eigen factor's solution itself.
        const Eigen::MatrixXd r = symmetric_multiply(m.pattern, m.values, xe) - b;
        CHECK(r.cwiseAbs().maxCoeff() <= 1e-10 * b.cwiseAbs().maxCoeff());
    }
}

TEST_CASE("Eigen kernels: a factor made twice, modified and copied behaves as CHOLMOD's") {
    const Lower m = plate(12);
    const auto eigen = factor(m, DenseKernels::eigen, Ordering::amd);
    const auto blas = factor(m, DenseKernels::blas, Ordering::amd);
    // Factorized again over the first factor's values.
    Lower scaled = m;
    for (double& v : scaled.values) v *= 3;
    eigen->factorize(scaled.pattern, scaled.values);
    blas->factorize(scaled.pattern, scaled.values);
    const Eigen::MatrixXd b = Eigen::MatrixXd::Ones(m.pattern.n, 1);
    CHECK(relative_difference(eigen->solve(b), blas->solve(b)) < 1e-12);
    // A rank-1 update (CHOLMOD's updown on the Eigen-made factor) and a copy.
    Eigen::SparseMatrix<double> c(m.pattern.n, 1);
    c.insert(m.pattern.n - 1, 0) = 1e5;
    c.insert(m.pattern.n / 2, 0) = -1e5;
    REQUIRE(eigen->modify(c, true));
    REQUIRE(blas->modify(c, true));
    const auto copy = eigen->clone();
    REQUIRE(copy);
    CHECK(relative_difference(eigen->solve(b), blas->solve(b)) < 1e-12);
    CHECK(relative_difference(copy->solve(b), blas->solve(b)) < 1e-12);
}

TEST_CASE("Eigen kernels: a pivot that is not positive is reported at its unknown") {
    // tridiag(−1, 2, −1) has pivots (k + 1)/k; with the diagonal at 0-based
    // 30 set to −5 the pivot there is −5 − 30/31 < 0 and every earlier one
    // is positive, so the natural order fails exactly there.
    const Lower m = second_difference(60, 30, -5.0);
    for (const DenseKernels kernels : {DenseKernels::eigen, DenseKernels::blas}) {
        int unknown = -1;
        try {
            factor(m, kernels, Ordering::natural);
        } catch (const NotPositiveDefinite& e) {
            unknown = e.unknown();
        }
        CHECK(unknown == 30);
    }
    // A NaN is not a positive pivot either.
    const Lower nan = second_difference(60, 12, std::numeric_limits<double>::quiet_NaN());
    CHECK_THROWS_AS(factor(nan, DenseKernels::eigen, Ordering::natural), NotPositiveDefinite);
}

TEST_CASE("the automatic choice takes Eigen's kernels exactly where the reference BLAS is loaded") {
    const BlasInUse& blas = blas_in_use();
    CHECK_FALSE(blas.path.empty()); // CHOLMOD brings a BLAS with dgemm_
    const Lower m = second_difference(10);
    const auto f = factor(m, DenseKernels::automatic, Ordering::amd);
    CHECK(f->stats().kernels == (blas.reference ? "Eigen" : "BLAS"));
}
#endif
