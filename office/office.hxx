// SPDX-License-Identifier: MPL-2.0
// The headless-office harness (library isentra_office): a private LibreOffice
// with the freshly built Isentra extension, driven over UNO. Used by the Calc
// tests (tests/calc), calc_bench and the tools.
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
// The Calc tests use the GoogleTest fixture CalcTest (tests/calc/calc_test.hxx)
// on top of this.
#pragma once

#include <string>
#include <vector>

#include <com/sun/star/lang/XComponent.hpp>
#include <com/sun/star/sheet/XSpreadsheet.hpp>
#include <com/sun/star/table/XCell.hpp>
#include <com/sun/star/uno/Reference.hxx>
#include <com/sun/star/uno/Exception.hpp>
#include <com/sun/star/uno/XComponentContext.hpp>
#include <rtl/ustring.hxx>

namespace isentra::office {

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

// UTF-8 <-> UNO strings, and a UNO exception as a sentence ("message (type)").
rtl::OUString ou(const std::string& s);
std::string str(const rtl::OUString& s);
std::string message(const css::uno::Exception& e);

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

}  // namespace isentra::office
