// SPDX-License-Identifier: MPL-2.0
// The whole spreadsheet surface in a real (headless) Calc: every catalogue
// function once in SI and once in US units against the core evaluated in
// this process (isentra::call) on the same arguments; error values and their
// explanations; arrays; the units argument as a cell; unit conversions.
#include <cmath>
#include <cstdio>
#include <iostream>
#include <map>
#include <set>
#include <string>
#include <vector>

#include "isentra/surface/call.hpp"
#include "isentra/surface/catalogue.hpp"
#include "isentra/units/units.hpp"
#include "calc_test.hxx"
#include "representative_args.hxx"

namespace isentra::calctest {
namespace {

using SurfaceTest = CalcTest;
namespace cat = isentra::catalogue;

using namespace representative;

TEST_F(SurfaceTest, EveryCatalogueFunctionInSIAndUSMatchesTheCore) {
    const auto& fs = cat::functions();
    ASSERT_FALSE(fs.empty());

    struct Placed {
        const cat::Function* f;
        std::string units;
        Table expected;
        int row;  // first row of the result
        bool fallback;
    };
    std::vector<Placed> placed;
    constexpr int result_col = 20;  // results from column U; inputs in A..T
    int row = 0;
    int skipped = 0;
    for (const cat::Function& f : fs) {
        if (skip_list().count(f.name)) {
            ++skipped;
            continue;
        }
        for (const std::string units : {"SI", "US"}) {
            const bool header = units == "US";
            Case c = make_case(f, units, header, 0.5);
            Table expected = call(f, to_tables(c));
            if (has_error(expected)) {  // a wet state is not defined for this property: saturated vapour
                Case c1 = make_case(f, units, header, 1.0);
                Table e1 = call(f, to_tables(c1));
                if (!has_error(e1)) {
                    c = c1;
                    c.fallback_x1 = true;
                    expected = e1;
                }
            }
            ASSERT_FALSE(has_error(expected))
                << f.name << " (" << units << "): the representative arguments are not valid: "
                << expected.cells[0].text << " (add an override)";
            ASSERT_LE(c.args.size(), static_cast<std::size_t>(result_col));
            std::string fm = "=" + f.name + "(";
            for (std::size_t i = 0; i < c.args.size(); ++i) {
                if (i) fm += ";";
                if (c.args[i].is_text) {
                    fm += quote(c.args[i].text);
                } else {
                    number(addr(static_cast<int>(i), row), c.args[i].number);  // the exact double
                    fm += addr(static_cast<int>(i), row);
                }
            }
            fm += ")";
            const int nr = static_cast<int>(expected.rows), nc = static_cast<int>(expected.cols);
            if (f.kind == cat::ResultKind::Row || nr != 1 || nc != 1)
                array_formula(addr(result_col, row) + ":" + addr(result_col + nc - 1, row + nr - 1), fm);
            else
                formula(addr(result_col, row), fm);
            placed.push_back(Placed{&f, units, expected, row, c.fallback_x1});
            row += std::max(nr, 1);
        }
    }
    recalc();

    int checked = 0, elements = 0, fallbacks = 0;
    std::set<std::string> names;
    for (const Placed& p : placed) {
        const std::string what = p.f->name + " (" + p.units + ")";
        bool ok = true;
        for (std::size_t r = 0; r < p.expected.rows; ++r) {
            for (std::size_t c = 0; c < p.expected.cols; ++c) {
                const std::string a = addr(result_col + static_cast<int>(c), p.row + static_cast<int>(r));
                const Value& e = p.expected.at(r, c);
                const std::string w = what + " at " + a + " (row " + std::to_string(r) + ", column " +
                                      std::to_string(c) + ")";
                ++elements;
                if (error(a) != NoError) {
                    ADD_FAILURE() << w << " shows " << string(a) << " (error " << error(a) << ")";
                    ok = false;
                    continue;
                }
                switch (e.kind) {
                case Value::Kind::Number:
                    expect_rel(value(a), e.number, 1e-12, w);
                    if (std::fabs(value(a) - e.number) > std::fabs(e.number) * 1e-12) ok = false;
                    break;
                case Value::Kind::Text:
                    EXPECT_EQ(string(a), e.text) << w;
                    if (string(a) != e.text) ok = false;
                    break;
                case Value::Kind::Empty:
                    EXPECT_EQ(string(a), "") << w;
                    break;
                case Value::Kind::Error:
                    break;  // excluded above
                }
            }
        }
        if (ok) ++checked;
        if (p.fallback) ++fallbacks;
        names.insert(p.f->name);
    }
    std::cout << "[ surface  ] " << fs.size() << " catalogue functions, " << names.size() << " checked in Calc, "
              << checked << " of " << placed.size() << " SI/US calls equal to the core (" << elements
              << " cells), " << fallbacks << " calls with x = 1 instead of 0.5, " << skipped << " skipped\n";
    EXPECT_EQ(names.size() + static_cast<std::size_t>(skipped), fs.size());
    EXPECT_EQ(checked, static_cast<int>(placed.size()));
    EXPECT_EQ(placed.size(), 2 * names.size());
}

// ---- error values and their explanations ----------------------------------------

TEST_F(SurfaceTest, ErrorsShowErr502AndExplainGivesTheSentenceInTheUsersUnits) {
    // Above the IF97 upper pressure limit of 100 MPa (IAPWS R7-97(2012), section 1 "range of
    // validity"): 200 MPa, and 29007.5 psia (= 200 MPa) in US units.
    number("A1", 200.0);
    number("B1", 400.0);
    formula("C1", "=STEAM.H.PT(A1;B1;\"SI\")");
    formula("D1", "=STEAM.EXPLAIN(\"H.PT\";A1;B1;\"SI\")");
    number("A2", 29007.5);
    number("B2", 752.0);
    formula("C2", "=STEAM.H.PT(A2;B2;\"US\")");
    formula("D2", "=STEAM.EXPLAIN(\"H.PT\";A2;B2;\"US\")");
    // Unknown units text.
    formula("C3", "=STEAM.H.PT(1;200;\"parsecs\")");
    formula("D3", "=STEAM.EXPLAIN(\"H.PT\";1;200;\"parsecs\")");
    // Text where a number belongs (a text cell).
    text("A4", "ten");
    formula("C4", "=STEAM.H.PT(A4;200)");
    formula("D4", "=STEAM.EXPLAIN(\"H.PT\";A4;200)");
    // An impossible pair: T exactly tsat(p) does not fix the state (IAPWS R7-97(2012) Eq. 31
    // evaluated by the core itself; the sentence asks for x, h or s instead).
    const Value ts = call_scalar(*cat::find("STEAM.TSAT"), {Value::of(1.0)});
    ASSERT_EQ(ts.kind, Value::Kind::Number) << ts.text;
    number("A5", 1.0);
    number("B5", ts.number);
    formula("C5", "=STEAM.H.PT(A5;B5)");
    formula("D5", "=STEAM.EXPLAIN(\"H.PT\";A5;B5)");
    const Value ts_us = call_scalar(*cat::find("STEAM.TSAT"), {Value::of(145.0377), Value::of_text("US")});
    ASSERT_EQ(ts_us.kind, Value::Kind::Number) << ts_us.text;
    number("A6", 145.0377);
    number("B6", ts_us.number);
    formula("C6", "=STEAM.H.PT(A6;B6;\"US\")");
    formula("D6", "=STEAM.EXPLAIN(\"H.PT\";A6;B6;\"US\")");
    // Out of range in a function with many arguments: a turbine efficiency above 1.
    formula("C7", "=STEAM.TURBINE.HOUT.PT(10;500;2;1.5)");
    formula("D7", "=STEAM.EXPLAIN(\"TURBINE.HOUT.PT\";10;500;2;1.5)");
    recalc();

    for (int r = 1; r <= 7; ++r) {
        const std::string c = "C" + std::to_string(r), d = "D" + std::to_string(r);
        EXPECT_EQ(error(c), IllegalArgument) << c << " shows " << string(c);
        EXPECT_EQ(string(c), "Err:502") << c;
        ASSERT_EQ(error(d), NoError) << d << " shows " << string(d);
        EXPECT_EQ(string(d).rfind("OK", 0), std::string::npos) << d << ": " << string(d);
        std::cout << "[ explain  ] " << d << ": " << string(d) << "\n";
    }
    // The sentence names the input and the limit in the user's units:
    // 100 MPa = 100e6 / 6894.757293168361 psia = 14503.77 psia (NIST SP 811 B.8, psi from lbf and in).
    char limit_us[32];
    std::snprintf(limit_us, sizeof limit_us, "%.6g psia", 100.0e6 / 6894.757293168361);
    EXPECT_NE(string("D1").find("p = 200 MPa"), std::string::npos) << string("D1");
    EXPECT_NE(string("D1").find("100 MPa"), std::string::npos) << string("D1");
    EXPECT_NE(string("D2").find("p = 29007.5 psia"), std::string::npos) << string("D2");
    EXPECT_NE(string("D2").find(limit_us), std::string::npos) << string("D2") << " lacks " << limit_us;
    EXPECT_EQ(string("D2").find("MPa"), std::string::npos) << string("D2");
    EXPECT_NE(string("D3").find("parsecs"), std::string::npos) << string("D3");
    EXPECT_NE(string("D4").find("ten"), std::string::npos) << string("D4");
    EXPECT_NE(string("D5").find("saturation"), std::string::npos) << string("D5");
    EXPECT_NE(string("D6").find("saturation"), std::string::npos) << string("D6");
    EXPECT_NE(string("D7").find("eta"), std::string::npos) << string("D7");
    // The sentence in the cell is the core's own.
    const Value e2 = call_scalar(*cat::find("STEAM.EXPLAIN"),
                                 {Value::of_text("H.PT"), Value::of(29007.5), Value::of(752.0), Value::of_text("US")});
    EXPECT_EQ(string("D2"), e2.text);
}

TEST_F(SurfaceTest, BlankCellsHeaderFlagExplainAndUnitsSpellInCalc) {
    // A reference to a blank cell reaches the add-in as 0 (LibreOffice's interpreter):
    // where 0 is no possible value the call is an error and the sentence says so.
    formula("C1", "=STEAM.TURBINE.HOUT.PT(10;500;1;Z1)");
    formula("D1", "=STEAM.EXPLAIN(\"TURBINE.HOUT.PT\";10;500;1;Z1)");
    formula("C2", "=STEAM.H.PT(Z1;100)");
    formula("D2", "=STEAM.EXPLAIN(\"H.PT\";Z1;100)");
    // The header flag: TRUE arrives as 1 (a header row), -1 and a text are refused.
    array_formula("A4:M5", "=STEAM.STATE.PT(1;300;\"SI\";TRUE())");
    formula("C6", "=STEAM.STATE.PT(1;300;\"SI\";-1)");
    formula("D6", "=STEAM.EXPLAIN(\"STATE.PT\";1;300;\"SI\";\"yes\")");
    // STEAM.EXPLAIN answers an unknown name with a sentence, not Err:502.
    formula("C7", "=STEAM.EXPLAIN(\"TURBINE.HOUT.TP\";10;500;1;0.85)");
    formula("C8", "=STEAM.UNITS.SPELL(\"psig\")");
    // The pump from a saturated inlet: (p, h') by STEAM.HF.P.
    formula("C9", "=STEAM.PUMP.HOUT.PH(0.008;STEAM.HF.P(0.008);16.5;0.85)");
    recalc();
    EXPECT_EQ(error("C1"), IllegalArgument) << string("C1");
    EXPECT_NE(string("D1").find("eta = 0"), std::string::npos) << string("D1");
    EXPECT_NE(string("D1").find("a blank cell counts as 0"), std::string::npos) << string("D1");
    EXPECT_EQ(error("C2"), IllegalArgument) << string("C2");
    EXPECT_NE(string("D2").find("a blank cell counts as 0"), std::string::npos) << string("D2");
    EXPECT_EQ(string("A4"), "p [MPa]");
    EXPECT_NEAR(value("A5"), 1.0, 0.0);
    EXPECT_EQ(error("C6"), IllegalArgument) << string("C6");
    EXPECT_NE(string("D6").find("header must be TRUE or FALSE"), std::string::npos) << string("D6");
    ASSERT_EQ(error("C7"), NoError) << string("C7");
    EXPECT_NE(string("C7").find("STEAM.TURBINE.HOUT.PT"), std::string::npos) << string("C7");
    ASSERT_EQ(error("C8"), NoError) << string("C8");
    EXPECT_NE(string("C8").find("means SI p=psig"), std::string::npos) << string("C8");
    // python3-iapws 1.5.2 (Debian): h_out = 193.35047373066845 kJ/kg (tests/core/test_equipment.cpp).
    ASSERT_EQ(error("C9"), NoError) << string("C9");
    EXPECT_NEAR(value("C9"), 193.35047373066845, 1e-6);
}

// ---- arrays ------------------------------------------------------------------------

TEST_F(SurfaceTest, ArraysColumnsBroadcastShapesAndElementErrors) {
    const cat::Function& hpt = *cat::find("STEAM.H.PT");
    // Five states from compressed liquid to superheated steam (MPa, degC; common practice).
    const double p[5] = {0.1, 1.0, 5.0, 10.0, 16.5};
    const double t[5] = {50.0, 250.0, 300.0, 540.0, 565.0};
    for (int i = 0; i < 5; ++i) {
        number(addr(0, i), p[i]);
        number(addr(1, i), t[i]);
    }
    array_formula("C1:C5", "=STEAM.H.PT(A1:A5;B1:B5)");
    // A scalar pressure broadcast against the temperature column, and a row of temperatures.
    array_formula("D1:D5", "=STEAM.H.PT(10;B1:B5)");
    number("F7", 300.0);
    number("G7", 400.0);
    number("H7", 500.0);
    array_formula("F8:H8", "=STEAM.H.PT(A4;F7:H7)");
    // Mismatched shapes: one error for the whole call.
    formula("E1", "=STEAM.H.PT(A1:A5;B1:B4)");
    array_formula("E3:E7", "=STEAM.H.PT(A1:A5;F7:H7)");
    // An element error: the fourth state is out of range (200 MPa); the others stay.
    number("J1", 1.0);
    number("J2", 1.0);
    number("J3", 1.0);
    number("J4", 200.0);
    number("J5", 1.0);
    array_formula("K1:K5", "=STEAM.H.PT(J1:J5;B1:B5)");
    formula("L1", "=ISERROR(K4)");
    formula("L2", "=SUM(K1:K5)");
    recalc();

    for (int i = 0; i < 5; ++i) {
        const Value e = call_scalar(hpt, {Value::of(p[i]), Value::of(t[i])});
        ASSERT_EQ(e.kind, Value::Kind::Number) << e.text;
        ASSERT_EQ(error(addr(2, i)), NoError) << addr(2, i) << " shows " << string(addr(2, i));
        expect_rel(value(addr(2, i)), e.number, 1e-12, addr(2, i));
        const Value b = call_scalar(hpt, {Value::of(10.0), Value::of(t[i])});
        ASSERT_EQ(b.kind, Value::Kind::Number) << b.text;
        ASSERT_EQ(error(addr(3, i)), NoError) << addr(3, i) << " shows " << string(addr(3, i));
        expect_rel(value(addr(3, i)), b.number, 1e-12, addr(3, i));
    }
    for (int j = 0; j < 3; ++j) {
        const Value e = call_scalar(hpt, {Value::of(10.0), Value::of(300.0 + 100.0 * j)});
        ASSERT_EQ(error(addr(5 + j, 7)), NoError) << addr(5 + j, 7) << " shows " << string(addr(5 + j, 7));
        expect_rel(value(addr(5 + j, 7)), e.number, 1e-12, addr(5 + j, 7));
    }
    EXPECT_EQ(error("E1"), IllegalArgument) << string("E1");
    for (const char* c : {"E3", "E7"}) EXPECT_NE(error(c), NoError) << c << " shows " << string(c);
    for (int i = 0; i < 5; ++i) {
        const std::string c = addr(10, i);
        if (i == 3) {
            EXPECT_EQ(error(c), IllegalFPOperation) << c << " shows " << string(c);
            EXPECT_EQ(string(c), "#NUM!");
        } else {
            ASSERT_EQ(error(c), NoError) << c << " shows " << string(c);
            const Value e = call_scalar(hpt, {Value::of(1.0), Value::of(t[i])});
            expect_rel(value(c), e.number, 1e-12, c);
        }
    }
    EXPECT_EQ(string("L1"), "TRUE");
    EXPECT_EQ(error("L2"), IllegalFPOperation) << string("L2");
}

// ---- the units argument as a cell -------------------------------------------------------

TEST_F(SurfaceTest, UnitsFromACellThatChanges) {
    const cat::Function& hpt = *cat::find("STEAM.H.PT");
    number("A1", 145.0377);
    number("B1", 392.0);
    text("C1", "SI");
    formula("D1", "=STEAM.H.PT(A1;B1;C1)");
    recalc();
    // SI: 145.0377 MPa is above the 100 MPa limit.
    EXPECT_EQ(error("D1"), IllegalArgument) << string("D1");

    number("A1", 1.0);
    number("B1", 200.0);
    recalc();
    const Value si = call_scalar(hpt, {Value::of(1.0), Value::of(200.0), Value::of_text("SI")});
    ASSERT_EQ(error("D1"), NoError) << string("D1");
    expect_rel(value("D1"), si.number, 1e-12, "SI");

    text("C1", "US");
    number("A1", 145.0377);
    number("B1", 392.0);
    recalc();
    const Value us = call_scalar(hpt, {Value::of(145.0377), Value::of(392.0), Value::of_text("US")});
    ASSERT_EQ(error("D1"), NoError) << string("D1");
    expect_rel(value("D1"), us.number, 1e-12, "US");
    // 1 MPa, 200 degC in Btu/lbm: 1 Btu/lbm = 2.326 kJ/kg exactly (NIST SP 811 B.8); the US
    // pressure 145.0377 psia is 1 MPa to 2e-7, so the two agree to about 1e-6.
    expect_rel(value("D1") * 2.326, si.number, 1e-5, "US vs SI");

    // A blank units cell means SI (Calc passes it as 0).
    formula("C1", "");
    number("A1", 1.0);
    number("B1", 200.0);
    recalc();
    ASSERT_EQ(error("D1"), NoError) << string("D1");
    expect_rel(value("D1"), si.number, 1e-12, "blank units cell");

    // Units with overrides in a cell: gauge pressure. 1 MPa absolute = (1 - 0.101325) MPa gauge.
    text("C1", "SI p=MPag");
    number("A1", 1.0 - 0.101325);
    recalc();
    ASSERT_EQ(error("D1"), NoError) << string("D1");
    expect_rel(value("D1"), si.number, 1e-9, "gauge");
}

// ---- unit conversions ----------------------------------------------------------------

TEST_F(SurfaceTest, ConvertMatchesNistSp811Factors) {
    struct C {
        double value;
        const char* from;
        const char* to;
        double expected;
        double rel;
    };
    const C cases[] = {
        // 1 psi = 1 lbf/in2 = 4.4482216152605 N / (0.0254 m)^2 = 6894.757293168361 Pa (NIST SP 811 B.8,
        // exact from the 1959 pound and inch)
        {1.0, "psi", "Pa", 6894.757293168361, 1e-14},
        {1.0, "psia", "kPa", 6.894757293168361, 1e-14},
        // 1 Btu_IT/lbm = 2.326 kJ/kg exactly (NIST SP 811 B.8)
        {1.0, "Btu/lbm", "kJ/kg", 2.326, 1e-14},
        {2326.0, "kJ/kg", "Btu/lbm", 1000.0, 1e-14},
        // gauge: relative to the standard atmosphere 101.325 kPa (NIST SP 811 B.8 "atmosphere, standard")
        {150.0, "psig", "MPa", 150.0 * 0.006894757293168361 + 0.101325, 1e-14},
        // degF = 1.8 degC + 32 (NIST SP 811 B.9, common practice)
        {212.0, "degF", "degC", 100.0, 1e-14},
        {32.0, "degF", "K", 273.15, 1e-14},
        // differences: 1 delta_degF = 1/1.8 K (NIST SP 811 B.9)
        {18.0, "delta_degF", "K", 10.0, 1e-14},
        {10.0, "delta_K", "delta_degF", 18.0, 1e-14},
        // 1 lbm = 0.45359237 kg, 1 h = 3600 s (NIST SP 811 B.8)
        {3600.0, "lbm/h", "kg/s", 0.45359237, 1e-14},
        // 1 ft = 0.3048 m (NIST SP 811 B.8): 1 ft3/lbm = 0.3048^3 / 0.45359237 m3/kg
        {1.0, "ft3/lbm", "m3/kg", 0.3048 * 0.3048 * 0.3048 / 0.45359237, 1e-14},
    };
    int r = 0;
    for (const C& c : cases) {
        number(addr(0, r), c.value);
        formula(addr(1, r), "=STEAM.CONVERT(A" + std::to_string(r + 1) + ";\"" + c.from + "\";\"" + c.to + "\")");
        ++r;
    }
    // different kinds and unknown units: errors with a sentence
    formula("D1", "=STEAM.CONVERT(1;\"psi\";\"degC\")");
    formula("D2", "=STEAM.CONVERT(1;\"furlong\";\"m\")");
    formula("E2", "=STEAM.EXPLAIN(\"CONVERT\";1;\"furlong\";\"m\")");
    recalc();
    r = 0;
    for (const C& c : cases) {
        const std::string a = addr(1, r++);
        const std::string w = std::to_string(c.value) + " " + c.from + " -> " + c.to;
        ASSERT_EQ(error(a), NoError) << w << " shows " << string(a);
        expect_rel(value(a), c.expected, c.rel, w);
    }
    EXPECT_EQ(error("D1"), IllegalArgument) << string("D1");
    EXPECT_EQ(error("D2"), IllegalArgument) << string("D2");
    EXPECT_NE(string("E2").find("furlong"), std::string::npos) << string("E2");
}

}  // namespace
}  // namespace isentra::calctest
