// SPDX-License-Identifier: MPL-2.0
#include "isentra/error.hpp"

#include <cmath>
#include <cstdio>

#include "isentra/units.hpp"

namespace isentra {
namespace {

std::string num(double v) {
    char buf[32];
    std::snprintf(buf, sizeof buf, "%.6g", v);
    return buf;
}

// One sentence for an input outside [low, high], in the units of `spec`.
std::string range_sentence(const std::string& input, Quantity q, double value, double low, double high,
                           const std::string& context, const units::UnitSpec& spec) {
    auto u = [&](double v) { return spec.from_core(q, v); };
    const std::string sym = spec.symbol(q);
    auto with_unit = [&](double v) { return sym.empty() ? num(v) : num(v) + " " + sym; };
    std::string m = std::isnan(value) ? input + " is not a number" : input + " = " + with_unit(u(value));
    const bool lo = !std::isnan(low), hi = !std::isnan(high);
    if (lo && hi)
        m += " is outside the range " + num(u(low)) + " to " + with_unit(u(high));
    else if (lo)
        m += (value == low ? " is at the limit " : " is below the minimum ") + with_unit(u(low));
    else if (hi)
        m += (value == high ? " is at the limit " : " is above the maximum ") + with_unit(u(high));
    else
        m += " is out of range";
    if (!context.empty()) m += " " + context;
    return m;
}

// Core units: MPa and kelvin, the rest as in SI (quantity.hpp).
const units::UnitSpec& core_units() {
    static const units::UnitSpec spec = units::UnitSpec::parse("K");  // built once, immutable
    return spec;
}

}  // namespace

RangeError::RangeError(const std::string& input, Quantity quantity, double value, double low,
                       double high, const std::string& context, ErrorCode code)
    : Error(code, range_sentence(input, quantity, value, low, high, context, core_units())),
      input_(input), quantity_(quantity), value_(value), low_(low), high_(high),
      context_(context) {}

std::string RangeError::sentence(const units::UnitSpec& spec) const {
    return range_sentence(input_, quantity_, value_, low_, high_, context_, spec);
}

}  // namespace isentra
