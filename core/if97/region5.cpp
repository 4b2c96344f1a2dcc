// SPDX-License-Identifier: MPL-2.0
// IAPWS-IF97 region 5, basic equation: R7-97(2012) Eq. (32) (ideal part
// Eq. (33), Table 37; residual part Eq. (34), Table 38 with the 2007
// coefficients of this revision). Property relations Table 39, derivatives
// Tables 40, 41.
#include <cmath>

#include "forward_detail.hpp"
#include "isentra/if97/if97.hpp"

namespace isentra::if97 {
namespace {

constexpr double Tstar = 1000.0;  // K; p* = 1 MPa

// R7-97(2012) Table 37.
constexpr int kNo = 6;
constexpr int Jo[kNo] = {0, 1, -3, -2, -1, 2};
constexpr double no[kNo] = {-0.13179983674201e2, 0.68540841634434e1, -0.24805148933466e-1,
                            0.36901534980333,    -0.31161318213925e1, -0.32961626538917};

// R7-97(2012) Table 38.
constexpr int kNr = 6;
constexpr int Ir[kNr] = {1, 1, 1, 2, 2, 3};
constexpr int Jr[kNr] = {1, 2, 3, 3, 9, 7};
constexpr double nr[kNr] = {0.15736404855259e-2, 0.90153761673944e-3, -0.50270077677648e-2,
                            0.22440037409485e-5, -0.41163275453471e-5, 0.37919454822955e-7};

}  // namespace

Props region5(double p, double T) {
    const double pi = p;
    const double tau = Tstar / T;
    detail::GibbsSplit g;

    // Ideal part (Table 40).
    {
        const double it = 1.0 / tau;
        const double it2 = it * it;
        const double tp[kNo] = {1.0, tau, it2 * it, it2, it, tau * tau};
        detail::ideal_gas_part(pi, tau, no, Jo, tp, kNo, g);
    }
    // Residual part (Table 41); pi > 0, tau > 0.
    {
        const double pp[4] = {1.0, pi, pi * pi, pi * pi * pi};
        double tp[10];
        detail::powers<10>(tau, tp);
        double s = 0, sI = 0, sII = 0, sJ = 0, sJJ = 0, sIJ = 0;
        for (int i = 0; i < kNr; ++i) {
            const double t = nr[i] * pp[Ir[i]] * tp[Jr[i]];
            const double dI = Ir[i], dJ = Jr[i];
            s += t;
            sI += dI * t;
            sII += dI * (dI - 1.0) * t;
            sJ += dJ * t;
            sJJ += dJ * (dJ - 1.0) * t;
            sIJ += dI * dJ * t;
        }
        const double ipi = 1.0 / pi, it = 1.0 / tau;
        g.gr = s;
        g.gr_p = sI * ipi;
        g.gr_pp = sII * ipi * ipi;
        g.gr_t = sJ * it;
        g.gr_tt = sJJ * it * it;
        g.gr_pt = sIJ * ipi * it;
    }
    return detail::props_from_gibbs_split(p, T, pi, tau, g, 5);
}

}  // namespace isentra::if97
