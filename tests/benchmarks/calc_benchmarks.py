"""The Calc side of run_benchmarks.py: a headless office with the benchmark extension
(isoquant-bench.oxt, which adds ISOQUANTFLOOR), invented seeded data, and every formula timed by a
full recalculation of the document (XCalculatable.calculateAll) holding only the formulas measured.
"""

import statistics
import time

import numpy
from isoquant_office import HeadlessOffice, set_values_in_blocks

# The typed model the column benchmarks evaluate (invented exponents).
LOG_SCALE, EXPONENTS = 0.6, (0.3, 0.5, 0.15)
CHUNK = 50000


def invented(rows, seed=20261202):
    generator = numpy.random.default_rng(seed)
    inputs = numpy.exp(generator.normal(2.0, 0.7, size=(rows, 3)))
    output = numpy.exp(LOG_SCALE + numpy.log(inputs) @ numpy.array(EXPONENTS) + generator.normal(0, 0.2, rows))
    return output, inputs


def fill(sheet, output, inputs):
    """Output in A2:A(n+1), inputs in B:D, a header row of text."""
    set_values_in_blocks(sheet, ["output", "capital", "labour", "materials"], numpy.column_stack([output, inputs]),
                         CHUNK)


def recalculation_seconds(doc, runs):
    seconds = []
    for _ in range(runs):
        start = time.perf_counter()
        doc.calculateAll()
        seconds.append(time.perf_counter() - start)
    return statistics.median(seconds)


def clear_formulas(sheet, last_row):
    from com.sun.star.sheet.CellFlags import FORMULA
    sheet.getCellRangeByPosition(5, 0, 30, last_row).clearContents(FORMULA)


def fill_down(doc, sheet, first_cell, formula, rows):
    """One formula in first_cell, filled down over `rows` rows with automatic calculation off."""
    doc.enableAutomaticCalculation(False)
    column = sheet.getCellRangeByName(first_cell).getCellAddress().Column
    sheet.getCellByPosition(column, 1).setFormula(formula)
    sheet.getCellRangeByPosition(column, 1, column, rows).fillAuto(0, 1)  # 0 = TO_BOTTOM


def run(args, report, target):
    print("== In Calc (headless LibreOffice, full recalculation timed) ==")
    with HeadlessOffice(extension_path=args.oxt) as office:
        for rows in args.sizes:
            doc = office.new_calc()
            doc.enableAutomaticCalculation(False)
            sheet = doc.Sheets.getByIndex(0)
            output, inputs = invented(rows)
            fill(sheet, output, inputs)
            last = rows + 1
            ranges = "A1:A%d; B1:D%d" % (last, last)
            print(" %d rows x 3 inputs" % rows)

            # 1. The fit: PRODFIT, the built-in route (LN helper columns + LINEST), the floor.
            sheet.getCellRangeByName("G1:M20").setArrayFormula("=PRODFIT(%s)" % ranges)
            fit_seconds = recalculation_seconds(doc, args.runs)
            check = sheet.getCellRangeByName("G1:M20").getDataArray()
            clear_formulas(sheet, last)
            sheet.getCellRangeByName("G1").setFormula("=ISOQUANTFLOOR(%s)" % ranges)
            floor_seconds = recalculation_seconds(doc, args.runs)
            floor_value = sheet.getCellRangeByName("G1").getValue()
            clear_formulas(sheet, last)
            for column, source in zip("FGHI", "ABCD"):
                fill_down(doc, sheet, "%s2" % column, "=LN(%s2)" % source, last)
            sheet.getCellRangeByName("K1:N5").setArrayFormula("=LINEST(F2:F%d; G2:I%d; 1; 1)" % (last, last))
            builtin_seconds = recalculation_seconds(doc, args.runs)
            linest = sheet.getCellRangeByName("K1:N1").getDataArray()[0]
            clear_formulas(sheet, last)
            print("  PRODFIT first rows: %s" % (check[:3],))
            print("  LINEST slopes (reversed order): %s; floor returned %g" % (linest, floor_value))
            report("PRODFIT (array formula)", fit_seconds, floor_seconds, "ISOQUANTFLOOR (do nothing)")
            report("PRODFIT (array formula)", fit_seconds, builtin_seconds, "LN columns + LINEST")
            if rows == max(args.sizes):
                target("fit in Calc <= 1.5x the do-nothing floor (%d rows): %.2fx" % (rows, fit_seconds / floor_seconds),
                       fit_seconds / floor_seconds <= 1.5)
                target("fit in Calc <= 0.5x LN columns + LINEST (%d rows): %.2fx" % (rows, fit_seconds / builtin_seconds),
                       fit_seconds / builtin_seconds <= 0.5)

            # 3. A column of marginal products of capital from a typed model in P1:Q5.
            sheet.getCellRangeByName("P1:Q5").setDataArray(
                (("form", "cobb-douglas"), ("ln A", LOG_SCALE), ("capital", EXPONENTS[0]),
                 ("labour", EXPONENTS[1]), ("materials", EXPONENTS[2])))
            sheet.getCellRangeByPosition(5, 1, 5, rows).setArrayFormula(
                "=PRODMARGINAL($P$1:$Q$5; B2:D%d; 1)" % last)
            array_seconds = recalculation_seconds(doc, args.runs)
            array_value = sheet.getCellByPosition(5, 1).getValue()
            clear_formulas(sheet, last)
            fill_down(doc, sheet, "F2", "=PRODMARGINAL($P$1:$Q$5; B2:D2; 1)", rows)
            single_seconds = recalculation_seconds(doc, args.runs)
            single_value = sheet.getCellByPosition(5, 1).getValue()
            clear_formulas(sheet, last)
            # The same number in built-in arithmetic: ∂Y/∂K = b_K·A·K^b_K·L^b_L·M^b_M / K.
            fill_down(doc, sheet, "F2", "=$Q$3*EXP($Q$2)*B2^$Q$3*C2^$Q$4*D2^$Q$5/B2", rows)
            builtin_column_seconds = recalculation_seconds(doc, args.runs)
            builtin_value = sheet.getCellByPosition(5, 1).getValue()
            clear_formulas(sheet, last)
            print("  marginal product, row 2: array %.9g, single cells %.9g, built-in %.9g"
                  % (array_value, single_value, builtin_value))
            report("marginal products, one array formula", array_seconds, builtin_column_seconds, "built-in column")
            report("marginal products, single-cell formulas", single_seconds, builtin_column_seconds, "built-in column")
            if rows == max(args.sizes):
                ratio = array_seconds / builtin_column_seconds
                target("MP column as one array formula <= 1x built-in (%d rows): %.2fx" % (rows, ratio), ratio <= 1)
                ratio = single_seconds / builtin_column_seconds
                target("MP column as single cells <= 4.5x built-in (%d rows): %.2fx" % (rows, ratio), ratio <= 4.5)
            doc.close(True)
