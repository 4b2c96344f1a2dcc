// SPDX-License-Identifier: MPL-2.0
// Differential-pressure flow meters by ISO 5167 (2003): discharge
// coefficients, expansibility, limits of use, the flow from a differential
// pressure (iterated in the Reynolds number), the inverse, and the
// uncertainty of the flow. See flow.hpp for the conventions.
//
// Equations (ISO 5167, 2003 editions; the numbers below are the standards'; the
// equation and clause numbers quoted here and in flow.hpp are from memory of
// those editions, the equations themselves are checked against python3-fluids
// and by hand in tests/core/test_flow.cpp):
//   q_m   = C / sqrt(1 - beta^4) eps (pi/4) d^2 sqrt(2 dp rho1)      5167-1 Eq. 1
//   Re_D  = 4 q_m / (pi mu1 D)                                        5167-1 3.3.2.1
//   orifice C (Reader-Harris/Gallagher), 5167-2 Eq. 4:
//     C = 0.5961 + 0.0261 b^2 - 0.216 b^8 + 0.000521 (1e6 b/Re)^0.7
//         + (0.0188 + 0.0063 A) b^3.5 (1e6/Re)^0.3
//         + (0.043 + 0.080 e^(-10 L1) - 0.123 e^(-7 L1)) (1 - 0.11 A) b^4/(1 - b^4)
//         - 0.031 (M2 - 0.8 M2^1.1) b^1.3
//         [+ 0.011 (0.75 - b)(2.8 - D/25.4 mm) where D < 71.12 mm]
//     A = (19000 b/Re)^0.8, M2 = 2 L2/(1 - b); corner L1 = L2 = 0;
//     D and D/2: L1 = 1, L2 = 0.47; flange: L1 = L2 = 25.4 mm / D
//   orifice eps, 5167-2 Eq. 5: 1 - (0.351 + 0.256 b^4 + 0.93 b^8)(1 - (p2/p1)^(1/kappa))
//   ISA 1932 nozzle, 5167-3 Eq. 1:
//     C = 0.9900 - 0.2262 b^4.1 - (0.00175 b^2 - 0.0033 b^4.15)(1e6/Re)^1.15
//   long-radius nozzle, 5167-3 Eq. 3: C = 0.9965 - 0.00653 b^0.5 (1e6/Re)^0.5
//   venturi nozzle, 5167-3 Eq. 4: C = 0.9858 - 0.196 b^4.5
//   classical venturi tube, 5167-4 5.5: C = 0.984 (as cast), 0.995 (machined),
//     0.985 (rough-welded)
//   nozzle and venturi eps, 5167-3 Eq. 2 = 5167-4 Eq. 2, tau = p2/p1:
//     eps = sqrt( kappa tau^(2/kappa)/(kappa - 1) (1 - b^4)/(1 - b^4 tau^(2/kappa))
//                 (1 - tau^((kappa-1)/kappa))/(1 - tau) )
#include "isentra/engineering/flow.hpp"

#include <algorithm>
#include <cmath>
#include <cstdio>
#include <limits>

#include "isentra/base/error.hpp"
#include "isentra/properties/state.hpp"
#include "isentra/properties/transport.hpp"

namespace isentra::flow {

namespace {

constexpr double nan_v = std::numeric_limits<double>::quiet_NaN();
constexpr double pi = 3.14159265358979323846;
constexpr double mm = 1e-3;
constexpr double inch = 0.0254;  // m, exact (international yard and pound, 1959)

std::string lower_compact(const std::string& s) {
    std::string r;
    for (char c : s) {
        if (c == ' ' || c == '-' || c == '_' || c == '\t' || c == '.') continue;
        r += (c >= 'A' && c <= 'Z') ? static_cast<char>(c - 'A' + 'a') : c;
    }
    return r;
}

bool finite_positive(double x) { return std::isfinite(x) && x > 0; }

// Limits of use of a device (ISO 5167-2 5.3.1, 5167-3 5.1.6.1/5.2.6.1/6.1.6.1, 5167-4 5.5.2-5.5.4).
struct Limits {
    double D_min, D_max;       // m
    double d_min;              // m (0: none)
    double beta_min, beta_max;
    const char* source;        // "(ISO 5167-2 5.3.1, ...)"
};

Limits limits_of(Device dev) {
    switch (dev) {
        case Device::OrificeCorner:
            return {50 * mm, 1000 * mm, 12.5 * mm, 0.1, 0.75,
                    "(limit of use of ISO 5167-2:2003 5.3.1 for orifice plates with corner tappings)"};
        case Device::OrificeFlange:
            return {50 * mm, 1000 * mm, 12.5 * mm, 0.1, 0.75,
                    "(limit of use of ISO 5167-2:2003 5.3.1 for orifice plates with flange tappings)"};
        case Device::OrificeDD2:
            return {50 * mm, 1000 * mm, 12.5 * mm, 0.1, 0.75,
                    "(limit of use of ISO 5167-2:2003 5.3.1 for orifice plates with D and D/2 tappings)"};
        case Device::NozzleISA1932:
            return {50 * mm, 500 * mm, 0, 0.3, 0.8, "(limit of use of ISO 5167-3:2003 5.1.6.1 for ISA 1932 nozzles)"};
        case Device::NozzleLongRadius:
            return {50 * mm, 630 * mm, 0, 0.2, 0.8,
                    "(limit of use of ISO 5167-3:2003 5.2.6.1 for long-radius nozzles)"};
        case Device::NozzleVenturi:
            return {65 * mm, 500 * mm, 50 * mm, 0.316, 0.775,
                    "(limit of use of ISO 5167-3:2003 6.1.6.1 for venturi nozzles)"};
        case Device::VenturiAsCast:
            return {100 * mm, 800 * mm, 0, 0.3, 0.75,
                    "(limit of use of ISO 5167-4:2003 5.5.2 for classical venturi tubes with an as-cast convergent "
                    "section)"};
        case Device::VenturiMachined:
            return {50 * mm, 250 * mm, 0, 0.4, 0.75,
                    "(limit of use of ISO 5167-4:2003 5.5.3 for classical venturi tubes with a machined convergent "
                    "section)"};
        case Device::VenturiRoughWelded:
            return {200 * mm, 1200 * mm, 0, 0.4, 0.7,
                    "(limit of use of ISO 5167-4:2003 5.5.4 for classical venturi tubes with a rough-welded "
                    "sheet-iron convergent section)"};
    }
    throw Error(ErrorCode::InvalidArgument, "internal: unknown flow meter");
}

// Reynolds-number interval of a device at this beta and D (NaN: unbounded).
void reynolds_limits(Device dev, double beta, double D, double& lo, double& hi) {
    hi = nan_v;
    switch (dev) {
        case Device::OrificeCorner:
        case Device::OrificeDD2: lo = beta <= 0.56 ? 5000.0 : 16000.0 * beta * beta; return;
        case Device::OrificeFlange: lo = std::max(5000.0, 170.0 * beta * beta * (D / mm)); return;
        case Device::NozzleISA1932:
            lo = beta < 0.44 ? 7e4 : 2e4;
            hi = 1e7;
            return;
        case Device::NozzleLongRadius:
            lo = 1e4;
            hi = 1e7;
            return;
        case Device::NozzleVenturi:
            lo = 1.5e5;
            hi = 2e6;
            return;
        case Device::VenturiAsCast:
        case Device::VenturiRoughWelded:
            lo = 2e5;
            hi = 2e6;
            return;
        case Device::VenturiMachined:
            lo = 2e5;
            hi = 1e6;
            return;
    }
}

std::string fmt(double v) {
    char buf[40];
    std::snprintf(buf, sizeof buf, "%.4g", v);
    return buf;
}

// The state at the upstream tapping and its properties.
struct Upstream {
    double rho = 0, mu = 0, kappa = nan_v;
    double dlnrho_dlnp = 0;  // (p/rho)(d rho/d p)_T
    double dlnrho_dT = 0;    // (1/rho)(d rho/d T)_p, 1/K
    double psat = nan_v;     // MPa, for water
    bool liquid = false;
};

Upstream upstream(double p1, double T1) {
    if (!finite_positive(p1)) throw RangeError("p", Quantity::Pressure, p1, 0.0, nan_v, "(absolute pressure)");
    if (!finite_positive(T1)) throw RangeError("T", Quantity::Temperature, T1, 0.0, nan_v, "(absolute temperature)");
    State st;
    try {
        st = state_pT(p1, T1);
    } catch (const RangeError&) {
        throw;
    } catch (const Error& e) {
        if (e.code() != ErrorCode::Impossible) throw;
        throw Error(ErrorCode::Impossible,
                    "the upstream state (p, T) lies on the saturation line: the steam may be wet or two-phase, and "
                    "ISO 5167 measures single-phase flow only (superheated steam or subcooled water); measure where "
                    "the fluid is single-phase");
    }
    if (st.phase == Phase::TwoPhase)
        throw Error(ErrorCode::Impossible,
                    "the upstream state is wet (two-phase) steam: ISO 5167 measures single-phase flow only");
    Upstream u;
    u.rho = st.rho;
    u.mu = viscosity(st);
    u.liquid = st.phase == Phase::Liquid;
    u.kappa = st.kappa;
    u.dlnrho_dlnp = p1 * st.drhodp_T / st.rho;
    u.dlnrho_dT = -st.rho * st.dvdT_p;
    if (u.liquid) u.psat = saturation_pressure(T1);
    if (!(finite_positive(u.rho) && finite_positive(u.mu) && finite_positive(u.kappa)))
        throw Error(ErrorCode::NotDefined, "the fluid properties at the upstream state are not defined (critical point)");
    return u;
}

double pressure_ratio_dp_max(double p1) { return 0.25 * p1 * 1e6; }  // Pa: p2/p1 >= 0.75

void check_dp(double dp, double p1, const Upstream& u) {
    if (!(std::isfinite(dp) && dp > 0)) throw RangeError("dp", Quantity::DifferentialPressure, dp, 0.0, nan_v,
                                                          "(the differential pressure must be positive)");
    if (u.liquid) {
        if (p1 - dp * 1e-6 <= u.psat)
            throw RangeError("dp", Quantity::DifferentialPressure, dp, nan_v, (p1 - u.psat) * 1e6,
                             "(p - dp would fall to the saturation pressure at T: the water would flash)",
                             ErrorCode::Impossible);
    } else if (dp > pressure_ratio_dp_max(p1)) {
        throw RangeError("dp", Quantity::DifferentialPressure, dp, nan_v, pressure_ratio_dp_max(p1),
                         "(ISO 5167-2/-3/-4 limit of use of the expansibility factor: p2/p1 = 1 - dp/p at least 0.75)");
    }
}

// r = dp/p1 = 1 - tau; the powers of tau = 1 - r are taken through log1p and
// expm1 so that the small differences 1 - tau^a keep their digits.
double eps_equation(Family f, double beta, double r, double kappa) {
    const double b4 = std::pow(beta, 4);
    const double ln_tau = std::log1p(-r);
    if (f == Family::Orifice) return 1.0 + (0.351 + 0.256 * b4 + 0.93 * b4 * b4) * std::expm1(ln_tau / kappa);
    if (r == 0.0) return 1.0;
    const double t2k = std::exp(2.0 / kappa * ln_tau);
    const double v = kappa * t2k / (kappa - 1.0) * (1.0 - b4) / (1.0 - b4 * t2k) *
                     (-std::expm1((kappa - 1.0) / kappa * ln_tau)) / r;
    return std::sqrt(v);
}

double eps_of(Family f, double beta, double dp, double p1, const Upstream& u) {
    if (u.liquid) return 1.0;
    if (!(u.kappa > 1.0))
        throw Error(ErrorCode::NotDefined, "the isentropic exponent at the upstream state is " + fmt(u.kappa) +
                                               ", not above 1 (near the critical point): the expansibility "
                                               "equations of ISO 5167 do not apply");
    return eps_equation(f, beta, dp / (p1 * 1e6), u.kappa);
}

// C of a meter at Re_D: its calibration or the standard's equation.
double C_of(const Meter& m, const Geometry& g, double Re) {
    if (!m.calibration.empty()) return calibrated_C(m.calibration, Re);
    return discharge_coefficient_equation(m.device, g.beta, Re, g.D);
}

// Same, without range checks during iterations (a calibration is clamped).
double C_trial(const Meter& m, const Geometry& g, double Re) {
    if (!m.calibration.empty()) {
        const Calibration& c = m.calibration;
        if (c.C.size() == 1) return c.C[0];
        return calibrated_C(c, std::min(std::max(Re, c.Re.front()), c.Re.back()));
    }
    return discharge_coefficient_equation(m.device, g.beta, Re, g.D);
}

void check_meter(const Meter& m, const Geometry& g) {
    if (!m.calibration.empty()) {
        check_calibration(m.calibration);
        if (!(g.beta > 0 && g.beta < 1))
            throw RangeError("beta", Quantity::None, g.beta, 0.0, 1.0, "(the bore must be smaller than the pipe)");
        return;
    }
    check_geometry(m.device, g.beta, g.D);
}

void check_Re(const Meter& m, const Geometry& g, double Re) {
    if (!m.calibration.empty()) {
        (void)calibrated_C(m.calibration, Re);  // throws outside the calibrated range
        return;
    }
    check_reynolds(m.device, g.beta, Re, g.D);
}

// Iterates x = f(x) to the last bits (|change| within 4 ulp); stops early when x
// passes `beyond` (the caller reports that). False if it does not settle.
// A cycle among the last few values (rounding in the last bits) also ends it.
template <class F>
bool fixed_point(F f, double& x, double beyond) {
    double seen[4] = {x, x, x, x};
    for (int it = 0; it < 200; ++it) {
        const double next = f(x);
        if (!std::isfinite(next)) return false;
        const double change = std::fabs(next - x);
        x = next;
        if (change <= 8.9e-16 * std::fabs(x) || x > beyond) return true;
        for (double v : seen)
            if (v == x) return true;
        seen[it % 4] = x;
    }
    return false;
}

Solution fill(const Geometry& g, const Upstream& u) {
    Solution s;
    s.beta = g.beta;
    s.d = g.d;
    s.D = g.D;
    s.rho = u.rho;
    s.mu = u.mu;
    s.kappa = u.kappa;
    s.liquid = u.liquid;
    return s;
}

}  // namespace

Family family(Device d) {
    switch (d) {
        case Device::OrificeCorner:
        case Device::OrificeFlange:
        case Device::OrificeDD2: return Family::Orifice;
        case Device::NozzleISA1932:
        case Device::NozzleLongRadius:
        case Device::NozzleVenturi: return Family::Nozzle;
        case Device::VenturiAsCast:
        case Device::VenturiMachined:
        case Device::VenturiRoughWelded: return Family::Venturi;
    }
    return Family::Orifice;
}

std::string device_name(Device d) {
    switch (d) {
        case Device::OrificeCorner: return "orifice plate with corner tappings";
        case Device::OrificeFlange: return "orifice plate with flange tappings";
        case Device::OrificeDD2: return "orifice plate with D and D/2 tappings";
        case Device::NozzleISA1932: return "ISA 1932 nozzle";
        case Device::NozzleLongRadius: return "long-radius nozzle";
        case Device::NozzleVenturi: return "venturi nozzle";
        case Device::VenturiAsCast: return "classical venturi tube with an as-cast convergent section";
        case Device::VenturiMachined: return "classical venturi tube with a machined convergent section";
        case Device::VenturiRoughWelded: return "classical venturi tube with a rough-welded convergent section";
    }
    return "";
}

std::string device_texts(Family f) {
    switch (f) {
        case Family::Orifice: return "\"corner\", \"flange\" or \"D-D/2\"";
        case Family::Nozzle: return "\"ISA 1932\", \"long radius\" or \"venturi nozzle\"";
        case Family::Venturi: return "\"as cast\", \"machined\" or \"rough welded\"";
    }
    return "";
}

Device parse_device(Family f, const std::string& text, const std::string& argname) {
    const std::string t = lower_compact(text);
    struct Word {
        const char* text;
        Device dev;
    };
    static const Word orifice[] = {{"corner", Device::OrificeCorner},  {"flange", Device::OrificeFlange},
                                   {"dd/2", Device::OrificeDD2},       {"dandd/2", Device::OrificeDD2},
                                   {"d&d/2", Device::OrificeDD2},      {"radius", Device::OrificeDD2}};
    static const Word nozzle[] = {{"isa1932", Device::NozzleISA1932},       {"isa", Device::NozzleISA1932},
                                  {"longradius", Device::NozzleLongRadius}, {"lr", Device::NozzleLongRadius},
                                  {"venturinozzle", Device::NozzleVenturi}, {"venturi", Device::NozzleVenturi}};
    static const Word venturi[] = {{"ascast", Device::VenturiAsCast},           {"cast", Device::VenturiAsCast},
                                   {"machined", Device::VenturiMachined},       {"roughwelded", Device::VenturiRoughWelded},
                                   {"welded", Device::VenturiRoughWelded}};
    auto look = [&](const auto& words) -> const Word* {
        for (const Word& w : words)
            if (t == w.text) return &w;
        return nullptr;
    };
    const Word* w = f == Family::Orifice ? look(orifice) : f == Family::Nozzle ? look(nozzle) : look(venturi);
    if (!w)
        throw Error(ErrorCode::InvalidArgument, "the argument " + argname + " must be " + device_texts(f) + ", not \"" +
                                                    text + "\"");
    return w->dev;
}

void check_calibration(const Calibration& cal) {
    if (cal.C.empty() || cal.C.size() != cal.Re.size())
        throw Error(ErrorCode::InvalidArgument,
                    "the calibration needs a discharge coefficient, or pairs of Reynolds number and coefficient");
    for (std::size_t i = 0; i < cal.C.size(); ++i) {
        // Sanity limits (common practice): the discharge coefficients of
        // differential-pressure meters lie between about 0.6 (orifice plates)
        // and 1 (nozzles, venturi tubes).
        if (!(std::isfinite(cal.C[i]) && cal.C[i] >= 0.3 && cal.C[i] <= 1.2))
            throw RangeError("C", Quantity::None, cal.C[i], 0.3, 1.2,
                             "(a discharge coefficient of the calibration, row " + std::to_string(i + 1) +
                                 ": those of differential-pressure meters lie between about 0.6 and 1)");
        if (cal.C.size() == 1) break;
        if (!finite_positive(cal.Re[i]))
            throw RangeError("Re_D", Quantity::None, cal.Re[i], 0.0, nan_v,
                             "(a Reynolds number of the calibration, row " + std::to_string(i + 1) + ")");
        if (i > 0 && !(cal.Re[i] > cal.Re[i - 1]))
            throw Error(ErrorCode::InvalidArgument, "the Reynolds numbers of the calibration must increase from row to "
                                                    "row (row " + std::to_string(i + 1) + ")");
    }
}

double calibrated_C(const Calibration& cal, double Re) {
    if (cal.C.size() == 1) return cal.C[0];
    const double lo = cal.Re.front(), hi = cal.Re.back();
    if (!(Re >= lo && Re <= hi))
        throw RangeError("Re_D", Quantity::None, Re, lo, hi, "(outside the Reynolds numbers of the calibration)");
    std::size_t k = 1;
    while (k + 1 < cal.Re.size() && Re > cal.Re[k]) ++k;
    const double x0 = std::log10(cal.Re[k - 1]), x1 = std::log10(cal.Re[k]);
    const double w = (std::log10(Re) - x0) / (x1 - x0);
    return cal.C[k - 1] + w * (cal.C[k] - cal.C[k - 1]);
}

Geometry geometry_at(const Meter& m, double T) {
    if (!finite_positive(m.d_ref)) throw RangeError("d", Quantity::Length, m.d_ref, 0.0, nan_v, "(bore diameter)");
    if (!finite_positive(m.D_ref)) throw RangeError("D", Quantity::Length, m.D_ref, 0.0, nan_v, "(pipe diameter)");
    auto check_alpha = [](const char* name, double a) {
        if (!(std::isfinite(a) && std::fabs(a) <= 1e-4))
            throw RangeError(name, Quantity::LinearExpansion, a, -1e-4, 1e-4,
                             "(a linear expansion coefficient of a metal is about 1e-5 per kelvin)");
    };
    check_alpha("alpha_d", m.alpha_d);
    check_alpha("alpha_D", m.alpha_D);
    if (!finite_positive(m.T_ref))
        throw RangeError("T_ref", Quantity::Temperature, m.T_ref, 0.0, nan_v, "(absolute temperature)");
    Geometry g;
    g.d = m.d_ref * (1.0 + m.alpha_d * (T - m.T_ref));
    g.D = m.D_ref * (1.0 + m.alpha_D * (T - m.T_ref));
    g.beta = g.d / g.D;
    return g;
}

double discharge_coefficient_equation(Device dev, double b, double Re, double D) {
    switch (dev) {
        case Device::OrificeCorner:
        case Device::OrificeFlange:
        case Device::OrificeDD2: {
            double L1 = 0, L2 = 0;
            if (dev == Device::OrificeDD2) {
                L1 = 1.0;
                L2 = 0.47;
            } else if (dev == Device::OrificeFlange) {
                L1 = L2 = inch / D;
            }
            const double A = std::pow(19000.0 * b / Re, 0.8);
            const double M2 = 2.0 * L2 / (1.0 - b);
            const double b4 = std::pow(b, 4);
            double C = 0.5961 + 0.0261 * b * b - 0.216 * b4 * b4 + 0.000521 * std::pow(1e6 * b / Re, 0.7) +
                       (0.0188 + 0.0063 * A) * std::pow(b, 3.5) * std::pow(1e6 / Re, 0.3) +
                       (0.043 + 0.080 * std::exp(-10.0 * L1) - 0.123 * std::exp(-7.0 * L1)) * (1.0 - 0.11 * A) * b4 /
                           (1.0 - b4) -
                       0.031 * (M2 - 0.8 * std::pow(M2, 1.1)) * std::pow(b, 1.3);
            if (D < 2.8 * inch) C += 0.011 * (0.75 - b) * (2.8 - D / inch);
            return C;
        }
        case Device::NozzleISA1932:
            return 0.9900 - 0.2262 * std::pow(b, 4.1) -
                   (0.00175 * b * b - 0.0033 * std::pow(b, 4.15)) * std::pow(1e6 / Re, 1.15);
        case Device::NozzleLongRadius: return 0.9965 - 0.00653 * std::sqrt(b) * std::sqrt(1e6 / Re);
        case Device::NozzleVenturi: return 0.9858 - 0.196 * std::pow(b, 4.5);
        case Device::VenturiAsCast: return 0.984;
        case Device::VenturiMachined: return 0.995;
        case Device::VenturiRoughWelded: return 0.985;
    }
    throw Error(ErrorCode::InvalidArgument, "internal: unknown flow meter");
}

void check_geometry(Device dev, double beta, double D) {
    const Limits L = limits_of(dev);
    if (!(D >= L.D_min && D <= L.D_max)) throw RangeError("D", Quantity::Length, D, L.D_min, L.D_max, L.source);
    if (!(beta >= L.beta_min && beta <= L.beta_max))
        throw RangeError("beta", Quantity::None, beta, L.beta_min, L.beta_max,
                         std::string("(d/D at the flowing temperature; ") + (L.source + 1));
    if (L.d_min > 0 && !(beta * D >= L.d_min))
        throw RangeError("d", Quantity::Length, beta * D, L.d_min, nan_v, L.source);
}

void check_reynolds(Device dev, double beta, double Re, double D) {
    double lo = 0, hi = 0;
    reynolds_limits(dev, beta, D, lo, hi);
    if (!(Re >= lo) || (!std::isnan(hi) && !(Re <= hi))) {
        std::string why = limits_of(dev).source;
        if (dev == Device::OrificeCorner || dev == Device::OrificeDD2)
            why.insert(1, beta <= 0.56 ? "Re_D at least 5000 for beta up to 0.56; "
                                       : "Re_D at least 16000 beta^2 for beta above 0.56; ");
        else if (dev == Device::OrificeFlange)
            why.insert(1, "Re_D at least 5000 and at least 170 beta^2 D/mm; ");
        else if (dev == Device::NozzleISA1932)
            why.insert(1, beta < 0.44 ? "for beta below 0.44; " : "for beta from 0.44; ");
        throw RangeError("Re_D", Quantity::None, Re, lo, hi, why);
    }
}

double discharge_coefficient(Device dev, double beta, double Re, double D) {
    if (!finite_positive(Re)) throw RangeError("Re_D", Quantity::None, Re, 0.0, nan_v, "(Reynolds number)");
    check_geometry(dev, beta, D);
    check_reynolds(dev, beta, Re, D);
    return discharge_coefficient_equation(dev, beta, Re, D);
}

double expansibility(Family f, double beta, double dp, double p1, double kappa) {
    if (!finite_positive(p1)) throw RangeError("p", Quantity::Pressure, p1, 0.0, nan_v, "(absolute pressure)");
    if (!(std::isfinite(kappa) && kappa > 1.0))
        throw RangeError("kappa", Quantity::None, kappa, 1.0, nan_v, "(isentropic exponent)");
    if (!(beta > 0 && beta < 1)) throw RangeError("beta", Quantity::None, beta, 0.0, 1.0, "(d/D)");
    if (!(std::isfinite(dp) && dp >= 0))
        throw RangeError("dp", Quantity::DifferentialPressure, dp, 0.0, nan_v, "(differential pressure)");
    if (dp > pressure_ratio_dp_max(p1))
        throw RangeError("dp", Quantity::DifferentialPressure, dp, nan_v, pressure_ratio_dp_max(p1),
                         "(ISO 5167-2/-3/-4 limit of use of the expansibility factor: p2/p1 = 1 - dp/p at least 0.75)");
    return eps_equation(f, beta, dp / (p1 * 1e6), kappa);
}

double expansibility_pT(Family f, double beta, double dp, double p1, double T1) {
    const Upstream u = upstream(p1, T1);
    if (!(beta > 0 && beta < 1)) throw RangeError("beta", Quantity::None, beta, 0.0, 1.0, "(d/D)");
    check_dp(dp, p1, u);
    return eps_of(f, beta, dp, p1, u);
}

Solution flow_from_dp(const Meter& m, double dp, double p1, double T1) {
    const Upstream u = upstream(p1, T1);
    const Geometry g = geometry_at(m, T1);
    check_meter(m, g);
    check_dp(dp, p1, u);
    Solution s = fill(g, u);
    s.dp = dp;
    s.eps = eps_of(family(m.device), g.beta, dp, p1, u);
    // q_m = K C(Re(q_m)): a fixed point with contraction |d ln C / d ln Re| (below 0.05
    // within the limits of use), iterated to the last bits.
    const double K = s.eps / std::sqrt(1.0 - std::pow(g.beta, 4)) * pi / 4.0 * g.d * g.d * std::sqrt(2.0 * dp * u.rho);
    const double Re_per_m = 4.0 / (pi * u.mu * g.D);
    double q = K * C_trial(m, g, 1e6);
    const bool done = fixed_point([&](double x) { return K * C_trial(m, g, Re_per_m * x); }, q,
                                  std::numeric_limits<double>::infinity());
    if (!done || !finite_positive(q))
        throw Error(ErrorCode::NoConvergence, "the flow iteration in the Reynolds number did not converge");
    s.Re_D = Re_per_m * q;
    check_Re(m, g, s.Re_D);
    s.C = C_of(m, g, s.Re_D);
    s.m = K * s.C;
    s.Re_D = Re_per_m * s.m;
    s.velocity = s.m / (u.rho * pi / 4.0 * g.D * g.D);
    return s;
}

Solution dp_from_flow(const Meter& m, double q_m, double p1, double T1) {
    const Upstream u = upstream(p1, T1);
    const Geometry g = geometry_at(m, T1);
    check_meter(m, g);
    if (!finite_positive(q_m)) throw RangeError("m", Quantity::MassFlow, q_m, 0.0, nan_v, "(the flow must be positive)");
    Solution s = fill(g, u);
    s.m = q_m;
    s.Re_D = 4.0 * q_m / (pi * u.mu * g.D);
    check_Re(m, g, s.Re_D);
    s.C = C_of(m, g, s.Re_D);
    const double area = pi / 4.0 * g.d * g.d;
    const double E = 1.0 / std::sqrt(1.0 - std::pow(g.beta, 4));
    auto dp_at = [&](double eps) {
        const double x = q_m / (s.C * E * eps * area);
        return x * x / (2.0 * u.rho);
    };
    double dp = dp_at(1.0);
    if (!u.liquid) {
        double eps = 1.0;
        const double beyond = 0.5 * p1 * 1e6;  // far past p2/p1 = 0.75: check_dp reports it
        const bool done = fixed_point(
            [&](double x) {
                eps = eps_equation(family(m.device), g.beta, x / (p1 * 1e6), u.kappa);
                return dp_at(eps);
            },
            dp, beyond);
        if (!done)
            throw Error(ErrorCode::NoConvergence, "the differential-pressure iteration did not converge");
    }
    check_dp(dp, p1, u);
    s.dp = dp;
    s.eps = eps_of(family(m.device), g.beta, dp, p1, u);
    s.velocity = q_m / (u.rho * pi / 4.0 * g.D * g.D);
    return s;
}

double C_uncertainty(Device dev, double b, double Re, double D) {
    switch (dev) {
        case Device::OrificeCorner:
        case Device::OrificeFlange:
        case Device::OrificeDD2: {
            // ISO 5167-2:2003 5.3.3.1: (0.7 - beta) % below 0.2, 0.5 % to 0.6, (1.667 beta - 0.5) % above;
            // added arithmetically: 0.9 (0.75 - beta)(2.8 - D/25.4 mm) % below D = 71.12 mm, and 0.2 %
            // for beta above 0.5 with Re_D below 10000.
            double u = b < 0.2 ? 0.7 - b : b <= 0.6 ? 0.5 : 1.667 * b - 0.5;
            if (D < 2.8 * inch) u += 0.9 * (0.75 - b) * (2.8 - D / inch);
            if (b > 0.5 && Re < 10000) u += 0.2;
            return u / 100.0;
        }
        case Device::NozzleISA1932: return (b <= 0.6 ? 0.8 : 2.0 * b - 0.4) / 100.0;  // ISO 5167-3:2003 5.1.6.3
        case Device::NozzleLongRadius: return 2.0 / 100.0;                            // ISO 5167-3:2003 5.2.6.3
        case Device::NozzleVenturi: return (1.2 + 1.5 * std::pow(b, 4)) / 100.0;       // ISO 5167-3:2003 6.1.6.3
        case Device::VenturiAsCast: return 0.7 / 100.0;                               // ISO 5167-4:2003 5.5.2
        case Device::VenturiMachined: return 1.0 / 100.0;                             // ISO 5167-4:2003 5.5.3
        case Device::VenturiRoughWelded: return 1.5 / 100.0;                          // ISO 5167-4:2003 5.5.4
    }
    return 0;
}

double eps_uncertainty(Device dev, double b, double dp, double p1, double kappa) {
    if (std::isnan(kappa)) return 0.0;  // water: epsilon = 1 exactly
    const double r = dp / (p1 * 1e6);
    switch (dev) {
        case Device::OrificeCorner:
        case Device::OrificeFlange:
        case Device::OrificeDD2: return 3.5 * r / kappa / 100.0;  // ISO 5167-2:2003 5.3.3.2: 3.5 dp/(kappa p1) %
        case Device::NozzleISA1932:
        case Device::NozzleLongRadius: return 2.0 * r / 100.0;    // ISO 5167-3:2003: 2 dp/p1 %
        case Device::NozzleVenturi:
        case Device::VenturiAsCast:
        case Device::VenturiMachined:
        case Device::VenturiRoughWelded:
            return (4.0 + 100.0 * std::pow(b, 8)) * r / 100.0;  // ISO 5167-3/-4:2003: (4 + 100 beta^8) dp/p1 %
    }
    return 0;
}

FlowUncertainty flow_uncertainty(const Meter& m, double dp, double p1, double T1, const FlowReadingsUncertainty& u,
                                 double patm_gauge) {
    auto check_fraction = [](const char* name, double v) {
        if (!(std::isfinite(v) && v >= 0 && v <= 0.1))
            throw RangeError(name, Quantity::None, v, 0.0, 0.1,
                             "(an uncertainty as a fraction of the reading: 0.001 for 0.1 %)");
    };
    check_fraction("u_dp", u.u_dp);
    check_fraction("u_p", u.u_p);
    check_fraction("u_d", u.u_d);
    check_fraction("u_D", u.u_D);
    if (!(std::isfinite(u.u_T) && u.u_T >= 0 && u.u_T <= 50))
        throw RangeError("u_T", Quantity::TemperatureDifference, u.u_T, 0.0, 50.0, "(temperature uncertainty)");
    if (!m.calibration.empty() && !(std::isfinite(u.u_C_cal) && u.u_C_cal >= 0 && u.u_C_cal <= 0.1))
        throw RangeError("u_C", Quantity::None, u.u_C_cal, 0.0, 0.1,
                         "(the calibration's uncertainty of C as a fraction: 0.003 for 0.3 %)");
    FlowUncertainty r;
    r.sol = flow_from_dp(m, dp, p1, T1);
    const Solution& s = r.sol;
    const Upstream up = upstream(p1, T1);
    const double b4 = std::pow(s.beta, 4);
    r.u_C = m.calibration.empty() ? C_uncertainty(m.device, s.beta, s.Re_D, s.D) : u.u_C_cal;
    r.u_eps = eps_uncertainty(m.device, s.beta, dp, p1, s.liquid ? nan_v : s.kappa);
    // Relative sensitivities of q_m (ISO 5167-1:2003 8.2.2.2), with rho1 = rho(p1, T1) by IF97 and the
    // diameters' change with T through the expansion coefficients.
    const double th_d = 2.0 / (1.0 - b4), th_D = -2.0 * b4 / (1.0 - b4);
    const double dT = T1 - m.T_ref;
    r.theta[0] = 1.0;
    r.theta[1] = 1.0;
    r.theta[2] = 0.5;
    r.theta[3] = 0.5 * up.dlnrho_dlnp;
    r.theta[4] = 0.5 * up.dlnrho_dT + th_d * m.alpha_d / (1.0 + m.alpha_d * dT) + th_D * m.alpha_D / (1.0 + m.alpha_D * dT);
    r.theta[5] = th_d;
    r.theta[6] = th_D;
    const double gauge_part = patm_gauge > 0 ? (p1 - patm_gauge) / p1 : 1.0;
    const double ux[flow_sources] = {r.u_C, r.u_eps, u.u_dp, u.u_p * std::fabs(gauge_part), u.u_T, u.u_d, u.u_D};
    double sum = 0;
    for (int i = 0; i < flow_sources; ++i) {
        r.contribution[i] = std::fabs(r.theta[i] * ux[i]);
        sum += r.contribution[i] * r.contribution[i];
    }
    r.u_rel = std::sqrt(sum);
    r.u_m = r.u_rel * s.m;
    for (int i = 0; i < flow_sources; ++i)
        r.share[i] = sum > 0 ? r.contribution[i] * r.contribution[i] / sum * 100.0 : 0.0;
    return r;
}

}  // namespace isentra::flow
