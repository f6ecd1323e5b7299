"""Invented data for the sample workbooks, from seeded generators with documented true parameters.

Nothing here is real: the companies, sites and figures are made up so that a reader can see what
the functions recover when the truth is known.
"""
import math
import random

# Birchwood Joinery: a furniture maker with 40 workshops, one year.
#   output  = value of furniture finished, thousand EUR
#   labour  = hours worked, thousand hours
#   capital = machinery and tools at replacement value, thousand EUR
# True technology: output = A * labour^b_labour * capital^b_capital * exp(noise),
# noise ~ Normal(0, NOISE_SD), drawn with random.Random(SEED).
WORKSHOPS = dict(
    seed=20261201,
    count=40,
    scale=3.2,
    labour_exponent=0.62,
    capital_exponent=0.31,
    noise_sd=0.07,
)


def workshop_rows(seed=WORKSHOPS["seed"], count=WORKSHOPS["count"]):
    """Rows of (name, output, labour hours, capital), rounded as a bookkeeper would keep them."""
    draw = random.Random(seed)
    rows = []
    for number in range(1, count + 1):
        labour = math.exp(draw.uniform(math.log(8.0), math.log(60.0)))
        # Bigger workshops hold more machinery per hour, with plenty of scatter.
        capital = labour * math.exp(draw.gauss(math.log(9.0) + 0.25 * math.log(labour / 20.0), 0.35))
        labour = round(labour, 1)
        capital = round(capital, 0)
        noise = draw.gauss(0.0, WORKSHOPS["noise_sd"])
        output = (WORKSHOPS["scale"] * labour ** WORKSHOPS["labour_exponent"]
                  * capital ** WORKSHOPS["capital_exponent"] * math.exp(noise))
        rows.append((f"Workshop {number:02d}", round(output, 1), labour, capital))
    return rows


if __name__ == "__main__":
    for row in workshop_rows():
        print(row)
