// Consistent nodal forces of a traction on an element edge:
//   f_a = ∫ N_a(s) t(s) · thickness · |dx/ds| ds
// over the edge's own parameter s ∈ [-1, 1] (Zienkiewicz, Taylor & Zhu 2013,
// §6.6) by 5 Gauss points: exact on straight edges, and on curved quadratic
// edges in the normal/tangential frame (where |dx/ds| cancels against the
// normal); a global-frame traction on a curved edge is integrated to the
// rule's accuracy (|dx/ds| is not polynomial there).
#pragma once

#include "fe/model.hpp"

#include <functional>
#include <utility>
#include <vector>

namespace lapwing::fe {

enum class TractionFrame {
    global,            // (tx, ty) in x, y
    normal_tangential, // (σn, τ): σn along the outward normal (tension positive),
                       // τ along the edge from its start corner to its end corner
};

// A traction on edge `edge` (0..3, from corner e to corner e+1) of element
// `element`, varying linearly from `at_start` to `at_end` (stress units, MPa).
struct EdgeLoad {
    int element = -1;
    int edge = 0;
    TractionFrame frame = TractionFrame::global;
    Vector2 at_start{0, 0};
    Vector2 at_end{0, 0};
};

// (dof, force) pairs of the consistent nodal forces.
std::vector<std::pair<int, double>> edge_load_forces(const Model& model, const EdgeLoad& load);

// A traction given as a function of the point x on the edge and the edge's
// outward unit normal there (MPa), integrated the same way; for loads that
// are not linear along an edge, such as a cosine bearing pressure.
using TractionField = std::function<Vector2(const Vector2& x, const Vector2& outward_normal)>;
std::vector<std::pair<int, double>> edge_traction_forces(const Model& model, int element, int edge,
                                                         const TractionField& traction);

} // namespace lapwing::fe
