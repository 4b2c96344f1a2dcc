#!/usr/bin/python3
# SPDX-License-Identifier: MPL-2.0
"""Independent oracle for the Isentra ISO 5167 flow-meter functions.

Writes tests/data/flow_oracle.csv (committed, so the C++ tests need no
Python). The discharge coefficients, expansibility factors and flows in it
come from Debian's python3-fluids (module fluids.flow_meter, which implements
ISO 5167-2/-3/-4:2003), run with Debian's /usr/bin/python3. That package is
MIT-licensed; this script only calls it and records the numbers it returns.

"Identical inputs": the fluid properties handed to python3-fluids (density,
viscosity, isentropic exponent at the upstream p, T) are Isentra's own, read
from the built command-line tool (STEAM.RHO.PT, STEAM.MU.PT, STEAM.KAPPA.PT in
core units), and written into the CSV so that the C++ test can check that the
core still gives them. For water, epsilon = 1 (ISO 5167-1: incompressible),
given to python3-fluids as epsilon_specified=1.

Run:  /usr/bin/python3 tests/oracle/gen_flow.py [path/to/isentra] [output.csv]
      (default build/cli/isentra and tests/data/flow_oracle.csv)

Row kinds (column `kind`), then `device` (a text), inputs a0.. and expected
results r0.. in core units (Pa for dp, MPa for p, K, m, kg/s):
  C     a: beta Re_D D                              r: C
  eps   a: beta dp p1 kappa                         r: eps   (device: orifice or nozzle)
  flow  a: dp p T d D rho mu kappa liquid           r: m C eps
Devices: corner, flange, D-D/2, ISA 1932, long radius, venturi nozzle, as cast,
machined, rough welded (the texts the spreadsheet functions accept).
"""

import math
import random
import subprocess
import sys

import fluids
import fluids.flow_meter as fm

EXPECTED_VERSION = "1.0.22"
SEED = 20261204
NA, NR = 9, 3

# device text -> (fluids meter type, taps, D range m, beta range, Re range at beta (lo, hi))
ORIFICE = "ISO 5167 orifice"


def re_orifice(taps):
    def f(beta, D):
        if taps == "flange":
            return max(5000.0, 170.0 * beta * beta * D * 1000.0), 1e8
        return (5000.0 if beta <= 0.56 else 16000.0 * beta * beta), 1e8
    return f


DEVICES = {
    "corner": (ORIFICE, "corner", (0.05, 1.0), (0.1, 0.75), re_orifice("corner")),
    "flange": (ORIFICE, "flange", (0.05, 1.0), (0.1, 0.75), re_orifice("flange")),
    "D-D/2": (ORIFICE, "D and D/2", (0.05, 1.0), (0.1, 0.75), re_orifice("D")),
    "ISA 1932": ("ISA 1932 nozzle", None, (0.05, 0.5), (0.3, 0.8),
                 lambda b, D: ((7e4 if b < 0.44 else 2e4), 1e7)),
    "long radius": ("long radius nozzle", None, (0.05, 0.63), (0.2, 0.8), lambda b, D: (1e4, 1e7)),
    "venturi nozzle": ("venuri nozzle", None, (0.065, 0.5), (0.316, 0.775), lambda b, D: (1.5e5, 2e6)),
    "as cast": ("as cast convergent venturi tube", None, (0.1, 0.8), (0.3, 0.75), lambda b, D: (2e5, 2e6)),
    "machined": ("machined convergent venturi tube", None, (0.05, 0.25), (0.4, 0.75), lambda b, D: (2e5, 1e6)),
    "rough welded": ("rough welded convergent venturi tube", None, (0.2, 1.2), (0.4, 0.7),
                     lambda b, D: (2e5, 2e6)),
}


def r9(x):
    """Inputs rounded to 9 significant digits (then exact in the CSV)."""
    return float("%.9g" % x)


def core_properties(cli, states):
    """rho, mu, kappa, Tsat-or-psat information from Isentra's CLI, in core units."""
    lines = []
    for p, T in states:
        for prop in ("RHO", "MU", "KAPPA"):
            lines.append('STEAM.%s.PT(%r; %r; "K")' % (prop, p, T))
        lines.append('STEAM.REGION.PT(%r; %r; "K")' % (p, T))
    out = subprocess.run([cli], input="\n".join(lines) + "\n", capture_output=True, text=True, check=True).stdout
    vals = out.strip().split("\n")
    assert len(vals) == len(lines), (len(vals), len(lines))
    res = []
    for k in range(len(states)):
        rho, mu, kappa = (float(v) for v in vals[4 * k:4 * k + 3])
        res.append((rho, mu, kappa))
    return res


def psat_of(cli, Ts):
    lines = ['STEAM.PSAT(%r; "K")' % T for T in Ts]
    out = subprocess.run([cli], input="\n".join(lines) + "\n", capture_output=True, text=True, check=True).stdout
    return [float(v) for v in out.strip().split("\n")]


def tsat_of(cli, ps):
    lines = ['STEAM.TSAT(%r; "K")' % p for p in ps]
    out = subprocess.run([cli], input="\n".join(lines) + "\n", capture_output=True, text=True, check=True).stdout
    return [float(v) for v in out.strip().split("\n")]


def C_fluids(dev, beta, Re, D):
    meter, taps, _, _, _ = DEVICES[dev]
    mu = 1e-3
    m = Re * math.pi * mu * D / 4.0
    if meter == ORIFICE:
        return fm.C_Reader_Harris_Gallagher(D, beta * D, 1000.0, mu, m, taps)
    C, _ = fm.differential_pressure_meter_C_epsilon(D, beta * D, m, 1e6, 0.99e6, 1000.0, mu, 1.3, meter)
    return C


def row(kind, dev, args, res):
    a = [repr(float(v)) for v in args] + [""] * (NA - len(args))
    r = ["%.17g" % v for v in res] + [""] * (NR - len(res))
    return ",".join([kind, dev] + a + r)


def main():
    if fluids.__version__ != EXPECTED_VERSION:
        print("warning: python3-fluids %s, expected %s" % (fluids.__version__, EXPECTED_VERSION), file=sys.stderr)
    cli = sys.argv[1] if len(sys.argv) > 1 else "build/cli/isentra"
    path = sys.argv[2] if len(sys.argv) > 2 else "tests/data/flow_oracle.csv"
    rnd = random.Random(SEED)
    rows = []

    # ---- C on its own: random beta, Re_D, D inside each device's limits
    for dev, (meter, taps, Dr, br, ref) in DEVICES.items():
        for _ in range(25):
            D = r9(rnd.uniform(*Dr))
            beta = r9(rnd.uniform(*br))
            if dev == "venturi nozzle" and beta * D < 0.05:
                continue
            if meter == ORIFICE and beta * D < 0.0125:
                continue
            lo, hi = ref(beta, D)
            Re = r9(math.exp(rnd.uniform(math.log(lo * 1.001), math.log(hi * 0.999))))
            rows.append(row("C", dev, [beta, Re, D], [C_fluids(dev, beta, Re, D)]))

    # ---- epsilon on its own: orifice and nozzle equations
    for fam in ("orifice", "nozzle"):
        for _ in range(40):
            beta = r9(rnd.uniform(0.1, 0.8))
            p1 = r9(rnd.uniform(0.2, 20.0))
            dp = r9(rnd.uniform(0.0, 0.25) * p1 * 1e6)
            kappa = r9(rnd.uniform(1.05, 1.6))
            P1, P2 = p1 * 1e6, p1 * 1e6 - dp
            if fam == "orifice":
                e = fm.orifice_expansibility(1.0, beta, P1, P2, kappa)
            else:
                e = fm.nozzle_expansibility(1.0, beta, P1, P2, kappa)
            rows.append(row("eps", fam, [beta, dp, p1, kappa], [e]))

    # ---- flows: random geometry, state and Reynolds number within the limits
    cases = []
    for dev, (meter, taps, Dr, br, ref) in DEVICES.items():
        n = 0
        while n < 30:
            D = r9(rnd.uniform(*Dr))
            beta = rnd.uniform(*br)
            d = r9(beta * D)
            beta = d / D
            if not (br[0] <= beta <= br[1]):
                continue
            if dev == "venturi nozzle" and d < 0.05:
                continue
            if meter == ORIFICE and d < 0.0125:
                continue
            liquid = n % 2 == 0
            if liquid:  # feedwater / condensate, at least 20 % above its saturation pressure
                T = r9(rnd.uniform(300.0, 520.0))
                ps = psat_of(cli, [T])[0]
                p = r9(rnd.uniform(max(0.5, 1.2 * ps + 0.2), 25.0))
            else:  # superheated steam
                p = r9(rnd.uniform(0.2, 16.0))
                T = r9(rnd.uniform(700.0, 840.0))
            cases.append((dev, D, d, p, T, liquid))
            n += 1
    props = core_properties(cli, [(c[3], c[4]) for c in cases])
    for (dev, D, d, p, T, liquid), (rho, mu, kappa) in zip(cases, props):
        meter, taps, _, _, ref = DEVICES[dev]
        psat = psat_of(cli, [T])[0] if liquid else 0.0
        dp_max = min(0.5e6, (p - 1.2 * psat) * 1e6) if liquid else min(0.3e6, 0.24 * p * 1e6)
        kw = dict(meter_type=meter, taps=taps)
        if liquid:
            kw["epsilon_specified"] = 1.0
        lo, hi = ref(d / D, D)
        for _ in range(20):  # a dp whose flow has a Reynolds number inside the limits
            dp = r9(math.exp(rnd.uniform(math.log(500.0), math.log(dp_max))))
            try:
                m = fm.differential_pressure_meter_solver(D, rho, mu, k=kappa, D2=d, P1=p * 1e6, P2=p * 1e6 - dp,
                                                          **kw)
            except Exception:
                continue
            Re = 4.0 * m / (math.pi * mu * D)
            if lo * 1.001 <= Re <= hi * 0.999:
                break
        else:
            continue
        C, eps = fm.differential_pressure_meter_C_epsilon(D, d, m, p * 1e6, p * 1e6 - dp, rho, mu, kappa, meter,
                                                          taps=taps,
                                                          epsilon_specified=1.0 if liquid else None)
        rows.append(row("flow", dev, [dp, p, T, d, D, rho, mu, kappa, 1 if liquid else 0], [m, C, eps]))

    with open(path, "w") as f:
        f.write("# Generated by tests/oracle/gen_flow.py with python3-fluids %s (Debian) and Isentra's "
                "properties; do not edit.\n" % fluids.__version__)
        f.write("kind,device," + ",".join("a%d" % i for i in range(NA)) + "," +
                ",".join("r%d" % i for i in range(NR)) + "\n")
        for r in rows:
            f.write(r + "\n")
    print("%d rows written to %s" % (len(rows), path))


if __name__ == "__main__":
    main()
