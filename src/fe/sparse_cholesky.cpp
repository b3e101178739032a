// The two factorization back ends behind one interface.
#include "fe/sparse_cholesky.hpp"

#include "fe/large_pages.hpp"
#include "fe/nested_dissection.hpp"
#include "fe/openmp_scope.hpp"

#include <Eigen/OrderingMethods>
#include <Eigen/SparseCholesky>
#include <chrono>
#include <fmt/format.h>

#ifdef LAPWING_HAVE_CHOLMOD
#include <cholmod.h>
#endif

namespace lapwing::fe {

namespace {

double seconds_since(std::chrono::steady_clock::time_point start) {
    return std::chrono::duration<double>(std::chrono::steady_clock::now() - start).count();
}

using SparseLower = Eigen::Map<const Eigen::SparseMatrix<double, Eigen::ColMajor, int>>;

SparseLower as_eigen(const SparsePattern& p, std::span<const double> values) {
    return SparseLower(p.n, p.n, p.nnz(), p.col_start.data(), p.row.data(), values.data());
}

// ---- Eigen SimplicialLDLT ------------------------------------------------
class EigenLdlt final : public SparseCholesky {
public:
    void analyse(const SparsePattern& pattern) override {
        const auto start = std::chrono::steady_clock::now();
        std::vector<double> zeros(static_cast<size_t>(pattern.nnz()), 0.0);
        ldlt_.analyzePattern(as_eigen(pattern, zeros));
        stats_.seconds_analyse = seconds_since(start);
        stats_.nnz_A = static_cast<double>(pattern.nnz());
    }
    void factorize(const SparsePattern& pattern, std::span<const double> values) override {
        const auto start = std::chrono::steady_clock::now();
        ldlt_.factorize(as_eigen(pattern, values));
        stats_.seconds_factorize = seconds_since(start);
        const Eigen::VectorXd d = ldlt_.vectorD();
        // A pivot that is not positive fails as in CHOLMOD; a positive but
        // vanishing one is left to the caller's reciprocal-condition guard.
        int bad = -1;
        const double d_max = d.cwiseAbs().maxCoeff();
        for (int i = 0; i < d.size(); ++i)
            if (!(d(i) > 0)) {
                bad = i;
                break;
            }
        if (ldlt_.info() != Eigen::Success || bad >= 0) {
            const int unknown = bad >= 0 ? ldlt_.permutationPinv().indices()(bad) : 0;
            throw NotPositiveDefinite(unknown,
                                      "the LDLᵀ factorization met a pivot that is not positive");
        }
        stats_.rcond = d.minCoeff() / d_max;
        stats_.nnz_L =
            static_cast<double>(ldlt_.matrixL().nestedExpression().nonZeros() + d.size());
    }
    Eigen::MatrixXd solve(const Eigen::MatrixXd& b) const override { return ldlt_.solve(b); }
    FactorStats stats() const override { return stats_; }

private:
    Eigen::SimplicialLDLT<Eigen::SparseMatrix<double>, Eigen::Lower, Eigen::AMDOrdering<int>> ldlt_;
    FactorStats stats_{"Eigen SimplicialLDLT", "AMD (Eigen)"};
};

#ifdef LAPWING_HAVE_CHOLMOD
// Maximal runs of consecutive unknowns whose columns of the full symmetric
// pattern are equal (a node's ux and uy when both are free: DofMap numbers
// them one after the other), and the graph of these groups.
struct UnknownGroups {
    std::vector<int> start; // group g holds unknowns start[g] .. start[g+1]
    AdjacencyGraph graph;
};

UnknownGroups group_unknowns(const SparsePattern& p) {
    const int n = p.n;
    const auto col = [&](int j) {
        return static_cast<size_t>(p.col_start[static_cast<size_t>(j)]);
    };
    // The full symmetric adjacency (both triangles, diagonal left out).
    std::vector<int> start(static_cast<size_t>(n) + 1, 0);
    for (int j = 0; j < n; ++j)
        for (size_t k = col(j); k < col(j + 1); ++k) {
            const int i = p.row[k];
            if (i == j) continue;
            ++start[static_cast<size_t>(i) + 1];
            ++start[static_cast<size_t>(j) + 1];
        }
    for (size_t j = 0; j < static_cast<size_t>(n); ++j) start[j + 1] += start[j];
    std::vector<int> adj(static_cast<size_t>(start.back()));
    {
        std::vector<int> fill(start.begin(), start.end() - 1);
        // Columns in order: each list comes out sorted (upper part first, by
        // column, then the lower part, by row).
        for (int j = 0; j < n; ++j)
            for (size_t k = col(j); k < col(j + 1); ++k)
                if (const int i = p.row[k]; i != j)
                    adj[static_cast<size_t>(fill[static_cast<size_t>(i)]++)] = j;
        for (int j = 0; j < n; ++j)
            for (size_t k = col(j); k < col(j + 1); ++k)
                if (const int i = p.row[k]; i != j)
                    adj[static_cast<size_t>(fill[static_cast<size_t>(j)]++)] = i;
    }
    // j and j+1 are one group when adj(j) ∪ {j} = adj(j+1) ∪ {j+1}.
    const auto same = [&](int j) {
        const auto a0 = adj.begin() + start[static_cast<size_t>(j)],
                   a1 = adj.begin() + start[static_cast<size_t>(j) + 1];
        const auto b0 = a1, b1 = adj.begin() + start[static_cast<size_t>(j) + 2];
        if (a1 - a0 != b1 - b0) return false;
        // Both hold each other; compare the rest, skipping j+1 in a and j in b.
        auto a = a0, b = b0;
        while (a != a1 || b != b1) {
            if (a != a1 && *a == j + 1) {
                ++a;
                continue;
            }
            if (b != b1 && *b == j) {
                ++b;
                continue;
            }
            if (a == a1 || b == b1 || *a != *b) return false;
            ++a, ++b;
        }
        return true;
    };
    UnknownGroups out;
    std::vector<int> group_of(static_cast<size_t>(n));
    out.start.push_back(0);
    for (int j = 0; j < n; ++j) {
        group_of[static_cast<size_t>(j)] = static_cast<int>(out.start.size()) - 1;
        if (j + 1 == n || !same(j)) out.start.push_back(j + 1);
    }
    // The groups' graph, from each group's first unknown (its list is sorted
    // and group_of is monotone, so repeats are adjacent).
    AdjacencyGraph& g = out.graph;
    g.n = static_cast<int>(out.start.size()) - 1;
    g.start.reserve(static_cast<size_t>(g.n) + 1);
    g.start.push_back(0);
    g.adj.reserve(adj.size() / 4 + 16);
    for (int h = 0; h < g.n; ++h) {
        const int j = out.start[static_cast<size_t>(h)];
        int last = -1;
        for (int k = start[static_cast<size_t>(j)]; k < start[static_cast<size_t>(j) + 1]; ++k) {
            const int m = group_of[static_cast<size_t>(adj[static_cast<size_t>(k)])];
            if (m != h && m != last) g.adj.push_back(m), last = m;
        }
        g.start.push_back(static_cast<int>(g.adj.size()));
    }
    return out;
}

// ---- CHOLMOD supernodal LLᵀ ----------------------------------------------
class Cholmod final : public SparseCholesky {
public:
    explicit Cholmod(const SolverOptions& options)
        : ordering_(options.ordering),
          poor_fill_flops_per_entry_(options.poor_fill_flops_per_entry),
          kernels_(options.dense_kernels) {
        if (kernels_ == DenseKernels::automatic)
            kernels_ = blas_in_use().reference ? DenseKernels::eigen : DenseKernels::blas;
        stats_.kernels = kernels_ == DenseKernels::eigen ? "Eigen" : "BLAS";
        use_large_pages_for_cholmod();
        cholmod_start(&common_);
        common_.supernodal = CHOLMOD_SUPERNODAL;
        common_.final_ll = 1;
        common_.print = 0;
        // Supernodal amalgamation: CHOLMOD merges a child supernode into its
        // parent when the merged one has at most nrelax[0..2] columns or at
        // most zrelax[0..2] of its entries as explicit zeros (defaults 4, 16,
        // 48 and 0.8, 0.1, 0.05; CHOLMOD User Guide, cholmod_super_symbolic).
        // The zeros buy larger dense blocks, which pay where the dense
        // kernels are fast; at the largest models they cost memory. Tighter
        // limits took the factor's peak at 2·10⁶ Q8 dofs from 3,936,080 to
        // 3,863,168 KiB and the demo check's instructions down by 0.4–0.7 %
        // (docs/benchmarks.md, 2026-12-03, third session).
        common_.nrelax[1] = 8;
        common_.nrelax[2] = 16;
        common_.zrelax[1] = 0.02;
        common_.zrelax[2] = 0.01;
        switch (ordering_) {
        case Ordering::automatic:
            break; // CHOLMOD's defaults
        case Ordering::amd:
        case Ordering::adaptive:
            common_.nmethods = 1;
            common_.method[0].ordering = CHOLMOD_AMD;
            common_.postorder = 1;
            break;
        case Ordering::metis:
            common_.nmethods = 1;
            common_.method[0].ordering = CHOLMOD_METIS;
            common_.postorder = 1;
            break;
        case Ordering::natural:
            common_.nmethods = 1;
            common_.method[0].ordering = CHOLMOD_NATURAL;
            common_.postorder = 0;
            break;
        case Ordering::node_amd:
        case Ordering::nested_dissection:
        case Ordering::node_metis:
        case Ordering::node_best:
            common_.nmethods = 1;
            common_.method[0].ordering = CHOLMOD_GIVEN;
            common_.postorder = 1;
            break;
        }
    }
    ~Cholmod() override {
        if (factor_) cholmod_free_factor(&factor_, &common_);
        if (symbolic_) cholmod_free_factor(&symbolic_, &common_);
        cholmod_finish(&common_);
    }
    Cholmod(const Cholmod&) = delete;
    Cholmod& operator=(const Cholmod&) = delete;

    void analyse(const SparsePattern& pattern) override {
        const SerialOpenMpScope serial;
        const auto start = std::chrono::steady_clock::now();
        // The ordering needs the structure only: a pattern matrix, rather
        // than an nnz-long array of zeros allocated (and faulted in) for it.
        cholmod_sparse A = view(pattern, {});
        A.xtype = CHOLMOD_PATTERN;
        if (factor_) cholmod_free_factor(&factor_, &common_);
        if (symbolic_) cholmod_free_factor(&symbolic_, &common_);
        std::string node_ordering;
        if (on_nodes()) {
            NodeGraph graph(pattern);
            node_ordering = analyse_on_nodes(A, graph, pattern);
        } else {
            factor_ = cholmod_analyze(&A, &common_);
            if (factor_ && ordering_ == Ordering::adaptive && fill_is_poor(pattern)) {
                NodeGraph graph(pattern);
                node_ordering = try_node_metis(A, graph, pattern)
                                    ? "METIS on nodes (AMD's fill poor)"
                                    : "AMD (METIS on nodes tried)";
            }
        }
        if (!factor_)
            throw std::runtime_error(
                fmt::format("CHOLMOD analysis failed (status {})", common_.status));
        // The symbolic factor (ordering and supernodes) is small next to the
        // numeric one; a copy restores it after modify() has turned the
        // factor simplicial, instead of ordering the same pattern again.
        symbolic_ = cholmod_copy_factor(factor_, &common_);
        if (!symbolic_)
            throw std::runtime_error(
                fmt::format("CHOLMOD could not copy the analysis (status {})", common_.status));
        stats_.seconds_analyse = seconds_since(start);
        stats_.nnz_A = static_cast<double>(pattern.nnz());
        static constexpr const char* names[] = {
            "natural", "given", "AMD", "METIS", "nested dissection", "COLAMD", "postordered"};
        const int o = factor_->ordering;
        stats_.ordering = !node_ordering.empty() ? node_ordering
                          : (o >= 0 && o <= 6)   ? names[o]
                                                 : "?";
    }
    void factorize(const SparsePattern& pattern, std::span<const double> values) override {
        const SerialOpenMpScope serial;
        // A modified factor is simplicial LDLᵀ: start again from the kept
        // supernodal analysis of the same pattern.
        if (modified_) {
            cholmod_free_factor(&factor_, &common_);
            factor_ = cholmod_copy_factor(symbolic_, &common_);
            if (!factor_)
                throw std::runtime_error(
                    fmt::format("CHOLMOD could not copy the analysis (status {})", common_.status));
            modified_ = false;
        }
        const auto start = std::chrono::steady_clock::now();
        cholmod_sparse A = view(pattern, values);
        if (kernels_ == DenseKernels::eigen)
            supernodal_numeric(A, factor_, &common_);
        else
            cholmod_factorize(&A, factor_, &common_);
        stats_.seconds_factorize = seconds_since(start);
        if (common_.status == CHOLMOD_NOT_POSDEF || factor_->minor < factor_->n) {
            const auto* perm = static_cast<const int*>(factor_->Perm);
            const int unknown = perm ? perm[factor_->minor] : static_cast<int>(factor_->minor);
            throw NotPositiveDefinite(
                unknown, "the Cholesky factorization met a pivot that is not positive");
        }
        if (common_.status < CHOLMOD_OK)
            throw std::runtime_error(
                fmt::format("CHOLMOD factorization failed (status {})", common_.status));
        stats_.flops = common_.fl;
        stats_.nnz_L = common_.lnz;
        stats_.rcond = cholmod_rcond(factor_, &common_);
    }
    Eigen::MatrixXd solve(const Eigen::MatrixXd& b) const override {
        const SerialOpenMpScope serial;
        Eigen::MatrixXd rhs = b;
        cholmod_dense B{};
        B.nrow = static_cast<size_t>(rhs.rows());
        B.ncol = static_cast<size_t>(rhs.cols());
        B.nzmax = B.nrow * B.ncol;
        B.d = B.nrow;
        B.x = rhs.data();
        B.xtype = CHOLMOD_REAL;
        B.dtype = CHOLMOD_DOUBLE;
        cholmod_dense* X = cholmod_solve(CHOLMOD_A, factor_, &B, &common_);
        if (!X) throw std::runtime_error("CHOLMOD solve failed");
        Eigen::MatrixXd x =
            Eigen::Map<Eigen::MatrixXd>(static_cast<double*>(X->x), rhs.rows(), rhs.cols());
        cholmod_free_dense(&X, &common_);
        return x;
    }
    FactorStats stats() const override { return stats_; }

    std::unique_ptr<SparseCholesky> clone() const override {
        SolverOptions options;
        options.backend = SolverBackend::cholmod;
        options.ordering = ordering_;
        options.poor_fill_flops_per_entry = poor_fill_flops_per_entry_;
        options.dense_kernels = kernels_;
        auto copy = std::make_unique<Cholmod>(options);
        const auto copied = [&](cholmod_factor* f) {
            if (!f) return f;
            cholmod_factor* c = cholmod_copy_factor(f, &copy->common_);
            if (!c)
                throw std::runtime_error(fmt::format(
                    "CHOLMOD could not copy the factor (status {})", copy->common_.status));
            return c;
        };
        copy->factor_ = copied(factor_);
        copy->symbolic_ = copied(symbolic_);
        copy->modified_ = modified_;
        copy->stats_ = stats_;
        return copy;
    }

    // CHOLMOD's multiple-rank update and downdate (Davis & Hager 2001, SIAM
    // J. Matrix Anal. Appl. 22:997–1013), which turns the factor into a
    // simplicial LDLᵀ. It works on the rows of L, so the columns are
    // permuted by the fill-reducing ordering first.
    bool modify(const Eigen::SparseMatrix<double>& columns, bool add) override {
        if (!factor_ || columns.rows() != static_cast<Eigen::Index>(factor_->n)) return false;
        if (columns.nonZeros() == 0) return true;
        const SerialOpenMpScope serial;
        const auto n = static_cast<int>(factor_->n);
        const auto* perm = static_cast<const int*>(factor_->Perm);
        std::vector<int> position(static_cast<size_t>(n));
        for (int k = 0; k < n; ++k) position[static_cast<size_t>(perm ? perm[k] : k)] = k;
        std::vector<Eigen::Triplet<double>> entries;
        for (int j = 0; j < columns.outerSize(); ++j)
            for (Eigen::SparseMatrix<double>::InnerIterator it(columns, j); it; ++it)
                entries.emplace_back(position[static_cast<size_t>(it.row())], j, it.value());
        Eigen::SparseMatrix<double, Eigen::ColMajor, int> permuted(columns.rows(), columns.cols());
        permuted.setFromTriplets(entries.begin(), entries.end());
        permuted.makeCompressed();
        cholmod_sparse C{};
        C.nrow = static_cast<size_t>(permuted.rows());
        C.ncol = static_cast<size_t>(permuted.cols());
        C.nzmax = static_cast<size_t>(permuted.nonZeros());
        C.p = permuted.outerIndexPtr();
        C.i = permuted.innerIndexPtr();
        C.x = permuted.valuePtr();
        C.stype = 0;
        C.itype = CHOLMOD_INT;
        C.xtype = CHOLMOD_REAL;
        C.dtype = CHOLMOD_DOUBLE;
        C.sorted = 1;
        C.packed = 1;
        const auto start = std::chrono::steady_clock::now();
        modified_ = true;
        const int ok = cholmod_updown(add ? 1 : 0, &C, factor_, &common_);
        stats_.seconds_factorize = seconds_since(start);
        if (!ok || common_.status != CHOLMOD_OK || factor_->is_super || factor_->is_ll)
            return false;
        // D is stored on L's diagonal: every pivot must stay positive.
        const auto* Lp = static_cast<const int*>(factor_->p);
        const auto* Lx = static_cast<const double*>(factor_->x);
        for (int j = 0; j < n; ++j)
            if (!(Lx[Lp[j]] > 0)) return false;
        stats_.rcond = cholmod_rcond(factor_, &common_);
        return true;
    }

private:
    bool on_nodes() const {
        return ordering_ == Ordering::node_amd || ordering_ == Ordering::nested_dissection ||
               ordering_ == Ordering::node_metis || ordering_ == Ordering::node_best;
    }

    // The groups of unknowns (fe: a node's ux, uy) and the lower triangle of
    // their graph, as CHOLMOD takes it (stype -1).
    struct NodeGraph {
        UnknownGroups groups;
        std::vector<int> gp{0}, gi;
        cholmod_sparse G{};

        explicit NodeGraph(const SparsePattern& p) : groups(group_unknowns(p)) {
            const int n_groups = groups.graph.n;
            gi.reserve(groups.graph.adj.size() / 2);
            for (int g = 0; g < n_groups; ++g) {
                for (int k = groups.graph.start[static_cast<size_t>(g)];
                     k < groups.graph.start[static_cast<size_t>(g) + 1]; ++k)
                    if (const int h = groups.graph.adj[static_cast<size_t>(k)]; h > g)
                        gi.push_back(h);
                gp.push_back(static_cast<int>(gi.size()));
            }
            G.nrow = G.ncol = static_cast<size_t>(n_groups);
            G.nzmax = gi.size();
            G.p = gp.data();
            G.i = gi.data();
            G.stype = -1;
            G.itype = CHOLMOD_INT;
            G.xtype = CHOLMOD_PATTERN;
            G.dtype = CHOLMOD_DOUBLE;
            G.sorted = 1;
            G.packed = 1;
        }
        NodeGraph(const NodeGraph&) = delete;
        NodeGraph& operator=(const NodeGraph&) = delete;

        // A permutation of the groups, expanded to their unknowns in turn.
        std::vector<int> expand(const std::vector<int>& group_perm, int n) const {
            std::vector<int> perm;
            perm.reserve(static_cast<size_t>(n));
            for (const int g : group_perm)
                for (int j = groups.start[static_cast<size_t>(g)];
                     j < groups.start[static_cast<size_t>(g) + 1]; ++j)
                    perm.push_back(j);
            return perm;
        }
    };

    enum class NodeMethod { amd, coordinates, metis };

    // The node graph ordered by AMD, by CAMD under the geometric
    // dissection's constraint sets, or by METIS.
    std::vector<int> node_permutation(NodeGraph& graph, const SparsePattern& p, NodeMethod method) {
        const int n_groups = graph.groups.graph.n;
        std::vector<int> group_perm(static_cast<size_t>(n_groups));
        switch (method) {
        case NodeMethod::coordinates: {
            std::vector<Vector2> xy(static_cast<size_t>(n_groups));
            for (int g = 0; g < n_groups; ++g)
                xy[static_cast<size_t>(g)] =
                    p.position[static_cast<size_t>(graph.groups.start[static_cast<size_t>(g)])];
            std::vector<int> sets =
                coordinate_dissection_sets(graph.groups.graph, xy, dissection_leaf);
            if (!cholmod_camd(&graph.G, nullptr, 0, sets.data(), group_perm.data(), &common_))
                throw std::runtime_error(fmt::format(
                    "CHOLMOD's CAMD failed on the node graph (status {})", common_.status));
            break;
        }
        case NodeMethod::metis:
            // No postorder here: cholmod_analyze_p postorders the unknowns.
            if (!cholmod_metis(&graph.G, nullptr, 0, 0, group_perm.data(), &common_))
                throw std::runtime_error(fmt::format(
                    "CHOLMOD's METIS failed on the node graph (status {})", common_.status));
            break;
        case NodeMethod::amd:
            if (!cholmod_amd(&graph.G, nullptr, 0, group_perm.data(), &common_))
                throw std::runtime_error(fmt::format(
                    "CHOLMOD's AMD failed on the node graph (status {})", common_.status));
            break;
        }
        return graph.expand(group_perm, p.n);
    }

    cholmod_factor* analyse_given(cholmod_sparse& A, std::vector<int>& perm) {
        // cholmod_analyze_p uses `perm` only for a method set to GIVEN (an
        // AMD method would order A again).
        const int method = common_.method[0].ordering;
        common_.method[0].ordering = CHOLMOD_GIVEN;
        cholmod_factor* f = cholmod_analyze_p(&A, perm.data(), nullptr, 0, &common_);
        common_.method[0].ordering = method;
        if (!f)
            throw std::runtime_error(
                fmt::format("CHOLMOD analysis failed (status {})", common_.status));
        return f;
    }

    // Sets factor_ from an ordering of the node graph; returns its name.
    std::string analyse_on_nodes(cholmod_sparse& A, NodeGraph& graph, const SparsePattern& p) {
        if (ordering_ == Ordering::nested_dissection) {
            // Nested dissection needs a position for every unknown; without
            // them it falls back to AMD on the nodes.
            const bool dissect = p.position.size() == static_cast<size_t>(p.n);
            std::vector<int> perm =
                node_permutation(graph, p, dissect ? NodeMethod::coordinates : NodeMethod::amd);
            factor_ = analyse_given(A, perm);
            return dissect ? "nested dissection on nodes" : "AMD on nodes";
        }
        if (ordering_ == Ordering::node_metis) {
            std::vector<int> perm = node_permutation(graph, p, NodeMethod::metis);
            factor_ = analyse_given(A, perm);
            return "METIS on nodes";
        }
        std::vector<int> perm = node_permutation(graph, p, NodeMethod::amd);
        factor_ = analyse_given(A, perm);
        if (ordering_ == Ordering::node_amd) return "AMD on nodes";
        // node_best.
        if (!fill_is_poor(p)) return "AMD on nodes";
        return try_node_metis(A, graph, p) ? "METIS on nodes (AMD's fill poor)"
                                           : "AMD on nodes (METIS tried)";
    }

    // CHOLMOD's default strategy keeps AMD when its factorization takes
    // fewer than 500 flops per entry of L (or L has fewer than 5 entries per
    // entry of A): then a nested dissection could save little against the
    // time it takes to compute. Reads the analysis just made (common_).
    bool fill_is_poor(const SparsePattern& p) const {
        return common_.fl >= poor_fill_flops_per_entry_ * common_.lnz &&
               common_.lnz >= poor_fill_entries_ratio * static_cast<double>(p.nnz());
    }

    // Orders the node graph by METIS too and keeps it in factor_ if its
    // factorization takes fewer flops than the analysis in factor_ now.
    bool try_node_metis(cholmod_sparse& A, NodeGraph& graph, const SparsePattern& p) {
        const double fl_first = common_.fl, lnz_first = common_.lnz;
        std::vector<int> perm_metis = node_permutation(graph, p, NodeMethod::metis);
        cholmod_factor* metis = analyse_given(A, perm_metis);
        if (common_.fl < fl_first) {
            cholmod_free_factor(&factor_, &common_);
            factor_ = metis;
            return true;
        }
        cholmod_free_factor(&metis, &common_);
        common_.fl = fl_first;
        common_.lnz = lnz_first;
        return false;
    }

    static cholmod_sparse view(const SparsePattern& p, std::span<const double> values) {
        cholmod_sparse A{};
        A.nrow = A.ncol = static_cast<size_t>(p.n);
        A.nzmax = static_cast<size_t>(p.nnz());
        A.p = const_cast<int*>(p.col_start.data());
        A.i = const_cast<int*>(p.row.data());
        A.x = const_cast<double*>(values.data());
        A.stype = -1; // lower triangle stored
        A.itype = CHOLMOD_INT;
        A.xtype = CHOLMOD_REAL;
        A.dtype = CHOLMOD_DOUBLE;
        A.sorted = 1;
        A.packed = 1;
        return A;
    }

    // Parts of at most this many nodes are left to CAMD undivided (the best
    // of 32 to 25 000 on the benchmark plate at 10⁵ dofs, tests/bench/fe).
    static constexpr int dissection_leaf = 128;
    // CHOLMOD's defaults for trying another ordering after AMD (the
    // cholmod_common fields method[0].fl_ratio... are documented in the
    // CHOLMOD user guide, "Common->nmethods = 0"); the flops threshold comes
    // from SolverOptions.
    static constexpr double poor_fill_entries_ratio = 5;
    Ordering ordering_;
    double poor_fill_flops_per_entry_;
    DenseKernels kernels_;
    mutable cholmod_common common_{};
    cholmod_factor* factor_ = nullptr;
    cholmod_factor* symbolic_ = nullptr; // copy of the analysis, for after modify()
    bool modified_ = false;              // by modify(): simplicial LDLᵀ now
    FactorStats stats_{"CHOLMOD supernodal", "?"};
};
#endif

} // namespace

std::unique_ptr<SparseCholesky>
make_sparse_cholesky([[maybe_unused]] const SolverOptions& options) {
#ifdef LAPWING_HAVE_CHOLMOD
    if (options.backend == SolverBackend::cholmod) return std::make_unique<Cholmod>(options);
#endif
    return std::make_unique<EigenLdlt>();
}

Eigen::MatrixXd symmetric_multiply(const SparsePattern& pattern, std::span<const double> values,
                                   const Eigen::MatrixXd& x) {
    return as_eigen(pattern, values).selfadjointView<Eigen::Lower>() * x;
}

} // namespace lapwing::fe
