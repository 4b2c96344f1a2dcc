// SPDX-License-Identifier: MPL-2.0
// The turbine section efficiency test workbook (templates/gen_turbine_workbook.py)
// opened in the headless Calc with the extension: recalculated, its key cells
// compared with the same quantities computed here directly from the core
// (state_pT / state_ps: the sheet's wiring is what is under test; the core
// itself is checked against the IAPWS tables and python3-iapws in core_tests).
#include <sys/stat.h>
#include <unistd.h>

#include <cmath>
#include <cstdlib>
#include <filesystem>
#include <string>

#include <com/sun/star/beans/PropertyValue.hpp>
#include <com/sun/star/container/XNameAccess.hpp>
#include <com/sun/star/frame/XComponentLoader.hpp>
#include <com/sun/star/lang/XMultiComponentFactory.hpp>
#include <com/sun/star/sheet/XCalculatable.hpp>
#include <com/sun/star/sheet/XSpreadsheetDocument.hpp>
#include <com/sun/star/sheet/XSpreadsheets.hpp>
#include <com/sun/star/table/XCellRange.hpp>
#include <com/sun/star/text/XTextRange.hpp>
#include <rtl/ustring.hxx>

#include "isentra/properties/state.hpp"
#include "calc_test.hxx"

namespace isentra::calctest {
namespace {

namespace fs = std::filesystem;
using namespace css::uno;
using css::table::XCell;
using ::rtl::OUString;
using ::rtl::OUStringToOString;

// Conversions for the US check (exact by definition, common practice).
constexpr double psi_per_MPa = 1e6 / 6894.757293168361;
constexpr double kJkg_per_Btulbm = 2.326;

fs::path built(const char* name) { return fs::path(ISENTRA_OXT_PATH).parent_path() / "templates" / name; }

// The enthalpy-drop efficiency from the core's state solver (SI: MPa, degC).
double eta_direct(double p1, double t1, double p2, double t2) {
    const State in = state_pT(p1, t1 + 273.15);
    const State out = state_pT(p2, t2 + 273.15);
    const State ise = state_ps(p2, in.s);
    return (in.h - out.h) / (in.h - ise.h);
}

class Workbook : public ::testing::Test {
protected:
    // Opens a copy of a built workbook (in a directory the office's user can read).
    void open(const char* name) {
        const fs::path src = built(name);
        ASSERT_TRUE(fs::exists(src)) << src;
        char pattern[] = "/tmp/isentra-wb-XXXXXX";
        ASSERT_NE(::mkdtemp(pattern), nullptr);
        dir_ = pattern;
        ::chmod(dir_.c_str(), 0755);
        const fs::path copy = fs::path(dir_) / name;
        fs::copy_file(src, copy);
        ::chmod(copy.c_str(), 0644);
        Office& office = Office::get();
        auto smgr = office.context()->getServiceManager();
        Reference<css::frame::XComponentLoader> loader(
            smgr->createInstanceWithContext("com.sun.star.frame.Desktop", office.context()), UNO_QUERY_THROW);
        Sequence<css::beans::PropertyValue> args(1);
        args[0].Name = "Hidden";
        args[0].Value <<= true;
        const std::string url = "file://" + copy.string();
        doc_ = loader->loadComponentFromURL(OUString::createFromAscii(url.c_str()), "_blank", 0, args);
        ASSERT_TRUE(doc_.is());
        recalc();
    }
    void TearDown() override {
        if (doc_.is()) Office::close(doc_);
        if (!dir_.empty()) fs::remove_all(dir_);
    }
    void recalc() { Reference<css::sheet::XCalculatable>(doc_, UNO_QUERY_THROW)->calculateAll(); }
    Reference<XCell> cell(const char* sheet, const std::string& a) {
        Reference<css::sheet::XSpreadsheetDocument> sd(doc_, UNO_QUERY_THROW);
        Reference<css::table::XCellRange> range(sd->getSheets()->getByName(OUString::createFromAscii(sheet)), UNO_QUERY_THROW);
        return range->getCellRangeByName(OUString::createFromAscii(a.c_str()))->getCellByPosition(0, 0);
    }
    double num(const char* sheet, const std::string& a) {
        auto c = cell(sheet, a);
        EXPECT_EQ(c->getError(), 0) << sheet << "." << a << " shows " << str(sheet, a);
        return c->getValue();
    }
    std::string str(const char* sheet, const std::string& a) {
        Reference<css::text::XTextRange> t(cell(sheet, a), UNO_QUERY_THROW);
        return OUStringToOString(t->getString(), RTL_TEXTENCODING_UTF8).getStr();
    }
    void set_num(const char* sheet, const std::string& a, double v) { cell(sheet, a)->setValue(v); }
    void set_text(const char* sheet, const std::string& a, const char* s) {
        cell(sheet, a)->setFormula(OUString::createFromAscii(s));
    }

    Reference<css::lang::XComponent> doc_;
    std::string dir_;
};

// Layout (see gen_turbine_workbook.py): readings Test.C15:N18 (per section
// p_in, T_in, p_out, T_out: HP C-F, IP G-J, LP K-N); results Test.C22:K25
// (per section efficiency, test - design, uncertainty); state points
// ChartData.B2:M5 (per section h_in, s_in, h_out, s_out).
const char* const kReadCols[3] = {"CDEF", "GHIJ", "KLMN"};
const char* const kResCols[3] = {"CDE", "FGH", "IJK"};
const char* const kStateCols[3] = {"BCDE", "FGHI", "JKLM"};
std::string at(char col, int row) { return std::string(1, col) + std::to_string(row); }

TEST_F(Workbook, DemoEfficienciesEnthalpiesAndUncertaintiesMatchTheCore) {
    open("harrow-fen-unit2-turbine-test.ods");
    EXPECT_EQ(str("Test", "B5"), "SI");
    EXPECT_NE(str("Test", "A3").find("licensed engineer"), std::string::npos) << str("Test", "A3");
    const double design[3] = {num("Test", "B8"), num("Test", "B9"), num("Test", "B10")};
    const double up = num("Test", "B6"), ut = num("Test", "B7");
    for (int i = 0; i < 4; ++i) {
        const int r = 15 + i, rr = 22 + i, rs = 2 + i;
        for (int k = 0; k < 3; ++k) {
            SCOPED_TRACE("test point T" + std::to_string(i + 1) + ", section " + std::to_string(k));
            double x[4];
            for (int j = 0; j < 4; ++j) x[j] = num("Test", at(kReadCols[k][j], r));
            const double eta = eta_direct(x[0], x[1], x[2], x[3]);
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
                const double theta = (eta_direct(a[0], a[1], a[2], a[3]) - eta_direct(b[0], b[1], b[2], b[3])) / (2 * d);
                sum += theta * u * theta * u;
            }
            EXPECT_NEAR(num("Test", at(kResCols[k][2], rr)), std::sqrt(sum), 2e-6);
            // State points on the helper sheet.
            const State in = state_pT(x[0], x[1] + 273.15), out = state_pT(x[2], x[3] + 273.15);
            EXPECT_NEAR(num("ChartData", at(kStateCols[k][0], rs)), in.h, 1e-9 * in.h);
            EXPECT_NEAR(num("ChartData", at(kStateCols[k][1], rs)), in.s, 1e-9 * in.s);
            EXPECT_NEAR(num("ChartData", at(kStateCols[k][2], rs)), out.h, 1e-9 * out.h);
            EXPECT_NEAR(num("ChartData", at(kStateCols[k][3], rs)), out.s, 1e-9 * out.s);
        }
    }
    // Chart series: saturated vapour (W, X rows 2-30) and the five isobars
    // (Z:AI rows 2-22) are all numbers; the isobar at the HP exhaust pressure
    // passes through the measured HP exhaust state at its centre (row 12).
    for (int r = 2; r <= 30; ++r) {
        const double tC = num("ChartData", at('U', r));
        const State g = saturation_T(tC + 273.15);
        EXPECT_NEAR(num("ChartData", at('X', r)), g.vap.h, 1e-9 * g.vap.h) << r;
        EXPECT_NEAR(num("ChartData", at('W', r)), g.vap.s, 1e-9 * g.vap.s) << r;
    }
    const double s_c = num("ChartData", "AB12"), h_c = num("ChartData", "AC12");
    EXPECT_NEAR(s_c, num("ChartData", "E2"), 1e-12);
    EXPECT_NEAR(h_c, num("ChartData", "D2"), 1e-4);
    for (int r = 2; r <= 22; ++r)
        for (const char* c : {"Z", "AA", "AB", "AC", "AD", "AE", "AF", "AG", "AH", "AI"}) num("ChartData", c + std::to_string(r));
}

TEST_F(Workbook, TheUnitsCellSwitchesTheWholeWorkbookToUsUnits) {
    open("harrow-fen-unit2-turbine-test.ods");
    double eta_si[4][3], h_si[4][3];
    for (int i = 0; i < 4; ++i)
        for (int k = 0; k < 3; ++k) {
            eta_si[i][k] = num("Test", at(kResCols[k][0], 22 + i));
            h_si[i][k] = num("ChartData", at(kStateCols[k][0], 2 + i));
        }
    const double hg_si = num("ChartData", "X2");
    // The same readings in psia and degF.
    for (int i = 0; i < 4; ++i)
        for (int k = 0; k < 3; ++k)
            for (int j = 0; j < 4; ++j) {
                const std::string a = at(kReadCols[k][j], 15 + i);
                const double v = num("Test", a);
                set_num("Test", a, j % 2 == 0 ? v * psi_per_MPa : v * 1.8 + 32);
            }
    set_num("Test", "B7", 1.8);
    set_text("Test", "B5", "US");
    recalc();
    EXPECT_EQ(str("Test", "C14"), "psia");
    EXPECT_EQ(str("Test", "D14"), "°F");
    for (int i = 0; i < 4; ++i)
        for (int k = 0; k < 3; ++k) {
            EXPECT_NEAR(num("Test", at(kResCols[k][0], 22 + i)), eta_si[i][k], 1e-9);
            EXPECT_NEAR(num("ChartData", at(kStateCols[k][0], 2 + i)), h_si[i][k] / kJkg_per_Btulbm, 1e-7);
        }
    EXPECT_NEAR(num("ChartData", "X2"), hg_si / kJkg_per_Btulbm, 1e-7);  // the saturation line follows
}

TEST_F(Workbook, BlankTemplateHasNoResultsAndNoErrors) {
    open("isentra-turbine-section-test.ots");
    EXPECT_EQ(str("Test", "B5"), "SI");
    EXPECT_EQ(cell("Test", "C15")->getError(), 0);
    for (int i = 0; i < 4; ++i)
        for (int k = 0; k < 3; ++k)
            for (int j = 0; j < 3; ++j) {
                const std::string a = at(kResCols[k][j], 22 + i);
                EXPECT_EQ(cell("Test", a)->getError(), 0) << a;
                EXPECT_EQ(str("Test", a), "") << a;
            }
    // One reading row typed in: its results appear.
    const double row[12] = {16.62, 538.4, 4.08, 333.1, 3.74, 538.9, 0.962, 342.6, 0.941, 340.8, 0.252, 192.3};
    for (int k = 0; k < 3; ++k)
        for (int j = 0; j < 4; ++j) set_num("Test", at(kReadCols[k][j], 15), row[4 * k + j]);
    recalc();
    for (int k = 0; k < 3; ++k)
        EXPECT_NEAR(num("Test", at(kResCols[k][0], 22)), eta_direct(row[4 * k], row[4 * k + 1], row[4 * k + 2], row[4 * k + 3]), 1e-9);
}

}  // namespace
}  // namespace isentra::calctest
