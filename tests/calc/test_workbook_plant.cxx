// SPDX-License-Identifier: MPL-2.0
// The plant performance workbook (templates/gen_plant_workbook.py: sheets
// Heaters, Pumps, Heat rate) opened in the headless Calc with the extension.
// Every result cell is recomputed here from the sheet's own readings with the
// core (state_pT / state_ps and isentra::equipment; the core itself is
// checked against the IAPWS tables and python3-iapws in core_tests): what is
// under test is the workbook's wiring, its blank handling and its units cell.
#include <sys/stat.h>
#include <unistd.h>

#include <cmath>
#include <filesystem>
#include <functional>
#include <limits>
#include <string>
#include <vector>

#include <com/sun/star/beans/PropertyValue.hpp>
#include <com/sun/star/frame/XComponentLoader.hpp>
#include <com/sun/star/lang/XMultiComponentFactory.hpp>
#include <com/sun/star/sheet/XCalculatable.hpp>
#include <com/sun/star/sheet/XSpreadsheet.hpp>
#include <com/sun/star/sheet/XSpreadsheetDocument.hpp>
#include <com/sun/star/sheet/XSpreadsheets.hpp>
#include <com/sun/star/text/XTextRange.hpp>
#include <rtl/ustring.hxx>

#include "isentra/surface/call.hpp"
#include "isentra/surface/catalogue.hpp"
#include "isentra/engineering/equipment.hpp"
#include "isentra/properties/state.hpp"
#include "calc_test.hxx"

namespace isentra::calctest {
namespace {

namespace fs = std::filesystem;
namespace eq = isentra::equipment;
using namespace css::uno;
using ::rtl::OUString;

constexpr double kNaN = std::numeric_limits<double>::quiet_NaN();
constexpr double kC0 = 273.15;

// SI -> US factors, exact by definition (NIST SP 811 (2008) Appendix B).
constexpr double kPsiaPerMPa = 1e6 / 6894.757293168361;
constexpr double kLbmhPerKgs = 3600.0 / 0.45359237;
constexpr double kKJPerBtu = 1.05505585262;           // international table Btu
constexpr double kKJkgPerBtulbm = 2.326;              // exact: the IT Btu/lbm is defined as 2.326 kJ/kg
constexpr double kKJkgKPerBtulbmF = 4.1868;

enum class Q { Plain, P, T, DT, H, S, M, HR };  // what a cell holds, for the US conversion

double to_us(Q q, double v) {
    switch (q) {
        case Q::P: return v * kPsiaPerMPa;
        case Q::T: return v * 1.8 + 32;
        case Q::DT: return v * 1.8;
        case Q::H: return v / kKJkgPerBtulbm;
        case Q::S: return v / kKJkgKPerBtulbmF;
        case Q::M: return v * kLbmhPerKgs;
        case Q::HR: return v / kKJPerBtu;
        case Q::Plain: break;
    }
    return v;
}

// A result cell and the value the core gives for it in SI.
struct Expected {
    const char* sheet;
    char col;
    int row;
    double si;  // NaN: the cell must be empty
    Q q;
};

// One document loaded from a private copy of a built workbook.
class PlantBook : public ::testing::Test {
protected:
    void load(const char* file) {
        const fs::path src = fs::path(ISENTRA_OXT_PATH).parent_path() / "templates" / file;
        ASSERT_TRUE(fs::is_regular_file(src)) << "not built: " << src;
        std::string tmpl = (fs::temp_directory_path() / "isentra-plant-XXXXXX").string();
        ASSERT_NE(::mkdtemp(tmpl.data()), nullptr);
        tmp_ = tmpl;
        ::chmod(tmp_.c_str(), 0755);  // the office may run as another user
        const fs::path local = tmp_ / file;
        fs::copy_file(src, local);
        ::chmod(local.c_str(), 0644);
        auto& ctx = Office::get().context();
        Reference<css::frame::XComponentLoader> desktop(
            ctx->getServiceManager()->createInstanceWithContext("com.sun.star.frame.Desktop", ctx), UNO_QUERY_THROW);
        Sequence<css::beans::PropertyValue> props(1);
        props[0].Name = "Hidden";
        props[0].Value <<= true;
        book_ = desktop->loadComponentFromURL(OUString::createFromAscii(("file://" + local.string()).c_str()),
                                              "_blank", 0, props);
        ASSERT_TRUE(book_.is()) << local;
        calculate();
    }
    void TearDown() override {
        if (book_.is()) Office::close(book_);
        if (!tmp_.empty()) fs::remove_all(tmp_);
    }
    void calculate() { Reference<css::sheet::XCalculatable>(book_, UNO_QUERY_THROW)->calculateAll(); }

    Reference<css::table::XCell> at(const char* sheet, char col, int row) {
        Reference<css::sheet::XSpreadsheetDocument> doc(book_, UNO_QUERY_THROW);
        Reference<css::sheet::XSpreadsheet> s(doc->getSheets()->getByName(OUString::createFromAscii(sheet)),
                                             UNO_QUERY_THROW);
        return s->getCellByPosition(col - 'A', row - 1);
    }
    std::string shown(const char* sheet, char col, int row) {
        Reference<css::text::XTextRange> t(at(sheet, col, row), UNO_QUERY_THROW);
        return ::rtl::OUStringToOString(t->getString(), RTL_TEXTENCODING_UTF8).getStr();
    }
    // A number cell; blank gives NaN. Error cells fail the test.
    double value(const char* sheet, char col, int row) {
        auto c = at(sheet, col, row);
        EXPECT_EQ(c->getError(), 0) << sheet << "." << col << row << " shows " << shown(sheet, col, row);
        if (c->getType() == css::table::CellContentType_EMPTY) return kNaN;
        return c->getValue();
    }
    void put(const char* sheet, char col, int row, double v) { at(sheet, col, row)->setValue(v); }
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

    Reference<css::lang::XComponent> book_;
    fs::path tmp_;
};

// ---------------------------------------------------------------- expected values
// Layout (gen_plant_workbook.py, DEVELOPERS.md "Templates"): units cell
// Heaters.B5; heaters in columns C-F, readings rows 8-19, results 23-34;
// pumps in C-D, readings 8-14, results 19-29; heat rate runs in C-E,
// readings 8-22, 1 kWh in C23, results 27-37.
constexpr const char* kHeaterCols = "CDEF";
constexpr const char* kPumpCols = "CD";
constexpr const char* kRunCols = "CDE";

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
            out.push_back({"Heaters", c, 23 + static_cast<int>(i), col[i].first, col[i].second});
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
        const std::vector<std::pair<double, Q>> col = {
            {in.h, Q::H}, {in.s, Q::S}, {out_state.h, Q::H}, {h_s, Q::H}, {t_out - t_in, Q::DT}, {w_s, Q::H},
            {w, Q::H}, {eta, Q::Plain}, {eta - eta_d, Q::Plain}, {m * w_s, Q::Plain}, {m * w, Q::Plain}};
        for (std::size_t i = 0; i < col.size(); ++i)
            out.push_back({"Pumps", c, 19 + static_cast<int>(i), col[i].first, col[i].second});
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
        const double hr = eq::cycle_heat_rate(m_ms, h_ms, h_fw, m_rh, h_hrh, h_crh, 1000 * p_gen);
        const double hr_net = eq::net_heat_rate(m_ms, h_ms, h_fw, m_rh, h_hrh, h_crh, 1000 * p_gen, 1000 * p_aux, eta_b);
        const double q_mw = eq::cycle_heat_input(m_ms, h_ms, h_fw, m_rh, h_hrh, h_crh) / 1000;
        const std::vector<std::pair<double, Q>> col = {
            {h_ms, Q::H}, {h_fw, Q::H}, {h_crh, Q::H}, {h_hrh, Q::H}, {hr, Q::HR}, {hr / hr_d - 1, Q::Plain},
            {q_mw, Q::Plain}, {3600 / hr, Q::Plain}, {p_gen - p_aux, Q::Plain}, {hr_net, Q::HR},
            {3600 / hr_net, Q::Plain}};
        for (std::size_t i = 0; i < col.size(); ++i)
            out.push_back({"Heat rate", c, 27 + static_cast<int>(i), col[i].first, col[i].second});
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

TEST_F(PlantBook, DemoResultsMatchTheCoreInSiAndAfterSwitchingToUs) {
    load("harrow-fen-unit2-plant-performance.ods");
    EXPECT_EQ(shown("Heaters", 'B', 5), "SI");
    EXPECT_EQ(shown("Pumps", 'B', 5), "SI");
    EXPECT_EQ(shown("Heat rate", 'B', 5), "SI");
    for (const char* s : {"Heaters", "Pumps", "Heat rate"})
        EXPECT_NE(shown(s, 'A', 3).find("licensed engineer"), std::string::npos) << s << ": " << shown(s, 'A', 3);
    EXPECT_NE(shown("Pumps", 'A', 15).find("0.01 K"), std::string::npos) << shown("Pumps", 'A', 15);

    auto rd = [this](const char* sheet) {
        return [this, sheet](char c, int r) { return value(sheet, c, r); };
    };
    auto nm = [this](char c, int r) { return shown("Heaters", c, r); };
    std::vector<Expected> all = heater_expectations(rd("Heaters"), nm);
    const auto pumps = pump_expectations(rd("Pumps"));
    const auto runs = run_expectations(rd("Heat rate"));
    all.insert(all.end(), pumps.begin(), pumps.end());
    all.insert(all.end(), runs.begin(), runs.end());
    check(all, false);
    EXPECT_EQ(value("Heat rate", 'C', 23), 3600.0);  // kJ in 1 kWh, by definition

    // The demo's readings were chosen to look like a 660 MW reheat unit (common practice).
    for (const char* c = kHeaterCols; *c; ++c) {
        EXPECT_GT(value("Heaters", *c, 23), -2.0) << *c;  // TTD, K
        EXPECT_LT(value("Heaters", *c, 23), 4.0) << *c;
        EXPECT_GT(value("Heaters", *c, 33), 15.0) << *c;  // extraction flow, kg/s
        EXPECT_LT(value("Heaters", *c, 33), 50.0) << *c;
    }
    // The pump readings were invented for about 81.5 % and 76 % (demo data, gen_plant_workbook.py).
    EXPECT_NEAR(value("Pumps", 'C', 26), 0.815, 0.005);  // feed pump efficiency
    EXPECT_NEAR(value("Pumps", 'D', 26), 0.76, 0.01);    // condensate pump efficiency
    for (const char* c = kRunCols; *c; ++c) {
        EXPECT_GT(value("Heat rate", *c, 31), 7900.0) << *c;  // kJ/kWh
        EXPECT_LT(value("Heat rate", *c, 31), 8400.0) << *c;
    }

    // Same plant, same readings in US units: every result follows.
    readings_to_us("Heaters", kHeaterReadings, kHeaterCols);
    readings_to_us("Pumps", kPumpReadings, kPumpCols);
    readings_to_us("Heat rate", kRunReadings, kRunCols);
    put_text("Heaters", 'B', 5, "US");
    calculate();
    EXPECT_EQ(shown("Pumps", 'B', 5), "US");
    EXPECT_EQ(shown("Heaters", 'B', 10), "psia");
    EXPECT_EQ(shown("Heaters", 'B', 23), "Δ°F");
    EXPECT_EQ(shown("Heaters", 'B', 33), "lbm/h");
    EXPECT_EQ(shown("Heat rate", 'B', 31), "Btu/kWh");
    EXPECT_NEAR(value("Heat rate", 'C', 23), 3600 / kKJPerBtu, 1e-9);  // Btu in 1 kWh, NIST SP 811 (2008) App. B
    check(all, true);

    // And the add-in's own US path agrees: STEAM.FWH.TTD and STEAM.HEATRATE.CYCLE
    // evaluated by the core's call() on the US readings.
    auto us_call = [](const char* fn, std::vector<Value> args) {
        args.push_back(Value::of_text("US"));
        const Value v = call_scalar(*catalogue::find(fn), args);
        EXPECT_EQ(v.kind, Value::Kind::Number) << fn << ": " << v.text;
        return v.number;
    };
    EXPECT_NEAR(value("Heaters", 'E', 23),
                us_call("STEAM.FWH.TTD", {Value::of(value("Heaters", 'E', 10)), Value::of(value("Heaters", 'E', 13))}),
                1e-9);
    EXPECT_NEAR(value("Heat rate", 'D', 31),
                us_call("STEAM.HEATRATE.CYCLE",
                        {Value::of(value("Heat rate", 'D', 9)), Value::of(value("Heat rate", 'D', 28)),
                         Value::of(value("Heat rate", 'D', 27)), Value::of(1000 * value("Heat rate", 'D', 19)),
                         Value::of(value("Heat rate", 'D', 14)), Value::of(value("Heat rate", 'D', 29)),
                         Value::of(value("Heat rate", 'D', 30))}),
                1e-9 * value("Heat rate", 'D', 31));
}

TEST_F(PlantBook, BlankTemplateRecalculatesToEmptyResultsWithoutErrors) {
    load("isentra-plant-performance.ots");
    EXPECT_EQ(shown("Heaters", 'B', 5), "SI");
    std::vector<Expected> empty;
    for (const char* c = kHeaterCols; *c; ++c)
        for (int r = 23; r <= 34; ++r) empty.push_back({"Heaters", *c, r, kNaN, Q::Plain});
    for (const char* c = kPumpCols; *c; ++c)
        for (int r = 19; r <= 29; ++r) empty.push_back({"Pumps", *c, r, kNaN, Q::Plain});
    for (const char* c = kRunCols; *c; ++c)
        for (int r = 27; r <= 37; ++r) empty.push_back({"Heat rate", *c, r, kNaN, Q::Plain});
    check(empty, false);
    for (const char* c = kHeaterCols; *c; ++c) EXPECT_TRUE(std::isnan(value("Heaters", *c, 10))) << "readings are blank";

    // A partial heater (no flows) gives TTD, DCA and rise but no extraction flow yet.
    const double part[6] = {0.236, 188.4, 96.3, 122.7, 2.71, 102.0};  // rows 10-15, invented
    for (int i = 0; i < 6; ++i) put("Heaters", 'D', 10 + i, part[i]);
    calculate();
    EXPECT_NEAR(value("Heaters", 'D', 23), eq::fwh_ttd(0.236, 122.7 + kC0), 1e-10);
    EXPECT_NEAR(value("Heaters", 'D', 25), eq::fwh_dca(102.0 + kC0, 96.3 + kC0), 1e-10);
    EXPECT_EQ(shown("Heaters", 'D', 24), "");  // no design TTD typed
    EXPECT_EQ(shown("Heaters", 'D', 33), "");
    // With the feedwater flow the balance closes.
    put("Heaters", 'D', 16, 414.0);
    calculate();
    const double h_in = state_pT(2.71, 96.3 + kC0).h, h_out = state_pT(2.71, 122.7 + kC0).h;
    const double h_ext = state_pT(0.236, 188.4 + kC0).h, h_dr = state_pT(0.236, 102.0 + kC0).h;
    EXPECT_NEAR(value("Heaters", 'D', 33), eq::fwh_extraction_flow(414.0, h_in, h_out, h_ext, h_dr, 0, h_dr), 1e-9);
    // A run without reheat (flow 0, reheat temperatures left blank) has a heat rate.
    const double run[6] = {180.0, 12.5, 535.0, 14.0, 230.0, 0.0};  // rows 9-14, invented
    for (int i = 0; i < 6; ++i) put("Heat rate", 'C', 9 + i, run[i]);
    put("Heat rate", 'C', 19, 210.0);
    calculate();
    const double hr = eq::cycle_heat_rate(180.0, state_pT(12.5, 535.0 + kC0).h, state_pT(14.0, 230.0 + kC0).h, 0, 0, 0,
                                          210000.0);
    EXPECT_NEAR(value("Heat rate", 'C', 31), hr, 1e-9 * hr);
    EXPECT_EQ(shown("Heat rate", 'C', 36), "");  // no auxiliary power / boiler efficiency yet
}

}  // namespace
}  // namespace isentra::calctest
