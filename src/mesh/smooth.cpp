// Constrained Laplacian smoothing (Field 1988, "Laplacian smoothing and
// Delaunay triangulations": plain Laplacian can invert elements, so each move
// is kept only if it does not worsen the adjacent elements).
#include "mesh/quad_split.hpp"

#include <algorithm>

namespace lapwing::mesh::detail {

namespace {

// Smallest corner sine of a quadrilateral (the corner form of the scaled
// Jacobian, Knupp 2000): 1 for a rectangle, <= 0 when a corner folds.
double worst_corner(const std::vector<Eigen::Vector2d>& x, const int* q) {
    double worst = 1.0;
    for (int k = 0; k < 4; ++k) {
        const Eigen::Vector2d& p = x[q[k]];
        const Eigen::Vector2d a = x[q[(k + 1) % 4]] - p, b = x[q[(k + 3) % 4]] - p;
        const double s = (a.x() * b.y() - a.y() * b.x()) / (a.norm() * b.norm());
        worst = std::min(worst, s);
    }
    return worst;
}

} // namespace

void smooth(std::vector<Eigen::Vector2d>& nodes, const std::vector<int>& quads,
            const std::vector<bool>& fixed, int passes) {
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
                before = std::min(before, worst_corner(nodes, q));
            }
            if (count == 0) continue;
            const Eigen::Vector2d old = nodes[v];
            nodes[v] = sum / count;
            double after = 1.0;
            for (int i = start[v]; i < start[v + 1]; ++i)
                after = std::min(after, worst_corner(nodes, &quads[4 * list[i]]));
            if (after < before) nodes[v] = old;
        }
    }
}

} // namespace lapwing::mesh::detail
