# SPDX-License-Identifier: MPL-2.0
"""Writes the workbooks recalc_tests feeds to isentra-recalc (standard library only).

    make_workbooks.py OUTDIR ISENTRA_CLI

stale.ods     one sheet "Readings" with stored (cached) results, some of them
              deliberately stale; the right stored values come from the core
              through the isentra command line (same catalogue and code as the
              add-in), so only the stale cells may be reported.
macro.ods     a document Basic macro bound to the document's open event
              (OnLoad) that would write OUTDIR/marker/macro-ran; plus
              control.ods, the same with another marker path, for the test's
              positive check that the binding really runs when macros are allowed.
damaged.ods   stale.ods cut off after 60 % of its bytes.
stale.json    what the test expects: the stale cells with labels and old values.
"""
import json
import os
import subprocess
import sys
import zipfile
from xml.sax.saxutils import escape, quoteattr

sys.path.insert(0, os.path.join(os.path.dirname(os.path.abspath(__file__)), "..", "..", "templates"))
import odf_writer as ow  # noqa: E402

OUT, CLI = sys.argv[1], sys.argv[2]
os.makedirs(OUT, exist_ok=True)


def core(call):
    """The core's value of a call (17 significant digits: the exact double)."""
    out = subprocess.run([CLI, call], check=True, capture_output=True, text=True).stdout.strip()
    return float(out)


def text(s):
    return ow.c_text(s)


def num(v):
    return ow.c_num(v)


def formula(f, cached):
    """A formula cell with a stored result: a number, a text (str) or None (no stored result)."""
    a = f"table:formula={quoteattr('of:=' + f)}"
    if cached is None:
        return f"<table:table-cell {a}/>"
    if isinstance(cached, str):
        return (f'<table:table-cell {a} office:value-type="string" office:string-value={quoteattr(cached)}>'
                f"<text:p>{escape(cached)}</text:p></table:table-cell>")
    return (f'<table:table-cell {a} office:value-type="float" office:value="{cached!r}">'
            f"<text:p>{cached}</text:p></table:table-cell>")


A = ow.ADDIN
p, t, pe, flow = 16.62, 538.4, 4.08, 150.0  # invented Harrow Fen readings (demo values)
h = core(f"STEAM.H.PT({p};{t})")
s = core(f"STEAM.S.PT({p};{t})")
tsat = core(f"STEAM.TSAT({pe})")

grid = {
    (1, 1): text("Harrow Fen Unit 2 - workbook with stored results, some stale (test)"),
    (3, 1): text("Main steam pressure (MPa)"), (3, 2): num(p),
    (4, 1): text("Main steam temperature (C)"), (4, 2): num(t),
    (5, 1): text("Exhaust pressure (MPa)"), (5, 2): num(pe),
    (6, 1): text("Flow (kg/s)"), (6, 2): num(flow),
    (8, 1): text("Result"), (8, 2): text("value"), (8, 3): text("Margin"),
    (9, 1): text("Main steam enthalpy"), (9, 2): formula(f"{A}HPT([.B3];[.B4])", h),
    (10, 1): text("Main steam entropy"), (10, 2): formula(f"{A}SPT([.B3];[.B4])", 6.4),            # stale
    (11, 1): text("Exhaust saturation temperature"), (11, 2): formula(f"{A}TSAT([.B5])", tsat),
    (12, 1): text("Heat flow (kW)"), (12, 2): formula("[.B6]*[.B9]", 500000.0),                     # stale
    (13, 1): text("Doubled pressure"), (13, 2): formula("[.B3]*2", p * 2),
    (14, 1): text("Status"), (14, 2): formula('IF([.B3]>10;"high";"low")', "high"),
    (15, 1): text("Mode"), (15, 2): formula('IF([.B3]>10;"high";0)', 0.0),                          # type change
    (16, 1): text("Per unit flow"), (16, 2): formula("[.B6]/[.B7]", 12.5),                          # new error
    (17, 1): text("Rate from a missing add-in"), (17, 2): formula("ORG.EXAMPLE.NOTINSTALLED.RATE([.B3])", 7.0),
    (18, 3): formula("[.B13]-[.B3]", 99.0),                                                          # stale, label above
}
stale = [
    {"cell": "B10", "label": "Main steam entropy", "change": "value changed", "old": 6.4, "new": s},
    {"cell": "B12", "label": "Heat flow (kW)", "change": "value changed", "old": 500000.0, "new": flow * h},
    {"cell": "B15", "label": "Mode", "change": "type changed", "old": 0.0, "new": "high"},
    {"cell": "B16", "label": "Per unit flow", "change": "new error", "old": 12.5, "new": "#DIV/0!"},
    {"cell": "B17", "label": "Rate from a missing add-in", "change": "unknown function", "old": 7.0,
     "new": "#NAME?", "detail": "ORG.EXAMPLE.NOTINSTALLED.RATE"},
    {"cell": "C18", "label": "Margin", "change": "value changed", "old": 99.0, "new": p * 2 - p},
]


def sheet(name, grid, nrows, ncols):
    return f'<table:table table:name="{name}">' + "".join(ow.grid_rows(grid, nrows, ncols)) + "</table:table>"


def workbook(path, sheets_xml, scripts="", extra=()):
    content = (f'<?xml version="1.0" encoding="UTF-8"?>\n<office:document-content {ow.NS} '
               'xmlns:script="urn:oasis:names:tc:opendocument:xmlns:script:1.0" xmlns:ooo="http://openoffice.org/2004/office" '
               'xmlns:dom="http://www.w3.org/2001/xml-events">'
               f"{scripts}<office:body><office:spreadsheet>{sheets_xml}</office:spreadsheet></office:body>"
               "</office:document-content>")
    parts = [("content.xml", content), ("styles.xml", ow.styles_xml()), ("meta.xml", ow.meta_xml("test", "tests"))]
    parts += [(n, d) for n, d, _ in extra]
    ow.write_package(path, ow.MIME_ODS, parts, [(n, m, False) for n, _, m in extra])


workbook(os.path.join(OUT, "stale.ods"), sheet("Readings", grid, 18, 3))
with open(os.path.join(OUT, "stale.json"), "w") as f:
    json.dump({"sheet": "Readings", "stale": stale, "formula_cells": 11,
               "unchanged": {"B9": h, "B11": tsat, "B13": p * 2}}, f, indent=1)


def macro_workbook(path, marker):
    basic = ("Sub WriteMarker\n  Dim n As Integer\n  n = FreeFile\n"
             f'  Open "{marker}" For Output As #n\n  Print #n, "the open-event macro ran"\n  Close #n\nEnd Sub\n')
    extra = [
        ("Basic/script-lc.xml",
         '<?xml version="1.0" encoding="UTF-8"?>\n<library:libraries xmlns:library="http://openoffice.org/2000/library" '
         'xmlns:xlink="http://www.w3.org/1999/xlink"><library:library library:name="Standard" library:link="false"/>'
         "</library:libraries>", "text/xml"),
        ("Basic/Standard/script-lb.xml",
         '<?xml version="1.0" encoding="UTF-8"?>\n<library:library xmlns:library="http://openoffice.org/2000/library" '
         'library:name="Standard" library:readonly="false" library:passwordprotected="false">'
         '<library:element library:name="Module1"/></library:library>', "text/xml"),
        ("Basic/Standard/Module1.xml",
         '<?xml version="1.0" encoding="UTF-8"?>\n<script:module xmlns:script="http://openoffice.org/2000/script" '
         f'script:name="Module1" script:language="StarBasic">{escape(basic)}</script:module>', "text/xml"),
    ]
    scripts = ('<office:scripts><office:event-listeners><script:event-listener script:language="ooo:script" '
               'script:event-name="dom:load" xlink:type="simple" '
               'xlink:href="vnd.sun.star.script:Standard.Module1.WriteMarker?language=Basic&amp;location=document"/>'
               "</office:event-listeners></office:scripts>")
    g = {(1, 1): text("Opening this workbook runs a macro (test)"), (2, 1): text("x"), (2, 2): num(2.0),
         (3, 1): text("twice x"), (3, 2): formula("[.B2]*2", 4.0)}
    workbook(path, sheet("Sheet1", g, 3, 2), scripts, extra)


os.makedirs(os.path.join(OUT, "marker"), exist_ok=True)
os.chmod(os.path.join(OUT, "marker"), 0o777)  # the office's user (nobody under root) may write there
macro_workbook(os.path.join(OUT, "macro.ods"), os.path.join(OUT, "marker", "macro-ran"))
macro_workbook(os.path.join(OUT, "control.ods"), os.path.join(OUT, "marker", "control-ran"))

data = open(os.path.join(OUT, "stale.ods"), "rb").read()
with open(os.path.join(OUT, "damaged.ods"), "wb") as f:
    f.write(data[: len(data) * 6 // 10])
