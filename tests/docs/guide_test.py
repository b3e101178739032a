"""docs/guide.md stays true: every `lapwing ...` command in its shell blocks
runs with the exit code the guide gives it, and every file it links or names
exists (and the committed figures stay small).

    guide_test.py LAPWING_EXE SOURCE_DIR WORK_DIR

Commands run in WORK_DIR, where `projects` and `templates` are links to the
source tree's folders, so outputs never land in the source tree. A command
expects exit code 0 unless its line ends in "# exit N".
"""
import os
import re
import shlex
import shutil
import subprocess
import sys

exe, src, work = sys.argv[1], sys.argv[2], sys.argv[3]
guide_path = os.path.join(src, "docs", "guide.md")
guide = open(guide_path, encoding="utf-8").read()
failures = []


def fail(message):
    failures.append(message)
    print("FAIL: " + message)


# --- every command of every ```sh block ------------------------------------
shutil.rmtree(work, ignore_errors=True)
os.makedirs(work)
for name in ("projects", "templates"):
    os.symlink(os.path.join(src, name), os.path.join(work, name))
# Fences may be indented (a block inside a list item).
blocks = re.findall(r"^[ \t]*```sh\n(.*?)^[ \t]*```", guide, re.S | re.M)
commands = []
for block in blocks:
    for line in block.splitlines():
        line = line.strip()
        if line.startswith("lapwing "):
            commands.append(line)
if len(commands) < 4:
    fail(f"only {len(commands)} lapwing commands found in the guide's sh blocks")
for line in commands:
    expected = 0
    m = re.search(r"#\s*exit\s+(\d+)\s*$", line)
    if m:
        expected = int(m.group(1))
    words = shlex.split(line, comments=True)
    # Standard output redirected in the guide ("> file") is kept in WORK_DIR.
    target = None
    if ">" in words:
        at = words.index(">")
        target = os.path.join(work, words[at + 1])
        words = words[:at]
    run = subprocess.run([exe] + words[1:], cwd=work, capture_output=True, text=True,
                         timeout=600)
    if target:
        open(target, "w").write(run.stdout)
    if run.returncode != expected:
        fail(f"`{line}` exited with {run.returncode}, the guide says {expected}\n"
             f"{run.stdout[-2000:]}{run.stderr[-2000:]}")
    else:
        print(f"ok: `{line}` exits {expected}")

# --- every linked or named file exists ----------------------------------------
docs = os.path.dirname(guide_path)
links = re.findall(r"\]\(([^)#\s]+)", guide)
for link in links:
    if re.match(r"[a-z]+://", link):
        fail(f"the guide links outside the repository: {link}")
        continue
    if not os.path.exists(os.path.join(docs, link)):
        fail(f"linked file {link} does not exist (relative to docs/)")
named = set(re.findall(r"`((?:projects|templates|docs|tests|src)/[^`\s]+)`", guide))
for path in named:
    if not os.path.exists(os.path.join(src, path)):
        fail(f"named file {path} does not exist")
images = [l for l in links if l.endswith((".svg", ".png"))]
if len(images) < 5:
    fail(f"only {len(images)} figures in the guide")
for image in images:
    path = os.path.join(docs, image)
    if os.path.exists(path):
        size = os.path.getsize(path)
        limit = 300_000 if image.endswith(".png") else 250_000
        if size > limit:
            fail(f"{image} is {size} bytes, more than {limit}")
print(f"ok: {len(links)} links and {len(named)} named files checked, {len(images)} figures")
sys.exit(1 if failures else 0)
