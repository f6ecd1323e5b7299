// The returns to scale ν = Σ bᵢ of a log-linear fit, its Wald test of ν = 1 and the verdict.
#pragma once

#include "isoquant/math/fits/fit_result.hpp"

#include <string>

namespace isoquant {

// The returns-to-scale verdict: "constant (imposed)" when imposed; else "constant" when the test
// of ν = 1 has p ≥ α = 1 − level, otherwise "increasing" or "decreasing" by ν. With no test
// (pValue NaN: a hand-typed model, an exact fit) the verdict follows ν alone, ν within 1e-9
// of 1 counting as constant.
std::string classifyReturnsToScale(double estimate, double pValue, double level, bool imposed);

// ν over the k exponents after ln A in fit.inference.estimates, its standard error √(1ᵀ V 1) and the Wald F
// of ν = 1 on `regression` (whose columns 1…k are the exponents); imposed: ν without a test.
ReturnsToScale testReturnsToScale(const ProductionFit& fit, const LeastSquaresResult& regression, Eigen::Index k,
                                  bool constantReturns, double confidenceLevel);

} // namespace isoquant
