// Construction of the quarter plate with a hole: two mapped grids, joined by
// renumbering the strip's left edge onto the annulus block's right edge.
#include "plate_with_hole.hpp"

#include "fe/structured_grid.hpp"

#include <cassert>
#include <cmath>
#include <numbers>
#include <stdexcept>

namespace lapwing::bench {

namespace {

// Nodes of an nx × ny structured grid of `kind` (Q8 omits the centre nodes).
long grid_nodes(fe::ElementKind kind, long nx, long ny) {
    if (!fe::is_quadratic(kind)) return (nx + 1) * (ny + 1);
    const long full = (2 * nx + 1) * (2 * ny + 1);
    return kind == fe::ElementKind::Q8 ? full - nx * ny : full;
}

// Radial spacing that grows geometrically away from the hole, so elements
// near the hole (where the stress gradient is) stay roughly square:
// g(0) = 0, g(1) = 1, g' ∝ exp(β s).
double graded(double s) {
    constexpr double beta = 1.5;
    return std::expm1(beta * s) / std::expm1(beta);
}

} // namespace

long plate_dofs(fe::ElementKind kind, int m) {
    const long order = fe::is_quadratic(kind) ? 2 : 1;
    const long annulus = grid_nodes(kind, m, 2L * m);
    const long strip = grid_nodes(kind, 3L * m, m);
    const long shared = order * m + 1;
    return 2 * (annulus + strip - shared);
}

PlateModel make_plate_with_hole(fe::ElementKind kind, long target_dofs,
                                const PlateWithHole& plate) {
    int best = 2;
    for (int m = 2; plate_dofs(kind, m - 1) < target_dofs; ++m)
        if (std::abs(plate_dofs(kind, m) - target_dofs) <
            std::abs(plate_dofs(kind, best) - target_dofs))
            best = m;
    return make_plate_with_hole_at_scale(kind, best, plate);
}

PlateModel make_plate_with_hole_at_scale(fe::ElementKind kind, int m, const PlateWithHole& plate) {
    if (m < 2) throw std::invalid_argument("plate with hole: mesh scale must be at least 2");
    const double a = plate.hole_radius, w = plate.half_width, l = plate.half_length;

    // Annulus block: s runs out from the hole, t around it from the x axis
    // (t = 0) to the y axis (t = 1); that order keeps the elements
    // counter-clockwise. The outer side follows x = w for t ≤ ½, then y = w.
    const fe::GridMap annulus_map = [=](double s, double t) -> fe::Vector2 {
        const double theta = 0.5 * std::numbers::pi * t;
        const fe::Vector2 inner(a * std::cos(theta), a * std::sin(theta));
        const fe::Vector2 outer =
            t <= 0.5 ? fe::Vector2(w, 2 * w * t) : fe::Vector2(w * (2 - 2 * t), w);
        return inner + graded(s) * (outer - inner);
    };
    const fe::StructuredGrid annulus = fe::make_structured_grid(kind, m, 2 * m, annulus_map);
    const fe::StructuredGrid strip =
        fe::make_structured_grid(kind, 3 * m, m, fe::bilinear_map({w, 0}, {l, 0}, {l, w}, {w, w}));

    // The strip's left side (s = 0, increasing y) is the first half of the
    // annulus block's outer side (increasing t): same parameters, same points.
    const auto& outer_side = annulus.side_nodes[1];
    const auto& strip_left = strip.side_nodes[3];
    std::vector<int> renumber(strip.nodes.size(), -1);
    for (size_t k = 0; k < strip_left.size(); ++k) {
        const int into = outer_side[k];
        assert((annulus.nodes[static_cast<size_t>(into)] -
                strip.nodes[static_cast<size_t>(strip_left[k])])
                   .norm() < 1e-9 * w);
        renumber[static_cast<size_t>(strip_left[k])] = into;
    }

    PlateModel out;
    out.mesh_scale = m;
    fe::Model& model = out.model;
    model.materials = {{200000.0, 0.3}}; // steel, MPa
    model.nodes = annulus.nodes;
    model.nodes.reserve(annulus.nodes.size() + strip.nodes.size());
    for (size_t i = 0; i < strip.nodes.size(); ++i)
        if (renumber[i] < 0) {
            renumber[i] = model.n_nodes();
            model.nodes.push_back(strip.nodes[i]);
        }
    model.elements.reserve(annulus.elements.size() + strip.elements.size());
    for (fe::Element el : annulus.elements) {
        el.thickness = plate.thickness;
        model.elements.push_back(el);
    }
    const int strip_first = static_cast<int>(model.elements.size());
    for (fe::Element el : strip.elements) {
        for (int i = 0; i < fe::node_count(kind); ++i)
            el.nodes[static_cast<size_t>(i)] =
                renumber[static_cast<size_t>(el.nodes[static_cast<size_t>(i)])];
        el.thickness = plate.thickness;
        model.elements.push_back(el);
    }
    assert(2L * model.n_nodes() == plate_dofs(kind, m));

    // Symmetry: uy = 0 on y = 0 (annulus side t = 0 and the strip's bottom),
    // ux = 0 on x = 0 (annulus side t = 1).
    for (int node : annulus.side_nodes[0])
        out.constraints.prescribed.push_back({fe::dof_uy(node), 0});
    for (int node : strip.side_nodes[0]) {
        const int merged = renumber[static_cast<size_t>(node)];
        if (merged != annulus.side_nodes[0].back())
            out.constraints.prescribed.push_back({fe::dof_uy(merged), 0});
    }
    for (int node : annulus.side_nodes[2])
        out.constraints.prescribed.push_back({fe::dof_ux(node), 0});

    // Uniform tension on the far end (the strip's right side).
    for (const fe::GridEdge& edge : strip.side_edges[1])
        out.loads.edges.push_back({strip_first + edge.element,
                                   edge.edge,
                                   fe::TractionFrame::global,
                                   {plate.tension, 0},
                                   {plate.tension, 0}});
    out.hole_top_node = annulus.side_nodes[2].front();
    return out;
}

} // namespace lapwing::bench
