// The data of a plane-stress finite-element model: nodes, elements,
// materials, springs, and the dofs they carry. Plain values, no behaviour.
#pragma once

#include "fe/element_kind.hpp"
#include "fe/material.hpp"
#include "fe/notation.hpp"

#include <array>
#include <vector>

namespace lapwing::fe {

struct Element {
    ElementKind kind = ElementKind::Q4;
    std::array<int, 9> nodes{}; // first node_count(kind) entries used
    int material = 0;           // index into Model::materials
    double thickness = 1.0;     // mm
};

// A linear spring of stiffness k (N/mm) between two dofs, or from one dof to
// the ground when dof_b < 0. Bolt shear springs are pairs of these.
struct Spring {
    int dof_a = -1;
    int dof_b = -1;
    double k = 0;
};

// A spring along a fixed unit direction n between two nodes, with energy
// ½ k ((u_b − u_a) · n)²; node_b < 0 ties node_a to the ground. Its stiffness
// may be refilled (0 switches it off) without changing the sparsity pattern,
// which is what contact by an active set needs.
struct LinkSpring {
    int node_a = -1;
    int node_b = -1;
    Vector2 direction{1, 0};
    double k = 0;
};

// Every node carries ux (dof 2i) and uy (dof 2i+1). A node listed in
// rotation_nodes also carries an in-plane rotation θ (rigid-body reference
// points such as member work points); its θ dof is 2·n_nodes + its position
// in that list.
struct Model {
    std::vector<Vector2> nodes;
    std::vector<Element> elements;
    std::vector<Material> materials;
    std::vector<Spring> springs;
    std::vector<LinkSpring> link_springs;
    std::vector<int> rotation_nodes;

    int n_nodes() const { return static_cast<int>(nodes.size()); }
    int n_dofs() const { return 2 * n_nodes() + static_cast<int>(rotation_nodes.size()); }
};

inline int dof_ux(int node) {
    return 2 * node;
}
inline int dof_uy(int node) {
    return 2 * node + 1;
}
inline int dof_rotation(const Model& model, int rotation_index) {
    return 2 * model.n_nodes() + rotation_index;
}

} // namespace lapwing::fe
