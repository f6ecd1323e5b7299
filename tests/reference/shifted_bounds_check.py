#!/usr/bin/python3
"""Recomputes the standard errors and bounds of output and a marginal product (issue 20) of fits
whose evaluators use a shifted ln A (controls at their means, a trend at its latest period), with
statsmodels and numpy.

Usage: /usr/bin/python3 shifted_bounds_check.py DATA_DIR OUTPUT_CSV

Data: Munnell's (1990) US state panel, tests/data/us_states_produc_1970_1986.csv (816 rows; see
tests/data/README.md): output gsp, inputs pcap, pc and emp, the control unemp, the periods year.
Three fits (MODELS), each by statsmodels OLS with classical ("nonrobust") and HC1 covariance (use_t,
as the core):
- "cd_trend": ln gsp on a constant, ln pcap, ln pc, ln emp, unemp and year - 1970 (the trend from
  the first period), beta = (ln A, b_pcap, b_pc, b_emp, c, lambda);
- "cd_control": the same without the trend;
- "translog_control": the translog in the three inputs with the 1/2 convention (a constant, the
  three ln x_i, then for i <= j in the order 11, 12, 13, 22, 23, 33 the column ln x_i ln x_j, halved
  when i = j) and unemp.
The evaluators take ln A at the control's mean and, with a trend, at the latest period:
ln Y(x) = beta_0 + c mean(unemp) [+ lambda (1986 - 1970)] + (the form's terms in ln x). Each
quantity q(beta) is written as such a function of the whole regression vector beta, and gets a
numerical gradient in numpy by the complex step, dq/dbeta_j = Im q(beta + i h e_j) / h with
h = 1e-20 (Squire and Trapp 1998, SIAM Review 40(1), 110-112; exact to rounding, as
form_bounds_check.py explains for the translog's near-collinear parameters); se = sqrt(grad' V grad)
with V = cov_params(). Bounds at 0.95 with scipy.stats.t(df_resid), on the log scale for the
positive quantities: output Y and the marginal product of emp, MP = e_emp Y / emp (e_emp = b_emp, or
the translog's a_emp + sum_j b_emp,j ln x_j), exp(ln q -+ t se(ln q)); one new plant's output:
exp(ln Y -+ t sqrt(se(ln Y)^2 + scale)), scale = RSS/(n - p). BUNDLES are invented, inside the
data's range.
For the two Cobb-Douglas fits also the decisions, with s the evaluators' ln A and b the exponents
(PLANS, BUDGETS and OBSERVED invented, numbered as the bundles): the least-cost amount of emp for
output y at prices w from the first-order conditions, x_i = (b_i / w_i) lam with
ln y = s + sum_j b_j (ln b_j + ln lam - ln w_j) solved for ln lam, and the least total cost
sum_i w_i x_i (PRODLEASTCOST, PRODCOST); the output of the budget plan, whose first-order conditions
b_i / x_i = mu w_i with sum_i w_i x_i = B give x_i = (b_i / sum_j b_j) B / w_i (PRODBUDGET); the TFP
of an observed output Y_obs / Y(x) (PRODTFP, without periods): all positive, on the log scale; the
cross second partial b_pcap b_emp Y / (pcap emp) (PRODSECOND): q -+ t se.

Writes one figure per line: model,errors,quantity,bundle,value. Exits with 77 (the CTest skip code)
when the libraries cannot be imported, leaving no OUTPUT_CSV behind.
"""

import cmath
import csv
import math
import os
import sys

LEVEL = 0.95
COMPLEX_STEP = 1e-20
BUNDLES = [(15000.0, 35000.0, 1000.0), (25000.0, 60000.0, 2000.0), (8000.0, 20000.0, 500.0)]  # (pcap, pc, emp)
PLANS = [(30000.0, (0.1, 0.1, 20.0)), (60000.0, (0.2, 0.1, 30.0)), (15000.0, (0.1, 0.2, 10.0))]  # (y, w)
BUDGETS = [(40000.0, (0.1, 0.1, 20.0)), (80000.0, (0.2, 0.1, 30.0)), (20000.0, (0.1, 0.2, 10.0))]  # (B, w)
OBSERVED = [35000.0, 60000.0, 15000.0]  # one state's output at each bundle (PRODTFP)
MODELS = ("cd_trend", "cd_control", "translog_control")
PAIRS = [(0, 0), (0, 1), (0, 2), (1, 1), (1, 2), (2, 2)]


def read_panel(data_dir, np):
    with open(os.path.join(data_dir, "us_states_produc_1970_1986.csv"), newline="") as handle:
        rows = list(csv.DictReader(handle))
    column = lambda name: np.array([float(row[name]) for row in rows])
    return (np.log(column("gsp")), np.log(np.column_stack([column(name) for name in ("pcap", "pc", "emp")])),
            column("unemp"), column("year"))


def design_of(np, model, logs, unemp, year):
    columns = [np.ones(len(unemp))] + [logs[:, i] for i in range(3)]
    if model == "translog_control":
        columns += [(0.5 if i == j else 1.0) * logs[:, i] * logs[:, j] for i, j in PAIRS]
    columns.append(unemp)
    if model == "cd_trend":
        columns.append(year - year.min())
    return np.column_stack(columns)


def log_output_and_elasticity(model, beta, logs, shift_weights):
    """ln Y at the bundle's logs and the output elasticity of emp, for the regression vector beta;
    shift_weights gives the evaluators' ln A as sum_j w_j beta_j."""
    log_scale = sum(weight * beta[j] for j, weight in shift_weights)
    log_output = log_scale + sum(beta[1 + i] * logs[i] for i in range(3))
    elasticity = beta[3]
    if model == "translog_control":
        for c, (i, j) in enumerate(PAIRS):
            log_output += (0.5 if i == j else 1.0) * beta[4 + c] * logs[i] * logs[j]
            if i == 2:  # (emp, emp): d/d ln emp of 1/2 b l^2
                elasticity += beta[4 + c] * logs[j]
            elif j == 2:
                elasticity += beta[4 + c] * logs[i]
    return log_output, elasticity


def cobb_douglas_decisions(number, shift_weights):
    """(name, on the log scale?, function of beta) for the decision figures at bundle `number`: the
    logarithm of each positive figure, the second partial itself."""
    bundle, (target, prices), (budget, budget_prices) = BUNDLES[number], PLANS[number], BUDGETS[number]
    logs = [math.log(amount) for amount in bundle]

    def log_scale(p):
        return sum(weight * p[j] for j, weight in shift_weights)

    def log_output(p):
        return log_scale(p) + sum(p[1 + i] * logs[i] for i in range(3))

    def log_amount(p, i):
        exponents = p[1:4]
        log_lam = (math.log(target) - log_scale(p) -
                   sum(exponents[j] * (cmath.log(exponents[j]) - math.log(prices[j])) for j in range(3))) / sum(exponents)
        return cmath.log(exponents[i]) - math.log(prices[i]) + log_lam

    def log_cost(p):
        return cmath.log(sum(prices[i] * cmath.exp(log_amount(p, i)) for i in range(3)))

    def log_budget_output(p):
        exponents = p[1:4]
        return log_scale(p) + sum(exponents[i] * cmath.log(exponents[i] / sum(exponents) * budget / budget_prices[i])
                                  for i in range(3))

    return [("least_cost_emp", True, lambda p: log_amount(p, 2)), ("cost_total", True, log_cost),
            ("budget_output", True, log_budget_output),
            ("tfp", True, lambda p: math.log(OBSERVED[number]) - log_output(p)),
            ("second_pcap_emp", False, lambda p: p[1] * p[3] * cmath.exp(log_output(p)) / (bundle[0] * bundle[2]))]


def main():
    sys.path.insert(0, os.path.dirname(os.path.abspath(__file__)))
    import reference_script

    opened = reference_script.start(__doc__)
    if isinstance(opened, int):
        return opened
    data_dir, output_path, np, sm, stats = opened

    y, log_inputs, unemp, year = read_panel(data_dir, np)
    figures = []
    for model in MODELS:
        design = design_of(np, model, log_inputs, unemp, year)
        control = design.shape[1] - (2 if model == "cd_trend" else 1)
        shift_weights = [(0, 1.0), (control, float(unemp.mean()))]
        if model == "cd_trend":
            shift_weights.append((control + 1, float(year.max() - year.min())))
        for errors, result in reference_script.classical_and_hc1_fits(sm, y, design):
            beta, cov, t, _ = reference_script.fit_inference(np, stats, result, LEVEL)

            def se(function):
                return reference_script.complex_step_standard_error(np, function, beta, cov, COMPLEX_STEP)

            for number, bundle in enumerate(BUNDLES):
                logs = [math.log(amount) for amount in bundle]

                def put(quantity, value):
                    figures.append([model, errors, quantity, number, repr(float(value))])

                def log_output(p):
                    return log_output_and_elasticity(model, p, logs, shift_weights)[0]

                def log_marginal(p):
                    ln_y, elasticity = log_output_and_elasticity(model, p, logs, shift_weights)
                    return cmath.log(elasticity) + ln_y - logs[2]

                quantities = [("output", True, log_output), ("marginal_emp", True, log_marginal)]
                if model != "translog_control":
                    quantities += cobb_douglas_decisions(number, shift_weights)
                for name, log_scale, function in quantities:
                    value, spread = function(beta.astype(complex)).real, se(function)
                    if log_scale:
                        value = math.exp(value)
                        put(name + "_se", value * spread)
                        put(name + "_lower", value * math.exp(-t * spread))
                        put(name + "_upper", value * math.exp(t * spread))
                    else:
                        put(name + "_se", spread)
                        put(name + "_lower", value - t * spread)
                        put(name + "_upper", value + t * spread)
                output, log_se = math.exp(log_output(beta)), se(log_output)
                spread = math.sqrt(log_se ** 2 + result.scale)
                put("prediction_lower", output * math.exp(-t * spread))
                put("prediction_upper", output * math.exp(t * spread))

    reference_script.write_figures(output_path, ["model", "errors", "quantity", "bundle", "value"], figures)
    return 0


if __name__ == "__main__":
    sys.exit(main())
