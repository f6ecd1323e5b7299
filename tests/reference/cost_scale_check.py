#!/usr/bin/python3
"""Recomputes the bounds PRODCOST gives on a cost table whose constant is shifted by controls or a
trend, and PRODEFFICIENTSCALE's standard error and bounds, with statsmodels OLS.

Usage: /usr/bin/python3 cost_scale_check.py DATA_DIR OUTPUT_CSV

Data: rice_farms_panel.csv (Feng and Horrace 2012, as in plm 2.6 RiceFarms; tests/data/README.md):
cost, output and prices as in cost_check.py; control size, trend the farm's season (cost_panel_check.py).

Shifted constant (models "cd_control" and "translog_trend_control" of cost_panel_check.py and a
translog with the trend alone, "translog_trend"; classical errors): the evaluators' constant s = constant + c·mean(size) (+ λ·(6 − 1) with the trend, the
latest season less the first). Its row J_s over the regression's coefficients b replaces the
constant's row of the full form's map, so (s, θ₁ …) = J·b + c₀ with covariance J·V_b·Jᵀ, V_b the
statsmodels covariance. At the data rows cost_check.POINTS: the standard errors of total, average
and marginal cost and the lower bound of total cost (cost_check.bound_figures: complex-step
gradient of ln q, scipy's t quantile on n − p).

Efficient scale (PRODEFFICIENTSCALE): for the plain translog (classical and HC3, cost_check.py's
fits), "translog_trend_control" and "translog_trend", at the prices of each row of POINTS, y* where the cost
elasticity is 1: ln y* = (1 − β_y − Σᵢ βᵢ_y ln wᵢ)/β_yy (closed form; only where β_yy > 0, the
elasticity rising with output, else whether there is one: average cost then has a top), its standard error
y*·√(gᵀVg) with g the complex-step gradient of ln y* in θ, and the bounds y*·exp(∓t·√(gᵀVg)).

Writes one figure per line: dataset,form,quantity,index,value. Exits with 77 (the CTest skip code)
when statsmodels cannot be imported, leaving no OUTPUT_CSV behind.
"""

import sys

import cost_check  # this folder: the data, the normalised regression, the bounds of PRODCOST
import cost_panel_check  # this folder: the panel columns and the models with a control and a trend
import reference_script  # this folder: command line, skip code, writing the figures

# name -> cost_panel_check.py's spec: (form, control, groups, effects, trend, covariance)
SHIFTED_MODELS = {
    "cd_control": cost_panel_check.MODELS["cd_control"],
    "translog_trend_control": cost_panel_check.MODELS["translog_trend_control"],
    "translog_trend": ("translog", False, False, "none", True, "classical"),  # β_yy > 0: an efficient scale
}
LAST_SEASON_LESS_FIRST = 5.0


def shifted_parameters(np, fit, rows, trend_column, size, control):
    """(s, θ₁ …) and their covariance: the constant's row of θ = R b + c replaced by s's."""
    matrix = np.array([row for row, _ in rows])
    constants = np.array([constant for _, constant in rows])
    shifted = matrix[0].copy()
    if control:
        shifted += matrix[-1] * size.mean()  # the control is θ's last entry
    if trend_column is not None:
        shifted[trend_column] += LAST_SEASON_LESS_FIRST
    matrix[0] = shifted
    return matrix @ fit.params + constants, matrix @ fit.cov_params() @ matrix.T


def efficient_scale_figures(np, put, theta, covariance, df, prices):
    """ln y* by the closed form at the prices of each row of POINTS, θ in table order."""
    from scipy import stats
    k = prices.shape[1]
    critical = stats.t.ppf(0.975, df)
    curvature_at, price_output_at = 2 + k, 3 + k + k * (k + 1) // 2

    def log_scale(t, w):
        return (1.0 - t[1] - t[price_output_at:price_output_at + k] @ np.log(w)) / t[curvature_at]

    for index, row in enumerate(cost_check.POINTS):
        w = prices[row]
        put("scale_exists", 1.0 if theta[curvature_at] > 0 else 0.0, index)  # else ε = 1 is average cost's top
        if theta[curvature_at] <= 0:
            continue
        scale = float(np.exp(log_scale(theta, w)))
        spread = reference_script.complex_step_standard_error(np, lambda t: log_scale(t, w), theta, covariance)
        put("scale_value", scale, index)
        put("scale_se", scale * spread, index)
        put("scale_lower", scale * np.exp(-critical * spread), index)
        put("scale_upper", scale * np.exp(critical * spread), index)


def plain_translog(np, sm, cov_type, data):
    """θ in table order and its covariance for cost_check.py's translog fit."""
    cost, output, prices = data
    log_prices = np.log(prices)
    relative = log_prices[:, :-1] - log_prices[:, -1:]
    design, rows = cost_check.regression(np, "translog", np.log(output), relative)
    fit = sm.OLS(np.log(cost) - log_prices[:, -1], design).fit(cov_type=cov_type, use_t=True)
    matrix = np.array([row for row, _ in rows])
    theta = matrix @ fit.params + np.array([constant for _, constant in rows])
    return theta, matrix @ fit.cov_params() @ matrix.T, fit.df_resid


def main():
    opening = cost_panel_check.rice_farm_opening(__doc__)
    if isinstance(opening, int):
        return opening
    np, statsmodels, sm = opening.np, opening.statsmodels, opening.sm
    data, panel, rows, putter = opening.data, opening.panel, opening.rows, opening.putter
    _, output, prices = data

    for name, spec in SHIFTED_MODELS.items():
        fit, _, theta_rows, trend_column, _, _ = cost_panel_check.model_fit(np, sm, spec, data, panel)
        theta, covariance = shifted_parameters(np, fit, theta_rows, trend_column, panel[2], spec[1])
        cost_check.bound_figures(np, putter(name), spec[0], theta, covariance, fit.df_resid, output, prices)
        if spec[0] == "translog":
            efficient_scale_figures(np, putter(name), theta, covariance, fit.df_resid, prices)
    for name, cov_type in [("translog", "nonrobust"), ("translog_hc3", "HC3")]:
        theta, covariance, df = plain_translog(np, sm, cov_type, data)
        efficient_scale_figures(np, putter(name), theta, covariance, df, prices)
    reference_script.write_figures(opening.output_path, ["dataset", "form", "quantity", "index", "value"], rows)
    print(f"statsmodels {statsmodels.__version__}: {len(rows)} cost bound figures written to {opening.output_path}")
    return 0


if __name__ == "__main__":
    sys.exit(main())
