// Mesh measurements for tests, written against fe's shape functions, not the
// mesher's internals.
#include "mesh_checks.hpp"

#include "fe/isoparametric_map.hpp"
#include "fe/quadrature.hpp"

#include <algorithm>
#include <array>
#include <cmath>
#include <map>
#include <sstream>
#include <vector>

namespace lapwing::test {

double mesh_area(const mesh::Mesh& m) {
    const fe::SquareRule rule = fe::gauss_square(3);
    double area = 0.0;
    for (int e = 0; e < m.n_elements(); ++e) {
        const auto el = m.element(e);
        std::array<fe::Vector2, 9> x;
        for (size_t i = 0; i < el.size(); ++i) x[i] = m.nodes[el[i]];
        const std::span<const fe::Vector2> xs(x.data(), el.size());
        for (int q = 0; q < rule.n_points; ++q)
            area +=
                rule.points[q].w * fe::det_J_at(m.kind, xs, rule.points[q].xi, rule.points[q].eta);
    }
    return area;
}

double boundary_length(const mesh::Mesh& m, geometry::BoundaryKind kind, int index) {
    const fe::LineRule& rule = fe::gauss_legendre(5);
    double length = 0.0;
    for (const mesh::BoundaryEdge& be : m.boundary_edges) {
        if (be.tag.kind != kind || be.tag.index != index) continue;
        const Eigen::Vector2d a = m.nodes[be.nodes[0]];
        if (!fe::is_quadratic(m.kind)) {
            length += (m.nodes[be.nodes[1]] - a).norm();
            continue;
        }
        const Eigen::Vector2d c = m.nodes[be.nodes[1]], b = m.nodes[be.nodes[2]];
        // x(s) = a (s² − s)/2 + c (1 − s²) + b (s² + s)/2 on s ∈ [-1, 1].
        for (int q = 0; q < rule.n; ++q) {
            const double s = rule.x[q];
            const Eigen::Vector2d d = a * (s - 0.5) - 2.0 * s * c + b * (s + 0.5);
            length += rule.w[q] * d.norm();
        }
    }
    return length;
}

std::string conformity_problem(const mesh::Mesh& m, int n_loops) {
    std::ostringstream why;
    const int npe = fe::node_count(m.kind);
    // Element edges by their corner pair.
    std::map<std::pair<int, int>, std::vector<std::pair<int, int>>> edges;
    for (int e = 0; e < m.n_elements(); ++e) {
        const auto el = m.element(e);
        for (int k = 0; k < 4; ++k) {
            const int a = el[k], b = el[(k + 1) % 4];
            edges[{std::min(a, b), std::max(a, b)}].push_back({e, k});
        }
    }
    std::map<std::pair<int, int>, int> listed;
    for (const mesh::BoundaryEdge& be : m.boundary_edges) {
        const auto el = m.element(be.element);
        const int a = el[be.local_edge], b = el[(be.local_edge + 1) % 4];
        if (be.nodes[0] != a || be.nodes[fe::edge_node_count(m.kind) - 1] != b)
            return "boundary edge nodes do not match its element edge";
        ++listed[{std::min(a, b), std::max(a, b)}];
    }
    for (const auto& [key, users] : edges) {
        const int n_listed = listed.count(key) ? listed[key] : 0;
        if (users.size() == 2 && n_listed == 0) {
            if (npe > 4) { // a shared edge shares its mid-side node
                const int m0 = m.element(users[0].first)[4 + users[0].second];
                const int m1 = m.element(users[1].first)[4 + users[1].second];
                if (m0 != m1) return "an interior edge has two different mid-side nodes";
            }
            continue;
        }
        if (users.size() == 1 && n_listed == 1) continue;
        why << "edge (" << key.first << ", " << key.second << ") is used by " << users.size()
            << " elements and listed " << n_listed << " times as boundary";
        return why.str();
    }
    // Boundary loops: each boundary node starts as many boundary edges as end
    // there (one, or more where the boundary touches itself, as a cut-out
    // touching the outline at a point). The walk takes, at such a node, the
    // sharpest left turn, which stays in the wedge of region the incoming edge
    // bounds (as geometry's loops do), so a loop bounds one connected piece.
    const int last = fe::edge_node_count(m.kind) - 1;
    std::multimap<int, size_t> starting;
    std::map<int, int> balance;
    for (size_t i = 0; i < m.boundary_edges.size(); ++i) {
        const auto& be = m.boundary_edges[i];
        starting.emplace(be.nodes[0], i);
        ++balance[be.nodes[0]];
        --balance[be.nodes[last]];
    }
    for (const auto& [node, count] : balance)
        if (count != 0) return "a boundary loop is open";
    // Direction leaving an edge's start and arriving at its end (through the
    // mid-side node of a quadratic edge).
    const auto leaving = [&](const mesh::BoundaryEdge& be) {
        return Eigen::Vector2d(m.nodes[be.nodes[1]] - m.nodes[be.nodes[0]]);
    };
    const auto arriving = [&](const mesh::BoundaryEdge& be) {
        return Eigen::Vector2d(m.nodes[be.nodes[last]] - m.nodes[be.nodes[last - 1]]);
    };
    int loops = 0;
    std::vector<bool> walked(m.boundary_edges.size(), false);
    for (size_t first = 0; first < m.boundary_edges.size(); ++first) {
        if (walked[first]) continue;
        ++loops;
        const int start = m.boundary_edges[first].nodes[0];
        size_t cur = first;
        for (size_t guard = 0; guard <= m.boundary_edges.size(); ++guard) {
            walked[cur] = true;
            const int v = m.boundary_edges[cur].nodes[last];
            if (v == start) break;
            const Eigen::Vector2d in = arriving(m.boundary_edges[cur]);
            long best = -1;
            double best_turn = -10.0;
            for (auto [it, end] = starting.equal_range(v); it != end; ++it) {
                if (walked[it->second]) continue;
                const Eigen::Vector2d out = leaving(m.boundary_edges[it->second]);
                const double turn = std::atan2(in.x() * out.y() - in.y() * out.x(), in.dot(out));
                if (turn > best_turn) best_turn = turn, best = static_cast<long>(it->second);
            }
            if (best < 0) return "a boundary loop does not close";
            cur = static_cast<size_t>(best);
        }
    }
    if (loops != n_loops) {
        why << loops << " boundary loops, expected " << n_loops;
        return why.str();
    }
    // No duplicate nodes: sort by x and compare neighbours within the tolerance.
    std::vector<int> order(m.nodes.size());
    for (size_t i = 0; i < order.size(); ++i) order[i] = static_cast<int>(i);
    std::sort(order.begin(), order.end(),
              [&](int a, int b) { return m.nodes[a].x() < m.nodes[b].x(); });
    double extent = 0;
    for (const auto& p : m.nodes) extent = std::max(extent, p.cwiseAbs().maxCoeff());
    const double tol = 1e-9 * extent;
    for (size_t i = 0; i < order.size(); ++i) {
        for (size_t j = i + 1;
             j < order.size() && m.nodes[order[j]].x() - m.nodes[order[i]].x() <= tol; ++j) {
            if ((m.nodes[order[j]] - m.nodes[order[i]]).norm() <= tol) {
                why << "nodes " << order[i] << " and " << order[j] << " coincide";
                return why.str();
            }
        }
    }
    std::vector<bool> used(m.nodes.size(), false);
    for (int n : m.connectivity) used[n] = true;
    for (size_t i = 0; i < used.size(); ++i)
        if (!used[i]) return "a node belongs to no element";
    return "";
}

} // namespace lapwing::test
