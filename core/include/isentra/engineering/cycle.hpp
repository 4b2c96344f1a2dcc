// SPDX-License-Identifier: MPL-2.0
// Cycle heat-balance pieces on top of the state solver and equipment.hpp, in
// core units (p MPa, T K, temperature differences K, h kJ/kg, s kJ/(kg K),
// mass flow kg/s; efficiencies, qualities, fractions as fractions).
//
// These are the calculations a regenerative reheat cycle needs besides the
// single machines of equipment.hpp: states at extraction pressures on a
// section's expansion line, the wet end of an LP section (Baumann rule) and
// its used energy end point, the closed heater's drain leaving a drain cooler,
// the open (deaerating) heater, and two closed heaters around a drain that is
// pumped forward into the feedwater line. Each is closed-form or solved inside
// the function, so a spreadsheet can compute a whole cycle top heater down in
// one pass without circular references.
//
// Every function returns finite values or throws isentra::Error (RangeError
// naming the spreadsheet argument). All are reentrant.
#pragma once

namespace isentra::cycle {

// ---- A point on a section's expansion line -----------------------------------

// The state at an intermediate (extraction) pressure p_ext on the expansion
// line of a turbine section from its inlet to its exhaust pressure p_out with
// one section efficiency eta.
//
// Rule (common practice): the expansion line is the straight line in the h-s
// plane from the inlet state (h_in, s_in) to the section's end point
// (h_end, s_end) at p_out, h_end = h_in - eta (h_in - h(p_out, s_in)); the
// point at p_ext is where that line crosses the isobar p_ext. The section's
// overall efficiency is therefore exactly eta, whatever the extraction
// pressures; the efficiencies of the parts above and below p_ext each come
// out slightly below eta (reheat factor: the parts' isentropic drops add up to
// more than the section's).
// p_out <= p_ext <= p_in; p_ext = p_in gives the inlet, p_ext = p_out the end point.
struct LinePoint {
    double h = 0, T = 0, s = 0;
    double x = 0;  // equilibrium quality at p_ext (above 1 superheated); NaN at or above pc
    double t = 0;  // position on the line: 0 at the inlet, 1 at the end point
};
LinePoint expansion_line_point_pT(double p_in, double T_in, double p_out, double eta, double p_ext);
LinePoint expansion_line_point_ph(double p_in, double h_in, double p_out, double eta, double p_ext);

// ---- Wet exhaust of a section: Baumann rule, expansion-line end point, UEEP ----

// A section (usually the LP turbine) whose exhaust is wet, with its dry-steam
// efficiency eta_dry and the Baumann coefficient a (common practice: the
// efficiency falls by a times the mean moisture of the section):
//   eta_wet = eta_dry (1 - a y_m),  y_m = (y_in + y_end)/2,
//   y = 1 - x, superheated ends (x >= 1) counted dry (y = 0),
//   h_end = h_in - eta_wet (h_in - h_s),  h_s = h(p_out, s_in).
// y_end depends on h_end; in the wet region x = (h - h')/(h'' - h') is linear
// in h at p_out, so the relation is solved in closed form:
//   h_end = (h_in - D + D a (1 + y_in)/2 + D a h'/(2 r)) / (1 + D a/(2 r)),
//   D = eta_dry (h_in - h_s), r = h'' - h' at p_out;
// if that end point is not wet, y_end = 0 and h_end = h_in - D (1 - a y_in/2).
// This is the expansion-line end point (ELEP). The used energy end point
// (UEEP) adds the exhaust loss h_loss (kinetic energy leaving the last stage
// and the exhaust hood loss, kJ per kg of exhaust steam; common practice):
//   h_ueep = h_elep + h_loss.
// The section's work is h_in - h_ueep; the condenser receives the steam at h_ueep.
struct WetExhaust {
    double h_elep = 0, T = 0, s_elep = 0, x_elep = 0;  // end point; T = Tsat(p_out) when wet
    double eta_wet = 0;                                 // (h_in - h_elep)/(h_in - h_s)
    double y_mean = 0;                                  // mean moisture used
    double h_ueep = 0, x_ueep = 0;
};
// 0 < eta_dry <= 1, a >= 0 with a y_m < 1, h_loss >= 0, p_out < p_in, p_out below pc.
WetExhaust wet_exhaust_pT(double p_in, double T_in, double p_out, double eta_dry, double a, double h_loss);
WetExhaust wet_exhaust_ph(double p_in, double h_in, double p_out, double eta_dry, double a, double h_loss);

// ---- Closed heater drain leaving a drain cooler -------------------------------------

// Drain enthalpy from the drain cooler approach: T_drain = T_fw_in + dca,
// h = h(p_shell, T_drain), liquid (T_drain below Tsat(p_shell)); dca >= 0.
// (ASME PTC 12.1 definition of the DCA.)
double drain_enthalpy_dca(double p_shell, double T_fw_in, double dca);

// ---- Open (deaerating) heater ----------------------------------------------------------

// Mass and energy balance of an open heater whose outlet is saturated liquid
// at the heater pressure p_da (h' = h'(p_da)):
//   m_out = m_cond + m_drain + m_ext,
//   m_out h' = m_cond h_cond + m_drain h_drain + m_ext h_ext, so
//   m_ext = (m_out (h' - h_cond) - m_drain (h_drain - h_cond)) / (h_ext - h_cond).
// m_out is the flow leaving (to the feed pump), m_drain the drains cascading in.
struct Deaerator {
    double m_ext = 0, m_cond = 0;
    double h_out = 0, T_out = 0;  // h'(p_da), Tsat(p_da)
};
Deaerator deaerator(double p_da, double m_out, double h_cond, double h_ext, double m_drain, double h_drain);

// ---- Two closed heaters around a drain pumped forward ------------------------------------

// Heater "lo" and the next heater up the feedwater line, "up". Up's drain
// (its own extraction plus m_casc_up cascading into it) cascades into lo.
// A fraction frac of lo's drain (0..1; 1 = all, 0 = none, which is the plain
// cascade) is pumped forward into the feedwater line between lo and up (the
// mix point); the rest cascades on to the heater below (m_down).
//   lo:  (m_fw - m_p)(h_fw_mid - h_fw_in) = m_ext (h_ext - h_drain) + (m_ext_up + m_casc_up)(h_drain_up - h_drain)
//   mix: m_fw h_mix = (m_fw - m_p) h_fw_mid + m_p h_pumped
//   up:  m_fw (h_fw_out - h_mix) = m_ext_up (h_ext_up - h_drain_up) + m_casc_up (h_casc_up - h_drain_up)
//   m_p = frac (m_ext + m_ext_up + m_casc_up),  m_down = (1 - frac)(...)
// Up's drain cooler is referred to the water it meets, the mixed stream:
// h_drain_up = h(p_shell_up, T_mix + dca_up), T_mix = T(p_fw, h_mix); the
// two flows are linear in the enthalpies and are solved exactly for a given
// h_drain_up; h_drain_up is then iterated inside the function (it depends on
// the mix only weakly; converged to 1e-12 kJ/kg).
// m_fw: feedwater flow leaving the mix point (through up); h_pumped: lo's
// drain after the drain pump (e.g. from STEAM.PUMP.HOUT.PT).
struct DrainPump {
    double m_ext_up = 0, m_ext = 0, m_pumped = 0, m_down = 0;
    double h_mix = 0, T_mix = 0, h_drain_up = 0;
};
DrainPump pumped_drain(double m_fw, double p_fw, double h_fw_in, double h_fw_mid, double h_fw_out, double h_ext,
                       double h_drain, double h_pumped, double h_ext_up, double p_shell_up, double dca_up,
                       double m_casc_up, double h_casc_up, double frac);

}  // namespace isentra::cycle
