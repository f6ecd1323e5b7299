// The covariance block a fitted table carries on request (PRODFIT's `covariance` argument, issue 20).
//
// After the table's last row come 1 + p rows (p estimated parameters, in the table's order):
//   covariance | <errors word> | <degrees of freedom> | <confidence level>
//   <label of parameter 1> | V₁₁ | V₁₂ | … | V₁ₚ
//   …
//   <label of parameter p> | Vₚ₁ | … | Vₚₚ
// V is the estimated covariance matrix of the kind chosen by `errors` ("classical", "hc1", "hc3",
// "cluster"); the degrees of freedom are those of the table's reference t distribution (n − p, or
// G − 1 under cluster errors) and the level that of its bounds, so that an evaluator reading the
// table back states bounds as the table does. A cell of V that has no value (ln A under effects;
// every cell of a ces fit without standard errors: at a boundary, not converged, not identified)
// reads "n/a". The table is then max(7, p + 1) columns wide and has 1 + p rows more; the header
// cells over columns 8 … p + 1 hold the label of the parameter whose covariances the column holds.
//
// The parameters, and so p, by form (k inputs, m controls):
//   cobb-douglas  ln A, the inputs, the controls "<label> (control)"        p = 1 + k + m
//   translog      ln A, the inputs (αᵢ), the pairs "<label i>*<label j>" for i ≤ j in the order
//                 1*1, 1*2, …, 1*k, 2*2, …, k*k (βᵢⱼ), the controls          p = 1 + k + k(k+1)/2 + m
//   ces           ln A, delta, rho, nu (its own classical inference)       p = 4
// So a translog table of two inputs without controls (23 rows, p = 6) becomes 30 rows by 7
// columns, of three inputs (28 rows, p = 10) 39 rows by 11 columns; a ces table (20 rows)
// becomes 25 rows by 7 columns.
//
// A cobb-douglas or translog table with controls, effects or a trend adds one more parameter row
// (and column) after those p: the evaluators' ln A, s = ln A + Σⱼ cⱼ·z̄ⱼ (+ λ·(t_last − t_first)
// with a trend, + the last period's effect under two-way effects), where under effects ln A is the
// row-weighted mean group effect Σ_g n_g·α_g / n, labelled as the table's own row for it, "ln A
// for predictions" with effects or a trend, else "ln A at control means" (fit_result.hpp,
// ShiftedLogScale). A cobb-douglas table with a trend adds one more after it, "technical change
// per period" (λ; its covariances with the parameters, then with s). So q = p + (1 with controls,
// effects or a trend) + (1 with a trend) parameter rows: the table has 1 + q rows more and is
// max(7, q + 1) columns wide. Under effects ln A itself (the plain mean effect) has no variance:
// n/a in its row and column.
#pragma once

#include "isoquant/sheet/arguments/cells.hpp"
#include "isoquant/math/numerics/least_squares.hpp"
#include "isoquant/math/fits/production_fit.hpp"

#include <Eigen/Dense>

#include <string>
#include <vector>

namespace isoquant {

inline constexpr const char* covarianceBlockLabel = "covariance";

struct CovarianceBlock {
    std::vector<std::string> labels; // the parameters' row labels, in order
    Eigen::MatrixXd matrix;          // p × p; NaN where the table says "n/a"
    CovarianceKind kind = CovarianceKind::classical;
    double degreesOfFreedom = 0; // infinite for a maximum-likelihood fit: the normal
    double level = 0.95;
    // A maximum-likelihood fit's block (PRODFRONTIER, a cost frontier): the inverse observed
    // information; its header row reads "likelihood" and "normal" in place of the kind of errors
    // and the degrees of freedom.
    bool likelihood = false;
};

inline constexpr const char* likelihoodBlockWord = "likelihood";
inline constexpr const char* normalDistributionWord = "normal";

std::string covarianceKindWord(CovarianceKind kind);

// Columns of a table of `columns` columns once a block of `parameters` parameters is added:
// max(columns, p + 1).
std::size_t widthWithCovariance(std::size_t columns, std::size_t parameters);

// The table with the block appended below its last row.
CellTable withCovarianceBlock(const CellTable& table, const CovarianceBlock& block);

// The parameters of a Cobb-Douglas table, as its rows label them: ln A, the inputs, the controls
// with " (control)".
std::vector<std::string> cobbDouglasParameterLabels(const std::vector<std::string>& inputLabels,
                                                    const std::vector<std::string>& controlLabels);

// The parameters of a translog table, as its rows label them: ln A, the inputs, the pairs
// "<label i>*<label j>" (i ≤ j, in the table's order), the controls with " (control)".
std::vector<std::string> translogParameterLabels(const std::vector<std::string>& inputLabels,
                                                 const std::vector<std::string>& controlLabels);
// The parameters of a ces table: ln A, delta, rho, nu.
std::vector<std::string> cesParameterLabels();
// The parameters of a table of the form `form`, in its order (the table above).
std::vector<std::string> parameterLabels(ProductionForm form, const std::vector<std::string>& inputLabels,
                                         const std::vector<std::string>& controlLabels);
// The label of the block's row for the evaluators' ln A (above): the table's own row for it.
std::string shiftedLogScaleLabel(bool forPredictions);

// The block with one more parameter row and column, `label`, the evaluators' shifted ln A (or a
// cost table's shifted constant) with its covariances.
void appendShiftedParameter(CovarianceBlock& block, const ShiftedLogScale& shifted, const std::string& label);

// PRODFIT's table `table` of `fit`, with the block when `covariance` is TRUE (read as a switch
// naming "covariance"), for every form.
CellTable fitTableWithCovariance(const CellTable& table, const ProductionFit& fit, const Cell& covariance);

// The block whose "covariance" row is row `headerRow` of `range` (a model argument). Throws
// InputError naming "model" and the row when: the row's degrees of freedom or level are missing
// or out of range; the block has not one row per parameter, labelled as `expectedLabels` (the
// shifted ln A's row last when the table has one); a cell
// is not a number; the matrix is not symmetric (relative 1e-8 of the larger diagonal entry) or not
// positive semidefinite (an eigenvalue below −1e-10 times the largest).
// `sizeNote` ends the message about a block of the wrong size.
CovarianceBlock readCovarianceBlock(const CellTable& range, std::size_t headerRow,
                                    const std::vector<std::string>& expectedLabels, const std::string& sizeNote = "");

} // namespace isoquant
