// Supernodal LLᵀ with Eigen's dense kernels on CHOLMOD's symbolic factor.
#include "fe/supernodal_numeric.hpp"

#include <Eigen/Cholesky>
#include <Eigen/Core>
#include <algorithm>
#include <cholmod.h>
#include <climits>
#include <cmath>
#include <dlfcn.h>
#include <filesystem>
#include <vector>

namespace lapwing::fe {

namespace {

using Panel = Eigen::Map<Eigen::MatrixXd, 0, Eigen::OuterStride<>>;
using ConstPanel = Eigen::Map<const Eigen::MatrixXd, 0, Eigen::OuterStride<>>;

BlasInUse find_blas() {
    BlasInUse b;
    void* symbol = dlsym(RTLD_DEFAULT, "dgemm_");
    Dl_info info{};
    if (!symbol || !dladdr(symbol, &info) || !info.dli_fname) return b;
    std::error_code ec;
    // Through the alternatives' symbolic links to the file itself.
    const std::filesystem::path file = std::filesystem::canonical(info.dli_fname, ec);
    b.path = ec ? std::string(info.dli_fname) : file.string();
    const std::filesystem::path p(b.path);
    // Debian and Ubuntu install the reference BLAS as <libdir>/blas/libblas.so.3
    // and the optimised ones beside it under their own names (openblas-pthread/,
    // blis-openmp/, atlas/, ...).
    b.reference =
        p.parent_path().filename() == "blas" && p.filename().string().rfind("libblas.so", 0) == 0;
    return b;
}

// The pattern of tril(P A Pᵀ) by columns, from A's lower triangle: column k
// holds the rows i ≥ k of permuted column k, the entries scattered into
// supernode k's block, and where each value sits in A (an index instead of a
// copy of the value: 4 bytes an entry less at the largest models' peak).
struct PermutedLower {
    std::vector<int> start, row, source;
};

PermutedLower permuted_lower(const cholmod_sparse& A, const int* perm, int n) {
    // A's entries are indexed by int, as its column pointers are (CHOLMOD_INT).
    std::vector<int> position(static_cast<size_t>(n));
    for (int k = 0; k < n; ++k) position[static_cast<size_t>(perm ? perm[k] : k)] = k;
    const auto* Ap = static_cast<const int*>(A.p);
    const auto* Ai = static_cast<const int*>(A.i);
    PermutedLower out;
    out.start.assign(static_cast<size_t>(n) + 1, 0);
    for (int j = 0; j < n; ++j)
        for (int p = Ap[j]; p < Ap[j + 1]; ++p)
            if (Ai[p] >= j) {
                const int a = position[static_cast<size_t>(Ai[p])];
                const int b = position[static_cast<size_t>(j)];
                ++out.start[static_cast<size_t>(std::min(a, b)) + 1];
            }
    for (size_t k = 0; k < static_cast<size_t>(n); ++k) out.start[k + 1] += out.start[k];
    out.row.resize(static_cast<size_t>(out.start.back()));
    out.source.resize(out.row.size());
    std::vector<int> fill(out.start.begin(), out.start.end() - 1);
    for (int j = 0; j < n; ++j)
        for (int p = Ap[j]; p < Ap[j + 1]; ++p)
            if (Ai[p] >= j) {
                const int a = position[static_cast<size_t>(Ai[p])];
                const int b = position[static_cast<size_t>(j)];
                const auto at = static_cast<size_t>(fill[static_cast<size_t>(std::min(a, b))]++);
                out.row[at] = std::max(a, b);
                out.source[at] = p;
            }
    return out;
}

} // namespace

const BlasInUse& blas_in_use() {
    static const BlasInUse b = find_blas();
    return b;
}

bool supernodal_numeric(const cholmod_sparse& A, cholmod_factor* L, cholmod_common* common) {
    if (!L->is_super || A.stype >= 0 || A.itype != CHOLMOD_INT || A.xtype != CHOLMOD_REAL ||
        !A.packed || A.nrow != L->n || A.ncol != L->n) {
        common->status = CHOLMOD_INVALID;
        return false;
    }
    // A symbolic factor gets its numeric part (L->xsize values), as
    // cholmod_super_numeric does; a numeric one is overwritten in place.
    if (!cholmod_change_factor(CHOLMOD_REAL, true, true, true, true, L, common)) return false;
    const int n = static_cast<int>(L->n);
    const int nsuper = static_cast<int>(L->nsuper);
    const auto* super = static_cast<const int*>(L->super);
    const auto* Lpi = static_cast<const int*>(L->pi);
    const auto* Lpx = static_cast<const int*>(L->px);
    const auto* Ls = static_cast<const int*>(L->s);
    auto* Lx = static_cast<double*>(L->x);
    const PermutedLower a = permuted_lower(A, static_cast<const int*>(L->Perm), n);
    const auto* Ax = static_cast<const double*>(A.x);

    // map: a row's place in the current supernode's row list. Descendants
    // wait in the list head[s] of the supernode holding their next row; pos
    // is how many of a supernode's rows have been used so far.
    std::vector<int> map(static_cast<size_t>(n)), super_of(static_cast<size_t>(n));
    std::vector<int> head(static_cast<size_t>(nsuper), -1), next(static_cast<size_t>(nsuper), -1);
    std::vector<int> pos(static_cast<size_t>(nsuper), 0), relative;
    std::vector<double> update; // one descendant's update, up to L->maxcsize values
    for (int s = 0; s < nsuper; ++s)
        for (int k = super[s]; k < super[s + 1]; ++k) super_of[static_cast<size_t>(k)] = s;
    const auto wait_for_row = [&](int supernode, int row) {
        const int target = super_of[static_cast<size_t>(row)];
        next[static_cast<size_t>(supernode)] = head[static_cast<size_t>(target)];
        head[static_cast<size_t>(target)] = supernode;
    };

    for (int s = 0; s < nsuper; ++s) {
        const int k1 = super[s], k2 = super[s + 1], nscol = k2 - k1;
        const int psi = Lpi[s], nsrow = Lpi[s + 1] - psi;
        double* xs = Lx + Lpx[s];
        Panel panel(xs, nsrow, nscol, Eigen::OuterStride<>(nsrow));
        for (int i = 0; i < nsrow; ++i) map[static_cast<size_t>(Ls[psi + i])] = i;

        // The supernode's columns of P A Pᵀ.
        panel.setZero();
        for (int k = k1; k < k2; ++k) {
            double* column = xs + static_cast<long>(k - k1) * nsrow;
            for (int p = a.start[static_cast<size_t>(k)]; p < a.start[static_cast<size_t>(k) + 1];
                 ++p)
                column[map[static_cast<size_t>(a.row[static_cast<size_t>(p)])]] +=
                    Ax[a.source[static_cast<size_t>(p)]];
        }

        // Less L_d L_dᵀ over the descendants d with rows in columns k1..k2−1:
        // rows r1 (those in k1..k2−1) and r2 (all from there on) of d give
        // L_d(r2, :) L_d(r1, :)ᵀ, its top square symmetric.
        for (int d = head[static_cast<size_t>(s)]; d >= 0;) {
            const int d_next = next[static_cast<size_t>(d)];
            const int ndcol = super[d + 1] - super[d];
            const int pdi = Lpi[d], ndrow = Lpi[d + 1] - pdi;
            const int p = pos[static_cast<size_t>(d)];
            int ndrow1 = 0;
            while (p + ndrow1 < ndrow && Ls[pdi + p + ndrow1] < k2) ++ndrow1;
            const int ndrow2 = ndrow - p;
            const ConstPanel rows(Lx + Lpx[d] + p, ndrow2, ndcol, Eigen::OuterStride<>(ndrow));
            update.resize(std::max(update.size(), static_cast<size_t>(ndrow2) * ndrow1));
            Eigen::Map<Eigen::MatrixXd> c(update.data(), ndrow2, ndrow1);
            const auto top = rows.topRows(ndrow1);
            c.topRows(ndrow1).triangularView<Eigen::Lower>() = top * top.transpose();
            if (ndrow2 > ndrow1)
                c.bottomRows(ndrow2 - ndrow1).noalias() =
                    rows.bottomRows(ndrow2 - ndrow1) * top.transpose();
            relative.resize(static_cast<size_t>(ndrow2));
            for (int i = 0; i < ndrow2; ++i)
                relative[static_cast<size_t>(i)] = map[static_cast<size_t>(Ls[pdi + p + i])];
            for (int j = 0; j < ndrow1; ++j) {
                double* column = xs + static_cast<long>(Ls[pdi + p + j] - k1) * nsrow;
                for (int i = j; i < ndrow2; ++i)
                    column[relative[static_cast<size_t>(i)]] -= c(i, j);
            }
            pos[static_cast<size_t>(d)] = p + ndrow1;
            if (ndrow2 > ndrow1) wait_for_row(d, Ls[pdi + p + ndrow1]);
            d = d_next;
        }

        // The diagonal block's Cholesky factor, then the block below it,
        // L21 = A21 L11⁻ᵀ.
        Eigen::Ref<Eigen::MatrixXd> diagonal = panel.topRows(nscol);
        Eigen::Index bad = Eigen::internal::llt_inplace<double, Eigen::Lower>::blocked(diagonal);
        for (int j = 0; j < nscol && bad < 0; ++j)
            if (!(diagonal(j, j) > 0)) bad = j; // a NaN passes the blocked test
        if (bad >= 0) {
            L->minor = static_cast<size_t>(k1 + bad);
            common->status = CHOLMOD_NOT_POSDEF;
            return true;
        }
        if (nsrow > nscol) {
            auto below = panel.bottomRows(nsrow - nscol);
            diagonal.transpose().triangularView<Eigen::Upper>().solveInPlace<Eigen::OnTheRight>(
                below);
            pos[static_cast<size_t>(s)] = nscol;
            wait_for_row(s, Ls[psi + nscol]);
        }
    }
    L->minor = L->n;
    common->status = CHOLMOD_OK;
    return true;
}

} // namespace lapwing::fe
