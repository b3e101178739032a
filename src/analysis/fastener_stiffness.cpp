// Huth's fastener flexibility for bolted metallic joints.
#include "analysis/fastener_stiffness.hpp"

#include <cmath>

namespace lapwing::analysis {

double huth_flexibility(const FastenerPlies& p) {
    constexpr double a = 2.0 / 3.0, b = 3.0; // bolted metallic joints (Huth 1986)
    const double n = p.shear_planes;
    return std::pow((p.t1 + p.t2) / (2.0 * p.d), a) * (b / n) *
           (1.0 / (p.t1 * p.E1) + 1.0 / (n * p.t2 * p.E2) + 1.0 / (2.0 * p.t1 * p.E3) +
            1.0 / (2.0 * n * p.t2 * p.E3));
}

double huth_stiffness(const FastenerPlies& p) {
    return 1.0 / huth_flexibility(p);
}

} // namespace lapwing::analysis
