// Fitting a production function to observed output and inputs.
//
// Cobb-Douglas: Y = A·Πᵢ xᵢ^bᵢ·exp(Σⱼ cⱼ·zⱼ + u), fitted by least squares on logs:
//   ln Y = ln A + Σᵢ bᵢ ln xᵢ + Σⱼ cⱼ zⱼ + u,
// with controls zⱼ (an unemployment rate, a 0/1 dummy) entered as they are, not logged.
// fitProduction dispatches on options.form to cobb_douglas_fit.hpp, ces_fit.hpp and translog_fit.hpp;
// every form follows the conventions of fit_result.hpp.
//
#pragma once

#include "isoquant/math/fits/ces_fit.hpp"
#include "isoquant/math/fits/cobb_douglas_fit.hpp"
#include "isoquant/math/fits/fit_result.hpp"
#include "isoquant/math/fits/returns_to_scale.hpp"
#include "isoquant/math/fits/translog_fit.hpp"

namespace isoquant {

// The fit of options.form. The panel options (groups, effects, a trend, cluster errors) are built
// on the cobb-douglas fit only: the other forms refuse them (InputError naming the argument).
ProductionFit fitProduction(const ProductionData& data, const ProductionFitOptions& options);

} // namespace isoquant
