// SPDX-License-Identifier: MPL-2.0
// The bad-input sweep: every catalogue function (taken from the catalogue, so
// a new function is swept without anyone remembering), every argument in
// turn replaced by bad values, in the one headless Calc of calc_tests.
//
// Bad values: a text, a blank cell, an error cell (=1/0), 0, -1, 1e308,
// -1e308, 1e-320, a range of the wrong shape, a 2x2 range, a wrong units
// text, a number where a text belongs, and for the header flag 2 and -1.
// Every other argument keeps its representative value
// (representative_args.hxx), so each case changes exactly one argument.
//
// Assertions:
// - no crash and no hang: a crash ends the UNO call of the very case (named
//   in the failure); a watchdog thread names the case and ends the test
//   binary if one cell takes longer than kCaseSeconds;
// - no number where the rules say error (rules(), below);
// - every error is explained: STEAM.EXPLAIN with the same arguments gives a
//   sentence (not "OK: ..."), and for every number it says "OK: ...";
// - a 2x2 range in one argument gives, element by element, what the four
//   scalar calls give (numbers equal, errors where they are errors).
// The counts are printed.
#include <atomic>
#include <chrono>
#include <cmath>
#include <condition_variable>
#include <cstdio>
#include <cstdlib>
#include <iostream>
#include <limits>
#include <mutex>
#include <string>
#include <thread>
#include <vector>

#include "isentra/surface/call.hpp"
#include "isentra/surface/catalogue.hpp"
#include "isentra/units/units.hpp"
#include "calc_test.hxx"
#include "representative_args.hxx"

namespace isentra::calctest {
namespace {

using SweepTest = CalcTest;
using namespace representative;

constexpr int kCaseSeconds = 30;  // the slowest case of an earlier outside sweep took 0.1 s

// Columns of the sweep sheet (0-based): arguments in A..L, the wrong-shape
// ranges in N..R, the 2x2 range in S..T, results from Y, the four scalar
// equivalents of a 2x2 case in AU..AV, the explanation in BA.
constexpr int kArgCol = 0, kShapeCol = 13, kSquareCol = 18, kResultCol = 24, kScalarCol = 46, kExplainCol = 52;

enum class Bad { Text, Blank, ErrorCell, Zero, MinusOne, Huge, MinusHuge, Denormal, WrongShape, Square,
                 WrongUnits, NumberForText, Two };

const char* bad_name(Bad b) {
    switch (b) {
        case Bad::Text: return "a text";
        case Bad::Blank: return "a blank cell";
        case Bad::ErrorCell: return "an error cell";
        case Bad::Zero: return "0";
        case Bad::MinusOne: return "-1";
        case Bad::Huge: return "1e308";
        case Bad::MinusHuge: return "-1e308";
        case Bad::Denormal: return "1e-320";
        case Bad::WrongShape: return "a range of the wrong shape";
        case Bad::Square: return "a 2x2 range";
        case Bad::WrongUnits: return "a wrong units text";
        case Bad::NumberForText: return "a number where a text belongs";
        case Bad::Two: return "2";
    }
    return "?";
}

double bad_number(Bad b) {
    switch (b) {
        case Bad::Zero: return 0.0;
        case Bad::MinusOne: return -1.0;
        case Bad::Huge: return 1e308;
        case Bad::MinusHuge: return -1e308;
        case Bad::Denormal: return 1e-320;
        case Bad::Two: return 2.0;
        default: return std::numeric_limits<double>::quiet_NaN();
    }
}

// What the rules demand of a case.
enum class Expect {
    Error,   // no number: an error value (or every element of a row an error)
    Either,  // a number may be right (e.g. -1 degC is a temperature) or an error
    Text     // a text (STEAM.EXPLAIN explains everything, even its own bad input)
};

bool is_header(const cat::Function& f, std::size_t i) { return i < f.args.size() && f.args[i].name == "header"; }
bool is_units(const cat::Function& f, std::size_t i) {
    return i < f.args.size() && f.args[i].name == "units" && f.args[i].quantity == Quantity::Text;
}

// The rules. A value the catalogue says the argument cannot take must give an
// error; so must a text in a numeric argument, an error cell, a range whose
// shape does not fit the others, a units text that names no unit, and +-1e308
// (no quantity of a plant reaches it, and its unit conversions overflow).
// Values inside an argument's range may still be errors for the state as a
// whole (then Either).
Expect rules(const cat::Function& f, std::size_t i, Bad b) {
    const bool explain = f.name == "STEAM.EXPLAIN";
    if (explain && i == 0) return b == Bad::ErrorCell ? Expect::Error : Expect::Text;
    if (explain) return b == Bad::ErrorCell || b == Bad::WrongShape || b == Bad::Square ? Expect::Either : Expect::Text;
    if (f.name == "STEAM.CONVERT" && i == 0 && (b == Bad::Huge || b == Bad::MinusHuge))
        return Expect::Either;  // a unit conversion of a huge value may well be finite
    switch (b) {
        case Bad::Text:
        case Bad::ErrorCell:
        case Bad::WrongShape:
        case Bad::WrongUnits:
        case Bad::NumberForText:
        case Bad::Huge:
        case Bad::MinusHuge:
            return Expect::Error;
        case Bad::Square:
            return Expect::Either;  // checked against the scalar calls instead
        case Bad::Blank:
        case Bad::Zero:
        case Bad::MinusOne:
        case Bad::Denormal:
        case Bad::Two: {
            if (is_header(f, i)) return b == Bad::Blank || b == Bad::Zero ? Expect::Either : Expect::Error;
            if (i >= f.args.size()) return Expect::Either;
            const double v = b == Bad::Blank ? 0.0 : bad_number(b);
            const double core = units::UnitSpec::parse("SI").to_core(f.args[i].quantity, v);
            return cat::arg_accepts(f, i, core) ? Expect::Either : Expect::Error;
        }
    }
    return Expect::Either;
}

std::vector<Bad> bad_values(const cat::Function& f, std::size_t i, const Case& c) {
    if (c.args[i].is_text) {
        if (is_units(f, i)) return {Bad::WrongUnits, Bad::NumberForText, Bad::ErrorCell};
        return {Bad::Text, Bad::NumberForText, Bad::ErrorCell};
    }
    if (is_header(f, i))
        return {Bad::Text, Bad::Blank, Bad::ErrorCell, Bad::Zero, Bad::MinusOne, Bad::Huge, Bad::Denormal, Bad::Two};
    std::vector<Bad> v = {Bad::Text, Bad::Blank, Bad::ErrorCell, Bad::Zero, Bad::MinusOne,
                          Bad::Huge, Bad::MinusHuge, Bad::Denormal};
    // Wrong shape: this argument a 1x3 range, another broadcast one a 1x2 range.
    auto broadcast = [&](std::size_t k) {
        return !c.args[k].is_text && !(k < f.args.size() && (f.args[k].whole_range || is_header(f, k)));
    };
    int numeric = 0;
    for (std::size_t k = 0; k < c.args.size(); ++k) numeric += broadcast(k) ? 1 : 0;
    if (broadcast(i) && numeric >= 2) v.push_back(Bad::WrongShape);
    // A whole-range argument (a calibration table) is not broadcast: no 2x2 comparison.
    if (f.kind == cat::ResultKind::Number && f.name != "STEAM.EXPLAIN" && !(i < f.args.size() && f.args[i].whole_range))
        v.push_back(Bad::Square);
    return v;
}

// The representative call of f in SI, header flag included (0) for rows.
bool base_case(const cat::Function& f, Case& c) {
    c = make_case(f, "SI", false, 0.5);
    if (has_error(call(f, to_tables(c)))) c = make_case(f, "SI", false, 1.0);
    if (has_error(call(f, to_tables(c)))) return false;
    if (f.kind == cat::ResultKind::Row && !f.args.empty() && f.args.back().name == "header")
        c.args.push_back(Arg{false, 0.0, ""});
    return true;
}

// Watches the case under way; names it and ends the binary (the office's own
// watchdog then kills the office and removes its profile) if it hangs.
class HangWatch {
public:
    HangWatch() : thread_([this] { run(); }) {}
    ~HangWatch() {
        {
            std::lock_guard<std::mutex> l(m_);
            stop_ = true;
        }
        cv_.notify_all();
        thread_.join();
    }
    void start(const std::string& what) {
        std::lock_guard<std::mutex> l(m_);
        what_ = what;
        since_ = std::chrono::steady_clock::now();
        busy_ = true;
    }
    void done() {
        std::lock_guard<std::mutex> l(m_);
        busy_ = false;
    }

private:
    void run() {
        std::unique_lock<std::mutex> l(m_);
        while (!stop_) {
            cv_.wait_for(l, std::chrono::seconds(1));
            if (busy_ && std::chrono::steady_clock::now() - since_ > std::chrono::seconds(kCaseSeconds)) {
                std::fprintf(stderr, "sweep: HANG: %s took more than %d s; ending the test\n", what_.c_str(),
                             kCaseSeconds);
                std::fflush(stderr);
                std::_Exit(3);
            }
        }
    }
    std::mutex m_;
    std::condition_variable cv_;
    std::string what_;
    std::chrono::steady_clock::time_point since_;
    bool busy_ = false, stop_ = false;
    std::thread thread_;
};

std::string describe(const cat::Function& f, std::size_t i, Bad b) {
    const std::string arg = i < f.args.size() ? f.args[i].name : "#" + std::to_string(i + 1);
    return f.name + " with " + arg + " = " + bad_name(b);
}

TEST_F(SweepTest, EveryArgumentOfEveryFunctionWithBadValues) {
    const auto t0 = std::chrono::steady_clock::now();
    HangWatch watch;
    int functions = 0, arguments = 0, cases = 0, errors = 0, numbers = 0, texts = 0, explained = 0, squares = 0;
    int row = 0;

    for (const cat::Function& f : cat::functions()) {
        if (f.args.empty()) continue;  // STEAM.VERSION
        Case base;
        if (!base_case(f, base)) {
            ADD_FAILURE() << f.name << ": its representative arguments are not valid (representative_args.hxx)";
            continue;
        }
        ++functions;
        for (std::size_t i = 0; i < base.args.size(); ++i) {
            ++arguments;
            for (Bad b : bad_values(f, i, base)) {
                const std::string what = describe(f, i, b);
                const int r = row;
                row += b == Bad::Square ? 2 : 1;
                ++cases;
                // The argument list as formula text; inputs in this row's cells.
                std::vector<std::string> refs;
                std::string other_range;  // wrong shape: another numeric argument as a 1x2 range
                for (std::size_t k = 0; k < base.args.size(); ++k) {
                    const Arg& a = base.args[k];
                    const std::string cell = addr(kArgCol + static_cast<int>(k), r);
                    if (k != i) {
                        if (a.is_text) refs.push_back(quote(a.text));
                        else {
                            number(cell, a.number);
                            refs.push_back(cell);
                        }
                        continue;
                    }
                    switch (b) {
                        case Bad::Text: text(cell, "abc"); refs.push_back(cell); break;
                        case Bad::Blank: refs.push_back(cell); break;  // left empty
                        case Bad::ErrorCell: formula(cell, "=1/0"); refs.push_back(cell); break;
                        case Bad::WrongUnits: text(cell, "furlongs"); refs.push_back(cell); break;
                        case Bad::NumberForText: number(cell, 5.0); refs.push_back(cell); break;
                        case Bad::WrongShape: {
                            for (int q = 0; q < 3; ++q) number(addr(kShapeCol + q, r), a.number);
                            refs.push_back(addr(kShapeCol, r) + ":" + addr(kShapeCol + 2, r));
                            break;
                        }
                        case Bad::Square: {
                            const double f4[4] = {1.0, 1.001, 0.999, 1.002};
                            for (int q = 0; q < 4; ++q) number(addr(kSquareCol + q % 2, r + q / 2), a.number * f4[q]);
                            refs.push_back(addr(kSquareCol, r) + ":" + addr(kSquareCol + 1, r + 1));
                            break;
                        }
                        default: number(cell, bad_number(b)); refs.push_back(cell); break;
                    }
                }
                if (b == Bad::WrongShape) {  // the first other numeric argument becomes a 1x2 range
                    for (std::size_t k = 0; k < base.args.size(); ++k) {
                        if (k == i || base.args[k].is_text || (k < f.args.size() && (f.args[k].whole_range ||
                                                                                     is_header(f, k))))
                            continue;
                        for (int q = 0; q < 2; ++q) number(addr(kShapeCol + 3 + q, r), base.args[k].number);
                        refs[k] = addr(kShapeCol + 3, r) + ":" + addr(kShapeCol + 4, r);
                        break;
                    }
                }
                std::string list;
                for (std::size_t k = 0; k < refs.size(); ++k) list += (k ? ";" : "") + refs[k];
                const std::string call_text = "=" + f.name + "(" + list + ")";
                const int width = f.kind == cat::ResultKind::Row ? static_cast<int>(f.row_names.size()) : 1;

                watch.start(what + ": " + call_text);
                try {
                    if (b == Bad::Square)
                        array_formula(addr(kResultCol, r) + ":" + addr(kResultCol + 1, r + 1), call_text);
                    else if (width > 1)
                        array_formula(addr(kResultCol, r) + ":" + addr(kResultCol + width - 1, r), call_text);
                    else
                        formula(addr(kResultCol, r), call_text);
                    if (b != Bad::ErrorCell && b != Bad::Square && f.name != "STEAM.EXPLAIN")
                        formula(addr(kExplainCol, r), "=STEAM.EXPLAIN(" + quote(f.name) + ";" + list + ")");
                    if (b == Bad::Square) {
                        for (int q = 0; q < 4; ++q) {
                            std::string l1;
                            for (std::size_t k = 0; k < refs.size(); ++k)
                                l1 += (k ? ";" : "") +
                                      (k == i ? addr(kSquareCol + q % 2, r + q / 2) : refs[k]);
                            formula(addr(kScalarCol + q % 2, r + q / 2), "=" + f.name + "(" + l1 + ")");
                        }
                    }
                } catch (const std::exception& e) {
                    watch.done();
                    FAIL() << "the office failed (crashed?) in the case " << what << ": " << call_text << ": "
                           << e.what();
                }
                watch.done();

                // Read back.
                bool any_number = false, all_error = true, any_text = false;
                if (b == Bad::Square) {
                    ++squares;
                    for (int q = 0; q < 4; ++q) {
                        const std::string a = addr(kResultCol + q % 2, r + q / 2);
                        const std::string s = addr(kScalarCol + q % 2, r + q / 2);
                        const bool ea = error(a) != NoError, es = error(s) != NoError;
                        EXPECT_EQ(ea, es) << what << ", element " << q << ": the array shows " << string(a)
                                          << ", the scalar call " << string(s) << " (" << call_text << ")";
                        if (!ea && !es)
                            EXPECT_EQ(value(a), value(s)) << what << ", element " << q << " (" << call_text << ")";
                    }
                    continue;
                }
                for (int w = 0; w < width; ++w) {
                    const std::string a = addr(kResultCol + w, r);
                    if (error(a) != NoError) continue;
                    all_error = false;
                    // A text result has the value 0 and shows something else than "0".
                    const std::string s = string(a);
                    if (value(a) == 0.0 && s != "0") any_text = true;
                    else any_number = true;
                }
                if (all_error) ++errors;
                else if (any_number) ++numbers;
                else if (any_text) ++texts;

                const Expect e = rules(f, i, b);
                if (e == Expect::Error)
                    EXPECT_TRUE(all_error) << what << " gives " << string(addr(kResultCol, r))
                                           << " where the rules say error: " << call_text;
                if (e == Expect::Text)
                    EXPECT_FALSE(all_error) << what << " gives " << string(addr(kResultCol, r))
                                            << " where STEAM.EXPLAIN must give a sentence: " << call_text;

                // The explanation.
                if (b != Bad::ErrorCell && f.name != "STEAM.EXPLAIN") {
                    const std::string ex = addr(kExplainCol, r);
                    const std::string sentence = string(ex);
                    EXPECT_EQ(error(ex), NoError) << what << ": STEAM.EXPLAIN itself fails: " << sentence;
                    if (all_error) {
                        EXPECT_TRUE(!sentence.empty() && sentence.rfind("OK", 0) != 0)
                            << what << ": the error is not explained (" << sentence << "): " << call_text;
                        ++explained;
                    } else {
                        EXPECT_EQ(sentence.rfind("OK", 0), 0u)
                            << what << ": a result, but STEAM.EXPLAIN says: " << sentence << ": " << call_text;
                    }
                }
            }
        }
    }
    const double seconds = std::chrono::duration<double>(std::chrono::steady_clock::now() - t0).count();
    std::cout << "[ sweep    ] " << functions << " functions, " << arguments << " arguments, " << cases
              << " bad-input cases in " << seconds << " s: " << errors << " errors (" << explained
              << " explained by STEAM.EXPLAIN), " << numbers << " numbers where a number may be right, " << texts
              << " texts, " << squares << " 2x2 ranges compared with the scalar calls\n";
    EXPECT_GT(functions, 150);
}

}  // namespace
}  // namespace isentra::calctest
