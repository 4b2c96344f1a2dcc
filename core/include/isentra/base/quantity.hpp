// SPDX-License-Identifier: MPL-2.0
// Physical quantities known to Isentra. Every number that crosses the
// boundary between the core and a user (cell, CLI) has one of these kinds;
// the units layer converts between the core's units and the user's.
#pragma once

namespace isentra {

// Core units (the units of IAPWS-IF97 where it has them):
enum class Quantity {
    None,                 // dimensionless (quality, ratios, efficiencies as fractions)
    Pressure,             // MPa (absolute)
    Temperature,          // K (absolute)
    TemperatureDifference,// K
    SpecificEnergy,       // kJ/kg   (h, u, specific work)
    SpecificEntropy,      // kJ/(kg K)  (s, cp, cv)
    SpecificVolume,       // m3/kg
    Density,              // kg/m3
    Speed,                // m/s
    DynamicViscosity,     // Pa s
    ThermalConductivity,  // W/(m K)
    SurfaceTension,       // N/m
    KinematicViscosity,   // m2/s
    ThermalDiffusivity,   // m2/s
    MassFlow,             // kg/s
    Power,                // kW
    HeatRate,             // kJ/kWh
    Percent,              // % (efficiency or uncertainty shown as a percentage)
    DifferentialPressure, // Pa (a difference of pressures, e.g. across a flow meter; never gauge/absolute)
    Length,               // m (diameters of pipes and meter bores)
    LinearExpansion,      // 1/K (linear thermal expansion coefficient of a material)
    Text                  // a text argument (units string, names); not converted
};

// The symbol of a quantity's core unit, as the sentences print it ("MPa",
// "K", "kJ/(kg·K)"; "" for dimensionless values and texts). The units layer
// has the same symbols for its system "K" (a test checks they agree).
const char* core_symbol(Quantity q) noexcept;

}  // namespace isentra
