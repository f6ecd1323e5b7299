#include "isoquant/math/numerics/nonlinear_least_squares.hpp"

#include "isoquant/math/numerics/not_a_number.hpp"

#include <Eigen/Cholesky>
#include <Eigen/Eigenvalues>
#include <Eigen/QR>
#include <Eigen/SVD>
#include <unsupported/Eigen/NonLinearOptimization>

#include <algorithm>
#include <cmath>
#include <limits>
#include <optional>
#include <stdexcept>

namespace isoquant {

void NonlinearModel::normalEquationsInto(const Eigen::VectorXd& parameters, const Eigen::VectorXd& residuals,
                                         Eigen::MatrixXd& jacobianBuffer, Eigen::MatrixXd& gram,
                                         Eigen::VectorXd& gradient) const
{
    jacobianInto(parameters, jacobianBuffer);
    const Eigen::Index p = jacobianBuffer.cols();
    gram.resize(p, p);
    for (Eigen::Index j = 0; j < p; ++j)
        for (Eigen::Index k = 0; k <= j; ++k) gram(j, k) = gram(k, j) = jacobianBuffer.col(j).dot(jacobianBuffer.col(k));
    gradient.resize(p);
    for (Eigen::Index j = 0; j < p; ++j) gradient(j) = jacobianBuffer.col(j).dot(residuals);
}

namespace {

// Stands in for a residual outside the model's domain: finite, so the solver's norms stay finite,
// and far above any real residual, so the step is rejected (MINPACK rejects a step whose residual
// norm exceeds ten times the current one outright).
constexpr double outsideDomainResidual = 1e100;

// The functor shape Eigen's LevenbergMarquardt expects.
class SolverFunctor {
public:
    explicit SolverFunctor(const NonlinearModel& model) : model_(model) {}

    int values() const { return static_cast<int>(model_.observationCount()); }

    int operator()(const Eigen::VectorXd& parameters, Eigen::VectorXd& residuals) const
    {
        model_.residualsInto(parameters, residuals);
        for (Eigen::Index i = 0; i < residuals.size(); ++i)
            if (!std::isfinite(residuals(i))) residuals(i) = outsideDomainResidual;
        return 0;
    }

    int df(const Eigen::VectorXd& parameters, Eigen::MatrixXd& jacobian) const
    {
        model_.jacobianInto(parameters, jacobian);
        return jacobian.allFinite() ? 0 : -1; // −1 stops the solver (status "user asked")
    }

private:
    const NonlinearModel& model_;
};

std::string describeStop(Eigen::LevenbergMarquardtSpace::Status code)
{
    using namespace Eigen::LevenbergMarquardtSpace;
    switch (code) {
    case RelativeReductionTooSmall: return "relative reduction of the sum of squares below tolerance";
    case RelativeErrorTooSmall: return "relative step below tolerance";
    case RelativeErrorAndReductionTooSmall: return "relative reduction and step below tolerance";
    case CosinusTooSmall: return "residuals orthogonal to the Jacobian";
    case TooManyFunctionEvaluation: return "evaluation limit reached";
    case FtolTooSmall:
    case XtolTooSmall:
    case GtolTooSmall: return "no further reduction possible at machine precision";
    case UserAsked: return "Jacobian not finite";
    default: return "stopped";
    }
}

NonlinearStatus statusOf(Eigen::LevenbergMarquardtSpace::Status code)
{
    using namespace Eigen::LevenbergMarquardtSpace;
    switch (code) {
    case TooManyFunctionEvaluation: return NonlinearStatus::evaluationLimit;
    case UserAsked: return NonlinearStatus::stopped;
    default: return NonlinearStatus::converged;
    }
}

struct GaussNewtonStep {
    Eigen::VectorXd direction; // −J⁺·r
    double length = 0;         // ‖J·direction‖
};

std::optional<GaussNewtonStep> gaussNewtonStep(const NonlinearModel& model, const Eigen::VectorXd& parameters,
                                               double rankTolerance)
{
    const Eigen::VectorXd residuals = model.residuals(parameters);
    const Eigen::MatrixXd jacobian = model.jacobian(parameters);
    if (!residuals.allFinite() || !jacobian.allFinite()) return std::nullopt;
    Eigen::ColPivHouseholderQR<Eigen::MatrixXd> qr(jacobian);
    qr.setThreshold(rankTolerance);
    if (qr.rank() < jacobian.cols()) return std::nullopt;
    GaussNewtonStep step;
    step.direction = qr.solve(-residuals);
    step.length = (jacobian * step.direction).norm();
    return step;
}

// Δ = −(JᵀJ)⁻¹·Jᵀr solved as S·(S·JᵀJ·S)⁻¹·S·(−Jᵀr), S = diag(JᵀJ)^(−1/2), by Cholesky; empty
// where JᵀJ or Jᵀr is not finite, J has a zero column, or the scaled matrix's eigenvalues are further apart
// than conditionLimit. The length ‖J·Δ‖ is √(Δᵀ·JᵀJ·Δ).
std::optional<GaussNewtonStep> normalEquationsStep(const Eigen::MatrixXd& gram, const Eigen::VectorXd& gradient,
                                                   double conditionLimit)
{
    const Eigen::Index p = gram.cols();
    // An infinite or NaN entry of J makes its column's ‖·‖² infinite or NaN (and so does a finite
    // column too large to square, which then goes to Levenberg–Marquardt as well).
    if (!gram.allFinite() || !gradient.allFinite()) return std::nullopt;
    const Eigen::VectorXd scale = gram.diagonal().cwiseSqrt().cwiseInverse();
    if (!scale.allFinite()) return std::nullopt;
    const Eigen::MatrixXd scaled = scale.asDiagonal() * gram * scale.asDiagonal();
    const Eigen::SelfAdjointEigenSolver<Eigen::MatrixXd> spectrum(scaled, Eigen::EigenvaluesOnly);
    const double smallest = spectrum.eigenvalues()(0);
    if (!(smallest > 0) || spectrum.eigenvalues()(p - 1) > conditionLimit * smallest) return std::nullopt;
    const Eigen::LLT<Eigen::MatrixXd> factor(scaled);
    if (factor.info() != Eigen::Success) return std::nullopt;
    GaussNewtonStep step;
    step.direction = -(scale.asDiagonal() * factor.solve(scale.asDiagonal() * gradient));
    step.length = std::sqrt(std::max(0.0, step.direction.dot(gram * step.direction)));
    return step;
}

} // namespace

Eigen::VectorXd refinedByGaussNewton(const NonlinearModel& model, const Eigen::VectorXd& parameters, int maximumSteps,
                                     double rankTolerance)
{
    Eigen::VectorXd refined = parameters;
    std::optional<GaussNewtonStep> step = gaussNewtonStep(model, refined, rankTolerance);
    for (int k = 0; step && k < maximumSteps; ++k) {
        const Eigen::VectorXd next = refined + step->direction;
        std::optional<GaussNewtonStep> following = gaussNewtonStep(model, next, rankTolerance);
        if (!following || !(following->length < step->length)) break;
        refined = next;
        step = std::move(following);
    }
    return refined;
}

std::optional<NonlinearLeastSquaresResult> minimizeByGaussNewton(const NonlinearModel& model, const Eigen::VectorXd& start,
                                                                 const GaussNewtonOptions& options,
                                                                 const std::function<bool(const Eigen::VectorXd&)>& known)
{
    const Eigen::Index n = model.observationCount();
    const Eigen::Index p = model.parameterCount();
    if (p < 1 || start.size() != p) throw std::invalid_argument("start: needs one value per parameter");
    if (n <= p) throw std::invalid_argument("model: needs more observations than parameters");
    Eigen::MatrixXd jacobian; // reused from one evaluation to the next, where the model forms J
    Eigen::MatrixXd gram;
    Eigen::VectorXd gradient;
    Eigen::Index evaluations = 0;
    const auto stepAt = [&](const Eigen::VectorXd& parameters, Eigen::VectorXd& residuals) -> std::optional<GaussNewtonStep> {
        ++evaluations;
        model.residualsInto(parameters, residuals);
        if (!std::isfinite(residuals.squaredNorm())) return std::nullopt; // a residual not finite, or too large to square
        model.normalEquationsInto(parameters, residuals, jacobian, gram, gradient);
        return normalEquationsStep(gram, gradient, options.conditionLimit);
    };
    const auto endedAt = [&](Eigen::VectorXd point, Eigen::VectorXd residualsThere, NonlinearStatus status,
                             const char* reason) {
        NonlinearLeastSquaresResult result;
        result.parameters = std::move(point);
        result.residuals = std::move(residualsThere);
        result.observations = n;
        result.evaluations = evaluations;
        result.jacobianEvaluations = evaluations;
        result.status = status;
        result.stopReason = reason;
        return result;
    };
    Eigen::VectorXd parameters = start;
    Eigen::VectorXd residuals;
    Eigen::VectorXd nextResiduals; // the two residual buffers trade places at each step taken
    // A point has settled when the step it would take is short (GaussNewtonOptions::settledLength).
    const auto settled = [&](const GaussNewtonStep& from, double sumOfSquaresThere) {
        return from.length <= options.settledLength * std::sqrt(sumOfSquaresThere / static_cast<double>(n - p));
    };
    std::optional<GaussNewtonStep> step = stepAt(parameters, residuals);
    if (!step) return std::nullopt;
    double sumOfSquares = residuals.squaredNorm();
    if (settled(*step, sumOfSquares))
        return endedAt(std::move(parameters), std::move(residuals), NonlinearStatus::converged, "Gauss–Newton steps settled");
    for (int k = 0; k < options.maximumSteps; ++k) {
        Eigen::VectorXd next = parameters + step->direction;
        if (known && known(next))
            return endedAt(std::move(next), Eigen::VectorXd(), NonlinearStatus::stopped, "reached a point the caller knows");
        std::optional<GaussNewtonStep> following = stepAt(next, nextResiduals);
        if (!following) return std::nullopt;
        const double nextSumOfSquares = nextResiduals.squaredNorm();
        if (nextSumOfSquares > sumOfSquares * (1 + options.sumOfSquaresSlack)) return std::nullopt;
        if (settled(*following, nextSumOfSquares))
            return endedAt(std::move(next), std::move(nextResiduals), NonlinearStatus::converged, "Gauss–Newton steps settled");
        if (!(following->length <= options.slowestShrink * step->length)) return std::nullopt; // stalled
        parameters = std::move(next);
        residuals.swap(nextResiduals);
        sumOfSquares = nextSumOfSquares;
        step = std::move(following);
    }
    return std::nullopt;
}

ParameterInference nonlinearInference(Eigen::MatrixXd jacobian, const Eigen::VectorXd& residuals,
                                      const Eigen::VectorXd& parameters, double confidenceLevel,
                                      double rankTolerance)
{
    const Eigen::Index n = jacobian.rows();
    const Eigen::Index p = jacobian.cols();
    const double residualDegreesOfFreedom = static_cast<double>(n - p);
    const double variance = residuals.squaredNorm() / residualDegreesOfFreedom;

    // (JᵀJ)⁻¹ from the SVD of the column-scaled Jacobian J·S = Q·R, whose singular values and right
    // singular vectors are R's: (JᵀJ)⁻¹ = S·V·Σ⁻²·Vᵀ·S. J·S and its Householder QR are formed in
    // the Jacobian's own storage, and only the p × p factor R goes to the SVD.
    Eigen::MatrixXd covariance = Eigen::MatrixXd::Constant(p, p, notANumber);
    const Eigen::VectorXd columnNorms = jacobian.colwise().norm().transpose();
    // A column's norm is infinite or NaN where it holds such a value (or overflows when squared).
    bool deficient = (columnNorms.array() == 0).any() || !columnNorms.allFinite();
    if (!deficient) {
        jacobian *= columnNorms.cwiseInverse().asDiagonal();
        const Eigen::HouseholderQR<Eigen::Ref<Eigen::MatrixXd>> factor(jacobian);
        const Eigen::MatrixXd upper = factor.matrixQR().topRows(p).triangularView<Eigen::Upper>();
        const Eigen::JacobiSVD<Eigen::MatrixXd> svd(upper, Eigen::ComputeFullV);
        const Eigen::VectorXd singular = svd.singularValues();
        deficient = singular(p - 1) <= rankTolerance * singular(0);
        if (!deficient) {
            const Eigen::MatrixXd root = columnNorms.cwiseInverse().asDiagonal() * svd.matrixV() *
                                         singular.cwiseInverse().asDiagonal();
            covariance = variance * root * root.transpose();
        }
    }
    return inferParameters(parameters, std::move(covariance), residualDegreesOfFreedom, confidenceLevel);
}

FitSummary nonlinearSummary(const Eigen::VectorXd& residuals, Eigen::Index parameterCount)
{
    FitSummary summary;
    summary.observations = residuals.size();
    summary.parameters = parameterCount;
    summary.residualSumOfSquares = residuals.squaredNorm();
    summary.residualDegreesOfFreedom = static_cast<double>(residuals.size() - parameterCount);
    summary.inferenceDegreesOfFreedom = summary.residualDegreesOfFreedom;
    summary.residualStandardDeviation = std::sqrt(summary.residualSumOfSquares / summary.residualDegreesOfFreedom);
    return summary;
}

NonlinearLeastSquaresResult minimizeSumOfSquares(const NonlinearModel& model, const Eigen::VectorXd& start,
                                                 const NonlinearLeastSquaresOptions& options)
{
    const Eigen::Index n = model.observationCount();
    const Eigen::Index p = model.parameterCount();
    if (p < 1 || start.size() != p) throw std::invalid_argument("start: needs one value per parameter");
    if (n <= p) throw std::invalid_argument("model: needs more observations than parameters");
    if (!start.allFinite() || !model.residuals(start).allFinite())
        throw std::invalid_argument("start: the model is not defined there");

    SolverFunctor functor(model);
    Eigen::LevenbergMarquardt<SolverFunctor> solver(functor);
    solver.parameters.ftol = options.relativeReductionTolerance;
    solver.parameters.xtol = options.relativeStepTolerance;
    solver.parameters.gtol = options.gradientTolerance;
    solver.parameters.maxfev = options.maximumEvaluations;

    NonlinearLeastSquaresResult result;
    result.parameters = start;
    const auto code = solver.minimize(result.parameters);
    result.status = statusOf(code);
    result.stopReason = describeStop(code);
    result.evaluations = solver.nfev;
    result.jacobianEvaluations = solver.njev;
    result.observations = n;
    result.residuals = model.residuals(result.parameters);
    return result;
}

NonlinearLeastSquaresResult fitNonlinearLeastSquares(const NonlinearModel& model, const Eigen::VectorXd& start,
                                                     const NonlinearLeastSquaresOptions& options)
{
    NonlinearLeastSquaresResult result = minimizeSumOfSquares(model, start, options);
    result.inference = nonlinearInference(model.jacobian(result.parameters), result.residuals, result.parameters,
                                          options.confidenceLevel, options.rankTolerance);
    result.summary = nonlinearSummary(result.residuals, result.parameters.size());
    return result;
}

} // namespace isoquant
