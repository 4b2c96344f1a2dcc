// SPDX-License-Identifier: MPL-2.0
// The pure parts of isentra-recalc, without an office. Expected values are
// worked out by hand from the definitions in the headers (no external source).
#include <gtest/gtest.h>

#include "model.hpp"
#include "options.hpp"
#include "report.hpp"
#include "stored.hpp"

using namespace isentra::recalc;

TEST(RecalcPure, Addresses) {
    const CellAddress a = parse_address("Heaters.C10", "t");
    EXPECT_EQ(a.sheet, "Heaters");
    EXPECT_EQ(a.col, 2);
    EXPECT_EQ(a.row, 9);
    const CellAddress b = parse_address("$'Heat rate'.$AA$3", "t");
    EXPECT_EQ(b.sheet, "Heat rate");
    EXPECT_EQ(b.col, 26);
    EXPECT_EQ(b.row, 2);
    EXPECT_EQ(b.text(), "'Heat rate'.AA3");
    EXPECT_EQ(parse_address("'It''s'.B2", "t").sheet, "It's");
    EXPECT_THROW(parse_address("C10", "--set"), UsageError);
    EXPECT_THROW(parse_address("Test.10", "--set"), UsageError);
    EXPECT_THROW(parse_address("Test.C0", "--set"), UsageError);
    EXPECT_THROW(parse_address("Test.C1x", "--set"), UsageError);
    try {
        parse_assignment("Test.C1");
        FAIL();
    } catch (const UsageError& e) {
        EXPECT_NE(std::string(e.what()).find("Test.C1"), std::string::npos);  // names the input
    }
    const Assignment s = parse_assignment("Test.B5=US");
    EXPECT_EQ(s.cell.text(), "Test.B5");
    EXPECT_EQ(s.value, "US");
}

TEST(RecalcPure, Options) {
    const Options o = parse_options({"-j2", "--set", "A.B1=3", "--abs=0.5", "--rel", "1e-6", "--format", "XLSX",
                                     "--collect", "A.C1,'B c'.D2", "--cases", "c.csv", "x.ods", "dir"});
    EXPECT_EQ(o.jobs, 2);
    EXPECT_EQ(o.sets.size(), 1u);
    EXPECT_EQ(o.tolerance.abs, 0.5);
    EXPECT_EQ(o.tolerance.rel, 1e-6);
    EXPECT_EQ(o.format, "xlsx");
    ASSERT_EQ(o.collect.size(), 2u);
    EXPECT_EQ(o.collect[1].sheet, "B c");
    EXPECT_EQ(o.inputs, (std::vector<std::string>{"x.ods", "dir"}));
    EXPECT_THROW(parse_options({"--format", "xls", "x.ods"}), UsageError);  // never .xls
    EXPECT_THROW(parse_options({"--bogus", "x.ods"}), UsageError);
    EXPECT_THROW(parse_options({}), UsageError);
    EXPECT_THROW(parse_options({"-j", "0", "x.ods"}), UsageError);
    EXPECT_THROW(parse_options({"--collect", "A.B1", "x.ods"}), UsageError);  // collect needs cases
    EXPECT_TRUE(parse_options({"--help"}).help);
}

TEST(RecalcPure, CaseTable) {
    const CaseTable t = parse_case_table("Test.C15;Test.D15\r\n16.62;538.4\n\"12,5\";510\n\n", "c.csv");
    ASSERT_EQ(t.inputs.size(), 2u);
    ASSERT_EQ(t.rows.size(), 2u);
    EXPECT_EQ(t.rows[1][0], "12,5");  // quoted: the separator inside is kept
    EXPECT_THROW(parse_case_table("Test.C15,Test.D15\n1\n", "c.csv"), UsageError);  // short row
    EXPECT_THROW(parse_case_table("Test.C15\n", "c.csv"), UsageError);              // no cases
}

TEST(RecalcPure, Compare) {
    Sheet a;
    a.name = "S";
    a.texts[{0, 0}] = "Pressure";
    a.texts[{2, 1}] = "Column head";
    auto cell = [](int c, int r, Value v, std::string f = "=X") { return FormulaCell{c, r, std::move(f), std::move(v)}; };
    a.cells = {cell(1, 0, Value::of_number(1.0)),           // B1 within tolerance
               cell(2, 0, Value::of_number(2.0)),           // C1 changes
               cell(1, 5, Value::of_number(3.0)),           // B6 becomes an error
               cell(1, 6, Value::of_error(532, "#DIV/0!")),  // B7 error goes away
               cell(1, 7, Value::of_number(4.0)),           // B8 becomes text
               cell(1, 8, Value::of_number(5.0), "=ORG.NO.SUCH(1)+SUM(1)")};  // B9 #NAME?
    Sheet b = a;
    b.cells[0].value = Value::of_number(1.0 + 1e-12);
    b.cells[1].value = Value::of_number(2.5);
    b.cells[2].value = Value::of_error(519, "#VALUE!");
    b.cells[3].value = Value::of_number(7.0);
    b.cells[4].value = Value::of_text("high");
    b.cells[5].value = Value::of_error(error_no_name, "#NAME?");
    struct Known : UnknownFunctions {
        bool unknown(const std::string& n) override { return n != "SUM"; }
    } known;
    const auto ch = compare(Snapshot{{a}}, Snapshot{{b}}, Tolerance{}, &known);
    ASSERT_EQ(ch.size(), 5u);
    EXPECT_EQ(ch[0].cell, "C1");
    EXPECT_EQ(ch[0].kind, ChangeKind::Value);
    EXPECT_EQ(ch[0].label, "Pressure");  // left in the row
    EXPECT_DOUBLE_EQ(ch[0].difference, 0.5);
    EXPECT_EQ(ch[1].kind, ChangeKind::NewError);
    EXPECT_EQ(ch[1].label, "Column head");  // above in the column (B3)
    EXPECT_EQ(ch[2].kind, ChangeKind::ErrorGone);
    EXPECT_EQ(ch[3].kind, ChangeKind::TypeChanged);
    EXPECT_EQ(ch[3].detail, "number -> text");
    EXPECT_EQ(ch[4].kind, ChangeKind::UnknownName);
    EXPECT_EQ(ch[4].detail, "unknown to Calc: ORG.NO.SUCH");
    EXPECT_TRUE(numbers_differ(1.0, 1.1, Tolerance{}));
    EXPECT_FALSE(numbers_differ(0.0, 1e-13, Tolerance{}));           // within abs 1e-12
    EXPECT_FALSE(numbers_differ(1e6, 1e6 * (1 + 1e-10), Tolerance{}));  // within rel 1e-9
    EXPECT_EQ(called_functions("=IF(A1>0;\"SUM(\";'My sheet'.B2)+org.x.Y (2)"),
              (std::vector<std::string>{"IF", "org.x.Y"}));
}

TEST(RecalcPure, Numbers) {
    EXPECT_EQ(format_number(500000), "500000");
    EXPECT_EQ(format_number(0.1), "0.1");
    EXPECT_EQ(format_number(3375.0584418464077), "3375.0584418464077");
    EXPECT_EQ(format_number(1e-20), "1e-20");
}

TEST(RecalcPure, ReportsAndZip) {
    FileResult r;
    r.name = "a.ods";
    r.formula_cells = 3;
    Change c;
    c.sheet = "S";
    c.cell = "B2";
    c.label = "Heat, \"net\"";
    c.before = Value::of_number(1);
    c.after = Value::of_number(2);
    c.difference = 1;
    r.changes = {c};
    EXPECT_EQ(summary_line(r), "a.ods: 1 change (1 value changed) in 3 formula cells");
    FileResult ok;
    ok.name = "b.ods";
    EXPECT_EQ(summary_line(ok), "b.ods: no changes in 0 formula cells");
    const std::string csv = to_csv(changes_table({r, ok}));
    EXPECT_NE(csv.find("a.ods,,S,B2,\"Heat, \"\"net\"\"\",value changed,,1,2,1,"), std::string::npos) << csv;
    const std::string ods = to_ods({summary_table({r, ok}), changes_table({r, ok})});
    EXPECT_EQ(zip_member(ods, "mimetype"), "application/vnd.oasis.opendocument.spreadsheet");
    const std::string content = zip_member(ods, "content.xml");
    EXPECT_LT(content.find("table:name=\"Summary\""), content.find("table:name=\"Changes\""));  // summary first
    // The report reads back through the ODF reader (it has no formulas: nothing stored).
    EXPECT_TRUE(parse_stored_values(content)["Changes"].empty());
}

TEST(RecalcPure, StoredValues) {
    const std::string xml =
        "<office:document-content><office:body><office:spreadsheet><table:table table:name=\"T\">"
        "<table:table-row table:number-rows-repeated=\"2\"><table:table-cell/></table:table-row>"
        "<table:table-row><table:table-cell table:number-columns-repeated=\"2\"/>"
        "<table:table-cell table:formula=\"of:=1\" office:value-type=\"float\" office:value=\"6.4\"><text:p>6.4</text:p></table:table-cell>"
        "<table:table-cell table:formula=\"of:=1/0\" office:value-type=\"string\" office:string-value=\"\" calcext:value-type=\"error\"><text:p>#DIV/0!</text:p></table:table-cell>"
        "<table:table-cell table:formula=\"of:=&quot;a&quot;\" office:value-type=\"string\"><text:p>a<text:s text:c=\"2\"/>b</text:p></table:table-cell>"
        "<table:table-cell office:value-type=\"float\" office:value=\"9\"/>"
        "</table:table-row></table:table></office:spreadsheet></office:body></office:document-content>";
    StoredValues v = parse_stored_values(xml);
    const auto& t = v["T"];
    ASSERT_EQ(t.size(), 3u);  // formula cells only
    EXPECT_EQ(t.at({2, 2}).number, 6.4);
    EXPECT_EQ(t.at({2, 3}).kind, Value::Error);
    EXPECT_EQ(t.at({2, 3}).error, 532);
    EXPECT_EQ(t.at({2, 4}).text, "a  b");
    EXPECT_EQ(error_code_of("Err:502"), 502);
    EXPECT_EQ(error_code_of("#NAME?"), 525);
}
