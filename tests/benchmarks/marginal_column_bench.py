#!/usr/bin/python3
"""A column of 1,000,000 marginal products of capital as one PRODMARGINAL array formula against the
same number in built-in arithmetic filled down (issue 19, item 4), in one headless office.

    PYTHONPATH=addin/python:tests/benchmarks /usr/bin/python3 tests/benchmarks/marginal_column_bench.py \\
        --oxt build/isoquant.oxt [--rows 1000000] [--runs 5] [--rounds 3]

Each round times both sides (median of --runs full recalculations each) and prints their ratio;
the load average is printed before and after. Nothing is asserted.
"""

import argparse

from calc_benchmarks import EXPONENTS, LOG_SCALE, clear_formulas, fill, fill_down, invented, recalculation_seconds
from isoquant_office import HeadlessOffice


def main():
    parser = argparse.ArgumentParser(description=__doc__, formatter_class=argparse.RawDescriptionHelpFormatter)
    parser.add_argument("--oxt", required=True)
    parser.add_argument("--rows", type=int, default=1000000)
    parser.add_argument("--runs", type=int, default=5)
    parser.add_argument("--rounds", type=int, default=3)
    args = parser.parse_args()
    print("load before: %s" % open("/proc/loadavg").read().strip())
    with HeadlessOffice(extension_path=args.oxt) as office:
        doc = office.new_calc()
        doc.enableAutomaticCalculation(False)
        sheet = doc.Sheets.getByIndex(0)
        output, inputs = invented(args.rows)
        fill(sheet, output, inputs)
        last = args.rows + 1
        sheet.getCellRangeByName("P1:Q5").setDataArray(
            (("form", "cobb-douglas"), ("ln A", LOG_SCALE), ("capital", EXPONENTS[0]),
             ("labour", EXPONENTS[1]), ("materials", EXPONENTS[2])))
        for round_number in range(1, args.rounds + 1):
            sheet.getCellRangeByPosition(5, 1, 5, args.rows).setArrayFormula(
                "=PRODMARGINAL($P$1:$Q$5; B2:D%d; 1)" % last)
            array_seconds = recalculation_seconds(doc, args.runs)
            array_values = (sheet.getCellByPosition(5, 1).getValue(), sheet.getCellByPosition(5, args.rows).getValue())
            clear_formulas(sheet, last)
            fill_down(doc, sheet, "F2", "=$Q$3*EXP($Q$2)*B2^$Q$3*C2^$Q$4*D2^$Q$5/B2", args.rows)
            builtin_seconds = recalculation_seconds(doc, args.runs)
            builtin_values = (sheet.getCellByPosition(5, 1).getValue(), sheet.getCellByPosition(5, args.rows).getValue())
            clear_formulas(sheet, last)
            print("round %d: array %.3f s, built-in %.3f s, ratio %.2f; first and last rows %s / %s; load %s"
                  % (round_number, array_seconds, builtin_seconds, array_seconds / builtin_seconds, array_values,
                     builtin_values, open("/proc/loadavg").read().strip()))
        doc.close(True)
    print("load after: %s" % open("/proc/loadavg").read().strip())


if __name__ == "__main__":
    main()
