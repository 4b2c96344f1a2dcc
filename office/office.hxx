// SPDX-License-Identifier: MPL-2.0
// The headless-office harness (library isentra_office; no GoogleTest): a
// private LibreOffice with the Isentra extension, driven over UNO. Used by the
// Calc tests (tests/calc, fixture CalcTest in calc_test.hxx), calc_bench,
// isentra-recalc (recalc/) and recalc_tests.
//
// Office(settings) makes a throwaway directory with a profile and a HOME,
// starts `soffice --terminate_after_init` once on the fresh profile (an
// extension added to a profile that no office has started yet is unregistered
// by its first start), installs the .oxt with `unopkg add -s -f`, adds the
// settings' configuration items to the profile, starts `soffice --headless`
// in its own process group on a free TCP port of 127.0.0.1 and connects a UNO
// bridge. The destructor terminates the office, kills its process group by id
// and removes the directory; a watchdog process does the same if the client
// dies first. Several Office objects may live side by side (one profile each).
//
// As root, unopkg refuses per-user installs: the profile and HOME belong to
// uid/gid 65534 (nobody) and unopkg and soffice run as that user (setpriv).
//
// Office::get() is one shared office for a whole test binary, started on
// first use; Office::shutdown() stops it (the test's main does).
#pragma once

#include <string>

#include <rtl/ustring.hxx>

#include <com/sun/star/lang/XComponent.hpp>
#include <com/sun/star/uno/Exception.hpp>
#include <com/sun/star/uno/Reference.hxx>
#include <com/sun/star/uno/XComponentContext.hpp>

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

struct Settings {
    std::string oxt;              // extension to install; "" = the built one (ISENTRA_OXT_PATH)
    std::string program_dir;      // LibreOffice's program folder; "" = the configured one
    std::string tmp_parent;       // "" = $ISENTRA_TEST_TMPDIR, $TMPDIR or /tmp
    std::string prefix = "isentra-office-";  // name of the throwaway directory (+ XXXXXX)
    std::string profile_items;    // extra <item> elements for registrymodifications.xcu
    int start_timeout_s = 120;
};

class Office {
public:
    // Prepares the profile and starts the office. Throws std::runtime_error
    // with the office's log if it cannot.
    explicit Office(Settings settings = {});
    ~Office();

    // The shared office of a test binary, started on first call (profile
    // directory isentra-calc-XXXXXX). Throws std::runtime_error (with the
    // office's log) if it cannot be started; later calls throw the same.
    static Office& get();
    // Stops the shared office if it was started (idempotent).
    static void shutdown();
    Office(const Office&) = delete;
    Office& operator=(const Office&) = delete;

    const css::uno::Reference<css::uno::XComponentContext>& context() const { return remote_; }

    // The throwaway directory (readable by the office's user) and a folder in
    // it that the office's user may write (its HOME).
    const std::string& dir() const { return dir_; }
    const std::string& writable_dir() const { return home_; }

    // Kills the office (if still running) and starts it again on the same
    // profile. Throws std::runtime_error if it does not come back.
    void restart();
    // Sends a signal to the office's process group (SIGKILL: stop it now,
    // from any thread; SIGSTOP: simulate a hang).
    void signal(int sig);
    bool alive();
    int pid() const { return pgid_; }

    // A new hidden Calc document; close it with close().
    css::uno::Reference<css::lang::XComponent> new_calc_document();
    static void close(const css::uno::Reference<css::lang::XComponent>& doc);

    // The last part of the office's output (for error messages).
    std::string log_tail() const;

private:
    void start();  // soffice --accept + connect
    void stop();

    Settings settings_;
    std::string dir_, home_, profile_, log_;
    std::string program_;
    bool root_ = false;
    int pgid_ = -1;         // soffice's process group
    int watchdog_fd_ = -1;  // write end of the watchdog's pipe
    int watchdog_pid_ = -1;
    css::uno::Reference<css::uno::XComponentContext> remote_;
};

}  // namespace isentra::office
