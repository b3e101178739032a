// Solving every load case and combination, and turning displacements into
// bolt forces, reactions and equilibrium figures.
#include "analysis/analyse.hpp"

#include "analysis/solution_checks.hpp"
#include "core/error.hpp"
#include "fe/linear_static.hpp"
#include "fe/recovery.hpp"

#include <chrono>
#include <cmath>
#include <fmt/format.h>
#include <functional>
#include <future>
#include <limits>
#include <numbers>
#include <optional>
#include <set>
#include <span>

namespace lapwing::analysis {

namespace {

constexpr int max_contact_iterations = 40;

struct CaseSpec {
    std::string name;
    bool combination = false;
    std::map<std::string, double> factors;
};

double cross(const Eigen::Vector2d& a, const Eigen::Vector2d& b) {
    return a.x() * b.y() - a.y() * b.x();
}

Eigen::Vector2d node_u(const Eigen::VectorXd& u, int node) {
    return {u(fe::dof_ux(node)), u(fe::dof_uy(node))};
}

// Gap along each contact spring: (u_hole − u_bolt) · n; > 0 opens.
double gap(const fe::LinkSpring& s, const Eigen::VectorXd& u) {
    return (node_u(u, s.node_b) - node_u(u, s.node_a)).dot(s.direction);
}

// Everything of a case but its stresses (recover_stresses, once every case
// is solved).
void fill_case(const model::Connection& c, const FeProblem& p, const fe::Model& model,
               const fe::Solution& s, const std::map<std::string, double>& factors,
               CaseResult& out) {
    out.u = s.u;
    out.dof_reactions = s.reactions;
    out.solver_residual = s.relative_residual;

    // Applied loads: forces at nodes and moments on rotation dofs.
    out.applied_force.setZero();
    out.applied_moment = 0;
    for (int n = 0; n < model.n_nodes(); ++n) {
        const Eigen::Vector2d f(s.applied(fe::dof_ux(n)), s.applied(fe::dof_uy(n)));
        out.applied_force += f;
        out.applied_moment += cross(model.nodes[static_cast<size_t>(n)], f);
    }
    for (int r = 0; r < static_cast<int>(model.rotation_nodes.size()); ++r)
        out.applied_moment += s.applied(fe::dof_rotation(model, r));
    out.strain_energy = 0.5 * s.applied.dot(s.u);

    // Bolt forces on the plate.
    out.bolts.clear();
    const std::vector<Eigen::Vector2d> prescribed = prescribed_bolt_forces(c, p, factors);
    for (int i = 0; i < static_cast<int>(p.bolts.size()); ++i) {
        const BoltModel& b = p.bolts[static_cast<size_t>(i)];
        Eigen::Vector2d f(0, 0);
        if (b.prescribed) {
            f = prescribed[static_cast<size_t>(i)];
        } else if (b.first_spring >= 0) {
            const Eigen::Vector2d other =
                b.other_node >= 0 ? node_u(s.u, b.other_node) : Eigen::Vector2d::Zero();
            f = b.stiffness * (other - node_u(s.u, b.plate_node));
        } else {
            for (size_t j = 0; j < b.hole_nodes.size(); ++j) {
                const fe::LinkSpring& spring =
                    model.link_springs[static_cast<size_t>(b.first_contact) + j];
                f -= spring.k * gap(spring, s.u) * spring.direction;
            }
        }
        const double axis_deg = b.member >= 0 ? c.members[static_cast<size_t>(b.member)].angle
                                              : c.bolt_groups[static_cast<size_t>(b.group)].angle;
        const double a = axis_deg * std::numbers::pi / 180.0;
        const double along = f.x() * std::cos(a) + f.y() * std::sin(a);
        const double across = -f.x() * std::sin(a) + f.y() * std::cos(a);
        out.bolts.push_back({i, f, f.norm(), std::atan2(across, along) * 180.0 / std::numbers::pi});
    }

    // Reactions per support, and the equilibrium check.
    out.reactions.assign(p.supports.size(), {});
    Eigen::Vector2d total_force = out.applied_force;
    double total_moment = out.applied_moment;
    for (size_t k = 0; k < p.supports.size(); ++k) {
        const SupportModel& sm = p.supports[k];
        SupportReaction& r = out.reactions[k];
        for (int n : sm.nodes) {
            const Eigen::Vector2d f(s.reactions(fe::dof_ux(n)), s.reactions(fe::dof_uy(n)));
            r.force += f;
            r.moment += cross(model.nodes[static_cast<size_t>(n)] - sm.about, f);
        }
        for (int bi : sm.bolts) {
            const Eigen::Vector2d f = out.bolts[static_cast<size_t>(bi)].force;
            r.force += f;
            r.moment += cross(p.bolts[static_cast<size_t>(bi)].centre - sm.about, f);
        }
        total_force += r.force;
        total_moment += r.moment + cross(sm.about, r.force);
    }
    const double scale = std::hypot(out.applied_force.norm(), out.applied_moment / p.size);
    const double imbalance = std::hypot(total_force.norm(), total_moment / p.size);
    out.equilibrium_residual = scale > 0 ? imbalance / scale : imbalance;
}

// The recovered nodal stresses of every case, then the check that each
// case's numbers are finite: the sampled stresses of all cases in one pass
// over the elements (their strain operators once), and the SPR patch fits,
// which depend on the mesh only, built once.
// With two threads, the second recovers the later half of the cases with
// the same (const) patches.
void recover_stresses(const FeProblem& p, const fe::Model& model, std::vector<CaseResult>& cases,
                      int threads) {
    std::vector<const Eigen::VectorXd*> fields;
    for (const CaseResult& r : cases) fields.push_back(&r.u);
    const std::vector<fe::SampledStresses> samples = fe::spr_samples(model, fields);
    if (!cases.empty()) {
        const fe::SprRecovery spr(model, samples.front());
        const auto recover = [&](size_t from, size_t to) {
            for (size_t k = from; k < to; ++k) {
                std::vector<fe::Stress> nodal = spr.recover(samples[k]);
                nodal.resize(static_cast<size_t>(p.n_plate_nodes));
                cases[k].nodal_stress = std::move(nodal);
            }
        };
        const size_t half = threads > 1 ? cases.size() / 2 : 0;
        std::future<void> later;
        if (half > 0) later = std::async(std::launch::async, recover, half, cases.size());
        recover(0, half > 0 ? half : cases.size());
        if (later.valid()) later.get();
    }
    for (const CaseResult& r : cases) check_finite(r);
}

// Rewords the FE core's restraint messages for a connection.
[[noreturn]] void rethrow_in_connection_terms(const model::Connection& c, const FeProblem& p,
                                              const AnalysisError& e) {
    const std::string what = e.what();
    if (what.find("not restrained") != std::string::npos) {
        int n_support_bolts = 0, n_other = 0;
        Eigen::Vector2d at(0, 0);
        for (const SupportModel& sm : p.supports) {
            n_support_bolts += static_cast<int>(sm.bolts.size());
            n_other += static_cast<int>(sm.nodes.size());
            for (int b : sm.bolts) at = p.bolts[static_cast<size_t>(b)].centre;
        }
        if (c.supports.empty())
            throw AnalysisError(
                "the plate has no supports: add a welded edge, a bolt group fixed to a support, or "
                "symmetry lines ([[support]])");
        if (n_support_bolts == 1 && n_other == 0)
            throw AnalysisError(fmt::format(
                "the plate can rotate about the single support bolt at ({:.1f}, {:.1f}): "
                "fix more bolts or an edge ({})",
                at.x(), at.y(), what));
        throw AnalysisError("the supports do not hold the plate: " + what);
    }
    if (what.find("singular") != std::string::npos) {
        // A given spring many orders stiffer than the plate makes the
        // factorization fail in round-off: say so rather than "mechanism".
        const double plate = c.material.E * c.plate.thickness; // N/mm, in-plane scale
        for (const model::BoltGroup& g : c.bolt_groups)
            if (g.stiffness == model::StiffnessKind::given && g.spring > 1e6 * plate)
                throw AnalysisError(fmt::format(
                    "the stiffness matrix is singular in working precision: the spring of bolt "
                    "group \"{}\" ({:.3g} N/mm) is {:.1e} times the plate's in-plane stiffness "
                    "E·t, which leaves the system too ill-conditioned to solve; use "
                    "stiffness = \"formula\" or \"rigid\", or a spring nearer the plate's",
                    g.name, g.spring, g.spring / plate));
    }
    throw AnalysisError(what);
}

// The FE core's solve, with the load cases named when it fails (a solution
// that is not finite).
template <class Solve>
auto named(const std::vector<CaseSpec>& specs, const std::vector<size_t>& case_of, Solve solve) {
    try {
        return solve();
    } catch (const AnalysisError& e) {
        std::string names;
        for (size_t i : case_of) names += (names.empty() ? "\"" : ", \"") + specs[i].name + "\"";
        throw AnalysisError(fmt::format(
            "{} {}: {}", case_of.size() == 1 ? "load case" : "load cases", names, e.what()));
    }
}

std::vector<fe::Solution> solve_named(const fe::LinearStaticProblem& solver,
                                      std::span<const fe::Loads> loads,
                                      const std::vector<CaseSpec>& specs,
                                      const std::vector<size_t>& case_of) {
    return named(specs, case_of, [&] { return solver.solve(loads); });
}

// The order to solve contact cases in: each next the remaining case whose
// applied forces are most nearly parallel to the last one's (cosine of the
// angle between the force vectors), starting with the first. Cases with
// nearly proportional loads settle on nearly the same contact set, and each
// case starts from the previous one's set, so this keeps the changes of set
// (and the factor modifications or refactorizations they cost) small. The
// settled solution of a case does not depend on where its iteration starts.
std::vector<size_t> similar_first_order(const fe::Model& model,
                                        const std::vector<fe::Loads>& loads) {
    std::vector<Eigen::VectorXd> f;
    for (const fe::Loads& l : loads) {
        f.push_back(fe::applied_forces(model, l));
        const double norm = f.back().norm();
        if (norm > 0) f.back() /= norm;
    }
    std::vector<size_t> order;
    std::vector<bool> done(loads.size(), false);
    for (size_t next = 0; order.size() < loads.size();) {
        order.push_back(next);
        done[next] = true;
        double best = -2;
        for (size_t j = 0; j < loads.size(); ++j)
            if (!done[j] && f[order.back()].dot(f[j]) > best)
                best = f[order.back()].dot(f[j]), next = j;
    }
    return order;
}

// Where to split the order of contact cases into two chains, one per
// thread: before the case whose start set (seed) differs most from the one
// before it, the nearer the middle among equals, so that the largest change
// of set becomes the second chain's start instead of a factor modification
// on the way. The order's size (no split) when a case has no seed.
size_t chain_split(const std::vector<size_t>& order,
                   const std::function<std::vector<bool>(size_t)>& seed_of) {
    std::vector<std::vector<bool>> seeds;
    for (const size_t i : order) {
        seeds.push_back(seed_of(i));
        if (seeds.back().empty()) return order.size();
    }
    size_t split = order.size(), most = 0;
    double off_middle = 0;
    for (size_t k = 1; k < order.size(); ++k) {
        size_t changed = 0;
        for (size_t j = 0; j < seeds[k].size() && j < seeds[k - 1].size(); ++j)
            changed += seeds[k][j] != seeds[k - 1][j];
        const double off =
            std::abs(static_cast<double>(k) - 0.5 * static_cast<double>(order.size()));
        if (split == order.size() || changed > most || (changed == most && off < off_middle))
            split = k, most = changed, off_middle = off;
    }
    return split;
}

} // namespace

Results analyse(const model::Connection& c, const mesh::Mesh& mesh, const PlateLayout& layout) {
    return analyse(c, mesh, layout, nullptr);
}

Results analyse(const model::Connection& c, const mesh::Mesh& mesh, const PlateLayout& layout,
                SolverReuse* reuse) {
    return analyse(c, mesh, layout, reuse, nullptr);
}

Results analyse(const model::Connection& c, const mesh::Mesh& mesh, const PlateLayout& layout,
                SolverReuse* reuse, const ContactHooks* hooks) {
    const auto start = std::chrono::steady_clock::now();
    Results results;
    results.problem = build_fe_problem(c, mesh, layout);
    const FeProblem& p = results.problem;

    std::vector<CaseSpec> specs;
    for (const model::LoadCase& lc : c.load_cases)
        specs.push_back({lc.name, false, {{lc.name, 1.0}}});
    for (const model::Combination& comb : c.combinations)
        specs.push_back({comb.name, true, comb.factors});

    fe::Model working = p.model;
    // Contact: the cases' loads and the order to solve them in, and each
    // case's seeded start set (empty without one). The first case's is
    // fetched once the pattern and the ordering are made (the seed may come
    // from an analysis still running on another thread), so that the first
    // factorization is made with the first case's start.
    std::vector<fe::Loads> case_loads;
    std::vector<size_t> contact_order;
    std::vector<double> k0(working.link_springs.size());
    for (size_t j = 0; j < k0.size(); ++j) k0[j] = working.link_springs[j].k;
    // The seeds mapped onto this mesh, by case (empty: none).
    std::vector<std::vector<bool>> mapped(specs.size());
    const auto seeded_start = [&](size_t i) {
        if (hooks && hooks->seed_for && mapped[i].empty())
            if (const std::optional<ContactSeed> seed = hooks->seed_for(i))
                mapped[i] = seeded_active_set(p, *seed);
        return mapped[i];
    };
    std::vector<bool> first_start;
    if (p.has_contact) {
        for (const CaseSpec& spec : specs)
            case_loads.push_back(loads_for(c, mesh, p, spec.factors));
        contact_order = similar_first_order(working, case_loads);
    }
    bool seed_first = p.has_contact; // until the first start set is fetched
    const std::function<void()> start_first = [&] {
        if (!seed_first) return;
        seed_first = false;
        first_start = seeded_start(contact_order.front());
        for (size_t j = 0; j < k0.size() && !first_start.empty(); ++j)
            working.link_springs[j].k = first_start[j] ? k0[j] : 0.0;
    };
    std::optional<fe::LinearStaticProblem> own_solver;
    fe::LinearStaticProblem* solver = nullptr;
    const auto make_solver = [&] {
        solver =
            reuse ? &reuse->problem_for(working, p.constraints, start_first)
                  : &own_solver.emplace(working, p.constraints, fe::SolverOptions{}, start_first);
    };
    try {
        try {
            make_solver();
        } catch (const AnalysisError&) {
            // A seeded set that leaves the plate loose: start as without one,
            // all hole nodes in contact, whose messages are the usual ones.
            if (first_start.empty()) throw;
            own_solver.reset();
            first_start.clear();
            working.link_springs = p.model.link_springs;
            make_solver();
        }
    } catch (const AnalysisError& e) {
        rethrow_in_connection_terms(c, p, e);
    }
    results.cases.resize(specs.size());
    double rcond = solver->stats().factor.rcond;
    if (!p.has_contact) {
        // Linear: one factorization; combinations are factored sums.
        std::vector<fe::Loads> loads;
        std::vector<size_t> case_of;
        for (size_t i = 0; i < specs.size(); ++i)
            if (!specs[i].combination) {
                loads.push_back(loads_for(c, mesh, p, specs[i].factors));
                case_of.push_back(i);
            }
        const auto solutions = solve_named(*solver, loads, specs, case_of);
        std::map<std::string, const fe::Solution*> by_name;
        for (size_t k = 0; k < solutions.size(); ++k)
            by_name[specs[case_of[k]].name] = &solutions[k];
        for (size_t i = 0; i < specs.size(); ++i) {
            CaseResult& out = results.cases[i];
            out.name = specs[i].name;
            out.combination = specs[i].combination;
            fe::Solution s;
            s.u = Eigen::VectorXd::Zero(working.n_dofs());
            s.reactions = s.applied = s.u;
            for (const auto& [name, factor] : specs[i].factors) {
                const auto it = by_name.find(name);
                if (it == by_name.end()) continue;
                s.u += factor * it->second->u;
                s.reactions += factor * it->second->reactions;
                s.applied += factor * it->second->applied;
                s.relative_residual = std::max(s.relative_residual, it->second->relative_residual);
            }
            fill_case(c, p, working, s, specs[i].factors, out);
        }
    } else {
        // Bearing-only contact: each case and combination by its own active
        // set, started from the set the previous case settled on (cases of
        // one connection mostly bear on the same side of the holes). A change
        // of set modifies the factor for the springs that switched rather
        // than factorizing again; the settled set's solution is checked by
        // its residual and solved on a fresh factorization when the modified
        // one has lost accuracy.
        //
        // With seeds from another mesh, the first case starts from its mapped
        // seed. A later case starts from the previous case's settled set on
        // this mesh, changed where the two cases' seeds differ: the mapping
        // of a seed can be off by a node at the edges of a contact arc,
        // which this mesh's own previous set has right.
        //
        // Where the caller has a core to spare (hooks->threads > 1) and every
        // case has a seed, the cases settle as two chains on two threads: the
        // order splits where consecutive cases' seeds differ most, and the
        // second chain starts on a copy of the first factorization, from its
        // first case's seed. Each chain is the same sequence of passes
        // whatever the threads' timing, so the results do not depend on it.
        // `before_change` is called before anything but the chain's first
        // pass (whose set is the one its factor was made with) may change the
        // factor: the later passes' modifications and any refactorization.
        const auto run_chain = [&](std::span<const size_t> chain,
                                   fe::LinearStaticProblem& chain_solver, fe::Model& chain_model,
                                   const std::function<void()>& before_change) {
            bool first_pass = true;
            double chain_rcond = chain_solver.stats().factor.rcond;
            std::vector<bool> start_set(k0.size(), true);
            size_t previous = chain.front();
            for (const size_t i : chain) {
                CaseResult& out = results.cases[i];
                out.name = specs[i].name;
                out.combination = specs[i].combination;
                const fe::Loads& loads = case_loads[i];
                std::vector<bool> active = start_set;
                if (i == chain.front()) {
                    const std::vector<bool>& seed =
                        i == contact_order.front() ? first_start : seeded_start(i);
                    if (!seed.empty()) active = seed;
                } else {
                    const std::vector<bool>& now = seeded_start(i);
                    const std::vector<bool>& before = seeded_start(previous);
                    if (!now.empty() && !before.empty())
                        for (size_t j = 0; j < active.size(); ++j)
                            if (now[j] != before[j]) active[j] = now[j];
                }
                previous = i;
                std::set<std::vector<bool>> seen;
                bool settled = false;
                Eigen::VectorXd unknowns; // of the last pass, on the current factor
                for (int iteration = 1; iteration <= max_contact_iterations; ++iteration) {
                    for (size_t j = 0; j < k0.size(); ++j)
                        chain_model.link_springs[j].k = active[j] ? k0[j] : 0.0;
                    if (!first_pass && before_change) before_change();
                    first_pass = false;
                    try {
                        chain_solver.update_link_springs(chain_model);
                    } catch (const AnalysisError& e) {
                        rethrow_in_connection_terms(c, p, e);
                    }
                    unknowns = chain_solver.unknowns(loads);
                    const Eigen::VectorXd u = chain_solver.dof_map().expand(unknowns);
                    seen.insert(active);
                    const double tol = 1e-9 * std::max(1e-30, u.cwiseAbs().maxCoeff());
                    std::vector<bool> next = active;
                    for (size_t j = 0; j < k0.size(); ++j) {
                        const double g = gap(chain_model.link_springs[j], u);
                        if (active[j] && g > tol) next[j] = false;  // pulling apart: no contact
                        if (!active[j] && g < -tol) next[j] = true; // closing in: contact
                    }
                    out.contact_iterations = iteration;
                    if (next == active) {
                        settled = true;
                        break;
                    }
                    if (seen.count(next))
                        throw AnalysisError(fmt::format(
                            "bearing contact in load case \"{}\" does not settle: the set of "
                            "contacting hole nodes cycles after {} passes; use the spread tie "
                            "for the bolt groups of this case",
                            out.name, iteration));
                    active = std::move(next);
                }
                if (!settled)
                    throw AnalysisError(fmt::format(
                        "bearing contact in load case \"{}\" did not settle in {} passes", out.name,
                        max_contact_iterations));
                // The settled pass solved on the factor of the settled set: its
                // unknowns are the solution, checked by their residual.
                fe::Solution s =
                    named(specs, {i}, [&] { return chain_solver.solution_of(loads, unknowns); });
                if (!(s.relative_residual <= 1e-10)) {
                    if (before_change) before_change();
                    try {
                        chain_solver.refactorize(chain_model);
                    } catch (const AnalysisError& e) {
                        rethrow_in_connection_terms(c, p, e);
                    }
                    s = solve_named(chain_solver, std::span(&loads, 1), specs, {i}).front();
                }
                chain_rcond = std::min(chain_rcond, chain_solver.stats().factor.rcond);
                start_set = active;
                out.contact_closed.assign(active.begin(), active.end());
                if (hooks && hooks->settled) hooks->settled(i, contact_seed(p, active, s.u));
                fill_case(c, p, chain_model, s, specs[i].factors, out);
            }
            return chain_rcond;
        };
        const size_t split = hooks && hooks->threads > 1 ? chain_split(contact_order, seeded_start)
                                                         : contact_order.size();
        const std::span<const size_t> order(contact_order);
        results.contact_chains = 1;
        if (split < order.size()) {
            // The copy is made on the second chain's thread while the first
            // chain's first pass solves on the same factor (both only read
            // it); the first chain changes its factor once the copy exists.
            fe::Model second_working = working;
            std::unique_ptr<fe::LinearStaticProblem> second;
            std::promise<bool> copy_made;
            std::shared_future<bool> copied = copy_made.get_future().share();
            std::future<double> other = std::async(std::launch::async, [&] {
                try {
                    second = solver->copy_for(second_working);
                } catch (...) {
                    copy_made.set_exception(std::current_exception());
                    throw;
                }
                copy_made.set_value(second != nullptr);
                return second ? run_chain(order.subspan(split), *second, second_working, {})
                              : std::numeric_limits<double>::infinity();
            });
            rcond = std::min(
                rcond, run_chain(order.first(split), *solver, working, [&] { copied.wait(); }));
            rcond = std::min(rcond, other.get());
            if (copied.get())
                results.contact_chains = 2;
            else // a back end that cannot copy its factor: one chain after all
                rcond = std::min(rcond, run_chain(order.subspan(split), *solver, working, {}));
        } else {
            rcond = std::min(rcond, run_chain(order, *solver, working, {}));
        }
    }
    recover_stresses(p, working, results.cases, hooks ? hooks->threads : 1);
    check_accuracy(results, rcond);
    results.seconds_solve =
        std::chrono::duration<double>(std::chrono::steady_clock::now() - start).count();
    return results;
}

} // namespace lapwing::analysis
