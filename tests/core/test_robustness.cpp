// SPDX-License-Identifier: MPL-2.0
// Robustness of every catalogue function against arbitrary input: whatever
// the arguments (out of range, negative, zero, huge, NaN, infinite, text,
// empty, odd unit texts), isentra::call() returns a finite number, a text or
// an error cell with a sentence; it never throws and never returns NaN or an
// infinity as a number. Inputs come from a fixed-seed generator (no check
// values here, only the contract).
#include <gtest/gtest.h>

#include <cmath>
#include <limits>
#include <random>
#include <string>
#include <vector>

#include "isentra/surface/call.hpp"
#include "isentra/surface/catalogue.hpp"

namespace {

using isentra::Table;
using isentra::Value;

Value random_value(std::mt19937_64& rng, const isentra::catalogue::Arg& arg) {
    std::uniform_int_distribution<int> pick(0, 19);
    const int k = pick(rng);
    if (arg.quantity == isentra::Quantity::Text) {
        static const char* const texts[] = {"SI", "US", "bar", "KPA", "K", "US p=psig", "SI T=K p=barg",
                                            "", "furlong", "p=", "US p=psig patm=14.2psia", "H.PT",
                                            "STEAM.TSAT", "psig", "degF", "kJ/kg", "patm=-1", "=;,"};
        std::uniform_int_distribution<int> t(0, sizeof texts / sizeof *texts - 1);
        return Value::of_text(texts[t(rng)]);
    }
    switch (k) {
    case 0: return Value::of(std::numeric_limits<double>::quiet_NaN());
    case 1: return Value::of(std::numeric_limits<double>::infinity());
    case 2: return Value::of(-1.0);
    case 3: return Value::of(0.0);
    case 4: return Value::of(1e300);
    case 5: return Value::of_text("abc");
    case 6: return Value{};
    case 7: return Value::of(22.064);
    case 8: return Value::of(373.946);
    default: {
        // Plausible magnitudes for every kind of argument, in SI or US units.
        std::uniform_real_distribution<double> u(-50.0, 4000.0);
        std::uniform_real_distribution<double> small(0.0, 1.2);
        return Value::of(k < 14 ? u(rng) : small(rng) * (k < 17 ? 1.0 : 30.0));
    }
    }
}

TEST(Robustness, EveryFunctionAnyInput) {
    std::mt19937_64 rng(20261201);
    std::size_t calls = 0, numbers = 0, errors = 0;
    for (const auto& f : isentra::catalogue::functions()) {
        for (int trial = 0; trial < 150; ++trial) {
            std::vector<Value> args;
            for (const auto& a : f.args) {
                if (a.varargs) {
                    for (int i = 0; i < 3; ++i) args.push_back(random_value(rng, isentra::catalogue::Arg{"v", isentra::Quantity::None, ""}));
                } else {
                    args.push_back(random_value(rng, a));
                }
            }
            if (f.name == "STEAM.EXPLAIN") args[0] = Value::of_text("H.PT");
            Value r;
            ASSERT_NO_THROW(r = isentra::call_scalar(f, args)) << f.name;
            ++calls;
            if (r.kind == Value::Kind::Number) {
                ++numbers;
                EXPECT_TRUE(std::isfinite(r.number)) << f.name << " -> " << r.number << " args " << [&] { std::string s; for (auto& a : args) s += (a.kind == Value::Kind::Number ? std::to_string(a.number) : "\"" + a.text + "\"") + "; "; return s; }();
            } else if (r.kind == Value::Kind::Error) {
                ++errors;
                EXPECT_FALSE(r.text.empty()) << f.name;
            }
        }
    }
    std::printf("[robustness] %zu calls: %zu numbers, %zu errors\n", calls, numbers, errors);
    EXPECT_GT(numbers, 0u);
}

}  // namespace

// ---------------------------------------------------------------------------
// Near the critical point, properties that diverge there (cp, cv, w, kappa and
// the transport properties) are either positive finite numbers or NotDefined
// errors, never negative or absurd numbers. Found by a differential run
// against python3-iapws 1.5.2 (Debian), which itself gives negative cp for
// saturated vapour within ~3e-5 K of Tc: there the region-3 saturated vapour
// (or liquid) density has no root of Eq. 28 at ps(T) and sits on the
// stability limit (see core/if97/r3sat.cpp), where cp is infinite.
// ---------------------------------------------------------------------------
TEST(Robustness, DivergingPropertiesNearTheCriticalPoint) {
    namespace cat = isentra::catalogue;
    const char* props[] = {"CP", "CV", "W", "KAPPA", "MU", "LAMBDA", "NU", "PR"};
    const double pc = 22.064, tc = 373.946;  // R7-97(2012) Eqs. 2 and 3, in MPa and degC
    int numbers = 0, errors = 0;
    auto check = [&](const std::string& name, std::vector<double> args) {
        const cat::Function* f = cat::find(name);
        if (!f && name.find('.', 6) == name.size() - 2) return;  // no F/G function for this property
        ASSERT_NE(f, nullptr) << name;
        std::vector<Table> in;
        for (double a : args) in.push_back(Table::scalar(Value::of(a)));
        const Value v = isentra::call(*f, in).cells[0];
        if (v.kind == Value::Kind::Number) {
            ++numbers;
            EXPECT_TRUE(std::isfinite(v.number) && v.number > 0.0) << name << " " << args[0] << " -> " << v.number;
            // (no upper bound: along the saturation line cp grows like 1/(Tc - T))
        } else {
            ++errors;
            ASSERT_EQ(v.kind, Value::Kind::Error) << name;
            if (v.error == isentra::ErrorCode::NotDefined) {
                EXPECT_EQ(v.text.find("wet"), std::string::npos) << name << " " << args[0] << ": " << v.text;
            }
        }
    };
    for (int k = 0; k <= 400; ++k) {
        // pressures from pc - 1e-3 MPa to pc, densest at pc
        const double dp = 1e-3 * std::pow(10.0, -8.0 * k / 400.0);
        const double p = k == 400 ? pc : pc - dp;
        const double dt = 1e-2 * std::pow(10.0, -8.0 * k / 400.0);
        const double t = k == 400 ? tc : tc - dt;
        for (const char* pr : props) {
            const std::string s(pr);
            check("STEAM." + s + "F.P", {p});
            check("STEAM." + s + "G.P", {p});
            check("STEAM." + s + "F.T", {t});
            check("STEAM." + s + "G.T", {t});
            check("STEAM." + s + ".PX", {p, 0.0});
            check("STEAM." + s + ".PX", {p, 1.0});
            check("STEAM." + s + ".PT", {pc, tc + dt});  // supercritical side along pc
        }
    }
    EXPECT_GT(numbers, 5000);
    EXPECT_GT(errors, 0);
}
