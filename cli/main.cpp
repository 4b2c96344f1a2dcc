// SPDX-License-Identifier: MPL-2.0
// isentra: the Isentra functions from the command line. Same catalogue, same
// names, same values and error sentences as the Calc add-in.
//
//   isentra 'STEAM.H.PT(10; 500)'     evaluates the calls given as arguments
//   isentra < calls.txt              reads one call per line from standard input
//   isentra csv [OPTION]... [FILE] NAME=CALL...   new columns for a CSV file (csv.cpp)
//   isentra table pT|sat-T|sat-p [OPTION]...      property tables (table.cpp)
//   isentra --list | --help | --version
//
// Every call prints exactly one line (see formula.hpp for the syntax and
// isentra::formula::format_line for the output). Bad calls print a line
// beginning with "error:" and do not stop the run; the exit code is 0 unless
// the command line itself is wrong (2).
#include <cstdio>
#include <cstring>
#include <string_view>
#include <map>
#include <string>
#include <vector>

#include "io.hpp"
#include "isentra/surface/catalogue.hpp"
#include "isentra/surface/formula.hpp"
#include "isentra/units/units.hpp"
#include "modes.hpp"

namespace {

namespace cat = isentra::catalogue;
using isentra::cli::exit_usage;

// "STEAM.H.PT(p; T; [units])"
std::string signature(const cat::Function& f) {
    std::string s = f.name + "(";
    for (std::size_t i = 0; i < f.args.size(); ++i) {
        const cat::Arg& a = f.args[i];
        if (i) s += "; ";
        if (a.varargs) s += a.name + "...";
        else if (a.optional) s += "[" + a.name + "]";
        else s += a.name;
    }
    return s + ")";
}

// The first sentence of a summary (a full stop followed by a space and a
// capital letter, not after "e.g" or "i.e"), or the whole summary.
std::string first_sentence(const std::string& text) {
    for (std::size_t k = 0; k + 2 < text.size(); ++k) {
        if (text[k] != '.' || text[k + 1] != ' ') continue;
        const char next = text[k + 2];
        if (!(next >= 'A' && next <= 'Z')) continue;
        if (k >= 3 && (text.compare(k - 3, 3, "e.g") == 0 || text.compare(k - 3, 3, "i.e") == 0)) continue;
        return text.substr(0, k + 1);
    }
    return text;
}

void print_list(std::FILE* out) {
    for (const cat::Function& f : cat::functions())
        std::fprintf(out, "%s\t%s\n", signature(f).c_str(), first_sentence(f.summary).c_str());
}

void print_help(std::FILE* out) {
    const auto& fs = cat::functions();
    std::string h;
    h += "Usage: isentra [OPTION]... [CALL]...\n"
         "       isentra csv [OPTION]... [FILE] NAME=CALL...    (isentra csv --help)\n"
         "       isentra table pT|sat-T|sat-p [OPTION]...       (isentra table --help)\n"
         "Water and steam properties (IAPWS-IF97 and related IAPWS releases) and steam plant\n"
         "calculations: the functions of the Isentra add-in for LibreOffice Calc, from the command line.\n"
         "\n"
         "  isentra 'STEAM.H.PT(10; 500)'       evaluate the calls given as arguments, one output line each\n"
         "  isentra < calls.txt                 with no call, read calls from standard input, one per line\n"
         "  isentra csv log.csv 'h=H.PT(p; T)'  add computed columns to a CSV file of readings\n"
         "  isentra table sat-T --T 20:370:10   a property table\n"
         "\n"
         "Options:\n"
         "  --list       every function with its arguments and one-line description\n"
         "  --units      every unit: quantity, symbol and meaning (tab separated)\n"
         "  --help, -h   this text\n"
         "  --version    the version\n"
         "  --           the remaining arguments are calls\n"
         "\n"
         "A call is written as in a cell, without '=' (a leading '=' is ignored):\n"
         "  NAME(argument; argument; ...)\n"
         "  - NAME as in --list, in any case, with or without \"STEAM.\": STEAM.H.PT, H.PT, h.pt\n"
         "  - ';' or ',' between arguments; a comma is never a decimal mark\n"
         "  - numbers with a decimal point and optional exponent: 10, -3.5, 1.2e-3\n"
         "  - texts in double quotes, \"\" for a quote inside: \"US\", \"SI T=K\"\n"
         "  - TRUE and FALSE are 1 and 0\n"
         "  - an empty argument is an empty cell; trailing optional ones may be left empty\n"
         "  - an inline array is a range: {1; 2; 3} a column, {1, 2, 3} a row, {1, 2; 3, 4} two rows\n"
         "  - whitespace is allowed between any two parts\n"
         "\n"
         "Output: exactly one line per call (a blank input line gives a blank output line):\n"
         "  - a number: 17 significant digits, trailing zeros dropped (as printf \"%.17g\" in the C locale)\n"
         "  - a text result (e.g. STEAM.VERSION): the text\n"
         "  - an invalid call or input: \"error: \" and the explanation, in your units\n"
         "  - a row result or a range: the elements in row-major order, separated by tabs;\n"
         "    an element that has no value is \"error: \" and its explanation\n"
         "Exit status: 0, however many calls gave errors; 2 for a usage error (unknown option);\n"
         "1 if reading standard input or writing standard output fails.\n"
         "\n"
         "Units: the optional last text argument \"units\" sets the units of all inputs and the result.\n"
         "Systems:\n";
    for (const auto& s : isentra::units::known_systems()) h += "  " + s.name + "\t" + s.description + "\n";
    h += "Single quantities can be overridden, e.g. \"US p=psig\", \"SI T=K\", \"SI p=barg patm=0.0985MPa\".\n"
         "\n";
    // Functions, by category (in catalogue order).
    std::vector<std::string> categories;
    std::map<std::string, std::vector<const cat::Function*>> by_category;
    for (const cat::Function& f : fs) {
        if (!by_category.count(f.category)) categories.push_back(f.category);
        by_category[f.category].push_back(&f);
    }
    h += "Functions (" + std::to_string(fs.size()) + "; isentra --list shows each):\n";
    for (const std::string& c : categories) {
        const auto& list = by_category[c];
        h += "  " + c + " (" + std::to_string(list.size()) + "): ";
        std::size_t shown = 0;
        for (const cat::Function* f : list) {
            if (shown == 4) {
                h += ", ...";
                break;
            }
            h += (shown ? ", " : "") + f->name;
            ++shown;
        }
        h += "\n";
    }
    // Row results: their columns.
    const cat::Function* row = nullptr;
    for (const cat::Function& f : fs)
        if (f.kind == cat::ResultKind::Row) {
            row = &f;
            break;
        }
    if (row) {
        h += "Row results print their columns on one line; " + row->name + " gives:";
        for (const auto& n : row->row_names) h += " " + n;
        h += "\n";
    }
    h += "\n"
         "Examples:\n"
         "  isentra 'STEAM.H.PT(10; 500)'             h at 10 MPa, 500 degC, in kJ/kg\n"
         "  isentra 'H.PT(1450, 950, \"US\")'           h at 1450 psia, 950 degF, in Btu/lbm\n"
         "  isentra 'STEAM.TSAT(0.101325)'            saturation temperature at 1 atm, in degC\n"
         "  isentra 'STEAM.EXPLAIN(\"H.PT\"; 200; 500)'  why a call gives an error\n"
         "  printf 'H.PT(3; 300)\\nS.PT(3; 300)\\n' | isentra\n";
    std::fputs(h.c_str(), out);
}

void print_version(std::FILE* out) { std::fprintf(out, "isentra %s\n", cat::version()); }

// One call text -> one output line (without the newline).
std::string answer(std::string_view line) {
    if (!line.empty() && line.back() == '\r') line.remove_suffix(1);
    for (char c : line)
        if (!(c == ' ' || c == '\t' || c == '\f' || c == '\v'))
            return isentra::formula::format_line(isentra::formula::evaluate(line));
    return {};
}

void flush_writer(void* w) { static_cast<isentra::cli::Writer*>(w)->flush(); }

// Calls on standard input, one per line. Answers are written in blocks, but
// everything answered is flushed before the next read that may wait, so the
// tool still works as a co-process (one answer per line sent).
int evaluate_stdin() {
    isentra::cli::Reader in(0);
    isentra::cli::Writer out(1);
    in.before_wait = flush_writer;
    in.before_wait_arg = &out;
    bool first = true;
    for (;;) {
        const char* p = in.begin();
        const char* end = in.end();
        for (;;) {
            const char* nl = static_cast<const char*>(std::memchr(p, '\n', static_cast<std::size_t>(end - p)));
            if (!nl) break;
            std::string_view line(p, static_cast<std::size_t>(nl - p));
            if (first && line.substr(0, 3) == "\xEF\xBB\xBF") line.remove_prefix(3);  // UTF-8 byte-order mark
            first = false;
            out.put(answer(line));
            out.put('\n');
            p = nl + 1;
        }
        in.consume_to(p);
        if (in.eof()) {
            if (p < end) {  // a last line without a newline
                std::string_view line(p, static_cast<std::size_t>(end - p));
                if (first && line.substr(0, 3) == "\xEF\xBB\xBF") line.remove_prefix(3);
                out.put(answer(line));
                out.put('\n');
            }
            break;
        }
        in.fill();
    }
    out.flush();
    if (in.error()) {
        std::fprintf(stderr, "isentra: reading standard input failed: %s\n", std::strerror(in.error()));
        return isentra::cli::exit_failure;
    }
    if (out.error()) {
        std::fprintf(stderr, "isentra: writing standard output failed: %s\n", std::strerror(out.error()));
        return isentra::cli::exit_failure;
    }
    return 0;
}

void evaluate_line(const std::string& line) {
    const std::string out = answer(line);
    std::fputs(out.c_str(), stdout);
    std::fputc('\n', stdout);
}

// One line per unit: quantity, symbol (as CONVERT and overrides take it), meaning.
void print_units(std::FILE* out) {
    for (const auto& u : isentra::units::known_units())
        std::fprintf(out, "%s\t%s\t%s\n", std::string(isentra::units::quantity_name(u.quantity)).c_str(),
                     u.symbol.c_str(), u.description.c_str());
}

int usage_error(const std::string& message) {
    std::fprintf(stderr, "isentra: %s\nTry 'isentra --help'.\n", message.c_str());
    return exit_usage;
}

}  // namespace

namespace isentra::cli {
int usage(const std::string& mode, const std::string& message) {
    std::fprintf(stderr, "isentra %s: %s\nTry 'isentra %s --help'.\n", mode.c_str(), message.c_str(), mode.c_str());
    return exit_usage;
}
}  // namespace isentra::cli

int main(int argc, char** argv) {
    if (argc >= 2 && (std::strcmp(argv[1], "csv") == 0 || std::strcmp(argv[1], "table") == 0)) {
        const std::vector<std::string> rest(argv + 2, argv + argc);
        return std::strcmp(argv[1], "csv") == 0 ? isentra::cli::run_csv(rest) : isentra::cli::run_table(rest);
    }
    bool options_done = false;
    enum class Action { Help, List, Units, Version, Call };
    std::vector<std::pair<Action, std::string>> actions;
    for (int k = 1; k < argc; ++k) {
        const std::string a = argv[k];
        if (!options_done && a.size() > 1 && a[0] == '-') {
            if (a == "--") options_done = true;
            else if (a == "--help" || a == "-h") actions.emplace_back(Action::Help, "");
            else if (a == "--list") actions.emplace_back(Action::List, "");
            else if (a == "--units") actions.emplace_back(Action::Units, "");
            else if (a == "--version") actions.emplace_back(Action::Version, "");
            else return usage_error("unknown option '" + a + "'");
            continue;
        }
        actions.emplace_back(Action::Call, a);
    }
    // Nothing is printed before the whole command line is known to be valid.
    for (const auto& [action, text] : actions) {
        switch (action) {
            case Action::Help: print_help(stdout); break;
            case Action::List: print_list(stdout); break;
            case Action::Units: print_units(stdout); break;
            case Action::Version: print_version(stdout); break;
            case Action::Call: evaluate_line(text); break;
        }
    }
    if (actions.empty()) {
        std::fflush(stdout);
        return evaluate_stdin();
    }
    std::fflush(stdout);
    return 0;
}
