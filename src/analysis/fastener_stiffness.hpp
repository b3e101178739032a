// Shear stiffness of a bolt between two plies from Huth's fastener
// flexibility (H. Huth 1986, "Influence of fastener flexibility on the
// prediction of load transfer and fatigue life for multiple-row joints",
// ASTM STP 927, pp. 221–250; form as quoted in ../shared/REFERENCES.md, from
// memory):
//   C = ((t1 + t2) / (2d))^a · (b/n) · [1/(t1 E1) + 1/(n t2 E2)
//                                      + 1/(2 t1 E3) + 1/(2 n t2 E3)]
// with a = 2/3, b = 3.0 for bolted metallic joints; n = 1 single shear,
// 2 double shear; E3 the fastener's modulus. k = 1/C.
#pragma once

namespace lapwing::analysis {

struct FastenerPlies {
    double t1 = 0, E1 = 0; // the plate (mm, MPa)
    double t2 = 0, E2 = 0; // the connected ply
    double E3 = 0;         // the fastener
    double d = 0;          // fastener diameter, mm
    int shear_planes = 1;
};

double huth_flexibility(const FastenerPlies& p); // mm/N
double huth_stiffness(const FastenerPlies& p);   // N/mm

} // namespace lapwing::analysis
