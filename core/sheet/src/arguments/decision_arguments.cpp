#include "isoquant/sheet/arguments/decision_arguments.hpp"

#include "isoquant/math/messages/input_error.hpp"
#include "isoquant/sheet/arguments/numeric_range.hpp"
#include "isoquant/math/messages/text.hpp"

#include <cmath>

namespace isoquant {

namespace {

bool isOmitted(const Cell& cell) { return isEmpty(cell) || (isText(cell) && std::get<std::string>(cell).empty()); }

std::string describe(const Cell& cell)
{
    return isText(cell) ? quoted(std::get<std::string>(cell)) : formatNumber(std::get<double>(cell));
}

std::string inputCountText(Eigen::Index count)
{
    return std::to_string(count) + (count == 1 ? " input" : " inputs");
}

} // namespace

double readPositiveNumber(const Cell& cell, const std::string& argument)
{
    if (isOmitted(cell)) throw InputError(argument + ": is empty; give a positive number");
    if (isText(cell))
        throw InputError(argument + ": holds text " + quoted(std::get<std::string>(cell)) + "; give a positive number");
    const double value = std::get<double>(cell);
    if (!std::isfinite(value)) throw InputError(argument + ": is not a finite number");
    if (value <= 0) throw InputError(argument + ": is " + formatNumber(value) + "; it must be positive");
    return value;
}

Eigen::VectorXd readPrices(const CellTable& range, const std::string& argument, Eigen::Index inputCount)
{
    const NumericColumns prices = readNumericColumns(range, argument, ValueRule::finite, "price");
    const Eigen::MatrixXd& values = prices.values;
    const bool isRow = values.rows() == 1 && values.cols() == inputCount;
    const bool isColumn = values.cols() == 1 && values.rows() == inputCount;
    if (!isRow && !isColumn)
        throw InputError(argument + ": give one price per input, " + std::to_string(inputCount) +
                         " numbers in a row or a column (the model has " + inputCountText(inputCount) + ")");
    const Eigen::VectorXd result = isRow ? Eigen::VectorXd(values.row(0).transpose()) : Eigen::VectorXd(values.col(0));
    for (Eigen::Index i = 0; i < result.size(); ++i)
        if (!(result(i) > 0))
            throw InputError(argument + ": the price of input " + std::to_string(i + 1) + " is " +
                             formatNumber(result(i)) + "; prices must be positive");
    return result;
}

SubstitutionKind readSubstitutionKind(const Cell& cell)
{
    if (isOmitted(cell)) return SubstitutionKind::direct;
    if (isText(cell)) {
        const std::string& word = std::get<std::string>(cell);
        if (equalsIgnoringCase(word, "direct")) return SubstitutionKind::direct;
        if (equalsIgnoringCase(word, "allen")) return SubstitutionKind::allen;
        if (equalsIgnoringCase(word, "morishima")) return SubstitutionKind::morishima;
    }
    throw InputError("kind: " + describe(cell) + " is not a kind; use \"direct\", \"allen\" or \"morishima\"");
}

CostMeasure readCostMeasure(const Cell& cell)
{
    if (isOmitted(cell)) return CostMeasure::total;
    if (isText(cell)) {
        const std::string& word = std::get<std::string>(cell);
        if (equalsIgnoringCase(word, "total")) return CostMeasure::total;
        if (equalsIgnoringCase(word, "marginal")) return CostMeasure::marginal;
        if (equalsIgnoringCase(word, "average")) return CostMeasure::average;
        if (equalsIgnoringCase(word, "cost elasticity")) return CostMeasure::costElasticity;
        if (equalsIgnoringCase(word, "returns to scale")) return CostMeasure::returnsToScale;
    }
    throw InputError("what: " + describe(cell) +
                     " is not a cost measure; use \"total\", \"marginal\", \"average\", \"cost elasticity\" or "
                     "\"returns to scale\"");
}

} // namespace isoquant
