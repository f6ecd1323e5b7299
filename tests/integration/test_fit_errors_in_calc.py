"""Bad input to PRODFIT, PRODSTAT and the evaluators in a real headless LibreOffice Calc with the
extension: the exact message in the cell, no number anywhere in the result, the office alive.

Run from the repository root with Debian's Python, the package isoquant_office on the path (see
tests/integration/README.md):
    PYTHONPATH=addin/python /usr/bin/python3 -m unittest -v tests/integration/test_fit_errors_in_calc.py

One office with the extension serves the whole module. Sources of the expected figures, named
beside each check, as listed in fit_checks.py: "Cobb & Douglas (1928)" and the error messages.
"""

import unittest

from isoquant_office import get_cell, get_range, recalc, set_array_formula, set_formula, set_values

from .fit_checks import FitTestCase, cobb_douglas_data, error
from .support import module_session, write_columns

CALC = module_session()
setUpModule, tearDownModule = CALC.start, CALC.stop


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


# The row labels of a two-input Cobb-Douglas table, as PRODSTAT lists them in a message.
CD_ROW_LIST = ("'ln A', 'L', 'C', 'observations', 'R2', 'adjusted R2', 'residual SD', 'F (slopes = 0)', "
               "'log-likelihood', 'AIC', 'BIC', 'returns to scale', 'verdict', 'form', 'smearing factor'")
LEVEL_HINT = "is not a confidence level; give a number between 0 and 1, such as 0.95"

# (what, change of a copy of the data or None, formula, entered as, message) -- each message as
# written in core/sheet/src/ and core/math/src/, which name the argument and the row (counting a header row).
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


class ErrorMessageTest(FitTestCase):
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
        sheet = CALC.new_sheet("Errors")
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
        recalc(CALC.doc)
        # The base table itself is fine: the errors come from the cases, not from the data.
        self.assertEqual(get_cell(sheet, "F2"), "ln A")

        for (what, _, formula, _, message), target in zip(ERROR_CASES, targets):
            with self.subTest(what, formula=formula):
                self.assert_only_message(get_range(sheet, target), message, what)

        self.assertTrue(CALC.office.alive(), "the office stopped answering after the error cases")


if __name__ == "__main__":
    unittest.main()
