// Fitting a production function to observed output and inputs.
//
// Cobb-Douglas: Y = A·Πᵢ xᵢ^bᵢ·exp(Σⱼ cⱼ·zⱼ + u), fitted by least squares on logs:
//   ln Y = ln A + Σᵢ bᵢ ln xᵢ + Σⱼ cⱼ zⱼ + u,
// with controls zⱼ (an unemployment rate, a 0/1 dummy) entered as they are, not logged.
// Conventions of every fit: fit_result.hpp.
#pragma once

#include "isoquant/math/fits/fit_result.hpp"

namespace isoquant {

// Throws InputError for too few rows and for collinear inputs (naming them), and for panel options
// without their columns.
ProductionFit fitCobbDouglas(const ProductionData& data, const ProductionFitOptions& options);

} // namespace isoquant
