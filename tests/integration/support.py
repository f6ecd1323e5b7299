"""What the integration modules share: the extension under test, the office of a module, the
reference data in tests/data, and assertions on cell values.

Imported relatively (`from .support import ...`): the modules run as tests.integration.<name>
(`/usr/bin/python3 -m unittest -v tests/integration/test_<name>.py` from the repository root).
"""

import csv
import math
import os
import unittest

from isoquant_office import CalcSession, set_values

REPO = os.path.normpath(os.path.join(os.path.dirname(os.path.abspath(__file__)), "..", ".."))
DATA_DIR = os.path.join(REPO, "tests", "data")
# The extension under test: $ISOQUANT_OXT (CTest sets it), else the one in the build folder.
EXTENSION = os.environ.get("ISOQUANT_OXT", os.path.join(REPO, "build", "isoquant.oxt"))


def module_session(prepare=None):
    """One office with the extension for a whole test module (starting one takes about 10 s):
        CALC = module_session()
        setUpModule, tearDownModule = CALC.start, CALC.stop
    prepare(sheet), if given, fills the document's first sheet (CALC.sheet) once."""
    return CalcSession(EXTENSION, prepare)


def skip_missing_reference(test_case, what):
    """Ends the calling (sub)test because a reference library (python3-statsmodels, -scipy, numpy) is
    missing: skipped, or failed under ISOQUANT_REQUIRE_REFERENCES=1 (the CMake option of that name
    sets it), so that a run without the libraries cannot pass having checked only counts and layout."""
    if os.environ.get("ISOQUANT_REQUIRE_REFERENCES") == "1":
        test_case.fail("%s, and ISOQUANT_REQUIRE_REFERENCES=1 requires them" % what)
    test_case.skipTest("%s: reference checks skipped" % what)


# -- reference data ------------------------------------------------------------------------------

def read_rows(file_name):
    """The rows of a CSV file in tests/data, each a dict by column name (values as text)."""
    with open(os.path.join(DATA_DIR, file_name), newline="") as handle:
        return list(csv.DictReader(handle))


def read_columns(file_name, names):
    """Columns of a CSV file in tests/data as lists of floats, by column name."""
    rows = read_rows(file_name)
    return {name: [float(row[name]) for row in rows] for name in names}


def cobb_douglas_rows():
    """Cobb & Douglas (1928), Tables II and III: [P, L, C] of each year 1899-1922, 1899 = 100."""
    return [[float(row["P"]), float(row["L"]), float(row["C"])] for row in read_rows("cobb_douglas_1928.csv")]


# -- sheets and tables -----------------------------------------------------------------------------

def write_columns(sheet, top_left, columns, names):
    """A header row of names, then the columns side by side."""
    set_values(sheet, top_left, [list(names)] + [list(row) for row in zip(*(columns[n] for n in names))])


def row_of(table, label):
    """The row of a read-back table whose first cell is label."""
    for row in table:
        if row[0] == label:
            return row
    raise KeyError(label)


class CalcTestCase(unittest.TestCase):
    """Assertions on the values get_cell and get_range read back."""

    def assert_number(self, value, what):
        self.assertIsInstance(value, float, "%s: expected a number, the cell shows %r" % (what, value))
        self.assertTrue(math.isfinite(value), "%s: %r is not finite" % (what, value))

    def assert_relative(self, value, expected, relative, what):
        self.assert_number(value, what)
        self.assertLessEqual(abs(value - expected), relative * abs(expected),
                             "%s: %r, expected %r (relative tolerance %g)" % (what, value, expected, relative))

    def assert_message(self, value, message, what):
        """A cell shows exactly the message, as text (so no number)."""
        self.assertIsInstance(value, str, "%s: a number %r is shown instead of %r" % (what, value, message))
        self.assertEqual(value, message, what)

    def assert_only_message(self, result, message, what):
        """A result range read back shows the message in its first cell and no number anywhere (Calc
        repeats a 1 x 1 result over the range)."""
        self.assert_message(result[0][0], message, what)
        numbers = [v for row in result for v in row if isinstance(v, float)]
        self.assertEqual(numbers, [], what + ": numbers shown beside the message")
