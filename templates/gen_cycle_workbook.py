#!/usr/bin/python3
# SPDX-License-Identifier: MPL-2.0
"""Writes the cycle heat-balance workbook (OpenDocument).

    gen_cycle_workbook.py OUTDIR

writes into OUTDIR:
  harrow-fen-unit3-cycle-heat-balance.ods     the demo: the design heat balance of the (fictional)
                                              Harrow Fen Power Station, Unit 3, and three what-if cases
  harrow-fen-unit3-cycle-heat-balance-us.ods  the same design in round US figures (units cell "US")
  isentra-cycle-heat-balance.ots              the template: the design inputs kept, the cases blank
  isentra-cycle-heat-balance-us.ots           the same in US units (the chart axes are fixed per file)

A single-reheat regenerative cycle: HP, IP and LP sections with their own
efficiencies (the LP section's wet expansion by the Baumann rule), three
closed HP heaters with drain coolers cascading to the deaerator, the
deaerator, three closed LP heaters cascading to the condenser with the LP2
drain pumped forward (a switch), feed, condensate and drain pumps. Every
extraction flow comes from its heater's balance, top heater down, in one pass
(no circular references): the add-in's cycle functions (STEAM.TURBINE.HLINE,
.ELEP, .UEEP, STEAM.FWH.HDRAIN, STEAM.DEAERATOR.EXTRACTION,
STEAM.FWH.DRAINPUMP.BALANCE) solve what would otherwise loop.

Sheets: Cycle (units cell B5, the input block, the results of every case side
by side), Balance (every step of the balance, one column per case), Points
(every numbered point of the case chosen in Cycle.B6: p, T, h, s, x, flow),
Charts (h-s expansion line, T-s diagram) and the hidden ChartData.
Columns D-G are the cases on every sheet; column A holds the key each
formula uses. A case column left blank takes the design value (column D).

This script is the reviewable source of all three files (standard library
only; the build runs it with /usr/bin/python3). The files carry no cached
results: Calc computes them on load. Harrow Fen Power Station is a made-up
plant; all figures are invented for the demo.
"""
import os
import re
import sys

sys.dont_write_bytecode = True  # keep templates/ free of __pycache__
from odf_writer import (ADDIN, MIME_ODS, MIME_OTS, NS, COMMON_STYLES, CELL_STYLES, col_name, col_index,  # noqa: E402
                        c_span, c_text, c_num, c_formula, c_empty, c_blank, row, grid_rows, table_style, column_style,
                        content_xml as document_content, styles_xml, meta_xml, write_package)
from xml.sax.saxutils import escape, quoteattr  # noqa: E402

CYCLE, BAL, PTS, CHARTS, DATA = "Cycle", "Balance", "Points", "Charts", "ChartData"
UNITS = "[$Cycle.$B$5]"       # the units cell
SEL = "[$Cycle.$B$6]"         # the case shown on the Points and Charts sheets
CASE_COLS = "DEFG"            # one column per case, on Cycle and Balance
US_TEST = f'UPPER({UNITS})="US"'

# ---------------------------------------------------------------- quantities
# kind: (SI unit, US unit, cell style)
KINDS = {
    "p": ("MPa", "psia", "r4"), "dp": ("MPa", "psi", "r4"), "T": ("°C", "°F", "r2"), "dT": ("K", "°F", "r2"),
    "m": ("kg/s", "lbm/h", "rm"), "h": ("kJ/kg", "Btu/lbm", "r2"), "s": ("kJ/(kg·K)", "Btu/(lbm·°F)", "r5"),
    "f": ("fraction", "fraction", "r4"), "sw": ("1 or 0", "1 or 0", "r0"), "MW": ("MW", "MW", "r3"),
    "kW": ("kW", "kW", "rg"), "hr": ("kJ/kWh", "Btu/kWh", "r1"), "pct": ("%", "%", "rpct"),
    "dpct": ("%", "%", "rdpct"), "g": ("", "", "rg"), "x": ("–", "–", "r5"),
}
PSI_MPA = 0.006894757293168361       # MPa per psi (NIST SP 811 (2008) App. B, exact)
LBMH_KGS = 3600.0 / 0.45359237       # lbm/h per kg/s (exact)
BTULBM_KJKG = 2.326                  # kJ/kg per Btu/lbm (exact, IT Btu)


def to_us(kind, v):
    if kind in ("p", "dp"):
        return v / PSI_MPA
    if kind == "T":
        return v * 1.8 + 32
    if kind == "dT":
        return v * 1.8
    if kind == "m":
        return v * LBMH_KGS
    if kind == "h":
        return v / BTULBM_KJKG
    return v


def us_design(kind, v):
    """A design input in US figures as an engineer writes them (the same design, rounded,
    as the US copies of the turbine and plant workbooks round theirs): pressures in psia to
    four or five significant figures (1 psi from 1000 psia, 0.1 from 100, 0.01 from 10,
    0.001 below), pressure heads to 0.1 psi, temperatures to 0.1 °F, TTDs and DCAs to whole
    °F, flows to whole klb/h, enthalpy differences to 0.1 Btu/lbm; fractions and switches
    as they are. The results then differ from the SI demo's within that rounding."""
    x = to_us(kind, v)
    if kind == "p":
        step = 1.0 if x >= 1000 else 0.1 if x >= 100 else 0.01 if x >= 10 else 0.001
        return round(round(x / step) * step, 3)
    if kind == "dp":
        return round(x, 1)
    if kind == "T":
        return round(x, 1)
    if kind == "dT":
        return float(round(x))
    if kind == "m":
        return round(x / 1000) * 1000.0
    if kind == "h":
        return round(x, 1)
    return x


def unit_formula(kind):
    si, us, _ = KINDS[kind]
    if si == us:
        return None
    return f'IF({US_TEST};"{us}";"{si}")'


# ---------------------------------------------------------------- inputs
# (key, description, kind, design value in SI). Invented for Harrow Fen Unit 3,
# a 660 MW class subcritical single-reheat unit (values of common practice).
INPUTS = [
    ("m_ms", "Main steam (throttle) flow", "m", 565.0),
    ("p_ms", "Throttle pressure", "p", 16.7),
    ("T_ms", "Throttle temperature", "T", 540.0),
    ("eta_hp", "HP section efficiency (throttle to HP exhaust)", "f", 0.87),
    ("p_x7", "HP stage extraction pressure (to HP7)", "p", 6.2),
    ("p_crh", "HP exhaust pressure (cold reheat; extraction to HP6)", "p", 4.1),
    ("dp_rh", "Reheater pressure drop, fraction of cold reheat pressure", "f", 0.08),
    ("T_rh", "Hot reheat temperature", "T", 540.0),
    ("eta_ip", "IP section efficiency", "f", 0.91),
    ("p_x5", "IP stage extraction pressure (to HP5)", "p", 1.9),
    ("p_ipx", "IP exhaust pressure (extraction to the deaerator)", "p", 0.95),
    ("dp_xo", "Crossover pressure drop, fraction", "f", 0.02),
    ("eta_lp", "LP section dry-steam efficiency", "f", 0.90),
    ("a_b", "Baumann coefficient (moisture loss per unit mean moisture)", "f", 1.0),
    ("h_el", "LP exhaust loss (leaving energy and hood loss per kg exhaust)", "h", 30.0),
    ("p_x3", "LP stage extraction pressure (to LP3)", "p", 0.45),
    ("p_x2", "LP stage extraction pressure (to LP2)", "p", 0.16),
    ("p_x1", "LP stage extraction pressure (to LP1)", "p", 0.045),
    ("p_c", "Condenser pressure", "p", 0.0065),
    ("dp_7", "Extraction line pressure drop HP7, fraction", "f", 0.03),
    ("dp_6", "Extraction line pressure drop HP6, fraction", "f", 0.03),
    ("dp_5", "Extraction line pressure drop HP5, fraction", "f", 0.03),
    ("dp_4", "Extraction line pressure drop deaerator, fraction", "f", 0.05),
    ("dp_3", "Extraction line pressure drop LP3, fraction", "f", 0.05),
    ("dp_2", "Extraction line pressure drop LP2, fraction", "f", 0.05),
    ("dp_1", "Extraction line pressure drop LP1, fraction", "f", 0.05),
    ("ttd_7", "TTD HP7 (Tsat(shell) - feedwater out)", "dT", -1.5),
    ("ttd_6", "TTD HP6", "dT", 0.0),
    ("ttd_5", "TTD HP5", "dT", 0.0),
    ("ttd_3", "TTD LP3", "dT", 2.8),
    ("ttd_2", "TTD LP2", "dT", 2.8),
    ("ttd_1", "TTD LP1", "dT", 2.8),
    ("dca_7", "DCA HP7 (drain out - feedwater in)", "dT", 5.6),
    ("dca_6", "DCA HP6", "dT", 5.6),
    ("dca_5", "DCA HP5", "dT", 5.6),
    ("dca_3", "DCA LP3 (referred to the water after the pumped drain joins)", "dT", 5.6),
    ("dca_2", "DCA LP2", "dT", 5.6),
    ("dca_1", "DCA LP1", "dT", 5.6),
    ("on_7", "HP7 (top heater) in service: 1, out of service: 0", "sw", 1),
    ("pf_2", "LP2 drain pumped forward: 1, cascaded to LP1: 0", "sw", 1),
    ("p_fw", "Feed pump discharge pressure (feedwater through HP5-HP7)", "p", 20.0),
    ("dp_bfs", "Feed pump suction head above the deaerator pressure", "dp", 0.25),
    ("eta_bfp", "Feed pump efficiency", "f", 0.82),
    ("dp_cps", "Condensate pump suction head above the condenser pressure", "dp", 0.05),
    ("p_cp", "Condensate pump discharge pressure (condensate through LP1-LP3)", "p", 2.0),
    ("eta_cp", "Condensate pump efficiency", "f", 0.78),
    ("eta_dp", "LP2 drain pump efficiency", "f", 0.72),
    ("eta_m", "Turbine mechanical efficiency", "f", 0.995),
    ("eta_g", "Generator efficiency", "f", 0.987),
]
IN_KIND = {k: kind for k, _, kind, _ in INPUTS}
# Cases: name (SI, US) and the inputs that differ from the design.
CASES = [
    (("Design", "Design"), {}),
    (("Condenser 9 kPa", "Condenser 1.305 psia"), {"p_c": 0.009}),
    (("HP7 out of service", "HP7 out of service"), {"on_7": 0}),
    (("Throttle 525 °C", "Throttle 977 °F"), {"T_ms": 525.0}),
]

# ---------------------------------------------------------------- Cycle sheet rows
IN_ROW0 = 11       # first numeric input row on Cycle (row 10: case names)
NAME_ROW = 10

# ---------------------------------------------------------------- Balance rows
# Templates: {key} is the same column's cell of that key on Balance; calls
# through call(); each formula is wrapped in IF({ok}; ...; "") unless noted.


def call(method, *args):
    return f"{ADDIN}{method.upper()}({';'.join(args)};{UNITS})"


def k(key):
    return "{" + key + "}"


def dp_row(i):
    """INDEX into the pumped-drain balance row (1..7)."""
    return ("INDEX(" + call("fwhDrainpumpBalance", k("m_c"), k("h_fw1"), k("h_fw2"), k("h_fw3"), k("p_cp"), k("h_x2"),
                            k("h_d2"), k("h_dp"), k("h_x3"), k("p_s3"), k("dca_3"), k("pf_2"), "0", "0")
            + f";1;{i})")


def shell(p_key, drop):
    return f"{k(p_key)}*(1-{k(drop)})"


BALANCE = [
    # key, description, kind, formula
    ("p_hrh", "Hot reheat pressure (IP inlet)", "p", f"{k('p_crh')}*(1-{k('dp_rh')})"),
    ("p_lpi", "LP inlet pressure (after the crossover)", "p", f"{k('p_ipx')}*(1-{k('dp_xo')})"),
    ("p_s7", "HP7 shell pressure", "p", shell("p_x7", "dp_7")),
    ("p_s6", "HP6 shell pressure", "p", shell("p_crh", "dp_6")),
    ("p_s5", "HP5 shell pressure", "p", shell("p_x5", "dp_5")),
    ("p_da", "Deaerator pressure", "p", shell("p_ipx", "dp_4")),
    ("p_s3", "LP3 shell pressure", "p", shell("p_x3", "dp_3")),
    ("p_s2", "LP2 shell pressure", "p", shell("p_x2", "dp_2")),
    ("p_s1", "LP1 shell pressure", "p", shell("p_x1", "dp_1")),
    # turbine
    ("h_ms", "Main steam enthalpy", "h", call("hPT", k("p_ms"), k("T_ms"))),
    ("h_x7", "HP stage extraction enthalpy (on the HP expansion line)", "h",
     call("turbineHlinePT", k("p_ms"), k("T_ms"), k("p_crh"), k("eta_hp"), k("p_x7"))),
    ("h_crh", "HP exhaust (cold reheat) enthalpy", "h",
     call("turbineHoutPT", k("p_ms"), k("T_ms"), k("p_crh"), k("eta_hp"))),
    ("h_hrh", "Hot reheat enthalpy", "h", call("hPT", k("p_hrh"), k("T_rh"))),
    ("h_x5", "IP stage extraction enthalpy (on the IP expansion line)", "h",
     call("turbineHlinePT", k("p_hrh"), k("T_rh"), k("p_ipx"), k("eta_ip"), k("p_x5"))),
    ("h_ipx", "IP exhaust enthalpy (also the LP inlet: the crossover throttles)", "h",
     call("turbineHoutPT", k("p_hrh"), k("T_rh"), k("p_ipx"), k("eta_ip"))),
    ("h_elep", "LP expansion-line end point (Baumann rule)", "h",
     call("turbineElepPH", k("p_lpi"), k("h_ipx"), k("p_c"), k("eta_lp"), k("a_b"))),
    ("h_ueep", "LP used energy end point (ELEP + exhaust loss)", "h",
     call("turbineUeepPH", k("p_lpi"), k("h_ipx"), k("p_c"), k("eta_lp"), k("a_b"), k("h_el"))),
    ("eta_lpw", "LP section efficiency with the moisture loss", "f",
     call("turbineEffPHPH", k("p_lpi"), k("h_ipx"), k("p_c"), k("h_elep"))),
    ("h_x3", "LP3 extraction enthalpy (on the LP expansion line)", "h",
     call("turbineHlinePH", k("p_lpi"), k("h_ipx"), k("p_c"), k("eta_lpw"), k("p_x3"))),
    ("h_x2", "LP2 extraction enthalpy", "h",
     call("turbineHlinePH", k("p_lpi"), k("h_ipx"), k("p_c"), k("eta_lpw"), k("p_x2"))),
    ("h_x1", "LP1 extraction enthalpy", "h",
     call("turbineHlinePH", k("p_lpi"), k("h_ipx"), k("p_c"), k("eta_lpw"), k("p_x1"))),
    ("x_elep", "Quality at the ELEP", "x", call("xPH", k("p_c"), k("h_elep"))),
    ("y_exh", "LP exhaust moisture at the ELEP, 1 - x", "pct", f"1-{k('x_elep')}"),
    ("x_ueep", "Quality at the UEEP", "x", call("xPH", k("p_c"), k("h_ueep"))),
    # condensate and feedwater
    ("T_c", "Condenser saturation temperature", "T", call("tsat", k("p_c"))),
    ("h_c", "Condensate (hotwell, saturated liquid)", "h", call("hfP", k("p_c"))),
    ("p_cps", "Condensate pump suction pressure", "p", f"{k('p_c')}+{k('dp_cps')}"),
    ("h_cp", "Condensate pump discharge enthalpy", "h",
     call("pumpHoutPH", k("p_cps"), k("h_c"), k("p_cp"), k("eta_cp"))),
    ("T_cp", "Condensate pump discharge temperature", "T", call("tPH", k("p_cp"), k("h_cp"))),
    ("T_fw1", "LP1 outlet temperature, Tsat(shell) - TTD", "T", f"{call('tsat', k('p_s1'))}-{k('ttd_1')}"),
    ("h_fw1", "LP1 outlet enthalpy", "h", call("hPT", k("p_cp"), k("T_fw1"))),
    ("T_fw2", "LP2 outlet temperature", "T", f"{call('tsat', k('p_s2'))}-{k('ttd_2')}"),
    ("h_fw2", "LP2 outlet enthalpy", "h", call("hPT", k("p_cp"), k("T_fw2"))),
    ("T_fw3", "LP3 outlet temperature (to the deaerator)", "T", f"{call('tsat', k('p_s3'))}-{k('ttd_3')}"),
    ("h_fw3", "LP3 outlet enthalpy", "h", call("hPT", k("p_cp"), k("T_fw3"))),
    ("T_da", "Deaerator outlet temperature (saturated)", "T", call("tsat", k("p_da"))),
    ("h_da", "Deaerator outlet enthalpy (saturated liquid)", "h", call("hfP", k("p_da"))),
    ("p_bfs", "Feed pump suction pressure", "p", f"{k('p_da')}+{k('dp_bfs')}"),
    ("h_bfp", "Feed pump discharge enthalpy", "h", call("pumpHoutPH", k("p_bfs"), k("h_da"), k("p_fw"), k("eta_bfp"))),
    ("T_bfp", "Feed pump discharge temperature", "T", call("tPH", k("p_fw"), k("h_bfp"))),
    ("T_fw5", "HP5 outlet temperature", "T", f"{call('tsat', k('p_s5'))}-{k('ttd_5')}"),
    ("h_fw5", "HP5 outlet enthalpy", "h", call("hPT", k("p_fw"), k("T_fw5"))),
    ("T_fw6", "HP6 outlet temperature", "T", f"{call('tsat', k('p_s6'))}-{k('ttd_6')}"),
    ("h_fw6", "HP6 outlet enthalpy", "h", call("hPT", k("p_fw"), k("T_fw6"))),
    ("T_fw7", "HP7 outlet temperature (in service)", "T", f"{call('tsat', k('p_s7'))}-{k('ttd_7')}"),
    ("h_fw7", "HP7 outlet enthalpy (in service)", "h", call("hPT", k("p_fw"), k("T_fw7"))),
    ("h_ffw", "Final feedwater enthalpy (HP6 outlet when HP7 is out)", "h",
     f"{k('h_fw6')}+{k('on_7')}*({k('h_fw7')}-{k('h_fw6')})"),
    ("T_ffw", "Final feedwater temperature", "T", call("tPH", k("p_fw"), k("h_ffw"))),
    # drains
    ("h_d7", "HP7 drain enthalpy (drain cooler)", "h", call("fwhHdrain", k("p_s7"), k("T_fw6"), k("dca_7"))),
    ("h_d6", "HP6 drain enthalpy", "h", call("fwhHdrain", k("p_s6"), k("T_fw5"), k("dca_6"))),
    ("h_d5", "HP5 drain enthalpy (to the deaerator)", "h", call("fwhHdrain", k("p_s5"), k("T_bfp"), k("dca_5"))),
    ("h_d2", "LP2 drain enthalpy", "h", call("fwhHdrain", k("p_s2"), k("T_fw1"), k("dca_2"))),
    ("T_d2", "LP2 drain temperature", "T", f"{k('T_fw1')}+{k('dca_2')}"),
    ("h_dp", "LP2 drain after the drain pump", "h", call("pumpHoutPT", k("p_s2"), k("T_d2"), k("p_cp"), k("eta_dp"))),
    ("h_d1", "LP1 drain enthalpy (to the condenser)", "h", call("fwhHdrain", k("p_s1"), k("T_cp"), k("dca_1"))),
    # flows, top heater down
    ("m_e7", "HP7 extraction flow (0 when out of service)", "m",
     f"{k('on_7')}*" + call("fwhExtraction", k("m_ms"), k("h_fw6"), k("h_fw7"), k("h_x7"), k("h_d7"), "0", "0")),
    ("m_e6", "HP6 extraction flow", "m",
     call("fwhExtraction", k("m_ms"), k("h_fw5"), k("h_fw6"), k("h_crh"), k("h_d6"), k("m_e7"), k("h_d7"))),
    ("m_d6", "HP6 drain flow (to HP5)", "m", f"{k('m_e7')}+{k('m_e6')}"),
    ("m_e5", "HP5 extraction flow", "m",
     call("fwhExtraction", k("m_ms"), k("h_bfp"), k("h_fw5"), k("h_x5"), k("h_d5"), k("m_d6"), k("h_d6"))),
    ("m_d5", "HP5 drain flow (to the deaerator)", "m", f"{k('m_d6')}+{k('m_e5')}"),
    ("m_e4", "Deaerator extraction flow", "m",
     call("deaeratorExtraction", k("m_ms"), k("h_fw3"), k("p_da"), k("h_ipx"), k("m_d5"), k("h_d5"))),
    ("m_c", "Condensate flow into the deaerator (through LP3)", "m", f"{k('m_ms')}-{k('m_e4')}-{k('m_d5')}"),
    ("m_e3", "LP3 extraction flow", "m", dp_row(1)),
    ("m_e2", "LP2 extraction flow", "m", dp_row(2)),
    ("m_pump", "LP2 drain pumped forward", "m", dp_row(3)),
    ("m_down", "LP2 drain cascading to LP1", "m", dp_row(4)),
    ("h_mix", "LP3 inlet enthalpy (after the pumped drain joins)", "h", dp_row(5)),
    ("T_mix", "LP3 inlet temperature", "T", dp_row(6)),
    ("h_d3", "LP3 drain enthalpy (to LP2)", "h", dp_row(7)),
    ("m_lp1", "Condensate flow through the condensate pump, LP1 and LP2", "m", f"{k('m_c')}-{k('m_pump')}"),
    ("m_e1", "LP1 extraction flow", "m",
     call("fwhExtraction", k("m_lp1"), k("h_cp"), k("h_fw1"), k("h_x1"), k("h_d1"), k("m_down"), k("h_d2"))),
    ("m_d2", "LP2 drain flow (own and LP3's)", "m", f"{k('m_e3')}+{k('m_e2')}"),
    ("m_d1", "LP1 drain flow (to the condenser)", "m", f"{k('m_e1')}+{k('m_down')}"),
    ("m_hpx", "HP exhaust flow", "m", f"{k('m_ms')}-{k('m_e7')}"),
    ("m_rh", "Reheat flow", "m", f"{k('m_hpx')}-{k('m_e6')}"),
    ("m_ipx", "IP exhaust flow", "m", f"{k('m_rh')}-{k('m_e5')}"),
    ("m_lp", "LP inlet flow", "m", f"{k('m_ipx')}-{k('m_e4')}"),
    ("m_exh", "LP exhaust flow", "m", f"{k('m_lp')}-{k('m_e3')}-{k('m_e2')}-{k('m_e1')}"),
    ("m_cin", "Condenser outlet flow (exhaust and LP1 drains)", "m", f"{k('m_exh')}+{k('m_d1')}"),
    ("res_m", "Mass balance residual: condenser outlet - condensate pump flow", "g", f"{k('m_cin')}-{k('m_lp1')}"),
    ("res_mr", "Mass balance residual / throttle flow", "g", f"{k('res_m')}/{k('m_ms')}"),
    # heater energy balances: heat taken up by the water - heat given by steam and drains
    ("q_7", "HP7 energy balance residual", "kW",
     f"({k('on_7')}*{k('m_ms')}*({k('h_fw7')}-{k('h_fw6')})-{k('m_e7')}*({k('h_x7')}-{k('h_d7')}))*{k('kwf')}"),
    ("q_6", "HP6 energy balance residual", "kW",
     f"({k('m_ms')}*({k('h_fw6')}-{k('h_fw5')})-{k('m_e6')}*({k('h_crh')}-{k('h_d6')})"
     f"-{k('m_e7')}*({k('h_d7')}-{k('h_d6')}))*{k('kwf')}"),
    ("q_5", "HP5 energy balance residual", "kW",
     f"({k('m_ms')}*({k('h_fw5')}-{k('h_bfp')})-{k('m_e5')}*({k('h_x5')}-{k('h_d5')})"
     f"-{k('m_d6')}*({k('h_d6')}-{k('h_d5')}))*{k('kwf')}"),
    ("q_4", "Deaerator energy balance residual", "kW",
     f"({k('m_ms')}*{k('h_da')}-{k('m_c')}*{k('h_fw3')}-{k('m_e4')}*{k('h_ipx')}-{k('m_d5')}*{k('h_d5')})*{k('kwf')}"),
    ("q_3", "LP3 energy balance residual", "kW",
     f"({k('m_c')}*({k('h_fw3')}-{k('h_mix')})-{k('m_e3')}*({k('h_x3')}-{k('h_d3')}))*{k('kwf')}"),
    ("q_mx", "Pumped-drain mix point energy residual", "kW",
     f"({k('m_c')}*{k('h_mix')}-{k('m_lp1')}*{k('h_fw2')}-{k('m_pump')}*{k('h_dp')})*{k('kwf')}"),
    ("q_2", "LP2 energy balance residual", "kW",
     f"({k('m_lp1')}*({k('h_fw2')}-{k('h_fw1')})-{k('m_e2')}*({k('h_x2')}-{k('h_d2')})"
     f"-{k('m_e3')}*({k('h_d3')}-{k('h_d2')}))*{k('kwf')}"),
    ("q_1", "LP1 energy balance residual", "kW",
     f"({k('m_lp1')}*({k('h_fw1')}-{k('h_cp')})-{k('m_e1')}*({k('h_x1')}-{k('h_d1')})"
     f"-{k('m_down')}*({k('h_d2')}-{k('h_d1')}))*{k('kwf')}"),
    # work, output, heat rate
    ("W_hp", "HP section work", "MW",
     f"({k('m_ms')}*({k('h_ms')}-{k('h_x7')})+{k('m_hpx')}*({k('h_x7')}-{k('h_crh')}))*{k('kwf')}/1000"),
    ("W_ip", "IP section work", "MW",
     f"({k('m_rh')}*({k('h_hrh')}-{k('h_x5')})+{k('m_ipx')}*({k('h_x5')}-{k('h_ipx')}))*{k('kwf')}/1000"),
    ("W_lp", "LP section work (to the UEEP)", "MW",
     f"({k('m_lp')}*({k('h_ipx')}-{k('h_x3')})+({k('m_lp')}-{k('m_e3')})*({k('h_x3')}-{k('h_x2')})"
     f"+({k('m_lp')}-{k('m_e3')}-{k('m_e2')})*({k('h_x2')}-{k('h_x1')})+{k('m_exh')}*({k('h_x1')}-{k('h_ueep')}))"
     f"*{k('kwf')}/1000"),
    ("W_t", "Turbine work, all sections", "MW", f"{k('W_hp')}+{k('W_ip')}+{k('W_lp')}"),
    ("P_gen", "Generator output (gross): work x mechanical x generator efficiency", "MW",
     f"{k('W_t')}*{k('eta_m')}*{k('eta_g')}"),
    ("P_bfp", "Feed pump power (work given to the water)", "MW", f"{k('m_ms')}*({k('h_bfp')}-{k('h_da')})*{k('kwf')}/1000"),
    ("P_cp", "Condensate pump power", "MW", f"{k('m_lp1')}*({k('h_cp')}-{k('h_c')})*{k('kwf')}/1000"),
    ("P_dp", "Drain pump power", "MW", f"{k('m_pump')}*({k('h_dp')}-{k('h_d2')})*{k('kwf')}/1000"),
    ("P_pmp", "Pump power, all pumps", "MW", f"{k('P_bfp')}+{k('P_cp')}+{k('P_dp')}"),
    ("P_net", "Net output (generator output - pump power)", "MW", f"{k('P_gen')}-{k('P_pmp')}"),
    ("Q_in", "Heat added (boiler and reheater)", "MW",
     f"({k('m_ms')}*({k('h_ms')}-{k('h_ffw')})+{k('m_rh')}*({k('h_hrh')}-{k('h_crh')}))*{k('kwf')}/1000"),
    ("Q_cd", "Heat to the condenser", "MW",
     f"({k('m_exh')}*{k('h_ueep')}+{k('m_d1')}*{k('h_d1')}-{k('m_lp1')}*{k('h_c')})*{k('kwf')}/1000"),
    ("res_e", "Cycle energy residual: heat added + pumps - turbine work - condenser", "g",
     f"{k('Q_in')}+{k('P_pmp')}-{k('W_t')}-{k('Q_cd')}"),
    ("HR_g", "Gross cycle heat rate", "hr",
     call("heatRateCycle", k("m_ms"), k("h_ffw"), k("h_ms"), f"{k('P_gen')}*1000", k("m_rh"), k("h_crh"), k("h_hrh"))),
    ("HR_n", "Net cycle heat rate (pump power deducted)", "hr",
     call("heatRateNet", k("m_ms"), k("h_ffw"), k("h_ms"), f"{k('P_gen')}*1000", f"{k('P_pmp')}*1000", "1",
          k("m_rh"), k("h_crh"), k("h_hrh"))),
    ("eff_g", "Gross cycle efficiency", "pct", f"{k('chr')}/{k('HR_g')}"),
    ("eff_n", "Net cycle efficiency", "pct", f"{k('chr')}/{k('HR_n')}"),
    # differences from the design case (column D); need both columns complete
    ("dHR_g", "Gross heat rate - design", "hr", "DIFF:HR_g"),
    ("dHR_gp", "Gross heat rate / design - 1", "dpct", "REL:HR_g"),
    ("dHR_n", "Net heat rate - design", "hr", "DIFF:HR_n"),
    ("dHR_np", "Net heat rate / design - 1", "dpct", "REL:HR_n"),
]

BAL_HEAD = 3       # header row on Balance
BAL_NAME = 4       # case names
BAL_KWF = 5        # kW per (flow unit x enthalpy unit)
BAL_CHR = 6        # 1 kWh in the heat rate's unit
BAL_IN0 = 8        # first effective input
BAL_OK = BAL_IN0 + len(INPUTS)        # the "inputs complete" helper row
BAL_OKD = BAL_OK + 1                  # complete and design complete
BAL_ROW0 = BAL_OKD + 2                # first computed row

ROW = {"name": BAL_NAME, "kwf": BAL_KWF, "chr": BAL_CHR, "ok": BAL_OK, "okd": BAL_OKD}
for i, (key, *_rest) in enumerate(INPUTS):
    ROW[key] = BAL_IN0 + i
for i, (key, *_rest) in enumerate(BALANCE):
    ROW[key] = BAL_ROW0 + i
BAL_LAST = BAL_ROW0 + len(BALANCE) - 1
KIND = dict(IN_KIND)
KIND.update({key: kind for key, _, kind, _ in BALANCE})


def expand(template, col):
    def sub(m):
        return f"[.{col}{ROW[m.group(1)]}]"
    return re.sub(r"\{(\w+)\}", sub, template)


# ---------------------------------------------------------------- points
POINTS = [  # (name, p key, h key, flow key)
    ("Main steam (throttle)", "p_ms", "h_ms", "m_ms"),
    ("HP7 extraction (HP stage)", "p_x7", "h_x7", "m_e7"),
    ("HP exhaust (cold reheat)", "p_crh", "h_crh", "m_hpx"),
    ("Hot reheat (IP inlet)", "p_hrh", "h_hrh", "m_rh"),
    ("HP5 extraction (IP stage)", "p_x5", "h_x5", "m_e5"),
    ("IP exhaust", "p_ipx", "h_ipx", "m_ipx"),
    ("LP inlet (after the crossover)", "p_lpi", "h_ipx", "m_lp"),
    ("LP3 extraction", "p_x3", "h_x3", "m_e3"),
    ("LP2 extraction", "p_x2", "h_x2", "m_e2"),
    ("LP1 extraction", "p_x1", "h_x1", "m_e1"),
    ("LP expansion-line end point (ELEP)", "p_c", "h_elep", "m_exh"),
    ("LP used energy end point (UEEP), to the condenser", "p_c", "h_ueep", "m_exh"),
    ("Condensate (hotwell)", "p_c", "h_c", "m_lp1"),
    ("Condensate pump discharge", "p_cp", "h_cp", "m_lp1"),
    ("LP1 outlet", "p_cp", "h_fw1", "m_lp1"),
    ("LP2 outlet", "p_cp", "h_fw2", "m_lp1"),
    ("LP3 inlet (after the pumped drain joins)", "p_cp", "h_mix", "m_c"),
    ("LP3 outlet (to the deaerator)", "p_cp", "h_fw3", "m_c"),
    ("Deaerator outlet", "p_da", "h_da", "m_ms"),
    ("Feed pump discharge", "p_fw", "h_bfp", "m_ms"),
    ("HP5 outlet", "p_fw", "h_fw5", "m_ms"),
    ("HP6 outlet", "p_fw", "h_fw6", "m_ms"),
    ("Final feedwater (HP7 outlet), to the boiler", "p_fw", "h_ffw", "m_ms"),
    ("HP7 extraction steam at the heater", "p_s7", "h_x7", "m_e7"),
    ("HP6 extraction steam at the heater", "p_s6", "h_crh", "m_e6"),
    ("HP5 extraction steam at the heater", "p_s5", "h_x5", "m_e5"),
    ("Deaerator extraction steam", "p_da", "h_ipx", "m_e4"),
    ("LP3 extraction steam at the heater", "p_s3", "h_x3", "m_e3"),
    ("LP2 extraction steam at the heater", "p_s2", "h_x2", "m_e2"),
    ("LP1 extraction steam at the heater", "p_s1", "h_x1", "m_e1"),
    ("HP7 drain (to HP6)", "p_s7", "h_d7", "m_e7"),
    ("HP6 drain (to HP5)", "p_s6", "h_d6", "m_d6"),
    ("HP5 drain (to the deaerator)", "p_s5", "h_d5", "m_d5"),
    ("LP3 drain (to LP2)", "p_s3", "h_d3", "m_e3"),
    ("LP2 drain", "p_s2", "h_d2", "m_d2"),
    ("LP2 drain after the drain pump (to the LP3 inlet)", "p_cp", "h_dp", "m_pump"),
    ("LP1 drain (to the condenser)", "p_s1", "h_d1", "m_d1"),
]
PT_HEAD = 6
PT_ROW0 = 8   # point 1
PT_OK = "[$Points.$B$4]"
PT_SEL = "[$Points.$B$3]"


def pt_row(n):  # 1-based point number
    return PT_ROW0 + n - 1


# ---------------------------------------------------------------- cell helpers
def u_cell(kind, style="unit"):
    f = unit_formula(kind)
    if f is None:
        return c_text(KINDS[kind][0], style)
    return c_formula(f, style, True)


def res_style(kind):
    return KINDS[kind][2]


# ---------------------------------------------------------------- Cycle sheet
SUMMARY = [  # label, balance key
    ("Generator output (gross)", "P_gen"), ("Pump power (feed, condensate and drain pumps)", "P_pmp"),
    ("Net output", "P_net"), ("Heat added (boiler and reheater)", "Q_in"),
    ("Gross cycle heat rate", "HR_g"), ("   difference from design", "dHR_g"), ("   difference from design, %", "dHR_gp"),
    ("Net cycle heat rate (pump power deducted)", "HR_n"), ("   difference from design", "dHR_n"),
    ("   difference from design, %", "dHR_np"),
    ("Gross cycle efficiency", "eff_g"), ("Net cycle efficiency", "eff_n"),
    ("HP section work", "W_hp"), ("IP section work", "W_ip"), ("LP section work", "W_lp"),
    ("Final feedwater temperature", "T_ffw"), ("Reheat flow", "m_rh"), ("LP exhaust flow", "m_exh"),
    ("LP efficiency with the moisture loss (Baumann)", "eta_lpw"), ("LP exhaust moisture (at the ELEP)", "y_exh"),
    ("LP expansion-line end point (ELEP)", "h_elep"), ("LP used energy end point (UEEP)", "h_ueep"),
    ("HP7 extraction flow", "m_e7"), ("Deaerator extraction flow", "m_e4"),
    ("Mass balance residual / throttle flow", "res_mr"), ("Cycle energy residual", "res_e"),
]
SUM_HEAD = IN_ROW0 + len(INPUTS) + 2
SUM_ROW0 = SUM_HEAD + 1
SUM_ROW = {key: SUM_ROW0 + i for i, (_, key) in enumerate(SUMMARY)}


def cycle_sheet(us, demo):
    rows = []
    rows.append(row([c_text("Harrow Fen Power Station, Unit 3 (a fictional plant): cycle heat balance, design and what-if "
                            "cases" if demo else "Cycle heat balance: single-reheat regenerative cycle, design and what-if cases",
                            "title")]))
    rows.append(row([c_span("Single reheat, HP/IP/LP sections, three HP heaters with drain coolers, deaerator, three LP "
                            "heaters (LP2 drain pumped forward); every extraction flow from its heater's balance, top "
                            "heater down, in one pass. Calculated by the Isentra add-in (IAPWS-IF97)."
                            + (" Invented design figures for the Isentra demo." if demo else ""), "note", 7)]))
    rows.append(row([c_text("CAUTION: results used for operation or design decisions are to be checked under local codes"
                            " by a licensed engineer. Isentra comes without any warranty.", "caution")]))
    rows.append(row([c_empty()]))
    rows.append(row([c_text("Units", "label"), c_text("US" if us else "SI", "input"),
                     c_span("Units of the inputs and results, SI or US: the units the inputs are typed in and the "
                            "results come out in (changing it converts nothing). SI: MPa (absolute), °C, kJ/kg, kg/s, "
                            "kJ/kWh.  US: psia, °F, Btu/lbm, lbm/h, Btu/kWh. Power in MW in both.", "note", 5)]))
    rows.append(row([c_text("Case shown", "label_wrap"), c_num(1, "input"),
                     c_span("1 to 4: the case whose points (sheet Points) and charts (sheet Charts) are shown", "note",
                            5)]))
    rows.append(row([c_empty()]))
    rows.append(row([c_span("INPUTS (yellow). Column D is the design case; in columns E-G enter only what differs "
                            "from the design (a blank cell takes the design value). A case without a name is not "
                            "calculated.", "subnote", 7)]))
    rows.append(row([c_text("key", "head"), c_text("Input", "head"), c_text("Unit", "head")]
                    + [c_text("Design" if i == 0 else f"Case {i + 1}", "head") for i in range(4)]))
    # case names
    cells = [c_text("name", "label"), c_text("Case name", "label"), c_empty()]
    for i, ((n_si, n_us), _) in enumerate(CASES):
        if demo or i == 0:
            cells.append(c_text(n_us if us else n_si, "input"))
        else:
            cells.append(c_blank("input"))
    rows.append(row(cells))
    for key, desc, kind, v in INPUTS:
        cells = [c_text(key, "label"), c_text(desc, "label_wrap"), u_cell(kind)]
        for i, (_, over) in enumerate(CASES):
            if i == 0:
                val = v
            elif demo and key in over:
                val = over[key]
            else:
                cells.append(c_blank("input"))
                continue
            if us:
                val = us_design(kind, val)
            cells.append(c_num(val, "input_m" if kind == "m" else "input"))
        rows.append(row(cells))
    rows.append(row([c_empty()]))
    rows.append(row([c_text("RESULTS (grey), one column per case", "subtitle")]))
    assert len(rows) + 1 == SUM_HEAD
    rows.append(row([c_text("key", "head"), c_text("Result", "head"), c_text("Unit", "head")]
                    + [c_formula(f"IF(LEN([$Balance.{c}{BAL_NAME}])>0;[$Balance.{c}{BAL_NAME}];\"(not used)\")", "head", True)
                       for c in CASE_COLS]))
    for label, key in SUMMARY:
        kind = KIND[key]
        cells = [c_text(key, "label"), c_text(label, "label"), u_cell(kind)]
        for c in CASE_COLS:
            cells.append(c_formula(f"[$Balance.{c}{ROW[key]}]", res_style(kind)))
        rows.append(row(cells))
    rows.append(row([c_text("Calculated with", "label"), c_empty(), c_empty(),
                     c_formula(f"{ADDIN}VERSION()", "result", True)]))
    rows.append(row([c_empty()]))
    for note in NOTES:
        rows.append(row([c_empty(), c_span(note, "note", 6)]))
    cols = ('<table:table-column table:style-name="coK"/><table:table-column table:style-name="coD"/>'
            '<table:table-column table:style-name="coU"/><table:table-column table:style-name="coV" '
            'table:number-columns-repeated="4"/>')
    return f'<table:table table:name="{CYCLE}" table:style-name="ta_show">{cols}' + "".join(rows) + "</table:table>"


NOTES = [
    "How it is calculated (the Isentra cycle functions; see docs/functions.md):",
    "Expansion lines (common practice): each section's line is straight in h-s from its inlet to its end point"
    " h_in - eta (h_in - h_s); extraction states are where it crosses their pressures (STEAM.TURBINE.HLINE).",
    "LP wet expansion, Baumann rule (common practice): eta_wet = eta_dry (1 - a y_m), y_m the mean moisture of inlet"
    " and end point (STEAM.TURBINE.ELEP); UEEP = ELEP + exhaust loss (STEAM.TURBINE.UEEP); LP work to the UEEP.",
    "Closed heaters: feedwater out at Tsat(shell) - TTD; drain at T_fw,in + DCA, liquid at shell pressure"
    " (STEAM.FWH.HDRAIN); extraction flow from the energy balance (STEAM.FWH.EXTRACTION).",
    "Deaerator: outlet saturated liquid at its pressure (STEAM.DEAERATOR.EXTRACTION). LP3 and LP2 with the pumped"
    " LP2 drain are solved together (STEAM.FWH.DRAINPUMP.BALANCE), so the sheet needs no circular reference.",
    "Not modelled: leakages, make-up and blowdown, heater pressure drops on the water side, pump motor losses; the"
    " throttle flow is the same in every case.",
]


# ---------------------------------------------------------------- Balance sheet
def balance_sheet():
    rows = []
    rows.append(row([c_text("Heat balance, step by step (one column per case; every formula uses the keys in column A)",
                            "title")]))
    rows.append(row([c_span("Top heater down in one pass: HP7, HP6, HP5 (drains cascading), deaerator, LP3 and LP2 "
                            "around the pumped drain, LP1 (drains to the condenser). Residuals should be zero to "
                            "rounding.", "note", 7)]))
    rows.append(row([c_text("key", "head"), c_text("Quantity", "head"), c_text("Unit", "head")]
                    + [c_text("Design" if i == 0 else f"Case {i + 1}", "head") for i in range(4)]))
    # case names
    cells = [c_text("name", "label"), c_text("Case name", "label"), c_empty()]
    for i, c in enumerate(CASE_COLS):
        src = f"[$Cycle.{c}{NAME_ROW}]"
        cells.append(c_formula(f'IF(ISBLANK({src});"";{src})', "result", True))
    rows.append(row(cells))
    rows.append(row([c_text("kwf", "label"), c_text("kW per (flow x enthalpy) unit", "label"), c_empty()]
                    + [c_formula(f'IF({US_TEST};{ADDIN}CONVERT(1;"Btu/h";"kW");1)', "rg") for _ in CASE_COLS]))
    rows.append(row([c_text("chr", "label"), c_text("1 kWh in the heat rate's unit", "label"), u_cell("hr")]
                    + [c_formula(f'{ADDIN}CONVERT(3600;"kJ/kWh";IF({US_TEST};"Btu/kWh";"kJ/kWh"))', "rg")
                       for _ in CASE_COLS]))
    rows.append(row([c_text("Inputs in effect (a blank case input takes the design value)", "subtitle")]))
    assert len(rows) + 1 == BAL_IN0
    for i, (key, desc, kind, _) in enumerate(INPUTS):
        r = IN_ROW0 + i
        cells = [c_text(key, "label"), c_text(desc, "label_wrap"), u_cell(kind)]
        for j, c in enumerate(CASE_COLS):
            src = f"[$Cycle.{c}{r}]"
            if j == 0:
                f = f'IF(ISBLANK({src});"";{src})'
            else:
                f = f"IF(ISBLANK({src});[.$D{ROW[key]}];{src})"
            cells.append(c_formula(f, res_style(kind)))
        rows.append(row(cells))
    assert len(rows) + 1 == BAL_OK
    cells = [c_text("ok", "label"), c_text("Inputs complete (the helper every result depends on)", "label"), c_empty()]
    for c in CASE_COLS:
        cells.append(c_formula(f"AND(LEN([.{c}{BAL_NAME}])>0;COUNT([.{c}{BAL_IN0}:.{c}{BAL_OK - 1}])={len(INPUTS)})",
                               "result"))
    rows.append(row(cells))
    cells = [c_text("okd", "label"), c_text("This case and the design complete (for the differences)", "label"), c_empty()]
    for c in CASE_COLS:
        cells.append(c_formula(f"AND([.{c}{BAL_OK}];[.$D{BAL_OK}])", "result"))
    rows.append(row(cells))
    rows.append(row([c_text("Balance", "subtitle")]))
    assert len(rows) + 1 == BAL_ROW0
    for key, desc, kind, tpl in BALANCE:
        cells = [c_text(key, "label"), c_text(desc, "label_wrap"), u_cell(kind)]
        for c in CASE_COLS:
            if tpl.startswith("DIFF:") or tpl.startswith("REL:"):
                op, ref = tpl.split(":")
                here, design = f"[.{c}{ROW[ref]}]", f"[.$D{ROW[ref]}]"
                body = f"{here}-{design}" if op == "DIFF" else f"{here}/{design}-1"
                f = f'IF([.{c}{BAL_OKD}];{body};"")'
            else:
                f = f'IF([.{c}{BAL_OK}];{expand(tpl, c)};"")'
            cells.append(c_formula(f, res_style(kind)))
        rows.append(row(cells))
    cols = ('<table:table-column table:style-name="coK"/><table:table-column table:style-name="coD"/>'
            '<table:table-column table:style-name="coU"/><table:table-column table:style-name="coV" '
            'table:number-columns-repeated="4"/>')
    return f'<table:table table:name="{BAL}" table:style-name="ta_show">{cols}' + "".join(rows) + "</table:table>"


# ---------------------------------------------------------------- Points sheet
def sel_of(key):
    r = ROW[key]
    return f"INDEX([$Balance.$D${r}:$G${r}];1;{PT_SEL})"


def points_sheet():
    rows = []
    rows.append(row([c_text("Every numbered point of the case shown (Cycle.B6): pressure, temperature, enthalpy, entropy,"
                            " quality, flow", "title")]))
    rows.append(row([c_span("x is the equilibrium quality (h - h')/(h'' - h') at the point's pressure: between 0 and 1 "
                            "wet, below 0 subcooled water, above 1 superheated steam.", "note", 8)]))
    rows.append(row([c_text("Case", "label"),
                     c_formula(f"IF(ISNUMBER({SEL});MAX(1;MIN(4;INT({SEL})));1)", "result"),
                     c_formula(f"INDEX([$Balance.$D${BAL_NAME}:$G${BAL_NAME}];1;[.$B$3])", "result", True)]))
    rows.append(row([c_text("Complete", "label"), c_formula(f"INDEX([$Balance.$D${BAL_OK}:$G${BAL_OK}];1;[.$B$3])", "result"),
                     c_text("1 (TRUE): the case's inputs are complete; otherwise the table stays blank")]))
    rows.append(row([c_empty()]))
    assert len(rows) + 1 == PT_HEAD
    rows.append(row([c_text("No.", "head"), c_text("Point", "head"), c_text("p", "head"), c_text("T", "head"),
                     c_text("h", "head"), c_text("s", "head"), c_text("x", "head"), c_text("flow", "head")]))
    rows.append(row([c_empty(), c_empty(), u_cell("p"), u_cell("T"), u_cell("h"), u_cell("s"), c_text("–", "unit"),
                     u_cell("m")]))
    for n, (name, pk, hk, mk) in enumerate(POINTS, start=1):
        r = pt_row(n)
        p, h = f"[.C{r}]", f"[.E{r}]"
        cells = [c_num(n, "label"), c_text(name, "label"),
                 c_formula(f'IF({PT_OK};{sel_of(pk)};"")', "r4"),
                 c_formula(f'IF({PT_OK};{call("tPH", p, h)};"")', "r2"),
                 c_formula(f'IF({PT_OK};{sel_of(hk)};"")', "r2"),
                 c_formula(f'IF({PT_OK};{call("sPH", p, h)};"")', "r5"),
                 c_formula(f'IF({PT_OK};{call("xPH", p, h)};"")', "r5"),
                 c_formula(f'IF({PT_OK};{sel_of(mk)};"")', "rm")]
        rows.append(row(cells))
    cols = ('<table:table-column table:style-name="coN"/><table:table-column table:style-name="coD"/>'
            '<table:table-column table:style-name="coV" table:number-columns-repeated="6"/>')
    return f'<table:table table:name="{PTS}" table:style-name="ta_show">{cols}' + "".join(rows) + "</table:table>"


# ---------------------------------------------------------------- ChartData
# h-s: expansion lines (points, None = a gap), the UEEP, saturated vapour, isobars.
HS_LINE = [1, 2, 3, None, 4, 5, 6, None, 7, 8, 9, 10, 11]
SATV_T = list(range(30, 301, 10))           # degC grid for the saturated-vapour line
ISOBARS = [("throttle", "p_ms", 1), ("cold reheat", "p_crh", 3), ("hot reheat", "p_hrh", 4),
           ("IP exhaust", "p_ipx", 6), ("condenser", "p_c", 11)]
ISO_N = 15
DOME_T = [0.01] + list(range(10, 371, 10)) + [373.9]
TS_PATH = [13, 14, 15, 16, 17, 18, 19, 20, 21, 22, 23, "bf", "bg", 1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12, 13]


def data_sheet():
    grid = {}

    def put(r, c, xml):
        grid[(r, col_index(c))] = xml

    def pt(n, col):  # Points sheet column of point n, NA() when the case is incomplete
        return f"IF({PT_OK};[$Points.{col}{pt_row(n)}];NA())"

    # A,B: h-s expansion line (s, h)
    put(1, "A", c_text("s"))
    put(1, "B", c_text("expansion line (HP, IP, LP)"))
    for i, n in enumerate(HS_LINE):
        if n is None:
            continue
        put(2 + i, "A", c_formula(pt(n, "F")))
        put(2 + i, "B", c_formula(pt(n, "E")))
    # C,D: UEEP
    put(1, "C", c_text("s"))
    put(1, "D", c_text("LP used energy end point"))
    put(2, "C", c_formula(pt(12, "F")))
    put(2, "D", c_formula(pt(12, "E")))
    # E..H: saturated vapour line
    put(1, "E", c_text("T grid [°C]"))
    put(1, "F", c_text("T"))
    put(1, "G", c_text("s''"))
    put(1, "H", c_text("saturated vapour"))
    for i, t in enumerate(SATV_T):
        r = 2 + i
        put(r, "E", c_num(t))
        put(r, "F", c_formula(f"IF({US_TEST};1.8*[.E{r}]+32;[.E{r}])"))
        put(r, "G", c_formula(call("sgT", f"[.F{r}]")))
        put(r, "H", c_formula(call("hgT", f"[.F{r}]")))
    # isobars from column J: (s, h) pairs around the point's entropy, +-5 %
    for j, (name, pk, n) in enumerate(ISOBARS):
        cs, ch = col_name(10 + 2 * j), col_name(11 + 2 * j)
        pref = sel_of(pk)
        put(1, cs, c_text(f"{name} s"))
        put(1, ch, c_formula(f'"{name} "&IF({PT_OK};TEXT(ROUND({pref};3-INT(LOG10({pref})));"General")&" "&IF({US_TEST};"psia";"MPa");"")', string=True))
        for i in range(ISO_N):
            r = 2 + i
            frac = -0.05 + 0.10 * i / (ISO_N - 1)
            put(r, cs, c_formula(f"IF({PT_OK};[$Points.F{pt_row(n)}]*(1+({frac!r}));NA())"))
            put(r, ch, c_formula(f"IF({PT_OK};{call('hPS', pref, f'[.{cs}{r}]')};NA())"))
    # T-s: the saturation dome (s', T up, then s'', T down) in columns U-W
    put(1, "U", c_text("T grid [°C]"))
    put(1, "V", c_text("s"))
    put(1, "W", c_text("saturation dome"))
    grid_t = DOME_T + DOME_T[::-1]
    for i, t in enumerate(grid_t):
        r = 2 + i
        liquid = i < len(DOME_T)
        put(r, "U", c_num(t))
        put(r, "W", c_formula(f"IF({US_TEST};1.8*[.U{r}]+32;[.U{r}])"))
        put(r, "V", c_formula(call("sfT" if liquid else "sgT", f"[.W{r}]")))
    # the cycle path (s, T) in columns Y, Z
    put(1, "Y", c_text("s"))
    put(1, "Z", c_text("cycle"))
    for i, n in enumerate(TS_PATH):
        r = 2 + i
        if n == "bf" or n == "bg":
            pms = sel_of("p_ms")
            put(r, "Y", c_formula(f"IF({PT_OK};{call('sfP' if n == 'bf' else 'sgP', pms)};NA())"))
            put(r, "Z", c_formula(f"IF({PT_OK};{call('tsat', pms)};NA())"))
        else:
            put(r, "Y", c_formula(pt(n, "F")))
            put(r, "Z", c_formula(pt(n, "D")))
    nrows = 1 + max(len(HS_LINE), len(SATV_T), ISO_N, len(grid_t), len(TS_PATH))
    return (f'<table:table table:name="{DATA}" table:style-name="ta_hidden">'
            + "".join(grid_rows(grid, nrows, col_index("Z"))) + "</table:table>")


def hs_series():
    last_sat = 1 + len(SATV_T)
    s = [(f"{DATA}.H1", f"{DATA}.G2:{DATA}.G{last_sat}", f"{DATA}.H2:{DATA}.H{last_sat}", "sat")]
    for j in range(len(ISOBARS)):
        cs, ch = col_name(10 + 2 * j), col_name(11 + 2 * j)
        s.append((f"{DATA}.{ch}1", f"{DATA}.{cs}2:{DATA}.{cs}{1 + ISO_N}", f"{DATA}.{ch}2:{DATA}.{ch}{1 + ISO_N}", "iso"))
    n = 1 + len(HS_LINE)
    s.append((f"{DATA}.B1", f"{DATA}.A2:{DATA}.A{n}", f"{DATA}.B2:{DATA}.B{n}", "line"))
    s.append((f"{DATA}.D1", f"{DATA}.C2:{DATA}.C2", f"{DATA}.D2:{DATA}.D2", "ueep"))
    return s


def ts_series():
    n = 1 + 2 * len(DOME_T)
    m = 1 + len(TS_PATH)
    return [(f"{DATA}.W1", f"{DATA}.V2:{DATA}.V{n}", f"{DATA}.W2:{DATA}.W{n}", "sat"),
            (f"{DATA}.Z1", f"{DATA}.Y2:{DATA}.Y{m}", f"{DATA}.Z2:{DATA}.Z{m}", "line")]


LOOK = {  # colour, width, dash, symbol
    "sat": ("#000000", "0.05cm", False, False),
    "iso": ("#8a8a8a", "0.03cm", True, False),
    "line": ("#c00000", "0.05cm", False, True),
    "ueep": ("#0050c0", "0.03cm", False, True),
}


def chart_object(title, series, x_title, y_title, x_min=None, y_min=None):
    def axis_style(name, minimum):
        mn = f' chart:minimum="{minimum}"' if minimum is not None else ""
        return (f'<style:style style:name="{name}" style:family="chart"><style:chart-properties chart:display-label="true"'
                f'{mn}/><style:text-properties fo:font-size="8pt"/></style:style>')
    styles = ['<style:style style:name="chA" style:family="chart"><style:graphic-properties draw:stroke="none" '
              'draw:fill-color="#ffffff"/></style:style>',
              '<style:style style:name="chT" style:family="chart"><style:text-properties fo:font-size="10pt" '
              'fo:font-weight="bold"/></style:style>',
              axis_style("chAx", x_min), axis_style("chAy", y_min),
              '<style:style style:name="chAt" style:family="chart"><style:text-properties fo:font-size="8pt"/></style:style>',
              '<style:style style:name="chL" style:family="chart"><style:text-properties fo:font-size="7pt"/></style:style>',
              '<style:style style:name="chP" style:family="chart"><style:chart-properties chart:lines="true" '
              'chart:symbol-type="none" chart:interpolation="none" chart:treat-empty-cells="leave-gap"/></style:style>',
              '<style:style style:name="chW" style:family="chart"><style:graphic-properties draw:fill-color="#ffffff"/>'
              '</style:style>',
              '<style:style style:name="chG" style:family="chart"><style:graphic-properties svg:stroke-color="#dddddd"/>'
              '</style:style>']
    body = []
    for i, (lab, xr, yr, key) in enumerate(series):
        colour, width, dash, sym = LOOK[key]
        stroke = 'draw:stroke="dash" draw:stroke-dash="dash1"' if dash else 'draw:stroke="solid"'
        if key == "ueep":
            stroke = 'draw:stroke="none"'
        symbol = ('chart:symbol-type="named-symbol" chart:symbol-name="circle" chart:symbol-width="0.14cm" '
                  'chart:symbol-height="0.14cm"' if sym else 'chart:symbol-type="none"')
        styles.append(f'<style:style style:name="s{i}" style:family="chart"><style:chart-properties {symbol}/>'
                      f'<style:graphic-properties {stroke} svg:stroke-width="{width}" svg:stroke-color="{colour}" '
                      f'draw:fill-color="{colour}"/></style:style>')
        body.append(f'<chart:series chart:style-name="s{i}" chart:class="chart:scatter" '
                    f'chart:values-cell-range-address="{yr}" chart:label-cell-address="{lab}">'
                    f'<chart:domain table:cell-range-address="{xr}"/></chart:series>')
    content = (f'<?xml version="1.0" encoding="UTF-8"?>\n<office:document-content {NS}>'
               f'<office:automatic-styles>{"".join(styles)}</office:automatic-styles><office:body><office:chart>'
               f'<chart:chart svg:width="13.4cm" svg:height="11.5cm" chart:class="chart:scatter" chart:style-name="chA">'
               f'<chart:title chart:style-name="chT"><text:p>{escape(title)}</text:p></chart:title>'
               f'<chart:legend chart:legend-position="bottom" style:legend-expansion="wide" chart:style-name="chL"/>'
               f'<chart:plot-area chart:style-name="chP" chart:data-source-has-labels="none">'
               f'<chart:axis chart:dimension="x" chart:name="primary-x" chart:style-name="chAx">'
               f'<chart:title chart:style-name="chAt"><text:p>{escape(x_title)}</text:p></chart:title>'
               f'<chart:grid chart:class="major" chart:style-name="chG"/></chart:axis>'
               f'<chart:axis chart:dimension="y" chart:name="primary-y" chart:style-name="chAy">'
               f'<chart:title chart:style-name="chAt"><text:p>{escape(y_title)}</text:p></chart:title>'
               f'<chart:grid chart:class="major" chart:style-name="chG"/></chart:axis>'
               + "".join(body) +
               '<chart:wall chart:style-name="chW"/></chart:plot-area></chart:chart></office:chart></office:body>'
               '</office:document-content>')
    chart_styles = (f'<?xml version="1.0" encoding="UTF-8"?>\n<office:document-styles {NS}><office:styles>'
                    '<draw:stroke-dash draw:name="dash1" draw:style="rect" draw:dots1="1" draw:dots1-length="0.12cm" '
                    'draw:distance="0.08cm"/></office:styles></office:document-styles>')
    return content, chart_styles


def frame(obj, name, series):
    ranges = " ".join(f"{x} {y}" for _, x, y, _ in series)
    return (f'<table:table-cell><draw:frame draw:z-index="0" draw:name="{name}" svg:width="13.4cm" svg:height="11.5cm" '
            'svg:x="0cm" svg:y="0.1cm">'
            f'<draw:object draw:notify-on-update-of-ranges={quoteattr(ranges)} xlink:href="./{obj}" '
            'xlink:type="simple" xlink:show="embed" xlink:actuate="onLoad"/></draw:frame></table:table-cell>')


def charts_sheet(us):
    scale = ("The h-s axes of this file start at s = 1.3 Btu/(lbm·°F) and h = 900 Btu/lbm (set for US units)" if us else
             "The h-s axes of this file start at s = 5.6 kJ/(kg·K) and h = 2100 kJ/kg (set for SI units)")
    rows = [row([c_text("Charts of the case shown (Cycle.B6): the turbine expansion line on an h-s chart, and the cycle on"
                        " a T-s diagram", "title")]),
            row([c_span(scale + "; after switching the units cell, set them under Format Axis > Scale, or open the copy"
                        " made for the other units.", "note", 2)]),
            f'<table:table-row table:style-name="roChart">{frame("Object 1", "hs_chart", hs_series())}'
            f'{frame("Object 2", "ts_chart", ts_series())}</table:table-row>']
    cols = '<table:table-column table:style-name="coC" table:number-columns-repeated="2"/>'
    return f'<table:table table:name="{CHARTS}" table:style-name="ta_show">{cols}' + "".join(rows) + "</table:table>"


# ---------------------------------------------------------------- document
# Flows: 3 decimals in kg/s; whole numbers with grouping from 10,000 (lbm/h) and for a zero flow.
LOCAL_STYLES = """
  <number:number-style style:name="N0"><number:number number:decimal-places="0" number:min-integer-digits="1"/></number:number-style>
  <number:number-style style:name="N1"><number:number number:decimal-places="1" number:min-decimal-places="1" number:min-integer-digits="1" number:grouping="true"/></number:number-style>
  <number:number-style style:name="N2"><number:number number:decimal-places="2" number:min-decimal-places="2" number:min-integer-digits="1" number:grouping="true"/></number:number-style>
  <number:number-style style:name="N3"><number:number number:decimal-places="3" number:min-decimal-places="3" number:min-integer-digits="1" number:grouping="true"/></number:number-style>
  <number:number-style style:name="N4"><number:number number:decimal-places="4" number:min-decimal-places="4" number:min-integer-digits="1"/></number:number-style>
  <number:number-style style:name="N5"><number:number number:decimal-places="5" number:min-decimal-places="5" number:min-integer-digits="1"/></number:number-style>
  <number:number-style style:name="Nm_big"><number:number number:decimal-places="0" number:min-integer-digits="1" number:grouping="true"/></number:number-style>
  <number:number-style style:name="Nm"><number:number number:decimal-places="3" number:min-decimal-places="3" number:min-integer-digits="1" number:grouping="true"/><style:map style:condition="value()&gt;=10000" style:apply-style-name="Nm_big"/><style:map style:condition="value()=0" style:apply-style-name="Nm_big"/></number:number-style>
  <number:number-style style:name="Nmi"><number:number number:decimal-places="4" number:min-decimal-places="0" number:min-integer-digits="1" number:grouping="true"/></number:number-style>
  <style:style style:name="rm" style:family="table-cell" style:data-style-name="Nm"><style:table-cell-properties fo:background-color="#eeeeee"/></style:style>
  <style:style style:name="input_m" style:family="table-cell" style:data-style-name="Nmi"><style:table-cell-properties fo:background-color="#fff3b0"/></style:style>
  <style:style style:name="r0" style:family="table-cell" style:data-style-name="N0"><style:table-cell-properties fo:background-color="#eeeeee"/></style:style>
  <style:style style:name="r1" style:family="table-cell" style:data-style-name="N1"><style:table-cell-properties fo:background-color="#eeeeee"/></style:style>
  <style:style style:name="r2" style:family="table-cell" style:data-style-name="N2"><style:table-cell-properties fo:background-color="#eeeeee"/></style:style>
  <style:style style:name="r3" style:family="table-cell" style:data-style-name="N3"><style:table-cell-properties fo:background-color="#eeeeee"/></style:style>
  <style:style style:name="r4" style:family="table-cell" style:data-style-name="N4"><style:table-cell-properties fo:background-color="#eeeeee"/></style:style>
  <style:style style:name="r5" style:family="table-cell" style:data-style-name="N5"><style:table-cell-properties fo:background-color="#eeeeee"/></style:style>
  <style:style style:name="rg" style:family="table-cell"><style:table-cell-properties fo:background-color="#eeeeee"/></style:style>
  <style:style style:name="rpct" style:family="table-cell" style:data-style-name="Np"><style:table-cell-properties fo:background-color="#eeeeee"/></style:style>
  <style:style style:name="rdpct" style:family="table-cell" style:data-style-name="Npd-neg"><style:table-cell-properties fo:background-color="#eeeeee"/></style:style>
  <style:style style:name="note" style:family="table-cell"><style:table-cell-properties fo:wrap-option="wrap" style:vertical-align="top"/><style:text-properties fo:font-size="9pt"/></style:style>
  <style:style style:name="subnote" style:family="table-cell"><style:table-cell-properties fo:wrap-option="wrap"/><style:text-properties fo:font-weight="bold"/></style:style>
  <style:style style:name="roChart" style:family="table-row"><style:table-row-properties style:row-height="11.8cm"/></style:style>
"""


def content_xml(us, demo):
    auto = (COMMON_STYLES + LOCAL_STYLES + "  " + "\n  ".join([
        table_style("ta_show"), table_style("ta_hidden", visible=False),
        column_style("coK", "1.6cm"), column_style("coD", "10.2cm"), column_style("coU", "2.1cm"),
        column_style("coV", "3.3cm"), column_style("coN", "2.0cm"), column_style("coC", "13.9cm")]) + CELL_STYLES)
    sheets = cycle_sheet(us, demo) + balance_sheet() + points_sheet() + charts_sheet(us) + data_sheet()
    return document_content(auto, sheets)


def write(path, mimetype, us, demo, title):
    if us:
        hs = chart_object("h-s chart: expansion line, saturated vapour, section isobars", hs_series(),
                          "s, Btu/(lbm·°F)", "h, Btu/lbm", 1.3, 900)
        ts = chart_object("T-s diagram of the cycle", ts_series(), "s, Btu/(lbm·°F)", "T, °F", 0, 0)
    else:
        hs = chart_object("h-s chart: expansion line, saturated vapour, section isobars", hs_series(),
                          "s, kJ/(kg·K)", "h, kJ/kg", 5.6, 2100)
        ts = chart_object("T-s diagram of the cycle", ts_series(), "s, kJ/(kg·K)", "T, °C", 0, 0)
    # The long sheets (inputs, balance) print one page wide and as many pages tall as they need.
    styles = styles_xml().replace('style:scale-to-Y="1"', 'style:scale-to-Y="0"')
    parts = [("content.xml", content_xml(us, demo)), ("styles.xml", styles),
             ("meta.xml", meta_xml(title, "gen_cycle_workbook.py"))]
    extra = []
    for obj, (c, s) in (("Object 1", hs), ("Object 2", ts)):
        parts += [(f"{obj}/content.xml", c), (f"{obj}/styles.xml", s)]
        extra += [(f"{obj}/", "application/vnd.oasis.opendocument.chart", True),
                  (f"{obj}/content.xml", "text/xml", False), (f"{obj}/styles.xml", "text/xml", False)]
    write_package(path, mimetype, parts, extra)


# The worked example of isentra-recalc (docs/recalc.md): the design case run
# over condenser pressure. A case table names the input cells in its header
# row; the cells come from this generator's own layout, so they stay in step.
CONDENSER_CASES_SI = [0.005, 0.0065, 0.008, 0.009, 0.010]  # MPa; 0.0065 is the design (invented demo values)


def condenser_case_table():
    keys = [k for k, *_ in INPUTS]
    cell = f"{CYCLE}.D{IN_ROW0 + keys.index('p_c')}"
    return f"{cell}\n" + "".join(f"{v:g}\n" for v in CONDENSER_CASES_SI)


def condenser_collect():
    """The cells to collect: the design column's and the 9 kPa case's gross heat rate."""
    return f"{CYCLE}.D{SUM_ROW['HR_g']},{CYCLE}.E{SUM_ROW['HR_g']}"


def main():
    if len(sys.argv) != 2:
        sys.exit("usage: gen_cycle_workbook.py OUTDIR")
    out = sys.argv[1]
    os.makedirs(out, exist_ok=True)
    write(os.path.join(out, "harrow-fen-unit3-cycle-heat-balance.ods"), MIME_ODS, False, True,
          "Harrow Fen Unit 3 cycle heat balance (fictional demo)")
    write(os.path.join(out, "harrow-fen-unit3-cycle-heat-balance-us.ods"), MIME_ODS, True, True,
          "Harrow Fen Unit 3 cycle heat balance, US units (fictional demo)")
    write(os.path.join(out, "isentra-cycle-heat-balance.ots"), MIME_OTS, False, False,
          "Cycle heat balance: reheat regenerative cycle (Isentra)")
    write(os.path.join(out, "isentra-cycle-heat-balance-us.ots"), MIME_OTS, True, False,
          "Cycle heat balance: reheat regenerative cycle, US units (Isentra)")
    with open(os.path.join(out, "harrow-fen-unit3-condenser-cases.csv"), "w", encoding="utf-8", newline="") as f:
        f.write(condenser_case_table())
    with open(os.path.join(out, "harrow-fen-unit3-condenser-collect.txt"), "w", encoding="utf-8") as f:
        f.write(condenser_collect() + "\n")


if __name__ == "__main__":
    main()
