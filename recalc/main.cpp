// SPDX-License-Identifier: MPL-2.0
// isentra-recalc: recalculates existing workbooks in a headless LibreOffice
// Calc with the Isentra extension and reports what changed (see --help and
// docs/recalc.md).
#include <algorithm>
#include <cctype>
#include <cerrno>
#include <csignal>
#include <cstdio>
#include <cstring>
#include <ctime>
#include <filesystem>
#include <fstream>
#include <set>
#include <sstream>
#include <string>
#include <sys/stat.h>
#include <vector>

#include "options.hpp"
#include "report.hpp"
#include "runner.hpp"

#ifndef ISENTRA_VERSION
#define ISENTRA_VERSION "unknown"
#endif

namespace fs = std::filesystem;
using namespace isentra::recalc;

namespace {

constexpr int exit_unchanged = 0, exit_changes = 1, exit_failures = 2, exit_usage = 64;

std::string lower_extension(const fs::path& p) {
    std::string e = p.extension().string();
    if (!e.empty()) e.erase(0, 1);
    for (char& c : e) c = static_cast<char>(std::tolower(static_cast<unsigned char>(c)));
    return e;
}

struct Input {
    fs::path path;      // absolute
    std::string name;   // shown in reports
    fs::path relative;  // below the output folder
};

// Every workbook named on the command line or found below a folder (sorted).
std::vector<Input> find_inputs(const std::vector<std::string>& args) {
    std::vector<Input> out;
    std::set<fs::path> seen;
    for (const std::string& a : args) {
        std::error_code ec;
        const fs::path p = fs::absolute(a, ec).lexically_normal();
        const fs::file_status st = fs::status(p, ec);
        if (ec || !fs::exists(st)) throw UsageError(a + ": no such file or folder");
        if (fs::is_directory(st)) {
            std::vector<fs::path> found;
            for (auto it = fs::recursive_directory_iterator(p, fs::directory_options::skip_permission_denied, ec);
                 !ec && it != fs::recursive_directory_iterator(); it.increment(ec)) {
                const fs::path f = it->path();
                const std::string base = f.filename().string();
                if (base.rfind(".~lock.", 0) == 0 || base.rfind("~$", 0) == 0) continue;  // office lock files
                if (it->is_regular_file(ec) && is_input_extension(lower_extension(f))) found.push_back(f);
            }
            if (ec) throw UsageError(a + ": cannot read the folder: " + ec.message());
            std::sort(found.begin(), found.end());
            const std::string folder = p.filename().string();
            for (const fs::path& f : found)
                if (seen.insert(f).second) {
                    const fs::path rel = fs::path(folder) / f.lexically_relative(p);
                    out.push_back({f, rel.string(), rel});
                }
        } else {
            if (!is_input_extension(lower_extension(p)))
                throw UsageError(a + ": not a workbook the tool reads (.ods .ots .fods .xlsx .xlsm .xls)");
            if (seen.insert(p).second) out.push_back({p, p.filename().string(), p.filename()});
        }
    }
    return out;
}

std::string timestamp() {
    const std::time_t t = std::time(nullptr);
    std::tm tm{};
    localtime_r(&t, &tm);
    char b[32];
    std::strftime(b, sizeof b, "%Y%m%d-%H%M%S", &tm);
    return b;
}

// A name in `dir` that does not exist yet: name, name-2, name-3 ...
fs::path unused(const fs::path& dir, const fs::path& rel, std::set<fs::path>& taken) {
    const fs::path base = dir / rel;
    fs::path candidate = base;
    for (int k = 2; fs::exists(candidate) || taken.count(candidate); ++k)
        candidate = base.parent_path() / (base.stem().string() + "-" + std::to_string(k) + base.extension().string());
    taken.insert(candidate);
    return candidate;
}

std::string read_text(const std::string& path) {
    std::ifstream in(path, std::ios::binary);
    if (!in) throw UsageError("--cases " + path + ": cannot read the file");
    std::ostringstream s;
    s << in.rdbuf();
    return s.str();
}

}  // namespace

int main(int argc, char** argv) {
    // A write to the socket of an office that has just died must give an error, not end the tool.
    std::signal(SIGPIPE, SIG_IGN);
    Options options;
    std::vector<Input> inputs;
    CaseTable cases;
    fs::path outdir;
    try {
        options = parse_options(std::vector<std::string>(argv + 1, argv + argc));
        if (options.help) {
            std::fputs(help_text().c_str(), stdout);
            return 0;
        }
        if (options.version) {
            std::printf("isentra-recalc %s\n", ISENTRA_VERSION);
            return 0;
        }
        inputs = find_inputs(options.inputs);
        if (inputs.empty()) throw UsageError("no workbooks (.ods .ots .fods .xlsx .xlsm .xls) in the folders given");
        if (!options.cases_file.empty()) cases = parse_case_table(read_text(options.cases_file), options.cases_file);
        // The output folder: never an input folder or the path of an input.
        std::error_code ec;
        if (!options.output.empty()) {
            outdir = fs::absolute(options.output, ec).lexically_normal();
        } else {
            const std::string& first = options.inputs.front();
            const fs::path p = fs::absolute(first, ec).lexically_normal();
            if (fs::is_directory(p))
                outdir = p.parent_path() / (p.filename().string() + "-recalculated-" + timestamp());
            else
                outdir = p.parent_path() / ("recalculated-" + timestamp());
            const fs::path base = outdir;
            for (int k = 2; fs::exists(outdir); ++k) outdir = base.string() + "-" + std::to_string(k);
        }
        for (const std::string& a : options.inputs) {
            const fs::path p = fs::absolute(a, ec).lexically_normal();
            if (p == outdir) throw UsageError("-o " + outdir.string() + ": the output folder cannot be an input");
            if (!fs::is_directory(p) && outdir == p.parent_path() && !options.output.empty())
                throw UsageError("-o " + outdir.string() +
                                 ": the output folder cannot be the folder of an input (the copies would sit beside the "
                                 "originals); name a new folder");
        }
        for (const Input& in : inputs)
            if (in.path == outdir) throw UsageError("-o " + outdir.string() + ": that is an input file");
    } catch (const UsageError& e) {
        std::fprintf(stderr, "isentra-recalc: %s\n", e.what());
        return exit_usage;
    }

    std::error_code ec;
    fs::create_directories(outdir, ec);
    if (ec || !fs::is_directory(outdir)) {
        std::fprintf(stderr, "isentra-recalc: cannot create the output folder %s: %s (name another with -o)\n",
                     outdir.c_str(), ec.message().c_str());
        return exit_failures;
    }

    // The jobs: each file once, or once per case.
    std::vector<Job> jobs;
    std::set<fs::path> taken;
    const std::size_t ncases = cases.rows.empty() ? 0 : cases.rows.size();
    for (const Input& in : inputs) {
        Job base;
        base.input = in.path.string();
        base.name = in.name;
        base.extension = lower_extension(in.path);
        base.copy_extension = options.format.empty() ? base.extension : options.format;
        if (base.copy_extension == "xls") {
            base.copy_extension = "xlsx";
            base.note = "written as .xlsx, not .xls: an add-in call does not survive .xls in LibreOffice (every "
                        "Isentra cell reads #MACRO? after reopening)";
        }
        base.sets = options.sets;
        for (std::size_t c = 0; c < std::max<std::size_t>(ncases, 1); ++c) {
            Job j = base;
            fs::path rel = in.relative;
            if (ncases) {
                j.case_number = static_cast<int>(c + 1);
                for (std::size_t k = 0; k < cases.inputs.size(); ++k)
                    j.sets.push_back(Assignment{cases.inputs[k], cases.rows[c][k]});
                rel = rel.parent_path() / (rel.stem().string() + "-case" + std::to_string(c + 1) + rel.extension().string());
            }
            rel.replace_extension("." + j.copy_extension);
            if (options.copies) {
                const fs::path target = unused(outdir, rel, taken);
                fs::create_directories(target.parent_path(), ec);
                j.copy_path = target.string();
            }
            jobs.push_back(std::move(j));
        }
    }

    std::vector<FileResult> results;
    RunTimes times;
    try {
        results = run_jobs(jobs, options, times);
    } catch (const std::exception& e) {
        std::fprintf(stderr, "isentra-recalc: %s\n", e.what());
        return exit_failures;
    }

    // Reports.
    std::size_t failed = 0, changed = 0, changes = 0;
    for (const FileResult& r : results) {
        if (r.failed) ++failed;
        else if (!r.changes.empty()) ++changed;
        changes += r.changes.size();
    }
    const Table summary = summary_table(results), table = changes_table(results);
    std::vector<std::string> written;
    try {
        const fs::path csv = unused(outdir, "recalc-report.csv", taken), ods = unused(outdir, "recalc-report.ods", taken);
        write_new_file(csv.string(), to_csv(table));
        write_new_file(ods.string(), to_ods({summary, table}));
        written = {ods.string(), csv.string()};
        if (ncases) {
            const Table ct = cases_table(results, cases, options.collect);
            const fs::path ccsv = unused(outdir, "cases.csv", taken), cods = unused(outdir, "cases.ods", taken);
            write_new_file(ccsv.string(), to_csv(ct));
            write_new_file(cods.string(), to_ods({ct}));
            written.push_back(cods.string());
            written.push_back(ccsv.string());
        }
    } catch (const std::exception& e) {
        std::fprintf(stderr, "isentra-recalc: %s\n", e.what());
        return exit_failures;
    }
    std::printf("total: %zu %s, %zu with changes (%zu %s), %zu failed; report: %s\n", results.size(),
                ncases ? "runs" : (results.size() == 1 ? "file" : "files"), changed, changes,
                changes == 1 ? "change" : "changes", failed, written.front().c_str());
    if (changes == 0 && failed == 0) std::printf("no changes: every formula result equals the stored one\n");
    std::printf("time: %.2f s to start %d %s, %.2f s for the files\n", times.start_seconds,
                std::max(1, std::min<int>(options.jobs, static_cast<int>(jobs.size()))),
                std::min<int>(options.jobs, static_cast<int>(jobs.size())) > 1 ? "offices" : "office",
                times.files_seconds);
    if (failed) return exit_failures;
    return changes ? exit_changes : exit_unchanged;
}
