"""PRODCOSTFIT's covariance block and PRODCOST's statistic over it, computed by a real headless
LibreOffice Calc with the extension, on the invented laundry chain of test_cost_in_calc.py.

Run from the repository root with Debian's Python, the package isoquant_office on the path:
    PYTHONPATH=addin/python /usr/bin/python3 -m unittest -v tests/integration/test_cost_bounds_in_calc.py

Sources of the expected figures, named beside each check:
- "delta-method formula": the standard error of ln C, sqrt(g' V g) with g = (1, ln y, ln w1, ln w2,
  ln w3) and V the block's own cells, times C for total cost (README, "Bounds on derived numbers");
  the bounds C exp(-/+ t s) with scipy's t quantile on the block's degrees of freedom (python3-scipy).
  The same arithmetic in another order: 1e-10 relative (the t quantile's own accuracy is ~1e-12).
- Figures against python3-statsmodels: tests/unit/test_cost_cross_check.cpp (cost_check.py).
- "the table's own cells": the block's diagonal against the squared standard errors beside it
  (1e-12 relative: a square root).
"""

import math
import unittest

from isoquant_office import get_cell, get_range, recalc, set_array_formula, set_values

from .support import module_session
from .test_cost_in_calc import DATA, prepare
from .test_cost_frontier_in_calc import DATA as DEPOTS

try:  # the t quantile; its check is skipped without scipy
    from scipy import stats
except ImportError:
    stats = None

CALC = module_session(prepare)
setUpModule, tearDownModule = CALC.start, CALC.stop

FORMULA_TOLERANCE = 1e-10
PARAMETERS = 5  # constant, output, three prices


class CostBlockTest(unittest.TestCase):

    @classmethod
    def setUpClass(cls):
        set_array_formula(CALC.sheet, "CA1:CG28", "=PRODCOSTFIT(A1:A31;B1:B31;C1:E31;;;;;;;;;;;TRUE())")
        for column, statistic in zip("CJ CK CL CM".split(), ["value", "std. error", "lower bound", "upper bound"]):
            set_array_formula(CALC.sheet, "%s2:%s6" % (column, column),
                              '=PRODCOST($CA$1:$CG$28;B2:B6;C2:E6;"total";"%s")' % statistic)
        set_values(CALC.sheet, "DA1", [["cost", "parcels", "driver hour", "van day", "fuel"]] + DEPOTS)
        set_array_formula(CALC.sheet, "CO1:CU34", '=PRODCOSTFIT(DA1:DA121;DB1:DB121;DC1:DE121;;;;;;;;;;"half-normal";TRUE())')
        recalc(CALC.doc)

    def block(self):
        rows = get_range(CALC.sheet, "CA23:CF28")
        self.assertEqual(rows[0][0], "covariance")
        self.assertEqual([row[0] for row in rows[1:]], ["constant", "output", "labour", "machines", "energy"])
        return rows[0], [row[1:1 + PARAMETERS] for row in rows[1:]]

    def test_the_block_holds_the_squared_standard_errors(self):
        header, matrix = self.block()
        self.assertEqual(header[1], "classical")
        self.assertEqual(header[2], 30 - PARAMETERS + 1)  # n - p of the regression run (4 coefficients)
        for i in range(PARAMETERS):
            se = get_cell(CALC.sheet, "CC%d" % (2 + i))
            self.assertAlmostEqual(math.sqrt(matrix[i][i]) / se, 1.0, delta=1e-12)  # the table's own cells
            for j in range(PARAMETERS):
                self.assertEqual(matrix[i][j], matrix[j][i])

    def test_total_cost_bounds_follow_the_delta_method(self):
        header, matrix = self.block()
        for row in range(5):
            y, prices = DATA[row][1], DATA[row][2:]
            gradient = [1.0, math.log(y)] + [math.log(w) for w in prices]
            spread = math.sqrt(sum(gradient[i] * matrix[i][j] * gradient[j]
                                   for i in range(PARAMETERS) for j in range(PARAMETERS)))
            value = get_cell(CALC.sheet, "CJ%d" % (2 + row))
            self.assertAlmostEqual(get_cell(CALC.sheet, "CK%d" % (2 + row)) / (value * spread), 1.0,
                                   delta=FORMULA_TOLERANCE)  # delta-method formula
            lower, upper = get_cell(CALC.sheet, "CL%d" % (2 + row)), get_cell(CALC.sheet, "CM%d" % (2 + row))
            self.assertTrue(0 < lower < value < upper)
            if stats is None:
                continue
            t = stats.t.ppf(0.5 + header[3] / 2, header[2])
            self.assertAlmostEqual(lower / (value * math.exp(-t * spread)), 1.0, delta=FORMULA_TOLERANCE)
            self.assertAlmostEqual(upper / (value * math.exp(t * spread)), 1.0, delta=FORMULA_TOLERANCE)

    def test_a_cost_frontier_block_is_the_likelihood_s(self):
        """The depot chain of test_cost_frontier_in_calc.py (invented, with inefficiency): k + 25 = 28
        rows of the frontier table, then 1 + 5: the header says likelihood and normal, the diagonal
        holds the squared standard errors of the table's own parameter rows."""
        table = get_range(CALC.sheet, "CO1:CU34")
        self.assertEqual(table[0][0], "half-normal cost frontier")
        self.assertEqual(table[25][1], "converged")
        self.assertEqual(table[28][:3], ["covariance", "likelihood", "normal"])
        for i in range(PARAMETERS):
            self.assertEqual(table[29 + i][0], table[1 + i][0])
            self.assertAlmostEqual(math.sqrt(table[29 + i][1 + i]) / table[1 + i][2], 1.0, delta=1e-12)


if __name__ == "__main__":
    unittest.main()
