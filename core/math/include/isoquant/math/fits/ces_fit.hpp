// Fitting the CES form of two inputs (ces.hpp) by nonlinear least squares on logs:
//   ln Y = ln A + ν·(ln x₂ + H(ln x₁ − ln x₂; δ, ρ)) + u,   p = 4 parameters (ln A, δ, ρ, ν).
//
// The solver (nonlinear_least_squares.hpp) works on (ln A, t, s, ν) with δ = 1/(1 + e^(−t)) and
// ρ = −1 + eˢ, so that every iterate is a CES with δ ∈ (0, 1) and ρ > −1. It starts from the
// Kmenta approximation (least squares of ln Y on ln x₁, ln x₂ and (ln x₁ − ln x₂)², whose
// coefficients give νδ, ν(1−δ) and −ρνδ(1−δ)/2) and from the best points of a grid over ρ on
// which δ is searched (Brent) with ln A and ν concentrated out by simple regression; the lowest
// sum of squares among the converged runs is kept. With more rows than
// CesFitOptions::startSearchRows (see there) the grid uses evenly spaced rows only, and every start
// is first run to its optimum on those rows; the runs on all rows start from the distinct points
// so reached. A converged run inside the domain ends with Gauss–Newton steps
// (refinedByGaussNewton), so the estimates reported depend on the start by 1e-10 relative at most
// on the test data (up to 4e-8 without them).
//
// Inference is classical at the optimum: V = s²·(JᵀJ)⁻¹ with J the Jacobian in (ln A, δ, ρ, ν) and
// s² = RSS/(n−4), t(n−4) for every test; σ = 1/(1+ρ) with se(σ) = se(ρ)/(1+ρ)² (delta method) and
// bounds [1/(1+ρ_high), 1/(1+ρ_low)], the bounds of ρ transformed (σ is monotone in ρ), the upper
// one infinite when ρ_low ≤ −1. The returns to scale are ν, tested against 1 by
// F = ((ν−1)/se(ν))² on F(1, n−4). There is no inference, and the verdict is "not tested (…)",
// at a boundary optimum, without convergence, and where J is rank deficient at a converged interior
// point. ProductionFit::status says which, one kind (fit_status.hpp) in this order: notConverged or
// stopped (the solver's status), notIdentified (JᵀJ singular, the optimum not unique), boundary,
// exactFit, ok; its reason is the solver's account of how the run kept ended.
// R² = 1 − RSS/TSS of ln Y; log-likelihood, AIC and BIC as for every form, with p = 4.
#pragma once

#include "isoquant/math/numerics/nonlinear_least_squares.hpp"
#include "isoquant/math/fits/fit_result.hpp"

#include <optional>
#include <string>

namespace isoquant {

// Where an optimum on the edge of the parameter space lies.
enum class CesBoundary {
    none,
    firstInputOnly,     // δ = 1 and the second input's share below boundaryDistance on every row:
                        // output depends on the first input alone; ρ and σ are not identified
    secondInputOnly,    // δ = 0 and the first input's share below boundaryDistance on every row
    perfectSubstitutes, // ρ = −1 (σ infinite): Y = A·(δ·x₁ + (1−δ)·x₂)^ν
    fixedProportions    // ρ → ∞ (σ → 0): the Leontief limit; ρ is shown as reached, not as an estimate
};

struct CesDetails {
    double substitutionElasticity = 0; // σ = 1/(1+ρ); NaN where δ is 0 or 1 (σ not identified)
    double substitutionStandardError = 0;
    double substitutionLowerBound = 0;
    double substitutionUpperBound = 0;
    Eigen::Index evaluations = 0; // residual evaluations of the run kept, on all rows
    // Where the point kept lies on the edge, whether or not the solver converged there (the
    // table marks the parameter); ProductionFit::status is boundary when it converged there.
    CesBoundary boundary = CesBoundary::none;
};

struct CesFitOptions {
    NonlinearLeastSquaresOptions solver;
    // An optimum with δ or 1 − δ below this (and the share of that input below it on every row),
    // or 1 + ρ below it, or σ = 1/(1+ρ) below it, lies on the boundary: the estimate shown is the
    // boundary value (the value reached for ρ → ∞) and no standard errors are reported. 1e-6 is
    // far below any weight or curvature the data could tell from the boundary (common practice, no
    // source).
    double boundaryDistance = 1e-6;
    // (ln A, δ, ρ, ν) to start from instead of the Kmenta and grid starts; needs δ ∈ (0, 1), ρ > −1.
    std::optional<Eigen::Vector4d> start;
    // With n rows and m = startSearchRows < n, the Kmenta regression and the grid over ρ (with δ
    // searched, ln A and ν concentrated out) use only the m rows ⌊k·n/m⌋, k = 0, …, m − 1 (the
    // grid at most 250 of these, evenly spaced again), and the Kmenta and grid starts are each run
    // to their optimum on the m rows (to a relative step of 1e-10) before the runs on all rows;
    // with n ≤ m the runs start from the Kmenta and grid points themselves. Why this is enough: the grid and the runs on the sample only choose
    // where the runs on all rows start, and so which basin they end in; the estimates come from all
    // rows. Evenly spaced rows are deterministic and span data sorted by any column; their sum of
    // squares is m/n times that of all rows up to a relative sampling error of about √(2/m), 4.5 %
    // at m = 1000, and its differences between two points, taken on the same rows, vary less still,
    // while the basins the grid exists to tell apart differ by more (13 % on the rice-farm panel).
    // The cost of the start search is then fixed whatever n. Needs m ≥ 5 (std::invalid_argument).
    Eigen::Index startSearchRows = 1000;
};

// Throws InputError for anything but two inputs, for controls, constant returns or robust errors
// (not available for this form), for too few rows (n ≥ 5), for an input that does not vary (as the
// Cobb-Douglas fit does), and when the ratio x₁/x₂ takes fewer than three values (δ and ρ cannot
// then be told apart). Values that agree to 1e-9 relative count as one in both checks.
ProductionFit fitCes(const ProductionData& data, const ProductionFitOptions& options,
                     const CesFitOptions& cesOptions = {});

// The start values the fit would try: the Kmenta one, then the grid's best first: (ln A, δ, ρ, ν).
// searchRows as CesFitOptions::startSearchRows.
std::vector<Eigen::Vector4d> cesStartValues(const ProductionData& data,
                                            Eigen::Index searchRows = CesFitOptions{}.startSearchRows);

// How the verdict of a fit without a test of ν = 1 begins: "not tested (boundary)", "not tested
// (not converged)", "not tested (stopped)" or "not tested (not identified)".
inline constexpr const char* untestedVerdictPrefix = "not tested (";

} // namespace isoquant
