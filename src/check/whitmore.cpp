// Whitmore width from the bolt centres: project on the member axis and its
// normal, take the first row's outer lines and spread 30° each side.
#include "check/whitmore.hpp"

#include <algorithm>
#include <cassert>
#include <cmath>
#include <numbers>

namespace lapwing::check {

WhitmoreLine whitmore_line(const std::vector<Eigen::Vector2d>& bolts, double axis_deg,
                           double row_tolerance) {
    assert(!bolts.empty());
    const double a = axis_deg * std::numbers::pi / 180.0;
    const Eigen::Vector2d along(std::cos(a), std::sin(a));
    const Eigen::Vector2d left(-along.y(), along.x());

    double first = -INFINITY, last = INFINITY;
    for (const Eigen::Vector2d& b : bolts) {
        first = std::max(first, b.dot(along));
        last = std::min(last, b.dot(along));
    }
    // Outer lines of the first row (with a stagger the first row may hold
    // only some of the lines; the spread starts from the bolts actually there).
    double right_most = INFINITY, left_most = -INFINITY;
    for (const Eigen::Vector2d& b : bolts) {
        if (b.dot(along) < first - row_tolerance) continue;
        right_most = std::min(right_most, b.dot(left));
        left_most = std::max(left_most, b.dot(left));
    }
    WhitmoreLine w;
    w.gauge = left_most - right_most;
    w.length = first - last;
    const double spread = w.length * std::tan(std::numbers::pi / 6.0); // 30° each side
    w.width = w.gauge + 2.0 * spread;
    w.centre = last * along + 0.5 * (left_most + right_most) * left;
    w.from = w.centre - 0.5 * w.width * left;
    w.to = w.centre + 0.5 * w.width * left;
    return w;
}

} // namespace lapwing::check
