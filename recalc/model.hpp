// SPDX-License-Identifier: MPL-2.0
// isentra-recalc: the pure data of a recalculation (no UNO): cell values as
// read from Calc, formula cells of a workbook before and after the
// recalculation, and the changes found between the two reads.
#pragma once

#include <cmath>
#include <map>
#include <set>
#include <string>
#include <utility>
#include <vector>

namespace isentra::recalc {

// A formula cell's result, or a constant cell's content.
struct Value {
    enum Kind { Empty, Number, Text, Error };
    Kind kind = Empty;
    double number = 0;
    std::string text;   // Text: the text; Error: what the cell shows (#NAME?, Err:502)
    int error = 0;      // Error: Calc's error code (525 = #NAME?)

    static Value of_number(double v) { return Value{Number, v, {}, 0}; }
    static Value of_text(std::string s) { return Value{Text, 0, std::move(s), 0}; }
    static Value of_error(int code, std::string shown) { return Value{Error, 0, std::move(shown), code}; }
};

// Calc's code for #NAME? (sc FormulaError::NoName).
constexpr int error_no_name = 525;

// How a value is written in a report: the number (shortest exact form), the
// text, the error as Calc shows it, "" for empty.
std::string to_string(const Value& v);
// Shortest text that reads back as the same double (std::to_chars).
std::string format_number(double v);

struct FormulaCell {
    int col = 0, row = 0;  // 0-based
    std::string formula;   // as Calc gives it (English function names, ';' separators)
    Value value;
};

struct Sheet {
    std::string name;
    std::vector<FormulaCell> cells;                 // every formula cell, row by row
    std::map<std::pair<int, int>, std::string> texts;  // (row, col) -> text of constant text cells
};

struct Snapshot {
    std::vector<Sheet> sheets;
    std::size_t formula_cells() const;
};

// "B7", "AA10" (0-based column and row).
std::string cell_name(int col, int row);

// The label an engineer recognises a cell by: the nearest text cell to its
// left in the same row, else the nearest text cell above it in its column;
// "" if neither exists.
std::string nearest_label(const Sheet& sheet, int col, int row);

// The function names called in a formula (NAME followed by '('), in order,
// without duplicates; texts in "..." and sheet names in '...' are skipped.
std::vector<std::string> called_functions(const std::string& formula);

struct Tolerance {
    double abs = 1e-12;  // |new - old| <= abs: unchanged
    double rel = 1e-9;   // |new - old| <= rel * max(|old|, |new|): unchanged
};

// A number pair counts as changed when it differs beyond both tolerances.
bool numbers_differ(double a, double b, const Tolerance& tol);

enum class ChangeKind { Value, NewError, ErrorGone, UnknownName, TypeChanged };
const char* to_string(ChangeKind k);

struct Change {
    ChangeKind kind = ChangeKind::Value;
    std::string sheet, cell, label, formula;
    Value before, after;
    double difference = std::nan("");  // after - before for two numbers, else NaN
    std::string detail;                // UnknownName: which names; TypeChanged: "number -> text"
};

// Compares two reads of the same workbook (same sheets, same cells).
// For cells that show #NAME? after the recalculation, `names` is asked which
// of the called functions Calc does not know (nullptr: all names are listed).
struct UnknownFunctions {
    virtual ~UnknownFunctions() = default;
    virtual bool unknown(const std::string& name) = 0;
};
std::vector<Change> compare(const Snapshot& before, const Snapshot& after, const Tolerance& tol,
                            UnknownFunctions* names);

// Counts per kind.
struct Counts {
    std::size_t value = 0, new_error = 0, error_gone = 0, unknown_name = 0, type_changed = 0;
    std::size_t total() const { return value + new_error + error_gone + unknown_name + type_changed; }
};
Counts count(const std::vector<Change>& changes);

}  // namespace isentra::recalc
