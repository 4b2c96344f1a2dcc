// SPDX-License-Identifier: MPL-2.0
// Tests of the IAPWS-IF97 region-3 backward equations and boundary equations
// of SR3-03(2014) and SR4-04(2014) (core/if97/backward3.cpp).
//
// The computer-program verification values were read on the rendered pages
// of the releases (the text layer omits those tables). They are printed to
// 10 significant digits (d.ddd ddd ddd x 10^k), so each is checked to half a
// unit of its last printed digit, which is tighter than a relative 1e-8.
#include <gtest/gtest.h>

#include <cmath>

#include "isentra/if97/if97.hpp"

namespace if97 = isentra::if97;

namespace {

// |actual - expected| <= half a unit of the 10th significant digit of expected.
void expect_10digits(double actual, double expected) {
    const double tol = 0.5 * std::pow(10.0, std::floor(std::log10(std::fabs(expected))) - 9.0);
    EXPECT_NEAR(actual, expected, tol);
}

void expect_rel(double actual, double expected, double rel) {
    EXPECT_NEAR(actual, expected, rel * std::fabs(expected));
}

// Critical isentrope, SR3-03(2014) Sec. 3.2 (also SR4-04(2014) Sec. 3.2).
constexpr double kSc = 4.41202148223476;
// Critical enthalpy, SR4-04(2014) Sec. 4.3 (printed 2.087 546 845 x 10^3 kJ/kg).
constexpr double kHc = 2.087546845e3;

}  // namespace

// ---- SR3-03(2014) ------------------------------------------------------

TEST(IF97Backward3SR3, H3abEq1) {
    expect_10digits(if97::b3ab_h(25.0), 2.095936454e3);  // IAPWS SR3-03(2014) Sec. 3.2, check point of Eq. (1)
}

TEST(IF97Backward3SR3, TphTable5) {
    // T3a(p,h), Eq. (2)
    expect_10digits(if97::region3_T_ph(20.0, 1700.0), 6.293083892e2);   // IAPWS SR3-03(2014) Table 5
    expect_10digits(if97::region3_T_ph(50.0, 2000.0), 6.905718338e2);   // IAPWS SR3-03(2014) Table 5
    expect_10digits(if97::region3_T_ph(100.0, 2100.0), 7.336163014e2);  // IAPWS SR3-03(2014) Table 5
    // T3b(p,h), Eq. (3)
    expect_10digits(if97::region3_T_ph(20.0, 2500.0), 6.418418053e2);   // IAPWS SR3-03(2014) Table 5
    expect_10digits(if97::region3_T_ph(50.0, 2400.0), 7.351848618e2);   // IAPWS SR3-03(2014) Table 5
    expect_10digits(if97::region3_T_ph(100.0, 2700.0), 8.420460876e2);  // IAPWS SR3-03(2014) Table 5
}

TEST(IF97Backward3SR3, VphTable8) {
    // v3a(p,h), Eq. (4)
    expect_10digits(if97::region3_v_ph(20.0, 1700.0), 1.749903962e-3);   // IAPWS SR3-03(2014) Table 8
    expect_10digits(if97::region3_v_ph(50.0, 2000.0), 1.908139035e-3);   // IAPWS SR3-03(2014) Table 8
    expect_10digits(if97::region3_v_ph(100.0, 2100.0), 1.676229776e-3);  // IAPWS SR3-03(2014) Table 8
    // v3b(p,h), Eq. (5)
    expect_10digits(if97::region3_v_ph(20.0, 2500.0), 6.670547043e-3);   // IAPWS SR3-03(2014) Table 8
    expect_10digits(if97::region3_v_ph(50.0, 2400.0), 2.801244590e-3);   // IAPWS SR3-03(2014) Table 8
    expect_10digits(if97::region3_v_ph(100.0, 2700.0), 2.404234998e-3);  // IAPWS SR3-03(2014) Table 8
}

TEST(IF97Backward3SR3, TpsTable12) {
    // T3a(p,s), Eq. (6)
    expect_10digits(if97::region3_T_ps(20.0, 3.8), 6.282959869e2);   // IAPWS SR3-03(2014) Table 12
    expect_10digits(if97::region3_T_ps(50.0, 3.6), 6.297158726e2);   // IAPWS SR3-03(2014) Table 12
    expect_10digits(if97::region3_T_ps(100.0, 4.0), 7.056880237e2);  // IAPWS SR3-03(2014) Table 12
    // T3b(p,s), Eq. (7)
    expect_10digits(if97::region3_T_ps(20.0, 5.0), 6.401176443e2);   // IAPWS SR3-03(2014) Table 12
    expect_10digits(if97::region3_T_ps(50.0, 4.5), 7.163687517e2);   // IAPWS SR3-03(2014) Table 12
    expect_10digits(if97::region3_T_ps(100.0, 5.0), 8.474332825e2);  // IAPWS SR3-03(2014) Table 12
}

TEST(IF97Backward3SR3, VpsTable15) {
    // v3a(p,s), Eq. (8)
    expect_10digits(if97::region3_v_ps(20.0, 3.8), 1.733791463e-3);   // IAPWS SR3-03(2014) Table 15
    expect_10digits(if97::region3_v_ps(50.0, 3.6), 1.469680170e-3);   // IAPWS SR3-03(2014) Table 15
    expect_10digits(if97::region3_v_ps(100.0, 4.0), 1.555893131e-3);  // IAPWS SR3-03(2014) Table 15
    // v3b(p,s), Eq. (9)
    expect_10digits(if97::region3_v_ps(20.0, 5.0), 6.262101987e-3);   // IAPWS SR3-03(2014) Table 15
    expect_10digits(if97::region3_v_ps(50.0, 4.5), 2.332634294e-3);   // IAPWS SR3-03(2014) Table 15
    expect_10digits(if97::region3_v_ps(100.0, 5.0), 2.449610757e-3);  // IAPWS SR3-03(2014) Table 15
}

TEST(IF97Backward3SR3, P3satHTable18) {
    expect_10digits(if97::p3sat_h(1700.0), 1.724175718e1);  // IAPWS SR3-03(2014) Table 18
    expect_10digits(if97::p3sat_h(2000.0), 2.193442957e1);  // IAPWS SR3-03(2014) Table 18
    expect_10digits(if97::p3sat_h(2400.0), 2.018090839e1);  // IAPWS SR3-03(2014) Table 18
}

TEST(IF97Backward3SR3, P3satSTable20) {
    expect_10digits(if97::p3sat_s(3.8), 1.687755057e1);  // IAPWS SR3-03(2014) Table 20
    expect_10digits(if97::p3sat_s(4.2), 2.164451789e1);  // IAPWS SR3-03(2014) Table 20
    expect_10digits(if97::p3sat_s(5.2), 1.668968482e1);  // IAPWS SR3-03(2014) Table 20
}

// "The critical temperature and the critical volume are met exactly by the
// equations T(p,h) and v(p,h)" / "T(p,s) and v(p,s)": IAPWS SR3-03(2014)
// Sec. 3.3 and 3.4; Tc, pc, rhoc from IAPWS R7-97(2012) Sec. 2, hc from
// IAPWS SR4-04(2014) Sec. 4.3. Both subregion equations meet the point.
TEST(IF97Backward3SR3, CriticalPoint) {
    const double vc = 1.0 / if97::rhoc;
    // h_3ab(pc) is the critical enthalpy (Eq. (1) starts at the critical point).
    const double h3a = if97::b3ab_h(if97::pc);
    const double h3b = std::nextafter(h3a, 1e4);  // just inside 3b
    expect_10digits(h3a, kHc);
    EXPECT_NEAR(if97::region3_T_ph(if97::pc, h3a), if97::Tc, 1e-6);
    EXPECT_NEAR(if97::region3_T_ph(if97::pc, h3b), if97::Tc, 1e-6);
    expect_rel(if97::region3_v_ph(if97::pc, h3a), vc, 1e-8);
    expect_rel(if97::region3_v_ph(if97::pc, h3b), vc, 1e-8);
    EXPECT_NEAR(if97::region3_T_ps(if97::pc, kSc), if97::Tc, 1e-6);
    EXPECT_NEAR(if97::region3_T_ps(if97::pc, std::nextafter(kSc, 10.0)), if97::Tc, 1e-6);  // 3b
    expect_rel(if97::region3_v_ps(if97::pc, kSc), vc, 1e-8);
    expect_rel(if97::region3_v_ps(if97::pc, std::nextafter(kSc, 10.0)), vc, 1e-8);  // 3b
}

// Consistency at the 3a/3b boundaries, IAPWS SR3-03(2014) Sec. 3.3 and 3.4:
// |T3a - T3b| <= 0.37 mK along h_3ab(p); |v3a/v3b - 1| <= 0.00015 % along
// h_3ab(p); |T3a - T3b| <= 0.093 mK along s_c. The subregion choice is made
// inside the functions, so the two sides are reached just below and above.
TEST(IF97Backward3SR3, SubregionBoundaryConsistency) {
    for (int k = 0; k <= 100; ++k) {
        const double p = if97::pc + k * (if97::p_max - if97::pc) / 100.0;
        const double h = if97::b3ab_h(p);
        const double h_above = std::nextafter(h, 1e4);
        EXPECT_LE(std::fabs(if97::region3_T_ph(p, h) - if97::region3_T_ph(p, h_above)), 0.37e-3) << p;
        EXPECT_LE(std::fabs(if97::region3_v_ph(p, h) / if97::region3_v_ph(p, h_above) - 1.0), 1.5e-6)
            << p;
        const double s_above = std::nextafter(kSc, 10.0);
        EXPECT_LE(std::fabs(if97::region3_T_ps(p, kSc) - if97::region3_T_ps(p, s_above)), 0.093e-3) << p;
    }
}

// One point per subregion equation away from the release's check points,
// against an independent implementation: python3-iapws 1.5.2 (Debian).
TEST(IF97Backward3SR3, Oracle) {
    constexpr double rel = 1e-12;
    expect_rel(if97::b3ab_h(60.0), 2179.188932189247, rel);                       // python3-iapws 1.5.2 (Debian)
    expect_rel(if97::region3_T_ph(30.0, 1800.0), 649.0380432392128, rel);         // python3-iapws 1.5.2 (Debian)
    expect_rel(if97::region3_T_ph(80.0, 2500.0), 789.2329650958269, rel);         // python3-iapws 1.5.2 (Debian)
    expect_rel(if97::region3_v_ph(30.0, 1800.0), 0.0018052221591702488, rel);     // python3-iapws 1.5.2 (Debian)
    expect_rel(if97::region3_v_ph(80.0, 2500.0), 0.002358642590210374, rel);      // python3-iapws 1.5.2 (Debian)
    expect_rel(if97::region3_T_ps(30.0, 3.9), 645.749788568922, rel);             // python3-iapws 1.5.2 (Debian)
    expect_rel(if97::region3_T_ps(80.0, 4.8), 791.9022778855417, rel);            // python3-iapws 1.5.2 (Debian)
    expect_rel(if97::region3_v_ps(30.0, 3.9), 0.0017593677393656895, rel);        // python3-iapws 1.5.2 (Debian)
    expect_rel(if97::region3_v_ps(80.0, 4.8), 0.002388614600936047, rel);         // python3-iapws 1.5.2 (Debian)
    expect_rel(if97::p3sat_h(1900.0), 21.138135054085183, rel);                   // python3-iapws 1.5.2 (Debian)
    expect_rel(if97::p3sat_h(2300.0), 21.36065808062115, rel);                    // python3-iapws 1.5.2 (Debian)
    expect_rel(if97::p3sat_s(4.0), 19.80913267970575, rel);                       // python3-iapws 1.5.2 (Debian)
    expect_rel(if97::p3sat_s(4.8), 21.04094885204827, rel);                       // python3-iapws 1.5.2 (Debian)
}

// ---- SR4-04(2014) ------------------------------------------------------

TEST(IF97Backward3SR4, PhsTable5) {
    // p3a(h,s), Eq. (1)
    expect_10digits(if97::region3_p_hs(1700.0, 3.8), 2.555703246e1);  // IAPWS SR4-04(2014) Table 5
    expect_10digits(if97::region3_p_hs(2000.0, 4.2), 4.540873468e1);  // IAPWS SR4-04(2014) Table 5
    expect_10digits(if97::region3_p_hs(2100.0, 4.3), 6.078123340e1);  // IAPWS SR4-04(2014) Table 5
    // p3b(h,s), Eq. (2)
    expect_10digits(if97::region3_p_hs(2600.0, 5.1), 3.434999263e1);  // IAPWS SR4-04(2014) Table 5
    expect_10digits(if97::region3_p_hs(2400.0, 4.7), 6.363924887e1);  // IAPWS SR4-04(2014) Table 5
    expect_10digits(if97::region3_p_hs(2700.0, 5.0), 8.839043281e1);  // IAPWS SR4-04(2014) Table 5
}

TEST(IF97Backward3SR4, SaturatedLiquidTable11) {
    // h'_1(s), Eq. (3)
    expect_10digits(if97::b_h1_s(1.0), 3.085509647e2);  // IAPWS SR4-04(2014) Table 11
    expect_10digits(if97::b_h1_s(2.0), 7.006304472e2);  // IAPWS SR4-04(2014) Table 11
    expect_10digits(if97::b_h1_s(3.0), 1.198359754e3);  // IAPWS SR4-04(2014) Table 11
    // h'_3a(s), Eq. (4)
    expect_10digits(if97::b_h3a_s(3.8), 1.685025565e3);  // IAPWS SR4-04(2014) Table 11
    expect_10digits(if97::b_h3a_s(4.0), 1.816891476e3);  // IAPWS SR4-04(2014) Table 11
    expect_10digits(if97::b_h3a_s(4.2), 1.949352563e3);  // IAPWS SR4-04(2014) Table 11
}

TEST(IF97Backward3SR4, SaturatedVapourTable18) {
    // h''_2ab(s), Eq. (5)
    expect_10digits(if97::b_h2ab_s(7.0), 2.723729985e3);  // IAPWS SR4-04(2014) Table 18
    expect_10digits(if97::b_h2ab_s(8.0), 2.599047210e3);  // IAPWS SR4-04(2014) Table 18
    expect_10digits(if97::b_h2ab_s(9.0), 2.511861477e3);  // IAPWS SR4-04(2014) Table 18
    // h''_2c3b(s), Eq. (6)
    expect_10digits(if97::b_h2c3b_s(5.5), 2.687693850e3);  // IAPWS SR4-04(2014) Table 18
    expect_10digits(if97::b_h2c3b_s(5.0), 2.451623609e3);  // IAPWS SR4-04(2014) Table 18
    expect_10digits(if97::b_h2c3b_s(4.5), 2.144360448e3);  // IAPWS SR4-04(2014) Table 18
}

TEST(IF97Backward3SR4, HB13Table24) {
    expect_10digits(if97::b_hB13_s(3.7), 1.632525047e3);  // IAPWS SR4-04(2014) Table 24
    expect_10digits(if97::b_hB13_s(3.6), 1.593027214e3);  // IAPWS SR4-04(2014) Table 24
    expect_10digits(if97::b_hB13_s(3.5), 1.566104611e3);  // IAPWS SR4-04(2014) Table 24
}

TEST(IF97Backward3SR4, TB23Table26) {
    expect_10digits(if97::b_TB23_hs(2600.0, 5.1), 7.135259364e2);   // IAPWS SR4-04(2014) Table 26
    expect_10digits(if97::b_TB23_hs(2700.0, 5.15), 7.685345532e2);  // IAPWS SR4-04(2014) Table 26
    expect_10digits(if97::b_TB23_hs(2800.0, 5.2), 8.176202120e2);   // IAPWS SR4-04(2014) Table 26
}

TEST(IF97Backward3SR4, TsatHsTable29) {
    expect_10digits(if97::tsat_hs(1800.0, 5.3), 3.468475498e2);  // IAPWS SR4-04(2014) Table 29
    expect_10digits(if97::tsat_hs(2400.0, 6.0), 4.251373305e2);  // IAPWS SR4-04(2014) Table 29
    expect_10digits(if97::tsat_hs(2500.0, 5.5), 5.225579013e2);  // IAPWS SR4-04(2014) Table 29
}

// "The enthalpy value of the critical point hc = 2.087 546 845 x 10^3 kJ/kg is
// met exactly by the equation h'_3a(s)" and "... by h''_2c3b(s)"; "the
// critical pressure is met exactly by the equations p3(h,s)":
// IAPWS SR4-04(2014) Sec. 3.3, 4.3, 4.4.
TEST(IF97Backward3SR4, CriticalPoint) {
    expect_10digits(if97::b_h3a_s(kSc), kHc);
    expect_10digits(if97::b_h2c3b_s(kSc), kHc);
    expect_rel(if97::region3_p_hs(kHc, kSc), if97::pc, 1e-8);
    expect_rel(if97::region3_p_hs(kHc, std::nextafter(kSc, 10.0)), if97::pc, 1e-8);  // 3b side
}

// End points of the boundary equations at T = 623.15 K: h'(623.15 K) =
// 1.670 858 218 x 10^3 kJ/kg and h''(623.15 K) = 2.563 592 004 x 10^3 kJ/kg
// (IAPWS SR3-03(2014) Sec. 4.3), s'(623.15 K) = 3.778 281 340 and
// s''(623.15 K) = 5.210 887 825 kJ/(kg K) (IAPWS SR4-04(2014) Sec. 4.3, 5.3).
// Permitted deviations from the basic equations: 0.0034 kJ/kg for h'_1,
// 0.0045 kJ/kg for h'_3a (SR4-04 Table 12), 0.0073 kJ/kg for h''_2c3b in
// region 3 (SR4-04 Table 19), 0.86 mK for Tsat(h,s) below 5.85 kJ/(kg K)
// (SR4-04 Table 30).
TEST(IF97Backward3SR4, BoundaryEndPoints623K) {
    const double h_liq = 1.670858218e3, h_vap = 2.563592004e3;
    const double s_liq = 3.778281340, s_vap = 5.210887825;
    EXPECT_NEAR(if97::b_h1_s(s_liq), h_liq, 0.0034);
    EXPECT_NEAR(if97::b_h3a_s(s_liq), h_liq, 0.0045);
    EXPECT_NEAR(if97::b_h2c3b_s(s_vap), h_vap, 0.0073);
    EXPECT_NEAR(if97::tsat_hs(h_vap, s_vap), if97::T_13, 0.86e-3);
}

// Consistency at the 3a/3b boundary s_c: |p3a - p3b| / p3b <= 0.00074 %
// (IAPWS SR4-04(2014) Sec. 3.3), sampled along h from the critical point to
// h_3ab(100 MPa).
TEST(IF97Backward3SR4, SubregionBoundaryConsistency) {
    const double s_above = std::nextafter(kSc, 10.0);
    for (int k = 0; k <= 50; ++k) {
        const double h = kHc + k * (if97::b3ab_h(100.0) - kHc) / 50.0;
        EXPECT_LE(std::fabs(if97::region3_p_hs(h, kSc) / if97::region3_p_hs(h, s_above) - 1.0), 7.4e-6)
            << h;
    }
}

// One point per equation away from the release's check points, against an
// independent implementation: python3-iapws 1.5.2 (Debian).
TEST(IF97Backward3SR4, Oracle) {
    constexpr double rel = 1e-12;
    expect_rel(if97::region3_p_hs(1900.0, 4.0), 66.31363502701413, rel);   // python3-iapws 1.5.2 (Debian)
    expect_rel(if97::region3_p_hs(2500.0, 4.9), 45.996226365989834, rel);  // python3-iapws 1.5.2 (Debian)
    expect_rel(if97::b_h1_s(0.5), 145.053261976719, rel);                   // python3-iapws 1.5.2 (Debian)
    expect_rel(if97::b_h1_s(2.5), 934.7722649156353, rel);                  // python3-iapws 1.5.2 (Debian)
    expect_rel(if97::b_h3a_s(4.1), 1883.2612988725762, rel);                // python3-iapws 1.5.2 (Debian)
    expect_rel(if97::b_h2ab_s(6.5), 2785.8892923022318, rel);               // python3-iapws 1.5.2 (Debian)
    expect_rel(if97::b_h2ab_s(8.5), 2551.404801842587, rel);                // python3-iapws 1.5.2 (Debian)
    expect_rel(if97::b_h2c3b_s(4.8), 2333.732785372091, rel);               // python3-iapws 1.5.2 (Debian)
    expect_rel(if97::b_hB13_s(3.55), 1577.8523876608485, rel);              // python3-iapws 1.5.2 (Debian)
    expect_rel(if97::b_TB23_hs(2650.0, 5.12), 744.4041028047106, rel);      // python3-iapws 1.5.2 (Debian)
    expect_rel(if97::tsat_hs(2000.0, 6.0), 338.3786022406429, rel);         // python3-iapws 1.5.2 (Debian)
    expect_rel(if97::tsat_hs(2200.0, 6.5), 343.9097922566539, rel);         // python3-iapws 1.5.2 (Debian)
    expect_rel(if97::tsat_hs(2600.0, 7.5), 352.5573738233858, rel);         // python3-iapws 1.5.2 (Debian)
}
