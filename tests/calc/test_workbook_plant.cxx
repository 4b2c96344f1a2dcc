// SPDX-License-Identifier: MPL-2.0
// The plant performance workbook (templates/gen_plant_workbook.py: sheets
// Heaters, Pumps, Heat rate) opened in the headless Calc with the extension.
// Every result cell is recomputed here from the sheet's own readings with the
// core (state_pT / state_ps and isentra::equipment; the core itself is
// checked against the IAPWS tables and python3-iapws in core_tests): what is
// under test is the workbook's wiring, its blank handling and its units cell.
#include <cmath>
#include <cstdio>
#include <functional>
#include <limits>
#include <string>
#include <vector>

#include "isentra/engineering/equipment.hpp"
#include "isentra/properties/state.hpp"
#include "isentra/surface/call.hpp"
#include "isentra/surface/catalogue.hpp"
#include "workbook_doc.hxx"

namespace isentra::calctest {
namespace {

namespace eq = isentra::equipment;
using namespace css::uno;
using ::rtl::OUString;

// A result cell and the value the core gives for it in SI.
struct Expected {
    const char* sheet;
    char col;
    int row;
    double si;  // NaN: the cell must be empty
    Q q;
};

class PlantBook : public BookTest {
protected:
    void calculate() { wb_.recalc(); }

    void put_text(const char* sheet, char col, int row, const char* s) {
        at(sheet, col, row)->setFormula(OUString::createFromAscii(s));
    }

    // Compares every expected cell; us: the workbook is in US units.
    void check(const std::vector<Expected>& cells, bool us) {
        for (const auto& e : cells) {
            const std::string where = std::string(e.sheet) + "." + e.col + std::to_string(e.row);
            auto c = at(e.sheet, e.col, e.row);
            ASSERT_EQ(c->getError(), 0) << where << " shows " << shown(e.sheet, e.col, e.row);
            if (std::isnan(e.si)) {
                EXPECT_EQ(shown(e.sheet, e.col, e.row), "") << where;
                continue;
            }
            const double want = us ? to_us(e.q, e.si) : e.si;
            EXPECT_EQ(c->getType(), css::table::CellContentType_FORMULA) << where;
            EXPECT_NEAR(c->getValue(), want, (us ? 1e-8 : 1e-10) * std::max(1.0, std::fabs(want))) << where;
        }
    }

    // Converts the readings in the given cells to US units in place.
    void readings_to_us(const char* sheet, const std::vector<std::pair<Q, int>>& rows, const char* cols) {
        for (const auto& [q, r] : rows)
            for (const char* c = cols; *c; ++c) {
                const double v = value(sheet, *c, r);
                if (!std::isnan(v)) put(sheet, *c, r, to_us(q, v));
            }
    }
};

// ---------------------------------------------------------------- expected values
// Layout (gen_plant_workbook.py, DEVELOPERS.md "Templates"): units cell
// Heaters.B5; heaters in columns C-F, readings rows 8-19, "readings complete"
// rows 20-22, results 26-37; pumps in C-D, readings 8-14, complete 15-16,
// results 21-31; heat rate runs in C-E, readings 8-22, 1 kWh in C23, the
// calls' units text in C24, complete 25-29, results 33-43.
constexpr const char* kHeaterCols = "CDEF";
constexpr const char* kPumpCols = "CD";
constexpr const char* kRunCols = "CDE";
constexpr int kHeaterRes = 26, kPumpRes = 21, kRunRes = 33;

std::vector<Expected> heater_expectations(const std::function<double(char, int)>& rd,
                                          const std::function<std::string(char, int)>& name) {
    std::vector<Expected> out;
    auto drain_h = [&](char c) { return state_pT(rd(c, 10), rd(c, 15) + kC0).h; };
    for (const char* cp = kHeaterCols; *cp; ++cp) {
        const char c = *cp;
        const double p_sh = rd(c, 10), t_ext = rd(c, 11), t_in = rd(c, 12), t_out = rd(c, 13), p_fw = rd(c, 14),
                     t_dr = rd(c, 15), m_fw = rd(c, 16), m_casc = rd(c, 17), ttd_d = rd(c, 18), dca_d = rd(c, 19);
        const std::string from = name(c, 9);
        const double ttd = eq::fwh_ttd(p_sh, t_out + kC0);
        const double dca = eq::fwh_dca(t_dr + kC0, t_in + kC0);
        const double h_ext = state_pT(p_sh, t_ext + kC0).h;
        const double h_in = state_pT(p_fw, t_in + kC0).h, h_out = state_pT(p_fw, t_out + kC0).h;
        const double h_dr = drain_h(c);
        double h_casc = kNaN;
        for (const char* u = kHeaterCols; *u && !from.empty(); ++u)
            if (name(*u, 8) == from) h_casc = drain_h(*u);
        const bool casc = !from.empty();
        EXPECT_TRUE(!casc || !std::isnan(h_casc)) << "no heater named " << from;
        const double m_ext = eq::fwh_extraction_flow(m_fw, h_in, h_out, h_ext, h_dr, casc ? m_casc : 0.0,
                                                     casc ? h_casc : h_dr);
        const std::vector<std::pair<double, Q>> col = {
            {ttd, Q::DT}, {ttd - ttd_d, Q::DT}, {dca, Q::DT}, {dca - dca_d, Q::DT},
            {eq::fwh_rise(t_in + kC0, t_out + kC0), Q::DT}, {h_ext, Q::H}, {h_in, Q::H}, {h_out, Q::H},
            {h_dr, Q::H}, {h_casc, Q::H}, {m_ext, Q::M}, {m_ext + (casc ? m_casc : 0.0), Q::M}};
        for (std::size_t i = 0; i < col.size(); ++i)
            out.push_back({"Heaters", c, kHeaterRes + static_cast<int>(i), col[i].first, col[i].second});
    }
    return out;
}

std::vector<Expected> pump_expectations(const std::function<double(char, int)>& rd) {
    std::vector<Expected> out;
    for (const char* cp = kPumpCols; *cp; ++cp) {
        const char c = *cp;
        const double p_in = rd(c, 9), t_in = rd(c, 10), p_out = rd(c, 11), t_out = rd(c, 12), m = rd(c, 13),
                     eta_d = rd(c, 14);
        const State in = state_pT(p_in, t_in + kC0), out_state = state_pT(p_out, t_out + kC0);
        const double h_s = state_ps(p_out, in.s).h;
        const double w_s = h_s - in.h, w = out_state.h - in.h, eta = w_s / w;
        // The core's pump model, run with that efficiency, lands on the measured discharge enthalpy.
        EXPECT_NEAR(eq::pump_pT(p_in, t_in + kC0, p_out, eta).h_out, out_state.h, 1e-9 * out_state.h);
        // Powers are in kW in both unit systems (kg/s x kJ/kg; US: Btu/h converted).
        const std::vector<std::pair<double, Q>> col = {
            {in.h, Q::H}, {in.s, Q::S}, {out_state.h, Q::H}, {h_s, Q::H}, {t_out - t_in, Q::DT}, {w_s, Q::H},
            {w, Q::H}, {eta, Q::Plain}, {eta - eta_d, Q::Plain}, {m * w_s, Q::Plain}, {m * w, Q::Plain}};
        for (std::size_t i = 0; i < col.size(); ++i)
            out.push_back({"Pumps", c, kPumpRes + static_cast<int>(i), col[i].first, col[i].second});
    }
    return out;
}

std::vector<Expected> run_expectations(const std::function<double(char, int)>& rd) {
    std::vector<Expected> out;
    for (const char* cp = kRunCols; *cp; ++cp) {
        const char c = *cp;
        const double m_ms = rd(c, 9), m_rh = rd(c, 14), p_gen = rd(c, 19), p_aux = rd(c, 20), eta_b = rd(c, 21),
                     hr_d = rd(c, 22);
        const double h_ms = state_pT(rd(c, 10), rd(c, 11) + kC0).h, h_fw = state_pT(rd(c, 12), rd(c, 13) + kC0).h;
        const double h_crh = state_pT(rd(c, 15), rd(c, 16) + kC0).h, h_hrh = state_pT(rd(c, 17), rd(c, 18) + kC0).h;
        // The workbook reads the outputs in MW (units text "... P=MW"); the core takes kW.
        const double hr = eq::cycle_heat_rate(m_ms, h_ms, h_fw, m_rh, h_hrh, h_crh, 1000 * p_gen);
        const double hr_net = eq::net_heat_rate(m_ms, h_ms, h_fw, m_rh, h_hrh, h_crh, 1000 * p_gen, 1000 * p_aux, eta_b);
        const double q_mw = eq::cycle_heat_input(m_ms, h_ms, h_fw, m_rh, h_hrh, h_crh) / 1000;
        const std::vector<std::pair<double, Q>> col = {
            {h_ms, Q::H}, {h_fw, Q::H}, {h_crh, Q::H}, {h_hrh, Q::H}, {hr, Q::HR}, {hr / hr_d - 1, Q::Plain},
            {q_mw, Q::Plain}, {3600 / hr, Q::Plain}, {p_gen - p_aux, Q::Plain}, {hr_net, Q::HR},
            {3600 / hr_net, Q::Plain}};
        for (std::size_t i = 0; i < col.size(); ++i)
            out.push_back({"Heat rate", c, kRunRes + static_cast<int>(i), col[i].first, col[i].second});
    }
    return out;
}

// Heaters.C17 etc.: the readings rows of each sheet and what they hold.
const std::vector<std::pair<Q, int>> kHeaterReadings = {{Q::P, 10}, {Q::T, 11}, {Q::T, 12}, {Q::T, 13}, {Q::P, 14},
                                                        {Q::T, 15}, {Q::M, 16}, {Q::M, 17}, {Q::DT, 18}, {Q::DT, 19}};
const std::vector<std::pair<Q, int>> kPumpReadings = {{Q::P, 9}, {Q::T, 10}, {Q::P, 11}, {Q::T, 12}, {Q::M, 13}};
const std::vector<std::pair<Q, int>> kRunReadings = {{Q::M, 9},  {Q::P, 10}, {Q::T, 11}, {Q::P, 12}, {Q::T, 13},
                                                     {Q::M, 14}, {Q::P, 15}, {Q::T, 16}, {Q::P, 17}, {Q::T, 18},
                                                     {Q::HR, 22}};

Q quantity_of(const std::vector<std::pair<Q, int>>& rows, int r) {
    for (const auto& [q, n] : rows)
        if (n == r) return q;
    return Q::Plain;
}

// Every expected result of the open workbook, from its own readings (us: read
// in US units and converted exactly to SI for the core).
class PlantExpect : public PlantBook {
protected:
    std::vector<Expected> expectations(bool us) {
        auto rd = [this, us](const char* sheet, const std::vector<std::pair<Q, int>>* rows) {
            return [this, us, sheet, rows](char c, int r) {
                const double v = value(sheet, c, r);
                return us ? from_us(quantity_of(*rows, r), v) : v;
            };
        };
        auto nm = [this](char c, int r) { return shown("Heaters", c, r); };
        std::vector<Expected> all = heater_expectations(rd("Heaters", &kHeaterReadings), nm);
        const auto pumps = pump_expectations(rd("Pumps", &kPumpReadings));
        const auto runs = run_expectations(rd("Heat rate", &kRunReadings));
        all.insert(all.end(), pumps.begin(), pumps.end());
        all.insert(all.end(), runs.begin(), runs.end());
        return all;
    }
    void check_labels(bool us) {
        for (const char* s : {"Heaters", "Pumps", "Heat rate"}) {
            EXPECT_EQ(shown(s, 'B', 5), us ? "US" : "SI") << s;
            EXPECT_NE(shown(s, 'A', 3).find("licensed engineer"), std::string::npos) << s << ": " << shown(s, 'A', 3);
            EXPECT_NE(shown(s, 'A', 5).find("Units of the readings and results"), std::string::npos) << s;
        }
        EXPECT_NE(shown("Heaters", 'A', 6).find("does not convert readings"), std::string::npos);
        EXPECT_NE(shown("Pumps", 'A', 17).find("0.01 K"), std::string::npos) << shown("Pumps", 'A', 17);
        EXPECT_EQ(shown("Heaters", 'B', 10), us ? "psia" : "MPa");
        EXPECT_EQ(shown("Heaters", 'B', 26), us ? "Δ°F" : "K");
        EXPECT_EQ(shown("Heaters", 'B', 36), us ? "lbm/h" : "kg/s");
        EXPECT_EQ(shown("Heat rate", 'B', 37), us ? "Btu/kWh" : "kJ/kWh");
        EXPECT_EQ(shown("Heat rate", 'C', 24), us ? "US P=MW" : "SI P=MW");
        // 1 kWh per kWh in the heat rate's unit: 3600 kJ/kWh = 3412.14 Btu/kWh (NIST SP 811 (2008) App. B).
        EXPECT_NEAR(value("Heat rate", 'C', 23), us ? 3600 / kKJPerBtu : 3600.0, 1e-9);
        // All "readings complete" cells of the demo are TRUE, but "reheat" and
        // "cascade" ones where the demo has none.
        for (const char* c = kHeaterCols; *c; ++c)
            for (int r = 21; r <= 22; ++r) EXPECT_EQ(shown("Heaters", *c, r), "TRUE") << *c << r;
        for (const char* c = kRunCols; *c; ++c)
            for (int r = 25; r <= 29; ++r) EXPECT_EQ(shown("Heat rate", *c, r), "TRUE") << *c << r;
        EXPECT_EQ(shown("Heaters", 'D', 20), "FALSE");  // LP4: no drains cascade in
    }
};

TEST_F(PlantExpect, DemoResultsMatchTheCoreInSiAndAfterSwitchingToUs) {
    load("harrow-fen-unit2-plant-performance.ods");
    check_labels(false);
    const std::vector<Expected> all = expectations(false);
    check(all, false);

    // The demo's readings were chosen to look like a 660 MW reheat unit (common practice).
    for (const char* c = kHeaterCols; *c; ++c) {
        EXPECT_GT(value("Heaters", *c, 26), -2.0) << *c;  // TTD, K
        EXPECT_LT(value("Heaters", *c, 26), 4.0) << *c;
        EXPECT_GT(value("Heaters", *c, 36), 15.0) << *c;  // extraction flow, kg/s
        EXPECT_LT(value("Heaters", *c, 36), 50.0) << *c;
    }
    // The pump readings were invented for about 81.5 % and 76 % (demo data, gen_plant_workbook.py).
    EXPECT_NEAR(value("Pumps", 'C', 28), 0.815, 0.005);  // feed pump efficiency
    EXPECT_NEAR(value("Pumps", 'D', 28), 0.76, 0.01);    // condensate pump efficiency
    for (const char* c = kRunCols; *c; ++c) {
        EXPECT_GT(value("Heat rate", *c, 37), 7900.0) << *c;  // kJ/kWh
        EXPECT_LT(value("Heat rate", *c, 37), 8400.0) << *c;
    }

    // Same plant, same readings converted exactly to US units: every result follows.
    readings_to_us("Heaters", kHeaterReadings, kHeaterCols);
    readings_to_us("Pumps", kPumpReadings, kPumpCols);
    readings_to_us("Heat rate", kRunReadings, kRunCols);
    put_text("Heaters", 'B', 5, "US");
    calculate();
    EXPECT_EQ(shown("Pumps", 'B', 5), "US");
    check(all, true);

    // And the add-in's own US path agrees: STEAM.FWH.TTD and STEAM.HEATRATE.CYCLE
    // evaluated by the core's call() on the US readings.
    auto us_call = [](const char* fn, std::vector<Value> args, const char* units) {
        args.push_back(Value::of_text(units));
        const Value v = call_scalar(*catalogue::find(fn), args);
        EXPECT_EQ(v.kind, Value::Kind::Number) << fn << ": " << v.text;
        return v.number;
    };
    EXPECT_NEAR(value("Heaters", 'E', 26),
                us_call("STEAM.FWH.TTD", {Value::of(value("Heaters", 'E', 10)), Value::of(value("Heaters", 'E', 13))},
                        "US"),
                1e-9);
    // STEAM.HEATRATE.CYCLE(m_ms; h_fw; h_ms; P_gen; m_rh; h_crh; h_hrh; "US P=MW")
    EXPECT_NEAR(value("Heat rate", 'D', 37),
                us_call("STEAM.HEATRATE.CYCLE",
                        {Value::of(value("Heat rate", 'D', 9)), Value::of(value("Heat rate", 'D', 34)),
                         Value::of(value("Heat rate", 'D', 33)), Value::of(value("Heat rate", 'D', 19)),
                         Value::of(value("Heat rate", 'D', 14)), Value::of(value("Heat rate", 'D', 35)),
                         Value::of(value("Heat rate", 'D', 36))},
                        "US P=MW"),
                1e-9 * value("Heat rate", 'D', 37));
}

// The US copy: the SI demo's readings as US instruments show them. Its results
// match the core for its own readings, and the SI demo's within the rounding
// of those readings.
TEST_F(PlantExpect, UsDemoCopyMatchesTheCoreAndTheSiDemo) {
    load("harrow-fen-unit2-plant-performance.ods");
    std::vector<Expected> si = expectations(false);
    std::vector<double> si_shown;
    for (const auto& e : si) si_shown.push_back(value(e.sheet, e.col, e.row));
    load("harrow-fen-unit2-plant-performance-us.ods");
    check_labels(true);
    const std::vector<Expected> us = expectations(true);
    check(us, true);
    // Against the SI demo: each result converted back to SI. Tolerances for the
    // instruments' rounding (psia 4-5 figures, 0.1 degF, 100 lbm/h; pump
    // temperatures 0.01 degF): 0.1 K, 0.3 kJ/kg, 0.2 % of a heat rate, 0.5 % of a flow,
    // 1.5 percentage points of a pump efficiency (its rise is 0.3 K).
    double worst_hr = 0, worst_pump = 0;
    for (std::size_t i = 0; i < us.size(); ++i) {
        const Expected& e = us[i];
        if (std::isnan(e.si)) continue;
        const double got = from_us(e.q, value(e.sheet, e.col, e.row)), want = si_shown[i];
        const std::string where = std::string(e.sheet) + "." + e.col + std::to_string(e.row);
        double tol = std::max(1e-3 * std::fabs(want), 5e-4);
        if (e.q == Q::DT) tol = 0.1;
        if (e.q == Q::H || e.q == Q::S) tol = 0.3;
        if (e.q == Q::HR) tol = 2e-3 * std::fabs(want);
        if (e.q == Q::M) tol = 5e-3 * std::fabs(want);
        if (std::string(e.sheet) == "Pumps") tol = std::max(tol, 0.015 * std::max(1.0, std::fabs(want)));
        if (std::string(e.sheet) == "Pumps" && e.row >= 30) tol = 0.03 * std::fabs(want);  // powers follow the rise
        if (std::string(e.sheet) == "Pumps" && e.row == 25) tol = 0.01;                  // temperature rise, K
        EXPECT_NEAR(got, want, tol) << where;
        if (e.q == Q::HR) worst_hr = std::max(worst_hr, std::fabs(got / want - 1));
        if (std::string(e.sheet) == "Pumps" && e.row == 28) worst_pump = std::max(worst_pump, std::fabs(got - want));
    }
    std::printf("plant workbook US copy vs SI demo: heat rates within %.4f %%, pump efficiencies within %.3f points\n",
                100 * worst_hr, 100 * worst_pump);
}

// The charts: heater TTD/DCA bars and cycle heat rate against load, automatic axes
// that Calc fits to the values (read back from the chart model).
TEST_F(PlantExpect, ChartsFitTheirValues) {
    for (const char* file : {"harrow-fen-unit2-plant-performance.ods", "harrow-fen-unit2-plant-performance-us.ods"}) {
        SCOPED_TRACE(file);
        load(file);
        ASSERT_EQ(wb_.chart_count("Heaters"), 1);
        ASSERT_EQ(wb_.chart_count("Heat rate"), 1);
        const AxisScale bars = wb_.axis("Heaters", 0, 'y');
        EXPECT_TRUE(bars.auto_min);
        double lo = 1e9, hi = -1e9;
        for (const char* c = kHeaterCols; *c; ++c)
            for (int r : {26, 18, 28, 19}) {
                lo = std::min(lo, value("Heaters", *c, r));
                hi = std::max(hi, value("Heaters", *c, r));
            }
        EXPECT_LE(bars.min, std::min(lo, 0.0));
        EXPECT_GE(bars.max, hi);
        EXPECT_LT(bars.max, 2 * hi);
        const AxisScale load_ax = wb_.axis("Heat rate", 0, 'x'), hr_ax = wb_.axis("Heat rate", 0, 'y');
        EXPECT_TRUE(load_ax.auto_min);
        EXPECT_TRUE(hr_ax.auto_min);
        double hr_lo = 1e9, hr_hi = -1e9;
        for (const char* c = kRunCols; *c; ++c) {
            EXPECT_LE(load_ax.min, value("Heat rate", *c, 19));
            EXPECT_GE(load_ax.max, value("Heat rate", *c, 19));
            for (int r : {37, 22}) {
                hr_lo = std::min(hr_lo, value("Heat rate", *c, r));
                hr_hi = std::max(hr_hi, value("Heat rate", *c, r));
            }
        }
        EXPECT_GT(load_ax.min, 0.0);  // the load axis does not start at 0
        EXPECT_LE(hr_ax.min, hr_lo);
        EXPECT_GE(hr_ax.max, hr_hi);
        EXPECT_GT(hr_ax.min, 0.5 * hr_hi);  // nor does the heat rate axis
        std::printf("%s: TTD/DCA axis %g..%g (values %.2f..%.2f); load axis %g..%g MW; heat rate axis %g..%g"
                    " (values %.0f..%.0f)\n",
                    file, bars.min, bars.max, lo, hi, load_ax.min, load_ax.max, hr_ax.min, hr_ax.max, hr_lo, hr_hi);
    }
}

TEST_F(PlantExpect, BlankTemplatesRecalculateToEmptyResultsWithoutErrors) {
    for (const char* file : {"isentra-plant-performance.ots", "isentra-plant-performance-us.ots"}) {
        SCOPED_TRACE(file);
        load(file);
        const bool us = std::string(file).find("-us") != std::string::npos;
        EXPECT_EQ(shown("Heaters", 'B', 5), us ? "US" : "SI");
        std::vector<Expected> empty;
        for (const char* c = kHeaterCols; *c; ++c)
            for (int r = 26; r <= 37; ++r) empty.push_back({"Heaters", *c, r, kNaN, Q::Plain});
        for (const char* c = kPumpCols; *c; ++c)
            for (int r = 21; r <= 31; ++r) empty.push_back({"Pumps", *c, r, kNaN, Q::Plain});
        for (const char* c = kRunCols; *c; ++c)
            for (int r = 33; r <= 43; ++r) empty.push_back({"Heat rate", *c, r, kNaN, Q::Plain});
        check(empty, false);
        for (const char* c = kHeaterCols; *c; ++c) {
            EXPECT_TRUE(std::isnan(value("Heaters", *c, 10))) << "readings are blank";
            for (int r = 20; r <= 22; ++r) EXPECT_EQ(shown("Heaters", *c, r), "FALSE") << *c << r;
        }
        if (us) continue;  // the rest is the same wiring

        // A partial heater (no flows) gives TTD, DCA and rise but no extraction flow yet.
        const double part[6] = {0.236, 188.4, 96.3, 122.7, 2.71, 102.0};  // rows 10-15, invented
        for (int i = 0; i < 5; ++i) put("Heaters", 'D', 10 + i, part[i]);
        calculate();
        EXPECT_EQ(shown("Heaters", 'D', 26), "");  // one reading still blank: nothing reaches a call
        put("Heaters", 'D', 15, part[5]);
        calculate();
        EXPECT_NEAR(value("Heaters", 'D', 26), eq::fwh_ttd(0.236, 122.7 + kC0), 1e-10);
        EXPECT_NEAR(value("Heaters", 'D', 28), eq::fwh_dca(102.0 + kC0, 96.3 + kC0), 1e-10);
        EXPECT_EQ(shown("Heaters", 'D', 27), "");  // no design TTD typed
        EXPECT_EQ(shown("Heaters", 'D', 36), "");
        // With the feedwater flow the balance closes (no cascade: the five-argument call).
        put("Heaters", 'D', 16, 414.0);
        calculate();
        const double h_in = state_pT(2.71, 96.3 + kC0).h, h_out = state_pT(2.71, 122.7 + kC0).h;
        const double h_ext = state_pT(0.236, 188.4 + kC0).h, h_dr = state_pT(0.236, 102.0 + kC0).h;
        EXPECT_NEAR(value("Heaters", 'D', 36), eq::fwh_extraction_flow(414.0, h_in, h_out, h_ext, h_dr, 0, h_dr), 1e-9);
        // A run without reheat (flow 0, reheat readings left blank) has a heat rate
        // (the call without the reheat arguments).
        const double run[6] = {180.0, 12.5, 535.0, 14.0, 230.0, 0.0};  // rows 9-14, invented
        for (int i = 0; i < 6; ++i) put("Heat rate", 'C', 9 + i, run[i]);
        calculate();
        EXPECT_EQ(shown("Heat rate", 'C', 37), "");  // no output yet
        put("Heat rate", 'C', 19, 210.0);
        calculate();
        EXPECT_EQ(shown("Heat rate", 'C', 25), "FALSE");
        const double hr = eq::cycle_heat_rate(180.0, state_pT(12.5, 535.0 + kC0).h, state_pT(14.0, 230.0 + kC0).h, 0,
                                              0, 0, 210000.0);
        EXPECT_NEAR(value("Heat rate", 'C', 37), hr, 1e-9 * hr);
        EXPECT_EQ(shown("Heat rate", 'C', 42), "");  // no auxiliary power / boiler efficiency yet
    }
}

}  // namespace
}  // namespace isentra::calctest
