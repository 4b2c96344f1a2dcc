// SPDX-License-Identifier: MPL-2.0
// isentra::PreparedCall (the CSV mode's plan) against isentra::call(): the
// same numbers bit for bit and the same error sentences, over random states
// in and out of range, in SI and US units; and column names in call texts.
#include <gtest/gtest.h>

#include <cmath>
#include <cstring>
#include <random>
#include <string>
#include <vector>

#include "isentra/surface/call.hpp"
#include "isentra/surface/catalogue.hpp"
#include "isentra/surface/formula.hpp"

namespace {

using isentra::PreparedCall;
using isentra::Table;
using isentra::Value;

const isentra::catalogue::Function& fn(const char* name) {
    const auto* f = isentra::catalogue::find(name);
    if (!f) throw std::runtime_error(name);
    return *f;
}

void expect_same(const Value& a, const Value& b, const std::string& what) {
    ASSERT_EQ(static_cast<int>(a.kind), static_cast<int>(b.kind)) << what << ": " << a.text << " | " << b.text;
    if (a.kind == Value::Kind::Number) EXPECT_EQ(std::memcmp(&a.number, &b.number, sizeof a.number), 0) << what;
    else EXPECT_EQ(a.text, b.text) << what;
}

// For each state: call() on 1x1 tables vs both eval()s of the prepared call.
void check(const char* name, const std::string& units, const std::vector<std::pair<double, double>>& ranges,
           int states, bool faults) {
    const auto& f = fn(name);
    const std::size_t n = ranges.size();
    std::vector<Table> args(n, Table::scalar(Value{}));
    args.push_back(Table::scalar(Value::of_text(units)));
    std::vector<std::size_t> slots;
    for (std::size_t k = 0; k < n; ++k) slots.push_back(k);
    const PreparedCall pc(f, args, slots);
    ASSERT_EQ(pc.slot_count(), n);
    std::mt19937_64 rng(17);
    std::uniform_real_distribution<double> u(0, 1);
    for (int s = 0; s < states; ++s) {
        std::vector<Value> in(n);
        std::vector<double> num(n);
        bool numbers = true;
        for (std::size_t k = 0; k < n; ++k) {
            num[k] = ranges[k].first + (ranges[k].second - ranges[k].first) * u(rng);
            in[k] = Value::of(num[k]);
            if (faults && s % 7 == 3 && k == s % n) {
                in[k] = (s % 2) ? Value::of_text("Bad") : Value{};
                numbers = false;
            }
        }
        std::vector<Table> a = args;
        for (std::size_t k = 0; k < n; ++k) a[k] = Table::scalar(in[k]);
        const Table ref = isentra::call(f, a);
        ASSERT_EQ(ref.cells.size(), pc.width());
        std::vector<Value> got(pc.width());
        pc.eval(in.data(), got.data());
        const std::string what = std::string(name) + " state " + std::to_string(s);
        for (std::size_t c = 0; c < pc.width(); ++c) expect_same(got[c], ref.cells[c], what);
        std::vector<double> fast(pc.width());
        const bool ok = numbers && pc.eval(num.data(), fast.data());
        bool all_numbers = true;
        for (const Value& v : ref.cells) all_numbers = all_numbers && v.kind == Value::Kind::Number;
        EXPECT_EQ(ok, all_numbers && numbers) << what;
        if (ok)
            for (std::size_t c = 0; c < pc.width(); ++c)
                EXPECT_EQ(std::memcmp(&fast[c], &ref.cells[c].number, sizeof(double)), 0) << what;
    }
}

}  // namespace

TEST(PreparedCall, SameAsCallInSi) {
    // Ranges cross the IF97 limits on purpose (p up to 110 MPa, T down to -5 degC).
    check("H.PT", "", {{0.001, 110}, {-5, 900}}, 3000, true);
    check("T.PH", "", {{0.001, 105}, {0, 4200}}, 1500, true);
    check("S.PH", "", {{0.001, 105}, {0, 4200}}, 1500, false);
}

TEST(PreparedCall, SameAsCallInUsAndForRowsAndEquipment) {
    check("H.PT", "US p=psig", {{0, 3000}, {100, 1100}}, 1500, true);
    check("STATE.PT", "", {{0.001, 30}, {10, 700}}, 500, true);
    check("TURBINE.EFF.PT.PT", "", {{10, 18}, {500, 560}, {3, 5}, {300, 360}}, 500, true);
}

TEST(PreparedCall, WholeCallErrorsAreThrown) {
    const auto& f = fn("H.PT");
    EXPECT_THROW(PreparedCall(f, {Table::scalar(Value{})}, {0}), isentra::Error);  // too few arguments
    EXPECT_THROW(PreparedCall(f, {Table::scalar(Value{}), Table::scalar(Value{}), Table::scalar(Value::of_text("furlongs"))},
                              {0, 1}),
                 isentra::Error);
    EXPECT_THROW(PreparedCall(f, {Table::scalar(Value{}), Table::scalar(Value::of_text("hot"))}, {0}), isentra::Error);
    EXPECT_THROW(PreparedCall(f, {Table::scalar(Value{}), Table::scalar(Value{})}, {0, 2}), isentra::Error);
    EXPECT_FALSE(PreparedCall::supported(fn("CONVERT")));
    EXPECT_FALSE(PreparedCall::supported(fn("EXPLAIN")));
    // A constant argument is converted once, in the call's units.
    const PreparedCall pc(f, {Table::scalar(Value{}), Table::scalar(Value::of(950)), Table::scalar(Value::of_text("US"))},
                          {0});
    double in = 1450, out = 0;
    ASSERT_TRUE(pc.eval(&in, &out));
    const Value ref = isentra::call_scalar(f, {Value::of(1450), Value::of(950), Value::of_text("US")});
    EXPECT_EQ(std::memcmp(&out, &ref.number, sizeof out), 0);
}

TEST(PreparedCall, NamesInCallTexts) {
    namespace fm = isentra::formula;
    const fm::ParsedCall c = fm::parse("H.PT(p_ms; [HP steam temp]; \"US\")", true);
    ASSERT_EQ(c.args.size(), 3u);
    EXPECT_EQ(c.names, (std::vector<std::string>{"p_ms", "HP steam temp", ""}));
    EXPECT_EQ(c.args[2].cells[0].text, "US");
    const fm::ParsedCall d = fm::parse("TURBINE.EFF.PT.PT(a1; 538.4; TRUE; [x]]y])", true);
    EXPECT_EQ(d.names, (std::vector<std::string>{"a1", "", "", "x]y"}));
    EXPECT_EQ(d.args[2].cells[0].number, 1.0);
    EXPECT_THROW(fm::parse("H.PT(p_ms; 500)"), fm::ParseError);  // names only where allowed
    EXPECT_THROW(fm::parse("H.PT({p; q}; 500)", true), fm::ParseError);  // not inside arrays
    EXPECT_THROW(fm::parse("H.PT([unclosed; 500)", true), fm::ParseError);
    EXPECT_TRUE(fm::parse("H.PT(3; 300)", true).names == (std::vector<std::string>{"", ""}));
}
