// SPDX-License-Identifier: MPL-2.0
// The metastable-vapour solvers and the viscosity forms against an
// independent oracle, tests/data/metastable_oracle.csv, written by
// tests/oracle/gen_metastable.py (fixed seed; regenerate with Debian's
// /usr/bin/python3). Its sources, named in the file's header:
//   * mv, lim, out rows: IAPWS R7-97(2012) Eq. 18 (Sec. 6.2; Table 10
//     footnote a, Table 16) in a transcription of its own in the generator,
//     checked there against R7-97(2012) Table 18 to all printed digits
//     (python3-iapws 1.5.2 has no metastable-vapour equation); the bounds
//     Ts(p), h'(p), h''(p) of the range from python3-iapws 1.5.2 (Debian).
//   * tr rows: python3-iapws 1.5.2 (Debian): IF97 state, _Viscosity(rho, T)
//     (R12-08 Sec. 3, mu_2 = 1) and _Viscosity(rho, T, phase, drho) (R12-08
//     Eq. 10 with mu_2), drho the R15-11 Eq. 25 zeta(T_R, rho).
//
// Tolerances (the project's accuracy targets):
//   metastable (p,T): v, h, u, s, cp, cv, w within 1e-9 relative (h, u, s:
//     relative to max(|value|, 1)), equilibrium quality within 1e-9
//   (p,h), (p,s): T within 1e-6 K
//   range: T of the 5 % line within 1e-6 K, Ts within 1e-9 relative
//   outside the range: a RangeError from each of the three solvers
//   mu (mu_2 = 1), nu, Pr: 1e-9 relative
//   mu with mu_2: 1e-9 relative inside the R12-08 Sec. 2.8 footnote 2 curve,
//     where both apply mu_2; outside it the release's 0.0051 % (the core
//     omits mu_2 there, python3-iapws does not)
#include <gtest/gtest.h>

#include <algorithm>
#include <cmath>
#include <cstdio>
#include <fstream>
#include <sstream>
#include <string>
#include <vector>

#include "isentra/base/error.hpp"
#include "isentra/properties/state.hpp"
#include "isentra/properties/transport.hpp"

using namespace isentra;

namespace {

const char* const kSource = "python3-iapws 1.5.2 (Debian)";
const char* const kEq18 = "IAPWS R7-97(2012) Eq. 18";

struct Row {
    std::string kind;
    std::vector<double> a;
    int line = 0;
};

struct Oracle {
    std::vector<Row> rows;
    bool names_sources = false;
    std::string error;
};

Oracle load() {
    Oracle o;
    const std::string path = std::string(ISENTRA_TEST_DATA_DIR) + "/metastable_oracle.csv";
    std::ifstream in(path);
    if (!in) {
        o.error = "cannot open " + path;
        return o;
    }
    std::string line;
    int n = 0;
    bool header = false;
    bool iapws = false, eq18 = false;
    while (std::getline(in, line)) {
        ++n;
        if (line.empty()) continue;
        if (line[0] == '#') {
            iapws = iapws || line.find(kSource) != std::string::npos;
            eq18 = eq18 || line.find(kEq18) != std::string::npos;
            continue;
        }
        if (!header) {
            header = true;
            continue;
        }
        std::stringstream ss(line);
        std::string f;
        Row r;
        r.line = n;
        std::getline(ss, r.kind, ',');
        while (std::getline(ss, f, ',')) r.a.push_back(std::stod(f));
        o.rows.push_back(std::move(r));
    }
    o.names_sources = iapws && eq18;
    return o;
}

const Oracle& oracle() {
    static const Oracle o = load();
    return o;
}

double rel(double got, double want, double floor = 0.0) {
    return std::fabs(got - want) / std::max(std::fabs(want), floor);
}

std::size_t count(const char* kind) {
    return static_cast<std::size_t>(std::count_if(oracle().rows.begin(), oracle().rows.end(),
                                                  [&](const Row& r) { return r.kind == kind; }));
}

TEST(OracleMetastable, FileNamesItsSourcesAndHasEnoughRows) {
    ASSERT_EQ(oracle().error, "");
    EXPECT_TRUE(oracle().names_sources);
    EXPECT_GE(count("mv"), 1000u);
    EXPECT_GE(count("lim"), 100u);
    EXPECT_GE(count("out"), 200u);
    EXPECT_GE(count("tr"), 800u);
}

// mv: p T v h u s cp cv w x
TEST(OracleMetastable, StatesFromPT_PH_PS) {
    double worst[8] = {0, 0, 0, 0, 0, 0, 0, 0};  // v h u s cp cv w x
    double worst_T_ph = 0, worst_T_ps = 0;
    int n = 0;
    for (const Row& r : oracle().rows) {
        if (r.kind != "mv") continue;
        ASSERT_EQ(r.a.size(), 10u) << "line " << r.line;
        const double p = r.a[0], T = r.a[1];
        const State st = state_pT_metastable(p, T);
        EXPECT_TRUE(st.metastable) << "line " << r.line;
        const double d[8] = {rel(st.v, r.a[2]),         rel(st.h, r.a[3], 1.0),  rel(st.u, r.a[4], 1.0),
                             rel(st.s, r.a[5], 1.0),    rel(st.cp, r.a[6]),      rel(st.cv, r.a[7]),
                             rel(st.w, r.a[8]),         std::fabs(quality(st) - r.a[9])};
        for (int k = 0; k < 8; ++k) {
            EXPECT_LT(d[k], 1e-9) << "property " << k << " at p = " << p << " MPa, T = " << T << " K (line "
                                  << r.line << ")";
            worst[k] = std::max(worst[k], d[k]);
        }
        const State sh = state_ph_metastable(p, r.a[3]);
        const State ss = state_ps_metastable(p, r.a[5]);
        EXPECT_NEAR(sh.T, T, 1e-6) << "line " << r.line;
        EXPECT_NEAR(ss.T, T, 1e-6) << "line " << r.line;
        EXPECT_LT(rel(sh.s, r.a[5], 1.0), 1e-9) << "line " << r.line;
        EXPECT_LT(rel(ss.h, r.a[3], 1.0), 1e-9) << "line " << r.line;
        worst_T_ph = std::max(worst_T_ph, std::fabs(sh.T - T));
        worst_T_ps = std::max(worst_T_ps, std::fabs(ss.T - T));
        ++n;
    }
    std::printf("metastable oracle: %d states; max rel dev v %.2e h %.2e u %.2e s %.2e cp %.2e cv %.2e w %.2e; "
                "x %.2e abs; T(p,h) %.2e K, T(p,s) %.2e K\n",
                n, worst[0], worst[1], worst[2], worst[3], worst[4], worst[5], worst[6], worst[7], worst_T_ph,
                worst_T_ps);
}

// lim: p T_low T_high h_low h_high s_low s_high
TEST(OracleMetastable, RangeOfValidity) {
    double worst_low = 0, worst_high = 0;
    for (const Row& r : oracle().rows) {
        if (r.kind != "lim") continue;
        ASSERT_EQ(r.a.size(), 7u) << "line " << r.line;
        const MetastableLimits m = metastable_limits(r.a[0]);
        EXPECT_NEAR(m.T_low, r.a[1], 1e-6) << "p = " << r.a[0] << " (line " << r.line << ")";
        EXPECT_LT(rel(m.T_high, r.a[2]), 1e-9) << "p = " << r.a[0] << " (line " << r.line << ")";
        // h and s at the ends: Eq. 18 at the end temperatures (the lower end
        // moves by its 1e-6 K, times cp or cp/T).
        EXPECT_NEAR(m.h_low, r.a[3], 1e-5) << "line " << r.line;
        EXPECT_LT(rel(m.h_high, r.a[4]), 1e-9) << "line " << r.line;
        EXPECT_NEAR(m.s_low, r.a[5], 1e-7) << "line " << r.line;
        EXPECT_LT(rel(m.s_high, r.a[6]), 1e-9) << "line " << r.line;
        worst_low = std::max(worst_low, std::fabs(m.T_low - r.a[1]));
        worst_high = std::max(worst_high, rel(m.T_high, r.a[2]));
    }
    std::printf("metastable range: 5 %% line T max dev %.2e K, Ts max rel dev %.2e\n", worst_low, worst_high);
}

// out: p T h s, each outside the range of Eq. 18 at its p.
TEST(OracleMetastable, OutsideTheRangeIsARangeError) {
    for (const Row& r : oracle().rows) {
        if (r.kind != "out") continue;
        ASSERT_EQ(r.a.size(), 4u) << "line " << r.line;
        const double p = r.a[0], T = r.a[1], h = r.a[2], s = r.a[3];
        EXPECT_THROW(state_pT_metastable(p, T), RangeError) << "p = " << p << ", T = " << T << " (line " << r.line
                                                             << ")";
        if (std::isfinite(h)) {
            EXPECT_THROW(state_ph_metastable(p, h), RangeError) << "p = " << p << ", h = " << h << " (line "
                                                                 << r.line << ")";
        }
        if (std::isfinite(s)) {
            EXPECT_THROW(state_ps_metastable(p, s), RangeError) << "p = " << p << ", s = " << s << " (line "
                                                                 << r.line << ")";
        }
    }
}

// tr: p T region rho mu mucrit nu pr inside
TEST(OracleMetastable, ViscosityIndustrialAndWithTheCriticalEnhancement) {
    double w_mu = 0, w_nu = 0, w_pr = 0, w_in = 0, w_out = 0, max_mu2 = 1;
    int n = 0, n_in = 0;
    for (const Row& r : oracle().rows) {
        if (r.kind != "tr") continue;
        ASSERT_EQ(r.a.size(), 9u) << "line " << r.line;
        const State st = state_pT(r.a[0], r.a[1]);
        const bool inside = r.a[8] != 0.0;
        const double dmu = rel(viscosity(st), r.a[4]);
        const double dnu = rel(kinematic_viscosity(st), r.a[6]);
        const double dpr = rel(prandtl(st), r.a[7]);
        const double dcrit = rel(viscosity_with_enhancement(st), r.a[5]);
        EXPECT_LT(dmu, 1e-9) << "line " << r.line;
        EXPECT_LT(dnu, 1e-9) << "line " << r.line;
        EXPECT_LT(dpr, 1e-9) << "line " << r.line;
        EXPECT_LT(dcrit, inside ? 1e-9 : 5.1e-5) << (inside ? "inside" : "outside") << " the footnote-2 curve, line "
                                                 << r.line;
        w_mu = std::max(w_mu, dmu);
        w_nu = std::max(w_nu, dnu);
        w_pr = std::max(w_pr, dpr);
        (inside ? w_in : w_out) = std::max(inside ? w_in : w_out, dcrit);
        max_mu2 = std::max(max_mu2, r.a[5] / r.a[4]);
        ++n;
        n_in += inside;
    }
    std::printf("viscosity oracle: %d states (%d inside the footnote-2 curve, max mu_2 %.4f); max rel dev mu %.2e "
                "nu %.2e Pr %.2e; with mu_2: inside %.2e, outside %.2e\n",
                n, n_in, max_mu2, w_mu, w_nu, w_pr, w_in, w_out);
}

}  // namespace
