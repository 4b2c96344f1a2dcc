// SPDX-License-Identifier: MPL-2.0
// Every input checked and every explanation right: argument ranges from the
// catalogue (checked in one place by call()), zeros that a blank cell leaves,
// the header flag, sentences at the saturation line, in the dome and at very
// low pressure, STEAM.EXPLAIN's own errors and suggestions, and
// STEAM.UNITS.SPELL.
#include <gtest/gtest.h>

#include <cmath>
#include <limits>
#include <string>
#include <vector>

#include "isentra/properties/state.hpp"
#include "isentra/surface/call.hpp"
#include "isentra/surface/catalogue.hpp"
#include "isentra/units/units.hpp"

namespace {

using namespace isentra;
namespace cat = isentra::catalogue;

const cat::Function& fn(const char* name) {
    const cat::Function* f = cat::find(name);
    if (!f) throw std::runtime_error(std::string("no catalogue function ") + name);
    return *f;
}

Value run(const char* name, std::vector<Value> args) { return call_scalar(fn(name), args); }

Value nums(const char* name, std::vector<double> a, const char* units = nullptr) {
    std::vector<Value> v;
    for (double d : a) v.push_back(Value::of(d));
    if (units) v.push_back(Value::of_text(units));
    return run(name, v);
}

// The error sentence of a call that must fail (empty string if it gave a number).
std::string error_of(const Value& v) {
    EXPECT_EQ(v.kind, Value::Kind::Error) << "got " << v.number;
    return v.kind == Value::Kind::Error ? v.text : std::string();
}

bool has(const std::string& text, const std::string& part) { return text.find(part) != std::string::npos; }

std::size_t arg_index(const cat::Function& f, const char* name) {
    for (std::size_t i = 0; i < f.args.size(); ++i)
        if (f.args[i].name == name) return i;
    ADD_FAILURE() << f.name << " has no argument " << name;
    return 0;
}

constexpr double kInf = std::numeric_limits<double>::infinity();
constexpr double kNaN = std::numeric_limits<double>::quiet_NaN();

// ============================================================================
// Ranges as metadata
// ============================================================================

TEST(InputRanges, EveryEnthalpyFlowEfficiencyQualityUncertaintyAndPowerArgumentHasOne) {
    int checked = 0;
    for (const cat::Function& f : cat::functions()) {
        for (std::size_t i = 0; i < f.args.size(); ++i) {
            const cat::Arg& a = f.args[i];
            if (a.quantity == Quantity::Text || a.name == "header" || a.varargs) continue;
            if (f.name == "STEAM.CONVERT") continue;  // any value of any unit
            // Every function: the state and balance quantities (a default range by quantity where
            // a family sets none). The water/steam and equipment families also: temperatures,
            // efficiencies, qualities and uncertainties (the flow-meter family checks its
            // temperatures and uncertainties in its own functions).
            const bool all = a.quantity == Quantity::SpecificEnergy || a.quantity == Quantity::SpecificEntropy ||
                             a.quantity == Quantity::MassFlow || a.quantity == Quantity::Power ||
                             a.quantity == Quantity::Pressure || a.quantity == Quantity::Temperature ||
                             a.name.rfind("eta", 0) == 0;
            const bool ours = f.name.rfind("STEAM.FLOW.", 0) != 0 &&
                              (a.name.rfind("x", 0) == 0 || a.name.rfind("u_", 0) == 0);
            const bool needs = all || ours;
            if (!needs) continue;
            ++checked;
            EXPECT_FALSE(std::isnan(a.range.min) && std::isnan(a.range.max)) << f.name << " " << a.name;
            EXPECT_FALSE(cat::range_text(f, i).empty()) << f.name << " " << a.name;
            // Never a number that is not finite.
            EXPECT_FALSE(cat::arg_accepts(f, i, kNaN)) << f.name << " " << a.name;
            EXPECT_FALSE(cat::arg_accepts(f, i, kInf)) << f.name << " " << a.name;
            EXPECT_FALSE(cat::arg_accepts(f, i, 1e308)) << f.name << " " << a.name;
            EXPECT_FALSE(cat::arg_accepts(f, i, -1e308)) << f.name << " " << a.name;
        }
    }
    EXPECT_GT(checked, 400);  // about 2.4 per function over ~200 functions
}

TEST(InputRanges, BoundsAndTheirOpenness) {
    // Efficiency: a fraction above 0 up to 1 (definition of an isentropic efficiency).
    const cat::Function& t = fn("STEAM.TURBINE.HOUT.PT");
    const std::size_t eta = arg_index(t, "eta");
    EXPECT_FALSE(cat::arg_accepts(t, eta, 0.0));
    EXPECT_TRUE(cat::arg_accepts(t, eta, 1e-9));
    EXPECT_TRUE(cat::arg_accepts(t, eta, 1.0));
    EXPECT_FALSE(cat::arg_accepts(t, eta, 1.0 + 1e-12));
    EXPECT_EQ(cat::range_text(t, eta), "above 0 to 1");
    // Absolute pressure above 0 up to 100 MPa (R7-97(2012) Sec. 4).
    const std::size_t p = arg_index(t, "p_in");
    EXPECT_FALSE(cat::arg_accepts(t, p, 0.0));
    EXPECT_TRUE(cat::arg_accepts(t, p, 100.0));
    EXPECT_FALSE(cat::arg_accepts(t, p, 100.0000001));
    // Enthalpy: -0.05 .. 7377 kJ/kg, the extremes of the core's IF97 rounded outward:
    // h(273.15 K, psat) = -0.0416 and h(2273.15 K, p -> 0) = 7376.98 kJ/kg.
    const cat::Function& m = fn("STEAM.MIX.H");
    const std::size_t h1 = arg_index(m, "h1");
    EXPECT_TRUE(cat::arg_accepts(m, h1, state_pT(saturation_pressure(273.15) * 0.999, 273.15).h));
    EXPECT_TRUE(cat::arg_accepts(m, h1, state_pT(1e-9, 2273.15).h));
    EXPECT_FALSE(cat::arg_accepts(m, h1, -1.0));
    EXPECT_FALSE(cat::arg_accepts(m, h1, 8000.0));
    EXPECT_EQ(cat::range_text(m, h1), "-0.05 to 7377 kJ/kg (US: -0.021496 to 3171.5 Btu/lbm)");
    // A flow where 0 is meaningful (one stream of a mixer) and one where it is not.
    EXPECT_TRUE(cat::arg_accepts(m, arg_index(m, "m1"), 0.0));
    const cat::Function& x = fn("STEAM.FWH.EXTRACTION");
    EXPECT_FALSE(cat::arg_accepts(x, arg_index(x, "m_fw"), 0.0));
    EXPECT_TRUE(cat::arg_accepts(x, arg_index(x, "m_casc"), 0.0));
    // Text arguments take no number.
    EXPECT_FALSE(cat::arg_accepts(t, t.units_index(), 0.0));
}

TEST(InputRanges, IssueExamplesAreErrorsWithSentences) {
    // Quality without an upper limit (before): now a sanity limit of 100.
    std::string s = error_of(nums("STEAM.BAUMANN.WET", {0.88, 1e308, 0.9}));
    EXPECT_TRUE(has(s, "x_in = 1e+308 is above the maximum 100")) << s;
    s = error_of(nums("STEAM.BAUMANN.DRY", {0.8, 0.95, 1e308}));
    EXPECT_TRUE(has(s, "x_out")) << s;
    // Enthalpies of the equipment functions.
    s = error_of(nums("STEAM.FWH.EXTRACTION", {100, 590, 740, 1e308, 640, 5, 700}));
    EXPECT_TRUE(has(s, "h_ext = 1e+308 kJ/kg is above the maximum 7377 kJ/kg")) << s;
    s = error_of(nums("STEAM.MIX.T", {10, -1, 5, 500, 1}));
    EXPECT_TRUE(has(s, "h1 = -1 kJ/kg is below the minimum -0.05 kJ/kg")) << s;
    s = error_of(nums("STEAM.HEATRATE.CYCLE", {100, -1, 3400, 80000}));
    EXPECT_TRUE(has(s, "h_fw = -1 kJ/kg")) << s;
    // The same in US units: the limit in Btu/lbm (7377 kJ/kg / 2.326 (kJ/kg)/(Btu/lbm), NIST SP 811).
    s = error_of(nums("STEAM.MIX.H", {10, 4000, 5, 500}, "US"));
    EXPECT_TRUE(has(s, "h1 = 4000 Btu/lbm is above the maximum 3171.54 Btu/lbm")) << s;
    // A temperature uncertainty of 100 K: the sentence says what was probably meant.
    s = error_of(nums("STEAM.TURBINE.EFF.UNC.PT.PT", {10, 500, 1, 250, 0.0025, 100, 0.0025, 0.5}));
    EXPECT_TRUE(has(s, "u_T_in = 100 K is above the maximum 10 K")) << s;
    EXPECT_TRUE(has(s, "percentage")) << s;
    // In US units the limit is 18 delta degF (10 K * 1.8, definition of the degree Fahrenheit).
    s = error_of(nums("STEAM.TURBINE.EFF.BUDGET.PT.PT", {1450, 932, 145, 482, 0.0025, 50, 0.0025, 1}, "US"));
    EXPECT_TRUE(has(s, "above the maximum 18 ")) << s;
    // A sanity limit on flows and powers catches a unit mix-up.
    s = error_of(nums("STEAM.HEATRATE.CYCLE", {100, 1000, 3400, 5e7}));
    EXPECT_TRUE(has(s, "P_gen")) << s;
    EXPECT_TRUE(has(s, "sanity limit")) << s;
}

// ============================================================================
// Zeros a blank cell leaves
// ============================================================================

TEST(InputBlankCells, ZeroIsRefusedWhereItIsNoPossibleValue) {
    // Calc passes a blank cell given for an argument as the number 0 (issue 11).
    std::string s = error_of(nums("STEAM.TURBINE.HOUT.PT", {10, 500, 1, 0}));
    EXPECT_TRUE(has(s, "eta = 0")) << s;
    EXPECT_TRUE(has(s, "a blank cell counts as 0")) << s;
    s = error_of(nums("STEAM.H.PT", {0, 100}));
    EXPECT_TRUE(has(s, "p = 0 MPa")) << s;
    EXPECT_TRUE(has(s, "a blank cell counts as 0")) << s;
    // An absolute temperature of 0 K (units K): below IF97's 273.15 K.
    s = error_of(nums("STEAM.H.PT", {1, 0}, "SI T=K"));
    EXPECT_TRUE(has(s, "T = 0 K")) << s;
    EXPECT_TRUE(has(s, "a blank cell counts as 0")) << s;
    s = error_of(nums("STEAM.PUMP.WORK.PT", {0.1, 40, 10, 0}));
    EXPECT_TRUE(has(s, "a blank cell counts as 0")) << s;
    s = error_of(nums("STEAM.FWH.EXTRACTION", {0, 590, 740, 2900, 640}));
    EXPECT_TRUE(has(s, "m_fw = 0 kg/s")) << s;
    EXPECT_TRUE(has(s, "a blank cell counts as 0")) << s;
    s = error_of(nums("STEAM.HEATRATE.NET", {100, 1000, 3400, 80000, 4000, 0}));
    EXPECT_TRUE(has(s, "eta_boiler = 0")) << s;
    s = error_of(nums("STEAM.BAUMANN.WET", {0.88, 0.95, 0.9, 0}));
    EXPECT_TRUE(has(s, "a = 0")) << s;
    // 0 where it is a possible value stays a number: 0 degC, no cascading drains, 0 uncertainty.
    EXPECT_EQ(nums("STEAM.H.PT", {1, 0}).kind, Value::Kind::Number);
    EXPECT_EQ(nums("STEAM.FWH.EXTRACTION", {100, 590, 740, 2900, 640, 0, 0}).kind, Value::Kind::Number);
    EXPECT_EQ(nums("STEAM.TURBINE.EFF.UNC.PT.PT", {10, 500, 1, 250, 0, 0, 0, 0}).kind, Value::Kind::Number);
    // A gauge pressure of 0 is the atmosphere: a possible reading.
    EXPECT_EQ(nums("STEAM.TSAT", {0}, "SI p=barg").kind, Value::Kind::Number);
}

// ============================================================================
// The header flag
// ============================================================================

TEST(InputHeaderFlag, AcceptsTrueFalseOneZeroAndBlankOnly) {
    const cat::Function& f = fn("STEAM.STATE.PT");
    auto with_header = [&](Value h) {
        return call(f, {Table::scalar(Value::of(1.0)), Table::scalar(Value::of(300.0)),
                        Table::scalar(Value::of_text("SI")), Table::scalar(std::move(h))});
    };
    EXPECT_EQ(with_header(Value::of(1)).rows, 2u);   // TRUE arrives as 1
    EXPECT_EQ(with_header(Value::of(0)).rows, 1u);   // FALSE arrives as 0
    EXPECT_EQ(with_header(Value{}).rows, 1u);        // left out between arguments
    EXPECT_EQ(with_header(Value::of(1)).cells[0].kind, Value::Kind::Text);
    for (Value bad : {Value::of(-1), Value::of(1e308), Value::of(1e-320), Value::of(2), Value::of_text("yes"),
                      Value::of_text("TRUE")}) {
        const Table t = with_header(bad);
        ASSERT_EQ(t.cells.size(), 1u);
        ASSERT_EQ(t.cells[0].kind, Value::Kind::Error);
        EXPECT_TRUE(has(t.cells[0].text, "header must be TRUE or FALSE (or 1 or 0, or left blank)")) << t.cells[0].text;
    }
}

// ============================================================================
// Sentences that name the right way out
// ============================================================================

TEST(InputSentences, SaturationLineNamesTheSaturatedFunctions) {
    const double p = 1.0;
    const double Ts_C = saturation_temperature(p) - 273.15;  // exactly on the line as Calc passes it
    std::string s = error_of(nums("STEAM.H.PT", {p, Ts_C}));
    if (!s.empty()) {  // the degC round trip may leave T a bit off the line; then H.PT is a number
        EXPECT_TRUE(has(s, "STEAM.HF.P(p)")) << s;
        EXPECT_TRUE(has(s, "STEAM.HG.P(p)")) << s;
    }
    // In K (no conversion), exactly on the line.
    const double Ts = saturation_temperature(p);
    s = error_of(nums("STEAM.H.PT", {p, Ts}, "SI T=K"));
    EXPECT_TRUE(has(s, "exactly on the saturation line")) << s;
    EXPECT_TRUE(has(s, "STEAM.HF.P(p) for saturated water or STEAM.HG.P(p) for saturated steam")) << s;
    s = error_of(nums("STEAM.CV.PT", {p, Ts}, "SI T=K"));
    EXPECT_TRUE(has(s, "STEAM.CVF.P(p)")) << s;
    s = error_of(nums("STEAM.KAPPA.PT", {p, Ts}, "SI T=K"));
    EXPECT_TRUE(has(s, "STEAM.KAPPA.PX(p; 0)")) << s;
    s = error_of(nums("STEAM.STATE.PT", {p, Ts}, "SI T=K"));
    EXPECT_TRUE(has(s, "STEAM.STATE.PX(p; 0)")) << s;
    // Equipment: the pump and the valve point at their (p,h) forms.
    s = error_of(nums("STEAM.PUMP.HOUT.PT", {p, Ts, 10, 0.8}, "SI T=K"));
    EXPECT_TRUE(has(s, "STEAM.PUMP.HOUT.PH")) << s;
    EXPECT_TRUE(has(s, "STEAM.HF.P(p_in)")) << s;
    s = error_of(nums("STEAM.VALVE.TOUT.PT", {p, Ts, 0.5}, "SI T=K"));
    EXPECT_TRUE(has(s, "STEAM.VALVE.TOUT.PH")) << s;
    s = error_of(nums("STEAM.TURBINE.HOUT.PT", {p, Ts, 0.1, 0.85}, "SI T=K"));
    EXPECT_TRUE(has(s, "STEAM.HG.P(p_in)")) << s;
}

TEST(InputSentences, DomeSuggestionsMatchTheProperty) {
    // cv, w and kappa of a wet state: their own saturated functions, not cp's.
    std::string s = run("EXPLAIN", {Value::of_text("CV.PX"), Value::of(1), Value::of(0.5)}).text;
    EXPECT_TRUE(has(s, "STEAM.CVF.P")) << s;
    EXPECT_FALSE(has(s, "CPF")) << s;
    s = run("EXPLAIN", {Value::of_text("W.PX"), Value::of(1), Value::of(0.5)}).text;
    EXPECT_TRUE(has(s, "STEAM.WF.P")) << s;
    s = run("EXPLAIN", {Value::of_text("KAPPA.PX"), Value::of(1), Value::of(0.5)}).text;
    EXPECT_TRUE(has(s, "STEAM.KAPPA.PX(p; 0)")) << s;
    s = run("EXPLAIN", {Value::of_text("CP.PX"), Value::of(1), Value::of(0.5)}).text;
    EXPECT_TRUE(has(s, "STEAM.CPF.P")) << s;
}

TEST(InputSentences, VeryLowPressureIsNotTheCriticalPoint) {
    for (const char* name : {"STEAM.CP.PT", "STEAM.CV.PT", "STEAM.W.PT", "STEAM.KAPPA.PT", "STEAM.MU.PT",
                             "STEAM.LAMBDA.PT", "STEAM.PR.PT"}) {
        const std::string s = error_of(nums(name, {1e-200, 300}));
        EXPECT_FALSE(has(s, "critical point")) << name << ": " << s;
        EXPECT_TRUE(has(s, "p = 1e-200 MPa")) << name << ": " << s;
    }
    // The critical point itself keeps its sentence (R7-97(2012): Tc = 647.096 K, pc = 22.064 MPa).
    EXPECT_TRUE(has(error_of(nums("STEAM.CP.PT", {22.064, 647.096}, "SI T=K")), "critical point"));
}

TEST(InputSentences, OutletQualityNamesTheRealReason) {
    // Below the triple-point pressure (611.657 Pa, R7-97(2012)) there is no liquid and no quality.
    std::string s = error_of(nums("STEAM.VALVE.XOUT.PT", {10, 500, 1e-320}));
    EXPECT_FALSE(has(s, "critical")) << s;
    EXPECT_TRUE(has(s, "triple-point pressure")) << s;
    EXPECT_TRUE(has(s, "p_out")) << s;
    // Above the critical pressure.
    s = error_of(nums("STEAM.TURBINE.XOUT.PT", {30, 600, 23, 0.9}));
    EXPECT_TRUE(has(s, "p_out = 23 MPa")) << s;
    EXPECT_TRUE(has(s, "critical pressure")) << s;
}

TEST(InputSentences, DenormalArgumentsAreNamed) {
    // 1e-320 (a denormal) where a division or a specific volume overflows: the sentence
    // names that argument, not an intermediate such as h_out = inf.
    std::string s = error_of(nums("STEAM.PUMP.HOUT.PT", {0.1, 40, 10, 1e-320}));
    EXPECT_TRUE(has(s, "eta = ")) << s;
    EXPECT_TRUE(has(s, "is so close to 0 that STEAM.PUMP.HOUT.PT has no finite result")) << s;
    s = error_of(nums("STEAM.V.PT", {1e-320, 300}));
    EXPECT_TRUE(has(s, "p = ")) << s;
    EXPECT_TRUE(has(s, "so close to 0")) << s;
}

TEST(InputSentences, PumpInletNearZeroCelsius) {
    // Water at 0 °C cools when compressed isentropically (negative expansion coefficient below
    // about 4 °C, common practice), so h(p_out, s_in) falls below IF97's 273.15 K.
    const std::string s = error_of(nums("STEAM.PUMP.HOUT.PT", {0.008, 0, 2.5, 0.8}));
    EXPECT_TRUE(has(s, "isentropic end point at p_out would be colder than 273.15 K")) << s;
    EXPECT_TRUE(has(s, "check T_in")) << s;
    EXPECT_EQ(nums("STEAM.PUMP.HOUT.PT", {0.008, 5, 2.5, 0.8}).kind, Value::Kind::Number);
}

TEST(InputSentences, TextArgumentsSayWhatTheyHold) {
    std::string s = error_of(run("CONVERT", {Value::of(1), Value::of(2), Value::of_text("MPa")}));
    EXPECT_TRUE(has(s, "the argument from must be a unit such as \"psig\" or \"kJ/kg\"")) << s;
    EXPECT_FALSE(has(s, "\"SI\"")) << s;
    s = error_of(run("CONVERT", {Value::of(1), Value::of_text("MPa"), Value::of(7)}));
    EXPECT_TRUE(has(s, "the argument to must be a unit")) << s;
    s = error_of(run("H.PT", {Value::of(1), Value::of(100), Value::of(3)}));
    EXPECT_TRUE(has(s, "the argument units must be a unit system such as \"SI\" or \"US\"")) << s;
}

// ============================================================================
// STEAM.EXPLAIN always answers with a sentence
// ============================================================================

TEST(InputExplain, OwnErrorsAreSentencesWithSuggestions) {
    Value v = run("EXPLAIN", {Value::of_text("abc"), Value::of(1)});
    ASSERT_EQ(v.kind, Value::Kind::Text);
    EXPECT_TRUE(has(v.text, "there is no function \"abc\"")) << v.text;
    v = run("EXPLAIN", {Value::of_text("PUMP.HOUT.TP"), Value::of(1)});
    ASSERT_EQ(v.kind, Value::Kind::Text);
    EXPECT_TRUE(has(v.text, "STEAM.PUMP.HOUT.PT")) << v.text;  // edit distance 2
    v = run("EXPLAIN", {Value::of_text("H.PTT"), Value::of(1)});
    EXPECT_TRUE(has(v.text, "the closest names are STEAM.H.PT")) << v.text;
    v = run("EXPLAIN", {Value::of(3), Value::of(1)});
    ASSERT_EQ(v.kind, Value::Kind::Text);
    EXPECT_TRUE(has(v.text, "must be a function name such as \"H.PT\", not the number 3")) << v.text;
    v = run("EXPLAIN", {});
    EXPECT_EQ(v.kind, Value::Kind::Text);
    v = run("EXPLAIN", {Value::of_text("")});
    EXPECT_EQ(v.kind, Value::Kind::Text);
    v = run("EXPLAIN", {Value::of_text("EXPLAIN")});
    EXPECT_EQ(v.kind, Value::Kind::Text);
    Table range;
    range.rows = range.cols = 2;
    range.cells.assign(4, Value::of_text("H.PT"));
    const Table r = call(fn("STEAM.EXPLAIN"), {range});
    ASSERT_EQ(r.cells.size(), 1u);
    EXPECT_EQ(r.cells[0].kind, Value::Kind::Text);
    // The explanation of a range refusal is the call's own sentence.
    v = run("EXPLAIN", {Value::of_text("TURBINE.HOUT.PT"), Value::of(10), Value::of(500), Value::of(1), Value::of(0)});
    EXPECT_TRUE(has(v.text, "a blank cell counts as 0")) << v.text;
}

// ============================================================================
// STEAM.UNITS.SPELL
// ============================================================================

TEST(InputUnitsSpell, SpellsEveryQuantityAndTheBarometricPressure) {
    Value v = run("UNITS.SPELL", {Value::of_text("psig")});
    ASSERT_EQ(v.kind, Value::Kind::Text) << v.text;
    EXPECT_TRUE(has(v.text, "\"psig\" means SI p=psig")) << v.text;
    EXPECT_TRUE(has(v.text, "pressure psig (gauge")) << v.text;
    // ISO 2533 standard atmosphere 101.325 kPa = 14.6959 psia (NIST SP 811 psi factor).
    EXPECT_TRUE(has(v.text, "14.6959 psia = 0.101325 MPa")) << v.text;
    EXPECT_TRUE(has(v.text, "temperature °C")) << v.text;
    EXPECT_TRUE(has(v.text, "specific energy kJ/kg")) << v.text;
    v = run("UNITS.SPELL", {Value::of_text("US p=psig patm=14.2psia")});
    EXPECT_TRUE(has(v.text, "14.2 psia")) << v.text;
    EXPECT_TRUE(has(v.text, "temperature °F")) << v.text;
    EXPECT_TRUE(has(v.text, "mass flow lbm/h")) << v.text;
    // The flow meters' quantities too (US: inH2O at 60 degF, inches; docs/flow.md).
    EXPECT_TRUE(has(v.text, "differential pressure inH")) << v.text;
    EXPECT_TRUE(has(v.text, "length in")) << v.text;
    EXPECT_FALSE(has(v.text, "percent")) << v.text;
    v = run("UNITS.SPELL", {Value::of_text("SI p=barg patm=0.0985MPa")});
    EXPECT_TRUE(has(v.text, "0.985 bar = 0.0985 MPa")) << v.text;
    v = run("UNITS.SPELL", {});
    EXPECT_TRUE(has(v.text, "An empty units text means SI")) << v.text;
    v = run("UNITS.SPELL", {Value::of(0)});  // a blank units cell
    EXPECT_TRUE(has(v.text, "means SI")) << v.text;
    v = run("UNITS.SPELL", {Value::of_text("bogus")});
    EXPECT_EQ(v.kind, Value::Kind::Error);
    EXPECT_TRUE(has(v.text, "bogus")) << v.text;
    // The Wizard text of the units argument says what a bare unit means, within 200 characters.
    const cat::Function& h = fn("STEAM.H.PT");
    const std::string d = h.args[h.units_index()].description;
    EXPECT_TRUE(has(d, "a bare unit (\"psig\") means SI with it")) << d;
    EXPECT_LE(d.size(), 200u) << d;
}

}  // namespace
