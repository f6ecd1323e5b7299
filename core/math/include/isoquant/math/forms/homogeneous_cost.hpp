// Closed-form decisions for a technology homogeneous of degree ν, f(t·x) = t^ν·f(x) (Cobb-Douglas,
// CES). Its cost function factors as C(w, y) = c(w)·y^(1/ν) and its conditional demands as
// xᵢ(w, y) = aᵢ(w)·y^(1/ν), where c and aᵢ are the cost and the demands for one unit of output
// (Varian, Microeconomic Analysis, 3rd ed. 1992, ch. 5, homothetic technologies; from memory).
// From these:
//   least cost of y:     x = a·y^(1/ν), C = c·y^(1/ν), marginal cost C/(ν·y)
//   budget B:            y = (B/c)^ν, then x and C = B as above
//   profit at price p:   p = marginal cost gives y = (ν·p/c)^(ν/(1−ν)) when ν < 1; profit (1 − ν)·p·y
// Everything is carried in logs, so that a result overflows only when its own value does.
#pragma once

#include "isoquant/math/forms/cobb_douglas.hpp"
#include "isoquant/math/decisions/production_plan.hpp"

namespace isoquant {

struct HomogeneousCost {
    double scale = 1;               // ν
    double logUnitCost = 0;         // ln c(w)
    Eigen::VectorXd logUnitDemands; // ln aᵢ(w)
};

ProductionPlan leastCostPlan(const HomogeneousCost& cost, double target);
ProductionPlan budgetPlan(const HomogeneousCost& cost, double budget);

// |ν − 1| within this counts as constant returns: a fit with constant returns imposed gives
// exponents summing to 1 up to rounding of a few ulps, and 1/(1 − ν) would then be about 1e16.
inline constexpr double constantReturnsTolerance = 1e-12;

// No plan (noPlan, saying why) when ν ≥ 1 (within constantReturnsTolerance of 1 counts as 1).
ProductionPlan profitPlan(const HomogeneousCost& cost, double outputPrice);

// Cobb-Douglas Y = A·Πxᵢ^bᵢ with every bᵢ > 0 (the caller checks): ν = Σbᵢ and
//   c(w) = ν·A^(−1/ν)·Πᵢ (wᵢ/bᵢ)^(bᵢ/ν),   aᵢ(w) = (bᵢ/ν)·c(w)/wᵢ   (cost shares bᵢ/ν).
HomogeneousCost cobbDouglasCost(const CobbDouglas& technology, const Eigen::VectorXd& prices);

} // namespace isoquant
