// SPDX-License-Identifier: MPL-2.0
// Shared by the CLI tests (test_cli.cpp, test_csv.cpp, test_table.cpp):
// reading the binary's text output back (substring, CSV fields, numbers)
// and comparing two doubles bit for bit.
#pragma once

#include <gtest/gtest.h>

#include <charconv>
#include <cstring>
#include <string>
#include <vector>

namespace isentra::clitest {

inline bool contains(const std::string& s, const std::string& p) { return s.find(p) != std::string::npos; }

// Splits a CSV line (no quotes) at `delim`.
inline std::vector<std::string> split(const std::string& line, char delim = ',') {
    std::vector<std::string> f(1);
    for (char c : line) {
        if (c == delim) f.emplace_back();
        else f.back() += c;
    }
    return f;
}

// The whole field as a number (`decimal`: the decimal separator written); anything else fails the test.
inline double parse(std::string s, char decimal = '.') {
    if (decimal != '.')
        for (char& c : s)
            if (c == decimal) c = '.';
    double v = 0;
    const auto r = std::from_chars(s.data(), s.data() + s.size(), v);
    EXPECT_TRUE(r.ec == std::errc() && r.ptr == s.data() + s.size()) << "not a number: \"" << s << "\"";
    return v;
}

// The two doubles are the same to the bit.
inline void expect_same(double a, double b, const std::string& what) {
    EXPECT_EQ(std::memcmp(&a, &b, sizeof a), 0) << what << ": " << a << " vs " << b;
}

}  // namespace isentra::clitest
