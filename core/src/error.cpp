// SPDX-License-Identifier: MPL-2.0
#include "isentra/error.hpp"

#include <cmath>
#include <cstdio>

#include "isentra/units.hpp"

namespace isentra {
namespace {

std::string num(double v, int digits = 6) {
    char buf[40];
    if (v == 0) v = 0;  // no "-0"
    std::snprintf(buf, sizeof buf, "%.*g", digits, v);
    return buf;
}

// One sentence for an input outside [low, high], in the units of `spec`.
// Numbers get 6 significant digits, more where the value and a limit would
// otherwise print alike ("310.999 °C is below the minimum 310.999 °C").
std::string range_sentence(const std::string& input, Quantity q, double value, double low, double high,
                           const std::string& context, const units::UnitSpec& spec) {
    auto u = [&](double v) { return spec.from_core(q, v); };
    const bool lo = !std::isnan(low), hi = !std::isnan(high);
    int digits = 6;
    if (!std::isnan(value)) {
        auto alike = [&](double limit) {
            return limit != value && num(u(limit), digits) == num(u(value), digits);
        };
        while (digits < 15 && ((lo && alike(low)) || (hi && alike(high)))) ++digits;
    }
    const std::string sym = spec.symbol(q);
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
