#!/usr/bin/python3
"""Recomputes the standard errors and bounds of derived numbers (issue 20) with statsmodels and numpy.

Usage: /usr/bin/python3 bounds_check.py DATA_DIR OUTPUT_CSV

Data: Cobb & Douglas (1928), tests/data/cobb_douglas_1928.csv. The fit: statsmodels OLS of ln P on a
constant, ln L and ln C, classical ("nonrobust") and HC1 covariance (use_t, as the core). For each
bundle in BUNDLES, each quantity q(theta) of the parameters theta = (ln A, bL, bC) (output, the two
marginal products, the mean output times the smearing factor mean(exp(residual)), the elasticities
and returns to scale) gets a numerical gradient in numpy by central differences (step 1e-6 times
max(1, |theta_j|); its error, about 1e-10 relative here, is far below the checked 1e-7), and
se = sqrt(grad' V grad) with V = cov_params(). Bounds at 0.95 with scipy.stats.t(df_resid): for
output and marginal products (positive) exp(ln q -+ t se(ln q)) with se(ln q) from the gradient of
ln q; for the elasticities and scale q -+ t se. Prediction bounds of one new plant's output:
exp(ln Y -+ t sqrt(se(ln Y)^2 + scale)), scale = RSS/(n - p). Least-cost amounts (PLANS, numbered as
the bundles): solved numerically for each theta by minimising cost on the isoquant in numpy's terms,
x_i = (b_i / w_i) * lam with lam from A prod (b_j lam / w_j)^b_j = y (the first-order conditions of
cost minimisation, solved for lam in logs), bounds on the log scale as for output. TFP of an observed
output (OBSERVED, numbered as the bundles): Y / (A L^bL C^bC), positive, on the log scale. The cross
and own second partials bL bC Y/(L C) and bL (bL - 1) Y/L^2, of either sign: q -+ t se. The marginal
rate of technical substitution of L for C, (bL/L)/(bC/C), positive: on the log scale. The budget plan
(BUDGETS, numbered as the bundles): the share s of the budget B spent on L solved for each theta by
scipy's brentq from the first-order condition bL/s = bC/(1 - s) of max ln Y = ln A + bL ln(sB/wL) +
bC ln((1 - s)B/wC) (to xtol 1e-15), then the two amounts and the output, positive: on the log scale.
PRODCOST's figures at the PLANS (independently of the core's closed form): total cost C = wL xL + wC xC
of those least-cost amounts, marginal cost MC = wL xL / (bL y) (the Lagrange multiplier of the
first-order condition wL = MC bL y / xL), average cost C / y, positive: on the log scale; the cost
elasticity MC y / C and returns to scale C / (MC y): q -+ t se.

Writes one figure per line: errors,quantity,bundle,value. Exits with 77 (the CTest skip code) when
the libraries cannot be imported, leaving no OUTPUT_CSV behind.
"""

import math
import os
import sys

LEVEL = 0.95
BUNDLES = [(150.0, 200.0), (250.0, 400.0), (100.0, 100.0)]  # (L, C), invented
PLANS = [(180.0, 2.0, 3.0), (300.0, 1.0, 1.0), (120.0, 5.0, 2.0)]  # (target output, wL, wC), invented
OBSERVED = [170.0, 260.0, 105.0]  # one plant's output at each bundle (PRODTFP), invented
BUDGETS = [(1000.0, 2.0, 3.0), (500.0, 1.0, 4.0), (2000.0, 5.0, 2.0)]  # (budget, wL, wC), invented


def main():
    sys.path.insert(0, os.path.dirname(os.path.abspath(__file__)))
    import reference_script

    data_dir, output_path = reference_script.paths(__doc__)
    try:
        import numpy as np
        import statsmodels.api as sm
        from scipy import optimize, stats
    except ImportError as error:
        return reference_script.skipped("numpy, scipy or statsmodels", error)

    y, log_labour, log_capital = reference_script.cobb_douglas_1928_logs(data_dir, np)
    design = sm.add_constant(np.column_stack([log_labour, log_capital]))
    figures = []
    for errors, result in reference_script.classical_and_hc1_fits(sm, y, design):
        theta, cov, t, smearing = reference_script.fit_inference(np, stats, result, LEVEL)

        def se(function):
            gradient = np.zeros(3)
            for j in range(3):
                step = 1e-6 * max(1.0, abs(theta[j]))
                up, down = theta.copy(), theta.copy()
                up[j] += step
                down[j] -= step
                gradient[j] = (function(up) - function(down)) / (2 * step)
            return math.sqrt(gradient @ cov @ gradient)

        for number, (labour, capital) in enumerate(BUNDLES):
            logs = np.array([1.0, math.log(labour), math.log(capital)])

            def output(p):
                return math.exp(p @ logs)

            def put(quantity, value):
                figures.append([errors, quantity, number, repr(float(value))])

            def positive(name, function):
                value, log_se = function(theta), se(lambda p: math.log(function(p)))
                put(name + "_se", se(function))
                put(name + "_lower", value * math.exp(-t * log_se))
                put(name + "_upper", value * math.exp(t * log_se))

            positive("output", output)
            positive("mean_output", lambda p: smearing * output(p))
            positive("marginal_L", lambda p: p[1] * output(p) / labour)
            positive("marginal_C", lambda p: p[2] * output(p) / capital)
            log_se = se(lambda p: p @ logs)
            put("prediction_lower", output(theta) * math.exp(-t * math.sqrt(log_se ** 2 + result.scale)))
            put("prediction_upper", output(theta) * math.exp(t * math.sqrt(log_se ** 2 + result.scale)))
            target, wage_l, wage_c = PLANS[number]
            wages = np.array([wage_l, wage_c])

            def amount(p, i):
                # ln y = ln A + sum b_j (ln b_j + ln lam - ln w_j)  =>  ln lam
                b = p[1:]
                log_lam = (math.log(target) - p[0] - float(b @ (np.log(b) - np.log(wages)))) / float(b.sum())
                return b[i] / wages[i] * math.exp(log_lam)

            positive("least_cost_L", lambda p: amount(p, 0))
            positive("least_cost_C", lambda p: amount(p, 1))

            def cost(p):
                return wage_l * amount(p, 0) + wage_c * amount(p, 1)

            def marginal_cost(p):
                return wage_l * amount(p, 0) / (p[1] * target)

            positive("cost_total", cost)
            positive("cost_marginal", marginal_cost)
            positive("cost_average", lambda p: cost(p) / target)
            positive("tfp", lambda p: OBSERVED[number] / output(p))
            positive("mrts_LC", lambda p: (p[1] / labour) / (p[2] / capital))
            budget, price_l, price_c = BUDGETS[number]

            def plan(p):
                share = optimize.brentq(lambda s: p[1] / s - p[2] / (1 - s), 1e-12, 1 - 1e-12, xtol=1e-15)
                amounts = np.array([share * budget / price_l, (1 - share) * budget / price_c])
                return np.append(amounts, math.exp(p[0] + p[1:] @ np.log(amounts)))

            for index, name in enumerate(("budget_L", "budget_C", "budget_output")):
                positive(name, lambda p, index=index: plan(p)[index])
            linear = (("elasticity_C", lambda p: p[2]), ("scale", lambda p: p[1] + p[2]),
                      ("second_LC", lambda p: p[1] * p[2] * output(p) / (labour * capital)),
                      ("second_LL", lambda p: p[1] * (p[1] - 1) * output(p) / labour ** 2),
                      ("cost_elasticity", lambda p: marginal_cost(p) * target / cost(p)),
                      ("cost_scale", lambda p: cost(p) / (marginal_cost(p) * target)))
            for name, function in linear:
                put(name + "_se", se(function))
                put(name + "_lower", function(theta) - t * se(function))
                put(name + "_upper", function(theta) + t * se(function))

    reference_script.write_figures(output_path, ["errors", "quantity", "bundle", "value"], figures)
    return 0


if __name__ == "__main__":
    sys.exit(main())
