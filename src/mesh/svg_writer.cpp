// SVG drawing of a mesh. y points up in the model and down in SVG, so every
// point is mirrored about the drawing's mid-height.
#include "mesh/writers.hpp"

#include <algorithm>
#include <cmath>
#include <fmt/format.h>
#include <iterator>
#include <map>

namespace lapwing::mesh {

namespace {

const char* colour(geometry::BoundaryKind kind) {
    switch (kind) {
    case geometry::BoundaryKind::outline_edge:
        return "#1f4e79";
    case geometry::BoundaryKind::outline_corner:
        return "#2e75b6";
    case geometry::BoundaryKind::hole:
        return "#c00000";
    case geometry::BoundaryKind::cutout:
        return "#7030a0";
    }
    return "#000000";
}

} // namespace

std::string mesh_to_svg(const Mesh& mesh, const SvgOptions& options) {
    Eigen::Vector2d lo(HUGE_VAL, HUGE_VAL), hi(-HUGE_VAL, -HUGE_VAL);
    for (const auto& p : mesh.nodes) {
        lo = lo.cwiseMin(p);
        hi = hi.cwiseMax(p);
    }
    if (mesh.nodes.empty()) lo = hi = Eigen::Vector2d::Zero();
    const double span = std::max({hi.x() - lo.x(), hi.y() - lo.y(), 1e-9});
    const double margin = 0.03 * span;
    const double scale = options.width_px / (hi.x() - lo.x() + 2 * margin + 1e-300);
    const double height = (hi.y() - lo.y() + 2 * margin) * scale;
    const auto X = [&](const Eigen::Vector2d& p) { return (p.x() - lo.x() + margin) * scale; };
    const auto Y = [&](const Eigen::Vector2d& p) { return (hi.y() - p.y() + margin) * scale; };
    const bool quadratic = fe::is_quadratic(mesh.kind);
    const auto edge_path = [&](fmt::memory_buffer& out, int a, int m, int b, bool move) {
        const auto& pa = mesh.nodes[a];
        const auto& pb = mesh.nodes[b];
        if (move) fmt::format_to(std::back_inserter(out), "M{:.2f} {:.2f}", X(pa), Y(pa));
        if (m >= 0) {
            // Quadratic Bézier through the mid-side node at t = ½: control = 2m − (a + b)/2.
            const Eigen::Vector2d c = 2.0 * mesh.nodes[m] - 0.5 * (pa + pb);
            fmt::format_to(std::back_inserter(out), "Q{:.2f} {:.2f} {:.2f} {:.2f}", X(c), Y(c),
                           X(pb), Y(pb));
        } else {
            fmt::format_to(std::back_inserter(out), "L{:.2f} {:.2f}", X(pb), Y(pb));
        }
    };

    fmt::memory_buffer out;
    fmt::format_to(std::back_inserter(out),
                   "<svg xmlns=\"http://www.w3.org/2000/svg\" width=\"{:.0f}\" height=\"{:.0f}\" "
                   "viewBox=\"0 0 {:.2f} {:.2f}\">\n",
                   options.width_px, height, options.width_px, height);
    fmt::format_to(std::back_inserter(out),
                   "<title>lapwing mesh: {} {} elements, {} nodes</title>\n", mesh.n_elements(),
                   fe::name(mesh.kind), mesh.nodes.size());
    fmt::format_to(std::back_inserter(out),
                   "<path fill=\"#eef3f8\" stroke=\"#5a6b7b\" stroke-width=\"0.5\" d=\"");
    for (int e = 0; e < mesh.n_elements(); ++e) {
        const auto el = mesh.element(e);
        for (int k = 0; k < 4; ++k)
            edge_path(out, el[k], quadratic ? el[4 + k] : -1, el[(k + 1) % 4], k == 0);
        fmt::format_to(std::back_inserter(out), "Z");
    }
    fmt::format_to(std::back_inserter(out), "\"/>\n");

    // Boundary, one path per kind so the colours group.
    std::map<int, fmt::memory_buffer> by_kind;
    for (const BoundaryEdge& be : mesh.boundary_edges) {
        auto& buf = by_kind[static_cast<int>(be.tag.kind)];
        const int n_edge = fe::edge_node_count(mesh.kind);
        edge_path(buf, be.nodes[0], quadratic ? be.nodes[1] : -1, be.nodes[n_edge - 1], true);
    }
    for (auto& [kind, buf] : by_kind) {
        fmt::format_to(std::back_inserter(out),
                       "<path fill=\"none\" stroke=\"{}\" stroke-width=\"1.6\" d=\"{}\"/>\n",
                       options.show_tags ? colour(static_cast<geometry::BoundaryKind>(kind))
                                         : "#000000",
                       fmt::to_string(buf));
    }
    if (options.show_tags) {
        // Label each tagged piece once, at the middle edge of its run.
        std::map<std::string, std::vector<const BoundaryEdge*>> pieces;
        for (const BoundaryEdge& be : mesh.boundary_edges) {
            geometry::BoundaryTag t = be.tag;
            if (t.kind == geometry::BoundaryKind::hole) t.part = 0;
            pieces[t.name()].push_back(&be);
        }
        for (const auto& [name, edges] : pieces) {
            const BoundaryEdge& be = *edges[edges.size() / 2];
            const Eigen::Vector2d p = mesh.nodes[be.nodes[0]];
            fmt::format_to(
                std::back_inserter(out),
                "<text x=\"{:.2f}\" y=\"{:.2f}\" font-family=\"sans-serif\" font-size=\"10\" "
                "fill=\"{}\">{}</text>\n",
                X(p) + 3, Y(p) - 3, colour(be.tag.kind), name);
        }
    }
    fmt::format_to(std::back_inserter(out), "</svg>\n");
    return fmt::to_string(out);
}

} // namespace lapwing::mesh
