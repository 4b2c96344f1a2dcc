// SPDX-License-Identifier: MPL-2.0
// Units of measure. The core computes in core units (quantity.hpp); a user
// states a unit system in a short text, e.g. "SI" (the default), "US",
// "US p=psig", "bar", "SI T=K p=kPa", "US p=psig patm=14.2 psia".
//
// Conversion factors are exact, from NIST SP 811 (2008) Appendix B and the
// international yard and pound agreement (1959): 1 lbm = 0.45359237 kg,
// 1 ft = 0.3048 m, 1 Btu_IT = 1055.05585262 J, 1 lbf = 4.4482216152605 N,
// 1 psi = 6894.757293168361 Pa, degF = degC * 1.8 + 32, 1 h = 3600 s.
#pragma once

#include <string>
#include <string_view>
#include <vector>

#include "isentra/quantity.hpp"

namespace isentra::units {

inline constexpr double standard_atmosphere_MPa = 0.101325;  // ISO 2533 / NIST SP 811

// A parsed unit specification: a named base system plus per-quantity
// overrides and the barometric pressure used for gauge pressures.
class UnitSpec {
public:
    UnitSpec();  // SI
    // Parses a unit text. Empty text means SI. Throws isentra::Error with
    // ErrorCode::UnknownUnit naming the word it did not understand.
    static UnitSpec parse(std::string_view text);

    double to_core(Quantity q, double value) const;    // user units -> core units
    double from_core(Quantity q, double value) const;  // core units -> user units
    std::string symbol(Quantity q) const;              // e.g. "psia", "°F", "kJ/kg"
    std::string name() const;                          // canonical text of this spec, e.g. "US p=psig"

private:
    struct Unit;  // defined in units.cpp
    const Unit* unit_[32];  // per Quantity
    double patm_ = standard_atmosphere_MPa;  // MPa, for gauge units
    std::string name_;
};

// Unit symbol of quantity q under a named system ("SI", "US", ...), for descriptions.
std::string symbol(Quantity q, std::string_view system);

// STEAM.CONVERT: converts value from one unit to another of the same kind.
// Units are single unit symbols ("psig", "degF", "Btu/lbm", "kJ/kg", ...);
// temperature differences use "delta_degF"/"delta_K" style names (see docs).
// patm_MPa is the barometric pressure for gauge units.
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
