// SPDX-License-Identifier: MPL-2.0
// The GoogleTest fixture of the Calc integration tests: each test gets a new,
// empty, hidden Calc document in the shared headless office (office/office.hxx)
// and helpers to type formulas and read results back.
#pragma once

#include <string>

#include <gtest/gtest.h>

#include <com/sun/star/lang/XComponent.hpp>
#include <com/sun/star/sheet/XSpreadsheet.hpp>
#include <com/sun/star/table/XCell.hpp>
#include <com/sun/star/uno/Reference.hxx>

#include "office.hxx"

namespace isentra::calctest {

namespace css = ::com::sun::star;
using namespace isentra::office;  // Office, CalcError, ou, str, message

// Fixture: one new Calc document per test in the shared office.
class CalcTest : public ::testing::Test {
protected:
    void SetUp() override;
    void TearDown() override;

    // Cell input, A1-style addresses on the first sheet.
    void formula(const std::string& cell, const std::string& f);  // e.g. "=STEAM.TSAT(0.1)"
    void number(const std::string& cell, double v);
    void text(const std::string& cell, const std::string& s);
    void array_formula(const std::string& range, const std::string& f);  // e.g. "B1:B4"
    void recalc();  // recalculates everything (calculateAll)

    // Results.
    double value(const std::string& cell);
    int error(const std::string& cell);  // CalcError, 0 if none
    std::string string(const std::string& cell);  // as displayed
    std::string formula_of(const std::string& cell);

    css::uno::Reference<css::table::XCell> cell(const std::string& address);

    css::uno::Reference<css::lang::XComponent> doc_;
    css::uno::Reference<css::sheet::XSpreadsheet> sheet_;
};

}  // namespace isentra::calctest
