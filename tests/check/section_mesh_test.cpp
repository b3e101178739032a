// Section integration on meshes from the mesher (curved hole edges, a
// fillet, weld lines lying on element edges): a uniform stress field must
// integrate to σₙ × material length × t on every kind of line, whatever the
// element edges it crosses, the boundary it starts on or the straight Q4
// edges that cut inside the true fillet.
#include "analysis/plate_region.hpp"
#include "check/section_integral.hpp"
#include "check/section_lines.hpp"
#include "fe/point_locator.hpp"
#include "mesh/mesh.hpp"
#include "plates.hpp"
#include "support/approx.hpp"

#include <doctest/doctest.h>

using namespace lapwing;
using Eigen::Vector2d;

namespace {

fe::Model model_of(const mesh::Mesh& m, const fe::Material& material, double thickness) {
    fe::Model model;
    model.nodes = m.nodes;
    model.materials = {material};
    for (int e = 0; e < m.n_elements(); ++e) {
        fe::Element el;
        el.kind = m.kind;
        el.thickness = thickness;
        const auto nodes = m.element(e);
        for (size_t i = 0; i < nodes.size(); ++i) el.nodes[i] = nodes[i];
        model.elements.push_back(el);
    }
    return model;
}

} // namespace

TEST_CASE(
    "a uniform stress integrates exactly along Whitmore, net, weld and user lines on a real mesh") {
    // Plate 400 × 260 with a 40 mm fillet at (400, 260), a 2 × 3 group of
    // 22 mm holes, welded along its left edge, and a cut through the fillet.
    auto c = test::plate_with({{0, 0}, {400, 0}, {400, 260}, {0, 260}});
    c.plate.outline[2].kind = model::CornerKind::fillet;
    c.plate.outline[2].size = 40;
    c.bolt_groups.push_back(test::bolt_group("g", {220, 70}, 0, 3, 2, 60, 90, 22));
    c.members.push_back(test::member("brace", "g", 0));
    model::Support base;
    base.name = "base";
    base.edges = {3};
    c.supports.push_back(base);
    c.section_lines.push_back({"corner", {300, 248}, {450, 248}});
    const auto layout = analysis::plate_layout(c);
    const auto lines = check::make_section_lines(c, layout);
    REQUIRE(lines.size() == 1 + 3 + 1 + 1);

    // u = εx x + γ/2 y, v = εy y + γ/2 x: constant strain, represented exactly
    // by every element; σ = D ε (plane stress, fe/material.hpp).
    const fe::Material steel{200000, 0.3};
    const Eigen::Vector3d strain(4e-4, -1e-4, 2e-4);
    const Eigen::Vector3d sigma = fe::plane_stress_D(steel) * strain;
    Eigen::Matrix2d tensor;
    tensor << sigma(0), sigma(2), sigma(2), sigma(1);
    const double t = 12;
    for (const auto kind : {fe::ElementKind::Q4, fe::ElementKind::Q8}) {
        CAPTURE(fe::name(kind));
        mesh::MeshSettings settings;
        settings.kind = kind;
        settings.element_size = 25;
        const auto m = mesh::build_mesh(layout.region, settings);
        const auto model = model_of(m, steel, t);
        Eigen::VectorXd u(model.n_dofs());
        for (int n = 0; n < model.n_nodes(); ++n) {
            const Vector2d& x = model.nodes[static_cast<size_t>(n)];
            u(fe::dof_ux(n)) = strain(0) * x.x() + 0.5 * strain(2) * x.y();
            u(fe::dof_uy(n)) = strain(1) * x.y() + 0.5 * strain(2) * x.x();
        }
        const fe::PointLocator locator(model);
        for (const auto& line : lines) {
            CAPTURE(line.id);
            const auto s = check::integrate_section(line, model, locator, u, t);
            const Vector2d n = line.normal(), along = line.tangent();
            const double sn = n.dot(tensor * n), tau = along.dot(tensor * n);
            const double area = line.material_length() * t;
            CHECK(s.N == test::approx(sn * area, 1e-9));
            CHECK(s.V == test::approx(tau * area, 1e-9));
            CHECK(std::abs(s.M) <= 1e-9 * std::abs(sn) * area * line.length());
            CHECK(s.max_peak <= 1e-9 * sigma.norm());
            // The cut ends on the true fillet: its last points lie beyond
            // the straight Q4 edges that chord the arc, and take the field
            // of the element they are next to (exact here, the field being
            // uniform). Lines away from curved edges need no extrapolation.
            if (line.id == "user-corner")
                CHECK(s.extrapolated_points > 0);
            else
                CHECK(s.extrapolated_points == 0);
        }
    }
}
