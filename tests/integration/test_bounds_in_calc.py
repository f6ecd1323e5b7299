"""Issue 20 in a real headless LibreOffice Calc with the extension: PRODFIT's covariance block, read
back by the evaluators and PRODVALUE, and the evaluators' `what` (std. error, bounds).

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

from .fit_checks import STATSMODELS_RELATIVE, cobb_douglas_sheet, logs, np, sm, state_panel_data, statsmodels_fit
from .support import CalcTestCase, module_session, read_rows, row_of, write_columns

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
        recalc(CALC.doc)
        self.assert_message(get_cell(self.sheet, "N6"),
                            "Error: model: row 20: the covariance block is not symmetric (column 2 differs from row 19, "
                            "column 3)", "asymmetric block")


class BoundsTest(CalcTestCase):
    """`what` of PRODMARGINAL, PRODOUTPUT, PRODELASTICITY and PRODSCALE on the table with its block.
    Expected: statsmodels' cov_params of the same fit and the gradient of ln MP = ln bL + ln A +
    bL ln L + bC ln C - ln L in numpy (1, ln L, ln C) + (0, 1/bL, 0); se = MP sqrt(g'Vg), bounds
    MP exp(-+ t s) with scipy's t(21) quantile; to 1e-7 relative (the issue's tolerance)."""

    @classmethod
    def setUpClass(cls):
        cls.sheet, cls.data = cobb_douglas_sheet(CALC, "Bounds of values")
        set_values(cls.sheet, "P90", [["L", "C"], [150.0, 200.0], [250.0, 400.0]])
        set_array_formula(cls.sheet, "F1:L21", "=PRODFIT(B1:B25;C1:D25;;;;;;;;;;TRUE())")
        for column, what in zip("NOPQ", ["value", "std. error", "lower bound", "upper bound"]):
            set_array_formula(cls.sheet, "%s1:%s3" % (column, column),
                              '=PRODMARGINAL($F$1:$L$21;$P$90:$Q$92;"L";"%s")' % what)
        set_formula(cls.sheet, "N10", '=PRODSCALE($F$1:$L$21;;"std. error")')
        set_formula(cls.sheet, "N11", '=PRODELASTICITY($F$1:$L$21;$P$91:$Q$91;"C";"upper bound")')
        set_formula(cls.sheet, "N12", '=PRODOUTPUT($F$1:$L$21;$P$91:$Q$91;;"prediction upper")')
        set_formula(cls.sheet, "N13", '=PRODOUTPUT($F$1:$L$21;$P$91:$Q$91;;"upper bound")')
        set_formula(cls.sheet, "N14", '=PRODMARGINAL($F$1:$L$17;$P$91:$Q$91;"L";"std. error")')
        set_formula(cls.sheet, "N15", '=PRODMARGINAL($F$1:$L$21;$P$91:$Q$91;"L";"bounds")')
        set_values(cls.sheet, "P95", [[2.0, 3.0]])  # input prices, invented
        for row, what in zip((20, 21, 22), ("value", "lower bound", "upper bound")):
            set_array_formula(cls.sheet, "N%d:O%d" % (row, row), '=PRODLEASTCOST($F$1:$L$21;180;$P$95:$Q$95;"%s")' % what)
        set_array_formula(cls.sheet, "N23:O23", "=PRODLEASTCOST($F$1:$L$21;180;$P$95:$Q$95)")
        recalc(CALC.doc)

    def test_marginal_product_against_statsmodels(self):
        if np is None:
            self.skipTest("python3-statsmodels/numpy not importable")
        import scipy.stats
        y = logs(self.data["P"])
        result = statsmodels_fit(y, [logs(self.data["L"]), logs(self.data["C"])])
        theta, cov = np.asarray(result.params), np.asarray(result.cov_params())
        t = scipy.stats.t.ppf(0.975, result.df_resid)
        self.assertEqual(get_cell(self.sheet, "N1"), "marginal product of L")
        for row, (labour, capital) in enumerate([(150.0, 200.0), (250.0, 400.0)]):
            gradient = np.array([1.0, np.log(labour) + 1.0 / theta[1], np.log(capital)])
            marginal = theta[1] * np.exp(theta[0] + theta[1] * np.log(labour) + theta[2] * np.log(capital)) / labour
            spread = float(np.sqrt(gradient @ cov @ gradient))
            expected = [marginal, marginal * spread, marginal * np.exp(-t * spread), marginal * np.exp(t * spread)]
            for column, figure in zip("NOPQ", expected):
                with self.subTest(row=row, column=column):
                    self.assert_relative(get_cell(self.sheet, "%s%d" % (column, row + 2)), figure, 1e-7,
                                         "PRODMARGINAL column %s" % column)
        self.assert_relative(get_cell(self.sheet, "N10"), float(np.sqrt(cov[1:, 1:].sum())), 1e-7, "PRODSCALE se")
        self.assert_relative(get_cell(self.sheet, "N11"), theta[2] + t * float(np.sqrt(cov[2, 2])), 1e-7,
                             "PRODELASTICITY upper bound")

    def test_least_cost_amounts_lie_within_their_bounds(self):
        # The figures themselves are checked against numpy in tests/reference/bounds_check.py.
        amounts, lower, upper, plain = (get_range(self.sheet, "N%d:O%d" % (r, r))[0] for r in (20, 21, 22, 23))
        self.assertEqual(amounts, plain)
        for i in range(2):
            self.assert_number(amounts[i], "least-cost amount")
            self.assertLess(lower[i], amounts[i])
            self.assertLess(amounts[i], upper[i])
            self.assertGreater(lower[i], 0)

    def test_prediction_bounds_are_wider(self):
        self.assertGreater(get_cell(self.sheet, "N12"), get_cell(self.sheet, "N13"))

    def test_messages_name_the_argument(self):
        self.assert_message(get_cell(self.sheet, "N14"),
                            "Error: what: \"std. error\" needs the model's covariance block; this model has none (a "
                            "typed model, or a PRODFIT table made without covariance TRUE)", "no block")
        self.assert_message(get_cell(self.sheet, "N15"),
                            "Error: what: give \"value\", \"std. error\", \"lower bound\" or \"upper bound\"",
                            "unknown word")


class DerivedBoundsTest(CalcTestCase):
    """`what` of PRODTFP, PRODSECOND, PRODMRTS, PRODBUDGET and PRODSUBSTITUTION, and `statistic` of
    PRODCOST, on the table with its block. Expected: statsmodels' cov_params of the same fit
    (tests/data, Cobb & Douglas 1928) and a central-difference gradient in numpy of the same quantity written out here (step 1e-6 times
    max(1, |theta_j|)); se = sqrt(g'Vg), bounds with scipy's t(21) quantile, on the log scale for
    the positive quantities; to 1e-7 relative (the issue's tolerance). Bundle (150, 200), output 170,
    budget 1000 and prices (2, 3): invented. PRODCOST's total and marginal cost of output 170 at those
    prices come from the first-order conditions here, not the core's closed form."""

    @classmethod
    def setUpClass(cls):
        cls.sheet, cls.data = cobb_douglas_sheet(CALC, "Derived bounds")
        set_values(cls.sheet, "P91", [[150.0, 200.0, 170.0, 2.0, 3.0]])
        set_array_formula(cls.sheet, "F1:L21", "=PRODFIT(B1:B25;C1:D25;;;;;;;;;;TRUE())")
        for name, (row, formula) in FORMULAS.items():
            for column, what in zip("NOPQ", ("std. error", "lower bound", "upper bound", "value")):
                set_formula(cls.sheet, "%s%d" % (column, row), formula % what)
        set_formula(cls.sheet, "R36", "=PRODCOST($F$1:$L$21;170;$S$91:$T$91)")  # the plain function
        recalc(CALC.doc)

    def reference(self):
        if np is None:
            self.skipTest("python3-statsmodels/numpy not importable")
        import scipy.stats
        result = statsmodels_fit(logs(self.data["P"]), [logs(self.data["L"]), logs(self.data["C"])])
        theta, cov = np.asarray(result.params), np.asarray(result.cov_params())
        t = scipy.stats.t.ppf(0.975, result.df_resid)

        def se(function):
            gradient = np.zeros(3)
            for j in range(3):
                step = 1e-6 * max(1.0, abs(theta[j]))
                up, down = theta.copy(), theta.copy()
                up[j] += step
                down[j] -= step
                gradient[j] = (function(up) - function(down)) / (2 * step)
            return float(np.sqrt(gradient @ cov @ gradient))

        def figures(function, positive):
            value = function(theta)
            if positive:
                spread = se(lambda p: np.log(function(p)))
                return [value * spread, value * np.exp(-t * spread), value * np.exp(t * spread)]
            spread = se(function)
            return [spread, value - t * spread, value + t * spread]
        return figures

    def check(self, name, function, positive):
        figures = self.reference()
        for column, expected in zip("NOP", figures(function, positive)):
            with self.subTest(name=name, column=column):
                self.assert_relative(get_cell(self.sheet, "%s%d" % (column, FORMULAS[name][0])), expected, 1e-7,
                                     "%s %s" % (name, column))

    def test_tfp(self):
        self.check("tfp", lambda p: 170.0 / output(p), True)

    def test_second_partial(self):
        self.check("second", lambda p: p[1] * p[2] * output(p) / (150.0 * 200.0), False)

    def test_rate_of_substitution(self):
        self.check("mrts", lambda p: (p[1] / 150.0) / (p[2] / 200.0), True)

    def test_budget_plan(self):
        # The plan spends 1000 at prices (2, 3): x_L = bL / (bL + bC) * 1000 / 2.
        def labour(p):
            return p[1] / (p[1] + p[2]) * 1000.0 / 2.0

        def made(p):
            capital = p[2] / (p[1] + p[2]) * 1000.0 / 3.0
            return np.exp(p[0] + p[1] * np.log(labour(p)) + p[2] * np.log(capital))
        self.check("budget labour", labour, True)
        self.check("budget output", made, True)

    def test_cost_of_an_output(self):
        # Cost minimisation's first-order conditions w_i = MC b_i y / x_i give x_i = (b_i / w_i) lam
        # with lam = MC y, and y = A prod (b_j lam / w_j)^b_j fixes ln lam; the cost is w . x.
        if np is None:
            self.skipTest("python3-statsmodels/numpy not importable")
        prices = np.array([2.0, 3.0])

        def scaled(p):
            b = p[1:]
            return np.exp((np.log(170.0) - p[0] - b @ (np.log(b) - np.log(prices))) / b.sum())

        self.check("cost total", lambda p: float(prices @ (p[1:] / prices * scaled(p))), True)
        self.check("cost marginal", lambda p: scaled(p) / 170.0, True)
        row = FORMULAS["cost total"][0]
        self.assertEqual(get_cell(self.sheet, "Q%d" % row), get_cell(self.sheet, "R%d" % row))

    def test_substitution_elasticity_has_no_sampling_error_under_cobb_douglas(self):
        # Every cobb-douglas parameter gives the elasticity 1 (README), so its gradient is 0.
        row = FORMULAS["substitution"][0]
        self.assertEqual(get_cell(self.sheet, "N%d" % row), 0.0)
        plain = get_cell(self.sheet, "Q%d" % row)
        self.assert_relative(plain, 1.0, 1e-12, "PRODSUBSTITUTION of cobb-douglas")
        self.assertEqual([get_cell(self.sheet, "%s%d" % (c, row)) for c in "OP"], [plain, plain])


class ShiftedLogScaleTest(CalcTestCase):
    """Munnell's (1990) state panel (tests/data) with the control unemp: 20 rows, and the block's
    1 + q rows, q = 5 parameters + the row "ln A at control means", s = ln A + c mean(unemp). Expected:
    statsmodels' cov_params V of the same fit and the gradient of ln Y = s + sum b_i ln x_i in beta,
    g = (1, ln x, mean(unemp)): Var(s) = a'Va with a = (1, 0, 0, 0, mean(unemp)) to 1e-8 and
    PRODOUTPUT's std. error Y sqrt(g'Vg) to 1e-7 relative (the issue's tolerance)."""

    @classmethod
    def setUpClass(cls):
        cls.data = state_panel_data()
        cls.sheet = CALC.new_sheet("Shifted bounds")
        write_columns(cls.sheet, "A1", cls.data, ["gsp", "pcap", "pc", "emp", "unemp"])
        set_values(cls.sheet, "P1", [[15000.0, 35000.0, 1000.0]])  # one bundle (pcap, pc, emp), invented
        set_array_formula(cls.sheet, "H1:N27", "=PRODFIT(A1:A817;B1:D817;;;;;E1:E817;;;;;TRUE())")
        set_formula(cls.sheet, "P3", '=PRODOUTPUT(H1:N27;P1:R1;;"std. error")')
        recalc(CALC.doc)

    def test_output_std_error_against_statsmodels(self):
        if np is None:
            self.skipTest("python3-statsmodels/numpy not importable")
        d = self.data
        result = statsmodels_fit(logs(d["gsp"]), [logs(d["pcap"]), logs(d["pc"]), logs(d["emp"]), d["unemp"]])
        beta, cov = np.asarray(result.params), np.asarray(result.cov_params())
        mean_rate = float(np.mean(d["unemp"]))
        table = get_range(self.sheet, "H1:N27")
        self.assertEqual(table[26][0], "ln A at control means")
        shift = np.array([1.0, 0.0, 0.0, 0.0, mean_rate])
        self.assert_relative(table[26][6], shift @ cov @ shift, STATSMODELS_RELATIVE, "Var(ln A at control means)")
        gradient = np.array([1.0, np.log(15000.0), np.log(35000.0), np.log(1000.0), mean_rate])
        expected = np.exp(beta @ gradient) * np.sqrt(gradient @ cov @ gradient)
        self.assert_relative(get_cell(self.sheet, "P3"), expected, 1e-7, "std. error of output")


class EffectsAndPeriodsBoundsTest(CalcTestCase):
    """Munnell's (1990) state panel (tests/data) with state fixed effects, the control unemp and the
    trend year: 26 rows and the block's 1 + q rows, q = 5 parameters + "ln A for predictions" +
    "technical change per period" = 7, so 34 rows by 8 columns. Expected: statsmodels OLS of the
    dummy-variable regression (one dummy per state, no constant; classical) at test time. The
    evaluators' ln A s = sum_g (n_g / n) alpha_g + c mean(unemp) + lambda 16 = w'beta; PRODOUTPUT's
    std. error Y sqrt(g'Vg), g = w + ln x at the inputs, and PRODTFP's with a period t,
    TFP sqrt(h'Vh), h = g + (t - 1986) at lambda, each to 1e-7 relative (the issue's tolerance)."""

    BUNDLE = [15000.0, 35000.0, 1000.0]  # (pcap, pc, emp), invented
    OBSERVED, PERIOD = 35000.0, 1975.0   # invented

    @classmethod
    def setUpClass(cls):
        cls.rows = read_rows("us_states_produc_1970_1986.csv")
        names = ["state", "year", "gsp", "pcap", "pc", "emp", "unemp"]
        cls.sheet = CALC.new_sheet("Effects bounds")
        set_values(cls.sheet, "A1", [names] + [[row["state"]] + [float(row[n]) for n in names[1:]]
                                               for row in cls.rows])
        set_values(cls.sheet, "R1", [cls.BUNDLE + [cls.OBSERVED, cls.PERIOD]])
        set_array_formula(cls.sheet, "I1:P34",
                          '=PRODFIT(C1:C817;D1:F817;;;;;G1:G817;A1:A817;"fixed";B1:B817;;TRUE())')
        set_formula(cls.sheet, "R3", '=PRODOUTPUT(I1:P34;R1:T1;;"std. error")')
        set_formula(cls.sheet, "R4", '=PRODTFP(I1:P34;U1;R1:T1;V1;"std. error")')
        recalc(CALC.doc)
        cls.table = get_range(cls.sheet, "I1:P34")

    def test_the_block_has_the_two_rows(self):
        labels = [row[0] for row in self.table]
        self.assertEqual(labels[-2:], ["ln A for predictions", "technical change per period"])
        self.assertEqual(self.table[0][7], "technical change per period")
        self.assertEqual(self.table[-7][1], "n/a")  # ln A, the plain mean of the effects

    def test_output_and_tfp_with_periods_against_the_dummy_variable_regression(self):
        if np is None:
            self.skipTest("python3-statsmodels/numpy not importable")
        states = sorted(set(row["state"] for row in self.rows))
        column = lambda name: np.array([float(row[name]) for row in self.rows])
        n = len(self.rows)
        dummies = np.zeros((n, len(states)))
        dummies[np.arange(n), [states.index(row["state"]) for row in self.rows]] = 1.0
        year, unemp = column("year"), column("unemp")
        design = np.column_stack([dummies] + [np.log(column(name)) for name in ("pcap", "pc", "emp")] +
                                 [unemp, year - year.min()])
        result = sm.OLS(np.log(column("gsp")), design).fit()
        beta, cov = np.asarray(result.params), np.asarray(result.cov_params())
        weights = np.concatenate([dummies.sum(axis=0) / n, [0.0, 0.0, 0.0, unemp.mean(), year.max() - year.min()]])
        self.assert_relative(row_of(self.table, "ln A for predictions")[1], weights @ beta, STATSMODELS_RELATIVE,
                             "ln A for predictions")
        gradient = weights.copy()
        gradient[len(states):len(states) + 3] += np.log(self.BUNDLE)
        expected = np.exp(gradient @ beta) * np.sqrt(gradient @ cov @ gradient)
        self.assert_relative(get_cell(self.sheet, "R3"), expected, 1e-7, "std. error of output under effects")
        gradient[-1] += self.PERIOD - year.max()
        tfp = self.OBSERVED / np.exp(gradient @ beta)
        self.assert_relative(get_cell(self.sheet, "R4"), tfp * np.sqrt(gradient @ cov @ gradient), 1e-7,
                             "std. error of TFP with periods")


# Per quantity: its row on the sheet, and its formula with %s for `what` (columns N, O, P, Q).
FORMULAS = {
    "tfp": (30, '=PRODTFP($F$1:$L$21;$R$91;$P$91:$Q$91;;"%s")'),
    "second": (31, '=PRODSECOND($F$1:$L$21;$P$91:$Q$91;"L";"C";"%s")'),
    "mrts": (32, '=PRODMRTS($F$1:$L$21;$P$91:$Q$91;"L";"C";"%s")'),
    "budget labour": (33, '=INDEX(PRODBUDGET($F$1:$L$21;1000;$S$91:$T$91;"%s");1;1)'),
    "budget output": (34, '=INDEX(PRODBUDGET($F$1:$L$21;1000;$S$91:$T$91;"%s");1;3)'),
    "substitution": (35, '=PRODSUBSTITUTION($F$1:$L$21;$P$91:$Q$91;"L";"C";"allen";"%s")'),
    "cost total": (36, '=PRODCOST($F$1:$L$21;170;$S$91:$T$91;"total";"%s")'),
    "cost marginal": (37, '=PRODCOST($F$1:$L$21;170;$S$91:$T$91;"marginal";"%s")'),
}


def output(p):
    return np.exp(p[0] + p[1] * np.log(150.0) + p[2] * np.log(200.0))


if __name__ == "__main__":
    unittest.main()
