// Linearization of a stress distribution along one piece of a section line
// into membrane, bending and peak parts (ASME BPVC VIII-2 Annex 5-A form).
#pragma once

#include "check/section.hpp"

#include <span>

namespace lapwing::check {

// One value of the stress along the piece: its position s (0 at the piece's
// start), the stress there, and its quadrature weight (mm; 0 for a point
// used only in the search for the peak).
struct StressSample {
    double s = 0;
    double stress = 0;
    double weight = 0;
};

// Over a piece of length ℓ, with the integrals taken as Σ weight · stress:
//   σm = (1/ℓ) ∫ σ ds
//   σb = (6/ℓ²) ∫ σ (ℓ/2 − s) ds        (the linear part's value at s = 0)
//   peak = max over the samples of |σ − σm − σb (1 − 2s/ℓ)|
// (ASME BPVC VIII-2 Annex 5-A, stress linearization; form from memory). The
// weights must integrate polynomials of the field's degree exactly for σm and
// σb to be exact; the peak is only as good as the sample points.
Linearized linearize(double length, std::span<const StressSample> samples);

} // namespace lapwing::check
