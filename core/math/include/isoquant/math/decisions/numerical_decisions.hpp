// Least cost, budget split and profit maximum of any smooth technology, solved numerically from
// the first-order conditions, with the second-order condition checked at the answer. Used where
// no closed form exists (translog), and checked against the closed forms on Cobb-Douglas.
//
// Least cost of output y at prices w (and the budget problem, the same tangency with spending B
// fixed instead), in u = (ln x₁…ln x_k, ln μ), μ = λ·y with λ the marginal cost:
//   wᵢxᵢ/μ − eᵢ(x) = 0   (i = 1…k; eᵢ = xᵢfᵢ/y: the tangency fᵢ/fⱼ = wᵢ/wⱼ with wᵢ = λfᵢ)
//   ln f(x) − ln y = 0    (least cost)   or   ln Σwᵢxᵢ − ln B = 0   (budget)
// Profit at output price p, in z = ln x:   p·fᵢ(x)/wᵢ − 1 = 0   (i = 1…k).
// All equations are dimensionless and of order 1, so one absolute tolerance serves every unit.
// The system is solved by Eigen's Levenberg–Marquardt with its analytic Jacobian (from the
// Hessian), started from the closed-form answer of the Cobb-Douglas that matches f and its
// elasticities at the current point, repeated a few rounds (exact in one round when f is itself
// Cobb-Douglas; a round is kept only where every elasticity stays positive). When that fails, the
// least-cost and budget solves follow a path in prices and level from a bundle where every
// elasticity is positive (src/decisions/tangency_continuation.cpp); either answer must pass the
// same checks.
#pragma once

#include "isoquant/math/decisions/production_plan.hpp"
#include "isoquant/math/forms/technology.hpp"

namespace isoquant {

struct NumericalSolveOptions {
    // An answer is accepted when every equation above holds to within this, absolutely; in the
    // closing equations that is a relative error of about 1e-9 in output or spending.
    double residualTolerance = 1e-9;
    // Levenberg–Marquardt stops after this many evaluations of the equations.
    int maxEvaluations = 2000;
    // Rounds of the local Cobb-Douglas start.
    int startRounds = 8;
    // Second-order condition: the scaled Hessian Sᵢⱼ = xᵢxⱼfᵢⱼ/y (restricted to the isoquant's
    // tangent plane for least cost and budget) must have every eigenvalue below
    // −curvatureTolerance·max(1, maxᵢⱼ|Sᵢⱼ|); a flatter point is not a strict optimum.
    double curvatureTolerance = 1e-10;
};

// Each gives noPlan, saying why, when the solve does not converge or its answer fails the
// second-order condition. Prices and the target (or budget, or output price) are positive (the caller checks).
ProductionPlan solveLeastCost(const Technology& technology, double target, const Eigen::VectorXd& prices,
                              const NumericalSolveOptions& options = {});
ProductionPlan solveBudget(const Technology& technology, double budget, const Eigen::VectorXd& prices,
                           const NumericalSolveOptions& options = {});
ProductionPlan solveProfit(const Technology& technology, double outputPrice, const Eigen::VectorXd& prices,
                           const NumericalSolveOptions& options = {});

} // namespace isoquant
