// SPDX-License-Identifier: MPL-2.0
// Catalogue functions for the IAPWS forms that are not the default, each a
// family of its own so that a workbook says which form it uses:
//
//  * STEAM.<PROP>MV.<PAIR>, STEAM.STATEMV.<PAIR>: metastable (supersaturated)
//    vapour by the supplementary equation of IF97 region 2, R7-97(2012)
//    Sec. 6.2, Eq. 18 (the MV suffix on the property, like F and G on the
//    saturation functions). Never a silent switch: the ordinary functions
//    give the stable state.
//  * STEAM.MUCRIT.<PAIR>: the R12-08 viscosity with the critical
//    enhancement mu_2 (the default STEAM.MU.* follows R12-08 Sec. 3, mu_2 = 1).
//
// Also the per-function documentation notes of the transport functions
// (transport_note), shown in docs/functions.md. Names and methods are frozen
// once released.
#include "catalogue_detail.hpp"

#include <cmath>
#include <limits>
#include <string>
#include <utility>

#include "isentra/base/error.hpp"
#include "isentra/properties/state.hpp"
#include "isentra/properties/transport.hpp"

namespace isentra::catalogue::detail {

namespace {

constexpr double nan_v = std::numeric_limits<double>::quiet_NaN();

// A state argument with the range of its quantity (catalogue_detail.hpp).
Arg state_arg(const char* name, Quantity q, const char* description) {
    return ranged(Arg{name, q, description}, ranges::for_quantity(q));
}

const char* const cat_metastable = "Steam metastable vapour";
const char* const cat_transport = "Steam transport properties";

struct In {
    const char* code;
    const char* arg;
    Quantity q;
    const char* description;
};
const In in_p{"P", "p", Quantity::Pressure,
              "Pressure (absolute unless a gauge unit is chosen), from 611.657 Pa to 10 MPa"};
const In in_T{"T", "T", Quantity::Temperature,
              "Temperature, at or below the saturation temperature, down to the 5 % equilibrium-moisture line"};
const In in_h{"H", "h", Quantity::SpecificEnergy, "Specific enthalpy (metastable vapour)"};
const In in_s{"S", "s", Quantity::SpecificEntropy, "Specific entropy (metastable vapour)"};

struct Pair {
    const char* code;
    const In* b;
    State (*solve)(double, double);
    const char* words;
};
const Pair mv_pairs[] = {
    {"PT", &in_T, &state_pT_metastable, "p and T"},
    {"PH", &in_h, &state_ph_metastable, "p and h"},
    {"PS", &in_s, &state_ps_metastable, "p and s"},
};

enum class P { T, H, S, U, V, RHO, CP, CV, W, KAPPA, X };
struct Prop {
    P prop;
    const char* code;
    const char* method;
    Quantity q;
    const char* noun;
};
const Prop mv_props[] = {
    {P::T, "T", "t", Quantity::Temperature, "Temperature"},
    {P::H, "H", "h", Quantity::SpecificEnergy, "Specific enthalpy"},
    {P::S, "S", "s", Quantity::SpecificEntropy, "Specific entropy"},
    {P::U, "U", "u", Quantity::SpecificEnergy, "Specific internal energy"},
    {P::V, "V", "v", Quantity::SpecificVolume, "Specific volume"},
    {P::RHO, "RHO", "rho", Quantity::Density, "Density"},
    {P::CP, "CP", "cp", Quantity::SpecificEntropy, "Specific isobaric heat capacity"},
    {P::CV, "CV", "cv", Quantity::SpecificEntropy, "Specific isochoric heat capacity"},
    {P::W, "W", "w", Quantity::Speed, "Speed of sound"},
    {P::KAPPA, "KAPPA", "kappa", Quantity::None, "Isentropic exponent (w^2 rho/p)"},
    {P::X, "X", "x", Quantity::None, "Equilibrium quality (0.95 to 1)"},
};

double get(const State& st, P p) {
    switch (p) {
    case P::T: return st.T;
    case P::H: return st.h;
    case P::S: return st.s;
    case P::U: return st.u;
    case P::V: return st.v;
    case P::RHO: return st.rho;
    case P::CP: return st.cp;
    case P::CV: return st.cv;
    case P::W: return st.w;
    case P::KAPPA: return st.kappa;
    case P::X: return quality(st);
    }
    return nan_v;
}

const char* const mv_note =
    "Source: IAPWS R7-97(2012) Sec. 6.2, the supplementary equation for the metastable-vapour region, "
    "Eq. (18): ideal-gas part Eq. (16) with the n1, n2 of Table 10 footnote a, residual part Eq. (19) "
    "with Table 16; check values Table 18 (reproduced to all printed digits by "
    "tests/core/test_verification_tables.cpp). Range of validity as the release states it: from the "
    "saturated-vapour line to the 5 % equilibrium-moisture line (equilibrium quality 0.95, from the "
    "equilibrium h' and h'' at p), from the triple-point pressure to 10 MPa; outside it an error that "
    "gives the limits at the pressure. Along the saturated-vapour line Eq. (18) differs from the stable "
    "region-2 equation by at most 0.014 % in v, 0.043 kJ/kg in h, 0.78 % in cp and 0.051 % in w "
    "(R7-97(2012) Sec. 6.2). Use it for supersaturated expansion (nozzles, LP turbine stages before "
    "condensation sets in); where the steam is in equilibrium use the ordinary functions.";

void add_metastable(std::vector<Function>& out) {
    for (const Pair& pair : mv_pairs) {
        for (const Prop& pr : mv_props) {
            if (pr.code == std::string(pair.b->code)) continue;
            Function f;
            f.name = std::string("STEAM.") + pr.code + "MV." + pair.code;
            f.method = std::string(pr.method) + "mv" + pair.code;
            f.category = cat_metastable;
            f.summary = std::string(pr.noun) + " of metastable vapour from " + pair.words +
                        " (IAPWS-IF97 Eq. 18). Supersaturated steam, valid from the 5 % moisture line to "
                        "saturation at p <= 10 MPa.";
            f.note = mv_note;
            f.args = {state_arg(in_p.arg, in_p.q, in_p.description), state_arg(pair.b->arg, pair.b->q, pair.b->description),
                      units_arg()};
            f.result = pr.q;
            const P prop = pr.prop;
            auto solve = pair.solve;
            f.eval = [prop, solve](const double* a, double* o) { o[0] = get(solve(a[0], a[1]), prop); };
            out.push_back(std::move(f));
        }
    }
    const P row[] = {P::T, P::H, P::S, P::U, P::V, P::RHO, P::CP, P::CV, P::W, P::KAPPA, P::X};
    for (const Pair& pair : mv_pairs) {
        Function f;
        f.name = std::string("STEAM.STATEMV.") + pair.code;
        f.method = std::string("statemv") + pair.code;
        f.category = cat_metastable;
        f.summary = std::string("Metastable-vapour state from ") + pair.words +
                    " (IAPWS-IF97 Eq. 18) as one row: p, T, h, s, u, v, rho, cp, cv, w, kappa, x. "
                    "Array formula over 12 cells; x is the equilibrium quality.";
        f.note = mv_note;
        f.args = {state_arg(in_p.arg, in_p.q, in_p.description), state_arg(pair.b->arg, pair.b->q, pair.b->description),
                  units_arg(), header_arg()};
        f.kind = ResultKind::Row;
        f.row_names.push_back("p");
        f.row_quantities.push_back(Quantity::Pressure);
        for (P p : row)
            for (const Prop& pr : mv_props)
                if (pr.prop == p) {
                    std::string n = pr.method;
                    f.row_names.push_back(n);
                    f.row_quantities.push_back(pr.q);
                }
        auto solve = pair.solve;
        f.eval = [solve, row](const double* a, double* o) {
            const State st = solve(a[0], a[1]);
            o[0] = st.p;
            std::size_t i = 1;
            for (P p : row) o[i++] = get(st, p);
        };
        out.push_back(std::move(f));
    }
}

// ---- Viscosity with the critical enhancement ------------------------------------

struct MuPair {
    const char* code;
    const char* a_arg;
    Quantity a_q;
    const char* a_desc;
    const char* b_arg;
    Quantity b_q;
    const char* b_desc;
    State (*solve)(double, double);
    const char* words;
};
const MuPair mu_pairs[] = {
    {"PT", "p", Quantity::Pressure, "Pressure (absolute unless a gauge unit is chosen)", "T",
     Quantity::Temperature, "Temperature", &state_pT, "p and T"},
    {"PH", "p", Quantity::Pressure, "Pressure (absolute unless a gauge unit is chosen)", "h",
     Quantity::SpecificEnergy, "Specific enthalpy", &state_ph, "p and h"},
    {"PS", "p", Quantity::Pressure, "Pressure (absolute unless a gauge unit is chosen)", "s",
     Quantity::SpecificEntropy, "Specific entropy", &state_ps, "p and s"},
    {"HS", "h", Quantity::SpecificEnergy, "Specific enthalpy", "s", Quantity::SpecificEntropy,
     "Specific entropy", &state_hs, "h and s"},
};

const char* const mucrit_note =
    "Source: IAPWS R12-08 Eq. (10) with the critical enhancement mu_2 of Sec. 2.7 (Eqs. 14-21), i.e. "
    "without the simplification of Sec. 3. Density and (d rho/d p)_T from IAPWS-IF97, the reference "
    "derivative at 1.5 Tc from R15-11 Eq. (25) (as the industrial conductivity does), the IF97 "
    "derivative limited per R15-11 Sec. 3.4 footnote 2. mu_2 is applied inside the near-critical "
    "region bounded by R12-08 Sec. 2.8 footnote 2 and set to 1 outside it, where it changes mu by less "
    "than 0.0051 % (Sec. 2.8): so this function equals STEAM.MU.* except near the critical point "
    "(roughly 640-720 K and 150-550 kg/m3; R12-08 Eq. 13 bounds the region where it is significant), "
    "where it is larger: by 0.21 % at 25.16 MPa and 387 degC (as the full correlation on IAPWS-95 gives, "
    "within 0.002 %), 0.38 % at 647.35 K and 222 kg/m3, 7.5 % at 647.35 K and 322 kg/m3, and "
    "more still closer to the critical point (8.6 % at 22.065 MPa and 647.097 K; mu_2 grows without "
    "bound at the critical point itself, where the function gives an error). "
    "With IF97 derivatives it differs from R12-08 Table 5 (IAPWS-95 derivatives) by up to 1.5 %. "
    "R12-08 Sec. 3 recommends mu_2 = 1 for industrial use; STEAM.MU.*, STEAM.NU.*, STEAM.PR.* and "
    "STEAM.LAMBDA.* all use that value.";

void add_mucrit(std::vector<Function>& out) {
    for (const MuPair& pair : mu_pairs) {
        Function f;
        f.name = std::string("STEAM.MUCRIT.") + pair.code;
        f.method = std::string("mucrit") + pair.code;
        f.category = cat_transport;
        f.summary = std::string("Dynamic viscosity from ") + pair.words +
                    " with the critical enhancement mu_2 (IAPWS R12-08 Sec. 2.7). Above STEAM.MU only near the "
                    "critical point: 7.5 % at 647.35 K, 322 kg/m3.";
        f.note = mucrit_note;
        f.args = {state_arg(pair.a_arg, pair.a_q, pair.a_desc), state_arg(pair.b_arg, pair.b_q, pair.b_desc), units_arg()};
        f.result = Quantity::DynamicViscosity;
        auto solve = pair.solve;
        f.eval = [solve](const double* a, double* o) { o[0] = viscosity_with_enhancement(solve(a[0], a[1])); };
        out.push_back(std::move(f));
    }
}

}  // namespace

const char* transport_note(const std::string& code) {
    if (code == "MU")
        return "Source: IAPWS R12-08 Sec. 3 (Recommendation for Industrial Application): Eq. (10) with "
               "mu_2 = 1, i.e. mu = mu_0(T) mu_1(T, rho) (Eqs. 11-12, Tables 1-2), density from IAPWS-IF97. "
               "Reproduces R12-08 Table 4 and the viscosity rows of R15-11 Tables 7-9. Close to the critical "
               "point the full correlation with the enhancement mu_2 is larger (by 7.5 % at 647.35 K and "
               "322 kg/m3): STEAM.MUCRIT.* gives it.";
    if (code == "NU")
        return "Source: mu/rho with mu from IAPWS R12-08 Sec. 3 (mu_2 = 1, as STEAM.MU.*) and rho from "
               "IAPWS-IF97.";
    if (code == "LAMBDA")
        return "Source: IAPWS R15-11 Sec. 3 (industrial form): Eq. (15) with cp, cv and (d rho/d p)_T from "
               "IAPWS-IF97, the reference derivative at 1.5 Tc from Eq. (25) with Table 6, IF97 derivative "
               "and cp limited per Sec. 3.4 footnote 2, lambda_2 = 0 in region 5 (footnote 3), and in "
               "Eq. (18) the R12-08 Sec. 3 viscosity (mu_2 = 1, as STEAM.MU.*). Reproduces R15-11 Tables 7-9.";
    if (code == "ALPHA")
        return "Source: lambda/(rho cp) with lambda from IAPWS R15-11 Sec. 3 (as STEAM.LAMBDA.*), rho and cp "
               "from IAPWS-IF97.";
    if (code == "PR")
        return "Source: mu cp/lambda with mu from IAPWS R12-08 Sec. 3 (mu_2 = 1), lambda from IAPWS R15-11 "
               "Sec. 3 (whose Eq. (18) uses that same mu), cp from IAPWS-IF97: one consistent viscosity.";
    if (code == "SIGMA")
        return "Source: IAPWS R1-76(2014), the full equation sigma = B tau^mu (1 + b tau), no "
               "simplification; reproduces its Table 1. Valid from the triple point (273.16 K) to the "
               "critical point.";
    return "";
}

void add_supplementary_family(std::vector<Function>& out) {
    add_mucrit(out);
    add_metastable(out);
}

}  // namespace isentra::catalogue::detail
