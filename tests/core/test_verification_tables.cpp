// SPDX-License-Identifier: MPL-2.0
// The computer-program verification tables of the IAPWS releases, every
// printed check value that a public function reaches, release and table named
// beside each value.
//
// Forward values (IF97 basic equations, metastable vapour, transport
// properties, surface tension) go through the spreadsheet surface
// (isentra::call with the core units "K": MPa, K, kJ/kg, Pa s, W/(m K), N/m)
// or, for values that only exist inside a correlation (lambda_0, lambda_1,
// xi, Z, the R12-08 (rho, T) form), the public core API. Each is compared to
// all printed digits: |computed - printed| <= half a unit of the last printed
// digit, the tolerance read from the printed text itself (Printed below).
// Where a table gives (T, rho) instead of (T, p) (R7-97 Table 33, R15-11
// Table 9), p is solved from the printed (T, rho) on IF97 Eq. 28
// (if97::region3_p) and the functions are called with (p, T).
//
// Values were read on the rendered pages (pdftotext -layout, digits checked on
// pdftoppm renders) of the releases in /work/shared/iapws.
//
// Each table prints its worst relative deviation (computed/printed - 1).
#include <gtest/gtest.h>

#include <algorithm>
#include <cmath>
#include <cstdio>
#include <cstdlib>
#include <map>
#include <string>
#include <vector>

#include "isentra/base/error.hpp"
#include "isentra/if97/if97.hpp"
#include "isentra/properties/state.hpp"
#include "isentra/properties/transport.hpp"
#include "isentra/surface/call.hpp"
#include "isentra/surface/catalogue.hpp"

using namespace isentra;

namespace {

// A value as printed in a release, e.g. "0.100215168e-2" for 0.100 215 168 x 10^-2.
// Its tolerance is half a unit of its last printed digit.
struct Printed {
    double value;
    double half_unit;
};

Printed printed(const std::string& text) {
    const std::size_t e = text.find_first_of("eE");
    const std::string mant = text.substr(0, e);
    const int exp10 = e == std::string::npos ? 0 : std::atoi(text.c_str() + e + 1);
    const std::size_t dot = mant.find('.');
    const int decimals = dot == std::string::npos ? 0 : static_cast<int>(mant.size() - dot - 1);
    return {std::strtod(text.c_str(), nullptr), 0.5 * std::pow(10.0, exp10 - decimals)};
}

// Worst deviations per release and table, printed at the end of the run.
struct Worst {
    int n = 0;         // values checked
    double rel = 0;    // worst |computed/printed - 1|
    double units = 0;  // worst |computed - printed| in half-units of the last printed digit (<= 1 passes)
    double dev = 0;    // backward tables: worst |exact - printed| / the release's stated maximum deviation
};
std::map<std::string, Worst>& worst() {
    static std::map<std::string, Worst> w;
    return w;
}

// Checks `got` (scaled by `scale` to the printed unit) against the printed text.
// half_units: the tolerance in half-units of the last printed digit (1 unless a
// value is documented as printed off by its last digit).
void check(const std::string& table, const std::string& what, double got, const std::string& text,
           double scale = 1.0, double half_units = 1.0) {
    const Printed p = printed(text);
    const double g = got * scale;
    // 1e-12 relative for the decimal-binary conversion of the printed value.
    EXPECT_LE(std::fabs(g - p.value), half_units * p.half_unit + 1e-12 * std::fabs(p.value))
        << table << ", " << what << ": computed " << g << ", printed " << text;
    Worst& w = worst()[table];
    w.rel = std::max(w.rel, std::fabs(g / p.value - 1.0));
    w.units = std::max(w.units, std::fabs(g - p.value) / p.half_unit);
    ++w.n;
}

// Checks |got - reference| <= max_dev (a release's stated maximum deviation).
void check_dev(const std::string& table, const std::string& what, double got, double reference,
               double max_dev) {
    EXPECT_LE(std::fabs(got - reference), max_dev) << table << ", " << what << ": computed " << got
                                                   << ", printed " << reference;
    Worst& w = worst()[table];
    w.dev = std::max(w.dev, std::fabs(got - reference) / max_dev);
    ++w.n;
}

// A number from a catalogue function through the spreadsheet surface, in the
// core units.
double fn(const char* name, std::vector<double> args) {
    const catalogue::Function* f = catalogue::find(name);
    EXPECT_NE(f, nullptr) << name;
    if (!f) return std::nan("");
    std::vector<Value> v;
    for (double a : args) v.push_back(Value::of(a));
    v.push_back(Value::of_text("K"));
    const Value r = call_scalar(*f, v);
    EXPECT_EQ(r.kind, Value::Kind::Number) << name << ": " << r.text;
    return r.kind == Value::Kind::Number ? r.number : std::nan("");
}

class Report : public ::testing::Environment {
public:
    void TearDown() override {
        std::printf("verification tables: values, worst relative deviation from the printed value, the same in "
                    "half-units of the last printed digit, and (backward equations) the worst deviation of the "
                    "exact inverse as a fraction of the release's stated maximum:\n");
        for (const auto& [table, w] : worst())
            std::printf("  %-36s %4d  rel %-8.2g half-units %-6.3f of max %.3f\n", table.c_str(), w.n, w.rel, w.units,
                        w.dev);
    }
};
const auto* const report = ::testing::AddGlobalTestEnvironment(new Report);

// One column of a forward table: the state's inputs and the printed v, h, u, s, cp, w.
struct Column {
    double T, p;
    const char *v, *h, *u, *s, *cp, *w;
};

// v, h, u, s, cp, w through STEAM.<X><suffix>.PT.
void check_column(const std::string& table, const Column& c, const std::string& suffix = "") {
    const std::string at = " at " + std::to_string(c.T) + " K, " + std::to_string(c.p) + " MPa";
    const auto name = [&](const char* x) { return "STEAM." + std::string(x) + suffix + ".PT"; };
    check(table, "v" + at, fn(name("V").c_str(), {c.p, c.T}), c.v);
    check(table, "h" + at, fn(name("H").c_str(), {c.p, c.T}), c.h);
    check(table, "u" + at, fn(name("U").c_str(), {c.p, c.T}), c.u);
    check(table, "s" + at, fn(name("S").c_str(), {c.p, c.T}), c.s);
    check(table, "cp" + at, fn(name("CP").c_str(), {c.p, c.T}), c.cp);
    check(table, "w" + at, fn(name("W").c_str(), {c.p, c.T}), c.w);
}

}  // namespace

// ===========================================================================
// IAPWS R7-97(2012), IF97 basic equations
// ===========================================================================

TEST(VerificationIF97, Table5Region1) {
    const Column cols[] = {
        // IAPWS R7-97(2012) Table 5
        {300, 3, "0.100215168e-2", "0.115331273e3", "0.112324818e3", "0.392294792", "0.417301218e1", "0.150773921e4"},
        {300, 80, "0.971180894e-3", "0.184142828e3", "0.106448356e3", "0.368563852", "0.401008987e1", "0.163469054e4"},
        {500, 3, "0.120241800e-2", "0.975542239e3", "0.971934985e3", "0.258041912e1", "0.465580682e1", "0.124071337e4"},
    };
    for (const Column& c : cols) check_column("R7-97(2012) Table 5", c);
}

TEST(VerificationIF97, Table15Region2) {
    const Column cols[] = {
        // IAPWS R7-97(2012) Table 15
        {300, 0.0035, "0.394913866e2", "0.254991145e4", "0.241169160e4", "0.852238967e1", "0.191300162e1", "0.427920172e3"},
        {700, 0.0035, "0.923015898e2", "0.333568375e4", "0.301262819e4", "0.101749996e2", "0.208141274e1", "0.644289068e3"},
        {700, 30, "0.542946619e-2", "0.263149474e4", "0.246861076e4", "0.517540298e1", "0.103505092e2", "0.480386523e3"},
    };
    for (const Column& c : cols) check_column("R7-97(2012) Table 15", c);
}

TEST(VerificationIF97, Table18MetastableVapour) {
    // Through the metastable-vapour family (STEAM.<X>MV.PT, R7-97(2012) Eq. 18).
    const Column cols[] = {
        // IAPWS R7-97(2012) Table 18
        {450, 1, "0.192516540", "0.276881115e4", "0.257629461e4", "0.656660377e1", "0.276349265e1", "0.498408101e3"},
        {440, 1, "0.186212297", "0.274015123e4", "0.255393894e4", "0.650218759e1", "0.298166443e1", "0.489363295e3"},
        {450, 1.5, "0.121685206", "0.272134539e4", "0.253881758e4", "0.629170440e1", "0.362795578e1", "0.481941819e3"},
    };
    for (const Column& c : cols) check_column("R7-97(2012) Table 18", c, "MV");
    // The same states from (p, h) and (p, s) with the printed h and s (a round
    // trip on Eq. 18: T to the printed digits of the input's precision).
    for (const Column& c : cols) {
        const Printed h = printed(c.h), s = printed(c.s);
        // dT = dh / cp: the 9-digit h fixes T to about 0.5e-5 kJ/kg / 2.8 kJ/(kg K).
        EXPECT_NEAR(fn("STEAM.TMV.PH", {c.p, h.value}), c.T, 2e-5);
        EXPECT_NEAR(fn("STEAM.TMV.PS", {c.p, s.value}), c.T, 1e-5);
    }
}

TEST(VerificationIF97, Table33Region3FromRhoT) {
    // p from the printed (T, rho) on IF97 Eq. 28, then the functions of (p, T).
    struct Col {
        double T, rho;
        const char *p, *h, *u, *s, *cp, *w;
    };
    const Col cols[] = {
        // IAPWS R7-97(2012) Table 33
        {650, 500, "0.255837018e2", "0.186343019e4", "0.181226279e4", "0.405427273e1", "0.138935717e2", "0.502005554e3"},
        {650, 200, "0.222930643e2", "0.237512401e4", "0.226365868e4", "0.485438792e1", "0.446579342e2", "0.383444594e3"},
        {750, 500, "0.783095639e2", "0.225868845e4", "0.210206932e4", "0.446971906e1", "0.634165359e1", "0.760696041e3"},
    };
    const std::string t = "R7-97(2012) Table 33";
    for (const Col& c : cols) {
        const double p = if97::region3_p(c.rho, c.T);
        const std::string at = " at " + std::to_string(c.T) + " K, " + std::to_string(c.rho) + " kg/m3";
        check(t, "p" + at, p, c.p);
        EXPECT_NEAR(fn("STEAM.RHO.PT", {p, c.T}), c.rho, 1e-9 * c.rho) << at;  // the density comes back
        check(t, "h" + at, fn("STEAM.H.PT", {p, c.T}), c.h);
        check(t, "u" + at, fn("STEAM.U.PT", {p, c.T}), c.u);
        check(t, "s" + at, fn("STEAM.S.PT", {p, c.T}), c.s);
        check(t, "cp" + at, fn("STEAM.CP.PT", {p, c.T}), c.cp);
        check(t, "w" + at, fn("STEAM.W.PT", {p, c.T}), c.w);
    }
}

TEST(VerificationIF97, Table35SaturationPressure) {
    const std::string t = "R7-97(2012) Table 35";
    check(t, "ps(300 K)", fn("STEAM.PSAT", {300}), "0.353658941e-2");  // IAPWS R7-97(2012) Table 35
    check(t, "ps(500 K)", fn("STEAM.PSAT", {500}), "0.263889776e1");   // IAPWS R7-97(2012) Table 35
    check(t, "ps(600 K)", fn("STEAM.PSAT", {600}), "0.123443146e2");   // IAPWS R7-97(2012) Table 35
}

TEST(VerificationIF97, Table36SaturationTemperature) {
    const std::string t = "R7-97(2012) Table 36";
    check(t, "Ts(0.1 MPa)", fn("STEAM.TSAT", {0.1}), "0.372755919e3");  // IAPWS R7-97(2012) Table 36
    check(t, "Ts(1 MPa)", fn("STEAM.TSAT", {1}), "0.453035632e3");      // IAPWS R7-97(2012) Table 36
    check(t, "Ts(10 MPa)", fn("STEAM.TSAT", {10}), "0.584149488e3");    // IAPWS R7-97(2012) Table 36
}

TEST(VerificationIF97, Table42Region5) {
    const Column cols[] = {
        // IAPWS R7-97(2012) Table 42
        {1500, 0.5, "0.138455090e1", "0.521976855e4", "0.452749310e4", "0.965408875e1", "0.261609445e1", "0.917068690e3"},
        {1500, 30, "0.230761299e-1", "0.516723514e4", "0.447495124e4", "0.772970133e1", "0.272724317e1", "0.928548002e3"},
        {2000, 30, "0.311385219e-1", "0.657122604e4", "0.563707038e4", "0.853640523e1", "0.288569882e1", "0.106736948e4"},
    };
    for (const Column& c : cols) check_column("R7-97(2012) Table 42", c);
}

TEST(VerificationIF97, B23CheckPoint) {
    // IAPWS R7-97(2012) Sec. 4, after Eq. (6): T = 0.623150000e3 K, p = 0.165291643e2 MPa.
    check("R7-97(2012) Sec. 4 (B23)", "p_B23(623.15 K)", if97::b23_p(623.15), "0.165291643e2");
    check("R7-97(2012) Sec. 4 (B23)", "T_B23(16.5291643 MPa)", if97::b23_T(16.5291643), "0.623150000e3");
}

// ---- R7-97(2012) Sec. 6.2: range of validity of Eq. 18 ----------------------

TEST(VerificationIF97, MetastableRangeOfValidity) {
    // "from the saturated vapor line to the 5 % equilibrium moisture line
    // (determined from the equilibrium h' and h'' values) at pressures from the
    // triple-point pressure up to 10 MPa" (R7-97(2012) Sec. 6.2).
    for (double p : {0.000611657, 0.005, 0.1, 1.0, 5.0, 10.0}) {
        const MetastableLimits m = metastable_limits(p);
        const State sat = saturation_p(p);
        EXPECT_EQ(m.T_high, sat.T) << p;
        // On the 5 % line the equilibrium quality of the Eq. 18 state is 0.95.
        EXPECT_NEAR(quality(state_pT_metastable(p, m.T_low)), 0.95, 1e-12) << p;
        EXPECT_NEAR(quality(state_pT_metastable(p, m.T_high)), 1.0, 1e-4) << p;  // Eq. 18 vs Eq. 15 at the line
        const State mid = state_pT_metastable(p, 0.5 * (m.T_low + m.T_high));
        EXPECT_TRUE(mid.metastable);
        EXPECT_EQ(mid.region, 2);
        EXPECT_EQ(mid.phase, Phase::Vapour);
        // Below the 5 % line and above the saturation temperature: errors naming T.
        for (double T : {m.T_low - 0.01, m.T_high + 0.01}) {
            try {
                state_pT_metastable(p, T);
                ADD_FAILURE() << "no error at " << p << " MPa, " << T << " K";
            } catch (const RangeError& e) {
                EXPECT_EQ(e.input(), "T");
                EXPECT_DOUBLE_EQ(e.low(), m.T_low);
                EXPECT_DOUBLE_EQ(e.high(), m.T_high);
            }
        }
        // (p, h) and (p, s) invert (p, T) inside the range, and refuse h or s outside it.
        EXPECT_NEAR(state_ph_metastable(p, mid.h).T, mid.T, 1e-9 * mid.T);
        EXPECT_NEAR(state_ps_metastable(p, mid.s).T, mid.T, 1e-9 * mid.T);
        EXPECT_THROW(state_ph_metastable(p, m.h_high + 0.1), RangeError);
        EXPECT_THROW(state_ps_metastable(p, m.s_low - 0.001), RangeError);
    }
    // Pressure limits.
    for (double p : {0.0006, 10.5, 20.0}) {
        try {
            state_pT_metastable(p, 400.0);
            ADD_FAILURE() << p;
        } catch (const RangeError& e) {
            EXPECT_EQ(e.input(), "p");
            EXPECT_DOUBLE_EQ(e.high(), 10.0);
        }
    }
    // The ordinary function gives the stable state: liquid at 1 MPa, 440 K.
    EXPECT_EQ(state_pT(1.0, 440.0).region, 1);
    EXPECT_FALSE(state_pT(1.0, 440.0).metastable);
}

// ===========================================================================
// IAPWS R15-11, thermal conductivity, industrial form (Tables 7-9)
// ===========================================================================

namespace {

struct TcColumn {
    double p, T, rho_in;  // p or, for Table 9, rho (p then from Eq. 28)
    const char *lambda, *l0, *l1, *l2, *rho, *zT, *zTR, *xi, *cp, *cv, *Z, *mu;
};

void check_tc(const std::string& t, const TcColumn& c) {
    const double p = c.rho_in > 0 ? if97::region3_p(c.rho_in, c.T) : c.p;
    const std::string at = " at " + std::to_string(c.T) + " K, " + std::to_string(p) + " MPa";
    // Through the surface: lambda (mW/(m K)), mu (uPa s), rho, cp, cv.
    check(t, "lambda" + at, fn("STEAM.LAMBDA.PT", {p, c.T}), c.lambda, 1e3);
    check(t, "mu" + at, fn("STEAM.MU.PT", {p, c.T}), c.mu, 1e6);
    // Pr and nu use the same (industrial) viscosity.
    const double cp_ = fn("STEAM.CP.PT", {p, c.T});
    EXPECT_NEAR(fn("STEAM.PR.PT", {p, c.T}),
                fn("STEAM.MU.PT", {p, c.T}) * cp_ * 1e3 / fn("STEAM.LAMBDA.PT", {p, c.T}), 1e-13 * cp_);
    if (c.rho) check(t, "rho" + at, fn("STEAM.RHO.PT", {p, c.T}), c.rho);
    check(t, "cp" + at, cp_, c.cp);
    check(t, "cv" + at, fn("STEAM.CV.PT", {p, c.T}), c.cv);
    // Inside the correlation, through the public core API on the same state.
    const State st = state_pT(p, c.T);
    check(t, "(d rho/d p)_T" + at, st.drhodp_T, c.zT);
    check(t, "(d rho/d p)_T at T_R" + at, drhodp_TR_industrial(st.rho), c.zTR);
    const ConductivityTerms k = conductivity_terms(st.rho, st.T, st.cp, st.cv, viscosity(st), st.drhodp_T,
                                                   drhodp_TR_industrial(st.rho));
    check(t, "lambda_0" + at, k.lambda0, c.l0);
    check(t, "lambda_1" + at, k.lambda1, c.l1);
    check(t, "lambda_2" + at, k.lambda2, c.l2);
    check(t, "xi" + at, k.xi, c.xi);
    check(t, "Z(y)" + at, k.Z, c.Z);
}

}  // namespace

TEST(VerificationR15_11, Table7Region1) {
    const TcColumn cols[] = {
        // IAPWS R15-11 Table 7
        {20, 620, 0, "0.481485195e3", "0.484911627e2", "0.966869008e1", "0.126391714e2", "0.613227777e3",
         "0.520937820e1", "0.935037951", "0.377694973", "0.763433705e1", "0.303793441e1", "0.166942638",
         "0.709051068e2"},
        {50, 620, 0, "0.545038940e3", "0.484911627e2", "0.111212177e2", "0.575816285e1", "0.699226043e3",
         "0.184869007e1", "0.639306277", "0.189692422", "0.532047725e1", "0.291692653e1", "0.113592223",
         "0.841527945e2"},
    };
    for (const TcColumn& c : cols) check_tc("R15-11 Table 7", c);
}

TEST(VerificationR15_11, Table8Region2) {
    const TcColumn cols[] = {
        // IAPWS R15-11 Table 8
        {0.3, 650, 0, "0.522311024e2", "0.518787461e2", "0.100678943e1", "0.129246457e-3", "0.100452141e1",
         "0.336351419e1", "0.223819386e1", "0.104305448e-2", "0.207010035e1", "0.159675313e1",
         "0.121437275e-2", "0.234877453e2"},
        {50, 800, 0, "0.177709914e3", "0.698329394e2", "0.244965343e1", "0.664341394e1", "0.218030012e3",
         "0.661484493e1", "0.312182530e1", "0.193491903", "0.590718707e1", "0.252343426e1", "0.137263826",
         "0.393727534e2"},
    };
    for (const TcColumn& c : cols) check_tc("R15-11 Table 8", c);
}

TEST(VerificationR15_11, Table9Region3FromRhoT) {
    // p from the printed (T, rho) on IF97 Eq. 28; rho printed as an input (no row).
    const TcColumn cols[] = {
        // IAPWS R15-11 Table 9
        {0, 647.35, 222, "0.366879411e3", "0.515764797e2", "0.348407362e1", "0.187183159e3", nullptr,
         "0.177778595e3", "0.311832789e1", "0.158223683e1", "0.101054488e3", "0.437466458e1", "0.217577777",
         "0.312204749e2"},
        {0, 647.35, 322, "0.124182415e4", "0.515764797e2", "0.496819532e1", "0.985582122e3", nullptr,
         "0.692651138e4", "0.275192511e1", "0.124722016e2", "0.312090124e4", "0.452163449e1",
         "0.322306729e-1", "0.393455495e2"},
    };
    for (const TcColumn& c : cols) {
        check_tc("R15-11 Table 9", c);
        const double p = if97::region3_p(c.rho_in, c.T);
        EXPECT_NEAR(fn("STEAM.RHO.PT", {p, c.T}), c.rho_in, 1e-9 * c.rho_in);
    }
}

TEST(VerificationR15_11, Tables4And5CorrelationAtRhoT) {
    // The correlation of (rho, T), public as conductivity_terms. Table 4: points where
    // lambda_2 = 0 (a zero (d rho/d p)_T gives Delta-chi <= 0 and so lambda_2 = 0, as the
    // table's note requires). Table 5: lambda_0 and lambda_1 at 647.35 K; its lambda_2
    // and lambda need IAPWS-95 cp, cv and derivatives and are not reached with IF97.
    struct Row4 { double T, rho; const char* lambda; };
    const Row4 t4[] = {
        // IAPWS R15-11 Table 4 (mW/(m K))
        {298.15, 0, "18.4341883"}, {298.15, 998, "607.712868"}, {298.15, 1200, "799.038144"}, {873.15, 0, "79.1034659"},
    };
    for (const Row4& r : t4) {
        const ConductivityTerms k = conductivity_terms(r.rho, r.T, 4.0, 3.0, 1e-4, 0.0, 1.0);
        EXPECT_EQ(k.lambda2, 0.0);
        check("R15-11 Table 4", "lambda at " + std::to_string(r.T) + " K, " + std::to_string(r.rho) + " kg/m3",
              k.lambda, r.lambda, 1e3);
    }
    struct Row5 { double rho; const char* l1; };
    const Row5 t5[] = {
        // IAPWS R15-11 Table 5 (lambda_0(647.35 K) = 51.5764797 for all)
        {1, "1.0068497"}, {122, "2.1445173"}, {222, "3.4840736"}, {272, "4.2233708"},
        {322, "4.9681953"}, {372, "5.6961250"}, {422, "6.3973429"}, {750, "11.5870532"},
    };
    for (const Row5& r : t5) {
        const ConductivityTerms k = conductivity_terms(r.rho, 647.35, 4.0, 3.0, 1e-4, 0.0, 1.0);
        check("R15-11 Table 5", "lambda_0 at " + std::to_string(r.rho) + " kg/m3", k.lambda0, "51.5764797");
        check("R15-11 Table 5", "lambda_1 at " + std::to_string(r.rho) + " kg/m3", k.lambda1, r.l1);
    }
}

// ===========================================================================
// IAPWS R12-08, viscosity, Table 4 (mu_2 = 1)
// ===========================================================================

TEST(VerificationR12_08, Table4) {
    // (T, rho) inputs: the public correlation of (rho, T) (several points lie
    // outside IF97, e.g. 1200 kg/m3 at 298.15 K).
    struct Row {
        double T, rho;
        const char* mu;
    };
    const Row rows[] = {
        // IAPWS R12-08 Table 4 (uPa s)
        {298.15, 998, "889.735100"},  {298.15, 1200, "1437.649467"}, {373.15, 1000, "307.883622"},
        {433.15, 1, "14.538324"},     {433.15, 1000, "217.685358"},  {873.15, 1, "32.619287"},
        {873.15, 100, "35.802262"},   {873.15, 600, "77.430195"},    {1173.15, 1, "44.217245"},
        {1173.15, 100, "47.640433"},  {1173.15, 400, "64.154608"},
    };
    for (const Row& r : rows)
        check("R12-08 Table 4", "mu at " + std::to_string(r.T) + " K, " + std::to_string(r.rho) + " kg/m3",
              viscosity_rhoT(r.rho, r.T), r.mu, 1e6);
}

TEST(VerificationR12_08, Table5EnhancementFromPrintedXi) {
    // R12-08 Table 5 (647.35 K): mu_2 from the printed correlation length, public as
    // viscosity_enhancement (Eqs. 14-19), to all printed digits. xi and mu themselves
    // need IAPWS-95 derivatives (test_transport.cpp feeds them from python3-iapws).
    struct Row { const char *xi, *mu2; };
    const Row rows[] = {
        // IAPWS R12-08 Table 5
        {"0.309247", "1.00000289"}, {"1.571405", "1.00375120"}, {"5.266522", "1.03416789"},
        {"16.590209", "1.09190440"}, {"5.603768", "1.03665871"}, {"1.876244", "1.00596332"},
    };
    for (const Row& r : rows)
        check("R12-08 Table 5", std::string("mu_2 at xi = ") + r.xi + " nm",
              viscosity_enhancement(printed(r.xi).value), r.mu2);
}

// ===========================================================================
// IAPWS R1-76(2014), surface tension, Table 1
// ===========================================================================

TEST(VerificationR1_76, Table1) {
    // Column "calculated", t in degC, sigma in mN/m, through STEAM.SIGMA.T.
    struct Row {
        double t;
        const char* sigma;
    };
    const Row rows[] = {
        // IAPWS R1-76(2014) Table 1
        {0.01, "75.65"}, {5, "74.94"},   {10, "74.22"},  {15, "73.49"},  {20, "72.74"},  {25, "71.97"},
        {30, "71.19"},   {35, "70.40"},  {40, "69.60"},  {45, "68.78"},  {50, "67.94"},  {55, "67.10"},
        {60, "66.24"},   {65, "65.37"},  {70, "64.48"},  {75, "63.58"},  {80, "62.67"},  {85, "61.75"},
        {90, "60.82"},   {95, "59.87"},  {100, "58.91"}, {105, "57.94"}, {110, "56.96"}, {115, "55.97"},
        {120, "54.97"},  {125, "53.96"}, {130, "52.93"}, {135, "51.90"}, {140, "50.86"}, {145, "49.80"},
        {150, "48.74"},  {155, "47.67"}, {160, "46.59"}, {165, "45.50"}, {170, "44.41"}, {175, "43.30"},
        {180, "42.19"},  {185, "41.07"}, {190, "39.95"}, {195, "38.81"}, {200, "37.67"}, {205, "36.53"},
        {210, "35.38"},  {215, "34.23"}, {220, "33.07"}, {225, "31.90"}, {230, "30.74"}, {235, "29.57"},
        {240, "28.39"},  {245, "27.22"}, {250, "26.04"}, {255, "24.87"}, {260, "23.69"}, {265, "22.51"},
        {270, "21.34"},  {275, "20.16"}, {280, "18.99"}, {285, "17.83"}, {290, "16.66"}, {295, "15.51"},
        {300, "14.36"},  {305, "13.22"}, {310, "12.09"}, {315, "10.97"}, {320, "9.86"},  {325, "8.77"},
        {330, "7.70"},   {335, "6.65"},  {340, "5.63"},  {345, "4.63"},  {350, "3.67"},  {355, "2.74"},
        {360, "1.88"},   {365, "1.08"},  {370, "0.39"},
    };
    for (const Row& r : rows)
        check("R1-76(2014) Table 1", "sigma at " + std::to_string(r.t) + " degC",
              fn("STEAM.SIGMA.T", {r.t + 273.15}), r.sigma, 1e3);
}

// ===========================================================================
// Backward and boundary equations
// ===========================================================================
//
// Each printed value is checked twice:
//  * the backward (or boundary) equation itself, public in isentra/if97/if97.hpp,
//    to all printed digits;
//  * the exact value on the basic equations that the spreadsheet functions
//    return (STEAM.T.PH, STEAM.P.HS, ...: backward values refined until they
//    reproduce the inputs) against the printed backward value, within the
//    release's stated maximum deviation of that backward equation from the
//    basic equation (its |dx|max, named beside each) plus the half-unit of
//    printing.

namespace {

// |exact - printed| <= stated maximum + half a unit of the printed value.
void check_exact(const std::string& table, const std::string& what, double exact, const std::string& text,
                 double max_dev) {
    const Printed p = printed(text);
    check_dev(table, what, exact, p.value, max_dev + p.half_unit);
}

// Monotone root on [a, b] by bisection (the tests' own, independent of the
// core's solvers): f(a) and f(b) bracket target.
template <class F>
double bisect(F f, double target, double a, double b) {
    const bool up = f(b) > f(a);
    for (int i = 0; i < 200 && b - a > 1e-13 * b; ++i) {
        const double m = 0.5 * (a + b);
        ((f(m) < target) == up ? a : b) = m;
    }
    return 0.5 * (a + b);
}

constexpr double Tc_minus = if97::Tc - 1e-7;  // saturated states just below Tc

}  // namespace

TEST(VerificationBackward, IF97Table7Region1Tph) {
    // IAPWS R7-97(2012) Table 7 (Eq. 11); |dT|max = 23.6 mK (R7-97(2012) Eq. 12).
    struct Row { double p, h; const char* T; };
    const Row rows[] = {{3, 500, "0.391798509e3"}, {80, 500, "0.378108626e3"}, {80, 1500, "0.611041229e3"}};
    const std::string t = "R7-97(2012) Table 7";
    for (const Row& r : rows) {
        const std::string at = " at " + std::to_string(r.p) + " MPa, " + std::to_string(r.h) + " kJ/kg";
        check(t, "T1(p,h)" + at, if97::region1_T_ph(r.p, r.h), r.T);
        check_exact(t, "STEAM.T.PH" + at, fn("STEAM.T.PH", {r.p, r.h}), r.T, 23.6e-3);
    }
}

TEST(VerificationBackward, IF97Table9Region1Tps) {
    // IAPWS R7-97(2012) Table 9 (Eq. 13); |dT|max = 21.8 mK (R7-97(2012) Eq. 14).
    struct Row { double p, s; const char* T; };
    const Row rows[] = {{3, 0.5, "0.307842258e3"}, {80, 0.5, "0.309979785e3"}, {80, 3, "0.565899909e3"}};
    const std::string t = "R7-97(2012) Table 9";
    for (const Row& r : rows) {
        const std::string at = " at " + std::to_string(r.p) + " MPa, " + std::to_string(r.s) + " kJ/(kg K)";
        check(t, "T1(p,s)" + at, if97::region1_T_ps(r.p, r.s), r.T);
        check_exact(t, "STEAM.T.PS" + at, fn("STEAM.T.PS", {r.p, r.s}), r.T, 21.8e-3);
    }
}

TEST(VerificationBackward, IF97B2bcCheckPoint) {
    // IAPWS R7-97(2012) Sec. 6.3 after Eq. (21): p = 0.100000000e3 MPa, h = 0.3516004323e4 kJ/kg.
    const std::string t = "R7-97(2012) Sec. 6.3 (B2bc)";
    check(t, "h_B2bc(100 MPa)", if97::b2bc_h(100), "0.3516004323e4");
    check(t, "p_B2bc(3516.004323 kJ/kg)", if97::b2bc_p(3516.004323), "0.100000000e3");
}

TEST(VerificationBackward, IF97Table24Region2Tph) {
    // IAPWS R7-97(2012) Table 24 (Eqs. 22-24); |dT|max 9.3, 9.6, 23.7 mK for 2a, 2b, 2c (R7-97(2012) Table 23).
    struct Row { double p, h; const char* T; double max; };
    const Row rows[] = {
        {0.001, 3000, "0.534433241e3", 9.3e-3}, {3, 3000, "0.575373370e3", 9.3e-3},   {3, 4000, "0.101077577e4", 9.3e-3},
        {5, 3500, "0.801299102e3", 9.6e-3},     {5, 4000, "0.101531583e4", 9.6e-3},   {25, 3500, "0.875279054e3", 9.6e-3},
        {40, 2700, "0.743056411e3", 23.7e-3},   {60, 2700, "0.791137067e3", 23.7e-3}, {60, 3200, "0.882756860e3", 23.7e-3},
    };
    const std::string t = "R7-97(2012) Table 24";
    for (const Row& r : rows) {
        const std::string at = " at " + std::to_string(r.p) + " MPa, " + std::to_string(r.h) + " kJ/kg";
        check(t, "T2(p,h)" + at, if97::region2_T_ph(r.p, r.h), r.T);
        check_exact(t, "STEAM.T.PH" + at, fn("STEAM.T.PH", {r.p, r.h}), r.T, r.max);
    }
}

TEST(VerificationBackward, IF97Table29Region2Tps) {
    // IAPWS R7-97(2012) Table 29 (Eqs. 25-27); |dT|max 8.8, 6.5, 19.0 mK for 2a, 2b, 2c (R7-97(2012) Table 28).
    struct Row { double p, s; const char* T; double max; };
    const Row rows[] = {
        {0.1, 7.5, "0.399517097e3", 8.8e-3},  {0.1, 8, "0.514127081e3", 8.8e-3},    {2.5, 8, "0.103984917e4", 8.8e-3},
        {8, 6, "0.600484040e3", 6.5e-3},      {8, 7.5, "0.106495556e4", 6.5e-3},    {90, 6, "0.103801126e4", 6.5e-3},
        {20, 5.75, "0.697992849e3", 19.0e-3}, {80, 5.25, "0.854011484e3", 19.0e-3}, {80, 5.75, "0.949017998e3", 19.0e-3},
    };
    const std::string t = "R7-97(2012) Table 29";
    for (const Row& r : rows) {
        const std::string at = " at " + std::to_string(r.p) + " MPa, " + std::to_string(r.s) + " kJ/(kg K)";
        check(t, "T2(p,s)" + at, if97::region2_T_ps(r.p, r.s), r.T);
        check_exact(t, "STEAM.T.PS" + at, fn("STEAM.T.PS", {r.p, r.s}), r.T, r.max);
    }
}

// ---- SR2-01(2014): p(h,s), regions 1 and 2 ------------------------------------

TEST(VerificationBackward, SR2_01Table3Region1Phs) {
    // IAPWS SR2-01(2014) Table 3 (Eq. 1); SR2-01 Table 4: |dp|max = 0.55 % below 2.5 MPa, 14 kPa above.
    struct Row { double h, s; const char* p; };
    const Row rows[] = {{0.001, 0, "9.800980612e-4"}, {90, 0, "9.192954727e1"}, {1500, 3.4, "5.868294423e1"}};
    const std::string t = "SR2-01(2014) Table 3";
    for (const Row& r : rows) {
        const std::string at = " at " + std::to_string(r.h) + " kJ/kg, " + std::to_string(r.s) + " kJ/(kg K)";
        const double p = printed(r.p).value;
        check(t, "p1(h,s)" + at, if97::region1_p_hs(r.h, r.s), r.p);
        check_exact(t, "STEAM.P.HS" + at, fn("STEAM.P.HS", {r.h, r.s}), r.p, p < 2.5 ? 0.0055 * p : 0.014);
    }
}

TEST(VerificationBackward, SR2_01Table9Region2Phs) {
    // IAPWS SR2-01(2014) Table 9 (Eqs. 3-5); |dp/p|max 0.0029, 0.0034, 0.0063 % for 2a, 2b, 2c (SR2-01 Table 10).
    struct Row { double h, s; const char* p; double max; };
    const Row rows[] = {
        {2800, 6.5, "1.371012767", 2.9e-5},   {2800, 9.5, "1.879743844e-3", 2.9e-5}, {4100, 9.5, "1.024788997e-1", 2.9e-5},
        {2800, 6, "4.793911442", 3.4e-5},     {3600, 6, "8.395519209e1", 3.4e-5},    {3600, 7, "7.527161441", 3.4e-5},
        {2800, 5.1, "9.439202060e1", 6.3e-5}, {2800, 5.8, "8.414574124", 6.3e-5},    {3400, 5.8, "8.376903879e1", 6.3e-5},
    };
    const std::string t = "SR2-01(2014) Table 9";
    for (const Row& r : rows) {
        const std::string at = " at " + std::to_string(r.h) + " kJ/kg, " + std::to_string(r.s) + " kJ/(kg K)";
        check(t, "p2(h,s)" + at, if97::region2_p_hs(r.h, r.s), r.p);
        check_exact(t, "STEAM.P.HS" + at, fn("STEAM.P.HS", {r.h, r.s}), r.p, r.max * printed(r.p).value);
    }
}

TEST(VerificationBackward, SR2_01H2abCheckPoint) {
    // IAPWS SR2-01(2014) Sec. 6.1: s = 7 kJ/(kg K), h_2ab = 3376.437 884 kJ/kg; the
    // boundary follows the 4 MPa isobar within |dp2ab|max = 22 kPa (SR2-01 Sec. 6.1).
    const std::string t = "SR2-01(2014) Sec. 6.1 (h2ab)";
    check(t, "h2ab(7)", if97::b2ab_h(7), "3376.437884");
    check_dev(t, "STEAM.P.HS(h2ab(7), 7)", fn("STEAM.P.HS", {if97::b2ab_h(7), 7}), 4.0, 0.022);
}

// ---- SR3-03(2014): T(p,h), v(p,h), T(p,s), v(p,s), p3sat(h), p3sat(s) ----------

TEST(VerificationBackward, SR3_03H3abCheckPoint) {
    // IAPWS SR3-03(2014) Sec. 3.2, Eq. (1): h_3ab(25 MPa) = 2.095936454e3 kJ/kg; the
    // boundary approximates the critical isentrope s_c = 4.41202148223476 kJ/(kg K)
    // within |ds3ab|max = 0.66 J/(kg K) (SR3-03 Sec. 3.2).
    const std::string t = "SR3-03(2014) Sec. 3.2 (h3ab)";
    check(t, "h3ab(25 MPa)", if97::b3ab_h(25), "2.095936454e3");
    check_dev(t, "STEAM.S.PH(25, h3ab)", fn("STEAM.S.PH", {25, if97::b3ab_h(25)}), 4.41202148223476, 0.66e-3);
}

TEST(VerificationBackward, SR3_03Tables5And8Region3ph) {
    // IAPWS SR3-03(2014) Tables 5 (T3(p,h), Eqs. 2-3) and 8 (v3(p,h), Eqs. 4-5); first
    // three rows subregion 3a, last three 3b. SR3-03 Table 9: |dT|max 23.6 / 19.6 mK,
    // |dv/v|max 0.0080 / 0.0095 % (3a / 3b).
    struct Row { double p, h; const char *T, *v; bool b; };
    const Row rows[] = {
        {20, 1700, "6.293083892e2", "1.749903962e-3", false}, {50, 2000, "6.905718338e2", "1.908139035e-3", false},
        {100, 2100, "7.336163014e2", "1.676229776e-3", false}, {20, 2500, "6.418418053e2", "6.670547043e-3", true},
        {50, 2400, "7.351848618e2", "2.801244590e-3", true},   {100, 2700, "8.420460876e2", "2.404234998e-3", true},
    };
    for (const Row& r : rows) {
        const std::string at = " at " + std::to_string(r.p) + " MPa, " + std::to_string(r.h) + " kJ/kg";
        check("SR3-03(2014) Table 5", "T3(p,h)" + at, if97::region3_T_ph(r.p, r.h), r.T);
        check_exact("SR3-03(2014) Table 5", "STEAM.T.PH" + at, fn("STEAM.T.PH", {r.p, r.h}), r.T,
                    r.b ? 19.6e-3 : 23.6e-3);
        check("SR3-03(2014) Table 8", "v3(p,h)" + at, if97::region3_v_ph(r.p, r.h), r.v);
        check_exact("SR3-03(2014) Table 8", "STEAM.V.PH" + at, fn("STEAM.V.PH", {r.p, r.h}), r.v,
                    (r.b ? 0.95e-4 : 0.80e-4) * printed(r.v).value);
    }
}

TEST(VerificationBackward, SR3_03Tables12And15Region3ps) {
    // IAPWS SR3-03(2014) Tables 12 (T3(p,s), Eqs. 6-7) and 15 (v3(p,s), Eqs. 8-9); first
    // three rows 3a, last three 3b. SR3-03 Table 16: |dT|max 24.8 / 22.1 mK, |dv/v|max
    // 0.0096 / 0.0077 % (3a / 3b).
    struct Row { double p, s; const char *T, *v; bool b; };
    const Row rows[] = {
        {20, 3.8, "6.282959869e2", "1.733791463e-3", false}, {50, 3.6, "6.297158726e2", "1.469680170e-3", false},
        {100, 4.0, "7.056880237e2", "1.555893131e-3", false}, {20, 5.0, "6.401176443e2", "6.262101987e-3", true},
        {50, 4.5, "7.163687517e2", "2.332634294e-3", true},   {100, 5.0, "8.474332825e2", "2.449610757e-3", true},
    };
    for (const Row& r : rows) {
        const std::string at = " at " + std::to_string(r.p) + " MPa, " + std::to_string(r.s) + " kJ/(kg K)";
        check("SR3-03(2014) Table 12", "T3(p,s)" + at, if97::region3_T_ps(r.p, r.s), r.T);
        check_exact("SR3-03(2014) Table 12", "STEAM.T.PS" + at, fn("STEAM.T.PS", {r.p, r.s}), r.T,
                    r.b ? 22.1e-3 : 24.8e-3);
        check("SR3-03(2014) Table 15", "v3(p,s)" + at, if97::region3_v_ps(r.p, r.s), r.v);
        check_exact("SR3-03(2014) Table 15", "STEAM.V.PS" + at, fn("STEAM.V.PS", {r.p, r.s}), r.v,
                    (r.b ? 0.77e-4 : 0.96e-4) * printed(r.v).value);
    }
}

TEST(VerificationBackward, SR3_03Tables18And20SaturationBoundaries) {
    // IAPWS SR3-03(2014) Tables 18 (p3sat(h), Eq. 10) and 20 (p3sat(s), Eq. 11). Exact:
    // psat at the temperature whose saturated h (s) is the given one, liquid side below
    // the critical value, vapour side above. SR3-03 Sec. 4: |dp/p|max 0.00043 % (Eq. 10),
    // 0.0033 % (Eq. 11) from the IF97 saturation pressure.
    const double hc = fn("STEAM.HF.T", {Tc_minus}), sc = fn("STEAM.SF.T", {Tc_minus});
    const auto exact_p = [&](const char* liq, const char* vap, double y, double yc) {
        const char* f = y <= yc ? liq : vap;
        const double T = bisect([&](double T) { return fn(f, {T}); }, y, if97::T_13, Tc_minus);
        return fn("STEAM.PSAT", {T});
    };
    struct Row { double y; const char* p; };
    const Row h_rows[] = {{1700, "1.724175718e1"}, {2000, "2.193442957e1"}, {2400, "2.018090839e1"}};  // SR3-03 Table 18
    const Row s_rows[] = {{3.8, "1.687755057e1"}, {4.2, "2.164451789e1"}, {5.2, "1.668968482e1"}};     // SR3-03 Table 20
    for (const Row& r : h_rows) {
        const std::string at = " at " + std::to_string(r.y) + " kJ/kg";
        check("SR3-03(2014) Table 18", "p3sat(h)" + at, if97::p3sat_h(r.y), r.p);
        check_exact("SR3-03(2014) Table 18", "psat at h' or h''" + at, exact_p("STEAM.HF.T", "STEAM.HG.T", r.y, hc),
                    r.p, 0.43e-5 * printed(r.p).value);
    }
    for (const Row& r : s_rows) {
        const std::string at = " at " + std::to_string(r.y) + " kJ/(kg K)";
        check("SR3-03(2014) Table 20", "p3sat(s)" + at, if97::p3sat_s(r.y), r.p);
        check_exact("SR3-03(2014) Table 20", "psat at s' or s''" + at, exact_p("STEAM.SF.T", "STEAM.SG.T", r.y, sc),
                    r.p, 3.3e-5 * printed(r.p).value);
    }
}

// ---- SR4-04(2014): p(h,s) region 3, boundaries, Tsat(h,s) ------------------------

TEST(VerificationBackward, SR4_04Table5Region3Phs) {
    // IAPWS SR4-04(2014) Table 5 (Eqs. 1-2), first three rows 3a, last three 3b;
    // SR4-04 Table 6: |dp/p|max 0.0070 / 0.0084 %.
    struct Row { double h, s; const char* p; bool b; };
    const Row rows[] = {
        {1700, 3.8, "2.555703246e1", false}, {2000, 4.2, "4.540873468e1", false}, {2100, 4.3, "6.078123340e1", false},
        {2600, 5.1, "3.434999263e1", true},  {2400, 4.7, "6.363924887e1", true},  {2700, 5.0, "8.839043281e1", true},
    };
    const std::string t = "SR4-04(2014) Table 5";
    for (const Row& r : rows) {
        const std::string at = " at " + std::to_string(r.h) + " kJ/kg, " + std::to_string(r.s) + " kJ/(kg K)";
        check(t, "p3(h,s)" + at, if97::region3_p_hs(r.h, r.s), r.p);
        check_exact(t, "STEAM.P.HS" + at, fn("STEAM.P.HS", {r.h, r.s}), r.p,
                    (r.b ? 0.84e-4 : 0.70e-4) * printed(r.p).value);
    }
}

TEST(VerificationBackward, SR4_04Tables11And18SaturationEnthalpies) {
    // IAPWS SR4-04(2014) Table 11 (h'1(s) Eq. 3, h'3a(s) Eq. 4) and Table 18 (h''2ab(s)
    // Eq. 5, h''2c3b(s) Eq. 6). Exact: h' (h'') at the temperature whose s' (s'') is s.
    // |dh|max: h'1 0.0034, h'3a 0.0045 kJ/kg (SR4-04 Table 12); h''2ab 0.0012, h''2c3b
    // 0.0058 (region 2) / 0.0073 kJ/kg (region 3) (SR4-04 Table 19).
    const auto exact_h = [](bool vapour, double s) {
        const double T = bisect([&](double T) { return fn(vapour ? "STEAM.SG.T" : "STEAM.SF.T", {T}); }, s,
                                if97::T_min, Tc_minus);
        return fn(vapour ? "STEAM.HG.T" : "STEAM.HF.T", {T});
    };
    struct Row { double s; const char* h; double max; };
    const Row h1[] = {{1, "3.085509647e2", 0.0034}, {2, "7.006304472e2", 0.0034}, {3, "1.198359754e3", 0.0034}};
    const Row h3a[] = {{3.8, "1.685025565e3", 0.0045}, {4.0, "1.816891476e3", 0.0045}, {4.2, "1.949352563e3", 0.0045}};
    const Row h2ab[] = {{7, "2.723729985e3", 0.0012}, {8, "2.599047210e3", 0.0012}, {9, "2.511861477e3", 0.0012}};
    // s = 5.5 and 5.0: saturated vapour in region 2 (T < 623.15 K) and region 3; 4.5 region 3.
    const Row h2c3b[] = {{5.5, "2.687693850e3", 0.0058}, {5.0, "2.451623609e3", 0.0073}, {4.5, "2.144360448e3", 0.0073}};
    const std::string t11 = "SR4-04(2014) Table 11", t18 = "SR4-04(2014) Table 18";
    for (const Row& r : h1) {
        check(t11, "h'1(s) at s = " + std::to_string(r.s), if97::b_h1_s(r.s), r.h);
        check_exact(t11, "h' at s' = " + std::to_string(r.s), exact_h(false, r.s), r.h, r.max);
    }
    for (const Row& r : h3a) {
        check(t11, "h'3a(s) at s = " + std::to_string(r.s), if97::b_h3a_s(r.s), r.h);
        check_exact(t11, "h' at s' = " + std::to_string(r.s), exact_h(false, r.s), r.h, r.max);
    }
    for (const Row& r : h2ab) {
        check(t18, "h''2ab(s) at s = " + std::to_string(r.s), if97::b_h2ab_s(r.s), r.h);
        check_exact(t18, "h'' at s'' = " + std::to_string(r.s), exact_h(true, r.s), r.h, r.max);
    }
    for (const Row& r : h2c3b) {
        check(t18, "h''2c3b(s) at s = " + std::to_string(r.s), if97::b_h2c3b_s(r.s), r.h);
        check_exact(t18, "h'' at s'' = " + std::to_string(r.s), exact_h(true, r.s), r.h, r.max);
    }
}

TEST(VerificationBackward, SR4_04Table24BoundaryB13) {
    // IAPWS SR4-04(2014) Table 24 (hB13(s), Eq. 7). The boundary is the 623.15 K
    // isotherm within |dT|max = 3.20 mK (SR4-04 Sec. 4.5): T(hB13(s), s) from the basic
    // equations.
    struct Row { double s; const char* h; };
    const Row rows[] = {{3.7, "1.632525047e3"}, {3.6, "1.593027214e3"}, {3.5, "1.566104611e3"}};
    const std::string t = "SR4-04(2014) Table 24";
    for (const Row& r : rows) {
        const std::string at = " at s = " + std::to_string(r.s);
        check(t, "hB13(s)" + at, if97::b_hB13_s(r.s), r.h);
        check_dev(t, "STEAM.T.HS(hB13(s), s)" + at, fn("STEAM.T.HS", {if97::b_hB13_s(r.s), r.s}), if97::T_13,
                  3.20e-3);
    }
}

TEST(VerificationBackward, SR4_04Table26BoundaryB23) {
    // IAPWS SR4-04(2014) Table 26 (TB23(h,s), Eq. 8). Its accuracy is stated as a
    // pressure (p2c(h,s) against pB23(TB23), SR4-04 Sec. 4.6), not as a temperature of
    // a state, so only the equation itself is checked.
    struct Row { double h, s; const char* T; };
    const Row rows[] = {{2600, 5.1, "7.135259364e2"}, {2700, 5.15, "7.685345532e2"}, {2800, 5.2, "8.176202120e2"}};
    for (const Row& r : rows)
        check("SR4-04(2014) Table 26", "TB23(h,s) at " + std::to_string(r.h) + ", " + std::to_string(r.s),
              if97::b_TB23_hs(r.h, r.s), r.T);
}

TEST(VerificationBackward, SR4_04Table29TsatHs) {
    // IAPWS SR4-04(2014) Table 29 (Tsat(h,s), Eq. 9); SR4-04 Table 30: |dT|max 0.86 mK for
    // s < 5.85 kJ/(kg K), 0.67 mK above. Exact: STEAM.T.HS of the wet state.
    struct Row { double h, s; const char* T; };
    const Row rows[] = {{1800, 5.3, "3.468475498e2"}, {2400, 6.0, "4.251373305e2"}, {2500, 5.5, "5.225579013e2"}};
    const std::string t = "SR4-04(2014) Table 29";
    for (const Row& r : rows) {
        const std::string at = " at " + std::to_string(r.h) + " kJ/kg, " + std::to_string(r.s) + " kJ/(kg K)";
        check(t, "Tsat(h,s)" + at, if97::tsat_hs(r.h, r.s), r.T);
        check_exact(t, "STEAM.T.HS" + at, fn("STEAM.T.HS", {r.h, r.s}), r.T, r.s < 5.85 ? 0.86e-3 : 0.67e-3);
    }
}

// ---- SR5-05(2016): v(p,T) in region 3 ---------------------------------------------

TEST(VerificationBackward, SR5_05Tables5And13Region3Vpt) {
    // IAPWS SR5-05(2016) Table 5 (subregions 3a-3t) and Table 13 (auxiliary equations
    // 3u-3z), through region3_v_pT (subregion selected by SR5-05 Tables 2 and 10) to all
    // digits; the exact v (STEAM.V.PT) within |dv/v|max of SR5-05 Table 6 (3a-3t) and
    // Table 14 (3u-3z). The boundary equations of Tables 3 and 11 are internal to the
    // core (not public) and are checked in test_if97_vpt.cpp.
    const std::map<char, double> max_pct = {
        // SR5-05(2016) Table 6
        {'a', 0.00061}, {'b', 0.00064}, {'c', 0.00080}, {'d', 0.00059}, {'e', 0.00072}, {'f', 0.00068},
        {'g', 0.00047}, {'h', 0.00085}, {'i', 0.00067}, {'j', 0.00034}, {'k', 0.00034}, {'l', 0.00033},
        {'m', 0.00057}, {'n', 0.00064}, {'o', 0.00031}, {'p', 0.00044}, {'q', 0.00036}, {'r', 0.00037},
        {'s', 0.00030}, {'t', 0.00095},
        // SR5-05(2016) Table 14
        {'u', 0.097}, {'v', 0.082}, {'w', 0.065}, {'x', 0.090}, {'y', 1.77}, {'z', 1.80},
    };
    struct Row { char sub; double p, T; const char* v; };
    const Row rows[] = {
        // SR5-05(2016) Table 5
        {'a', 50, 630, "1.470853100e-3"},     {'a', 80, 670, "1.503831359e-3"},
        {'b', 50, 710, "2.204728587e-3"},     {'b', 80, 750, "1.973692940e-3"},
        {'c', 20, 630, "1.761696406e-3"},     {'c', 30, 650, "1.819560617e-3"},
        {'d', 26, 656, "2.245587720e-3"},     {'d', 30, 670, "2.506897702e-3"},
        {'e', 26, 661, "2.970225962e-3"},     {'e', 30, 675, "3.004627086e-3"},
        {'f', 26, 671, "5.019029401e-3"},     {'f', 30, 690, "4.656470142e-3"},
        {'g', 23.6, 649, "2.163198378e-3"},   {'g', 24, 650, "2.166044161e-3"},
        {'h', 23.6, 652, "2.651081407e-3"},   {'h', 24, 654, "2.967802335e-3"},
        {'i', 23.6, 653, "3.273916816e-3"},   {'i', 24, 655, "3.550329864e-3"},
        {'j', 23.5, 655, "4.545001142e-3"},   {'j', 24, 660, "5.100267704e-3"},
        {'k', 23, 660, "6.109525997e-3"},     {'k', 24, 670, "6.427325645e-3"},
        {'l', 22.6, 646, "2.117860851e-3"},   {'l', 23, 646, "2.062374674e-3"},
        {'m', 22.6, 648.6, "2.533063780e-3"}, {'m', 22.8, 649.3, "2.572971781e-3"},
        {'n', 22.6, 649, "2.923432711e-3"},   {'n', 22.8, 649.7, "2.913311494e-3"},
        {'o', 22.6, 649.1, "3.131208996e-3"}, {'o', 22.8, 649.9, "3.221160278e-3"},
        {'p', 22.6, 649.4, "3.715596186e-3"}, {'p', 22.8, 650.2, "3.664754790e-3"},
        {'q', 21.1, 640, "1.970999272e-3"},   {'q', 21.8, 643, "2.043919161e-3"},
        {'r', 21.1, 644, "5.251009921e-3"},   {'r', 21.8, 648, "5.256844741e-3"},
        {'s', 19.1, 635, "1.932829079e-3"},   {'s', 20, 638, "1.985387227e-3"},
        {'t', 17, 626, "8.483262001e-3"},     {'t', 20, 640, "6.227528101e-3"},
        // SR5-05(2016) Table 13
        {'u', 21.5, 644.6, "2.268366647e-3"},  {'u', 22, 646.1, "2.296350553e-3"},
        {'v', 22.5, 648.6, "2.832373260e-3"},  {'v', 22.3, 647.9, "2.811424405e-3"},
        {'w', 22.15, 647.5, "3.694032281e-3"}, {'w', 22.3, 648.1, "3.622226305e-3"},
        {'x', 22.11, 648, "4.528072649e-3"},   {'x', 22.3, 649, "4.556905799e-3"},
        {'y', 22, 646.84, "2.698354719e-3"},   {'y', 22.064, 647.05, "2.717655648e-3"},
        {'z', 22, 646.89, "3.798732962e-3"},   {'z', 22.064, 647.15, "3.701940010e-3"},
    };
    for (const Row& r : rows) {
        const std::string t = r.sub <= 't' ? "SR5-05(2016) Table 5" : "SR5-05(2016) Table 13";
        const std::string at = std::string(" (3") + r.sub + ") at " + std::to_string(r.p) + " MPa, " +
                               std::to_string(r.T) + " K";
        // The one printed value that is not the equation's value rounded: 3z at
        // 22.064 MPa, 647.15 K prints 3.701940010e-3, Eq. 3z gives 3.70194000947e-3
        // (python3-iapws 1.5.2 (Debian), _Backward3x_v_PT: 3.7019400094847e-3), 0.53 of a
        // unit of the last digit: one full unit allowed there.
        const bool last_digit_off = r.sub == 'z' && r.p == 22.064;
        check(t, "v3(p,T)" + at, if97::region3_v_pT(r.p, r.T), r.v, 1.0, last_digit_off ? 2.0 : 1.0);
        check_exact(t, "STEAM.V.PT" + at, fn("STEAM.V.PT", {r.p, r.T}), r.v,
                    max_pct.at(r.sub) * 1e-2 * printed(r.v).value);
    }
}
