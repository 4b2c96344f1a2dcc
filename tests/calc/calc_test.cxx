// SPDX-License-Identifier: MPL-2.0
#include "calc_test.hxx"

#include <stdexcept>

#include <com/sun/star/container/XIndexAccess.hpp>
#include <com/sun/star/sheet/XArrayFormulaRange.hpp>
#include <com/sun/star/sheet/XCalculatable.hpp>
#include <com/sun/star/sheet/XSpreadsheetDocument.hpp>
#include <com/sun/star/sheet/XSpreadsheets.hpp>
#include <com/sun/star/table/XCellRange.hpp>
#include <com/sun/star/text/XTextRange.hpp>

namespace isentra::calctest {

using css::uno::Reference;
using css::uno::UNO_QUERY;
using css::uno::UNO_QUERY_THROW;

namespace {

// Runs f, turning UNO exceptions into test failures with their message.
template <class F>
auto guarded(const char* what, F f) -> decltype(f()) {
    try {
        return f();
    } catch (const css::uno::Exception& e) {
        throw std::runtime_error(std::string(what) + ": " + message(e));
    }
}

}  // namespace

void CalcTest::SetUp() {
    try {
        Office& office = Office::get();
        doc_ = guarded("new Calc document", [&] { return office.new_calc_document(); });
        Reference<css::sheet::XSpreadsheetDocument> sdoc(doc_, UNO_QUERY_THROW);
        Reference<css::container::XIndexAccess> sheets(sdoc->getSheets(), UNO_QUERY_THROW);
        sheet_.set(sheets->getByIndex(0), UNO_QUERY_THROW);
    } catch (const std::exception& e) {
        FAIL() << e.what();
    } catch (const css::uno::Exception& e) {
        FAIL() << message(e);
    }
}

void CalcTest::TearDown() {
    try {
        Office::close(doc_);
    } catch (...) {
        ADD_FAILURE() << "closing the test document failed: is the office still alive?";
    }
    sheet_.clear();
    doc_.clear();
}

Reference<css::table::XCell> CalcTest::cell(const std::string& address) {
    return guarded(address.c_str(), [&] {
        if (!sheet_.is()) throw std::runtime_error("no document (the office did not start)");
        return sheet_->getCellRangeByName(ou(address))->getCellByPosition(0, 0);
    });
}

void CalcTest::formula(const std::string& c, const std::string& f) {
    guarded(f.c_str(), [&] { cell(c)->setFormula(ou(f)); });
}

void CalcTest::number(const std::string& c, double v) {
    guarded(c.c_str(), [&] { cell(c)->setValue(v); });
}

void CalcTest::text(const std::string& c, const std::string& s) {
    guarded(c.c_str(), [&] { Reference<css::text::XTextRange>(cell(c), UNO_QUERY_THROW)->setString(ou(s)); });
}

void CalcTest::array_formula(const std::string& range, const std::string& f) {
    guarded(f.c_str(), [&] {
        Reference<css::sheet::XArrayFormulaRange> r(sheet_->getCellRangeByName(ou(range)), UNO_QUERY_THROW);
        r->setArrayFormula(ou(f));
    });
}

void CalcTest::recalc() {
    guarded("calculateAll", [&] { Reference<css::sheet::XCalculatable>(doc_, UNO_QUERY_THROW)->calculateAll(); });
}

double CalcTest::value(const std::string& c) {
    return guarded(c.c_str(), [&] { return cell(c)->getValue(); });
}

int CalcTest::error(const std::string& c) {
    return guarded(c.c_str(), [&] { return static_cast<int>(cell(c)->getError()); });
}

std::string CalcTest::string(const std::string& c) {
    return guarded(c.c_str(), [&] { return str(Reference<css::text::XTextRange>(cell(c), UNO_QUERY_THROW)->getString()); });
}

std::string CalcTest::formula_of(const std::string& c) {
    return guarded(c.c_str(), [&] { return str(cell(c)->getFormula()); });
}

}  // namespace isentra::calctest
