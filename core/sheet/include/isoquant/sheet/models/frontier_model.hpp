// A PRODFRONTIER table, or a PRODCOSTFIT cost-frontier table, read back for PRODEFFICIENCY.
#pragma once

#include "isoquant/sheet/arguments/cells.hpp"
#include "isoquant/sheet/models/cost_model.hpp"
#include "isoquant/math/frontier/frontier_likelihood.hpp"
#include "isoquant/math/forms/production_form.hpp"

#include <Eigen/Dense>

#include <string>
#include <vector>

namespace isoquant {

struct FrontierModel {
    InefficiencyDistribution distribution = InefficiencyDistribution::halfNormal; // from the title
    ProductionForm form = ProductionForm::cobbDouglas;
    std::vector<std::string> inputLabels;
    std::vector<std::string> controlLabels; // without " (control)"
    Eigen::VectorXd coefficients;           // the parameter rows, in table order
    double noiseSd = 0;
    double inefficiencySd = 0;
    // The level of the table's bounds, (2Φ(c) − 1) for c = (upper bound − value)/std. error of its
    // first parameter row; 0.95 when that row has no finite bounds.
    double confidenceLevel = 0.95;
};

// Throws InputError naming "model" and the row.
FrontierModel readFrontierModel(const CellTable& table);

// A PRODCOSTFIT table fitted with `inefficiency` (cost_table.hpp): the cost function as PRODCOST
// reads it, and the frontier's distribution (from the title), σᵥ, σᵤ and level as above.
struct CostFrontierModel {
    CostModel cost;
    InefficiencyDistribution distribution = InefficiencyDistribution::halfNormal;
    double noiseSd = 0;
    double inefficiencySd = 0;
    double confidenceLevel = 0.95;
};

// Throws InputError naming "model" (an average cost function's table says how to fit a frontier).
CostFrontierModel readCostFrontierModel(const CellTable& table);

} // namespace isoquant
