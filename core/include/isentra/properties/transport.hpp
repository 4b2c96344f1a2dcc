// SPDX-License-Identifier: MPL-2.0
// Transport and interfacial properties of water and steam.
//   viscosity:            IAPWS R12-08 Sec. 3, industrial use: IF97 densities,
//                         mu_2 = 1 (the default everywhere: mu, nu, Pr, and the
//                         mu inside lambda's Eq. 18); on request the full
//                         Eq. 10 with mu_2 near the critical point
//                         (viscosity_with_enhancement)
//   thermal conductivity: IAPWS R15-11, industrial formulation (Sec. 3, IF97-based)
//   surface tension:      IAPWS R1-76(2014)
// Units: Pa s, W/(m K), N/m, m2/s. Inputs in core units (p MPa, T K, rho kg/m3,
// cp and cv kJ/(kg K), (d rho/d p)_T kg/(m3 MPa)).
//
// Range (checked by the State functions): R12-08 Eq. 9 and R15-11 Eq. 27
// intersected with IF97: 273.15 K <= T <= 1173.15 K; p <= 100 MPa up to
// 1073.15 K, p <= 50 MPa from 1073.15 K to 1173.15 K. Outside: RangeError.
#pragma once

#include "isentra/properties/state.hpp"

namespace isentra {

// ---- Raw correlations (no range checks, never throw) ---------------------

// R12-08 Eqs. 10-12 with mu_2 = 1: mu_0(T) mu_1(T, rho), in Pa s.
double viscosity_rhoT(double rho, double T);

// (d rho/d p)_T at T_R = 1.5 Tc and density rho by R15-11 Eq. 25 with the
// Table 6 coefficients (the industrial prescription), in kg/(m3 MPa).
double drhodp_TR_industrial(double rho);

// Correlation length xi in nm, R12-08 Eqs. 20-21 = R15-11 Eqs. 22-24, from
// (d rho/d p)_T at (rho, T) and at (rho, T_R). Delta-chi < 0 gives xi = 0.
// The IF97 value at (rho, T) is limited as R15-11 Sec. 3.4 footnote 2 says
// (negative or > 1e13 in reduced units -> 1e13).
double correlation_length(double rho, double T, double drhodp_T_at_T, double drhodp_T_at_TR);

// Critical enhancement of viscosity mu_2(xi), R12-08 Eqs. 14-19 (xi in nm).
double viscosity_enhancement(double xi);

// Full R12-08 Eq. 10, mu_0 mu_1 mu_2, with xi from the given derivatives (Pa s).
// Applies mu_2 wherever it is called (see viscosity_with_enhancement).
double viscosity_rhoT(double rho, double T, double drhodp_T_at_T, double drhodp_T_at_TR);

// R15-11 Eq. 15 (W/(m K)). mu in Pa s is the viscosity used in Eq. 18 (the
// industrial form uses the R12-08 industrial value, mu_2 = 1). cp and cv in
// kJ/(kg K); cp is limited as R15-11 Sec. 3.4 footnote 2 says.
double conductivity_rhoT(double rho, double T, double cp, double cv, double mu,
                         double drhodp_T_at_T, double drhodp_T_at_TR);

// The terms of R15-11 Eq. 15 in the release's reduced units (mW/(m K) for the
// lambdas), for checks against R15-11 Tables 7-9.
struct ConductivityTerms {
    double lambda0 = 0;  // Eq. 16
    double lambda1 = 0;  // Eq. 17 (dimensionless factor)
    double lambda2 = 0;  // Eq. 18
    double xi = 0;       // nm, Eq. 22
    double Z = 0;        // Eq. 19
    double lambda = 0;   // W/(m K), Eq. 15
};
ConductivityTerms conductivity_terms(double rho, double T, double cp, double cv, double mu,
                                     double drhodp_T_at_T, double drhodp_T_at_TR);

// ---- On a solved state ----------------------------------------------------
// Single-phase states and saturated ends (x = 0 or 1 on the saturation line).
// A wet mixture (0 < x < 1) throws Error(NotDefined) naming the
// saturated-liquid and -vapour functions; outside the range, RangeError.
double viscosity(const State& st);             // Pa s, R12-08 Sec. 3 (mu_2 = 1)
// R12-08 Eq. 10 with the critical enhancement mu_2 (Eqs. 14-21, xi from IF97
// and R15-11 Eq. 25) inside the near-critical region of R12-08 Sec. 2.8
// footnote 2, mu_2 = 1 outside it (a change below 0.0051 % there). Equal to
// viscosity(st) except there; larger next to the critical point (0.38 % at
// 647.35 K and 222 kg/m3, 7.5 % at 322 kg/m3, 8.6 % at 22.065 MPa, 647.097 K).
double viscosity_with_enhancement(const State& st);  // Pa s
double conductivity(const State& st);          // W/(m K)
double kinematic_viscosity(const State& st);   // mu / rho, m2/s
double thermal_diffusivity(const State& st);   // lambda / (rho cp), m2/s
double prandtl(const State& st);               // mu cp / lambda

// Saturated liquid / vapour values at a saturation state (region 4, from
// saturation_p/T or any two-phase state); other states throw InvalidArgument.
double viscosity_liq(const State& sat);
double viscosity_vap(const State& sat);
double conductivity_liq(const State& sat);
double conductivity_vap(const State& sat);

// All transport properties of one phase at once (one evaluation).
struct Transport {
    double mu = 0;      // Pa s
    double lambda = 0;  // W/(m K)
    double nu = 0;      // m2/s
    double a = 0;       // m2/s, thermal diffusivity
    double Pr = 0;      // Prandtl number
};
Transport transport(const State& st);        // as viscosity(st) etc.
Transport transport_liq(const State& sat);   // saturated liquid
Transport transport_vap(const State& sat);   // saturated vapour

// Surface tension, R1-76(2014), N/m; 273.16 K (triple point) <= T <= Tc.
double surface_tension(double T);

}  // namespace isentra
