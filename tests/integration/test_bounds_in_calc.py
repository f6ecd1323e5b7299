"""Issue 20 in a real headless LibreOffice Calc with the extension: PRODFIT's covariance block, read
back by the evaluators and PRODVALUE.

Run from the repository root with Debian's Python, the package isoquant_office on the path (see
tests/integration/README.md):
    PYTHONPATH=addin/python /usr/bin/python3 -m unittest -v tests/integration/test_bounds_in_calc.py

Sources of the expected figures: Cobb & Douglas (1928) data (tests/data); the covariance matrix of
the same least squares recomputed by python3-statsmodels (cov_params of OLS, classical and HC1) at
test time, to 1e-8 relative (STATSMODELS_RELATIVE: two implementations of the same least squares in
double precision); the table's own cells where the block must not change them (equal exactly).
"""

import unittest

from isoquant_office import get_cell, get_range, recalc, set_array_formula, set_formula, set_values

from .fit_checks import STATSMODELS_RELATIVE, cobb_douglas_sheet, logs, np, statsmodels_fit
from .support import CalcTestCase, module_session

CALC = module_session()
setUpModule, tearDownModule = CALC.start, CALC.stop

LABELS = ["ln A", "L", "C"]


class CovarianceBlockTest(CalcTestCase):
    @classmethod
    def setUpClass(cls):
        cls.sheet, cls.data = cobb_douglas_sheet(CALC, "Bounds")
        # 17 rows + 1 + p = 4 rows of the block, max(7, p + 1) = 7 columns.
        set_values(cls.sheet, "P90", [[150.0, 200.0]])  # one bundle: L = 150, C = 200
        set_array_formula(cls.sheet, "F1:L21", "=PRODFIT(B1:B25;C1:D25;;;;;;;;;;TRUE())")
        set_array_formula(cls.sheet, "F30:L50", '=PRODFIT(B1:B25;C1:D25;;;"hc1";;;;;;;TRUE())')
        set_array_formula(cls.sheet, "F60:L76", "=PRODFIT(B1:B25;C1:D25)")
        recalc(CALC.doc)
        cls.table = get_range(cls.sheet, "F1:L21")
        cls.robust = get_range(cls.sheet, "F30:L50")
        cls.plain = get_range(cls.sheet, "F60:L76")

    def test_the_table_is_unchanged_above_the_block(self):
        self.assertEqual(self.table[:17], self.plain)

    def test_the_block_rows(self):
        self.assertEqual(list(self.table[17][:4]), ["covariance", "classical", 21.0, 0.95])
        self.assertEqual([row[0] for row in self.table[18:21]], LABELS)
        self.assertEqual(self.robust[17][1], "hc1")

    def test_the_block_is_statsmodels_covariance(self):
        if np is None:
            self.skipTest("python3-statsmodels/numpy not importable")
        y = logs(self.data["P"])
        regressors = [logs(self.data["L"]), logs(self.data["C"])]
        for table, kind in ((self.table, "nonrobust"), (self.robust, "HC1")):
            expected = statsmodels_fit(y, regressors, kind).cov_params()
            for i in range(3):
                for j in range(3):
                    with self.subTest(kind=kind, i=i, j=j):
                        self.assert_relative(table[18 + i][1 + j], expected[i][j], STATSMODELS_RELATIVE,
                                             "covariance %s, %s" % (LABELS[i], LABELS[j]))

    def test_evaluators_and_lookups_read_the_table_with_its_block(self):
        set_formula(self.sheet, "N1", "=PRODMARGINAL(F1:L21;$P$90:$Q$90;1)")
        set_formula(self.sheet, "N2", "=PRODMARGINAL(F60:L76;$P$90:$Q$90;1)")
        set_formula(self.sheet, "N3", '=PRODVALUE(F1:L21;"C";"std. error")')
        set_formula(self.sheet, "N4", "=PRODOUTPUT(F1:L21;$P$90:$Q$90;TRUE())")
        set_formula(self.sheet, "N5", "=PRODOUTPUT(F60:L76;$P$90:$Q$90;TRUE())")
        recalc(CALC.doc)
        self.assert_number(get_cell(self.sheet, "N1"), "marginal product with the block")
        self.assertEqual(get_cell(self.sheet, "N1"), get_cell(self.sheet, "N2"))
        self.assertEqual(get_cell(self.sheet, "N3"), self.plain[3][2])
        self.assertEqual(get_cell(self.sheet, "N4"), get_cell(self.sheet, "N5"))

    def test_a_block_typed_wrongly_gets_a_message(self):
        # A copy of the table by value, with one covariance made asymmetric.
        set_values(self.sheet, "P101", [list(row) for row in get_range(self.sheet, "F1:L21")])
        set_formula(self.sheet, "R119", "=Q120+0.01")
        set_formula(self.sheet, "N6", "=PRODMARGINAL(P101:V121;$P$90:$Q$90;1)")
        set_formula(self.sheet, "N7", "=PRODFIT(B1:B25;C1:D25;\"translog\";;;;;;;;;TRUE())")
        recalc(CALC.doc)
        self.assert_message(get_cell(self.sheet, "N6"),
                            "Error: model: row 20: the covariance block is not symmetric (column 2 differs from row 19, "
                            "column 3)", "asymmetric block")
        self.assert_message(get_cell(self.sheet, "N7"),
                            "Error: covariance: the block is written for the cobb-douglas form only so far; leave "
                            "covariance empty or FALSE for the translog form", "translog with covariance")


if __name__ == "__main__":
    unittest.main()
