// SPDX-License-Identifier: MPL-2.0
// Evaluating catalogue functions on spreadsheet-like values: numbers, texts,
// empty cells and ranges, with unit conversion, broadcasting and per-cell
// error sentences in the user's units. Shared by the Calc add-in and the CLI.
#pragma once

#include <cstdint>
#include <string>
#include <vector>

#include "isentra/base/error.hpp"
#include "isentra/surface/catalogue.hpp"
#include "isentra/units/units.hpp"

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

// A call prepared once and evaluated for many states (the command line's CSV
// mode and property tables). The same conversion and error rules as call():
// for the same inputs the results are bit-identical and the error sentences
// the same, without building Tables per state.
class PreparedCall {
public:
    // f with its arguments as call() takes them, except that the arguments
    // whose indexes are listed in `slots` are read per state by eval() (their
    // entries in args, e.g. empty cells, are ignored but must be there).
    // Every other argument is a 1x1 constant, converted once here. Throws isentra::Error
    // with the sentence call() would give for the call as a whole (argument
    // count, units text, a constant that is not a number), or saying that a
    // range argument or the header option is not available, or that f is a
    // text function (supported() is false).
    PreparedCall(const catalogue::Function& f, const std::vector<Table>& args, const std::vector<std::size_t>& slots);

    // False for the functions whose evaluation is not numeric (STEAM.EXPLAIN,
    // STEAM.VERSION, STEAM.CONVERT): use call() for those.
    static bool supported(const catalogue::Function& f);

    // The values for slot k are given in the units of `spec` (for example a
    // logged column in its own unit) instead of the call's units.
    void set_slot_units(std::size_t k, const units::UnitSpec& spec);

    const catalogue::Function& function() const { return *f_; }
    const units::UnitSpec& units() const { return spec_; }  // the call's units (results are in these)
    std::size_t slot_count() const { return slots_.size(); }
    const catalogue::Arg& slot_arg(std::size_t k) const { return *slots_.at(k).arg; }
    std::size_t width() const { return width_; }  // results per state: 1, or a Row function's length
    Quantity result_quantity(std::size_t c) const;

    // The fast path: in[k] is slot k's number. On success writes width()
    // results (in the call's units) to out and returns true; returns false,
    // without any sentence, if any input is not finite or any result is an
    // error; then eval() gives the full answer.
    bool eval(const double* in, double* out) const noexcept;

    // The full answer for one state: in[k] is slot k's value (a number, an
    // empty cell, a text or an error); out[0..width()) receives what call()
    // gives for the same 1x1 arguments.
    void eval(const Value* in, Value* out) const;

private:
    struct Slot {
        std::size_t pos;             // position among the state's numeric arguments
        const catalogue::Arg* arg;   // its catalogue argument
        bool own_units = false;      // spec below instead of the call's units
        units::UnitSpec spec;
    };
    const catalogue::Function* f_;
    units::UnitSpec spec_;
    catalogue::Extra extra_;  // texts and whole ranges of an eval_extra function
    std::vector<Slot> slots_;
    std::vector<std::size_t> order_;  // slot indexes in argument order (call() checks arguments in that order)
    std::vector<double> a_;  // the numeric arguments in core units, constants filled in
    std::size_t width_ = 1;
    std::uint32_t zero_mask_ = 0;  // bit pos: the constant a_[pos] was given as 0 (for "a blank cell counts as 0")
};

}  // namespace isentra
