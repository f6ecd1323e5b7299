#!/usr/bin/python3
"""A column of 1,000,000 marginal products of capital as one PRODMARGINAL array formula against the
same number in built-in arithmetic filled down (issue 19, item 4), in one headless office.

    PYTHONPATH=addin/python:tests/benchmarks /usr/bin/python3 tests/benchmarks/marginal_column_bench.py \\
        --oxt build/isoquant.oxt [--rows 1000000] [--runs 5] [--rounds 3]

Each round times both sides (median of --runs full recalculations each) and prints their ratio,
with the office's minor page faults in each recalculation (fresh pages: what made the array formula
slow in about one recalculation in two, RESULTS.md). With the benchmark extension
(build/isoquant-bench.oxt) a round also times two do-nothing functions as the same array formula:
ISOQUANTFLOORCOLUMN returns the inputs' first column with the least work a function that takes its
ranges as cells can do (each cell's type tested, so text and empty cells are told from numbers);
ISOQUANTFLOORNUMBERS does the same with the ranges taken as numbers, which the office fills with 0
for text and empty cells. Each round starts one side later than the round before. The load average
is printed before and after. Nothing is asserted.
"""

import argparse
import statistics
import time

from calc_benchmarks import EXPONENTS, LOG_SCALE, clear_formulas, fill, fill_down, invented
from isoquant_office import HeadlessOffice
from isoquant_office.process_memory import minor_faults, office_process


def recalculations(doc, pid, runs):
    """The median seconds of `runs` full recalculations, and each one's seconds and minor page faults."""
    seconds, faults = [], []
    for _ in range(runs):
        before = minor_faults(pid)
        start = time.perf_counter()
        doc.calculateAll()
        seconds.append(time.perf_counter() - start)
        faults.append(minor_faults(pid) - before)
    return statistics.median(seconds), ["%.2f s (%d)" % pair for pair in zip(seconds, faults)]


def timed_and_cleared(doc, pid, sheet, rows, runs):
    """Times the formulas now in column F, reads its first and last rows, and clears them."""
    seconds, faults = recalculations(doc, pid, runs)
    values = (sheet.getCellByPosition(5, 1).getValue(), sheet.getCellByPosition(5, rows).getValue())
    clear_formulas(sheet, rows + 1)
    return seconds, faults, values


def timed_array_formula(doc, pid, sheet, rows, formula, runs):
    sheet.getCellRangeByPosition(5, 1, 5, rows).setArrayFormula(formula)
    return timed_and_cleared(doc, pid, sheet, rows, runs)


def timed_filled_column(doc, pid, sheet, rows, runs):
    fill_down(doc, sheet, "F2", "=$Q$3*EXP($Q$2)*B2^$Q$3*C2^$Q$4*D2^$Q$5/B2", rows)
    return timed_and_cleared(doc, pid, sheet, rows, runs)


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
        names = {entry.get("Name") for entry in office.function_descriptions()}
        doc = office.new_calc()
        doc.enableAutomaticCalculation(False)
        sheet = doc.Sheets.getByIndex(0)
        output, inputs = invented(args.rows)
        fill(sheet, output, inputs)
        last = args.rows + 1
        sheet.getCellRangeByName("P1:Q5").setDataArray(
            (("form", "cobb-douglas"), ("ln A", LOG_SCALE), ("capital", EXPONENTS[0]),
             ("labour", EXPONENTS[1]), ("materials", EXPONENTS[2])))
        sides = [("array", lambda: timed_array_formula(
                      doc, pid, sheet, args.rows, "=PRODMARGINAL($P$1:$Q$5; B2:D%d; 1)" % last, args.runs)),
                 ("built-in", lambda: timed_filled_column(doc, pid, sheet, args.rows, args.runs))]
        if "ISOQUANTFLOORCOLUMN" in names:
            sides.append(("floor column", lambda: timed_array_formula(
                doc, pid, sheet, args.rows, "=ISOQUANTFLOORCOLUMN(B2:D%d)" % last, args.runs)))
        if "ISOQUANTFLOORNUMBERS" in names:
            sides.append(("floor column of numbers", lambda: timed_array_formula(
                doc, pid, sheet, args.rows, "=ISOQUANTFLOORNUMBERS(B2:D%d)" % last, args.runs)))
        for round_number in range(1, args.rounds + 1):
            # Each round starts one side later, so that no side always follows the same one (the
            # office's memory grows with each million-row formula set and cleared, RESULTS.md).
            shift = (round_number - 1) % len(sides)
            order = sides[shift:] + sides[:shift]
            measured = {name: measure() for name, measure in order}
            builtin_seconds = measured["built-in"][0]
            print("round %d (order %s); load %s" % (round_number, ", ".join(name for name, _ in order),
                                                   open("/proc/loadavg").read().strip()))
            for name, _ in sides:
                seconds, faults, values = measured[name]
                print("    %-24s %.3f s, ratio to built-in %.2f; first and last rows %s;\n        each (minor page faults): %s"
                      % (name, seconds, seconds / builtin_seconds, values, ", ".join(faults)))
        doc.close(True)
    print("load after: %s" % open("/proc/loadavg").read().strip())


if __name__ == "__main__":
    main()
