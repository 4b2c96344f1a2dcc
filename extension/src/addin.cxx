// SPDX-License-Identifier: MPL-2.0
// The Calc add-in: XAddIn texts from the catalogue, the generic dispatcher
// (UNO any <-> isentra::Table) and the component's constructor function.
#include "addin.hxx"

#include <cmath>
#include <exception>
#include <limits>
#include <new>
#include <string>
#include <unordered_map>
#include <vector>

#include <com/sun/star/lang/IllegalArgumentException.hpp>
#include <com/sun/star/uno/RuntimeException.hpp>
#include <cppuhelper/supportsservice.hxx>
#include <rtl/ustring.hxx>

#include "isentra/surface/call.hpp"
#include "isentra/surface/catalogue.hpp"
#include "wizard_text.hpp"

namespace isentra::uno {

namespace {

namespace cat = isentra::catalogue;
using css::uno::Any;
using css::uno::Sequence;

OUString to_ou(const std::string& s) {
    return OUString(s.data(), static_cast<sal_Int32>(s.size()), RTL_TEXTENCODING_UTF8);
}

std::string to_std(const OUString& s) {
    const OString o = OUStringToOString(s, RTL_TEXTENCODING_UTF8);
    return std::string(o.getStr(), static_cast<std::size_t>(o.getLength()));
}

// Method name -> catalogue index, built on first use (not in the constructor).
const std::unordered_map<std::string, std::size_t>& method_index() {
    static const std::unordered_map<std::string, std::size_t> map = [] {
        std::unordered_map<std::string, std::size_t> m;
        const auto& fs = cat::functions();
        for (std::size_t i = 0; i < fs.size(); ++i) m.emplace(fs[i].method, i);
        return m;
    }();
    return map;
}

const cat::Function* by_method(const OUString& method) {
    const auto& m = method_index();
    const auto it = m.find(to_std(method));
    return it == m.end() ? nullptr : &cat::functions()[it->second];
}

// ---- any -> Value / Table ---------------------------------------------------

// A single cell value. Calc passes numbers as double, texts as OUString, and
// empty cells inside a range as "" (an empty text): both "" and void are Empty.
Value to_value(const Any& a) {
    switch (a.getValueTypeClass()) {
    case css::uno::TypeClass_VOID:
        return Value{};
    case css::uno::TypeClass_STRING: {
        const OUString s = *static_cast<const OUString*>(a.getValue());
        if (s.isEmpty()) return Value{};
        return Value::of_text(to_std(s));
    }
    case css::uno::TypeClass_BOOLEAN:
        return Value::of(*static_cast<const sal_Bool*>(a.getValue()) ? 1.0 : 0.0);
    case css::uno::TypeClass_BYTE:
    case css::uno::TypeClass_SHORT:
    case css::uno::TypeClass_UNSIGNED_SHORT:
    case css::uno::TypeClass_LONG:
    case css::uno::TypeClass_UNSIGNED_LONG:
    case css::uno::TypeClass_HYPER:
    case css::uno::TypeClass_UNSIGNED_HYPER:
    case css::uno::TypeClass_FLOAT:
    case css::uno::TypeClass_DOUBLE: {
        double d = 0;
        if (a >>= d) return Value::of(d);
        sal_Int64 i = 0;  // 64-bit integers do not widen to double implicitly
        if (a >>= i) return Value::of(static_cast<double>(i));
        sal_uInt64 u = 0;
        if (a >>= u) return Value::of(static_cast<double>(u));
        break;
    }
    default:
        break;
    }
    return Value::of_error(ErrorCode::InvalidArgument,
                           "an argument of type " + to_std(a.getValueTypeName()) + " is not supported");
}

template <class E>
bool fill_rows(const Sequence<Sequence<E>>& rows, Table& t, Value (*conv)(const E&)) {
    const sal_Int32 nr = rows.getLength();
    const sal_Int32 nc = nr ? rows[0].getLength() : 0;
    if (nr == 0 || nc == 0) return false;
    t.rows = static_cast<std::size_t>(nr);
    t.cols = static_cast<std::size_t>(nc);
    t.cells.assign(t.rows * t.cols, Value{});
    for (sal_Int32 r = 0; r < nr; ++r) {
        if (rows[r].getLength() != nc) return false;
        for (sal_Int32 c = 0; c < nc; ++c)
            t.cells[static_cast<std::size_t>(r) * t.cols + static_cast<std::size_t>(c)] = conv(rows[r][c]);
    }
    return true;
}

Value from_double(const double& d) { return Value::of(d); }
Value from_string(const OUString& s) { return s.isEmpty() ? Value{} : Value::of_text(to_std(s)); }

// One argument: a scalar, or a range (Calc passes a range to an `any`
// parameter as sequence<sequence<any>>; macros may pass typed sequences).
Table to_table(const Any& a) {
    if (a.getValueTypeClass() != css::uno::TypeClass_SEQUENCE) return Table::scalar(to_value(a));
    Table t;
    bool ok = false;
    Sequence<Sequence<Any>> sa;
    Sequence<Sequence<double>> sd;
    Sequence<Sequence<OUString>> ss;
    Sequence<Any> flat;
    if (a >>= sa) ok = fill_rows(sa, t, &to_value);
    else if (a >>= sd) ok = fill_rows(sd, t, &from_double);
    else if (a >>= ss) ok = fill_rows(ss, t, &from_string);
    else if (a >>= flat) {  // a one-dimensional array from a macro: one row
        Sequence<Sequence<Any>> one(1);
        one[0] = flat;
        ok = fill_rows(one, t, &to_value);
    }
    if (!ok)
        return Table::scalar(Value::of_error(ErrorCode::InvalidArgument,
                                             "an argument is an empty or non-rectangular array"));
    return t;
}

// A required argument (sequence<sequence<any>>): Calc wraps a single value
// (a number, a text, a one-cell reference) in a 1x1 array and passes a range
// as its cells. An argument left empty inside the list, as in H.PT(1;), comes
// as an empty array and counts as missing (Empty).
Table to_table(const Sequence<Sequence<Any>>& rows) {
    const sal_Int32 nr = rows.getLength();
    if (nr == 0 || (nr == 1 && rows[0].getLength() == 0)) return Table::scalar(Value{});
    if (nr == 1 && rows[0].getLength() == 1) return Table::scalar(to_value(rows[0][0]));
    Table t;
    if (!fill_rows(rows, t, &to_value))
        return Table::scalar(Value::of_error(ErrorCode::InvalidArgument, "an argument is a non-rectangular array"));
    return t;
}

Table to_table(const Param& p) { return p.rows ? to_table(*p.rows) : to_table(*p.any); }

// ---- Table -> any -------------------------------------------------------------

// An error element inside an array result. Calc has no way to show an
// error's sentence in one element of an array, so the element must at least
// be visibly an error. A NaN double shows as #NUM! ("invalid numeric
// value"); see DEVELOPERS.md, "Errors inside array results", for the
// experiment behind this choice.
Any error_element(const Value&) { return Any(std::numeric_limits<double>::quiet_NaN()); }

Any element(const Value& v) {
    switch (v.kind) {
    case Value::Kind::Number: return Any(v.number);
    case Value::Kind::Text: return Any(to_ou(v.text));
    case Value::Kind::Empty: return Any(OUString());
    case Value::Kind::Error: return error_element(v);
    }
    return Any();
}

}  // namespace

SteamFunctions::SteamFunctions(const css::uno::Reference<css::uno::XComponentContext>&) {}

Any SteamFunctions::dispatch(std::size_t index, const Param* args, std::size_t nargs,
                             const Sequence<Any>* rest) {
    try {
        const auto& fs = cat::functions();
        if (index >= fs.size()) throw css::uno::RuntimeException("Isentra: unknown function index");
        const cat::Function& f = fs[index];

        std::vector<Table> in;
        in.reserve(nargs + (rest ? static_cast<std::size_t>(rest->getLength()) : 0));
        for (std::size_t i = 0; i < nargs; ++i) in.push_back(to_table(args[i]));
        if (rest)
            for (sal_Int32 i = 0; i < rest->getLength(); ++i) in.push_back(to_table((*rest)[i]));
        // Calc passes omitted trailing (optional, `any`) arguments as void
        // anys: drop them, so that the core sees the call as written (and
        // counts the arguments).
        if (!rest) {
            std::size_t n = nargs;
            while (n > 0 && args[n - 1].any && !args[n - 1].any->hasValue()) --n;
            in.resize(n);
        }

        const Table r = call(f, in);

        if (r.rows == 1 && r.cols == 1) {
            const Value& v = r.cells[0];
            switch (v.kind) {
            case Value::Kind::Number: return Any(v.number);
            case Value::Kind::Text: return Any(to_ou(v.text));
            case Value::Kind::Empty: return Any(OUString());
            case Value::Kind::Error:
                // Calc shows Err:502 ("invalid argument"); STEAM.EXPLAIN gives the sentence.
                throw css::lang::IllegalArgumentException(to_ou(f.name + ": " + v.text),
                                                          static_cast<cppu::OWeakObject*>(this), 0);
            }
        }
        Sequence<Sequence<Any>> out(static_cast<sal_Int32>(r.rows));
        Sequence<Any>* rows = out.getArray();
        for (std::size_t i = 0; i < r.rows; ++i) {
            rows[i].realloc(static_cast<sal_Int32>(r.cols));
            Any* cells = rows[i].getArray();
            for (std::size_t j = 0; j < r.cols; ++j) cells[j] = element(r.at(i, j));
        }
        return Any(out);
    } catch (const css::uno::Exception&) {
        throw;  // IllegalArgumentException (and any other UNO exception) as is
    } catch (const std::bad_alloc&) {
        throw css::uno::RuntimeException("Isentra: out of memory");
    } catch (const std::exception& e) {
        throw css::uno::RuntimeException(to_ou(std::string("Isentra internal error: ") + e.what()));
    } catch (...) {
        throw css::uno::RuntimeException("Isentra internal error");
    }
}

// ---- XAddIn -------------------------------------------------------------------
// Calc asks for these texts while it builds its function list; they never
// throw (an unknown name or a failure gives an empty text).

namespace {

template <class F>
OUString text_or_empty(F f) noexcept {
    try {
        return f();
    } catch (...) {
        return OUString();
    }
}

bool valid_arg(const cat::Function* f, sal_Int32 n) {
    return f && n >= 0 && static_cast<std::size_t>(n) < f->args.size();
}

}  // namespace

OUString SteamFunctions::getProgrammaticFuntionName(const OUString& aDisplayName) {
    return text_or_empty([&] {
        const OUString wanted = aDisplayName.toAsciiUpperCase();
        for (const cat::Function& f : cat::functions())
            if (to_ou(f.name).toAsciiUpperCase() == wanted) return to_ou(f.method);
        return OUString();
    });
}

OUString SteamFunctions::getDisplayFunctionName(const OUString& aProgrammaticName) {
    return text_or_empty([&] {
        const cat::Function* f = by_method(aProgrammaticName);
        return f ? to_ou(f->name) : OUString();
    });
}

OUString SteamFunctions::getFunctionDescription(const OUString& aProgrammaticName) {
    return text_or_empty([&] {
        const cat::Function* f = by_method(aProgrammaticName);
        return f ? to_ou(wizard::function_text(*f)) : OUString();
    });
}

OUString SteamFunctions::getDisplayArgumentName(const OUString& aProgrammaticName, sal_Int32 nArgument) {
    return text_or_empty([&] {
        const cat::Function* f = by_method(aProgrammaticName);
        return valid_arg(f, nArgument) ? to_ou(f->args[static_cast<std::size_t>(nArgument)].name) : OUString();
    });
}

OUString SteamFunctions::getArgumentDescription(const OUString& aProgrammaticName, sal_Int32 nArgument) {
    return text_or_empty([&] {
        const cat::Function* f = by_method(aProgrammaticName);
        return valid_arg(f, nArgument) ? to_ou(wizard::arg_text(*f, static_cast<std::size_t>(nArgument)))
                                       : OUString();
    });
}

OUString SteamFunctions::getProgrammaticCategoryName(const OUString&) { return "Add-In"; }

OUString SteamFunctions::getDisplayCategoryName(const OUString& aProgrammaticName) {
    return text_or_empty([&] {
        const cat::Function* f = by_method(aProgrammaticName);
        return f ? to_ou(f->category) : OUString("Add-In");
    });
}

// ---- XLocalizable, XServiceName, XServiceInfo ------------------------------------

void SteamFunctions::setLocale(const css::lang::Locale& eLocale) {
    std::lock_guard<std::mutex> lock(mutex_);
    locale_ = eLocale;
}

css::lang::Locale SteamFunctions::getLocale() {
    std::lock_guard<std::mutex> lock(mutex_);
    return locale_;
}

OUString SteamFunctions::getServiceName() { return OUString::createFromAscii(service_name); }

OUString SteamFunctions::getImplementationName() { return OUString::createFromAscii(implementation_name); }

sal_Bool SteamFunctions::supportsService(const OUString& ServiceName) {
    return cppu::supportsService(this, ServiceName);
}

Sequence<OUString> SteamFunctions::getSupportedServiceNames() {
    Sequence<OUString> names(2);
    names[0] = OUString::createFromAscii(service_name);
    names[1] = "com.sun.star.sheet.AddIn";
    return names;
}

}  // namespace isentra::uno

// The constructor function named in isentra.components.
extern "C" SAL_DLLPUBLIC_EXPORT css::uno::XInterface*
org_isentra_SteamFunctions_get_implementation(css::uno::XComponentContext* context,
                                              const css::uno::Sequence<css::uno::Any>&) {
    return cppu::acquire(new isentra::uno::SteamFunctions(context));
}
