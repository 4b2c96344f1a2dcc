// SPDX-License-Identifier: MPL-2.0
// Cycle heat-balance pieces (cycle.hpp): expansion-line points, the wet
// exhaust (Baumann rule, ELEP, UEEP), drain-cooler drains, the deaerator and
// two heaters around a pumped-forward drain. Check values: python3-iapws
// 1.5.2 (Debian) where an independent solver helps, otherwise hand
// computations from the core's own states with the equation written beside
// them; plus the catalogue functions through isentra::call (units, errors).
#include <gtest/gtest.h>

#include <cmath>
#include <string>
#include <vector>

#include "isentra/base/error.hpp"
#include "isentra/engineering/cycle.hpp"
#include "isentra/engineering/equipment.hpp"
#include "isentra/properties/state.hpp"
#include "isentra/surface/call.hpp"
#include "isentra/surface/catalogue.hpp"

using namespace isentra;
namespace cy = isentra::cycle;
namespace eq = isentra::equipment;

namespace {

constexpr double K0 = 273.15;

const catalogue::Function& fn(const char* name) {
    const catalogue::Function* f = catalogue::find(name);
    EXPECT_NE(f, nullptr) << name;
    return *f;
}

Table num(double v) { return Table::scalar(Value::of(v)); }
Table txt(const char* t) { return Table::scalar(Value::of_text(t)); }

// ---- Expansion line -------------------------------------------------------------

TEST(CycleLine, PointAgainstIndependentSolver) {
    // HP section 16.7 MPa, 540 degC to 4.1 MPa, eta 0.87; extraction at 6.3 MPa.
    // python3-iapws 1.5.2 (Debian), bisection on the same straight h-s line:
    // t = 0.7170798174893092, h = 3152.9519721481283 kJ/kg, s = 6.48484213783382,
    // T = 392.50438065866604 degC.
    const cy::LinePoint p = cy::expansion_line_point_pT(16.7, 540 + K0, 4.1, 0.87, 6.3);
    EXPECT_NEAR(p.h, 3152.9519721481283, 2e-6);
    EXPECT_NEAR(p.s, 6.48484213783382, 2e-9);
    EXPECT_NEAR(p.T - K0, 392.50438065866604, 1e-5);
    EXPECT_NEAR(p.t, 0.7170798174893092, 1e-8);
    EXPECT_GT(p.x, 1.0);  // superheated
}

TEST(CycleLine, EndsAndOverallEfficiency) {
    const eq::Expansion e = eq::turbine_expansion_pT(16.7, 540 + K0, 4.1, 0.87);
    const cy::LinePoint top = cy::expansion_line_point_pT(16.7, 540 + K0, 4.1, 0.87, 16.7);
    const cy::LinePoint end = cy::expansion_line_point_pT(16.7, 540 + K0, 4.1, 0.87, 4.1);
    EXPECT_DOUBLE_EQ(top.h, e.h_in);
    EXPECT_DOUBLE_EQ(end.h, e.h_out);  // the end point: overall efficiency exactly eta
    // The point lies on the isobar: h(p_ext, s) equals h (core state, by definition of the crossing).
    const cy::LinePoint m = cy::expansion_line_point_pT(16.7, 540 + K0, 4.1, 0.87, 8.0);
    EXPECT_NEAR(state_ps(8.0, m.s).h, m.h, 1e-8);
    // Reheat factor (common practice): the sum of the parts' isentropic drops
    // exceeds the section's, so both parts come out below eta (here 0.852
    // above 8 MPa and 0.869 below it, core values).
    const double eta_top = eq::section_efficiency_pT_ph(16.7, 540 + K0, 8.0, m.h);
    const double eta_bot = eq::section_efficiency_ph_ph(8.0, m.h, 4.1, e.h_out);
    EXPECT_LT(eta_top, 0.87);
    EXPECT_LT(eta_bot, 0.87);
    EXPECT_GT(eta_top, 0.84);
    EXPECT_GT(eta_bot, 0.86);
}

TEST(CycleLine, WetPointsOnTheLine) {
    // LP section from 0.93 MPa, h 3140 kJ/kg to 6.5 kPa at eta 0.80: a point
    // at 20 kPa is wet; its x is (h - h')/(h'' - h') at 20 kPa (core saturation states).
    const cy::LinePoint p = cy::expansion_line_point_ph(0.93, 3140.0, 0.0065, 0.80, 0.02);
    const State sat = saturation_p(0.02);
    EXPECT_NEAR(p.x, (p.h - sat.liq.h) / (sat.vap.h - sat.liq.h), 1e-12);
    EXPECT_LT(p.x, 1.0);
    EXPECT_NEAR(p.T, sat.T, 1e-9);
}

TEST(CycleLine, Errors) {
    EXPECT_THROW(cy::expansion_line_point_pT(16.7, 540 + K0, 4.1, 0.87, 20.0), RangeError);
    EXPECT_THROW(cy::expansion_line_point_pT(16.7, 540 + K0, 4.1, 0.87, 3.0), RangeError);
    EXPECT_THROW(cy::expansion_line_point_pT(16.7, 540 + K0, 4.1, 1.2, 6.0), RangeError);
    try {
        cy::expansion_line_point_pT(16.7, 540 + K0, 4.1, 0.87, 3.0);
    } catch (const RangeError& e) {
        EXPECT_EQ(e.input(), "p_ext");
    }
}

// ---- Wet exhaust ------------------------------------------------------------------

TEST(CycleWetExhaust, BaumannEndPointAgainstIndependentIteration) {
    // LP 0.93 MPa, h 3140 kJ/kg to 6.5 kPa, eta_dry 0.90, a = 1. python3-iapws
    // 1.5.2 (Debian), fixed-point iteration of h = h_in - eta_dry (1 - a y_m)(h_in - h_s),
    // y_m = (0 + 1 - x(h))/2: h_elep = 2379.3978752270345 kJ/kg, x = 0.9212577684251012,
    // h_s = 2260.2497802648104 kJ/kg.
    const cy::WetExhaust w = cy::wet_exhaust_ph(0.93, 3140.0, 0.0065, 0.90, 1.0, 30.0);
    EXPECT_NEAR(w.h_elep, 2379.3978752270345, 2e-6);
    EXPECT_NEAR(w.x_elep, 0.9212577684251012, 1e-9);
    EXPECT_NEAR(w.y_mean, 0.5 * (1 - w.x_elep), 1e-14);
    // eta_wet = eta_dry (1 - a y_m) (the rule itself).
    EXPECT_NEAR(w.eta_wet, 0.90 * (1 - w.y_mean), 1e-12);
    // UEEP = ELEP + exhaust loss (common practice).
    EXPECT_DOUBLE_EQ(w.h_ueep, w.h_elep + 30.0);
    const State sat = saturation_p(0.0065);
    EXPECT_NEAR(w.x_ueep, (w.h_ueep - sat.liq.h) / (sat.vap.h - sat.liq.h), 1e-12);
    EXPECT_NEAR(w.T, sat.T, 1e-9);
    // a = 0: no moisture correction, the dry end point.
    const cy::WetExhaust d = cy::wet_exhaust_ph(0.93, 3140.0, 0.0065, 0.90, 0.0, 0.0);
    EXPECT_NEAR(d.h_elep, eq::turbine_expansion_ph(0.93, 3140.0, 0.0065, 0.90).h_out, 1e-9);
    EXPECT_NEAR(d.eta_wet, 0.90, 1e-12);
}

TEST(CycleWetExhaust, DryEndPointAndWetInlet) {
    // A section that stays superheated: no correction (y = 0 at both ends).
    const cy::WetExhaust s = cy::wet_exhaust_pT(4.0, 500 + K0, 0.5, 0.9, 1.0, 0.0);
    EXPECT_NEAR(s.h_elep, eq::turbine_expansion_pT(4.0, 500 + K0, 0.5, 0.9).h_out, 1e-9);
    EXPECT_GT(s.x_elep, 1.0);
    // A wet inlet (x = 0.98 at 0.1 MPa) to 10 kPa: check the closed form against
    // the defining relation, with x_end from the core state at p_out.
    const State in = state_px(0.1, 0.98);
    const cy::WetExhaust w = cy::wet_exhaust_ph(0.1, in.h, 0.01, 0.88, 1.2, 0.0);
    const double hs = state_ps(0.01, in.s).h;
    const double y_m = 0.5 * (0.02 + (1 - quality(state_ph(0.01, w.h_elep))));
    EXPECT_NEAR(w.h_elep, in.h - 0.88 * (1 - 1.2 * y_m) * (in.h - hs), 1e-9);
}

TEST(CycleWetExhaust, Errors) {
    EXPECT_THROW(cy::wet_exhaust_ph(0.93, 3140.0, 0.0065, 0.0, 1.0, 0.0), RangeError);   // eta_dry 0
    EXPECT_THROW(cy::wet_exhaust_ph(0.93, 3140.0, 0.0065, 0.9, -1.0, 0.0), RangeError);  // a < 0
    EXPECT_THROW(cy::wet_exhaust_ph(0.93, 3140.0, 0.0065, 0.9, 1.0, -5.0), RangeError);  // loss < 0
    EXPECT_THROW(cy::wet_exhaust_ph(0.93, 3140.0, 0.93, 0.9, 1.0, 0.0), RangeError);     // no expansion
}

// ---- Drain cooler ----------------------------------------------------------------

TEST(CycleDrain, DcaEnthalpy) {
    // p_shell 4.0 MPa, feedwater in 209.4 degC, DCA 5.6 K: T_drain = 215.0 degC,
    // h(4.0 MPa, 215 degC) = 921.1975789155341 kJ/kg (python3-iapws 1.5.2 (Debian)).
    EXPECT_NEAR(cy::drain_enthalpy_dca(4.0, 209.4 + K0, 5.6), 921.1975789155341, 1e-7);
    // DCA too large: the drain would reach Tsat(4 MPa) = 250.4 degC.
    EXPECT_THROW(cy::drain_enthalpy_dca(4.0, 209.4 + K0, 45.0), RangeError);
    EXPECT_THROW(cy::drain_enthalpy_dca(4.0, 209.4 + K0, -1.0), RangeError);
}

// ---- Deaerator ---------------------------------------------------------------------

TEST(CycleDeaerator, Balance) {
    // 0.9 MPa: h' = 742.7246151273523 kJ/kg (python3-iapws 1.5.2 (Debian)).
    // m_out 560 kg/s, condensate at 600 kJ/kg, steam 3000 kJ/kg, drains 90 kg/s at 900 kJ/kg:
    // m_ext = (560 (742.7246 - 600) - 90 (900 - 600))/(3000 - 600) (the balance in cycle.hpp).
    const cy::Deaerator d = cy::deaerator(0.9, 560.0, 600.0, 3000.0, 90.0, 900.0);
    const double hf = 742.7246151273523;
    EXPECT_NEAR(d.h_out, hf, 1e-8);
    EXPECT_NEAR(d.m_ext, (560 * (hf - 600) - 90 * (900 - 600)) / (3000 - 600), 1e-8);
    EXPECT_NEAR(d.m_cond, 560 - 90 - d.m_ext, 1e-10);
    // Energy balance closes (relative 1e-14).
    EXPECT_NEAR(d.m_cond * 600 + 90 * 900 + d.m_ext * 3000, 560 * d.h_out, 1e-9);
    EXPECT_NEAR(d.T_out, saturation_temperature(0.9), 1e-12);
    // Drains bring too much heat: negative extraction.
    EXPECT_THROW(cy::deaerator(0.9, 560.0, 600.0, 3000.0, 400.0, 1000.0), Error);
    EXPECT_THROW(cy::deaerator(0.9, 560.0, 800.0, 3000.0, 0.0, 0.0), RangeError);  // condensate too hot
    EXPECT_THROW(cy::deaerator(0.9, 0.0, 600.0, 3000.0, 0.0, 0.0), RangeError);
}

// ---- Pumped-forward drain ----------------------------------------------------------------

struct PairCase {
    double m = 420, p = 2.0;
    double h_in = 330, h_mid = 460, h_out = 610;
    double h_ext = 2680, p_lo = 0.16, h_ext_up = 2860, p_up = 0.45, dca_up = 5.6;
    double m_casc = 0, h_casc = 0;
};

TEST(CycleDrainPump, BalancesClose) {
    const PairCase c;
    // Lower heater drain: saturated at its shell pressure (core state); after
    // the drain pump (2 MPa, eta 0.75, core pump).
    const State s_lo = saturation_p(c.p_lo);
    const double h_drain = cy::drain_enthalpy_dca(c.p_lo, state_ph(c.p, c.h_in).T, 5.6);
    const double T_drain = state_ph(c.p_lo, h_drain).T;
    const double h_pumped = eq::pump_pT(c.p_lo, T_drain, c.p, 0.75).h_out;
    (void)s_lo;
    for (double frac : {0.0, 1.0, 0.4}) {
        const cy::DrainPump r = cy::pumped_drain(c.m, c.p, c.h_in, c.h_mid, c.h_out, c.h_ext, h_drain, h_pumped,
                                                 c.h_ext_up, c.p_up, c.dca_up, c.m_casc, c.h_casc, frac);
        const double m_d = r.m_ext_up + r.m_ext;
        EXPECT_NEAR(r.m_pumped, frac * m_d, 1e-10);
        EXPECT_NEAR(r.m_down, (1 - frac) * m_d, 1e-10);
        // Each balance of cycle.hpp closes (relative 1e-12 of the heat taken up).
        const double mB = c.m - r.m_pumped;
        const double qB = mB * (c.h_mid - c.h_in);
        EXPECT_NEAR(qB, r.m_ext * (c.h_ext - h_drain) + r.m_ext_up * (r.h_drain_up - h_drain), 1e-9 * qB);
        EXPECT_NEAR(c.m * r.h_mix, mB * c.h_mid + r.m_pumped * h_pumped, 1e-9 * c.m * r.h_mix);
        const double qA = c.m * (c.h_out - r.h_mix);
        EXPECT_NEAR(qA, r.m_ext_up * (c.h_ext_up - r.h_drain_up), 1e-9 * qA);
        // The upper drain is referred to the water after the mix point.
        EXPECT_NEAR(r.h_drain_up, state_pT(c.p_up, state_ph(c.p, r.h_mix).T + c.dca_up).h, 1e-9);
        EXPECT_NEAR(r.T_mix, state_ph(c.p, r.h_mix).T, 1e-9);
        if (frac == 0.0) {
            // The plain cascade: the same flows as two STEAM.FWH.EXTRACTION balances.
            EXPECT_DOUBLE_EQ(r.h_mix, c.h_mid);
            const double m_up = eq::fwh_extraction_flow(c.m, c.h_mid, c.h_out, c.h_ext_up, r.h_drain_up, 0, 0);
            const double m_lo = eq::fwh_extraction_flow(c.m, c.h_in, c.h_mid, c.h_ext, h_drain, m_up, r.h_drain_up);
            EXPECT_NEAR(r.m_ext_up, m_up, 1e-10);
            EXPECT_NEAR(r.m_ext, m_lo, 1e-10);
        }
    }
}

TEST(CycleDrainPump, Errors) {
    const PairCase c;
    EXPECT_THROW(cy::pumped_drain(c.m, c.p, c.h_in, c.h_mid, c.h_out, c.h_ext, 400, 402, c.h_ext_up, c.p_up, c.dca_up,
                                  0, 0, 1.5),
                 RangeError);
    EXPECT_THROW(cy::pumped_drain(c.m, c.p, c.h_in, c.h_mid, c.h_out, c.h_ext, 400, 402, c.h_ext_up, c.p_up, 60.0, 0,
                                  0, 1.0),
                 RangeError);  // upper drain would not be liquid
    EXPECT_THROW(cy::pumped_drain(0.0, c.p, c.h_in, c.h_mid, c.h_out, c.h_ext, 400, 402, c.h_ext_up, c.p_up, c.dca_up,
                                  0, 0, 1.0),
                 RangeError);
}

// ---- Through the catalogue (units, rows, error cells) ---------------------------------------

TEST(CycleCatalogue, UsUnitsAndRows) {
    // HLINE in US: 16.7 MPa = 2422.12 psia ... compare with the SI call converted
    // (exact factors: psi = 6894.757293168 Pa, Btu/lbm = 2.326 kJ/kg, degF = 1.8 K).
    const double psi = 6.894757293168361e-3;  // MPa per psi, NIST SP 811 (2008)
    const Value si = call_scalar(fn("STEAM.TURBINE.HLINE.PT"),
                                 {Value::of(16.7), Value::of(540.0), Value::of(4.1), Value::of(0.87), Value::of(6.3)});
    const Value us = call_scalar(fn("STEAM.TURBINE.HLINE.PT"),
                                 {Value::of(16.7 / psi), Value::of(540 * 1.8 + 32), Value::of(4.1 / psi),
                                  Value::of(0.87), Value::of(6.3 / psi), Value::of_text("US")});
    ASSERT_EQ(si.kind, Value::Kind::Number);
    ASSERT_EQ(us.kind, Value::Kind::Number);
    EXPECT_NEAR(us.number * 2.326, si.number, 1e-8);
    // HDRAIN: the DCA is a temperature difference (5.6 K = 10.08 degF).
    const Value hd = call_scalar(fn("STEAM.FWH.HDRAIN"), {Value::of(4.0 / psi), Value::of(209.4 * 1.8 + 32),
                                                          Value::of(5.6 * 1.8), Value::of_text("US")});
    ASSERT_EQ(hd.kind, Value::Kind::Number);
    EXPECT_NEAR(hd.number * 2.326, 921.1975789155341, 1e-6);  // python3-iapws 1.5.2 (Debian), as above
    // Rows: EXHAUST has 8 columns; with a header 2 rows.
    const Table t = call(fn("STEAM.TURBINE.EXHAUST.PH"),
                         {num(0.93), num(3140.0), num(0.0065), num(0.90), num(1.0), num(30.0), txt("SI"), num(1)});
    ASSERT_EQ(t.rows, 2u);
    ASSERT_EQ(t.cols, 8u);
    EXPECT_EQ(t.at(0, 0).text.substr(0, 6), "h_elep");
    EXPECT_NEAR(t.at(1, 0).number, 2379.3978752270345, 2e-6);  // python3-iapws 1.5.2 (Debian), as above
    // DEAERATOR.BALANCE(m_fw; h_fw_in; p_da; h_ext; [m_drain; h_drain]).
    const Table d = call(fn("STEAM.DEAERATOR.BALANCE"),
                         {num(560), num(600), num(0.9), num(3000), num(90), num(900)});
    ASSERT_EQ(d.cols, 4u);
    EXPECT_NEAR(d.at(0, 2).number, 742.7246151273523, 1e-8);
    // An error names the input.
    const Value bad = call_scalar(fn("STEAM.TURBINE.HLINE.PT"),
                                  {Value::of(16.7), Value::of(540.0), Value::of(4.1), Value::of(0.87), Value::of(30.0)});
    ASSERT_EQ(bad.kind, Value::Kind::Error);
    EXPECT_NE(bad.text.find("p_ext"), std::string::npos) << bad.text;
    // DRAINPUMP.BALANCE(m_fw; h_fw_in; h_fw_mid; h_fw_out; p_fw; h_ext; h_drain; h_pumped; h_ext_up;
    // p_shell_up; dca_up; [frac; m_casc_up; h_casc_up]) equals the core function.
    const Table pr = call(fn("STEAM.FWH.DRAINPUMP.BALANCE"),
                          {num(420), num(330), num(460), num(610), num(2.0), num(2680), num(500), num(502),
                           num(2860), num(0.45), num(5.6)});
    ASSERT_EQ(pr.cols, 7u);
    const cy::DrainPump r = cy::pumped_drain(420, 2.0, 330, 460, 610, 2680, 500, 502, 2860, 0.45, 5.6, 0, 0, 1.0);
    EXPECT_DOUBLE_EQ(pr.at(0, 0).number, r.m_ext_up);
    EXPECT_DOUBLE_EQ(pr.at(0, 2).number, r.m_pumped);
    EXPECT_DOUBLE_EQ(pr.at(0, 6).number, r.h_drain_up);
}

}  // namespace
