#!/usr/bin/python3
"""Recomputes the standard errors and bounds of the plans of translog and ces models (issue 20:
PRODLEASTCOST, PRODBUDGET and PRODCOST with `what` / `statistic`) with statsmodels, scipy and numpy.

Usage: /usr/bin/python3 plan_bounds_check.py DATA_DIR OUTPUT_CSV

Models: those of decision_bounds_check.py (the translog fitted by statsmodels OLS on Cobb & Douglas
(1928), classical and HC1 covariance; the typed ces CES_THETA with CES_COVARIANCE, the table's own
covariance, stated as such). Prices PRICES, outputs TARGETS and the budget BUDGET are invented.
- translog: each plan solved here by scipy.optimize.root on the textbook conditions in levels,
  least cost w_i - lam f_i(x) = 0, f(x) - y = 0 in (x_1, x_2, lam), budget f_i(x) - kap w_i = 0,
  w'x - B = 0 in (x_1, x_2, kap), with f_i = e_i Y / x_i (from a start stated in translog_plan, then
  polished by Newton steps; the second-order condition asserted at the answer); its gradient in theta by the implicit
  function theorem dv/dtheta = -F_v^-1 F_theta with both Jacobians by the complex step
  (reference_script.complex_step_standard_error's rule, Squire and Trapp 1998): no closed form, no
  difference, and not the core's logged equations or analytic partials.
- ces: the closed form of the least-cost plan (the core's ces_closed_forms.hpp states the same
  textbook result): x_1/x_2 = t = (delta w_2 / ((1 - delta) w_1))^sigma, sigma = 1/(1 + rho),
  a_2 = A^(-1/nu) (delta t^-rho + 1 - delta)^(1/rho), a_1 = t a_2, c = w'a, and by homogeneity of
  degree nu, x(y) = a y^(1/nu), C(y) = c y^(1/nu), marginal cost C/(nu y); budget x = a B/c with
  output (B/c)^nu; differentiated by the complex step through that formula (the core differentiates
  its plans through the first-order conditions instead).
Figures: the amounts x_i and the budget plan's output on the log scale, exp(ln q -+ t se(ln q));
PRODCOST's total, marginal and average cost on the log scale, its cost elasticity (marginal cost
y / C) and returns to scale (its inverse) value -+ t se.
Writes one figure per line: form,errors,quantity,case,value. Exits with 77 (the CTest skip code)
when the libraries cannot be imported, leaving no OUTPUT_CSV behind.
"""

import cmath
import math
import sys

import reference_script  # this folder: complex-step Jacobian, command line, skip code, figures

LEVEL = 0.95
PRICES = (4.0, 3.0)  # w_L, w_C, invented
TARGETS = (180.0, 240.0)  # outputs for least cost and cost, invented
BUDGET = 1000.0  # invented
CASES = [("target", y) for y in TARGETS] + [("budget", BUDGET)]
STEP = 1e-20


def translog_log_output(p, logs):
    l1, l2 = logs
    return p[0] + p[1] * l1 + p[2] * l2 + 0.5 * (p[3] * l1 * l1 + 2 * p[4] * l1 * l2 + p[5] * l2 * l2)


def translog_partials(p, x):
    """(Y, (f_L, f_C)) of the translog at amounts x (complex allowed)."""
    logs = (cmath.log(x[0]), cmath.log(x[1]))
    y = cmath.exp(translog_log_output(p, logs))
    e = (p[1] + p[3] * logs[0] + p[4] * logs[1], p[2] + p[4] * logs[0] + p[5] * logs[1])
    return y, (e[0] * y / x[0], e[1] * y / x[1])


def conditions(p, v, kind, level):
    """The textbook first-order conditions in levels, v = (x_1, x_2, multiplier)."""
    y, f = translog_partials(p, v[:2])
    if kind == "target":
        return [PRICES[0] - v[2] * f[0], PRICES[1] - v[2] * f[1], y - level]
    return [f[0] - v[2] * PRICES[0], f[1] - v[2] * PRICES[1], PRICES[0] * v[0] + PRICES[1] * v[1] - level]


def translog_plan(np, optimize, theta, kind, level):
    """(v, dv/dtheta) of a translog plan: v solved by scipy, its gradient by the implicit function
    theorem with complex-step Jacobians."""
    if kind == "budget":  # half the budget on each input
        start = np.array([level / (2 * PRICES[0]), level / (2 * PRICES[1]), 0.1])
    else:  # each amount at the output level, the multiplier at cost per unit of output
        start = np.array([level, level, PRICES[0] + PRICES[1]])
    solution = optimize.root(lambda v: np.real(conditions(theta, v, kind, level)), start, method="lm")
    assert solution.success, solution.message
    v = solution.x
    for _ in range(3):  # Newton steps polish root's answer (xtol 1.5e-8) to rounding
        by_plan = reference_script.complex_jacobian(np, lambda u: conditions(theta, u, kind, level), v)
        v = v - np.linalg.solve(by_plan, np.real(conditions(theta, v, kind, level)))
    # Second-order condition of both problems: f curves down along the isoquant's tangent
    # (f_C, -f_L), so the point is a least cost (budget: a most output), not a saddle.
    gradient = np.real(translog_partials(np.asarray(theta, dtype=complex), v[:2].astype(complex))[1])
    hessian = reference_script.complex_jacobian(np, lambda u: list(translog_partials(theta, u)[1]), v[:2])
    tangent = np.array([gradient[1], -gradient[0]])
    assert tangent @ hessian @ tangent < 0, "the plan fails the second-order condition"
    by_plan = reference_script.complex_jacobian(np, lambda u: conditions(theta, u, kind, level), v)
    by_parameters = reference_script.complex_jacobian(np, lambda q: conditions(q, v, kind, level), theta)
    return v, -np.linalg.solve(by_plan, by_parameters)


def translog_figures(np, optimize, theta, cov, put):
    def spread(gradient):
        return float(np.sqrt(gradient @ cov @ gradient))

    for case, (kind, level) in enumerate(CASES):
        v, dv = translog_plan(np, optimize, theta, kind, level)
        quantities = []  # (name, value, gradient, log scale)
        for i, name in enumerate(("L", "C")):
            quantities.append(("amount_" + name, v[i], dv[i], True))
        if kind == "budget":
            y, f = translog_partials(np.asarray(theta, dtype=complex), v[:2])
            output_by_theta = reference_script.complex_jacobian(
                np, lambda q: [translog_partials(q, v[:2])[0]], theta)[0]
            quantities.append(("output", y.real, output_by_theta + np.real(f[0]) * dv[0] + np.real(f[1]) * dv[1],
                               True))
        else:
            cost, cost_gradient = PRICES[0] * v[0] + PRICES[1] * v[1], PRICES[0] * dv[0] + PRICES[1] * dv[1]
            marginal = v[2]
            quantities += [("total", cost, cost_gradient, True), ("average", cost / level, cost_gradient / level, True),
                           ("marginal", marginal, dv[2], True),
                           ("cost_elasticity", marginal * level / cost,
                            level * (dv[2] / cost - marginal * cost_gradient / cost ** 2), False),
                           ("returns_to_scale", cost / (marginal * level),
                            (cost_gradient / marginal - cost * dv[2] / marginal ** 2) / level, False)]
        for name, value, gradient, log_scale in quantities:
            put(case, name, value, spread(gradient), log_scale)


def ces_plan(p, kind, level):
    """(x_1, x_2, C, marginal cost, output) of the closed form, for complex parameters p."""
    scale, delta, rho, nu = cmath.exp(p[0]), p[1], p[2], p[3]
    ratio = (delta * PRICES[1] / ((1 - delta) * PRICES[0])) ** (1 / (1 + rho))
    second = scale ** (-1 / nu) * (delta * ratio ** (-rho) + 1 - delta) ** (1 / rho)
    unit = (ratio * second, second)
    unit_cost = PRICES[0] * unit[0] + PRICES[1] * unit[1]
    if kind == "budget":
        return unit[0] * level / unit_cost, unit[1] * level / unit_cost, level, None, (level / unit_cost) ** nu
    grown = level ** (1 / nu)
    cost = unit_cost * grown
    return unit[0] * grown, unit[1] * grown, cost, cost / (nu * level), level


def ces_figures(np, theta, cov, put):
    def spread(function):
        return reference_script.complex_step_standard_error(np, function, theta, cov, STEP)

    for case, (kind, level) in enumerate(CASES):
        def plan(p):
            return ces_plan(p, kind, level)
        names = [("amount_L", 0, True), ("amount_C", 1, True)]
        if kind == "budget":
            names.append(("output", 4, True))
        else:
            names += [("total", 2, True), ("marginal", 3, True)]
        for name, index, log_scale in names:
            value = plan(np.asarray(theta, dtype=complex))[index].real
            put(case, name, value, spread(lambda p, index=index: plan(p)[index]), log_scale)
        if kind == "target":
            put(case, "average", plan(np.asarray(theta, dtype=complex))[2].real / level,
                spread(lambda p: plan(p)[2] / level), True)
            put(case, "cost_elasticity", 1 / theta[3], spread(lambda p: plan(p)[3] * level / plan(p)[2]), False)
            put(case, "returns_to_scale", theta[3], spread(lambda p: plan(p)[2] / (plan(p)[3] * level)), False)


def main():
    data_dir, output_path = reference_script.paths(__doc__)
    try:
        import numpy as np
        import statsmodels.api as sm
        from scipy import optimize, stats
        import decision_bounds_check as decisions
    except ImportError as error:
        return reference_script.skipped("numpy, scipy or statsmodels", error)

    figures = []

    def putter(form, errors, t):
        def put(case, name, value, se, log_scale):
            """se is that of q itself; on the log scale se(ln q) = se / q."""
            if log_scale:
                low, high = value * math.exp(-t * se / value), value * math.exp(t * se / value)
            else:
                low, high = value - t * se, value + t * se
            for word, figure in (("se", se), ("lower", low), ("upper", high)):
                figures.append([form, errors, name + "_" + word, case, repr(float(figure))])
        return put

    for errors, result in reference_script.translog_1928_fits(data_dir, np, sm):
        theta, cov, t, _ = reference_script.fit_inference(np, stats, result, LEVEL)
        translog_figures(np, optimize, theta, cov, putter("translog", errors, t))
    ces_t = stats.t.ppf(0.5 + LEVEL / 2, decisions.CES_DEGREES_OF_FREEDOM)
    ces_figures(np, np.array(decisions.CES_THETA), np.array(decisions.CES_COVARIANCE), putter("ces", "typed", ces_t))
    reference_script.write_figures(output_path, ["form", "errors", "quantity", "case", "value"], figures)
    return 0


if __name__ == "__main__":
    sys.exit(main())
