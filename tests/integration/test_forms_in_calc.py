"""The ces and translog forms, PRODREGULAR and PRODCOMPARE computed by a real headless Calc.

Run from the repository root with Debian's Python, the package isoquant_office on the path (see
tests/integration/README.md):
    PYTHONPATH=addin/python /usr/bin/python3 -m unittest -v tests/integration/test_forms_in_calc.py

One office with the extension serves the whole module. Sources of the expected figures, named
beside each check:
- "Cobb & Douglas (1928)": tests/data/cobb_douglas_1928.csv (Tables II and III of the paper).
- "rice farms": tests/data/rice_farms_panel.csv, Feng and Horrace (2012) as in plm 2.6 (RiceFarms).
- "scipy/statsmodels": the figures tests/reference/forms_check.py computes (python3-scipy 1.10.1
  least_squares for ces, python3-statsmodels 0.13.5 OLS for translog), recomputed here at test
  time; skipped as subtests when they cannot be imported. Tolerances as in
  tests/unit/test_forms_cross_check.cpp, where they are justified.
- "function formula": the CES and translog formulas evaluated here from the table's own numbers
  (1e-12 relative: the same expression in another order).
- Error messages: the wording in core/sheet/src/ and core/math/src/, which the add-in prefixes with "Error: ".
- "invented": seeded data made here (invented_rows) to reach a ces boundary and a fit that is not
  identified; the checks there are the words of the report, not figures.
"""

import math
import random
import unittest

from isoquant_office import get_cell, get_range, recalc, set_array_formula, set_formula, set_values

from .fit_checks import COLUMNS, FORMULA_RELATIVE, error
from .support import CalcTestCase, module_session, read_columns, row_of, skip_missing_reference, write_columns

try:  # reference libraries; their checks are skipped when these are missing (failed
    # under ISOQUANT_REQUIRE_REFERENCES=1)
    import numpy as np
    import statsmodels.api as sm
    from scipy import optimize, stats
    from ..reference import forms_check
except ImportError:
    np = sm = optimize = stats = forms_check = None

CALC = module_session()
setUpModule, tearDownModule = CALC.start, CALC.stop


def reference_figures(form, y, inputs):
    """{(quantity, index): value} from tests/reference/forms_check.py for one form."""
    figures = {}

    def put(_form, quantity, values):
        for index, value in enumerate(np.atleast_1d(values)):
            figures[(quantity, index)] = float(value)

    if form == "ces":
        forms_check.ces_figures(np, optimize, put, np.array(y), np.array(inputs[0]), np.array(inputs[1]))
    else:
        forms_check.translog_figures(np, sm, put, np.array(y), [np.array(x) for x in inputs])
    return figures


def ces_output(table, x):
    """Y = A [delta x1^-rho + (1 - delta) x2^-rho]^(-nu/rho), from the table's own numbers."""
    ln_a, delta, rho, nu = (row_of(table, label)[1] for label in ["ln A", "delta", "rho", "nu"])
    s = delta * x[0] ** -rho + (1 - delta) * x[1] ** -rho
    return math.exp(ln_a) * s ** (-nu / rho), s


def ces_marginal(table, x, i):
    """dY/dx_i = nu * w_i * x_i^(-rho-1) * Y / S with w = (delta, 1 - delta)."""
    delta, rho, nu = (row_of(table, label)[1] for label in ["delta", "rho", "nu"])
    y, s = ces_output(table, x)
    weight = delta if i == 0 else 1 - delta
    return nu * weight * x[i] ** (-rho - 1) * y / s


def translog_parts(table, labels):
    """alpha_0, alpha_i and the symmetric beta_ij of a translog table, by the row labels."""
    alpha = [row_of(table, label)[1] for label in labels]
    beta = [[row_of(table, "%s*%s" % (labels[min(i, j)], labels[max(i, j)]))[1] for j in range(len(labels))]
            for i in range(len(labels))]
    return row_of(table, "ln A")[1], alpha, beta


def translog_elasticity(table, labels, x, i):
    _, alpha, beta = translog_parts(table, labels)
    return alpha[i] + math.fsum(beta[i][j] * math.log(x[j]) for j in range(len(labels)))


def translog_output(table, labels, x):
    ln_a, alpha, beta = translog_parts(table, labels)
    logs = [math.log(v) for v in x]
    k = len(labels)
    return math.exp(ln_a + math.fsum(alpha[i] * logs[i] for i in range(k))
                    + 0.5 * math.fsum(beta[i][j] * logs[i] * logs[j] for i in range(k) for j in range(k)))


class FormsTestCase(CalcTestCase):
    def need_reference(self):
        if forms_check is None:
            skip_missing_reference(self, "python3-scipy/statsmodels/numpy not importable")


class CesTest(FormsTestCase):
    """PRODFIT "ces" on Cobb & Douglas (1928), the evaluators on its table and on a typed model."""

    @classmethod
    def setUpClass(cls):
        cls.data = read_columns("cobb_douglas_1928.csv", ["P", "L", "C"])
        cls.sheet = CALC.new_sheet("Ces")
        write_columns(cls.sheet, "A1", cls.data, ["P", "L", "C"])
        # The ces table is always 20 x 7 (core/sheet/include/isoquant/sheet/tables/form_tables.hpp).
        set_array_formula(cls.sheet, "F1:L20", '=PRODFIT(A1:A25;B1:C25;"ces")')
        for column, formula in zip("NOPQR", ['PRODOUTPUT($F$1:$L$20;B{r}:C{r})',
                                             'PRODMARGINAL($F$1:$L$20;B{r}:C{r};"L")',
                                             'PRODMARGINAL($F$1:$L$20;B{r}:C{r};2)',
                                             'PRODELASTICITY($F$1:$L$20;B{r}:C{r};"C")',
                                             'PRODSCALE($F$1:$L$20;B{r}:C{r})']):
            for r in range(2, 26):
                set_formula(cls.sheet, "%s%d" % (column, r), "=" + formula.format(r=r))
        set_formula(cls.sheet, "T1", '=PRODSTAT(A1:A25;B1:C25;"sigma";"std. error";"ces")')
        set_formula(cls.sheet, "T2", '=PRODSTAT(A1:A25;B1:C25;"convergence";;"ces")')
        set_formula(cls.sheet, "T3", "=PRODRETURNS($F$1:$L$20)")
        set_array_formula(cls.sheet, "U2:U25", "=PRODREGULAR($F$1:$L$20;B2:C25)")
        # A typed ces model: sigma instead of rho, and an inputs row naming the inputs.
        set_values(cls.sheet, "W1", [["form", "ces", None], ["A", 1.5, None], ["delta", 0.3, None],
                                     ["sigma", 0.5, None], ["nu", 0.9, None], ["inputs", "hours", "machines"]])
        set_formula(cls.sheet, "W8", "=PRODOUTPUT(W1:Y6;B2:C2)")
        set_formula(cls.sheet, "W9", '=PRODMARGINAL(W1:Y6;B2:C2;"machines")')
        set_formula(cls.sheet, "W10", "=PRODSCALE(W1:Y6)")
        set_formula(cls.sheet, "W11", "=PRODREGULAR(W1:Y6;B2:C2)")
        recalc(CALC.doc)
        cls.table = get_range(cls.sheet, "F1:L20")

    def test_layout(self):
        labels = [row[0] for row in self.table]
        # Blank cells of a formula result read as "" (isoquant_office.get_range).
        self.assertEqual(labels, ["ces fit", "ln A", "delta", "rho", "nu", "sigma", "", "observations", "R2",
                                  "adjusted R2", "residual SD", "log-likelihood", "AIC", "BIC",
                                  "returns to scale", "verdict", "form", "convergence", "inputs", "smearing factor"])
        self.assertEqual(self.table[0], ["ces fit"] + COLUMNS)
        for row in self.table[1:6]:
            for value in row[1:3]:
                self.assert_number(value, row[0])
        self.assertEqual(row_of(self.table, "sigma")[3:5], ["", ""])
        self.assertEqual(row_of(self.table, "form")[1:3], ["ces", ""])
        self.assertEqual(row_of(self.table, "convergence")[1], "converged")
        self.assertEqual(row_of(self.table, "inputs")[1:3], ["L", "C"])
        self.assertEqual(row_of(self.table, "observations")[1], 24.0)  # 1899-1922
        # sigma = 1 / (1 + rho) and the returns to scale are nu.
        rho = row_of(self.table, "rho")[1]
        self.assert_relative(row_of(self.table, "sigma")[1], 1 / (1 + rho), FORMULA_RELATIVE, "sigma")
        self.assertEqual(row_of(self.table, "returns to scale")[1], row_of(self.table, "nu")[1])

    def test_against_scipy(self):
        with self.subTest("scipy least_squares"):
            self.need_reference()
            figures = reference_figures("ces", self.data["P"], [self.data["L"], self.data["C"]])
            for index, label in enumerate(["ln A", "delta", "rho", "nu"]):
                self.assert_relative(row_of(self.table, label)[1], figures[("params", index)], 1e-6, label)
                self.assert_relative(row_of(self.table, label)[2], figures[("bse", index)], 1e-5, label + " se")
            self.assert_relative(row_of(self.table, "sigma")[2], figures[("sigma_se", 0)], 1e-5, "sigma se")
            for label, quantity in [("R2", "rsquared"), ("log-likelihood", "llf"), ("AIC", "aic"), ("BIC", "bic")]:
                self.assert_relative(row_of(self.table, label)[1], figures[(quantity, 0)], 1e-9, label)

    def test_prodstat_and_returns(self):
        self.assertEqual(get_cell(self.sheet, "T1"), row_of(self.table, "sigma")[2])
        self.assertEqual(get_cell(self.sheet, "T2"), "converged")
        # The F of nu = 1 has p above 0.05 on these data (the table's own p-value is checked).
        self.assertGreater(row_of(self.table, "returns to scale")[4], 0.05)
        self.assertEqual(get_cell(self.sheet, "T3"), "constant")

    def test_evaluators_follow_the_function_formula(self):
        for r in range(2, 26):
            x = (self.data["L"][r - 2], self.data["C"][r - 2])
            y, _ = ces_output(self.table, x)
            with self.subTest(row=r):
                self.assert_relative(get_cell(self.sheet, "N%d" % r), y, FORMULA_RELATIVE, "PRODOUTPUT")
                self.assert_relative(get_cell(self.sheet, "O%d" % r), ces_marginal(self.table, x, 0), FORMULA_RELATIVE,
                                     "PRODMARGINAL L")
                self.assert_relative(get_cell(self.sheet, "P%d" % r), ces_marginal(self.table, x, 1), FORMULA_RELATIVE,
                                     "PRODMARGINAL 2")
                self.assert_relative(get_cell(self.sheet, "Q%d" % r), ces_marginal(self.table, x, 1) * x[1] / y,
                                     FORMULA_RELATIVE, "PRODELASTICITY C")
                self.assertEqual(get_cell(self.sheet, "R%d" % r), row_of(self.table, "nu")[1])

    def test_regularity_phrases(self):
        # delta in (0, 1), rho > -1 and nu > 0: every marginal product positive and the isoquants
        # convex, so every row is regular.
        self.assertGreater(row_of(self.table, "rho")[1], -1)
        self.assertEqual([row[0] for row in get_range(self.sheet, "U2:U25")], ["regular"] * 24)

    def test_typed_model(self):
        x = (self.data["L"][0], self.data["C"][0])
        rho = 1 / 0.5 - 1
        s = 0.3 * x[0] ** -rho + 0.7 * x[1] ** -rho
        y = 1.5 * s ** (-0.9 / rho)
        self.assert_relative(get_cell(self.sheet, "W8"), y, FORMULA_RELATIVE, "typed PRODOUTPUT")
        self.assert_relative(get_cell(self.sheet, "W9"), 0.9 * 0.7 * x[1] ** (-rho - 1) * y / s, FORMULA_RELATIVE,
                             "typed PRODMARGINAL machines")
        self.assertEqual(get_cell(self.sheet, "W10"), 0.9)
        self.assertEqual(get_cell(self.sheet, "W11"), "regular")


class TranslogTest(FormsTestCase):
    """PRODFIT "translog" on the rice farms (four inputs) and the evaluators on its table."""

    LABELS = ["size", "totlabor", "seed", "urea"]

    @classmethod
    def setUpClass(cls):
        cls.data = read_columns("rice_farms_panel.csv", ["goutput"] + cls.LABELS)
        cls.sheet = CALC.new_sheet("Translog")
        write_columns(cls.sheet, "A1", cls.data, ["goutput"] + cls.LABELS)
        # 2k + k(k+1)/2 + 16 = 8 + 10 + 16 = 34 rows for four inputs.
        set_array_formula(cls.sheet, "H1:N34", '=PRODFIT(A1:A1027;B1:E1027;"translog")')
        set_array_formula(cls.sheet, "P2:P11", '=PRODELASTICITY($H$1:$N$34;B2:E11;"seed")')
        set_array_formula(cls.sheet, "Q2:Q11", "=PRODMARGINAL($H$1:$N$34;B2:E11;1)")
        set_array_formula(cls.sheet, "R2:R11", "=PRODSCALE($H$1:$N$34;B2:E11)")
        set_array_formula(cls.sheet, "S2:S11", "=PRODOUTPUT($H$1:$N$34;B2:E11)")
        set_array_formula(cls.sheet, "T2:T11", "=PRODREGULAR($H$1:$N$34;B2:E11)")
        set_formula(cls.sheet, "V1", '=PRODSTAT(A1:A1027;B1:E1027;"Cobb-Douglas test";"p-value";"translog")')
        set_formula(cls.sheet, "V2", "=PRODRETURNS($H$1:$N$34)")
        recalc(CALC.doc)
        cls.table = get_range(cls.sheet, "H1:N34")

    def test_layout(self):
        pairs = ["%s*%s" % (a, b) for i, a in enumerate(self.LABELS) for b in self.LABELS[i:]]
        expected = (["translog fit", "ln A"] + self.LABELS + pairs + ["", "observations", "R2", "adjusted R2",
                                                             "residual SD", "F (slopes = 0)", "log-likelihood",
                                                             "AIC", "BIC"]
                    + ["elasticity " + label for label in self.LABELS]
                    + ["returns to scale", "verdict", "Cobb-Douglas test", "form", "smearing factor"])
        self.assertEqual([row[0] for row in self.table], expected)
        self.assertEqual(row_of(self.table, "form")[1], "translog")
        self.assertEqual(row_of(self.table, "observations")[1], 1026.0)
        self.assertEqual(row_of(self.table, "Cobb-Douglas test")[1:3], ["", ""])
        self.assert_number(row_of(self.table, "Cobb-Douglas test")[3], "Cobb-Douglas test F")

    def test_against_statsmodels(self):
        with self.subTest("statsmodels OLS"):
            self.need_reference()
            figures = reference_figures("translog", self.data["goutput"], [self.data[n] for n in self.LABELS])
            pairs = ["%s*%s" % (a, b) for i, a in enumerate(self.LABELS) for b in self.LABELS[i:]]
            for index, label in enumerate(["ln A"] + self.LABELS + pairs):
                self.assert_relative(row_of(self.table, label)[1], figures[("params", index)], 1e-8, label)
                self.assert_relative(row_of(self.table, label)[2], figures[("bse", index)], 1e-8, label + " se")
            for index, label in enumerate(self.LABELS):
                row = row_of(self.table, "elasticity " + label)
                self.assert_relative(row[1], figures[("elasticity", index)], 1e-8, "elasticity " + label)
                self.assert_relative(row[2], figures[("elasticity_se", index)], 1e-8, "elasticity se " + label)
            returns = row_of(self.table, "returns to scale")
            self.assert_relative(returns[1], figures[("nu", 0)], 1e-8, "nu")
            self.assert_relative(returns[2], figures[("nu_se", 0)], 1e-8, "nu se")
            self.assert_relative(returns[3], figures[("nu_fvalue", 0)], 1e-8, "F of nu = 1")
            self.assert_relative(row_of(self.table, "Cobb-Douglas test")[3], figures[("cd_fvalue", 0)], 1e-8, "Cobb-Douglas test F")
            self.assert_relative(get_cell(self.sheet, "V1"), figures[("cd_pvalue", 0)], 1e-8, "Cobb-Douglas test p")

    def test_evaluators_follow_the_function_formula(self):
        for r in range(2, 12):
            x = [self.data[n][r - 2] for n in self.LABELS]
            y = translog_output(self.table, self.LABELS, x)
            elasticities = [translog_elasticity(self.table, self.LABELS, x, i) for i in range(4)]
            with self.subTest(row=r):
                self.assert_relative(get_cell(self.sheet, "P%d" % r), elasticities[2], 1e-12, "PRODELASTICITY seed")
                self.assert_relative(get_cell(self.sheet, "Q%d" % r), elasticities[0] * y / x[0], FORMULA_RELATIVE,
                                     "PRODMARGINAL size")
                self.assert_relative(get_cell(self.sheet, "R%d" % r), math.fsum(elasticities), 1e-12, "PRODSCALE")
                self.assert_relative(get_cell(self.sheet, "S%d" % r), y, FORMULA_RELATIVE, "PRODOUTPUT")
                phrase = get_cell(self.sheet, "T%d" % r)
                self.assertIsInstance(phrase, str)
                # Every marginal product that is not positive, and only those, is named first.
                first_clause = phrase.split(";")[0] if phrase.startswith("marginal") else ""
                for label, elasticity in zip(self.LABELS, elasticities):
                    self.assertEqual(elasticity <= 0, label in first_clause, "%s in %r" % (label, phrase))

    def test_returns_verdict_at_the_mean(self):
        self.assertIn(get_cell(self.sheet, "V2"), ["increasing", "constant", "decreasing"])
        self.assertEqual(get_cell(self.sheet, "V2"), row_of(self.table, "verdict")[1])


class CompareTest(FormsTestCase):
    """PRODCOMPARE on Cobb & Douglas (1928)."""

    @classmethod
    def setUpClass(cls):
        cls.data = read_columns("cobb_douglas_1928.csv", ["P", "L", "C"])
        cls.sheet = CALC.new_sheet("Compare")
        write_columns(cls.sheet, "A1", cls.data, ["P", "L", "C"])
        set_array_formula(cls.sheet, "F1:L8", "=PRODCOMPARE(A1:A25;B1:C25)")
        set_array_formula(cls.sheet, "F11:L33", '=PRODFIT(A1:A25;B1:C25;"translog")')
        set_formula(cls.sheet, "N1", "=PRODSTAT(A1:A25;B1:C25;\"log-likelihood\")")
        set_formula(cls.sheet, "N2", "=PRODSTAT(A1:A25;B1:C25;\"log-likelihood\";;\"ces\")")
        recalc(CALC.doc)
        cls.table = get_range(cls.sheet, "F1:L8")

    def test_layout_and_ranks(self):
        self.assertEqual(self.table[0], ["form", "parameters", "log-likelihood", "AIC", "BIC", "AIC rank", "BIC rank"])
        self.assertEqual([row[0] for row in self.table], ["form", "cobb-douglas", "ces", "translog", "",
                                                          "nested test", "translog vs cobb-douglas",
                                                          "ces vs cobb-douglas"])
        self.assertEqual([row[1] for row in self.table[1:4]], [3.0, 4.0, 6.0])
        for column in (5, 6):
            self.assertEqual(sorted(row[column] for row in self.table[1:4]), [1.0, 2.0, 3.0])
        aic = [row[3] for row in self.table[1:4]]
        self.assertEqual(self.table[1 + aic.index(min(aic))][5], 1.0)

    def test_nested_tests(self):
        translog = get_range(self.sheet, "F11:L33")
        self.assertEqual(self.table[6][1], row_of(translog, "Cobb-Douglas test")[3])
        self.assertEqual(self.table[6][5], "F")
        # LR = 2 (LL_ces - LL_cd), from the two PRODSTAT cells.
        self.assert_relative(self.table[7][1], 2 * (get_cell(self.sheet, "N2") - get_cell(self.sheet, "N1")),
                             1e-9, "likelihood ratio")
        self.assertEqual(self.table[7][2:6], [1.0, "", self.table[7][4], "chi-squared"])
        with self.subTest("scipy chi2"):
            self.need_reference()
            self.assert_relative(self.table[7][4], float(stats.chi2.sf(self.table[7][1], 1)), 1e-12, "LR p-value")
        # Cobb & Douglas (1928) is not rejected by either test at 5% (p-values in the table).
        self.assertEqual([self.table[6][6], self.table[7][6]], ["cobb-douglas not rejected"] * 2)


def invented_rows(seed, n, log_output):
    """Invented data (Python's random.Random(seed), so the same rows on every run): x1 and x2
    log-uniform on [1, 100], then Y = exp(log_output(x1, x2) + N(0, noise^2)) with the noise the
    function's second value."""
    rng = random.Random(seed)
    rows = []
    for _ in range(n):
        x1 = math.exp(rng.uniform(0.0, math.log(100.0)))
        x2 = math.exp(rng.uniform(0.0, math.log(100.0)))
        mean, noise = log_output(x1, x2)
        rows.append([math.exp(mean + rng.gauss(0.0, noise)), x1, x2])
    return rows


def outside_ces(x1, x2):
    """A Cobb-Douglas with exponents 0.8 and -0.15: no CES with delta in [0, 1] has a negative
    elasticity, so the ces optimum lies on delta = 1."""
    return 0.2 + 0.8 * math.log(x1) - 0.15 * math.log(x2), 0.05


def near_fixed_proportions(x1, x2):
    """A CES at rho = 50 (delta 0.4, nu 0.9): on these 40 rows the optimum runs out on a ridge
    toward fixed proportions, where J'J is singular to rounding."""
    return 0.5 - 0.9 / 50 * math.log(0.4 * x1 ** -50 + 0.6 * x2 ** -50), 0.025


class CesWithoutTestTest(FormsTestCase):
    """Where the ces fit has no test of nu = 1, its verdict and PRODRETURNS say so; a constant
    input is refused as Cobb-Douglas refuses it. Expected words: core/math/src/fits/ces_inference.cpp,
    ces_table.cpp and production_fit.cpp."""

    @classmethod
    def setUpClass(cls):
        cls.sheet = CALC.new_sheet("CesWithoutTest")
        set_values(cls.sheet, "A1", [["y", "a", "b"]] + invented_rows(1, 60, outside_ces))
        set_array_formula(cls.sheet, "E1:K20", '=PRODFIT(A1:A61;B1:C61;"ces")')
        set_formula(cls.sheet, "M1", "=PRODRETURNS(E1:K20)")
        ridge = invented_rows(3, 40, near_fixed_proportions)
        set_values(cls.sheet, "A70", [["y", "a", "b"]] + ridge)
        set_array_formula(cls.sheet, "E70:K89", '=PRODFIT(A70:A110;B70:C110;"ces")')
        set_formula(cls.sheet, "M70", "=PRODRETURNS(E70:K89)")
        set_formula(cls.sheet, "M71", "=PRODOUTPUT(E70:K89;B71:C71)")
        set_array_formula(cls.sheet, "E92:K99", "=PRODCOMPARE(A70:A110;B70:C110)")
        # The same output and first input with the second input constant in all 40 rows.
        set_values(cls.sheet, "O70", [["y", "a", "b"]] + [[y, a, 7.5] for y, a, _ in ridge])
        set_array_formula(cls.sheet, "S70:Y89", '=PRODFIT(O70:O110;P70:Q110;"ces")')
        set_array_formula(cls.sheet, "S91:Y108", "=PRODFIT(O70:O110;P70:Q110)")
        set_array_formula(cls.sheet, "S110:Y117", "=PRODCOMPARE(O70:O110;P70:Q110)")
        recalc(CALC.doc)
        cls.boundary = get_range(cls.sheet, "E1:K20")
        cls.ridge = get_range(cls.sheet, "E70:K89")

    def test_boundary_verdict_and_prodreturns(self):
        self.assertEqual(row_of(self.boundary, "delta")[1:3], [1.0, "boundary"])
        self.assertEqual(row_of(self.boundary, "verdict")[1], "not tested (boundary)")
        self.assertEqual(get_cell(self.sheet, "M1"), "not tested (boundary)")
        # rho is not identified at delta = 1, so neither is sigma.
        self.assertEqual(row_of(self.boundary, "sigma")[1:7], ["n/a", "n/a", "", "", "n/a", "n/a"])
        self.assertEqual(row_of(self.boundary, "returns to scale")[2:5], ["n/a", "n/a", "n/a"])
        self.assertIn("boundary delta = 1", row_of(self.boundary, "form")[2])

    def test_not_identified_status(self):
        self.assertEqual(row_of(self.ridge, "convergence")[1], "not identified")
        self.assertIn("not identified", row_of(self.ridge, "form")[2])
        self.assertEqual(row_of(self.ridge, "verdict")[1], "not tested (not identified)")
        self.assertEqual(row_of(self.ridge, "rho")[2], "n/a")
        self.assertEqual(get_cell(self.sheet, "M70"), "not tested (not identified)")
        self.assert_message(get_cell(self.sheet, "M71"), error(
            "model: the fit is not identified; its estimates are one optimum of many, so they are not used"),
            "PRODOUTPUT of a table not identified")
        comparison = get_range(self.sheet, "E92:K99")
        self.assertEqual(row_of(comparison, "ces vs cobb-douglas")[1], "n/a: the ces fit is not identified")

    def test_constant_second_input_refused_as_by_cobb_douglas(self):
        message = error("inputs: 'b' does not vary, so it cannot be told apart from ln A")
        for what, target in [("ces", "S70:Y89"), ("cobb-douglas", "S91:Y108"), ("PRODCOMPARE", "S110:Y117")]:
            with self.subTest(what):
                result = get_range(self.sheet, target)
                self.assert_message(result[0][0], message, what)
                self.assertEqual([v for row in result for v in row if isinstance(v, float)], [], what)


ERROR_CASES = [
    # (what, formula over the sheet below, entered over, message)
    ("ces with three inputs", '=PRODFIT(A1:A25;B1:D25;"ces")', "H1:N19",
     error("inputs: the ces form takes exactly two inputs; this range has 3 columns")),
    ("ces with a control", '=PRODFIT(A1:A25;B1:C25;"ces";;;;D1:D25)', "H21:N39",
     error("controls: the ces form takes no controls; leave the argument empty")),
    ("ces with hc1 errors", '=PRODFIT(A1:A25;B1:C25;"ces";;"hc1")', "H41:N59",
     error("errors: the ces form reports classical standard errors only; leave the argument empty")),
    ("translog with an input labelled with *", '=PRODFIT(A1:A25;E1:F25;"translog")', "H61:N83",
     error("inputs: column 1 is labelled 'a*b'; the translog table joins labels with \"*\", so rename it")),
    ("ces with too few rows", '=PRODFIT(A1:A5;B1:C5;"ces")', "H85:N103",
     error("too few rows: output and inputs have 4 rows of data for 4 parameters to estimate; need at least 5")),
    ("typed ces model without delta", "=PRODOUTPUT(P1:Q4;B2:C2)", "P20",
     error('model: a ces model needs a "delta" row (the weight of the first input)')),
    ("typed translog model without a pair", "=PRODOUTPUT(P6:Q10;B2:C2)", "P21",
     error('model: a translog model needs a row "a*b" (0 when absent)')),
    ("PRODSCALE of a translog without inputs", "=PRODSCALE(P6:Q12)", "P22",
     error("inputs: this model's returns to scale vary with the inputs; give a row of inputs")),
    ("PRODREGULAR with three columns for two inputs", "=PRODREGULAR(P13:Q16;B2:D2)", "P23",
     error("inputs: has 3 columns but the model has 2 inputs")),
    ("PRODCOMPARE with level as text", '=PRODCOMPARE(A1:A25;B1:C25;"high")', "H105:N112",
     error("level: 'high' is not a confidence level; give a number between 0 and 1, such as 0.95")),
    ("PRODCOMPARE with text in output", "=PRODCOMPARE(G1:G25;B1:C25)", "H114:N121",
     error("output: row 3 holds text 'n.a.'; every cell must hold a number")),
]


class FormErrorTest(FormsTestCase):
    """Bad input to the new forms and functions: the exact message, no number, office alive."""

    def test_error_cases_then_office_alive(self):
        sheet = CALC.new_sheet("FormErrors")
        data = read_columns("cobb_douglas_1928.csv", ["P", "L", "C"])
        rows = [["P", "L", "C", "year", "a*b", "b", "P2"]]
        for i, (p, l, c) in enumerate(zip(data["P"], data["L"], data["C"])):
            rows.append([p, l, c, 1899.0 + i, l, c, "n.a." if i == 1 else p])
        set_values(sheet, "A1", rows)
        set_values(sheet, "P1", [["form", "ces"], ["A", 1.0], ["rho", 0.5], ["nu", 1.0], [None, None],
                                 ["form", "translog"], ["A", 1.0], ["a", 0.5], ["b", 0.4], ["a*a", -0.2],
                                 ["a*b", 0.1], ["b*b", -0.1], ["form", "cobb-douglas"], ["A", 1.0], ["a", 0.5],
                                 ["b", 0.4]])
        for _, formula, target, _ in ERROR_CASES:
            if ":" in target:
                set_array_formula(sheet, target, formula)
            else:
                set_formula(sheet, target, formula)
        recalc(CALC.doc)
        for what, formula, target, message in ERROR_CASES:
            with self.subTest(what, formula=formula):
                result = get_range(sheet, target) if ":" in target else [[get_cell(sheet, target)]]
                self.assert_only_message(result, message, what)
        self.assertTrue(CALC.office.alive(), "the office stopped answering after the error cases")


if __name__ == "__main__":
    unittest.main()
