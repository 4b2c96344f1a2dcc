// SPDX-License-Identifier: MPL-2.0
#include "runner.hpp"

#include <atomic>
#include <csignal>
#include <chrono>
#include <cstdio>
#include <cstdlib>
#include <filesystem>
#include <fstream>
#include <memory>
#include <mutex>
#include <signal.h>
#include <sys/stat.h>
#include <sstream>
#include <thread>
#include <unistd.h>

#include <com/sun/star/lang/DisposedException.hpp>
#include <com/sun/star/uno/Exception.hpp>
#include <com/sun/star/uno/RuntimeException.hpp>

#include "office.hxx"
#include "session.hpp"
#include "stored.hpp"

namespace isentra::recalc {

namespace fs = std::filesystem;
using Clock = std::chrono::steady_clock;

namespace {

// What the private profile adds to LibreOffice's defaults (registrymodifications.xcu items):
// never recalculate on load (ODF and OOXML: the stored results are what we read first),
// macros disabled outright, links never updated, no thumbnail picture in the copies
// (rendering it is most of the time a small workbook takes to store).
const char* const profile_items =
    "<item oor:path=\"/org.openoffice.Office.Calc/Formula/Load\"><prop oor:name=\"ODFRecalcMode\" oor:op=\"fuse\">"
    "<value>1</value></prop></item>\n"
    "<item oor:path=\"/org.openoffice.Office.Calc/Formula/Load\"><prop oor:name=\"OOXMLRecalcMode\" oor:op=\"fuse\">"
    "<value>1</value></prop></item>\n"
    "<item oor:path=\"/org.openoffice.Office.Common/Security/Scripting\"><prop oor:name=\"MacroSecurityLevel\" "
    "oor:op=\"fuse\"><value>3</value></prop></item>\n"
    "<item oor:path=\"/org.openoffice.Office.Common/Security/Scripting\"><prop oor:name=\"DisableMacrosExecution\" "
    "oor:op=\"fuse\"><value>true</value></prop></item>\n"
    "<item oor:path=\"/org.openoffice.Office.Calc/Content/Update\"><prop oor:name=\"Link\" oor:op=\"fuse\">"
    "<value>2</value></prop></item>\n"
    "<item oor:path=\"/org.openoffice.Office.Common/Save/Document\"><prop oor:name=\"GenerateThumbnail\" "
    "oor:op=\"fuse\"><value>false</value></prop></item>\n";

std::string file_url(const std::string& path) {
    std::string u = "file://";
    for (unsigned char c : path) {
        if (std::isalnum(c) || c == '/' || c == '-' || c == '_' || c == '.' || c == '~') u += static_cast<char>(c);
        else {
            char b[4];
            std::snprintf(b, sizeof b, "%%%02X", c);
            u += b;
        }
    }
    return u;
}

std::string read_whole(const std::string& path) {
    std::ifstream in(path, std::ios::binary);
    if (!in) throw std::runtime_error("cannot read " + path);
    std::ostringstream s;
    s << in.rdbuf();
    return s.str();
}

void copy_file_new(const std::string& from, const std::string& to) { write_new_file(to, read_whole(from)); }

struct Worker {
    int index = 0;
    std::unique_ptr<office::Office> office;
    std::mutex mutex;  // guards office against kill() during restart
    std::atomic<long long> deadline{0};  // steady-clock ns; 0: idle
    std::atomic<bool> timed_out{false};
    std::string start_error;
};

// The extension to install: $ISENTRA_OXT, else the one installed beside the
// program (<prefix>/share/isentra/isentra.oxt), else the build's (the harness default).
std::string extension_package() {
    if (const char* oxt = std::getenv("ISENTRA_OXT"); oxt && *oxt) return oxt;
    std::error_code ec;
    const fs::path exe = fs::read_symlink("/proc/self/exe", ec);
    if (!ec) {
        const fs::path installed = exe.parent_path().parent_path() / "share" / "isentra" / "isentra.oxt";
        if (fs::exists(installed, ec)) return installed.string();
    }
    return "";
}

office::Settings settings_for(int index) {
    office::Settings s;
    s.prefix = "isentra-recalc-" + std::to_string(index) + "-";
    s.profile_items = profile_items;
    s.oxt = extension_package();
    return s;
}

class Progress {
public:
    Progress(std::size_t total, bool on) : total_(total), on_(on && ::isatty(2)) {}
    void finished(const FileResult& r) {
        std::lock_guard<std::mutex> lock(mutex_);
        ++done_;
        if (r.failed) ++failed_;
        clear();
        std::fprintf(stdout, "%s\n", summary_line(r).c_str());
        std::fflush(stdout);
        draw();
    }
    void message(const std::string& m) {
        std::lock_guard<std::mutex> lock(mutex_);
        clear();
        std::fprintf(stderr, "isentra-recalc: %s\n", m.c_str());
        draw();
    }
    void end() {
        std::lock_guard<std::mutex> lock(mutex_);
        clear();
    }

private:
    void clear() {
        if (on_ && drawn_) std::fputs("\r\033[K", stderr);
        drawn_ = false;
    }
    void draw() {
        if (!on_ || done_ >= total_) return;
        std::fprintf(stderr, "isentra-recalc: %zu/%zu files done, %zu failed", done_, total_, failed_);
        std::fflush(stderr);
        drawn_ = true;
    }
    std::mutex mutex_;
    std::size_t total_, done_ = 0, failed_ = 0;
    bool on_, drawn_ = false;
};

// Ctrl-C (SIGINT) or SIGTERM: the files being recalculated finish, the others are
// reported as not run, the report is written. A second signal ends the program at once.
std::atomic<bool> interrupted{false};
extern "C" void on_interrupt(int sig) {
    interrupted = true;
    std::signal(sig, SIG_DFL);
}

// Hidden test hooks (documented in docs/recalc.md): the office is stopped
// (SIGSTOP: a hang) or killed (a crash) just before it loads a file of this name.
bool hook_matches(const char* var, const std::string& input) {
    const char* v = std::getenv(var);
    return v && *v && fs::path(input).filename() == v;
}

FileResult run_one(Worker& w, const Job& job, const Options& options, std::unique_ptr<FunctionNames>& names,
                   std::size_t serial) {
    FileResult r;
    r.input = job.input;
    r.name = job.name;
    r.case_number = job.case_number;
    r.note = job.note;
    const auto t0 = Clock::now();
    office::Office& office = *w.office;
    const std::string private_in = office.dir() + "/in-" + std::to_string(serial) + "." + job.extension;
    const std::string private_out = office.writable_dir() + "/out-" + std::to_string(serial) + "." + job.copy_extension;
    css::uno::Reference<css::lang::XComponent> doc;
    bool restart = false;
    // A UNO error. A broken bridge (DisposedException): the office died or is unusable; its
    // process may take a moment to exit after the bridge noticed.
    auto uno_failure = [&](const std::string& what, bool disposed) {
        r.failed = true;
        if (!disposed && !w.timed_out) {  // is the bridge still usable? (one cheap remote call)
            try {
                office.context()->getServiceManager();
            } catch (...) {
                disposed = true;
            }
        }
        for (int i = 0; disposed && !w.timed_out && i < 30 && office.alive(); ++i)
            std::this_thread::sleep_for(std::chrono::milliseconds(100));
        if (w.timed_out) {
            r.reason = "time limit of " + format_number(options.timeout_s) +
                       " s exceeded (the office was stopped and restarted)";
            restart = true;
        } else if (!office.alive()) {
            r.reason = "the office crashed on this file (it was restarted)";
            restart = true;
        } else if (disposed) {
            r.reason = "the connection to the office broke on this file (it was restarted)";
            restart = true;
        } else {
            r.reason = "LibreOffice reported an error: " + what;
        }
    };
    try {
        // The office reads a private copy: the original is never opened by it, locked or written.
        copy_file_new(job.input, private_in);
        ::chmod(private_in.c_str(), 0644);
        w.timed_out = false;
        w.deadline = (Clock::now() + std::chrono::duration_cast<Clock::duration>(
                                         std::chrono::duration<double>(options.timeout_s)))
                         .time_since_epoch()
                         .count();
        if (hook_matches("ISENTRA_RECALC_TEST_STALL", job.input)) office.signal(SIGSTOP);
        if (hook_matches("ISENTRA_RECALC_TEST_CRASH", job.input)) office.signal(SIGKILL);
        doc = load_document(office.context(), file_url(private_in), job.extension == "ots");
        Snapshot before = read_snapshot(doc);
        if (job.extension == "ods" || job.extension == "ots" || job.extension == "fods") {
            // Calc recalculated unstyled formula cells while loading: take the stored results
            // from the file itself (stored.hpp).
            StoredValues stored;
            try {
                stored = read_stored_values(private_in);
            } catch (const std::exception&) {
                // the office opened it, the reader did not: keep what the office shows
            }
            for (Sheet& s : before.sheets) {
                auto it = stored.find(s.name);
                if (it == stored.end()) continue;
                for (FormulaCell& c : s.cells) {
                    auto v = it->second.find({c.row, c.col});
                    if (v != it->second.end()) c.value = v->second;
                }
            }
        }
        if (job.extension == "xls") {
            const int n = reenter_addin_calls(doc, before, "ORG.ISENTRA.STEAMFUNCTIONS.");
            if (n)
                r.note += std::string(r.note.empty() ? "" : "; ") + std::to_string(n) +
                          " Isentra calls entered again: LibreOffice reads them from .xls as macro calls (#MACRO?), "
                          "so their stored results are unknown and not compared";
        }
        for (const Assignment& a : job.sets) set_cell(doc, a);
        const auto c0 = Clock::now();
        recalculate_all(doc);
        r.recalc_seconds = std::chrono::duration<double>(Clock::now() - c0).count();
        const Snapshot after = read_snapshot(doc);
        if (!names) names = std::make_unique<FunctionNames>(office.context());
        r.changes = compare(before, after, options.tolerance, names.get());
        r.formula_cells = after.formula_cells();
        for (const CellAddress& a : options.collect) r.collected.push_back(read_cell(doc, a));
        if (!job.copy_path.empty()) {
            store_copy(doc, file_url(private_out), job.copy_extension);
            // The copy must be a whole package before it is handed out (a member every such
            // package has is read back through the central directory).
            const std::string data = read_whole(private_out);
            const char* member = job.copy_extension == "xlsx" || job.copy_extension == "xlsm" ? "[Content_Types].xml"
                                 : job.copy_extension == "fods"                               ? nullptr
                                                                                              : "content.xml";
            if (member) {
                try {
                    zip_member(data, member);
                } catch (const std::exception& e) {
                    throw DocumentError(std::string("the office wrote an incomplete recalculated copy (") + e.what() +
                                        "); nothing was written to the output folder");
                }
            }
            write_new_file(job.copy_path, data);
            r.copy = job.copy_path;
        }
        close_document(doc);
        doc.clear();
    } catch (const DocumentError& e) {
        r.failed = true;
        r.reason = e.what();
    } catch (const css::lang::DisposedException& e) {
        uno_failure(describe(e), true);
    } catch (const css::uno::Exception& e) {
        uno_failure(describe(e), false);
    } catch (const std::exception& e) {
        r.failed = true;
        r.reason = e.what();
    }
    w.deadline = 0;
    if (!restart && !office.alive()) {
        restart = true;
        if (!r.failed) {
            r.failed = true;
            r.reason = "the office ended while this file was open (it was restarted)";
        }
    }
    if (doc.is() && !restart) {
        try {
            close_document(doc);
        } catch (...) {
        }
    }
    doc.clear();
    if (restart) {
        names.reset();
        std::lock_guard<std::mutex> lock(w.mutex);
        try {
            office.restart();
        } catch (const std::exception& e) {
            w.start_error = e.what();
        }
    } else {
        std::error_code ec;
        fs::remove(private_out, ec);
    }
    std::error_code ec;
    fs::remove(private_in, ec);
    if (!r.copy.empty() && r.failed) r.copy.clear();
    r.seconds = std::chrono::duration<double>(Clock::now() - t0).count();
    return r;
}

}  // namespace

std::vector<FileResult> run_jobs(const std::vector<Job>& jobs, const Options& options, RunTimes& times) {
    const auto t_start = Clock::now();
    std::vector<FileResult> results(jobs.size());
    if (jobs.empty()) return results;
    const int n = std::max(1, std::min<int>(options.jobs, static_cast<int>(jobs.size())));
    std::vector<std::unique_ptr<Worker>> workers;
    for (int i = 0; i < n; ++i) {
        workers.push_back(std::make_unique<Worker>());
        workers.back()->index = i;
    }
    // Start the offices in parallel (profile, extension, start: a few seconds each).
    {
        std::vector<std::thread> starters;
        for (auto& w : workers)
            starters.emplace_back([&w] {
                try {
                    w->office = std::make_unique<office::Office>(settings_for(w->index));
                } catch (const std::exception& e) {
                    w->start_error = e.what();
                }
            });
        for (auto& t : starters) t.join();
    }
    std::string first_error;
    std::size_t started = 0;
    for (auto& w : workers) {
        if (w->office) ++started;
        else if (first_error.empty()) first_error = w->start_error;
    }
    if (started == 0) throw std::runtime_error("no office could be started: " + first_error);
    const auto t_files = Clock::now();
    times.start_seconds = std::chrono::duration<double>(t_files - t_start).count();

    Progress progress(jobs.size(), options.progress);
    std::signal(SIGINT, on_interrupt);
    std::signal(SIGTERM, on_interrupt);
    std::atomic<bool> done{false};
    std::thread monitor([&] {
        while (!done) {
            const long long now = Clock::now().time_since_epoch().count();
            for (auto& w : workers) {
                const long long d = w->deadline;
                if (d != 0 && now > d && !w->timed_out) {
                    w->timed_out = true;
                    std::lock_guard<std::mutex> lock(w->mutex);
                    if (w->office) w->office->signal(SIGKILL);
                }
            }
            std::this_thread::sleep_for(std::chrono::milliseconds(50));
        }
    });
    std::atomic<std::size_t> next{0};
    std::vector<std::thread> threads;
    for (auto& wp : workers) {
        if (!wp->office) continue;
        threads.emplace_back([&, w = wp.get()] {
            std::unique_ptr<FunctionNames> names;
            while (true) {
                // An office that could not be restarted gets one more try; if that fails too,
                // this worker stops and the other offices take the remaining files.
                if (!w->start_error.empty() && !w->office->alive()) {
                    std::lock_guard<std::mutex> lock(w->mutex);
                    try {
                        w->office->restart();
                        w->start_error.clear();
                    } catch (const std::exception& e) {
                        w->start_error = e.what();
                        break;
                    }
                }
                const std::size_t k = next++;
                if (k >= jobs.size()) break;
                FileResult r;
                if (interrupted) {
                    r.input = jobs[k].input;
                    r.name = jobs[k].name;
                    r.case_number = jobs[k].case_number;
                    r.failed = true;
                    r.reason = "not recalculated: the run was interrupted";
                } else {
                    r = run_one(*w, jobs[k], options, names, k);
                }
                results[k] = r;
                progress.finished(results[k]);
            }
            try {
                names.reset();
            } catch (...) {
            }
        });
    }
    for (auto& t : threads) t.join();
    // Files no office was left for (every office failed to restart).
    std::string why;
    for (auto& w : workers)
        if (!w->start_error.empty()) why = w->start_error;
    for (std::size_t k = std::min(next.load(), jobs.size()); k < jobs.size(); ++k) {
        FileResult& r = results[k];
        r.input = jobs[k].input;
        r.name = jobs[k].name;
        r.case_number = jobs[k].case_number;
        r.failed = true;
        r.reason = "not recalculated: no office could be restarted (" + why + ")";
        progress.finished(r);
    }
    times.files_seconds = std::chrono::duration<double>(Clock::now() - t_files).count();
    done = true;
    monitor.join();
    progress.end();
    workers.clear();  // stops the offices, removes the private profiles
    return results;
}

}  // namespace isentra::recalc
