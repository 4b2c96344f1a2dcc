// SPDX-License-Identifier: MPL-2.0
#include "office.hxx"

#include <cerrno>
#include <chrono>
#include <cstdio>
#include <cstdlib>
#include <cstring>
#include <cxxabi.h>
#include <filesystem>
#include <fstream>
#include <memory>
#include <mutex>
#include <signal.h>
#include <sstream>
#include <stdexcept>
#include <thread>
#include <typeinfo>
#include <vector>

#include <arpa/inet.h>
#include <fcntl.h>
#include <netinet/in.h>
#include <sys/socket.h>
#include <sys/stat.h>
#include <sys/types.h>
#include <sys/wait.h>
#include <unistd.h>

#include <com/sun/star/beans/PropertyValue.hpp>
#include <com/sun/star/bridge/XUnoUrlResolver.hpp>
#include <com/sun/star/frame/XComponentLoader.hpp>
#include <com/sun/star/frame/XDesktop.hpp>
#include <com/sun/star/lang/XMultiComponentFactory.hpp>
#include <com/sun/star/uno/Exception.hpp>
#include <com/sun/star/util/XCloseable.hpp>
#include <cppuhelper/bootstrap.hxx>
#include <rtl/ustring.hxx>

#ifndef ISENTRA_OXT_PATH
#define ISENTRA_OXT_PATH ""
#endif
#ifndef ISENTRA_LO_PROGRAM_DIR
#define ISENTRA_LO_PROGRAM_DIR "/usr/lib/libreoffice/program"
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
// stdout and stderr appended to `log`. Only async-signal-safe calls after fork
// (the client may have other threads).
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

void kill_group(pid_t pgid, int grace_ms) {
    if (pgid <= 0) return;
    ::kill(-pgid, SIGCONT);  // a stopped office cannot exit cleanly
    ::kill(-pgid, SIGTERM);
    for (int i = 0; i < grace_ms / 100; ++i) {
        ::waitpid(pgid, nullptr, WNOHANG);
        if (::kill(-pgid, 0) != 0) return;
        std::this_thread::sleep_for(std::chrono::milliseconds(100));
    }
    ::kill(-pgid, SIGKILL);
    ::waitpid(pgid, nullptr, 0);
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
            kill_group(pid, 0);
            throw std::runtime_error("timed out after " + std::to_string(timeout_s) + " s: " + argv[0] + " ...\n" +
                                     read_file(log));
        }
        std::this_thread::sleep_for(std::chrono::milliseconds(50));
    }
    ::kill(-pid, SIGKILL);  // leftovers of the group, if any
    return WIFEXITED(status) ? WEXITSTATUS(status) : 128 + WTERMSIG(status);
}

// The local UNO runtime of this process (created once): office types and
// the URE services (bridge, connector, URL resolver), from a bootstrap file
// written for the program folder.
Reference<css::uno::XComponentContext> local_context(const std::string& program, const std::string& tmp) {
    static std::mutex mutex;
    static Reference<css::uno::XComponentContext> ctx;
    std::lock_guard<std::mutex> lock(mutex);
    if (ctx.is()) return ctx;
    std::string ini = tmp + "/isentra-uno-XXXXXX";
    const int fd = ::mkstemp(ini.data());
    if (fd < 0) throw std::runtime_error("cannot create a UNO bootstrap file in " + tmp);
    const std::string text = "[Bootstrap]\nURE_INTERNAL_LIB_DIR=file://" + program + "\nLO_LIB_DIR=file://" + program +
                             "\nUNO_TYPES=file://" + program + "/types.rdb file://" + program +
                             "/types/offapi.rdb\nUNO_SERVICES=file://" + program + "/services.rdb\n";
    const bool ok = ::write(fd, text.data(), text.size()) == static_cast<ssize_t>(text.size());
    ::close(fd);
    if (!ok) throw std::runtime_error("cannot write " + ini);
    try {
        ctx = cppu::defaultBootstrap_InitialComponentContext(ou("file://" + ini));
    } catch (...) {
        ::unlink(ini.c_str());
        throw;
    }
    ::unlink(ini.c_str());
    return ctx;
}

void add_profile_items(const std::string& profile, const std::string& items) {
    if (items.empty()) return;
    const std::string path = profile + "/user/registrymodifications.xcu";
    std::string xcu = read_file(path, std::string::npos);
    const std::size_t end = xcu.rfind("</oor:items>");
    if (end == std::string::npos) throw std::runtime_error("no registrymodifications.xcu in the new profile " + profile);
    xcu.insert(end, items);
    std::ofstream out(path, std::ios::binary | std::ios::trunc);
    out << xcu;
    if (!out) throw std::runtime_error("cannot write " + path);
}

}  // namespace

std::string message(const css::uno::Exception& e) {
    int status = 0;
    char* name = abi::__cxa_demangle(typeid(e).name(), nullptr, nullptr, &status);
    const std::string type = name ? name : typeid(e).name();
    std::free(name);
    return str(e.Message) + " (" + type + ")";
}

Office::Office(Settings settings) : settings_(std::move(settings)) {
    root_ = ::geteuid() == 0;
    std::string tmp = settings_.tmp_parent;
    if (tmp.empty() && std::getenv("ISENTRA_TEST_TMPDIR")) tmp = std::getenv("ISENTRA_TEST_TMPDIR");
    if (tmp.empty() && std::getenv("TMPDIR")) tmp = std::getenv("TMPDIR");
    if (tmp.empty()) tmp = "/tmp";
    program_ = settings_.program_dir;
    if (program_.empty() && std::getenv("ISENTRA_LO_PROGRAM")) program_ = std::getenv("ISENTRA_LO_PROGRAM");
    if (program_.empty()) program_ = ISENTRA_LO_PROGRAM_DIR;
    std::string oxt_source = settings_.oxt.empty() ? std::string(ISENTRA_OXT_PATH) : settings_.oxt;

    std::string pattern = tmp + "/" + settings_.prefix + "XXXXXX";
    if (!::mkdtemp(pattern.data())) throw std::runtime_error("cannot make a directory in " + tmp + ": " + std::strerror(errno));
    dir_ = pattern;
    try {
        ::chmod(dir_.c_str(), 0755);  // traversable by the unprivileged user
        profile_ = dir_ + "/profile";
        home_ = dir_ + "/home";
        log_ = dir_ + "/office.log";
        const std::string oxt = dir_ + "/isentra.oxt";
        fs::create_directory(profile_);
        fs::create_directory(home_);
        fs::create_directory(dir_ + "/tmp");  // the office's TMPDIR: nothing of it outside dir_
        if (!oxt_source.empty()) {
            std::error_code ec;
            fs::copy_file(oxt_source, oxt, ec);
            if (ec) throw std::runtime_error("cannot copy the extension " + oxt_source + ": " + ec.message());
            ::chmod(oxt.c_str(), 0644);
        }
        if (root_ && (::chown(profile_.c_str(), unprivileged_id, unprivileged_id) != 0 ||
                      ::chown(home_.c_str(), unprivileged_id, unprivileged_id) != 0 ||
                      ::chown((dir_ + "/tmp").c_str(), unprivileged_id, unprivileged_id) != 0))
            throw std::runtime_error("cannot give the private profile to uid 65534");

        // Watchdog: if this process dies without stop(), kill the office and
        // remove the directory. Messages on a pipe: 'p' + pid (the office's
        // current process group), 'x' (orderly shutdown); EOF means the client died.
        int fds[2];
        if (::pipe2(fds, O_CLOEXEC) == 0) {
            const std::string dir = dir_;
            const pid_t w = ::fork();
            if (w == 0) {
                ::setsid();  // survive a kill of the client's group
                ::close(fds[1]);
                pid_t office = -1;
                while (true) {
                    char c;
                    ssize_t n = ::read(fds[0], &c, 1);
                    if (n < 0 && errno == EINTR) continue;
                    if (n == 1 && c == 'x') std::_Exit(0);
                    if (n == 1 && c == 'p') {
                        pid_t p;
                        std::size_t got = 0;
                        while (got < sizeof p) {
                            const ssize_t k = ::read(fds[0], reinterpret_cast<char*>(&p) + got, sizeof p - got);
                            if (k <= 0) break;
                            got += static_cast<std::size_t>(k);
                        }
                        if (got == sizeof p) office = p;
                        continue;
                    }
                    break;  // EOF or error: the client is gone
                }
                if (office > 0) {
                    ::kill(-office, SIGCONT);
                    ::kill(-office, SIGKILL);
                }
                ::sleep(1);
                ::execlp("rm", "rm", "-rf", dir.c_str(), static_cast<char*>(nullptr));
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

        auto cmd = [&](std::vector<std::string> tail) {
            std::vector<std::string> v;
            if (root_)
                v = {"setpriv", "--reuid=" + std::to_string(unprivileged_id), "--regid=" + std::to_string(unprivileged_id),
                     "--clear-groups"};
            // -C: the office's start script changes back to its working directory and fails if
            // the unprivileged user cannot enter it (a clone under /root, mode 0700).
            v.insert(v.end(), {"env", "-C", dir_, "HOME=" + home_, "TMPDIR=" + dir_ + "/tmp", "LANG=C.UTF-8", "LC_ALL=C.UTF-8"});
            v.insert(v.end(), tail.begin(), tail.end());
            return v;
        };
        const std::string user_installation = "-env:UserInstallation=file://" + profile_;
        // 1. Initialise the profile.
        int rc = run(cmd({program_ + "/soffice", "--headless", "--norestore", "--nologo", "--terminate_after_init",
                          user_installation}),
                     log_, 180);
        if (rc != 0)
            throw std::runtime_error("soffice --terminate_after_init failed (" + std::to_string(rc) + "):\n" + log_tail());
        // 2. The extension (-s: accept the licence without asking).
        if (!oxt_source.empty()) {
            rc = run(cmd({program_ + "/unopkg", "add", "-s", "-f", oxt, user_installation}), log_, 180);
            if (rc != 0) throw std::runtime_error("unopkg add failed (" + std::to_string(rc) + "):\n" + log_tail());
        }
        // 3. Configuration.
        add_profile_items(profile_, settings_.profile_items);
        local_context(program_, tmp);
        start();
    } catch (...) {
        stop();
        throw;
    }
}

void Office::start() {
    const std::string user_installation = "-env:UserInstallation=file://" + profile_;
    std::vector<std::string> v;
    if (root_)
        v = {"setpriv", "--reuid=" + std::to_string(unprivileged_id), "--regid=" + std::to_string(unprivileged_id),
             "--clear-groups"};
    const int port = free_port();
    v.insert(v.end(), {"env", "-C", dir_, "HOME=" + home_, "TMPDIR=" + dir_ + "/tmp", "LANG=C.UTF-8", "LC_ALL=C.UTF-8",
                       program_ + "/soffice",
                       "--headless", "--invisible", "--norestore", "--nologo", "--nodefault", "--nolockcheck",
                       user_installation,
                       "--accept=socket,host=127.0.0.1,port=" + std::to_string(port) + ";urp;StarOffice.ComponentContext"});
    pgid_ = spawn(v, log_);
    if (watchdog_fd_ >= 0) {
        char msg[1 + sizeof(pid_t)];
        msg[0] = 'p';
        const pid_t p = pgid_;
        std::memcpy(msg + 1, &p, sizeof p);
        (void)!::write(watchdog_fd_, msg, sizeof msg);
    }
    // Connect, with retries while the office starts.
    const Reference<css::uno::XComponentContext> local = local_context(program_, "/tmp");
    Reference<css::bridge::XUnoUrlResolver> resolver(
        local->getServiceManager()->createInstanceWithContext("com.sun.star.bridge.UnoUrlResolver", local),
        UNO_QUERY_THROW);
    const OUString url = ou("uno:socket,host=127.0.0.1,port=" + std::to_string(port) + ";urp;StarOffice.ComponentContext");
    const auto deadline = std::chrono::steady_clock::now() + std::chrono::seconds(settings_.start_timeout_s);
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
            throw std::runtime_error("soffice exited before accepting a connection:\n" + log_tail());
        }
        if (std::chrono::steady_clock::now() > deadline)
            throw std::runtime_error("no connection to soffice on port " + std::to_string(port) + " within " +
                                     std::to_string(settings_.start_timeout_s) + " s (" + last_error + "):\n" + log_tail());
        std::this_thread::sleep_for(std::chrono::milliseconds(100));
    }
}

Office::~Office() { stop(); }

namespace {

std::unique_ptr<Office>& shared() {
    static std::unique_ptr<Office> office;
    return office;
}

std::string& shared_failure() {
    static std::string failure;
    return failure;
}

}  // namespace

Office& Office::get() {
    auto& office = shared();
    if (!office) {
        if (!shared_failure().empty()) throw std::runtime_error(shared_failure());
        try {
            Settings s;
            s.prefix = "isentra-calc-";
            office = std::make_unique<Office>(s);
        } catch (const std::exception& e) {
            shared_failure() = std::string("cannot start the headless office: ") + e.what();
            throw std::runtime_error(shared_failure());
        } catch (const css::uno::Exception& e) {
            shared_failure() = "cannot start the headless office: " + message(e);
            throw std::runtime_error(shared_failure());
        }
    }
    return *office;
}

void Office::shutdown() { shared().reset(); }

void Office::signal(int sig) {
    const int p = pgid_;
    if (p > 0) ::kill(-p, sig);
}

bool Office::alive() {
    if (pgid_ <= 0) return false;
    int status = 0;
    const pid_t r = ::waitpid(pgid_, &status, WNOHANG);
    if (r == pgid_) {
        ::kill(-pgid_, SIGKILL);  // what is left of the group
        pgid_ = -1;
        return false;
    }
    return r == 0;
}

void Office::restart() {
    try {
        remote_.clear();
    } catch (...) {
    }
    if (pgid_ > 0) {
        kill_group(pgid_, 0);
        pgid_ = -1;
    }
    start();
}

std::string Office::log_tail() const { return read_file(log_); }

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
        kill_group(pgid_, 3000);
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
        remote_->getServiceManager()->createInstanceWithContext("com.sun.star.frame.Desktop", remote_), UNO_QUERY_THROW);
    css::uno::Sequence<css::beans::PropertyValue> props(1);
    props[0].Name = "Hidden";
    props[0].Value <<= true;
    Reference<css::lang::XComponent> doc = loader->loadComponentFromURL("private:factory/scalc", "_blank", 0, props);
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
