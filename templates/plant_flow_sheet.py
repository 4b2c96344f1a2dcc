# SPDX-License-Identifier: MPL-2.0
"""The Flow sheet of the plant performance workbook (gen_plant_workbook.py).

Flow from differential-pressure meters by ISO 5167 (the STEAM.FLOW.* functions
of the add-in): one column per flow measurement, the final feedwater flow of
each test run through the test nozzle (columns C-E, one per run of the Heat
rate sheet) and the condensate flow through an orifice (column F). Results:
the flow, C, epsilon, Re_D, beta, the flow's uncertainty and the main shares
of its budget. The main steam flow of the heat rate sheet (its row 9) is this
sheet's feedwater flow plus a spray flow that bypasses the nozzle, instead of
a typed reading.

gen_plant_workbook.py calls add_flow_sheet() once; the Sheet class and the
cell helpers are that module's (passed in as `g`), so both sheets look alike.

Layout (asserted below; tests/calc/test_workbook_flow.cxx reads these rows):
  B5 the units cell (= Heaters.B5), A6 the units note
  rows 8-23 readings: 8 name, 9 family (nozzle/orifice/venturi), 10 type,
    11 d, 12 D (at T_ref), 13 alpha_d, 14 alpha_D (x 1e-6 per K or per degF),
    15 T_ref, 16 dp, 17 p, 18 T, 19 u_dp, 20 u_p (fractions), 21 u_T, 22 u_d,
    23 u_D (fractions)
  row 24 readings complete (TRUE/FALSE), row 25 the family as a number (the
    calls are =IF(C$24; IF(C$25=1; nozzle; ...); ""), as every template's)
  rows 27-38 results: 27 mass flow, 28 C, 29 eps, 30 Re_D, 31 beta,
    32 uncertainty of the flow, 33 uncertainty in % of the flow, 34-37 shares
    of C, eps, dp and of p, T, d, D together (%), 38 mean pipe velocity
  rows 41-43 to the heat rate sheet (columns C-E = its test runs C-E):
    41 spray flow not through the nozzle (input), 42 run name, 43 main steam flow
Harrow Fen Power Station is a made-up plant; the readings are invented.
"""

FLOW_COLS = "CDEF"
HEAT_RATE_MAIN_STEAM_ROW = 9  # the Heat rate sheet's main steam flow reading

# Readings per column (SI: mm, 1e-6/K, degC, kPa, MPa absolute, fractions, K).
# Invented: the final feedwater (after the feed pump, before the HP heaters,
# the Pumps sheet's 20.35 MPa and 179 degC) through a long-radius test nozzle
# with d = 250 mm in a 500 mm pipe gives the heat rate sheet's three main
# steam flows (about 535, 449.5 and 367 kg/s); the condensate orifice the
# Heaters sheet's 414 kg/s. Expansion coefficients: austenitic stainless
# nozzle 16.5, carbon-steel pipe 12.0 (x 1e-6/K, typical handbook values,
# see docs/flow.md). Instrument uncertainties as for a test-grade section.
FLOWS = [
    ("Run 1 feedwater", "nozzle", "long radius", 250.0, 500.0, 16.5, 12.0, 20.0, 61.82, 20.35, 179.1,
     0.001, 0.0025, 0.3, 0.0005, 0.004),
    ("Run 2 feedwater", "nozzle", "long radius", 250.0, 500.0, 16.5, 12.0, 20.0, 43.61, 17.52, 176.3,
     0.001, 0.0025, 0.3, 0.0005, 0.004),
    ("Run 3 feedwater", "nozzle", "long radius", 250.0, 500.0, 16.5, 12.0, 20.0, 29.02, 14.61, 171.8,
     0.001, 0.0025, 0.3, 0.0005, 0.004),
    ("Condensate", "orifice", "flange", 300.0, 500.0, 16.5, 12.0, 20.0, 41.03, 2.98, 36.7,
     0.001, 0.0025, 0.3, 0.0005, 0.004),
]
SPRAY = [0.0, 0.0, 0.0]  # superheater spray not through the nozzle, per run (kg/s; invented)
# (row, label, quantity key); quantity keys: see UNIT below
FLOW_ROWS = [
    (8, "Measurement", "name"),
    (9, "Meter family: nozzle, orifice or venturi (ISO 5167-3, -2, -4)", "name"),
    (10, "Type of meter (the texts accepted: see the note below)", "name"),
    (11, "Bore (throat) diameter d, measured at T_ref", "L"),
    (12, "Pipe inside diameter D, measured at T_ref", "L"),
    (13, "Expansion coefficient of the nozzle or plate (x 1e-6)", "alpha"),
    (14, "Expansion coefficient of the pipe (x 1e-6)", "alpha"),
    (15, "Temperature T_ref at which d and D were measured", "T"),
    (16, "Differential pressure", "dp"),
    (17, "Upstream pressure", "p"),
    (18, "Upstream temperature", "T"),
    (19, "Uncertainty of dp (fraction of reading)", "%"),
    (20, "Uncertainty of p (fraction of reading)", "%"),
    (21, "Uncertainty of T", "dT"),
    (22, "Uncertainty of d (fraction)", "%"),
    (23, "Uncertainty of D (fraction)", "%"),
]
R_OK, R_FAMILY = 24, 25
RES = {"m": 27, "C": 28, "eps": 29, "Re": 30, "beta": 31, "u_m": 32, "u_rel": 33, "sh_C": 34, "sh_eps": 35,
       "sh_dp": 36, "sh_rest": 37, "w": 38}
R_SPRAY, R_RUN, R_MAIN = 41, 42, 43

# Units per quantity key: (SI label, US label); the add-in converts by the units cell.
UNIT = {"L": ("mm", "in"), "alpha": ("1e-6/K", "1e-6/°F"), "dp": ("kPa", "inH₂O (60 °F)"), "p": ("MPa", "psia"),
        "T": ("°C", "°F"), "dT": ("K", "Δ°F"), "m": ("kg/s", "lbm/h"), "%": ("%", "%"), "-": ("", ""),
        "name": ("", ""), "w": ("m/s", "ft/s")}

MM_PER_IN = 25.4                    # exact (1959)
PA_PER_INH2O = 248.84               # inch of water at 60 degF, NIST SP 811 (2008) B.8


def to_us(q, v, g):
    """A reading as a US instrument shows it: d, D to 0.001 in, dp to 0.01 inH2O."""
    if v is None or isinstance(v, str):
        return v
    if q == "L":
        return round(v / MM_PER_IN, 3)
    if q == "alpha":
        return round(v / 1.8, 3)
    if q == "dp":
        return round(v * 1000 / PA_PER_INH2O, 2)
    if q == "dT":
        return round(v * 1.8, 2)
    if q in ("p", "T"):
        return g.to_us(q, v)
    return v


def unit_cell(g, q):
    si, us = UNIT[q]
    if si == us:
        return g.c_text(si, "unit") if si else g.c_blank("unit")
    return g.c_formula(f'IF({g.US};"{us}";"{si}")', "unit", True)


def flow_results(g, c):
    def r(n):
        return g.ref(c, n)
    ok = f"[.{c}${R_OK}]"
    args = [r(16), r(17), r(18), r(11), r(12), r(10), f"{r(13)}/1000000", f"{r(14)}/1000000", r(15)]
    unc = [r(16), r(17), r(18), r(11), r(12), r(10), r(19), r(20), r(21), r(22), r(23), f"{r(13)}/1000000",
           f"{r(14)}/1000000", r(15)]

    def by_family(method, a):  # row 25: 1 nozzle, 2 orifice, 3 venturi
        fam = f"[.{c}${R_FAMILY}]"
        return (f'IF({fam}=1;{g.call(method + "Nozzle", *a)};'
                f'IF({fam}=2;{g.call(method + "Orifice", *a)};{g.call(method + "Venturi", *a)}))')

    def sol(k):  # element k (1-based) of the STEAM.FLOW.SOLUTION.* row
        return f"INDEX({by_family('flowSolution', args)};1;{k})"

    def bud(k):  # element k of the STEAM.FLOW.BUDGET.* row
        return f"INDEX({by_family('flowBudget', unc)};1;{k})"
    return [
        (RES["m"], "Mass flow (ISO 5167, iterated in Re_D)", "m", "result_2", g.when(ok, by_family("flow", args))),
        (RES["C"], "Discharge coefficient C", "-", "result_5", g.when(ok, sol(2))),
        (RES["eps"], "Expansibility factor eps (1 for water)", "-", "result_5", g.when(ok, sol(3))),
        (RES["Re"], "Pipe Reynolds number Re_D", "-", "result_1", g.when(ok, sol(4))),
        (RES["beta"], "Diameter ratio beta = d/D at the flowing temperature", "-", "result_5", g.when(ok, sol(5))),
        (RES["u_m"], "Uncertainty of the flow (ASME PTC 19.1, 95 %)", "m", "result_2",
         g.when(ok, by_family("flowUnc", unc))),
        (RES["u_rel"], "Uncertainty of the flow in % of the flow", "%", "result_3", g.when(ok, bud(3))),
        (RES["sh_C"], "Share of the total: discharge coefficient C", "%", "result_1", g.when(ok, bud(11))),
        (RES["sh_eps"], "Share of the total: expansibility eps", "%", "result_1", g.when(ok, bud(12))),
        (RES["sh_dp"], "Share of the total: differential pressure", "%", "result_1", g.when(ok, bud(13))),
        (RES["sh_rest"], "Share of the total: p, T, d and D", "%", "result_1",
         g.when(ok, f"{bud(14)}+{bud(15)}+{bud(16)}+{bud(17)}")),
        (RES["w"], "Mean velocity in the pipe", "w", "result_2", g.when(ok, sol(11))),
    ]


def flow_sheet(g, demo, system):
    us = system == "US"
    s = g.Sheet(2 + len(FLOW_COLS))
    s.header("Harrow Fen Power Station, Unit 2: feedwater and condensate flow" + (", US units" if us else "")
             if demo else "Flow from differential-pressure meters (ISO 5167)",
             "Mass flow from the differential pressure of a flow nozzle, orifice plate or venturi tube by ISO 5167,"
             " on IAPWS-IF97 density, R12-08 viscosity and the isentropic exponent. The feedwater flow of each run"
             " (row 43) is the main steam flow of sheet Heat rate (its row 9).",
             g.linked_units_cell(),
             "Units: d and D in mm (SI) or in (US); dp in kPa (SI) or inches of water at 60 °F (US, 248.84 Pa,"
             " NIST SP 811); expansion coefficients in millionths per K or per °F. Uncertainties at 95 %,"
             " as fractions of the reading (shown in %).")
    s.add([g.c_text("Readings (one column per flow measurement)", "subtitle")], expect=7)
    values = None
    if demo:
        values = [tuple(to_us(q, v, g) for (_, _, q), v in zip(FLOW_ROWS, col)) for col in FLOWS] if us else FLOWS
    names = [f"Run {k + 1} feedwater" for k in range(3)] + ["Condensate"]
    for i, (n, label, q) in enumerate(FLOW_ROWS):
        cells = ([g.c_text(label, "head"), g.c_text("Unit", "head")] if i == 0
                 else [g.c_text(label, "label"), unit_cell(g, q)])
        for k in range(len(FLOW_COLS)):
            v = values[k][i] if values else (names[k] if i == 0 else None)
            style = "input_pct" if q == "%" else "input_name" if q == "name" else "input"
            cells.append(g.input_cell(v, style))
        s.add(cells, expect=n)
    s.add([g.c_text("Readings complete (rows 9-23)", "label"), g.c_blank("unit")]
          + [g.c_formula(f"AND(COUNT([.{c}11:.{c}23])=13;{g.ref(c, R_FAMILY)}>0;LEN(TRIM({g.ref(c, 10)}))>0)",
                         "check") for c in FLOW_COLS], expect=R_OK)

    def family(c):
        f = f"LOWER(TRIM({g.ref(c, 9)}))"
        return f'IF({f}="nozzle";1;IF({f}="orifice";2;IF({f}="venturi";3;0)))'
    s.add([g.c_text("Meter family as a number (1 nozzle, 2 orifice, 3 venturi; 0 unknown)", "label"),
           g.c_blank("unit")] + [g.c_formula(family(c), "result") for c in FLOW_COLS], expect=R_FAMILY)
    s.add([g.c_text("Results", "head"), g.c_text("Unit", "head")]
          + [g.c_formula(f'{g.ref(c, 8)}&""', "head_name", True) for c in FLOW_COLS], expect=26)
    per_col = [flow_results(g, c) for c in FLOW_COLS]
    for i, (n, label, q, _, _) in enumerate(per_col[0]):
        s.add([g.c_text(label, "label"), unit_cell(g, q)] + [g.c_formula(res[i][4], res[i][3]) for res in per_col],
              expect=n)
    s.add([g.c_empty()])
    s.add([g.c_text("Main steam flow for sheet Heat rate (columns C-E: its test runs)", "subtitle")], expect=40)
    s.add([g.c_text("Superheater spray water not through the nozzle", "label"), unit_cell(g, "m")]
          + [g.input_cell((g.to_us("m", v) if us else v) if demo else None) for v in SPRAY], expect=R_SPRAY)
    s.add([g.c_text("Test run (sheet Heat rate, row 8)", "label"), g.c_blank("unit")]
          + [g.c_formula(f"['Heat rate'.{c}8]&\"\"", "head_name", True) for c in "CDE"], expect=R_RUN)
    s.add([g.c_text("Main steam flow = feedwater flow + spray (to Heat rate row 9)", "label"), unit_cell(g, "m")]
          + [g.c_formula(g.when(f"AND(ISNUMBER({g.ref(c, RES['m'])});ISNUMBER({g.ref(c, R_SPRAY)}))",
                                f"{g.ref(c, RES['m'])}+{g.ref(c, R_SPRAY)}"), "result_2") for c in "CDE"],
          expect=R_MAIN)
    s.add([g.c_empty()])
    s.note("Types (row 10): for a nozzle \"ISA 1932\", \"long radius\" or \"venturi nozzle\"; for an orifice the"
           " tappings \"corner\", \"flange\" or \"D-D/2\"; for a venturi tube the convergent section \"as cast\","
           " \"machined\" or \"rough welded\".")
    s.note("Limits of use of ISO 5167 (D, d, beta, Re_D, p2/p1), wet steam and water that would flash are errors:"
           " =STEAM.EXPLAIN(\"FLOW.NOZZLE\"; same arguments) says which. A calibrated test section takes"
           " STEAM.FLOW.CALIBRATED with its certificate's coefficient instead. The uncertainty combines the"
           " standard's statements for C and eps with the instrument uncertainties (ASME PTC 19.1).")
    g.version_row(s)
    return s


def link_heat_rate(g, heat_rate, demo):
    """The Heat rate sheet's main steam flow (row 9) from this sheet's row 43."""
    cells = [g.c_text("Main steam flow (from sheet Flow, row 43)", "label"), g.unit_cell("m")]
    cells += [g.c_formula(f'IF(ISNUMBER([$Flow.{c}{R_MAIN}]);[$Flow.{c}{R_MAIN}];"")', "result_2") for c in "CDE"]
    heat_rate.rows[HEAT_RATE_MAIN_STEAM_ROW - 1] = g.row(cells)


def add_flow_sheet(g, sheets, demo, system):
    """sheets: [(name, Sheet)] of gen_plant_workbook.document(); returns them with the
    Flow sheet appended and the Heat rate sheet's main steam flow taken from it."""
    for name, sheet in sheets:
        if name == "Heat rate":
            link_heat_rate(g, sheet, demo)
    return sheets + [("Flow", flow_sheet(g, demo, system))]
