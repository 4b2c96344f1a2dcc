// SPDX-License-Identifier: MPL-2.0
// The typed errors of the Isentra core. Every failure the core reports is
// an isentra::Error (derived from std::runtime_error, so what() is always a
// readable sentence). Nothing else escapes from the core's public functions.
#pragma once

#include <cmath>
#include <stdexcept>
#include <string>

#include "isentra/base/quantity.hpp"

namespace isentra {

enum class ErrorCode {
    OutOfRange,      // an input lies outside the validity range of the formulation
    NotDefined,      // the property is not defined for this state (e.g. cp inside the dome)
    InvalidArgument, // malformed input: text where a number belongs, NaN, x outside [0,1], ...
    Impossible,      // an impossible pair, e.g. (p,T) exactly on the saturation line
    NoConvergence,   // an iteration did not converge (should never happen inside the range)
    UnknownUnit      // unit text not understood
};

class Error : public std::runtime_error {
public:
    Error(ErrorCode code, const std::string& message)
        : std::runtime_error(message), code_(code) {}
    ErrorCode code() const noexcept { return code_; }

private:
    ErrorCode code_;
};

// An input outside its valid range. Carries the structured facts so that a
// front end can re-word the sentence in the user's own units:
// input  - the argument's name as the user knows it ("p", "T", "h", ...)
// quantity - its physical kind (for unit conversion)
// value  - the offending value, in core units
// low, high - the permitted interval in core units (NaN where unbounded)
// context - optional words saying which limit ("at this pressure", "region 5")
class RangeError : public Error {
public:
    // code: OutOfRange, or Impossible where the limit is a physical one (e.g. a
    // steam reading at or below the saturation temperature).
    RangeError(const std::string& input, Quantity quantity, double value, double low,
               double high, const std::string& context = {},
               ErrorCode code = ErrorCode::OutOfRange);
    const std::string& input() const noexcept { return input_; }
    Quantity quantity() const noexcept { return quantity_; }
    double value() const noexcept { return value_; }
    double low() const noexcept { return low_; }
    double high() const noexcept { return high_; }
    const std::string& context() const noexcept { return context_; }

private:
    std::string input_;
    Quantity quantity_;
    double value_, low_, high_;
    std::string context_;
};

// How a sentence writes a value of some quantity: converted from core units
// and followed by its unit symbol. The units layer words sentences in a
// user's units through this (units::range_sentence); the error's own what()
// uses the core units.
class ValueWording {
public:
    virtual ~ValueWording() = default;
    virtual double from_core(Quantity q, double value) const = 0;
    virtual std::string symbol(Quantity q) const = 0;  // "" for a dimensionless value
};

// The core units' wording: values as they are, the core unit symbols.
const ValueWording& core_wording();

// The sentence of a range error ("p = 120 MPa is above the maximum 100 MPa
// ..."), worded by `w`. Numbers get 6 significant digits, more where the value
// and a limit would otherwise print alike.
std::string range_sentence(const RangeError& e, const ValueWording& w);

}  // namespace isentra
