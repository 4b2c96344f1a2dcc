// SPDX-License-Identifier: MPL-2.0
// Exact region-3 solutions on the IAPWS-IF97 basic equation f3(rho,T),
// R7-97(2012) Eq. 28:
//   region3_pT(p,T)        density with p(rho,T) = p, started from the
//                          SR5-05(2016) backward value v(p,T);
//   region3_saturation(T)  rho' and rho'' with p(rho,T) = ps(T) of Eq. 30,
//                          623.15 K <= T <= Tc (R7-97(2012) Sec. 10.2, text
//                          to Eq. 36c: "rho' and rho'' are determined from
//                          Eq. (28) by iteration for given T values and
//                          corresponding ps values from Eq. (30)").
// Raw functions: no range checks, no exceptions.
//
// Method. The SR5-05 value (0.001 % from Eq. 28 in 3a..3t, up to 2 % in the
// near-critical 3y/3z) starts a Newton iteration on rho with (dp/drho)_T from
// Eq. 28; the subregion, chosen on the requested side of the saturation line,
// fixes the branch (liquid-like rho > rhoc, vapour-like rho < rhoc). The
// result is accepted only if it converged on the stable part of that branch
// (dp/drho > 0, right side of rhoc). Otherwise, which happens only close to
// the critical point, the root is bracketed on its branch between the
// spinodal (dp/drho = 0) and a far density and found by TOMS 748
// (Boost.Math).
//
// Near the critical point Eq. 30 and Eq. 28 are not exactly consistent: their
// slopes dps/dT at Tc differ by about 1e-4 MPa/K, and ps of Eq. 30 rounds to
// about 3e-10 MPa above p(rhoc,Tc) of Eq. 28. Within some 1e-5 K of Tc,
// ps(T) therefore lies slightly above the vapour spinodal pressure of Eq. 28
// and Eq. 28 has no vapour-like root at ps at all: the two roots have merged.
// There the pressure used for both phases is the nearest one at which both
// exist, the spinodal pressure (an inconsistency below 2e-9 MPa, far inside
// R7-97 Table 44); the densities then tend continuously to rhoc, which is
// returned for both phases at T = Tc. For region3_pT, a (p,T) on a branch with
// no root at p (only in that same tiny zone) gets the spinodal state, the
// branch's nearest approach to p.
#include <algorithm>
#include <cmath>
#include <limits>
#include <cstdint>

#include <boost/math/policies/policy.hpp>
#include <boost/math/tools/roots.hpp>

#include "isentra/if97/if97.hpp"

namespace isentra::if97 {

// From core/if97/vpt.cpp (internal to the core): subregion selection with the
// saturation side forced (+1 liquid, -1 vapour, 0 by Tsat(p)), and the
// equation of one subregion.
namespace vpt_detail {
char subregion(double p, double T, int side);
double v_sub(double p, double T, char letter);
}  // namespace vpt_detail

namespace {

// Boost policy: never throw, never touch errno (the core is exception-free
// here and reentrant).
using NoThrow = boost::math::policies::policy<
    boost::math::policies::domain_error<boost::math::policies::ignore_error>,
    boost::math::policies::evaluation_error<boost::math::policies::ignore_error>,
    boost::math::policies::overflow_error<boost::math::policies::ignore_error>>;

constexpr double kResTol = 1e-13;  // accepted relative residual |p(rho,T) - p| / p

// Newton on p(rho,T) = p from rho0, staying on one branch.
// side: +1 liquid-like (rho > rhoc), -1 vapour-like (rho < rhoc), 0 any
// (T >= Tc or p > pc: no two-phase loop can be hit). Returns false when the
// iteration leaves the stable part of the branch or does not converge.
bool newton(double p, double T, double rho0, int side, Props& out) {
    if (!(rho0 > 0.0) || !std::isfinite(rho0)) return false;
    double rho = rho0;
    Props P = region3(rho, T);
    if (!(P.drhodp_T > 0.0)) return false;
    // First step full Newton, second a chord step with the same slope and the
    // cheap p-only function: from the 1e-5 start this lands at ~1e-15.
    const double k0 = P.drhodp_T;
    rho += (p - P.p) * k0;
    if (!(rho > 0.0)) return false;
    rho += (p - region3_p(rho, T)) * k0;
    if (!(rho > 0.0) || std::fabs(rho - rho0) > 0.25 * rho0) return false;
    for (int it = 0; it < 8; ++it) {
        P = region3(rho, T);
        const double r = p - P.p;
        if (!(P.drhodp_T > 0.0)) return false;
        if (side > 0 && !(rho > rhoc)) return false;
        if (side < 0 && !(rho < rhoc)) return false;
        if (std::fabs(r) <= kResTol * p) {
            out = P;
            return true;
        }
        const double step = r * P.drhodp_T;
        if (!(std::fabs(step) < 0.25 * rho)) return false;
        if (std::fabs(step) <= 4e-16 * rho) {
            // No further progress is possible in double precision.
            if (std::fabs(r) > 1e-11 * p) return false;
            out = P;
            return true;
        }
        rho += step;
    }
    return false;
}

double dpdrho(double rho, double T) { return 1.0 / region3(rho, T).drhodp_T; }

// Root of f on [a,b] (f(a), f(b) of opposite signs) by TOMS 748.
template <class F>
double toms748(F f, double a, double b, double fa, double fb, unsigned bits) {
    if (fa == 0.0) return a;
    if (fb == 0.0) return b;
    std::uintmax_t iters = 200;
    const auto r = boost::math::tools::toms748_solve(
        f, a, b, fa, fb, boost::math::tools::eps_tolerance<double>(bits), iters, NoThrow());
    return 0.5 * (r.first + r.second);
}

// The two spinodals of Eq. 28 at T < Tc and a far density on each branch.
struct Spinodals {
    double a;    // vapour-branch density with dp/drho > 0, below rsv
    double rsv;  // vapour spinodal, max of p on rho < rhoc
    double rsl;  // liquid spinodal, min of p on rho > rhoc
    double b;    // liquid-branch density with dp/drho > 0, above rsl
    bool loop;   // false when dp/drho(rhoc) >= 0 (T within rounding of Tc)
};

Spinodals spinodals(double T, double rho_v_hint, double rho_l_hint) {
    Spinodals s{};
    const double dc = dpdrho(rhoc, T);
    double a = std::min(rho_v_hint, rhoc) * 0.8;
    for (int i = 0; i < 60 && !(dpdrho(a, T) > 0.0); ++i) a *= 0.8;
    double b = std::max(rho_l_hint, rhoc) * 1.1;
    for (int i = 0; i < 60 && !(dpdrho(b, T) > 0.0); ++i) b *= 1.1;
    s.a = a;
    s.b = b;
    if (!(dc < 0.0)) {
        s.rsv = s.rsl = rhoc;
        s.loop = false;
        return s;
    }
    auto f = [T](double r) { return dpdrho(r, T); };
    s.rsv = toms748(f, a, rhoc, f(a), dc, 45);
    s.rsl = toms748(f, rhoc, b, dc, f(b), 45);
    s.loop = true;
    return s;
}

// Root of p(rho,T) = p on the vapour branch [lo, rsv] (p <= p(rsv)).
double vapour_root(double p, double T, double lo, double rsv, double psv) {
    if (p >= psv) return rsv;
    auto f = [p, T](double r) { return region3_p(r, T) - p; };
    double flo = f(lo);
    for (int i = 0; i < 60 && !(flo < 0.0); ++i) flo = f(lo *= 0.7);
    return toms748(f, lo, rsv, flo, psv - p, 52);
}

// Root of p(rho,T) = p on the liquid branch [rsl, hi] (p >= p(rsl)).
double liquid_root(double p, double T, double rsl, double psl, double hi) {
    if (p <= psl) return rsl;
    auto f = [p, T](double r) { return region3_p(r, T) - p; };
    double fhi = f(hi);
    for (int i = 0; i < 60 && !(fhi > 0.0); ++i) fhi = f(hi *= 1.1);
    return toms748(f, rsl, hi, psl - p, fhi, 52);
}

// Bracketed solve where no two-phase loop can interfere (T >= Tc or p > pc):
// p(rho,T) increases with rho on the whole search interval used.
double monotone_root(double p, double T, double rho0) {
    auto f = [p, T](double r) { return region3_p(r, T) - p; };
    double lo = rho0, hi = rho0;
    double flo = f(lo), fhi = flo;
    for (int i = 0; i < 80 && !(flo < 0.0); ++i) flo = f(lo *= 0.9);
    for (int i = 0; i < 80 && !(fhi > 0.0); ++i) fhi = f(hi *= 1.1);
    if (!(flo < 0.0) || !(fhi > 0.0)) return rho0;  // cannot happen inside region 3
    // Below Tc with p > pc the bracket may reach into the two-phase loop, where
    // f < 0 throughout (p exceeds every pressure of the loop): still one root.
    return toms748(f, lo, hi, flo, fhi, 52);
}

}  // namespace

namespace r3_detail {

// Density from (p,T) on a chosen branch of Eq. 28: side +1 the liquid-like
// root, -1 the vapour-like root, 0 the side of the saturation line of (p,T).
// Only T < Tc with p <= pc has two branches; elsewhere side is ignored.
Props pT_side(double p, double T, int side) {
    const bool two_phase_possible = T < Tc && p <= pc;
    if (!two_phase_possible) side = (p <= pc) ? -1 : 0;  // T >= Tc: subregions on the vapour-like side
    else if (side == 0) {
        // Side of the saturation line by Eq. 30 (consistent with
        // region3_saturation). Within rounding of the line Eqs. 30 and 31 may
        // disagree (near Tc psat(tsat(p)) exceeds p by up to ~2.4e-13
        // relative, i.e. ~2e-11 K in T): there T against tsat(p) decides, so
        // that every T below tsat(p) is liquid and every T above is vapour,
        // as the state solver brackets them.
        const double ps = psat(T);
        side = (p >= ps) ? +1 : -1;
        if (std::fabs(p - ps) <= 1e-11 * p) {
            const double ts = tsat(p);
            if (T < ts) side = +1;
            else if (T > ts) side = -1;
        }
    }
    const char sub = vpt_detail::subregion(p, T, side);
    const double rho0 = 1.0 / vpt_detail::v_sub(p, T, sub);
    Props P;
    if (newton(p, T, rho0, two_phase_possible ? side : 0, P)) return P;

    if (!two_phase_possible) return region3(monotone_root(p, T, rho0), T);

    // Close to the critical point: bracket on the requested branch.
    const Spinodals s = spinodals(T, side < 0 ? rho0 : rhoc, side > 0 ? rho0 : rhoc);
    if (!s.loop) return region3(monotone_root(p, T, rho0), T);
    double rho;
    if (side > 0)
        rho = liquid_root(p, T, s.rsl, region3_p(s.rsl, T), s.b);
    else
        rho = vapour_root(p, T, s.a, s.rsv, region3_p(s.rsv, T));
    return region3(rho, T);
}

}  // namespace r3_detail

Props region3_pT(double p, double T) { return r3_detail::pT_side(p, T, 0); }

namespace {
// A state on the limit of stability, (dp/drho)_T = 0, or the critical point
// itself: cp and (d rho/d p)_T are infinite there (rounding would otherwise
// leave huge numbers of either sign).
Props singular(Props c) {
    c.cp = c.drhodp_T = c.dvdT_p = std::numeric_limits<double>::infinity();
    return c;
}
}  // namespace

SatPair region3_saturation(double T) {
    if (!(T < Tc)) {
        // The critical point (R7-97(2012) Eqs. 2-4 and Sec. 7: Eq. 28 meets it
        // exactly): rho' = rho'' = rhoc.
        const Props c = singular(region3(rhoc, T));
        return SatPair{c, c};
    }
    const double ps = psat(T);
    // Starting values from SR5-05(2016) on either side of the saturation line
    // (liquid side 3c/3s/3u/3y, vapour side 3t/3r/3x/3z).
    const double rl0 = 1.0 / vpt_detail::v_sub(ps, T, vpt_detail::subregion(ps, T, +1));
    const double rv0 = 1.0 / vpt_detail::v_sub(ps, T, vpt_detail::subregion(ps, T, -1));
    SatPair out;
    if (newton(ps, T, rl0, +1, out.liq) && newton(ps, T, rv0, -1, out.vap)) {
        return out;
    }
    // Close to Tc: bracket each root between its spinodal and a far density.
    const Spinodals s = spinodals(T, rv0, rl0);
    if (!s.loop) {
        const Props c = singular(region3(rhoc, T));
        return SatPair{c, c};
    }
    const double psv = region3_p(s.rsv, T);
    const double psl = region3_p(s.rsl, T);
    // Where ps lies outside [psl, psv] (only within ~1e-5 K of Tc, see top of
    // file) both phases take the nearest pressure at which both exist.
    const double pe = std::min(std::max(ps, psl), psv);
    out.liq = region3(liquid_root(pe, T, s.rsl, psl, s.b), T);
    out.vap = region3(vapour_root(pe, T, s.a, s.rsv, psv), T);
    if (ps < psl) out.liq = singular(out.liq);  // the liquid sits on its spinodal
    if (ps > psv) out.vap = singular(out.vap);  // the vapour sits on its spinodal
    return out;
}

}  // namespace isentra::if97
