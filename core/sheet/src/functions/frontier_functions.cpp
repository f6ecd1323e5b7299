#include "isoquant/sheet/functions/frontier_functions.hpp"

#include "isoquant/sheet/arguments/argument_names.hpp"
#include "isoquant/sheet/functions/production_functions.hpp"
#include "isoquant/math/numerics/exact_elementwise.hpp"
#include "isoquant/math/messages/input_error.hpp"
#include "isoquant/math/frontier/normal_tail.hpp"
#include "isoquant/sheet/arguments/numeric_range.hpp"
#include "isoquant/sheet/arguments/option_arguments.hpp"
#include "isoquant/math/fits/production_fit.hpp"
#include "isoquant/math/messages/text.hpp"
#include "isoquant/math/fits/translog_fit.hpp"

#include <cmath>

namespace isoquant {

namespace {

ProductionForm readFrontierForm(const Cell& cell)
{
    const ProductionForm form = readFormArgument(cell);
    if (form == ProductionForm::ces)
        throw argumentError(argument::form,
                            "a frontier takes \"cobb-douglas\" or \"translog\"; the ces form is not offered");
    return form;
}

double twoSidedNormalPValue(double z)
{
    if (std::isnan(z)) return z;
    return 2.0 * std::exp(logNormalCdf(-std::fabs(z)));
}

ParameterEstimate normalEstimate(double estimate, double standardError, double critical)
{
    const double z = estimate / standardError;
    return {estimate, standardError, z, twoSidedNormalPValue(z), estimate - critical * standardError,
            estimate + critical * standardError};
}

// ν as gᵀβ: the exponents' sum, or for translog Σᵢ(αᵢ + Σⱼ βᵢⱼ l̄ⱼ) at the mean logs l̄.
Eigen::VectorXd returnsGradient(ProductionForm form, Eigen::Index k, Eigen::Index parameters,
                                const Eigen::VectorXd& meanLogs)
{
    Eigen::VectorXd gradient = Eigen::VectorXd::Zero(parameters);
    gradient.segment(1, k).setOnes();
    if (form != ProductionForm::translog) return gradient;
    Eigen::Index column = 1 + k;
    for (const auto& [i, j] : translogPairs(k)) gradient(column++) = i == j ? meanLogs(i) : meanLogs(i) + meanLogs(j);
    return gradient;
}

void setInference(ProductionFrontier& frontier, const Eigen::MatrixXd& logInputs)
{
    const StochasticFrontierFit& fit = frontier.fit;
    const Eigen::Index p = fit.coefficients.size();
    const double critical = normalQuantile((1 + frontier.confidenceLevel) / 2);
    const Eigen::MatrixXd& v = fit.covariance;
    for (Eigen::Index j = 0; j < p; ++j)
        frontier.coefficients.push_back(normalEstimate(fit.coefficients(j), std::sqrt(v(j, j)), critical));
    const FrontierScaleEstimates scales = frontierScaleEstimates(fit, frontier.confidenceLevel);
    frontier.noiseSd = scales.noiseSd;
    frontier.inefficiencySd = scales.inefficiencySd;
    frontier.lambda = scales.lambda;
    const auto k = static_cast<Eigen::Index>(frontier.inputLabels.size());
    const Eigen::VectorXd gradient =
        returnsGradient(frontier.form, k, p, logInputs.colwise().mean().transpose());
    const double nu = gradient.dot(fit.coefficients);
    const double se = std::sqrt(gradient.dot(v.topLeftCorner(p, p) * gradient));
    frontier.returns = normalEstimate(nu, se, critical);
    frontier.returns.tStatistic = (nu - 1) / se;
    frontier.returns.pValue = twoSidedNormalPValue(frontier.returns.tStatistic);
    frontier.verdict = classifyReturnsToScale(nu, frontier.returns.pValue, frontier.confidenceLevel, false);
}

// The parameters of the frontier: the least-squares ones, σᵥ and σᵤ.
Eigen::Index frontierParameters(ProductionForm form, Eigen::Index k, Eigen::Index m)
{
    return 1 + k + (form == ProductionForm::translog ? k * (k + 1) / 2 : 0) + m + 2;
}

} // namespace

InefficiencyDistribution readInefficiencyArgument(const Cell& cell)
{
    return readChoice<InefficiencyDistribution>(
        cell, argument::inefficiency, "a distribution",
        {{"half-normal", InefficiencyDistribution::halfNormal}, {"exponential", InefficiencyDistribution::exponential}},
        InefficiencyDistribution::halfNormal);
}

Eigen::MatrixXd frontierDesign(ProductionForm form, const Eigen::MatrixXd& inputs, const Eigen::MatrixXd& controls)
{
    const Eigen::MatrixXd logs = exactLog(inputs.array()).matrix();
    if (form == ProductionForm::translog) return translogDesign(logs, controls);
    Eigen::MatrixXd design(inputs.rows(), 1 + inputs.cols() + controls.cols());
    design.col(0).setOnes();
    design.middleCols(1, inputs.cols()) = logs;
    design.rightCols(controls.cols()) = controls;
    return design;
}

ProductionFrontier frontierFromArguments(const FrontierArguments& arguments)
{
    ProductionFrontier frontier;
    frontier.form = readFrontierForm(arguments.form);
    const InefficiencyDistribution distribution = readInefficiencyArgument(arguments.inefficiency);
    frontier.confidenceLevel = readLevelArgument(arguments.level, argument::level);

    FitArguments leastSquares;
    leastSquares.output = arguments.output;
    leastSquares.inputs = arguments.inputs;
    leastSquares.controls = arguments.controls;
    leastSquares.form = arguments.form;
    leastSquares.level = arguments.level;
    leastSquares = withoutTrailingEmptyRows(std::move(leastSquares));
    // Read here to count the rows before the least-squares fit, whose own minimum is lower.
    const NumericColumns output =
        readNumericColumns(leastSquares.output, argument::output, ValueRule::positive, "output");
    const NumericColumns inputs =
        readNumericColumns(leastSquares.inputs, argument::inputs, ValueRule::positive, "input");
    const Eigen::Index n = output.values.rows();
    const Eigen::Index parameters = frontierParameters(frontier.form, inputs.values.cols(),
                                                       leastSquares.controls.empty() ? 0 : leastSquares.controls.columns());
    if (n == inputs.values.rows() && n < parameters + 1)
        throw InputError("too few rows: output and inputs have " + std::to_string(n) + " rows of data for " +
                         std::to_string(parameters) + " parameters of the frontier (with noise SD and inefficiency "
                         "SD); need at least " + std::to_string(parameters + 1));
    const ProductionFit fit = fitFromArguments(leastSquares); // checks shapes, labels, collinearity

    frontier.inputLabels = fit.inputLabels;
    frontier.controlLabels = fit.controlLabels;
    Eigen::MatrixXd controls(n, 0);
    if (!leastSquares.controls.empty())
        controls = readNumericColumns(leastSquares.controls, argument::controls, ValueRule::finite, "control").values;
    const Eigen::MatrixXd design = frontierDesign(frontier.form, inputs.values, controls);
    const Eigen::VectorXd response = exactLog(output.values.col(0).array()).matrix();
    frontier.fit = fitStochasticFrontier(design, response, fit.inference.estimates, distribution);
    setInference(frontier, exactLog(inputs.values.array()).matrix());
    return frontier;
}

} // namespace isoquant
