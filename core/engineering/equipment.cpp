// SPDX-License-Identifier: MPL-2.0
// Turbine and plant-equipment calculations (see equipment.hpp). Everything
// here is built on the state solver (state.hpp); no property is computed
// any other way.
#include "isentra/engineering/equipment.hpp"

#include <algorithm>
#include <cmath>
#include <cstdio>
#include <limits>
#include <string>

#include "isentra/base/error.hpp"
#include "isentra/properties/state.hpp"

#include "engineering_detail.hpp"

namespace isentra::equipment {

namespace {

using if97::pc;
using if97::Tc;

using namespace engineering::detail;

constexpr double p_wet_min = 611.213e-6;  // MPa, psat(273.15 K): below it IF97 has no liquid

void check_T(const char* name, double T) {
    check_finite(name, Quantity::Temperature, T);
    if (T < if97::T_min || T > if97::T_max)
        throw RangeError(name, Quantity::Temperature, T, if97::T_min, if97::T_max, "(the range of IAPWS-IF97)");
}

// Efficiency as a fraction; zero allowed only where the calculation stays defined.
void check_eta(const char* name, double eta, bool zero_ok, const char* what) {
    check_finite(name, Quantity::None, eta);
    if (eta < 0 || eta > 1 || (!zero_ok && eta == 0))
        throw RangeError(name, Quantity::None, eta, 0.0, 1.0,
                         std::string("(") + what + " is a fraction" + (zero_ok ? "" : " above 0") +
                             ", e.g. 0.85 for 85 %)");
}

// Re-throws a state solver's RangeError under the argument names of the
// calling function ("p" -> "p_out", ...), so the sentence names the cell's input.
struct Names {
    const char* p;
    const char* T;
    const char* h;
    const char* s;
};

[[noreturn]] void rename(const RangeError& e, const Names& n) {
    std::string in = e.input();
    if (in == "p" && n.p) in = n.p;
    else if (in == "T" && n.T) in = n.T;
    else if (in == "h" && n.h) in = n.h;
    else if (in == "s" && n.s) in = n.s;
    throw RangeError(in, e.quantity(), e.value(), e.low(), e.high(), e.context());
}

State pT(double p, double T, const Names& n) {
    try {
        return state_pT(p, T);
    } catch (const RangeError& e) {
        rename(e, n);
    }
}

State ph(double p, double h, const Names& n) {
    try {
        return state_ph(p, h);
    } catch (const RangeError& e) {
        rename(e, n);
    }
}

State ps(double p, double s, const Names& n) {
    try {
        return state_ps(p, s);
    } catch (const RangeError& e) {
        rename(e, n);
    }
}


// True if a (p,T) reading is on or inside the wet region (or, below the
// critical pressure, subcooled): T <= Tsat(p). p must be a valid pressure.
bool at_or_below_tsat(double p, double T, double& Ts) {
    if (!(p >= p_wet_min && p < pc)) return false;
    Ts = if97::tsat(p);
    return T <= Ts;
}

// A steam reading (p,T): must be superheated (or supercritical with T >= Tc).
// `role` is "inlet" or "outlet"; `instead` the sentence's way out.
State steam_pT(double p, double T, const Names& n, const char* role, const std::string& instead) {
    check_finite(n.p, Quantity::Pressure, p);
    check_finite(n.T, Quantity::Temperature, T);
    double Ts = nan_v;
    // A RangeError (code Impossible) so that front ends word it in the user's
    // units: "T_out = 40 °C is below the minimum 45.8 °C (the outlet reading
    // lies on or inside the wet region ...)".
    auto wet = [&]() -> RangeError {
        return RangeError(n.T, Quantity::Temperature, T, Ts, nan_v,
                          std::string("(the saturation temperature at ") + n.p + ": the " + role +
                              " reading lies on or inside the wet region, where p and T do not fix the "
                              "enthalpy; " + instead + ")",
                          ErrorCode::Impossible);
    };
    if (p > 0 && p <= if97::p_max && at_or_below_tsat(p, T, Ts) && T >= if97::T_min) throw wet();
    State st;
    try {
        st = pT(p, T, n);
    } catch (const RangeError&) {
        throw;
    } catch (const Error& e) {
        if (e.code() != ErrorCode::Impossible) throw;
        Ts = T;  // exactly on the saturation line
        throw wet();
    }
    if (st.phase == Phase::Liquid)
        throw RangeError(n.T, Quantity::Temperature, T, Tc, nan_v,
                         std::string("(the critical temperature: below it, above the critical pressure, the ") +
                             role + " reading is compressed water, not steam)",
                         ErrorCode::Impossible);
    return st;
}

void check_expansion_pressures(double p_in, double p_out, bool strict) {
    check_finite("p_out", Quantity::Pressure, p_out);
    if (p_out > p_in || (strict && p_out == p_in))
        throw RangeError("p_out", Quantity::Pressure, p_out, none, p_in,
                         strict ? "(the inlet pressure p_in: an expansion efficiency needs an outlet pressure "
                                  "below the inlet pressure)"
                                : "(the inlet pressure p_in: a turbine expands the steam to a lower pressure)");
}

// The highest enthalpy of water that is not steam at p: the saturated liquid
// below the critical pressure, the state at Tc above it (where the phase name
// turns from compressed water to supercritical).
double liquid_limit_h(double p) { return p < pc ? saturation_p(p).liq.h : state_pT(p, Tc).h; }

// A turbine inlet given by (p,h): steam (wet, saturated, superheated or
// supercritical), not subcooled or compressed water.
State steam_ph(double p, double h) {
    const State in = ph(p, h, Names{"p_in", "T_in", "h_in", "s_in"});
    if (in.phase == Phase::Liquid)
        throw RangeError("h_in", Quantity::SpecificEnergy, h, liquid_limit_h(p), none,
                         p < pc ? "(the saturated-liquid enthalpy at p_in: below it the inlet is subcooled water, "
                                  "not steam)"
                                : "(the enthalpy at p_in and the critical temperature: below it, above the "
                                  "critical pressure, the inlet is compressed water, not steam)",
                         ErrorCode::Impossible);
    return in;
}

// The outlet of a measured expansion (p_out, h_out): below the inlet enthalpy
// (the section does work) and not subcooled or compressed water.
void check_outlet(const State& in, double p_out, double h_out) {
    check_finite("h_out", Quantity::SpecificEnergy, h_out);
    if (!(h_out < in.h))
        throw RangeError("h_out", Quantity::SpecificEnergy, h_out, none, in.h,
                         "(the inlet enthalpy: the readings show no expansion work, so there is no efficiency)",
                         ErrorCode::Impossible);
    const State out = ph(p_out, h_out, Names{"p_out", "T_out", "h_out", "s_out"});
    if (out.phase == Phase::Liquid)
        throw RangeError("h_out", Quantity::SpecificEnergy, h_out, liquid_limit_h(p_out), none,
                         "(below it the outlet would be subcooled or compressed water, which no turbine section "
                         "delivers; check the readings)",
                         ErrorCode::Impossible);
}

const Names in_pT{"p_in", "T_in", "h_in", "s_in"};
const Names out_names{"p_out", "T_out", "h_out", "s_in (isentropic end point at p_out)"};

// A section inlet read as (p,T): superheated or supercritical steam.
State section_inlet_pT(double p_in, double T_in) {
    return steam_pT(p_in, T_in, in_pT, "inlet", "give the inlet enthalpy (STEAM.HG.P(p_in) for saturated steam) and use STEAM.TURBINE.EFF.PH.PH instead");
}

// Inlet and outlet of a section read as (p,T) at both ends: steam at both, a
// lower outlet pressure, and an outlet below the inlet enthalpy.
struct SectionReadings {
    State in, out;
};
SectionReadings section_readings_pT_pT(double p_in, double T_in, double p_out, double T_out) {
    SectionReadings r;
    r.in = section_inlet_pT(p_in, T_in);
    check_expansion_pressures(p_in, p_out, true);
    r.out = steam_pT(p_out, T_out, out_names, "outlet",
                     "use the section-efficiency function from the outlet enthalpy (from an energy balance) "
                     "instead, STEAM.TURBINE.EFF.PT.PH");
    if (!(r.out.h < r.in.h))
        throw RangeError("T_out", Quantity::Temperature, T_out, none, state_ph(p_out, r.in.h).T,
                         "(the temperature at p_out with the inlet enthalpy: the readings show no expansion "
                         "work, so there is no efficiency)",
                         ErrorCode::Impossible);
    return r;
}

Expansion expand(const State& in, double p_out, double eta) {
    Expansion e;
    e.h_in = in.h;
    e.s_in = in.s;
    const State iso = ps(p_out, in.s, out_names);
    e.h_s = iso.h;
    e.x_s = quality_or_nan(iso);
    e.h_out = in.h - eta * (in.h - iso.h);
    const State out = eta == 1.0 ? iso : ph(p_out, e.h_out, out_names);
    e.T_out = out.T;
    e.s_out = out.s;
    e.x_out = quality_or_nan(out);
    e.work = in.h - e.h_out;
    return e;
}

double efficiency(const State& in, double p_out, double h_out) {
    const State iso = ps(p_out, in.s, out_names);
    return (in.h - h_out) / (in.h - iso.h);
}

const char* const to_ph_expansion =
    "for wet or saturated steam give the inlet enthalpy (STEAM.HG.P(p_in) for saturated steam) and use the (p,h) "
    "form, e.g. STEAM.TURBINE.HOUT.PH";


}  // namespace

// ---- Turbine ---------------------------------------------------------------------

Expansion turbine_expansion_pT(double p_in, double T_in, double p_out, double eta) {
    check_eta("eta", eta, true, "the isentropic efficiency");
    const State in = steam_pT(p_in, T_in, in_pT, "inlet", to_ph_expansion);
    check_expansion_pressures(p_in, p_out, false);
    return expand(in, p_out, eta);
}

Expansion turbine_expansion_ph(double p_in, double h_in, double p_out, double eta) {
    check_eta("eta", eta, true, "the isentropic efficiency");
    const State in = steam_ph(p_in, h_in);
    check_expansion_pressures(p_in, p_out, false);
    return expand(in, p_out, eta);
}

double section_efficiency_pT_pT(double p_in, double T_in, double p_out, double T_out) {
    const SectionReadings r = section_readings_pT_pT(p_in, T_in, p_out, T_out);
    return efficiency(r.in, p_out, r.out.h);
}

double section_efficiency_pT_ph(double p_in, double T_in, double p_out, double h_out) {
    const State in = section_inlet_pT(p_in, T_in);
    check_expansion_pressures(p_in, p_out, true);
    check_outlet(in, p_out, h_out);
    return efficiency(in, p_out, h_out);
}

double section_efficiency_ph_ph(double p_in, double h_in, double p_out, double h_out) {
    const State in = steam_ph(p_in, h_in);
    check_expansion_pressures(p_in, p_out, true);
    check_outlet(in, p_out, h_out);
    return efficiency(in, p_out, h_out);
}

EfficiencyUncertainty section_efficiency_uncertainty(double p_in, double T_in, double p_out, double T_out,
                                                     double u_p_in_rel, double u_T_in, double u_p_out_rel,
                                                     double u_T_out, double patm_gauge) {
    auto check_rel = [](const char* name, double u) {
        check_finite(name, Quantity::None, u);
        if (u < 0 || u > 0.1)
            throw RangeError(name, Quantity::None, u, 0.0, 0.1,
                             "(a pressure uncertainty is a fraction of the reading, e.g. 0.0025 for 0.25 %, "
                             "at most 0.1)");
    };
    check_rel("u_p_in", u_p_in_rel);
    check_nonneg("u_T_in", Quantity::TemperatureDifference, u_T_in, "(an uncertainty cannot be negative)");
    check_rel("u_p_out", u_p_out_rel);
    check_nonneg("u_T_out", Quantity::TemperatureDifference, u_T_out, "(an uncertainty cannot be negative)");

    const SectionReadings rd = section_readings_pT_pT(p_in, T_in, p_out, T_out);
    const State& in = rd.in;
    const State& out = rd.out;
    const State iso = ps(p_out, in.s, out_names);

    EfficiencyUncertainty r;
    const double N = in.h - out.h, D = in.h - iso.h;
    const double eta = N / D;
    r.eta = eta;
    // Partial derivatives of the three enthalpies (kJ/kg per K or per MPa).
    const double dv1 = in.dvdT_p, dv2 = out.dvdT_p;  // (dv/dT)_p from the basic equations
    const double dh1_dT = in.cp, dh1_dp = 1e3 * (in.v - in.T * dv1);
    const double ds1_dT = in.cp / in.T, ds1_dp = -1e3 * dv1;
    const double dh2_dT = out.cp, dh2_dp = 1e3 * (out.v - out.T * dv2);
    const double dh2s_ds1 = iso.T, dh2s_dp2 = 1e3 * iso.v;  // (dh/ds)_p = T, (dh/dp)_s = v
    // eta = N/D: d eta/d h1 = (1 - eta)/D, d eta/d h2 = -1/D, d eta/d h2s = eta/D.
    const double e1 = (1 - eta) / D, e2 = -1 / D, e2s = eta / D;
    r.theta[0] = e1 * dh1_dp + e2s * dh2s_ds1 * ds1_dp;
    r.theta[1] = e1 * dh1_dT + e2s * dh2s_ds1 * ds1_dT;
    r.theta[2] = e2 * dh2_dp + e2s * dh2s_dp2;
    r.theta[3] = e2 * dh2_dT;
    // The pressure uncertainties: fractions of the readings as the instruments
    // show them (gauge readings when patm_gauge > 0; a vacuum reading counts by
    // its magnitude).
    const double u[4] = {u_p_in_rel * std::fabs(p_in - patm_gauge), u_T_in,
                         u_p_out_rel * std::fabs(p_out - patm_gauge), u_T_out};
    double sum = 0;
    for (int i = 0; i < 4; ++i) {
        r.contribution[i] = std::fabs(r.theta[i] * u[i]);
        sum += r.contribution[i] * r.contribution[i];
    }
    r.u_eta = std::sqrt(sum);
    for (int i = 0; i < 4; ++i)
        r.share[i] = sum > 0 ? 100.0 * r.contribution[i] * r.contribution[i] / sum : 0.0;  // all 0 if u = 0
    return r;
}

// ---- Baumann rule ------------------------------------------------------------------

double mean_moisture(double x_in, double x_out) {
    check_nonneg("x_in", Quantity::None, x_in, "(vapour quality; above 1 counts as dry superheated steam)");
    check_nonneg("x_out", Quantity::None, x_out, "(vapour quality; above 1 counts as dry superheated steam)");
    return 0.5 * ((1 - std::min(x_in, 1.0)) + (1 - std::min(x_out, 1.0)));
}

namespace {
double baumann_factor(double x_in, double x_out, double a) {
    const double y = mean_moisture(x_in, x_out);
    check_nonneg("a", Quantity::None, a, "(the Baumann coefficient, about 1)");
    const double f = 1 - a * y;
    if (!(f > 0))
        throw RangeError("a", Quantity::None, a, 0.0, 1.0 / y,
                         "for this mean moisture (a times the mean moisture must stay below 1)");
    return f;
}
}  // namespace

double baumann_wet(double eta_dry, double x_in, double x_out, double a) {
    check_eta("eta_dry", eta_dry, true, "the dry efficiency");
    return eta_dry * baumann_factor(x_in, x_out, a);
}

double baumann_dry(double eta_wet, double x_in, double x_out, double a) {
    check_eta("eta_wet", eta_wet, true, "the wet efficiency");
    const double eta = eta_wet / baumann_factor(x_in, x_out, a);
    if (eta > 1)
        throw Error(ErrorCode::Impossible,
                    "the dry efficiency eta_wet / (1 - a y) = " + num(eta) +
                        " would exceed 1: the wet efficiency is too high for this moisture and coefficient");
    return eta;
}

// ---- Pump ----------------------------------------------------------------------------

namespace {
// The pump proper from a liquid inlet state.
Pumping pump_from(const State& in, double p_in, double p_out, double eta) {
    check_finite("p_out", Quantity::Pressure, p_out);
    if (p_out < p_in)
        throw RangeError("p_out", Quantity::Pressure, p_out, p_in, none,
                         "(the inlet pressure p_in: a pump raises the pressure)");
    const Names o{"p_out", "T_out", "h_out", "s_in (isentropic end point at p_out)"};
    State iso;
    try {
        iso = ps(p_out, in.s, o);
    } catch (const RangeError& e) {
        // Water just above 0 °C cools when compressed isentropically (its expansion
        // coefficient is negative below about 4 °C), so the end point can fall below IF97.
        if (!(in.T < 281.0 && e.low() == e.low() && e.value() < e.low())) throw;
        throw Error(ErrorCode::OutOfRange,
                    "the isentropic end point at p_out would be colder than 273.15 K, below the range of "
                    "IAPWS-IF97: water this close to 0 °C cools when compressed isentropically (its expansion "
                    "coefficient is negative below about 4 °C); check T_in");
    }
    Pumping r;
    r.h_in = in.h;
    r.s_in = in.s;
    r.h_s = iso.h;
    r.work = (iso.h - in.h) / eta;
    r.h_out = in.h + r.work;
    const State out = eta == 1.0 ? iso : ph(p_out, r.h_out, o);
    r.T_out = out.T;
    r.s_out = out.s;
    return r;
}
}  // namespace

Pumping pump_pT(double p_in, double T_in, double p_out, double eta) {
    check_eta("eta", eta, false, "the pump efficiency");
    check_finite("p_in", Quantity::Pressure, p_in);
    check_finite("T_in", Quantity::Temperature, T_in);
    const Names n{"p_in", "T_in", "h_in", "s_in"};
    double Ts = nan_v;
    // Not subcooled water: a RangeError of kind Impossible on T_in, so that
    // front ends word it in the user's units. Exactly at Tsat(p_in), p and T
    // do not tell saturated water from steam: the sentence points at the
    // (p,h) form with the saturated-liquid enthalpy.
    auto not_liquid = [&](bool on_line) {
        const bool sub = p_in < pc;
        const double limit = sub ? if97::tsat(p_in) : Tc;
        return RangeError("T_in", Quantity::Temperature, T_in, nan_v, limit,
                          on_line ? "(the saturation temperature at p_in: there p and T do not fix the state; for "
                                    "saturated water use STEAM.PUMP.HOUT.PH with h_in = STEAM.HF.P(p_in))"
                          : sub   ? "(the saturation temperature at p_in: a pump takes subcooled water, colder "
                                    "than that)"
                                  : "(the critical temperature: above it the fluid at p_in is supercritical, "
                                    "not water)",
                          ErrorCode::Impossible);
    };
    if (p_in > 0 && p_in <= if97::p_max && T_in >= if97::T_min && at_or_below_tsat(p_in, T_in, Ts) && T_in == Ts)
        throw not_liquid(true);
    State in;
    try {
        in = pT(p_in, T_in, n);
    } catch (const RangeError&) {
        throw;
    } catch (const Error& e) {
        if (e.code() != ErrorCode::Impossible) throw;
        throw not_liquid(true);
    }
    if (in.phase != Phase::Liquid) throw not_liquid(false);
    return pump_from(in, p_in, p_out, eta);
}

Pumping pump_ph(double p_in, double h_in, double p_out, double eta) {
    check_eta("eta", eta, false, "the pump efficiency");
    check_finite("p_in", Quantity::Pressure, p_in);
    check_finite("h_in", Quantity::SpecificEnergy, h_in);
    const State in = ph(p_in, h_in, Names{"p_in", "T_in", "h_in", "s_in"});
    if (in.phase == Phase::Liquid) return pump_from(in, p_in, p_out, eta);
    if (p_in < pc) {
        // Saturated water (x = 0) is a pump's usual inlet (condensate from a
        // hotwell, water from a deaerator). A value that went through a unit
        // conversion may sit a few ulps above h': within 1e-9 relative it
        // counts as saturated liquid.
        const State sat = saturation_p(p_in);
        if (h_in <= sat.liq.h + 1e-9 * std::max(1.0, std::fabs(sat.liq.h)))
            return pump_from(with_quality(sat, 0.0), p_in, p_out, eta);
        throw RangeError("h_in", Quantity::SpecificEnergy, h_in, nan_v, sat.liq.h,
                         "(the saturated-liquid enthalpy at p_in: above it the inlet holds steam, and a pump takes "
                         "water)",
                         ErrorCode::Impossible);
    }
    throw RangeError("h_in", Quantity::SpecificEnergy, h_in, nan_v, liquid_limit_h(p_in),
                     "(the enthalpy at p_in and the critical temperature: above it the fluid is supercritical, not "
                     "water)",
                     ErrorCode::Impossible);
}

// ---- Valve ------------------------------------------------------------------------

namespace {
Throttling throttle(double p_in, double h, double p_out) {
    check_finite("p_out", Quantity::Pressure, p_out);
    if (p_out > p_in)
        throw RangeError("p_out", Quantity::Pressure, p_out, none, p_in,
                         "(the inlet pressure p_in: a valve can only lower the pressure)");
    const State out = ph(p_out, h, Names{"p_out", "T_out", "h (at p_out)", "s_out"});
    Throttling r;
    r.h = h;
    r.T_out = out.T;
    r.s_out = out.s;
    r.x_out = quality_or_nan(out);
    return r;
}
}  // namespace

Throttling valve_pT(double p_in, double T_in, double p_out) {
    State in;
    try {
        in = pT(p_in, T_in, Names{"p_in", "T_in", "h_in", "s_in"});
    } catch (const RangeError&) {
        throw;
    } catch (const Error& e) {
        if (e.code() != ErrorCode::Impossible) throw;
        throw Error(ErrorCode::Impossible,
                    "p_in and T_in lie exactly on the saturation line (T_in = Tsat(p_in)), where they do not fix the "
                    "inlet state: use the (p,h) form, e.g. STEAM.VALVE.TOUT.PH, with h_in = STEAM.HF.P(p_in) for "
                    "saturated water or STEAM.HG.P(p_in) for saturated steam");
    }
    return throttle(p_in, in.h, p_out);
}

Throttling valve_ph(double p_in, double h_in, double p_out) {
    const State in = ph(p_in, h_in, Names{"p_in", "T_in", "h_in", "s_in"});
    return throttle(p_in, in.h, p_out);
}

// ---- Mixing ------------------------------------------------------------------------

double mix_h(double m1, double h1, double m2, double h2) {
    check_nonneg("m1", Quantity::MassFlow, m1, "(a mass flow cannot be negative)");
    check_nonneg("m2", Quantity::MassFlow, m2, "(a mass flow cannot be negative)");
    check_finite("h1", Quantity::SpecificEnergy, h1);
    check_finite("h2", Quantity::SpecificEnergy, h2);
    if (!(m1 + m2 > 0))
        throw Error(ErrorCode::InvalidArgument, "both flows m1 and m2 are zero: there is nothing to mix");
    return (m1 * h1 + m2 * h2) / (m1 + m2);
}

Mixing mix(double m1, double h1, double m2, double h2, double p) {
    Mixing r;
    r.h = mix_h(m1, h1, m2, h2);
    r.m = m1 + m2;
    const State st = ph(p, r.h, Names{"p", "T", "h (mixed)", "s"});
    r.T = st.T;
    r.s = st.s;
    r.x = quality_or_nan(st);
    return r;
}

// ---- Desuperheater -------------------------------------------------------------------

double desuperheater_spray(double m_steam, double p_steam, double T_steam, double T_out, double p_water,
                           double T_water) {
    check_nonneg("m_steam", Quantity::MassFlow, m_steam, "(a mass flow cannot be negative)");
    const Names sn{"p_steam", "T_steam", "h_steam", "s_steam"};
    const State steam = steam_pT(p_steam, T_steam, sn, "steam",
                                 "a desuperheater needs superheated steam at its inlet");
    check_T("T_out", T_out);
    double Ts = nan_v;
    if (at_or_below_tsat(p_steam, T_out, Ts))
        throw RangeError("T_out", Quantity::Temperature, T_out, Ts, none,
                         "(the saturation temperature at p_steam: the desuperheater outlet must stay superheated)");
    if (T_out > T_steam)
        throw RangeError("T_out", Quantity::Temperature, T_out, none, T_steam,
                         "(the steam temperature T_steam: spray water can only cool the steam)");
    const State out = pT(p_steam, T_out, Names{"p_steam", "T_out", "h_out", "s_out"});
    check_finite("p_water", Quantity::Pressure, p_water);
    if (p_water < p_steam)
        throw RangeError("p_water", Quantity::Pressure, p_water, p_steam, none,
                         "(the steam pressure p_steam: spray water must be supplied above the steam pressure to "
                         "enter the steam)",
                         ErrorCode::Impossible);
    const State water = pT(p_water, T_water, Names{"p_water", "T_water", "h_water", "s_water"});
    if (water.phase != Phase::Liquid)
        throw RangeError("T_water", Quantity::Temperature, T_water, nan_v,
                         p_water < pc ? if97::tsat(p_water) : Tc,
                         "(the saturation or critical temperature at p_water: spray water must be liquid)",
                         ErrorCode::Impossible);
    if (!(water.h < out.h))
        throw Error(ErrorCode::Impossible, "the spray water's enthalpy (" + num(water.h) +
                                               " kJ/kg) is not below the outlet enthalpy (" + num(out.h) +
                                               " kJ/kg): it cannot cool the steam");
    return m_steam * (steam.h - out.h) / (out.h - water.h);
}

// ---- Feedwater heater ----------------------------------------------------------------

double fwh_ttd(double p_shell, double T_fw_out) {
    check_T("T_fw_out", T_fw_out);
    double Ts = 0;
    try {
        Ts = saturation_temperature(p_shell);
    } catch (const RangeError& e) {
        rename(e, Names{"p_shell", nullptr, nullptr, nullptr});
    }
    return Ts - T_fw_out;
}

double fwh_dca(double T_drain, double T_fw_in) {
    check_T("T_drain", T_drain);
    check_T("T_fw_in", T_fw_in);
    if (T_drain < T_fw_in)
        throw RangeError("T_drain", Quantity::Temperature, T_drain, T_fw_in, none,
                         "(the feedwater inlet temperature T_fw_in: the drain cannot leave colder than the "
                         "coldest water it meets; check the readings)",
                         ErrorCode::Impossible);
    return T_drain - T_fw_in;
}

double fwh_rise(double T_fw_in, double T_fw_out) {
    check_T("T_fw_in", T_fw_in);
    check_T("T_fw_out", T_fw_out);
    if (T_fw_out < T_fw_in)
        throw RangeError("T_fw_out", Quantity::Temperature, T_fw_out, T_fw_in, none,
                         "(the feedwater inlet temperature T_fw_in: a heater does not cool the feedwater; check "
                         "the readings)",
                         ErrorCode::Impossible);
    return T_fw_out - T_fw_in;
}

double fwh_extraction_flow(double m_fw, double h_fw_in, double h_fw_out, double h_ext, double h_drain,
                           double m_casc, double h_casc) {
    check_nonneg("m_fw", Quantity::MassFlow, m_fw, "(a mass flow cannot be negative)");
    check_finite("h_fw_in", Quantity::SpecificEnergy, h_fw_in);
    check_finite("h_fw_out", Quantity::SpecificEnergy, h_fw_out);
    check_finite("h_ext", Quantity::SpecificEnergy, h_ext);
    check_finite("h_drain", Quantity::SpecificEnergy, h_drain);
    check_nonneg("m_casc", Quantity::MassFlow, m_casc, "(a mass flow cannot be negative; 0 without cascading drains)");
    check_finite("h_casc", Quantity::SpecificEnergy, h_casc);
    check_heated("h_fw_out", h_fw_out, h_fw_in, "the feedwater inlet enthalpy h_fw_in");
    check_drain_and_extraction(h_fw_in, h_drain, h_ext);
    const double q_fw = m_fw * (h_fw_out - h_fw_in);
    const double q_casc = m_casc * (h_casc - h_drain);
    const double m = (q_fw - q_casc) / (h_ext - h_drain);
    if (m < 0)
        throw Error(ErrorCode::Impossible,
                    "the energy balance gives a negative extraction flow: the feedwater takes up " + num(q_fw) +
                        " kW but the cascading drains alone give " + num(q_casc) + " kW; check the readings");
    return m;
}

// ---- Heat rate ----------------------------------------------------------------------

namespace {
// A heat rate below 3600 kJ/kWh (1 kWh of heat per kWh of electricity) would
// mean more than 100 % efficiency (first law; 3600 kJ/kWh = 3412.14 Btu/kWh).
void check_generator_output(double P_gen) {
    check_finite("P_gen", Quantity::Power, P_gen);
    if (!(P_gen > 0)) throw RangeError("P_gen", Quantity::Power, P_gen, 0.0, none, "(the generator output must be positive)");
}

double checked_heat_rate(double hr) {
    if (hr < 3600.0)
        throw Error(ErrorCode::Impossible,
                    "the heat rate comes out at " + num(hr) + " kJ/kWh (" + num(hr / 1.05505585262) +
                        " Btu/kWh), below 3600 kJ/kWh (3412.14 Btu/kWh), which would mean more than 100 % "
                        "efficiency: the output is larger than the heat added; check the flows, enthalpies and "
                        "output");
    return hr;
}
}  // namespace

double cycle_heat_input(double m_ms, double h_ms, double h_fw, double m_rh, double h_hrh, double h_crh) {
    check_nonneg("m_ms", Quantity::MassFlow, m_ms, "(a mass flow cannot be negative)");
    check_finite("h_ms", Quantity::SpecificEnergy, h_ms);
    check_finite("h_fw", Quantity::SpecificEnergy, h_fw);
    check_nonneg("m_rh", Quantity::MassFlow, m_rh, "(a mass flow cannot be negative; 0 for a unit without reheat)");
    check_finite("h_hrh", Quantity::SpecificEnergy, h_hrh);
    check_finite("h_crh", Quantity::SpecificEnergy, h_crh);
    if (m_rh > 0 && h_hrh < h_crh)
        throw RangeError("h_hrh", Quantity::SpecificEnergy, h_hrh, h_crh, none,
                         "(the cold reheat enthalpy h_crh: a reheater adds heat)", ErrorCode::Impossible);
    const double q = m_ms * (h_ms - h_fw) + m_rh * (h_hrh - h_crh);
    if (!(q > 0))
        throw Error(ErrorCode::Impossible,
                    "the heat added to the cycle, m_ms (h_ms - h_fw) + m_rh (h_hrh - h_crh) = " + num(q) +
                        " kW, is not positive; check the flows and enthalpies");
    return q;
}

double cycle_heat_rate(double m_ms, double h_ms, double h_fw, double m_rh, double h_hrh, double h_crh,
                       double P_gen) {
    const double q = cycle_heat_input(m_ms, h_ms, h_fw, m_rh, h_hrh, h_crh);
    check_generator_output(P_gen);
    return checked_heat_rate(3600.0 * q / P_gen);
}

double net_heat_rate(double m_ms, double h_ms, double h_fw, double m_rh, double h_hrh, double h_crh,
                     double P_gen, double P_aux, double eta_boiler) {
    const double q = cycle_heat_input(m_ms, h_ms, h_fw, m_rh, h_hrh, h_crh);
    check_generator_output(P_gen);
    check_nonneg("P_aux", Quantity::Power, P_aux, "(the auxiliary power cannot be negative)");
    if (!(P_aux < P_gen))
        throw RangeError("P_aux", Quantity::Power, P_aux, 0.0, P_gen,
                         "(the generator output P_gen: the net output P_gen - P_aux must be positive)");
    check_eta("eta_boiler", eta_boiler, false, "the boiler efficiency");
    return checked_heat_rate(3600.0 * q / eta_boiler / (P_gen - P_aux));
}

}  // namespace isentra::equipment
