// SPDX-License-Identifier: MPL-2.0
// Units of measure: the unit table, the named systems, the unit-text parser
// and conversion. Syntax of a unit text: see units.hpp.
//
// Every factor is computed from its definition (in long double, rounded once
// to double). Definitions, from NIST SP 811 (2008) Appendix B and the
// international yard and pound agreement (1959):
//   1 lbm    = 0.45359237 kg                        (yard and pound, 1959; exact)
//   1 ft     = 0.3048 m, 1 in = 0.0254 m            (yard and pound, 1959; exact)
//   1 Btu_IT = 1055.05585262 J                      (NIST SP 811 B.8; exact)
//   1 cal_IT = 4.1868 J                             (NIST SP 811 B.8; exact)
//   g_n      = 9.80665 m/s2                         (NIST SP 811 B.8 footnote; exact)
//   1 lbf    = g_n * 1 lbm                          (NIST SP 811 B.8; = 4.4482216152605 N exactly)
//   1 psi    = 1 lbf / in2                          (NIST SP 811 B.8)
//   1 h      = 3600 s
//   temperature: T/K = t/degC + 273.15 = (t/degF + 459.67)/1.8 = (T/degR)/1.8  (NIST SP 811 B.8)
#include "isentra/units/units.hpp"

#include <array>
#include <charconv>
#include <cmath>
#include <cstdio>
#include <cstring>

#include "isentra/base/error.hpp"

namespace isentra::units {

namespace detail {
// A unit of measure. Core value c from a user value v:
//   c = (v - zero) * factor + base          (gauge units: base = patm at run time)
//   v = (c - base) * inverse + zero
// zero/base are non-zero only for temperatures with an offset; they are
// chosen so that degC <-> degF <-> K conversions of round numbers stay round
// (the offsets are applied around 0 degC rather than around 0 K).
struct UnitDef {
    Quantity quantity;
    const char* symbol;       // canonical ASCII spelling (convert(), overrides, name())
    const char* display;      // for showing beside a number (UTF-8)
    double factor;            // core units per user unit
    double inverse;           // user units per core unit
    double zero;              // user value ...
    double base;              // ... that maps to this core value
    bool gauge;               // relative to patm
    const char* absolute;     // gauge units: the absolute unit of the same scale
    const char* aliases;      // other spellings, '|' separated (normalised on lookup)
    const char* description;
};
}  // namespace detail

using detail::UnitDef;

namespace {

using Q = Quantity;

// ---- Base definitions (long double; see the file header for sources) ----
constexpr long double kg_per_lbm = 0.45359237L;      // international yard and pound (1959), exact
constexpr long double m_per_ft = 0.3048L;            // international yard and pound (1959), exact
constexpr long double m_per_in = 0.0254L;            // international yard and pound (1959), exact
constexpr long double J_per_Btu = 1055.05585262L;    // Btu_IT, NIST SP 811 (2008) B.8, exact
constexpr long double J_per_cal = 4.1868L;           // cal_IT, NIST SP 811 (2008) B.8, exact
constexpr long double g_n = 9.80665L;                // standard gravity, NIST SP 811 (2008) B.8, exact
constexpr long double N_per_lbf = g_n * kg_per_lbm;  // NIST SP 811 (2008) B.8: 4.4482216152605 N
constexpr long double Pa_per_psi = N_per_lbf / (m_per_in * m_per_in);  // NIST SP 811 B.8: 6.894757 E+03
constexpr long double s_per_h = 3600.0L;
// Conventional mercury column: density 13595.1 kg/m3 under g_n (NIST SP 811 (2008) B.8 footnote):
constexpr long double Pa_per_mmHg = 13595.1L * g_n / 1000.0L;  // 133.322387415 Pa; NIST: 1.333224 E+02
constexpr long double Pa_per_inHg = 13595.1L * g_n * m_per_in;  // 3386.388640341 Pa; NIST: 3.386389 E+03
constexpr long double Pa_per_atm = 101325.0L;        // standard atmosphere, NIST SP 811 (2008) B.8, exact
constexpr long double Pa_per_kgf_cm2 = g_n * 1.0e4L;  // kgf/cm2, NIST SP 811 (2008) B.8: 9.80665 E+04, exact
constexpr long double W_per_hp = 550.0L * m_per_ft * N_per_lbf;  // 550 ft lbf/s, NIST SP 811 B.8: 7.456999 E+02
constexpr long double K_per_degF = 1.0L / 1.8L;      // NIST SP 811 (2008) B.8: interval 5/9 K
// Inch of water at 60 degF, NIST SP 811 (2008) B.8: 2.4884 E+02 Pa (the conventional column of
// differential-pressure transmitters in US plants; NIST gives no exact definition, this is its factor).
constexpr long double Pa_per_inH2O_60F = 248.84L;
// Millimetre of water, conventional (1000 kg/m3 under g_n), NIST SP 811 (2008) B.8: 9.80665 E+00 Pa, exact.
constexpr long double Pa_per_mmH2O = g_n;

// A linear unit: `num/den` core units per user unit.
constexpr UnitDef lin(Q q, const char* sym, const char* disp, long double num, long double den,
                      const char* aliases, const char* desc) {
    return UnitDef{q, sym, disp, static_cast<double>(num / den), static_cast<double>(den / num), 0.0, 0.0,
                   false, nullptr, aliases, desc};
}
// A gauge pressure: `num` MPa per user unit, relative to patm.
constexpr UnitDef gauge(const char* sym, const char* disp, long double num, const char* absolute,
                        const char* aliases, const char* desc) {
    return UnitDef{Q::Pressure, sym, disp, static_cast<double>(num), static_cast<double>(1.0L / num), 0.0, 0.0,
                   true, absolute, aliases, desc};
}
// A temperature with an offset: user value `zero` is core value `base` K; `per` user units per kelvin.
constexpr UnitDef temp(const char* sym, const char* disp, long double per, double zero, double base,
                       const char* aliases, const char* desc) {
    return UnitDef{Q::Temperature, sym, disp, static_cast<double>(1.0L / per), static_cast<double>(per), zero, base,
                   false, nullptr, aliases, desc};
}

constexpr long double MPa_per_Pa = 1.0e-6L;

// The unit table. Order matters: for a spelling shared by several kinds the
// first entry is the primary meaning (Temperature before TemperatureDifference,
// Percent before None).
constexpr UnitDef kUnits[] = {
    // Pressure, core MPa (absolute)
    lin(Q::Pressure, "MPa", "MPa", 1.0L, 1.0L, "MPa(a)|MPaa|MPa abs", "megapascal (absolute)"),
    lin(Q::Pressure, "kPa", "kPa", 1.0e-3L, 1.0L, "kPa(a)|kPaa|kPa abs", "kilopascal (absolute)"),
    lin(Q::Pressure, "Pa", "Pa", MPa_per_Pa, 1.0L, "N/m2", "pascal (absolute)"),
    lin(Q::Pressure, "bar", "bar", 0.1L, 1.0L, "bar(a)|bara|bar abs", "bar = 100 kPa (absolute)"),  // NIST SP 811 B.8, exact
    lin(Q::Pressure, "mbar", "mbar", 1.0e-4L, 1.0L, "mbar(a)|mbara|mbar abs",
        "millibar = 100 Pa (absolute), common for condenser pressure"),  // NIST SP 811 B.8 (bar), exact
    lin(Q::Pressure, "psia", "psia", Pa_per_psi * MPa_per_Pa, 1.0L, "psi|lbf/in2|psi(a)",
        "pound-force per square inch, absolute = 6894.757293168361 Pa"),
    gauge("psig", "psig", Pa_per_psi * MPa_per_Pa, "psia", "psi(g)", "pound-force per square inch, gauge (psia - patm)"),
    gauge("barg", "barg", 0.1L, "bar", "bar(g)", "bar, gauge (bar - patm)"),
    gauge("kPag", "kPag", 1.0e-3L, "kPa", "kPa(g)", "kilopascal, gauge (kPa - patm)"),
    gauge("MPag", "MPag", 1.0L, "MPa", "MPa(g)", "megapascal, gauge (MPa - patm)"),
    lin(Q::Pressure, "inHg", "inHg", Pa_per_inHg * MPa_per_Pa, 1.0L, "in Hg|inHgA|inHg(a)|inHg abs|in HgA",
        "inch of mercury, conventional = 3386.388640341 Pa (absolute)"),
    lin(Q::Pressure, "mmHg", "mmHg", Pa_per_mmHg * MPa_per_Pa, 1.0L, "mm Hg|mmHgA|mmHg(a)|mmHg abs|mm HgA",
        "millimetre of mercury, conventional = 133.322387415 Pa (absolute)"),
    lin(Q::Pressure, "atm", "atm", Pa_per_atm * MPa_per_Pa, 1.0L, "", "standard atmosphere = 101325 Pa (absolute)"),
    lin(Q::Pressure, "kgf/cm2", "kgf/cm²", Pa_per_kgf_cm2 * MPa_per_Pa, 1.0L, "kg/cm2|at|ata",
        "kilogram-force per square centimetre (technical atmosphere) = 98066.5 Pa (absolute)"),

    // Temperature, core K
    lin(Q::Temperature, "K", "K", 1.0L, 1.0L, "kelvin", "kelvin"),
    temp("degC", "°C", 1.0L, 0.0, 273.15, "C|celsius", "degree Celsius: T/K = t/°C + 273.15"),
    temp("degF", "°F", 1.8L, 32.0, 273.15, "F|fahrenheit", "degree Fahrenheit: t/°F = 1.8 t/°C + 32"),
    lin(Q::Temperature, "degR", "°R", K_per_degF, 1.0L, "R|rankine", "degree Rankine: T/°R = 1.8 T/K"),

    // Temperature difference, core K (factor only, no offset)
    lin(Q::TemperatureDifference, "delta_K", "K", 1.0L, 1.0L, "K|dK|kelvin",
        "kelvin, as a temperature difference"),
    lin(Q::TemperatureDifference, "delta_degC", "Δ°C", 1.0L, 1.0L, "degC|C|deltaC",
        "degree Celsius as a temperature difference (= 1 K)"),
    lin(Q::TemperatureDifference, "delta_degF", "Δ°F", K_per_degF, 1.0L, "degF|F|deltaF",
        "degree Fahrenheit as a temperature difference (= 5/9 K)"),
    lin(Q::TemperatureDifference, "delta_degR", "Δ°R", K_per_degF, 1.0L, "degR|R|deltaR",
        "degree Rankine as a temperature difference (= 5/9 K)"),

    // Specific energy, core kJ/kg
    lin(Q::SpecificEnergy, "kJ/kg", "kJ/kg", 1.0L, 1.0L, "", "kilojoule per kilogram"),
    lin(Q::SpecificEnergy, "J/kg", "J/kg", 1.0e-3L, 1.0L, "", "joule per kilogram"),
    lin(Q::SpecificEnergy, "Btu/lbm", "Btu/lbm", J_per_Btu / kg_per_lbm / 1000.0L, 1.0L, "Btu/lb",
        "international-table Btu per pound = 2.326 kJ/kg"),
    lin(Q::SpecificEnergy, "kcal/kg", "kcal/kg", J_per_cal, 1.0L, "cal/g|kcal_IT/kg",
        "international-table kilocalorie per kilogram = 4.1868 kJ/kg"),

    // Specific entropy and specific heat capacity, core kJ/(kg K)
    lin(Q::SpecificEntropy, "kJ/(kg K)", "kJ/(kg·K)", 1.0L, 1.0L, "kJ/kgK|kJ/kg/K|kJ/(kg degC)|kJ/kgC",
        "kilojoule per kilogram kelvin"),
    lin(Q::SpecificEntropy, "J/(kg K)", "J/(kg·K)", 1.0e-3L, 1.0L, "J/kgK|J/kg/K", "joule per kilogram kelvin"),
    lin(Q::SpecificEntropy, "Btu/(lbm degF)", "Btu/(lbm·°F)", J_per_Btu / kg_per_lbm / 1000.0L * 1.8L, 1.0L,
        "Btu/lbmF|Btu/(lbm R)|Btu/lbmR|Btu/(lbm degR)|Btu/(lb degF)|Btu/lbF|Btu/(lb R)|Btu/lbR",
        "Btu per pound degree Fahrenheit (or Rankine) = 4.1868 kJ/(kg·K)"),

    // Specific volume, core m3/kg
    lin(Q::SpecificVolume, "m3/kg", "m³/kg", 1.0L, 1.0L, "", "cubic metre per kilogram"),
    lin(Q::SpecificVolume, "ft3/lbm", "ft³/lbm", m_per_ft * m_per_ft * m_per_ft / kg_per_lbm, 1.0L, "ft3/lb",
        "cubic foot per pound"),
    lin(Q::SpecificVolume, "L/kg", "L/kg", 1.0e-3L, 1.0L, "l/kg|dm3/kg", "litre per kilogram"),

    // Density, core kg/m3
    lin(Q::Density, "kg/m3", "kg/m³", 1.0L, 1.0L, "", "kilogram per cubic metre"),
    lin(Q::Density, "lbm/ft3", "lbm/ft³", kg_per_lbm / (m_per_ft * m_per_ft * m_per_ft), 1.0L, "lb/ft3",
        "pound per cubic foot"),
    lin(Q::Density, "g/cm3", "g/cm³", 1000.0L, 1.0L, "g/cc|kg/L|kg/l", "gram per cubic centimetre"),

    // Speed, core m/s
    lin(Q::Speed, "m/s", "m/s", 1.0L, 1.0L, "", "metre per second"),
    lin(Q::Speed, "ft/s", "ft/s", m_per_ft, 1.0L, "", "foot per second"),

    // Dynamic viscosity, core Pa s
    lin(Q::DynamicViscosity, "Pa s", "Pa·s", 1.0L, 1.0L, "N s/m2|kg/(m s)", "pascal second"),
    lin(Q::DynamicViscosity, "mPa s", "mPa·s", 1.0e-3L, 1.0L, "", "millipascal second"),
    lin(Q::DynamicViscosity, "uPa s", "µPa·s", 1.0e-6L, 1.0L, "", "micropascal second"),
    lin(Q::DynamicViscosity, "cP", "cP", 1.0e-3L, 1.0L, "centipoise", "centipoise = 1 mPa·s"),
    lin(Q::DynamicViscosity, "lbm/(ft h)", "lbm/(ft·h)", kg_per_lbm / (m_per_ft * s_per_h), 1.0L,
        "lb/(ft h)|lbm/(ft hr)|lb/(ft hr)", "pound per foot hour"),
    lin(Q::DynamicViscosity, "lbm/(ft s)", "lbm/(ft·s)", kg_per_lbm / m_per_ft, 1.0L, "lb/(ft s)",
        "pound per foot second"),

    // Thermal conductivity, core W/(m K)
    lin(Q::ThermalConductivity, "W/(m K)", "W/(m·K)", 1.0L, 1.0L, "W/mK|W/m/K", "watt per metre kelvin"),
    lin(Q::ThermalConductivity, "mW/(m K)", "mW/(m·K)", 1.0e-3L, 1.0L, "mW/mK|mW/m/K", "milliwatt per metre kelvin"),
    lin(Q::ThermalConductivity, "Btu/(h ft degF)", "Btu/(h·ft·°F)", J_per_Btu / s_per_h / m_per_ft * 1.8L, 1.0L,
        "Btu/(h ft F)|Btu/hftF|Btu/(hr ft degF)|Btu/(hr ft F)|Btu/hrftF|Btu/(h ft R)|Btu/(hr ft R)",
        "Btu per hour foot degree Fahrenheit"),

    // Surface tension, core N/m
    lin(Q::SurfaceTension, "N/m", "N/m", 1.0L, 1.0L, "", "newton per metre"),
    lin(Q::SurfaceTension, "mN/m", "mN/m", 1.0e-3L, 1.0L, "dyn/cm", "millinewton per metre (= dyn/cm)"),
    lin(Q::SurfaceTension, "lbf/ft", "lbf/ft", N_per_lbf / m_per_ft, 1.0L, "", "pound-force per foot"),

    // Kinematic viscosity, core m2/s
    lin(Q::KinematicViscosity, "m2/s", "m²/s", 1.0L, 1.0L, "", "square metre per second"),
    lin(Q::KinematicViscosity, "mm2/s", "mm²/s", 1.0e-6L, 1.0L, "", "square millimetre per second"),
    lin(Q::KinematicViscosity, "cSt", "cSt", 1.0e-6L, 1.0L, "centistokes", "centistokes = 1 mm²/s"),
    lin(Q::KinematicViscosity, "ft2/h", "ft²/h", m_per_ft * m_per_ft / s_per_h, 1.0L, "ft2/hr",
        "square foot per hour"),
    lin(Q::KinematicViscosity, "ft2/s", "ft²/s", m_per_ft * m_per_ft, 1.0L, "", "square foot per second"),

    // Thermal diffusivity, core m2/s
    lin(Q::ThermalDiffusivity, "m2/s", "m²/s", 1.0L, 1.0L, "", "square metre per second"),
    lin(Q::ThermalDiffusivity, "mm2/s", "mm²/s", 1.0e-6L, 1.0L, "", "square millimetre per second"),
    lin(Q::ThermalDiffusivity, "ft2/h", "ft²/h", m_per_ft * m_per_ft / s_per_h, 1.0L, "ft2/hr",
        "square foot per hour"),
    lin(Q::ThermalDiffusivity, "ft2/s", "ft²/s", m_per_ft * m_per_ft, 1.0L, "", "square foot per second"),

    // Mass flow, core kg/s
    lin(Q::MassFlow, "kg/s", "kg/s", 1.0L, 1.0L, "", "kilogram per second"),
    lin(Q::MassFlow, "kg/h", "kg/h", 1.0L, s_per_h, "kg/hr", "kilogram per hour"),
    lin(Q::MassFlow, "t/h", "t/h", 1000.0L, s_per_h, "t/hr|tph", "metric ton per hour"),
    lin(Q::MassFlow, "lbm/h", "lbm/h", kg_per_lbm, s_per_h, "lb/h|lbm/hr|lb/hr|pph", "pound per hour"),
    lin(Q::MassFlow, "klbm/h", "klbm/h", 1000.0L * kg_per_lbm, s_per_h, "klb/h|klbm/hr|klb/hr|kpph",
        "thousand pounds per hour"),

    // Power, core kW
    lin(Q::Power, "kW", "kW", 1.0L, 1.0L, "", "kilowatt"),
    lin(Q::Power, "MW", "MW", 1000.0L, 1.0L, "", "megawatt"),
    lin(Q::Power, "W", "W", 1.0e-3L, 1.0L, "", "watt"),
    lin(Q::Power, "Btu/h", "Btu/h", J_per_Btu / s_per_h / 1000.0L, 1.0L, "Btu/hr", "Btu per hour"),
    lin(Q::Power, "hp", "hp", W_per_hp / 1000.0L, 1.0L, "",
        "mechanical horsepower (550 ft·lbf/s) = 745.69987158227022 W"),

    // Heat rate, core kJ/kWh
    lin(Q::HeatRate, "kJ/kWh", "kJ/kWh", 1.0L, 1.0L, "kJ/kW h|kJ/kWhr", "kilojoule per kilowatt hour"),
    lin(Q::HeatRate, "Btu/kWh", "Btu/kWh", J_per_Btu / 1000.0L, 1.0L, "Btu/kW h|Btu/kWhr",
        "Btu per kilowatt hour = 1.05505585262 kJ/kWh"),
    lin(Q::HeatRate, "kcal/kWh", "kcal/kWh", J_per_cal, 1.0L, "kcal/kW h",
        "international-table kilocalorie per kilowatt hour = 4.1868 kJ/kWh"),

    // Percent, core %
    lin(Q::Percent, "%", "%", 1.0L, 1.0L, "percent", "percent"),
    lin(Q::Percent, "fraction", "", 100.0L, 1.0L, "1", "fraction of one (0.85 for 85 %)"),

    // Dimensionless, core fraction
    lin(Q::None, "fraction", "", 1.0L, 1.0L, "1|dimensionless", "dimensionless number"),
    lin(Q::None, "%", "%", 0.01L, 1.0L, "percent", "dimensionless number shown in percent"),

    // Differential pressure, core Pa (a difference: neither absolute nor gauge)
    lin(Q::DifferentialPressure, "Pa", "Pa", 1.0L, 1.0L, "N/m2", "pascal (differential)"),
    lin(Q::DifferentialPressure, "kPa", "kPa", 1.0e3L, 1.0L, "kPad|kPa(d)", "kilopascal (differential)"),
    lin(Q::DifferentialPressure, "MPa", "MPa", 1.0e6L, 1.0L, "MPad|MPa(d)", "megapascal (differential)"),
    lin(Q::DifferentialPressure, "mbar", "mbar", 100.0L, 1.0L, "mbard|mbar(d)",
        "millibar = 100 Pa (differential)"),  // NIST SP 811 B.8 (bar), exact
    lin(Q::DifferentialPressure, "bar", "bar", 1.0e5L, 1.0L, "bard|bar(d)", "bar = 100 kPa (differential)"),
    lin(Q::DifferentialPressure, "inH2O", "inH₂O", Pa_per_inH2O_60F, 1.0L,
        "in H2O|inH2O(60F)|inH2O(60degF)|inWC|in WC|inWG",
        "inch of water at 60 °F = 248.84 Pa (NIST SP 811 B.8; differential)"),
    lin(Q::DifferentialPressure, "mmH2O", "mmH₂O", Pa_per_mmH2O, 1.0L, "mm H2O|mmWC|mm WC",
        "millimetre of water, conventional = 9.80665 Pa (NIST SP 811 B.8; differential)"),
    lin(Q::DifferentialPressure, "psi", "psi", Pa_per_psi, 1.0L, "psid|psi(d)|lbf/in2",
        "pound-force per square inch (differential) = 6894.757293168361 Pa"),

    // Length, core m (diameters)
    lin(Q::Length, "m", "m", 1.0L, 1.0L, "metre|meter", "metre"),
    lin(Q::Length, "mm", "mm", 1.0e-3L, 1.0L, "millimetre|millimeter", "millimetre"),
    lin(Q::Length, "cm", "cm", 1.0e-2L, 1.0L, "", "centimetre"),
    lin(Q::Length, "in", "in", m_per_in, 1.0L, "inch", "inch = 25.4 mm"),
    lin(Q::Length, "ft", "ft", m_per_ft, 1.0L, "foot|feet", "foot = 0.3048 m"),

    // Linear thermal expansion coefficient, core 1/K
    lin(Q::LinearExpansion, "1/K", "1/K", 1.0L, 1.0L, "/K|1/degC|/degC|per K", "per kelvin (= per degree Celsius)"),
    lin(Q::LinearExpansion, "1/degF", "1/°F", 1.8L, 1.0L, "/degF|1/F|/F|1/degR|/degR",
        "per degree Fahrenheit (= 1.8 per kelvin)"),
};

constexpr UnitDef kTextUnit{Q::Text, "", "", 1.0, 1.0, 0.0, 0.0, false, nullptr, "", "text"};

// ---- Named systems: the canonical symbol of every quantity, in enum order ----
struct SystemDef {
    const char* name;
    const char* alias;  // second accepted name or nullptr
    const char* description;
    const char* symbols[quantity_count];
};

// clang-format off
constexpr SystemDef kSystems[] = {
    {"SI", nullptr, "SI with MPa and °C (the default; also the empty text)",
     {"fraction", "MPa", "degC", "delta_K", "kJ/kg", "kJ/(kg K)", "m3/kg", "kg/m3", "m/s", "Pa s", "W/(m K)", "N/m",
      "m2/s", "m2/s", "kg/s", "kW", "kJ/kWh", "%", "kPa", "mm", "1/K", ""}},
    {"US", nullptr, "US customary units",
     {"fraction", "psia", "degF", "delta_degF", "Btu/lbm", "Btu/(lbm degF)", "ft3/lbm", "lbm/ft3", "ft/s",
      "lbm/(ft h)", "Btu/(h ft degF)", "lbf/ft", "ft2/h", "ft2/h", "lbm/h", "kW", "Btu/kWh", "%", "inH2O", "in", "1/degF",
      ""}},
    {"BAR", nullptr, "SI with bar (absolute) and °C",
     {"fraction", "bar", "degC", "delta_K", "kJ/kg", "kJ/(kg K)", "m3/kg", "kg/m3", "m/s", "Pa s", "W/(m K)", "N/m",
      "m2/s", "m2/s", "kg/s", "kW", "kJ/kWh", "%", "mbar", "mm", "1/K", ""}},
    {"KPA", nullptr, "SI with kPa (absolute) and °C",
     {"fraction", "kPa", "degC", "delta_K", "kJ/kg", "kJ/(kg K)", "m3/kg", "kg/m3", "m/s", "Pa s", "W/(m K)", "N/m",
      "m2/s", "m2/s", "kg/s", "kW", "kJ/kWh", "%", "kPa", "mm", "1/K", ""}},
    {"K", "SI-K", "SI with MPa and kelvin (the core units); also written SI-K",
     {"fraction", "MPa", "K", "delta_K", "kJ/kg", "kJ/(kg K)", "m3/kg", "kg/m3", "m/s", "Pa s", "W/(m K)", "N/m",
      "m2/s", "m2/s", "kg/s", "kW", "kJ/kWh", "%", "Pa", "m", "1/K", ""}},
};
// clang-format on
constexpr std::size_t kSystemCount = sizeof kSystems / sizeof kSystems[0];

// ---- Override keys ----
struct KeyDef {
    const char* key;
    Quantity quantity;
};
// The first key of each quantity is its canonical key (used by name()).
constexpr KeyDef kKeys[] = {
    {"p", Q::Pressure},
    {"pressure", Q::Pressure},
    {"T", Q::Temperature},
    {"temperature", Q::Temperature},
    {"dT", Q::TemperatureDifference},
    {"deltaT", Q::TemperatureDifference},
    {"h", Q::SpecificEnergy},
    {"energy", Q::SpecificEnergy},
    {"s", Q::SpecificEntropy},
    {"entropy", Q::SpecificEntropy},
    {"cp", Q::SpecificEntropy},
    {"v", Q::SpecificVolume},
    {"volume", Q::SpecificVolume},
    {"rho", Q::Density},
    {"density", Q::Density},
    {"w", Q::Speed},
    {"speed", Q::Speed},
    {"mu", Q::DynamicViscosity},
    {"viscosity", Q::DynamicViscosity},
    {"lambda", Q::ThermalConductivity},
    {"conductivity", Q::ThermalConductivity},
    {"sigma", Q::SurfaceTension},
    {"tension", Q::SurfaceTension},
    {"nu", Q::KinematicViscosity},
    {"kinematic", Q::KinematicViscosity},
    {"a", Q::ThermalDiffusivity},
    {"alpha", Q::ThermalDiffusivity},
    {"diffusivity", Q::ThermalDiffusivity},
    {"m", Q::MassFlow},
    {"mdot", Q::MassFlow},
    {"massflow", Q::MassFlow},
    {"P", Q::Power},
    {"power", Q::Power},
    {"hr", Q::HeatRate},
    {"heatrate", Q::HeatRate},
    {"pct", Q::Percent},
    {"percent", Q::Percent},
    {"dp", Q::DifferentialPressure},
    {"differential", Q::DifferentialPressure},
    {"L", Q::Length},
    {"length", Q::Length},
    {"exp", Q::LinearExpansion},
    {"expansion", Q::LinearExpansion},
};

constexpr int qi(Quantity q) { return static_cast<int>(q); }

// ---- Text helpers ----
char lower_ascii(char c) { return (c >= 'A' && c <= 'Z') ? static_cast<char>(c - 'A' + 'a') : c; }
std::string lower(std::string_view s) {
    std::string r(s);
    for (char& c : r) c = lower_ascii(c);
    return r;
}
bool iequals(std::string_view a, std::string_view b) {
    if (a.size() != b.size()) return false;
    for (std::size_t i = 0; i < a.size(); ++i)
        if (lower_ascii(a[i]) != lower_ascii(b[i])) return false;
    return true;
}

// Normalises a unit spelling: drops spaces and punctuation that only
// separates, maps Unicode signs to ASCII words.
std::string normalize(std::string_view s) {
    struct Map {
        const char* from;
        const char* to;
    };
    static constexpr Map maps[] = {
        {"\xC2\xB0", "deg"},      // ° degree sign
        {"\xC2\xBA", "deg"},      // º masculine ordinal, often typed for °
        {"\xC2\xB3", "3"},        // ³
        {"\xC2\xB2", "2"},        // ²
        {"\xC2\xB7", ""},         // · middle dot
        {"\xC2\xA0", ""},         // no-break space
        {"\xC2\xB5", "u"},        // µ micro sign
        {"\xCE\xBC", "u"},        // μ Greek mu
        {"\xCE\x94", "delta"},    // Δ Greek capital delta
        {"\xE2\x88\x86", "delta"},  // ∆ increment
        {"\xE2\x8B\x85", ""},     // ⋅ dot operator
        {"\xE2\x88\x99", ""},     // ∙ bullet operator
        {"\xE2\x84\x83", "degC"},  // ℃
        {"\xE2\x84\x89", "degF"},  // ℉
        {"\xE2\x84\xAA", "K"},     // K kelvin sign
    };
    std::string r;
    r.reserve(s.size());
    for (std::size_t i = 0; i < s.size();) {
        const char c = s[i];
        if (c == ' ' || c == '\t' || c == '(' || c == ')' || c == '*' || c == '-' || c == '_' || c == '.' ||
            c == '^' || c == '[' || c == ']') {
            ++i;
            continue;
        }
        if (static_cast<unsigned char>(c) >= 0x80) {
            bool mapped = false;
            for (const Map& m : maps) {
                const std::size_t n = std::strlen(m.from);
                if (s.compare(i, n, m.from) == 0) {
                    r += m.to;
                    i += n;
                    mapped = true;
                    break;
                }
            }
            if (mapped) continue;
        }
        r += c;
        ++i;
    }
    return r;
}

// Calls f with each spelling of a '|'-separated alias list.
template <class F>
void for_each_alias(std::string_view aliases, F&& f) {
    while (!aliases.empty()) {
        const std::size_t bar = aliases.find('|');
        f(aliases.substr(0, bar));
        if (bar == std::string_view::npos) break;
        aliases.remove_prefix(bar + 1);
    }
}

// Spellings of every unit, normalised once (immutable after construction).
struct Spelling {
    std::string exact;  // normalised
    std::string folded; // normalised, ASCII lower case
    const UnitDef* unit;
};

struct Tables {
    std::vector<Spelling> spellings;
    const UnitDef* systems[kSystemCount][quantity_count];
    Tables();
};

const UnitDef* find_in(const std::vector<Spelling>& sp, Quantity q, std::string_view text) {
    const std::string n = normalize(text);
    if (n.empty()) return nullptr;
    for (const Spelling& s : sp)
        if (s.unit->quantity == q && s.exact == n) return s.unit;
    const std::string f = lower(n);
    for (const Spelling& s : sp)
        if (s.unit->quantity == q && s.folded == f) return s.unit;
    return nullptr;
}

Tables::Tables() {
    for (const UnitDef& u : kUnits) {
        auto add = [&](std::string_view text) {
            std::string n = normalize(text);
            if (n.empty()) return;
            for (const Spelling& s : spellings)
                if (s.unit == &u && s.exact == n) return;
            std::string f = lower(n);
            spellings.push_back(Spelling{std::move(n), std::move(f), &u});
        };
        add(u.symbol);
        add(u.display);
        for_each_alias(u.aliases, add);
    }
    for (std::size_t s = 0; s < kSystemCount; ++s) {
        for (int q = 0; q < quantity_count; ++q) {
            const Quantity qq = static_cast<Quantity>(q);
            if (qq == Q::Text) {
                systems[s][q] = &kTextUnit;
                continue;
            }
            const UnitDef* u = find_in(spellings, qq, kSystems[s].symbols[q]);
            if (!u) throw Error(ErrorCode::UnknownUnit, std::string("internal: unit system ") + kSystems[s].name +
                                                            " names unknown unit '" + kSystems[s].symbols[q] + "'");
            systems[s][q] = u;
        }
    }
}

const Tables& tables() {
    static const Tables t;  // built once, immutable afterwards
    return t;
}

const UnitDef* find_unit(Quantity q, std::string_view text) { return find_in(tables().spellings, q, text); }

// All units spelled `text`, primary meaning first (table order), each once.
struct Candidates {
    std::array<const UnitDef*, 8> u{};
    std::size_t n = 0;
    void add(const UnitDef* p) {
        for (std::size_t i = 0; i < n; ++i)
            if (u[i] == p) return;
        if (n < u.size()) u[n++] = p;
    }
};

Candidates find_units(std::string_view text) {
    Candidates c;
    const std::string n = normalize(text);
    if (n.empty()) return c;
    // Spellings are stored in table order, so candidates come out in table order.
    const auto& sp = tables().spellings;
    for (const Spelling& s : sp)
        if (s.exact == n) c.add(s.unit);
    if (c.n == 0) {
        const std::string f = lower(n);
        for (const Spelling& s : sp)
            if (s.folded == f) c.add(s.unit);
    }
    return c;
}

int find_system(std::string_view word) {
    for (std::size_t s = 0; s < kSystemCount; ++s)
        if (iequals(word, kSystems[s].name) || (kSystems[s].alias && iequals(word, kSystems[s].alias)))
            return static_cast<int>(s);
    return -1;
}

std::string system_list() {
    std::string r;
    for (std::size_t s = 0; s < kSystemCount; ++s) {
        if (s) r += s + 1 == kSystemCount ? " or " : ", ";
        r += kSystems[s].name;
        if (kSystems[s].alias) r += std::string(" (") + kSystems[s].alias + ")";
    }
    return r;
}

std::string units_of(Quantity q) {
    std::string r;
    for (const UnitDef& u : kUnits)
        if (u.quantity == q) {
            if (!r.empty()) r += ", ";
            r += u.symbol;
        }
    return r;
}

const char* canonical_key(Quantity q) {
    for (const KeyDef& k : kKeys)
        if (k.quantity == q) return k.key;
    return nullptr;
}

// Key lookup: exact, else ASCII case-insensitive if that is unambiguous.
bool find_key(std::string_view key, Quantity& q) {
    for (const KeyDef& k : kKeys)
        if (key == k.key) {
            q = k.quantity;
            return true;
        }
    bool found = false;
    for (const KeyDef& k : kKeys)
        if (iequals(key, k.key)) {
            if (found && q != k.quantity) return false;  // p/P
            q = k.quantity;
            found = true;
        }
    return found;
}

std::string key_list() {
    std::string r;
    for (const KeyDef& k : kKeys) {
        if (canonical_key(k.quantity) != k.key) continue;
        if (!r.empty()) r += ", ";
        r += k.key;
    }
    return r + ", patm";
}

std::string format_number(double v) {
    char buf[64];
    auto res = std::to_chars(buf, buf + sizeof buf, v);
    return std::string(buf, res.ptr);
}

// Splits a unit text into words at spaces, commas and semicolons outside
// parentheses, then glues "key =", "= unit" pieces back together.
std::vector<std::string> tokenize(std::string_view text) {
    std::vector<std::string> raw;
    std::string cur;
    int depth = 0;
    auto digit = [](char d) { return d >= '0' && d <= '9'; };
    for (std::size_t k = 0; k < text.size(); ++k) {
        char c = text[k];
        // A comma between two digits is a decimal comma (patm=0,985bar, as
        // typed under a locale with a decimal comma), not a separator.
        if (c == ',' && k > 0 && k + 1 < text.size() && digit(text[k - 1]) && digit(text[k + 1])) c = '.';
        if (c == '(') ++depth;
        if (c == ')' && depth > 0) --depth;
        const bool sep = depth == 0 && (c == ' ' || c == '\t' || c == '\n' || c == '\r' || c == ',' || c == ';');
        if (sep) {
            if (!cur.empty()) raw.push_back(std::move(cur));
            cur.clear();
        } else {
            cur += c;
        }
    }
    if (!cur.empty()) raw.push_back(std::move(cur));
    std::vector<std::string> out;
    for (std::string& t : raw) {
        if (!out.empty() && (out.back().back() == '=' || t.front() == '='))
            out.back() += t;
        else
            out.push_back(std::move(t));
    }
    return out;
}

double core_of(const UnitDef& u, double v, double patm) {
    if (u.gauge) return v * u.factor + patm;
    return (v - u.zero) * u.factor + u.base;
}
double user_of(const UnitDef& u, double c, double patm) {
    if (u.gauge) return (c - patm) * u.inverse;
    return (c - u.base) * u.inverse + u.zero;
}

std::string quoted(std::string_view s) { return "'" + std::string(s) + "'"; }

}  // namespace

// ---------------------------------------------------------------------------

std::string_view quantity_name(Quantity q) {
    switch (q) {
    case Q::None: return "dimensionless";
    case Q::Pressure: return "pressure";
    case Q::Temperature: return "temperature";
    case Q::TemperatureDifference: return "temperature difference";
    case Q::SpecificEnergy: return "specific energy";
    case Q::SpecificEntropy: return "specific entropy";
    case Q::SpecificVolume: return "specific volume";
    case Q::Density: return "density";
    case Q::Speed: return "speed";
    case Q::DynamicViscosity: return "dynamic viscosity";
    case Q::ThermalConductivity: return "thermal conductivity";
    case Q::SurfaceTension: return "surface tension";
    case Q::KinematicViscosity: return "kinematic viscosity";
    case Q::ThermalDiffusivity: return "thermal diffusivity";
    case Q::MassFlow: return "mass flow";
    case Q::Power: return "power";
    case Q::HeatRate: return "heat rate";
    case Q::Percent: return "percentage";
    case Q::DifferentialPressure: return "differential pressure";
    case Q::Length: return "length";
    case Q::LinearExpansion: return "linear expansion coefficient";
    case Q::Text: return "text";
    }
    return "unknown quantity";
}

UnitSpec::UnitSpec() : name_("SI") {
    const Tables& t = tables();
    for (int q = 0; q < quantity_count; ++q) unit_[q] = t.systems[0][q];
}

UnitSpec UnitSpec::parse(std::string_view text) {
    const Tables& t = tables();
    const std::vector<std::string> words = tokenize(text);
    const std::string whole(text);
    auto where = [&] { return " in the unit text '" + whole + "'"; };

    int system = 0;
    std::size_t i = 0;
    if (!words.empty() && words[0].find('=') == std::string::npos) {
        const int s = find_system(words[0]);
        if (s >= 0) {
            system = s;
            i = 1;
        }
    }

    const UnitDef* bare[quantity_count] = {};
    const UnitDef* explicit_[quantity_count] = {};
    bool patm_given = false;
    double patm_value = 0.0;
    const UnitDef* patm_unit = nullptr;

    // Longest run of words starting at `first` (its text replaced by `head`)
    // that `accept` takes as a unit; returns the number of extra words used, or -1.
    auto longest = [&](std::size_t first, const std::string& head, auto accept) -> int {
        std::size_t extra = 0;
        while (extra < 3 && first + 1 + extra < words.size() &&
               words[first + 1 + extra].find('=') == std::string::npos)
            ++extra;
        for (int k = static_cast<int>(extra); k >= 0; --k) {
            std::string joined = head;
            for (int j = 1; j <= k; ++j) joined += " " + words[first + static_cast<std::size_t>(j)];
            if (accept(joined)) return k;
        }
        return -1;
    };

    for (; i < words.size(); ++i) {
        const std::string& w = words[i];
        const std::size_t eq = w.find('=');
        if (eq == std::string::npos) {
            // A unit given alone.
            Candidates found;
            const int k = longest(i, w, [&](const std::string& s) {
                found = find_units(s);
                std::size_t useful = 0;
                for (std::size_t c = 0; c < found.n; ++c)
                    if (found.u[c]->quantity != Q::None) ++useful;
                return useful > 0;
            });
            if (k < 0) {
                if (find_system(w) >= 0)
                    throw Error(ErrorCode::UnknownUnit, quoted(w) + " names a unit system; it must be the first word" +
                                                            where() + " (e.g. '" + w + " p=psig')");
                throw Error(ErrorCode::UnknownUnit,
                            "unknown word " + quoted(w) + where() + ": expected a unit system (" + system_list() +
                                ") first, then overrides such as p=psig, T=degF or patm=14.2psia");
            }
            for (std::size_t c = 0; c < found.n; ++c)
                if (found.u[c]->quantity != Q::None) bare[qi(found.u[c]->quantity)] = found.u[c];
            i += static_cast<std::size_t>(k);
            continue;
        }
        const std::string key = w.substr(0, eq);
        const std::string value = w.substr(eq + 1);
        if (key.empty())
            throw Error(ErrorCode::UnknownUnit, "missing quantity key before '=" + value + "'" + where() +
                                                    "; keys: " + key_list());
        if (iequals(key, "patm")) {
            if (patm_given) throw Error(ErrorCode::InvalidArgument, "patm is given twice" + where());
            double num = 0.0;
            const char* b = value.data();
            const char* e = value.data() + value.size();
            if (b != e && *b == '+') ++b;
            const auto res = std::from_chars(b, e, num);
            if (res.ec != std::errc() || !std::isfinite(num) || num <= 0.0)
                throw Error(ErrorCode::InvalidArgument,
                            "patm needs a positive number and a pressure unit, e.g. patm=14.2psia or "
                            "patm=0.0985MPa, not " + quoted(w) + where());
            const std::string rest(res.ptr, e);
            int k = -1;
            const UnitDef* u = nullptr;
            if (rest.empty()) {
                // Unit as the following word(s), or none.
                if (i + 1 < words.size() && words[i + 1].find('=') == std::string::npos) {
                    k = longest(i + 1, words[i + 1], [&](const std::string& s) {
                        u = find_unit(Q::Pressure, s);
                        return u != nullptr;
                    });
                    if (k >= 0) i += static_cast<std::size_t>(k) + 1;
                }
            } else {
                k = longest(i, rest, [&](const std::string& s) {
                    u = find_unit(Q::Pressure, s);
                    return u != nullptr;
                });
                if (k < 0)
                    throw Error(ErrorCode::UnknownUnit, "unknown pressure unit " + quoted(rest) + " in " + quoted(w) +
                                                            where() + "; pressure units: " + units_of(Q::Pressure));
                i += static_cast<std::size_t>(k);
            }
            if (u && u->gauge)
                throw Error(ErrorCode::InvalidArgument, "patm is the barometric pressure and must be given in an "
                                                        "absolute unit, not " + quoted(u->symbol) + where());
            patm_given = true;
            patm_value = num;
            patm_unit = u;
            continue;
        }
        Quantity q{};
        if (!find_key(key, q))
            throw Error(ErrorCode::UnknownUnit,
                        "unknown quantity key " + quoted(key) + where() + "; keys: " + key_list());
        if (value.empty())
            throw Error(ErrorCode::UnknownUnit, "missing unit after '" + key + "='" + where() + "; " +
                                                    std::string(quantity_name(q)) + " units: " + units_of(q));
        if (explicit_[qi(q)])
            throw Error(ErrorCode::InvalidArgument,
                        "the " + std::string(quantity_name(q)) + " unit is given twice" + where());
        const UnitDef* u = nullptr;
        const int k = longest(i, value, [&](const std::string& s) {
            u = find_unit(q, s);
            return u != nullptr;
        });
        if (k < 0) {
            const Candidates other = find_units(value);
            std::string msg = quoted(value) + " is not a " + std::string(quantity_name(q)) + " unit";
            if (other.n > 0) msg += " (it is a " + std::string(quantity_name(other.u[0]->quantity)) + " unit)";
            else msg = "unknown unit " + quoted(value) + " for " + key;
            throw Error(ErrorCode::UnknownUnit,
                        msg + where() + "; " + std::string(quantity_name(q)) + " units: " + units_of(q));
        }
        explicit_[qi(q)] = u;
        i += static_cast<std::size_t>(k);
    }

    UnitSpec spec;
    for (int q = 0; q < quantity_count; ++q) {
        spec.unit_[q] = t.systems[system][q];
        if (bare[q]) spec.unit_[q] = bare[q];
        if (explicit_[q]) spec.unit_[q] = explicit_[q];
    }

    std::string name = kSystems[system].name;
    for (int q = 0; q < quantity_count; ++q) {
        if (spec.unit_[q] == t.systems[system][q]) continue;
        const char* key = canonical_key(static_cast<Quantity>(q));
        if (!key) continue;  // not overridable (never differs)
        name += std::string(" ") + key + "=" + spec.unit_[q]->symbol;
    }
    if (patm_given) {
        if (!patm_unit) {
            const UnitDef* p = spec.unit_[qi(Q::Pressure)];
            patm_unit = p->gauge ? find_unit(Q::Pressure, p->absolute) : p;
        }
        spec.patm_ = patm_value * patm_unit->factor;
        name += " patm=" + format_number(patm_value) + patm_unit->symbol;
    }
    spec.name_ = std::move(name);
    return spec;
}

namespace {
[[noreturn]] void bad_quantity(Quantity q) {
    throw Error(ErrorCode::InvalidArgument,
                "internal: quantity code " + std::to_string(static_cast<int>(q)) + " has no unit");
}
}  // namespace

double UnitSpec::to_core(Quantity q, double value) const {
    const auto k = static_cast<unsigned>(q);
    if (k >= static_cast<unsigned>(quantity_count)) bad_quantity(q);
    return core_of(*unit_[k], value, patm_);
}

double UnitSpec::from_core(Quantity q, double value) const {
    const auto k = static_cast<unsigned>(q);
    if (k >= static_cast<unsigned>(quantity_count)) bad_quantity(q);
    return user_of(*unit_[k], value, patm_);
}

std::string UnitSpec::symbol(Quantity q) const {
    const auto k = static_cast<unsigned>(q);
    if (k >= static_cast<unsigned>(quantity_count)) bad_quantity(q);
    return unit_[k]->display;
}

std::string UnitSpec::unit_text(Quantity q) const {
    const auto k = static_cast<unsigned>(q);
    if (k >= static_cast<unsigned>(quantity_count)) bad_quantity(q);
    return unit_[k]->symbol;
}

bool UnitSpec::is_gauge(Quantity q) const {
    const auto k = static_cast<unsigned>(q);
    if (k >= static_cast<unsigned>(quantity_count)) bad_quantity(q);
    return unit_[k]->gauge;
}

std::string UnitSpec::name() const { return name_; }

std::string symbol(Quantity q, std::string_view system) { return UnitSpec::parse(system).symbol(q); }

double convert(double value, std::string_view from, std::string_view to, double patm_MPa) {
    const Candidates f = find_units(from), t = find_units(to);
    auto unknown = [](std::string_view text) {
        std::string msg = "unknown unit " + quoted(text);
        if (find_system(text) >= 0) msg += " (that is the name of a unit system; convert() takes single units)";
        msg += "; units are written like MPa, psig, degF, delta_degF, kJ/kg, Btu/lbm, kg/s";
        return Error(ErrorCode::UnknownUnit, msg);
    };
    if (f.n == 0) throw unknown(from);
    if (t.n == 0) throw unknown(to);
    for (std::size_t a = 0; a < f.n; ++a)
        for (std::size_t b = 0; b < t.n; ++b) {
            const UnitDef& uf = *f.u[a];
            const UnitDef& ut = *t.u[b];
            if (uf.quantity != ut.quantity) continue;
            if ((uf.gauge || ut.gauge) && !(std::isfinite(patm_MPa) && patm_MPa > 0.0))
                throw Error(ErrorCode::InvalidArgument,
                            "the barometric pressure for a gauge unit must be a positive number of MPa, not " +
                                format_number(patm_MPa));
            if (!std::isfinite(value))
                throw Error(ErrorCode::InvalidArgument, "the value to convert must be a finite number");
            const double core = core_of(uf, value, patm_MPa);
            // Absolute temperatures and pressures cannot be negative (a gauge
            // pressure can, down to -patm); rounding may leave a tiny -0.
            const bool temperature = uf.quantity == Q::Temperature;
            const bool absolute = temperature || uf.quantity == Q::Pressure;
            if (absolute && core < (temperature ? -1e-9 : -1e-12)) {
                char zero[32];  // the limit in the unit given, rounded for the sentence
                std::snprintf(zero, sizeof zero, "%.10g", user_of(uf, 0.0, patm_MPa));
                throw Error(ErrorCode::OutOfRange,
                            std::string(temperature ? "T = " : "p = ") + format_number(value) + " " + uf.display +
                                (temperature ? " is below absolute zero (" : " is below zero absolute pressure (") +
                                zero + " " + uf.display + ")");
            }
            if (&uf == &ut) return value;
            return user_of(ut, absolute && core < 0.0 ? 0.0 : core, patm_MPa);  // -0 from rounding: 0
        }
    throw Error(ErrorCode::InvalidArgument, "cannot convert " + std::string(quantity_name(f.u[0]->quantity)) + " " +
                                                quoted(from) + " to " +
                                                std::string(quantity_name(t.u[0]->quantity)) + " " + quoted(to));
}

const std::vector<UnitInfo>& known_units() {
    static const std::vector<UnitInfo> list = [] {
        std::vector<UnitInfo> r;
        for (const UnitDef& u : kUnits) {
            std::string d = u.description;
            std::vector<std::string> spellings;
            auto add = [&](std::string_view a) {
                if (a.empty() || a == u.symbol) return;
                for (const std::string& x : spellings)
                    if (x == a) return;
                spellings.emplace_back(a);
            };
            add(u.display);
            for_each_alias(u.aliases, add);
            std::string also;
            for (const std::string& x : spellings) also += (also.empty() ? "" : ", ") + x;
            if (!also.empty()) d += "; also written " + also;
            r.push_back(UnitInfo{u.symbol, u.quantity, std::move(d)});
        }
        return r;
    }();
    return list;
}

const std::vector<SystemInfo>& known_systems() {
    static const std::vector<SystemInfo> list = [] {
        const Tables& t = tables();
        std::vector<SystemInfo> r;
        for (std::size_t s = 0; s < kSystemCount; ++s) {
            std::string d = std::string(kSystems[s].description) + ":";
            bool first = true;
            for (int q = 0; q < quantity_count; ++q) {
                const char* key = canonical_key(static_cast<Quantity>(q));
                if (!key) continue;
                d += std::string(first ? " " : ", ") + key + " " + t.systems[s][q]->display;
                first = false;
            }
            r.push_back(SystemInfo{kSystems[s].name, std::move(d)});
        }
        return r;
    }();
    return list;
}

namespace {

// A UnitSpec as the wording of a sentence.
class SpecWording final : public ValueWording {
public:
    explicit SpecWording(const UnitSpec& spec) : spec_(spec) {}
    double from_core(Quantity q, double value) const override { return spec_.from_core(q, value); }
    std::string symbol(Quantity q) const override { return spec_.symbol(q); }

private:
    const UnitSpec& spec_;
};

}  // namespace

std::string range_sentence(const RangeError& e, const UnitSpec& spec) {
    return isentra::range_sentence(e, SpecWording(spec));
}

}  // namespace isentra::units
