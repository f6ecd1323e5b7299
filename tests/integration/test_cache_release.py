"""The fit cache is released when a spreadsheet document closes (addin/closing_documents.hxx), in a real
headless Calc with the benchmark extension, whose ISOQUANTCACHEBYTES tells the bytes the cache holds
(the user-facing isoquant.oxt has no such function).

Run from the repository root with Debian's Python, the package isoquant_office on the path, after
`cmake --build build --target oxt_bench`:
    PYTHONPATH=addin/python /usr/bin/python3 -m unittest -v tests/integration/test_cache_release.py
The extension comes from ISOQUANT_BENCH_OXT (default build/isoquant-bench.oxt).

The add-in cannot tell which document a fit came from, so closing any spreadsheet releases every
entry; the documents still open compute their fits again at their next recalculation.
"""

import os
import unittest
import zipfile

import uno

from isoquant_office import HeadlessOffice, get_cell, get_range, set_array_formula, set_formula, set_values
from isoquant_office.uno_calls import properties

from .support import EXTENSION as USER_EXTENSION
from .support import REPO, cobb_douglas_rows

EXTENSION = os.environ.get("ISOQUANT_BENCH_OXT", os.path.join(REPO, "build", "isoquant-bench.oxt"))
FIT = "=PRODFIT(A2:A{last};B2:C{last})"
TABLE = "E1:J17"  # PRODFIT's table for 2 inputs: 17 rows, 6 columns


def invented_rows(count):
    """Invented deterministic rows (a demo scenario: bakeries, flour and hours), unlike Cobb-Douglas's."""
    rows = []
    for index in range(count):
        flour = 20.0 + (index * 37) % 101
        hours = 8.0 + (index * 53) % 67
        rows.append([3.0 * flour ** 0.4 * hours ** 0.5 * (1.0 + 0.05 * ((index * 29) % 7 - 3)), flour, hours])
    return rows


class CacheReleaseTest(unittest.TestCase):
    @classmethod
    def setUpClass(cls):
        # Missing is a failure, not a skip: CTest builds it (fixture integration_bench_extension).
        if not os.path.exists(EXTENSION):
            raise FileNotFoundError("no benchmark extension at %s: build the target oxt_bench" % EXTENSION)
        cls.office = HeadlessOffice(extension_path=EXTENSION)
        cls.office.__enter__()
        # The probe lives in a document of its own that stays open throughout (it fits nothing).
        cls.probe_doc = cls.office.new_calc()
        cls.probe_sheet = cls.probe_doc.Sheets.getByIndex(0)

    @classmethod
    def tearDownClass(cls):
        cls.office.__exit__(None, None, None)

    def cache_bytes(self):
        # A formula written anew is calculated at once: the cache as it is now.
        set_formula(self.probe_sheet, "A1", "=ISOQUANTCACHEBYTES()")
        value = get_cell(self.probe_sheet, "A1")
        self.assertIsInstance(value, float, "ISOQUANTCACHEBYTES shows %r" % (value,))
        return value

    def broadcaster(self):
        return self.office.context.getValueByName("/singletons/com.sun.star.frame.theGlobalEventBroadcaster")

    def fitted_document(self, rows):
        doc = self.office.new_calc()
        sheet = doc.Sheets.getByIndex(0)
        set_values(sheet, "A1", [["output", "first input", "second input"]] + rows)
        set_array_formula(sheet, TABLE, FIT.format(last=len(rows) + 1))
        doc.calculateAll()
        table = get_range(sheet, TABLE)
        self.assertIsInstance(table[1][1], float, "the fit's first value: %r" % (table[1][1],))
        return doc, table

    def test_closing_spreadsheets_releases_the_cache(self):
        self.assertEqual(self.cache_bytes(), 0.0, "a fresh office holds no fit")
        first, _ = self.fitted_document(cobb_douglas_rows())
        first_bytes = self.cache_bytes()
        self.assertGreater(first_bytes, 0.0)
        second, second_table = self.fitted_document(invented_rows(2000))
        both_bytes = self.cache_bytes()
        self.assertGreater(both_bytes, first_bytes)

        # A document of another kind closing is no reason to drop the fits (a chart: this office
        # has no Writer). Its close is sent to the listeners as well, in case the office sends none.
        chart = self.office.desktop.loadComponentFromURL("private:factory/schart", "_blank", 0,
                                                         properties(Hidden=True))
        self.assertFalse(chart.supportsService("com.sun.star.sheet.SpreadsheetDocument"))
        closed = uno.createUnoStruct("com.sun.star.document.DocumentEvent")
        closed.Source, closed.EventName = chart, "OnUnload"
        self.broadcaster().documentEventOccured(closed)
        chart.close(True)
        self.assertEqual(self.cache_bytes(), both_bytes, "after a chart document closed")

        first.close(True)
        self.assertEqual(self.cache_bytes(), 0.0, "after the first spreadsheet closed")
        # The second keeps its values, and fits again (its entry alone) when it is recalculated.
        second_sheet = second.Sheets.getByIndex(0)
        self.assertEqual(get_range(second_sheet, TABLE), second_table)
        second.calculateAll()
        self.assertEqual(get_range(second_sheet, TABLE), second_table)
        self.assertEqual(self.cache_bytes(), both_bytes - first_bytes, "the second document's fit alone")

        second.close(True)
        self.assertEqual(self.cache_bytes(), 0.0, "after the second spreadsheet closed")

    def test_many_open_fit_close_cycles(self):
        rows = invented_rows(300)
        for cycle in range(25):
            doc, _ = self.fitted_document(rows)
            self.assertGreater(self.cache_bytes(), 0.0, "cycle %d, document open" % cycle)
            doc.close(True)
            self.assertEqual(self.cache_bytes(), 0.0, "cycle %d, document closed" % cycle)
        self.assertTrue(self.office.alive(), "the office answers after the cycles")


class DiagnosticOnlyInBenchmarkTest(unittest.TestCase):
    def test_user_extension_has_no_cache_diagnostic(self):
        # Neither the type library nor the library of isoquant.oxt names the diagnostic function.
        with zipfile.ZipFile(USER_EXTENSION) as package:
            for member in ("isoquant.rdb", "libisoquant.so"):
                content = package.read(member)
                self.assertNotIn(b"benchCacheBytes", content, member)
                self.assertNotIn(b"ISOQUANTCACHEBYTES", content, member)
        with zipfile.ZipFile(EXTENSION) as package:
            self.assertIn(b"ISOQUANTCACHEBYTES", package.read("libisoquant.so"))


if __name__ == "__main__":
    unittest.main()
