"""PRODVALUE in a real headless LibreOffice Calc with the extension: one cell of a table already on
the sheet, by row and column label, as a dashboard reads its figures from one fitted table.

Run from the repository root with Debian's Python, the package isoquant_office on the path (see
tests/integration/README.md):
    PYTHONPATH=addin/python /usr/bin/python3 -m unittest -v tests/integration/test_values_in_calc.py

Source of the expected figures: the PRODFIT table beside it (Cobb & Douglas 1928 data) and
PRODSTAT over the same data, the same cells read another way; equal exactly.
"""

import unittest

from isoquant_office import get_cell, get_range, recalc, set_array_formula, set_formula

from .fit_checks import cobb_douglas_sheet
from .support import module_session

CALC = module_session()
setUpModule, tearDownModule = CALC.start, CALC.stop

COLUMNS = ["value", "std. error", "t", "p-value", "lower bound", "upper bound"]


class TableValueTest(unittest.TestCase):
    @classmethod
    def setUpClass(cls):
        cls.sheet, _ = cobb_douglas_sheet(CALC, "Values")
        set_array_formula(cls.sheet, "F1:L17", '=PRODFIT(B1:B25;C1:D25;;;"hc1")')
        recalc(CALC.doc)
        cls.table = get_range(cls.sheet, "F1:L17")

    def test_every_cell_of_the_table_by_its_labels(self):
        labels = [row[0] for row in self.table[1:] if row[0]]
        for index, label in enumerate(labels):
            set_formula(self.sheet, "N%d" % (index + 1), '=PRODVALUE($F$1:$L$17;"%s")' % label)
            set_formula(self.sheet, "O%d" % (index + 1),
                        '=PRODSTAT(B1:B25;C1:D25;"%s";;;;"hc1")' % label)
            for offset, column in enumerate(COLUMNS):
                set_formula(self.sheet, "%s%d" % ("PQRSTU"[offset], index + 1),
                            '=PRODVALUE($F$1:$L$17;"%s";"%s")' % (label, column))
        recalc(CALC.doc)
        for index, label in enumerate(labels):
            row = next(r for r in self.table if r[0] == label)
            with self.subTest(row=label):
                self.assertEqual(get_cell(self.sheet, "N%d" % (index + 1)), get_cell(self.sheet, "O%d" % (index + 1)))
                for offset in range(len(COLUMNS)):
                    self.assertEqual(get_cell(self.sheet, "%s%d" % ("PQRSTU"[offset], index + 1)), row[1 + offset])

    def test_a_verdict_compares_as_text(self):
        set_formula(self.sheet, "W1", '=IF(PRODVALUE($F$1:$L$17;"verdict")="%s";1;0)' % self.table[14][1])
        recalc(CALC.doc)
        self.assertEqual(self.table[14][0], "verdict")
        self.assertEqual(get_cell(self.sheet, "W1"), 1.0)

    def test_messages_name_the_argument(self):
        set_formula(self.sheet, "W2", '=PRODVALUE($F$1:$L$17;"capital")')
        set_formula(self.sheet, "W3", '=PRODVALUE($F$1:$L$17;"L";"se")')
        set_formula(self.sheet, "W4", '=PRODVALUE($F$2:$L$17;"L")')
        recalc(CALC.doc)
        self.assertTrue(get_cell(self.sheet, "W2").startswith(
            "Error: row label: 'capital' is not a row of the table; its rows are 'ln A', 'L', 'C', "))
        self.assertEqual(get_cell(self.sheet, "W3"),
                         "Error: column label: 'se' is not a column of the table; its columns are 'value', "
                         "'std. error', 't', 'p-value', 'lower bound', 'upper bound'")
        self.assertEqual(get_cell(self.sheet, "W4"),
                         "Error: table: give the whole table, its header row included (such as $I$1:$O$17 for a "
                         "PRODFIT of two inputs)")


if __name__ == "__main__":
    unittest.main()
