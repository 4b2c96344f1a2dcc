// SPDX-License-Identifier: MPL-2.0
// Mass flow of water and steam from differential-pressure meters by ISO 5167
// (2003 editions): part 2 orifice plates (corner, flange, D and D/2 taps;
// Reader-Harris/Gallagher discharge coefficient), part 3 ISA 1932 nozzles,
// long-radius nozzles and venturi nozzles, part 4 classical venturi tubes
// (as-cast, machined and rough-welded convergent sections); and a calibrated
// device whose discharge coefficient comes from its calibration.
//
// Core units: differential pressure Pa, pressure MPa (absolute), temperature
// K, lengths m, mass flow kg/s, linear expansion coefficients 1/K.
//
// The fluid properties at the upstream tapping (p1, T1) are Isentra's own:
// density by IAPWS-IF97, viscosity by IAPWS R12-08 (industrial form), the
// isentropic exponent kappa = w^2 rho / p. Water (compressed liquid) is
// incompressible for ISO 5167: epsilon = 1 (ISO 5167-1:2003 5.3), and the
// downstream tapping pressure p1 - dp must stay above the saturation
// pressure (the water would flash). Steam and supercritical states take the
// expansibility equation of the device. A state on the saturation line
// (wet or two-phase steam) is an error: ISO 5167 applies to single-phase flow.
//
// Every limit of use of the standards (D, d, beta, Re_D, p2/p1) is a
// RangeError naming the input ("D", "d", "beta", "Re_D", "dp") so that the
// sentence is worded in the user's units. All functions are reentrant.
#pragma once

#include <string>
#include <vector>

namespace isentra::flow {

enum class Device {
    OrificeCorner,       // ISO 5167-2, corner tappings
    OrificeFlange,       // ISO 5167-2, flange tappings
    OrificeDD2,          // ISO 5167-2, D and D/2 tappings
    NozzleISA1932,       // ISO 5167-3, ISA 1932 nozzle
    NozzleLongRadius,    // ISO 5167-3, long-radius nozzle
    NozzleVenturi,       // ISO 5167-3, venturi nozzle
    VenturiAsCast,       // ISO 5167-4, classical venturi tube, as-cast convergent section
    VenturiMachined,     // ISO 5167-4, machined convergent section
    VenturiRoughWelded,  // ISO 5167-4, rough-welded sheet-iron convergent section
};

// The expansibility family of a device (orifice plates; nozzles; venturi
// tubes), which also decides the epsilon uncertainty statement.
enum class Family { Orifice, Nozzle, Venturi };
Family family(Device d);
// "orifice plate with flange tappings", ...
std::string device_name(Device d);

// Parses a device text of a family ("corner", "flange", "D-D/2" for
// orifices; "ISA 1932", "long radius", "venturi nozzle" for nozzles; "as
// cast", "machined", "rough welded" for venturi tubes). Case, spaces,
// hyphens and underscores are ignored. `argname` names the argument in the
// error sentence (InvalidArgument) that lists the accepted texts.
Device parse_device(Family f, const std::string& text, const std::string& argname);
// The accepted texts of a family, for descriptions: "\"corner\", \"flange\" or \"D-D/2\"".
std::string device_texts(Family f);

// A calibration: pairs of pipe Reynolds number and discharge coefficient,
// Re strictly increasing, interpolated linearly in log10(Re); one pair with
// any Re (or Re NaN) is a constant coefficient. Outside the calibrated
// Reynolds range: RangeError on "Re_D".
struct Calibration {
    std::vector<double> Re, C;
    bool empty() const { return C.empty(); }
};
// Checks the table (sizes, finite values, 0.3 <= C <= 1.2, Re increasing).
void check_calibration(const Calibration& cal);
double calibrated_C(const Calibration& cal, double Re_D);

// A meter. d_ref and D_ref are the bore (throat) and the pipe inside
// diameters measured at T_ref; alpha_d and alpha_D the linear expansion
// coefficients of the plate (nozzle, venturi) and pipe materials (0: the
// diameters are taken as they are at any temperature).
struct Meter {
    Device device = Device::OrificeCorner;
    double d_ref = 0, D_ref = 0;      // m
    double alpha_d = 0, alpha_D = 0;  // 1/K
    double T_ref = 293.15;            // K (20 °C, the usual reference)
    Calibration calibration;          // non-empty: replaces the standard's C (and its limits of use)
};

// Diameters at the flowing temperature T: d = d_ref (1 + alpha_d (T - T_ref)),
// likewise D (ISO 5167-1:2003 5.1.1 and the parts' 5.1.8/6.1.8: d and D at the
// flowing temperature).
struct Geometry {
    double d = 0, D = 0, beta = 0;
};
Geometry geometry_at(const Meter& m, double T);

// Discharge coefficient of a standard device from the diameter ratio, the
// pipe Reynolds number and the pipe diameter D (m), with the standard's
// limits of use for D, beta and Re_D checked (RangeError). d = beta D is
// checked too (orifice d >= 12.5 mm, venturi nozzle d >= 50 mm).
double discharge_coefficient(Device dev, double beta, double Re_D, double D);
// The same equations without any check (for iterations and tests).
double discharge_coefficient_equation(Device dev, double beta, double Re_D, double D);
// Checks the limits of use of D, d and beta (not Re_D) for a standard device.
void check_geometry(Device dev, double beta, double D);
// Checks Re_D against the device's limits (at this beta and D).
void check_reynolds(Device dev, double beta, double Re_D, double D);

// Expansibility factor of the family at the pressure ratio p2/p1 = 1 - dp/p1
// with isentropic exponent kappa (dp Pa, p1 MPa). ISO 5167-2 Eq. 5 for
// orifice plates, ISO 5167-3 Eq. 2 / ISO 5167-4 Eq. 2 for nozzles and
// venturis. p2/p1 must be at least 0.75: else RangeError on "dp".
double expansibility(Family f, double beta, double dp, double p1, double kappa);
// The same from the state (p1, T1) with Isentra's kappa; 1 for water.
double expansibility_pT(Family f, double beta, double dp, double p1, double T1);

// A solved meter reading.
struct Solution {
    double m = 0;      // kg/s
    double dp = 0;     // Pa
    double C = 0, eps = 0, Re_D = 0;
    double beta = 0, d = 0, D = 0;  // at the flowing temperature
    double rho = 0, mu = 0, kappa = 0;  // upstream: kg/m3, Pa s, isentropic exponent (unused for water)
    double velocity = 0;  // mean velocity in the pipe, m/s
    bool liquid = false;  // water: epsilon = 1
};

// Mass flow from the differential pressure dp (Pa) at the upstream state
// (p1 MPa, T1 K): q_m = C/sqrt(1 - beta^4) eps (pi/4) d^2 sqrt(2 dp rho1)
// (ISO 5167-1:2003 Eq. 1), solved for C(Re_D) by iteration to full precision.
Solution flow_from_dp(const Meter& m, double dp, double p1, double T1);
// The differential pressure for a mass flow (the inverse; epsilon depends on dp).
Solution dp_from_flow(const Meter& m, double q_m, double p1, double T1);

// ---- Uncertainty (ISO 5167-1:2003 8.2 combined by ASME PTC 19.1 sensitivities) ----

// Instrument uncertainties, all at the same coverage (95 % like the
// standards' statements for C and epsilon): differential pressure, pressure,
// d and D as fractions of their values (0.001 = 0.1 %; at most 0.1),
// temperature in K. u_C_cal: the uncertainty of a calibrated coefficient as
// a fraction (used only for a calibrated meter; NaN otherwise).
struct FlowReadingsUncertainty {
    double u_dp = 0, u_p = 0, u_T = 0, u_d = 0, u_D = 0;
    double u_C_cal = 0;
};
// Sources, in this order: C, epsilon, dp, p, T, d, D.
inline constexpr int flow_sources = 7;
struct FlowUncertainty {
    Solution sol;
    double u_m = 0;      // kg/s
    double u_rel = 0;    // fraction of the flow
    double u_C = 0;      // the standard's (or the calibration's) uncertainty of C, fraction
    double u_eps = 0;    // the standard's uncertainty of epsilon, fraction
    double theta[flow_sources] = {};         // relative sensitivities (d ln q / d ln x; per K for T)
    double contribution[flow_sources] = {};  // |theta_i u_i| as a fraction of the flow
    double share[flow_sources] = {};         // % of u_rel^2; sums to 100
};
// patm_gauge (MPa): for a gauge pressure instrument, u_p applies to the gauge
// reading p1 - patm_gauge (0: absolute reading).
FlowUncertainty flow_uncertainty(const Meter& m, double dp, double p1, double T1, const FlowReadingsUncertainty& u,
                                 double patm_gauge = 0.0);

// The standards' uncertainty statements on their own (fractions; kappa NaN:
// water, epsilon = 1 with no uncertainty).
double C_uncertainty(Device dev, double beta, double Re_D, double D);
double eps_uncertainty(Device dev, double beta, double dp, double p1, double kappa);

}  // namespace isentra::flow
