#include "fits/ces_start_search.hpp"

#include "isoquant/math/numerics/column_kernels.hpp"
#include "isoquant/math/numerics/least_squares.hpp"

#include <boost/math/tools/minima.hpp>

#include <algorithm>
#include <cmath>
#include <limits>
#include <optional>

namespace isoquant::ces_fit {

namespace {

// Curvatures ρ at which δ is searched for start values: σ from 10 down to about 0.06.
constexpr double gridCurvatures[] = {-0.9, -0.75, -0.5, -0.25, 0.0, 0.25, 0.5, 1.0, 2.0, 4.0, 8.0, 16.0};
// Logits of δ tried before Brent's search refines the best of them (δ from about 0.0025 to 0.9975).
constexpr double gridWeightLogits[] = {-6, -4.5, -3, -2, -1, 0, 1, 2, 3, 4.5, 6};
// Bounds a Kmenta start is clamped to: δ in [0.01, 0.99], ρ in [−0.9, 20].
constexpr double kmentaWeightLimit = 0.01;
constexpr double kmentaCurvatureLimit = 20.0;
// Starts taken from the grid besides the Kmenta one.
constexpr std::size_t gridStartsTried = 2;
// Bits of precision Brent's search aims at on the logit of δ: about 5e-4 relative, enough for a
// start value, which the runs on the sample move to their optimum anyway.
constexpr int brentBits = 12;
// Rows of the grid at most: evenly spaced among the searched ones. The grid only ranks curvatures
// (its best two points are starts); 250 rows rank the basins of the rice-farm panel as all its rows
// do, and even 100 do (test_forms_fits.cpp).
constexpr Eigen::Index gridRows = 250;

struct ConcentratedFit {
    double sumOfSquares = std::numeric_limits<double>::infinity();
    Eigen::Vector4d raw = Eigen::Vector4d::Zero();
};

// The searched rows at one ρ, with what of b + H does not depend on δ. With u = −ρ·d and
// e = expm1(−|u|), K(u) = ln(δeᵘ + 1 − δ) is ln(1 + δ·e) for u ≤ 0 and u + ln(1 + (1 − δ)·e) for
// u > 0 (ln(δeᵘ + 1 − δ) = u + ln(δ + (1 − δ)e^(−u))), and H = d·K/u = −K/ρ. So each δ costs one
// ln a row (the column kernels') and no division:
//   b + H = base − ln(1 + δ·below + (1 − δ)·above)/ρ,  base = b − max(u, 0)/ρ,
// where `below` holds e on the rows with u ≤ 0 and 0 elsewhere, `above` the reverse; at ρ = 0,
// b + H = b + δ·d. ln(1 + x) rather than log1p(x) is good to ε absolute in K, ε/|ρ| ≤ 4ε in H on
// the grid's curvatures, which is all a start needs (the estimates come from the runs on all
// rows). ln Y about its mean is the same at every ρ and δ, and is formed once.
struct CurvatureRows {
    const CesLogs& logs;
    const Eigen::ArrayXd& centredOutput;
    double outputSquares; // Syy
    double curvature;
    Eigen::ArrayXd base, below, above;
    // Work column of concentrated(), reused for every δ.
    mutable Eigen::ArrayXd column;

    CurvatureRows(const CesLogs& searched, const Eigen::ArrayXd& centred, double squares, double rho)
        : logs(searched), centredOutput(centred), outputSquares(squares), curvature(rho),
          column(searched.logRatio.size())
    {
        if (rho == 0) return;
        const Eigen::ArrayXd u = -rho * searched.logRatio.array();
        Eigen::ArrayXd exps(u.size()), shrunk(u.size());
        column = -u.abs();
        column_kernels::expsAndExpm1s(column.data(), exps.data(), shrunk.data(), static_cast<std::size_t>(u.size()));
        below = (u > 0).select(0.0, shrunk);
        above = (u > 0).select(shrunk, 0.0);
        base = searched.logSecond.array() - u.max(0.0) / rho;
    }

    // b + H for every row at δ, into `column`
    void composite(double weight) const
    {
        if (curvature == 0) {
            column = logs.logSecond.array() + weight * logs.logRatio.array();
            return;
        }
        column = 1 + weight * below + (1 - weight) * above;
        column_kernels::logs(column.data(), column.data(), static_cast<std::size_t>(column.size()));
        column = base + (-1 / curvature) * column;
    }
};

// For fixed δ and ρ the model is linear in ln A and ν: a simple regression of the centred ln Y on
// the centred b + H, whose sum of squares is Syy − slope·Sxy (slope = Sxy/Sxx). That difference
// loses digits where the fit is close, about ε·Syy absolute, which only blurs the ranking of
// points whose fits are equally close to exact; Sxx and Sxy come from one pass over the rows.
ConcentratedFit concentrated(const CurvatureRows& rows, double weight)
{
    const CesLogs& logs = rows.logs;
    rows.composite(weight);
    const double mean = rows.column.mean();
    const Eigen::Index m = rows.column.size();
    const double* column = rows.column.data();
    const double* output = rows.centredOutput.data();
    constexpr int lanes = 4;
    double squares[lanes] = {}, products[lanes] = {};
    Eigen::Index i = 0;
    for (; i + lanes <= m; i += lanes)
        for (int lane = 0; lane < lanes; ++lane) {
            const double centred = column[i + lane] - mean;
            squares[lane] += centred * centred;
            products[lane] += centred * output[i + lane];
        }
    for (int lane = 0; i < m; ++i, ++lane) {
        const double centred = column[i] - mean;
        squares[lane] += centred * centred;
        products[lane] += centred * output[i];
    }
    const double sxx = (squares[0] + squares[1]) + (squares[2] + squares[3]);
    const double sxy = (products[0] + products[1]) + (products[2] + products[3]);
    ConcentratedFit fit;
    if (!(sxx > 0) || !std::isfinite(sxx)) return fit;
    const double slope = sxy / sxx;
    fit.sumOfSquares = std::max(0.0, rows.outputSquares - slope * sxy);
    fit.raw = {logs.logOutput.mean() - slope * mean, weight, rows.curvature, slope};
    return fit;
}

// Best δ for this ρ: the best logit of a coarse grid, refined by Brent's search between its
// neighbours. The best point evaluated is kept as it is evaluated, not evaluated again.
ConcentratedFit bestWeightFor(const CesLogs& logs, const Eigen::ArrayXd& centredOutput, double outputSquares,
                              double curvature)
{
    const CurvatureRows rows(logs, centredOutput, outputSquares, curvature);
    ConcentratedFit best;
    const auto sumOfSquares = [&](double logit) {
        ConcentratedFit fit = concentrated(rows, logistic(logit));
        if (fit.sumOfSquares < best.sumOfSquares) best = fit;
        return fit.sumOfSquares;
    };
    std::size_t bestIndex = 0;
    double bestValue = std::numeric_limits<double>::infinity();
    constexpr std::size_t count = std::size(gridWeightLogits);
    for (std::size_t i = 0; i < count; ++i) {
        const double value = sumOfSquares(gridWeightLogits[i]);
        if (value < bestValue) bestValue = value, bestIndex = i;
    }
    const double low = gridWeightLogits[bestIndex == 0 ? 0 : bestIndex - 1];
    const double high = gridWeightLogits[bestIndex + 1 == count ? bestIndex : bestIndex + 1];
    boost::math::tools::brent_find_minima(sumOfSquares, low, high, brentBits);
    return best;
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
    const Eigen::VectorXd& b = kmenta.inference.estimates;
    const double nu = b(1) + b(2);
    if (!(nu > 0)) return std::nullopt;
    // Kept inside the domain, where a start must lie, when the approximation strays outside it.
    const double weight = std::clamp(b(1) / nu, kmentaWeightLimit, 1 - kmentaWeightLimit);
    const double curvature = -2 * b(3) / (nu * weight * (1 - weight));
    if (!std::isfinite(curvature)) return std::nullopt;
    return Eigen::Vector4d(b(0), weight, std::clamp(curvature, gridCurvatures[0], kmentaCurvatureLimit), nu);
}

} // namespace

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

// The Kmenta start, then the best grid points, from the rows of evenlySpacedRows (the grid from at
// most gridRows of them). Like the grid, the Kmenta regression only proposes a start, which the
// runs on the sample and on all rows then move.
std::vector<Eigen::Vector4d> startValues(const CesLogs& logs, Eigen::Index searchRows)
{
    std::vector<Eigen::Vector4d> starts;
    const CesLogs sample = evenlySpacedRows(logs, searchRows);
    if (const auto kmenta = kmentaStart(sample)) starts.push_back(*kmenta);
    const CesLogs searched = evenlySpacedRows(sample, gridRows);
    const Eigen::ArrayXd centredOutput = searched.logOutput.array() - searched.logOutput.mean();
    const double outputSquares = centredOutput.square().sum();
    std::vector<ConcentratedFit> grid;
    for (const double curvature : gridCurvatures)
        grid.push_back(bestWeightFor(searched, centredOutput, outputSquares, curvature));
    std::sort(grid.begin(), grid.end(),
              [](const ConcentratedFit& a, const ConcentratedFit& b) { return a.sumOfSquares < b.sumOfSquares; });
    for (std::size_t i = 0; i < std::min(gridStartsTried, grid.size()); ++i)
        if (std::isfinite(grid[i].sumOfSquares)) starts.push_back(grid[i].raw);
    return starts;
}

// Each start moved to the optimum the solver reaches from it on the sample rows, so that the runs on
// all rows start close to their optimum. Moved starts that agree to 1e-6·(1 + |θ|) in every solver
// coordinate reached the same minimum (runs into one minimum stop within about 1e-8 of each other,
// distinct minima lie O(1) apart) and are kept once; a Gauss–Newton run whose next point already
// agrees so with a moved start ends there, since it has come to that start's minimum. A moved start
// where some row's residual is not finite is replaced by the start itself. Each start first tries
// Gauss–Newton steps alone (minimizeByGaussNewton: from a grid or Kmenta start that lies in a
// well-behaved basin they settle in a few steps of one evaluation each, where Levenberg–Marquardt
// also factorises the Jacobian), settled at a step of sampleSettledLength; where they give way,
// Levenberg–Marquardt runs, stopping at a relative step of sampleStepTolerance. Either point only
// starts the runs on all rows, whose own optimum lies about √(n/m) standard errors away
// (sampling), far beyond that; the last steps to 1e-10 standard errors (Gauss–Newton) or 1e-15
// (Levenberg–Marquardt) would cost about a third of their evaluations.
std::vector<Eigen::VectorXd> movedOnSample(const CesModel& model, const CesLogs& sample,
                                           const std::vector<Eigen::VectorXd>& starts,
                                           const NonlinearLeastSquaresOptions& options)
{
    constexpr double sameMinimum = 1e-6;
    constexpr double sampleStepTolerance = 1e-10;
    constexpr double sampleSettledLength = 1e-6;
    NonlinearLeastSquaresOptions sampleOptions = options;
    sampleOptions.relativeStepTolerance = std::max(options.relativeStepTolerance, sampleStepTolerance);
    GaussNewtonOptions sampleSteps;
    sampleSteps.settledLength = sampleSettledLength;
    const CesModel sampleModel(sample);
    std::vector<Eigen::VectorXd> moved;
    const auto alreadyMoved = [&](const Eigen::VectorXd& reached) {
        return std::any_of(moved.begin(), moved.end(), [&](const Eigen::VectorXd& other) {
            return ((reached - other).array().abs() <= sameMinimum * (1 + other.array().abs())).all();
        });
    };
    for (const Eigen::VectorXd& start : starts) {
        const std::optional<NonlinearLeastSquaresResult> steps =
            minimizeByGaussNewton(sampleModel, start, sampleSteps, alreadyMoved);
        if (steps && steps->status == NonlinearStatus::stopped) continue; // at a moved start's minimum
        Eigen::VectorXd reached = steps ? steps->parameters : minimizeSumOfSquares(sampleModel, start, sampleOptions).parameters;
        if (alreadyMoved(reached)) continue;
        if (!model.residuals(reached).allFinite()) reached = start;
        moved.push_back(reached);
    }
    return moved;
}

} // namespace isoquant::ces_fit
