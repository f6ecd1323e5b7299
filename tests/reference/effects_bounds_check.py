#!/usr/bin/python3
"""Recomputes the standard errors and bounds of the evaluators' ln A under group effects and of
PRODTFP with periods (issue 20) by statsmodels OLS of the explicit dummy-variable regression.

Usage: /usr/bin/python3 effects_bounds_check.py DATA_DIR OUTPUT_CSV

Data: Munnell's (1990) US state panel, tests/data/us_states_produc_1970_1986.csv (816 rows, 48
states x 17 years; see tests/data/README.md): output gsp, inputs pcap, pc and emp, the control
unemp, the groups state, the periods year. Three Cobb-Douglas fits (MODELS):
- "fixed_trend": ln gsp on one dummy per state (no constant), ln pcap, ln pc, ln emp, unemp and
  year - 1970; errors classical, hc1, hc3 and cluster (by state);
- "two_way": ln gsp on one dummy per state, ln pcap, ln pc, ln emp, unemp and one dummy per year
  after 1970; errors classical, hc1 and cluster;
- "trend": ln gsp on a constant, ln pcap, ln pc, ln emp, unemp and year - 1970; errors classical
  and cluster;
- "fixed_unbalanced": "fixed_trend" on the file's rows after the first DROPPED (the sixth state then
  keeps 2 of its 17 rows, the 42 after it all 17), so that the states' weights n_g / n differ;
  errors classical and cluster;
- "fixed_constant_returns": "fixed_trend" with constant returns imposed, ln(gsp/emp) on the
  dummies, ln(pcap/emp), ln(pc/emp), unemp and year - 1970 (b_emp = 1 - b_pcap - b_pc, so
  ln Y = s + b_pcap ln(pcap/emp) + b_pc ln(pc/emp) + ln emp); errors classical and cluster.
The evaluators' ln A is s = sum_g (n_g / n) alpha_g + c mean(unemp) + lambda (1986 - 1970) (fixed,
trend), + delta_1986 instead of the trend (two-way), and beta_0 + c mean(unemp) + lambda 16
without effects: s = w'beta, se(s) = sqrt(w'Vw) with V = cov_params(). Every figure below is
linear in beta (on the log scale for output and TFP), so its gradient is exact.
Errors as the core (README, "Degrees of freedom under effects"): classical, HC1 and HC3 of
statsmodels on the dummy-variable regression (its HC3 leverages hold each state's 1/n_g); the
cluster covariance of statsmodels (CR1, G/(G-1) (n-1)/(n-K), K all the regression's parameters)
times (n-K)/(n-K+G-1) under effects, because the core's CR1 factor leaves out the G - 1 state
effects nested in the clusters (least_squares.hpp, absorbedNestedInClusters); t(n-K), or t(G-1)
under cluster errors, at 0.95.
Figures: scale_value and scale_se (s), trend_se (lambda) and trend_scale_cov (Cov(lambda, s)) with a
trend; at each of BUNDLES output_se/_lower/_upper (PRODOUTPUT: exp(ln Y -+ t se)); with a trend at
each bundle tfp_period_se/_lower/_upper (PRODTFP with periods: ln TFP = ln Y_obs - s -
lambda (t - 1986) - b' ln x, OBSERVED and PERIODS invented).

Writes one figure per line: model,errors,quantity,bundle,value. Exits with 77 (the CTest skip code)
when the libraries cannot be imported, leaving no OUTPUT_CSV behind.
"""

import csv
import math
import os
import sys

LEVEL = 0.95
BUNDLES = [(15000.0, 35000.0, 1000.0), (25000.0, 60000.0, 2000.0), (8000.0, 20000.0, 500.0)]  # (pcap, pc, emp)
OBSERVED = [35000.0, 60000.0, 15000.0]  # one state's output at each bundle (PRODTFP)
PERIODS = [1975.0, 1980.0, 1986.0]      # the period of each of those rows
MODELS = {"fixed_trend": ("classical", "hc1", "hc3", "cluster"), "two_way": ("classical", "hc1", "cluster"),
          "trend": ("classical", "cluster"), "fixed_unbalanced": ("classical", "cluster"),
          "fixed_constant_returns": ("classical", "cluster")}
DROPPED = 100
COV_TYPES = {"classical": "nonrobust", "hc1": "HC1", "hc3": "HC3", "cluster": "cluster"}


def read_panel(data_dir, np, dropped):
    with open(os.path.join(data_dir, "us_states_produc_1970_1986.csv"), newline="") as handle:
        rows = list(csv.DictReader(handle))[dropped:]
    column = lambda name: np.array([float(row[name]) for row in rows])
    states = sorted(set(row["state"] for row in rows))
    group = np.array([states.index(row["state"]) for row in rows])
    return (np.log(column("gsp")), np.log(np.column_stack([column(name) for name in ("pcap", "pc", "emp")])),
            column("unemp"), column("year"), group)


def design_and_weights(np, model, logs, unemp, year, group):
    """The dummy-variable design, the weights w of s = w'beta, the positions of b (the columns of
    `logs`) and of lambda (None without a trend), and the number of state dummies nested in the
    clusters."""
    n, inputs = len(unemp), logs.shape[1]
    if model == "trend":
        leading = np.ones((n, 1))
        leading_weights = np.array([1.0])
    else:
        states = group.max() + 1
        leading = np.zeros((n, states))
        leading[np.arange(n), group] = 1.0
        leading_weights = leading.sum(axis=0) / n  # n_g / n
    columns = [leading, logs, unemp[:, None]]
    extra_weights = [0.0] * inputs + [float(unemp.mean())]
    trend = None
    if model == "two_way":
        years = sorted(set(year))
        dummies = np.column_stack([(year == value).astype(float) for value in years[1:]])
        columns.append(dummies)
        extra_weights += [0.0] * (len(years) - 2) + [1.0]  # the latest year's effect
    else:
        columns.append((year - year.min())[:, None])
        extra_weights.append(float(year.max() - year.min()))
        trend = leading.shape[1] + inputs + 1
    design = np.column_stack(columns)
    weights = np.concatenate([leading_weights, extra_weights])
    return design, weights, leading.shape[1], trend, (leading.shape[1] - 1 if model != "trend" else 0)


def fit(sm, np, y, design, errors, group, nested):
    """(beta, V, degrees of freedom of t) as the core states them."""
    kind = COV_TYPES[errors]
    model = sm.OLS(y, design)
    if kind == "cluster":
        result = model.fit(cov_type="cluster", cov_kwds={"groups": group}, use_t=True)
        n, parameters = design.shape
        cov = np.asarray(result.cov_params()) * (n - parameters) / (n - parameters + nested)
        return np.asarray(result.params), cov, float(group.max())
    result = model.fit(cov_type=kind, use_t=True) if kind != "nonrobust" else model.fit()
    return np.asarray(result.params), np.asarray(result.cov_params()), float(result.df_resid)


def main():
    sys.path.insert(0, os.path.dirname(os.path.abspath(__file__)))
    import reference_script

    opened = reference_script.start(__doc__)
    if isinstance(opened, int):
        return opened
    data_dir, output_path, np, sm, stats = opened

    figures = []
    for model, kinds in MODELS.items():
        y, log_inputs, unemp, year, group = read_panel(data_dir, np, DROPPED if model == "fixed_unbalanced" else 0)
        ratios = model == "fixed_constant_returns"  # the regression in logs of ratios to emp
        if ratios:
            y, log_inputs = y - log_inputs[:, 2], log_inputs[:, :2] - log_inputs[:, 2:]
        design, weights, first_input, trend, nested = design_and_weights(np, model, log_inputs, unemp, year, group)
        for errors in kinds:
            beta, cov, df = fit(sm, np, y, design, errors, group, nested)
            t = stats.t.ppf(0.5 + LEVEL / 2, df)

            def put(quantity, number, value):
                figures.append([model, errors, quantity, number, repr(float(value))])

            def linear(gradient):
                return float(gradient @ beta), math.sqrt(float(gradient @ cov @ gradient))

            def put_log_bounds(name, number, gradient, offset):
                log_value, spread = linear(gradient)
                value = math.exp(log_value + offset)
                put(name + "_se", number, value * spread)
                put(name + "_lower", number, value * math.exp(-t * spread))
                put(name + "_upper", number, value * math.exp(t * spread))

            scale, scale_se = linear(weights)
            put("scale_value", 0, scale)
            put("scale_se", 0, scale_se)
            if trend is not None:
                put("trend_se", 0, math.sqrt(cov[trend, trend]))
                put("trend_scale_cov", 0, float(cov[trend] @ weights))
            for number, bundle in enumerate(BUNDLES):
                gradient = weights.copy()
                log_bundle = np.log(bundle)
                offset = log_bundle[2] if ratios else 0.0  # ln emp, its exponent 1 - the others'
                gradient[first_input:first_input + log_inputs.shape[1]] += \
                    log_bundle[:2] - log_bundle[2] if ratios else log_bundle
                put_log_bounds("output", number, gradient, offset)
                if trend is not None:
                    tfp = -gradient
                    tfp[trend] -= PERIODS[number] - year.max()
                    put_log_bounds("tfp_period", number, tfp, math.log(OBSERVED[number]) - offset)

    reference_script.write_figures(output_path, ["model", "errors", "quantity", "bundle", "value"], figures)
    return 0


if __name__ == "__main__":
    sys.exit(main())
