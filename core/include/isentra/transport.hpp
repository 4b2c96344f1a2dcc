// SPDX-License-Identifier: MPL-2.0
// Transport and interfacial properties of water and steam.
//   viscosity:            IAPWS R12-08 (industrial use: IF97 densities)
//   thermal conductivity: IAPWS R15-11, industrial formulation (IF97-based)
//   surface tension:      IAPWS R1-76(2014)
// Units: Pa s, W/(m K), N/m, m2/s.
#pragma once

#include "isentra/state.hpp"

namespace isentra {

// Raw correlations from density and temperature (and, for the critical
// enhancement, the derivatives the releases ask for). No range checks.
double viscosity_rhoT(double rho, double T, double drhodp_T_at_T, double drhodp_T_at_TR);
double conductivity_rhoT(double rho, double T, double cp, double cv, double mu,
                         double drhodp_T_at_T, double drhodp_T_at_TR);

// On a solved single-phase state (throws NotDefined for a two-phase state
// with 0 < x < 1, naming the saturated-liquid and -vapour alternatives;
// RangeError outside the release's range).
double viscosity(const State& st);
double conductivity(const State& st);
double kinematic_viscosity(const State& st);   // mu / rho
double thermal_diffusivity(const State& st);   // lambda / (rho cp)
double prandtl(const State& st);               // mu cp / lambda

// Saturated liquid / vapour values at a saturation state (from saturation_p/T).
double viscosity_liq(const State& sat);
double viscosity_vap(const State& sat);
double conductivity_liq(const State& sat);
double conductivity_vap(const State& sat);

// Surface tension, R1-76(2014) Eq. 1, 273.16 K (triple point) <= T <= Tc.
double surface_tension(double T);

}  // namespace isentra
