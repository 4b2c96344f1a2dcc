// SPDX-License-Identifier: MPL-2.0
// Call texts: one catalogue function call written as in a spreadsheet cell,
// e.g. STEAM.H.PT(10; 500) or h.pt(435.1, 80.33, "US"). Used by the
// command-line tool `isentra`; evaluation goes through isentra::call(), so a
// call text gives the same values and error sentences as the cell.
//
// Syntax (whitespace is allowed between any two tokens):
//
//   call     := ['='] NAME '(' [ arg { sep arg } ] ')'
//   NAME     := a catalogue name, case-insensitive, with or without the
//               "STEAM." prefix (STEAM.H.PT, H.PT, h.pt); letters, digits,
//               '.', '_'; must start with a letter
//   sep      := ';' | ','              (a comma is never a decimal mark)
//   arg      := number | text | TRUE | FALSE | array | <nothing>
//   number   := ['+'|'-'] digits ['.' digits] [('e'|'E') ['+'|'-'] digits]
//               (C locale; "5." and ".5" are accepted; no inf/nan/hex)
//   text     := '"' { any character except '"' | '""' } '"'   ("" is one quote)
//   TRUE/FALSE (case-insensitive) are the numbers 1 and 0
//   array    := '{' element { (';'|',') element } '}'   an inline array:
//               ';' ends a row, ',' separates columns; {1;2;3} is a column,
//               {1,2,3} a row, {1,2;3,4} two rows of two; every row has the
//               same length; elements are numbers, texts or TRUE/FALSE
//
// An empty argument is an empty cell. Trailing empty arguments in the places
// of optional arguments are dropped (the argument is omitted):
// H.PT(3; 300; ) is H.PT(3; 300). Elsewhere an empty argument stays an empty
// cell and call() explains it ("the argument T is empty"); an empty units
// text means SI, an empty header means 0. NAME() has no arguments.
#pragma once

#include <cstddef>
#include <string>
#include <string_view>
#include <vector>

#include "isentra/surface/call.hpp"
#include "isentra/surface/catalogue.hpp"
#include "isentra/base/error.hpp"

namespace isentra::formula {

// A call text that does not follow the syntax above, or names no catalogue
// function. code() is ErrorCode::InvalidArgument; what() is
// "at column N: <detail>" (N counted from 1 in bytes of the text).
class ParseError : public Error {
public:
    ParseError(std::size_t position, const std::string& detail);
    std::size_t position() const noexcept { return position_; }  // 0-based byte offset
    const std::string& detail() const noexcept { return detail_; }  // e.g. "expected ')' or ';' after the argument"

private:
    std::size_t position_;
    std::string detail_;
};

struct ParsedCall {
    const catalogue::Function* function = nullptr;  // never null after a successful parse
    std::vector<Table> args;                        // one Table per argument, as call() takes them
    // With names allowed (below): per argument, the name written there, or ""
    // (its Table is then an empty cell, a placeholder). Empty otherwise.
    std::vector<std::string> names;
};

// Parses one call text. Throws ParseError.
// allow_names: an argument may also be a name, for the command line's CSV
// mode, where names are column names: a word of letters, digits, '.' and
// '_' that starts with a letter (other than TRUE and FALSE), or any text in
// square brackets, "]]" for a ']' inside: [HP steam pressure]. Names are not
// allowed inside arrays.
ParsedCall parse(std::string_view text, bool allow_names = false);

// Parses and evaluates. Never throws: a parse error comes back as a 1x1
// error table whose text is the ParseError's what().
Table evaluate(std::string_view text);

// A number as the CLI prints it: printf "%.17g" in the C locale (17
// significant digits, trailing zeros dropped), whatever the process locale.
std::string format_number(double v);

// A result as one line (no newline at the end):
// - a single number: format_number(); a single text: the text;
// - a single error, or a result whose every element is the same error
//   (a Row result for a state out of range): "error: " + the sentence;
// - otherwise (a Row result, a range): the elements in row-major order,
//   separated by tabs; an error element is "error: " + its sentence, an
//   empty element is empty.
// Tabs, carriage returns and newlines inside texts are written as spaces, so
// the line is always exactly one line.
std::string format_line(const Table& result);

}  // namespace isentra::formula
