// PRODFRONTIER and PRODEFFICIENCY on plain cells: the stochastic production frontier of
// isoquant/math/frontier/stochastic_frontier.hpp fitted to ranges, and the efficiency of each row.
#pragma once

#include "isoquant/sheet/arguments/cells.hpp"
#include "isoquant/math/fits/fit_result.hpp" // ParameterEstimate
#include "isoquant/math/frontier/stochastic_frontier.hpp"
#include "isoquant/math/forms/production_form.hpp"

#include <Eigen/Dense>

#include <string>
#include <vector>

namespace isoquant {

struct FrontierArguments {
    CellTable output;
    CellTable inputs;
    Cell form;
    Cell inefficiency;
    Cell level;
    CellTable controls; // empty when omitted
};

struct ProductionFrontier {
    ProductionForm form = ProductionForm::cobbDouglas;
    std::vector<std::string> inputLabels;
    std::vector<std::string> controlLabels;
    StochasticFrontierFit fit;
    double confidenceLevel = 0.95;
    // Maximum likelihood inference throughout: the statistic is z = estimate / se, its p-value two-sided
    // normal, the bounds at the table's level on the normal (not t).
    std::vector<ParameterEstimate> coefficients; // in the order of the design's columns
    // σᵥ, σᵤ and λ: standard errors by the delta method from ln σ (se(σ) = σ·se(ln σ)), bounds
    // exp(ln σ ± z·se(ln σ)), which stay positive; no test (σᵤ = 0 lies on the boundary: see the
    // inefficiency test).
    ParameterEstimate noiseSd, inefficiencySd, lambda;
    // ν = Σ εᵢ (translog: at the sample means of the logs) with z = (ν − 1)/se and its p-value.
    ParameterEstimate returns;
    std::string verdict;
};

// The `inefficiency` argument: "half-normal" (also when empty) or "exponential".
InefficiencyDistribution readInefficiencyArgument(const Cell& cell);

// The regressors of the frontier: 1, ln xᵢ, (translog: its second-order terms,
// translog_fit.hpp), then the controls as they are.
Eigen::MatrixXd frontierDesign(ProductionForm form, const Eigen::MatrixXd& inputs, const Eigen::MatrixXd& controls);

// Throws InputError naming the argument (and row).
ProductionFrontier frontierFromArguments(const FrontierArguments& arguments);

// PRODEFFICIENCY: per row of output and inputs (inputs, then any controls, in the table's order
// or matched by a header row), from a PRODFRONTIER table: `what` "efficiency" (default),
// "inefficiency", "lower bound" or "upper bound".
CellTable efficiencyColumn(const CellTable& model, const CellTable& output, const CellTable& inputs, const Cell& what);

} // namespace isoquant
