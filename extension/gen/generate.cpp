// SPDX-License-Identifier: MPL-2.0
// Build-time generator: writes everything that follows from the function
// catalogue (isentra::catalogue::functions()) so that adding a function to
// the catalogue is the only step needed to add it to the Calc add-in.
//
//   isentra_gen OUTDIR
//
// writes into OUTDIR:
//   isentra.idl               the UNO interface org.isentra.XSteamFunctions and
//                             the service org.isentra.SteamFunctions
//   steam_methods.hxx         the method declarations, included inside the
//                             add-in class (extension/src/addin.hxx)
//   steam_methods.cxx         the method definitions: each forwards to the
//                             generic dispatcher with its catalogue index
//   functions.md              the user reference (committed as docs/functions.md)
//
// Files are rewritten only when their content changes, so an unchanged
// catalogue does not trigger a rebuild of everything downstream.
// Exit status 1 (with a message) if the catalogue breaks a rule that the
// UNO interface or Calc depends on.
#include <algorithm>
#include <cctype>
#include <cmath>
#include <cstdio>
#include <fstream>
#include <iostream>
#include <set>
#include <sstream>
#include <string>
#include <vector>

#include "isentra/surface/call.hpp"
#include "isentra/surface/catalogue.hpp"
#include "isentra/surface/formula.hpp"
#include "isentra/units/units.hpp"
#include "wizard_text.hpp"

namespace cat = isentra::catalogue;

namespace {

int failures = 0;

void fail(const std::string& what) {
    std::cerr << "isentra_gen: catalogue error: " << what << "\n";
    ++failures;
}

std::string upper(std::string s) {
    for (auto& c : s) c = static_cast<char>(std::toupper(static_cast<unsigned char>(c)));
    return s;
}

// Letters and digits, starting with a letter. (UNOIDL restricts where an
// underscore may appear; method names simply do without.)
bool is_identifier(const std::string& s) {
    if (s.empty() || !(std::isalpha(static_cast<unsigned char>(s[0])))) return false;
    return std::all_of(s.begin(), s.end(), [](char c) { return std::isalnum(static_cast<unsigned char>(c)); });
}

// "p_in" -> "pIn": argument names as UNOIDL identifiers.
std::string camel(const std::string& s) {
    std::string r;
    bool up = false;
    for (char c : s) {
        if (!std::isalnum(static_cast<unsigned char>(c))) {
            up = !r.empty();
            continue;
        }
        r += up ? static_cast<char>(std::toupper(static_cast<unsigned char>(c))) : c;
        up = false;
    }
    return r;
}

// Words that cannot be UNO IDL identifiers (UNOIDL keywords) or that would
// clash with the methods the add-in class inherits (XInterface, XTypeProvider,
// XWeak, XAddIn, XLocalizable, XServiceName, XServiceInfo) or with C++.
const std::set<std::string>& reserved() {
    static const std::set<std::string> words = {
        // UNOIDL
        "any", "attribute", "boolean", "bound", "byte", "char", "const", "constants", "constrained",
        "double", "enum", "exception", "float", "get", "hyper", "in", "inout", "interface", "long",
        "maybeambiguous", "maybedefault", "maybevoid", "module", "needs", "observes", "oneway",
        "optional", "out", "property", "published", "raises", "readonly", "removable", "sequence",
        "service", "set", "short", "singleton", "string", "struct", "transient", "type", "typedef",
        "unsigned", "void", "true", "false", "TRUE", "FALSE",
        // inherited methods
        "queryInterface", "acquire", "release", "getTypes", "getImplementationId", "queryAdapter",
        "getProgrammaticFuntionName", "getDisplayFunctionName", "getFunctionDescription",
        "getDisplayArgumentName", "getArgumentDescription", "getProgrammaticCategoryName",
        "getDisplayCategoryName", "setLocale", "getLocale", "getServiceName",
        "getImplementationName", "supportsService", "getSupportedServiceNames", "dispatch",
        // C++ keywords that are plausible method or argument names
        "and", "auto", "bool", "case", "catch", "class", "default", "delete", "do", "else", "explicit",
        "export", "extern", "for", "friend", "goto", "if", "inline", "int", "new", "not", "operator",
        "or", "private", "protected", "public", "register", "return", "signed", "sizeof", "static",
        "switch", "template", "this", "throw", "try", "union", "using", "virtual", "volatile", "while",
        "xor"};
    return words;
}

// IDL parameter name for argument i: the catalogue's name when it is a safe
// identifier, otherwise argN. Only documentation: Calc shows XAddIn's names.
std::string param_name(const cat::Arg& a, std::size_t i, const std::set<std::string>& used) {
    std::string n = camel(a.name);
    if (!is_identifier(n) || reserved().count(n) || used.count(n)) n = "arg" + std::to_string(i);
    return n;
}

void check(const std::vector<cat::Function>& fs) {
    std::set<std::string> names, methods;
    for (const cat::Function& f : fs) {
        const std::string where = "function \"" + f.name + "\" (method \"" + f.method + "\")";
        if (f.name.empty() || f.name.find_first_of(" ;,()\"'") != std::string::npos)
            fail(where + ": the display name must be non-empty and contain no blanks, quotes, "
                         "parentheses or separators");
        if (!is_identifier(f.method) || reserved().count(f.method))
            fail(where + ": the method name must be a plain identifier and not a reserved word");
        if (!names.insert(upper(f.name)).second)
            fail(where + ": display name used twice (Calc compares names without case)");
        if (!methods.insert(upper(f.method)).second)
            fail(where + ": method name used twice (Calc compares names without case)");
        bool seen_optional = false;
        for (std::size_t i = 0; i < f.args.size(); ++i) {
            const cat::Arg& a = f.args[i];
            if (a.varargs && i + 1 != f.args.size())
                fail(where + ": only the last argument may take a variable number of values");
            if (a.optional) seen_optional = true;
            else if (seen_optional && !a.varargs)
                fail(where + ": argument \"" + a.name + "\" follows an optional argument and must be optional too");
        }
        // The Function Wizard cuts longer texts with "..." (wizard_text.hpp).
        const std::string wtext = isentra::wizard::required_function_text(f);
        if (!isentra::wizard::fits(wtext))
            fail(where + ": its Function Wizard text (the summary's first sentence, the result units and \"" +
                 isentra::wizard::blank_cell_sentence + "\") wraps into " +
                 std::to_string(isentra::wizard::wrapped_lines(wtext)) + " lines of " +
                 std::to_string(isentra::wizard::line_columns) + " characters; the Wizard shows " +
                 std::to_string(isentra::wizard::max_lines) +
                 ": shorten the summary's first sentence (the rest of the summary goes to docs/functions.md)");
        for (std::size_t i = 0; i < f.args.size(); ++i) {
            const std::string at = isentra::wizard::arg_text(f, i);
            if (!isentra::wizard::fits(at))
                fail(where + ": the Function Wizard text of argument \"" + f.args[i].name + "\" wraps into " +
                     std::to_string(isentra::wizard::wrapped_lines(at)) + " lines of " +
                     std::to_string(isentra::wizard::line_columns) + " characters; the Wizard shows " +
                     std::to_string(isentra::wizard::max_lines) + ": shorten its description");
        }
        if (f.kind == cat::ResultKind::Row && (f.row_names.empty() || f.row_names.size() != f.row_quantities.size()))
            fail(where + ": a Row function needs row_names and row_quantities of equal length");
    }
}

// ---- writers ------------------------------------------------------------------

void write_if_changed(const std::string& path, const std::string& content) {
    {
        std::ifstream in(path, std::ios::binary);
        if (in) {
            std::ostringstream old;
            old << in.rdbuf();
            if (old.str() == content) return;
        }
    }
    std::ofstream out(path, std::ios::binary | std::ios::trunc);
    out << content;
    if (!out) {
        std::cerr << "isentra_gen: cannot write " << path << "\n";
        ++failures;
    }
}

const char* const banner = "GENERATED by extension/gen/generate.cpp from the function catalogue "
                           "(core/surface/catalogue.cpp). Do not edit.";

// How an argument is declared. Calc's add-in collection (LibreOffice
// sc/source/core/tool/addincol.cxx) marks a parameter optional in the
// Function Wizard only when it is an `any` or the varargs sequence<any>, and
// refuses a call that omits a non-optional one before calling the add-in. A
// mixed array sequence<sequence<any>> is the non-optional type that still
// takes everything an `any` takes: numbers, texts, one cell (as a 1x1 array),
// ranges and inline arrays (ScInterpreter::ScExternal).
enum class ArgType { Required, Optional, Varargs };

ArgType arg_type(const cat::Arg& a) {
    if (a.varargs) return ArgType::Varargs;
    return a.optional ? ArgType::Optional : ArgType::Required;
}

const char* idl_type(const cat::Arg& a) {
    switch (arg_type(a)) {
    case ArgType::Required: return "sequence< sequence< any > >";
    case ArgType::Optional: return "any";
    case ArgType::Varargs: return "sequence< any >";
    }
    return "any";
}

const char* cxx_type(const cat::Arg& a) {
    switch (arg_type(a)) {
    case ArgType::Required: return "const css::uno::Sequence<css::uno::Sequence<css::uno::Any>>&";
    case ArgType::Optional: return "const css::uno::Any&";
    case ArgType::Varargs: return "const css::uno::Sequence<css::uno::Any>&";
    }
    return "const css::uno::Any&";
}

std::string idl(const std::vector<cat::Function>& fs) {
    std::ostringstream o;
    o << "// SPDX-License-Identifier: MPL-2.0\n// " << banner << "\n"
      << "// The names below are written into users' documents: never rename or remove one.\n\n"
      << "module org { module isentra {\n\n"
      << "/** The spreadsheet functions of Isentra (water and steam properties).\n"
      << "    A required argument is a sequence<sequence<any>> (Calc passes a single\n"
      << "    value as a 1x1 array, a range as its cells), an optional one an any\n"
      << "    (void when omitted), a variable list a sequence<any>; every result is\n"
      << "    an any (a number, a text, or an array). */\n"
      << "interface XSteamFunctions : com::sun::star::uno::XInterface\n{\n";
    for (const cat::Function& f : fs) {
        o << "    /** " << f.name << " */\n    any " << f.method << "(";
        std::set<std::string> used;
        for (std::size_t i = 0; i < f.args.size(); ++i) {
            const std::string n = param_name(f.args[i], i, used);
            used.insert(n);
            o << (i ? ", " : "") << "[in] " << idl_type(f.args[i]) << " " << n;
        }
        o << ");\n";
    }
    o << "};\n\n"
      << "/** The Calc add-in service (also exported as com.sun.star.sheet.AddIn). */\n"
      << "service SteamFunctions : XSteamFunctions;\n\n"
      << "}; };\n";
    return o.str();
}

std::string cxx_params(const cat::Function& f, bool named) {
    std::ostringstream o;
    for (std::size_t i = 0; i < f.args.size(); ++i) {
        o << (i ? ", " : "") << cxx_type(f.args[i]);
        if (named) o << " a" << i;
    }
    return o.str();
}

std::string methods_hxx(const std::vector<cat::Function>& fs) {
    std::ostringstream o;
    o << "// " << banner << "\n"
      << "// Included inside class isentra::uno::SteamFunctions (extension/src/addin.hxx).\n";
    for (const cat::Function& f : fs)
        o << "css::uno::Any SAL_CALL " << f.method << "(" << cxx_params(f, false) << ") override;\n";
    return o.str();
}

std::string methods_cxx(const std::vector<cat::Function>& fs) {
    std::ostringstream o;
    o << "// " << banner << "\n"
      << "#include \"addin.hxx\"\n\n"
      << "namespace isentra::uno {\n";
    for (std::size_t k = 0; k < fs.size(); ++k) {
        const cat::Function& f = fs[k];
        std::size_t fixed = f.args.size();
        std::string rest = "nullptr";
        if (!f.args.empty() && f.args.back().varargs) {
            --fixed;
            rest = "&a" + std::to_string(f.args.size() - 1);
        }
        o << "\n// " << f.name << "\ncss::uno::Any SAL_CALL SteamFunctions::" << f.method << "("
          << cxx_params(f, true) << ")\n{\n";
        if (fixed) {
            o << "    const Param args[] = {";
            for (std::size_t i = 0; i < fixed; ++i) o << (i ? ", " : "") << "a" << i;
            o << "};\n    return dispatch(" << k << ", args, " << fixed << ", " << rest << ");\n";
        } else {
            o << "    return dispatch(" << k << ", nullptr, 0, " << rest << ");\n";
        }
        o << "}\n";
    }
    o << "\n}  // namespace isentra::uno\n";
    return o.str();
}

// Markdown: escape the characters that would start markup inside table cells.
std::string md(const std::string& s) {
    std::string r;
    for (char c : s) {
        if (c == '|') r += "\\|";
        else if (c == '*' || c == '_' || c == '<' || c == '>') { r += '\\'; r += c; }
        else r += c;
    }
    return r;
}

std::string signature(const cat::Function& f) {
    std::string s = f.name + "(";
    for (std::size_t i = 0; i < f.args.size(); ++i) {
        const cat::Arg& a = f.args[i];
        std::string n = a.varargs ? a.name + "..." : a.name;
        if (a.optional) n = "[" + n + "]";
        s += (i ? "; " : "") + n;
    }
    return s + ")";
}

std::string anchor(const std::string& name) {
    std::string a;
    for (char c : name)
        if (std::isalnum(static_cast<unsigned char>(c))) a += static_cast<char>(std::tolower(static_cast<unsigned char>(c)));
    return a;
}

std::string num6(double v) {
    if (std::isnan(v)) return "#NUM!";
    char b[64];
    std::snprintf(b, sizeof b, "%.6g", v);
    return b;
}

std::string si_symbol(isentra::Quantity q) {
    if (q == isentra::Quantity::None || q == isentra::Quantity::Text) return "";
    return isentra::units::symbol(q, "SI");
}

std::string us_symbol(isentra::Quantity q) {
    if (q == isentra::Quantity::None || q == isentra::Quantity::Text) return "";
    return isentra::units::symbol(q, "US");
}

std::size_t missing_examples = 0;

// The worked example of f, computed now with isentra::call() through the
// call-text parser (the same path as the command-line tool): markdown, or
// "" if f has none. A failing example is a catalogue error.
std::string worked_example(const cat::Function& f) {
    if (f.example.empty()) {
        std::cerr << "isentra_gen: warning: function \"" << f.name
                  << "\" has no worked example (catalogue::Function::example) for docs/functions.md\n";
        ++missing_examples;
        return "";
    }
    const std::string where = "function \"" + f.name + "\": its example " + f.example;
    isentra::formula::ParsedCall pc;
    try {
        pc = isentra::formula::parse(f.example);
    } catch (const std::exception& e) {
        fail(where + " does not parse: " + e.what());
        return "";
    }
    if (pc.function != &f) {
        fail(where + " calls another function");
        return "";
    }
    const isentra::Table r = isentra::call(f, pc.args);
    std::ostringstream o;
    o << "\nExample: `=" << f.example << "`";
    if (r.rows == 1 && r.cols == 1) {
        const isentra::Value& v = r.cells[0];
        switch (v.kind) {
        case isentra::Value::Kind::Number: {
            const std::string u = si_symbol(f.result);
            o << " gives **" << num6(v.number) << "**" << (u.empty() ? "" : " " + md(u)) << ".\n";
            break;
        }
        case isentra::Value::Kind::Text: o << " gives \"" << md(v.text) << "\".\n"; break;
        case isentra::Value::Kind::Empty: o << " gives an empty result.\n"; break;
        case isentra::Value::Kind::Error:
            fail(where + " gives an error: " + v.text + " (change the example in the catalogue's add_examples)");
            return "";
        }
        return o.str();
    }
    o << " (an array formula over " << r.cols << " cells) gives:\n\n|";
    for (std::size_t c = 0; c < r.cols; ++c) {
        std::string h = c < f.row_names.size() ? f.row_names[c] : "";
        const std::string u = c < f.row_quantities.size() ? si_symbol(f.row_quantities[c]) : "";
        o << " " << md(h) << (u.empty() ? "" : " (" + md(u) + ")") << " |";
    }
    o << "\n|";
    for (std::size_t c = 0; c < r.cols; ++c) o << "---|";
    o << "\n|";
    bool any_error = false;
    for (std::size_t c = 0; c < r.cols; ++c) {
        const isentra::Value& v = r.at(0, c);
        if (v.kind == isentra::Value::Kind::Error) {
            any_error = true;
            o << " #NUM! |";
        } else if (v.kind == isentra::Value::Kind::Number) {
            o << " " << num6(v.number) << " |";
        } else {
            o << " " << md(v.text) << " |";
        }
    }
    o << "\n";
    if (any_error) o << "\n#NUM! marks a value the state does not have (STEAM.EXPLAIN gives the reason).\n";
    return o.str();
}

std::string functions_md(const std::vector<cat::Function>& fs) {
    std::ostringstream o;
    o << "<!-- " << banner << "\n     Refresh with: cmake --build <build dir> --target update-docs -->\n\n"
      << "# Isentra function reference\n\n"
      << "Isentra " << cat::version() << " adds " << fs.size()
      << " functions to LibreOffice Calc, listed below by category with their arguments, the units of "
         "each, what they accept and a worked example (in SI units) whose result Isentra itself computed "
         "when this page was made. This page separates arguments with `;`; Calc may show another separator, "
         "depending on Tools > Options > LibreOffice Calc > Formula. Arguments in [brackets] are "
         "optional; the others are required, and Calc refuses a call without them (Err:504).\n\n"
      << "Results feed decisions about pressure equipment: check them, and defer to the codes that apply "
         "where you work and to a licensed engineer.\n\n";

    // ---- once, for every function -------------------------------------------
    o << "## Units\n\n"
      << "Every function with quantities takes an optional argument `units` (the last one, or the last "
         "but `header`): a text that sets the units of **all** its inputs and of its result. Leave it out for SI. It may be a "
         "cell reference, so one cell can set a whole workbook; the readings in the sheet are then read "
         "in those units and the results come out in them.\n\n"
      << "A units text is a unit system, optionally followed by overrides of single quantities written "
         "`key=unit`, separated by blanks: \"US\", \"US p=psig\", \"SI p=barg T=K\", \"BAR h=kcal/kg\". "
         "A text that starts with an override or a bare unit, such as \"psig\" or \"p=psig\", means SI "
         "with that one quantity changed: `STEAM.TSAT(150; \"psig\")` reads 150 psig and answers in °C. "
         "`STEAM.UNITS.SPELL(\"psig\")` spells out what a units text means, quantity by quantity, with "
         "the barometric pressure a gauge unit adds. "
         "Gauge pressures are relative to the standard atmosphere (101.325 kPa) unless the text gives "
         "the local barometric pressure, e.g. \"US p=psig patm=14.2psia\". Unit spellings are "
         "case-insensitive where that is unambiguous. Temperature differences (TTD, DCA, approach, "
         "superheat, rise, uncertainties of temperatures) convert as differences. Conversion factors are "
         "exact from NIST SP 811 (2008) Appendix B and the international yard and pound.\n\n"
      << "| system | units (override key, unit) |\n|---|---|\n";
    for (const auto& sys : isentra::units::known_systems())
        o << "| " << md(sys.name) << " | " << md(sys.description) << " |\n";
    o << "\nEach function below gives the unit of every argument and of its result in SI and US; the "
         "other systems and every unit symbol are in [Unit symbols](#unit-symbols) at the end.\n\n"
      << "## Blank cells, ranges and errors\n\n"
      << "- **A blank cell counts as 0.** Calc passes a reference to an empty cell to an add-in as the "
         "number 0 before the add-in sees it, so `=STEAM.H.PT(1; Z1)` with Z1 empty is the enthalpy at "
         "0 °C, not an error. Where 0 is not a possible value (an absolute pressure or temperature, an "
         "efficiency, a flow or power that must be above 0) the function refuses it, and its sentence "
         "adds \"a blank cell counts as 0\". Check that the cells a formula reads are filled in, or leave the result "
         "blank while a reading is blank (the Isentra workbooks do). A blank cell inside a range of two "
         "or more cells is an error (\"the argument T is empty\").\n"
      << "- **Ranges.** Numeric arguments may be ranges: `{=STEAM.H.PT(A2:A500; B2:B500)}` converts a "
         "whole column in one array formula (Ctrl+Shift+Enter); a single value is used for every row. "
         "Each argument's own range (what it accepts) is in its table below; a value outside it is an "
         "error whose sentence gives the limit and its reason.\n"
      << "- **Errors.** An invalid input gives an error value: Err:502 in a cell, #NUM! for one element "
         "of an array result, Err:504 when a required argument is missing or there are too many. "
         "`=STEAM.EXPLAIN(\"H.PT\"; same arguments)` returns the reason as a sentence in your units.\n\n"
      << "## Ranges of validity\n\n"
      << "Water and steam properties follow IAPWS-IF97 (IAPWS R7-97(2012)), valid for 273.15 K to "
         "1073.15 K (0 °C to 800 °C) at pressures up to 100 MPa and for 1073.15 K to 2273.15 K (800 °C to "
         "2000 °C) up to 50 MPa (R7-97(2012) Sec. 2). Saturation properties exist from the triple point "
         "to the critical point (611.657 Pa to 22.064 MPa, 273.16 K to 647.096 K); viscosity (IAPWS "
         "R12-08), thermal conductivity (IAPWS R15-11) and surface tension (IAPWS R1-76(2014)) have the "
         "ranges their releases give. Outside them a function gives an error, never an extrapolated "
         "number. Each argument below says what else it accepts.\n\n";

    // Categories in order of first appearance.
    std::vector<std::string> cats;
    for (const cat::Function& f : fs)
        if (std::find(cats.begin(), cats.end(), f.category) == cats.end()) cats.push_back(f.category);

    o << "## Contents\n\n";
    for (const std::string& c : cats) {
        o << "- **" << md(c) << "**:";
        bool first = true;
        for (const cat::Function& f : fs)
            if (f.category == c) {
                o << (first ? " " : ", ") << "[" << f.name << "](#" << anchor(f.name) << ")";
                first = false;
            }
        o << "\n";
    }
    o << "- [Unit symbols](#unit-symbols); for developers: [UNO method names](#uno-method-names)\n";
    for (const std::string& c : cats) {
        o << "\n## " << md(c) << "\n";
        for (const cat::Function& f : fs) {
            if (f.category != c) continue;
            o << "\n### " << f.name << "\n\n`" << signature(f) << "`\n\n" << md(f.summary);
            if (f.kind == cat::ResultKind::Number && f.result != isentra::Quantity::None &&
                f.result != isentra::Quantity::Text)
                o << " Result in " << md(si_symbol(f.result)) << " (SI), " << md(us_symbol(f.result)) << " (US).";
            o << "\n";
            if (!f.note.empty()) o << "\n" << md(f.note) << "\n";
            if (f.kind == cat::ResultKind::Row) {
                o << "\nResult columns:";
                for (std::size_t i = 0; i < f.row_names.size(); ++i) {
                    const std::string si = si_symbol(f.row_quantities[i]), us = us_symbol(f.row_quantities[i]);
                    o << (i ? ", " : " ") << md(f.row_names[i]);
                    if (!si.empty()) o << " (" << md(si) << (us != si ? "; " + md(us) : "") << ")";
                }
                o << ".\n";
            }
            if (!f.args.empty()) {
                o << "\n| argument | what it is, what it accepts | SI | US |\n|---|---|---|---|\n";
                for (std::size_t i = 0; i < f.args.size(); ++i) {
                    const cat::Arg& a = f.args[i];
                    std::string name = md(a.name) + (a.varargs ? "..." : "") + (a.optional ? " (optional)" : "");
                    if (i == f.units_index() && f.name != "STEAM.UNITS.SPELL") {  // its text is the subject
                        o << "| " << name << " | the units of all inputs and the result, see [Units](#units) | | |\n";
                        continue;
                    }
                    std::string d = a.description;
                    if (!d.empty() && d.back() != '.') d += ".";
                    const std::string range = cat::range_text(f, i);  // the values call() accepts
                    if (!range.empty()) d += " Range " + range + ".";
                    o << "| " << name << " | " << md(d) << " | " << md(si_symbol(a.quantity)) << " | "
                      << md(us_symbol(a.quantity)) << " |\n";
                }
            }
            o << worked_example(f);
        }
    }

    // Units, from the core's unit table (the same one the functions use).
    o << "\n## Unit symbols\n\n"
      << "Every unit, by quantity: the symbol is what `STEAM.CONVERT` and overrides (`key=unit`) accept.\n";
    std::vector<isentra::Quantity> qs;
    for (const auto& u : isentra::units::known_units())
        if (std::find(qs.begin(), qs.end(), u.quantity) == qs.end()) qs.push_back(u.quantity);
    for (const isentra::Quantity q : qs) {
        o << "\n**" << md(std::string(isentra::units::quantity_name(q))) << "**\n\n| unit | meaning |\n|---|---|\n";
        for (const auto& u : isentra::units::known_units())
            if (u.quantity == q) o << "| `" << u.symbol << "` | " << md(u.description) << " |\n";
    }

    // Developers' appendix: the stored names.
    o << "\n## UNO method names\n\n"
      << "For developers and for reading a saved file. A document stores each call under the add-in's "
         "service and the function's UNO method, e.g. `of:=ORG.ISENTRA.STEAMFUNCTIONS.HPT(A2;B2)` for "
         "STEAM.H.PT; these names never change. All methods belong to the interface "
         "`org.isentra.XSteamFunctions`; a required argument is declared `sequence<sequence<any>>`, an "
         "optional one `any`, a list `sequence<any>` (DEVELOPERS.md, \"How the add-in talks to Calc\").\n\n"
      << "| function | UNO method |\n|---|---|\n";
    for (const cat::Function& f : fs) o << "| " << f.name << " | `" << f.method << "` |\n";
    return o.str();
}

}  // namespace

int main(int argc, char** argv) {
    if (argc != 2) {
        std::cerr << "usage: isentra_gen OUTDIR\n";
        return 2;
    }
    const std::string dir = argv[1];
    try {
        const std::vector<cat::Function>& fs = cat::functions();
        if (fs.empty()) fail("the catalogue is empty");
        check(fs);
        if (failures) return 1;
        write_if_changed(dir + "/isentra.idl", idl(fs));
        write_if_changed(dir + "/steam_methods.hxx", methods_hxx(fs));
        write_if_changed(dir + "/steam_methods.cxx", methods_cxx(fs));
        write_if_changed(dir + "/functions.md", functions_md(fs));
    } catch (const std::exception& e) {
        std::cerr << "isentra_gen: " << e.what() << "\n";
        return 1;
    }
    return failures ? 1 : 0;
}
