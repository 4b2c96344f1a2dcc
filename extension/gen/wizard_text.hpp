// SPDX-License-Identifier: MPL-2.0
// The texts Calc's Function Wizard shows for each function and argument, made
// from the catalogue in one place: the generator checks them at build time
// (and writes the longer texts into docs/functions.md), the add-in returns
// them through XAddIn, calc_tests compares the two.
//
// How much the Wizard shows (LibreOffice 7.4, default dialog size): on the
// page where the arguments are entered, the function's description and the
// description of the argument being edited each get a wrapped label of three
// lines, about 440 pixels (70-80 characters of text) wide; a longer text is
// cut at the end of the third line with "...". The function list page shows
// more lines, but the argument page is where a user reads both texts. So a
// Wizard text must wrap into at most `max_lines` lines of `line_columns`
// characters (fewer than fit, so that wide letters, another UI font or a
// different VCL backend still show it whole). See DEVELOPERS.md, "How the
// add-in talks to Calc".
#pragma once

#include <cctype>
#include <cstddef>
#include <string>
#include <vector>

#include "isentra/surface/catalogue.hpp"
#include "isentra/units/units.hpp"

namespace isentra::wizard {

inline constexpr std::size_t max_lines = 3;
inline constexpr std::size_t line_columns = 66;

// Said in every function's Wizard text that has a numeric argument: Calc
// passes a reference to a blank cell to an add-in as the number 0.
inline constexpr const char* blank_cell_sentence = "A blank cell counts as 0.";

// Characters (UTF-8 code points) in s.
inline std::size_t chars(const std::string& s) {
    std::size_t n = 0;
    for (unsigned char c : s) n += (c & 0xC0) != 0x80;
    return n;
}

// Lines that s takes when wrapped at word boundaries to line_columns.
inline std::size_t wrapped_lines(const std::string& s) {
    std::size_t lines = 0, col = 0;
    std::size_t i = 0;
    while (i < s.size()) {
        while (i < s.size() && s[i] == ' ') ++i;
        std::size_t j = i;
        while (j < s.size() && s[j] != ' ') ++j;
        if (j == i) break;
        const std::size_t w = chars(s.substr(i, j - i));
        if (lines == 0) {
            lines = 1;
            col = w;
        } else if (col + 1 + w <= line_columns) {
            col += 1 + w;
        } else {
            ++lines;
            col = w;
        }
        while (col > line_columns) {  // a word longer than a line
            ++lines;
            col -= line_columns;
        }
        i = j;
    }
    return lines;
}

inline bool fits(const std::string& s) { return wrapped_lines(s) <= max_lines; }

// The sentences of a catalogue summary. A sentence ends at ". " followed by
// a capital letter, a digit-free start of a new thought ('=', '(') or at the
// end; abbreviations (e.g., i.e., Eq., cf., No., approx., vs.) do not end one.
inline std::vector<std::string> sentences(const std::string& s) {
    static const char* const abbreviations[] = {"e.g.", "i.e.", "Eq.", "Eqs.", "cf.", "No.", "approx.", "vs.", "Fig."};
    std::vector<std::string> out;
    std::size_t start = 0;
    for (std::size_t i = 0; i + 1 < s.size(); ++i) {
        if (s[i] != '.' || s[i + 1] != ' ' || i + 2 >= s.size()) continue;
        const char next = s[i + 2];
        if (!(std::isupper(static_cast<unsigned char>(next)) || next == '=' || next == '(')) continue;
        bool abbreviation = false;
        for (const char* a : abbreviations) {
            const std::string ab(a);
            if (i + 1 >= ab.size() && s.compare(i + 1 - ab.size(), ab.size(), ab) == 0 &&
                (i + 1 == ab.size() || s[i - ab.size()] == ' ' || s[i - ab.size()] == '('))
                abbreviation = true;
        }
        if (abbreviation) continue;
        out.push_back(s.substr(start, i + 1 - start));
        start = i + 2;
    }
    if (start < s.size()) out.push_back(s.substr(start));
    return out;
}

inline std::string unit_pair(Quantity q) {
    if (q == Quantity::None || q == Quantity::Text) return "";
    return "SI: " + units::symbol(q, "SI") + "; US: " + units::symbol(q, "US") + ".";
}

inline bool has_numeric_arg(const catalogue::Function& f) {
    for (const catalogue::Arg& a : f.args)
        if (a.quantity != Quantity::Text) return true;
    return false;
}

// The parts of a function's Wizard text that must all be shown: the first
// sentence of the summary, the result's units and, for a function with a
// numeric argument, the blank-cell sentence.
inline std::string required_function_text(const catalogue::Function& f) {
    const std::vector<std::string> ss = sentences(f.summary);
    std::string d = ss.empty() ? f.name : ss.front();
    if (f.kind == catalogue::ResultKind::Number && f.result != Quantity::None) d += " Result " + unit_pair(f.result);
    if (has_numeric_arg(f)) d += std::string(" ") + blank_cell_sentence;
    return d;
}

inline std::string explain_hint(const catalogue::Function& f) {
    if (f.name == "STEAM.EXPLAIN" || f.name == "STEAM.VERSION" || f.name.size() < 7) return "";
    return " Why an error: =STEAM.EXPLAIN(\"" + f.name.substr(6) + "\"; same arguments).";
}

// The function's Wizard text: the required parts, then the STEAM.EXPLAIN hint
// and then further sentences of the summary as far as they fit. The whole
// summary is in docs/functions.md.
inline std::string function_text(const catalogue::Function& f) {
    const std::vector<std::string> ss = sentences(f.summary);
    const std::string first = ss.empty() ? f.name : ss.front();
    const std::string tail = required_function_text(f).substr(first.size());
    std::string hint = explain_hint(f);
    if (!fits(first + tail + hint) && !hint.empty()) hint = " Why an error: STEAM.EXPLAIN.";
    if (!fits(first + tail + hint)) hint.clear();
    std::string body = first;
    for (std::size_t k = 1; k < ss.size(); ++k) {
        if (!fits(body + " " + ss[k] + tail + hint)) break;
        body += " " + ss[k];
    }
    return body + tail + hint;
}

// An argument's Wizard text: its description, its units in SI and US, and
// its range (catalogue::range_text) where that still fits; the range is
// always in docs/functions.md.
inline std::string arg_text(const catalogue::Function& f, std::size_t i) {
    const catalogue::Arg& a = f.args.at(i);
    std::string d = a.description;
    if (d.empty() || d.back() != '.') d += ".";
    const std::string u = unit_pair(a.quantity);
    std::string t = u.empty() ? d : d + " " + u;
    const std::string r = catalogue::range_text(f, i);
    if (!r.empty() && fits(t + " Range " + r + ".")) t += " Range " + r + ".";
    return t;
}

}  // namespace isentra::wizard
