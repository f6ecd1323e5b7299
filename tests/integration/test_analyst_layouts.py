"""Everyday sheet layouts a new user builds, computed by a real headless LibreOffice Calc with the
extension: a totals row under the data, two columns under one label, a gap in the header row,
PRODSTAT labels typed loosely, the table's size under the incomplete-rows switch, dates as the
trend, whole columns as ranges, shares in percent or headed "labour share", and a profit maximum
too small to be a plant.

Run from the repository root with Debian's Python, the package isoquant_office on the path (see
tests/integration/README.md):
    PYTHONPATH=addin/python /usr/bin/python3 -m unittest -v tests/integration/test_analyst_layouts.py

Sources of the expected figures, named beside each check:
- "Cobb & Douglas (1928)": Tables II and III of the paper (tests/data/cobb_douglas_1928.csv); the
  unrestricted fit's figures listed in tests/data/README.md (R 4.2.2 lm), to the digits printed.
- "same sheet": a cell compared with another cell of the same fit (PRODSTAT against the table).
- "Cobb-Douglas calculus": MP_L = b_L * Y / L from the table's own numbers (1e-12 relative).
- Error messages: the wording in core/sheet/src/ and core/math/src/, prefixed "Error: " by the add-in.
- "ces profit formula": y* = (nu*p/c)^(nu/(1-nu)) with the textbook ces unit cost
  c = A^(-1/nu) * (d^s w1^(1-s) + (1-d)^s w2^(1-s))^(1/(1-s)), s = 1/(1+rho), computed here.
"""

import math
import unittest

from isoquant_office import get_cell, get_range, recalc, set_array_formula, set_formula, set_values

from .support import cobb_douglas_rows, module_session

CALC = module_session()
setUpModule, tearDownModule = CALC.start, CALC.stop


class TotalsRow(unittest.TestCase):
    """B1:D26 holds the 24 years under a header and, in row 26, =SUM of each column."""

    @classmethod
    def setUpClass(cls):
        cls.sheet = CALC.new_sheet("Totals")
        set_values(cls.sheet, "B1", [["P", "L", "C"]] + cobb_douglas_rows())
        for column in "BCD":
            set_formula(cls.sheet, "%s26" % column, "=SUM(%s2:%s25)" % (column, column))
        set_array_formula(cls.sheet, "G1:M17", "=PRODFIT(B1:B26;C1:D26)")
        set_formula(cls.sheet, "O1", '=PRODSTAT(B1:B26;C1:D26;"L")')
        set_formula(cls.sheet, "O2", '=PRODSTAT(B1:B25;C1:D25;"L")')
        recalc(CALC.doc)

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
        cls.sheet = CALC.new_sheet("Headers")
        rows = cobb_douglas_rows()
        set_values(cls.sheet, "A1", [["output", "capital", "capital"]] + rows)
        set_values(cls.sheet, "E1", [["output", "labour", ""]] + rows)
        set_formula(cls.sheet, "I1", '=PRODSTAT(A1:A25;B1:C25;"capital")')
        set_formula(cls.sheet, "I2", '=PRODSTAT(E1:E25;F1:G25;"labour")')
        recalc(CALC.doc)

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
        cls.sheet = CALC.new_sheet("Labels")
        set_values(cls.sheet, "A1", [["P", "L", "C"]] + cobb_douglas_rows())
        set_array_formula(cls.sheet, "E1:K17", "=PRODFIT(A1:A25;B1:C25)")
        set_formula(cls.sheet, "M1", '=PRODSTAT(A1:A25;B1:C25;" R\u00b2 ")')
        set_formula(cls.sheet, "M2", '=PRODSTAT(A1:A25;B1:C25;"L ";" upper bound")')
        recalc(CALC.doc)
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
        cls.sheet = CALC.new_sheet("Switch")
        rows = cobb_douglas_rows()
        set_values(cls.sheet, "A1", [["P", "L", "C"]] + rows)
        holed = [list(row) for row in rows]
        holed[9][1] = ""  # a blanked labour cell in data row 10
        set_values(cls.sheet, "E1", [["P", "L", "C"]] + holed)
        set_array_formula(cls.sheet, "I1:O18", "=PRODFIT(A1:A25;B1:C25;;;;;;;;;TRUE())")
        set_array_formula(cls.sheet, "Q1:W18", "=PRODFIT(E1:E25;F1:G25;;;;;;;;;TRUE())")
        recalc(CALC.doc)

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
        cls.sheet = CALC.new_sheet("ByLabel")
        cls.rows = cobb_douglas_rows()
        set_values(cls.sheet, "A1", [["P", "L", "C"]] + cls.rows)
        set_array_formula(cls.sheet, "I1:O17", "=PRODFIT(A1:A25;B1:C25)")
        # the same years with capital first
        set_values(cls.sheet, "Q1", [["C", "L"]] + [[row[2], row[1]] for row in cls.rows])
        set_formula(cls.sheet, "T1", '=PRODMARGINAL($I$1:$O$17;Q1:R2;"L")')
        set_array_formula(cls.sheet, "U1:U25", '=PRODMARGINAL($I$1:$O$17;Q1:R25;"L")')
        recalc(CALC.doc)
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


def find_row(table, label):
    return next(row for row in table if row[0] == label)


class DatesAsTheTrend(unittest.TestCase):
    """The trend column holds year-end dates (invented: the 24 rows of Cobb & Douglas (1928)
    given the year ends of 2000-2023), and beside it =YEAR() of them."""

    @classmethod
    def setUpClass(cls):
        cls.sheet = CALC.new_sheet("Dates")
        set_values(cls.sheet, "A1", [["P", "L", "C"]] + cobb_douglas_rows())
        set_values(cls.sheet, "D1", [["year end", "year"]])
        for row in range(2, 26):
            set_formula(cls.sheet, "D%d" % row, "=DATE(%d;12;31)" % (1998 + row))
            set_formula(cls.sheet, "E%d" % row, "=YEAR(D%d)" % row)
        set_array_formula(cls.sheet, "G1:M24", "=PRODFIT(A1:A25;B1:C25;;;;;;;;D1:D25)")
        set_array_formula(cls.sheet, "O1:U24", "=PRODFIT(A1:A25;B1:C25;;;;;;;;E1:E25)")
        recalc(CALC.doc)

    def test_the_form_row_says_the_rate_is_per_day(self):
        form = find_row(get_range(self.sheet, "G1:M24"), "form")
        self.assertEqual(form[2], "note: the trend counts days (dates?), so technical change is per day; "
                                  "for years use =YEAR(date)")

    def test_years_get_no_note(self):
        form = find_row(get_range(self.sheet, "O1:U24"), "form")
        self.assertEqual(form[2], "")


class WholeColumns(unittest.TestCase):
    """=PRODSTAT(A:A;B:C;"L") on 24 rows under a header: the rest of the columns is empty."""

    @classmethod
    def setUpClass(cls):
        cls.sheet = CALC.new_sheet("Whole")
        set_values(cls.sheet, "A1", [["P", "L", "C"]] + cobb_douglas_rows())
        set_formula(cls.sheet, "E1", '=PRODSTAT(A:A;B:C;"L")')
        set_formula(cls.sheet, "E2", '=PRODSTAT(A1:A25;B1:C25;"L")')
        set_array_formula(cls.sheet, "G1:M17", "=PRODFIT(A:A;B:C)")
        set_array_formula(cls.sheet, "O1:U17", "=PRODFIT(A1:A25;B1:C25)")
        set_array_formula(cls.sheet, "G20:M27", "=PRODCOMPARE(A:A;B:C)")
        set_array_formula(cls.sheet, "O20:U27", "=PRODCOMPARE(A1:A25;B1:C25)")
        recalc(CALC.doc)

    def test_the_published_fit_from_whole_columns(self):
        # Cobb & Douglas (1928), unrestricted fit: labour 0.8072782 (R 4.2.2 lm, 7 digits printed).
        self.assertAlmostEqual(get_cell(self.sheet, "E1"), 0.8072782, delta=5e-8)
        # same sheet: identical to the exact range, cell for cell
        self.assertEqual(get_cell(self.sheet, "E1"), get_cell(self.sheet, "E2"))
        self.assertEqual(get_range(self.sheet, "G1:M17"), get_range(self.sheet, "O1:U17"))
        self.assertEqual(get_range(self.sheet, "G20:M27"), get_range(self.sheet, "O20:U27"))


class SharesAsUsersTypeThem(unittest.TestCase):
    """PRODGROWTH over the Cobb & Douglas years with cost shares typed in percent, headed
    "labour share" and "share of capital", and one year's shares summing to 0.8796."""

    @classmethod
    def setUpClass(cls):
        cls.sheet = CALC.new_sheet("Shares")
        rows = cobb_douglas_rows()
        set_values(cls.sheet, "A1", [["P", "labour", "capital"]] + rows)
        set_values(cls.sheet, "D1", [["labour", "capital"]] + [[0.75, 0.25]] * 24)
        set_values(cls.sheet, "F1", [["labour share", "share of capital"]] + [[0.75, 0.25]] * 24)
        set_values(cls.sheet, "H1", [["labour", "capital"]] + [[75, 25]] * 24)
        set_values(cls.sheet, "J1", [["labour", "capital"]] + [[0.5, 0.3796]] + [[0.75, 0.25]] * 23)
        set_array_formula(cls.sheet, "L1:P24", "=PRODGROWTH(A1:A25;B1:C25;D1:E25)")
        set_array_formula(cls.sheet, "R1:V24", "=PRODGROWTH(A1:A25;B1:C25;F1:G25)")
        set_formula(cls.sheet, "X1", "=PRODGROWTH(A1:A25;B1:C25;H1:I25)")
        set_formula(cls.sheet, "X2", "=PRODGROWTH(A1:A25;B1:C25;J1:K25)")
        set_formula(cls.sheet, "X3", '=PRODFIT(A1:A25;B1:C25;"cobb douglas")')
        recalc(CALC.doc)

    def test_share_headers_name_their_inputs(self):
        # same sheet: headed "labour share" | "share of capital", the table of plain headers
        self.assertEqual(get_range(self.sheet, "R1:V24"), get_range(self.sheet, "L1:P24"))

    def test_percent_shares_are_told_to_divide(self):
        self.assertEqual(get_cell(self.sheet, "X1"), "Error: weights: period 1 (row 2): the shares sum to 100: "
                                                     "give them as fractions (divide by 100)")

    def test_a_sum_reads_as_typed(self):
        self.assertEqual(get_cell(self.sheet, "X2"), "Error: weights: period 1 (row 2): the shares sum to 0.8796; "
                         "the cost shares of a period must sum to 1 within 0.01 (0.99 to 1.01, both included)")

    def test_a_rejected_word_lists_the_accepted_ones(self):
        self.assertEqual(get_cell(self.sheet, "X3"), "Error: form: 'cobb douglas' is not a form; use "
                                                     "\"cobb-douglas\", \"ces\" or \"translog\"")


class NoProfitableSize(unittest.TestCase):
    """A typed ces model (A 2, delta 0.4, rho 0.5, nu 0.95) at input prices 18 and 45: PRODPROFIT
    at an output price of 5 and of 40 (invented bakery)."""

    @classmethod
    def setUpClass(cls):
        cls.sheet = CALC.new_sheet("Profit")
        set_values(cls.sheet, "A1", [["form", "ces", ""], ["A", 2, ""], ["delta", 0.4, ""], ["rho", 0.5, ""],
                                     ["nu", 0.95, ""], ["inputs", "labour", "ovens"]])
        set_values(cls.sheet, "E1", [[18, 45]])
        set_formula(cls.sheet, "E3", "=PRODPROFIT(A1:C6;5;E1:F1)")
        set_array_formula(cls.sheet, "E4:H4", "=PRODPROFIT(A1:C6;40;E1:F1)")
        recalc(CALC.doc)

    def test_producing_nothing_is_said(self):
        self.assertEqual(get_cell(self.sheet, "E3"), "No profitable size: producing nothing is best at these prices "
                                                     "(the best output, 7.12e-16, is below a millionth of one unit)")

    def test_a_price_that_pays_gives_the_plan(self):
        s = 1 / 1.5
        unit_cost = 2 ** (-1 / 0.95) * (0.4 ** s * 18 ** (1 - s) + 0.6 ** s * 45 ** (1 - s)) ** (1 / (1 - s))
        expected = (0.95 * 40 / unit_cost) ** (0.95 / 0.05)  # ces profit formula, about 102.6
        self.assertAlmostEqual(get_cell(self.sheet, "G4") / expected, 1.0, delta=1e-9)


if __name__ == "__main__":
    unittest.main()
