"""Everyday sheet layouts a new user builds, computed by a real headless LibreOffice Calc with the
extension: a totals row under the data, two columns under one label, a gap in the header row,
PRODSTAT labels typed loosely, and the table's size under the incomplete-rows switch.

Run from the repository root with Debian's Python (the only one that imports uno):
    /usr/bin/python3 -m unittest -v tests/integration/test_analyst_layouts.py

Sources of the expected figures, named beside each check:
- "Cobb & Douglas (1928)": Tables II and III of the paper (tests/data/cobb_douglas_1928.csv); the
  unrestricted fit's figures listed in tests/data/README.md (R 4.2.2 lm), to the digits printed.
- "same sheet": a cell compared with another cell of the same fit (PRODSTAT against the table).
- "Cobb-Douglas calculus": MP_L = b_L * Y / L from the table's own numbers (1e-12 relative).
- Error messages: the wording in core/src/*.cpp, prefixed "Error: " by the add-in.
"""

import csv
import math
import os
import sys
import unittest

HERE = os.path.dirname(os.path.abspath(__file__))
sys.path.insert(0, HERE)

from office import (  # noqa: E402
    get_cell, get_range, recalc, set_array_formula, set_formula, set_values, start_module_office,
    stop_module_office)

REPO = os.path.normpath(os.path.join(HERE, "..", ".."))
OXT = os.environ.get("ISOQUANT_OXT", os.path.join(REPO, "build", "isoquant.oxt"))

OFFICE = None
DOC = None


def setUpModule():
    global OFFICE, DOC
    OFFICE, DOC = start_module_office(OXT)


def tearDownModule():
    stop_module_office(OFFICE)


def cobb_douglas_rows():
    with open(os.path.join(REPO, "tests", "data", "cobb_douglas_1928.csv"), newline="") as handle:
        return [[float(row["P"]), float(row["L"]), float(row["C"])] for row in csv.DictReader(handle)]


def new_sheet(name):
    sheets = DOC.Sheets
    sheets.insertNewByName(name, sheets.getCount())
    return sheets.getByName(name)


class TotalsRow(unittest.TestCase):
    """B1:D26 holds the 24 years under a header and, in row 26, =SUM of each column."""

    @classmethod
    def setUpClass(cls):
        cls.sheet = new_sheet("Totals")
        set_values(cls.sheet, "B1", [["P", "L", "C"]] + cobb_douglas_rows())
        for column in "BCD":
            set_formula(cls.sheet, "%s26" % column, "=SUM(%s2:%s25)" % (column, column))
        set_array_formula(cls.sheet, "G1:M17", "=PRODFIT(B1:B26;C1:D26)")
        set_formula(cls.sheet, "O1", '=PRODSTAT(B1:B26;C1:D26;"L")')
        set_formula(cls.sheet, "O2", '=PRODSTAT(B1:B25;C1:D25;"L")')
        recalc(DOC)

    def test_the_totals_row_is_named(self):
        message = "Error: row 26 looks like a total of the rows above; leave it out of the ranges"
        self.assertEqual(get_cell(self.sheet, "G1"), message)
        self.assertEqual(get_cell(self.sheet, "O1"), message)

    def test_without_it_the_published_fit(self):
        # Cobb & Douglas (1928), unrestricted fit: labour 0.8072782 (R 4.2.2 lm, 7 digits printed).
        self.assertAlmostEqual(get_cell(self.sheet, "O2"), 0.8072782, delta=5e-8)


class HeaderRows(unittest.TestCase):
    """Two inputs both headed `capital`, and a header with one label missing."""

    @classmethod
    def setUpClass(cls):
        cls.sheet = new_sheet("Headers")
        rows = cobb_douglas_rows()
        set_values(cls.sheet, "A1", [["output", "capital", "capital"]] + rows)
        set_values(cls.sheet, "E1", [["output", "labour", ""]] + rows)
        set_formula(cls.sheet, "I1", '=PRODSTAT(A1:A25;B1:C25;"capital")')
        set_formula(cls.sheet, "I2", '=PRODSTAT(E1:E25;F1:G25;"labour")')
        recalc(DOC)

    def test_a_label_used_twice_is_named(self):
        self.assertEqual(get_cell(self.sheet, "I1"),
                         "Error: inputs: the label 'capital' heads two columns; give every column its own label")

    def test_a_gap_in_the_header_is_named(self):
        self.assertEqual(get_cell(self.sheet, "I2"),
                         "Error: inputs: row 1, column 2 is an empty header; give every column a label or none")


class LooseLabels(unittest.TestCase):
    """PRODSTAT with labels as a user types or copies them: spaces around, R² for R2."""

    @classmethod
    def setUpClass(cls):
        cls.sheet = new_sheet("Labels")
        set_values(cls.sheet, "A1", [["P", "L", "C"]] + cobb_douglas_rows())
        set_array_formula(cls.sheet, "E1:K17", "=PRODFIT(A1:A25;B1:C25)")
        set_formula(cls.sheet, "M1", '=PRODSTAT(A1:A25;B1:C25;" R\u00b2 ")')
        set_formula(cls.sheet, "M2", '=PRODSTAT(A1:A25;B1:C25;"L ";" upper bound")')
        recalc(DOC)
        cls.table = get_range(cls.sheet, "E1:K17")

    def test_same_cells_as_the_table(self):
        # same sheet: R2 is the table's row 7, column 2; L's upper bound row 3, column 7.
        self.assertEqual(self.table[6][0], "R2")
        self.assertEqual(get_cell(self.sheet, "M1"), self.table[6][1])
        self.assertEqual(self.table[2][0], "L")
        self.assertEqual(get_cell(self.sheet, "M2"), self.table[2][6])


class TableSizeUnderTheSwitch(unittest.TestCase):
    """With `incomplete rows` TRUE the table keeps its size whether or not a row was dropped."""

    @classmethod
    def setUpClass(cls):
        cls.sheet = new_sheet("Switch")
        rows = cobb_douglas_rows()
        set_values(cls.sheet, "A1", [["P", "L", "C"]] + rows)
        holed = [list(row) for row in rows]
        holed[9][1] = ""  # a blanked labour cell in data row 10
        set_values(cls.sheet, "E1", [["P", "L", "C"]] + holed)
        set_array_formula(cls.sheet, "I1:O18", "=PRODFIT(A1:A25;B1:C25;;;;;;;;;TRUE())")
        set_array_formula(cls.sheet, "Q1:W18", "=PRODFIT(E1:E25;F1:G25;;;;;;;;;TRUE())")
        recalc(DOC)

    def test_the_dropped_rows_row_is_always_there(self):
        complete = get_range(self.sheet, "I1:O18")
        holed = get_range(self.sheet, "Q1:W18")
        self.assertEqual([row[0] for row in complete], [row[0] for row in holed])
        self.assertEqual(complete[17][:2], ["incomplete rows dropped", 0.0])
        self.assertEqual(holed[17][:2], ["incomplete rows dropped", 1.0])
        self.assertEqual(complete[5][:2], ["observations", 24.0])
        self.assertEqual(holed[5][:2], ["observations", 23.0])


class InputsByLabel(unittest.TestCase):
    """A fit on `L | C`, evaluated on inputs headed `C | L` (one row, and a whole column)."""

    @classmethod
    def setUpClass(cls):
        cls.sheet = new_sheet("ByLabel")
        cls.rows = cobb_douglas_rows()
        set_values(cls.sheet, "A1", [["P", "L", "C"]] + cls.rows)
        set_array_formula(cls.sheet, "I1:O17", "=PRODFIT(A1:A25;B1:C25)")
        # the same years with capital first
        set_values(cls.sheet, "Q1", [["C", "L"]] + [[row[2], row[1]] for row in cls.rows])
        set_formula(cls.sheet, "T1", '=PRODMARGINAL($I$1:$O$17;Q1:R2;"L")')
        set_array_formula(cls.sheet, "U1:U25", '=PRODMARGINAL($I$1:$O$17;Q1:R25;"L")')
        recalc(DOC)
        cls.table = get_range(cls.sheet, "I1:O17")

    def marginal_product_of_labour(self, labour, capital):
        # Cobb-Douglas calculus from the table's own numbers: b_L * Y / L, Y = exp(ln A) L^b_L C^b_C
        log_a, b_l, b_c = self.table[1][1], self.table[2][1], self.table[3][1]
        return b_l * math.exp(log_a) * labour ** b_l * capital ** b_c / labour

    def test_one_row_headed_in_another_order(self):
        _, labour, capital = self.rows[0]
        self.assertAlmostEqual(get_cell(self.sheet, "T1") / self.marginal_product_of_labour(labour, capital), 1.0,
                               delta=1e-12)

    def test_a_column_lines_up_with_its_rows(self):
        column = [row[0] for row in get_range(self.sheet, "U1:U25")]
        self.assertEqual(column[0], "marginal product of L")
        for (_, labour, capital), value in zip(self.rows, column[1:]):
            self.assertAlmostEqual(value / self.marginal_product_of_labour(labour, capital), 1.0, delta=1e-12)


if __name__ == "__main__":
    unittest.main()
