// SPDX-License-Identifier: MPL-2.0
// Cycle heat-balance functions of the catalogue: expansion-line points, the
// wet LP exhaust (Baumann rule, ELEP, UEEP), the drain-cooler drain, the open
// (deaerating) heater and two closed heaters around a pumped-forward drain.
// The numerics are in engineering/cycle.cpp.
//
// Naming as in catalogue_equipment.cpp: STEAM.<MACHINE>.<RESULT>.<INPUTS>;
// a function whose whole result is a row ends in what the row describes
// (LINEPOINT, EXHAUST, BALANCE). Names and methods are frozen once released.
#include "catalogue_detail.hpp"

#include <cmath>
#include <string>
#include <utility>

#include "isentra/base/error.hpp"
#include "isentra/engineering/cycle.hpp"

namespace isentra::catalogue::detail {

namespace {

namespace cy = isentra::cycle;

const char* const cat_turbine = "Steam turbines";
const char* const cat_equipment = "Steam plant equipment";


Arg p_arg(const char* n, const char* d) { return Arg{n, Quantity::Pressure, d}; }
Arg T_arg(const char* n, const char* d) { return Arg{n, Quantity::Temperature, d}; }
Arg h_arg(const char* n, const char* d) { return Arg{n, Quantity::SpecificEnergy, d}; }
Arg m_arg(const char* n, const char* d) { return Arg{n, Quantity::MassFlow, d}; }
Arg dT_arg(const char* n, const char* d) { return Arg{n, Quantity::TemperatureDifference, d}; }
Arg frac_arg(const char* n, const char* d) { return Arg{n, Quantity::None, d}; }

const char* const d_p_in = "Section inlet pressure (absolute unless a gauge unit is chosen)";
const char* const d_p_out = "Section exhaust pressure (absolute unless a gauge unit is chosen)";

struct Inlet {
    const char* code;  // "PT" or "PH"
    Arg second;
    const char* words;
};

const Inlet inlets[] = {
    {"PT", Arg{"T_in", Quantity::Temperature, "Section inlet temperature (superheated steam)"}, "inlet by (p,T)"},
    {"PH", Arg{"h_in", Quantity::SpecificEnergy, "Section inlet specific enthalpy"}, "inlet by (p,h)"},
};

// ---- Expansion-line points --------------------------------------------------------

void add_line_points(std::vector<Function>& out) {
    const std::string rule =
        " Rule (common practice): the section's expansion line is the straight line in the h-s plane from the "
        "inlet to its end point at p_out, h_end = h_in - eta (h_in - h(p_out, s_in)); the point is where it "
        "crosses the isobar p_ext, so the section's overall efficiency is eta whatever the extraction "
        "pressures. p_ext lies between p_out and p_in.";
    for (const Inlet& in : inlets) {
        const std::string code = in.code;
        const bool pT = code == "PT";
        auto args = [&]() {
            return std::vector<Arg>{p_arg("p_in", d_p_in), in.second, p_arg("p_out", d_p_out),
                                    frac_arg("eta", "Section isentropic efficiency as a fraction, 0 to 1 (0.88 "
                                                    "for 88 %), inlet to p_out"),
                                    p_arg("p_ext", "Extraction (intermediate stage) pressure on the section")};
        };
        auto point = [pT](const double* a) {
            return pT ? cy::expansion_line_point_pT(a[0], a[1], a[2], a[3], a[4])
                      : cy::expansion_line_point_ph(a[0], a[1], a[2], a[3], a[4]);
        };
        out.push_back(number(("STEAM.TURBINE.HLINE." + code).c_str(), ("turbineHline" + code).c_str(), cat_turbine,
                             "Enthalpy at an extraction pressure on a turbine section's expansion line, " +
                                 std::string(in.words) + ". From the section's inlet, exhaust pressure and "
                                 "efficiency." + rule,
                             args(), Quantity::SpecificEnergy,
                             [point](const double* a, double* o) { o[0] = point(a).h; }));
        out.push_back(row(("STEAM.TURBINE.LINEPOINT." + code).c_str(), ("turbineLinepoint" + code).c_str(),
                          cat_turbine,
                          "State at an extraction pressure on a section's expansion line as a row, " +
                              std::string(in.words) + ". The row: h, T, s, x (equilibrium quality, above 1 "
                              "superheated) and the position t on the line (0 inlet, 1 end point)." + rule +
                              " Enter as an array formula over 5 cells; with header = 1 the first row holds the "
                              "names and units.",
                          args(),
                          {{"h", Quantity::SpecificEnergy},
                           {"T", Quantity::Temperature},
                           {"s", Quantity::SpecificEntropy},
                           {"x", Quantity::None},
                           {"t", Quantity::None}},
                          [point](const double* a, double* o) {
                              const cy::LinePoint r = point(a);
                              o[0] = r.h;
                              o[1] = r.T;
                              o[2] = r.s;
                              o[3] = r.x;
                              o[4] = r.t;
                          }));
    }
}

// ---- Wet exhaust ------------------------------------------------------------------

void add_wet_exhaust(std::vector<Function>& out) {
    const std::string rule =
        " Baumann rule (common practice): eta_wet = eta_dry (1 - a y_m), y_m = (y_in + y_end)/2 the mean "
        "moisture of inlet and end point (superheated ends count dry), end point h_end = h_in - eta_wet (h_in - "
        "h_s), h_s = h(p_out, s_in), solved exactly (x is linear in h in the wet region).";
    const std::string ueep =
        " Used energy end point (common practice): UEEP = ELEP + exhaust loss (leaving energy of the last stage "
        "and hood loss, per kg of exhaust steam); the section's work is h_in - UEEP and the condenser receives "
        "the steam at the UEEP.";
    for (const Inlet& in : inlets) {
        const std::string code = in.code;
        const bool pT = code == "PT";
        auto base = [&]() {
            return std::vector<Arg>{p_arg("p_in", d_p_in), in.second,
                                    p_arg("p_out", "Exhaust pressure (e.g. the condenser pressure)"),
                                    frac_arg("eta_dry", "Dry-steam section efficiency as a fraction above 0 to 1 "
                                                        "(0.90 for 90 %)"),
                                    ranged(frac_arg("a", "Baumann coefficient: efficiency fraction lost per unit "
                                                         "of mean moisture (about 1)"),
                                           ranges::baumann_coefficient())};
        };
        auto with_loss = [&]() {
            std::vector<Arg> v = base();
            v.push_back(h_arg("h_loss", "Exhaust loss per kg of exhaust steam (leaving energy and hood loss), 0 "
                                        "or more"));
            return v;
        };
        auto ex = [pT](const double* a, double loss) {
            return pT ? cy::wet_exhaust_pT(a[0], a[1], a[2], a[3], a[4], loss)
                      : cy::wet_exhaust_ph(a[0], a[1], a[2], a[3], a[4], loss);
        };
        out.push_back(number(("STEAM.TURBINE.ELEP." + code).c_str(), ("turbineElep" + code).c_str(), cat_turbine,
                             "Expansion-line end point (ELEP) of a wet-exhaust section, " + std::string(in.words) +
                                 ". From the inlet, the exhaust pressure, the dry-steam efficiency and the "
                                 "Baumann coefficient." + rule,
                             base(), Quantity::SpecificEnergy,
                             [ex](const double* a, double* o) { o[0] = ex(a, 0.0).h_elep; }));
        out.push_back(number(("STEAM.TURBINE.UEEP." + code).c_str(), ("turbineUeep" + code).c_str(), cat_turbine,
                             "Used energy end point (UEEP) of a wet-exhaust section, " + std::string(in.words) +
                                 ". From the inlet, the exhaust pressure, the dry-steam efficiency, the Baumann "
                                 "coefficient and the exhaust loss." + rule + ueep,
                             with_loss(), Quantity::SpecificEnergy,
                             [ex](const double* a, double* o) { o[0] = ex(a, a[5]).h_ueep; }));
        out.push_back(row(("STEAM.TURBINE.EXHAUST." + code).c_str(), ("turbineExhaust" + code).c_str(), cat_turbine,
                          "Wet exhaust of a turbine section as a row (ELEP, UEEP), " + std::string(in.words) +
                              ". The row: ELEP enthalpy, temperature, entropy and quality, the wet efficiency eta_wet = (h_in - h_elep)/"
                          "(h_in - h_s), the mean moisture used, the UEEP enthalpy and its quality (1 - x is the "
                          "exhaust moisture)." + rule + ueep +
                              " Enter as an array formula over 8 cells; with header = 1 the first row holds the "
                              "names and units.",
                          with_loss(),
                          {{"h_elep", Quantity::SpecificEnergy},
                           {"T_out", Quantity::Temperature},
                           {"s_elep", Quantity::SpecificEntropy},
                           {"x_elep", Quantity::None},
                           {"eta_wet", Quantity::None},
                           {"y_mean", Quantity::None},
                           {"h_ueep", Quantity::SpecificEnergy},
                           {"x_ueep", Quantity::None}},
                          [ex](const double* a, double* o) {
                              const cy::WetExhaust w = ex(a, a[5]);
                              o[0] = w.h_elep;
                              o[1] = w.T;
                              o[2] = w.s_elep;
                              o[3] = w.x_elep;
                              o[4] = w.eta_wet;
                              o[5] = w.y_mean;
                              o[6] = w.h_ueep;
                              o[7] = w.x_ueep;
                          }));
    }
}

// ---- Heaters ----------------------------------------------------------------------

void add_heaters(std::vector<Function>& out) {
    out.push_back(number(
        "STEAM.FWH.HDRAIN", "fwhHdrain", cat_equipment,
        "Drain enthalpy of a closed feedwater heater from its drain cooler approach. ASME PTC 12.1 defines "
        "DCA = T_drain - T_fw_in; h = h(p_shell, T_fw_in + DCA), subcooled liquid at the shell pressure. An error if T_fw_in + DCA reaches the saturation temperature at p_shell.",
        {p_arg("p_shell", "Heater shell pressure (extraction steam pressure at the heater)"),
         T_arg("T_fw_in", "Feedwater inlet temperature (the water entering the drain cooler)"),
         dT_arg("dca", "Drain cooler approach, 0 or more")},
        Quantity::SpecificEnergy, [](const double* a, double* o) { o[0] = cy::drain_enthalpy_dca(a[0], a[1], a[2]); }));

    const std::string da =
        " Open heater, outlet saturated liquid at p_da: m_fw = m_cond + m_drain + m_ext and m_fw h'(p_da) = "
        "m_cond h_fw_in + m_drain h_drain + m_ext h_ext, so m_ext = (m_fw (h' - h_fw_in) - m_drain (h_drain - "
        "h_fw_in))/(h_ext - h_fw_in); m_drain and h_drain only for drains cascading in from the heaters above.";
    auto da_args = []() {
        return std::vector<Arg>{
            m_arg("m_fw", "Feedwater flow leaving the deaerator (to the feed pump)"),
            h_arg("h_fw_in", "Enthalpy of the condensate entering"),
            p_arg("p_da", "Deaerator (open heater) pressure; the outlet is saturated liquid at it"),
            h_arg("h_ext", "Enthalpy of the heating (extraction) steam at the deaerator"),
            Arg{"m_drain", Quantity::MassFlow,
                "Optional: drain flow cascading in from the heaters above; default 0 (none)", true, false, 0.0},
            Arg{"h_drain", Quantity::SpecificEnergy,
                "Optional: enthalpy of the drains cascading in; needed when m_drain is above 0", true}};
    };
    // a = m_fw, h_fw_in, p_da, h_ext, m_drain, h_drain
    auto da_eval = [](const double* a) {
        double h_drain = a[5];
        if (a[4] == 0.0 && std::isnan(h_drain)) h_drain = a[1];  // no drains: their enthalpy plays no part
        if (std::isnan(h_drain))
            throw Error(ErrorCode::InvalidArgument,
                        "the argument h_drain is missing: with a drain flow m_drain above 0, give the drains' "
                        "enthalpy h_drain too");
        return cy::deaerator(a[2], a[0], a[1], a[3], a[4], h_drain);
    };
    out.push_back(number("STEAM.DEAERATOR.EXTRACTION", "deaeratorExtraction", cat_equipment,
                         "Heating-steam (extraction) flow of an open deaerating heater from its mass and energy "
                         "balance." + da,
                         da_args(), Quantity::MassFlow,
                         [da_eval](const double* a, double* o) { o[0] = da_eval(a).m_ext; }));
    out.push_back(row("STEAM.DEAERATOR.BALANCE", "deaeratorBalance", cat_equipment,
                      "Mass and energy balance of an open deaerating heater as a row. The row: extraction "
                      "flow, condensate flow m_fw - m_ext - m_drain, outlet enthalpy h'(p_da) and temperature "
                      "Tsat(p_da)." + da +
                          " Enter as an array formula over 4 cells; with header = 1 the first row holds the names "
                          "and units.",
                      da_args(),
                      {{"m_ext", Quantity::MassFlow},
                       {"m_cond", Quantity::MassFlow},
                       {"h_out", Quantity::SpecificEnergy},
                       {"T_out", Quantity::Temperature}},
                      [da_eval](const double* a, double* o) {
                          const cy::Deaerator d = da_eval(a);
                          o[0] = d.m_ext;
                          o[1] = d.m_cond;
                          o[2] = d.h_out;
                          o[3] = d.T_out;
                      }));

    out.push_back(row(
        "STEAM.FWH.DRAINPUMP.BALANCE", "fwhDrainpumpBalance", cat_equipment,
        "Two closed feedwater heaters around a drain pumped forward, as a row. The row: extraction flows of "
        "the upper and the lower heater, the pumped drain flow, the drain flow cascading on below, and the enthalpy, "
        "temperature and upper-heater drain enthalpy at the mix point. The upper heater's drain cascades into "
        "the lower one; the fraction frac of the lower heater's drain is pumped into the feedwater line between "
        "the two (mix point), the rest cascades on. Energy balances: lower (m_fw - m_p)(h_fw_mid - h_fw_in) = "
        "m_ext (h_ext - h_drain) + (m_ext_up + m_casc_up)(h_drain_up - h_drain); mix m_fw h_mix = (m_fw - m_p) "
        "h_fw_mid + m_p h_pumped; upper m_fw (h_fw_out - h_mix) = m_ext_up (h_ext_up - h_drain_up) + m_casc_up "
        "(h_casc_up - h_drain_up), with h_drain_up = h(p_shell_up, T_mix + dca_up) solved inside the function "
        "(no circular reference in the sheet). frac = 0 is the plain cascade. Enter as an array formula over 7 "
        "cells; with header = 1 the first row holds the names and units.",
        {m_arg("m_fw", "Feedwater flow leaving the mix point (through the upper heater)"),
         h_arg("h_fw_in", "Feedwater enthalpy at the lower heater's inlet"),
         h_arg("h_fw_mid", "Feedwater enthalpy at the lower heater's outlet (before the mix point)"),
         h_arg("h_fw_out", "Feedwater enthalpy at the upper heater's outlet"),
         p_arg("p_fw", "Feedwater pressure at the mix point"),
         h_arg("h_ext", "Extraction steam enthalpy at the lower heater"),
         h_arg("h_drain", "Drain enthalpy of the lower heater (e.g. from STEAM.FWH.HDRAIN)"),
         h_arg("h_pumped", "Enthalpy of the lower heater's drain after the drain pump (e.g. STEAM.PUMP.HOUT.PT)"),
         h_arg("h_ext_up", "Extraction steam enthalpy at the upper heater"),
         p_arg("p_shell_up", "Upper heater shell pressure"),
         dT_arg("dca_up", "Upper heater drain cooler approach, referred to the water after the mix point"),
         Arg{"frac", Quantity::None,
             "Optional: fraction of the lower heater's drain pumped forward, 0 to 1; default 1 (all); 0 is the "
             "plain cascade",
             true, false, 1.0},
         Arg{"m_casc_up", Quantity::MassFlow,
             "Optional: drain flow cascading into the upper heater from above; default 0 (none)", true, false, 0.0},
         Arg{"h_casc_up", Quantity::SpecificEnergy,
             "Optional: enthalpy of the drain cascading into the upper heater; needed when m_casc_up is above 0",
             true}},
        {{"m_ext_up", Quantity::MassFlow},
         {"m_ext", Quantity::MassFlow},
         {"m_pumped", Quantity::MassFlow},
         {"m_down", Quantity::MassFlow},
         {"h_mix", Quantity::SpecificEnergy},
         {"T_mix", Quantity::Temperature},
         {"h_drain_up", Quantity::SpecificEnergy}},
        [](const double* a, double* o) {
            // a = m_fw, h_fw_in, h_fw_mid, h_fw_out, p_fw, h_ext, h_drain, h_pumped, h_ext_up, p_shell_up,
            //     dca_up, frac, m_casc_up, h_casc_up
            double h_casc = a[13];
            if (a[12] == 0.0 && std::isnan(h_casc)) h_casc = a[8];  // no cascade: its enthalpy plays no part
            if (std::isnan(h_casc))
                throw Error(ErrorCode::InvalidArgument,
                            "the argument h_casc_up is missing: with a drain flow m_casc_up above 0, give its "
                            "enthalpy h_casc_up too");
            const cy::DrainPump r = cy::pumped_drain(a[0], a[4], a[1], a[2], a[3], a[5], a[6], a[7], a[8], a[9],
                                                     a[10], a[12], h_casc, a[11]);
            o[0] = r.m_ext_up;
            o[1] = r.m_ext;
            o[2] = r.m_pumped;
            o[3] = r.m_down;
            o[4] = r.h_mix;
            o[5] = r.T_mix;
            o[6] = r.h_drain_up;
        }));
}

}  // namespace

void add_cycle_family(std::vector<Function>& out) {
    const std::size_t first = out.size();
    add_line_points(out);
    add_wet_exhaust(out);
    add_heaters(out);
    // Worked examples for docs/functions.md (SI; states of a 660 MW class reheat unit, common practice).
    static const std::pair<const char*, const char*> examples[] = {
        {"STEAM.TURBINE.HLINE.PT", "16.7; 540; 4.1; 0.87; 6.2"},
        {"STEAM.TURBINE.LINEPOINT.PT", "16.7; 540; 4.1; 0.87; 6.2"},
        {"STEAM.TURBINE.HLINE.PH", "0.931; 3140; 0.0065; 0.86; 0.16"},
        {"STEAM.TURBINE.LINEPOINT.PH", "0.931; 3140; 0.0065; 0.86; 0.16"},
        {"STEAM.TURBINE.ELEP.PT", "0.931; 340; 0.0065; 0.9; 1"},
        {"STEAM.TURBINE.UEEP.PT", "0.931; 340; 0.0065; 0.9; 1; 30"},
        {"STEAM.TURBINE.EXHAUST.PT", "0.931; 340; 0.0065; 0.9; 1; 30"},
        {"STEAM.TURBINE.ELEP.PH", "0.931; 3140; 0.0065; 0.9; 1"},
        {"STEAM.TURBINE.UEEP.PH", "0.931; 3140; 0.0065; 0.9; 1; 30"},
        {"STEAM.TURBINE.EXHAUST.PH", "0.931; 3140; 0.0065; 0.9; 1; 30"},
        {"STEAM.FWH.HDRAIN", "4; 209.4; 5.6"},
        {"STEAM.DEAERATOR.EXTRACTION", "565; 580; 0.9; 3140; 90; 900"},
        {"STEAM.DEAERATOR.BALANCE", "565; 580; 0.9; 3140; 90; 900"},
        {"STEAM.FWH.DRAINPUMP.BALANCE", "480; 330; 460; 610; 2; 2680; 500; 502; 2860; 0.43; 5.6"},
    };
    for (std::size_t i = first; i < out.size(); ++i)
        for (const auto& e : examples)
            if (out[i].name == e.first) out[i].example = out[i].name + "(" + e.second + ")";
}

}  // namespace isentra::catalogue::detail
