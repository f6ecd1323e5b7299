#!/usr/bin/python3
"""Recomputes the standard errors and bounds of the decisions' derived numbers of translog and ces
models (issue 20: PRODSECOND, PRODMRTS, PRODSUBSTITUTION and PRODTFP with `what`) with statsmodels,
scipy and numpy.

Usage: /usr/bin/python3 decision_bounds_check.py DATA_DIR OUTPUT_CSV

Translog: the fit of form_bounds_check.py (statsmodels OLS of ln P on a constant, ln L, ln C,
(ln L)^2 / 2, ln L ln C, (ln C)^2 / 2 on Cobb & Douglas (1928), tests/data/cobb_douglas_1928.csv;
classical and HC1 covariance). Ces: a typed model with a typed covariance block, CES_THETA and
CES_COVARIANCE below (invented: near the ces fit of the same data, the correlations made up, the
matrix positive definite), classical, 20 degrees of freedom, level 0.95; the C++ check types the same
numbers, so this is the table's own covariance and theta, stated as such. Three inputs (where Allen
and Morishima differ from the direct elasticity): the translog of goutput on seed, urea and totlabor
of the rice-farm panel (Feng and Horrace 2012, tests/data/rice_farms_panel.csv, 1026 rows; statsmodels
OLS with the same regressors in the core's order, classical and HC1) at RICE_BUNDLES.
The quantities are written here from the textbook definitions in the unscaled partials f_i, f_ij of
Y = f(L, C), not from the core's scaled local shape:
- f_i = e_i Y / x_i and f_ij = (d e_i / d ln x_j + e_i e_j - [i = j] e_i) Y / (x_i x_j), with
  translog e_i = a_i + sum_j b_ij ln x_j, d e_i / d ln x_j = b_ij, and ces e_1 = nu pi,
  pi = delta L^-rho / (delta L^-rho + (1 - delta) C^-rho), e_2 = nu - e_1, d e_1 / d ln L = -nu rho
  pi (1 - pi) = -d e_1 / d ln C;
- TFP = Y_observed / Y(x) at OBSERVED outputs (invented): log scale;
- MRTS_LC = f_L / f_C: log scale where both f are positive, else value -+ t se;
- the elasticities of substitution between L and C, from the bordered Hessian
  H = [[0, f_L, f_C], [f_L, f_LL, f_LC], [f_C, f_LC, f_CC]] (Chambers 1988, ch. 1, from memory):
  direct (1/(L f_L) + 1/(C f_C)) / (-f_LL/f_L^2 + 2 f_LC/(f_L f_C) - f_CC/f_C^2), Allen
  (L f_L + C f_C)/(L C) (H^-1)_LC, Morishima (f_C / L)(H^-1)_LC - (f_C / C)(H^-1)_CC: value -+ t se;
- the second partials f_LL, f_LC, f_CC: value -+ t se.
Each gradient in theta by the complex step (reference_script.complex_step_standard_error, numpy's
inverse taking the complex matrix), se = sqrt(g' V g), bounds at 0.95 with scipy.stats.t.
Writes one figure per line: form,errors,quantity,bundle,value. Exits with 77 (the CTest skip code)
when the libraries cannot be imported, leaving no OUTPUT_CSV behind.
"""

import cmath
import math
import os
import sys

LEVEL = 0.95
BUNDLES = [(150.0, 200.0), (250.0, 400.0), (100.0, 100.0)]  # (L, C), invented, as in bounds_check.py
OBSERVED = [160.0, 230.0, 110.0]  # an observed output at each bundle, invented, for TFP
CES_THETA = [-0.285, 0.831, -0.526, 1.064]  # ln A, delta, rho, nu
CES_COVARIANCE = [[0.364816, -0.062816, 0.746544, -0.070668],
                  [-0.062816, 0.043264, -0.299936, 0.010816],
                  [0.746544, -0.299936, 4.2436, -0.1339],
                  [-0.070668, 0.010816, -0.1339, 0.0169]]
CES_DEGREES_OF_FREEDOM = 20
RICE_INPUTS = ["seed", "urea", "totlabor"]
RICE_BUNDLES = [(10.0, 60.0, 250.0), (20.0, 100.0, 430.0)]  # invented, near the medians and upper quartiles


def translog_shape(p, logs):
    """(ln Y, (e_L, e_C), matrix of d e_i / d ln x_j) of the translog with the 1/2 convention."""
    l1, l2 = logs
    log_output = p[0] + p[1] * l1 + p[2] * l2 + 0.5 * (p[3] * l1 * l1 + 2 * p[4] * l1 * l2 + p[5] * l2 * l2)
    elasticities = (p[1] + p[3] * l1 + p[4] * l2, p[2] + p[4] * l1 + p[5] * l2)
    return log_output, elasticities, ((p[3], p[4]), (p[4], p[5]))


def ces_shape(p, logs):
    """The same for Y = A (delta L^-rho + (1 - delta) C^-rho)^(-nu/rho)."""
    first, second = p[1] * cmath.exp(-p[2] * logs[0]), (1 - p[1]) * cmath.exp(-p[2] * logs[1])
    log_output = p[0] - p[3] / p[2] * cmath.log(first + second)
    share = first / (first + second)
    slope = p[3] * p[2] * share * (1 - share)
    return log_output, (p[3] * share, p[3] * (1 - share)), ((-slope, slope), (slope, -slope))


def translog_k_shape(p, logs):
    """The same for the translog of k inputs, p = (a0, a_1 .. a_k, b_ij for i <= j in row order)."""
    k = len(logs)
    pairs = [(i, j) for i in range(k) for j in range(i, k)]
    beta = [[0] * k for _ in range(k)]
    for c, (i, j) in enumerate(pairs):
        beta[i][j] = beta[j][i] = p[1 + k + c]
    log_output = p[0] + sum(p[1 + i] * logs[i] for i in range(k)) + 0.5 * sum(
        beta[i][j] * logs[i] * logs[j] for i in range(k) for j in range(k))
    elasticities = [p[1 + i] + sum(beta[i][j] * logs[j] for j in range(k)) for i in range(k)]
    return log_output, elasticities, beta


def partials(shape, bundle):
    """(Y, [f_i], [[f_ij]]) from a shape."""
    log_output, e, slope = shape
    y = cmath.exp(log_output)
    k = len(bundle)
    first = [e[i] * y / bundle[i] for i in range(k)]
    second = [[(slope[i][j] + e[i] * e[j] - (e[i] if i == j else 0)) * y / (bundle[i] * bundle[j])
               for j in range(k)] for i in range(k)]
    return y, first, second


def substitution(np, f, h, bundle, kind, i=0, j=1):
    """The elasticity of substitution of input i for input j from the unscaled partials."""
    if kind == "direct":
        return ((1 / (bundle[i] * f[i]) + 1 / (bundle[j] * f[j]))
                / (-h[i][i] / f[i] ** 2 + 2 * h[i][j] / (f[i] * f[j]) - h[j][j] / f[j] ** 2))
    k = len(bundle)
    bordered = np.zeros((k + 1, k + 1), dtype=complex)
    bordered[0, 1:] = bordered[1:, 0] = f
    bordered[1:, 1:] = np.array(h, dtype=complex)
    inverse = np.linalg.inv(bordered)
    if kind == "allen":
        return sum(bundle[m] * f[m] for m in range(k)) / (bundle[i] * bundle[j]) * inverse[i + 1][j + 1]
    return f[j] / bundle[i] * inverse[i + 1][j + 1] - f[j] / bundle[j] * inverse[j + 1][j + 1]


def two_input_quantities(np, of, number, bundle, theta):
    """(name, function of theta, positive by nature) of each figure at a bundle of (L, C)."""
    yield "tfp", lambda p: OBSERVED[number] / of(p)[0], True
    for name, (i, j) in (("second_LL", (0, 0)), ("second_LC", (0, 1)), ("second_CC", (1, 1))):
        yield name, lambda p, i=i, j=j: of(p)[2][i][j], False
    both_positive = all(value.real > 0 for value in of(np.asarray(theta).astype(complex))[1])
    yield "mrts", lambda p: of(p)[1][0] / of(p)[1][1], both_positive
    for kind in ("direct", "allen", "morishima"):
        yield "substitution_" + kind, lambda p, kind=kind: substitution(np, of(p)[1], of(p)[2], bundle, kind), False


def three_input_quantities(np, of, number, bundle, theta):
    """The same for three inputs, named with the inputs' numbers from 1: where Allen and Morishima
    differ from the direct elasticity and Morishima's is not symmetric."""
    for kind, i, j in (("direct", 1, 3), ("allen", 1, 2), ("allen", 2, 3), ("morishima", 1, 2),
                       ("morishima", 2, 1), ("morishima", 3, 2)):
        yield "%s_%d_%d" % (kind, i, j), lambda p, kind=kind, i=i, j=j: substitution(
            np, of(p)[1], of(p)[2], bundle, kind, i - 1, j - 1), False
    for i, j in ((1, 3), (2, 2)):
        yield "second_%d_%d" % (i, j), lambda p, i=i, j=j: of(p)[2][i - 1][j - 1], False
    positive = all(value.real > 0 for value in of(np.asarray(theta).astype(complex))[1])
    yield "mrts_3_1", lambda p: of(p)[1][2] / of(p)[1][0], positive


def figures_of(np, form, errors, theta, cov, t, shape_of, bundles, quantities, figures):
    def se(function):
        return reference_script.complex_step_standard_error(np, function, theta, cov)

    def at_estimate(function):
        return function(np.asarray(theta).astype(complex)).real

    for number, bundle in enumerate(bundles):
        logs = tuple(math.log(amount) for amount in bundle)

        def put(quantity, value):
            figures.append([form, errors, quantity, number, repr(float(value))])

        def of(p):
            return partials(shape_of(p, logs), bundle)

        for name, function, positive in quantities(np, of, number, bundle, theta):
            if positive:
                value, log_se = at_estimate(function), se(lambda p: cmath.log(function(p)))
                low, high = value * math.exp(-t * log_se), value * math.exp(t * log_se)
            else:
                low, high = at_estimate(function) - t * se(function), at_estimate(function) + t * se(function)
            put(name + "_se", se(function))
            put(name + "_lower", low)
            put(name + "_upper", high)


def main():
    opened = reference_script.start(__doc__)
    if isinstance(opened, int):
        return opened
    data_dir, output_path, np, sm, stats = opened

    figures = []
    for errors, result in reference_script.translog_1928_fits(data_dir, np, sm):
        theta, cov, t, _ = reference_script.fit_inference(np, stats, result, LEVEL)
        figures_of(np, "translog", errors, theta, cov, t, translog_shape, BUNDLES, two_input_quantities, figures)
    ces_t = stats.t.ppf(0.5 + LEVEL / 2, CES_DEGREES_OF_FREEDOM)
    figures_of(np, "ces", "typed", np.array(CES_THETA), np.array(CES_COVARIANCE), ces_t, ces_shape, BUNDLES,
               two_input_quantities, figures)
    y, logs = reference_script.rice_farm_logs(data_dir, np, RICE_INPUTS)
    k = len(RICE_INPUTS)
    terms = [logs[i] * logs[j] * (0.5 if i == j else 1.0) for i in range(k) for j in range(i, k)]
    for errors, result in reference_script.classical_and_hc1_fits(sm, y, sm.add_constant(np.column_stack(logs + terms))):
        theta, cov, t, _ = reference_script.fit_inference(np, stats, result, LEVEL)
        figures_of(np, "translog3", errors, theta, cov, t, translog_k_shape, RICE_BUNDLES, three_input_quantities,
                   figures)
    reference_script.write_figures(output_path, ["form", "errors", "quantity", "bundle", "value"], figures)
    return 0


if __name__ == "__main__":
    sys.path.insert(0, os.path.dirname(os.path.abspath(__file__)))
    import reference_script

    sys.exit(main())
