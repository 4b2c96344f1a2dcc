// SPDX-License-Identifier: MPL-2.0
// Representative arguments for every catalogue function (a valid, typical
// plant state per argument name, with per-function overrides), and small
// helpers to place calls in a sheet. Shared by the surface test (every
// function against the core) and the bad-input sweep. A new function whose
// argument names are not in by_name() gets them there, or an override.
#pragma once

#include <cmath>
#include <map>
#include <string>
#include <vector>

#include <gtest/gtest.h>

#include "isentra/surface/call.hpp"
#include "isentra/surface/catalogue.hpp"
#include "isentra/units/units.hpp"

namespace isentra::calctest::representative {

namespace cat = isentra::catalogue;

// A1-style column name of a 0-based column index.
inline std::string col(int c) {
    std::string s;
    for (++c; c > 0; c = (c - 1) / 26) s.insert(s.begin(), static_cast<char>('A' + (c - 1) % 26));
    return s;
}
inline std::string addr(int c, int r) { return col(c) + std::to_string(r + 1); }  // 0-based row

inline void expect_rel(double actual, double expected, double rel, const std::string& what) {
    EXPECT_NEAR(actual, expected, std::fabs(expected) * rel + 1e-300) << what;
}

// ---- representative arguments -----------------------------------------------
// Values in CORE units (MPa, K, kJ/kg, kJ/(kg K), kg/s, kW, K for differences),
// converted to the user's units of each run. Chosen by hand as typical plant
// states (common practice); the check values are the core's own results.

// By argument name, for every function unless overridden below.
inline const std::map<std::string, double>& by_name() {
    static const std::map<std::string, double> m = {
        {"p", 1.0}, {"T", 473.15}, {"h", 2800.0}, {"s", 6.7}, {"x", 0.5},  // 1 MPa, 200 degC: superheated
        {"p_in", 10.0}, {"T_in", 773.15}, {"h_in", 3375.0}, {"p_out", 2.0}, {"T_out", 573.15}, {"h_out", 3024.0},
        {"eta", 0.85}, {"u_p_in", 0.0025}, {"u_T_in", 1.0}, {"u_p_out", 0.0025}, {"u_T_out", 1.0},
        {"eta_dry", 0.88}, {"eta_wet", 0.80}, {"x_in", 1.0}, {"x_out", 0.9}, {"a", 1.0},
        {"m1", 10.0}, {"h1", 3000.0}, {"m2", 5.0}, {"h2", 500.0},
        {"m_steam", 10.0}, {"p_steam", 5.0}, {"T_steam", 723.15}, {"p_water", 8.0}, {"T_water", 423.15},
        {"p_shell", 1.0}, {"T_fw_out", 448.15}, {"T_drain", 393.15}, {"T_fw_in", 383.15},
        {"m_fw", 100.0}, {"h_fw_in", 600.0}, {"h_fw_out", 750.0}, {"h_ext", 3000.0}, {"h_drain", 650.0},
        {"m_casc", 5.0}, {"h_casc", 700.0},
        {"m_ms", 100.0}, {"h_ms", 3400.0}, {"h_fw", 1000.0}, {"m_rh", 90.0}, {"h_hrh", 3500.0},
        {"h_crh", 3000.0}, {"P_gen", 100000.0}, {"P_aux", 5000.0}, {"eta_boiler", 0.88},
        // flow meters (steam at 1 MPa, 200 degC): dp Pa, diameters m, flow kg/s; Re_D about 1e6
        {"dp", 20000.0}, {"d", 0.11}, {"D", 0.22}, {"m", 3.0}, {"beta", 0.5}, {"Re_D", 1.0e6}, {"C", 0.99},
        {"u_dp", 0.002}, {"u_p", 0.0025}, {"u_T", 1.0}, {"u_d", 0.0005}, {"u_D", 0.004}, {"u_C", 0.003},
    };
    return m;
}

// Text arguments other than units, by name (the flow meters' device types).
inline const std::map<std::string, std::string>& text_by_name() {
    static const std::map<std::string, std::string> m = {
        {"taps", "flange"}, {"type", "ISA 1932"}, {"convergent", "as cast"}, {"kind", "nozzle"}};
    return m;
}

// Per-function overrides where the defaults above are not a valid state.
inline const std::map<std::string, std::map<std::string, double>>& overrides() {
    static const std::map<std::string, std::map<std::string, double>> m = {
        // pumps: subcooled feedwater at the inlet (0.1 MPa, 40 degC) to 10 MPa
        {"STEAM.PUMP.OUTLET.PT", {{"p_in", 0.1}, {"T_in", 313.15}, {"p_out", 10.0}, {"eta", 0.8}}},
        {"STEAM.PUMP.HOUT.PT", {{"p_in", 0.1}, {"T_in", 313.15}, {"p_out", 10.0}, {"eta", 0.8}}},
        {"STEAM.PUMP.TOUT.PT", {{"p_in", 0.1}, {"T_in", 313.15}, {"p_out", 10.0}, {"eta", 0.8}}},
        {"STEAM.PUMP.WORK.PT", {{"p_in", 0.1}, {"T_in", 313.15}, {"p_out", 10.0}, {"eta", 0.8}}},
        // the same by (p,h): 167.6 kJ/kg is about h(0.1 MPa, 40 degC) (subcooled)
        {"STEAM.PUMP.OUTLET.PH", {{"p_in", 0.1}, {"h_in", 167.6}, {"p_out", 10.0}, {"eta", 0.8}}},
        {"STEAM.PUMP.HOUT.PH", {{"p_in", 0.1}, {"h_in", 167.6}, {"p_out", 10.0}, {"eta", 0.8}}},
        {"STEAM.PUMP.TOUT.PH", {{"p_in", 0.1}, {"h_in", 167.6}, {"p_out", 10.0}, {"eta", 0.8}}},
        {"STEAM.PUMP.WORK.PH", {{"p_in", 0.1}, {"h_in", 167.6}, {"p_out", 10.0}, {"eta", 0.8}}},
        // desuperheater: 5 MPa steam at 450 degC sprayed down to 350 degC (Tsat 264 degC)
        {"STEAM.DESUPERHEATER.SPRAY", {{"T_out", 623.15}}},
        // cycle family: extraction at 5 MPa on a 10 -> 2 MPa section; a wet exhaust at 10 kPa; a drain
        // cooler at 1 MPa; a deaerator at 0.9 MPa; two heaters around a pumped drain at 2 MPa
        {"STEAM.TURBINE.HLINE.PT", {{"p_ext", 5.0}}},
        {"STEAM.TURBINE.HLINE.PH", {{"p_ext", 5.0}}},
        {"STEAM.TURBINE.LINEPOINT.PT", {{"p_ext", 5.0}}},
        {"STEAM.TURBINE.LINEPOINT.PH", {{"p_ext", 5.0}}},
        {"STEAM.TURBINE.ELEP.PT", {{"p_out", 0.01}}},
        {"STEAM.TURBINE.ELEP.PH", {{"p_out", 0.01}}},
        {"STEAM.TURBINE.UEEP.PT", {{"p_out", 0.01}, {"h_loss", 30.0}}},
        {"STEAM.TURBINE.UEEP.PH", {{"p_out", 0.01}, {"h_loss", 30.0}}},
        {"STEAM.TURBINE.EXHAUST.PT", {{"p_out", 0.01}, {"h_loss", 30.0}}},
        {"STEAM.TURBINE.EXHAUST.PH", {{"p_out", 0.01}, {"h_loss", 30.0}}},
        {"STEAM.FWH.HDRAIN", {{"dca", 5.6}}},
        {"STEAM.DEAERATOR.EXTRACTION", {{"p_da", 0.9}, {"m_drain", 10.0}, {"h_drain", 900.0}}},
        {"STEAM.DEAERATOR.BALANCE", {{"p_da", 0.9}, {"m_drain", 10.0}, {"h_drain", 900.0}}},
        {"STEAM.FWH.DRAINPUMP.BALANCE",
         {{"p_fw", 2.0}, {"h_fw_mid", 680.0}, {"h_pumped", 652.0}, {"h_ext_up", 3100.0}, {"p_shell_up", 1.0},
          {"dca_up", 5.6}, {"m_casc_up", 5.0}, {"h_casc_up", 800.0}, {"frac", 1.0}}},
    };
    return m;
}

// The metastable-vapour functions (STEAM.<X>MV.*, IAPWS-IF97 Eq. 18): 1 MPa, 445 K,
// below Ts = 453.04 K and above the 5 % moisture line (420.7 K); h and s lie between
// their values at 440 and 450 K (R7-97(2012) Table 18).
inline const std::map<std::string, double>& metastable_args() {
    static const std::map<std::string, double> m = {{"p", 1.0}, {"T", 445.0}, {"h", 2750.0}, {"s", 6.52}};
    return m;
}

// Functions not checked here, each with its reason. Keep it empty if possible.
inline const std::map<std::string, std::string>& skip_list() {
    static const std::map<std::string, std::string> m = {};
    return m;
}

struct Arg {
    bool is_text = false;
    double number = 0;  // user units
    std::string text;
};

struct Case {
    std::vector<Arg> args;
    bool fallback_x1 = false;  // x = 0.5 was not valid, x = 1 used
};

// The argument list of f in the given unit system, with x = `x` for the
// arguments named x; units and (for US) header = 1 appended.
inline Case make_case(const cat::Function& f, const std::string& units, bool header, double x) {
    Case c;
    const units::UnitSpec spec = units::UnitSpec::parse(units);
    if (f.name == "STEAM.VERSION") return c;
    if (f.name == "STEAM.CONVERT") {
        // value; from; to
        if (units == "SI") c.args = {Arg{false, 150.0, ""}, Arg{true, 0, "psig"}, Arg{true, 0, "MPa"}};
        else c.args = {Arg{false, 2800.0, ""}, Arg{true, 0, "kJ/kg"}, Arg{true, 0, "Btu/lbm"}};
        return c;
    }
    if (f.name == "STEAM.EXPLAIN") {
        // explain a valid H.PT call with the same defaults (1 MPa, 200 degC)
        c.args = {Arg{true, 0, "H.PT"}, Arg{false, spec.from_core(Quantity::Pressure, 1.0), ""},
                  Arg{false, spec.from_core(Quantity::Temperature, 473.15), ""}, Arg{true, 0, units}};
        return c;
    }
    const auto ov = overrides().find(f.name);
    for (const cat::Arg& a : f.args) {
        if (a.name == "units" && a.quantity == Quantity::Text) {
            c.args.push_back(Arg{true, 0, units});
            continue;
        }
        if (a.name == "header") {
            if (header) c.args.push_back(Arg{false, 1.0, ""});
            continue;
        }
        if (a.quantity == Quantity::Text && text_by_name().count(a.name)) {
            c.args.push_back(Arg{true, 0, text_by_name().at(a.name)});
            continue;
        }
        if (a.quantity == Quantity::Text || a.varargs) {
            ADD_FAILURE() << f.name << ": no representative value for the text argument " << a.name;
            continue;
        }
        double v;
        if (f.name.find("MV.") != std::string::npos && metastable_args().count(a.name)) v = metastable_args().at(a.name);
        else if (ov != overrides().end() && ov->second.count(a.name)) v = ov->second.at(a.name);
        else if (a.name == "x") v = x;
        else if (by_name().count(a.name)) v = by_name().at(a.name);
        else if (a.optional && !std::isnan(a.default_value)) v = a.default_value;
        else {
            ADD_FAILURE() << f.name << ": no representative value for the argument " << a.name
                          << " (add it to by_name() or overrides())";
            v = 1.0;
        }
        c.args.push_back(Arg{false, spec.from_core(a.quantity, v), ""});
    }
    return c;
}

inline std::vector<Table> to_tables(const Case& c) {
    std::vector<Table> t;
    for (const Arg& a : c.args) t.push_back(Table::scalar(a.is_text ? Value::of_text(a.text) : Value::of(a.number)));
    return t;
}

inline bool has_error(const Table& t) {
    for (const Value& v : t.cells)
        if (v.kind == Value::Kind::Error) return true;
    return false;
}

inline std::string quote(const std::string& s) {
    std::string q = "\"";
    for (char ch : s) q += ch == '"' ? std::string("\"\"") : std::string(1, ch);
    return q + "\"";
}

}  // namespace isentra::calctest::representative
