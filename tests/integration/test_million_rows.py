"""A million-row fit and a million-row evaluator column in headless Calc: the numbers match
python3-statsmodels (Debian) on the same data, a bad cell deep in the range is named by its row,
a range beyond the cap on work per call gets its message, and the office answers afterwards. Timings and peak memory are printed for the record
(tests/benchmarks/RESULTS.md), never asserted.

Run from the repository root with Debian's Python, the package isoquant_office on the path (see
tests/integration/README.md):
    PYTHONPATH=addin/python /usr/bin/python3 -m unittest -v tests/integration/test_million_rows.py
The extension comes from ISOQUANT_OXT (default build/isoquant.oxt).
"""
import time
import unittest

import numpy
import statsmodels.api as sm
from isoquant_office import HeadlessOffice, get_cell, get_range, set_array_formula, set_values_in_blocks
from isoquant_office.process_memory import memory_mb, office_process

from .support import EXTENSION

ROWS = 1000000
CHUNK = 50000
# Invented, seeded data (a demo scenario: a million delivery routes, fuel and driver hours).
LOG_SCALE, EXPONENTS = 0.4, (0.35, 0.55)


def invented():
    generator = numpy.random.default_rng(20261202)
    inputs = numpy.exp(generator.normal(3.0, 0.6, size=(ROWS, 2)))
    output = numpy.exp(LOG_SCALE + numpy.log(inputs) @ numpy.array(EXPONENTS) + generator.normal(0, 0.25, ROWS))
    return output, inputs


def fill(sheet, output, inputs):
    """Header in row 1, output in A, inputs in B:C, rows 2 … ROWS + 1."""
    set_values_in_blocks(sheet, ["routes done", "fuel", "driver hours"], numpy.column_stack([output, inputs]), CHUNK)


def reset_peak(pid):
    # Writing 5 to clear_refs resets the peak resident set size (VmHWM) to the current one.
    with open("/proc/%d/clear_refs" % pid, "w") as handle:
        handle.write("5")


def timed_recalculation(doc, pid):
    """Seconds of a full recalculation, and the peak resident memory (MB) of the office during it."""
    reset_peak(pid)
    start = time.perf_counter()
    doc.calculateAll()
    return time.perf_counter() - start, memory_mb(pid, "VmHWM")


class MillionRows(unittest.TestCase):
    @classmethod
    def setUpClass(cls):
        cls.output, cls.inputs = invented()
        design = sm.add_constant(numpy.log(cls.inputs))
        cls.reference = sm.OLS(numpy.log(cls.output), design).fit()

    def test_fit_and_column_over_a_million_rows(self):
        last = ROWS + 1
        with HeadlessOffice(extension_path=EXTENSION) as office:
            doc = office.new_calc()
            sheet = doc.Sheets.getByIndex(0)
            fill(sheet, self.output, self.inputs)
            pid = office_process(office)
            doc.calculateAll()
            resident_before = memory_mb(pid, "VmRSS")

            set_array_formula(sheet, "E1:K17", "=PRODFIT(A1:A%d;B1:C%d)" % (last, last))
            fit_seconds, fit_peak = timed_recalculation(doc, pid)
            table = get_range(sheet, "E1:K17")
            self.assertEqual(table[1][0], "ln A")
            # statsmodels OLS on the same logs (python3-statsmodels, Debian): estimates and
            # classical standard errors to 1e-9 relative (common practice, no source: both are
            # double-precision QR-type solutions of a well-conditioned problem).
            for row, column in ((1, 0), (2, 1), (3, 2)):
                with self.subTest(parameter=table[row][0]):
                    self.assertAlmostEqual(table[row][1] / self.reference.params[column], 1.0, delta=1e-9)
                    self.assertAlmostEqual(table[row][2] / self.reference.bse[column], 1.0, delta=1e-9)

            set_array_formula(sheet, "M2:M%d" % last, "=PRODMARGINAL($E$1:$K$17;B2:C%d;\"fuel\")" % last)
            both_seconds, both_peak = timed_recalculation(doc, pid)
            marginal = numpy.array([row[0] for row in sheet.getCellRangeByName("M2:M%d" % last).getDataArray()])
            # The marginal product of fuel, ∂Y/∂fuel = b·A·fuel^b·hours^c / fuel (the derivative of
            # the Cobb-Douglas form, from memory), from the fitted numbers as the table shows them;
            # 1e-12 relative: the same expression evaluated in a different order (common practice,
            # no source).
            log_scale, fuel, hours = table[1][1], table[2][1], table[3][1]
            expected = fuel * numpy.exp(log_scale + fuel * numpy.log(self.inputs[:, 0]) +
                                        hours * numpy.log(self.inputs[:, 1])) / self.inputs[:, 0]
            self.assertTrue(numpy.all(numpy.isfinite(marginal)))
            self.assertLess(numpy.max(numpy.abs(marginal / expected - 1.0)), 1e-12)

            # One bad cell deep in the range is named by its row of the selection.
            sheet.getCellRangeByName("B777778").setString("n/a")
            doc.calculateAll()
            self.assertEqual(get_cell(sheet, "E1"),
                             "Error: inputs: row 777778, column 1 holds text 'n/a'; every cell must hold a number")
            self.assertTrue(office.alive())

            # Beyond the cap on work per call (core/math/include/isoquant/math/numerics/work_limits.hpp): a message,
            # before any copy of the range is made.
            doc.Sheets.insertNewByName("empty", 1)
            empty = doc.Sheets.getByName("empty")
            empty.getCellRangeByName("A1").setFormula("=PRODFIT(A2:A1048576;B2:R1048576)")
            doc.calculateAll()
            self.assertEqual(get_cell(empty, "A1"), "Error: inputs: the range has 1,048,575 rows × 17 columns; "
                                                    "one call takes at most 16,777,216 cells")
            self.assertTrue(office.alive())
            print("\nmillion rows (2 inputs), full recalculation: PRODFIT alone %.2f s (peak resident %.0f MB); "
                  "PRODFIT and a PRODMARGINAL column of 1,000,000 rows %.2f s (peak resident %.0f MB); "
                  "resident with the data and no formula %.0f MB"
                  % (fit_seconds, fit_peak, both_seconds, both_peak, resident_before))
            doc.close(True)


if __name__ == "__main__":
    unittest.main()
