// SPDX-License-Identifier: MPL-2.0
// libFuzzer target: any line of text through the CLI's formula evaluator,
// the same path as a cell (parse, units, call(), core, error sentences).
// Must never crash, hang, trip a sanitizer, or print more than one line.
// Build and run with tools/fuzz (clang with -fsanitize=fuzzer,address,undefined).
#include <cstddef>
#include <cstdint>
#include <string>

#include "isentra/surface/formula.hpp"

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size) {
    std::string line(reinterpret_cast<const char*>(data), size);
    for (char& c : line)
        if (c == '\n') c = ' ';  // the CLI reads one line per call
    const std::string out = isentra::formula::format_line(isentra::formula::evaluate(line));
    if (out.find('\n') != std::string::npos) __builtin_trap();  // one output line per call
    return 0;
}
