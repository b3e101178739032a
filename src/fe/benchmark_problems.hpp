// Published plane-stress benchmark problems as ready-made solves, shared by
// the verification tests, `lapwing verify` and the benchmarks.
#pragma once

#include "fe/element_kind.hpp"

namespace lapwing::fe {

// Cook's membrane (Cook 1974; set-up as in Zienkiewicz & Taylor, The Finite
// Element Method, vol. 2): the quadrilateral (0,0) (48,44) (48,60) (0,44),
// left edge clamped, a total vertical load 1 spread uniformly on the right
// edge, E = 1, ν = 1/3, t = 1, n × n elements. Returns the vertical
// displacement at the midpoint of the loaded edge, (48, 52); converged
// value 23.96.
double cook_membrane_uy(ElementKind kind, int n);

// MacNeal & Harder (1985) straight cantilever: 6 × 0.2, t = 0.1, E = 1e7,
// ν = 0.3, six rectangular elements in a row, root clamped, a unit tip load
// split equally between the tip nodes (consistently for quadratic
// elements). Returns the tip displacement along the load: 0.1081 for unit
// in-plane shear, 3.0e-5 for unit extension.
enum class TipLoad { shear, extension };
double macneal_harder_cantilever_tip(ElementKind kind, TipLoad load);

} // namespace lapwing::fe
