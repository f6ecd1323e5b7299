#!/usr/bin/python3
"""Recomputes least-cost bundles with scipy.optimize, for the core to be compared against.

Usage: /usr/bin/python3 scipy_least_cost_check.py DATA_FOLDER OUTPUT_CSV (the data folder is not used)

For each case below (invented technologies and prices), minimises the cost sum(w_i * x_i) subject to
f(x) = y with scipy.optimize.minimize (SLSQP) in log inputs, from a start that is not the answer
(equal spending scaled onto the isoquant), and writes the bundle found. The technologies:
  cobb-douglas  f = A * prod(x_i ** b_i)                       (parameters: A, b_1..b_k)
  ces           f = A * (d x1^-r + (1 - d) x2^-r) ** (-v / r)   (parameters: A, d, r, v)
No closed form is used here: the answer is the optimiser's.

OUTPUT_CSV rows: case,form,parameters (';'-separated),prices (';'),target,bundle (';'),
largest relative constraint error. Run with Debian's /usr/bin/python3.
Exits with 77 (the CTest skip code) when scipy cannot be imported, leaving no OUTPUT_CSV behind.
"""

import csv
import math
import os
import sys

import reference_script  # this folder: command line, skip code, writing the figures

CASES = [
    ("bakery", "cobb-douglas", [3.0, 0.7, 0.5], [18.0, 45.0], 400.0),
    ("print shop", "cobb-douglas", [1.8, 0.45, 0.3, 0.15], [22.0, 7.5, 3.2], 120.0),
    ("decreasing returns", "cobb-douglas", [0.9, 0.35, 0.4], [5.0, 11.0], 30.0),
    ("ces complements", "ces", [2.0, 0.4, 1.5, 1.0], [12.0, 30.0], 250.0),
    ("ces substitutes", "ces", [1.2, 0.6, -0.5, 0.9], [8.0, 5.0], 75.0),
    ("ces increasing", "ces", [0.8, 0.3, 0.6, 1.3], [2.0, 9.0], 1000.0),
]


def log_output(form, parameters, log_x):
    if form == "cobb-douglas":
        return math.log(parameters[0]) + sum(b * z for b, z in zip(parameters[1:], log_x))
    scale, weight, rho, returns = parameters
    total = weight * math.exp(-rho * log_x[0]) + (1 - weight) * math.exp(-rho * log_x[1])
    return math.log(scale) - returns / rho * math.log(total)


def least_cost(optimize, np, form, parameters, prices, target):
    k = len(prices)
    log_target = math.log(target)
    start = np.array([-math.log(w) for w in prices])
    # onto the isoquant along the ray (f is homogeneous: ln f rises by nu per unit of ln t)
    nu = sum(parameters[1:]) if form == "cobb-douglas" else parameters[3]
    start += (log_target - log_output(form, parameters, start)) / nu
    scale = sum(w * math.exp(z) for w, z in zip(prices, start))
    result = optimize.minimize(
        lambda z: sum(w * math.exp(v) for w, v in zip(prices, z)) / scale, start, method="SLSQP",
        constraints=[{"type": "eq", "fun": lambda z: log_output(form, parameters, z) - log_target}],
        options={"ftol": 1e-15, "maxiter": 1000})
    if not result.success:
        raise RuntimeError("SLSQP did not converge: %s" % result.message)
    return [math.exp(v) for v in result.x], abs(log_output(form, parameters, result.x) - log_target)


def main():
    # Called as the other reference scripts are, with the data folder first (this one needs no data).
    _, output_path = reference_script.paths(__doc__)
    try:
        import numpy as np
        import scipy
        from scipy import optimize
    except ImportError as error:
        return reference_script.skipped("scipy", error)

    rows = []
    for name, form, parameters, prices, target in CASES:
        bundle, error = least_cost(optimize, np, form, parameters, prices, target)
        rows.append([name, form, ";".join(map(repr, parameters)), ";".join(map(repr, prices)), repr(target),
                     ";".join(repr(float(x)) for x in bundle), repr(error)])
    reference_script.write_figures(
        output_path, ["case", "form", "parameters", "prices", "target", "bundle", "constraint_error"], rows)
    print(f"scipy {scipy.__version__}: {len(rows)} least-cost bundles written to {output_path}")
    return 0


if __name__ == "__main__":
    sys.exit(main())
