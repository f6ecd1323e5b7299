// Elasticities of substitution between two inputs at one bundle, for any smooth technology, from
// its gradient and Hessian (in the dimensionless form of local_shape.hpp). Definitions as in
// Chambers, Applied Production Analysis (1988), ch. 1 (from memory), with fᵢ, fᵢⱼ the first and
// second partials, F the determinant of the bordered Hessian [[0, ∇fᵀ], [∇f, ∇²f]] and Fᵢⱼ the
// cofactor of fᵢⱼ in it:
//   direct     σᵢⱼ = (1/(xᵢfᵢ) + 1/(xⱼfⱼ)) / (−fᵢᵢ/fᵢ² + 2fᵢⱼ/(fᵢfⱼ) − fⱼⱼ/fⱼ²)
//   Allen      σᵢⱼ = (Σₖ xₖfₖ)/(xᵢxⱼ) · Fᵢⱼ/F
//   Morishima  Mᵢⱼ = (fⱼ/xᵢ)·Fᵢⱼ/F − (fⱼ/xⱼ)·Fⱼⱼ/F   (not symmetric: i and j in the order given)
// In the scaled variables eᵢ = xᵢfᵢ/Y, Sᵢⱼ = xᵢxⱼfᵢⱼ/Y, with B the scaled bordered Hessian
// [[0, eᵀ], [e, S]] (rows and columns of inputs numbered from 1):
//   direct     σᵢⱼ = (1/eᵢ + 1/eⱼ) / (−Sᵢᵢ/eᵢ² + 2Sᵢⱼ/(eᵢeⱼ) − Sⱼⱼ/eⱼ²)
//   Allen      σᵢⱼ = (Σₖ eₖ)·(B⁻¹)ᵢⱼ
//   Morishima  Mᵢⱼ = eⱼ·((B⁻¹)ᵢⱼ − (B⁻¹)ⱼⱼ)
// (Fᵢⱼ/F is the (i, j) entry of the inverse of the symmetric bordered Hessian; the scaling
// multiplies it by Y/(xᵢxⱼ).)
#pragma once

#include "isoquant/math/forms/local_shape.hpp"

#include <optional>

namespace isoquant {

enum class SubstitutionKind { direct, allen, morishima };

// Empty where the elasticity is undefined at this bundle: a denominator of 0 (a straight
// isoquant, perfect substitutes) or a singular bordered Hessian, or a marginal product of 0.
std::optional<double> substitutionElasticity(const LocalShape& shape, Eigen::Index first, Eigen::Index second,
                                             SubstitutionKind kind);

// The scaled bordered Hessian B = [[0, eᵀ], [e, S]].
Eigen::MatrixXd scaledBorderedHessian(const LocalShape& shape);

} // namespace isoquant
