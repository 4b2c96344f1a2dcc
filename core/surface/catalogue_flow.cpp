// SPDX-License-Identifier: MPL-2.0
// Flow measurement functions of the catalogue: mass flow from
// differential-pressure meters by ISO 5167. The numerics are in flow.cpp.
//
// Naming: STEAM.FLOW.<RESULT>.<DEVICE>, the device being ORIFICE (ISO 5167-2),
// NOZZLE (5167-3), VENTURI (classical venturi tube, 5167-4) or CALIBRATED (a
// device with its own calibration); the mass flow itself is plain
// STEAM.FLOW.<DEVICE>. The kind of device within its part of the standard
// (tappings, nozzle type, convergent section) is a text argument. Results:
// DP (differential pressure for a flow), C (discharge coefficient), EPS
// (expansibility factor), UNC (uncertainty of the flow), and the rows
// SOLUTION (the solved reading) and BUDGET (the uncertainty budget). Method
// names are the same words in camelCase. Names and methods are frozen once
// released.
#include <limits>
#include <string>
#include <utility>

#include "catalogue_detail.hpp"
#include "isentra/base/error.hpp"
#include "isentra/engineering/flow.hpp"
#include "isentra/units/units.hpp"

namespace isentra::catalogue::detail {

namespace {

namespace fl = isentra::flow;

const char* const cat_flow = "Steam flow measurement";

struct DeviceSpec {
    const char* code;    // ORIFICE, NOZZLE, VENTURI
    const char* method;  // Orifice, ...
    fl::Family family;
    const char* type_arg;   // name of the text argument
    const char* type_desc;  // its description
    const char* words;      // "an orifice plate (ISO 5167-2)"
    const char* more;       // a sentence on the method
};

const DeviceSpec devices[] = {
    {"ORIFICE", "Orifice", fl::Family::Orifice, "taps",
     "Tappings: \"corner\", \"flange\" or \"D-D/2\" (D and D/2 tappings)", "an orifice plate (ISO 5167-2)",
     " Orifice plates by ISO 5167-2:2003 with the Reader-Harris/Gallagher discharge coefficient."},
    {"NOZZLE", "Nozzle", fl::Family::Nozzle, "type",
     "Nozzle: \"ISA 1932\", \"long radius\" or \"venturi nozzle\"", "a flow nozzle (ISO 5167-3)",
     " ISA 1932, long-radius and venturi nozzles by ISO 5167-3:2003."},
    {"VENTURI", "Venturi", fl::Family::Venturi, "convergent",
     "Convergent section: \"as cast\", \"machined\" or \"rough welded\"", "a venturi tube (ISO 5167-4)",
     " Classical venturi tubes by ISO 5167-4:2003 (as-cast, machined or rough-welded convergent section)."},
};

// The shared builders (catalogue_family.cpp) with the flow category; the
// device type and calibration table reach the numerics through eval_extra.
Function make(const std::string& name, const std::string& method, std::string summary, std::vector<Arg> args,
              Quantity result, EvalExtra eval) {
    Function f = number(name.c_str(), method.c_str(), cat_flow, std::move(summary), std::move(args), result, Eval{});
    f.eval_extra = std::move(eval);
    return f;
}

Function make_row(const std::string& name, const std::string& method, std::string summary, std::vector<Arg> args,
                  std::vector<std::pair<const char*, Quantity>> columns, EvalExtra eval) {
    Function f = row(name.c_str(), method.c_str(), cat_flow, std::move(summary), std::move(args), std::move(columns),
                     Eval{});
    f.eval_extra = std::move(eval);
    return f;
}

// ---- Arguments ----------------------------------------------------------------------------

// Ranges of the flow arguments (core units), checked by call() before the
// numerics; the standards' own limits of use (D, d, beta, Re_D, p2/p1) are
// checked in flow.cpp, where they depend on the device.
Range bounds(double lo, bool lo_open, const char* lo_why, double hi, bool hi_open, const char* hi_why) {
    return ranges::make(lo, lo_open, lo_why, hi, hi_open, hi_why);
}
Range dp_range() {
    return bounds(0.0, true, "(the differential pressure across a meter is above 0)", 1e8, false,
                  "(a sanity limit of 100 MPa, far above any meter's: check the units)");
}
Range diameter_range() {
    return bounds(0.0, true, "(a diameter is above 0)", 10.0, false,
                  "(a sanity limit of 10 m: check the units, e.g. mm given as m)");
}
Range expansion_range() {
    return bounds(-1e-4, false, "(a linear expansion coefficient of a metal is about 1e-5 per kelvin)", 1e-4, false,
                  "(a linear expansion coefficient of a metal is about 1e-5 per kelvin)");
}
Range fraction_range() {
    return bounds(0.0, false, "(an uncertainty cannot be negative)", 0.1, false,
                  "(an uncertainty as a fraction, e.g. 0.001 for 0.1 %, at most 0.1)");
}
Range beta_range() {
    return bounds(0.0, true, "(beta = d/D lies between 0 and 1)", 1.0, true, "(beta = d/D lies between 0 and 1)");
}
Range reynolds_range() {
    return bounds(0.0, true, "(a Reynolds number is above 0)", 1e10, false,
                  "(a sanity limit far above any pipe flow's Reynolds number)");
}

Arg dp_arg() {
    return ranged(Arg{"dp", Quantity::DifferentialPressure,
                      "Differential pressure across the meter (US: inches of water at 60 degF)"},
                  dp_range());
}
Arg m_arg() { return ranged(Arg{"m", Quantity::MassFlow, "Mass flow through the meter"}, ranges::mass_flow(false)); }
Arg p_arg() {
    return Arg{"p", Quantity::Pressure,
               "Static pressure at the upstream tapping (absolute unless a gauge unit)"};
}
Arg T_arg() {
    return Arg{"T", Quantity::Temperature,
               "Upstream temperature (subcooled water or superheated steam)"};
}
Arg d_arg() {
    return ranged(Arg{"d", Quantity::Length, "Bore (throat) diameter measured at T_ref (as is when alpha_d is 0)"},
                  diameter_range());
}
Arg D_arg() {
    return ranged(Arg{"D", Quantity::Length, "Pipe inside diameter measured at T_ref (as is when alpha_D is 0)"},
                  diameter_range());
}
std::vector<Arg> expansion_args() {
    return {ranged(Arg{"alpha_d", Quantity::LinearExpansion,
                       "Optional expansion coefficient of the bore's metal, e.g. 16.5e-6 1/K (stainless); default 0",
                       true, false, 0.0},
                   expansion_range()),
            ranged(Arg{"alpha_D", Quantity::LinearExpansion,
                       "Optional expansion coefficient of the pipe, e.g. 12e-6 1/K (carbon steel); default 0", true,
                       false, 0.0},
                   expansion_range()),
            Arg{"T_ref", Quantity::Temperature,
                "Optional temperature at which d and D were measured; default 20 degC", true, false, 293.15}};
}
std::vector<Arg> uncertainty_args() {
    return {ranged(Arg{"u_dp", Quantity::None, "Uncertainty of dp as a fraction of the reading (0.0025 for 0.25 %)"},
                   fraction_range()),
            ranged(Arg{"u_p", Quantity::None, "Uncertainty of p as a fraction of the (gauge, under a gauge unit) reading"},
                   fraction_range()),
            ranged(Arg{"u_T", Quantity::TemperatureDifference, "Uncertainty of T"}, ranges::temperature_uncertainty()),
            ranged(Arg{"u_d", Quantity::None, "Uncertainty of d as a fraction (0.0005 for 0.05 %)"}, fraction_range()),
            ranged(Arg{"u_D", Quantity::None, "Uncertainty of D as a fraction (0.004 for 0.4 %)"}, fraction_range())};
}

std::vector<Arg> cat(std::vector<Arg> a, const std::vector<Arg>& b) {
    a.insert(a.end(), b.begin(), b.end());
    return a;
}

// Numeric arguments of the flow functions, in order: dp (or m), p, T, d, D,
// [u_C], [u_dp, u_p, u_T, u_d, u_D], alpha_d, alpha_D, T_ref.
fl::Meter meter_of(fl::Device dev, const double* a, std::size_t expansion_at) {
    fl::Meter m;
    m.device = dev;
    m.d_ref = a[3];
    m.D_ref = a[4];
    m.alpha_d = a[expansion_at];
    m.alpha_D = a[expansion_at + 1];
    m.T_ref = a[expansion_at + 2];
    return m;
}

// The calibration argument: one value (a constant C) or two columns (or two rows) of Re_D and C.
fl::Calibration calibration_of(const NumberTable& t) {
    fl::Calibration c;
    auto bad = []() {
        return Error(ErrorCode::InvalidArgument,
                     "the argument C must be a discharge coefficient or a range of two columns: Reynolds numbers "
                     "Re_D and their coefficients C");
    };
    if (t.rows * t.cols == 1) {
        if (t.v[0] != t.v[0]) throw Error(ErrorCode::InvalidArgument, "the argument C is empty");
        c.C = {t.v[0]};
        c.Re = {std::nan("")};
        return c;
    }
    const bool columns = t.cols == 2, rows = !columns && t.rows == 2;
    if (!columns && !rows) throw bad();
    const std::size_t n = columns ? t.rows : t.cols;
    for (std::size_t i = 0; i < n; ++i) {
        const double re = columns ? t.v[i * 2] : t.v[i];
        const double C = columns ? t.v[i * 2 + 1] : t.v[t.cols + i];
        if (re != re && C != C) continue;  // a blank row of the range
        if (re != re || C != C)
            throw Error(ErrorCode::InvalidArgument,
                        "the calibration range has an empty cell in pair " + std::to_string(i + 1));
        c.Re.push_back(re);
        c.C.push_back(C);
    }
    if (c.C.empty()) throw Error(ErrorCode::InvalidArgument, "the calibration range is empty");
    if (c.C.size() == 1) throw Error(ErrorCode::InvalidArgument,
                                     "a calibration needs at least two pairs of Re_D and C (or give C alone)");
    return c;
}

fl::Device calibrated_kind(const std::string& text) {
    std::string t;
    for (char ch : text)
        if (ch != ' ' && ch != '-' && ch != '_') t += static_cast<char>(ch >= 'A' && ch <= 'Z' ? ch - 'A' + 'a' : ch);
    if (t == "orifice" || t == "orificeplate") return fl::Device::OrificeCorner;
    if (t == "nozzle" || t == "isa1932" || t == "longradius") return fl::Device::NozzleISA1932;
    if (t == "venturi" || t == "venturinozzle" || t == "venturitube") return fl::Device::NozzleVenturi;
    throw Error(ErrorCode::InvalidArgument,
                "the argument kind must be \"orifice\", \"nozzle\" (ISA 1932 or long radius) or \"venturi\" "
                "(venturi nozzle or tube), not \"" + text + "\"");
}

double gauge_patm(const units::UnitSpec& spec) {
    return spec.is_gauge(Quantity::Pressure) ? spec.patm_MPa() : 0.0;
}

const std::vector<std::pair<const char*, Quantity>> solution_columns = {
    {"m", Quantity::MassFlow},   {"C", Quantity::None},    {"eps", Quantity::None},
    {"Re_D", Quantity::None},    {"beta", Quantity::None}, {"d", Quantity::Length},
    {"D", Quantity::Length},     {"rho", Quantity::Density}, {"mu", Quantity::DynamicViscosity},
    {"kappa", Quantity::None},   {"velocity", Quantity::Speed}};

const std::vector<std::pair<const char*, Quantity>> budget_columns = {
    {"m", Quantity::MassFlow},          {"u_m", Quantity::MassFlow},       {"u_rel", Quantity::Percent},
    {"c_C", Quantity::Percent},         {"c_eps", Quantity::Percent},      {"c_dp", Quantity::Percent},
    {"c_p", Quantity::Percent},         {"c_T", Quantity::Percent},        {"c_d", Quantity::Percent},
    {"c_D", Quantity::Percent},         {"share_C", Quantity::Percent},    {"share_eps", Quantity::Percent},
    {"share_dp", Quantity::Percent},    {"share_p", Quantity::Percent},    {"share_T", Quantity::Percent},
    {"share_d", Quantity::Percent},     {"share_D", Quantity::Percent}};

void put_solution(const fl::Solution& s, double* o) {
    o[0] = s.m;
    o[1] = s.C;
    o[2] = s.eps;
    o[3] = s.Re_D;
    o[4] = s.beta;
    o[5] = s.d;
    o[6] = s.D;
    o[7] = s.rho;
    o[8] = s.mu;
    o[9] = s.kappa;
    o[10] = s.velocity;
}

void put_budget(const fl::FlowUncertainty& r, double* o) {
    o[0] = r.sol.m;
    o[1] = r.u_m;
    o[2] = r.u_rel * 100.0;
    for (int i = 0; i < fl::flow_sources; ++i) {
        o[3 + i] = r.contribution[i] * 100.0;
        o[10 + i] = r.share[i];
    }
}

const std::string props_text =
    " Density by IAPWS-IF97, viscosity by IAPWS R12-08 (industrial form) and the isentropic exponent kappa = "
    "w^2 rho/p at the upstream (p, T); water is incompressible (epsilon = 1) and must not flash at p - dp; a "
    "state on the saturation line (wet steam) is an error.";
const std::string limits_text =
    " The standard's limits of use (D, d, beta = d/D and Re_D, at the flowing temperature; p2/p1 at least 0.75) "
    "are errors that name the limit.";
const std::string budget_text =
    " The uncertainties of C and epsilon are the standard's own statements; with the instrument uncertainties "
    "they are combined as the root-sum-square of sensitivity times uncertainty (ASME PTC 19.1; sensitivities of "
    "ISO 5167-1:2003 8.2, density from IAPWS-IF97 derivatives). The standard's statements are at 95 % "
    "confidence: give the instrument uncertainties at 95 % too.";
const std::string row_hint = " Enter as an array formula; with header = 1 the first row holds the names and units.";

void add_device(std::vector<Function>& out, const DeviceSpec& ds) {
    const std::string code = ds.code, meth = ds.method;
    const fl::Family fam = ds.family;
    const std::string tname = ds.type_arg;
    const Arg type{ds.type_arg, Quantity::Text, ds.type_desc};
    auto dev_of = [fam, tname](const Extra& x) { return fl::parse_device(fam, x.texts.at(0), tname); };

    out.push_back(make("STEAM.FLOW." + code, "flow" + meth,
                       "Mass flow of water or steam through " + std::string(ds.words) +
                           " from its differential pressure." + ds.more +
                           " q_m = C/sqrt(1 - beta^4) eps (pi/4) d^2 sqrt(2 dp rho) (ISO 5167-1), solved by "
                           "iteration in the Reynolds number." +
                           props_text + limits_text,
                       cat({dp_arg(), p_arg(), T_arg(), d_arg(), D_arg(), type}, expansion_args()),
                       Quantity::MassFlow, [dev_of](const double* a, double* o, const units::UnitSpec&, const Extra& x) {
                           o[0] = fl::flow_from_dp(meter_of(dev_of(x), a, 5), a[0], a[1], a[2]).m;
                       }));
    out.push_back(make("STEAM.FLOW.DP." + code, "flowDp" + meth,
                       "Differential pressure of " + std::string(ds.words) + " at a given mass flow." +
                           " The inverse of STEAM.FLOW." + code + ", e.g. to choose or check a transmitter range." +
                           ds.more + props_text + limits_text,
                       cat({m_arg(), p_arg(), T_arg(), d_arg(), D_arg(), type}, expansion_args()),
                       Quantity::DifferentialPressure,
                       [dev_of](const double* a, double* o, const units::UnitSpec&, const Extra& x) {
                           o[0] = fl::dp_from_flow(meter_of(dev_of(x), a, 5), a[0], a[1], a[2]).dp;
                       }));
    out.push_back(make_row(
        "STEAM.FLOW.SOLUTION." + code, "flowSolution" + meth,
        "The solved reading of " + std::string(ds.words) + " as a row: m, C, eps, Re_D, beta, d, D, rho, mu, "
            "kappa, velocity." +
            " Mass flow, discharge coefficient C, expansibility eps, pipe Reynolds number Re_D, beta, d and D at the "
            "flowing temperature, upstream density, viscosity, isentropic exponent and mean pipe velocity." +
            ds.more + props_text + row_hint,
        cat({dp_arg(), p_arg(), T_arg(), d_arg(), D_arg(), type}, expansion_args()), solution_columns,
        [dev_of](const double* a, double* o, const units::UnitSpec&, const Extra& x) {
            put_solution(fl::flow_from_dp(meter_of(dev_of(x), a, 5), a[0], a[1], a[2]), o);
        }));
    out.push_back(make(
        "STEAM.FLOW.C." + code, "flowC" + meth,
        "Discharge coefficient C of " + std::string(ds.words) + " from beta, Re_D and D." +
            " From the diameter ratio beta = d/D, the pipe Reynolds number Re_D and the pipe diameter D, with the "
            "standard's limits of use checked." + ds.more,
        {ranged(Arg{"beta", Quantity::None, "Diameter ratio d/D at the flowing temperature"}, beta_range()),
         ranged(Arg{"Re_D", Quantity::None, "Pipe Reynolds number 4 m/(pi mu D)"}, reynolds_range()),
         ranged(Arg{"D", Quantity::Length, "Pipe inside diameter at the flowing temperature"}, diameter_range()),
         type},
        Quantity::None, [dev_of](const double* a, double* o, const units::UnitSpec&, const Extra& x) {
            o[0] = fl::discharge_coefficient(dev_of(x), a[0], a[1], a[2]);
        }));
    const std::string eps_eq = fam == fl::Family::Orifice
                                   ? " eps = 1 - (0.351 + 0.256 beta^4 + 0.93 beta^8)(1 - (p2/p1)^(1/kappa)) "
                                     "(ISO 5167-2:2003 Eq. 5)."
                                   : " eps from the isentropic expansion equation of ISO 5167-3:2003 and "
                                     "5167-4:2003 (the same for nozzles, venturi nozzles and venturi tubes).";
    out.push_back(make("STEAM.FLOW.EPS." + code, "flowEps" + meth,
                       "Expansibility factor eps of " + std::string(ds.words) + " at dp and the upstream p, T." +
                           " With Isentra's isentropic exponent at the upstream (p, T); 1 for water." + eps_eq +
                           " p2/p1 = 1 - dp/p must be at least 0.75.",
                       {dp_arg(), p_arg(), T_arg(), ranged(Arg{"beta", Quantity::None, "Diameter ratio d/D"}, beta_range())},
                       Quantity::None, [fam](const double* a, double* o, const units::UnitSpec&, const Extra&) {
                           o[0] = fl::expansibility_pT(fam, a[3], a[0], a[1], a[2]);
                       }));
    out.push_back(make("STEAM.FLOW.UNC." + code, "flowUnc" + meth,
                       "Uncertainty of the mass flow through " + std::string(ds.words) + "." +
                           " The flow as STEAM.FLOW." + code + ", the uncertainty in mass-flow units." + budget_text,
                       cat(cat({dp_arg(), p_arg(), T_arg(), d_arg(), D_arg(), type}, uncertainty_args()),
                           expansion_args()),
                       Quantity::MassFlow,
                       [dev_of](const double* a, double* o, const units::UnitSpec& spec, const Extra& x) {
                           const fl::FlowReadingsUncertainty u{a[5], a[6], a[7], a[8], a[9], 0.0};
                           o[0] = fl::flow_uncertainty(meter_of(dev_of(x), a, 10), a[0], a[1], a[2], u,
                                                       gauge_patm(spec))
                                      .u_m;
                       }));
    out.push_back(make_row(
        "STEAM.FLOW.BUDGET." + code, "flowBudget" + meth,
        "Uncertainty budget of the flow through " + std::string(ds.words) + " as a row." +
            std::string(" Flow, its uncertainty, the uncertainty in % of the flow, each source's contribution "
                        "|theta_i u_i| in % of the flow (C, eps, dp, p, T, d, D) and its share of the total in % "
                        "(the shares add up to 100).") +
            budget_text + row_hint,
        cat(cat({dp_arg(), p_arg(), T_arg(), d_arg(), D_arg(), type}, uncertainty_args()), expansion_args()),
        budget_columns, [dev_of](const double* a, double* o, const units::UnitSpec& spec, const Extra& x) {
            const fl::FlowReadingsUncertainty u{a[5], a[6], a[7], a[8], a[9], 0.0};
            put_budget(fl::flow_uncertainty(meter_of(dev_of(x), a, 10), a[0], a[1], a[2], u, gauge_patm(spec)), o);
        }));
}

void add_calibrated(std::vector<Function>& out) {
    const Arg C{"C", Quantity::None,
                "A discharge coefficient, or a 2-column range of Re_D (increasing) and C, interpolated in log Re_D",
                false, false, std::nan(""), true};
    const Arg kind{"kind", Quantity::Text,
                   "For the expansibility: \"orifice\", \"nozzle\" or \"venturi\" (venturi nozzle or tube)"};
    const Arg u_C = ranged(Arg{"u_C", Quantity::None,
                               "Uncertainty of the calibrated C as a fraction, from its certificate (0.003 for 0.3 %)"},
                           fraction_range());
    const std::string when =
        " Use it for a calibrated flow section (the usual test-grade nozzle or orifice of an acceptance test) or "
        "a device outside the standard's geometry: the calibration then replaces the standard's discharge "
        "coefficient and its limits of use; the expansibility factor of the standard still applies.";
    auto meter = [](const double* a, const Extra& x, std::size_t expansion_at) {
        fl::Meter m = meter_of(calibrated_kind(x.texts.at(0)), a, expansion_at);
        m.calibration = calibration_of(x.tables.at(0));
        return m;
    };
    out.push_back(make("STEAM.FLOW.CALIBRATED", "flowCalibrated",
                       "Mass flow from dp; use it instead of the ISO 5167 coefficient when the meter has a calibration." +
                           std::string(" With the calibration's discharge coefficient: q_m = C/sqrt(1 - beta^4) eps "
                                       "(pi/4) d^2 sqrt(2 dp rho), solved by iteration in Re_D.") +
                           when + props_text,
                       cat({dp_arg(), p_arg(), T_arg(), d_arg(), D_arg(), C, kind}, expansion_args()),
                       Quantity::MassFlow, [meter](const double* a, double* o, const units::UnitSpec&, const Extra& x) {
                           o[0] = fl::flow_from_dp(meter(a, x, 5), a[0], a[1], a[2]).m;
                       }));
    out.push_back(make("STEAM.FLOW.DP.CALIBRATED", "flowDpCalibrated",
                       "Differential pressure at a given flow; use it when the meter has its own calibration." +
                           std::string(" The inverse of STEAM.FLOW.CALIBRATED.") + when,
                       cat({m_arg(), p_arg(), T_arg(), d_arg(), D_arg(), C, kind}, expansion_args()),
                       Quantity::DifferentialPressure,
                       [meter](const double* a, double* o, const units::UnitSpec&, const Extra& x) {
                           o[0] = fl::dp_from_flow(meter(a, x, 5), a[0], a[1], a[2]).dp;
                       }));
    out.push_back(make_row("STEAM.FLOW.SOLUTION.CALIBRATED", "flowSolutionCalibrated",
                           "The solved reading of a calibrated meter as a row (as STEAM.FLOW.SOLUTION.ORIFICE)." +
                               when + row_hint,
                           cat({dp_arg(), p_arg(), T_arg(), d_arg(), D_arg(), C, kind}, expansion_args()),
                           solution_columns,
                           [meter](const double* a, double* o, const units::UnitSpec&, const Extra& x) {
                               put_solution(fl::flow_from_dp(meter(a, x, 5), a[0], a[1], a[2]), o);
                           }));
    out.push_back(make("STEAM.FLOW.UNC.CALIBRATED", "flowUncCalibrated",
                       "Uncertainty of the mass flow through a meter with its own calibration." +
                           std::string(" In mass-flow units, with the calibration's uncertainty of C.") + when +
                           budget_text,
                       cat(cat({dp_arg(), p_arg(), T_arg(), d_arg(), D_arg(), C, kind, u_C}, uncertainty_args()),
                           expansion_args()),
                       Quantity::MassFlow,
                       [meter](const double* a, double* o, const units::UnitSpec& spec, const Extra& x) {
                           const fl::FlowReadingsUncertainty u{a[6], a[7], a[8], a[9], a[10], a[5]};
                           o[0] = fl::flow_uncertainty(meter(a, x, 11), a[0], a[1], a[2], u, gauge_patm(spec)).u_m;
                       }));
    out.push_back(make_row(
        "STEAM.FLOW.BUDGET.CALIBRATED", "flowBudgetCalibrated",
        "Uncertainty budget of the flow through a calibrated meter as a row." +
            std::string(" As STEAM.FLOW.BUDGET.ORIFICE, with the calibration's uncertainty of C.") + when +
            budget_text + row_hint,
        cat(cat({dp_arg(), p_arg(), T_arg(), d_arg(), D_arg(), C, kind, u_C}, uncertainty_args()), expansion_args()),
        budget_columns, [meter](const double* a, double* o, const units::UnitSpec& spec, const Extra& x) {
            const fl::FlowReadingsUncertainty u{a[6], a[7], a[8], a[9], a[10], a[5]};
            put_budget(fl::flow_uncertainty(meter(a, x, 11), a[0], a[1], a[2], u, gauge_patm(spec)), o);
        }));
}

}  // namespace

void add_flow_family(std::vector<Function>& out) {
    for (const DeviceSpec& ds : devices) add_device(out, ds);
    add_calibrated(out);
}

}  // namespace isentra::catalogue::detail
