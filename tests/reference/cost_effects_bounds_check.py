#!/usr/bin/python3
"""Recomputes the bounds PRODCOST gives on a cost table fitted under group effects ("fixed",
"two-way"), by statsmodels OLS of the explicit dummy-variable cost regression.

Usage: /usr/bin/python3 cost_effects_bounds_check.py DATA_DIR OUTPUT_CSV

Data: rice_farms_panel.csv (Feng and Horrace 2012, as in plm 2.6 RiceFarms; tests/data/README.md):
cost, output and prices as in cost_check.py; groups = farm (id), periods = the farm's season 1 to 6,
control size (cost_panel_check.py, whose model_fit builds the regression: a constant, the form's
columns, the control, the trend season - 1, one dummy per farm after the first and, two-way, one
per season after the first). Model "cd_fixed_unbalanced_cluster" drops the file's first DROPPED
rows (as incomplete rows), so that the first farm keeps 3 rows and the weights n_g / n differ; the
bounds are still taken at the data rows POINTS.

The evaluators' constant under effects ("constant for predictions") is the row-weighted mean farm
effect plus the control at its mean, plus lambda (6 - 1) with the trend, plus the last season's
effect under two-way effects: in the dummy-variable regression s = b_0 + sum_{g>=1} (n_g / n)
delta_g + c mean(size) (+ 5 lambda) (+ delta_6), a linear combination w'b. Its row w replaces the
constant's row of the full form's map, so (s, theta_1 ...) = J b + c_0 with covariance J V Jᵀ.
Errors: classical (statsmodels nonrobust, t on n - K) and cluster by farm: statsmodels' CR1
(G/(G-1) (n-1)/(n-K), K all the regression's parameters) times (n-K)/(n-K+G-1), because the core's
CR1 factor leaves out the G - 1 farm effects nested in the clusters (least_squares.hpp,
absorbedNestedInClusters; cost_panel_check.py does the same), t on G - 1.
At the data rows cost_check.POINTS: the standard errors of total, average and marginal cost, cost
elasticity and returns to scale, and the lower bound of total cost (cost_check.bound_figures:
numpy complex-step gradient of ln q, scipy's t quantile).

Writes one figure per line: dataset,form,quantity,index,value. Exits with 77 (the CTest skip code)
when statsmodels cannot be imported, leaving no OUTPUT_CSV behind.
"""

import sys

import cost_check  # this folder: the data and the bounds of PRODCOST
import cost_panel_check  # this folder: the panel columns and the dummy-variable regression
import reference_script  # this folder: command line, skip code, writing the figures

# name -> cost_panel_check.py's spec: (form, control, groups, effects, trend, covariance)
EFFECTS_MODELS = {
    "cd_fixed": ("cobb-douglas", False, True, "fixed", False, "classical"),
    "cd_fixed_control_cluster": ("cobb-douglas", True, True, "fixed", False, "cluster"),
    "cd_two_way": ("cobb-douglas", False, True, "two-way", False, "classical"),
    "cd_two_way_cluster": ("cobb-douglas", True, True, "two-way", False, "cluster"),
    "translog_fixed_trend": ("translog", False, True, "fixed", True, "classical"),
    "translog_fixed_trend_cluster": ("translog", True, True, "fixed", True, "cluster"),
    "cd_fixed_unbalanced_cluster": ("cobb-douglas", True, True, "fixed", False, "cluster"),
}
UNBALANCED = "cd_fixed_unbalanced_cluster"  # on the file's rows after the first DROPPED
DROPPED = 3  # the first farm keeps 3 of its 6 rows, so the farms' weights n_g / n differ
LAST_SEASON_LESS_FIRST = 5.0


def shifted_parameters(np, spec, fit, used, rows, trend_column, slopes, panel):
    """(s, θ₁ …) and their covariance: the constant's row of θ = R b + c replaced by s's."""
    control, effects = spec[1], spec[3]
    farms, _, size = panel
    matrix = np.array([row for row, _ in rows])
    constants = np.array([constant for _, constant in rows])
    shifted = matrix[0].copy()  # 1 at b_0, the first farm's effect
    groups = farms.max() + 1
    shares = np.bincount(farms, minlength=groups) / len(farms)  # n_g / n
    shifted[1 + slopes:1 + slopes + groups - 1] += shares[1:]  # the other farms' effects over the first
    if control:
        shifted += matrix[-1] * size.mean()  # the control is θ's last entry
    if trend_column is not None:
        shifted[trend_column] += LAST_SEASON_LESS_FIRST
    if effects == "two-way":
        shifted[-1] += 1.0  # the last season's effect, the design's last column
    matrix[0] = shifted
    covariance = np.asarray(fit.cov_params() if used is None else used)
    return matrix @ fit.params + constants, matrix @ covariance @ matrix.T


def main():
    opening = cost_panel_check.rice_farm_opening(__doc__)
    if isinstance(opening, int):
        return opening
    np, statsmodels, sm = opening.np, opening.statsmodels, opening.sm
    data, panel, rows, putter = opening.data, opening.panel, opening.rows, opening.putter
    _, output, prices = data

    for name, spec in EFFECTS_MODELS.items():
        dropped = DROPPED if name == UNBALANCED else 0

        def rows_of(columns):
            return tuple(column[dropped:] for column in columns)

        fit, used, theta_rows, trend_column, slopes, _ = cost_panel_check.model_fit(np, sm, spec, rows_of(data),
                                                                                  rows_of(panel))
        theta, covariance = shifted_parameters(np, spec, fit, used, theta_rows, trend_column, slopes, rows_of(panel))
        df = float(panel[0].max()) if spec[5] == "cluster" else fit.df_resid  # G − 1 under cluster errors
        put = putter(name)
        put("constant_for_predictions", theta[0])
        put("constant_for_predictions_se", np.sqrt(covariance[0, 0]))
        cost_check.bound_figures(np, put, spec[0], theta, covariance, df, output, prices)
    reference_script.write_figures(opening.output_path, ["dataset", "form", "quantity", "index", "value"], rows)
    print(f"statsmodels {statsmodels.__version__}: {len(rows)} cost bound figures under effects written to "
          f"{opening.output_path}")
    return 0


if __name__ == "__main__":
    sys.exit(main())
