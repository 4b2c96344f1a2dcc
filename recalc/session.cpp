// SPDX-License-Identifier: MPL-2.0
#include "session.hpp"

#include <algorithm>
#include <atomic>
#include <cstdlib>
#include <cxxabi.h>
#include <mutex>
#include <set>
#include <typeinfo>

#include <com/sun/star/beans/PropertyValue.hpp>
#include <com/sun/star/container/XIndexAccess.hpp>
#include <com/sun/star/container/XNameAccess.hpp>
#include <com/sun/star/container/XNamed.hpp>
#include <com/sun/star/document/MacroExecMode.hpp>
#include <com/sun/star/document/UpdateDocMode.hpp>
#include <com/sun/star/frame/XComponentLoader.hpp>
#include <com/sun/star/frame/XStorable.hpp>
#include <com/sun/star/lang/XMultiComponentFactory.hpp>
#include <com/sun/star/sheet/CellFlags.hpp>
#include <com/sun/star/sheet/FormulaResult.hpp>
#include <com/sun/star/sheet/XCalculatable.hpp>
#include <com/sun/star/sheet/XCellRangeData.hpp>
#include <com/sun/star/sheet/XCellRangeFormula.hpp>
#include <com/sun/star/sheet/XCellRangesQuery.hpp>
#include <com/sun/star/sheet/XSheetCellRanges.hpp>
#include <com/sun/star/sheet/XSpreadsheet.hpp>
#include <com/sun/star/sheet/XSpreadsheetDocument.hpp>
#include <com/sun/star/table/CellRangeAddress.hpp>
#include <com/sun/star/table/XCell.hpp>
#include <com/sun/star/table/XCellRange.hpp>
#include <com/sun/star/task/XInteractionAbort.hpp>
#include <com/sun/star/task/XInteractionDisapprove.hpp>
#include <com/sun/star/task/XInteractionHandler.hpp>
#include <com/sun/star/task/XInteractionRequest.hpp>
#include <com/sun/star/text/XTextRange.hpp>
#include <com/sun/star/uno/Exception.hpp>
#include <com/sun/star/util/XCloseable.hpp>
#include <cppuhelper/implbase1.hxx>
#include <rtl/ref.hxx>
#include <rtl/ustring.hxx>

namespace isentra::recalc {

using css::uno::Any;
using css::uno::Reference;
using css::uno::Sequence;
using css::uno::UNO_QUERY;
using css::uno::UNO_QUERY_THROW;
using rtl::OUString;

namespace {

OUString ou(const std::string& s) { return OUString(s.data(), static_cast<sal_Int32>(s.size()), RTL_TEXTENCODING_UTF8); }

std::string str(const OUString& s) {
    const rtl::OString o = rtl::OUStringToOString(s, RTL_TEXTENCODING_UTF8);
    return std::string(o.getStr(), static_cast<std::size_t>(o.getLength()));
}

css::beans::PropertyValue prop(const char* name, const Any& value) {
    css::beans::PropertyValue p;
    p.Name = OUString::createFromAscii(name);
    p.Value = value;
    return p;
}

Sequence<css::beans::PropertyValue> props_of(std::initializer_list<css::beans::PropertyValue> list) {
    Sequence<css::beans::PropertyValue> seq(static_cast<sal_Int32>(list.size()));
    sal_Int32 i = 0;
    for (const auto& p : list) seq.getArray()[i++] = p;
    return seq;
}

// Answers every request without a dialog: "abort" (else "disapprove"), and
// remembers what was asked.
class NoDialogs : public cppu::WeakImplHelper1<css::task::XInteractionHandler> {
public:
    void SAL_CALL handle(const Reference<css::task::XInteractionRequest>& request) override {
        const Any what = request->getRequest();
        const std::string type = str(what.getValueTypeName());
        {
            std::lock_guard<std::mutex> lock(mutex_);
            if (type.find("PasswordRequest") != std::string::npos) password_ = true;
            asked_ += (asked_.empty() ? "" : ", ") + type.substr(type.rfind('.') + 1);
        }
        const Sequence<Reference<css::task::XInteractionContinuation>> cs = request->getContinuations();
        for (const auto& c : cs) {
            Reference<css::task::XInteractionAbort> abort(c, UNO_QUERY);
            if (abort.is()) {
                abort->select();
                return;
            }
        }
        for (const auto& c : cs) {
            Reference<css::task::XInteractionDisapprove> no(c, UNO_QUERY);
            if (no.is()) {
                no->select();
                return;
            }
        }
    }
    bool password() {
        std::lock_guard<std::mutex> lock(mutex_);
        return password_;
    }
    std::string asked() {
        std::lock_guard<std::mutex> lock(mutex_);
        return asked_;
    }

private:
    std::mutex mutex_;
    bool password_ = false;
    std::string asked_;
};

Reference<css::container::XIndexAccess> sheets_of(const Reference<css::lang::XComponent>& doc) {
    Reference<css::sheet::XSpreadsheetDocument> sdoc(doc, UNO_QUERY_THROW);
    return Reference<css::container::XIndexAccess>(sdoc->getSheets(), UNO_QUERY_THROW);
}

Reference<css::sheet::XSpreadsheet> sheet_named(const Reference<css::lang::XComponent>& doc, const std::string& name) {
    Reference<css::sheet::XSpreadsheetDocument> sdoc(doc, UNO_QUERY_THROW);
    Reference<css::container::XNameAccess> sheets(sdoc->getSheets(), UNO_QUERY_THROW);
    if (!sheets->hasByName(ou(name))) throw DocumentError("the workbook has no sheet '" + name + "'");
    return Reference<css::sheet::XSpreadsheet>(sheets->getByName(ou(name)), UNO_QUERY_THROW);
}

Sequence<css::table::CellRangeAddress> addresses(const Reference<css::sheet::XSheetCellRanges>& r) {
    if (!r.is()) return {};
    return r->getRangeAddresses();
}

template <class F>
void each_cell(const Sequence<css::table::CellRangeAddress>& rs, F f) {
    for (const auto& r : rs)
        for (sal_Int32 row = r.StartRow; row <= r.EndRow; ++row)
            for (sal_Int32 col = r.StartColumn; col <= r.EndColumn; ++col) f(static_cast<int>(col), static_cast<int>(row));
}

Value error_value(const Reference<css::table::XCell>& cell) {
    const int code = static_cast<int>(cell->getError());
    const std::string shown = str(Reference<css::text::XTextRange>(cell, UNO_QUERY_THROW)->getString());
    return Value::of_error(code, shown);
}

}  // namespace

std::string describe(const css::uno::Exception& e) {
    int status = 0;
    char* name = abi::__cxa_demangle(typeid(e).name(), nullptr, nullptr, &status);
    std::string type = name ? name : typeid(e).name();
    std::free(name);
    const std::size_t k = type.rfind("::");
    if (k != std::string::npos) type = type.substr(k + 2);
    const std::string m = str(e.Message);
    return m.empty() ? type : m + " (" + type + ")";
}

Reference<css::lang::XComponent> load_document(const Reference<css::uno::XComponentContext>& ctx,
                                              const std::string& file_url, bool as_template) {
    Reference<css::frame::XComponentLoader> loader(
        ctx->getServiceManager()->createInstanceWithContext("com.sun.star.frame.Desktop", ctx), UNO_QUERY_THROW);
    rtl::Reference<NoDialogs> handler(new NoDialogs);
    Sequence<css::beans::PropertyValue> props = props_of({
        prop("Hidden", Any(true)),
        prop("ReadOnly", Any(true)),
        prop("AsTemplate", Any(as_template)),
        prop("MacroExecutionMode", Any(css::document::MacroExecMode::NEVER_EXECUTE)),
        prop("UpdateDocMode", Any(css::document::UpdateDocMode::NO_UPDATE)),
        prop("InteractionHandler", Any(Reference<css::task::XInteractionHandler>(handler.get()))),
        prop("Silent", Any(true)),
    });
    Reference<css::lang::XComponent> doc;
    std::string failure;
    try {
        doc = loader->loadComponentFromURL(ou(file_url), "_blank", 0, props);
    } catch (const css::uno::RuntimeException&) {
        throw;  // the office or the bridge went away: the caller decides
    } catch (const css::uno::Exception& e) {
        failure = describe(e);
    }
    if (handler->password()) {
        if (doc.is()) close_document(doc);
        throw DocumentError("password-protected (the tool does not open encrypted workbooks)");
    }
    if (!doc.is())
        throw DocumentError("damaged or not a workbook: LibreOffice could not open it" +
                            (failure.empty() ? std::string() : " (" + failure + ")") +
                            (handler->asked().empty() ? std::string() : " [asked: " + handler->asked() + "]"));
    if (!Reference<css::sheet::XSpreadsheetDocument>(doc, UNO_QUERY).is()) {
        close_document(doc);
        throw DocumentError("not a spreadsheet: LibreOffice opened it as another kind of document");
    }
    return doc;
}

Snapshot read_snapshot(const Reference<css::lang::XComponent>& doc) {
    Snapshot snap;
    const Reference<css::container::XIndexAccess> sheets = sheets_of(doc);
    const sal_Int32 n = sheets->getCount();
    for (sal_Int32 i = 0; i < n; ++i) {
        Reference<css::sheet::XSpreadsheet> sheet(sheets->getByIndex(i), UNO_QUERY_THROW);
        Sheet s;
        s.name = str(Reference<css::container::XNamed>(sheet, UNO_QUERY_THROW)->getName());
        Reference<css::sheet::XCellRangesQuery> q(sheet, UNO_QUERY_THROW);
        const auto formulas = addresses(q->queryContentCells(css::sheet::CellFlags::FORMULA));
        if (formulas.getLength() == 0) {
            snap.sheets.push_back(std::move(s));
            continue;
        }
        sal_Int32 max_col = 0, max_row = 0;
        for (const auto& r : formulas) {
            max_col = std::max(max_col, r.EndColumn);
            max_row = std::max(max_row, r.EndRow);
        }
        // One read of values and one of formulas from A1 to the last formula
        // cell: that also covers every label candidate (left of, above a cell).
        Reference<css::table::XCellRange> box = sheet->getCellRangeByPosition(0, 0, max_col, max_row);
        const Sequence<Sequence<Any>> data = Reference<css::sheet::XCellRangeData>(box, UNO_QUERY_THROW)->getDataArray();
        const Sequence<Sequence<OUString>> text =
            Reference<css::sheet::XCellRangeFormula>(box, UNO_QUERY_THROW)->getFormulaArray();
        std::set<std::pair<int, int>> strings, errors;
        each_cell(addresses(q->queryFormulaCells(css::sheet::FormulaResult::STRING)),
                  [&](int c, int r) { strings.insert({r, c}); });
        each_cell(addresses(q->queryFormulaCells(css::sheet::FormulaResult::ERROR)),
                  [&](int c, int r) { errors.insert({r, c}); });
        each_cell(addresses(q->queryContentCells(css::sheet::CellFlags::STRING)), [&](int c, int r) {
            if (r <= max_row && c <= max_col) {
                OUString t;
                if (data[r][c] >>= t) s.texts[{r, c}] = str(t);
            }
        });
        std::vector<std::pair<int, int>> cells;
        each_cell(formulas, [&](int c, int r) { cells.push_back({r, c}); });
        std::sort(cells.begin(), cells.end());
        for (const auto& [r, c] : cells) {
            FormulaCell fc;
            fc.col = c;
            fc.row = r;
            fc.formula = str(text[r][c]);
            if (errors.count({r, c})) {
                fc.value = error_value(sheet->getCellByPosition(c, r));
            } else if (strings.count({r, c})) {
                OUString t;
                data[r][c] >>= t;
                fc.value = Value::of_text(str(t));
            } else {
                double v = 0;
                if (data[r][c] >>= v) fc.value = Value::of_number(v);
                else {
                    OUString t;
                    if (data[r][c] >>= t) fc.value = Value::of_text(str(t));
                }
            }
            s.cells.push_back(std::move(fc));
        }
        snap.sheets.push_back(std::move(s));
    }
    return snap;
}

int reenter_addin_calls(const Reference<css::lang::XComponent>& doc, Snapshot& before, const std::string& prefix) {
    constexpr int no_macro = 531;  // sc FormulaError::NoMacro, shown as #MACRO?
    int n = 0;
    const Reference<css::container::XIndexAccess> sheets = sheets_of(doc);
    for (std::size_t i = 0; i < before.sheets.size() && static_cast<sal_Int32>(i) < sheets->getCount(); ++i) {
        Reference<css::sheet::XSpreadsheet> sheet(sheets->getByIndex(static_cast<sal_Int32>(i)), UNO_QUERY_THROW);
        for (FormulaCell& c : before.sheets[i].cells) {
            if (c.value.kind != Value::Error || c.value.error != no_macro) continue;
            if (c.formula.empty() || c.formula[0] != '=' || c.formula.find(prefix) == std::string::npos) continue;
            sheet->getCellByPosition(c.col, c.row)->setFormula(ou(c.formula));
            c.value = Value{};
            ++n;
        }
    }
    return n;
}

void recalculate_all(const Reference<css::lang::XComponent>& doc) {
    Reference<css::sheet::XCalculatable>(doc, UNO_QUERY_THROW)->calculateAll();
}

void set_cell(const Reference<css::lang::XComponent>& doc, const Assignment& a) {
    Reference<css::table::XCell> cell = sheet_named(doc, a.cell.sheet)->getCellByPosition(a.cell.col, a.cell.row);
    const std::string& v = a.value;
    char* end = nullptr;
    const double d = std::strtod(v.c_str(), &end);
    if (!v.empty() && end && *end == '\0' && v.find_first_not_of(" \t") == 0) cell->setValue(d);
    else if (!v.empty() && v[0] == '=') cell->setFormula(ou(v));
    else Reference<css::text::XTextRange>(cell, UNO_QUERY_THROW)->setString(ou(v));
}

Value read_cell(const Reference<css::lang::XComponent>& doc, const CellAddress& a) {
    Reference<css::sheet::XSpreadsheet> sheet = sheet_named(doc, a.sheet);
    Reference<css::table::XCell> cell = sheet->getCellByPosition(a.col, a.row);
    if (cell->getError() != 0) return error_value(cell);
    const Sequence<Sequence<Any>> data =
        Reference<css::sheet::XCellRangeData>(sheet->getCellRangeByPosition(a.col, a.row, a.col, a.row), UNO_QUERY_THROW)
            ->getDataArray();
    double v = 0;
    OUString t;
    if (data[0][0] >>= v) return Value::of_number(v);
    if ((data[0][0] >>= t) && !t.isEmpty()) return Value::of_text(str(t));
    return Value{};
}

void store_copy(const Reference<css::lang::XComponent>& doc, const std::string& file_url, const std::string& extension) {
    const char* filter = filter_for(extension);
    if (!filter) throw DocumentError("no filter for ." + extension);
    Sequence<css::beans::PropertyValue> props = props_of({prop("FilterName", Any(OUString::createFromAscii(filter))),
                                                          prop("Overwrite", Any(false))});
    try {
        Reference<css::frame::XStorable>(doc, UNO_QUERY_THROW)->storeToURL(ou(file_url), props);
    } catch (const css::uno::RuntimeException&) {
        throw;
    } catch (const css::uno::Exception& e) {
        throw DocumentError("the recalculated copy could not be written as ." + extension + ": " + describe(e));
    }
}

void close_document(const Reference<css::lang::XComponent>& doc) {
    if (!doc.is()) return;
    try {
        Reference<css::util::XCloseable> c(doc, UNO_QUERY);
        if (c.is()) c->close(true);
        else doc->dispose();
    } catch (const css::uno::RuntimeException&) {
        throw;
    } catch (const css::uno::Exception&) {
        // CloseVetoException: the office keeps it; nothing else to do
    }
}

FunctionNames::~FunctionNames() {
    try {
        close_document(scratch_);
    } catch (...) {
    }
}

bool FunctionNames::unknown(const std::string& name) {
    auto it = cache_.find(name);
    if (it != cache_.end()) return it->second;
    if (!scratch_.is()) {
        Reference<css::frame::XComponentLoader> loader(
            ctx_->getServiceManager()->createInstanceWithContext("com.sun.star.frame.Desktop", ctx_), UNO_QUERY_THROW);
        Sequence<css::beans::PropertyValue> props = props_of({prop("Hidden", Any(true))});
        scratch_ = loader->loadComponentFromURL("private:factory/scalc", "_blank", 0, props);
    }
    Reference<css::sheet::XSpreadsheet> sheet(sheets_of(scratch_)->getByIndex(0), UNO_QUERY_THROW);
    Reference<css::table::XCell> cell = sheet->getCellByPosition(0, 0);
    cell->setFormula(ou("=" + name + "()"));
    const bool result = cell->getError() == error_no_name;
    cell->setFormula("");
    cache_[name] = result;
    return result;
}

}  // namespace isentra::recalc
