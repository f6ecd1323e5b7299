"""The Function Wizard's entries of Isoquant's functions, read back from a real headless LibreOffice
Calc with the extension through com.sun.star.sheet.FunctionDescriptions.

Run from the repository root with Debian's Python, the package isoquant_office on the path (see
tests/integration/README.md):
    PYTHONPATH=addin/python /usr/bin/python3 -m unittest -v tests/integration/test_function_wizard_in_calc.py

Expected: the issues' own statement of each function's arguments and of which are required.
"""

import unittest

import uno  # Debian's python3-uno

from .support import CalcTestCase, module_session

CALC = module_session()
setUpModule, tearDownModule = CALC.start, CALC.stop


# -- 9: Function Wizard metadata ---------------------------------------------------------------------

# Display names and argument counts, as the issues state the functions.
ARGUMENT_COUNTS = {"PRODFIT": 12, "PRODSTAT": 13, "PRODOUTPUT": 4, "PRODMARGINAL": 4, "PRODELASTICITY": 4,
                   "PRODSCALE": 3, "PRODRETURNS": 2}
# Required arguments lead; the rest are optional (declared `any` in idl/, which Calc marks optional).
REQUIRED_ARGUMENTS = {"PRODFIT": 2, "PRODSTAT": 3, "PRODOUTPUT": 2, "PRODMARGINAL": 3, "PRODELASTICITY": 3,
                      "PRODSCALE": 1, "PRODRETURNS": 1}
# Productivity and growth (their own checks: test_growth_in_calc.py).
ARGUMENT_COUNTS.update({"PRODTFP": 5, "PRODGROWTH": 5, "PRODINDEX": 5})
REQUIRED_ARGUMENTS.update({"PRODTFP": 3, "PRODGROWTH": 3, "PRODINDEX": 2})
# The regularity test and the comparison of forms (test_forms_in_calc.py computes them).
ARGUMENT_COUNTS.update({"PRODREGULAR": 2, "PRODCOMPARE": 3})
REQUIRED_ARGUMENTS.update({"PRODREGULAR": 2, "PRODCOMPARE": 2})
ARGUMENT_COUNTS.update({"PRODSECOND": 5, "PRODINPUTRETURNS": 3, "PRODPAIR": 4, "PRODMRTS": 5, "PRODSUBSTITUTION": 6,
                        "PRODLEASTCOST": 4, "PRODCOST": 5, "PRODBUDGET": 4, "PRODPROFIT": 3, "PRODISOQUANT": 5})
REQUIRED_ARGUMENTS.update({"PRODSECOND": 3, "PRODINPUTRETURNS": 3, "PRODPAIR": 4, "PRODMRTS": 4, "PRODSUBSTITUTION": 4,
                           "PRODLEASTCOST": 3, "PRODCOST": 3, "PRODBUDGET": 3, "PRODPROFIT": 3, "PRODISOQUANT": 3})
# The efficient scale with its optional `what` (issue 20).
ARGUMENT_COUNTS.update({"PRODEFFICIENTSCALE": 3})
REQUIRED_ARGUMENTS.update({"PRODEFFICIENTSCALE": 2})
FUNCTION_CATEGORY_NAMES = ["DATABASE", "DATETIME", "FINANCIAL", "INFORMATION", "LOGICAL", "MATHEMATICAL",
                           "MATRIX", "STATISTICAL", "TEXT", "SPREADSHEET", "ADDIN"]


class FunctionWizardTest(CalcTestCase):
    """com.sun.star.sheet.FunctionDescriptions lists every function once, with a description and every
    argument named, described and flagged as stated above (names: test_sheet_behaviour.py)."""

    @classmethod
    def setUpClass(cls):
        cls.listed = {}
        for properties in CALC.office.function_descriptions():
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
