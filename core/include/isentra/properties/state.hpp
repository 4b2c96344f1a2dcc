// SPDX-License-Identifier: MPL-2.0
// The state solver: the full thermodynamic state of water or steam from any
// of the input pairs engineers use, by IAPWS-IF97, in core units
// (p MPa, T K, h and u kJ/kg, s kJ/(kg K), v m3/kg, rho kg/m3, w m/s).
//
// Every function here either returns a complete, valid state or throws an
// isentra::Error (RangeError for inputs outside IF97's range). None returns
// NaN as a value. All functions are reentrant (no global mutable state).
#pragma once

#include <string>

#include "isentra/base/error.hpp"
#include "isentra/if97/if97.hpp"

namespace isentra {

enum class Phase {
    Liquid,         // compressed (subcooled) liquid, p < pc
    Vapour,         // superheated vapour, p < pc (T < Tc or region 5 at any T)
    Supercritical,  // p >= pc and T >= Tc (p >= pc, T < Tc counts as compressed Liquid;
                    // p < pc, T >= Tc as Vapour)
    TwoPhase,       // inside the dome, 0 <= x <= 1 (saturated liquid/vapour included)
};

const char* phase_name(Phase phase);

struct State {
    double T = 0, p = 0, v = 0, rho = 0, u = 0, h = 0, s = 0;
    // cp, cv, w, kappa are those of the single phase; inside the dome they are
    // not defined and hold NaN (property accessors in the front ends turn
    // that into a NotDefined error that points at the saturated values).
    double cp = 0, cv = 0, w = 0, kappa = 0;
    double drhodp_T = 0;  // (d rho/d p)_T, kg/(m3 MPa); NaN in the dome
    double dvdT_p = 0;    // (d v/d T)_p, m3/(kg K); NaN in the dome
    // Vapour quality inside the dome (0..1); NaN for a single-phase state
    // (see quality() for the equilibrium quality outside the dome).
    double x = 0;
    int region = 0;  // 1, 2, 3, 4 (two-phase) or 5
    Phase phase = Phase::Liquid;
    // True for a metastable (supersaturated) vapour state from the
    // supplementary equation of region 2 (state_*_metastable); such a state
    // has region 2, phase Vapour and lies below the saturation temperature.
    bool metastable = false;
    // For a two-phase state: the saturated liquid (f) and vapour (g).
    if97::Props liq{}, vap{};
};

// Saturation temperature (K) at p in [pt, pc], and saturation pressure (MPa)
// at T in [273.15 K, Tc], range-checked like saturation_p/T but without the
// saturated liquid and vapour states (R7-97(2012) Eqs. 31 and 30).
double saturation_temperature(double p);
double saturation_pressure(double T);

// Saturation: p in [pt, pc] or T in [273.15 K, Tc]. The result is a
// two-phase State at x = 0 with liq and vap filled. At exactly the critical
// point liq == vap.
State saturation_p(double p);
State saturation_T(double T);

// The state at vapour quality x (0..1) on the saturation line of a
// saturation state `sat` (from saturation_p/T), without solving again.
// x = 0 and x = 1 give the saturated liquid and vapour with their
// single-phase properties (cp, w, ...) defined.
State with_quality(const State& sat, double x);

// True where cp, cv, w, the isentropic exponent and the transport properties
// have no finite IAPWS-IF97 value: at the critical point itself (T and p
// within 1e-9 relative of Tc and pc) and on the limit of mechanical stability
// ((d rho/d p)_T not finite and positive), which the region-3 saturated
// states reach within about 3e-5 K of Tc. cp diverges at both.
bool critical_singularity(double T, double p, double drhodp_T) noexcept;
// The NotDefined error for such a state; `subject` names what is asked for,
// with its verb: "cp is", "transport properties are".
Error critical_singularity_error(const std::string& subject);

// Single-state solvers. Inputs in core units.
State state_pT(double p, double T);  // throws Impossible if (p,T) lies exactly on the saturation line
State state_ph(double p, double h);
State state_ps(double p, double s);
State state_hs(double h, double s);
State state_px(double p, double x);  // p <= pc, 0 <= x <= 1
State state_Tx(double T, double x);  // T <= Tc, 0 <= x <= 1

// ---- Metastable (supersaturated) vapour, R7-97(2012) Section 6.2 ----------
// The supplementary equation of region 2 for the metastable-vapour region,
// Eq. 18 (residual part Table 16, ideal part Eq. 16 with Table 10 footnote a).
// Range of validity (R7-97(2012) Sec. 6.2): "from the saturated vapor line
// to the 5 % equilibrium moisture line (determined from the equilibrium h'
// and h'' values) at pressures from the triple-point pressure up to 10 MPa":
// pt <= p <= 10 MPa and T between the temperature of the 5 % line and
// Ts(p). Outside, RangeError (naming T, h or s with the limits at this p).
// Results: region 2, phase Vapour, metastable = true, x NaN (quality() gives
// the equilibrium quality, 0.95 to 1).
inline constexpr double p_max_metastable = 10.0;  // MPa, R7-97(2012) Sec. 6.2
struct MetastableLimits {
    double T_low = 0, T_high = 0;  // K: on the 5 % equilibrium-moisture line, and Ts(p)
    double h_low = 0, h_high = 0;  // kJ/kg, Eq. 18 at T_low and T_high
    double s_low = 0, s_high = 0;  // kJ/(kg K), Eq. 18 at T_low and T_high
};
MetastableLimits metastable_limits(double p);  // range-checks p
State state_pT_metastable(double p, double T);
State state_ph_metastable(double p, double h);
State state_ps_metastable(double p, double s);

// Vapour quality of any state: inside the dome its x (0..1); outside it,
// between the triple-point and critical pressures, the equilibrium quality
// (h - h')/(h'' - h'): below 0 for subcooled liquid, above 1 for superheated
// vapour (at any temperature, also above Tc). Throws NotDefined at or above the critical pressure.
double quality(const State& st);

}  // namespace isentra
