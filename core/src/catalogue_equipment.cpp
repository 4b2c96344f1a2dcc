// SPDX-License-Identifier: MPL-2.0
// Turbine and plant-equipment functions of the catalogue.
#include "catalogue_detail.hpp"

namespace isentra::catalogue::detail {

void add_equipment_family(std::vector<Function>&) {}

}  // namespace isentra::catalogue::detail
