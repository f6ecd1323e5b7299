#!/usr/bin/python3
"""The main job on the bundled sample data: open each sample workbook in a headless Calc with the
extension installed, recalculate, print what the fit says, and export the workbook to PDF.

    PYTHONPATH=addin/python /usr/bin/python3 sample-sheets/demo.py --extension build/isoquant.oxt --output build/demo

(from the repository root; `cmake --build build --target demo` runs it, README command 1)
"""
import glob
import os
import sys

from isoquant_office import HeadlessOffice, extension_and_output, recalc

from workbook_checks import formula_problems, named_range  # this folder: on the path as the script's own

HERE = os.path.dirname(os.path.abspath(__file__))


def show(value):
    if isinstance(value, float) and value.is_integer() and abs(value) < 1e9:
        return "%d" % value
    if isinstance(value, float) and abs(value) < 1e5:
        text = "%.4f" % value
        return text[1:] if text == "-0.0000" else text  # a rounding residue of 0, e.g. a scale effect
    if isinstance(value, float):
        return "%.4g" % value
    return str(value)


def print_table(rows):
    widths = [max(len(show(row[c])) for row in rows) for c in range(len(rows[0]))]
    for row in rows:
        print("  " + "  ".join(show(value).rjust(widths[c]) if c else show(value).ljust(widths[c])
                               for c, value in enumerate(row)).rstrip())


def summarise_fit(doc, name):
    table = [list(row) for row in named_range(doc, "fitted_technology").getDataArray()]
    print("\n%s: fitted technology" % name)
    print_table(table)
    by_label = {row[0]: row for row in table}
    returns = by_label["returns to scale"]
    print("  -> returns to scale %.3f (SE %.3f; p-value of the test that it equals 1: %.3f): %s" % (
        returns[1], returns[2], returns[4], by_label["verdict"][1]))
    if "technical change per period" in by_label:
        trend = by_label["technical change per period"]
        print("  -> technical change %.4f a period (SE %.4f): about %.1f%% more output a period from the same "
              "inputs" % (trend[1], trend[2], 100 * trend[1]))


def summarise_comparison(doc, name):
    table = [list(row) for row in named_range(doc, "form_comparison").getDataArray()]
    print("\n%s: Cobb-Douglas, CES and translog compared" % name)
    print_table([row for row in table if any(value != "" for value in row)])


def summarise_growth(doc, name):
    table = [list(row) for row in named_range(doc, "growth_accounting").getDataArray()]
    header, total = table[0], table[-1]
    years = len(table) - 2
    print("\n%s: growth accounting over %d years (log points; 0.05 is about 5%%)" % (name, years))
    print_table([header, total])
    print("  -> output grew %.1f%% a year; TFP growth %.2f%% a year, %.0f%% of output growth" % (
        100 * total[1] / years, 100 * total[-1] / years, 100 * total[-1] / total[1]))


def summarise_plan(doc, name):
    table = {row[0]: row[1:] for row in named_range(doc, "least_cost_plan").getDataArray()}
    print("\n%s: least-cost bundle" % name)
    for column, scenario in enumerate(table["scenario"]):
        print("  -> %s: %s loaves a day cost least with %.2f baker hours and %.2f oven hours, %.2f a day" % (
            scenario, show(table["target (loaves a day)"][column]), table["least cost: baker hours"][column],
            table["least cost: oven hours"][column], table["total cost a day"][column]))


def summarise_efficiency(doc, name):
    table = {row[0]: row[1] for row in named_range(doc, "efficiency_frontier").getDataArray()}
    sheet = named_range(doc, "efficiency_frontier").Spreadsheet
    rows = [row for row in sheet.getCellRangeByName("A2:F200").getDataArray() if row[0]]
    print("\n%s: distance from best practice" % name)
    print("  -> stochastic frontier: mean efficiency %.3f, inefficiency SD %.3f, noise SD %.3f (%s)" % (
        table["mean efficiency"], table["inefficiency SD"], table["noise SD"], table["convergence"]))
    for label, column in (("frontier efficiency", 4), ("envelope score", 5)):
        lowest = sorted(rows, key=lambda row: row[column])[:3]
        print("  -> lowest %s: %s" % (label, ", ".join("%s %.3f" % (row[0], row[column]) for row in lowest)))


def summarise_costs(doc, name):
    table = {row[0]: row[1:] for row in named_range(doc, "cost_function").getDataArray()}
    scale = {row[0]: row[1] for row in named_range(doc, "efficient_scale").getDataArray()}
    print("\n%s: cost function from the books" % name)
    print("  -> cost elasticity %.3f (SE %.3f), returns to scale %.3f: %s" % (
        table["cost elasticity"][0], table["cost elasticity"][1], table["returns to scale"][0],
        table["verdict"][0]))
    print("  -> efficient scale %s thousand loads at typical prices, where a load costs %s EUR" % (
        show(scale["efficient scale (thousand loads)"]), show(scale["average cost there (EUR a load)"])))


# One summary per named table a workbook carries.
SUMMARIES = {"fitted_technology": summarise_fit, "form_comparison": summarise_comparison,
             "growth_accounting": summarise_growth, "least_cost_plan": summarise_plan,
             "efficiency_frontier": summarise_efficiency, "cost_function": summarise_costs}


def summarise(doc, name):
    for table_name, summary in SUMMARIES.items():
        if doc.NamedRanges.hasByName(table_name):
            summary(doc, name)


def main():
    arguments = extension_and_output(__doc__.splitlines()[0], "folder for the PDF exports")
    workbooks = sorted(glob.glob(os.path.join(HERE, "*.fods")))
    failures = 0
    with HeadlessOffice(extension_path=arguments.extension) as office:
        for path in workbooks:
            name = os.path.basename(path)
            doc = office.open(path)
            recalc(doc)
            problems = formula_problems(doc)
            if problems:
                failures += 1
                print("%s: %d formula cells show problems, first: %s" % (name, len(problems), problems[:5]))
            summarise(doc, name)
            pdf = os.path.join(arguments.output, os.path.splitext(name)[0] + ".pdf")
            office.export_pdf(doc, pdf)
            print("  PDF: %s" % os.path.abspath(pdf))
            doc.close(True)
    print("\nThese figures are statistical estimates (here from invented data), not professional advice;")
    print("see the caution in README.md before such figures steer a costly decision.")
    print("\nTo use these workbooks yourself: in LibreOffice Calc choose Tools > Extension Manager > Add,")
    print("pick %s, restart LibreOffice, then open the .fods files in %s." % (
        os.path.abspath(arguments.extension), HERE))
    return 1 if failures else 0


if __name__ == "__main__":
    sys.exit(main())
