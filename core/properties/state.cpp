// SPDX-License-Identifier: MPL-2.0
// The state solver. Regions and phases are decided from the inputs
// themselves, compared with values from the basic equations (never from an
// approximate backward temperature); backward equations only give starting
// values, which are refined on the basic equations with Boost.Math's root
// finders until the round trip closes.
#include "isentra/properties/state.hpp"

#include <algorithm>
#include <cmath>
#include <cstdint>
#include <limits>
#include <string>

#include <boost/math/tools/minima.hpp>
#include <boost/math/tools/roots.hpp>

#include "isentra/base/error.hpp"

namespace isentra {

namespace if97::r3_detail {
// core/if97/r3sat.cpp: region-3 density from (p,T) on a chosen branch of Eq. 28
// (+1 liquid-like, -1 vapour-like, 0 by the side of the saturation line).
Props pT_side(double p, double T, int side);
}  // namespace if97::r3_detail

using namespace if97;

namespace {

constexpr double nan_v = std::numeric_limits<double>::quiet_NaN();
constexpr double none = nan_v;  // "no bound" in a RangeError
constexpr int kDigits = 50;     // bits of the root finders' relative tolerance (~1e-15)
constexpr std::uintmax_t kMaxIter = 100;

// ---- range checks ----------------------------------------------------------

void check_finite(const char* name, Quantity q, double v) {
    if (!std::isfinite(v)) throw RangeError(name, q, v, none, none);
}

void check_p(double p) {
    check_finite("p", Quantity::Pressure, p);
    if (!(p > 0.0)) throw RangeError("p", Quantity::Pressure, p, 0.0, p_max, "(pressure must be positive)");
    if (p > p_max) throw RangeError("p", Quantity::Pressure, p, none, p_max, "(the upper limit of IAPWS-IF97)");
}

void check_pT(double p, double T) {
    check_p(p);
    check_finite("T", Quantity::Temperature, T);
    if (T < T_min || T > T_max)
        throw RangeError("T", Quantity::Temperature, T, T_min, T_max, "(the range of IAPWS-IF97)");
    if (T > T_25 && p > p_max5)
        throw RangeError("p", Quantity::Pressure, p, none, p_max5,
                         "(above 1073.15 K = 800 °C = 1472 °F, where only region 5 of IAPWS-IF97 is defined)");
}

void check_x(double x) {
    check_finite("x", Quantity::None, x);
    if (x < 0.0 || x > 1.0) throw RangeError("x", Quantity::None, x, 0.0, 1.0, "(vapour quality is a mass fraction)");
}

// ---- states from Props -------------------------------------------------------

// p_in: the pressure as given by the caller (a region-3 state's p(rho,T)
// matches it only to the solver's tolerance).
// side: for a region-3 state below pc solved on a chosen branch of Eq. 28,
// +1 liquid / -1 vapour (near the critical point the branch, not rho > rhoc,
// tells them apart); 0 decides by density.
State from_props(const Props& pr, double p_in, int side = 0) {
    State st;
    st.T = pr.T;
    st.p = p_in;
    st.v = pr.v;
    st.rho = pr.rho;
    st.u = pr.u;
    st.h = pr.h;
    st.s = pr.s;
    st.cp = pr.cp;
    st.cv = pr.cv;
    st.w = pr.w;
    st.kappa = pr.w * pr.w * pr.rho / (pr.p * 1e6);
    st.drhodp_T = pr.drhodp_T;
    st.dvdT_p = pr.dvdT_p;
    st.region = pr.region;
    st.x = nan_v;
    if (p_in >= pc)
        st.phase = pr.T >= Tc ? Phase::Supercritical : Phase::Liquid;
    else if (pr.T >= Tc)
        st.phase = Phase::Vapour;
    else if (pr.region == 1)
        st.phase = Phase::Liquid;
    else if (pr.region == 2 || pr.region == 5)
        st.phase = Phase::Vapour;
    else if (side != 0)
        st.phase = side > 0 ? Phase::Liquid : Phase::Vapour;
    else  // region 3 below the critical point: liquid side if denser than critical
        st.phase = pr.rho > rhoc ? Phase::Liquid : Phase::Vapour;
    return st;
}

// Saturated liquid and vapour from T (basic equations).
SatPair sat_pair_T(double T) {
    if (T <= T_13) {
        const double p = psat(T);
        return SatPair{region1(p, T), region2(p, T)};
    }
    return region3_saturation(T);
}

State two_phase(const SatPair& sp, double p, double T, double x) {
    State st;
    const Props& l = sp.liq;
    const Props& g = sp.vap;
    st.T = T;
    st.p = p;
    st.x = x;
    st.v = l.v + x * (g.v - l.v);
    st.rho = 1.0 / st.v;
    st.u = l.u + x * (g.u - l.u);
    st.h = l.h + x * (g.h - l.h);
    st.s = l.s + x * (g.s - l.s);
    st.region = 4;
    st.phase = Phase::TwoPhase;
    st.liq = l;
    st.vap = g;
    if (x == 0.0 || x == 1.0) {  // saturated liquid or vapour: single-phase properties are defined
        const Props& e = x == 0.0 ? l : g;
        st.v = e.v;
        st.rho = e.rho;
        st.u = e.u;
        st.h = e.h;
        st.s = e.s;
        st.cp = e.cp;
        st.cv = e.cv;
        st.w = e.w;
        st.kappa = e.w * e.w * e.rho / (e.p * 1e6);
        st.drhodp_T = e.drhodp_T;
        st.dvdT_p = e.dvdT_p;
    } else {
        st.cp = st.cv = st.w = st.kappa = st.drhodp_T = st.dvdT_p = nan_v;
    }
    return st;
}

// ---- root finding ------------------------------------------------------------

// Newton on [lo, hi] with Boost.Math; f(x) returns (residual, derivative).
// Falls back to TOMS 748 on the bracket when Newton does not settle.
template <class F>
double solve_newton(F f, double guess, double lo, double hi, const char* what) {
    guess = std::min(std::max(guess, lo), hi);
    std::uintmax_t it = kMaxIter;
    double r = nan_v;
    try {
        r = boost::math::tools::newton_raphson_iterate(f, guess, lo, hi, kDigits, it);
    } catch (const std::exception&) {
        it = kMaxIter;
    }
    if (it < kMaxIter && std::isfinite(r)) return r;
    // Fallback: bracketing solver.
    auto g = [&](double x) { return std::get<0>(f(x)); };
    double a = lo, b = hi, fa = g(a), fb = g(b);
    if (fa == 0) return a;
    if (fb == 0) return b;
    if ((fa > 0) == (fb > 0))
        throw Error(ErrorCode::NoConvergence, std::string("no solution found for ") + what);
    std::uintmax_t it2 = 200;
    auto tol = boost::math::tools::eps_tolerance<double>(kDigits);
    auto res = boost::math::tools::toms748_solve(g, a, b, fa, fb, tol, it2);
    return 0.5 * (res.first + res.second);
}

template <class G>
double solve_bracket(G g, double lo, double hi, const char* what) {
    double fa = g(lo), fb = g(hi);
    if (fa == 0) return lo;
    if (fb == 0) return hi;
    if ((fa > 0) == (fb > 0)) throw Error(ErrorCode::NoConvergence, std::string("no solution found for ") + what);
    std::uintmax_t it = 200;
    auto tol = boost::math::tools::eps_tolerance<double>(kDigits);
    auto res = boost::math::tools::toms748_solve(g, lo, hi, fa, fb, tol, it);
    return 0.5 * (res.first + res.second);
}

// Region of a range-checked (p,T); 0 = on the saturation line: p = psat(T)
// or T = tsat(p) to the last bit (the two equations invert each other only
// to rounding).
int region_pT(double p, double T) {
    if (T <= Tc && p <= pc) {
        const double ps = psat(T);  // once: this is the hot path of every (p,T) call
        if (p == ps || (std::fabs(p - ps) <= 1e-12 * ps && tsat(p) == T)) return 0;
        if (T <= T_13) return p > ps ? 1 : 2;
    } else if (T <= T_13) {
        return 1;  // above the critical pressure
    }
    if (T <= T_25) return (T <= 863.15 && p > b23_p(T)) ? 3 : 2;
    return 5;
}

// ---- (p, y) solvers where y is h or s -----------------------------------------

enum class Y { H, S };

double yval(const Props& pr, Y y) { return y == Y::H ? pr.h : pr.s; }
double ydT(const Props& pr, Y y) { return y == Y::H ? pr.cp : pr.cp / pr.T; }
const char* yname(Y y) { return y == Y::H ? "h" : "s"; }
Quantity yq(Y y) { return y == Y::H ? Quantity::SpecificEnergy : Quantity::SpecificEntropy; }

// side: the branch of Eq. 28 in region 3 (see r3_detail::pT_side).
Props props_region(double p, double T, int region, int side = 0) {
    switch (region) {
    case 1: return region1(p, T);
    case 2: return region2(p, T);
    case 3: return r3_detail::pT_side(p, T, side);
    default: return region5(p, T);
    }
}

// Solves y(p,T) = y for T within [lo, hi] in one region.
State solve_T_in_region(double p, double y, Y which, int region, double lo, double hi, double guess,
                        int side = 0) {
    auto f = [&](double T) {
        const Props pr = props_region(p, T, region, side);
        return std::make_pair(yval(pr, which) - y, ydT(pr, which));
    };
    if (!(guess >= lo && guess <= hi)) guess = 0.5 * (lo + hi);
    const double T = solve_newton(f, guess, lo, hi, which == Y::H ? "T(p,h)" : "T(p,s)");
    return from_props(props_region(p, T, region, side), p, side);
}

// Whether a solver result reproduces y within 1e-9 (relative, at least 1 unit:
// h and s cross zero at the IF97 reference state).
bool reproduces(double got, double want) {
    return std::fabs(got - want) <= 1e-9 * std::max(1.0, std::fabs(want));
}

// Region 3 along the isobar p in density: for fixed p, T(rho) from
// p(rho,T) = p is unique because (dp/dT)_rho > 0, and h and s change
// monotonically with rho along the isobar. Near the critical point this keeps
// full resolution where T runs out of bits (cp diverges: one ulp of T moves h
// by more than 1e-9 relative) and where, within rounding of the saturation
// line, Eq. 30 and Eq. 28 disagree about which branch exists at (p, Tsat)
// (see core/if97/r3sat.cpp). r1, r2: densities bracketing the solution.
State solve_rho_region3(double p, double y, Y which, double r1, double r2, double T0, int side) {
    double T = T0;  // warm start of the inner solve
    auto T_of_rho = [&](double rho) {
        for (int it = 0; it < 40; ++it) {
            const double pr = region3_p(rho, T);
            const double r = pr - p;
            if (r == 0.0) break;
            const double dT = 1e-7 * T;
            const double slope = (region3_p(rho, T + dT) - pr) / dT;  // (dp/dT)_rho > 0
            if (!(slope > 0.0)) break;
            const double step = r / slope;
            T -= step;
            if (std::fabs(step) <= 1e-15 * T) break;
        }
        return T;
    };
    auto F = [&](double rho) { return yval(region3(rho, T_of_rho(rho)), which) - y; };
    const double lo = std::min(r1, r2), hi = std::max(r1, r2);
    const double rho = solve_bracket(F, lo, hi, which == Y::H ? "rho(p,h)" : "rho(p,s)");
    const Props pr = region3(rho, T_of_rho(rho));
    return from_props(pr, p, side);
}

// Fast path for region 3: two-dimensional Newton in (rho, T) on Eq. 28 for
// p(rho,T) = p and y(rho,T) = y, started from the SR3-03 backward T and v.
// Accepted only if it converges tightly inside [lo, hi] on a mechanically
// stable point whose density is the branch's root at (p, T). (dp/dT)_rho =
// rho^2 (dv/dT)_p (dp/drho)_T from the basic equation's own derivatives.
bool newton2d_region3(double p, double y, Y which, double lo, double hi, State& out) {
    double T = which == Y::H ? region3_T_ph(p, y) : region3_T_ps(p, y);
    const double v0 = which == Y::H ? region3_v_ph(p, y) : region3_v_ps(p, y);
    if (!(T > 0 && v0 > 0)) return false;
    // Near the critical point the Jacobian is nearly singular and the phase
    // name hangs on the last bits of T: leave it to the one-dimensional solves.
    if (p < 25.0 && std::fabs(T - Tc) < 2.0) return false;
    double rho = 1.0 / v0;
    for (int it = 0; it < 12; ++it) {
        const Props pr = region3(rho, T);
        if (!(pr.drhodp_T > 0)) return false;
        const double p_rho = 1.0 / pr.drhodp_T;               // MPa per kg/m3
        const double p_T = rho * rho * pr.dvdT_p * p_rho;     // MPa/K
        double y_rho, y_T;
        if (which == Y::H) {
            y_rho = 1e3 * (p_rho / rho - T * p_T / (rho * rho));
            y_T = pr.cv + 1e3 * p_T / rho;
        } else {
            y_rho = -1e3 * p_T / (rho * rho);
            y_T = pr.cv / T;
        }
        const double f1 = pr.p - p, f2 = yval(pr, which) - y;
        const double det = p_rho * y_T - p_T * y_rho;
        if (!(std::fabs(det) > 0)) return false;
        const double d_rho = (f1 * y_T - p_T * f2) / det;
        const double d_T = (p_rho * f2 - y_rho * f1) / det;
        rho -= d_rho;
        T -= d_T;
        if (!(rho > 0 && T > 0)) return false;
        if (std::fabs(d_rho) <= 1e-14 * rho && std::fabs(d_T) <= 1e-14 * T) break;
    }
    // Inside the T interval, and the density is the branch's own root of
    // p(rho,T) = p: this rules out roots of Eq. 28 outside its region and on
    // the other branch.
    if (!(T >= lo && T <= hi)) return false;
    // (away from the critical point the SR5-05 backward density, which picks
    // the branch by its subregions, is within 1e-3 of it; the two branches
    // are much further apart there)
    if (std::fabs(rho * region3_v_pT(p, T) - 1.0) > 1e-3) return false;
    const Props pr = region3(rho, T);
    if (!(pr.drhodp_T > 0)) return false;
    if (std::fabs(pr.p - p) > 1e-12 * p) return false;
    if (std::fabs(yval(pr, which) - y) > 1e-12 * std::max(1.0, std::fabs(y))) return false;
    out = from_props(pr, p);
    return true;
}

// Region 3 at pressure p on one branch (side, see r3_detail::pT_side) between
// lo and hi in T; rho_ends(): the densities bracketing the state along the
// isobar, for the density fallback (computed only when needed).
template <class RhoEnds>
State solve_region3(double p, double y, Y which, double lo, double hi, double guess, int side,
                    RhoEnds rho_ends) {
    State st;
    if (newton2d_region3(p, y, which, lo, hi, st)) {
        st.phase = from_props(region3(st.rho, st.T), p, side).phase;  // the branch names the phase
        return st;
    }
    try {
        st = solve_T_in_region(p, y, which, 3, lo, hi, guess, side);
        if (reproduces(which == Y::H ? st.h : st.s, y)) return st;
    } catch (const Error&) {
    }
    try {
        const auto ends = rho_ends();
        st = solve_rho_region3(p, y, which, ends.first, ends.second, std::clamp(guess, lo, hi), side);
        if (reproduces(which == Y::H ? st.h : st.s, y)) return st;
        throw Error(ErrorCode::NoConvergence, "no region-3 root");
    } catch (const Error&) {
        // No root in region 3 along this isobar: y lies in the band where the
        // regions meet only within R7-97(2012)'s permitted inconsistencies
        // (Sec. 10, Table 43). The state is the seam point: the end of the
        // region-3 interval whose y is nearer.
        const Props a = r3_detail::pT_side(p, lo, side), b = r3_detail::pT_side(p, hi, side);
        const bool at_hi = std::fabs(yval(b, which) - y) < std::fabs(yval(a, which) - y);
        return from_props(at_hi ? b : a, p, side);
    }
}

double backward_T(double p, double y, Y which, int region) {
    switch (region) {
    case 1: return which == Y::H ? region1_T_ph(p, y) : region1_T_ps(p, y);
    case 2: return which == Y::H ? region2_T_ph(p, y) : region2_T_ps(p, y);
    case 3: return which == Y::H ? region3_T_ph(p, y) : region3_T_ps(p, y);
    default: return nan_v;
    }
}


double top_T(double p) { return p <= p_max5 ? T_max : T_25; }
int top_region(double p) { return p <= p_max5 ? 5 : 2; }

// Vapour-side single phase above T_from (Tsat, B23 or 623.15 K) in regions 2 and 5.
State vapour_25(double p, double y, Y which, double T_from) {
    if (p <= p_max5) {
        const Props r25 = region2(p, T_25);
        if (y > yval(r25, which)) {
            const Props r5 = region5(p, T_25);
            return solve_T_in_region(p, y, which, 5, T_25, T_max,
                                     T_25 + (y - yval(r5, which)) / ydT(r5, which));
        }
    }
    return solve_T_in_region(p, y, which, 2, T_from, T_25, backward_T(p, y, which, 2));
}

}  // namespace

const char* phase_name(Phase phase) {
    switch (phase) {
    case Phase::Liquid: return "liquid";
    case Phase::Vapour: return "vapour";
    case Phase::Supercritical: return "supercritical";
    case Phase::TwoPhase: return "two-phase";
    }
    return "";
}

double saturation_pressure(double T) {
    check_finite("T", Quantity::Temperature, T);
    // IF97's saturation line, Eq. 30, runs from 273.15 K (R7-97(2012) Sec. 8.1);
    // by pressure (saturation_temperature) it starts at the triple-point pressure.
    if (T < T_min || T > Tc)
        throw RangeError("T", Quantity::Temperature, T, T_min, Tc,
                         "(the saturation line of IAPWS-IF97, 273.15 K to the critical point)");
    return T == Tc ? pc : psat(T);
}

double saturation_temperature(double p) {
    check_finite("p", Quantity::Pressure, p);
    if (p < pt || p > pc)
        throw RangeError("p", Quantity::Pressure, p, pt, pc,
                         "(saturation exists from the triple point to the critical point)");
    return p == pc ? Tc : tsat(p);
}

State saturation_T(double T) {
    const double p = saturation_pressure(T);
    return two_phase(sat_pair_T(T), p, T, 0.0);
}

State saturation_p(double p) {
    const double T = saturation_temperature(p);
    return two_phase(sat_pair_T(T), p, T, 0.0);
}

bool critical_singularity(double T, double p, double drhodp_T) noexcept {
    if (!(drhodp_T > 0.0) || !std::isfinite(drhodp_T)) return true;
    return std::fabs(T - Tc) <= 1e-9 * Tc && std::fabs(p - pc) <= 1e-9 * pc;
}

Error critical_singularity_error(const std::string& subject) {
    return Error(ErrorCode::NotDefined,
                 subject + " not defined at the critical point (p = 22.064 MPa, T = 647.096 K) or on the limit of "
                           "stability next to it (saturated states within about 3e-5 K of Tc), where cp and the "
                           "compressibility diverge");
}

State with_quality(const State& sat, double x) {
    check_x(x);
    return two_phase(SatPair{sat.liq, sat.vap}, sat.p, sat.T, x);
}

State state_px(double p, double x) {
    check_x(x);
    return with_quality(saturation_p(p), x);
}

State state_Tx(double T, double x) {
    check_x(x);
    return with_quality(saturation_T(T), x);
}

State state_pT(double p, double T) {
    check_pT(p, T);
    const int r = region_pT(p, T);
    if (r == 0)
        throw Error(ErrorCode::Impossible,
                    "p and T lie exactly on the saturation line, where they do not fix the state; give the "
                    "vapour quality x (STEAM.*.PX / STEAM.*.TX) or h or s instead");
    return from_props(props_region(p, T, r), p);
}

namespace {

State state_py(double p, double y, Y which) {
    check_p(p);
    check_finite(yname(which), yq(which), y);
    const Quantity q = yq(which);
    const char* name = yname(which);
    const double p_dome_min = psat(T_min);  // 611.213 Pa: below it no liquid exists in IF97
    // Range of y at this pressure: 273.15 K .. the top temperature. Checked
    // only on the branches that can reach those ends (liquid: the low end;
    // regions 2 and 5: both ends below 611.213 Pa, the high end otherwise).
    auto check_low = [&] {
        const Props lowest = p >= p_dome_min ? region1(p, T_min) : region2(p, T_min);
        const double ylow = yval(lowest, which);
        if (y < ylow)
            throw RangeError(name, q, y, ylow, none,
                             "at this pressure (colder than 273.15 K, the lower limit of IAPWS-IF97)");
    };
    auto vapour = [&](double T_from) {
        const double yhigh = yval(props_region(p, top_T(p), top_region(p)), which);
        if (y > yhigh)
            throw RangeError(name, q, y, none, yhigh,
                             p <= p_max5
                                 ? "at this pressure (hotter than 2273.15 K, the upper limit of IAPWS-IF97)"
                                 : "at this pressure (hotter than 1073.15 K, the limit of IAPWS-IF97 above 50 MPa)");
        return vapour_25(p, y, which, T_from);
    };
    auto liquid = [&](double T_to) {
        check_low();
        return solve_T_in_region(p, y, which, 1, T_min, T_to, backward_T(p, y, which, 1));
    };

    if (p < p_dome_min) {
        check_low();
        return vapour(T_min);
    }

    if (p < pc) {
        const double Ts = tsat(p);
        const SatPair sp = sat_pair_T(Ts);
        const double yl = yval(sp.liq, which), yv = yval(sp.vap, which);
        // Within rounding (1e-13 of the vapour value) of a saturation value the
        // state is that saturated state: h'(tsat(p)) and h'(T) at p = psat(T)
        // differ in the last bits.
        const double band = 1e-13 * std::fabs(yv);
        if (y >= yl - band && y <= yv + band) {
            const double x = y <= yl + band ? 0.0 : y >= yv - band ? 1.0 : (y - yl) / (yv - yl);
            State st = two_phase(sp, p, Ts, x);
            if (which == Y::H) st.h = y; else st.s = y;
            return st;
        }
        if (y < yl) {  // compressed liquid
            if (Ts <= T_13) return liquid(Ts);
            const Props r13 = region1(p, T_13);
            if (y <= yval(r13, which)) return liquid(T_13);
            // On the liquid branch of Eq. 28 up to Tsat itself.
            return solve_region3(p, y, which, T_13, Ts, backward_T(p, y, which, 3), +1, [&] {
                return std::make_pair(sp.liq.rho, r3_detail::pT_side(p, T_13, +1).rho);
            });
        }
        // superheated vapour
        if (Ts <= T_13) return vapour(Ts);
        const double TB = b23_T(p);
        const Props rb = region2(p, TB);
        if (y < yval(rb, which))
            return solve_region3(p, y, which, Ts, TB, backward_T(p, y, which, 3), -1, [&] {
                return std::make_pair(sp.vap.rho, r3_detail::pT_side(p, TB, -1).rho);
            });
        return vapour(TB);
    }
    // p >= pc: no dome.
    const Props r13 = region1(p, T_13);
    if (y <= yval(r13, which)) return liquid(T_13);
    const double TB = b23_T(p);
    const Props rb = region2(p, TB);
    if (y < yval(rb, which))
        return solve_region3(p, y, which, T_13, TB, backward_T(p, y, which, 3), 0, [&] {
            return std::make_pair(r3_detail::pT_side(p, T_13, 0).rho, r3_detail::pT_side(p, TB, 0).rho);
        });
    return vapour(TB);
}

}  // namespace

State state_ph(double p, double h) { return state_py(p, h, Y::H); }
State state_ps(double p, double s) { return state_py(p, s, Y::S); }

// (h,s): along an isentrope (dh/dp)_s = v > 0 in every phase, so h(p) at
// fixed s is monotonic and continuous: solve state_ps(p, s).h = h for p.
namespace {

bool ps_valid(double p, double s, State& out) {
    try {
        out = state_ps(p, s);
        return true;
    } catch (const RangeError&) {
        return false;
    }
}

// Moves p towards `inside` until state_ps(p,s) is valid (a root on a range
// boundary may sit a few ulps outside it).
double nudge(double p, double inside, double s, State& out) {
    for (int i = 0; i < 64; ++i) {
        if (ps_valid(p, s, out)) return p;
        p += (inside - p) * 1e-14 * (1 << std::min(i, 30));
    }
    throw Error(ErrorCode::NoConvergence, "could not place the entropy s inside the range of IAPWS-IF97");
}

// The pressure interval in which the isentrope s lies inside IAPWS-IF97's
// range, with the states at both ends.
// At 273.15 K liquid water expands on cooling (density maximum above 0 degC
// up to some 20 MPa), so s1(p, 273.15 K) first rises with p, then falls: the
// highest entropy of the 273.15 K isotherm in region 1 and its pressure.
struct ColdTop {
    double p, s;
};
ColdTop cold_top() {
    auto neg_s = [](double p) { return -region1(p, T_min).s; };
    std::uintmax_t it = 200;
    const auto r = boost::math::tools::brent_find_minima(neg_s, psat(T_min), p_max, 40, it);
    return ColdTop{r.first, -r.second};
}

void isentrope_bounds(double s, double h, double& plo, double& phi, State& lo, State& hi) {
    const double p_dome_min = psat(T_min);
    // Lower end: 273.15 K, i.e. the vapour side below 611.213 Pa, the wet
    // isotherm at 611.213 Pa, or cold compressed liquid.
    const double s_vap_min = region2(p_dome_min, T_min).s;
    if (s > s_vap_min) {
        const double p_floor = 1e-12;
        if (region2(p_floor, T_min).s < s)
            throw RangeError("s", Quantity::SpecificEntropy, s, none, region2(p_floor, T_min).s,
                             "(no state of IAPWS-IF97 at a pressure above 1e-6 Pa has so high an entropy)");
        plo = solve_bracket([&](double p) { return region2(p, T_min).s - s; }, p_floor, p_dome_min,
                            "the lowest pressure of this entropy");
    } else if (s >= region1(p_dome_min, T_min).s) {
        plo = p_dome_min;
        static const ColdTop top = cold_top();  // constant, computed once (thread-safe)
        if (s < top.s) {
            // The isentrope leaves IF97's range (T < 273.15 K) between pa and
            // pb: two pieces; h (increasing with p along it) tells which.
            const double pa = solve_bracket([&](double p) { return region1(p, T_min).s - s; }, p_dome_min,
                                            top.p, "the 273.15 K end of this entropy");
            const double ha = region1(pa, T_min).h;
            if (h <= ha * (1 + 1e-12 * (ha > 0 ? 1 : -1)) + 1e-12) {
                phi = pa;
                plo = nudge(plo, phi, s, lo);
                phi = nudge(phi, plo, s, hi);
                return;
            }
            if (region1(p_max, T_min).s > s)
                throw RangeError("h", Quantity::SpecificEnergy, h, none, ha,
                                 "for this entropy (hotter states of this entropy would be colder than 273.15 K)");
            plo = solve_bracket([&](double p) { return region1(p, T_min).s - s; }, top.p, p_max,
                                "the 273.15 K end of this entropy");
        }
    } else {
        // Colder than 0 degC liquid would be needed at low pressure.
        double ta = region1(p_dome_min, T_min).s - s, tb = region1(p_max, T_min).s - s;
        if ((ta > 0) == (tb > 0))
            throw RangeError("s", Quantity::SpecificEntropy, s, std::min(region1(p_dome_min, T_min).s, region1(p_max, T_min).s),
                             none, "(the state would be colder than 273.15 K at every pressure)");
        plo = solve_bracket([&](double p) { return region1(p, T_min).s - s; }, p_dome_min, p_max,
                            "the lowest pressure of this entropy");
    }
    // Upper end: 100 MPa up to 1073.15 K, the 1073.15 K isotherm from 100 to
    // 50 MPa, 50 MPa up to 2273.15 K, then the 2273.15 K isotherm.
    if (s <= region2(p_max, T_25).s) {
        phi = p_max;
    } else if (s <= region2(p_max5, T_25).s) {
        phi = solve_bracket([&](double p) { return region2(p, T_25).s - s; }, p_max5, p_max,
                            "the highest pressure of this entropy");
    } else if (s <= region5(p_max5, T_max).s) {
        phi = p_max5;
    } else {
        phi = solve_bracket([&](double p) { return region5(p, T_max).s - s; }, plo, p_max5,
                            "the highest pressure of this entropy");
    }
    plo = nudge(plo, phi, s, lo);
    phi = nudge(phi, plo, s, hi);
}

// (h,s) in one region on its own equation, near a seam: nested Newton, the
// inner one for T_r(p) from s on region r's equation ((ds/dT)_p = cp/T), the
// outer one for p from h_r(p) = h ((dh/dp)_s = v). Starts at (p0, T0).
// Returns true with the state if it converges to an exact solution (h and s
// within 1e-9) that lies inside region r's own domain.
bool hs_in_region(double h, double s, int r, double p0, double T0, State& out) {
    double p = p0, T = T0;
    Props pr;
    auto T_of_p = [&](double pp) {
        for (int it = 0; it < 30; ++it) {
            pr = props_region(pp, T, r);
            const double step = (pr.s - s) * pr.T / pr.cp;
            if (!std::isfinite(step)) return false;
            T -= step;
            if (std::fabs(step) <= 1e-14 * T) break;
        }
        pr = props_region(pp, T, r);
        return std::isfinite(pr.h);
    };
    // A region-3 h carries the ~1e-13 noise of its density solve: stop when
    // the residual is down to that.
    for (int it = 0; it < 30; ++it) {
        if (!(p > 0.0) || !(p <= p_max * (1 + 1e-9)) || !T_of_p(p)) return false;
        if (std::fabs(pr.h - h) <= 1e-14 * std::max(1.0, std::fabs(h))) break;
        const double step = (pr.h - h) / (pr.v * 1e3);
        if (!std::isfinite(step)) return false;
        p -= step;
        if (std::fabs(step) <= 1e-15 * p) break;
    }
    // Rounding at the 100 MPa limit (a few 1e-12 relative: 1e-13 of h).
    if (p > p_max && p <= p_max * (1 + 1e-11)) p = p_max;
    if (!(p > 0.0) || !(p <= p_max) || !T_of_p(p)) return false;
    if (!reproduces(pr.h, h) || !reproduces(pr.s, s)) return false;
    if (T < T_min || T > top_T(p)) return false;
    if (region_pT(p, T) != r) return false;  // outside this region's domain (or on saturation)
    out = from_props(pr, p);
    return true;
}

// Regions to try for an (h,s) state near a seam, by the region Newton ended in.
// A wet result that does not reproduce h ended on the jump where the dome
// (regions 1/2 below 623.15 K, region 3 above) meets a single phase.
constexpr int kNeighbours[6][3] = {{0, 0, 0}, {1, 3, 0}, {2, 3, 5}, {3, 1, 2}, {2, 3, 1}, {5, 2, 0}};

// Within 1e-9 of the critical pressure (the accuracy to which (h,s) fixes p
// near the critical point) a single-phase state counts as at pc, so that the
// phase (decided by p >= pc) does not hang on the last bits.
State snap_pc(State st) {
    if (st.phase != Phase::TwoPhase && st.p < pc && std::fabs(st.p - pc) <= 1e-9 * pc) {
        st.p = pc;
        st.phase = st.T >= Tc ? Phase::Supercritical : Phase::Liquid;
    }
    return st;
}

}  // namespace

// Fast path of state_hs inside the dome below 623.15 K: a wet state with
// (h,s) lies on the isobar through its saturation temperature T, where
// h = h' + x (h'' - h') with x = (s - s')/(s'' - s'). Newton on T (Boost.Math)
// with the derivative of h' + T (s - s'), v' dps/dT + s - s'(T) (dps/dT by
// Clapeyron from the saturated pair); start
// from SR4-04 Tsat(h,s) where it applies. Accepted only if it converges
// tightly with 0 <= x <= 1.
bool hs_wet(double h, double s, State& out) {
    double guess = s >= 5.210887825 ? tsat_hs(h, s) : 0.5 * (Tt + T_13);
    if (!(guess >= Tt && guess <= T_13)) guess = 0.5 * (Tt + T_13);
    try {
        auto g = [&](double T) {
            const double p = psat(T);
            const Props l = region1(p, T), v = region2(p, T);
            const double dpdT_term = l.v * (v.s - l.s) / (v.v - l.v);
            // Exactly as two_phase() mixes: x from s, then h from x (h'' - h' equals
            // T (s'' - s') only within IF97's inconsistency at the saturation line).
            const double x = (s - l.s) / (v.s - l.s);
            return std::make_pair(l.h + x * (v.h - l.h) - h, dpdT_term + s - l.s);
        };
        std::uintmax_t it = 40;
        const double T = boost::math::tools::newton_raphson_iterate(g, guess, Tt, T_13, kDigits, it);
        if (it >= 40) return false;
        const double p = psat(T);
        const SatPair sp{region1(p, T), region2(p, T)};
        const double x = (s - sp.liq.s) / (sp.vap.s - sp.liq.s);
        if (!(x >= 0.0 && x <= 1.0)) return false;
        State st = two_phase(sp, p, T, x);
        if (std::fabs(st.h - h) > 1e-12 * std::max(1.0, std::fabs(h))) return false;
        st.h = h;
        st.s = s;
        out = st;
        return true;
    } catch (const std::exception&) {
        return false;
    }
}

// Fastest path of state_hs for regions 1, 2 and 5: two-dimensional Newton in
// (p,T) on the Gibbs equation, from the SR2-01 p(h,s) and the R7-97 T(p,h)
// backward values. Derivatives at constant T: (dh/dp)_T = v - T (dv/dT)_p,
// (ds/dp)_T = -(dv/dT)_p, from the Gibbs equation's own derivatives. Accepted
// only if it converges tightly and (p,T) lies in the region whose equation
// was used.
bool hs_gibbs2d(double h, double s, int region, State& out) {
    double p = region == 1 ? region1_p_hs(h, s) : region2_p_hs(h, s);
    if (!(p > 0 && p <= p_max)) return false;
    double T = region == 1 ? region1_T_ph(p, h) : region2_T_ph(p, h);
    if (region == 5) T = std::max(T, T_25);
    if (!(T >= T_min && T <= T_max)) return false;
    for (int it = 0; it < 12; ++it) {
        const Props pr = props_region(p, T, region);
        // (dh/dp)_T = v - T (dv/dT)_p, (ds/dp)_T = -(dv/dT)_p (Maxwell), in kJ/(kg MPa).
        const double h_p = 1e3 * (pr.v - T * pr.dvdT_p), s_p = -1e3 * pr.dvdT_p;
        const double h_T = pr.cp, s_T = pr.cp / T;
        const double f1 = pr.h - h, f2 = pr.s - s;
        const double det = h_p * s_T - h_T * s_p;
        if (!(std::fabs(det) > 0)) return false;
        const double dp = (f1 * s_T - h_T * f2) / det;
        const double dT = (h_p * f2 - s_p * f1) / det;
        p -= dp;
        T -= dT;
        if (!(p > 0 && p <= p_max && T >= T_min - 50 && T <= T_max + 50)) return false;
        if (std::fabs(dp) <= 1e-14 * p && std::fabs(dT) <= 1e-14 * T) break;
    }
    if (!(T >= T_min && T <= T_max)) return false;
    if (region == 1 && T < 300.0) return false;
    try {
        check_pT(p, T);
    } catch (const Error&) {
        return false;
    }
    if (region_pT(p, T) != region) return false;
    const Props pr = props_region(p, T, region);
    if (std::fabs(pr.h - h) > 1e-13 * std::max(1.0, std::fabs(h)) ||
        std::fabs(pr.s - s) > 1e-13 * std::max(1.0, std::fabs(s)))
        return false;
    if (std::fabs(p - pc) <= 1e-9 * pc) return false;  // leave the critical-pressure snap to the slow path
    out = from_props(pr, p);
    return true;
}

// Fast path of state_hs: Newton on p near the backward-equation pressure
// (SR2-01, SR4-04). Returns false (and the caller takes the bounded path) if
// any step leaves IF97's range or the result does not reproduce (h,s).
bool hs_fast(double h, double s, State& out) {
    double guess = std::numeric_limits<double>::quiet_NaN();
    if (s >= 5.3) guess = region2_p_hs(h, s);
    else if (s <= 3.6) guess = region1_p_hs(h, s);
    else guess = region3_p_hs(h, s);
    if (!(guess > pt && guess < p_max)) return false;
    try {
        auto f = [&](double p) {
            const State st = state_ps(p, s);
            return std::make_pair(st.h - h, st.v * 1e3);  // (dh/dp)_s = v; kJ/kg per MPa
        };
        std::uintmax_t it = 40;
        double p = boost::math::tools::newton_raphson_iterate(f, guess, std::max(0.5 * guess, pt),
                                                              std::min(2.0 * guess, p_max), kDigits, it);
        if (it >= 40) return false;
        if (std::fabs(p - pc) <= 1e-9 * pc) p = pc;
        out = state_ps(p, s);
        // Tighter than reproduces(): near the saturation line and the seams a
        // state 1e-9 away may be another phase or region.
        return std::fabs(out.h - h) <= 1e-13 * std::max(1.0, std::fabs(h)) &&
               std::fabs(out.s - s) <= 1e-13 * std::max(1.0, std::fabs(s));
    } catch (const std::exception&) {
        return false;
    }
}

State state_hs(double h, double s) {
    check_finite("h", Quantity::SpecificEnergy, h);
    check_finite("s", Quantity::SpecificEntropy, s);
    {
        State st;
        // Which to try first: the SR4-04 saturation boundary equations say
        // roughly whether (h,s) is wet; each path accepts only an exact state.
        const bool maybe_wet = (s >= 5.85 && s <= 9.155759395 && h < b_h2ab_s(s) * (1 + 1e-3)) ||
                               (s >= 5.210887825 && s < 5.85 && h < b_h2c3b_s(s) * (1 + 1e-3)) ||
                               (s >= -1.545495919e-4 && s <= 3.778281340 && h < b_h1_s(s) * (1 + 1e-3));
        if (maybe_wet && hs_wet(h, s, st)) return st;
        if (s >= 5.3 ? (hs_gibbs2d(h, s, 2, st) || hs_gibbs2d(h, s, 5, st))
                     : (s <= 3.6 && hs_gibbs2d(h, s, 1, st)))
            return st;
        if (hs_fast(h, s, st)) return st;
    }
    double plo, phi;
    State lo, hi;
    isentrope_bounds(s, h, plo, phi, lo, hi);
    // Within rounding of an end of the isentrope: that end.
    const double tol = 1e-12 * std::max(1.0, std::fabs(h));
    if (std::fabs(h - lo.h) <= tol) return snap_pc(lo);
    if (std::fabs(h - hi.h) <= tol) return snap_pc(hi);
    // Beyond an end that lies on a region seam (e.g. 100 MPa at 623.15 K, where
    // state_ps gives region 1 but region 3 has the same entropy at a slightly
    // higher h): the neighbouring region's exact solution at that end.
    if (h < lo.h || h > hi.h) {
        const State& e = h < lo.h ? lo : hi;
        for (int r : kNeighbours[e.region]) {
                State out;
            if (r != 0 && r != e.region && hs_in_region(h, s, r, e.p, e.T, out)) return snap_pc(out);
        }
    }
    if (h < lo.h || h > hi.h)
        throw RangeError("h", Quantity::SpecificEnergy, h, lo.h, hi.h,
                         "for this entropy (the limits of IAPWS-IF97 along this isentrope)");
    // Starting pressure from the backward equations (SR2-01) where they apply.
    double guess = std::sqrt(plo * phi);
    const double g1 = region1_p_hs(h, s), g2 = region2_p_hs(h, s);
    if (s > 5.0 && std::isfinite(g2) && g2 > plo && g2 < phi) guess = g2;
    else if (s < 3.8 && std::isfinite(g1) && g1 > plo && g1 < phi) guess = g1;
    auto f = [&](double p) {
        const State st = state_ps(p, s);
        return std::make_pair(st.h - h, st.v * 1e3);  // (dh/dp)_s = v; kJ/kg per MPa
    };
    double p = solve_newton(f, guess, plo, phi, "p(h,s)");
    // Within 1e-9 of the critical pressure (the accuracy to which (h,s) fixes
    // p near the critical point): the critical pressure, so that the phase
    // (decided by p >= pc) does not hang on the last bits.
    if (std::fabs(p - pc) <= 1e-9 * pc) p = pc;
    const State st = state_ps(p, s);
    if (reproduces(st.h, h) && reproduces(st.s, s)) return st;
    // Near a region seam (623.15 K between 1 and 3, B23 between 2 and 3,
    // 1073.15 K between 2 and 5) h(p) along the isentrope jumps, because the
    // two equations meet only within R7-97(2012)'s permitted inconsistencies
    // (Sec. 10, Tables 43/44), and Newton can end on the seam with no exact
    // root in the region it tried. Solve in each adjacent region on its own
    // equation and return the exact solution.
    for (int r : kNeighbours[st.region]) {
        if (r == 0) continue;
        State out;
        if (hs_in_region(h, s, r, st.p, st.T, out)) return snap_pc(out);
    }
    // A true gap between the regions' images in (h,s): the seam point, which
    // reproduces (h,s) within the permitted inconsistency of the regions.
    return st;
}

double quality(const State& st) {
    if (st.phase == Phase::TwoPhase) return st.x;
    if (st.p >= pc || st.p < pt)
        throw Error(ErrorCode::NotDefined,
                    "vapour quality is not defined for this state: it exists only below the critical pressure "
                    "(22.064 MPa) and above the triple-point pressure (611.657 Pa)");
    const State sat = saturation_p(st.p);
    return (st.h - sat.liq.h) / (sat.vap.h - sat.liq.h);
}

// ---- Metastable vapour, R7-97(2012) Section 6.2 -------------------------------

namespace {

void check_p_metastable(double p) {
    check_finite("p", Quantity::Pressure, p);
    if (!(p >= pt && p <= p_max_metastable))
        throw RangeError("p", Quantity::Pressure, p, pt, p_max_metastable,
                         "(the metastable-vapour equation of IAPWS-IF97, Eq. 18, is valid from the triple-point "
                         "pressure to 10 MPa)");
}

const char* const metastable_context =
    "(the metastable-vapour region of IAPWS-IF97 Eq. 18 at this pressure: from the 5 % equilibrium-moisture "
    "line to the saturated-vapour line; above the saturation temperature the vapour is stable, use the "
    "ordinary functions)";

State metastable_state(double p, double T) {
    State st = from_props(region2_metastable(p, T), p);
    st.metastable = true;
    return st;
}

}  // namespace

MetastableLimits metastable_limits(double p) {
    check_p_metastable(p);
    const double Ts = tsat(p);  // p <= 10 MPa: Ts <= 584.15 K, regions 1 and 2 at saturation
    const double hf = region1(p, Ts).h, hg = region2(p, Ts).h;
    const double h95 = hf + 0.95 * (hg - hf);  // the 5 % equilibrium-moisture line
    const auto f = [&](double T) { return region2_metastable(p, T).h - h95; };
    // Bracket the 5 % line below Ts by steps of 5 K (h of Eq. 18 rises with T).
    double hi = Ts, lo = Ts - 5.0;
    while (f(lo) > 0.0) {
        hi = lo;
        lo -= 5.0;
        if (lo < 100.0) throw Error(ErrorCode::NoConvergence, "no 5 % equilibrium-moisture line found");
    }
    MetastableLimits m;
    m.T_low = solve_bracket(f, lo, hi, "the 5 % equilibrium-moisture line");
    m.T_high = Ts;
    const Props a = region2_metastable(p, m.T_low), b = region2_metastable(p, Ts);
    m.h_low = a.h;
    m.h_high = b.h;
    m.s_low = a.s;
    m.s_high = b.s;
    return m;
}

State state_pT_metastable(double p, double T) {
    check_p_metastable(p);
    check_finite("T", Quantity::Temperature, T);
    // Quick acceptance without solving for the 5 % line: T <= Ts and the
    // equilibrium quality from Eq. 18's h at least 0.95.
    const double Ts = tsat(p);
    if (T > 0.0 && T <= Ts) {
        const State st = metastable_state(p, T);
        const double hf = region1(p, Ts).h, hg = region2(p, Ts).h;
        if ((st.h - hf) / (hg - hf) >= 0.95) return st;
    }
    // Otherwise the limits decide (T on the computed 5 % line itself passes).
    const MetastableLimits m = metastable_limits(p);
    if (T >= m.T_low && T <= m.T_high) return metastable_state(p, T);
    throw RangeError("T", Quantity::Temperature, T, m.T_low, m.T_high, metastable_context);
}

namespace {

State metastable_py(double p, double y, Y which) {
    check_p_metastable(p);
    check_finite(yname(which), yq(which), y);
    const MetastableLimits m = metastable_limits(p);
    const double ylo = which == Y::H ? m.h_low : m.s_low, yhi = which == Y::H ? m.h_high : m.s_high;
    if (!(y >= ylo && y <= yhi)) throw RangeError(yname(which), yq(which), y, ylo, yhi, metastable_context);
    const auto f = [&](double T) {
        const Props pr = region2_metastable(p, T);
        return std::make_pair(yval(pr, which) - y, ydT(pr, which));
    };
    const double guess = m.T_low + (m.T_high - m.T_low) * (y - ylo) / (yhi - ylo);
    const double T = solve_newton(f, guess, m.T_low, m.T_high, "the metastable-vapour temperature");
    return metastable_state(p, T);
}

}  // namespace

State state_ph_metastable(double p, double h) { return metastable_py(p, h, Y::H); }
State state_ps_metastable(double p, double s) { return metastable_py(p, s, Y::S); }

}  // namespace isentra
