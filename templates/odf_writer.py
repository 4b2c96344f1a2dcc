# SPDX-License-Identifier: MPL-2.0
"""Small OpenDocument spreadsheet writer shared by the workbook generators
(gen_turbine_workbook.py, gen_plant_workbook.py). Standard library only.

It knows just what the Isentra workbooks need: cells (text, number, formula,
empty), rows, a sparse grid of cells turned into rows, the namespaces, the
common cell and number styles, the landscape page style, meta.xml, and the
zip package (mimetype first and stored, fixed times for reproducible files).
Formulas are OpenFormula text without the leading "of:=", e.g.
"[.B5]*2" or "ORG.ISENTRA.STEAMFUNCTIONS.HPT([.C10];[.C11];[$Heaters.$B$5])".
"""
import os
import zipfile
from xml.sax.saxutils import escape, quoteattr

ADDIN = "ORG.ISENTRA.STEAMFUNCTIONS."  # stored prefix of every add-in call

MIME_ODS = "application/vnd.oasis.opendocument.spreadsheet"
MIME_OTS = "application/vnd.oasis.opendocument.spreadsheet-template"

NS = ('xmlns:office="urn:oasis:names:tc:opendocument:xmlns:office:1.0" '
      'xmlns:style="urn:oasis:names:tc:opendocument:xmlns:style:1.0" '
      'xmlns:text="urn:oasis:names:tc:opendocument:xmlns:text:1.0" '
      'xmlns:table="urn:oasis:names:tc:opendocument:xmlns:table:1.0" '
      'xmlns:draw="urn:oasis:names:tc:opendocument:xmlns:drawing:1.0" '
      'xmlns:fo="urn:oasis:names:tc:opendocument:xmlns:xsl-fo-compatible:1.0" '
      'xmlns:xlink="http://www.w3.org/1999/xlink" '
      'xmlns:dc="http://purl.org/dc/elements/1.1/" '
      'xmlns:meta="urn:oasis:names:tc:opendocument:xmlns:meta:1.0" '
      'xmlns:number="urn:oasis:names:tc:opendocument:xmlns:datastyle:1.0" '
      'xmlns:svg="urn:oasis:names:tc:opendocument:xmlns:svg-compatible:1.0" '
      'xmlns:chart="urn:oasis:names:tc:opendocument:xmlns:chart:1.0" '
      'xmlns:of="urn:oasis:names:tc:opendocument:xmlns:of:1.2" '
      'xmlns:loext="urn:org:documentfoundation:names:experimental:office:xmlns:loext:1.0" '
      'office:version="1.3"')


# ---------------------------------------------------------------- addresses
def col_name(i):  # 1-based
    s = ""
    while i:
        i, r = divmod(i - 1, 26)
        s = chr(65 + r) + s
    return s


def col_index(name):
    i = 0
    for ch in name:
        i = i * 26 + ord(ch) - 64
    return i


# ---------------------------------------------------------------- cells
def _style(style):
    return f' table:style-name="{style}"' if style else ""


def c_text(s, style=None):
    return f'<table:table-cell{_style(style)} office:value-type="string"><text:p>{escape(s)}</text:p></table:table-cell>'


def c_num(v, style=None):
    return (f'<table:table-cell{_style(style)} office:value-type="float" office:value="{v!r}">'
            f'<text:p>{v}</text:p></table:table-cell>')


def c_formula(f, style=None, string=False):
    vt = ' office:value-type="string"' if string else ""
    return f'<table:table-cell{_style(style)} table:formula={quoteattr("of:=" + f)}{vt}/>'


def c_empty(n=1):
    if n == 1:
        return "<table:table-cell/>"
    return f'<table:table-cell table:number-columns-repeated="{n}"/>'


def c_span(s, style, span):
    """A text cell merged across `span` columns (the covered cells follow), e.g. a wrapped note."""
    cover = f'<table:covered-table-cell table:number-columns-repeated="{span - 1}"/>' if span > 1 else ""
    return (f'<table:table-cell{_style(style)} table:number-columns-spanned="{span}" office:value-type="string">'
            f'<text:p>{escape(s)}</text:p></table:table-cell>{cover}')


def c_blank(style):
    """An empty cell that carries a style (e.g. an input cell left for the user)."""
    return f'<table:table-cell{_style(style)}/>'


def row(cells, style=None):
    return f"<table:table-row{_style(style)}>" + "".join(cells) + "</table:table-row>"


def grid_rows(grid, nrows, ncols):
    """Rows 1..nrows of a sparse grid {(row, column index): cell xml}; gaps become repeated empty cells."""
    rows = []
    for r in range(1, nrows + 1):
        cells, gap = [], 0
        for c in range(1, ncols + 1):
            x = grid.get((r, c))
            if x is None:
                gap += 1
                continue
            if gap:
                cells.append(c_empty(gap))
                gap = 0
            cells.append(x)
        rows.append(row(cells))
    return rows


# ---------------------------------------------------------------- styles
# Number and cell styles common to the workbooks (content.xml automatic styles).
# Yellow = input, grey = calculated; Np = percent, Npd-neg = signed percent, Nb = TRUE/FALSE.
COMMON_STYLES = """
  <number:boolean-style style:name="Nb"><number:boolean/></number:boolean-style>
  <number:number-style style:name="Nf"><number:number number:decimal-places="4" number:min-decimal-places="0" number:min-integer-digits="1"/></number:number-style>
  <number:percentage-style style:name="Np"><number:number number:decimal-places="2" number:min-decimal-places="2" number:min-integer-digits="1"/><number:text>%</number:text></number:percentage-style>
  <number:percentage-style style:name="Npd"><number:text>+</number:text><number:number number:decimal-places="2" number:min-decimal-places="2" number:min-integer-digits="1"/><number:text>%</number:text></number:percentage-style>
  <number:percentage-style style:name="Npd-neg"><number:text>-</number:text><number:number number:decimal-places="2" number:min-decimal-places="2" number:min-integer-digits="1"/><number:text>%</number:text>
   <style:map style:condition="value()&gt;=0" style:apply-style-name="Npd"/></number:percentage-style>
"""

CELL_STYLES = """
  <style:style style:name="title" style:family="table-cell"><style:text-properties fo:font-weight="bold" fo:font-size="13pt"/></style:style>
  <style:style style:name="subtitle" style:family="table-cell"><style:text-properties fo:font-weight="bold"/></style:style>
  <style:style style:name="caution" style:family="table-cell"><style:text-properties fo:font-weight="bold" fo:color="#b00000"/></style:style>
  <style:style style:name="label" style:family="table-cell"/>
  <style:style style:name="label_wrap" style:family="table-cell"><style:table-cell-properties fo:wrap-option="wrap"/></style:style>
  <style:style style:name="head" style:family="table-cell"><style:table-cell-properties fo:background-color="#dddddd" fo:wrap-option="wrap"/><style:text-properties fo:font-weight="bold" fo:font-size="9pt"/></style:style>
  <style:style style:name="unit" style:family="table-cell"><style:table-cell-properties fo:background-color="#dddddd"/><style:text-properties fo:font-size="9pt"/></style:style>
  <style:style style:name="input" style:family="table-cell" style:data-style-name="Nf"><style:table-cell-properties fo:background-color="#fff3b0"/></style:style>
  <style:style style:name="input_pct" style:family="table-cell" style:data-style-name="Np"><style:table-cell-properties fo:background-color="#fff3b0"/></style:style>
  <style:style style:name="result" style:family="table-cell"><style:table-cell-properties fo:background-color="#eeeeee"/></style:style>
  <style:style style:name="result_pct" style:family="table-cell" style:data-style-name="Np"><style:table-cell-properties fo:background-color="#eeeeee"/></style:style>
  <style:style style:name="result_dpct" style:family="table-cell" style:data-style-name="Npd-neg"><style:table-cell-properties fo:background-color="#eeeeee"/></style:style>
"""


def table_style(name, visible=True):
    """A sheet style on the landscape "Report" page (styles_xml)."""
    shown = "true" if visible else "false"
    return (f'<style:style style:name="{name}" style:family="table" style:master-page-name="Report">'
            f'<style:table-properties table:display="{shown}"/></style:style>')


def column_style(name, width):
    return (f'<style:style style:name="{name}" style:family="table-column">'
            f'<style:table-column-properties style:column-width="{width}"/></style:style>')


def content_xml(automatic_styles, sheets_xml):
    return (f'<?xml version="1.0" encoding="UTF-8"?>\n<office:document-content {NS}>'
            f'<office:automatic-styles>{automatic_styles}</office:automatic-styles>'
            f'<office:body><office:spreadsheet>{sheets_xml}</office:spreadsheet></office:body></office:document-content>')


def styles_xml():
    """styles.xml: the master page "Report", A4 landscape, every sheet's columns on one page width."""
    return f"""<?xml version="1.0" encoding="UTF-8"?>
<office:document-styles {NS}>
 <office:automatic-styles>
  <style:page-layout style:name="pmReport"><style:page-layout-properties fo:page-width="29.7cm" fo:page-height="21cm"
     style:print-orientation="landscape" fo:margin-top="1cm" fo:margin-bottom="1cm" fo:margin-left="1.2cm" fo:margin-right="1.2cm"
     style:scale-to-X="1" style:scale-to-Y="1" style:print-page-order="ttb"/></style:page-layout>
 </office:automatic-styles>
 <office:master-styles>
  <style:master-page style:name="Report" style:page-layout-name="pmReport">
   <style:header style:display="false"/><style:footer style:display="false"/>
  </style:master-page>
 </office:master-styles>
</office:document-styles>
"""


def meta_xml(title, generator):
    return (f'<?xml version="1.0" encoding="UTF-8"?>\n<office:document-meta {NS}><office:meta>'
            f'<dc:title>{escape(title)}</dc:title><meta:generator>Isentra {escape(generator)}</meta:generator>'
            f'</office:meta></office:document-meta>')


# ---------------------------------------------------------------- package
def write_package(path, mimetype, parts, manifest_extra=()):
    """Writes the zipped document. parts: (name, text) in archive order after
    mimetype and META-INF/manifest.xml; the manifest lists content.xml,
    styles.xml and meta.xml, then manifest_extra: (full path, media type,
    with version attribute) for anything else (e.g. an embedded chart)."""
    entries = [f'<manifest:file-entry manifest:full-path="/" manifest:version="1.3" manifest:media-type="{mimetype}"/>']
    entries += [f'<manifest:file-entry manifest:full-path="{n}" manifest:media-type="text/xml"/>'
                for n in ("content.xml", "styles.xml", "meta.xml")]
    for full, media, versioned in manifest_extra:
        v = ' manifest:version="1.3"' if versioned else ""
        entries.append(f'<manifest:file-entry manifest:full-path="{full}"{v} manifest:media-type="{media}"/>')
    manifest = ('<?xml version="1.0" encoding="UTF-8"?>\n'
                '<manifest:manifest xmlns:manifest="urn:oasis:names:tc:opendocument:xmlns:manifest:1.0" manifest:version="1.3">'
                + "".join(entries) + '</manifest:manifest>')
    tmp = path + ".tmp"
    fixed = (1980, 1, 1, 0, 0, 0)  # reproducible archives
    with zipfile.ZipFile(tmp, "w") as z:
        def add(name, data, compress=zipfile.ZIP_DEFLATED):
            info = zipfile.ZipInfo(name, fixed)
            info.compress_type = compress
            info.external_attr = 0o644 << 16
            z.writestr(info, data.encode("utf-8"))
        add("mimetype", mimetype, zipfile.ZIP_STORED)
        add("META-INF/manifest.xml", manifest)
        for name, data in parts:
            add(name, data)
    os.replace(tmp, path)


# ---------------------------------------------------------------- charts
# An embedded chart is an object folder ("Object 1/", "Object 2/", ...) with
# its own content.xml and styles.xml, listed in the manifest, and a draw:frame
# in a sheet cell that points at it. The helpers below write both; a
# generator supplies the chart:chart body (plot area, axes, series) and the
# automatic styles it uses.
CHART_MIME = "application/vnd.oasis.opendocument.chart"


def chart_axis_style(name, minimum=None, maximum=None, interval=None, font="8pt"):
    """An axis style: fixed minimum/maximum/major interval where given, automatic otherwise."""
    fixed = ""
    if minimum is not None:
        fixed += f' chart:minimum="{minimum!r}"'
    if maximum is not None:
        fixed += f' chart:maximum="{maximum!r}"'
    if interval is not None:
        fixed += f' chart:interval-major="{interval!r}"'
    return (f'<style:style style:name="{name}" style:family="chart"><style:chart-properties chart:display-label="true"'
            f'{fixed}/><style:text-properties fo:font-size="{font}"/></style:style>')


def chart_series_style(name, colour, width="0.05cm", dash=None, symbol=None, symbol_size="0.2cm", line=True):
    """A series style: line colour/width, dash (the name of a draw:stroke-dash in the chart's
    styles.xml) or solid, and a named symbol (circle, square, diamond, arrow-up, x, ...) or none."""
    stroke = "none" if not line else ("dash" if dash else "solid")
    dash_attr = f' draw:stroke-dash="{dash}"' if dash and line else ""
    sym = (f'chart:symbol-type="named-symbol" chart:symbol-name="{symbol}" chart:symbol-width="{symbol_size}" '
           f'chart:symbol-height="{symbol_size}"' if symbol else 'chart:symbol-type="none"')
    return (f'<style:style style:name="{name}" style:family="chart"><style:chart-properties {sym}/>'
            f'<style:graphic-properties draw:stroke="{stroke}"{dash_attr} svg:stroke-width="{width}" '
            f'svg:stroke-color="{colour}" draw:fill-color="{colour}"/></style:style>')


def chart_stroke_dash(name, dot_cm, gap_cm, dots=1):
    """A dash pattern for chart_series_style(dash=name), placed in the chart's styles.xml."""
    return (f'<draw:stroke-dash draw:name="{name}" draw:style="rect" draw:dots1="{dots}" '
            f'draw:dots1-length="{dot_cm}cm" draw:distance="{gap_cm}cm"/>')


def chart_object(body, automatic_styles, dashes=()):
    """(content.xml, styles.xml) of an embedded chart: body is the chart:chart element."""
    content = (f'<?xml version="1.0" encoding="UTF-8"?>\n<office:document-content {NS}>'
               f'<office:automatic-styles>{"".join(automatic_styles)}</office:automatic-styles>'
               f'<office:body><office:chart>{body}</office:chart></office:body></office:document-content>')
    styles = (f'<?xml version="1.0" encoding="UTF-8"?>\n<office:document-styles {NS}>'
              f'<office:styles>{"".join(dashes)}</office:styles></office:document-styles>')
    return content, styles


def chart_parts(folder, content, styles):
    """The package parts and manifest entries of one chart object folder (e.g. "Object 2")."""
    parts = [(f"{folder}/content.xml", content), (f"{folder}/styles.xml", styles)]
    manifest = [(f"{folder}/", CHART_MIME, True), (f"{folder}/content.xml", "text/xml", False),
                (f"{folder}/styles.xml", "text/xml", False)]
    return parts, manifest


def chart_frame_cell(name, folder, ranges, width_cm, height_cm):
    """A cell holding the frame of an embedded chart. ranges: the cell ranges the chart
    reads (e.g. ["Sheet.A1:Sheet.A9", ...]); Calc redraws the chart when they change."""
    return (f'<table:table-cell><draw:frame draw:z-index="0" draw:name="{name}" svg:width="{width_cm}cm" '
            f'svg:height="{height_cm}cm" svg:x="0cm" svg:y="0.1cm">'
            f'<draw:object draw:notify-on-update-of-ranges={quoteattr(" ".join(ranges))} xlink:href="./{folder}" '
            'xlink:type="simple" xlink:show="embed" xlink:actuate="onLoad"/></draw:frame></table:table-cell>')
