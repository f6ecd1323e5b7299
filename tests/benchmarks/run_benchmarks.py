#!/usr/bin/python3
"""Isoquant's benchmarks, each side by side with what a user would do instead, in one run.

    cmake --build build --target bench            # everything (about 5 minutes on 2 cores)
    PYTHONPATH=addin/python /usr/bin/python3 tests/benchmarks/run_benchmarks.py \
        --core-bench build/tests/benchmarks/isoquant_core_bench \
        [--oxt build/isoquant-bench.oxt] [--runs 5] [--sizes 10000,100000,1000000]

Prints every figure with both sides and their ratio, then each target of the performance issue as
met or not. Timings are medians of --runs runs; nothing is asserted (benchmarks are not tests).
Data are invented and seeded (the core benchmark writes them for the Python sides).
Needs /usr/bin/python3 with python3-statsmodels and python3-scipy (Debian), and for the Calc part
the benchmark extension (target oxt_bench), which adds the do-nothing ISOQUANTFLOOR function.
"""

import argparse
import os
import statistics
import subprocess
import tempfile
import time

import numpy

ROOT = os.path.dirname(os.path.dirname(os.path.dirname(os.path.abspath(__file__))))
TARGETS = []


def report(what, ours, theirs, their_name):
    print("  %-46s Isoquant %9.4f s   %-28s %9.4f s   ratio %6.2f" % (what, ours, their_name, theirs, ours / theirs))


def target(text, met):
    TARGETS.append((text, met))


def median_seconds(runs, work):
    seconds = []
    for _ in range(runs):
        start = time.perf_counter()
        work()
        seconds.append(time.perf_counter() - start)
    return statistics.median(seconds)


def core_lines(core_bench, runs, folder, sizes):
    lines = {}
    for size in sizes:
        out = subprocess.run([core_bench, str(runs), folder, str(size)], check=True, capture_output=True, text=True)
        for line in out.stdout.splitlines():
            parts = line.split()
            lines[(parts[0], int(parts[1]))] = (float(parts[2]), parts[4:], int(parts[3]))
    return lines


def read_raw(path, columns):
    values = numpy.fromfile(path, dtype=numpy.float64).reshape(-1, columns + 1)
    return values[:, 0], values[:, 1:]


def statsmodels_fit_seconds(path, runs):
    import statsmodels.api as sm
    output, inputs = read_raw(path, 3)

    def fit():
        model = sm.OLS(numpy.log(output), sm.add_constant(numpy.log(inputs)))
        result = model.fit()
        return result.params, result.bse

    params = fit()[0]
    return median_seconds(runs, fit), params


def scipy_ces(path, runs):
    from scipy.optimize import least_squares
    output, inputs = read_raw(path, 2)
    log_output, log_capital, log_labour = numpy.log(output), numpy.log(inputs[:, 0]), numpy.log(inputs[:, 1])

    # ln Y = ln A − (ν/ρ)·ln S, S = δ·K^−ρ + (1−δ)·L^−ρ; parameters (ln A, δ, ρ, ν).
    def parts(p):
        capital_term = numpy.exp(-p[2] * log_capital)
        labour_term = numpy.exp(-p[2] * log_labour)
        mix = p[1] * capital_term + (1 - p[1]) * labour_term
        return capital_term, labour_term, mix

    def residuals(p):
        return p[0] - p[3] / p[2] * numpy.log(parts(p)[2]) - log_output

    def jacobian(p):
        capital_term, labour_term, mix = parts(p)
        log_mix = numpy.log(mix)
        weighted_logs = (p[1] * capital_term * log_capital + (1 - p[1]) * labour_term * log_labour) / mix
        return numpy.column_stack([
            numpy.ones_like(mix),
            -p[3] / p[2] * (capital_term - labour_term) / mix,
            p[3] / p[2] ** 2 * log_mix + p[3] / p[2] * weighted_logs,
            -log_mix / p[2]])

    # A neutral start: δ = 1/2, ρ = 0.1 (near Cobb-Douglas), ν = 1, ln A from the means.
    start = numpy.array([log_output.mean() - 0.5 * (log_capital.mean() + log_labour.mean()), 0.5, 0.1, 1.0])
    result = least_squares(residuals, start, jac=jacobian, method="lm", xtol=1e-15, ftol=1e-15, gtol=1e-15)
    seconds = median_seconds(runs, lambda: least_squares(residuals, start, jac=jacobian, method="lm",
                                                         xtol=1e-15, ftol=1e-15, gtol=1e-15))
    return seconds, result


def core_part(args, folder):
    print("== Core alone (C++ against python3-statsmodels OLS and a streaming pass) ==")
    lines = core_lines(args.core_bench, args.runs, folder, args.sizes)
    for size in args.sizes:
        ours = lines[("core_fit", size)][0]
        stream = lines[("stream_pass", size)][0]
        theirs, params = statsmodels_fit_seconds(os.path.join(folder, "cobb_douglas_%d.f64" % size), args.runs)
        print(" %d rows x 3 inputs (elasticities: Isoquant %s; statsmodels %s)"
              % (size, " ".join(lines[("core_fit", size)][1][1:4]), " ".join("%.6f" % v for v in params[1:])))
        report("Cobb-Douglas fit (logs included)", ours, theirs, "statsmodels OLS")
        report("Cobb-Douglas fit", ours, stream, "one streaming pass")
        default_step = lines[("least_squares_default", size)]
        print("  %-46s default (took the %s route) %.4f s, long double route %.4f s"
              % ("least-squares step alone (same log design)", default_step[1][1], default_step[0],
                 lines[("least_squares_extended", size)][0]))
        report("Cobb-Douglas fit", ours, lines[("stream_logs", size)][0], "streaming pass taking logs")
        kernel_pass = lines[("stream_kernel_logs", size)][0]
        report("Cobb-Douglas fit", ours, kernel_pass, "the same, the fit's log kernels")
        report("whole core path from cells (+ table)", lines[("core_from_cells", size)][0], theirs, "statsmodels OLS")
        if size == max(args.sizes):
            target("core fit >= 10x faster than statsmodels (%d rows): %.1fx" % (size, theirs / ours), theirs / ours >= 10)
            target("core fit <= 3x a streaming pass (%d rows): %.1fx" % (size, ours / stream), ours / stream <= 3)
            target("core fit <= 2x a streaming pass taking the logs with the fit's kernels (issue 19): %.1fx"
                   % (ours / kernel_pass), ours / kernel_pass <= 2)

    cells, (seconds, extra, _) = next((key[1], value) for key, value in lines.items() if key[0] == "cache_cells")
    fits = int(extra[1])
    print("== Cache ==\n  %d cells over one fit (1,000 rows x 3): %d fit(s), %.3f s (%.2f us per cell)"
          % (cells, fits, seconds, seconds / cells * 1e6))
    target("%d cells over one fit: exactly one fit (%d)" % (cells, fits), fits == 1)

    ces_seconds, ces_extra, ces_runs = lines[("ces_fit", 10000)]
    # As many of scipy's fits as core_bench timed of ours (at least 101: about a millisecond each).
    scipy_seconds, scipy_result = scipy_ces(os.path.join(folder, "ces_10000.f64"), ces_runs)
    print("== CES, 10,000 rows ==\n  Isoquant: %s residual evaluations; estimates (ln A, δ, ρ, ν) %s"
          % (ces_extra[1], " ".join(ces_extra[3:])))
    print("  scipy least_squares (lm, analytic Jacobian, neutral start): %d evaluations; %s"
          % (scipy_result.nfev, " ".join("%.6f" % v for v in scipy_result.x)))
    report("CES fit", ces_seconds, scipy_seconds, "scipy least_squares")
    target("CES 10k rows < 50 ms in core: %.1f ms" % (ces_seconds * 1e3), ces_seconds < 0.05)
    target("CES >= 5x faster than scipy: %.1fx" % (scipy_seconds / ces_seconds), scipy_seconds / ces_seconds >= 5)
    target("CES >= 2x faster than scipy (issue 19): %.2fx" % (scipy_seconds / ces_seconds), scipy_seconds / ces_seconds >= 2)
    print("== Stochastic frontier, 10,000 rows x 3 inputs (from cells, as a PRODFRONTIER cell) ==")
    for name, words in (("frontier_fit_half_normal", "half-normal"), ("frontier_fit_exponential", "exponential")):
        seconds, extra, _ = lines[(name, 10000)]
        print("  %-12s %.4f s, %s score evaluations, sigma_u %s, %s" % (words, seconds, extra[1], extra[3], extra[5]))
        target("frontier fit (%s) of 10,000 rows < 100 ms in the core (issue 19): %.1f ms" % (words, seconds * 1e3),
               seconds < 0.1)
    if ("ces_fit_fixed_proportions", 1000000) in lines:
        seconds, extra, _ = lines[("ces_fit_fixed_proportions", 1000000)]
        print("== CES, 1,000,000 rows near fixed proportions ==\n  %.2f s, %s after %s evaluations"
              % (seconds, extra[1], extra[3]))
        target("CES that does not converge on 1M rows says so within 3 s: %.2f s" % seconds, seconds <= 3)


def main():
    parser = argparse.ArgumentParser(description=__doc__, formatter_class=argparse.RawDescriptionHelpFormatter)
    parser.add_argument("--core-bench", required=True)
    parser.add_argument("--oxt")
    parser.add_argument("--runs", type=int, default=5)
    parser.add_argument("--sizes", default="10000,100000,1000000")
    parser.add_argument("--skip-core", action="store_true")
    args = parser.parse_args()
    args.sizes = [int(size) for size in args.sizes.split(",")]
    print("machine: %s; %d cores; load before: %s" % (os.uname().machine, os.cpu_count(), open("/proc/loadavg").read().strip()))
    with tempfile.TemporaryDirectory(prefix="isoquant-bench-") as folder:
        if not args.skip_core:
            core_part(args, folder)
    if args.oxt:
        import calc_benchmarks  # this folder (the script's own, on the path); needs the package isoquant_office
        calc_benchmarks.run(args, report, target)
    print("load after: %s" % open("/proc/loadavg").read().strip())
    print("== Targets ==")
    for text, met in TARGETS:
        print("  [%s] %s" % ("met" if met else "NOT met", text))


if __name__ == "__main__":
    main()
