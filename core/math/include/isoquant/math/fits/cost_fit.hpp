// Fitting a cost function C(y, w) to observed cost, output and input prices (PRODCOSTFIT).
//
// Cobb-Douglas cost:  ln C = β₀ + β_y ln y + Σᵢ βᵢ ln wᵢ
// translog cost:      ln C = β₀ + β_y ln y + ½β_yy (ln y)² + Σᵢ βᵢ ln wᵢ + ½ΣᵢΣⱼ βᵢⱼ ln wᵢ ln wⱼ
//                            + Σᵢ βᵢ_y ln wᵢ ln y,   βᵢⱼ = βⱼᵢ
// Linear homogeneity in prices (Σβᵢ = 1, Σⱼβᵢⱼ = 0, Σᵢβᵢ_y = 0) is imposed by dividing cost and
// prices by the last price w_k: the regression run is ln(C/w_k) on 1, ln y, ln(wᵢ/w_k) (i < k) and,
// for the translog, ½(ln y)², ½(ln w̃ᵢ)², ln w̃ᵢ·ln w̃ⱼ (i < j < k) and ln w̃ᵢ·ln y. Every parameter
// of the full form is an affine function θ = T·b + t₀ of the regression's b (the last price's from
// the restrictions), so its standard error comes from T·V·Tᵀ, V the regression's covariance.
//
// Parameters θ in table order: constant, output, the k prices; for the translog then
// output*output, <i>*<j> for i ≤ j, <i>*output.
// Cost elasticity ε = ∂ln C/∂ln y = β_y + β_yy·l̄_y + Σᵢ βᵢ_y·l̄ᵢ at the sample means of the logs
// (linear in θ, so its standard error √(gᵀV_θg) is exact); returns to scale 1/ε, standard error
// se(ε)/ε² (delta method); the test of returns = 1 is the Wald F of ε = 1 on F(1, n − p).
// Efficient scale (translog): ln y* = (1 − β_y − Σᵢ βᵢ_y·l̄ᵢ)/β_yy, where ε = 1 at the mean log
// prices, standard error y*·√(gᵀV_θg) with g the gradient of ln y* (delta method).
// R² is that of ln C (1 − RSS/TSS of ln C), as PRODFIT does under constant returns; the F, the
// log-likelihood, AIC and BIC are those of the regression run.
// Cost frontier (`inefficiency` set): the same regression run with ε = v + u, u ≥ 0 half-normal or
// exponential (cost_frontier.hpp), by maximum likelihood from the least-squares start; θ = T·β + t₀
// and its covariance T·V_β·Tᵀ from the frontier's β and the observed information. Inference is then
// the normal's (Student's t on infinitely many degrees of freedom) and the test of returns = 1 the
// Wald χ²(1) (the F on 1 and ∞). Not with shares.
//
// Controls zⱼ enter ln C as they are, not logged (+ Σⱼ cⱼ zⱼ, after the form's terms; θ ends with
// the cⱼ). Groups, effects, a trend and cluster errors are PRODFIT's (panel_regression.hpp): the
// regression run above is the base of the panel regression, and under effects the constant is the
// mean group effect (no standard error); the trend's coefficient is the change of ln C per period
// at given output and prices (negative: costs fall — technical progress). With shares, controls
// and a trend enter the cost equation only (they shift cost, not the shares), and neither effects
// nor cluster errors are available; a cost frontier takes controls only.
#pragma once

#include "isoquant/math/fits/fit_result.hpp"
#include "isoquant/math/forms/cost_duality.hpp"
#include "isoquant/math/frontier/stochastic_frontier.hpp"

#include <Eigen/Dense>

#include <optional>
#include <string>
#include <vector>

namespace isoquant {

enum class CostForm { cobbDouglas, translog };

struct CostData {
    Eigen::VectorXd cost;   // n values, positive
    Eigen::VectorXd output; // n values, positive
    Eigen::MatrixXd prices; // n × k, positive
    std::vector<std::string> priceLabels; // the inputs' labels
    // n × k cost shares, rows summing to 1: the share equations join the cost equation
    // (cost_share_system.hpp); empty: least squares on the cost equation alone.
    Eigen::MatrixXd shares;
    Eigen::MatrixXd controls; // n × m, finite (m may be 0)
    std::vector<std::string> controlLabels;
    PanelColumns panel; // groups and periods, when given
};

struct CostFitOptions {
    CostForm form = CostForm::cobbDouglas;
    CovarianceKind covariance = CovarianceKind::classical; // classical, hc1, hc3 or cluster (by the groups)
    double confidenceLevel = 0.95;
    // Set: the cost frontier with this distribution of u (above); empty: the average cost function.
    std::optional<InefficiencyDistribution> inefficiency;
    EffectsKind effects = EffectsKind::none;
};

// The cost frontier's own figures: the fit of −ln(C/w_k) as a production frontier (cost_frontier.hpp:
// its coefficients are −b of the regression run, its residuals −ε) and σᵥ, σᵤ, λ.
struct CostFrontierPart {
    StochasticFrontierFit mirrored;
    FrontierScaleEstimates scales;
};

struct CostFit {
    CostForm form = CostForm::cobbDouglas;
    std::vector<std::string> priceLabels;
    // θ and its inference in table order (above), in the fields PRODFIT's tables use; the
    // regression run, R² and R̄² of ln C, the smearing factor (mean of exp(residual)) and the
    // returns to scale (1/ε with the test of ε = 1, and the verdict) likewise; the controls'
    // labels, the constant at the controls' means (logScaleAtControlMeans) and the panel options'
    // account (panel) as PRODFIT's.
    ProductionFit summary;
    ParameterEstimate costElasticity;
    Eigen::VectorXd meanLogPrices;
    double meanLogOutput = 0;
    // Translog with β_yy > 0: y* and its standard error; empty otherwise.
    std::optional<ParameterEstimate> efficientScale;
    // The rows (of the data) whose fitted shares sᵢ = ∂ln C/∂ln wᵢ are not all positive or whose
    // cost is not concave in prices (cost_duality.hpp); the first row counted from the range's top.
    CostRegularityTally regularity;
    std::size_t firstDataRow = 1; // of the ranges, 1-based, for naming the first irregular row
    // `incomplete rows` on: the table shows how many rows were left out.
    bool dropsIncompleteRows = false;
    std::size_t incompleteRowsDropped = 0;
    std::optional<CostFrontierPart> frontier; // with `inefficiency`
};

// The labels of the translog's second-order rows: "output*output", "<i>*<j>" (i ≤ j), "<i>*output".
std::vector<std::string> costSecondOrderLabels(const std::vector<std::string>& priceLabels);

// The first θ index of the translog's <i>*output terms: constant, output, k prices, output*output
// and the k(k+1)/2 price pairs come before them.
Eigen::Index priceOutputStart(Eigen::Index prices);

// Throws InputError for too few rows, no variation in output, and collinear terms (naming them);
// for panel options without their columns or in a combination not available (above); for a cost
// frontier also for shares and for an exact fit (a frontier needs noise).
CostFit fitCost(const CostData& data, const CostFitOptions& options);

} // namespace isoquant
