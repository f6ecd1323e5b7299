"""PRODFIT's Cobb-Douglas table and PRODSTAT's lookups in it, computed by a real headless LibreOffice Calc
with the extension: classical and robust errors, subnormal values, constant returns imposed.

Run from the repository root with Debian's Python, the package isoquant_office on the path (see
tests/integration/README.md):
    PYTHONPATH=addin/python /usr/bin/python3 -m unittest -v tests/integration/test_fits_in_calc.py

One office with the extension serves the whole module. Sources of the expected figures, named
beside each check, as listed in fit_checks.py: "Cobb & Douglas (1928)", "reference figures
(R 4.2.2 lm)" and "statsmodels".
"""

import math
import unittest

from isoquant_office import get_cell, get_range, recalc, set_array_formula, set_formula

from .fit_checks import (HEADER, FitTestCase, cobb_douglas_data, cobb_douglas_sheet, layout, logs, scipy,
                         statsmodels_fit, statsmodels_table)
from .support import module_session, row_of, write_columns

CALC = module_session()
setUpModule, tearDownModule = CALC.start, CALC.stop


# -- 1 and 3: Cobb & Douglas (1928), unrestricted, classical and robust errors -----------------------

class CobbDouglasTableTest(FitTestCase):
    """PRODFIT on Cobb & Douglas (1928): layout, published figures and statsmodels."""

    @classmethod
    def setUpClass(cls):
        cls.sheet, cls.data = cobb_douglas_sheet(CALC, "CobbDouglas")
        # Exactly the table's size: 2 inputs, no controls -> 2 + 0 + 15 = 17 rows.
        set_array_formula(cls.sheet, "F1:L17", "=PRODFIT(B1:B25;C1:D25)")
        set_array_formula(cls.sheet, "F21:L37", '=PRODFIT(B1:B25;C1:D25;;;"hc1")')
        set_array_formula(cls.sheet, "F41:L57", '=PRODFIT(B1:B25;C1:D25;;;"hc3")')
        # The same options written out in full, and as empty texts.
        set_array_formula(cls.sheet, "F61:L77", '=PRODFIT(B1:B25;C1:D25;"cobb-douglas";FALSE();"hc1";0.95)')
        set_array_formula(cls.sheet, "F81:L97", '=PRODFIT(B1:B25;C1:D25;"";"";"";"")')
        # One row and one column more than the table: Calc pads what the result does not fill.
        set_array_formula(cls.sheet, "F101:M118", "=PRODFIT(B1:B25;C1:D25)")
        recalc(CALC.doc)
        cls.table = get_range(cls.sheet, "F1:L17")
        cls.hc1 = get_range(cls.sheet, "F21:L37")
        cls.hc3 = get_range(cls.sheet, "F41:L57")

    def reference(self, cov_type):
        y = logs(self.data["P"])
        return statsmodels_fit(y, [logs(self.data["L"]), logs(self.data["C"])], cov_type)

    def test_every_cell_has_its_label_or_a_number(self):
        self.assert_layout(self.table, layout(["L", "C"], "constant"))

    def test_published_reference_figures(self):
        # Reference figures (R 4.2.2 lm; statsmodels 0.13.5 agrees) for Cobb & Douglas (1928):
        # ln P = b0 + bL ln L + bC ln C.
        expected = {("ln A", "value"): "-0.1773097", ("ln A", "std. error"): "0.434293",
                    ("L", "value"): "0.8072782", ("L", "std. error"): "0.1450762",
                    ("C", "value"): "0.2330535", ("C", "std. error"): "0.0635297",
                    ("R2", "value"): "0.957425", ("residual SD", "value"): "0.0581384",
                    # F test of bL + bC = 1, as printed (4 and 3 significant digits):
                    ("returns to scale", "t"): "0.1956", ("returns to scale", "p-value"): "0.663"}
        for (label, column), figure in expected.items():
            with self.subTest(row=label, column=column):
                self.assert_published(row_of(self.table, label)[HEADER.index(column)], figure,
                                      "%s / %s" % (label, column))
        # 24 years, 1899-1922 (Cobb & Douglas 1928).
        self.assertEqual(row_of(self.table, "observations")[1], 24.0)
        # Returns to scale is bL + bC: the published exponents sum to 1.0403317, each printed to
        # 7 digits, so the sum is good to 1e-7.
        self.assertLessEqual(abs(row_of(self.table, "returns to scale")[1] - (0.8072782 + 0.2330535)), 1e-7)
        # Published p = 0.663 >= 0.05: constant returns are not rejected at the default level 0.95.
        self.assertEqual(row_of(self.table, "verdict")[1], "constant")

    def test_against_statsmodels(self):
        with self.subTest("statsmodels OLS on logs"):
            self.need_statsmodels()
            result = self.reference("nonrobust")
            self.assertEqual(row_of(self.table, "observations")[1], float(result.nobs))
            self.assert_matches_statsmodels(self.table, statsmodels_table(result, ["ln A", "L", "C"], 2))

    def test_hc1_errors(self):
        self.assert_layout(self.hc1, layout(["L", "C"], "constant"))
        # Reference figures (R 4.2.2 lm with HC1; statsmodels 0.13.5 agrees): HC1 standard errors
        # and the HC1 Wald F of bL + bC = 1 with its p-value, to the digits printed.
        expected = {("ln A", "std. error"): "0.547223", ("L", "std. error"): "0.215936",
                    ("C", "std. error"): "0.105406",
                    ("returns to scale", "t"): "0.11904", ("returns to scale", "p-value"): "0.7335"}
        for (label, column), figure in expected.items():
            with self.subTest(row=label, column=column):
                self.assert_published(row_of(self.hc1, label)[HEADER.index(column)], figure,
                                      "hc1 %s / %s" % (label, column))
        # The estimates are the least-squares ones whatever the errors: the same computation.
        for label in ["ln A", "L", "C", "R2", "residual SD", "log-likelihood"]:
            self.assertEqual(row_of(self.hc1, label)[1], row_of(self.table, label)[1], label)
        with self.subTest("statsmodels cov_type HC1"):
            self.need_statsmodels()
            self.assert_matches_statsmodels(self.hc1, statsmodels_table(self.reference("HC1"), ["ln A", "L", "C"], 2))

    def test_hc3_errors_against_statsmodels(self):
        # statsmodels' HC3 p of bL + bC = 1 is 0.81 (checked below): constant at 0.95.
        self.assert_layout(self.hc3, layout(["L", "C"], "constant"))
        with self.subTest("statsmodels cov_type HC3"):
            self.need_statsmodels()
            self.assert_matches_statsmodels(self.hc3, statsmodels_table(self.reference("HC3"), ["ln A", "L", "C"], 2))

    def test_result_is_exactly_17_by_7(self):
        padded = get_range(self.sheet, "F101:M118")
        self.assertEqual([row[:7] for row in padded[:17]], self.table)
        self.assertEqual(padded[17], ["#N/A"] * 8)
        self.assertEqual([row[7] for row in padded], ["#N/A"] * 18)

    def test_empty_arguments_mean_the_defaults(self):
        # ";;" (an omitted argument) and "" both take the documented default (addin/function_table.cxx).
        self.assertEqual(get_range(self.sheet, "F61:L77"), self.hc1)
        self.assertEqual(get_range(self.sheet, "F81:L97"), self.table)


# -- 1b: values below the normal doubles ---------------------------------------------------------

class SubnormalValuesTest(FitTestCase):
    """Cobb & Douglas (1928) with one labour value replaced by 1e-310, and with every output
    scaled by 1e-318: both subnormal doubles (below 2.2e-308), whose logs a vectorised kernel would
    clamp to ln 2.2e-308. statsmodels on the same doubles, logged one by one with math.log."""

    LABOUR_ROW = 5  # 1903, the fifth data row

    @classmethod
    def setUpClass(cls):
        cls.data = cobb_douglas_data()
        cls.labour = list(cls.data["L"])
        cls.labour[cls.LABOUR_ROW - 1] = 1e-310
        cls.scaled_output = [p * 1e-318 for p in cls.data["P"]]
        cls.sheet = CALC.new_sheet("Subnormal")
        columns = {"P": cls.data["P"], "L": cls.labour, "C": cls.data["C"], "Ps": cls.scaled_output,
                   "L0": cls.data["L"]}
        write_columns(cls.sheet, "A1", columns, ["P", "L", "C", "Ps", "L0", "C"])
        set_array_formula(cls.sheet, "H1:N17", "=PRODFIT(A1:A25;B1:C25)")
        set_array_formula(cls.sheet, "H21:N37", "=PRODFIT(D1:D25;E1:F25)")
        recalc(CALC.doc)

    def test_the_sheet_holds_the_subnormal_values(self):
        # Calc keeps the doubles as given: the reference below sees the same numbers.
        self.assertEqual(get_cell(self.sheet, "B%d" % (self.LABOUR_ROW + 1)), 1e-310)
        self.assertEqual([r[0] for r in get_range(self.sheet, "D2:D25")], self.scaled_output)

    def test_one_labour_value_of_1e_minus_310_against_statsmodels(self):
        table = get_range(self.sheet, "H1:N17")
        with self.subTest("statsmodels OLS on logs"):
            self.need_statsmodels()
            result = statsmodels_fit(logs(self.data["P"]), [logs(self.labour), logs(self.data["C"])])
            self.assert_matches_statsmodels(table, statsmodels_table(result, ["ln A", "L", "C"], 2))

    def test_output_scaled_by_1e_minus_318_against_statsmodels(self):
        # The unchanged labour column is headed "L0".
        table = get_range(self.sheet, "H21:N37")
        with self.subTest("statsmodels OLS on logs"):
            self.need_statsmodels()
            result = statsmodels_fit(logs(self.scaled_output), [logs(self.data["L"]), logs(self.data["C"])])
            self.assert_matches_statsmodels(table, statsmodels_table(result, ["ln A", "L0", "C"], 2))


# -- 2: constant returns imposed ------------------------------------------------------------------

class ConstantReturnsTest(FitTestCase):
    """PRODFIT(...; TRUE) on Cobb & Douglas (1928): the published restricted fit."""

    @classmethod
    def setUpClass(cls):
        cls.sheet, cls.data = cobb_douglas_sheet(CALC, "ConstantReturns")
        set_array_formula(cls.sheet, "F1:L17", "=PRODFIT(B1:B25;C1:D25;;TRUE())")
        recalc(CALC.doc)
        cls.table = get_range(cls.sheet, "F1:L17")

    def test_every_cell_has_its_label_or_a_number(self):
        self.assert_layout(self.table, layout(["L", "C"], "constant (imposed)", imposed=True))
        self.assertEqual(row_of(self.table, "returns to scale")[1:3], [1.0, "imposed"])

    def test_published_reference_figures(self):
        # Reference figures (R 4.2.2 lm; statsmodels 0.13.5 agrees), constant returns:
        # ln(P/C) on ln(L/C): intercept 0.0145446 (SE 0.019979), slope 0.7458658 (SE 0.041224),
        # capital exponent 1 - slope = 0.2541342 with the slope's SE, A = 1.014651.
        expected = {("ln A", "value"): "0.0145446", ("ln A", "std. error"): "0.019979",
                    ("L", "value"): "0.7458658", ("L", "std. error"): "0.041224",
                    ("C", "value"): "0.2541342", ("C", "std. error"): "0.041224"}
        for (label, column), figure in expected.items():
            with self.subTest(row=label, column=column):
                self.assert_published(row_of(self.table, label)[HEADER.index(column)], figure,
                                      "%s / %s" % (label, column))
        self.assert_published(math.exp(row_of(self.table, "ln A")[1]), "1.014651", "A = exp(ln A)")
        # The same reference gives RSS 0.0716427 (6 digits) on 24 - 2 degrees of freedom. Half a
        # unit in its last digit, propagated through the square root, is the tolerance.
        rss, rss_half_unit, df = 0.0716427, 0.5e-7, 22
        residual_sd = math.sqrt(rss / df)
        tolerance = 0.5 * rss_half_unit / rss * residual_sd
        self.assertLessEqual(abs(row_of(self.table, "residual SD")[1] - residual_sd), tolerance)
        self.assertEqual(row_of(self.table, "observations")[1], 24.0)

    def test_against_statsmodels(self):
        with self.subTest("statsmodels OLS of ln(P/C) on ln(L/C)"):
            self.need_statsmodels()
            log_p, log_l, log_c = logs(self.data["P"]), logs(self.data["L"]), logs(self.data["C"])
            result = statsmodels_fit([p - c for p, c in zip(log_p, log_c)],
                                     [[l - c for l, c in zip(log_l, log_c)]])
            bounds = result.conf_int(alpha=0.05)
            df = result.df_resid
            # The capital exponent is 1 - slope: same SE, bounds mirrored, t and p from scipy.
            capital_t = (1 - result.params[1]) / result.bse[1]
            tss = sum((y - sum(log_p) / len(log_p)) ** 2 for y in log_p)  # R2 is of ln P itself
            r2 = 1 - result.ssr / tss
            figures = {
                ("ln A", "value"): result.params[0], ("ln A", "std. error"): result.bse[0],
                ("ln A", "t"): result.tvalues[0], ("ln A", "p-value"): result.pvalues[0],
                ("ln A", "lower bound"): bounds[0][0], ("ln A", "upper bound"): bounds[0][1],
                ("L", "value"): result.params[1], ("L", "std. error"): result.bse[1],
                ("L", "t"): result.tvalues[1], ("L", "p-value"): result.pvalues[1],
                ("L", "lower bound"): bounds[1][0], ("L", "upper bound"): bounds[1][1],
                ("C", "value"): 1 - result.params[1], ("C", "std. error"): result.bse[1],
                ("C", "t"): capital_t, ("C", "p-value"): 2 * scipy.stats.t.sf(abs(capital_t), df),
                ("C", "lower bound"): 1 - bounds[1][1], ("C", "upper bound"): 1 - bounds[1][0],
                ("R2", "value"): r2,
                ("adjusted R2", "value"): 1 - (1 - r2) * (result.nobs - 1) / df,
                ("residual SD", "value"): math.sqrt(result.scale),
                ("F (slopes = 0)", "t"): float(result.fvalue),
                ("F (slopes = 0)", "p-value"): float(result.f_pvalue),
                ("log-likelihood", "value"): result.llf,
                ("AIC", "value"): result.aic, ("BIC", "value"): result.bic,
            }
            self.assert_matches_statsmodels(self.table, figures)


# -- 5: PRODSTAT ---------------------------------------------------------------------------------

class ProdStatTest(FitTestCase):
    """PRODSTAT answers with the cell of the PRODFIT table its labels name."""

    # (row label typed, column label typed or None, table row, table column)
    LOOKUPS = [
        ("l", None, "L", "value"),                 # an input's label, in another case
        ("C", "std. error", "C", "std. error"),
        ("L", "p-value", "L", "p-value"),
        ("LN A", "Upper Bound", "ln A", "upper bound"),
        ("R2", None, "R2", "value"),
        ("F", None, "F (slopes = 0)", "t"),            # "F" alias; the row holds only a statistic
        ("F (slopes = 0)", "p-value", "F (slopes = 0)", "p-value"),
        ("verdict", None, "verdict", "value"),
        ("returns to scale", "p-value", "returns to scale", "p-value"),
        ("Residual SD", None, "residual SD", "value"),
        ("observations", None, "observations", "value"),
        ("aic", None, "AIC", "value"),
        ("form", None, "form", "value"),
    ]

    @classmethod
    def setUpClass(cls):
        cls.sheet, _ = cobb_douglas_sheet(CALC, "ProdStat")
        set_array_formula(cls.sheet, "F1:L17", "=PRODFIT(B1:B25;C1:D25)")
        set_array_formula(cls.sheet, "F21:L37", '=PRODFIT(B1:B25;C1:D25;;;"hc1")')
        set_array_formula(cls.sheet, "F41:L57", "=PRODFIT(B1:B25;C1:D25;;TRUE())")
        for i, (row_label, column_label, _, _) in enumerate(cls.LOOKUPS):
            column = ';"%s"' % column_label if column_label else ""
            set_formula(cls.sheet, "N%d" % (i + 1), '=PRODSTAT(B1:B25;C1:D25;"%s"%s)' % (row_label, column))
        set_formula(cls.sheet, "O1", '=PRODSTAT(B1:B25;C1:D25;"C";"std. error";;;"hc1")')
        set_formula(cls.sheet, "O2", '=PRODSTAT(B1:B25;C1:D25;"verdict";;;TRUE())')
        set_formula(cls.sheet, "O3", '=PRODSTAT(B1:B25;C1:D25;"C";"lower bound";;TRUE())')
        recalc(CALC.doc)

    def test_lookups_equal_the_table_cells(self):
        table = get_range(self.sheet, "F1:L17")
        for i, (row_label, column_label, table_row, table_column) in enumerate(self.LOOKUPS):
            with self.subTest(row_label=row_label, column_label=column_label):
                expected = row_of(table, table_row)[HEADER.index(table_column)]
                self.assertNotEqual(expected, "")  # a real cell, not a blank one
                self.assertEqual(get_cell(self.sheet, "N%d" % (i + 1)), expected)

    def test_lookups_with_options(self):
        self.assertEqual(get_cell(self.sheet, "O1"), row_of(get_range(self.sheet, "F21:L37"), "C")[2])
        imposed = get_range(self.sheet, "F41:L57")
        self.assertEqual(get_cell(self.sheet, "O2"), "constant (imposed)")
        self.assertEqual(get_cell(self.sheet, "O2"), row_of(imposed, "verdict")[1])
        self.assertEqual(get_cell(self.sheet, "O3"), row_of(imposed, "C")[5])


if __name__ == "__main__":
    unittest.main()
