#!/usr/bin/env bash
# SPDX-License-Identifier: MPL-2.0
# Benchmark (prints figures; not a test): rows per second of `isentra csv`
# for one H.PT column on a generated 1,000,000-row file of main-steam
# readings (file in the page cache, output to /dev/null, best of 3), beside
# the same rows through python3-iapws (IAPWS97(P=p, T=T).h per state; a
# 20,000-row sample is timed and scaled), and the ratio. Also the
# line-by-line mode on 200,000 calls.
#
#   bash tests/bench/bench_cli_csv.sh            # uses build/cli/isentra (Release: bash tools/build)
#   ISENTRA_BUILD_DIR=... bash tests/bench/bench_cli_csv.sh
#
# Needs /usr/bin/python3 with python3-iapws (Debian package) for the
# comparison; without it only the isentra figures are printed.
set -euo pipefail
ROOT=$(cd "$(dirname "${BASH_SOURCE[0]}")/../.." && pwd)
BUILD=${ISENTRA_BUILD_DIR:-$ROOT/build}
ISENTRA=$BUILD/cli/isentra
if [ ! -x "$ISENTRA" ]; then
  echo "bench_cli_csv: $ISENTRA not found; build first (bash tools/build)" >&2
  exit 1
fi
if grep -q 'CMAKE_BUILD_TYPE:STRING=Release' "$BUILD/CMakeCache.txt" 2>/dev/null; then :; else
  echo "bench_cli_csv: warning: $BUILD is not a Release build; the figures mean little" >&2
fi
WORK=$(mktemp -d /tmp/isentra-bench-XXXXXX)
trap 'rm -rf "$WORK"' EXIT

exec /usr/bin/python3 - "$ISENTRA" "$WORK" <<'EOF'
import os, random, resource, subprocess, sys, time

isentra, work = sys.argv[1], sys.argv[2]
rows = 1_000_000
path = os.path.join(work, "readings.csv")

# Main-steam readings of the (fictional) Harrow Fen unit 2: one a minute,
# 15.5-17.0 MPa, 530-545 degC (IAPWS-IF97 region 2).
random.seed(2026)
with open(path, "w") as f:
    f.write("timestamp,p_ms,T_ms\n")
    for k in range(rows):
        f.write("2026-%02d-%02d %02d:%02d:00,%.3f,%.2f\n" % (
            1 + k // 43200 % 12, 1 + k // 1440 % 28, k // 60 % 24, k % 60,
            random.uniform(15.5, 17.0), random.uniform(530.0, 545.0)))
size = os.path.getsize(path)
with open(path, "rb") as f:  # into the page cache
    while f.read(1 << 22):
        pass

def run_timed(args, stdin=None):
    r0 = resource.getrusage(resource.RUSAGE_CHILDREN)
    t0 = time.perf_counter()
    subprocess.run(args, stdin=stdin, stdout=subprocess.DEVNULL, stderr=subprocess.DEVNULL, check=True)
    wall = time.perf_counter() - t0
    r1 = resource.getrusage(resource.RUSAGE_CHILDREN)
    cpu = (r1.ru_utime - r0.ru_utime) + (r1.ru_stime - r0.ru_stime)
    return wall, cpu

best_wall = best_cpu = float("inf")
for _ in range(3):
    wall, cpu = run_timed([isentra, "csv", "-q", path, "h_ms=STEAM.H.PT(p_ms; T_ms)"])
    best_wall, best_cpu = min(best_wall, wall), min(best_cpu, cpu)
print("isentra csv, one H.PT column, %s rows (%.1f MB, page cache), best of 3:" % (f"{rows:,}", size / 1e6))
print("  wall %.3f s = %s rows/s;  CPU (user+sys) %.3f s = %s rows/s per core" % (
    best_wall, f"{rows / best_wall:,.0f}", best_cpu, f"{rows / best_cpu:,.0f}"))

# Line-by-line mode: the same states as calls.
calls = os.path.join(work, "calls.txt")
n_calls = 200_000
with open(path) as f, open(calls, "w") as out:
    next(f)
    for k, line in enumerate(f):
        if k == n_calls:
            break
        _, p, T = line.rstrip("\n").split(",")
        out.write("H.PT(%s; %s)\n" % (p, T))
best_line = float("inf")
for _ in range(3):
    with open(calls) as fin:
        _, cpu = run_timed([isentra], stdin=fin)
    best_line = min(best_line, cpu)
print("isentra line by line, %s calls H.PT(p; T) from standard input: CPU %.3f s = %.2f us per call" % (
    f"{n_calls:,}", best_line, best_line / n_calls * 1e6))

try:
    from iapws import IAPWS97
    import iapws
except ImportError:
    print("python3-iapws not installed (apt-get install python3-iapws): no comparison")
    sys.exit(0)

sample = 20_000
with open(path) as f:
    next(f)
    lines = [next(f) for _ in range(sample)]
c0 = time.process_time()
t0 = time.perf_counter()
out = []
for line in lines:  # the same work: read the row, compute h, write the row
    stamp, p, T = line.rstrip("\n").split(",")
    h = IAPWS97(P=float(p), T=float(T) + 273.15).h
    out.append("%s,%s,%s,%r\n" % (stamp, p, T, h))
py_wall = time.perf_counter() - t0
py_cpu = time.process_time() - c0
py_rate = sample / py_cpu
try:
    deb = subprocess.run(["dpkg-query", "-W", "-f=${Version}", "python3-iapws"], capture_output=True,
                         text=True).stdout or "?"
except OSError:
    deb = "?"
print("python3-iapws (module %s, Debian package %s), IAPWS97(P=p, T=T+273.15).h per row, a %s-row sample timed:" % (
    iapws.__version__, deb, f"{sample:,}"))
print("  CPU %.3f s = %s rows/s; scaled to %s rows: %.0f s" % (py_cpu, f"{py_rate:,.0f}", f"{rows:,}", rows / py_rate))
print("ratio (rows/s per core, isentra csv / python3-iapws): %s" % f"{(rows / best_cpu) / py_rate:,.0f}")
EOF
