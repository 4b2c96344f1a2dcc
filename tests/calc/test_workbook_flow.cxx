// SPDX-License-Identifier: MPL-2.0
// The Flow sheet of the plant performance workbook (templates/plant_flow_sheet.py,
// written by gen_plant_workbook.py) opened in the headless Calc with the
// extension: every result recomputed from the sheet's own readings with the
// core (isentra::flow; the core itself is checked against python3-fluids in
// core_tests), in the SI demo, the US demo copy and the blank template, and the
// main steam flow it hands to the Heat rate sheet.
#include <cmath>
#include <cstdio>
#include <limits>
#include <string>

#include "isentra/engineering/equipment.hpp"
#include "isentra/engineering/flow.hpp"
#include "isentra/properties/state.hpp"
#include "workbook_doc.hxx"

namespace isentra::calctest {
namespace {

namespace fl = isentra::flow;
using ::rtl::OUString;

// US -> SI, exact by definition (NIST SP 811 (2008) Appendix B; inH2O at 60 degF: B.8, 248.84 Pa).
constexpr double kPaPerPsi = 6894.757293168361;
constexpr double kMmPerIn = 25.4;
constexpr double kPaPerInH2O = 248.84;
constexpr double kKgPerLbm = 0.45359237;
constexpr double kMPerFt = 0.3048;

const char* const kCols = "CDEF";
const char* const kRunCols = "CDE";

class FlowBook : public BookTest {
protected:
    // The meter of column c from its readings, in SI core units (us: read in US units).
    struct Reading {
        fl::Meter meter;
        double dp = 0, p = 0, T = 0;
        fl::FlowReadingsUncertainty u;
    };
    Reading reading(char c, bool us) {
        Reading r;
        const std::string family = shown("Flow", c, 9), type = shown("Flow", c, 10);
        const fl::Family f = family == "nozzle"    ? fl::Family::Nozzle
                             : family == "orifice" ? fl::Family::Orifice
                                                   : fl::Family::Venturi;
        r.meter.device = fl::parse_device(f, type, "type");
        const double L = us ? kMmPerIn * 1e-3 : 1e-3;          // in or mm -> m
        const double per_K = us ? 1.8e-6 : 1e-6;               // 1e-6/degF or 1e-6/K -> 1/K
        auto temp = [us](double v) { return us ? (v - 32) / 1.8 + kC0 : v + kC0; };
        r.meter.d_ref = value("Flow", c, 11) * L;
        r.meter.D_ref = value("Flow", c, 12) * L;
        r.meter.alpha_d = value("Flow", c, 13) * per_K;
        r.meter.alpha_D = value("Flow", c, 14) * per_K;
        r.meter.T_ref = temp(value("Flow", c, 15));
        r.dp = value("Flow", c, 16) * (us ? kPaPerInH2O : 1e3);
        r.p = value("Flow", c, 17) * (us ? kPaPerPsi * 1e-6 : 1.0);
        r.T = temp(value("Flow", c, 18));
        r.u = fl::FlowReadingsUncertainty{value("Flow", c, 19), value("Flow", c, 20),
                                          value("Flow", c, 21) / (us ? 1.8 : 1.0), value("Flow", c, 22),
                                          value("Flow", c, 23), 0.0};
        return r;
    }

    // Compares the results of every column with the core; returns the SI flows.
    std::vector<double> check_results(bool us) {
        const double m_unit = us ? kKgPerLbm / 3600 : 1.0;  // shown flow -> kg/s
        std::vector<double> flows;
        for (const char* c = kCols; *c; ++c) {
            SCOPED_TRACE(std::string("column ") + *c);
            EXPECT_EQ(shown("Flow", *c, 24), "TRUE");
            const Reading r = reading(*c, us);
            const fl::FlowUncertainty u = fl::flow_uncertainty(r.meter, r.dp, r.p, r.T, r.u);
            const fl::Solution& s = u.sol;
            auto near = [](double got, double want, const char* what) {
                EXPECT_NEAR(got, want, 1e-11 * std::fabs(want) + 1e-13) << what;
            };
            near(value("Flow", *c, 27) * m_unit, s.m, "mass flow");
            near(value("Flow", *c, 28), s.C, "C");
            near(value("Flow", *c, 29), s.eps, "eps");
            near(value("Flow", *c, 30), s.Re_D, "Re_D");
            near(value("Flow", *c, 31), s.beta, "beta");
            near(value("Flow", *c, 32) * m_unit, u.u_m, "u_m");
            near(value("Flow", *c, 33), 100 * u.u_rel, "u_rel %");
            near(value("Flow", *c, 34), u.share[0], "share C");
            near(value("Flow", *c, 35), u.share[1], "share eps");
            near(value("Flow", *c, 36), u.share[2], "share dp");
            near(value("Flow", *c, 37), u.share[3] + u.share[4] + u.share[5] + u.share[6], "share p, T, d, D");
            EXPECT_NEAR(value("Flow", *c, 34) + value("Flow", *c, 35) + value("Flow", *c, 36) + value("Flow", *c, 37),
                        100.0, 1e-9);
            near(value("Flow", *c, 38) * (us ? kMPerFt : 1.0), s.velocity, "velocity");
            flows.push_back(s.m);
        }
        // The main steam flow of each test run = feedwater flow + spray, on sheet Heat rate row 9.
        for (int k = 0; k < 3; ++k) {
            const char c = kRunCols[k];
            const double main = value("Flow", c, 43);
            EXPECT_NEAR(main, value("Flow", c, 27) + value("Flow", c, 41), 1e-9 * main) << c;
            EXPECT_DOUBLE_EQ(value("Heat rate", c, 9), main) << c;
            EXPECT_EQ(shown("Flow", c, 42), shown("Heat rate", c, 8)) << c;
        }
        return flows;
    }

};

TEST_F(FlowBook, DemoFlowsMatchTheCoreAndFeedTheHeatRate) {
    load("harrow-fen-unit2-plant-performance.ods");
    EXPECT_EQ(shown("Flow", 'B', 5), "SI");
    EXPECT_NE(shown("Flow", 'A', 3).find("licensed engineer"), std::string::npos);
    EXPECT_EQ(shown("Flow", 'B', 16), "kPa");
    EXPECT_EQ(shown("Flow", 'B', 11), "mm");
    EXPECT_EQ(shown("Flow", 'B', 27), "kg/s");
    const std::vector<double> m = check_results(false);
    // The demo readings were invented to give the Heat rate sheet's former typed flows
    // (535, 449.5, 367.1 kg/s) and the Heaters sheet's condensate flow (414 kg/s) to 0.05 %.
    const double typed[4] = {535.0, 449.5, 367.1, 414.0};
    for (int k = 0; k < 4; ++k) EXPECT_NEAR(m[k], typed[k], 5e-4 * typed[k]) << k;
    // The heat rate follows the measured flow: STEAM.HEATRATE.CYCLE with it, by the core.
    const double h_ms = state_pT(value("Heat rate", 'C', 10), value("Heat rate", 'C', 11) + kC0).h;
    const double h_fw = state_pT(value("Heat rate", 'C', 12), value("Heat rate", 'C', 13) + kC0).h;
    const double h_crh = state_pT(value("Heat rate", 'C', 15), value("Heat rate", 'C', 16) + kC0).h;
    const double h_hrh = state_pT(value("Heat rate", 'C', 17), value("Heat rate", 'C', 18) + kC0).h;
    const double hr = equipment::cycle_heat_rate(value("Heat rate", 'C', 9), h_ms, h_fw, value("Heat rate", 'C', 14),
                                                 h_hrh, h_crh, 1000 * value("Heat rate", 'C', 19));
    EXPECT_NEAR(value("Heat rate", 'C', 37), hr, 1e-9 * hr);
    // The uncertainty shown: a long-radius nozzle's C is known to 2 % (ISO 5167-3:2003), which
    // dominates the feedwater flow's budget; the condensate orifice (beta 0.6: 0.5 %).
    EXPECT_GT(value("Flow", 'C', 34), 95.0);
    EXPECT_NEAR(value("Flow", 'C', 33), 2.0, 0.05);
    EXPECT_LT(value("Flow", 'F', 33), 0.6);
    std::printf("[ flow     ] demo flows %.2f %.2f %.2f kg/s feedwater, %.2f kg/s condensate; uncertainty %.2f %% "
                "and %.2f %%\n",
                m[0], m[1], m[2], m[3], value("Flow", 'C', 33), value("Flow", 'F', 33));
}

TEST_F(FlowBook, UsCopyMatchesTheCoreAndTheSiDemo) {
    load("harrow-fen-unit2-plant-performance.ods");
    const std::vector<double> si = check_results(false);
    load("harrow-fen-unit2-plant-performance-us.ods");
    EXPECT_EQ(shown("Flow", 'B', 5), "US");
    EXPECT_EQ(shown("Flow", 'B', 16), "inH₂O (60 °F)");
    EXPECT_EQ(shown("Flow", 'B', 11), "in");
    EXPECT_EQ(shown("Flow", 'B', 27), "lbm/h");
    const std::vector<double> us = check_results(true);
    // The US readings are the SI ones as US instruments show them (0.01 inH2O, 0.001 in, psia
    // to 4-5 figures, 0.1 degF): the flows agree within 0.05 %.
    double worst = 0;
    for (std::size_t k = 0; k < si.size(); ++k) {
        EXPECT_NEAR(us[k], si[k], 5e-4 * si[k]) << k;
        worst = std::max(worst, std::fabs(us[k] / si[k] - 1));
    }
    std::printf("[ flow     ] US copy vs SI demo: flows within %.4f %%\n", 100 * worst);
}

TEST_F(FlowBook, BlankTemplateGivesEmptyResults) {
    for (const char* file : {"isentra-plant-performance.ots", "isentra-plant-performance-us.ots"}) {
        SCOPED_TRACE(file);
        load(file);
        for (const char* c = kCols; *c; ++c) {
            EXPECT_EQ(shown("Flow", *c, 24), "FALSE") << *c;
            for (int r = 27; r <= 38; ++r) {
                EXPECT_EQ(at("Flow", *c, r)->getError(), 0) << *c << r;
                EXPECT_EQ(shown("Flow", *c, r), "") << *c << r;
            }
        }
        for (const char* c = kRunCols; *c; ++c) {
            EXPECT_EQ(shown("Flow", *c, 43), "") << *c;
            EXPECT_EQ(shown("Heat rate", *c, 9), "") << *c;
            EXPECT_EQ(shown("Heat rate", *c, 37), "") << *c;
        }
    }
}

}  // namespace
}  // namespace isentra::calctest
