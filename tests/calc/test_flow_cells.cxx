// SPDX-License-Identifier: MPL-2.0
// The flow-meter functions at the cell level in a real (headless) Calc: the
// device type from a text cell, a calibration table as a two-column range (not
// broadcast), arrays of readings, and error values with their explanation.
// Expected values: the core's own (isentra::call), which core_tests checks
// against python3-fluids.
#include <cmath>
#include <string>

#include "isentra/surface/call.hpp"
#include "isentra/surface/catalogue.hpp"
#include "calc_test.hxx"

namespace isentra::calctest {
namespace {

using FlowCells = CalcTest;

double core(const char* fn, std::vector<Table> args) {
    const Table t = call(*catalogue::find(fn), args);
    EXPECT_EQ(t.cells[0].kind, Value::Kind::Number) << fn << ": " << t.cells[0].text;
    return t.cells[0].number;
}
Table num(double v) { return Table::scalar(Value::of(v)); }
Table txt(const char* s) { return Table::scalar(Value::of_text(s)); }

TEST_F(FlowCells, DeviceTextFromACellAndRangesOfReadings) {
    // Steam at 10 MPa, 540 degC through an ISA 1932 nozzle, d 120 mm, D 250 mm (invented readings).
    text("A1", "ISA 1932");
    number("B1", 30);
    number("B2", 50);
    number("B3", 80);
    formula("C1", "=STEAM.FLOW.NOZZLE(B1;10;540;120;250;A1)");
    array_formula("D1:D3", "=STEAM.FLOW.NOZZLE(B1:B3;10;540;120;250;A1)");
    recalc();
    ASSERT_EQ(error("C1"), NoError) << string("C1");
    const double m30 = core("STEAM.FLOW.NOZZLE", {num(30), num(10), num(540), num(120), num(250), txt("ISA 1932")});
    EXPECT_NEAR(value("C1"), m30, 1e-12 * m30);
    EXPECT_NEAR(value("D1"), m30, 1e-12 * m30);
    const double m80 = core("STEAM.FLOW.NOZZLE", {num(80), num(10), num(540), num(120), num(250), txt("ISA 1932")});
    EXPECT_NEAR(value("D3"), m80, 1e-12 * m80);
}

TEST_F(FlowCells, CalibrationTableAsARange) {
    // A calibration certificate (invented): Re_D 1e5, 1e6, 1e7 with C 0.990, 0.994, 0.996.
    number("A1", 1e5);
    number("B1", 0.990);
    number("A2", 1e6);
    number("B2", 0.994);
    number("A3", 1e7);
    number("B3", 0.996);
    formula("C1", "=STEAM.FLOW.CALIBRATED(50;10;540;120;250;A1:B3;\"nozzle\")");
    formula("C2", "=STEAM.FLOW.CALIBRATED(50;10;540;120;250;0.994;\"nozzle\")");
    formula("C3", "=STEAM.FLOW.DP.CALIBRATED(C1;10;540;120;250;A1:B3;\"nozzle\")");
    recalc();
    ASSERT_EQ(error("C1"), NoError) << string("C1");
    Table cal;
    cal.rows = 3;
    cal.cols = 2;
    cal.cells = {Value::of(1e5), Value::of(0.990), Value::of(1e6), Value::of(0.994), Value::of(1e7), Value::of(0.996)};
    const double m = core("STEAM.FLOW.CALIBRATED", {num(50), num(10), num(540), num(120), num(250), cal, txt("nozzle")});
    EXPECT_NEAR(value("C1"), m, 1e-12 * m);
    EXPECT_EQ(error("C2"), NoError) << string("C2");
    EXPECT_NEAR(value("C3"), 50.0, 1e-9);  // the round trip in the sheet
}

TEST_F(FlowCells, LimitsAndUnknownTextsAreErrorsThatExplainThemselves) {
    formula("A1", "=STEAM.FLOW.ORIFICE(25;10;200;20;40;\"flange\")");
    formula("A2", "=STEAM.EXPLAIN(\"FLOW.ORIFICE\";25;10;200;20;40;\"flange\")");
    formula("A3", "=STEAM.FLOW.ORIFICE(25;10;200;120;250;\"pipe\")");
    formula("A4", "=STEAM.EXPLAIN(\"FLOW.ORIFICE\";25;10;200;120;250;\"pipe\")");
    recalc();
    EXPECT_EQ(error("A1"), 502);
    EXPECT_NE(string("A2").find("D = 40 mm is outside the range 50 to 1000 mm"), std::string::npos) << string("A2");
    EXPECT_EQ(error("A3"), 502);
    EXPECT_NE(string("A4").find("taps must be"), std::string::npos) << string("A4");
}

}  // namespace
}  // namespace isentra::calctest
