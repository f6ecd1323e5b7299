// The regression behind a cost fit (cost_fit.hpp), internal to the math library: the
// homogeneity-normalised design, the map back to the full form's parameters, and the run itself —
// least squares with the panel options, or the cost and share system.
#pragma once

#include "isoquant/math/fits/cost_fit.hpp"

#include <Eigen/Dense>

#include <string>
#include <utility>
#include <vector>

namespace isoquant {

// ln(C/w_k) on the normalised terms of the form, then the controls as they are; the names of the
// columns for messages.
struct NormalisedRegression {
    Eigen::MatrixXd design;
    Eigen::VectorXd response;
    std::vector<std::string> termNames;
    Eigen::MatrixXd relativeLogPrices; // ln(wᵢ/w_k), i < k: the share equations' terms
    Eigen::VectorXd logOutput;
    Eigen::Index formColumns = 0; // the columns before the controls
};

NormalisedRegression normalisedRegression(const CostData& data, CostForm form);

// θ = T·b + t₀ (cost_fit.hpp): the full form's parameters, then the m controls' coefficients, from
// the regression's first `formColumns` + m coefficients.
std::pair<Eigen::MatrixXd, Eigen::VectorXd> restoredParameters(CostForm form, Eigen::Index k, Eigen::Index formColumns,
                                                               Eigen::Index controls);

// The regression run in the panel regression's column space (panel_regression.hpp): least
// squares with the panel options; with shares, the cost and share system with a trend as one more
// cost-equation column. Throws InputError naming the terms when they are collinear.
PanelRegression runCostRegression(const NormalisedRegression& normalised, const CostData& data,
                                  const CostFitOptions& options);

} // namespace isoquant
