#include "isoquant/sheet/arguments/model_inputs.hpp"

#include "isoquant/sheet/arguments/argument_names.hpp"
#include "isoquant/math/messages/input_error.hpp"
#include "isoquant/math/messages/text.hpp"

namespace isoquant {

namespace {

// Whether the model's input labels are the defaults of a fit without a header row.
bool namesNoInputs(const ProductionModel& model)
{
    for (std::size_t i = 0; i < model.inputLabels.size(); ++i)
        if (model.inputLabels[i] != "input " + std::to_string(i + 1)) return false;
    return true;
}

std::string knownLabels(const ProductionModel& model)
{
    std::string known;
    for (const auto& label : model.inputLabels) known += (known.empty() ? "" : ", ") + quoted(label);
    return known;
}

// The columns of `read` rearranged into the model's input order by their header labels.
void takeInModelOrder(NumericColumns& read, const ProductionModel& model)
{
    const auto k = static_cast<Eigen::Index>(model.inputLabels.size());
    for (const auto& label : read.labels) {
        bool known = false;
        for (const auto& input : model.inputLabels) known |= equalsIgnoringCase(label, input);
        if (!known)
            throw argumentError(argument::inputs, "the column headed " + quoted(label) +
                                                      " is not an input of the model; its inputs are " +
                                                      knownLabels(model));
    }
    Eigen::MatrixXd ordered(read.values.rows(), k);
    for (Eigen::Index i = 0; i < k; ++i) {
        const std::string& input = model.inputLabels[static_cast<std::size_t>(i)];
        Eigen::Index found = -1;
        for (std::size_t column = 0; column < read.labels.size(); ++column)
            if (equalsIgnoringCase(read.labels[column], input)) found = static_cast<Eigen::Index>(column);
        if (found < 0)
            throw argumentError(argument::inputs, "no column is headed " + quoted(input) +
                                                      ", an input of the model; its inputs are " + knownLabels(model));
        ordered.col(i) = read.values.col(found);
    }
    read.values = std::move(ordered);
    read.labels = model.inputLabels;
}

} // namespace

NumericColumns readModelInputs(const CellTable& inputs, const ProductionModel& model)
{
    NumericColumns read = readNumericColumns(inputs, argument::inputs, ValueRule::positive, "input");
    if (read.hasHeader && !namesNoInputs(model)) {
        takeInModelOrder(read, model);
        return read;
    }
    const auto k = static_cast<Eigen::Index>(model.inputLabels.size());
    if (read.values.cols() != k)
        throw argumentError(argument::inputs, "has " + plural(static_cast<std::size_t>(read.values.cols()), "column") +
                                                  " but the model has " + plural(static_cast<std::size_t>(k), "input"));
    return read;
}

CellTable underHeader(CellTable column, const NumericColumns& rows, const std::string& title)
{
    if (!rows.hasHeader || column.rows() < 2) return column;
    CellTable headed(column.rows() + 1, column.columns());
    headed.set(0, 0, title);
    for (std::size_t row = 0; row < column.rows(); ++row)
        for (std::size_t c = 0; c < column.columns(); ++c) headed.set(row + 1, c, column.at(row, c));
    return headed;
}

} // namespace isoquant
