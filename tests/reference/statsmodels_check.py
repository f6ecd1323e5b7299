#!/usr/bin/python3
"""Recomputes the Cobb-Douglas fits of the reference data sets with statsmodels OLS.

Usage: /usr/bin/python3 statsmodels_check.py DATA_DIR OUTPUT_CSV

Fits, on tests/data/cobb_douglas_1928.csv and tests/data/us_states_produc_1970_1986.csv, the same
models as the core (unrestricted ln Y on ln x and controls; constant returns as ln(Y/x_k) on
ln(x_i/x_k) and controls) with classical, HC1 and HC3 covariance, and writes the figures to
OUTPUT_CSV, one per line: dataset,model,covariance,level,quantity,index,value. "regression" figures
are those of the regression actually run; "production" figures are mapped back to
(ln A, exponents, control coefficients), as the core reports them.

Run it with Debian's /usr/bin/python3 (python3-statsmodels imports only there). Exits with 77 (the
CTest skip code) when statsmodels cannot be imported, leaving no OUTPUT_CSV behind.
"""

import csv
import os
import sys

SKIP = 77
LEVEL = 0.95

DATASETS = {
    "cobb_douglas_1928": ("cobb_douglas_1928.csv", "P", ["L", "C"], []),
    "state_panel": ("us_states_produc_1970_1986.csv", "gsp", ["pcap", "pc", "emp"], ["unemp"]),
}
COVARIANCES = {"classical": "nonrobust", "hc1": "HC1", "hc3": "HC3"}


def read_columns(path, names):
    with open(path, newline="") as handle:
        rows = list(csv.DictReader(handle))
    return {name: [float(row[name]) for row in rows] for name in names}


def designs(np, columns, output, inputs, controls, constant_returns):
    """Design, response and the map β = T·θ + o back to (ln A, exponents, controls)."""
    log_inputs = [np.log(np.array(columns[name])) for name in inputs]
    z = [np.array(columns[name]) for name in controls]
    y = np.log(np.array(columns[output]))
    k, m = len(inputs), len(controls)
    slopes = k - 1 if constant_returns else k
    if constant_returns:
        y = y - log_inputs[-1]
        regressors = [x - log_inputs[-1] for x in log_inputs[:-1]]
    else:
        regressors = log_inputs
    design = np.column_stack([np.ones(len(y))] + regressors + z)
    transform = np.zeros((1 + k + m, 1 + slopes + m))
    offset = np.zeros(1 + k + m)
    transform[0, 0] = 1.0
    for i in range(slopes):
        transform[1 + i, 1 + i] = 1.0
    if constant_returns:
        transform[k, 1:k] = -1.0
        offset[k] = 1.0
    for j in range(m):
        transform[1 + k + j, 1 + slopes + j] = 1.0
    return design, y, transform, offset, np.log(np.array(columns[output]))


def figures(np, sm, columns, output, inputs, controls, constant_returns, covariance):
    design, y, transform, offset, log_output = designs(np, columns, output, inputs, controls, constant_returns)
    fit = sm.OLS(y, design).fit(cov_type=covariance, use_t=True)
    alpha = 1.0 - LEVEL
    out = []

    def put(level, quantity, values):
        for index, value in enumerate(np.atleast_1d(values)):
            out.append((level, quantity, index, float(value)))

    bounds = fit.conf_int(alpha=alpha)
    put("regression", "params", fit.params)
    put("regression", "bse", fit.bse)
    put("regression", "pvalues", fit.pvalues)
    put("regression", "low", bounds[:, 0])
    put("regression", "high", bounds[:, 1])
    put("regression", "rsquared", fit.rsquared)
    put("regression", "rsquared_adj", fit.rsquared_adj)
    put("regression", "ssr", fit.ssr)
    put("regression", "fvalue", fit.fvalue)
    put("regression", "f_pvalue", fit.f_pvalue)
    put("regression", "llf", fit.llf)
    put("regression", "aic", fit.aic)
    put("regression", "bic", fit.bic)

    # Production parameters β = T·θ + o: a t test of T·θ = −o tests β = 0; its "effect" and
    # bounds are those of T·θ, so o is added back.
    production = fit.t_test((transform, -offset))
    production_bounds = production.conf_int(alpha=alpha)
    put("production", "params", production.effect + offset)
    put("production", "bse", production.sd)
    put("production", "tvalues", production.tvalue)
    put("production", "pvalues", production.pvalue)
    put("production", "low", production_bounds[:, 0] + offset)
    put("production", "high", production_bounds[:, 1] + offset)
    # R² of ln Y (not of ln(Y/x_k) when constant returns are imposed) and its adjusted form.
    rsquared = 1.0 - fit.ssr / float(np.sum((log_output - log_output.mean()) ** 2))
    put("production", "rsquared", rsquared)
    put("production", "rsquared_adj", 1.0 - (1.0 - rsquared) * (fit.nobs - 1) / fit.df_resid)

    k = len(inputs)
    sum_of_exponents = np.zeros((1, transform.shape[0]))
    sum_of_exponents[0, 1:1 + k] = 1.0
    nu = fit.t_test((sum_of_exponents @ transform, np.zeros(1)))
    put("production", "nu", float(np.squeeze(nu.effect)) + float(sum_of_exponents @ offset))
    if not constant_returns:
        put("production", "nu_se", np.squeeze(nu.sd))
        wald = fit.f_test((sum_of_exponents @ transform, np.ones(1)))
        put("production", "nu_fvalue", np.squeeze(wald.fvalue))
        put("production", "nu_pvalue", np.squeeze(wald.pvalue))
    return out


def main():
    if len(sys.argv) != 3:
        print(__doc__, file=sys.stderr)
        return 2
    data_dir, output_path = sys.argv[1], sys.argv[2]
    if os.path.exists(output_path):
        os.remove(output_path)  # never leave stale figures for the C++ check to read
    try:
        import numpy as np
        import statsmodels
        import statsmodels.api as sm
    except ImportError as error:
        print(f"statsmodels is not importable ({error}); skipping", file=sys.stderr)
        return SKIP

    rows = []
    for dataset, (file, output, inputs, controls) in DATASETS.items():
        columns = read_columns(os.path.join(data_dir, file), [output] + inputs + controls)
        for model, constant_returns in (("unrestricted", False), ("constant_returns", True)):
            for name, covariance in COVARIANCES.items():
                for level, quantity, index, value in figures(np, sm, columns, output, inputs, controls,
                                                             constant_returns, covariance):
                    rows.append((dataset, model, name, level, quantity, index, repr(value)))

    os.makedirs(os.path.dirname(os.path.abspath(output_path)), exist_ok=True)
    with open(output_path, "w", newline="") as handle:
        writer = csv.writer(handle)
        writer.writerow(["dataset", "model", "covariance", "level", "quantity", "index", "value"])
        writer.writerows(rows)
    print(f"statsmodels {statsmodels.__version__}: {len(rows)} figures written to {output_path}")
    return 0


if __name__ == "__main__":
    sys.exit(main())
