// Reads the arguments of the decision functions (PRODLEASTCOST, PRODCOST, PRODBUDGET, PRODPROFIT,
// PRODSUBSTITUTION, PRODISOQUANT). Every error names the argument. Throws InputError.
#pragma once

#include "isoquant/sheet/arguments/cells.hpp"
#include "isoquant/math/forms/substitution_elasticity.hpp"

#include <Eigen/Dense>

#include <string>

namespace isoquant {

// A single positive, finite number (a target output, a budget, a price).
double readPositiveNumber(const Cell& cell, const std::string& argument);

// One positive price per input: a row or a column of `inputCount` numbers, with an optional
// header row of labels when given as a row.
Eigen::VectorXd readPrices(const CellTable& range, const std::string& argument, Eigen::Index inputCount);

// "direct" (default), "allen" or "morishima".
SubstitutionKind readSubstitutionKind(const Cell& cell);

enum class CostMeasure { total, marginal, average, costElasticity, returnsToScale };
// "total" (default), "marginal", "average", "cost elasticity" (∂ln C/∂ln y) or "returns to scale" (its inverse).
CostMeasure readCostMeasure(const Cell& cell);

} // namespace isoquant
