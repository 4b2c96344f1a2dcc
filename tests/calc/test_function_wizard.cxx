// SPDX-License-Identifier: MPL-2.0
// The add-in object as Calc sees it: service names and the Function Wizard
// texts (XAddIn), for every catalogue function; the argument metadata Calc
// builds from the generated IDL (required vs optional), read back through
// Calc's own function description API; how Calc hands each kind of value to a
// required (sequence<sequence<any>>) argument.
#include <cmath>
#include <map>
#include <string>

#include <com/sun/star/beans/PropertyValue.hpp>
#include <com/sun/star/container/XIndexAccess.hpp>
#include <com/sun/star/lang/XMultiComponentFactory.hpp>
#include <com/sun/star/lang/XServiceInfo.hpp>
#include <com/sun/star/lang/XServiceName.hpp>
#include <com/sun/star/sheet/FunctionArgument.hpp>
#include <com/sun/star/sheet/XAddIn.hpp>

#include "isentra/surface/catalogue.hpp"
#include "calc_test.hxx"
#include "wizard_text.hpp"

namespace isentra::calctest {
namespace {

namespace css = ::com::sun::star;
using css::uno::Reference;
using css::uno::UNO_QUERY_THROW;
using rtl::OUString;

OUString ou(const std::string& s) { return OUString(s.data(), static_cast<sal_Int32>(s.size()), RTL_TEXTENCODING_UTF8); }
std::string str(const OUString& s) { return rtl::OUStringToOString(s, RTL_TEXTENCODING_UTF8).getStr(); }

TEST(FunctionWizard, ServiceAndTextsComeFromTheCatalogue) {
    try {
        Office& office = Office::get();
        const auto& ctx = office.context();
        Reference<css::uno::XInterface> obj =
            ctx->getServiceManager()->createInstanceWithContext("org.isentra.SteamFunctions", ctx);
        ASSERT_TRUE(obj.is()) << "the service org.isentra.SteamFunctions is not registered";
        Reference<css::lang::XServiceInfo> info(obj, UNO_QUERY_THROW);
        EXPECT_EQ(str(info->getImplementationName()), "org.isentra.SteamFunctions.impl");
        EXPECT_TRUE(info->supportsService("com.sun.star.sheet.AddIn"));
        EXPECT_TRUE(info->supportsService("org.isentra.SteamFunctions"));
        EXPECT_EQ(str(Reference<css::lang::XServiceName>(obj, UNO_QUERY_THROW)->getServiceName()),
                  "org.isentra.SteamFunctions");

        Reference<css::sheet::XAddIn> addin(obj, UNO_QUERY_THROW);
        for (const catalogue::Function& f : catalogue::functions()) {
            const OUString m = ou(f.method);
            EXPECT_EQ(str(addin->getDisplayFunctionName(m)), f.name);
            EXPECT_EQ(str(addin->getProgrammaticFuntionName(ou(f.name))), f.method);
            EXPECT_EQ(str(addin->getFunctionDescription(m)), wizard::function_text(f));
            EXPECT_EQ(str(addin->getProgrammaticCategoryName(m)), "Add-In");
            EXPECT_EQ(str(addin->getDisplayCategoryName(m)), f.category);
            for (std::size_t i = 0; i < f.args.size(); ++i) {
                EXPECT_EQ(str(addin->getDisplayArgumentName(m, static_cast<sal_Int32>(i))), f.args[i].name);
                EXPECT_EQ(str(addin->getArgumentDescription(m, static_cast<sal_Int32>(i))), wizard::arg_text(f, i));
            }
            EXPECT_EQ(str(addin->getDisplayArgumentName(m, static_cast<sal_Int32>(f.args.size()))), "");
        }
        EXPECT_EQ(str(addin->getDisplayFunctionName("noSuchMethod")), "");
    } catch (const css::uno::Exception& e) {
        FAIL() << str(e.Message);
    } catch (const std::exception& e) {
        FAIL() << e.what();
    }
}

// Calc's own list of functions (com.sun.star.sheet.FunctionDescriptions, what
// the Function Wizard shows): every Isentra function with its description and
// its arguments, required ones not optional, optional ones (units, header,
// defaults) and variable lists optional.
TEST(FunctionWizard, CalcMarksExactlyTheOptionalArgumentsOptional) {
    try {
        Office& office = Office::get();
        const auto& ctx = office.context();
        Reference<css::container::XIndexAccess> list(
            ctx->getServiceManager()->createInstanceWithContext("com.sun.star.sheet.FunctionDescriptions", ctx),
            UNO_QUERY_THROW);
        std::map<std::string, css::uno::Sequence<css::beans::PropertyValue>> by_name;
        for (sal_Int32 k = 0; k < list->getCount(); ++k) {
            css::uno::Sequence<css::beans::PropertyValue> props;
            list->getByIndex(k) >>= props;
            for (const auto& p : props)
                if (p.Name == "Name") {
                    OUString n;
                    p.Value >>= n;
                    by_name[str(n)] = props;
                }
        }
        std::size_t required = 0, optional = 0;
        for (const catalogue::Function& f : catalogue::functions()) {
            const auto it = by_name.find(f.name);
            ASSERT_NE(it, by_name.end()) << f.name << " is not in Calc's function list";
            css::uno::Sequence<css::sheet::FunctionArgument> args;
            OUString description;
            for (const auto& p : it->second) {
                if (p.Name == "Arguments") p.Value >>= args;
                if (p.Name == "Description") p.Value >>= description;
            }
            EXPECT_EQ(str(description), wizard::function_text(f)) << f.name;
            ASSERT_EQ(static_cast<std::size_t>(args.getLength()), f.args.size()) << f.name;
            for (std::size_t i = 0; i < f.args.size(); ++i) {
                const css::sheet::FunctionArgument& a = args[static_cast<sal_Int32>(i)];
                const bool expect_optional = f.args[i].optional || f.args[i].varargs;
                EXPECT_EQ(static_cast<bool>(a.IsOptional), expect_optional) << f.name << " argument " << f.args[i].name;
                EXPECT_EQ(str(a.Name), f.args[i].name) << f.name;
                EXPECT_EQ(str(a.Description), wizard::arg_text(f, i)) << f.name << " argument " << f.args[i].name;
                (expect_optional ? optional : required) += 1;
            }
        }
        // The catalogue has both kinds (a test that compared nothing would pass too).
        EXPECT_GT(required, 300u);
        EXPECT_GT(optional, 190u);
    } catch (const css::uno::Exception& e) {
        FAIL() << str(e.Message);
    }
}

using CallTest = CalcTest;

// h(1 MPa, 0 degC) = 0.9758164571240161 kJ/kg and h(1 MPa, 300 degC) =
// 3051.703185584021 kJ/kg: python3-iapws 1.5.2 (Debian), IAPWS97(P=1, T=273.15).h
// and IAPWS97(P=1, T=573.15).h.
constexpr double h_1MPa_0C = 0.9758164571240161;
constexpr double h_1MPa_300C = 3051.703185584021;

void expect_near_rel(double got, double want, double rel) { EXPECT_NEAR(got, want, std::fabs(want) * rel); }

// Too few arguments: Calc refuses the call itself (Err:504, "error in the
// parameter list") before the add-in is called, because the missing argument
// is a required one; the optional ones may be left out.
TEST_F(CallTest, TooFewArgumentsAreRefusedByCalc) {
    formula("A1", "=STEAM.H.PT(1)");                       // T missing
    formula("A2", "=STEAM.TURBINE.HOUT.PT(10;500;1)");     // eta missing
    formula("A3", "=STEAM.TSAT()");
    formula("A4", "=STEAM.H.PT(1;300)");                   // units left out: fine
    formula("A5", "=STEAM.H.PT(1;300;\"SI\")");
    recalc();
    for (const char* c : {"A1", "A2", "A3"}) EXPECT_EQ(error(c), ParameterExpected) << c << " shows " << string(c);
    ASSERT_EQ(error("A4"), NoError) << string("A4");
    expect_near_rel(value("A4"), h_1MPa_300C, 1e-9);
    ASSERT_EQ(error("A5"), NoError) << string("A5");
    expect_near_rel(value("A5"), h_1MPa_300C, 1e-9);
}

// What reaches a required argument (DEVELOPERS.md, "How the add-in talks to
// Calc", has the table): a number, a number in a cell, a text, a blank cell
// (Calc passes 0), a blank cell as a one-cell range (an empty text: refused),
// an error cell (Calc propagates the error, the add-in is not called), a
// range and an inline array (array results), an empty place in the list.
TEST_F(CallTest, WhatARequiredArgumentReceives) {
    number("Z1", 300);
    text("Z2", "abc");
    // Z3 stays blank
    formula("Z4", "=1/0");
    number("Y1", 0);
    number("Y2", 300);
    formula("A1", "=STEAM.H.PT(1;300)");        // a number
    formula("A2", "=STEAM.H.PT(1;Z1)");         // a cell with a number
    formula("A3", "=STEAM.H.PT(1;Z2)");         // a cell with a text
    formula("A4", "=STEAM.H.PT(1;\"abc\")");    // a text
    formula("A5", "=STEAM.H.PT(1;Z3)");         // a blank cell: arrives as 0, so 0 degC
    formula("A6", "=STEAM.H.PT(1;Z3:Z3)");      // a blank cell as a range: an empty text
    formula("A7", "=STEAM.H.PT(1;Z4)");         // an error cell
    formula("A8", "=STEAM.H.PT(1;)");           // an empty place in the list
    array_formula("B1:B2", "=STEAM.H.PT(1;Y1:Y2)");  // a range
    array_formula("C1:C2", "=STEAM.H.PT(1;{0|300})");  // an inline array (a column: rows end at |)
    recalc();
    ASSERT_EQ(error("A1"), NoError);
    expect_near_rel(value("A1"), h_1MPa_300C, 1e-9);
    ASSERT_EQ(error("A2"), NoError);
    expect_near_rel(value("A2"), h_1MPa_300C, 1e-9);
    EXPECT_EQ(error("A3"), IllegalArgument) << string("A3");
    EXPECT_EQ(error("A4"), IllegalArgument) << string("A4");
    ASSERT_EQ(error("A5"), NoError) << string("A5");
    expect_near_rel(value("A5"), h_1MPa_0C, 1e-9);
    EXPECT_EQ(error("A6"), IllegalArgument) << string("A6");
    EXPECT_EQ(error("A7"), 532) << string("A7");  // #DIV/0!, Calc's own error, passed through
    EXPECT_NE(error("A8"), NoError) << string("A8");
    for (const char* c : {"B1", "C1"}) {
        ASSERT_EQ(error(c), NoError) << c;
        expect_near_rel(value(c), h_1MPa_0C, 1e-9);
    }
    for (const char* c : {"B2", "C2"}) {
        ASSERT_EQ(error(c), NoError) << c;
        expect_near_rel(value(c), h_1MPa_300C, 1e-9);
    }
    // STEAM.EXPLAIN with the same arguments names the text argument.
    formula("D1", "=STEAM.EXPLAIN(\"H.PT\";1;Z2)");
    formula("D2", "=STEAM.EXPLAIN(\"H.PT\";1;)");
    recalc();
    EXPECT_NE(string("D1"), "OK");
    std::printf("  H.PT(1; Z2) with Z2 = \"abc\": %s\n  H.PT(1;) shows %s: %s\n", string("D1").c_str(),
                string("A8").c_str(), string("D2").c_str());
}

}  // namespace
}  // namespace isentra::calctest
