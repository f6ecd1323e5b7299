"""The laundry workbook: a translog cost function fitted from the books of a chain of laundries, its
efficient scale, the cheapest mix there, a price elasticity and the average-cost curve (invented data
from the seeded scenario in scenarios.py)."""
from isoquant_office import set_array_formula, set_formula, set_values

import scenarios
import workbook_style as style
from workbook_about import SHARING, about_sheet
from workbook_checks import named_range, refuse_formula_problems
from workbook_style import add_name, new_sheet

FLAT_ODS_FILTER = "OpenDocument Spreadsheet Flat XML"


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
