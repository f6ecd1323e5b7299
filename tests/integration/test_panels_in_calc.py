"""PRODFIT's estimation options (groups, effects, trend, cluster errors, incomplete rows) and
PRODOUTPUT's mean prediction, computed by a real headless LibreOffice Calc with the extension.

Run from the repository root with Debian's Python, the package isoquant_office on the path (see
tests/integration/README.md):
    PYTHONPATH=addin/python /usr/bin/python3 -m unittest -v tests/integration/test_panels_in_calc.py

One office serves the whole module. Sources of the expected figures, named beside each check:
- "Munnell (1990)": the US state panel 1970-1986 (48 states x 17 years), as distributed in the R
  package plm 2.6 (dataset Produc); "reference figures (R 4.2.2 lm / plm 2.6)": the within
  (state fixed effects) figures listed in tests/data/README.md, compared to the 6 decimals printed.
- "Feng & Horrace (2012)": the rice-farm panel (171 farms x 6 seasons), plm 2.6 (RiceFarms).
- "Cobb & Douglas (1928)": Tables II and III of the paper (tests/data/cobb_douglas_1928.csv).
- "statsmodels": python3-statsmodels 0.13.5 / numpy, recomputed here at test time with one dummy
  per group (and per year for two-way effects), compared to 1e-8 relative; skipped as subtests
  when the libraries cannot be imported. Under fixed effects the cluster (CR1) covariance is
  statsmodels' times (n - k - G)/(n - k - 1): the group effects are nested in the clusters and
  left out of the factor (README, "Estimation options").
- "function formula": Y = exp(ln A) * prod x_i^b_i and the smearing factor times it, computed here
  from the table's own numbers (1e-12 relative).
- Error messages: the wording in core/sheet/src/ and core/math/src/, prefixed "Error: " by the add-in.
"""

import math
import unittest

from isoquant_office import get_cell, get_range, recalc, set_array_formula, set_formula, set_values

from .fit_checks import FORMULA_RELATIVE, STATSMODELS_RELATIVE
from .support import CalcTestCase, module_session, read_rows, row_of, skip_missing_reference

try:  # reference libraries; their checks are skipped when these are missing (failed
    # under ISOQUANT_REQUIRE_REFERENCES=1)
    import numpy as np
    import statsmodels.api as sm
except ImportError:
    np = sm = None

CALC = module_session()
setUpModule, tearDownModule = CALC.start, CALC.stop


def first_appearance(labels):
    order = {}
    for label in labels:
        order.setdefault(label, len(order))
    return np.array([order[label] for label in labels]), len(order)


def dummy_regression(y, regressors, groups, periods=None, cluster=False):
    """statsmodels OLS of y on a constant, the regressors, one dummy per group after the first
    and (periods given) one per period after the first; errors clustered by group on request."""
    index, count = first_appearance(groups)
    columns = [np.ones(len(y))] + [np.asarray(r, dtype=float) for r in regressors]
    columns += [(index == g).astype(float) for g in range(1, count)]
    if periods is not None:
        columns += [(np.asarray(periods) == value).astype(float) for value in sorted(set(periods))[1:]]
    model = sm.OLS(np.asarray(y, dtype=float), np.column_stack(columns))
    if cluster:
        return model.fit(cov_type="cluster", cov_kwds={"groups": index}, use_t=True)
    return model.fit()


def nested_cluster_inference(result, group_count):
    """Standard errors and p-values (t(G - 1)) of a clustered dummy regression with the CR1 factor
    that leaves out the G - 1 group dummies nested in the clusters: statsmodels' covariance times
    (n - p)/(n - p + G - 1), p counting the dummies."""
    covariance = result.cov_params() * (result.df_resid / (result.df_resid + group_count - 1))
    contrast = result.t_test(np.eye(len(result.params)), cov_p=covariance)
    return contrast.sd, contrast.pvalue


class PanelTestCase(CalcTestCase):
    def assert_six_decimals(self, value, figure, what):
        """Agrees with a figure printed to six decimals: within half a unit in the sixth."""
        self.assert_number(value, what)
        self.assertLessEqual(abs(value - float(figure)), 0.5e-6 + 1e-15, "%s: %r, printed %s" % (what, value, figure))

    def need_statsmodels(self):
        if sm is None:
            skip_missing_reference(self, "python3-statsmodels/numpy not importable")


# -- the state panel: fixed effects, cluster errors, trend, two-way effects --------------------------------

STATE_LAST = 817  # header + 816 rows
STATE_ARGS = "C1:C{0};D1:F{0};;;{{errors}};;G1:G{0};A1:A{0}".format(STATE_LAST)


class StatePanelTest(PanelTestCase):
    """Munnell (1990) state panel: ln gsp on ln pcap, ln pc, ln emp with unemp as a control."""

    INPUTS = ["pcap", "pc", "emp"]

    @classmethod
    def setUpClass(cls):
        rows = read_rows("us_states_produc_1970_1986.csv")
        cls.rows = rows
        names = ["state", "year", "gsp", "pcap", "pc", "emp", "unemp"]
        values = [names] + [[row["state"]] + [float(row[n]) for n in names[1:]] for row in rows]
        cls.sheet = sheet = CALC.new_sheet("StatePanel")
        set_values(sheet, "A1", values)
        years = "B1:B%d" % STATE_LAST
        fixed = "=PRODFIT(%s;\"fixed\")" % STATE_ARGS.format(errors="")
        # k = 3, m = 1: 3 + 1 + 15 + 1 = 20 rows, + groups and effects 2, within R2 1, ln A for
        # predictions 1 = 24 (fit_table.hpp).
        set_array_formula(sheet, "J1:P24", fixed)
        set_array_formula(sheet, "J31:P54", "=PRODFIT(%s;\"fixed\")" % STATE_ARGS.format(errors='"cluster"'))
        # Pooled, errors clustered by state: 20 + groups and effects 2 = 22 rows.
        set_array_formula(sheet, "J61:P82", "=PRODFIT(%s;\"none\")" % STATE_ARGS.format(errors='"cluster"'))
        # Pooled with a trend in year, no groups: 20 + trend 2 (technical change per period, latest
        # period) + ln A for predictions 1 = 23 rows.
        set_array_formula(sheet, "J91:P113", "=PRODFIT(C1:C{0};D1:F{0};;;;;G1:G{0};;;{1})".format(STATE_LAST, years))
        # Two-way (state and year): 20 + 2 + within R2 1 + periods 1 + ln A for predictions 1 = 25 rows.
        set_array_formula(sheet, "J121:P145", "=PRODFIT(%s;\"two-way\";%s)" % (STATE_ARGS.format(errors=""), years))
        set_formula(sheet, "R1", '=PRODSTAT(C1:C{0};D1:F{0};"effect of group ALABAMA";;;;;;G1:G{0};A1:A{0};"fixed")'
                    .format(STATE_LAST))
        set_formula(sheet, "R2", '=PRODSTAT(C1:C{0};D1:F{0};"within R2";;;;;;G1:G{0};A1:A{0};"Fixed")'
                    .format(STATE_LAST))
        set_formula(sheet, "R3", '=PRODSTAT(C1:C{0};D1:F{0};"effect of period 1986";;;;;;G1:G{0};A1:A{0};"two-way";{1})'
                    .format(STATE_LAST, years))
        # Evaluators on the fixed-effects table: ln A for predictions is used (production_model.hpp).
        set_formula(sheet, "R4", "=PRODOUTPUT($J$1:$P$24;D2:F2)")
        set_formula(sheet, "R5", "=PRODOUTPUT($J$1:$P$24;D2:F2;TRUE())")
        recalc(CALC.doc)
        cls.fixed = get_range(sheet, "J1:P24")
        cls.fixed_cluster = get_range(sheet, "J31:P54")
        cls.pooled_cluster = get_range(sheet, "J61:P82")
        cls.trend = get_range(sheet, "J91:P113")
        cls.two_way = get_range(sheet, "J121:P145")

    def logs(self, name):
        return [math.log(float(row[name])) for row in self.rows]

    def regressors(self):
        return [self.logs(n) for n in self.INPUTS] + [[float(row["unemp"]) for row in self.rows]]

    def test_fixed_effects_table_rows(self):
        labels = [row[0] for row in self.fixed]
        self.assertEqual(labels[-5:], ["smearing factor", "groups", "effects", "within R2", "ln A for predictions"])
        self.assertEqual(row_of(self.fixed, "groups")[1], 48.0)   # 48 states (Munnell 1990)
        self.assertEqual(row_of(self.fixed, "effects")[1], "fixed")
        self.assertEqual(row_of(self.fixed, "ln A")[2:], ["n/a"] * 5)  # mean state effect: no standard error

    def test_within_estimates_match_reference_figures(self):
        # Reference figures (R 4.2.2 lm / plm 2.6), within (state fixed effects), tests/data/README.md.
        expected = {"pcap": ("-0.026150", "0.029002"), "pc": ("0.292007", "0.025120"),
                    "emp": ("0.768159", "0.030092"), "unemp (control)": ("-0.005298", "0.000989")}
        for label, (estimate, error) in expected.items():
            with self.subTest(row=label):
                self.assert_six_decimals(row_of(self.fixed, label)[1], estimate, label)
                self.assert_six_decimals(row_of(self.fixed, label)[2], error, label + " std. error")
        self.assert_six_decimals(row_of(self.fixed, "within R2")[1], "0.941336", "within R2")
        self.assertEqual(get_cell(self.sheet, "R2"), row_of(self.fixed, "within R2")[1])
        # RSS 1.111189 (same source): residual SD = sqrt(RSS / (816 - 4 - 48)).
        self.assertLessEqual(abs(row_of(self.fixed, "residual SD")[1] ** 2 * 764 - 1.111189), 0.5e-6 + 1e-12)

    def test_cluster_errors_against_statsmodels(self):
        self.assertEqual([row[1] for row in self.fixed_cluster[1:6]], [row[1] for row in self.fixed[1:6]])
        for name, table, effects in [("fixed", self.fixed_cluster, True), ("pooled", self.pooled_cluster, False)]:
            with self.subTest("statsmodels, errors clustered by state, " + name):
                self.need_statsmodels()
                states = [row["state"] for row in self.rows]
                if effects:
                    result = dummy_regression(self.logs("gsp"), self.regressors(), states, cluster=True)
                    errors, pvalues = nested_cluster_inference(result, 48)
                else:
                    index, _ = first_appearance(states)
                    design = np.column_stack([np.ones(816)] + self.regressors())
                    result = sm.OLS(np.array(self.logs("gsp")), design).fit(
                        cov_type="cluster", cov_kwds={"groups": index}, use_t=True)
                    errors, pvalues = result.bse, result.pvalues
                labels = self.INPUTS + ["unemp (control)"]
                for j, label in enumerate(labels):
                    row = row_of(table, label)
                    self.assert_relative(row[1], result.params[1 + j], STATSMODELS_RELATIVE, label)
                    self.assert_relative(row[2], errors[1 + j], STATSMODELS_RELATIVE, label + " CR1 error")
                    self.assert_relative(row[4], pvalues[1 + j], STATSMODELS_RELATIVE, label + " p on t(47)")
                if effects:
                    # statsmodels' own CR1 of the dummy regression is larger by sqrt((n-k-1)/(n-k-G)).
                    ratio = math.sqrt((816 - 4 - 1) / (816 - 4 - 48))
                    self.assert_relative(result.bse[1], row_of(table, "pcap")[2] * ratio, STATSMODELS_RELATIVE,
                                         "statsmodels' dummy-regression CR1 of pcap")

    def test_group_effect_and_predictions(self):
        # Function formula: Alabama's effect is the mean over its 17 rows of ln gsp - b'x.
        b = [row_of(self.fixed, label)[1] for label in self.INPUTS + ["unemp (control)"]]
        alabama = [row for row in self.rows if row["state"] == "ALABAMA"]
        effect = sum(math.log(float(r["gsp"])) - sum(bj * math.log(float(r[n])) for bj, n in zip(b, self.INPUTS))
                     - b[3] * float(r["unemp"]) for r in alabama) / len(alabama)
        self.assert_relative(get_cell(self.sheet, "R1"), effect, FORMULA_RELATIVE, "effect of group ALABAMA")
        # PRODOUTPUT uses ln A for predictions; the mean prediction multiplies by the smearing factor.
        log_scale = row_of(self.fixed, "ln A for predictions")[1]
        first = self.rows[0]
        median = math.exp(log_scale + sum(bj * math.log(float(first[n])) for bj, n in zip(b, self.INPUTS)))
        self.assert_relative(get_cell(self.sheet, "R4"), median, FORMULA_RELATIVE, "median prediction")
        smearing = row_of(self.fixed, "smearing factor")[1]
        self.assert_relative(get_cell(self.sheet, "R5"), median * smearing, FORMULA_RELATIVE, "mean prediction")
        with self.subTest("statsmodels/numpy: smearing factor = mean of exp(residual)"):
            self.need_statsmodels()
            result = dummy_regression(self.logs("gsp"), self.regressors(), [r["state"] for r in self.rows])
            self.assert_relative(smearing, float(np.mean(np.exp(result.resid))), STATSMODELS_RELATIVE, "smearing")

    def test_trend_against_statsmodels(self):
        change = row_of(self.trend, "technical change per period")
        for cell in change[1:]:
            self.assert_number(cell, "technical change per period")
        with self.subTest("statsmodels OLS with year - 1970 as a regressor"):
            self.need_statsmodels()
            years = [float(r["year"]) - 1970.0 for r in self.rows]
            design = np.column_stack([np.ones(816)] + self.regressors() + [years])
            result = sm.OLS(np.array(self.logs("gsp")), design).fit()
            self.assert_relative(change[1], result.params[5], STATSMODELS_RELATIVE, "trend")
            self.assert_relative(change[2], result.bse[5], STATSMODELS_RELATIVE, "trend std. error")
            # ln A refers to the first year; predictions use the latest (1986): ln A + 16 * trend.
            self.assert_relative(row_of(self.trend, "ln A")[1], result.params[0], STATSMODELS_RELATIVE, "ln A")
        mean_unemp = sum(float(r["unemp"]) for r in self.rows) / 816
        expected = (row_of(self.trend, "ln A")[1] + row_of(self.trend, "unemp (control)")[1] * mean_unemp
                    + 16 * change[1])
        self.assert_relative(row_of(self.trend, "ln A for predictions")[1], expected, FORMULA_RELATIVE,
                             "ln A for predictions")
        # The period ln A for predictions refers to, the last row (Munnell 1990: 1970-1986).
        self.assertEqual(self.trend[-1][:2], ["latest period", 1986.0])

    def test_two_way_against_statsmodels(self):
        self.assertEqual(row_of(self.two_way, "periods")[1], 17.0)  # 1970-1986
        with self.subTest("statsmodels OLS with state and year dummies"):
            self.need_statsmodels()
            years = [float(r["year"]) for r in self.rows]
            result = dummy_regression(self.logs("gsp"), self.regressors(), [r["state"] for r in self.rows], years)
            for j, label in enumerate(self.INPUTS + ["unemp (control)"]):
                row = row_of(self.two_way, label)
                self.assert_relative(row[1], result.params[1 + j], STATSMODELS_RELATIVE, label)
                self.assert_relative(row[2], result.bse[1 + j], STATSMODELS_RELATIVE, label + " std. error")
            # The 1986 effect relative to 1970 is the last dummy's coefficient.
            self.assert_relative(get_cell(self.sheet, "R3"), result.params[-1], STATSMODELS_RELATIVE, "1986 effect")
            # F (slopes = 0) tests the three inputs and unemp, not the year effects: f_test of those 4.
            slopes = np.zeros((4, len(result.params)))
            slopes[:, 1:5] = np.eye(4)
            test = result.f_test(slopes)
            f_row = row_of(self.two_way, "F (slopes = 0)")
            self.assert_relative(f_row[3], float(np.squeeze(test.fvalue)), STATSMODELS_RELATIVE, "two-way F")


# -- rice farms: fixed effects by farm with numeric identifiers -----------------------------------------------

class RiceFarmsTest(PanelTestCase):
    """Feng & Horrace (2012) rice farms: goutput on seed, urea, totlabor, size; groups = farm id."""

    INPUTS = ["seed", "urea", "totlabor", "size"]

    @classmethod
    def setUpClass(cls):
        cls.rows = read_rows("rice_farms_panel.csv")
        names = ["id", "goutput"] + cls.INPUTS
        cls.sheet = sheet = CALC.new_sheet("RiceFarms")
        set_values(sheet, "A1", [names] + [[float(r[n]) for n in names] for r in cls.rows])
        # k = 4: 4 + 15 + 2 + 1 + 1 = 23 rows.
        set_array_formula(sheet, "H1:N23", '=PRODFIT(B1:B1027;C1:F1027;;;"cluster";;;A1:A1027;"fixed")')
        recalc(CALC.doc)
        cls.table = get_range(sheet, "H1:N23")

    def test_fixed_effects_and_cluster_errors_against_statsmodels(self):
        self.assertEqual(row_of(self.table, "groups")[1], 171.0)  # 171 farms (Feng & Horrace 2012)
        with self.subTest("statsmodels OLS with farm dummies, errors clustered by farm"):
            self.need_statsmodels()
            y = [math.log(float(r["goutput"])) for r in self.rows]
            x = [[math.log(float(r[n])) for r in self.rows] for n in self.INPUTS]
            result = dummy_regression(y, x, [r["id"] for r in self.rows], cluster=True)
            errors, _ = nested_cluster_inference(result, 171)
            for j, label in enumerate(self.INPUTS):
                row = row_of(self.table, label)
                self.assert_relative(row[1], result.params[1 + j], STATSMODELS_RELATIVE, label)
                self.assert_relative(row[2], errors[1 + j], STATSMODELS_RELATIVE, label + " CR1 error")


# -- too few groups for a Wald test under cluster errors ----------------------------------------------------

class TooFewGroupsTest(PanelTestCase):
    """Munnell (1990), the first 3 states (51 rows), fixed effects, a trend and the control unemp with
    errors clustered by state: F (slopes = 0) tests 5 coefficients, but 3 cluster scores that sum to
    zero carry at most 2 (algebra: X'e = 0), so the test shows n/a and the form row says why."""

    @classmethod
    def setUpClass(cls):
        rows = read_rows("us_states_produc_1970_1986.csv")[:51]
        cls.rows = rows
        names = ["state", "year", "gsp", "pcap", "pc", "emp", "unemp"]
        cls.sheet = sheet = CALC.new_sheet("TooFewGroups")
        set_values(sheet, "A1", [names] + [[row["state"]] + [float(row[n]) for n in names[1:]] for row in rows])
        # 20 rows + groups and effects 2 + within R2 1 + technical change 1 + ln A for predictions 1 = 25.
        set_array_formula(sheet, "J1:P25", '=PRODFIT(C1:C52;D1:F52;;;"cluster";;G1:G52;A1:A52;"fixed";B1:B52)')
        recalc(CALC.doc)
        cls.table = get_range(sheet, "J1:P25")

    def test_overall_f_is_not_available_with_a_note(self):
        self.assertEqual(row_of(self.table, "groups")[1], 3.0)
        self.assertEqual(row_of(self.table, "F (slopes = 0)")[3:5], ["n/a", "n/a"])
        self.assertEqual(row_of(self.table, "form")[1:3],
                         ["cobb-douglas", "note: too few groups for F (slopes = 0): its 5 restrictions exceed the 2 "
                                          "that cluster errors on 3 groups can carry, so it is n/a"])
        # One restriction is still carried: the test of returns to scale is a number.
        self.assert_number(row_of(self.table, "returns to scale")[3], "F of nu = 1")

    def test_cr1_errors_against_statsmodels(self):
        self.need_statsmodels()
        y = [math.log(float(r["gsp"])) for r in self.rows]
        x = [[math.log(float(r[n])) for r in self.rows] for n in ["pcap", "pc", "emp"]]
        x += [[float(r["unemp"]) for r in self.rows], [float(r["year"]) - 1970.0 for r in self.rows]]
        result = dummy_regression(y, x, [r["state"] for r in self.rows], cluster=True)
        errors, _ = nested_cluster_inference(result, 3)
        for j, label in enumerate(["pcap", "pc", "emp", "unemp (control)"]):
            self.assert_relative(row_of(self.table, label)[2], errors[1 + j], STATSMODELS_RELATIVE,
                                 label + " CR1 error")
        self.assert_relative(row_of(self.table, "technical change per period")[2], errors[5], STATSMODELS_RELATIVE,
                             "trend CR1 error")


# -- incomplete rows on Cobb & Douglas (1928) ---------------------------------------------------------------

class IncompleteRowsTest(PanelTestCase):
    @classmethod
    def setUpClass(cls):
        rows = read_rows("cobb_douglas_1928.csv")
        values = [["P", "L", "C"]] + [[float(r["P"]), float(r["L"]), float(r["C"])] for r in rows]
        values[3][1] = None      # a blank labour cell in the 3rd year
        values[10][2] = "n.a."   # a text capital cell in the 10th year
        complete = [row for i, row in enumerate(values) if i not in (3, 10)]
        cls.sheet = sheet = CALC.new_sheet("Incomplete")
        set_values(sheet, "A1", values)
        set_values(sheet, "E1", complete)
        # 2 inputs: 17 rows + incomplete rows dropped 1 = 18.
        set_array_formula(sheet, "I1:O18", "=PRODFIT(A1:A25;B1:C25;;;;;;;;;TRUE())")
        set_array_formula(sheet, "I21:O37", "=PRODFIT(E1:E23;F1:G23)")
        set_formula(sheet, "Q1", "=PRODSTAT(A1:A25;B1:C25;\"R2\")")
        recalc(CALC.doc)
        cls.dropped = get_range(sheet, "I1:O18")
        cls.complete = get_range(sheet, "I21:O37")

    def test_dropped_rows_are_counted_and_left_out(self):
        self.assertEqual(row_of(self.dropped, "incomplete rows dropped")[1], 2.0)
        self.assertEqual(row_of(self.dropped, "observations")[1], 22.0)
        # The same 22 rows typed without the gaps give the same fit, number for number.
        self.assertEqual(self.dropped[:17], self.complete)

    def test_default_is_an_error_naming_the_cell(self):
        self.assertEqual(get_cell(self.sheet, "Q1"),
                         "Error: inputs: row 4, column 1 is empty; every cell must hold a number")


# -- bad input ------------------------------------------------------------------------------------------------

class PanelErrorsTest(PanelTestCase):
    @classmethod
    def setUpClass(cls):
        rows = read_rows("cobb_douglas_1928.csv")
        cls.sheet = sheet = CALC.new_sheet("PanelErrors")
        plants = ["north", "south", "east"] * 8
        set_values(sheet, "A1", [["P", "L", "C", "plant", "year", "fixed year"]] +
                   [[float(r["P"]), float(r["L"]), float(r["C"]), plants[i], float(r["year"]), 2000.0]
                    for i, r in enumerate(rows)])
        cases = {
            "H1": ("=PRODFIT(A1:A25;B1:C25;;;;;;D1:D20;\"fixed\")",
                   "Error: groups: has 20 rows but output has 24 rows of data; give one identifier per row "
                   "(a header row may come first)"),
            "H2": ("=PRODFIT(A1:A25;B1:C25;;;;;;;;F1:F25)",
                   "Error: trend: every row holds the same period; a trend needs at least two different periods"),
            "H3": ("=PRODFIT(A1:A25;B1:C25;;;;;;D1:D25;\"two-way\")",
                   "Error: effects: \"two-way\" needs the trend argument, the column of periods (years)"),
            "H4": ("=PRODFIT(A1:A25;B1:C25;;;;;;D1:D25;\"random\")",
                   "Error: effects: 'random' is not a kind of effects; use \"none\", \"fixed\" or \"two-way\""),
            "H5": ("=PRODFIT(A1:A25;B1:C25;;;\"cluster\")",
                   "Error: errors: \"cluster\" needs the groups argument, a column naming each row's plant or firm"),
            "H6": ("=PRODFIT(A1:A25;B1:C25;;;;;;;\"fixed\")",
                   "Error: effects: \"fixed\" needs the groups argument, a column naming each row's plant or firm"),
            "H7": ("=PRODFIT(A1:A25;B1:C25;;;;;;D1:D25;\"fixed\";F1:F25)",
                   "Error: trend: every row holds the same period; a trend needs at least two different periods"),
            "H8": ("=PRODFIT(A1:A25;B1:C25;;;;;;;;;\"yes\")",
                   "Error: incomplete rows: 'yes' is not TRUE or FALSE (1 or 0)"),
            "H9": ("=PRODOUTPUT({\"form\";\"cobb-douglas\"|\"A\";1|\"L\";0.5};2;TRUE())",
                   "Error: mean: the model has no \"smearing factor\" row; use a PRODFIT table, or add the row "
                   "(the mean of exp(residual) of ln Y)"),
        }
        for cell, (formula, _) in cases.items():
            set_formula(sheet, cell, formula)
        recalc(CALC.doc)
        cls.cases = cases

    def test_messages(self):
        for cell, (formula, message) in self.cases.items():
            with self.subTest(formula=formula):
                self.assertEqual(get_cell(self.sheet, cell), message)


if __name__ == "__main__":
    unittest.main()
