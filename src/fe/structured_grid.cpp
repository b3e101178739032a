// Structured grid generation on a mapped square.
#include "fe/structured_grid.hpp"

namespace lapwing::fe {

StructuredGrid make_structured_grid(ElementKind kind, int nx, int ny, const GridMap& map) {
    StructuredGrid g;
    const int order = is_quadratic(kind) ? 2 : 1;
    const int mx = order * nx + 1, my = order * ny + 1;
    std::vector<int> index(static_cast<size_t>(mx * my), -1);
    for (int j = 0; j < my; ++j)
        for (int i = 0; i < mx; ++i) {
            if (kind == ElementKind::Q8 && i % 2 == 1 && j % 2 == 1) continue; // no centre nodes
            index[static_cast<size_t>(j * mx + i)] = static_cast<int>(g.nodes.size());
            g.nodes.push_back(
                map(static_cast<double>(i) / (mx - 1), static_cast<double>(j) / (my - 1)));
        }
    auto at = [&](int i, int j) { return index[static_cast<size_t>(j * mx + i)]; };
    for (int ej = 0; ej < ny; ++ej)
        for (int ei = 0; ei < nx; ++ei) {
            Element el;
            el.kind = kind;
            const int i = order * ei, j = order * ej;
            el.nodes[0] = at(i, j), el.nodes[1] = at(i + order, j);
            el.nodes[2] = at(i + order, j + order), el.nodes[3] = at(i, j + order);
            if (order == 2) {
                el.nodes[4] = at(i + 1, j), el.nodes[5] = at(i + 2, j + 1);
                el.nodes[6] = at(i + 1, j + 2), el.nodes[7] = at(i, j + 1);
                if (kind == ElementKind::Q9) el.nodes[8] = at(i + 1, j + 1);
            }
            const int e = static_cast<int>(g.elements.size());
            g.elements.push_back(el);
            if (ej == 0) g.side_edges[0].push_back({e, 0});
            if (ei == nx - 1) g.side_edges[1].push_back({e, 1});
            if (ej == ny - 1) g.side_edges[2].push_back({e, 2});
            if (ei == 0) g.side_edges[3].push_back({e, 3});
        }
    for (int i = 0; i < mx; ++i)
        g.side_nodes[0].push_back(at(i, 0)), g.side_nodes[2].push_back(at(i, my - 1));
    for (int j = 0; j < my; ++j)
        g.side_nodes[1].push_back(at(mx - 1, j)), g.side_nodes[3].push_back(at(0, j));
    return g;
}

GridMap bilinear_map(const Vector2& p0, const Vector2& p1, const Vector2& p2, const Vector2& p3) {
    return [=](double s, double t) -> Vector2 {
        return (1 - s) * (1 - t) * p0 + s * (1 - t) * p1 + s * t * p2 + (1 - s) * t * p3;
    };
}

Model model_from_grid(const StructuredGrid& grid, const Material& material, double thickness) {
    Model m;
    m.nodes = grid.nodes;
    m.elements = grid.elements;
    for (Element& el : m.elements) el.thickness = thickness;
    m.materials = {material};
    return m;
}

} // namespace lapwing::fe
