// SPDX-License-Identifier: MPL-2.0
// States below the triple-point pressure (611.657 Pa), where python3-iapws is
// not used as an oracle (see tests/oracle/gen_if97.py). They are checked
// against the release's own definitions: IF97 region 2 is valid for
// 0 < p <= ps(T) at 273.15 K <= T <= 623.15 K and region 5 for p <= 50 MPa
// (R7-97(2012) Sec. 2, Fig. 1); below ps(273.15 K) = 611.213 Pa (Eq. 30) no
// liquid exists in IF97, so (p,h) and (p,s) below the region-2 value at
// 273.15 K are out of range, and every inverse must return the (p,T) state
// it came from.
#include <gtest/gtest.h>

#include <cmath>

#include "isentra/base/error.hpp"
#include "isentra/if97/if97.hpp"
#include "isentra/properties/state.hpp"

namespace {

using namespace isentra;

TEST(LowPressure, VapourBelowTheTriplePointRoundTrips) {
    int n = 0;
    for (double p = 1e-7; p < 6.1e-4; p *= 1.9) {
        for (double T = 273.16; T <= 2273.15; T += 97.3) {
            const State a = state_pT(p, T);
            EXPECT_EQ(a.phase, Phase::Vapour) << p << " " << T;
            EXPECT_EQ(a.region, T > if97::T_25 ? 5 : 2) << p << " " << T;
            const State b = state_ph(p, a.h);
            EXPECT_NEAR(b.T, T, 1e-6) << "ph " << p << " " << T;  // the project's inverse tolerance
            const State c = state_ps(p, a.s);
            EXPECT_NEAR(c.T, T, 1e-6) << "ps " << p << " " << T;
            const State d = state_hs(a.h, a.s);
            EXPECT_NEAR(d.T, T, 1e-6) << "hs " << p << " " << T;
            EXPECT_NEAR(d.p, p, 1e-9 * p) << "hs " << p << " " << T;
            ++n;
        }
    }
    EXPECT_GT(n, 100);
}

TEST(LowPressure, NoLiquidBelowTheLowestSaturationPressure) {
    const double p = 5e-4;                                 // 500 Pa < ps(273.15 K) = 611.213 Pa (R7-97 Eq. 30)
    const double h_min = if97::region2(p, 273.15).h;       // vapour at the lowest IF97 temperature
    EXPECT_THROW(state_ph(p, h_min - 1.0), RangeError);
    EXPECT_THROW(state_ph(p, 100.0), RangeError);          // a liquid enthalpy at 500 Pa
    EXPECT_THROW(saturation_p(p), RangeError);             // below the triple-point pressure
    EXPECT_THROW(state_px(p, 0.5), RangeError);
    EXPECT_NO_THROW(state_ph(p, h_min + 1.0));
}

TEST(LowPressure, IdealGasLimit) {
    // At vanishing pressure region 2 tends to the ideal gas: p v / (R T) -> 1
    // (R7-97(2012) Eq. 15: the residual part vanishes with pi).
    for (double T : {300.0, 600.0, 1000.0}) {
        const State st = state_pT(1e-9, T);
        EXPECT_NEAR(st.p * 1e3 * st.v / (if97::R * T), 1.0, 1e-9) << T;
    }
}

}  // namespace
