"""The Isoquant menu's two commands in a real headless Calc, run through the dispatch framework as a
menu click runs them (issue 18): "Fit the array to its result" and "Save a copy for colleagues".

Run from the repository root with Debian's Python (the only one that imports uno):
    /usr/bin/python3 -m unittest -v tests/integration/test_menu_commands.py

The data are invented (a seeded Cobb-Douglas sample of 24 workshops); the checks are about sizes,
cells and files, not estimates. The expected sizes come from Calc itself (ROWS()/COLUMNS() of the
same expression in a cell of its own), the copy's values from the original document's cells.
Headless, the office cancels every dialog, so a command that would ask before overwriting refuses.
"""

import os
import random
import tempfile
import unittest

import uno
from isoquant_office import HeadlessOffice, get_cell, get_range, recalc, set_array_formula, set_formula, set_values

from .support import EXTENSION as OXT
FIT_ARRAY = "org.isoquant.calc.commands:FitArray"
SAVE_COPY = "org.isoquant.calc.commands:SaveForColleagues"
HELP = "org.isoquant.calc.commands:Help"
SUCCESS, FAILURE = 1, 0  # com.sun.star.frame.DispatchResultState

OFFICE = None


def workshops():
    generator = random.Random(18)
    rows = [["output", "labour", "capital", "energy"]]
    for _ in range(24):
        labour, capital, energy = (generator.uniform(5, 50) for _ in range(3))
        output = 2.0 * labour ** 0.6 * capital ** 0.3 * energy ** 0.05 * generator.lognormvariate(0, 0.05)
        rows.append([output, labour, capital, energy])
    return rows


def setUpModule():
    global OFFICE
    OFFICE = HeadlessOffice(extension_path=OXT)
    OFFICE.__enter__()


def tearDownModule():
    if OFFICE is not None:
        OFFICE.__exit__(None, None, None)


def dispatch(doc, command, **arguments):
    """Runs a command as the menu does, through a DispatchHelper on the document's frame; returns
    (state, sentence)."""
    helper = OFFICE.service_manager.createInstanceWithContext("com.sun.star.frame.DispatchHelper", OFFICE.context)
    properties = []
    for name, value in arguments.items():
        prop = uno.createUnoStruct("com.sun.star.beans.PropertyValue")
        prop.Name, prop.Value = name, value
        properties.append(prop)
    result = helper.executeDispatch(doc.getCurrentController().getFrame(), command, "", 0, tuple(properties))
    return result.State, result.Result


def put_cursor(doc, cell):
    controller = doc.getCurrentController()
    controller.select(controller.getActiveSheet().getCellRangeByName(cell))


def array_block(sheet, cell):
    """The array formula's block around `cell` as "F1:L17", or None when it is no array formula."""
    cursor = sheet.createCursorByRange(sheet.getCellRangeByName(cell))
    cursor.collapseToCurrentArray()
    if not cursor.getArrayFormula():
        return None
    return cursor.AbsoluteName.split(".")[-1].replace("$", "")


def shown(sheet):
    """What A1:T60 shows: numbers, texts (an error value as its text, e.g. "#N/A"), None for a cell
    that shows nothing (empty, or a formula's empty text)."""
    return [[None if value == "" else value for value in row] for row in get_range(sheet, "A1:T60")]


class MenuInstalled(unittest.TestCase):
    def test_the_menu_and_its_handler_are_registered_by_the_extension(self):
        provider = OFFICE.service_manager.createInstanceWithContext(
            "com.sun.star.configuration.ConfigurationProvider", OFFICE.context)

        def node(path):
            prop = uno.createUnoStruct("com.sun.star.beans.PropertyValue")
            prop.Name, prop.Value = "nodepath", path
            return provider.createInstanceWithArguments("com.sun.star.configuration.ConfigurationAccess", (prop,))

        menu = node("/org.openoffice.Office.Addons/AddonUI/OfficeMenuBar/org.isoquant.calc.menu")
        self.assertEqual(menu.Title, "Iso~quant")
        self.assertEqual(menu.Context, "com.sun.star.sheet.SpreadsheetDocument")
        entries = menu.Submenu
        self.assertEqual(sorted(entries.getByName(name).URL for name in entries.getElementNames()),
                         sorted([FIT_ARRAY, SAVE_COPY, HELP]))
        handler = node("/org.openoffice.Office.ProtocolHandler/HandlerSet/org.isoquant.calc.CommandsImpl")
        self.assertEqual(tuple(handler.Protocols), ("org.isoquant.calc.commands:*",))


    def test_the_help_entry_explains_both_commands(self):
        doc = OFFICE.new_calc()
        try:
            state, sentence = dispatch(doc, HELP)
            self.assertEqual(state, SUCCESS)
            self.assertIn("Fit the Array to Its Result:", sentence)
            self.assertIn("Save a Copy for Colleagues:", sentence)
        finally:
            doc.close(True)


class FitTheArray(unittest.TestCase):
    def setUp(self):
        self.doc = OFFICE.new_calc()
        self.sheet = self.doc.Sheets.getByIndex(0)
        set_values(self.sheet, "A1", workshops())

    def tearDown(self):
        self.doc.close(True)

    def size_by_calc(self, expression):
        set_formula(self.sheet, "Z1", "=ROWS(%s)" % expression)
        set_formula(self.sheet, "Z2", "=COLUMNS(%s)" % expression)
        recalc(self.doc)
        rows, columns = int(get_cell(self.sheet, "Z1")), int(get_cell(self.sheet, "Z2"))
        self.sheet.getCellRangeByName("Z1:Z2").clearContents(31)
        return rows, columns

    def test_a_single_cell_fit_grows_to_its_table_and_again_after_a_control(self):
        rows, columns = self.size_by_calc("PRODFIT(A1:A25;B1:C25)")
        set_formula(self.sheet, "F1", "=PRODFIT(A1:A25;B1:C25)")
        put_cursor(self.doc, "F1")
        state, sentence = dispatch(self.doc, FIT_ARRAY)
        self.assertEqual(state, SUCCESS, sentence)
        self.assertEqual(array_block(self.sheet, "F1"), "F1:%s%d" % (chr(ord("F") + columns - 1), rows))
        self.assertEqual(get_cell(self.sheet, "F1"), "Cobb-Douglas fit")
        self.assertIn("%d rows × %d columns" % (rows, columns), sentence)

        # The user adds a control to the formula (over the old block) and runs the command again,
        # with the cursor anywhere in the block: one row more.
        self.sheet.getCellRangeByName("F1:L%d" % rows).setArrayFormula("=PRODFIT(A1:A25;B1:C25;;;;;D1:D25)")
        put_cursor(self.doc, "H5")
        state, sentence = dispatch(self.doc, FIT_ARRAY)
        self.assertEqual(state, SUCCESS, sentence)
        grown, _ = self.size_by_calc("PRODFIT(A1:A25;B1:C25;;;;;D1:D25)")
        self.assertGreater(grown, rows)  # the control's own row and its test
        self.assertEqual(array_block(self.sheet, "F1"), "F1:L%d" % grown)

    def test_a_block_with_data_below_is_refused_not_overwritten(self):
        set_formula(self.sheet, "F30", "=PRODFIT(A1:A25;B1:C25)")
        set_values(self.sheet, "G40", [["keep me"]])
        put_cursor(self.doc, "F30")
        state, sentence = dispatch(self.doc, FIT_ARRAY)
        self.assertEqual(state, FAILURE)
        self.assertIn("G40", sentence)
        self.assertIn("nothing changed", sentence)
        self.assertEqual(get_cell(self.sheet, "G40"), "keep me")
        self.assertIsNone(array_block(self.sheet, "F30"))
        self.assertIn("PRODFIT", self.sheet.getCellRangeByName("F30").FormulaLocal.upper())

    def test_a_built_in_array_is_fitted_too(self):
        set_array_formula(self.sheet, "H1:H2", "=B2:C6*2")
        put_cursor(self.doc, "H2")
        state, sentence = dispatch(self.doc, FIT_ARRAY)
        self.assertEqual(state, SUCCESS, sentence)
        self.assertEqual(array_block(self.sheet, "H1"), "H1:I5")
        self.assertAlmostEqual(get_cell(self.sheet, "I5"), 2 * get_cell(self.sheet, "C6"), places=12)

    def test_no_formula_under_the_cursor_says_so(self):
        put_cursor(self.doc, "B3")
        state, sentence = dispatch(self.doc, FIT_ARRAY)
        self.assertEqual(state, FAILURE)
        self.assertEqual(sentence, "The cell under the cursor holds no formula.")

    def test_one_undo_step_restores_the_single_cell(self):
        set_formula(self.sheet, "F1", "=PRODFIT(A1:A25;B1:C25)")
        put_cursor(self.doc, "F1")
        self.assertEqual(dispatch(self.doc, FIT_ARRAY)[0], SUCCESS)
        self.doc.UndoManager.undo()
        self.assertIsNone(array_block(self.sheet, "F1"))
        self.assertIsNone(get_cell(self.sheet, "F2"))
        self.assertIn("PRODFIT", self.sheet.getCellRangeByName("F1").FormulaLocal.upper())


class SaveForColleagues(unittest.TestCase):
    def test_the_copy_shows_every_value_without_the_extension(self):
        doc = OFFICE.new_calc()
        sheet = doc.Sheets.getByIndex(0)
        sheet.Name = "workshops"
        set_values(sheet, "A1", workshops())
        set_array_formula(sheet, "F1:L17", "=PRODFIT(A1:A25;B1:C25)")
        set_array_formula(sheet, "N1:N25", '=PRODMARGINAL($F$1:$L$17;B1:C25;"labour")')
        set_formula(sheet, "P2", "=PRODOUTPUT($F$1:$L$17;B2:C2)")
        set_formula(sheet, "P3", "=P2*2")  # built in: stays a formula
        set_formula(sheet, "P4", "=PRODMARGINAL($F$1:$L$17;B1:C25)")  # an error message, frozen as text
        set_array_formula(sheet, "R1:R20", "=PRODFIT(A1:A25;B1:C25)")  # too tall: #N/A padding
        sheet.getCellRangeByName("P2").CellBackColor = 0xFFCC00
        second = doc.Sheets.insertNewByName("summary", 1) or doc.Sheets.getByName("summary")
        set_formula(second, "A1", '=PRODSTAT(workshops.A1:A25;workshops.B1:C25;"labour")')
        recalc(doc)
        modified_before = doc.isModified()
        original = {name: shown(doc.Sheets.getByName(name)) for name in ("workshops", "summary")}

        with tempfile.TemporaryDirectory() as folder:
            copies = {}
            for extension in (".ods", ".xlsx"):
                path = os.path.join(folder, "for colleagues" + extension)
                state, sentence = dispatch(doc, SAVE_COPY, URL=uno.systemPathToFileUrl(path))
                self.assertEqual(state, SUCCESS, sentence)
                self.assertIn("unchanged", sentence)
                copies[extension] = path
            # The open document is the one the user edits, as it was.
            self.assertEqual(doc.isModified(), modified_before)
            self.assertTrue(sheet.getCellRangeByName("P2").getFormula().upper().startswith("=ORG.ISOQUANT"))
            doc.close(True)

            with HeadlessOffice(extension_path=None) as plain:
                for extension, path in copies.items():
                    copy = plain.open(path)
                    try:
                        names = copy.Sheets.getElementNames()
                        self.assertEqual(names[0], "About this copy", extension)
                        self.assertIn("Save a copy for colleagues", copy.Sheets.getByIndex(0).getCellByPosition(0, 0).getString())
                        for name in ("workshops", "summary"):
                            values = shown(copy.Sheets.getByName(name))
                            self.assert_same_shown(values, original[name], "%s %s" % (extension, name))
                            self.assertNotIn("#NAME?", [value for row in values for value in row])
                        frozen = copy.Sheets.getByName("workshops")
                        self.assertEqual(frozen.getCellRangeByName("P3").getFormula(), "=P2*2", extension)
                        self.assertEqual(frozen.getCellRangeByName("P2").getType().value, "VALUE", extension)
                        self.assertEqual(frozen.getCellRangeByName("P2").CellBackColor, 0xFFCC00, extension)
                    finally:
                        copy.close(True)

    def assert_same_shown(self, copy, original, where):
        """Texts and empties exactly; numbers as LibreOffice 7.4 writes any number into a file, frozen
        or not (observed in the .ods XML: 15 significant digits, 30.05602602445911 saved as
        30.0560260244591, and at most 20 decimals, 7.312295321025803e-09 saved as
        0.00000000731229532103): 1e-14 relative or 5e-21 absolute, whichever is larger."""
        self.assertEqual(len(copy), len(original))
        for r, (copy_row, original_row) in enumerate(zip(copy, original)):
            for c, (got, want) in enumerate(zip(copy_row, original_row)):
                place = "%s row %d column %d" % (where, r + 1, c + 1)
                if isinstance(want, float) and isinstance(got, float):
                    self.assertLessEqual(abs(got - want), max(1e-14 * abs(want), 5e-21), place)
                else:
                    self.assertEqual(got, want, place)

    def test_nothing_to_freeze_says_so(self):
        doc = OFFICE.new_calc()
        try:
            set_formula(doc.Sheets.getByIndex(0), "A1", "=1+1")
            state, sentence = dispatch(doc, SAVE_COPY, URL="file:///tmp/never-written.ods")
            self.assertEqual(state, FAILURE)
            self.assertIn("Nothing to freeze", sentence)
            self.assertFalse(os.path.exists("/tmp/never-written.ods"))
        finally:
            doc.close(True)


if __name__ == "__main__":
    unittest.main()
