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
#include <cstdio>
#include <fstream>
#include <iostream>
#include <set>
#include <sstream>
#include <string>
#include <vector>

#include "isentra/surface/catalogue.hpp"
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

std::string functions_md(const std::vector<cat::Function>& fs) {
    std::ostringstream o;
    o << "<!-- " << banner << "\n     Refresh with: cmake --build <build dir> --target update-docs -->\n\n"
      << "# Isentra function reference\n\n"
      << "Isentra " << cat::version() << " adds " << fs.size()
      << " functions to LibreOffice Calc. This reference separates arguments with `;`; Calc may show "
         "another separator, depending on the settings under Tools > Options > LibreOffice Calc > "
         "Formula. Every argument can be a number, a text or "
         "a cell reference; numeric arguments can also be ranges, which give an array result (enter it as an "
         "array formula, Ctrl+Shift+Enter). Arguments in [brackets] are optional.\n\n"
      << "Units: the optional last argument `units` chooses the unit system for all inputs and the result, "
         "e.g. \"SI\" (default) or \"US\". An invalid input gives an error value (Err:502 for a single value); "
         "`=STEAM.EXPLAIN(\"NAME\"; same arguments)` returns the reason as a sentence.\n\n";

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
    for (const std::string& c : cats) {
        o << "\n## " << md(c) << "\n";
        for (const cat::Function& f : fs) {
            if (f.category != c) continue;
            o << "\n### " << f.name << "\n\n`" << signature(f) << "`\n\n" << md(cat::describe_function(f)) << "\n";
            if (!f.note.empty()) o << "\n" << md(f.note) << "\n";
            if (f.kind == cat::ResultKind::Row) {
                o << "\nResult columns:";
                for (std::size_t i = 0; i < f.row_names.size(); ++i) {
                    const std::string si = isentra::units::symbol(f.row_quantities[i], "SI");
                    const std::string us = isentra::units::symbol(f.row_quantities[i], "US");
                    o << (i ? ", " : " ") << md(f.row_names[i]);
                    if (!si.empty()) o << " (" << md(si) << (us != si ? "; " + md(us) : "") << ")";
                }
                o << ".\n";
            }
            if (!f.args.empty()) {
                o << "\n| argument | description |\n|---|---|\n";
                for (std::size_t i = 0; i < f.args.size(); ++i) {
                    const cat::Arg& a = f.args[i];
                    o << "| " << md(a.name) << (a.varargs ? "..." : "") << (a.optional ? " (optional)" : "") << " | "
                      << md(cat::describe_arg(f, i)) << " |\n";
                }
            }
            o << "\nUNO method: `org.isentra.XSteamFunctions::" << f.method << "`\n";
        }
    }

    // Units, from the core's unit table (the same one the functions use).
    o << "\n## Units\n\n"
      << "The `units` argument names a unit system, optionally followed by overrides of single "
         "quantities as `key=unit`, e.g. \"US p=psig\", \"SI p=barg T=K\", \"BAR h=kcal/kg\". "
         "Gauge pressures are relative to the standard atmosphere (101.325 kPa) unless the text gives "
         "the local barometric pressure, e.g. \"US p=psig patm=14.2psia\". Unit spellings are "
         "case-insensitive where that is unambiguous. Temperature differences (superheat, "
         "subcooling, approach, rise) convert as differences. Conversion factors are exact from "
         "NIST SP 811 (2008) Appendix B and the international yard and pound.\n\n"
      << "| system | units (override key, unit) |\n|---|---|\n";
    for (const auto& sys : isentra::units::known_systems())
        o << "| " << md(sys.name) << " | " << md(sys.description) << " |\n";
    o << "\nEvery unit, by quantity (the symbol is what `STEAM.CONVERT` and overrides accept):\n";
    std::vector<isentra::Quantity> qs;
    for (const auto& u : isentra::units::known_units())
        if (std::find(qs.begin(), qs.end(), u.quantity) == qs.end()) qs.push_back(u.quantity);
    for (const isentra::Quantity q : qs) {
        o << "\n**" << md(std::string(isentra::units::quantity_name(q))) << "**\n\n| unit | meaning |\n|---|---|\n";
        for (const auto& u : isentra::units::known_units())
            if (u.quantity == q) o << "| `" << u.symbol << "` | " << md(u.description) << " |\n";
    }
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
