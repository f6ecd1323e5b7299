#include "isoquant/ces_fit.hpp"

#include "isoquant/ces.hpp"
#include "isoquant/distributions.hpp"
#include "isoquant/exact_elementwise.hpp"
#include "isoquant/input_error.hpp"
#include "isoquant/least_squares.hpp"
#include "isoquant/text.hpp"
#include "isoquant/work_limits.hpp"
#include "fit_inference.hpp"

#include <boost/math/constants/constants.hpp>
#include <boost/math/tools/minima.hpp>

#include <algorithm>
#include <cmath>
#include <limits>
#include <stdexcept>

namespace isoquant {

namespace {

constexpr double notANumber = std::numeric_limits<double>::quiet_NaN();
constexpr Eigen::Index cesParameters = 4;

// Curvatures ρ at which δ is searched for start values: σ from 10 down to about 0.06.
constexpr double gridCurvatures[] = {-0.9, -0.75, -0.5, -0.25, 0.0, 0.25, 0.5, 1.0, 2.0, 4.0, 8.0, 16.0};
// Logits of δ tried before Brent's search refines the best of them (δ from about 0.0025 to 0.9975).
constexpr double gridWeightLogits[] = {-6, -4.5, -3, -2, -1, 0, 1, 2, 3, 4.5, 6};
// Bounds a Kmenta start is clamped to: δ in [0.01, 0.99], ρ in [−0.9, 20].
constexpr double kmentaWeightLimit = 0.01;
constexpr double kmentaCurvatureLimit = 20.0;
// Starts taken from the grid besides the Kmenta one.
constexpr std::size_t gridStartsTried = 2;
// Gauss–Newton steps at most after the solver has converged inside the domain (see
// refinedByGaussNewton). Where the solver stops, about 1e-6·se from the optimum, one step reaches
// rounding on small residuals; on the rice-farm panel each step shrinks the next by about 6, and
// three bring the estimates to within 2e-10 of the optimum.
constexpr int gaussNewtonSteps = 3;
// Bits of precision Brent's search aims at on the logit of δ (enough for a start value).
constexpr int brentBits = 20;

double logistic(double z) { return z >= 0 ? 1.0 / (1.0 + std::exp(-z)) : std::exp(z) / (1.0 + std::exp(z)); }

// ln Y, ln x₂ and d = ln x₁ − ln x₂ of every row.
struct CesLogs {
    Eigen::VectorXd logOutput;
    Eigen::VectorXd logSecond;
    Eigen::VectorXd logRatio;
};

// b + H(d) for every row.
Eigen::VectorXd compositeColumn(const CesLogs& logs, double weight, double curvature)
{
    const CesCompositeCurve curve(weight, curvature);
    Eigen::VectorXd column(logs.logOutput.size());
    for (Eigen::Index i = 0; i < column.size(); ++i) column(i) = logs.logSecond(i) + curve.value(logs.logRatio(i));
    return column;
}

Eigen::VectorXd rawResiduals(const CesLogs& logs, const Eigen::Vector4d& raw)
{
    return logs.logOutput - (raw(0) + raw(3) * compositeColumn(logs, raw(1), raw(2)).array()).matrix();
}

// The second column of the Jacobian: by δ itself (inference) or by its logit t (the solver).
enum class WeightColumn { byWeight, byLogit };

// ∂r/∂(ln A, δ or t, ρ, ν) at raw = (ln A, δ, ρ, ν); H and its derivatives taken once per row.
Eigen::MatrixXd rawJacobian(const CesLogs& logs, const Eigen::Vector4d& raw, WeightColumn weightColumn)
{
    const Eigen::Index n = logs.logOutput.size();
    const CesCompositeCurve curve(raw(1), raw(2));
    Eigen::MatrixXd jacobian(n, cesParameters);
    for (Eigen::Index i = 0; i < n; ++i) {
        const CesComposite composite = curve.at(logs.logRatio(i));
        jacobian(i, 0) = -1.0;
        // ∂/∂t stays finite even where δ rounds to 0 or 1
        const double byWeight = weightColumn == WeightColumn::byLogit ? composite.byWeightLogit : composite.byWeight;
        jacobian(i, 1) = -raw(3) * byWeight;
        jacobian(i, 2) = -raw(3) * composite.byCurvature;
        jacobian(i, 3) = -(logs.logSecond(i) + composite.value);
    }
    return jacobian;
}

// (ln A, t, s, ν) ↔ (ln A, δ, ρ, ν) with δ = logistic(t), ρ = −1 + eˢ.
Eigen::Vector4d toRaw(const Eigen::VectorXd& solver)
{
    return {solver(0), logistic(solver(1)), std::expm1(solver(2)), solver(3)};
}

Eigen::Vector4d toSolver(const Eigen::Vector4d& raw)
{
    return {raw(0), std::log(raw(1) / (1 - raw(1))), std::log1p(raw(2)), raw(3)};
}

class CesModel : public NonlinearModel {
public:
    explicit CesModel(const CesLogs& logs) : logs_(logs) {}
    Eigen::Index observationCount() const override { return logs_.logOutput.size(); }
    Eigen::Index parameterCount() const override { return cesParameters; }
    Eigen::VectorXd residuals(const Eigen::VectorXd& solver) const override { return rawResiduals(logs_, toRaw(solver)); }
    Eigen::MatrixXd jacobian(const Eigen::VectorXd& solver) const override
    {
        Eigen::MatrixXd jacobian = rawJacobian(logs_, toRaw(solver), WeightColumn::byLogit);
        jacobian.col(2) *= std::exp(solver(2)); // dρ/ds = 1 + ρ
        return jacobian;
    }

private:
    const CesLogs& logs_;
};

struct ConcentratedFit {
    double sumOfSquares = std::numeric_limits<double>::infinity();
    Eigen::Vector4d raw = Eigen::Vector4d::Zero();
};

// For fixed δ and ρ the model is linear in ln A and ν: a simple regression of ln Y on b + H.
ConcentratedFit concentrated(const CesLogs& logs, double weight, double curvature)
{
    const Eigen::VectorXd composite = compositeColumn(logs, weight, curvature);
    const Eigen::ArrayXd centredX = composite.array() - composite.mean();
    const Eigen::ArrayXd centredY = logs.logOutput.array() - logs.logOutput.mean();
    const double sxx = centredX.square().sum();
    ConcentratedFit fit;
    if (!(sxx > 0) || !std::isfinite(sxx)) return fit;
    const double slope = (centredX * centredY).sum() / sxx;
    fit.sumOfSquares = (centredY - slope * centredX).square().sum();
    fit.raw = {logs.logOutput.mean() - slope * composite.mean(), weight, curvature, slope};
    return fit;
}

// Best δ for this ρ: the best logit of a coarse grid, refined by Brent's search between its neighbours.
ConcentratedFit bestWeightFor(const CesLogs& logs, double curvature)
{
    const auto sumOfSquares = [&](double logit) { return concentrated(logs, logistic(logit), curvature).sumOfSquares; };
    std::size_t best = 0;
    double bestValue = std::numeric_limits<double>::infinity();
    constexpr std::size_t count = std::size(gridWeightLogits);
    for (std::size_t i = 0; i < count; ++i) {
        const double value = sumOfSquares(gridWeightLogits[i]);
        if (value < bestValue) bestValue = value, best = i;
    }
    const double low = gridWeightLogits[best == 0 ? 0 : best - 1];
    const double high = gridWeightLogits[best + 1 == count ? best : best + 1];
    const auto [logit, value] = boost::math::tools::brent_find_minima(sumOfSquares, low, high, brentBits);
    return concentrated(logs, logistic(value <= bestValue ? logit : gridWeightLogits[best]), curvature);
}

// ln Y = β₀ + β₁ ln x₁ + β₂ ln x₂ + β₃ d², the second-order expansion of ln Y about ρ = 0:
// ν = β₁ + β₂, δ = β₁/ν, ρ = −2β₃/(ν·δ(1−δ)); empty when ν ≤ 0.
std::optional<Eigen::Vector4d> kmentaStart(const CesLogs& logs)
{
    const Eigen::Index n = logs.logOutput.size();
    Eigen::MatrixXd design(n, 4);
    design.col(0).setOnes();
    design.col(1) = logs.logRatio + logs.logSecond;
    design.col(2) = logs.logSecond;
    design.col(3) = logs.logRatio.array().square().matrix();
    LeastSquaresResult kmenta;
    try {
        kmenta = fitLeastSquares(design, logs.logOutput, 0);
    } catch (const CollinearColumns&) {
        return std::nullopt;
    }
    const Eigen::VectorXd& b = kmenta.coefficients;
    const double nu = b(1) + b(2);
    if (!(nu > 0)) return std::nullopt;
    // Kept inside the domain, where a start must lie, when the approximation strays outside it.
    const double weight = std::clamp(b(1) / nu, kmentaWeightLimit, 1 - kmentaWeightLimit);
    const double curvature = -2 * b(3) / (nu * weight * (1 - weight));
    if (!std::isfinite(curvature)) return std::nullopt;
    return Eigen::Vector4d(b(0), weight, std::clamp(curvature, gridCurvatures[0], kmentaCurvatureLimit), nu);
}

CesLogs logsOf(const ProductionData& data)
{
    CesLogs logs;
    logs.logOutput = exactLog(data.output.array()).matrix();
    logs.logSecond = exactLog(data.inputs.col(1).array()).matrix();
    logs.logRatio = (exactLog(data.inputs.col(0).array()) - logs.logSecond.array()).matrix();
    return logs;
}

// Rows ⌊k·n/m⌋, k = 0, …, m − 1: every (n/m)-th row, from the first; all n rows when n ≤ m.
CesLogs evenlySpacedRows(const CesLogs& logs, Eigen::Index m)
{
    const Eigen::Index n = logs.logOutput.size();
    if (n <= m) return logs;
    CesLogs sample;
    for (Eigen::VectorXd* column : {&sample.logOutput, &sample.logSecond, &sample.logRatio}) column->resize(m);
    for (Eigen::Index k = 0; k < m; ++k) {
        const Eigen::Index row = static_cast<Eigen::Index>(static_cast<long double>(k) * n / m);
        sample.logOutput(k) = logs.logOutput(row);
        sample.logSecond(k) = logs.logSecond(row);
        sample.logRatio(k) = logs.logRatio(row);
    }
    return sample;
}

// The Kmenta start from all rows, then the best grid points from the rows of evenlySpacedRows.
std::vector<Eigen::Vector4d> startValues(const CesLogs& logs, Eigen::Index searchRows)
{
    std::vector<Eigen::Vector4d> starts;
    if (const auto kmenta = kmentaStart(logs)) starts.push_back(*kmenta);
    const CesLogs searched = evenlySpacedRows(logs, searchRows);
    std::vector<ConcentratedFit> grid;
    for (const double curvature : gridCurvatures) grid.push_back(bestWeightFor(searched, curvature));
    std::sort(grid.begin(), grid.end(),
              [](const ConcentratedFit& a, const ConcentratedFit& b) { return a.sumOfSquares < b.sumOfSquares; });
    for (std::size_t i = 0; i < std::min(gridStartsTried, grid.size()); ++i)
        if (std::isfinite(grid[i].sumOfSquares)) starts.push_back(grid[i].raw);
    return starts;
}

// Each start moved to the optimum the solver reaches from it on the sample rows, so that the runs on
// all rows start close to their optimum. Moved starts that agree to 1e-6·(1 + |θ|) in every solver
// coordinate reached the same minimum (runs into one minimum stop within about 1e-8 of each other,
// distinct minima lie O(1) apart) and are kept once. A moved start where some row's residual is
// not finite is replaced by the start itself.
std::vector<Eigen::VectorXd> movedOnSample(const CesLogs& logs, const CesLogs& sample,
                                           const std::vector<Eigen::VectorXd>& starts,
                                           const NonlinearLeastSquaresOptions& options)
{
    constexpr double sameMinimum = 1e-6;
    const CesModel sampleModel(sample);
    std::vector<Eigen::VectorXd> moved;
    for (const Eigen::VectorXd& start : starts) {
        Eigen::VectorXd reached = minimizeSumOfSquares(sampleModel, start, options).parameters;
        const auto same = [&](const Eigen::VectorXd& other) {
            return ((reached - other).array().abs() <= sameMinimum * (1 + other.array().abs())).all();
        };
        if (std::any_of(moved.begin(), moved.end(), same)) continue;
        if (!rawResiduals(logs, toRaw(reached)).allFinite()) reached = start;
        moved.push_back(reached);
    }
    return moved;
}

void requireCesData(const ProductionData& data, const ProductionFitOptions& options)
{
    const Eigen::Index n = data.output.size();
    if (data.inputs.cols() != 2)
        throw InputError("inputs: the ces form takes exactly two inputs; this range has " +
                         std::to_string(data.inputs.cols()) + (data.inputs.cols() == 1 ? " column" : " columns"));
    if (data.controls.cols() > 0) throw InputError("controls: the ces form takes no controls; leave the argument empty");
    if (options.constantReturns)
        throw InputError("constant returns: cannot be imposed on the ces form; leave the argument empty");
    if (options.covariance != CovarianceKind::classical)
        throw InputError("errors: the ces form reports classical standard errors only; leave the argument empty");
    if (data.output.maxCoeff() == data.output.minCoeff())
        throw InputError("output: every row holds the same value; there is no variation to explain");
    if (n < cesParameters + 1)
        throw InputError("too few rows: output and inputs have " + std::to_string(n) +
                         " rows of data for 4 parameters to estimate; need at least 5");
    std::vector<double> ratios(static_cast<std::size_t>(n));
    for (Eigen::Index i = 0; i < n; ++i) ratios[static_cast<std::size_t>(i)] = data.inputs(i, 0) / data.inputs(i, 1);
    std::sort(ratios.begin(), ratios.end());
    if (std::unique(ratios.begin(), ratios.end()) - ratios.begin() < 3)
        throw InputError("inputs: the ratio of " + isoquant::quoted(data.inputLabels[0]) + " to " +
                         isoquant::quoted(data.inputLabels[1]) +
                         " takes fewer than three values; the ces form cannot tell its weight from its curvature");
}

CesBoundary boundaryOf(const Eigen::VectorXd& solver, double distance)
{
    if (logistic(solver(1)) < distance) return CesBoundary::secondInputOnly;
    if (logistic(-solver(1)) < distance) return CesBoundary::firstInputOnly;
    if (std::exp(solver(2)) < distance) return CesBoundary::perfectSubstitutes; // 1 + ρ
    if (std::exp(-solver(2)) < distance) return CesBoundary::fixedProportions;  // σ
    return CesBoundary::none;
}

} // namespace

std::vector<Eigen::Vector4d> cesStartValues(const ProductionData& data, Eigen::Index searchRows)
{
    return startValues(logsOf(data), searchRows);
}

ProductionFit fitCes(const ProductionData& data, const ProductionFitOptions& options, const CesFitOptions& cesOptions)
{
    requireCesData(data, options);
    if (cesOptions.startSearchRows < cesParameters + 1)
        throw std::invalid_argument("startSearchRows: needs at least 5 rows");
    const CesLogs logs = logsOf(data);
    const CesModel model(logs);
    const Eigen::Index n = data.output.size();

    NonlinearLeastSquaresOptions solverOptions = cesOptions.solver;
    solverOptions.confidenceLevel = options.confidenceLevel;
    std::vector<Eigen::VectorXd> starts;
    if (cesOptions.start) {
        const Eigen::Vector4d& start = *cesOptions.start;
        if (!(start(1) > 0 && start(1) < 1 && start(2) > -1) || !start.allFinite())
            throw InputError("start: needs 0 < delta < 1 and rho > -1");
        starts.push_back(toSolver(start));
    } else {
        for (const Eigen::Vector4d& start : startValues(logs, cesOptions.startSearchRows))
            starts.push_back(toSolver(start));
        if (n > cesOptions.startSearchRows)
            starts = movedOnSample(logs, evenlySpacedRows(logs, cesOptions.startSearchRows), starts, solverOptions);
    }

    // The runs on all rows share the work cap (work_limits.hpp).
    solverOptions.maximumEvaluations = static_cast<Eigen::Index>(
        evaluationsPerRun(static_cast<std::size_t>(n), starts.size(), static_cast<std::size_t>(solverOptions.maximumEvaluations)));
    // Keep the lowest sum of squares, preferring converged runs.
    std::optional<NonlinearLeastSquaresResult> kept;
    for (const Eigen::VectorXd& start : starts) {
        NonlinearLeastSquaresResult run = minimizeSumOfSquares(model, start, solverOptions);
        const auto rank = [](const NonlinearLeastSquaresResult& r) {
            return std::make_pair(r.status != NonlinearStatus::converged, r.residuals.squaredNorm());
        };
        if (!kept || rank(run) < rank(*kept)) kept = std::move(run);
    }
    if (!kept) throw InputError("inputs: no start value for the ces fit could be found from these data");

    auto details = std::make_shared<CesDetails>();
    details->convergence = kept->status;
    details->stopReason = kept->stopReason;
    details->evaluations = kept->evaluations;
    Eigen::VectorXd reached = kept->parameters;
    if (kept->status == NonlinearStatus::converged &&
        boundaryOf(reached, cesOptions.boundaryDistance) == CesBoundary::none)
        reached = refinedByGaussNewton(model, reached, gaussNewtonSteps, cesOptions.solver.rankTolerance);
    details->boundary = boundaryOf(reached, cesOptions.boundaryDistance);

    Eigen::Vector4d raw = toRaw(reached);
    switch (details->boundary) {
    case CesBoundary::firstInputOnly: raw(1) = 1; break;
    case CesBoundary::secondInputOnly: raw(1) = 0; break;
    case CesBoundary::perfectSubstitutes: raw(2) = -1; break;
    case CesBoundary::fixedProportions: // ρ keeps the value reached
    case CesBoundary::none: break;
    }
    const Eigen::VectorXd residuals = rawResiduals(logs, raw);
    NonlinearInference inference = nonlinearInference(rawJacobian(logs, raw, WeightColumn::byWeight), residuals, raw,
                                                      options.confidenceLevel, cesOptions.solver.rankTolerance);
    // At a boundary or away from an optimum the classical standard errors mean nothing.
    const bool inferable = details->boundary == CesBoundary::none && details->convergence == NonlinearStatus::converged;
    if (!inferable) {
        for (Eigen::VectorXd* column : {&inference.standardErrors, &inference.tStatistics, &inference.pValues,
                                        &inference.lowerBounds, &inference.upperBounds})
            column->setConstant(notANumber);
        inference.covariance.setConstant(notANumber);
    }

    ProductionFit fit;
    fit.form = ProductionForm::ces;
    fit.inputLabels = data.inputLabels;
    setParameterInference(fit, raw, inference);
    fit.logScaleAtControlMeans = raw(0);
    fit.smearingFactor = residuals.array().exp().mean(); // Duan: mean of exp(residual of ln Y)

    LeastSquaresResult& summary = fit.regression;
    const double df = inference.residualDegreesOfFreedom;
    const double rss = inference.residualSumOfSquares;
    summary.coefficients = raw;
    summary.standardErrors = inference.standardErrors;
    summary.covariance = inference.covariance;
    summary.residuals = residuals;
    summary.observations = n;
    summary.parameters = cesParameters;
    summary.residualDegreesOfFreedom = df;
    summary.residualSumOfSquares = rss;
    summary.totalSumOfSquares = (logs.logOutput.array() - logs.logOutput.mean()).square().sum();
    summary.rSquared = 1.0 - rss / summary.totalSumOfSquares;
    summary.adjustedRSquared = 1.0 - (1.0 - summary.rSquared) * static_cast<double>(n - 1) / df;
    summary.residualStandardDeviation = inference.residualStandardDeviation;
    summary.fStatistic = notANumber;
    summary.fPValue = notANumber;
    const double count = static_cast<double>(n);
    summary.logLikelihood = -count / 2 * (std::log(boost::math::constants::two_pi<double>()) + std::log(rss / count) + 1);
    summary.aic = -2 * summary.logLikelihood + 2 * cesParameters;
    summary.bic = -2 * summary.logLikelihood + cesParameters * std::log(count);
    summary.interceptColumn = 0;
    summary.confidenceLevel = options.confidenceLevel;
    const bool exact = std::sqrt(rss) <= LeastSquaresOptions{}.perfectFitTolerance * logs.logOutput.norm();
    summary.status = exact ? FitStatus::perfectFit : FitStatus::ok;
    fit.status = summary.status;
    fit.rSquared = summary.rSquared;
    fit.adjustedRSquared = summary.adjustedRSquared;

    // σ = 1/(1+ρ), se(σ) = se(ρ)/(1+ρ)²
    const double onePlusCurvature = 1 + raw(2);
    details->substitutionElasticity = 1 / onePlusCurvature;
    details->substitutionStandardError = inference.standardErrors(2) / (onePlusCurvature * onePlusCurvature);
    const double critical = studentCriticalValue(options.confidenceLevel, df);
    details->substitutionLowerBound = details->substitutionElasticity - critical * details->substitutionStandardError;
    details->substitutionUpperBound = details->substitutionElasticity + critical * details->substitutionStandardError;
    fit.ces = details;

    ReturnsToScale& returns = fit.returns;
    returns.estimate = raw(3);
    returns.standardError = inference.standardErrors(3);
    const double distance = (raw(3) - 1) / returns.standardError;
    returns.fStatistic = exact ? notANumber : distance * distance;
    returns.pValue = fisherUpperPValue(returns.fStatistic, 1, df);
    returns.verdict = classifyReturnsToScale(returns.estimate, returns.pValue, options.confidenceLevel, false);
    return fit;
}

} // namespace isoquant
