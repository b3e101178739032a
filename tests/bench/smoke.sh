#!/bin/sh
# Bench smoke test: configures the bench preset, builds every benchmark and
# runs each at its smallest size, to prove the harness still builds and runs
# (no figures are kept). Run from anywhere: sh tests/bench/smoke.sh
# bench_fe_calculix skips with a message where calculix-ccx is not installed.
set -eu
cd "$(dirname "$0")/../.."
cmake --preset bench > /dev/null
cmake --build build/bench -j2 --target bench_fe_solve bench_fe_elements bench_fe_calculix \
    mesh_bench bench_analysis
bin=build/bench/tests/bench
"$bin/fe/bench_fe_solve" --smoke
"$bin/fe/bench_fe_elements" --smoke
"$bin/fe/bench_fe_calculix" --smoke --dir build/bench/smoke-calculix
"$bin/mesh/mesh_bench" 1 small
"$bin/analysis/bench_analysis" --smoke
echo "bench smoke: every benchmark built and ran"
