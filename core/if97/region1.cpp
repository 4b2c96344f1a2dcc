// SPDX-License-Identifier: MPL-2.0
// IAPWS-IF97 region 1, basic equation: R7-97(2012) Eq. (7), coefficients
// Table 2, property relations Table 3, derivatives Table 4.
#include <cmath>

#include "forward_detail.hpp"
#include "isentra/if97/if97.hpp"

namespace isentra::if97 {
namespace {

// R7-97(2012) Table 2.
constexpr int kN = 34;
constexpr int I1[kN] = {0, 0, 0, 0, 0, 0, 0, 0, 1, 1, 1, 1, 1, 1, 2, 2, 2,
                        2, 2, 3, 3, 3, 4, 4, 4, 5, 8, 8, 21, 23, 29, 30, 31, 32};
constexpr int J1[kN] = {-2, -1, 0, 1, 2, 3, 4, 5, -9, -7, -1, 0, 1, 3, -3, 0, 1,
                        3, 17, -4, 0, 6, -5, -2, 10, -8, -11, -6, -29, -31, -38, -39, -40, -41};
constexpr double n1[kN] = {
    0.14632971213167,     -0.84548187169114,    -0.37563603672040e1,  0.33855169168385e1,
    -0.95791963387872,    0.15772038513228,     -0.16616417199501e-1, 0.81214629983568e-3,
    0.28319080123804e-3,  -0.60706301565874e-3, -0.18990068218419e-1, -0.32529748770505e-1,
    -0.21841717175414e-1, -0.52838357969930e-4, -0.47184321073267e-3, -0.30001780793026e-3,
    0.47661393906987e-4,  -0.44141845330846e-5, -0.72694996297594e-15, -0.31679644845054e-4,
    -0.28270797985312e-5, -0.85205128120103e-9, -0.22425281908000e-5, -0.65171222895601e-6,
    -0.14341729937924e-12, -0.40516996860117e-6, -0.12734301741641e-8, -0.17424871230634e-9,
    -0.68762131295531e-18, 0.14478307828521e-19, 0.26335781662795e-22, -0.11947622640071e-22,
    0.18228094581404e-23, -0.93537087292458e-25};

constexpr double pstar = 16.53;  // MPa
constexpr double Tstar = 1386.0; // K
constexpr int kJmin = -41;       // smallest J in Table 2
constexpr int kJmax = 17;        // largest J
constexpr int kImax = 32;        // largest I

// Terms grouped by I; tau-powers addressed with offset -kJmin (negative J).
constexpr int kG = detail::count_groups(I1);
constexpr auto kTerms = detail::make_grouped<kN, kG>(I1, J1, n1, -kJmin, false);

static_assert(detail::sorted_by_I(I1), "terms must be sorted by I");

}  // namespace

Props region1(double p, double T) {
    const double pi = p / pstar;
    const double tau = Tstar / T;
    const double a = 7.1 - pi;
    const double b = tau - 1.222;

    double ap[kImax + 1];
    detail::powers<kImax + 1>(a, ap);
    double bp[kJmax - kJmin + 1];  // b^-41 .. b^17, b^0 at index 41
    detail::powers<kJmax + 1>(b, bp - kJmin);
    const double ib = 1.0 / b;
    detail::powers_down<-kJmin + 1>(ib, bp - kJmin);

    // Weighted sums of t_i = n_i a^I b^J (Table 4); the derivatives follow by
    // dividing by a and b once (a >= 1.05 and b >= 1.0 in the range of validity).
    const detail::Sums S = detail::eval_grouped(kTerms, ap, bp);
    const double ia = 1.0 / a;
    const double g = S.s;
    const double gp = -S.sI * ia;
    const double gpp = S.sII * ia * ia;
    const double gt = S.sJ * ib;
    const double gtt = S.sJJ * ib * ib;
    const double gpt = -S.sIJ * ia * ib;

    // Table 3.
    Props r;
    r.T = T;
    r.p = p;
    r.region = 1;
    const double RT = R * T;
    r.v = 1e-3 * RT * pi * gp / p;  // RT/p in kJ/(kg MPa) = 1e-3 m3/kg
    r.rho = 1.0 / r.v;
    r.h = RT * tau * gt;
    r.u = RT * (tau * gt - pi * gp);
    r.s = R * (tau * gt - g);
    r.cp = -R * tau * tau * gtt;
    const double x = gp - tau * gpt;
    r.cv = R * (-tau * tau * gtt + x * x / gpp);
    r.w = std::sqrt(1e3 * RT * gp * gp / (x * x / (tau * tau * gtt) - gpp));
    // v = (RT/p*) gamma_pi -> (dv/dp)_T = (RT/p*^2) gamma_pipi.
    r.drhodp_T = -r.rho * r.rho * 1e-3 * RT * gpp / (pstar * pstar);
    // (dv/dT)_p = (R/p*)(gamma_pi - tau gamma_pitau) = (R pi / p) x.
    r.dvdT_p = 1e-3 * R * pi * x / p;
    return r;
}

}  // namespace isentra::if97
