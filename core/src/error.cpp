// SPDX-License-Identifier: MPL-2.0
#include "isentra/error.hpp"

#include <cstdio>

namespace isentra {
namespace {

const char* core_unit(Quantity q) {
    switch (q) {
    case Quantity::Pressure: return "MPa";
    case Quantity::Temperature: return "K";
    case Quantity::TemperatureDifference: return "K";
    case Quantity::SpecificEnergy: return "kJ/kg";
    case Quantity::SpecificEntropy: return "kJ/(kg K)";
    case Quantity::SpecificVolume: return "m3/kg";
    case Quantity::Density: return "kg/m3";
    case Quantity::Speed: return "m/s";
    case Quantity::DynamicViscosity: return "Pa s";
    case Quantity::ThermalConductivity: return "W/(m K)";
    case Quantity::SurfaceTension: return "N/m";
    case Quantity::KinematicViscosity:
    case Quantity::ThermalDiffusivity: return "m2/s";
    case Quantity::MassFlow: return "kg/s";
    case Quantity::Power: return "kW";
    case Quantity::HeatRate: return "kJ/kWh";
    case Quantity::Percent: return "%";
    default: return "";
    }
}

std::string num(double v) {
    char buf[32];
    std::snprintf(buf, sizeof buf, "%.6g", v);
    return buf;
}

std::string range_message(const std::string& input, Quantity q, double value, double low,
                          double high, const std::string& context) {
    const std::string u = core_unit(q);
    const std::string us = u.empty() ? "" : " " + u;
    std::string m = input + " = " + num(value) + us;
    if (std::isnan(value)) m = input + " is not a number";
    if (!std::isnan(low) && !std::isnan(high))
        m += " is outside " + num(low) + " to " + num(high) + us;
    else if (!std::isnan(low))
        m += (value == low ? " is at the limit " : " is below the minimum ") + num(low) + us;
    else if (!std::isnan(high))
        m += (value == high ? " is at the limit " : " is above the maximum ") + num(high) + us;
    else
        m += " is out of range";
    if (!context.empty()) m += " " + context;
    return m;
}

}  // namespace

RangeError::RangeError(const std::string& input, Quantity quantity, double value, double low,
                       double high, const std::string& context, ErrorCode code)
    : Error(code, range_message(input, quantity, value, low, high, context)),
      input_(input), quantity_(quantity), value_(value), low_(low), high_(high),
      context_(context) {}

}  // namespace isentra
