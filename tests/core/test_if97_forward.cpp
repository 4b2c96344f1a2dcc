// SPDX-License-Identifier: MPL-2.0
// Tests of the IAPWS-IF97 basic (forward) equations: regions 1, 2, 3, 5, the
// metastable-vapour equation, the saturation line and the B23 boundary.
// Check values are the computer-program verification values of
// IAPWS R7-97(2012), read on the rendered pages of the release.
#include <gtest/gtest.h>

#include <cmath>
#include <functional>

#include "isentra/if97/if97.hpp"

namespace if97 = isentra::if97;

namespace {

// |a - b| <= rel * |b|; the release prints 9 significant digits.
::testing::AssertionResult RelNear(double a, double b, double rel = 1e-8) {
    if (std::fabs(a - b) <= rel * std::fabs(b)) return ::testing::AssertionSuccess();
    return ::testing::AssertionFailure()
           << "got " << a << ", expected " << b << " (rel. dev. "
           << (b != 0 ? std::fabs(a - b) / std::fabs(b) : std::fabs(a - b)) << " > " << rel
           << ")";
}

struct GibbsCheck {
    double T, p;                // inputs
    double v, h, u, s, cp, w;   // release values
};

void CheckGibbsRow(const if97::Props& r, const GibbsCheck& c, int region) {
    SCOPED_TRACE("T = " + std::to_string(c.T) + " K, p = " + std::to_string(c.p) + " MPa");
    EXPECT_EQ(r.region, region);
    EXPECT_DOUBLE_EQ(r.T, c.T);
    EXPECT_DOUBLE_EQ(r.p, c.p);
    EXPECT_TRUE(RelNear(r.v, c.v));
    EXPECT_TRUE(RelNear(r.rho, 1.0 / c.v));
    EXPECT_TRUE(RelNear(r.h, c.h));
    EXPECT_TRUE(RelNear(r.u, c.u));
    EXPECT_TRUE(RelNear(r.s, c.s));
    EXPECT_TRUE(RelNear(r.cp, c.cp));
    EXPECT_TRUE(RelNear(r.w, c.w));
    EXPECT_GT(r.cv, 0.0);
    EXPECT_GT(r.drhodp_T, 0.0);
}

// Central difference of rho(p) at constant T for a Gibbs-form equation.
double FdDrhodp(const std::function<if97::Props(double, double)>& f, double p, double T) {
    const double dp = 1e-4 * p;
    return (f(p + dp, T).rho - f(p - dp, T).rho) / (2.0 * dp);
}

}  // namespace

// ---- Region 1 -------------------------------------------------------------
TEST(IF97ForwardRegion1, Table5) {
    // IAPWS R7-97(2012) Table 5.
    const GibbsCheck rows[] = {
        {300.0, 3.0, 0.100215168e-2, 0.115331273e3, 0.112324818e3, 0.392294792,
         0.417301218e1, 0.150773921e4},
        {300.0, 80.0, 0.971180894e-3, 0.184142828e3, 0.106448356e3, 0.368563852,
         0.401008987e1, 0.163469054e4},
        {500.0, 3.0, 0.120241800e-2, 0.975542239e3, 0.971934985e3, 0.258041912e1,
         0.465580682e1, 0.124071337e4},
    };
    for (const auto& c : rows) CheckGibbsRow(if97::region1(c.p, c.T), c, 1);
}

TEST(IF97ForwardRegion1, CvAndDrhodpOracle) {
    // python3-iapws 1.5.2 (Debian): cv, and drho/dp = rho * kt.
    EXPECT_TRUE(RelNear(if97::region1(3, 300).cv, 4.12120160359, 1e-10));
    EXPECT_TRUE(RelNear(if97::region1(3, 500).cv, 3.22139222903, 1e-10));
    EXPECT_TRUE(RelNear(if97::region1(3, 300).drhodp_T, 0.445423713646, 1e-10));
    EXPECT_TRUE(RelNear(if97::region1(3, 500).drhodp_T, 0.938876392265, 1e-10));
}

TEST(IF97ForwardRegion1, DrhodpFiniteDifference) {
    // Consistency of drhodp_T with rho(p) of Eq. (7) itself (common practice).
    for (double T : {280.0, 300.0, 450.0, 600.0})
        for (double p : {1.0, 20.0, 90.0}) {
            if (p < if97::psat(T)) continue;
            EXPECT_TRUE(RelNear(if97::region1(p, T).drhodp_T, FdDrhodp(if97::region1, p, T), 1e-6))
                << "T=" << T << " p=" << p;
        }
}

// ---- Region 2 -------------------------------------------------------------
TEST(IF97ForwardRegion2, Table15) {
    // IAPWS R7-97(2012) Table 15.
    const GibbsCheck rows[] = {
        {300.0, 0.0035, 0.394913866e2, 0.254991145e4, 0.241169160e4, 0.852238967e1,
         0.191300162e1, 0.427920172e3},
        {700.0, 0.0035, 0.923015898e2, 0.333568375e4, 0.301262819e4, 0.101749996e2,
         0.208141274e1, 0.644289068e3},
        {700.0, 30.0, 0.542946619e-2, 0.263149474e4, 0.246861076e4, 0.517540298e1,
         0.103505092e2, 0.480386523e3},
    };
    for (const auto& c : rows) CheckGibbsRow(if97::region2(c.p, c.T), c, 2);
}

TEST(IF97ForwardRegion2, CvAndDrhodpOracle) {
    // python3-iapws 1.5.2 (Debian): cv, and drho/dp = rho * kt.
    EXPECT_TRUE(RelNear(if97::region2(30, 700).cv, 2.97553836891, 1e-10));
    EXPECT_TRUE(RelNear(if97::region2(0.0035, 300).cv, 1.44132661897, 1e-10));
    EXPECT_TRUE(RelNear(if97::region2(30, 700).drhodp_T, 15.0735147761, 1e-10));
    EXPECT_TRUE(RelNear(if97::region2(0.0035, 300).drhodp_T, 7.24815398399, 1e-10));
}

TEST(IF97ForwardRegion2, DrhodpFiniteDifference) {
    // common practice
    for (double T : {300.0, 500.0, 700.0, 1000.0, 1073.15})
        for (double p : {0.0035, 0.1, 5.0, 30.0, 90.0}) {
            if (T < 623.15 && p > if97::psat(T)) continue;
            if (T >= 623.15 && T < 863.15 && p > if97::b23_p(T)) continue;
            EXPECT_TRUE(RelNear(if97::region2(p, T).drhodp_T, FdDrhodp(if97::region2, p, T), 1e-6))
                << "T=" << T << " p=" << p;
        }
}

TEST(IF97ForwardRegion2, FiniteAtT1080) {
    // tau - 0.5 = 0 at T = 1080 K: the powers are tabulated, so the equation
    // stays finite there (common practice).
    const auto r = if97::region2(10.0, 1080.0);
    EXPECT_TRUE(std::isfinite(r.h));
    EXPECT_TRUE(std::isfinite(r.cp));
    EXPECT_TRUE(std::isfinite(r.w));
    EXPECT_TRUE(std::isfinite(r.drhodp_T));
}

// ---- Metastable vapour (Eq. 18) ---------------------------------------------
TEST(IF97ForwardRegion2Metastable, Table18) {
    // IAPWS R7-97(2012) Table 18.
    const GibbsCheck rows[] = {
        {450.0, 1.0, 0.192516540, 0.276881115e4, 0.257629461e4, 0.656660377e1,
         0.276349265e1, 0.498408101e3},
        {440.0, 1.0, 0.186212297, 0.274015123e4, 0.255393894e4, 0.650218759e1,
         0.298166443e1, 0.489363295e3},
        {450.0, 1.5, 0.121685206, 0.272134539e4, 0.253881758e4, 0.629170440e1,
         0.362795578e1, 0.481941819e3},
    };
    for (const auto& c : rows) CheckGibbsRow(if97::region2_metastable(c.p, c.T), c, 2);
}

TEST(IF97ForwardRegion2Metastable, DrhodpFiniteDifference) {
    // common practice
    for (double T : {420.0, 450.0, 550.0})
        for (double p : {0.5, 1.0, 1.5}) {
            EXPECT_TRUE(RelNear(if97::region2_metastable(p, T).drhodp_T,
                                FdDrhodp(if97::region2_metastable, p, T), 1e-6))
                << "T=" << T << " p=" << p;
        }
}

// ---- Region 3 -------------------------------------------------------------
TEST(IF97ForwardRegion3, Table33) {
    // IAPWS R7-97(2012) Table 33 (from T and rho).
    struct Row {
        double T, rho, p, h, u, s, cp, w;
    };
    const Row rows[] = {
        {650.0, 500.0, 0.255837018e2, 0.186343019e4, 0.181226279e4, 0.405427273e1,
         0.138935717e2, 0.502005554e3},
        {650.0, 200.0, 0.222930643e2, 0.237512401e4, 0.226365868e4, 0.485438792e1,
         0.446579342e2, 0.383444594e3},
        {750.0, 500.0, 0.783095639e2, 0.225868845e4, 0.210206932e4, 0.446971906e1,
         0.634165359e1, 0.760696041e3},
    };
    for (const auto& c : rows) {
        SCOPED_TRACE("T = " + std::to_string(c.T) + " K, rho = " + std::to_string(c.rho));
        const auto r = if97::region3(c.rho, c.T);
        EXPECT_EQ(r.region, 3);
        EXPECT_DOUBLE_EQ(r.T, c.T);
        EXPECT_DOUBLE_EQ(r.rho, c.rho);
        EXPECT_DOUBLE_EQ(r.v, 1.0 / c.rho);
        EXPECT_TRUE(RelNear(r.p, c.p));
        EXPECT_TRUE(RelNear(r.h, c.h));
        EXPECT_TRUE(RelNear(r.u, c.u));
        EXPECT_TRUE(RelNear(r.s, c.s));
        EXPECT_TRUE(RelNear(r.cp, c.cp));
        EXPECT_TRUE(RelNear(r.w, c.w));
        EXPECT_TRUE(RelNear(if97::region3_p(c.rho, c.T), r.p, 1e-12));
        EXPECT_GT(r.cv, 0.0);
        EXPECT_GT(r.drhodp_T, 0.0);
    }
}

TEST(IF97ForwardRegion3, CvAndDrhodpOracle) {
    // python3-iapws 1.5.2 (Debian): cv, and drho/dp = rho * kt.
    EXPECT_TRUE(RelNear(if97::region3(500, 650).cv, 3.19131787189, 1e-10));
    EXPECT_TRUE(RelNear(if97::region3(200, 650).cv, 4.04118075955, 1e-10));
    EXPECT_TRUE(RelNear(if97::region3(500, 750).cv, 2.71701677121, 1e-10));
    EXPECT_TRUE(RelNear(if97::region3(500, 650).drhodp_T, 17.2753478145, 1e-9));
    EXPECT_TRUE(RelNear(if97::region3(200, 650).drhodp_T, 75.1597130748, 1e-9));
    EXPECT_TRUE(RelNear(if97::region3(500, 750).drhodp_T, 4.0335540833, 1e-9));
}

TEST(IF97ForwardRegion3, DrhodpFiniteDifference) {
    // (drho/dp)_T = 1 / (dp/drho)_T with a central difference of p(rho) (common practice).
    for (double T : {630.0, 650.0, 700.0, 800.0})
        for (double rho : {150.0, 250.0, 400.0, 600.0}) {
            const double d = 1e-4 * rho;
            const double fd =
                2.0 * d / (if97::region3_p(rho + d, T) - if97::region3_p(rho - d, T));
            const auto r = if97::region3(rho, T);
            if (r.drhodp_T <= 0) continue;  // inside the two-phase dome (unstable part)
            EXPECT_TRUE(RelNear(r.drhodp_T, fd, 1e-6)) << "T=" << T << " rho=" << rho;
        }
}

TEST(IF97ForwardRegion3, CriticalPoint) {
    // R7-97(2012) Sec. 7 (text after Eq. 28): Eq. (28) reproduces the critical
    // parameters, Eqs. (2)-(4): p(rhoc, Tc) = pc = 22.064 MPa.
    EXPECT_TRUE(RelNear(if97::region3(if97::rhoc, if97::Tc).p, 22.064, 1e-9));
    EXPECT_TRUE(RelNear(if97::region3_p(if97::rhoc, if97::Tc), 22.064, 1e-9));
}

// ---- Region 4 -------------------------------------------------------------
TEST(IF97ForwardRegion4, Table35Psat) {
    // IAPWS R7-97(2012) Table 35.
    EXPECT_TRUE(RelNear(if97::psat(300.0), 0.353658941e-2));
    EXPECT_TRUE(RelNear(if97::psat(500.0), 0.263889776e1));
    EXPECT_TRUE(RelNear(if97::psat(600.0), 0.123443146e2));
}

TEST(IF97ForwardRegion4, Table36Tsat) {
    // IAPWS R7-97(2012) Table 36.
    EXPECT_TRUE(RelNear(if97::tsat(0.1), 0.372755919e3));
    EXPECT_TRUE(RelNear(if97::tsat(1.0), 0.453035632e3));
    EXPECT_TRUE(RelNear(if97::tsat(10.0), 0.584149488e3));
}

TEST(IF97ForwardRegion4, SpecialPoints) {
    // R7-97(2012) Sec. 8.1 (text after Table 34): Eqs. (29)-(31) reproduce
    // the triple point, Eq. (9), and the critical point, Eqs. (2), (3).
    EXPECT_TRUE(RelNear(if97::psat(if97::Tc), if97::pc, 1e-9));
    EXPECT_TRUE(RelNear(if97::tsat(if97::pc), if97::Tc, 1e-9));
    EXPECT_TRUE(RelNear(if97::psat(if97::Tt), if97::pt, 1e-6));
    // Eqs. (30) and (31) are inverse to each other (R7-97(2012) Sec. 8.2).
    for (double T : {273.15, 300.0, 373.15, 500.0, 623.15, 647.0})
        EXPECT_TRUE(RelNear(if97::tsat(if97::psat(T)), T, 1e-12)) << "T=" << T;
    // ps_623 is psat(623.15 K) (isentra/if97.hpp).
    EXPECT_TRUE(RelNear(if97::psat(623.15), if97::ps_623, 1e-13));
}

// ---- Region 5 -------------------------------------------------------------
TEST(IF97ForwardRegion5, Table42) {
    // IAPWS R7-97(2012) Table 42 (2007 coefficients of Table 38).
    const GibbsCheck rows[] = {
        {1500.0, 0.5, 0.138455090e1, 0.521976855e4, 0.452749310e4, 0.965408875e1,
         0.261609445e1, 0.917068690e3},
        {1500.0, 30.0, 0.230761299e-1, 0.516723514e4, 0.447495124e4, 0.772970133e1,
         0.272724317e1, 0.928548002e3},
        {2000.0, 30.0, 0.311385219e-1, 0.657122604e4, 0.563707038e4, 0.853640523e1,
         0.288569882e1, 0.106736948e4},
    };
    for (const auto& c : rows) CheckGibbsRow(if97::region5(c.p, c.T), c, 5);
}

TEST(IF97ForwardRegion5, CvAndDrhodpOracle) {
    // python3-iapws 1.5.2 (Debian): cv, and drho/dp = rho * kt.
    EXPECT_TRUE(RelNear(if97::region5(30, 1500).cv, 2.19274829366, 1e-10));
    EXPECT_TRUE(RelNear(if97::region5(30, 1500).drhodp_T, 1.44253500921, 1e-10));
}

TEST(IF97ForwardRegion5, DrhodpFiniteDifference) {
    // common practice
    for (double T : {1073.15, 1500.0, 2273.15})
        for (double p : {0.01, 1.0, 30.0, 50.0}) {
            EXPECT_TRUE(RelNear(if97::region5(p, T).drhodp_T, FdDrhodp(if97::region5, p, T), 1e-6))
                << "T=" << T << " p=" << p;
        }
}

// ---- B23 boundary ------------------------------------------------------------
TEST(IF97ForwardB23, CheckPoint) {
    // IAPWS R7-97(2012) Sec. 4, text after Eq. (6): T = 0.623 150 000e3 K,
    // p = 0.165 291 643e2 MPa.
    EXPECT_TRUE(RelNear(if97::b23_p(623.15), 0.165291643e2));
    EXPECT_TRUE(RelNear(if97::b23_T(0.165291643e2), 0.623150000e3));
    // Eqs. (5) and (6) are inverse to each other (common practice).
    for (double T : {623.15, 700.0, 863.15})
        EXPECT_TRUE(RelNear(if97::b23_T(if97::b23_p(T)), T, 1e-12)) << "T=" << T;
}

// (dv/dT)_p from each basic equation's own derivatives against central
// differences of v at constant p (the equations themselves: no external value).
TEST(IF97Derivatives, DvDTAtConstantPressure) {
    struct Case {
        const char* what;
        std::function<if97::Props(double)> at_T;  // the state at T, p fixed
        double T;
    };
    const Case cases[] = {
        {"region 1, 3 MPa", [](double T) { return if97::region1(3.0, T); }, 300.0},
        {"region 1 near 4 degC (alpha ~ 0)", [](double T) { return if97::region1(0.1, T); }, 277.0},
        {"region 1, 80 MPa", [](double T) { return if97::region1(80.0, T); }, 500.0},
        {"region 2, 0.0035 MPa", [](double T) { return if97::region2(0.0035, T); }, 300.0},
        {"region 2, 30 MPa", [](double T) { return if97::region2(30.0, T); }, 700.0},
        {"region 2 metastable", [](double T) { return if97::region2_metastable(1.0, T); }, 450.0},
        {"region 5", [](double T) { return if97::region5(30.0, T); }, 1500.0},
        // region 3 at constant p: density re-solved at each T
        {"region 3, 25 MPa", [](double T) { return if97::region3_pT(25.0, T); }, 650.0},
        {"region 3, 50 MPa", [](double T) { return if97::region3_pT(50.0, T); }, 700.0},
    };
    for (const Case& c : cases) {
        const double dT = 1e-3;
        const if97::Props m = c.at_T(c.T);
        const double fd = (c.at_T(c.T + dT).v - c.at_T(c.T - dT).v) / (2 * dT);
        EXPECT_NEAR(m.dvdT_p, fd, 1e-6 * std::fabs(fd) + 1e-13) << c.what;
    }
    // Directly on Eq. 28 at a fixed (rho, T): (dv/dT)_p = (dp/dT)_rho (drho/dp)_T / rho^2.
    const double rho = 500.0, T = 650.0, e = 1e-4;
    const if97::Props r = if97::region3(rho, T);
    const double dpdT = (if97::region3(rho, T + e).p - if97::region3(rho, T - e).p) / (2 * e);
    EXPECT_NEAR(r.dvdT_p, dpdT * r.drhodp_T / (rho * rho), 1e-7 * std::fabs(r.dvdT_p));
}
