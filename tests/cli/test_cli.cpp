// SPDX-License-Identifier: MPL-2.0
// Runs the built `isentra` binary: calls as arguments and on standard input,
// exactly one output line per call, 17 significant digits, error lines,
// --list, --help, --version and exit codes.
#include <gtest/gtest.h>

#include <poll.h>
#include <sys/wait.h>
#include <unistd.h>

#include <cmath>
#include <cstdio>
#include <cstdlib>
#include <fstream>
#include <set>
#include <sstream>
#include <string>
#include <vector>

#include "isentra/surface/catalogue.hpp"
#include "isentra/units/units.hpp"
#include "cli_run.hpp"
#include "text_check.hpp"

namespace {

using isentra::clitest::Outcome;
using isentra::clitest::contains;
using isentra::clitest::run;

bool starts_with(const std::string& s, const std::string& p) { return s.rfind(p, 0) == 0; }

// Significant digits of a number printed with %.17g (trailing zeros are not printed).
int significant_digits(const std::string& s) {
    std::string mant = s.substr(0, s.find_first_of("eE"));
    std::string d;
    for (char c : mant)
        if (c >= '0' && c <= '9') d += c;
    const auto first = d.find_first_not_of('0');
    return first == std::string::npos ? 0 : static_cast<int>(d.size() - first);
}

double number(const std::string& s) {
    char* end = nullptr;
    const double v = std::strtod(s.c_str(), &end);
    EXPECT_TRUE(end && *end == '\0' && !s.empty()) << "not a number: \"" << s << "\"";
    return v;
}

std::vector<std::string> fields(const std::string& line) {
    std::vector<std::string> f(1);
    for (char c : line) {
        if (c == '\t') f.emplace_back();
        else f.back() += c;
    }
    return f;
}

}  // namespace

TEST(CliCall, ArgumentPrintsTheValue) {
    // h(3 MPa, 300 K) = 0.115331273e3 kJ/kg: IAPWS R7-97(2012) Table 5.
    const Outcome r = run({"STEAM.H.PT(3;300;\"K\")"});
    EXPECT_EQ(r.status, 0);
    ASSERT_EQ(r.lines.size(), 1u) << r.out;
    EXPECT_NEAR(number(r.lines[0]), 115.331273, 5e-7);
    EXPECT_EQ(significant_digits(r.lines[0]), 17) << r.lines[0];
    EXPECT_EQ(r.err, "");
}

TEST(CliCall, SeveralArgumentsOneLineEach) {
    const Outcome r = run({"H.PT(3;300;\"K\")", "H.PT(200;500)", "nonsense", "VERSION()"});
    EXPECT_EQ(r.status, 0);
    ASSERT_EQ(r.lines.size(), 4u) << r.out;
    EXPECT_NEAR(number(r.lines[0]), 115.331273, 5e-7);  // IAPWS R7-97(2012) Table 5
    EXPECT_TRUE(starts_with(r.lines[1], "error: ")) << r.lines[1];
    EXPECT_TRUE(starts_with(r.lines[2], "error: ")) << r.lines[2];
    EXPECT_EQ(r.lines[3], std::string("Isentra ") + isentra::catalogue::version());
}

TEST(CliStdin, ExactlyOneLinePerInputLine) {
    // Each line: the call, and what its output line must be.
    const std::vector<std::string> script = {
        "STEAM.H.PT(3;300;\"K\")",          // 0: IAPWS R7-97(2012) Table 5: 0.115331273e3 kJ/kg
        "h.pt(80, 300, \"K\")",             // 1: IAPWS R7-97(2012) Table 5: 0.184142828e3 kJ/kg
        "H.PT(3; 26.85)",                   // 2: the same state as line 0 in SI (degC)
        "PSAT(300;\"K\")",                  // 3: IAPWS R7-97(2012) Table 35: 0.353658941e-2 MPa
        "H.PT(200; 500)",                   // 4: out of range
        "H.PT(3; 300",                      // 5: parse error
        "FOO(1)",                           // 6: unknown function
        "",                                 // 7: blank line -> blank line
        "   ",                              // 8: blank line -> blank line
        "H.PT(3;)",                         // 9: empty argument
        "STEAM.VERSION()",                  // 10: text
        "STATE.PT(3; 300)",                 // 11: a row: 13 tab-separated fields
        "H.PT({3;80};{300;300};\"K\")",     // 12: a range: 2 fields
        "H.PT(3;300;\"K\")\r",              // 13: CRLF line end
        "\"unterminated",                   // 14
        "STEAM.EXPLAIN(\"H.PT\"; 200; 500)",  // 15: text explaining the error
        "H.PT(3 MPa; 300)",                 // 16: parse error with a hint
        std::string("H.PT(3;\0;300)", 13),  // 17: a NUL byte
        "TSAT(0.1;\"K\")",                  // 18: last line without a newline (see below)
    };
    std::string input;
    for (std::size_t k = 0; k < script.size(); ++k) input += script[k] + (k + 1 < script.size() ? "\n" : "");
    const Outcome r = run({}, input);
    EXPECT_EQ(r.status, 0);
    EXPECT_EQ(r.err, "");
    ASSERT_EQ(r.lines.size(), script.size()) << r.out;
    const auto& L = r.lines;
    EXPECT_NEAR(number(L[0]), 115.331273, 5e-7);
    EXPECT_NEAR(number(L[1]), 184.142828, 5e-7);
    EXPECT_NEAR(number(L[2]), 115.331273, 5e-7);
    EXPECT_NEAR(number(L[3]), 0.353658941e-2, 5e-12);
    for (int k : {0, 1, 2, 3}) EXPECT_EQ(significant_digits(L[k]), 17) << L[k];
    EXPECT_TRUE(starts_with(L[4], "error: ") && contains(L[4], "200 MPa")) << L[4];
    EXPECT_EQ(L[5], "error: at column 12: the call ends before its closing ')'");
    EXPECT_EQ(L[6], "error: at column 1: there is no function \"FOO\"");
    EXPECT_EQ(L[7], "");
    EXPECT_EQ(L[8], "");
    EXPECT_EQ(L[9], "error: the argument T is empty");
    EXPECT_EQ(L[10], std::string("Isentra ") + isentra::catalogue::version());
    const auto row = fields(L[11]);
    ASSERT_EQ(row.size(), 13u) << L[11];
    for (const auto& f : row) EXPECT_FALSE(starts_with(f, "error")) << f;
    EXPECT_EQ(number(row[0]), 3.0);  // p as given
    const auto range = fields(L[12]);
    ASSERT_EQ(range.size(), 2u) << L[12];
    EXPECT_NEAR(number(range[0]), 115.331273, 5e-7);  // IAPWS R7-97(2012) Table 5
    EXPECT_NEAR(number(range[1]), 184.142828, 5e-7);  // IAPWS R7-97(2012) Table 5
    EXPECT_EQ(L[13], L[0]);
    EXPECT_TRUE(starts_with(L[14], "error: at column 1: ")) << L[14];
    EXPECT_FALSE(starts_with(L[15], "error")) << L[15];
    EXPECT_TRUE(contains(L[15], "200 MPa")) << L[15];
    EXPECT_TRUE(starts_with(L[16], "error: at column 8: ")) << L[16];
    EXPECT_TRUE(starts_with(L[17], "error: at column 8: ")) << L[17];
    // Tsat(0.1 MPa) = 0.372755919e3 K: IAPWS R7-97(2012) Table 36.
    EXPECT_NEAR(number(L[18]), 372.755919, 5e-7);
}

TEST(CliStdin, ManyLinesNeverStop) {
    std::string input;
    const int n = 600;
    for (int k = 0; k < n; ++k) {
        switch (k % 4) {
            case 0: input += "H.PT(" + std::to_string(1 + k % 50) + "; 300; \"K\")\n"; break;
            case 1: input += "H.PT(" + std::to_string(k) + "; )\n"; break;
            case 2: input += "}{ garbage " + std::to_string(k) + "\n"; break;
            case 3: input += "T.PH(10; " + std::to_string(100 * k) + ")\n"; break;
        }
    }
    const Outcome r = run({}, input);
    EXPECT_EQ(r.status, 0);
    ASSERT_EQ(r.lines.size(), static_cast<std::size_t>(n));
    for (int k = 0; k < n; k += 4) EXPECT_FALSE(starts_with(r.lines[k], "error")) << k << ": " << r.lines[k];
    for (int k = 1; k < n; k += 4) EXPECT_TRUE(starts_with(r.lines[k], "error: ")) << k << ": " << r.lines[k];
    for (int k = 2; k < n; k += 4) EXPECT_TRUE(starts_with(r.lines[k], "error: at column 1")) << r.lines[k];
}

TEST(CliStdin, ByteOrderMarkAndEmptyInput) {
    const Outcome r = run({}, "\xEF\xBB\xBFPSAT(300;\"K\")\n");
    ASSERT_EQ(r.lines.size(), 1u) << r.out;
    EXPECT_NEAR(number(r.lines[0]), 0.353658941e-2, 5e-12);  // IAPWS R7-97(2012) Table 35
    const Outcome e = run({}, "");
    EXPECT_EQ(e.status, 0);
    EXPECT_EQ(e.out, "");
}

TEST(CliStdin, UsUnits) {
    // h(3 MPa, 300 K) = 115.331273 kJ/kg (IAPWS R7-97(2012) Table 5); in US units with the exact factors of
    // NIST SP 811: 3 MPa = 3e6/6894.757293168361 psia, 300 K = 80.33 degF, 1 Btu/lbm = 2.326 kJ/kg.
    char call[128];
    std::snprintf(call, sizeof call, "H.PT(%.17g; 80.33; \"US\")", 3e6 / 6894.757293168361);
    const Outcome r = run({}, std::string(call) + "\n");
    ASSERT_EQ(r.lines.size(), 1u);
    EXPECT_NEAR(number(r.lines[0]), 115.331273 / 2.326, 5e-7 / 2.326);
    EXPECT_EQ(significant_digits(r.lines[0]), 17) << r.lines[0];
}

TEST(CliOptions, ListHasOneLinePerFunction) {
    const Outcome r = run({"--list"}, "H.PT(3;300)\n");  // standard input is not read
    EXPECT_EQ(r.status, 0);
    const auto& fs = isentra::catalogue::functions();
    ASSERT_EQ(r.lines.size(), fs.size());
    std::set<std::string> names;
    for (std::size_t k = 0; k < fs.size(); ++k) {
        EXPECT_TRUE(starts_with(r.lines[k], fs[k].name + "(")) << r.lines[k];
        const auto f = fields(r.lines[k]);
        ASSERT_EQ(f.size(), 2u) << r.lines[k];
        EXPECT_GT(f[1].size(), 10u) << r.lines[k];
        names.insert(fs[k].name);
    }
    EXPECT_EQ(names.size(), fs.size());
    bool found = false;
    for (const auto& l : r.lines) found = found || starts_with(l, "STEAM.H.PT(p; T; [units])\t");
    EXPECT_TRUE(found);
}

TEST(CliOptions, UnitsListsEveryUnitOnce) {
    const Outcome r = run({"--units"}, "H.PT(3;300)\n");  // standard input is not read
    EXPECT_EQ(r.status, 0);
    const auto& us = isentra::units::known_units();
    ASSERT_EQ(r.lines.size(), us.size());
    for (std::size_t k = 0; k < us.size(); ++k) {
        const auto f = fields(r.lines[k]);
        ASSERT_EQ(f.size(), 3u) << r.lines[k];
        EXPECT_EQ(f[0], std::string(isentra::units::quantity_name(us[k].quantity)));
        EXPECT_EQ(f[1], us[k].symbol);
        EXPECT_EQ(f[2], us[k].description);
    }
    // every symbol listed is accepted by STEAM.CONVERT (converted to itself)
    std::string calls;
    for (const auto& u : us) calls += "STEAM.CONVERT(2.5; \"" + u.symbol + "\"; \"" + u.symbol + "\")\n";
    const Outcome c = run({}, calls);
    ASSERT_EQ(c.lines.size(), us.size());
    for (std::size_t k = 0; k < us.size(); ++k) EXPECT_NEAR(number(c.lines[k]), 2.5, 1e-12) << us[k].symbol;
}

TEST(CliOptions, Help) {
    for (const char* opt : {"--help", "-h"}) {
        const Outcome r = run({opt});
        EXPECT_EQ(r.status, 0);
        EXPECT_TRUE(starts_with(r.out, "Usage: isentra")) << r.out;
        for (const char* part : {"--list", "--version", "error: ", "%.17g", "{1; 2; 3}", "US", "STEAM.H.PT"})
            EXPECT_TRUE(contains(r.out, part)) << part;
        for (const auto& f : isentra::catalogue::functions())
            EXPECT_TRUE(contains(r.out, f.category)) << f.category;
        EXPECT_TRUE(contains(r.out, "Functions (" + std::to_string(isentra::catalogue::functions().size())));
    }
}

TEST(CliOptions, HelpExamplesWork) {
    // Every example call in --help evaluates; the EXPLAIN example explains an error.
    const Outcome r = run({"STEAM.H.PT(10; 500)", "H.PT(1450, 950, \"US\")", "STEAM.TSAT(0.101325)",
                       "STEAM.EXPLAIN(\"H.PT\"; 200; 500)"});
    ASSERT_EQ(r.lines.size(), 4u);
    for (const auto& l : r.lines) EXPECT_FALSE(starts_with(l, "error")) << l;
    const Outcome h = run({"--help"});
    for (const char* ex : {"'STEAM.H.PT(10; 500)'", "'H.PT(1450, 950, \"US\")'", "'STEAM.TSAT(0.101325)'",
                           "'STEAM.EXPLAIN(\"H.PT\"; 200; 500)'"})
        EXPECT_TRUE(contains(h.out, ex)) << ex;
}

TEST(CliOptions, Version) {
    const Outcome r = run({"--version"});
    EXPECT_EQ(r.status, 0);
    ASSERT_EQ(r.lines.size(), 1u);
    EXPECT_EQ(r.lines[0], std::string("isentra ") + isentra::catalogue::version());
}

TEST(CliOptions, UsageErrorsExitWithTwo) {
    for (const char* opt : {"--bogus", "-x", "--LIST"}) {
        const Outcome r = run({"H.PT(3;300)", opt});
        EXPECT_EQ(r.status, 2) << opt;
        EXPECT_EQ(r.out, "") << opt;  // nothing is evaluated when the command line is wrong
        EXPECT_TRUE(contains(r.err, opt)) << r.err;
        EXPECT_TRUE(contains(r.err, "--help")) << r.err;
    }
    const Outcome d = run({"--", "-x"});  // after --, a call (a bad one): exit 0
    EXPECT_EQ(d.status, 0);
    ASSERT_EQ(d.lines.size(), 1u);
    EXPECT_TRUE(starts_with(d.lines[0], "error: ")) << d.lines[0];
}

TEST(CliOptions, BadCallsExitWithZero) {
    const Outcome r = run({"H.PT(", "NOPE()", "H.PT(300;300)"});
    EXPECT_EQ(r.status, 0);
    ASSERT_EQ(r.lines.size(), 3u);
    for (const auto& l : r.lines) EXPECT_TRUE(starts_with(l, "error: ")) << l;
}

// As a co-process: the answer to each line comes before the next line is sent.
TEST(CliStdin, AnswersEachLineBeforeWaiting) {
    int to_child[2], from_child[2];
    ASSERT_EQ(pipe(to_child), 0);
    ASSERT_EQ(pipe(from_child), 0);
    const pid_t pid = fork();
    ASSERT_GE(pid, 0);
    if (pid == 0) {
        dup2(to_child[0], 0);
        dup2(from_child[1], 1);
        close(to_child[1]);
        close(from_child[0]);
        execl(ISENTRA_CLI_PATH, ISENTRA_CLI_PATH, static_cast<char*>(nullptr));
        _exit(127);
    }
    close(to_child[0]);
    close(from_child[1]);
    auto read_line = [&]() {
        std::string line;
        for (;;) {
            pollfd pfd{from_child[0], POLLIN, 0};
            if (poll(&pfd, 1, 10000) <= 0) return std::string("(no answer within 10 s)");
            char c;
            if (read(from_child[0], &c, 1) != 1) return line + "(end)";
            if (c == '\n') return line;
            line += c;
        }
    };
    const std::string q1 = "TSAT(0.1; \"K\")\n", q2 = "nonsense\n";
    ASSERT_EQ(write(to_child[1], q1.data(), q1.size()), static_cast<ssize_t>(q1.size()));
    EXPECT_NEAR(number(read_line()), 372.755919, 5e-7);  // Tsat(0.1 MPa) = 372.755919 K: IAPWS R7-97(2012) Table 35
    ASSERT_EQ(write(to_child[1], q2.data(), q2.size()), static_cast<ssize_t>(q2.size()));
    EXPECT_EQ(read_line().substr(0, 7), "error: ");
    close(to_child[1]);
    int st = 0;
    waitpid(pid, &st, 0);
    close(from_child[0]);
    EXPECT_TRUE(WIFEXITED(st) && WEXITSTATUS(st) == 0);
}
