// The force across a section line from element nodal forces on one side of
// it: a free body, exact to round-off by equilibrium whatever the mesh.
#pragma once

#include "check/section.hpp"
#include "fe/model.hpp"

#include <Eigen/Core>
#include <optional>
#include <vector>

namespace lapwing::check {

struct FreeBodyResultant {
    double N = 0, V = 0, M = 0; // same senses as SectionStress::N, V, M
    int elements = 0;           // elements in the free body
};

// The side of the line is the set of elements whose centroids lie on the
// −normal side, grown through shared element edges that do not cross the
// line; the force on it is Σ k_e u_e over its elements at the nodes it
// shares with the rest. This is the force the other side puts on it, the
// same as ∫ σ·n t ds for the exact field. A load applied at a shared node
// (a bolt tie at a hole-edge node on the line) is split half to each side. For a weld line (on the
// plate's edge) the free body is the whole plate and the force is the reaction at the nodes on the
// line. Nothing when the line does not separate the plate (a Whitmore line that stops short of the
// edges). `about` is the distance along the line of the point M is taken about.
std::optional<FreeBodyResultant> free_body_resultant(const SectionLine& line,
                                                     const fe::Model& model,
                                                     const Eigen::VectorXd& u, double about);

// The same in two steps: the cut depends on the mesh only (which elements
// form the body, the nodes it shares with the rest), the resultant on the
// displacements, so a line's cut serves every load case.
struct FreeBodyCut {
    bool weld = false;
    std::vector<int> elements;  // those touching a cut node
    std::vector<double> weight; // per element: 1 (weld), ½ body, −½ rest
    std::vector<char> cut;      // per node: shared by the body and the rest
    int body_elements = 0;
    Eigen::Vector2d centre{0, 0}, tangent{0, 0}, normal{0, 0};
};
std::optional<FreeBodyCut> free_body_cut(const SectionLine& line, const fe::Model& model,
                                         double about);

// The pairs of elements that share an edge (by its corner nodes), each pair
// once: the mesh's part of a cut, the same for every line of a model.
struct ElementNeighbours {
    std::vector<std::pair<int, int>> pairs;
};
ElementNeighbours element_neighbours(const fe::Model& model);
std::optional<FreeBodyCut> free_body_cut(const SectionLine& line, const fe::Model& model,
                                         const ElementNeighbours& neighbours, double about);
FreeBodyResultant free_body_resultant(const FreeBodyCut& cut, const fe::Model& model,
                                      const Eigen::VectorXd& u);

} // namespace lapwing::check
