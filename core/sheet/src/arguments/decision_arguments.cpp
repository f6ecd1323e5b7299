#include "isoquant/sheet/arguments/decision_arguments.hpp"

#include "isoquant/sheet/arguments/argument_names.hpp"
#include "isoquant/math/messages/input_error.hpp"
#include "isoquant/sheet/arguments/option_arguments.hpp"
#include "isoquant/sheet/arguments/numeric_range.hpp"
#include "isoquant/math/messages/text.hpp"

#include <cmath>

namespace isoquant {

namespace {

std::string inputCountText(Eigen::Index count) { return plural(static_cast<std::size_t>(count), "input"); }

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
    return readChoice<SubstitutionKind>(cell, argument::kind, "a kind",
                                        {{"direct", SubstitutionKind::direct},
                                         {"allen", SubstitutionKind::allen},
                                         {"morishima", SubstitutionKind::morishima}},
                                        SubstitutionKind::direct);
}

CostMeasure readCostMeasure(const Cell& cell)
{
    return readChoice<CostMeasure>(cell, argument::what, "a cost measure",
                                   {{"total", CostMeasure::total},
                                    {"marginal", CostMeasure::marginal},
                                    {"average", CostMeasure::average},
                                    {"cost elasticity", CostMeasure::costElasticity},
                                    {"returns to scale", CostMeasure::returnsToScale}},
                                   CostMeasure::total);
}

} // namespace isoquant
