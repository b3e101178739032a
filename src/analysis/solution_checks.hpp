// Whether a solution can be trusted: finite numbers everywhere, a
// factorization that is not near-singular, a small residual. Problems short
// of wrong answers become warnings for the calc sheet; past the error
// thresholds the analysis stops with an AnalysisError that names the case.
#pragma once

#include "analysis/results.hpp"

namespace lapwing::analysis {

// CHOLMOD's reciprocal condition estimate, (min diag L / max diag L)² (the
// LDLᵀ fallback gives min/max of D, the same quantity), is cheap and can
// overstate the true 1/κ by orders of magnitude, so the thresholds are
// conservative. In double precision (ε = 2.2e-16) the relative error of the
// solution is bounded by about κ·ε (Higham 2002, Accuracy and Stability of
// Numerical Algorithms, §10.1):
// - below 1e-9, κ·ε may reach 2e-7 even on the estimate: still far more
//   than the three figures a check needs, but a sign of a stiffness far out
//   of proportion (a spring 10⁸ times the plate, a sliver element): warn;
// - below 1e-13, κ·ε reaches 2e-3, the size of the figures the calc sheet
//   prints: stop.
inline constexpr double rcond_warning = 1e-9;
inline constexpr double rcond_error = 1e-13;

// Relative residual ‖K̃ũ − f̃‖ / ‖f̃‖ of the solve. A backward-stable
// Cholesky solve gives about ε·κ-free round-off, 1e-15 to 1e-12 on the
// shipped templates (tests/analysis/templates_test.cpp holds them to 1e-9):
// - above 1e-8 the solve has lost accuracy the model cannot explain: warn;
// - above 1e-4 the solution misses equilibrium by 0.01 % of the applied
//   load, and stresses (derivatives of u) by more: stop.
inline constexpr double residual_warning = 1e-8;
inline constexpr double residual_error = 1e-4;

// Throws AnalysisError naming the case when its displacements, stresses,
// bolt forces or reactions hold a NaN or an infinity.
void check_finite(const CaseResult& result);

// Adds warnings to results.warnings, or throws AnalysisError past the
// error thresholds above, for the smallest reciprocal condition estimate
// of the factorizations (`rcond`) and every case's solver residual.
void check_accuracy(Results& results, double rcond);

} // namespace lapwing::analysis
