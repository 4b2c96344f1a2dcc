// SPDX-License-Identifier: MPL-2.0
// calc_bench: speed of the add-in in a real headless Calc (not a ctest test;
// run it by hand: build-dir/tests/calc/calc_bench). It prints figures and
// asserts nothing about them.
//
// In one office run, each on its own new document with the same 100,000
// input rows (A: pressure, B: temperature, varied states in regions 1, 2
// and 3), hard-recalculated with calculateAll and timed (best of N):
//   - inputs only (the baseline that is subtracted),
//   - 100,000 cells =STEAM.H.PT(An;Bn),
//   - 100,000 cells =STEAM.VERSION()   (the near-empty add-in call, a text),
//   - 100,000 cells =STEAM.FWH.RISE(Bn;Bn) (a trivial numeric add-in call),
//   - 100,000 cells =SQRT(An)          (a built-in function),
//   - one array formula =STEAM.H.PT(A1:A100000;B1:B100000) over 100,000 cells.
// And, in this process, isentra::call() on the same states (the core and the
// call layer without UNO and Calc), and the glue's conversion of one cell's
// arguments in the two declarations a parameter can have: a required
// argument is a sequence<sequence<any>> (a single value comes as a 1x1
// array), an optional one an `any` (the declaration of every argument before
// issue 11). docs/performance.md compares the Calc figures of both builds.
// Environment: ISENTRA_BENCH_ROWS (default 100000), ISENTRA_BENCH_REPEAT (default 3),
// ISENTRA_BENCH_ONLY (a word: only the phases whose title contains it, e.g. "array").
#include <algorithm>
#include <chrono>
#include <cstdio>
#include <cstdlib>
#include <functional>
#include <string>
#include <vector>

#include <com/sun/star/container/XIndexAccess.hpp>
#include <com/sun/star/sheet/XArrayFormulaRange.hpp>
#include <com/sun/star/sheet/XCalculatable.hpp>
#include <com/sun/star/sheet/XCellRangeData.hpp>
#include <com/sun/star/sheet/XCellSeries.hpp>
#include <com/sun/star/sheet/XSpreadsheetDocument.hpp>
#include <com/sun/star/sheet/XSpreadsheets.hpp>
#include <com/sun/star/table/XCell.hpp>
#include <com/sun/star/table/XCellRange.hpp>
#include <rtl/ustring.hxx>

#include "isentra/surface/call.hpp"
#include "isentra/surface/catalogue.hpp"
#include "calc_test.hxx"

namespace isentra::calctest {
namespace {

using css::uno::Any;
using css::uno::Reference;
using css::uno::Sequence;
using css::uno::UNO_QUERY_THROW;
using Clock = std::chrono::steady_clock;
using rtl::OUString;
namespace cat = isentra::catalogue;

int env_int(const char* name, int def) {
    const char* v = std::getenv(name);
    return v && *v ? std::max(1, std::atoi(v)) : def;
}

OUString ou(const std::string& s) { return OUString::createFromAscii(s.c_str()); }

// Varied states (MPa, degC): p 0.1 .. 20.08 MPa, T 20 .. 598 degC; the two
// periods are coprime, so the pairs cover compressed liquid, superheated
// steam and region 3.
double p_of(int i) { return 0.1 + (i % 1000) * 0.02; }
double t_of(int i) { return 20.0 + (i % 997) * 0.58; }

struct Doc {
    Reference<css::lang::XComponent> comp;
    Reference<css::sheet::XSpreadsheet> sheet;
    Reference<css::sheet::XCalculatable> calc;
};

Doc open_doc() {
    Doc d;
    d.comp = Office::get().new_calc_document();
    Reference<css::sheet::XSpreadsheetDocument> sdoc(d.comp, UNO_QUERY_THROW);
    Reference<css::container::XIndexAccess> sheets(sdoc->getSheets(), UNO_QUERY_THROW);
    d.sheet.set(sheets->getByIndex(0), UNO_QUERY_THROW);
    d.calc.set(d.comp, UNO_QUERY_THROW);
    d.calc->enableAutomaticCalculation(false);
    return d;
}

void fill_inputs(const Doc& d, int n) {
    Sequence<Sequence<Any>> data(n);
    Sequence<Any>* rows = data.getArray();
    for (int i = 0; i < n; ++i) {
        rows[i].realloc(2);
        rows[i].getArray()[0] <<= p_of(i);
        rows[i].getArray()[1] <<= t_of(i);
    }
    Reference<css::sheet::XCellRangeData> r(d.sheet->getCellRangeByName(ou("A1:B" + std::to_string(n))),
                                            UNO_QUERY_THROW);
    r->setDataArray(data);
}

// One formula per row in column C: C1 typed, then filled down as a user
// drags it (relative references follow). setFormulaArray with 100,000
// different formulas is quadratic in Calc 7.4 (40 s for 30,000 rows).
void fill_column(const Doc& d, int n, const std::string& first) {
    d.sheet->getCellByPosition(2, 0)->setFormula(ou(first));
    Reference<css::sheet::XCellSeries> r(d.sheet->getCellRangeByName(ou("C1:C" + std::to_string(n))), UNO_QUERY_THROW);
    r->fillAuto(css::sheet::FillDirection_TO_BOTTOM, 1);
}

// One array formula over C1:Cn.
void array_formula(const Doc& d, int n, const std::string& formula) {
    Reference<css::sheet::XArrayFormulaRange> r(d.sheet->getCellRangeByName(ou("C1:C" + std::to_string(n))),
                                                UNO_QUERY_THROW);
    r->setArrayFormula(ou(formula));
}

// Best of `repeat` hard recalculations, in seconds.
double time_recalc(const Doc& d, int repeat) {
    double best = 1e300;
    for (int k = 0; k < repeat; ++k) {
        const auto t0 = Clock::now();
        d.calc->calculateAll();
        best = std::min(best, std::chrono::duration<double>(Clock::now() - t0).count());
    }
    return best;
}

// Checks a few result cells so that a broken run does not print fast nonsense.
int errors_in(const Doc& d, int n) {
    int e = 0;
    for (int i : {0, 1, n / 3, n / 2, n - 1})
        if (d.sheet->getCellByPosition(2, i)->getError() != 0) ++e;
    return e;
}

struct Row {
    std::string what;
    double seconds;  // minus the baseline
    int errors;
};

TEST(CalcBench, HundredThousandCells) {
    const int n = env_int("ISENTRA_BENCH_ROWS", 100000);
    const int repeat = env_int("ISENTRA_BENCH_REPEAT", 3);
    std::printf("calc_bench: %d rows, best of %d calculateAll() each, LibreOffice headless\n", n, repeat);

    const char* only = std::getenv("ISENTRA_BENCH_ONLY");  // e.g. "array": only the phases whose name has it
    auto run = [&](const std::string& what, const std::function<void(const Doc&)>& fill, double baseline) {
        if (only && *only && fill && what.find(only) == std::string::npos) return Row{what, 1e-300, 0};
        Doc d = open_doc();
        fill_inputs(d, n);
        const auto t0 = Clock::now();
        if (fill) fill(d);
        const double setup = std::chrono::duration<double>(Clock::now() - t0).count();
        const double t = time_recalc(d, repeat);
        const int e = fill ? errors_in(d, n) : 0;
        if (fill) {
            const OUString last = d.sheet->getCellByPosition(2, n - 1)->getFormula();
            std::printf("    last cell: %s = %.10g\n", OUStringToOString(last, RTL_TEXTENCODING_UTF8).getStr(),
                        d.sheet->getCellByPosition(2, n - 1)->getValue());
        }
        std::printf("  %-44s recalc %8.3f s  (setup %6.2f s)%s\n", what.c_str(), t, setup,
                    e ? "  SOME SAMPLED CELLS ARE ERRORS" : "");
        Office::close(d.comp);
        return Row{what, t - baseline, e};
    };

    const Row base = run("inputs only (baseline)", nullptr, 0.0);
    const double b = base.seconds;
    const Row hpt = run("=STEAM.H.PT(An;Bn), one cell per state",
                        [&](const Doc& d) {
                            fill_column(d, n, "=STEAM.H.PT(A1;B1)");
                        },
                        b);
    const Row ver = run("=STEAM.VERSION()",
                        [&](const Doc& d) { fill_column(d, n, "=STEAM.VERSION()"); },
                        b);
    const Row rise = run("=STEAM.FWH.RISE(Bn;Bn)",
                         [&](const Doc& d) {
                             fill_column(d, n, "=STEAM.FWH.RISE(B1;B1)");
                         },
                         b);
    const Row sqrt = run("=SQRT(An) (built-in)",
                         [&](const Doc& d) {
                             fill_column(d, n, "=SQRT(A1)");
                         },
                         b);
    const Row arr = run("{=STEAM.H.PT(A1:An;B1:Bn)}, one array formula",
                        [&](const Doc& d) {
                            const std::string m = std::to_string(n);
                            array_formula(d, n, "=STEAM.H.PT(A1:A" + m + ";B1:B" + m + ")");
                        },
                        b);
    const Row arr_rise = run("{=STEAM.FWH.RISE(B1:Bn;B1:Bn)}, array formula",
                             [&](const Doc& d) {
                                 const std::string m = std::to_string(n);
                                 array_formula(d, n, "=STEAM.FWH.RISE(B1:B" + m + ";B1:B" + m + ")");
                             },
                             b);
    const Row arr_sqrt = run("{=SQRT(A1:An)}, built-in array formula",
                             [&](const Doc& d) { array_formula(d, n, "=SQRT(A1:A" + std::to_string(n) + ")"); },
                             b);

    // Calc's floor for any array result of this size: an array formula that
    // computes nothing and only copies the input column into its result.
    const Row arr_copy = run("{=A1:An}, array formula of plain references",
                             [&](const Doc& d) { array_formula(d, n, "=A1:A" + std::to_string(n)); },
                             b);

    // The same work in this process: isentra::call() per state (as the glue
    // calls it for one cell) and once over the whole column.
    const cat::Function& fh = *cat::find("STEAM.H.PT");
    const cat::Function& fv = *cat::find("STEAM.VERSION");
    const cat::Function& fr = *cat::find("STEAM.FWH.RISE");
    auto best_of = [&](const std::function<double()>& f) {
        double best = 1e300, sink = 0;
        for (int k = 0; k < repeat; ++k) {
            const auto t0 = Clock::now();
            sink += f();
            best = std::min(best, std::chrono::duration<double>(Clock::now() - t0).count());
        }
        if (sink == 12345.678) std::printf(" ");
        return best;
    };
    const double core_hpt = best_of([&] {
        double s = 0;
        for (int i = 0; i < n; ++i) {
            std::vector<Table> in{Table::scalar(Value::of(p_of(i))), Table::scalar(Value::of(t_of(i)))};
            s += call(fh, in).cells[0].number;
        }
        return s;
    });
    const double core_ver = best_of([&] {
        double s = 0;
        for (int i = 0; i < n; ++i) s += static_cast<double>(call(fv, {}).cells[0].text.size());
        return s;
    });
    const double core_rise = best_of([&] {
        double s = 0;
        for (int i = 0; i < n; ++i) {
            std::vector<Table> in{Table::scalar(Value::of(t_of(i))), Table::scalar(Value::of(t_of(i)))};
            s += call(fr, in).cells[0].number;
        }
        return s;
    });
    const double core_arr = best_of([&] {
        Table p, t;
        p.rows = t.rows = static_cast<std::size_t>(n);
        p.cells.assign(static_cast<std::size_t>(n), Value{});
        t.cells.assign(static_cast<std::size_t>(n), Value{});
        for (int i = 0; i < n; ++i) {
            p.cells[static_cast<std::size_t>(i)] = Value::of(p_of(i));
            t.cells[static_cast<std::size_t>(i)] = Value::of(t_of(i));
        }
        return call(fh, {p, t}).cells[0].number;
    });

    // The glue's own work for the array formula, replayed here with the same
    // UNO types: ranges as sequence<sequence<any>> -> Tables -> call() ->
    // sequence<sequence<any>> (the pattern of extension/src/addin.cxx).
    Sequence<Sequence<Any>> in_p(n), in_t(n);
    for (int i = 0; i < n; ++i) {
        in_p.getArray()[i] = Sequence<Any>(1);
        in_p.getArray()[i].getArray()[0] <<= p_of(i);
        in_t.getArray()[i] = Sequence<Any>(1);
        in_t.getArray()[i].getArray()[0] <<= t_of(i);
    }
    const Any any_p(in_p), any_t(in_t);
    auto glue_convert_in = [&](const Any& a) {
        Sequence<Sequence<Any>> sa;
        a >>= sa;
        const Sequence<Sequence<Any>>& csa = sa;  // const access: no copy-on-write
        Table t;
        t.rows = static_cast<std::size_t>(csa.getLength());
        t.cols = 1;
        t.cells.assign(t.rows, Value{});
        for (sal_Int32 r = 0; r < csa.getLength(); ++r) {
            double v = 0;
            csa[r][0] >>= v;
            t.cells[static_cast<std::size_t>(r)] = Value::of(v);
        }
        return t;
    };
    // One cell's two arguments, as Calc passes them to a required argument
    // (1x1 sequence<sequence<any>>) and to an `any`, turned into Tables.
    std::vector<Sequence<Sequence<Any>>> cell_seq(static_cast<std::size_t>(n));
    std::vector<Any> cell_any(static_cast<std::size_t>(n));
    for (int i = 0; i < n; ++i) {
        Sequence<Any> one(1);
        one.getArray()[0] <<= p_of(i);
        cell_seq[static_cast<std::size_t>(i)] = Sequence<Sequence<Any>>(&one, 1);
        cell_any[static_cast<std::size_t>(i)] <<= p_of(i);
    }
    const double glue_cell_seq = best_of([&] {
        double s = 0;
        for (int i = 0; i < n; ++i) {
            const Sequence<Sequence<Any>>& r = cell_seq[static_cast<std::size_t>(i)];
            double v = 0;
            r[0][0] >>= v;
            std::vector<Table> in{Table::scalar(Value::of(v)), Table::scalar(Value::of(v))};
            s += in[0].cells[0].number;
        }
        return s;
    });
    const double glue_cell_any = best_of([&] {
        double s = 0;
        for (int i = 0; i < n; ++i) {
            double v = 0;
            cell_any[static_cast<std::size_t>(i)] >>= v;
            std::vector<Table> in{Table::scalar(Value::of(v)), Table::scalar(Value::of(v))};
            s += in[0].cells[0].number;
        }
        return s;
    });

    double glue_in = 0, glue_call = 0, glue_out = 0;
    {
        double bi = 1e300, bc = 1e300, bo = 1e300;
        for (int k = 0; k < repeat; ++k) {
            const auto t0 = Clock::now();
            std::vector<Table> in{glue_convert_in(any_p), glue_convert_in(any_t)};
            const auto t1 = Clock::now();
            const Table r = call(fh, in);
            const auto t2 = Clock::now();
            Sequence<Sequence<Any>> out(static_cast<sal_Int32>(r.rows));
            Sequence<Any>* rows = out.getArray();
            for (std::size_t i = 0; i < r.rows; ++i) {
                rows[i].realloc(static_cast<sal_Int32>(r.cols));
                Any* cells = rows[i].getArray();
                for (std::size_t j = 0; j < r.cols; ++j) cells[j] = Any(r.at(i, j).number);
            }
            const Any result(out);
            const auto t3 = Clock::now();
            bi = std::min(bi, std::chrono::duration<double>(t1 - t0).count());
            bc = std::min(bc, std::chrono::duration<double>(t2 - t1).count());
            bo = std::min(bo, std::chrono::duration<double>(t3 - t2).count());
        }
        glue_in = bi;
        glue_call = bc;
        glue_out = bo;
    }

    auto us = [&](double s) { return s / n * 1e6; };
    std::printf("\nper cell (recalc minus the inputs-only baseline %.3f s):\n", b);
    for (const Row* r : {&hpt, &ver, &rise, &sqrt, &arr, &arr_rise, &arr_sqrt, &arr_copy})
        std::printf("  %-44s %8.3f us%s\n", r->what.c_str(), us(r->seconds), r->errors ? "  (errors!)" : "");
    std::printf("\nin this process, isentra::call() (core + call layer, no UNO, no Calc):\n");
    std::printf("  %-44s %8.3f us\n", "H.PT per state, one call each", us(core_hpt));
    std::printf("  %-44s %8.3f us\n", "VERSION, one call each", us(core_ver));
    std::printf("  %-44s %8.3f us\n", "FWH.RISE, one call each", us(core_rise));
    std::printf("  %-44s %8.3f us\n", "H.PT, one call over the column", us(core_arr));
    std::printf("  %-44s %8.3f us\n", "glue replay: 2 ranges of any -> Tables", us(glue_in));
    std::printf("  %-44s %8.3f us\n", "glue replay: call() over the column", us(glue_call));
    std::printf("  %-44s %8.3f us\n", "glue replay: Table -> sequence<sequence<any>>", us(glue_out));
    std::printf("  %-44s %8.3f us\n", "one cell, 2 args as 1x1 arrays -> Tables", us(glue_cell_seq));
    std::printf("  %-44s %8.3f us\n", "one cell, 2 args as any -> Tables", us(glue_cell_any));
    std::printf("\nratios:\n");
    std::printf("  H.PT cell / VERSION cell            %6.2f\n", hpt.seconds / ver.seconds);
    std::printf("  H.PT cell / FWH.RISE cell           %6.2f\n", hpt.seconds / rise.seconds);
    std::printf("  VERSION cell / SQRT cell            %6.2f\n", ver.seconds / sqrt.seconds);
    std::printf("  FWH.RISE cell / SQRT cell           %6.2f\n", rise.seconds / sqrt.seconds);
    std::printf("  H.PT cell / SQRT cell               %6.2f\n", hpt.seconds / sqrt.seconds);
    std::printf("  H.PT per cell / per array element   %6.2f   (target >= 10)\n", hpt.seconds / arr.seconds);
    const double addin_call = rise.seconds - sqrt.seconds;  // what an add-in call costs beyond a built-in
    std::printf("  our code in a FWH.RISE cell (call() %.3f us) / add-in call overhead beyond SQRT (%.3f us): %.0f %%"
                "   (target <= 20 %%)\n",
                us(core_rise), us(addin_call), 100.0 * core_rise / addin_call);
    std::printf("  our code in a VERSION cell (call() %.3f us) / VERSION cell beyond SQRT (%.3f us): %.0f %%\n",
                us(core_ver), us(ver.seconds - sqrt.seconds), 100.0 * core_ver / (ver.seconds - sqrt.seconds));
    std::printf("  H.PT array element / FWH.RISE array element  %6.2f\n", arr.seconds / arr_rise.seconds);
    std::printf("  H.PT array element / SQRT array element      %6.2f\n", arr.seconds / arr_sqrt.seconds);
    std::printf("  H.PT per cell / {=A1:An} per element  %6.2f   (the most any array function could reach)\n",
                hpt.seconds / arr_copy.seconds);
    EXPECT_EQ(hpt.errors + ver.errors + rise.errors + sqrt.errors + arr.errors, 0);
}

}  // namespace
}  // namespace isentra::calctest
