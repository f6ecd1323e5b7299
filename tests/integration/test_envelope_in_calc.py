"""PRODENVELOPE computed by a real headless LibreOffice Calc with the extension: scores under the
three returns in both orientations, scale efficiency, targets, peers by name (texts Calc compares),
bad input, and the Function Wizard's entry.

Run from the repository root with Debian's Python (the only one that imports uno):
    /usr/bin/python3 -m unittest -v tests/integration/test_envelope_in_calc.py

One office with the extension serves the whole module. The data are invented: 24 home-care
agencies, each with its patient visits and assessments in a year (outputs) and its nurses, cars and
office staff (inputs), drawn (seeded) log-uniform; agency names "agency 1" to "agency 24".

Sources of the expected figures, named beside each check:
- "scipy linprog": the same linear programs solved here by scipy.optimize.linprog (HiGHS,
  python3-scipy 1.10.1) through tests/reference/envelope_check.py (stage one: the score; stage two:
  the intensities with the slacks as variables, giving targets and peers); skipped as subtests when scipy cannot be imported.
  Tolerance 1e-7 relative (absolute below 1), as in tests/unit/test_envelope_cross_check.cpp: both
  solvers stop at feasibility tolerances of 1e-7.
- Peers' weights are shown to 4 significant digits: 5e-4 relative to linprog's λ.
- Error messages: the wording in core/sheet/src/arguments/envelope_arguments.cpp and
  numeric_range.cpp, which the add-in prefixes with "Error: ".
"""

import math
import random
import unittest

from isoquant_office import get_cell, get_range, recalc, set_array_formula, set_formula, set_values

from .support import module_session, skip_missing_reference

try:
    import numpy as np
    from scipy.optimize import linprog
    from ..reference import envelope_check
except ImportError:
    np = linprog = envelope_check = None

LINPROG_TOLERANCE = 1e-7
PEER_WEIGHT_TOLERANCE = 5e-4
ROWS = 24
OUTPUTS = ["visits", "assessments"]
INPUTS = ["nurses", "cars", "office staff"]
NAMES = ["agency %d" % (i + 1) for i in range(ROWS)]



def agencies():
    generator = random.Random(20261217)

    def amount(low, high):
        return math.exp(generator.uniform(math.log(low), math.log(high)))

    return [[amount(2000, 20000), amount(100, 900), amount(5, 40), amount(2, 15), amount(1, 6)]
            for _ in range(ROWS)]


DATA = agencies()
LAST = ROWS + 1  # the data are in rows 2 … LAST, under the header in row 1


def prepare(sheet):
    set_values(sheet, "A1", [["agency"] + OUTPUTS + INPUTS] + [[n] + row for n, row in zip(NAMES, DATA)])


CALC = module_session(prepare)
setUpModule, tearDownModule = CALC.start, CALC.stop


def formula(returns, orientation, what, names=""):
    return '=PRODENVELOPE(B1:C%d;D1:F%d;"%s";"%s";"%s"%s)' % (LAST, LAST, returns, orientation, what, names)


def arrays():
    outputs = np.array([row[:2] for row in DATA])
    inputs = np.array([row[2:] for row in DATA])
    return outputs, inputs


class EnvelopeTestCase(unittest.TestCase):

    def require_scipy(self):
        if envelope_check is None:
            skip_missing_reference(self, "python3-scipy or numpy is not importable")

    def assert_close(self, value, expected, tolerance, what):
        self.assertIsInstance(value, float, "%s: expected a number, the cell shows %r" % (what, value))
        self.assertLessEqual(abs(value - expected), tolerance * max(1.0, abs(expected)),
                             "%s: %r, expected %r (tolerance %g)" % (what, value, expected, tolerance))


class ScoresTest(EnvelopeTestCase):
    """Scores, scale efficiency and targets of all agencies as array formulas under the header row."""

    @classmethod
    def setUpClass(cls):
        cls.columns = {}
        column = 8  # from column I on, one result column each
        for returns in envelope_check.RETURNS if envelope_check else ["constant"]:
            for orientation in ["input", "output"]:
                cls.columns[(returns, orientation)] = column
                column += 1
        cls.columns["scale"] = column
        cls.columns["target"] = column + 1
        for key, index in cls.columns.items():
            cells = "%s1:%s%d" % (cls.letter(index), cls.letter(index), LAST)
            if key == "scale":
                set_array_formula(CALC.sheet, cells, formula("constant", "output", "scale efficiency"))
            elif key == "target":
                set_array_formula(CALC.sheet, cells, formula("variable", "input", "target Nurses"))
            else:
                set_array_formula(CALC.sheet, cells, formula(key[0], key[1], "score"))
        recalc(CALC.doc)

    @staticmethod
    def letter(index):
        return chr(ord("A") + index)

    def result(self, key):
        index = self.columns[key]
        return [row[0] for row in get_range(CALC.sheet, "%s1:%s%d" % (self.letter(index), self.letter(index), LAST))]

    def test_headers(self):
        self.assertEqual(self.result(("constant", "input"))[0], "efficiency")
        self.assertEqual(self.result("scale")[0], "scale efficiency")
        self.assertEqual(self.result("target")[0], "target nurses")

    def test_scores_agree_with_scipy_linprog(self):
        self.require_scipy()
        outputs, inputs = arrays()
        for returns in envelope_check.RETURNS:
            for orientation in ["input", "output"]:
                cells = self.result((returns, orientation))[1:]
                for plant in range(ROWS):
                    optimum = envelope_check.stage_one(np, linprog, outputs, inputs, plant, returns, orientation)
                    expected = optimum if orientation == "input" else 1.0 / optimum
                    with self.subTest(returns=returns, orientation=orientation, plant=plant):
                        self.assert_close(cells[plant], expected, LINPROG_TOLERANCE, "scipy linprog score")
                        self.assertLessEqual(cells[plant], 1.0 + LINPROG_TOLERANCE)

    def test_scale_efficiency_and_targets_agree_with_scipy_linprog(self):
        self.require_scipy()
        outputs, inputs = arrays()
        scale, target = self.result("scale")[1:], self.result("target")[1:]
        for plant in range(ROWS):
            constant = 1.0 / envelope_check.stage_one(np, linprog, outputs, inputs, plant, "constant", "output")
            variable = 1.0 / envelope_check.stage_one(np, linprog, outputs, inputs, plant, "variable", "output")
            theta = envelope_check.stage_one(np, linprog, outputs, inputs, plant, "variable", "input")
            weights = envelope_check.stage_two(np, linprog, outputs, inputs, plant, "variable", "input", theta)
            nurses = inputs[:, 0] @ weights
            with self.subTest(plant=plant):
                self.assert_close(scale[plant], constant / variable, LINPROG_TOLERANCE, "scipy linprog scale")
                self.assert_close(target[plant], nurses, LINPROG_TOLERANCE, "scipy linprog target")


class PeersTest(EnvelopeTestCase):
    """Peers by name, variable returns, input orientation: a text column that Calc compares."""

    @classmethod
    def setUpClass(cls):
        set_array_formula(CALC.sheet, "P1:P%d" % LAST, formula("variable", "input", "peers", ";A1:A%d" % LAST))
        set_formula(CALC.sheet, "R1", '=COUNTIF(P2:P%d;"*(1)")' % LAST)
        recalc(CALC.doc)
        cls.peers = [row[0] for row in get_range(CALC.sheet, "P1:P%d" % LAST)]

    def test_peer_names_and_weights_agree_with_scipy_linprog(self):
        self.assertEqual(self.peers[0], "peers")
        self.require_scipy()
        outputs, inputs = arrays()
        for plant in range(ROWS):
            theta = envelope_check.stage_one(np, linprog, outputs, inputs, plant, "variable", "input")
            weights = envelope_check.stage_two(np, linprog, outputs, inputs, plant, "variable", "input", theta)
            shown = dict(self.parse(self.peers[plant + 1]))
            with self.subTest(plant=plant):
                self.assertEqual(sorted(shown), sorted(NAMES[j] for j, w in enumerate(weights) if w > 1e-7))
                for name, weight in shown.items():
                    expected = weights[NAMES.index(name)]
                    self.assertLessEqual(abs(weight - expected), PEER_WEIGHT_TOLERANCE * expected, name)

    def test_an_efficient_agency_is_its_own_peer_and_texts_compare(self):
        efficient = [text for text in self.peers[1:] if text.endswith("(1)")]
        self.assertTrue(efficient, "no agency with weight 1 on one peer")
        # COUNTIF finds the texts of a string array result (DEVELOPERS.md, "Texts in array results").
        self.assertEqual(get_cell(CALC.sheet, "R1"), float(len(efficient)))

    @staticmethod
    def parse(text):
        pairs = []
        for part in text.split("), "):
            name, weight = part.rstrip(")").rsplit(" (", 1)
            pairs.append((name, float(weight)))
        return pairs


class BadInputTest(EnvelopeTestCase):

    def test_text_in_inputs_names_the_row(self):
        set_values(CALC.sheet, "A40", [["visits", "nurses"], [1200, 14], [900, "n/a"], [1500, 18]])
        set_formula(CALC.sheet, "D40", "=PRODENVELOPE(A40:A43;B40:B43)")
        set_formula(CALC.sheet, "D41", '=PRODENVELOPE(A40:A43;A40:A43;"increasing")')
        recalc(CALC.doc)
        self.assertEqual(get_cell(CALC.sheet, "D40"), "Error: inputs: row 3 holds text 'n/a'; every cell must hold a number")
        self.assertEqual(get_cell(CALC.sheet, "D41"),
                         "Error: returns: 'increasing' is not a kind of returns to scale; use \"constant\", "
                         "\"variable\" or \"non-increasing\"")


class FunctionWizardTest(unittest.TestCase):

    def test_prodenvelope_is_listed_with_its_arguments(self):
        descriptions = CALC.office.service_manager.createInstanceWithContext(
            "com.sun.star.sheet.FunctionDescriptions", CALC.office.context)
        listed = {}
        for i in range(descriptions.getCount()):
            properties = {p.Name: p.Value for p in descriptions.getByIndex(i)}
            if properties.get("Name") == "PRODENVELOPE":
                listed[properties["Name"]] = properties
        self.assertEqual(sorted(listed), ["PRODENVELOPE"])
        self.assertIn("efficiency", listed["PRODENVELOPE"]["Description"])
        arguments = listed["PRODENVELOPE"]["Arguments"]
        self.assertEqual([a.Name for a in arguments], ["outputs", "inputs", "returns", "orientation", "what", "names"])
        self.assertEqual([a.IsOptional for a in arguments], [i >= 2 for i in range(6)])
        self.assertTrue(all(a.Description.strip() for a in arguments))
        # Filed under Add-In (com.sun.star.sheet.FunctionCategory.ADDIN = 11), as every function.
        self.assertEqual(listed["PRODENVELOPE"]["Category"], 11)


if __name__ == "__main__":
    unittest.main()
