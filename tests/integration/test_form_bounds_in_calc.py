"""Issue 20 in a real headless LibreOffice Calc with the extension: the covariance block of translog
and ces PRODFIT tables and `what` over them (the cobb-douglas form: test_bounds_in_calc.py).

Run from the repository root with Debian's Python, the package isoquant_office on the path (see
tests/integration/README.md):
    PYTHONPATH=addin/python /usr/bin/python3 -m unittest -v tests/integration/test_form_bounds_in_calc.py

Sources of the expected figures: Cobb & Douglas (1928) data (tests/data); the covariance matrix of
the same least squares recomputed by python3-statsmodels at test time, to 1e-8 relative
(STATSMODELS_RELATIVE); gradients by the complex step in numpy; the plan of PRODLEASTCOST solved by
scipy in tests/reference/plan_bounds_check.py; the rice-farm panel (Feng and Horrace 2012, as in plm
2.6 RiceFarms; tests/data) and PRODEFFICIENTSCALE's y* found by scipy in
tests/reference/scale_bounds_check.py.
"""

import unittest

from isoquant_office import get_cell, get_range, recalc, set_array_formula, set_formula, set_values

from .fit_checks import STATSMODELS_RELATIVE, cobb_douglas_sheet, logs, np, statsmodels_fit
from .support import CalcTestCase, module_session, read_columns, write_columns

CALC = module_session()
setUpModule, tearDownModule = CALC.start, CALC.stop


def complex_step_gradient(function, theta):
    """d function / d theta by the complex step, Im f(theta + i h e_j) / h with h = 1e-20 (Squire and
    Trapp 1998, SIAM Review 40(1)): exact to rounding, no difference taken. Central differences lose
    too much here: g'Vg of the translog and ces fits cancels four to five digits
    (tests/reference/form_bounds_check.py)."""
    gradient = np.zeros(len(theta))
    for j in range(len(theta)):
        shifted = np.asarray(theta, dtype=complex)
        shifted[j] += 1e-20j
        gradient[j] = function(shifted).imag / 1e-20
    return gradient


class OtherFormsTest(CalcTestCase):
    """The block and `what` for the translog and ces forms (Cobb & Douglas 1928 data, bundle (150,
    200) invented). Translog: the block is statsmodels' cov_params of the same regression (1e-8), the
    marginal product's std. error and bounds, and PRODSECOND's std. error of f_LC, that covariance with
    a numpy complex-step gradient of e_L Y / L and of (b_LC + e_L e_C) Y / (L C) written out here
    (1e-7; the same figures as the core's, test_decision_bounds_cross_check.cpp). Ces: the covariance is the table's own (its diagonal the
    table's squared standard errors, 1e-12; symmetric; positive semidefinite), and the std. errors
    sqrt(g'Vg) with V and theta read from the table and g a numpy complex-step gradient of the textbook
    formula ln Y = ln A - (nu/rho) ln(delta L^-rho + (1 - delta) C^-rho) (and of PRODMRTS's
    ln(e_L / e_C) + ln(C / L)), to 1e-6 relative."""

    @classmethod
    def setUpClass(cls):
        cls.sheet, cls.data = cobb_douglas_sheet(CALC, "Bounds of other forms")
        set_values(cls.sheet, "P90", [[150.0, 200.0]])
        set_array_formula(cls.sheet, "F1:L30", '=PRODFIT(B1:B25;C1:D25;"translog";;;;;;;;;TRUE())')
        set_array_formula(cls.sheet, "F40:L62", '=PRODFIT(B1:B25;C1:D25;"translog")')
        set_array_formula(cls.sheet, "F70:L94", '=PRODFIT(B1:B25;C1:D25;"ces";;;;;;;;;TRUE())')
        for row, (model, what) in enumerate([("F1:L30", "std. error"), ("F1:L30", "lower bound"),
                                             ("F1:L30", "upper bound"), ("F70:L94", "std. error"),
                                             ("F70:L94", "lower bound"), ("F70:L94", "upper bound")]):
            set_formula(cls.sheet, "N%d" % (row + 1), '=PRODMARGINAL(%s;$P$90:$Q$90;"L";"%s")' % (model, what))
        set_formula(cls.sheet, "N7", '=PRODOUTPUT(F70:L94;$P$90:$Q$90;;"std. error")')
        set_formula(cls.sheet, "N8", '=PRODELASTICITY(F70:L94;$P$90:$Q$90;"C";"std. error")')
        set_formula(cls.sheet, "N9", '=PRODSCALE(F1:L30;;"std. error")')
        set_formula(cls.sheet, "N10", '=PRODSECOND(F1:L30;$P$90:$Q$90;"L";"C";"std. error")')
        set_values(cls.sheet, "F101", [list(row) for row in get_range(cls.sheet, "F1:L29")])  # one row short
        set_formula(cls.sheet, "N11", '=PRODMARGINAL(F101:L130;$P$90:$Q$90;"L";"std. error")')
        set_values(cls.sheet, "P91", [[4.0, 3.0]])  # input prices, invented
        set_formula(cls.sheet, "N12", '=PRODLEASTCOST(F1:L30;180;$P$91:$Q$91;"std. error")')
        set_formula(cls.sheet, "N13", '=PRODMRTS(F70:L94;$P$90:$Q$90;"L";"C";"std. error")')
        recalc(CALC.doc)
        cls.translog, cls.plain = get_range(cls.sheet, "F1:L30"), get_range(cls.sheet, "F40:L62")
        cls.ces = get_range(cls.sheet, "F70:L94")

    def test_translog_block(self):
        self.assertEqual(self.translog[:23], self.plain)
        self.assertEqual(list(self.translog[23][:4]), ["covariance", "classical", 18.0, 0.95])
        self.assertEqual([row[0] for row in self.translog[24:]], ["ln A", "L", "C", "L*L", "L*C", "C*C"])
        if np is None:
            self.skipTest("python3-statsmodels/numpy not importable")
        l1, l2 = np.array(logs(self.data["L"])), np.array(logs(self.data["C"]))
        result = statsmodels_fit(logs(self.data["P"]), [l1, l2, l1 * l1 / 2, l1 * l2, l2 * l2 / 2])
        cov = np.asarray(result.cov_params())
        for i in range(6):
            for j in range(6):
                self.assert_relative(self.translog[24 + i][1 + j], cov[i][j], STATSMODELS_RELATIVE,
                                     "translog covariance %d, %d" % (i, j))
        import scipy.stats
        t = scipy.stats.t.ppf(0.975, result.df_resid)
        a, b = np.log(150.0), np.log(200.0)

        def log_marginal(p):
            log_output = p[0] + p[1] * a + p[2] * b + (p[3] * a * a + 2 * p[4] * a * b + p[5] * b * b) / 2
            return np.log(p[1] + p[3] * a + p[4] * b) + log_output - a
        theta = np.asarray(result.params)
        marginal = float(np.exp(log_marginal(theta)))
        gradient = complex_step_gradient(log_marginal, theta)
        spread = float(np.sqrt(gradient @ cov @ gradient))
        for row, expected in enumerate([marginal * spread, marginal * np.exp(-t * spread),
                                        marginal * np.exp(t * spread)]):
            self.assert_relative(get_cell(self.sheet, "N%d" % (row + 1)), expected, 1e-7, "translog row %d" % row)

        def cross_partial(p):  # f_LC = (b_LC + e_L e_C) Y / (L C)
            log_output = p[0] + p[1] * a + p[2] * b + (p[3] * a * a + 2 * p[4] * a * b + p[5] * b * b) / 2
            e_l, e_c = p[1] + p[3] * a + p[4] * b, p[2] + p[4] * a + p[5] * b
            return (p[4] + e_l * e_c) * np.exp(log_output) / (150.0 * 200.0)
        gradient = complex_step_gradient(cross_partial, theta)
        self.assert_relative(get_cell(self.sheet, "N10"), float(np.sqrt(gradient @ cov @ gradient)), 1e-7,
                             "translog PRODSECOND std. error")

    def test_translog_least_cost_std_error(self):
        """PRODLEASTCOST's std. error of L at output 180 and prices (4, 3): the plan solved by scipy and
        differentiated through its first-order conditions in numpy by tests/reference/plan_bounds_check.py
        (the core's own figure is checked against the same in test_plan_bounds_cross_check.cpp), 1e-7."""
        if np is None:
            self.skipTest("python3-statsmodels/numpy not importable")
        import os
        import sys
        from scipy import optimize
        sys.path.insert(0, os.path.join(os.path.dirname(os.path.abspath(__file__)), "..", "reference"))
        import plan_bounds_check
        l1, l2 = np.array(logs(self.data["L"])), np.array(logs(self.data["C"]))
        result = statsmodels_fit(logs(self.data["P"]), [l1, l2, l1 * l1 / 2, l1 * l2, l2 * l2 / 2])
        self.assertEqual(plan_bounds_check.PRICES, (4.0, 3.0))
        _, sensitivity = plan_bounds_check.translog_plan(np, optimize, np.asarray(result.params), "target", 180.0)
        cov = np.asarray(result.cov_params())
        self.assert_relative(get_cell(self.sheet, "N12"), float(np.sqrt(sensitivity[0] @ cov @ sensitivity[0])),
                             1e-7, "translog PRODLEASTCOST std. error")

    def test_ces_block_and_bounds(self):
        block = np.array([row[1:5] for row in self.ces[21:25]]) if np is not None else None
        self.assertEqual(list(self.ces[20][:4]), ["covariance", "classical", 20.0, 0.95])
        self.assertEqual([row[0] for row in self.ces[21:25]], ["ln A", "delta", "rho", "nu"])
        if np is None:
            self.skipTest("numpy not importable")
        for i in range(4):
            self.assert_relative(np.sqrt(block[i][i]), self.ces[1 + i][2], 1e-12, "ces variance %d" % i)
        self.assertTrue((block == block.T).all(), "ces block symmetric")
        self.assertGreaterEqual(np.linalg.eigvalsh(block).min(), -1e-10 * np.linalg.eigvalsh(block).max())
        theta = [row[1] for row in self.ces[1:5]]
        a, b = np.log(150.0), np.log(200.0)

        def log_output(p):
            return p[0] - p[3] / p[2] * np.log(p[1] * np.exp(-p[2] * a) + (1 - p[1]) * np.exp(-p[2] * b))

        def elasticity_c(p):  # nu (1 - delta) C^-rho / (delta L^-rho + (1 - delta) C^-rho)
            second = (1 - p[1]) * np.exp(-p[2] * b)
            return p[3] * second / (p[1] * np.exp(-p[2] * a) + second)

        def log_marginal_l(p):
            return np.log(p[3] - elasticity_c(p)) + log_output(p) - a

        def spread(function):
            gradient = complex_step_gradient(function, theta)
            return float(np.sqrt(gradient @ block @ gradient))
        output = float(np.exp(log_output(np.asarray(theta))))
        marginal = float(np.exp(log_marginal_l(np.asarray(theta))))
        self.assert_relative(get_cell(self.sheet, "N4"), marginal * spread(log_marginal_l), 1e-6, "ces MP se")
        self.assert_relative(get_cell(self.sheet, "N7"), output * spread(log_output), 1e-6, "ces output se")
        self.assert_relative(get_cell(self.sheet, "N8"), spread(elasticity_c), 1e-6, "ces elasticity se")

        def log_rate(p):  # ln MRTS = ln(e_L / e_C) + ln(C / L)
            return np.log((p[3] - elasticity_c(p)) / elasticity_c(p)) + b - a
        rate = float(np.exp(log_rate(np.asarray(theta))))
        self.assert_relative(get_cell(self.sheet, "N13"), rate * spread(log_rate), 1e-6, "ces PRODMRTS std. error")
        lower, upper = get_cell(self.sheet, "N5"), get_cell(self.sheet, "N6")
        self.assert_relative(lower * upper, marginal * marginal, 1e-9, "ces MP bounds on the log scale")

    def test_messages_name_the_argument(self):
        self.assert_message(get_cell(self.sheet, "N9"), "Error: inputs: the translog's returns to scale and their "
                            "bounds vary with the inputs; give a row of inputs", "translog scale without inputs")

        self.assert_message(get_cell(self.sheet, "N11"), "Error: model: row 24: the covariance block has 5 rows; it "
                            "needs one row per parameter (6) and 6 numbers in each", "translog block one row short")


class EfficientScaleBoundsTest(CalcTestCase):
    """PRODEFFICIENTSCALE's std. error on a translog PRODFIT table with its block: the rice-farm panel's
    goutput on seed, urea and totlabor, at the panel's mean prices rounded (112, 79, 80), against y*
    found by scipy and differentiated through the textbook conditions by the complex step in
    tests/reference/scale_bounds_check.py, with statsmodels' classical covariance (1e-7; the core's
    own figures are checked against the same in test_scale_bounds_cross_check.cpp)."""

    LABELS = ["seed", "urea", "totlabor"]

    @classmethod
    def setUpClass(cls):
        cls.data = read_columns("rice_farms_panel.csv", ["goutput"] + cls.LABELS)
        cls.sheet = CALC.new_sheet("Efficient scale bounds")
        write_columns(cls.sheet, "A1", cls.data, ["goutput"] + cls.LABELS)
        # 2k + k(k+1)/2 + 16 = 28 rows for three inputs, then the block's header and 10 rows.
        set_array_formula(cls.sheet, "F1:P39", '=PRODFIT(A1:A1027;B1:D1027;"translog";;;;;;;;;TRUE())')
        set_values(cls.sheet, "R1", [[112.0, 79.0, 80.0]])
        set_formula(cls.sheet, "R2", '=PRODEFFICIENTSCALE(F1:P39;R1:T1;"std. error")')
        recalc(CALC.doc)

    def test_std_error_of_the_efficient_scale(self):
        if np is None:
            self.skipTest("python3-statsmodels/numpy not importable")
        import os
        import sys
        from scipy import optimize
        sys.path.insert(0, os.path.join(os.path.dirname(os.path.abspath(__file__)), "..", "reference"))
        import scale_bounds_check
        self.assertEqual(scale_bounds_check.PRICES, (112.0, 79.0, 80.0))
        columns = [np.array(logs(self.data[label])) for label in self.LABELS]
        terms = [columns[i] * columns[j] * (0.5 if i == j else 1.0) for i in range(3) for j in range(i, 3)]
        result = statsmodels_fit(logs(self.data["goutput"]), columns + terms)
        _, sensitivity = scale_bounds_check.efficient_scale(np, optimize, np.asarray(result.params))
        cov = np.asarray(result.cov_params())
        self.assert_relative(get_cell(self.sheet, "R2"), float(np.sqrt(sensitivity[-1] @ cov @ sensitivity[-1])),
                             1e-7, "translog PRODEFFICIENTSCALE std. error")


if __name__ == "__main__":
    unittest.main()
