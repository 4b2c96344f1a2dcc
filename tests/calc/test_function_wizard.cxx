// SPDX-License-Identifier: MPL-2.0
// The add-in object as Calc sees it: service names and the Function Wizard
// texts (XAddIn), for every catalogue function.
#include <string>

#include <com/sun/star/lang/XMultiComponentFactory.hpp>
#include <com/sun/star/lang/XServiceInfo.hpp>
#include <com/sun/star/lang/XServiceName.hpp>
#include <com/sun/star/sheet/XAddIn.hpp>

#include "isentra/surface/catalogue.hpp"
#include "calc_test.hxx"

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
            EXPECT_EQ(str(addin->getFunctionDescription(m)), catalogue::describe_function(f));
            EXPECT_EQ(str(addin->getProgrammaticCategoryName(m)), "Add-In");
            EXPECT_EQ(str(addin->getDisplayCategoryName(m)), f.category);
            for (std::size_t i = 0; i < f.args.size(); ++i) {
                EXPECT_EQ(str(addin->getDisplayArgumentName(m, static_cast<sal_Int32>(i))), f.args[i].name);
                EXPECT_EQ(str(addin->getArgumentDescription(m, static_cast<sal_Int32>(i))),
                          catalogue::describe_arg(f, i));
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

}  // namespace
}  // namespace isentra::calctest
