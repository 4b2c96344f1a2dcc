// SPDX-License-Identifier: MPL-2.0
// Tests of the units layer: factors, gauge pressures, temperature
// differences, unit-text parsing and error messages.
#include <gtest/gtest.h>

#include <cmath>
#include <functional>
#include <string>

#include "isentra/base/error.hpp"
#include "isentra/units/units.hpp"

using isentra::Error;
using isentra::ErrorCode;
using isentra::Quantity;
namespace u = isentra::units;

namespace {

// |actual - printed| within half a unit of the last printed digit.
// `digits` = significant digits of the printed factor.
void expect_printed(double actual, double printed, int digits, const char* what) {
    const double e = std::floor(std::log10(std::fabs(printed)));
    const double half_ulp_printed = 0.5 * std::pow(10.0, e - (digits - 1));
    EXPECT_LE(std::fabs(actual - printed), half_ulp_printed * (1.0 + 1e-9))
        << what << ": " << actual << " vs printed " << printed;
}

// Equal to a few double roundings.
void expect_exact(double actual, double exact, const char* what) {
    EXPECT_NEAR(actual, exact, 4.0 * std::fabs(exact) * 2.220446049250313e-16) << what;
}

std::string what_of(const std::function<void()>& f) {
    try {
        f();
    } catch (const Error& e) {
        return e.what();
    }
    return "(no error)";
}

ErrorCode code_of(const std::function<void()>& f) {
    try {
        f();
    } catch (const Error& e) {
        return e.code();
    }
    return ErrorCode::NoConvergence;  // marker: nothing thrown
}

bool contains(const std::string& s, const std::string& part) { return s.find(part) != std::string::npos; }

}  // namespace

// ---------------------------------------------------------------------------
// Factors against NIST SP 811 (2008) Appendix B.8. The printed 7-digit factors
// below were quoted from memory (the PDF is not in the repository); each is
// also checked against the exact value computed from the definitions
// (international yard and pound 1959: lb = 0.45359237 kg, ft = 0.3048 m;
// Btu_IT = 1055.05585262 J; g_n = 9.80665 m/s2; exact decimals computed with
// rational arithmetic from those definitions).

TEST(UnitsFactors, Pressure) {
    // NIST SP 811 (2008) B.8: pound-force per square inch (psi) -> Pa 6.894757 E+03
    expect_printed(u::convert(1.0, "psia", "Pa"), 6.894757e3, 7, "psi");
    expect_exact(u::convert(1.0, "psia", "Pa"), 6894.757293168361, "psi exact from lbf/in2");  // from the definitions
    // NIST SP 811 (2008) B.8: bar -> Pa 1.0 E+05 (exact)
    expect_exact(u::convert(1.0, "bar", "Pa"), 1.0e5, "bar");
    // NIST SP 811 (2008) B.8: atmosphere, standard (atm) -> Pa 1.01325 E+05 (exact)
    expect_exact(u::convert(1.0, "atm", "Pa"), 101325.0, "atm");
    // NIST SP 811 (2008) B.8: kilogram-force per square centimeter -> Pa 9.80665 E+04 (exact)
    expect_exact(u::convert(1.0, "kgf/cm2", "Pa"), 98066.5, "kgf/cm2");
    // NIST SP 811 (2008) B.8: inch of mercury, conventional (inHg) -> Pa 3.386389 E+03
    expect_printed(u::convert(1.0, "inHg", "Pa"), 3.386389e3, 7, "inHg");
    expect_exact(u::convert(1.0, "inHg", "Pa"), 3386.388640341, "inHg from 13595.1 kg/m3 * g_n * 0.0254 m");  // from the definitions
    // NIST SP 811 (2008) B.8: millimeter of mercury, conventional (mmHg) -> Pa 1.333224 E+02
    expect_printed(u::convert(1.0, "mmHg", "Pa"), 1.333224e2, 7, "mmHg");
    expect_exact(u::convert(1.0, "mmHg", "Pa"), 133.322387415, "mmHg from 13595.1 kg/m3 * g_n * 1 mm");  // from the definitions
    // NIST SP 811 (2008) B.8: bar -> Pa 1.0 E+05 (exact), with the SI prefix milli (exact)
    expect_exact(u::convert(1.0, "mbar", "Pa"), 100.0, "mbar");
    // absolute spellings plant people write for condenser pressure (common practice)
    for (const char* a : {"mbar(a)", "mbara", "mbar abs"}) expect_exact(u::convert(1.0, a, "Pa"), 100.0, a);
    for (const char* a : {"inHgA", "inHg(a)", "inHg abs", "in HgA"})
        expect_exact(u::convert(1.0, a, "Pa"), 3386.388640341, a);
    for (const char* a : {"mmHgA", "mmHg(a)", "mmHg abs"}) expect_exact(u::convert(1.0, a, "Pa"), 133.322387415, a);
    // SI prefixes (exact by definition)
    expect_exact(u::convert(1.0, "MPa", "kPa"), 1000.0, "MPa/kPa");
    expect_exact(u::convert(1.0, "kPa", "Pa"), 1000.0, "kPa/Pa");
    expect_exact(u::convert(1.0, "MPa", "bar"), 10.0, "MPa/bar");
    // 1 atm in psi: 101325 / 6894.757293168361 = 14.695948775513449 (from the definitions)
    expect_exact(u::convert(1.0, "atm", "psia"), 14.695948775513449, "atm in psia");
}

TEST(UnitsFactors, Temperature) {
    // NIST SP 811 (2008) B.8: T/K = (t/degF + 459.67)/1.8 ; t/degC = (t/degF - 32)/1.8 ; T/K = (T/degR)/1.8
    expect_exact(u::convert(32.0, "degF", "K"), 273.15, "32 degF");
    expect_exact(u::convert(212.0, "degF", "K"), 373.15, "212 degF");
    EXPECT_NEAR(u::convert(-459.67, "degF", "K"), 0.0, 1e-12);
    EXPECT_EQ(u::convert(100.0, "degC", "degF"), 212.0);  // t/degF = 1.8 t/degC + 32, NIST SP 811 B.8
    EXPECT_EQ(u::convert(212.0, "degF", "degC"), 100.0);
    EXPECT_EQ(u::convert(-40.0, "degC", "degF"), -40.0);  // common practice: the scales cross at -40
    EXPECT_EQ(u::convert(0.0, "degC", "K"), 273.15);
    EXPECT_EQ(u::convert(373.15, "K", "degC"), 100.0);
    expect_exact(u::convert(491.67, "degR", "K"), 273.15, "491.67 degR");
    expect_exact(u::convert(671.67, "degR", "degF"), 212.0, "degR to degF");
    // NIST SP 811 (2008) B.8: degree Fahrenheit / Rankine as an interval -> K 5.555556 E-01
    expect_printed(u::convert(1.0, "delta_degF", "delta_K"), 5.555556e-1, 7, "delta degF");
    expect_exact(u::convert(1.0, "delta_degR", "delta_K"), 5.0 / 9.0, "delta degR");
    expect_exact(u::convert(1.0, "delta_degC", "delta_K"), 1.0, "delta degC");
}

TEST(UnitsFactors, EnergyEntropy) {
    // NIST SP 811 (2008) B.8: British thermal unit_IT per pound (Btu_IT/lb) -> J/kg 2.326 E+03 (exact)
    expect_exact(u::convert(1.0, "Btu/lbm", "J/kg"), 2326.0, "Btu/lb");
    expect_exact(u::convert(1.0, "Btu/lbm", "kJ/kg"), 2.326, "Btu/lb");
    // NIST SP 811 (2008) B.8: calorie_IT per gram (cal_IT/g) -> J/kg 4.1868 E+03 (exact)
    expect_exact(u::convert(1.0, "kcal/kg", "J/kg"), 4186.8, "kcal/kg");
    // NIST SP 811 (2008) B.8: Btu_IT per pound degree Fahrenheit -> J/(kg K) 4.1868 E+03 (exact)
    expect_exact(u::convert(1.0, "Btu/(lbm degF)", "J/(kg K)"), 4186.8, "Btu/(lb F)");
    expect_exact(u::convert(1.0, "Btu/(lbm degF)", "kJ/(kg K)"), 4.1868, "Btu/(lb F)");
    expect_exact(u::convert(1.0, "Btu/lbmR", "kJ/kgK"), 4.1868, "Btu/(lb R)");
}

TEST(UnitsFactors, VolumeDensitySpeed) {
    // NIST SP 811 (2008) B.8: cubic foot per pound (ft3/lb) -> m3/kg 6.242796 E-02
    expect_printed(u::convert(1.0, "ft3/lbm", "m3/kg"), 6.242796e-2, 7, "ft3/lb");
    expect_exact(u::convert(1.0, "ft3/lbm", "m3/kg"), 0.062427960576144612, "ft3/lb");  // from the definitions
    // NIST SP 811 (2008) B.8: liter -> m3 1.0 E-03 (exact)
    expect_exact(u::convert(1.0, "L/kg", "m3/kg"), 1.0e-3, "L/kg");
    // NIST SP 811 (2008) B.8: pound per cubic foot (lb/ft3) -> kg/m3 1.601846 E+01
    expect_printed(u::convert(1.0, "lbm/ft3", "kg/m3"), 1.601846e1, 7, "lb/ft3");
    expect_exact(u::convert(1.0, "lbm/ft3", "kg/m3"), 16.018463373960140, "lb/ft3");  // from the definitions
    // NIST SP 811 (2008) B.8: gram per cubic centimeter -> kg/m3 1.0 E+03 (exact)
    expect_exact(u::convert(1.0, "g/cm3", "kg/m3"), 1000.0, "g/cm3");
    // NIST SP 811 (2008) B.8: foot per second -> m/s 3.048 E-01 (exact)
    expect_exact(u::convert(1.0, "ft/s", "m/s"), 0.3048, "ft/s");
}

TEST(UnitsFactors, Transport) {
    // NIST SP 811 (2008) B.8: centipoise (cP) -> Pa s 1.0 E-03 (exact)
    expect_exact(u::convert(1.0, "cP", "Pa s"), 1.0e-3, "cP");
    expect_exact(u::convert(1.0, "mPa s", "Pa s"), 1.0e-3, "mPa s");
    expect_exact(u::convert(1.0, "uPa s", "Pa s"), 1.0e-6, "uPa s");
    // NIST SP 811 (2008) B.8: pound per foot hour [lb/(ft h)] -> Pa s 4.133789 E-04
    expect_printed(u::convert(1.0, "lbm/(ft h)", "Pa s"), 4.133789e-4, 7, "lb/(ft h)");
    expect_exact(u::convert(1.0, "lbm/(ft h)", "Pa s"), 4.1337887321376495e-4, "lb/(ft h)");  // from the definitions
    // NIST SP 811 (2008) B.8: pound per foot second [lb/(ft s)] -> Pa s 1.488164 E+00
    expect_printed(u::convert(1.0, "lbm/(ft s)", "Pa s"), 1.488164, 7, "lb/(ft s)");
    // NIST SP 811 (2008) B.8: Btu_IT ft/(h ft2 degF) -> W/(m K) 1.730735 E+00
    expect_printed(u::convert(1.0, "Btu/(h ft degF)", "W/(m K)"), 1.730735, 7, "Btu/(h ft F)");
    expect_exact(u::convert(1.0, "Btu/(h ft degF)", "W/(m K)"), 1.7307346663713911, "Btu/(h ft F)");  // from the definitions
    expect_exact(u::convert(1.0, "mW/(m K)", "W/(m K)"), 1.0e-3, "mW/(m K)");
    // NIST SP 811 (2008) B.8: pound-force per foot (lbf/ft) -> N/m 1.459390 E+01
    expect_printed(u::convert(1.0, "lbf/ft", "N/m"), 1.459390e1, 7, "lbf/ft");
    expect_exact(u::convert(1.0, "lbf/ft", "N/m"), 14.593902937206365, "lbf/ft");  // from the definitions
    expect_exact(u::convert(1.0, "mN/m", "N/m"), 1.0e-3, "mN/m");
    // NIST SP 811 (2008) B.8: centistokes (cSt) -> m2/s 1.0 E-06 (exact)
    expect_exact(u::convert(1.0, "cSt", "m2/s"), 1.0e-6, "cSt");
    expect_exact(u::convert(1.0, "mm2/s", "m2/s"), 1.0e-6, "mm2/s");
    // NIST SP 811 (2008) B.8: square foot per hour (ft2/h) -> m2/s 2.58064 E-05 (exact)
    expect_exact(u::convert(1.0, "ft2/h", "m2/s"), 2.58064e-5, "ft2/h");
    // NIST SP 811 (2008) B.8: square foot per second (ft2/s) -> m2/s 9.290304 E-02 (exact)
    expect_exact(u::convert(1.0, "ft2/s", "m2/s"), 9.290304e-2, "ft2/s");
}

TEST(UnitsFactors, FlowPowerHeatRate) {
    // NIST SP 811 (2008) B.8: pound per hour (lb/h) -> kg/s 1.259979 E-04
    expect_printed(u::convert(1.0, "lbm/h", "kg/s"), 1.259979e-4, 7, "lb/h");
    expect_exact(u::convert(1.0, "lbm/h", "kg/s"), 1.2599788055555556e-4, "lb/h");  // from the definitions
    expect_exact(u::convert(1.0, "klbm/h", "kg/h"), 453.59237, "klb/h");            // yard and pound 1959, exact
    expect_exact(u::convert(3.6, "t/h", "kg/s"), 1.0, "t/h");                       // NIST SP 811 B.8: ton, metric = 1000 kg
    expect_exact(u::convert(3600.0, "kg/h", "kg/s"), 1.0, "kg/h");
    // NIST SP 811 (2008) B.8: Btu_IT per hour (Btu_IT/h) -> W 2.930711 E-01
    expect_printed(u::convert(1.0, "Btu/h", "W"), 2.930711e-1, 7, "Btu/h");
    expect_exact(u::convert(1.0, "Btu/h", "W"), 0.29307107017222222, "Btu/h");  // from the definitions
    // NIST SP 811 (2008) B.8: horsepower (550 ft lbf/s) -> W 7.456999 E+02
    expect_printed(u::convert(1.0, "hp", "W"), 7.456999e2, 7, "hp");
    expect_exact(u::convert(1.0, "hp", "W"), 745.69987158227022, "hp");  // from the definitions
    expect_exact(u::convert(1.0, "MW", "kW"), 1000.0, "MW");
    // NIST SP 811 (2008) B.8: British thermal unit_IT -> J 1.055056 E+03; exact 1055.05585262
    expect_printed(u::convert(1.0, "Btu/kWh", "kJ/kWh"), 1.055056, 7, "Btu/kWh");
    expect_exact(u::convert(1.0, "Btu/kWh", "kJ/kWh"), 1.05505585262, "Btu/kWh");
    expect_exact(u::convert(1.0, "kcal/kWh", "kJ/kWh"), 4.1868, "kcal/kWh");  // NIST SP 811 B.8: kcal_IT = 4186.8 J
}

TEST(UnitsFactors, PercentAndFraction) {
    EXPECT_DOUBLE_EQ(u::convert(85.0, "%", "fraction"), 0.85);  // common practice
    EXPECT_DOUBLE_EQ(u::convert(0.85, "fraction", "%"), 85.0);
    const auto spec = u::UnitSpec::parse("SI pct=fraction");
    EXPECT_DOUBLE_EQ(spec.to_core(Quantity::Percent, 0.85), 85.0);
    EXPECT_DOUBLE_EQ(spec.from_core(Quantity::Percent, 85.0), 0.85);
    EXPECT_EQ(u::UnitSpec().from_core(Quantity::None, 0.5), 0.5);
}

// ---------------------------------------------------------------------------

TEST(UnitsRoundTrip, EveryUnit) {
    const double xs[] = {0.0, 1.0, -3.5, 0.1, 273.15, 1.0e-7, 12345.678, 22.064};
    for (const auto& info : u::known_units()) {
        if (info.quantity == Quantity::None) {
            for (double x : xs) {
                const double c = u::convert(x, info.symbol, "fraction");
                EXPECT_NEAR(u::convert(c, "fraction", info.symbol), x, 1e-13 * (1.0 + std::fabs(x))) << info.symbol;
            }
            continue;
        }
        // Override by its canonical key through the spec.
        const std::string key = [&] {
            switch (info.quantity) {
            case Quantity::Pressure: return "p";
            case Quantity::Temperature: return "T";
            case Quantity::TemperatureDifference: return "dT";
            case Quantity::SpecificEnergy: return "h";
            case Quantity::SpecificEntropy: return "s";
            case Quantity::SpecificVolume: return "v";
            case Quantity::Density: return "rho";
            case Quantity::Speed: return "w";
            case Quantity::DynamicViscosity: return "mu";
            case Quantity::ThermalConductivity: return "lambda";
            case Quantity::SurfaceTension: return "sigma";
            case Quantity::KinematicViscosity: return "nu";
            case Quantity::ThermalDiffusivity: return "a";
            case Quantity::MassFlow: return "m";
            case Quantity::Power: return "P";
            case Quantity::HeatRate: return "hr";
            case Quantity::Percent: return "pct";
            case Quantity::DifferentialPressure: return "dp";
            case Quantity::Length: return "L";
            case Quantity::LinearExpansion: return "exp";
            default: return "?";
            }
        }();
        const std::string text = "SI " + key + "=" + info.symbol;
        const auto spec = u::UnitSpec::parse(text);
        EXPECT_EQ(spec.unit_text(info.quantity), info.symbol) << text;
        for (double x : xs) {
            // a few roundings; offsets (temperatures, gauge pressures) add an absolute part
            const double tol = 2e-15 * std::fabs(x) + (info.quantity == Quantity::Temperature ? 1e-12 : 0.0) +
                               (spec.is_gauge(info.quantity) ? 1e-13 : 0.0);
            const double back = spec.from_core(info.quantity, spec.to_core(info.quantity, x));
            EXPECT_NEAR(back, x, tol) << text << " x=" << x;
            const double core = spec.to_core(info.quantity, spec.from_core(info.quantity, x));
            EXPECT_NEAR(core, x, tol) << text << " core x=" << x;
        }
        // convert() to itself is the identity.
        EXPECT_EQ(u::convert(2.5, info.symbol, info.symbol), 2.5) << info.symbol;
        // The display symbol is accepted back as the same unit.
        const std::string disp = spec.symbol(info.quantity);
        if (!disp.empty()) {
            EXPECT_EQ(u::UnitSpec::parse("SI " + key + "=" + disp).unit_text(info.quantity), info.symbol) << disp;
        }
        // The canonical name parses back to the same spec.
        const auto again = u::UnitSpec::parse(spec.name());
        EXPECT_EQ(again.name(), spec.name()) << text;
        EXPECT_EQ(again.unit_text(info.quantity), info.symbol) << text;
    }
}

TEST(UnitsRoundTrip, ConvertThroughAnotherUnit) {
    EXPECT_NEAR(u::convert(u::convert(1234.5, "psia", "kPa"), "kPa", "psia"), 1234.5, 1e-11);
    EXPECT_NEAR(u::convert(u::convert(1000.0, "degF", "K"), "K", "degF"), 1000.0, 1e-11);
    EXPECT_NEAR(u::convert(u::convert(1400.0, "Btu/lbm", "kJ/kg"), "kJ/kg", "Btu/lbm"), 1400.0, 1e-11);
}

// ---------------------------------------------------------------------------

TEST(UnitsGauge, StandardAtmosphere) {
    // ISO 2533 / NIST SP 811 (2008) B.8: standard atmosphere 101.325 kPa
    EXPECT_DOUBLE_EQ(u::standard_atmosphere_MPa, 0.101325);
    const auto spec = u::UnitSpec::parse("US p=psig");
    EXPECT_TRUE(spec.is_gauge(Quantity::Pressure));
    EXPECT_DOUBLE_EQ(spec.to_core(Quantity::Pressure, 0.0), 0.101325);
    EXPECT_NEAR(spec.from_core(Quantity::Pressure, 0.101325), 0.0, 1e-15);
    // 100 psig = 100 psi + 14.695948775513449 psi (from the definitions)
    EXPECT_NEAR(spec.to_core(Quantity::Pressure, 100.0), (100.0 + 14.695948775513449) * 6894.757293168361e-6, 1e-15);
    EXPECT_NEAR(u::convert(0.0, "barg", "bar"), 1.01325, 1e-15);
    EXPECT_NEAR(u::convert(1.01325, "bar", "barg"), 0.0, 1e-15);
    EXPECT_NEAR(u::convert(0.0, "kPag", "kPa"), 101.325, 1e-12);
    EXPECT_NEAR(u::convert(0.0, "MPag", "MPa"), 0.101325, 1e-16);
    // gauge to gauge: 1 bar = 14.503773773020923 psi (from the definitions), same atmosphere on both sides
    EXPECT_NEAR(u::convert(1.0, "barg", "psig"), 14.503773773020923, 1e-12);
    EXPECT_NEAR(u::convert(0.0, "psig", "psia"), 14.695948775513449, 1e-12);
}

TEST(UnitsGauge, GivenAtmosphere) {
    const double psi_MPa = 6894.757293168361e-6;  // from the definitions
    for (const char* text : {"US p=psig patm=14.2psia", "US p=psig patm=14.2 psia", "US p=psig, patm = 14.2 psia",
                             "US p=psig patm=14.2", "us patm=14.2 p=psig"}) {
        const auto spec = u::UnitSpec::parse(text);
        EXPECT_NEAR(spec.patm_MPa(), 14.2 * psi_MPa, 1e-16) << text;
        EXPECT_NEAR(spec.to_core(Quantity::Pressure, 0.0), 14.2 * psi_MPa, 1e-16) << text;
        EXPECT_NEAR(spec.to_core(Quantity::Pressure, 85.8), 100.0 * psi_MPa, 1e-14) << text;
        EXPECT_NEAR(spec.from_core(Quantity::Pressure, 100.0 * psi_MPa), 85.8, 1e-12) << text;
        EXPECT_EQ(spec.name(), "US p=psig patm=14.2psia") << text;
    }
    const auto si = u::UnitSpec::parse("SI p=barg patm=0.0985MPa");
    EXPECT_DOUBLE_EQ(si.patm_MPa(), 0.0985);
    EXPECT_NEAR(si.to_core(Quantity::Pressure, 1.0), 0.1985, 1e-15);
    // a bare patm number is read in the absolute counterpart of the pressure unit
    EXPECT_DOUBLE_EQ(u::UnitSpec::parse("SI p=barg patm=0.985").patm_MPa(), 0.0985);
    EXPECT_DOUBLE_EQ(u::UnitSpec::parse("KPA p=kPag patm=98.5").patm_MPa(), 0.0985);
    // convert() with a given atmosphere
    EXPECT_NEAR(u::convert(1.0, "barg", "MPa", 0.0985), 0.1985, 1e-15);
    EXPECT_NEAR(u::convert(0.1985, "MPa", "barg", 0.0985), 1.0, 1e-14);
    // errors
    EXPECT_EQ(code_of([] { u::UnitSpec::parse("US p=psig patm=1psig"); }), ErrorCode::InvalidArgument);
    EXPECT_EQ(code_of([] { u::UnitSpec::parse("US p=psig patm=-3psia"); }), ErrorCode::InvalidArgument);
    EXPECT_EQ(code_of([] { u::UnitSpec::parse("US patm=psia"); }), ErrorCode::InvalidArgument);
    EXPECT_EQ(code_of([] { u::UnitSpec::parse("US patm=14.2furlong"); }), ErrorCode::UnknownUnit);
    EXPECT_EQ(code_of([] { u::convert(1.0, "psig", "psia", -1.0); }), ErrorCode::InvalidArgument);
    EXPECT_EQ(code_of([] { u::convert(1.0, "psig", "psia", std::nan("")); }), ErrorCode::InvalidArgument);
    // A decimal comma inside the unit text (typed under a decimal-comma locale)
    // reads like a decimal point (common practice).
    EXPECT_EQ(u::UnitSpec::parse("SI p=barg patm=0,985bar").patm_MPa(),
              u::UnitSpec::parse("SI p=barg patm=0.985bar").patm_MPa());
    EXPECT_EQ(u::UnitSpec::parse("US,p=psig,patm=14,2psia").patm_MPa(),
              u::UnitSpec::parse("US p=psig patm=14.2psia").patm_MPa());
}

// ---------------------------------------------------------------------------

TEST(UnitsTemperatureDifference, VersusAbsolute) {
    const auto us = u::UnitSpec::parse("US");
    // A difference converts by the factor only (NIST SP 811 (2008) B.8: interval 1 degF = 5/9 K)
    EXPECT_NEAR(us.from_core(Quantity::TemperatureDifference, 10.0), 18.0, 1e-13);
    EXPECT_NEAR(us.to_core(Quantity::TemperatureDifference, 18.0), 10.0, 1e-13);
    // An absolute temperature applies the offset
    EXPECT_NEAR(us.from_core(Quantity::Temperature, 10.0), -441.67, 1e-12);
    EXPECT_NEAR(us.from_core(Quantity::Temperature, 373.15), 212.0, 1e-12);
    const auto si = u::UnitSpec();
    EXPECT_EQ(si.from_core(Quantity::TemperatureDifference, 10.0), 10.0);
    EXPECT_EQ(si.from_core(Quantity::Temperature, 373.15), 100.0);
    EXPECT_EQ(si.symbol(Quantity::TemperatureDifference), "K");
    EXPECT_EQ(us.symbol(Quantity::TemperatureDifference), "Δ°F");
    // convert(): plain symbols are absolute; a delta_ unit on either side makes both differences
    EXPECT_NEAR(u::convert(10.0, "K", "degF"), -441.67, 1e-12);
    EXPECT_NEAR(u::convert(10.0, "delta_K", "delta_degF"), 18.0, 1e-13);
    EXPECT_NEAR(u::convert(18.0, "degF", "delta_K"), 10.0, 1e-13);
    EXPECT_NEAR(u::convert(10.0, "delta_degC", "degF"), 18.0, 1e-13);
    EXPECT_NEAR(u::convert(10.0, "Δ°F", "ΔK"), 50.0 / 9.0, 1e-14);
    EXPECT_NEAR(u::convert(10.0, "delta degR", "delta_K"), 50.0 / 9.0, 1e-14);
    // dT override
    const auto sidf = u::UnitSpec::parse("SI dT=degF");
    EXPECT_EQ(sidf.unit_text(Quantity::TemperatureDifference), "delta_degF");
    EXPECT_EQ(sidf.unit_text(Quantity::Temperature), "degC");
}

// ---------------------------------------------------------------------------

TEST(UnitsParse, Systems) {
    const auto si = u::UnitSpec::parse("SI");
    EXPECT_EQ(si.name(), "SI");
    EXPECT_EQ(si.symbol(Quantity::Pressure), "MPa");
    EXPECT_EQ(si.symbol(Quantity::Temperature), "°C");
    EXPECT_EQ(si.symbol(Quantity::TemperatureDifference), "K");
    EXPECT_EQ(si.symbol(Quantity::SpecificEnergy), "kJ/kg");
    EXPECT_EQ(si.symbol(Quantity::SpecificEntropy), "kJ/(kg·K)");
    EXPECT_EQ(si.symbol(Quantity::SpecificVolume), "m³/kg");
    EXPECT_EQ(si.symbol(Quantity::Density), "kg/m³");
    EXPECT_EQ(si.symbol(Quantity::Speed), "m/s");
    EXPECT_EQ(si.symbol(Quantity::DynamicViscosity), "Pa·s");
    EXPECT_EQ(si.symbol(Quantity::ThermalConductivity), "W/(m·K)");
    EXPECT_EQ(si.symbol(Quantity::SurfaceTension), "N/m");
    EXPECT_EQ(si.symbol(Quantity::KinematicViscosity), "m²/s");
    EXPECT_EQ(si.symbol(Quantity::ThermalDiffusivity), "m²/s");
    EXPECT_EQ(si.symbol(Quantity::MassFlow), "kg/s");
    EXPECT_EQ(si.symbol(Quantity::Power), "kW");
    EXPECT_EQ(si.symbol(Quantity::HeatRate), "kJ/kWh");
    EXPECT_EQ(si.symbol(Quantity::Percent), "%");
    EXPECT_EQ(si.symbol(Quantity::None), "");
    EXPECT_EQ(si.symbol(Quantity::Text), "");

    const auto us = u::UnitSpec::parse("US");
    EXPECT_EQ(us.name(), "US");
    EXPECT_EQ(us.unit_text(Quantity::Pressure), "psia");
    EXPECT_EQ(us.unit_text(Quantity::Temperature), "degF");
    EXPECT_EQ(us.symbol(Quantity::Temperature), "°F");
    EXPECT_EQ(us.unit_text(Quantity::TemperatureDifference), "delta_degF");
    EXPECT_EQ(us.unit_text(Quantity::SpecificEnergy), "Btu/lbm");
    EXPECT_EQ(us.unit_text(Quantity::SpecificEntropy), "Btu/(lbm degF)");
    EXPECT_EQ(us.unit_text(Quantity::SpecificVolume), "ft3/lbm");
    EXPECT_EQ(us.unit_text(Quantity::Density), "lbm/ft3");
    EXPECT_EQ(us.unit_text(Quantity::Speed), "ft/s");
    EXPECT_EQ(us.unit_text(Quantity::DynamicViscosity), "lbm/(ft h)");
    EXPECT_EQ(us.unit_text(Quantity::ThermalConductivity), "Btu/(h ft degF)");
    EXPECT_EQ(us.unit_text(Quantity::SurfaceTension), "lbf/ft");
    EXPECT_EQ(us.unit_text(Quantity::KinematicViscosity), "ft2/h");
    EXPECT_EQ(us.unit_text(Quantity::ThermalDiffusivity), "ft2/h");
    EXPECT_EQ(us.unit_text(Quantity::MassFlow), "lbm/h");
    EXPECT_EQ(us.unit_text(Quantity::Power), "kW");
    EXPECT_EQ(us.unit_text(Quantity::HeatRate), "Btu/kWh");

    const auto bar = u::UnitSpec::parse("BAR");
    EXPECT_EQ(bar.name(), "BAR");
    EXPECT_EQ(bar.unit_text(Quantity::Pressure), "bar");
    EXPECT_EQ(bar.unit_text(Quantity::Temperature), "degC");
    EXPECT_EQ(bar.unit_text(Quantity::MassFlow), "kg/s");
    EXPECT_EQ(bar.unit_text(Quantity::SpecificEnergy), "kJ/kg");
    const auto kpa = u::UnitSpec::parse("KPA");
    EXPECT_EQ(kpa.name(), "KPA");
    EXPECT_EQ(kpa.unit_text(Quantity::Pressure), "kPa");
    EXPECT_EQ(kpa.unit_text(Quantity::Temperature), "degC");
    const auto k = u::UnitSpec::parse("K");
    EXPECT_EQ(k.name(), "K");
    EXPECT_EQ(k.unit_text(Quantity::Pressure), "MPa");
    EXPECT_EQ(k.unit_text(Quantity::Temperature), "K");
    EXPECT_EQ(u::UnitSpec::parse("SI-K").name(), "K");
    // the K system is the core units: to_core is the identity
    for (int q = 0; q < u::quantity_count; ++q)
        EXPECT_EQ(k.to_core(static_cast<Quantity>(q), 123.456), 123.456) << q;

    // default and empty text
    EXPECT_EQ(u::UnitSpec().name(), "SI");
    EXPECT_EQ(u::UnitSpec::parse("").name(), "SI");
    EXPECT_EQ(u::UnitSpec::parse("   ").name(), "SI");
    EXPECT_EQ(u::UnitSpec::parse("").unit_text(Quantity::Pressure), "MPa");

    // case-insensitive system names
    for (const char* t : {"us", "Us", "uS"}) EXPECT_EQ(u::UnitSpec::parse(t).name(), "US") << t;
    for (const char* t : {"si", "Si"}) EXPECT_EQ(u::UnitSpec::parse(t).name(), "SI") << t;
    for (const char* t : {"bar", "Bar"}) EXPECT_EQ(u::UnitSpec::parse(t).name(), "BAR") << t;
    for (const char* t : {"kpa", "kPa", "Kpa"}) EXPECT_EQ(u::UnitSpec::parse(t).name(), "KPA") << t;
    for (const char* t : {"k", "si-k", "Si-K"}) EXPECT_EQ(u::UnitSpec::parse(t).name(), "K") << t;

    // the free symbol() function
    EXPECT_EQ(u::symbol(Quantity::Pressure, "US"), "psia");
    EXPECT_EQ(u::symbol(Quantity::Pressure, "US p=psig"), "psig");
    EXPECT_EQ(u::symbol(Quantity::SpecificEntropy, "US"), "Btu/(lbm·°F)");
}

TEST(UnitsParse, Overrides) {
    auto p = [](const char* t) { return u::UnitSpec::parse(t); };
    EXPECT_EQ(p("US p=psig").unit_text(Quantity::Pressure), "psig");
    EXPECT_EQ(p("US p=psig").name(), "US p=psig");
    {
        const auto s = p("SI p=barg T=K");
        EXPECT_EQ(s.unit_text(Quantity::Pressure), "barg");
        EXPECT_EQ(s.unit_text(Quantity::Temperature), "K");
        EXPECT_EQ(s.name(), "SI p=barg T=K");
    }
    // separators: spaces, commas, semicolons; spaces around '='
    for (const char* t : {"SI,p=kPa;T=K", "SI p = kPa  T= K", "SI; p =kPa , T=K", "SI\tp=kPa\nT=K"}) {
        const auto s = p(t);
        EXPECT_EQ(s.name(), "SI p=kPa T=K") << t;
    }
    // order of overrides does not matter; name() is canonical
    EXPECT_EQ(p("SI T=K p=kPa").name(), "SI p=kPa T=K");
    // units with spaces or parentheses
    EXPECT_EQ(p("SI mu=Pa s").unit_text(Quantity::DynamicViscosity), "Pa s");
    EXPECT_EQ(p("SI mu=mPa s T=K").unit_text(Quantity::DynamicViscosity), "mPa s");
    EXPECT_EQ(p("SI mu=mPa s T=K").unit_text(Quantity::Temperature), "K");
    EXPECT_EQ(p("US s=kJ/(kg K)").unit_text(Quantity::SpecificEntropy), "kJ/(kg K)");
    EXPECT_EQ(p("US s=kJ/kg K").unit_text(Quantity::SpecificEntropy), "kJ/(kg K)");
    EXPECT_EQ(p("US s=kJ/kg-K").unit_text(Quantity::SpecificEntropy), "kJ/(kg K)");
    EXPECT_EQ(p("US s=kJ/kgK").unit_text(Quantity::SpecificEntropy), "kJ/(kg K)");
    EXPECT_EQ(p("SI lambda=Btu/(h ft degF)").unit_text(Quantity::ThermalConductivity), "Btu/(h ft degF)");
    EXPECT_EQ(p("SI lambda=Btu/h ft F").unit_text(Quantity::ThermalConductivity), "Btu/(h ft degF)");
    // "h=kJ/kg K": h takes kJ/kg, the K that follows is a bare unit (temperature)
    {
        const auto s = p("US h=kJ/kg K");
        EXPECT_EQ(s.unit_text(Quantity::SpecificEnergy), "kJ/kg");
        EXPECT_EQ(s.unit_text(Quantity::Temperature), "K");
    }
    EXPECT_EQ(p("bar h=kcal/kg").unit_text(Quantity::SpecificEnergy), "kcal/kg");
    EXPECT_EQ(p("BAR m=t/h").unit_text(Quantity::MassFlow), "t/h");
    EXPECT_EQ(p("KPA m=t/h").name(), "KPA m=t/h");
    // every key
    const auto all = p("SI p=psia T=degF dT=degF h=Btu/lbm s=Btu/lbmR v=ft3/lbm rho=lbm/ft3 w=ft/s mu=cP "
                       "lambda=mW/(m K) sigma=mN/m nu=cSt a=ft2/s m=klbm/h P=MW hr=Btu/kWh pct=fraction");
    EXPECT_EQ(all.name(), "SI p=psia T=degF dT=delta_degF h=Btu/lbm s=Btu/(lbm degF) v=ft3/lbm rho=lbm/ft3 w=ft/s "
                          "mu=cP lambda=mW/(m K) sigma=mN/m nu=cSt a=ft2/s m=klbm/h P=MW hr=Btu/kWh pct=fraction");
    EXPECT_EQ(u::UnitSpec::parse(all.name()).name(), all.name());
    // p (pressure) and P (power) are told apart by case; other keys ignore case; long key names
    {
        const auto s = p("SI p=kPa P=MW");
        EXPECT_EQ(s.unit_text(Quantity::Pressure), "kPa");
        EXPECT_EQ(s.unit_text(Quantity::Power), "MW");
        EXPECT_EQ(p("SI t=K").unit_text(Quantity::Temperature), "K");
        EXPECT_EQ(p("SI MU=cP").unit_text(Quantity::DynamicViscosity), "cP");
        EXPECT_EQ(p("SI pressure=bar").unit_text(Quantity::Pressure), "bar");
        EXPECT_EQ(p("SI Power=W").unit_text(Quantity::Power), "W");
        EXPECT_EQ(p("SI massflow=lbm/h").unit_text(Quantity::MassFlow), "lbm/h");
        EXPECT_EQ(p("SI heatrate=Btu/kWh").unit_text(Quantity::HeatRate), "Btu/kWh");
    }
    // unit spellings are case-insensitive when unambiguous
    EXPECT_EQ(p("SI p=PSIG").unit_text(Quantity::Pressure), "psig");
    EXPECT_EQ(p("SI p=mpa").unit_text(Quantity::Pressure), "MPa");
    EXPECT_EQ(p("SI h=BTU/LB").unit_text(Quantity::SpecificEnergy), "Btu/lbm");
}

TEST(UnitsParse, BareUnits) {
    auto p = [](const char* t) { return u::UnitSpec::parse(t); };
    // a unit alone overrides its quantity on top of SI (or of the named system)
    EXPECT_EQ(p("psig").name(), "SI p=psig");
    EXPECT_EQ(p("US barg").name(), "US p=barg");
    // a temperature unit alone sets temperatures and temperature differences
    EXPECT_EQ(p("SI degF").name(), "SI T=degF dT=delta_degF");
    EXPECT_EQ(p("US K").name(), "US T=K dT=delta_K");
    EXPECT_EQ(p("SI kPa K").name(), "SI p=kPa T=K");
    // m2/s alone sets kinematic viscosity and thermal diffusivity
    EXPECT_EQ(p("US m2/s").name(), "US nu=m2/s a=m2/s");
    // bare "fraction" sets percentages shown as fractions
    EXPECT_EQ(p("SI fraction").name(), "SI pct=fraction");
    // explicit key=unit wins over a bare unit regardless of order
    EXPECT_EQ(p("SI dT=K degF").name(), "SI T=degF");
    // units with spaces alone
    EXPECT_EQ(p("SI mPa s").name(), "SI mu=mPa s");
    EXPECT_EQ(p("psig patm=14.2").name(), "SI p=psig patm=14.2psia");
}

TEST(UnitsParse, UnicodeSpellings) {
    auto p = [](const char* t) { return u::UnitSpec::parse(t); };
    EXPECT_EQ(p("SI T=°F").unit_text(Quantity::Temperature), "degF");
    EXPECT_EQ(p("SI T=℉").unit_text(Quantity::Temperature), "degF");
    EXPECT_EQ(p("US T=°C").unit_text(Quantity::Temperature), "degC");
    EXPECT_EQ(p("US T=℃").unit_text(Quantity::Temperature), "degC");
    EXPECT_EQ(p("US T=º C").unit_text(Quantity::Temperature), "degC");
    EXPECT_EQ(p("SI T=°R").unit_text(Quantity::Temperature), "degR");
    EXPECT_EQ(p("SI dT=Δ°F").unit_text(Quantity::TemperatureDifference), "delta_degF");
    EXPECT_EQ(p("US v=m³/kg").unit_text(Quantity::SpecificVolume), "m3/kg");
    EXPECT_EQ(p("SI v=ft³/lbm").unit_text(Quantity::SpecificVolume), "ft3/lbm");
    EXPECT_EQ(p("US rho=kg/m³").unit_text(Quantity::Density), "kg/m3");
    EXPECT_EQ(p("US s=kJ/(kg·K)").unit_text(Quantity::SpecificEntropy), "kJ/(kg K)");
    EXPECT_EQ(p("SI s=Btu/(lbm·°F)").unit_text(Quantity::SpecificEntropy), "Btu/(lbm degF)");
    EXPECT_EQ(p("US mu=Pa·s").unit_text(Quantity::DynamicViscosity), "Pa s");
    EXPECT_EQ(p("US mu=µPa·s").unit_text(Quantity::DynamicViscosity), "uPa s");
    EXPECT_EQ(p("US mu=μPa s").unit_text(Quantity::DynamicViscosity), "uPa s");  // Greek mu
    EXPECT_EQ(p("US lambda=W/(m·K)").unit_text(Quantity::ThermalConductivity), "W/(m K)");
    EXPECT_EQ(p("SI lambda=Btu/(h·ft·°F)").unit_text(Quantity::ThermalConductivity), "Btu/(h ft degF)");
    EXPECT_EQ(p("SI nu=ft²/h").unit_text(Quantity::KinematicViscosity), "ft2/h");
    EXPECT_EQ(p("SI p=kgf/cm²").unit_text(Quantity::Pressure), "kgf/cm2");
    EXPECT_NEAR(u::convert(100.0, "°C", "°F"), 212.0, 1e-12);
    EXPECT_NEAR(u::convert(1.0, "m³/kg", "ft³/lbm"), 1.0 / 0.062427960576144612, 1e-12);
    // every display symbol is accepted back
    for (const auto& info : u::known_units()) {
        const auto spec_sym = info.symbol;
        EXPECT_EQ(u::convert(1.0, spec_sym, spec_sym), 1.0);
    }
    for (const char* sys : {"SI", "US", "BAR", "KPA", "K"}) {
        const auto s = u::UnitSpec::parse(sys);
        for (int q = 0; q < u::quantity_count; ++q) {
            const Quantity qq = static_cast<Quantity>(q);
            if (qq == Quantity::Text || qq == Quantity::None || s.symbol(qq).empty()) continue;
            EXPECT_NO_THROW(u::convert(1.0, s.symbol(qq), s.unit_text(qq))) << sys << " " << s.symbol(qq);
        }
    }
}

// ---------------------------------------------------------------------------

TEST(UnitsErrors, Convert) {
    EXPECT_EQ(what_of([] { u::convert(1.0, "psig", "degF"); }), "cannot convert pressure 'psig' to temperature 'degF'");
    EXPECT_EQ(code_of([] { u::convert(1.0, "psig", "degF"); }), ErrorCode::InvalidArgument);
    EXPECT_EQ(what_of([] { u::convert(1.0, "kJ/kg", "kJ/(kg K)"); }),
              "cannot convert specific energy 'kJ/kg' to specific entropy 'kJ/(kg K)'");
    EXPECT_EQ(code_of([] { u::convert(1.0, "furlong", "m/s"); }), ErrorCode::UnknownUnit);
    EXPECT_TRUE(contains(what_of([] { u::convert(1.0, "furlong", "m/s"); }), "unknown unit 'furlong'"));
    EXPECT_TRUE(contains(what_of([] { u::convert(1.0, "m/s", "parsec/s"); }), "unknown unit 'parsec/s'"));
    EXPECT_TRUE(contains(what_of([] { u::convert(1.0, "US", "SI"); }), "unit system"));
    EXPECT_EQ(code_of([] { u::convert(1.0, "", "MPa"); }), ErrorCode::UnknownUnit);
    // Below absolute zero and below zero absolute pressure (common practice).
    EXPECT_EQ(what_of([] { u::convert(-500.0, "degC", "K"); }), "T = -500 °C is below absolute zero (-273.15 °C)");
    EXPECT_EQ(code_of([] { u::convert(-1.0, "K", "degC"); }), ErrorCode::OutOfRange);
    EXPECT_EQ(code_of([] { u::convert(-460.0, "degF", "degF"); }), ErrorCode::OutOfRange);
    EXPECT_EQ(what_of([] { u::convert(-10.0, "psia", "MPa"); }), "p = -10 psia is below zero absolute pressure (0 psia)");
    EXPECT_EQ(code_of([] { u::convert(-15.0, "psig", "psia"); }), ErrorCode::OutOfRange);  // below -14.696 psig
    EXPECT_NEAR(u::convert(-14.0, "psig", "psia"), 0.6959487763, 1e-9);  // a vacuum reading is fine
    EXPECT_EQ(u::convert(-40.0, "degC", "degF"), -40.0);  // -40 °C = -40 °F (from the definitions)
    EXPECT_NEAR(u::convert(-5.0, "delta_degC", "delta_degF"), -9.0, 1e-12);  // differences may be negative
    EXPECT_EQ(code_of([] { u::convert(std::nan(""), "MPa", "bar"); }), ErrorCode::InvalidArgument);
}

TEST(UnitsErrors, Parse) {
    {
        const std::string m = what_of([] { u::UnitSpec::parse("SI foo"); });
        EXPECT_TRUE(contains(m, "unknown word 'foo'")) << m;
        EXPECT_TRUE(contains(m, "SI, US, BAR, KPA")) << m;
        EXPECT_EQ(code_of([] { u::UnitSpec::parse("SI foo"); }), ErrorCode::UnknownUnit);
    }
    {
        const std::string m = what_of([] { u::UnitSpec::parse("metric"); });
        EXPECT_TRUE(contains(m, "'metric'")) << m;
        EXPECT_TRUE(contains(m, "SI, US, BAR, KPA or K (SI-K)")) << m;
    }
    {
        const std::string m = what_of([] { u::UnitSpec::parse("SI p=degF"); });
        EXPECT_TRUE(contains(m, "'degF' is not a pressure unit (it is a temperature unit)")) << m;
        EXPECT_TRUE(contains(m, "psig")) << m;  // lists the pressure units
        EXPECT_EQ(code_of([] { u::UnitSpec::parse("SI p=degF"); }), ErrorCode::UnknownUnit);
    }
    {
        const std::string m = what_of([] { u::UnitSpec::parse("SI p=zorch"); });
        EXPECT_TRUE(contains(m, "unknown unit 'zorch' for p")) << m;
    }
    {
        const std::string m = what_of([] { u::UnitSpec::parse("SI q=psig"); });
        EXPECT_TRUE(contains(m, "unknown quantity key 'q'")) << m;
        EXPECT_TRUE(contains(m, "p, T, dT, h")) << m;
        EXPECT_EQ(code_of([] { u::UnitSpec::parse("SI q=psig"); }), ErrorCode::UnknownUnit);
    }
    EXPECT_EQ(code_of([] { u::UnitSpec::parse("SI p=kPa p=bar"); }), ErrorCode::InvalidArgument);
    EXPECT_EQ(code_of([] { u::UnitSpec::parse("SI p="); }), ErrorCode::UnknownUnit);
    EXPECT_EQ(code_of([] { u::UnitSpec::parse("SI =kPa"); }), ErrorCode::UnknownUnit);
    {
        const std::string m = what_of([] { u::UnitSpec::parse("p=psig US"); });
        EXPECT_TRUE(contains(m, "'US' names a unit system")) << m;
    }
    EXPECT_NO_THROW(u::UnitSpec::parse("SI fraction"));
}

// ---------------------------------------------------------------------------

TEST(UnitsCatalogue, KnownUnitsAndSystems) {
    const auto& units = u::known_units();
    EXPECT_GE(units.size(), 60u);
    for (const auto& info : units) {
        EXPECT_FALSE(info.symbol.empty());
        EXPECT_FALSE(info.description.empty()) << info.symbol;
    }
    // every unit requested for the reference is present
    auto has = [&](Quantity q, const char* s) {
        for (const auto& i : units)
            if (i.quantity == q && i.symbol == s) return true;
        return false;
    };
    for (const char* s : {"MPa", "kPa", "Pa", "bar", "psia", "psig", "barg", "kPag", "MPag", "inHg", "mmHg", "atm",
                          "kgf/cm2", "mbar"})
        EXPECT_TRUE(has(Quantity::Pressure, s)) << s;
    for (const char* s : {"degC", "K", "degF", "degR"}) EXPECT_TRUE(has(Quantity::Temperature, s)) << s;
    for (const char* s : {"delta_K", "delta_degC", "delta_degF", "delta_degR"})
        EXPECT_TRUE(has(Quantity::TemperatureDifference, s)) << s;
    for (const char* s : {"kJ/kg", "J/kg", "Btu/lbm", "kcal/kg"}) EXPECT_TRUE(has(Quantity::SpecificEnergy, s)) << s;
    for (const char* s : {"kg/s", "kg/h", "t/h", "lbm/h", "klbm/h"}) EXPECT_TRUE(has(Quantity::MassFlow, s)) << s;
    for (const char* s : {"kW", "MW", "W", "Btu/h", "hp"}) EXPECT_TRUE(has(Quantity::Power, s)) << s;

    const auto& systems = u::known_systems();
    ASSERT_EQ(systems.size(), 5u);
    EXPECT_EQ(systems[0].name, "SI");
    EXPECT_EQ(systems[1].name, "US");
    EXPECT_EQ(systems[2].name, "BAR");
    EXPECT_EQ(systems[3].name, "KPA");
    EXPECT_EQ(systems[4].name, "K");
    for (const auto& s : systems) {
        EXPECT_EQ(u::UnitSpec::parse(s.name).name(), s.name);
        EXPECT_TRUE(contains(s.description, "p ")) << s.description;
    }
    EXPECT_TRUE(contains(systems[1].description, "p psia, T °F")) << systems[1].description;
}

TEST(UnitsQuantityName, All) {
    EXPECT_EQ(u::quantity_name(Quantity::Pressure), "pressure");
    EXPECT_EQ(u::quantity_name(Quantity::TemperatureDifference), "temperature difference");
    EXPECT_EQ(u::quantity_name(Quantity::MassFlow), "mass flow");
}

// The bottom layer words its own sentences in core units without the units
// layer (core_symbol); those symbols must be the ones the unit system "K"
// (MPa and kelvin, the core units) gives, or the two wordings would differ.
TEST(UnitsCoreSymbols, SameAsSystemK) {
    const auto k = u::UnitSpec::parse("K");
    for (int q = 0; q < u::quantity_count; ++q) {
        const auto quantity = static_cast<Quantity>(q);
        EXPECT_EQ(isentra::core_symbol(quantity), k.symbol(quantity)) << "quantity " << q;
    }
}

// A range sentence in core units from the units layer equals the error's own.
TEST(UnitsCoreSymbols, RangeSentenceInCoreUnitsIsWhat) {
    const isentra::RangeError e("p", Quantity::Pressure, 120.0, 0.0, 100.0, "(the upper limit of IAPWS-IF97)");
    EXPECT_EQ(u::range_sentence(e, u::UnitSpec::parse("K")), e.what());
    EXPECT_EQ(u::range_sentence(e, u::UnitSpec::parse("US")),
              "p = 17404.5 psia is outside the range 0 to 14503.8 psia (the upper limit of IAPWS-IF97)");
}
