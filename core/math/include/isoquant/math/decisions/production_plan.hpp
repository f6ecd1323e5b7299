// The answer of a least-cost, budget or profit problem, and the status of one that has no answer.
#pragma once

#include <Eigen/Dense>

#include <stdexcept>
#include <string>

namespace isoquant {

struct ProductionPlan {
    Eigen::VectorXd inputs; // the chosen amounts, in the model's input order
    double output = 0;      // f(inputs)
    double cost = 0;        // Σ wᵢ·xᵢ
    double marginalCost = 0; // ∂C/∂y at this output: the multiplier wᵢ/fᵢ, the same for every input
};

// A well-posed problem without a (found) solution: no finite optimum exists, the solver did not
// converge, or the point it found fails the second-order condition. Not bad input: the cell shows
// the message as it is, without the "Error: " of an InputError.
class NoSolution : public std::runtime_error {
public:
    explicit NoSolution(const std::string& message) : std::runtime_error(message) {}
};

} // namespace isoquant
