// SPDX-License-Identifier: MPL-2.0
// Transport and interfacial properties of water and steam.
//
// Viscosity: IAPWS R12-08 "Release on the IAPWS Formulation 2008 for the
// Viscosity of Ordinary Water Substance", Eqs. 10-21, Tables 1-3.
// Thermal conductivity: IAPWS R15-11 "Release on the IAPWS Formulation 2011
// for the Thermal Conductivity of Ordinary Water Substance", Eqs. 15-24 and
// its industrial form, Sec. 3 (Eqs. 25-27, Table 6, footnotes 2 and 3).
// Surface tension: IAPWS R1-76(2014) "Revised Release on Surface Tension of
// Ordinary Water Substance".
//
// What is implemented, exactly:
//  * Densities and all thermodynamic inputs (rho, cp, cv, (d rho/d p)_T) come
//    from IAPWS-IF97 (the State), as R12-08 Sec. 3 and R15-11 Sec. 3.1 ask
//    for industrial use.
//  * Viscosity, the default (viscosity(), kinematic_viscosity(), prandtl(),
//    transport(), the saturated values): R12-08 Sec. 3, "Recommendation for
//    industrial application": Eq. 10 with mu_2 = 1, i.e. mu = mu_0 mu_1
//    (Eqs. 11, 12) at the IF97 density. This is the viscosity column of
//    R15-11 Tables 7-9 and the viscosity in the conductivity's Eq. 18, so
//    mu, nu, lambda and Pr are mutually consistent. R12-08 Sec. 3 states that
//    using IF97 densities adds an error smaller than the correlation's
//    uncertainty except close to and inside the near-critical region of
//    Eq. 13; there the enhancement mu_2 (omitted here) matters too.
//  * Viscosity with the critical enhancement, on request only
//    (viscosity_with_enhancement()): R12-08 Eq. 10 with mu_2 (Eqs. 14-19)
//    applied to single-phase region 1-3 states with T < T_b(rho), the side
//    of the R12-08 Sec. 2.8 footnote 2 curve T/K = sum_{i=0..3} a_i
//    (rho/(kg/m3))^i that holds the critical point (outside it omitting mu_2
//    changes mu by less than 0.0051 %, footnote 2), mu_2 = 1 elsewhere. The
//    correlation length xi (Eqs. 20-21) uses the IF97 (d rho/d p)_T at the
//    state and, for zeta(T_R, rho), the industrial prescription of R15-11
//    Eq. 25 (the same xi as the conductivity, R15-11 Sec. 2.7; R12-08 gives
//    no industrial zeta(T_R) because it sets mu_2 = 1). The IF97 derivative
//    is limited per R15-11 Sec. 3.4 footnote 2. Near the critical point these
//    values differ from R12-08 Table 5 (IAPWS-95 derivatives) as IF97's
//    derivatives differ from IAPWS-95's there.
//  * Thermal conductivity: the R15-11 industrial form: cp, cv and zeta(T, rho)
//    from IF97, zeta(T_R, rho) from Eq. 25, mu in Eq. 18 from the R12-08
//    industrial viscosity (mu_2 = 1, which R15-11 Tables 7-9 confirm), IF97
//    zeta and cp limited per footnote 2, lambda_2 = 0 in region 5
//    (footnote 3). Range Eq. 27.
//  * Surface tension: R1-76(2014), valid from the triple point 273.16 K to Tc.
#include "isentra/properties/transport.hpp"

#include <cmath>
#include <limits>
#include <string>

#include "isentra/base/error.hpp"

namespace isentra {
namespace {

constexpr double NaN = std::numeric_limits<double>::quiet_NaN();
constexpr double pi = 3.14159265358979323846;

// ---- Reference constants ---------------------------------------------------
// R12-08 Eqs. 1-4 and R15-11 Eqs. 1-6.
constexpr double T_star = 647.096;     // K
constexpr double rho_star = 322.0;     // kg/m3
constexpr double p_star = 22.064;      // MPa
constexpr double mu_star = 1.0e-6;     // Pa s
constexpr double lambda_star = 1.0e-3; // W/(m K)
constexpr double R_tc = 0.46151805;    // kJ/(kg K), R15-11 Eq. 6 (IAPWS-95 value)

// ---- R12-08 Table 1: H_i for mu_0 (Eq. 11) ---------------------------------
constexpr double H0[4] = {1.67752, 2.20462, 0.6366564, -0.241605};

// ---- R12-08 Table 2: H_ij for mu_1 (Eq. 12), [i][j], omitted ones = 0 -------
constexpr double H1[6][7] = {
    {5.20094e-1, 2.22531e-1, -2.81378e-1, 1.61913e-1, -3.25372e-2, 0.0, 0.0},
    {8.50895e-2, 9.99115e-1, -9.06851e-1, 2.57399e-1, 0.0, 0.0, 0.0},
    {-1.08374, 1.88797, -7.72479e-1, 0.0, 0.0, 0.0, 0.0},
    {-2.89555e-1, 1.26613, -4.89837e-1, 0.0, 6.98452e-2, 0.0, -4.35673e-3},
    {0.0, 0.0, -2.57040e-1, 0.0, 0.0, 8.72102e-3, 0.0},
    {0.0, 1.20573e-1, 0.0, 0.0, 0.0, 0.0, -5.93264e-4},
};

// ---- R12-08 Table 3: critical-region constants ------------------------------
constexpr double x_mu = 0.068;
constexpr double qC = 1.0 / 1.9;  // nm^-1
constexpr double qD = 1.0 / 1.1;  // nm^-1
constexpr double nu_c = 0.630;
constexpr double gamma_c = 1.239;
constexpr double xi0 = 0.13;      // nm
constexpr double Gamma0 = 0.06;
constexpr double TR_bar = 1.5;
constexpr double xi_eq15 = 0.3817016416;  // nm, Eq. 15 / Eq. 16 switch

// R12-08 Sec. 2.8 footnote 2: boundary of the near-critical region.
constexpr double a_b[4] = {457.95895935062, 1.68077273385305, -3.24405775203984e-3,
                           1.43032446173023e-6};

// ---- R15-11 Table 1: L_k for lambda_0 (Eq. 16) ------------------------------
constexpr double L0[5] = {2.443221e-3, 1.323095e-2, 6.770357e-3, -3.454586e-3, 4.096266e-4};

// ---- R15-11 Table 2: L_ij for lambda_1 (Eq. 17), [i][j] ---------------------
constexpr double L1[5][6] = {
    {1.60397357, -0.646013523, 0.111443906, 0.102997357, -0.0504123634, 0.00609859258},
    {2.33771842, -2.78843778, 1.53616167, -0.463045512, 0.0832827019, -0.00719201245},
    {2.19650529, -4.54580785, 3.55777244, -1.40944978, 0.275418278, -0.0205938816},
    {-1.21051378, 1.60812989, -0.621178141, 0.0716373224, 0.0, 0.0},
    {-2.7203370, 4.57586331, -3.18369245, 1.1168348, -0.19268305, 0.012913842},
};

// ---- R15-11 Table 3 ---------------------------------------------------------
constexpr double Lambda_c = 177.8514;
constexpr double qD_lambda = 1.0 / 0.40;  // nm^-1

// ---- R15-11 Table 6: A_ij for zeta(T_R, rho) (Eq. 25), [j][i] ----------------
constexpr double A_tr[5][6] = {
    {6.53786807199516, -5.61149954923348, 3.39624167361325, -2.27492629730878,
     10.2631854662709, 1.97815050331519},
    {6.52717759281799, -6.30816983387575, 8.08379285492595, -9.82240510197603,
     12.1358413791395, -5.54349664571295},
    {5.35500529896124, -3.96415689925446, 8.91990208918795, -12.0338729505790,
     9.19494865194302, -2.16866274479712},
    {1.55225959906681, 0.464621290821181, 8.93237374861479, -11.0321960061126,
     6.16780999933360, -0.965458722086812},
    {1.11999926419994, 0.595748562571649, 9.88952565078920, -10.3255051147040,
     4.66861294457414, -0.503243546373828},
};
// R15-11 Eq. 26: upper bounds of the reduced density for j = 0..3.
constexpr double A_rho_bounds[4] = {0.310559006, 0.776397516, 1.242236025, 1.863354037};

// R15-11 Sec. 3.4 footnote 2: limit for IF97 zeta and cp (reduced).
constexpr double big = 1.0e13;

// ---- R1-76(2014) --------------------------------------------------------------
constexpr double sigma_B = 235.8e-3;  // N/m
constexpr double sigma_b = -0.625;
constexpr double sigma_mu = 1.256;
constexpr double sigma_Tmin = 273.16;  // K, triple point (0.01 C)

// Slack on the temperature limits so that a limit typed in another unit
// (0.01 C + 273.15 = 273.15999999999997 K) is not refused for rounding.
constexpr double T_slack = 1.0e-9;  // K

// ---- Range: R12-08 Eq. 9 and R15-11 Eq. 27 within IF97 -------------------------
constexpr double T_lo = 273.15;    // K, IF97 lower limit
constexpr double T_hi = 1173.15;   // K
constexpr double T_p50 = 1073.15;  // K, above this p <= 50 MPa
constexpr double p_hi = 100.0;     // MPa
constexpr double p_hi_hot = 50.0;  // MPa

// Reduced mu_0 mu_1 (R12-08 Eqs. 11, 12).
double mu01_bar(double rho_bar, double T_bar) {
    const double it = 1.0 / T_bar;
    const double d0 = H0[0] + it * (H0[1] + it * (H0[2] + it * H0[3]));
    const double mu0 = 100.0 * std::sqrt(T_bar) / d0;
    const double ti = it - 1.0;
    const double r = rho_bar - 1.0;
    double sum = 0.0;
    for (int i = 5; i >= 0; --i) {
        const double* h = H1[i];
        const double row =
            h[0] + r * (h[1] + r * (h[2] + r * (h[3] + r * (h[4] + r * (h[5] + r * h[6])))));
        sum = sum * ti + row;
    }
    return mu0 * std::exp(rho_bar * sum);
}

// zeta(T_R, rho) reduced, R15-11 Eq. 25.
double zeta_TR_bar(double rho_bar) {
    int j = 4;
    for (int k = 0; k < 4; ++k)
        if (rho_bar <= A_rho_bounds[k]) {
            j = k;
            break;
        }
    const double* a = A_tr[j];
    const double s =
        a[0] + rho_bar * (a[1] + rho_bar * (a[2] + rho_bar * (a[3] + rho_bar * (a[4] + rho_bar * a[5]))));
    return 1.0 / s;
}

constexpr double zeta_scale = p_star / rho_star;  // (d rho/d p) kg/(m3 MPa) -> reduced

// xi in nm from reduced quantities (R15-11 Eqs. 22-23, R12-08 Eqs. 20-21).
double xi_bar(double rho_bar, double T_bar, double zeta_T, double zeta_TR) {
    if (!(zeta_T >= 0.0 && zeta_T <= big)) zeta_T = big;  // footnote 2 (also catches NaN)
    const double dchi = rho_bar * (zeta_T - zeta_TR * TR_bar / T_bar);
    if (!(dchi > 0.0)) return 0.0;
    return xi0 * std::pow(dchi / Gamma0, nu_c / gamma_c);
}

// R12-08 Eqs. 14-19.
double mu2_of_xi(double xi) {
    if (!(xi > 0.0)) return 1.0;
    const double c = qC * xi;
    const double d = qD * xi;
    double Y;
    if (xi <= xi_eq15) {
        const double d2 = d * d;
        Y = 0.2 * c * d2 * d2 * d * (1.0 - c + c * c - 765.0 / 504.0 * d2);  // Eq. 15
    } else {
        // Eq. 17: cos(psi_D) = (1 + (qD xi)^2)^(-1/2), so psi_D = atan(qD xi) with
        // sin and cos by the identities (no further trigonometric calls).
        const double cs = 1.0 / std::sqrt(1.0 + d * d);
        const double sn = d * cs;
        const double psi = std::atan(d);
        const double w = std::sqrt(std::fabs((c - 1.0) / (c + 1.0))) * (sn / (1.0 + cs));  // Eq. 19
        const double L = c > 1.0 ? std::log((1.0 + w) / (1.0 - w)) : 2.0 * std::atan(std::fabs(w));  // Eq. 18
        const double c2 = c * c;
        const double sin2 = 2.0 * sn * cs, sin3 = sn * (3.0 - 4.0 * sn * sn);
        const double e = std::fabs(c2 - 1.0);
        Y = sin3 / 12.0 - sin2 / (4.0 * c) + (1.0 - 1.25 * c2) * sn / c2 -
            ((1.0 - 1.5 * c2) * psi - e * std::sqrt(e) * L) / (c2 * c);  // Eq. 16
    }
    return std::exp(x_mu * Y);  // Eq. 14
}

// Reduced lambda_0 (R15-11 Eq. 16) and lambda_1 (Eq. 17).
double lambda0_bar(double T_bar) {
    const double it = 1.0 / T_bar;
    const double d = L0[0] + it * (L0[1] + it * (L0[2] + it * (L0[3] + it * L0[4])));
    return std::sqrt(T_bar) / d;
}
double lambda1_bar(double rho_bar, double T_bar) {
    const double ti = 1.0 / T_bar - 1.0;
    const double r = rho_bar - 1.0;
    double sum = 0.0;
    for (int i = 4; i >= 0; --i) {
        const double* l = L1[i];
        const double row = l[0] + r * (l[1] + r * (l[2] + r * (l[3] + r * (l[4] + r * l[5]))));
        sum = sum * ti + row;
    }
    return std::exp(rho_bar * sum);
}

// R15-11 Eq. 19 (with Eq. 21).
double Z_of_y(double y, double kappa, double rho_bar) {
    if (y < 1.2e-7) return 0.0;
    const double ik = 1.0 / kappa;
    return 2.0 / (pi * y) *
           (((1.0 - ik) * std::atan(y) + ik * y) -
            (1.0 - std::exp(-1.0 / (1.0 / y + y * y / (3.0 * rho_bar * rho_bar)))));
}

ConductivityTerms terms(double rho, double T, double cp, double cv, double mu, double zeta_T_bar,
                        double zeta_TR_bar_, bool with_lambda2) {
    ConductivityTerms t;
    const double rb = rho / rho_star, Tb = T / T_star;
    t.lambda0 = lambda0_bar(Tb);
    t.lambda1 = lambda1_bar(rb, Tb);
    double l2 = 0.0;
    if (with_lambda2) {
        t.xi = xi_bar(rb, Tb, zeta_T_bar, zeta_TR_bar_);
        if (t.xi > 0.0) {
            double cp_bar = cp / R_tc;
            if (!(cp_bar >= 0.0 && cp_bar <= big)) cp_bar = big;  // footnote 2
            const double kappa = cp_bar / (cv / R_tc);
            t.Z = Z_of_y(qD_lambda * t.xi, kappa, rb);
            l2 = Lambda_c * rb * cp_bar * Tb / (mu / mu_star) * t.Z;  // Eq. 18
        }
    }
    t.lambda2 = l2;
    t.lambda = (t.lambda0 * t.lambda1 + l2) * lambda_star;  // Eq. 15
    return t;
}

// ---- Phase data and dispatch ----------------------------------------------------

struct PhaseData {
    double rho, T, p, cp, cv, drhodp;
    int region;
};

PhaseData from_props(const if97::Props& s) {
    return {s.rho, s.T, s.p, s.cp, s.cv, s.drhodp_T, s.region};
}

enum class Prop { Mu, Lambda, Nu, A, Pr, All };

const char* prop_label(Prop w) {
    switch (w) {
    case Prop::Mu: return "dynamic viscosity";
    case Prop::Lambda: return "thermal conductivity";
    case Prop::Nu: return "kinematic viscosity";
    case Prop::A: return "thermal diffusivity";
    case Prop::Pr: return "Prandtl number";
    default: return "transport properties";
    }
}

// The saturated-liquid/-vapour spreadsheet functions (see catalogue.cpp).
const char* prop_hint(Prop w) {
    switch (w) {
    case Prop::Mu: return "STEAM.MUF.P / STEAM.MUG.P or STEAM.MUF.T / STEAM.MUG.T";
    case Prop::Lambda:
        return "STEAM.LAMBDAF.P / STEAM.LAMBDAG.P or STEAM.LAMBDAF.T / STEAM.LAMBDAG.T";
    case Prop::Nu: return "STEAM.NUF.P / STEAM.NUG.P or STEAM.NUF.T / STEAM.NUG.T";
    case Prop::Pr: return "STEAM.PRF.P / STEAM.PRG.P or STEAM.PRF.T / STEAM.PRG.T";
    case Prop::A:
        return "from STEAM.LAMBDAF.P, STEAM.RHOF.P and STEAM.CPF.P (or the G and .T forms)";
    default:
        return "STEAM.MUF.P / STEAM.MUG.P, STEAM.LAMBDAF.P / STEAM.LAMBDAG.P and their .T forms";
    }
}

void check_range(double p, double T) {
    const std::string ctx = "for transport properties (IAPWS R12-08/R15-11 with IF97)";
    if (!(T >= T_lo - T_slack && T <= T_hi + T_slack)) throw RangeError("T", Quantity::Temperature, T, T_lo, T_hi, ctx);
    if (!(p <= p_hi)) throw RangeError("p", Quantity::Pressure, p, NaN, p_hi, ctx);
    if (T > T_p50 + T_slack && !(p <= p_hi_hot))
        throw RangeError("p", Quantity::Pressure, p, NaN, p_hi_hot,
                         "for transport properties at T > 1073.15 K (IAPWS R12-08/R15-11 with IF97)");
}

// The phase a State stands for: single phase, or a saturated end (x = 0 / 1).
PhaseData single_phase(const State& st, Prop w) {
    if (st.phase == Phase::TwoPhase || st.region == 4) {
        if (st.x == 0.0) return from_props(st.liq);
        if (st.x == 1.0) return from_props(st.vap);
        throw Error(ErrorCode::NotDefined,
                    std::string("transport properties of a wet-steam mixture (0 < x < 1) are not "
                                "defined (asked for: ") +
                        prop_label(w) + "); use the saturated-liquid or saturated-vapour value (" +
                        prop_hint(w) + ")");
    }
    return {st.rho, st.T, st.p, st.cp, st.cv, st.drhodp_T, st.region};
}

const State& saturation_only(const State& sat, const char* fn) {
    if (!(sat.phase == Phase::TwoPhase || sat.region == 4))
        throw Error(ErrorCode::InvalidArgument,
                    std::string(fn) + " needs a saturation state (from saturation_p or saturation_T)");
    return sat;
}

// R12-08 Sec. 2.8 footnote 2: inside the near-critical region?
bool near_critical(const PhaseData& d) {
    if (d.region == 5) return false;
    const double r = d.rho;
    return d.T < a_b[0] + r * (a_b[1] + r * (a_b[2] + r * a_b[3]));
}

// No finite transport property at the critical point or on the stability
// limit next to it (see isentra::critical_singularity).
void require_regular(const PhaseData& d) {
    if (critical_singularity(d.T, d.p, d.drhodp)) throw critical_singularity_error(prop_label(Prop::All) +
                                                                                   std::string(" are"));
}

// R12-08 Sec. 3, industrial: mu_2 = 1.
double mu_of(const PhaseData& d) {
    require_regular(d);
    return mu01_bar(d.rho / rho_star, d.T / T_star) * mu_star;
}

// R12-08 Eq. 10 with mu_2 inside the near-critical region of Sec. 2.8 footnote 2.
double mu_enhanced_of(const PhaseData& d) {
    require_regular(d);
    const double rb = d.rho / rho_star, Tb = d.T / T_star;
    double m = mu01_bar(rb, Tb);
    if (near_critical(d)) m *= mu2_of_xi(xi_bar(rb, Tb, d.drhodp * zeta_scale, zeta_TR_bar(rb)));
    return m * mu_star;
}

double lambda_of(const PhaseData& d) {
    require_regular(d);
    const double rb = d.rho / rho_star, Tb = d.T / T_star;
    const double mu_ind = mu01_bar(rb, Tb) * mu_star;  // R15-11 Sec. 3.1: industrial viscosity (= mu_of)
    return terms(d.rho, d.T, d.cp, d.cv, mu_ind, d.drhodp * zeta_scale, zeta_TR_bar(rb),
                 d.region != 5)
        .lambda;
}

Transport all_of(const PhaseData& d) {
    Transport r;
    r.mu = mu_of(d);
    r.lambda = lambda_of(d);
    r.nu = r.mu / d.rho;
    r.a = r.lambda / (d.rho * d.cp * 1.0e3);
    r.Pr = r.mu * d.cp * 1.0e3 / r.lambda;
    return r;
}

PhaseData checked(const State& st, Prop w) {
    PhaseData d = single_phase(st, w);
    check_range(d.p, d.T);
    return d;
}

}  // namespace

// ---- Raw correlations ----------------------------------------------------------

double viscosity_rhoT(double rho, double T) {
    return mu01_bar(rho / rho_star, T / T_star) * mu_star;
}

double drhodp_TR_industrial(double rho) { return zeta_TR_bar(rho / rho_star) / zeta_scale; }

double correlation_length(double rho, double T, double drhodp_T_at_T, double drhodp_T_at_TR) {
    return xi_bar(rho / rho_star, T / T_star, drhodp_T_at_T * zeta_scale,
                  drhodp_T_at_TR * zeta_scale);
}

double viscosity_enhancement(double xi) { return mu2_of_xi(xi); }

double viscosity_rhoT(double rho, double T, double drhodp_T_at_T, double drhodp_T_at_TR) {
    return viscosity_rhoT(rho, T) *
           mu2_of_xi(correlation_length(rho, T, drhodp_T_at_T, drhodp_T_at_TR));
}

ConductivityTerms conductivity_terms(double rho, double T, double cp, double cv, double mu,
                                     double drhodp_T_at_T, double drhodp_T_at_TR) {
    return terms(rho, T, cp, cv, mu, drhodp_T_at_T * zeta_scale, drhodp_T_at_TR * zeta_scale, true);
}

double conductivity_rhoT(double rho, double T, double cp, double cv, double mu,
                         double drhodp_T_at_T, double drhodp_T_at_TR) {
    return conductivity_terms(rho, T, cp, cv, mu, drhodp_T_at_T, drhodp_T_at_TR).lambda;
}

// ---- On a state ------------------------------------------------------------------

double viscosity(const State& st) { return mu_of(checked(st, Prop::Mu)); }
double viscosity_with_enhancement(const State& st) { return mu_enhanced_of(checked(st, Prop::Mu)); }
double conductivity(const State& st) { return lambda_of(checked(st, Prop::Lambda)); }
double kinematic_viscosity(const State& st) {
    const PhaseData d = checked(st, Prop::Nu);
    return mu_of(d) / d.rho;
}
double thermal_diffusivity(const State& st) {
    const PhaseData d = checked(st, Prop::A);
    return lambda_of(d) / (d.rho * d.cp * 1.0e3);
}
double prandtl(const State& st) {
    const PhaseData d = checked(st, Prop::Pr);
    return mu_of(d) * d.cp * 1.0e3 / lambda_of(d);
}
Transport transport(const State& st) { return all_of(checked(st, Prop::All)); }

double viscosity_liq(const State& sat) {
    return mu_of(from_props(saturation_only(sat, "viscosity_liq").liq));
}
double viscosity_vap(const State& sat) {
    return mu_of(from_props(saturation_only(sat, "viscosity_vap").vap));
}
double conductivity_liq(const State& sat) {
    return lambda_of(from_props(saturation_only(sat, "conductivity_liq").liq));
}
double conductivity_vap(const State& sat) {
    return lambda_of(from_props(saturation_only(sat, "conductivity_vap").vap));
}
Transport transport_liq(const State& sat) {
    return all_of(from_props(saturation_only(sat, "transport_liq").liq));
}
Transport transport_vap(const State& sat) {
    return all_of(from_props(saturation_only(sat, "transport_vap").vap));
}

double surface_tension(double T) {
    if (!(T >= sigma_Tmin - T_slack && T <= T_star + T_slack))
        throw RangeError("T", Quantity::Temperature, T, sigma_Tmin, T_star,
                         "for surface tension (IAPWS R1-76(2014): triple point to critical point)");
    const double tau = 1.0 - T / T_star;
    if (tau <= 0.0) return 0.0;
    return sigma_B * std::pow(tau, sigma_mu) * (1.0 + sigma_b * tau);
}

}  // namespace isentra
