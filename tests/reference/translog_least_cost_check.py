#!/usr/bin/python3
"""Least-cost plans of the translog fitted to Cobb & Douglas (1928), recomputed with statsmodels
and scipy for the core to be compared against.

Usage: /usr/bin/python3 translog_least_cost_check.py DATA_FOLDER OUTPUT_CSV

The technology: statsmodels OLS of ln P on a constant, ln L, ln C, (ln L)^2/2, ln L ln C and
(ln C)^2/2 (tests/data/cobb_douglas_1928.csv), so ln f = a0 + a.z + z'Bz/2 with z = (ln L, ln C).
Its elasticities e = a + Bz change sign inside the data (B11 is about -4.5), so both marginal
products are positive only in a narrow wedge.

At each pair of prices and output y below (CASES), the isoquant ln f = ln y is walked in ln C
(step 1e-3 over -5..15, the ends of the wedge found by bisection; for each ln C the ln L with
e_L > 0 solves the quadratic), and every change of sign of the tangency gap
ln(w_L L e_C) - ln(w_C C e_L) where both elasticities are positive is narrowed
by scipy.optimize.brentq. A tangency where the isoquant is convex (f_LL f_C^2 - 2 f_LC f_L f_C +
f_CC f_L^2 < 0) is the plan; none means no plan. Each plan is confirmed by scipy.optimize.minimize
(SLSQP: cost on the isoquant with e >= 0, from the data's mean logs), which must agree to 1e-6.

OUTPUT_CSV rows: what, prices (w_L;w_C), output, values (';'-separated):
  parameters, (empty), (empty), a0;a1;a2;B11;B12;B22
  plan, prices, y, L;C;marginal cost (w_L / f_L)
  no plan, prices, y, (empty)
Run with Debian's /usr/bin/python3. Exits with 77 (the CTest skip code) when statsmodels or scipy
cannot be imported, leaving no OUTPUT_CSV behind.
"""

import math
import sys

import reference_script  # this folder: command line, skip code, data readers, writing the figures

# (prices (w_L, w_C), outputs). At (2, 3) the walk finds no tangency below an output of about 144;
# at (1, 5) no ray of equal spending meets the wedge, and the plans lie next to its edge (e_L small).
CASES = [((2.0, 3.0), [100.0, 120.0, 140.0, 150.0, 170.0, 200.0, 230.0, 260.0]),
         ((1.0, 5.0), [160.0, 240.0, 320.0])]
SLSQP_AGREEMENT = 1e-6


class Translog:
    def __init__(self, np, parameters):
        self.np = np
        self.a0 = parameters[0]
        self.a = np.array(parameters[1:3])
        b11, b12, b22 = parameters[3:6]
        self.b = np.array([[b11, b12], [b12, b22]])

    def log_output(self, z):
        return self.a0 + self.a @ z + 0.5 * z @ self.b @ z

    def elasticities(self, z):
        return self.a + self.b @ z

    def log_labour_on_isoquant(self, c, log_level):
        """ln L with ln f(ln L, c) = log_level and e_L > 0 (e_L = +sqrt(discriminant) there), or nan."""
        (b11, b12), (_, b22) = self.b
        linear = self.a[0] + b12 * c
        constant = self.a0 + self.a[1] * c + 0.5 * b22 * c * c - log_level
        discriminant = linear * linear - 2 * b11 * constant
        root = self.np.sqrt(self.np.where(discriminant > 0, discriminant, self.np.nan))
        return (root - linear) / b11

    def tangency_gap(self, c, log_level, prices):
        l = self.log_labour_on_isoquant(c, log_level)
        e = self.a[:, None] + self.b @ self.np.vstack([l, c])
        positive = (e[0] > 0) & (e[1] > 0)
        with self.np.errstate(divide="ignore"):
            gap = (math.log(prices[0]) + l + self.np.log(self.np.abs(e[1]))
                   - math.log(prices[1]) - c - self.np.log(self.np.abs(e[0])))
        return self.np.where(positive, gap, self.np.nan)

    def isoquant_convex(self, z):
        """f_LL f_C^2 - 2 f_LC f_L f_C + f_CC f_L^2 < 0, from f_i = e_i y / x_i and
        f_ij = y (e_i e_j + B_ij - [i = j] e_i) / (x_i x_j)."""
        e = self.elasticities(z)
        y, x = math.exp(self.log_output(z)), self.np.exp(z)
        first = e * y / x
        second = y * (self.np.outer(e, e) + self.b - self.np.diag(e)) / self.np.outer(x, x)
        return (second[0, 0] * first[1] ** 2 - 2 * second[0, 1] * first[0] * first[1]
                + second[1, 1] * first[0] ** 2) < 0


def finite_edge(np, gap, inside, outside):
    """The point next to where gap stops being finite between `inside` (finite) and `outside`, by
    bisection to rounding level."""
    for _ in range(200):
        middle = 0.5 * (inside + outside)
        if middle in (inside, outside):
            break
        if np.isfinite(gap(middle)):
            inside = middle
        else:
            outside = middle
    return inside


def plans_on_isoquant(np, optimize, technology, level, prices):
    """The convex tangencies z = (ln L, ln C) on the isoquant of output `level`. Where the walk
    leaves the wedge (an elasticity reaches 0, and the gap grows without bound) the end of the wedge
    is found by bisection and taken as a grid point too, so a tangency next to it is not missed."""
    log_level = math.log(level)
    gap = lambda v: float(technology.tangency_gap(np.array([v]), log_level, prices)[0])
    grid = np.arange(-5.0, 15.0, 1e-3)
    values = technology.tangency_gap(grid, log_level, prices)
    finite = np.isfinite(values)
    brackets = [(grid[i], grid[i + 1]) for i in np.flatnonzero(finite[:-1] & finite[1:] &
                                                               (np.sign(values[:-1]) != np.sign(values[1:])))]
    for i in np.flatnonzero(finite[:-1] != finite[1:]):
        low, high = grid[i], grid[i + 1]
        low, high = (low, finite_edge(np, gap, low, high)) if finite[i] else (finite_edge(np, gap, high, low), high)
        if low != high and np.sign(gap(low)) != np.sign(gap(high)):
            brackets.append((low, high))
    plans = []
    for low, high in brackets:
        c = optimize.brentq(gap, low, high, xtol=1e-15, rtol=4 * np.finfo(float).eps)
        z = np.array([float(technology.log_labour_on_isoquant(np.array([c]), log_level)[0]), c])
        if technology.isoquant_convex(z):
            plans.append(z)
    return plans


def slsqp_bundle(np, optimize, technology, level, prices, start):
    """scipy's least cost on the isoquant among bundles with both elasticities non-negative."""
    prices = np.array(prices)
    scale = prices @ np.exp(start)
    result = optimize.minimize(
        lambda z: prices @ np.exp(z) / scale, start, method="SLSQP",
        constraints=[{"type": "eq", "fun": lambda z: technology.log_output(z) - math.log(level)},
                     {"type": "ineq", "fun": technology.elasticities}],
        options={"ftol": 1e-15, "maxiter": 1000})
    return np.exp(result.x)


def plan_row(np, optimize, technology, level, prices, start):
    """(what, prices, output, values) of one output at one pair of prices."""
    plans = plans_on_isoquant(np, optimize, technology, level, prices)
    price_text = ";".join(map(repr, prices))
    if len(plans) > 1:
        raise RuntimeError("output %r: %d convex tangencies; the check expects at most one" % (level, len(plans)))
    if not plans:
        return "no plan", price_text, repr(level), ""
    bundle = np.exp(plans[0])
    confirmed = slsqp_bundle(np, optimize, technology, level, prices, start)
    if np.max(np.abs(confirmed / bundle - 1)) > SLSQP_AGREEMENT:
        raise RuntimeError("output %r: SLSQP found %r, the isoquant walk %r" % (level, confirmed, bundle))
    marginal_product = technology.elasticities(plans[0])[0] * level / bundle[0]
    return "plan", price_text, repr(level), ";".join(repr(float(v)) for v in (*bundle, prices[0] / marginal_product))


def main():
    data_dir, output_path = reference_script.paths(__doc__)
    try:
        import numpy as np
        import scipy
        import statsmodels.api as sm
        from scipy import optimize
    except ImportError as error:
        return reference_script.skipped("statsmodels and scipy", error)

    parameters = np.asarray(reference_script.translog_1928_fits(data_dir, np, sm)[0][1].params)
    technology = Translog(np, parameters)
    _, log_labour, log_capital = reference_script.cobb_douglas_1928_logs(data_dir, np)
    start = np.array([log_labour.mean(), log_capital.mean()])
    rows = [["parameters", "", "", ";".join(repr(float(v)) for v in parameters)]]
    for prices, outputs in CASES:
        for level in outputs:
            rows.append([*plan_row(np, optimize, technology, level, prices, start)])
    reference_script.write_figures(output_path, ["what", "prices", "output", "values"], rows)
    print(f"scipy {scipy.__version__}: {len(rows) - 1} translog least-cost answers written to {output_path}")
    return 0


if __name__ == "__main__":
    sys.exit(main())
