// Invented data from a known technology, for property tests of the fits (seeded, so deterministic).
#pragma once

#include "isoquant/math/fits/production_fit.hpp"

#include <cmath>
#include <cstdint>
#include <random>
#include <string>

namespace isoquant::testing {

// Inputs log-uniform over [1, 100], noise on ln Y normal with SD `noise` (0.05 unless given).
template <typename Technology>
isoquant::ProductionData generate(const Technology& technology, int n, std::uint32_t seed, double noise = 0.05)
{
    std::mt19937 engine(seed);
    std::uniform_real_distribution<double> logInput(0.0, std::log(100.0));
    std::normal_distribution<double> disturbance(0.0, noise);
    const Eigen::Index k = technology.inputCount();
    isoquant::ProductionData data;
    data.inputs.resize(n, k);
    data.output.resize(n);
    for (int row = 0; row < n; ++row) {
        for (Eigen::Index i = 0; i < k; ++i) data.inputs(row, i) = std::exp(logInput(engine));
        data.output(row) = std::exp(technology.logOutput(data.inputs.row(row).transpose()) + disturbance(engine));
    }
    for (Eigen::Index i = 0; i < k; ++i) data.inputLabels.push_back("x" + std::to_string(i + 1));
    data.controls.resize(n, 0);
    return data;
}

} // namespace isoquant::testing
