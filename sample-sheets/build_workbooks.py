#!/usr/bin/python3
"""Builds the sample workbooks from the seeded scenarios in scenarios.py.

    PYTHONPATH=addin/python /usr/bin/python3 sample-sheets/build_workbooks.py --extension build/isoquant.oxt [--output DIR]

(from the repository root; `cmake --build build --target sample_workbooks` runs it over sample-sheets/)

Each workbook is written as flat OpenDocument XML (.fods), readable and diffable. After building,
every formula cell must compute without an error or message, and the fitted exponents must land
within three standard errors of the true ones; the script exits non-zero otherwise.
"""
import os
import sys

from isoquant_office import HeadlessOffice, extension_and_output, set_array_formula, set_formula, set_values

import efficiency_workbook
import scenarios  # this folder's modules: on the path as the script's own
import workbook_style as style
from workbook_about import SHARING, about_sheet
from workbook_checks import formula_problems, named_range

HERE = os.path.dirname(os.path.abspath(__file__))

FLAT_ODS_FILTER = "OpenDocument Spreadsheet Flat XML"

CAUTION = ("Caution: the fitted figures are statistical estimates from a small sample. They depend on the "
           "quality of the data and on the Cobb-Douglas form being a fair description. They are not "
           "professional advice: check them with qualified practice before they steer costly decisions.")
CAUTION_FORMS = ("Caution: the fitted figures are statistical estimates from a small panel. They depend on the "
                 "quality of the data and on the form fitted; a better AIC says which form fits these rows, "
                 "not that it holds elsewhere. They are not professional advice: check them with qualified "
                 "practice before they steer costly decisions.")
CAUTION_GROWTH = ("Caution: TFP growth is a residual. It carries every error in the output, input and cost "
                  "figures and everything the inputs leave out (quality, capacity use, measurement): read a "
                  "year's figure as a question to look into, not a verdict. These are statistical accounts, "
                  "not professional advice: check them with qualified practice before they steer costly "
                  "decisions.")
def furniture_workshops(office, path):
    truth = scenarios.WORKSHOPS
    rows = scenarios.workshop_rows()
    last = len(rows) + 1
    doc = office.new_calc()
    about_sheet(doc, "Birchwood Joinery: what drives workshop output?", [
        "What it shows: a Cobb-Douglas production function fitted to last year's output, labour and capital "
        "of the company's %d workshops, with the returns-to-scale verdict, and for every workshop its fitted "
        "output and the marginal products of labour and capital (the output one more unit of each would "
        "add)." % len(rows),
        "Which cells to change: the yellow data cells on the sheet Workshops (B2:D%d). Everything else "
        "recalculates. The fitted table is the array formula in I1:O17." % last,
        "Units: output and capital in thousand EUR a year, labour in thousand hours worked.",
        "Where the data came from: invented. sample-sheets/scenarios.py draws the workshops with seed %d "
        "from output = %.1f x labour^%.2f x capital^%.2f x exp(noise), noise normal with SD %.2f, so the true "
        "returns to scale are %.2f." % (truth["seed"], truth["scale"], truth["labour_exponent"],
                                         truth["capital_exponent"], truth["noise_sd"],
                                         truth["labour_exponent"] + truth["capital_exponent"]),
        CAUTION,
        SHARING,
    ])

    doc.Sheets.insertNewByName("Workshops", 1)
    sheet = doc.Sheets.getByName("Workshops")
    set_values(sheet, "A1", [["workshop", "output", "labour", "capital"]] + [list(row) for row in rows])
    set_values(sheet, "E1", [["fitted output", "MP labour", "MP capital"]])
    style.header(sheet.getCellRangeByName("A1:G1"))
    style.input_cells(sheet.getCellRangeByName("B2:D%d" % last))

    table = "$I$1:$O$17"
    set_array_formula(sheet, "I1:O17", "=PRODFIT(B1:B%d;C1:D%d)" % (last, last))
    style.header(sheet.getCellRangeByName("I1:O1"))
    for row in range(2, last + 1):
        set_formula(sheet, "E%d" % row, "=PRODOUTPUT(%s;C%d:D%d)" % (table, row, row))
        set_formula(sheet, "F%d" % row, "=PRODMARGINAL(%s;C%d:D%d;\"labour\")" % (table, row, row))
        set_formula(sheet, "G%d" % row, "=PRODMARGINAL(%s;C%d:D%d;\"capital\")" % (table, row, row))

    set_values(sheet, "I19", [["In short"], ["returns to scale"], ["verdict (classical errors)"],
                              ["verdict (hc3 errors)"]])
    style.header(sheet.getCellRangeByName("I19:J19"))
    set_formula(sheet, "J20", "=PRODSCALE(%s)" % table)
    set_formula(sheet, "J21", "=PRODRETURNS(%s)" % table)
    set_formula(sheet, "J22", "=PRODSTAT(B1:B%d;C1:D%d;\"verdict\";;;;\"hc3\")" % (last, last))

    style.number_format(doc, sheet.getCellRangeByName("B2:B%d" % last), "0.0")
    style.number_format(doc, sheet.getCellRangeByName("C2:C%d" % last), "0.0")
    style.number_format(doc, sheet.getCellRangeByName("D2:D%d" % last), "0")
    style.number_format(doc, sheet.getCellRangeByName("E2:G%d" % last), "0.00")
    style.number_format(doc, sheet.getCellRangeByName("J2:O17"), "0.0000")
    style.number_format(doc, sheet.getCellRangeByName("J6"), "0")
    style.number_format(doc, sheet.getCellRangeByName("J20"), "0.000")
    style.align_right(sheet.getCellRangeByName("B1:G1"))
    style.align_right(sheet.getCellRangeByName("J1:O1"))
    style.column_widths(sheet, {"A": 28, "B": 18, "C": 18, "D": 18, "E": 24, "F": 22, "G": 22, "H": 6,
                                "I": 42, "J": 24, "K": 22, "L": 18, "M": 22, "N": 20, "O": 20})
    style.scatter_chart(sheet, "actual_vs_fitted", "Actual and fitted output (thousand EUR)",
                        actual_range="B1:B%d" % last, fitted_range="E1:E%d" % last, anchor="I25", size_mm=(160, 90))
    doc.NamedRanges.addNewByName("fitted_technology", "$Workshops.%s" % table,
                                 sheet.getCellRangeByName("A1").CellAddress, 0)
    doc.calculateAll()
    check_workbook(doc, path, {"labour": truth["labour_exponent"], "capital": truth["capital_exponent"]})
    office.store(doc, path, FLAT_ODS_FILTER)
    doc.close(True)


def new_sheet(doc, name):
    doc.Sheets.insertNewByName(name, doc.Sheets.Count)
    return doc.Sheets.getByName(name)


def add_name(doc, name, sheet, cell_range):
    doc.NamedRanges.addNewByName(name, "$'%s'.%s" % (sheet.Name, cell_range),
                                 sheet.getCellRangeByName("A1").CellAddress, 0)


def dairy_creameries(office, path):
    truth = scenarios.CREAMERIES
    rows = scenarios.creamery_rows()
    last = len(rows) + 1
    first_year = rows[0][1]
    data = "$Creameries."
    output, inputs = data + "$C$1:$C$%d" % last, data + "$D$1:$E$%d" % last
    groups, years = data + "$A$1:$A$%d" % last, data + "$B$1:$B$%d" % last
    translog = "$Forms.$A$34:$G$56"
    doc = office.new_calc()
    about_sheet(doc, "Marrow Valley Dairies: six years of eight creameries", [
        "What it shows: a Cobb-Douglas production function fitted to %d years of output, labour and capital "
        "of the cooperative's %d creameries, with one effect per creamery (fixed effects: each creamery's own "
        "level of efficiency, whatever its cause) and a trend (technical change per year), standard errors "
        "robust within creameries. The sheet Forms compares Cobb-Douglas, CES and translog on the same rows, "
        "and the sheet Creameries flags, row by row, where the fitted translog is not a well-behaved "
        "production function (PRODREGULAR)." % (truth["years"], len(truth["names"])),
        "Which cells to change: the yellow data cells on the sheet Creameries (C2:E%d). Everything else "
        "recalculates. The fixed-effects table is the array formula in A1:G23 of the sheet Fixed effects; "
        "the comparison of forms, the CES and the translog tables are on the sheet Forms." % last,
        "Units: output in thousand EUR at %d prices, labour in thousand hours worked, capital (plant and "
        "equipment at replacement value) in thousand EUR at %d prices." % (first_year, first_year),
        "Where the data came from: invented. sample-sheets/scenarios.py draws the creameries with seed %d "
        "from ln output = ln %.1f + creamery effect + %.3f x (year - %d) + %.2f ln labour + %.2f ln capital "
        "+ noise, the creamery effects normal with SD %.2f (independent of the inputs), the noise normal "
        "with SD %.2f. So the true technology is Cobb-Douglas with returns to scale %.2f and %.1f%% more "
        "output a year from the same inputs." % (
            truth["seed"], truth["scale"], truth["trend"], first_year, truth["labour_exponent"],
            truth["capital_exponent"], truth["effect_sd"], truth["noise_sd"],
            truth["labour_exponent"] + truth["capital_exponent"], 100 * truth["trend"]),
        "Reading the comparison: PRODCOMPARE fits the three forms to the pooled rows, without creamery "
        "effects or trend; with only %d creameries the cluster-robust bounds are wide (%d degrees of "
        "freedom). The true technology is Cobb-Douglas, yet the pooled rows may reject it: they leave out "
        "the creameries' own levels and the yearly technical change, and the flexible forms bend to absorb "
        "them (here the CES runs to an extreme weight and the translog's marginal product of capital turns "
        "negative on some rows: see the flags). A Cobb-Douglas rejected on pooled rows is a reason to look at "
        "effects and trends before reaching for a more flexible form." % (len(truth["names"]),
                                                                          len(truth["names"]) - 1),
        CAUTION_FORMS,
        SHARING,
    ])

    # All sheets first: formulas refer across them.
    for name in ("Creameries", "Fixed effects", "Forms"):
        new_sheet(doc, name)
    sheet = doc.Sheets.getByName("Creameries")
    set_values(sheet, "A1", [["creamery", "year", "output", "labour", "capital"]] + [list(row) for row in rows])
    set_values(sheet, "F1", [["translog fitted", "translog regularity"]])
    style.header(sheet.getCellRangeByName("A1:G1"))
    style.input_cells(sheet.getCellRangeByName("C2:E%d" % last))
    for row in range(2, last + 1):
        set_formula(sheet, "F%d" % row, "=PRODOUTPUT(%s;D%d:E%d)" % (translog, row, row))
        set_formula(sheet, "G%d" % row, "=PRODREGULAR(%s;D%d:E%d)" % (translog, row, row))
    style.number_format(doc, sheet.getCellRangeByName("C2:D%d" % last), "0.0")
    style.number_format(doc, sheet.getCellRangeByName("E2:E%d" % last), "0")
    style.number_format(doc, sheet.getCellRangeByName("F2:F%d" % last), "0.0")
    style.align_right(sheet.getCellRangeByName("B1:F1"))
    style.column_widths(sheet, {"A": 26, "B": 14, "C": 18, "D": 18, "E": 18, "F": 26, "G": 70, "H": 6})
    style.wrapped_column(sheet, 6, width_mm=70)
    style.align_left(sheet.getCellRangeByName("G1:G%d" % last))  # an indent needs explicit left alignment
    sheet.getCellRangeByName("G1:G%d" % last).ParaIndent = 300  # 3 mm off the numbers beside
    style.one_page_wide(doc, sheet, landscape=True)
    style.scatter_chart(sheet, "actual_vs_translog", "Actual and translog fitted output (thousand EUR)",
                        actual_range="C1:C%d" % last, fitted_range="F1:F%d" % last, anchor="I2", size_mm=(150, 90))

    sheet = doc.Sheets.getByName("Fixed effects")
    table = "$A$1:$G$23"
    set_array_formula(sheet, "A1:G23", '=PRODFIT(%s;%s;;;"cluster";;;%s;"fixed";%s)' % (output, inputs, groups, years))
    style.header(sheet.getCellRangeByName("A1:G1"))
    style.number_format(doc, sheet.getCellRangeByName("B2:G23"), "0.0000")
    for count_cell in ("B6", "B18"):  # observations, groups
        style.number_format(doc, sheet.getCellRangeByName(count_cell), "0")
    style.align_right(sheet.getCellRangeByName("B1:G23"))
    set_values(sheet, "A24", [["In short"], ["technical change per year"], ["returns to scale"],
                              ["verdict (cluster errors)"], ["pooled fit, no effects or trend: labour"],
                              ["pooled fit, no effects or trend: capital"]])
    style.header(sheet.getCellRangeByName("A24:B24"))
    set_formula(sheet, "B25", '=PRODSTAT(%s;%s;"technical change per period";;;;"cluster";;;%s;"fixed";%s)'
                % (output, inputs, groups, years))
    set_formula(sheet, "B26", "=PRODSCALE(%s)" % table)
    set_formula(sheet, "B27", "=PRODRETURNS(%s)" % table)
    set_formula(sheet, "B28", '=PRODSTAT(%s;%s;"labour")' % (output, inputs))
    set_formula(sheet, "B29", '=PRODSTAT(%s;%s;"capital")' % (output, inputs))
    style.number_format(doc, sheet.getCellRangeByName("B25"), "0.0000")
    style.number_format(doc, sheet.getCellRangeByName("B26:B29"), "0.000")
    style.align_right(sheet.getCellRangeByName("B25:B29"))
    set_values(sheet, "D24", [["creamery", "effect (ln A)", "level vs mean"]])
    set_values(sheet, "D25", [[name] for name in truth["names"]])
    style.header(sheet.getCellRangeByName("D24:F24"))
    effects_end = 24 + len(truth["names"])
    for row in range(25, effects_end + 1):
        set_formula(sheet, "E%d" % row, '=PRODSTAT(%s;%s;"effect of group "&D%d;;;;"cluster";;;%s;"fixed";%s)'
                    % (output, inputs, row, groups, years))
        set_formula(sheet, "F%d" % row, "=EXP(E%d-AVERAGE($E$25:$E$%d))" % (row, effects_end))
    style.number_format(doc, sheet.getCellRangeByName("E25:E%d" % effects_end), "0.000")
    style.number_format(doc, sheet.getCellRangeByName("F25:F%d" % effects_end), "0.00")
    style.align_right(sheet.getCellRangeByName("E24:F24"))
    style.column_widths(sheet, {"A": 62, "B": 24, "C": 22, "D": 26, "E": 22, "F": 24, "G": 22})
    style.one_page_wide(doc, sheet, landscape=True)
    add_name(doc, "fitted_technology", sheet, table)

    sheet = doc.Sheets.getByName("Forms")
    set_values(sheet, "A1", [["Three forms fitted to the pooled rows (no creamery effects, no trend)"]])
    set_array_formula(sheet, "A2:G9", "=PRODCOMPARE(%s;%s)" % (output, inputs))
    set_values(sheet, "A11", [["CES"]])
    set_array_formula(sheet, "A12:G31", '=PRODFIT(%s;%s;"ces")' % (output, inputs))
    set_values(sheet, "A33", [["Translog"]])
    set_array_formula(sheet, "A34:G56", '=PRODFIT(%s;%s;"translog")' % (output, inputs))
    for heading in ("A1", "A11", "A33"):
        sheet.getCellRangeByName(heading).CharWeight = style.BOLD
    for header_range in ("A2:G2", "A7:G7", "A12:G12", "A34:G34"):
        style.header(sheet.getCellRangeByName(header_range))
    for body in ("B2:G9", "B12:G31", "B34:G56"):
        style.align_right(sheet.getCellRangeByName(body))
    style.number_format(doc, sheet.getCellRangeByName("C3:E5"), "0.00")
    style.number_format(doc, sheet.getCellRangeByName("B8:B9"), "0.000")
    style.number_format(doc, sheet.getCellRangeByName("E8:E9"), "0.0000")
    style.number_format(doc, sheet.getCellRangeByName("B13:G31"), "0.0000")
    style.number_format(doc, sheet.getCellRangeByName("B35:G56"), "0.0000")
    for count_cell in ("B19", "B42"):  # observations of the ces and the translog table
        style.number_format(doc, sheet.getCellRangeByName(count_cell), "0")
    # The ces convergence note is longer than its column, and its neighbours are array cells that
    # stop it spilling over: repeat it in full in the empty row below the table.
    set_formula(sheet, "A32", '="ces convergence: "&B29&", "&C29')
    sheet.getCellRangeByName("A32").CharHeight = 9.0
    style.align_left(sheet.getCellRangeByName("C29"))
    sheet.getCellRangeByName("C29").ParaIndent = 200
    style.column_widths(sheet, {"A": 52, "B": 22, "C": 26, "D": 22, "E": 22, "F": 26, "G": 44})
    style.one_page_wide(doc, sheet, landscape=False)
    add_name(doc, "form_comparison", sheet, "$A$2:$G$9")
    doc.calculateAll()
    check_workbook(doc, path, {"labour": truth["labour_exponent"], "capital": truth["capital_exponent"],
                               "technical change per period": truth["trend"]})
    office.store(doc, path, FLAT_ODS_FILTER)
    doc.close(True)


def glassworks_growth(office, path):
    truth = scenarios.GLASSWORKS
    rows, true_tfp = scenarios.glassworks_rows()
    last = len(rows) + 1
    first_year, last_year = rows[0][0], rows[-1][0]
    doc = office.new_calc()
    about_sheet(doc, "Saltmarsh Glassworks: where twenty years of growth came from", [
        "What it shows: growth accounting for one container-glass plant, %d to %d. Each year's growth of "
        "output is split into the contributions of more labour, capital and energy, each weighted by its "
        "share of the plant's costs (Tornqvist: the mean of the two years' shares), and the rest, total "
        "factor productivity (TFP) growth. The sheet Plant also carries the combined input index "
        "(PRODINDEX) and the output and TFP indexes, %d = 100." % (first_year, last_year, first_year),
        "Which cells to change: the yellow cells on the sheet Plant: the quantities (B2:E%d) and the cost "
        "shares (F2:H%d, each row summing to 1). Everything else recalculates. The accounting table is "
        "the array formula in B1:H%d of the sheet Growth accounting; growth figures are differences of "
        "natural logs (0.05 is about 5%%)." % (last, last, last),
        "Units: output in million EUR at %d prices, labour in thousand hours worked, capital (furnaces "
        "and lines) in million EUR at %d prices, energy (gas and power) in GWh." % (first_year, first_year),
        "Where the data came from: invented. sample-sheets/scenarios.py draws the years with seed %d: "
        "each input grows at random around a yearly %.1f%% (labour), %.1f%% (capital) and %.1f%% "
        "(energy); the cost shares drift from %.2f / %.2f / %.2f to %.2f / %.2f / %.2f with small noise; "
        "output grows by the share-weighted input growth plus TFP growth drawn normal with mean %.3f and "
        "SD %.3f a year. The true TFP growth over the %d years is %.4f; the accounting recovers it up "
        "to the rounding of the published figures." % (
            truth["seed"], 100 * truth["growth"]["labour"], 100 * truth["growth"]["capital"],
            100 * truth["growth"]["energy"], truth["first_shares"]["labour"], truth["first_shares"]["capital"],
            1 - truth["first_shares"]["labour"] - truth["first_shares"]["capital"],
            truth["last_shares"]["labour"], truth["last_shares"]["capital"],
            1 - truth["last_shares"]["labour"] - truth["last_shares"]["capital"],
            truth["tfp_growth"], truth["tfp_sd"], len(true_tfp), sum(true_tfp)),
        CAUTION_GROWTH,
        SHARING,
    ])

    sheet = new_sheet(doc, "Plant")
    new_sheet(doc, "Growth accounting")
    labels = ["year", "output", "labour", "capital", "energy", "labour share", "capital share", "energy share"]
    set_values(sheet, "A1", [labels] + [list(row) for row in rows])
    set_values(sheet, "I1", [["input index", "output index", "TFP index"]])
    style.header(sheet.getCellRangeByName("A1:K1"))
    style.align_right(sheet.getCellRangeByName("A1:K1"))
    style.input_cells(sheet.getCellRangeByName("B2:H%d" % last))
    # The shares' headers ("labour share") are not the inputs' labels, which a header row of shares
    # must repeat: the share ranges start below the header.
    set_array_formula(sheet, "I2:I%d" % last, '=PRODINDEX(C2:E%d;F2:H%d;"tornqvist";100)' % (last, last))
    for row in range(2, last + 1):
        set_formula(sheet, "J%d" % row, "=100*B%d/$B$2" % row)
        set_formula(sheet, "K%d" % row, "=100*J%d/I%d" % (row, row))
    style.number_format(doc, sheet.getCellRangeByName("A2:A%d" % last), "0")
    style.number_format(doc, sheet.getCellRangeByName("B2:E%d" % last), "0.0")
    style.number_format(doc, sheet.getCellRangeByName("F2:H%d" % last), "0.000")
    style.number_format(doc, sheet.getCellRangeByName("I2:K%d" % last), "0.0")
    style.column_widths(sheet, {"A": 14, "B": 18, "C": 18, "D": 18, "E": 18, "F": 24, "G": 26, "H": 24,
                                "I": 22, "J": 24, "K": 20})
    style.one_page_wide(doc, sheet, landscape=True)

    sheet = doc.Sheets.getByName("Growth accounting")
    table = "$B$1:$H$%d" % (last)
    set_array_formula(sheet, "B1:H%d" % last, "=PRODGROWTH($Plant.$B$1:$B$%d;$Plant.$C$1:$E$%d;$Plant.$F$2:$H$%d)"
                      % (last, last, last))
    set_values(sheet, "A1", [["year"]])
    for row in range(2, last):
        set_formula(sheet, "A%d" % row, "=$Plant.A%d" % (row + 1))
    set_values(sheet, "A%d" % last, [["%d-%d" % (first_year, last_year)]])
    style.header(sheet.getCellRangeByName("A1:H1"))
    style.align_right(sheet.getCellRangeByName("A1:H1"))
    style.align_right(sheet.getCellRangeByName("A2:A%d" % last))
    style.number_format(doc, sheet.getCellRangeByName("A2:A%d" % (last - 1)), "0")
    style.number_format(doc, sheet.getCellRangeByName("B2:B%d" % last), "0")
    style.number_format(doc, sheet.getCellRangeByName("C2:H%d" % last), "0.0000")
    set_values(sheet, "J1", [["In short"], ["output growth a year"], ["TFP growth a year"],
                             ["TFP share of output growth"]])
    style.header(sheet.getCellRangeByName("J1:K1"))
    set_formula(sheet, "K2", "=C%d/%d" % (last, len(rows) - 1))
    set_formula(sheet, "K3", "=H%d/%d" % (last, len(rows) - 1))
    set_formula(sheet, "K4", "=H%d/C%d" % (last, last))
    style.number_format(doc, sheet.getCellRangeByName("K2:K3"), "0.0000")
    style.number_format(doc, sheet.getCellRangeByName("K4"), "0%")
    style.column_widths(sheet, {"A": 26, "B": 16, "C": 26, "D": 20, "E": 20, "F": 20, "G": 22, "H": 22,
                                "I": 6, "J": 50, "K": 20})
    style.one_page_wide(doc, sheet, landscape=True, one_page_high=True)
    style.stacked_columns_chart(sheet, "growth_sources", "Where output growth came from (log points a year)",
                                categories="A1:A%d" % (last - 1), series=("D1:F%d" % (last - 1), "H1:H%d" % (last - 1)),
                                anchor="A%d" % (last + 2), size_mm=(230, 110))
    add_name(doc, "growth_accounting", sheet, table)
    doc.calculateAll()
    check_growth(doc, path, sum(true_tfp))
    office.store(doc, path, FLAT_ODS_FILTER)
    doc.close(True)


CAUTION_PLAN = ("Caution: a plan is only as good as its model. Here the model is typed, not fitted: with a "
                "fitted one the bundles inherit its statistical uncertainty, and the Cobb-Douglas form, the "
                "prices and the target are assumptions. These are not professional advice: check them with "
                "qualified practice before they steer costly decisions.")


def bakery_planning(office, path):
    truth = scenarios.BAKERY
    hours = truth["baker_hours"]
    last = len(hours) + 1
    doc = office.new_calc()
    about_sheet(doc, "Kestrel Street Bakery: planning the day's baking", [
        "What it shows: for a Cobb-Douglas model of loaves from baker hours and oven hours, the cheapest "
        "mix of hours that bakes the target number of loaves (PRODLEASTCOST) and what it costs in total, at "
        "the margin and per loaf (PRODCOST); the most loaves a daily budget can buy and how to split it "
        "(PRODBUDGET); the isoquant (every mix that bakes the target, PRODISOQUANT) with today's cost line "
        "touching it at the cheapest mix; and, side by side, what changes when an oven hour costs %.0f "
        "instead of %.0f EUR." % (truth["dearer_oven_price"], truth["oven_price"]),
        "Which cells to change: the yellow cells on the sheet Plan: the model (A1:B4), the prices, target "
        "and budget of both scenarios (B7:C10) and the baker hours the isoquant is drawn over (E2:E%d). "
        "Everything else recalculates." % last,
        "Units: loaves a day; baker hours and oven hours a day; prices, costs and the budget in EUR.",
        "Where the data came from: invented. The model is typed, not fitted: loaves = %.0f x baker "
        "hours^%.1f x oven hours^%.1f (returns to scale %.1f), with %.0f EUR a baker hour, %.0f EUR an oven "
        "hour, a target of %.0f loaves and a budget of %.0f EUR a day (sample-sheets/scenarios.py)." % (
            truth["scale"], truth["baker_exponent"], truth["oven_exponent"],
            truth["baker_exponent"] + truth["oven_exponent"], truth["baker_price"], truth["oven_price"],
            truth["target"], truth["budget"]),
        CAUTION_PLAN,
        SHARING,
    ])

    sheet = new_sheet(doc, "Plan")
    model = "$A$1:$B$4"
    set_values(sheet, "A1", [["form", "cobb-douglas"], ["A", truth["scale"]], ["bakers", truth["baker_exponent"]],
                             ["ovens", truth["oven_exponent"]]])
    style.header(sheet.getCellRangeByName("A1:B1"))
    style.input_cells(sheet.getCellRangeByName("B2:B4"))
    set_values(sheet, "A6", [["scenario", "today", "dearer ovens"],
                             ["price of a baker hour", truth["baker_price"], truth["baker_price"]],
                             ["price of an oven hour", truth["oven_price"], truth["dearer_oven_price"]],
                             ["target (loaves a day)", truth["target"], truth["target"]],
                             ["budget a day", truth["budget"], truth["budget"]],
                             ["least cost: baker hours", None, None], ["least cost: oven hours", None, None], ["total cost a day", None, None],
                             ["marginal cost of a loaf", None, None], ["average cost of a loaf", None, None],
                             ["budget: baker hours", None, None], ["budget: oven hours", None, None], ["budget: loaves", None, None]])
    style.header(sheet.getCellRangeByName("A6:C6"))
    style.align_right(sheet.getCellRangeByName("B6:C6"))
    style.input_cells(sheet.getCellRangeByName("B7:C10"))
    for column in "BC":
        # The prices are a column, so PRODLEASTCOST and PRODBUDGET give columns: INDEX picks row k.
        prices, target, budget = "%s7:%s8" % (column, column), "%s9" % column, "%s10" % column
        set_formula(sheet, column + "11", "=INDEX(PRODLEASTCOST(%s;%s;%s);1;1)" % (model, target, prices))
        set_formula(sheet, column + "12", "=INDEX(PRODLEASTCOST(%s;%s;%s);2;1)" % (model, target, prices))
        set_formula(sheet, column + "13", "=PRODCOST(%s;%s;%s)" % (model, target, prices))
        set_formula(sheet, column + "14", '=PRODCOST(%s;%s;%s;"marginal")' % (model, target, prices))
        set_formula(sheet, column + "15", '=PRODCOST(%s;%s;%s;"average")' % (model, target, prices))
        for row, item in ((16, 1), (17, 2), (18, 3)):
            set_formula(sheet, "%s%d" % (column, row), "=INDEX(PRODBUDGET(%s;%s;%s);%d;1)"
                        % (model, budget, prices, item))
    style.number_format(doc, sheet.getCellRangeByName("B7:C10"), "0.00")
    style.number_format(doc, sheet.getCellRangeByName("B9:C10"), "0")
    style.number_format(doc, sheet.getCellRangeByName("B11:C18"), "0.00")
    style.number_format(doc, sheet.getCellRangeByName("B14:C15"), "0.0000")

    set_values(sheet, "E1", [["baker hours", "oven hours for the target", "today's cost line"]]
               + [[float(value), None, None] for value in hours])
    style.header(sheet.getCellRangeByName("E1:G1"))
    style.align_right(sheet.getCellRangeByName("E1:G1"))
    style.input_cells(sheet.getCellRangeByName("E2:E%d" % last))
    set_array_formula(sheet, "F2:F%d" % last, "=PRODISOQUANT(%s;$B$9;E2:E%d)" % (model, last))
    for row in range(2, last + 1):
        set_formula(sheet, "G%d" % row, "=($B$13-$B$7*E%d)/$B$8" % row)
    style.number_format(doc, sheet.getCellRangeByName("E2:E%d" % last), "0")
    style.number_format(doc, sheet.getCellRangeByName("F2:G%d" % last), "0.00")
    style.column_widths(sheet, {"A": 52, "B": 24, "C": 26, "D": 6, "E": 24, "F": 44, "G": 36})
    style.one_page_wide(doc, sheet, landscape=True, one_page_high=True)
    style.xy_lines_chart(sheet, "isoquant_and_cost_line", "Mixes that bake the target, and today's cost line",
                         x_range="E1:E%d" % last, y_range="F1:G%d" % last, anchor="E%d" % (last + 2),
                         size_mm=(160, 95), x_title="baker hours a day", y_title="oven hours a day")
    add_name(doc, "least_cost_plan", sheet, "$A$6:$C$15")
    doc.calculateAll()
    check_plan(doc, path, truth)
    office.store(doc, path, FLAT_ODS_FILTER)
    doc.close(True)


CAUTION_COSTS = ("Caution: a cost function is the cost of the cheapest way to produce, so fitting one assumes "
                 "every branch minimises its cost at the prices it pays, and that those prices are given to it. "
                 "Branches that waste inputs, or prices that differ from what was really paid, bias the "
                 "figures. The fitted figures are statistical estimates from a small sample, not professional "
                 "advice: check them with qualified practice before they steer costly decisions.")


def laundry_costs(office, path):
    truth = scenarios.LAUNDRIES
    rows = scenarios.laundry_rows()
    last = len(rows) + 1
    doc = office.new_calc()
    about_sheet(doc, "Lathergate Laundries: what does a load cost, and at what size is it cheapest?", [
        "What it shows: a translog cost function fitted to last year's books of the chain's %d laundries "
        "(each branch's total cost, the loads it washed and the prices it paid for an hour of labour, a "
        "machine hour and a kWh) by PRODCOSTFIT, with the cost elasticity and returns to scale; at the "
        "chain's typical (geometric mean) prices the efficient scale, where average cost is lowest "
        "(PRODEFFICIENTSCALE), the cheapest mix of inputs there (PRODLEASTCOST, by Shephard's lemma), how "
        "labour hours respond to the price of energy (PRODPRICEELASTICITY); and the average-cost curve "
        "with the efficient scale marked." % len(rows),
        "Which cells to change: the yellow data cells on the sheet Costs (B2:F%d) and the loads the curve "
        "is drawn over (P2:P31). Everything else recalculates. The fitted table is the array formula in "
        "H1:N32." % last,
        "Units: cost in thousand EUR a year, loads in thousands a year, so average cost is EUR a load; the "
        "wage and the machine hour in EUR an hour, energy in EUR a kWh.",
        "Where the data came from: invented. sample-sheets/scenarios.py draws the branches with seed %d "
        "from ln cost = %.1f + %.2f ln loads + 1/2 x %.2f (ln loads)^2 + %.1f ln wage + %.1f ln machine hour "
        "+ %.1f ln kWh + noise, noise normal with SD %.2f, so the true efficient scale is %.1f thousand "
        "loads a year at any prices." % (truth["seed"], truth["constant"], truth["output"],
                                          truth["output_squared"], *truth["shares"], truth["noise_sd"],
                                          truth["efficient_scale"]),
        CAUTION_COSTS,
        SHARING,
    ])

    sheet = new_sheet(doc, "Costs")
    set_values(sheet, "A1", [["branch", "cost", "loads", "labour", "machines", "energy"]]
               + [list(row) for row in rows])
    style.header(sheet.getCellRangeByName("A1:F1"))
    style.input_cells(sheet.getCellRangeByName("B2:F%d" % last))
    table = "$H$1:$N$32"
    set_array_formula(sheet, "H1:N32", '=PRODCOSTFIT(B1:B%d;C1:C%d;D1:F%d;"translog")' % (last, last, last))
    style.header(sheet.getCellRangeByName("H1:N1"))

    set_values(sheet, "H34", [["At typical prices", "labour", "machines", "energy"]])
    set_values(sheet, "H35", [[label] for label in ("geometric mean prices", "efficient scale (thousand loads)",
                                        "average cost there (EUR a load)",
                                        "cheapest mix there (hours, hours, kWh; thousands)",
                                        "labour hours per 1% dearer energy (%)")])
    style.header(sheet.getCellRangeByName("H34:K34"))
    for column, data in zip("IJK", "DEF"):
        set_formula(sheet, "%s35" % column, "=GEOMEAN(%s2:%s%d)" % (data, data, last))
    set_formula(sheet, "I36", "=PRODEFFICIENTSCALE(%s;I35:K35)" % table)
    set_formula(sheet, "I37", '=PRODCOST(%s;I36;I35:K35;"average")' % table)
    set_array_formula(sheet, "I38:K38", "=PRODLEASTCOST(%s;I36;I35:K35)" % table)
    set_formula(sheet, "I39", '=PRODPRICEELASTICITY(%s;I36;I35:K35;"labour";"energy")' % table)

    grid = [round(10 * 50 ** (step / 29.0), 1) for step in range(30)]  # 10 to 500 thousand loads
    set_values(sheet, "P1", [["loads (thousand)", "average cost (EUR a load)", "efficient scale"]])
    set_values(sheet, "P2", [[value] for value in grid])
    style.header(sheet.getCellRangeByName("P1:R1"))
    style.input_cells(sheet.getCellRangeByName("P2:P31"))
    set_array_formula(sheet, "Q2:Q31", '=PRODCOST(%s;P2:P31;$I$35:$K$35;"average")' % table)
    # The marker: a vertical segment at the efficient scale, from 0 to the lowest average cost.
    set_formula(sheet, "P32", "=$I$36")
    set_formula(sheet, "P33", "=$I$36")
    set_values(sheet, "R32", [[0.0]])
    set_formula(sheet, "R33", "=$I$37")

    style.number_format(doc, sheet.getCellRangeByName("B2:C%d" % last), "0.0")
    style.number_format(doc, sheet.getCellRangeByName("D2:E%d" % last), "0.00")
    style.number_format(doc, sheet.getCellRangeByName("F2:F%d" % last), "0.000")
    style.number_format(doc, sheet.getCellRangeByName("I2:N32"), "0.0000")
    style.number_format(doc, sheet.getCellRangeByName("I35:K39"), "0.00")
    style.number_format(doc, sheet.getCellRangeByName("P2:R33"), "0.00")
    style.align_right(sheet.getCellRangeByName("B1:F1"))
    style.align_right(sheet.getCellRangeByName("I1:N1"))
    style.column_widths(sheet, {"A": 24, "B": 18, "C": 18, "D": 18, "E": 18, "F": 18, "G": 6, "H": 64, "I": 24,
                                "J": 22, "K": 22, "L": 18, "M": 22, "N": 20, "O": 6, "P": 28, "Q": 40, "R": 28})
    style.xy_lines_chart(sheet, "average_cost_curve", "Average cost of a load, and the efficient scale",
                         x_range="P1:P33", y_range="Q1:R33", anchor="H42", size_mm=(170, 95),
                         x_title="loads a year (thousand)", y_title="EUR a load")
    add_name(doc, "cost_function", sheet, table)
    add_name(doc, "efficient_scale", sheet, "$H$34:$K$39")
    doc.calculateAll()
    check_costs(doc, path, truth)
    office.store(doc, path, FLAT_ODS_FILTER)
    doc.close(True)


def check_costs(doc, path, truth):
    """No formula cell shows a problem, and the fitted efficient scale lies within 3 standard errors
    of the true one."""
    refuse_formula_problems(doc, path)
    row = next(r for r in named_range(doc, "cost_function").getDataArray() if r[0] == "efficient scale")
    estimate, error = row[1], row[2]
    if abs(estimate - truth["efficient_scale"]) > 3 * error:
        raise SystemExit("%s: efficient scale %.2f is more than 3 SE (%.2f) from the true %.2f"
                         % (path, estimate, error, truth["efficient_scale"]))
    print("  efficient scale %.2f thousand loads (SE %.2f), true %.2f" % (estimate, error, truth["efficient_scale"]))


def check_plan(doc, path, truth):
    """No formula cell shows a problem, and in both scenarios the least-cost bundle bakes the target
    and spends on each input its exponent's share of the cost (the Cobb-Douglas first-order condition)."""
    refuse_formula_problems(doc, path)
    table = {row[0]: row[1:] for row in named_range(doc, "least_cost_plan").getDataArray()}
    a, b = truth["baker_exponent"], truth["oven_exponent"]
    for column in (0, 1):
        bakers, ovens = table["least cost: baker hours"][column], table["least cost: oven hours"][column]
        wage, rent = table["price of a baker hour"][column], table["price of an oven hour"][column]
        loaves = truth["scale"] * bakers ** a * ovens ** b
        if abs(loaves - truth["target"]) > 1e-6 * truth["target"] or abs(rent * ovens / (wage * bakers) - b / a) > 1e-9:
            raise SystemExit("%s: least-cost bundle %.4f, %.4f is not the cheapest way to the target" % (
                path, bakers, ovens))
        print("  least cost at %.0f/%.0f: %.2f baker hours, %.2f oven hours, %.2f a day" % (
            wage, rent, bakers, ovens, table["total cost a day"][column]))


# The growth rows round output and inputs to 0.1 (a log error of at most 0.05/180 per figure) and the
# shares to 0.001; over 19 years of input growth of a few percent the rounded shares move the TFP
# total by about 19 x 3 x 0.0005 x 0.05 < 0.0015, so 0.005 leaves room without hiding a real error.
TFP_TOTAL_TOLERANCE = 0.005


def check_growth(doc, path, true_total):
    """No formula cell shows a problem, and the total TFP growth is the drawn one up to rounding."""
    refuse_formula_problems(doc, path)
    total = named_range(doc, "growth_accounting").getDataArray()[-1]
    if abs(total[-1] - true_total) > TFP_TOTAL_TOLERANCE:
        raise SystemExit("%s: TFP growth %.4f is more than %.3f from the true %.4f"
                         % (path, total[-1], TFP_TOTAL_TOLERANCE, true_total))
    print("  TFP growth over the years %.4f, true %.4f" % (total[-1], true_total))


def refuse_formula_problems(doc, path):
    problems = formula_problems(doc)
    if problems:
        raise SystemExit("%s: formula cells show problems: %s" % (path, problems[:10]))


def check_workbook(doc, path, true_values):
    """No formula cell shows an error or a message, and each labelled estimate of the table named
    fitted_technology lies within 3 standard errors of its true value."""
    refuse_formula_problems(doc, path)
    table = named_range(doc, "fitted_technology").getDataArray()
    for label, truth in true_values.items():
        row = next(r for r in table if r[0] == label)
        estimate, error = row[1], row[2]
        if abs(estimate - truth) > 3 * error:
            raise SystemExit("%s: %s %.4f is more than 3 SE (%.4f) from the true %.3f"
                             % (path, label, estimate, error, truth))
        print("  %s %.4f (SE %.4f), true %.3f" % (label, estimate, error, truth))


WORKBOOKS = {"furniture-workshops.fods": furniture_workshops,
             "dairy-creameries.fods": dairy_creameries,
             "glassworks-growth.fods": glassworks_growth,
             "bakery-planning.fods": bakery_planning,
             "print-shop-efficiency.fods": efficiency_workbook.print_shop_efficiency,
             "laundry-costs.fods": laundry_costs}


def main():
    arguments = extension_and_output(__doc__.splitlines()[0], "folder to write the workbooks to", HERE)
    with HeadlessOffice(extension_path=arguments.extension) as office:
        for name, build in WORKBOOKS.items():
            path = os.path.join(arguments.output, name)
            print("building", path)
            build(office, path)
    return 0


if __name__ == "__main__":
    sys.exit(main())
