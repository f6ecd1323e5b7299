"""The stochastic frontier functions computed by a real headless LibreOffice Calc with the extension:
PRODFRONTIER's table, PRODEFFICIENCY's columns, the wrong-skew case, bad input, and the Function
Wizard's entries.

Run from the repository root with Debian's Python (the only one that imports uno):
    /usr/bin/python3 -m unittest -v tests/integration/test_frontier_in_calc.py

One office with the extension serves the whole module. The data are invented: 80 bottling lines of a
drinks company, each with its bottles filled in a year, crew hours and machine hours, drawn (seeded)
from ln y = 2 + 0.55 ln crew + 0.35 ln machine + v - u with v ~ N(0, 0.15^2) and u half-normal of
scale 0.35. A second set of 40 lines has +u instead of -u: residuals skewed the wrong way; a third
of 80 lines has u exponential of mean 0.3.

Sources of the expected figures, named beside each check:
- "scipy maximum": the half-normal log-likelihood of Aigner, Lovell and Schmidt (1977), written here
  from the density with scipy.stats.norm.logpdf and scipy.special.log_ndtr, maximised by
  scipy.optimize.minimize (BFGS, then Nelder-Mead) from 4 starts (python3-scipy). The maximum of the
  log-likelihood agrees to 1e-8 relative: it is stationary there, so solvers stopping by different
  rules agree far closer in it than in the parameters (see tests/unit/test_frontier_cross_check.cpp).
- "numpy lstsq": least squares of ln y on 1, ln crew, ln machine (python3-numpy): 1e-8 relative, as the
  statsmodels cross-checks (two factorisations of the same least squares).
- "efficiency formula": E[exp(-u)|e] = exp(-mu + s^2/2) Phi(mu/s - s) / Phi(mu/s) with
  mu = -e su^2/(su^2 + sv^2), s = su sv / sqrt(su^2 + sv^2) (Battese and Coelli 1988) from the table's
  own cells, by scipy.special.log_ndtr: 1e-12 relative (the same formula in another order).
- Error messages: the wording in core/sheet/src/arguments/numeric_range.cpp and
  core/sheet/src/functions/frontier_functions.cpp, which the add-in prefixes with "Error: ".
"""

import math
import random
import unittest

from isoquant_office import get_cell, get_range, recalc, set_array_formula, set_values

from .support import module_session


FORMULA_TOLERANCE = 1e-12
LSTSQ_TOLERANCE = 1e-8
MAXIMUM_TOLERANCE = 1e-8
ROWS, WRONG_ROWS = 80, 40
LABELS = ["crew hours", "machine hours"]



def bottling_lines(rows, sign, seed, exponential=False):
    generator = random.Random(seed)
    data = []
    for _ in range(rows):
        crew = math.exp(generator.uniform(math.log(2000), math.log(20000)))
        machine = math.exp(generator.uniform(math.log(500), math.log(8000)))
        u = generator.expovariate(1 / 0.3) if exponential else abs(generator.gauss(0, 0.35))
        log_output = 2 + 0.55 * math.log(crew) + 0.35 * math.log(machine) + generator.gauss(0, 0.15) + sign * u
        data.append([math.exp(log_output), crew, machine])
    return data


DATA = bottling_lines(ROWS, -1, 20261202)
EXPONENTIAL = bottling_lines(ROWS, -1, 11, exponential=True)
WRONG = bottling_lines(WRONG_ROWS, +1, 7)


def prepare(sheet):
    set_values(sheet, "A1", [["bottles"] + LABELS] + DATA)   # A1:C81
    set_values(sheet, "A101", [["bottles"] + LABELS] + WRONG)  # A101:C141
    set_values(sheet, "Z1", [["bottles"] + LABELS] + EXPONENTIAL)  # Z1:AB81


CALC = module_session(prepare)
setUpModule, tearDownModule = CALC.start, CALC.stop


def design_and_response(data):
    import numpy as np
    array = np.array(data)
    return np.column_stack([np.ones(len(data)), np.log(array[:, 1]), np.log(array[:, 2])]), np.log(array[:, 0])


class FrontierTestCase(unittest.TestCase):

    def assert_close(self, value, expected, tolerance, what):
        self.assertIsInstance(value, float, "%s: expected a number, the cell shows %r" % (what, value))
        self.assertLessEqual(abs(value - expected), tolerance * abs(expected),
                             "%s: %r, expected %r (relative tolerance %g)" % (what, value, expected, tolerance))


class FrontierTableTest(FrontierTestCase):
    """PRODFRONTIER over 7 columns: Cobb-Douglas k + m + 16 = 18 rows for two inputs."""

    @classmethod
    def setUpClass(cls):
        set_array_formula(CALC.sheet, "E1:K18", "=PRODFRONTIER(A1:A81;B1:C81)")
        set_array_formula(CALC.sheet, "E21:K38", '=PRODFRONTIER(Z1:Z81;AA1:AB81;;"exponential")')
        set_array_formula(CALC.sheet, "E41:K58", "=PRODFRONTIER(A101:A141;B101:C141)")
        recalc(CALC.doc)
        cls.table = get_range(CALC.sheet, "E1:K18")
        cls.exponential = get_range(CALC.sheet, "E21:K38")
        cls.wrong = get_range(CALC.sheet, "E41:K58")

    def test_layout(self):
        self.assertEqual(self.table[0], ["half-normal frontier", "value", "std. error", "t", "p-value",
                                         "lower bound", "upper bound"])
        self.assertEqual([row[0] for row in self.table[1:]],
                         ["ln A"] + LABELS + ["", "noise SD", "inefficiency SD", "lambda", "observations",
                          "log-likelihood", "AIC", "BIC", "inefficiency test", "mean efficiency",
                          "returns to scale", "verdict", "convergence", "form"])
        rows = {row[0]: row for row in self.table[1:] if row[0]}
        self.assertEqual(rows["observations"][1], float(ROWS))
        self.assertEqual(rows["convergence"][1], "converged")
        self.assertEqual(rows["form"][1], "cobb-douglas")
        self.assertEqual(self.exponential[0][0], "exponential frontier")
        self.assertEqual(self.exponential[16][1], "converged")
        # The README's example shows this table rounded to 4 digits: it must stay what Calc computes.
        for row, shown in ((1, 1.845), (2, 0.5771), (3, 0.3499), (5, 0.1578), (6, 0.3195), (13, 0.7549)):
            self.assertAlmostEqual(self.exponential[row][1], shown, delta=5e-4 * abs(shown),
                                   msg="README example, row %s" % self.exponential[row][0])

    def test_maximum_against_scipy(self):
        import numpy as np
        from scipy import optimize, special, stats
        design, response = design_and_response(DATA)

        def negative(theta):
            e = response - design @ theta[:3]
            sv, su = math.exp(theta[3]), math.exp(theta[4])
            s = math.hypot(su, sv)
            value = -np.sum(math.log(2) - math.log(s) + stats.norm.logpdf(e / s) + special.log_ndtr(-e * su / (sv * s)))
            return value if np.isfinite(value) else 1e300

        b = np.linalg.lstsq(design, response, rcond=None)[0]
        best = None
        for sv, su in ((0.1, 0.2), (0.2, 0.4), (0.15, 0.35), (0.3, 0.1)):
            start = np.concatenate([b, [math.log(sv), math.log(su)]])
            start[0] += su * math.sqrt(2 / math.pi)
            found = optimize.minimize(negative, start, method="BFGS", options={"gtol": 1e-7})
            found = optimize.minimize(negative, found.x, method="Nelder-Mead",
                                      options={"xatol": 1e-10, "fatol": 1e-12, "maxfev": 20000})
            if best is None or found.fun < best.fun:
                best = found
        self.assert_close(self.table[9][1], -best.fun, MAXIMUM_TOLERANCE, "log-likelihood")  # scipy maximum
        self.assertAlmostEqual(self.table[6][1], math.exp(best.x[4]), delta=1e-3 * self.table[6][2],
                               msg="inefficiency SD within a thousandth of its standard error")  # scipy maximum

    def test_wrong_skew_gives_least_squares(self):
        import numpy as np
        design, response = design_and_response(WRONG)
        b = np.linalg.lstsq(design, response, rcond=None)[0]
        for row, value in zip(self.wrong[1:4], b):
            self.assert_close(row[1], value, LSTSQ_TOLERANCE, row[0])  # numpy lstsq
        self.assertEqual(self.wrong[6][1], 0.0)
        self.assertEqual(self.wrong[17][2], "no inefficiency found: residuals skewed the wrong way")


class EfficiencyTest(FrontierTestCase):

    @classmethod
    def setUpClass(cls):
        set_array_formula(CALC.sheet, "M1:S18", "=PRODFRONTIER(A1:A81;B1:C81)")
        set_array_formula(CALC.sheet, "U1:U81", "=PRODEFFICIENCY($M$1:$S$18;A1:A81;B1:C81)")
        set_array_formula(CALC.sheet, "V1:V81", '=PRODEFFICIENCY($M$1:$S$18;A1:A81;B1:C81;"lower bound")')
        set_array_formula(CALC.sheet, "W1:W81", '=PRODEFFICIENCY($M$1:$S$18;A1:A81;B1:C81;"upper bound")')
        set_array_formula(CALC.sheet, "X2", "=PRODEFFICIENCY($M$1:$S$18;A2;B2:C2)")
        set_array_formula(CALC.sheet, "M101:S122", "=PRODFRONTIER(A1:A81;B1:C81;;;;;TRUE())")
        set_array_formula(CALC.sheet, "U101:U181", "=PRODEFFICIENCY($M$101:$S$122;A1:A81;B1:C81)")
        recalc(CALC.doc)

    def test_the_covariance_block_is_read_past(self):
        """covariance TRUE: 18 + 1 + 3 rows; the block's diagonal is the squared standard errors of the
        table's own coefficient rows (1e-12), and PRODEFFICIENCY reads the table as without it."""
        table = get_range(CALC.sheet, "M101:S122")
        self.assertEqual(table[18][:4], ["covariance", "likelihood", "normal", 0.95])
        self.assertEqual([row[0] for row in table[19:22]], ["ln A"] + LABELS)
        for i in range(3):
            self.assert_close(table[19 + i][1 + i], table[1 + i][2] ** 2, FORMULA_TOLERANCE, "variance %d" % i)
            for j in range(3):  # symmetric up to the rounding of the inverse (the reader allows 1e-8)
                self.assertAlmostEqual(table[19 + i][1 + j], table[19 + j][1 + i], delta=1e-12 * table[19 + i][1 + i])
        self.assertEqual(get_range(CALC.sheet, "U101:U181"), [[row[0]] for row in get_range(CALC.sheet, "U1:U81")])

    def test_efficiency_column_against_the_formula(self):
        import numpy as np
        from scipy import special
        table = get_range(CALC.sheet, "M1:S18")
        b = np.array([table[1][1], table[2][1], table[3][1]])
        sv, su = table[5][1], table[6][1]
        design, response = design_and_response(DATA)
        e = response - design @ b
        s2 = sv * sv + su * su
        mu, s = -e * su * su / s2, su * sv / math.sqrt(s2)
        expected = np.exp(-mu + 0.5 * s * s + special.log_ndtr(mu / s - s) - special.log_ndtr(mu / s))
        column = get_range(CALC.sheet, "U1:W81")
        self.assertEqual(column[0], ["efficiency", "efficiency lower bound", "efficiency upper bound"])
        for row in range(ROWS):
            self.assert_close(column[row + 1][0], float(expected[row]), FORMULA_TOLERANCE, "row %d" % row)  # efficiency formula
            self.assertLessEqual(column[row + 1][1], column[row + 1][0])
            self.assertLessEqual(column[row + 1][0], column[row + 1][2])
        self.assert_close(get_cell(CALC.sheet, "X2"), float(expected[0]), FORMULA_TOLERANCE, "single row")


class FrontierBadInputTest(FrontierTestCase):

    def test_messages_name_argument_and_row(self):
        set_values(CALC.sheet, "A201", [["bottles"] + LABELS] + [row[:] for row in DATA[:20]])
        set_values(CALC.sheet, "A205", [[0.0]])
        set_values(CALC.sheet, "A231", [["bottles"] + LABELS] + [[row[0], row[1], 0.0] for row in DATA[:20]])
        set_array_formula(CALC.sheet, "E201:K218", "=PRODFRONTIER(A201:A221;B201:C221)")
        set_array_formula(CALC.sheet, "E231:K248", "=PRODFRONTIER(A231:A251;B231:C251)")
        set_array_formula(CALC.sheet, "E261:K278", "=PRODFRONTIER(A1:A5;B1:C5)")
        set_array_formula(CALC.sheet, "E281:K298", '=PRODFRONTIER(A1:A81;B1:C81;"ces")')
        set_array_formula(CALC.sheet, "E301:E310", "=PRODEFFICIENCY(A1:C10;A1:A10;B1:C10)")
        recalc(CALC.doc)
        self.assertEqual(get_cell(CALC.sheet, "E201"), "Error: output: row 5 is 0; logs need positive values")
        self.assertEqual(get_cell(CALC.sheet, "E231"), "Error: inputs: row 2, column 2 is 0; logs need positive values")
        self.assertEqual(get_cell(CALC.sheet, "E261"),
                         "Error: too few rows: output and inputs have 4 rows of data for 5 parameters of the frontier "
                         "(with noise SD and inefficiency SD); need at least 6")
        self.assertEqual(get_cell(CALC.sheet, "E281"),
                         'Error: form: a frontier takes "cobb-douglas" or "translog"; the ces form is not offered')
        self.assertTrue(get_cell(CALC.sheet, "E301").startswith("Error: model: is not a PRODFRONTIER table"))
        self.assertTrue(CALC.office.alive(), "the office stopped answering after the error cases")


class FunctionWizardTest(unittest.TestCase):

    def test_frontier_functions_are_listed_with_their_arguments(self):
        descriptions = CALC.office.service_manager.createInstanceWithContext(
            "com.sun.star.sheet.FunctionDescriptions", CALC.office.context)
        listed = {}
        for i in range(descriptions.getCount()):
            properties = {p.Name: p.Value for p in descriptions.getByIndex(i)}
            if properties.get("Name") in ("PRODFRONTIER", "PRODEFFICIENCY"):
                listed[properties["Name"]] = properties
        self.assertEqual(sorted(listed), ["PRODEFFICIENCY", "PRODFRONTIER"])
        self.assertIn("stochastic production frontier", listed["PRODFRONTIER"]["Description"])
        arguments = listed["PRODFRONTIER"]["Arguments"]
        self.assertEqual([a.Name for a in arguments],
                         ["output", "inputs", "form", "inefficiency", "level", "controls", "covariance"])
        self.assertEqual([a.IsOptional for a in arguments], [i >= 2 for i in range(7)])
        arguments = listed["PRODEFFICIENCY"]["Arguments"]
        self.assertEqual([a.Name for a in arguments], ["model", "output", "inputs", "what"])
        self.assertEqual([a.IsOptional for a in arguments], [i >= 3 for i in range(4)])


if __name__ == "__main__":
    unittest.main()
