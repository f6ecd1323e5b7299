#!/usr/bin/python3
"""Recomputes stochastic cost frontiers with python3-scipy, for PRODCOSTFIT's `inefficiency`.

Usage: /usr/bin/python3 cost_frontier_check.py DATA_DIR OUTPUT_CSV

Model (Kumbhakar and Lovell 2000, chapter 4): ln C = c(y, w) + v + u, e = v + u, v ~ N(0, sv^2),
u >= 0, homogeneity in prices imposed as in PRODCOSTFIT: the regression run is ln(C/w_k) on 1, ln y,
ln(w_i/w_k) (and the translog's terms). Log-likelihoods written here from the cost densities
(independently of the core, which fits the production frontier of -ln C):
- half-normal u, s = sqrt(su^2 + sv^2), lambda = su / sv:
  ln f(e) = ln 2 - ln s + ln phi(e / s) + ln Phi(e lambda / s);
- exponential u of mean su:
  ln f(e) = -ln su - e / su + sv^2 / (2 su^2) + ln Phi(e / sv - sv / su),
with scipy.stats.norm.logpdf and scipy.special.log_ndtr, and their analytic gradients (derived here).
Maximised over (b, ln sv, ln su) by scipy.optimize.minimize (BFGS with the analytic gradient) from 9
starts (least squares with su, sv from the moments of its residuals, times 0.5, 1, 2 each), the best
then polished by Newton steps on the analytic gradient with a central-difference Hessian (step 1e-6)
until the step is below 1e-12: the parameters are then good to far better than 1e-6. Standard
errors from the inverse of that Hessian of -ln L.

Data sets:
- bakeries_half_normal / bakeries_exponential (invented: a chain of 300 bakery branches):
  numpy default_rng(23); output (loaves) log-uniform on [50, 5000], prices of flour, labour and
  energy log-uniform on [1, 20]; ln C = 0.4 + 0.8 ln y + 0.3 ln w1 + 0.5 ln w2 + 0.2 ln w3 + v + u,
  sv = 0.1, u half-normal with su = 0.3 or exponential of mean 0.2. Cobb-Douglas; the half-normal
  set also translog ("translog-half-normal"). The rows are written out (quantity "row": C, y, w1,
  w2, w3).
- rice_farms: tests/data/rice_farms_panel.csv (Feng and Horrace 2012), cost pseed*seed +
  purea*urea + wage*totlabor, output goutput, prices pseed, purea, wage: its least-squares residuals
  are skewed the wrong way for a cost frontier (third moment < 0), so the frontier is least squares:
  the figures ("ols") are numpy lstsq, the Gaussian log-likelihood at sv^2 = RSS/n, and the best
  half-normal cost-frontier log-likelihood scipy finds from the 9 starts ("best_llf").
- at given parameters (b from least squares, sv = 0.12, su = 0.27) for each bakery set: ln L, and per
  row E[exp(-u)|e] (Battese and Coelli 1988) with u given e ~ N(mu*, s*^2) truncated at 0, for the
  cost frontier half-normal mu* = e su^2 / s^2, s* = su sv / s; exponential mu* = e - sv^2 / su,
  s* = sv; and E[u|e] (Jondrow et al. 1982). Also E[exp(-u)|e] at scipy's optimum ("fit_te").

Writes one figure per line: dataset,form,quantity,index,value. Exits 77 (the CTest skip code)
without python3-scipy.
"""

import csv
import os
import sys

import reference_script

GIVEN_SV, GIVEN_SU = 0.12, 0.27


class CostFrontier:
    def __init__(self, np, special, stats, design, response, distribution):
        self.np, self.special, self.stats = np, special, stats
        self.X, self.r, self.distribution = design, response, distribution

    def terms(self, b, sv, su):
        """ln f per row and its derivatives in e, sv, su."""
        np, log_ndtr, logpdf = self.np, self.special.log_ndtr, self.stats.norm.logpdf
        e = self.r - self.X @ b
        if self.distribution == "half-normal":
            s2 = su * su + sv * sv
            s = np.sqrt(s2)
            z = e * su / (sv * s)
            mills = np.exp(logpdf(z) - log_ndtr(z))
            value = np.log(2.0) - np.log(s) + logpdf(e / s) + log_ndtr(z)
            d_e = -e / s2 + mills * su / (sv * s)
            d_su = -su / s2 + e * e * su / (s2 * s2) + mills * e * sv / (s2 * s)
            d_sv = -sv / s2 + e * e * sv / (s2 * s2) - mills * e * su * (s2 + sv * sv) / (sv * sv * s2 * s)
            return value, d_e, d_sv, d_su
        z = e / sv - sv / su
        mills = np.exp(logpdf(z) - log_ndtr(z))
        value = -np.log(su) - e / su + sv * sv / (2 * su * su) + log_ndtr(z)
        d_e = -1 / su + mills / sv
        d_su = -1 / su + e / (su * su) - sv * sv / su ** 3 + mills * sv / (su * su)
        d_sv = sv / (su * su) + mills * (-e / (sv * sv) - 1 / su)
        return value, d_e, d_sv, d_su

    def split(self, theta):
        p = self.X.shape[1]
        return theta[:p], self.np.exp(theta[p]), self.np.exp(theta[p + 1])

    def llf_at(self, b, sv, su):
        return float(self.np.sum(self.terms(b, sv, su)[0]))

    def negative(self, theta):
        value = -self.llf_at(*self.split(theta))
        return value if self.np.isfinite(value) else 1e300

    def negative_gradient(self, theta):
        b, sv, su = self.split(theta)
        _, d_e, d_sv, d_su = self.terms(b, sv, su)
        return -self.np.concatenate([-(self.X.T @ d_e), [sv * d_sv.sum(), su * d_su.sum()]])

    def hessian(self, theta, step=1e-6):
        np = self.np
        columns = []
        for j in range(len(theta)):
            ahead, behind = np.array(theta, dtype=float), np.array(theta, dtype=float)
            ahead[j] += step
            behind[j] -= step
            columns.append((self.negative_gradient(ahead) - self.negative_gradient(behind)) / (2 * step))
        result = np.column_stack(columns)
        return 0.5 * (result + result.T)


def starts(np, design, response, distribution):
    b, *_ = np.linalg.lstsq(design, response, rcond=None)
    e = response - design @ b
    m2, m3 = np.mean((e - e.mean()) ** 2), np.mean((e - e.mean()) ** 3)
    if distribution == "half-normal":
        su = np.cbrt(m3 / (np.sqrt(2 / np.pi) * (4 / np.pi - 1))) if m3 > 0 else np.sqrt(m2 / 2)
        sv = np.sqrt(max(m2 - (1 - 2 / np.pi) * su * su, 0.1 * m2))
        shift = su * np.sqrt(2 / np.pi)
    else:
        su = np.cbrt(m3 / 2) if m3 > 0 else np.sqrt(m2 / 2)
        sv = np.sqrt(max(m2 - su * su, 0.1 * m2))
        shift = su
    result = []
    for scale_u in (0.5, 1.0, 2.0):
        for scale_v in (0.5, 1.0, 2.0):
            start = np.concatenate([b, [np.log(sv * scale_v), np.log(su * scale_u)]])
            start[0] -= shift * scale_u  # least squares' constant holds E[u]
            result.append(start)
    return b, result


def maximise(np, optimize, frontier, start_list, polish=True):
    best = None
    for start in start_list:
        found = optimize.minimize(frontier.negative, start, jac=frontier.negative_gradient, method="BFGS",
                                  options={"gtol": 1e-9, "maxiter": 5000})
        if best is None or found.fun < best.fun:
            best = found
    theta = np.array(best.x, dtype=float)
    if not polish:
        return theta
    for _ in range(100):
        step = np.linalg.solve(frontier.hessian(theta), frontier.negative_gradient(theta))
        theta = theta - step
        if np.max(np.abs(step)) < 1e-12:
            break
    return theta


def conditional(np, distribution, e, sv, su):
    if distribution == "half-normal":
        s2 = sv * sv + su * su
        return e * su * su / s2, np.full_like(e, su * sv / np.sqrt(s2))
    return e - sv * sv / su, np.full_like(e, sv)


def efficiencies(np, special, distribution, e, sv, su):
    mu, sigma = conditional(np, distribution, e, sv, su)
    z = mu / sigma
    log_cdf = special.log_ndtr(z)
    technical = np.exp(-mu + 0.5 * sigma * sigma + special.log_ndtr(z - sigma) - log_cdf)
    inefficiency = mu + sigma * np.exp(-0.5 * z * z - 0.5 * np.log(2 * np.pi) - log_cdf)
    return technical, inefficiency


def translog(np, log_output, relative):
    """PRODCOSTFIT's translog regression: 1, ln y, r_i, (ln y)^2/2, r_i r_j (halved for i = j), r_i ln y."""
    k1 = relative.shape[1]
    columns = [np.ones_like(log_output), log_output] + [relative[:, i] for i in range(k1)]
    columns.append(log_output ** 2 / 2)
    for i in range(k1):
        for j in range(i, k1):
            columns.append(relative[:, i] * relative[:, j] * (0.5 if i == j else 1.0))
    columns += [relative[:, i] * log_output for i in range(k1)]
    return np.column_stack(columns)


def regression(np, cost, output, prices, form):
    relative = np.log(prices[:, :-1]) - np.log(prices[:, -1:])
    log_output = np.log(output)
    response = np.log(cost) - np.log(prices[:, -1])
    if form == "translog":
        return translog(np, log_output, relative), response
    return np.column_stack([np.ones_like(log_output), log_output, relative]), response


def bakeries(np, distribution):
    rng = np.random.default_rng(23)
    n = 300
    output = np.exp(rng.uniform(np.log(50), np.log(5000), n))
    prices = np.exp(rng.uniform(0, np.log(20), (n, 3)))
    v = rng.normal(0, 0.1, n)
    u = np.abs(rng.normal(0, 0.3, n)) if distribution == "half-normal" else rng.exponential(0.2, n)
    log_cost = 0.4 + 0.8 * np.log(output) + np.log(prices) @ np.array([0.3, 0.5, 0.2]) + v + u
    return np.exp(log_cost), output, prices


def fit_figures(np, optimize, special, put, frontier):
    b, start_list = starts(np, frontier.X, frontier.r, frontier.distribution)
    theta = maximise(np, optimize, frontier, start_list)
    p = frontier.X.shape[1]
    covariance = np.linalg.inv(frontier.hessian(theta))
    put("llf", -frontier.negative(theta))
    put("gradient_norm", np.max(np.abs(frontier.negative_gradient(theta))))
    put("coefficients", theta[:p])
    put("log_noise_sd", theta[p])
    put("log_inefficiency_sd", theta[p + 1])
    put("coefficient_se", np.sqrt(np.diag(covariance)[:p]))
    put("log_noise_sd_se", np.sqrt(covariance[p, p]))
    put("log_inefficiency_sd_se", np.sqrt(covariance[p + 1, p + 1]))
    e = frontier.r - frontier.X @ theta[:p]
    put("fit_te", efficiencies(np, special, frontier.distribution, e, np.exp(theta[p]), np.exp(theta[p + 1]))[0])
    return b


def given_figures(np, special, put, frontier, b):
    put("given_b", b)
    put("given_llf", frontier.llf_at(b, GIVEN_SV, GIVEN_SU))
    e = frontier.r - frontier.X @ b
    technical, inefficiency = efficiencies(np, special, frontier.distribution, e, GIVEN_SV, GIVEN_SU)
    put("given_te", technical)
    put("given_u", inefficiency)


def rice_farms(np, data_dir):
    with open(os.path.join(data_dir, "rice_farms_panel.csv"), newline="") as handle:
        rows = list(csv.DictReader(handle))
    prices = np.array([[float(row[name]) for name in ("pseed", "purea", "wage")] for row in rows])
    quantities = np.array([[float(row[name]) for name in ("seed", "urea", "totlabor")] for row in rows])
    output = np.array([float(row["goutput"]) for row in rows])
    return (prices * quantities).sum(axis=1), output, prices


def main():
    data_dir, output_path = reference_script.paths(__doc__.splitlines()[2])
    try:
        import numpy as np
        import scipy
        from scipy import optimize, special, stats
    except ImportError as error:
        return reference_script.skipped("python3-scipy", error)

    rows = []
    putter = reference_script.figure_putter(rows, np)

    for distribution in ("half-normal", "exponential"):
        cost, output, prices = bakeries(np, distribution)
        dataset = "bakeries_" + distribution.replace("-", "_")
        for row in range(len(cost)):
            values = [cost[row], output[row]] + list(prices[row])
            rows.append((dataset, "data", "row", row, " ".join(repr(float(v)) for v in values)))
        forms = [("cobb-douglas", distribution)]
        if distribution == "half-normal":
            forms.append(("translog", "translog-half-normal"))
        for form, label in forms:
            design, response = regression(np, cost, output, prices, form)
            frontier = CostFrontier(np, special, stats, design, response, distribution)
            put = putter(dataset, label)
            b = fit_figures(np, optimize, special, put, frontier)
            given_figures(np, special, put, frontier, b)

    design, response = regression(np, *rice_farms(np, data_dir), "cobb-douglas")
    b, start_list = starts(np, design, response, "half-normal")
    e = response - design @ b
    n = len(response)
    put = putter("rice_farms", "ols")
    put("coefficients", b)
    put("llf", -n / 2 * (np.log(2 * np.pi) + np.log(float(e @ e) / n) + 1))
    put("third_moment", np.mean((e - e.mean()) ** 3))
    frontier = CostFrontier(np, special, stats, design, response, "half-normal")
    best = maximise(np, optimize, frontier, start_list, polish=False)
    putter("rice_farms", "half-normal")("best_llf", -frontier.negative(best))

    reference_script.write_figures(output_path, ["dataset", "form", "quantity", "index", "value"], rows)
    print(f"scipy {scipy.__version__}: {len(rows)} figures written to {output_path}")
    return 0


if __name__ == "__main__":
    sys.exit(main())
