// The answer of a least-cost, budget or profit problem, with its status: whether it exists.
#pragma once

#include <Eigen/Dense>

#include <string>

namespace isoquant {

// Whether a well-posed problem has a (found) solution, as data, in the manner of a fit's FitStatus:
// a problem can lack one (no finite optimum exists, the solver did not converge, or the point it
// found fails the second-order condition). Not bad input: the cell shows the reason as it is,
// without the "Error: " of an InputError.
struct PlanStatus {
    bool solved = true;
    std::string reason; // why there is no plan, a sentence for the cell; empty when solved
};

struct ProductionPlan {
    Eigen::VectorXd inputs; // the chosen amounts, in the model's input order
    double output = 0;      // f(inputs)
    double cost = 0;        // Σ wᵢ·xᵢ
    double marginalCost = 0; // ∂C/∂y at this output: the multiplier wᵢ/fᵢ, the same for every input
    PlanStatus status;       // the figures above mean something only when status.solved

    bool solved() const { return status.solved; }
};

// A plan that does not exist, saying why.
inline ProductionPlan noPlan(std::string reason)
{
    ProductionPlan plan;
    plan.status = {false, std::move(reason)};
    return plan;
}

} // namespace isoquant
