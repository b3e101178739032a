"""Reads back a `lapwing check -o` folder with independent tools and checks it.

Called by sheet_test.sh with the work folder (holding out/, shot.png,
sheet.pdf, pdfpage-*.ppm, the Chromium logs, pdfinfo.txt, sha256.txt) and
the schema path. Each check prints "ok: ..." or raises.
"""
import glob
import json
import re
import struct
import sys
import zlib

import jsonschema
import meshio
import numpy as np

work, schema_path = sys.argv[1], sys.argv[2]
out = work + "/out"


def ok(message):
    print("ok: " + message)


# --- results.json against its schema (python3-jsonschema, Draft 7) ---------
results = json.load(open(out + "/results.json"))
schema = json.load(open(schema_path))
jsonschema.Draft7Validator.check_schema(schema)
jsonschema.validate(results, schema)

# --- every key of results.json is documented in docs/results.md -------------
# Names that are the user's data (parameter names, load cases as map keys,
# families as map keys) are values, not keys of the layout.
doc = open(schema_path.replace("results.schema.json", "results.md")).read()
data_maps = {".model.parameters", ".model.combinations[].factors", ".model.members[].forces",
             ".checks.governing_by_family"}
missing = set()


def keys(node, path):
    if isinstance(node, dict):
        for k, v in node.items():
            if path in data_maps:
                keys(v, path + ".*")
                continue
            if "`" + k + "`" not in doc and "`" + k + "[]`" not in doc:
                missing.add(path + "." + k)
            keys(v, path + "." + k)
    elif isinstance(node, list):
        for v in node:
            keys(v, path + "[]")


keys(results, "")
assert not missing, "keys of results.json not in docs/results.md: " + ", ".join(sorted(missing))
ok("every results.json key is documented in docs/results.md")
ok("results.json validates against docs/results.schema.json")

# --- the figures: every case has its own, each listed one is on disk --------
import os
figures = results["figures"]
files = [f["file"] for f in figures]
assert len(files) == len(set(files)), files
assert all(" " not in f for f in files), files
for kind in ("contour", "deformed", "bolt-forces"):
    shown = sorted(f["load_case"] for f in figures if f["kind"] == kind)
    assert shown == sorted(c["name"] for c in results["cases"]), (kind, shown)
for f in figures:
    assert f["file_written"] and os.path.isfile(out + "/" + f["file"]), f["file"]
svgs = sorted(os.path.basename(p) for p in glob.glob(out + "/*.svg"))
assert svgs == sorted(files), (svgs, files)
ok(f"figures: {len(files)} distinct files, contour/deformed/bolt forces for each of "
   f"{len(results['cases'])} cases, each on disk and listed")

# --- input hash against coreutils sha256sum ---------------------------------
expected = open(work + "/sha256.txt").read().split()[0]
assert results["run"]["input_sha256"] == expected, (results["run"]["input_sha256"], expected)
assert results["run"]["date"] == "2000-01-01 00:00:00 UTC"
ok("input SHA-256 equals sha256sum's")

# --- model.vtu through meshio -----------------------------------------------
mesh = meshio.read(out + "/model.vtu")
n_cells = sum(len(block.data) for block in mesh.cells)
assert len(mesh.points) == results["mesh"]["nodes"], (len(mesh.points), results["mesh"]["nodes"])
assert n_cells == results["mesh"]["elements"], (n_cells, results["mesh"]["elements"])
# Q9 is VTK_BIQUADRATIC_QUAD (28), meshio's "quad9".
assert [block.type for block in mesh.cells] == ["quad9"], [b.type for b in mesh.cells]
for case in results["cases"]:
    u = mesh.point_data[case["name"] + "_displacement"]
    assert u.shape == (len(mesh.points), 3)
    largest = float(np.max(np.linalg.norm(u, axis=1)))
    assert abs(largest - case["max_displacement"]) <= 1e-6 * case["max_displacement"], (
        largest, case["max_displacement"])
    assert np.all(u[:, 2] == 0)
    vm = mesh.point_data[case["name"] + "_von_mises"]
    s = mesh.point_data[case["name"] + "_stress"]
    # Plane-stress von Mises from the stored components, independently.
    vm2 = np.sqrt(s[:, 0] ** 2 - s[:, 0] * s[:, 1] + s[:, 1] ** 2 + 3 * s[:, 2] ** 2)
    assert np.allclose(vm, vm2, rtol=1e-6, atol=1e-9)
ok(f"model.vtu: {len(mesh.points)} nodes, {n_cells} quad9 cells, displacements match results.json")

# --- the calc sheet's text ----------------------------------------------------
html = open(out + "/report.html", encoding="utf-8").read()
for phrase in ["engineer of record decides", "local codes and licensed practice govern",
               "Peak stresses are local and mesh dependent", "bolt pretension and slip",
               "Mesh convergence", "ksi", "kip", "SHA-256 of the input file", expected]:
    assert phrase in html, phrase
governing = results["checks"]["governing"]
row = re.search(r'<tr class="governing">(.*?)</tr>', html, re.S)
assert row and governing in row.group(1), governing
assert html.count('<tr class="governing">') == 1
assert "<script" not in html and "src=" not in html
ok("sheet text: cautions, units, hash and the governing row " + governing)


# --- screenshot not blank (PNG decoded here: zlib + the five PNG filters) -----
def read_png(path):
    data = open(path, "rb").read()
    assert data[:8] == b"\x89PNG\r\n\x1a\n"
    pos, idat, header = 8, b"", None
    while pos < len(data):
        length, kind = struct.unpack(">I4s", data[pos:pos + 8])
        chunk = data[pos + 8:pos + 8 + length]
        if kind == b"IHDR":
            header = struct.unpack(">IIBBBBB", chunk)
        elif kind == b"IDAT":
            idat += chunk
        pos += 12 + length
    width, height, depth, colour = header[:4]
    assert depth == 8 and colour in (2, 6), header
    bpp = 3 if colour == 2 else 4
    raw = zlib.decompress(idat)
    stride = width * bpp
    image = np.zeros((height, stride), dtype=np.uint8)
    previous = np.zeros(stride, dtype=np.int32)
    for y in range(height):
        f = raw[y * (stride + 1)]
        line = np.frombuffer(raw, dtype=np.uint8, count=stride, offset=y * (stride + 1) + 1).astype(np.int32)
        if f == 0:
            cur = line
        elif f == 2:
            cur = (line + previous) & 255
        else:
            cur = line.copy()
            for x in range(stride):
                a = cur[x - bpp] if x >= bpp else 0
                b = previous[x]
                c = previous[x - bpp] if x >= bpp else 0
                if f == 1:
                    p = a
                elif f == 3:
                    p = (a + b) >> 1
                else:
                    pa, pb, pc = abs(b - c), abs(a - c), abs(a + b - 2 * c)
                    p = a if pa <= pb and pa <= pc else (b if pb <= pc else c)
                cur[x] = (cur[x] + p) & 255
        image[y] = cur
        previous = cur
    return image.reshape(height, width, bpp)[:, :, :3]


shot = read_png(work + "/shot.png")
dark = np.count_nonzero(shot.sum(axis=2) < 300)
colours = len(np.unique(shot.reshape(-1, 3)[::7], axis=0))
assert dark > 2000 and colours > 20, (dark, colours)
ok(f"screenshot not blank: {dark} dark pixels, {colours}+ colours")

# --- no console messages -------------------------------------------------------
probe = open(work + "/probe.log").read()
assert "CONSOLE" in probe and "lapwing-probe" in probe, "console detector saw nothing on the probe page"
for log in ("shot.log", "pdf.log"):
    lines = [l for l in open(work + "/" + log) if "CONSOLE" in l]
    assert not lines, lines
ok("no console messages (the detector sees the probe page's)")

# --- PDF pages and the contour colours on them -------------------------------
pages = int(re.search(r"Pages:\s+(\d+)", open(work + "/pdfinfo.txt").read()).group(1))
assert 5 <= pages <= 30, pages


def read_ppm(path):
    data = open(path, "rb").read()
    fields = data.split(maxsplit=4)
    assert fields[0] == b"P6"
    w, h = int(fields[1]), int(fields[2])
    return np.frombuffer(fields[4][:w * h * 3], dtype=np.uint8).reshape(h, w, 3).astype(int)


# Viridis' dark purple end (#440154) and its teal middle (#21918c, from memory):
# colours no other part of the sheet uses.
targets = np.array([[0x44, 0x01, 0x54], [0x48, 0x28, 0x78], [0x26, 0x82, 0x8e]])
best = 0
for path in sorted(glob.glob(work + "/pdfpage-*.ppm")):
    img = read_ppm(path).reshape(-1, 1, 3)
    near = np.min(np.abs(img - targets[None, :, :]).sum(axis=2), axis=1) < 30
    best = max(best, int(np.count_nonzero(near)))
assert best > 1500, best
ok(f"PDF: {pages} pages; one page shows the contour ({best} viridis pixels at 40 dpi)")
