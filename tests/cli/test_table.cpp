// SPDX-License-Identifier: MPL-2.0
// `isentra table`: property tables, checked against the cell functions
// (isentra::call, bit for bit) and at a few grid points against
// python3-iapws 1.5.x (Debian package 1.5.3-1), an independent IAPWS-IF97 implementation.
#include <gtest/gtest.h>

#include <charconv>
#include <cmath>
#include <cstring>
#include <string>
#include <vector>

#include "cli_run.hpp"
#include "text_check.hpp"
#include "isentra/surface/call.hpp"
#include "isentra/surface/catalogue.hpp"

namespace {

using namespace isentra::clitest;  // cli_run.hpp, text_check.hpp

// The cell function NAME(args...; units) as Calc would compute it.
double cell(const std::string& name, const std::vector<double>& args, const std::string& units = "") {
    const isentra::catalogue::Function* f = isentra::catalogue::find(name);
    EXPECT_NE(f, nullptr) << name;
    std::vector<isentra::Value> a;
    for (double v : args) a.push_back(isentra::Value::of(v));
    a.push_back(isentra::Value::of_text(units));
    const isentra::Value v = isentra::call_scalar(*f, a);
    EXPECT_EQ(v.kind, isentra::Value::Kind::Number) << name << ": " << v.text;
    return v.number;
}

struct Csv {
    std::vector<std::string> header, units;
    std::vector<std::vector<std::string>> rows;
    std::size_t col(const std::string& n) const {
        for (std::size_t k = 0; k < header.size(); ++k)
            if (header[k] == n) return k;
        ADD_FAILURE() << "no column " << n;
        return 0;
    }
};

Csv table(const std::vector<std::string>& args) {
    const Outcome r = run(args);
    EXPECT_EQ(r.status, 0) << r.err;
    Csv c;
    if (r.lines.size() < 2) {
        ADD_FAILURE() << r.out << r.err;
        return c;
    }
    c.header = split(r.lines[0]);
    c.units = split(r.lines[1]);
    for (std::size_t k = 2; k < r.lines.size(); ++k) c.rows.push_back(split(r.lines[k]));
    return c;
}

}  // namespace

TEST(CliTable, GridMatchesTheCellFunctions) {
    const Csv t = table({"table", "pT", "--p", "1:16:5", "--T", "300:550:50", "--props", "h,s,v,cp,w"});
    EXPECT_EQ(t.header, (std::vector<std::string>{"p", "T", "h", "s", "v", "cp", "w"}));
    EXPECT_EQ(t.units, (std::vector<std::string>{"MPa", "°C", "kJ/kg", "kJ/(kg·K)", "m³/kg", "kJ/(kg·K)", "m/s"}));
    ASSERT_EQ(t.rows.size(), 4u * 6u);
    EXPECT_EQ(t.rows[0][0], "1");
    EXPECT_EQ(t.rows[6][0], "6");
    EXPECT_EQ(t.rows[1][1], "350");
    const char* names[] = {"STEAM.H.PT", "STEAM.S.PT", "STEAM.V.PT", "STEAM.CP.PT", "STEAM.W.PT"};
    for (const auto& row : t.rows) {
        ASSERT_EQ(row.size(), 7u);
        const double p = parse(row[0]), T = parse(row[1]);
        for (std::size_t c = 0; c < 5; ++c) expect_same(parse(row[2 + c]), cell(names[c], {p, T}), names[c]);
    }
}

TEST(CliTable, GridAgreesWithPython3Iapws) {
    const Csv t = table({"table", "pT", "--p", "1,6,11,16", "--T", "300,450,550", "--props", "h,s,v"});
    struct Point {
        double p, T, h, s, v;
    };
    // python3-iapws 1.5.x (Debian package 1.5.3-1), IAPWS97(P=p, T=T+273.15).h, .s, .v
    const Point points[] = {
        {1, 300, 3051.703185584021, 7.124712479424178, 0.25797919004877357},
        {6, 450, 3302.763538248859, 6.721633790168076, 0.05216832278118115},
        {16, 550, 3439.849601661265, 6.483249024579735, 0.02135319833145377},
        {11, 300, 1341.9841177690826, 3.243989596565187, 0.0013938288167153674},  // compressed liquid
    };
    std::size_t found = 0;
    for (const Point& pt : points)
        for (const auto& row : t.rows) {
            if (parse(row[0]) != pt.p || parse(row[1]) != pt.T) continue;
            ++found;
            EXPECT_NEAR(parse(row[t.col("h")]), pt.h, 1e-9 * pt.h);
            EXPECT_NEAR(parse(row[t.col("s")]), pt.s, 1e-9 * pt.s);
            EXPECT_NEAR(parse(row[t.col("v")]), pt.v, 1e-9 * pt.v);
        }
    EXPECT_EQ(found, 4u);
}

TEST(CliTable, SaturationByTemperatureAndPressure) {
    const Csv t = table({"table", "sat-T", "--T", "100:250:150"});
    EXPECT_EQ(t.header, (std::vector<std::string>{"T", "p", "vf", "vg", "hf", "hfg", "hg", "sf", "sg"}));
    ASSERT_EQ(t.rows.size(), 2u);
    for (const auto& row : t.rows) {
        const double T = parse(row[0]);
        expect_same(parse(row[1]), cell("PSAT", {T}), "PSAT");
        expect_same(parse(row[t.col("hfg")]), cell("HFG.T", {T}), "HFG.T");
        expect_same(parse(row[t.col("sg")]), cell("SG.T", {T}), "SG.T");
    }
    // python3-iapws 1.5.x (Debian package 1.5.3-1), IAPWS97(T=T+273.15, x=0) and (x=1): .P, .h, .s, .v
    EXPECT_NEAR(parse(t.rows[0][1]), 0.10141797792131013, 1e-14);
    EXPECT_NEAR(parse(t.rows[0][t.col("hf")]), 419.09915499770307, 1e-9);
    EXPECT_NEAR(parse(t.rows[0][t.col("hg")]), 2675.572029220834, 1e-9);
    EXPECT_NEAR(parse(t.rows[0][t.col("vg")]), 1.671860601094037, 1e-12);
    EXPECT_NEAR(parse(t.rows[1][1]), 3.9759390708353273, 1e-12);
    EXPECT_NEAR(parse(t.rows[1][t.col("hf")]), 1085.6868126800841, 1e-9);
    EXPECT_NEAR(parse(t.rows[1][t.col("sg")]), 6.072224101064681, 1e-12);
    EXPECT_NEAR(parse(t.rows[1][t.col("vf")]), 0.0012517369112361736, 1e-15);

    const Csv s = table({"table", "sat-p", "--p", "1,10", "--props", "hf,hg,hfg"});
    EXPECT_EQ(s.header, (std::vector<std::string>{"p", "T", "hf", "hg", "hfg"}));
    ASSERT_EQ(s.rows.size(), 2u);
    expect_same(parse(s.rows[1][1]), cell("TSAT", {10}), "TSAT");
    expect_same(parse(s.rows[1][4]), cell("HFG.P", {10}), "HFG.P");
    // python3-iapws 1.5.x (Debian package 1.5.3-1), IAPWS97(P=p, x=0) and (x=1): .T - 273.15, .h, and hg - hf
    EXPECT_NEAR(parse(s.rows[0][1]), 179.88563239146663, 1e-9);
    EXPECT_NEAR(parse(s.rows[0][4]), 2014.436693349251, 1e-8);
    EXPECT_NEAR(parse(s.rows[1][1]), 310.99948799852825, 1e-9);
    EXPECT_NEAR(parse(s.rows[1][2]), 1407.8675005682433, 1e-8);
    EXPECT_NEAR(parse(s.rows[1][3]), 2725.4725664387406, 1e-8);
}

TEST(CliTable, UsUnitsAndDecimalSteps) {
    const Csv t = table({"table", "pT", "--units", "US", "--p", "1000", "--T", "800", "--props", "h"});
    EXPECT_EQ(t.units, (std::vector<std::string>{"psia", "°F", "Btu/lbm"}));
    ASSERT_EQ(t.rows.size(), 1u);
    expect_same(parse(t.rows[0][2]), cell("H.PT", {1000, 800}, "US"), "US");
    // python3-iapws 1.5.x (Debian package 1.5.3-1), IAPWS97(P=1000*0.006894757293168361, T=(800-32)/1.8+273.15).h / 2.326
    EXPECT_NEAR(parse(t.rows[0][2]), 1388.963935725953, 1e-8);

    const Csv d = table({"table", "sat-p", "--p", "0.1:0.3:0.1", "--props", "hf"});
    ASSERT_EQ(d.rows.size(), 3u);
    EXPECT_EQ(d.rows[0][0], "0.1");
    EXPECT_EQ(d.rows[1][0], "0.2");
    EXPECT_EQ(d.rows[2][0], "0.3");  // not 0.30000000000000004
}

TEST(CliTable, TextLayoutErrorsAndOptions) {
    const Outcome r = run({"table", "pT", "--p", "10,120", "--T", "500", "--props", "h", "--text", "--digits", "8"});
    EXPECT_EQ(r.status, 0);
    ASSERT_EQ(r.lines.size(), 5u) << r.out;
    EXPECT_EQ(r.lines[0], "  p    T          h");
    EXPECT_EQ(r.lines[1], "MPa   °C      kJ/kg");
    EXPECT_EQ(r.lines[2], "---  ---  ---------");
    EXPECT_EQ(r.lines[3], " 10  500  3375.0584");  // 8 significant digits
    EXPECT_EQ(r.lines[4], "120  500          -");  // above 100 MPa: outside IAPWS-IF97
    EXPECT_TRUE(contains(r.err, "1 values have no result")) << r.err;

    const Outcome c = run({"table", "sat-T", "--T", "100", "--props", "hf", "--decimal", ","});
    ASSERT_EQ(c.lines.size(), 3u);
    EXPECT_EQ(c.lines[0], "T;p;hf");
    EXPECT_TRUE(contains(c.lines[2], "419,099")) << c.lines[2];

    EXPECT_EQ(run({"table"}).status, 2);
    EXPECT_EQ(run({"table", "pT", "--p", "1:10:1"}).status, 2);  // no --T
    EXPECT_EQ(run({"table", "pT", "--p", "1:10:0", "--T", "300"}).status, 2);
    EXPECT_EQ(run({"table", "pT", "--p", "1", "--T", "300", "--props", "zz"}).status, 2);
    EXPECT_EQ(run({"table", "sat-T", "--T", "100", "--units", "furlongs"}).status, 2);
    // nan and inf are no grid values: a usage error, never an empty table or a "nan" row.
    for (const char* grid : {"nan:1:1", "1:nan:1", "1:2:inf", "0:inf:1", "nan", "inf", "100,nan", "-inf,1"}) {
        const Outcome bad = run({"table", "sat-T", "--T", grid});
        EXPECT_EQ(bad.status, 2) << grid << ": " << bad.out;
        EXPECT_EQ(bad.out, "") << grid;
        EXPECT_TRUE(contains(bad.err, "finite")) << grid << ": " << bad.err;
    }
    EXPECT_EQ(run({"table", "pT", "--p", "nan", "--T", "100"}).status, 2);
    // A row function is named as such, not as missing.
    const Outcome row = run({"table", "pT", "--p", "1", "--T", "150", "--props", "statemv"});
    EXPECT_EQ(row.status, 2);
    EXPECT_TRUE(contains(row.err, "STEAM.STATEMV.PT gives a row of values")) << row.err;
    EXPECT_FALSE(contains(row.err, "there is no function")) << row.err;
    const Outcome help = run({"table", "--help"});
    EXPECT_EQ(help.status, 0);
    EXPECT_TRUE(contains(help.out, "sat-T")) << help.out;
}
