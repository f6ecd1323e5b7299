#!/usr/bin/python3
"""Recomputes the Cobb-Douglas fits of the reference data sets with statsmodels OLS.

Usage: /usr/bin/python3 statsmodels_check.py DATA_DIR OUTPUT_CSV

Fits, on tests/data/cobb_douglas_1928.csv and tests/data/us_states_produc_1970_1986.csv, the same
models as the core (unrestricted ln Y on ln x and controls; constant returns as ln(Y/x_k) on
ln(x_i/x_k) and controls) with classical, HC1 and HC3 covariance; and, on the state panel and
tests/data/rice_farms_panel.csv, the panel models (fixed effects, two-way effects, a trend, errors
clustered by group) as regressions with one dummy per group and period; under effects the
cluster covariance is statsmodels' CR1 of that regression times (n - k - G)/(n - k - 1), the
factor that leaves out the group effects nested in the clusters (README, "Estimation options").
The overall F is statsmodels' f_test of the inputs, controls and trend, the effects kept. Two
subsets of the state panel: 1970 and 1971 only (T = 2), and Alabama reduced to its 1986 row (a
group of one row). Writes the figures to
OUTPUT_CSV, one per line: dataset,model,covariance,level,quantity,index,value. "regression" figures
are those of the regression actually run; "production" figures are mapped back to
(ln A, exponents, control coefficients), as the core reports them.

Run it with Debian's /usr/bin/python3 (python3-statsmodels imports only there). Exits with 77 (the
CTest skip code) when statsmodels cannot be imported, leaving no OUTPUT_CSV behind.
"""

import csv
import os
import sys

import reference_script  # this folder: command line, skip code, writing the figures
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


# Panel models, fitted with one dummy per group (and per period after the first under two-way
# effects) by statsmodels OLS: dataset -> (file, output, inputs, controls, group column, period
# column), and the models run on it: name -> (group dummies, period dummies, trend, covariances,
# rows kept: None for all, else a test of (group, period)). The C++ check leaves out the same rows.
PANEL_DATASETS = {
    "state_panel": ("us_states_produc_1970_1986.csv", "gsp", ["pcap", "pc", "emp"], ["unemp"], "state", "year"),
    "rice_farms": ("rice_farms_panel.csv", "goutput", ["seed", "urea", "totlabor", "size"], [], "id", None),
}
PANEL_MODELS = {
    "state_panel": {
        "pooled": (False, False, False, ["classical", "hc1", "cluster"], None),
        "fixed": (True, False, False, ["classical", "hc1", "hc3", "cluster"], None),
        "fixed_trend": (True, False, True, ["classical", "hc1", "cluster"], None),
        "pooled_trend": (False, False, True, ["classical", "hc1", "cluster"], None),
        "two_way": (True, True, False, ["classical", "hc1", "cluster"], None),
        "fixed_two_years": (True, False, False, ["classical", "cluster"], lambda group, year: year <= 1971),
        "fixed_singleton": (True, False, False, ["hc1", "cluster"],
                            lambda group, year: group != "ALABAMA" or year == 1986),
    },
    "rice_farms": {
        "pooled": (False, False, False, ["cluster"], None),
        "fixed": (True, False, False, ["classical", "hc1", "cluster"], None),
    },
}


def read_texts(path, name):
    with open(path, newline="") as handle:
        return [row[name] for row in csv.DictReader(handle)]


def first_appearance(labels):
    """Index of every row's label in order of first appearance, as the core numbers groups."""
    order = {}
    for label in labels:
        order.setdefault(label, len(order))
    return [order[label] for label in labels], len(order)


def panel_figures(np, sm, columns, groups, periods, output, inputs, controls, group_dummies, period_dummies,
                  trend, covariance):
    """Figures of the dummy-variable regression, mapped to what the core reports: production
    parameters (ln A as the mean group effect under effects, without standard errors), fit
    statistics, the test of returns to scale, the trend, the group effects, the within R² and the
    smearing factor."""
    y = np.log(np.array(columns[output]))
    regressors = [np.log(np.array(columns[name])) for name in inputs] + [np.array(columns[name]) for name in controls]
    group_index, group_count = first_appearance(groups)
    group_index = np.array(group_index)
    if trend:
        year = np.array(periods, dtype=float)
        regressors.append(year - year.min())
    k, slopes = len(inputs), len(regressors)
    dummies = []
    if group_dummies:
        dummies += [(group_index == g).astype(float) for g in range(1, group_count)]
    if period_dummies:
        values = sorted(set(periods))
        dummies += [(np.array(periods) == value).astype(float) for value in values[1:]]
    design = np.column_stack([np.ones(len(y))] + regressors + dummies)
    if covariance == "cluster":
        fit = sm.OLS(y, design).fit(cov_type="cluster", cov_kwds={"groups": group_index}, use_t=True)
    else:
        fit = sm.OLS(y, design).fit(cov_type=COVARIANCES[covariance], use_t=True)
    # statsmodels' CR1 factor G/(G-1)(n-1)/(n-p) counts the G - 1 group dummies in p; nested in
    # the clusters, they are left out: times (n - p)/(n - p + G - 1), the period dummies kept.
    covariance_used = None
    if covariance == "cluster" and group_dummies:
        covariance_used = fit.cov_params() * (fit.df_resid / (fit.df_resid + group_count - 1))
    alpha = 1.0 - LEVEL
    out = []

    def put(quantity, values, first=0):
        for index, value in enumerate(np.atleast_1d(values)):
            out.append(("production", quantity, first + index, float(value)))

    def selector(columns):
        rows = np.zeros((len(columns), len(fit.params)))
        for row, column in enumerate(columns):
            rows[row, column] = 1.0
        return rows

    every = fit.t_test((np.eye(len(fit.params)), np.zeros(len(fit.params))), cov_p=covariance_used)
    bse, pvalues = every.sd, every.pvalue
    bounds = every.conf_int(alpha=alpha)
    slope = slice(1, 1 + k + len(controls))
    if group_dummies:
        # α_1 is the constant, α_g = constant + dummy g; ln A is their mean.
        first_period_dummy = 1 + slopes + group_count - 1
        effects = fit.params[0] + np.concatenate([[0.0], fit.params[1 + slopes:first_period_dummy]])
        put("params", effects.mean())
        put("group_effect", effects)
        demeaned = y - np.array([y[group_index == g].mean() for g in range(group_count)])[group_index]
        put("within_rsquared", 1.0 - fit.ssr / float(np.sum(demeaned ** 2)))
    else:
        put("params", fit.params[0])
        put("bse", bse[0])
        put("pvalues", pvalues[0])
        put("low", bounds[0, 0])
        put("high", bounds[0, 1])
    put("params", fit.params[slope], 1)
    put("bse", bse[slope], 1)
    put("pvalues", pvalues[slope], 1)
    put("low", bounds[slope, 0], 1)
    put("high", bounds[slope, 1], 1)
    if trend:
        put("trend", fit.params[slopes])
        put("trend_se", bse[slopes])
        put("trend_pvalue", pvalues[slopes])
    # F (slopes = 0): the inputs, controls and trend, not the group or period dummies.
    overall = fit.f_test(selector(range(1, 1 + slopes)), cov_p=covariance_used)
    put("fvalue", np.squeeze(overall.fvalue))
    put("f_pvalue", np.squeeze(overall.pvalue))
    put("rsquared", fit.rsquared)
    put("rsquared_adj", fit.rsquared_adj)
    put("ssr", fit.ssr)
    put("llf", fit.llf)
    put("aic", fit.aic)
    put("bic", fit.bic)
    # Duan's smearing factor, with numpy: the mean of exp(residual).
    put("smearing", np.mean(np.exp(fit.resid)))
    restriction = np.zeros((1, len(fit.params)))
    restriction[0, 1:1 + k] = 1.0
    nu = fit.t_test((restriction, np.zeros(1)), cov_p=covariance_used)
    wald = fit.f_test((restriction, np.ones(1)), cov_p=covariance_used)
    put("nu", np.squeeze(nu.effect))
    put("nu_se", np.squeeze(nu.sd))
    put("nu_fvalue", np.squeeze(wald.fvalue))
    put("nu_pvalue", np.squeeze(wald.pvalue))
    return out


def main():
    data_dir, output_path = reference_script.paths(__doc__)
    try:
        import numpy as np
        import statsmodels
        import statsmodels.api as sm
    except ImportError as error:
        return reference_script.skipped("statsmodels", error)

    rows = []
    for dataset, (file, output, inputs, controls) in DATASETS.items():
        columns = read_columns(os.path.join(data_dir, file), [output] + inputs + controls)
        for model, constant_returns in (("unrestricted", False), ("constant_returns", True)):
            for name, covariance in COVARIANCES.items():
                for level, quantity, index, value in figures(np, sm, columns, output, inputs, controls,
                                                             constant_returns, covariance):
                    rows.append((dataset, model, name, level, quantity, index, repr(value)))

    for dataset, (file, output, inputs, controls, group_column, period_column) in PANEL_DATASETS.items():
        path = os.path.join(data_dir, file)
        all_columns = read_columns(path, [output] + inputs + controls)
        all_groups = read_texts(path, group_column)
        all_periods = [float(value) for value in read_texts(path, period_column)] if period_column else None
        for model, (group_dummies, period_dummies, trend, covariances, keep) in PANEL_MODELS[dataset].items():
            kept = [i for i in range(len(all_groups)) if keep is None or keep(all_groups[i], all_periods[i])]
            columns = {name: [values[i] for i in kept] for name, values in all_columns.items()}
            groups = [all_groups[i] for i in kept]
            periods = [all_periods[i] for i in kept] if all_periods else None
            for name in covariances:
                for level, quantity, index, value in panel_figures(np, sm, columns, groups, periods, output, inputs,
                                                                   controls, group_dummies, period_dummies, trend,
                                                                   name):
                    rows.append((dataset, model, name, level, quantity, index, repr(value)))

    reference_script.write_figures(
        output_path, ["dataset", "model", "covariance", "level", "quantity", "index", "value"], rows)
    print(f"statsmodels {statsmodels.__version__}: {len(rows)} figures written to {output_path}")
    return 0


if __name__ == "__main__":
    sys.exit(main())
