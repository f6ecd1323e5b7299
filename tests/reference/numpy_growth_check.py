#!/usr/bin/python3
"""Recomputes index numbers and growth accounts with numpy, for the core to be compared against.

Usage: /usr/bin/python3 numpy_growth_check.py DATA_DIR OUTPUT_CSV

On the rice farm panel (tests/data/rice_farms_panel.csv; 171 farms x 6 seasons, Feng and Horrace
2012, as distributed in plm 2.6): for each farm, its six seasons in the file's order are periods
1-6; inputs seed, urea and labour (totlabor) with prices pseed, purea and wage; output goutput.
Cost shares are p*q / sum(p*q) per season. Written per farm:
  - the chained quantity indexes of the three inputs, base 1: Tornqvist from the shares;
    Laspeyres, Paasche and Fisher from PRICES AND QUANTITIES (sum p_{t-1} q_t / sum p_{t-1} q_{t-1},
    sum p_t q_t / sum p_t q_{t-1}, their geometric mean), not from the shares, so the core's share
    form is checked against the textbook definition;
  - the growth account with the cost shares, Tornqvist-averaged over adjacent seasons.
On Cobb & Douglas (1928) (tests/data/cobb_douglas_1928.csv): the growth account of output P with
inputs L and C weighted by the published technology P = 1.01 L^0.75 C^0.25, and the TFP levels
P / (1.01 L^0.75 C^0.25). These figures are recomputed here; none of them is published.

Growth is the natural-log difference; with weights w of an interval and nu = sum(w):
contribution_i = w_i/nu * dln x_i, scale effect = (nu - 1) * sum(w_i/nu * dln x_i), TFP growth =
dln Y - contributions - scale effect; the total row: ln Y_n - ln Y_1, the summed contributions and
scale effects, and the residual.

OUTPUT_CSV rows: dataset,series,quantity,period,column,value. Run with Debian's /usr/bin/python3.
Exits with 77 (the CTest skip code) when numpy cannot be imported, leaving no OUTPUT_CSV behind.
"""

import csv
import itertools
import os
import sys

import reference_script  # this folder: command line, skip code, writing the figures
RICE_INPUTS = [("seed", "pseed"), ("urea", "purea"), ("totlabor", "wage")]


def growth_account(np, output, quantities, period_weights):
    """Rows (period, [output growth, contributions..., scale effect, TFP growth]) for periods 2..n, then
    ("total", [...])."""
    log_y = np.log(output)
    log_x = np.log(quantities)
    weights = 0.5 * (period_weights[:-1] + period_weights[1:])
    nu = weights.sum(axis=1)
    dy = np.diff(log_y)
    dx = np.diff(log_x, axis=0)
    contributions = weights / nu[:, None] * dx
    scale = (nu - 1.0) * contributions.sum(axis=1)
    tfp = dy - contributions.sum(axis=1) - scale
    rows = []
    for t in range(len(dy)):
        rows.append((str(t + 2), [dy[t]] + list(contributions[t]) + [scale[t], tfp[t]]))
    total_dy = log_y[-1] - log_y[0]
    total_contributions = contributions.sum(axis=0)
    total_scale = scale.sum()
    total_tfp = total_dy - total_contributions.sum() - total_scale
    rows.append(("total", [total_dy] + list(total_contributions) + [total_scale, total_tfp]))
    return rows


def chained(np, links):
    return np.concatenate([[1.0], np.cumprod(links)])


def quantity_indexes(np, quantities, prices, shares):
    q0, q1 = quantities[:-1], quantities[1:]
    p0, p1 = prices[:-1], prices[1:]
    laspeyres = (p0 * q1).sum(axis=1) / (p0 * q0).sum(axis=1)
    paasche = (p1 * q1).sum(axis=1) / (p1 * q0).sum(axis=1)
    tornqvist = np.exp((0.5 * (shares[:-1] + shares[1:]) * np.log(q1 / q0)).sum(axis=1))
    return {"tornqvist": chained(np, tornqvist), "laspeyres": chained(np, laspeyres),
            "paasche": chained(np, paasche), "fisher": chained(np, np.sqrt(laspeyres * paasche))}


def rice_figures(np, path):
    with open(path, newline="") as handle:
        rows = list(csv.DictReader(handle))
    out = []
    for farm, seasons in itertools.groupby(rows, key=lambda row: row["id"]):
        seasons = list(seasons)
        quantities = np.array([[float(s[q]) for q, _ in RICE_INPUTS] for s in seasons])
        prices = np.array([[float(s[p]) for _, p in RICE_INPUTS] for s in seasons])
        output = np.array([float(s["goutput"]) for s in seasons])
        costs = prices * quantities
        shares = costs / costs.sum(axis=1)[:, None]
        for method, index in quantity_indexes(np, quantities, prices, shares).items():
            for t, value in enumerate(index):
                out.append(("rice_farms", farm, "index_" + method, str(t + 1), 0, value))
        for period, values in growth_account(np, output, quantities, shares):
            for column, value in enumerate(values):
                out.append(("rice_farms", farm, "growth", period, column, value))
    return out


def cobb_douglas_figures(np, path):
    with open(path, newline="") as handle:
        rows = list(csv.DictReader(handle))
    output = np.array([float(r["P"]) for r in rows])
    quantities = np.array([[float(r["L"]), float(r["C"])] for r in rows])
    exponents = np.array([0.75, 0.25])  # Cobb & Douglas (1928), published
    weights = np.tile(exponents, (len(rows), 1))
    out = []
    for period, values in growth_account(np, output, quantities, weights):
        for column, value in enumerate(values):
            out.append(("cobb_douglas_1928", "published_technology", "growth", period, column, value))
    levels = output / (1.01 * np.prod(quantities ** exponents, axis=1))
    for t, value in enumerate(levels):
        out.append(("cobb_douglas_1928", "published_technology", "tfp_level", str(t + 1), 0, value))
    return out


def main():
    data_dir, output_path = reference_script.paths(__doc__)
    try:
        import numpy as np
    except ImportError as error:
        return reference_script.skipped("numpy", error)

    figures = rice_figures(np, os.path.join(data_dir, "rice_farms_panel.csv"))
    figures += cobb_douglas_figures(np, os.path.join(data_dir, "cobb_douglas_1928.csv"))
    reference_script.write_figures(output_path, ["dataset", "series", "quantity", "period", "column", "value"],
                                   [row[:-1] + (repr(float(row[-1])),) for row in figures])
    print(f"numpy {np.__version__}: {len(figures)} figures written to {output_path}")
    return 0


if __name__ == "__main__":
    sys.exit(main())
