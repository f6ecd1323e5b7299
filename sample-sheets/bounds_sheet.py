"""The joinery workbook's sheet Labour bounds: the marginal product of labour in each workshop with its
95 % bounds (PRODFIT with its covariance block, PRODMARGINAL's `what`), drawn as columns with the
bounds as error bars."""
from isoquant_office import set_array_formula, set_formula, set_values

import workbook_style as style
from workbook_checks import named_range
from workbook_style import add_name, new_sheet

SHEET = "Labour bounds"
# 17 rows of the table, then the covariance block: a `covariance` row and one row per parameter
# (ln A, labour, capital); max(7, p + 1) = 7 columns.
TABLE_CELLS = "H1:N21"
TABLE = "$H$1:$N$21"
HEADER = ["workshop", "MP labour", "lower bound", "upper bound", "error bar down", "error bar up"]
BOUNDS_NOTE = ("Note: the bounds reflect sampling error under the model, not errors of form: if the technology is "
               "not Cobb-Douglas, or the inputs are measured with error, they can be far too narrow.")


def labour_bounds_sheet(doc, last):
    """The sheet, over the data rows 2..last of the sheet Workshops. Columns E and F hold the error
    bars' lengths, value - lower and upper - value: a chart draws error bars from lengths, not from
    the bounds themselves."""
    sheet = new_sheet(doc, SHEET)
    set_values(sheet, "A1", [HEADER])
    style.header(sheet.getCellRangeByName("A1:F1"))
    style.align_right(sheet.getCellRangeByName("B1:F1"))
    set_array_formula(sheet, TABLE_CELLS, "=PRODFIT($Workshops.B1:B%d;$Workshops.C1:D%d;;;;;;;;;;TRUE())"
                      % (last, last))
    for row in range(2, last + 1):
        inputs = "$Workshops.C%d:D%d" % (row, row)
        set_formula(sheet, "A%d" % row, "=$Workshops.A%d" % row)
        set_formula(sheet, "B%d" % row, '=PRODMARGINAL(%s;%s;"labour")' % (TABLE, inputs))
        set_formula(sheet, "C%d" % row, '=PRODMARGINAL(%s;%s;"labour";"lower bound")' % (TABLE, inputs))
        set_formula(sheet, "D%d" % row, '=PRODMARGINAL(%s;%s;"labour";"upper bound")' % (TABLE, inputs))
        set_formula(sheet, "E%d" % row, "=B%d-C%d" % (row, row))
        set_formula(sheet, "F%d" % row, "=D%d-B%d" % (row, row))
    set_values(sheet, "H23", [[BOUNDS_NOTE]])
    style.number_format(doc, sheet.getCellRangeByName("B2:F%d" % last), "0.00")
    style.number_format(doc, sheet.getCellRangeByName("I2:N17"), "0.0000")
    style.number_format(doc, sheet.getCellRangeByName("I6"), "0")
    style.number_format(doc, sheet.getCellRangeByName("J18"), "0")        # degrees of freedom
    style.number_format(doc, sheet.getCellRangeByName("K18"), "0.00")     # confidence level
    style.number_format(doc, sheet.getCellRangeByName("I19:K21"), "0.000000")
    style.header(sheet.getCellRangeByName("H1:N1"))
    style.align_right(sheet.getCellRangeByName("I1:N1"))
    style.column_widths(sheet, {"A": 28, "B": 22, "C": 26, "D": 26, "E": 30, "F": 26, "G": 6,
                                "H": 42, "I": 24, "J": 22, "K": 18, "L": 22, "M": 26, "N": 26})
    style.columns_with_error_bars_chart(
        sheet, "labour_bounds", "Marginal product of labour with 95 % bounds (EUR per hour worked)",
        categories="A1:A%d" % last, values="B1:B%d" % last, below="E2:E%d" % last, above="F2:F%d" % last,
        anchor="H25", size_mm=(250, 110))
    style.one_page_wide(doc, sheet, landscape=True, one_page_high=True)
    add_name(doc, "labour_bounds", sheet, "$A$1:$F$%d" % last)
    return sheet


def check_labour_bounds(doc, path):
    """Every workshop's bounds hold its marginal product between them, and the error bars' lengths
    are the distances to the bounds."""
    rows = named_range(doc, "labour_bounds").getDataArray()[1:]
    for name, value, lower, upper, down, up in rows:
        if not lower <= value <= upper or down != value - lower or up != upper - value:
            raise SystemExit("%s: %s: marginal product %r, bounds %r and %r, error bars %r and %r do not fit"
                             % (path, name, value, lower, upper, down, up))
    widest = max(rows, key=lambda row: row[3] / row[2])
    print("  MP labour with 95%% bounds: widest in %s, %.2f (%.2f to %.2f)" % widest[:4])
