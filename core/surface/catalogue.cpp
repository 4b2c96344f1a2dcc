// SPDX-License-Identifier: MPL-2.0
// The function catalogue. See catalogue.hpp for the rules: display names and
// method names are frozen once released. The property and saturation
// families are built from tables below; their order (and so the generated
// IDL) is deterministic.
#include "isentra/surface/catalogue.hpp"
#include "catalogue_detail.hpp"

#include <algorithm>
#include <cctype>
#include <cmath>
#include <cstdio>
#include <cstdlib>
#include <cstring>
#include <limits>
#include <utility>

#include "isentra/base/error.hpp"
#include "isentra/properties/state.hpp"
#include "isentra/properties/transport.hpp"
#include "isentra/units/units.hpp"

#ifndef ISENTRA_VERSION
#define ISENTRA_VERSION "0.0.0"
#endif

namespace isentra::catalogue {

namespace {

constexpr double nan_v = std::numeric_limits<double>::quiet_NaN();

// ---- Input pairs ---------------------------------------------------------

struct InputSpec {
    const char* code;  // "P", "T", "H", "S", "X"
    const char* arg;   // argument name shown to the user
    Quantity q;
    const char* description;
    Range (*range)();
};

const InputSpec in_p{"P", "p", Quantity::Pressure, "Pressure (absolute unless a gauge unit is chosen)",
                     &detail::ranges::absolute_pressure};
const InputSpec in_T{"T", "T", Quantity::Temperature, "Temperature", &detail::ranges::temperature};
const InputSpec in_h{"H", "h", Quantity::SpecificEnergy, "Specific enthalpy", &detail::ranges::enthalpy};
const InputSpec in_s{"S", "s", Quantity::SpecificEntropy, "Specific entropy", &detail::ranges::entropy};
const InputSpec in_p_sat{"P", "p", Quantity::Pressure, "Saturation pressure (absolute unless a gauge unit is chosen)",
                         &detail::ranges::saturation_pressure};
const InputSpec in_T_sat{"T", "T", Quantity::Temperature, "Saturation temperature",
                         &detail::ranges::saturation_temperature};
const InputSpec in_x{"X", "x", Quantity::None,
                     "Vapour quality (mass fraction of vapour), 0 = saturated liquid, 1 = saturated vapour",
                     &detail::ranges::quality};

Arg input_arg(const InputSpec& in) { return detail::ranged(Arg{in.arg, in.q, in.description}, in.range()); }

struct PairSpec {
    const char* code;  // "PT"
    const InputSpec* a;
    const InputSpec* b;
    State (*solve)(double, double);
    const char* words;  // "pressure and temperature"
};

const PairSpec pairs[] = {
    {"PT", &in_p, &in_T, &state_pT, "pressure and temperature"},
    {"PH", &in_p, &in_h, &state_ph, "pressure and specific enthalpy"},
    {"PS", &in_p, &in_s, &state_ps, "pressure and specific entropy"},
    {"HS", &in_h, &in_s, &state_hs, "specific enthalpy and specific entropy"},
    {"PX", &in_p_sat, &in_x, &state_px, "pressure and vapour quality"},
    {"TX", &in_T_sat, &in_x, &state_Tx, "temperature and vapour quality"},
};

// ---- Properties ------------------------------------------------------------

enum class Prop { T, P, H, S, U, V, RHO, CP, CV, W, KAPPA, X, MU, LAMBDA, NU, ALPHA, PR };

struct PropSpec {
    Prop prop;
    const char* code;    // display code, "H"
    const char* method;  // method stem, "h"
    Quantity q;
    const char* noun;    // "specific enthalpy"
    bool transport;
};

const PropSpec props[] = {
    {Prop::T, "T", "t", Quantity::Temperature, "temperature", false},
    {Prop::P, "P", "p", Quantity::Pressure, "pressure", false},
    {Prop::H, "H", "h", Quantity::SpecificEnergy, "specific enthalpy", false},
    {Prop::S, "S", "s", Quantity::SpecificEntropy, "specific entropy", false},
    {Prop::U, "U", "u", Quantity::SpecificEnergy, "specific internal energy", false},
    {Prop::V, "V", "v", Quantity::SpecificVolume, "specific volume", false},
    {Prop::RHO, "RHO", "rho", Quantity::Density, "density", false},
    {Prop::CP, "CP", "cp", Quantity::SpecificEntropy, "specific isobaric heat capacity", false},
    {Prop::CV, "CV", "cv", Quantity::SpecificEntropy, "specific isochoric heat capacity", false},
    {Prop::W, "W", "w", Quantity::Speed, "speed of sound", false},
    {Prop::KAPPA, "KAPPA", "kappa", Quantity::None,
     "isentropic exponent (-v/p (dp/dv)s = w^2 rho / p)", false},
    {Prop::X, "X", "x", Quantity::None, "vapour quality", false},
    {Prop::MU, "MU", "mu", Quantity::DynamicViscosity, "dynamic viscosity (IAPWS R12-08 industrial form)", true},
    {Prop::LAMBDA, "LAMBDA", "lambda", Quantity::ThermalConductivity,
     "thermal conductivity (IAPWS R15-11, industrial form)", true},
    {Prop::NU, "NU", "nu", Quantity::KinematicViscosity, "kinematic viscosity (mu/rho)", true},
    {Prop::ALPHA, "ALPHA", "alpha", Quantity::ThermalDiffusivity,
     "thermal diffusivity (lambda/(rho cp))", true},
    {Prop::PR, "PR", "pr", Quantity::None, "Prandtl number (mu cp/lambda)", true},
};

// The property's saturated-liquid and -vapour functions, as a sentence's way
// out: "STEAM.CVF.P(p) for saturated water or STEAM.CVG.P(p) for saturated
// steam" where the saturation family has them, else the PX form at x = 0 or 1.
bool has_saturation_functions(Prop p) {
    switch (p) {
    case Prop::H: case Prop::S: case Prop::U: case Prop::V: case Prop::RHO: case Prop::CP: case Prop::CV:
    case Prop::W: case Prop::MU: case Prop::LAMBDA: case Prop::NU: case Prop::PR: return true;
    default: return false;
    }
}

const char* prop_code(Prop p);

std::string saturated_ways(Prop p) {
    const std::string c = prop_code(p);
    if (has_saturation_functions(p))
        return "STEAM." + c + "F.P(p) for saturated water or STEAM." + c + "G.P(p) for saturated steam (or the .T forms)";
    return "STEAM." + c + ".PX(p; 0) for saturated water or STEAM." + c + ".PX(p; 1) for saturated steam";
}

[[noreturn]] void not_in_dome(Prop p, const char* what) {
    throw Error(ErrorCode::NotDefined, std::string(what) +
                                           " is not defined for a wet (two-phase) state, only for each phase: use " +
                                           saturated_ways(p));
}

// cp, cv, w, kappa and the transport properties need (d rho/d p)_T. At
// pressures far below any plant's (below about 1e-150 MPa) the specific
// volume is so large that its derivatives overflow double precision: that is
// not the critical point, and the sentence says so.
[[noreturn]] void too_low_pressure(const State& st, const std::string& subject) {
    char buf[40];
    std::snprintf(buf, sizeof buf, "%.6g", st.p);
    throw Error(ErrorCode::OutOfRange,
                subject + " not computable at p = " + buf +
                    " MPa: at so low a pressure the specific volume is so large that its derivatives overflow "
                    "double precision; steam there is an ideal gas, so the value at 1e-6 MPa is the same to many "
                    "digits");
}

bool near_critical(const State& st) { return std::fabs(st.p - if97::pc) < 1.0 && std::fabs(st.T - if97::Tc) < 10.0; }

double single_phase(const State& st, double value, Prop p, const char* what) {
    if (st.phase == Phase::TwoPhase && !(st.x == 0.0 || st.x == 1.0)) not_in_dome(p, what);
    if (critical_singularity(st.T, st.p, st.drhodp_T) || !std::isfinite(value)) {
        if (!near_critical(st)) too_low_pressure(st, std::string(what) + " is");
        throw critical_singularity_error(std::string(what) + " is");
    }
    return value;
}

// Transport properties: the same low-pressure case.
template <class F>
double transport(const State& st, F fn) {
    if (!near_critical(st) && (critical_singularity(st.T, st.p, st.drhodp_T) || !std::isfinite(st.cp)) &&
        st.phase != Phase::TwoPhase)
        too_low_pressure(st, "transport properties are");
    return fn(st);
}

double get(const State& st, Prop p) {
    switch (p) {
    case Prop::T: return st.T;
    case Prop::P: return st.p;
    case Prop::H: return st.h;
    case Prop::S: return st.s;
    case Prop::U: return st.u;
    case Prop::V: return st.v;
    case Prop::RHO: return st.rho;
    case Prop::CP: return single_phase(st, st.cp, p, "cp");
    case Prop::CV: return single_phase(st, st.cv, p, "cv");
    case Prop::W: return single_phase(st, st.w, p, "The speed of sound");
    case Prop::KAPPA: return single_phase(st, st.kappa, p, "The isentropic exponent");
    case Prop::X: return quality(st);
    case Prop::MU: return transport(st, [](const State& s) { return viscosity(s); });
    case Prop::LAMBDA: return transport(st, [](const State& s) { return conductivity(s); });
    case Prop::NU: return transport(st, [](const State& s) { return kinematic_viscosity(s); });
    case Prop::ALPHA: return transport(st, [](const State& s) { return thermal_diffusivity(s); });
    case Prop::PR: return transport(st, [](const State& s) { return prandtl(s); });
    }
    return nan_v;
}

const char* prop_code(Prop p) {
    for (const PropSpec& ps : props)
        if (ps.prop == p) return ps.code;
    return "";
}

// (p,T) exactly on the saturation line: the sentence names the saturated
// liquid and vapour functions of the property asked for.
[[noreturn]] void on_saturation_line(const std::string& ways) {
    throw Error(ErrorCode::Impossible,
                "p and T lie exactly on the saturation line (T = Tsat(p)), where they do not fix the state: use " +
                    ways + ", or give the quality, h or s instead of T");
}

State solve_pair(State (*solve)(double, double), double a, double b, const std::string& ways) {
    if (solve != &state_pT) return solve(a, b);
    try {
        return state_pT(a, b);
    } catch (const RangeError&) {
        throw;
    } catch (const Error& e) {
        if (e.code() == ErrorCode::Impossible) on_saturation_line(ways);
        throw;
    }
}

// Saturated-liquid or -vapour State from a saturation State (x = 0 one).
State side_state(const State& sat, bool vapour) { return with_quality(sat, vapour ? 1.0 : 0.0); }

double sat_get(const State& sat, Prop p, int side /*0 f, 1 g, 2 fg*/) {
    if (side == 2) return get(side_state(sat, true), p) - get(side_state(sat, false), p);
    // At the critical point cp, cv, w, kappa and the transport properties are
    // errors (critical_singularity): the saturated states there carry an
    // infinite (d rho/d p)_T.
    return get(side_state(sat, side == 1), p);
}

std::string lower(std::string s) {
    for (auto& c : s) c = static_cast<char>(std::tolower(static_cast<unsigned char>(c)));
    return s;
}

}  // namespace

// ---- Argument ranges -------------------------------------------------------------
//
// Limits in core units. Formulation limits come from IAPWS-IF97 (R7-97(2012)
// Sec. 4: 273.15 K <= T <= 1073.15 K up to 100 MPa, and region 5 to
// 2273.15 K up to 50 MPa); the enthalpy and entropy limits are the extremes
// of the core's own IF97 over that range, rounded outward so that no state
// IF97 covers is refused: h(273.15 K, psat(273.15 K)) = -0.0416 kJ/kg is the
// lowest enthalpy, h(2273.15 K, p -> 0) = 7376.98 kJ/kg the highest;
// s(273.15 K, 100 MPa) = -0.0086 kJ/(kg K) the lowest entropy (s has no
// upper limit as p -> 0: 50 kJ/(kg K) is a sanity limit, reached at 2000 °C
// only below about 1e-30 MPa). Flows and powers get sanity maxima far above
// any steam plant (the largest units pass about 2,500 kg/s of main steam
// and make about 1.75 GW, common practice), so that a wrong cell (a unit
// mix-up, 1E308) is caught while no real reading is refused.

namespace detail::ranges {
Range make(double lo, bool lo_open, const char* lo_why, double hi, bool hi_open, const char* hi_why) {
    Range r;
    r.min = lo;
    r.min_open = lo_open;
    r.min_why = lo_why;
    r.max = hi;
    r.max_open = hi_open;
    r.max_why = hi_why;
    return r;
}

Range absolute_pressure() {
    return make(0.0, true, "(an absolute pressure is above 0)", if97::p_max, false, "(the upper limit of IAPWS-IF97)");
}
Range temperature() {
    return make(if97::T_min, false, "(the lowest temperature of IAPWS-IF97)", if97::T_max, false,
                "(the highest temperature of IAPWS-IF97, region 5)");
}
Range enthalpy() {
    return make(-0.05, false, "(the lowest enthalpy IAPWS-IF97 covers: water at 0 °C)", 7377.0, false,
                "(the highest enthalpy IAPWS-IF97 covers: steam at 2000 °C)");
}
Range entropy() {
    return make(-0.01, false, "(the lowest entropy IAPWS-IF97 covers: water at 0 °C and 100 MPa)", 50.0, false,
                "(a sanity limit: steam at 2000 °C reaches it only below about 1e-30 MPa)");
}
Range saturation_pressure() {
    return make(if97::pt, false, "(the triple-point pressure: the saturation line starts there)", if97::pc, false,
                "(the critical pressure: the saturation line ends there)");
}
Range saturation_temperature() {
    return make(if97::T_min, false, "(the lowest temperature of IAPWS-IF97's saturation line)", if97::Tc, false,
                "(the critical temperature: the saturation line ends there)");
}
Range quality() {
    return make(0.0, false, "(vapour quality is a mass fraction)", 1.0, false, "(vapour quality is a mass fraction)");
}
Range equilibrium_quality() {
    return make(0.0, false, "(vapour quality; above 1 counts as dry superheated steam)", 100.0, false,
                "(a sanity limit: above 1 the steam is superheated and counts as dry, and no turbine state "
                "comes near 100)");
}
Range efficiency() {
    return make(0.0, true, "(an efficiency is a fraction above 0, e.g. 0.85 for 85 %)", 1.0, false,
                "(an efficiency is a fraction, e.g. 0.85 for 85 %, not a percentage)");
}
// The Baumann coefficient: above 0 (0 would be no correction at all, and a
// blank cell counts as 0) up to 3, a sanity limit (the usual value is 1,
// common practice).
Range baumann_coefficient() {
    return make(0.0, true, "(the Baumann coefficient is above 0, usually 1)", 3.0, false,
                "(a sanity limit: the usual value is 1)");
}
Range mass_flow(bool zero_ok) {
    return make(0.0, !zero_ok,
                zero_ok ? "(a mass flow cannot be negative)" : "(the flow must be above 0 for a result to mean anything)",
                1e5, false, "(a sanity limit, far above any steam plant's flows: check the units)");
}
Range power(bool zero_ok) {
    return make(0.0, !zero_ok, zero_ok ? "(a power cannot be negative)" : "(the power must be above 0)", 1e7, false,
                "(a sanity limit of 10 GW, far above any generating unit: check the units, e.g. MW given as kW)");
}
Range relative_uncertainty() {
    return make(0.0, false, "(an uncertainty cannot be negative)", 0.1, false,
                "(a pressure uncertainty is a fraction of the reading, e.g. 0.0025 for 0.25 %, at most 0.1)");
}
Range temperature_uncertainty() {
    return make(0.0, false, "(an uncertainty cannot be negative)", 10.0, false,
                "(a sanity limit: a temperature uncertainty is a temperature difference, typically a few tenths "
                "of a kelvin; a fraction or a percentage of the reading was probably meant, which this argument "
                "does not take)");
}
Range for_quantity(Quantity q) {
    switch (q) {
    case Quantity::Pressure: return absolute_pressure();
    case Quantity::Temperature: return temperature();
    case Quantity::SpecificEnergy: return enthalpy();
    case Quantity::SpecificEntropy: return entropy();
    default: return Range{};
    }
}
}  // namespace detail::ranges

Arg detail::ranged(Arg a, Range r) {
    a.range = std::move(r);
    return a;
}

Arg detail::units_arg() {
    return Arg{"units", Quantity::Text,
               "Optional units of inputs and result: \"SI\" (default), \"US\", \"BAR\", \"KPA\" or \"K\", then "
               "overrides, e.g. \"US p=psig\"; a bare unit (\"psig\") means SI with it. STEAM.UNITS.SPELL spells "
               "it out",
               true};
}

namespace {
using detail::units_arg;

void add_property_family(std::vector<Function>& out) {
    for (const PairSpec& pair : pairs) {
        for (const PropSpec& ps : props) {
            // The inputs themselves are not offered as properties of their own pair.
            if (ps.code == std::string(pair.a->code) || ps.code == std::string(pair.b->code)) continue;
            Function f;
            f.name = std::string("STEAM.") + ps.code + "." + pair.code;
            f.method = std::string(ps.method) + pair.code;
            f.category = ps.transport ? "Steam transport properties" : "Steam properties";
            std::string noun = ps.noun;
            noun[0] = static_cast<char>(std::toupper(static_cast<unsigned char>(noun[0])));
            f.summary = noun + " of water or steam from " + pair.words + " (IAPWS-IF97).";
            if (ps.prop == Prop::X)
                f.summary +=
                    " Inside the wet region 0..1; outside it, below the critical pressure, the "
                    "equilibrium quality (h - hf)/(hg - hf): below 0 for subcooled liquid, above 1 for "
                    "superheated steam; an error above the critical pressure.";
            if (ps.prop == Prop::CP || ps.prop == Prop::CV || ps.prop == Prop::W ||
                ps.prop == Prop::KAPPA || ps.transport)
                f.summary += " Not defined for a wet mixture: use the F (liquid) or G (vapour) function.";
            if (ps.transport)
                f.summary += " Range: 0 to 900 °C (32 to 1652 °F), up to 50 MPa (7252 psia) above 800 °C, "
                             "the range of the IAPWS transport releases.";
            if (ps.transport) f.note = detail::transport_note(ps.code);
            f.args = {input_arg(*pair.a), input_arg(*pair.b), units_arg()};
            f.result = ps.q;
            const Prop prop = ps.prop;
            auto solve = pair.solve;
            const std::string ways = prop == Prop::X ? "STEAM.X.PH(p; h) with the enthalpy" : saturated_ways(prop);
            f.eval = [prop, solve, ways](const double* a, double* o) {
                o[0] = get(solve_pair(solve, a[0], a[1], ways), prop);
            };
            out.push_back(std::move(f));
        }
    }
}

// Saturation functions: STEAM.HF.P(p), STEAM.HG.T(T), STEAM.HFG.P(p), ...
void add_saturation_family(std::vector<Function>& out) {
    struct SatProp {
        Prop prop;
        bool fg;  // offer the difference g - f
    };
    const SatProp sat_props[] = {{Prop::H, true},    {Prop::S, true},      {Prop::U, true},
                                 {Prop::V, true},    {Prop::RHO, false},   {Prop::CP, false},
                                 {Prop::CV, false},  {Prop::W, false},     {Prop::MU, false},
                                 {Prop::LAMBDA, false}, {Prop::NU, false}, {Prop::PR, false}};
    const char* side_code[3] = {"F", "G", "FG"};
    const char* side_words[3] = {"saturated liquid", "saturated vapour",
                                 "the difference saturated vapour minus saturated liquid of the"};
    for (const SatProp& sp : sat_props) {
        const PropSpec& ps = *std::find_if(std::begin(props), std::end(props),
                                           [&](const PropSpec& x) { return x.prop == sp.prop; });
        for (int side = 0; side < 3; ++side) {
            if (side == 2 && !sp.fg) continue;
            for (int by = 0; by < 2; ++by) {  // 0: by pressure, 1: by temperature
                Function f;
                const char* in = by == 0 ? "P" : "T";
                f.name = std::string("STEAM.") + ps.code + side_code[side] + "." + in;
                f.method = std::string(ps.method) + lower(side_code[side]) + in;
                f.category = ps.transport ? "Steam transport properties" : "Steam saturation";
                f.summary = std::string(ps.noun) +
                            (side == 2 ? std::string(" of saturated vapour minus saturated liquid")
                                       : std::string(" of ") + side_words[side]) +
                            (by == 0 ? " at saturation pressure p" : " at saturation temperature T") +
                            " (IAPWS-IF97 region 4).";
                f.summary[0] = static_cast<char>(std::toupper(static_cast<unsigned char>(f.summary[0])));
                if (ps.transport) f.note = detail::transport_note(ps.code);
                if (by == 0)
                    f.args = {detail::ranged(Arg{"p", Quantity::Pressure, "Saturation pressure"},
                                             detail::ranges::saturation_pressure()),
                              units_arg()};
                else
                    f.args = {detail::ranged(Arg{"T", Quantity::Temperature, "Saturation temperature"},
                                             detail::ranges::saturation_temperature()),
                              units_arg()};
                f.result = ps.q;
                const Prop prop = sp.prop;
                if (by == 0)
                    f.eval = [prop, side](const double* a, double* o) {
                        o[0] = sat_get(saturation_p(a[0]), prop, side);
                    };
                else
                    f.eval = [prop, side](const double* a, double* o) {
                        o[0] = sat_get(saturation_T(a[0]), prop, side);
                    };
                out.push_back(std::move(f));
            }
        }
    }
}

// Whole state as a row.
const Prop state_row[] = {Prop::P,  Prop::T, Prop::H,     Prop::S, Prop::U,  Prop::V,
                          Prop::RHO, Prop::CP, Prop::CV,  Prop::W, Prop::KAPPA, Prop::X};

void add_state_family(std::vector<Function>& out) {
    for (const PairSpec& pair : pairs) {
        Function f;
        f.name = std::string("STEAM.STATE.") + pair.code;
        f.method = std::string("state") + pair.code;
        f.category = "Steam properties";
        f.summary = std::string("The whole state from ") + pair.words +
                    " as one row: p, T, h, s, u, v, rho, cp, cv, w, kappa, x, region. Enter as an "
                    "array formula over 13 cells (more rows for a range of inputs); with header = 1 "
                    "the first row holds the names and units.";
        f.args = {input_arg(*pair.a), input_arg(*pair.b), units_arg(),
                  Arg{"header", Quantity::None,
                      "Optional: 1 (or TRUE) puts a row of names and units above the values; default 0",
                      true}};
        f.kind = ResultKind::Row;
        for (Prop p : state_row) {
            const PropSpec& ps = *std::find_if(std::begin(props), std::end(props),
                                               [&](const PropSpec& x) { return x.prop == p; });
            f.row_names.push_back(lower(ps.code));
            f.row_quantities.push_back(ps.q);
        }
        f.row_names.push_back("region");
        f.row_quantities.push_back(Quantity::None);
        auto solve = pair.solve;
        f.eval = [solve](const double* a, double* o) {
            const State st = solve_pair(solve, a[0], a[1],
                                        "STEAM.STATE.PX(p; 0) for saturated water or STEAM.STATE.PX(p; 1) for "
                                        "saturated steam");
            std::size_t i = 0;
            for (Prop p : state_row) {
                double v;
                try {
                    v = get(st, p);
                } catch (const Error&) {
                    v = nan_v;  // shown as an error element; the rest of the row stands
                }
                o[i++] = v;
            }
            o[i] = st.region;
        };
        out.push_back(std::move(f));
    }
}

// Worked examples for docs/functions.md (Function::example), SI units, with
// readings of the (fictional) Harrow Fen Unit 2 where there are some. The
// property families get one state per input pair; the rest by name.
void add_examples(std::vector<Function>& out) {
    static const std::pair<const char*, const char*> by_name[] = {
        {"STEAM.TSAT", "0.1"},
        {"STEAM.PSAT", "100"},
        {"STEAM.SIGMA.T", "100"},
        {"STEAM.TURBINE.EXPANSION.PT", "16.62; 538.4; 4.08; 0.87"},
        {"STEAM.TURBINE.HOUT.PT", "16.62; 538.4; 4.08; 0.87"},
        {"STEAM.TURBINE.TOUT.PT", "16.62; 538.4; 4.08; 0.87"},
        {"STEAM.TURBINE.XOUT.PT", "16.62; 538.4; 4.08; 0.87"},
        {"STEAM.TURBINE.WORK.PT", "16.62; 538.4; 4.08; 0.87"},
        {"STEAM.TURBINE.EXPANSION.PH", "0.95; 3050; 0.0065; 0.88"},
        {"STEAM.TURBINE.HOUT.PH", "0.95; 3050; 0.0065; 0.88"},
        {"STEAM.TURBINE.TOUT.PH", "0.95; 3050; 0.0065; 0.88"},
        {"STEAM.TURBINE.XOUT.PH", "0.95; 3050; 0.0065; 0.88"},
        {"STEAM.TURBINE.WORK.PH", "0.95; 3050; 0.0065; 0.88"},
        {"STEAM.TURBINE.EFF.PT.PT", "16.62; 538.4; 4.08; 333.1"},
        {"STEAM.TURBINE.EFF.PT.PH", "0.95; 300; 0.0065; 2400"},
        {"STEAM.TURBINE.EFF.PH.PH", "0.95; 3050; 0.0065; 2400"},
        {"STEAM.TURBINE.EFF.UNC.PT.PT", "16.62; 538.4; 4.08; 333.1; 0.0025; 1; 0.0025; 1"},
        {"STEAM.TURBINE.EFF.BUDGET.PT.PT", "16.62; 538.4; 4.08; 333.1; 0.0025; 1; 0.0025; 1"},
        {"STEAM.BAUMANN.WET", "0.9; 0.95; 0.88; 1"},
        {"STEAM.BAUMANN.DRY", "0.85; 0.95; 0.88; 1"},
        {"STEAM.PUMP.OUTLET.PT", "1.2; 180; 19; 0.82"},
        {"STEAM.PUMP.HOUT.PT", "1.2; 180; 19; 0.82"},
        {"STEAM.PUMP.TOUT.PT", "1.2; 180; 19; 0.82"},
        {"STEAM.PUMP.WORK.PT", "1.2; 180; 19; 0.82"},
        {"STEAM.PUMP.OUTLET.PH", "0.008; 173.8; 2.5; 0.8"},
        {"STEAM.PUMP.HOUT.PH", "0.008; 173.8; 2.5; 0.8"},
        {"STEAM.PUMP.TOUT.PH", "0.008; 173.8; 2.5; 0.8"},
        {"STEAM.PUMP.WORK.PH", "0.008; 173.8; 2.5; 0.8"},
        {"STEAM.VALVE.OUTLET.PT", "16.62; 538.4; 12"},
        {"STEAM.VALVE.TOUT.PT", "16.62; 538.4; 12"},
        {"STEAM.VALVE.XOUT.PT", "16.62; 538.4; 12"},
        {"STEAM.VALVE.OUTLET.PH", "1; 2700; 0.1"},
        {"STEAM.VALVE.TOUT.PH", "1; 2700; 0.1"},
        {"STEAM.VALVE.XOUT.PH", "1; 2700; 0.1"},
        {"STEAM.MIX.H", "100; 2800; 20; 700"},
        {"STEAM.MIX.T", "100; 2800; 20; 700; 1"},
        {"STEAM.MIX.OUTLET", "100; 2800; 20; 700; 1"},
        {"STEAM.DESUPERHEATER.SPRAY", "50; 4; 450; 6; 150; 400"},
        {"STEAM.FWH.TTD", "1.8; 204"},
        {"STEAM.FWH.DCA", "180; 174"},
        {"STEAM.FWH.RISE", "174; 204"},
        {"STEAM.FWH.EXTRACTION", "180; 740; 873; 3030; 770"},
        {"STEAM.HEATRATE.CYCLE", "180; 1100; 3400; 190000; 160; 3000; 3540"},
        {"STEAM.HEATRATE.NET", "180; 1100; 3400; 190000; 9000; 0.88; 160; 3000; 3540"},
        {"STEAM.CONVERT", "150; \"psig\"; \"MPa\""},
        {"STEAM.UNITS.SPELL", "\"psig\""},
        {"STEAM.EXPLAIN", "\"H.PT\"; 200; 300"},
        {"STEAM.VERSION", ""},
        // Flow meters (ISO 5167): an extraction line (orifice, 4.08 MPa steam), the
        // final feedwater (nozzle, 19 MPa, 250 degC, about 180 kg/s), condensate (venturi).
        {"STEAM.FLOW.ORIFICE", "73; 4.08; 333.1; 180; 300; \"flange\""},
        {"STEAM.FLOW.DP.ORIFICE", "25; 4.08; 333.1; 180; 300; \"flange\""},
        {"STEAM.FLOW.SOLUTION.ORIFICE", "73; 4.08; 333.1; 180; 300; \"flange\""},
        {"STEAM.FLOW.C.ORIFICE", "0.6; 1e7; 300; \"flange\""},
        {"STEAM.FLOW.EPS.ORIFICE", "73; 4.08; 333.1; 0.6"},
        {"STEAM.FLOW.UNC.ORIFICE", "73; 4.08; 333.1; 180; 300; \"flange\"; 0.0025; 0.0025; 1; 0.0005; 0.004"},
        {"STEAM.FLOW.BUDGET.ORIFICE", "73; 4.08; 333.1; 180; 300; \"flange\"; 0.0025; 0.0025; 1; 0.0005; 0.004"},
        {"STEAM.FLOW.NOZZLE", "28.9; 19; 250; 180; 300; \"ISA 1932\""},
        {"STEAM.FLOW.DP.NOZZLE", "180; 19; 250; 180; 300; \"ISA 1932\""},
        {"STEAM.FLOW.SOLUTION.NOZZLE", "28.9; 19; 250; 180; 300; \"ISA 1932\""},
        {"STEAM.FLOW.C.NOZZLE", "0.6; 1e7; 300; \"ISA 1932\""},
        {"STEAM.FLOW.EPS.NOZZLE", "73; 4.08; 333.1; 0.6"},
        {"STEAM.FLOW.UNC.NOZZLE", "28.9; 19; 250; 180; 300; \"ISA 1932\"; 0.0025; 0.0025; 1; 0.0005; 0.004"},
        {"STEAM.FLOW.BUDGET.NOZZLE", "28.9; 19; 250; 180; 300; \"ISA 1932\"; 0.0025; 0.0025; 1; 0.0005; 0.004"},
        {"STEAM.FLOW.VENTURI", "3.4; 2; 150; 120; 200; \"rough welded\""},
        {"STEAM.FLOW.DP.VENTURI", "30; 2; 150; 120; 200; \"rough welded\""},
        {"STEAM.FLOW.SOLUTION.VENTURI", "3.4; 2; 150; 120; 200; \"rough welded\""},
        {"STEAM.FLOW.C.VENTURI", "0.6; 5e5; 200; \"rough welded\""},
        {"STEAM.FLOW.EPS.VENTURI", "73; 4.08; 333.1; 0.6"},
        {"STEAM.FLOW.UNC.VENTURI", "3.4; 2; 150; 120; 200; \"rough welded\"; 0.0025; 0.0025; 1; 0.0005; 0.004"},
        {"STEAM.FLOW.BUDGET.VENTURI", "3.4; 2; 150; 120; 200; \"rough welded\"; 0.0025; 0.0025; 1; 0.0005; 0.004"},
        {"STEAM.FLOW.CALIBRATED", "28.9; 19; 250; 180; 300; 0.99; \"nozzle\""},
        {"STEAM.FLOW.DP.CALIBRATED", "180; 19; 250; 180; 300; 0.99; \"nozzle\""},
        {"STEAM.FLOW.SOLUTION.CALIBRATED", "28.9; 19; 250; 180; 300; 0.99; \"nozzle\""},
        {"STEAM.FLOW.UNC.CALIBRATED",
         "28.9; 19; 250; 180; 300; 0.99; \"nozzle\"; 0.003; 0.0025; 0.0025; 1; 0.0005; 0.004"},
        {"STEAM.FLOW.BUDGET.CALIBRATED",
         "28.9; 19; 250; 180; 300; 0.99; \"nozzle\"; 0.003; 0.0025; 0.0025; 1; 0.0005; 0.004"},
    };
    // Input pairs: main steam (16.62 MPa, 538.4 degC), a superheated IP state,
    // the condenser (6.5 kPa, wet). Wet states use x = 1 for the properties that
    // a wet state does not have (cp, cv, w, kappa, transport).
    static const std::pair<const char*, const char*> by_pair[] = {
        {"PT", "16.62; 538.4"}, {"PH", "4.08; 3050"}, {"PS", "4.08; 6.5"},
        {"HS", "3400; 6.5"},    {"PX", "0.0065; 0.9"}, {"TX", "37.6; 0.9"}};
    const std::string wet_ok = "|T|P|H|S|U|V|RHO|STATE|";
    for (Function& f : out) {
        if (!f.example.empty()) continue;
        for (const auto& e : by_name)
            if (f.name == e.first) f.example = f.name + "(" + e.second + ")";
        if (!f.example.empty()) continue;
        const std::size_t d1 = f.name.find('.'), d2 = f.name.rfind('.');
        if (d1 == d2 || f.name.find('.', d1 + 1) != d2) continue;  // STEAM.<A>.<B> only
        const std::string prop = f.name.substr(d1 + 1, d2 - d1 - 1), in = f.name.substr(d2 + 1);
        // Metastable (supercooled) vapour, STEAM.<prop>MV.<pair>: 0.1 MPa, 8-10 K below Tsat.
        if (prop.size() > 2 && prop.compare(prop.size() - 2, 2, "MV") == 0) {
            if (in == "PT") f.example = f.name + "(0.1; 90)";
            if (in == "PH") f.example = f.name + "(0.1; 2660)";
            if (in == "PS") f.example = f.name + "(0.1; 7.3)";
            continue;
        }
        for (const auto& e : by_pair)
            if (in == e.first) {
                std::string a = e.second;
                if ((in == "PX" || in == "TX") && wet_ok.find("|" + prop + "|") == std::string::npos)
                    a.replace(a.size() - 3, 3, "1");
                f.example = f.name + "(" + a + ")";
            }
        if (!f.example.empty()) continue;
        // The saturation family, STEAM.<prop>{F,G,FG}.{P,T}: the condenser pressure or 100 degC.
        const char last = prop.empty() ? ' ' : prop.back();
        if (last != 'F' && last != 'G') continue;
        if (in == "P") f.example = f.name + "(0.0065)";
        if (in == "T") f.example = f.name + "(100)";
    }
}

std::vector<Function> build() {
    std::vector<Function> out;
    {
        Function f;
        f.name = "STEAM.TSAT";
        f.method = "tsat";
        f.category = "Steam saturation";
        f.summary = "Saturation temperature at pressure p (IAPWS-IF97 region 4, R7-97(2012) Eq. 31).";
        f.args = {detail::ranged(Arg{"p", Quantity::Pressure, "Pressure (absolute unless a gauge unit is chosen)"},
                                 detail::ranges::saturation_pressure()),
                  units_arg()};
        f.result = Quantity::Temperature;
        f.eval = [](const double* a, double* o) { o[0] = saturation_temperature(a[0]); };
        out.push_back(std::move(f));
    }
    {
        Function f;
        f.name = "STEAM.PSAT";
        f.method = "psat";
        f.category = "Steam saturation";
        f.summary = "Saturation pressure at temperature T (IAPWS-IF97 region 4, R7-97(2012) Eq. 30).";
        f.args = {detail::ranged(Arg{"T", Quantity::Temperature, "Temperature"},
                                 detail::ranges::saturation_temperature()),
                  units_arg()};
        f.result = Quantity::Pressure;
        f.eval = [](const double* a, double* o) { o[0] = saturation_pressure(a[0]); };
        out.push_back(std::move(f));
    }
    add_saturation_family(out);
    {
        Function f;
        f.name = "STEAM.SIGMA.T";
        f.method = "sigmaT";
        f.category = "Steam transport properties";
        f.summary = "Surface tension of water against its vapour at saturation temperature T "
                    "(IAPWS R1-76(2014)).";
        f.args = {detail::ranged(Arg{"T", Quantity::Temperature, "Saturation temperature, from the triple point"},
                                 detail::ranges::saturation_temperature()),
                  units_arg()};
        f.result = Quantity::SurfaceTension;
        f.note = detail::transport_note("SIGMA");
        f.eval = [](const double* a, double* o) { o[0] = surface_tension(a[0]); };
        out.push_back(std::move(f));
    }
    add_property_family(out);
    add_state_family(out);
    detail::add_equipment_family(out);
    detail::add_supplementary_family(out);
    detail::add_flow_family(out);
    detail::add_cycle_family(out);
    {
        Function f;
        f.name = "STEAM.CONVERT";
        f.method = "convert";
        f.category = "Steam utilities";
        f.summary = "Converts a value between two units of the same kind, e.g. "
                    "STEAM.CONVERT(150; \"psig\"; \"MPa\"). Gauge pressures are relative to the standard "
                    "atmosphere (101.325 kPa) unless the unit text gives the local one, e.g. \"psig patm=14.2psia\"; "
                    "temperature differences use delta units (\"delta_K\", \"delta_degF\").";
        f.args = {Arg{"value", Quantity::None, "The value to convert, in unit 'from'"},
                  Arg{"from", Quantity::Text, "Unit of the value, e.g. \"psig\", \"degF\", \"Btu/lbm\""},
                  Arg{"to", Quantity::Text, "Unit wanted, e.g. \"MPa\", \"degC\", \"kJ/kg\""}};
        f.kind = ResultKind::Number;
        out.push_back(std::move(f));  // evaluated specially by call()
    }
    {
        Function f;
        f.name = "STEAM.UNITS.SPELL";
        f.method = "unitsSpell";
        f.category = "Steam utilities";
        f.summary = "Spells out a units text: which unit each quantity gets under it, and for gauge pressures the "
                    "barometric pressure added to a reading, e.g. STEAM.UNITS.SPELL(\"psig\") says SI with p in "
                    "psig. Use it to check a workbook's units cell.";
        // Its argument is the text to spell out, not the units of a result.
        f.args = {Arg{"units", Quantity::Text,
                      "The units text to spell out, e.g. a workbook's units cell or \"US p=psig\"; blank "
                      "means SI",
                      true}};
        f.kind = ResultKind::Text;
        out.push_back(std::move(f));  // evaluated specially by call()
    }
    {
        Function f;
        f.name = "STEAM.EXPLAIN";
        f.method = "explain";
        f.category = "Steam utilities";
        f.summary = "Explains, in one sentence and in your units, why a call of another STEAM function "
                    "gives an error. For example =STEAM.EXPLAIN(\"H.PT\"; A2; B2; \"US\") repeats the call "
                    "STEAM.H.PT(A2; B2; \"US\") and returns its error sentence, or \"OK\" and the value.";
        f.args = {Arg{"function", Quantity::Text, "Name of the function, e.g. \"H.PT\" or \"STEAM.H.PT\""},
                  Arg{"arguments", Quantity::None,
                      "The same arguments as in the call being explained, in the same order and units",
                      false, true}};
        f.kind = ResultKind::Text;
        out.push_back(std::move(f));
    }
    {
        Function f;
        f.name = "STEAM.VERSION";
        f.method = "version";
        f.category = "Steam utilities";
        f.summary = "The version of the Isentra add-in, e.g. for a workbook's audit trail.";
        f.kind = ResultKind::Text;
        out.push_back(std::move(f));
    }
    // Every family gets the ranges of the common quantities where it has not
    // set its own: absolute pressures, IAPWS-IF97 temperatures, enthalpies,
    // entropies, flows and powers (zero allowed: a family that needs more sets
    // its range itself), and efficiencies (arguments named eta or eta_...).
    for (Function& f : out)
        for (Arg& a : f.args) {
            if (!std::isnan(a.range.min) || !std::isnan(a.range.max) || a.whole_range || a.varargs) continue;
            if (f.name == "STEAM.CONVERT") continue;  // any value of any unit
            switch (a.quantity) {
            case Quantity::None:
                if (a.name == "eta" || a.name.rfind("eta_", 0) == 0) a.range = detail::ranges::efficiency();
                break;
            case Quantity::Pressure:
            case Quantity::Temperature:
            case Quantity::SpecificEnergy:
            case Quantity::SpecificEntropy: a.range = detail::ranges::for_quantity(a.quantity); break;
            case Quantity::MassFlow: a.range = detail::ranges::mass_flow(true); break;
            case Quantity::Power: a.range = detail::ranges::power(true); break;
            default: break;
            }
        }
    add_examples(out);
    return out;
}

}  // namespace

std::size_t Function::units_index() const {
    for (std::size_t i = 0; i < args.size(); ++i)
        if (args[i].name == "units" && args[i].quantity == Quantity::Text) return i;
    return args.size();
}

bool Function::has_units_arg() const { return units_index() < args.size(); }

const std::vector<Function>& functions() {
    static const std::vector<Function> all = build();  // built once, immutable afterwards
    return all;
}

namespace {
char ascii_lower(char c) { return c >= 'A' && c <= 'Z' ? static_cast<char>(c - 'A' + 'a') : c; }
bool same_ignoring_case(std::string_view a, std::string_view b) {
    if (a.size() != b.size()) return false;
    for (std::size_t k = 0; k < a.size(); ++k)
        if (ascii_lower(a[k]) != ascii_lower(b[k])) return false;
    return true;
}
}  // namespace

// No allocation: the command line looks a name up for every call it reads.
const Function* find(std::string_view name) {
    const bool prefixed = name.size() >= 6 && same_ignoring_case(name.substr(0, 6), "steam.");
    for (const Function& f : functions()) {
        const std::string_view n = f.name;
        if (prefixed ? same_ignoring_case(n, name)
                     : (n.size() == name.size() + 6 && same_ignoring_case(n.substr(0, 6), "steam.") &&
                        same_ignoring_case(n.substr(6), name)))
            return &f;
    }
    for (const Function& f : functions())
        if (same_ignoring_case(f.method, name)) return &f;
    return nullptr;
}

bool arg_accepts(const Function& f, std::size_t i, double v) {
    if (i >= f.args.size()) return false;
    return arg_accepts(f.args[i], v);
}

bool arg_accepts(const Arg& a, double v) {
    if (a.quantity == Quantity::Text || a.name == "header" || a.varargs || a.whole_range) return false;
    if (!std::isfinite(v)) return false;
    const Range& r = a.range;
    if (!std::isnan(r.min) && (v < r.min || (r.min_open && v == r.min))) return false;
    if (!std::isnan(r.max) && (v > r.max || (r.max_open && v == r.max))) return false;
    return true;
}

RangeError range_error(const Function& f, std::size_t i, double v) { return range_error(f.args.at(i), v); }

RangeError range_error(const Arg& a, double v) {
    const Range& r = a.range;
    if (!std::isnan(r.min) && (v < r.min || (r.min_open && v == r.min)))
        return RangeError(a.name, a.quantity, v, r.min, nan_v, r.min_why);
    if (!std::isnan(r.max) && (v > r.max || (r.max_open && v == r.max)))
        return RangeError(a.name, a.quantity, v, nan_v, r.max, r.max_why);
    return RangeError(a.name, a.quantity, v, nan_v, nan_v, "(it must be a finite number)");
}

namespace {
std::string short_num(double v) {
    char buf[32];
    if (v == 0) v = 0;
    std::snprintf(buf, sizeof buf, "%.5g", v);
    // A large bound reads as a plain number in the Wizard ("100000 kg/s", not "1e+05 kg/s").
    if (std::strchr(buf, 'e') && std::fabs(v) >= 1 && std::fabs(v) < 1e15)
        std::snprintf(buf, sizeof buf, "%.0f", std::strtod(buf, nullptr));
    return buf;
}

std::string range_in(const Arg& a, const units::UnitSpec& spec) {
    const Range& r = a.range;
    const bool lo = !std::isnan(r.min), hi = !std::isnan(r.max);
    auto u = [&](double v) { return short_num(spec.from_core(a.quantity, v)); };
    std::string t;
    if (lo && hi) t = (r.min_open ? "above " : "") + u(r.min) + " to " + (r.max_open ? "below " : "") + u(r.max);
    else if (lo) t = (r.min_open ? "above " : "at least ") + u(r.min);
    else if (hi) t = (r.max_open ? "below " : "at most ") + u(r.max);
    const std::string sym = spec.symbol(a.quantity);
    if (!t.empty() && !sym.empty()) t += " " + sym;
    return t;
}
}  // namespace

std::string range_text(const Function& f, std::size_t i) {
    const Arg& a = f.args.at(i);
    if (std::isnan(a.range.min) && std::isnan(a.range.max)) return "";
    const std::string si = range_in(a, units::UnitSpec::parse("SI"));
    const std::string us = range_in(a, units::UnitSpec::parse("US"));
    return si == us ? si : si + " (US: " + us + ")";
}

const char* version() { return ISENTRA_VERSION; }

}  // namespace isentra::catalogue
