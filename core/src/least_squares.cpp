#include "isoquant/least_squares.hpp"

#include "isoquant/distributions.hpp"

#include "least_squares_factor.hpp"

#include <Eigen/Cholesky>

#include <cmath>
#include <limits>
#include <numeric>

namespace isoquant {

namespace {

constexpr double notANumber = std::numeric_limits<double>::quiet_NaN();

// Columns with at least this share of the largest weight in the null direction count as part of
// the collinear set (weights are in unit-norm column scale, so they are comparable).
constexpr double nullDirectionShare = 1e-3;

std::vector<Eigen::Index> columnsInNullDirection(const Eigen::VectorXd& direction)
{
    const double largest = direction.cwiseAbs().maxCoeff();
    std::vector<Eigen::Index> columns;
    for (Eigen::Index j = 0; j < direction.size(); ++j)
        if (std::fabs(direction(j)) >= nullDirectionShare * largest) columns.push_back(j);
    return columns;
}

void validateShapes(const Eigen::MatrixXd& design, const Eigen::VectorXd& response,
                    std::optional<Eigen::Index> interceptColumn)
{
    if (design.cols() < 1) throw std::invalid_argument("design: needs at least one column");
    if (design.rows() != response.size())
        throw std::invalid_argument("design and response: different numbers of rows");
    if (design.rows() <= design.cols())
        throw std::invalid_argument("design: needs more rows than columns");
    if (interceptColumn && (*interceptColumn < 0 || *interceptColumn >= design.cols()))
        throw std::invalid_argument("interceptColumn: outside the design");
    if (!design.allFinite()) throw std::invalid_argument("design: holds a value that is not finite");
    if (!response.allFinite()) throw std::invalid_argument("response: holds a value that is not finite");
}

// Sandwich "meat" Aᵀ·diag(ω)·A, where A = X·(XᵀX)^{-1/2}-like factor with orthonormal columns,
// so that hᵢᵢ = ‖Aᵢ‖² are the leverages and the sandwich is H·meat·Hᵀ.
Eigen::MatrixXd robustMeat(const Eigen::MatrixXd& orthonormalFactor, const Eigen::VectorXd& residuals,
                           CovarianceKind kind, double residualDegreesOfFreedom,
                           const Eigen::VectorXd& absorbedLeverage)
{
    const Eigen::Index n = residuals.size();
    Eigen::VectorXd weights = residuals.array().square();
    if (kind == CovarianceKind::hc1) {
        weights *= static_cast<double>(n) / residualDegreesOfFreedom;
    } else {
        Eigen::VectorXd leverage = orthonormalFactor.rowwise().squaredNorm();
        if (absorbedLeverage.size() == n) leverage += absorbedLeverage;
        // hᵢᵢ = 1 makes the HC3 weight infinite: the covariance is undefined, not huge.
        weights = (leverage.array() < 1.0)
                      .select(weights.array() / (1.0 - leverage.array()).square(), notANumber);
    }
    return orthonormalFactor.transpose() * weights.asDiagonal() * orthonormalFactor;
}

// CR1 meat: Σ_g s_g s_gᵀ with s_g = A_gᵀ e_g the score of cluster g, times
// G/(G−1)·(n−1)/(n−p), p counting the absorbed parameters too.
Eigen::MatrixXd clusterMeat(const Eigen::MatrixXd& orthonormalFactor, const Eigen::VectorXd& residuals,
                            const std::vector<Eigen::Index>& clusters, Eigen::Index clusterCount,
                            double residualDegreesOfFreedom)
{
    Eigen::MatrixXd scores = Eigen::MatrixXd::Zero(orthonormalFactor.cols(), clusterCount);
    for (Eigen::Index i = 0; i < residuals.size(); ++i)
        scores.col(clusters[static_cast<std::size_t>(i)]) += residuals(i) * orthonormalFactor.row(i).transpose();
    const double n = static_cast<double>(residuals.size());
    const double g = static_cast<double>(clusterCount);
    return (g / (g - 1.0)) * ((n - 1.0) / residualDegreesOfFreedom) * (scores * scores.transpose());
}

// G, after checking that every row has a cluster in 0 … G−1 and that G ≥ 2.
Eigen::Index countClusters(const std::vector<Eigen::Index>& clusters, Eigen::Index rows)
{
    if (static_cast<Eigen::Index>(clusters.size()) != rows)
        throw std::invalid_argument("clusters: one cluster per row is needed");
    Eigen::Index count = 0;
    for (const Eigen::Index cluster : clusters) {
        if (cluster < 0) throw std::invalid_argument("clusters: negative cluster index");
        count = std::max(count, cluster + 1);
    }
    if (count < 2) throw std::invalid_argument("clusters: at least 2 clusters are needed");
    return count;
}

} // namespace

CollinearColumns::CollinearColumns(std::vector<Eigen::Index> columns)
    : std::runtime_error("design columns are collinear"), columns_(std::move(columns))
{
}

LeastSquaresResult fitLeastSquares(const Eigen::MatrixXd& design, const Eigen::VectorXd& response,
                                   std::optional<Eigen::Index> interceptColumn,
                                   const LeastSquaresOptions& options)
{
    validateShapes(design, response, interceptColumn);
    if (!(options.confidenceLevel > 0 && options.confidenceLevel < 1))
        throw std::invalid_argument("confidenceLevel: must lie strictly between 0 and 1");
    if (options.absorbedParameters < 0 || design.rows() <= design.cols() + options.absorbedParameters)
        throw std::invalid_argument("design: needs more rows than parameters, absorbed ones included");
    const bool clustered = options.covariance == CovarianceKind::cluster;
    const Eigen::Index clusterCount = clustered ? countClusters(options.clusters, design.rows()) : 0;

    const Eigen::Index n = design.rows();
    const Eigen::Index p = design.cols();
    const Eigen::Index allParameters = p + options.absorbedParameters;

    // Equilibrate: columns of about unit norm make the rank decision and the condition number
    // independent of the units the user's data come in. The scale factors are powers of two, so
    // scaling perturbs no digit of the data (an inexact scaling alone costs Wampler5 three digits).
    Eigen::VectorXd inverseNorms(p);
    for (Eigen::Index j = 0; j < p; ++j) {
        const double norm = design.col(j).norm();
        if (norm == 0) throw CollinearColumns({j});
        inverseNorms(j) = std::ldexp(1.0, -std::ilogb(norm));
    }
    const Eigen::MatrixXd scaledDesign = design * inverseNorms.asDiagonal();

    // Well-conditioned designs (the usual logs of inputs) are factorised in double, vectorised;
    // the rest, and every rank decision, in long double (least_squares_factor.hpp).
    std::optional<LeastSquaresFactor> fast = factorInDouble(scaledDesign, response, options.doublePrecisionErrorLimit);
    const LeastSquaresFactor factor = fast ? std::move(*fast) : factorInExtendedPrecision(scaledDesign, response);
    const Eigen::VectorXd& singularValues = factor.singularValues;
    if (singularValues(p - 1) <= options.rankTolerance * singularValues(0))
        throw CollinearColumns(columnsInNullDirection(factor.nullDirection));

    LeastSquaresResult result;
    result.observations = n;
    result.parameters = p;
    result.absorbedParameters = options.absorbedParameters;
    result.clusterCount = clusterCount;
    result.interceptColumn = interceptColumn;
    result.covarianceKind = options.covariance;
    result.confidenceLevel = options.confidenceLevel;
    result.conditionNumber = singularValues(0) / singularValues(p - 1);
    result.factorisedInDouble = fast.has_value();

    result.coefficients = inverseNorms.cwiseProduct(factor.coefficients);
    result.residuals = factor.residuals;

    const double df = static_cast<double>(n - allParameters);
    result.residualDegreesOfFreedom = df;
    // Cluster errors rest on G cluster scores, so inference uses t(G−1) and F(q, G−1).
    const double inferenceDf = clustered ? static_cast<double>(clusterCount - 1) : df;
    result.inferenceDegreesOfFreedom = inferenceDf;
    result.residualSumOfSquares = result.residuals.squaredNorm();
    result.totalSumOfSquares = interceptColumn
                                   ? (response.array() - response.mean()).matrix().squaredNorm()
                                   : response.squaredNorm();
    result.rSquared = 1.0 - result.residualSumOfSquares / result.totalSumOfSquares;
    const double centring = interceptColumn ? 1.0 : 0.0;
    result.adjustedRSquared = 1.0 - (1.0 - result.rSquared) * (static_cast<double>(n) - centring) / df;
    result.residualStandardDeviation = std::sqrt(result.residualSumOfSquares / df);

    // (XᵀX)⁻¹ = H·Hᵀ with H = D·P·R⁻¹ (D the inverse column norms, P the pivoting).
    const Eigen::MatrixXd pivotedInverse = factor.permutation * factor.upperInverse;
    const Eigen::MatrixXd bread = inverseNorms.asDiagonal() * pivotedInverse;
    if (options.covariance == CovarianceKind::classical) {
        result.covariance = (result.residualSumOfSquares / df) * (bread * bread.transpose());
    } else {
        const Eigen::MatrixXd orthonormalFactor = scaledDesign * pivotedInverse;
        const Eigen::MatrixXd meat =
            clustered ? clusterMeat(orthonormalFactor, result.residuals, options.clusters, clusterCount, df)
                      : robustMeat(orthonormalFactor, result.residuals, options.covariance, df,
                                         options.absorbedLeverage);
        result.covariance = bread * meat * bread.transpose();
    }

    result.standardErrors = result.covariance.diagonal().cwiseSqrt();
    result.tStatistics = result.coefficients.cwiseQuotient(result.standardErrors);
    result.pValues.resize(p);
    for (Eigen::Index j = 0; j < p; ++j)
        result.pValues(j) = studentTwoSidedPValue(result.tStatistics(j), inferenceDf);
    const double critical = studentCriticalValue(options.confidenceLevel, inferenceDf);
    result.lowerBounds = result.coefficients - critical * result.standardErrors;
    result.upperBounds = result.coefficients + critical * result.standardErrors;

    const Eigen::Index tested = interceptColumn ? p - 1 : p;
    if (tested > 0) {
        Eigen::MatrixXd restrictions = Eigen::MatrixXd::Zero(tested, p);
        for (Eigen::Index j = 0, row = 0; j < p; ++j)
            if (!interceptColumn || j != *interceptColumn) restrictions(row++, j) = 1.0;
        const WaldTest overall = testLinearRestrictions(result, restrictions, Eigen::VectorXd::Zero(tested));
        result.fStatistic = overall.fStatistic;
        result.fPValue = overall.pValue;
    } else {
        result.fStatistic = notANumber;
        result.fPValue = notANumber;
    }

    const double nd = static_cast<double>(n);
    const double pi = 3.14159265358979323846;
    result.logLikelihood = -nd / 2.0 * (std::log(2.0 * pi) + std::log(result.residualSumOfSquares / nd) + 1.0);
    result.aic = -2.0 * result.logLikelihood + 2.0 * static_cast<double>(allParameters);
    result.bic = -2.0 * result.logLikelihood + static_cast<double>(allParameters) * std::log(nd);

    if (std::sqrt(result.residualSumOfSquares) <= options.perfectFitTolerance * response.norm())
        result.status = FitStatus::perfectFit;
    else if (result.conditionNumber > options.conditionWarning)
        result.status = FitStatus::illConditioned;
    return result;
}

WaldTest testLinearRestrictions(const LeastSquaresResult& fit, const Eigen::MatrixXd& restrictions,
                                const Eigen::VectorXd& values)
{
    if (restrictions.cols() != fit.parameters || restrictions.rows() != values.size() || values.size() == 0)
        throw std::invalid_argument("restrictions: shape does not match the fit");
    const Eigen::VectorXd discrepancy = restrictions * fit.coefficients - values;
    const Eigen::MatrixXd middle = restrictions * fit.covariance * restrictions.transpose();
    WaldTest test;
    test.numeratorDegreesOfFreedom = static_cast<double>(values.size());
    test.denominatorDegreesOfFreedom = fit.inferenceDegreesOfFreedom;
    const Eigen::LDLT<Eigen::MatrixXd> factor(middle);
    const bool singular = factor.info() != Eigen::Success || !middle.allFinite() ||
                          (factor.vectorD().array() <= 0).any();
    if (singular) {
        // A zero-variance restriction (a perfect fit): the statistic is undefined, not infinite.
        test.fStatistic = notANumber;
        test.pValue = notANumber;
        return test;
    }
    test.fStatistic = discrepancy.dot(factor.solve(discrepancy)) / test.numeratorDegreesOfFreedom;
    test.pValue = fisherUpperPValue(test.fStatistic, test.numeratorDegreesOfFreedom, test.denominatorDegreesOfFreedom);
    return test;
}

} // namespace isoquant
