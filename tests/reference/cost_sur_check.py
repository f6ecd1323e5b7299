#!/usr/bin/python3
"""Recomputes PRODCOSTFIT with `shares` (cost and share equations by iterated SUR) on the rice-farm
panel with an independent numpy implementation.

Usage: /usr/bin/python3 cost_sur_check.py DATA_DIR OUTPUT_CSV

Data: rice_farms_panel.csv (Feng and Horrace 2012, as in plm 2.6 RiceFarms; tests/data/README.md),
1026 rows: cost C = pseed*seed + purea*urea + wage*totlabor, output y = goutput, prices
w = (pseed, purea, wage), cost shares s_i = w_i x_i / C.

Method, written here from the textbook definitions (Zellner 1962; Greene, Econometric Analysis,
ch. 10; from memory) and parametrised differently from the core, so that the two meet only in the
answer: the parameters theta of the full form (constant, output, the k price coefficients, for the
translog output*output, the pairs i <= j, the price*output terms) enter the cost equation ln C with
the unnormalised log prices and the share equations s_i = beta_i + sum_j beta_ij ln w_j + beta_iy ln y
with all k shares but the one dropped; homogeneity (sum beta_i = 1, each row sum of beta_ij = 0,
sum beta_iy = 0) is imposed as linear restrictions R theta = q through the bordered (KKT) normal
equations of restricted GLS, and the covariance of theta is the top-left block of their inverse.
Iterated: Sigma = I first, then Sigma = E'E/n of the residuals, until theta changes by less than
1e-10 relative (the rounding floor of the iteration is near 1e-11 here). Log-likelihood
-(n m/2)(1 + ln 2 pi) - (n/2) ln det Sigma; R^2 of ln C from the cost equation's residuals.

Figures, for each form and each dropped share d = 0, 1, 2 (the core drops the last; all three must
agree with it, which is the invariance to the dropped share): params and bse of every theta, llf,
rsquared. One figure per line: dataset,form,quantity,index,value (form "<form>_drop<d>"). Exits
with 77 (the CTest skip code) when numpy cannot be imported.
"""

import csv
import math
import os
import sys


PRICES = ["pseed", "purea", "wage"]
QUANTITIES = ["seed", "urea", "totlabor"]


def read_data(data_dir, np):
    with open(os.path.join(data_dir, "rice_farms_panel.csv"), newline="") as handle:
        rows = list(csv.DictReader(handle))
    prices = np.array([[float(row[p]) for p in PRICES] for row in rows])
    quantities = np.array([[float(row[q]) for q in QUANTITIES] for row in rows])
    output = np.array([float(row["goutput"]) for row in rows])
    spending = prices * quantities
    cost = spending.sum(axis=1)
    return cost, output, prices, spending / cost[:, None]


def system(np, translog, log_output, log_prices):
    """Cost-equation design, the k share-equation designs, and the restrictions (R, q), in theta."""
    n, k = log_prices.shape
    pairs = [(i, j) for i in range(k) for j in range(i, k)] if translog else []
    p = 2 + k + ((1 + len(pairs) + k) if translog else 0)
    cost = np.zeros((n, p))
    cost[:, 0], cost[:, 1], cost[:, 2:2 + k] = 1.0, log_output, log_prices
    shares = [np.zeros((n, p)) for _ in range(k)]
    for i in range(k):
        shares[i][:, 2 + i] = 1.0
    restrictions, targets = [np.r_[np.zeros(2), np.ones(k), np.zeros(p - 2 - k)]], [1.0]
    if translog:
        yy = 2 + k
        cost[:, yy] = 0.5 * log_output ** 2
        for n_pair, (i, j) in enumerate(pairs):
            column = yy + 1 + n_pair
            cost[:, column] = (0.5 if i == j else 1.0) * log_prices[:, i] * log_prices[:, j]
            shares[i][:, column] = log_prices[:, j]
            if i != j:
                shares[j][:, column] = log_prices[:, i]
        first = yy + 1 + len(pairs)
        for i in range(k):
            cost[:, first + i] = log_prices[:, i] * log_output
            shares[i][:, first + i] = log_output
        for i in range(k):  # row sums of beta_ij
            row = np.zeros(p)
            for n_pair, pair in enumerate(pairs):
                if i in pair:
                    row[yy + 1 + n_pair] = 1.0
            restrictions.append(row)
            targets.append(0.0)
        row = np.zeros(p)
        row[first:first + k] = 1.0
        restrictions.append(row)
        targets.append(0.0)
    return cost, shares, np.array(restrictions), np.array(targets)


def restricted_gls(np, designs, responses, weights, restrictions, targets):
    p, r = designs[0].shape[1], restrictions.shape[0]
    normal, right = np.zeros((p, p)), np.zeros(p)
    for a, (xa, ya) in enumerate(zip(designs, responses)):
        for c, (xc, yc) in enumerate(zip(designs, responses)):
            normal += weights[a, c] * xa.T @ xc
            right += weights[a, c] * xa.T @ yc
    bordered = np.block([[normal, restrictions.T], [restrictions, np.zeros((r, r))]])
    inverse = np.linalg.inv(bordered)
    solution = inverse @ np.r_[right, targets]
    return solution[:p], inverse[:p, :p]


def iterated_sur(np, designs, responses, restrictions, targets):
    m, n = len(designs), len(responses[0])
    theta, _ = restricted_gls(np, designs, responses, np.eye(m), restrictions, targets)
    for _ in range(5000):
        residuals = np.column_stack([y - x @ theta for x, y in zip(designs, responses)])
        sigma = residuals.T @ residuals / n
        new, _ = restricted_gls(np, designs, responses, np.linalg.inv(sigma), restrictions, targets)
        change = np.max(np.abs(new - theta))
        theta = new
        if change <= 1e-10 * (1 + np.max(np.abs(theta))):
            break
    else:
        raise RuntimeError("iterated SUR did not converge")
    residuals = np.column_stack([y - x @ theta for x, y in zip(designs, responses)])
    sigma = residuals.T @ residuals / n
    theta, covariance = restricted_gls(np, designs, responses, np.linalg.inv(sigma), restrictions, targets)
    llf = -0.5 * n * m * (1 + math.log(2 * math.pi)) - 0.5 * n * math.log(np.linalg.det(sigma))
    return theta, covariance, residuals[:, 0], llf


def main():
    # Imported here, not at the top: run as a script, reference_script.py sits beside this file on
    # the path; tests/integration/test_cost_in_calc.py imports this module for its SUR alone.
    import reference_script  # command line, skip code, writing the figures

    data_dir, output_path = reference_script.paths(__doc__)
    try:
        import numpy as np
    except ImportError as error:
        return reference_script.skipped("numpy", error)
    cost, output, prices, shares = read_data(data_dir, np)
    log_cost, log_output, log_prices = np.log(cost), np.log(output), np.log(prices)
    rows = []
    for form in ("cobb-douglas", "translog"):
        design, share_designs, restrictions, targets = system(np, form == "translog", log_output, log_prices)
        for dropped in range(3):
            kept = [i for i in range(3) if i != dropped]
            designs = [design] + [share_designs[i] for i in kept]
            responses = [log_cost] + [shares[:, i] for i in kept]
            theta, covariance, cost_residuals, llf = iterated_sur(np, designs, responses, restrictions, targets)
            name = "%s_drop%d" % (form, dropped)
            for index, value in enumerate(theta):
                rows.append(["rice_farms", name, "params", index, repr(float(value))])
                rows.append(["rice_farms", name, "bse", index, repr(float(math.sqrt(covariance[index, index])))])
            rows.append(["rice_farms", name, "llf", 0, repr(float(llf))])
            total = float(((log_cost - log_cost.mean()) ** 2).sum())
            rows.append(["rice_farms", name, "rsquared", 0, repr(1.0 - float(cost_residuals @ cost_residuals) / total)])
    reference_script.write_figures(output_path, ["dataset", "form", "quantity", "index", "value"], rows)
    print(f"numpy {np.__version__}: {len(rows)} cost-system figures written to {output_path}")
    return 0


if __name__ == "__main__":
    sys.exit(main())
