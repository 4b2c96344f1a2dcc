#!/usr/bin/python3
# SPDX-License-Identifier: MPL-2.0
"""Writes the turbine section efficiency test workbook (OpenDocument).

    gen_turbine_workbook.py OUTDIR

writes into OUTDIR:
  harrow-fen-unit2-turbine-test.ods      the demo: readings of a (fictional) periodic
                                         test of Harrow Fen Power Station, Unit 2, SI
  harrow-fen-unit2-turbine-test-us.ods   the same test as a US plant would read it
                                         (psia, °F), units cell "US"
  isentra-turbine-section-test.ots       the workbook without readings, SI: the
  isentra-turbine-section-test-us.ots    templates the extension installs (and US)

This script is the reviewable source of these files (standard library only;
the build runs it with /usr/bin/python3). Every result cell is a formula of
the Isentra add-in (stored names ORG.ISENTRA.STEAMFUNCTIONS.<method>, shown in
Calc as STEAM.<NAME>); the files carry no cached results, so Calc computes
them on load. The units cell (Test.B5) is the unit system the readings are
entered in and the results come out in; it is passed to every call. Each
reading row has one "complete" cell per section (COUNT(...)=4) and every
call sits behind it: =IF($O15; STEAM....; ""), so a blank reading never
reaches the add-in (where it would count as 0).

The chart's axis ranges and titles are fixed per file (an ODF chart can take
neither from a cell): the SI files in kJ/kg and kJ/(kg·K), the US ones in
Btu/lbm and Btu/(lbm·°F); the demos' ranges frame their readings, the
templates' ones suit a typical reheat-turbine expansion.

Harrow Fen Power Station is a made-up plant; the readings are invented.
"""
import os
import sys

sys.dont_write_bytecode = True  # keep templates/ free of __pycache__
from odf_writer import (ADDIN, MIME_ODS, MIME_OTS, COMMON_STYLES, CELL_STYLES, col_name, col_index,  # noqa: E402
                        c_text, c_num, c_formula, c_empty, c_blank, c_span, row, grid_rows, table_style,
                        column_style, content_xml as document_content, styles_xml, meta_xml, write_package,
                        chart_axis_style, chart_series_style, chart_stroke_dash, chart_object, chart_parts,
                        chart_frame_cell)

TEST = "Test"          # first sheet: inputs, readings, results, chart
DATA = "ChartData"     # hidden helper sheet: state points and chart series
UNITS = "[$Test.$B$5]"  # the units cell, as seen from the helper sheet
FIRST_ROW = 15         # first reading row on the Test sheet
POINTS = 4             # test point rows
RES_ROW = 22           # first result row on the Test sheet

# Demo readings: (label, load MW, HP p_in, T_in, p_out, T_out, IP ..., LP ...)
# SI: MPa absolute, degC. Invented for this demo; chosen so that the sections
# come out near 85-92 % as is common for reheat units of this size (common practice).
READINGS = [
    ("T1", 660, 16.62, 538.4, 4.08, 333.1, 3.74, 538.9, 0.962, 342.6, 0.941, 340.8, 0.252, 192.3),
    ("T2", 560, 14.21, 537.6, 3.52, 336.2, 3.23, 538.2, 0.833, 342.6, 0.815, 341.2, 0.219, 193.3),
    ("T3", 460, 11.86, 536.9, 2.96, 339.9, 2.72, 537.4, 0.703, 343.3, 0.688, 340.4, 0.185, 193.6),
    ("T4", 360, 9.58, 535.8, 2.41, 344.1, 2.21, 536.6, 0.574, 344.5, 0.561, 339.5, 0.152, 194.7),
]
DESIGN = (0.880, 0.920, 0.910)        # design section efficiencies HP, IP, LP (invented)
U_P = 0.0025                          # pressure uncertainty, fraction of reading
U_T = {"SI": 1.0, "US": 1.8}          # temperature uncertainty: 1 K = 1.8 °F

# ---------------------------------------------------------------- US readings
PSI_PER_MPA = 1e6 / 6894.757293168361  # 1 psi = 6894.757293168361 Pa (NIST SP 811 (2008) App. B)


def psia(p_mpa):
    """A pressure in psia as a plant gauge would show it: four to five significant figures."""
    v = p_mpa * PSI_PER_MPA
    step = 1.0 if v >= 1000 else 0.1 if v >= 100 else 0.01 if v >= 10 else 0.001
    return round(round(v / step) * step, 3)


def deg_f(t_c, decimals=1):
    """A temperature in °F, read to 0.1 °F (0.01 °F where a method needs it)."""
    return round(t_c * 1.8 + 32, decimals)


def us_readings():
    """The demo test as a US plant's instruments show it (psia, °F): the same steam states,
    rounded to the instruments' resolution, so the results agree with SI within that rounding."""
    out = []
    for r in READINGS:
        vals = list(r[2:])
        out.append((r[0], r[1]) + tuple(psia(v) if j % 2 == 0 else deg_f(v) for j, v in enumerate(vals)))
    return out


SECTIONS = ("HP", "IP", "LP")
# Reading columns per section on the Test sheet: p_in, T_in, p_out, T_out.
RCOL = {"HP": "CDEF", "IP": "GHIJ", "LP": "KLMN"}
# "Readings complete" column per section (TRUE when its four readings are numbers).
OKCOL = {"HP": "O", "IP": "P", "LP": "Q"}
# Result columns per section: efficiency, test minus design, uncertainty.
ECOL = {"HP": "CDE", "IP": "FGH", "LP": "IJK"}
DESIGN_CELL = {"HP": "$B$8", "IP": "$B$9", "LP": "$B$10"}

# Helper sheet layout (rows 2.. hold data; row 1 the series names).
# State points: one row per test point, per section h_in, s_in, h_out, s_out.
SCOL = {"HP": "BCDE", "IP": "FGHI", "LP": "JKLM"}
# Isentropic end points h_s = h(p_out, s_in): one row per test point.
HSCOL = {"HP": "AK", "IP": "AL", "LP": "AM"}
# Expansion lines: per section an (s, h) column pair; per test point the
# inlet row, the exhaust row and an empty row (a gap in the line).
XCOL = {"HP": "OP", "IP": "QR", "LP": "ST"}
# Saturated-vapour line over a temperature grid (degC in column U).
SAT_T = list(range(60, 341, 10))
# Isobars of the section pressures at test point T1: (name, reading column on
# Test, the state point whose entropy the s grid starts from, the grid's span
# as fractions of that entropy). An inlet isobar runs mostly to lower s (down
# the expansion), an exhaust isobar to higher s; each is labelled at its
# high-s end (the label left of it, above the line), inside the chart.
ISOBARS = [
    ("HP inlet", "C", ("HP", 1), (-0.045, 0.015)),
    ("HP exhaust", "E", ("HP", 3), (-0.015, 0.045)),
    ("IP inlet", "G", ("IP", 1), (-0.045, 0.015)),
    ("crossover", "I", ("IP", 3), (-0.015, 0.045)),
    ("LP exhaust", "M", ("LP", 3), (-0.015, 0.045)),
]
ISO_N = 21  # points per isobar: the state itself is point 15 (inlet) or 5 (exhaust), 0-based
ISO_COL0 = 26  # column Z: first isobar's s column (then h, then the next isobar)
# Isentropic expansion lines (inlet -> h_s, then a gap), 3 rows per point and section.
ISL = ("AO", "AP")
# Isentropic end points, one row per point and section.
ISE = ("AR", "AS")
# Test point markers: per point an (s, h) pair, six rows (HP in, HP out, IP in, IP out, LP in, LP out).
MARK_COL0 = col_index("AU")

# Chart axes per file: (s min, s max, s step, h min, h max, h step).
# Demo: chosen to frame the demo's states (h 2824-3547 kJ/kg, s 6.42-7.62
# kJ/(kg·K), the isentropic end points included); the Calc test checks that
# every plotted state lies inside. Template: a typical reheat-turbine
# expansion from main steam down to a wet LP exhaust.
AXES = {
    ("demo", "SI"): (6.2, 7.8, 0.2, 2600.0, 3700.0, 100.0),
    ("demo", "US"): (1.45, 1.85, 0.05, 1100.0, 1600.0, 50.0),
    ("blank", "SI"): (5.6, 8.4, 0.4, 2000.0, 3700.0, 100.0),
    ("blank", "US"): (1.3, 2.0, 0.1, 850.0, 1600.0, 50.0),
}
AXIS_UNITS = {"SI": ("kJ/(kg·K)", "kJ/kg"), "US": ("Btu/(lbm·°F)", "Btu/lbm")}


def p_unit():
    return f'IF(UPPER({UNITS})="US";"psia";"MPa")'


def t_unit():
    return f'IF(UPPER({UNITS})="US";"°F";"°C")'


# ---------------------------------------------------------------- Test sheet
def units_note(system):
    return ("SI or US: the units every reading on this sheet is entered in and every result comes out in."
            " Changing it does not convert the readings already typed; it reads them in the other units."
            " SI: MPa (absolute), °C, kJ/kg, kJ/(kg·K).  US: psia, °F, Btu/lbm, Btu/(lbm·°F)."
            f" The chart's axis titles and ranges are fixed for {system} (see the note under the chart).")


def test_sheet(readings, system, chart_cell_xml):
    u = "[.$B$5]"
    us = system == "US"
    rows = []
    rows.append(row([c_text("Harrow Fen Power Station, Unit 2 (a fictional plant): turbine section efficiency test"
                            + (", US units" if us else "") if readings
                            else "Turbine section efficiency test (HP, IP and LP sections, enthalpy-drop method)", "title")]))
    rows.append(row([c_text("Periodic performance test, invented readings for the Isentra demo; four steady test points at"
                            " decreasing load, reheat unit with a superheated crossover to the LP turbine."
                            + (" The readings are those of the SI demo as US instruments show them (psia, °F)." if us else "")
                            if readings
                            else "Enter the test readings (absolute pressures) in the yellow cells; the grey cells and the chart"
                            " are calculated by the Isentra add-in (IAPWS-IF97).")]))
    rows.append(row([c_text("CAUTION: results used for operation or design decisions are to be checked under local codes"
                            " by a licensed engineer. Isentra comes without any warranty.", "caution")]))
    rows.append(row([c_empty()]))
    rows.append(row([c_text("Units of the readings and results", "label_wrap"), c_text(system, "input"),
                     c_span(units_note(system), "note", 15)]))
    rows.append(row([c_text("Pressure uncertainty, fraction", "label"), c_num(U_P, "input"),
                     c_text("instrument uncertainty as a fraction of the reading (0.0025 = 0.25 %)")]))
    rows.append(row([c_text("Temperature uncertainty", "label"), c_num(U_T[system], "input"),
                     c_formula(f'IF(UPPER({u})="US";"°F";"K")')]))
    for s, d in zip(SECTIONS, DESIGN):
        rows.append(row([c_text(f"Design efficiency, {s} section", "label"), c_num(d, "input_pct")]))
    rows.append(row([c_empty()]))
    rows.append(row([c_text("Readings (inlet and exhaust of each section); a section is calculated when its four"
                            " readings are complete (columns O-Q)", "subtitle")]))
    head = [c_text("Point", "head"), c_text("Load", "head")]
    for s in SECTIONS:
        head += [c_text(f"{s} inlet p", "head"), c_text(f"{s} inlet T", "head"),
                 c_text(f"{s} exhaust p", "head"), c_text(f"{s} exhaust T", "head")]
    head += [c_text(f"{s} readings complete", "head") for s in SECTIONS]
    rows.append(row(head))
    units_row = [c_empty(), c_text("MW", "unit")]
    for _ in SECTIONS:
        units_row += [c_formula(p_unit().replace(UNITS, u), "unit", True), c_formula(t_unit().replace(UNITS, u), "unit", True)] * 2
    units_row += [c_blank("unit")] * 3
    rows.append(row(units_row))
    for i in range(POINTS):
        r = FIRST_ROW + i
        if readings:
            rd = readings[i]
            cells = [c_text(rd[0], "label"), c_num(rd[1], "input")] + [c_num(v, "input") for v in rd[2:]]
        else:
            cells = [c_text(f"T{i + 1}", "label")] + [c_blank("input")] * 13
        cells += [c_formula(f"COUNT([.{RCOL[s][0]}{r}:.{RCOL[s][3]}{r}])=4", "check") for s in SECTIONS]
        rows.append(row(cells))
    rows.append(row([c_empty()]))
    rows.append(row([c_text("Results: enthalpy-drop efficiency (h_in - h_out)/(h_in - h_s), h_s at the exhaust pressure and the inlet entropy", "subtitle")]))
    head = [c_text("Point", "head"), c_text("Load", "head")]
    for s in SECTIONS:
        head += [c_text(f"{s} efficiency", "head"), c_text(f"{s} test - design", "head"), c_text(f"{s} uncertainty ±", "head")]
    rows.append(row(head))
    for i in range(POINTS):
        r = FIRST_ROW + i
        cells = [c_formula(f"[.A{r}]", "label", True), c_formula(f'IF(ISBLANK([.B{r}]);"";[.B{r}])', "result")]
        for s in SECTIONS:
            a, b, c, d = (f"[.{x}{r}]" for x in RCOL[s])
            done = f"[.${OKCOL[s]}{r}]"
            e = ECOL[s]
            cells.append(c_formula(f'IF({done};{ADDIN}TURBINEEFFPTPT({a};{b};{c};{d};{u});"")', "result_pct"))
            cells.append(c_formula(f'IF({done};[.{e[0]}{RES_ROW + i}]-[.{DESIGN_CELL[s]}];"")', "result_dpct"))
            cells.append(c_formula(f'IF({done};{ADDIN}TURBINEEFFUNCPTPT({a};{b};{c};{d};[.$B$6];[.$B$7];[.$B$6];[.$B$7];{u});"")',
                                   "result_pct"))
        rows.append(row(cells))
    rows.append(row([c_span("Test - design is in percentage points. The uncertainty is the root-sum-square of sensitivity times"
                            " instrument uncertainty (ASME PTC 19.1) for the instrument uncertainties above; it has their coverage.",
                            "note", 17)]))
    rows.append(row([c_text("Calculated with", "label"), c_formula(f"{ADDIN}VERSION()", "result", True)]))
    rows.append(row([c_empty()]))
    rows.append(row([c_text("h-s chart: saturated-vapour line, isobars of the section pressures at T1, each section's"
                            " expansion line (inlet to exhaust), the test points, and the isentropic end points", "subtitle")]))
    rows.append(row([chart_cell_xml]))
    for _ in range(33):  # room for the chart (14 cm) before the note under it
        rows.append(row([c_empty()]))
    s_u, h_u = AXIS_UNITS[system]
    other = "isentra-turbine-section-test-us.ots" if system == "SI" else "isentra-turbine-section-test.ots"
    rows.append(row([c_span(f"The chart's axis titles ({h_u}, {s_u}) and its axis ranges are fixed in this file: an"
                            " OpenDocument chart cannot take them from a cell. If you change the units cell, the series"
                            f" follow but the axes do not; start from the {'US' if system == 'SI' else 'SI'} template"
                            f" ({other}) instead, or set the axes under Format > Axis.", "note", 17)]))
    cols = ('<table:table-column table:style-name="coA"/><table:table-column table:style-name="coB"/>'
            '<table:table-column table:style-name="coC" table:number-columns-repeated="15"/>')
    return (f'<table:table table:name="{TEST}" table:style-name="ta_test">{cols}' + "".join(rows) + "</table:table>")


# ---------------------------------------------------------------- helper sheet
def data_sheet():
    """Hidden helper sheet. Rows: 1 = series names, 2.. = values."""
    nrows = max(len(SAT_T), ISO_N, POINTS * 3 * 3) + 1
    grid = {}  # (row, colname) -> cell xml

    def put(r, c, xml):
        grid[(r, col_index(c))] = xml

    put(1, "A", c_text("Point"))
    for s in SECTIONS:
        for c, n in zip(SCOL[s], ("h_in", "s_in", "h_out", "s_out")):
            put(1, c, c_text(f"{s} {n}"))
        put(1, HSCOL[s], c_text(f"{s} h_s"))
    for i in range(POINTS):
        r, tr = 2 + i, FIRST_ROW + i
        put(r, "A", c_formula(f"[$Test.A{tr}]", string=True))
        for s in SECTIONS:
            a, b, c, d = (f"[$Test.{x}{tr}]" for x in RCOL[s])
            done = f"[$Test.${OKCOL[s]}{tr}]"
            hi, si, ho, so = SCOL[s]
            put(r, hi, c_formula(f"IF({done};{ADDIN}HPT({a};{b};{UNITS});NA())"))
            put(r, si, c_formula(f"IF({done};{ADDIN}SPT({a};{b};{UNITS});NA())"))
            put(r, ho, c_formula(f"IF({done};{ADDIN}HPT({c};{d};{UNITS});NA())"))
            put(r, so, c_formula(f"IF({done};{ADDIN}SPT({c};{d};{UNITS});NA())"))
            put(r, HSCOL[s], c_formula(f"IF({done};{ADDIN}HPS({c};[.{si}{r}];{UNITS});NA())"))
    # Expansion lines.
    for s in SECTIONS:
        cs, ch = XCOL[s]
        put(1, cs, c_text(f"{s} s"))
        put(1, ch, c_text(f"{s} section expansion"))
        hi, si, ho, so = SCOL[s]
        for i in range(POINTS):
            r0 = 2 + 3 * i
            put(r0, cs, c_formula(f"[.{si}{2 + i}]"))
            put(r0, ch, c_formula(f"[.{hi}{2 + i}]"))
            put(r0 + 1, cs, c_formula(f"[.{so}{2 + i}]"))
            put(r0 + 1, ch, c_formula(f"[.{ho}{2 + i}]"))
    # Isentropic expansions (inlet straight down to h_s) and their end points.
    put(1, ISL[0], c_text("isentropic s"))
    put(1, ISL[1], c_text("isentropic expansion (at the inlet entropy)"))
    put(1, ISE[0], c_text("end point s"))
    put(1, ISE[1], c_text("isentropic end point h_s(p_out, s_in)"))
    k = 0
    for i in range(POINTS):
        for s in SECTIONS:
            hi, si, _, _ = SCOL[s]
            r0 = 2 + 3 * k
            put(r0, ISL[0], c_formula(f"[.{si}{2 + i}]"))
            put(r0, ISL[1], c_formula(f"[.{hi}{2 + i}]"))
            put(r0 + 1, ISL[0], c_formula(f"[.{si}{2 + i}]"))
            put(r0 + 1, ISL[1], c_formula(f"[.{HSCOL[s]}{2 + i}]"))
            put(2 + k, ISE[0], c_formula(f"[.{si}{2 + i}]"))
            put(2 + k, ISE[1], c_formula(f"[.{HSCOL[s]}{2 + i}]"))
            k += 1
    # Test point markers: the six measured states of each point.
    for i in range(POINTS):
        cs, ch = col_name(MARK_COL0 + 2 * i), col_name(MARK_COL0 + 2 * i + 1)
        tr = FIRST_ROW + i
        put(1, cs, c_text(f"point {i + 1} s"))
        put(1, ch, c_formula(f'[$Test.A{tr}]&IF(ISNUMBER([$Test.B{tr}]);", "&[$Test.B{tr}]&" MW";"")', string=True))
        n = 0
        for s in SECTIONS:
            hi, si, ho, so = SCOL[s]
            for hc, sc in ((hi, si), (ho, so)):
                put(2 + n, cs, c_formula(f"[.{sc}{2 + i}]"))
                put(2 + n, ch, c_formula(f"[.{hc}{2 + i}]"))
                n += 1
    # Saturated-vapour line: the grid in degC, converted by the add-in to the
    # workbook's temperature unit (named in Y1: degC or degF).
    put(1, "U", c_text("T grid [°C]"))
    put(1, "V", c_text("T"))
    put(1, "W", c_text("s_g"))
    put(1, "X", c_text("saturated vapour"))
    put(1, "Y", c_formula(f'IF(UPPER({UNITS})="US";"degF";"degC")', string=True))
    for k, t in enumerate(SAT_T):
        r = 2 + k
        put(r, "U", c_num(t))
        put(r, "V", c_formula(f'{ADDIN}CONVERT([.U{r}];"degC";[.$Y$1])'))
        put(r, "W", c_formula(f"{ADDIN}SGT([.V{r}];{UNITS})"))
        put(r, "X", c_formula(f"{ADDIN}HGT([.V{r}];{UNITS})"))
    # Isobars: an s grid around the entropy of the state at that pressure (T1),
    # a fixed fraction of it either side (the same relative span in SI and US units).
    for j, (name, pcol, (sec, k), (lo, hi)) in enumerate(ISOBARS):
        cs = col_name(ISO_COL0 + 2 * j)
        ch = col_name(ISO_COL0 + 2 * j + 1)
        centre = f"[.{SCOL[sec][k]}2]"
        pref = f"[$Test.{pcol}{FIRST_ROW}]"
        done = f"[$Test.${OKCOL[sec]}${FIRST_ROW}]"  # T1's readings of that section complete
        put(1, cs, c_text(f"{name} s"))
        put(1, ch, c_formula(f'"{name} "&IF(ISNUMBER({pref});TEXT({pref};"General")&" "&{p_unit()};"isobar")', string=True))
        for n in range(ISO_N):
            r = 2 + n
            frac = round(lo + (hi - lo) * n / (ISO_N - 1), 6)
            put(r, cs, c_formula(f"{centre}*(1+({frac!r}))"))
            put(r, ch, c_formula(f"IF({done};{ADDIN}HPS({pref};[.{cs}{r}];{UNITS});NA())"))
    rows = grid_rows(grid, nrows, MARK_COL0 + 2 * POINTS - 1)
    return f'<table:table table:name="{DATA}" table:style-name="ta_hidden">' + "".join(rows) + "</table:table>"


def rng(col, first, last):
    return f"{DATA}.{col}{first}:{DATA}.{col}{last}"


def series_list():
    """(label cell, x range, y range, style key) for the chart, all on the helper sheet, in legend order."""
    out = []
    last = 1 + len(SAT_T)
    out.append((f"{DATA}.X1", rng("W", 2, last), rng("X", 2, last), "sat"))
    for j in range(len(ISOBARS)):
        cs = col_name(ISO_COL0 + 2 * j)
        ch = col_name(ISO_COL0 + 2 * j + 1)
        out.append((f"{DATA}.{ch}1", rng(cs, 2, 1 + ISO_N), rng(ch, 2, 1 + ISO_N), f"iso{j}"))
    last = 1 + 3 * POINTS
    for s in SECTIONS:
        cs, ch = XCOL[s]
        out.append((f"{DATA}.{ch}1", rng(cs, 2, last), rng(ch, 2, last), f"exp{s}"))
    n = POINTS * len(SECTIONS)
    out.append((f"{DATA}.{ISL[1]}1", rng(ISL[0], 2, 1 + 3 * n), rng(ISL[1], 2, 1 + 3 * n), "isl"))
    out.append((f"{DATA}.{ISE[1]}1", rng(ISE[0], 2, 1 + n), rng(ISE[1], 2, 1 + n), "ise"))
    for i in range(POINTS):
        cs, ch = col_name(MARK_COL0 + 2 * i), col_name(MARK_COL0 + 2 * i + 1)
        out.append((f"{DATA}.{ch}1", rng(cs, 2, 7), rng(ch, 2, 7), f"pt{i}"))
    return out


# ---------------------------------------------------------------- chart object
# key: (colour, width, dash, symbol, line). Isobars: one colour and dash each,
# labelled at their right-hand end with their name (pressure and unit).
SERIES_LOOK = {
    "sat": ("#000000", "0.06cm", None, None, True),
    "iso0": ("#8c564b", "0.03cm", "dashL", None, True),
    "iso1": ("#9467bd", "0.03cm", "dashS", None, True),
    "iso2": ("#17becf", "0.03cm", "dashL", None, True),
    "iso3": ("#bcbd22", "0.03cm", "dashS", None, True),
    "iso4": ("#7f7f7f", "0.03cm", "dashD", None, True),
    "expHP": ("#c00000", "0.05cm", None, None, True),
    "expIP": ("#0050c0", "0.05cm", None, None, True),
    "expLP": ("#00802a", "0.05cm", None, None, True),
    "isl": ("#555555", "0.02cm", "dashD", None, True),
    "ise": ("#000000", "0.02cm", None, "x", False),
    "pt0": ("#d62728", "0.02cm", None, "circle", False),
    "pt1": ("#ff7f0e", "0.02cm", None, "square", False),
    "pt2": ("#2ca02c", "0.02cm", None, "diamond", False),
    "pt3": ("#1f77b4", "0.02cm", None, "arrow-up", False),
}
DASHES = [chart_stroke_dash("dashL", 0.3, 0.12), chart_stroke_dash("dashS", 0.1, 0.1), chart_stroke_dash("dashD", 0.04, 0.08)]


def chart_content(kind, system):
    s_min, s_max, s_step, h_min, h_max, h_step = AXES[(kind, system)]
    s_u, h_u = AXIS_UNITS[system]
    styles = ['<style:style style:name="chA" style:family="chart"><style:graphic-properties draw:stroke="none" draw:fill-color="#ffffff"/></style:style>',
              '<style:style style:name="chT" style:family="chart"><style:text-properties fo:font-size="11pt" fo:font-weight="bold"/></style:style>',
              chart_axis_style("chAx", s_min, s_max, s_step),
              chart_axis_style("chAy", h_min, h_max, h_step),
              '<style:style style:name="chAt" style:family="chart"><style:text-properties fo:font-size="9pt"/></style:style>',
              '<style:style style:name="chL" style:family="chart"><style:text-properties fo:font-size="7pt"/></style:style>',
              '<style:style style:name="chP" style:family="chart"><style:chart-properties chart:lines="true" '
              'chart:symbol-type="none" chart:interpolation="none" chart:treat-empty-cells="leave-gap"/></style:style>',
              '<style:style style:name="chW" style:family="chart"><style:graphic-properties draw:fill-color="#ffffff"/></style:style>',
              '<style:style style:name="chG" style:family="chart"><style:graphic-properties svg:stroke-color="#dddddd"/></style:style>',
              # the label at an isobar's end: its series name (the isobar's pressure in the units in use)
              '<style:style style:name="isoLab" style:family="chart"><style:chart-properties chart:data-label-number="none" '
              'chart:data-label-text="false" chart:data-label-symbol="false" chart:data-label-series="true" '
              'chart:label-position="left"/><style:text-properties fo:font-size="7pt"/></style:style>']
    series = []
    for lab, xr, yr, key in series_list():
        colour, width, dash, sym, line = SERIES_LOOK[key]
        styles.append(chart_series_style(f"s_{key}", colour, width, dash, sym, "0.22cm", line))
        points = ""
        if key.startswith("iso") and key[3:].isdigit():
            points = f'<chart:data-point chart:repeated="{ISO_N - 1}"/><chart:data-point chart:style-name="isoLab"/>'
        series.append(f'<chart:series chart:style-name="s_{key}" chart:class="chart:scatter" '
                      f'chart:values-cell-range-address="{yr}" chart:label-cell-address="{lab}">'
                      f'<chart:domain table:cell-range-address="{xr}"/>{points}</chart:series>')
    body = (f'<chart:chart svg:width="24cm" svg:height="14cm" chart:class="chart:scatter" chart:style-name="chA">'
            f'<chart:title chart:style-name="chT"><text:p>h-s chart of the section expansions</text:p></chart:title>'
            f'<chart:legend chart:legend-position="end" style:legend-expansion="high" chart:style-name="chL"/>'
            f'<chart:plot-area chart:style-name="chP" chart:data-source-has-labels="none">'
            f'<chart:axis chart:dimension="x" chart:name="primary-x" chart:style-name="chAx">'
            f'<chart:title chart:style-name="chAt"><text:p>specific entropy s, {s_u}</text:p></chart:title>'
            f'<chart:grid chart:class="major" chart:style-name="chG"/></chart:axis>'
            f'<chart:axis chart:dimension="y" chart:name="primary-y" chart:style-name="chAy">'
            f'<chart:title chart:style-name="chAt"><text:p>specific enthalpy h, {h_u}</text:p></chart:title>'
            f'<chart:grid chart:class="major" chart:style-name="chG"/></chart:axis>'
            + "".join(series) +
            f'<chart:wall chart:style-name="chW"/></chart:plot-area></chart:chart>')
    return chart_object(body, styles, DASHES)


def chart_frame():
    ranges = []
    for _, x, y, _ in series_list():
        ranges += [x, y]
    return chart_frame_cell("hs_chart", "Object 1", ranges, 24, 14)


# ---------------------------------------------------------------- document
def content_xml(readings, system):
    auto = (COMMON_STYLES + "  " + "\n  ".join([
        table_style("ta_test"), table_style("ta_hidden", visible=False),
        column_style("coA", "5.6cm"), column_style("coB", "2.0cm"), column_style("coC", "2.45cm"),
        '<style:style style:name="check" style:family="table-cell" style:data-style-name="Nb"><style:table-cell-properties fo:background-color="#eeeeee"/>'
        '<style:paragraph-properties fo:text-align="center"/><style:text-properties fo:font-size="8pt"/></style:style>',
        '<style:style style:name="note" style:family="table-cell"><style:table-cell-properties fo:wrap-option="wrap"'
        ' style:vertical-align="top"/></style:style>']) + CELL_STYLES)
    return document_content(auto, test_sheet(readings, system, chart_frame()) + data_sheet())


def write(path, mimetype, readings, system, title):
    content, styles = chart_content("demo" if readings else "blank", system)
    parts, manifest = chart_parts("Object 1", content, styles)
    write_package(path, mimetype,
                  [("content.xml", content_xml(readings, system)), ("styles.xml", styles_xml()),
                   ("meta.xml", meta_xml(title, "gen_turbine_workbook.py"))] + parts, manifest)


def main():
    if len(sys.argv) != 2:
        sys.exit("usage: gen_turbine_workbook.py OUTDIR")
    out = sys.argv[1]
    os.makedirs(out, exist_ok=True)
    write(os.path.join(out, "harrow-fen-unit2-turbine-test.ods"), MIME_ODS, READINGS, "SI",
          "Harrow Fen Unit 2 turbine section efficiency test (fictional demo)")
    write(os.path.join(out, "harrow-fen-unit2-turbine-test-us.ods"), MIME_ODS, us_readings(), "US",
          "Harrow Fen Unit 2 turbine section efficiency test, US units (fictional demo)")
    write(os.path.join(out, "isentra-turbine-section-test.ots"), MIME_OTS, None, "SI",
          "Turbine section efficiency test (Isentra)")
    write(os.path.join(out, "isentra-turbine-section-test-us.ots"), MIME_OTS, None, "US",
          "Turbine section efficiency test, US units (Isentra)")


if __name__ == "__main__":
    main()
