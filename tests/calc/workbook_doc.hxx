// SPDX-License-Identifier: MPL-2.0
// Shared by the workbook tests (test_workbook*.cxx): a built workbook opened
// from a private copy in the shared headless office, cell access by sheet
// name, the axis scales of its embedded charts read back from the chart
// model, a test fixture with cell access by column letter and row, and the
// SI <-> US conversion of the workbooks' units cell.
#pragma once

#include <sys/stat.h>
#include <unistd.h>

#include <filesystem>
#include <limits>
#include <string>
#include <vector>

#include <com/sun/star/beans/PropertyValue.hpp>
#include <com/sun/star/beans/XPropertySet.hpp>
#include <com/sun/star/chart/XAxisXSupplier.hpp>
#include <com/sun/star/chart/XAxisYSupplier.hpp>
#include <com/sun/star/chart/XChartDocument.hpp>
#include <com/sun/star/container/XIndexAccess.hpp>
#include <com/sun/star/document/XEmbeddedObjectSupplier.hpp>
#include <com/sun/star/frame/XComponentLoader.hpp>
#include <com/sun/star/lang/XMultiComponentFactory.hpp>
#include <com/sun/star/sheet/XCalculatable.hpp>
#include <com/sun/star/sheet/XCellRangeFormula.hpp>
#include <com/sun/star/sheet/XSpreadsheet.hpp>
#include <com/sun/star/sheet/XSpreadsheetDocument.hpp>
#include <com/sun/star/sheet/XSpreadsheets.hpp>
#include <com/sun/star/table/XCell.hpp>
#include <com/sun/star/table/XCellRange.hpp>
#include <com/sun/star/table/XTableChart.hpp>
#include <com/sun/star/table/XTableChartsSupplier.hpp>
#include <com/sun/star/text/XTextRange.hpp>
#include <rtl/ustring.hxx>

#include "calc_test.hxx"

namespace isentra::calctest {

constexpr double kNaN = std::numeric_limits<double>::quiet_NaN();
constexpr double kC0 = 273.15;  // K at 0 degC (SI Brochure: the definition of the degree Celsius)

// SI -> US factors, exact by definition (NIST SP 811 (2008) Appendix B).
constexpr double kPsiaPerMPa = 1e6 / 6894.757293168361;
constexpr double kLbmhPerKgs = 3600.0 / 0.45359237;
constexpr double kKJPerBtu = 1.05505585262;     // international table Btu
constexpr double kKJkgPerBtulbm = 2.326;        // exact: the IT Btu/lbm is defined as 2.326 kJ/kg
constexpr double kKJkgKPerBtulbmF = 4.1868;     // exact

enum class Q { Plain, P, T, DT, H, S, M, HR };  // what a cell holds, for the US conversion

// US value of an SI value (temperatures in degC -> degF).
inline double to_us(Q q, double v) {
    switch (q) {
        case Q::P: return v * kPsiaPerMPa;
        case Q::T: return v * 1.8 + 32;
        case Q::DT: return v * 1.8;
        case Q::H: return v / kKJkgPerBtulbm;
        case Q::S: return v / kKJkgKPerBtulbmF;
        case Q::M: return v * kLbmhPerKgs;
        case Q::HR: return v / kKJPerBtu;
        case Q::Plain: break;
    }
    return v;
}

// SI value of a US reading (the exact inverse of to_us).
inline double from_us(Q q, double v) {
    switch (q) {
        case Q::P: return v / kPsiaPerMPa;
        case Q::T: return (v - 32) / 1.8;
        case Q::DT: return v / 1.8;
        case Q::H: return v * kKJkgPerBtulbm;
        case Q::S: return v * kKJkgKPerBtulbmF;
        case Q::M: return v / kLbmhPerKgs;
        case Q::HR: return v * kKJPerBtu;
        case Q::Plain: break;
    }
    return v;
}

// One axis of a chart as the chart model reports it: for an automatic
// minimum or maximum, Min and Max are the values Calc's scaling chose.
struct AxisScale {
    double min = 0, max = 0;
    bool auto_min = true, auto_max = true;
};

class WorkbookDoc {
public:
    // Opens a copy of build/templates/<name> (in a directory the office's user can read).
    bool open(const std::string& name) {
        namespace fs = std::filesystem;
        using namespace css::uno;
        close();
        const fs::path src = fs::path(ISENTRA_OXT_PATH).parent_path() / "templates" / name;
        if (!fs::is_regular_file(src)) {
            ADD_FAILURE() << "not built: " << src;
            return false;
        }
        char pattern[] = "/tmp/isentra-wb-XXXXXX";
        if (::mkdtemp(pattern) == nullptr) return false;
        dir_ = pattern;
        ::chmod(dir_.c_str(), 0755);  // the office may run as another user
        const fs::path copy = fs::path(dir_) / name;
        fs::copy_file(src, copy);
        ::chmod(copy.c_str(), 0644);
        auto& ctx = Office::get().context();
        Reference<css::frame::XComponentLoader> loader(
            ctx->getServiceManager()->createInstanceWithContext("com.sun.star.frame.Desktop", ctx), UNO_QUERY_THROW);
        Sequence<css::beans::PropertyValue> args(1);
        args[0].Name = "Hidden";
        args[0].Value <<= true;
        doc_ = loader->loadComponentFromURL(::rtl::OUString::createFromAscii(("file://" + copy.string()).c_str()),
                                            "_blank", 0, args);
        if (!doc_.is()) {
            ADD_FAILURE() << "could not open " << copy;
            return false;
        }
        recalc();
        return true;
    }
    void close() {
        if (doc_.is()) Office::close(doc_);
        doc_.clear();
        if (!dir_.empty()) std::filesystem::remove_all(dir_);
        dir_.clear();
    }
    ~WorkbookDoc() { close(); }

    void recalc() { css::uno::Reference<css::sheet::XCalculatable>(doc_, css::uno::UNO_QUERY_THROW)->calculateAll(); }

    css::uno::Reference<css::sheet::XSpreadsheet> sheet(const std::string& name) {
        using namespace css::uno;
        Reference<css::sheet::XSpreadsheetDocument> sd(doc_, UNO_QUERY_THROW);
        return Reference<css::sheet::XSpreadsheet>(
            sd->getSheets()->getByName(::rtl::OUString::createFromAscii(name.c_str())), UNO_QUERY_THROW);
    }
    // A cell by A1 address.
    css::uno::Reference<css::table::XCell> cell(const std::string& sheet_name, const std::string& a1) {
        css::uno::Reference<css::table::XCellRange> r(sheet(sheet_name), css::uno::UNO_QUERY_THROW);
        return r->getCellRangeByName(::rtl::OUString::createFromAscii(a1.c_str()))->getCellByPosition(0, 0);
    }
    std::string shown(const std::string& sheet_name, const std::string& a1) {
        css::uno::Reference<css::text::XTextRange> t(cell(sheet_name, a1), css::uno::UNO_QUERY_THROW);
        return ::rtl::OUStringToOString(t->getString(), RTL_TEXTENCODING_UTF8).getStr();
    }

    std::vector<std::string> sheet_names() {
        css::uno::Reference<css::sheet::XSpreadsheetDocument> sd(doc_, css::uno::UNO_QUERY_THROW);
        std::vector<std::string> out;
        for (const auto& n : sd->getSheets()->getElementNames())
            out.push_back(::rtl::OUStringToOString(n, RTL_TEXTENCODING_UTF8).getStr());
        return out;
    }
    // The formulas (or constants) of a range, by rows, as the API writes them, in one call.
    std::vector<std::vector<std::string>> formulas(const std::string& sheet_name, const std::string& range) {
        using namespace css::uno;
        Reference<css::table::XCellRange> r(sheet(sheet_name), UNO_QUERY_THROW);
        Reference<css::sheet::XCellRangeFormula> f(
            r->getCellRangeByName(::rtl::OUString::createFromAscii(range.c_str())), UNO_QUERY_THROW);
        std::vector<std::vector<std::string>> out;
        for (const auto& line : f->getFormulaArray()) {
            out.emplace_back();
            for (const auto& cell : line)
                out.back().push_back(::rtl::OUStringToOString(cell, RTL_TEXTENCODING_UTF8).getStr());
        }
        return out;
    }

    // Axis 'x' or 'y' of the index-th chart on a sheet.
    AxisScale axis(const std::string& sheet_name, int index, char which) {
        using namespace css::uno;
        Reference<css::table::XTableChartsSupplier> supplier(sheet(sheet_name), UNO_QUERY_THROW);
        Reference<css::container::XIndexAccess> charts(supplier->getCharts(), UNO_QUERY_THROW);
        Reference<css::table::XTableChart> chart(charts->getByIndex(index), UNO_QUERY_THROW);
        Reference<css::document::XEmbeddedObjectSupplier> embedded(chart, UNO_QUERY_THROW);
        Reference<css::chart::XChartDocument> cd(embedded->getEmbeddedObject(), UNO_QUERY_THROW);
        Reference<css::beans::XPropertySet> ax;
        if (which == 'x')
            ax = Reference<css::chart::XAxisXSupplier>(cd->getDiagram(), UNO_QUERY_THROW)->getXAxis();
        else
            ax = Reference<css::chart::XAxisYSupplier>(cd->getDiagram(), UNO_QUERY_THROW)->getYAxis();
        AxisScale s;
        ax->getPropertyValue("Min") >>= s.min;
        ax->getPropertyValue("Max") >>= s.max;
        ax->getPropertyValue("AutoMin") >>= s.auto_min;
        ax->getPropertyValue("AutoMax") >>= s.auto_max;
        return s;
    }
    int chart_count(const std::string& sheet_name) {
        using namespace css::uno;
        Reference<css::table::XTableChartsSupplier> supplier(sheet(sheet_name), UNO_QUERY_THROW);
        return Reference<css::container::XIndexAccess>(supplier->getCharts(), UNO_QUERY_THROW)->getCount();
    }

    css::uno::Reference<css::lang::XComponent> doc_;

private:
    std::string dir_;
};

// A test on one document loaded from a private copy of a built workbook,
// its cells by column letter and row number.
class BookTest : public ::testing::Test {
protected:
    void load(const char* file) { ASSERT_TRUE(wb_.open(file)); }
    void TearDown() override { wb_.close(); }

    css::uno::Reference<css::table::XCell> at(const char* sheet, char col, int row) {
        return wb_.sheet(sheet)->getCellByPosition(col - 'A', row - 1);
    }
    std::string shown(const char* sheet, char col, int row) {
        return wb_.shown(sheet, std::string(1, col) + std::to_string(row));
    }
    bool blank(const char* sheet, char col, int row) {
        return at(sheet, col, row)->getType() == css::table::CellContentType_EMPTY;
    }
    // A number cell; blank gives NaN. Error cells fail the test.
    double value(const char* sheet, char col, int row) {
        auto c = at(sheet, col, row);
        EXPECT_EQ(c->getError(), 0) << sheet << "." << col << row << " shows " << shown(sheet, col, row);
        if (c->getType() == css::table::CellContentType_EMPTY || shown(sheet, col, row).empty()) return kNaN;
        return c->getValue();
    }
    void put(const char* sheet, char col, int row, double v) { at(sheet, col, row)->setValue(v); }

    WorkbookDoc wb_;
};

}  // namespace isentra::calctest
