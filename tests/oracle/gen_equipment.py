#!/usr/bin/python3
# SPDX-License-Identifier: MPL-2.0
"""Independent oracle for the Isentra turbine and plant-equipment functions.

Writes tests/data/equipment_oracle.csv (committed, so the C++ tests need no
Python). Every state property in it comes from python3-iapws 1.5.2 (Debian),
run with Debian's /usr/bin/python3, through its IAPWS97 class only (inputs
(P,T), (P,s), (P,h), (P,x)). That package is GPL: this script only calls it
and records the numbers it returns; no code of it is read or copied. The
equipment formulas applied here on top of those states are the standard
definitions written out independently below (eta = (h_in - h_out) / (h_in -
h_s), energy balances, Tsat differences); the uncertainty rows take their
sensitivities by central finite differences of python3-iapws numbers, not by
the analytic property derivatives the C++ core uses.

Run:  /usr/bin/python3 tests/oracle/gen_equipment.py  [output.csv]

Row kinds (column `kind`), inputs a0.. and expected results r0.. in core
units (MPa, K, kJ/kg, kJ/(kg K), kg/s, fractions):
  exp_pT   a: p_in T_in p_out eta        r: h_out T_out s_out x_out h_s x_s work
  exp_ph   a: p_in h_in p_out eta        r: same as exp_pT
  eff_pTpT a: p_in T_in p_out T_out      r: eta
  eff_pTph a: p_in T_in p_out h_out      r: eta
  eff_phph a: p_in h_in p_out h_out      r: eta
  pump     a: p_in T_in p_out eta        r: h_out T_out s_out h_s work
  valve_pT a: p_in T_in p_out            r: h_out T_out s_out x_out
  mix      a: m1 h1 m2 h2 p              r: m h T s x
  dsh      a: m_steam p_steam T_steam T_out p_water T_water   r: m_water
  ttd      a: p_shell T_fw_out           r: TTD
  unc      a: p_in T_in p_out T_out u_p_in u_T_in u_p_out u_T_out
           r: eta u_eta theta_p_in theta_T_in theta_p_out theta_T_out
              share_p_in share_T_in share_p_out share_T_out
x is the equilibrium quality (h - h')/(h'' - h') at the state's pressure
(above 1 for superheated steam), from python3-iapws' saturated h' and h''.

Every state stays below 16.5 MPa where it is wet (python3-iapws' region-3
dome is left out, as in gen_if97.py) and keeps at least 0.5 K from the
saturation line where a (p,T) input must be single-phase.
"""

import math
import random
import sys

import iapws
from iapws import IAPWS97 as W

EXPECTED_VERSION = "1.5.2"
NA, NR = 8, 10
SEED = 20240611


def tsat(p):
    return W(P=p, x=0).T


def hf_hg(p):
    return W(P=p, x=0).h, W(P=p, x=1).h


def xeq(p, h):
    hf, hg = hf_hg(p)
    return (h - hf) / (hg - hf)


def r9(x):
    """Inputs rounded to 9 significant digits (then exact in the CSV)."""
    return float("%.9g" % x)


def row(kind, args, res):
    a = [repr(float(v)) for v in args] + [""] * (NA - len(args))
    r = ["%.15g" % v for v in res] + [""] * (NR - len(res))
    return ",".join([kind] + a + r)


def expansion(st_in, p_out, eta):
    iso = W(P=p_out, s=st_in.s)
    h_out = st_in.h - eta * (st_in.h - iso.h)
    out = W(P=p_out, h=h_out)
    return [h_out, out.T, out.s, xeq(p_out, h_out), iso.h, xeq(p_out, iso.h), st_in.h - h_out]


def eta_of(st_in, p_out, h_out):
    iso = W(P=p_out, s=st_in.s)
    return (st_in.h - h_out) / (st_in.h - iso.h)


def superheated_inlet(rng):
    p = r9(rng.uniform(0.5, 25.0))
    lo = 660.0 if p >= 22.064 else tsat(p) + 20.0
    T = r9(rng.uniform(lo, 873.15))
    return p, T


def main():
    if iapws.__version__ != EXPECTED_VERSION:
        sys.stderr.write("warning: python3-iapws %s, the CSV was made with %s\n"
                         % (iapws.__version__, EXPECTED_VERSION))
    rng = random.Random(SEED)
    rows = []

    # Turbine expansion from (p,T).
    n = 0
    while n < 40:
        p_in, T_in = superheated_inlet(rng)
        p_out = r9(max(0.003, p_in * rng.uniform(0.0005, 0.6)))
        eta = r9(rng.uniform(0.6, 1.0)) if n % 8 else 1.0
        res = expansion(W(P=p_in, T=T_in), p_out, eta)
        if abs(res[3] - 1) < 1e-3:  # too close to the saturation line
            continue
        rows.append(row("exp_pT", [p_in, T_in, p_out, eta], res))
        n += 1

    # Turbine expansion from (p,h) with a wet or barely superheated inlet.
    for _ in range(25):
        p_in = r9(rng.uniform(0.2, 10.0))
        hf, hg = hf_hg(p_in)
        h_in = r9(hf + rng.uniform(0.85, 1.05) * (hg - hf))
        p_out = r9(max(0.003, p_in * rng.uniform(0.002, 0.5)))
        eta = r9(rng.uniform(0.6, 0.95))
        rows.append(row("exp_ph", [p_in, h_in, p_out, eta], expansion(W(P=p_in, h=h_in), p_out, eta)))

    # Section efficiency from (p,T) readings at both ends (superheated exhaust).
    n = 0
    while n < 30:
        p_in, T_in = superheated_inlet(rng)
        p_out = r9(max(0.05, p_in * rng.uniform(0.05, 0.6)))
        st = W(P=p_in, T=T_in)
        eta0 = rng.uniform(0.7, 0.95)
        res = expansion(st, p_out, eta0)
        T_out = r9(res[1])
        if T_out < tsat(p_out) + 2.0:
            continue
        h_out = W(P=p_out, T=T_out).h
        rows.append(row("eff_pTpT", [p_in, T_in, p_out, T_out], [eta_of(st, p_out, h_out)]))
        n += 1

    # Section efficiency from an outlet enthalpy (wet exhaust).
    for _ in range(20):
        p_in, T_in = superheated_inlet(rng)
        p_out = r9(rng.uniform(0.004, 0.05))
        st = W(P=p_in, T=T_in)
        hf, hg = hf_hg(p_out)
        h_out = r9(hf + rng.uniform(0.85, 0.99) * (hg - hf))
        rows.append(row("eff_pTph", [p_in, T_in, p_out, h_out], [eta_of(st, p_out, h_out)]))
    for _ in range(15):
        p_in = r9(rng.uniform(0.2, 5.0))
        hf, hg = hf_hg(p_in)
        h_in = r9(hf + rng.uniform(0.9, 0.999) * (hg - hf))
        p_out = r9(rng.uniform(0.004, 0.1) * min(1.0, p_in))
        st = W(P=p_in, h=h_in)
        hf, hg = hf_hg(p_out)
        h_out = r9(hf + rng.uniform(0.8, 0.95) * (hg - hf))
        rows.append(row("eff_phph", [p_in, h_in, p_out, h_out], [eta_of(st, p_out, h_out)]))

    # Pump.
    for _ in range(20):
        p_in = r9(rng.uniform(0.005, 2.0))
        T_in = r9(tsat(p_in) - rng.uniform(1.0, 30.0))
        p_out = r9(rng.uniform(2.5, 32.0))
        eta = r9(rng.uniform(0.6, 0.9))
        st = W(P=p_in, T=T_in)
        iso = W(P=p_out, s=st.s)
        w = (iso.h - st.h) / eta
        out = W(P=p_out, h=st.h + w)
        rows.append(row("pump", [p_in, T_in, p_out, eta], [st.h + w, out.T, out.s, iso.h, w]))

    # Throttling valve: superheated and subcooled (flashing) inlets.
    for i in range(25):
        if i % 2:
            p_in, T_in = superheated_inlet(rng)
            p_in = min(p_in, 16.0)
            T_in = r9(max(T_in, tsat(p_in) + 5.0))
        else:
            p_in = r9(rng.uniform(0.5, 15.0))
            T_in = r9(tsat(p_in) - rng.uniform(1.0, 40.0))
        p_out = r9(p_in * rng.uniform(0.02, 0.95))
        h = W(P=p_in, T=T_in).h
        out = W(P=p_out, h=h)
        rows.append(row("valve_pT", [p_in, T_in, p_out], [h, out.T, out.s, xeq(p_out, h)]))

    # Adiabatic mixing of a steam and a water stream.
    for _ in range(15):
        p = r9(rng.uniform(0.1, 10.0))
        m1, m2 = r9(rng.uniform(1.0, 100.0)), r9(rng.uniform(0.5, 50.0))
        h1 = r9(W(P=p, T=tsat(p) + rng.uniform(5.0, 200.0)).h)
        h2 = r9(W(P=p, T=tsat(p) - rng.uniform(5.0, 60.0)).h)
        h = (m1 * h1 + m2 * h2) / (m1 + m2)
        st = W(P=p, h=h)
        rows.append(row("mix", [m1, h1, m2, h2, p], [m1 + m2, h, st.T, st.s, xeq(p, h)]))

    # Desuperheater spray flow.
    for _ in range(15):
        p = r9(rng.uniform(1.0, 15.0))
        Ts = tsat(p)
        T_steam = r9(rng.uniform(Ts + 60.0, 840.0))
        T_out = r9(rng.uniform(Ts + 10.0, T_steam - 5.0))
        p_w = r9(rng.uniform(p + 1.0, 21.0))
        T_w = r9(rng.uniform(400.0, min(480.0, tsat(p_w) - 5.0)))
        m = r9(rng.uniform(10.0, 300.0))
        h_s, h_o, h_w = W(P=p, T=T_steam).h, W(P=p, T=T_out).h, W(P=p_w, T=T_w).h
        rows.append(row("dsh", [m, p, T_steam, T_out, p_w, T_w], [m * (h_s - h_o) / (h_o - h_w)]))

    # Feedwater heater TTD.
    for _ in range(15):
        p = r9(10 ** rng.uniform(-2.0, math.log10(8.0)))
        T_fw = r9(tsat(p) - rng.uniform(-2.0, 10.0))
        rows.append(row("ttd", [p, T_fw], [tsat(p) - T_fw]))

    # Uncertainty of a section efficiency: central finite differences.
    n = 0
    while n < 12:
        p_in, T_in = superheated_inlet(rng)
        p_in = min(p_in, 20.0)
        p_out = r9(max(0.05, p_in * rng.uniform(0.05, 0.6)))
        st = W(P=p_in, T=T_in)
        T_out = r9(expansion(st, p_out, rng.uniform(0.75, 0.92))[1])
        if T_out < tsat(p_out) + 5.0:
            continue
        u = [r9(rng.uniform(0.001, 0.005)), r9(rng.uniform(0.1, 1.0)),
             r9(rng.uniform(0.001, 0.005)), r9(rng.uniform(0.1, 1.0))]
        x = [p_in, T_in, p_out, T_out]

        def eta(v):
            s1 = W(P=v[0], T=v[1])
            return eta_of(s1, v[2], W(P=v[2], T=v[3]).h)

        steps = [1e-4 * p_in, 0.02, 1e-4 * p_out, 0.02]
        theta = []
        for i in range(4):
            up, dn = list(x), list(x)
            up[i] += steps[i]
            dn[i] -= steps[i]
            theta.append((eta(up) - eta(dn)) / (2 * steps[i]))
        ui = [u[0] * p_in, u[1], u[2] * p_out, u[3]]
        c2 = [(t * v) ** 2 for t, v in zip(theta, ui)]
        tot = sum(c2)
        rows.append(row("unc", x + u, [eta(x), math.sqrt(tot)] + theta + [100 * c / tot for c in c2]))
        n += 1

    out = sys.argv[1] if len(sys.argv) > 1 else "tests/data/equipment_oracle.csv"
    header = ["kind"] + ["a%d" % i for i in range(NA)] + ["r%d" % i for i in range(NR)]
    with open(out, "w") as f:
        f.write("# Turbine and plant-equipment oracle for the Isentra core tests.\n")
        f.write("# Source: python3-iapws %s (Debian), IAPWS97 class; formulas and row kinds in\n"
                % iapws.__version__)
        f.write("# tests/oracle/gen_equipment.py (seed %d; re-run with /usr/bin/python3).\n" % SEED)
        f.write(",".join(header) + "\n")
        for r in rows:
            f.write(r + "\n")
    print("%d rows -> %s" % (len(rows), out))


if __name__ == "__main__":
    main()
