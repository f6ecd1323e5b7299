"""PRODFIT with a control on the Munnell (1990) state panel, computed by a real headless LibreOffice
Calc with the extension: the table, ln A at control means, and PRODOUTPUT and PRODSTAT reading it.

Run from the repository root with Debian's Python, the package isoquant_office on the path (see
tests/integration/README.md):
    PYTHONPATH=addin/python /usr/bin/python3 -m unittest -v tests/integration/test_controls_in_calc.py

One office with the extension serves the whole module. Sources of the expected figures, named
beside each check, as listed in fit_checks.py: "Munnell (1990)", "reference figures (R 4.2.2 lm)", "statsmodels" and
"function formula".
"""

import math
import unittest

from isoquant_office import get_cell, get_range, recalc, set_array_formula, set_formula

from .fit_checks import (FORMULA_RELATIVE, FitTestCase, layout, logs, state_panel_data, statsmodels_fit,
                         statsmodels_table)
from .support import module_session, row_of, write_columns

CALC = module_session()
setUpModule, tearDownModule = CALC.start, CALC.stop


# -- 4: the Munnell (1990) state panel with a control ---------------------------------------------

class StatePanelTest(FitTestCase):
    """PRODFIT of ln gsp on ln pcap, ln pc, ln emp with unemp as a control (pooled), Munnell (1990)."""

    INPUTS = ["pcap", "pc", "emp"]

    @classmethod
    def setUpClass(cls):
        cls.data = state_panel_data()
        cls.sheet = CALC.new_sheet("StatePanel")
        write_columns(cls.sheet, "A1", cls.data, ["gsp", "pcap", "pc", "emp", "unemp"])
        last = len(cls.data["gsp"]) + 1
        arguments = "A1:A{0};B1:D{0}".format(last)
        control = "E1:E%d" % last
        # k = 3 inputs, m = 1 control: k + m + 15 + 1 = 20 rows (fit_table.hpp), the last two
        # "ln A at control means" and "smearing factor".
        set_array_formula(cls.sheet, "G1:M20", "=PRODFIT(%s;;;;;%s)" % (arguments, control))
        set_array_formula(cls.sheet, "G31:M50", '=PRODFIT(%s;;;"hc1";;%s)' % (arguments, control))
        set_array_formula(cls.sheet, "G61:N81", "=PRODFIT(%s;;;;;%s)" % (arguments, control))  # 1 more each way
        # Evaluators read a table with controls at ln A at control means (production_model.hpp).
        set_array_formula(cls.sheet, "O2:O11", "=PRODOUTPUT($G$1:$M$20;B2:D11)")
        # PRODSTAT: a control answers to its label without " (control)" (fit_table.hpp).
        set_formula(cls.sheet, "Q2", '=PRODSTAT(%s;"unemp";"std. error";;;;;%s)' % (arguments, control))
        set_formula(cls.sheet, "Q3", '=PRODSTAT(%s;"ln A at control means";;;;;;%s)' % (arguments, control))
        recalc(CALC.doc)
        cls.table = get_range(cls.sheet, "G1:M20")
        cls.hc1 = get_range(cls.sheet, "G31:M50")

    def reference(self, cov_type):
        d = self.data
        return statsmodels_fit(logs(d["gsp"]), [logs(d["pcap"]), logs(d["pc"]), logs(d["emp"]), d["unemp"]],
                               cov_type)

    def test_result_is_exactly_20_by_7(self):
        padded = get_range(self.sheet, "G61:N81")
        self.assertEqual([row[:7] for row in padded[:20]], self.table)
        self.assertEqual(padded[20], ["#N/A"] * 8)
        self.assertEqual([row[7] for row in padded], ["#N/A"] * 21)

    def test_every_cell_has_its_label_or_a_number(self):
        # Verdict: the reference F = 270.9 of "elasticities sum to 1" on (1, 811) df is far beyond
        # the 5% point (about 3.85), and the published exponents sum to 1.058 > 1: increasing.
        self.assert_layout(self.table, layout(self.INPUTS, "increasing", ["unemp"]))

    def test_published_reference_figures(self):
        # Reference figures (R 4.2.2 lm / plm 2.6; statsmodels agrees), pooled OLS of
        # ln gsp on ln pcap, ln pc, ln emp, unemp: estimate (SE), R2, residual SD, F of sum = 1.
        expected = {"ln A": ("1.643302", "0.057587"), "pcap": ("0.155007", "0.017154"),
                    "pc": ("0.309190", "0.010272"), "emp": ("0.593935", "0.013747"),
                    "unemp (control)": ("-0.006733", "0.001416")}
        for label, (estimate, error) in expected.items():
            with self.subTest(row=label):
                row = row_of(self.table, label)
                self.assert_published(row[1], estimate, label + " estimate")
                self.assert_published(row[2], error, label + " std. error")
        self.assert_published(row_of(self.table, "R2")[1], "0.992593", "R2")
        self.assert_published(row_of(self.table, "residual SD")[1], "0.088096", "residual SD")
        self.assert_published(row_of(self.table, "returns to scale")[3], "270.9", "F of returns = 1")
        # 48 states x 17 years (Munnell 1990 / plm Produc).
        self.assertEqual(row_of(self.table, "observations")[1], 816.0)

    def test_ln_A_at_control_means(self):
        # ln A + coefficient x mean(unemp), from the table's own numbers and the data.
        log_scale = row_of(self.table, "ln A")[1]
        coefficient = row_of(self.table, "unemp (control)")[1]
        unemp = self.data["unemp"]
        expected = log_scale + coefficient * math.fsum(unemp) / len(unemp)
        # The row before the last ("smearing factor", fit_table.hpp).
        self.assertEqual(self.table[-2][0], "ln A at control means")
        self.assert_relative(self.table[-2][1], expected, FORMULA_RELATIVE, "ln A at control means")
        self.assertEqual(get_cell(self.sheet, "Q3"), self.table[-2][1])

    def test_against_statsmodels(self):
        with self.subTest("statsmodels OLS on logs with unemp"):
            self.need_statsmodels()
            labels = ["ln A"] + self.INPUTS + ["unemp (control)"]
            self.assert_matches_statsmodels(self.table, statsmodels_table(self.reference("nonrobust"), labels, 3))

    def test_hc1_errors(self):
        self.assert_layout(self.hc1, layout(self.INPUTS, "increasing", ["unemp"]))
        # Reference figures (R 4.2.2; statsmodels agrees): HC1 standard errors of the pooled fit.
        expected = {"ln A": "0.070989", "pcap": "0.018574", "pc": "0.012517", "emp": "0.019594",
                    "unemp (control)": "0.001341"}
        for label, error in expected.items():
            with self.subTest(row=label):
                self.assert_published(row_of(self.hc1, label)[2], error, label + " HC1 std. error")
        with self.subTest("statsmodels cov_type HC1"):
            self.need_statsmodels()
            labels = ["ln A"] + self.INPUTS + ["unemp (control)"]
            self.assert_matches_statsmodels(self.hc1, statsmodels_table(self.reference("HC1"), labels, 3))

    def test_output_uses_ln_A_at_control_means(self):
        # Function formula with ln A at control means and the three exponents of the table.
        scale = math.exp(row_of(self.table, "ln A at control means")[1])
        exponents = [row_of(self.table, label)[1] for label in self.INPUTS]
        values = get_range(self.sheet, "O2:O11")
        for i, (value,) in enumerate(values):
            x = [self.data[label][i] for label in self.INPUTS]
            expected = scale * math.prod(xi ** b for xi, b in zip(x, exponents))
            self.assert_relative(value, expected, FORMULA_RELATIVE, "PRODOUTPUT row %d" % (i + 2))

    def test_prodstat_finds_a_control_by_its_own_label(self):
        self.assertEqual(get_cell(self.sheet, "Q2"), row_of(self.table, "unemp (control)")[2])


if __name__ == "__main__":
    unittest.main()
