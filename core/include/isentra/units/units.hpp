// SPDX-License-Identifier: MPL-2.0
// Units of measure. The core computes in core units (quantity.hpp); a user
// states a unit system in a short text, e.g. "SI" (the default), "US",
// "US p=psig", "bar", "SI T=K p=kPa", "US p=psig patm=14.2 psia".
//
// Conversion factors are exact, from NIST SP 811 (2008) Appendix B and the
// international yard and pound agreement (1959): 1 lbm = 0.45359237 kg,
// 1 ft = 0.3048 m, 1 Btu_IT = 1055.05585262 J, 1 lbf = 4.4482216152605 N,
// 1 psi = 6894.757293168361 Pa, degF = degC * 1.8 + 32, 1 h = 3600 s.
//
// Syntax of a unit text (all parts optional; empty text = "SI"):
//
//   unit-text := [system] { override }
//   system    := SI | US | BAR | KPA | K | SI-K          (case-insensitive; first word only)
//   override  := key=unit | unit | patm=<number>[<unit>]
//
// Words are separated by spaces, commas or semicolons (not inside
// parentheses); spaces around '=' are allowed, and a unit may contain spaces
// ("mu=Pa s", "s=kJ/(kg K)").
// Keys (case-sensitive where p/P clash, otherwise case-insensitive):
//   p|pressure, T|temperature, dT|deltaT, h|energy, s|entropy|cp, v|volume,
//   rho|density, w|speed, mu|viscosity, lambda|conductivity, sigma|tension,
//   nu|kinematic, a|alpha|diffusivity, m|mdot|massflow, P|power, hr|heatrate,
//   pct|percent, dp|differential (differential pressure), L|length (diameters),
//   exp|expansion (linear expansion coefficient).
// A unit given alone (e.g. "psig", "degF", "m2/s") overrides every quantity it
// is a unit of: "degF" alone sets T=degF and dT=delta_degF, "m2/s" sets nu and a.
// Explicit key=unit overrides are applied after bare units; the same key twice
// is an error.
// patm is the barometric pressure for gauge units (psig, barg, kPag, MPag);
// default 101.325 kPa. Its unit may be attached or the next word
// ("patm=14.2psia", "patm=14.2 psia"); a bare number is read in the text's
// pressure unit (its absolute counterpart for a gauge unit).
// Unit symbols are matched exactly first, then ignoring ASCII case; spaces,
// '(', ')', '*', '-', '_', '.', '^', '·' are ignored, '°' reads as "deg",
// '³'/'²' as 3/2, 'Δ' as "delta", 'µ'/'μ' as "u".
#pragma once

#include <string>
#include <string_view>
#include <vector>

#include "isentra/base/error.hpp"
#include "isentra/base/quantity.hpp"

namespace isentra::units {

inline constexpr double standard_atmosphere_MPa = 0.101325;  // ISO 2533 / NIST SP 811

// Number of Quantity enumerators (None .. Text).
inline constexpr int quantity_count = static_cast<int>(Quantity::Text) + 1;

namespace detail {
struct UnitDef;  // one unit of measure; defined in units.cpp
}

// A parsed unit specification: a named base system plus per-quantity
// overrides and the barometric pressure used for gauge pressures.
// Cheap to copy; to_core/from_core are a multiply and an add.
class UnitSpec {
public:
    UnitSpec();  // SI
    // Parses a unit text. Empty text means SI. Throws isentra::Error with
    // ErrorCode::UnknownUnit naming the word it did not understand
    // (ErrorCode::InvalidArgument for a malformed patm or a repeated key).
    static UnitSpec parse(std::string_view text);

    double to_core(Quantity q, double value) const;    // user units -> core units
    double from_core(Quantity q, double value) const;  // core units -> user units
    std::string symbol(Quantity q) const;              // e.g. "psia", "°F", "kJ/kg"
    std::string unit_text(Quantity q) const;           // ASCII symbol as accepted by convert(), e.g. "degF"
    std::string name() const;                          // canonical text of this spec, e.g. "US p=psig"
    double patm_MPa() const noexcept { return patm_; }  // barometric pressure for gauge units
    bool is_gauge(Quantity q) const;                   // true if q's unit is a gauge pressure

private:
    const detail::UnitDef* unit_[quantity_count];  // per Quantity
    double patm_ = standard_atmosphere_MPa;  // MPa, for gauge units
    std::string name_;
};

// The sentence of a range error in the units of `spec` (the error's what()
// gives it in core units), e.g. "p = 29007.5 psia is above the maximum
// 14503.8 psia (the upper limit of IAPWS-IF97)".
std::string range_sentence(const RangeError& e, const UnitSpec& spec);

// Unit symbol of quantity q under a named system ("SI", "US", ...), for
// descriptions. Accepts any unit text that UnitSpec::parse accepts.
std::string symbol(Quantity q, std::string_view system);

// Lower-case English name of a quantity kind: "pressure", "temperature difference", ...
std::string_view quantity_name(Quantity q);

// STEAM.CONVERT: converts value from one unit to another of the same kind.
// Units are single unit symbols ("psig", "degF", "Btu/lbm", "kJ/kg", ...);
// temperature differences use "delta_degF"/"delta_K" style names (see docs).
// A plain temperature symbol ("degF", "K") means an absolute temperature,
// unless the other unit is a delta_ unit, then both are differences.
// "%" and "fraction" convert into each other (85 % = 0.85).
// patm_MPa is the barometric pressure for gauge units.
// Unknown unit -> Error(UnknownUnit); different kinds -> Error(InvalidArgument).
double convert(double value, std::string_view from, std::string_view to,
               double patm_MPa = standard_atmosphere_MPa);

struct UnitInfo {
    std::string symbol;       // as accepted by convert() and in overrides
    Quantity quantity;
    std::string description;  // e.g. "pound-force per square inch, gauge"
};
const std::vector<UnitInfo>& known_units();

struct SystemInfo {
    std::string name;         // "SI", "US", "BAR", "KPA", "K"
    std::string description;
};
const std::vector<SystemInfo>& known_systems();

}  // namespace isentra::units
