"""The cost functions computed by a real headless LibreOffice Calc with the extension: PRODCOSTFIT's
tables, PRODCOST over a fitted and a typed cost model, a bad input, and the Function Wizard's entry.

Run from the repository root with Debian's Python, the package isoquant_office on the path (see
tests/integration/README.md):
    PYTHONPATH=addin/python /usr/bin/python3 -m unittest -v tests/integration/test_cost_in_calc.py

One office with the extension serves the whole module. The data are invented: 30 branches of a
chain of laundries, each with its yearly cost, washes and the prices of labour, machine hours and
energy, drawn (seeded) from the dual cost function of a Cobb-Douglas technology with A = 2.5 and
exponents 0.5, 0.3, 0.4, times a small noise.

Sources of the expected figures, named beside each check:
- "numpy lstsq": the homogeneity-normalised regression ln(C/w3) on 1, ln y, ln(w1/w3), ln(w2/w3),
  solved here by numpy.linalg.lstsq (python3-numpy); the implied third price coefficient 1 - b1 - b2.
  The same least squares by another factorisation: 1e-8 relative, as the statsmodels cross-checks.
- "dual of Cobb-Douglas (derived in tests/unit/test_cost_functions.cpp)":
  C = nu (y/A)^(1/nu) prod (w_i/b_i)^(b_i/nu); the marginal cost C/(nu y), elasticity 1/nu.
- "cost-model formula": exp(b0 + by ln y + sum bi ln wi) from the table's own cells.
Formula recomputations agree to 1e-12 relative (the same logs and exponentials in another order).
- Error messages: the wording in core/src/cost_cell_functions.cpp and numeric_range.cpp, which the
  add-in prefixes with "Error: ".
"""

import math
import random
import unittest

from isoquant_office import get_cell, get_range, recalc, set_array_formula, set_values

from .support import CalcTestCase, module_session

FORMULA_TOLERANCE = 1e-12
LSTSQ_TOLERANCE = 1e-8

SCALE, EXPONENTS = 2.5, (0.5, 0.3, 0.4)
LABELS = ["labour", "machines", "energy"]
NU = sum(EXPONENTS)
ROWS = 30

def dual_cost(y, prices):
    cost = NU * (y / SCALE) ** (1 / NU)
    for w, b in zip(prices, EXPONENTS):
        cost *= (w / b) ** (b / NU)
    return cost


def laundries():
    generator = random.Random(20261202)
    rows = []
    for _ in range(ROWS):
        y = math.exp(generator.uniform(math.log(2000), math.log(60000)))
        prices = [math.exp(generator.uniform(math.log(low), math.log(high)))
                  for low, high in ((12, 22), (3, 9), (0.15, 0.45))]
        rows.append([dual_cost(y, prices) * math.exp(generator.gauss(0, 0.03)), y] + prices)
    return rows


DATA = laundries()
TYPED_COST = [["form", "cobb-douglas cost"],
              ["constant", math.log(NU) - math.log(SCALE) / NU - sum(b / NU * math.log(b) for b in EXPONENTS)],
              ["output", 1 / NU]] + [[label, b / NU] for label, b in zip(LABELS, EXPONENTS)]
TYPED_PRODUCTION = [["form", "cobb-douglas"], ["A", SCALE]] + [[label, b] for label, b in zip(LABELS, EXPONENTS)]
WORDS = ["total", "marginal", "average", "cost elasticity", "returns to scale"]


def write_laundries(sheet):
    set_values(sheet, "A1", [["cost", "washes"] + LABELS] + DATA)  # A1:E31
    set_values(sheet, "G1", TYPED_COST)                            # G1:H6
    set_values(sheet, "G11", TYPED_PRODUCTION)                     # G11:H15


CALC = module_session(write_laundries)
setUpModule, tearDownModule = CALC.start, CALC.stop


class CostFitTableTest(CalcTestCase):
    """PRODCOSTFIT over 7 columns: Cobb-Douglas k + 18 = 21 rows, translog 2k + k(k+1)/2 + 19 = 31."""

    @classmethod
    def setUpClass(cls):
        set_array_formula(CALC.sheet, "J1:P21", "=PRODCOSTFIT(A1:A31;B1:B31;C1:E31)")
        set_array_formula(CALC.sheet, "J31:P61", '=PRODCOSTFIT(A1:A31;B1:B31;C1:E31;"translog";;"hc3")')
        recalc(CALC.doc)
        cls.table = get_range(CALC.sheet, "J1:P21")
        cls.translog = get_range(CALC.sheet, "J31:P61")

    def test_cobb_douglas_layout(self):
        self.assertEqual(self.table[0], ["Cobb-Douglas cost fit", "value", "std. error", "t", "p-value",
                                         "lower bound", "upper bound"])
        self.assertEqual([row[0] for row in self.table[1:]],
                         ["constant", "output"] + LABELS + ["", "observations", "R2", "adjusted R2", "residual SD",
                          "F (slopes = 0)", "log-likelihood", "AIC", "BIC", "cost elasticity", "returns to scale",
                          "verdict", "efficient scale", "form", "smearing factor"])
        rows = {row[0]: row for row in self.table[1:] if row[0]}
        self.assertEqual(rows["observations"][1], float(ROWS))
        self.assertEqual(rows["efficient scale"][1], "n/a")
        self.assertEqual(rows["form"][1], "cobb-douglas cost")
        self.assertIn("no efficient scale", rows["form"][2])
        self.assertIn(rows["verdict"][1], ("increasing", "constant", "decreasing"))

    def test_cobb_douglas_estimates_against_numpy(self):
        import numpy as np  # python3-numpy
        data = np.array(DATA)
        logs = np.log(data)
        relative = logs[:, 2:4] - logs[:, 4:5]
        design = np.column_stack([np.ones(ROWS), logs[:, 1], relative])
        b = np.linalg.lstsq(design, logs[:, 0] - logs[:, 4], rcond=None)[0]
        expected = list(b) + [1 - b[2] - b[3]]
        for row, value in zip(self.table[1:6], expected):
            self.assert_relative(row[1], value, LSTSQ_TOLERANCE, row[0])  # numpy lstsq
        self.assert_relative(self.table[15][1], b[1], LSTSQ_TOLERANCE, "cost elasticity = output coefficient")
        self.assert_relative(self.table[16][1], 1 / b[1], LSTSQ_TOLERANCE, "returns to scale")

    def test_translog_layout(self):
        self.assertEqual(self.translog[0][0], "translog cost fit")
        pairs = ["%s*%s" % (LABELS[i], LABELS[j]) for i in range(3) for j in range(i, 3)]
        self.assertEqual([row[0] for row in self.translog[1:17]],
                         ["constant", "output"] + LABELS + ["output*output"] + pairs +
                         ["%s*output" % label for label in LABELS] + [""])
        self.assertEqual([row[0] for row in self.translog[-6:]],
                         ["cost elasticity", "returns to scale", "verdict", "efficient scale", "form", "smearing factor"])
        self.assertEqual(self.translog[-2][1], "translog cost")


class CostModelTest(CalcTestCase):
    """PRODCOST over the fitted table and over the typed dual, and for the production model."""

    @classmethod
    def setUpClass(cls):
        set_array_formula(CALC.sheet, "J81:P101", "=PRODCOSTFIT(A1:A31;B1:B31;C1:E31)")
        for column, word in zip("RSTUV", WORDS):
            set_array_formula(CALC.sheet, "%s2:%s6" % (column, column),
                              '=PRODCOST($J$81:$P$101;B2:B6;C2:E6;"%s")' % word)
            set_array_formula(CALC.sheet, "%s12" % column, '=PRODCOST($G$1:$H$6;B2;C2:E2;"%s")' % word)
            set_array_formula(CALC.sheet, "%s14" % column, '=PRODCOST($G$11:$H$15;B2;C2:E2;"%s")' % word)
        set_array_formula(CALC.sheet, "W2:W6", '=PRODCOST($G$11:$H$15;B2:B6;C2:E6;"marginal")')
        recalc(CALC.doc)

    def test_fitted_model_total_cost_is_the_median_prediction(self):
        fitted = get_range(CALC.sheet, "K82:K86")
        for row in range(5):
            y, prices = DATA[row][1], DATA[row][2:]
            log_cost = fitted[0][0] + fitted[1][0] * math.log(y) + sum(
                fitted[2 + i][0] * math.log(w) for i, w in enumerate(prices))
            self.assert_relative(get_cell(CALC.sheet, "R%d" % (row + 2)), math.exp(log_cost), FORMULA_TOLERANCE,
                                 "total, row %d" % row)  # cost-model formula
            self.assert_relative(get_cell(CALC.sheet, "U%d" % (row + 2)), fitted[1][0], FORMULA_TOLERANCE, "elasticity")

    def test_typed_dual_and_production_model_agree(self):
        y, prices = DATA[0][1], DATA[0][2:]
        cost = dual_cost(y, prices)  # dual of Cobb-Douglas
        expected = [cost, cost / (NU * y), cost / y, 1 / NU, NU]
        for column, word, value in zip("RSTUV", WORDS, expected):
            self.assert_relative(get_cell(CALC.sheet, "%s12" % column), value, FORMULA_TOLERANCE,
                                 "typed cost model " + word)
            self.assert_relative(get_cell(CALC.sheet, "%s14" % column), value, FORMULA_TOLERANCE,
                                 "production model " + word)


    def test_production_model_gives_a_column_of_marginal_costs(self):
        for row in range(5):
            y, prices = DATA[row][1], DATA[row][2:]
            self.assert_relative(get_cell(CALC.sheet, "W%d" % (row + 2)), dual_cost(y, prices) / (NU * y),
                                 FORMULA_TOLERANCE, "marginal cost, row %d" % row)  # dual of Cobb-Douglas


class CostBadInputTest(CalcTestCase):

    def test_messages_name_argument_and_row(self):
        set_values(CALC.sheet, "A41", [["cost", "washes"] + LABELS] + [row[:] for row in DATA[:10]])
        set_values(CALC.sheet, "A44", [[0.0]])
        set_array_formula(CALC.sheet, "J111:P131", "=PRODCOSTFIT(A41:A51;B41:B51;C41:E51)")
        set_array_formula(CALC.sheet, "J141:P161", "=PRODCOSTFIT(A1:A31;B1:B31;C1:E31;;;;;B1:B31)")
        set_array_formula(CALC.sheet, "J171:P191", "=PRODCOSTFIT(A1:A31;B1:B30;C1:E31)")
        recalc(CALC.doc)
        self.assertEqual(get_cell(CALC.sheet, "J111"), "Error: cost: row 4 is 0; logs need positive values")
        self.assertEqual(get_cell(CALC.sheet, "J141"),
                         "Error: controls: not available yet for cost fits; leave it empty")
        self.assertEqual(get_cell(CALC.sheet, "J171"), "Error: output: has 29 rows of data but cost has 30 rows")
        self.assertTrue(CALC.office.alive(), "the office stopped answering after the error cases")


class FunctionWizardTest(unittest.TestCase):

    def test_prodcostfit_is_listed_with_its_arguments(self):
        listed = {}
        for properties in CALC.office.function_descriptions():
            if properties.get("Name") in ("PRODCOSTFIT", "PRODCOST"):
                listed[properties["Name"]] = properties
        self.assertEqual(sorted(listed), ["PRODCOST", "PRODCOSTFIT"])
        self.assertIn("cost function", listed["PRODCOSTFIT"]["Description"])
        arguments = listed["PRODCOSTFIT"]["Arguments"]
        self.assertEqual([a.Name for a in arguments],
                         ["cost", "output", "input prices", "form", "shares", "errors", "level", "controls", "groups",
                          "effects", "trend", "incomplete rows"])
        self.assertEqual([a.IsOptional for a in arguments], [i >= 3 for i in range(12)])
        self.assertIn("cost elasticity", listed["PRODCOST"]["Description"])


if __name__ == "__main__":
    unittest.main()
