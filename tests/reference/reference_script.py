"""What the reference scripts in this folder share: their command line, the skip (or the failure,
under ISOQUANT_REQUIRE_REFERENCES=1) when a Debian library is missing, and writing their figures
for the C++ checks."""

import csv
import os
import sys

SKIP = 77  # the fixtures' SKIP_RETURN_CODE (add_reference_check in tests/CMakeLists.txt)
MISSING_REQUIRED = 1  # a plain failure, under ISOQUANT_REQUIRE_REFERENCES=1


def paths(usage):
    """(data folder, output path) from the command line, after removing a stale output file;
    prints `usage` and exits 2 when called otherwise."""
    if len(sys.argv) != 3:
        print(usage, file=sys.stderr)
        sys.exit(2)
    data_dir, output_path = sys.argv[1], sys.argv[2]
    if os.path.exists(output_path):
        os.remove(output_path)  # never leave stale figures for the C++ check to read
    return data_dir, output_path


def references_required():
    """True under ISOQUANT_REQUIRE_REFERENCES=1 (the CMake option of that name sets it for the tests)."""
    return os.environ.get("ISOQUANT_REQUIRE_REFERENCES") == "1"


def skipped(libraries, error):
    """The exit code for a missing library, after saying so: the skip code, or a failure when the
    references are required."""
    if references_required():
        print(f"{libraries} is not importable ({error}) but ISOQUANT_REQUIRE_REFERENCES=1: failing",
              file=sys.stderr)
        return MISSING_REQUIRED
    print(f"{libraries} is not importable ({error}); skipping", file=sys.stderr)
    return SKIP


def write_figures(output_path, header, rows):
    os.makedirs(os.path.dirname(os.path.abspath(output_path)), exist_ok=True)
    with open(output_path, "w", newline="") as handle:
        writer = csv.writer(handle)
        writer.writerow(header)
        writer.writerows(rows)


def figure_putter(rows, np):
    """For (dataset, form), a function put(quantity, values) that appends one figure line per value
    (dataset, form, quantity, index, value) to `rows`."""
    def putter(dataset, form):
        def put(quantity, values):
            for index, value in enumerate(np.atleast_1d(values)):
                rows.append((dataset, form, quantity, index, repr(float(value))))
        return put
    return putter
