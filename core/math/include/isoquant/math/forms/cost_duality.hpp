// What a log-linear-in-parameters cost function says about input demand, substitution and size, at
// one output and one set of prices. For a translog cost function (a Cobb-Douglas one has βᵢⱼ = 0)
//   sᵢ = ∂ln C/∂ln wᵢ = βᵢ + Σⱼ βᵢⱼ ln wⱼ + βᵢ_y ln y        (fitted cost shares)
//   Cᵢ = sᵢ·C/wᵢ = xᵢ                                        (Shephard's lemma)
//   Cᵢⱼ = C/(wᵢwⱼ)·Mᵢⱼ,  Mᵢⱼ = βᵢⱼ + sᵢsⱼ − δᵢⱼsᵢ
// (Christensen, Jorgenson and Lau 1973; Binswanger 1974 — the standard translog cost algebra,
// derived here by differentiating ln C twice; from memory). From these:
//   Allen           σᵢⱼ = C·Cᵢⱼ/(Cᵢ·Cⱼ) = Mᵢⱼ/(sᵢsⱼ)
//   demand          ηᵢⱼ = ∂ln xᵢ/∂ln wⱼ = wⱼCᵢⱼ/Cᵢ = Mᵢⱼ/sᵢ = sⱼσᵢⱼ
//   Morishima       Mᵢⱼ = ηᵢⱼ − ηⱼⱼ   (PRODSUBSTITUTION's order: the price of j moves, x_i/x_j responds)
// C is concave in prices where the Hessian [Cᵢⱼ] is negative semidefinite, i.e. where M is (M is
// congruent to it by diag(wᵢ)/√C, which keeps the signs of the eigenvalues).
#pragma once

#include <Eigen/Dense>

#include <optional>
#include <string>
#include <vector>

namespace isoquant {

enum class PriceElasticityKind { demand, allen, morishima };

// M = B + s·sᵀ − diag(s), B the symmetric βᵢⱼ.
Eigen::MatrixXd scaledCostHessian(const Eigen::VectorXd& shares, const Eigen::MatrixXd& interactions);

// Empty where a share the formula divides by is 0 (or the result is not finite).
std::optional<double> costPriceElasticity(const Eigen::VectorXd& shares, const Eigen::MatrixXd& interactions,
                                          Eigen::Index first, Eigen::Index second, PriceElasticityKind kind);

// The same three figures from an Allen matrix element pair and the cost shares at the least-cost
// bundle of a production model (its dual): demand ηᵢⱼ = sⱼσᵢⱼ, Morishima as given.
double demandFromAllen(double allen, double secondShare);

// "regular", or what fails: "fitted share of energy is not positive" (listing every such input),
// "cost not concave in prices" (an eigenvalue of M above tolerance·max|Mᵢⱼ|), or both.
struct CostRegularityOptions {
    // An eigenvalue of M within this·max|Mᵢⱼ| of 0 counts as 0: M always has the eigenvector
    // (1, …, 1) with eigenvalue 0 under homogeneity, computed to rounding (common practice, no source).
    double zeroTolerance = 1e-10;
};
std::string costRegularityPhrase(const Eigen::VectorXd& shares, const Eigen::MatrixXd& interactions,
                                 const std::vector<std::string>& labels, const CostRegularityOptions& options = {});

// PRODCOSTFIT's `regularity` row: how many rows of fitted shares (n × k) are not regular, and the
// first such row (0-based) with its phrase.
struct CostRegularityTally {
    std::size_t irregularRows = 0;
    std::optional<Eigen::Index> firstRow;
    std::string firstPhrase;
};
CostRegularityTally tallyCostRegularity(const Eigen::MatrixXd& fittedShares, const Eigen::MatrixXd& interactions,
                                        const std::vector<std::string>& labels);

// The output where average cost is lowest for ln C with cost elasticity ε(y) = a + b·ln y
// (a = β_y + Σᵢ βᵢ_y ln wᵢ, b = β_yy): ε = 1 at ln y* = (1 − a)/b, a minimum of C/y when b > 0.
// Otherwise the sentence saying why there is none.
struct EfficientScale {
    std::optional<double> output;
    std::string whyNone;
};
EfficientScale efficientScaleOfLogQuadratic(double elasticityAtUnitOutput, double elasticitySlope);

// Sentences shared with the production-model route.
inline constexpr const char* averageCostFallsForever =
    "No efficient scale: average cost falls at every output in this model (increasing returns throughout)";
inline constexpr const char* averageCostRisesForever =
    "No efficient scale: average cost rises at every output in this model (decreasing returns throughout)";
inline constexpr const char* averageCostFlat =
    "No efficient scale: average cost is the same at every output in this model (constant returns)";
inline constexpr const char* averageCostHasMaximum =
    "No efficient scale: returns to scale rise with output in this model, so average cost has a highest "
    "point, not a lowest";

} // namespace isoquant
