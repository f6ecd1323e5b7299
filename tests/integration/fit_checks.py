"""PRODFIT tables checked the same way by the modules of the fit family (test_fits_in_calc.py,
test_controls_in_calc.py, test_evaluators_in_calc.py, test_fit_errors_in_calc.py, and
test_forms_in_calc.py): the data they fit, the table's layout, the statsmodels figures of a table,
and the assertions on them.

Sources of the expected figures, named beside each check in those modules:
- "Cobb & Douglas (1928)": the data, Cobb, C. W. and Douglas, P. H. (1928), "A Theory of Production",
  American Economic Review 18(1) Supplement, pp. 139-165, Tables II and III (tests/data).
- "Munnell (1990)": the US state panel 1970-1986 (48 states x 17 years), Munnell, A. (1990), New
  England Economic Review 3-22, as distributed in the R package plm 2.6 (dataset Produc).
- "reference figures (R 4.2.2 lm)": figures computed from those data with R 4.2.2 lm (plm 2.6 for the
  panel; statsmodels 0.13.5 agrees), as listed in the project's shared reference-data README. They
  are copied as printed there and compared to the digits printed, at most 6 significant.
- "statsmodels": python3-statsmodels (Debian 12: 0.13.5) and python3-scipy, recomputed on the
  same data at test time and compared to 1e-8 relative. Those checks are skipped (as subtests) when
  the libraries cannot be imported.
- "function formula": Y = exp(ln A) * prod x_i^b_i, MP_i = b_i * Y / x_i, elasticity b_i,
  returns to scale = sum of b_i, computed from the table's own numbers (1e-12 relative).
- Error messages: the wording in core/sheet/src/ and core/math/src/, which the add-in prefixes with "Error: ".
"""

import math

from .support import CalcTestCase, read_columns, row_of, skip_missing_reference, write_columns

try:  # reference libraries; their checks are skipped when these are missing (failed
    # under ISOQUANT_REQUIRE_REFERENCES=1)
    import numpy as np
    import scipy.stats
    import statsmodels.api as sm
except ImportError:
    np = scipy = sm = None

STATSMODELS_RELATIVE = 1e-8   # two implementations of the same least squares, in double precision
FORMULA_RELATIVE = 1e-12      # the same closed-form expression, evaluated in a different order

COLUMNS = ["value", "std. error", "t", "p-value", "lower bound", "upper bound"]
HEADER = ["Cobb-Douglas fit"] + COLUMNS
NUMBER = object()  # a layout slot that must hold a finite number


def cobb_douglas_data():
    # Cobb & Douglas (1928), Tables II and III: output P, labour L, capital C, 1899 = 100.
    return read_columns("cobb_douglas_1928.csv", ["year", "P", "L", "C"])


def cobb_douglas_sheet(session, name):
    """A new sheet of the session with Cobb & Douglas (1928) in A1:D25 (year, P, L, C under a header
    row, so P is B1:B25 and L, C are C1:D25); returns the sheet and the data's columns."""
    data = cobb_douglas_data()
    sheet = session.new_sheet(name)
    write_columns(sheet, "A1", data, ["year", "P", "L", "C"])
    return sheet, data


def state_panel_data():
    # Munnell (1990) state panel, as distributed in plm 2.6 (Produc).
    return read_columns("us_states_produc_1970_1986.csv", ["gsp", "pcap", "pc", "emp", "unemp"])


def layout(input_labels, verdict, control_labels=(), imposed=False, note=""):
    """The PRODFIT table expected by core/sheet/include/isoquant/sheet/tables/fit_table.hpp: each cell a text (blank
    cells are formula results "" in Calc) or NUMBER."""
    blank = [""] * 5
    rows = [list(HEADER), ["ln A"] + [NUMBER] * 6]
    rows += [[label] + [NUMBER] * 6 for label in input_labels]
    rows += [[label + " (control)"] + [NUMBER] * 6 for label in control_labels]
    rows.append([""] * 7)
    for label in ["observations", "R2", "adjusted R2", "residual SD"]:
        rows.append([label, NUMBER] + blank)
    rows.append(["F (slopes = 0)", "", "", NUMBER, NUMBER, "", ""])
    for label in ["log-likelihood", "AIC", "BIC"]:
        rows.append([label, NUMBER] + blank)
    if imposed:
        rows.append(["returns to scale", NUMBER, "imposed", "", "", "", ""])
    else:
        rows.append(["returns to scale", NUMBER, NUMBER, NUMBER, NUMBER, "", ""])
    rows.append(["verdict", verdict] + blank)
    rows.append(["form", "cobb-douglas", note, "", "", "", ""])
    if control_labels:
        rows.append(["ln A at control means", NUMBER] + blank)
    rows.append(["smearing factor", NUMBER] + blank)
    return rows


def error(text):
    return "Error: " + text  # the add-in's prefix (addin/production_functions.cxx)


# -- reference computations (statsmodels) ------------------------------------------------------

def statsmodels_fit(y, regressors, cov_type="nonrobust"):
    """OLS of y on a constant and the regressors. use_t: t and F distributions, as the add-in
    uses for every kind of error (statsmodels would use the normal for robust errors otherwise)."""
    design = np.column_stack([np.ones(len(y))] + [np.asarray(r, dtype=float) for r in regressors])
    model = sm.OLS(np.asarray(y, dtype=float), design)
    if cov_type == "nonrobust":
        return model.fit()
    return model.fit(cov_type=cov_type, use_t=True)


def statsmodels_returns_test(result, inputs):
    """Estimate, standard error, F and p of the test that the `inputs` exponents (parameters
    1..inputs) sum to 1."""
    restriction = np.zeros((1, len(result.params)))
    restriction[0, 1:1 + inputs] = 1.0
    t_test = result.t_test((restriction, np.array([1.0])))
    f_test = result.f_test((restriction, np.array([1.0])))
    return (float(np.squeeze(t_test.effect)), float(np.squeeze(t_test.sd)),
            float(np.squeeze(f_test.fvalue)), float(np.squeeze(f_test.pvalue)))


def statsmodels_table(result, labels, inputs, level=0.95):
    """{(row label, column label): value} for every number of an unrestricted PRODFIT table."""
    bounds = result.conf_int(alpha=1 - level)
    figures = {}
    for j, label in enumerate(labels):
        figures[(label, "value")] = result.params[j]
        figures[(label, "std. error")] = result.bse[j]
        figures[(label, "t")] = result.tvalues[j]
        figures[(label, "p-value")] = result.pvalues[j]
        figures[(label, "lower bound")] = bounds[j][0]
        figures[(label, "upper bound")] = bounds[j][1]
    figures[("R2", "value")] = result.rsquared
    figures[("adjusted R2", "value")] = result.rsquared_adj
    figures[("residual SD", "value")] = math.sqrt(result.scale)
    figures[("F (slopes = 0)", "t")] = float(result.fvalue)
    figures[("F (slopes = 0)", "p-value")] = float(result.f_pvalue)
    figures[("log-likelihood", "value")] = result.llf
    figures[("AIC", "value")] = result.aic
    figures[("BIC", "value")] = result.bic
    nu, se, f_value, p_value = statsmodels_returns_test(result, inputs)
    figures[("returns to scale", "value")] = nu
    figures[("returns to scale", "std. error")] = se
    figures[("returns to scale", "t")] = f_value
    figures[("returns to scale", "p-value")] = p_value
    return figures


def logs(values):
    return [math.log(v) for v in values]


# -- assertions ----------------------------------------------------------------------------------

def half_unit(figure, most_digits=6):
    """Half a unit in the last significant digit of a figure printed as `figure`, counting at most
    `most_digits` significant digits: a correct value lies within this of the printed figure."""
    digits = len(figure.lstrip("+-").replace(".", "").lstrip("0"))
    used = min(digits, most_digits)
    exponent = math.floor(math.log10(abs(float(figure))))
    return 0.5 * 10.0 ** (exponent - used + 1)


class FitTestCase(CalcTestCase):
    """Assertions on PRODFIT tables, shared by the modules of the fit family."""

    def assert_published(self, value, figure, what):
        """value agrees with a published figure to the digits printed (at most 6 significant)."""
        self.assert_number(value, what)
        tolerance = half_unit(figure)
        self.assertLessEqual(abs(value - float(figure)), tolerance,
                             "%s: %r, published %s (tolerance %.1g)" % (what, value, figure, tolerance))

    def assert_layout(self, table, expected):
        """Every cell: the expected text, or a finite number where NUMBER stands."""
        self.assertEqual(len(table), len(expected), "rows")
        for r, (row, wanted_row) in enumerate(zip(table, expected)):
            self.assertEqual(len(row), len(wanted_row), "columns of row %d" % (r + 1))
            for c, (cell, wanted) in enumerate(zip(row, wanted_row)):
                where = "row %d (%s), column %d (%s)" % (r + 1, wanted_row[0], c + 1, HEADER[c])
                if wanted is NUMBER:
                    self.assert_number(cell, where)
                else:
                    self.assertEqual(cell, wanted, where)

    def assert_matches_statsmodels(self, table, figures):
        # An expected 0 demands exactly 0: the panel's F of all slopes has p about 7e-861 (mpmath),
        # below the smallest double, so both statsmodels and a correct add-in give 0.
        for (label, column), expected in figures.items():
            value = row_of(table, label)[HEADER.index(column)]
            self.assert_relative(value, float(expected), STATSMODELS_RELATIVE,
                                 "%s / %s against statsmodels" % (label, column))

    def need_statsmodels(self):
        """Call inside a subTest: skips just that subtest when the reference libraries are missing."""
        if sm is None:
            skip_missing_reference(self, "python3-statsmodels/scipy/numpy not importable")
