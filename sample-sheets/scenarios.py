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


# Marrow Valley Dairies: a cooperative with 8 creameries, six years (2019-2024), one row per
# creamery and year.
#   output  = value of dairy products shipped, thousand EUR at 2019 prices
#   labour  = hours worked, thousand hours
#   capital = plant and equipment at replacement value, thousand EUR at 2019 prices
# True technology: ln output = ln A + effect(creamery) + trend * (year - 2019)
#                              + b_labour ln labour + b_capital ln capital + noise,
# effect ~ Normal(0, EFFECT_SD) per creamery (independent of its inputs), noise ~ Normal(0, NOISE_SD).
CREAMERIES = dict(
    seed=20261202,
    names=("Ashby", "Brindle", "Carrow", "Dunsley", "Elmstead", "Foxton", "Greyholm", "Hatherley"),
    first_year=2019,
    years=6,
    scale=2.9,
    labour_exponent=0.55,
    capital_exponent=0.35,
    trend=0.018,
    effect_sd=0.05,
    noise_sd=0.04,
)


def creamery_rows(truth=CREAMERIES):
    """Rows of (creamery, year, output, labour, capital), creamery by creamery, years in order."""
    draw = random.Random(truth["seed"])
    rows = []
    for name in truth["names"]:
        effect = draw.gauss(0.0, truth["effect_sd"])
        labour = math.exp(draw.uniform(math.log(25.0), math.log(90.0)))
        capital_per_hour = math.exp(draw.gauss(math.log(11.0), 0.3))
        for offset in range(truth["years"]):
            # Staff numbers move with the order book; machinery is added most years.
            labour *= math.exp(draw.gauss(0.005, 0.06))
            capital_per_hour *= math.exp(draw.gauss(0.025, 0.05))
            hours = round(labour, 1)
            capital = round(labour * capital_per_hour, 0)
            log_output = (math.log(truth["scale"]) + effect + truth["trend"] * offset
                          + truth["labour_exponent"] * math.log(hours)
                          + truth["capital_exponent"] * math.log(capital)
                          + draw.gauss(0.0, truth["noise_sd"]))
            rows.append((name, truth["first_year"] + offset, round(math.exp(log_output), 1), hours, capital))
    return rows


# Saltmarsh Glassworks: one container-glass plant, twenty years (2005-2024).
#   output  = glass shipped, million EUR at 2005 prices
#   labour  = hours worked, thousand hours; capital = furnaces and lines, million EUR at 2005 prices;
#   energy  = gas and power, GWh
#   shares  = each input's share of the year's total cost of the three, from the books
# Each year: input i grows by g_i ~ Normal(growth_i, growth_sd_i); the shares drift linearly from
# their first to their last values plus Normal(0, SHARE_NOISE) (energy takes the rest); output
# grows by sum_i mean share_i * g_i + tfp, tfp ~ Normal(TFP_GROWTH, TFP_SD): exactly the Tornqvist
# accounting, so the productivity growth the workbook finds is the drawn one, up to rounding.
GLASSWORKS = dict(
    seed=20261203,
    first_year=2005,
    years=20,
    start=dict(output=240.0, labour=410.0, capital=180.0, energy=520.0),
    growth=dict(labour=0.002, capital=0.032, energy=0.006),
    growth_sd=dict(labour=0.02, capital=0.02, energy=0.03),
    first_shares=dict(labour=0.52, capital=0.28),
    last_shares=dict(labour=0.45, capital=0.35),
    share_noise=0.008,
    tfp_growth=0.011,
    tfp_sd=0.012,
)
GLASSWORKS_INPUTS = ("labour", "capital", "energy")


def glassworks_rows(truth=GLASSWORKS):
    """(rows, true TFP growth per year): rows of (year, output, labour, capital, energy, labour share,
    capital share, energy share); the TFP growth of year t is the drawn tfp from t-1 to t."""
    draw = random.Random(truth["seed"])
    quantities = dict(truth["start"])
    rows, tfp_path, previous_shares = [], [], None
    for offset in range(truth["years"]):
        fraction = offset / (truth["years"] - 1)
        shares = {name: round(truth["first_shares"][name] + fraction
                              * (truth["last_shares"][name] - truth["first_shares"][name])
                              + draw.gauss(0.0, truth["share_noise"]), 3) for name in ("labour", "capital")}
        shares["energy"] = round(1.0 - shares["labour"] - shares["capital"], 3)
        if previous_shares is not None:
            log_output_growth = 0.0
            for name in GLASSWORKS_INPUTS:
                growth = draw.gauss(truth["growth"][name], truth["growth_sd"][name])
                quantities[name] *= math.exp(growth)
                log_output_growth += 0.5 * (previous_shares[name] + shares[name]) * growth
            tfp = draw.gauss(truth["tfp_growth"], truth["tfp_sd"])
            quantities["output"] *= math.exp(log_output_growth + tfp)
            tfp_path.append(tfp)
        previous_shares = shares
        rows.append((truth["first_year"] + offset, round(quantities["output"], 1))
                    + tuple(round(quantities[name], 1) for name in GLASSWORKS_INPUTS)
                    + tuple(shares[name] for name in GLASSWORKS_INPUTS))
    return rows, tfp_path


# Kestrel Street Bakery: a typed (not fitted) plan, loaves from baker hours and oven hours.
# True technology: loaves a day = SCALE * baker_hours^baker_exponent * oven_hours^oven_exponent.
# Prices in EUR an hour; the second scenario raises the price of an oven hour (energy dearer).
BAKERY = dict(
    scale=12.0,
    baker_exponent=0.7,
    oven_exponent=0.5,
    baker_price=18.0,
    oven_price=45.0,
    dearer_oven_price=60.0,
    target=1500.0,
    budget=5000.0,
    baker_hours=tuple(range(40, 150, 10)),
)


# Lathergate Laundries: a chain of 36 laundries, one year, from the books.
#   cost   = total cost of running the branch, thousand EUR a year
#   loads  = loads washed and dried, thousand a year
#   prices = the wage an hour (EUR), the price of a machine hour (EUR, leasing and upkeep) and of a
#            kWh (EUR) each branch paid
# True cost function: ln cost = constant + output ln loads + 1/2 output_squared (ln loads)^2
#                               + sum_i share_i ln price_i + noise,
# the shares summing to 1 (homogeneous in prices), noise ~ Normal(0, NOISE_SD). The cost elasticity
# output + output_squared ln loads is 1 where ln loads = (1 - output)/output_squared: average cost is
# lowest at exp(4.5) = 90.0 thousand loads a year, whatever the prices.
LAUNDRIES = dict(
    seed=20261204,
    count=36,
    constant=0.5,
    output=0.46,
    output_squared=0.12,
    shares=(0.5, 0.3, 0.2),
    price_ranges=((12.0, 20.0), (3.0, 7.0), (0.18, 0.40)),
    loads_range=(12.0, 450.0),
    noise_sd=0.04,
    efficient_scale=math.exp((1 - 0.46) / 0.12),
)


def laundry_rows(truth=LAUNDRIES):
    """Rows of (branch, cost, loads, wage, machine hour, kWh), rounded as the books keep them."""
    draw = random.Random(truth["seed"])
    rows = []
    for number in range(1, truth["count"] + 1):
        loads = round(math.exp(draw.uniform(*(math.log(v) for v in truth["loads_range"]))), 1)
        prices = [round(math.exp(draw.uniform(math.log(low), math.log(high))), 3 if high < 1 else 2)
                  for low, high in truth["price_ranges"]]
        log_loads = math.log(loads)
        log_cost = (truth["constant"] + truth["output"] * log_loads + 0.5 * truth["output_squared"] * log_loads ** 2
                    + sum(share * math.log(price) for share, price in zip(truth["shares"], prices))
                    + draw.gauss(0.0, truth["noise_sd"]))
        rows.append((f"Branch {number:02d}", round(math.exp(log_cost), 2), loads) + tuple(prices))
    return rows


if __name__ == "__main__":
    for row in workshop_rows() + creamery_rows() + glassworks_rows()[0]:
        print(row)
