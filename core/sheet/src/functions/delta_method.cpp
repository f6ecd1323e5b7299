#include "functions/delta_method.hpp"

#include "isoquant/sheet/arguments/argument_names.hpp"
#include "isoquant/math/messages/input_error.hpp"
#include "isoquant/math/messages/text.hpp"
#include "isoquant/math/numerics/distributions.hpp"
#include "isoquant/math/numerics/parameter_inference.hpp"
#include "isoquant/sheet/arguments/model_inputs.hpp"
#include "isoquant/sheet/models/model_table.hpp"

#include <array>
#include <cmath>

namespace isoquant::delta_method {

namespace {

constexpr std::array<const char*, 6> statisticWords{"value",       "std. error",       "lower bound",
                                                    "upper bound", "prediction lower", "prediction upper"};

std::string tooLarge(std::size_t row)
{
    return "inputs: row " + std::to_string(row) + " gives a result too large to represent";
}

} // namespace

Statistic readWhat(const Cell& what, bool allowsPrediction, const std::string& argumentName)
{
    if (isEmpty(what)) return Statistic::value;
    const std::size_t known = allowsPrediction ? statisticWords.size() : 4;
    if (isText(what))
        for (std::size_t word = 0; word < known; ++word)
            if (equalsIgnoringCase(std::get<std::string>(what), statisticWords[word])) return Statistic(word);
    std::string list;
    for (std::size_t word = 0; word < known; ++word)
        list += std::string(word == 0 ? "" : word + 1 == known ? " or " : ", ") + "\"" + statisticWords[word] + "\"";
    throw argumentError(argumentName, "give " + list);
}

std::string word(Statistic statistic) { return statisticWords[static_cast<std::size_t>(statistic)]; }

BoundsModel readBoundsModel(const ModelTable& range, Statistic statistic,
                            const std::string& argumentName, FormsAnswered forms)
{
    BoundsModel read{range.production()};
    const std::string asked = argumentName + ": \"" + word(statistic) + "\" ";
    if (!read.model.parameterCovariance)
        throw InputError(asked + "needs the model's covariance block; this model has none (a typed model, or a "
                                 "PRODFIT table made without covariance TRUE)");
    read.technology = read.model.technology.get();
    read.form = dynamic_cast<const CobbDouglas*>(read.technology);
    if (!read.form && forms == FormsAnswered::cobbDouglas)
        throw InputError(asked + "is available for the cobb-douglas form only in this function (for the " +
                         formWord(read.model.form) +
                         " form in PRODOUTPUT, PRODMARGINAL, PRODELASTICITY, PRODSCALE, PRODSECOND, PRODMRTS, "
                                                 "PRODSUBSTITUTION, PRODTFP, PRODLEASTCOST, PRODBUDGET and PRODCOST)");
    read.block = &*read.model.parameterCovariance;
    const Eigen::Index rows = read.block->matrix.rows();
    if (read.model.covarianceCoversTechnicalChange) read.technicalChangeIndex = rows - 1;
    if (read.model.covarianceCoversShiftedLogScale)
        read.logScaleIndex = rows - 1 - (read.model.covarianceCoversTechnicalChange ? 1 : 0);
    read.critical = studentCriticalValue(read.block->level, read.block->degreesOfFreedom);
    return read;
}

double answer(const Linearised& quantity, const BoundsModel& read, Statistic statistic, double residualVariance)
{
    if (read.logScaleIndex == 0) return answer(quantity, *read.block, read.critical, statistic, residualVariance);
    Linearised shifted = quantity;
    shifted.gradient(read.logScaleIndex) = quantity.gradient(0);
    shifted.gradient(0) = 0;
    return answer(shifted, *read.block, read.critical, statistic, residualVariance);
}

double answer(const Linearised& quantity, const CovarianceBlock& block, double critical, Statistic statistic,
              double residualVariance)
{
    // gᵀVg over the parameters the quantity depends on ("n/a", ln A under effects, where g is 0).
    const double variance = varianceOfCombination(quantity.gradient, block.matrix);
    if (!std::isfinite(variance))
        throw argumentError(argument::what, "the covariance block has no variance for a parameter this quantity uses");
    const double spread = std::sqrt(variance);
    const double t = critical;
    if (!quantity.logScale) {
        switch (statistic) {
        case Statistic::standardError: return spread;
        case Statistic::lowerBound: return quantity.value - t * spread;
        case Statistic::upperBound: return quantity.value + t * spread;
        default: return quantity.value;
        }
    }
    const double predictionSpread = std::sqrt(variance + residualVariance);
    switch (statistic) {
    case Statistic::standardError: return quantity.value * spread;
    case Statistic::lowerBound: return quantity.value * std::exp(-t * spread);
    case Statistic::upperBound: return quantity.value * std::exp(t * spread);
    case Statistic::predictionLower: return quantity.value * std::exp(-t * predictionSpread);
    case Statistic::predictionUpper: return quantity.value * std::exp(t * predictionSpread);
    default: return quantity.value;
    }
}

Eigen::VectorXd zeroGradient(const BoundsModel& read) { return Eigen::VectorXd::Zero(read.block->matrix.rows()); }

Eigen::VectorXd logOutputGradient(const BoundsModel& read, const Eigen::VectorXd& bundle)
{
    Eigen::VectorXd gradient = zeroGradient(read);
    gradient(0) = 1;
    gradient.segment(1, bundle.size()) = bundle.array().log().matrix();
    return gradient;
}

CellTable columnOfBounds(const CellTable& inputs, const BoundsModel& read, Statistic statistic,
                         double residualVariance, const std::string& title,
                         const std::function<Linearised(const Eigen::VectorXd&)>& linearise)
{
    const NumericColumns bundles = readModelInputs(inputs, read.model);
    CellTable column(static_cast<std::size_t>(bundles.values.rows()), 1);
    for (Eigen::Index row = 0; row < bundles.values.rows(); ++row) {
        const double result = answer(linearise(bundles.values.row(row).transpose()), read, statistic, residualVariance);
        if (!std::isfinite(result)) throw InputError(tooLarge(static_cast<std::size_t>(row) + bundles.firstDataRow()));
        column.set(static_cast<std::size_t>(row), 0, result);
    }
    return underHeader(std::move(column), bundles, word(statistic) + " of " + title);
}

CellTable boundsOfValueColumn(const CellTable& values, const CellTable& inputs, const BoundsModel& read,
                              Statistic statistic,
                              const std::function<Linearised(const Eigen::VectorXd&, double)>& linearise)
{
    return boundsOfValueColumn(values, inputs, read, statistic,
                               [&](Eigen::Index, const Eigen::VectorXd& bundle, double value) {
                                   return linearise(bundle, value);
                               });
}

CellTable boundsOfValueColumn(const CellTable& values, const CellTable& inputs, const BoundsModel& read,
                              Statistic statistic,
                              const std::function<Linearised(Eigen::Index, const Eigen::VectorXd&, double)>& linearise)
{
    const NumericColumns bundles = readModelInputs(inputs, read.model);
    const auto rows = static_cast<std::size_t>(bundles.values.rows());
    const std::size_t headerRows = values.rows() - rows; // 0, or 1 for the header cell
    CellTable column = values;
    if (headerRows == 1 && values.isText(0, 0)) column.set(0, 0, word(statistic) + " of " + values.text(0, 0));
    for (std::size_t row = 0; row < rows; ++row) {
        if (!values.isNumber(headerRows + row, 0)) continue;
        const auto index = static_cast<Eigen::Index>(row);
        const Eigen::VectorXd bundle = bundles.values.row(index).transpose();
        const double result = answer(linearise(index, bundle, values.number(headerRows + row, 0)), read, statistic, 0);
        if (!std::isfinite(result)) throw InputError(tooLarge(row + bundles.firstDataRow()));
        column.set(headerRows + row, 0, result);
    }
    return column;
}

} // namespace isoquant::delta_method
