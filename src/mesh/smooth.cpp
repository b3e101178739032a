// Constrained Laplacian smoothing (Field 1988, "Laplacian smoothing and
// Delaunay triangulations": plain Laplacian can invert elements, so each move
// is kept only if it does not worsen the adjacent elements).
#include "fe/isoparametric_map.hpp"
#include "fe/quadrature.hpp"
#include "fe/shape_functions.hpp"
#include "mesh/quad_split.hpp"

#include <algorithm>
#include <array>
#include <cmath>

namespace lapwing::mesh::detail {

namespace {

// Smoothing aims a little above the scaled-Jacobian target of 0.3, so that
// the search does not stop on the target's edge.
constexpr double ratio_aim = 0.32;

// The two targets in one number, the det J ratio first: below its aim the
// metric lies in (-1, 0), so no angle gain can pay for a det J loss there
// (the angle target is for 99 % of the elements, the det J target for every
// one); at or above it, the smaller of ratio / aim and sine / sin 30°, 1 at
// the targets. A folded element (ratio <= 0) scores below -1.
double combine(double ratio, double sine) {
    if (ratio <= 0) return -2.0;
    if (ratio < ratio_aim) return ratio / ratio_aim - 1.0;
    return std::min(ratio / ratio_aim, sine / 0.5);
}

// Corner det J ratio of a straight-sided quadrilateral (min / max of the
// corner cross products, which for a bilinear map are the extreme values of
// det J) and its smallest corner sine; ratio <= 0 when a corner folds.
struct Corners {
    double ratio, sine;
};
// Each edge vector and its length once (corner k joins edges k and k − 1,
// the latter reversed: the same numbers, bit for bit, as from the corners).
Corners corners(const std::vector<Eigen::Vector2d>& x, const int* q) {
    std::array<Eigen::Vector2d, 4> edge;
    std::array<double, 4> length;
    for (int k = 0; k < 4; ++k) {
        edge[k] = x[q[(k + 1) % 4]] - x[q[k]];
        length[k] = edge[k].norm();
    }
    double lo = HUGE_VAL, hi = -HUGE_VAL, sine = 1.0;
    for (int k = 0; k < 4; ++k) {
        const Eigen::Vector2d& a = edge[k];
        const Eigen::Vector2d b = -edge[(k + 3) % 4];
        const double cr = a.x() * b.y() - a.y() * b.x();
        lo = std::min(lo, cr);
        hi = std::max(hi, cr);
        sine = std::min(sine, cr / (length[k] * length[(k + 3) % 4]));
    }
    return {hi > 0 ? lo / hi : -1.0, sine};
}

double straight_metric(const std::vector<Eigen::Vector2d>& x, const int* q) {
    const Corners c = corners(x, q);
    return combine(c.ratio, c.sine);
}

// Reference derivatives of the eight-node shape functions at the sample
// points of the quality figures (the 9-node lattice and the 3×3 Gauss
// points), computed once: the metric runs thousands of times per mesh.
struct Q8Samples {
    std::array<fe::ShapeDerivatives<8>, 18> dN_dxi;
    Q8Samples() {
        for (int i = 0; i < 9; ++i)
            dN_dxi[i] = fe::shape_q8(fe::reference_node(i).x(), fe::reference_node(i).y()).dN_dxi;
        const fe::SquareRule rule = fe::gauss_square(3);
        for (int k = 0; k < 9; ++k)
            dN_dxi[9 + k] = fe::shape_q8(rule.points[k].xi, rule.points[k].eta).dN_dxi;
    }
};

// The same with a curved edge: det J of the eight-node map at those sample
// points, mid-sides on the curve where given.
double curved_metric(const std::vector<Eigen::Vector2d>& x, const int* q,
                     const Eigen::Vector2d* mid) {
    static const Q8Samples samples;
    fe::NodeCoords<8> X;
    for (int k = 0; k < 4; ++k) {
        X.row(k) = x[q[k]].transpose();
        X.row(4 + k) =
            (std::isnan(mid[k].x()) ? Eigen::Vector2d(0.5 * (x[q[k]] + x[q[(k + 1) % 4]])) : mid[k])
                .transpose();
    }
    double lo = HUGE_VAL, hi = -HUGE_VAL;
    for (const auto& dN : samples.dN_dxi) {
        const double d = (X.transpose() * dN).determinant(); // det J, J = Xᵀ · dN_dxi
        lo = std::min(lo, d);
        hi = std::max(hi, d);
    }
    const Corners straight = corners(x, q);
    return combine(std::min(hi > 0 ? lo / hi : -1.0, straight.ratio), straight.sine);
}

} // namespace

void smooth(std::vector<Eigen::Vector2d>& nodes, const std::vector<int>& quads,
            const std::vector<bool>& fixed, const std::vector<Eigen::Vector2d>& curved_mid,
            int passes) {
    const auto quad_metric = [&](const std::vector<Eigen::Vector2d>& x, const int* q) {
        const size_t at = static_cast<size_t>(q - quads.data());
        if (!curved_mid.empty()) {
            for (int k = 0; k < 4; ++k)
                if (!std::isnan(curved_mid[at + k].x()))
                    return curved_metric(x, q, &curved_mid[at]);
        }
        return straight_metric(x, q);
    };
    const int n_nodes = static_cast<int>(fixed.size());
    const int n_quads = static_cast<int>(quads.size() / 4);
    // Node → quadrilaterals, compressed rows.
    std::vector<int> start(n_nodes + 1, 0), list(quads.size());
    for (int v : quads) ++start[v + 1];
    for (int i = 0; i < n_nodes; ++i) start[i + 1] += start[i];
    std::vector<int> fill(start.begin(), start.end() - 1);
    for (int q = 0; q < n_quads; ++q)
        for (int k = 0; k < 4; ++k) list[fill[quads[4 * q + k]]++] = q;

    for (int pass = 0; pass < passes; ++pass) {
        for (int v = 0; v < n_nodes; ++v) {
            if (fixed[v]) continue;
            // Mean of edge neighbours: each interior edge is seen from both of
            // its quadrilaterals, so every neighbour counts twice.
            Eigen::Vector2d sum = Eigen::Vector2d::Zero();
            int count = 0;
            double before = 1.0;
            for (int i = start[v]; i < start[v + 1]; ++i) {
                const int* q = &quads[4 * list[i]];
                int k = 0;
                while (q[k] != v) ++k;
                sum += nodes[q[(k + 1) % 4]] + nodes[q[(k + 3) % 4]];
                count += 2;
                before = std::min(before, quad_metric(nodes, q));
            }
            if (count == 0) continue;
            const Eigen::Vector2d old = nodes[v];
            nodes[v] = sum / count;
            // Undo the move as soon as one element gets worse than the worst before.
            for (int i = start[v]; i < start[v + 1]; ++i) {
                if (quad_metric(nodes, &quads[4 * list[i]]) < before) {
                    nodes[v] = old;
                    break;
                }
            }
        }
    }

    // Local optimisation where smoothing left a poor element: compass
    // search on each free corner of it, maximising the worst adjacent metric.
    // Each node is searched at most once per round, and the search stops once
    // every adjacent element clears the selection mark.
    constexpr double good = 1.2;
    // Worst metric of the elements at v; stops at the first one at or below
    // `floor` (a trial position that cannot beat the best so far). The
    // element that ruled out the last trial (`lead`, an offset in v's list)
    // is judged first, as it most likely rules out the next one too; the
    // minimum, when reached, does not depend on the order.
    const auto worst_at = [&](int v, double floor, int& lead) {
        const int n = start[v + 1] - start[v];
        double w = HUGE_VAL;
        for (int j = 0; j < n && w > floor; ++j) {
            const int i = (lead + j) % n;
            w = std::min(w, quad_metric(nodes, &quads[4 * list[start[v] + i]]));
            if (w <= floor) lead = i;
        }
        return w;
    };
    constexpr double s45 = 0.7071067811865476; // the eight compass directions
    static const std::array<Eigen::Vector2d, 8> compass{
        Eigen::Vector2d(1, 0),      Eigen::Vector2d(s45, s45), Eigen::Vector2d(0, 1),
        Eigen::Vector2d(-s45, s45), Eigen::Vector2d(-1, 0),    Eigen::Vector2d(-s45, -s45),
        Eigen::Vector2d(0, -1),     Eigen::Vector2d(s45, -s45)};
    std::vector<int> searched(n_nodes, -1); // round in which the node was last searched
    for (int round = 0; round < 3; ++round) {
        for (int q = 0; q < n_quads; ++q) {
            if (quad_metric(nodes, &quads[4 * q]) >= good) continue;
            for (int k = 0; k < 4; ++k) {
                const int v = quads[4 * q + k];
                if (fixed[v] || searched[v] == round) continue;
                searched[v] = round;
                int lead = 0;
                double best = worst_at(v, -HUGE_VAL, lead);
                double step = 0.0;
                for (int i = start[v]; i < start[v + 1]; ++i) {
                    const int* qq = &quads[4 * list[i]];
                    for (int c = 0; c < 4; ++c)
                        step += (nodes[qq[(c + 1) % 4]] - nodes[qq[c]]).norm();
                }
                step *= 0.1 / (4.0 * (start[v + 1] - start[v]));
                for (int iter = 0; iter < 12 && step > 0 && best < good; ++iter) {
                    const Eigen::Vector2d base = nodes[v];
                    Eigen::Vector2d best_pos = base;
                    for (const Eigen::Vector2d& d : compass) {
                        nodes[v] = base + step * d;
                        const double w = worst_at(v, best, lead);
                        if (w > best) {
                            best = w;
                            best_pos = nodes[v];
                        }
                    }
                    nodes[v] = best_pos;
                    if (best_pos == base) step *= 0.5;
                }
            }
        }
    }
}

} // namespace lapwing::mesh::detail
