// SPDX-License-Identifier: MPL-2.0
// Internal: the catalogue is assembled from families defined in several
// files. Each adds its functions, in a fixed order, to the list.
#pragma once

#include <string>
#include <utility>
#include <vector>

#include "isentra/surface/catalogue.hpp"

namespace isentra::catalogue::detail {

// Turbine and plant-equipment functions (catalogue_equipment.cpp).
void add_equipment_family(std::vector<Function>& out);
// Flow measurement functions, ISO 5167 (catalogue_flow.cpp).
void add_flow_family(std::vector<Function>& out);
// Cycle heat-balance functions (catalogue_cycle.cpp).
void add_cycle_family(std::vector<Function>& out);

// Viscosity with the critical enhancement and the metastable-vapour family
// (catalogue_supplementary.cpp).
void add_supplementary_family(std::vector<Function>& out);

// The documentation note of a transport property ("MU", "NU", "LAMBDA",
// "ALPHA", "PR", "SIGMA"): release, section, simplification ("" otherwise).
const char* transport_note(const std::string& code);

// The optional "units" argument shared by all functions.
Arg units_arg();

// The ranges of the usual argument quantities (core units), each with its
// reasons; catalogue.cpp gives the source of each limit.
namespace ranges {
// A range from its bounds, each open or closed, each with its reason "(...)".
Range make(double lo, bool lo_open, const char* lo_why, double hi, bool hi_open, const char* hi_why);
Range absolute_pressure();           // (0, 100] MPa: IAPWS-IF97 regions 1-3 reach 100 MPa
Range temperature();                 // [273.15, 2273.15] K: IAPWS-IF97
Range enthalpy();                    // [-0.05, 7377] kJ/kg: the enthalpies IAPWS-IF97 covers
Range entropy();                     // [-0.01, 50] kJ/(kg K)
Range saturation_pressure();         // [611.657 Pa, 22.064 MPa]: triple point to critical point
Range saturation_temperature();      // [273.15 K, 647.096 K]: IAPWS-IF97's saturation line
Range quality();                     // [0, 1]
Range equilibrium_quality();         // [0, 100]: above 1 = superheated (sanity limit 100)
Range efficiency();                  // (0, 1]
Range mass_flow(bool zero_ok);       // [0 or (0, 1e5] kg/s
Range power(bool zero_ok);           // [0 or (0, 1e7] kW
Range relative_uncertainty();        // [0, 0.1]: a fraction of the reading
Range temperature_uncertainty();     // [0, 10] K
Range baumann_coefficient();         // (0, 3]: usually 1 (common practice)
// The range of a state input by its quantity: absolute_pressure, temperature,
// enthalpy or entropy (no bounds for other quantities).
Range for_quantity(Quantity q);
}  // namespace ranges

// a with range r.
Arg ranged(Arg a, Range r);

// Building blocks of the equipment families (catalogue_family.cpp).
// The optional header flag of a row function.
Arg header_arg();
// A function with one number per state; the units argument is appended.
Function number(const char* name, const char* method, const char* category, std::string summary,
                std::vector<Arg> args, Quantity result, Eval eval);
// A function with a row per state; the units argument and the header flag are appended.
Function row(const char* name, const char* method, const char* category, std::string summary,
             std::vector<Arg> args, std::vector<std::pair<const char*, Quantity>> columns, Eval eval);

}  // namespace isentra::catalogue::detail
