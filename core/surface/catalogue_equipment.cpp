// SPDX-License-Identifier: MPL-2.0
// Turbine and plant-equipment functions of the catalogue. The numerics are in
// equipment.cpp; here each calculation gets its names, arguments and texts.
//
// Naming: STEAM.<MACHINE>.<RESULT>.<INPUTS>, like the property functions
// (STEAM.<PROPERTY>.<PAIR>): e.g. STEAM.TURBINE.HOUT.PT is the outlet
// enthalpy of a turbine expansion from an inlet given by p and T;
// STEAM.TURBINE.EFF.PT.PH the section efficiency from an inlet (p,T) and an
// outlet (p,h). Functions whose whole result is a row end in the name of
// what the row describes (EXPANSION, OUTLET, BUDGET). Method names are the
// same words in camelCase. Names and methods are frozen once released.
#include "catalogue_detail.hpp"

#include <cmath>
#include <limits>
#include <string>
#include <utility>

#include "isentra/engineering/equipment.hpp"
#include "isentra/base/error.hpp"
#include "isentra/if97/if97.hpp"
#include "isentra/units/units.hpp"

namespace isentra::catalogue::detail {

namespace {

namespace eq = isentra::equipment;

const char* const cat_turbine = "Steam turbines";
const char* const cat_equipment = "Steam plant equipment";
const char* const cat_performance = "Steam plant performance";


// The barometric pressure (MPa) when the units give pressures as gauge
// readings, else 0: uncertainties "as a fraction of the reading" then refer to
// the gauge reading the instrument shows.
double gauge_patm(const units::UnitSpec& spec) {
    return spec.is_gauge(Quantity::Pressure) ? spec.patm_MPa() : 0.0;
}

// ---- Argument texts ------------------------------------------------------------------

const char* const d_p_in = "Inlet pressure (absolute unless a gauge unit is chosen)";
const char* const d_T_in = "Inlet temperature";
const char* const d_h_in = "Inlet specific enthalpy";
const char* const d_p_out = "Outlet pressure (absolute unless a gauge unit is chosen)";
const char* const d_eta_turbine =
    "Isentropic efficiency as a fraction, 0 to 1 (0.85 for 85 %): (h_in - h_out)/(h_in - h_s)";

Arg p_arg(const char* n, const char* d) { return ranged(Arg{n, Quantity::Pressure, d}, ranges::absolute_pressure()); }
Arg p_in() { return p_arg("p_in", d_p_in); }
Arg p_out() { return p_arg("p_out", d_p_out); }
// zero_ok: whether a zero flow still gives a meaningful result (one stream of a mixer, no cascading drains).
Arg m_arg(const char* n, const char* d, bool zero_ok) {
    return ranged(Arg{n, Quantity::MassFlow, d}, ranges::mass_flow(zero_ok));
}
Arg h_arg(const char* n, const char* d) { return ranged(Arg{n, Quantity::SpecificEnergy, d}, ranges::enthalpy()); }
Arg T_arg(const char* n, const char* d) { return ranged(Arg{n, Quantity::Temperature, d}, ranges::temperature()); }
Arg eta_arg(const char* n, const char* d) { return ranged(Arg{n, Quantity::None, d}, ranges::efficiency()); }

// The outlet has no vapour quality: at or above the critical pressure, or
// below the triple-point pressure (no liquid phase). A RangeError on p_out so
// that the sentence is in the user's units.
[[noreturn]] void no_outlet_quality(double p_out) {
    if (p_out >= if97::pc)
        throw RangeError("p_out", Quantity::Pressure, p_out, std::numeric_limits<double>::quiet_NaN(), if97::pc,
                         "(the critical pressure: vapour quality exists only below it)", ErrorCode::NotDefined);
    throw RangeError("p_out", Quantity::Pressure, p_out, if97::pt, std::numeric_limits<double>::quiet_NaN(),
                     "(the triple-point pressure: below it water has no liquid phase, so there is no vapour quality)",
                     ErrorCode::NotDefined);
}

// ---- Turbine expansion -------------------------------------------------------------------

struct InletPair {
    const char* code;  // "PT" or "PH"
    Arg second;
    const char* words;
    eq::Expansion (*expand)(double, double, double, double);
};

void add_turbine_expansion(std::vector<Function>& out) {
    const InletPair inlets[] = {
        {"PT", T_arg("T_in", d_T_in), "inlet p and T (superheated steam)",
         &eq::turbine_expansion_pT},
        {"PH", h_arg("h_in", d_h_in),
         "inlet p and h (wet or superheated steam)",
         &eq::turbine_expansion_ph},
    };
    const std::string defn =
        " Isentropic efficiency eta = (h_in - h_out)/(h_in - h_s), h_s = h(p_out, s_in) the isentropic end "
        "point.";
    for (const InletPair& in : inlets) {
        const std::string code = in.code;
        auto args = [&]() {
            return std::vector<Arg>{p_in(), in.second, p_out(),
                                    eta_arg("eta", d_eta_turbine)};
        };
        auto ex = in.expand;
        {
            Function f = row(("STEAM.TURBINE.EXPANSION." + code).c_str(), ("turbineExpansion" + code).c_str(),
                             cat_turbine,
                             "Steam turbine expansion from " + std::string(in.words) +
                                 " to the outlet pressure with an isentropic efficiency, as one row. The row: "
                                 "outlet h, T, s, x, isentropic end point h_s and its x, and specific work h_in - "
                                 "h_out." +
                                 defn +
                                 " A wet outlet has T = Tsat(p_out) and x below 1; x above 1 means superheated. "
                                 "Enter as an array formula over 7 cells; with header = 1 the first row holds "
                                 "the names and units.",
                             args(),
                             {{"h_out", Quantity::SpecificEnergy},
                              {"T_out", Quantity::Temperature},
                              {"s_out", Quantity::SpecificEntropy},
                              {"x_out", Quantity::None},
                              {"h_s", Quantity::SpecificEnergy},
                              {"x_s", Quantity::None},
                              {"work", Quantity::SpecificEnergy}},
                             [ex](const double* a, double* o) {
                                 const eq::Expansion e = ex(a[0], a[1], a[2], a[3]);
                                 o[0] = e.h_out;
                                 o[1] = e.T_out;
                                 o[2] = e.s_out;
                                 o[3] = e.x_out;
                                 o[4] = e.h_s;
                                 o[5] = e.x_s;
                                 o[6] = e.work;
                             });
            out.push_back(std::move(f));
        }
        out.push_back(number(("STEAM.TURBINE.HOUT." + code).c_str(), ("turbineHout" + code).c_str(), cat_turbine,
                             "Outlet enthalpy of a turbine expansion from " + std::string(in.words) +
                                 ", outlet p and isentropic efficiency. It is h_out = h_in - eta (h_in - h_s)." +
                                 defn,
                             args(), Quantity::SpecificEnergy,
                             [ex](const double* a, double* o) { o[0] = ex(a[0], a[1], a[2], a[3]).h_out; }));
        out.push_back(number(("STEAM.TURBINE.TOUT." + code).c_str(), ("turbineTout" + code).c_str(), cat_turbine,
                             "Outlet temperature of a turbine expansion from " + std::string(in.words) +
                                 ", outlet p and isentropic efficiency. For a wet outlet it is the "
                                 "saturation temperature at p_out." + defn,
                             args(), Quantity::Temperature,
                             [ex](const double* a, double* o) { o[0] = ex(a[0], a[1], a[2], a[3]).T_out; }));
        out.push_back(number(("STEAM.TURBINE.XOUT." + code).c_str(), ("turbineXout" + code).c_str(), cat_turbine,
                             "Outlet vapour quality of a turbine expansion from " + std::string(in.words) +
                                 ", outlet p and isentropic efficiency. Below 1 for a wet outlet (1 - x "
                                 "is the moisture), above 1 (equilibrium quality) for a superheated one; an error "
                                 "at or above the critical pressure." + defn,
                             args(), Quantity::None, [ex](const double* a, double* o) {
                                 const double x = ex(a[0], a[1], a[2], a[3]).x_out;
                                 if (x != x) no_outlet_quality(a[2]);
                                 o[0] = x;
                             }));
        out.push_back(number(("STEAM.TURBINE.WORK." + code).c_str(), ("turbineWork" + code).c_str(), cat_turbine,
                             "Specific work h_in - h_out of a turbine expansion from " +
                                 std::string(in.words) + ", outlet p and isentropic efficiency. It is "
                                 "eta (h_in - h_s)." + defn,
                             args(), Quantity::SpecificEnergy,
                             [ex](const double* a, double* o) { o[0] = ex(a[0], a[1], a[2], a[3]).work; }));
    }
}

// ---- Section efficiency and its uncertainty -----------------------------------------------

void add_section_efficiency(std::vector<Function>& out) {
    const std::string defn =
        " Enthalpy-drop efficiency (h_in - h_out)/(h_in - h_s), h_s = h(p_out, s_in); returned as found, so "
        "inconsistent readings can give a value above 1. An error if the readings show no expansion work "
        "(h_out not below h_in), a water inlet, or a subcooled outlet.";
    out.push_back(number(
        "STEAM.TURBINE.EFF.PT.PT", "turbineEffPTPT", cat_turbine,
        "Turbine section efficiency from inlet and outlet pressure and temperature readings (superheated "
        "exhaust)." + defn +
            " An outlet reading at or below the saturation temperature is an error: use STEAM.TURBINE.EFF.PT.PH.",
        {p_in(), T_arg("T_in", d_T_in), p_out(), T_arg("T_out", "Outlet temperature (superheated steam)")},
        Quantity::None,
        [](const double* a, double* o) { o[0] = eq::section_efficiency_pT_pT(a[0], a[1], a[2], a[3]); }));
    out.push_back(number(
        "STEAM.TURBINE.EFF.PT.PH", "turbineEffPTPH", cat_turbine,
        "Turbine section efficiency from inlet pressure and temperature and the outlet pressure and enthalpy, "
        "e.g. for a wet exhaust whose enthalpy comes from an energy balance." + defn,
        {p_in(), T_arg("T_in", d_T_in), p_out(), h_arg("h_out", "Outlet specific enthalpy")}, Quantity::None,
        [](const double* a, double* o) { o[0] = eq::section_efficiency_pT_ph(a[0], a[1], a[2], a[3]); }));
    out.push_back(number(
        "STEAM.TURBINE.EFF.PH.PH", "turbineEffPHPH", cat_turbine,
        "Turbine section efficiency from inlet and outlet pressure and enthalpy (for a wet inlet, or states "
        "known by their enthalpies)." + defn,
        {p_in(), h_arg("h_in", d_h_in), p_out(), h_arg("h_out", "Outlet specific enthalpy")}, Quantity::None,
        [](const double* a, double* o) { o[0] = eq::section_efficiency_ph_ph(a[0], a[1], a[2], a[3]); }));

    auto unc_args = []() {
        return std::vector<Arg>{
            p_in(),
            T_arg("T_in", d_T_in),
            p_out(),
            T_arg("T_out", "Outlet temperature (superheated steam)"),
            ranged(Arg{"u_p_in", Quantity::None,
                       "Uncertainty of the inlet pressure reading as a fraction of the reading (0.0025 for 0.25 "
                       "%); of the gauge reading when the units give a gauge pressure (e.g. \"SI p=barg\")"},
                   ranges::relative_uncertainty()),
            ranged(Arg{"u_T_in", Quantity::TemperatureDifference, "Uncertainty of the inlet temperature reading"},
                   ranges::temperature_uncertainty()),
            ranged(Arg{"u_p_out", Quantity::None,
                       "Uncertainty of the outlet pressure reading as a fraction of the reading (0.0025 for 0.25 "
                       "%); of the gauge reading when the units give a gauge pressure"},
                   ranges::relative_uncertainty()),
            ranged(Arg{"u_T_out", Quantity::TemperatureDifference, "Uncertainty of the outlet temperature reading"},
                   ranges::temperature_uncertainty())};
    };
    const std::string method =
        " By the root-sum-square of sensitivity coefficient times instrument uncertainty (ASME PTC 19.1), "
        "the sensitivities d eta/d reading from the IAPWS-IF97 property derivatives; the result has the "
        "coverage of the uncertainties given (e.g. 95 %).";
    out.push_back(number("STEAM.TURBINE.EFF.UNC.PT.PT", "turbineEffUncPTPT", cat_turbine,
                         "Uncertainty of a turbine section efficiency (STEAM.TURBINE.EFF.PT.PT) from those of its "
                         "readings, as a fraction (0.01 = 1 percentage point). The "
                         "readings are the inlet and outlet pressure and temperature. Superheated outlets only (the outlet "
                         "enthalpy of a wet exhaust comes from an energy balance, whose uncertainty this "
                         "function does not know)." +
                             method,
                         unc_args(), Quantity::None, nullptr));
    out.back().eval_units = [](const double* a, double* o, const units::UnitSpec& spec) {
        o[0] = eq::section_efficiency_uncertainty(a[0], a[1], a[2], a[3], a[4], a[5], a[6], a[7], gauge_patm(spec))
                   .u_eta;
    };
    out.push_back(row("STEAM.TURBINE.EFF.BUDGET.PT.PT", "turbineEffBudgetPTPT", cat_turbine,
                      "Uncertainty budget of a turbine section efficiency as one row. The row: efficiency, its "
                      "uncertainty, each reading's contribution |theta_i u_i| (in efficiency units like u_eta: 0.001 = 0.1 "
                      "percentage point) and "
                      "its share of the total (theta_i u_i)^2/u^2 in % (the shares add up to 100)." +
                          method +
                          " Enter as an array formula over 10 cells; with header = 1 the first row holds the "
                          "names and units.",
                      unc_args(),
                      {{"eta", Quantity::None},
                       {"u_eta", Quantity::None},
                       {"c_p_in", Quantity::None},
                       {"c_T_in", Quantity::None},
                       {"c_p_out", Quantity::None},
                       {"c_T_out", Quantity::None},
                       {"share_p_in", Quantity::Percent},
                       {"share_T_in", Quantity::Percent},
                       {"share_p_out", Quantity::Percent},
                       {"share_T_out", Quantity::Percent}},
                      nullptr));
    out.back().eval_units = [](const double* a, double* o, const units::UnitSpec& spec) {
        const eq::EfficiencyUncertainty r =
            eq::section_efficiency_uncertainty(a[0], a[1], a[2], a[3], a[4], a[5], a[6], a[7], gauge_patm(spec));
        o[0] = r.eta;
        o[1] = r.u_eta;
        for (int i = 0; i < 4; ++i) {
            o[2 + i] = r.contribution[i];
            o[6 + i] = r.share[i];
        }
    };

    const std::string baumann =
        " Baumann rule (common practice): eta_wet = eta_dry (1 - a y), y = mean moisture ((1 - x_in) + (1 - "
        "x_out))/2 with superheated ends (x above 1) counted dry; a is about 1 (1 % efficiency lost per 1 % "
        "mean moisture).";
    auto baumann_args = [](const char* eta_name, const char* eta_desc) {
        return std::vector<Arg>{
            eta_arg(eta_name, eta_desc),
            ranged(Arg{"x_in", Quantity::None, "Vapour quality at the stage or section inlet (above 1 = superheated)"},
                   ranges::equilibrium_quality()),
            ranged(Arg{"x_out", Quantity::None, "Vapour quality at the stage or section outlet"},
                   ranges::equilibrium_quality()),
            ranged(Arg{"a", Quantity::None,
                       "Optional Baumann coefficient: efficiency fraction lost per unit of mean moisture; default 1, "
                       "the usual value",
                       true, false, 1.0},
                   ranges::baumann_coefficient())};
    };
    out.push_back(number("STEAM.BAUMANN.WET", "baumannWet", cat_turbine,
                         "Efficiency of a stage or section working in wet steam from its dry-steam efficiency." +
                             baumann,
                         baumann_args("eta_dry", "Dry-steam efficiency as a fraction (0.88 for 88 %)"),
                         Quantity::None,
                         [](const double* a, double* o) { o[0] = eq::baumann_wet(a[0], a[1], a[2], a[3]); }));
    out.push_back(number("STEAM.BAUMANN.DRY", "baumannDry", cat_turbine,
                         "Dry-steam efficiency of a stage or section from its efficiency in wet steam "
                         "(eta_dry = eta_wet / (1 - a y))." +
                             baumann,
                         baumann_args("eta_wet", "Efficiency in wet steam as a fraction (0.80 for 80 %)"),
                         Quantity::None,
                         [](const double* a, double* o) { o[0] = eq::baumann_dry(a[0], a[1], a[2], a[3]); }));
}

// ---- Pump and valve ---------------------------------------------------------------------------

void add_pump(std::vector<Function>& out) {
    struct P {
        const char* code;
        Arg second;
        const char* words;
        const char* inlet;
        eq::Pumping (*fn)(double, double, double, double);
    };
    const P inlets[] = {
        {"PT", T_arg("T_in", "Inlet temperature (subcooled water)"),
         "inlet pressure and temperature", " the inlet must be subcooled water (for saturated water use the PH form).",
         &eq::pump_pT},
        {"PH", h_arg("h_in", "Inlet specific enthalpy (subcooled or saturated water)"),
         "inlet pressure and enthalpy", " the inlet is subcooled or saturated water, e.g. h_in = STEAM.HF.P(p_in).",
         &eq::pump_ph},
    };
    for (const P& in : inlets) {
        const std::string code = in.code;
        auto args = [&]() {
            return std::vector<Arg>{
                p_in(), in.second, p_out(),
                eta_arg("eta",
                        "Pump isentropic efficiency as a fraction, above 0 to 1 (0.80 for 80 %): (h_s - h_in)/(h_out "
                        "- h_in)")};
        };
        const std::string defn = std::string(" Work (h_s - h_in)/eta, h_s = h(p_out, s_in);") + in.inlet;
        const std::string words = in.words;
        auto fn = in.fn;
        out.push_back(row(("STEAM.PUMP.OUTLET." + code).c_str(), ("pumpOutlet" + code).c_str(), cat_equipment,
                          "Pump outlet state and specific work from " + words +
                              ", outlet pressure and efficiency, as one row: h_out, T_out, s_out, h_s, work." + defn +
                              " Enter as an array formula over 5 cells; with header = 1 the first row holds the "
                              "names and units.",
                          args(),
                          {{"h_out", Quantity::SpecificEnergy},
                           {"T_out", Quantity::Temperature},
                           {"s_out", Quantity::SpecificEntropy},
                           {"h_s", Quantity::SpecificEnergy},
                           {"work", Quantity::SpecificEnergy}},
                          [fn](const double* a, double* o) {
                              const eq::Pumping r = fn(a[0], a[1], a[2], a[3]);
                              o[0] = r.h_out;
                              o[1] = r.T_out;
                              o[2] = r.s_out;
                              o[3] = r.h_s;
                              o[4] = r.work;
                          }));
        out.push_back(number(("STEAM.PUMP.HOUT." + code).c_str(), ("pumpHout" + code).c_str(), cat_equipment,
                             "Pump outlet specific enthalpy from " + words + ", outlet pressure and efficiency." +
                                 defn,
                             args(), Quantity::SpecificEnergy,
                             [fn](const double* a, double* o) { o[0] = fn(a[0], a[1], a[2], a[3]).h_out; }));
        out.push_back(number(("STEAM.PUMP.TOUT." + code).c_str(), ("pumpTout" + code).c_str(), cat_equipment,
                             "Pump outlet temperature from " + words + ", outlet pressure and efficiency." + defn,
                             args(), Quantity::Temperature,
                             [fn](const double* a, double* o) { o[0] = fn(a[0], a[1], a[2], a[3]).T_out; }));
        out.push_back(number(("STEAM.PUMP.WORK." + code).c_str(), ("pumpWork" + code).c_str(), cat_equipment,
                             "Pump specific work h_out - h_in from " + words + ", outlet pressure and efficiency." +
                                 defn,
                             args(), Quantity::SpecificEnergy,
                             [fn](const double* a, double* o) { o[0] = fn(a[0], a[1], a[2], a[3]).work; }));
    }
}

void add_valve(std::vector<Function>& out) {
    struct V {
        const char* code;
        Arg second;
        const char* words;
        eq::Throttling (*fn)(double, double, double);
    };
    const V inlets[] = {
        {"PT", T_arg("T_in", d_T_in), "inlet pressure and temperature", &eq::valve_pT},
        {"PH", h_arg("h_in", d_h_in), "inlet pressure and enthalpy", &eq::valve_ph},
    };
    for (const V& v : inlets) {
        const std::string code = v.code;
        auto args = [&]() { return std::vector<Arg>{p_in(), v.second, p_out()}; };
        auto fn = v.fn;
        const std::string defn = " Throttling is isenthalpic: h_out = h_in.";
        out.push_back(row(("STEAM.VALVE.OUTLET." + code).c_str(), ("valveOutlet" + code).c_str(), cat_equipment,
                          "State after throttling through a valve from " + std::string(v.words) +
                              " to the outlet pressure, as one row: h_out, T_out, s_out, x_out." + defn +
                              " x (equilibrium quality) between 0 and 1 is wet, above 1 superheated, below 0 "
                              "subcooled liquid. Enter as an array formula over 4 cells; "
                              "with header = 1 the first row holds the names and units.",
                          args(),
                          {{"h_out", Quantity::SpecificEnergy},
                           {"T_out", Quantity::Temperature},
                           {"s_out", Quantity::SpecificEntropy},
                           {"x_out", Quantity::None}},
                          [fn](const double* a, double* o) {
                              const eq::Throttling r = fn(a[0], a[1], a[2]);
                              o[0] = r.h;
                              o[1] = r.T_out;
                              o[2] = r.s_out;
                              o[3] = r.x_out;
                          }));
        out.push_back(number(("STEAM.VALVE.TOUT." + code).c_str(), ("valveTout" + code).c_str(), cat_equipment,
                             "Temperature after throttling through a valve from " + std::string(v.words) +
                                 " to the outlet pressure." + defn,
                             args(), Quantity::Temperature,
                             [fn](const double* a, double* o) { o[0] = fn(a[0], a[1], a[2]).T_out; }));
        out.push_back(number(("STEAM.VALVE.XOUT." + code).c_str(), ("valveXout" + code).c_str(), cat_equipment,
                             "Vapour quality after throttling through a valve from " + std::string(v.words) +
                                 " to the outlet pressure (equilibrium quality). Between 0 and 1 wet, above 1 "
                                 "superheated, below 0 subcooled liquid (a liquid inlet that does not flash); an "
                                 "error at or above the critical pressure." + defn,
                             args(), Quantity::None, [fn](const double* a, double* o) {
                                 const double x = fn(a[0], a[1], a[2]).x_out;
                                 if (x != x) no_outlet_quality(a[2]);
                                 o[0] = x;
                             }));
    }
}

// ---- Mixing and desuperheater -----------------------------------------------------------------

void add_mixing(std::vector<Function>& out) {
    auto streams = []() {
        return std::vector<Arg>{m_arg("m1", "Mass flow of stream 1", true), h_arg("h1", "Specific enthalpy of stream 1"),
                                m_arg("m2", "Mass flow of stream 2", true), h_arg("h2", "Specific enthalpy of stream 2")};
    };
    auto with_p = [&]() {
        std::vector<Arg> a = streams();
        a.push_back(p_arg("p", "Pressure of the mixed stream"));
        return a;
    };
    const std::string defn = " Adiabatic mixing: h = (m1 h1 + m2 h2)/(m1 + m2).";
    out.push_back(number("STEAM.MIX.H", "mixH", cat_equipment,
                         "Specific enthalpy after adiabatic mixing of two streams of water or steam." + defn,
                         streams(), Quantity::SpecificEnergy,
                         [](const double* a, double* o) { o[0] = eq::mix_h(a[0], a[1], a[2], a[3]); }));
    out.push_back(number("STEAM.MIX.T", "mixT", cat_equipment,
                         "Temperature after adiabatic mixing of two streams, at the pressure p of the mixed "
                         "stream." + defn,
                         with_p(), Quantity::Temperature,
                         [](const double* a, double* o) { o[0] = eq::mix(a[0], a[1], a[2], a[3], a[4]).T; }));
    out.push_back(row("STEAM.MIX.OUTLET", "mixOutlet", cat_equipment,
                      "Mixed stream after adiabatic mixing of two streams, at pressure p, as one row: m, h, T, s, x." +
                          defn +
                          " x (equilibrium quality) between 0 and 1 is wet, above 1 superheated, below 0 "
                          "subcooled liquid. Enter as an array formula over 5 cells; with "
                          "header = 1 the first row holds the names and units.",
                      with_p(),
                      {{"m", Quantity::MassFlow},
                       {"h", Quantity::SpecificEnergy},
                       {"T", Quantity::Temperature},
                       {"s", Quantity::SpecificEntropy},
                       {"x", Quantity::None}},
                      [](const double* a, double* o) {
                          const eq::Mixing r = eq::mix(a[0], a[1], a[2], a[3], a[4]);
                          o[0] = r.m;
                          o[1] = r.h;
                          o[2] = r.T;
                          o[3] = r.s;
                          o[4] = r.x;
                      }));
    out.push_back(number(
        "STEAM.DESUPERHEATER.SPRAY", "desuperheaterSpray", cat_equipment,
        "Spray-water flow of a desuperheater for a target outlet temperature, from its energy balance. "
        "Formula: m_w = m_steam (h_steam - h_out)/(h_out - h_water); the outlet is at the steam pressure and "
        "must stay superheated.",
        {m_arg("m_steam", "Steam flow entering the desuperheater (before the spray)", false),
         p_arg("p_steam", "Steam pressure (also the outlet pressure)"),
         T_arg("T_steam", "Steam temperature before the spray (superheated)"),
         p_arg("p_water", "Spray-water pressure"), T_arg("T_water", "Spray-water temperature"),
         T_arg("T_out", "Target outlet temperature (above the saturation temperature at p_steam)")},
        Quantity::MassFlow,
        [](const double* a, double* o) { o[0] = eq::desuperheater_spray(a[0], a[1], a[2], a[5], a[3], a[4]); }));
}

// ---- Feedwater heater ---------------------------------------------------------------------------

void add_fwh(std::vector<Function>& out) {
    out.push_back(number(
        "STEAM.FWH.TTD", "fwhTTD", cat_equipment,
        "Terminal temperature difference of a closed feedwater heater, TTD = Tsat(p_shell) - T_fw_out (ASME "
        "PTC 12.1). Here p_shell is the extraction steam pressure at the heater inlet. Negative when the feedwater "
        "leaves hotter than Tsat (heaters with a desuperheating zone, typically a few K).",
        {p_arg("p_shell", "Heater shell pressure (extraction steam pressure at the heater inlet)"),
         T_arg("T_fw_out", "Feedwater outlet temperature")},
        Quantity::TemperatureDifference, [](const double* a, double* o) { o[0] = eq::fwh_ttd(a[0], a[1]); }));
    out.push_back(number("STEAM.FWH.DCA", "fwhDCA", cat_equipment,
                         "Drain cooler approach of a closed feedwater heater, DCA = T_drain - T_fw_in (ASME PTC "
                         "12.1). It is the drain outlet temperature minus the feedwater inlet temperature. An error if the "
                         "drain is colder than the feedwater inlet.",
                         {T_arg("T_drain", "Drain outlet temperature"), T_arg("T_fw_in", "Feedwater inlet temperature")},
                         Quantity::TemperatureDifference,
                         [](const double* a, double* o) { o[0] = eq::fwh_dca(a[0], a[1]); }));
    out.push_back(number("STEAM.FWH.RISE", "fwhRise", cat_equipment,
                         "Feedwater temperature rise through a heater, T_fw_out - T_fw_in (an error if "
                         "negative).",
                         {T_arg("T_fw_in", "Feedwater inlet temperature"),
                          T_arg("T_fw_out", "Feedwater outlet temperature")},
                         Quantity::TemperatureDifference,
                         [](const double* a, double* o) { o[0] = eq::fwh_rise(a[0], a[1]); }));
    out.push_back(number(
        "STEAM.FWH.EXTRACTION", "fwhExtraction", cat_equipment,
        "Extraction steam flow to a closed feedwater heater from its energy balance (ASME PTC 12.1). It is "
        "m_ext = (m_fw (h_fw_out - h_fw_in) - m_casc (h_casc - h_drain)) / (h_ext - h_drain). Enthalpies from "
        "e.g. STEAM.H.PT; m_casc and h_casc only for drains cascading in from the heater above.",
        {m_arg("m_fw", "Feedwater flow through the heater", false), h_arg("h_fw_in", "Feedwater inlet enthalpy"),
         h_arg("h_fw_out", "Feedwater outlet enthalpy"), h_arg("h_ext", "Extraction steam enthalpy at the heater inlet"),
         h_arg("h_drain", "Drain outlet enthalpy"),
         ranged(Arg{"m_casc", Quantity::MassFlow,
                    "Optional: cascading drain flow from the heater above; default 0 (none)", true, false, 0.0},
                ranges::mass_flow(true)),
         ranged(Arg{"h_casc", Quantity::SpecificEnergy,
                    "Optional: enthalpy of the cascading drain; needed when m_casc is above 0", true},
                ranges::enthalpy())},
        Quantity::MassFlow, [](const double* a, double* o) {
            double h_casc = a[6];
            if (a[5] == 0.0 && std::isnan(h_casc)) h_casc = a[4];  // no cascading drains: its enthalpy plays no part
            if (std::isnan(h_casc))
                throw Error(ErrorCode::InvalidArgument,
                            "the argument h_casc is missing: with a cascading drain flow m_casc above 0, give the "
                            "cascading drain's enthalpy h_casc too");
            o[0] = eq::fwh_extraction_flow(a[0], a[1], a[2], a[3], a[4], a[5], h_casc);
        }));
}

// ---- Heat rate ------------------------------------------------------------------------------------

void add_heat_rate(std::vector<Function>& out) {
    // Main steam and feedwater (flow, then enthalpy in before out), the output
    // (and for the net heat rate the auxiliary power and boiler efficiency),
    // then the reheat stream as optional trailing arguments.
    auto main_args = []() {
        return std::vector<Arg>{m_arg("m_ms", "Main steam flow (leaving the boiler)", false),
                                h_arg("h_fw", "Final feedwater enthalpy (entering the boiler)"),
                                h_arg("h_ms", "Main steam enthalpy"),
                                ranged(Arg{"P_gen", Quantity::Power, "Generator output (gross)"},
                                       ranges::power(false))};
    };
    auto reheat = [](std::vector<Arg>& a) {
        a.push_back(ranged(Arg{"m_rh", Quantity::MassFlow, "Optional: reheat steam flow; default 0 (no reheat)", true,
                               false, 0.0},
                           ranges::mass_flow(true)));
        a.push_back(ranged(Arg{"h_crh", Quantity::SpecificEnergy, "Optional: cold reheat enthalpy (reheater inlet)",
                               true},
                           ranges::enthalpy()));
        a.push_back(ranged(Arg{"h_hrh", Quantity::SpecificEnergy, "Optional: hot reheat enthalpy (reheater outlet)",
                               true},
                           ranges::enthalpy()));
    };
    // a[k..k+2] = m_rh, h_crh, h_hrh; without reheat the enthalpies play no part.
    struct Reheat {
        double m, h_hrh, h_crh;
    };
    auto reheat_of = [](const double* a) {
        Reheat r{a[0], a[2], a[1]};
        if (r.m == 0.0) {
            if (std::isnan(r.h_hrh)) r.h_hrh = 0.0;
            if (std::isnan(r.h_crh)) r.h_crh = 0.0;
        }
        if (std::isnan(r.h_crh) || std::isnan(r.h_hrh))
            throw Error(ErrorCode::InvalidArgument,
                        std::string("the argument ") + (std::isnan(r.h_crh) ? "h_crh" : "h_hrh") +
                            " is missing: with a reheat flow m_rh above 0, give the cold and hot reheat enthalpies "
                            "h_crh and h_hrh too");
        return r;
    };
    const std::string heat = "heat added to the cycle Q = m_ms (h_ms - h_fw) + m_rh (h_hrh - h_crh)";
    std::vector<Arg> cyc = main_args();
    reheat(cyc);
    out.push_back(number("STEAM.HEATRATE.CYCLE", "heatRateCycle", cat_performance,
                         "Turbine cycle heat rate Q / P_gen, with the " + heat +
                             ". Enthalpies from e.g. STEAM.H.PT. An error below 3600 kJ/kWh (3412.14 "
                             "Btu/kWh), which would mean more than 100 % efficiency.",
                         std::move(cyc), Quantity::HeatRate, [reheat_of](const double* a, double* o) {
                             const Reheat r = reheat_of(a + 4);
                             o[0] = eq::cycle_heat_rate(a[0], a[2], a[1], r.m, r.h_hrh, r.h_crh, a[3]);
                         }));
    std::vector<Arg> net = main_args();
    net.push_back(ranged(Arg{"P_aux", Quantity::Power, "Auxiliary power (station service) taken from the generator output"},
                         ranges::power(true)));
    net.push_back(eta_arg("eta_boiler", "Boiler (steam generator) efficiency as a fraction (0.88 for 88 %)"));
    reheat(net);
    out.push_back(number("STEAM.HEATRATE.NET", "heatRateNet", cat_performance,
                         "Net unit heat rate (Q / eta_boiler) / (P_gen - P_aux): fuel heat per unit of net "
                         "output. Here Q is the " + heat + ". Enthalpies from e.g. STEAM.H.PT.",
                         std::move(net), Quantity::HeatRate, [reheat_of](const double* a, double* o) {
                             const Reheat r = reheat_of(a + 6);
                             o[0] = eq::net_heat_rate(a[0], a[2], a[1], r.m, r.h_hrh, r.h_crh, a[3], a[4], a[5]);
                         }));
}

}  // namespace

void add_equipment_family(std::vector<Function>& out) {
    add_turbine_expansion(out);
    add_section_efficiency(out);
    add_pump(out);
    add_valve(out);
    add_mixing(out);
    add_fwh(out);
    add_heat_rate(out);
}

}  // namespace isentra::catalogue::detail
