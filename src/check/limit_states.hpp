// The classical plate limit states as pure formulas (DESIGN: Checks): block
// shear, bolt bearing and tear-out, Whitmore yielding and buckling, gross
// and net section capacities. Each returns the design capacity, the
// published form it follows and the formula with the numbers substituted,
// in internal units (N, mm, MPa), so a reviewer can redo it by hand. Where
// the trade uses two published forms (AISC 360-16 and EN 1993-1-8), both
// are here: the user's `style` picks the one a check row uses, the other is
// shown beside it for information (TwoForms). Derivations and the choices
// made are in docs/checks.md ("Classical limit states").
#pragma once

#include "model/connection.hpp"

#include <limits>
#include <string>
#include <vector>

namespace lapwing::check {

struct Capacity {
    double value = 0;    // design capacity: N (forces) unless the function says otherwise
    std::string method;  // the published form, e.g. "AISC 360-16 §J4.3 form"
    std::string formula; // the formula with its numbers, N·mm·MPa
};

// The form the user chose (`style`) and the other published form.
struct TwoForms {
    Capacity chosen;
    Capacity other;
};

inline constexpr double no_distance = std::numeric_limits<double>::infinity();

// ---------------------------------------------------------------- block shear

// Areas of one block shear path, mm² (see block_shear_paths.hpp for how a
// path's lengths and hole deductions become these).
struct BlockShearAreas {
    double Agv = 0; // gross area in shear
    double Anv = 0; // net area in shear
    double Agt = 0; // gross area in tension
    double Ant = 0; // net area in tension
};

// AISC 360-16 §J4.3 (Eq. J4-5): Rn = 0.60 Fu Anv + Ubs Fu Ant
// ≤ 0.60 Fy Agv + Ubs Fu Ant; design value φ Rn.
Capacity block_shear_aisc(const BlockShearAreas& a, double Fy, double Fu, double Ubs, double phi);

// EN 1993-1-8 §3.10.2 (Eq. 3.9 / 3.10): Veff = k fu Ant / γM2
// + fy Anv / (√3 γM0), k = 1.0 for a concentric, 0.5 for an eccentric load.
Capacity block_shear_en(const BlockShearAreas& a, double fy, double fu, double tension_factor,
                        double gamma_M0, double gamma_M2);

// Both forms for one path. The tension factor (Ubs, or EN's 1.0 / 0.5) is
// min(user's Ubs, 1.0 for uniform tension stress on the path, 0.5 for
// non-uniform): the user's value can only lower it. `aisc` and `en` are the
// path's areas with each form's hole deduction (AISC adds 1/16 in to the
// hole, EN uses d0).
TwoForms block_shear_forms(const BlockShearAreas& aisc, const BlockShearAreas& en,
                           bool uniform_tension, const model::Material& material,
                           const model::BlockShearAllowable& allowable);

// ------------------------------------------------------ bolt bearing, tear-out

// Geometry of one bolt seen along its force (EN 1993-1-8 Table 3.4
// notation), mm. Distances the geometry does not have are no_distance
// (an inner bolt has no e1, a bolt with no neighbour across has no p2).
struct BoltClearances {
    double d = 0;            // nominal bolt diameter
    double d0 = 0;           // hole diameter (a slot's width)
    double lc = 0;           // clear distance, hole edge to the next hole or edge, along the force
    double e1 = no_distance; // hole centre to the edge ahead, along the force (an end bolt)
    double p1 = no_distance; // hole centre to the next hole centre ahead, along the force
    double e2 = no_distance; // hole centre to the nearest edge across the force (an edge bolt)
    double p2 = no_distance; // hole centre to the nearest hole centre across the force
    std::string ahead;       // what lc ends at, e.g. "outline.edge[1]", "holes[3]"
    // EN 1993-1-8 Table 3.4 footnote (from memory): 0.8 for oversized holes,
    // 0.6 for a slot whose long side lies across the force, else 1.
    double hole_factor = 1.0;
};

// Demand side of a bearing row: the bolt force over the projected area,
// F / (d t), MPa.
double bearing_stress(double force, double d, double t);

// AISC 360-16 §J3.10 (Eq. J3-6a/6c), deformation at the hole a design
// consideration: bearing Rn = 2.4 d t Fu, tear-out Rn = 1.2 lc t Fu; the
// factors are the user's (BearingAllowable::bearing_factor, tearout_factor).
Capacity bearing_aisc(double d, double t, double Fu, double bearing_factor, double phi);
Capacity tearout_aisc(double lc, double t, double Fu, double tearout_factor, double phi);
// The bolt's capacity: the smaller of the two, both shown.
Capacity bearing_tearout_aisc(const BoltClearances& g, double t, double Fu,
                              const model::BearingAllowable& allowable);

// EN 1993-1-8 Table 3.4: Fb,Rd = k1 αb fu d t / γM2 with, from the geometry,
//   αd = e1/(3 d0) for an end bolt, p1/(3 d0) − 1/4 for an inner bolt,
//   αb = min(αd, fub/fu, 1.0),
//   k1 = min(2.8 e2/d0 − 1.7, 1.4 p2/d0 − 1.7, 2.5) (the e2 term for edge
//   bolts only, the p2 term only where there is a neighbour across).
// The user's k1 and alpha_b (BearingAllowable) act as upper limits: their
// defaults are the Table 3.4 maxima (2.5, 1.0), so left unset the geometry
// decides. fub ≤ 0 means the bolt grade is not known: the fub/fu term is
// left out and the formula says so.
Capacity bearing_en(const BoltClearances& g, double t, double fu, double fub,
                    const model::BearingAllowable& allowable);

TwoForms bearing_forms(const BoltClearances& g, double t, const model::Material& material,
                       double fub, const model::BearingAllowable& allowable);

// ------------------------------------------------------- Whitmore yielding

// Capacity = user allowable stress × Lw × t (Whitmore 1952 effective width).
Capacity whitmore_yield(const model::Allowable& allowable, double Lw, double t);

// --------------------------------------------- Whitmore buckling (Thornton)

// Thornton (1984): the Whitmore section as a column of length
// L = (L1 + L2 + L3)/3 (lengths from the Whitmore line's centre and ends to
// the supported edge along the member axis), radius of gyration r = t/√12
// (a rectangular strip bending out of plane), Euler stress
// Fe = π² E / (K L / r)².
struct Slenderness {
    double L = 0;         // average length, mm
    double r = 0;         // mm
    double K = 0;         // effective length factor (user; 0.65 by default)
    double KL_over_r = 0; // slenderness
    double Fe = 0;        // elastic buckling stress, MPa
    std::string lengths;  // "L = (L1 + L2 + L3)/3 = (…)/3 = … mm"
};
// `lengths` holds the one to three lengths that reach the support (mm);
// none throws lapwing::AnalysisError. `units` is the system the `lengths`
// text is written in (the values stay in mm and MPa).
Slenderness thornton_slenderness(const std::vector<double>& lengths, double t, double K, double E,
                                 UnitSystem units = UnitSystem::n_mm);

// AISC 360-16 §E3 column curve on the Whitmore area Lw·t:
// Fcr = 0.658^(Fy/Fe) Fy when KL/r ≤ 4.71 √(E/Fy), else 0.877 Fe; φ Fcr Lw t.
Capacity buckling_aisc(const Slenderness& s, double Fy, double E, double Lw, double t, double phi);

// EN 1993-1-1 §6.3.1.2 buckling curve c (α = 0.49, the curve for solid
// plates and sections, Table 6.2): λ̄ = √(fy/Fe), Φ = 0.5[1 + α(λ̄ − 0.2) + λ̄²],
// χ = 1/(Φ + √(Φ² − λ̄²)) ≤ 1, Nb,Rd = χ Lw t fy / γM1.
Capacity buckling_en(const Slenderness& s, double fy, double Lw, double t, double gamma_M1);

// The chosen form follows the block shear style (WhitmoreBuckling has no
// style of its own): factor → AISC §E3 with its resistance factor, partial
// → EN curve c with gamma_M1 (the model has no field for it; EN 1993-1-1
// §6.1 recommends 1.00).
TwoForms buckling_forms(const Slenderness& s, const model::Material& material, double Lw, double t,
                        const model::WhitmoreBuckling& buckling,
                        model::BlockShearAllowable::Style style, double gamma_M1 = 1.0);

// --------------------------------------------------- gross and net sections

// Capacity = user allowable stress × area (material length × t), e.g. gross
// or net section tension or shear across a section line; `what` names it
// ("net section tension").
Capacity section_capacity(const model::Allowable& allowable, const std::string& what, double length,
                          double t);

} // namespace lapwing::check
