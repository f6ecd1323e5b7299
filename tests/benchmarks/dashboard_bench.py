"""A dashboard of 200 figures of one fit over 50,000 rows × 3 inputs, two ways (issue 19, item 3):
200 PRODSTAT cells, each over the data, against one PRODFIT table plus 200 PRODVALUE cells reading it.
Timed: the recalculation after a data edit (one output cell changed, automatic calculation off,
XCalculatable.calculate(): every dirty formula), medians of RUNS. Printed, never asserted.

Run from the repository root with Debian's Python (the only one that imports uno), the package
isoquant_office (addin/python) on the path:
    PYTHONPATH=addin/python ISOQUANT_OXT=$PWD/build/isoquant.oxt /usr/bin/python3 tests/benchmarks/dashboard_bench.py
Invented seeded data (calc_benchmarks.invented). The machine's load average is printed before and after.
"""

import itertools
import os
import statistics
import time

from calc_benchmarks import fill, invented  # this folder: on the path as the script's own
from isoquant_office import CalcSession

HERE = os.path.dirname(os.path.abspath(__file__))

ROWS, CELLS, RUNS = 50000, 200, 5
ROW_LABELS = ["ln A", "capital", "labour", "materials", "observations", "R2", "adjusted R2", "residual SD", "F",
              "log-likelihood", "AIC", "BIC", "returns to scale"]
COLUMN_LABELS = ["value", "std. error", "t", "p-value", "lower bound", "upper bound"]
LAST = ROWS + 1


def figures():
    """CELLS (row label, column label) pairs of the table, different ones first."""
    return list(itertools.islice(itertools.cycle(itertools.product(ROW_LABELS, COLUMN_LABELS)), CELLS))


def edit_and_recalculate(doc, sheet, value):
    sheet.getCellRangeByName("A2").setValue(value)
    start = time.perf_counter()
    doc.calculate()
    return time.perf_counter() - start


def timed(session, formulas):
    doc, sheet = session.doc, session.sheet
    for row, formula in enumerate(formulas):
        sheet.getCellByPosition(12, row).setFormula(formula)
    doc.calculateAll()
    seconds = [edit_and_recalculate(doc, sheet, 5.0 + run) for run in range(RUNS)]
    sheet.getCellRangeByPosition(12, 0, 12, len(formulas) - 1).clearContents(31)
    return statistics.median(seconds)


def main():
    oxt = os.environ.get("ISOQUANT_OXT", os.path.join(os.path.dirname(os.path.dirname(HERE)), "build", "isoquant.oxt"))
    print("load average before: %.2f %.2f %.2f" % os.getloadavg())
    session = CalcSession(oxt)
    session.start()
    try:
        session.doc.enableAutomaticCalculation(False)
        fill(session.sheet, *invented(ROWS))
        stat = ['=PRODSTAT($A$1:$A$%d;$B$1:$D$%d;"%s";"%s")' % (LAST, LAST, row, column) for row, column in figures()]
        seconds_stat = timed(session, stat)
        session.sheet.getCellRangeByName("F1:L18").setArrayFormula("=PRODFIT($A$1:$A$%d;$B$1:$D$%d)" % (LAST, LAST))
        value = ['=PRODVALUE($F$1:$L$18;"%s";"%s")' % (row, column) for row, column in figures()]
        seconds_value = timed(session, value)
    finally:
        session.stop()
    print("%d rows x 3 inputs, %d figures, recalculation after a data edit (median of %d):" % (ROWS, CELLS, RUNS))
    print("  %d PRODSTAT cells:              %.3f s" % (CELLS, seconds_stat))
    print("  PRODFIT table + %d PRODVALUE:   %.3f s  (%.3f of the PRODSTAT dashboard)" %
          (CELLS, seconds_value, seconds_value / seconds_stat))
    print("load average after: %.2f %.2f %.2f" % os.getloadavg())


if __name__ == "__main__":
    main()
