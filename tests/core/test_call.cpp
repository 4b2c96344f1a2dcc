// SPDX-License-Identifier: MPL-2.0
// The call layer (call.hpp): units texts, blank arguments, gauge pressures in
// STEAM.CONVERT, broadcasting and error sentences in the user's units.
#include <gtest/gtest.h>

#include <string>
#include <vector>

#include "isentra/surface/call.hpp"
#include "isentra/surface/catalogue.hpp"
#include "isentra/properties/state.hpp"

namespace {

using isentra::Table;
using isentra::Value;

Value call(const char* name, std::vector<Value> args) {
    const auto* f = isentra::catalogue::find(name);
    EXPECT_NE(f, nullptr) << name;
    return isentra::call_scalar(*f, args);
}

// NIST SP 811 (2008) App. B: 1 psi = 6.894757293168361 kPa (lbf/in^2 from the
// international pound and inch, exact to double rounding).
constexpr double kPsiMPa = 0.006894757293168361;

TEST(Call, ConvertGaugeWithLocalBarometricPressure) {
    // 150 psig at the standard atmosphere and at a local 14.2 psia.
    const Value a = call("CONVERT", {Value::of(150), Value::of_text("psig"), Value::of_text("MPa")});
    ASSERT_EQ(a.kind, Value::Kind::Number) << a.text;
    EXPECT_NEAR(a.number, 150 * kPsiMPa + 0.101325, 1e-15);  // standard atmosphere, ISO 2533
    const Value b =
        call("CONVERT", {Value::of(150), Value::of_text("psig patm=14.2psia"), Value::of_text("MPa")});
    ASSERT_EQ(b.kind, Value::Kind::Number) << b.text;
    EXPECT_NEAR(b.number, (150 + 14.2) * kPsiMPa, 1e-15);
    const Value c = call("CONVERT", {Value::of(1.2), Value::of_text("MPa"), Value::of_text("barg patm=0.98bar")});
    ASSERT_EQ(c.kind, Value::Kind::Number) << c.text;
    EXPECT_NEAR(c.number, 12.0 - 0.98, 1e-13);  // 1 bar = 0.1 MPa (NIST SP 811)
    const Value d = call("CONVERT", {Value::of(1), Value::of_text("psig patm=abc"), Value::of_text("MPa")});
    EXPECT_EQ(d.kind, Value::Kind::Error);
}

TEST(Call, BlankUnitsCellMeansSI) {
    // Calc passes a blank cell given for an `any` argument as the number 0.
    const Value si = call("TSAT", {Value::of(0.1)});
    const Value blank = call("TSAT", {Value::of(0.1), Value::of(0.0)});
    ASSERT_EQ(blank.kind, Value::Kind::Number) << blank.text;
    EXPECT_EQ(blank.number, si.number);
    const Value other = call("TSAT", {Value::of(0.1), Value::of(3.0)});
    EXPECT_EQ(other.kind, Value::Kind::Error);
}

TEST(Call, ErrorSentenceInTheUsersUnits) {
    // 29007.5 psia = 200 MPa, above the 100 MPa limit of IAPWS-IF97 (R7-97(2012) Sec. 2).
    const Value v = call("H.PT", {Value::of(29007.5), Value::of(500), Value::of_text("US")});
    ASSERT_EQ(v.kind, Value::Kind::Error);
    EXPECT_NE(v.text.find("p = 29007.5 psia"), std::string::npos) << v.text;
    EXPECT_NE(v.text.find("14503.8 psia"), std::string::npos) << v.text;  // 100 MPa / kPsiMPa
    EXPECT_EQ(v.text.find("MPa"), std::string::npos) << v.text;
}

TEST(Call, RangesBroadcastAndKeepTheirShape) {
    const auto* f = isentra::catalogue::find("H.PT");
    Table p;  // a column of three pressures
    p.rows = 3;
    p.cols = 1;
    p.cells = {Value::of(1.0), Value::of(200.0), Value{}};
    const Table r = isentra::call(*f, {p, Table::scalar(Value::of(300.0))});
    ASSERT_EQ(r.rows, 3u);
    ASSERT_EQ(r.cols, 1u);
    EXPECT_EQ(r.cells[0].kind, Value::Kind::Number);
    EXPECT_DOUBLE_EQ(r.cells[0].number, isentra::state_pT(1.0, 573.15).h);
    EXPECT_EQ(r.cells[1].kind, Value::Kind::Error);  // 200 MPa is out of range
    EXPECT_EQ(r.cells[2].kind, Value::Kind::Empty);  // an empty cell in a range stays empty
}

}  // namespace
