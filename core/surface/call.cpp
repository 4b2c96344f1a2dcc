// SPDX-License-Identifier: MPL-2.0
// Evaluating catalogue functions on spreadsheet values: units, broadcasting
// over ranges, and error sentences in the user's own units.
#include "isentra/surface/call.hpp"

#include <algorithm>
#include <cctype>
#include <cmath>
#include <cstdint>
#include <cstdio>
#include <exception>
#include <utility>

#include "isentra/units/units.hpp"

namespace isentra {

namespace {

using catalogue::Function;
using catalogue::ResultKind;

std::string fmt(double v) {
    char buf[40];
    std::snprintf(buf, sizeof buf, "%.6g", v);
    return buf;
}

// Re-words a core error in the user's units.
std::string explain(const Error& e, const units::UnitSpec& spec) {
    const auto* re = dynamic_cast<const RangeError*>(&e);
    return re ? units::range_sentence(*re, spec) : e.what();
}

Value error_value(const Error& e, const units::UnitSpec& spec) { return Value::of_error(e.code(), explain(e, spec)); }

bool is_scalar(const Table& t) { return t.rows == 1 && t.cols == 1; }

// What a text argument holds, for its sentences.
std::string text_kind(const std::string& argname) {
    if (argname == "units") return "a unit system such as \"SI\" or \"US\"";
    if (argname == "from" || argname == "to") return "a unit such as \"psig\" or \"kJ/kg\"";
    if (argname == "function") return "a function name such as \"H.PT\"";
    return "a text";
}

// Text of a 1x1 text argument ("" when empty or absent).
bool text_arg(const Table& t, const std::string& argname, std::string& out, Value& err) {
    if (!is_scalar(t)) {
        err = Value::of_error(ErrorCode::InvalidArgument,
                              "the argument " + argname + " must be a single text (" + text_kind(argname) +
                                  "), not a range");
        return false;
    }
    const Value& v = t.cells[0];
    if (v.kind == Value::Kind::Text) out = v.text;
    else if (v.kind == Value::Kind::Empty) out.clear();
    else if (v.kind == Value::Kind::Number && v.number == 0.0) out.clear();  // Calc passes a blank cell as 0
    else if (v.kind == Value::Kind::Error) { err = v; return false; }
    else {
        err = Value::of_error(ErrorCode::InvalidArgument,
                              "the argument " + argname + " must be " + text_kind(argname) + ", not the number " +
                                  fmt(v.number));
        return false;
    }
    return true;
}

Table error_table(Value v) { return Table::scalar(std::move(v)); }

// The header flag of Row functions: TRUE or FALSE (Calc passes them as 1 and
// 0), 1 or 0, or blank (false). Anything else is refused with a sentence.
bool header_flag(const Table& t, bool& header, Value& err) {
    const std::string rule = "header must be TRUE or FALSE (or 1 or 0, or left blank)";
    if (!is_scalar(t)) {
        err = Value::of_error(ErrorCode::InvalidArgument, rule + ", a single value, not a range");
        return false;
    }
    const Value& v = t.cells[0];
    switch (v.kind) {
    case Value::Kind::Empty: header = false; return true;
    case Value::Kind::Error: err = v; return false;
    case Value::Kind::Text:
        err = Value::of_error(ErrorCode::InvalidArgument, rule + ", not the text \"" + v.text + "\"");
        return false;
    case Value::Kind::Number:
        if (v.number == 0.0 || v.number == 1.0) {
            header = v.number == 1.0;
            return true;
        }
        err = Value::of_error(ErrorCode::InvalidArgument, rule + ", not the number " + fmt(v.number));
        return false;
    }
    return false;
}

// "(... reason)" + "a blank cell counts as 0" -> "(... reason; a blank cell counts as 0)".
std::string with_blank_hint(std::string m) {
    if (!m.empty() && m.back() == ')') {
        m.pop_back();
        return m + "; a blank cell counts as 0)";
    }
    return m + " (a blank cell counts as 0)";
}

Table call_convert(const Function&, const std::vector<Table>& args) {
    std::string from, to;
    Value err;
    if (!text_arg(args[1], "from", from, err) || !text_arg(args[2], "to", to, err)) return error_table(err);
    // A gauge unit may carry the local barometric pressure, as in a unit
    // text: "psig patm=14.2psia". Default: the standard atmosphere.
    double patm = units::standard_atmosphere_MPa;
    for (std::string* t : {&from, &to}) {
        const std::size_t k = t->find("patm=");
        if (k == std::string::npos) continue;
        try {
            patm = units::UnitSpec::parse("SI " + t->substr(k)).patm_MPa();
        } catch (const Error& e) {
            return error_table(Value::of_error(e.code(), e.what()));
        }
        t->erase(k);
        while (!t->empty() && (t->back() == ' ' || t->back() == ',' || t->back() == ';')) t->pop_back();
    }
    const Table& val = args[0];
    Table out;
    out.rows = val.rows;
    out.cols = val.cols;
    out.cells.assign(val.cells.size(), Value{});
    for (std::size_t i = 0; i < val.cells.size(); ++i) {
        const Value& v = val.cells[i];
        if (v.kind == Value::Kind::Empty) {
            if (is_scalar(val)) out.cells[i] = Value::of_error(ErrorCode::InvalidArgument, "the argument value is empty");
            continue;
        }
        if (v.kind == Value::Kind::Error) { out.cells[i] = v; continue; }
        if (v.kind != Value::Kind::Number) {
            out.cells[i] = Value::of_error(ErrorCode::InvalidArgument,
                                           "the argument value is the text \"" + v.text + "\" where a number is expected");
            continue;
        }
        if (!std::isfinite(v.number)) {
            out.cells[i] = Value::of_error(ErrorCode::InvalidArgument, "the argument value is not a finite number");
            continue;
        }
        try {
            const double r = units::convert(v.number, from, to, patm);
            out.cells[i] = std::isfinite(r) ? Value::of(r)
                                            : Value::of_error(ErrorCode::OutOfRange,
                                                              "the converted value is too large to represent");
        } catch (const Error& e) {
            out.cells[i] = Value::of_error(e.code(), e.what());
        }
    }
    return out;
}

// STEAM.UNITS.SPELL: what a units text means, quantity by quantity.
Table call_units_spell(const std::vector<Table>& args) {
    std::string text;
    Value err;
    if (!args.empty() && !text_arg(args[0], "units", text, err)) return error_table(err);
    units::UnitSpec spec;
    try {
        spec = units::UnitSpec::parse(text);
    } catch (const Error& e) {
        return error_table(Value::of_error(e.code(), e.what()));
    }
    std::string out = (text.empty() ? std::string("An empty units text") : "\"" + text + "\"") + " means " +
                      spec.name() + ":";
    bool first = true;
    for (int qi = static_cast<int>(Quantity::Pressure); qi < static_cast<int>(Quantity::Text); ++qi) {
        const Quantity q = static_cast<Quantity>(qi);
        if (q == Quantity::Percent) continue;  // always %
        out += first ? " " : "; ";
        first = false;
        out += std::string(units::quantity_name(q)) + " " + spec.symbol(q);
        if (q == Quantity::Pressure && spec.is_gauge(q)) {
            // The gauge unit's absolute counterpart: psig -> psi, barg -> bar, kPag -> kPa, MPag -> MPa.
            std::string abs = spec.symbol(q);
            if (!abs.empty() && abs.back() == 'g') abs.pop_back();
            if (abs == "psi") abs = "psia";
            out += " (gauge: absolute = reading + barometric pressure " +
                   fmt(spec.from_core(q, spec.patm_MPa()) - spec.from_core(q, 0.0)) + " " + abs + " = " +
                   fmt(spec.patm_MPa()) + " MPa)";
        }
    }
    out += ". Inputs are read and results given in these units.";
    return Table::scalar(Value::of_text(out));
}

// Edit distance (Levenshtein) between two upper-case names, for suggestions.
std::size_t edit_distance(const std::string& a, const std::string& b) {
    std::vector<std::size_t> row(b.size() + 1);
    for (std::size_t j = 0; j <= b.size(); ++j) row[j] = j;
    for (std::size_t i = 1; i <= a.size(); ++i) {
        std::size_t diag = row[0];
        row[0] = i;
        for (std::size_t j = 1; j <= b.size(); ++j) {
            const std::size_t up = row[j];
            row[j] = std::min({row[j] + 1, row[j - 1] + 1, diag + (a[i - 1] == b[j - 1] ? 0 : 1)});
            diag = up;
        }
    }
    return row[b.size()];
}

std::string upper_short(std::string n) {
    for (auto& c : n) c = static_cast<char>(std::toupper(static_cast<unsigned char>(c)));
    while (!n.empty() && n.front() == ' ') n.erase(n.begin());
    while (!n.empty() && n.back() == ' ') n.pop_back();
    if (n.rfind("STEAM.", 0) == 0) n.erase(0, 6);
    return n;
}

// The (up to) three catalogue names closest to `name`, as "STEAM.H.PT, STEAM.H.PH or STEAM.H.PS".
std::string closest_names(const std::string& name) {
    const std::string n = upper_short(name);
    std::vector<std::pair<std::size_t, const std::string*>> d;
    for (const Function& f : catalogue::functions()) {
        if (f.name == "STEAM.EXPLAIN") continue;
        d.emplace_back(edit_distance(n, upper_short(f.name)), &f.name);
    }
    std::stable_sort(d.begin(), d.end(), [](const auto& x, const auto& y) { return x.first < y.first; });
    std::string out;
    const std::size_t k = std::min<std::size_t>(3, d.size());
    for (std::size_t i = 0; i < k; ++i) {
        if (i > 0) out += i + 1 == k ? " or " : ", ";
        out += *d[i].second;
    }
    return out;
}

// STEAM.EXPLAIN answers with a sentence, also about its own arguments: its
// errors are texts too, never error values.
Table explain_text(std::string sentence) { return Table::scalar(Value::of_text(std::move(sentence))); }

Table call_explain(const std::vector<Table>& args) {
    std::string name;
    Value err;
    if (args.empty())
        return explain_text("name the function to explain as the first argument, e.g. STEAM.EXPLAIN(\"H.PT\"; A2; B2)");
    if (!text_arg(args[0], "function", name, err)) return explain_text(err.text);
    if (name.empty())
        return explain_text("the argument function is empty: name the function to explain, e.g. \"H.PT\" or "
                            "\"STEAM.H.PT\"");
    const Function* target = catalogue::find(name);
    if (target && target->name == "STEAM.EXPLAIN")
        return explain_text("STEAM.EXPLAIN explains a call of another function: name that one, e.g. \"H.PT\"");
    if (!target)
        return explain_text("there is no function \"" + name + "\"; the closest names are " + closest_names(name) +
                            " (write a name as in \"H.PT\" or \"STEAM.H.PT\")");
    std::vector<Table> rest(args.begin() + 1, args.end());
    Table r = call(*target, rest);
    for (Value& v : r.cells) {
        if (v.kind == Value::Kind::Error) v = Value::of_text(v.text);
        else if (v.kind == Value::Kind::Number) v = Value::of_text("OK: " + target->name + " = " + fmt(v.number));
        else if (v.kind == Value::Kind::Text) v = Value::of_text("OK: " + v.text);
    }
    return r;
}

// One numeric argument of one state (shared by call() and PreparedCall, so
// that both convert and explain in exactly the same way).
enum class ArgStatus { Ok, Skip, Failed };
// v: the argument's value for this state; scalar_arg: the argument is a
// single value (not a range); ranged: the call is broadcast over ranges.
// The argument's range (catalogue metadata) is checked here, in one place:
// a refused value gives the range sentence in the user's units, with "a
// blank cell counts as 0" where the cell held 0. zero: set when the cell held
// the number 0 (perhaps a blank cell), for evaluate_state's sentences.
ArgStatus state_arg(const catalogue::Arg& arg, const Value& v, bool scalar_arg, bool ranged,
                    const units::UnitSpec& spec, double& out, Value& err, bool& zero) {
    zero = false;
    if (v.kind == Value::Kind::Number) {
        if (!std::isfinite(v.number)) {
            err = Value::of_error(ErrorCode::InvalidArgument, arg.name + " is not a finite number");
            return ArgStatus::Failed;
        }
        out = spec.to_core(arg.quantity, v.number);
        zero = v.number == 0.0;
        if (!catalogue::arg_accepts(arg, out)) {
            const std::string m = units::range_sentence(catalogue::range_error(arg, out), spec);
            err = Value::of_error(ErrorCode::OutOfRange, zero ? with_blank_hint(m) : m);
            return ArgStatus::Failed;
        }
        return ArgStatus::Ok;
    }
    if (v.kind == Value::Kind::Empty) {
        if (scalar_arg && (arg.optional || !std::isnan(arg.default_value))) {
            // left out between other arguments (";;"): its default (NaN: the function decides)
            out = arg.default_value;
            return ArgStatus::Ok;
        }
        if (ranged && !scalar_arg) return ArgStatus::Skip;  // an empty cell in a range: an empty result
        err = Value::of_error(ErrorCode::InvalidArgument, "the argument " + arg.name + " is empty");
        return ArgStatus::Failed;
    }
    if (v.kind == Value::Kind::Error) {
        err = v;
        return ArgStatus::Failed;
    }
    err = Value::of_error(ErrorCode::InvalidArgument,
                          "the argument " + arg.name + " is the text \"" + v.text + "\" where a number is expected");
    return ArgStatus::Failed;
}

std::size_t result_width(const Function& f) { return f.kind == ResultKind::Row ? f.row_names.size() : 1; }

Quantity result_quantity_of(const Function& f, std::size_t c) {
    return f.kind == ResultKind::Row ? f.row_quantities[c] : f.result;
}

// Whether an argument is one of the state's numbers (a[] of Eval): not a
// text, not a whole range, not the header flag.
bool is_state_arg(const catalogue::Arg& arg) {
    return arg.quantity != Quantity::Text && !arg.whole_range && arg.name != "header";
}

// Evaluates f numerically: eval_extra, eval_units or eval, whichever it has.
void evaluate_raw(const Function& f, const units::UnitSpec& spec, const catalogue::Extra& extra, const double* a,
                  double* res) {
    if (f.eval_extra) f.eval_extra(a, res, spec, extra);
    else if (f.eval_units) f.eval_units(a, res, spec);
    else f.eval(a, res);
}

// Evaluates f on one state (a: numeric arguments in core units) and gives
// each result element to put(c, Value). Shared by call() and PreparedCall.
// zero_mask: bit j set when numeric argument j (the arguments other than
// texts, whole ranges and the header, in order) was given as 0: a range error on it then
// says that a blank cell counts as 0.
template <class Put>
void evaluate_state(const Function& f, const units::UnitSpec& spec, const catalogue::Extra& extra, const double* a,
                    Put&& put, std::uint32_t zero_mask) {
    double res[32];
    const std::size_t width = result_width(f);
    // An argument so close to 0 (1e-320, a denormal) that the calculation
    // overflows: the sentence names it instead of an overflowing intermediate.
    auto tiny_sentence = [&]() -> std::string {
        std::size_t j = 0;
        for (const catalogue::Arg& arg : f.args) {
            if (!is_state_arg(arg)) continue;
            const double v = a[j++];
            if (v != 0.0 && std::fabs(v) < 1e-100 && arg.quantity != Quantity::Temperature)
                return arg.name + " = " + fmt(spec.from_core(arg.quantity, v)) + " is so close to 0 that " + f.name +
                       " has no finite result";
        }
        return "";
    };
    try {
        evaluate_raw(f, spec, extra, a, res);
        for (std::size_t c = 0; c < width; ++c) {
            const double v = res[c];
            if (!std::isfinite(v)) {
                const std::string tiny = tiny_sentence();
                put(c, Value::of_error(ErrorCode::NotDefined,
                                       !tiny.empty() ? tiny
                                                     : (f.kind == ResultKind::Row ? f.row_names[c] : f.name) +
                                                           " is not defined for this state"));
            } else
                put(c, Value::of(spec.from_core(result_quantity_of(f, c), v)));
        }
    } catch (const Error& e) {
        Value ev = error_value(e, spec);
        if (const auto* re = dynamic_cast<const RangeError*>(&e)) {
            if (!std::isfinite(re->value())) {
                const std::string tiny = tiny_sentence();
                if (!tiny.empty()) ev.text = tiny;
            }
            std::size_t j = 0;
            for (const catalogue::Arg& arg : f.args) {
                if (!is_state_arg(arg)) continue;
                if (j < 32 && (zero_mask >> j & 1u) && arg.name == re->input()) {
                    ev.text = with_blank_hint(ev.text);
                    break;
                }
                ++j;
            }
        }
        for (std::size_t c = 0; c < width; ++c) put(c, ev);
    }
}

// The checks of call() on the call as a whole: argument count and units.
// Returns false with err set when the call cannot be evaluated.
bool check_count(const Function& f, std::size_t given, Value& err) {
    std::size_t required = 0;
    for (const auto& a : f.args)
        if (!a.optional) ++required;
    if (given >= required && given <= f.args.size()) return true;
    err = Value::of_error(ErrorCode::InvalidArgument,
                          f.name + " takes " + std::to_string(required) +
                              (required == f.args.size() ? "" : " to " + std::to_string(f.args.size())) +
                              " arguments, not " + std::to_string(given));
    return false;
}

bool units_of_call(const Function& f, const std::vector<Table>& args, units::UnitSpec& spec, Value& err) {
    const std::size_t units_index = f.units_index();
    if (units_index >= args.size()) return true;
    std::string text;
    if (!text_arg(args[units_index], "units", text, err)) return false;
    try {
        spec = units::UnitSpec::parse(text);
    } catch (const Error& e) {
        err = Value::of_error(e.code(), e.what());
        return false;
    }
    return true;
}

// The texts other than units and the whole-range arguments of a function
// with eval_extra (see catalogue::Extra). False with err set on a bad one.
bool extra_of_call(const Function& f, const std::vector<Table>& args, catalogue::Extra& extra, Value& err) {
    if (!f.eval_extra) return true;
    const std::size_t units_index = f.units_index();
    for (std::size_t i = 0; i < f.args.size(); ++i) {
        const catalogue::Arg& ar = f.args[i];
        if (ar.quantity == Quantity::Text && i != units_index) {
            std::string text;
            if (i < args.size()) {
                const Table& t = args[i];
                const Value& v = t.cells.empty() ? Value{} : t.cells[0];
                if (v.kind == Value::Kind::Error) {
                    err = v;
                    return false;
                }
                if (!is_scalar(t) || v.kind == Value::Kind::Number) {
                    err = Value::of_error(ErrorCode::InvalidArgument, "the argument " + ar.name + " must be a single text");
                    return false;
                }
                if (v.kind == Value::Kind::Text) text = v.text;
            }
            extra.texts.push_back(std::move(text));
        } else if (ar.whole_range) {
            catalogue::NumberTable nt;
            if (i < args.size()) {
                const Table& t = args[i];
                nt.rows = t.rows;
                nt.cols = t.cols;
                for (const Value& v : t.cells) {
                    if (v.kind == Value::Kind::Number) {
                        nt.v.push_back(v.number);
                    } else if (v.kind == Value::Kind::Empty) {
                        nt.v.push_back(std::nan(""));
                    } else if (v.kind == Value::Kind::Error) {
                        err = v;
                        return false;
                    } else {
                        err = Value::of_error(ErrorCode::InvalidArgument, "the argument " + ar.name + " holds the text \"" +
                                                                              v.text + "\" where numbers are expected");
                        return false;
                    }
                }
            }
            extra.tables.push_back(std::move(nt));
        }
    }
    return true;
}

}  // namespace

Table call(const Function& f, const std::vector<Table>& args) {
    try {
        if (f.name == "STEAM.EXPLAIN") return call_explain(args);
        if (f.name == "STEAM.VERSION") return Table::scalar(Value::of_text(std::string("Isentra ") + catalogue::version()));

        Value err;
        if (!check_count(f, args.size(), err)) return error_table(err);
        if (f.name == "STEAM.CONVERT") return call_convert(f, args);
        if (f.name == "STEAM.UNITS.SPELL") return call_units_spell(args);

        // Units.
        units::UnitSpec spec;
        if (!units_of_call(f, args, spec, err)) return error_table(err);
        catalogue::Extra extra;  // texts and whole ranges for eval_extra
        if (!extra_of_call(f, args, extra, err)) return error_table(err);

        // Header option of Row functions.
        bool header = false;
        std::vector<std::size_t> numeric;  // indices of the state's numeric arguments
        for (std::size_t i = 0; i < f.args.size(); ++i) {
            if (f.args[i].quantity == Quantity::Text || f.args[i].whole_range) continue;
            if (i >= args.size()) {  // omitted optional argument: its default (NaN: the function decides)
                if (f.args[i].name != "header") numeric.push_back(i);
                continue;
            }
            if (f.args[i].name == "header") {
                if (!header_flag(args[i], header, err)) return error_table(err);
                continue;
            }
            numeric.push_back(i);
        }

        // Broadcast shape.
        std::size_t rows = 1, cols = 1;
        for (std::size_t i : numeric) {
            if (i >= args.size()) continue;
            const Table& t = args[i];
            if (is_scalar(t)) continue;
            if (rows == 1 && cols == 1) {
                rows = t.rows;
                cols = t.cols;
            } else if (t.rows != rows || t.cols != cols) {
                return error_table(Value::of_error(
                    ErrorCode::InvalidArgument,
                    "the ranges given as arguments must have the same shape (or be single values): " +
                        std::to_string(rows) + "x" + std::to_string(cols) + " and " + std::to_string(t.rows) + "x" +
                        std::to_string(t.cols)));
            }
        }
        const bool ranged = !(rows == 1 && cols == 1);
        const std::size_t n = rows * cols;
        const std::size_t width = result_width(f);

        Table out;
        if (f.kind == ResultKind::Row) {
            out.rows = n + (header ? 1 : 0);
            out.cols = width;
        } else {
            out.rows = rows;
            out.cols = cols;
        }
        out.cells.assign(out.rows * out.cols, Value{});
        std::size_t row0 = 0;
        if (f.kind == ResultKind::Row && header) {
            for (std::size_t c = 0; c < width; ++c) {
                const std::string sym = spec.symbol(f.row_quantities[c]);
                out.cells[c] = Value::of_text(sym.empty() ? f.row_names[c] : f.row_names[c] + " [" + sym + "]");
            }
            row0 = 1;
        }

        double a[16];
        for (std::size_t k = 0; k < n; ++k) {
            Value result;
            bool empty = false;
            bool failed = false;
            std::uint32_t zero_mask = 0;
            for (std::size_t j = 0; j < numeric.size(); ++j) {
                const std::size_t i = numeric[j];
                const catalogue::Arg& spec_arg = f.args[i];
                if (i >= args.size()) {  // omitted optional: its default, in core units
                    a[j] = spec_arg.default_value;
                    continue;
                }
                const Table& t = args[i];
                const Value& v = is_scalar(t) ? t.cells[0] : t.cells[k];
                bool zero = false;
                const ArgStatus st = state_arg(spec_arg, v, is_scalar(t), ranged, spec, a[j], result, zero);
                if (zero) zero_mask |= std::uint32_t(1) << j;
                if (st == ArgStatus::Skip) empty = true;
                if (st == ArgStatus::Failed) failed = true;
                if (st != ArgStatus::Ok) break;
            }
            auto put = [&](std::size_t c, Value v) {
                if (f.kind == ResultKind::Row) out.cells[(row0 + k) * width + c] = std::move(v);
                else out.cells[k] = std::move(v);
            };
            if (empty) continue;
            if (failed) {
                for (std::size_t c = 0; c < width; ++c) put(c, result);
                continue;
            }
            evaluate_state(f, spec, extra, a, put, zero_mask);
        }
        return out;
    } catch (const Error& e) {
        return error_table(Value::of_error(e.code(), e.what()));
    } catch (const std::exception& e) {
        return error_table(Value::of_error(ErrorCode::InvalidArgument, std::string("internal error: ") + e.what()));
    }
}

Value call_scalar(const catalogue::Function& f, const std::vector<Value>& args) {
    std::vector<Table> t;
    t.reserve(args.size());
    for (const Value& v : args) t.push_back(Table::scalar(v));
    Table r = call(f, t);
    return r.cells.empty() ? Value{} : r.cells[0];
}

// ---- PreparedCall ----

bool PreparedCall::supported(const Function& f) {
    return f.kind != ResultKind::Text && f.name != "STEAM.EXPLAIN" && f.name != "STEAM.VERSION" &&
           f.name != "STEAM.CONVERT";
}

PreparedCall::PreparedCall(const Function& f, const std::vector<Table>& args, const std::vector<std::size_t>& slots)
    : f_(&f), width_(result_width(f)) {
    const auto fail = [](const Value& v) { throw Error(v.error, v.text); };
    const auto fail_text = [](const std::string& text) { throw Error(ErrorCode::InvalidArgument, text); };
    if (!supported(f)) fail_text(f.name + " gives a text, not numbers; it cannot be evaluated state by state");
    Value err;
    if (!check_count(f, args.size(), err)) fail(err);
    for (std::size_t i : slots) {
        if (i >= args.size()) fail_text("internal error: a per-state argument has no place in the call");
        const catalogue::Arg& a = f.args[i];
        if (a.quantity == Quantity::Text || a.name == "header")
            fail_text("the argument " + a.name + " of " + f.name + " must be written in the call, not read per state");
    }
    if (!units_of_call(f, args, spec_, err)) fail(err);
    if (!extra_of_call(f, args, extra_, err)) fail(err);
    slots_.resize(slots.size());
    for (std::size_t i = 0; i < f.args.size(); ++i) {
        const catalogue::Arg& arg = f.args[i];
        if (arg.quantity == Quantity::Text) continue;
        if (arg.whole_range) {
            for (std::size_t k : slots)
                if (k == i) fail_text("the argument " + arg.name + " of " + f.name + " must be written in the call, not read per state");
            continue;
        }
        if (arg.name == "header") {
            if (i >= args.size()) continue;
            bool header = false;
            if (!header_flag(args[i], header, err)) fail(err);
            if (header)
                fail_text("the header option of " + f.name + " is not available here: give it as FALSE or leave it out");
            continue;
        }
        const std::size_t pos = a_.size();
        a_.push_back(arg.default_value);
        if (i >= args.size()) continue;  // omitted optional argument: its default (NaN: the function decides)
        bool per_state = false;
        for (std::size_t k = 0; k < slots.size(); ++k)
            if (slots[k] == i) {
                slots_[k].pos = pos;
                slots_[k].arg = &arg;
                order_.push_back(k);
                per_state = true;
            }
        if (per_state) continue;
        if (!is_scalar(args[i])) fail_text("the argument " + arg.name + " must be a single value here, not a range");
        bool zero = false;
        if (state_arg(arg, args[i].cells[0], true, false, spec_, a_[pos], err, zero) != ArgStatus::Ok) fail(err);
        if (zero && pos < 32) zero_mask_ |= std::uint32_t(1) << pos;
    }
    if (a_.size() > 16 || width_ > 32) fail_text("internal error: " + f.name + " has too many arguments or results");
}

void PreparedCall::set_slot_units(std::size_t k, const units::UnitSpec& spec) {
    slots_.at(k).own_units = true;
    slots_[k].spec = spec;
}

Quantity PreparedCall::result_quantity(std::size_t c) const { return result_quantity_of(*f_, c); }

bool PreparedCall::eval(const double* in, double* out) const noexcept {
    try {
        double a[16];
        double res[32];
        std::copy(a_.begin(), a_.end(), a);
        for (std::size_t k = 0; k < slots_.size(); ++k) {
            if (!std::isfinite(in[k])) return false;
            const Slot& s = slots_[k];
            a[s.pos] = (s.own_units ? s.spec : spec_).to_core(s.arg->quantity, in[k]);
            if (!catalogue::arg_accepts(*s.arg, a[s.pos])) return false;  // eval(Value*) gives the sentence
        }
        evaluate_raw(*f_, spec_, extra_, a, res);
        for (std::size_t c = 0; c < width_; ++c) {
            if (!std::isfinite(res[c])) return false;
            out[c] = spec_.from_core(result_quantity_of(*f_, c), res[c]);
        }
        return true;
    } catch (...) {
        return false;
    }
}

void PreparedCall::eval(const Value* in, Value* out) const {
    double a[16];
    std::copy(a_.begin(), a_.end(), a);
    Value err;
    std::uint32_t zero_mask = zero_mask_;
    for (std::size_t k : order_) {
        const Slot& s = slots_[k];
        bool zero = false;
        if (state_arg(*s.arg, in[k], true, false, s.own_units ? s.spec : spec_, a[s.pos], err, zero) !=
            ArgStatus::Ok) {
            for (std::size_t c = 0; c < width_; ++c) out[c] = err;
            return;
        }
        if (zero && s.pos < 32) zero_mask |= std::uint32_t(1) << s.pos;
    }
    try {
        evaluate_state(*f_, spec_, extra_, a, [&](std::size_t c, Value v) { out[c] = std::move(v); }, zero_mask);
    } catch (const std::exception& e) {
        for (std::size_t c = 0; c < width_; ++c)
            out[c] = Value::of_error(ErrorCode::InvalidArgument, std::string("internal error: ") + e.what());
    }
}

}  // namespace isentra
