"""PRODOUTPUT, PRODMARGINAL, PRODELASTICITY, PRODSCALE and PRODRETURNS on a PRODFIT table and on typed
models, and their recalculation when a data cell changes, in a real headless LibreOffice Calc with
the extension.

Run from the repository root with Debian's Python, the package isoquant_office on the path (see
tests/integration/README.md):
    PYTHONPATH=addin/python /usr/bin/python3 -m unittest -v tests/integration/test_evaluators_in_calc.py

One office with the extension serves the whole module. Sources of the expected figures, named
beside each check, as listed in fit_checks.py: "Cobb & Douglas (1928)", "statsmodels" and "function formula".
"""

import math
import unittest

from isoquant_office import get_cell, get_range, recalc, set_array_formula, set_formula, set_values

from .fit_checks import (FORMULA_RELATIVE, FitTestCase, cobb_douglas_sheet, layout, logs, statsmodels_fit,
                         statsmodels_table)
from .support import module_session, row_of

CALC = module_session()
setUpModule, tearDownModule = CALC.start, CALC.stop


# -- 6: the evaluators -----------------------------------------------------------------------------

def expected_verdict(nu, p_value, level):
    """The verdict as the functions' descriptions in addin/function_table.cxx state it: constant
    unless the test of returns to scale = 1 rejects at 1 - level; a model without a test (a typed
    model) is judged by its returns to scale alone."""
    if p_value is not None and p_value >= 1 - level:
        return "constant"
    return "increasing" if nu > 1 else "decreasing" if nu < 1 else "constant"


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


class EvaluatorTest(FitTestCase):
    """PRODOUTPUT, PRODMARGINAL, PRODELASTICITY, PRODSCALE, PRODRETURNS on a PRODFIT table and on typed
    models, one formula per row (as filling down makes) and one array formula over all rows."""

    TABLE = "$F$1:$L$17"
    TYPED = "$N$1:$O$4"     # form | cobb-douglas; A | 1.01; L | 0.75; C | 0.25 (Cobb & Douglas 1928)
    TYPED_LN = "$N$6:$O$9"  # form | cobb-douglas; ln A | 0.5; L | 0.6; C | 0.3
    FIRST, LAST = 2, 25     # the 24 rows of inputs, C2:D25
    MODELS = [TABLE, TYPED]

    @classmethod
    def setUpClass(cls):
        cls.sheet, cls.data = cobb_douglas_sheet(CALC, "Evaluators")
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
        recalc(CALC.doc)
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

class RecalculationTest(FitTestCase):
    """Changing one data cell changes the table and the evaluators that read it."""

    def test_one_changed_output_refits(self):
        sheet, data = cobb_douglas_sheet(CALC, "Recalculation")
        set_array_formula(sheet, "F1:L17", "=PRODFIT(B1:B25;C1:D25)")
        set_formula(sheet, "N1", "=PRODOUTPUT($F$1:$L$17;C25:D25)")
        set_formula(sheet, "N2", '=PRODMARGINAL($F$1:$L$17;C25:D25;"L")')
        recalc(CALC.doc)
        before = get_range(sheet, "F1:L17")
        before_output = get_cell(sheet, "N1")

        # 1922's output, 240 in Cobb & Douglas (1928), becomes 250.
        self.assertEqual(get_cell(sheet, "B25"), 240.0)
        set_values(sheet, "B25", [[250]])
        recalc(CALC.doc)
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
        recalc(CALC.doc)
        self.assertEqual(get_range(sheet, "F1:L17"), before)
        self.assertEqual(get_cell(sheet, "N1"), before_output)


if __name__ == "__main__":
    unittest.main()
