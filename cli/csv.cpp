// SPDX-License-Identifier: MPL-2.0
// `isentra csv`: new columns computed by cell-style calls over the columns of
// a CSV file (logged plant readings), written as CSV with the input columns
// passed through byte for byte.
//
// Speed: every call is parsed once into a plan (an isentra::PreparedCall:
// the catalogue function, its units and constants, and which columns feed
// which argument); per row only the referenced fields are read
// (std::from_chars), the function is evaluated in core units and the result
// is written with std::to_chars (shortest text that reads back exactly).
// Input and output go through large blocks on the file descriptors.
#include <fcntl.h>
#include <sys/stat.h>
#include <unistd.h>

#include <cerrno>
#include <cmath>
#include <cstdio>
#include <cstring>
#include <optional>
#include <string>
#include <string_view>
#include <vector>

#include "io.hpp"
#include "isentra/surface/call.hpp"
#include "isentra/surface/catalogue.hpp"
#include "isentra/surface/formula.hpp"
#include "isentra/units/units.hpp"
#include "modes.hpp"

namespace isentra::cli {

namespace {

namespace cat = isentra::catalogue;

const char* const mode = "csv";

// ---------------------------------------------------------------- records

struct Field {
    const char* b;
    const char* e;
    bool quoted;
};

// Parses one record (RFC 4180: fields separated by `delim`, optionally in
// double quotes with "" for a quote; a quoted field may hold delimiters and
// line breaks) starting at p. Returns the position after its line break, or
// nullptr when the record runs past `end` and more input may follow.
// content_end: the end of the record without its line break ("\n" or "\r\n").
const char* parse_record(const char* p, const char* end, bool eof, char delim, std::vector<Field>& fields,
                         const char*& content_end) {
    fields.clear();
    const char* q = p;
    for (;;) {
        Field f;
        if (q < end && *q == '"') {
            const char* s = q + 1;
            const char* r = s;
            for (;;) {
                if (r >= end) {
                    if (!eof) return nullptr;
                    break;  // an unterminated quote at the end of the input: the field runs to the end
                }
                if (*r == '"') {
                    if (r + 1 < end && r[1] == '"') {
                        r += 2;
                        continue;
                    }
                    if (r + 1 >= end && !eof) return nullptr;  // cannot tell "" from " yet
                    break;
                }
                ++r;
            }
            f = {s, r, true};
            q = r < end ? r + 1 : r;
            while (q < end && *q != delim && *q != '\n') ++q;  // anything after the closing quote is ignored
        } else {
            const char* s = q;
            while (q < end && *q != delim && *q != '\n') ++q;
            f = {s, q, false};
        }
        if (q >= end) {
            if (!eof) return nullptr;
            content_end = end;
            if (!f.quoted && f.e > f.b && f.e[-1] == '\r') --f.e;
            if (content_end > p && content_end[-1] == '\r') --content_end;
            fields.push_back(f);
            return end;
        }
        if (*q == delim) {
            fields.push_back(f);
            ++q;
            continue;
        }
        // *q == '\n'
        content_end = q;
        if (content_end > p && content_end[-1] == '\r') {
            --content_end;
            if (!f.quoted && f.e == q) --f.e;
        }
        fields.push_back(f);
        return q + 1;
    }
}

std::string field_text(const Field& f) {
    if (!f.quoted) return std::string(f.b, f.e);
    std::string t;
    t.reserve(static_cast<std::size_t>(f.e - f.b));
    for (const char* p = f.b; p < f.e; ++p) {
        t += *p;
        if (*p == '"' && p + 1 < f.e && p[1] == '"') ++p;
    }
    return t;
}

std::string trim(std::string s) {
    std::size_t a = 0, b = s.size();
    while (a < b && (s[a] == ' ' || s[a] == '\t')) ++a;
    while (b > a && (s[b - 1] == ' ' || s[b - 1] == '\t')) --b;
    return s.substr(a, b - a);
}

// A field for the output, in quotes when it needs them.
void put_field(Writer& w, std::string_view t, char delim) {
    bool quote = !t.empty() && (t.front() == ' ' || t.back() == ' ');
    for (char c : t)
        if (c == delim || c == '"' || c == '\n' || c == '\r') {
            quote = true;
            break;
        }
    if (!quote) {
        w.put(t);
        return;
    }
    w.put('"');
    for (char c : t) {
        if (c == '"') w.put('"');
        w.put(c);
    }
    w.put('"');
}

// ---------------------------------------------------------------- the plan

// One value of the current row as an argument: an input field or an
// element of an earlier computed column.
struct Cell {
    enum class Kind { Number, Empty, Text, Error } kind = Kind::Empty;
    double number = 0;
    const Field* field = nullptr;  // Text: the field
    const Value* error = nullptr;  // Error: the value
    Value value() const {
        switch (kind) {
            case Kind::Number: return Value::of(number);
            case Kind::Empty: return Value{};
            case Kind::Text: return Value::of_text(field_text(*field));
            case Kind::Error: return *error;
        }
        return Value{};
    }
};

struct Source {
    bool computed = false;
    std::size_t index = 0;    // input column, or computed column
    std::size_t element = 0;  // computed: which result element
};

struct Column {
    std::string name;                    // as defined (NAME=...)
    std::vector<std::string> out_names;  // one per result element
    const cat::Function* f = nullptr;
    std::optional<PreparedCall> prepared;  // the fast plan (numeric functions)
    std::vector<Source> slot_source;       // prepared: per slot
    std::vector<Table> args;               // generic plan (CONVERT, EXPLAIN, ...): the arguments, names as placeholders
    std::vector<std::pair<std::size_t, Source>> arg_source;  // generic: argument index and its source
    std::size_t width = 1;
    unsigned long long error_rows = 0;
    // This row's results.
    std::vector<Cell> cells;
    std::vector<Value> values;  // results that are not numbers (errors, texts)
    bool text_result = false;   // generic plan: results may be texts
};

struct Options {
    std::string input = "-";
    bool input_given = false;
    std::string output;
    std::string units;
    bool units_given = false;
    std::vector<std::pair<std::string, std::string>> column_units;  // name, unit text
    char delimiter = 0;  // 0: ';' with a decimal comma, ',' otherwise
    char decimal = '.';
    bool errors = false;
    bool quiet = false;
    bool progress = true;
    std::vector<std::string> definitions;
};

bool is_name_start(char c) { return (c >= 'A' && c <= 'Z') || (c >= 'a' && c <= 'z'); }

// "NAME=CALL(" : a column definition (rather than the input file name).
bool looks_like_definition(const std::string& a) {
    const std::size_t eq = a.find('=');
    if (eq == std::string::npos || eq == 0) return false;
    std::size_t k = eq + 1;
    while (k < a.size() && a[k] == ' ') ++k;
    if (k >= a.size() || !is_name_start(a[k])) return false;
    while (k < a.size() && (is_name_start(a[k]) || (a[k] >= '0' && a[k] <= '9') || a[k] == '.' || a[k] == '_')) ++k;
    while (k < a.size() && a[k] == ' ') ++k;
    return k < a.size() && a[k] == '(';
}

bool parse_char_option(const std::string& what, const std::string& v, char& out, std::string& err) {
    if (v == "tab" || v == "\\t" || v == "\t") out = '\t';
    else if (v == "comma") out = ',';
    else if (v == "semicolon") out = ';';
    else if (v == "space") out = ' ';
    else if (v.size() == 1) out = v[0];
    else {
        err = what + " must be one character (or tab, comma, semicolon, space), not '" + v + "'";
        return false;
    }
    if (out == '"' || out == '\n' || out == '\r') {
        err = what + " cannot be a quote or a line break";
        return false;
    }
    return true;
}

int parse_options(const std::vector<std::string>& args, Options& o) {
    for (std::size_t k = 0; k < args.size(); ++k) {
        std::string a = args[k];
        std::string value;
        bool has_value = false;
        if (a.size() > 2 && a.compare(0, 2, "--") == 0) {
            const std::size_t eq = a.find('=');
            if (eq != std::string::npos) {
                value = a.substr(eq + 1);
                a = a.substr(0, eq);
                has_value = true;
            }
        }
        auto need = [&](std::string& out) -> bool {
            if (has_value) {
                out = value;
                return true;
            }
            if (k + 1 >= args.size()) return false;
            out = args[++k];
            return true;
        };
        std::string v, err;
        if (a == "-o" || a == "--output") {
            if (!need(o.output) || o.output.empty()) return usage(mode, "--output needs a file name");
        } else if (a == "-i" || a == "--input") {
            if (o.input_given) return usage(mode, "two input files; give one");
            if (!need(o.input) || o.input.empty()) return usage(mode, "--input needs a file name");
            o.input_given = true;
        } else if (a == "--units") {
            if (!need(o.units)) return usage(mode, "--units needs a unit text, e.g. --units US");
            o.units_given = true;
        } else if (a == "--column-unit") {
            if (!need(v)) return usage(mode, "--column-unit needs COLUMN=UNIT, e.g. --column-unit p_ms=barg");
            // COLUMN may be written in square brackets, as in a call (then it may hold '=').
            const std::size_t close = v.compare(0, 1, "[") == 0 ? v.find(']') : 0;
            const std::size_t eq = close == std::string::npos ? close : v.find('=', close);
            if (eq == std::string::npos || eq == 0 || eq + 1 >= v.size())
                return usage(mode, "--column-unit needs COLUMN=UNIT, e.g. --column-unit p_ms=barg, not '" + v + "'");
            o.column_units.emplace_back(trim(v.substr(0, eq)), trim(v.substr(eq + 1)));
        } else if (a == "--delimiter" || a == "-d") {
            if (!need(v)) return usage(mode, "--delimiter needs a character");
            if (!parse_char_option("the delimiter", v, o.delimiter, err)) return usage(mode, err);
        } else if (a == "--decimal") {
            if (!need(v)) return usage(mode, "--decimal needs '.' or ','");
            if (v != "." && v != ",") return usage(mode, "the decimal mark must be '.' or ',', not '" + v + "'");
            o.decimal = v[0];
        } else if (a == "--errors") {
            o.errors = true;
        } else if (a == "--quiet" || a == "-q") {
            o.quiet = true;
        } else if (a == "--no-progress") {
            o.progress = false;
        } else if (a.size() > 1 && a[0] == '-' && !looks_like_definition(a)) {
            return usage(mode, "unknown option '" + args[k] + "'");
        } else if (looks_like_definition(args[k])) {
            o.definitions.push_back(args[k]);
        } else {
            if (o.input_given)
                return usage(mode, "two input files ('" + o.input + "' and '" + args[k] +
                                       "'); a new column is written NAME=FUNCTION(...)");
            o.input = args[k];
            o.input_given = true;
        }
    }
    if (o.delimiter == 0) o.delimiter = o.decimal == ',' ? ';' : ',';
    if (o.delimiter == o.decimal)
        return usage(mode, std::string("the delimiter and the decimal mark are both '") + o.decimal +
                               "': give --delimiter ';' with --decimal ','");
    if (o.definitions.empty())
        return usage(mode, "no column to compute: give one or more NAME=FUNCTION(arguments), e.g. 'h=H.PT(p; T)'");
    return -1;
}

// ---------------------------------------------------------------- running

struct Run {
    Options o;
    std::vector<std::string> header;  // input column names (trimmed)
    std::vector<Column> columns;
    std::vector<std::size_t> needed;  // input columns read per row
    std::vector<Cell> input_cells;    // per input column (only the needed ones are filled)
};

const std::size_t npos = static_cast<std::size_t>(-1);

std::size_t find_input(const Run& r, const std::string& name) {
    for (std::size_t k = 0; k < r.header.size(); ++k)
        if (r.header[k] == name) return k;
    return npos;
}

std::string column_list(const Run& r) {
    std::string s;
    for (std::size_t k = 0; k < r.header.size() && k < 12; ++k) s += (k ? ", " : "") + r.header[k];
    if (r.header.size() > 12) s += ", ...";
    return s;
}

// Resolves a name used in a call: an earlier computed column (or one of its
// elements, NAME.element) or an input column.
bool resolve(Run& r, const std::string& name, std::size_t upto, Source& src, std::string& err) {
    for (std::size_t c = 0; c < upto; ++c)
        for (std::size_t e = 0; e < r.columns[c].out_names.size(); ++e)
            if (r.columns[c].out_names[e] == name) {
                src = {true, c, e};
                return true;
            }
    std::size_t found = npos;
    for (std::size_t k = 0; k < r.header.size(); ++k)
        if (r.header[k] == name) {
            if (found != npos) {
                err = "the column name '" + name + "' appears twice in the header";
                return false;
            }
            found = k;
        }
    if (found == npos) {
        err = "there is no column '" + name + "' in the input (columns: " + column_list(r) + ")";
        return false;
    }
    src = {false, found, 0};
    return true;
}

int plan(Run& r) {
    const Options& o = r.o;
    for (const std::string& def : o.definitions) {
        const std::size_t eq = def.find('=');
        Column col;
        col.name = trim(def.substr(0, eq));
        const std::string text = def.substr(eq + 1);
        if (col.name.empty()) return usage(mode, "a new column needs a name: NAME=FUNCTION(...)");
        formula::ParsedCall pc;
        try {
            pc = formula::parse(text, true);
        } catch (const formula::ParseError& e) {
            return usage(mode, "column " + col.name + ": " + e.what());
        }
        col.f = pc.function;
        const cat::Function& f = *pc.function;
        // --units for calls that do not give their own.
        if (o.units_given && f.has_units_arg() && pc.args.size() <= f.units_index()) {
            pc.args.resize(f.units_index(), Table::scalar(Value{}));
            pc.names.resize(f.units_index());
            pc.args.push_back(Table::scalar(Value::of_text(o.units)));
            pc.names.emplace_back();
        }
        for (const Table& t : pc.args)
            if (!(t.rows == 1 && t.cols == 1))
                return usage(mode, "column " + col.name + ": arrays are not available in CSV mode; name a column");
        std::vector<std::size_t> slots;
        std::vector<Source> sources;
        for (std::size_t i = 0; i < pc.names.size(); ++i) {
            if (pc.names[i].empty()) continue;
            Source src;
            std::string err;
            if (!resolve(r, pc.names[i], r.columns.size(), src, err)) return usage(mode, "column " + col.name + ": " + err);
            slots.push_back(i);
            sources.push_back(src);
        }
        if (PreparedCall::supported(f)) {
            try {
                col.prepared.emplace(f, pc.args, slots);
            } catch (const Error& e) {
                return usage(mode, "column " + col.name + ": " + e.what());
            }
            col.slot_source = sources;
            col.width = col.prepared->width();
        } else {
            col.args = pc.args;
            for (std::size_t k = 0; k < slots.size(); ++k) col.arg_source.emplace_back(slots[k], sources[k]);
            col.text_result = true;
        }
        if (col.width == 1) col.out_names.push_back(col.name);
        else
            for (const std::string& n : f.row_names) col.out_names.push_back(col.name + "." + n);
        for (const std::string& n : col.out_names) {
            Source dummy;
            std::string err;
            if (find_input(r, n) != npos) return usage(mode, "column " + n + " is already in the input; choose another name");
            if (resolve(r, n, r.columns.size(), dummy, err) && dummy.computed)
                return usage(mode, "column " + n + " is defined twice");
        }
        col.cells.resize(col.width);
        col.values.resize(col.width);
        r.columns.push_back(std::move(col));
    }
    // Units of single input columns.
    for (const auto& [name, unit] : o.column_units) {
        std::size_t k = find_input(r, name);
        if (k == npos && name.size() > 2 && name.front() == '[' && name.back() == ']')
            k = find_input(r, trim(name.substr(1, name.size() - 2)));  // [HP steam pressure]
        if (k == npos) return usage(mode, "--column-unit: there is no column '" + name + "' in the input (columns: " +
                                              column_list(r) + ")");
        units::UnitSpec spec;
        try {
            spec = units::UnitSpec::parse("SI " + unit);
        } catch (const Error& e) {
            return usage(mode, "--column-unit " + name + "=" + unit + ": " + e.what());
        }
        // The unit itself (without a patm= part), to check that it fits.
        std::string word = unit.substr(0, unit.find_first_of(" ,;"));
        bool used = false;
        for (Column& c : r.columns) {
            for (const auto& as : c.arg_source)
                if (!as.second.computed && as.second.index == k)
                    return usage(mode, "--column-unit " + name + ": " + c.f->name + " (column " + c.name +
                                           ") takes its units in its own arguments");
            for (std::size_t s = 0; s < c.slot_source.size(); ++s) {
                const Source& src = c.slot_source[s];
                if (src.computed || src.index != k) continue;
                const cat::Arg& arg = c.prepared->slot_arg(s);
                try {
                    units::convert(1.0, word, units::UnitSpec().unit_text(arg.quantity));
                } catch (const Error&) {
                    return usage(mode, "--column-unit " + name + "=" + unit + ": " + word + " is not a unit of " +
                                           std::string(units::quantity_name(arg.quantity)) + ", the quantity of " +
                                           arg.name + " in " + c.f->name + " (column " + c.name + ")");
                }
                c.prepared->set_slot_units(s, spec);
                used = true;
            }
        }
        if (!used) return usage(mode, "--column-unit " + name + ": no new column uses the column '" + name + "'");
    }
    for (std::size_t k = 0; k < r.header.size(); ++k) {
        bool need = false;
        for (const Column& c : r.columns) {
            for (const Source& s : c.slot_source) need = need || (!s.computed && s.index == k);
            for (const auto& as : c.arg_source) need = need || (!as.second.computed && as.second.index == k);
        }
        if (need) r.needed.push_back(k);
    }
    r.input_cells.resize(r.header.size());
    return -1;
}

// Reads the needed fields of one row.
void read_inputs(Run& r, const std::vector<Field>& fields) {
    const char dec = r.o.decimal;
    for (std::size_t k : r.needed) {
        Cell& c = r.input_cells[k];
        if (k >= fields.size()) {
            c.kind = Cell::Kind::Empty;
            continue;
        }
        const Field& f = fields[k];
        const std::string_view t(f.b, static_cast<std::size_t>(f.e - f.b));
        if (parse_number(t, dec, c.number)) {
            c.kind = Cell::Kind::Number;
            continue;
        }
        bool blank = true;
        for (char ch : t)
            if (ch != ' ' && ch != '\t') {
                blank = false;
                break;
            }
        if (blank) {
            c.kind = Cell::Kind::Empty;
        } else if (f.quoted) {
            // A quoted number ("12.5") is still a number.
            const std::string u = field_text(f);
            c.kind = parse_number(u, dec, c.number) ? Cell::Kind::Number : Cell::Kind::Text;
            c.field = &f;
        } else {
            c.kind = Cell::Kind::Text;
            c.field = &f;
        }
    }
}

const Cell& source_cell(const Run& r, const Source& s) {
    return s.computed ? r.columns[s.index].cells[s.element] : r.input_cells[s.index];
}

// Computes column c for the current row. Returns true if it has an error.
bool compute(Run& r, Column& c) {
    if (c.prepared) {
        const std::size_t n = c.slot_source.size();
        double in[16];
        bool numbers = true;
        for (std::size_t k = 0; k < n; ++k) {
            const Cell& s = source_cell(r, c.slot_source[k]);
            if (s.kind != Cell::Kind::Number) {
                numbers = false;
                break;
            }
            in[k] = s.number;
        }
        double out[32];
        if (numbers && c.prepared->eval(in, out)) {
            for (std::size_t e = 0; e < c.width; ++e) {
                c.cells[e].kind = Cell::Kind::Number;
                c.cells[e].number = out[e];
            }
            return false;
        }
        // The full answer with its sentences (faulty readings are rare).
        Value vin[16];
        for (std::size_t k = 0; k < n; ++k) vin[k] = source_cell(r, c.slot_source[k]).value();
        c.prepared->eval(vin, c.values.data());
    } else {
        std::vector<Table> args = c.args;
        for (const auto& [i, src] : c.arg_source) args[i] = Table::scalar(source_cell(r, src).value());
        const Table t = call(*c.f, args);
        for (std::size_t e = 0; e < c.width; ++e) c.values[e] = e < t.cells.size() ? t.cells[e] : Value{};
    }
    bool error = false;
    for (std::size_t e = 0; e < c.width; ++e) {
        Cell& cell = c.cells[e];
        const Value& v = c.values[e];
        if (v.kind == Value::Kind::Number) {
            cell.kind = Cell::Kind::Number;
            cell.number = v.number;
        } else if (v.kind == Value::Kind::Error) {
            cell.kind = Cell::Kind::Error;
            cell.error = &v;
            error = true;
        } else if (v.kind == Value::Kind::Text) {
            cell.kind = Cell::Kind::Error;  // as an argument of a later column: not a number
            cell.error = &v;
        } else {
            cell.kind = Cell::Kind::Empty;
        }
    }
    return error;
}

void put_results(Run& r, Writer& w, Column& c, bool error) {
    const char d = r.o.delimiter;
    char buf[40];
    for (std::size_t e = 0; e < c.width; ++e) {
        w.put(d);
        const Cell& cell = c.cells[e];
        if (cell.kind == Cell::Kind::Number) {
            w.put(std::string_view(buf, static_cast<std::size_t>(format_shortest(cell.number, r.o.decimal, buf) - buf)));
        } else if (cell.kind == Cell::Kind::Error && c.values[e].kind == Value::Kind::Text) {
            put_field(w, c.values[e].text, d);
        }
    }
    if (r.o.errors) {
        w.put(d);
        if (error)
            for (std::size_t e = 0; e < c.width; ++e)
                if (c.values[e].kind == Value::Kind::Error) {
                    put_field(w, c.values[e].text, d);
                    break;
                }
    }
}

std::string with_thousands(unsigned long long n) {
    std::string s = std::to_string(n);
    for (int k = static_cast<int>(s.size()) - 3; k > 0; k -= 3) s.insert(static_cast<std::size_t>(k), ",");
    return s;
}

void before_wait(void* w) { static_cast<Writer*>(w)->flush(); }

}  // namespace

int run_csv(const std::vector<std::string>& args) {
    for (const std::string& a : args)
        if (a == "--help" || a == "-h") {
            std::fputs(csv_help().c_str(), stdout);
            return exit_ok;
        }
    Run r;
    if (const int rc = parse_options(args, r.o); rc >= 0) return rc;
    const Options& o = r.o;

    // Input.
    int in_fd = 0;
    if (o.input != "-") {
        in_fd = ::open(o.input.c_str(), O_RDONLY | O_CLOEXEC);
        if (in_fd < 0) {
            std::fprintf(stderr, "isentra csv: cannot read the input file %s: %s\n", o.input.c_str(), std::strerror(errno));
            return exit_failure;
        }
    }
    struct stat st {};
    const bool sized = ::fstat(in_fd, &st) == 0 && S_ISREG(st.st_mode) && st.st_size > 0;
    Reader in(in_fd);

    // Header.
    std::vector<Field> fields;
    const char* content_end = nullptr;
    const char* next = nullptr;
    while (!(next = parse_record(in.begin(), in.end(), in.eof(), o.delimiter, fields, content_end))) in.fill();
    if (in.error()) {
        std::fprintf(stderr, "isentra csv: cannot read %s: %s\n", o.input == "-" ? "standard input" : o.input.c_str(),
                     std::strerror(in.error()));
        return exit_failure;
    }
    if (in.begin() == in.end()) return usage(mode, "the input is empty: it needs a header row with the column names");
    const std::string header_raw(in.begin(), content_end);
    const std::string eol(content_end, next > content_end && next[-1] == '\n' ? next : content_end);
    for (std::size_t k = 0; k < fields.size(); ++k) {
        std::string n = trim(field_text(fields[k]));
        if (k == 0 && n.compare(0, 3, "\xEF\xBB\xBF") == 0) n = trim(n.substr(3));  // UTF-8 byte-order mark
        r.header.push_back(n);
    }
    in.consume_to(next);
    if (const int rc = plan(r); rc >= 0) return rc;

    // Output (only now: nothing is created for a wrong command line).
    int out_fd = 1;
    if (!o.output.empty() && o.output != "-") {
        out_fd = create_new_file(o.output);
        if (out_fd < 0) {
            if (errno == EEXIST)
                std::fprintf(stderr,
                             "isentra csv: the output file %s exists; it is never written over: choose a new name\n",
                             o.output.c_str());
            else
                std::fprintf(stderr, "isentra csv: cannot create the output file %s: %s\n", o.output.c_str(),
                             std::strerror(errno));
            return exit_failure;
        }
    }
    Writer w(out_fd);
    const std::string line_end = eol.empty() ? "\n" : eol;
    w.put(header_raw);
    for (const Column& c : r.columns) {
        for (const std::string& n : c.out_names) {
            w.put(o.delimiter);
            put_field(w, n, o.delimiter);
        }
        if (o.errors) {
            w.put(o.delimiter);
            put_field(w, c.name + "_error", o.delimiter);
        }
    }
    w.put(line_end);
    if (o.input == "-") {  // a co-process sees its answers before we wait for more input
        in.before_wait = before_wait;
        in.before_wait_arg = &w;
    }

    const bool progress = o.progress && !o.quiet && stderr_is_terminal();
    const double t0 = now_seconds();
    double last_progress = t0;
    bool progress_shown = false;
    unsigned long long rows = 0;
    unsigned long long long_rows = 0, first_long_row = 0;  // rows with more fields than the header
    for (;;) {
        const char* p = in.begin();
        const char* end = in.end();
        while (p < end) {
            next = parse_record(p, end, in.eof(), o.delimiter, fields, content_end);
            if (!next) break;
            // The record's own line break, or the header's when the input
            // ends without one.
            const std::string_view terminator =
                next > content_end && next[-1] == '\n'
                    ? std::string_view(content_end, static_cast<std::size_t>(next - content_end))
                    : std::string_view(line_end);
            if (content_end == p) {  // a blank line: passed through
                w.put(terminator);
                p = next;
                continue;
            }
            read_inputs(r, fields);
            w.put(std::string_view(p, static_cast<std::size_t>(content_end - p)));
            // A short row gets empty fields up to the header's width, so the
            // new columns stay under their names; a long one keeps its extra
            // fields (its new columns then stand to the right of the header's)
            // and is counted in the summary.
            for (std::size_t k = fields.size(); k < r.header.size(); ++k) w.put(o.delimiter);
            if (fields.size() > r.header.size()) {
                if (long_rows == 0) first_long_row = rows + 1;
                ++long_rows;
            }
            for (Column& c : r.columns) {
                const bool error = compute(r, c);
                if (error) ++c.error_rows;
                put_results(r, w, c, error);
            }
            w.put(terminator);
            ++rows;
            p = next;
            if ((rows & 0xFFFF) == 0 && progress) {
                const double t = now_seconds();
                if (t - last_progress >= 0.5) {
                    last_progress = t;
                    progress_shown = true;
                    if (sized)
                        std::fprintf(stderr, "\risentra csv: %s rows (%.0f %%)", with_thousands(rows).c_str(),
                                     100.0 * static_cast<double>(in.bytes_read()) / static_cast<double>(st.st_size));
                    else
                        std::fprintf(stderr, "\risentra csv: %s rows", with_thousands(rows).c_str());
                    std::fflush(stderr);
                }
            }
        }
        in.consume_to(p);
        if (in.eof()) break;
        in.fill();
    }
    w.flush();
    if (progress_shown) std::fputs("\r\033[K", stderr);
    const double elapsed = now_seconds() - t0;
    int rc = exit_ok;
    if (in.error()) {
        std::fprintf(stderr, "isentra csv: reading %s failed after %s rows: %s\n",
                     o.input == "-" ? "standard input" : o.input.c_str(), with_thousands(rows).c_str(),
                     std::strerror(in.error()));
        rc = exit_failure;
    }
    if (w.error()) {
        std::fprintf(stderr, "isentra csv: writing %s failed: %s\n",
                     out_fd == 1 ? "standard output" : o.output.c_str(), std::strerror(w.error()));
        rc = exit_failure;
    }
    if (out_fd != 1 && ::close(out_fd) != 0 && rc == exit_ok) {
        std::fprintf(stderr, "isentra csv: writing %s failed: %s\n", o.output.c_str(), std::strerror(errno));
        rc = exit_failure;
    }
    if (!o.quiet) {
        std::fprintf(stderr, "isentra csv: %s rows in %.3f s", with_thousands(rows).c_str(), elapsed);
        if (elapsed >= 0.05 && rows > 0) std::fprintf(stderr, " (%s rows/s)", with_thousands(static_cast<unsigned long long>(static_cast<double>(rows) / elapsed)).c_str());
        std::fputc('\n', stderr);
        if (long_rows > 0)
            std::fprintf(stderr,
                         "isentra csv: %s rows have more fields than the header (the first: data row %s); "
                         "their new columns stand to the right of the extra fields\n",
                         with_thousands(long_rows).c_str(), with_thousands(first_long_row).c_str());
        for (const Column& c : r.columns) {
            if (c.error_rows == 0) std::fprintf(stderr, "isentra csv: %s: no errors\n", c.name.c_str());
            else
                std::fprintf(stderr, "isentra csv: %s: %s rows with errors, %s\n", c.name.c_str(),
                             with_thousands(c.error_rows).c_str(),
                             o.errors ? ("the reasons are in the column " + c.name + "_error").c_str()
                                      : "left empty (--errors writes the reasons into a column)");
        }
    }
    if (in_fd != 0) ::close(in_fd);
    return rc;
}

}  // namespace isentra::cli
