// SPDX-License-Identifier: MPL-2.0
// Building blocks shared by the equipment families of the catalogue
// (catalogue_equipment.cpp, catalogue_cycle.cpp): a number or a row per
// state, with the units argument (and the header flag) appended.
#include "catalogue_detail.hpp"

#include <string>
#include <utility>
#include <vector>

namespace isentra::catalogue::detail {

Arg header_arg() {
    return Arg{"header", Quantity::None,
               "Optional: 1 (or TRUE) puts a row of names and units above the values; default 0", true};
}

Function number(const char* name, const char* method, const char* category, std::string summary,
                std::vector<Arg> args, Quantity result, Eval eval) {
    Function f;
    f.name = name;
    f.method = method;
    f.category = category;
    f.summary = std::move(summary);
    f.args = std::move(args);
    f.args.push_back(units_arg());
    f.result = result;
    f.kind = ResultKind::Number;
    f.eval = std::move(eval);
    return f;
}

Function row(const char* name, const char* method, const char* category, std::string summary,
             std::vector<Arg> args, std::vector<std::pair<const char*, Quantity>> columns, Eval eval) {
    Function f;
    f.name = name;
    f.method = method;
    f.category = category;
    f.summary = std::move(summary);
    f.args = std::move(args);
    f.args.push_back(units_arg());
    f.args.push_back(header_arg());
    f.kind = ResultKind::Row;
    for (const auto& c : columns) {
        f.row_names.emplace_back(c.first);
        f.row_quantities.push_back(c.second);
    }
    f.eval = std::move(eval);
    return f;
}

}  // namespace isentra::catalogue::detail
