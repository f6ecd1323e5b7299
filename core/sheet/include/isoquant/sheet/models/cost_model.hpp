// A cost function read from cells, for PRODCOST: a PRODCOSTFIT table, or one typed by hand with the
// rows `form | cobb-douglas cost` (or `translog cost`), `constant`, `output`, one row per input
// price's coefficient, labelled by the input; a translog also `output*output`, `<i>*<j>` (i ≤ j)
// and `<i>*output`. Evaluates
//   ln C = β₀ + β_y ln y + ½β_yy (ln y)² + Σᵢ βᵢ ln wᵢ + ½ΣᵢΣⱼ βᵢⱼ ln wᵢ ln wⱼ + Σᵢ βᵢ_y ln wᵢ ln y
// (the second-order terms zero for Cobb-Douglas) and its cost elasticity
//   ε = ∂ln C/∂ln y = β_y + β_yy ln y + Σᵢ βᵢ_y ln wᵢ.
// The model is used as given: a typed model whose price coefficients do not sum to 1 is not
// homogeneous in prices, and no check corrects it.
// Rows labelled "<name> (control)" are controls' coefficients cⱼ (ln C + Σⱼ cⱼ zⱼ). β₀ in ln C
// above is then the constant the evaluators use: the table's "constant for predictions" row when
// there is one (effects or a trend), else its "constant at control means" row, else `constant`.
// A "covariance" row starts the block of covariance_block.hpp, one row per parameter row above,
// in their order, and with a "constant for predictions" or "constant at control means" row one
// more, labelled as that row (the constant the evaluators use; under effects the row-weighted mean
// group effect stands in it); a typed model may carry one too.
#pragma once

#include "isoquant/sheet/arguments/cells.hpp"
#include "isoquant/sheet/tables/covariance_block.hpp"

#include <Eigen/Dense>

#include <optional>
#include <string>
#include <vector>

namespace isoquant {

struct CostModel {
    bool translog = false;
    std::vector<std::string> priceLabels;
    double constant = 0;
    double output = 0;
    double outputSquared = 0;          // β_yy
    Eigen::VectorXd prices;            // βᵢ
    Eigen::MatrixXd priceInteractions; // βᵢⱼ, symmetric k × k
    Eigen::VectorXd priceOutput;       // βᵢ_y
    std::vector<std::string> controlLabels; // without " (control)"
    Eigen::VectorXd controls;               // cⱼ
    double constantAtZeroControls = 0;      // the `constant` row itself
    // The parameter rows' labels in the model's order, and the covariance block below them
    // (PRODCOSTFIT's `covariance` TRUE), whose rows follow that order.
    std::vector<std::string> parameterLabels;
    std::optional<CovarianceBlock> covariance;
    // Controls, effects or a trend shift the constant: the block's last row is the evaluators'
    // constant (cost_table.hpp), after the parameter rows.
    bool covarianceCoversShiftedConstant = false;

    double logCost(double output, const Eigen::VectorXd& prices) const;
    // ln C at these controls' values: the `constant` row plus Σⱼ cⱼ zⱼ in place of β₀.
    double logCostAt(double output, const Eigen::VectorXd& prices, const Eigen::VectorXd& controlValues) const;
    double costElasticity(double output, const Eigen::VectorXd& prices) const;
};

// Whether `model` is a cost model: its first cell is a cost table's title, or it has a `form` row
// whose word is a cost form ("cobb-douglas cost", "translog cost").
bool isCostModel(const CellTable& model);

// Throws InputError naming the row at fault (a missing number, an unknown price label in a
// second-order row, a missing `constant` or `output` row, second-order rows in a Cobb-Douglas model).
CostModel readCostModel(const CellTable& model);

} // namespace isoquant
