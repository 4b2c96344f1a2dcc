// SPDX-License-Identifier: MPL-2.0
// IAPWS-IF97 region 3, basic equation: R7-97(2012) Eq. (28) (dimensionless
// Helmholtz free energy), coefficients Table 30, property relations Table 31,
// derivatives Table 32.
#include <cmath>

#include "forward_detail.hpp"
#include "isentra/if97/if97.hpp"

namespace isentra::if97 {
namespace {

// R7-97(2012) Table 30. n1 multiplies ln(delta); terms i = 2..40 below.
constexpr double n3_1 = 0.10658070028513e1;
constexpr int kN = 39;
constexpr int I3[kN] = {0, 0, 0, 0, 0, 0, 0, 1, 1, 1, 1, 2, 2, 2, 2, 2, 2, 3, 3, 3,
                        3, 3, 4, 4, 4, 4, 5, 5, 5, 6, 6, 6, 7, 8, 9, 9, 10, 10, 11};
constexpr int J3[kN] = {0, 1, 2, 7, 10, 12, 23, 2, 6, 15, 17, 0, 2, 6, 7, 22, 26, 0, 2, 4,
                        16, 26, 0, 2, 4, 26, 1, 3, 26, 0, 2, 26, 2, 26, 2, 26, 0, 1, 26};
constexpr double n3[kN] = {
    -0.15732845290239e2,  0.20944396974307e2,  -0.76867707878716e1,  0.26185947787954e1,
    -0.28080781148620e1,  0.12053369696517e1,  -0.84566812812502e-2, -0.12654315477714e1,
    -0.11524407806681e1,  0.88521043984318,    -0.64207765181607,    0.38493460186671,
    -0.85214708824206,    0.48972281541877e1,  -0.30502617256965e1,  0.39420536879154e-1,
    0.12558408424308,     -0.27999329698710,   0.13899799569460e1,   -0.20189915023570e1,
    -0.82147637173963e-2, -0.47596035734923,   0.43984074473500e-1,  -0.44476435428739,
    0.90572070719733,     0.70522450087967,    0.10770512626332,     -0.32913623258954,
    -0.50871062041158,    -0.22175400873096e-1, 0.94260751665092e-1, 0.16436278447961,
    -0.13503372241348e-1, -0.14834345352472e-1, 0.57922953628084e-3, 0.32308904703711e-2,
    0.80964802996215e-4,  -0.16557679795037e-3, -0.44923899061815e-4};

constexpr int kImax = 11;
constexpr int kJmax = 26;
constexpr int kGroups = detail::count_groups(I3);
constexpr auto kTerms = detail::make_grouped<kN, kGroups>(I3, J3, n3, 0, false);

static_assert(detail::sorted_by_I(I3), "terms must be sorted by I");

}  // namespace

Props region3(double rho, double T) {
    const double delta = rho / rhoc;
    const double tau = Tc / T;
    double dp[kImax + 1];
    double tp[kJmax + 1];
    detail::powers<kImax + 1>(delta, dp);
    detail::powers<kJmax + 1>(tau, tp);

    // Weighted sums of t_i = n_i delta^I tau^J: delta and tau times the
    // derivatives of Table 32 (delta, tau > 0).
    const detail::Sums S = detail::eval_grouped(kTerms, dp, tp);
    const double f = S.s, sI = S.sI, sII = S.sII, sJ = S.sJ, sJJ = S.sJJ, sIJ = S.sIJ;
    // delta*phi_delta, delta^2*phi_deltadelta, tau*phi_tau, tau^2*phi_tautau,
    // delta*tau*phi_deltatau.
    const double dfd = n3_1 + sI;
    const double d2fdd = -n3_1 + sII;
    const double tft = sJ;
    const double t2ftt = sJJ;
    const double dtfdt = sIJ;
    const double phi = n3_1 * std::log(delta) + f;

    // Table 31.
    Props r;
    r.T = T;
    r.rho = rho;
    r.v = 1.0 / rho;
    r.region = 3;
    const double RT = R * T;                 // kJ/kg
    r.p = 1e-3 * rho * RT * dfd;             // rho*R*T in kPa
    r.u = RT * tft;
    r.s = R * (tft - phi);
    r.h = RT * (tft + dfd);
    r.cv = -R * t2ftt;
    const double x = dfd - dtfdt;            // delta*phi_delta - delta*tau*phi_deltatau
    const double y = 2.0 * dfd + d2fdd;      // 2 delta phi_delta + delta^2 phi_deltadelta
    r.cp = R * (-t2ftt + x * x / y);
    r.w = std::sqrt(1e3 * RT * (y - x * x / t2ftt));
    // (dp/drho)_T = RT (2 delta phi_delta + delta^2 phi_deltadelta), in MPa per kg/m3.
    r.drhodp_T = 1e3 / (RT * y);
    // (dp/dT)_rho = rho R x; (dv/dT)_p = (dp/dT)_rho (d rho/d p)_T / rho^2.
    r.dvdT_p = 1e-3 * R * x * r.drhodp_T / rho;
    return r;
}

double region3_p(double rho, double T) {
    const double delta = rho / rhoc;
    const double tau = Tc / T;
    double dp[kImax + 1];
    double tp[kJmax + 1];
    detail::powers<kImax + 1>(delta, dp);
    detail::powers<kJmax + 1>(tau, tp);
    // delta*phi_delta = n1 + sum_i I_i n_i delta^I tau^J (Table 32), grouped by I.
    double sI = 0;
    int i = 0;
#pragma GCC unroll 64
    for (int g = 0; g < kGroups; ++g) {
        double a = 0;
#pragma GCC unroll 64
        for (; i < kTerms.gEnd[g]; ++i) a += kTerms.n[i] * tp[kTerms.iT[i]];
        sI += kTerms.wI[g] * dp[kTerms.gI[g]] * a;
    }
    return 1e-3 * rho * R * T * (n3_1 + sI);
}

}  // namespace isentra::if97
