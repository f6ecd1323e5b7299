"""The cost functions computed by a real headless LibreOffice Calc with the extension: PRODCOSTFIT's
tables, PRODCOST over a fitted and a typed cost model, PRODLEASTCOST, PRODEFFICIENTSCALE,
PRODPRICEELASTICITY and PRODREGULAR over cost models, bad input, and the Function Wizard's entries.

Run from the repository root with Debian's Python (the only one that imports uno), the package
isoquant_office on the path:
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
- "Cobb-Douglas demand elasticities": with cost shares s_j = b_j/nu and Allen elasticity 1, the
  conditional demand elasticities are s_j (i != j) and s_i - 1 (own) (Binswanger 1974, from memory).
- "scipy minimize_scalar": the average cost exp(ln C(y, w))/y of a typed translog cost model minimised
  over ln y by scipy.optimize.minimize_scalar (python3-scipy, bounded Brent, xatol 1e-12), recomputed
  here; Brent's minimum of a smooth function is located to about sqrt(machine epsilon) in ln y, so
  the output agrees to 1e-6 relative.
Formula recomputations agree to 1e-12 relative (the same logs and exponentials in another order).
- "numpy SUR": tests/reference/cost_sur_check.py's own restricted iterated SUR (numpy, restrictions
  through the bordered normal equations, in the unnormalised parameters), run here on the sheet's
  data; both iterations stop at 1e-10 relative change, so 1e-7 relative (as the C++ cross-check).
- Error messages: the wording in core/sheet/src/functions/cost_functions.cpp and numeric_range.cpp, which the
  add-in prefixes with "Error: ".
"""

import math
import random
import unittest

from isoquant_office import get_cell, get_range, recalc, set_array_formula, set_values

from .support import module_session

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


def laundry_shares():
    """Cost shares of each branch: the Cobb-Douglas dual's b_i/nu plus noise (SD 0.01, seeded), the
    last one 1 minus the others."""
    generator = random.Random(20261203)
    rows = []
    for _ in range(ROWS):
        first = [b / NU + generator.gauss(0, 0.01) for b in EXPONENTS[:2]]
        rows.append(first + [1 - sum(first)])
    return rows


SHARES = laundry_shares()
TYPED_COST = [["form", "cobb-douglas cost"],
              ["constant", math.log(NU) - math.log(SCALE) / NU - sum(b / NU * math.log(b) for b in EXPONENTS)],
              ["output", 1 / NU]] + [[label, b / NU] for label, b in zip(LABELS, EXPONENTS)]
TYPED_PRODUCTION = [["form", "cobb-douglas"], ["A", SCALE]] + [[label, b] for label, b in zip(LABELS, EXPONENTS)]
# An invented translog cost function of the chain, homogeneous in prices, average cost U-shaped.
TRANSLOG_COST = [["form", "translog cost"], ["constant", -1.5], ["output", 0.4], ["labour", 0.35], ["machines", 0.3],
                 ["energy", 0.35], ["output*output", 0.06], ["labour*labour", 0.04], ["labour*machines", -0.02],
                 ["labour*energy", -0.02], ["machines*machines", 0.03], ["machines*energy", -0.01],
                 ["energy*energy", 0.03], ["labour*output", 0.005], ["machines*output", -0.002],
                 ["energy*output", -0.003]]
WORDS = ["total", "marginal", "average", "cost elasticity", "returns to scale"]


def prepare(sheet):
    set_values(sheet, "A1", [["cost", "washes"] + LABELS] + DATA)  # A1:E31
    set_values(sheet, "G1", TYPED_COST)                            # G1:H6
    set_values(sheet, "G11", TYPED_PRODUCTION)                     # G11:H15
    set_values(sheet, "G21", TRANSLOG_COST)                        # G21:H36
    set_values(sheet, "AN1", [[label + " share" for label in LABELS]] + SHARES)  # AN1:AP31


CALC = module_session(prepare)
setUpModule, tearDownModule = CALC.start, CALC.stop


class CostTestCase(unittest.TestCase):

    def assert_close(self, value, expected, tolerance, what):
        self.assertIsInstance(value, float, "%s: expected a number, the cell shows %r" % (what, value))
        self.assertLessEqual(abs(value - expected), tolerance * abs(expected),
                             "%s: %r, expected %r (relative tolerance %g)" % (what, value, expected, tolerance))


class CostFitTableTest(CostTestCase):
    """PRODCOSTFIT over 7 columns: Cobb-Douglas k + 19 = 22 rows, translog 2k + k(k+1)/2 + 20 = 32."""

    @classmethod
    def setUpClass(cls):
        set_array_formula(CALC.sheet, "J1:P22", "=PRODCOSTFIT(A1:A31;B1:B31;C1:E31)")
        set_array_formula(CALC.sheet, "J31:P62", '=PRODCOSTFIT(A1:A31;B1:B31;C1:E31;"translog";;"hc3")')
        recalc(CALC.doc)
        cls.table = get_range(CALC.sheet, "J1:P22")
        cls.translog = get_range(CALC.sheet, "J31:P62")

    def test_cobb_douglas_layout(self):
        self.assertEqual(self.table[0], ["Cobb-Douglas cost fit", "value", "std. error", "t", "p-value",
                                         "lower bound", "upper bound"])
        self.assertEqual([row[0] for row in self.table[1:]],
                         ["constant", "output"] + LABELS + ["", "observations", "R2", "adjusted R2", "residual SD",
                          "F (slopes = 0)", "log-likelihood", "AIC", "BIC", "cost elasticity", "returns to scale",
                          "verdict", "efficient scale", "regularity", "form", "smearing factor"])
        rows = {row[0]: row for row in self.table[1:] if row[0]}
        self.assertEqual(rows["observations"][1], float(ROWS))
        self.assertEqual(rows["efficient scale"][1], "n/a")
        self.assertEqual(rows["form"][1], "cobb-douglas cost")
        self.assertIn("no efficient scale", rows["form"][2])
        self.assertIn(rows["verdict"][1], ("increasing", "constant", "decreasing"))
        # Positive price coefficients: every fitted share positive, M = s s' - diag(s) negative semidefinite.
        self.assertEqual(rows["regularity"][1:3], [0.0, "regular at every row"])

    def test_cobb_douglas_estimates_against_numpy(self):
        import numpy as np  # python3-numpy
        data = np.array(DATA)
        logs = np.log(data)
        relative = logs[:, 2:4] - logs[:, 4:5]
        design = np.column_stack([np.ones(ROWS), logs[:, 1], relative])
        b = np.linalg.lstsq(design, logs[:, 0] - logs[:, 4], rcond=None)[0]
        expected = list(b) + [1 - b[2] - b[3]]
        for row, value in zip(self.table[1:6], expected):
            self.assert_close(row[1], value, LSTSQ_TOLERANCE, row[0])  # numpy lstsq
        self.assert_close(self.table[15][1], b[1], LSTSQ_TOLERANCE, "cost elasticity = output coefficient")
        self.assert_close(self.table[16][1], 1 / b[1], LSTSQ_TOLERANCE, "returns to scale")

    def test_translog_layout(self):
        self.assertEqual(self.translog[0][0], "translog cost fit")
        pairs = ["%s*%s" % (LABELS[i], LABELS[j]) for i in range(3) for j in range(i, 3)]
        self.assertEqual([row[0] for row in self.translog[1:17]],
                         ["constant", "output"] + LABELS + ["output*output"] + pairs +
                         ["%s*output" % label for label in LABELS] + [""])
        self.assertEqual([row[0] for row in self.translog[-7:]],
                         ["cost elasticity", "returns to scale", "verdict", "efficient scale", "regularity", "form",
                          "smearing factor"])
        self.assertEqual(self.translog[-2][1], "translog cost")


class CostSharesTest(CostTestCase):
    """PRODCOSTFIT with shares: the cost and share equations by iterated SUR."""

    @classmethod
    def setUpClass(cls):
        set_array_formula(CALC.sheet, "AR1:AX32", '=PRODCOSTFIT(A1:A31;B1:B31;C1:E31;"translog";AN1:AP31)')
        set_array_formula(CALC.sheet, "AR41", '=PRODCOSTFIT(A1:A31;B1:B31;C1:E31;"translog";AN1:AO31)')
        recalc(CALC.doc)
        cls.table = get_range(CALC.sheet, "AR1:AX32")

    def test_estimates_against_numpy_sur(self):
        import numpy as np  # python3-numpy
        from ..reference import cost_sur_check
        data, shares = np.array(DATA), np.array(SHARES)
        design, share_designs, restrictions, targets = cost_sur_check.system(
            np, True, np.log(data[:, 1]), np.log(data[:, 2:5]))
        theta, covariance, _, llf = cost_sur_check.iterated_sur(
            np, [design] + share_designs[:2], [np.log(data[:, 0])] + [shares[:, 0], shares[:, 1]], restrictions, targets)
        for row, value, variance in zip(self.table[1:17], theta, np.diag(covariance)):
            self.assert_close(row[1], float(value), 1e-7, row[0])  # numpy SUR
            self.assert_close(row[2], math.sqrt(variance), 1e-7, row[0] + " std. error")  # numpy SUR
        rows = {row[0]: row for row in self.table[17:] if row[0]}
        self.assert_close(rows["log-likelihood"][1], llf, 1e-7, "system log-likelihood")  # numpy SUR

    def test_incomplete_rows_are_left_out(self):
        set_values(CALC.sheet, "AZ1", [["cost", "washes"] + LABELS] + [row[:] for row in DATA])  # AZ1:BD31
        set_values(CALC.sheet, "BA4", [[None]])  # row 4: a blank output
        set_array_formula(CALC.sheet, "BF1:BL23", "=PRODCOSTFIT(AZ1:AZ31;BA1:BA31;BB1:BD31;;;;;;;;;TRUE())")
        set_array_formula(CALC.sheet, "BF31", "=PRODCOSTFIT(AZ1:AZ31;BA1:BA31;BB1:BD31)")
        recalc(CALC.doc)
        rows = {row[0]: row for row in get_range(CALC.sheet, "BF1:BL23") if row[0]}
        self.assertEqual(rows["observations"][1], float(ROWS - 1))
        self.assertEqual(rows["incomplete rows dropped"][1], 1.0)
        self.assertEqual(get_cell(CALC.sheet, "BF31"), "Error: output: row 4 is empty; every cell must hold a number")

    def test_shares_must_match_the_prices(self):
        self.assertEqual(get_cell(CALC.sheet, "AR41"), "Error: shares: has 2 columns but input prices has 3; give one share "
                                                  "column per price, in the same order")


class CostModelTest(CostTestCase):
    """PRODCOST over the fitted table and over the typed dual, and for the production model."""

    @classmethod
    def setUpClass(cls):
        set_array_formula(CALC.sheet, "J81:P102", "=PRODCOSTFIT(A1:A31;B1:B31;C1:E31)")
        for column, word in zip("RSTUV", WORDS):
            set_array_formula(CALC.sheet, "%s2:%s6" % (column, column), '=PRODCOST($J$81:$P$102;B2:B6;C2:E6;"%s")' % word)
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
            self.assert_close(get_cell(CALC.sheet, "R%d" % (row + 2)), math.exp(log_cost), FORMULA_TOLERANCE,
                              "total, row %d" % row)  # cost-model formula
            self.assert_close(get_cell(CALC.sheet, "U%d" % (row + 2)), fitted[1][0], FORMULA_TOLERANCE, "elasticity")

    def test_typed_dual_and_production_model_agree(self):
        y, prices = DATA[0][1], DATA[0][2:]
        cost = dual_cost(y, prices)  # dual of Cobb-Douglas
        expected = [cost, cost / (NU * y), cost / y, 1 / NU, NU]
        for column, word, value in zip("RSTUV", WORDS, expected):
            self.assert_close(get_cell(CALC.sheet, "%s12" % column), value, FORMULA_TOLERANCE, "typed cost model " + word)
            self.assert_close(get_cell(CALC.sheet, "%s14" % column), value, FORMULA_TOLERANCE, "production model " + word)


    def test_production_model_gives_a_column_of_marginal_costs(self):
        for row in range(5):
            y, prices = DATA[row][1], DATA[row][2:]
            self.assert_close(get_cell(CALC.sheet, "W%d" % (row + 2)), dual_cost(y, prices) / (NU * y), FORMULA_TOLERANCE,
                              "marginal cost, row %d" % row)  # dual of Cobb-Douglas


class CostBadInputTest(CostTestCase):

    def test_messages_name_argument_and_row(self):
        set_values(CALC.sheet, "A41", [["cost", "washes"] + LABELS] + [row[:] for row in DATA[:10]])
        set_values(CALC.sheet, "A44", [[0.0]])
        set_array_formula(CALC.sheet, "J111:P132", "=PRODCOSTFIT(A41:A51;B41:B51;C41:E51)")
        set_array_formula(CALC.sheet, "J141:P162", "=PRODCOSTFIT(A1:A31;B1:B31;C1:E31;;;;;;;\"fixed\")")
        set_array_formula(CALC.sheet, "J171:P192", "=PRODCOSTFIT(A1:A31;B1:B30;C1:E31)")
        recalc(CALC.doc)
        self.assertEqual(get_cell(CALC.sheet, "J111"), "Error: cost: row 4 is 0; logs need positive values")
        self.assertEqual(get_cell(CALC.sheet, "J141"), "Error: effects: \"fixed\" needs the groups argument, a column naming each row's plant or firm")
        self.assertEqual(get_cell(CALC.sheet, "J171"), "Error: output: has 29 rows of data but cost has 30 rows")
        self.assertTrue(CALC.office.alive(), "the office stopped answering after the error cases")


def translog_log_cost(y, prices):
    """ln C of TRANSLOG_COST, written out from its rows (the cost-model formula)."""
    rows = dict((label, value) for label, value in TRANSLOG_COST[1:])
    ly, lw = math.log(y), [math.log(w) for w in prices]
    value = rows["constant"] + rows["output"] * ly + 0.5 * rows["output*output"] * ly * ly
    for i, a in enumerate(LABELS):
        value += rows[a] * lw[i] + rows[a + "*output"] * lw[i] * ly
        for j, b in enumerate(LABELS):
            key = "%s*%s" % (a, b) if i <= j else "%s*%s" % (b, a)
            value += 0.5 * rows[key] * lw[i] * lw[j]
    return value


class CostDecisionsTest(CostTestCase):
    """PRODLEASTCOST, PRODEFFICIENTSCALE, PRODPRICEELASTICITY and PRODREGULAR with cost models."""

    @classmethod
    def setUpClass(cls):
        set_array_formula(CALC.sheet, "R21:T21", "=PRODLEASTCOST($G$1:$H$6;B2;C2:E2)")
        set_array_formula(CALC.sheet, "R22:T22", "=PRODLEASTCOST($G$11:$H$15;B2;C2:E2)")
        set_values(CALC.sheet, "Y21", [[p] for p in DATA[0][2:]])  # Y21:Y23, the same prices as a column
        set_array_formula(CALC.sheet, "Z21:Z23", "=PRODLEASTCOST($G$1:$H$6;B2;Y21:Y23)")
        set_array_formula(CALC.sheet, "R24", "=PRODEFFICIENTSCALE($G$21:$H$36;C2:E2)")
        set_array_formula(CALC.sheet, "R25", "=PRODEFFICIENTSCALE($G$1:$H$6;C2:E2)")
        set_array_formula(CALC.sheet, "R26", "=PRODEFFICIENTSCALE($G$11:$H$15;C2:E2)")
        for column, (i, j) in zip("RSTUVW", [(1, 1), (1, 2), (1, 3), (2, 1), (2, 2), (3, 3)]):
            set_array_formula(CALC.sheet, "%s28" % column, '=PRODPRICEELASTICITY($G$1:$H$6;B2;C2:E2;%d;%d)' % (i, j))
        set_array_formula(CALC.sheet, "R29", '=PRODPRICEELASTICITY($G$11:$H$15;B2;C2:E2;"labour";"energy";"allen")')
        set_array_formula(CALC.sheet, "S29", '=PRODPRICEELASTICITY($G$1:$H$6;B2;C2:E2;"labour";"energy";"morishima")')
        set_array_formula(CALC.sheet, "R30:R34", '=PRODPRICEELASTICITY($G$21:$H$36;B2:B6;C2:E6;1;2;"allen")')
        set_array_formula(CALC.sheet, "R36:R41", "=PRODREGULAR($G$21:$H$36;B1:E6)")
        set_array_formula(CALC.sheet, "T36", '=PRODPRICEELASTICITY($G$21:$H$36;B2;C2:E2;1;2;"cross")')
        set_array_formula(CALC.sheet, "T37", "=PRODREGULAR($G$21:$H$36;C2:E6)")
        set_array_formula(CALC.sheet, "AB1:AH32", '=PRODCOSTFIT(A1:A31;B1:B31;C1:E31;"translog")')
        set_values(CALC.sheet, "AJ1", [[math.exp(sum(math.log(row[2 + i]) for row in DATA) / ROWS) for i in range(3)]])
        set_array_formula(CALC.sheet, "AJ2", "=PRODEFFICIENTSCALE(AB1:AH32;AJ1:AL1)")
        recalc(CALC.doc)

    def test_least_cost_from_a_cost_model_follows_the_prices(self):
        via_cost, via_production = get_range(CALC.sheet, "R21:T21")[0], get_range(CALC.sheet, "R22:T22")[0]
        y, prices = DATA[0][1], DATA[0][2:]
        for i, b in enumerate(EXPONENTS):
            expected = b / NU * dual_cost(y, prices) / prices[i]  # Shephard: share x cost / price, dual of Cobb-Douglas
            self.assert_close(via_cost[i], expected, FORMULA_TOLERANCE, "cost model, " + LABELS[i])
            self.assert_close(via_production[i], expected, FORMULA_TOLERANCE, "production model, " + LABELS[i])
            self.assert_close(get_cell(CALC.sheet, "Z%d" % (21 + i)), expected, FORMULA_TOLERANCE, "prices as a column")

    def test_efficient_scale_against_scipy(self):
        import numpy as np  # python3-numpy
        from scipy.optimize import minimize_scalar  # python3-scipy
        prices = DATA[0][2:]
        result = minimize_scalar(lambda ly: math.exp(translog_log_cost(math.exp(ly), prices) - ly),
                                 bounds=(-20.0, 40.0), method="bounded", options={"xatol": 1e-12})
        self.assertTrue(result.success)
        self.assert_close(get_cell(CALC.sheet, "R24"), float(np.exp(result.x)), 1e-6, "efficient scale")  # scipy
        # NU = 1.2: increasing returns, the cost elasticity 1/NU < 1 at every output.
        falls = "No efficient scale: average cost falls at every output in this model (increasing returns throughout)"
        self.assertEqual(get_cell(CALC.sheet, "R25"), falls)
        self.assertEqual(get_cell(CALC.sheet, "R26"), falls)

    def test_efficient_scale_at_geometric_mean_prices_is_the_table_row(self):
        row = [r for r in get_range(CALC.sheet, "AB1:AH32") if r[0] == "efficient scale"][0]
        self.assert_close(get_cell(CALC.sheet, "AJ2"), row[1], 1e-10, "efficient scale")  # the same formula, other logs

    def test_price_elasticities_of_the_cobb_douglas_dual(self):
        shares = [b / NU for b in EXPONENTS]
        expected = [shares[0] - 1, shares[1], shares[2], shares[0], shares[1] - 1, shares[2] - 1]
        for column, value in zip("RSTUVW", expected):  # Cobb-Douglas demand elasticities
            self.assert_close(get_cell(CALC.sheet, "%s28" % column), value, FORMULA_TOLERANCE, "demand " + column)
        self.assert_close(get_cell(CALC.sheet, "R29"), 1.0, 1e-10, "Allen from the production model")
        self.assert_close(get_cell(CALC.sheet, "S29"), 1.0, FORMULA_TOLERANCE, "Morishima from the cost model")

    def test_translog_allen_and_regularity(self):
        rows = dict((label, value) for label, value in TRANSLOG_COST[1:])
        for row in range(5):
            y, prices = DATA[row][1], DATA[row][2:]
            ly, lw = math.log(y), [math.log(w) for w in prices]
            s = [rows[a] + rows[a + "*output"] * ly + sum(
                rows["%s*%s" % ((a, b) if i <= j else (b, a))] * lw[j] for j, b in enumerate(LABELS))
                for i, a in enumerate(LABELS)]
            allen = (rows["labour*machines"] + s[0] * s[1]) / (s[0] * s[1])  # translog Allen, cost-model formula
            self.assert_close(get_cell(CALC.sheet, "R%d" % (30 + row)), allen, FORMULA_TOLERANCE, "Allen, row %d" % row)
        self.assertEqual(get_cell(CALC.sheet, "R36"), "regularity")
        self.assertEqual([get_cell(CALC.sheet, "R%d" % r) for r in range(37, 42)], ["regular"] * 5)

    def test_bad_input(self):
        self.assertEqual(get_cell(CALC.sheet, "T36"), "Error: kind: 'cross' is not a kind; use \"demand\", \"allen\" or "
                                                 "\"morishima\"")
        self.assertEqual(get_cell(CALC.sheet, "T37"), "Error: inputs: has 3 columns; with a cost model give the output and "
                                                 "then one price per input (4 columns)")


class FunctionWizardTest(unittest.TestCase):

    def test_prodcostfit_is_listed_with_its_arguments(self):
        descriptions = CALC.office.service_manager.createInstanceWithContext(
            "com.sun.star.sheet.FunctionDescriptions", CALC.office.context)
        listed = {}
        for i in range(descriptions.getCount()):
            properties = {p.Name: p.Value for p in descriptions.getByIndex(i)}
            if properties.get("Name") in ("PRODCOSTFIT", "PRODCOST", "PRODEFFICIENTSCALE", "PRODPRICEELASTICITY"):
                listed[properties["Name"]] = properties
        self.assertEqual(sorted(listed), ["PRODCOST", "PRODCOSTFIT", "PRODEFFICIENTSCALE", "PRODPRICEELASTICITY"])
        self.assertEqual([a.Name for a in listed["PRODEFFICIENTSCALE"]["Arguments"]], ["model", "input prices", "what"])
        elasticity = listed["PRODPRICEELASTICITY"]["Arguments"]
        self.assertEqual([a.Name for a in elasticity], ["model", "output", "input prices", "input i", "input j", "kind"])
        self.assertEqual([a.IsOptional for a in elasticity], [False] * 5 + [True])
        self.assertIn("cost function", listed["PRODCOSTFIT"]["Description"])
        arguments = listed["PRODCOSTFIT"]["Arguments"]
        self.assertEqual([a.Name for a in arguments],
                         ["cost", "output", "input prices", "form", "shares", "errors", "level", "controls", "groups",
                          "effects", "trend", "incomplete rows", "inefficiency", "covariance"])
        self.assertEqual([a.IsOptional for a in arguments], [i >= 3 for i in range(14)])
        self.assertIn("cost elasticity", listed["PRODCOST"]["Description"])


if __name__ == "__main__":
    unittest.main()
