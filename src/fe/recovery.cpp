// Stress recovery: extrapolation + averaging, SPR, and the ZZ estimate.
#include "fe/recovery.hpp"

#include "fe/isoparametric_map.hpp"
#include "fe/quadrature.hpp"

#include <Eigen/Cholesky>
#include <algorithm>
#include <cmath>

namespace lapwing::fe {

namespace {

std::span<const int> nodes_of(const Element& el) {
    return {el.nodes.data(), static_cast<size_t>(node_count(el.kind))};
}

// Evaluation weights that extrapolate values at an n×n Gauss lattice (n = 2
// or 3, ξ fastest) to the reference point (ξ, η): the Lagrange interpolant
// through the Gauss points, evaluated outside them.
std::array<double, 9> extrapolation_weights(int n, double xi, double eta) {
    std::array<double, 9> w{};
    if (n == 2) {
        const double s = std::sqrt(3.0); // Gauss points at ±1/√3 map to ±1
        const ShapeAt<4> q = shape_q4(xi * s, eta * s);
        // Q4 node order (−,−) (+,−) (+,+) (−,+) against the lattice (ξ fastest).
        w[0] = q.N(0), w[1] = q.N(1), w[2] = q.N(3), w[3] = q.N(2);
    } else {
        const double s = 1.0 / std::sqrt(0.6); // Gauss points at ±√0.6 map to ±1
        const ShapeAt<9> q = shape_q9(xi * s, eta * s);
        for (int node = 0; node < 9; ++node) {
            const Vector2 r = reference_node(node);
            const int i = static_cast<int>(r.x()) + 1, j = static_cast<int>(r.y()) + 1;
            w[static_cast<size_t>(i + 3 * j)] = q.N(node);
        }
    }
    return w;
}

// The elements around each node, compressed (counting sort by node): the
// elements of node n are elements[start[n] .. start[n + 1]), in element order.
void elements_of_nodes(const Model& model, std::vector<int>& start, std::vector<int>& elements) {
    start.assign(static_cast<size_t>(model.n_nodes()) + 1, 0);
    for (const Element& el : model.elements)
        for (int node : nodes_of(el)) ++start[static_cast<size_t>(node) + 1];
    for (size_t n = 1; n < start.size(); ++n) start[n] += start[n - 1];
    elements.resize(static_cast<size_t>(start.back()));
    std::vector<int> next(start.begin(), start.end() - 1);
    for (int e = 0; e < static_cast<int>(model.elements.size()); ++e)
        for (int node : nodes_of(model.elements[static_cast<size_t>(e)]))
            elements[static_cast<size_t>(next[static_cast<size_t>(node)]++)] = e;
}

// Corner nodes on the boundary: on a corner-to-corner edge used by one element.
std::vector<bool> boundary_corners(const Model& model) {
    std::vector<std::pair<int, int>> edges;
    for (const Element& el : model.elements)
        for (int e = 0; e < 4; ++e) {
            const int a = el.nodes[static_cast<size_t>(e)],
                      b = el.nodes[static_cast<size_t>((e + 1) % 4)];
            edges.emplace_back(std::min(a, b), std::max(a, b));
        }
    std::sort(edges.begin(), edges.end());
    std::vector<bool> on_boundary(static_cast<size_t>(model.n_nodes()), false);
    for (size_t i = 0; i < edges.size();) {
        size_t j = i;
        while (j < edges.size() && edges[j] == edges[i]) ++j;
        if (j - i == 1)
            on_boundary[static_cast<size_t>(edges[i].first)] =
                on_boundary[static_cast<size_t>(edges[i].second)] = true;
        i = j;
    }
    return on_boundary;
}

} // namespace

std::vector<Stress> recover_by_averaging(const Model& model, const Eigen::VectorXd& u) {
    std::vector<Stress> sum(static_cast<size_t>(model.n_nodes()), Stress::Zero());
    std::vector<int> count(static_cast<size_t>(model.n_nodes()), 0);
    for (int e = 0; e < static_cast<int>(model.elements.size()); ++e) {
        const Element& el = model.elements[static_cast<size_t>(e)];
        const int n = gauss_order(el.kind);
        const SquareRule rule = gauss_square(n);
        std::array<Stress, 9> at_gauss;
        for (int q = 0; q < rule.n_points; ++q) {
            const auto& p = rule.points[static_cast<size_t>(q)];
            at_gauss[static_cast<size_t>(q)] = element_stress(model, e, u, p.xi, p.eta);
        }
        for (int i = 0; i < node_count(el.kind); ++i) {
            const Vector2 r = reference_node(i);
            const auto w = extrapolation_weights(n, r.x(), r.y());
            Stress s = Stress::Zero();
            for (int q = 0; q < rule.n_points; ++q)
                s += w[static_cast<size_t>(q)] * at_gauss[static_cast<size_t>(q)];
            sum[static_cast<size_t>(el.nodes[static_cast<size_t>(i)])] += s;
            ++count[static_cast<size_t>(el.nodes[static_cast<size_t>(i)])];
        }
    }
    for (size_t i = 0; i < sum.size(); ++i)
        if (count[i] > 0) sum[i] /= count[i];
    return sum;
}

SampledStresses spr_samples(const Model& model, const Eigen::VectorXd& u) {
    return sample_stresses(model, u, 2);
}

std::vector<SampledStresses> spr_samples(const Model& model,
                                         std::span<const Eigen::VectorXd* const> u) {
    return sample_stresses(model, u, 2);
}

namespace {

// The complete polynomial basis 1, X, Y, X², XY, Y² in a patch's local,
// scaled coordinates (the first n_terms used).
Eigen::Matrix<double, 1, 6> spr_basis(const Vector2& x, const Vector2& origin, double h) {
    const double X = (x.x() - origin.x()) / h, Y = (x.y() - origin.y()) / h;
    Eigen::Matrix<double, 1, 6> row;
    row << 1, X, Y, X * X, X * Y, Y * Y;
    return row;
}

} // namespace

SprRecovery::SprRecovery(const Model& model, const SampledStresses& samples)
    : model_(&model), per_element_(samples.points_per_element) {
    elements_of_nodes(model, element_start_, elements_);
    const auto n_nodes = static_cast<size_t>(model.n_nodes());
    const auto on_boundary = boundary_corners(model);
    std::vector<bool> is_corner(n_nodes, false);
    for (const Element& el : model.elements)
        for (int i = 0; i < 4; ++i)
            is_corner[static_cast<size_t>(el.nodes[static_cast<size_t>(i)])] = true;

    // At most 6 × 6: storage on the stack, not the heap, per patch.
    using Small = Eigen::Matrix<double, Eigen::Dynamic, Eigen::Dynamic, 0, 6, 6>;
    for (size_t v = 0; v < n_nodes; ++v) {
        const std::span<const int> patch = elements_of(v);
        if (!is_corner[v] || patch.empty()) continue;
        const bool quadratic = std::any_of(patch.begin(), patch.end(), [&](int e) {
            return is_quadratic(model.elements[static_cast<size_t>(e)].kind);
        });
        const int n_terms = quadratic ? 6 : 3;
        const int n_points = static_cast<int>(patch.size()) * per_element_;
        if (n_points < n_terms + 1) continue;
        // Local, scaled coordinates keep the normal equations well conditioned.
        const Vector2 origin = model.nodes[v];
        double h = 0;
        for (int e : patch)
            for (int q = 0; q < per_element_; ++q)
                h = std::max(
                    h, (samples.point[static_cast<size_t>(e * per_element_ + q)] - origin).norm());
        if (h == 0) continue;
        Small AtA = Small::Zero(n_terms, n_terms);
        for (int e : patch)
            for (int q = 0; q < per_element_; ++q) {
                const Eigen::Matrix<double, 1, 6> p =
                    spr_basis(samples.point[static_cast<size_t>(e * per_element_ + q)], origin, h);
                AtA.noalias() += p.head(n_terms).transpose() * p.head(n_terms);
            }
        // Reject a patch whose points do not determine the polynomial (e.g.
        // collinear samples): its smallest pivot collapses.
        const Eigen::LDLT<Small> normal(AtA);
        const auto& d = normal.vectorD();
        if (normal.info() != Eigen::Success || d.minCoeff() <= 1e-10 * d.maxCoeff()) continue;
        const Eigen::LLT<Small> cholesky(AtA);
        if (cholesky.info() != Eigen::Success) continue;
        // The fit depends on the mesh only: coefficients = (AᵀA)⁻¹Aᵀ b for
        // the sampled values b of any load case.
        patches_.push_back({static_cast<int>(v), static_cast<bool>(on_boundary[v]), n_terms, origin,
                            h, factors_.size()});
        const Small L = cholesky.matrixL();
        for (int r = 0; r < n_terms; ++r)
            for (int c = 0; c <= r; ++c) factors_.push_back(L(r, c));
    }
}

std::vector<Stress> SprRecovery::recover(const SampledStresses& samples) const {
    const Model& model = *model_;
    const auto n_nodes = static_cast<size_t>(model.n_nodes());
    const int per_element = per_element_;

    // Each node keeps the values of the best kind of patch that reaches it:
    // its own interior patch (rank 3), else the mean over the interior
    // patches that contain it (2), else over the boundary patches (1).
    std::vector<Stress> sum(n_nodes, Stress::Zero());
    std::vector<int> count(n_nodes, 0);
    std::vector<unsigned char> rank(n_nodes, 0);
    // `value` is called only where the node takes it: a node that already
    // has a better kind of patch skips the fit's evaluation.
    const auto offer = [&](size_t node, unsigned char r, const auto& value) {
        if (r > rank[node]) {
            rank[node] = r;
            sum[node] = value();
            count[node] = 1;
        } else if (r == rank[node] && r < 3) {
            sum[node] += value();
            ++count[node];
        }
    };

    using Coefficients = Eigen::Matrix<double, Eigen::Dynamic, 3, 0, 6, 3>; // n_terms × 3, no heap
    Coefficients c;
    for (const Patch& patch : patches_) {
        const auto v = static_cast<size_t>(patch.vertex);
        const std::span<const int> elements = elements_of(v);
        const int n = patch.n_terms;
        // Aᵀb, then the two triangular solves with the packed factor.
        c = Coefficients::Zero(n, 3);
        for (int e : elements)
            for (int q = 0; q < per_element; ++q) {
                const auto k = static_cast<size_t>(e * per_element + q);
                const Eigen::Matrix<double, 1, 6> p =
                    spr_basis(samples.point[k], patch.origin, patch.h);
                const Stress& s = samples.stress[k];
                for (int t = 0; t < n; ++t) c.row(t) += p(t) * s.transpose();
            }
        const double* L = factors_.data() + patch.factor;
        const auto at = [&](int r, int col) { return L[r * (r + 1) / 2 + col]; };
        for (int r = 0; r < n; ++r) {
            for (int col = 0; col < r; ++col) c.row(r) -= at(r, col) * c.row(col);
            c.row(r) /= at(r, r);
        }
        for (int r = n - 1; r >= 0; --r) {
            for (int row = r + 1; row < n; ++row) c.row(r) -= at(row, r) * c.row(row);
            c.row(r) /= at(r, r);
        }
        auto value_at = [&](int node) {
            const Eigen::Matrix<double, 1, 6> p =
                spr_basis(model.nodes[static_cast<size_t>(node)], patch.origin, patch.h);
            Stress value = Stress::Zero();
            for (int k = 0; k < n; ++k) value += p(k) * c.row(k).transpose();
            return value;
        };
        if (!patch.boundary) offer(v, 3, [&] { return value_at(patch.vertex); });
        const unsigned char r = patch.boundary ? 1 : 2;
        for (int e : elements)
            for (int node : nodes_of(model.elements[static_cast<size_t>(e)]))
                offer(static_cast<size_t>(node), r, [&] { return value_at(node); });
    }

    for (size_t i = 0; i < n_nodes; ++i) {
        if (count[i] > 0) {
            sum[i] /= count[i];
            continue;
        }
        // A node no patch reaches: the mean of its elements' sampled values.
        Stress s = Stress::Zero();
        int n_samples = 0;
        for (int e : elements_of(i))
            for (int q = 0; q < per_element; ++q, ++n_samples)
                s += samples.stress[static_cast<size_t>(e * per_element + q)];
        sum[i] = n_samples > 0 ? Stress(s / n_samples) : Stress::Zero();
    }
    return sum;
}

std::vector<Stress> recover_spr(const Model& model, const SampledStresses& samples) {
    return SprRecovery(model, samples).recover(samples);
}

ErrorEstimate zz_error_estimate(const Model& model, const Eigen::VectorXd& u,
                                const std::vector<Stress>& recovered) {
    ErrorEstimate out;
    out.element_error.resize(model.elements.size());
    double error_sq = 0, energy_sq = 0;
    for (int e = 0; e < static_cast<int>(model.elements.size()); ++e) {
        const Element& el = model.elements[static_cast<size_t>(e)];
        const Matrix3 C =
            plane_stress_compliance(model.materials[static_cast<size_t>(el.material)]);
        const int n = node_count(el.kind);
        std::array<Vector2, 9> coords;
        for (int i = 0; i < n; ++i)
            coords[static_cast<size_t>(i)] =
                model.nodes[static_cast<size_t>(el.nodes[static_cast<size_t>(i)])];
        const std::span<const Vector2> c(coords.data(), static_cast<size_t>(n));
        const SquareRule rule = gauss_square(gauss_order(el.kind) + 1);
        double e_sq = 0;
        for (int q = 0; q < rule.n_points; ++q) {
            const auto& p = rule.points[static_cast<size_t>(q)];
            Eigen::VectorXd N;
            if (n == 4)
                N = shape_q4(p.xi, p.eta).N;
            else if (n == 8)
                N = shape_q8(p.xi, p.eta).N;
            else
                N = shape_q9(p.xi, p.eta).N;
            Stress star = Stress::Zero();
            for (int i = 0; i < n; ++i)
                star += N(i) * recovered[static_cast<size_t>(el.nodes[static_cast<size_t>(i)])];
            const Stress sigma = element_stress(model, e, u, p.xi, p.eta);
            const double dv = el.thickness * det_J_at(el.kind, c, p.xi, p.eta) * p.w;
            const Stress diff = star - sigma;
            e_sq += diff.dot(C * diff) * dv;
            energy_sq += sigma.dot(C * sigma) * dv;
        }
        out.element_error[static_cast<size_t>(e)] = std::sqrt(e_sq);
        error_sq += e_sq;
    }
    out.error_norm = std::sqrt(error_sq);
    out.energy_norm = std::sqrt(energy_sq);
    const double total = std::sqrt(energy_sq + error_sq);
    out.relative = total > 0 ? out.error_norm / total : 0.0; // no stress, no error
    return out;
}

} // namespace lapwing::fe
