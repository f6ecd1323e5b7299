#!/usr/bin/python3
"""Recomputes PRODENVELOPE's linear programs with scipy.optimize.linprog (HiGHS).

Usage: /usr/bin/python3 envelope_check.py DATA_DIR OUTPUT_CSV   (DATA_DIR is not used)

Two invented data sets, drawn here with numpy's default_rng:
- "random" (seed 17): 40 plants, 2 outputs and 3 inputs, each log-uniform on [1, 100];
- "zeros" (seed 29): 30 plants, 2 outputs and 2 inputs log-uniform on [1, 100], then the second
  output and the second input set to 0 in about a fifth of the plants each (amounts may be 0);
- "wide" (seed 41): 40 plants, 2 outputs and 3 inputs log-uniform on [1, 1e6], plants of very
  different sizes: scores only.
The score's LP is solved on the columns divided by the plant's own amounts (by the column's mean
where it has 0): the score is the same, and HiGHS's absolute tolerances then apply relative to the
plant's own amounts (on the raw "wide" data HiGHS misses a small plant's score by a third). The
second stage is solved on the data as they are, theta fixed exactly: on the "wide" data HiGHS
finds some plants' second stage infeasible within its tolerances, and relaxing theta by even 1e-9
moves the targets of the others by up to 3e-7 (the slacks' optimum is sensitive to theta), so the
"wide" set has no targets here.
For each, under constant, variable and non-increasing returns and in both orientations:
- the score: input orientation min theta s.t. X'lambda <= theta x_o, Y'lambda >= y_o; output
  orientation max phi s.t. X'lambda <= x_o, Y'lambda >= phi y_o, reported as 1/phi; lambda >= 0,
  with sum lambda = 1 (variable) or <= 1 (non-increasing);
- the targets X'lambda and Y'lambda of the second stage: theta (phi) fixed at its optimum, the
  slacks as variables of their own, X'lambda + s- = theta x_o (x_o), Y'lambda - s+ = y_o (phi y_o),
  maximising sum s- + sum s+ in the data's units.
This is the textbook envelopment form with explicit slacks, written independently of the core's
(which folds the slacks into the objective over lambda and scales the columns).

Writes one figure per line: dataset,quantity,returns,orientation,plant,column,value, with the data
themselves as quantities "output" and "input" (returns and orientation "-"), then "score",
"input_target" and "output_target". Exits with 77 (the CTest skip code) when scipy or numpy cannot
be imported, leaving no OUTPUT_CSV behind.
"""

import sys


RETURNS = ["constant", "variable", "non-increasing"]
ORIENTATIONS = ["input", "output"]


def invented_data(np):
    rng = np.random.default_rng(17)
    random = (np.exp(rng.uniform(0, np.log(100), (40, 2))), np.exp(rng.uniform(0, np.log(100), (40, 3))))
    rng = np.random.default_rng(29)
    outputs = np.exp(rng.uniform(0, np.log(100), (30, 2)))
    inputs = np.exp(rng.uniform(0, np.log(100), (30, 2)))
    outputs[rng.uniform(size=30) < 0.2, 1] = 0.0
    inputs[rng.uniform(size=30) < 0.2, 1] = 0.0
    rng = np.random.default_rng(41)
    wide = (np.exp(rng.uniform(0, np.log(1e6), (40, 2))), np.exp(rng.uniform(0, np.log(1e6), (40, 3))))
    return {"random": random, "zeros": (outputs, inputs), "wide": wide}


def returns_rows(np, n, columns, returns):
    """(A_ub rows, b_ub, A_eq rows, b_eq) of the condition on sum lambda, over `columns` variables."""
    row = np.zeros(columns)
    row[:n] = 1.0
    if returns == "variable":
        return [], [], [row], [1.0]
    if returns == "non-increasing":
        return [row], [1.0], [], []
    return [], [], [], []


def own_units(np, values, plant):
    """Each column divided by plant o's own amount (by the column's mean where that is 0), so that
    HiGHS's absolute tolerances are relative to plant o; the scores and lambda do not change.
    Returns (scaled values, factors)."""
    factors = np.where(values[plant] > 0, values[plant], values.mean(axis=0))
    return values / factors, factors


def stage_one(np, linprog, outputs, inputs, plant, returns, orientation):
    outputs, _ = own_units(np, outputs, plant)
    inputs, _ = own_units(np, inputs, plant)
    n, s = outputs.shape
    m = inputs.shape[1]
    x_o, y_o = inputs[plant], outputs[plant]
    upper, bound = [], []
    for i in range(m):  # sum_j lambda_j x_ij - theta x_io <= 0   (or <= x_io)
        upper.append(np.append(inputs[:, i], -x_o[i] if orientation == "input" else 0.0))
        bound.append(0.0 if orientation == "input" else x_o[i])
    for r in range(s):  # -sum_j lambda_j y_rj <= -y_ro   (or + phi y_ro <= 0)
        upper.append(np.append(-outputs[:, r], 0.0 if orientation == "input" else y_o[r]))
        bound.append(-y_o[r] if orientation == "input" else 0.0)
    extra_ub, extra_b, eq, eq_b = returns_rows(np, n, n + 1, returns)
    cost = np.zeros(n + 1)
    cost[n] = 1.0 if orientation == "input" else -1.0
    result = linprog(cost, A_ub=np.array(upper + extra_ub), b_ub=np.array(bound + extra_b),
                     A_eq=np.array(eq) if eq else None, b_eq=np.array(eq_b) if eq else None,
                     bounds=[(0, None)] * (n + 1), method="highs")
    if result.status != 0:
        raise RuntimeError(f"linprog stage one, plant {plant}: {result.message}")
    return result.x[n]


def stage_two(np, linprog, outputs, inputs, plant, returns, orientation, optimum):
    n, s = outputs.shape
    m = inputs.shape[1]
    x_o, y_o = inputs[plant], outputs[plant]
    columns = n + m + s  # lambda, s-, s+
    eq, eq_b = [], []
    for i in range(m):
        row = np.zeros(columns)
        row[:n] = inputs[:, i]
        row[n + i] = 1.0
        eq.append(row)
        eq_b.append(optimum * x_o[i] if orientation == "input" else x_o[i])
    for r in range(s):
        row = np.zeros(columns)
        row[:n] = outputs[:, r]
        row[n + m + r] = -1.0
        eq.append(row)
        eq_b.append(y_o[r] if orientation == "input" else optimum * y_o[r])
    extra_ub, extra_b, extra_eq, extra_eq_b = returns_rows(np, n, columns, returns)
    cost = np.zeros(columns)
    cost[n:] = -1.0
    result = linprog(cost, A_ub=np.array(extra_ub) if extra_ub else None, b_ub=np.array(extra_b) if extra_ub else None,
                     A_eq=np.array(eq + extra_eq), b_eq=np.array(eq_b + extra_eq_b),
                     bounds=[(0, None)] * columns, method="highs")
    if result.status != 0:
        raise RuntimeError(f"linprog stage two, plant {plant}: {result.message}")
    return result.x[:n]  # lambda; the targets are X'lambda and Y'lambda


def main():
    # Imported here, not at the top: run as a script, reference_script.py sits beside this file on
    # the path; tests/integration/test_envelope_in_calc.py imports this module for its LPs alone.
    import reference_script  # command line, skip code, writing the figures

    _, output_path = reference_script.paths(__doc__)
    try:
        import numpy as np
        import scipy
        from scipy.optimize import linprog
    except ImportError as error:
        return reference_script.skipped("scipy", error)
    rows = []
    for name, (outputs, inputs) in invented_data(np).items():
        for quantity, values in (("output", outputs), ("input", inputs)):
            for plant, column in np.ndindex(values.shape):
                rows.append([name, quantity, "-", "-", plant, column, repr(float(values[plant, column]))])
        for returns in RETURNS:
            for orientation in ORIENTATIONS:
                for plant in range(outputs.shape[0]):
                    optimum = stage_one(np, linprog, outputs, inputs, plant, returns, orientation)
                    score = optimum if orientation == "input" else 1.0 / optimum
                    rows.append([name, "score", returns, orientation, plant, 0, repr(float(score))])
                    if name == "wide":
                        continue
                    weights = stage_two(np, linprog, outputs, inputs, plant, returns, orientation, optimum)
                    input_targets, output_targets = inputs.T @ weights, outputs.T @ weights
                    for quantity, targets in (("input_target", input_targets), ("output_target", output_targets)):
                        for column, value in enumerate(targets):
                            rows.append([name, quantity, returns, orientation, plant, column, repr(float(value))])
    reference_script.write_figures(output_path, ["dataset", "quantity", "returns", "orientation", "plant", "column",
                                                 "value"], rows)
    print(f"scipy {scipy.__version__}: {len(rows)} envelope figures written to {output_path}")
    return 0


if __name__ == "__main__":
    sys.exit(main())
