// SPDX-License-Identifier: MPL-2.0
// isentra-recalc: what the tool does with one document in an office over UNO:
// load it safely (no macros, no link updates, no dialogs, read-only), read
// every formula cell, set input cells, recalculate, store a copy.
#pragma once

#include <map>
#include <stdexcept>
#include <string>

#include <com/sun/star/lang/XComponent.hpp>
#include <com/sun/star/uno/Reference.hxx>
#include <com/sun/star/uno/XComponentContext.hpp>

#include "model.hpp"
#include "options.hpp"

namespace isentra::recalc {

namespace css = ::com::sun::star;

// A document that cannot be recalculated: the reason is the report's text
// ("password-protected", "damaged or not a workbook: ...").
struct DocumentError : std::runtime_error {
    using std::runtime_error::runtime_error;
};

// Loads file_url (a private copy of the input) hidden and read-only, with
// MacroExecutionMode NEVER_EXECUTE, UpdateDocMode NO_UPDATE and an
// interaction handler that answers every request with "abort" (and notes a
// password request). Templates open as new documents. Throws DocumentError.
css::uno::Reference<css::lang::XComponent> load_document(const css::uno::Reference<css::uno::XComponentContext>& ctx,
                                                        const std::string& file_url, bool as_template);

// Every formula cell's current value (no recalculation is triggered for cells
// that hold a stored result) and the sheet's text cells (for labels).
Snapshot read_snapshot(const css::uno::Reference<css::lang::XComponent>& doc);

// .xls inputs: Calc reads an add-in call from .xls as a call of a macro that
// does not exist (#MACRO?, error 531). Entering the same formula text again
// binds it to the add-in. Does that for every such cell whose formula calls
// `prefix` (e.g. "ORG.ISENTRA.STEAMFUNCTIONS."), sets its value in `before`
// to Empty (its stored result is unknown) and returns how many there were.
int reenter_addin_calls(const css::uno::Reference<css::lang::XComponent>& doc, Snapshot& before, const std::string& prefix);

void recalculate_all(const css::uno::Reference<css::lang::XComponent>& doc);

// Enters a value (number, "=formula" or text). Throws DocumentError if the
// sheet does not exist.
void set_cell(const css::uno::Reference<css::lang::XComponent>& doc, const Assignment& a);
Value read_cell(const css::uno::Reference<css::lang::XComponent>& doc, const CellAddress& a);

// Stores a copy (storeToURL) with the Calc filter of `extension`.
void store_copy(const css::uno::Reference<css::lang::XComponent>& doc, const std::string& file_url,
                const std::string& extension);

void close_document(const css::uno::Reference<css::lang::XComponent>& doc);

// Which function names Calc does not know: asks a scratch document of the
// same office once per name (a call of an unknown name gives #NAME?).
class FunctionNames : public UnknownFunctions {
public:
    explicit FunctionNames(css::uno::Reference<css::uno::XComponentContext> ctx) : ctx_(std::move(ctx)) {}
    ~FunctionNames() override;
    bool unknown(const std::string& name) override;

private:
    css::uno::Reference<css::uno::XComponentContext> ctx_;
    css::uno::Reference<css::lang::XComponent> scratch_;
    std::map<std::string, bool> cache_;
};

// Text of a UNO exception with its type.
std::string describe(const css::uno::Exception& e);

}  // namespace isentra::recalc
