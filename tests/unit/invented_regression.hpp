// Invented regressions for the least-squares engine's property tests (not reference data): a
// constant and three slopes scattered about 3, heteroskedastic noise, rows dealt to clusters in
// turn.
#pragma once

#include <Eigen/Dense>

#include <algorithm>
#include <cmath>
#include <limits>
#include <random>
#include <vector>

namespace isoquant::testing {

struct InventedRegression {
    Eigen::MatrixXd design;
    Eigen::VectorXd response;
    std::vector<Eigen::Index> clusters;
};

// y = 0.5 + 0.3·x₁ + 0.6·x₂ − 0.2·x₃ + (0.5 + |x₁ − 3|)·ε, xⱼ = 3 + spread·N(0, 1), ε ~ N(0, 1).
inline InventedRegression inventedRegression(Eigen::Index rows, unsigned seed, double spread, Eigen::Index clusterCount)
{
    std::mt19937 generator(seed);
    std::normal_distribution<double> normal;
    InventedRegression data;
    data.design.resize(rows, 4);
    data.response.resize(rows);
    for (Eigen::Index i = 0; i < rows; ++i) {
        data.design(i, 0) = 1.0;
        for (Eigen::Index j = 1; j < 4; ++j) data.design(i, j) = 3.0 + spread * normal(generator);
        const double noise = (0.5 + std::fabs(data.design(i, 1) - 3.0)) * normal(generator);
        data.response(i) = 0.5 + 0.3 * data.design(i, 1) + 0.6 * data.design(i, 2) - 0.2 * data.design(i, 3) + noise;
        data.clusters.push_back(i % clusterCount);
    }
    return data;
}

// Relative agreement of two vectors, measured against the larger norm.
inline double relativeDifference(const Eigen::VectorXd& a, const Eigen::VectorXd& b)
{
    // Vectors of different sizes are as far apart as can be (Eigen without assertions would
    // subtract the shorter one's length only, and an empty vector would pass any tolerance).
    if (a.size() != b.size()) return std::numeric_limits<double>::infinity();
    return (a - b).norm() / std::max(a.norm(), b.norm());
}

} // namespace isoquant::testing
