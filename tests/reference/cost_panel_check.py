#!/usr/bin/python3
"""Recomputes PRODCOSTFIT's cost functions with controls, groups, effects, a trend and cluster
errors on the rice-farm panel, with statsmodels OLS of the dummy-variable regression.

Usage: /usr/bin/python3 cost_panel_check.py DATA_DIR OUTPUT_CSV

Data: rice_farms_panel.csv (Feng and Horrace 2012, as in plm 2.6 RiceFarms; tests/data/README.md),
1026 rows, 171 farms of 6 rows each: cost, output and prices as in cost_check.py (pseed, purea,
wage; wage the numeraire); groups = id; periods = each farm's seasons 1 to 6 in the file's order
(as numpy_growth_check.py); control = size (hectares, entered as it is, not logged).
Each model is the homogeneity-normalised regression of cost_check.py with the control, the trend
(season − 1) and one dummy per farm after the first (effects) and per season after the first
(two-way) appended, fitted by statsmodels OLS. The core's figures map onto it as for PRODFIT
(statsmodels_check.py): under effects the constant is the mean of the farm effects (no standard
error), and the cluster covariance is statsmodels' CR1 times (n − p)/(n − p + G − 1), leaving out
the farm dummies nested in the clusters. Figures: every parameter of the full form (implied ones
through t_test), the control, the trend, R² and adjusted R² of ln C, the within R², F (slopes =
0: form terms, control and trend, the dummies kept), log-likelihood, AIC, BIC, the cost elasticity
at the mean logs with its test of 1, the translog's efficient scale (where the cost elasticity rises
with output, else its absence) and the smearing factor.

Writes one figure per line: dataset,form,quantity,index,value. Exits with 77 (the CTest skip code)
when statsmodels cannot be imported, leaving no OUTPUT_CSV behind.
"""

import csv
import os
import sys
import types

import cost_check  # this folder: the data and the normalised regression
import reference_script  # this folder: command line, skip code, writing the figures

# name -> (form, control, groups, effects, trend, covariance)
MODELS = {
    "cd_control": ("cobb-douglas", True, False, "none", False, "classical"),
    "cd_pooled_cluster": ("cobb-douglas", False, True, "none", False, "cluster"),
    "cd_fixed": ("cobb-douglas", False, True, "fixed", False, "classical"),
    "cd_fixed_cluster": ("cobb-douglas", True, True, "fixed", False, "cluster"),
    "cd_fixed_trend_hc1": ("cobb-douglas", False, True, "fixed", True, "hc1"),
    "cd_two_way": ("cobb-douglas", False, True, "two-way", False, "classical"),
    "translog_fixed_cluster": ("translog", False, True, "fixed", False, "cluster"),
    "translog_trend_control": ("translog", True, False, "none", True, "classical"),
}
COV_TYPES = {"classical": "nonrobust", "hc1": "HC1", "hc3": "HC3"}


def read_panel(data_dir, np):
    with open(os.path.join(data_dir, "rice_farms_panel.csv"), newline="") as handle:
        rows = list(csv.DictReader(handle))
    farms, seasons, seen = [], [], {}
    for row in rows:
        farm = seen.setdefault(row["id"], len(seen))  # numbered in order of first appearance
        farms.append(farm)
        seasons.append(sum(1 for earlier in farms[:-1] if earlier == farm) + 1)
    size = np.array([float(row["size"]) for row in rows])
    return np.array(farms), np.array(seasons, dtype=float), size


def rice_farm_opening(doc):
    """The opening of the cost-bounds scripts' main(): the command line (doc is the script's
    usage), numpy and statsmodels (else the skip code, an int), the rice-farm cost data and panel,
    and an empty list of figure rows with its model_putter."""
    data_dir, output_path = reference_script.paths(doc)
    libraries = reference_script.numpy_and_statsmodels()
    if isinstance(libraries, int):
        return libraries
    np, statsmodels, sm = libraries
    rows = []
    return types.SimpleNamespace(output_path=output_path, np=np, statsmodels=statsmodels, sm=sm,
                                 data=cost_check.read_data(data_dir, np), panel=read_panel(data_dir, np),
                                 rows=rows, putter=reference_script.model_putter(rows, "rice_farms"))


def model_fit(np, sm, spec, data, panel):
    """The statsmodels fit, the covariance to use, θ's rows (R, c) over the extended design, and the
    positions of the trend and of the last slope column."""
    form, control, groups, effects, trend, covariance = spec
    cost, output, prices = data
    farms, seasons, size = panel
    log_output, log_prices = np.log(output), np.log(prices)
    relative = log_prices[:, :-1] - log_prices[:, -1:]
    response = np.log(cost) - log_prices[:, -1]
    base, theta = cost_check.regression(np, form, log_output, relative)
    columns = [base] + ([size[:, None]] if control else []) + ([(seasons - 1.0)[:, None]] if trend else [])
    slopes = sum(c.shape[1] for c in columns) - 1  # everything after the constant but the dummies
    group_count = farms.max() + 1
    if effects != "none":
        columns.append(np.column_stack([(farms == g).astype(float) for g in range(1, group_count)]))
    if effects == "two-way":
        columns.append(np.column_stack([(seasons == s).astype(float) for s in range(2, 7)]))
    design = np.column_stack(columns)
    width = design.shape[1]
    rows = [(np.concatenate([row, np.zeros(width - len(row))]), constant) for row, constant in theta]
    if control:
        unit = np.zeros(width)
        unit[base.shape[1]] = 1.0
        rows.append((unit, 0.0))
    if covariance == "cluster":
        fit = sm.OLS(response, design).fit(cov_type="cluster", cov_kwds={"groups": farms}, use_t=True)
    else:
        fit = sm.OLS(response, design).fit(cov_type=COV_TYPES[covariance], use_t=True)
    used = None
    if covariance == "cluster" and effects != "none":
        used = fit.cov_params() * (fit.df_resid / (fit.df_resid + group_count - 1))
    trend_column = base.shape[1] + (1 if control else 0) if trend else None
    return fit, used, rows, trend_column, slopes, base.shape[1]


def figures(np, sm, put, name, spec, data, panel):
    form, control, groups, effects, trend, covariance = spec
    fit, used, rows, trend_column, slopes, base_width = model_fit(np, sm, spec, data, panel)
    cost, output, prices = data
    farms = panel[0]
    for index, (row, constant) in enumerate(rows):
        test = fit.t_test((row.reshape(1, -1), np.array([-constant])), cov_p=used)
        if index == 0 and effects != "none":  # the mean farm effect: constant + mean of the dummies
            dummies = fit.params[1 + slopes:1 + slopes + farms.max()]
            put(name, "params", fit.params[0] + dummies.sum() / (farms.max() + 1), 0)
            continue
        put(name, "params", float(row @ fit.params) + constant, index)
        put(name, "bse", float(np.squeeze(test.sd)), index)
        put(name, "pvalues", float(np.squeeze(test.pvalue)), index)
    if trend_column is not None:
        test = fit.t_test(np.eye(len(fit.params))[trend_column:trend_column + 1], cov_p=used)
        put(name, "trend", fit.params[trend_column])
        put(name, "trend_se", float(np.squeeze(test.sd)))
        put(name, "trend_pvalue", float(np.squeeze(test.pvalue)))
    log_cost = np.log(cost)
    rsquared = 1.0 - fit.ssr / float(((log_cost - log_cost.mean()) ** 2).sum())
    put(name, "rsquared", rsquared)
    put(name, "rsquared_adj", 1.0 - (1.0 - rsquared) * (fit.nobs - 1) / fit.df_resid)
    if effects != "none":
        response = fit.model.endog
        means = np.array([response[farms == g].mean() for g in range(farms.max() + 1)])
        put(name, "within_rsquared", 1.0 - fit.ssr / float(((response - means[farms]) ** 2).sum()))
    overall = fit.f_test(np.eye(len(fit.params))[1:1 + slopes], cov_p=used)
    put(name, "fvalue", float(np.squeeze(overall.fvalue)))
    put(name, "llf", fit.llf)
    put(name, "aic", fit.aic)
    put(name, "bic", fit.bic)
    put(name, "smearing", float(np.exp(fit.resid).mean()))
    relative = np.log(prices[:, :-1]) - np.log(prices[:, -1:])
    cost_check.elasticity_figures(np, lambda q, v: put(name, q, v), fit, form, np.log(output), relative, base_width,
                                  used)


def main():
    data_dir, output_path = reference_script.paths(__doc__)
    try:
        import numpy as np
        import statsmodels
        import statsmodels.api as sm
    except ImportError as error:
        return reference_script.skipped("statsmodels", error)
    data = cost_check.read_data(data_dir, np)
    panel = read_panel(data_dir, np)
    rows = []

    def put(model, quantity, value, index=0):
        rows.append(["rice_farms", model, quantity, index, repr(float(value))])

    for name, spec in MODELS.items():
        figures(np, sm, put, name, spec, data, panel)
    reference_script.write_figures(output_path, ["dataset", "form", "quantity", "index", "value"], rows)
    print(f"statsmodels {statsmodels.__version__}: {len(rows)} cost-panel figures written to {output_path}")
    return 0


if __name__ == "__main__":
    sys.exit(main())
