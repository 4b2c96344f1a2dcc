// SPDX-License-Identifier: MPL-2.0
// Headless LibreOffice Calc for integration tests.
//
// Office::get() starts, on first use, one private office for the whole test
// binary: it makes a throwaway profile, installs the freshly built .oxt into
// it with unopkg, starts `soffice --headless` in its own process group with a
// socket on 127.0.0.1 (free port), and connects a UNO bridge. The global
// environment in main.cxx shuts it down (terminate, kill the process group by
// id, remove the profile); a watchdog process does the same if the test
// binary dies.
//
// As root (CI), unopkg refuses per-user installs, so unopkg and soffice run
// as the unprivileged user `nobody` (setpriv) with the profile owned by it.
//
// Tests use CalcTest (below): each test gets a new, empty, hidden Calc
// document and helpers to type formulas and read results back.
#pragma once

#include <string>
#include <vector>

#include <gtest/gtest.h>

#include <com/sun/star/lang/XComponent.hpp>
#include <com/sun/star/sheet/XSpreadsheet.hpp>
#include <com/sun/star/table/XCell.hpp>
#include <com/sun/star/uno/Reference.hxx>
#include <com/sun/star/uno/XComponentContext.hpp>

namespace isentra::calctest {

namespace css = ::com::sun::star;

// Calc's error codes as returned by XCell::getError() (sc FormulaError).
enum CalcError : int {
    NoError = 0,
    IllegalArgument = 502,   // Err:502, what an add-in's IllegalArgumentException shows
    IllegalFPOperation = 503,  // #NUM!
    ParameterExpected = 504, // Err:504 (wrong argument count)
    NoValue = 519,           // #VALUE!
    NoConvergence = 523,     // Err:523
    NoName = 525,            // #NAME? (unknown function)
    NotAvailable = 32767     // #N/A
};

class Office {
public:
    // The shared office, started on first call. Throws std::runtime_error
    // (with the office's log) if it cannot be started.
    static Office& get();
    // Stops the shared office if it was started (idempotent).
    static void shutdown();

    // A new hidden Calc document; close it with close().
    css::uno::Reference<css::lang::XComponent> new_calc_document();
    static void close(const css::uno::Reference<css::lang::XComponent>& doc);

    const css::uno::Reference<css::uno::XComponentContext>& context() const { return remote_; }

    ~Office();
    Office(const Office&) = delete;
    Office& operator=(const Office&) = delete;

private:
    Office();
    void stop();

    std::string dir_;      // throwaway directory: profile, home, copy of the .oxt, logs
    int pgid_ = -1;        // soffice's process group
    int watchdog_fd_ = -1; // write end of the watchdog's pipe
    int watchdog_pid_ = -1;
    css::uno::Reference<css::uno::XComponentContext> remote_;
};

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
