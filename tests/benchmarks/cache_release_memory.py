"""What the office holds after a workbook with large fits closes (tests/benchmarks/RESULTS.md, "Memory and
time bounds"): the resident memory of soffice.bin, from /proc, before the workbook opens, with its
fits calculated, and after it closed. Printed, never asserted.

    PYTHONPATH=addin/python /usr/bin/python3 tests/benchmarks/cache_release_memory.py --extension build/isoquant.oxt

Invented seeded data (a demo scenario: a million delivery routes, fuel and driver hours), six
PRODFIT tables over the same 1,000,000 × 3 cells with six confidence levels: six distinct cache entries.
"""
import argparse
import os
import time

import numpy
from isoquant_office import HeadlessOffice, set_array_formula, set_values_in_blocks
from isoquant_office.process_memory import memory_mb, office_process

ROWS = 1000000
LEVELS = (0.80, 0.85, 0.90, 0.95, 0.98, 0.99)


def settled_resident_mb(pid, seconds=3.0):
    time.sleep(seconds)  # let the office finish what the close started
    return memory_mb(pid, "VmRSS")


def main():
    parser = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    parser.add_argument("--extension", required=True)
    extension = parser.parse_args().extension
    generator = numpy.random.default_rng(20261202)
    inputs = numpy.exp(generator.normal(3.0, 0.6, size=(ROWS, 2)))
    output = numpy.exp(0.4 + numpy.log(inputs) @ numpy.array((0.35, 0.55)) + generator.normal(0, 0.25, ROWS))
    with HeadlessOffice(extension_path=extension) as office:
        pid = office_process(office)
        other = office.new_calc()  # a small workbook that stays open, as a user's would
        before = settled_resident_mb(pid)
        doc = office.new_calc()
        sheet = doc.Sheets.getByIndex(0)
        set_values_in_blocks(sheet, ["routes done", "fuel", "driver hours"], numpy.column_stack([output, inputs]))
        doc.calculateAll()
        with_data = settled_resident_mb(pid)
        last = ROWS + 1
        for index, level in enumerate(LEVELS):
            top = 1 + 20 * index
            set_array_formula(sheet, "E%d:K%d" % (top, top + 16),
                              "=PRODFIT(A2:A%d;B2:C%d;;;;%g)" % (last, last, level))
        doc.calculateAll()
        with_fits = settled_resident_mb(pid)
        start = time.perf_counter()
        doc.close(True)
        close_seconds = time.perf_counter() - start
        after_close = settled_resident_mb(pid)
        other.getSheets().getByIndex(0).getCellRangeByName("A1").setValue(1.0)
        print("%s (load %s): resident MB before the workbook %.0f, with its data %.0f, with its %d fits %.0f, "
              "after it closed %.0f (%.0f above before); closing took %.2f s"
              % (os.path.basename(extension), " ".join(open("/proc/loadavg").read().split()[:3]), before,
                 with_data, len(LEVELS), with_fits, after_close, after_close - before, close_seconds))


if __name__ == "__main__":
    main()
