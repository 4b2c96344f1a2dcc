// SPDX-License-Identifier: MPL-2.0
// Internal: the catalogue is assembled from families defined in several
// files. Each adds its functions, in a fixed order, to the list.
#pragma once

#include <string>
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

}  // namespace isentra::catalogue::detail
