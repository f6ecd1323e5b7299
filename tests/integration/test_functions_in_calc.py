"""Isoquant's cell functions computed by a real headless LibreOffice Calc with the extension.

Run from the repository root with Debian's Python (the only one that imports uno):
    /usr/bin/python3 -m unittest -v tests/integration/test_functions_in_calc.py

One office with the extension serves the whole module (starting one takes about 10 s). The
extension comes from $ISOQUANT_OXT (default build/isoquant.oxt); the data from
tests/data/ beside this folder.

Sources of the expected figures, named beside each check:
- "Cobb & Douglas (1928)": the data, Cobb, C. W. and Douglas, P. H. (1928), "A Theory of Production",
  American Economic Review 18(1) Supplement, pp. 139-165, Tables II and III.
- "Munnell (1990)": the US state panel 1970-1986 (48 states x 17 years), Munnell, A. (1990), New
  England Economic Review 3-22, as distributed in the R package plm 2.6 (dataset Produc).
- "reference figures (R 4.2.2 lm)": figures computed from those data with R 4.2.2 lm (plm 2.6 for the
  panel; statsmodels 0.13.5 agrees), as listed in the project's shared reference-data README. They
  are copied below as printed there and compared to the digits printed, at most 6 significant.
- "statsmodels": python3-statsmodels (Debian 12: 0.13.5) and python3-scipy, recomputed here on the
  same data at test time and compared to 1e-8 relative. Those checks are skipped (as subtests) when
  the libraries cannot be imported.
- "function formula": Y = exp(ln A) * prod x_i^b_i, MP_i = b_i * Y / x_i, elasticity b_i,
  returns to scale = sum of b_i, computed here from the table's own numbers (1e-12 relative).
- Error messages: the wording in core/src/*.cpp, which the add-in prefixes with "Error: ".
"""

import csv
import math
import os
import sys
import unittest

HERE = os.path.dirname(os.path.abspath(__file__))
sys.path.insert(0, HERE)

import uno  # noqa: E402  (Debian's python3-uno)

from office import (  # noqa: E402  (needs the path above)
    get_cell, get_range, recalc, set_array_formula, set_formula, set_values, skip_missing_reference,
    start_module_office, stop_module_office)

try:  # reference libraries; their checks are skipped when these are missing (failed
    # under ISOQUANT_REQUIRE_REFERENCES=1)
    import numpy as np
    import scipy.stats
    import statsmodels.api as sm
except ImportError:
    np = scipy = sm = None

REPO = os.path.normpath(os.path.join(HERE, "..", ".."))
DATA_DIR = os.path.join(HERE, "..", "data")
OXT = os.environ.get("ISOQUANT_OXT", os.path.join(REPO, "build", "isoquant.oxt"))

STATSMODELS_RELATIVE = 1e-8   # two implementations of the same least squares, in double precision
FORMULA_RELATIVE = 1e-12      # the same closed-form expression, evaluated in a different order

COLUMNS = ["value", "std. error", "t", "p-value", "lower bound", "upper bound"]
HEADER = ["Cobb-Douglas fit"] + COLUMNS
# The row labels of a two-input Cobb-Douglas table, as PRODSTAT lists them in a message.
CD_ROW_LIST = ("'ln A', 'L', 'C', 'observations', 'R2', 'adjusted R2', 'residual SD', 'F (slopes = 0)', "
               "'log-likelihood', 'AIC', 'BIC', 'returns to scale', 'verdict', 'form', 'smearing factor'")
NUMBER = object()  # a layout slot that must hold a finite number

OFFICE = None
DOC = None


def setUpModule():
    global OFFICE, DOC
    OFFICE, DOC = start_module_office(OXT)


def tearDownModule():
    stop_module_office(OFFICE)


# -- data and sheets ---------------------------------------------------------------------

def read_columns(file_name, names):
    """Columns of a CSV file in tests/data as lists of floats, by column name."""
    with open(os.path.join(DATA_DIR, file_name), newline="") as handle:
        rows = list(csv.DictReader(handle))
    return {name: [float(row[name]) for row in rows] for name in names}


def cobb_douglas_data():
    # Cobb & Douglas (1928), Tables II and III: output P, labour L, capital C, 1899 = 100.
    return read_columns("cobb_douglas_1928.csv", ["year", "P", "L", "C"])


def state_panel_data():
    # Munnell (1990) state panel, as distributed in plm 2.6 (Produc).
    return read_columns("us_states_produc_1970_1986.csv", ["gsp", "pcap", "pc", "emp", "unemp"])


def new_sheet(name):
    sheets = DOC.Sheets
    sheets.insertNewByName(name, sheets.getCount())
    return sheets.getByName(name)


def write_columns(sheet, top_left, columns, names):
    """A header row of names, then the columns side by side."""
    set_values(sheet, top_left, [list(names)] + [list(row) for row in zip(*(columns[n] for n in names))])


def layout(input_labels, verdict, control_labels=(), imposed=False, note=""):
    """The PRODFIT table expected by core/include/isoquant/fit_table.hpp: each cell a text (blank
    cells are formula results "" in Calc) or NUMBER."""
    blank = [""] * 5
    rows = [list(HEADER), ["ln A"] + [NUMBER] * 6]
    rows += [[label] + [NUMBER] * 6 for label in input_labels]
    rows += [[label + " (control)"] + [NUMBER] * 6 for label in control_labels]
    rows.append([""] * 7)
    for label in ["observations", "R2", "adjusted R2", "residual SD"]:
        rows.append([label, NUMBER] + blank)
    rows.append(["F (slopes = 0)", "", "", NUMBER, NUMBER, "", ""])
    for label in ["log-likelihood", "AIC", "BIC"]:
        rows.append([label, NUMBER] + blank)
    if imposed:
        rows.append(["returns to scale", NUMBER, "imposed", "", "", "", ""])
    else:
        rows.append(["returns to scale", NUMBER, NUMBER, NUMBER, NUMBER, "", ""])
    rows.append(["verdict", verdict] + blank)
    rows.append(["form", "cobb-douglas", note, "", "", "", ""])
    if control_labels:
        rows.append(["ln A at control means", NUMBER] + blank)
    rows.append(["smearing factor", NUMBER] + blank)
    return rows


def row_of(table, label):
    """The row of a read-back table whose first cell is label."""
    for row in table:
        if row[0] == label:
            return row
    raise KeyError(label)


def expected_verdict(nu, p_value, level):
    """The verdict as the functions' descriptions in addin/function_table.cxx state it: constant
    unless the test of returns to scale = 1 rejects at 1 - level; a model without a test (a typed
    model) is judged by its returns to scale alone."""
    if p_value is not None and p_value >= 1 - level:
        return "constant"
    return "increasing" if nu > 1 else "decreasing" if nu < 1 else "constant"


# -- reference computations (statsmodels) ------------------------------------------------------

def statsmodels_fit(y, regressors, cov_type="nonrobust"):
    """OLS of y on a constant and the regressors. use_t: t and F distributions, as the add-in
    uses for every kind of error (statsmodels would use the normal for robust errors otherwise)."""
    design = np.column_stack([np.ones(len(y))] + [np.asarray(r, dtype=float) for r in regressors])
    model = sm.OLS(np.asarray(y, dtype=float), design)
    if cov_type == "nonrobust":
        return model.fit()
    return model.fit(cov_type=cov_type, use_t=True)


def statsmodels_returns_test(result, inputs):
    """Estimate, standard error, F and p of the test that the `inputs` exponents (parameters
    1..inputs) sum to 1."""
    restriction = np.zeros((1, len(result.params)))
    restriction[0, 1:1 + inputs] = 1.0
    t_test = result.t_test((restriction, np.array([1.0])))
    f_test = result.f_test((restriction, np.array([1.0])))
    return (float(np.squeeze(t_test.effect)), float(np.squeeze(t_test.sd)),
            float(np.squeeze(f_test.fvalue)), float(np.squeeze(f_test.pvalue)))


def statsmodels_table(result, labels, inputs, level=0.95):
    """{(row label, column label): value} for every number of an unrestricted PRODFIT table."""
    bounds = result.conf_int(alpha=1 - level)
    figures = {}
    for j, label in enumerate(labels):
        figures[(label, "value")] = result.params[j]
        figures[(label, "std. error")] = result.bse[j]
        figures[(label, "t")] = result.tvalues[j]
        figures[(label, "p-value")] = result.pvalues[j]
        figures[(label, "lower bound")] = bounds[j][0]
        figures[(label, "upper bound")] = bounds[j][1]
    figures[("R2", "value")] = result.rsquared
    figures[("adjusted R2", "value")] = result.rsquared_adj
    figures[("residual SD", "value")] = math.sqrt(result.scale)
    figures[("F (slopes = 0)", "t")] = float(result.fvalue)
    figures[("F (slopes = 0)", "p-value")] = float(result.f_pvalue)
    figures[("log-likelihood", "value")] = result.llf
    figures[("AIC", "value")] = result.aic
    figures[("BIC", "value")] = result.bic
    nu, se, f_value, p_value = statsmodels_returns_test(result, inputs)
    figures[("returns to scale", "value")] = nu
    figures[("returns to scale", "std. error")] = se
    figures[("returns to scale", "t")] = f_value
    figures[("returns to scale", "p-value")] = p_value
    return figures


def logs(values):
    return [math.log(v) for v in values]


# -- assertions ----------------------------------------------------------------------------------

def half_unit(figure, most_digits=6):
    """Half a unit in the last significant digit of a figure printed as `figure`, counting at most
    `most_digits` significant digits: a correct value lies within this of the printed figure."""
    digits = len(figure.lstrip("+-").replace(".", "").lstrip("0"))
    used = min(digits, most_digits)
    exponent = math.floor(math.log10(abs(float(figure))))
    return 0.5 * 10.0 ** (exponent - used + 1)


class CalcTestCase(unittest.TestCase):
    """Assertions shared by the tests below."""

    def assert_number(self, value, what):
        self.assertIsInstance(value, float, "%s: expected a number, the cell shows %r" % (what, value))
        self.assertTrue(math.isfinite(value), "%s: %r is not finite" % (what, value))

    def assert_published(self, value, figure, what):
        """value agrees with a published figure to the digits printed (at most 6 significant)."""
        self.assert_number(value, what)
        tolerance = half_unit(figure)
        self.assertLessEqual(abs(value - float(figure)), tolerance,
                             "%s: %r, published %s (tolerance %.1g)" % (what, value, figure, tolerance))

    def assert_relative(self, value, expected, relative, what):
        self.assert_number(value, what)
        self.assertLessEqual(abs(value - expected), relative * abs(expected),
                             "%s: %r, expected %r (relative tolerance %g)" % (what, value, expected, relative))

    def assert_layout(self, table, expected):
        """Every cell: the expected text, or a finite number where NUMBER stands."""
        self.assertEqual(len(table), len(expected), "rows")
        for r, (row, wanted_row) in enumerate(zip(table, expected)):
            self.assertEqual(len(row), len(wanted_row), "columns of row %d" % (r + 1))
            for c, (cell, wanted) in enumerate(zip(row, wanted_row)):
                where = "row %d (%s), column %d (%s)" % (r + 1, wanted_row[0], c + 1, HEADER[c])
                if wanted is NUMBER:
                    self.assert_number(cell, where)
                else:
                    self.assertEqual(cell, wanted, where)

    def assert_matches_statsmodels(self, table, figures):
        # An expected 0 demands exactly 0: the panel's F of all slopes has p about 7e-861 (mpmath),
        # below the smallest double, so both statsmodels and a correct add-in give 0.
        for (label, column), expected in figures.items():
            value = row_of(table, label)[HEADER.index(column)]
            self.assert_relative(value, float(expected), STATSMODELS_RELATIVE,
                                 "%s / %s against statsmodels" % (label, column))

    def need_statsmodels(self):
        """Call inside a subTest: skips just that subtest when the reference libraries are missing."""
        if sm is None:
            skip_missing_reference(self, "python3-statsmodels/scipy/numpy not importable")

    def assert_message(self, value, message, what):
        """A cell shows exactly the message, as text (so no number)."""
        self.assertIsInstance(value, str, "%s: a number %r is shown instead of %r" % (what, value, message))
        self.assertEqual(value, message, what)


# -- 1 and 3: Cobb & Douglas (1928), unrestricted, classical and robust errors -----------------------

class CobbDouglasTableTest(CalcTestCase):
    """PRODFIT on Cobb & Douglas (1928): layout, published figures and statsmodels."""

    @classmethod
    def setUpClass(cls):
        cls.data = cobb_douglas_data()
        cls.sheet = new_sheet("CobbDouglas")
        write_columns(cls.sheet, "A1", cls.data, ["year", "P", "L", "C"])
        # Exactly the table's size: 2 inputs, no controls -> 2 + 0 + 15 = 17 rows.
        set_array_formula(cls.sheet, "F1:L17", "=PRODFIT(B1:B25;C1:D25)")
        set_array_formula(cls.sheet, "F21:L37", '=PRODFIT(B1:B25;C1:D25;;;"hc1")')
        set_array_formula(cls.sheet, "F41:L57", '=PRODFIT(B1:B25;C1:D25;;;"hc3")')
        # The same options written out in full, and as empty texts.
        set_array_formula(cls.sheet, "F61:L77", '=PRODFIT(B1:B25;C1:D25;"cobb-douglas";FALSE();"hc1";0.95)')
        set_array_formula(cls.sheet, "F81:L97", '=PRODFIT(B1:B25;C1:D25;"";"";"";"")')
        # One row and one column more than the table: Calc pads what the result does not fill.
        set_array_formula(cls.sheet, "F101:M118", "=PRODFIT(B1:B25;C1:D25)")
        recalc(DOC)
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

class SubnormalValuesTest(CalcTestCase):
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
        cls.sheet = new_sheet("Subnormal")
        columns = {"P": cls.data["P"], "L": cls.labour, "C": cls.data["C"], "Ps": cls.scaled_output,
                   "L0": cls.data["L"]}
        write_columns(cls.sheet, "A1", columns, ["P", "L", "C", "Ps", "L0", "C"])
        set_array_formula(cls.sheet, "H1:N17", "=PRODFIT(A1:A25;B1:C25)")
        set_array_formula(cls.sheet, "H21:N37", "=PRODFIT(D1:D25;E1:F25)")
        recalc(DOC)

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

class ConstantReturnsTest(CalcTestCase):
    """PRODFIT(...; TRUE) on Cobb & Douglas (1928): the published restricted fit."""

    @classmethod
    def setUpClass(cls):
        cls.data = cobb_douglas_data()
        cls.sheet = new_sheet("ConstantReturns")
        write_columns(cls.sheet, "A1", cls.data, ["year", "P", "L", "C"])
        set_array_formula(cls.sheet, "F1:L17", "=PRODFIT(B1:B25;C1:D25;;TRUE())")
        recalc(DOC)
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


# -- 4: the Munnell (1990) state panel with a control ---------------------------------------------

class StatePanelTest(CalcTestCase):
    """PRODFIT of ln gsp on ln pcap, ln pc, ln emp with unemp as a control (pooled), Munnell (1990)."""

    INPUTS = ["pcap", "pc", "emp"]

    @classmethod
    def setUpClass(cls):
        cls.data = state_panel_data()
        cls.sheet = new_sheet("StatePanel")
        write_columns(cls.sheet, "A1", cls.data, ["gsp", "pcap", "pc", "emp", "unemp"])
        last = len(cls.data["gsp"]) + 1
        arguments = "A1:A{0};B1:D{0}".format(last)
        control = "E1:E%d" % last
        # k = 3 inputs, m = 1 control: k + m + 15 + 1 = 20 rows (fit_table.hpp), the last two
        # "ln A at control means" and "smearing factor".
        set_array_formula(cls.sheet, "G1:M20", "=PRODFIT(%s;;;;;%s)" % (arguments, control))
        set_array_formula(cls.sheet, "G31:M50", '=PRODFIT(%s;;;"hc1";;%s)' % (arguments, control))
        set_array_formula(cls.sheet, "G61:N81", "=PRODFIT(%s;;;;;%s)" % (arguments, control))  # 1 more each way
        # Evaluators read a table with controls at ln A at control means (production_model.hpp).
        set_array_formula(cls.sheet, "O2:O11", "=PRODOUTPUT($G$1:$M$20;B2:D11)")
        # PRODSTAT: a control answers to its label without " (control)" (fit_table.hpp).
        set_formula(cls.sheet, "Q2", '=PRODSTAT(%s;"unemp";"std. error";;;;;%s)' % (arguments, control))
        set_formula(cls.sheet, "Q3", '=PRODSTAT(%s;"ln A at control means";;;;;;%s)' % (arguments, control))
        recalc(DOC)
        cls.table = get_range(cls.sheet, "G1:M20")
        cls.hc1 = get_range(cls.sheet, "G31:M50")

    def reference(self, cov_type):
        d = self.data
        return statsmodels_fit(logs(d["gsp"]), [logs(d["pcap"]), logs(d["pc"]), logs(d["emp"]), d["unemp"]],
                               cov_type)

    def test_result_is_exactly_20_by_7(self):
        padded = get_range(self.sheet, "G61:N81")
        self.assertEqual([row[:7] for row in padded[:20]], self.table)
        self.assertEqual(padded[20], ["#N/A"] * 8)
        self.assertEqual([row[7] for row in padded], ["#N/A"] * 21)

    def test_every_cell_has_its_label_or_a_number(self):
        # Verdict: the reference F = 270.9 of "elasticities sum to 1" on (1, 811) df is far beyond
        # the 5% point (about 3.85), and the published exponents sum to 1.058 > 1: increasing.
        self.assert_layout(self.table, layout(self.INPUTS, "increasing", ["unemp"]))

    def test_published_reference_figures(self):
        # Reference figures (R 4.2.2 lm / plm 2.6; statsmodels agrees), pooled OLS of
        # ln gsp on ln pcap, ln pc, ln emp, unemp: estimate (SE), R2, residual SD, F of sum = 1.
        expected = {"ln A": ("1.643302", "0.057587"), "pcap": ("0.155007", "0.017154"),
                    "pc": ("0.309190", "0.010272"), "emp": ("0.593935", "0.013747"),
                    "unemp (control)": ("-0.006733", "0.001416")}
        for label, (estimate, error) in expected.items():
            with self.subTest(row=label):
                row = row_of(self.table, label)
                self.assert_published(row[1], estimate, label + " estimate")
                self.assert_published(row[2], error, label + " std. error")
        self.assert_published(row_of(self.table, "R2")[1], "0.992593", "R2")
        self.assert_published(row_of(self.table, "residual SD")[1], "0.088096", "residual SD")
        self.assert_published(row_of(self.table, "returns to scale")[3], "270.9", "F of returns = 1")
        # 48 states x 17 years (Munnell 1990 / plm Produc).
        self.assertEqual(row_of(self.table, "observations")[1], 816.0)

    def test_ln_A_at_control_means(self):
        # ln A + coefficient x mean(unemp), from the table's own numbers and the data.
        log_scale = row_of(self.table, "ln A")[1]
        coefficient = row_of(self.table, "unemp (control)")[1]
        unemp = self.data["unemp"]
        expected = log_scale + coefficient * math.fsum(unemp) / len(unemp)
        # The row before the last ("smearing factor", fit_table.hpp).
        self.assertEqual(self.table[-2][0], "ln A at control means")
        self.assert_relative(self.table[-2][1], expected, FORMULA_RELATIVE, "ln A at control means")
        self.assertEqual(get_cell(self.sheet, "Q3"), self.table[-2][1])

    def test_against_statsmodels(self):
        with self.subTest("statsmodels OLS on logs with unemp"):
            self.need_statsmodels()
            labels = ["ln A"] + self.INPUTS + ["unemp (control)"]
            self.assert_matches_statsmodels(self.table, statsmodels_table(self.reference("nonrobust"), labels, 3))

    def test_hc1_errors(self):
        self.assert_layout(self.hc1, layout(self.INPUTS, "increasing", ["unemp"]))
        # Reference figures (R 4.2.2; statsmodels agrees): HC1 standard errors of the pooled fit.
        expected = {"ln A": "0.070989", "pcap": "0.018574", "pc": "0.012517", "emp": "0.019594",
                    "unemp (control)": "0.001341"}
        for label, error in expected.items():
            with self.subTest(row=label):
                self.assert_published(row_of(self.hc1, label)[2], error, label + " HC1 std. error")
        with self.subTest("statsmodels cov_type HC1"):
            self.need_statsmodels()
            labels = ["ln A"] + self.INPUTS + ["unemp (control)"]
            self.assert_matches_statsmodels(self.hc1, statsmodels_table(self.reference("HC1"), labels, 3))

    def test_output_uses_ln_A_at_control_means(self):
        # Function formula with ln A at control means and the three exponents of the table.
        scale = math.exp(row_of(self.table, "ln A at control means")[1])
        exponents = [row_of(self.table, label)[1] for label in self.INPUTS]
        values = get_range(self.sheet, "O2:O11")
        for i, (value,) in enumerate(values):
            x = [self.data[label][i] for label in self.INPUTS]
            expected = scale * math.prod(xi ** b for xi, b in zip(x, exponents))
            self.assert_relative(value, expected, FORMULA_RELATIVE, "PRODOUTPUT row %d" % (i + 2))

    def test_prodstat_finds_a_control_by_its_own_label(self):
        self.assertEqual(get_cell(self.sheet, "Q2"), row_of(self.table, "unemp (control)")[2])


# -- 5: PRODSTAT ---------------------------------------------------------------------------------

class ProdStatTest(CalcTestCase):
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
        cls.sheet = new_sheet("ProdStat")
        write_columns(cls.sheet, "A1", cobb_douglas_data(), ["year", "P", "L", "C"])
        set_array_formula(cls.sheet, "F1:L17", "=PRODFIT(B1:B25;C1:D25)")
        set_array_formula(cls.sheet, "F21:L37", '=PRODFIT(B1:B25;C1:D25;;;"hc1")')
        set_array_formula(cls.sheet, "F41:L57", "=PRODFIT(B1:B25;C1:D25;;TRUE())")
        for i, (row_label, column_label, _, _) in enumerate(cls.LOOKUPS):
            column = ';"%s"' % column_label if column_label else ""
            set_formula(cls.sheet, "N%d" % (i + 1), '=PRODSTAT(B1:B25;C1:D25;"%s"%s)' % (row_label, column))
        set_formula(cls.sheet, "O1", '=PRODSTAT(B1:B25;C1:D25;"C";"std. error";;;"hc1")')
        set_formula(cls.sheet, "O2", '=PRODSTAT(B1:B25;C1:D25;"verdict";;;TRUE())')
        set_formula(cls.sheet, "O3", '=PRODSTAT(B1:B25;C1:D25;"C";"lower bound";;TRUE())')
        recalc(DOC)

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


# -- 6: the evaluators -----------------------------------------------------------------------------

class CobbDouglasFormula:
    """Y = A * prod x_i^b_i, MP_i = b_i * Y / x_i: the function formula, from a model's own numbers."""

    def __init__(self, scale, exponents):
        self.scale = scale
        self.exponents = exponents

    def output(self, x):
        return self.scale * math.prod(xi ** b for xi, b in zip(x, self.exponents))

    def marginal(self, x, i):
        return self.exponents[i] * self.output(x) / x[i]

    def returns(self):
        return math.fsum(self.exponents)


# (what, formula with {model} and {inputs}, expected value for a model and one row of inputs)
EVALUATORS = [
    ("PRODOUTPUT", "PRODOUTPUT({model};{inputs})", lambda m, x: m.output(x)),
    ("PRODMARGINAL input 1", "PRODMARGINAL({model};{inputs};1)", lambda m, x: m.marginal(x, 0)),
    ("PRODMARGINAL input 2", "PRODMARGINAL({model};{inputs};2)", lambda m, x: m.marginal(x, 1)),
    ('PRODMARGINAL "L"', 'PRODMARGINAL({model};{inputs};"L")', lambda m, x: m.marginal(x, 0)),
    ('PRODMARGINAL "c" (case-insensitive)', 'PRODMARGINAL({model};{inputs};"c")', lambda m, x: m.marginal(x, 1)),
    ("PRODELASTICITY input 1", "PRODELASTICITY({model};{inputs};1)", lambda m, x: m.exponents[0]),
    ('PRODELASTICITY "C"', 'PRODELASTICITY({model};{inputs};"C")', lambda m, x: m.exponents[1]),
    ("PRODSCALE with inputs", "PRODSCALE({model};{inputs})", lambda m, x: m.returns()),
]


def column_letters(index):
    """0 -> A, 25 -> Z, 26 -> AA."""
    letters = ""
    index += 1
    while index:
        index, rest = divmod(index - 1, 26)
        letters = chr(ord("A") + rest) + letters
    return letters


class EvaluatorTest(CalcTestCase):
    """PRODOUTPUT, PRODMARGINAL, PRODELASTICITY, PRODSCALE, PRODRETURNS on a PRODFIT table and on typed
    models, one formula per row (as filling down makes) and one array formula over all rows."""

    TABLE = "$F$1:$L$17"
    TYPED = "$N$1:$O$4"     # form | cobb-douglas; A | 1.01; L | 0.75; C | 0.25 (Cobb & Douglas 1928)
    TYPED_LN = "$N$6:$O$9"  # form | cobb-douglas; ln A | 0.5; L | 0.6; C | 0.3
    FIRST, LAST = 2, 25     # the 24 rows of inputs, C2:D25
    MODELS = [TABLE, TYPED]

    @classmethod
    def setUpClass(cls):
        cls.data = cobb_douglas_data()
        cls.sheet = new_sheet("Evaluators")
        write_columns(cls.sheet, "A1", cls.data, ["year", "P", "L", "C"])
        set_array_formula(cls.sheet, "F1:L17", "=PRODFIT(B1:B25;C1:D25)")
        set_values(cls.sheet, "N1", [["form", "cobb-douglas"], ["A", 1.01], ["L", 0.75], ["C", 0.25], [None, None],
                                     ["form", "cobb-douglas"], ["ln A", 0.5], ["L", 0.6], ["C", 0.3]])
        for m, model in enumerate(cls.MODELS):
            for v, (_, formula, _) in enumerate(EVALUATORS):
                single, array = cls.result_columns(m, v)
                for row in range(cls.FIRST, cls.LAST + 1):
                    set_formula(cls.sheet, "%s%d" % (single, row),
                                "=" + formula.format(model=model, inputs="C%d:D%d" % (row, row)))
                set_array_formula(cls.sheet, "{0}{1}:{0}{2}".format(array, cls.FIRST, cls.LAST),
                                  "=" + formula.format(model=model, inputs="C%d:D%d" % (cls.FIRST, cls.LAST)))
        scale_and_returns = [
            ("Q30", "=PRODSCALE(%s)" % cls.TABLE), ("Q31", "=PRODRETURNS(%s;0.95)" % cls.TABLE),
            ("Q32", "=PRODRETURNS(%s;0.3)" % cls.TABLE), ("Q33", "=PRODRETURNS(%s)" % cls.TABLE),
            ("R30", "=PRODSCALE(%s)" % cls.TYPED), ("R31", "=PRODRETURNS(%s;0.5)" % cls.TYPED),
            ("R32", "=PRODRETURNS(%s;0.95)" % cls.TYPED),
            ("S30", "=PRODSCALE(%s)" % cls.TYPED_LN), ("S31", "=PRODRETURNS(%s;0.5)" % cls.TYPED_LN),
            ("S32", "=PRODRETURNS(%s;0.95)" % cls.TYPED_LN), ("S33", "=PRODOUTPUT(%s;C2:D2)" % cls.TYPED_LN),
        ]
        for cell, formula in scale_and_returns:
            set_formula(cls.sheet, cell, formula)
        recalc(DOC)
        cls.table = get_range(cls.sheet, "F1:L17")

    @classmethod
    def result_columns(cls, model_index, evaluator_index):
        """Columns of one model's one evaluator: (one formula per row, one array formula)."""
        first = 16 + model_index * 2 * len(EVALUATORS) + 2 * evaluator_index  # from Q on
        return column_letters(first), column_letters(first + 1)

    def table_formula(self):
        # The table's own numbers: ln A, then the exponents of L and C.
        self.assertEqual([row[0] for row in self.table[1:4]], ["ln A", "L", "C"])
        return CobbDouglasFormula(math.exp(self.table[1][1]), [self.table[2][1], self.table[3][1]])

    def check_evaluators(self, model_index, formula):
        bundles = list(zip(self.data["L"], self.data["C"]))
        for v, (what, _, expected) in enumerate(EVALUATORS):
            for kind, column in zip(["one formula per row", "array formula"], self.result_columns(model_index, v)):
                with self.subTest(function=what, entered_as=kind):
                    values = get_range(self.sheet, "{0}{1}:{0}{2}".format(column, self.FIRST, self.LAST))
                    self.assertEqual(len(values), len(bundles))
                    for row, ((value,), x) in enumerate(zip(values, bundles), start=self.FIRST):
                        self.assert_relative(value, expected(formula, x), FORMULA_RELATIVE,
                                             "%s, %s, row %d" % (what, kind, row))

    def test_evaluators_from_prodfit_table(self):
        self.check_evaluators(0, self.table_formula())

    def test_evaluators_from_typed_model(self):
        # The published 1928 technology P = 1.01 L^0.75 C^0.25 (Cobb & Douglas 1928), typed in.
        self.check_evaluators(1, CobbDouglasFormula(1.01, [0.75, 0.25]))

    def test_scale_and_returns_from_prodfit_table(self):
        formula = self.table_formula()
        self.assert_relative(get_cell(self.sheet, "Q30"), formula.returns(), FORMULA_RELATIVE, "PRODSCALE")
        returns = row_of(self.table, "returns to scale")
        nu, p_value = returns[1], returns[4]
        at_95 = get_cell(self.sheet, "Q31")
        at_30 = get_cell(self.sheet, "Q32")
        self.assertEqual(at_95, expected_verdict(nu, p_value, 0.95))
        self.assertEqual(at_30, expected_verdict(nu, p_value, 0.3))
        # The table's p (about 0.66) lies between 0.05 and 0.7: the level changes the verdict.
        self.assertNotEqual(at_95, at_30)
        # Omitted level: the default 0.95, as in the table's own verdict row.
        self.assertEqual(get_cell(self.sheet, "Q33"), at_95)
        self.assertEqual(row_of(self.table, "verdict")[1], at_95)

    def test_scale_and_returns_from_typed_models(self):
        # A typed model has no test: the verdict comes from returns to scale alone, at any level.
        self.assert_relative(get_cell(self.sheet, "R30"), 1.0, FORMULA_RELATIVE, "PRODSCALE typed")
        for cell, level in [("R31", 0.5), ("R32", 0.95)]:
            self.assertEqual(get_cell(self.sheet, cell), expected_verdict(0.75 + 0.25, None, level), cell)
        typed_ln = CobbDouglasFormula(math.exp(0.5), [0.6, 0.3])
        self.assert_relative(get_cell(self.sheet, "S30"), typed_ln.returns(), FORMULA_RELATIVE, "PRODSCALE ln A")
        for cell, level in [("S31", 0.5), ("S32", 0.95)]:
            self.assertEqual(get_cell(self.sheet, cell), expected_verdict(typed_ln.returns(), None, level), cell)
        x = (self.data["L"][0], self.data["C"][0])
        self.assert_relative(get_cell(self.sheet, "S33"), typed_ln.output(x), FORMULA_RELATIVE, "PRODOUTPUT ln A")


# -- 7: recalculation ------------------------------------------------------------------------------

class RecalculationTest(CalcTestCase):
    """Changing one data cell changes the table and the evaluators that read it."""

    def test_one_changed_output_refits(self):
        data = cobb_douglas_data()
        sheet = new_sheet("Recalculation")
        write_columns(sheet, "A1", data, ["year", "P", "L", "C"])
        set_array_formula(sheet, "F1:L17", "=PRODFIT(B1:B25;C1:D25)")
        set_formula(sheet, "N1", "=PRODOUTPUT($F$1:$L$17;C25:D25)")
        set_formula(sheet, "N2", '=PRODMARGINAL($F$1:$L$17;C25:D25;"L")')
        recalc(DOC)
        before = get_range(sheet, "F1:L17")
        before_output = get_cell(sheet, "N1")

        # 1922's output, 240 in Cobb & Douglas (1928), becomes 250.
        self.assertEqual(get_cell(sheet, "B25"), 240.0)
        set_values(sheet, "B25", [[250]])
        recalc(DOC)
        after = get_range(sheet, "F1:L17")
        returns = row_of(after, "returns to scale")
        self.assert_layout(after, layout(["L", "C"], expected_verdict(returns[1], returns[4], 0.95)))
        for label in ["ln A", "L", "C", "R2"]:
            self.assertNotEqual(row_of(after, label)[1], row_of(before, label)[1], label + " did not change")

        # The evaluators read the new table: function formula from its own numbers.
        formula = CobbDouglasFormula(math.exp(row_of(after, "ln A")[1]), [row_of(after, "L")[1], row_of(after, "C")[1]])
        x = (data["L"][-1], data["C"][-1])
        self.assertNotEqual(get_cell(sheet, "N1"), before_output)
        self.assert_relative(get_cell(sheet, "N1"), formula.output(x), FORMULA_RELATIVE, "PRODOUTPUT after")
        self.assert_relative(get_cell(sheet, "N2"), formula.marginal(x, 0), FORMULA_RELATIVE, "PRODMARGINAL after")

        # A table entered fresh on the changed data is the same as the recalculated one.
        set_array_formula(sheet, "F21:L37", "=PRODFIT(B1:B25;C1:D25)")
        self.assertEqual(get_range(sheet, "F21:L37"), after)

        with self.subTest("statsmodels on the changed data"):
            self.need_statsmodels()
            output = data["P"][:-1] + [250.0]
            result = statsmodels_fit(logs(output), [logs(data["L"]), logs(data["C"])])
            self.assert_matches_statsmodels(after, statsmodels_table(result, ["ln A", "L", "C"], 2))

        # Back to 240: the first table again, exactly.
        set_values(sheet, "B25", [[240]])
        recalc(DOC)
        self.assertEqual(get_range(sheet, "F1:L17"), before)
        self.assertEqual(get_cell(sheet, "N1"), before_output)


# -- 8: error messages -------------------------------------------------------------------------------

NA = object()  # a data cell that gets the formula =NA()
TABLE, CELL, COLUMN = "table", "cell", "column"  # how a case's formula is entered

# Base area of the sheet "Errors" (rows 1-25), read by the cases through the placeholders:
#   A1:C25 P, L, C of Cobb & Douglas (1928); F1:L17 their PRODFIT table; typed models from N6.
BASE = {
    "table": "$F$1:$L$17",
    "noform": "$N$6:$O$8",    # A | 1.01; L | 0.75; C | 0.25 (no form row)
    "cesmodel": "$N$10:$O$13",  # form | ces; A | 1.01; L | 0.75; C | 0.25
    "negmodel": "$N$15:$O$18",  # form | cobb-douglas; A | -1; L | 0.75; C | 0.25
    "bundle": "$B$2:$C$2",
    "bundles3": "$A$2:$C$25",  # three columns for a two-input model
    "empty": "$Z$1",           # a cell left empty
}


def with_column(index, label, make):
    """A change of the data: column `index` gets `label` and the values make(P, L, C)."""
    def change(rows):
        rows[0][index] = label
        for row in rows[1:]:
            row[index] = make(*row)
        return rows
    return change


def cells(*edits):
    """A change of the data: (range row counting the header as 1, column 0=P 1=L 2=C, new value)."""
    def change(rows):
        for row, column, value in edits:
            rows[row - 1][column] = value
        return rows
    return change


def first_rows(count):
    return lambda rows: rows[:count + 1]


def error(text):
    return "Error: " + text  # the add-in's prefix (addin/production_functions.cxx)


LEVEL_HINT = "is not a confidence level; give a number between 0 and 1, such as 0.95"

# (what, change of a copy of the data or None, formula, entered as, message) -- each message as
# written in core/src/*.cpp, which name the argument and the row (counting a header row).
# Placeholders: {out} and {inp} are the case's own copy of P and L, C (header in the first row);
# {inp_short} lacks the last row, {inp_bare_short} lacks the header and the last row, {out2} is
# P and L; the rest are in BASE.
ERROR_CASES = [
    ("text in inputs", cells((6, 2, "abc")), "PRODFIT({out};{inp})", TABLE,
     error("inputs: row 6, column 2 holds text 'abc'; every cell must hold a number")),
    ("an empty cell in inputs", cells((8, 1, None)), "PRODFIT({out};{inp})", TABLE,
     error("inputs: row 8, column 1 is empty; every cell must hold a number")),
    ("a zero input (logs)", cells((4, 2, 0)), "PRODFIT({out};{inp})", TABLE,
     error("inputs: row 4, column 2 is 0; logs need positive values")),
    ("a negative output", cells((11, 0, -5)), "PRODFIT({out};{inp})", TABLE,
     error("output: row 11 is -5; logs need positive values")),
    ("different row counts", None, "PRODFIT({out};{inp_short})", TABLE,
     error("inputs: has 23 rows of data but output has 24 rows")),
    ("different row counts, header in output only", None, "PRODFIT({out};{inp_bare_short})", TABLE,
     error("inputs: has 23 rows of data but output has 24 rows (a header row of text was found in output only)")),
    ("too few rows", first_rows(3), "PRODFIT({out};{inp})", TABLE,
     error("too few rows: output and inputs have 3 rows of data for 3 parameters to estimate; need at least 4")),
    ("collinear inputs: a column twice another", with_column(2, "2L", lambda p, l, c: 2 * l),
     "PRODFIT({out};{inp})", TABLE,
     error("inputs: 'L' and '2L' together with ln A are collinear (inputs taken in logs); drop one of them")),
    ("a constant input column", with_column(2, "C", lambda p, l, c: 100), "PRODFIT({out};{inp})", TABLE,
     error("inputs: 'C' does not vary, so it cannot be told apart from ln A")),
    ("a constant output", with_column(0, "P", lambda p, l, c: 150), "PRODFIT({out};{inp})", TABLE,
     error("output: every row holds the same value; there is no variation to explain")),
    ("output of two columns", None, "PRODFIT({out2};{inp})", TABLE, error("output: must be one column; it has 2")),
    ("unknown form word", None, 'PRODFIT({out};{inp};"quadratic")', TABLE,
     error("form: 'quadratic' is not a form; use \"cobb-douglas\", \"ces\" or \"translog\"")),
    ('"ces" with constant returns', None, 'PRODFIT({out};{inp};"ces";TRUE())', TABLE,
     error("constant returns: cannot be imposed on the ces form; leave the argument empty")),
    ('errors "hc" (abbreviated)', None, 'PRODFIT({out};{inp};;;"hc")', TABLE,
     error("errors: 'hc' is not a kind of standard error; use \"classical\", \"hc1\", \"hc3\" or \"cluster\"")),
    ("level 1.5", None, "PRODFIT({out};{inp};;;;1.5)", TABLE, error("level: 1.5 " + LEVEL_HINT)),
    # Calc passes a reference to one empty cell as the number 0 to an `any` argument.
    ("level from an empty cell", None, "PRODFIT({out};{inp};;;;{empty})", TABLE, error("level: 0 " + LEVEL_HINT)),
    ("constant returns given as text", None, 'PRODFIT({out};{inp};;"yes")', TABLE,
     error("constant returns: 'yes' is not TRUE or FALSE (1 or 0)")),
    ("PRODSTAT: a row label not in the table", None, 'PRODSTAT({out};{inp};"K")', CELL,
     error("row label: 'K' is not a row of the table; its rows are " + CD_ROW_LIST)),
    ("PRODSTAT: a column label not in the table", None, 'PRODSTAT({out};{inp};"R2";"se")', CELL,
     error("column label: 'se' is not a column; use value, std. error, t, p-value, lower bound or upper bound")),
    ("an input label that does not exist", None, 'PRODMARGINAL({table};{bundle};"K")', CELL,
     error("input: 'K' is not an input of the model; its inputs are 'L', 'C'")),
    ("input number 3 for a 2-input model", None, "PRODELASTICITY({table};{bundle};3)", CELL,
     error("input: 3 is not an input number; the model has 2 inputs")),
    # `input` is required (a range argument in idl/): Calc refuses the call without it, before the
    # add-in runs, with its wrong-argument-count error (platform notes: Err:504).
    ("no input given", None, "PRODMARGINAL({table};{bundle})", CELL, "Err:504"),
    ("a model range without a form row", None, "PRODOUTPUT({noform};{bundle})", CELL,
     error('model: has no "form" row (for example: form | cobb-douglas)')),
    ("a typed model of form ces with exponent rows", None, "PRODOUTPUT({cesmodel};{bundle})", CELL,
     error("model: row 3 ('L') is not a parameter of the ces form; its rows are delta, rho (or sigma) and nu")),
    ("a typed model with A below 0", None, "PRODSCALE({negmodel})", CELL, error("model: row 2 (A) must be positive")),
    ("inputs with the wrong number of columns", None, "PRODOUTPUT({table};{bundles3})", COLUMN,
     error("inputs: has 3 columns but the model has 2 inputs")),
    ("PRODRETURNS level 0", None, "PRODRETURNS({table};0)", CELL, error("level: 0 " + LEVEL_HINT)),
    # Platform notes (calc-addin-platform.md): an error cell inside a range argument gives Err:504
    # before the add-in is called.
    ("=NA() inside inputs", cells((9, 1, NA)), "PRODFIT({out};{inp})", TABLE, "Err:504"),
    ("=NA() inside an evaluator's inputs", cells((9, 1, NA)), "PRODOUTPUT({table};{inp_bare})", COLUMN, "Err:504"),
]


class ErrorMessageTest(CalcTestCase):
    """Bad input: the exact message in the cell, no number anywhere in the result, office alive."""

    SPACING = 30  # rows between the cases' blocks

    def write_case(self, sheet, top, change, formula, entered_as):
        """The case's copy of P, L, C at A{top}, its formula at E{top}; returns the result range."""
        data = cobb_douglas_data()
        rows = [["P", "L", "C"]] + [[p, l, c] for p, l, c in zip(data["P"], data["L"], data["C"])]
        if change:
            rows = change(rows)
        set_values(sheet, "A%d" % top, [[None if v is NA else v for v in row] for row in rows])
        for r, row in enumerate(rows):
            for c, value in enumerate(row):
                if value is NA:
                    set_formula(sheet, "%s%d" % ("ABC"[c], top + r), "=NA()")
        last = top + len(rows) - 1
        places = dict(BASE, out="A%d:A%d" % (top, last), inp="B%d:C%d" % (top, last),
                      inp_bare="B%d:C%d" % (top + 1, last), inp_short="B%d:C%d" % (top, last - 1),
                      inp_bare_short="B%d:C%d" % (top + 1, last - 1), out2="A%d:B%d" % (top, last))
        text = "=" + formula.format(**places)
        if entered_as == TABLE:
            target = "E%d:K%d" % (top, top + 15)   # a 16 x 7 table, as for a good fit
            set_array_formula(sheet, target, text)
        elif entered_as == COLUMN:
            target = "E%d:E%d" % (top, top + 23)   # one value per row of 24 inputs
            set_array_formula(sheet, target, text)
        else:
            target = "E%d" % top
            set_formula(sheet, target, text)
        return target

    def test_error_cases_then_office_alive(self):
        self.assertGreaterEqual(len(ERROR_CASES), 12)
        sheet = new_sheet("Errors")
        data = cobb_douglas_data()
        write_columns(sheet, "A1", data, ["P", "L", "C"])
        set_array_formula(sheet, "F1:L17", "=PRODFIT(A1:A25;B1:C25)")
        set_values(sheet, "N6", [["A", 1.01], ["L", 0.75], ["C", 0.25], [None, None],
                                 ["form", "ces"], ["A", 1.01], ["L", 0.75], ["C", 0.25], [None, None],
                                 ["form", "cobb-douglas"], ["A", -1], ["L", 0.75], ["C", 0.25]])
        targets = []
        for i, (_, change, formula, entered_as, _) in enumerate(ERROR_CASES):
            top = self.SPACING * (i + 1) + 1
            targets.append(self.write_case(sheet, top, change, formula, entered_as))
        recalc(DOC)
        # The base table itself is fine: the errors come from the cases, not from the data.
        self.assertEqual(get_cell(sheet, "F2"), "ln A")

        for (what, _, formula, _, message), target in zip(ERROR_CASES, targets):
            with self.subTest(what, formula=formula):
                result = get_range(sheet, target)
                self.assert_message(result[0][0], message, what)
                # No number anywhere in the result range (Calc repeats a 1 x 1 result over it).
                numbers = [v for row in result for v in row if isinstance(v, float)]
                self.assertEqual(numbers, [], what + ": numbers shown beside the message")

        self.assertTrue(OFFICE.alive(), "the office stopped answering after the error cases")


# -- 9: Function Wizard metadata ---------------------------------------------------------------------

# Display names and argument counts, as the issues state the functions.
ARGUMENT_COUNTS = {"PRODFIT": 11, "PRODSTAT": 13, "PRODOUTPUT": 3, "PRODMARGINAL": 3, "PRODELASTICITY": 3,
                   "PRODSCALE": 2, "PRODRETURNS": 2}
# Required arguments lead; the rest are optional (declared `any` in idl/, which Calc marks optional).
REQUIRED_ARGUMENTS = {"PRODFIT": 2, "PRODSTAT": 3, "PRODOUTPUT": 2, "PRODMARGINAL": 3, "PRODELASTICITY": 3,
                      "PRODSCALE": 1, "PRODRETURNS": 1}
# Productivity and growth (their own checks: test_growth_in_calc.py).
ARGUMENT_COUNTS.update({"PRODTFP": 4, "PRODGROWTH": 5, "PRODINDEX": 5})
REQUIRED_ARGUMENTS.update({"PRODTFP": 3, "PRODGROWTH": 3, "PRODINDEX": 2})
# The regularity test and the comparison of forms (test_forms_in_calc.py computes them).
ARGUMENT_COUNTS.update({"PRODREGULAR": 2, "PRODCOMPARE": 3})
REQUIRED_ARGUMENTS.update({"PRODREGULAR": 2, "PRODCOMPARE": 2})
ARGUMENT_COUNTS.update({"PRODSECOND": 4, "PRODINPUTRETURNS": 3, "PRODPAIR": 4, "PRODMRTS": 4, "PRODSUBSTITUTION": 5,
                        "PRODLEASTCOST": 3, "PRODCOST": 4, "PRODBUDGET": 3, "PRODPROFIT": 3, "PRODISOQUANT": 5})
REQUIRED_ARGUMENTS.update({"PRODSECOND": 3, "PRODINPUTRETURNS": 3, "PRODPAIR": 4, "PRODMRTS": 4, "PRODSUBSTITUTION": 4,
                           "PRODLEASTCOST": 3, "PRODCOST": 3, "PRODBUDGET": 3, "PRODPROFIT": 3, "PRODISOQUANT": 3})
FUNCTION_CATEGORY_NAMES = ["DATABASE", "DATETIME", "FINANCIAL", "INFORMATION", "LOGICAL", "MATHEMATICAL",
                           "MATRIX", "STATISTICAL", "TEXT", "SPREADSHEET", "ADDIN"]


class FunctionWizardTest(CalcTestCase):
    """com.sun.star.sheet.FunctionDescriptions lists every function once, with a description and every
    argument named, described and flagged as stated above (names: test_sheet_behaviour.py)."""

    @classmethod
    def setUpClass(cls):
        descriptions = OFFICE.service_manager.createInstanceWithContext(
            "com.sun.star.sheet.FunctionDescriptions", OFFICE.context)
        cls.listed = {}
        for i in range(descriptions.getCount()):
            properties = {p.Name: p.Value for p in descriptions.getByIndex(i)}
            if properties.get("Name") in ARGUMENT_COUNTS:
                cls.listed.setdefault(properties["Name"], []).append(properties)

    def test_every_function_listed_once_with_its_description(self):
        self.assertEqual(sorted(self.listed), sorted(ARGUMENT_COUNTS))
        for name, entries in self.listed.items():
            with self.subTest(function=name):
                self.assertEqual(len(entries), 1)
                self.assertTrue(entries[0]["Description"].strip())

    def test_every_argument_named_and_described(self):
        for name, entries in self.listed.items():
            arguments = entries[0]["Arguments"]
            with self.subTest(function=name):
                self.assertEqual(len(arguments), ARGUMENT_COUNTS[name])
                for i, argument in enumerate(arguments):
                    self.assertTrue(argument.Name.strip() and argument.Description.strip(),
                                    "%s argument %d" % (name, i + 1))
                    self.assertEqual(argument.IsOptional, i >= REQUIRED_ARGUMENTS[name],
                                     "%s argument %r optional" % (name, argument.Name))

    def test_category_is_add_in(self):
        # The add-in names its category "Production Economics" (addin/function_table.hxx), not one of
        # Calc's: Calc 7.4 files such functions under Add-In (com.sun.star.sheet.FunctionCategory).
        add_in = uno.getConstantByName("com.sun.star.sheet.FunctionCategory.ADDIN")
        for name, entries in self.listed.items():
            with self.subTest(function=name):
                category = entries[0]["Category"]
                names = [n for n in FUNCTION_CATEGORY_NAMES
                         if uno.getConstantByName("com.sun.star.sheet.FunctionCategory." + n) == category]
                self.assertEqual((category, names), (add_in, ["ADDIN"]))
                self.assertEqual(category, 11)


if __name__ == "__main__":
    unittest.main()
