// Welded edges: the lines, and the force per length recovered from the
// nodal support forces.
#include "check/weld_lines.hpp"

#include "fe/notation.hpp"

#include <Eigen/Dense>
#include <algorithm>
#include <fmt/format.h>
#include <map>

namespace lapwing::check {

namespace {

Eigen::Vector2d corner(const model::Connection& c, int i) {
    const auto& p = c.plate.outline[static_cast<size_t>(i) % c.plate.outline.size()].at;
    return {p.x, p.y};
}

WeldLine make_line(const model::Connection& c, int edge) {
    WeldLine w;
    w.edge = edge;
    w.from = corner(c, edge);
    w.to = corner(c, edge + 1);
    return w;
}

// 1D Lagrange shape functions on ξ ∈ [−1, 1]: nodes at −1, 1 (linear) or
// −1, 0, 1 (quadratic, in the BoundaryEdge order first, middle, last).
void edge_shape(bool quadratic, double xi, double (&n)[3]) {
    if (quadratic) {
        n[0] = 0.5 * xi * (xi - 1);
        n[1] = 1 - xi * xi;
        n[2] = 0.5 * xi * (xi + 1);
    } else {
        n[0] = 0.5 * (1 - xi);
        n[1] = 0;
        n[2] = 0.5 * (1 + xi);
    }
}

} // namespace

std::vector<WeldLine> weld_lines(const model::Connection& c) {
    std::vector<WeldLine> lines;
    for (size_t i = 0; i < c.supports.size(); ++i) {
        const model::Support& s = c.supports[i];
        if (s.kind != model::SupportKind::welded) continue;
        for (int edge : s.edges) {
            WeldLine w = make_line(c, edge);
            w.support = static_cast<int>(i);
            w.id = fmt::format("weld-{}-e{}", s.name, edge);
            w.label = fmt::format("weld of support {} along outline edge {}", s.name, edge);
            lines.push_back(std::move(w));
        }
    }
    for (size_t i = 0; i < c.members.size(); ++i) {
        const model::Member& m = c.members[i];
        for (int edge : m.welded_edges) {
            WeldLine w = make_line(c, edge);
            w.member = static_cast<int>(i);
            w.id = fmt::format("weld-{}-e{}", m.name, edge);
            w.label = fmt::format("weld of member {} along outline edge {}", m.name, edge);
            lines.push_back(std::move(w));
        }
    }
    return lines;
}

WeldForces weld_forces(const WeldLine& line, const mesh::Mesh& mesh,
                       const Eigen::VectorXd& dof_reactions, const std::vector<int>& held) {
    WeldForces out;
    const double length = line.length();
    if (length <= 0) return out;
    const Eigen::Vector2d along = (line.to - line.from) / length;
    const bool quadratic = fe::is_quadratic(mesh.kind);

    // The line's mesh edges and their nodes, numbered locally.
    std::vector<std::array<int, 3>> edges;
    std::map<int, int> local;
    for (const mesh::BoundaryEdge& b : mesh.boundary_edges) {
        if (b.tag.kind != geometry::BoundaryKind::outline_edge || b.tag.index != line.edge)
            continue;
        // Local order first, middle, last; a linear edge stores [first, last, -1].
        const std::array<int, 3> ordered =
            quadratic ? b.nodes : std::array<int, 3>{b.nodes[0], -1, b.nodes[1]};
        std::array<int, 3> e{};
        for (int k = 0; k < 3; ++k) {
            const int node = ordered[static_cast<size_t>(k)];
            e[static_cast<size_t>(k)] = -1;
            if (node < 0) continue;
            const auto [it, fresh] = local.emplace(node, static_cast<int>(local.size()));
            e[static_cast<size_t>(k)] = it->second;
            (void)fresh;
        }
        edges.push_back(e);
    }
    const int n = static_cast<int>(local.size());
    if (n == 0) return out;
    std::vector<int> global(static_cast<size_t>(n));
    for (const auto& [node, i] : local) global[static_cast<size_t>(i)] = node;
    std::vector<double> s(static_cast<size_t>(n));
    for (int i = 0; i < n; ++i)
        s[static_cast<size_t>(i)] =
            (mesh.nodes[static_cast<size_t>(global[static_cast<size_t>(i)])] - line.from)
                .dot(along);

    // Consistent edge matrix M_ij = ∫ N_i N_j ds (3-point Gauss is exact for
    // quadratic × quadratic on a straight edge) and the nodal forces.
    const double gx[3] = {-0.7745966692414834, 0.0, 0.7745966692414834};
    const double gw[3] = {5.0 / 9.0, 8.0 / 9.0, 5.0 / 9.0};
    Eigen::MatrixXd M = Eigen::MatrixXd::Zero(n, n);
    for (const auto& e : edges) {
        const double le = std::abs(s[static_cast<size_t>(e[2])] - s[static_cast<size_t>(e[0])]);
        for (int g = 0; g < 3; ++g) {
            double N[3];
            edge_shape(quadratic, gx[g], N);
            for (int a = 0; a < 3; ++a)
                for (int b = 0; b < 3; ++b)
                    if (e[static_cast<size_t>(a)] >= 0 && e[static_cast<size_t>(b)] >= 0)
                        M(e[static_cast<size_t>(a)], e[static_cast<size_t>(b)]) +=
                            N[a] * N[b] * gw[g] * 0.5 * le;
        }
    }
    Eigen::MatrixXd f = Eigen::MatrixXd::Zero(n, 2);
    for (int i = 0; i < n; ++i) {
        const int node = global[static_cast<size_t>(i)];
        if (!std::binary_search(held.begin(), held.end(), node)) continue;
        f(i, 0) = dof_reactions(fe::dof_ux(node));
        f(i, 1) = dof_reactions(fe::dof_uy(node));
        out.resultant += Eigen::Vector2d(f(i, 0), f(i, 1));
    }
    const Eigen::MatrixXd q = M.ldlt().solve(f);
    out.average = out.resultant.norm() / length;

    for (int i = 0; i < n; ++i) {
        const Eigen::Vector2d qi(q(i, 0), q(i, 1));
        out.profile.push_back({s[static_cast<size_t>(i)], qi});
        out.peak = std::max(out.peak, qi.norm());
    }
    std::sort(out.profile.begin(), out.profile.end(),
              [](const WeldPoint& a, const WeldPoint& b) { return a.s < b.s; });
    for (const auto& e : edges) {
        const double s0 = s[static_cast<size_t>(e[0])], s1 = s[static_cast<size_t>(e[2])];
        double integral = 0;
        for (int g = 0; g < 3; ++g) {
            double N[3];
            edge_shape(quadratic, gx[g], N);
            Eigen::Vector2d qg(0, 0);
            for (int a = 0; a < 3; ++a)
                if (e[static_cast<size_t>(a)] >= 0)
                    qg += N[a] * Eigen::Vector2d(q(e[static_cast<size_t>(a)], 0),
                                                 q(e[static_cast<size_t>(a)], 1));
            integral += qg.norm() * gw[g] * 0.5;
        }
        if (integral > out.peak_edge_average) {
            out.peak_edge_average = integral;
            out.peak_s = 0.5 * (s0 + s1);
        }
    }
    return out;
}

} // namespace lapwing::check
