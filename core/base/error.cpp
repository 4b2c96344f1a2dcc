// SPDX-License-Identifier: MPL-2.0
#include "isentra/base/error.hpp"

#include <cmath>
#include <cstdio>

namespace isentra {
namespace {

std::string num(double v, int digits = 6) {
    char buf[40];
    if (v == 0) v = 0;  // no "-0"
    std::snprintf(buf, sizeof buf, "%.*g", digits, v);
    return buf;
}

// One sentence for an input outside [low, high], worded by `w`.
// Numbers get 6 significant digits, more where the value and a limit would
// otherwise print alike ("310.999 °C is below the minimum 310.999 °C").
std::string range_sentence(const std::string& input, Quantity q, double value, double low, double high,
                           const std::string& context, const ValueWording& w) {
    auto u = [&](double v) { return w.from_core(q, v); };
    const bool lo = !std::isnan(low), hi = !std::isnan(high);
    int digits = 6;
    if (!std::isnan(value)) {
        auto alike = [&](double limit) {
            return limit != value && num(u(limit), digits) == num(u(value), digits);
        };
        while (digits < 15 && ((lo && alike(low)) || (hi && alike(high)))) ++digits;
    }
    const std::string sym = w.symbol(q);
    auto with_unit = [&](double v) { return sym.empty() ? num(v, digits) : num(v, digits) + " " + sym; };
    std::string m = std::isnan(value) ? input + " is not a number" : input + " = " + with_unit(u(value));
    if (lo && hi)
        m += " is outside the range " + num(u(low), digits) + " to " + with_unit(u(high));
    else if (lo)
        m += (value == low ? " is at the limit " : " is below the minimum ") + with_unit(u(low));
    else if (hi)
        m += (value == high ? " is at the limit " : " is above the maximum ") + with_unit(u(high));
    else
        m += " is out of range";
    if (!context.empty()) m += " " + context;
    return m;
}

class CoreWording final : public ValueWording {
public:
    double from_core(Quantity, double value) const override { return value; }
    std::string symbol(Quantity q) const override { return core_symbol(q); }
};

}  // namespace

const char* core_symbol(Quantity q) noexcept {
    switch (q) {
        case Quantity::None: return "";
        case Quantity::Pressure: return "MPa";
        case Quantity::Temperature: return "K";
        case Quantity::TemperatureDifference: return "K";
        case Quantity::SpecificEnergy: return "kJ/kg";
        case Quantity::SpecificEntropy: return "kJ/(kg\u00B7K)";
        case Quantity::SpecificVolume: return "m\u00B3/kg";
        case Quantity::Density: return "kg/m\u00B3";
        case Quantity::Speed: return "m/s";
        case Quantity::DynamicViscosity: return "Pa\u00B7s";
        case Quantity::ThermalConductivity: return "W/(m\u00B7K)";
        case Quantity::SurfaceTension: return "N/m";
        case Quantity::KinematicViscosity: return "m\u00B2/s";
        case Quantity::ThermalDiffusivity: return "m\u00B2/s";
        case Quantity::MassFlow: return "kg/s";
        case Quantity::Power: return "kW";
        case Quantity::HeatRate: return "kJ/kWh";
        case Quantity::Percent: return "%";
        case Quantity::DifferentialPressure: return "Pa";
        case Quantity::Length: return "m";
        case Quantity::LinearExpansion: return "1/K";
        case Quantity::Text: return "";
    }
    return "";
}

const ValueWording& core_wording() {
    static const CoreWording wording;  // stateless, immutable
    return wording;
}

RangeError::RangeError(const std::string& input, Quantity quantity, double value, double low,
                       double high, const std::string& context, ErrorCode code)
    : Error(code, range_sentence(input, quantity, value, low, high, context, core_wording())),
      input_(input), quantity_(quantity), value_(value), low_(low), high_(high),
      context_(context) {}

std::string range_sentence(const RangeError& e, const ValueWording& w) {
    return range_sentence(e.input(), e.quantity(), e.value(), e.low(), e.high(), e.context(), w);
}

}  // namespace isentra
