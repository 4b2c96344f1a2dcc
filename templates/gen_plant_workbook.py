#!/usr/bin/python3
# SPDX-License-Identifier: MPL-2.0
"""Writes the plant performance test workbook (OpenDocument).

    gen_plant_workbook.py OUTDIR

writes into OUTDIR:
  harrow-fen-unit2-plant-performance.ods   the demo: invented readings of a routine
                                           test of Harrow Fen Power Station, Unit 2
  isentra-plant-performance.ots            the same workbook without readings: the
                                           template the extension installs

Sheets:
  Heaters    closed feedwater heaters (one per column): TTD, DCA, temperature
             rise, test - design, enthalpies, extraction steam flow from the
             heater's energy balance with cascading drains from the heater above
  Pumps      boiler feed and condensate pump efficiency by the thermodynamic
             method, (h_s - h_in)/(h_out - h_in) with h_s = h(p_out, s_in),
             specific work, hydraulic and absorbed power
  Heat rate  turbine cycle and net unit heat rate and efficiency per test run

This script is the reviewable source of both files (standard library only;
the build runs it with /usr/bin/python3). Every result is a formula of the
Isentra add-in or plain Calc arithmetic on such results; the files carry no
cached results, so Calc computes them on load. The units cell (Heaters.B5,
"SI" or "US") is the units argument of every add-in call in all three sheets.
Blank readings give empty results.

Harrow Fen Power Station is a made-up plant; the readings are invented.
"""
import os
import sys

sys.dont_write_bytecode = True  # keep templates/ free of __pycache__
from odf_writer import (ADDIN, MIME_ODS, MIME_OTS, COMMON_STYLES, CELL_STYLES,  # noqa: E402
                        c_text, c_num, c_formula, c_empty, c_blank, c_span, row, table_style, column_style,
                        content_xml, styles_xml, meta_xml, write_package)

UNITS = "[$Heaters.$B$5]"  # the one units cell, as every formula refers to it
US = f'UPPER({UNITS})="US"'
KWH_US = "3412.14163312794"  # 1 kWh in Btu (IT): 3600 kJ / 1.05505585262 kJ/Btu (NIST SP 811 (2008) App. B)
KW_US = KWH_US               # 1 kW in Btu/h, the same number
KWH = "[.$C$23]"  # Heat rate sheet: the cell that holds 1 kWh in the heat rate's unit

CAUTION = ("CAUTION: these figures evaluate a test; they approve nothing. Before a result feeds a design or an"
           " operating decision, a licensed engineer has to review it against the codes in force where the plant"
           " stands. Isentra is provided without warranty.")

# Units per quantity: (SI label, US label).
UNIT = {
    "p": ("MPa", "psia"), "T": ("°C", "°F"), "dT": ("K", "Δ°F"), "m": ("kg/s", "lbm/h"),
    "h": ("kJ/kg", "Btu/lbm"), "s": ("kJ/(kg·K)", "Btu/(lbm·°F)"), "hr": ("kJ/kWh", "Btu/kWh"),
    "kW": ("kW", "kW"), "MW": ("MW", "MW"), "-": ("", ""), "%": ("%", "%"), "name": ("", ""),
}


def unit_cell(q):
    si, us = UNIT[q]
    if si == us:
        return c_text(si, "unit") if si else c_blank("unit")
    return c_formula(f'IF({US};"{us}";"{si}")', "unit", True)


def ref(col, r):
    return f"[.{col}{r}]"


def call(method, *args):
    return f"{ADDIN}{method}({';'.join(args)};{UNITS})"


def when(cond, value):
    return f'IF({cond};{value};"")'


def count_is(col, rows):
    return f"COUNT({';'.join(ref(col, r) for r in rows)})={len(rows)}"


class Sheet:
    """Rows of one sheet, numbered as they are added (1-based)."""

    def __init__(self, ncols):
        self.ncols = ncols  # columns A.. in use; notes span all of them
        self.rows = []

    @property
    def next(self):
        return len(self.rows) + 1

    def add(self, cells, expect=None):
        if expect is not None:
            assert self.next == expect, (self.next, expect)  # the layout the test and DEVELOPERS.md describe
        self.rows.append(row(cells))
        return len(self.rows)

    def header(self, title, text, units_cell):
        self.add([c_text(title, "title")])
        self.note(text)
        self.note(CAUTION, "caution_note")
        self.add([c_empty()])
        self.add(units_cell, expect=5)
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
    return [c_text("Units (set on sheet Heaters, cell B5)", "label"), c_formula(UNITS, "result", True)]


def version_row(sheet):
    sheet.add([c_text("Calculated with", "label"), c_formula(f"{ADDIN}VERSION()", "result", True)])


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


def heater_results(c):
    """(row, label, quantity, style, formula) of the results of the heater in column c."""
    def r(n):
        return ref(c, n)
    no_casc = f"LEN(TRIM({r(R_CASC_FROM)}))=0"
    names = f"[.$C${R_NAME}:.$F${R_NAME}]"
    h_drains = "[.$C$31:.$F$31]"
    ext_ok = (f"AND(COUNT([.{c}{R_PSH}:.{c}{R_MFW}])={R_MFW - R_PSH + 1};"
              f"OR({no_casc};AND(ISNUMBER({r(R_MCASC)});ISNUMBER({r(32)}))))")
    return [
        (23, "TTD = Tsat(shell p) - feedwater outlet T", "dT", "result_2",
         when(count_is(c, [R_PSH, R_TOUT]), call("FWHTTD", r(R_PSH), r(R_TOUT)))),
        (24, "TTD test - design", "dT", "result_2",
         when(f"AND(ISNUMBER({r(23)});ISNUMBER({r(R_TTD_D)}))", f"{r(23)}-{r(R_TTD_D)}")),
        (25, "DCA = drain outlet T - feedwater inlet T", "dT", "result_2",
         when(count_is(c, [R_TDR, R_TIN]), call("FWHDCA", r(R_TDR), r(R_TIN)))),
        (26, "DCA test - design", "dT", "result_2",
         when(f"AND(ISNUMBER({r(25)});ISNUMBER({r(R_DCA_D)}))", f"{r(25)}-{r(R_DCA_D)}")),
        (27, "Feedwater temperature rise", "dT", "result_2",
         when(count_is(c, [R_TIN, R_TOUT]), call("FWHRISE", r(R_TIN), r(R_TOUT)))),
        (28, "Extraction steam enthalpy h(shell p, extraction T)", "h", "result_2",
         when(count_is(c, [R_PSH, R_TEXT]), call("HPT", r(R_PSH), r(R_TEXT)))),
        (29, "Feedwater inlet enthalpy h(feedwater p, inlet T)", "h", "result_2",
         when(count_is(c, [R_PFW, R_TIN]), call("HPT", r(R_PFW), r(R_TIN)))),
        (30, "Feedwater outlet enthalpy h(feedwater p, outlet T)", "h", "result_2",
         when(count_is(c, [R_PFW, R_TOUT]), call("HPT", r(R_PFW), r(R_TOUT)))),
        (31, "Drain enthalpy h(shell p, drain T)", "h", "result_2",
         when(count_is(c, [R_PSH, R_TDR]), call("HPT", r(R_PSH), r(R_TDR)))),
        (32, "Cascading drain enthalpy (drain of the heater named in row 9)", "h", "result_2",
         f'IF({no_casc};"";INDEX({h_drains};1;MATCH(TRIM({r(R_CASC_FROM)});{names};0)))'),
        (33, "Extraction steam flow (heater energy balance)", "m", "result_2",
         when(ext_ok, call("FWHEXTRACTION", r(R_MFW), r(29), r(30), r(28), r(31),
                           f"IF({no_casc};0;{r(R_MCASC)})", f"IF({no_casc};{r(31)};{r(32)})"))),
        (34, "Drain flow out (extraction + cascade in), to the heater below", "m", "result_2",
         when(f"ISNUMBER({r(33)})", f"{r(33)}+IF({no_casc};0;{r(R_MCASC)})")),
    ]


def heaters_sheet(demo):
    s = Sheet(2 + len(HEATER_COLS))
    s.header("Harrow Fen Power Station, Unit 2 (a fictional plant): feedwater heater, pump and heat rate test" if demo
             else "Plant performance test: closed feedwater heaters, feed and condensate pumps, heat rate",
             "Routine performance test at 660 MW, invented readings for the Isentra demo. Heaters are in columns;"
             " drains cascade from HP7 to HP6 and from LP4 to LP3." if demo
             else "Enter the readings (absolute pressures) in the yellow cells; the grey cells are calculated by the"
             " Isentra add-in (IAPWS-IF97). Heaters are in columns; name the heater whose drains cascade in.",
             [c_text("Units for the whole workbook", "label"), c_text("SI", "input"),
              c_span("SI or US, for all three sheets. SI: MPa (absolute), °C, K, kg/s, kJ/kg.  "
                     "US: psia, °F, Δ°F, lbm/h, Btu/lbm. Powers in kW or MW either way.", "note", len(HEATER_COLS))])
    s.add([c_text("Readings and design values", "subtitle")], expect=7)
    s.readings(HEATER_ROWS, len(HEATER_COLS), HEATERS if demo else None,
               [f"Heater {k + 1}" for k in range(len(HEATER_COLS))])
    s.add([c_empty()])
    s.add([c_text("Results", "subtitle")], expect=21)
    s.results("Heater", R_NAME, HEATER_COLS, heater_results, expect=22)
    s.add([c_empty()])
    s.note("TTD and DCA as defined in ASME PTC 12.1; a negative TTD is normal for a heater with a desuperheating"
           " zone. Extraction flow from m_fw (h_fw,out - h_fw,in) = m_ext (h_ext - h_drain) + m_casc (h_casc -"
           " h_drain), heat lost to the surroundings neglected; drain enthalpies at shell pressure.")
    s.note("A heater whose drains cascade in from another one needs that heater's shell pressure and drain"
           " temperature, in this sheet, under the name given in row 9.")
    version_row(s)
    return s.xml("Heaters")


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


def pump_results(c):
    def r(n):
        return ref(c, n)
    return [
        (19, "Suction enthalpy h_in = h(p_in, T_in)", "h", "result_3",
         when(count_is(c, [9, 10]), call("HPT", r(9), r(10)))),
        (20, "Suction entropy s_in = s(p_in, T_in)", "s", "result_5",
         when(count_is(c, [9, 10]), call("SPT", r(9), r(10)))),
        (21, "Discharge enthalpy h_out = h(p_out, T_out)", "h", "result_3",
         when(count_is(c, [11, 12]), call("HPT", r(11), r(12)))),
        (22, "Isentropic discharge enthalpy h_s = h(p_out, s_in)", "h", "result_3",
         when(f"AND(ISNUMBER({r(11)});ISNUMBER({r(20)}))", call("HPS", r(11), r(20)))),
        (23, "Temperature rise T_out - T_in", "dT", "result_2",
         when(count_is(c, [10, 12]), f"{r(12)}-{r(10)}")),
        (24, "Isentropic work h_s - h_in", "h", "result_3",
         when(f"COUNT({r(19)};{r(22)})=2", f"{r(22)}-{r(19)}")),
        (25, "Pump work per unit mass h_out - h_in", "h", "result_3",
         when(f"COUNT({r(19)};{r(21)})=2", f"{r(21)}-{r(19)}")),
        (26, "Efficiency (h_s - h_in)/(h_out - h_in)", "%", "result_pct",
         when(f"COUNT({r(24)};{r(25)})=2", f"{r(24)}/{r(25)}")),
        (27, "Efficiency test - design (percentage points)", "%", "result_dpct",
         when(f"COUNT({r(26)};{r(14)})=2", f"{r(26)}-{r(14)}")),
        (28, "Hydraulic power m (h_s - h_in)", "kW", "result_1",
         when(f"COUNT({r(13)};{r(24)})=2", f"{r(13)}*{r(24)}/IF({US};{KW_US};1)")),
        (29, "Power absorbed by the water m (h_out - h_in)", "kW", "result_1",
         when(f"COUNT({r(13)};{r(25)})=2", f"{r(13)}*{r(25)}/IF({US};{KW_US};1)")),
    ]


def pumps_sheet(demo):
    s = Sheet(2 + len(PUMP_COLS))
    s.header("Harrow Fen Power Station, Unit 2: feed and condensate pump efficiency" if demo
             else "Pump efficiency by the thermodynamic method",
             "Efficiency from suction and discharge pressure and temperature: (h_s - h_in)/(h_out - h_in),"
             " h_s = h(p_out, s_in), IAPWS-IF97.", linked_units_cell())
    s.add([c_text("Readings", "subtitle")], expect=7)
    s.readings(PUMP_ROWS, len(PUMP_COLS), PUMPS if demo else None, ["Feed pump", "Cond. pump"])
    s.note(PUMP_NOTE, "caution_note", expect=15)
    s.add([c_empty()])
    s.add([c_text("Results (thermodynamic method)", "subtitle")], expect=17)
    s.results("Pump", 8, PUMP_COLS, pump_results, expect=18)
    s.add([c_empty()])
    s.note("The power absorbed by the water excludes bearing, seal and coupling losses: the shaft power is"
           " larger. A leak-off or balance flow returned to suction belongs in the flow reading.")
    version_row(s)
    return s.xml("Pumps")


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


def run_results(c):
    def r(n):
        return ref(c, n)
    no_rh = f"AND(ISNUMBER({r(14)});{r(14)}=0)"
    base = f"AND(COUNT({r(9)};{r(19)};{r(27)};{r(28)})=4;OR({no_rh};COUNT({r(14)};{r(29)};{r(30)})=3))"
    # STEAM.HEATRATE.CYCLE/NET: m_ms, h_fw, h_ms, P_gen[, P_aux, eta_boiler], m_rh, h_crh, h_hrh.
    main = [r(9), r(28), r(27), f"1000*{r(19)}"]
    rh = [r(14), f"IF(ISNUMBER({r(29)});{r(29)};0)", f"IF(ISNUMBER({r(30)});{r(30)};0)"]
    return [
        (27, "Main steam enthalpy", "h", "result_2", when(count_is(c, [10, 11]), call("HPT", r(10), r(11)))),
        (28, "Final feedwater enthalpy", "h", "result_2", when(count_is(c, [12, 13]), call("HPT", r(12), r(13)))),
        (29, "Cold reheat enthalpy", "h", "result_2", when(count_is(c, [15, 16]), call("HPT", r(15), r(16)))),
        (30, "Hot reheat enthalpy", "h", "result_2", when(count_is(c, [17, 18]), call("HPT", r(17), r(18)))),
        (31, "Turbine cycle heat rate", "hr", "result_1", when(base, call("HEATRATECYCLE", *main, *rh))),
        (32, "Cycle heat rate test - design", "%", "result_dpct",
         when(f"COUNT({r(31)};{r(22)})=2", f"{r(31)}/{r(22)}-1")),
        (33, "Heat added to the cycle (heat rate x gross output / 1 kWh)", "MW", "result_2",
         when(f"ISNUMBER({r(31)})", f"{r(31)}*{r(19)}/{KWH}")),
        (34, "Turbine cycle efficiency (1 kWh / cycle heat rate)", "%", "result_pct",
         when(f"ISNUMBER({r(31)})", f"{KWH}/{r(31)}")),
        (35, "Net output (gross - auxiliary)", "MW", "result_2",
         when(f"COUNT({r(19)};{r(20)})=2", f"{r(19)}-{r(20)}")),
        (36, "Net unit heat rate (fuel heat per net kWh)", "hr", "result_1",
         when(f"AND({base};COUNT({r(20)};{r(21)})=2)",
              call("HEATRATENET", *main, f"1000*{r(20)}", r(21), *rh))),
        (37, "Net unit efficiency (1 kWh / net unit heat rate)", "%", "result_pct",
         when(f"ISNUMBER({r(36)})", f"{KWH}/{r(36)}")),
    ]


def heat_rate_sheet(demo):
    s = Sheet(2 + len(RUN_COLS))
    s.header("Harrow Fen Power Station, Unit 2: heat rate test" if demo else "Heat rate test: turbine cycle and net unit",
             "Heat added to the cycle m_ms (h_ms - h_fw) + m_rh (h_hrh - h_crh); cycle heat rate = heat added / gross"
             " output; net unit heat rate = heat added / boiler efficiency / (gross - auxiliary power).",
             linked_units_cell())
    s.add([c_text("Readings (one column per test run)", "subtitle")], expect=7)
    s.readings(RUN_ROWS, len(RUN_COLS), RUNS if demo else None, [f"Run {k + 1}" for k in range(len(RUN_COLS))])
    s.add([c_text("1 kWh in the heat rate's unit", "label"), unit_cell("hr"), c_formula(f"IF({US};{KWH_US};3600)", "result_2")],
          expect=23)
    s.add([c_empty()])
    s.add([c_text("Results", "subtitle")], expect=25)
    s.results("Test run", 8, RUN_COLS, run_results, expect=26)
    s.add([c_empty()])
    s.note("1 kWh is 3600 kJ or 3412.14 Btu; an efficiency is that energy divided by the heat rate."
           " Test - design is relative: (test / design - 1). Generator output and auxiliary power are in MW; the"
           " add-in takes kW (x 1000 in the formulas).")
    version_row(s)
    return s.xml("Heat rate")


# ---------------------------------------------------------------- document
def number_style(name, decimals):
    return (f'<number:number-style style:name="{name}"><number:number number:decimal-places="{decimals}" '
            f'number:min-decimal-places="{decimals}" number:min-integer-digits="1" number:grouping="true"/>'
            '</number:number-style>')


def result_style(name, data_style):
    return (f'<style:style style:name="{name}" style:family="table-cell" style:data-style-name="{data_style}">'
            '<style:table-cell-properties fo:background-color="#eeeeee"/></style:style>')


def document(demo):
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
              ' fo:color="#b00000"/></style:style>']
    for d in (1, 2, 3, 5):
        extra += [number_style(f"Nr{d}", d), result_style(f"result_{d}", f"Nr{d}")]
    auto = COMMON_STYLES + "  " + "\n  ".join(extra) + CELL_STYLES
    return content_xml(auto, heaters_sheet(demo) + pumps_sheet(demo) + heat_rate_sheet(demo))


def write(path, mimetype, demo, title):
    write_package(path, mimetype, [("content.xml", document(demo)), ("styles.xml", styles_xml()),
                                   ("meta.xml", meta_xml(title, "gen_plant_workbook.py"))])


def main():
    if len(sys.argv) != 2:
        sys.exit("usage: gen_plant_workbook.py OUTDIR")
    out = sys.argv[1]
    os.makedirs(out, exist_ok=True)
    write(os.path.join(out, "harrow-fen-unit2-plant-performance.ods"), MIME_ODS, True,
          "Harrow Fen Unit 2 feedwater heater, pump and heat rate test (fictional demo)")
    write(os.path.join(out, "isentra-plant-performance.ots"), MIME_OTS, False,
          "Plant performance test: heaters, pumps, heat rate (Isentra)")


if __name__ == "__main__":
    main()
