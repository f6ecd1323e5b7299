"""The cost frontier computed by a real headless LibreOffice Calc with the extension: PRODCOSTFIT with
`inefficiency` "half-normal", PRODEFFICIENCY's cost efficiency over its table, bad input, and the
Function Wizard's entry.

Run from the repository root with Debian's Python (the only one that imports uno):
    PYTHONPATH=addin/python /usr/bin/python3 -m unittest -v tests/integration/test_cost_frontier_in_calc.py

One office with the extension serves the whole module. The data are invented: 120 depots of a
parcel courier, each with its yearly cost, parcels delivered and the prices it pays for a driver
hour, a van day and a litre of fuel, drawn (seeded) from
ln C = 0.5 + 0.85 ln y + 0.5 ln w1 + 0.3 ln w2 + 0.2 ln w3 + v + u, v ~ N(0, 0.08^2), u half-normal
of scale 0.3 (the extra cost of a depot over the least cost).

Sources of the expected figures, named beside each check:
- "scipy maximum": the half-normal cost-frontier log-likelihood (Kumbhakar and Lovell 2000, chapter
  4), ln f(e) = ln 2 - ln s + ln phi(e/s) + ln Phi(e su/(sv s)), e = ln(C/w3) - b'x on PRODCOSTFIT's
  normalised regressors, written here with scipy.stats.norm.logpdf and scipy.special.log_ndtr and
  maximised by scipy.optimize.minimize (BFGS, then Nelder-Mead) from 4 starts (python3-scipy). The
  maximum of the log-likelihood agrees to 1e-8 relative (it is stationary there; see
  tests/unit/test_cost_frontier_cross_check.cpp for the parameters to 1e-6).
- "efficiency formula": E[exp(-u)|e] = exp(-mu + s^2/2) Phi(mu/s - s) / Phi(mu/s) with
  mu = e su^2/(su^2 + sv^2), s = su sv / sqrt(su^2 + sv^2) (Battese and Coelli 1988, u given the cost
  residual e), from the table's own cells, by numpy and scipy.special.log_ndtr: 1e-12 relative.
- Error messages: the wording in core/sheet/src/functions/efficiency_function.cpp and
  option_arguments.cpp, which the add-in prefixes with "Error: ".
"""

import math
import random
import unittest

from isoquant_office import get_cell, get_range, recalc, set_array_formula, set_values

from .support import CalcTestCase, module_session

FORMULA_TOLERANCE = 1e-12
MAXIMUM_TOLERANCE = 1e-8
ROWS = 120
LABELS = ["driver hour", "van day", "fuel"]
TABLE_ROWS = len(LABELS) + 25  # the average cost table's k + 19, and the frontier's 6


def depots():
    generator = random.Random(20261202)
    rows = []
    for _ in range(ROWS):
        parcels = math.exp(generator.uniform(math.log(5000), math.log(200000)))
        prices = [math.exp(generator.uniform(math.log(low), math.log(high)))
                  for low, high in ((18, 30), (40, 90), (1.2, 2.0))]
        log_cost = (0.5 + 0.85 * math.log(parcels) + sum(b * math.log(w) for b, w in zip((0.5, 0.3, 0.2), prices))
                    + generator.gauss(0, 0.08) + abs(generator.gauss(0, 0.3)))
        rows.append([math.exp(log_cost), parcels] + prices)
    return rows


DATA = depots()
FRONTIER = '=PRODCOSTFIT(A1:A121;B1:B121;C1:E121;;;;;;;;;;"half-normal")'


def prepare(sheet):
    set_values(sheet, "A1", [["cost", "parcels"] + LABELS] + DATA)  # A1:E121


CALC = module_session(prepare)
setUpModule, tearDownModule = CALC.start, CALC.stop


def regression(data):
    """PRODCOSTFIT's normalised regression: ln(C/w3) on 1, ln y, ln(w1/w3), ln(w2/w3)."""
    import numpy as np
    array = np.array(data)
    design = np.column_stack([np.ones(len(data)), np.log(array[:, 1]), np.log(array[:, 2] / array[:, 4]),
                              np.log(array[:, 3] / array[:, 4])])
    return design, np.log(array[:, 0] / array[:, 4])


class CostFrontierTableTest(CalcTestCase):
    """PRODCOSTFIT with inefficiency over 7 columns: Cobb-Douglas k + 25 = 28 rows for three prices."""

    @classmethod
    def setUpClass(cls):
        set_array_formula(CALC.sheet, "H1:N%d" % TABLE_ROWS, FRONTIER)
        set_array_formula(CALC.sheet, "P1:P121", "=PRODEFFICIENCY($H$1:$N$%d;A1:A121;B1:E121)" % TABLE_ROWS)
        set_array_formula(CALC.sheet, "Q2", "=PRODEFFICIENCY($H$1:$N$%d;A2;B2:E2)" % TABLE_ROWS)
        recalc(CALC.doc)
        cls.table = get_range(CALC.sheet, "H1:N%d" % TABLE_ROWS)
        cls.rows = {row[0]: row for row in cls.table[1:] if row[0]}

    def test_layout(self):
        self.assertEqual(self.table[0], ["half-normal cost frontier", "value", "std. error", "t", "p-value",
                                         "lower bound", "upper bound"])
        self.assertEqual([row[0] for row in self.table[1:]],
                         ["constant", "output"] + LABELS + ["", "noise SD", "inefficiency SD", "lambda",
                          "observations", "R2", "adjusted R2", "residual SD", "F (slopes = 0)", "log-likelihood",
                          "AIC", "BIC", "inefficiency test", "mean efficiency", "cost elasticity",
                          "returns to scale", "verdict", "efficient scale", "regularity", "convergence", "form",
                          "smearing factor"])
        self.assertEqual(self.rows["observations"][1], float(ROWS))
        self.assertEqual(self.rows["convergence"][1], "converged")
        self.assertEqual(self.rows["form"][1], "cobb-douglas cost")
        self.assertEqual(self.rows["R2"][1], "n/a")
        self.assertLess(self.rows["inefficiency test"][4], 0.01)  # 120 rows with sigma_u = 0.3: inefficiency found
        # The README's example shows this table rounded to 4 digits: it must stay what Calc computes.
        for row, shown in ((1, 0.6539), (2, 0.8419), (3, 0.4971), (7, 0.05567), (8, 0.3041), (9, 5.462),
                           (15, 38.00), (19, 0.7946)):
            self.assertAlmostEqual(self.table[row][1], shown, delta=5e-4 * abs(shown),
                                   msg="README example, row %s" % self.table[row][0])

    def test_maximum_against_scipy(self):
        import numpy as np
        from scipy import optimize, special, stats
        design, response = regression(DATA)

        def negative(theta):
            e = response - design @ theta[:4]
            sv, su = math.exp(theta[4]), math.exp(theta[5])
            s = math.hypot(su, sv)
            value = -np.sum(math.log(2) - math.log(s) + stats.norm.logpdf(e / s) + special.log_ndtr(e * su / (sv * s)))
            return value if np.isfinite(value) else 1e300

        b = np.linalg.lstsq(design, response, rcond=None)[0]
        best = None
        for sv, su in ((0.05, 0.2), (0.1, 0.3), (0.08, 0.4), (0.2, 0.1)):
            start = np.concatenate([b, [math.log(sv), math.log(su)]])
            start[0] -= su * math.sqrt(2 / math.pi)
            found = optimize.minimize(negative, start, method="BFGS", options={"gtol": 1e-7})
            found = optimize.minimize(negative, found.x, method="Nelder-Mead",
                                      options={"xatol": 1e-10, "fatol": 1e-12, "maxfev": 20000})
            if best is None or found.fun < best.fun:
                best = found
        self.assert_relative(self.rows["log-likelihood"][1], -best.fun, MAXIMUM_TOLERANCE, "log-likelihood")  # scipy maximum
        self.assertAlmostEqual(self.rows["inefficiency SD"][1], math.exp(best.x[5]),
                               delta=1e-3 * self.rows["inefficiency SD"][2],
                               msg="inefficiency SD within a thousandth of its standard error")  # scipy maximum

    def test_cost_efficiency_against_the_formula(self):
        import numpy as np
        from scipy import special
        b1, b2 = self.rows[LABELS[0]][1], self.rows[LABELS[1]][1]
        b = np.array([self.rows["constant"][1], self.rows["output"][1], b1, b2])
        sv, su = self.rows["noise SD"][1], self.rows["inefficiency SD"][1]
        design, response = regression(DATA)
        e = response - design @ b
        s2 = sv * sv + su * su
        mu, s = e * su * su / s2, su * sv / math.sqrt(s2)
        expected = np.exp(-mu + 0.5 * s * s + special.log_ndtr(mu / s - s) - special.log_ndtr(mu / s))
        column = get_range(CALC.sheet, "P1:P121")
        self.assertEqual(column[0], ["cost efficiency"])
        for row in range(ROWS):
            self.assert_relative(column[row + 1][0], float(expected[row]), FORMULA_TOLERANCE, "row %d" % row)  # efficiency formula
            self.assertLessEqual(column[row + 1][0], 1.0)
        self.assert_relative(get_cell(CALC.sheet, "Q2"), float(expected[0]), FORMULA_TOLERANCE, "single row")


class CostFrontierBadInputTest(CalcTestCase):

    def test_messages_name_the_argument(self):
        # Columns AA to AO: clear of the table and columns the other tests fill.
        set_array_formula(CALC.sheet, "AA1:AG28", '=PRODCOSTFIT(A1:A121;B1:B121;C1:E121;;;;;;;;;;"gamma")')
        set_array_formula(CALC.sheet, "AA31:AG58", FRONTIER)
        set_array_formula(CALC.sheet, "AI1:AI121", "=PRODEFFICIENCY(AA31:AG58;A1:A121;C1:E121)")
        set_array_formula(CALC.sheet, "AA61:AG88", '=PRODCOSTFIT(A1:A121;B1:B121;C1:E121;;;"hc1";;;;;;;"exponential")')
        recalc(CALC.doc)
        self.assert_message(get_cell(CALC.sheet, "AA1"),
                            'Error: inefficiency: \'gamma\' is not a distribution; use "half-normal" or "exponential"',
                            "inefficiency")
        self.assert_message(get_cell(CALC.sheet, "AI1"),
                            "Error: inputs: has 3 columns, but a cost frontier needs 4: the output column, then the 3 "
                            "price columns in PRODCOSTFIT's order", "inputs")
        self.assertTrue(get_cell(CALC.sheet, "AA61").startswith("Error: errors: a cost frontier's standard errors"))
        self.assertTrue(CALC.office.alive(), "the office stopped answering after the error cases")


class FunctionWizardTest(unittest.TestCase):

    def test_inefficiency_is_an_optional_argument_before_covariance(self):
        descriptions = CALC.office.service_manager.createInstanceWithContext(
            "com.sun.star.sheet.FunctionDescriptions", CALC.office.context)
        for i in range(descriptions.getCount()):
            properties = {p.Name: p.Value for p in descriptions.getByIndex(i)}
            if properties.get("Name") == "PRODCOSTFIT":
                arguments = properties["Arguments"]
                self.assertEqual([a.Name for a in arguments[-2:]], ["inefficiency", "covariance"])
                self.assertTrue(arguments[-2].IsOptional)
                self.assertIn("cost frontier", arguments[-2].Description)
                return
        self.fail("PRODCOSTFIT is not listed")


if __name__ == "__main__":
    unittest.main()
