// SPDX-License-Identifier: MPL-2.0
// `isentra table`: property tables over a grid of pressures and
// temperatures, or along the saturation line, in any unit system, as CSV or
// as aligned text. Every value comes from the catalogue function of the same
// name through an isentra::PreparedCall, so it is bit-identical to the cell
// function with the same inputs and units.
#include <cerrno>
#include <cmath>
#include <cstdio>
#include <cstring>
#include <optional>
#include <string>
#include <vector>

#include <unistd.h>

#include "io.hpp"
#include "isentra/surface/call.hpp"
#include "isentra/surface/catalogue.hpp"
#include "isentra/units/units.hpp"
#include "modes.hpp"

namespace isentra::cli {

namespace {

namespace cat = isentra::catalogue;

const char* const mode = "table";

enum class Kind { PT, SatT, SatP };

struct Options {
    Kind kind = Kind::PT;
    std::string p_text, T_text;
    std::vector<std::string> props;
    std::string units;
    bool text = false;
    char delimiter = 0;
    char decimal = '.';
    int digits = 6;  // text: significant digits
    bool digits_given = false;
    std::string output;
};

// A list of values: START:STOP:STEP or v1,v2,... (decimal point). Grid
// values are computed in decimal, (start + k step) with the digits of start
// and step, so 0.1:0.3:0.1 gives 0.1, 0.2, 0.3 and not 0.30000000000000004.
bool parse_grid(const std::string& what, const std::string& text, std::vector<double>& out, std::string& err) {
    out.clear();
    auto number = [&](const std::string& t, double& v, int& decimals) {
        decimals = 0;
        const std::size_t dot = t.find('.');
        if (dot != std::string::npos) {
            std::size_t k = dot + 1;
            while (k < t.size() && t[k] >= '0' && t[k] <= '9') ++k;
            decimals = static_cast<int>(k - dot - 1);
        }
        if (t.find_first_of("eE") != std::string::npos) decimals = -1;  // no decimal stepping
        return parse_number(t, '.', v) && std::isfinite(v);  // nan, inf: not a grid value
    };
    const std::size_t c1 = text.find(':');
    if (c1 == std::string::npos) {
        std::size_t a = 0;
        for (;;) {
            const std::size_t b = text.find(',', a);
            const std::string t = text.substr(a, b == std::string::npos ? std::string::npos : b - a);
            double v;
            int d;
            if (!number(t, v, d)) {
                err = what + ": '" + t + "' is not a finite number (a list is v1,v2,... and a range START:STOP:STEP)";
                return false;
            }
            out.push_back(v);
            if (b == std::string::npos) break;
            a = b + 1;
        }
        return true;
    }
    const std::size_t c2 = text.find(':', c1 + 1);
    if (c2 == std::string::npos || text.find(':', c2 + 1) != std::string::npos) {
        err = what + ": a range is START:STOP:STEP, e.g. 1:10:0.5, not '" + text + "'";
        return false;
    }
    double start, stop, step;
    int d1, d2, d3;
    if (!number(text.substr(0, c1), start, d1) || !number(text.substr(c1 + 1, c2 - c1 - 1), stop, d2) ||
        !number(text.substr(c2 + 1), step, d3)) {
        err = what + ": START, STOP and STEP must be finite numbers, e.g. 1:10:0.5, not '" + text + "'";
        return false;
    }
    if (!(step > 0)) {
        err = what + ": the step must be positive";
        return false;
    }
    if (stop < start) {
        err = what + ": STOP must not be below START";
        return false;
    }
    const double count = std::floor((stop - start) / step * (1 + 1e-12) + 1e-9) + 1;
    if (count > 1e6) {
        err = what + ": more than 1,000,000 values; take a larger step";
        return false;
    }
    const int decimals = (d1 < 0 || d3 < 0) ? -1 : std::max(d1, d3);
    const double scale = decimals >= 0 && decimals <= 15 ? std::pow(10.0, decimals) : 0;
    const double s0 = scale ? std::round(start * scale) : 0, ds = scale ? std::round(step * scale) : 0;
    for (long k = 0; k < static_cast<long>(count); ++k) {
        // An integer over a power of ten: the double nearest the decimal value.
        const double v = scale ? (s0 + static_cast<double>(k) * ds) / scale : start + static_cast<double>(k) * step;
        out.push_back(v);
    }
    return true;
}

std::string upper(std::string s) {
    for (char& c : s)
        if (c >= 'a' && c <= 'z') c = static_cast<char>(c - 'a' + 'A');
    return s;
}

std::string lower(std::string s) {
    for (char& c : s)
        if (c >= 'A' && c <= 'Z') c = static_cast<char>(c - 'A' + 'a');
    return s;
}

// Display width of a UTF-8 text (code points).
std::size_t width_of(const std::string& s) {
    std::size_t n = 0;
    for (unsigned char c : s)
        if ((c & 0xC0) != 0x80) ++n;
    return n;
}

struct Column {
    std::string name;
    std::string unit;
    std::optional<PreparedCall> call;  // null: an input column
    std::size_t input = 0;             // input column: 0 (first input) or 1
};

int parse_options(const std::vector<std::string>& args, Options& o) {
    if (args.empty())
        return usage(mode, "say which table: pT (a grid of pressures and temperatures), sat-T or sat-p");
    const std::string k = lower(args[0]);
    if (k == "pt") o.kind = Kind::PT;
    else if (k == "sat-t" || k == "satt") o.kind = Kind::SatT;
    else if (k == "sat-p" || k == "satp") o.kind = Kind::SatP;
    else return usage(mode, "unknown table '" + args[0] + "': pT, sat-T or sat-p");
    for (std::size_t i = 1; i < args.size(); ++i) {
        std::string a = args[i], value;
        bool has_value = false;
        if (a.size() > 2 && a.compare(0, 2, "--") == 0 && a.find('=') != std::string::npos) {
            value = a.substr(a.find('=') + 1);
            a = a.substr(0, a.find('='));
            has_value = true;
        }
        auto need = [&](std::string& out) {
            if (has_value) {
                out = value;
                return true;
            }
            if (i + 1 >= args.size()) return false;
            out = args[++i];
            return true;
        };
        std::string v;
        if (a == "--p" || a == "-p") {
            if (!need(o.p_text)) return usage(mode, "--p needs START:STOP:STEP or a list v1,v2,...");
        } else if (a == "--T" || a == "-T") {
            if (!need(o.T_text)) return usage(mode, "--T needs START:STOP:STEP or a list v1,v2,...");
        } else if (a == "--props") {
            if (!need(v) || v.empty()) return usage(mode, "--props needs a list such as h,s,v");
            o.props.clear();
            std::size_t s = 0;
            for (;;) {
                const std::size_t e = v.find(',', s);
                const std::string t = v.substr(s, e == std::string::npos ? std::string::npos : e - s);
                if (t.empty()) return usage(mode, "--props: an empty name in '" + v + "'");
                o.props.push_back(t);
                if (e == std::string::npos) break;
                s = e + 1;
            }
        } else if (a == "--units") {
            if (!need(o.units)) return usage(mode, "--units needs a unit text, e.g. --units US");
        } else if (a == "--text") {
            o.text = true;
        } else if (a == "--csv") {
            o.text = false;
        } else if (a == "--digits") {
            if (!need(v)) return usage(mode, "--digits needs a number of significant digits (1 to 17)");
            double d;
            if (!parse_number(v, '.', d) || d != std::floor(d) || d < 1 || d > 17)
                return usage(mode, "--digits must be a whole number from 1 to 17, not '" + v + "'");
            o.digits = static_cast<int>(d);
            o.digits_given = true;
        } else if (a == "--delimiter" || a == "-d") {
            if (!need(v)) return usage(mode, "--delimiter needs a character");
            if (v == "tab" || v == "\\t") o.delimiter = '\t';
            else if (v.size() == 1 && v[0] != '"' && v[0] != '\n') o.delimiter = v[0];
            else return usage(mode, "the delimiter must be one character (or tab), not '" + v + "'");
        } else if (a == "--decimal") {
            if (!need(v) || (v != "." && v != ",")) return usage(mode, "the decimal mark must be '.' or ','");
            o.decimal = v[0];
        } else if (a == "-o" || a == "--output") {
            if (!need(o.output) || o.output.empty()) return usage(mode, "--output needs a file name");
        } else {
            return usage(mode, "unknown option '" + args[i] + "'");
        }
    }
    if (o.delimiter == 0) o.delimiter = o.decimal == ',' ? ';' : ',';
    if (o.delimiter == o.decimal) return usage(mode, "the delimiter and the decimal mark must differ");
    if (o.kind == Kind::PT && (o.p_text.empty() || o.T_text.empty()))
        return usage(mode, "a pT table needs --p and --T, e.g. --p 1:10:1 --T 200:600:50");
    if (o.kind == Kind::SatT && o.T_text.empty()) return usage(mode, "a sat-T table needs --T, e.g. --T 20:370:10");
    if (o.kind == Kind::SatP && o.p_text.empty()) return usage(mode, "a sat-p table needs --p, e.g. --p 0.01:22:0.5");
    if (o.kind == Kind::SatT && !o.p_text.empty()) return usage(mode, "a sat-T table takes --T only");
    if (o.kind == Kind::SatP && !o.T_text.empty()) return usage(mode, "a sat-p table takes --p only");
    if (o.props.empty()) {
        if (o.kind == Kind::PT) o.props = {"v", "u", "h", "s"};
        else o.props = {"vf", "vg", "hf", "hfg", "hg", "sf", "sg"};
    }
    return -1;
}

}  // namespace

int run_table(const std::vector<std::string>& args) {
    for (const std::string& a : args)
        if (a == "--help" || a == "-h") {
            std::fputs(table_help().c_str(), stdout);
            return exit_ok;
        }
    Options o;
    if (const int rc = parse_options(args, o); rc >= 0) return rc;
    units::UnitSpec spec;
    try {
        spec = units::UnitSpec::parse(o.units);
    } catch (const Error& e) {
        return usage(mode, std::string("--units: ") + e.what());
    }
    std::vector<double> first, second;  // the grid: first input (outer), second (inner)
    std::string err;
    if (o.kind == Kind::PT) {
        if (!parse_grid("--p", o.p_text, first, err) || !parse_grid("--T", o.T_text, second, err)) return usage(mode, err);
        if (first.size() * second.size() > 1000000) return usage(mode, "more than 1,000,000 rows; take larger steps");
    } else if (!parse_grid(o.kind == Kind::SatT ? "--T" : "--p", o.kind == Kind::SatT ? o.T_text : o.p_text, first,
                           err)) {
        return usage(mode, err);
    }

    // Columns: the inputs, then one per property.
    const std::vector<Table> args_template = {Table::scalar(Value{}), Table::scalar(Value{}),
                                              Table::scalar(Value::of_text(o.units))};
    std::vector<Column> cols;
    const std::string suffix = o.kind == Kind::PT ? ".PT" : o.kind == Kind::SatT ? ".T" : ".P";
    auto add_input = [&](const std::string& name, Quantity q, std::size_t input) {
        Column c;
        c.name = name;
        c.unit = spec.symbol(q);
        c.input = input;
        cols.push_back(std::move(c));
    };
    auto add_function = [&](const std::string& display, const std::string& fname) -> bool {
        const cat::Function* f = cat::find(fname);
        if (!f) return false;
        if (f->kind != cat::ResultKind::Number) {
            err = fname + " gives a row of values, not one per state; name its elements instead";
            return false;
        }
        Column c;
        c.name = display;
        c.unit = spec.symbol(f->result);
        const std::size_t n = o.kind == Kind::PT ? 2 : 1;
        std::vector<Table> a(args_template.begin(), args_template.begin() + static_cast<long>(n));
        a.push_back(args_template[2]);
        std::vector<std::size_t> slots = {0};
        if (n == 2) slots.push_back(1);
        try {
            c.call.emplace(*f, a, slots);
        } catch (const Error& e) {
            err = e.what();
            return false;
        }
        cols.push_back(std::move(c));
        return true;
    };
    if (o.kind == Kind::PT) {
        add_input("p", Quantity::Pressure, 0);
        add_input("T", Quantity::Temperature, 1);
    } else if (o.kind == Kind::SatT) {
        add_input("T", Quantity::Temperature, 0);
        add_function("p", "STEAM.PSAT");
    } else {
        add_input("p", Quantity::Pressure, 0);
        add_function("T", "STEAM.TSAT");
    }
    for (const std::string& p : o.props) {
        err.clear();
        if (!add_function(p, "STEAM." + upper(p) + suffix)) {
            return usage(mode, "--props: " +
                                   (err.empty() ? "there is no function STEAM." + upper(p) + suffix : err) +
                                   (o.kind == Kind::PT ? "; properties are e.g. h, s, v, u, rho, cp, cv, w, mu, lambda"
                                                       : "; saturation properties are e.g. hf, hg, hfg, sf, sg, vf, vg"));
        }
    }

    // Values.
    const std::size_t nrows = o.kind == Kind::PT ? first.size() * second.size() : first.size();
    std::vector<std::string> cells(nrows * cols.size());
    unsigned long long errors = 0;
    std::string first_error;
    std::vector<Value> vout(1);
    char buf[64];
    for (std::size_t r = 0; r < nrows; ++r) {
        const double in[2] = {o.kind == Kind::PT ? first[r / second.size()] : first[r],
                              o.kind == Kind::PT ? second[r % second.size()] : 0.0};
        for (std::size_t c = 0; c < cols.size(); ++c) {
            std::string& cell = cells[r * cols.size() + c];
            double v;
            if (!cols[c].call) {
                v = in[cols[c].input];
            } else if (!cols[c].call->eval(in, &v)) {
                const Value vin[2] = {Value::of(in[0]), Value::of(in[1])};
                cols[c].call->eval(vin, vout.data());
                if (vout[0].kind != Value::Kind::Number) {
                    ++errors;
                    if (first_error.empty())
                        first_error = cols[c].name + " at " + cols[0].name + " = " + std::string(buf, format_shortest(in[0], '.', buf)) +
                                      (o.kind == Kind::PT ? ", T = " + std::string(buf, format_shortest(in[1], '.', buf)) : "") +
                                      ": " + vout[0].text;
                    cell = o.text ? "-" : "";
                    continue;
                }
                v = vout[0].number;
            }
            char* end;
            if (o.text && o.digits_given) end = std::to_chars(buf, buf + sizeof buf, v, std::chars_format::general, o.digits).ptr;
            else if (o.text && cols[c].call) end = std::to_chars(buf, buf + sizeof buf, v, std::chars_format::general, o.digits).ptr;
            else end = format_shortest(v, '.', buf);
            if (o.decimal != '.')
                for (char* q = buf; q < end; ++q)
                    if (*q == '.') *q = o.decimal;
            cell.assign(buf, end);
        }
    }

    // Output.
    int fd = 1;
    if (!o.output.empty() && o.output != "-") {
        fd = create_new_file(o.output);
        if (fd < 0) {
            if (errno == EEXIST)
                std::fprintf(stderr, "isentra table: the output file %s exists; it is never written over: choose a new name\n",
                             o.output.c_str());
            else
                std::fprintf(stderr, "isentra table: cannot create the output file %s: %s\n", o.output.c_str(),
                             std::strerror(errno));
            return exit_failure;
        }
    }
    {
        Writer w(fd);
        if (o.text) {
            std::vector<std::size_t> widths(cols.size());
            for (std::size_t c = 0; c < cols.size(); ++c) {
                widths[c] = std::max(width_of(cols[c].name), width_of(cols[c].unit));
                for (std::size_t r = 0; r < nrows; ++r) widths[c] = std::max(widths[c], cells[r * cols.size() + c].size());
            }
            auto line = [&](auto text_of) {
                std::string l;
                for (std::size_t c = 0; c < cols.size(); ++c) {
                    const std::string t = text_of(c);
                    if (c) l += "  ";
                    l.append(widths[c] - width_of(t), ' ');
                    l += t;
                }
                w.put(l);
                w.put('\n');
            };
            line([&](std::size_t c) { return cols[c].name; });
            line([&](std::size_t c) { return cols[c].unit; });
            line([&](std::size_t c) { return std::string(widths[c], '-'); });
            for (std::size_t r = 0; r < nrows; ++r) line([&](std::size_t c) { return cells[r * cols.size() + c]; });
        } else {
            auto put = [&](const std::string& t, std::size_t c) {
                if (c) w.put(o.delimiter);
                if (t.find(o.delimiter) != std::string::npos || t.find('"') != std::string::npos) {
                    w.put('"');
                    for (char ch : t) {
                        if (ch == '"') w.put('"');
                        w.put(ch);
                    }
                    w.put('"');
                } else {
                    w.put(t);
                }
            };
            for (std::size_t c = 0; c < cols.size(); ++c) put(cols[c].name, c);
            w.put('\n');
            for (std::size_t c = 0; c < cols.size(); ++c) put(cols[c].unit, c);
            w.put('\n');
            for (std::size_t r = 0; r < nrows; ++r) {
                for (std::size_t c = 0; c < cols.size(); ++c) put(cells[r * cols.size() + c], c);
                w.put('\n');
            }
        }
        w.flush();
        if (w.error()) {
            std::fprintf(stderr, "isentra table: writing failed: %s\n", std::strerror(w.error()));
            return exit_failure;
        }
    }
    if (fd != 1 && ::close(fd) != 0) {
        std::fprintf(stderr, "isentra table: writing %s failed: %s\n", o.output.c_str(), std::strerror(errno));
        return exit_failure;
    }
    if (errors)
        std::fprintf(stderr, "isentra table: %llu values have no result (left %s); the first: %s\n", errors,
                     o.text ? "as '-'" : "empty", first_error.c_str());
    return exit_ok;
}

}  // namespace isentra::cli
