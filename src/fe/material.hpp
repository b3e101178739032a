// Isotropic linear-elastic material in plane stress.
#pragma once

#include "fe/notation.hpp"

namespace lapwing::fe {

struct Material {
    double E = 0;  // Young's modulus, MPa
    double nu = 0; // Poisson's ratio, 0 ≤ ν < 0.5
};

// Plane-stress elasticity in Voigt form (σxx, σyy, τxy) = D (εxx, εyy, γxy):
//   D = E/(1−ν²) [1 ν 0; ν 1 0; 0 0 (1−ν)/2]   (Timoshenko & Goodier 1970, §16;
// written out rather than in Lamé form, whose λ is the plane-strain one).
inline Matrix3 plane_stress_D(const Material& m) {
    const double c = m.E / (1.0 - m.nu * m.nu);
    Matrix3 D;
    D << c, c * m.nu, 0, //
        c * m.nu, c, 0,  //
        0, 0, c * (1.0 - m.nu) / 2.0;
    return D;
}

// D⁻¹ (compliance), for energy norms of stress fields.
inline Matrix3 plane_stress_compliance(const Material& m) {
    Matrix3 C;
    C << 1.0, -m.nu, 0, //
        -m.nu, 1.0, 0,  //
        0, 0, 2.0 * (1.0 + m.nu);
    return C / m.E;
}

} // namespace lapwing::fe
