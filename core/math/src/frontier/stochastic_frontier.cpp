#include "isoquant/math/frontier/stochastic_frontier.hpp"

#include "isoquant/math/frontier/normal_tail.hpp"
#include "isoquant/math/numerics/parameter_inference.hpp"

#include <boost/math/distributions/chi_squared.hpp>
#include <unsupported/Eigen/NonLinearOptimization>

#include <cmath>
#include <limits>
#include <vector>

namespace isoquant {

namespace {

constexpr double notANumber = std::numeric_limits<double>::quiet_NaN();
constexpr double pi = 3.14159265358979323846;
constexpr long evaluationLimit = 200; // per run of the solver
constexpr int solverRuns = 4;         // per start
constexpr double newtonGainTolerance = 1e-8;

// The score equations for Eigen's HybridNonLinearSolver, divided by n so that their size does not
// grow with the rows; the Jacobian (the Hessian of ℓ/n) by central differences of the score.
struct ScoreEquations {
    InefficiencyDistribution distribution;
    FrontierData data;
    long evaluations = 0;

    Eigen::VectorXd score(const Eigen::VectorXd& theta)
    {
        ++evaluations;
        return frontierScore(distribution, data, theta) / static_cast<double>(data.response.size());
    }
    int operator()(const Eigen::VectorXd& theta, Eigen::VectorXd& values)
    {
        values = score(theta);
        return values.allFinite() ? 0 : -1; // a negative value stops the solver
    }
    int df(const Eigen::VectorXd& theta, Eigen::MatrixXd& jacobian)
    {
        jacobian = hessian(theta);
        return jacobian.allFinite() ? 0 : -1;
    }
    // Step cbrt(machine ε)·max(1, |θⱼ|), the usual choice for central differences.
    Eigen::MatrixXd hessian(const Eigen::VectorXd& theta)
    {
        const Eigen::Index size = theta.size();
        Eigen::MatrixXd result(size, size);
        for (Eigen::Index j = 0; j < size; ++j) {
            const double step = 6.0555e-6 * std::max(1.0, std::fabs(theta(j)));
            Eigen::VectorXd ahead = theta, behind = theta;
            ahead(j) += step;
            behind(j) -= step;
            result.col(j) = (score(ahead) - score(behind)) / (2 * step);
        }
        return 0.5 * (result + result.transpose());
    }
};

struct Moments {
    double second = 0;
    double third = 0;
};

Moments centralMoments(const Eigen::VectorXd& residuals)
{
    const Eigen::ArrayXd centred = residuals.array() - residuals.mean();
    return {centred.square().mean(), centred.cube().mean()};
}

// θ from least squares and the moments (the formulas in the header).
Eigen::VectorXd momentStart(const Eigen::VectorXd& coefficients, const Moments& moments,
                            InefficiencyDistribution distribution)
{
    const bool halfNormal = distribution == InefficiencyDistribution::halfNormal;
    double inefficiency = halfNormal ? std::cbrt(moments.third / (std::sqrt(2 / pi) * (1 - 4 / pi)))
                                     : std::cbrt(-moments.third / 2);
    const double varianceShare = halfNormal ? 1 - 2 / pi : 1.0; // var(u) / σᵤ²
    const double largest = std::sqrt(0.9 * moments.second / varianceShare);
    inefficiency = std::min(inefficiency, largest);
    const double noise = std::sqrt(moments.second - varianceShare * inefficiency * inefficiency);
    const Eigen::Index p = coefficients.size();
    Eigen::VectorXd theta(p + 2);
    theta.head(p) = coefficients;
    theta(0) += halfNormal ? inefficiency * std::sqrt(2 / pi) : inefficiency;
    theta(p) = std::log(noise);
    theta(p + 1) = std::log(inefficiency);
    return theta;
}

// A second start, should the first fail: σᵤ = σᵥ sharing the residual variance.
Eigen::VectorXd balancedStart(const Eigen::VectorXd& coefficients, const Moments& moments,
                              InefficiencyDistribution distribution)
{
    Eigen::VectorXd theta = momentStart(coefficients, moments, distribution);
    const Eigen::Index p = coefficients.size();
    const double share = std::sqrt(moments.second / 2);
    theta.head(p) = coefficients;
    theta(0) += distribution == InefficiencyDistribution::halfNormal ? share * std::sqrt(2 / pi) : share;
    theta(p) = theta(p + 1) = std::log(share);
    return theta;
}

struct Attempt {
    Eigen::VectorXd theta;
    double logLikelihood = -std::numeric_limits<double>::infinity();
    Eigen::MatrixXd covariance;
    FitStatus status{FitStatusKind::stopped, ""};
};

std::string solverReason(Eigen::HybridNonLinearSolverSpace::Status status)
{
    using namespace Eigen::HybridNonLinearSolverSpace;
    switch (status) {
    case RelativeErrorTooSmall: return "the score vanished (relative step below 1.5e-8) at a maximum";
    case TooManyFunctionEvaluation: return "evaluation limit reached";
    case TolTooSmall: return "no further improvement possible at machine precision";
    case NotMakingProgressJacobian:
    case NotMakingProgressIterations: return "the solver made no progress";
    case UserAsked: return "the likelihood was not finite at a trial point";
    default: return "the solver stopped";
    }
}

Attempt maximiseFrom(Eigen::VectorXd theta, ScoreEquations& equations)
{
    Attempt attempt;
    const double startLikelihood = frontierLogLikelihood(equations.distribution, equations.data, theta);
    // Restarted from where it stopped, with a fresh Jacobian and trust region, when it runs out of
    // evaluations or progress: the Broyden updates between Jacobians go stale on flat likelihoods.
    auto status = Eigen::HybridNonLinearSolverSpace::Running;
    for (int run = 0; run < solverRuns; ++run) {
        Eigen::HybridNonLinearSolver<ScoreEquations> solver(equations);
        solver.parameters.maxfev = evaluationLimit;
        status = solver.solve(theta);
        if (status == Eigen::HybridNonLinearSolverSpace::RelativeErrorTooSmall ||
            status == Eigen::HybridNonLinearSolverSpace::TolTooSmall ||
            status == Eigen::HybridNonLinearSolverSpace::UserAsked || !theta.allFinite())
            break;
    }
    attempt.theta = theta;
    attempt.status.reason = solverReason(status);
    const bool solved = status == Eigen::HybridNonLinearSolverSpace::RelativeErrorTooSmall ||
                        status == Eigen::HybridNonLinearSolverSpace::TolTooSmall;
    if (!theta.allFinite()) return attempt;
    attempt.logLikelihood = frontierLogLikelihood(equations.distribution, equations.data, theta);
    const auto n = static_cast<double>(equations.data.response.size());
    const Eigen::MatrixXd information = -equations.hessian(theta) * n;
    const Eigen::LLT<Eigen::MatrixXd> factor(information);
    const bool maximum = factor.info() == Eigen::Success &&
                         attempt.logLikelihood >= startLikelihood - 1e-9 * std::fabs(startLikelihood);
    // Where ℓ is flat in one direction (σᵤ small beside σᵥ, say) the solver's steps may keep
    // wandering below any visible change in ℓ: a point is also accepted when the gain a Newton step
    // predicts, ½ gᵀ(−∇²ℓ)⁻¹g (the Newton decrement, Boyd and Vandenberghe 2004, 9.5.1), is below 1e-8.
    const Eigen::VectorXd score = equations.score(theta) * n;
    const bool flatEnough = maximum && 0.5 * score.dot(factor.solve(score)) < newtonGainTolerance;
    if (!solved && !flatEnough) {
        if (status == Eigen::HybridNonLinearSolverSpace::TooManyFunctionEvaluation)
            attempt.status.kind = FitStatusKind::notConverged;
        return attempt;
    }
    if (!maximum) {
        attempt.status.reason = "the score vanished at a point that is not a maximum";
        return attempt;
    }
    if (!solved) attempt.status.reason = "a Newton step would raise the log-likelihood by less than 1e-8";
    attempt.covariance = factor.solve(Eigen::MatrixXd::Identity(theta.size(), theta.size()));
    attempt.status.kind = FitStatusKind::ok;
    return attempt;
}

void setWrongSkew(StochasticFrontierFit& fit, const Eigen::MatrixXd& design,
                  const Eigen::VectorXd& leastSquaresCoefficients)
{
    const Eigen::Index n = design.rows(), p = design.cols();
    const double mlVariance = fit.residuals.squaredNorm() / static_cast<double>(n);
    fit.wrongSkew = true;
    fit.coefficients = leastSquaresCoefficients;
    fit.noiseSd = std::sqrt(mlVariance);
    fit.inefficiencySd = 0;
    fit.logLikelihood = fit.leastSquaresLogLikelihood;
    fit.covariance = Eigen::MatrixXd::Constant(p + 2, p + 2, notANumber);
    const Eigen::MatrixXd crossProducts = design.transpose() * design;
    fit.covariance.topLeftCorner(p, p) =
        crossProducts.ldlt().solve(Eigen::MatrixXd::Identity(p, p)) * mlVariance;
    fit.covariance.row(p).head(p + 1).setZero();
    fit.covariance.col(p).head(p + 1).setZero();
    fit.covariance(p, p) = 0.5 / static_cast<double>(n);
    fit.status = {FitStatusKind::ok, "least squares: the likelihood is largest at inefficiency SD = 0"};
}

} // namespace

StochasticFrontierFit fitStochasticFrontier(const Eigen::MatrixXd& design, const Eigen::VectorXd& response,
                                            const Eigen::VectorXd& leastSquaresCoefficients,
                                            InefficiencyDistribution distribution)
{
    StochasticFrontierFit fit;
    fit.distribution = distribution;
    const auto n = static_cast<double>(response.size());
    const Eigen::Index p = design.cols();
    fit.residuals = response - design * leastSquaresCoefficients;
    const Moments moments = centralMoments(fit.residuals);
    fit.thirdMoment = moments.third;
    fit.leastSquaresLogLikelihood = gaussianLogLikelihood(fit.residuals.squaredNorm(), n);
    if (!(moments.third < 0)) {
        setWrongSkew(fit, design, leastSquaresCoefficients);
        return fit;
    }

    ScoreEquations equations{distribution, FrontierData{design, response}};
    Attempt best;
    for (const Eigen::VectorXd& start : {momentStart(leastSquaresCoefficients, moments, distribution),
                                         balancedStart(leastSquaresCoefficients, moments, distribution)}) {
        Attempt attempt = maximiseFrom(start, equations);
        const bool better = attempt.status.is(FitStatusKind::ok) &&
                            (!best.status.is(FitStatusKind::ok) ||
                             attempt.logLikelihood > best.logLikelihood);
        if (better || best.theta.size() == 0) best = std::move(attempt);
        if (best.status.is(FitStatusKind::ok)) break;
    }
    fit.evaluations = equations.evaluations;
    fit.status = best.status;
    if (!best.status.is(FitStatusKind::ok) && best.theta.allFinite() &&
        frontierScore(distribution, equations.data, best.theta)(p) < 0) {
        fit.status = {FitStatusKind::boundary, "the likelihood still rises as noise SD falls toward 0"};
    }
    fit.coefficients = best.theta.head(p);
    fit.noiseSd = std::exp(best.theta(p));
    fit.inefficiencySd = std::exp(best.theta(p + 1));
    fit.logLikelihood = frontierLogLikelihood(distribution, equations.data, best.theta);
    fit.covariance = best.covariance.size() ? best.covariance : Eigen::MatrixXd::Constant(p + 2, p + 2, notANumber);
    fit.residuals = response - design * fit.coefficients;
    return fit;
}

double inefficiencyTestStatistic(const StochasticFrontierFit& fit)
{
    return std::max(0.0, 2 * (fit.logLikelihood - fit.leastSquaresLogLikelihood));
}

double inefficiencyTestPValue(double statistic)
{
    if (std::isnan(statistic)) return notANumber;
    if (!(statistic > 0)) return 1.0;
    if (std::isinf(statistic)) return 0.0;
    return 0.5 * boost::math::cdf(boost::math::complement(boost::math::chi_squared_distribution<double>(1), statistic));
}

double meanEfficiency(const StochasticFrontierFit& fit)
{
    if (fit.wrongSkew) return 1.0;
    double sum = 0;
    for (Eigen::Index row = 0; row < fit.residuals.size(); ++row)
        sum += expectedEfficiency(
            inefficiencyGivenResidual(fit.distribution, fit.residuals(row), fit.noiseSd, fit.inefficiencySd));
    return sum / static_cast<double>(fit.residuals.size());
}

namespace {

// σ = exp(s) with s estimated (stochastic_frontier.hpp).
ParameterEstimate scaleEstimate(double logValue, double logStandardError, double critical)
{
    const double value = std::exp(logValue);
    return {value, value * logStandardError, notANumber, notANumber, std::exp(logValue - critical * logStandardError),
            std::exp(logValue + critical * logStandardError)};
}

} // namespace

FrontierScaleEstimates frontierScaleEstimates(const StochasticFrontierFit& fit, double level)
{
    const Eigen::Index p = fit.coefficients.size();
    const double critical = normalQuantile((1 + level) / 2);
    const Eigen::MatrixXd& v = fit.covariance;
    FrontierScaleEstimates scales;
    scales.noiseSd = scaleEstimate(std::log(fit.noiseSd), std::sqrt(v(p, p)), critical);
    if (fit.wrongSkew) {
        scales.inefficiencySd = {0, notANumber, notANumber, notANumber, notANumber, notANumber};
        scales.lambda = scales.inefficiencySd;
        return scales;
    }
    scales.inefficiencySd = scaleEstimate(std::log(fit.inefficiencySd), std::sqrt(v(p + 1, p + 1)), critical);
    const double logLambdaVariance = v(p, p) + v(p + 1, p + 1) - 2 * v(p, p + 1); // ln λ = ln σᵤ − ln σᵥ
    scales.lambda = scaleEstimate(std::log(fit.inefficiencySd / fit.noiseSd), std::sqrt(logLambdaVariance), critical);
    return scales;
}

} // namespace isoquant
