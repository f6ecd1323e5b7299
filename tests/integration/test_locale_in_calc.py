"""Numbers in Isoquant's messages use the office's locale setting (issue 14, item 12): with the
locale setting German (Tools > Options > Language Settings > Languages > Locale setting), a cell
reads "the shares sum to 0,9896" as the cells around it show 0,9896; switched back to English,
"0.9896" again, without a restart.

The office starts with the default (English) setting; the test sets German through the
configuration, as the Options dialog does, before the first Isoquant formula (the add-in reads the
setting when it starts), and back to English afterwards (the add-in follows the change).

Run with /usr/bin/python3; the extension comes from ISOQUANT_OXT (default build/isoquant.oxt).
"""
import unittest

import uno
from isoquant_office import get_cell, recalc, set_formula, set_values

from .support import module_session

CALC = module_session()
setUpModule, tearDownModule = CALC.start, CALC.stop

# Two periods of two inputs; the second period's shares sum to 0.6 + 0.3896 = 0.9896.
QUANTITIES = [["labour", "energy"], [10.0, 4.0], [11.0, 4.5]]
SHARES = [["labour", "energy"], [0.6, 0.4], [0.6, 0.3896]]


def set_locale_setting(tag):
    """Writes the locale setting as the Options dialog does ("" is the system default)."""
    provider = CALC.office.service_manager.createInstanceWithContext(
        "com.sun.star.configuration.ConfigurationProvider", CALC.office.context)
    path = uno.createUnoStruct("com.sun.star.beans.PropertyValue")
    path.Name, path.Value = "nodepath", "/org.openoffice.Setup/L10N"
    access = provider.createInstanceWithArguments("com.sun.star.configuration.ConfigurationUpdateAccess", (path,))
    access.replaceByName("ooSetupSystemLocale", tag)
    access.commitChanges()


class LocalePunctuation(unittest.TestCase):
    def message(self, cell, formula):
        set_formula(CALC.sheet, cell, formula)
        recalc(CALC.doc)
        return get_cell(CALC.sheet, cell)

    def test_german_then_english(self):
        sheet = CALC.sheet
        set_locale_setting("de-DE")
        set_values(sheet, "A1", QUANTITIES)
        set_values(sheet, "D1", SHARES)
        recalc(CALC.doc)
        # The office itself now writes a German decimal comma: the setting took effect.
        self.assertEqual(sheet.getCellRangeByName("D3").getString(), "0,6")

        self.assertEqual(
            self.message("H1", "=PRODINDEX(A1:B3;D1:E3)"),
            "Error: shares: period 2 (row 3): the shares sum to 0,9896; the cost shares of a period must sum "
            "to 1 within 0,01 (0,99 to 1,01, both included)")
        self.assertEqual(
            self.message("H2", "=PRODFIT(A1:A3;B1:B3;;;;1.5)"),
            "Error: level: 1,5 is not a confidence level; give a number between 0 and 1, such as 0,95")

        set_locale_setting("en-US")
        recalc(CALC.doc)
        self.assertEqual(sheet.getCellRangeByName("D3").getString(), "0.6")
        self.assertEqual(
            self.message("H3", "=PRODINDEX(A1:B3;D1:E3)"),
            "Error: shares: period 2 (row 3): the shares sum to 0.9896; the cost shares of a period must sum "
            "to 1 within 0.01 (0.99 to 1.01, both included)")
        self.assertEqual(
            self.message("H4", "=PRODFIT(A1:A3;B1:B3;;;;1.5)"),
            "Error: level: 1.5 is not a confidence level; give a number between 0 and 1, such as 0.95")


if __name__ == "__main__":
    unittest.main()
