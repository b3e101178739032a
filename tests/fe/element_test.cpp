// Properties every reference element and element matrix must have, run on
// every element type (Hughes 1987, §3.2 and §4.5; the rank condition: an
// element matrix has exactly the 3 rigid-body zero-energy modes in 2-D).
#include "core/error.hpp"
#include "fe/element_matrix.hpp"
#include "fe/isoparametric_map.hpp"
#include "fe/shape_functions.hpp"
#include "support/approx.hpp"
#include "support/fe_models.hpp"

#include <Eigen/Eigenvalues>
#include <doctest/doctest.h>

using namespace lapwing::fe;
using lapwing::test::all_kinds;

namespace {

template <int n>
void check_shape_properties() {
    // Kronecker property N_i(x_j) = δ_ij.
    for (int j = 0; j < n; ++j) {
        const Vector2 r = reference_node(j);
        const auto s = shape<n>(r.x(), r.y());
        for (int i = 0; i < n; ++i) CHECK(std::abs(s.N(i) - (i == j ? 1.0 : 0.0)) < 1e-15);
    }
    // Partition of unity and its derivative, at scattered points.
    const double pts[][2] = {{0.3, -0.7}, {-0.91, 0.42}, {0.0, 0.0}, {0.77, 0.77}, {-1.0, 0.25}};
    for (const auto& p : pts) {
        const auto s = shape<n>(p[0], p[1]);
        CHECK(s.N.sum() == lapwing::test::approx(1.0, 1e-14));
        CHECK(std::abs(s.dN_dxi.col(0).sum()) < 1e-14);
        CHECK(std::abs(s.dN_dxi.col(1).sum()) < 1e-14);
        // Derivatives against central differences (error O(h²) ≈ 1e-12). Held as
        // values: an Eigen expression of temporaries must not outlive them.
        const double h = 1e-6;
        const ShapeValues<n> sx = (shape<n>(p[0] + h, p[1]).N - shape<n>(p[0] - h, p[1]).N) / (2 * h);
        const ShapeValues<n> sy = (shape<n>(p[0], p[1] + h).N - shape<n>(p[0], p[1] - h).N) / (2 * h);
        for (int i = 0; i < n; ++i) {
            CHECK(s.dN_dxi(i, 0) == doctest::Approx(sx(i)).epsilon(1e-8).scale(1.0));
            CHECK(s.dN_dxi(i, 1) == doctest::Approx(sy(i)).epsilon(1e-8).scale(1.0));
        }
    }
}

// A single distorted element of the given kind with straight edges.
Model one_element(ElementKind kind, const std::array<Vector2, 4>& corners) {
    return lapwing::test::promote({corners.begin(), corners.end()}, {{0, 1, 2, 3}}, kind,
                                  {200000.0, 0.3}, 10.0);
}

const std::array<Vector2, 4> distorted = {Vector2(0, 0), Vector2(2.2, 0.3), Vector2(1.9, 1.7),
                                          Vector2(-0.2, 1.2)};

} // namespace

TEST_CASE("Q4, Q8 and Q9 shape functions: Kronecker delta, partition of unity, derivatives") {
    check_shape_properties<4>();
    check_shape_properties<8>();
    check_shape_properties<9>();
}

TEST_CASE("det J of an affine map equals det A at every point, for every element type") {
    Eigen::Matrix2d A;
    A << 2.0, 0.5, 0.3, 1.5;
    const Vector2 b(4, -1);
    for (ElementKind kind : all_kinds) {
        std::array<Vector2, 9> x;
        for (int i = 0; i < node_count(kind); ++i) x[i] = A * reference_node(i) + b;
        const std::span<const Vector2> c(x.data(), node_count(kind));
        for (double xi : {-1.0, -0.3, 0.5, 1.0})
            for (double eta : {-0.8, 0.0, 0.9}) {
                // x = Aξ + b gives J = A.
                CHECK(det_J_at(kind, c, xi, eta) == lapwing::test::approx(A.determinant(), 1e-14));
                const auto back = inverse_map(kind, c, map_point(kind, c, xi, eta));
                REQUIRE(back);
                CHECK((*back - Vector2(xi, eta)).norm() < 1e-12);
            }
    }
}

TEST_CASE(
    "every element matrix is symmetric with exactly three zero-energy modes, the rigid motions") {
    for (ElementKind kind : all_kinds) {
        CAPTURE(name(kind));
        const Model m = one_element(kind, distorted);
        ElementMatrixStorage k;
        const int n = element_stiffness(m, 0, plane_stress_D(m.materials[0]), k);
        const Eigen::MatrixXd K = k.topLeftCorner(n, n);
        CHECK((K - K.transpose()).norm() <= 1e-12 * K.norm());
        const Eigen::SelfAdjointEigenSolver<Eigen::MatrixXd> eig(K);
        const double largest = eig.eigenvalues().maxCoeff();
        int zero = 0;
        for (int i = 0; i < n; ++i) {
            CHECK(eig.eigenvalues()(i) > -1e-10 * largest);
            if (eig.eigenvalues()(i) < 1e-10 * largest) ++zero;
        }
        CHECK(zero == 3);
        // The rigid motions are among them: K r = 0.
        for (int mode = 0; mode < 3; ++mode) {
            Eigen::VectorXd r(n);
            for (int i = 0; i < n / 2; ++i) {
                const Vector2& x = m.nodes[static_cast<size_t>(m.elements[0].nodes[i])];
                r(2 * i) = mode == 0 ? 1 : mode == 1 ? 0 : -x.y();
                r(2 * i + 1) = mode == 0 ? 0 : mode == 1 ? 1 : x.x();
            }
            CHECK((K * r).norm() <= 1e-12 * largest * r.norm());
        }
    }
}

TEST_CASE("element nodal forces equal the element stiffness times the displacements") {
    // f = Σ Bᵀ D B u t det J w summed as Bᵀ (D B u) is k u reordered (Hughes
    // 1987, eq. 3.4.12): equal to round-off, on a distorted element and for
    // several displacement columns at once.
    for (ElementKind kind : all_kinds) {
        CAPTURE(name(kind));
        const Model m = one_element(kind, distorted);
        ElementMatrixStorage k;
        const Matrix3 D = plane_stress_D(m.materials[0]);
        const int n = element_stiffness(m, 0, D, k);
        Eigen::MatrixXd u(n, 3);
        for (int i = 0; i < n; ++i)
            for (int c = 0; c < 3; ++c) u(i, c) = std::sin(1.0 + i + 7.0 * c) * 1e-3;
        Eigen::MatrixXd f(n, 3);
        element_forces(m, 0, D, u, f);
        const Eigen::MatrixXd expected = k.topLeftCorner(n, n) * u;
        CHECK((f - expected).norm() <= 1e-13 * expected.norm());
    }
}

TEST_CASE("an element numbered clockwise is reported with its number, the point and det J") {
    for (ElementKind kind : all_kinds) {
        CAPTURE(name(kind));
        const std::array<Vector2, 4> clockwise = {distorted[0], distorted[3], distorted[2],
                                                  distorted[1]};
        const Model m = one_element(kind, clockwise);
        ElementMatrixStorage k;
        try {
            element_stiffness(m, 0, plane_stress_D(m.materials[0]), k);
            FAIL("no error for an inverted element");
        } catch (const lapwing::AnalysisError& e) {
            const std::string what = e.what();
            CHECK(what.find("element 0") != std::string::npos);
            CHECK(what.find("inverted") != std::string::npos);
            CHECK(what.find("det J = -") != std::string::npos);
        }
    }
}

TEST_CASE("a non-convex Q4 whose Gauss points are all positive is still rejected") {
    // The reflex corner at (0.6, 0.6) makes det J negative near it only.
    const std::array<Vector2, 4> arrow = {Vector2(0, 0), Vector2(2, 0), Vector2(0.6, 0.6),
                                          Vector2(0, 2)};
    const Model m = one_element(ElementKind::Q4, arrow);
    ElementMatrixStorage k;
    CHECK_THROWS_AS(element_stiffness(m, 0, plane_stress_D(m.materials[0]), k),
                    lapwing::AnalysisError);
}

TEST_CASE("a nearly collapsed element is reported as degenerate, with its det J against the mean") {
    // Corner 3 pulled to within 1e-9 of corner 2: det J there is ~1e-9 of the mean.
    const std::array<Vector2, 4> collapsed = {Vector2(0, 0), Vector2(1, 0), Vector2(1, 1),
                                              Vector2(1 - 1e-9, 1)};
    for (ElementKind kind : all_kinds) {
        CAPTURE(name(kind));
        const Model m = one_element(kind, collapsed);
        ElementMatrixStorage k;
        const std::string expected = "element 0 (" + std::string(name(kind)) + ") is degenerate";
        CHECK_THROWS_WITH_AS(element_stiffness(m, 0, plane_stress_D(m.materials[0]), k),
                             doctest::Contains(expected.c_str()), lapwing::AnalysisError);
    }
}
