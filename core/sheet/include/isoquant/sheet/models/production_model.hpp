// A fitted or hand-typed technology, read back from cells for the evaluators.
//
// `model` is either a PRODFIT table or a small table the user types: two or more columns, labels
// in the first and values in the second, with a row "form" (e.g. cobb-douglas), a row "ln A" (or
// "A") and one exponent row per input, in input order. Rows up to the first empty row are
// parameters; rows after it must be statistic rows of a PRODFIT table, up to a "covariance" row that
// starts the covariance block (covariance_block.hpp), read back and checked to the table's end. A row labelled
// "<label> (control)" is a control's coefficient; with controls the evaluators use the row
// "ln A at control means" as ln A, and the row "ln A for predictions" before either when there
// is one (fixed effects or a trend: the mean group effect over rows, at the latest period). With
// controls or a trend and no effects, the covariance block ends with the row of that ln A
// (covariance_block.hpp), which the reader then requires.
//
// The form row decides what the parameter rows mean:
// - cobb-douglas: one exponent row per input, labelled by the input.
// - ces: rows "delta", "rho" (or "sigma", ρ = 1/σ − 1; both may be given and must agree) and
//   "nu", in any order; an optional row "inputs | <first label> | <second label>" names the two
//   inputs (otherwise "input 1", "input 2"). A PRODFIT table whose "convergence" row does not say
//   "converged" is refused.
// - translog: one row per input (αᵢ), labelled by the input, and one row "<label i>*<label j>" for
//   every pair i ≤ j (βᵢⱼ, the ½ convention of translog.hpp; either order of the two labels).
// Rows a form does not know ("elasticity <label>", "Cobb-Douglas test", …) are statistic rows after the
// empty row of a PRODFIT table.
#pragma once

#include "isoquant/sheet/arguments/cells.hpp"
#include "isoquant/math/forms/technology.hpp"
#include "isoquant/math/forms/production_form.hpp"
#include "isoquant/sheet/tables/covariance_block.hpp"

#include <memory>
#include <optional>
#include <string>
#include <vector>

namespace isoquant {

struct ScaleTest {
    double estimate = 0;
    double standardError = 0;
    double fStatistic = 0;
    double pValue = 0;
    bool imposed = false;
};

struct ProductionModel {
    ProductionForm form = ProductionForm::cobbDouglas;
    std::vector<std::string> inputLabels;
    // Cobb-Douglas: ln A as the evaluators use it (at the controls' means when the fit had any).
    std::shared_ptr<const Technology> technology;
    // The test of ν = 1 from a PRODFIT table; absent for a hand-typed model.
    std::optional<ScaleTest> scaleTest;
    // Duan's smearing factor from a "smearing factor" row; absent when the model has none.
    std::optional<double> smearingFactor;
    // A trend: λ from the "technical change per period" row and t_last from "latest period", so
    // that the technology of period t has ln A + λ·(t − t_last) (PRODTFP's periods). Absent
    // without those rows.
    std::optional<double> technicalChange;
    std::optional<double> latestPeriod;
    // The "effects" row says "two-way": period effects, which the table does not hold.
    bool hasPeriodEffects = false;
    // ln A is shifted (controls at their means, effects or a trend): the evaluators' ln A is then
    // not ln A of the table's parameters.
    bool logScaleShifted = false;
    // Shifted by controls, effects or a trend: the covariance block's row after the parameters is
    // the evaluators' ln A (covariance_block.hpp).
    bool covarianceCoversShiftedLogScale = false;
    // A trend: the block's last row is λ, "technical change per period".
    bool covarianceCoversTechnicalChange = false;
    // The covariance block of a PRODFIT table made with covariance TRUE (covariance_block.hpp).
    std::optional<CovarianceBlock> parameterCovariance;
};

// Throws InputError naming "model" and the row of the range.
ProductionModel readProductionModel(const CellTable& range);

// Position (0-based) of the input a user named by 1-based number or by label.
Eigen::Index readInputSelector(const Cell& selector, const ProductionModel& model, const std::string& argument);
// The same over any list of input labels (a cost model's price rows, say).
Eigen::Index readLabelSelector(const Cell& selector, const std::vector<std::string>& labels, const std::string& argument);

// "increasing", "constant", "decreasing" or "constant (imposed)": by the Wald test at
// α = 1 − level when the model carries one, else by ν alone.
std::string returnsVerdict(const ProductionModel& model, double level);

// The verdict row of a PRODFIT table when it reads "not tested (…)" (a ces fit at a boundary, not
// converged or not identified): such a fit carries no test, and PRODRETURNS repeats the row rather
// than judge by ν alone. Empty for any other table.
std::optional<std::string> untestedVerdict(const CellTable& range);

} // namespace isoquant
