#include "isoquant/math/numerics/least_squares.hpp"

#include "isoquant/math/numerics/distributions.hpp"
#include "isoquant/math/numerics/exact_elementwise.hpp"
#include "isoquant/math/numerics/not_a_number.hpp"

#include "numerics/least_squares_factor.hpp"

#include <Eigen/Cholesky>

#include <cmath>
#include <limits>
#include <numeric>
#include <sstream>

namespace isoquant {

namespace {

// A leverage this close to 1 counts as 1: hᵢᵢ = ‖Aᵢ‖² carries rounding of a few p·ε (1e-14 at
// most here), and a true 1 − 1e-10 would already scale its row's HC3 weight by 1e20 (common
// practice, no source).
constexpr double unitLeverage = 1.0 - 1e-10;

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

void validateShape(const RegressionRows& rows, std::optional<Eigen::Index> interceptColumn,
                   const LeastSquaresOptions& options)
{
    if (rows.columns() < 1) throw std::invalid_argument("design: needs at least one column");
    if (rows.rows() <= rows.columns()) throw std::invalid_argument("design: needs more rows than columns");
    if (interceptColumn && (*interceptColumn < 0 || *interceptColumn >= rows.columns()))
        throw std::invalid_argument("interceptColumn: outside the design");
    if (!(options.confidenceLevel > 0 && options.confidenceLevel < 1))
        throw std::invalid_argument("confidenceLevel: must lie strictly between 0 and 1");
    if (options.absorbedParameters < 0 || rows.rows() <= rows.columns() + options.absorbedParameters)
        throw std::invalid_argument("design: needs more rows than parameters, absorbed ones included");
    if (options.rowsPerBlock < 1) throw std::invalid_argument("rowsPerBlock: must be at least 1");
    if (options.rowsPerFill < 1) throw std::invalid_argument("rowsPerFill: must be at least 1");
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

// The sandwich "meat" in the coordinates of A = X·H, H = D·P·R⁻¹ (the bread), whose columns are
// orthonormal, so that hᵢᵢ = ‖Aᵢ‖² are the leverages and the covariance is H·meat·Hᵀ:
//   HC1: Aᵀ·diag(eᵢ²)·A · n/(n−p);   HC3: Aᵀ·diag(eᵢ²/(1−hᵢᵢ)²)·A;
//   CR1: Σ_g s_g s_gᵀ with s_g = A_gᵀ e_g the score of cluster g, times G/(G−1)·(n−1)/(n−p),
// p counting the absorbed parameters too, but not those nested in the clusters beyond one
// (absorbedNestedInClusters). Accumulated a block of rows at a time.
class MeatAccumulator {
public:
    MeatAccumulator(const LeastSquaresOptions& options, const Eigen::MatrixXd& bread, Eigen::Index rows,
                    Eigen::Index clusterCount, double residualDegreesOfFreedom)
        : options_(options), bread_(bread), rows_(rows), clusterCount_(clusterCount),
          residualDegreesOfFreedom_(residualDegreesOfFreedom),
          sum_(Eigen::MatrixXd::Zero(bread.cols(), options.covariance == CovarianceKind::cluster ? clusterCount : bread.cols()))
    {
    }

    void add(Eigen::Index first, const Eigen::Ref<const Eigen::MatrixXd>& design,
             const Eigen::Ref<const Eigen::VectorXd>& residuals)
    {
        const Eigen::MatrixXd orthonormal = design * bread_;
        if (options_.covariance == CovarianceKind::cluster) {
            for (Eigen::Index i = 0; i < residuals.size(); ++i)
                sum_.col(options_.clusters[static_cast<std::size_t>(first + i)]) +=
                    residuals(i) * orthonormal.row(i).transpose();
            return;
        }
        Eigen::VectorXd weights = residuals.array().square();
        if (options_.covariance == CovarianceKind::hc3) {
            Eigen::VectorXd leverage = orthonormal.rowwise().squaredNorm();
            if (options_.absorbedLeverage.size() == rows_) leverage += options_.absorbedLeverage.segment(first, residuals.size());
            // hᵢᵢ = 1 makes the HC3 weight 0/0: the covariance is undefined, not huge. The row is
            // named rather than letting NaN reach every standard error.
            for (Eigen::Index i = 0; i < leverage.size(); ++i)
                if (leverage(i) >= unitLeverage) throw UnitLeverage(first + i);
            weights = weights.array() / (1.0 - leverage.array()).square();
        }
        sum_.noalias() += orthonormal.transpose() * weights.asDiagonal() * orthonormal;
    }

    Eigen::MatrixXd meat() const
    {
        const double n = static_cast<double>(rows_);
        if (options_.covariance == CovarianceKind::hc1) return sum_ * (n / residualDegreesOfFreedom_);
        if (options_.covariance == CovarianceKind::hc3) return sum_;
        const double g = static_cast<double>(clusterCount_);
        const double clusterDf = residualDegreesOfFreedom_ + static_cast<double>(options_.absorbedNestedInClusters);
        return (g / (g - 1.0)) * ((n - 1.0) / clusterDf) * (sum_ * sum_.transpose());
    }

private:
    const LeastSquaresOptions& options_;
    const Eigen::MatrixXd& bread_;
    Eigen::Index rows_;
    Eigen::Index clusterCount_;
    double residualDegreesOfFreedom_;
    Eigen::MatrixXd sum_;
};

// The overall F: every coefficient but the constant (interceptColumn) is zero.
void addOverallTest(LeastSquaresResult& result)
{
    FitSummary& summary = result.summary;
    const Eigen::Index p = summary.parameters;
    const auto& interceptColumn = result.interceptColumn;
    const Eigen::Index tested = interceptColumn ? p - 1 : p;
    summary.overallRestrictions = tested;
    if (tested == 0) {
        summary.fStatistic = notANumber;
        summary.fPValue = notANumber;
        return;
    }
    Eigen::MatrixXd restrictions = Eigen::MatrixXd::Zero(tested, p);
    for (Eigen::Index j = 0, row = 0; j < p; ++j)
        if (!interceptColumn || j != *interceptColumn) restrictions(row++, j) = 1.0;
    const WaldTest overall = testLinearRestrictions(result, restrictions, Eigen::VectorXd::Zero(tested));
    summary.fStatistic = overall.fStatistic;
    summary.fPValue = overall.pValue;
    summary.overallTestExceedsClusters = overall.exceedsClusters;
}

// Well-conditioned designs (the usual logs of inputs) are factorised in double, blocked; the rest,
// and every rank decision that the double factor cannot settle, in long double.
struct ChosenFactor {
    LeastSquaresFactor factor;
    ResponseMoments response;
    bool inDouble = false;
    bool fromNormalEquations = false; // its coefficients still need the refinement step
};

// Many rows of a well-conditioned design take the normal equations (LeastSquaresOptions).
std::optional<ChosenFactor> normalEquationsFactor(const RegressionRows& rows, const LeastSquaresOptions& options)
{
    if (rows.rows() < options.normalEquationsFromRows || !(options.doublePrecisionErrorLimit > 0)) return std::nullopt;
    std::optional<DoubleRouteFactor> normal = factorByNormalEquations(rows, options.rowsPerFill, options.rowsPerBlock);
    if (!normal || !(normal->errorEstimate <= options.doublePrecisionErrorLimit)) return std::nullopt;
    ChosenFactor chosen;
    chosen.factor = std::move(normal->factor);
    chosen.response = normal->response;
    chosen.inDouble = true;
    chosen.fromNormalEquations = true;
    return chosen;
}

ChosenFactor chooseFactor(const RegressionRows& rows, const LeastSquaresOptions& options)
{
    if (std::optional<ChosenFactor> normal = normalEquationsFactor(rows, options)) return std::move(*normal);
    DoubleRouteFactor fast = factorByBlocksInDouble(rows, options.rowsPerBlock);
    ChosenFactor chosen;
    chosen.response = fast.response;
    const Eigen::Index p = rows.columns();
    const bool rankDeficient = fast.factor.singularValues(p - 1) <= options.rankTolerance * fast.factor.singularValues(0);
    chosen.inDouble = !rankDeficient && options.doublePrecisionErrorLimit > 0 &&
                      fast.errorEstimate <= options.doublePrecisionErrorLimit;
    chosen.factor = chosen.inDouble ? std::move(fast.factor) : factorInExtendedPrecision(rows, fast.factor.columnScales);
    return chosen;
}

// exactFit when ‖residuals‖ ≤ perfectFitTolerance·‖y‖, else illConditioned above conditionWarning.
FitStatus leastSquaresStatus(const FitSummary& summary, double responseNorm, const LeastSquaresOptions& options)
{
    FitStatus status;
    if (std::sqrt(summary.residualSumOfSquares) <= options.perfectFitTolerance * responseNorm) {
        status.kind = FitStatusKind::exactFit;
        status.reason = "every residual is zero: standard errors are zero and tests are undefined";
    } else if (summary.conditionNumber > options.conditionWarning) {
        std::ostringstream reason;
        reason << "the scaled condition number " << summary.conditionNumber << " exceeds " << options.conditionWarning
               << ": the columns are nearly collinear and the estimates fragile";
        status.kind = FitStatusKind::illConditioned;
        status.reason = reason.str();
    }
    return status;
}

// A pass after the factor: the residuals (the extended route has them already) with Σr², Σe^r
// (LeastSquaresOptions::sumExpResiduals) and the robust meat, which it returns (empty for classical errors).
Eigen::MatrixXd formResiduals(const RegressionRows& rows, const std::optional<HeldColumns>& held, const LeastSquaresOptions& options,
                              LeastSquaresFactor& factor, const Eigen::MatrixXd& bread, LeastSquaresResult& result)
{
    const Eigen::Index n = rows.rows();
    const bool robust = options.covariance != CovarianceKind::classical;
    MeatAccumulator meat(options, bread, n, result.summary.clusterCount, result.summary.residualDegreesOfFreedom);
    if (factor.residuals.size() != n) factor.residuals.resize(n);
    const bool needResiduals = result.factorisedInDouble;
    CompensatedSum sumOfExps;
    const auto addExps = [&](const Eigen::Ref<const Eigen::VectorXd>& residuals) {
        if (options.sumExpResiduals) sumOfExps.add(sumOfExactExps(residuals));
    };
    if (needResiduals && !robust && held) {
        // Held in memory: the residuals are formed in place, a block of rows at a time.
        forEachHeldBlock(*held, n, options.rowsPerBlock, factor.coefficients, factor.residuals,
                         [&](Eigen::Index, const auto& residuals) { addExps(residuals); });
    } else if (needResiduals || robust) {
        forEachBlock(rows, options.rowsPerBlock, [&](Eigen::Index first, const auto& design, const auto& response) {
            auto residuals = factor.residuals.segment(first, design.rows());
            if (needResiduals) {
                residuals = response;
                residuals.noalias() -= design * factor.coefficients;
            }
            if (robust) meat.add(first, design, residuals);
            addExps(residuals);
        });
    } else {
        addExps(factor.residuals); // the long double route's, formed with its factor
    }
    if (options.sumExpResiduals) result.sumOfExpResiduals = sumOfExps.value();
    result.residuals = std::move(factor.residuals);
    result.summary.residualSumOfSquares = result.residuals.squaredNorm();
    return robust ? meat.meat() : Eigen::MatrixXd();
}

} // namespace

UnitLeverage::UnitLeverage(Eigen::Index row)
    : std::runtime_error("a row has leverage 1; HC3 errors are undefined"), row_(row)
{
}

LeastSquaresResult fitLeastSquares(const Eigen::MatrixXd& design, const Eigen::VectorXd& response,
                                   std::optional<Eigen::Index> interceptColumn,
                                   const LeastSquaresOptions& options)
{
    if (design.rows() != response.size())
        throw std::invalid_argument("design and response: different numbers of rows");
    return fitLeastSquares(MatrixRows(design, response), interceptColumn, options);
}

LeastSquaresResult fitLeastSquares(const RegressionRows& rows, std::optional<Eigen::Index> interceptColumn,
                                   const LeastSquaresOptions& options)
{
    validateShape(rows, interceptColumn, options);
    const bool clustered = options.covariance == CovarianceKind::cluster;
    const Eigen::Index clusterCount = clustered ? countClusters(options.clusters, rows.rows()) : 0;

    const Eigen::Index n = rows.rows();
    const Eigen::Index p = rows.columns();
    const Eigen::Index allParameters = p + options.absorbedParameters;

    // Columns are equilibrated by powers of two (least_squares_factor.hpp): the rank decision and
    // the condition number do not depend on the units of the data, and no digit of it is perturbed
    // (an inexact scaling alone costs Wampler5 three digits).
    ChosenFactor chosen = chooseFactor(rows, options);
    LeastSquaresFactor& factor = chosen.factor;
    const Eigen::VectorXd& singularValues = factor.singularValues;
    if (singularValues(p - 1) <= options.rankTolerance * singularValues(0))
        throw CollinearColumns(columnsInNullDirection(factor.nullDirection));

    LeastSquaresResult result;
    FitSummary& summary = result.summary;
    summary.observations = n;
    summary.parameters = p;
    summary.absorbedParameters = options.absorbedParameters;
    summary.clusterCount = clusterCount;
    summary.covarianceKind = options.covariance;
    summary.conditionNumber = singularValues(0) / singularValues(p - 1);
    result.interceptColumn = interceptColumn;
    result.factorisedInDouble = chosen.inDouble;
    result.fromNormalEquations = chosen.fromNormalEquations;

    const double df = static_cast<double>(n - allParameters);
    summary.residualDegreesOfFreedom = df;
    // Cluster errors rest on G cluster scores, so inference uses t(G−1) and F(q, G−1).
    const double inferenceDf = clustered ? static_cast<double>(clusterCount - 1) : df;
    summary.inferenceDegreesOfFreedom = inferenceDf;

    // (XᵀX)⁻¹ = H·Hᵀ with H = D·P·R⁻¹ (D the column scales, P the pivoting).
    const Eigen::MatrixXd bread = factor.columnScales.asDiagonal() * (factor.permutation * factor.upperInverse);
    const bool robust = options.covariance != CovarianceKind::classical;
    const std::optional<HeldColumns> held = rows.heldColumns();
    // Without residuals to keep, the refinement's pass gives their sums too (one pass, not two).
    std::optional<ResidualSums> sums;
    Eigen::MatrixXd meat;
    if (chosen.fromNormalEquations) {
        if (!options.keepResiduals && !robust && held)
            sums = refineWithResidualSums(*held, n, options.rowsPerFill, options.rowsPerBlock, factor,
                                          options.sumExpResiduals);
        else
            refineCoefficients(rows, options.rowsPerFill, options.rowsPerBlock, factor);
    }
    if (sums) {
        summary.residualSumOfSquares = sums->squares;
        result.sumOfExpResiduals = sums->exps;
    } else {
        meat = formResiduals(rows, held, options, factor, bread, result);
        if (!options.keepResiduals) result.residuals = Eigen::VectorXd();
    }
    summary.totalSumOfSquares = interceptColumn ? chosen.response.centredSumOfSquares : chosen.response.sumOfSquares;
    summary.rSquared = 1.0 - summary.residualSumOfSquares / summary.totalSumOfSquares;
    const double centring = interceptColumn ? 1.0 : 0.0;
    summary.adjustedRSquared = 1.0 - (1.0 - summary.rSquared) * (static_cast<double>(n) - centring) / df;
    summary.residualStandardDeviation = std::sqrt(summary.residualSumOfSquares / df);

    Eigen::MatrixXd covariance = robust ? Eigen::MatrixXd(bread * meat * bread.transpose())
                                        : Eigen::MatrixXd((summary.residualSumOfSquares / df) * (bread * bread.transpose()));
    result.inference = inferParameters(factor.coefficients, std::move(covariance), inferenceDf, options.confidenceLevel);
    addOverallTest(result);
    setGaussianLikelihood(summary);
    result.status = leastSquaresStatus(summary, std::sqrt(chosen.response.sumOfSquares), options);
    return result;
}

WaldTest testLinearRestrictions(const LeastSquaresResult& fit, const Eigen::MatrixXd& restrictions,
                                const Eigen::VectorXd& values)
{
    const FitSummary& summary = fit.summary;
    if (restrictions.cols() != summary.parameters || restrictions.rows() != values.size() || values.size() == 0)
        throw std::invalid_argument("restrictions: shape does not match the fit");
    const Eigen::VectorXd discrepancy = restrictions * fit.inference.estimates - values;
    const Eigen::MatrixXd middle = restrictions * fit.inference.covariance * restrictions.transpose();
    WaldTest test;
    test.numeratorDegreesOfFreedom = static_cast<double>(values.size());
    test.denominatorDegreesOfFreedom = summary.inferenceDegreesOfFreedom;
    if (summary.covarianceKind == CovarianceKind::cluster && values.size() > summary.clusterCount - 1) {
        test.exceedsClusters = true;
        test.fStatistic = notANumber;
        test.pValue = notANumber;
        return test;
    }
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
