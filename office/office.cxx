// SPDX-License-Identifier: MPL-2.0
#include "office.hxx"

#include <cerrno>
#include <cxxabi.h>
#include <typeinfo>
#include <chrono>
#include <cstdlib>
#include <cstring>
#include <filesystem>
#include <fstream>
#include <memory>
#include <sstream>
#include <stdexcept>
#include <thread>

#include <arpa/inet.h>
#include <fcntl.h>
#include <netinet/in.h>
#include <signal.h>
#include <sys/socket.h>
#include <sys/stat.h>
#include <sys/types.h>
#include <sys/wait.h>
#include <unistd.h>

#include <com/sun/star/beans/PropertyValue.hpp>
#include <com/sun/star/bridge/XUnoUrlResolver.hpp>
#include <com/sun/star/container/XIndexAccess.hpp>
#include <com/sun/star/frame/XComponentLoader.hpp>
#include <com/sun/star/frame/XDesktop.hpp>
#include <com/sun/star/lang/XMultiComponentFactory.hpp>
#include <com/sun/star/sheet/XArrayFormulaRange.hpp>
#include <com/sun/star/sheet/XCalculatable.hpp>
#include <com/sun/star/sheet/XSpreadsheetDocument.hpp>
#include <com/sun/star/sheet/XSpreadsheets.hpp>
#include <com/sun/star/table/XCellRange.hpp>
#include <com/sun/star/text/XTextRange.hpp>
#include <com/sun/star/uno/Exception.hpp>
#include <com/sun/star/util/XCloseable.hpp>
#include <cppuhelper/bootstrap.hxx>
#include <rtl/ustring.hxx>

#ifndef ISENTRA_OXT_PATH
#error "ISENTRA_OXT_PATH must name the built .oxt"
#endif
#ifndef ISENTRA_LO_PROGRAM_DIR
#define ISENTRA_LO_PROGRAM_DIR "/usr/lib/libreoffice/program"
#endif
#ifndef ISENTRA_UNO_INI
#error "ISENTRA_UNO_INI must name the client's UNO bootstrap file"
#endif

namespace isentra::office {

namespace fs = std::filesystem;
using css::uno::Reference;
using css::uno::UNO_QUERY;
using css::uno::UNO_QUERY_THROW;
using rtl::OUString;

OUString ou(const std::string& s) { return OUString(s.data(), static_cast<sal_Int32>(s.size()), RTL_TEXTENCODING_UTF8); }

std::string str(const OUString& s) {
    const rtl::OString o = rtl::OUStringToOString(s, RTL_TEXTENCODING_UTF8);
    return std::string(o.getStr(), static_cast<std::size_t>(o.getLength()));
}

std::string message(const css::uno::Exception& e) {
    int status = 0;
    char* name = abi::__cxa_demangle(typeid(e).name(), nullptr, nullptr, &status);
    const std::string type = name ? name : typeid(e).name();
    std::free(name);
    return str(e.Message) + " (" + type + ")";
}

namespace {

constexpr uid_t unprivileged_id = 65534;  // nobody / nogroup on Debian



std::string read_file(const std::string& path, std::size_t max = 4000) {
    std::ifstream in(path, std::ios::binary);
    std::ostringstream s;
    s << in.rdbuf();
    std::string r = s.str();
    if (r.size() > max) r = "..." + r.substr(r.size() - max);
    return r;
}

// A free TCP port on 127.0.0.1 (the kernel picks it; soffice binds it a moment later).
int free_port() {
    const int s = ::socket(AF_INET, SOCK_STREAM | SOCK_CLOEXEC, 0);
    if (s < 0) throw std::runtime_error("socket() failed");
    sockaddr_in a{};
    a.sin_family = AF_INET;
    a.sin_addr.s_addr = htonl(INADDR_LOOPBACK);
    a.sin_port = 0;
    socklen_t len = sizeof a;
    if (::bind(s, reinterpret_cast<sockaddr*>(&a), sizeof a) != 0 ||
        ::getsockname(s, reinterpret_cast<sockaddr*>(&a), &len) != 0) {
        ::close(s);
        throw std::runtime_error("cannot find a free port on 127.0.0.1");
    }
    const int port = ntohs(a.sin_port);
    ::close(s);
    return port;
}

// Starts argv in a new process group (the child's pid is the group id),
// stdout and stderr appended to `log`.
pid_t spawn(const std::vector<std::string>& argv, const std::string& log) {
    std::vector<char*> args;
    for (const std::string& a : argv) args.push_back(const_cast<char*>(a.c_str()));
    args.push_back(nullptr);
    const pid_t pid = ::fork();
    if (pid < 0) throw std::runtime_error("fork failed");
    if (pid == 0) {
        ::setpgid(0, 0);
        const int fd = ::open(log.c_str(), O_WRONLY | O_CREAT | O_APPEND, 0644);
        if (fd >= 0) {
            ::dup2(fd, 1);
            ::dup2(fd, 2);
            ::close(fd);
        }
        const int null = ::open("/dev/null", O_RDONLY);
        if (null >= 0) ::dup2(null, 0);
        ::execvp(args[0], args.data());
        std::_Exit(127);
    }
    ::setpgid(pid, pid);  // also from the parent, to avoid a race with kill()
    return pid;
}

void kill_group(pid_t pgid) {
    if (pgid <= 0) return;
    ::kill(-pgid, SIGTERM);
    for (int i = 0; i < 30; ++i) {  // up to 3 s for a clean exit
        if (::kill(-pgid, 0) != 0) return;
        ::waitpid(pgid, nullptr, WNOHANG);
        std::this_thread::sleep_for(std::chrono::milliseconds(100));
    }
    ::kill(-pgid, SIGKILL);
}

// Runs argv to completion (in its own process group); returns the exit status.
int run(const std::vector<std::string>& argv, const std::string& log, int timeout_s) {
    const pid_t pid = spawn(argv, log);
    const auto deadline = std::chrono::steady_clock::now() + std::chrono::seconds(timeout_s);
    int status = 0;
    while (true) {
        const pid_t r = ::waitpid(pid, &status, WNOHANG);
        if (r == pid) break;
        if (r < 0 && errno != EINTR) return -1;
        if (std::chrono::steady_clock::now() > deadline) {
            kill_group(pid);
            ::waitpid(pid, &status, 0);
            throw std::runtime_error("timed out after " + std::to_string(timeout_s) + " s: " + argv[0] +
                                     " ...\n" + read_file(log));
        }
        std::this_thread::sleep_for(std::chrono::milliseconds(50));
    }
    ::kill(-pid, SIGKILL);  // leftovers of the group, if any
    return WIFEXITED(status) ? WEXITSTATUS(status) : 128 + WTERMSIG(status);
}

// The local UNO runtime of this test process (created once).
Reference<css::uno::XComponentContext> local_context() {
    static const Reference<css::uno::XComponentContext> ctx =
        cppu::defaultBootstrap_InitialComponentContext(ou(ISENTRA_UNO_INI));
    return ctx;
}


std::unique_ptr<Office>& instance() {
    static std::unique_ptr<Office> office;
    return office;
}

std::string& start_failure() {
    static std::string failure;
    return failure;
}

}  // namespace

Office& Office::get() {
    auto& office = instance();
    if (!office) {
        if (!start_failure().empty()) throw std::runtime_error(start_failure());
        try {
            office.reset(new Office());
        } catch (const std::exception& e) {
            start_failure() = std::string("cannot start the headless office: ") + e.what();
            throw std::runtime_error(start_failure());
        } catch (const css::uno::Exception& e) {
            start_failure() = "cannot start the headless office: " + message(e);
            throw std::runtime_error(start_failure());
        }
    }
    return *office;
}

void Office::shutdown() { instance().reset(); }

Office::Office() {
    const bool root = ::geteuid() == 0;
    const char* tmp = std::getenv("ISENTRA_TEST_TMPDIR");
    if (!tmp || !*tmp) tmp = "/tmp";
    std::string pattern = std::string(tmp) + "/isentra-calc-XXXXXX";
    if (!::mkdtemp(pattern.data())) throw std::runtime_error("mkdtemp failed in " + std::string(tmp));
    dir_ = pattern;
    ::chmod(dir_.c_str(), 0755);  // traversable by the unprivileged user
    const std::string profile = dir_ + "/profile", home = dir_ + "/home", oxt = dir_ + "/isentra.oxt";
    fs::create_directory(profile);
    fs::create_directory(home);
    std::error_code ec;
    fs::copy_file(ISENTRA_OXT_PATH, oxt, ec);
    if (ec) throw std::runtime_error(std::string("cannot copy ") + ISENTRA_OXT_PATH + ": " + ec.message() +
                                     " (build the extension first)");
    ::chmod(oxt.c_str(), 0644);

    std::vector<std::string> as_user;  // runs a command as the office's user, with a private HOME
    if (root) {
        if (::chown(profile.c_str(), unprivileged_id, unprivileged_id) != 0 ||
            ::chown(home.c_str(), unprivileged_id, unprivileged_id) != 0)
            throw std::runtime_error("cannot chown the test profile to uid 65534");
        as_user = {"setpriv", "--reuid=" + std::to_string(unprivileged_id),
                   "--regid=" + std::to_string(unprivileged_id), "--clear-groups"};
    }
    // -C: start in our own world-readable directory; the office's start script changes back
    // to its working directory and fails if the unprivileged user cannot enter it (a clone
    // under /root, mode 0700).
    as_user.insert(as_user.end(), {"env", "-C", dir_, "HOME=" + home, "LANG=C.UTF-8", "LC_ALL=C.UTF-8"});
    const std::string program = ISENTRA_LO_PROGRAM_DIR;
    const std::string user_installation = "-env:UserInstallation=file://" + profile;
    const std::string log = dir_ + "/office.log";

    auto cmd = [&](std::vector<std::string> tail) {
        std::vector<std::string> v = as_user;
        v.insert(v.end(), tail.begin(), tail.end());
        return v;
    };

    // 1. Initialise the profile. (An extension added to a profile that no
    //    office has started yet is unregistered again by the first start.)
    int rc = run(cmd({program + "/soffice", "--headless", "--norestore", "--nologo", "--terminate_after_init",
                      user_installation}),
                 log, 180);
    if (rc != 0) throw std::runtime_error("soffice --terminate_after_init failed (" + std::to_string(rc) + "):\n" + read_file(log));
    // 2. Install the extension (-s: accept the licence without asking).
    rc = run(cmd({program + "/unopkg", "add", "-s", "-f", oxt, user_installation}), log, 180);
    if (rc != 0) throw std::runtime_error("unopkg add failed (" + std::to_string(rc) + "):\n" + read_file(log));
    // 3. The office, listening on a socket (a pipe is per user).
    const int port = free_port();
    pgid_ = spawn(cmd({program + "/soffice", "--headless", "--invisible", "--norestore", "--nologo", "--nodefault",
                       "--nolockcheck", user_installation,
                       "--accept=socket,host=127.0.0.1,port=" + std::to_string(port) +
                           ";urp;StarOffice.ComponentContext"}),
                  log);

    // 4. Watchdog: if this process dies without shutdown(), kill the office
    //    and remove the directory. It waits for EOF on a pipe; a byte means
    //    "orderly shutdown, nothing to do".
    int fds[2];
    if (::pipe2(fds, O_CLOEXEC) == 0) {
        const pid_t w = ::fork();
        if (w == 0) {
            ::setsid();  // survive a kill of this process's group
            ::close(fds[1]);
            char c;
            ssize_t n;
            while ((n = ::read(fds[0], &c, 1)) < 0 && errno == EINTR) {
            }
            if (n == 1) std::_Exit(0);
            ::kill(-pgid_, SIGKILL);
            ::sleep(1);
            ::execlp("rm", "rm", "-rf", dir_.c_str(), static_cast<char*>(nullptr));
            std::_Exit(0);
        }
        ::close(fds[0]);
        if (w > 0) {
            watchdog_pid_ = w;
            watchdog_fd_ = fds[1];
        } else {
            ::close(fds[1]);
        }
    }

    // 5. Connect, with retries while the office starts.
    const Reference<css::uno::XComponentContext> local = local_context();
    Reference<css::bridge::XUnoUrlResolver> resolver(
        local->getServiceManager()->createInstanceWithContext("com.sun.star.bridge.UnoUrlResolver", local),
        UNO_QUERY_THROW);
    const OUString url = ou("uno:socket,host=127.0.0.1,port=" + std::to_string(port) +
                            ";urp;StarOffice.ComponentContext");
    const auto deadline = std::chrono::steady_clock::now() + std::chrono::seconds(120);
    std::string last_error;
    while (!remote_.is()) {
        try {
            remote_.set(resolver->resolve(url), UNO_QUERY_THROW);
            // The desktop answers only when the office is fully up.
            Reference<css::frame::XDesktop> desktop(
                remote_->getServiceManager()->createInstanceWithContext("com.sun.star.frame.Desktop", remote_),
                UNO_QUERY_THROW);
        } catch (const css::uno::Exception& e) {
            remote_.clear();
            last_error = message(e);
        }
        if (remote_.is()) break;
        int status = 0;
        if (::waitpid(pgid_, &status, WNOHANG) == pgid_) {
            pgid_ = -1;
            throw std::runtime_error("soffice exited before accepting a connection:\n" + read_file(log));
        }
        if (std::chrono::steady_clock::now() > deadline)
            throw std::runtime_error("no connection to soffice on port " + std::to_string(port) +
                                     " within 120 s (" + last_error + "):\n" + read_file(log));
        std::this_thread::sleep_for(std::chrono::milliseconds(200));
    }
}

Office::~Office() { stop(); }

void Office::stop() {
    if (remote_.is()) {
        try {
            Reference<css::frame::XDesktop> desktop(
                remote_->getServiceManager()->createInstanceWithContext("com.sun.star.frame.Desktop", remote_),
                UNO_QUERY);
            if (desktop.is()) desktop->terminate();
        } catch (...) {
            // the bridge goes away with the office: expected
        }
        try {
            remote_.clear();
        } catch (...) {
        }
    }
    if (pgid_ > 0) {
        for (int i = 0; i < 50 && ::waitpid(pgid_, nullptr, WNOHANG) == 0; ++i)
            std::this_thread::sleep_for(std::chrono::milliseconds(100));
        kill_group(pgid_);
        ::waitpid(pgid_, nullptr, WNOHANG);
        pgid_ = -1;
    }
    if (watchdog_fd_ >= 0) {
        const char done = 'x';
        (void)!::write(watchdog_fd_, &done, 1);
        ::close(watchdog_fd_);
        watchdog_fd_ = -1;
        ::waitpid(watchdog_pid_, nullptr, 0);
    }
    if (!dir_.empty()) {
        std::error_code ec;
        if (std::getenv("ISENTRA_KEEP_PROFILE"))
            std::fprintf(stderr, "isentra office: keeping %s\n", dir_.c_str());
        else
            fs::remove_all(dir_, ec);
        dir_.clear();
    }
}

Reference<css::lang::XComponent> Office::new_calc_document() {
    Reference<css::frame::XComponentLoader> loader(
        remote_->getServiceManager()->createInstanceWithContext("com.sun.star.frame.Desktop", remote_),
        UNO_QUERY_THROW);
    css::uno::Sequence<css::beans::PropertyValue> props(1);
    props[0].Name = "Hidden";
    props[0].Value <<= true;
    Reference<css::lang::XComponent> doc =
        loader->loadComponentFromURL("private:factory/scalc", "_blank", 0, props);
    if (!doc.is()) throw std::runtime_error("the office did not create a Calc document");
    return doc;
}

void Office::close(const Reference<css::lang::XComponent>& doc) {
    if (!doc.is()) return;
    Reference<css::util::XCloseable> c(doc, UNO_QUERY);
    if (c.is()) c->close(true);
    else doc->dispose();
}

}  // namespace isentra::office
