"""Whole columns against the exact range in Calc: =PRODSTAT(A:A;B:D;"labour") and
=PRODSTAT(A1:A41;B1:D41;"labour") on 40 rows of invented seeded data (calc_benchmarks.invented).

Run from the repository root with Debian's Python (the only one that imports uno), the package
isoquant_office (addin/python) on the path, with the benchmark extension (target oxt_bench), which
adds the do-nothing ISOQUANTFLOOR(output; inputs):
    cmake --build build --target oxt_bench
    PYTHONPATH=addin/python ISOQUANT_OXT=$PWD/build/isoquant-bench.oxt /usr/bin/python3 tests/benchmarks/whole_column_bench.py
ISOQUANTFLOOR over the whole columns times Calc's own part: building the argument arrays.

Two figures per range, medians of RUNS:
- first: a full recalculation (XCalculatable.calculateAll) right after new data were written, so the
  fit is computed (the fit cache holds nothing equal);
- again: a full recalculation of unchanged data, as every later recalculation of the sheet: the
  arguments are converted and compared with the cached fit's.
Only the timed formula is in the document. The machine's load average is printed before and after.
"""

import os
import statistics
import time

from calc_benchmarks import fill, invented  # this folder: on the path as the script's own
from isoquant_office import CalcSession

HERE = os.path.dirname(os.path.abspath(__file__))

ROWS, RUNS = 40, 5
FORMULAS = {
    "exact range": '=PRODSTAT(A1:A41;B1:D41;"labour")',
    "whole columns": '=PRODSTAT(A:A;B:D;"labour")',
    "floor, exact": "=ISOQUANTFLOOR(A1:A41;B1:D41)",
    "floor, whole": "=ISOQUANTFLOOR(A:A;B:D)",
}


def timed(doc):
    start = time.perf_counter()
    doc.calculateAll()
    return time.perf_counter() - start


def main():
    oxt = os.environ.get("ISOQUANT_OXT", os.path.join(os.path.dirname(os.path.dirname(HERE)), "build",
                                                       "isoquant-bench.oxt"))
    print("load average before: %.2f %.2f %.2f" % os.getloadavg())
    session = CalcSession(oxt)
    session.start()
    try:
        doc, sheet = session.doc, session.sheet
        doc.enableAutomaticCalculation(False)
        seed = 1
        for name, formula in FORMULAS.items():
            sheet.getCellRangeByName("F1").setFormula(formula)
            first, again = [], []
            for _ in range(RUNS):
                seed += 1  # new data: no fit in the cache is equal
                fill(sheet, *invented(ROWS, seed))
                first.append(timed(doc))
                again.append(timed(doc))
            value = sheet.getCellRangeByName("F1").getValue()
            print("%-14s first %.4f s  again %.4f s  (value %.6f)" %
                  (name, statistics.median(first), statistics.median(again), value))
            sheet.getCellRangeByName("F1").setFormula("")
    finally:
        session.stop()
    print("load average after: %.2f %.2f %.2f" % os.getloadavg())


if __name__ == "__main__":
    main()
