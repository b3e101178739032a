#!/bin/sh
# Runs the FE benchmark at every size of docs/benchmarks.md, one process per
# (element kind, size) so each process's peak memory is that case's, and
# writes the raw output to a results folder (default build/bench/results).
# Usage, from the repository root after `cmake --workflow --preset bench`:
#   sh tests/bench/fe/run_all.sh [results-dir] [sizes...]
set -eu
bin=build/bench/tests/bench/fe
out=${1:-build/bench/results}
[ $# -gt 0 ] && shift
sizes=${*:-1e4 1e5 1e6}
mkdir -p "$out"
{
    echo "date: $(date -u +%Y-%m-%dT%H:%M:%SZ)"
    echo "nproc: $(nproc)"
    grep -m1 'model name' /proc/cpuinfo
    grep MemTotal /proc/meminfo
    echo "OPENBLAS_CORETYPE=${OPENBLAS_CORETYPE:-}"
    echo "libblas: $(readlink -f /usr/lib/x86_64-linux-gnu/libblas.so.3 2>/dev/null || echo '?')"
    echo "load: $(cat /proc/loadavg)"
} > "$out/machine.txt"
[ -n "${SKIP_ELEMENTS:-}" ] || "$bin/bench_fe_elements" > "$out/elements.txt"
for dofs in $sizes; do
    for kind in Q4 Q8; do
        # Four repeats (two with the reference CHOLMOD run first, two with it
        # second); at 10^6 three, and without the end-to-end
        # LinearStaticProblem pass (which repeats the stage-by-stage work),
        # to keep the run short on a shared machine.
        extra="--repeats 4"
        [ "$dofs" = 1e6 ] && extra="--repeats 3 --no-problem-path"
        echo "== $kind $dofs ($(date -u +%H:%M:%S), load $(cut -d' ' -f1-3 /proc/loadavg))"
        "$bin/bench_fe_solve" --kind "$kind" --dofs "$dofs" $extra \
            > "$out/solve_${kind}_${dofs}.txt"
        grep '^#' "$out/solve_${kind}_${dofs}.txt"
    done
done
