// SPDX-License-Identifier: MPL-2.0
#include "options.hpp"

#include <cctype>
#include <cerrno>
#include <cstdlib>

namespace isentra::recalc {

namespace {

bool parse_double(const std::string& s, double& v) {
    if (s.empty()) return false;
    char* end = nullptr;
    errno = 0;
    v = std::strtod(s.c_str(), &end);
    return end && *end == '\0' && errno == 0;
}

}  // namespace

std::string CellAddress::text() const {
    bool plain = !sheet.empty() && !std::isdigit(static_cast<unsigned char>(sheet[0]));
    for (char c : sheet)
        if (!(std::isalnum(static_cast<unsigned char>(c)) || c == '_')) plain = false;
    std::string s;
    if (plain) s = sheet;
    else {
        s = "'";
        for (char c : sheet) s += c == '\'' ? std::string("''") : std::string(1, c);
        s += "'";
    }
    return s + "." + cell_name(col, row);
}

CellAddress parse_address(const std::string& text, const std::string& what) {
    auto bad = [&](const std::string& why) {
        return UsageError(what + ": '" + text + "' is not a cell address SHEET.CELL (e.g. Heaters.C10): " + why);
    };
    CellAddress a;
    std::size_t i = 0;
    if (i < text.size() && text[i] == '$') ++i;
    std::size_t dot;
    if (i < text.size() && text[i] == '\'') {
        std::size_t j = i + 1;
        for (; j < text.size(); ++j) {
            if (text[j] == '\'') {
                if (j + 1 < text.size() && text[j + 1] == '\'') {
                    a.sheet += '\'';
                    ++j;
                } else break;
            } else a.sheet += text[j];
        }
        if (j >= text.size()) throw bad("the quoted sheet name has no closing quote");
        dot = j + 1;
        if (dot >= text.size() || text[dot] != '.') throw bad("a '.' must follow the sheet name");
    } else {
        dot = text.rfind('.');
        if (dot == std::string::npos || dot <= i) throw bad("no sheet name before a '.'");
        a.sheet = text.substr(i, dot - i);
    }
    if (a.sheet.empty()) throw bad("the sheet name is empty");
    std::size_t k = dot + 1;
    if (k < text.size() && text[k] == '$') ++k;
    long col = 0;
    std::size_t letters = 0;
    while (k < text.size() && std::isalpha(static_cast<unsigned char>(text[k]))) {
        col = col * 26 + (std::toupper(static_cast<unsigned char>(text[k])) - 'A' + 1);
        ++k;
        if (++letters > 3) throw bad("the column has more than three letters");
    }
    if (letters == 0) throw bad("the cell has no column letters");
    if (k < text.size() && text[k] == '$') ++k;
    std::size_t digits = 0;
    long row = 0;
    while (k < text.size() && std::isdigit(static_cast<unsigned char>(text[k]))) {
        row = row * 10 + (text[k] - '0');
        ++k;
        if (++digits > 7) throw bad("the row number is too large");
    }
    if (digits == 0 || row == 0) throw bad("the cell has no row number (rows start at 1)");
    if (k != text.size()) throw bad("unexpected '" + text.substr(k) + "' after the cell");
    if (col > 16384) throw bad("the column is beyond XFD");
    if (row > 1048576) throw bad("the row is beyond 1048576");
    a.col = static_cast<int>(col - 1);
    a.row = static_cast<int>(row - 1);
    return a;
}

Assignment parse_assignment(const std::string& text) {
    const std::size_t eq = text.find('=');
    if (eq == std::string::npos) throw UsageError("--set: '" + text + "' has no '=' (write SHEET.CELL=VALUE)");
    return Assignment{parse_address(text.substr(0, eq), "--set"), text.substr(eq + 1)};
}

std::vector<std::vector<std::string>> parse_csv(const std::string& text) {
    // The separator is ';' when the first line has more ';' than ',' outside quotes.
    char sep = ',';
    {
        std::size_t commas = 0, semis = 0;
        bool q = false;
        for (char c : text) {
            if (c == '"') q = !q;
            else if (!q && (c == '\n' || c == '\r')) break;
            else if (!q && c == ',') ++commas;
            else if (!q && c == ';') ++semis;
        }
        if (semis > commas) sep = ';';
    }
    std::vector<std::vector<std::string>> rows;
    std::vector<std::string> row;
    std::string field;
    bool quoted = false, any = false;
    for (std::size_t i = 0; i < text.size(); ++i) {
        const char c = text[i];
        if (quoted) {
            if (c == '"') {
                if (i + 1 < text.size() && text[i + 1] == '"') {
                    field += '"';
                    ++i;
                } else quoted = false;
            } else field += c;
            continue;
        }
        if (c == '"') {
            quoted = true;
            any = true;
        } else if (c == sep) {
            row.push_back(field);
            field.clear();
            any = true;
        } else if (c == '\n' || c == '\r') {
            if (c == '\r' && i + 1 < text.size() && text[i + 1] == '\n') ++i;
            if (any || !field.empty()) {
                row.push_back(field);
                rows.push_back(row);
            }
            row.clear();
            field.clear();
            any = false;
        } else {
            field += c;
            any = true;
        }
    }
    if (any || !field.empty()) {
        row.push_back(field);
        rows.push_back(row);
    }
    // Trim spaces around unquoted fields is not done: values are taken as written.
    return rows;
}

CaseTable parse_case_table(const std::string& csv_text, const std::string& file_name) {
    const auto rows = parse_csv(csv_text);
    if (rows.empty()) throw UsageError("--cases " + file_name + ": the file is empty (expected a header row of cell addresses)");
    CaseTable t;
    for (const std::string& h : rows[0]) t.inputs.push_back(parse_address(h, "--cases " + file_name + " (header)"));
    for (std::size_t r = 1; r < rows.size(); ++r) {
        bool blank = true;
        for (const std::string& f : rows[r])
            if (!f.empty()) blank = false;
        if (blank) continue;
        if (rows[r].size() != t.inputs.size())
            throw UsageError("--cases " + file_name + ": row " + std::to_string(r + 1) + " has " +
                             std::to_string(rows[r].size()) + " fields, the header has " +
                             std::to_string(t.inputs.size()));
        t.rows.push_back(rows[r]);
    }
    if (t.rows.empty()) throw UsageError("--cases " + file_name + ": no case rows below the header");
    return t;
}

const char* filter_for(const std::string& e) {
    if (e == "ods") return "calc8";
    if (e == "ots") return "calc8_template";
    if (e == "fods") return "OpenDocument Spreadsheet Flat XML";
    if (e == "xlsx") return "Calc MS Excel 2007 XML";
    if (e == "xlsm") return "Calc MS Excel 2007 VBA XML";
    return nullptr;
}

bool is_input_extension(const std::string& e) {
    return e == "ods" || e == "ots" || e == "fods" || e == "xlsx" || e == "xlsm" || e == "xls";
}

Options parse_options(const std::vector<std::string>& args) {
    Options o;
    bool only_files = false;
    for (std::size_t i = 0; i < args.size(); ++i) {
        const std::string& a = args[i];
        if (only_files || a.empty() || a[0] != '-' || a == "-") {
            o.inputs.push_back(a);
            continue;
        }
        std::string name = a, inline_value;
        bool has_inline = false;
        if (a.rfind("--", 0) == 0) {
            const std::size_t eq = a.find('=');
            if (eq != std::string::npos) {
                name = a.substr(0, eq);
                inline_value = a.substr(eq + 1);
                has_inline = true;
            }
        } else if (a.size() > 2 && a[1] == 'j') {  // -j2
            name = "-j";
            inline_value = a.substr(2);
            has_inline = true;
        }
        auto value = [&]() -> std::string {
            if (has_inline) return inline_value;
            if (i + 1 >= args.size()) throw UsageError(name + " needs a value");
            return args[++i];
        };
        auto number = [&](double lo) {
            const std::string v = value();
            double d;
            if (!parse_double(v, d) || d < lo)
                throw UsageError(name + ": '" + v + "' is not a number of at least " + format_number(lo));
            return d;
        };
        if (name == "--") only_files = true;
        else if (name == "-h" || name == "--help") o.help = true;
        else if (name == "--version") o.version = true;
        else if (name == "-o" || name == "--output") o.output = value();
        else if (name == "--format") {
            std::string f = value();
            for (char& c : f) c = static_cast<char>(std::tolower(static_cast<unsigned char>(c)));
            if (!f.empty() && f[0] == '.') f.erase(0, 1);
            if (f == "xls")
                throw UsageError("--format xls: the tool never writes .xls (an add-in call does not survive .xls in "
                                 "LibreOffice: every Isentra cell reads #MACRO? after reopening); use xlsx or ods");
            if (!filter_for(f)) throw UsageError("--format: '" + f + "' is not one of ods, ots, fods, xlsx, xlsm");
            o.format = f;
        } else if (name == "--no-copies") o.copies = false;
        else if (name == "--abs") o.tolerance.abs = number(0);
        else if (name == "--rel") o.tolerance.rel = number(0);
        else if (name == "--set") o.sets.push_back(parse_assignment(value()));
        else if (name == "--cases") o.cases_file = value();
        else if (name == "--collect") {
            const std::string v = value();
            std::size_t start = 0;
            // Comma-separated; a comma inside a 'quoted sheet name' does not split.
            bool q = false;
            for (std::size_t k = 0; k <= v.size(); ++k) {
                if (k < v.size() && v[k] == '\'') q = !q;
                if (k == v.size() || (!q && v[k] == ',')) {
                    const std::string part = v.substr(start, k - start);
                    if (!part.empty()) o.collect.push_back(parse_address(part, "--collect"));
                    start = k + 1;
                }
            }
        } else if (name == "-j" || name == "--jobs") {
            const double j = number(1);
            if (j != static_cast<int>(j) || j > 64) throw UsageError(name + ": '" + format_number(j) + "' is not a whole number from 1 to 64");
            o.jobs = static_cast<int>(j);
        } else if (name == "--timeout") {
            o.timeout_s = number(0);
            if (o.timeout_s <= 0) throw UsageError("--timeout: the time limit must be more than 0 seconds");
        } else if (name == "-q" || name == "--quiet") o.progress = false;
        else throw UsageError("unknown option " + a + " (see --help)");
    }
    if (o.help || o.version) return o;
    if (o.inputs.empty()) throw UsageError("no workbook or folder given (see --help)");
    if (!o.collect.empty() && o.cases_file.empty() && o.sets.empty())
        throw UsageError("--collect needs --cases or --set (it collects the results of case runs)");
    return o;
}

std::string help_text() {
    return R"(Usage: isentra-recalc [OPTIONS] WORKBOOK|FOLDER...

Recalculates existing workbooks in a headless LibreOffice Calc with the Isentra
extension and reports which formula results changed against the results stored
in the files. Folders are searched recursively for .ods .ots .fods .xlsx .xlsm
.xls. Templates (.ots) open as new documents. The originals are never written:
recalculated copies, the report (.ods and .csv) and case results go into a new
output folder. Macros are never executed, links are not updated, no dialog is
shown. A private LibreOffice profile is prepared in a temporary folder (your own
profile is not used); as root, the office runs as the user nobody.

Options:
  -o, --output DIR        output folder (created; existing files there are never
                          overwritten). Default: a new folder beside the inputs,
                          <input folder>/recalculated-YYYYMMDD-HHMMSS
                          (for a folder input: <folder>-recalculated-...).
      --format EXT        format of the copies: ods, ots, fods, xlsx, xlsm
                          (default: the input's own; .xls inputs are written as
                          .xlsx: an add-in call does not survive .xls)
      --no-copies         write only the report, no recalculated copies
      --abs X             absolute tolerance (default 1e-12)
      --rel X             relative tolerance (default 1e-9); a number counts as
                          changed when it differs beyond both
      --set SHEET.CELL=VALUE
                          enter VALUE into a cell before recalculating
                          (repeatable; a number, "=formula", or text), e.g.
                          --set Heaters.C10=2.31 --set "'Heat rate'.C9=538"
      --cases TABLE.csv   run each workbook once per case: a header row of cell
                          addresses, one row of input values per case
      --collect SHEET.CELL[,SHEET.CELL...]
                          result cells collected into cases.csv and cases.ods,
                          one row per case (repeatable)
  -j, --jobs N            N office processes, each with its own profile (default 1)
      --timeout SECONDS   time limit per file (default 300); a file that exceeds
                          it, or crashes the office, is reported as failed, the
                          office is restarted and the batch goes on
  -q, --quiet             no progress line on the terminal
  -h, --help              this text
      --version           the version

Output: one summary line per file on standard output, a total and the time
taken (starting the offices, the files); in the output folder the
recalculated copies, recalc-report.ods (a summary sheet, then one row per change)
and recalc-report.csv (one row per change), and with --cases cases.csv/.ods.
A change is: a number that changed beyond the tolerances, a text that changed,
a new error, an error that went away, an unknown function (#NAME?, naming the
function), a change of type (number to text). Each row names the file, sheet,
cell, the nearest label (text cell to the left, else above), the formula, the
old and new value and the difference.

Exit status: 0 all files recalculated, nothing changed; 1 changes found;
2 some files failed (damaged, password-protected, time limit, office crash);
64 wrong command line.
)";
}

}  // namespace isentra::recalc
