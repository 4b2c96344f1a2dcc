// SPDX-License-Identifier: MPL-2.0
// Call texts (formula.hpp): a small recursive-descent parser over one line,
// evaluation through isentra::call(), and the one-line output format.
#include "isentra/surface/formula.hpp"

#include <charconv>
#include <cstdio>
#include <exception>
#include <system_error>

namespace isentra::formula {

ParseError::ParseError(std::size_t position, const std::string& detail)
    : Error(ErrorCode::InvalidArgument, "at column " + std::to_string(position + 1) + ": " + detail),
      position_(position),
      detail_(detail) {}

namespace {

bool is_digit(char c) { return c >= '0' && c <= '9'; }
bool is_letter(char c) { return (c >= 'A' && c <= 'Z') || (c >= 'a' && c <= 'z'); }
bool is_name_char(char c) { return is_letter(c) || is_digit(c) || c == '.' || c == '_'; }

bool equals_ignore_case(std::string_view a, std::string_view b) {
    if (a.size() != b.size()) return false;
    for (std::size_t k = 0; k < a.size(); ++k) {
        char x = a[k], y = b[k];
        if (x >= 'a' && x <= 'z') x = static_cast<char>(x - 'a' + 'A');
        if (y >= 'a' && y <= 'z') y = static_cast<char>(y - 'a' + 'A');
        if (x != y) return false;
    }
    return true;
}

const char* const what_arg = "a number, a \"text\", TRUE, FALSE or an {array}";
const char* const what_element = "a number, a \"text\", TRUE or FALSE";

class Parser {
public:
    Parser(std::string_view s, bool allow_names) : s_(s), allow_names_(allow_names) {}

    ParsedCall call() {
        ParsedCall out;
        skip_space();
        if (peek() == '=') {
            ++i_;
            skip_space();
        }
        if (at_end()) fail(i_, "expected a function call such as STEAM.H.PT(10; 500), found an empty text");
        const std::size_t name_pos = i_;
        if (!is_letter(peek()))
            fail(i_, "expected a function name such as STEAM.H.PT, found " + found(i_));
        while (!at_end() && is_name_char(peek())) ++i_;
        const std::string_view name = s_.substr(name_pos, i_ - name_pos);
        out.function = catalogue::find(name);
        if (!out.function) fail(name_pos, "there is no function \"" + std::string(name) + "\"");
        skip_space();
        if (peek() != '(') {
            if (at_end())
                fail(i_, "expected '(' after " + out.function->name + ": write " + out.function->name + "(...)");
            fail(i_, "expected '(' after " + out.function->name + ", found " + found(i_));
        }
        ++i_;
        skip_space();
        std::vector<bool> empty;  // per argument: nothing was written there
        if (peek() == ')') {
            ++i_;
        } else {
            for (;;) {
                skip_space();
                const std::size_t n = out.args.size() + 1;
                if (peek() == '{') {
                    out.args.push_back(array());
                    empty.push_back(false);
                } else {
                    Value v;
                    const std::size_t pos = i_;
                    name_.clear();
                    if (element(v, true)) {
                        out.args.push_back(Table::scalar(std::move(v)));
                        empty.push_back(false);
                        if (allow_names_) {
                            out.names.resize(out.args.size());
                            out.names.back() = name_;
                        }
                    } else if (at_end() || peek() == ';' || peek() == ',' || peek() == ')') {
                        out.args.push_back(Table::scalar(Value{}));
                        empty.push_back(true);
                    } else {
                        fail(pos, "expected " + std::string(what_arg) + " as argument " + std::to_string(n) +
                                      ", found " + found(pos) + hint_at(pos));
                    }
                }
                skip_space();
                if (at_end())
                    fail(i_, "the call ends before its closing ')'");
                const char c = peek();
                if (c == ';' || c == ',') {
                    ++i_;
                    continue;
                }
                if (c == ')') {
                    ++i_;
                    break;
                }
                fail(i_, "expected ';', ',' or ')' after argument " + std::to_string(n) + ", found " + found(i_) +
                             hint_at(i_));
            }
        }
        skip_space();
        if (!at_end()) fail(i_, "unexpected " + found(i_) + " after the closing ')' of the call");

        // Trailing empty arguments in the places of optional arguments are omitted.
        const auto& params = out.function->args;
        while (!out.args.empty() && empty.back()) {
            const std::size_t k = out.args.size() - 1;
            if (k >= params.size() || !params[k].optional || params[k].varargs) break;
            out.args.pop_back();
            empty.pop_back();
        }
        if (allow_names_) out.names.resize(out.args.size());
        return out;
    }

private:
    std::string_view s_;
    bool allow_names_;
    std::size_t i_ = 0;
    std::string name_;  // the name element() found (allow_names_), else ""

    bool at_end() const { return i_ >= s_.size(); }
    char peek() const { return at_end() ? '\0' : s_[i_]; }

    void skip_space() {
        while (!at_end()) {
            const char c = s_[i_];
            if (c == ' ' || c == '\t' || c == '\r' || c == '\n' || c == '\f' || c == '\v') {
                ++i_;
            } else if (c == '\xC2' && i_ + 1 < s_.size() && s_[i_ + 1] == '\xA0') {  // UTF-8 no-break space
                i_ += 2;
            } else {
                break;
            }
        }
    }

    [[noreturn]] static void fail(std::size_t pos, const std::string& detail) { throw ParseError(pos, detail); }

    // Describes what stands at pos, for messages.
    std::string found(std::size_t pos) const {
        if (pos >= s_.size()) return "the end of the text";
        const unsigned char c = static_cast<unsigned char>(s_[pos]);
        if (c >= 0x20 && c < 0x7F) return std::string("'") + static_cast<char>(c) + "'";
        if (c >= 0xC0) {  // a UTF-8 sequence: show the whole character
            std::size_t len = 1;
            while (pos + len < s_.size() && len < 4 && (static_cast<unsigned char>(s_[pos + len]) & 0xC0) == 0x80)
                ++len;
            return "'" + std::string(s_.substr(pos, len)) + "'";
        }
        char buf[24];
        std::snprintf(buf, sizeof buf, "the byte 0x%02X", static_cast<unsigned>(c));
        return buf;
    }

    // A hint for common mistakes at pos.
    std::string hint_at(std::size_t pos) const {
        if (pos >= s_.size()) return {};
        const char c = s_[pos];
        if (c == '+' || c == '-' || c == '*' || c == '/' || c == '^' || c == '&' || c == '(')
            return " (expressions are not evaluated: write the number)";
        if (is_letter(c)) {
            std::size_t k = pos;
            while (k > 0 && (s_[k - 1] == ' ' || s_[k - 1] == '\t')) --k;
            if (k > 0 && (is_digit(s_[k - 1]) || s_[k - 1] == '.'))
                return " (units are not written after numbers: the units argument sets them, e.g. \"US\")";
        }
        if (c == '\'') return " (texts are written in double quotes)";
        return {};
    }

    // A number, a text, TRUE or FALSE at the current position. Returns false,
    // consuming nothing, if none starts here.
    bool element(Value& out, bool in_argument) {
        const char c = peek();
        if (c == '"') {
            out = Value::of_text(text());
            return true;
        }
        if (c == '[' && allow_names_ && in_argument) {
            name_ = bracket_name();
            out = Value{};
            return true;
        }
        if (is_digit(c) || c == '.' || c == '+' || c == '-') {
            out = Value::of(number());
            return true;
        }
        if (is_letter(c)) {
            const std::size_t pos = i_;
            while (!at_end() && is_name_char(peek())) ++i_;
            const std::string_view w = s_.substr(pos, i_ - pos);
            if (equals_ignore_case(w, "TRUE")) {
                out = Value::of(1.0);
                return true;
            }
            if (equals_ignore_case(w, "FALSE")) {
                out = Value::of(0.0);
                return true;
            }
            if (allow_names_ && in_argument) {
                name_ = std::string(w);
                out = Value{};
                return true;
            }
            fail(pos, "expected " + std::string(in_argument ? what_arg : what_element) + ", found the word \"" +
                          std::string(w) +
                          "\" (cell references, names and nested functions are not available here; texts are "
                          "written in double quotes)");
        }
        return false;
    }

    std::string text() {
        const std::size_t open = i_;
        ++i_;  // opening quote
        std::string t;
        for (;;) {
            if (at_end()) fail(open, "the text has no closing '\"'");
            const char c = s_[i_++];
            if (c == '"') {
                if (peek() == '"') {
                    t += '"';
                    ++i_;
                    continue;
                }
                return t;
            }
            t += c;
        }
    }

    // [any name], "]]" for a ']' inside.
    std::string bracket_name() {
        const std::size_t open = i_;
        ++i_;
        std::string t;
        for (;;) {
            if (at_end()) fail(open, "the name has no closing ']'");
            const char c = s_[i_++];
            if (c == ']') {
                if (peek() == ']') {
                    t += ']';
                    ++i_;
                    continue;
                }
                if (t.empty()) fail(open, "the name in [] is empty");
                return t;
            }
            t += c;
        }
    }

    double number() {
        const std::size_t start = i_;
        bool negative = false;
        if (peek() == '+' || peek() == '-') {
            negative = peek() == '-';
            ++i_;
            skip_space();
        }
        const std::size_t body = i_;
        std::size_t digits = 0;
        while (is_digit(peek())) ++i_, ++digits;
        if (peek() == '.') {
            ++i_;
            while (is_digit(peek())) ++i_, ++digits;
        }
        if (digits == 0) {
            if (i_ > body) fail(body, "expected digits in the number, found only '.'");
            fail(i_, std::string("expected a number after '") + s_[start] + "', found " + found(i_) + hint_at(i_));
        }
        if (peek() == 'e' || peek() == 'E') {
            const std::size_t e = i_;
            ++i_;
            if (peek() == '+' || peek() == '-') ++i_;
            if (!is_digit(peek()))
                fail(e, "expected digits in the exponent of the number, found " + found(i_));
            while (is_digit(peek())) ++i_;
        }
        // The digits as written, without a copy; the sign is applied after
        // (exact), so "- 5" (a space after the sign) reads as -5 too.
        double v = 0;
        const char* first = s_.data() + body;
        const char* last = s_.data() + i_;
        const auto r = std::from_chars(first, last, v, std::chars_format::general);
        if (r.ec != std::errc() || r.ptr != last) {
            std::string digits_text = negative ? "-" : "";
            digits_text.append(first, last);
            if (r.ec == std::errc::result_out_of_range)
                fail(start, "the number " + digits_text + " is outside the range of double-precision numbers");
            fail(start, "the number " + digits_text + " could not be read");
        }
        if (negative) v = -v;
        return v;
    }

    Table array() {
        const std::size_t open = i_;
        ++i_;  // '{'
        std::vector<Value> cells;
        std::size_t cols = 0, rows = 0, in_row = 0;
        std::size_t row_start = i_;
        for (;;) {
            skip_space();
            if (peek() == '{') fail(i_, "an array cannot contain another array");
            if (peek() == '}' && cells.empty()) fail(i_, "the array is empty: write its elements, e.g. {1; 2; 3}");
            Value v;
            const std::size_t pos = i_;
            if (!element(v, false)) {
                if (at_end()) fail(open, "the array has no closing '}'");
                fail(pos, "expected " + std::string(what_element) + " as an element of the array, found " +
                              found(pos) + hint_at(pos));
            }
            cells.push_back(std::move(v));
            ++in_row;
            skip_space();
            const char c = peek();
            if (c == ',') {
                ++i_;
                continue;
            }
            if (c == ';' || c == '}') {
                if (rows == 0) {
                    cols = in_row;
                } else if (in_row != cols) {
                    fail(row_start, "every row of an array must have the same number of elements: row 1 has " +
                                        std::to_string(cols) + ", row " + std::to_string(rows + 1) + " has " +
                                        std::to_string(in_row));
                }
                ++rows;
                in_row = 0;
                ++i_;
                row_start = i_;
                if (c == '}') break;
                continue;
            }
            if (at_end()) fail(open, "the array has no closing '}'");
            fail(i_, "expected ',' (next column), ';' (next row) or '}' in the array, found " + found(i_) +
                         hint_at(i_));
        }
        Table t;
        t.rows = rows;
        t.cols = cols;
        t.cells = std::move(cells);
        return t;
    }
};

std::string one_line(const std::string& text) {
    std::string t = text;
    for (char& c : t)
        if (c == '\t' || c == '\r' || c == '\n') c = ' ';
    return t;
}

std::string element_text(const Value& v) {
    switch (v.kind) {
        case Value::Kind::Number: return format_number(v.number);
        case Value::Kind::Text: return one_line(v.text);
        case Value::Kind::Error: return "error: " + one_line(v.text);
        case Value::Kind::Empty: break;
    }
    return {};
}

}  // namespace

ParsedCall parse(std::string_view text, bool allow_names) { return Parser(text, allow_names).call(); }

Table evaluate(std::string_view text) {
    try {
        const ParsedCall c = parse(text);
        return call(*c.function, c.args);
    } catch (const Error& e) {
        return Table::scalar(Value::of_error(e.code(), e.what()));
    } catch (const std::exception& e) {
        return Table::scalar(Value::of_error(ErrorCode::InvalidArgument, std::string("internal error: ") + e.what()));
    }
}

std::string format_number(double v) {
    char buf[64];
    const auto r = std::to_chars(buf, buf + sizeof buf, v, std::chars_format::general, 17);
    return std::string(buf, r.ptr);
}

std::string format_line(const Table& result) {
    const auto& cells = result.cells;
    if (cells.empty()) return {};
    if (cells.size() == 1) return element_text(cells[0]);
    bool same_error = true;
    for (const Value& v : cells)
        if (v.kind != Value::Kind::Error || v.text != cells[0].text) {
            same_error = false;
            break;
        }
    if (same_error) return element_text(cells[0]);
    std::string line;
    for (std::size_t k = 0; k < cells.size(); ++k) {
        if (k) line += '\t';
        line += element_text(cells[k]);
    }
    return line;
}

}  // namespace isentra::formula
