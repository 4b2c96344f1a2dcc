// SPDX-License-Identifier: MPL-2.0
// `isentra csv`: computed columns over CSV files. Every expected value comes
// from the line-by-line mode of the same binary (the same call written with
// numbers), so the two modes are checked against each other bit for bit;
// the readings are invented demo values of Harrow Fen Power Station.
#include <gtest/gtest.h>

#include <unistd.h>

#include <charconv>
#include <cstdio>
#include <cstring>
#include <fstream>
#include <random>
#include <string>
#include <vector>

#include "cli_run.hpp"
#include "text_check.hpp"

namespace {

using namespace isentra::clitest;  // cli_run.hpp, text_check.hpp

// A temporary file name (the file is removed at the end of the test).
struct TempFile {
    std::string path;
    explicit TempFile(const std::string& content = "", bool create = true) {
        char name[] = "/tmp/isentra_csv_test_XXXXXX";
        const int fd = mkstemp(name);
        path = name;
        if (fd >= 0) {
            if (!content.empty() && write(fd, content.data(), content.size()) != static_cast<ssize_t>(content.size()))
                ADD_FAILURE() << "write failed";
            close(fd);
        }
        if (!create) std::remove(path.c_str());
    }
    ~TempFile() { std::remove(path.c_str()); }
};

// The line-by-line answers of the calls (one per element).
std::vector<std::string> line_mode(const std::vector<std::string>& calls) {
    std::string in;
    for (const std::string& c : calls) in += c + "\n";
    const Outcome r = run({}, in);
    EXPECT_EQ(r.lines.size(), calls.size());
    return r.lines;
}

// Bit-identical doubles (NaN never expected here).
}  // namespace

TEST(CliCsv, NewColumnsMatchTheLineMode) {
    const std::string input =
        "timestamp,p_ms,T_ms,p_crh,T_crh\n"
        "2026-03-02 06:00:00,16.62,538.4,4.08,333.1\n"
        "2026-03-02 06:01:00,16.58,537.9,4.07,332.8\n"
        "2026-03-02 06:02:00,16.71,539.2,4.1,333.9\n";
    const TempFile in(input);
    const Outcome r = run({"csv", in.path, "h_ms=STEAM.H.PT(p_ms; T_ms)", "eta=TURBINE.EFF.PT.PT(p_ms; T_ms; p_crh; T_crh)",
                           "s_ms=S.PH(p_ms; h_ms)"});
    EXPECT_EQ(r.status, 0) << r.err;
    ASSERT_EQ(r.lines.size(), 4u) << r.out;
    EXPECT_EQ(r.lines[0], "timestamp,p_ms,T_ms,p_crh,T_crh,h_ms,eta,s_ms");
    const std::vector<std::string> rows = split(input, '\n');
    for (std::size_t k = 1; k < 4; ++k) {
        const std::vector<std::string> in_f = split(rows[k]);
        const std::vector<std::string> f = split(r.lines[k]);
        ASSERT_EQ(f.size(), 8u) << r.lines[k];
        EXPECT_EQ(r.lines[k].substr(0, rows[k].size()), rows[k]);  // input columns byte for byte
        const std::vector<std::string> expect =
            line_mode({"H.PT(" + in_f[1] + ";" + in_f[2] + ")",
                       "TURBINE.EFF.PT.PT(" + in_f[1] + ";" + in_f[2] + ";" + in_f[3] + ";" + in_f[4] + ")"});
        expect_same(parse(f[5]), parse(expect[0]), "h_ms row " + std::to_string(k));
        expect_same(parse(f[6]), parse(expect[1]), "eta row " + std::to_string(k));
        // s from (p, h) with h exactly as computed: the chained column.
        const std::string s_expect = line_mode({"S.PH(" + in_f[1] + ";" + f[5] + ")"})[0];
        expect_same(parse(f[7]), parse(s_expect), "s_ms row " + std::to_string(k));
    }
    EXPECT_TRUE(contains(r.err, "3 rows")) << r.err;
    EXPECT_TRUE(contains(r.err, "h_ms: no errors")) << r.err;
    EXPECT_FALSE(contains(r.err, "\r")) << "a progress line on a non-terminal";
}

TEST(CliCsv, FaultyReadingsGiveEmptyResultsAndACount) {
    const std::string input =
        "time,p,T\n"
        "06:00,16.62,538.4\n"
        "06:01,Bad,538.1\n"
        "06:02,16.6,I/O Timeout\n"
        "06:03,,538.0\n"
        "06:04,16.6,   \n"
        "06:05,120,538\n"   // outside IAPWS-IF97
        "06:06,16.6,538.2\n";
    const TempFile in(input);
    const Outcome r = run({"csv", in.path, "h=H.PT(p; T)"});
    EXPECT_EQ(r.status, 0);
    ASSERT_EQ(r.lines.size(), 8u) << r.out;
    for (std::size_t k : {2u, 3u, 4u, 5u, 6u}) EXPECT_EQ(split(r.lines[k]).back(), "") << r.lines[k];
    EXPECT_NE(split(r.lines[1]).back(), "");
    EXPECT_NE(split(r.lines[7]).back(), "");
    EXPECT_TRUE(contains(r.err, "7 rows")) << r.err;
    EXPECT_TRUE(contains(r.err, "h: 5 rows with errors")) << r.err;

    // --errors: the reasons, the same sentences as the line mode gives.
    const Outcome e = run({"csv", "--errors", in.path, "h=H.PT(p; T)"});
    EXPECT_EQ(e.status, 0);
    ASSERT_EQ(e.lines.size(), 8u) << e.out;
    EXPECT_EQ(e.lines[0], "time,p,T,h,h_error");
    const std::vector<std::string> expect = line_mode(
        {"H.PT(\"Bad\"; 538.1)", "H.PT(16.6; \"I/O Timeout\")", "H.PT(; 538.0)", "H.PT(16.6; )", "H.PT(120; 538)"});
    EXPECT_EQ(e.lines[2], "06:01,Bad,538.1,,\"" + [&] {
        std::string t = expect[0].substr(7);  // without "error: "
        std::string q;
        for (char c : t) q += c == '"' ? std::string("\"\"") : std::string(1, c);
        return q;
    }() + "\"");
    EXPECT_TRUE(contains(e.lines[3], "I/O Timeout")) << e.lines[3];
    EXPECT_EQ(e.lines[4], "06:03,,538.0,," + expect[2].substr(7));
    EXPECT_TRUE(contains(e.lines[5], "the argument T is empty")) << e.lines[5];
    EXPECT_EQ(split(e.lines[6]).back(), expect[4].substr(7));
    EXPECT_TRUE(contains(e.lines[6], "p = 120 MPa")) << e.lines[6];
    EXPECT_EQ(split(e.lines[1]).back(), "");
    EXPECT_TRUE(contains(e.err, "h: 5 rows with errors")) << e.err;
}

TEST(CliCsv, DecimalCommaAndSemicolon) {
    const std::string input =
        "Zeit;p_ms;T_ms\n"
        "02.03.2026 06:00;16,62;538,4\n"
        "02.03.2026 06:01;16.62;538,4\n"   // a point is never a decimal mark here
        "02.03.2026 06:02;1,662e1;538,4\n";
    const TempFile in(input);
    const Outcome r = run({"csv", "--decimal", ",", in.path, "h=H.PT(p_ms; T_ms)"});
    EXPECT_EQ(r.status, 0) << r.err;
    ASSERT_EQ(r.lines.size(), 4u) << r.out;
    EXPECT_EQ(r.lines[0], "Zeit;p_ms;T_ms;h");
    const std::string expect = line_mode({"H.PT(16.62; 538.4)"})[0];
    const std::vector<std::string> f = split(r.lines[1], ';');
    ASSERT_EQ(f.size(), 4u);
    EXPECT_TRUE(contains(f[3], ",")) << f[3];
    EXPECT_FALSE(contains(f[3], ".")) << f[3];
    expect_same(parse(f[3], ','), parse(expect), "decimal comma");
    EXPECT_EQ(split(r.lines[2], ';').back(), "");
    expect_same(parse(split(r.lines[3], ';').back(), ','), parse(expect), "exponent with decimal comma");
    // An explicit delimiter; the delimiter and decimal mark may not clash.
    const Outcome clash = run({"csv", "--decimal", ",", "--delimiter", ",", in.path, "h=H.PT(p_ms; T_ms)"});
    EXPECT_EQ(clash.status, 2);
    EXPECT_EQ(clash.out, "");
}

TEST(CliCsv, QuotedFieldsPassThrough) {
    const std::string input =
        "\"Time stamp\",\"HP steam pressure\",\"HP steam temp\",note\n"
        "\"2026-03-02 06:00:00\",\"16.62\",538.4,\"valve 3, \"\"open\"\"\"\n"
        "\"2026-03-02 06:01:00\",16.6,538.4,\"two\nlines\"\n";
    const TempFile in(input);
    const Outcome r = run({"csv", in.path, "h=H.PT([HP steam pressure]; [HP steam temp])", "text=VERSION()"});
    EXPECT_EQ(r.status, 0) << r.err;
    const std::string expect_h1 = line_mode({"H.PT(16.62; 538.4)"})[0];
    const std::string expect_h2 = line_mode({"H.PT(16.6; 538.4)"})[0];
    ASSERT_EQ(r.lines.size(), 4u) << r.out;
    EXPECT_EQ(r.lines[0], "\"Time stamp\",\"HP steam pressure\",\"HP steam temp\",note,h,text");
    const std::string row1 = "\"2026-03-02 06:00:00\",\"16.62\",538.4,\"valve 3, \"\"open\"\"\",";
    ASSERT_EQ(r.lines[1].substr(0, row1.size()), row1);
    const std::vector<std::string> f1 = split(r.lines[1].substr(row1.size()));
    expect_same(parse(f1[0]), parse(expect_h1), "quoted number");
    EXPECT_TRUE(contains(f1[1], "Isentra")) << r.lines[1];
    EXPECT_EQ(r.lines[2], "\"2026-03-02 06:01:00\",16.6,538.4,\"two");
    const std::vector<std::string> f2 = split(r.lines[3]);
    ASSERT_EQ(f2.size(), 3u) << r.lines[3];
    EXPECT_EQ(f2[0], "lines\"");
    expect_same(parse(f2[1]), parse(expect_h2), "after a quoted line break");
}

TEST(CliCsv, UnitsForTheFileTheCallAndAColumn) {
    const std::string input = "t,p,T,p_g\n0,1450,950,1435.3\n";
    const TempFile in(input);
    const Outcome r = run({"csv", "--units", "US", in.path, "h=H.PT(p; T)", "h_si=H.PT(10; 500; \"SI\")"});
    EXPECT_EQ(r.status, 0) << r.err;
    ASSERT_EQ(r.lines.size(), 2u);
    const std::vector<std::string> f = split(r.lines[1]);
    expect_same(parse(f[4]), parse(line_mode({"H.PT(1450; 950; \"US\")"})[0]), "--units US");
    expect_same(parse(f[5]), parse(line_mode({"H.PT(10; 500)"})[0]), "the call's own units");
    // One column in its own unit (psig), the call in US: same as the cell with "US p=psig".
    const Outcome c = run({"csv", "--units", "US", "--column-unit", "p_g=psig", in.path, "h=H.PT(p_g; T)"});
    EXPECT_EQ(c.status, 0) << c.err;
    ASSERT_EQ(c.lines.size(), 2u);
    expect_same(parse(split(c.lines[1]).back()), parse(line_mode({"H.PT(1435.3; 950; \"US p=psig\")"})[0]),
                "--column-unit psig");
    // A unit of the wrong kind is refused, naming both.
    const Outcome bad = run({"csv", "--column-unit", "p=degF", in.path, "h=H.PT(p; T)"});
    EXPECT_EQ(bad.status, 2);
    EXPECT_TRUE(contains(bad.err, "degF is not a unit of pressure")) << bad.err;
}

TEST(CliCsv, OutputFileNeverOverwrites) {
    const TempFile in("p,T\n10,500\n");
    const TempFile out("", false);
    const Outcome r = run({"csv", "-o", out.path, in.path, "h=H.PT(p; T)"});
    EXPECT_EQ(r.status, 0) << r.err;
    EXPECT_EQ(r.out, "");
    const std::string written = read_file(out.path);
    EXPECT_EQ(written, "p,T,h\n10,500," + line_mode({"H.PT(10; 500)"})[0].substr(0) + "\n");
    // Again: the file exists now, nothing is written.
    const Outcome again = run({"csv", "-o", out.path, in.path, "h=S.PT(p; T)"});
    EXPECT_EQ(again.status, 1);
    EXPECT_TRUE(contains(again.err, "exists")) << again.err;
    EXPECT_EQ(read_file(out.path), written);
    // Never the input.
    const Outcome over = run({"csv", "--output", in.path, in.path, "h=H.PT(p; T)"});
    EXPECT_EQ(over.status, 1);
    EXPECT_EQ(read_file(in.path), "p,T\n10,500\n");
}

TEST(CliCsv, TabsCrLfBlankLinesAndStandardInput) {
    const Outcome r = run({"csv", "-d", "tab", "h=H.PT(p; T)"}, "p\tT\r\n10\t500\r\n\r\n3\t300\n");
    EXPECT_EQ(r.status, 0) << r.err;
    const std::string h1 = line_mode({"H.PT(10; 500)"})[0], h2 = line_mode({"H.PT(3; 300)"})[0];
    auto shortest = [](const std::string& s) {
        const double v = parse(s);
        char buf[40];
        return std::string(buf, std::to_chars(buf, buf + sizeof buf, v).ptr);
    };
    EXPECT_EQ(r.out, "p\tT\th\r\n10\t500\t" + shortest(h1) + "\r\n\r\n3\t300\t" + shortest(h2) + "\n");
    // No newline after the last row.
    const Outcome last = run({"csv", "-", "h=H.PT(p; T)"}, "p,T\n10,500");
    EXPECT_EQ(last.out, "p,T,h\n10,500," + shortest(h1) + "\n");
}

TEST(CliCsv, RowResultsConvertAndUsageErrors) {
    const TempFile in("p,T,p_kPa\n10,500,150\n");
    const Outcome r = run({"csv", in.path, "st=STATE.PT(p; T)", "pc=CONVERT(p_kPa; \"kPa\"; \"MPa\")"});
    EXPECT_EQ(r.status, 0) << r.err;
    ASSERT_EQ(r.lines.size(), 2u);
    const std::vector<std::string> head = split(r.lines[0]);
    ASSERT_GT(head.size(), 5u);
    EXPECT_EQ(head[3].substr(0, 3), "st.");
    EXPECT_EQ(head.back(), "pc");
    const std::vector<std::string> f = split(r.lines[1]);
    EXPECT_EQ(f.size(), head.size());
    const std::vector<std::string> row = [&] {
        std::vector<std::string> t(1);
        const std::string line = line_mode({"STATE.PT(10; 500)"})[0];
        for (char c : line) {
            if (c == '\t') t.emplace_back();
            else t.back() += c;
        }
        return t;
    }();
    ASSERT_EQ(row.size(), head.size() - 4);
    for (std::size_t k = 0; k < row.size(); ++k) expect_same(parse(f[3 + k]), parse(row[k]), head[3 + k]);
    expect_same(parse(f.back()), 0.15, "CONVERT 150 kPa");  // 150 kPa = 0.15 MPa (SI prefixes)

    // Usage errors: exit 2, the reason on standard error, no output.
    const Outcome unknown = run({"csv", in.path, "h=H.PT(p_ms; T)"});
    EXPECT_EQ(unknown.status, 2);
    EXPECT_TRUE(contains(unknown.err, "no column 'p_ms'") && contains(unknown.err, "p, T, p_kPa")) << unknown.err;
    EXPECT_EQ(unknown.out, "");
    const Outcome bad_call = run({"csv", in.path, "h=H.PT(p; T"});
    EXPECT_EQ(bad_call.status, 2);
    EXPECT_TRUE(contains(bad_call.err, "column h")) << bad_call.err;
    EXPECT_EQ(run({"csv", in.path}).status, 2);
    EXPECT_EQ(run({"csv", in.path, "p=H.PT(p; T)"}).status, 2);  // p is already a column
    EXPECT_EQ(run({"csv", "--bogus", in.path, "h=H.PT(p; T)"}).status, 2);
    EXPECT_EQ(run({"csv", "/nonexistent/readings.csv", "h=H.PT(p; T)"}).status, 1);
    const Outcome help = run({"csv", "--help"});
    EXPECT_EQ(help.status, 0);
    EXPECT_TRUE(contains(help.out, "--errors") && contains(help.out, "--decimal")) << help.out;
}

// A million generated rows, checked against the line mode on every 997th row.
TEST(CliCsv, MillionRowsAgreeWithTheLineMode) {
    const std::size_t n = 1000000;
    const TempFile in;
    std::vector<std::string> sample_rows;
    {
        std::ofstream f(in.path);
        f << "timestamp,p_ms,T_ms\n";
        std::mt19937_64 rng(2026);
        std::uniform_real_distribution<double> p(0.5, 20.0), T(250.0, 560.0);
        char line[96];
        for (std::size_t k = 0; k < n; ++k) {
            const int len = std::snprintf(line, sizeof line, "2026-03-%02zu %02zu:%02zu:00,%.4f,%.3f\n", 1 + k / 1440 % 28,
                                          k / 60 % 24, k % 60, p(rng), T(rng));
            f.write(line, len);
            if (k % 997 == 0) sample_rows.emplace_back(line, static_cast<std::size_t>(len - 1));
        }
    }
    const TempFile out("", false);
    const Outcome r = run({"csv", "-o", out.path, in.path, "h=H.PT(p_ms; T_ms)"});
    EXPECT_EQ(r.status, 0) << r.err;
    EXPECT_TRUE(contains(r.err, "1,000,000 rows")) << r.err;
    std::ifstream o(out.path);
    std::string line;
    std::getline(o, line);
    EXPECT_EQ(line, "timestamp,p_ms,T_ms,h");
    std::vector<std::string> calls, got;
    std::size_t count = 0, s = 0;
    while (std::getline(o, line)) {
        if (count % 997 == 0) {
            ASSERT_LT(s, sample_rows.size());
            ASSERT_EQ(line.substr(0, sample_rows[s].size()), sample_rows[s]);
            const std::vector<std::string> f = split(sample_rows[s++]);
            calls.push_back("H.PT(" + f[1] + "; " + f[2] + ")");
            got.push_back(split(line).back());
        }
        ++count;
    }
    EXPECT_EQ(count, n);
    const std::vector<std::string> expect = line_mode(calls);
    ASSERT_EQ(expect.size(), got.size());
    std::size_t errors = 0;
    for (std::size_t k = 0; k < got.size(); ++k) {
        if (expect[k].rfind("error: ", 0) == 0) {  // e.g. exactly on the saturation line
            EXPECT_EQ(got[k], "") << calls[k];
            ++errors;
            continue;
        }
        expect_same(parse(got[k]), parse(expect[k]), calls[k]);
    }
    EXPECT_LT(errors, got.size() / 100);
}

TEST(CliCsv, ByteOrderMarkShortRowsQuietAndHeaderOnly) {
    const TempFile in("\xEF\xBB\xBFp,T,note\n10,500\n10\n");
    const Outcome r = run({"csv", "-q", in.path, "h=H.PT(p; T)"});
    EXPECT_EQ(r.status, 0);
    EXPECT_EQ(r.err, "");  // --quiet: no summary
    ASSERT_EQ(r.lines.size(), 3u) << r.out;
    EXPECT_EQ(r.lines[0], "\xEF\xBB\xBFp,T,note,h");  // the mark stays, the name p is found
    // A short row gets empty fields up to the header's width: h stays under "h".
    ASSERT_EQ(split(r.lines[1]).size(), 4u) << r.lines[1];
    EXPECT_EQ(r.lines[1].rfind("10,500,,", 0), 0u) << r.lines[1];
    EXPECT_NE(split(r.lines[1])[3], "");
    EXPECT_EQ(r.lines[2], "10,,,");  // T missing: empty result in the h column
    const Outcome e = run({"csv", "--no-progress", "--errors", in.path, "h=H.PT(p; T)"});
    ASSERT_EQ(e.lines.size(), 3u);
    EXPECT_EQ(e.lines[2], "10,,,,the argument T is empty");
    EXPECT_FALSE(contains(e.err, "more fields than the header")) << e.err;
    EXPECT_TRUE(contains(e.err, "h: 1 rows with errors")) << e.err;
    const Outcome h = run({"csv", "h=H.PT(p; T)"}, "p,T\n");
    EXPECT_EQ(h.status, 0);
    EXPECT_EQ(h.out, "p,T,h\n");
    EXPECT_TRUE(contains(h.err, "0 rows")) << h.err;
}

// Random bytes from the characters that matter to a CSV reader: never a
// crash or a hang, exit 0 (rows) or 2 (no usable header); with exit 0 the
// output begins with the header and new column (cli_run checks that it
// ends with a line break), with exit 2 there is no output.
TEST(CliCsv, RandomInputsNeverCrash) {
    const char alphabet[] = {'p', 'T', '1', '5', '.', ',', ';', '"', '\n', '\r', ' ', 'e', '-', 'B'};
    std::mt19937 rng(11);
    for (int k = 0; k < 300; ++k) {
        std::string s = (k % 3 == 0) ? "" : "p,T\n";
        const int n = static_cast<int>(rng() % 60);
        for (int i = 0; i < n; ++i) s += alphabet[rng() % sizeof alphabet];
        const Outcome r = run({"csv", "-q", "h=H.PT(p; T)"}, s);
        ASSERT_TRUE(r.status == 0 || r.status == 2) << "status " << r.status << " for input: " << s;
        if (r.status == 0) {
            EXPECT_EQ(r.out.rfind("p,T", 0), 0u) << s;
        } else {
            EXPECT_EQ(r.out, "") << s;
        }
    }
}

// Ragged rows against the header: short ones are padded (also with ';' and
// CRLF, and a quoted field holding the delimiter counts as one field); long
// ones keep their extra fields and are counted on standard error.
TEST(CliCsv, RaggedRowsKeepTheNewColumnsUnderTheirNames) {
    const double hv = parse(line_mode({"H.PT(10; 500)"})[0]);
    char buf[40];
    const std::string h(buf, std::to_chars(buf, buf + sizeof buf, hv).ptr);  // the shortest form, as csv writes
    const Outcome r = run({"csv", "--no-progress", "--errors", "h=H.PT(p; T)"},
                          "p,T,tag,note\r\n10,500\r\n10,500,\"a,b\"\r\n10,500,x,y,z\r\n10,500,x,y,z\r\n");
    EXPECT_EQ(r.status, 0);
    EXPECT_EQ(r.out, "p,T,tag,note,h,h_error\r\n"
                     "10,500,,," + h + ",\r\n"
                     "10,500,\"a,b\",," + h + ",\r\n"
                     "10,500,x,y,z," + h + ",\r\n"
                     "10,500,x,y,z," + h + ",\r\n");
    EXPECT_TRUE(contains(r.err, "2 rows have more fields than the header (the first: data row 3)")) << r.err;
    const Outcome s = run({"csv", "-q", "--decimal", ",", "h=H.PT(p; T)"}, "p;T;note\n10;500\n");
    EXPECT_EQ(s.out, "p;T;note;h\n10;500;;" + std::string(h).replace(h.find('.'), 1, ",") + "\n");
    EXPECT_EQ(s.err, "");
}

// --column-unit takes a column name as the header has it or in square
// brackets, as a call writes it (also with '=' inside the brackets).
TEST(CliCsv, ColumnUnitNamesInSquareBrackets) {
    const std::string in = "HP steam pressure,HP T,a=b\n1450,950,1\n";
    const Outcome plain = run({"csv", "-q", "--column-unit", "HP steam pressure=psia", "--column-unit", "HP T=degF",
                               "h=H.PT([HP steam pressure]; [HP T])"},
                              in);
    const Outcome brackets = run({"csv", "-q", "--column-unit", "[HP steam pressure]=psia", "--column-unit",
                                  "[HP T]=degF", "h=H.PT([HP steam pressure]; [HP T])"},
                                 in);
    EXPECT_EQ(plain.status, 0) << plain.err;
    EXPECT_EQ(brackets.status, 0) << brackets.err;
    EXPECT_EQ(brackets.out, plain.out);
    ASSERT_EQ(plain.lines.size(), 2u);
    // The same state in US units, converted: H.PT(1450 psia; 950 degF) in Btu/lbm times 2.326 (exact).
    const double us = parse(line_mode({"H.PT(1450; 950; \"US\")"})[0]);
    EXPECT_NEAR(parse(split(plain.lines[1]).back()), us * 2.326, 1e-9 * us * 2.326);
    const Outcome eq = run({"csv", "-q", "--column-unit", "[a=b]=kPa", "t=TSAT([a=b])"}, in);
    EXPECT_EQ(eq.status, 0) << eq.err;
    ASSERT_EQ(eq.lines.size(), 2u);
    EXPECT_EQ(parse(split(eq.lines[1]).back()), parse(line_mode({"TSAT(1; \"KPA\")"})[0]));
    EXPECT_EQ(run({"csv", "-q", "--column-unit", "[nothere]=kPa", "t=TSAT([a=b])"}, in).status, 2);
}

TEST(CliCsv, InputOptionForAnyFileName) {
    const TempFile dir_probe;  // a unique prefix
    const std::string odd = dir_probe.path + "_h=H.PT(p).csv";
    {
        std::ofstream f(odd);
        f << "p,T\n10,500\n";
    }
    const Outcome r = run({"csv", "--input", odd, "h=H.PT(p; T)"});
    EXPECT_EQ(r.status, 0) << r.err;
    ASSERT_EQ(r.lines.size(), 2u) << r.out;
    EXPECT_EQ(r.lines[0], "p,T,h");
    EXPECT_EQ(run({"csv", "-i", odd, "-i", odd, "h=H.PT(p; T)"}).status, 2);
    std::remove(odd.c_str());
}
