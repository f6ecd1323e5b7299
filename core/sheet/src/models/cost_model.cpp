#include "isoquant/sheet/models/cost_model.hpp"

#include "isoquant/sheet/arguments/argument_names.hpp"
#include "isoquant/math/fits/cost_fit.hpp"
#include "isoquant/sheet/tables/cost_table.hpp"
#include "isoquant/math/messages/input_error.hpp"
#include "isoquant/sheet/tables/table_labels.hpp"
#include "isoquant/math/messages/text.hpp"

#include <algorithm>
#include <cmath>
#include <optional>

namespace isoquant {

double CostModel::logCost(double level, const Eigen::VectorXd& pricesGiven) const
{
    const double logOutput = std::log(level);
    const Eigen::VectorXd logPrices = pricesGiven.array().log().matrix();
    return constant + output * logOutput + 0.5 * outputSquared * logOutput * logOutput + prices.dot(logPrices) +
           0.5 * logPrices.dot(priceInteractions * logPrices) + logOutput * priceOutput.dot(logPrices);
}

double CostModel::logCostAt(double level, const Eigen::VectorXd& pricesGiven,
                            const Eigen::VectorXd& controlValues) const
{
    return logCost(level, pricesGiven) - constant + constantAtZeroControls + controls.dot(controlValues);
}

double CostModel::costElasticity(double level, const Eigen::VectorXd& pricesGiven) const
{
    return output + outputSquared * std::log(level) + priceOutput.dot(pricesGiven.array().log().matrix());
}

namespace {

std::string labelAt(const CellTable& model, std::size_t row)
{
    if (!model.isText(row, 0)) return "";
    std::string label = model.text(row, 0);
    const auto first = label.find_first_not_of(" \t");
    const auto last = label.find_last_not_of(" \t");
    return first == std::string::npos ? "" : label.substr(first, last - first + 1);
}

bool isCostTitle(const std::string& label)
{
    return equalsIgnoringCase(label, cobbDouglasCostTitle) || equalsIgnoringCase(label, translogCostTitle) ||
           equalsIgnoringCase(label, halfNormalCostFrontierTitle) || equalsIgnoringCase(label, exponentialCostFrontierTitle);
}

// The form word of the model's `form` row, if it has one.
std::optional<std::string> formWordOf(const CellTable& model)
{
    if (model.columns() < 2) return std::nullopt;
    for (std::size_t row = 0; row < model.rows(); ++row)
        if (equalsIgnoringCase(labelAt(model, row), formLabel) && model.isText(row, 1)) return model.text(row, 1);
    return std::nullopt;
}

std::string rowPlace(std::size_t row, const std::string& label)
{
    return "model: row " + std::to_string(row + 1) + " (" + quoted(label) + ")";
}

double numberAt(const CellTable& model, std::size_t row, const std::string& label)
{
    if (model.columns() < 2 || !model.isNumber(row, 1) || !std::isfinite(model.number(row, 1)))
        throw InputError(rowPlace(row, label) + " has no number in its second column");
    return model.number(row, 1);
}

Eigen::Index priceIndex(const std::vector<std::string>& labels, const std::string& label, std::size_t row,
                        const std::string& whole)
{
    for (std::size_t i = 0; i < labels.size(); ++i)
        if (equalsIgnoringCase(labels[i], label)) return static_cast<Eigen::Index>(i);
    throw InputError(rowPlace(row, whole) + " names " + quoted(label) +
                     ", which is not a price row above it; list the price rows first");
}

struct SecondOrderRow {
    std::size_t row;
    std::string label;
    double value;
};

void applySecondOrder(CostModel& cost, const std::vector<SecondOrderRow>& rows)
{
    const auto k = static_cast<Eigen::Index>(cost.priceLabels.size());
    cost.priceInteractions = Eigen::MatrixXd::Zero(k, k);
    cost.priceOutput = Eigen::VectorXd::Zero(k);
    for (const auto& [row, label, value] : rows) {
        const auto star = label.find('*');
        const std::string first = label.substr(0, star), second = label.substr(star + 1);
        if (equalsIgnoringCase(first, costOutputLabel) && equalsIgnoringCase(second, costOutputLabel)) {
            cost.outputSquared = value;
        } else if (equalsIgnoringCase(second, costOutputLabel)) {
            cost.priceOutput(priceIndex(cost.priceLabels, first, row, label)) = value;
        } else {
            const Eigen::Index i = priceIndex(cost.priceLabels, first, row, label);
            const Eigen::Index j = priceIndex(cost.priceLabels, second, row, label);
            cost.priceInteractions(i, j) = cost.priceInteractions(j, i) = value;
        }
    }
}

// A row of the cost table below its parameters (cost_table.hpp): typed straight under them, without
// the empty row a table has there, it is still not a price.
bool isTableStatistic(const std::string& label)
{
    for (const char* statistic : {costControlMeansLabel, costPredictionLabel, costTrendLabel, costElasticityLabel,
                                  efficientScaleLabel, costRegularityLabel})
        if (equalsIgnoringCase(label, statistic)) return true;
    return false;
}

// The constant the evaluators use (cost_model.hpp), from the rows below the parameters, and which
// row gave it.
struct PredictionConstant {
    double value = 0;
    std::optional<std::string> shiftedLabel; // "constant for predictions" or "constant at control means"
};

PredictionConstant predictionConstant(const CellTable& model, double constant)
{
    std::optional<double> atControlMeans, forPredictions;
    PredictionConstant read;
    for (std::size_t row = 0; row < model.rows(); ++row) {
        const std::string label = labelAt(model, row);
        if (equalsIgnoringCase(label, covarianceBlockLabel)) break; // the block's last row bears the same label
        if (equalsIgnoringCase(label, costPredictionLabel)) forPredictions = numberAt(model, row, label);
        if (equalsIgnoringCase(label, costControlMeansLabel)) atControlMeans = numberAt(model, row, label);
    }
    read.value = forPredictions.value_or(atControlMeans.value_or(constant));
    if (forPredictions || atControlMeans) read.shiftedLabel = forPredictions ? costPredictionLabel : costControlMeansLabel;
    return read;
}

// The covariance block, whose last row is the evaluators' constant when controls, effects or a
// trend shift it (cost_table.hpp).
void readCostCovariance(const CellTable& model, const PredictionConstant& constant, CostModel& cost)
{
    std::vector<std::string> labels = cost.parameterLabels;
    std::string sizeNote;
    cost.covarianceCoversShiftedConstant = constant.shiftedLabel.has_value();
    if (cost.covarianceCoversShiftedConstant) {
        labels.push_back(*constant.shiftedLabel);
        sizeNote = "; with controls, effects or a trend its last row is " + quoted(labels.back()) +
                   ", the constant the evaluators use";
    }
    for (std::size_t row = 0; row < model.rows(); ++row)
        if (equalsIgnoringCase(labelAt(model, row), covarianceBlockLabel))
            cost.covariance = readCovarianceBlock(model, row, labels, sizeNote);
}

} // namespace

bool isCostModel(const CellTable& model)
{
    if (model.rows() == 0 || model.columns() == 0) return false;
    if (isCostTitle(labelAt(model, 0))) return true;
    const auto word = formWordOf(model);
    return word && (equalsIgnoringCase(*word, cobbDouglasCostWord) || equalsIgnoringCase(*word, translogCostWord));
}

CostModel readCostModel(const CellTable& model)
{
    CostModel cost;
    const auto word = formWordOf(model);
    if (!word)
        throw argumentError(argument::model, "has no \"form\" row saying \"cobb-douglas cost\" or \"translog cost\"");
    cost.translog = equalsIgnoringCase(*word, translogCostWord);
    std::optional<double> constant, output;
    std::vector<double> prices, controls;
    std::vector<SecondOrderRow> secondOrder;
    // The parameter rows: from the top (after a table's title) to the first row without a label.
    for (std::size_t row = isCostTitle(labelAt(model, 0)) ? 1 : 0; row < model.rows(); ++row) {
        const std::string label = labelAt(model, row);
        if (label.empty() || equalsIgnoringCase(label, covarianceBlockLabel)) break;
        if (equalsIgnoringCase(label, formLabel) || isTableStatistic(label)) continue;
        cost.parameterLabels.push_back(label);
        const double value = numberAt(model, row, label);
        if (equalsIgnoringCase(label, costConstantLabel)) constant = value;
        else if (endsWithIgnoringCase(label, controlSuffix)) {
            cost.controlLabels.push_back(label.substr(0, label.size() - std::string(controlSuffix).size()));
            controls.push_back(value);
        } else if (equalsIgnoringCase(label, costOutputLabel))
            output = value;
        else if (label.find('*') != std::string::npos) secondOrder.push_back({row, label, value});
        else {
            for (const auto& earlier : cost.priceLabels)
                if (equalsIgnoringCase(earlier, label))
                    throw InputError(rowPlace(row, label) + " repeats a price row's label; give each input one row");
            cost.priceLabels.push_back(label);
            prices.push_back(value);
        }
    }
    if (!constant || !output)
        throw InputError(std::string("model: has no \"") + (constant ? costOutputLabel : costConstantLabel) +
                         "\" row; a cost model needs \"constant\", \"output\" and one row per input price");
    if (prices.empty())
        throw argumentError(argument::model, "has no price rows; give one row per input, labelled by the input");
    if (!cost.translog && !secondOrder.empty())
        throw InputError(rowPlace(secondOrder.front().row, secondOrder.front().label) +
                         " is a translog term, but the form is \"cobb-douglas cost\"; say \"translog cost\"");
    cost.constantAtZeroControls = *constant;
    const PredictionConstant evaluated = predictionConstant(model, *constant);
    cost.constant = evaluated.value;
    cost.output = *output;
    cost.controls = Eigen::Map<const Eigen::VectorXd>(controls.data(), static_cast<Eigen::Index>(controls.size()));
    cost.prices = Eigen::Map<const Eigen::VectorXd>(prices.data(), static_cast<Eigen::Index>(prices.size()));
    applySecondOrder(cost, secondOrder);
    readCostCovariance(model, evaluated, cost);
    return cost;
}

} // namespace isoquant
