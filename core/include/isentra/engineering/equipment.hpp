// SPDX-License-Identifier: MPL-2.0
// Turbine and plant-equipment calculations on top of the state solver, in
// core units: p MPa, T K, temperature differences K, h kJ/kg, s kJ/(kg K),
// mass flow kg/s, power kW, heat rate kJ/kWh; efficiencies, qualities and
// moisture as fractions (0.85, not 85).
//
// Every function returns finite values or throws isentra::Error (RangeError
// for an input outside its range, naming the input as the spreadsheet
// function does: "p_in", "T_out", "eta", ...). All are reentrant.
//
// Rule of the inputs: machines through which steam expands or is pumped take
// their states ((p,T), or (p,h) where the steam may be wet); heat and mass
// balances (mixing, feedwater heater, heat rate) take enthalpies, so that any
// state (wet, superheated, liquid) can be used, e.g. from STEAM.H.PT.
#pragma once

namespace isentra::equipment {

// ---- Turbine expansion -----------------------------------------------------

// Expansion from an inlet state to the outlet pressure with an isentropic
// efficiency eta = (h_in - h_out)/(h_in - h_s), h_s = h(p_out, s_in).
// x values are vapour qualities: 0..1 in the wet region; outside it, below
// the critical pressure, the equilibrium quality (h - h')/(h'' - h') at that
// pressure (above 1 for superheated steam, at any temperature); NaN at or
// above the critical pressure, where no quality exists.
struct Expansion {
    double h_in = 0, s_in = 0;        // inlet
    double h_out = 0, T_out = 0;      // actual outlet; T_out = Tsat(p_out) when wet
    double s_out = 0, x_out = 0;
    double h_s = 0, x_s = 0;          // isentropic end point h(p_out, s_in) and its quality
    double work = 0;                  // specific work h_in - h_out, kJ/kg (positive for a turbine)
};

// Inlet by (p,T): must be steam (T above Tsat(p_in) below the critical
// pressure, T >= Tc above it); an inlet on or inside the wet region is an
// Impossible error pointing at the (p,h) form.
// 0 <= eta <= 1; p_out <= p_in.
Expansion turbine_expansion_pT(double p_in, double T_in, double p_out, double eta);
// Inlet by (p,h): any steam state including wet steam.
Expansion turbine_expansion_ph(double p_in, double h_in, double p_out, double eta);

// ---- Section efficiency from test readings --------------------------------

// Enthalpy-drop efficiency (h_in - h_out)/(h_in - h_s) from inlet (p,T) and
// outlet (p,T) readings. The outlet must be superheated: a reading with
// T_out <= Tsat(p_out) (p_out below the critical pressure) lies on or inside
// the wet region, where p and T do not fix h: ErrorCode::Impossible with a
// sentence that points at the enthalpy form. The value is returned as
// measured (it may exceed 1 or be negative for inconsistent readings).
double section_efficiency_pT_pT(double p_in, double T_in, double p_out, double T_out);
// Outlet by its enthalpy (e.g. from an energy balance) for a wet exhaust.
double section_efficiency_pT_ph(double p_in, double T_in, double p_out, double h_out);
double section_efficiency_ph_ph(double p_in, double h_in, double p_out, double h_out);

// ---- Uncertainty of a section efficiency (ASME PTC 19.1 RSS) --------------

// Inputs: the four readings and the uncertainty of each instrument: pressure
// uncertainties as a fraction of the reading (0.001 = 0.1 % of reading; at
// most 0.1, so that a percentage typed by mistake is caught),
// temperature uncertainties in K. The sensitivity coefficients
// theta_i = d eta / d x_i are computed analytically from the core's property
// derivatives ((dh/dT)_p = cp, (ds/dT)_p = cp/T, (dh/dp)_T = v - T (dv/dT)_p,
// (ds/dp)_T = -(dv/dT)_p, and along the isentrope (dh/ds)_p = T, (dh/dp)_s = v).
// u_eta = sqrt(sum (theta_i u_i)^2); the result has the same coverage (level
// of confidence) as the instrument uncertainties given.
struct EfficiencyUncertainty {
    double eta = 0;
    double u_eta = 0;            // uncertainty of eta (fraction)
    // Order of the arrays: p_in, T_in, p_out, T_out.
    double theta[4] = {0, 0, 0, 0};         // sensitivities: per MPa (p), per K (T)
    double contribution[4] = {0, 0, 0, 0};  // |theta_i u_i| (fraction of efficiency)
    double share[4] = {0, 0, 0, 0};         // (theta_i u_i)^2 / u_eta^2 * 100, in %; sums to 100
};
// u_p_in_rel and u_p_out_rel are fractions of the pressure readings; for
// gauge instruments give the barometric pressure as patm_gauge (MPa) and the
// fractions apply to the gauge readings p - patm_gauge (0: absolute readings).
EfficiencyUncertainty section_efficiency_uncertainty(double p_in, double T_in, double p_out, double T_out,
                                                     double u_p_in_rel, double u_T_in, double u_p_out_rel,
                                                     double u_T_out, double patm_gauge = 0.0);

// ---- Wet-stage correction (Baumann rule, common practice) -----------------

// Mean moisture of a stage or section: ((1 - x_in) + (1 - x_out))/2 with
// qualities above 1 (superheated) counted as dry (moisture 0).
double mean_moisture(double x_in, double x_out);
// eta_wet = eta_dry (1 - a y_m), y_m the mean moisture, a the Baumann
// coefficient (about 1: 1 % efficiency lost per 1 % mean moisture).
double baumann_wet(double eta_dry, double x_in, double x_out, double a);
// The inverse: eta_dry = eta_wet / (1 - a y_m).
double baumann_dry(double eta_wet, double x_in, double x_out, double a);

// ---- Pump --------------------------------------------------------------------

struct Pumping {
    double h_in = 0, s_in = 0;
    double h_out = 0, T_out = 0, s_out = 0;
    double h_s = 0;   // h(p_out, s_in)
    double work = 0;  // h_out - h_in = (h_s - h_in)/eta, kJ/kg (positive)
};
// Inlet (p,T) must be liquid (below Tsat(p_in)); p_out >= p_in; 0 < eta <= 1.
// Exactly at Tsat(p_in) the error points at pump_ph with h' (saturated water).
Pumping pump_pT(double p_in, double T_in, double p_out, double eta);
// Inlet (p,h): subcooled or saturated water (h_in <= h'(p_in), within 1e-9
// relative, so h' that went through a unit conversion counts as saturated),
// e.g. condensate leaving a hotwell or water leaving a deaerator.
Pumping pump_ph(double p_in, double h_in, double p_out, double eta);

// ---- Throttling valve (isenthalpic) -------------------------------------------

struct Throttling {
    double h = 0;                      // h_out = h_in
    double T_out = 0, s_out = 0, x_out = 0;  // x as in Expansion
};
Throttling valve_pT(double p_in, double T_in, double p_out);  // p_out <= p_in
Throttling valve_ph(double p_in, double h_in, double p_out);

// ---- Adiabatic mixing of two streams -------------------------------------------

struct Mixing {
    double m = 0;  // m1 + m2
    double h = 0;  // (m1 h1 + m2 h2)/(m1 + m2)
    double T = 0, s = 0, x = 0;  // of the mixed state at p
};
double mix_h(double m1, double h1, double m2, double h2);  // m1, m2 >= 0, m1 + m2 > 0
Mixing mix(double m1, double h1, double m2, double h2, double p);

// ---- Desuperheater (spray attemperator) -----------------------------------------

// Spray-water flow that brings steam m_steam at (p_steam, T_steam) to the
// superheated outlet temperature T_out at p_steam, water at (p_water, T_water):
// m_w = m_steam (h_steam - h_out)/(h_out - h_water).
double desuperheater_spray(double m_steam, double p_steam, double T_steam, double T_out, double p_water,
                           double T_water);

// ---- Closed feedwater heater (ASME PTC 12.1 definitions) -------------------------

double fwh_ttd(double p_shell, double T_fw_out);   // Tsat(p_shell) - T_fw_out
double fwh_dca(double T_drain, double T_fw_in);    // T_drain - T_fw_in
double fwh_rise(double T_fw_in, double T_fw_out);  // T_fw_out - T_fw_in
// Extraction steam flow from the heater's energy balance:
// m_fw (h_fw_out - h_fw_in) = m_ext (h_ext - h_drain) + m_casc (h_casc - h_drain).
double fwh_extraction_flow(double m_fw, double h_fw_in, double h_fw_out, double h_ext, double h_drain,
                           double m_casc, double h_casc);

// ---- Heat rate -----------------------------------------------------------------

// Heat added to the cycle, kW: m_ms (h_ms - h_fw) + m_rh (h_hrh - h_crh).
double cycle_heat_input(double m_ms, double h_ms, double h_fw, double m_rh, double h_hrh, double h_crh);
// Turbine cycle heat rate, kJ/kWh: 3600 * heat input / P_gen.
double cycle_heat_rate(double m_ms, double h_ms, double h_fw, double m_rh, double h_hrh, double h_crh,
                       double P_gen);
// Net unit heat rate, kJ/kWh: 3600 * heat input / eta_boiler / (P_gen - P_aux).
double net_heat_rate(double m_ms, double h_ms, double h_fw, double m_rh, double h_hrh, double h_crh,
                     double P_gen, double P_aux, double eta_boiler);

}  // namespace isentra::equipment
