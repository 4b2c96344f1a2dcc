// SPDX-License-Identifier: MPL-2.0
// Tests of call texts (formula.hpp): the parser and its error messages,
// evaluation through call(), and the one-line output format of the CLI.
#include <gtest/gtest.h>

#include <clocale>
#include <cmath>
#include <cstdlib>
#include <string>

#include "isentra/surface/formula.hpp"

using isentra::ErrorCode;
using isentra::Table;
using isentra::Value;
namespace fm = isentra::formula;

namespace {

fm::ParsedCall ok(const std::string& text) {
    try {
        return fm::parse(text);
    } catch (const fm::ParseError& e) {
        ADD_FAILURE() << "parse(" << text << ") failed: " << e.what();
    }
    return {};
}

// Parses text expecting a ParseError; returns it (position npos if none was thrown).
struct Failure {
    std::size_t position = std::string::npos;
    std::string detail, what;
    ErrorCode code = ErrorCode::OutOfRange;
};
Failure bad(const std::string& text) {
    Failure f;
    try {
        fm::parse(text);
        ADD_FAILURE() << "parse(" << text << ") succeeded";
    } catch (const fm::ParseError& e) {
        f.position = e.position();
        f.detail = e.detail();
        f.what = e.what();
        f.code = e.code();
    }
    return f;
}

void expect_bad(const std::string& text, std::size_t position, const std::string& words) {
    const Failure f = bad(text);
    EXPECT_EQ(f.position, position) << text << " -> " << f.what;
    EXPECT_NE(f.detail.find(words), std::string::npos) << text << " -> " << f.what;
    EXPECT_EQ(f.what, "at column " + std::to_string(position + 1) + ": " + f.detail);
    EXPECT_EQ(f.code, ErrorCode::InvalidArgument);
}

double num(const Table& t, std::size_t k = 0) {
    EXPECT_LT(k, t.cells.size());
    if (k >= t.cells.size()) return NAN;
    const Value& v = t.cells[k];
    EXPECT_EQ(v.kind, Value::Kind::Number) << v.text;
    return v.number;
}

double value_of(const std::string& text) {
    const Table t = fm::evaluate(text);
    EXPECT_EQ(t.cells.size(), 1u) << text;
    return num(t);
}

std::string error_of(const std::string& text) {
    const Table t = fm::evaluate(text);
    if (t.cells.size() != 1 || t.cells[0].kind != Value::Kind::Error) {
        ADD_FAILURE() << text << " gave no single error: " << fm::format_line(t);
        return {};
    }
    return t.cells[0].text;
}

bool contains(const std::string& s, const std::string& part) { return s.find(part) != std::string::npos; }

}  // namespace

// ---- Names ------------------------------------------------------------------------------

TEST(FormulaParse, NameWithOrWithoutPrefixAnyCase) {
    for (const char* text : {"STEAM.H.PT(3;300)", "H.PT(3;300)", "h.pt(3;300)", "Steam.h.Pt(3;300)", "=H.PT(3;300)",
                             "  = steam.H.PT (3;300)  "}) {
        const fm::ParsedCall c = ok(text);
        ASSERT_NE(c.function, nullptr) << text;
        EXPECT_EQ(c.function->name, "STEAM.H.PT") << text;
        EXPECT_EQ(c.args.size(), 2u) << text;
    }
}

TEST(FormulaParse, NoArguments) {
    EXPECT_EQ(ok("STEAM.VERSION()").args.size(), 0u);
    EXPECT_EQ(ok("version(  )").args.size(), 0u);
    EXPECT_EQ(ok("VERSION ( ) ").function->name, "STEAM.VERSION");
}

// ---- Numbers ----------------------------------------------------------------------------

TEST(FormulaParse, NumbersInTheCLocale) {
    const struct {
        const char* text;
        double value;
    } cases[] = {
        {"1", 1.0},         {"-3.5", -3.5},   {"+2", 2.0},     {"1.2e-3", 1.2e-3}, {"1E+3", 1000.0},
        {"2e2", 200.0},     {".5", 0.5},      {"5.", 5.0},     {"5.e1", 50.0},     {"- 4", -4.0},
        {"0.1", 0.1},       {"-0", -0.0},     {"007", 7.0},    {"1e-320", 1e-320}, {"123456789.125", 123456789.125},
        {"0.30000000000000004", 0.30000000000000004},
    };
    for (const auto& c : cases) {
        const fm::ParsedCall p = ok(std::string("TSAT(") + c.text + ")");
        ASSERT_EQ(p.args.size(), 1u) << c.text;
        ASSERT_EQ(p.args[0].cells[0].kind, Value::Kind::Number) << c.text;
        EXPECT_EQ(p.args[0].cells[0].number, c.value) << c.text;  // exact: correctly rounded
    }
    EXPECT_TRUE(std::signbit(ok("TSAT(-0)").args[0].cells[0].number));
}

TEST(FormulaParse, CommaIsASeparatorNeverADecimalMark) {
    const fm::ParsedCall c = ok("H.PT(3,5)");
    ASSERT_EQ(c.args.size(), 2u);
    EXPECT_EQ(c.args[0].cells[0].number, 3.0);
    EXPECT_EQ(c.args[1].cells[0].number, 5.0);
    const fm::ParsedCall m = ok("H.PT(3.5, 300; \"US\")");  // separators may be mixed
    ASSERT_EQ(m.args.size(), 3u);
    EXPECT_EQ(m.args[0].cells[0].number, 3.5);
    EXPECT_EQ(m.args[2].cells[0].text, "US");
}

// ---- Texts, TRUE/FALSE --------------------------------------------------------------------

TEST(FormulaParse, TextsWithDoubledQuotes) {
    const fm::ParsedCall c = ok(R"(CONVERT(1; "a""b"; "x;y, z"))");
    ASSERT_EQ(c.args.size(), 3u);
    EXPECT_EQ(c.args[1].cells[0].kind, Value::Kind::Text);
    EXPECT_EQ(c.args[1].cells[0].text, "a\"b");
    EXPECT_EQ(c.args[2].cells[0].text, "x;y, z");  // separators inside a text are text
    const fm::ParsedCall e = ok(R"(H.PT(3; 300; ""))");
    ASSERT_EQ(e.args.size(), 3u);
    EXPECT_EQ(e.args[2].cells[0].kind, Value::Kind::Text);  // an empty text, not an empty cell
    EXPECT_EQ(e.args[2].cells[0].text, "");
    EXPECT_EQ(ok(R"(EXPLAIN("""";1))").args[0].cells[0].text, "\"");
    EXPECT_EQ(ok("EXPLAIN(\"  \xC2\xB0\x46  \";1)").args[0].cells[0].text, "  \xC2\xB0\x46  ");  // kept as written
}

TEST(FormulaParse, TrueAndFalseAreOneAndZero) {
    const fm::ParsedCall c = ok("STATE.PT(3; 300; \"SI\"; TRUE)");
    ASSERT_EQ(c.args.size(), 4u);
    EXPECT_EQ(c.args[3].cells[0].kind, Value::Kind::Number);
    EXPECT_EQ(c.args[3].cells[0].number, 1.0);
    EXPECT_EQ(ok("STATE.PT(3; 300; ; false)").args[3].cells[0].number, 0.0);
    EXPECT_EQ(ok("STATE.PT(3; 300; ; True)").args[3].cells[0].number, 1.0);
}

// ---- Empty arguments ----------------------------------------------------------------------

TEST(FormulaParse, TrailingEmptyOptionalArgumentsAreOmitted) {
    EXPECT_EQ(ok("H.PT(3; 300; )").args.size(), 2u);     // units omitted
    EXPECT_EQ(ok("STATE.PT(3; 300;;)").args.size(), 2u);  // units and header omitted
    const fm::ParsedCall c = ok("STATE.PT(3; 300;; 1)");  // an empty units text before a header: kept, empty
    ASSERT_EQ(c.args.size(), 4u);
    EXPECT_EQ(c.args[2].cells[0].kind, Value::Kind::Empty);
}

TEST(FormulaParse, EmptyRequiredArgumentsStayEmptyCells) {
    const fm::ParsedCall a = ok("H.PT(3;)");
    ASSERT_EQ(a.args.size(), 2u);
    EXPECT_EQ(a.args[1].cells[0].kind, Value::Kind::Empty);
    const fm::ParsedCall b = ok("H.PT( ; 300)");
    ASSERT_EQ(b.args.size(), 2u);
    EXPECT_EQ(b.args[0].cells[0].kind, Value::Kind::Empty);
    EXPECT_EQ(ok("H.PT(3; 300; \"SI\";)").args.size(), 4u);  // beyond the last argument: kept (call() counts it)
    EXPECT_EQ(ok("EXPLAIN(\"H.PT\"; 3;)").args.size(), 3u);   // variable arguments are never dropped
}

// ---- Arrays -------------------------------------------------------------------------------

TEST(FormulaParse, InlineArrays) {
    const Table col = ok("TSAT({1; 2; 3})").args.at(0);
    EXPECT_EQ(col.rows, 3u);
    EXPECT_EQ(col.cols, 1u);
    EXPECT_EQ(col.at(2, 0).number, 3.0);
    const Table row = ok("TSAT({1, 2, 3})").args.at(0);
    EXPECT_EQ(row.rows, 1u);
    EXPECT_EQ(row.cols, 3u);
    const Table sq = ok("TSAT( { 1 , 2 ; 3 , -4e0 } )").args.at(0);
    ASSERT_EQ(sq.rows, 2u);
    ASSERT_EQ(sq.cols, 2u);
    ASSERT_EQ(sq.cells.size(), 4u);
    EXPECT_EQ(sq.at(0, 1).number, 2.0);
    EXPECT_EQ(sq.at(1, 0).number, 3.0);
    EXPECT_EQ(sq.at(1, 1).number, -4.0);
    const Table mixed = ok(R"(EXPLAIN("H.PT"; {"a"; TRUE; 2}))").args.at(1);
    ASSERT_EQ(mixed.cells.size(), 3u);
    EXPECT_EQ(mixed.cells[0].kind, Value::Kind::Text);
    EXPECT_EQ(mixed.cells[1].number, 1.0);
    const Table one = ok("TSAT({5})").args.at(0);
    EXPECT_EQ(one.rows * one.cols, 1u);
}

// ---- Parse errors: position and what was expected ------------------------------------------

TEST(FormulaParseErrors, CallStructure) {
    expect_bad("", 0, "expected a function call");
    expect_bad("   ", 3, "expected a function call");
    expect_bad("3(1)", 0, "expected a function name");
    expect_bad("FOO(1)", 0, "there is no function \"FOO\"");
    expect_bad("  STEAM.NOPE.PT(1)", 2, "there is no function \"STEAM.NOPE.PT\"");
    expect_bad("H.PT", 4, "expected '(' after STEAM.H.PT");
    expect_bad("H.PT 3", 5, "found '3'");
    expect_bad("H.PT(1;2", 8, "the call ends before its closing ')'");
    expect_bad("H.PT(1;", 7, "the call ends before its closing ')'");
    expect_bad("H.PT(1;2))", 9, "unexpected ')' after the closing ')'");
    expect_bad("H.PT(1;2) x", 10, "unexpected 'x'");
    expect_bad("H.PT(1 2)", 7, "expected ';', ',' or ')' after argument 1, found '2'");
    expect_bad("H.PT(1;2 3)", 9, "after argument 2");
}

TEST(FormulaParseErrors, Arguments) {
    expect_bad("H.PT(1;\"abc)", 7, "the text has no closing '\"'");
    expect_bad("H.PT(1e;2)", 6, "expected digits in the exponent");
    expect_bad("H.PT(1e+;2)", 6, "expected digits in the exponent");
    expect_bad("H.PT(-;2)", 6, "expected a number after '-'");
    expect_bad("H.PT(.;2)", 5, "found only '.'");
    expect_bad("H.PT(1e999;2)", 5, "outside the range of double-precision numbers");
    expect_bad("H.PT(A1;2)", 5, "found the word \"A1\"");
    expect_bad("H.PT(H.PT(1;2);2)", 5, "nested functions are not available");
    expect_bad("H.PT(3+1;2)", 6, "expressions are not evaluated");
    expect_bad("H.PT(3*1;2)", 6, "expressions are not evaluated");
    expect_bad("H.PT(3 MPa;2)", 7, "the units argument sets them");
    expect_bad("H.PT(3;300degC)", 10, "the units argument sets them");
    expect_bad("H.PT(3;300;'US')", 11, "texts are written in double quotes");
    expect_bad("H.PT(3;300;@)", 11, "expected a number, a \"text\", TRUE, FALSE or an {array} as argument 3");
    expect_bad("H.PT(3;\x01)", 7, "the byte 0x01");
    expect_bad("H.PT(3;\xC3\xA9)", 7, "'\xC3\xA9'");
}

TEST(FormulaParseErrors, Arrays) {
    expect_bad("TSAT({})", 6, "the array is empty");
    expect_bad("TSAT({1;{2}})", 8, "cannot contain another array");
    expect_bad("TSAT({1,2;3})", 10, "row 1 has 2, row 2 has 1");
    expect_bad("TSAT({1;2,3})", 8, "row 1 has 1, row 2 has 2");
    expect_bad("TSAT({1;2", 5, "the array has no closing '}'");
    expect_bad("TSAT({1;", 5, "the array has no closing '}'");
    expect_bad("TSAT({1;;2})", 8, "as an element of the array");
    expect_bad("TSAT({1 2})", 8, "expected ',' (next column), ';' (next row) or '}'");
    expect_bad("TSAT({A1})", 6, "found the word \"A1\"");
}

TEST(FormulaParseErrors, AreIsentraErrors) {
    try {
        fm::parse("H.PT(");
        FAIL() << "no error";
    } catch (const isentra::Error& e) {  // ParseError is an isentra::Error
        EXPECT_EQ(e.code(), ErrorCode::InvalidArgument);
        EXPECT_STREQ(e.what(), "at column 6: the call ends before its closing ')'");
    }
}

// ---- Evaluation -----------------------------------------------------------------------------

TEST(FormulaEvaluate, ValuesFromTheReleaseTables) {
    // h(3 MPa, 300 K) = 0.115331273e3 kJ/kg: IAPWS R7-97(2012) Table 5.
    EXPECT_NEAR(value_of("STEAM.H.PT(3; 300; \"K\")"), 115.331273, 5e-7);
    EXPECT_NEAR(value_of("h.pt(3, 300, \"SI T=K\")"), 115.331273, 5e-7);
    // The same state in the default SI units (degC): 300 K = 26.85 degC.
    EXPECT_NEAR(value_of("H.PT(3; 26.85)"), 115.331273, 5e-7);
    // s(3 MPa, 500 K) = 0.258041912e1 kJ/(kg K): IAPWS R7-97(2012) Table 5.
    EXPECT_NEAR(value_of("S.PT(3; 500; \"K\")"), 2.58041912, 5e-9);
    // psat(300 K) = 0.353658941e-2 MPa: IAPWS R7-97(2012) Table 35; in kPa and degC.
    EXPECT_NEAR(value_of("PSAT(300; \"K\")"), 0.353658941e-2, 5e-12);
    EXPECT_NEAR(value_of("PSAT(26.85; \"KPA\")"), 3.53658941, 5e-9);
}

TEST(FormulaEvaluate, UsUnits) {
    // h(3 MPa, 300 K) = 115.331273 kJ/kg (IAPWS R7-97(2012) Table 5) in US units, with the exact
    // factors of NIST SP 811: 1 psi = 6894.757293168361 Pa, degF = 1.8 degC + 32, 1 Btu/lbm = 2.326 kJ/kg.
    const double p_psia = 3e6 / 6894.757293168361;
    const double T_degF = 26.85 * 1.8 + 32.0;  // 80.33 degF
    const std::string text = "H.PT(" + fm::format_number(p_psia) + "; " + fm::format_number(T_degF) + "; \"US\")";
    EXPECT_NEAR(value_of(text), 115.331273 / 2.326, 5e-7 / 2.326);
}

TEST(FormulaEvaluate, ArraysBroadcast) {
    // Table 5 of IAPWS R7-97(2012): h(3 MPa, 300 K) = 0.115331273e3, h(80 MPa, 300 K) = 0.184142828e3,
    // h(3 MPa, 500 K) = 0.975542239e3 kJ/kg.
    const Table t = fm::evaluate("H.PT({3; 80; 3}; {300; 300; 500}; \"K\")");
    ASSERT_EQ(t.rows, 3u);
    ASSERT_EQ(t.cols, 1u);
    EXPECT_NEAR(num(t, 0), 115.331273, 5e-7);
    EXPECT_NEAR(num(t, 1), 184.142828, 5e-7);
    EXPECT_NEAR(num(t, 2), 975.542239, 5e-7);
    const Table r = fm::evaluate("H.PT(3; {300, 500}; \"K\")");
    ASSERT_EQ(r.rows, 1u);
    ASSERT_EQ(r.cols, 2u);
    EXPECT_NEAR(num(r, 1), 975.542239, 5e-7);
}

TEST(FormulaEvaluate, ErrorsComeBackAsValues) {
    EXPECT_TRUE(contains(error_of("H.PT(200; 500)"), "200 MPa"));           // out of range, in the user's units
    EXPECT_TRUE(contains(error_of("H.PT(3;)"), "the argument T is empty"));  // from call()
    EXPECT_TRUE(contains(error_of("H.PT(3; 300; \"SI\"; 1)"), "takes 2 to 3 arguments, not 4"));
    EXPECT_TRUE(contains(error_of("H.PT(3)"), "takes 2 to 3 arguments, not 1"));
    EXPECT_TRUE(contains(error_of("H.PT(3; \"x\")"), "where a number is expected"));
    EXPECT_TRUE(contains(error_of("H.PT(3; 300; \"furlongs\")"), "furlongs"));
    EXPECT_EQ(error_of("H.PT(3; 300"), "at column 12: the call ends before its closing ')'");
    EXPECT_EQ(error_of("NOPE()"), "at column 1: there is no function \"NOPE\"");
}

TEST(FormulaEvaluate, TextResults) {
    const Table v = fm::evaluate("STEAM.VERSION()");
    ASSERT_EQ(v.cells.size(), 1u);
    EXPECT_EQ(v.cells[0].kind, Value::Kind::Text);
    EXPECT_EQ(v.cells[0].text, std::string("Isentra ") + isentra::catalogue::version());
    const Table e = fm::evaluate("EXPLAIN(\"H.PT\"; 200; 500)");
    ASSERT_EQ(e.cells.size(), 1u);
    EXPECT_EQ(e.cells[0].kind, Value::Kind::Text);
    EXPECT_TRUE(contains(e.cells[0].text, "200 MPa")) << e.cells[0].text;
    // 150 psig = 150 psi + 101325 Pa / 6894.757293168361 Pa/psi (standard atmosphere and psi: NIST SP 811).
    EXPECT_NEAR(fm::evaluate("CONVERT(150; \"psig\"; \"psia\")").cells.at(0).number,
                150.0 + 101325.0 / 6894.757293168361, 1e-12);
}

TEST(FormulaEvaluate, RowResults) {
    const Table t = fm::evaluate("STATE.PT(3; 300; \"K\")");
    EXPECT_EQ(t.rows, 1u);
    EXPECT_EQ(t.cols, 13u);
    const Table h = fm::evaluate("STATE.PT(3; 300; \"K\"; TRUE)");
    EXPECT_EQ(h.rows, 2u);  // header row + values
}

// ---- Output ----------------------------------------------------------------------------------

TEST(FormulaFormat, SeventeenSignificantDigits) {
    EXPECT_EQ(fm::format_number(0.1), "0.10000000000000001");
    EXPECT_EQ(fm::format_number(115.33127302143866), "115.33127302143866");
    EXPECT_EQ(fm::format_number(1.0 / 3.0), "0.33333333333333331");
    EXPECT_EQ(fm::format_number(300.0), "300");  // %.17g drops trailing zeros
    EXPECT_EQ(fm::format_number(-2.5e-5), "-2.5000000000000001e-05");
    EXPECT_EQ(fm::format_number(1e21), "1e+21");
    EXPECT_EQ(fm::format_number(-0.0), "-0");
    // 17 significant digits always read back to the same double.
    for (double x : {0.1, 2.0 / 3.0, 6.02214076e23, 1.7976931348623157e308, 4.9406564584124654e-324, 115.331273})
        EXPECT_EQ(std::strtod(fm::format_number(x).c_str(), nullptr), x);
}

TEST(FormulaFormat, IndependentOfTheProcessLocale) {
    const char* old = std::setlocale(LC_NUMERIC, nullptr);
    const std::string saved = old ? old : "C";
    const char* found = nullptr;
    for (const char* name : {"de_DE.UTF-8", "de_DE.utf8", "fr_FR.UTF-8", "fr_FR.utf8", "de_DE", "fr_FR"})
        if ((found = std::setlocale(LC_NUMERIC, name))) break;
    if (!found) {
        // None installed (a minimal machine): compile one into a private
        // directory with glibc's localedef (Debian package locales) and point
        // LOCPATH at it; nothing outside the build tree changes.
        const std::string dir = std::string(ISENTRA_TEST_BINARY_DIR) + "/locale";
        const std::string cmd = "mkdir -p '" + dir + "' && localedef -i de_DE -f UTF-8 '" + dir +
                                "/de_DE.UTF-8' >/dev/null 2>&1";
        if (std::system(cmd.c_str()) >= 0) {
            ::setenv("LOCPATH", dir.c_str(), 1);
            found = std::setlocale(LC_NUMERIC, "de_DE.UTF-8");
        }
    }
    if (!found) GTEST_SKIP() << "no locale with a decimal comma installed, and localedef could not make one";
    ASSERT_EQ(std::localeconv()->decimal_point[0], ',');  // the process now has a decimal comma
    EXPECT_EQ(fm::format_number(0.5), "0.5");
    EXPECT_EQ(ok("TSAT(0.5)").args[0].cells[0].number, 0.5);
    std::setlocale(LC_NUMERIC, saved.c_str());
}

TEST(FormulaFormat, OneLine) {
    EXPECT_EQ(fm::format_line(Table::scalar(Value::of(0.1))), "0.10000000000000001");
    EXPECT_EQ(fm::format_line(Table::scalar(Value::of_text("a\tb\r\nc"))), "a b  c");
    EXPECT_EQ(fm::format_line(Table::scalar(Value::of_error(ErrorCode::OutOfRange, "p is too high"))),
              "error: p is too high");
    EXPECT_EQ(fm::format_line(Table::scalar(Value{})), "");

    Table row;
    row.rows = 1;
    row.cols = 3;
    row.cells = {Value::of(1.5), Value::of_error(ErrorCode::NotDefined, "cp is not defined\nhere"), Value::of(2)};
    EXPECT_EQ(fm::format_line(row), "1.5\terror: cp is not defined here\t2");

    Table same = row;  // every element the same error: said once
    same.cells.assign(3, Value::of_error(ErrorCode::OutOfRange, "T is out of range"));
    EXPECT_EQ(fm::format_line(same), "error: T is out of range");

    Table sq;  // a 2x2 range, row-major, an empty cell as an empty field
    sq.rows = 2;
    sq.cols = 2;
    sq.cells = {Value::of(1), Value::of(2), Value{}, Value::of_text("x")};
    EXPECT_EQ(fm::format_line(sq), "1\t2\t\tx");
}

TEST(FormulaFormat, RowResultIsOneLineOfThirteenFields) {
    const std::string line = fm::format_line(fm::evaluate("STATE.PT(3; 300; \"K\")"));
    EXPECT_EQ(line.find('\n'), std::string::npos);
    std::size_t tabs = 0;
    for (char c : line) tabs += c == '\t';
    EXPECT_EQ(tabs, 12u) << line;
    EXPECT_EQ(line.rfind("error:", 0), std::string::npos) << line;
    // Out of range: one error for the whole row.
    const std::string err = fm::format_line(fm::evaluate("STATE.PT(300; 300)"));
    EXPECT_EQ(err.rfind("error: ", 0), 0u) << err;
    EXPECT_EQ(err.find('\t'), std::string::npos) << err;
}
