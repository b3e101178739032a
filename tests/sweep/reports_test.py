"""`lapwing sweep --reports` against single `lapwing check` runs.

Each variant's folder must hold exactly the files a single
`lapwing check --set ... -o DIR --reproducible` of that variant writes, byte
for byte, with one exception: the command line recorded in report.html and
results.json. A sheet written by the sweep records the sweep's command line
and which variant it is (it was not made by a `lapwing check` command, and
traceability must not say it was), so that one value is masked before the
comparison, after checking what it says. The reference is the program's own
check command; the comparison is by the standard library's byte equality.

Then a variant whose folder cannot be written (a file stands where its
folder goes) is recorded in sweep.csv's report column, the other variants'
files and the sweep are still written, and the exit code is 3.

    reports_test.py LAPWING_EXE SOURCE_DIR WORK_DIR
"""
import csv
import filecmp
import json
import os
import re
import shutil
import subprocess
import sys

exe, src, work = (os.path.abspath(a) for a in sys.argv[1:4])
template = os.path.join(src, "templates", "lap-splice.toml")
# Coarse lap splice (as tests/sweep/sweep_fixture.hpp), every output format.
common = ["--set", "mesh.size=30", "--set", "mesh.near_hole_size=12", "--set",
          "mesh.around_hole=8", "--set", 'bolt_group[0].tie="spread"', "--set",
          'bolt_group[1].tie="spread"', "--set", 'report.formats=["html","json","vtu"]',
          "--set", "report.figures=true", "--single-mesh", "--reproducible"]

shutil.rmtree(work, ignore_errors=True)
os.makedirs(work)


def run(args, expect):
    p = subprocess.run([exe] + args, cwd=work, capture_output=True, text=True)
    if p.returncode not in expect:
        sys.exit(f"FAIL: exit {p.returncode} from {' '.join(args)}\n{p.stdout}{p.stderr}")
    return p


def masked_html(path):
    text = open(path, encoding="utf-8").read()
    found = re.findall(r"command line</t[hd]><td><code>(.*?)</code>", text)
    assert len(found) == 1, f"{path}: {len(found)} command-line rows"
    return text.replace(found[0], "COMMAND"), found[0]


def masked_json(path):
    data = json.load(open(path, encoding="utf-8"))
    line = data["run"]["command_line"]
    data["run"]["command_line"] = "COMMAND"
    return data, line


def read_csv(path):
    with open(path, newline="", encoding="utf-8") as f:
        return list(csv.DictReader(f))


# --- every variant's folder equals a single check of it ----------------------
values = ["10", "16", "22"]
run(["sweep", template, "--vary", "t=10:22:6", "-j", "2", "--reports", "-o", "."] + common,
    {0})
names = sorted(os.listdir(os.path.join(work, "variants")))
assert names == ["1_t-10", "2_t-16", "3_t-22"], names
rows = read_csv(os.path.join(work, "sweep.csv"))
assert [r["report"] for r in rows] == ["variants/" + n for n in names], rows
print("ok: one folder per variant, named by number and value, listed in sweep.csv")

for n, (name, t) in enumerate(zip(names, values), start=1):
    single = f"check-{t}"
    run(["check", template, "-o", single, "--set", f"parameters.t={t}"] + common, {0, 1})
    ours = os.path.join(work, "variants", name)
    theirs = os.path.join(work, single)
    files = sorted(os.listdir(ours))
    assert files == sorted(os.listdir(theirs)), (files, os.listdir(theirs))
    assert {"report.html", "results.json", "model.vtu"} <= set(files), files
    assert any(f.endswith(".svg") for f in files), files
    for f in files:
        a, b = os.path.join(ours, f), os.path.join(theirs, f)
        if f == "report.html":
            (ta, la), (tb, lb) = masked_html(a), masked_html(b)
        elif f == "results.json":
            (ta, la), (tb, lb) = masked_json(a), masked_json(b)
        else:
            assert filecmp.cmp(a, b, shallow=False), f"{name}/{f} differs from {single}/{f}"
            continue
        assert ta == tb, f"{name}/{f} differs from {single}/{f} beyond the command line"
        # argv[0] as typed: here the executable's full path.
        assert re.match(r"\S*lapwing sweep ", la) and la.endswith(
            f"[variant {n} of 3: --set parameters.t={t}]"), la
        assert re.match(r"\S*lapwing check ", lb), lb
    print(f"ok: {name}: {len(files)} files equal those of lapwing check --set parameters.t={t}"
          " (the command line aside)")

# --- a variant whose files cannot be written is recorded; the rest go on -----
bad = os.path.join(work, "bad")
os.makedirs(os.path.join(bad, "variants"))
open(os.path.join(bad, "variants", "2_t-16"), "w").write("a file where the folder goes\n")
p = run(["sweep", template, "--vary", "t=10:22:6", "-j", "2", "--reports", "-o", bad] + common,
        {3})
assert "could not be written" in p.stderr, p.stderr
rows = read_csv(os.path.join(bad, "sweep.csv"))
assert [r["built"] for r in rows] == ["yes"] * 3, rows
assert rows[1]["report"].startswith("not written: ") and "2_t-16" in rows[1]["report"], rows[1]
for r, name in ((rows[0], "1_t-10"), (rows[2], "3_t-22")):
    assert r["report"] == "variants/" + name, r
    assert os.path.isfile(os.path.join(bad, "variants", name, "report.html")), name
assert os.path.isfile(os.path.join(bad, "sweep.html"))
print("ok: an unwritable variant folder is recorded, the others and the sweep are written, exit 3")
