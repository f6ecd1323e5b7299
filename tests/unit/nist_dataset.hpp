// Reads a NIST StRD linear least-squares file (the original .dat layout: certified values and data
// at the line ranges its header names) and builds the design matrix its model describes.
#pragma once

#include <Eigen/Dense>

#include <optional>
#include <string>
#include <vector>

namespace isoquant::testing {

struct NistLinearDataset {
    std::string name;
    Eigen::MatrixXd design;   // with a leading constant column unless the model has none
    Eigen::VectorXd response;
    std::optional<Eigen::Index> interceptColumn;
    Eigen::VectorXd certifiedEstimates;
    Eigen::VectorXd certifiedStandardDeviations;
    double certifiedResidualStandardDeviation = 0;
    double certifiedRSquared = 0;
};

// `path` is a NIST .dat file. Models: y = B0 + Σ Bᵢxᵢ (several predictors), a polynomial in x
// (one predictor, more parameters than two), or y = B1·x with no constant (NoInt sets).
NistLinearDataset readNistLinearDataset(const std::string& path);

// Log relative error, −log10(|estimate − certified| / |certified|), as used to grade NIST StRD
// results (McCullough, The American Statistician, 1998); −log10|estimate| where certified is 0.
// Capped at 15 (double precision cannot show more).
double logRelativeError(double estimate, double certified);

} // namespace isoquant::testing
