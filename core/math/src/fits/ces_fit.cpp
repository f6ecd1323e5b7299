#include "isoquant/math/fits/ces_fit.hpp"

#include "isoquant/math/forms/ces.hpp"
#include "isoquant/math/messages/input_error.hpp"
#include "isoquant/math/messages/text.hpp"
#include "isoquant/math/numerics/work_limits.hpp"
#include "fits/ces_fit_model.hpp"
#include "fits/ces_inference.hpp"
#include "fits/ces_start_search.hpp"

#include <algorithm>
#include <cmath>
#include <stdexcept>

namespace isoquant {

using namespace ces_fit;

namespace {

// Gauss–Newton steps at most after the solver has converged inside the domain (see
// refinedByGaussNewton). Where the solver stops, about 1e-6·se from the optimum, one step reaches
// rounding on small residuals; on the rice-farm panel each step shrinks the next by about 6, and
// three bring the estimates to within 2e-10 of the optimum.
constexpr int gaussNewtonSteps = 3;

// Two values count as one when they differ by at most this relative amount: typed data carry 15 to
// 17 significant digits and a ratio or a logarithm of them rounds in the last one or two, while
// values that differ in the ninth digit are distinct data (common practice, no source).
constexpr double sameValueTolerance = 1e-9;

bool sameValue(double a, double b)
{
    return std::fabs(a - b) <= sameValueTolerance * std::max(std::fabs(a), std::fabs(b));
}

// The number of values in `values` told apart by sameValue (sorted, each compared with the last
// kept), counted up to `enough`. For positive values sameValue(v, kept) with v ≥ kept holds
// exactly while v·(1 − tolerance) ≤ kept, so the next value kept is the smallest v not same as the
// last: found by linear passes, with no sort (a million-row column costs a sort about 0.1 s) and no
// copy (only the sort of other values takes one). The last pass only asks whether such a value
// exists, so it stops at the first (mostly the first row).
std::size_t distinctValues(const Eigen::Ref<const Eigen::VectorXd>& values, std::size_t enough)
{
    const double smallest = values.size() > 0 ? values.minCoeff() : 0.0;
    if (smallest > 0) {
        double kept = smallest;
        std::size_t count = 1;
        while (count < enough) {
            const bool last = count + 1 == enough;
            bool found = false;
            double next = 0;
            for (const double value : values) {
                if (value > kept && !sameValue(value, kept) && (!found || value < next)) found = true, next = value;
                if (found && last) break;
            }
            if (!found) break;
            kept = next;
            ++count;
        }
        return count;
    }
    std::vector<double> sorted(values.begin(), values.end());
    std::sort(sorted.begin(), sorted.end());
    std::size_t count = 0;
    double last = 0;
    for (const double value : sorted)
        if (count == 0 || !sameValue(value, last)) ++count, last = value;
    return count;
}

void requireCesData(const ProductionData& data, const ProductionFitOptions& options)
{
    const Eigen::Index n = data.output.size();
    if (data.inputs.cols() != 2)
        throw InputError({DataPart::inputs}, "the ces form takes exactly two inputs; this range has " +
                         std::to_string(data.inputs.cols()) + (data.inputs.cols() == 1 ? " column" : " columns"));
    if (data.controls.cols() > 0) throw InputError({DataPart::controls}, "the ces form takes no controls; leave the argument empty");
    if (options.constantReturns)
        throw InputError({DataPart::constantReturns}, "cannot be imposed on the ces form; leave the argument empty");
    if (options.covariance != CovarianceKind::classical)
        throw InputError({DataPart::covarianceKind}, "the ces form reports classical standard errors only; leave the argument empty");
    if (data.output.maxCoeff() == data.output.minCoeff())
        throw InputError({DataPart::output}, "every row holds the same value; there is no variation to explain");
    if (n < parameterCount + 1)
        throw InputError({DataPart::output, DataPart::inputs}, "too few rows: {parts} have " + std::to_string(n) +
                         " rows of data for 4 parameters to estimate; need at least 5");
    // As the Cobb-Douglas fit says it: ln A and ν·ln x of a constant input cannot be told apart.
    for (Eigen::Index column = 0; column < 2; ++column)
        if (distinctValues(data.inputs.col(column), 2) < 2)
            throw InputError({DataPart::inputs}, quoted(data.inputLabels[static_cast<std::size_t>(column)]) +
                             " does not vary, so it cannot be told apart from ln A");
    const Eigen::VectorXd ratios = data.inputs.col(0).cwiseQuotient(data.inputs.col(1));
    if (distinctValues(ratios, 3) < 3)
        throw InputError({DataPart::inputs}, "the ratio of " + quoted(data.inputLabels[0]) + " to " + quoted(data.inputLabels[1]) +
                         " takes fewer than three values; the ces form cannot tell its weight from its curvature");
}

// The largest share π (first input) and 1 − π (second) over the rows at (δ, ρ).
std::pair<double, double> largestShares(const CesLogs& logs, double weight, double curvature)
{
    const CesCompositeCurve curve(weight, curvature);
    double first = 0, second = 0;
    for (Eigen::Index i = 0; i < logs.logRatio.size(); ++i) {
        const CesComposite composite = curve.at(logs.logRatio(i));
        first = std::max(first, composite.firstShare);
        second = std::max(second, composite.secondShare);
    }
    return {first, second};
}

// δ near 0 is the boundary "output follows x₂ alone" only where the first input's share π is below
// `distance` on every row too: for large ρ the term δ·x₁^(−ρ) may still decide rows where x₁ is
// the scarcer input (the CES then approaches min(c·x₁, x₂), with c = δ^(−1/ρ)), and setting δ to 0
// there would change the fit itself. Likewise for δ near 1.
CesBoundary boundaryOf(const CesLogs& logs, const Eigen::VectorXd& solver, double distance)
{
    const Eigen::Vector4d raw = toRaw(solver);
    if (raw(1) < distance || logistic(-solver(1)) < distance) {
        const auto [first, second] = largestShares(logs, raw(1), raw(2));
        if (raw(1) < distance && first < distance) return CesBoundary::secondInputOnly;
        if (logistic(-solver(1)) < distance && second < distance) return CesBoundary::firstInputOnly;
    }
    if (std::exp(solver(2)) < distance) return CesBoundary::perfectSubstitutes; // 1 + ρ
    if (std::exp(-solver(2)) < distance) return CesBoundary::fixedProportions;  // σ
    return CesBoundary::none;
}

// The starts in solver coordinates: the caller's, or the Kmenta and grid starts (ces_start_search.hpp).
std::vector<Eigen::VectorXd> solverStarts(const CesModel& model, const CesLogs& logs, const CesFitOptions& cesOptions,
                                          const NonlinearLeastSquaresOptions& solverOptions)
{
    std::vector<Eigen::VectorXd> starts;
    if (cesOptions.start) {
        const Eigen::Vector4d& start = *cesOptions.start;
        if (!(start(1) > 0 && start(1) < 1 && start(2) > -1) || !start.allFinite())
            throw InputError({DataPart::start}, "needs 0 < delta < 1 and rho > -1");
        starts.push_back(toSolver(start));
        return starts;
    }
    for (const Eigen::Vector4d& start : startValues(logs, cesOptions.startSearchRows))
        starts.push_back(toSolver(start));
    if (logs.logOutput.size() > cesOptions.startSearchRows)
        starts = movedOnSample(model, evenlySpacedRows(logs, cesOptions.startSearchRows), starts, solverOptions);
    return starts;
}

// A run on all rows, and whether it already ends with Gauss–Newton steps to rounding.
struct Run {
    NonlinearLeastSquaresResult result;
    bool refined = false;
};

// The run with the lowest sum of squares, preferring converged runs. From starts moved to the
// optimum of the sample rows, each run first tries Gauss–Newton steps alone (the start lies a few
// standard errors from the optimum of all rows, where each step shrinks the next by a large
// factor), and Levenberg–Marquardt where they give up.
Run bestRun(const CesModel& model, const std::vector<Eigen::VectorXd>& starts, bool startsMoved,
            NonlinearLeastSquaresOptions solverOptions)
{
    // The runs on all rows share the work cap (work_limits.hpp).
    solverOptions.maximumEvaluations = static_cast<Eigen::Index>(
        evaluationsPerRun(static_cast<std::size_t>(model.observationCount()), starts.size(),
                          static_cast<std::size_t>(solverOptions.maximumEvaluations)));
    std::optional<Run> kept;
    for (const Eigen::VectorXd& start : starts) {
        std::optional<NonlinearLeastSquaresResult> steps;
        if (startsMoved) steps = minimizeByGaussNewton(model, start);
        Run run{steps ? std::move(*steps) : minimizeSumOfSquares(model, start, solverOptions), steps.has_value()};
        const auto rank = [](const Run& r) {
            return std::make_pair(r.result.status != NonlinearStatus::converged, r.result.residuals.squaredNorm());
        };
        if (!kept || rank(run) < rank(*kept)) kept = std::move(run);
    }
    if (!kept) throw InputError({DataPart::inputs}, "no start value for the ces fit could be found from these data");
    return std::move(*kept);
}

} // namespace

std::vector<Eigen::Vector4d> cesStartValues(const ProductionData& data, Eigen::Index searchRows)
{
    return startValues(logsOf(data), searchRows);
}

ProductionFit fitCes(const ProductionData& data, const ProductionFitOptions& options, const CesFitOptions& cesOptions)
{
    requireCesData(data, options);
    if (cesOptions.startSearchRows < parameterCount + 1)
        throw std::invalid_argument("startSearchRows: needs at least 5 rows");
    const CesLogs logs = logsOf(data);
    const CesModel model(logs);

    NonlinearLeastSquaresOptions solverOptions = cesOptions.solver;
    solverOptions.confidenceLevel = options.confidenceLevel;
    const bool startsMoved = !cesOptions.start && logs.logOutput.size() > cesOptions.startSearchRows;
    const Run run = bestRun(model, solverStarts(model, logs, cesOptions, solverOptions), startsMoved, solverOptions);
    const NonlinearLeastSquaresResult& kept = run.result;

    CesDetails details;
    details.evaluations = kept.evaluations;
    FitStatus status;
    status.reason = kept.stopReason;
    if (kept.status == NonlinearStatus::evaluationLimit) status.kind = FitStatusKind::notConverged;
    if (kept.status == NonlinearStatus::stopped) status.kind = FitStatusKind::stopped;
    Eigen::VectorXd reached = kept.parameters;
    if (kept.status == NonlinearStatus::converged && !run.refined &&
        boundaryOf(logs, reached, cesOptions.boundaryDistance) == CesBoundary::none)
        reached = refinedByGaussNewton(model, reached, gaussNewtonSteps, cesOptions.solver.rankTolerance);
    details.boundary = boundaryOf(logs, reached, cesOptions.boundaryDistance);

    Eigen::Vector4d raw = toRaw(reached);
    switch (details.boundary) {
    case CesBoundary::firstInputOnly: raw(1) = 1; break;
    case CesBoundary::secondInputOnly: raw(1) = 0; break;
    case CesBoundary::perfectSubstitutes: raw(2) = -1; break;
    case CesBoundary::fixedProportions: // ρ keeps the value reached
    case CesBoundary::none: break;
    }
    return reportAt(data, model, logs, raw, std::move(details), std::move(status), options,
                    cesOptions.solver.rankTolerance);
}

} // namespace isoquant
