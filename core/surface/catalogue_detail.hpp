// SPDX-License-Identifier: MPL-2.0
// Internal: the catalogue is assembled from families defined in several
// files. Each adds its functions, in a fixed order, to the list.
#pragma once

#include <vector>

#include "isentra/surface/catalogue.hpp"

namespace isentra::catalogue::detail {

// Turbine and plant-equipment functions (catalogue_equipment.cpp).
void add_equipment_family(std::vector<Function>& out);

// The optional "units" argument shared by all functions.
Arg units_arg();

}  // namespace isentra::catalogue::detail
