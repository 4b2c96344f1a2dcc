// SPDX-License-Identifier: MPL-2.0
// isentra-recalc: the formula results stored in an OpenDocument file (.ods,
// .ots, .fods), read from the file itself (pure C++: zlib, expat).
//
// Why not from Calc: Calc 7.4 recalculates, while loading an ODF file, every
// formula cell that has no cell style (to choose its number format), so the
// office cannot show those cells' stored results. For .xlsx/.xlsm/.xls Calc
// keeps the stored results and the tool reads them from the office.
#pragma once

#include <map>
#include <stdexcept>
#include <string>
#include <utility>

#include "model.hpp"

namespace isentra::recalc {

// sheet name -> (row, col) -> stored result of each formula cell that has one.
using StoredValues = std::map<std::string, std::map<std::pair<int, int>, Value>>;

// Throws std::runtime_error if the file is not a readable ODF spreadsheet
// (the office then reports why it cannot open it).
StoredValues read_stored_values(const std::string& path);
// The same from the text of content.xml or of a flat .fods.
StoredValues parse_stored_values(const std::string& xml);

// The content of one member of a zip archive (stored or deflated).
std::string zip_member(const std::string& archive, const std::string& name);

// Calc's error code for what an error cell shows ("#DIV/0!" -> 532, "Err:502" -> 502), 0 if unknown.
int error_code_of(const std::string& shown);

}  // namespace isentra::recalc
