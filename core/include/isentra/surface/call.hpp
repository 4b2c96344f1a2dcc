// SPDX-License-Identifier: MPL-2.0
// Evaluating catalogue functions on spreadsheet-like values: numbers, texts,
// empty cells and ranges, with unit conversion, broadcasting and per-cell
// error sentences in the user's units. Shared by the Calc add-in and the CLI.
#pragma once

#include <string>
#include <vector>

#include "isentra/surface/catalogue.hpp"
#include "isentra/base/error.hpp"

namespace isentra {

struct Value {
    enum class Kind { Empty, Number, Text, Error };
    Kind kind = Kind::Empty;
    double number = 0;
    std::string text;                       // Text: the text; Error: the explanation sentence
    ErrorCode error = ErrorCode::InvalidArgument;  // Error: its kind

    static Value of(double d) { Value v; v.kind = Kind::Number; v.number = d; return v; }
    static Value of_text(std::string t) { Value v; v.kind = Kind::Text; v.text = std::move(t); return v; }
    static Value of_error(ErrorCode c, std::string msg) {
        Value v; v.kind = Kind::Error; v.error = c; v.text = std::move(msg); return v;
    }
};

// A rectangular block of values, row-major. A scalar is 1x1.
struct Table {
    std::size_t rows = 1, cols = 1;
    std::vector<Value> cells{Value{}};
    static Table scalar(Value v) { Table t; t.cells[0] = std::move(v); return t; }
    const Value& at(std::size_t r, std::size_t c) const { return cells[r * cols + c]; }
};

// Evaluates f. Each argument is a Table (1x1 for a single value; ranges
// broadcast: all non-1x1 numeric arguments must have the same shape, which is
// the shape of the result; Row functions return one row per state).
// Never throws for bad input: errors come back as Value::Kind::Error cells
// whose text is one sentence in the user's units. An error in the call as a
// whole (wrong shapes, bad units text) gives a 1x1 error table.
Table call(const catalogue::Function& f, const std::vector<Table>& args);

// Convenience for scalars.
Value call_scalar(const catalogue::Function& f, const std::vector<Value>& args);

}  // namespace isentra
