#!/usr/bin/env python3
"""Markdown tables for docs/benchmarks.md from the raw output of run_all.sh.

Reads the "result<TAB>kind<TAB>dofs<TAB>key<TAB>median<TAB>runs" lines that
bench_fe_solve and bench_fe_elements print (medians over the repeats) and
prints the tables. Usage: python3 tests/bench/fe/make_tables.py [results-dir]
Optional sibling folders: <results-dir>_eigen (Eigen at sizes above the
default cut-off) and <results-dir>_metis (lapwing with --ordering metis).
"""
import glob
import math
import os
import sys


def load_cases(folder):
    return load(folder)[0] if folder and os.path.isdir(folder) else {}


def load(folder):
    cases = {}
    for path in sorted(glob.glob(os.path.join(folder, "solve_*.txt"))):
        for line in open(path):
            if not line.startswith("result\t"):
                continue
            _, kind, dofs, key, value, runs = line.rstrip("\n").split("\t")
            case = cases.setdefault((kind, int(dofs)), {"runs": int(runs)})
            case[key] = float(value)
    elements = {}
    path = os.path.join(folder, "elements.txt")
    if os.path.exists(path):
        for line in open(path):
            if line.startswith("result\t"):
                _, what, key, value, runs = line.rstrip("\n").split("\t")
                elements.setdefault(what, {})[key] = (float(value), int(runs))
    return cases, elements


def t(x):
    """Seconds, readable."""
    if x != x:
        return "–"
    if x < 1e-3:
        return f"{x * 1e3:.2f} ms"
    if x < 1:
        return f"{x * 1e3:.0f} ms"
    return f"{x:.2f} s"


def mb(x):
    return "–" if x != x else f"{x:,.0f}"


def order(cases):
    """Rows by size class (10^4, 10^5, 10^6), then element kind."""
    return sorted(cases, key=lambda k: (round(math.log10(k[1])), k[0]))


def g(case, key):
    return case.get(key, float("nan"))


def stage_table(cases, suffix, title):
    out = [f"**{title}** (medians of {{runs}} runs per row)", "",
           "| case | dofs | pattern | assembly | analyse (AMD) | factorize | solve | "
           "**lapwing** | CHOLMOD direct | **ratio** | order-balanced ratio | sample + SPR | averaging |",
           "|---|---:|---:|---:|---:|---:|---:|---:|---:|---:|---:|---:|---:|"]
    runs = set()
    for key in order(cases):
        c = cases[key]
        runs.add(c["runs"])
        out.append(
            f"| {key[0]} | {key[1]:,} | {t(g(c, 'pattern' + suffix))} | {t(g(c, 'assembly' + suffix))} "
            f"| {t(g(c, 'analyse' + suffix))} | {t(g(c, 'factorize' + suffix))} "
            f"| {t(g(c, 'solve' + suffix))} | **{t(g(c, 'lapwing' + suffix))}** "
            f"| {t(g(c, 'reference' + suffix))} "
            f"| **{g(c, 'ratio.lapwing_over_reference' + suffix):.2f}** "
            f"| {g(c, 'ratio.lapwing_over_reference' + suffix + '.balanced'):.2f} "
            f"| {t(g(c, 'sample_stresses' + suffix) + g(c, 'recover_spr' + suffix))} "
            f"| {t(g(c, 'recover_by_averaging' + suffix))} |")
    out[0] = out[0].replace("{runs}", "/".join(str(r) for r in sorted(runs)))
    return "\n".join(out)


def reference_table(cases):
    out = ["| case | dofs | nnz(A) | nnz(L) lapwing (AMD) | flops lapwing | GFLOP/s (CPU) "
           "| CHOLMOD default ordering | nnz(L) | flops | analyse | factorize | solve (CPU s) |",
           "|---|---:|---:|---:|---:|---:|---|---:|---:|---:|---:|---:|"]
    for key in order(cases):
        c = cases[key]
        ordering = "METIS" if g(c, "reference.metis") == 1 else "AMD"
        kind = "supernodal" if g(c, "reference.supernodal") == 1 else "simplicial"
        gflops = g(c, "flops") / g(c, "factorize.cpu_s") * 1e-9
        out.append(
            f"| {key[0]} | {key[1]:,} | {g(c, 'nnz_A'):.3g} | {g(c, 'nnz_L'):.3g} "
            f"| {g(c, 'flops'):.3g} | {gflops:.2f} | {ordering}, {kind} "
            f"| {g(c, 'reference.nnz_L'):.3g} | {g(c, 'reference.flops'):.3g} "
            f"| {t(g(c, 'reference.analyse.cpu_s'))} | {t(g(c, 'reference.factorize.cpu_s'))} "
            f"| {t(g(c, 'reference.solve.cpu_s'))} |")
    return "\n".join(out)


def memory_table(cases):
    out = ["| case | dofs | pattern | assembly | analyse | factorize | solve "
           "| CHOLMOD direct | sample + SPR | process peak (ru_maxrss) |",
           "|---|---:|---:|---:|---:|---:|---:|---:|---:|---:|"]
    for key in order(cases):
        c = cases[key]
        out.append(
            f"| {key[0]} | {key[1]:,} | {mb(g(c, 'pattern.peak_mb'))} | {mb(g(c, 'assembly.peak_mb'))} "
            f"| {mb(g(c, 'analyse.peak_mb'))} | {mb(g(c, 'factorize.peak_mb'))} "
            f"| {mb(g(c, 'solve.peak_mb'))} | {mb(g(c, 'reference.peak_mb'))} "
            f"| {mb(max(g(c, 'sample_stresses.peak_mb'), g(c, 'recover_spr.peak_mb')))} "
            f"| {mb(g(c, 'peak_rss_mb'))} |")
    return "\n".join(out)


def eigen_table(cases, extra):
    """Rows from `cases`, or for a case run without Eigen there, the same case
    from `extra` (a run with a higher --eigen-max-dofs): its CHOLMOD and Eigen
    figures come from that one run."""
    cases = {k: (extra[k] if "eigen.factorize.cpu_s" not in c and k in extra else c)
             for k, c in cases.items()}
    out = ["| case | dofs | CHOLMOD analyse + factorize + solve | Eigen analyse | Eigen factorize "
           "| Eigen solve | nnz(L) Eigen / CHOLMOD | **CHOLMOD / Eigen** total (CPU) "
           "| factorize only (CPU) | total (wall) |",
           "|---|---:|---:|---:|---:|---:|---:|---:|---:|---:|"]
    for key in order(cases):
        c = cases[key]
        if "eigen.factorize.cpu_s" not in c:
            out.append(f"| {key[0]} | {key[1]:,} | not run (above the Eigen cut-off) "
                       "| | | | | | | |")
            continue
        cholmod = g(c, "analyse.cpu_s") + g(c, "factorize.cpu_s") + g(c, "solve.cpu_s")
        out.append(
            f"| {key[0]} | {key[1]:,} | {t(cholmod)} | {t(g(c, 'eigen.analyse.cpu_s'))} "
            f"| {t(g(c, 'eigen.factorize.cpu_s'))} | {t(g(c, 'eigen.solve.cpu_s'))} "
            f"| {g(c, 'eigen.nnz_L') / g(c, 'nnz_L'):.3f} "
            f"| **{g(c, 'ratio.cholmod_over_eigen.cpu_s'):.2f}** "
            f"| {g(c, 'ratio.cholmod_over_eigen.factorize.cpu_s'):.2f} "
            f"| {g(c, 'ratio.cholmod_over_eigen.s'):.2f} |")
    return "\n".join(out)


def extra_table(cases):
    out = ["| case | dofs | dof map | restraint check | load vector | residual | reactions "
           "| LinearStaticProblem setup + solve | its ratio to CHOLMOD direct | Kt (SPR) "
           "| Kt (averaging) | rel. difference to CHOLMOD direct |",
           "|---|---:|---:|---:|---:|---:|---:|---:|---:|---:|---:|---:|"]
    for key in order(cases):
        c = cases[key]
        problem = t(g(c, "problem.cpu_s")) if "problem.cpu_s" in c else "not run"
        ratio = (f"{g(c, 'ratio.problem_over_reference.cpu_s'):.2f}"
                 if "problem.cpu_s" in c else "–")
        out.append(
            f"| {key[0]} | {key[1]:,} | {t(g(c, 'dofmap.cpu_s'))} "
            f"| {t(g(c, 'restraint_check.cpu_s'))} | {t(g(c, 'load.cpu_s'))} "
            f"| {t(g(c, 'residual.cpu_s'))} | {t(g(c, 'reactions.cpu_s'))} | {problem} | {ratio} "
            f"| {g(c, 'Kt_spr'):.3f} | {g(c, 'Kt_averaging'):.3f} "
            f"| {g(c, 'reference.difference'):.1e} |")
    return "\n".join(out)


def ordering_table(cases, metis):
    out = ["| case | dofs | lapwing ordering | analyse | factorize | nnz(L) | flops "
           "| lapwing total | CHOLMOD direct (default: AMD, METIS if AMD fills badly) "
           "| ratio (order-balanced) |",
           "|---|---:|---|---:|---:|---:|---:|---:|---:|---:|"]
    for key in order(metis):
        for name, c in (("AMD (default)", cases.get(key)), ("METIS", metis[key])):
            if c is None:
                continue
            out.append(
                f"| {key[0]} | {key[1]:,} | {name} | {t(g(c, 'analyse.cpu_s'))} "
                f"| {t(g(c, 'factorize.cpu_s'))} | {g(c, 'nnz_L'):.3g} | {g(c, 'flops'):.3g} "
                f"| {t(g(c, 'lapwing.cpu_s'))} | {t(g(c, 'reference.cpu_s'))} "
                f"| {g(c, 'ratio.lapwing_over_reference.cpu_s'):.2f} "
                f"({g(c, 'ratio.lapwing_over_reference.cpu_s.balanced'):.2f}) |")
    return "\n".join(out)


def element_table(elements):
    out = ["| routine | elements / CPU-second | elements / wall-second | runs |",
           "|---|---:|---:|---:|"]
    for what, v in elements.items():
        cpu, runs = v.get("elements_per_cpu_s", (float("nan"), 0))
        wall, _ = v.get("elements_per_wall_s", (float("nan"), 0))
        out.append(f"| {what} | {cpu:.3g} | {wall:.3g} | {runs} |")
    return "\n".join(out)


def main():
    folder = sys.argv[1] if len(sys.argv) > 1 else "build/bench/results"
    cases, elements = load(folder)
    eigen = load_cases(folder + "_eigen")
    metis = load_cases(folder + "_metis")
    print(stage_table(cases, ".cpu_s", "CPU seconds"))
    print()
    print(stage_table(cases, ".s", "Wall seconds"))
    print()
    print(reference_table(cases))
    print()
    print(memory_table(cases))
    print()
    print(eigen_table(cases, eigen))
    print()
    print(extra_table(cases))
    print()
    print(element_table(elements))
    if metis:
        print()
        print(ordering_table(cases, metis))


if __name__ == "__main__":
    main()
