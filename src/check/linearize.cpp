// Membrane, bending and peak parts of a stress distribution along a piece.
#include "check/linearize.hpp"

#include <algorithm>
#include <cassert>
#include <cmath>

namespace lapwing::check {

Linearized linearize(double length, std::span<const StressSample> samples) {
    assert(length > 0);
    double integral = 0, first_moment = 0;
    for (const StressSample& p : samples) {
        integral += p.weight * p.stress;
        first_moment += p.weight * p.stress * (0.5 * length - p.s);
    }
    Linearized out;
    out.membrane = integral / length;
    out.bending = 6.0 * first_moment / (length * length);
    for (const StressSample& p : samples) {
        const double linear = out.membrane + out.bending * (1.0 - 2.0 * p.s / length);
        out.peak = std::max(out.peak, std::abs(p.stress - linear));
    }
    return out;
}

} // namespace lapwing::check
