// The quantities of PRODOUTPUT, PRODMARGINAL, PRODELASTICITY, PRODSCALE and PRODTFP linearised in the
// parameters θ of the model's form, in the order of its covariance block (covariance_block.hpp), for
// the delta method (delta_method.hpp), every gradient analytic. Internal to the sheet library.
//
// cobb-douglas, θ = (ln A, b₁ … b_k, controls): analytic (bound_functions.hpp gives the formulas).
// translog, θ = (α₀, α₁ … α_k, βᵢⱼ for i ≤ j, controls), l = ln x: analytic, since ln Y and the
// elasticities are linear in θ:
//   ln Y = α₀ + Σ αᵢlᵢ + ½ΣᵢΣⱼ βᵢⱼlᵢlⱼ: g = (1, l, ½lᵢ² at βᵢᵢ and lᵢlⱼ at βᵢⱼ (i < j), 0 …);
//   εᵢ = αᵢ + Σⱼ βᵢⱼlⱼ and ν(x) = Σ εᵢ: g from translogElasticityGradients (translog_fit.hpp);
//   MPᵢ = εᵢ·Y/xᵢ: where εᵢ > 0, ln MPᵢ = ln εᵢ + ln Y − ln xᵢ, g = gεᵢ/εᵢ + g(ln Y), log scale;
//   else MPᵢ itself, g = (Y/xᵢ)·(gεᵢ + εᵢ·g(ln Y)).
// ces, θ = (ln A, δ, ρ, ν), d = ln x₁ − ln x₂, b = ln x₂, H and its partials from cesComposite
// (ces.hpp, stable near ρ = 0 and for large |ρd|): analytic too, since H gives them simply:
//   ln Y = ln A + ν(b + H): g = (1, ν·∂H/∂δ, ν·∂H/∂ρ, b + H);
//   ε₁ = ν·π with π = logistic(logit δ − ρd): g = (0, ν·π(1−π)/(δ(1−δ)), −ν·d·π(1−π), π), and
//   ε₂ = ν − ε₁; MPᵢ as for the translog; ν is a parameter, g = (0, 0, 0, 1).
// Central differences were tried first and are not good enough here: on Cobb & Douglas (1928)
// the ces's gᵀVg cancels about four digits (Σ|gᵢVᵢⱼgⱼ| is up to 7e3 times gᵀVg), so the rounding
// error of a central difference at step h = 1e-6, ε·|ln Y|/h ≈ 1e-9 (ε = 2.2e-16), would show as
// a few parts in a million in a standard error.
// An interior fit only: at δ = 0 or 1 the derivative in δ is 0/0, and the message says so.
#pragma once

#include "functions/delta_method.hpp"

namespace isoquant::delta_method {

// The ces gradient as it is, or InputError naming "what" where it is not finite: δ of 0 or 1 leaves
// ∂/∂δ undefined (0/0).
Eigen::VectorXd finiteCesGradient(Eigen::VectorXd gradient);
// g of ln Y, by form: cobb-douglas (1, ln x, 0 …), translog and ces as above.
Eigen::VectorXd logOutputGradientOf(const BoundsModel& read, const Eigen::VectorXd& bundle);
// g of εᵢ, by form (cobb-douglas: εᵢ = bᵢ, 1 at bᵢ).
Eigen::VectorXd elasticityGradientOf(const BoundsModel& read, const Eigen::VectorXd& bundle, Eigen::Index input);

// Y (times `factor`, the smearing factor of a mean prediction) with the gradient of ln Y: log scale.
Linearised outputLinearised(const BoundsModel& read, const Eigen::VectorXd& bundle, double factor);
// ∂Y/∂xᵢ: log scale where it is positive by nature (cobb-douglas bᵢ > 0, translog and ces εᵢ > 0).
Linearised marginalProductLinearised(const BoundsModel& read, const Eigen::VectorXd& bundle, Eigen::Index input);
// εᵢ = ∂ln Y/∂ln xᵢ: value ∓ t·se.
Linearised elasticityLinearised(const BoundsModel& read, const Eigen::VectorXd& bundle, Eigen::Index input);
// ν at the bundle (the same at every bundle for cobb-douglas and ces): value ∓ t·se.
Linearised scaleLinearised(const BoundsModel& read, const Eigen::VectorXd& bundle);

} // namespace isoquant::delta_method
