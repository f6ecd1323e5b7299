"""PRODENVELOPE in Calc: one array formula of scores (and one of peers) over n plants with 2 outputs
and 3 inputs, invented and seeded (log-uniform on [1, 100]), timed as full recalculations.

Run from the repository root with Debian's Python (the only one that imports uno):
    ISOQUANT_OXT=$PWD/build/isoquant.oxt /usr/bin/python3 tests/benchmarks/envelope_bench.py [rows …]

Each figure is the median of RUNS full recalculations (XCalculatable.calculateAll) of a document
holding only the data and the timed formula; PRODENVELOPE keeps no cache, so every one solves all
the linear programs again (n of them, 2n for "peers": the second stage). Printed, never asserted;
the load average is printed before and after.
"""

import math
import os
import random
import statistics
import sys
import time

HERE = os.path.dirname(os.path.abspath(__file__))
sys.path.insert(0, os.path.join(os.path.dirname(HERE), "integration"))

from office import start_module_office, stop_module_office  # noqa: E402

RUNS = 3
SIZES = [100, 300, 500, 1000, 2000, 5000]
FORMULAS = {
    "score, constant": '=PRODENVELOPE(A1:B{n};C1:E{n})',
    "score, variable, output": '=PRODENVELOPE(A1:B{n};C1:E{n};"variable";"output")',
    "peers, variable": '=PRODENVELOPE(A1:B{n};C1:E{n};"variable";;"peers")',
}


def write_data(sheet, rows):
    generator = random.Random(rows)
    data = tuple(tuple(math.exp(generator.uniform(0, math.log(100))) for _ in range(5)) for _ in range(rows))
    sheet.getCellRangeByPosition(0, 0, 4, rows - 1).setDataArray(data)


def timed(doc):
    start = time.perf_counter()
    doc.calculateAll()
    return time.perf_counter() - start


def main():
    sizes = [int(argument) for argument in sys.argv[1:]] or SIZES
    oxt = os.environ.get("ISOQUANT_OXT", os.path.join(os.path.dirname(os.path.dirname(HERE)), "build",
                                                       "isoquant.oxt"))
    print("load average before: %.2f %.2f %.2f" % os.getloadavg())
    office, doc = start_module_office(oxt)
    try:
        doc.enableAutomaticCalculation(False)
        sheet = doc.Sheets.getByIndex(0)
        for rows in sizes:
            write_data(sheet, rows)
            for name, formula in FORMULAS.items():
                target = sheet.getCellRangeByPosition(6, 0, 6, rows - 1)
                target.setArrayFormula(formula.format(n=rows))
                seconds = statistics.median(timed(doc) for _ in range(RUNS))
                first = sheet.getCellByPosition(6, 0)
                print("%5d rows  %-24s %.3f s  (first cell %r)" % (rows, name, seconds, first.getString()))
                target.setArrayFormula("")
            sheet.getCellRangeByPosition(0, 0, 4, rows - 1).clearContents(1 | 2 | 4 | 16)
    finally:
        stop_module_office(office)
    print("load average after: %.2f %.2f %.2f" % os.getloadavg())


if __name__ == "__main__":
    main()
