// SPDX-License-Identifier: MPL-2.0
// Internal helpers shared by the IF97 basic (forward) equations
// (core/if97/region*.cpp). Not a public header.
#pragma once

#include <cmath>

#include "isentra/if97/if97.hpp"

namespace isentra::if97::detail {

// out[k] = x^k for k = 0..N-1, by products with a short dependency chain
// (x^k = x^(k/2) * x^(k - k/2)), no std::pow.
template <int N>
inline void powers(double x, double* out) {
    out[0] = 1.0;
    if constexpr (N > 1) out[1] = x;
#pragma GCC unroll 64
    for (int k = 2; k < N; ++k) out[k] = out[k >> 1] * out[k - (k >> 1)];
}

// at0[-k] = ix^k for k = 0..N-1 (negative powers of x when ix = 1/x).
template <int N>
inline void powers_down(double ix, double* at0) {
    at0[0] = 1.0;
    if constexpr (N > 1) at0[-1] = ix;
#pragma GCC unroll 64
    for (int k = 2; k < N; ++k) at0[-k] = at0[-(k >> 1)] * at0[-(k - (k >> 1))];
}

// ---- Sums of n_i x^I_i y^J_i with all first and second derivatives --------
//
// The terms of a table (sorted by I) are grouped by equal I. Within a group
// only y-powers vary, so per term we need three products and three sums; the
// factor x^I and the I-weights are applied once per group. The y-powers are
// looked up in a caller-supplied array through per-term indices, which lets
// the caller choose between
//   * "divide at the end": all three indices point at y^J, the J-weighted sums
//     are then divided by y (or y^2) by the caller (y must not vanish), and
//   * "tabulated": the indices point at y^J, y^(J-1), y^(J-2) (clamped at 0
//     where the weight J or J(J-1) is zero), giving the derivatives directly.
// The x-derivatives always come out multiplied by x (x > 0 or x != 0 in use).
template <int N, int G>
struct GroupedTerms {
    double n[N] = {}, nJ[N] = {}, nJJ[N] = {};  // n, n*J, n*J*(J-1)
    int iT[N] = {}, iH[N] = {}, iK[N] = {};     // y-power indices for the three sums
    int gI[G] = {};                             // exponent I of each group
    int gEnd[G] = {};                           // one past the group's last term
    double wI[G] = {}, wII[G] = {};             // I and I*(I-1) of each group
};

template <int N>
constexpr bool sorted_by_I(const int (&I)[N]) {
    for (int i = 1; i < N; ++i)
        if (I[i] < I[i - 1]) return false;
    return true;
}

template <int N>
constexpr int count_groups(const int (&I)[N]) {
    int g = 1;
    for (int i = 1; i < N; ++i)
        if (I[i] != I[i - 1]) ++g;
    return g;
}

// offset: index of y^0 in the power array (for negative J).
// tabulated: choose y^(J-1), y^(J-2) for the J-weighted sums.
template <int N, int G>
constexpr GroupedTerms<N, G> make_grouped(const int (&I)[N], const int (&J)[N],
                                          const double (&n)[N], int offset, bool tabulated) {
    GroupedTerms<N, G> t;
    int g = -1;
    for (int i = 0; i < N; ++i) {
        if (i == 0 || I[i] != I[i - 1]) {
            ++g;
            t.gI[g] = I[i];
            t.wI[g] = I[i];
            t.wII[g] = double(I[i]) * double(I[i] - 1);
        }
        t.gEnd[g] = i + 1;
        const double dJ = J[i];
        t.n[i] = n[i];
        t.nJ[i] = n[i] * dJ;
        t.nJJ[i] = n[i] * dJ * (dJ - 1.0);
        t.iT[i] = J[i] + offset;
        if (tabulated) {
            t.iH[i] = J[i] >= 1 ? J[i] - 1 + offset : offset;
            t.iK[i] = J[i] >= 2 ? J[i] - 2 + offset : offset;
        } else {
            t.iH[i] = t.iT[i];
            t.iK[i] = t.iT[i];
        }
    }
    return t;
}

struct Sums {
    double s = 0;    // sum t_i,           t_i = n_i x^I y^J
    double sI = 0;   // sum I t_i          (= x * d/dx)
    double sII = 0;  // sum I(I-1) t_i     (= x^2 * d2/dx2)
    double sJ = 0;   // sum J t_i / y^(0 or 1)
    double sJJ = 0;  // sum J(J-1) t_i / y^(0 or 2)
    double sIJ = 0;  // sum I J t_i / y^(0 or 1)
};

// xp: x^k for k = 0..max I; yp: y-powers addressed by the table's indices.
template <int N, int G>
inline Sums eval_grouped(const GroupedTerms<N, G>& t, const double* xp, const double* yp) {
    Sums r;
    int i = 0;
#pragma GCC unroll 64
    for (int g = 0; g < G; ++g) {
        double a = 0, b = 0, c = 0;
#pragma GCC unroll 64
        for (; i < t.gEnd[g]; ++i) {
            a += t.n[i] * yp[t.iT[i]];
            b += t.nJ[i] * yp[t.iH[i]];
            c += t.nJJ[i] * yp[t.iK[i]];
        }
        const double P = xp[t.gI[g]];
        const double Pa = P * a, Pb = P * b;
        r.s += Pa;
        r.sI += t.wI[g] * Pa;
        r.sII += t.wII[g] * Pa;
        r.sJ += Pb;
        r.sJJ += P * c;
        r.sIJ += t.wI[g] * Pb;
    }
    return r;
}

// ---- Gibbs equations with ideal-gas and residual parts --------------------

// Dimensionless Gibbs free energy split into ideal-gas part (o) and
// residual part (r), with the derivatives that R7-97(2012) Tables 12 and 39
// need. The ideal part's pi-derivatives are 1/pi, -1/pi^2, 0 and are not stored.
struct GibbsSplit {
    double go, go_t, go_tt;                      // ideal part, tau-derivatives
    double gr, gr_p, gr_pp, gr_t, gr_tt, gr_pt;  // residual part
};

// The ideal-gas part gamma^o = ln(pi) + sum n_i tau^J_i of regions 2 and 5
// (R7-97(2012) Eqs. 16 and 33) and its tau-derivatives; tp[i] = tau^J_i.
// Weighted sums divided by tau once (tau > 0).
inline void ideal_gas_part(double pi, double tau, const double* n, const int* J, const double* tp, int k,
                           GibbsSplit& g) {
    double s = 0, sJ = 0, sJJ = 0;
    for (int i = 0; i < k; ++i) {
        const double t = n[i] * tp[i];
        const double dJ = J[i];
        s += t;
        sJ += dJ * t;
        sJJ += dJ * (dJ - 1.0) * t;
    }
    const double it = 1.0 / tau;
    const double it2 = it * it;
    g.go = std::log(pi) + s;
    g.go_t = sJ * it;
    g.go_tt = sJJ * it2;
}

// Properties from Eq. (15)/(18)/(32) by the relations of R7-97(2012)
// Table 12 (regions 2, metastable vapour) and Table 39 (region 5), which are
// identical. p in MPa, T in K; pi = p/p*, tau = T*/T of the equation.
inline Props props_from_gibbs_split(double p, double T, double pi, double tau,
                                    const GibbsSplit& g, int region) {
    Props r;
    r.T = T;
    r.p = p;
    r.region = region;
    const double RT = R * T;                      // kJ/kg
    const double pgp = pi * g.gr_p;               // pi * gamma^r_pi
    const double one_pgp = 1.0 + pgp;             // pi * gamma_pi
    const double ppgpp = 1.0 - pi * pi * g.gr_pp; // -pi^2 * gamma_pipi
    const double gt = g.go_t + g.gr_t;
    const double gtt = g.go_tt + g.gr_tt;
    const double x = 1.0 + pgp - tau * pi * g.gr_pt;  // pi*(gamma_pi - tau*gamma_pitau)
    // v p/(RT) = pi (gamma^o_pi + gamma^r_pi); RT/p in kJ/(kg MPa) = 1e-3 m3/kg.
    r.v = 1e-3 * RT * one_pgp / p;
    r.rho = 1.0 / r.v;
    r.h = RT * tau * gt;
    r.u = RT * (tau * gt - one_pgp);
    r.s = R * (tau * gt - (g.go + g.gr));
    r.cp = -R * tau * tau * gtt;
    r.cv = R * (-tau * tau * gtt - x * x / ppgpp);
    // w^2/(RT) with RT in J/kg.
    const double w2 = 1e3 * RT * one_pgp * one_pgp / (ppgpp + x * x / (tau * tau * gtt));
    r.w = std::sqrt(w2);
    // (dv/dp)_T = -(RT/p^2)(1 - pi^2 gamma^r_pipi) * 1e-3; drho/dp = -rho^2 dv/dp.
    r.drhodp_T = r.rho * r.rho * 1e-3 * RT * ppgpp / (p * p);
    // (dv/dT)_p = (R/p) pi (gamma_pi - tau gamma_pitau) = (R/p) x.
    r.dvdT_p = 1e-3 * R * x / p;
    return r;
}

}  // namespace isentra::if97::detail
