// The delta method behind the functions' `what` argument (bound_functions.hpp), internal to the
// sheet library: the words, the model read with its covariance block, and the standard error or
// bounds of one quantity linearised in the parameters θ = (ln A, b₁ … b_k, controls).
#pragma once

#include "isoquant/sheet/arguments/argument_names.hpp"
#include "isoquant/sheet/arguments/cells.hpp"
#include "isoquant/sheet/arguments/numeric_range.hpp"
#include "isoquant/sheet/models/model_table.hpp"
#include "isoquant/sheet/models/production_model.hpp"
#include "isoquant/math/forms/cobb_douglas.hpp"

#include <Eigen/Dense>

#include <functional>
#include <string>

namespace isoquant::delta_method {

enum class Statistic { value, standardError, lowerBound, upperBound, predictionLower, predictionUpper };

// Empty: "value". `allowsPrediction`: the two prediction words are known too (PRODOUTPUT).
// `argumentName` names the cell in a message: "what", or "statistic" where "what" is taken (PRODCOST).
Statistic readWhat(const Cell& what, bool allowsPrediction, const std::string& argumentName = argument::what);
std::string word(Statistic statistic);

// A quantity at one bundle: its value and the gradient in θ of ln(value) (log scale) or of value.
struct Linearised {
    double value = 0;
    Eigen::VectorXd gradient;
    bool logScale = false;
};

struct BoundsModel {
    ProductionModel model;
    const Technology* technology = nullptr; // the model's, of any form
    const CobbDouglas* form = nullptr;      // the same when it is a Cobb-Douglas, else null
    const CovarianceBlock* block = nullptr;
    double critical = 0; // the t quantile of the block's level and degrees of freedom
    // Where the evaluators' ln A stands in the block: 0, or the row after the parameters when
    // controls, effects or a trend shift it (covariance_block.hpp). The gradients put ln A's entry
    // at 0; answer moves it there.
    Eigen::Index logScaleIndex = 0;
    // λ's row with a trend (the block's last), else −1.
    Eigen::Index technicalChangeIndex = -1;
};

// Which forms a function answers the words for: every function of a production model now answers
// them for every form (form_gradients.hpp, shape_gradients.hpp, plan_gradients.hpp); the default,
// cobbDouglas, is for a function whose gradients are written for that form alone (read.form set).
enum class FormsAnswered { cobbDouglas, all };

// Throws InputError naming `argumentName` for a model without a covariance block (a typed model) and
// a form the function does not answer for.
BoundsModel readBoundsModel(const ModelTable& range, Statistic statistic,
                            const std::string& argumentName = argument::what,
                            FormsAnswered forms = FormsAnswered::cobbDouglas);

// se = √(gᵀVg); bounds value ∓ t·se, or value·exp(∓t·se) on the log scale (se then value·se).
// The BoundsModel overload first moves g's ln A entry to read.logScaleIndex: the evaluators' ln A is
// s = ln A + Σⱼ cⱼ·z̄ⱼ (+ λ·Δt), and a quantity f(s, b) has ∂f/∂s where f(ln A, b) has ∂f/∂ln A, and
// 0 at ln A itself and at the controls (held at their means, inside s).
// `residualVariance` widens the prediction words' log-scale interval: √(gᵀVg + σ²).
double answer(const Linearised& quantity, const BoundsModel& read, Statistic statistic, double residualVariance);
// The same from a block and the t quantile `critical` (a cost model's, say).
double answer(const Linearised& quantity, const CovarianceBlock& block, double critical, Statistic statistic,
              double residualVariance);

// A zero gradient of the size of the block.
Eigen::VectorXd zeroGradient(const BoundsModel& read);

// g of ln Y: 1 for ln A, ln xᵢ for bᵢ, 0 for the controls.
Eigen::VectorXd logOutputGradient(const BoundsModel& read, const Eigen::VectorXd& bundle);

// The answer per row of `inputs` (read as the evaluators read it), under the header "<word> of <title>".
CellTable columnOfBounds(const CellTable& inputs, const BoundsModel& read, Statistic statistic,
                         double residualVariance, const std::string& title,
                         const std::function<Linearised(const Eigen::VectorXd&)>& linearise);

// The answer in place of each number of `values`, the plain function's column for the rows of
// `inputs` (a header cell over them when it has one more row): a text there (an undefined value
// at that bundle) stays, the header becomes "<word> of <header>". `linearise` gets the bundle and
// the value the plain function gave.
CellTable boundsOfValueColumn(const CellTable& values, const CellTable& inputs, const BoundsModel& read,
                              Statistic statistic,
                              const std::function<Linearised(const Eigen::VectorXd&, double)>& linearise);
// The same with the row (0-based among the data rows) given to `linearise` first.
CellTable boundsOfValueColumn(const CellTable& values, const CellTable& inputs, const BoundsModel& read,
                              Statistic statistic,
                              const std::function<Linearised(Eigen::Index, const Eigen::VectorXd&, double)>& linearise);

} // namespace isoquant::delta_method
