// Cantilever with a parabolic end shear: the exact plane-stress solution of
// Timoshenko & Goodier (Theory of Elasticity, 3rd ed. 1970, §21; formula as
// in ../shared/REFERENCES.md, from memory) with the exact displacement
// prescribed on x = 0 and the parabolic traction on x = L (the boundary data
// that make the comparison fair, Augarde & Deeks 2008, FEAD 44:595).
// L = 48, D = 12, E = 3e7, ν = 0.3, P = 1000, t = 1: uy(L, 0) = −0.0089.
// A priori rates for smooth solutions (Strang & Fix 1973, ch. 3): L2
// displacement error O(h^(p+1)), energy error O(h^p), p the degree.
#include "fe/isoparametric_map.hpp"
#include "fe/linear_static.hpp"
#include "fe/quadrature.hpp"
#include "fe/recovery.hpp"
#include "fe/shape_functions.hpp"
#include "fe/structured_grid.hpp"
#include "support/approx.hpp"

#include <cmath>
#include <doctest/doctest.h>
#include <vector>

using namespace lapwing::fe;

namespace {

constexpr double L = 48, D = 12, E = 3e7, nu = 0.3, P = 1000;
constexpr double I = D * D * D / 12;

Vector2 exact_u(const Vector2& p) {
    const double x = p.x(), y = p.y();
    const double ux = P * y / (6 * E * I) * ((6 * L - 3 * x) * x + (2 + nu) * (y * y - D * D / 4));
    const double uy =
        -P / (6 * E * I) *
        (3 * nu * y * y * (L - x) + (4 + 5 * nu) * D * D * x / 4 + (3 * L - x) * x * x);
    return {ux, uy};
}
Stress exact_stress(const Vector2& p) {
    return {P * (L - p.x()) * p.y() / I, 0.0, -P / (2 * I) * (D * D / 4 - p.y() * p.y())};
}

struct Errors {
    double h, l2, energy, zz_effectivity, tip_uy;
};

Errors solve(ElementKind kind, int nx) {
    const int ny = nx / 4;
    const auto grid = make_structured_grid(
        kind, nx, ny, bilinear_map({0, -D / 2}, {L, -D / 2}, {L, D / 2}, {0, D / 2}));
    const Model m = model_from_grid(grid, {E, nu}, 1.0);
    Constraints c;
    for (int node : grid.side_nodes[3]) {
        const Vector2 u = exact_u(m.nodes[node]);
        c.prescribed.push_back({dof_ux(node), u.x()});
        c.prescribed.push_back({dof_uy(node), u.y()});
    }
    // Parabolic shear on x = L: t = σ·n = (σxx, τxy) with n = (1, 0), σxx(L, y) = 0.
    Loads loads;
    for (const GridEdge& e : grid.side_edges[1]) {
        // Linear interpolation of the traction is exact only for 2-node
        // edges' resultant; load the parabola with sub-edges instead: split
        // into the element's own nodal forces by integrating the exact
        // traction with the edge shape functions.
        const auto local = edge_nodes(kind, e.edge);
        const int n = edge_node_count(kind);
        const Element& el = m.elements[e.element];
        const Vector2 a = m.nodes[el.nodes[local[0]]];
        const Vector2 b = m.nodes[el.nodes[local[n == 3 ? 2 : 1]]];
        const LineRule& rule = gauss_legendre(5);
        for (int q = 0; q < rule.n; ++q) {
            const double s = rule.x[q];
            const Vector2 x = 0.5 * (1 - s) * a + 0.5 * (1 + s) * b;
            const double ds = 0.5 * (b - a).norm() * rule.w[q];
            const double ty = exact_stress(x)(2);
            std::array<double, 3> N =
                n == 2 ? std::array<double, 3>{0.5 * (1 - s), 0.5 * (1 + s), 0}
                       : std::array<double, 3>{0.5 * s * (s - 1), 1 - s * s, 0.5 * s * (s + 1)};
            for (int i = 0; i < n; ++i)
                loads.nodal.push_back({dof_uy(el.nodes[local[i]]), N[i] * ty * ds});
        }
    }
    const LinearStaticProblem problem(m, c);
    const Solution s = problem.solve(loads);

    // Errors by a 5×5 rule on every element (exact for the polynomial data).
    const SquareRule rule = gauss_square(5);
    const Matrix3 C = plane_stress_compliance({E, nu});
    double l2 = 0, l2_ref = 0, en = 0, en_ref = 0, zz_true = 0;
    const auto recovered = recover_spr(m, spr_samples(m, s.u));
    const ErrorEstimate zz = zz_error_estimate(m, s.u, recovered);
    for (int e = 0; e < static_cast<int>(m.elements.size()); ++e) {
        const Element& el = m.elements[e];
        std::array<Vector2, 9> x;
        const int n = node_count(kind);
        for (int i = 0; i < n; ++i) x[i] = m.nodes[el.nodes[i]];
        const std::span<const Vector2> coords(x.data(), n);
        for (int q = 0; q < rule.n_points; ++q) {
            const auto& p = rule.points[q];
            const Vector2 point = map_point(kind, coords, p.xi, p.eta);
            const double dv = det_J_at(kind, coords, p.xi, p.eta) * p.w;
            Eigen::VectorXd N = n == 4   ? Eigen::VectorXd(shape_q4(p.xi, p.eta).N)
                                : n == 8 ? Eigen::VectorXd(shape_q8(p.xi, p.eta).N)
                                         : Eigen::VectorXd(shape_q9(p.xi, p.eta).N);
            Vector2 uh(0, 0);
            for (int i = 0; i < n; ++i)
                uh += N(i) * Vector2(s.u(dof_ux(el.nodes[i])), s.u(dof_uy(el.nodes[i])));
            const Vector2 du = uh - exact_u(point);
            l2 += du.squaredNorm() * dv;
            l2_ref += exact_u(point).squaredNorm() * dv;
            const Stress ds = element_stress(m, e, s.u, p.xi, p.eta) - exact_stress(point);
            en += ds.dot(C * ds) * dv;
            en_ref += exact_stress(point).dot(C * exact_stress(point)) * dv;
        }
    }
    zz_true = std::sqrt(en);
    const auto& tip = grid.side_nodes[1];
    return {L / nx, std::sqrt(l2 / l2_ref), std::sqrt(en / en_ref), zz.error_norm / zz_true,
            s.u(dof_uy(tip[tip.size() / 2]))};
}

// Least-squares slope of log(error) against log(h).
double slope(const std::vector<Errors>& runs, double Errors::*field) {
    double sx = 0, sy = 0, sxx = 0, sxy = 0;
    const double n = static_cast<double>(runs.size());
    for (const auto& r : runs) {
        const double x = std::log(r.h), y = std::log(r.*field);
        sx += x, sy += y, sxx += x * x, sxy += x * y;
    }
    return (n * sxy - sx * sy) / (n * sxx - sx * sx);
}

} // namespace

TEST_CASE("parabolic-shear cantilever: tip deflection and convergence rates of Q4, Q8 and Q9") {
    struct Expect {
        ElementKind kind;
        double l2_rate, energy_rate;
        std::vector<int> meshes;
    };
    const std::vector<Expect> cases = {{ElementKind::Q4, 1.9, 0.9, {8, 16, 32, 64, 128}},
                                       {ElementKind::Q8, 2.8, 1.9, {4, 8, 16, 32, 64}},
                                       {ElementKind::Q9, 2.8, 1.9, {4, 8, 16, 32, 64}}};
    for (const auto& c : cases) {
        CAPTURE(name(c.kind));
        std::vector<Errors> runs;
        for (int nx : c.meshes) runs.push_back(solve(c.kind, nx));
        for (const auto& r : runs)
            MESSAGE(name(c.kind) << " h=" << r.h << " L2=" << r.l2 << " energy=" << r.energy
                                 << " ZZ effectivity=" << r.zz_effectivity
                                 << " tip uy=" << r.tip_uy);
        const double l2_rate = slope(runs, &Errors::l2), energy_rate = slope(runs, &Errors::energy);
        MESSAGE(name(c.kind) << " L2 slope " << l2_rate << ", energy slope " << energy_rate);
        CHECK(l2_rate >= c.l2_rate);
        CHECK(energy_rate >= c.energy_rate);
        // Finest mesh: the exact tip deflection −0.0089 (to its printed digits).
        CHECK(runs.back().tip_uy == lapwing::test::approx(-0.0089, 0.006));
        // ZZ effectivity (estimated / true energy error) near 1 on the finest mesh.
        CHECK(runs.back().zz_effectivity >= 0.8);
        CHECK(runs.back().zz_effectivity <= 1.25);
    }
}
