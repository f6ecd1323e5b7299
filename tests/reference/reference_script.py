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


def numpy_statsmodels_scipy_stats():
    """(numpy, statsmodels.api, scipy.stats), or, when one of them does not import, the exit code of
    `skipped` (an int) for main() to return."""
    try:
        import numpy
        import statsmodels.api
        from scipy import stats
    except ImportError as error:
        return skipped("numpy, scipy or statsmodels", error)
    return numpy, statsmodels.api, stats


def numpy_and_statsmodels():
    """(numpy, statsmodels, statsmodels.api), or, when one of them does not import, the exit code of
    `skipped` (an int) for main() to return."""
    try:
        import numpy
        import statsmodels
        import statsmodels.api
    except ImportError as error:
        return skipped("statsmodels", error)
    return numpy, statsmodels, statsmodels.api


def model_putter(rows, dataset):
    """putter(model) -> put(quantity, value, index=0), which appends the figure line
    (dataset, model, quantity, index, value) to `rows`."""
    def putter(model):
        def put(quantity, value, index=0):
            rows.append([dataset, model, quantity, index, repr(float(value))])
        return put
    return putter


def start(usage):
    """main()'s opening: (data folder, output path, numpy, statsmodels.api, scipy.stats), or the exit
    code (an int) for main() to return when a library is missing."""
    data_dir, output_path = paths(usage)
    libraries = numpy_statsmodels_scipy_stats()
    if isinstance(libraries, int):
        return libraries
    return (data_dir, output_path) + libraries


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


def cobb_douglas_1928_logs(data_dir, np):
    """ln P, ln L and ln C of Cobb & Douglas (1928), tests/data/cobb_douglas_1928.csv, as arrays."""
    with open(os.path.join(data_dir, "cobb_douglas_1928.csv"), newline="") as handle:
        rows = list(csv.DictReader(handle))
    return tuple(np.log([float(row[name]) for row in rows]) for name in ("P", "L", "C"))


def rice_farm_logs(data_dir, np, inputs):
    """ln goutput and the list of ln of each input column of the rice-farm panel
    (tests/data/rice_farms_panel.csv)."""
    with open(os.path.join(data_dir, "rice_farms_panel.csv"), newline="") as handle:
        rows = list(csv.DictReader(handle))
    return (np.log([float(row["goutput"]) for row in rows]),
            [np.log([float(row[name]) for row in rows]) for name in inputs])


def classical_and_hc1_fits(sm, y, design):
    """(errors word, statsmodels OLS result) for classical ("nonrobust") and HC1 errors, the latter
    with use_t: t(n - p) for every kind, as the core."""
    model = sm.OLS(y, design)
    return [("classical", model.fit()), ("hc1", model.fit(cov_type="HC1", use_t=True))]


def translog_1928_fits(data_dir, np, sm):
    """classical_and_hc1_fits of the translog on Cobb & Douglas (1928): ln P on a constant, ln L,
    ln C, (ln L)^2 / 2, ln L ln C and (ln C)^2 / 2 (the 1/2 convention, parameters in the order of
    the core's table)."""
    y, l1, l2 = cobb_douglas_1928_logs(data_dir, np)
    design = sm.add_constant(np.column_stack([l1, l2, 0.5 * l1 * l1, l1 * l2, 0.5 * l2 * l2]))
    return classical_and_hc1_fits(sm, y, design)


def fit_inference(np, stats, result, level):
    """(parameters, covariance, t quantile at `level` on the residual degrees of freedom, Duan's
    smearing factor mean(exp(residual))) of a statsmodels OLS result."""
    return (np.asarray(result.params), np.asarray(result.cov_params()),
            stats.t.ppf(0.5 + level / 2, result.df_resid), float(np.mean(np.exp(result.resid))))


def complex_jacobian(np, function, point, step=1e-20):
    """d function / d point by the complex step (as complex_step_standard_error below), function
    mapping a complex vector to a list."""
    columns = []
    for j in range(len(point)):
        stepped = np.asarray(point, dtype=complex)
        stepped[j] += step * 1j
        columns.append(np.imag(np.asarray(function(stepped), dtype=complex)) / step)
    return np.column_stack(columns)


def complex_step_standard_error(np, function, theta, cov, step=1e-20):
    """sqrt(g' cov g) with g the gradient of function at theta by the complex step,
    dq/dtheta_j = Im q(theta + i h e_j) / h (Squire and Trapp 1998, SIAM Review 40(1), 110-112):
    no difference is taken, so g is exact to rounding. function must accept complex parameters."""
    gradient = np.zeros(len(theta))
    for j in range(len(theta)):
        stepped = np.asarray(theta).astype(complex)
        stepped[j] += step * 1j
        gradient[j] = function(stepped).imag / step
    return float(np.sqrt(gradient @ cov @ gradient))
