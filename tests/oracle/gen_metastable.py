#!/usr/bin/python3
# SPDX-License-Identifier: MPL-2.0
"""Oracle for the metastable-vapour equation and the viscosity forms.

Writes tests/data/metastable_oracle.csv (committed; read by
tests/core/test_oracle_metastable.cpp, so the C++ tests need no Python).
Run with Debian's /usr/bin/python3:
    /usr/bin/python3 tests/oracle/gen_metastable.py [output.csv]

Sources of the numbers:
  * Metastable vapour: IAPWS R7-97(2012) Sec. 6.2, Eq. 18, transcribed below
    on its own from the release (ideal-gas part Eq. 16 with the coefficients of
    Table 10 and the n1, n2 of its footnote a; residual part Eq. 19 with Table
    16; properties by Table 12, derivatives Tables 13 and 17), coefficients read
    on the rendered pages 13 and 18. python3-iapws 1.5.2 has no metastable-vapour
    equation, so this transcription is the reference; the script checks it
    against R7-97(2012) Table 18 to all printed digits before writing anything.
    It shares no code with the C++ core.
  * The saturation values that bound the range (Ts(p), h'(p), h''(p)): from
    Debian's python3-iapws 1.5.2 (IAPWS97 class, _TSat_P); only its numbers are
    used (GPL, no code of it is read or copied). The 5 % equilibrium-moisture
    line (R7-97(2012) Sec. 6.2: "determined from the equilibrium h' and h''
    values") is where Eq. 18 gives h = h' + 0.95 (h'' - h'), solved here by
    bisection.
  * Viscosity and the derived properties: python3-iapws 1.5.2 (IAPWS97 class
    for the state, rho, cp, lambda; _Viscosity(rho, T) for mu with mu_2 = 1,
    R12-08 Sec. 3; _Viscosity(rho, T, phase, drho) for the full R12-08 Eq. 10
    with the critical enhancement mu_2). For mu_2 the reference derivative
    zeta(T_R, rho) is the industrial one of R15-11 Eq. 25 with its Table 6
    coefficients (numbers of the release), as our STEAM.MUCRIT.* uses.
    Each transport row records whether the state lies inside the near-critical
    curve of R12-08 Sec. 2.8 footnote 2 (T below a0 + a1 rho + a2 rho^2 +
    a3 rho^3): outside it the release allows mu_2 to be left out (a change
    below 0.0051 %), which STEAM.MUCRIT.* does.

Rows (column `kind`), core units (MPa, K, kJ/kg, kJ/(kg K), kg/m3, m/s, Pa s):
  mv   p T   v h u s cp cv w x               a metastable state (x: equilibrium quality)
  lim  p     T_low T_high h_low h_high s_low s_high   the range at p
  out  p T   h s                              outside the range: (p,T), (p,h), (p,s) are errors
  tr   p T   region rho mu mucrit nu pr inside        transport, (p,T) single phase
"""

import csv
import math
import os
import random
import sys

import iapws
from iapws import IAPWS97
from iapws._iapws import _Viscosity
from iapws.iapws97 import _PSat_T, _TSat_P

EXPECTED_VERSION = "1.5.2"
SEED = 20261204
P_TRIPLE = 611.657e-6  # MPa, R7-97(2012) Eq. 9 (the triple-point pressure as the release gives it)
P_MAX = 10.0           # MPa, R7-97(2012) Sec. 6.2

# ---- R7-97(2012) Eq. 18 -------------------------------------------------------
R = 0.461526  # kJ/(kg K), R7-97(2012) Eq. 1
J0 = [0, 1, -5, -4, -3, -2, -1, 2, 3]                                   # Table 10
N0 = [-0.96937268393049e1, 0.10087275970006e2,                           # Table 10 footnote a
      -0.56087911283020e-2, 0.71452738081455e-1, -0.40710498223928,
      0.14240819171444e1, -0.43839511319450e1, -0.28408632460772,
      0.21268463753307e-1]
IR = [1, 1, 1, 1, 2, 2, 2, 3, 3, 4, 4, 5, 5]                             # Table 16
JR = [0, 2, 5, 11, 1, 7, 16, 4, 16, 7, 10, 9, 10]
NR = [-0.73362260186506e-2, -0.88223831943146e-1, -0.72334555213245e-1,
      -0.40813178534455e-2, 0.20097803380207e-2, -0.53045921898642e-1,
      -0.76190409086970e-2, -0.63498037657313e-2, -0.86043093028588e-1,
      0.75321581522770e-2, -0.79238375446139e-2, -0.22888160778447e-3,
      -0.26456501482810e-2]


def eq18(p, T):
    """R7-97(2012) Eq. 18 at p (MPa), T (K): v, h, u, s, cp, cv, w (Table 12)."""
    pi, tau = p / 1.0, 540.0 / T
    t5 = tau - 0.5
    g0 = math.log(pi) + sum(n * tau ** j for n, j in zip(N0, J0))
    g0p = 1.0 / pi
    g0t = sum(n * j * tau ** (j - 1) for n, j in zip(N0, J0))
    g0tt = sum(n * j * (j - 1) * tau ** (j - 2) for n, j in zip(N0, J0))
    terms = list(zip(NR, IR, JR))
    gr = sum(n * pi ** i * t5 ** j for n, i, j in terms)
    grp = sum(n * i * pi ** (i - 1) * t5 ** j for n, i, j in terms)
    grpp = sum(n * i * (i - 1) * pi ** (i - 2) * t5 ** j for n, i, j in terms)
    grt = sum(n * pi ** i * j * t5 ** (j - 1) for n, i, j in terms)
    grtt = sum(n * pi ** i * j * (j - 1) * t5 ** (j - 2) for n, i, j in terms)
    grpt = sum(n * i * pi ** (i - 1) * j * t5 ** (j - 1) for n, i, j in terms)
    RT = R * T
    a = 1 + pi * grp - tau * pi * grpt
    w2 = 1000.0 * RT * (1 + 2 * pi * grp + (pi * grp) ** 2) / (
        (1 - pi * pi * grpp) + a * a / (tau * tau * (g0tt + grtt)))
    return {
        "v": pi * (g0p + grp) * RT / p * 1e-3,
        "h": tau * (g0t + grt) * RT,
        "u": RT * (tau * (g0t + grt) - pi * (g0p + grp)),
        "s": R * (tau * (g0t + grt) - (g0 + gr)),
        "cp": -R * tau * tau * (g0tt + grtt),
        "cv": R * (-tau * tau * (g0tt + grtt) - a * a / (1 - pi * pi * grpp)),
        "w": math.sqrt(w2) if w2 > 0 else float("nan"),
    }


def check_table18():
    # R7-97(2012) Table 18, all printed digits (9 significant).
    table = [
        (450.0, 1.0, 0.192516540, 0.276881115e4, 0.257629461e4, 0.656660377e1, 0.276349265e1, 0.498408101e3),
        (440.0, 1.0, 0.186212297, 0.274015123e4, 0.255393894e4, 0.650218759e1, 0.298166443e1, 0.489363295e3),
        (450.0, 1.5, 0.121685206, 0.272134539e4, 0.253881758e4, 0.629170440e1, 0.362795578e1, 0.481941819e3),
    ]
    for T, p, *ref in table:
        r = eq18(p, T)
        for name, want in zip(["v", "h", "u", "s", "cp", "w"], ref):
            got = r[name]
            half_unit = 0.5 * 10 ** (math.floor(math.log10(abs(want))) - 8)  # of the 9th digit
            assert abs(got - want) <= half_unit, (T, p, name, got, want)


def bisect(f, a, b):
    fa = f(a)
    for _ in range(200):
        m = 0.5 * (a + b)
        fm = f(m)
        if (fm < 0) == (fa < 0):
            a, fa = m, fm
        else:
            b = m
        if b - a < 1e-13 * b:
            break
    return 0.5 * (a + b)


def limits(p):
    ts = _TSat_P(p)
    hf, hg = IAPWS97(P=p, x=0).h, IAPWS97(P=p, x=1).h
    h95 = hf + 0.95 * (hg - hf)
    tl = bisect(lambda T: eq18(p, T)["h"] - h95, ts - 80.0, ts)
    return ts, tl, hf, hg


# ---- R15-11 Eq. 25 (industrial zeta(T_R, rho)), Table 6 -----------------------
RHOC, PC = 322.0, 22.064
A25 = [
    [6.53786807199516, -5.61149954923348, 3.39624167361325, -2.27492629730878, 10.2631854662709, 1.97815050331519],
    [6.52717759281799, -6.30816983387575, 8.08379285492595, -9.82240510197603, 12.1358413791395, -5.54349664571295],
    [5.35500529896124, -3.96415689925446, 8.91990208918795, -12.0338729505790, 9.19494865194302, -2.16866274479712],
    [1.55225959906681, 0.464621290821181, 8.93237374861479, -11.0321960061126, 6.16780999933360, -0.965458722086812],
    [1.11999926419994, 0.595748562571649, 9.88952565078920, -10.3255051147040, 4.66861294457414, -0.503243546373828],
]
BOUNDS = [0.310559006, 0.776397516, 1.242236025, 1.863354037]


def drhodp_TR(rho):
    """(d rho/d p)_T at T_R = 1.5 Tc, kg/(m3 MPa), R15-11 Eq. 25."""
    d = rho / RHOC
    j = next((k for k, b in enumerate(BOUNDS) if d <= b), 4)
    return RHOC / PC / sum(a * d ** i for i, a in enumerate(A25[j]))


# R12-08 Sec. 2.8 footnote 2: the near-critical curve.
A_FN2 = [457.95895935062, 1.68077273385305, -3.24405775203984e-3, 1.43032446173023e-6]


def inside_fn2(T, rho):
    return T < sum(a * rho ** i for i, a in enumerate(A_FN2))


def main():
    if iapws.__version__ != EXPECTED_VERSION:
        sys.exit("python3-iapws %s expected, found %s" % (EXPECTED_VERSION, iapws.__version__))
    check_table18()
    out = sys.argv[1] if len(sys.argv) > 1 else os.path.join(
        os.path.dirname(os.path.abspath(__file__)), "..", "data", "metastable_oracle.csv")
    rng = random.Random(SEED)
    rows = []

    def logu(a, b):
        return math.exp(rng.uniform(math.log(a), math.log(b)))

    # Metastable states: p log-uniform over the whole range (and its ends),
    # T uniform between the 5 % line and Ts(p), kept 1e-9 K inside the ends
    # (the ends themselves are a matter of rounding between two Ts(p)).
    for k in range(1200):
        p = [P_TRIPLE, P_MAX, 1e-3, 0.1, 1.0, 5.0][k] if k < 6 else logu(P_TRIPLE, P_MAX)
        ts, tl, hf, hg = limits(p)
        T = rng.uniform(tl + 1e-6, ts - 1e-6)
        if k % 40 == 7:
            T = ts - 1e-6
        if k % 40 == 8:
            T = tl + 1e-6
        r = eq18(p, T)
        rows.append(["mv", p, T, r["v"], r["h"], r["u"], r["s"], r["cp"], r["cv"], r["w"], (r["h"] - hf) / (hg - hf)])
    # The range at p.
    for k in range(150):
        p = [P_TRIPLE, P_MAX][k] if k < 2 else logu(P_TRIPLE, P_MAX)
        ts, tl, _, _ = limits(p)
        lo, hi = eq18(p, tl), eq18(p, ts)
        rows.append(["lim", p, tl, ts, lo["h"], hi["h"], lo["s"], hi["s"]])
    # Outside the range: above Ts (stable vapour), wetter than 5 %, p beyond
    # its limits (h, s from Eq. 18 at the same p and T where it is finite).
    for k in range(300):
        kind = k % 4
        p = logu(P_TRIPLE, P_MAX)
        ts, tl, _, _ = limits(p)
        if kind == 0:
            T = ts + logu(1e-5, 60.0)
        elif kind == 1:
            T = tl - logu(1e-5, 20.0)
        else:
            T = rng.uniform(tl, ts)
            p = rng.uniform(P_MAX * (1 + 1e-9), 16.0) if kind == 2 else rng.uniform(1e-5, P_TRIPLE * (1 - 1e-6))
        r = eq18(p, T)
        rows.append(["out", p, T, r["h"], r["s"]])
    # Transport: regions 1-3 (and 5), with extra states around the critical point.
    n = 0
    while n < 900:
        if n % 6 == 0:
            T, p = rng.uniform(646.5, 648.5), rng.uniform(21.8, 22.6)
        elif n % 3 == 0:
            T, p = rng.uniform(645.0, 660.0), rng.uniform(21.0, 30.0)
        elif n % 11 == 1:
            T, p = rng.uniform(1073.15, 1173.15), logu(1e-3, 50.0)
        else:
            T, p = rng.uniform(273.16, 1073.15), logu(1e-3, 100.0)
        if T < 647.096 and abs(p / _PSat_T(T) - 1) < 1e-3:
            continue
        st = IAPWS97(P=p, T=T)
        if st.region not in (1, 2, 3, 5):
            continue
        phase = st.Liquid if st.x == 0 else st.Vapor
        mu = _Viscosity(st.rho, T)
        mucrit = _Viscosity(st.rho, T, phase, drhodp_TR(st.rho))
        rows.append(["tr", p, T, st.region, st.rho, mu, mucrit, phase.nu, phase.Prandt,
                     1 if inside_fn2(T, st.rho) else 0])
        n += 1

    with open(out, "w", newline="") as f:
        f.write("# Metastable-vapour and viscosity oracle for the Isentra core tests "
                "(tests/core/test_oracle_metastable.cpp).\n")
        f.write("# Source: IAPWS R7-97(2012) Eq. 18 (Tables 10 footnote a, 16) transcribed in "
                "tests/oracle/gen_metastable.py and checked there against Table 18; saturation "
                "values and transport: python3-iapws 1.5.2 (Debian); R15-11 Eq. 25 and R12-08 "
                "Sec. 2.8 footnote 2 coefficients from the releases.\n")
        f.write("# Generator: tests/oracle/gen_metastable.py (seed %d; re-run with /usr/bin/python3).\n" % SEED)
        w = csv.writer(f, lineterminator="\n")
        w.writerow(["kind", "a0", "a1", "a2", "a3", "a4", "a5", "a6", "a7", "a8", "a9", "a10"])
        for r in rows:
            w.writerow([r[0]] + [repr(float(x)) if isinstance(x, float) else str(x) for x in r[1:]])
    print("wrote %d rows to %s" % (len(rows), out))


if __name__ == "__main__":
    main()
