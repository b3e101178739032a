#!/bin/sh
# Bench smoke test: builds every benchmark and runs each at its smallest size,
# to prove the harness still builds and runs (no figures are kept).
#   sh tests/bench/smoke.sh            configures and builds the bench preset
#   sh tests/bench/smoke.sh BUILD_DIR  adds the benchmarks to an existing build
#                                      tree (CI: the release tree it has just
#                                      tested, so only the benchmarks compile)
# bench_fe_calculix skips with a message where calculix-ccx is not installed.
set -eu
cd "$(dirname "$0")/../.."
if [ $# -ge 1 ]; then
  build="$1"
  cmake -S . -B "$build" -DLAPWING_BUILD_BENCH=ON > /dev/null
else
  build=build/bench
  cmake --preset bench > /dev/null
fi
cmake --build "$build" -j2 --target bench_fe_solve bench_fe_elements bench_fe_calculix bench_fe_gemm \
    mesh_bench bench_analysis bench_contact_start
bin="$build/tests/bench"
"$bin/fe/bench_fe_solve" --smoke
"$bin/fe/bench_fe_elements" --smoke
"$bin/fe/bench_fe_gemm" --smoke
"$bin/fe/bench_fe_calculix" --smoke --dir "$build/smoke-calculix"
"$bin/mesh/mesh_bench" 1 small
"$bin/analysis/bench_analysis" --smoke
"$bin/analysis/bench_contact_start" --smoke
echo "bench smoke: every benchmark built and ran"
