// Stress recovery: SPR reproduces a stress field in its polynomial space
// exactly (Zienkiewicz & Zhu 1992, IJNME 33:1331, the consistency
// condition), on distorted meshes, for every element type; extrapolation
// reproduces a constant field; von Mises and principal stresses of known
// states.
#include "fe/recovery.hpp"
#include "fe/structured_grid.hpp"
#include "support/approx.hpp"
#include "support/fe_models.hpp"

#include <cmath>
#include <doctest/doctest.h>

using namespace lapwing::fe;

namespace {
// A 5 × 4 grid on a distorted quadrilateral, with a wavy interior.
Model distorted_grid(ElementKind kind) {
    const auto base = bilinear_map({0, 0}, {50, 5}, {45, 40}, {-3, 35});
    const auto grid = make_structured_grid(kind, 5, 4, [&](double s, double t) {
        return Vector2(base(s, t) + Vector2(1.5 * std::sin(3 * t) * s * (1 - s),
                                            1.2 * std::sin(4 * s) * t * (1 - t)));
    });
    return model_from_grid(grid, {200000.0, 0.3}, 8.0);
}
Stress linear_field(const Vector2& x) {
    return {10 + 0.5 * x.x() - 0.2 * x.y(), -4 + 0.1 * x.x() + 0.3 * x.y(), 2 - 0.05 * x.x()};
}
Stress quadratic_field(const Vector2& x) {
    return linear_field(x) +
           Stress(0.01 * x.x() * x.x(), -0.02 * x.x() * x.y(), 0.005 * x.y() * x.y());
}
} // namespace

TEST_CASE("SPR recovers a linear stress field exactly at every node of every element type") {
    for (ElementKind kind : lapwing::test::all_kinds) {
        CAPTURE(name(kind));
        const Model m = distorted_grid(kind);
        SampledStresses samples = spr_samples(m, Eigen::VectorXd::Zero(m.n_dofs()));
        for (size_t k = 0; k < samples.point.size(); ++k)
            samples.stress[k] = linear_field(samples.point[k]);
        const auto nodal = recover_spr(m, samples);
        double worst = 0;
        for (int i = 0; i < m.n_nodes(); ++i)
            worst = std::max(worst, (nodal[i] - linear_field(m.nodes[i])).norm() /
                                        linear_field(m.nodes[i]).norm());
        CHECK(worst < 1e-10);
    }
}

TEST_CASE("SPR with quadratic elements recovers a quadratic stress field exactly") {
    for (ElementKind kind : {ElementKind::Q8, ElementKind::Q9}) {
        const Model m = distorted_grid(kind);
        SampledStresses samples = spr_samples(m, Eigen::VectorXd::Zero(m.n_dofs()));
        for (size_t k = 0; k < samples.point.size(); ++k)
            samples.stress[k] = quadratic_field(samples.point[k]);
        const auto nodal = recover_spr(m, samples);
        double worst = 0;
        for (int i = 0; i < m.n_nodes(); ++i)
            worst = std::max(worst, (nodal[i] - quadratic_field(m.nodes[i])).norm() /
                                        quadratic_field(m.nodes[i]).norm());
        CHECK(worst < 1e-9);
    }
}

TEST_CASE("von Mises and principal stresses of known states") {
    // Uniaxial σ: von Mises σ. Pure shear τ: von Mises √3 τ, principal ±τ at 45°.
    CHECK(von_mises({250, 0, 0}) == lapwing::test::approx(250));
    CHECK(von_mises({0, 0, 100}) == lapwing::test::approx(100 * std::sqrt(3.0)));
    const Principal p = principal({0, 0, 100});
    CHECK(p.s1 == lapwing::test::approx(100));
    CHECK(p.s2 == lapwing::test::approx(-100));
    CHECK(p.angle_rad == lapwing::test::approx(std::atan(1.0)));
    // Equal biaxial: von Mises σ.
    CHECK(von_mises({120, 120, 0}) == lapwing::test::approx(120));
}

TEST_CASE("sampling several displacement fields at once gives each field's own samples, and a "
          "uniform strain the plane-stress D ε at every point") {
    // Uniform strain from linear displacements: every isoparametric element
    // reproduces it exactly (the patch test, Irons; Hughes 1987 §3.8), and
    // σ = E/(1−ν²) [εx + ν εy, εy + ν εx, (1−ν)/2 γxy] (plane stress,
    // elementary elasticity).
    const double E = 200000, nu = 0.3;
    const double ex = 2e-4, ey = -1e-4, gxy = 3e-4;
    for (ElementKind kind : lapwing::test::all_kinds) {
        CAPTURE(name(kind));
        const Model m = distorted_grid(kind);
        Eigen::VectorXd uniform(m.n_dofs()), wavy(m.n_dofs());
        for (int n = 0; n < m.n_nodes(); ++n) {
            const Vector2& x = m.nodes[static_cast<size_t>(n)];
            uniform(dof_ux(n)) = ex * x.x() + 0.5 * gxy * x.y();
            uniform(dof_uy(n)) = ey * x.y() + 0.5 * gxy * x.x();
            wavy(dof_ux(n)) = 1e-3 * std::sin(0.1 * x.x() + 0.2 * x.y());
            wavy(dof_uy(n)) = 1e-3 * std::cos(0.15 * x.x() * x.y() / 40);
        }
        const std::vector<const Eigen::VectorXd*> fields = {&uniform, &wavy};
        const std::vector<SampledStresses> both = sample_stresses(m, fields, 3);
        REQUIRE(both.size() == 2);
        for (size_t f = 0; f < 2; ++f) {
            const SampledStresses alone = sample_stresses(m, *fields[f], 3);
            REQUIRE(both[f].stress.size() == alone.stress.size());
            for (size_t k = 0; k < alone.stress.size(); ++k) {
                CHECK((both[f].stress[k] - alone.stress[k]).cwiseAbs().maxCoeff() == 0.0);
                CHECK(both[f].point[k] == alone.point[k]);
                CHECK(both[f].weight[k] == alone.weight[k]);
            }
        }
        const Stress expected =
            E / (1 - nu * nu) * Stress(ex + nu * ey, ey + nu * ex, 0.5 * (1 - nu) * gxy);
        for (const Stress& s : both[0].stress)
            CHECK((s - expected).cwiseAbs().maxCoeff() < 1e-9 * expected.cwiseAbs().maxCoeff());
    }
}
