// Reference data of an element type, computed once: the stiffness quadrature
// rule and the shape functions and derivatives at its points.
#pragma once

#include "fe/quadrature.hpp"
#include "fe/shape_functions.hpp"

namespace lapwing::fe {

template <int n>
struct ReferenceElement {
    static constexpr int n_nodes = n;
    static constexpr int order = n == 4 ? 2 : 3; // Gauss points per direction
    SquareRule rule;
    std::array<ShapeAt<n>, order * order> at_points;

    ReferenceElement() : rule(gauss_square(order)) {
        for (int q = 0; q < rule.n_points; ++q) {
            const auto& p = rule.points[static_cast<size_t>(q)];
            at_points[static_cast<size_t>(q)] = shape<n>(p.xi, p.eta);
        }
    }

    static const ReferenceElement& get() {
        static const ReferenceElement instance;
        return instance;
    }
};

} // namespace lapwing::fe
