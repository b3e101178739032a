// Direct CHOLMOD calls on a private copy of the assembled matrix.
#include "reference_cholmod.hpp"

#include "measure.hpp"

#include <algorithm>
#include <cholmod.h>
#include <fmt/format.h>
#include <stdexcept>

namespace lapwing::bench {

namespace {

// RAII for cholmod_common and the objects allocated in it.
class CholmodSession {
public:
    CholmodSession() { cholmod_start(&common); }
    ~CholmodSession() {
        if (X) cholmod_free_dense(&X, &common);
        if (B) cholmod_free_dense(&B, &common);
        if (L) cholmod_free_factor(&L, &common);
        if (A) cholmod_free_sparse(&A, &common);
        cholmod_finish(&common);
    }
    CholmodSession(const CholmodSession&) = delete;
    CholmodSession& operator=(const CholmodSession&) = delete;

    cholmod_common common{};
    cholmod_sparse* A = nullptr;
    cholmod_factor* L = nullptr;
    cholmod_dense* B = nullptr;
    cholmod_dense* X = nullptr;
};

std::string ordering_name(int o) {
    static constexpr const char* names[] = {"natural",           "given",  "AMD",        "METIS",
                                            "nested dissection", "COLAMD", "postordered"};
    return (o >= 0 && o <= 6) ? names[o] : fmt::format("ordering {}", o);
}

} // namespace

ReferenceRun run_reference_cholmod(const fe::SparsePattern& pattern, std::span<const double> values,
                                   const Eigen::VectorXd& b) {
    CholmodSession s;
    const auto n = static_cast<size_t>(pattern.n);
    const auto nnz = static_cast<size_t>(pattern.nnz());
    // Copy outside the timed region: CHOLMOD owns its own matrix.
    s.A = cholmod_allocate_sparse(n, n, nnz, 1, 1, -1, CHOLMOD_REAL, &s.common);
    s.B = cholmod_allocate_dense(n, 1, n, CHOLMOD_REAL, &s.common);
    if (!s.A || !s.B) throw std::runtime_error("reference CHOLMOD: allocation failed");
    std::copy(pattern.col_start.begin(), pattern.col_start.end(), static_cast<int*>(s.A->p));
    std::copy(pattern.row.begin(), pattern.row.end(), static_cast<int*>(s.A->i));
    std::copy(values.begin(), values.end(), static_cast<double*>(s.A->x));
    std::copy(b.data(), b.data() + b.size(), static_cast<double*>(s.B->x));

    ReferenceRun out;
    {
        const Stopwatch clock;
        s.L = cholmod_analyze(s.A, &s.common);
        out.seconds_analyse = clock.seconds();
        out.cpu_seconds_analyse = clock.cpu_seconds();
    }
    if (!s.L)
        throw std::runtime_error(
            fmt::format("reference CHOLMOD: analyse failed ({})", s.common.status));
    {
        const Stopwatch clock;
        cholmod_factorize(s.A, s.L, &s.common);
        out.seconds_factorize = clock.seconds();
        out.cpu_seconds_factorize = clock.cpu_seconds();
    }
    if (s.common.status != CHOLMOD_OK)
        throw std::runtime_error(
            fmt::format("reference CHOLMOD: factorize failed ({})", s.common.status));
    out.flops = s.common.fl;
    out.nnz_L = s.common.lnz;
    out.ordering = ordering_name(s.L->ordering);
    out.supernodal = s.L->is_super != 0;
    {
        const Stopwatch clock;
        s.X = cholmod_solve(CHOLMOD_A, s.L, s.B, &s.common);
        out.seconds_solve = clock.seconds();
        out.cpu_seconds_solve = clock.cpu_seconds();
    }
    if (!s.X) throw std::runtime_error("reference CHOLMOD: solve failed");
    out.x = Eigen::Map<const Eigen::VectorXd>(static_cast<const double*>(s.X->x), pattern.n);
    return out;
}

} // namespace lapwing::bench
