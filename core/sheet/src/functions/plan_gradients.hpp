// The plans of PRODLEASTCOST, PRODBUDGET and PRODCOST on translog and ces models, linearised in the
// parameters θ (form_gradients.hpp gives θ's order) for the delta method (delta_method.hpp), by the
// implicit function theorem on the plan's first-order conditions; internal to the sheet library.
//
// The conditions are those the numerical solve uses (numerical_decisions.hpp), in
// z = (l₁ … l_k, m), l = ln x, m = ln μ, μ = λ·y with λ the marginal cost:
//   Gᵢ = wᵢxᵢ/μ − eᵢ(x; θ) = 0   (i = 1…k),
//   G_k = ln f(x; θ) − ln y = 0 (least cost)   or   ln Σwᵢxᵢ − ln B = 0 (budget).
// At a solved plan dz/dθ = −G_z⁻¹·G_θ, with the analytic partials
//   ∂Gᵢ/∂lⱼ = [i = j]·wᵢxᵢ/μ − ∂eᵢ/∂ln xⱼ,  ∂Gᵢ/∂m = −wᵢxᵢ/μ,  ∂Gᵢ/∂θ = −g(eᵢ);
//   least cost: ∂G_k/∂lⱼ = eⱼ, ∂G_k/∂θ = g(ln f);  budget: ∂G_k/∂lⱼ = wⱼxⱼ/C, ∂G_k/∂θ = 0;  ∂G_k/∂m = 0,
// where ∂eᵢ/∂ln xⱼ = Sᵢⱼ − eᵢeⱼ + [i = j]·eᵢ from the local shape (local_shape.hpp) and g(eᵢ),
// g(ln f) from form_gradients.hpp. No plan is solved again: the plan is the plain function's, and
// μ = C/Σeᵢ (the sum of wᵢxᵢ = μ·eᵢ). The figures, all positive by nature, on the log scale:
//   ln xᵢ: row i of dz/dθ;  ln C = ln Σwᵢxᵢ: Σ(wᵢxᵢ/C)·dlᵢ;  ln λ = m − ln y: dm (least cost);
//   the budget plan's output ln Y = ln f(x(θ); θ): g(ln f) + Σ eⱼ·dlⱼ.
// PRODCOST's cost elasticity μ/C and returns to scale C/μ: value ∓ t·se, g = value·(dm − d ln C)
// and value·(d ln C − dm).
// PRODEFFICIENTSCALE's y*, where ε = μ/C of the least-cost plan is 1: F(ln y, θ) = ln ε = m − ln C = 0
// defines ln y* implicitly, so d ln y*/dθ = −(∂F/∂θ)/(∂F/∂ln y), with ∂F/∂θ = dm − d ln C above and
// ∂F/∂ln y the same from dz/d ln y = −G_z⁻¹·∂G/∂ln y, ∂G/∂ln y = (0 … 0, −1) (the closing condition).
#pragma once

#include "functions/delta_method.hpp"

namespace isoquant::delta_method {

enum class PlanClosing { output, spending };

// dz/dθ of a plan: row i < k is d ln xᵢ/dθ, row k d ln μ/dθ. Throws InputError naming "what" where
// G_z is singular (a flat optimum: the plan does not move smoothly with θ there).
Eigen::MatrixXd planSensitivity(const BoundsModel& read, const Eigen::VectorXd& amounts, const Eigen::VectorXd& prices,
                                PlanClosing closing);

// d ln y*/dθ of the efficient scale, the least-cost plan `amounts` at y* given. Throws InputError
// naming "what" where G_z is singular or ε only touches 1 (∂F/∂ln y = 0).
Eigen::VectorXd efficientScaleLogGradient(const BoundsModel& read, const Eigen::VectorXd& amounts,
                                          const Eigen::VectorXd& prices);

// d ln C/dθ of a plan from its sensitivity.
Eigen::VectorXd logCostGradient(const Eigen::MatrixXd& sensitivity, const Eigen::VectorXd& amounts,
                                const Eigen::VectorXd& prices);

// d ln Y/dθ of the budget plan's output.
Eigen::VectorXd budgetOutputGradient(const BoundsModel& read, const Eigen::MatrixXd& sensitivity,
                                     const Eigen::VectorXd& amounts);

// The k (or more) numbers of a plan row of the plain function, as a vector.
Eigen::VectorXd planNumbers(const CellTable& plan, Eigen::Index count);

// The plan row `plan` with each cell c replaced by the word's figure of the positive quantity
// plan(c) with g of its logarithm in row c of `logGradients` (log scale). Throws InputError
// "<argumentName>: <tooLarge>" for a figure too large to represent.
CellTable planRowOfBounds(const CellTable& plan, const BoundsModel& read, Statistic statistic,
                          const Eigen::MatrixXd& logGradients, const std::string& argumentName,
                          const std::string& tooLarge);

} // namespace isoquant::delta_method
