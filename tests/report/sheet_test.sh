#!/usr/bin/env bash
# End-to-end check of `lapwing check -o`: the calc sheet rendered by headless
# Chromium (screenshot not blank, no console messages, a PDF of a sensible
# page count whose pages, rasterised by poppler, show the contour colours),
# results.json validated by python3-jsonschema against docs/results.schema.json,
# model.vtu read back by python3-meshio, --reproducible twice byte-identical,
# and the input hash equal to coreutils' sha256sum.
#   sheet_test.sh LAPWING_EXE SOURCE_DIR WORK_DIR
# Exit 77 (CTest: skipped) when a tool is missing, unless
# LAPWING_REQUIRE_ALL_TESTS=1 (CI), where a missing tool fails the test.
set -euo pipefail
exe=$1
src=$2
work=$3
here="$src/tests/report"

skip() {
  if [ "${LAPWING_REQUIRE_ALL_TESTS:-0}" = 1 ]; then
    echo "FAIL: $1 (LAPWING_REQUIRE_ALL_TESTS=1)"
    exit 1
  fi
  echo "SKIP: $1"
  exit 77
}

command -v chromium >/dev/null || skip "chromium is not installed (apt-get install chromium)"
command -v pdftoppm >/dev/null && command -v pdfinfo >/dev/null ||
  skip "poppler-utils is not installed (apt-get install poppler-utils)"
# The first python3 on PATH that has Debian's meshio and jsonschema.
python=""
for candidate in $(which -a python3 2>/dev/null); do
  if "$candidate" -c "import meshio, jsonschema, numpy" 2>/dev/null; then
    python=$candidate
    break
  fi
done
[ -n "$python" ] || skip "python3-meshio and python3-jsonschema are not installed"

rm -rf "$work"
mkdir -p "$work"
cd "$work"
# The flange-splice template (kip-in units, Q9 elements) on a coarser mesh,
# with the convergence mesh, writing every format.
input="$src/templates/flange-splice.toml"
cp "$input" input.toml
args=(check input.toml --set mesh.size=1.5 --set mesh.around_hole=8 --set mesh.near_hole_size=0.5
      --set 'report.formats=["html","json","vtu"]' -o out --reproducible)
set +e
"$exe" "${args[@]}" > first.txt
code=$?
set -e
[ "$code" -le 1 ] || { cat first.txt; echo "FAIL: lapwing check exit code $code"; exit 1; }
mv out first
"$exe" "${args[@]}" > second.txt || true
for f in first/*; do
  cmp "$f" "out/$(basename "$f")" || { echo "FAIL: $(basename "$f") differs between two --reproducible runs"; exit 1; }
done
[ "$(ls first | wc -l)" = "$(ls out | wc -l)" ] || { echo "FAIL: different file sets"; exit 1; }
echo "ok: two --reproducible runs give byte-identical files ($(ls out | wc -l) files)"

# A folder holding a foreign file is refused without --force.
touch out/notes.txt
if "$exe" "${args[@]}" > refused.txt 2>&1; then echo "FAIL: foreign file not refused"; exit 1; fi
grep -q "not lapwing outputs (notes.txt)" refused.txt || { cat refused.txt; echo "FAIL: refusal message"; exit 1; }
rm out/notes.txt
echo "ok: a folder with foreign files is refused"

flags=(--headless --no-sandbox --disable-gpu --disable-quic --no-first-run
       --disable-background-networking --disable-component-update --disable-sync
       --disable-dev-shm-usage --enable-logging=stderr --v=0)
browse() { timeout 60 chromium "${flags[@]}" --user-data-dir="$(mktemp -d)" "$@"; }
page="file://$work/out/report.html"
browse --window-size=1000,800 --screenshot="$work/shot.png" "$page" 2> shot.log
browse --no-pdf-header-footer --print-to-pdf="$work/sheet.pdf" "$page" 2> pdf.log
# The console detector must see a console message on a page that makes one.
echo '<!DOCTYPE html><script>console.error("lapwing-probe")</script>' > probe.html
browse --window-size=200,200 --screenshot="$work/probe.png" "file://$work/probe.html" 2> probe.log
pdftoppm -r 40 sheet.pdf pdfpage
pdfinfo sheet.pdf > pdfinfo.txt
sha256sum input.toml > sha256.txt

"$python" "$here/check_outputs.py" "$work" "$src/docs/results.schema.json"
