#include "isoquant/sheet/models/frontier_model.hpp"

#include "isoquant/sheet/arguments/argument_names.hpp"
#include "isoquant/math/fits/ces_fit.hpp" // convergedText, the word every fit's convergence row uses
#include "isoquant/math/messages/input_error.hpp"
#include "isoquant/math/frontier/normal_tail.hpp"
#include "isoquant/sheet/arguments/option_arguments.hpp"
#include "isoquant/sheet/tables/frontier_table.hpp"
#include "isoquant/sheet/tables/table_labels.hpp"
#include "isoquant/math/messages/text.hpp"

#include <cmath>
#include <optional>

namespace isoquant {

namespace {

std::string rowPlace(std::size_t row) { return "model: row " + std::to_string(row + 1); }

bool labelIs(const CellTable& table, std::size_t row, const char* label)
{
    return table.isText(row, 0) && equalsIgnoringCase(table.text(row, 0), label);
}

double numberAt(const CellTable& table, std::size_t row, std::size_t column)
{
    if (!table.isNumber(row, column) || !std::isfinite(table.number(row, column)))
        throw InputError(rowPlace(row) + " (" + quoted(table.isText(row, 0) ? table.text(row, 0) : "") +
                         ") has no number in column " + std::to_string(column + 1));
    return table.number(row, column);
}

InefficiencyDistribution readTitle(const CellTable& table)
{
    if (table.rows() > 0 && table.isText(0, 0)) {
        if (equalsIgnoringCase(table.text(0, 0), halfNormalFrontierTitle)) return InefficiencyDistribution::halfNormal;
        if (equalsIgnoringCase(table.text(0, 0), exponentialFrontierTitle)) return InefficiencyDistribution::exponential;
    }
    throw argumentError(argument::model,
                        "is not a PRODFRONTIER table; its first cell reads \"half-normal frontier\" or "
                        "\"exponential frontier\" (select the whole table)");
}

void readParameterRows(const CellTable& table, std::size_t& row, FrontierModel& model)
{
    std::vector<double> values;
    for (row = 1; row < table.rows() && table.isText(row, 0) && !table.text(row, 0).empty(); ++row) {
        const std::string& label = table.text(row, 0);
        values.push_back(numberAt(table, row, 1));
        if (row == 1) {
            if (!equalsIgnoringCase(label, logScaleLabel))
                throw InputError(rowPlace(row) + " should be the \"ln A\" row of a PRODFRONTIER table");
        } else if (endsWithIgnoringCase(label, controlSuffix)) {
            model.controlLabels.push_back(label.substr(0, label.size() - std::string(controlSuffix).size()));
        } else if (label.find('*') == std::string::npos) {
            model.inputLabels.push_back(label);
        }
    }
    model.coefficients = Eigen::Map<const Eigen::VectorXd>(values.data(), static_cast<Eigen::Index>(values.size()));
    if (model.inputLabels.empty()) throw argumentError(argument::model, "has no input rows after \"ln A\"");
    if (table.columns() > 6 && table.isNumber(1, 2) && table.isNumber(1, 6) && table.number(1, 2) > 0) {
        const double critical = (table.number(1, 6) - table.number(1, 1)) / table.number(1, 2);
        if (std::isfinite(critical) && critical > 0) model.confidenceLevel = 2 * std::exp(logNormalCdf(critical)) - 1;
    }
}

} // namespace

FrontierModel readFrontierModel(const CellTable& table)
{
    if (table.columns() < 2) throw argumentError(argument::model, "needs the whole PRODFRONTIER table (7 columns)");
    FrontierModel model;
    model.distribution = readTitle(table);
    std::size_t row = 1;
    readParameterRows(table, row, model);
    std::optional<double> noise, inefficiency;
    bool formRead = false;
    for (; row < table.rows(); ++row) {
        if (labelIs(table, row, noiseSdLabel)) noise = numberAt(table, row, 1);
        if (labelIs(table, row, inefficiencySdLabel)) inefficiency = numberAt(table, row, 1);
        if (labelIs(table, row, convergenceLabel) &&
            !(table.isText(row, 1) && equalsIgnoringCase(table.text(row, 1), convergedText)))
            throw argumentError(argument::model,
                                "the frontier did not converge; its estimates are not a maximum, so they are not used");
        if (labelIs(table, row, formLabel)) {
            try {
                model.form = readFormArgument(table.at(row, 1));
            } catch (const InputError&) {
                throw InputError(rowPlace(row) + " (form) must hold \"cobb-douglas\" or \"translog\"");
            }
            formRead = true;
        }
    }
    if (!noise || !inefficiency || !formRead)
        throw argumentError(argument::model,
                            "lacks the \"noise SD\", \"inefficiency SD\" or \"form\" row of a PRODFRONTIER table");
    if (!(*noise > 0) || !(*inefficiency >= 0))
        throw argumentError(argument::model, "noise SD must be positive and inefficiency SD not negative");
    model.noiseSd = *noise;
    model.inefficiencySd = *inefficiency;
    const auto k = static_cast<Eigen::Index>(model.inputLabels.size());
    const Eigen::Index expected = 1 + k + (model.form == ProductionForm::translog ? k * (k + 1) / 2 : 0) +
                                  static_cast<Eigen::Index>(model.controlLabels.size());
    if (model.coefficients.size() != expected)
        throw argumentError(argument::model, "its parameter rows do not fit the " + formWord(model.form) + " form of " +
                                                 std::to_string(k) + (k == 1 ? " input" : " inputs"));
    return model;
}

} // namespace isoquant
