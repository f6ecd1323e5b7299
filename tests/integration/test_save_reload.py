"""A workbook saved with Isoquant formulas reopens with identical values, in both OpenDocument
formats (the add-in cells recompute on load; nothing is cached in the file for them).

Run from the repository root with Debian's Python, the package isoquant_office on the path (see
tests/integration/README.md):
    PYTHONPATH=addin/python /usr/bin/python3 -m unittest -v tests/integration/test_save_reload.py
The extension comes from ISOQUANT_OXT (default build/isoquant.oxt).
"""
import os
import tempfile
import unittest

from isoquant_office import HeadlessOffice, get_range, recalc, set_array_formula, set_formula, set_values

from .support import EXTENSION, cobb_douglas_rows

FORMATS = {".ods": "calc8", ".fods": "OpenDocument Spreadsheet Flat XML"}


class SaveAndReload(unittest.TestCase):
    def test_values_survive_saving_and_reopening(self):
        with HeadlessOffice(extension_path=EXTENSION) as office, tempfile.TemporaryDirectory() as folder:
            doc = office.new_calc()
            sheet = doc.Sheets.getByIndex(0)
            # Cobb & Douglas (1928) indexes, tests/data/cobb_douglas_1928.csv; only the round trip is checked here.
            set_values(sheet, "A1", [["P", "L", "C"]] + cobb_douglas_rows())
            set_array_formula(sheet, "F1:L16", "=PRODFIT(A1:A25;B1:C25)")
            set_array_formula(sheet, "N2:N25", "=PRODMARGINAL($F$1:$L$16;B2:C25;\"L\")")
            set_formula(sheet, "O1", "=PRODSTAT(A1:A25;B1:C25;\"returns to scale\";\"p-value\";;;\"hc3\")")
            set_formula(sheet, "O2", "=PRODRETURNS($F$1:$L$16;0.5)")
            set_formula(sheet, "O3", "=PRODOUTPUT($F$1:$L$16;B2:C2)*2")
            recalc(doc)
            before = get_range(sheet, "A1:O25")
            self.assertIsInstance(before[1][13], float)  # a marginal product, not a message
            for extension, filter_name in FORMATS.items():
                with self.subTest(format=extension):
                    path = os.path.join(folder, "saved" + extension)
                    office.store(doc, path, filter_name)
                    reopened = office.open(path)
                    after = get_range(reopened.Sheets.getByIndex(0), "A1:O25")
                    self.assertEqual(after, before)
                    reopened.close(True)
            doc.close(True)
            self.assertTrue(office.alive())


if __name__ == "__main__":
    unittest.main()
