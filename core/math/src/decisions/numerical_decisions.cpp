#include "isoquant/math/decisions/numerical_decisions.hpp"

#include "isoquant/math/forms/cobb_douglas.hpp"
#include "isoquant/math/numerics/exact_elementwise.hpp"
#include "isoquant/math/forms/homogeneous_cost.hpp"
#include "isoquant/math/numerics/level_roots.hpp"
#include "isoquant/math/forms/local_shape.hpp"
#include "isoquant/math/numerics/log_sum.hpp"
#include "isoquant/math/messages/text.hpp"
#include "tangency_system.hpp"

#include <cmath>
#include <optional>

namespace isoquant {

namespace {

using decisions_detail::Closing;
using decisions_detail::logBound;
using decisions_detail::offDomainResidual;
using decisions_detail::solveSystem;
using decisions_detail::tangencyByContinuation;
using decisions_detail::TangencySystem;

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
// a round is kept only when it improves `worse` (a number to lower: cost, −output, −profit) and
// lands where every elasticity is positive, so that a poor approximation (a CES far from σ = 1, a
// translog whose elasticities change sign) cannot carry the start away. Outside that region no
// bundle is optimal, and there an isoquant may bend back to ever cheaper points.
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
        if (!next || !usable(*next) || !ontoLevel(*next) || !(worse(*next) < worse(x)) ||
            !localCobbDouglas(technology, *next))
            break;
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
           "); there may be no such plan at these prices and this level (a form like the translog has "
           "one only where every input still adds output), or they lie far from the data the model was fitted on";
}

ProductionPlan planAt(const Technology& technology, const Eigen::VectorXd& x, const Eigen::VectorXd& prices)
{
    ProductionPlan plan;
    plan.inputs = x;
    plan.output = technology.output(x);
    plan.cost = prices.dot(x);
    return plan;
}

// u = (ln x, ln μ) to start the tangency system from: equal spending on every input, then the
// local Cobb-Douglas rounds; μ = C/ν at the answer (Σ wᵢxᵢ = μ·Σ eᵢ), so the start takes the local ν.
Eigen::VectorXd tangencyStart(const Technology& technology, const Eigen::VectorXd& prices, Closing closing,
                              double level, const NumericalSolveOptions& options)
{
    const Eigen::Index k = prices.size();
    Eigen::VectorXd x = prices.cwiseInverse();
    if (closing == Closing::spending) x *= level / static_cast<double>(k);
    const auto logTarget = closing == Closing::output ? std::optional<double>(std::log(level)) : std::nullopt;
    x = cobbDouglasStart(technology, x, options, logTarget,
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
    Eigen::VectorXd u(k + 1);
    u.head(k) = exactLog(x.array());
    u(k) = std::log(prices.dot(x) / technology.scaleElasticity(x));
    if (!std::isfinite(u(k))) u(k) = std::log(prices.dot(x));
    return u;
}

// The plan at a root u of the tangency system, or noPlan where it fails the second-order condition.
ProductionPlan checkedTangency(const Technology& technology, const Eigen::VectorXd& prices, Closing closing,
                               const Eigen::VectorXd& u, const NumericalSolveOptions& options)
{
    const Eigen::Index k = prices.size();
    const Eigen::VectorXd x = u.head(k).array().exp();
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

ProductionPlan solveTangency(const Technology& technology, const Eigen::VectorXd& prices, Closing closing,
                             double level, const NumericalSolveOptions& options)
{
    const double logLevel = std::log(level);
    Eigen::VectorXd u = tangencyStart(technology, prices, closing, level, options);
    TangencySystem system(technology, prices, closing, logLevel);
    const double residual = solveSystem(system, u, options);
    const std::string problem = closing == Closing::output ? "the least-cost bundle" : "the best use of the budget";
    ProductionPlan plan = residual <= options.residualTolerance ? checkedTangency(technology, prices, closing, u, options)
                                                                : noPlan(notConverged(problem, residual));
    if (plan.solved()) return plan;
    // The start may lie outside the tangency's basin, or off the level altogether; the path from
    // a point where every elasticity is positive can still reach it (tangency_continuation.cpp).
    // Its answer passes the same checks; otherwise the first attempt's reason stands.
    const auto optimal = [&](const Eigen::VectorXd& root) {
        return checkedTangency(technology, prices, closing, root, options).solved();
    };
    if (const auto continued = tangencyByContinuation(technology, prices, closing, logLevel, options, optimal))
        return checkedTangency(technology, prices, closing, *continued, options);
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
