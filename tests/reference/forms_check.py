#!/usr/bin/python3
"""Recomputes the CES and translog fits of the reference data sets with scipy and statsmodels.

Usage: /usr/bin/python3 forms_check.py DATA_DIR OUTPUT_CSV

CES, ln Y = ln A - (nu/rho) ln(delta x1^-rho + (1 - delta) x2^-rho), by scipy.optimize.least_squares
(trust-region reflective, an algorithm other than the core's Levenberg-Marquardt) with the
analytic Jacobian of that textbook formula, started from the Kmenta approximation; standard
errors s^2 (J'J)^-1 at the optimum, sigma = 1/(1 + rho) by the delta method.
Translog, ln Y = a0 + sum a_i ln x_i + 1/2 sum sum b_ij ln x_i ln x_j, by statsmodels OLS on the
regressors ln x_i, (ln x_i)^2 / 2 and ln x_i ln x_j (i < j); elasticities and returns to scale at
the sample means of the logs by t_test, nu = 1 and all b_ij = 0 by f_test; the same with HC1 and
HC3 covariance (forms "translog_hc1", "translog_hc3"; cluster errors are not offered for the
translog form). PRODCOMPARE's test of
Cobb-Douglas within CES: LR = n ln(RSS_cd / RSS_ces) with the statsmodels Cobb-Douglas fit, p-value
from scipy.stats.chi2(1).

Data near fixed proportions (rho = 50), invented here: for seeds 1 to RHO50_DATASETS of numpy's
default_rng, 40 rows with x1, x2 log-uniform on [1, 100] (independent), ln Y = 0.5 + 0.9 (b + H)
at delta = 0.4, rho = 50 and N(0, 0.025^2) noise, written out as figures (form "data": y, x1, x2
by row) together with the lowest sum of squares scipy.optimize.least_squares reaches from 28 starts
(rho in 0.5, 2, 8, 20, 50, 100, 200 times delta in 0.2, 0.4, 0.6, 0.8; ln A = 0.5, nu = 0.9), each
run by both "trf" and "lm" (form "search": best_rss). The CES is taken there in the stable form the
core uses too, ln Y = ln A + nu (ln x2 + H), H = -ln(delta e^(-rho d) + 1 - delta) / rho with
d = ln x1 - ln x2 and the log-sum-exp formed by numpy.logaddexp, in the coordinates (ln A,
logit delta, ln(1 + rho), nu), so that x^(-rho) neither overflows nor underflows for large rho.

Writes one figure per line: dataset,form,quantity,index,value. Run it with Debian's /usr/bin/python3
(python3-scipy and python3-statsmodels import only there). Exits with 77 (the CTest skip code)
when they cannot be imported, leaving no OUTPUT_CSV behind.
"""

import csv
import os
import sys

LEVEL = 0.95

# dataset: (file, output, CES inputs, translog inputs)
DATASETS = {
    "cobb_douglas_1928": ("cobb_douglas_1928.csv", "P", ["L", "C"], ["L", "C"]),
    "rice_farms": ("rice_farms_panel.csv", "goutput", ["size", "totlabor"], ["size", "totlabor", "seed", "urea"]),
}


def read_columns(path, names):
    with open(path, newline="") as handle:
        rows = list(csv.DictReader(handle))
    return {name: [float(row[name]) for row in rows] for name in names}


def likelihood_figures(np, put, form, rss, n, p, log_output):
    tss = float(np.sum((log_output - log_output.mean()) ** 2))
    llf = -n / 2.0 * (np.log(2 * np.pi) + np.log(rss / n) + 1.0)
    put(form, "rss", rss)
    put(form, "rsquared", 1.0 - rss / tss)
    put(form, "rsquared_adj", 1.0 - rss / tss * (n - 1) / (n - p))
    put(form, "llf", llf)
    put(form, "aic", -2 * llf + 2 * p)
    put(form, "bic", -2 * llf + p * np.log(n))


def comparison_figures(np, sm, chi2, put, y, x1, x2, ces_rss):
    """Cobb-Douglas nested in CES at rho = 0: LR = n ln(RSS_cd / RSS_ces) on chi-squared(1)."""
    ly = np.log(y)
    cobb_douglas = sm.OLS(ly, np.column_stack([np.ones_like(ly), np.log(x1), np.log(x2)])).fit()
    ratio = len(ly) * np.log(cobb_douglas.ssr / ces_rss)
    put("compare", "cd_llf", cobb_douglas.llf)
    put("compare", "lr", ratio)
    put("compare", "lr_pvalue", chi2.sf(ratio, 1))


def ces_figures(np, optimize, put, y, x1, x2):
    ly, l1, l2 = np.log(y), np.log(x1), np.log(x2)

    def predicted(theta):
        ln_a, delta, rho, nu = theta
        s = delta * x1 ** -rho + (1 - delta) * x2 ** -rho
        return ln_a - nu / rho * np.log(s)

    def jacobian(theta):  # of the residuals ly - predicted
        ln_a, delta, rho, nu = theta
        p1, p2 = x1 ** -rho, x2 ** -rho
        s = delta * p1 + (1 - delta) * p2
        d_delta = -nu / rho * (p1 - p2) / s
        d_rho = nu / rho ** 2 * np.log(s) + nu / rho * (delta * p1 * l1 + (1 - delta) * p2 * l2) / s
        d_nu = -np.log(s) / rho
        return -np.column_stack([np.ones_like(ly), d_delta, d_rho, d_nu])

    # Kmenta: ln Y = b0 + b1 ln x1 + b2 ln x2 + b3 (ln x1 - ln x2)^2
    design = np.column_stack([np.ones_like(ly), l1, l2, (l1 - l2) ** 2])
    b = np.linalg.lstsq(design, ly, rcond=None)[0]
    nu = b[1] + b[2]
    delta = b[1] / nu
    start = [b[0], delta, -2 * b[3] / (nu * delta * (1 - delta)), nu]
    fit = optimize.least_squares(lambda t: ly - predicted(t), start, jac=jacobian, method="trf", x_scale="jac",
                                 ftol=1e-15, xtol=1e-15, gtol=1e-15, max_nfev=20000)
    theta = fit.x
    residuals = ly - predicted(theta)
    n, p = len(ly), 4
    rss = float(residuals @ residuals)
    j = jacobian(theta)
    covariance = rss / (n - p) * np.linalg.inv(j.T @ j)
    se = np.sqrt(np.diag(covariance))
    put("ces", "params", theta)
    put("ces", "bse", se)
    put("ces", "tvalues", theta / se)
    put("ces", "sigma", 1 / (1 + theta[2]))
    put("ces", "sigma_se", se[2] / (1 + theta[2]) ** 2)
    put("ces", "nu_fvalue", ((theta[3] - 1) / se[3]) ** 2)
    likelihood_figures(np, put, "ces", rss, n, p, ly)
    return rss


RHO50_DATASETS = 12


def rho50_data(np, seed):
    """(y, x1, x2) of the invented data near fixed proportions (see the module's text)."""
    n, ln_a, delta, rho, nu, noise = 40, 0.5, 0.4, 50.0, 0.9, 0.025
    rng = np.random.default_rng(seed)
    x1 = np.exp(rng.uniform(0.0, np.log(100.0), n))
    x2 = np.exp(rng.uniform(0.0, np.log(100.0), n))
    ly = ln_a - nu / rho * np.log(delta * x1 ** -rho + (1 - delta) * x2 ** -rho) + rng.normal(0.0, noise, n)
    return np.exp(ly), x1, x2


def rho50_best_rss(np, optimize, y, x1, x2):
    """The lowest sum of squares least_squares reaches from the starts of the module's text."""
    ly, l2, d = np.log(y), np.log(x2), np.log(x1) - np.log(x2)

    def residuals(theta):
        ln_a, logit, log_rho, nu = theta
        delta, rho = 1 / (1 + np.exp(-logit)), np.expm1(log_rho)
        if abs(rho) < 1e-12:
            composite = delta * d
        else:
            composite = -np.logaddexp(np.log(delta) - rho * d, np.log1p(-delta)) / rho
        return ly - (ln_a + nu * (l2 + composite))

    best = np.inf
    for rho in (0.5, 2, 8, 20, 50, 100, 200):
        for delta in (0.2, 0.4, 0.6, 0.8):
            start = [0.5, np.log(delta / (1 - delta)), np.log1p(rho), 0.9]
            for method in ("trf", "lm"):
                with np.errstate(all="ignore"):
                    fit = optimize.least_squares(residuals, start, method=method, xtol=1e-15, ftol=1e-15,
                                                 gtol=1e-15, max_nfev=20000)
                rss = float(fit.fun @ fit.fun)
                if np.isfinite(rss):
                    best = min(best, rss)
    return best


def rho50_figures(np, optimize, rows):
    for seed in range(1, RHO50_DATASETS + 1):
        y, x1, x2 = rho50_data(np, seed)
        dataset = f"ces_rho50_seed{seed}"
        for name, column in (("y", y), ("x1", x1), ("x2", x2)):
            rows.extend((dataset, "data", name, i, repr(float(v))) for i, v in enumerate(column))
        rows.append((dataset, "search", "best_rss", 0, repr(rho50_best_rss(np, optimize, y, x1, x2))))


def translog_figures(np, sm, put, y, inputs, form="translog", covariance="nonrobust"):
    ly = np.log(y)
    logs = [np.log(x) for x in inputs]
    k = len(logs)
    pairs = [(i, j) for i in range(k) for j in range(i, k)]
    regressors = logs + [(0.5 if i == j else 1.0) * logs[i] * logs[j] for i, j in pairs]
    design = np.column_stack([np.ones_like(ly)] + regressors)
    fit = sm.OLS(ly, design).fit(cov_type=covariance, use_t=True)

    def out(quantity, values):
        put(form, quantity, values)

    p = design.shape[1]
    out("params", fit.params)
    out("bse", fit.bse)
    out("pvalues", fit.pvalues)
    out("fvalue", fit.fvalue)
    likelihood_figures(np, put, form, float(fit.ssr), len(ly), p, ly)
    out("statsmodels_llf", fit.llf)
    means = [float(np.mean(l)) for l in logs]
    gradients = np.zeros((k, p))
    for i in range(k):
        gradients[i, 1 + i] = 1.0
    for c, (i, j) in enumerate(pairs):
        gradients[i, 1 + k + c] += means[j]
        if i != j:
            gradients[j, 1 + k + c] += means[i]
    elasticities = fit.t_test((gradients, np.zeros(k)))
    out("elasticity", elasticities.effect)
    out("elasticity_se", elasticities.sd)
    out("elasticity_pvalue", elasticities.pvalue)
    total = gradients.sum(axis=0, keepdims=True)
    nu = fit.t_test((total, np.zeros(1)))
    out("nu", float(np.squeeze(nu.effect)))
    out("nu_se", float(np.squeeze(nu.sd)))
    wald = fit.f_test((total, np.ones(1)))
    out("nu_fvalue", float(np.squeeze(wald.fvalue)))
    out("nu_pvalue", float(np.squeeze(wald.pvalue)))
    interactions = np.zeros((len(pairs), p))
    interactions[:, 1 + k:] = np.eye(len(pairs))
    cd_test = fit.f_test((interactions, np.zeros(len(pairs))))
    out("cd_fvalue", float(np.squeeze(cd_test.fvalue)))
    out("cd_pvalue", float(np.squeeze(cd_test.pvalue)))


def main():
    # Imported here, not at the top: run as a script, reference_script.py sits beside this file on
    # the path; tests/integration/test_forms_in_calc.py imports this module for its figures alone.
    import reference_script  # command line, skip code, writing the figures

    data_dir, output_path = reference_script.paths(__doc__)
    try:
        import numpy as np
        import scipy
        import statsmodels
        import statsmodels.api as sm
        from scipy import optimize, stats
    except ImportError as error:
        return reference_script.skipped("scipy or statsmodels", error)

    rows = []
    for dataset, (file, output, ces_inputs, translog_inputs) in DATASETS.items():
        columns = read_columns(os.path.join(data_dir, file), [output] + sorted(set(ces_inputs + translog_inputs)))
        y = np.array(columns[output])

        def put(form, quantity, values):
            for index, value in enumerate(np.atleast_1d(values)):
                rows.append((dataset, form, quantity, index, repr(float(value))))

        x1, x2 = np.array(columns[ces_inputs[0]]), np.array(columns[ces_inputs[1]])
        ces_rss = ces_figures(np, optimize, put, y, x1, x2)
        comparison_figures(np, sm, stats.chi2, put, y, x1, x2, ces_rss)
        translog_columns = [np.array(columns[name]) for name in translog_inputs]
        translog_figures(np, sm, put, y, translog_columns)
        for covariance in ("HC1", "HC3"):
            translog_figures(np, sm, put, y, translog_columns, "translog_" + covariance.lower(), covariance)

    rho50_figures(np, optimize, rows)
    reference_script.write_figures(output_path, ["dataset", "form", "quantity", "index", "value"], rows)
    print(f"scipy {scipy.__version__}, statsmodels {statsmodels.__version__}: {len(rows)} figures written to "
          f"{output_path}")
    return 0


if __name__ == "__main__":
    sys.exit(main())
