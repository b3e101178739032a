// Point location and the inverse map on curved quadratic elements: a point
// mapped forward from known (ξ, η) is found again in the right element.
#include "fe/isoparametric_map.hpp"
#include "fe/point_locator.hpp"
#include "fe/structured_grid.hpp"

#include <cmath>
#include <doctest/doctest.h>
#include <numbers>

using namespace lapwing::fe;

TEST_CASE("every point mapped from an element is located back in it, on a curved Q8 ring") {
    const double pi = std::numbers::pi;
    // s runs clockwise in θ and t outwards in r: counter-clockwise elements.
    const auto ccw = make_structured_grid(ElementKind::Q8, 12, 3, [&](double s, double t) {
        const double r = 10 + 15 * t, th = 0.5 * pi * (1 - s);
        return Vector2(r * std::cos(th), r * std::sin(th));
    });
    const Model m = model_from_grid(ccw, {1.0, 0.3}, 1.0);
    const PointLocator locator(m);
    int found = 0;
    for (int e = 0; e < static_cast<int>(m.elements.size()); ++e) {
        std::array<Vector2, 8> x;
        for (int i = 0; i < 8; ++i) x[i] = m.nodes[static_cast<size_t>(m.elements[e].nodes[i])];
        for (const Vector2& r : {Vector2(0.3, -0.4), Vector2(-0.7, 0.6)}) {
            const Vector2 p = map_point(ElementKind::Q8, x, r.x(), r.y());
            const auto at = locator.locate(p);
            REQUIRE(at);
            CHECK(at->element == e);
            CHECK((at->reference - r).norm() < 1e-9);
            ++found;
        }
    }
    CHECK(found == 72);
    CHECK_FALSE(locator.locate(Vector2(0, 0))); // the ring's centre is outside the mesh
    CHECK_FALSE(locator.locate(Vector2(30, 30)));
}
