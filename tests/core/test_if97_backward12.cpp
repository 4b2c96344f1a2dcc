// SPDX-License-Identifier: MPL-2.0
// Check values of the IAPWS-IF97 backward equations for regions 1 and 2.
// Every value below was read from the rendered page of the release named
// beside it. Values printed to 9 significant digits are checked to a
// relative 1e-8; values printed to more digits to half a unit of the last
// printed digit.
#include <gtest/gtest.h>

#include <cmath>

#include "isentra/if97/if97.hpp"

namespace if97 = isentra::if97;

namespace {

// Relative tolerance for a value printed to 9 significant digits.
constexpr double kRel9 = 1e-8;

void expect_rel(double actual, double expected, double rel) {
    EXPECT_NEAR(actual, expected, rel * std::fabs(expected));
}

}  // namespace

// ---- Region 1, T(p,h), Eq. (11) ------------------------------------------
TEST(IF97Backward12Region1, TphTable7) {
    expect_rel(if97::region1_T_ph(3.0, 500.0), 0.391798509e3, kRel9);   // IAPWS R7-97(2012) Table 7
    expect_rel(if97::region1_T_ph(80.0, 500.0), 0.378108626e3, kRel9);  // IAPWS R7-97(2012) Table 7
    expect_rel(if97::region1_T_ph(80.0, 1500.0), 0.611041229e3, kRel9); // IAPWS R7-97(2012) Table 7
}

// ---- Region 1, T(p,s), Eq. (13) ------------------------------------------
TEST(IF97Backward12Region1, TpsTable9) {
    expect_rel(if97::region1_T_ps(3.0, 0.5), 0.307842258e3, kRel9);   // IAPWS R7-97(2012) Table 9
    expect_rel(if97::region1_T_ps(80.0, 0.5), 0.309979785e3, kRel9);  // IAPWS R7-97(2012) Table 9
    expect_rel(if97::region1_T_ps(80.0, 3.0), 0.565899909e3, kRel9);  // IAPWS R7-97(2012) Table 9
}

// ---- B2bc boundary, Eqs. (20) and (21) -----------------------------------
TEST(IF97Backward12B2bc, CheckPoint) {
    // IAPWS R7-97(2012) check point after Eq. (21) (Sec. 6.3):
    // p = 0.100 000 000 x 10^3 MPa, h = 0.351 600 432 3 x 10^4 kJ/kg.
    expect_rel(if97::b2bc_p(3516.004323), 100.0, kRel9);  // IAPWS R7-97(2012) Sec. 6.3, after Eq. (21)
    EXPECT_NEAR(if97::b2bc_h(100.0), 3516.004323, 0.5e-6);  // IAPWS R7-97(2012) Sec. 6.3, after Eq. (21)
}

TEST(IF97Backward12B2bc, Eq20AndEq21AreInverse) {
    for (double p = 6.6; p <= 100.0; p += 3.1) {
        EXPECT_NEAR(if97::b2bc_p(if97::b2bc_h(p)), p, 1e-10 * p);
    }
}

// ---- Region 2, T(p,h), Eqs. (22)-(24) ------------------------------------
TEST(IF97Backward12Region2, TphTable24Subregion2a) {
    expect_rel(if97::region2_T_ph(0.001, 3000.0), 0.534433241e3, kRel9);  // IAPWS R7-97(2012) Table 24, Eq. (22)
    expect_rel(if97::region2_T_ph(3.0, 3000.0), 0.575373370e3, kRel9);    // IAPWS R7-97(2012) Table 24, Eq. (22)
    expect_rel(if97::region2_T_ph(3.0, 4000.0), 0.101077577e4, kRel9);    // IAPWS R7-97(2012) Table 24, Eq. (22)
}

TEST(IF97Backward12Region2, TphTable24Subregion2b) {
    expect_rel(if97::region2_T_ph(5.0, 3500.0), 0.801299102e3, kRel9);   // IAPWS R7-97(2012) Table 24, Eq. (23)
    expect_rel(if97::region2_T_ph(5.0, 4000.0), 0.101531583e4, kRel9);   // IAPWS R7-97(2012) Table 24, Eq. (23)
    expect_rel(if97::region2_T_ph(25.0, 3500.0), 0.875279054e3, kRel9);  // IAPWS R7-97(2012) Table 24, Eq. (23)
}

TEST(IF97Backward12Region2, TphTable24Subregion2c) {
    expect_rel(if97::region2_T_ph(40.0, 2700.0), 0.743056411e3, kRel9);  // IAPWS R7-97(2012) Table 24, Eq. (24)
    expect_rel(if97::region2_T_ph(60.0, 2700.0), 0.791137067e3, kRel9);  // IAPWS R7-97(2012) Table 24, Eq. (24)
    expect_rel(if97::region2_T_ph(60.0, 3200.0), 0.882756860e3, kRel9);  // IAPWS R7-97(2012) Table 24, Eq. (24)
}

// ---- Region 2, T(p,s), Eqs. (25)-(27) ------------------------------------
TEST(IF97Backward12Region2, TpsTable29Subregion2a) {
    expect_rel(if97::region2_T_ps(0.1, 7.5), 0.399517097e3, kRel9);  // IAPWS R7-97(2012) Table 29, Eq. (25)
    expect_rel(if97::region2_T_ps(0.1, 8.0), 0.514127081e3, kRel9);  // IAPWS R7-97(2012) Table 29, Eq. (25)
    expect_rel(if97::region2_T_ps(2.5, 8.0), 0.103984917e4, kRel9);  // IAPWS R7-97(2012) Table 29, Eq. (25)
}

TEST(IF97Backward12Region2, TpsTable29Subregion2b) {
    expect_rel(if97::region2_T_ps(8.0, 6.0), 0.600484040e3, kRel9);   // IAPWS R7-97(2012) Table 29, Eq. (26)
    expect_rel(if97::region2_T_ps(8.0, 7.5), 0.106495556e4, kRel9);   // IAPWS R7-97(2012) Table 29, Eq. (26)
    expect_rel(if97::region2_T_ps(90.0, 6.0), 0.103801126e4, kRel9);  // IAPWS R7-97(2012) Table 29, Eq. (26)
}

TEST(IF97Backward12Region2, TpsTable29Subregion2c) {
    expect_rel(if97::region2_T_ps(20.0, 5.75), 0.697992849e3, kRel9);  // IAPWS R7-97(2012) Table 29, Eq. (27)
    expect_rel(if97::region2_T_ps(80.0, 5.25), 0.854011484e3, kRel9);  // IAPWS R7-97(2012) Table 29, Eq. (27)
    expect_rel(if97::region2_T_ps(80.0, 5.75), 0.949017998e3, kRel9);  // IAPWS R7-97(2012) Table 29, Eq. (27)
}

// ---- h_2ab(s), SR2-01 Eq. (2) --------------------------------------------
TEST(IF97Backward12H2ab, CheckPoint) {
    // SR2-01(2014) Sec. 6.1: s = 7 kJ/(kg K), h_2ab = 3376.437 884 kJ/kg.
    EXPECT_NEAR(if97::b2ab_h(7.0), 3376.437884, 0.5e-6);  // IAPWS SR2-01(2014) Sec. 6.1, after Table 5
}

// ---- Region 1, p(h,s), SR2-01 Eq. (1) ------------------------------------
TEST(IF97Backward12Region1, PhsTable3) {
    expect_rel(if97::region1_p_hs(0.001, 0.0), 9.800980612e-4, kRel9);  // IAPWS SR2-01(2014) Table 3
    expect_rel(if97::region1_p_hs(90.0, 0.0), 9.192954727e1, kRel9);    // IAPWS SR2-01(2014) Table 3
    expect_rel(if97::region1_p_hs(1500.0, 3.4), 5.868294423e1, kRel9);  // IAPWS SR2-01(2014) Table 3
}

// ---- Region 2, p(h,s), SR2-01 Eqs. (3)-(5) -------------------------------
TEST(IF97Backward12Region2, PhsTable9Subregion2a) {
    expect_rel(if97::region2_p_hs(2800.0, 6.5), 1.371012767, kRel9);     // IAPWS SR2-01(2014) Table 9, Eq. (3)
    expect_rel(if97::region2_p_hs(2800.0, 9.5), 1.879743844e-3, kRel9);  // IAPWS SR2-01(2014) Table 9, Eq. (3)
    expect_rel(if97::region2_p_hs(4100.0, 9.5), 1.024788997e-1, kRel9);  // IAPWS SR2-01(2014) Table 9, Eq. (3)
}

TEST(IF97Backward12Region2, PhsTable9Subregion2b) {
    expect_rel(if97::region2_p_hs(2800.0, 6.0), 4.793911442, kRel9);   // IAPWS SR2-01(2014) Table 9, Eq. (4)
    expect_rel(if97::region2_p_hs(3600.0, 6.0), 8.395519209e1, kRel9); // IAPWS SR2-01(2014) Table 9, Eq. (4)
    expect_rel(if97::region2_p_hs(3600.0, 7.0), 7.527161441, kRel9);   // IAPWS SR2-01(2014) Table 9, Eq. (4)
}

TEST(IF97Backward12Region2, PhsTable9Subregion2c) {
    expect_rel(if97::region2_p_hs(2800.0, 5.1), 9.439202060e1, kRel9);  // IAPWS SR2-01(2014) Table 9, Eq. (5)
    expect_rel(if97::region2_p_hs(2800.0, 5.8), 8.414574124, kRel9);    // IAPWS SR2-01(2014) Table 9, Eq. (5)
    expect_rel(if97::region2_p_hs(3400.0, 5.8), 8.376903879e1, kRel9);  // IAPWS SR2-01(2014) Table 9, Eq. (5)
}

// ---- Subregion selection -------------------------------------------------
// The check tables above already exercise the subregion choice (e.g. 5 MPa
// goes to 2b, 40 MPa and 2700 kJ/kg to 2c). Here: across each boundary the
// neighbouring equations nearly agree (R7-97(2012) Tables 23 and 28,
// SR2-01(2014) Sec. 6.4), so a jump would show a wrong split.
TEST(IF97Backward12Region2, SubregionBoundariesAreNearlyContinuous) {
    // p = 4 MPa, 2a/2b (T(p,h) and T(p,s)).
    EXPECT_NEAR(if97::region2_T_ph(4.0, 3200.0), if97::region2_T_ph(4.0 + 1e-9, 3200.0), 0.03);
    EXPECT_NEAR(if97::region2_T_ps(4.0, 7.0), if97::region2_T_ps(4.0 + 1e-9, 7.0), 0.03);
    // B2bc, 2b/2c (T(p,h)).
    const double hb = if97::b2bc_h(30.0);
    EXPECT_NEAR(if97::region2_T_ph(30.0, hb - 1e-7), if97::region2_T_ph(30.0, hb + 1e-7), 0.05);
    // s = 5.85, 2b/2c (T(p,s) and p(h,s)).
    EXPECT_NEAR(if97::region2_T_ps(30.0, 5.85 - 1e-10), if97::region2_T_ps(30.0, 5.85), 0.05);
    const double p_lo = if97::region2_p_hs(3000.0, 5.85 - 1e-10);
    const double p_hi = if97::region2_p_hs(3000.0, 5.85);
    EXPECT_NEAR(p_lo, p_hi, 1e-4 * p_hi);
    // h_2ab(s), 2a/2b (p(h,s)).
    const double ha = if97::b2ab_h(6.8);
    const double pa = if97::region2_p_hs(ha, 6.8);
    const double pb = if97::region2_p_hs(ha + 1e-7, 6.8);
    EXPECT_NEAR(pa, pb, 1e-4 * pb);
    EXPECT_NEAR(pa, 4.0, 0.03);  // h_2ab approximates the 4 MPa isobar to 22 kPa (SR2-01(2014) Sec. 6.1)
}
