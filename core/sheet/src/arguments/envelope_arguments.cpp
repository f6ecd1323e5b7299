#include "isoquant/sheet/arguments/envelope_arguments.hpp"

#include "isoquant/sheet/arguments/argument_names.hpp"
#include "isoquant/math/messages/input_error.hpp"
#include "isoquant/math/messages/text.hpp"
#include "isoquant/sheet/arguments/option_arguments.hpp"

#include <cmath>

namespace isoquant {

namespace {

std::string rowsOf(Eigen::Index count) { return plural(static_cast<std::size_t>(count), "row"); }

std::string cellPlace(const std::string& argument, const NumericColumns& read, Eigen::Index row, Eigen::Index column)
{
    std::string text = argument + ": row " + std::to_string(static_cast<std::size_t>(row) + read.firstDataRow());
    if (read.values.cols() > 1) text += ", column " + std::to_string(column + 1);
    return text;
}

// Amounts may be 0 (a plant without one of the inputs) but never negative, and a plant needs a
// positive input and a positive output: the LPs compare amounts, they take no logs.
NumericColumns readAmounts(const CellTable& range, const std::string& argument, const std::string& noun)
{
    NumericColumns read = readNumericColumns(range, argument, ValueRule::finite, noun);
    for (Eigen::Index row = 0; row < read.values.rows(); ++row)
        for (Eigen::Index column = 0; column < read.values.cols(); ++column)
            if (read.values(row, column) < 0)
                throw InputError(cellPlace(argument, read, row, column) + " is " + formatNumber(read.values(row, column)) +
                                 "; amounts must be zero or positive");
    for (Eigen::Index column = 0; column < read.values.cols(); ++column)
        if ((read.values.col(column).array() == 0).all())
            throw InputError(argument + ": the column " + quoted(read.labels[static_cast<std::size_t>(column)]) +
                             " is 0 in every row; leave it out");
    for (Eigen::Index column = 0; column < read.values.cols(); ++column) {
        const auto values = read.values.col(column).array();
        const double largest = values.maxCoeff(), smallest = (values > 0).select(values, largest).minCoeff();
        if (largest / smallest > maximumAmountRatio)
            throw InputError(argument + ": the column " + quoted(read.labels[static_cast<std::size_t>(column)]) +
                             " holds " + formatNumber(smallest) + " and " + formatNumber(largest) +
                             ", more than 1e12 times as much; check the units (or enter 0 for none)");
    }
    for (Eigen::Index row = 0; row < read.values.rows(); ++row)
        if ((read.values.row(row).array() == 0).all())
            throw InputError(argument + ": row " + std::to_string(static_cast<std::size_t>(row) + read.firstDataRow()) +
                             " is 0 in every column; every plant needs a positive " + noun);
    return read;
}

std::string optionWord(const Cell& cell) { return isText(cell) ? std::get<std::string>(cell) : std::string(); }

} // namespace

EnvelopeData readEnvelopeData(const CellTable& outputs, const CellTable& inputs)
{
    EnvelopeData data;
    data.outputs = readAmounts(outputs, argument::outputs, "output");
    data.inputs = readAmounts(inputs, argument::inputs, "input");
    const Eigen::Index plants = data.outputs.values.rows();
    if (data.inputs.values.rows() != plants)
        throw argumentError(argument::inputs, "has " + rowsOf(data.inputs.values.rows()) + " of data but outputs has " +
                                                  rowsOf(plants) + "; give one row per plant in both");
    if (plants < 2)
        throw argumentError(argument::outputs,
                            "has 1 row of data, so the frontier is that plant alone; an envelope compares at "
                            "least 2 plants");
    return data;
}

EnvelopeReturns readEnvelopeReturns(const Cell& cell)
{
    return readChoice<EnvelopeReturns>(cell, argument::returns, "a kind of returns to scale",
                                       {{"constant", EnvelopeReturns::constant},
                                        {"variable", EnvelopeReturns::variable},
                                        {"non-increasing", EnvelopeReturns::nonIncreasing}},
                                       EnvelopeReturns::constant);
}

EnvelopeOrientation readEnvelopeOrientation(const Cell& cell)
{
    return readChoice<EnvelopeOrientation>(
        cell, argument::orientation, "an orientation",
        {{"input", EnvelopeOrientation::input}, {"output", EnvelopeOrientation::output}}, EnvelopeOrientation::input);
}

EnvelopeRequest readEnvelopeRequest(const Cell& cell, const EnvelopeData& data)
{
    if (isOmitted(cell)) return {EnvelopeMeasure::score, 0, "efficiency"};
    const std::string word = optionWord(cell);
    if (equalsIgnoringCase(word, "score")) return {EnvelopeMeasure::score, 0, "efficiency"};
    if (equalsIgnoringCase(word, "scale efficiency")) return {EnvelopeMeasure::scaleEfficiency, 0, "scale efficiency"};
    if (equalsIgnoringCase(word, "peers")) return {EnvelopeMeasure::peers, 0, "peers"};
    const std::string prefix = "target ";
    if (word.size() > prefix.size() && equalsIgnoringCase(word.substr(0, prefix.size()), prefix)) {
        const std::string label = word.substr(prefix.size());
        const auto find = [&](const std::vector<std::string>& labels) -> Eigen::Index {
            for (std::size_t i = 0; i < labels.size(); ++i)
                if (equalsIgnoringCase(labels[i], label)) return static_cast<Eigen::Index>(i);
            return -1;
        };
        if (const Eigen::Index input = find(data.inputs.labels); input >= 0)
            return {EnvelopeMeasure::inputTarget, input, "target " + data.inputs.labels[static_cast<std::size_t>(input)]};
        if (const Eigen::Index output = find(data.outputs.labels); output >= 0)
            return {EnvelopeMeasure::outputTarget, output,
                    "target " + data.outputs.labels[static_cast<std::size_t>(output)]};
        std::string known;
        for (const auto& name : data.inputs.labels) known += (known.empty() ? "" : ", ") + quoted(name);
        throw argumentError(argument::what,
                            quoted(label) + " is not an input or output label; the inputs are " + known);
    }
    throw argumentError(
        argument::what,
        describe(cell) + " is not known; use \"score\", \"scale efficiency\", \"peers\" or \"target <input label>\"");
}

std::vector<std::string> readPlantNames(const CellTable& names, const NumericColumns& outputs)
{
    if (names.empty()) return {};
    const auto plants = static_cast<std::size_t>(outputs.values.rows());
    if (names.columns() != 1)
        throw argumentError(argument::names, "must be one column; it has " + std::to_string(names.columns()));
    if (names.rows() != plants && names.rows() != plants + 1)
        throw argumentError(argument::names, "has " + rowsOf(static_cast<Eigen::Index>(names.rows())) +
                                                 " but outputs has " + rowsOf(static_cast<Eigen::Index>(plants)) +
                                                 " of data; give one name per plant (a header "
                                                 "row may come first)");
    std::vector<std::string> read;
    for (std::size_t row = names.rows() - plants; row < names.rows(); ++row) {
        const Cell cell = names.at(row, 0);
        if (isOmitted(cell) || (isNumber(cell) && !std::isfinite(std::get<double>(cell))))
            throw argumentError(argument::names, "row " + std::to_string(row + 1) + " holds no name");
        read.push_back(isText(cell) ? std::get<std::string>(cell) : formatNumber(std::get<double>(cell)));
    }
    return read;
}

} // namespace isoquant
