// SPDX-License-Identifier: MPL-2.0
// Internal helpers shared by the equipment and cycle calculations
// (core/engineering/equipment.cpp, cycle.cpp): argument checks with the
// sentence of their RangeError, the number format of error messages, and
// the feedwater heater's energy-balance checks. Not a public header.
#pragma once

#include <cmath>
#include <cstdio>
#include <limits>
#include <string>

#include "isentra/base/error.hpp"
#include "isentra/properties/state.hpp"

namespace isentra::engineering::detail {

constexpr double nan_v = std::numeric_limits<double>::quiet_NaN();
constexpr double none = nan_v;  // "no bound" in a RangeError

// A number as error messages write it (6 significant digits, no "-0").
inline std::string num(double v) {
    char buf[40];
    if (v == 0) v = 0;
    std::snprintf(buf, sizeof buf, "%.6g", v);
    return buf;
}

inline void check_finite(const char* name, Quantity q, double v) {
    if (!std::isfinite(v)) throw RangeError(name, q, v, none, none);
}

inline void check_nonneg(const char* name, Quantity q, double v, const char* context) {
    check_finite(name, q, v);
    if (v < 0) throw RangeError(name, q, v, 0.0, none, context);
}

inline void check_positive(const char* name, Quantity q, double v, const char* context) {
    check_finite(name, q, v);
    if (!(v > 0)) throw RangeError(name, q, v, 0.0, none, context);
}

// Vapour quality: x inside the wet region; outside it, below the critical
// pressure, the equilibrium quality (h - h')/(h'' - h') at the state's
// pressure (as quality() gives it, but also for steam hotter than Tc, e.g. a
// high-pressure turbine exhaust); NaN at or above the critical pressure.
inline double quality_or_nan(const State& st) {
    try {
        return quality(st);
    } catch (const Error&) {
        return nan_v;
    }
}

// A heater does not cool the feedwater: h_after (named `name`) is not below
// h_before; `before` says in the sentence what h_before is.
inline void check_heated(const char* name, double h_after, double h_before, const char* before) {
    if (h_after < h_before)
        throw RangeError(name, Quantity::SpecificEnergy, h_after, h_before, none,
                         std::string("(") + before + ": a heater does not cool the feedwater)", ErrorCode::Impossible);
}

// A feedwater heater's drain and extraction steam: the drain leaves no colder
// than the feedwater inlet h_fw_in, and the extraction steam h_ext brings more
// enthalpy than the drain h_drain takes away.
inline void check_drain_and_extraction(double h_fw_in, double h_drain, double h_ext) {
    if (h_drain < h_fw_in)
        throw RangeError("h_drain", Quantity::SpecificEnergy, h_drain, h_fw_in, none,
                         "(the feedwater inlet enthalpy h_fw_in: the drain cannot leave colder than the coldest "
                         "water it meets)",
                         ErrorCode::Impossible);
    if (!(h_ext > h_drain))
        throw RangeError("h_ext", Quantity::SpecificEnergy, h_ext, h_drain, none,
                         "(the drain enthalpy h_drain: the extraction steam must bring more enthalpy than the "
                         "drain takes away)");
}

}  // namespace isentra::engineering::detail
