// SPDX-License-Identifier: MPL-2.0
// isentra-recalc run as a program on workbooks with known stored values, in a
// real headless LibreOffice with the built extension. The expected numbers
// come from the core through the `isentra` command line (same catalogue and
// code as the add-in): the tests check that the tool reports exactly the cells
// whose stored results differ from what the core computes.
#include <gtest/gtest.h>

#include <chrono>
#include <cmath>
#include <cstdio>
#include <cstdlib>
#include <filesystem>
#include <fstream>
#include <functional>
#include <map>
#include <regex>
#include <sstream>
#include <thread>

#include <fcntl.h>
#include <sys/stat.h>
#include <sys/wait.h>
#include <unistd.h>

#include <com/sun/star/beans/PropertyValue.hpp>
#include <com/sun/star/frame/XComponentLoader.hpp>
#include <com/sun/star/frame/XStorable.hpp>
#include <com/sun/star/lang/XMultiComponentFactory.hpp>
#include <com/sun/star/sheet/XCalculatable.hpp>
#include <com/sun/star/sheet/XSpreadsheet.hpp>
#include <com/sun/star/sheet/XSpreadsheetDocument.hpp>
#include <com/sun/star/container/XIndexAccess.hpp>
#include <com/sun/star/container/XNamed.hpp>
#include <com/sun/star/container/XNameAccess.hpp>
#include <com/sun/star/document/XEventsSupplier.hpp>
#include <com/sun/star/script/provider/XScript.hpp>
#include <com/sun/star/script/provider/XScriptProvider.hpp>
#include <com/sun/star/script/provider/XScriptProviderSupplier.hpp>
#include <com/sun/star/table/XCell.hpp>
#include <com/sun/star/text/XTextRange.hpp>

#include "office.hxx"
#include "options.hpp"
#include "stored.hpp"

namespace fs = std::filesystem;
namespace css = ::com::sun::star;
using css::uno::Reference;
using css::uno::UNO_QUERY_THROW;

namespace {

std::string read(const fs::path& p) {
    std::ifstream in(p, std::ios::binary);
    std::ostringstream s;
    s << in.rdbuf();
    return s.str();
}

struct ToolRun {
    int status = -1;
    std::string out, err;
};

// Runs the tool with `args` and extra environment `env`; waits at most 300 s.
ToolRun run_tool(const std::vector<std::string>& args, const std::vector<std::string>& env = {}) {
    const fs::path dir = fs::temp_directory_path();
    const std::string out = (dir / ("recalc-test-out-" + std::to_string(::getpid()))).string();
    const std::string err = out + ".err";
    const pid_t pid = ::fork();
    if (pid == 0) {
        const int o = ::open(out.c_str(), O_WRONLY | O_CREAT | O_TRUNC, 0644);
        const int e = ::open(err.c_str(), O_WRONLY | O_CREAT | O_TRUNC, 0644);
        ::dup2(o, 1);
        ::dup2(e, 2);
        for (const std::string& v : env) ::putenv(const_cast<char*>(v.c_str()));
        std::vector<char*> argv{const_cast<char*>(ISENTRA_RECALC_PATH)};
        for (const std::string& a : args) argv.push_back(const_cast<char*>(a.c_str()));
        argv.push_back(nullptr);
        ::execv(argv[0], argv.data());
        std::_Exit(127);
    }
    int status = 0;
    ::waitpid(pid, &status, 0);
    ToolRun r;
    r.status = WIFEXITED(status) ? WEXITSTATUS(status) : 128 + WTERMSIG(status);
    r.out = read(out);
    r.err = read(err);
    fs::remove(out);
    fs::remove(err);
    return r;
}

// The core's value of a call, through the isentra command line.
double core(const std::string& call) {
    const std::string cmd = std::string(ISENTRA_CLI_PATH) + " '" + call + "'";
    FILE* p = ::popen(cmd.c_str(), "r");
    char buf[256] = {};
    const bool ok = p && std::fgets(buf, sizeof buf, p);
    if (p) ::pclose(p);
    if (!ok) throw std::runtime_error("no output from " + cmd);
    return std::strtod(buf, nullptr);
}

// path (relative) -> content, of every file below `dir`, except below `skip`.
std::map<std::string, std::string> tree(const fs::path& dir, const std::vector<fs::path>& skip = {}) {
    std::map<std::string, std::string> t;
    for (auto it = fs::recursive_directory_iterator(dir); it != fs::recursive_directory_iterator(); ++it) {
        bool skipped = false;
        for (const fs::path& s : skip)
            if (it->path() == s) skipped = true;
        if (skipped) {
            it.disable_recursion_pending();
            continue;
        }
        if (it->is_regular_file()) t[it->path().lexically_relative(dir).string()] = read(it->path());
    }
    return t;
}

std::vector<std::vector<std::string>> csv(const fs::path& p) { return isentra::recalc::parse_csv(read(p)); }

// The number Calc stored for `cell` in sheet 1 of an .xlsx.
double xlsx_value(const fs::path& file, const std::string& cell) {
    const std::string sheet = isentra::recalc::zip_member(read(file), "xl/worksheets/sheet1.xml");
    std::smatch m;
    if (!std::regex_search(sheet, m, std::regex("<c r=\"" + cell + "\"[^>]*>(?:(?!</c>).)*<v>([^<]*)</v>")))
        throw std::runtime_error("no value for " + cell + " in " + file.string());
    return std::strtod(m[1].str().c_str(), nullptr);
}

rtl::OUString ou(const std::string& s) { return rtl::OUString::createFromAscii(s.c_str()); }

css::beans::PropertyValue prop(const char* n, const css::uno::Any& v) {
    css::beans::PropertyValue p;
    p.Name = rtl::OUString::createFromAscii(n);
    p.Value = v;
    return p;
}

css::uno::Sequence<css::beans::PropertyValue> props(std::vector<css::beans::PropertyValue> v) {
    css::uno::Sequence<css::beans::PropertyValue> s(static_cast<sal_Int32>(v.size()));
    for (std::size_t i = 0; i < v.size(); ++i) s.getArray()[i] = v[i];
    return s;
}

// The workbooks, made once: the Python generator (stored values), then an
// office of the test's own for what only Calc can write (.xls, .xlsx, an
// encrypted .ods) and for the positive check of the macro workbook.
class Fixture : public ::testing::Environment {
public:
    static fs::path dir;
    static bool control_macro_ran;
    static std::string control_binding;

    void SetUp() override {
        char pattern[] = "/tmp/isentra-recalc-test-XXXXXX";
        ASSERT_TRUE(::mkdtemp(pattern));
        dir = pattern;
        ::chmod(pattern, 0755);
        fs::create_directory(dir / "in");
        fs::create_directory(dir / "tmp");
        ::chmod((dir / "tmp").c_str(), 01777);
        const std::string cmd = std::string(ISENTRA_PYTHON3) + " " + ISENTRA_MAKE_WORKBOOKS + " " + (dir / "in").string() +
                                " " + ISENTRA_CLI_PATH;
        ASSERT_EQ(std::system(cmd.c_str()), 0) << cmd;
        fs::copy_file(ISENTRA_PLANT_TEMPLATE, dir / "in" / "plant.ots");

        isentra::office::Office office;
        auto ctx = office.context();
        Reference<css::frame::XComponentLoader> loader(
            ctx->getServiceManager()->createInstanceWithContext("com.sun.star.frame.Desktop", ctx), UNO_QUERY_THROW);
        const std::string home = office.writable_dir();
        // .xlsx and .xls with Isentra calls, written by Calc (values computed with the extension).
        {
            Reference<css::lang::XComponent> doc = office.new_calc_document();
            Reference<css::sheet::XSpreadsheet> sheet(
                Reference<css::sheet::XSpreadsheetDocument>(doc, UNO_QUERY_THROW)->getSheets()->getByName(
                    Reference<css::container::XNamed>(Reference<css::container::XIndexAccess>(
                        Reference<css::sheet::XSpreadsheetDocument>(doc, UNO_QUERY_THROW)->getSheets(), UNO_QUERY_THROW)
                        ->getByIndex(0), UNO_QUERY_THROW)->getName()),
                UNO_QUERY_THROW);
            Reference<css::container::XNamed>(sheet, UNO_QUERY_THROW)->setName("Plant");
            auto text = [&](const char* c, const char* t) {
                Reference<css::text::XTextRange>(sheet->getCellRangeByName(ou(c))->getCellByPosition(0, 0), UNO_QUERY_THROW)
                    ->setString(ou(t));
            };
            auto formula = [&](const char* c, const char* f) { sheet->getCellRangeByName(ou(c))->getCellByPosition(0, 0)->setFormula(ou(f)); };
            text("A1", "Main steam pressure (MPa)");
            formula("B1", "10");
            text("A2", "Main steam temperature (C)");
            formula("B2", "500");
            text("A3", "Main steam enthalpy");
            formula("B3", "=STEAM.H.PT(B1;B2)");
            text("A4", "Saturation temperature at 0.1 MPa");
            formula("B4", "=STEAM.TSAT(0.1)");
            text("A5", "Main steam entropy");
            formula("B5", "=STEAM.S.PT(B1;B2)*1");
            Reference<css::sheet::XCalculatable>(doc, UNO_QUERY_THROW)->calculateAll();
            Reference<css::frame::XStorable> st(doc, UNO_QUERY_THROW);
            st->storeToURL(ou("file://" + home + "/isentra.xlsx"),
                           props({prop("FilterName", css::uno::Any(ou("Calc MS Excel 2007 XML")))}));
            st->storeToURL(ou("file://" + home + "/isentra.xls"), props({prop("FilterName", css::uno::Any(ou("MS Excel 97")))}));
            isentra::office::Office::close(doc);
        }
        // An encrypted .ods.
        {
            Reference<css::lang::XComponent> doc = loader->loadComponentFromURL(
                ou("file://" + (dir / "in" / "stale.ods").string()), "_blank", 0, props({prop("Hidden", css::uno::Any(true))}));
            Reference<css::frame::XStorable>(doc, UNO_QUERY_THROW)
                ->storeToURL(ou("file://" + home + "/password.ods"),
                             props({prop("FilterName", css::uno::Any(ou("calc8"))), prop("Password", css::uno::Any(ou("harrow")))}));
            isentra::office::Office::close(doc);
        }
        for (const char* f : {"isentra.xlsx", "isentra.xls", "password.ods"}) fs::copy_file(fs::path(home) / f, dir / "in" / f);
        // Positive check: control.ods (made like macro.ods) has its open event (OnLoad) bound to
        // a document macro, and that macro writes its marker when it runs. (A hidden document's
        // events do not fire in the headless office even with MacroExecutionMode
        // ALWAYS_EXECUTE_NO_WARN, so the macro is run here through the document's script provider.)
        {
            Reference<css::lang::XComponent> doc = loader->loadComponentFromURL(
                ou("file://" + (dir / "in" / "control.ods").string()), "_blank", 0,
                props({prop("Hidden", css::uno::Any(true)), prop("MacroExecutionMode", css::uno::Any(sal_Int16(4)))}));
            css::uno::Sequence<css::beans::PropertyValue> binding;
            Reference<css::document::XEventsSupplier>(doc, UNO_QUERY_THROW)->getEvents()->getByName("OnLoad") >>= binding;
            rtl::OUString script;
            for (const auto& p : binding)
                if (p.Name == "Script") p.Value >>= script;
            control_binding = rtl::OUStringToOString(script, RTL_TEXTENCODING_UTF8).getStr();
            if (!script.isEmpty()) {
                Reference<css::script::provider::XScript> s =
                    Reference<css::script::provider::XScriptProviderSupplier>(doc, UNO_QUERY_THROW)->getScriptProvider()->getScript(script);
                css::uno::Sequence<sal_Int16> out_index;
                css::uno::Sequence<css::uno::Any> out;
                s->invoke({}, out_index, out);
            }
            control_macro_ran = fs::exists(dir / "in" / "marker" / "control-ran");
            isentra::office::Office::close(doc);
        }
    }
    void TearDown() override {
        if (!dir.empty() && !std::getenv("ISENTRA_KEEP_PROFILE")) fs::remove_all(dir);
    }
};
fs::path Fixture::dir;
bool Fixture::control_macro_ran = false;
std::string Fixture::control_binding;
const auto* const fixture = ::testing::AddGlobalTestEnvironment(new Fixture);

std::string in(const char* name) { return (Fixture::dir / "in" / name).string(); }
std::string tmp_env() { return "TMPDIR=" + (Fixture::dir / "tmp").string(); }

}  // namespace

TEST(RecalcTool, UsageAndHelp) {
    const ToolRun help = run_tool({"--help"});
    EXPECT_EQ(help.status, 0);
    EXPECT_NE(help.out.find("Exit status"), std::string::npos);
    EXPECT_EQ(run_tool({"--bogus", in("stale.ods")}).status, 64);
    const ToolRun missing = run_tool({in("no-such.ods")});
    EXPECT_EQ(missing.status, 64);
    EXPECT_NE(missing.err.find("no-such.ods"), std::string::npos) << missing.err;  // names the input
    EXPECT_EQ(run_tool({"--format", "xls", in("stale.ods")}).status, 64);
    EXPECT_EQ(run_tool({"-o", (Fixture::dir / "in").string(), in("stale.ods")}).status, 64);  // beside the originals
}

// The stale cells, and only they, with labels, old and new values.
TEST(RecalcTool, ReportsExactlyTheStaleCells) {
    const auto before = tree(Fixture::dir / "in");
    const fs::path out = Fixture::dir / "out-stale";
    const ToolRun r = run_tool({"-o", out.string(), "--format", "xlsx", in("stale.ods")}, {tmp_env()});
    ASSERT_EQ(r.status, 1) << r.out << r.err;
    EXPECT_NE(r.out.find("stale.ods: 6 changes (3 values changed, 1 new error, 1 unknown function, 1 type changed) in 10 formula cells"),
              std::string::npos) << r.out;
    // Expected: tests/recalc/make_workbooks.py writes them to stale.json (new values from the core).
    const std::string json = read(Fixture::dir / "in" / "stale.json");
    const auto rows = csv(out / "recalc-report.csv");
    ASSERT_EQ(rows.size(), 7u) << read(out / "recalc-report.csv");
    const std::vector<std::string> head{"file", "case", "sheet", "cell", "label", "change", "formula", "old", "new", "difference", "detail"};
    EXPECT_EQ(rows[0], head);
    struct Expect {
        const char* cell;
        const char* label;
        const char* change;
        double old_value;
        std::string new_value;  // a number as text, or what the cell shows
    };
    const double h = core("STEAM.H.PT(16.62;538.4)"), s = core("STEAM.S.PT(16.62;538.4)");
    const std::vector<Expect> expect{
        {"B10", "Main steam entropy", "value changed", 6.4, std::to_string(s)},
        {"B12", "Heat flow (kW)", "value changed", 500000, std::to_string(150 * h)},
        {"B15", "Mode", "type changed", 0, "high"},
        {"B16", "Per unit flow", "new error", 12.5, "#DIV/0!"},
        {"B17", "Rate from a missing add-in", "unknown function", 7, "#NAME?"},
        {"C18", "Margin", "value changed", 99, std::to_string(16.62 * 2 - 16.62)},
    };
    for (std::size_t i = 0; i < expect.size(); ++i) {
        const auto& row = rows[i + 1];
        ASSERT_EQ(row.size(), head.size());
        EXPECT_EQ(row[0], "stale.ods");
        EXPECT_EQ(row[2], "Readings");
        EXPECT_EQ(row[3], expect[i].cell);
        EXPECT_EQ(row[4], expect[i].label);
        EXPECT_EQ(row[5], expect[i].change);
        EXPECT_DOUBLE_EQ(std::strtod(row[7].c_str(), nullptr), expect[i].old_value) << row[3];
        if (expect[i].change == std::string("value changed"))
            EXPECT_NEAR(std::strtod(row[8].c_str(), nullptr), std::strtod(expect[i].new_value.c_str(), nullptr),
                        1e-12 * std::fabs(std::strtod(row[8].c_str(), nullptr)) + 1e-6)
                << row[3];
        else
            EXPECT_EQ(row[8], expect[i].new_value) << row[3];
    }
    EXPECT_NE(rows[5][10].find("org.example.notinstalled.rate"), std::string::npos) << rows[5][10];  // which name
    // The report workbook: the summary sheet first, one row per change.
    const std::string content = isentra::recalc::zip_member(read(out / "recalc-report.ods"), "content.xml");
    EXPECT_LT(content.find("table:name=\"Summary\""), content.find("table:name=\"Changes\""));
    EXPECT_NE(content.find("Main steam entropy"), std::string::npos);
    // The recalculated copy (as asked, .xlsx) holds the core's values; the original is untouched.
    EXPECT_NEAR(xlsx_value(out / "stale.xlsx", "B10"), s, 1e-13 * s);  // .xlsx keeps 15 digits
    EXPECT_EQ(tree(Fixture::dir / "in"), before);
    EXPECT_TRUE(fs::is_empty(Fixture::dir / "tmp"));  // the private profile is gone

    // Round trip: the .xlsx copy recalculates to the same values (only the missing add-in remains),
    // together with .xlsx and .xls written by Calc with Isentra calls and a template (.ots).
    const fs::path out2 = Fixture::dir / "out-round-trip";
    const ToolRun r2 = run_tool({"-o", out2.string(), (out / "stale.xlsx").string(), in("isentra.xlsx"), in("isentra.xls"),
                             in("plant.ots")},
                            {tmp_env()});
    ASSERT_EQ(r2.status, 1) << r2.out << r2.err;
    EXPECT_NE(r2.out.find("stale.xlsx: 1 change (1 unknown function)"), std::string::npos) << r2.out;
    EXPECT_NE(r2.out.find("isentra.xlsx: no changes in 3 formula cells"), std::string::npos) << r2.out;
    EXPECT_NE(r2.out.find("isentra.xls: no changes in 3 formula cells"), std::string::npos) << r2.out;
    EXPECT_NE(r2.out.find("written as .xlsx, not .xls"), std::string::npos) << r2.out;
    EXPECT_NE(r2.out.find("plant.ots: no changes"), std::string::npos) << r2.out;
    ASSERT_TRUE(fs::exists(out2 / "plant.ots"));
    // A whole package (a workbook with charts: an incomplete copy once came out of a store option).
    EXPECT_NO_THROW(isentra::recalc::zip_member(read(out2 / "plant.ots"), "content.xml"));
    EXPECT_NO_THROW(isentra::recalc::zip_member(read(out2 / "plant.ots"), "Object 1/content.xml"));
    // The .xls came out as .xlsx (beside the .xlsx input's copy) with the core's values.
    const fs::path xls_copy = out2 / "isentra-2.xlsx";
    ASSERT_TRUE(fs::exists(xls_copy)) << r2.out;
    EXPECT_NEAR(xlsx_value(xls_copy, "B3"), core("STEAM.H.PT(10;500)"), 1e-12 * 3400);
    EXPECT_NEAR(xlsx_value(xls_copy, "B4"), core("STEAM.TSAT(0.1)"), 1e-12 * 100);
    EXPECT_NEAR(xlsx_value(out2 / "isentra.xlsx", "B5"), core("STEAM.S.PT(10;500)"), 1e-12 * 10);
    EXPECT_EQ(tree(Fixture::dir / "in"), before);
}

// Macros never run; damaged, encrypted, hanging and crashing files are reported and the batch goes on.
TEST(RecalcTool, SafetyBatch) {
    EXPECT_EQ(Fixture::control_binding, "vnd.sun.star.script:Standard.Module1.WriteMarker?language=Basic&location=document");
    ASSERT_TRUE(Fixture::control_macro_ran) << "control.ods's open-event macro does not write its marker when run: "
                                               "the macro test would prove nothing";
    fs::copy_file(in("stale.ods"), in("hangs.ods"), fs::copy_options::overwrite_existing);
    fs::copy_file(in("stale.ods"), in("crashes.ods"), fs::copy_options::overwrite_existing);
    const auto before = tree(Fixture::dir / "in");
    const fs::path out = Fixture::dir / "out-safety";
    const ToolRun r = run_tool({"-o", out.string(), "--timeout", "15", in("macro.ods"), in("damaged.ods"), in("password.ods"),
                            in("hangs.ods"), in("crashes.ods"), in("stale.ods")},
                           {tmp_env(), "ISENTRA_RECALC_TEST_STALL=hangs.ods", "ISENTRA_RECALC_TEST_CRASH=crashes.ods"});
    EXPECT_EQ(r.status, 2) << r.out << r.err;
    EXPECT_NE(r.out.find("macro.ods: no changes in 1 formula cell"), std::string::npos) << r.out;
    EXPECT_NE(r.out.find("damaged.ods: FAILED: damaged"), std::string::npos) << r.out;
    EXPECT_NE(r.out.find("password.ods: FAILED: password-protected"), std::string::npos) << r.out;
    EXPECT_NE(r.out.find("hangs.ods: FAILED: time limit of 15 s exceeded"), std::string::npos) << r.out;
    EXPECT_NE(r.out.find("crashes.ods: FAILED: the office crashed"), std::string::npos) << r.out;
    EXPECT_NE(r.out.find("stale.ods: 6 changes"), std::string::npos) << r.out;  // after two restarts
    EXPECT_FALSE(fs::exists(Fixture::dir / "in" / "marker" / "macro-ran"));
    EXPECT_EQ(tree(Fixture::dir / "in"), before);  // originals unchanged, nothing written beside them
    EXPECT_TRUE(fs::is_empty(Fixture::dir / "tmp"));
    const auto summary = csv(out / "recalc-report.csv");
    EXPECT_EQ(summary.size(), 7u);  // the 6 changes of stale.ods
}

// A case table of three rows: three rows of collected results equal to the core's, with -j 2.
TEST(RecalcTool, CaseTable) {
    const fs::path table = Fixture::dir / "cases.csv";
    std::ofstream(table) << "Readings.B3,Readings.B4\n16.62,538.4\n12.5,510\n9.8,480\n";
    const fs::path out = Fixture::dir / "out-cases";
    const ToolRun r = run_tool({"-o", out.string(), "-j", "2", "--cases", table.string(), "--collect",
                            "Readings.B9,Readings.B10", "--no-copies", in("stale.ods")},
                           {tmp_env()});
    ASSERT_EQ(r.status, 1) << r.out << r.err;  // the stale cells are still reported per case
    const auto rows = csv(out / "cases.csv");
    ASSERT_EQ(rows.size(), 4u) << read(out / "cases.csv");
    EXPECT_EQ(rows[0], (std::vector<std::string>{"file", "case", "Readings.B3", "Readings.B4", "Readings.B9",
                                                 "Readings.B10", "status"}));
    const double p[] = {16.62, 12.5, 9.8}, t[] = {538.4, 510, 480};
    for (int k = 0; k < 3; ++k) {
        const auto& row = rows[static_cast<std::size_t>(k + 1)];
        ASSERT_EQ(row.size(), 7u);
        EXPECT_EQ(row[1], std::to_string(k + 1));
        const std::string args = isentra::recalc::format_number(p[k]) + ";" + isentra::recalc::format_number(t[k]);
        EXPECT_DOUBLE_EQ(std::strtod(row[4].c_str(), nullptr), core("STEAM.H.PT(" + args + ")")) << k;
        EXPECT_DOUBLE_EQ(std::strtod(row[5].c_str(), nullptr), core("STEAM.S.PT(" + args + ")")) << k;
        EXPECT_EQ(row[6], "recalculated");
    }
    EXPECT_TRUE(fs::exists(out / "cases.ods"));
    EXPECT_TRUE(fs::is_empty(Fixture::dir / "tmp"));
}

// The worked example of docs/recalc.md: the Harrow Fen Unit 3 cycle heat
// balance (built by templates/gen_cycle_workbook.py, with its case table over
// condenser pressure and the cells to collect) run once per case.
TEST(RecalcTool, CycleHeatBalanceOverCondenserPressure) {
    const fs::path t = ISENTRA_TEMPLATES_OUT;
    const fs::path book = Fixture::dir / "cycle" / "harrow-fen-unit3-cycle-heat-balance.ods";
    fs::create_directories(book.parent_path());
    fs::copy_file(t / "harrow-fen-unit3-cycle-heat-balance.ods", book, fs::copy_options::overwrite_existing);
    std::string collect = read(t / "harrow-fen-unit3-condenser-collect.txt");
    while (!collect.empty() && (collect.back() == '\n' || collect.back() == '\r')) collect.pop_back();
    const fs::path out = Fixture::dir / "out-cycle";
    const ToolRun r = run_tool({"-o", out.string(), "--no-copies", "--cases",
                                (t / "harrow-fen-unit3-condenser-cases.csv").string(), "--collect", collect,
                                book.string()},
                               {tmp_env()});
    ASSERT_LE(r.status, 1) << r.out << r.err;  // 1: results differ from the stored design results
    const auto rows = csv(out / "cases.csv");
    ASSERT_EQ(rows.size(), 6u) << read(out / "cases.csv");  // header + 5 cases
    ASSERT_EQ(rows[0].size(), 6u);
    EXPECT_EQ(rows[0][2], "Cycle.D29");  // the design column's condenser pressure
    std::vector<double> p, hr;
    double hr_9kPa_case = 0;
    for (std::size_t k = 1; k < rows.size(); ++k) {
        ASSERT_EQ(rows[k][5], "recalculated") << k;
        p.push_back(std::strtod(rows[k][2].c_str(), nullptr));
        hr.push_back(std::strtod(rows[k][3].c_str(), nullptr));
        hr_9kPa_case = std::strtod(rows[k][4].c_str(), nullptr);  // the workbook's own 9 kPa case column
    }
    for (std::size_t k = 1; k < p.size(); ++k) {
        // Common practice: a higher condenser pressure raises the heat rate.
        EXPECT_GT(hr[k], hr[k - 1]) << "p_c = " << p[k];
    }
    for (std::size_t k = 0; k < p.size(); ++k) {
        // Common practice: the design heat rate of such a cycle lies roughly between 7,600 and 8,300 kJ/kWh.
        EXPECT_GT(hr[k], 7600.0) << p[k];
        EXPECT_LT(hr[k], 8300.0) << p[k];
        // The design column set to 9 kPa computes what the workbook's own 9 kPa case column computes
        // (same formulas, same inputs).
        if (p[k] == 0.009) EXPECT_EQ(hr[k], hr_9kPa_case);
    }
    EXPECT_TRUE(fs::exists(out / "cases.ods"));
}
