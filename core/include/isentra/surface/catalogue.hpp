// SPDX-License-Identifier: MPL-2.0
// The function catalogue: the single source of truth for every spreadsheet
// function (display name, UNO method name, arguments, units, descriptions,
// evaluation). The IDL, the add-in's dispatch, the Function Wizard texts, the
// command-line tool and docs/functions.md are all generated from it.
//
// RULE: `name` and `method` are written into users' files. Once released they
// never change. Add new functions; never rename or remove one.
#pragma once

#include <cstddef>
#include <functional>
#include <limits>
#include <string>
#include <string_view>
#include <vector>

#include "isentra/base/error.hpp"
#include "isentra/base/quantity.hpp"

namespace isentra::units {
class UnitSpec;
}

namespace isentra::catalogue {

// The values an argument can take: the physical range of its quantity or
// the range the formulation covers (IAPWS-IF97), in core units. call()
// checks it for every numeric argument before evaluating (one place), and
// the Wizard text (extension/gen/wizard_text.hpp) and docs/functions.md state
// it (range_text). A bound is NaN where there is none.
struct Range {
    double min = std::numeric_limits<double>::quiet_NaN();
    double max = std::numeric_limits<double>::quiet_NaN();
    bool min_open = false, max_open = false;  // true: the bound itself is refused (eta > 0)
    std::string min_why, max_why;             // "(...)", the reason a sentence gives for each bound
};

struct Arg {
    std::string name;         // as shown in the Function Wizard, e.g. "p"
    Quantity quantity;        // Quantity::Text for text arguments (units, names)
    std::string description;  // e.g. "Pressure"; the Wizard text adds the units (extension/gen/wizard_text.hpp)
    bool optional = false;    // only trailing arguments may be optional
    bool varargs = false;     // the last argument takes all remaining values (UNO sequence<any>)
    // Value of an omitted optional numeric argument, in core units. NaN for an
    // optional argument: the function receives NaN and decides (e.g. h_casc
    // is needed only when m_casc is above 0).
    double default_value = std::numeric_limits<double>::quiet_NaN();
    // A dimensionless numeric argument taken whole, not broadcast: a range
    // (e.g. a calibration table) or a single value, handed to eval_extra.
    bool whole_range = false;
    Range range = {};  // no bounds unless set
};

enum class ResultKind {
    Number,  // one number per state (broadcast over ranges)
    Row,     // a row of numbers for one state (optional header rows of names and units)
    Text     // a text (e.g. STEAM.EXPLAIN, STEAM.VERSION)
};

struct Function;

// For functions with text arguments other than "units" (e.g. a device type)
// or whole-range arguments: the texts in argument order ("" when omitted) and
// the tables in argument order (row-major numbers; NaN for an empty cell).
struct NumberTable {
    std::size_t rows = 0, cols = 0;
    std::vector<double> v;
};
struct Extra {
    std::vector<std::string> texts;
    std::vector<NumberTable> tables;
};

// Numeric evaluation: a[] holds the numeric arguments in core units (text
// arguments are not included), `out` receives the result(s) in core units.
// For ResultKind::Number, out[0]; for Row, out[0..row_len). Throws isentra::Error.
using Eval = std::function<void(const double* a, double* out)>;
// The same for the few functions whose meaning depends on the units given
// (e.g. an uncertainty as a fraction of a gauge reading).
using EvalUnits = std::function<void(const double* a, double* out, const units::UnitSpec& spec)>;
// With the texts and whole ranges (see Extra).
using EvalExtra =
    std::function<void(const double* a, double* out, const units::UnitSpec& spec, const Extra& extra)>;

struct Function {
    std::string name;      // display name, e.g. "STEAM.H.PT"
    std::string method;    // UNO method name, e.g. "hPT" (frozen once released)
    std::string category;  // Function Wizard category
    // What the function does. Its first sentence (with the result units and
    // "A blank cell counts as 0.") must fit the Function Wizard's three
    // lines, which the generator checks (extension/gen/wizard_text.hpp); the
    // whole summary is in docs/functions.md.
    std::string summary;
    // Longer documentation (source, section, simplification), shown in
    // docs/functions.md only, not in the Function Wizard. May be empty.
    std::string note;
    // A worked example for docs/functions.md: a call as written in a cell,
    // SI units, e.g. "STEAM.H.PT(16.62; 538.4)". The docs generator computes
    // its result with isentra::call(), so the number shown is real.
    std::string example;
    std::vector<Arg> args;
    Quantity result = Quantity::None;
    ResultKind kind = ResultKind::Number;
    Eval eval;
    EvalUnits eval_units;  // if set, called instead of eval
    EvalExtra eval_extra;  // if set, called instead of eval and eval_units
    // Row results: the column names and their quantities.
    std::vector<std::string> row_names;
    std::vector<Quantity> row_quantities;
    bool has_units_arg() const;  // one argument is the optional "units" text
    std::size_t units_index() const;  // its position; args.size() if there is none
};

const std::vector<Function>& functions();
// Finds a function by display name (case-insensitive, with or without the
// "STEAM." prefix) or by UNO method name. nullptr if unknown.
const Function* find(std::string_view name);

// Argument ranges. arg_accepts() is false when argument i of f cannot take
// core_value (in core units; NaN and infinities are never accepted): the call
// then gives an error whatever the other arguments are. true means only that
// this argument alone does not make the call an error (a state may still lie
// outside the formulation, e.g. a temperature above what region 5 covers at a
// pressure). Text arguments (units, names) and the header flag accept no
// number through this function; the header flag is checked by call().
bool arg_accepts(const Function& f, std::size_t i, double core_value);
// The error call() gives for a refused value (core units; the call layer
// words it in the user's units and adds "a blank cell counts as 0" where the
// cell held 0): the bound that is crossed and its reason.
// Precondition: !arg_accepts(f, i, core_value).
RangeError range_error(const Function& f, std::size_t i, double core_value);
// The same for an argument on its own.
bool arg_accepts(const Arg& a, double core_value);
RangeError range_error(const Arg& a, double core_value);
// The range as Function Wizard words, e.g. "above 0 to 1" or "-0.05 to 7377
// kJ/kg (US: -0.0215 to 3172 Btu/lbm)"; "" when the argument has no range.
std::string range_text(const Function& f, std::size_t i);

// The version of the add-in (project version).
const char* version();

}  // namespace isentra::catalogue
