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

import bounds_sheet
import cost_workbook
import efficiency_workbook
import panel_workbook
import scenarios  # this folder's modules: on the path as the script's own
import workbook_style as style
from workbook_about import SHARING, about_sheet
from workbook_checks import check_workbook, named_range, refuse_formula_problems
from workbook_style import add_name, new_sheet

HERE = os.path.dirname(os.path.abspath(__file__))

FLAT_ODS_FILTER = "OpenDocument Spreadsheet Flat XML"

CAUTION = ("Caution: the fitted figures are statistical estimates from a small sample. They depend on the "
           "quality of the data and on the Cobb-Douglas form being a fair description. They are not "
           "professional advice: check them with qualified practice before they steer costly decisions.")
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
        "add). The sheet Labour bounds gives each workshop's marginal product of labour with its 95 %% bounds "
        "(PRODFIT with its covariance block, then PRODMARGINAL's lower and upper bound) and draws them as "
        "columns with the bounds as error bars." % len(rows),
        "Which cells to change: the yellow data cells on the sheet Workshops (B2:D%d). Everything else "
        "recalculates. The fitted table is the array formula in I1:O17 (on the sheet Labour bounds, with "
        "its covariance block, in %s)." % (last, bounds_sheet.TABLE_CELLS),
        "Units: output and capital in thousand EUR a year, labour in thousand hours worked.",
        "Where the data came from: invented. sample-sheets/scenarios.py draws the workshops with seed %d "
        "from output = %.1f x labour^%.2f x capital^%.2f x exp(noise), noise normal with SD %.2f, so the true "
        "returns to scale are %.2f." % (truth["seed"], truth["scale"], truth["labour_exponent"],
                                         truth["capital_exponent"], truth["noise_sd"],
                                         truth["labour_exponent"] + truth["capital_exponent"]),
        CAUTION,
        bounds_sheet.BOUNDS_NOTE,
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
    bounds_sheet.labour_bounds_sheet(doc, last)
    doc.calculateAll()
    check_workbook(doc, path, {"labour": truth["labour_exponent"], "capital": truth["capital_exponent"]})
    bounds_sheet.check_labour_bounds(doc, path)
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


WORKBOOKS = {"furniture-workshops.fods": furniture_workshops,
             "dairy-creameries.fods": panel_workbook.dairy_creameries,
             "glassworks-growth.fods": glassworks_growth,
             "bakery-planning.fods": bakery_planning,
             "print-shop-efficiency.fods": efficiency_workbook.print_shop_efficiency,
             "laundry-costs.fods": cost_workbook.laundry_costs}


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
