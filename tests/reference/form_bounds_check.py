#!/usr/bin/python3
"""Recomputes the standard errors and bounds of derived numbers of a translog fit (issue 20) with
statsmodels and numpy.

Usage: /usr/bin/python3 form_bounds_check.py DATA_DIR OUTPUT_CSV

Data: Cobb & Douglas (1928), tests/data/cobb_douglas_1928.csv. The fit: statsmodels OLS of ln P on
a constant, ln L, ln C, (ln L)^2 / 2, ln L ln C and (ln C)^2 / 2 (the translog with the 1/2
convention, parameters theta = (a0, aL, aC, bLL, bLC, bCC) in the order of the table), classical
("nonrobust") and HC1 covariance (use_t, as the core). For each bundle in BUNDLES (those of
bounds_check.py) each quantity q(theta), written out from the translog formula here, gets a numerical
gradient in numpy by the complex step, dq/dtheta_j = Im q(theta + i h e_j) / h with h = 1e-20
(Squire and Trapp 1998, "Using complex variables to estimate derivatives of real functions", SIAM
Review 40(1), 110-112): no difference is taken, so the gradient is exact to rounding. Central
differences are not enough here: on these data the translog's parameters are nearly collinear
(cond(V) about 3e9) and grad' V grad cancels about five digits (terms near 4e3 summing to 0.04),
so the 1e-10 relative error of a central difference showed as 4e-7 in the standard errors.
se = sqrt(grad' V grad) with V = cov_params(); bounds at 0.95 with scipy.stats.t(df_resid):
- output Y = exp(ln Y), its mean S Y (S = mean(exp(residual)), Duan's smearing factor) and the
  marginal products MP_i = e_i Y / x_i where positive: on the log scale, exp(ln q -+ t se(ln q));
  a marginal product that is not positive: q -+ t se;
- one new plant's output: exp(ln Y -+ t sqrt(se(ln Y)^2 + scale)), scale = RSS/(n - p);
- the elasticities e_i = a_i + sum_j b_ij ln x_j and the returns to scale sum_i e_i: q -+ t se.
Writes one figure per line: errors,quantity,bundle,value. Exits with 77 (the CTest skip code) when
the libraries cannot be imported, leaving no OUTPUT_CSV behind.
"""

import cmath
import math
import os
import sys

LEVEL = 0.95
COMPLEX_STEP = 1e-20
BUNDLES = [(150.0, 200.0), (250.0, 400.0), (100.0, 100.0)]  # (L, C), invented, as in bounds_check.py


def translog_log_output(p, logs):
    """ln Y = a0 + aL l1 + aC l2 + 1/2 (bLL l1^2 + 2 bLC l1 l2 + bCC l2^2)."""
    l1, l2 = logs
    return p[0] + p[1] * l1 + p[2] * l2 + 0.5 * (p[3] * l1 * l1 + 2 * p[4] * l1 * l2 + p[5] * l2 * l2)


def translog_elasticities(p, logs):
    """e_L = aL + bLL l1 + bLC l2, e_C = aC + bLC l1 + bCC l2."""
    l1, l2 = logs
    return (p[1] + p[3] * l1 + p[4] * l2, p[2] + p[4] * l1 + p[5] * l2)


def main():
    sys.path.insert(0, os.path.dirname(os.path.abspath(__file__)))
    import reference_script

    opened = reference_script.start(__doc__)
    if isinstance(opened, int):
        return opened
    data_dir, output_path, np, sm, stats = opened

    figures = []
    for errors, result in reference_script.translog_1928_fits(data_dir, np, sm):
        theta, cov, t, smearing = reference_script.fit_inference(np, stats, result, LEVEL)

        def se(function):
            return reference_script.complex_step_standard_error(np, function, theta, cov, COMPLEX_STEP)

        def at_estimate(function):
            return function(theta.astype(complex)).real

        for number, bundle in enumerate(BUNDLES):
            logs = (math.log(bundle[0]), math.log(bundle[1]))

            def put(quantity, value):
                figures.append([errors, quantity, number, repr(float(value))])

            def positive(name, function):
                value, log_se = at_estimate(function), se(lambda p: cmath.log(function(p)))
                put(name + "_se", se(function))
                put(name + "_lower", value * math.exp(-t * log_se))
                put(name + "_upper", value * math.exp(t * log_se))

            def linear(name, function):
                put(name + "_se", se(function))
                put(name + "_lower", at_estimate(function) - t * se(function))
                put(name + "_upper", at_estimate(function) + t * se(function))

            def output(p):
                return cmath.exp(translog_log_output(p, logs))

            positive("output", output)
            positive("mean_output", lambda p: smearing * output(p))
            log_se = se(lambda p: translog_log_output(p, logs))
            spread = math.sqrt(log_se ** 2 + result.scale)
            put("prediction_lower", at_estimate(output) * math.exp(-t * spread))
            put("prediction_upper", at_estimate(output) * math.exp(t * spread))
            for index, name in enumerate(("L", "C")):
                def marginal(p, index=index):
                    return translog_elasticities(p, logs)[index] * output(p) / bundle[index]

                (positive if at_estimate(marginal) > 0 else linear)("marginal_" + name, marginal)
                linear("elasticity_" + name, lambda p, index=index: translog_elasticities(p, logs)[index])
            linear("scale", lambda p: sum(translog_elasticities(p, logs)))

    reference_script.write_figures(output_path, ["errors", "quantity", "bundle", "value"], figures)
    return 0


if __name__ == "__main__":
    sys.exit(main())
