#!/usr/bin/env bash
# Builds the fuzz targets with the `fuzz` preset (clang-14, libFuzzer, ASan +
# UBSan) and runs each for SECONDS (default 60). The seed corpus is made at
# run time from templates/ and tests/cases/bad_input (never copied into the
# repository); the dictionary holds every key and table name of the
# templates. New corpus entries stay in BUILD/corpus/TARGET between runs.
# Exit status: 0 when no target crashed, hung or tripped a sanitizer.
#   tests/fuzz/run.sh [SECONDS] [TARGET...]
# LAPWING_FUZZ_BUILD names a build tree that already has the targets configured
# (CI: build/debug-asan, which holds the sanitized test suite too); without it
# the `fuzz` preset (-O2, targets only) is configured in build/fuzz.
# LAPWING_FUZZ_TIMEOUT (default 10 s) is the time one input may take before it
# counts as a hang; raise it on a machine loaded by other work, where a
# template that needs 0.25 s of CPU has taken over 10 s of wall time.
set -euo pipefail
cd "$(dirname "$0")/../.."
seconds="${1:-60}"
shift || true
targets=("$@")
if [ ${#targets[@]} -eq 0 ]; then targets=(fuzz_template fuzz_pipeline); fi

build="${LAPWING_FUZZ_BUILD:-}"
if [ -z "$build" ]; then
  build=build/fuzz
  cmake --preset fuzz >/dev/null
fi
cmake --build "$build" --target "${targets[@]}" -j 2

work="$build/fuzz-run"
mkdir -p "$work/seeds"
rm -f "$work/seeds"/*
for f in templates/*.toml tests/cases/bad_input/*.toml projects/*/*.toml; do
  [ -f "$f" ] && cp "$f" "$work/seeds/$(echo "$f" | tr / _)"
done
# Dictionary: "key =" names and [table] / [[table]] headers of the templates.
{
  grep -ohE '^[[:space:]]*[a-z_]+[[:space:]]*=' templates/*.toml | tr -d ' =' 
  grep -ohE '\b[a-z_]+[[:space:]]*=' templates/*.toml | tr -d ' ='
  grep -ohE '^\[\[?[a-z_.]+\]\]?' templates/*.toml
} | sort -u | sed 's/\\/\\\\/g; s/"/\\"/g; s/.*/"&"/' > "$work/template.dict"

timeout="${LAPWING_FUZZ_TIMEOUT:-10}"
status=0
for t in "${targets[@]}"; do
  mkdir -p "$build/corpus/$t"
  log="$work/$t.log"
  echo "== $t for ${seconds} s"
  # -timeout: an input taking longer counts as a hang; -rss_limit_mb: so
  # does one above 2 GiB. Crash inputs go to BUILD/fuzz-run/.
  if ! "$build/tests/fuzz/$t" "$build/corpus/$t" "$work/seeds" \
      -dict="$work/template.dict" -max_total_time="$seconds" -timeout="$timeout" \
      -rss_limit_mb=2048 -max_len=16384 -print_final_stats=1 \
      -artifact_prefix="$work/$t-" >"$log" 2>&1; then
    status=1
    echo "!! $t failed; see $log"
    grep -E "ERROR|SUMMARY|Test unit written" "$log" | head -20 || true
  fi
  grep -E "stat::number_of_executed_units|stat::peak_rss_mb" "$log" || true
  echo "corpus: $(ls "$build/corpus/$t" | wc -l) files"
done
exit $status
