// SPDX-License-Identifier: MPL-2.0
// isentra-recalc: the command line, cell addresses and case tables (pure, no UNO).
#pragma once

#include <optional>
#include <stdexcept>
#include <string>
#include <vector>

#include "model.hpp"

namespace isentra::recalc {

// A wrong command line: the message names the argument and the reason.
struct UsageError : std::runtime_error {
    using std::runtime_error::runtime_error;
};

// SHEET.CELL, e.g. "Heaters.C10", "'Heat rate'.$C$12", "$Test.B5".
struct CellAddress {
    std::string sheet;
    int col = 0, row = 0;  // 0-based
    std::string text() const;  // "Heaters.C10" ('quoted' if the name needs it)
};
// Throws UsageError naming `what` (e.g. "--set") and the text.
CellAddress parse_address(const std::string& text, const std::string& what);

// One input cell of a case: the address and the text to put there. A number
// (C locale, '.' decimal) is entered as a number, "=..." as a formula, anything
// else as text.
struct Assignment {
    CellAddress cell;
    std::string value;
};
Assignment parse_assignment(const std::string& text);  // "SHEET.CELL=VALUE" (--set)

// A case table: a header row of cell addresses, one row per case (CSV, ',' or
// ';' separated, "quoted" fields).
struct CaseTable {
    std::vector<CellAddress> inputs;
    std::vector<std::vector<std::string>> rows;
};
CaseTable parse_case_table(const std::string& csv_text, const std::string& file_name);
std::vector<std::vector<std::string>> parse_csv(const std::string& text);

struct Options {
    std::vector<std::string> inputs;     // files and folders as given
    std::string output;                  // -o; "" = default beside the inputs
    std::string format;                  // --format: "" = the input's (xls -> xlsx)
    bool copies = true;                  // --no-copies
    Tolerance tolerance;                 // --abs, --rel
    std::vector<Assignment> sets;        // --set
    std::string cases_file;              // --cases
    std::vector<CellAddress> collect;    // --collect
    int jobs = 1;                        // -j
    double timeout_s = 300;              // --timeout (per file)
    bool progress = true;                // --quiet turns it off
    bool help = false, version = false;
};
// Throws UsageError.
Options parse_options(const std::vector<std::string>& args);

// The formats a copy can be written in (extension -> Calc filter name).
const char* filter_for(const std::string& extension);  // nullptr: not a format the tool writes
bool is_input_extension(const std::string& extension);  // ods ots fods xlsx xlsm xls (lower case)

std::string help_text();

}  // namespace isentra::recalc
