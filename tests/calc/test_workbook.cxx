// SPDX-License-Identifier: MPL-2.0
// The turbine section efficiency test workbooks (templates/gen_turbine_workbook.py:
// SI and US demos, SI and US blank templates) opened in the headless Calc with
// the extension: recalculated, their key cells compared with the same
// quantities computed here directly from the core (state_pT / state_ps: the
// sheet's wiring is what is under test; the core itself is checked against
// the IAPWS tables and python3-iapws in core_tests), and the h-s chart's axis
// scales read back from the chart model.
#include <algorithm>
#include <cmath>
#include <cstdio>
#include <regex>
#include <string>
#include <vector>

#include "isentra/properties/state.hpp"
#include "workbook_doc.hxx"

namespace isentra::calctest {
namespace {

// Conversions for the US check (exact by definition: NIST SP 811 (2008) Appendix B).
constexpr double kMPaPerPsi = 6894.757293168361e-6;
constexpr double kKJkgPerBtulbm = 2.326;
constexpr double kKJkgKPerBtulbmF = 4.1868;

double p_si(bool us, double p) { return us ? p * kMPaPerPsi : p; }
double t_si(bool us, double t) { return us ? (t - 32) / 1.8 : t; }

// The enthalpy-drop efficiency from the core's state solver (SI: MPa, degC).
double eta_direct(double p1, double t1, double p2, double t2) {
    const State in = state_pT(p1, t1 + 273.15);
    const State out = state_pT(p2, t2 + 273.15);
    const State ise = state_ps(p2, in.s);
    return (in.h - out.h) / (in.h - ise.h);
}

class Workbook : public ::testing::Test {
protected:
    void open(const char* name) { ASSERT_TRUE(wb_.open(name)); }
    void TearDown() override { wb_.close(); }
    void recalc() { wb_.recalc(); }
    css::uno::Reference<css::table::XCell> cell(const char* sheet, const std::string& a) { return wb_.cell(sheet, a); }
    double num(const char* sheet, const std::string& a) {
        auto c = cell(sheet, a);
        EXPECT_EQ(c->getError(), 0) << sheet << "." << a << " shows " << str(sheet, a);
        return c->getValue();
    }
    std::string str(const char* sheet, const std::string& a) { return wb_.shown(sheet, a); }
    void set_num(const char* sheet, const std::string& a, double v) { cell(sheet, a)->setValue(v); }
    void set_text(const char* sheet, const std::string& a, const char* s) {
        cell(sheet, a)->setFormula(::rtl::OUString::createFromAscii(s));
    }

    WorkbookDoc wb_;
};

// Layout (see gen_turbine_workbook.py, DEVELOPERS.md "Templates"): readings
// Test.C15:N18 (per section p_in, T_in, p_out, T_out: HP C-F, IP G-J, LP K-N),
// "readings complete" O15:Q18; results Test.C22:K25 (per section efficiency,
// test - design, uncertainty); state points ChartData.B2:M5 (per section
// h_in, s_in, h_out, s_out), isentropic end points h_s AK2:AM5.
const char* const kReadCols[3] = {"CDEF", "GHIJ", "KLMN"};
const char kOkCols[3] = {'O', 'P', 'Q'};
const char* const kResCols[3] = {"CDE", "FGH", "IJK"};
const char* const kStateCols[3] = {"BCDE", "FGHI", "JKLM"};
const char* const kHsCols[3] = {"AK", "AL", "AM"};
std::string at(char col, int row) { return std::string(1, col) + std::to_string(row); }
std::string at(const char* col, int row) { return std::string(col) + std::to_string(row); }

// The axis ranges the generator fixes per file (gen_turbine_workbook.py AXES):
// s min, s max, h min, h max.
struct Axes {
    const char* file;
    double s_min, s_max, h_min, h_max;
};
const Axes kAxes[] = {
    {"harrow-fen-unit2-turbine-test.ods", 6.2, 7.8, 2600, 3700},
    {"harrow-fen-unit2-turbine-test-us.ods", 1.45, 1.85, 1100, 1600},
    {"isentra-turbine-section-test.ots", 5.6, 8.4, 2000, 3700},
    {"isentra-turbine-section-test-us.ots", 1.3, 2.0, 850, 1600},
};

// Checks every result of a demo against the core, from the sheet's own
// readings (us: in psia and degF, converted exactly to SI here).
class WorkbookDemo : public Workbook {
protected:
    void check(bool us, double eta_out[4][3]) {
        EXPECT_EQ(str("Test", "B5"), us ? "US" : "SI");
        EXPECT_EQ(str("Test", "A5"), "Units of the readings and results");
        EXPECT_NE(str("Test", "C5").find("does not convert the readings"), std::string::npos) << str("Test", "C5");
        EXPECT_NE(str("Test", "A3").find("licensed engineer"), std::string::npos) << str("Test", "A3");
        EXPECT_EQ(str("Test", "C14"), us ? "psia" : "MPa");
        EXPECT_EQ(str("Test", "D14"), us ? "°F" : "°C");
        const double design[3] = {num("Test", "B8"), num("Test", "B9"), num("Test", "B10")};
        const double up = num("Test", "B6");
        const double ut = num("Test", "B7") / (us ? 1.8 : 1.0);  // K
        EXPECT_DOUBLE_EQ(ut, 1.0);  // 1 K = 1.8 degF: the same instruments in both copies
        const double h_us = us ? kKJkgPerBtulbm : 1.0, s_us = us ? kKJkgKPerBtulbmF : 1.0;
        for (int i = 0; i < 4; ++i) {
            const int r = 15 + i, rr = 22 + i, rs = 2 + i;
            for (int k = 0; k < 3; ++k) {
                SCOPED_TRACE(std::string(us ? "US" : "SI") + " test point T" + std::to_string(i + 1) + ", section " +
                             std::to_string(k));
                EXPECT_EQ(str("Test", at(kOkCols[k], r)), "TRUE");
                double x[4];
                for (int j = 0; j < 4; ++j) {
                    const double v = num("Test", at(kReadCols[k][j], r));
                    x[j] = j % 2 == 0 ? p_si(us, v) : t_si(us, v);
                }
                const double eta = eta_direct(x[0], x[1], x[2], x[3]);
                eta_out[i][k] = eta;
                EXPECT_NEAR(num("Test", at(kResCols[k][0], rr)), eta, 1e-9);
                EXPECT_NEAR(num("Test", at(kResCols[k][1], rr)), eta - design[k], 1e-9);
                EXPECT_GT(eta, 0.84);  // the demo's readings were chosen for 85-92 % (common practice)
                EXPECT_LT(eta, 0.93);
                // Uncertainty: root-sum-square of central-difference sensitivities
                // times the instrument uncertainties (p: fraction of reading).
                double sum = 0;
                for (int j = 0; j < 4; ++j) {
                    const double u = (j % 2 == 0) ? up * x[j] : ut;
                    const double d = (j % 2 == 0) ? 1e-4 * x[j] : 1e-3;
                    double a[4] = {x[0], x[1], x[2], x[3]}, b[4] = {x[0], x[1], x[2], x[3]};
                    a[j] += d;
                    b[j] -= d;
                    const double theta =
                        (eta_direct(a[0], a[1], a[2], a[3]) - eta_direct(b[0], b[1], b[2], b[3])) / (2 * d);
                    sum += theta * u * theta * u;
                }
                EXPECT_NEAR(num("Test", at(kResCols[k][2], rr)), std::sqrt(sum), 2e-6);
                // State points and the isentropic end point on the helper sheet.
                const State in = state_pT(x[0], x[1] + 273.15), out = state_pT(x[2], x[3] + 273.15);
                const double hs = state_ps(x[2], in.s).h;
                EXPECT_NEAR(num("ChartData", at(kStateCols[k][0], rs)) * h_us, in.h, 1e-9 * in.h);
                EXPECT_NEAR(num("ChartData", at(kStateCols[k][1], rs)) * s_us, in.s, 1e-9 * in.s);
                EXPECT_NEAR(num("ChartData", at(kStateCols[k][2], rs)) * h_us, out.h, 1e-9 * out.h);
                EXPECT_NEAR(num("ChartData", at(kStateCols[k][3], rs)) * s_us, out.s, 1e-9 * out.s);
                EXPECT_NEAR(num("ChartData", at(kHsCols[k], rs)) * h_us, hs, 1e-9 * hs);
            }
        }
        // Saturated-vapour line (W, X rows 2-30; the grid in degC in U).
        for (int r = 2; r <= 30; ++r) {
            const State g = saturation_T(num("ChartData", at('U', r)) + 273.15);
            EXPECT_NEAR(num("ChartData", at('X', r)) * h_us, g.vap.h, 1e-9 * g.vap.h) << r;
            EXPECT_NEAR(num("ChartData", at('W', r)) * s_us, g.vap.s, 1e-9 * g.vap.s) << r;
        }
        // Isobars (Z:AI rows 2-22): the HP inlet isobar (Z, AA) passes through
        // the HP inlet state of T1 at its 16th point (row 17), the HP exhaust
        // one (AB, AC) through the HP exhaust state at its 6th (row 7).
        EXPECT_NEAR(num("ChartData", "Z17"), num("ChartData", "C2"), 1e-12);
        EXPECT_NEAR(num("ChartData", "AA17"), num("ChartData", "B2"), 1e-7);
        EXPECT_NEAR(num("ChartData", "AB7"), num("ChartData", "E2"), 1e-12);
        EXPECT_NEAR(num("ChartData", "AC7"), num("ChartData", "D2"), 1e-7);
        EXPECT_EQ(str("ChartData", "AC1"), us ? "HP exhaust 591.8 psia" : "HP exhaust 4.08 MPa");
        for (int r = 2; r <= 22; ++r)
            for (const char* c : {"Z", "AA", "AB", "AC", "AD", "AE", "AF", "AG", "AH", "AI"})
                num("ChartData", c + std::to_string(r));
    }
};


TEST_F(WorkbookDemo, SiDemoMatchesTheCore) {
    open("harrow-fen-unit2-turbine-test.ods");
    double eta[4][3];
    check(false, eta);
}

// The US copy holds the SI demo's readings as US instruments show them
// (psia to 4-5 significant figures, degF to 0.1): its results match the core
// for its own readings, and the SI demo's within that rounding.
TEST_F(WorkbookDemo, UsDemoMatchesTheCoreAndTheSiDemo) {
    open("harrow-fen-unit2-turbine-test.ods");
    double eta_si[4][3], eta_us[4][3];
    check(false, eta_si);
    open("harrow-fen-unit2-turbine-test-us.ods");
    check(true, eta_us);
    double worst = 0;
    for (int i = 0; i < 4; ++i)
        for (int k = 0; k < 3; ++k) worst = std::max(worst, std::fabs(eta_us[i][k] - eta_si[i][k]));
    std::printf("turbine workbook: largest SI/US efficiency difference from reading rounding %.4f points\n",
                100 * worst);
    EXPECT_LT(worst, 0.002);  // 0.2 percentage points
}

TEST_F(Workbook, TheUnitsCellReinterpretsTheReadings) {
    open("harrow-fen-unit2-turbine-test.ods");
    double eta_si[4][3], h_si[4][3];
    for (int i = 0; i < 4; ++i)
        for (int k = 0; k < 3; ++k) {
            eta_si[i][k] = num("Test", at(kResCols[k][0], 22 + i));
            h_si[i][k] = num("ChartData", at(kStateCols[k][0], 2 + i));
        }
    const double hg_si = num("ChartData", "X2");
    // Switching the units cell alone reads the same numbers in psia and degF:
    // the HP efficiency of T1 changes (the label says so).
    set_text("Test", "B5", "US");
    recalc();
    EXPECT_GT(std::fabs(num("Test", "C22") - eta_si[0][0]), 0.05);
    // The readings converted to psia and degF give the SI results back.
    for (int i = 0; i < 4; ++i)
        for (int k = 0; k < 3; ++k)
            for (int j = 0; j < 4; ++j) {
                const std::string a = at(kReadCols[k][j], 15 + i);
                const double v = num("Test", a);
                set_num("Test", a, j % 2 == 0 ? v / kMPaPerPsi : v * 1.8 + 32);
            }
    set_num("Test", "B7", 1.8);
    recalc();
    EXPECT_EQ(str("Test", "C14"), "psia");
    EXPECT_EQ(str("Test", "D14"), "°F");
    for (int i = 0; i < 4; ++i)
        for (int k = 0; k < 3; ++k) {
            EXPECT_NEAR(num("Test", at(kResCols[k][0], 22 + i)), eta_si[i][k], 1e-9);
            EXPECT_NEAR(num("ChartData", at(kStateCols[k][0], 2 + i)), h_si[i][k] / kKJkgPerBtulbm, 1e-7);
        }
    EXPECT_NEAR(num("ChartData", "X2"), hg_si / kKJkgPerBtulbm, 1e-7);  // the saturation line follows
}

// The h-s chart's axes, read back from the chart model: fixed per file, and
// in the demos framing every measured state and isentropic end point.
TEST_F(Workbook, ChartAxesAreFixedPerFileAndFrameTheDemoStates) {
    for (const Axes& a : kAxes) {
        SCOPED_TRACE(a.file);
        open(a.file);
        ASSERT_EQ(wb_.chart_count("Test"), 1);
        const AxisScale x = wb_.axis("Test", 0, 'x'), y = wb_.axis("Test", 0, 'y');
        EXPECT_FALSE(x.auto_min);
        EXPECT_FALSE(x.auto_max);
        EXPECT_FALSE(y.auto_min);
        EXPECT_FALSE(y.auto_max);
        EXPECT_DOUBLE_EQ(x.min, a.s_min);
        EXPECT_DOUBLE_EQ(x.max, a.s_max);
        EXPECT_DOUBLE_EQ(y.min, a.h_min);
        EXPECT_DOUBLE_EQ(y.max, a.h_max);
        std::printf("%s: s axis %g..%g, h axis %g..%g\n", a.file, x.min, x.max, y.min, y.max);
        if (std::string(a.file).find(".ods") == std::string::npos) continue;
        double s_lo = 1e9, s_hi = -1e9, h_lo = 1e9, h_hi = -1e9;
        for (int r = 2; r <= 5; ++r)
            for (int k = 0; k < 3; ++k) {
                for (int j : {0, 2}) {
                    const double h = num("ChartData", at(kStateCols[k][j], r));
                    const double s = num("ChartData", at(kStateCols[k][j + 1], r));
                    s_lo = std::min(s_lo, s), s_hi = std::max(s_hi, s);
                    h_lo = std::min(h_lo, h), h_hi = std::max(h_hi, h);
                }
                h_lo = std::min(h_lo, num("ChartData", at(kHsCols[k], r)));
            }
        EXPECT_GT(s_lo, x.min);
        EXPECT_LT(s_hi, x.max);
        EXPECT_GT(h_lo, y.min);
        EXPECT_LT(h_hi, y.max);
        // The states fill most of the plot (the issue: they filled the top third).
        EXPECT_GT((s_hi - s_lo) / (x.max - x.min), 0.6);
        EXPECT_GT((h_hi - h_lo) / (y.max - y.min), 0.6);
        std::printf("  states: s %.3f..%.3f (%.0f %% of the axis), h %.1f..%.1f (%.0f %%)\n", s_lo, s_hi,
                    100 * (s_hi - s_lo) / (x.max - x.min), h_lo, h_hi, 100 * (h_hi - h_lo) / (y.max - y.min));
    }
}

// The rule of every template (DEVELOPERS.md "Templates"): a formula that calls
// the add-in is =IF(<one "readings complete" cell>; call; "" or NA()), and no
// formula nests AND/OR/LEN/TRIM/COUNT/ISNUMBER around a call. Calls on
// constants only (STEAM.VERSION, the saturation line's grid, a unit
// conversion of a constant) need no guard.
TEST_F(Workbook, EveryAddInCallSitsBehindOneReadingsCompleteCell) {
    const std::regex addin(R"(ORG\.ISENTRA\.STEAMFUNCTIONS\.([A-Z]+)\()", std::regex::icase);
    const std::regex guarded(R"(^=IF\(\$?'?[A-Za-z ]*'?\.?\$?[A-Z]{1,2}\$?[0-9]+;)");
    const std::regex nested(R"((^|[^A-Z.])(AND|OR|LEN|TRIM|COUNT|ISNUMBER)\()");
    const char* files[] = {"harrow-fen-unit2-turbine-test.ods", "harrow-fen-unit2-turbine-test-us.ods",
                           "isentra-turbine-section-test.ots", "isentra-turbine-section-test-us.ots",
                           "harrow-fen-unit2-plant-performance.ods", "harrow-fen-unit2-plant-performance-us.ods",
                           "isentra-plant-performance.ots", "isentra-plant-performance-us.ots"};
    int calls = 0, guards = 0;
    std::string example;
    for (const char* file : files) {
        SCOPED_TRACE(file);
        open(file);
        for (const std::string& sheet : wb_.sheet_names()) {
            const auto rows = wb_.formulas(sheet, "A1:BD80");
            for (std::size_t r = 0; r < rows.size(); ++r)
                for (std::size_t c = 0; c < rows[r].size(); ++c) {
                    const std::string& f = rows[r][c];
                    std::smatch m;
                    if (f.empty() || f[0] != '=' || !std::regex_search(f, m, addin)) continue;
                    ++calls;
                    const std::string where = sheet + " row " + std::to_string(r + 1) + " col " + std::to_string(c + 1);
                    EXPECT_FALSE(std::regex_search(f, nested)) << where << ": " << f;
                    if (std::regex_search(f, guarded)) {
                        ++guards;
                        if (example.empty() && f.find("FWHEXTRACTION") != std::string::npos) example = f;
                        continue;
                    }
                    // Unguarded: only calls on constants.
                    for (auto it = std::sregex_iterator(f.begin(), f.end(), addin); it != std::sregex_iterator(); ++it) {
                        const std::string fn = (*it)[1];
                        EXPECT_TRUE(fn == "VERSION" || fn == "SGT" || fn == "HGT" || fn == "CONVERT")
                            << where << ": " << f;
                    }
                }
        }
    }
    std::printf("%d add-in calls in 8 workbooks, %d behind a readings-complete cell; e.g. %s\n", calls, guards,
                example.c_str());
    EXPECT_GT(guards, 8 * 20);
}

TEST_F(Workbook, BlankTemplatesHaveNoResultsAndNoErrors) {
    for (const char* file : {"isentra-turbine-section-test.ots", "isentra-turbine-section-test-us.ots"}) {
        SCOPED_TRACE(file);
        open(file);
        const bool us = std::string(file).find("-us") != std::string::npos;
        EXPECT_EQ(str("Test", "B5"), us ? "US" : "SI");
        EXPECT_EQ(str("Test", "C14"), us ? "psia" : "MPa");
        for (int i = 0; i < 4; ++i) {
            for (int k = 0; k < 3; ++k) {
                EXPECT_EQ(str("Test", at(kOkCols[k], 15 + i)), "FALSE");
                for (int j = 0; j < 3; ++j) {
                    const std::string a = at(kResCols[k][j], 22 + i);
                    EXPECT_EQ(cell("Test", a)->getError(), 0) << a;
                    EXPECT_EQ(str("Test", a), "") << a;
                }
            }
            // The chart's state points are #N/A (left out of the chart), not numbers.
            EXPECT_EQ(cell("ChartData", at('B', 2 + i))->getError(), NotAvailable);
        }
        // Three of four HP readings typed in: still no result (a blank would count as 0).
        const double row[12] = {16.62, 538.4, 4.08, 333.1, 3.74, 538.9, 0.962, 342.6, 0.941, 340.8, 0.252, 192.3};
        const auto reading = [&](int n) {
            return n % 2 == 0 ? (us ? row[n] / kMPaPerPsi : row[n]) : (us ? row[n] * 1.8 + 32 : row[n]);
        };
        for (int j = 0; j < 3; ++j) set_num("Test", at(kReadCols[0][j], 15), reading(j));
        recalc();
        EXPECT_EQ(str("Test", "O15"), "FALSE");
        EXPECT_EQ(str("Test", "C22"), "");
        EXPECT_EQ(cell("Test", "C22")->getError(), 0);
        // The whole row typed in: its results appear.
        for (int k = 0; k < 3; ++k)
            for (int j = 0; j < 4; ++j) set_num("Test", at(kReadCols[k][j], 15), reading(4 * k + j));
        recalc();
        for (int k = 0; k < 3; ++k)
            EXPECT_NEAR(num("Test", at(kResCols[k][0], 22)),
                        eta_direct(row[4 * k], row[4 * k + 1], row[4 * k + 2], row[4 * k + 3]), 1e-9);
    }
}

}  // namespace
}  // namespace isentra::calctest
