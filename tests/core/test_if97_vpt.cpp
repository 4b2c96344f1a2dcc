// SPDX-License-Identifier: MPL-2.0
// Backward v(p,T) for region 3, IAPWS SR5-05(2016): subregion boundary
// equations (Tables 3 and 11) and the subregion equations (Tables 5 and 13).
#include <gtest/gtest.h>

#include <cmath>

#include "isentra/if97/if97.hpp"

// Internal to the core (core/if97/vpt.cpp); not part of isentra/if97/if97.hpp.
namespace isentra::if97::vpt_detail {
double T3ab(double p);
double T3cd(double p);
double T3ef(double p);
double T3gh(double p);
double T3ij(double p);
double T3jk(double p);
double T3mn(double p);
double T3op(double p);
double T3qu(double p);
double T3rx(double p);
double T3uv(double p);
double T3wx(double p);
char subregion(double p, double T, int side);
}  // namespace isentra::if97::vpt_detail

namespace {

using namespace isentra::if97;
namespace d = isentra::if97::vpt_detail;

constexpr double kRel = 1e-8;  // 9-digit check values

void expect_rel(double got, double want, double rel = kRel) {
    EXPECT_NEAR(got, want, std::fabs(want) * rel) << "want " << want;
}

TEST(IF97Region3VpTBoundaries, Table3) {
    expect_rel(d::T3ab(40.0), 6.930341408e2);  // SR5-05(2016) Table 3
    expect_rel(d::T3cd(25.0), 6.493659208e2);  // SR5-05(2016) Table 3
    expect_rel(d::T3ef(40.0), 7.139593992e2);  // SR5-05(2016) Table 3
    expect_rel(d::T3gh(23.0), 6.498873759e2);  // SR5-05(2016) Table 3
    expect_rel(d::T3ij(23.0), 6.515778091e2);  // SR5-05(2016) Table 3
    expect_rel(d::T3jk(23.0), 6.558338344e2);  // SR5-05(2016) Table 3
    expect_rel(d::T3mn(22.8), 6.496054133e2);  // SR5-05(2016) Table 3
    expect_rel(d::T3op(22.8), 6.500106943e2);  // SR5-05(2016) Table 3
    expect_rel(d::T3qu(22.0), 6.456355027e2);  // SR5-05(2016) Table 3
    expect_rel(d::T3rx(22.0), 6.482622754e2);  // SR5-05(2016) Table 3
}

TEST(IF97Region3VpTBoundaries, Table11) {
    expect_rel(d::T3uv(22.3), 6.477996121e2);  // SR5-05(2016) Table 11
    expect_rel(d::T3wx(22.3), 6.482049480e2);  // SR5-05(2016) Table 11
}

TEST(IF97Region3VpTBoundaries, P3cdIsWhereT3cdMeetsSaturation) {
    // SR5-05(2016) Sec. 5.1: p3cd = 1.900881189173929e1 MPa is given by
    // Tsat(p) - T3cd(p) = 0.
    const double p3cd = 1.900881189173929e1;
    EXPECT_NEAR(tsat(p3cd), d::T3cd(p3cd), 1e-9);
}

struct VCase {
    char sub;
    double p, T, v;
};

// SR5-05(2016) Table 5 (subregions 3a..3t) and Table 13 (3u..3z).
constexpr VCase kCases[] = {
    {'a', 50.0, 630.0, 1.470853100e-3},    {'a', 80.0, 670.0, 1.503831359e-3},     // Table 5
    {'b', 50.0, 710.0, 2.204728587e-3},    {'b', 80.0, 750.0, 1.973692940e-3},     // Table 5
    {'c', 20.0, 630.0, 1.761696406e-3},    {'c', 30.0, 650.0, 1.819560617e-3},     // Table 5
    {'d', 26.0, 656.0, 2.245587720e-3},    {'d', 30.0, 670.0, 2.506897702e-3},     // Table 5
    {'e', 26.0, 661.0, 2.970225962e-3},    {'e', 30.0, 675.0, 3.004627086e-3},     // Table 5
    {'f', 26.0, 671.0, 5.019029401e-3},    {'f', 30.0, 690.0, 4.656470142e-3},     // Table 5
    {'g', 23.6, 649.0, 2.163198378e-3},    {'g', 24.0, 650.0, 2.166044161e-3},     // Table 5
    {'h', 23.6, 652.0, 2.651081407e-3},    {'h', 24.0, 654.0, 2.967802335e-3},     // Table 5
    {'i', 23.6, 653.0, 3.273916816e-3},    {'i', 24.0, 655.0, 3.550329864e-3},     // Table 5
    {'j', 23.5, 655.0, 4.545001142e-3},    {'j', 24.0, 660.0, 5.100267704e-3},     // Table 5
    {'k', 23.0, 660.0, 6.109525997e-3},    {'k', 24.0, 670.0, 6.427325645e-3},     // Table 5
    {'l', 22.6, 646.0, 2.117860851e-3},    {'l', 23.0, 646.0, 2.062374674e-3},     // Table 5
    {'m', 22.6, 648.6, 2.533063780e-3},    {'m', 22.8, 649.3, 2.572971781e-3},     // Table 5
    {'n', 22.6, 649.0, 2.923432711e-3},    {'n', 22.8, 649.7, 2.913311494e-3},     // Table 5
    {'o', 22.6, 649.1, 3.131208996e-3},    {'o', 22.8, 649.9, 3.221160278e-3},     // Table 5
    {'p', 22.6, 649.4, 3.715596186e-3},    {'p', 22.8, 650.2, 3.664754790e-3},     // Table 5
    {'q', 21.1, 640.0, 1.970999272e-3},    {'q', 21.8, 643.0, 2.043919161e-3},     // Table 5
    {'r', 21.1, 644.0, 5.251009921e-3},    {'r', 21.8, 648.0, 5.256844741e-3},     // Table 5
    {'s', 19.1, 635.0, 1.932829079e-3},    {'s', 20.0, 638.0, 1.985387227e-3},     // Table 5
    {'t', 17.0, 626.0, 8.483262001e-3},    {'t', 20.0, 640.0, 6.227528101e-3},     // Table 5
    {'u', 21.5, 644.6, 2.268366647e-3},    {'u', 22.0, 646.1, 2.296350553e-3},     // Table 13
    {'v', 22.5, 648.6, 2.832373260e-3},    {'v', 22.3, 647.9, 2.811424405e-3},     // Table 13
    {'w', 22.15, 647.5, 3.694032281e-3},   {'w', 22.3, 648.1, 3.622226305e-3},     // Table 13
    {'x', 22.11, 648.0, 4.528072649e-3},   {'x', 22.3, 649.0, 4.556905799e-3},     // Table 13
    {'y', 22.0, 646.84, 2.698354719e-3},   {'y', 22.064, 647.05, 2.717655648e-3},  // Table 13
    {'z', 22.0, 646.89, 3.798732962e-3},   {'z', 22.064, 647.15, 3.701940010e-3},  // Table 13
};

TEST(IF97Region3VpT, Tables5And13ByNamedSubregion) {
    for (const VCase& c : kCases) {
        SCOPED_TRACE(std::string("subregion 3") + c.sub + " p=" + std::to_string(c.p) +
                     " T=" + std::to_string(c.T));
        expect_rel(region3_v_pT_sub(c.p, c.T, c.sub), c.v);
    }
}

TEST(IF97Region3VpT, Tables5And13PointsLieInTheirSubregion) {
    // Every check point of Tables 5 and 13 lies inside its own subregion, so
    // the selection of Tables 2 and 10 must name it and region3_v_pT must give
    // the same value.
    for (const VCase& c : kCases) {
        SCOPED_TRACE(std::string("subregion 3") + c.sub + " p=" + std::to_string(c.p) +
                     " T=" + std::to_string(c.T));
        EXPECT_EQ(region3_subregion(c.p, c.T), c.sub);
        expect_rel(region3_v_pT(c.p, c.T), c.v);
    }
}

TEST(IF97Region3VpT, SelectionFollowsTable2) {
    // Points placed well inside the areas of SR5-05(2016) Table 2 / Figs. 3-4.
    EXPECT_EQ(region3_subregion(90.0, 640.0), 'a');
    EXPECT_EQ(region3_subregion(90.0, 800.0), 'b');
    EXPECT_EQ(region3_subregion(30.0, 700.0), 'f');
    EXPECT_EQ(region3_subregion(24.0, 700.0), 'k');
    EXPECT_EQ(region3_subregion(22.7, 700.0), 'k');
    EXPECT_EQ(region3_subregion(22.7, 630.0), 'c');
    EXPECT_EQ(region3_subregion(22.4, 645.0), 'q');
    EXPECT_EQ(region3_subregion(22.4, 651.0), 'r');
    EXPECT_EQ(region3_subregion(20.0, 700.0), 't');
    EXPECT_EQ(region3_subregion(17.0, 625.0), 'c');  // below Tsat(17 MPa) = 625.7 K
    EXPECT_EQ(region3_subregion(17.0, 630.0), 't');  // above it
}

TEST(IF97Region3VpT, SaturationSideByTsat) {
    // Below p3cd only 3c (liquid) and 3t (vapour) exist; the side is T vs Tsat(p).
    const double p = 18.0;
    const double Ts = tsat(p);
    EXPECT_EQ(region3_subregion(p, Ts - 1e-6), 'c');
    EXPECT_EQ(region3_subregion(p, Ts + 1e-6), 't');
    // Between 20.5 MPa and psat(643.15 K): 3s liquid, 3r vapour.
    const double p2 = 20.8, Ts2 = tsat(p2);
    EXPECT_EQ(region3_subregion(p2, Ts2 - 1e-6), 's');
    EXPECT_EQ(region3_subregion(p2, Ts2 + 1e-6), 'r');
    // Forced sides at the saturation temperature itself.
    EXPECT_EQ(d::subregion(p2, Ts2, +1), 's');
    EXPECT_EQ(d::subregion(p2, Ts2, -1), 'r');
    // Close to the critical point (Table 10, subcritical part).
    const double p3 = 22.0, Ts3 = tsat(p3);
    EXPECT_EQ(d::subregion(p3, Ts3, +1), 'y');
    EXPECT_EQ(d::subregion(p3, Ts3, -1), 'z');
    const double p4 = 21.5, Ts4 = tsat(p4);
    EXPECT_EQ(d::subregion(p4, Ts4, +1), 'u');
    EXPECT_EQ(d::subregion(p4, Ts4, -1), 'x');
}

TEST(IF97Region3VpT, ConsistentAcrossSubregionBoundaries) {
    // SR5-05(2016) Tables 7, 8, 15, 16: neighbouring equations agree at their
    // common boundary within 0.001 % .. 0.14 % (up to 3.5 % where 3y or 3z
    // meets a neighbour, Tables 15-16).
    // A mistyped coefficient or a wrong selection shows as a larger step.
    // Walk isobars over region 3; wherever the selected subregion changes,
    // evaluate both equations at the same (p,T).
    const double ps[] = {16.6, 18.0, 19.5, 20.7, 21.2, 21.95, 22.08, 22.2, 22.6, 22.9,
                         23.2, 23.8, 24.5, 27.0, 35.0, 45.0, 70.0, 100.0};
    int crossings = 0;
    for (double p : ps) {
        const double Tlo = 623.2;
        const double Thi = b23_T(p);
        const double Ts = p < pc ? tsat(p) : 0.0;
        char sprev = 0;
        const int n = 20000;
        for (int i = 0; i <= n; ++i) {
            const double T = Tlo + (Thi - Tlo) * i / n;
            const char s = region3_subregion(p, T);
            const double v = region3_v_pT(p, T);
            ASSERT_TRUE(std::isfinite(v) && v > 0) << p << " " << T << " " << s;
            const double Tprev = Tlo + (Thi - Tlo) * (i - 1) / n;
            const bool crosses_sat = p < pc && Tprev <= Ts && T > Ts;  // a real phase change
            if (i > 0 && s != sprev && !crosses_sat) {
                ++crossings;
                const bool yz = s == 'y' || s == 'z' || sprev == 'y' || sprev == 'z';
                const double tol = yz ? 0.04 : 0.002;
                EXPECT_NEAR(region3_v_pT_sub(p, T, sprev), v, tol * v)
                    << "p=" << p << " T=" << T << " 3" << sprev << " -> 3" << s;
            }
            sprev = s;
        }
    }
    EXPECT_GT(crossings, 40);
}

}  // namespace
