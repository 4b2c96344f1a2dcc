// SPDX-License-Identifier: MPL-2.0
// isentra-recalc: the results of a run and how they are written: summary
// lines, CSV (RFC 4180) and OpenDocument spreadsheets (written directly, no
// office needed), pure C++ with zlib's CRC-32.
#pragma once

#include <string>
#include <vector>

#include "model.hpp"
#include "options.hpp"

namespace isentra::recalc {

// One workbook (or one case of a workbook) after the run.
struct FileResult {
    std::string input;        // the path as found
    std::string name;         // as shown in reports (relative to the folder given)
    int case_number = 0;      // 1-based with --cases, else 0
    bool failed = false;
    std::string reason;       // failed: why ("password-protected", "damaged: ...", "time limit ...")
    std::string copy;         // the recalculated copy written ("" if none)
    std::string note;         // e.g. why an .xls input was written as .xlsx
    std::size_t formula_cells = 0;
    std::vector<Change> changes;
    std::vector<Value> collected;  // --collect, in order
    double seconds = 0;        // the whole file: copy in, load, read, recalculate, read, store
    double recalc_seconds = 0; // of which Calc's calculateAll()
};

// "plant.ods: 3 changes (2 values changed, 1 new error) in 412 formula cells -> out/plant.ods"
std::string summary_line(const FileResult& r);

// A sheet of a report: a header row and rows of values (numbers stay numbers).
struct Table {
    std::string name;
    std::vector<std::string> header;
    std::vector<std::vector<Value>> rows;
};

Table summary_table(const std::vector<FileResult>& results);
Table changes_table(const std::vector<FileResult>& results);
Table cases_table(const std::vector<FileResult>& results, const CaseTable& cases,
                  const std::vector<CellAddress>& collect);

std::string to_csv(const Table& t);
// An .ods package with one sheet per table (the first one is shown first).
std::string to_ods(const std::vector<Table>& tables);

// Writes `data` to `path` as a new file (fails if it exists). Throws std::runtime_error.
void write_new_file(const std::string& path, const std::string& data);

// A stored (uncompressed) zip archive; entries in the order given.
std::string zip_stored(const std::vector<std::pair<std::string, std::string>>& entries);

}  // namespace isentra::recalc
