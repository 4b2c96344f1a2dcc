// SPDX-License-Identifier: MPL-2.0
// IAPWS-IF97 boundary between regions 2 and 3 (B23-equation):
// R7-97(2012) Eqs. (5) and (6), coefficients Table 1; p* = 1 MPa, T* = 1 K.
#include <cmath>

#include "isentra/if97/if97.hpp"

namespace isentra::if97 {
namespace {

// R7-97(2012) Table 1.
constexpr double n1 = 0.34805185628969e3;
constexpr double n2 = -0.11671859879975e1;
constexpr double n3 = 0.10192970039326e-2;
constexpr double n4 = 0.57254459862746e3;
constexpr double n5 = 0.13918839778870e2;

}  // namespace

// Eq. (5).
double b23_p(double T) { return n1 + n2 * T + n3 * T * T; }

// Eq. (6).
double b23_T(double p) { return n4 + std::sqrt((p - n5) / n3); }

}  // namespace isentra::if97
