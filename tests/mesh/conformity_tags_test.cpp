// Conformity of the mesh and the tags on its boundary: every boundary edge
// lies on the geometric piece its tag names (checked against the input
// geometry, not the mesher's curves), every outline vertex and arc end is a
// node, and the hole node sets hold exactly the nodes on each hole.
#include "mesh/mesh.hpp"
#include "mesh_checks.hpp"
#include "sample_plates.hpp"

#include <cmath>
#include <doctest/doctest.h>
#include <numbers>

using namespace lapwing;
using Eigen::Vector2d;
using geometry::BoundaryKind;

namespace {

double line_distance(const Vector2d& p, const Vector2d& a, const Vector2d& b) {
    const Vector2d d = (b - a).normalized();
    return std::abs((p - a).x() * d.y() - (p - a).y() * d.x());
}

// Distance from p to the piece of sample_plate() named by tag (by hand).
double off_piece(const Vector2d& p, const geometry::BoundaryTag& tag) {
    const auto r = test::sample_plate();
    switch (tag.kind) {
    case BoundaryKind::outline_edge: {
        const auto& o = r.outline;
        return line_distance(p, o[tag.index].point, o[(tag.index + 1) % o.size()].point);
    }
    case BoundaryKind::outline_corner:
        if (tag.index == 2) return std::abs((p - Vector2d(260, 160)).norm() - 40); // fillet centre
        if (tag.index == 3) return line_distance(p, {0, 180}, {20, 200});          // chamfer
        return 1e9;
    case BoundaryKind::hole: {
        const auto& h = r.holes[tag.index];
        if (h.shape == geometry::HoleShape::circle)
            return std::abs((p - h.centre).norm() - h.diameter / 2);
        const double a = (h.length - h.width) / 2, t = h.angle_deg * std::numbers::pi / 180;
        const Vector2d u(std::cos(t), std::sin(t));
        const double s = std::clamp((p - h.centre).dot(u), -a, a);
        return std::abs((p - h.centre - s * u).norm() - h.width / 2);
    }
    case BoundaryKind::cutout: {
        const auto& c = r.cutouts[tag.index].points;
        return line_distance(p, c[tag.part], c[(tag.part + 1) % c.size()]);
    }
    }
    return 1e9;
}

bool has_node_at(const mesh::Mesh& m, const Vector2d& p) {
    for (const auto& x : m.nodes)
        if ((x - p).norm() < 1e-9) return true;
    return false;
}

} // namespace

TEST_CASE("the mesh is conforming: shared edges, closed boundary loops, no duplicate nodes") {
    for (auto kind : {fe::ElementKind::Q4, fe::ElementKind::Q8, fe::ElementKind::Q9}) {
        mesh::MeshSettings s;
        s.kind = kind;
        const mesh::Mesh m = mesh::build_mesh(test::sample_plate(), s);
        // Outer boundary (with the notch) plus three holes.
        CHECK_MESSAGE(test::conformity_problem(m, 4) == "", fe::name(kind));
        CHECK(m.quality_summary.n_inverted == 0);
    }
}

TEST_CASE("every boundary edge lies on the piece its tag names, vertices and arc ends are nodes") {
    for (auto kind : {fe::ElementKind::Q4, fe::ElementKind::Q8}) {
        mesh::MeshSettings s;
        s.kind = kind;
        s.element_size = 15;
        const mesh::Mesh m = mesh::build_mesh(test::sample_plate(), s);
        double worst = 0.0;
        for (const auto& be : m.boundary_edges)
            for (int n : be.nodes)
                if (n >= 0) worst = std::max(worst, off_piece(m.nodes[n], be.tag));
        CHECK(worst < 1e-9);
        // Pieces present: outline edges 0..3 (edge 0 and 3 shortened by the
        // notch), corners 2 and 3, holes 0..2, notch edges 1 and 2.
        for (int i = 0; i < 4; ++i) CHECK(!m.nodes_on({BoundaryKind::outline_edge, i, 0}).empty());
        CHECK(!m.nodes_on({BoundaryKind::outline_corner, 2, 0}).empty());
        CHECK(!m.nodes_on({BoundaryKind::outline_corner, 3, 0}).empty());
        CHECK(!m.nodes_on({BoundaryKind::cutout, 0, 1}).empty());
        CHECK(!m.nodes_on({BoundaryKind::cutout, 0, 2}).empty());
        CHECK(m.nodes_on({BoundaryKind::cutout, 0, 0}).empty()); // outside the plate
        for (Vector2d p :
             {Vector2d(300, 0), Vector2d(300, 160), Vector2d(260, 200), Vector2d(20, 200),
              Vector2d(0, 180), Vector2d(0, 30), Vector2d(60, 30), Vector2d(60, 0)})
            CHECK_MESSAGE(has_node_at(m, p), "no node at (" << p.x() << ", " << p.y() << ")");
    }
}

TEST_CASE("hole node sets: every node on the hole edge, in order, mid-side nodes on the arc") {
    for (auto kind : {fe::ElementKind::Q4, fe::ElementKind::Q8, fe::ElementKind::Q9}) {
        mesh::MeshSettings s;
        s.kind = kind;
        const mesh::Mesh m = mesh::build_mesh(test::sample_plate(), s);
        REQUIRE(m.hole_nodes.size() == 3);
        for (int h = 0; h < 3; ++h) {
            const auto& set = m.hole_nodes[h].nodes;
            const auto on = m.nodes_on(BoundaryKind::hole, h);
            CHECK(set.size() == on.size());
            double worst = 0.0;
            for (int n : set)
                worst = std::max(worst, off_piece(m.nodes[n], {BoundaryKind::hole, h, 0}));
            CHECK(worst < 1e-9);
            // Default element count round each hole (≥ 16 quadratic, ≥ 32 linear).
            const size_t per_edge = fe::is_quadratic(kind) ? 2 : 1;
            CHECK(set.size() >= (fe::is_quadratic(kind) ? 16u : 32u) * per_edge);
        }
        // Circle nodes run round the hole: consecutive angles step one way.
        const auto& c = m.hole_nodes[0].nodes;
        int turns = 0;
        for (size_t i = 0; i < c.size(); ++i) {
            const Vector2d a = m.nodes[c[i]] - Vector2d(100, 100),
                           b = m.nodes[c[(i + 1) % c.size()]] - Vector2d(100, 100);
            turns += (a.x() * b.y() - a.y() * b.x()) < 0 ? 1 : 0; // clockwise, plate on the left
        }
        CHECK(turns == static_cast<int>(c.size()));
    }
}
