#include "isoquant/math/forms/homogeneous_cost.hpp"

#include "isoquant/math/numerics/exact_elementwise.hpp"

#include <cmath>
#include "isoquant/math/messages/text.hpp"
#include <limits>
#include <string>

namespace isoquant {

namespace {

// Six significant digits: the unit cost in a sentence is read, not computed with.
std::string readable(double value) { return formatNumber(value, 6); }

ProductionPlan planAtLogOutput(const HomogeneousCost& cost, double logOutput)
{
    const double logExpansion = logOutput / cost.scale; // ln y^(1/ν)
    ProductionPlan plan;
    plan.inputs = exactExp(cost.logUnitDemands.array() + logExpansion).matrix();
    plan.output = std::exp(logOutput);
    plan.cost = std::exp(cost.logUnitCost + logExpansion);
    // ∂C/∂y = c·y^(1/ν − 1)/ν
    plan.marginalCost = std::exp(cost.logUnitCost + logExpansion - logOutput - std::log(cost.scale));
    return plan;
}

} // namespace

ProductionPlan leastCostPlan(const HomogeneousCost& cost, double target)
{
    return planAtLogOutput(cost, std::log(target));
}

ProductionPlan budgetPlan(const HomogeneousCost& cost, double budget)
{
    return planAtLogOutput(cost, cost.scale * (std::log(budget) - cost.logUnitCost));
}

ProductionPlan profitPlan(const HomogeneousCost& cost, double outputPrice)
{
    const double nu = cost.scale;
    if (std::fabs(nu - 1) <= constantReturnsTolerance) {
        const double unitCost = std::exp(cost.logUnitCost);
        // Outside the normal doubles the unit cost is compared, and told, by its log.
        const bool representable = std::isfinite(unitCost) && unitCost >= std::numeric_limits<double>::min();
        const double gap = representable ? outputPrice - unitCost : std::log(outputPrice) - cost.logUnitCost;
        const std::string comparison =
            gap > 0   ? "so profit grows without limit as every input is scaled up"
            : gap < 0 ? "so every unit loses money and the best plan is to produce nothing"
                      : "so every scale of production earns zero profit";
        const std::string costText = representable ? readable(unitCost)
                                     : cost.logUnitCost > 0
                                         ? "more than " + localDecimal("1.8e308") + " (ln " + readable(cost.logUnitCost) + ")"
                                         : "less than " + localDecimal("2.2e-308") + " (ln " + readable(cost.logUnitCost) + ")";
        return noPlan("No finite profit maximum: returns to scale are constant (1), and at these prices one "
                      "unit of output costs " + costText + " to make and sells for " + readable(outputPrice) +
                      ", " + comparison);
    }
    if (nu > 1)
        return noPlan("No finite profit maximum: returns to scale are increasing (" + readable(nu) +
                      "), so profit grows without limit as every input is scaled up");
    return planAtLogOutput(cost, nu / (1 - nu) * (std::log(nu) + std::log(outputPrice) - cost.logUnitCost));
}

HomogeneousCost cobbDouglasCost(const CobbDouglas& technology, const Eigen::VectorXd& prices)
{
    const Eigen::ArrayXd b = technology.exponents.array();
    const double nu = b.sum();
    const Eigen::ArrayXd logPrices = exactLog(prices.array());
    HomogeneousCost cost;
    cost.scale = nu;
    cost.logUnitCost =
        std::log(nu) - technology.logScale / nu + ((b / nu) * (logPrices - b.log())).sum();
    cost.logUnitDemands = ((b / nu).log() + cost.logUnitCost - logPrices).matrix();
    return cost;
}

} // namespace isoquant
