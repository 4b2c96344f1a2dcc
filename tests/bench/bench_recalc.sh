#!/usr/bin/env bash
# SPDX-License-Identifier: MPL-2.0
# isentra-recalc speed (prints figures; not a test): 100 small one-sheet
# workbooks (10 test points, 40 formula cells with Isentra calls, invented
# Harrow Fen readings), written by Calc itself (the tool's recalculated
# copies, so they carry stored results as real files do), then recalculated
# with -j 1 and -j 2. Prints the office start cost, the per-file time, Calc's
# own recalculation time and the overhead beyond it, and the -j 2 speed-up.
#
#   bash tests/bench/bench_recalc.sh [N_FILES]      (after bash tools/build)
set -euo pipefail
ROOT=$(cd "$(dirname "${BASH_SOURCE[0]}")/../.." && pwd)
BUILD=${ISENTRA_BUILD_DIR:-$ROOT/build}
TOOL=$BUILD/recalc/isentra-recalc
N=${1:-100}
W=$(mktemp -d "${TMPDIR:-/tmp}/isentra-recalc-bench-XXXXXX")
trap 'rm -rf "$W"' EXIT

/usr/bin/python3 - "$W/gen" "$N" "$ROOT/templates" <<'PY'
import os, sys
sys.path.insert(0, sys.argv[3])
import odf_writer as ow
out, n = sys.argv[1], int(sys.argv[2])
os.makedirs(out)
A = ow.ADDIN
for k in range(n):
    grid = {(1, 1): ow.c_text(f"Harrow Fen Unit 2 - test point set {k + 1} (benchmark)"),
            (3, 1): ow.c_text("Point"), (3, 2): ow.c_text("p (MPa)"), (3, 3): ow.c_text("T (C)"),
            (3, 4): ow.c_text("h"), (3, 5): ow.c_text("s"), (3, 6): ow.c_text("v"), (3, 7): ow.c_text("h - h(ref)")}
    for i in range(10):
        r = 4 + i
        grid[(r, 1)] = ow.c_text(f"P{i + 1}")
        grid[(r, 2)] = ow.c_num(round(4.0 + 1.3 * i + 0.01 * k, 4))
        grid[(r, 3)] = ow.c_num(round(420.0 + 11.0 * i + 0.1 * k, 3))
        grid[(r, 4)] = ow.c_formula(f"{A}HPT([.B{r}];[.C{r}])")
        grid[(r, 5)] = ow.c_formula(f"{A}SPT([.B{r}];[.C{r}])")
        grid[(r, 6)] = ow.c_formula(f"{A}VPT([.B{r}];[.C{r}])")
        grid[(r, 7)] = ow.c_formula(f"[.D{r}]-[.D$4]")
    sheet = '<table:table table:name="Test">' + "".join(ow.grid_rows(grid, 13, 7)) + "</table:table>"
    content = ow.content_xml("", sheet)
    ow.write_package(os.path.join(out, f"points-{k + 1:03d}.ods"), ow.MIME_ODS,
                     [("content.xml", content), ("styles.xml", ow.styles_xml()), ("meta.xml", ow.meta_xml("bench", "bench"))])
PY
"$TOOL" -q -j 2 -o "$W/files" "$W/gen" >/dev/null || true   # Calc writes the inputs (stored results)
rm -f "$W/files"/recalc-report.*
files=("$W/files/gen"/*.ods)
one=${files[0]}

# seconds from a report: total, sum per file, sum of Calc's recalculation
figures() {
  /usr/bin/python3 - "$1" <<'PY'
import re, sys, zipfile
x = zipfile.ZipFile(sys.argv[1]).read("content.xml").decode()
t = x.split('table:name="Changes"')[0]
rows = re.findall(r"<table:table-row>(.*?)</table:table-row>", t)
head = re.findall(r"<text:p>(.*?)</text:p>", rows[0])
i, j = head.index("seconds"), head.index("recalculation seconds")
s = c = n = 0
for r in rows[1:]:
    cells = re.findall(r"<table:table-cell[^>]*?(?:/>|>.*?</table:table-cell>)", r)
    if len(cells) <= j: continue
    v = lambda cell: float(re.search(r'office:value="([^"]*)"', cell).group(1))
    s += v(cells[i]); c += v(cells[j]); n += 1
print(n, s, c)
PY
}
run() {  # jobs, input, output -> "wall start files" (seconds; start and files from the tool's time line)
  local t0 t1 line
  t0=$(date +%s.%N)
  line=$("$TOOL" -q -j "$1" -o "$3" "$2" | sed -n 's/^time: \([0-9.]*\) s to start .*, \([0-9.]*\) s for the files$/\1 \2/p')
  t1=$(date +%s.%N)
  echo "$(echo "$t1 - $t0" | bc -l) $line"
}
read -r w_one st_one f_one < <(run 1 "$one" "$W/one")
read -r w_j1 st_j1 f_j1 < <(run 1 "$W/files/gen" "$W/j1")
read -r w_j2 st_j2 f_j2 < <(run 2 "$W/files/gen" "$W/j2")
read -r n1 s1 c1 < <(figures "$W/j1/recalc-report.ods")
/usr/bin/python3 - "$N" "$n1" "$s1" "$c1" "$w_j1" "$st_j1" "$f_j1" "$w_j2" "$st_j2" "$f_j2" <<'PY'
import sys
n, n1 = int(sys.argv[1]), int(sys.argv[2])
s1, c1, w1, st1, f1, w2, st2, f2 = map(float, sys.argv[3:])
print(f"isentra-recalc, {n} one-sheet workbooks (40 formula cells each, 30 Isentra calls), copies written")
print(f"  office start (profile, extension, start, connect): {st1:5.2f} s for one office, {st2:5.2f} s for two in parallel")
print(f"  -j 1: {w1:6.2f} s wall; files {f1:6.2f} s = {f1 / n:5.3f} s per file; in the worker {s1 / n1:5.3f} s per file,")
print(f"        of which Calc's calculateAll {c1 / n1:5.3f} s: overhead beyond the recalculation "
      f"(copy, load, read, store) {(s1 - c1) / n1:5.3f} s per file (target <= 0.5 s)")
print(f"  -j 2: {w2:6.2f} s wall; files {f2:6.2f} s = {f2 / n:5.3f} s per file")
print(f"  throughput -j 2 / -j 1, files: {f1 / f2:4.2f}x (target >= 1.7x); whole run with the start: {w1 / w2:4.2f}x")
PY
