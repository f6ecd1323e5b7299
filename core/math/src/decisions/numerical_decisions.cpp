#include "isoquant/math/decisions/numerical_decisions.hpp"

#include "isoquant/math/forms/cobb_douglas.hpp"
#include "isoquant/math/numerics/exact_elementwise.hpp"
#include "isoquant/math/forms/homogeneous_cost.hpp"
#include "isoquant/math/numerics/level_roots.hpp"
#include "isoquant/math/forms/local_shape.hpp"
#include "isoquant/math/numerics/log_sum.hpp"
#include "isoquant/math/messages/text.hpp"

#include <unsupported/Eigen/LevenbergMarquardt>

#include <cmath>
#include <optional>

namespace isoquant {

namespace {

// Returned for a trial point outside the doubles: Levenberg–Marquardt then rejects the step and
// shortens its trust region, instead of stopping.
constexpr double offDomainResidual = 1e50;
// |ln x| beyond this leaves the ordinary doubles (e^700 ≈ 1e304).
constexpr double logBound = 700;

enum class Closing { output, spending };

// The tangency system of the least-cost and budget problems (numerical_decisions.hpp).
struct TangencySystem : Eigen::DenseFunctor<double> {
    TangencySystem(const Technology& technology, const Eigen::VectorXd& prices, Closing closing, double logLevel)
        : Eigen::DenseFunctor<double>(static_cast<int>(prices.size()) + 1, static_cast<int>(prices.size()) + 1),
          technology(technology), logPrices(exactLog(prices.array())), closing(closing), logLevel(logLevel)
    {
    }

    const Technology& technology;
    Eigen::ArrayXd logPrices;
    Closing closing;
    double logLevel;

    Eigen::Index k() const { return logPrices.size(); }

    bool inDomain(const Eigen::VectorXd& u) const
    {
        return u.allFinite() && u.head(k()).cwiseAbs().maxCoeff() <= logBound && std::fabs(u(k())) <= 2 * logBound;
    }

    // wᵢxᵢ/μ
    Eigen::ArrayXd spendingOverMu(const Eigen::VectorXd& u) const
    {
        return exactExp(u.head(k()).array() + logPrices - u(k()));
    }

    int operator()(const Eigen::VectorXd& u, Eigen::VectorXd& residuals) const
    {
        residuals.setConstant(offDomainResidual);
        if (!inDomain(u)) return 0;
        const Eigen::VectorXd x = u.head(k()).array().exp();
        for (Eigen::Index i = 0; i < k(); ++i) residuals(i) = spendingOverMu(u)(i) - technology.elasticity(x, i);
        residuals(k()) = closing == Closing::output ? technology.logOutput(x) - logLevel
                                                    : logSumExp(u.head(k()).array() + logPrices) - logLevel;
        if (!residuals.allFinite()) residuals.setConstant(offDomainResidual);
        return 0;
    }

    // ∂(wᵢxᵢ/μ − eᵢ)/∂ln xⱼ = δᵢⱼ·wᵢxᵢ/μ − (δᵢⱼeᵢ + Sᵢⱼ − eᵢeⱼ);  ∂/∂ln μ = −wᵢxᵢ/μ;
    // ∂ln f/∂ln xⱼ = eⱼ;  ∂ln Σwx/∂ln xⱼ = wⱼxⱼ/Σwx.
    int df(const Eigen::VectorXd& u, Eigen::MatrixXd& jacobian) const
    {
        const Eigen::VectorXd x = u.head(k()).array().exp();
        const LocalShape shape = localShape(technology, x);
        if (!isFinite(shape)) return -1;
        const Eigen::VectorXd& e = shape.elasticities;
        const Eigen::VectorXd spending = spendingOverMu(u).matrix();
        jacobian.setZero(k() + 1, k() + 1);
        jacobian.topLeftCorner(k(), k()) = Eigen::MatrixXd(spending.asDiagonal()) -
                                           (Eigen::MatrixXd(e.asDiagonal()) + shape.scaledHessian - e * e.transpose());
        jacobian.col(k()).head(k()) = -spending;
        if (closing == Closing::output) {
            jacobian.row(k()).head(k()) = e.transpose();
        } else {
            const Eigen::ArrayXd logSpending = u.head(k()).array() + logPrices;
            jacobian.row(k()).head(k()) = (logSpending - logSumExp(logSpending)).exp().matrix().transpose();
        }
        return jacobian.allFinite() ? 0 : -1;
    }
};

// The profit system p·fᵢ(x)/wᵢ − 1 = 0 in z = ln x; ∂/∂ln xⱼ = p·fᵢⱼ·xⱼ/wᵢ.
struct ProfitSystem : Eigen::DenseFunctor<double> {
    ProfitSystem(const Technology& technology, double outputPrice, const Eigen::VectorXd& prices)
        : Eigen::DenseFunctor<double>(static_cast<int>(prices.size()), static_cast<int>(prices.size())),
          technology(technology), outputPrice(outputPrice), prices(prices)
    {
    }

    const Technology& technology;
    double outputPrice;
    Eigen::VectorXd prices;

    int operator()(const Eigen::VectorXd& z, Eigen::VectorXd& residuals) const
    {
        residuals.setConstant(offDomainResidual);
        if (!z.allFinite() || z.cwiseAbs().maxCoeff() > logBound) return 0;
        const Eigen::VectorXd x = z.array().exp();
        for (Eigen::Index i = 0; i < z.size(); ++i)
            residuals(i) = outputPrice * technology.marginalProduct(x, i) / prices(i) - 1;
        if (!residuals.allFinite()) residuals.setConstant(offDomainResidual);
        return 0;
    }

    int df(const Eigen::VectorXd& z, Eigen::MatrixXd& jacobian) const
    {
        const Eigen::VectorXd x = z.array().exp();
        jacobian.resize(z.size(), z.size());
        for (Eigen::Index i = 0; i < z.size(); ++i)
            for (Eigen::Index j = 0; j < z.size(); ++j)
                jacobian(i, j) = outputPrice * technology.secondPartial(x, i, j) * x(j) / prices(i);
        return jacobian.allFinite() ? 0 : -1;
    }
};

// Runs Levenberg–Marquardt from `start` (overwritten with the answer); returns the largest
// |residual| there.
template <typename System>
double solveSystem(System& system, Eigen::VectorXd& start, const NumericalSolveOptions& options)
{
    Eigen::LevenbergMarquardt<System> solver(system);
    solver.setMaxfev(options.maxEvaluations);
    // Stop on the step size or the reduction only when they reach rounding level; acceptance is
    // judged below on the residuals themselves.
    solver.setXtol(1e-14);
    solver.setFtol(1e-14);
    solver.minimize(start);
    Eigen::VectorXd residuals(system.values());
    system(start, residuals);
    return residuals.cwiseAbs().maxCoeff();
}

// The Cobb-Douglas with f's value and elasticities at x, or empty where an elasticity is not positive.
std::optional<CobbDouglas> localCobbDouglas(const Technology& technology, const Eigen::VectorXd& x)
{
    Eigen::VectorXd exponents(x.size());
    for (Eigen::Index i = 0; i < x.size(); ++i) exponents(i) = technology.elasticity(x, i);
    const double logOutput = technology.logOutput(x);
    if (!exponents.allFinite() || !(exponents.minCoeff() > 0) || !std::isfinite(logOutput)) return std::nullopt;
    return CobbDouglas(logOutput - exponents.dot(exactLog(x.array()).matrix()), exponents);
}

bool usable(const Eigen::VectorXd& x)
{
    return x.allFinite() && x.minCoeff() > 0 && exactLog(x.array()).abs().maxCoeff() <= logBound;
}

// Rounds of: the local Cobb-Douglas answer, then onto the level along the ray (least cost only);
// a round is kept only when it improves `worse` (a number to lower: cost, −output, −profit), so
// that a poor approximation (a CES far from σ = 1, say) cannot carry the start away.
template <typename CobbDouglasAnswer, typename Objective>
Eigen::VectorXd cobbDouglasStart(const Technology& technology, Eigen::VectorXd x, const NumericalSolveOptions& options,
                                 std::optional<double> logTarget, CobbDouglasAnswer answer, Objective worse)
{
    const auto ontoLevel = [&](Eigen::VectorXd& bundle) {
        if (!logTarget) return true;
        const auto factor = scaleForLevel(technology, bundle, *logTarget);
        if (!factor || !usable(*factor * bundle)) return false;
        bundle *= *factor;
        return true;
    };
    if (!ontoLevel(x)) return x;
    for (int round = 0; round < options.startRounds; ++round) {
        const auto local = localCobbDouglas(technology, x);
        if (!local) break;
        // Empty when the local approximation has no answer (e.g. ν ≥ 1 for profit).
        std::optional<Eigen::VectorXd> next = answer(*local);
        if (!next || !usable(*next) || !ontoLevel(*next) || !(worse(*next) < worse(x))) break;
        x = *next;
    }
    return x;
}

// Sᵢⱼ restricted to the plane e·d = 0 (the isoquant's tangent plane in relative changes dᵢ = dxᵢ/xᵢ).
Eigen::MatrixXd onTangentPlane(const LocalShape& shape)
{
    const Eigen::Index k = shape.elasticities.size();
    const Eigen::MatrixXd normal = shape.elasticities.transpose();
    const Eigen::MatrixXd kernel = Eigen::FullPivLU<Eigen::MatrixXd>(normal).kernel();
    const Eigen::MatrixXd basis = kernel.householderQr().householderQ() * Eigen::MatrixXd::Identity(k, kernel.cols());
    return basis.transpose() * shape.scaledHessian * basis;
}

bool negativeDefinite(const Eigen::MatrixXd& matrix, double scale, const NumericalSolveOptions& options)
{
    if (matrix.size() == 0) return true;
    const Eigen::VectorXd eigenvalues = Eigen::SelfAdjointEigenSolver<Eigen::MatrixXd>(matrix).eigenvalues();
    return eigenvalues.maxCoeff() < -options.curvatureTolerance * std::max(1.0, scale);
}

std::string notConverged(const std::string& problem, double residual)
{
    return "Did not converge: the numerical search for " + problem +
           " stopped before its conditions held (largest error " + formatNumber(residual) +
           "); the prices or the level may lie far from the data the model was fitted on";
}

ProductionPlan planAt(const Technology& technology, const Eigen::VectorXd& x, const Eigen::VectorXd& prices)
{
    ProductionPlan plan;
    plan.inputs = x;
    plan.output = technology.output(x);
    plan.cost = prices.dot(x);
    return plan;
}

ProductionPlan solveTangency(const Technology& technology, const Eigen::VectorXd& prices, Closing closing,
                             double level, const NumericalSolveOptions& options)
{
    const Eigen::Index k = prices.size();
    const double logLevel = std::log(level);
    // Equal spending on every input, then the local Cobb-Douglas rounds.
    Eigen::VectorXd x = prices.cwiseInverse();
    if (closing == Closing::spending) x *= level / static_cast<double>(k);
    x = cobbDouglasStart(technology, x, options, closing == Closing::output ? std::optional<double>(logLevel) : std::nullopt,
                         [&](const CobbDouglas& local) -> std::optional<Eigen::VectorXd> {
                             const HomogeneousCost cost = cobbDouglasCost(local, prices);
                             const ProductionPlan plan =
                                 closing == Closing::output ? leastCostPlan(cost, level) : budgetPlan(cost, level);
                             if (!plan.solved()) return std::nullopt;
                             return plan.inputs;
                         },
                         [&](const Eigen::VectorXd& bundle) {
                             return closing == Closing::output ? prices.dot(bundle) : -technology.logOutput(bundle);
                         });
    // μ = C/ν at the answer (Σ wᵢxᵢ = μ·Σ eᵢ); the start takes the local ν.
    Eigen::VectorXd u(k + 1);
    u.head(k) = exactLog(x.array());
    u(k) = std::log(prices.dot(x) / technology.scaleElasticity(x));
    if (!std::isfinite(u(k))) u(k) = std::log(prices.dot(x));

    TangencySystem system(technology, prices, closing, logLevel);
    const std::string problem = closing == Closing::output ? "the least-cost bundle" : "the best use of the budget";
    const double residual = solveSystem(system, u, options);
    if (!(residual <= options.residualTolerance)) return noPlan(notConverged(problem, residual));

    x = u.head(k).array().exp();
    const LocalShape shape = localShape(technology, x);
    if (!isFinite(shape) || !negativeDefinite(onTangentPlane(shape), shape.scaledHessian.cwiseAbs().maxCoeff(), options))
        return noPlan("No " + std::string(closing == Closing::output ? "least-cost bundle" : "best use of the budget") +
                      " found: where the isoquant touches the price line it is not bowed towards the origin, so "
                      "that point is not an optimum");
    ProductionPlan plan = planAt(technology, x, prices);
    // λ = μ/y
    plan.marginalCost = std::exp(u(k)) / plan.output;
    return plan;
}

} // namespace

ProductionPlan solveLeastCost(const Technology& technology, double target, const Eigen::VectorXd& prices,
                              const NumericalSolveOptions& options)
{
    return solveTangency(technology, prices, Closing::output, target, options);
}

ProductionPlan solveBudget(const Technology& technology, double budget, const Eigen::VectorXd& prices,
                           const NumericalSolveOptions& options)
{
    return solveTangency(technology, prices, Closing::spending, budget, options);
}

ProductionPlan solveProfit(const Technology& technology, double outputPrice, const Eigen::VectorXd& prices,
                           const NumericalSolveOptions& options)
{
    // Homogeneous of degree ν ≥ 1: no finite maximum; the unit cost (the least cost of one unit of
    // output) is what the message compares the price with.
    if (const auto scale = technology.constantScaleElasticity(); scale && *scale >= 1 - constantReturnsTolerance) {
        HomogeneousCost cost;
        cost.scale = *scale;
        const ProductionPlan unit = solveLeastCost(technology, 1, prices, options);
        if (!unit.solved()) return unit;
        cost.logUnitCost = std::log(unit.cost);
        if (ProductionPlan closed = profitPlan(cost, outputPrice); !closed.solved()) return closed;
    }
    Eigen::VectorXd x = cobbDouglasStart(technology, Eigen::VectorXd::Ones(prices.size()), options, std::nullopt,
                                         [&](const CobbDouglas& local) -> std::optional<Eigen::VectorXd> {
                                             const ProductionPlan plan = profitPlan(cobbDouglasCost(local, prices), outputPrice);
                                             if (!plan.solved()) return std::nullopt;
                                             return plan.inputs;
                                         },
                                         [&](const Eigen::VectorXd& bundle) {
                                             return prices.dot(bundle) - outputPrice * technology.output(bundle);
                                         });
    Eigen::VectorXd z = exactLog(x.array());
    ProfitSystem system(technology, outputPrice, prices);
    const double residual = solveSystem(system, z, options);
    if (!(residual <= options.residualTolerance)) return noPlan(notConverged("the profit maximum", residual));
    x = z.array().exp();
    const LocalShape shape = localShape(technology, x);
    if (!isFinite(shape) || !negativeDefinite(shape.scaledHessian, shape.scaledHessian.cwiseAbs().maxCoeff(), options))
        return noPlan("No profit maximum found: where price equals marginal value for every input, the profit "
                      "function is not concave, so that point is not a maximum");
    ProductionPlan plan = planAt(technology, x, prices);
    plan.marginalCost = outputPrice;
    return plan;
}

} // namespace isoquant
