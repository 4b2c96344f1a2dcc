// SPDX-License-Identifier: MPL-2.0
// Reading an oracle fixture of tests/data/ (written by a generator in
// tests/oracle/): '#' comment lines, one header line, then rows of one or two
// text columns (the case's kind, and its device where there is one), the
// arguments and the reference results; empty cells are left out.
#pragma once

#include <fstream>
#include <sstream>
#include <string>
#include <vector>

namespace isentra::fixture {

struct OracleRow {
    std::string kind, device;  // device: "" for a fixture with one text column
    std::vector<double> a, r;  // arguments, reference results
    int line = 0;              // line number in the file
};

// text_columns: 1 (kind) or 2 (kind, device); the arguments are the columns
// from there up to first_result - 1, the results first_result .. columns - 1.
inline std::vector<OracleRow> load_oracle_csv(const std::string& file, int text_columns, int first_result,
                                              int columns) {
    std::ifstream in(std::string(ISENTRA_TEST_DATA_DIR) + "/" + file);
    std::vector<OracleRow> rows;
    std::string line;
    int n = 0;
    bool header = true;
    while (std::getline(in, line)) {
        ++n;
        if (line.empty() || line[0] == '#') continue;
        if (header) {
            header = false;
            continue;
        }
        std::vector<std::string> f;
        std::stringstream ss(line);
        std::string cell;
        while (std::getline(ss, cell, ',')) f.push_back(cell);
        while (f.size() < static_cast<std::size_t>(columns)) f.emplace_back();
        OracleRow r;
        r.kind = f[0];
        if (text_columns > 1) r.device = f[1];
        r.line = n;
        for (int i = text_columns; i < first_result; ++i)
            if (!f[i].empty()) r.a.push_back(std::stod(f[i]));
        for (int i = first_result; i < columns; ++i)
            if (!f[i].empty()) r.r.push_back(std::stod(f[i]));
        rows.push_back(std::move(r));
    }
    return rows;
}

}  // namespace isentra::fixture
