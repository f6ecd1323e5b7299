#!/usr/bin/python3
"""Recomputes PRODCOSTFIT's cost functions of the rice-farm panel with statsmodels OLS.

Usage: /usr/bin/python3 cost_check.py DATA_DIR OUTPUT_CSV

Data: rice_farms_panel.csv (Feng and Horrace 2012, as in plm 2.6 RiceFarms; tests/data/README.md),
1026 rows: cost C = pseed*seed + purea*urea + wage*totlabor, output y = goutput, prices
w = (pseed, purea, wage), the last (wage) the numeraire.
Cobb-Douglas cost, homogeneous of degree one in prices: OLS of ln(C/w3) on 1, ln y, ln(w1/w3),
ln(w2/w3). Translog cost: the same plus (ln y)^2/2, the halved squares and the cross product of the
normalised log prices, and each normalised log price times ln y. The full form's parameters are
linear combinations of the regression's, taken with statsmodels' t_test (R b = q), so the
implied last price coefficient 1 - b1 - b2 and the implied second-order terms get their standard
errors and p-values from statsmodels itself, classical and with HC1 and HC3 covariance.
Also: R^2 of ln C (1 - SSR/TSS of ln C), the overall F, log-likelihood, AIC, BIC, the cost
elasticity at the sample means of the logs (t_test), the F of elasticity = 1 (f_test), the
efficient scale of the translog (where the elasticity is 1 at the mean log prices) with its
delta-method standard error, and the smearing factor mean(exp(residual)).

Bounds from the table's covariance block (PRODCOST's statistic, PRODCOSTFIT's covariance TRUE): at
the rows POINTS of the data (y and w of each), the standard errors of total, average and marginal
cost (log scale: q·√(gᵀVg), g the gradient of ln q), of the cost elasticity and of returns to
scale (√(gᵀVg), g the gradient of q), and the lower bound of total cost, q·exp(−t·s) with scipy's
t quantile on the fit's degrees of freedom — V the statsmodels covariance of the full form's
parameters (R V_b Rᵀ), g by the complex step in numpy (reference_script.complex_step_standard_error:
no difference is taken, so g is exact to rounding, far inside the 1e-7 of the check).

Writes one figure per line: dataset,form,quantity,index,value. Exits with 77 (the CTest skip code)
when statsmodels cannot be imported, leaving no OUTPUT_CSV behind.
"""

import csv
import os
import sys

import reference_script  # this folder: command line, skip code, writing the figures

PRICES = ["pseed", "purea", "wage"]
QUANTITIES = ["seed", "urea", "totlabor"]
FORMS = [("cobb-douglas", "nonrobust"), ("cobb-douglas", "HC1"), ("translog", "nonrobust"), ("translog", "HC3")]


def read_data(data_dir, np):
    with open(os.path.join(data_dir, "rice_farms_panel.csv"), newline="") as handle:
        rows = list(csv.DictReader(handle))
    prices = np.array([[float(row[p]) for p in PRICES] for row in rows])
    quantities = np.array([[float(row[q]) for q in QUANTITIES] for row in rows])
    output = np.array([float(row["goutput"]) for row in rows])
    return (prices * quantities).sum(axis=1), output, prices


def regression(np, form, log_output, relative):
    """Design columns and, per full parameter, (coefficient row R, constant c): theta = R b + c."""
    k = relative.shape[1] + 1
    columns = [np.ones_like(log_output), log_output] + [relative[:, i] for i in range(k - 1)]
    if form == "translog":
        columns.append(log_output ** 2 / 2)
        reduced_pairs = [(i, j) for i in range(k - 1) for j in range(i, k - 1)]
        for i, j in reduced_pairs:
            columns.append(relative[:, i] * relative[:, j] * (0.5 if i == j else 1.0))
        columns += [relative[:, i] * log_output for i in range(k - 1)]
    p = len(columns)

    def unit(*indices_and_signs):
        row = np.zeros(p)
        for index, sign in indices_and_signs:
            row[index] += sign
        return row

    theta = [(unit((0, 1)), 0.0), (unit((1, 1)), 0.0)]
    theta += [(unit((2 + i, 1)), 0.0) for i in range(k - 1)]
    theta.append((unit(*[(2 + i, -1) for i in range(k - 1)]), 1.0))  # Σ βᵢ = 1
    if form == "translog":
        yy = 2 + (k - 1)
        theta.append((unit((yy, 1)), 0.0))
        pair_column = {pair: yy + 1 + n for n, pair in enumerate(reduced_pairs)}

        def beta(i, j):  # βᵢⱼ of the reduced form, i, j < k - 1 + 1
            return pair_column[(min(i, j), max(i, j))]

        for i in range(k):
            for j in range(i, k):
                if j < k - 1:
                    theta.append((unit((beta(i, j), 1)), 0.0))
                elif i < k - 1:  # row sums zero
                    theta.append((unit(*[(beta(i, m), -1) for m in range(k - 1)]), 0.0))
                else:
                    theta.append((unit(*[(beta(a, b), 1) for a in range(k - 1) for b in range(k - 1)]), 0.0))
        first = yy + 1 + len(reduced_pairs)
        theta += [(unit((first + i, 1)), 0.0) for i in range(k - 1)]
        theta.append((unit(*[(first + i, -1) for i in range(k - 1)]), 0.0))
    return np.column_stack(columns), theta


def figures(np, sm, put, form, cov_type, cost, output, prices):
    name = form if cov_type == "nonrobust" else form + "_" + cov_type.lower()
    log_output, log_prices = np.log(output), np.log(prices)
    relative = log_prices[:, :-1] - log_prices[:, -1:]
    response = np.log(cost) - log_prices[:, -1]
    design, theta = regression(np, form, log_output, relative)
    fit = sm.OLS(response, design).fit(cov_type=cov_type, use_t=True)  # t(n − p) for every kind, as the core
    rows = np.array([row for row, _ in theta])
    full = rows @ fit.params + np.array([constant for _, constant in theta])
    bound_figures(np, lambda q, v, i: put(name, q, v, i), form, full, rows @ fit.cov_params() @ rows.T,
                  fit.df_resid, output, prices)
    for index, (row, constant) in enumerate(theta):
        test = fit.t_test((row.reshape(1, -1), np.array([-constant])))
        put(name, "params", float(row @ fit.params) + constant, index)
        put(name, "bse", float(np.squeeze(test.sd)), index)
        put(name, "pvalues", float(np.squeeze(test.pvalue)), index)
    log_cost = np.log(cost)
    put(name, "rsquared", 1.0 - fit.ssr / float(((log_cost - log_cost.mean()) ** 2).sum()))
    put(name, "fvalue", float(np.squeeze(fit.fvalue)))
    put(name, "llf", fit.llf)
    put(name, "aic", fit.aic)
    put(name, "bic", fit.bic)
    put(name, "smearing", float(np.exp(fit.resid).mean()))
    # the cost elasticity at the mean logs, in the regression's coefficients
    elasticity_figures(np, lambda q, v: put(name, q, v), fit, form, log_output, relative, design.shape[1])


def elasticity_figures(np, put, fit, form, log_output, relative, form_columns, covariance=None):
    """The cost elasticity gᵀb at the mean logs (g: 1 at ln y; for the translog the mean ln y at
    (ln y)²/2 and the mean normalised log prices at the last k − 1 of the form's `form_columns`
    columns, the ln w̃ᵢ·ln y terms) with its standard error and test of 1, and for the translog the
    efficient scale (where the elasticity is 1 at the mean log prices; only where it rises with
    output, else its absence) with its delta-method standard error; `covariance` in place of the
    fit's own (cost_panel_check.py's cluster factor)."""
    k = relative.shape[1] + 1
    gradient = np.zeros(len(fit.params))
    gradient[1] = 1.0
    if form == "translog":
        gradient[2 + (k - 1)] = log_output.mean()
        gradient[form_columns - (k - 1):form_columns] = relative.mean(axis=0)
    elasticity = fit.t_test(gradient.reshape(1, -1), cov_p=covariance)
    put("elasticity", float(np.squeeze(elasticity.effect)))
    put("elasticity_se", float(np.squeeze(elasticity.sd)))
    unit_test = fit.f_test((gradient.reshape(1, -1), np.array([1.0])), cov_p=covariance)
    put("unit_fvalue", float(np.squeeze(unit_test.fvalue)))
    put("unit_pvalue", float(np.squeeze(unit_test.pvalue)))
    if form != "translog":
        return
    curvature = fit.params[2 + (k - 1)]
    put("efficient_scale_exists", 1.0 if curvature > 0 else 0.0)  # else average cost has no minimum
    if curvature <= 0:
        return
    rest = gradient.copy()
    rest[2 + (k - 1)] = 0.0
    log_scale = (1.0 - rest @ fit.params) / curvature
    delta = -rest / curvature
    delta[2 + (k - 1)] = -log_scale / curvature
    used = fit.cov_params() if covariance is None else covariance
    put("efficient_scale", float(np.exp(log_scale)))
    put("efficient_scale_se", float(np.exp(log_scale) * np.sqrt(delta @ used @ delta)))


POINTS = [0, 100, 500]


def log_cost(np, theta, form, k, y, w):
    """ln C of the full form at (y, w), θ in table order (constant, output, prices, then for the
    translog output*output, the pairs i <= j, i*output), and the cost elasticity."""
    ly, lw = np.log(y), np.log(w)
    value = theta[0] + theta[1] * ly + theta[2:2 + k] @ lw
    elasticity = theta[1]
    if form == "translog":
        value += 0.5 * theta[2 + k] * ly * ly
        at = 3 + k
        for i in range(k):
            for j in range(i, k):
                value += (0.5 if i == j else 1.0) * theta[at] * lw[i] * lw[j]
                at += 1
        value += ly * (theta[at:at + k] @ lw)
        elasticity = theta[1] + theta[2 + k] * ly + theta[at:at + k] @ lw
    return value, elasticity


def bound_figures(np, put, form, theta, covariance, df, output, prices):
    from scipy import stats
    k = prices.shape[1]
    critical = stats.t.ppf(0.975, df)
    quantities = {  # name -> (q(θ), log scale)
        "total": (lambda t, y, w: np.exp(log_cost(np, t, form, k, y, w)[0]), True),
        "average": (lambda t, y, w: np.exp(log_cost(np, t, form, k, y, w)[0]) / y, True),
        "marginal": (lambda t, y, w: log_cost(np, t, form, k, y, w)[1] * np.exp(log_cost(np, t, form, k, y, w)[0]) / y,
                     True),
        "cost elasticity": (lambda t, y, w: log_cost(np, t, form, k, y, w)[1], False),
        "returns to scale": (lambda t, y, w: 1.0 / log_cost(np, t, form, k, y, w)[1], False),
    }
    for index, row in enumerate(POINTS):
        y, w = output[row], prices[row]
        for name, (quantity, log_scale) in quantities.items():
            value = quantity(theta, y, w)
            on_scale = (lambda t: np.log(quantity(t, y, w))) if log_scale else (lambda t: quantity(t, y, w))
            spread = reference_script.complex_step_standard_error(np, on_scale, theta, covariance)
            put("bound_se_" + name, value * spread if log_scale else spread, index)
            if name == "total":
                put("bound_lower_total", value * np.exp(-critical * spread), index)


def main():
    data_dir, output_path = reference_script.paths(__doc__)
    try:
        import numpy as np
        import statsmodels
        import statsmodels.api as sm
    except ImportError as error:
        return reference_script.skipped("statsmodels", error)
    cost, output, prices = read_data(data_dir, np)
    rows = []

    def put(form, quantity, value, index=0):
        rows.append(["rice_farms", form, quantity, index, repr(float(value))])

    for form, cov_type in FORMS:
        figures(np, sm, put, form, cov_type, cost, output, prices)
    reference_script.write_figures(output_path, ["dataset", "form", "quantity", "index", "value"], rows)
    print(f"statsmodels {statsmodels.__version__}: {len(rows)} cost-function figures written to {output_path}")
    return 0


if __name__ == "__main__":
    sys.exit(main())
