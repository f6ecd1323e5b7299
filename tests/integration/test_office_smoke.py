"""Smoke test of the headless-office harness against the installed LibreOffice.

Run from the repository root with Debian's Python, the package isoquant_office on the path (see
tests/integration/README.md):
    PYTHONPATH=addin/python /usr/bin/python3 -m unittest tests/integration/test_office_smoke.py
    PYTHONPATH=addin/python /usr/bin/python3 tests/integration/test_office_smoke.py
Starts three offices, 16-22 s in all on 2 cores.
"""

import os
import tempfile
import unittest

from isoquant_office import (CalcSession, HeadlessOffice, get_cell, get_range, recalc, set_array_formula,
                             set_formula, set_values)

# Built-in formulas that provoke each error, and what the cell must show (observed in 7.4).
ERROR_CASES = [
    ("=SQRT(-1)", "Err:502"),      # illegal argument
    ("=ROUND(1;2;3)", "Err:504"),  # wrong parameter count
    ("=10^400", "#NUM!"),          # 503: overflow
    ('="a"+1', "#VALUE!"),         # 519
    ("=NOSUCHFUNC(1)", "#NAME?"),  # 525
    ("=1/0", "#DIV/0!"),           # 532
    ("=NA()", "#N/A"),             # 32767
    ("=ABS()", "Err:511"),         # missing argument
    ("=#REF!+1", "#REF!"),         # 524
]


class SheetRoundTripTest(unittest.TestCase):
    """Values, formulas and errors written through the harness read back as expected."""

    @classmethod
    def setUpClass(cls):
        cls.session = CalcSession(extension_path=None)  # an office without an extension
        cls.session.start()
        cls.office, cls.doc, cls.sheet = cls.session.office, cls.session.doc, cls.session.sheet

    @classmethod
    def tearDownClass(cls):
        cls.session.stop()

    def test_values_and_sum(self):
        set_values(self.sheet, "A1", [[1, 2.5, "text"], [3, None, 4]])
        set_formula(self.sheet, "E1", "=SUM(A1:C2)")
        recalc(self.doc)
        self.assertEqual(get_range(self.sheet, "A1:C2"), [[1.0, 2.5, "text"], [3.0, None, 4.0]])
        self.assertEqual(get_cell(self.sheet, "E1"), 10.5)
        self.assertIsNone(get_cell(self.sheet, "B2"))
        self.assertEqual(get_cell(self.sheet, "C1"), "text")

    def test_strings_stay_text(self):
        set_values(self.sheet, "A10", [["123", "=1+1"]])
        self.assertEqual(get_range(self.sheet, "A10:B10"), [["123", "=1+1"]])

    def test_semicolon_separates_arguments(self):
        set_formula(self.sheet, "E2", "=ROUND(2.345;2)")
        set_formula(self.sheet, "E3", "=ROUND(2.345,2)")
        self.assertEqual(get_cell(self.sheet, "E2"), 2.35)
        self.assertEqual(get_cell(self.sheet, "E3"), "#NAME?")

    def test_array_formulas(self):
        set_values(self.sheet, "A20", [[1, 2, 3], [4, 5, 6]])
        set_array_formula(self.sheet, "E20:F22", "=TRANSPOSE(A20:C21)")
        set_array_formula(self.sheet, "H20:I21", "=MMULT(A20:C21;TRANSPOSE(A20:C21))")
        # A range larger than the result pads with #N/A.
        set_array_formula(self.sheet, "K20:K22", "={7|8}")
        recalc(self.doc)
        self.assertEqual(get_range(self.sheet, "E20:F22"), [[1.0, 4.0], [2.0, 5.0], [3.0, 6.0]])
        self.assertEqual(get_range(self.sheet, "H20:I21"), [[14.0, 32.0], [32.0, 77.0]])
        self.assertEqual(get_range(self.sheet, "K20:K22"), [[7.0], [8.0], ["#N/A"]])

    def test_error_cells(self):
        for row, (formula, _) in enumerate(ERROR_CASES, start=30):
            set_formula(self.sheet, "A%d" % row, formula)
        recalc(self.doc)
        last = 30 + len(ERROR_CASES) - 1
        column = get_range(self.sheet, "A30:A%d" % last)
        for row, (formula, expected) in enumerate(ERROR_CASES, start=30):
            with self.subTest(formula=formula):
                self.assertEqual(get_cell(self.sheet, "A%d" % row), expected)
                self.assertEqual(column[row - 30], [expected])
                # The mapping must match what the office itself displays.
                shown = self.sheet.getCellRangeByName("A%d" % row).getCellByPosition(0, 0)
                self.assertEqual(shown.getString(), expected)

    def test_store_open_and_pdf(self):
        set_values(self.sheet, "A40", [[6, 7]])
        set_formula(self.sheet, "C40", "=A40*B40")
        with tempfile.TemporaryDirectory() as folder:
            ods = os.path.join(folder, "round-trip.ods")
            pdf = os.path.join(folder, "round-trip.pdf")
            self.office.store(self.doc, ods, "calc8")
            self.office.export_pdf(self.doc, pdf)
            with open(pdf, "rb") as f:
                self.assertEqual(f.read(5), b"%PDF-")
            copy = self.office.open(ods)
            try:
                self.assertEqual(get_cell(copy.Sheets.getByIndex(0), "C40"), 42.0)
            finally:
                copy.close(True)

    def test_alive(self):
        self.assertTrue(self.office.alive())


class CleanupTest(unittest.TestCase):
    """Leaving the with-block leaves no office process and no temp folder behind."""

    def assert_gone(self, office, workdir):
        self.assertFalse(office.group_alive(), "office processes left behind")
        self.assertFalse(office.alive())
        self.assertFalse(os.path.exists(workdir), "temp folder left behind")

    def test_normal_exit(self):
        with HeadlessOffice() as office:
            workdir = office.workdir
            self.assertTrue(office.alive())
            self.assertTrue(office.group_alive())
            self.assertTrue(os.path.isdir(os.path.join(workdir, "profile")))
            doc = office.new_calc()
            set_values(doc.Sheets.getByIndex(0), "A1", [[1]])  # a modified document must not block exit
        self.assert_gone(office, workdir)

    def test_exit_on_exception(self):
        with self.assertRaises(KeyError):
            with HeadlessOffice() as office:
                workdir = office.workdir
                raise KeyError("boom")
        self.assert_gone(office, workdir)


if __name__ == "__main__":
    unittest.main()
