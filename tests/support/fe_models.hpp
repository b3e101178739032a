// Small model builders shared by the fe and verification tests: promotion of
// a 4-node mesh to 8/9 nodes, merging of coincident nodes, and dof helpers.
#pragma once

#include "fe/model.hpp"
#include "fe/structured_grid.hpp"

#include <algorithm>
#include <map>
#include <utility>
#include <vector>

namespace lapwing::test {

using fe::ElementKind;
using fe::Vector2;

// A 4-node mesh promoted to `kind`: mid-side nodes at straight-edge
// midpoints (shared between neighbours), the Q9 centre at the bilinear
// centre.
inline fe::Model promote(const std::vector<Vector2>& nodes,
                         const std::vector<std::array<int, 4>>& quads, ElementKind kind,
                         const fe::Material& material, double thickness) {
    fe::Model m;
    m.nodes = nodes;
    m.materials = {material};
    std::map<std::pair<int, int>, int> midside;
    for (const auto& q : quads) {
        fe::Element el;
        el.kind = kind;
        el.thickness = thickness;
        for (int i = 0; i < 4; ++i) el.nodes[static_cast<size_t>(i)] = q[static_cast<size_t>(i)];
        if (fe::is_quadratic(kind)) {
            for (int e = 0; e < 4; ++e) {
                const int a = q[static_cast<size_t>(e)], b = q[static_cast<size_t>((e + 1) % 4)];
                const auto key = std::minmax(a, b);
                auto it = midside.find(key);
                if (it == midside.end()) {
                    it = midside.emplace(key, m.n_nodes()).first;
                    m.nodes.push_back(
                        0.5 * (nodes[static_cast<size_t>(a)] + nodes[static_cast<size_t>(b)]));
                }
                el.nodes[static_cast<size_t>(4 + e)] = it->second;
            }
            if (kind == ElementKind::Q9) {
                el.nodes[8] = m.n_nodes();
                Vector2 c(0, 0);
                for (int i = 0; i < 4; ++i)
                    c += 0.25 * nodes[static_cast<size_t>(q[static_cast<size_t>(i)])];
                m.nodes.push_back(c);
            }
        }
        m.elements.push_back(el);
    }
    return m;
}

// Joins grids into one model, merging nodes closer than `tolerance`.
inline fe::Model merge_grids(const std::vector<fe::StructuredGrid>& grids,
                             const fe::Material& material, double thickness,
                             double tolerance = 1e-9) {
    fe::Model m;
    m.materials = {material};
    for (const auto& g : grids) {
        std::vector<int> renumber(g.nodes.size());
        for (size_t i = 0; i < g.nodes.size(); ++i) {
            int found = -1;
            for (int j = 0; j < m.n_nodes() && found < 0; ++j)
                if ((m.nodes[static_cast<size_t>(j)] - g.nodes[i]).norm() < tolerance) found = j;
            if (found < 0) {
                found = m.n_nodes();
                m.nodes.push_back(g.nodes[i]);
            }
            renumber[i] = found;
        }
        for (fe::Element el : g.elements) {
            for (int i = 0; i < fe::node_count(el.kind); ++i)
                el.nodes[static_cast<size_t>(i)] =
                    renumber[static_cast<size_t>(el.nodes[static_cast<size_t>(i)])];
            el.thickness = thickness;
            m.elements.push_back(el);
        }
    }
    return m;
}

inline constexpr std::array<ElementKind, 4> all_kinds = {ElementKind::Q4, ElementKind::Q4i,
                                                         ElementKind::Q8, ElementKind::Q9};

} // namespace lapwing::test
