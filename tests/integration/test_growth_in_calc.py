"""PRODGROWTH, PRODINDEX and PRODTFP computed by a real headless LibreOffice Calc with the extension.

Run from the repository root with Debian's Python, the package isoquant_office on the path (see
tests/integration/README.md):
    PYTHONPATH=addin/python /usr/bin/python3 -m unittest -v tests/integration/test_growth_in_calc.py

One office with the extension serves the whole module. The data are invented: eight years of a
tile plant (output in thousand square metres; labour, kiln capital and energy; the cost shares of
the three from its books), the scenario of the README's worked example.

Sources of the expected figures, named beside each check:
- "formula": the definitions in core/math/include/isoquant/math/growth/growth_accounting.hpp and index_numbers.hpp
  (those of the issue), recomputed here in Python from the sheet's own numbers. Agreement to 1e-12
  (absolute for log growth, which may be near 0; relative for index values): the same few
  operations on numbers of order 1 in double precision, in another order.
- "identity": each PRODGROWTH row adds up to its output growth (TFP growth is the residual).
- "least squares": on the sample a PRODFIT table was fitted to, the log residuals average 0 (over
  all rows, and within each group under fixed effects), so PRODTFP's geometric mean is 1 when each
  row is compared with its own period's technology (the `periods` argument, with a trend) and
  with the group effects' mean over rows.
- "Diewert (1992)": W. E. Diewert, "Fisher ideal output, input and productivity indexes
  revisited", Journal of Productivity Analysis 3, 211–248: the identity test (constant quantities
  give a constant index) and proportionality (from memory).
- "Fisher (1922)": the Fisher index is the geometric mean of Laspeyres and Paasche (from memory).
- Error messages: the wording in core/sheet/src/arguments/period_range.cpp and core/sheet/src/functions/growth_functions.cpp,
  which the add-in prefixes with "Error: ".
The reference-library recomputation (numpy) of these functions is the CTest pair
numpy_growth_figures / numpy_growth_cross_check.
"""

import math
import random
import sys
import unittest

from isoquant_office import get_cell, get_range, recalc, set_array_formula, set_formula, set_values

from .support import CalcTestCase, module_session

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

def write_plant(sheet):
    """A1:A9 year, B1:B9 output, C1:E9 inputs, F1:H9 cost shares, each under a header row."""
    rows = [["year", "output"] + LABELS + LABELS]
    for t in range(N):
        rows.append([t + 1, OUTPUT[t]] + [INPUTS[x][t] for x in LABELS] + [SHARES[x][t] for x in LABELS])
    set_values(sheet, "A1", rows)


CALC = module_session(write_plant)
setUpModule, tearDownModule = CALC.start, CALC.stop


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


class GrowthTestCase(CalcTestCase):

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
        # 8 periods, 3 inputs: 8 + 1 rows, 3 + 4 columns (core/sheet/include/isoquant/sheet/tables/growth_table.hpp).
        set_array_formula(CALC.sheet, "J1:P9", "=PRODGROWTH(B1:B9;C1:E9;F1:H9)")
        set_array_formula(CALC.sheet, "J11:P19", '=PRODGROWTH(B1:B9;C1:E9;F1:H9;"tornqvist")')
        set_values(CALC.sheet, "R1", [["form", "cobb-douglas"], ["A", 2.5], ["labour", 0.55], ["capital", 0.3],
                                      ["energy", 0.1]])
        set_array_formula(CALC.sheet, "J21:P29", '=PRODGROWTH(B1:B9;C1:E9;$R$1:$S$5;"fixed")')
        set_array_formula(CALC.sheet, "J31:P39", "=PRODGROWTH(B1:B9;C1:E9;$R$1:$S$5)")
        set_array_formula(CALC.sheet, "R11:X27", "=PRODFIT(B1:B9;C1:E9)")
        set_array_formula(CALC.sheet, "J41:P49", "=PRODGROWTH(B1:B9;C1:E9;$R$11:$X$27)")
        recalc(CALC.doc)

    def test_with_cost_shares(self):
        expected = growth_rows(OUTPUT, columns_of(INPUTS), columns_of(SHARES))
        for where in ["J1:P9", "J11:P19"]:
            table = get_range(CALC.sheet, where)
            self.assert_table(table, expected)
            self.assert_rows_add_up(table)
        # The total row's output growth is ln(Y_8 / Y_1) (formula).
        self.assertLessEqual(abs(get_cell(CALC.sheet, "K9") - math.log(1580 / 1200)), FORMULA_TOLERANCE)
        # Documentation check, not an independent source (those are the formula checks above): the
        # README's worked example prints this total row rounded to 4 decimals.
        printed = [0.2751, 0.0456, 0.1038, 0.0150, 0.0000, 0.1106]
        for value, figure in zip(get_range(CALC.sheet, "K9:P9")[0], printed):
            self.assertLessEqual(abs(value - figure), 0.00005, "README total row (documentation check)")

    def test_with_a_typed_model(self):
        weights = [[0.55, 0.3, 0.1]] * N
        expected = growth_rows(OUTPUT, columns_of(INPUTS), weights, average=False)
        for where in ["J21:P29", "J31:P39"]:
            table = get_range(CALC.sheet, where)
            self.assert_table(table, expected)
            self.assert_rows_add_up(table)
        # ν = 0.95: a scale effect that is not 0 (formula: (ν − 1)·Σ(εᵢ/ν)·Δln xᵢ).
        self.assertNotEqual(get_cell(CALC.sheet, "O22"), 0.0)

    def test_with_a_prodfit_table(self):
        fit = get_range(CALC.sheet, "R11:X27")
        exponents = [row[1] for row in fit[2:5]]
        self.assertEqual([row[0] for row in fit[2:5]], LABELS)
        table = get_range(CALC.sheet, "J41:P49")
        self.assert_table(table, growth_rows(OUTPUT, columns_of(INPUTS), [exponents] * N, average=False))
        self.assert_rows_add_up(table)


class IndexAndProductivityTest(GrowthTestCase):
    """PRODINDEX by every method, and PRODTFP of a PRODFIT table on its own sample."""

    METHODS = ["tornqvist", "laspeyres", "paasche", "fisher"]

    @classmethod
    def setUpClass(cls):
        for m, method in enumerate(cls.METHODS):
            column = "ABCD"[m]
            set_array_formula(CALC.sheet, "%s50:%s58" % (column, column), '=PRODINDEX(C1:E9;F1:H9;"%s")' % method)
            set_array_formula(CALC.sheet, "%s60:%s68" % (column, column), '=PRODINDEX(C1:E9;F1:H9;"%s";100)' % method)
        set_array_formula(CALC.sheet, "F50:F58", "=PRODINDEX(C1:E9;F1:H9)")
        set_array_formula(CALC.sheet, "R31:X47", "=PRODFIT(B1:B9;C1:E9)")
        set_array_formula(CALC.sheet, "G50:G58", "=PRODTFP($R$31:$X$47;B1:B9;C1:E9)")
        set_formula(CALC.sheet, "H51", "=PRODTFP($R$31:$X$47;B9;C9:E9)")
        recalc(CALC.doc)

    def test_every_method_by_formula(self):
        for m, method in enumerate(self.METHODS):
            column = "ABCD"[m]
            for base, top in [(1.0, 51), (100.0, 61)]:
                values = [row[0] for row in get_range(CALC.sheet, "%s%d:%s%d" % (column, top, column, top + 7))]
                expected = index_by_formula(columns_of(INPUTS), columns_of(SHARES), method, base)
                self.assertEqual(values[0], base, method)  # the first period is the base exactly
                for t, (value, figure) in enumerate(zip(values, expected), start=1):
                    with self.subTest(method=method, base=base, period=t):
                        self.assert_number(value, method)
                        self.assertLessEqual(abs(value - figure), FORMULA_TOLERANCE * figure)
        # Omitted method: Törnqvist.
        self.assertEqual(get_range(CALC.sheet, "F51:F58"), get_range(CALC.sheet, "A51:A58"))

    def test_fisher_is_the_geometric_mean(self):
        # Fisher (1922): F = √(L·P), period by period.
        for t in range(51, 59):
            laspeyres, paasche, fisher = (get_cell(CALC.sheet, "%s%d" % (c, t)) for c in "BCD")
            self.assertLessEqual(abs(fisher - math.sqrt(laspeyres * paasche)), FORMULA_TOLERANCE * fisher)

    def test_columns_under_a_header_row_start_with_their_own_header_cell(self):
        # entered over rows 50-58 beside the ranges' header row 1-9: the header cells line up
        self.assertEqual(get_cell(CALC.sheet, "A50"), "quantity index")
        self.assertEqual(get_cell(CALC.sheet, "G50"), "TFP")

    def test_productivity_on_the_fitting_sample(self):
        levels = [row[0] for row in get_range(CALC.sheet, "G51:G58")]
        for level in levels:
            self.assert_number(level, "PRODTFP")
        # least squares: the geometric mean is 1 (ln values of order 7: 1e-12 is rounding).
        self.assertLessEqual(abs(sum(math.log(x) for x in levels) / N), 1e-12)
        # One row on its own gives that row's value.
        self.assertEqual(get_cell(CALC.sheet, "H51"), levels[-1])


# Invented: an unbalanced panel of four kilns (plants) over 2016-2023, each observed for its own run
# of years; ln Y = α_kiln + 0.6 ln L + 0.3 ln K + 0.025·(year − 2016) + noise, seeded.
KILN_RUNS = {"north": (2016, 6), "east": (2018, 3), "south": (2016, 8), "west": (2019, 5)}


def kiln_panel():
    generator = random.Random(17)
    rows = [["year", "kiln", "output", "labour", "capital"]]
    for effect, (kiln, (first, years)) in zip([0.2, 0.9, 0.5, 1.3], KILN_RUNS.items()):
        for year in range(first, first + years):
            labour = math.exp(generator.uniform(2.0, 5.0) + 0.5 * effect)
            capital = math.exp(generator.uniform(3.0, 6.0) - 0.5 * effect)
            log_output = (effect + 0.6 * math.log(labour) + 0.3 * math.log(capital) + 0.025 * (year - 2016)
                          + generator.gauss(0.0, 0.05))
            rows.append([year, kiln, round(math.exp(log_output), 3), round(labour, 3), round(capital, 3)])
    return rows


class RescaledSharesAndPeriodsTest(GrowthTestCase):
    """Issue items: shares within 0.01 of 1 rescaled; PRODTFP's periods and the row-weighted mean effect."""

    @classmethod
    def setUpClass(cls):
        # Constant quantities (year 1's, eight times) and the plant's shares scaled to sum to 0.995
        # and to 1.008 in every year (within 0.01: accepted and rescaled).
        constant = [LABELS] + [columns_of(INPUTS)[0]] * N
        set_values(CALC.sheet, "Z301", constant)
        for top_left, factor in [("AC301", 0.995), ("AF301", 1.008)]:
            set_values(CALC.sheet, top_left, [LABELS] + [[factor * s for s in row] for row in columns_of(SHARES)])
        # Output and every input × 1.1 a year.
        growing = [["output"] + LABELS] + [[1000 * 1.1 ** t] + [q * 1.1 ** t for q in columns_of(INPUTS)[0]]
                                           for t in range(N)]
        set_values(CALC.sheet, "Z311", growing)
        for m, method in enumerate(IndexAndProductivityTest.METHODS):
            for shares, first_column in [("AC301:AE309", 0), ("AF301:AH309", 4)]:
                column = ["AJ", "AK", "AL", "AM", "AN", "AO", "AP", "AQ"][first_column + m]
                set_array_formula(CALC.sheet, "%s301:%s309" % (column, column),
                                  '=PRODINDEX(Z301:AB309;%s;"%s";100)' % (shares, method))
                set_array_formula(CALC.sheet, "%s311:%s319" % (column, column),
                                  '=PRODINDEX(AA311:AC319;%s;"%s";100)' % (shares, method))
        set_array_formula(CALC.sheet, "AJ321:AP329", "=PRODGROWTH(Z311:Z319;AA311:AC319;AC301:AE309)")
        set_array_formula(CALC.sheet, "AJ331:AP339", "=PRODGROWTH(Z311:Z319;AA311:AC319;AF301:AH309)")
        # Shares typed to sum to exactly 0.99 (year 2) and 1.01 (year 3): accepted.
        edge = [LABELS] + columns_of(SHARES)
        edge[2] = [0.5, 0.35, 0.14]
        edge[3] = [0.5, 0.36, 0.15]
        set_values(CALC.sheet, "Z341", edge)
        set_array_formula(CALC.sheet, "AJ341:AJ349", '=PRODINDEX(C1:E9;Z341:AB349;"laspeyres")')

        # The tile plant with a trend in its year column (A1:A9): 3 inputs, 18 + 2 + 1 = 21 rows.
        set_array_formula(CALC.sheet, "AF261:AL281", "=PRODFIT(B1:B9;C1:E9;;;;;;;;A1:A9)")
        set_array_formula(CALC.sheet, "AN261:AN269", "=PRODTFP($AF$261:$AL$281;B1:B9;C1:E9;A1:A9)")
        set_array_formula(CALC.sheet, "AO261:AO269", "=PRODTFP($AF$261:$AL$281;B1:B9;C1:E9)")
        # The kilns: fixed effects and a trend (17 + 2 + 1 + 2 + 1 = 23 rows), fixed effects alone (21).
        cls.kilns = kiln_panel()
        last = len(cls.kilns) + 200
        set_values(CALC.sheet, "Z201", cls.kilns)
        set_array_formula(CALC.sheet, "AF201:AL223",
                          '=PRODFIT(AB201:AB%d;AC201:AD%d;;;;;;AA201:AA%d;"fixed";Z201:Z%d)' % ((last,) * 4))
        set_array_formula(CALC.sheet, "AF231:AL251",
                          '=PRODFIT(AB201:AB%d;AC201:AD%d;;;;;;AA201:AA%d;"fixed")' % ((last,) * 3))
        set_array_formula(CALC.sheet, "AN202:AN%d" % last,
                          "=PRODTFP($AF$201:$AL$223;AB202:AB%d;AC202:AD%d;Z202:Z%d)" % ((last,) * 3))
        set_array_formula(CALC.sheet, "AO202:AO%d" % last,
                          "=PRODTFP($AF$231:$AL$251;AB202:AB%d;AC202:AD%d)" % ((last,) * 2))
        set_array_formula(CALC.sheet, "AP202:AP%d" % last,
                          "=PRODTFP($AF$201:$AL$223;AB202:AB%d;AC202:AD%d)" % ((last,) * 2))
        recalc(CALC.doc)

    def column(self, where):
        values = [row[0] for row in get_range(CALC.sheet, where)]
        for value in values:
            self.assert_number(value, where)
        return values

    def test_identity_and_proportionality_with_shares_off_by_less_than_the_tolerance(self):
        # Diewert (1992): constant quantities give the base in every year; quantities × 1.1 a year give
        # the index × 1.1 a year, for every method (1e-12 relative, as for the formula checks).
        for column in ["AJ", "AK", "AL", "AM", "AN", "AO", "AP", "AQ"]:
            with self.subTest(column=column):
                for value in self.column("%s302:%s309" % (column, column)):
                    self.assertLessEqual(abs(value - 100), FORMULA_TOLERANCE * 100)
                growing = self.column("%s312:%s319" % (column, column))
                for before, after in zip(growing, growing[1:]):
                    self.assertLessEqual(abs(after / before - 1.1), FORMULA_TOLERANCE * 1.1)

    def test_no_scale_effect_with_shares_off_by_less_than_the_tolerance(self):
        # Rescaled shares sum to 1: scale effect and TFP growth 0 (1e-12 absolute), and the inputs'
        # contributions add up to ln 1.1 a year (identity).
        for where in ["AJ321:AP329", "AJ331:AP339"]:
            table = get_range(CALC.sheet, where)
            self.assertEqual(table[0][0], "period")
            for row in table[1:]:
                years = 7 if row[0] == "total" else 1
                self.assertLessEqual(abs(row[5]), years * FORMULA_TOLERANCE, "%s %s scale effect" % (where, row[0]))
                self.assertLessEqual(abs(row[6]), years * FORMULA_TOLERANCE, "%s %s TFP growth" % (where, row[0]))
                self.assertLessEqual(abs(sum(row[2:5]) - years * math.log(1.1)), years * FORMULA_TOLERANCE)

    def test_shares_summing_to_exactly_099_and_101_are_accepted(self):
        # Formula: the Laspeyres links with the typed shares divided by their sums (0.99, 1.01).
        edge = columns_of(SHARES)
        edge[1] = [0.5, 0.35, 0.14]
        edge[2] = [0.5, 0.36, 0.15]
        rescaled = [[s / sum(row) for s in row] for row in edge]
        expected = index_by_formula(columns_of(INPUTS), rescaled, "laspeyres")
        for value, figure in zip(self.column("AJ342:AJ349"), expected):
            self.assertLessEqual(abs(value - figure), FORMULA_TOLERANCE * figure)

    def test_periods_give_geometric_mean_one_for_a_trend_fit(self):
        labels = [row[0] for row in get_range(CALC.sheet, "AF261:AF281")]
        self.assertEqual(labels[-3:], ["technical change per period", "ln A for predictions", "latest period"])
        self.assertEqual(get_cell(CALC.sheet, "AG281"), 8.0)
        # least squares: 1 to 1e-12 (ln values of order 7).
        self.assertLessEqual(abs(sum(math.log(x) for x in self.column("AN262:AN269")) / N), 1e-12)
        # Without periods every year is judged by year 8's technology: λ·(mean year − 8) (formula).
        change = get_cell(CALC.sheet, "AG279")
        mean_log = sum(math.log(x) for x in self.column("AO262:AO269")) / N
        self.assertLessEqual(abs(mean_log - change * (4.5 - 8)), 1e-12)

    def test_periods_give_geometric_mean_one_for_fixed_effects_on_an_unbalanced_panel(self):
        n = len(self.kilns) - 1
        labels = [row[0] for row in get_range(CALC.sheet, "AF201:AF223")]
        self.assertEqual(labels[-4:], ["within R2", "technical change per period", "ln A for predictions",
                                       "latest period"])
        self.assertEqual(get_cell(CALC.sheet, "AG223"), 2023.0)
        # least squares within each kiln, the effects' mean over rows: 1 to 1e-12, with a trend and
        # periods, and with fixed effects alone.
        for where in ["AN202:AN%d" % (201 + n), "AO202:AO%d" % (201 + n)]:
            with self.subTest(where=where):
                self.assertLessEqual(abs(sum(math.log(x) for x in self.column(where)) / n), 1e-12)
        # With the trend but without periods it is not 1.
        self.assertGreater(abs(sum(math.log(x) for x in self.column("AP202:AP%d" % (201 + n))) / n), 1e-3)
        # ln A for predictions (fixed effects alone) is not the plain mean of the effects (ln A).
        self.assertGreater(abs(get_cell(CALC.sheet, "AG251") - get_cell(CALC.sheet, "AG232")), 1e-4)


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
     error("shares: period 4 (row 5): the shares sum to 0.9; the cost shares of a period must sum to 1 within "
           "0.01 (0.99 to 1.01, both included)")),
    ("shares that do not sum to 1, periods named", "PRODINDEX(C1:E9;J71:L79;;;AR1:AR9)", "J201:J208",
     error("shares: period FY2020 (row 5): the shares sum to 0.9; the cost shares of a period must sum to 1 within "
           "0.01 (0.99 to 1.01, both included)")),
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
        set_values(CALC.sheet, "C71", zero)
        set_values(CALC.sheet, "F71", swapped)
        set_values(CALC.sheet, "J71", short)
        set_values(CALC.sheet, "AR1", [[name] for name in PERIOD_NAMES])
        if get_cell(CALC.sheet, "R1") != "form":  # the typed model, when this class runs alone
            set_values(CALC.sheet, "R1", [["form", "cobb-douglas"], ["A", 2.5], ["labour", 0.55], ["capital", 0.3],
                                          ["energy", 0.1]])
        for _, formula, target, _ in ERROR_CASES:
            set_array_formula(CALC.sheet, target, "=" + formula)
        recalc(CALC.doc)
        for what, formula, target, message in ERROR_CASES:
            with self.subTest(what, formula=formula):
                self.assert_only_message(get_range(CALC.sheet, target), message, what)
        self.assertTrue(CALC.office.alive(), "the office stopped answering after the error cases")


PERIOD_NAMES = ["season"] + ["FY%d" % year for year in range(2017, 2025)]  # invented names of the 8 years


class PeriodNamesTest(GrowthTestCase):
    """PRODGROWTH's optional periods label the table's rows instead of 2, 3, …"""

    @classmethod
    def setUpClass(cls):
        set_values(CALC.sheet, "AR1", [[name] for name in PERIOD_NAMES])
        set_array_formula(CALC.sheet, "AR11:AX19", "=PRODGROWTH(B1:B9;C1:E9;F1:H9;;AR1:AR9)")
        set_array_formula(CALC.sheet, "AZ11:BF19", "=PRODGROWTH(B1:B9;C1:E9;F1:H9)")
        recalc(CALC.doc)

    def test_rows_carry_the_period_names(self):
        named = get_range(CALC.sheet, "AR11:AX19")
        numbered = get_range(CALC.sheet, "AZ11:BF19")
        self.assertEqual([row[0] for row in named[1:]], PERIOD_NAMES[2:] + ["total"])
        self.assertEqual([row[0] for row in numbered[1:]], [float(t) for t in range(2, 9)] + ["total"])
        # same sheet: everything but the labels is the table without periods
        self.assertEqual([row[1:] for row in named], [row[1:] for row in numbered])


class GrowthFunctionWizardTest(unittest.TestCase):
    """The three functions are listed with their argument names; the optional ones are marked so."""

    EXPECTED = {"PRODTFP": (["model", "output", "inputs", "periods", "what"], 3),
                "PRODGROWTH": (["output", "inputs", "weights", "method", "periods"], 3),
                "PRODINDEX": (["quantities", "shares", "method", "base", "periods"], 2)}

    def test_listed_with_arguments(self):
        listed = {}
        for properties in CALC.office.function_descriptions():
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
