#!/usr/bin/python3
"""Recomputes stochastic production frontiers with python3-scipy, for the core's PRODFRONTIER.

Usage: /usr/bin/python3 frontier_check.py DATA_DIR OUTPUT_CSV

Model ln y = X b + v - u, e = v - u, v ~ N(0, sv^2), with the published log-likelihoods, written here
from the densities as printed (independently of the core's code):
- half-normal u (Aigner, Lovell and Schmidt 1977), s = sqrt(su^2 + sv^2), lambda = su / sv:
  ln f(e) = ln 2 - ln s + ln phi(e / s) + ln Phi(-e lambda / s);
- exponential u of mean su (Meeusen and van den Broeck 1977):
  ln f(e) = -ln su + e / su + sv^2 / (2 su^2) + ln Phi(-e / sv - sv / su),
with scipy.stats.norm.logpdf and scipy.special.log_ndtr. Maximised by scipy.optimize.minimize (BFGS
with three-point finite-difference gradients, an algorithm other than the core's Powell hybrid on an
analytic score) over (b, ln sv, ln su) from 9 starts: least squares with su, sv from the moments of
its residuals, times 0.5, 1, 2 each; the best optimum is polished by Nelder-Mead. Standard errors from
the inverse of the Hessian of -ln L by central second differences (step 1e-4) in (b, ln sv, ln su).

Data sets:
- rice_farms: tests/data/rice_farms_panel.csv (Feng and Horrace 2012), pooled 1026 rows, output
  goutput, inputs size, totlabor, seed, urea, Cobb-Douglas and translog. The translog in size and
  totlabor alone has least-squares residuals skewed the wrong way (third moment > 0): its figures
  (form "translog-ols") are the least-squares ones, which the core must return.
- invented_half_normal / invented_exponential: numpy default_rng(17), 400 rows, x1, x2 log-uniform
  on [1, 100], ln y = 1 + 0.6 ln x1 + 0.3 ln x2 + v - u with sv = 0.2 and su = 0.4 (half-normal) or
  0.25 (exponential); the rows are written out (quantity "data": y, x1, x2 per row).
- wrong_skew: the same inputs, ln y = 1 + 0.6 ln x1 + 0.3 ln x2 + v + u (u half-normal, su = 0.4,
  sv = 0.2): residuals skewed the wrong way; the figures are the least-squares coefficients (numpy
  lstsq), the Gaussian log-likelihood at sv^2 = RSS/n, and the best half-normal log-likelihood scipy
  finds from the 9 starts (which must not exceed it by more than rounding).
- given parameters: for each data set and distribution, ln L at b = least squares (quantity
  "given_b"), sv = 0.21, su = 0.33 (quantity "given_llf"), and per row at those parameters E[exp(-u)|e] (Battese and Coelli
  1988), E[u|e] (Jondrow et al. 1982) and the 95% bounds of exp(-u) (Horrace and Schmidt 1996)
  (quantities "given_te", "given_u", "given_lower", "given_upper"): the first two by their closed
  forms in numpy with log_ndtr, the bounds as the quantiles alpha/2 and 1 - alpha/2 of u given e
  (N(mu*, sigma*^2) truncated at 0) by scipy.stats.truncnorm.ppf, exponentiated as exp(-u).

Writes one figure per line: dataset,form,quantity,index,value; form is "half-normal",
"exponential", "translog-half-normal" or "ols". Exits 77 (the CTest skip code) without
python3-scipy.
"""

import csv
import os
import sys

import reference_script

GIVEN_SV, GIVEN_SU, LEVEL = 0.21, 0.33, 0.95


def read_columns(path, names):
    with open(path, newline="") as handle:
        rows = list(csv.DictReader(handle))
    return {name: [float(row[name]) for row in rows] for name in names}


class Frontier:
    def __init__(self, np, special, stats, design, response, distribution):
        self.np, self.special, self.stats = np, special, stats
        self.X, self.y, self.distribution = design, response, distribution

    def llf_at(self, b, sv, su):
        np, log_ndtr = self.np, self.special.log_ndtr
        e = self.y - self.X @ b
        if self.distribution == "half-normal":
            s = np.sqrt(su * su + sv * sv)
            return float(np.sum(np.log(2.0) - np.log(s) + self.stats.norm.logpdf(e / s) + log_ndtr(-e * (su / sv) / s)))
        return float(np.sum(-np.log(su) + e / su + sv * sv / (2 * su * su) + log_ndtr(-e / sv - sv / su)))

    def negative(self, theta):
        p = self.X.shape[1]
        value = -self.llf_at(theta[:p], self.np.exp(theta[p]), self.np.exp(theta[p + 1]))
        return value if self.np.isfinite(value) else 1e300

    def hessian(self, theta, step=1e-4):
        np = self.np
        size = len(theta)
        result = np.zeros((size, size))
        for i in range(size):
            for j in range(size):
                def at(di, dj):
                    shifted = np.array(theta, dtype=float)
                    shifted[i] += di
                    shifted[j] += dj
                    return self.negative(shifted)
                result[i, j] = (at(step, step) - at(step, -step) - at(-step, step) + at(-step, -step)) / (4 * step * step)
        return 0.5 * (result + result.T)


def starts(np, design, response, distribution):
    b, *_ = np.linalg.lstsq(design, response, rcond=None)
    e = response - design @ b
    m2, m3 = np.mean(e ** 2), np.mean(e ** 3)
    if distribution == "half-normal":
        su = np.cbrt(m3 / (np.sqrt(2 / np.pi) * (1 - 4 / np.pi))) if m3 < 0 else np.sqrt(m2 / 2)
        sv = np.sqrt(max(m2 - (1 - 2 / np.pi) * su * su, 0.1 * m2))
        shift = su * np.sqrt(2 / np.pi)
    else:
        su = np.cbrt(-m3 / 2) if m3 < 0 else np.sqrt(m2 / 2)
        sv = np.sqrt(max(m2 - su * su, 0.1 * m2))
        shift = su
    result = []
    for scale_u in (0.5, 1.0, 2.0):
        for scale_v in (0.5, 1.0, 2.0):
            start = np.concatenate([b, [np.log(sv * scale_v), np.log(su * scale_u)]])
            start[0] += shift * scale_u
            result.append(start)
    return b, result


def maximise(np, optimize, frontier, start_list):
    best = None
    for start in start_list:
        found = optimize.minimize(frontier.negative, start, method="BFGS", jac="3-point",
                                  options={"gtol": 1e-7, "maxiter": 5000})
        if best is None or found.fun < best.fun:
            best = found
    polished = optimize.minimize(frontier.negative, best.x, method="Nelder-Mead",
                                 options={"xatol": 1e-10, "fatol": 1e-12, "maxiter": 40000, "maxfev": 40000})
    return polished if polished.fun <= best.fun else best


def fit_figures(np, optimize, put, frontier, start_list):
    best = maximise(np, optimize, frontier, start_list)
    p = frontier.X.shape[1]
    covariance = np.linalg.inv(frontier.hessian(best.x))
    put("llf", -best.fun)
    put("coefficients", best.x[:p])
    put("noise_sd", np.exp(best.x[p]))
    put("inefficiency_sd", np.exp(best.x[p + 1]))
    put("coefficient_se", np.sqrt(np.diag(covariance)[:p]))
    put("coefficient_covariance", covariance[:p, :p].flatten())  # row by row: PRODFRONTIER's block
    put("log_noise_sd_se", np.sqrt(covariance[p, p]))
    put("log_inefficiency_sd_se", np.sqrt(covariance[p + 1, p + 1]))


def conditional(np, distribution, e, sv, su):
    if distribution == "half-normal":
        s2 = sv * sv + su * su
        return -e * su * su / s2, np.full_like(e, su * sv / np.sqrt(s2))
    return -e - sv * sv / su, np.full_like(e, sv)


def given_figures(np, special, stats, put, frontier, b):
    put("given_b", b)
    put("given_llf", frontier.llf_at(b, GIVEN_SV, GIVEN_SU))
    e = frontier.y - frontier.X @ b
    mu, sigma = conditional(np, frontier.distribution, e, GIVEN_SV, GIVEN_SU)
    z = mu / sigma
    log_cdf = special.log_ndtr(z)
    put("given_u", mu + sigma * np.exp(-0.5 * z * z - 0.5 * np.log(2 * np.pi) - log_cdf))
    put("given_te", np.exp(-mu + 0.5 * sigma * sigma + special.log_ndtr(z - sigma) - log_cdf))
    # Horrace and Schmidt's interval is the central LEVEL interval of u given e, N(mu, sigma^2)
    # truncated below at 0: scipy.stats.truncnorm's quantiles (its own implementation).
    alpha = 1 - LEVEL
    truncated = stats.truncnorm(-mu / sigma, np.inf, loc=mu, scale=sigma)
    u_low, u_high = truncated.ppf(alpha / 2), truncated.ppf(1 - alpha / 2)
    put("given_lower", np.exp(-u_high))
    put("given_upper", np.exp(-u_low))


def translog(np, columns):
    """1, ln x_i, then (ln x_i)^2 / 2 and ln x_i ln x_j (i < j) for i <= j in order."""
    logs = [np.log(c) for c in columns]
    terms = [np.ones(len(logs[0]))] + logs
    for i in range(len(logs)):
        for j in range(i, len(logs)):
            terms.append((0.5 if i == j else 1.0) * logs[i] * logs[j])
    return np.column_stack(terms)


def least_squares_figures(np, put, design, response):
    b, *_ = np.linalg.lstsq(design, response, rcond=None)
    e = response - design @ b
    n = len(response)
    put("coefficients", b)
    put("llf", -n / 2 * (np.log(2 * np.pi) + np.log(float(e @ e) / n) + 1))
    put("third_moment", np.mean(e ** 3))


def invented(np, sign, su, distribution):
    rng = np.random.default_rng(17)
    n = 400
    x1, x2 = np.exp(rng.uniform(0, np.log(100), n)), np.exp(rng.uniform(0, np.log(100), n))
    v = rng.normal(0, 0.2, n)
    u = np.abs(rng.normal(0, su, n)) if distribution == "half-normal" else rng.exponential(su, n)
    y = np.exp(1 + 0.6 * np.log(x1) + 0.3 * np.log(x2) + v + sign * u)
    return y, x1, x2


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

    def log_design(columns):
        return np.column_stack([np.ones(len(columns[0]))] + [np.log(c) for c in columns])

    rice = read_columns(os.path.join(data_dir, "rice_farms_panel.csv"), ["goutput", "size", "totlabor", "seed", "urea"])
    rice_y = np.log(np.array(rice["goutput"]))
    rice_design = log_design([np.array(rice[name]) for name in ("size", "totlabor", "seed", "urea")])
    translog_design = translog(np, [np.array(rice[name]) for name in ("size", "totlabor", "seed", "urea")])
    cases = [("rice_farms", "half-normal", rice_design, rice_y, "half-normal"),
             ("rice_farms", "exponential", rice_design, rice_y, "exponential"),
             ("rice_farms", "translog-half-normal", translog_design, rice_y, "half-normal")]
    for distribution, su in (("half-normal", 0.4), ("exponential", 0.25)):
        y, x1, x2 = invented(np, -1, su, distribution)
        dataset = "invented_" + distribution.replace("-", "_")
        for row, values in enumerate(zip(y, x1, x2)):
            rows.append((dataset, "data", "row", row, " ".join(repr(float(v)) for v in values)))
        cases.append((dataset, distribution, log_design([x1, x2]), np.log(y), distribution))

    for dataset, form, design, response, distribution in cases:
        frontier = Frontier(np, special, stats, design, response, distribution)
        b, start_list = starts(np, design, response, distribution)
        put = putter(dataset, form)
        fit_figures(np, optimize, put, frontier, start_list)
        given_figures(np, special, stats, put, frontier, b)

    y, x1, x2 = invented(np, +1, 0.4, "half-normal")
    for row, values in enumerate(zip(y, x1, x2)):
        rows.append(("wrong_skew", "data", "row", row, " ".join(repr(float(v)) for v in values)))
    design, response = log_design([x1, x2]), np.log(y)
    b, start_list = starts(np, design, response, "half-normal")
    least_squares_figures(np, putter("wrong_skew", "ols"), design, response)
    rice_two = translog(np, [np.array(rice[name]) for name in ("size", "totlabor")])
    least_squares_figures(np, putter("rice_farms", "translog-ols"), rice_two, rice_y)
    frontier = Frontier(np, special, stats, design, response, "half-normal")
    best = maximise(np, optimize, frontier, start_list)
    putter("wrong_skew", "half-normal")("best_llf", -best.fun)

    reference_script.write_figures(output_path, ["dataset", "form", "quantity", "index", "value"], rows)
    print(f"scipy {scipy.__version__}: {len(rows)} figures written to {output_path}")
    return 0


if __name__ == "__main__":
    sys.exit(main())
