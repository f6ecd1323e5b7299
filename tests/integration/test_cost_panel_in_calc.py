"""PRODCOSTFIT's panel options (controls, groups, effects, a trend, cluster errors) computed by a real
headless LibreOffice Calc with the extension: the tables' size and rows, their figures, PRODCOST over
them, PRODEFFICIENCY over a cost frontier with a control, and bad input.

Run from the repository root with Debian's Python (the only one that imports uno), the package
isoquant_office on the path (see tests/integration/README.md):
    PYTHONPATH=addin/python /usr/bin/python3 -m unittest -v tests/integration/test_cost_panel_in_calc.py

One office serves the whole module. Data: "Feng & Horrace (2012)", the rice-farm panel (171 farms x 6
seasons, tests/data/rice_farms_panel.csv, as in the R package plm 2.6, RiceFarms): cost = pseed*seed +
purea*urea + wage*totlabor, output goutput, prices pseed, purea, wage; groups id; trend each farm's
season 1..6 in the file's order; control size (hectares, not logged). Its cost residuals are skewed
the wrong way for a cost frontier, so one check of PRODEFFICIENCY also runs on invented data (150
bakeries, a property test only: efficiencies in (0, 1)).

Sources of the expected figures, named beside each check:
- "statsmodels": python3-statsmodels 0.13.5 / numpy, recomputed here at test time by
  tests/reference/cost_panel_check.py (imported, not copied): OLS of ln(C/wage) on the normalised
  regressors, the control, the trend (season - 1) and one dummy per farm (effects) and per season
  (two-way); under effects the constant is the mean farm effect and the cluster (CR1) covariance is
  statsmodels' times (n - p)/(n - p + G - 1). Compared to 1e-8 relative; skipped as subtests when the
  libraries cannot be imported (failed under ISOQUANT_REQUIRE_REFERENCES=1).
- "documented size": the row count of cost_table.hpp (Cobb-Douglas k + 19, translog
  2k + k(k+1)/2 + 20; one row per control and "constant at control means"; the option rows; a
  frontier's 6), against Calc's own ROWS() of the formula.
- "function formula": the table's mean efficiency is the mean of PRODEFFICIENCY's column
  (frontier_table.hpp), 1e-12 relative.
- "cost-model formula": exp(b0 + by ln y + sum bi ln wi) from the table's own cells, b0 the constant
  cost_model.hpp says the evaluators use; the constants' own definitions (cost_fit.hpp) likewise
  (1e-12 relative).
- Error messages: the wording in core/math/src/fits/ (cost_fit.cpp, cost_regression.cpp,
  panel_summary.cpp) and core/sheet/src/ (panel_arguments.cpp, numeric_range.cpp,
  efficiency_function.cpp), which the add-in prefixes with "Error: ".
"""

import math
import os
import random
import sys
import unittest

from isoquant_office import get_cell, get_range, recalc, set_array_formula, set_formula, set_values

from .fit_checks import FORMULA_RELATIVE, STATSMODELS_RELATIVE
from .support import DATA_DIR, REPO, CalcTestCase, module_session, read_rows, row_of, skip_missing_reference

try:  # reference libraries; their checks are skipped when these are missing (failed
    # under ISOQUANT_REQUIRE_REFERENCES=1)
    import numpy as np
    import statsmodels.api as sm
except ImportError:
    np = sm = None
sys.path.insert(0, os.path.join(REPO, "tests", "reference"))
import cost_check  # noqa: E402  (tests/reference: the data as the C++ cross-check reads them)
import cost_panel_check  # noqa: E402  (tests/reference: the dummy-variable regressions)

PRICES = ["pseed", "purea", "wage"]
LAST = 1027  # header + 171 farms x 6 seasons
DATA = "A1:A{0};B1:B{0};C1:E{0}".format(LAST)
CONTROL, GROUPS, TREND = "F1:F%d" % LAST, "G1:G%d" % LAST, "H1:H%d" % LAST
ARGUMENTS = ["form", "shares", "errors", "level", "controls", "groups", "effects", "trend", "incomplete",
             "inefficiency"]


def cost_fit(**options):
    """PRODCOSTFIT over the panel with the given optional arguments, the others left empty."""
    given = [options.get(name, "") for name in ARGUMENTS]
    while given and not given[-1]:
        given.pop()
    return "=PRODCOSTFIT(%s)" % ";".join([DATA] + given)


QUANTITIES = ["seed", "urea", "totlabor"]


def panel_rows():
    """[cost, goutput, pseed, purea, wage, size, id, season] and the cost shares of each row; seasons
    counted per farm in the file's order."""
    rows, shares, seen = [], [], {}
    for r in read_rows("rice_farms_panel.csv"):
        seen[r["id"]] = seen.get(r["id"], 0) + 1
        spent = [float(r[price]) * float(r[quantity]) for price, quantity in zip(PRICES, QUANTITIES)]
        cost = spent[0] + spent[1] + spent[2]
        rows.append([cost] + [float(r[n]) for n in ["goutput"] + PRICES + ["size", "id"]] + [float(seen[r["id"]])])
        shares.append([amount / cost for amount in spent])
    return rows, shares


ROWS, SHARES = panel_rows()


def prepare(sheet):
    seasons_with_text = [[row[7]] for row in ROWS]
    seasons_with_text[9] = ["n.a."]  # data row 10, sheet row 11
    set_values(sheet, "A1", [["cost", "goutput"] + PRICES + ["size", "id", "season"]] + ROWS)  # A1:H1027
    set_values(sheet, "I1", [["seed share", "urea share", "labour share"]] + SHARES)  # I1:K1027
    set_values(sheet, "L1", [["flat"]] + [[1.0]] * len(ROWS))  # L1:L1027, a control that does not vary
    set_values(sheet, "M1", [["season"]] + seasons_with_text)  # M1:M1027


CALC = module_session(prepare)
setUpModule, tearDownModule = CALC.start, CALC.stop


def documented_rows(form, controls, groups, effects, trend, frontier=False):
    """cost_table.hpp's count: the form's rows, controls, and the option rows after the smearing factor."""
    k = len(PRICES)
    rows = k + 19 if form == "cobb-douglas" else 2 * k + k * (k + 1) // 2 + 20
    rows += controls + (1 if controls else 0) + (6 if frontier else 0)
    estimated_trend = trend and effects != "two-way"  # two-way: the periods' effects absorb the trend
    rows += (2 if groups else 0) + (effects != "none") + (effects == "two-way") + 2 * estimated_trend
    return rows + (effects != "none" or trend)


def expected_labels(form, control, groups, effects, trend):
    """The first cell of each row, in order (cost_table.hpp)."""
    labels = ["translog cost fit" if form == "translog" else "Cobb-Douglas cost fit", "constant", "output"] + PRICES
    if form == "translog":
        labels += ["output*output"] + ["%s*%s" % (PRICES[i], PRICES[j]) for i in range(3) for j in range(i, 3)]
        labels += ["%s*output" % price for price in PRICES]
    labels += ["size (control)"] * control + ["", "observations", "R2", "adjusted R2", "residual SD",
                                              "F (slopes = 0)", "log-likelihood", "AIC", "BIC", "cost elasticity",
                                              "returns to scale", "verdict", "efficient scale", "regularity", "form"]
    labels += ["constant at control means"] * control + ["smearing factor"] + ["groups", "effects"] * groups
    estimated_trend = trend and effects != "two-way"
    labels += ["within R2"] * (effects != "none") + ["periods"] * (effects == "two-way")
    labels += ["cost change per period"] * estimated_trend
    labels += ["constant for predictions"] * (effects != "none" or trend) + ["latest period"] * estimated_trend
    return labels


# name: (PRODCOSTFIT's options, cost_panel_check's spec (form, control, groups, effects, trend, errors))
FITS = {
    "control": (dict(controls=CONTROL), ("cobb-douglas", True, False, "none", False, "classical")),
    "fixed, cluster": (dict(errors='"cluster"', groups=GROUPS, effects='"fixed"'),
                       ("cobb-douglas", False, True, "fixed", False, "cluster")),
    "two-way": (dict(groups=GROUPS, effects='"two-way"', trend=TREND),
                ("cobb-douglas", False, True, "two-way", False, "classical")),
    "translog, trend, control": (dict(form='"translog"', controls=CONTROL, trend=TREND),
                                 ("translog", True, False, "none", True, "classical")),
    "fixed, trend": (dict(groups=GROUPS, effects='"fixed"', trend=TREND),
                     ("cobb-douglas", False, True, "fixed", True, "classical")),
}


def table_size(name):
    options, (form, control, groups, effects, _, _) = FITS[name]
    return documented_rows(form, int(control), groups, effects, "trend" in options)


class CostPanelTablesTest(CalcTestCase):
    """Feng & Horrace (2012): the five tables at O{40 i + 1}, ROWS() and COLUMNS() of each in W and X."""

    @classmethod
    def setUpClass(cls):
        cls.sheet = sheet = CALC.sheet
        cls.places = {}
        for i, (name, (options, _)) in enumerate(FITS.items()):
            top = 40 * i + 1
            cls.places[name] = "$O$%d:$U$%d" % (top, top + table_size(name) - 1)
            set_array_formula(sheet, cls.places[name], cost_fit(**options))
            set_formula(sheet, "W%d" % top, "=ROWS(%s)" % cost_fit(**options)[1:])
            set_formula(sheet, "X%d" % top, "=COLUMNS(%s)" % cost_fit(**options)[1:])
        # PRODCOST over the fixed-effects-with-trend table and over the table with a control.
        for column, name in (("Z", "fixed, trend"), ("AA", "control")):
            set_array_formula(sheet, "%s2:%s11" % (column, column),
                              '=PRODCOST(%s;B2:B11;C2:E11;"total")' % cls.places[name])
        recalc(CALC.doc)
        cls.tables = {name: get_range(sheet, place.replace("$", "")) for name, place in cls.places.items()}

    def test_size_and_rows(self):
        for i, name in enumerate(FITS):
            options, (form, control, groups, effects, _, _) = FITS[name]
            with self.subTest(name):
                # documented size against Calc's own ROWS() and COLUMNS() of the formula
                self.assertEqual(get_cell(self.sheet, "W%d" % (40 * i + 1)), float(table_size(name)))
                self.assertEqual(get_cell(self.sheet, "X%d" % (40 * i + 1)), 7.0)
                labels = expected_labels(form, control, groups, effects, "trend" in options)
                self.assertEqual(len(labels), table_size(name), "documented size = rows listed in cost_table.hpp")
                self.assertEqual([row[0] for row in self.tables[name]], labels)

    def test_figures_against_statsmodels(self):
        for name, (_, spec) in FITS.items():
            with self.subTest("statsmodels dummy-variable OLS: " + name):
                if sm is None:
                    skip_missing_reference(self, "python3-statsmodels/numpy not importable")
                figures = {}

                def put(model, quantity, value, index=0):
                    figures[quantity, index] = value

                data, panel = cost_check.read_data(DATA_DIR, np), cost_panel_check.read_panel(DATA_DIR, np)
                cost_panel_check.figures(np, sm, put, name, spec, data, panel)
                self.check_table(name, spec, figures)

    def check_table(self, name, spec, figures):
        table, effects = self.tables[name], spec[3] != "none"
        parameters = max(index for quantity, index in figures if quantity == "params") + 1
        for index in range(parameters):
            row = table[1 + index]
            self.assert_relative(row[1], figures["params", index], STATSMODELS_RELATIVE, name + ": " + row[0])
            if index == 0 and effects:  # the mean farm effect has no standard error (cost_fit.hpp)
                self.assertEqual(row[2], "n/a", name + ": constant's standard error under effects")
                continue
            self.assert_relative(row[2], figures["bse", index], STATSMODELS_RELATIVE, name + ": se " + row[0])
        self.assert_relative(row_of(table, "R2")[1], figures["rsquared", 0], STATSMODELS_RELATIVE, name + ": R2")
        if effects:
            self.assert_relative(row_of(table, "within R2")[1], figures["within_rsquared", 0], STATSMODELS_RELATIVE,
                                 name + ": within R2")
        if ("trend", 0) in figures:
            change = row_of(table, "cost change per period")
            self.assert_relative(change[1], figures["trend", 0], STATSMODELS_RELATIVE, name + ": trend")
            self.assert_relative(change[2], figures["trend_se", 0], STATSMODELS_RELATIVE, name + ": trend se")

    def test_option_rows(self):
        self.assertEqual(row_of(self.tables["fixed, cluster"], "groups")[1], 171.0)  # Feng & Horrace (2012)
        self.assertEqual(row_of(self.tables["fixed, cluster"], "effects")[1], "fixed")
        self.assertEqual(row_of(self.tables["two-way"], "periods")[1], 6.0)  # six seasons
        self.assertEqual(row_of(self.tables["two-way"], "effects")[1], "two-way")
        for name in ("translog, trend, control", "fixed, trend"):
            self.assertEqual(row_of(self.tables[name], "latest period")[1], 6.0)

    def test_constants_follow_their_definitions(self):
        # cost_fit.hpp: at control means = constant + c * mean(size); for predictions, in a balanced
        # panel (row-weighted mean effect = plain mean), the constant moved to season 6: + 5 * trend.
        mean_size = sum(row[5] for row in ROWS) / len(ROWS)
        for name in ("control", "translog, trend, control"):
            table = self.tables[name]
            at_means = row_of(table, "constant")[1] + row_of(table, "size (control)")[1] * mean_size
            self.assert_relative(row_of(table, "constant at control means")[1], at_means, FORMULA_RELATIVE, name)
        for name, base in (("fixed, trend", "constant"), ("translog, trend, control", "constant at control means")):
            table = self.tables[name]
            moved = row_of(table, base)[1] + 5 * row_of(table, "cost change per period")[1]
            self.assert_relative(row_of(table, "constant for predictions")[1], moved, FORMULA_RELATIVE, name)

    def test_prodcost_uses_the_documented_constant(self):
        for column, name, constant in (("Z", "fixed, trend", "constant for predictions"),
                                       ("AA", "control", "constant at control means")):
            table = self.tables[name]
            slopes = [row_of(table, label)[1] for label in ["output"] + PRICES]
            for i, row in enumerate(ROWS[:10]):  # cost-model formula
                log_cost = row_of(table, constant)[1] + sum(b * math.log(x) for b, x in zip(slopes, row[1:5]))
                self.assert_relative(get_cell(self.sheet, "%s%d" % (column, i + 2)), math.exp(log_cost),
                                     FORMULA_RELATIVE, "%s: PRODCOST total, row %d" % (name, i + 2))


def bakeries():
    """Invented (a property test only): 150 bakeries of a chain, [cost, loaves, flour, labour, energy
    prices, oven age], ln C = 0.2 + 0.8 ln y + 0.5 ln w1 + 0.3 ln w2 + 0.2 ln w3 + 0.03 age + v + u,
    v ~ N(0, 0.05^2), u half-normal of scale 0.3, seeded."""
    generator = random.Random(20261216)
    rows = []
    for _ in range(150):
        loaves = math.exp(generator.uniform(math.log(20000), math.log(400000)))
        prices = [generator.uniform(low, high) for low, high in ((0.4, 0.7), (14, 24), (0.1, 0.3))]
        age = float(generator.randint(1, 20))
        log_cost = (0.2 + 0.8 * math.log(loaves) + sum(b * math.log(w) for b, w in zip((0.5, 0.3, 0.2), prices))
                    + 0.03 * age + generator.gauss(0, 0.05) + abs(generator.gauss(0, 0.3)))
        rows.append([math.exp(log_cost), loaves] + prices + [age])
    return rows


class CostFrontierWithControlTest(CalcTestCase):
    """A half-normal cost frontier with a control, and PRODEFFICIENCY over it (output, prices, control):
    on Feng & Horrace (2012) with size, whose residuals are skewed the wrong way for a cost frontier,
    and on invented bakeries with their ovens' age."""

    @classmethod
    def setUpClass(cls):
        cls.sheet = sheet = CALC.sheet
        set_values(sheet, "AV1", [["cost", "loaves", "flour", "labour", "energy", "oven age"]] + bakeries())
        cls.rows = documented_rows("cobb-douglas", 1, False, "none", False, frontier=True)
        formula = cost_fit(controls=CONTROL, inefficiency='"half-normal"')
        bakery_formula = '=PRODCOSTFIT(AV1:AV151;AW1:AW151;AX1:AZ151;;;;;BA1:BA151;;;;;"half-normal")'
        for top, fit in ((1, formula), (41, bakery_formula)):
            set_array_formula(sheet, "AC%d:AI%d" % (top, top + cls.rows - 1), fit)
            set_formula(sheet, "AK%d" % top, "=ROWS(%s)" % fit[1:])
        set_array_formula(sheet, "AC81:AI%d" % (80 + table_size("control")), cost_fit(controls=CONTROL))
        rice, bakery = "$AC$1:$AI$%d" % cls.rows, "$AC$41:$AI$%d" % (40 + cls.rows)
        set_array_formula(sheet, "AM1:AM%d" % LAST, "=PRODEFFICIENCY(%s;A1:A%d;B1:F%d)" % (rice, LAST, LAST))
        set_array_formula(sheet, "AN1:AN151", "=PRODEFFICIENCY(%s;AV1:AV151;AW1:BA151)" % bakery)
        set_formula(sheet, "AO1", "=PRODEFFICIENCY(%s;A1:A%d;B1:E%d)" % (rice, LAST, LAST))
        recalc(CALC.doc)
        cls.rice = get_range(sheet, "AC1:AI%d" % cls.rows)
        cls.bakery = get_range(sheet, "AC41:AI%d" % (40 + cls.rows))

    def efficiencies(self, cell_range):
        column = get_range(self.sheet, cell_range)
        self.assertEqual(column[0][0], "cost efficiency")
        for i, (value,) in enumerate(column[1:]):
            self.assert_number(value, "efficiency, row %d" % (i + 2))
            self.assertTrue(0 < value <= 1, "efficiency, row %d: %r not in (0, 1]" % (i + 2, value))
        return [value for (value,) in column[1:]]

    def test_wrong_skew_gives_least_squares_and_efficiency_one(self):
        self.assertEqual(get_cell(self.sheet, "AK1"), float(self.rows))  # documented size
        self.assertEqual(self.rice[0][0], "half-normal cost frontier")
        self.assertEqual(row_of(self.rice, "inefficiency SD")[1], 0.0)
        self.assertIn("no inefficiency found: residuals skewed the wrong way", row_of(self.rice, "form")[2])
        # DEVELOPERS.md: wrong skew gives least squares, so the parameters are those of the table with size
        for row, same in zip(self.rice[1:7], get_range(self.sheet, "AC81:AI87")[1:7]):
            self.assertEqual(row[:2], same[:2])
        # efficiency_function.cpp: 1 where inefficiency SD = 0
        self.assertEqual(set(self.efficiencies("AM1:AM%d" % LAST)), {1.0})

    def test_bakeries_efficiencies(self):
        self.assertEqual(get_cell(self.sheet, "AK41"), float(self.rows))  # documented size
        self.assertGreater(row_of(self.bakery, "inefficiency SD")[1], 0.0)
        values = self.efficiencies("AN1:AN151")
        self.assertLess(max(values), 1.0)
        # frontier_table.hpp: mean efficiency is the mean of E[exp(-u)|e] over the rows
        self.assert_relative(row_of(self.bakery, "mean efficiency")[1], sum(values) / len(values), FORMULA_RELATIVE,
                             "mean efficiency")

    def test_wrong_column_count_names_inputs(self):
        self.assert_message(get_cell(self.sheet, "AO1"),
                            "Error: inputs: has 4 columns, but a cost frontier needs 5: the output column, then the 3 "
                            "price columns in PRODCOSTFIT's order, then its 1 control", "PRODEFFICIENCY without size")


class CostPanelErrorsTest(CalcTestCase):
    """Bad input, each message from the C++ sources named in the module's docstring."""

    CASES = {
        "fixed without groups": (cost_fit(effects='"fixed"'),
                                 "Error: effects: \"fixed\" needs the groups argument, a column naming each row's "
                                 "plant or firm"),
        "cluster without groups": (cost_fit(errors='"cluster"'),
                                   "Error: errors: \"cluster\" needs the groups argument, a column naming each row's "
                                   "plant or firm"),
        "groups too short": (cost_fit(groups="G1:G1000", effects='"fixed"'),
                             "Error: groups: has 1000 rows but output has 1026 rows of data; give one identifier per "
                             "row (a header row may come first)"),
        "effects with shares": (cost_fit(form='"translog"', shares="I1:K%d" % LAST, groups=GROUPS, effects='"fixed"'),
                                "Error: effects: not available with shares: the share equations would need group "
                                "effects of their own; fit without shares for effects"),
        "trend with inefficiency": (cost_fit(trend=TREND, inefficiency='"half-normal"'),
                                    "Error: trend: not available with a cost frontier, which takes controls but no "
                                    "panel options (its inefficiency would mix with group effects or a trend); leave "
                                    "trend empty"),
        "control that does not vary": (cost_fit(controls="L1:L%d" % LAST),
                                       "Error: controls: control 'flat' does not vary, so it cannot be told apart from "
                                       "the constant"),
        "trend with text": (cost_fit(groups=GROUPS, effects='"fixed"', trend="M1:M%d" % LAST, incomplete="FALSE()"),
                            "Error: trend: row 11 holds text 'n.a.'; every cell must hold a number"),
    }

    @classmethod
    def setUpClass(cls):
        cls.sheet = CALC.sheet
        for i, (formula, _) in enumerate(cls.CASES.values()):
            set_formula(cls.sheet, "AQ%d" % (i + 1), formula)
        recalc(CALC.doc)

    def test_messages(self):
        for i, (what, (_, message)) in enumerate(self.CASES.items()):
            with self.subTest(what):
                self.assert_message(get_cell(self.sheet, "AQ%d" % (i + 1)), message, what)


if __name__ == "__main__":
    unittest.main()
