// SPDX-License-Identifier: MPL-2.0
// isentra-recalc: the batch: the list of jobs (a file, or a file and a case),
// N workers each with its own office, the per-file time limit, and restarts.
#pragma once

#include <string>
#include <vector>

#include "options.hpp"
#include "report.hpp"

namespace isentra::recalc {

struct Job {
    std::string input;         // path of the original
    std::string name;          // as shown in reports
    std::string extension;     // lower case, of the input
    std::string copy_path;     // where the recalculated copy goes ("" = none)
    std::string copy_extension;
    std::string note;
    int case_number = 0;       // 1-based, 0 = no case table
    std::vector<Assignment> sets;
};

struct RunTimes {
    double start_seconds = 0;  // starting the offices (in parallel)
    double files_seconds = 0;  // from the first file to the last one done
};

// Runs every job; results in job order. Progress on stderr if `progress`.
// Throws std::runtime_error if no office could be started at all.
std::vector<FileResult> run_jobs(const std::vector<Job>& jobs, const Options& options, RunTimes& times);

}  // namespace isentra::recalc
