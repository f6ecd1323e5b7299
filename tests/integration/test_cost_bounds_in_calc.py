"""PRODCOSTFIT's covariance block and PRODCOST's statistic over it, computed by a real headless
LibreOffice Calc with the extension, on the invented laundry chain of test_cost_in_calc.py (with an
invented control, the share of night shifts, for the block's row of the shifted constant); and
PRODEFFICIENTSCALE's `what` over a typed translog cost model with a typed block.

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
- "implicit differentiation": ln y* = (1 - b_y - sum b_iy ln w_i)/b_yy, its gradient -(1, ln y*,
  ln w_i)/b_yy at output, output*output and i*output (README, PRODEFFICIENTSCALE), with the typed
  block's cells; bounds y* exp(-/+ t s) with scipy's t quantile refined by one Newton step
  (t_quantile). 1e-10 relative, as above.
- Figures against python3-statsmodels: tests/unit/test_cost_scale_cross_check.cpp (cost_scale_check.py).
- "statsmodels": python3-statsmodels OLS of the explicit dummy-variable cost regression under fixed
  effects (ln(C/w3) on a constant, ln y, ln(w1/w3), ln(w2/w3) and one dummy per branch after the
  first), recomputed here at test time: the standard error of total cost C·sqrt(g'Vg) with g the
  gradient of ln C at the row-weighted mean branch effect, 1e-8 relative (two implementations of the
  same least squares). More figures: tests/unit/test_cost_effects_bounds_cross_check.cpp.
"""

import math
import random
import unittest

from isoquant_office import get_cell, get_range, recalc, set_array_formula, set_values

from .support import module_session, skip_missing_reference
from .test_cost_in_calc import DATA, prepare
from .test_cost_frontier_in_calc import DATA as DEPOTS

try:  # the t quantile; its check is skipped without scipy
    from scipy import stats
except ImportError:
    stats = None
try:  # the dummy-variable regression under effects
    import numpy as np
    import statsmodels.api as sm
except ImportError:
    np = sm = None

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



def t_quantile(level, degrees):
    """scipy's t quantile with one Newton step on its survival function: the quantile alone is off by
    3.6e-9 relative at 40 degrees of freedom (scipy 1.10's, against mpmath's incomplete beta), which
    a bound y* exp(-t s) with t s near 3 carries beyond 1e-10."""
    t = stats.t.ppf(0.5 + level / 2, degrees)
    return t + (stats.t.sf(t, degrees) - (1 - level) / 2) / stats.t.pdf(t, degrees)


def night_shift_shares():
    """An invented control per branch: the share of washes done at night (seeded, 0.05 to 0.4)."""
    generator = random.Random(20261204)
    return [[round(generator.uniform(0.05, 0.4), 3)] for _ in DATA]


# A typed translog cost model of two prices with a typed diagonal block (invented numbers).
TRANSLOG_PARAMETERS = [("constant", 1.0), ("output", 0.55), ("labour", 0.6), ("energy", 0.4),
                       ("output*output", 0.08), ("labour*labour", 0.1), ("labour*energy", -0.1),
                       ("energy*energy", 0.1), ("labour*output", 0.02), ("energy*output", -0.02)]
TYPED_VARIANCE = 0.0004
TYPED_DEGREES = 40


def typed_translog_with_block():
    p = len(TRANSLOG_PARAMETERS)
    rows = [["form", "translog cost"] + [None] * (p - 1)]
    rows += [[label, value] + [None] * (p - 1) for label, value in TRANSLOG_PARAMETERS]
    rows.append(["covariance", "classical", TYPED_DEGREES, 0.95] + [None] * (p - 3))
    for i, (label, _) in enumerate(TRANSLOG_PARAMETERS):
        rows.append([label] + [TYPED_VARIANCE if i == j else 0.0 for j in range(p)])
    return rows


class ShiftedConstantAndScaleTest(unittest.TestCase):

    @classmethod
    def setUpClass(cls):
        set_values(CALC.sheet, "EZ1", [["night share"]] + night_shift_shares())  # EZ1:EZ31
        # 22 rows + the control's row + constant at control means = 24; then 1 + q, q = 5 + 1 + 1.
        set_array_formula(CALC.sheet, "FA1:FH32", "=PRODCOSTFIT(A1:A31;B1:B31;C1:E31;;;;;EZ1:EZ31;;;;;;TRUE())")
        for column, statistic in zip("FK FL FM FN".split(), ["value", "std. error", "lower bound", "upper bound"]):
            set_array_formula(CALC.sheet, "%s2:%s6" % (column, column),
                              '=PRODCOST($FA$1:$FH$32;B2:B6;C2:E6;"total";"%s")' % statistic)
        set_values(CALC.sheet, "GA1", typed_translog_with_block())  # GA1:GK22
        set_values(CALC.sheet, "GN1", [[1.4, 0.9]])
        for column, statistic in zip("GN GO GP GQ".split(), ["value", "std. error", "lower bound", "upper bound"]):
            set_array_formula(CALC.sheet, "%s3" % column, '=PRODEFFICIENTSCALE(GA1:GK22;GN1:GO1;"%s")' % statistic)
        set_values(CALC.sheet, "GS1", [[1.4, 0.9, 1.2]])
        set_array_formula(CALC.sheet, "GN4", '=PRODEFFICIENTSCALE(G21:H36;GS1:GU1;"std. error")')
        recalc(CALC.doc)

    def test_the_block_ends_with_the_constant_at_control_means(self):
        table = get_range(CALC.sheet, "FA1:FH32")
        self.assertEqual(table[22][0], "constant at control means")
        self.assertEqual(table[24][:2], ["covariance", "classical"])
        labels = [row[0] for row in table[25:]]
        self.assertEqual(labels, ["constant", "output", "labour", "machines", "energy", "night share (control)",
                                  "constant at control means"])

    def test_total_cost_bounds_take_the_shifted_constant(self):
        table = get_range(CALC.sheet, "FA1:FH32")
        header, matrix = table[24], [row[1:8] for row in table[25:]]
        for row in range(5):
            y, prices = DATA[row][1], DATA[row][2:]
            # 0 at the constant and the control, 1 at the shifted constant (delta-method formula)
            gradient = [0.0, math.log(y)] + [math.log(w) for w in prices] + [0.0, 1.0]
            spread = math.sqrt(sum(gradient[i] * matrix[i][j] * gradient[j] for i in range(7) for j in range(7)))
            value = get_cell(CALC.sheet, "FK%d" % (2 + row))
            self.assertAlmostEqual(get_cell(CALC.sheet, "FL%d" % (2 + row)) / (value * spread), 1.0,
                                   delta=FORMULA_TOLERANCE)
            lower, upper = get_cell(CALC.sheet, "FM%d" % (2 + row)), get_cell(CALC.sheet, "FN%d" % (2 + row))
            self.assertTrue(0 < lower < value < upper)
            if stats is not None:
                t = t_quantile(header[3], header[2])
                self.assertAlmostEqual(lower / (value * math.exp(-t * spread)), 1.0, delta=FORMULA_TOLERANCE)

    def test_efficient_scale_bounds_follow_implicit_differentiation(self):
        coefficient = dict(TRANSLOG_PARAMETERS)
        w = [1.4, 0.9]
        curvature = coefficient["output*output"]
        log_scale = (1 - coefficient["output"] - coefficient["labour*output"] * math.log(w[0])
                     - coefficient["energy*output"] * math.log(w[1])) / curvature
        value = get_cell(CALC.sheet, "GN3")
        self.assertAlmostEqual(value / math.exp(log_scale), 1.0, delta=FORMULA_TOLERANCE)  # implicit differentiation
        gradient = [-1 / curvature, -log_scale / curvature, -math.log(w[0]) / curvature, -math.log(w[1]) / curvature]
        spread = math.sqrt(TYPED_VARIANCE * sum(g * g for g in gradient))
        self.assertAlmostEqual(get_cell(CALC.sheet, "GO3") / (value * spread), 1.0, delta=FORMULA_TOLERANCE)
        lower, upper = get_cell(CALC.sheet, "GP3"), get_cell(CALC.sheet, "GQ3")
        self.assertTrue(0 < lower < value < upper)
        if stats is not None:
            t = t_quantile(0.95, TYPED_DEGREES)
            self.assertAlmostEqual(lower / (value * math.exp(-t * spread)), 1.0, delta=FORMULA_TOLERANCE)
            self.assertAlmostEqual(upper / (value * math.exp(t * spread)), 1.0, delta=FORMULA_TOLERANCE)

    def test_a_typed_model_without_a_block_gives_a_message(self):
        self.assertEqual(get_cell(CALC.sheet, "GN4"),
                         'Error: what: "std. error" needs the model\'s covariance block; this cost model has none (typed '
                         'rows, or a PRODCOSTFIT table made without covariance TRUE)')

BRANCHES = ["branch %d" % (row % 6 + 1) for row in range(len(DATA))]  # invented: 6 branches of 5 rows


def statsmodels_total_cost_se(row):
    """C·sqrt(g'Vg) by statsmodels OLS of the dummy-variable regression (classical errors), g = (1, ln y,
    ln(w1/w3), ln(w2/w3), n_g/n of each branch after the first): ln C at the row-weighted mean effect."""
    data = np.array(DATA)
    log_prices = np.log(data[:, 2:])
    groups = np.array([int(label.split()[1]) - 1 for label in BRANCHES])
    columns = [np.ones(len(data)), np.log(data[:, 1])] + [log_prices[:, i] - log_prices[:, 2] for i in range(2)]
    columns += [(groups == g).astype(float) for g in range(1, 6)]
    fit = sm.OLS(np.log(data[:, 0]) - log_prices[:, 2], np.column_stack(columns)).fit()
    y, w = DATA[row][1], np.log(DATA[row][2:])
    gradient = np.concatenate([[1.0, math.log(y), w[0] - w[2], w[1] - w[2]],
                               [np.mean(groups == g) for g in range(1, 6)]])
    cost = math.exp(gradient @ fit.params + w[2])
    return cost * math.sqrt(gradient @ fit.cov_params() @ gradient)


class EffectsConstantTest(unittest.TestCase):

    @classmethod
    def setUpClass(cls):
        set_values(CALC.sheet, "HA1", [["branch"]] + [[label] for label in BRANCHES])  # HA1:HA31
        # 22 rows + groups, effects, within R2 and constant for predictions = 26; then 1 + q, q = 5 + 1.
        set_array_formula(CALC.sheet, "HC1:HI33", '=PRODCOSTFIT(A1:A31;B1:B31;C1:E31;;;;;;HA1:HA31;"fixed";;;;TRUE())')
        set_array_formula(CALC.sheet, "HK2:HK4", '=PRODCOST($HC$1:$HI$33;B2:B4;C2:E4;"total";"std. error")')
        recalc(CALC.doc)

    def test_the_block_ends_with_the_constant_for_predictions(self):
        table = get_range(CALC.sheet, "HC1:HI33")
        self.assertEqual(table[25][0], "constant for predictions")
        self.assertEqual([row[0] for row in table[27:]], ["constant", "output", "labour", "machines", "energy",
                                                          "constant for predictions"])

    def test_total_cost_std_error_under_fixed_effects_agrees_with_statsmodels(self):
        if sm is None:
            skip_missing_reference(self, "python3-statsmodels/numpy not importable")
        for row in range(3):
            expected = statsmodels_total_cost_se(row)
            self.assertAlmostEqual(get_cell(CALC.sheet, "HK%d" % (2 + row)) / expected, 1.0, delta=1e-8)  # statsmodels


if __name__ == "__main__":
    unittest.main()
