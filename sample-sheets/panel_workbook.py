"""The creameries workbook: a panel of eight creameries over six years, fixed effects and a trend with
cluster-robust errors, the three forms compared and the translog's regularity (invented data from
the seeded scenario in scenarios.py)."""
from isoquant_office import set_array_formula, set_formula, set_values

import scenarios
import workbook_style as style
from workbook_about import SHARING, about_sheet
from workbook_checks import check_workbook
from workbook_style import add_name, new_sheet

FLAT_ODS_FILTER = "OpenDocument Spreadsheet Flat XML"

CAUTION_FORMS = ("Caution: the fitted figures are statistical estimates from a small panel. They depend on the "
                 "quality of the data and on the form fitted; a better AIC says which form fits these rows, "
                 "not that it holds elsewhere. They are not professional advice: check them with qualified "
                 "practice before they steer costly decisions.")


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
