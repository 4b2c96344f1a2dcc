// SPDX-License-Identifier: MPL-2.0
// Evaluating catalogue functions on spreadsheet values: units, broadcasting
// over ranges, and error sentences in the user's own units.
#include "isentra/surface/call.hpp"

#include <cmath>
#include <cstdio>
#include <exception>

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

// Text of a 1x1 text argument ("" when empty or absent).
bool text_arg(const Table& t, const std::string& argname, std::string& out, Value& err) {
    if (!is_scalar(t)) {
        err = Value::of_error(ErrorCode::InvalidArgument, "the argument " + argname + " must be a single text, not a range");
        return false;
    }
    const Value& v = t.cells[0];
    if (v.kind == Value::Kind::Text) out = v.text;
    else if (v.kind == Value::Kind::Empty) out.clear();
    else if (v.kind == Value::Kind::Number && v.number == 0.0) out.clear();  // Calc passes a blank cell as 0
    else if (v.kind == Value::Kind::Error) { err = v; return false; }
    else {
        err = Value::of_error(ErrorCode::InvalidArgument,
                              "the argument " + argname + " must be a text such as \"SI\" or \"US\", not the number " +
                                  fmt(v.number));
        return false;
    }
    return true;
}

Table error_table(Value v) { return Table::scalar(std::move(v)); }

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

Table call_explain(const std::vector<Table>& args) {
    std::string name;
    Value err;
    if (args.empty()) return error_table(Value::of_error(ErrorCode::InvalidArgument, "name the function to explain"));
    if (!text_arg(args[0], "function", name, err)) return error_table(err);
    const Function* target = catalogue::find(name);
    if (!target || target->name == "STEAM.EXPLAIN")
        return error_table(Value::of_error(ErrorCode::InvalidArgument,
                                           "there is no function \"" + name + "\"; write it as in \"H.PT\" or \"STEAM.H.PT\""));
    std::vector<Table> rest(args.begin() + 1, args.end());
    Table r = call(*target, rest);
    for (Value& v : r.cells) {
        if (v.kind == Value::Kind::Error) v = Value::of_text(v.text);
        else if (v.kind == Value::Kind::Number) v = Value::of_text("OK: " + target->name + " = " + fmt(v.number));
        else if (v.kind == Value::Kind::Text) v = Value::of_text("OK: " + v.text);
    }
    return r;
}

}  // namespace

Table call(const Function& f, const std::vector<Table>& args) {
    try {
        if (f.name == "STEAM.EXPLAIN") return call_explain(args);
        if (f.name == "STEAM.VERSION") return Table::scalar(Value::of_text(std::string("Isentra ") + catalogue::version()));

        std::size_t required = 0;
        for (const auto& a : f.args)
            if (!a.optional) ++required;
        if (args.size() < required || args.size() > f.args.size())
            return error_table(Value::of_error(
                ErrorCode::InvalidArgument,
                f.name + " takes " + std::to_string(required) +
                    (required == f.args.size() ? "" : " to " + std::to_string(f.args.size())) + " arguments, not " +
                    std::to_string(args.size())));
        if (f.name == "STEAM.CONVERT") return call_convert(f, args);

        // Units.
        units::UnitSpec spec;
        const std::size_t units_index = f.units_index();
        if (units_index < args.size()) {
            std::string text;
            Value err;
            if (!text_arg(args[units_index], "units", text, err)) return error_table(err);
            try {
                spec = units::UnitSpec::parse(text);
            } catch (const Error& e) {
                return error_table(Value::of_error(e.code(), e.what()));
            }
        }

        // Header option of Row functions.
        bool header = false;
        std::vector<std::size_t> numeric;  // indices of the state's numeric arguments
        for (std::size_t i = 0; i < f.args.size(); ++i) {
            if (f.args[i].quantity == Quantity::Text) continue;
            if (i >= args.size()) {  // omitted optional argument: its default (NaN: the function decides)
                if (f.args[i].name != "header") numeric.push_back(i);
                continue;
            }
            if (f.args[i].name == "header") {
                const Table& t = args[i];
                if (!is_scalar(t)) return error_table(Value::of_error(ErrorCode::InvalidArgument, "header must be a single value"));
                const Value& v = t.cells[0];
                header = v.kind == Value::Kind::Number && v.number != 0.0;
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
        const std::size_t width = f.kind == ResultKind::Row ? f.row_names.size() : 1;

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
        double res[32];
        for (std::size_t k = 0; k < n; ++k) {
            Value result;
            bool empty = false;
            bool failed = false;
            for (std::size_t j = 0; j < numeric.size(); ++j) {
                const std::size_t i = numeric[j];
                const catalogue::Arg& spec_arg = f.args[i];
                if (i >= args.size()) {  // omitted optional: its default, in core units
                    a[j] = spec_arg.default_value;
                    continue;
                }
                const Table& t = args[i];
                const Value& v = is_scalar(t) ? t.cells[0] : t.cells[k];
                if (v.kind == Value::Kind::Number) {
                    if (!std::isfinite(v.number)) {
                        result = Value::of_error(ErrorCode::InvalidArgument, spec_arg.name + " is not a finite number");
                        failed = true;
                        break;
                    }
                    a[j] = spec.to_core(spec_arg.quantity, v.number);
                } else if (v.kind == Value::Kind::Empty) {
                    if (is_scalar(t) && (spec_arg.optional || !std::isnan(spec_arg.default_value))) {
                        // left out between other arguments (";;"): its default
                        a[j] = spec_arg.default_value;
                        continue;
                    }
                    if (ranged && !is_scalar(t)) {
                        empty = true;
                        break;
                    }
                    result = Value::of_error(ErrorCode::InvalidArgument, "the argument " + spec_arg.name + " is empty");
                    failed = true;
                    break;
                } else if (v.kind == Value::Kind::Error) {
                    result = v;
                    failed = true;
                    break;
                } else {
                    result = Value::of_error(ErrorCode::InvalidArgument,
                                             "the argument " + spec_arg.name + " is the text \"" + v.text +
                                                 "\" where a number is expected");
                    failed = true;
                    break;
                }
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
            try {
                if (f.eval_units) f.eval_units(a, res, spec);
                else f.eval(a, res);
                for (std::size_t c = 0; c < width; ++c) {
                    const Quantity q = f.kind == ResultKind::Row ? f.row_quantities[c] : f.result;
                    const double v = res[c];
                    if (!std::isfinite(v))
                        put(c, Value::of_error(ErrorCode::NotDefined,
                                               (f.kind == ResultKind::Row ? f.row_names[c] : f.name) +
                                                   " is not defined for this state"));
                    else
                        put(c, Value::of(spec.from_core(q, v)));
                }
            } catch (const Error& e) {
                const Value ev = error_value(e, spec);
                for (std::size_t c = 0; c < width; ++c) put(c, ev);
            }
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

}  // namespace isentra
