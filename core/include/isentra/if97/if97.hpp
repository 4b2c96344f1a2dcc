// SPDX-License-Identifier: MPL-2.0
// IAPWS-IF97 equations, each callable on its own, exactly as the releases
// define them. Units are those of the releases: p in MPa, T in K, v in m3/kg,
// rho in kg/m3, h and u in kJ/kg, s, cp, cv in kJ/(kg K), w in m/s.
//
// These are raw equations: they do not check ranges and do not throw. The
// state solver (state.hpp) checks ranges, chooses the region and refines
// backward-equation values on the basic equations.
//
// Sources: IAPWS R7-97(2012) "Revised Release on the IAPWS Industrial
// Formulation 1997"; SR2-01(2014), SR3-03(2014), SR4-04(2014), SR5-05(2016).
#pragma once

namespace isentra::if97 {

// R7-97(2012) Eqs. 1-2 and Section 2.
inline constexpr double R = 0.461526;        // kJ/(kg K), specific gas constant
inline constexpr double Tc = 647.096;        // K, critical temperature
inline constexpr double pc = 22.064;         // MPa, critical pressure
inline constexpr double rhoc = 322.0;        // kg/m3, critical density
inline constexpr double Tt = 273.16;         // K, triple-point temperature
inline constexpr double pt = 611.657e-6;     // MPa, triple-point pressure
inline constexpr double T_min = 273.15;      // K, lower temperature limit of IF97
inline constexpr double T_13 = 623.15;       // K, boundary regions 1/3 and 2/3 start
inline constexpr double T_25 = 1073.15;      // K, boundary regions 2/5
inline constexpr double T_max = 2273.15;     // K, upper limit of region 5
inline constexpr double p_max = 100.0;       // MPa, upper pressure limit (regions 1-3)
inline constexpr double p_max5 = 50.0;       // MPa, upper pressure limit of region 5
inline constexpr double ps_623 = 16.5291642526045;  // MPa, psat(623.15 K), R7-97 Sec. 4

// Properties of one single-phase state from a basic equation.
struct Props {
    double T = 0;      // K
    double p = 0;      // MPa
    double rho = 0;    // kg/m3
    double v = 0;      // m3/kg
    double u = 0;      // kJ/kg
    double h = 0;      // kJ/kg
    double s = 0;      // kJ/(kg K)
    double cp = 0;     // kJ/(kg K)
    double cv = 0;     // kJ/(kg K)
    double w = 0;      // m/s
    double drhodp_T = 0;  // (d rho / d p)_T in kg/(m3 MPa), needed by the transport properties
    double dvdT_p = 0;    // (d v / d T)_p in m3/(kg K) (thermal expansion: alpha_v = dvdT_p / v)
    int region = 0;    // 1, 2, 3 or 5
};

// ---- Basic equations (R7-97(2012)) -------------------------------------
Props region1(double p, double T);             // Eq. 7, Tables 2-4
Props region2(double p, double T);             // Eq. 15, Tables 10-12
Props region2_metastable(double p, double T);  // Eq. 18, Tables 16-17 (metastable vapour, p <= 10 MPa)
Props region3(double rho, double T);           // Eq. 28, Tables 30-31 (from density and temperature)
Props region5(double p, double T);             // Eq. 32, Tables 37-39 (2007 coefficients)
// Cheaper variants returning only p (MPa) of region 3, for root finding.
double region3_p(double rho, double T);

// Region 4, saturation line (Eqs. 30 and 31, Table 34).
double psat(double T);  // 273.15 K <= T <= 647.096 K
double tsat(double p);  // 611.213 Pa <= p <= 22.064 MPa

// B23 boundary between regions 2 and 3 (Eqs. 5 and 6, Table 1).
double b23_p(double T);  // p(T), 623.15 K <= T <= 863.15 K
double b23_T(double p);  // T(p), 16.529 MPa <= p <= 100 MPa

// ---- Backward equations, regions 1 and 2 (R7-97(2012)) -----------------
double region1_T_ph(double p, double h);  // Eq. 11, Table 6
double region1_T_ps(double p, double s);  // Eq. 13, Table 8
double b2bc_p(double h);                  // Eq. 20, B2bc boundary p(h)
double b2bc_h(double p);                  // Eq. 21, B2bc boundary h(p)
double region2_T_ph(double p, double h);  // Eqs. 22-24 with subregion 2a/2b/2c selection
double region2_T_ps(double p, double s);  // Eqs. 25-27 with subregion 2a/2b/2c selection
// ---- Backward p(h,s), regions 1 and 2 (SR2-01(2014)) -------------------
double b2ab_h(double s);                  // SR2-01 Eq. 2, h_2ab(s)
double region1_p_hs(double h, double s);  // SR2-01 Eq. 1
double region2_p_hs(double h, double s);  // SR2-01 Eqs. 3-5 with subregion selection

// ---- Backward equations, region 3 (SR3-03(2014)) -----------------------
double b3ab_h(double p);                  // SR3-03 Eq. 1, h_3ab(p)
double region3_T_ph(double p, double h);  // SR3-03 Eqs. 2-3 (3a/3b chosen by b3ab_h)
double region3_v_ph(double p, double h);  // SR3-03 Eqs. 4-5
double region3_T_ps(double p, double s);  // SR3-03 Eqs. 6-7 (3a/3b split at s_c = 4.41202148223476)
double region3_v_ps(double p, double s);  // SR3-03 Eqs. 8-9
double p3sat_h(double h);                 // SR3-03 Eq. 10
double p3sat_s(double s);                 // SR3-03 Eq. 11

// ---- Backward p(h,s) region 3, boundaries, Tsat(h,s) (SR4-04(2014)) ----
double b_h1_s(double s);      // SR4-04 Eq. 3, h'_1(s) saturated liquid, region-1 part
double b_h3a_s(double s);     // SR4-04 Eq. 4, h'_3a(s)
double b_h2ab_s(double s);    // SR4-04 Eq. 5, h''_2ab(s) saturated vapour
double b_h2c3b_s(double s);   // SR4-04 Eq. 6, h''_2c3b(s)
double b_hB13_s(double s);    // SR4-04 Eq. 7, boundary B13 h(s)
double b_TB23_hs(double h, double s);  // SR4-04 Eq. 8, boundary B23 T(h,s)
double region3_p_hs(double h, double s);  // SR4-04 Eqs. 1-2 (3a/3b)
double tsat_hs(double h, double s);       // SR4-04 Eq. 9, Tsat(h,s) in the wet region, s >= s"(623.15 K) = 5.210887825

// ---- Backward v(p,T), region 3 (SR5-05(2016)) ---------------------------
// Subregion letter 'a'..'z' (SR5-05 Table 2 and Section 3) for a region-3 (p,T).
// A (p,T) exactly on the saturation line counts as liquid (SR5-05 Table 2).
char region3_subregion(double p, double T);
double region3_v_pT(double p, double T);  // backward v, with subregion selection (incl. auxiliary near-critical equations)
double region3_v_pT_sub(double p, double T, char subregion);  // v by a named subregion's equation

// ---- Exact region-3 solutions on the basic equation (Eq. 28) -------------
// Density from (p,T) by refining the SR5-05 value until p(rho,T) = p.
Props region3_pT(double p, double T);
// Saturated liquid and vapour in region 3, 623.15 K <= T <= Tc: both densities
// solve p(rho,T) = psat(T) on Eq. 28 (R7-97(2012) Sec. 10.2, text to Eq. 36c).
struct SatPair {
    Props liq;
    Props vap;
};
SatPair region3_saturation(double T);

}  // namespace isentra::if97
