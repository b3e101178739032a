// Stage-by-stage timing and memory of the lapwing solve path on the plate
// with a hole, against CHOLMOD called directly and Eigen's SimplicialLDLT on
// the same matrix in the same run. One kind and size per process, so the
// process's peak memory belongs to that case; `--smoke` runs a tiny case of
// each kind and checks the three solvers agree.
#include "fe/linear_static.hpp"
#include "fe/recovery.hpp"
#include "fe/restraint_check.hpp"
#include "fe/sparse_cholesky.hpp"
#include "kernels_option.hpp"
#include "measure.hpp"
#include "plate_with_hole.hpp"
#include "reference_cholmod.hpp"

#include <cmath>
#include <cstdlib>
#include <fmt/format.h>
#include <iostream>
#include <map>
#include <memory>
#include <stdexcept>
#include <string>
#include <vector>

namespace lapwing::bench {
namespace {

struct Options {
    bool smoke = false;
    fe::ElementKind kind = fe::ElementKind::Q4;
    long target_dofs = 10000;
    int repeats = 3;
    long eigen_max_dofs = 400000; // above this Eigen's LDLᵀ exceeds ~2 min here
    fe::Ordering ordering = fe::SolverOptions{}.ordering; // lapwing's default
    fe::DenseKernels kernels = fe::SolverOptions{}.dense_kernels;
    bool problem_path = true; // also time LinearStaticProblem end to end
};

// Named figures of one repeat, in the order they were recorded.
class Record {
public:
    void set(const std::string& key, double value) {
        if (!values_.contains(key)) keys_.push_back(key);
        values_[key] = value;
    }
    void stage(const std::string& name, const StageSample& s) {
        set(name + ".s", s.seconds);
        set(name + ".cpu_s", s.cpu_seconds);
        set(name + ".peak_mb", s.peak_mb);
        set(name + ".kept_mb", s.retained_mb);
    }
    double operator[](const std::string& key) const { return values_.at(key); }
    bool has(const std::string& key) const { return values_.contains(key); }
    const std::vector<std::string>& keys() const { return keys_; }

private:
    std::map<std::string, double> values_;
    std::vector<std::string> keys_;
};

fe::ElementKind parse_kind(const std::string& s) {
    if (s == "Q4") return fe::ElementKind::Q4;
    if (s == "Q4i") return fe::ElementKind::Q4i;
    if (s == "Q8") return fe::ElementKind::Q8;
    if (s == "Q9") return fe::ElementKind::Q9;
    throw std::invalid_argument("--kind " + s + ": expected Q4, Q4i, Q8 or Q9");
}

fe::Ordering parse_ordering(const std::string& s) {
    if (s == "amd") return fe::Ordering::amd;
    if (s == "metis") return fe::Ordering::metis;
    if (s == "automatic") return fe::Ordering::automatic;
    if (s == "node-amd") return fe::Ordering::node_amd;
    if (s == "nd") return fe::Ordering::nested_dissection;
    if (s == "node-metis") return fe::Ordering::node_metis;
    if (s == "node-best") return fe::Ordering::node_best;
    if (s == "adaptive") return fe::Ordering::adaptive;
    throw std::invalid_argument(
        "--ordering " + s +
        ": expected adaptive, amd, node-amd, node-metis, node-best, nd, metis or automatic");
}

long parse_count(const std::string& flag, const std::string& s) {
    size_t used = 0;
    double v = 0;
    try {
        v = std::stod(s, &used); // accepts 1e6
    } catch (const std::exception&) {
        used = 0;
    }
    if (used != s.size() || !(v >= 1) || v > 1e9)
        throw std::invalid_argument(flag + " " + s + ": expected a positive count");
    return static_cast<long>(v);
}

Options parse(int argc, char** argv) {
    Options o;
    for (int i = 1; i < argc; ++i) {
        const std::string arg = argv[i];
        auto value = [&]() -> std::string {
            if (i + 1 >= argc) throw std::invalid_argument(arg + ": missing value");
            return argv[++i];
        };
        if (arg == "--smoke")
            o.smoke = true;
        else if (arg == "--kind")
            o.kind = parse_kind(value());
        else if (arg == "--dofs")
            o.target_dofs = parse_count(arg, value());
        else if (arg == "--repeats")
            o.repeats = static_cast<int>(parse_count(arg, value()));
        else if (arg == "--eigen-max-dofs")
            o.eigen_max_dofs = parse_count(arg, value());
        else if (arg == "--no-eigen")
            o.eigen_max_dofs = 0;
        else if (arg == "--ordering")
            o.ordering = parse_ordering(value());
        else if (arg == "--kernels")
            o.kernels = parse_kernels(value());
        else if (arg == "--no-problem-path")
            o.problem_path = false;
        else
            throw std::invalid_argument(
                "unknown argument " + arg +
                " (use --smoke | --kind K --dofs N [--repeats N] "
                "[--ordering adaptive|amd|node-amd|node-metis|node-best|nd|metis|automatic]"
                " [--kernels automatic|eigen|blas] [--eigen-max-dofs N | --no-eigen] "
                "[--no-problem-path])");
    }
    return o;
}

double relative_difference(const Eigen::VectorXd& a, const Eigen::VectorXd& b) {
    return (a - b).norm() / std::max(b.norm(), 1e-300);
}

// One repeat of every stage; returns the reduced solution for cross-checks.
void run_once(const Options& o, const PlateModel& plate, bool reference_first, Record& r) {
    const fe::Model& model = plate.model;
    const double n_elements = static_cast<double>(model.elements.size());

    // --- lapwing, stage by stage (the steps LinearStaticProblem takes) ----
    fe::DofMap map;
    r.stage("dofmap", measure([&] { map = fe::DofMap(model.n_dofs(), plate.constraints); }));
    std::unique_ptr<fe::Assembler> assembler;
    r.stage("pattern", measure([&] { assembler = std::make_unique<fe::Assembler>(model, map); }));
    const fe::SparsePattern& pattern = assembler->pattern();
    std::vector<double> values;
    Eigen::VectorXd prescribed_load;
    r.stage("assembly", measure([&] { assembler->assemble(model, values, prescribed_load); }));
    r.set("assembly.elements_per_s", n_elements / r["assembly.s"]);
    r.stage("restraint_check", measure([&] {
                if (!fe::free_rigid_motions(model, map, plate.constraints, pattern, values).empty())
                    throw std::runtime_error("benchmark model is not restrained");
            }));

    Eigen::VectorXd b;
    r.stage("load", measure([&] {
                b = map.restrict_to_unknowns(fe::applied_forces(model, plate.loads)) +
                    prescribed_load;
            }));
    // --- CHOLMOD directly, default settings, the same matrix ---------------
    // Run before lapwing's factorization in odd repeats and after it in even
    // ones: whichever goes second finds the allocator's heap already grown
    // (glibc raises its mmap threshold after a large free), which favours it.
    Eigen::VectorXd x_reference;
    auto run_reference = [&] {
        ReferenceRun ref;
        r.stage("reference", measure([&] { ref = run_reference_cholmod(pattern, values, b); }));
        r.set("reference.analyse.s", ref.seconds_analyse);
        r.set("reference.factorize.s", ref.seconds_factorize);
        r.set("reference.solve.s", ref.seconds_solve);
        r.set("reference.analyse.cpu_s", ref.cpu_seconds_analyse);
        r.set("reference.factorize.cpu_s", ref.cpu_seconds_factorize);
        r.set("reference.solve.cpu_s", ref.cpu_seconds_solve);
        r.set("reference.nnz_L", ref.nnz_L);
        r.set("reference.flops", ref.flops);
        r.set("reference.metis", ref.ordering == "METIS" ? 1 : 0);
        r.set("reference.supernodal", ref.supernodal ? 1 : 0);
        x_reference = std::move(ref.x);
    };
    r.set("reference.first", reference_first ? 1 : 0);
    if (reference_first) run_reference();

    fe::SolverOptions options;
    options.ordering = o.ordering;
    options.dense_kernels = o.kernels;
    auto cholesky = fe::make_sparse_cholesky(options);
    r.stage("analyse", measure([&] { cholesky->analyse(pattern); }));
    r.stage("factorize", measure([&] { cholesky->factorize(pattern, values); }));
    const fe::FactorStats fs = cholesky->stats();
    std::cout << fmt::format("# lapwing's ordering: {}; dense kernels: {}\n", fs.ordering,
                             fs.kernels);
    r.set("nnz_A", fs.nnz_A);
    r.set("nnz_L", fs.nnz_L);
    r.set("flops", fs.flops);
    r.set("factorize.gflop_per_s", fs.flops / r["factorize.s"] * 1e-9);
    r.set("factorize.gflop_per_cpu_s", fs.flops / r["factorize.cpu_s"] * 1e-9);

    Eigen::VectorXd x;
    r.stage("solve", measure([&] { x = cholesky->solve(b); }));
    Eigen::VectorXd residual;
    r.stage("residual",
            measure([&] { residual = fe::symmetric_multiply(pattern, values, x) - b; }));
    r.set("relative_residual", residual.norm() / b.norm());
    Eigen::VectorXd u;
    r.stage("reactions", measure([&] {
                u = map.expand(x);
                const Eigen::MatrixXd f = assembler->internal_forces(model, u);
                if (!f.allFinite()) throw std::runtime_error("reactions are not finite");
            }));
    cholesky.reset();

    fe::SampledStresses samples;
    std::vector<fe::Stress> spr, averaged;
    r.stage("sample_stresses", measure([&] { samples = fe::spr_samples(model, u); }));
    r.stage("recover_spr", measure([&] { spr = fe::recover_spr(model, samples); }));
    r.stage("recover_by_averaging",
            measure([&] { averaged = fe::recover_by_averaging(model, u); }));
    const auto top = static_cast<size_t>(plate.hole_top_node);
    r.set("Kt_spr", spr[top](0) / PlateWithHole{}.tension);
    r.set("Kt_averaging", averaged[top](0) / PlateWithHole{}.tension);
    samples = {};
    spr = {};
    averaged = {};

    if (!reference_first) run_reference();
    r.set("reference.difference", relative_difference(x_reference, x));
    x_reference = {};

    // --- Eigen SimplicialLDLT, same matrix ----------------------------------
    if (pattern.n <= o.eigen_max_dofs) {
        fe::SolverOptions eigen_options;
        eigen_options.backend = fe::SolverBackend::eigen_ldlt;
        auto ldlt = fe::make_sparse_cholesky(eigen_options);
        Eigen::VectorXd x_eigen;
        r.stage("eigen.analyse", measure([&] { ldlt->analyse(pattern); }));
        r.stage("eigen.factorize", measure([&] { ldlt->factorize(pattern, values); }));
        r.stage("eigen.solve", measure([&] { x_eigen = ldlt->solve(b); }));
        r.set("eigen.nnz_L", ldlt->stats().nnz_L);
        r.set("eigen.difference", relative_difference(x_eigen, x));
    }
    assembler.reset();
    values = {};

    // --- LinearStaticProblem end to end (what a caller pays) ---------------
    if (o.problem_path) {
        std::unique_ptr<fe::LinearStaticProblem> problem;
        r.stage("problem.setup", measure([&] {
                    problem = std::make_unique<fe::LinearStaticProblem>(model, plate.constraints,
                                                                        options);
                }));
        fe::Solution solution;
        r.stage("problem.solve", measure([&] { solution = problem->solve(plate.loads); }));
        r.set("problem.difference", relative_difference(solution.u, u));
    }
}

// Headline figures of one repeat, from its own stage times (ratios taken
// within a repeat, so a slow moment of the shared machine hits both sides).
void derive(Record& r) {
    for (const std::string t : {".s", ".cpu_s"}) {
        r.set("lapwing" + t, r["pattern" + t] + r["assembly" + t] + r["analyse" + t] +
                                 r["factorize" + t] + r["solve" + t]);
        r.set("reference" + t,
              r["reference.analyse" + t] + r["reference.factorize" + t] + r["reference.solve" + t]);
        r.set("ratio.lapwing_over_reference" + t, r["lapwing" + t] / r["reference" + t]);
        r.set("ratio.factorize_over_reference" + t,
              r["factorize" + t] / r["reference.factorize" + t]);
        r.set("ratio.analyse_over_reference" + t, r["analyse" + t] / r["reference.analyse" + t]);
    }
    r.set("spr_total.s", r["sample_stresses.s"] + r["recover_spr.s"]);
    // The measure: lapwing's whole path including SPR stress recovery
    // against the reference's analyse + factorize + solve.
    for (const std::string t : {".s", ".cpu_s"}) {
        r.set("lapwing_with_recovery" + t,
              r["lapwing" + t] + r["sample_stresses" + t] + r["recover_spr" + t]);
        r.set("ratio.with_recovery_over_reference" + t,
              r["lapwing_with_recovery" + t] / r["reference" + t]);
    }
    if (r.has("problem.setup.s")) {
        r.set("problem.s", r["problem.setup.s"] + r["problem.solve.s"]);
        r.set("problem.cpu_s", r["problem.setup.cpu_s"] + r["problem.solve.cpu_s"]);
        r.set("ratio.problem_over_reference.s", r["problem.s"] / r["reference.s"]);
        r.set("ratio.problem_over_reference.cpu_s", r["problem.cpu_s"] / r["reference.cpu_s"]);
    }
    if (r.has("eigen.factorize.s")) {
        r.set("eigen.s", r["eigen.analyse.s"] + r["eigen.factorize.s"] + r["eigen.solve.s"]);
        r.set("eigen.cpu_s",
              r["eigen.analyse.cpu_s"] + r["eigen.factorize.cpu_s"] + r["eigen.solve.cpu_s"]);
        const double cholmod = r["analyse.s"] + r["factorize.s"] + r["solve.s"];
        const double cholmod_cpu = r["analyse.cpu_s"] + r["factorize.cpu_s"] + r["solve.cpu_s"];
        r.set("ratio.cholmod_over_eigen.s", cholmod / r["eigen.s"]);
        r.set("ratio.cholmod_over_eigen.cpu_s", cholmod_cpu / r["eigen.cpu_s"]);
        r.set("ratio.cholmod_over_eigen.factorize.s", r["factorize.s"] / r["eigen.factorize.s"]);
        r.set("ratio.cholmod_over_eigen.factorize.cpu_s",
              r["factorize.cpu_s"] / r["eigen.factorize.cpu_s"]);
    }
}

struct CaseResult {
    std::vector<Record> repeats;
    double median(const std::string& key) const {
        std::vector<double> v;
        for (const Record& r : repeats)
            if (r.has(key)) v.push_back(r[key]);
        return v.empty() ? std::nan("") : bench::median(v);
    }
};

CaseResult run_case(const Options& o, fe::ElementKind kind, long target_dofs, int repeats) {
    PlateModel plate;
    const StageSample generation =
        measure([&] { plate = make_plate_with_hole(kind, target_dofs); });
    const std::string label = fmt::format("{} m={}", fe::name(kind), plate.mesh_scale);
    std::cout << fmt::format("# {}: {} elements, {} nodes, {} dofs; model built in {}\n", label,
                             plate.model.elements.size(), plate.model.n_nodes(),
                             plate.model.n_dofs(), format_seconds(generation.seconds))
              << std::flush;
    CaseResult out;
    for (int k = 0; k < repeats; ++k) {
        Record r;
        r.set("dofs", plate.model.n_dofs());
        r.set("elements", static_cast<double>(plate.model.elements.size()));
        r.set("model.s", generation.seconds);
        run_once(o, plate, k % 2 == 1, r);
        derive(r);
        r.set("peak_rss_mb", lifetime_peak_rss_mb());
        std::cout << fmt::format(
                         "# repeat {}: lapwing {} (CPU {}) | reference CHOLMOD {} (CPU {}) | "
                         "ratio {:.3f} (CPU {:.3f}); with SPR recovery CPU {:.3f}\n",
                         k + 1, format_seconds(r["lapwing.s"]), format_seconds(r["lapwing.cpu_s"]),
                         format_seconds(r["reference.s"]), format_seconds(r["reference.cpu_s"]),
                         r["ratio.lapwing_over_reference.s"],
                         r["ratio.lapwing_over_reference.cpu_s"],
                         r["ratio.with_recovery_over_reference.cpu_s"])
                  << std::flush;
        out.repeats.push_back(std::move(r));
    }
    // Medians, one line per figure: "result <kind> <dofs> <key> <median> <n>".
    for (const std::string& key : out.repeats.front().keys())
        std::cout << fmt::format("result\t{}\t{}\t{}\t{:.6g}\t{}\n", fe::name(kind),
                                 plate.model.n_dofs(), key, out.median(key), repeats);
    // The order-balanced ratios: the geometric mean of the median ratio with
    // the reference run first and with it second, which cancels the
    // advantage of going second (the same factor either way).
    for (const std::string key :
         {"ratio.lapwing_over_reference.s", "ratio.lapwing_over_reference.cpu_s",
          "ratio.with_recovery_over_reference.cpu_s", "ratio.factorize_over_reference.s",
          "ratio.factorize_over_reference.cpu_s", "ratio.analyse_over_reference.cpu_s"}) {
        std::vector<double> first, second;
        for (const Record& r : out.repeats)
            (r["reference.first"] == 1 ? first : second).push_back(r[key]);
        if (first.empty() || second.empty()) continue;
        std::cout << fmt::format("result\t{}\t{}\t{}.balanced\t{:.6g}\t{}\n", fe::name(kind),
                                 plate.model.n_dofs(), key,
                                 std::sqrt(bench::median(first) * bench::median(second)), repeats);
    }
    return out;
}

// The smoke test: a tiny case of each kind; the three solvers must agree.
int smoke(const Options& o) {
    int failures = 0;
    for (fe::ElementKind kind : {fe::ElementKind::Q4, fe::ElementKind::Q8}) {
        const CaseResult c = run_case(o, kind, 2000, 1);
        const Record& r = c.repeats.front();
        // Round-off bounds for a well-conditioned system of ~2000 unknowns.
        const bool ok = r["relative_residual"] < 1e-10 && r["reference.difference"] < 1e-8 &&
                        r["eigen.difference"] < 1e-8 && r["problem.difference"] < 1e-8;
        if (!ok) {
            std::cerr << fmt::format("smoke {}: solvers disagree (residual {:.2g}, reference "
                                     "{:.2g}, Eigen {:.2g}, problem {:.2g})\n",
                                     fe::name(kind), r["relative_residual"],
                                     r["reference.difference"], r["eigen.difference"],
                                     r["problem.difference"]);
            ++failures;
        }
    }
    std::cout << (failures == 0 ? "smoke: ok\n" : "smoke: FAILED\n");
    return failures == 0 ? 0 : 1;
}

} // namespace
} // namespace lapwing::bench

int main(int argc, char** argv) {
    using namespace lapwing::bench;
    Options o;
    try {
        o = parse(argc, argv);
    } catch (const std::invalid_argument& e) {
        std::cerr << "bench_fe_solve: " << e.what() << "\n";
        return 2;
    }
    try {
        if (o.smoke) return smoke(o);
        run_case(o, o.kind, o.target_dofs, o.repeats);
        return 0;
    } catch (const std::exception& e) {
        std::cerr << "bench_fe_solve: " << e.what() << "\n";
        return 2;
    }
}
