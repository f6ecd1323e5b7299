"""The committed sample workbooks are what their generator builds, compute without a problem,
and the demo (README command 1) prints its summary and writes a PDF for each.

Run from the repository root with Debian's Python, the package isoquant_office on the path (see
tests/integration/README.md):
    PYTHONPATH=addin/python /usr/bin/python3 -m unittest -v tests/integration/test_sample_workbooks.py
The extension comes from ISOQUANT_OXT (default build/isoquant.oxt).

Sources of the expected figures on the joinery's sheet Labour bounds (issue 20): python3-statsmodels
(OLS of ln output on ln labour and ln capital, its classical covariance) and python3-scipy (the t
quantile), recomputed at test time, with the delta method on the log scale as README's "Bounds on
derived numbers" states it: ln MP = ln A + ln b_labour + (b_labour - 1) ln labour + b_capital ln capital,
gradient (1, 1/b_labour + ln labour, ln capital), bounds MP exp(-/+ t s), s = sqrt(g'Vg); compared to
1e-8 relative (STATSMODELS_RELATIVE: two implementations of the same least squares).
"""
import glob
import math
import os
import subprocess
import tempfile
import unittest

from isoquant_office import HeadlessOffice, get_cell, get_range, recalc  # first: it imports uno, which makes com.sun.star importable
from com.sun.star.sheet.CellFlags import FORMULA, VALUE, STRING
import uno

from .fit_checks import STATSMODELS_RELATIVE, np, scipy, statsmodels_fit
from .support import EXTENSION, REPO, CalcTestCase, skip_missing_reference

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


class LabourBoundsSheet(CalcTestCase):
    """The committed joinery workbook, recomputed: the marginal product of labour with its bounds, the
    error bars' lengths, and the chart that draws them."""
    SHEET = "Labour bounds"
    ROWS = 40  # workshops, in rows 2..41

    @classmethod
    def setUpClass(cls):
        cls.office = HeadlessOffice(extension_path=EXTENSION)
        cls.office.__enter__()
        try:
            cls.doc = cls.office.open(os.path.join(SAMPLES, "furniture-workshops.fods"))
            recalc(cls.doc)
            cls.sheet = cls.doc.Sheets.getByName(cls.SHEET)
            cls.rows = get_range(cls.sheet, "A2:F%d" % (cls.ROWS + 1))
            cls.data = get_range(cls.doc.Sheets.getByName("Workshops"), "B2:D%d" % (cls.ROWS + 1))
        except BaseException:
            cls.office.__exit__(None, None, None)
            raise

    @classmethod
    def tearDownClass(cls):
        cls.doc.close(True)
        cls.office.__exit__(None, None, None)

    def test_the_columns_are_the_marginal_product_its_bounds_and_the_bar_lengths(self):
        self.assertEqual(get_range(self.sheet, "A1:F1")[0], [
            "workshop", "MP labour", "lower bound", "upper bound", "error bar down", "error bar up"])
        # The API writes an add-in function by its programmatic name (ORG.ISOQUANT.CALC...PRODFIT).
        self.assertIn('PRODMARGINAL($H$1:$N$21;$Workshops.C2:D2;"labour";"lower bound")',
                      self.sheet.getCellRangeByName("C2").getFormula())
        self.assertIn("PRODFIT($Workshops.B1:B41;$Workshops.C1:D41;;;;;;;;;;TRUE())",
                      self.sheet.getCellRangeByName("H1").getFormula())
        self.assertEqual(get_cell(self.sheet, "H18"), "covariance")

    def test_every_bound_computes_and_holds_the_value(self):
        for name, value, lower, upper, down, up in self.rows:
            with self.subTest(workshop=name):
                for figure, what in ((value, "MP labour"), (lower, "lower bound"), (upper, "upper bound"),
                                     (down, "error bar down"), (up, "error bar up")):
                    self.assert_number(figure, "%s, %s" % (name, what))
                self.assertLessEqual(lower, value, name)
                self.assertLessEqual(value, upper, name)
                self.assertGreater(lower, 0.0, name)  # bounds on the log scale never cross 0

    def test_the_error_bars_are_the_distances_to_the_bounds(self):
        # Calc subtracts in IEEE double as Python does (its rounding of near-equal differences to 0
        # applies only within 2^-48 of each other, far from these), so the cells equal exactly.
        for name, value, lower, upper, down, up in self.rows:
            with self.subTest(workshop=name):
                self.assertEqual(down, value - lower)
                self.assertEqual(up, upper - value)

    def test_the_bounds_are_the_delta_method_on_statsmodels_covariance(self):
        if np is None:
            skip_missing_reference(self, "python3-statsmodels/scipy/numpy not importable")
        output, labour, capital = (np.log([row[j] for row in self.data]) for j in range(3))
        fit = statsmodels_fit(output, [labour, capital])  # statsmodels, classical covariance
        covariance = fit.cov_params()
        log_a, b_labour, b_capital = fit.params
        t = scipy.stats.t.ppf(0.975, fit.df_resid)  # scipy: the table's level 0.95, t(n - p)
        for (name, value, lower, upper, _, _), ln_l, ln_k in zip(self.rows, labour, capital):
            with self.subTest(workshop=name):
                log_mp = log_a + math.log(b_labour) + (b_labour - 1) * ln_l + b_capital * ln_k
                gradient = np.array([1.0, 1 / b_labour + ln_l, ln_k])
                spread = math.sqrt(gradient @ covariance @ gradient)
                self.assert_relative(value, math.exp(log_mp), STATSMODELS_RELATIVE, name + ", value")
                self.assert_relative(lower, math.exp(log_mp - t * spread), STATSMODELS_RELATIVE, name + ", lower")
                self.assert_relative(upper, math.exp(log_mp + t * spread), STATSMODELS_RELATIVE, name + ", upper")

    def test_the_chart_draws_the_bounds_as_error_bars(self):
        # A flat ODF file keeps no chart names: the sheet's one chart.
        self.assertEqual(self.sheet.Charts.Count, 1)
        chart = self.sheet.Charts.getByIndex(0).EmbeddedObject
        chart_types = chart.getFirstDiagram().getCoordinateSystems()[0].getChartTypes()
        self.assertEqual([kind.getChartType() for kind in chart_types], ["com.sun.star.chart2.ColumnChartType"])
        [series] = chart_types[0].getDataSeries()
        values = {sequence.getValues().Role: sequence.getValues().getSourceRangeRepresentation()
                  for sequence in series.getDataSequences()}
        self.assertEqual(values["values-y"], "$'Labour bounds'.$B$2:$B$41")
        bars = series.ErrorBarY
        self.assertIsNotNone(bars, "the series has no error bars")
        self.assertEqual(bars.ErrorBarStyle, uno.getConstantByName("com.sun.star.chart.ErrorBarStyle.FROM_DATA"))
        self.assertTrue(bars.ShowPositiveError)
        self.assertTrue(bars.ShowNegativeError)
        ranges = {sequence.getValues().Role: sequence.getValues().getSourceRangeRepresentation()
                  for sequence in bars.getDataSequences()}
        self.assertEqual(ranges, {"error-bars-y-negative": "$'Labour bounds'.$E$2:$E$41",
                                  "error-bars-y-positive": "$'Labour bounds'.$F$2:$F$41"})

    def test_the_about_sheet_keeps_the_caution_and_notes_what_bounds_leave_out(self):
        about = " ".join(row[0] for row in get_range(self.doc.Sheets.getByIndex(0), "A1:A20") if row[0])
        self.assertIn("not professional advice", about)
        self.assertIn("sampling error under the model, not errors of form", about)
        self.assertIn("Labour bounds", about)


if __name__ == "__main__":
    unittest.main()
