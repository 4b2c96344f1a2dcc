// SPDX-License-Identifier: MPL-2.0
// Cycle heat-balance pieces (see cycle.hpp). Every property comes from the
// state solver (state.hpp); turbine inlets and end points from equipment.hpp.
#include "isentra/engineering/cycle.hpp"

#include <boost/math/tools/roots.hpp>

#include <algorithm>
#include <cmath>
#include <cstdint>
#include <cstdio>
#include <limits>
#include <string>

#include "isentra/base/error.hpp"
#include "isentra/engineering/equipment.hpp"
#include "isentra/properties/state.hpp"

#include "engineering_detail.hpp"

namespace isentra::cycle {

namespace {

using if97::pc;

using namespace engineering::detail;

// Re-throws a state solver's RangeError on "p"/"T"/"h" under the caller's names.
[[noreturn]] void rename(const RangeError& e, const char* p, const char* T, const char* h) {
    std::string in = e.input();
    if (in == "p" && p) in = p;
    else if (in == "T" && T) in = T;
    else if (in == "h" && h) in = h;
    throw RangeError(in, e.quantity(), e.value(), e.low(), e.high(), e.context(), e.code());
}

State ph(double p, double h, const char* pn, const char* hn) {
    try {
        return state_ph(p, h);
    } catch (const RangeError& e) {
        rename(e, pn, nullptr, hn);
    }
}

State pT(double p, double T, const char* pn, const char* Tn) {
    try {
        return state_pT(p, T);
    } catch (const RangeError& e) {
        rename(e, pn, Tn, nullptr);
    }
}

double tsat_of(double p, const char* name) {
    try {
        return saturation_temperature(p);
    } catch (const RangeError& e) {
        rename(e, name, nullptr, nullptr);
    }
}

// ---- Expansion line ----------------------------------------------------------------

LinePoint line_point(const equipment::Expansion& e, double p_in, double p_out, double p_ext) {
    check_finite("p_ext", Quantity::Pressure, p_ext);
    if (p_ext > p_in || p_ext < p_out)
        throw RangeError("p_ext", Quantity::Pressure, p_ext, p_out, p_in,
                         "(the extraction pressure lies on the section between its exhaust pressure p_out and "
                         "its inlet pressure p_in)");
    const double h0 = e.h_in, s0 = e.s_in, h1 = e.h_out, s1 = e.s_out;
    auto at = [&](double t, State& st) {
        st = state_ps(p_ext, s0 + t * (s1 - s0));
        return (h0 + t * (h1 - h0)) - st.h;
    };
    LinePoint r;
    State st;
    double t = 0;
    if (p_ext == p_in) {
        t = 0;
    } else if (p_ext == p_out) {
        t = 1;
    } else {
        // f(t) = h_line(t) - h(p_ext, s_line(t)) falls strictly from f(0) > 0
        // (the inlet lies above the isobar p_ext) to f(1) < 0 (the end point lies below it).
        auto f = [&](double tt) {
            State tmp;
            return at(tt, tmp);
        };
        double f0 = f(0.0), f1 = f(1.0);
        if (!(f0 > 0) || !(f1 < 0)) {
            // Round-off right at an end of the line.
            t = std::fabs(f0) <= std::fabs(f1) ? 0.0 : 1.0;
        } else {
            std::uintmax_t it = 200;
            const auto res = boost::math::tools::toms748_solve(f, 0.0, 1.0, f0, f1,
                                                               boost::math::tools::eps_tolerance<double>(50), it);
            t = 0.5 * (res.first + res.second);
        }
    }
    r.t = t;
    r.s = s0 + t * (s1 - s0);
    r.h = h0 + t * (h1 - h0);
    st = ph(p_ext, r.h, "p_ext", "h (on the expansion line)");
    r.T = st.T;
    r.x = quality_or_nan(st);
    return r;
}

// ---- Wet exhaust -------------------------------------------------------------------

WetExhaust wet_exhaust(const equipment::Expansion& dry, double x_in, double p_out, double eta_dry, double a,
                       double h_loss) {
    check_nonneg("a", Quantity::None, a, "(the Baumann coefficient, about 1)");
    check_nonneg("h_loss", Quantity::SpecificEnergy, h_loss,
                 "(the exhaust loss: leaving energy and hood loss per kg of exhaust steam, 0 or more)");
    if (!(p_out < pc))
        throw RangeError("p_out", Quantity::Pressure, p_out, none, pc,
                         "(the critical pressure: a wet exhaust needs an exhaust pressure below it)");
    const double y_in = std::isfinite(x_in) ? std::max(0.0, 1.0 - std::min(x_in, 1.0)) : 0.0;
    const State sat = saturation_p(p_out);
    const double hf = sat.liq.h, hg = sat.vap.h, r = hg - hf;
    const double D = eta_dry * (dry.h_in - dry.h_s);
    // Wet end point (closed form, x linear in h at p_out).
    double h_end = (dry.h_in - D + D * a * (1.0 + y_in) / 2.0 + D * a * hf / (2.0 * r)) / (1.0 + D * a / (2.0 * r));
    double y_end = 1.0 - (h_end - hf) / r;
    if (!(y_end > 0)) {  // the end point is not wet: only the inlet moisture counts
        y_end = 0;
        h_end = dry.h_in - D * (1.0 - a * y_in / 2.0);
    }
    const double y_m = 0.5 * (y_in + y_end);
    const double f = 1.0 - a * y_m;
    if (!(f > 0))
        throw RangeError("a", Quantity::None, a, 0.0, 1.0 / y_m,
                         "for this mean moisture (a times the mean moisture must stay below 1)");
    if (h_end < hf)
        throw Error(ErrorCode::Impossible,
                    "the expansion-line end point would be below the saturated-liquid enthalpy at p_out (" +
                        num(h_end) + " kJ/kg): check the efficiency and the Baumann coefficient");
    WetExhaust w;
    w.h_elep = h_end;
    w.y_mean = y_m;
    w.eta_wet = dry.h_in > dry.h_s ? (dry.h_in - h_end) / (dry.h_in - dry.h_s) : eta_dry * f;
    const State end = ph(p_out, h_end, "p_out", "h (end point)");
    w.T = end.T;
    w.s_elep = end.s;
    w.x_elep = quality_or_nan(end);
    w.h_ueep = h_end + h_loss;
    const State ue = ph(p_out, w.h_ueep, "p_out", "h (used energy end point)");
    w.x_ueep = quality_or_nan(ue);
    return w;
}

void check_eta_dry(double eta) {
    check_finite("eta_dry", Quantity::None, eta);
    if (!(eta > 0) || eta > 1)
        throw RangeError("eta_dry", Quantity::None, eta, 0.0, 1.0,
                         "(the dry-steam section efficiency is a fraction above 0, e.g. 0.90 for 90 %)");
}

// A section with a wet exhaust expands: p_out below p_in.
void check_expands(double p_in, double p_out) {
    if (!(p_out < p_in))
        throw RangeError("p_out", Quantity::Pressure, p_out, none, p_in,
                         "(the inlet pressure p_in: the section expands the steam to a lower pressure)");
}

}  // namespace

LinePoint expansion_line_point_pT(double p_in, double T_in, double p_out, double eta, double p_ext) {
    const equipment::Expansion e = equipment::turbine_expansion_pT(p_in, T_in, p_out, eta);
    return line_point(e, p_in, p_out, p_ext);
}

LinePoint expansion_line_point_ph(double p_in, double h_in, double p_out, double eta, double p_ext) {
    const equipment::Expansion e = equipment::turbine_expansion_ph(p_in, h_in, p_out, eta);
    return line_point(e, p_in, p_out, p_ext);
}

WetExhaust wet_exhaust_pT(double p_in, double T_in, double p_out, double eta_dry, double a, double h_loss) {
    check_eta_dry(eta_dry);
    const equipment::Expansion e = equipment::turbine_expansion_pT(p_in, T_in, p_out, eta_dry);
    check_expands(p_in, p_out);
    return wet_exhaust(e, quality_or_nan(state_pT(p_in, T_in)), p_out, eta_dry, a, h_loss);
}

WetExhaust wet_exhaust_ph(double p_in, double h_in, double p_out, double eta_dry, double a, double h_loss) {
    check_eta_dry(eta_dry);
    const equipment::Expansion e = equipment::turbine_expansion_ph(p_in, h_in, p_out, eta_dry);
    check_expands(p_in, p_out);
    return wet_exhaust(e, quality_or_nan(state_ph(p_in, h_in)), p_out, eta_dry, a, h_loss);
}

// ---- Drain cooler ----------------------------------------------------------------------

double drain_enthalpy_dca(double p_shell, double T_fw_in, double dca) {
    check_finite("p_shell", Quantity::Pressure, p_shell);
    check_finite("T_fw_in", Quantity::Temperature, T_fw_in);
    check_nonneg("dca", Quantity::TemperatureDifference, dca,
                 "(the drain cooler approach T_drain - T_fw_in cannot be negative: the drain cannot leave colder "
                 "than the water that cools it)");
    const double Ts = tsat_of(p_shell, "p_shell");
    const double T = T_fw_in + dca;
    if (!(T < Ts))
        throw RangeError("dca", Quantity::TemperatureDifference, dca, 0.0, Ts - T_fw_in,
                         "(at most the saturation temperature at p_shell minus T_fw_in: a drain cooler's drain "
                         "leaves as subcooled liquid)",
                         ErrorCode::Impossible);
    return pT(p_shell, T, "p_shell", "T_fw_in").h;
}

// ---- Deaerator -------------------------------------------------------------------------

Deaerator deaerator(double p_da, double m_out, double h_cond, double h_ext, double m_drain, double h_drain) {
    check_finite("p_da", Quantity::Pressure, p_da);
    check_positive("m_out", Quantity::MassFlow, m_out, "(the flow leaving the deaerator must be positive)");
    check_finite("h_cond", Quantity::SpecificEnergy, h_cond);
    check_finite("h_ext", Quantity::SpecificEnergy, h_ext);
    check_nonneg("m_drain", Quantity::MassFlow, m_drain,
                 "(a mass flow cannot be negative; 0 without drains cascading in)");
    check_finite("h_drain", Quantity::SpecificEnergy, h_drain);
    State sat;
    try {
        sat = saturation_p(p_da);
    } catch (const RangeError& e) {
        rename(e, "p_da", nullptr, nullptr);
    }
    const double hf = sat.liq.h;
    if (!(h_cond < hf))
        throw RangeError("h_cond", Quantity::SpecificEnergy, h_cond, none, hf,
                         "(the saturated-liquid enthalpy at p_da: condensate at or above it needs no heating "
                         "steam)",
                         ErrorCode::Impossible);
    if (!(h_ext > hf))
        throw RangeError("h_ext", Quantity::SpecificEnergy, h_ext, hf, none,
                         "(the saturated-liquid enthalpy at p_da: the heating steam must bring more enthalpy "
                         "than the outlet water has)",
                         ErrorCode::Impossible);
    Deaerator d;
    d.h_out = hf;
    d.T_out = sat.T;
    d.m_ext = (m_out * (hf - h_cond) - m_drain * (h_drain - h_cond)) / (h_ext - h_cond);
    d.m_cond = m_out - d.m_ext - m_drain;
    if (d.m_ext < 0)
        throw Error(ErrorCode::Impossible,
                    "the deaerator balance gives a negative extraction flow (" + num(d.m_ext) +
                        " kg/s): the drains alone bring more heat than the condensate needs; check the flows and "
                        "enthalpies");
    if (d.m_cond < 0)
        throw Error(ErrorCode::Impossible,
                    "the deaerator balance gives a negative condensate flow (" + num(d.m_cond) +
                        " kg/s): the drains and the heating steam exceed the outlet flow m_out");
    return d;
}

// ---- Pumped-forward drain --------------------------------------------------------------

DrainPump pumped_drain(double m_fw, double p_fw, double h_fw_in, double h_fw_mid, double h_fw_out, double h_ext,
                       double h_drain, double h_pumped, double h_ext_up, double p_shell_up, double dca_up,
                       double m_casc_up, double h_casc_up, double frac) {
    check_positive("m_fw", Quantity::MassFlow, m_fw, "(the feedwater flow must be positive)");
    check_finite("p_fw", Quantity::Pressure, p_fw);
    check_finite("h_fw_in", Quantity::SpecificEnergy, h_fw_in);
    check_finite("h_fw_mid", Quantity::SpecificEnergy, h_fw_mid);
    check_finite("h_fw_out", Quantity::SpecificEnergy, h_fw_out);
    check_finite("h_ext", Quantity::SpecificEnergy, h_ext);
    check_finite("h_drain", Quantity::SpecificEnergy, h_drain);
    check_finite("h_pumped", Quantity::SpecificEnergy, h_pumped);
    check_finite("h_ext_up", Quantity::SpecificEnergy, h_ext_up);
    check_nonneg("m_casc_up", Quantity::MassFlow, m_casc_up,
                 "(a mass flow cannot be negative; 0 without drains cascading into the upper heater)");
    check_finite("h_casc_up", Quantity::SpecificEnergy, h_casc_up);
    check_finite("frac", Quantity::None, frac);
    if (frac < 0 || frac > 1)
        throw RangeError("frac", Quantity::None, frac, 0.0, 1.0,
                         "(the fraction of the drain pumped forward: 1 all of it, 0 none, the plain cascade)");
    check_heated("h_fw_mid", h_fw_mid, h_fw_in, "the feedwater inlet enthalpy h_fw_in");
    check_heated("h_fw_out", h_fw_out, h_fw_mid, "the enthalpy h_fw_mid leaving the lower heater");
    check_drain_and_extraction(h_fw_in, h_drain, h_ext);
    check_nonneg("dca_up", Quantity::TemperatureDifference, dca_up,
                 "(the drain cooler approach cannot be negative)");
    const double Ts_up = tsat_of(p_shell_up, "p_shell_up");

    const double F = h_fw_mid - h_fw_in, G = h_fw_out - h_fw_mid, P = h_pumped - h_fw_mid;
    DrainPump r;
    double h_mix = h_fw_mid;
    double h_du = nan_v;
    for (int it = 0; it < 100; ++it) {
        const State mix = ph(p_fw, h_mix, "p_fw", "h (mix point)");
        const double T_drain_up = mix.T + dca_up;
        if (!(T_drain_up < Ts_up))
            throw RangeError("dca_up", Quantity::TemperatureDifference, dca_up, 0.0, Ts_up - mix.T,
                             "(at most the saturation temperature at p_shell_up minus the temperature after the "
                             "mix point: the upper heater's drain leaves as subcooled liquid)",
                             ErrorCode::Impossible);
        const double h_du_new = pT(p_shell_up, T_drain_up, "p_shell_up", "T (upper drain)").h;
        if (!(h_ext_up > h_du_new))
            throw RangeError("h_ext_up", Quantity::SpecificEnergy, h_ext_up, h_du_new, none,
                             "(the upper heater's drain enthalpy: the extraction steam must bring more enthalpy "
                             "than the drain takes away)");
        // Linear 2x2 system in (m_ext_up, m_ext) for this upper drain enthalpy.
        const double a11 = h_ext_up - h_du_new + frac * P, a12 = frac * P;
        const double b1 = m_fw * G - m_casc_up * (h_casc_up - h_du_new) - frac * P * m_casc_up;
        const double a21 = h_du_new - h_drain + frac * F, a22 = h_ext - h_drain + frac * F;
        const double b2 = m_fw * F - m_casc_up * (h_du_new - h_drain + frac * F);
        const double det = a11 * a22 - a12 * a21;
        if (!(std::fabs(det) > 0))
            throw Error(ErrorCode::Impossible, "the heater balance around the pumped drain has no solution "
                                               "(singular); check the enthalpies");
        r.m_ext_up = (b1 * a22 - a12 * b2) / det;
        r.m_ext = (a11 * b2 - a21 * b1) / det;
        const double m_d = r.m_ext_up + r.m_ext + m_casc_up;
        r.m_pumped = frac * m_d;
        r.m_down = m_d - r.m_pumped;
        const double h_mix_new = h_fw_mid + r.m_pumped * P / m_fw;
        const bool done = std::fabs(h_du_new - h_du) <= 1e-12 * std::fabs(h_du_new) &&
                          std::fabs(h_mix_new - h_mix) <= 1e-12 * std::fabs(h_mix_new);
        h_du = h_du_new;
        h_mix = h_mix_new;
        if (done) break;
        if (it == 99)
            throw Error(ErrorCode::NoConvergence,
                        "the heater balance around the pumped drain did not converge; check the enthalpies");
    }
    r.h_mix = h_mix;
    r.T_mix = ph(p_fw, h_mix, "p_fw", "h (mix point)").T;
    r.h_drain_up = h_du;
    if (r.m_ext_up < 0 || r.m_ext < 0)
        throw Error(ErrorCode::Impossible,
                    "the heater balance around the pumped drain gives a negative extraction flow (upper heater " +
                        num(r.m_ext_up) + " kg/s, lower heater " + num(r.m_ext) +
                        " kg/s): the drains bring more heat than the feedwater takes up; check the enthalpies");
    if (r.m_pumped >= m_fw)
        throw Error(ErrorCode::Impossible, "the pumped drain flow (" + num(r.m_pumped) +
                                               " kg/s) is not below the feedwater flow m_fw: check the flows");
    return r;
}

}  // namespace isentra::cycle
