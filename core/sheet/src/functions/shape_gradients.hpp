// The decisions' quantities at one bundle of a translog or ces model, linearised in its parameters
// θ (form_gradients.hpp gives θ's order) for the delta method (delta_method.hpp). Internal to the
// sheet library; every gradient analytic.
//
// All of them rest on the local shape (local_shape.hpp): the elasticities eᵢ and the scaled Hessian
//   Sᵢⱼ = xᵢxⱼfᵢⱼ/Y = eᵢeⱼ + ∂eⱼ/∂ln xᵢ − [i = j]·eⱼ,
// so g of Sᵢⱼ = eᵢ·g(eⱼ) + eⱼ·g(eᵢ) + g(∂eⱼ/∂ln xᵢ) − [i = j]·g(eⱼ), with g(eᵢ) from form_gradients and
//   translog: ∂eⱼ/∂ln xᵢ = βᵢⱼ, g = 1 at βᵢⱼ's parameter;
//   ces: ∂eⱼ/∂ln xᵢ = ∓q (− for i = j), q = ν·ρ·s, s = π(1−π) (ces.hpp), ∂s = (1 − 2π)·∂π with
//        ∂π/∂δ = s/(δ(1−δ)), ∂π/∂ρ = −d·s: g of q = (0, νρ(1−2π)s/(δ(1−δ)), ν·s − νρ(1−2π)·d·s, ρ·s).
// Then
//   fᵢⱼ = (Y/(xᵢxⱼ))·Sᵢⱼ: g = fᵢⱼ·g(ln Y) + (Y/(xᵢxⱼ))·g(Sᵢⱼ); its sign varies: value ∓ t·se;
//   MRTS = (eᵢ/eⱼ)·(xⱼ/xᵢ): where eᵢ, eⱼ > 0 it is positive by nature, g of ln MRTS = g(eᵢ)/eᵢ −
//        g(eⱼ)/eⱼ, bounds on the log scale; else g = (xⱼ/xᵢ)·(g(eᵢ)/eⱼ − eᵢ·g(eⱼ)/eⱼ²), value ∓ t·se;
//   the elasticities of substitution (substitution_elasticity.hpp), differentiated along each
//        parameter's direction (de, dS): direct σ = N/D gives dσ = (dN − σ·dD)/D; Allen σ = ν·Cᵢⱼ
//        and Morishima M = eⱼ(Cᵢⱼ − Cⱼⱼ) with C = B⁻¹ give, by dC = −C·dB·C, dσ = Σde·Cᵢⱼ −
//        ν·(C dB C)ᵢⱼ and dM = deⱼ(Cᵢⱼ − Cⱼⱼ) − eⱼ((C dB C)ᵢⱼ − (C dB C)ⱼⱼ). Their sign is not fixed
//        (a translog's σ can be negative): value ∓ t·se.
#pragma once

#include "functions/delta_method.hpp"
#include "isoquant/math/forms/substitution_elasticity.hpp"

namespace isoquant::delta_method {

// `partial`, `rate` and `elasticity`: the plain function's value at the bundle.
Linearised secondPartialLinearised(const BoundsModel& read, const Eigen::VectorXd& bundle, Eigen::Index first,
                                   Eigen::Index second, double partial);
Linearised technicalRateLinearised(const BoundsModel& read, const Eigen::VectorXd& bundle, Eigen::Index first,
                                   Eigen::Index second, double rate);
Linearised substitutionLinearised(const BoundsModel& read, const Eigen::VectorXd& bundle, Eigen::Index first,
                                  Eigen::Index second, SubstitutionKind kind, double elasticity);

} // namespace isoquant::delta_method
