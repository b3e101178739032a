// The finite-value, conditioning and residual checks of a solution.
#include "analysis/solution_checks.hpp"

#include "core/error.hpp"

#include <algorithm>
#include <cmath>
#include <fmt/format.h>

namespace lapwing::analysis {

namespace {

std::string case_words(const CaseResult& r) {
    return fmt::format("{} \"{}\"", r.combination ? "combination" : "load case", r.name);
}

} // namespace

void check_finite(const CaseResult& r) {
    const char* what = nullptr;
    if (!r.u.allFinite())
        what = "displacements";
    else if (!std::all_of(r.nodal_stress.begin(), r.nodal_stress.end(),
                          [](const fe::Stress& s) { return s.allFinite(); }))
        what = "stresses";
    else if (!std::all_of(r.bolts.begin(), r.bolts.end(), [](const BoltForce& b) {
                 return b.force.allFinite() && std::isfinite(b.magnitude);
             }))
        what = "bolt forces";
    else if (!std::all_of(r.reactions.begin(), r.reactions.end(), [](const SupportReaction& s) {
                 return s.force.allFinite() && std::isfinite(s.moment);
             }))
        what = "support reactions";
    else if (!r.applied_force.allFinite() || !std::isfinite(r.applied_moment))
        what = "applied loads";
    if (what)
        throw AnalysisError(fmt::format(
            "{}: the {} contain values that are not finite numbers (NaN or infinity); the "
            "loads or stiffnesses are out of range or the model is singular, so no result is "
            "reported",
            case_words(r), what));
}

void check_accuracy(Results& results, double rcond) {
    results.reciprocal_condition = rcond;
    if (!(rcond >= rcond_error))
        throw AnalysisError(fmt::format(
            "the stiffness matrix is too ill-conditioned to trust (reciprocal condition estimate "
            "{:.2g}, below {:.0e}): stiffnesses far out of proportion, e.g. a bolt spring many "
            "orders stiffer than the plate, or a sliver element; use the formula or a smaller "
            "spring, or a coarser mesh there",
            rcond, rcond_error));
    if (rcond < rcond_warning)
        results.warnings.push_back(fmt::format(
            "the stiffness matrix is ill-conditioned (reciprocal condition estimate {:.2g}, below "
            "{:.0e}): check for stiffnesses far out of proportion (a bolt spring much stiffer "
            "than the plate, a sliver element); the results may carry round-off",
            rcond, rcond_warning));
    for (const CaseResult& r : results.cases) {
        if (!(r.solver_residual <= residual_error))
            throw AnalysisError(fmt::format(
                "{}: the solve does not satisfy the equations (relative residual {:.2g}, above "
                "{:.0e}); the model is too ill-conditioned to trust",
                case_words(r), r.solver_residual, residual_error));
        if (r.solver_residual > residual_warning)
            results.warnings.push_back(fmt::format(
                "{}: relative residual of the solve {:.2g}, above {:.0e}: the results may carry "
                "round-off",
                case_words(r), r.solver_residual, residual_warning));
    }
}

} // namespace lapwing::analysis
