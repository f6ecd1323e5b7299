#!/usr/bin/python3
"""A column of 1,000,000 marginal products of capital as one PRODMARGINAL array formula against the
same number in built-in arithmetic filled down (issue 19, item 4), in one headless office.

    PYTHONPATH=addin/python:tests/benchmarks /usr/bin/python3 tests/benchmarks/marginal_column_bench.py \\
        --oxt build/isoquant.oxt [--rows 1000000] [--runs 5] [--rounds 3]

Each round times both sides (median of --runs full recalculations each) and prints their ratio,
with the office's minor page faults in each recalculation (fresh pages: what made the array formula
slow in about one recalculation in two, RESULTS.md). With the benchmark extension
(build/isoquant-bench.oxt) a round also times ISOQUANTFLOORCOLUMN as the same array formula: the
inputs' first column returned unchanged, the floor of any add-in whose result is a million-row
column. The load average is printed before and after. Nothing is asserted.
"""

import argparse
import statistics
import time

from calc_benchmarks import EXPONENTS, LOG_SCALE, clear_formulas, fill, fill_down, invented
from isoquant_office import HeadlessOffice
from isoquant_office.process_memory import minor_faults, office_process


def recalculations(doc, pid, runs):
    """The median seconds of `runs` full recalculations and each one's minor page faults."""
    seconds, faults = [], []
    for _ in range(runs):
        before = minor_faults(pid)
        start = time.perf_counter()
        doc.calculateAll()
        seconds.append(time.perf_counter() - start)
        faults.append(minor_faults(pid) - before)
    return statistics.median(seconds), faults


def timed_array_formula(doc, pid, sheet, rows, formula, runs):
    sheet.getCellRangeByPosition(5, 1, 5, rows).setArrayFormula(formula)
    seconds, faults = recalculations(doc, pid, runs)
    values = (sheet.getCellByPosition(5, 1).getValue(), sheet.getCellByPosition(5, rows).getValue())
    clear_formulas(sheet, rows + 1)
    return seconds, faults, values


def main():
    parser = argparse.ArgumentParser(description=__doc__, formatter_class=argparse.RawDescriptionHelpFormatter)
    parser.add_argument("--oxt", required=True)
    parser.add_argument("--rows", type=int, default=1000000)
    parser.add_argument("--runs", type=int, default=5)
    parser.add_argument("--rounds", type=int, default=3)
    args = parser.parse_args()
    print("load before: %s" % open("/proc/loadavg").read().strip())
    with HeadlessOffice(extension_path=args.oxt) as office:
        pid = office_process(office)
        has_floor = any(entry.get("Name") == "ISOQUANTFLOORCOLUMN" for entry in office.function_descriptions())
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
            array_seconds, array_faults, array_values = timed_array_formula(
                doc, pid, sheet, args.rows, "=PRODMARGINAL($P$1:$Q$5; B2:D%d; 1)" % last, args.runs)
            fill_down(doc, sheet, "F2", "=$Q$3*EXP($Q$2)*B2^$Q$3*C2^$Q$4*D2^$Q$5/B2", args.rows)
            builtin_seconds, builtin_faults = recalculations(doc, pid, args.runs)
            builtin_values = (sheet.getCellByPosition(5, 1).getValue(), sheet.getCellByPosition(5, args.rows).getValue())
            clear_formulas(sheet, last)
            print("round %d: array %.3f s, built-in %.3f s, ratio %.2f; first and last rows %s / %s; load %s"
                  % (round_number, array_seconds, builtin_seconds, array_seconds / builtin_seconds, array_values,
                     builtin_values, open("/proc/loadavg").read().strip()))
            print("    minor page faults a recalculation: array %s; built-in %s" % (array_faults, builtin_faults))
            if has_floor:
                floor_seconds, floor_faults, _ = timed_array_formula(
                    doc, pid, sheet, args.rows, "=ISOQUANTFLOORCOLUMN(B2:D%d)" % last, args.runs)
                print("    floor column %.3f s (ratio to built-in %.2f), minor page faults %s"
                      % (floor_seconds, floor_seconds / builtin_seconds, floor_faults))
        doc.close(True)
    print("load after: %s" % open("/proc/loadavg").read().strip())


if __name__ == "__main__":
    main()
