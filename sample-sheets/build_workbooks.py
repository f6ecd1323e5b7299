#!/usr/bin/python3
"""Builds the sample workbooks from the seeded scenarios in scenarios.py.

    /usr/bin/python3 sample-sheets/build_workbooks.py --extension build/isoquant.oxt [--output DIR]

Each workbook is written as flat OpenDocument XML (.fods), readable and diffable. After building,
every formula cell must compute without an error or message, and the fitted exponents must land
within three standard errors of the true ones; the script exits non-zero otherwise.
"""
import argparse
import os
import sys

HERE = os.path.dirname(os.path.abspath(__file__))
sys.path.insert(0, os.path.join(HERE, "..", "tests", "integration"))

from office import HeadlessOffice, get_cell, set_array_formula, set_formula, set_values  # noqa: E402
from workbook_checks import formula_problems, named_range  # noqa: E402

import scenarios  # noqa: E402
import workbook_style as style  # noqa: E402

FLAT_ODS_FILTER = "OpenDocument Spreadsheet Flat XML"

CAUTION = ("Caution: the fitted figures are statistical estimates from a small sample. They depend on the "
           "quality of the data and on the Cobb-Douglas form being a fair description. They are not "
           "professional advice: check them with qualified practice before they steer costly decisions.")
SHARING = ("Sharing: a colleague without the Isoquant extension sees #NAME? in every function cell, because "
           "LibreOffice keeps no stored results for add-in functions. Send a PDF (File > Export as PDF), or "
           "save a copy and paste the results into it as values (Edit > Paste Special > Paste Only Values).")


def about_sheet(doc, title, paragraphs):
    sheet = doc.Sheets.getByIndex(0)
    sheet.Name = "About this workbook"
    set_values(sheet, "A1", [[title]] + [[None]] + [[text] for text in paragraphs])
    style.title(sheet.getCellRangeByName("A1"))
    style.wrapped_column(sheet, 0, width_mm=170)
    return sheet


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
    style.scatter_chart(sheet, "actual_vs_fitted", "Actual against fitted output (thousand EUR)",
                        x_range="E1:E%d" % last, y_range="B1:B%d" % last, anchor="I25", size_mm=(160, 90))
    doc.NamedRanges.addNewByName("fitted_technology", "$Workshops.%s" % table,
                                 sheet.getCellRangeByName("A1").CellAddress, 0)
    doc.calculateAll()
    check_workbook(doc, path, {"labour": truth["labour_exponent"], "capital": truth["capital_exponent"]})
    office.store(doc, path, FLAT_ODS_FILTER)
    doc.close(True)


def check_workbook(doc, path, true_exponents):
    problems = formula_problems(doc)
    if problems:
        raise SystemExit("%s: formula cells show problems: %s" % (path, problems[:10]))
    table = named_range(doc, "fitted_technology").getDataArray()
    for label, truth in true_exponents.items():
        row = next(r for r in table if r[0] == label)
        estimate, error = row[1], row[2]
        if abs(estimate - truth) > 3 * error:
            raise SystemExit("%s: %s exponent %.4f is more than 3 SE (%.4f) from the true %.2f"
                             % (path, label, estimate, error, truth))
        print("  %s exponent %.4f (SE %.4f), true %.2f" % (label, estimate, error, truth))


WORKBOOKS = {"furniture-workshops.fods": furniture_workshops}


def main():
    parser = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    parser.add_argument("--extension", required=True, help="path to isoquant.oxt")
    parser.add_argument("--output", default=HERE, help="folder to write the workbooks to")
    arguments = parser.parse_args()
    os.makedirs(arguments.output, exist_ok=True)
    with HeadlessOffice(extension_path=arguments.extension) as office:
        for name, build in WORKBOOKS.items():
            path = os.path.join(arguments.output, name)
            print("building", path)
            build(office, path)
    return 0


if __name__ == "__main__":
    sys.exit(main())
