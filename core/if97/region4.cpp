// SPDX-License-Identifier: MPL-2.0
// IAPWS-IF97 region 4, the saturation line: saturation-pressure equation
// R7-97(2012) Eq. (30) and saturation-temperature equation Eq. (31), both
// solutions of the implicit Eq. (29); coefficients Table 34.
#include <cmath>

#include "isentra/if97/if97.hpp"

namespace isentra::if97 {
namespace {

// R7-97(2012) Table 34.
constexpr double n1 = 0.11670521452767e4;
constexpr double n2 = -0.72421316703206e6;
constexpr double n3 = -0.17073846940092e2;
constexpr double n4 = 0.12020824702470e5;
constexpr double n5 = -0.32325550322333e7;
constexpr double n6 = 0.14915108613530e2;
constexpr double n7 = -0.48232657361591e4;
constexpr double n8 = 0.40511340542057e6;
constexpr double n9 = -0.23855557567849;
constexpr double n10 = 0.65017534844798e3;

}  // namespace

// Eq. (30), with theta from Eq. (29b); p* = 1 MPa, T* = 1 K.
double psat(double T) {
    const double th = T + n9 / (T - n10);
    const double th2 = th * th;
    const double A = th2 + n1 * th + n2;
    const double B = n3 * th2 + n4 * th + n5;
    const double C = n6 * th2 + n7 * th + n8;
    const double x = 2.0 * C / (-B + std::sqrt(B * B - 4.0 * A * C));
    const double x2 = x * x;
    return x2 * x2;
}

// Eq. (31), with beta = (p/p*)^(1/4) from Eq. (29a).
double tsat(double p) {
    const double beta = std::sqrt(std::sqrt(p));
    const double b2 = beta * beta;
    const double E = b2 + n3 * beta + n6;
    const double F = n1 * b2 + n4 * beta + n7;
    const double G = n2 * b2 + n5 * beta + n8;
    const double D = 2.0 * G / (-F - std::sqrt(F * F - 4.0 * E * G));
    const double nd = n10 + D;
    return 0.5 * (nd - std::sqrt(nd * nd - 4.0 * (n9 + n10 * D)));
}

}  // namespace isentra::if97
