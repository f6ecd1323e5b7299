// The PRODFIT tables of the ces and translog forms (fitTable in fit_table.hpp dispatches here).
// 7 columns, the same header and column meanings as the Cobb-Douglas table; "n/a" for a number
// that is not finite or not defined.
//
// ces (always 20 rows):
//   ces fit | value | std. error | t | p-value | lower bound | upper bound   header
//   ln A, delta (weight of the first input), rho, nu             parameter rows, t of parameter = 0
//   sigma                                                        σ = 1/(1+ρ): value, se (delta
//                                                                method), bounds; t and p empty
//   (empty row)
//   observations, R2, adjusted R2, residual SD, log-likelihood, AIC, BIC      (on ln Y, p = 4)
//   returns to scale                                             ν, se, F of ν = 1 under "t", p
//   verdict, form                                                as for Cobb-Douglas, but "not tested
//                                                                (boundary | not converged | stopped |
//                                                                not identified)" without a test; the
//                                                                form row notes why
//   convergence | converged, not converged, stopped or not identified | evaluations, stop reason
//   inputs | first input's label | second input's label
//   smearing factor                                              Duan's: mean of exp(residual of ln Y)
// At a boundary optimum the parameter on the boundary shows the boundary value (δ = 0 or 1,
// ρ = −1) with "boundary" under "std. error", and no row carries standard errors (at δ = 0 or 1
// sigma is "n/a": ρ is not identified); without convergence the estimates are the solver's last
// values and carry none either, nor does a point that is not identified. The bounds of sigma are
// those of ρ transformed, 1/(1 + upper bound of ρ) and 1/(1 + lower bound of ρ), the upper one
// "n/a" when the lower bound of ρ is at or below −1.
//
// translog (k inputs, m controls, q = k(k+1)/2):
//   header (translog fit | value | …); ln A; one row per input (αᵢ); one row "<label i>*<label j>" per βᵢⱼ, i ≤ j, in the
//   order 1*1, 1*2, …, 1*k, 2*2, …; one row per control "<label> (control)"; an empty row;
//   observations, R2, adjusted R2, residual SD, F (slopes = 0), log-likelihood, AIC, BIC;
//   elasticity <label> (one per input: εᵢ at the sample mean of the logs, se, t of εᵢ = 0, p,
//   bounds); returns to scale (ν at the mean, se, F of ν = 1, p); verdict; Cobb-Douglas test (F of all βᵢⱼ = 0
//   under "t", its p-value); form; ln A at control means (only when m > 0); smearing factor
// so 2k + q + m + 16 rows, plus one with controls. Two inputs, no controls: 23 rows.
//
// With PRODFIT's covariance TRUE the covariance block follows (covariance_block.hpp): 1 + p rows
// more and max(7, p + 1) columns, p = 1 + k + q + m for the translog (two inputs: 30 rows by 7
// columns), p = 4 for the ces (25 rows by 7 columns).
#pragma once

#include "isoquant/sheet/arguments/cells.hpp"
#include "isoquant/math/fits/fit_result.hpp"

namespace isoquant {

CellTable cesFitTable(const ProductionFit& fit);
CellTable translogFitTable(const ProductionFit& fit);

std::size_t cesFitTableRows();
std::size_t translogFitTableRows(std::size_t inputs, std::size_t controls);

} // namespace isoquant
