#!/usr/bin/python3
# SPDX-License-Identifier: MPL-2.0
"""Writes the turbine section efficiency test workbook (OpenDocument).

    gen_turbine_workbook.py OUTDIR

writes into OUTDIR:
  harrow-fen-unit2-turbine-test.ods   the demo: readings of a (fictional) periodic
                                      test of Harrow Fen Power Station, Unit 2
  isentra-turbine-section-test.ots    the same workbook without readings: the
                                      template the extension installs

This script is the reviewable source of both files (standard library only;
the build runs it with /usr/bin/python3). Every result cell is a formula of
the Isentra add-in (stored names ORG.ISENTRA.STEAMFUNCTIONS.<method>, shown in
Calc as STEAM.<NAME>); the files carry no cached results, so Calc computes
them on load. The units cell (Test.B5, "SI" or "US") is passed to every
call, so it switches the whole workbook, the chart included.

Harrow Fen Power Station is a made-up plant; the readings are invented.
"""
import os
import sys

sys.dont_write_bytecode = True  # keep templates/ free of __pycache__
from odf_writer import (ADDIN, MIME_ODS, MIME_OTS, NS, COMMON_STYLES, CELL_STYLES, col_name, col_index,  # noqa: E402
                        c_text, c_num, c_formula, c_empty, c_blank, row, grid_rows, table_style, column_style,
                        content_xml as document_content, styles_xml, meta_xml, write_package)
from xml.sax.saxutils import quoteattr  # noqa: E402

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
U_P, U_T = 0.0025, 1.0                # instrument uncertainties: fraction of reading, K

SECTIONS = ("HP", "IP", "LP")
# Reading columns per section on the Test sheet: p_in, T_in, p_out, T_out.
RCOL = {"HP": "CDEF", "IP": "GHIJ", "LP": "KLMN"}
# Result columns per section: efficiency, test minus design, uncertainty.
ECOL = {"HP": "CDE", "IP": "FGH", "LP": "IJK"}
DESIGN_CELL = {"HP": "$B$8", "IP": "$B$9", "LP": "$B$10"}

# Helper sheet layout (rows 2.. hold data; row 1 the series names).
# State points: one row per test point, per section h_in, s_in, h_out, s_out.
SCOL = {"HP": "BCDE", "IP": "FGHI", "LP": "JKLM"}
# Expansion lines: per section an (s, h) column pair; per test point the
# inlet row, the exhaust row and an empty row (a gap in the line).
XCOL = {"HP": "OP", "IP": "QR", "LP": "ST"}
# Saturated-vapour line over a temperature grid (degC in column U).
SAT_T = list(range(60, 341, 10))
# Isobars of the section pressures at test point T1: (name, reading column on
# Test, the state point whose entropy centres the s grid).
ISOBARS = [
    ("HP inlet", "C", ("HP", 1)),
    ("HP exhaust", "E", ("HP", 3)),
    ("IP inlet", "G", ("IP", 1)),
    ("crossover", "I", ("IP", 3)),
    ("LP exhaust", "M", ("LP", 3)),
]
ISO_N = 21
ISO_COL0 = 26  # column Z: first isobar's s column (then h, then the next isobar)


def p_unit():
    return f'IF(UPPER({UNITS})="US";"psia";"MPa")'


def t_unit():
    return f'IF(UPPER({UNITS})="US";"°F";"°C")'


# ---------------------------------------------------------------- Test sheet
def test_sheet(readings, chart_cell_xml):
    u = "[.$B$5]"
    rows = []
    rows.append(row([c_text("Harrow Fen Power Station, Unit 2 (a fictional plant): turbine section efficiency test" if readings
                            else "Turbine section efficiency test (HP, IP and LP sections, enthalpy-drop method)", "title")]))
    rows.append(row([c_text("Periodic performance test, invented readings for the Isentra demo; four steady test points at"
                            " decreasing load, reheat unit with a superheated crossover to the LP turbine." if readings
                            else "Enter the test readings (absolute pressures) in the yellow cells; the grey cells and the chart"
                            " are calculated by the Isentra add-in (IAPWS-IF97).")]))
    rows.append(row([c_text("CAUTION: results used for operation or design decisions are to be checked under local codes"
                            " by a licensed engineer. Isentra comes without any warranty.", "caution")]))
    rows.append(row([c_empty()]))
    rows.append(row([c_text("Units for the whole workbook", "label"), c_text("SI", "input"),
                     c_text("SI or US. SI: MPa (absolute), °C, kJ/kg, kJ/(kg·K).  US: psia, °F, Btu/lbm, Btu/(lbm·°F).")]))
    rows.append(row([c_text("Pressure uncertainty, fraction", "label"), c_num(U_P, "input"),
                     c_text("instrument uncertainty as a fraction of the reading (0.0025 = 0.25 %)")]))
    rows.append(row([c_text("Temperature uncertainty", "label"), c_num(U_T, "input"),
                     c_formula(f'IF(UPPER({u})="US";"°F";"K")')]))
    for s, d in zip(SECTIONS, DESIGN):
        rows.append(row([c_text(f"Design efficiency, {s} section", "label"), c_num(d, "input_pct")]))
    rows.append(row([c_empty()]))
    rows.append(row([c_text("Readings (inlet and exhaust of each section)", "subtitle")]))
    head = [c_text("Point", "head"), c_text("Load", "head")]
    for s in SECTIONS:
        head += [c_text(f"{s} inlet p", "head"), c_text(f"{s} inlet T", "head"),
                 c_text(f"{s} exhaust p", "head"), c_text(f"{s} exhaust T", "head")]
    rows.append(row(head))
    units_row = [c_empty(), c_text("MW", "unit")]
    for _ in SECTIONS:
        units_row += [c_formula(p_unit().replace(UNITS, u), "unit", True), c_formula(t_unit().replace(UNITS, u), "unit", True)] * 2
    rows.append(row(units_row))
    for i in range(POINTS):
        if readings:
            r = readings[i]
            cells = [c_text(r[0], "label"), c_num(r[1], "input")] + [c_num(v, "input") for v in r[2:]]
        else:
            cells = [c_text(f"T{i + 1}", "label")] + [c_blank("input")] * 13
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
            ok = f"COUNT([.{RCOL[s][0]}{r}:.{RCOL[s][3]}{r}])=4"
            e = ECOL[s]
            cells.append(c_formula(f'IF({ok};{ADDIN}TURBINEEFFPTPT({a};{b};{c};{d};{u});"")', "result_pct"))
            cells.append(c_formula(f'IF({ok};[.{e[0]}{RES_ROW + i}]-[.{DESIGN_CELL[s]}];"")', "result_dpct"))
            cells.append(c_formula(f'IF({ok};{ADDIN}TURBINEEFFUNCPTPT({a};{b};{c};{d};[.$B$6];[.$B$7];[.$B$6];[.$B$7];{u});"")',
                                   "result_pct"))
        rows.append(row(cells))
    rows.append(row([c_text("Test - design is in percentage points. The uncertainty is the root-sum-square of sensitivity times"
                            " instrument uncertainty (ASME PTC 19.1) for the instrument uncertainties above; it has their coverage.")]))
    rows.append(row([c_text("Calculated with", "label"), c_formula(f"{ADDIN}VERSION()", "result", True)]))
    rows.append(row([c_empty()]))
    rows.append(row([c_text("h-s chart: saturated-vapour line, isobars of the section pressures at T1, and each section's"
                            " expansion line (inlet to exhaust) for every test point", "subtitle")]))
    rows.append(row([chart_cell_xml]))
    cols = ('<table:table-column table:style-name="coA"/><table:table-column table:style-name="coB"/>'
            '<table:table-column table:style-name="coC" table:number-columns-repeated="12"/>')
    return (f'<table:table table:name="{TEST}" table:style-name="ta_test">{cols}' + "".join(rows) + "</table:table>")


# ---------------------------------------------------------------- helper sheet
def data_sheet():
    """Hidden helper sheet. Rows: 1 = series names, 2.. = values."""
    nrows = max(len(SAT_T), ISO_N, POINTS * 3) + 1
    grid = {}  # (row, colname) -> cell xml

    def put(r, c, xml):
        grid[(r, col_index(c))] = xml

    put(1, "A", c_text("Point"))
    for s in SECTIONS:
        for c, n in zip(SCOL[s], ("h_in", "s_in", "h_out", "s_out")):
            put(1, c, c_text(f"{s} {n}"))
    for i in range(POINTS):
        r, tr = 2 + i, FIRST_ROW + i
        put(r, "A", c_formula(f"[$Test.A{tr}]", string=True))
        for s in SECTIONS:
            a, b, c, d = (f"[$Test.{x}{tr}]" for x in RCOL[s])
            ok = f"COUNT([$Test.{RCOL[s][0]}{tr}:.{RCOL[s][3]}{tr}])=4"
            hi, si, ho, so = SCOL[s]
            put(r, hi, c_formula(f"IF({ok};{ADDIN}HPT({a};{b};{UNITS});NA())"))
            put(r, si, c_formula(f"IF({ok};{ADDIN}SPT({a};{b};{UNITS});NA())"))
            put(r, ho, c_formula(f"IF({ok};{ADDIN}HPT({c};{d};{UNITS});NA())"))
            put(r, so, c_formula(f"IF({ok};{ADDIN}SPT({c};{d};{UNITS});NA())"))
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
    # Saturated-vapour line: the grid in degC, converted to degF for US.
    put(1, "U", c_text("T grid [°C]"))
    put(1, "V", c_text("T"))
    put(1, "W", c_text("s_g"))
    put(1, "X", c_text("saturated vapour"))
    for k, t in enumerate(SAT_T):
        r = 2 + k
        put(r, "U", c_num(t))
        put(r, "V", c_formula(f'IF(UPPER({UNITS})="US";1.8*[.U{r}]+32;[.U{r}])'))
        put(r, "W", c_formula(f"{ADDIN}SGT([.V{r}];{UNITS})"))
        put(r, "X", c_formula(f"{ADDIN}HGT([.V{r}];{UNITS})"))
    # Isobars: s grid centred on the entropy of the state at that pressure (T1),
    # +-4.5 % of it (the same relative span in SI and US units).
    for j, (name, pcol, (sec, k)) in enumerate(ISOBARS):
        cs = col_name(ISO_COL0 + 2 * j)
        ch = col_name(ISO_COL0 + 2 * j + 1)
        centre = f"[.{SCOL[sec][k]}2]"
        pref = f"[$Test.{pcol}{FIRST_ROW}]"
        put(1, cs, c_text(f"{name} s"))
        put(1, ch, c_formula(f'"{name} isobar "&IF(ISNUMBER({pref});TEXT({pref};"0.000")&" "&{p_unit()};"")', string=True))
        for n in range(ISO_N):
            r = 2 + n
            frac = -0.045 + 0.09 * n / (ISO_N - 1)
            put(r, cs, c_formula(f"{centre}*(1+({frac!r}))"))
            put(r, ch, c_formula(f"IF(ISNUMBER([.{cs}{r}]);{ADDIN}HPS({pref};[.{cs}{r}];{UNITS});NA())"))
    rows = grid_rows(grid, nrows, ISO_COL0 + 2 * len(ISOBARS) - 1)
    return f'<table:table table:name="{DATA}" table:style-name="ta_hidden">' + "".join(rows) + "</table:table>"


def series_list():
    """(label cell, x range, y range, style) for the chart, all on the helper sheet."""
    out = []
    last = 1 + len(SAT_T)
    out.append((f"{DATA}.X1", f"{DATA}.W2:{DATA}.W{last}", f"{DATA}.X2:{DATA}.X{last}", "sat"))
    for j in range(len(ISOBARS)):
        cs = col_name(ISO_COL0 + 2 * j)
        ch = col_name(ISO_COL0 + 2 * j + 1)
        out.append((f"{DATA}.{ch}1", f"{DATA}.{cs}2:{DATA}.{cs}{1 + ISO_N}", f"{DATA}.{ch}2:{DATA}.{ch}{1 + ISO_N}", f"iso{j}"))
    last = 1 + 3 * POINTS
    for s in SECTIONS:
        cs, ch = XCOL[s]
        out.append((f"{DATA}.{ch}1", f"{DATA}.{cs}2:{DATA}.{cs}{last}", f"{DATA}.{ch}2:{DATA}.{ch}{last}", f"exp{s}"))
    return out


# ---------------------------------------------------------------- chart object
SERIES_LOOK = {  # colour, width, dash, symbol
    "sat": ("#000000", "0.06cm", False, False),
    "iso0": ("#7f7f7f", "0.03cm", True, False),
    "iso1": ("#7f7f7f", "0.03cm", True, False),
    "iso2": ("#a0a0a0", "0.03cm", True, False),
    "iso3": ("#7f7f7f", "0.03cm", True, False),
    "iso4": ("#a0a0a0", "0.03cm", True, False),
    "expHP": ("#c00000", "0.05cm", False, True),
    "expIP": ("#0050c0", "0.05cm", False, True),
    "expLP": ("#00802a", "0.05cm", False, True),
}


def chart_content():
    styles = ['<style:style style:name="chA" style:family="chart"><style:graphic-properties draw:stroke="none" draw:fill-color="#ffffff"/></style:style>',
              '<style:style style:name="chT" style:family="chart"><style:text-properties fo:font-size="11pt" fo:font-weight="bold"/></style:style>',
              '<style:style style:name="chAx" style:family="chart"><style:chart-properties chart:display-label="true"/>'
              '<style:text-properties fo:font-size="8pt"/></style:style>',
              # y axis from 1000 (kJ/kg or Btu/lbm): Calc would otherwise start it at 0; 1000 suits both unit systems.
              '<style:style style:name="chAy" style:family="chart"><style:chart-properties chart:display-label="true" '
              'chart:minimum="1000"/><style:text-properties fo:font-size="8pt"/></style:style>',
              '<style:style style:name="chAt" style:family="chart"><style:text-properties fo:font-size="9pt"/></style:style>',
              '<style:style style:name="chL" style:family="chart"><style:text-properties fo:font-size="8pt"/></style:style>',
              '<style:style style:name="chP" style:family="chart"><style:chart-properties chart:lines="true" '
              'chart:symbol-type="none" chart:interpolation="none" chart:treat-empty-cells="leave-gap"/></style:style>',
              '<style:style style:name="chW" style:family="chart"><style:graphic-properties draw:fill-color="#ffffff"/></style:style>',
              '<style:style style:name="chG" style:family="chart"><style:graphic-properties svg:stroke-color="#dddddd"/></style:style>',
              '<draw:stroke-dash draw:name="dash1" draw:style="rect" draw:dots1="1" draw:dots1-length="0.15cm" draw:distance="0.1cm"/>']
    series = []
    for lab, xr, yr, key in series_list():
        colour, width, dash, sym = SERIES_LOOK[key]
        stroke = 'draw:stroke="dash" draw:stroke-dash="dash1"' if dash else 'draw:stroke="solid"'
        symbol = ('chart:symbol-type="named-symbol" chart:symbol-name="circle" chart:symbol-width="0.15cm" chart:symbol-height="0.15cm"'
                  if sym else 'chart:symbol-type="none"')
        styles.append(f'<style:style style:name="s_{key}" style:family="chart"><style:chart-properties {symbol}/>'
                      f'<style:graphic-properties {stroke} svg:stroke-width="{width}" svg:stroke-color="{colour}" '
                      f'draw:fill-color="{colour}"/></style:style>')
        series.append(f'<chart:series chart:style-name="s_{key}" chart:class="chart:scatter" '
                      f'chart:values-cell-range-address="{yr}" chart:label-cell-address="{lab}">'
                      f'<chart:domain table:cell-range-address="{xr}"/></chart:series>')
    body = (f'<chart:chart svg:width="24cm" svg:height="13cm" chart:class="chart:scatter" chart:style-name="chA">'
            f'<chart:title chart:style-name="chT"><text:p>h-s chart of the section expansions</text:p></chart:title>'
            f'<chart:legend chart:legend-position="end" style:legend-expansion="high" chart:style-name="chL"/>'
            f'<chart:plot-area chart:style-name="chP" chart:data-source-has-labels="none">'
            f'<chart:axis chart:dimension="x" chart:name="primary-x" chart:style-name="chAx">'
            f'<chart:title chart:style-name="chAt"><text:p>specific entropy s (kJ/(kg·K) for SI, Btu/(lbm·°F) for US)</text:p></chart:title>'
            f'<chart:grid chart:class="major" chart:style-name="chG"/></chart:axis>'
            f'<chart:axis chart:dimension="y" chart:name="primary-y" chart:style-name="chAy">'
            f'<chart:title chart:style-name="chAt"><text:p>specific enthalpy h (kJ/kg for SI, Btu/lbm for US)</text:p></chart:title>'
            f'<chart:grid chart:class="major" chart:style-name="chG"/></chart:axis>'
            + "".join(series) +
            f'<chart:wall chart:style-name="chW"/></chart:plot-area></chart:chart>')
    return (f'<?xml version="1.0" encoding="UTF-8"?>\n<office:document-content {NS}>'
            f'<office:automatic-styles>{"".join(s for s in styles if not s.startswith("<draw:"))}</office:automatic-styles>'
            f'<office:body><office:chart>{body}</office:chart></office:body></office:document-content>'), \
        "".join(s for s in styles if s.startswith("<draw:"))


def chart_styles(dash_xml):
    return (f'<?xml version="1.0" encoding="UTF-8"?>\n<office:document-styles {NS}>'
            f'<office:styles>{dash_xml}</office:styles></office:document-styles>')


def chart_frame():
    ranges = " ".join(f"{x} {y}" for _, x, y, _ in series_list())
    return ('<table:table-cell><draw:frame draw:z-index="0" draw:name="hs_chart" svg:width="24cm" svg:height="13cm" '
            'svg:x="0cm" svg:y="0.1cm">'
            f'<draw:object draw:notify-on-update-of-ranges={quoteattr(ranges)} xlink:href="./Object 1" '
            'xlink:type="simple" xlink:show="embed" xlink:actuate="onLoad"/></draw:frame></table:table-cell>')


# ---------------------------------------------------------------- document
def content_xml(readings):
    auto = (COMMON_STYLES + "  " + "\n  ".join([
        table_style("ta_test"), table_style("ta_hidden", visible=False),
        column_style("coA", "5.6cm"), column_style("coB", "2.0cm"), column_style("coC", "2.45cm")]) + CELL_STYLES)
    return document_content(auto, test_sheet(readings, chart_frame()) + data_sheet())


def write(path, mimetype, readings, title):
    chart, dash = chart_content()
    write_package(path, mimetype,
                  [("content.xml", content_xml(readings)), ("styles.xml", styles_xml()),
                   ("meta.xml", meta_xml(title, "gen_turbine_workbook.py")),
                   ("Object 1/content.xml", chart), ("Object 1/styles.xml", chart_styles(dash))],
                  [("Object 1/", "application/vnd.oasis.opendocument.chart", True),
                   ("Object 1/content.xml", "text/xml", False), ("Object 1/styles.xml", "text/xml", False)])


def main():
    if len(sys.argv) != 2:
        sys.exit("usage: gen_turbine_workbook.py OUTDIR")
    out = sys.argv[1]
    os.makedirs(out, exist_ok=True)
    write(os.path.join(out, "harrow-fen-unit2-turbine-test.ods"), MIME_ODS,
          READINGS, "Harrow Fen Unit 2 turbine section efficiency test (fictional demo)")
    write(os.path.join(out, "isentra-turbine-section-test.ots"),
          MIME_OTS, None,
          "Turbine section efficiency test (Isentra)")


if __name__ == "__main__":
    main()
