// SPDX-License-Identifier: MPL-2.0
// The modes of the `isentra` command besides the line-by-line calls.
#pragma once

#include <string>
#include <vector>

namespace isentra::cli {

constexpr int exit_ok = 0;
constexpr int exit_failure = 1;  // input or output failed (cannot open, cannot write)
constexpr int exit_usage = 2;    // the command line is wrong

// `isentra csv ...`: args are the words after "csv".
int run_csv(const std::vector<std::string>& args);
// `isentra table ...`: args are the words after "table".
int run_table(const std::vector<std::string>& args);

// Their --help texts.
std::string csv_help();
std::string table_help();

// Prints "isentra <mode>: message" and the hint to stderr; returns exit_usage.
int usage(const std::string& mode, const std::string& message);

}  // namespace isentra::cli
