// The element types of the library and their node numbering on the
// reference square [-1,1]². Every part of lapwing uses this numbering.
#pragma once

#include <array>
#include <string_view>

namespace lapwing::fe {

//        η
//        ^
//   3 ---6--- 2          corners first, counter-clockwise: 0 1 2 3
//   |    |    |          mid-sides next, mid-side 4+e on edge e
//   7    8 ---5--> ξ     (edge e runs from corner e to corner (e+1) mod 4)
//   |         |          centre last (Q9 only): 8
//   0 ---4--- 1
//
// Reference coordinates: 0 (-1,-1)  1 (1,-1)  2 (1,1)  3 (-1,1)
//                        4 (0,-1)   5 (1,0)   6 (0,1)  7 (-1,0)   8 (0,0)
enum class ElementKind {
    Q4,  // bilinear, 4 nodes, 2×2 Gauss
    Q4i, // bilinear plus condensed incompatible bending modes, 4 nodes, 2×2 Gauss
    Q8,  // serendipity, 8 nodes, 3×3 Gauss
    Q9,  // Lagrange, 9 nodes, 3×3 Gauss
};

constexpr int node_count(ElementKind kind) {
    switch (kind) {
    case ElementKind::Q4:
    case ElementKind::Q4i:
        return 4;
    case ElementKind::Q8:
        return 8;
    case ElementKind::Q9:
        return 9;
    }
    return 0;
}

// Nodes on an element edge: 2 for linear elements, 3 (corner, mid-side,
// corner) for quadratic ones.
constexpr int edge_node_count(ElementKind kind) {
    return node_count(kind) == 4 ? 2 : 3;
}

constexpr bool is_quadratic(ElementKind kind) {
    return node_count(kind) > 4;
}

// Local node numbers along edge e (0..3), from corner e to corner e+1; for
// quadratic elements the middle entry is the mid-side node.
constexpr std::array<int, 3> edge_nodes(ElementKind kind, int e) {
    const int a = e, b = (e + 1) % 4;
    if (is_quadratic(kind)) return {a, 4 + e, b};
    return {a, b, -1};
}

// Gauss points per direction for full integration of the stiffness: exact for
// the parallelogram stiffness (Bathe 1996, §5.5.5 on required orders).
constexpr int gauss_order(ElementKind kind) {
    return node_count(kind) == 4 ? 2 : 3;
}

constexpr std::string_view name(ElementKind kind) {
    switch (kind) {
    case ElementKind::Q4:
        return "Q4";
    case ElementKind::Q4i:
        return "Q4i";
    case ElementKind::Q8:
        return "Q8";
    case ElementKind::Q9:
        return "Q9";
    }
    return "?";
}

// VTK cell type numbers (VTK file format: VTK_QUAD 9, VTK_QUADRATIC_QUAD 23,
// VTK_BIQUADRATIC_QUAD 28); the node order above is VTK's.
constexpr int vtk_cell_type(ElementKind kind) {
    switch (kind) {
    case ElementKind::Q4:
    case ElementKind::Q4i:
        return 9;
    case ElementKind::Q8:
        return 23;
    case ElementKind::Q9:
        return 28;
    }
    return 0;
}

} // namespace lapwing::fe
