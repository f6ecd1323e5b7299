"""The print-shop workbook: how far each shop is from best practice, by a stochastic frontier and by
data envelopment, side by side (invented data from a seeded generator with a documented truth)."""
import math
import random

from isoquant_office import set_array_formula, set_values

import workbook_style as style
from workbook_about import SHARING, about_sheet
from workbook_checks import named_range, refuse_formula_problems

FLAT_ODS_FILTER = "OpenDocument Spreadsheet Flat XML"

# Fernbrook Print: 60 print shops, one year.
#   output      = pages printed, thousand pages
#   staff hours = hours worked, hundred hours
#   press hours = hours the presses ran, hundred hours
# True frontier: ln output = ln A + b_staff ln staff + b_press ln press + v - u, v ~ Normal(0, NOISE_SD),
# u ~ |Normal(0, INEFFICIENCY_SD)| (half-normal), drawn with random.Random(SEED).
PRINT_SHOPS = dict(
    seed=20261203,
    count=60,
    scale=9.0,
    staff_exponent=0.60,
    press_exponent=0.35,
    noise_sd=0.06,
    inefficiency_sd=0.30,
)
# Half-normal u with scale s: E[exp(-u)] = 2 exp(s^2/2) (1 - Phi(s)).
TRUE_MEAN_EFFICIENCY = 2 * math.exp(PRINT_SHOPS["inefficiency_sd"] ** 2 / 2) * (
    1 - 0.5 * (1 + math.erf(PRINT_SHOPS["inefficiency_sd"] / math.sqrt(2))))
# The frontier's mean efficiency on 60 shops lands near the truth; 0.08 leaves room for sampling
# error of a 60-row fit (common practice, no source) without hiding a broken fit.
MEAN_EFFICIENCY_TOLERANCE = 0.08


def print_shop_rows(seed=PRINT_SHOPS["seed"], count=PRINT_SHOPS["count"]):
    """Rows of (name, output, staff hours, press hours), rounded as a bookkeeper would keep them."""
    truth = PRINT_SHOPS
    draw = random.Random(seed)
    rows = []
    for number in range(1, count + 1):
        staff = round(math.exp(draw.uniform(math.log(20.0), math.log(160.0))), 1)
        press = round(staff * math.exp(draw.gauss(math.log(0.6), 0.3)), 1)
        noise = draw.gauss(0.0, truth["noise_sd"])
        inefficiency = abs(draw.gauss(0.0, truth["inefficiency_sd"]))
        output = (truth["scale"] * staff ** truth["staff_exponent"] * press ** truth["press_exponent"]
                  * math.exp(noise - inefficiency))
        rows.append(("Shop %02d" % number, round(output, 1), staff, press))
    return rows


def print_shop_efficiency(office, path):
    truth = PRINT_SHOPS
    rows = print_shop_rows()
    last = len(rows) + 1
    doc = office.new_calc()
    about_sheet(doc, "Fernbrook Print: how far is each shop from best practice?", [
        "What it shows: for each of the company's %d print shops, how much of the output its staff and "
        "press hours could give it actually reaches, measured two ways side by side. Column E is the "
        "stochastic frontier's technical efficiency (PRODFRONTIER, then PRODEFFICIENCY): the frontier is "
        "fitted by maximum likelihood and separates inefficiency from noise. Column F is the data "
        "envelopment score (PRODENVELOPE, variable returns, input orientation): the share of its inputs a "
        "shop would need if it worked like the best mix of the other shops. The chart sets one against "
        "the other." % len(rows),
        "Which cells to change: the yellow data cells on the sheet Shops (B2:D%d). Everything else "
        "recalculates. The frontier table is the array formula in H1:N18." % last,
        "Units: output in thousand pages a year, staff and press hours in hundred hours.",
        "Where the data came from: invented. sample-sheets/efficiency_workbook.py draws the shops with seed "
        "%d from ln output = ln %.1f + %.2f ln staff + %.2f ln press + noise - inefficiency, noise normal "
        "with SD %.2f, inefficiency half-normal with scale %.2f, so the true mean efficiency is %.3f."
        % (truth["seed"], truth["scale"], truth["staff_exponent"], truth["press_exponent"], truth["noise_sd"],
           truth["inefficiency_sd"], TRUE_MEAN_EFFICIENCY),
        "Caution: both are estimates. The frontier's efficiencies depend on the distribution assumed for "
        "inefficiency (half-normal here); an envelope score is relative to the shops in the range, and few "
        "shops or many inputs push scores up. Neither says why a shop lags: read a low score as a question "
        "to look into. They are not professional advice: check them with qualified practice before they "
        "steer costly decisions.",
        SHARING,
    ])

    doc.Sheets.insertNewByName("Shops", 1)
    sheet = doc.Sheets.getByName("Shops")
    set_values(sheet, "A1", [["shop", "output", "staff hours", "press hours"]] + [list(row) for row in rows])
    style.header(sheet.getCellRangeByName("A1:F1"))
    style.input_cells(sheet.getCellRangeByName("B2:D%d" % last))

    table = "$H$1:$N$18"
    set_array_formula(sheet, "H1:N18", "=PRODFRONTIER(B1:B%d;C1:D%d)" % (last, last))
    style.header(sheet.getCellRangeByName("H1:N1"))
    set_array_formula(sheet, "E1:E%d" % last, "=PRODEFFICIENCY(%s;B1:B%d;C1:D%d)" % (table, last, last))
    set_array_formula(sheet, "F1:F%d" % last, '=PRODENVELOPE(B1:B%d;C1:D%d;"variable")' % (last, last))

    style.number_format(doc, sheet.getCellRangeByName("B2:D%d" % last), "0.0")
    style.number_format(doc, sheet.getCellRangeByName("E2:F%d" % last), "0.000")
    style.number_format(doc, sheet.getCellRangeByName("I2:N18"), "0.0000")
    style.align_right(sheet.getCellRangeByName("B1:F1"))
    style.align_right(sheet.getCellRangeByName("I1:N1"))
    style.column_widths(sheet, {"A": 22, "B": 18, "C": 22, "D": 22, "E": 22, "F": 22, "G": 6,
                                "H": 42, "I": 24, "J": 22, "K": 18, "L": 22, "M": 20, "N": 20})
    style.scatter_chart(sheet, "frontier_vs_envelope", "Efficiency of each shop: frontier (x) and envelope (y)",
                        actual_range="E1:E%d" % last, fitted_range="F1:F%d" % last, anchor="H21",
                        size_mm=(160, 100))
    chart = sheet.Charts.getByName("frontier_vs_envelope").EmbeddedObject
    chart.Diagram.XAxisTitle.String = "stochastic frontier efficiency"
    chart.Diagram.YAxisTitle.String = "data envelopment score"
    doc.NamedRanges.addNewByName("efficiency_frontier", "$Shops.%s" % table, sheet.getCellRangeByName("A1").CellAddress, 0)
    doc.calculateAll()
    check_efficiency(doc, path)
    office.store(doc, path, FLAT_ODS_FILTER)
    doc.close(True)


def check_efficiency(doc, path):
    """No formula cell shows a problem, the frontier converged, and its mean efficiency lies near the truth."""
    refuse_formula_problems(doc, path)
    table = {row[0]: row[1] for row in named_range(doc, "efficiency_frontier").getDataArray()}
    if table["convergence"] != "converged":
        raise SystemExit("%s: the frontier did not converge (%s)" % (path, table["convergence"]))
    mean = table["mean efficiency"]
    if abs(mean - TRUE_MEAN_EFFICIENCY) > MEAN_EFFICIENCY_TOLERANCE:
        raise SystemExit("%s: mean efficiency %.4f is more than %.2f from the true %.4f"
                         % (path, mean, MEAN_EFFICIENCY_TOLERANCE, TRUE_MEAN_EFFICIENCY))
    print("  mean efficiency %.4f, true %.4f" % (mean, TRUE_MEAN_EFFICIENCY))
