// Fitting the translog form (translog.hpp) by least squares on logs:
//   ln Y = α₀ + Σᵢ αᵢ ln xᵢ + ½ Σᵢ Σⱼ βᵢⱼ ln xᵢ ln xⱼ + Σⱼ cⱼ zⱼ + u,   βᵢⱼ = βⱼᵢ,
// run as the regression of ln Y on 1, ln xᵢ, ½(ln xᵢ)² and ln xᵢ·ln xⱼ (i < j) and the controls, so
// that every coefficient is one of the parameters: p = 1 + k + k(k+1)/2 + m.
//
// Parameters in the order α₀, α₁…α_k, βᵢⱼ for i ≤ j (β₁₁, β₁₂, …, β₁ₖ, β₂₂, …, βₖₖ), controls.
// At the sample means l̄ of the logs: εᵢ = αᵢ + Σⱼ βᵢⱼ l̄ⱼ and ν = Σᵢ εᵢ, linear in the parameters,
// so their standard errors √(gᵀVg) are exact (the delta method of a linear function), with the
// fit's own covariance (classical or robust). ν = 1 is tested by the Wald F on F(1, n−p), and
// Cobb-Douglas (all βᵢⱼ = 0) by the Wald F on F(k(k+1)/2, n−p).
#pragma once

#include "isoquant/math/fits/fit_result.hpp"

#include <utility>
#include <vector>

namespace isoquant {

struct TranslogDetails {
    Eigen::VectorXd meanLogInputs;  // l̄
    ParameterInference elasticities; // εᵢ at l̄, t of εᵢ = 0 on t(n−p)
    WaldTest cobbDouglasTest; // all βᵢⱼ = 0
};

// The (i, j), i ≤ j, of the βᵢⱼ in parameter order.
std::vector<std::pair<Eigen::Index, Eigen::Index>> translogPairs(Eigen::Index inputs);

// The regressors 1, ln xᵢ, ½(ln xᵢ)², ln xᵢ·ln xⱼ (i < j), then the controls, in parameter order.
Eigen::MatrixXd translogDesign(const Eigen::MatrixXd& logInputs, const Eigen::MatrixXd& controls);

// εᵢ = αᵢ + Σⱼ βᵢⱼ lⱼ at the log inputs l (k of them) and ν = Σᵢ εᵢ as linear functions gᵀθ of the
// `parameters` θ in parameter order: row i (i < k) is the gradient of εᵢ (1 at αᵢ; at βᵢⱼ, lⱼ, and
// lᵢ at βⱼᵢ = βᵢⱼ stored once), row k that of ν; 0 at the controls.
Eigen::MatrixXd translogElasticityGradients(Eigen::Index k, Eigen::Index parameters, const Eigen::VectorXd& logs);

// The table label of βᵢⱼ: "<label i>*<label j>".
std::string translogPairLabel(const std::vector<std::string>& labels, Eigen::Index first, Eigen::Index second);

// Throws InputError for constant returns (not available for this form), an input label holding
// "*", too few rows and collinear terms (naming them).
ProductionFit fitTranslog(const ProductionData& data, const ProductionFitOptions& options);

} // namespace isoquant
