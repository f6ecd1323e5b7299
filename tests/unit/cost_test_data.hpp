// Invented cost data shared by the cost-frontier tests (property tests only; no figure here is
// checked against an outside source).
#pragma once

#include "isoquant/sheet/functions/cost_functions.hpp"
#include "cell_tables.hpp"

#include <cmath>
#include <cstdint>
#include <random>

namespace isoquant::testing {

// A chain of delivery depots (invented): ln C = 1 + 0.9 ln y + 0.6 ln w₁ + 0.4 ln w₂ + v + u with
// σᵥ = 0.05 and half-normal u of σᵤ = 0.25; output log-uniform over [10, 1000], prices over [1, 30].
inline isoquant::CostFitArguments depots(int n, std::uint32_t seed)
{
    std::mt19937 engine(seed);
    std::uniform_real_distribution<double> logOutput(std::log(10.0), std::log(1000.0)), logPrice(0.0, std::log(30.0));
    std::normal_distribution<double> noise(0.0, 0.05), inefficiency(0.0, 0.25);
    Eigen::MatrixXd cost(n, 1), output(n, 1), prices(n, 2);
    for (int row = 0; row < n; ++row) {
        output(row, 0) = std::exp(logOutput(engine));
        prices(row, 0) = std::exp(logPrice(engine));
        prices(row, 1) = std::exp(logPrice(engine));
        cost(row, 0) = std::exp(1 + 0.9 * std::log(output(row, 0)) + 0.6 * std::log(prices(row, 0)) +
                                0.4 * std::log(prices(row, 1)) + noise(engine) + std::fabs(inefficiency(engine)));
    }
    isoquant::CostFitArguments arguments;
    arguments.cost = numberRange(cost, {"cost"});
    arguments.output = numberRange(output, {"parcels"});
    arguments.prices = numberRange(prices, {"drivers", "fuel"});
    arguments.inefficiency = std::string("half-normal");
    return arguments;
}

} // namespace isoquant::testing
