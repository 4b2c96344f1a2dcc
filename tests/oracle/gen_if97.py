#!/usr/bin/python3
# SPDX-License-Identifier: MPL-2.0
"""Independent IAPWS-IF97 oracle for the Isentra property core.

Writes tests/data/if97_oracle.csv (committed, so the C++ tests need no Python).

Source of every number in the CSV: python3-iapws 1.5.2 (Debian), run with
Debian's /usr/bin/python3. That package is GPL; this script only *calls* it
(the IAPWS97 class and the region-level functions _Region1/2/3/5, _PSat_T,
_TSat_P, _P23_T) and records the numbers it returns. No code of it is read or
copied here.

Run:  /usr/bin/python3 tests/oracle/gen_if97.py  [output.csv]

Row kinds (column `kind`) and what the C++ test checks on each:
  pT  forward: inputs p, T; expected v, h, s, u, cp, cv, w, region
  ph  inverse: inputs p, h; expected T (and x, region in the dome)
  ps  inverse: inputs p, s; expected T
  hs  inverse: inputs h, s; expected p and T
  px  wet:     inputs p, x; expected T, v, h, s, u
  Tx  wet:     inputs T, x; expected p, v, h, s, u
Inverse rows are built forward: a (p,T) (or (p,x)) state is evaluated, and
its h and/or s become the inputs; the expected T/p are the values the state
was built from. Each inverse row is kept only if python3-iapws' own inverse
for the same pair agrees (T within 1e-7 K, p within 1e-10 relative; for (h,s)
additionally its own h(p,T) reproduces the h passed within 1e-9 relative).

Places where python3-iapws 1.5.2 is known to be wrong or ambiguous are left
OUT of the set on purpose (filters below):
  * two-phase states above 623.15 K (the region-3 part of the dome): no wet
    state with T >= 623.15 K, i.e. p >= 16.529 MPa, is generated;
  * (p,h) and (p,s) inside the dome above 16.529 MPa: same filter;
  * (h,s) in region 5: no hs row is taken from region 5;
  * pressures below 611 Pa: every state has p >= P_MIN = 6.12e-4 MPa;
  * states exactly on a boundary (saturation line, T = 623.15 K, B23,
    T = 1073.15 K, x = 0 or 1 for the inverse kinds): every state keeps a
    relative distance of at least 1e-8 from each boundary; the region is
    decided here and must agree with python3-iapws' own region.
Region 3 from (p,T): the density python3-iapws finds is re-checked on the
basic equation (_Region3(rho,T)['P'] == p within 1e-12 relative) and must be
on the stable branch (liquid side rho > rho_c, vapour side rho < rho_c,
positive compressibility); the CSV then holds the pressure p(rho,T) of that
very density, so p, T and all properties are mutually consistent.

Inputs p and T are rounded to 12 significant digits before evaluation so the
CSV stays small; computed inputs (h, s for inverse rows) are written with 17
significant digits (exact doubles); expected outputs with 14.
"""

import math
import random
import sys

import iapws
import iapws.iapws97 as r97
from iapws import IAPWS97

SOURCE = "python3-iapws %s (Debian)" % iapws.__version__
EXPECTED_VERSION = "1.5.2"

TC, PC, RHOC = 647.096, 22.064, 322.0
T13, T25, TMAX = 623.15, 1073.15, 2273.15
TB23MAX = 863.15
P_MIN = 6.12e-4          # MPa: nothing below 611 Pa
PS623 = r97._PSat_T(T13)  # 16.529... MPa
MARGIN = 1e-8            # minimum relative distance from any boundary

COLUMNS = ["kind", "region", "p_MPa", "T_K", "x", "v_m3_kg", "h_kJ_kg",
           "s_kJ_kgK", "u_kJ_kg", "cp_kJ_kgK", "cv_kJ_kgK", "w_m_s", "source"]


def r12(x):
    return float("%.12g" % x)


def fexp(x):
    return "" if x is None else "%.14g" % x


def fin(x):
    return repr(float(x))


def psat(T):
    return r97._PSat_T(T)


def tsat(p):
    return r97._TSat_P(p)


def b23(T):
    return r97._P23_T(T)


def near(a, b):
    return abs(a - b) <= MARGIN * abs(b)


def region_of(p, T):
    """IF97 region of a single-phase (p,T), or None if outside the set's range
    or within MARGIN of a boundary."""
    if not (P_MIN <= p <= 100.0 and 273.15 <= T <= TMAX):
        return None
    if near(T, T13) or near(T, T25):
        return None
    if T < T13:
        ps = psat(T)
        if near(p, ps) or ps < P_MIN * (1 + 1e-6):
            return None
        return 1 if p > ps else 2
    if T < TB23MAX + 1e-9 and p > b23(T) * (1 - MARGIN):
        if near(p, b23(T)):
            return None
        if T < TC and near(p, psat(T)):
            return None
        return 3
    if T < T25:
        return 2
    if p > 50.0:
        return None
    return 5


def forward(p, T):
    """dict of properties at (p,T) or None. For region 3 the returned p is
    p(rho,T) of the density found (consistent to the last bits)."""
    reg = region_of(p, T)
    if reg is None:
        return None
    if reg == 1:
        d = r97._Region1(T, p)
    elif reg == 2:
        d = r97._Region2(T, p)
    elif reg == 5:
        d = r97._Region5(T, p)
    else:
        st = IAPWS97(P=p, T=T)
        if st.region != 3:
            return None
        rho = 1.0 / st.v
        d = r97._Region3(rho, T)
        if abs(d["P"] - p) > 1e-12 * p or not d["kt"] > 0:
            return None
        if T < TC:
            liquid_side = p > psat(T)
            if liquid_side != (rho > RHOC):
                return None
        p = d["P"]
        if region_of(p, T) != 3:
            return None
    # Cross-check the region decision against the library's own.
    st = IAPWS97(P=p, T=T)
    if st.region != reg or abs(st.h - d["h"]) > 1e-12 * abs(d["h"]):
        return None
    out = dict(region=reg, p=p, T=T, v=d["v"], h=d["h"], s=d["s"],
               u=d["h"] - 1000.0 * p * d["v"], cp=d["cp"], cv=d["cv"], w=d["w"])
    for k in ("v", "h", "s", "u", "cp", "cv", "w"):
        if not math.isfinite(out[k]):
            return None
    return out


def wet_pT(p, T, x):
    """Two-phase mixture at saturation (p, T = tsat(p)) below 623.15 K."""
    if not (P_MIN <= p < PS623 * (1 - 1e-6)) or T >= T13 * (1 - 1e-9):
        return None
    liq = r97._Region1(T, p)
    vap = r97._Region2(T, p)
    def mix(k):
        return liq[k] + x * (vap[k] - liq[k])
    v, h, s = mix("v"), mix("h"), mix("s")
    return dict(region=4, p=p, T=T, x=x, v=v, h=h, s=s, u=h - 1000.0 * p * v)


def wet_px(p, x):
    return wet_pT(p, tsat(p), x)


def wet_Tx(T, x):
    return wet_pT(psat(T), T, x)


def loguniform(rng, a, b):
    return math.exp(rng.uniform(math.log(a), math.log(b)))


def signed_delta(rng, lo=1e-8, hi=1e-2):
    return rng.choice((-1.0, 1.0)) * loguniform(rng, lo, hi)


class Writer:
    def __init__(self):
        self.rows = []
        self.counts = {}
        self.dropped = {}
        self.seen = set()

    def drop(self, why):
        self.dropped[why] = self.dropped.get(why, 0) + 1

    def add(self, kind, st, inputs):
        key = (kind,) + tuple(inputs.values())
        if key in self.seen:
            return False
        self.seen.add(key)
        def col(name, val):
            if val is None:
                return ""
            return fin(val) if name in inputs else fexp(val)
        x = st.get("x")
        row = [kind, str(st["region"]), col("p", st["p"]), col("T", st["T"]),
               col("x", x), col("v", st["v"]), col("h", st["h"]), col("s", st["s"]),
               col("u", st["u"]), col("cp", st.get("cp")), col("cv", st.get("cv")),
               col("w", st.get("w")), SOURCE]
        self.rows.append(",".join(row))
        self.counts[kind] = self.counts.get(kind, 0) + 1
        return True


# ---- samplers of single-phase (p,T) ------------------------------------

def s_region1(rng):
    T = rng.uniform(273.16, T13)
    p = loguniform(rng, max(psat(T), P_MIN), 100.0)
    return r12(p), r12(T)


def s_region2(rng):
    T = rng.uniform(273.2, T25)
    if T < T13:
        pmax = psat(T)
    elif T < TB23MAX:
        pmax = b23(T)
    else:
        pmax = 100.0
    if pmax <= P_MIN:
        return None
    return r12(loguniform(rng, P_MIN, pmax)), r12(T)


def s_region3(rng):
    T = rng.uniform(T13, TB23MAX)
    p = rng.uniform(b23(T), 100.0)
    return r12(p), r12(T)


def s_region5(rng):
    T = rng.uniform(T25, TMAX)
    return r12(loguniform(rng, P_MIN, 50.0)), r12(T)


def s_critical(rng):
    T = rng.uniform(TC - 3.0, TC + 10.0)
    p = rng.uniform(PC - 3.0, PC + 5.0)
    if rng.random() < 0.5:  # tighter
        T = TC * (1 + signed_delta(rng, 1e-7, 3e-3))
        p = PC * (1 + signed_delta(rng, 1e-7, 3e-2))
    return r12(p), r12(T)


def s_b23(rng):
    T = rng.uniform(T13 + 0.01, TB23MAX - 0.01)
    p = b23(T) * (1 + signed_delta(rng))
    return r12(p), r12(T)


def s_t13(rng):
    T = T13 * (1 + signed_delta(rng, 1e-8, 1e-3))
    p = rng.uniform(P_MIN, 100.0) if rng.random() < 0.3 else rng.uniform(PS623, 100.0)
    return r12(p), r12(T)


def s_t25(rng):
    T = T25 * (1 + signed_delta(rng, 1e-8, 1e-3))
    p = loguniform(rng, P_MIN, 50.0)
    return r12(p), r12(T)


def s_sat(rng):
    # both sides of the saturation line, from the triple point to near pc;
    # half of them in the region-3 part above 16.529 MPa.
    if rng.random() < 0.5:
        p = loguniform(rng, P_MIN * 1.01, PS623)
    else:
        p = rng.uniform(PS623, PC * (1 - 1e-6))
    T = tsat(p) * (1 + signed_delta(rng))
    return r12(p), r12(T)


def s_wet_p(rng):
    if rng.random() < 0.7:
        p = loguniform(rng, P_MIN * 1.01, PS623 * (1 - 1e-4))
    else:  # close to 623.15 K from below
        p = PS623 * (1 - loguniform(rng, 1e-6, 1e-2))
    return r12(p)


def s_wet_T(rng):
    if rng.random() < 0.8:
        T = rng.uniform(273.16, T13 - 0.01)
    else:
        T = T13 * (1 - loguniform(rng, 1e-8, 1e-3))
    return r12(T)


def s_x(rng):
    c = rng.random()
    if c < 0.1:
        return rng.choice((1e-6, 1 - 1e-6, 1e-9, 1 - 1e-9))
    return r12(rng.uniform(0.0, 1.0))


SINGLE = [  # (name, sampler, forward count, ph, ps, hs)
    ("region1", s_region1, 1000, 300, 300, 300),
    ("region2", s_region2, 1000, 300, 300, 300),
    ("region3", s_region3, 700, 250, 250, 250),
    ("region5", s_region5, 500, 200, 200, 0),
    ("critical", s_critical, 400, 120, 120, 120),
    ("B23", s_b23, 400, 120, 120, 120),
    ("623.15K", s_t13, 400, 120, 120, 120),
    ("1073.15K", s_t25, 300, 100, 100, 0),
    ("saturation", s_sat, 600, 200, 200, 200),
]


def guarded(check):
    """python3-iapws raises (or returns no state) for some inverse inputs:
    those count as 'does not close'."""
    def wrapped(st):
        try:
            return bool(check(st))
        except Exception:  # noqa: BLE001 - any failure of the library
            return False
    wrapped.__name__ = check.__name__
    return wrapped


@guarded
def iapws_ok_ph(st):
    b = IAPWS97(P=st["p"], h=st["h"])
    return abs(b.T - st["T"]) <= 1e-7


@guarded
def iapws_ok_ps(st):
    b = IAPWS97(P=st["p"], s=st["s"])
    return abs(b.T - st["T"]) <= 1e-7


@guarded
def iapws_ok_hs(st):
    b = IAPWS97(h=st["h"], s=st["s"])
    if b.region != st["region"]:
        return False
    if abs(b.T - st["T"]) > 1e-7 or abs(b.P - st["p"]) > 1e-10 * st["p"]:
        return False
    if st["region"] == 4:
        return abs(b.x - st["x"]) <= 1e-9
    back = IAPWS97(P=b.P, T=b.T)
    return abs(back.h - st["h"]) <= 1e-9 * abs(st["h"])


def main():
    out = sys.argv[1] if len(sys.argv) > 1 else "tests/data/if97_oracle.csv"
    if iapws.__version__ != EXPECTED_VERSION:
        sys.exit("expected python3-iapws %s, found %s" % (EXPECTED_VERSION, iapws.__version__))
    W = Writer()

    for idx, (name, sampler, n_pt, n_ph, n_ps, n_hs) in enumerate(SINGLE):
        rng = random.Random(9700 + idx)  # fixed seeds
        want = {"pT": n_pt, "ph": n_ph, "ps": n_ps, "hs": n_hs}
        got = dict.fromkeys(want, 0)
        tries = 0
        while any(got[k] < want[k] for k in want):
            tries += 1
            if tries > 200 * sum(want.values()):
                sys.exit("sampler %s cannot fill its quota: %r" % (name, got))
            pt = sampler(rng)
            if pt is None:
                continue
            st = forward(*pt)
            if st is None:
                W.drop(name + ": outside range / on a boundary / region disagreement")
                continue
            # each sampled state goes to the first kind still short
            for kind, check in (("pT", None), ("ph", iapws_ok_ph),
                                ("ps", iapws_ok_ps), ("hs", iapws_ok_hs)):
                if got[kind] >= want[kind]:
                    continue
                if check is not None and not check(st):
                    W.drop("%s: python3-iapws own %s inverse does not close" % (name, kind))
                    break
                ins = {"pT": ("p", "T"), "ph": ("p", "h"), "ps": ("p", "s"),
                       "hs": ("h", "s")}[kind]
                if W.add(kind, st, {k: st[k] for k in ins}):
                    got[kind] += 1
                break

    # Wet states, all below 623.15 K.
    rng = random.Random(9797)
    n = {"px": 700, "Tx": 700, "ph": 250, "ps": 250, "hs": 250}
    for kind in ("px", "Tx", "ph", "ps", "hs"):
        got = 0
        while got < n[kind]:
            x = s_x(rng)
            if kind == "Tx":
                st = wet_Tx(s_wet_T(rng), x)
            else:
                st = wet_px(s_wet_p(rng), x)
            if st is None:
                W.drop("wet: outside range")
                continue
            if kind in ("px", "Tx"):
                # cross-check against the library's own mixture
                b = IAPWS97(P=st["p"], x=x) if kind == "px" else IAPWS97(T=st["T"], x=x)
                if max(abs(b.h - st["h"]) / abs(st["h"]), abs(b.s - st["s"]) / abs(st["s"]),
                       abs(b.v - st["v"]) / st["v"]) > 1e-12:
                    W.drop("wet: IAPWS97 mixture disagrees with region 1/2 saturation values")
                    continue
                ins = {"p": st["p"], "x": x} if kind == "px" else {"T": st["T"], "x": x}
            else:
                if not (1e-6 <= x <= 1 - 1e-6):
                    continue  # no inverse exactly/almost on the saturation lines
                ok = {"ph": iapws_ok_ph, "ps": iapws_ok_ps, "hs": iapws_ok_hs}[kind](st)
                if not ok:
                    W.drop("wet: python3-iapws own %s inverse does not close" % kind)
                    continue
                ins = {"ph": {"p": st["p"], "h": st["h"]}, "ps": {"p": st["p"], "s": st["s"]},
                       "hs": {"h": st["h"], "s": st["s"]}}[kind]
            if W.add(kind, st, ins):
                got += 1

    with open(out, "w") as f:
        f.write("# IAPWS-IF97 oracle states for the Isentra core tests.\n")
        f.write("# Source: %s, via IAPWS97 and its region-level functions.\n" % SOURCE)
        f.write("# Generator: tests/oracle/gen_if97.py (fixed seeds; re-run with /usr/bin/python3).\n")
        f.write("# Units: p MPa, T K, v m3/kg, h u kJ/kg, s cp cv kJ/(kg K), w m/s. region 4 = two-phase.\n")
        f.write("# Inputs of each row: pT -> p,T; ph -> p,h; ps -> p,s; hs -> h,s; px -> p,x; Tx -> T,x.\n")
        f.write("# Left out on purpose (python3-iapws known-wrong or ambiguous there): two-phase states\n")
        f.write("# at or above 623.15 K (so no (p,h)/(p,s) in the dome above 16.529 MPa), (h,s) in region 5,\n")
        f.write("# p below 611 Pa, states within 1e-8 relative of a region boundary.\n")
        f.write("# Inverse rows kept only where python3-iapws' own inverse closes (see generator).\n")
        f.write("# Counts: %s\n" % ", ".join("%s=%d" % kv for kv in sorted(W.counts.items())))
        f.write(",".join(COLUMNS) + "\n")
        for r in W.rows:
            f.write(r + "\n")
    print("wrote %d rows to %s" % (len(W.rows), out))
    print("counts:", W.counts)
    for why, k in sorted(W.dropped.items()):
        print("dropped %6d  %s" % (k, why))


if __name__ == "__main__":
    main()
