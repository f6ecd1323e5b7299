"""The committed sample workbooks are what their generator builds, compute without a problem,
and the demo (README command 1) prints its summary and writes a PDF for each.

Run from the repository root with Debian's Python, the package isoquant_office on the path (see
tests/integration/README.md):
    PYTHONPATH=addin/python /usr/bin/python3 -m unittest -v tests/integration/test_sample_workbooks.py
The extension comes from ISOQUANT_OXT (default build/isoquant.oxt).
"""
import glob
import os
import subprocess
import tempfile
import unittest

from isoquant_office import HeadlessOffice, recalc  # first: it imports uno, which makes com.sun.star importable
from com.sun.star.sheet.CellFlags import FORMULA, VALUE, STRING

from .support import EXTENSION, REPO

SAMPLES = os.path.join(REPO, "sample-sheets")


def cell_contents(doc):
    """Every non-empty cell of every sheet as {(sheet, column, row): formula or constant}, and the
    number of charts on each sheet."""
    contents = {}
    charts = {}
    for sheet in doc.Sheets:
        charts[sheet.Name] = sheet.Charts.Count
        for address in sheet.queryContentCells(FORMULA | VALUE | STRING).getRangeAddresses():
            for row in range(address.StartRow, address.EndRow + 1):
                for column in range(address.StartColumn, address.EndColumn + 1):
                    contents[(sheet.Name, column, row)] = sheet.getCellByPosition(column, row).getFormula()
    return contents, charts


class SampleWorkbooks(unittest.TestCase):
    def test_committed_workbooks_match_their_generator(self):
        committed = sorted(glob.glob(os.path.join(SAMPLES, "*.fods")))
        self.assertGreaterEqual(len(committed), 3)
        with tempfile.TemporaryDirectory() as fresh_folder:
            # The generator checks on its own that every formula computes and that fitted
            # exponents land within 3 SE of the true ones; a failure exits non-zero.
            subprocess.run(["/usr/bin/python3", os.path.join(SAMPLES, "build_workbooks.py"),
                            "--extension", EXTENSION, "--output", fresh_folder], check=True, timeout=600)
            with HeadlessOffice(extension_path=EXTENSION) as office:
                for path in committed:
                    with self.subTest(workbook=os.path.basename(path)):
                        fresh_path = os.path.join(fresh_folder, os.path.basename(path))
                        self.assertTrue(os.path.exists(fresh_path), "the generator no longer builds it")
                        old = office.open(path)
                        new = office.open(fresh_path)
                        recalc(old)
                        self.assertEqual(cell_contents(old), cell_contents(new))
                        old.close(True)
                        new.close(True)

    def test_demo_prints_the_fit_and_writes_a_pdf_per_workbook(self):
        with tempfile.TemporaryDirectory() as output:
            run = subprocess.run(["/usr/bin/python3", os.path.join(SAMPLES, "demo.py"), "--extension", EXTENSION,
                                  "--output", output], capture_output=True, text=True, timeout=600)
            self.assertEqual(run.returncode, 0, run.stdout + run.stderr)
            self.assertIn("not professional advice", run.stdout)
            self.assertRegex(run.stdout, r"-> returns to scale [0-9.]+ \(SE [0-9.]+; p-value of the test that it equals 1: [0-9.]+\): "
                                         r"(increasing|constant|decreasing)")
            # The panel workbook's trend and the growth workbook's productivity line.
            self.assertRegex(run.stdout, r"-> technical change -?[0-9.]+ a period \(SE [0-9.]+\)")
            self.assertRegex(run.stdout, r"-> output grew -?[0-9.]+% a year; TFP growth -?[0-9.]+% a year, "
                                         r"-?[0-9]+% of output growth")
            for path in glob.glob(os.path.join(SAMPLES, "*.fods")):
                pdf = os.path.join(output, os.path.splitext(os.path.basename(path))[0] + ".pdf")
                self.assertTrue(os.path.getsize(pdf) > 10000, pdf)
                with open(pdf, "rb") as handle:
                    self.assertEqual(handle.read(5), b"%PDF-")


if __name__ == "__main__":
    unittest.main()
