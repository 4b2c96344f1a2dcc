// SPDX-License-Identifier: MPL-2.0
// The Calc add-in object org.isentra.SteamFunctions. Its spreadsheet methods
// (one per catalogue function) are generated at build time into
// steam_methods.hxx / steam_methods.cxx; each one calls dispatch() with its
// index in isentra::catalogue::functions().
#pragma once

#include <mutex>

#include <com/sun/star/lang/Locale.hpp>
#include <com/sun/star/lang/XServiceInfo.hpp>
#include <com/sun/star/lang/XServiceName.hpp>
#include <com/sun/star/sheet/XAddIn.hpp>
#include <com/sun/star/uno/Any.hxx>
#include <com/sun/star/uno/Sequence.hxx>
#include <com/sun/star/uno/XComponentContext.hpp>
#include <cppuhelper/implbase4.hxx>
#include <org/isentra/XSteamFunctions.hpp>
#include <rtl/ustring.hxx>

namespace css = ::com::sun::star;

namespace isentra::uno {

using ::rtl::OString;
using ::rtl::OUString;

inline constexpr const char* service_name = "org.isentra.SteamFunctions";

// One fixed argument as a generated method received it: a required argument
// is declared sequence<sequence<any>> (Calc then marks it required in the
// Function Wizard and refuses a call without it; a single value arrives as a
// 1x1 array), an optional one `any` (omitted: a void any).
struct Param {
    const css::uno::Any* any = nullptr;
    const css::uno::Sequence<css::uno::Sequence<css::uno::Any>>* rows = nullptr;
    Param(const css::uno::Any& a) : any(&a) {}  // NOLINT: implicit on purpose (generated code)
    Param(const css::uno::Sequence<css::uno::Sequence<css::uno::Any>>& r) : rows(&r) {}  // NOLINT
};
inline constexpr const char* implementation_name = "org.isentra.SteamFunctions.impl";

class SteamFunctions
    : public cppu::WeakImplHelper4<org::isentra::XSteamFunctions, css::sheet::XAddIn,
                                   css::lang::XServiceName, css::lang::XServiceInfo> {
public:
    // Cheap: Calc creates one object per office process when it first needs
    // the function list; nothing is computed here.
    explicit SteamFunctions(const css::uno::Reference<css::uno::XComponentContext>& ctx);

    // org.isentra.XSteamFunctions: generated, one method per catalogue function.
#include "steam_methods.hxx"

    // XAddIn
    OUString SAL_CALL getProgrammaticFuntionName(const OUString& aDisplayName) override;
    OUString SAL_CALL getDisplayFunctionName(const OUString& aProgrammaticName) override;
    OUString SAL_CALL getFunctionDescription(const OUString& aProgrammaticName) override;
    OUString SAL_CALL getDisplayArgumentName(const OUString& aProgrammaticName, sal_Int32 nArgument) override;
    OUString SAL_CALL getArgumentDescription(const OUString& aProgrammaticName, sal_Int32 nArgument) override;
    OUString SAL_CALL getProgrammaticCategoryName(const OUString& aProgrammaticName) override;
    OUString SAL_CALL getDisplayCategoryName(const OUString& aProgrammaticName) override;

    // XLocalizable (base of XAddIn)
    void SAL_CALL setLocale(const css::lang::Locale& eLocale) override;
    css::lang::Locale SAL_CALL getLocale() override;

    // XServiceName
    OUString SAL_CALL getServiceName() override;

    // XServiceInfo
    OUString SAL_CALL getImplementationName() override;
    sal_Bool SAL_CALL supportsService(const OUString& ServiceName) override;
    css::uno::Sequence<OUString> SAL_CALL getSupportedServiceNames() override;

private:
    // The one generic implementation behind every spreadsheet method:
    // converts the arguments (fixed ones, then the elements of a varargs
    // sequence), evaluates catalogue function `index` with isentra::call()
    // and converts the result back. Throws only UNO exceptions.
    css::uno::Any dispatch(std::size_t index, const Param* args, std::size_t nargs,
                           const css::uno::Sequence<css::uno::Any>* rest);

    std::mutex mutex_;  // guards locale_
    css::lang::Locale locale_;
};

}  // namespace isentra::uno
