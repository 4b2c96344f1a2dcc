#!/usr/bin/python3
# SPDX-License-Identifier: MPL-2.0
"""Writes the plant performance test workbook (OpenDocument).

    gen_plant_workbook.py OUTDIR

writes into OUTDIR:
  harrow-fen-unit2-plant-performance.ods      the demo: invented readings of a routine
                                              test of Harrow Fen Power Station, Unit 2, SI
  harrow-fen-unit2-plant-performance-us.ods   the same test as a US plant reads it
                                              (psia, °F, lbm/h, Btu/kWh), units cell "US"
  isentra-plant-performance.ots               the workbook without readings, SI: the
  isentra-plant-performance-us.ots            templates the extension installs (and US)

Sheets:
  Heaters    closed feedwater heaters (one per column): TTD, DCA, temperature
             rise, test - design, enthalpies, extraction steam flow from the
             heater's energy balance with cascading drains from the heater
             above; chart: TTD and DCA of each heater against design
  Pumps      boiler feed and condensate pump efficiency by the thermodynamic
             method, (h_s - h_in)/(h_out - h_in) with h_s = h(p_out, s_in),
             specific work, hydraulic and absorbed power
  Heat rate  turbine cycle and net unit heat rate and efficiency per test run;
             chart: turbine cycle heat rate against load, test and design

This script is the reviewable source of these files (standard library only;
the build runs it with /usr/bin/python3). Every result is a formula of the
Isentra add-in or plain Calc arithmetic on such results; the files carry no
cached results, so Calc computes them on load. The units cell (Heaters.B5)
is the unit system the readings are entered in and the results come out in,
for all sheets; it is the units argument of every add-in call (the heat rate
calls add " P=MW": the outputs are read in MW).

Blank readings never reach a call (a blank cell would arrive as 0): each
column has "readings complete" cells (TRUE/FALSE, e.g. =COUNT(C10:C15)=6)
under its readings, and every result is =IF(C$21; STEAM....; ""). Where an
optional part of a call applies (cascading drains, reheat), a second IF picks
the call with or without those arguments.

Each sheet is written by its own function (heaters_sheet, pumps_sheet,
heat_rate_sheet) returning a Sheet; document() puts them together with their
charts.

Harrow Fen Power Station is a made-up plant; the readings are invented.
"""
import os
import sys

sys.dont_write_bytecode = True  # keep templates/ free of __pycache__
from odf_writer import (ADDIN, MIME_ODS, MIME_OTS, COMMON_STYLES, CELL_STYLES,  # noqa: E402
                        c_text, c_num, c_formula, c_empty, c_blank, c_span, row, table_style, column_style,
                        content_xml, styles_xml, meta_xml, write_package,
                        chart_axis_style, chart_series_style, chart_stroke_dash, chart_object, chart_parts,
                        chart_frame_cell)
import plant_flow_sheet  # noqa: E402  (the Flow sheet, ISO 5167 flow meters)

UNITS = "[$Heaters.$B$5]"  # the one units cell, as every formula refers to it
US = f'UPPER({UNITS})="US"'

CAUTION = ("CAUTION: these figures evaluate a test; they approve nothing. Before a result feeds a design or an"
           " operating decision, a licensed engineer has to review it against the codes in force where the plant"
           " stands. Isentra is provided without warranty.")

# Units per quantity: (SI label, US label).
UNIT = {
    "p": ("MPa", "psia"), "T": ("°C", "°F"), "dT": ("K", "Δ°F"), "m": ("kg/s", "lbm/h"),
    "h": ("kJ/kg", "Btu/lbm"), "s": ("kJ/(kg·K)", "Btu/(lbm·°F)"), "hr": ("kJ/kWh", "Btu/kWh"),
    "kW": ("kW", "kW"), "MW": ("MW", "MW"), "-": ("", ""), "%": ("%", "%"), "name": ("", ""),
    "check": ("", ""), "units": ("", ""),
}

# ---------------------------------------------------------------- US readings
PSI_PER_MPA = 1e6 / 6894.757293168361   # 1 psi = 6894.757293168361 Pa (NIST SP 811 (2008) App. B)
LBMH_PER_KGS = 3600 / 0.45359237        # 1 lbm = 0.45359237 kg (exact)
KJ_PER_BTU = 1.05505585262              # international table Btu (NIST SP 811 (2008) App. B)


def to_us(q, v, fine=False):
    """A reading converted to US units and rounded as a plant instrument shows it:
    pressures to four or five significant figures, temperatures to 0.1 °F (0.01 °F
    with fine=True: pump temperatures), flows to 100 lbm/h, heat rates to 1 Btu/kWh."""
    if v is None or isinstance(v, str):
        return v
    if q == "p":
        x = v * PSI_PER_MPA
        step = 1.0 if x >= 1000 else 0.1 if x >= 100 else 0.01 if x >= 10 else 0.001
        return round(round(x / step) * step, 3)
    if q == "T":
        return round(v * 1.8 + 32, 2 if fine else 1)
    if q == "dT":
        return round(v * 1.8, 1)
    if q == "m":
        return round(v * LBMH_PER_KGS / 100) * 100.0
    if q == "hr":
        return float(round(v / KJ_PER_BTU))
    return v  # MW, fractions, names


def us_columns(columns, rows, fine=False):
    """Demo columns (tuples of row values in the order of rows) converted to US units."""
    return [tuple(to_us(q, v, fine) for (_, _, q), v in zip(rows, col)) for col in columns]


def unit_cell(q):
    si, us = UNIT[q]
    if si == us:
        return c_text(si, "unit") if si else c_blank("unit")
    return c_formula(f'IF({US};"{us}";"{si}")', "unit", True)


def ref(col, r):
    return f"[.{col}{r}]"


def call(method, *args, units=UNITS):
    return f"{ADDIN}{method}({';'.join(args)};{units})"


def when(cond, value):
    return f'IF({cond};{value};"")'


class Sheet:
    """Rows of one sheet, numbered as they are added (1-based), and its charts."""

    def __init__(self, ncols):
        self.ncols = ncols  # columns A.. in use; notes span all of them
        self.rows = []
        self.charts = []    # (frame name, chart content.xml, styles.xml, ranges, width cm, height cm)

    @property
    def next(self):
        return len(self.rows) + 1

    def add(self, cells, expect=None):
        if expect is not None:
            assert self.next == expect, (self.next, expect)  # the layout the test and DEVELOPERS.md describe
        self.rows.append(row(cells))
        return len(self.rows)

    def header(self, title, text, units_cell, units_note=None):
        self.add([c_text(title, "title")])
        self.note(text)
        self.note(CAUTION, "caution_note")
        self.add([c_empty()])
        self.add(units_cell, expect=5)
        if units_note:
            self.note(units_note, expect=6)
        else:
            self.add([c_empty()])

    def readings(self, rows, ncols, demo_values, blank_names):
        """Input rows [(row, label, quantity)], the first one the column names.
        demo_values[k][i]: column k's value in rows[i] ("" or None: blank);
        without demo values the names are blank_names and the rest is blank."""
        for i, (n, label, q) in enumerate(rows):
            cells = [c_text(label, "head"), c_text("Unit", "head")] if i == 0 else [c_text(label, "label"), unit_cell(q)]
            for k in range(ncols):
                v = demo_values[k][i] if demo_values else (blank_names[k] if i == 0 else None)
                cells.append(input_cell(None if v == "" else v, INPUT_STYLE.get(q, "input")))
            self.add(cells, expect=n)

    def checks(self, cols, checks_of):
        """The "readings complete" rows: checks_of(column) -> [(row, label, formula)],
        each TRUE or FALSE; the results refer to them."""
        per_col = [checks_of(c) for c in cols]
        for i, (n, label, _) in enumerate(per_col[0]):
            self.add([c_text(label, "label"), c_blank("unit")] + [c_formula(ch[i][2], "check") for ch in per_col],
                     expect=n)

    def results(self, head_label, name_row, cols, results_of, expect):
        """The results header row (the names from name_row) and one row per
        result of results_of(column): (row, label, quantity, style, formula)."""
        self.add([c_text(head_label, "head"), c_text("Unit", "head")]
                 + [c_formula(f'{ref(c, name_row)}&""', "head_name", True) for c in cols], expect=expect)
        per_col = [results_of(c) for c in cols]
        for i, (n, label, q, _, _) in enumerate(per_col[0]):
            self.add([c_text(label, "label"), unit_cell(q)] + [c_formula(res[i][4], res[i][3]) for res in per_col],
                     expect=n)

    def note(self, text, style="note", expect=None):
        """A paragraph across the whole width, wrapped."""
        return self.add([c_span(text, style, self.ncols)], expect)

    def chart(self, name, content_styles, ranges, width, height, room_rows):
        """A chart in column A of the next row, then room_rows empty rows for it to sit on."""
        folder = f"Object {name}"  # renamed to Object N by document()
        self.charts.append((name, content_styles, ranges))
        self.add([chart_frame_cell(name, folder, ranges, width, height)])
        for _ in range(room_rows):
            self.add([c_empty()])

    def xml(self, name):
        cols = ('<table:table-column table:style-name="coA"/><table:table-column table:style-name="coB"/>'
                f'<table:table-column table:style-name="coC" table:number-columns-repeated="{self.ncols - 2}"/>')
        return f'<table:table table:name="{name}" table:style-name="ta_sheet">{cols}' + "".join(self.rows) + "</table:table>"


INPUT_STYLE = {"%": "input_pct", "name": "input_name"}


def input_cell(v, style="input"):
    if v is None:
        return c_blank(style)
    if isinstance(v, str):
        return c_text(v, style)
    return c_num(v, style)


def linked_units_cell():
    return [c_text("Units of the readings and results (set on sheet Heaters, cell B5)", "label"),
            c_formula(UNITS, "result", True)]


def version_row(sheet):
    sheet.add([c_text("Calculated with", "label"), c_formula(f"{ADDIN}VERSION()", "result", True)])


def units_cell_row(system):
    return [c_text("Units of the readings and results", "label"), c_text(system, "input"),
            c_span("SI or US, for all sheets", "note", len(HEATER_COLS))]


def units_note(system):
    return ("B5: the units the readings are entered in and the results come out in; changing it does not"
            " convert readings already typed. SI: MPa (absolute), °C, K, kg/s, kJ/kg, kJ/kWh. US: psia, °F,"
            f" Δ°F, lbm/h, Btu/lbm, Btu/kWh. Powers in MW or kW. Chart axis titles: {system}.")


# ---------------------------------------------------------------- charts
CHART_COMMON = [
    '<style:style style:name="chA" style:family="chart"><style:graphic-properties draw:stroke="none" draw:fill-color="#ffffff"/></style:style>',
    '<style:style style:name="chT" style:family="chart"><style:text-properties fo:font-size="10pt" fo:font-weight="bold"/></style:style>',
    '<style:style style:name="chAt" style:family="chart"><style:text-properties fo:font-size="8pt"/></style:style>',
    '<style:style style:name="chL" style:family="chart"><style:text-properties fo:font-size="8pt"/></style:style>',
    '<style:style style:name="chW" style:family="chart"><style:graphic-properties draw:fill-color="#ffffff"/></style:style>',
    '<style:style style:name="chG" style:family="chart"><style:graphic-properties svg:stroke-color="#dddddd"/></style:style>',
]
DASHES = [chart_stroke_dash("dashL", 0.3, 0.12)]


def chart_body(cls, title, x_title, y_title, series_xml, plot_style, width, height, categories=None):
    cats = f'<chart:categories table:cell-range-address="{categories}"/>' if categories else ""
    return (f'<chart:chart svg:width="{width}cm" svg:height="{height}cm" chart:class="chart:{cls}" chart:style-name="chA">'
            f'<chart:title chart:style-name="chT"><text:p>{title}</text:p></chart:title>'
            f'<chart:legend chart:legend-position="bottom" style:legend-expansion="wide" chart:style-name="chL"/>'
            f'<chart:plot-area chart:style-name="{plot_style}" chart:data-source-has-labels="none">'
            f'<chart:axis chart:dimension="x" chart:name="primary-x" chart:style-name="chAx">{cats}'
            f'<chart:title chart:style-name="chAt"><text:p>{x_title}</text:p></chart:title></chart:axis>'
            f'<chart:axis chart:dimension="y" chart:name="primary-y" chart:style-name="chAy">'
            f'<chart:title chart:style-name="chAt"><text:p>{y_title}</text:p></chart:title>'
            f'<chart:grid chart:class="major" chart:style-name="chG"/></chart:axis>'
            + series_xml + '<chart:wall chart:style-name="chW"/></chart:plot-area></chart:chart>')


def heater_chart(system):
    """Bars per heater: TTD and DCA from the test beside their design values (automatic
    y axis: the values change sign, so Calc's scale fits them)."""
    sh = "Heaters"
    cats = f"{sh}.C{R_NAME}:{sh}.F{R_NAME}"
    dt = UNIT["dT"][1 if system == "US" else 0]
    # (row, colour); each series is named by its row's label in column A
    series = [(R_RES["ttd"], "#1f4e9c"), (R_TTD_D, "#9dbce8"), (R_RES["dca"], "#b35806"), (R_DCA_D, "#f7c58f")]
    styles = CHART_COMMON + [chart_axis_style("chAx"), chart_axis_style("chAy"),
                             '<style:style style:name="chP" style:family="chart"><style:chart-properties '
                             'chart:overlap="0" chart:gap-width="80"/></style:style>']
    xml, ranges = "", [cats]
    for k, (r, colour) in enumerate(series):
        styles.append(f'<style:style style:name="b{k}" style:family="chart"><style:graphic-properties '
                      f'draw:stroke="none" draw:fill-color="{colour}"/></style:style>')
        ranges.append(f"{sh}.C{r}:{sh}.F{r}")
        xml += (f'<chart:series chart:style-name="b{k}" chart:class="chart:bar" '
                f'chart:values-cell-range-address="{sh}.C{r}:{sh}.F{r}" chart:label-cell-address="{sh}.$A${r}"/>')
    body = chart_body("bar", "Feedwater heaters: TTD and DCA, test against design", "heater",
                      f"temperature difference, {dt}", xml, "chP", 16, 9, cats)
    return chart_object(body, styles, DASHES), ranges


def heat_rate_chart(system):
    """Turbine cycle heat rate against gross output, test and design (automatic axes: Calc
    fits them to the values; the net unit heat rate, some 20 % higher, would stretch the
    heat rate axis down to 0, so it stays in the table)."""
    sh = "'Heat rate'"
    hr = UNIT["hr"][1 if system == "US" else 0]
    load = f"{sh}.C19:{sh}.E19"
    # (row, colour, symbol, dash); each series is named by its row's label in column A
    series = [(RR["hr"], "#c00000", "circle", None), (22, "#0050c0", "square", "dashL")]
    styles = CHART_COMMON + [chart_axis_style("chAx"), chart_axis_style("chAy"),
                             '<style:style style:name="chP" style:family="chart"><style:chart-properties chart:lines="true" '
                             'chart:interpolation="none" chart:treat-empty-cells="leave-gap"/></style:style>']
    xml, ranges = "", [load]
    for k, (r, colour, sym, dash) in enumerate(series):
        styles.append(chart_series_style(f"s{k}", colour, "0.04cm", dash, sym, "0.25cm"))
        ranges.append(f"{sh}.C{r}:{sh}.E{r}")
        xml += (f'<chart:series chart:style-name="s{k}" chart:class="chart:scatter" '
                f'chart:values-cell-range-address="{sh}.C{r}:{sh}.E{r}" chart:label-cell-address="{sh}.$A${r}">'
                f'<chart:domain table:cell-range-address="{load}"/></chart:series>')
    body = chart_body("scatter", "Turbine cycle heat rate against load, test and design", "generator output (gross), MW", f"heat rate, {hr}",
                      xml, "chP", 16, 9)
    return chart_object(body, styles, DASHES), ranges


# ---------------------------------------------------------------- Heaters
HEATER_COLS = "CDEF"
# Readings per heater, rows 8-19 of the Heaters sheet, demo values (SI: MPa
# absolute, degC, kg/s, K). Invented; chosen so that TTD, DCA and the
# extraction flows come out as is usual for a 660 MW reheat unit (common practice):
# name, drains cascade in from, p_shell, T_ext, T_fw_in, T_fw_out, p_fw, T_drain,
# m_fw, m_casc, design TTD, design DCA.
HEATERS = [
    ("LP3", "LP4", 0.098, 112.6, 68.4, 96.3, 2.84, 74.9, 414.0, 19.1, 2.8, 5.6),
    ("LP4", "", 0.236, 188.4, 96.3, 122.7, 2.71, 102.0, 414.0, None, 2.8, 5.6),
    ("HP6", "HP7", 1.92, 436.2, 179.1, 208.9, 19.95, 185.0, 535.0, 44.9, 1.0, 5.6),
    ("HP7", "", 3.95, 331.6, 208.9, 248.2, 19.62, 214.7, 535.0, None, 1.0, 5.6),
]
HEATER_ROWS = [  # (row, label, quantity)
    (8, "Heater", "name"),
    (9, "Drains cascade in from (the heater above; empty if none)", "name"),
    (10, "Shell pressure (extraction steam at the heater inlet)", "p"),
    (11, "Extraction steam temperature at the heater inlet", "T"),
    (12, "Feedwater inlet temperature", "T"),
    (13, "Feedwater outlet temperature", "T"),
    (14, "Feedwater pressure", "p"),
    (15, "Drain outlet temperature", "T"),
    (16, "Feedwater flow", "m"),
    (17, "Cascading drain flow in (when row 9 names a heater)", "m"),
    (18, "Design TTD", "dT"),
    (19, "Design DCA", "dT"),
]
R_NAME, R_CASC_FROM, R_PSH, R_TEXT, R_TIN, R_TOUT, R_PFW, R_TDR, R_MFW, R_MCASC, R_TTD_D, R_DCA_D = range(8, 20)
# "Readings complete" rows (TRUE/FALSE per heater).
R_CASC, R_OK_PT, R_OK_FLOW = 20, 21, 22
# Result rows.
R_RES = {"ttd": 26, "ttd_d": 27, "dca": 28, "dca_d": 29, "rise": 30, "h_ext": 31, "h_in": 32, "h_out": 33,
         "h_dr": 34, "h_casc": 35, "m_ext": 36, "m_out": 37}


def heater_checks(c):
    def r(n):
        return ref(c, n)
    return [
        (R_CASC, "Drains cascade in (row 9 names a heater)", f"LEN(TRIM({r(R_CASC_FROM)}))>0"),
        (R_OK_PT, "Readings complete: pressures and temperatures (rows 10-15)",
         f"COUNT([.{c}{R_PSH}:.{c}{R_TDR}])={R_TDR - R_PSH + 1}"),
        (R_OK_FLOW, "Readings complete: flows (row 16; row 17 with a cascade)",
         f"AND({r(R_OK_PT)};ISNUMBER({r(R_MFW)});OR(NOT({r(R_CASC)});COUNT({r(R_MCASC)};{r(R_RES['h_casc'])})=2))"),
    ]


def heater_results(c):
    """(row, label, quantity, style, formula) of the results of the heater in column c."""
    def r(n):
        return ref(c, n)
    ok, flows, casc = f"[.{c}${R_OK_PT}]", f"[.{c}${R_OK_FLOW}]", f"[.{c}${R_CASC}]"
    names = f"[.$C${R_NAME}:.$F${R_NAME}]"
    h_drains = f"[.$C${R_RES['h_dr']}:.$F${R_RES['h_dr']}]"
    rr = {k: r(v) for k, v in R_RES.items()}
    ext = [r(R_MFW), rr["h_in"], rr["h_out"], rr["h_ext"], rr["h_dr"]]
    return [
        (26, "TTD = Tsat(shell p) - feedwater outlet T", "dT", "result_2",
         when(ok, call("FWHTTD", r(R_PSH), r(R_TOUT)))),
        (27, "TTD test - design", "dT", "result_2", when(f"COUNT({rr['ttd']};{r(R_TTD_D)})=2", f"{rr['ttd']}-{r(R_TTD_D)}")),
        (28, "DCA = drain outlet T - feedwater inlet T", "dT", "result_2",
         when(ok, call("FWHDCA", r(R_TDR), r(R_TIN)))),
        (29, "DCA test - design", "dT", "result_2", when(f"COUNT({rr['dca']};{r(R_DCA_D)})=2", f"{rr['dca']}-{r(R_DCA_D)}")),
        (30, "Feedwater temperature rise", "dT", "result_2", when(ok, call("FWHRISE", r(R_TIN), r(R_TOUT)))),
        (31, "Extraction steam enthalpy h(shell p, extraction T)", "h", "result_2",
         when(ok, call("HPT", r(R_PSH), r(R_TEXT)))),
        (32, "Feedwater inlet enthalpy h(feedwater p, inlet T)", "h", "result_2",
         when(ok, call("HPT", r(R_PFW), r(R_TIN)))),
        (33, "Feedwater outlet enthalpy h(feedwater p, outlet T)", "h", "result_2",
         when(ok, call("HPT", r(R_PFW), r(R_TOUT)))),
        (34, "Drain enthalpy h(shell p, drain T)", "h", "result_2", when(ok, call("HPT", r(R_PSH), r(R_TDR)))),
        (35, "Cascading drain enthalpy (drain of the heater named in row 9)", "h", "result_2",
         when(casc, f"INDEX({h_drains};1;MATCH(TRIM({r(R_CASC_FROM)});{names};0))")),
        (36, "Extraction steam flow (heater energy balance)", "m", "result_2",
         when(flows, f"IF({casc};{call('FWHEXTRACTION', *ext, r(R_MCASC), rr['h_casc'])};"
                     f"{call('FWHEXTRACTION', *ext, '', '')})")),
        (37, "Drain flow out (extraction + cascade in), to the heater below", "m", "result_2",
         when(flows, f"{rr['m_ext']}+IF({casc};{r(R_MCASC)};0)")),
    ]


def heaters_sheet(demo, system):
    s = Sheet(2 + len(HEATER_COLS))
    us = system == "US"
    s.header("Harrow Fen Power Station, Unit 2 (a fictional plant): heater, pump and heat rate test"
             + (", US" if us else "") if demo
             else "Plant performance test: closed feedwater heaters, feed and condensate pumps, heat rate",
             "Routine performance test at 660 MW, invented readings for the Isentra demo. Heaters are in columns;"
             " drains cascade from HP7 to HP6 and from LP4 to LP3."
             + (" The readings are those of the SI demo as US instruments show them." if us else "") if demo
             else "Enter the readings (absolute pressures) in the yellow cells; the grey cells are calculated by the"
             " Isentra add-in (IAPWS-IF97). Heaters are in columns; name the heater whose drains cascade in.",
             units_cell_row(system), units_note(system))
    s.add([c_text("Readings and design values", "subtitle")], expect=7)
    values = (us_columns(HEATERS, HEATER_ROWS) if us else HEATERS) if demo else None
    s.readings(HEATER_ROWS, len(HEATER_COLS), values, [f"Heater {k + 1}" for k in range(len(HEATER_COLS))])
    s.checks(HEATER_COLS, heater_checks)
    s.add([c_empty()])
    s.add([c_text("Results", "subtitle")], expect=24)
    s.results("Heater", R_NAME, HEATER_COLS, heater_results, expect=25)
    s.add([c_empty()])
    s.note("TTD and DCA as defined in ASME PTC 12.1; a negative TTD is normal for a heater with a desuperheating"
           " zone. Extraction flow from m_fw (h_fw,out - h_fw,in) = m_ext (h_ext - h_drain) + m_casc (h_casc -"
           " h_drain), heat lost to the surroundings neglected; drain enthalpies at shell pressure.")
    s.note("A heater whose drains cascade in from another one needs that heater's shell pressure and drain"
           " temperature, in this sheet, under the name given in row 9. A result appears once the readings it"
           " needs are complete (rows 20-22); a blank reading never reaches a calculation.")
    version_row(s)
    s.add([c_empty()])
    content, ranges = heater_chart(system)
    s.chart("heater_chart", content, ranges, 16, 9, 18)
    return s


# ---------------------------------------------------------------- Pumps
PUMP_COLS = "CD"
# Demo readings (SI: MPa absolute, degC, kg/s), rows 8-14 of the Pumps sheet.
# Invented; the discharge temperatures are those that give about 81.5 % and
# 76 % (common practice for such pumps), read to 0.01 K.
PUMPS = [
    ("Feed pump A", 2.05, 175.62, 20.35, 179.12, 267.5, 0.83),
    ("Cond. pump A", 0.062, 36.42, 2.98, 36.72, 414.0, 0.78),
]
PUMP_ROWS = [
    (8, "Pump", "name"),
    (9, "Suction pressure", "p"),
    (10, "Suction temperature", "T"),
    (11, "Discharge pressure", "p"),
    (12, "Discharge temperature", "T"),
    (13, "Flow through the pump", "m"),
    (14, "Design efficiency", "%"),
]
PUMP_NOTE = ("Thermodynamic method: the efficiency rests on the small temperature rise across the pump (a few tenths"
             " of a kelvin for a condensate pump). Measure suction and discharge temperatures with calibrated"
             " sensors, in the same way, to 0.01 K or better: 0.05 K on a condensate pump shifts its efficiency by"
             " several percentage points.")
P_OK_PT, P_OK_FLOW = 15, 16


def pump_checks(c):
    return [
        (P_OK_PT, "Readings complete: pressures and temperatures (rows 9-12)", f"COUNT([.{c}9:.{c}12])=4"),
        (P_OK_FLOW, "Readings complete: flow (row 13)", f"AND({ref(c, P_OK_PT)};ISNUMBER({ref(c, 13)}))"),
    ]


def pump_results(c):
    def r(n):
        return ref(c, n)
    ok, flow = f"[.{c}${P_OK_PT}]", f"[.{c}${P_OK_FLOW}]"
    # m (h_s - h_in) is in kW for SI (kg/s x kJ/kg) and in Btu/h for US (lbm/h x Btu/lbm).
    mh_unit = f'IF({US};"Btu/h";"kW")'
    return [
        (21, "Suction enthalpy h_in = h(p_in, T_in)", "h", "result_3", when(ok, call("HPT", r(9), r(10)))),
        (22, "Suction entropy s_in = s(p_in, T_in)", "s", "result_5", when(ok, call("SPT", r(9), r(10)))),
        (23, "Discharge enthalpy h_out = h(p_out, T_out)", "h", "result_3", when(ok, call("HPT", r(11), r(12)))),
        (24, "Isentropic discharge enthalpy h_s = h(p_out, s_in)", "h", "result_3",
         when(ok, call("HPS", r(11), r(22)))),
        (25, "Temperature rise T_out - T_in", "dT", "result_2", when(ok, f"{r(12)}-{r(10)}")),
        (26, "Isentropic work h_s - h_in", "h", "result_3", when(ok, f"{r(24)}-{r(21)}")),
        (27, "Pump work per unit mass h_out - h_in", "h", "result_3", when(ok, f"{r(23)}-{r(21)}")),
        (28, "Efficiency (h_s - h_in)/(h_out - h_in)", "%", "result_pct", when(ok, f"{r(26)}/{r(27)}")),
        (29, "Efficiency test - design (percentage points)", "%", "result_dpct",
         when(f"COUNT({r(28)};{r(14)})=2", f"{r(28)}-{r(14)}")),
        (30, "Hydraulic power m (h_s - h_in)", "kW", "result_1",
         when(flow, f'{ADDIN}CONVERT({r(13)}*{r(26)};{mh_unit};"kW")')),
        (31, "Power absorbed by the water m (h_out - h_in)", "kW", "result_1",
         when(flow, f'{ADDIN}CONVERT({r(13)}*{r(27)};{mh_unit};"kW")')),
    ]


def pumps_sheet(demo, system):
    s = Sheet(2 + len(PUMP_COLS))
    us = system == "US"
    s.header("Harrow Fen Power Station, Unit 2: feed and condensate pump efficiency" + (", US units" if us else "")
             if demo else "Pump efficiency by the thermodynamic method",
             "Efficiency from suction and discharge pressure and temperature: (h_s - h_in)/(h_out - h_in),"
             " h_s = h(p_out, s_in), IAPWS-IF97.", linked_units_cell())
    s.add([c_text("Readings", "subtitle")], expect=7)
    values = (us_columns(PUMPS, PUMP_ROWS, fine=True) if us else PUMPS) if demo else None
    s.readings(PUMP_ROWS, len(PUMP_COLS), values, ["Feed pump", "Cond. pump"])
    s.checks(PUMP_COLS, pump_checks)
    s.note(PUMP_NOTE, "caution_note", expect=17)
    s.add([c_empty()])
    s.add([c_text("Results (thermodynamic method)", "subtitle")], expect=19)
    s.results("Pump", 8, PUMP_COLS, pump_results, expect=20)
    s.add([c_empty()])
    s.note("The power absorbed by the water excludes bearing, seal and coupling losses: the shaft power is"
           " larger. A leak-off or balance flow returned to suction belongs in the flow reading. Powers are"
           " converted to kW by STEAM.CONVERT from kg/s x kJ/kg (SI) or lbm/h x Btu/lbm = Btu/h (US).")
    version_row(s)
    return s


# ---------------------------------------------------------------- Heat rate
RUN_COLS = "CDE"
# Demo readings per test run (SI: kg/s, MPa absolute, degC, MW, fraction,
# kJ/kWh), rows 8-22 of the Heat rate sheet. Invented; main steam, cold and
# hot reheat match the turbine workbook's points T1-T3; heat rates near
# 8100 kJ/kWh as is usual for a subcritical reheat unit (common practice).
RUNS = [
    ("Run 1, 660 MW", 535.0, 16.62, 538.4, 19.55, 248.2, 484.2, 4.08, 333.1, 3.74, 538.9, 660.25, 31.4, 0.884, 7985.0),
    ("Run 2, 560 MW", 449.5, 14.21, 537.6, 16.72, 239.6, 408.6, 3.52, 336.2, 3.23, 538.2, 560.4, 28.2, 0.887, 8060.0),
    ("Run 3, 460 MW", 367.1, 11.86, 536.9, 13.95, 229.8, 335.2, 2.96, 339.9, 2.72, 537.4, 460.1, 25.6, 0.883, 8190.0),
]
RUN_ROWS = [
    (8, "Test run", "name"),
    (9, "Main steam flow", "m"),
    (10, "Main steam pressure", "p"),
    (11, "Main steam temperature", "T"),
    (12, "Final feedwater pressure", "p"),
    (13, "Final feedwater temperature", "T"),
    (14, "Reheat steam flow (0 without reheat)", "m"),
    (15, "Cold reheat pressure", "p"),
    (16, "Cold reheat temperature", "T"),
    (17, "Hot reheat pressure", "p"),
    (18, "Hot reheat temperature", "T"),
    (19, "Generator output (gross)", "MW"),
    (20, "Auxiliary power (station service)", "MW"),
    (21, "Boiler efficiency", "%"),
    (22, "Design turbine cycle heat rate", "hr"),
]
HR_KWH, HR_UNITS = 23, 24          # heat rate of 1 kWh per kWh; units text of the heat rate calls
H_RH, H_OK_MAIN, H_OK_RH, H_READY, H_OK_NET = 25, 26, 27, 28, 29
RR = {"h_ms": 33, "h_fw": 34, "h_crh": 35, "h_hrh": 36, "hr": 37, "hr_d": 38, "q": 39, "eta": 40, "net": 41,
      "hr_net": 42, "eta_net": 43}


def run_checks(c):
    def r(n):
        return ref(c, n)
    return [
        (H_RH, "Reheat (row 14 above 0)", f"AND(ISNUMBER({r(14)});{r(14)}>0)"),
        (H_OK_MAIN, "Readings complete: rows 9-14 and 19 (steam, output)",
         f"COUNT([.{c}9:.{c}14];{r(19)})=7"),
        (H_OK_RH, "Readings complete: reheat p and T (rows 15-18)", f"COUNT([.{c}15:.{c}18])=4"),
        (H_READY, "Ready for the heat rate (row 26; row 27 with reheat)",
         f"AND({r(H_OK_MAIN)};OR(NOT({r(H_RH)});{r(H_OK_RH)}))"),
        (H_OK_NET, "Ready for the net heat rate (row 28; rows 20-21)",
         f"AND({r(H_READY)};COUNT([.{c}20:.{c}21])=2)"),
    ]


def run_results(c):
    def r(n):
        return ref(c, n)
    main_ok, rh_ok, ready, net_ok, rh = (f"[.{c}${n}]" for n in (H_OK_MAIN, H_OK_RH, H_READY, H_OK_NET, H_RH))
    u_mw = f"[.$C${HR_UNITS}]"  # the units text with powers in MW
    kwh = f"[.$C${HR_KWH}]"
    x = {k: r(v) for k, v in RR.items()}
    # STEAM.HEATRATE.CYCLE/NET: m_ms, h_fw, h_ms, P_gen[, P_aux, eta_boiler][, m_rh, h_crh, h_hrh].
    main = [r(9), x["h_fw"], x["h_ms"], r(19)]
    reheat = [r(14), x["h_crh"], x["h_hrh"]]

    def heat_rate(method, *extra):
        with_rh = call(method, *main, *extra, *reheat, units=u_mw)
        without = call(method, *main, *extra, "", "", "", units=u_mw)
        return f"IF({rh};{with_rh};{without})"
    return [
        (33, "Main steam enthalpy", "h", "result_2", when(main_ok, call("HPT", r(10), r(11)))),
        (34, "Final feedwater enthalpy", "h", "result_2", when(main_ok, call("HPT", r(12), r(13)))),
        (35, "Cold reheat enthalpy", "h", "result_2", when(rh_ok, call("HPT", r(15), r(16)))),
        (36, "Hot reheat enthalpy", "h", "result_2", when(rh_ok, call("HPT", r(17), r(18)))),
        (37, "Turbine cycle heat rate", "hr", "result_1", when(ready, heat_rate("HEATRATECYCLE"))),
        (38, "Cycle heat rate test - design", "%", "result_dpct",
         when(f"COUNT({x['hr']};{r(22)})=2", f"{x['hr']}/{r(22)}-1")),
        (39, "Heat added to the cycle (heat rate x gross output / 1 kWh)", "MW", "result_2",
         when(ready, f"{x['hr']}*{r(19)}/{kwh}")),
        (40, "Turbine cycle efficiency (1 kWh / cycle heat rate)", "%", "result_pct", when(ready, f"{kwh}/{x['hr']}")),
        (41, "Net output (gross - auxiliary)", "MW", "result_2", when(f"COUNT({r(19)};{r(20)})=2", f"{r(19)}-{r(20)}")),
        (42, "Net unit heat rate (fuel heat per net kWh)", "hr", "result_1",
         when(net_ok, heat_rate("HEATRATENET", r(20), r(21)))),
        (43, "Net unit efficiency (1 kWh / net unit heat rate)", "%", "result_pct",
         when(net_ok, f"{kwh}/{x['hr_net']}")),
    ]


def heat_rate_sheet(demo, system):
    s = Sheet(2 + len(RUN_COLS))
    us = system == "US"
    s.header("Harrow Fen Power Station, Unit 2: heat rate test" + (", US units" if us else "") if demo
             else "Heat rate test: turbine cycle and net unit",
             "Heat added to the cycle m_ms (h_ms - h_fw) + m_rh (h_hrh - h_crh); cycle heat rate = heat added / gross"
             " output; net unit heat rate = heat added / boiler efficiency / (gross - auxiliary power).",
             linked_units_cell())
    s.add([c_text("Readings (one column per test run)", "subtitle")], expect=7)
    values = (us_columns(RUNS, RUN_ROWS) if us else RUNS) if demo else None
    s.readings(RUN_ROWS, len(RUN_COLS), values, [f"Run {k + 1}" for k in range(len(RUN_COLS))])
    s.add([c_text("1 kWh per kWh in the heat rate's unit (a lossless cycle)", "label"),
           unit_cell("hr"), c_formula(f'{ADDIN}CONVERT(3600;"kJ/kWh";[.$B${HR_KWH}])', "result_2")], expect=HR_KWH)
    s.add([c_text("Units text of the heat rate calls (powers in MW)", "label"), c_blank("unit"),
           c_formula(f'{UNITS}&" P=MW"', "result", True)], expect=HR_UNITS)
    s.checks(RUN_COLS, run_checks)
    s.add([c_empty()])
    s.add([c_text("Results", "subtitle")], expect=31)
    s.results("Test run", 8, RUN_COLS, run_results, expect=32)
    s.add([c_empty()])
    s.note("An efficiency is 1 kWh divided by the heat rate (3600 kJ or 3412.14 Btu per kWh)."
           " Test - design is relative: (test / design - 1). Generator output and auxiliary power are in MW:"
           " the calls get the units text of row 24, which says so (\"P=MW\"). Without reheat (row 14 = 0) the"
           " reheat readings may stay blank and the calls leave out the reheat arguments.")
    version_row(s)
    s.add([c_empty()])
    content, ranges = heat_rate_chart(system)
    s.chart("heat_rate_chart", content, ranges, 16, 9, 18)
    return s


# ---------------------------------------------------------------- document
def number_style(name, decimals):
    return (f'<number:number-style style:name="{name}"><number:number number:decimal-places="{decimals}" '
            f'number:min-decimal-places="{decimals}" number:min-integer-digits="1" number:grouping="true"/>'
            '</number:number-style>')


def result_style(name, data_style):
    return (f'<style:style style:name="{name}" style:family="table-cell" style:data-style-name="{data_style}">'
            '<style:table-cell-properties fo:background-color="#eeeeee"/></style:style>')


def document(demo, system):
    """content.xml and the chart objects [(folder, content, styles)] of the whole workbook."""
    extra = [table_style("ta_sheet"), column_style("coA", "11.8cm"), column_style("coB", "2.1cm"),
             column_style("coC", "3.2cm")]
    extra += ['<style:style style:name="input_name" style:family="table-cell"><style:table-cell-properties'
              ' fo:background-color="#fff3b0"/><style:paragraph-properties fo:text-align="end"/></style:style>',
              '<style:style style:name="head_name" style:family="table-cell">'
              '<style:table-cell-properties fo:background-color="#dddddd" fo:wrap-option="wrap"/>'
              '<style:paragraph-properties fo:text-align="end"/><style:text-properties fo:font-weight="bold"'
              ' fo:font-size="9pt"/></style:style>',
              '<style:style style:name="note" style:family="table-cell"><style:table-cell-properties fo:wrap-option="wrap"'
              ' style:vertical-align="top"/></style:style>',
              '<style:style style:name="caution_note" style:family="table-cell"><style:table-cell-properties'
              ' fo:wrap-option="wrap" style:vertical-align="top"/><style:text-properties fo:font-weight="bold"'
              ' fo:color="#b00000"/></style:style>',
              '<style:style style:name="check" style:family="table-cell" style:data-style-name="Nb"><style:table-cell-properties'
              ' fo:background-color="#eeeeee"/><style:paragraph-properties fo:text-align="end"/>'
              '<style:text-properties fo:font-size="8pt"/></style:style>',
              ]
    for d in (1, 2, 3, 5):
        extra += [number_style(f"Nr{d}", d), result_style(f"result_{d}", f"Nr{d}")]
    auto = COMMON_STYLES + "  " + "\n  ".join(extra) + CELL_STYLES
    sheets = [("Heaters", heaters_sheet(demo, system)), ("Pumps", pumps_sheet(demo, system)),
              ("Heat rate", heat_rate_sheet(demo, system))]
    sheets = plant_flow_sheet.add_flow_sheet(sys.modules[__name__], sheets, demo, system)  # + Flow, feeds Heat rate row 9
    xml, objects = "", []
    for name, sheet in sheets:
        sx = sheet.xml(name)
        for frame, (content, styles), _ in sheet.charts:
            folder = f"Object {len(objects) + 1}"
            sx = sx.replace(f'xlink:href="./Object {frame}"', f'xlink:href="./{folder}"')
            objects.append((folder, content, styles))
        xml += sx
    return content_xml(auto, xml), objects


def write(path, mimetype, demo, system, title):
    content, objects = document(demo, system)
    parts, manifest = [], []
    for folder, c, s in objects:
        p, m = chart_parts(folder, c, s)
        parts += p
        manifest += m
    write_package(path, mimetype, [("content.xml", content), ("styles.xml", styles_xml()),
                                   ("meta.xml", meta_xml(title, "gen_plant_workbook.py"))] + parts, manifest)


def main():
    if len(sys.argv) != 2:
        sys.exit("usage: gen_plant_workbook.py OUTDIR")
    out = sys.argv[1]
    os.makedirs(out, exist_ok=True)
    write(os.path.join(out, "harrow-fen-unit2-plant-performance.ods"), MIME_ODS, True, "SI",
          "Harrow Fen Unit 2 feedwater heater, pump and heat rate test (fictional demo)")
    write(os.path.join(out, "harrow-fen-unit2-plant-performance-us.ods"), MIME_ODS, True, "US",
          "Harrow Fen Unit 2 feedwater heater, pump and heat rate test, US units (fictional demo)")
    write(os.path.join(out, "isentra-plant-performance.ots"), MIME_OTS, False, "SI",
          "Plant performance test: heaters, pumps, heat rate (Isentra)")
    write(os.path.join(out, "isentra-plant-performance-us.ots"), MIME_OTS, False, "US",
          "Plant performance test: heaters, pumps, heat rate, US units (Isentra)")


if __name__ == "__main__":
    main()
