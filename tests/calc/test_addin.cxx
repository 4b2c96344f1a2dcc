// SPDX-License-Identifier: MPL-2.0
// The add-in in a real (headless) Calc: names, values, errors, units,
// arrays. Formulas are typed as a user types them (display names, `;`).
#include <cctype>
#include <cmath>
#include <string>

#include "isentra/surface/catalogue.hpp"
#include "calc_test.hxx"

namespace isentra::calctest {
namespace {

using AddinTest = CalcTest;

// IAPWS R7-97(2012) Table 36 (saturation temperature, Eq. 31):
// p = 0.1 MPa -> Ts = 372.755919 K; 1 MPa -> 453.035632 K; 10 MPa -> 584.149488 K.
constexpr double ts_01_C = 372.755919 - 273.15;
constexpr double ts_1_C = 453.035632 - 273.15;
constexpr double ts_10_C = 584.149488 - 273.15;

void expect_rel(double actual, double expected, double rel) {
    EXPECT_NEAR(actual, expected, std::fabs(expected) * rel) << "expected " << expected;
}

TEST_F(AddinTest, TsatAtOneBarMatchesIapwsTable36) {
    formula("A1", "=STEAM.TSAT(0.1)");
    recalc();
    ASSERT_EQ(error("A1"), NoError) << string("A1");
    expect_rel(value("A1"), ts_01_C, 1e-8);
}

TEST_F(AddinTest, DocumentStoresTheFrozenProgrammaticName) {
    // What a saved document contains: service name + method name. Never change.
    formula("A1", "=steam.tsat(0.1)");  // display names are case-insensitive
    recalc();
    EXPECT_EQ(formula_of("A1"), "=ORG.ISENTRA.STEAMFUNCTIONS.TSAT(0.1)");
    expect_rel(value("A1"), ts_01_C, 1e-8);
}

TEST_F(AddinTest, InvalidInputsGiveErr502AndTheOfficeSurvives) {
    formula("A1", "=STEAM.TSAT(0.0005)");  // below the triple-point pressure 611.657 Pa
    formula("A2", "=STEAM.TSAT(22.1)");    // above the critical pressure 22.064 MPa
    formula("A3", "=STEAM.TSAT(-1)");
    formula("A4", "=STEAM.TSAT(\"abc\")");  // text where a number belongs
    formula("A6", "=STEAM.TSAT(0.1;\"no such units\")");
    recalc();
    for (const char* c : {"A1", "A2", "A3", "A4", "A6"})
        EXPECT_EQ(error(c), IllegalArgument) << c << " shows " << string(c);
    EXPECT_EQ(string("A1"), "Err:502");

    // Too many arguments, or the required argument missing: Calc itself
    // refuses the call (Err:504).
    formula("A7", "=STEAM.TSAT(0.1;\"SI\";1)");
    formula("A5", "=STEAM.TSAT()");
    recalc();
    EXPECT_EQ(error("A7"), ParameterExpected) << string("A7");
    EXPECT_EQ(error("A5"), ParameterExpected) << string("A5");

    // Still alive and answering, in this document and in a new one.
    formula("B1", "=STEAM.TSAT(1)");
    recalc();
    ASSERT_EQ(error("B1"), NoError);
    expect_rel(value("B1"), ts_1_C, 1e-8);
    auto doc = Office::get().new_calc_document();
    EXPECT_TRUE(doc.is());
    Office::close(doc);
}

TEST_F(AddinTest, ExplainGivesTheReasonAsASentence) {
    formula("A1", "=STEAM.EXPLAIN(\"TSAT\";22.1)");
    formula("A2", "=STEAM.EXPLAIN(\"STEAM.TSAT\";0.1)");
    recalc();
    ASSERT_EQ(error("A1"), NoError);
    EXPECT_NE(string("A1").find("22.064"), std::string::npos) << string("A1");
    ASSERT_EQ(error("A2"), NoError);
    EXPECT_EQ(string("A2").rfind("OK", 0), 0u) << string("A2");
}

TEST_F(AddinTest, VersionNamesTheAddin) {
    formula("A1", "=STEAM.VERSION()");
    recalc();
    ASSERT_EQ(error("A1"), NoError);
    EXPECT_EQ(string("A1"), std::string("Isentra ") + catalogue::version());
}

TEST_F(AddinTest, UnitsFromACellReference) {
    text("A1", "US");
    formula("B1", "=STEAM.TSAT(14.696;A1)");
    // The same pressure in MPa, exact factor: 1 psi = 6894.757293168361 Pa (NIST SP 811).
    formula("B2", "=STEAM.TSAT(14.696*6894.757293168361/1000000)");
    recalc();
    ASSERT_EQ(error("B1"), NoError) << string("B1");
    ASSERT_EQ(error("B2"), NoError) << string("B2");
    const double expected_F = 1.8 * value("B2") + 32.0;  // degF = 1.8 degC + 32 (exact)
    expect_rel(value("B1"), expected_F, 1e-9);
    // Water boils near 212 degF at 14.696 psia; IAPWS-IF97 gives 211.95 degF (common practice).
    EXPECT_NEAR(value("B1"), 211.95, 0.01);
}

TEST_F(AddinTest, ArrayFormulaOverARangeOfPressures) {
    number("A1", 0.1);
    number("A2", 1.0);
    number("A3", 10.0);
    number("A4", 30.0);  // above the critical pressure: an error element
    // A5 stays empty: an empty result element
    array_formula("B1:B5", "=STEAM.TSAT(A1:A5)");
    formula("C1", "=SUM(STEAM.TSAT(A1:A3))");
    formula("C2", "=SUM(B1:B5)");
    recalc();
    ASSERT_EQ(error("B1"), NoError) << string("B1");
    expect_rel(value("B1"), ts_01_C, 1e-8);
    expect_rel(value("B2"), ts_1_C, 1e-8);
    expect_rel(value("B3"), ts_10_C, 1e-8);
    // An error inside an array shows as #NUM! (the add-in returns NaN there;
    // see DEVELOPERS.md) and propagates into anything that uses it.
    EXPECT_EQ(error("B4"), IllegalFPOperation) << string("B4");
    EXPECT_EQ(string("B4"), "#NUM!");
    EXPECT_EQ(error("B5"), NoError);
    EXPECT_EQ(string("B5"), "");
    expect_rel(value("C1"), ts_01_C + ts_1_C + ts_10_C, 1e-8);
    EXPECT_EQ(error("C2"), IllegalFPOperation);
}

TEST_F(AddinTest, EveryCatalogueFunctionIsKnownToCalc) {
    // Each function, called without arguments, must at least be recognised
    // (no #NAME?). The list comes from the catalogue, like the IDL.
    const auto& fs = catalogue::functions();
    ASSERT_FALSE(fs.empty());
    for (std::size_t i = 0; i < fs.size(); ++i)
        formula("A" + std::to_string(i + 1), "=" + fs[i].name + "()");
    recalc();
    for (std::size_t i = 0; i < fs.size(); ++i) {
        const std::string c = "A" + std::to_string(i + 1);
        EXPECT_NE(error(c), NoName) << fs[i].name << " is unknown to Calc";
        EXPECT_NE(formula_of(c).find("ORG.ISENTRA.STEAMFUNCTIONS." + [&] {
                      std::string m = fs[i].method;
                      for (auto& ch : m) ch = static_cast<char>(std::toupper(static_cast<unsigned char>(ch)));
                      return m;
                  }()),
                  std::string::npos)
            << fs[i].name << ": " << formula_of(c);
    }
}

}  // namespace
}  // namespace isentra::calctest
