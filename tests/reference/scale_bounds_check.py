#!/usr/bin/python3
"""Recomputes PRODEFFICIENTSCALE's efficient scale y* of a translog production table and its standard
error and bounds (issue 20, `what`) with statsmodels, scipy and numpy.

Usage: /usr/bin/python3 scale_bounds_check.py DATA_DIR OUTPUT_CSV

Model: the translog of the rice-farm panel (Feng and Horrace 2012, as in plm 2.6 RiceFarms;
tests/data/README.md), ln goutput on a constant, ln seed, ln urea, ln totlabor and their second-order
terms (1/2 on the squares, the core's table order), fitted by statsmodels OLS with classical and HC1
covariance. Prices PRICES: the panel's mean pseed, purea and wage (112.07, 78.98, 80.42), rounded; at
them average cost has its lowest point near y = 12,000, inside the data's range (its largest output
is 20,960, its mean 841).
- y*: each least-cost plan solved here by scipy.optimize.root on the textbook conditions in levels,
  w_i - lam f_i(x) = 0 and f(x) - y = 0 with f_i = e_i Y / x_i, and y* by scipy.optimize.brentq on
  the cost elasticity lam y / w'x - 1 over ln y in LOG_OUTPUT_BRACKET (below 1 at its low end, above
  at its high end: average cost falls, then rises, so y* is its lowest point; the plan at y* is
  asserted to pass the second-order condition, f concave along the isoquant); then the whole system
  u = (x, lam, y) with the added condition lam y - w'x = 0 (marginal equals average cost) polished by
  Newton steps to rounding.
- its gradient: the implicit function theorem on that system, du/dtheta = -F_u^-1 F_theta, with both
  Jacobians by the complex step (reference_script.complex_step_standard_error's rule, Squire and
  Trapp 1998): no difference, and not the core's logged conditions, its analytic partials or its
  route through d ln eps = d ln mu - d ln C.
Figures: y* itself, se(y*) = sqrt(g' V g), and y* exp(-+ t se / y*) (log scale) at t(n - p), 95 %.
Writes one figure per line: form,errors,quantity,case,value (case 0). Exits with 77 (the CTest skip
code) when the libraries cannot be imported, leaving no OUTPUT_CSV behind.
"""

import cmath
import sys

import reference_script  # this folder: complex-step Jacobian, command line, skip code, figures

LEVEL = 0.95
INPUTS = ("seed", "urea", "totlabor")
PRICES = (112.0, 79.0, 80.0)  # the panel's mean pseed, purea, wage, rounded
LOG_OUTPUT_BRACKET = (9.0, 10.0)  # outputs 8,103 to 22,026


def translog_partials(p, x):
    """(Y, [f_i]) of the k-input translog at amounts x (complex allowed), p in the table's order:
    ln A, alpha_i, then beta_ij for i <= j (1/2 on the squares)."""
    k = len(x)
    logs = [cmath.log(amount) for amount in x]
    beta = [[0] * k for _ in range(k)]
    index = 1 + k
    for i in range(k):
        for j in range(i, k):
            beta[i][j] = beta[j][i] = p[index]
            index += 1
    log_y = p[0] + sum(p[1 + i] * logs[i] for i in range(k))
    log_y += 0.5 * sum(beta[i][j] * logs[i] * logs[j] for i in range(k) for j in range(k))
    y = cmath.exp(log_y)
    elasticities = [p[1 + i] + sum(beta[i][j] * logs[j] for j in range(k)) for i in range(k)]
    return y, [elasticities[i] * y / x[i] for i in range(k)]


def plan_conditions(p, v, level):
    """Least cost in levels, v = (x_1 .. x_k, lam): w_i - lam f_i = 0, f(x) - y = 0."""
    y, f = translog_partials(p, v[:-1])
    return [PRICES[i] - v[-1] * f[i] for i in range(len(f))] + [y - level]


def scale_conditions(p, u):
    """The plan's conditions with y free, u = (x, lam, y), and marginal cost lam = average cost w'x / y."""
    spent = sum(PRICES[i] * u[i] for i in range(len(PRICES)))
    return plan_conditions(p, u[:-1], u[-1]) + [u[-2] * u[-1] - spent]


def least_cost_plan(np, optimize, theta, level, start):
    """(x_1 .. x_k, lam) solved by scipy in the logs of the unknowns (they are positive), each
    condition divided by its price or by y so that all are of order 1."""
    def scaled(logs):
        values = np.real(plan_conditions(theta, np.exp(logs), level))
        return values / np.array(list(PRICES) + [level])

    solution = optimize.root(scaled, np.log(start), method="hybr")
    assert solution.success, solution.message
    return np.exp(solution.x)


def concave_along_isoquant(np, theta, x):
    """The second-order condition of least cost: the Hessian of f is negative definite on the
    isoquant's tangent space {d : grad f . d = 0} (its basis from a QR factorisation)."""
    gradient = np.real(translog_partials(np.asarray(theta, dtype=complex), np.asarray(x, dtype=complex))[1])
    hessian = reference_script.complex_jacobian(np, lambda u: translog_partials(theta, u)[1], x)
    basis = np.linalg.qr(np.column_stack([gradient, np.eye(len(x))]))[0][:, 1:len(x)]
    return np.linalg.eigvalsh(basis.T @ hessian @ basis).max() < 0


def efficient_scale(np, optimize, theta):
    """(u = (x, lam, y*), du/dtheta) of the efficient scale."""
    start = [115.0, 1250.0, 375.0, 17.0]  # near the plan of output 8,103, found by a first run
    plans = {}

    def gap(log_output):
        plan = least_cost_plan(np, optimize, theta, np.exp(log_output), plans.get("last", start))
        plans["last"] = plan
        return plan[-1] * np.exp(log_output) / np.dot(PRICES, plan[:-1]) - 1

    low, high = LOG_OUTPUT_BRACKET
    assert gap(low) < 0 < gap(high), "average cost does not fall then rise over the bracket"
    log_output = optimize.brentq(gap, low, high)
    u = np.append(least_cost_plan(np, optimize, theta, np.exp(log_output), plans["last"]), np.exp(log_output))
    for _ in range(3):  # Newton steps polish the answers of root and brentq (about 1e-8) to rounding
        u = u - np.linalg.solve(reference_script.complex_jacobian(np, lambda v: scale_conditions(theta, v), u),
                                np.real(scale_conditions(theta, u)))
    assert concave_along_isoquant(np, theta, u[:-2]), "the plan at y* fails the second-order condition"
    by_unknowns = reference_script.complex_jacobian(np, lambda v: scale_conditions(theta, v), u)
    by_parameters = reference_script.complex_jacobian(np, lambda q: scale_conditions(q, u), theta)
    return u, -np.linalg.solve(by_unknowns, by_parameters)


def main():
    data_dir, output_path = reference_script.paths(__doc__)
    try:
        import numpy as np
        import statsmodels.api as sm
        from scipy import optimize, stats
    except ImportError as error:
        return reference_script.skipped("numpy, scipy or statsmodels", error)

    y, logs = reference_script.rice_farm_logs(data_dir, np, INPUTS)
    k = len(INPUTS)
    terms = [logs[i] * logs[j] * (0.5 if i == j else 1.0) for i in range(k) for j in range(i, k)]
    design = sm.add_constant(np.column_stack(logs + terms))
    figures = []
    for errors, result in reference_script.classical_and_hc1_fits(sm, y, design):
        theta, cov, t, _ = reference_script.fit_inference(np, stats, result, LEVEL)
        u, du = efficient_scale(np, optimize, theta)
        scale, gradient = u[-1], du[-1]
        se = float(np.sqrt(gradient @ cov @ gradient))
        for word, figure in (("value", scale), ("se", se), ("lower", scale * np.exp(-t * se / scale)),
                             ("upper", scale * np.exp(t * se / scale))):
            figures.append(["translog3", errors, "scale_" + word, 0, repr(float(figure))])
    reference_script.write_figures(output_path, ["form", "errors", "quantity", "case", "value"], figures)
    return 0


if __name__ == "__main__":
    sys.exit(main())
