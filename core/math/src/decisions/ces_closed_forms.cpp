#include "isoquant/math/decisions/ces_closed_forms.hpp"

#include "isoquant/math/numerics/exact_elementwise.hpp"
#include "isoquant/math/numerics/log_sum.hpp"

#include <cmath>

namespace isoquant {

std::string cesParameterProblem(const CesParameters& parameters)
{
    if (!(parameters.scale > 0) || !std::isfinite(parameters.scale)) return "A must be positive";
    if (!(parameters.weight > 0 && parameters.weight < 1)) return "the weight δ must lie strictly between 0 and 1";
    if (!(parameters.rho > -1) || parameters.rho == 0 || !std::isfinite(parameters.rho))
        return "ρ must be greater than −1 and not 0 (ρ = 0 is the Cobb-Douglas limit)";
    if (!(parameters.returns > 0) || !std::isfinite(parameters.returns)) return "returns to scale ν must be positive";
    return {};
}

HomogeneousCost cesCost(const CesParameters& parameters, const Eigen::Vector2d& prices)
{
    const double delta = parameters.weight, rho = parameters.rho, nu = parameters.returns;
    const double sigma = parameters.substitutionElasticity();
    const double logRatio = sigma * (std::log(delta) - std::log1p(-delta) + std::log(prices(1)) - std::log(prices(0)));
    // ln a₂ = −ln A/ν + (1/ρ)·ln(δ·t^(−ρ) + 1 − δ)
    const double logSecond =
        -std::log(parameters.scale) / nu +
        logSumExp(Eigen::Array2d(std::log(delta) - rho * logRatio, std::log1p(-delta))) / rho;
    HomogeneousCost cost;
    cost.scale = nu;
    cost.logUnitDemands = Eigen::Vector2d(logRatio + logSecond, logSecond);
    // ln c = ln(w₁a₁ + w₂a₂)
    cost.logUnitCost = logSumExp(exactLog(prices.array()) + cost.logUnitDemands.array());
    return cost;
}

} // namespace isoquant
