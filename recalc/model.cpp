// SPDX-License-Identifier: MPL-2.0
#include "model.hpp"

#include <algorithm>
#include <array>
#include <cctype>
#include <charconv>

namespace isentra::recalc {

std::string format_number(double v) {
    if (std::isnan(v)) return "NaN";
    if (std::isinf(v)) return v > 0 ? "inf" : "-inf";
    if (v == 0) return "0";
    std::array<char, 400> buf{};
    const double a = std::fabs(v);
    // Plain digits in the usual range (500000, not 5e+05), else the shortest form.
    const auto r = a >= 1e-5 && a < 1e15 ? std::to_chars(buf.data(), buf.data() + buf.size(), v, std::chars_format::fixed)
                                         : std::to_chars(buf.data(), buf.data() + buf.size(), v);
    return std::string(buf.data(), r.ptr);
}

std::string to_string(const Value& v) {
    switch (v.kind) {
    case Value::Empty: return "";
    case Value::Number: return format_number(v.number);
    case Value::Text: return v.text;
    case Value::Error: return v.text.empty() ? "Err:" + std::to_string(v.error) : v.text;
    }
    return "";
}

std::size_t Snapshot::formula_cells() const {
    std::size_t n = 0;
    for (const Sheet& s : sheets) n += s.cells.size();
    return n;
}

std::string cell_name(int col, int row) {
    std::string c;
    for (int n = col + 1; n > 0; n = (n - 1) / 26) c.insert(c.begin(), static_cast<char>('A' + (n - 1) % 26));
    return c + std::to_string(row + 1);
}

std::string nearest_label(const Sheet& sheet, int col, int row) {
    // Left in the row: the text cell (row, c) with the largest c < col.
    auto it = sheet.texts.lower_bound({row, col});
    if (it != sheet.texts.begin()) {
        auto left = std::prev(it);
        if (left->first.first == row && !left->second.empty()) return left->second;
    }
    // Above in the column.
    for (int r = row - 1; r >= 0; --r) {
        auto a = sheet.texts.find({r, col});
        if (a != sheet.texts.end() && !a->second.empty()) return a->second;
    }
    return "";
}

std::vector<std::string> called_functions(const std::string& f) {
    std::vector<std::string> names;
    const std::size_t n = f.size();
    auto ident_start = [](char c) { return std::isalpha(static_cast<unsigned char>(c)) || c == '_'; };
    auto ident_char = [](char c) { return std::isalnum(static_cast<unsigned char>(c)) || c == '_' || c == '.'; };
    for (std::size_t i = 0; i < n;) {
        const char c = f[i];
        if (c == '"' || c == '\'') {  // a text, or a quoted sheet name: doubled quotes inside
            for (++i; i < n; ++i) {
                if (f[i] == c) {
                    if (i + 1 < n && f[i + 1] == c) ++i;
                    else break;
                }
            }
            ++i;
            continue;
        }
        if (ident_start(c) && (i == 0 || !ident_char(f[i - 1]))) {
            std::size_t j = i;
            while (j < n && ident_char(f[j])) ++j;
            std::size_t k = j;
            while (k < n && f[k] == ' ') ++k;
            if (k < n && f[k] == '(') {
                std::string name = f.substr(i, j - i);
                if (std::find(names.begin(), names.end(), name) == names.end()) names.push_back(name);
            }
            i = j;
            continue;
        }
        ++i;
    }
    return names;
}

bool numbers_differ(double a, double b, const Tolerance& tol) {
    if (std::isnan(a) || std::isnan(b)) return std::isnan(a) != std::isnan(b);
    if (a == b) return false;
    const double d = std::fabs(b - a);
    if (d <= tol.abs) return false;
    if (d <= tol.rel * std::max(std::fabs(a), std::fabs(b))) return false;
    return true;
}

const char* to_string(ChangeKind k) {
    switch (k) {
    case ChangeKind::Value: return "value changed";
    case ChangeKind::NewError: return "new error";
    case ChangeKind::ErrorGone: return "error gone";
    case ChangeKind::UnknownName: return "unknown function";
    case ChangeKind::TypeChanged: return "type changed";
    }
    return "";
}

namespace {

const char* kind_name(Value::Kind k) {
    switch (k) {
    case Value::Empty: return "empty";
    case Value::Number: return "number";
    case Value::Text: return "text";
    case Value::Error: return "error";
    }
    return "";
}

}  // namespace

std::vector<Change> compare(const Snapshot& before, const Snapshot& after, const Tolerance& tol,
                            UnknownFunctions* names) {
    std::vector<Change> out;
    for (std::size_t s = 0; s < after.sheets.size(); ++s) {
        const Sheet& sa = after.sheets[s];
        const Sheet* sb = nullptr;
        for (const Sheet& x : before.sheets)
            if (x.name == sa.name) sb = &x;
        std::map<std::pair<int, int>, const FormulaCell*> old_cells;
        if (sb)
            for (const FormulaCell& c : sb->cells) old_cells[{c.row, c.col}] = &c;
        for (const FormulaCell& c : sa.cells) {
            auto it = old_cells.find({c.row, c.col});
            const Value old = it == old_cells.end() ? Value{} : it->second->value;
            const Value& now = c.value;
            Change ch;
            ch.sheet = sa.name;
            ch.cell = cell_name(c.col, c.row);
            ch.formula = c.formula;
            ch.before = old;
            ch.after = now;
            bool changed = false;
            const bool unknown_name = now.kind == Value::Error && now.error == error_no_name;
            if (old.kind == Value::Empty && !unknown_name) continue;  // no stored result to compare with
            if (now.kind == Value::Error && now.error == error_no_name) {
                ch.kind = ChangeKind::UnknownName;
                std::string list;
                for (const std::string& n : called_functions(c.formula)) {
                    if (names && !names->unknown(n)) continue;
                    list += (list.empty() ? "" : ", ") + n;
                }
                ch.detail = list.empty() ? "a name in the formula is not defined (no unknown function)"
                                         : "unknown to Calc: " + list;
                changed = true;
            } else if (now.kind == Value::Error && old.kind == Value::Error) {
                const bool same = now.error == old.error || (!now.text.empty() && now.text == old.text);
                if (!same) {
                    ch.kind = ChangeKind::NewError;
                    ch.detail = "error changed";
                    changed = true;
                }
            } else if (now.kind == Value::Error) {
                ch.kind = ChangeKind::NewError;
                changed = true;
            } else if (old.kind == Value::Error) {
                ch.kind = ChangeKind::ErrorGone;
                changed = true;
            } else if (old.kind != now.kind) {
                ch.kind = ChangeKind::TypeChanged;
                ch.detail = std::string(kind_name(old.kind)) + " -> " + kind_name(now.kind);
                changed = true;
            } else if (now.kind == Value::Number) {
                if (numbers_differ(old.number, now.number, tol)) {
                    ch.kind = ChangeKind::Value;
                    ch.difference = now.number - old.number;
                    changed = true;
                }
            } else if (now.kind == Value::Text && now.text != old.text) {
                ch.kind = ChangeKind::Value;
                changed = true;
            }
            if (!changed) continue;
            ch.label = nearest_label(sa, c.col, c.row);
            out.push_back(std::move(ch));
        }
    }
    return out;
}

Counts count(const std::vector<Change>& changes) {
    Counts n;
    for (const Change& c : changes) {
        switch (c.kind) {
        case ChangeKind::Value: ++n.value; break;
        case ChangeKind::NewError: ++n.new_error; break;
        case ChangeKind::ErrorGone: ++n.error_gone; break;
        case ChangeKind::UnknownName: ++n.unknown_name; break;
        case ChangeKind::TypeChanged: ++n.type_changed; break;
        }
    }
    return n;
}

}  // namespace isentra::recalc
