"""The bad-input corpus (tests/bad_input/corpus.tsv) through a real headless Calc.

Every case is a formula over the fixture sheet built below and the exact text the cell must show.
For each case the test asserts that text (never a number where a message belongs) and that the
office still answers afterwards. The same situations are checked through the core, message for
message, in tests/unit/test_bad_input.cpp, test_growth_bad_input.cpp and the forms and panel tests.

Fixture data: the Cobb & Douglas (1928) indexes (tests/data/cobb_douglas_1928.csv) in A1:C25, and
copies of them each spoiled in one known place (the corpus names the place it expects).
Run from the repository root with Debian's Python, the package isoquant_office on the path (see
tests/integration/README.md):
    PYTHONPATH=addin/python /usr/bin/python3 -m unittest -v tests/integration/test_bad_input_corpus.py
The extension comes from ISOQUANT_OXT (default build/isoquant.oxt).
"""
import os
import unittest

from isoquant_office import get_cell, recalc, set_formula, set_values

from .support import REPO, cobb_douglas_rows, module_session

CORPUS = os.path.join(REPO, "tests", "bad_input", "corpus.tsv")


def read_corpus():
    """(name, formula, expected) of every case; lines starting with # are comments."""
    cases = []
    with open(CORPUS, newline="", encoding="utf-8") as handle:
        for number, line in enumerate(handle, start=1):
            line = line.rstrip("\n")
            if not line or line.startswith("#"):
                continue
            fields = line.split("\t")
            if len(fields) != 3:
                raise ValueError("%s line %d: want name, formula and message separated by tabs" % (CORPUS, number))
            cases.append(tuple(fields))
    return cases


def spoiled(rows, row, column, value):
    """A copy of the data rows with one cell replaced (row and column 0-based in the data)."""
    copy = [list(r) for r in rows]
    copy[row][column] = value
    return copy


def build_fixture(sheet):
    data = cobb_douglas_rows()
    header = [["P", "L", "C"]]
    blocks = {
        "A1": header + data,                                   # clean data
        "E1": header + spoiled(data, 3, 0, "n/a"),              # text in output, row 5 of the range
        "I1": header + spoiled(data, 5, 0, None),               # empty output cell, row 7
        "M1": header + spoiled(data, 15, 2, 0.0),               # zero capital, row 17, inputs column 2
        "Q1": header + spoiled(data, 1, 0, -5.0),               # negative output, row 3
        "U1": header + [[r[0], r[1], 2 * r[1]] for r in data],  # capital = 2 x labour: collinear
        "Y1": header + [[r[0], r[1], 100.0] for r in data],     # capital constant
        "AC1": header + [[150.0, r[1], r[2]] for r in data],    # output constant
    }
    for corner, rows in blocks.items():
        set_values(sheet, corner, rows)
    # A typed Cobb-Douglas model, a model without a form row, a model with a misplaced row.
    set_values(sheet, "AG1", [["form", "cobb-douglas"], ["A", 1.01], ["L", 0.75], ["C", 0.25]])
    set_values(sheet, "AG6", [["A", 1.01], ["L", 0.75], ["C", 0.25]])
    set_values(sheet, "AG10", [["form", "cobb-douglas"], ["L", 0.75], ["A", 1.01], ["C", 0.25]])
    set_values(sheet, "AG15", [["form", "cobb-douglas"], ["ln A", 0.0], ["x", 1e308], ["y", 1e308]])
    set_values(sheet, "AG20", [["form", "cobb-douglas"], ["ln A", 0.0], ["x", 400.0]])
    set_values(sheet, "AJ1", [["x"], [2.0], [1e300]])
    # Panel columns for the data rows: plants by thirds, a constant period, periods 1899-1922.
    set_values(sheet, "AL1", [["plant"]] + [["p%d" % (i // 8)] for i in range(24)])
    set_values(sheet, "AM1", [["year"]] + [[1910.0] for _ in range(24)])
    set_values(sheet, "AN1", [["year"]] + [[1899.0 + i] for i in range(24)])
    # Plants by thirds, but the 10th data row (sheet row 11) alone in its plant.
    set_values(sheet, "AV1", [["plant"]] + [["solo" if i == 9 else "p%d" % (i // 8)] for i in range(24)])
    # Cost shares that do not add up in period 3 (row 4), and a period with a zero quantity.
    set_values(sheet, "AP1", [["L", "C"]] + [[0.7, 0.3] if i != 2 else [0.7, 0.5] for i in range(24)])
    set_values(sheet, "AR1", [["L", "C"]] + [[r[1], r[2]] if i != 4 else [r[1], 0.0] for i, r in enumerate(data)])
    # Cost shares typed in percent; a share header that names both inputs.
    set_values(sheet, "AX1", [["L", "C"]] + [[70.0, 30.0] for _ in range(24)])
    set_values(sheet, "BC1", [["L and C share", "C share"]] + [[0.7, 0.3] for _ in range(24)])
    # A decreasing-returns model (nu 0.95) and unit input prices: at output price 0.1 the best
    # output is 7.39e-26 (y* = (nu*p/c)^(nu/(1-nu)), c = nu*A^(-1/nu)*prod (w_i/b_i)^(b_i/nu)).
    set_values(sheet, "BF1", [["form", "cobb-douglas"], ["A", 1.0], ["L", 0.5], ["C", 0.45]])
    set_values(sheet, "BI1", [[1.0, 1.0]])
    # Typed models with a covariance block (issue 20): not symmetric (L, C 0.5 against C, L 0.2), and
    # symmetric but not positive semidefinite (covariance 0.5 between variances of 0.01).
    typed = [["form", "cobb-douglas", None, None], ["ln A", 0.1, None, None], ["L", 0.7, None, None],
             ["C", 0.3, None, None], ["covariance", "classical", 21.0, 0.95]]
    set_values(sheet, "DA1", typed + [["ln A", 0.01, 0.0, 0.0], ["L", 0.0, 0.01, 0.5], ["C", 0.0, 0.2, 0.01]])
    set_values(sheet, "DA12", typed + [["ln A", 0.01, 0.0, 0.0], ["L", 0.0, 0.01, 0.5], ["C", 0.0, 0.5, 0.01]])
    # A typed translog model (6 parameters) under which a cobb-douglas-sized block (3 rows) was typed.
    set_values(sheet, "DA24", [["form", "translog", None, None], ["ln A", 0.1, None, None], ["L", 0.6, None, None],
                               ["C", 0.3, None, None], ["L*L", 0.01, None, None], ["L*C", 0.0, None, None],
                               ["C*C", -0.01, None, None], ["covariance", "classical", 18.0, 0.95],
                               ["ln A", 0.01, 0.0, 0.0], ["L", 0.0, 0.01, 0.0], ["C", 0.0, 0.0, 0.01]])
    # A typed cobb-douglas with a control whose block lacks the row of ln A at control means.
    set_values(sheet, "DA40", [["form", "cobb-douglas", None, None, None], ["ln A", 0.1, None, None, None],
                               ["L", 0.7, None, None, None], ["C", 0.3, None, None, None],
                               ["z (control)", 0.05, None, None, None], [None] * 5,
                               ["ln A at control means", 0.2, None, None, None],
                               ["covariance", "classical", 20.0, 0.95, None],
                               ["ln A", 0.01, 0.0, 0.0, 0.0], ["L", 0.0, 0.01, 0.0, 0.0],
                               ["C", 0.0, 0.0, 0.01, 0.0], ["z (control)", 0.0, 0.0, 0.0, 0.01]])
    # A typed translog cost model without a block (PRODEFFICIENTSCALE's words), and a typed cost model
    # with a control whose block lacks the row of the constant at control means.
    set_values(sheet, "DA60", [["form", "translog cost"], ["constant", 1.0], ["output", 0.5], ["L", 0.6], ["C", 0.4],
                               ["output*output", 0.1], ["L*L", 0.1], ["L*C", -0.1], ["C*C", 0.1], ["L*output", 0.0],
                               ["C*output", 0.0]])
    none = [None] * 4
    set_values(sheet, "DA75", [["form", "cobb-douglas cost"] + none, ["constant", 1.0] + none, ["output", 0.8] + none,
                               ["L", 0.6] + none, ["C", 0.4] + none, ["z (control)", 0.1] + none, [None] * 6,
                               ["constant at control means", 1.2] + none,
                               ["covariance", "classical", 50.0, 0.95, None, None]]
               + [[label] + [0.01 if i == j else 0.0 for j in range(5)]
                  for i, label in enumerate(["constant", "output", "L", "C", "z (control)"])])
    # A typed cobb-douglas with a trend whose block lacks the row of the trend's λ.
    set_values(sheet, "DA100", [["form", "cobb-douglas", None, None, None], ["ln A", 0.1, None, None, None],
                               ["L", 0.7, None, None, None], ["C", 0.3, None, None, None], [None] * 5,
                               ["technical change per period", 0.02, None, None, None],
                               ["ln A for predictions", 0.2, None, None, None],
                               ["latest period", 1990.0, None, None, None],
                               ["covariance", "classical", 20.0, 0.95, None],
                               ["ln A", 0.01, 0.0, 0.0, 0.0], ["L", 0.0, 0.01, 0.0, 0.0],
                               ["C", 0.0, 0.0, 0.01, 0.0], ["ln A for predictions", 0.0, 0.0, 0.0, 0.01]])
    # A typed cobb-douglas whose block has n/a between L and C, which both have variances.
    set_values(sheet, "DA120", typed + [["ln A", 0.01, 0.0, 0.0], ["L", 0.0, 0.01, "n/a"], ["C", 0.0, "n/a", 0.01]])
    set_formula(sheet, "AT2", "=NA()")
    set_values(sheet, "AT1", [["P"]])
    for row in range(3, 26):
        set_formula(sheet, "AT%d" % row, "=A%d" % row)


CALC = module_session(build_fixture)
setUpModule, tearDownModule = CALC.start, CALC.stop


class BadInputCorpus(unittest.TestCase):
    def test_corpus_has_enough_cases(self):
        cases = read_corpus()
        self.assertGreaterEqual(len(cases), 50)
        self.assertEqual(len({name for name, _, _ in cases}), len(cases), "case names must be unique")

    def test_every_case_shows_its_message_and_the_office_answers(self):
        for name, formula, expected in read_corpus():
            with self.subTest(case=name):
                set_formula(CALC.sheet, "BA1", formula)
                recalc(CALC.doc)
                shown = get_cell(CALC.sheet, "BA1")
                self.assertIsInstance(shown, str, "%s showed a number: %r" % (formula, shown))
                self.assertEqual(shown, expected, formula)
                self.assertTrue(CALC.office.alive(timeout=10), "the office stopped answering after " + name)


if __name__ == "__main__":
    unittest.main()
