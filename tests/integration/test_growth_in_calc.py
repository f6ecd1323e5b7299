"""PRODGROWTH, PRODINDEX and PRODTFP computed by a real headless LibreOffice Calc with the extension.

Run from the repository root with Debian's Python (the only one that imports uno):
    /usr/bin/python3 -m unittest -v tests/integration/test_growth_in_calc.py

One office with the extension serves the whole module. The data are invented: eight years of a
tile plant (output in thousand square metres; labour, kiln capital and energy; the cost shares of
the three from its books), the scenario of the README's worked example.

Sources of the expected figures, named beside each check:
- "formula": the definitions in core/include/isoquant/growth_accounting.hpp and index_numbers.hpp
  (those of the issue), recomputed here in Python from the sheet's own numbers. Agreement to 1e-12
  (absolute for log growth, which may be near 0; relative for index values): the same few
  operations on numbers of order 1 in double precision, in another order.
- "identity": each PRODGROWTH row adds up to its output growth (TFP growth is the residual).
- "least squares": on the sample a PRODFIT table was fitted to, the log residuals average 0, so
  PRODTFP's geometric mean is 1.
- "Fisher (1922)": the Fisher index is the geometric mean of Laspeyres and Paasche (from memory).
- Error messages: the wording in core/src/period_range.cpp and core/src/growth_cell_functions.cpp,
  which the add-in prefixes with "Error: ".
The reference-library recomputation (numpy) of these functions is the CTest pair
numpy_growth_figures / numpy_growth_cross_check.
"""

import math
import os
import sys
import unittest

HERE = os.path.dirname(os.path.abspath(__file__))
sys.path.insert(0, HERE)

from office import (  # noqa: E402  (needs the path above)
    get_cell, get_range, recalc, set_array_formula, set_formula, set_values, start_module_office,
    stop_module_office)

REPO = os.path.normpath(os.path.join(HERE, "..", ".."))
OXT = os.environ.get("ISOQUANT_OXT", os.path.join(REPO, "build", "isoquant.oxt"))

FORMULA_TOLERANCE = 1e-12
EPSILON = sys.float_info.epsilon

# Invented: a tile plant, years 1-8.
OUTPUT = [1200, 1262, 1318, 1301, 1389, 1460, 1497, 1580]
INPUTS = {"labour": [310, 318, 322, 315, 326, 331, 333, 340],
          "capital": [820, 850, 905, 930, 960, 1010, 1050, 1095],
          "energy": [150, 156, 158, 151, 160, 163, 161, 166]}
SHARES = {"labour": [0.52, 0.51, 0.50, 0.50, 0.49, 0.48, 0.48, 0.47],
          "capital": [0.33, 0.34, 0.35, 0.36, 0.36, 0.37, 0.38, 0.38],
          "energy": [0.15, 0.15, 0.15, 0.14, 0.15, 0.15, 0.14, 0.15]}
LABELS = ["labour", "capital", "energy"]
HEADER = ["period", "output growth"] + LABELS + ["scale effect", "TFP growth"]
N = len(OUTPUT)

OFFICE = None
DOC = None
SHEET = None


def setUpModule():
    global OFFICE, DOC, SHEET
    OFFICE, DOC = start_module_office(OXT, lambda doc: write_plant(doc.Sheets.getByIndex(0)))
    SHEET = DOC.Sheets.getByIndex(0)


def tearDownModule():
    stop_module_office(OFFICE)


def write_plant(sheet):
    """A1:A9 year, B1:B9 output, C1:E9 inputs, F1:H9 cost shares, each under a header row."""
    rows = [["year", "output"] + LABELS + LABELS]
    for t in range(N):
        rows.append([t + 1, OUTPUT[t]] + [INPUTS[x][t] for x in LABELS] + [SHARES[x][t] for x in LABELS])
    set_values(sheet, "A1", rows)


def columns_of(data):
    return [[data[x][t] for x in LABELS] for t in range(N)]


def growth_rows(output, quantities, period_weights, average=True):
    """The account by the formula: rows [period, g_Y, c_1..c_k, s, r], then the total row."""
    k = len(quantities[0])
    rows, total_c, total_s = [], [0.0] * k, 0.0
    for t in range(1, len(output)):
        w = [0.5 * (a + b) for a, b in zip(period_weights[t - 1], period_weights[t])] if average \
            else list(period_weights[t])
        nu = sum(w)
        g_y = math.log(output[t]) - math.log(output[t - 1])
        c = [w[i] / nu * (math.log(quantities[t][i]) - math.log(quantities[t - 1][i])) for i in range(k)]
        s = (nu - 1) * sum(c)
        rows.append([t + 1, g_y] + c + [s, g_y - sum(c) - s])
        total_c = [a + b for a, b in zip(total_c, c)]
        total_s += s
    g_total = math.log(output[-1]) - math.log(output[0])
    rows.append(["total", g_total] + total_c + [total_s, g_total - sum(total_c) - total_s])
    return rows


def index_by_formula(quantities, shares, method, base=1.0):
    values = [base]
    for t in range(1, len(quantities)):
        r = [b / a for a, b in zip(quantities[t - 1], quantities[t])]
        laspeyres = sum(s * x for s, x in zip(shares[t - 1], r))
        paasche = 1 / sum(s / x for s, x in zip(shares[t], r))
        link = {"tornqvist": math.exp(sum(0.5 * (a + b) * math.log(x)
                                          for a, b, x in zip(shares[t - 1], shares[t], r))),
                "laspeyres": laspeyres, "paasche": paasche,
                "fisher": math.sqrt(laspeyres * paasche)}[method]
        values.append(values[-1] * link)
    return values


class GrowthTestCase(unittest.TestCase):

    def assert_number(self, value, what):
        self.assertIsInstance(value, float, "%s: expected a number, the cell shows %r" % (what, value))
        self.assertTrue(math.isfinite(value), "%s: %r is not finite" % (what, value))

    def assert_table(self, table, expected):
        """The header, the period labels and every figure against the formula (1e-12 absolute)."""
        self.assertEqual(table[0], HEADER)
        self.assertEqual(len(table), len(expected) + 1)
        for row, wanted in zip(table[1:], expected):
            self.assertEqual(row[0], float(wanted[0]) if wanted[0] != "total" else "total")
            for column, (value, figure) in enumerate(zip(row[1:], wanted[1:]), start=1):
                what = "period %s, %s" % (wanted[0], HEADER[column])
                self.assert_number(value, what)
                self.assertLessEqual(abs(value - figure), FORMULA_TOLERANCE, "%s: %r vs %r" % (what, value, figure))

    def assert_rows_add_up(self, table):
        # identity: |g − Σ rest| ≤ (k + 2)·ε·Σ|terms| (the bound of tests/unit/test_growth_accounting.cpp).
        for row in table[1:]:
            terms = row[2:]
            self.assertLessEqual(abs(row[1] - sum(terms)),
                                 (len(LABELS) + 2) * EPSILON * (abs(row[1]) + sum(abs(x) for x in terms)),
                                 "period %s does not add up" % row[0])


class GrowthTableTest(GrowthTestCase):
    """PRODGROWTH with cost shares, a typed model and a PRODFIT table as weights."""

    @classmethod
    def setUpClass(cls):
        # 8 periods, 3 inputs: 8 + 1 rows, 3 + 4 columns (core/include/isoquant/growth_table.hpp).
        set_array_formula(SHEET, "J1:P9", "=PRODGROWTH(B1:B9;C1:E9;F1:H9)")
        set_array_formula(SHEET, "J11:P19", '=PRODGROWTH(B1:B9;C1:E9;F1:H9;"tornqvist")')
        set_values(SHEET, "R1", [["form", "cobb-douglas"], ["A", 2.5], ["labour", 0.55], ["capital", 0.3],
                                 ["energy", 0.1]])
        set_array_formula(SHEET, "J21:P29", '=PRODGROWTH(B1:B9;C1:E9;$R$1:$S$5;"fixed")')
        set_array_formula(SHEET, "J31:P39", "=PRODGROWTH(B1:B9;C1:E9;$R$1:$S$5)")
        set_array_formula(SHEET, "R11:X27", "=PRODFIT(B1:B9;C1:E9)")
        set_array_formula(SHEET, "J41:P49", "=PRODGROWTH(B1:B9;C1:E9;$R$11:$X$27)")
        recalc(DOC)

    def test_with_cost_shares(self):
        expected = growth_rows(OUTPUT, columns_of(INPUTS), columns_of(SHARES))
        for where in ["J1:P9", "J11:P19"]:
            table = get_range(SHEET, where)
            self.assert_table(table, expected)
            self.assert_rows_add_up(table)
        # The total row's output growth is ln(Y_8 / Y_1) (formula).
        self.assertLessEqual(abs(get_cell(SHEET, "K9") - math.log(1580 / 1200)), FORMULA_TOLERANCE)
        # Documentation check, not an independent source (those are the formula checks above): the
        # README's worked example prints this total row rounded to 4 decimals.
        printed = [0.2751, 0.0456, 0.1038, 0.0150, 0.0000, 0.1106]
        for value, figure in zip(get_range(SHEET, "K9:P9")[0], printed):
            self.assertLessEqual(abs(value - figure), 0.00005, "README total row (documentation check)")

    def test_with_a_typed_model(self):
        weights = [[0.55, 0.3, 0.1]] * N
        expected = growth_rows(OUTPUT, columns_of(INPUTS), weights, average=False)
        for where in ["J21:P29", "J31:P39"]:
            table = get_range(SHEET, where)
            self.assert_table(table, expected)
            self.assert_rows_add_up(table)
        # ν = 0.95: a scale effect that is not 0 (formula: (ν − 1)·Σ(εᵢ/ν)·Δln xᵢ).
        self.assertNotEqual(get_cell(SHEET, "O22"), 0.0)

    def test_with_a_prodfit_table(self):
        fit = get_range(SHEET, "R11:X27")
        exponents = [row[1] for row in fit[2:5]]
        self.assertEqual([row[0] for row in fit[2:5]], LABELS)
        table = get_range(SHEET, "J41:P49")
        self.assert_table(table, growth_rows(OUTPUT, columns_of(INPUTS), [exponents] * N, average=False))
        self.assert_rows_add_up(table)


class IndexAndProductivityTest(GrowthTestCase):
    """PRODINDEX by every method, and PRODTFP of a PRODFIT table on its own sample."""

    METHODS = ["tornqvist", "laspeyres", "paasche", "fisher"]

    @classmethod
    def setUpClass(cls):
        for m, method in enumerate(cls.METHODS):
            column = "ABCD"[m]
            set_array_formula(SHEET, "%s51:%s58" % (column, column), '=PRODINDEX(C1:E9;F1:H9;"%s")' % method)
            set_array_formula(SHEET, "%s61:%s68" % (column, column), '=PRODINDEX(C1:E9;F1:H9;"%s";100)' % method)
        set_array_formula(SHEET, "F51:F58", "=PRODINDEX(C1:E9;F1:H9)")
        set_array_formula(SHEET, "R31:X47", "=PRODFIT(B1:B9;C1:E9)")
        set_array_formula(SHEET, "G51:G58", "=PRODTFP($R$31:$X$47;B1:B9;C1:E9)")
        set_formula(SHEET, "H51", "=PRODTFP($R$31:$X$47;B9;C9:E9)")
        recalc(DOC)

    def test_every_method_by_formula(self):
        for m, method in enumerate(self.METHODS):
            column = "ABCD"[m]
            for base, top in [(1.0, 51), (100.0, 61)]:
                values = [row[0] for row in get_range(SHEET, "%s%d:%s%d" % (column, top, column, top + 7))]
                expected = index_by_formula(columns_of(INPUTS), columns_of(SHARES), method, base)
                self.assertEqual(values[0], base, method)  # the first period is the base exactly
                for t, (value, figure) in enumerate(zip(values, expected), start=1):
                    with self.subTest(method=method, base=base, period=t):
                        self.assert_number(value, method)
                        self.assertLessEqual(abs(value - figure), FORMULA_TOLERANCE * figure)
        # Omitted method: Törnqvist.
        self.assertEqual(get_range(SHEET, "F51:F58"), get_range(SHEET, "A51:A58"))

    def test_fisher_is_the_geometric_mean(self):
        # Fisher (1922): F = √(L·P), period by period.
        for t in range(51, 59):
            laspeyres, paasche, fisher = (get_cell(SHEET, "%s%d" % (c, t)) for c in "BCD")
            self.assertLessEqual(abs(fisher - math.sqrt(laspeyres * paasche)), FORMULA_TOLERANCE * fisher)

    def test_productivity_on_the_fitting_sample(self):
        levels = [row[0] for row in get_range(SHEET, "G51:G58")]
        for level in levels:
            self.assert_number(level, "PRODTFP")
        # least squares: the geometric mean is 1 (ln values of order 7: 1e-12 is rounding).
        self.assertLessEqual(abs(sum(math.log(x) for x in levels) / N), 1e-12)
        # One row on its own gives that row's value.
        self.assertEqual(get_cell(SHEET, "H51"), levels[-1])


def error(text):
    return "Error: " + text  # the add-in's prefix (addin/production_functions.cxx)


# (what, formula, result range, message). The areas used: the plant in A1:H9, the typed model in
# R1:S5, a copy of the inputs with one zero in C71:E79, shares in another order in F71:H79, shares
# whose year 4 sums to 0.9 in J71:L79.
ERROR_CASES = [
    ("periods of different lengths", "PRODGROWTH(B1:B9;C1:E8;F1:H9)", "J81:P89",
     error("inputs: has 7 periods but output has 8 periods")),
    ("shares of fewer inputs", "PRODGROWTH(B1:B9;C1:E9;F1:G9)", "J91:P99",
     error("weights: has 2 columns but inputs has 3")),
    ("shares in another order than the inputs", "PRODGROWTH(B1:B9;C1:E9;F71:H79)", "J101:P109",
     error("weights: column 1 is 'capital' but inputs column 1 is 'labour'; give them the same labels, in the "
           "same order")),
    ("shares of fewer periods (index)", "PRODINDEX(C1:E9;F1:H8)", "J111:J118",
     error("shares: has 7 periods but quantities has 8 periods")),
    ("a zero quantity (growth)", "PRODGROWTH(B1:B9;C71:E79;F1:H9)", "J121:P129",
     error("inputs: period 5 (row 6), column 2 is 0; quantities must be positive (growth is a difference of logs)")),
    ("a zero quantity (index)", "PRODINDEX(C71:E79;F1:H9)", "J131:J138",
     error("quantities: period 5 (row 6), column 2 is 0; quantities must be positive (growth is a difference of "
           "logs)")),
    ("shares that do not sum to 1", "PRODINDEX(C1:E9;J71:L79)", "J141:J148",
     error("shares: period 4 (row 5): the shares sum to 0.9; the cost shares of a period must sum to 1 (within "
           "0.01)")),
    ('"fixed" with cost shares', 'PRODGROWTH(B1:B9;C1:E9;F1:H9;"fixed")', "J151:P159",
     error('method: "fixed" uses a model\'s constant elasticities; with cost shares as weights use "tornqvist"')),
    ("an unknown index method", 'PRODINDEX(C1:E9;F1:H9;"chain")', "J161:J168",
     error('method: \'chain\' is not an index method; use "tornqvist", "laspeyres", "paasche" or "fisher"')),
    ("base 0", "PRODINDEX(C1:E9;F1:H9;;0)", "J171:J178",
     error("base: 0 is not a base value; give a positive number such as 1 or 100")),
    ("a model with fewer inputs", "PRODGROWTH(B1:B9;C1:E9;$R$1:$S$4)", "J181:P189",
     error("weights: the model has 2 inputs but inputs has 3 columns")),
    ("PRODTFP with inputs of fewer rows", "PRODTFP($R$1:$S$5;B1:B9;C1:E8)", "J191:J198",
     error("inputs: has 7 rows of data but output has 8 rows")),
]


class GrowthErrorTest(GrowthTestCase):
    """Bad input: the exact message in the cell, no number anywhere in the result, office alive."""

    def test_error_cases_then_office_alive(self):
        zero = [["labour", "capital", "energy"]] + columns_of(INPUTS)
        zero[5][1] = 0
        swapped = [["capital", "labour", "energy"]] + [[s[1], s[0], s[2]] for s in columns_of(SHARES)]
        short = [LABELS] + columns_of(SHARES)
        short[4] = [0.5, 0.26, 0.14]
        set_values(SHEET, "C71", zero)
        set_values(SHEET, "F71", swapped)
        set_values(SHEET, "J71", short)
        if get_cell(SHEET, "R1") != "form":  # the typed model, when this class runs alone
            set_values(SHEET, "R1", [["form", "cobb-douglas"], ["A", 2.5], ["labour", 0.55], ["capital", 0.3],
                                     ["energy", 0.1]])
        for _, formula, target, _ in ERROR_CASES:
            set_array_formula(SHEET, target, "=" + formula)
        recalc(DOC)
        for what, formula, target, message in ERROR_CASES:
            with self.subTest(what, formula=formula):
                result = get_range(SHEET, target)
                self.assertEqual(result[0][0], message, what)
                numbers = [v for row in result for v in row if isinstance(v, float)]
                self.assertEqual(numbers, [], what + ": numbers shown beside the message")
        self.assertTrue(OFFICE.alive(), "the office stopped answering after the error cases")


class GrowthFunctionWizardTest(unittest.TestCase):
    """The three functions are listed with their argument names; the optional ones are marked so."""

    EXPECTED = {"PRODTFP": (["model", "output", "inputs"], 3),
                "PRODGROWTH": (["output", "inputs", "weights", "method"], 3),
                "PRODINDEX": (["quantities", "shares", "method", "base"], 2)}

    def test_listed_with_arguments(self):
        descriptions = OFFICE.service_manager.createInstanceWithContext(
            "com.sun.star.sheet.FunctionDescriptions", OFFICE.context)
        listed = {}
        for i in range(descriptions.getCount()):
            properties = {p.Name: p.Value for p in descriptions.getByIndex(i)}
            if properties.get("Name") in self.EXPECTED:
                listed[properties["Name"]] = properties
        self.assertEqual(sorted(listed), sorted(self.EXPECTED))
        for name, (arguments, required) in self.EXPECTED.items():
            with self.subTest(function=name):
                self.assertTrue(listed[name]["Description"].strip())
                found = listed[name]["Arguments"]
                self.assertEqual([a.Name for a in found], arguments)
                self.assertEqual([a.IsOptional for a in found], [i >= required for i in range(len(arguments))])
                self.assertTrue(all(a.Description.strip() for a in found))


if __name__ == "__main__":
    unittest.main()
