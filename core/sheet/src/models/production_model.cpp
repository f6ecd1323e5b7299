#include "isoquant/sheet/models/production_model.hpp"

#include "isoquant/sheet/arguments/argument_names.hpp"
#include "isoquant/math/fits/ces_fit.hpp"
#include "isoquant/math/forms/cobb_douglas.hpp"
#include "isoquant/sheet/models/cost_model.hpp"
#include "models/form_models.hpp"
#include "isoquant/math/messages/input_error.hpp"
#include "isoquant/sheet/arguments/option_arguments.hpp"
#include "isoquant/math/fits/production_fit.hpp"
#include "isoquant/sheet/tables/table_labels.hpp"
#include "isoquant/math/messages/text.hpp"
#include "isoquant/math/numerics/not_a_number.hpp"
#include "isoquant/sheet/tables/covariance_block.hpp"

#include <cmath>
#include <limits>

namespace isoquant {

namespace {

std::string rowPlace(std::size_t row) { return "model: row " + std::to_string(row + 1); }

bool rowIsEmpty(const CellTable& range, std::size_t row)
{
    for (std::size_t column = 0; column < range.columns(); ++column)
        if (!range.isEmpty(row, column) && !(range.isText(row, column) && range.text(row, column).empty()))
            return false;
    return true;
}

// The first cell of a fitted table's header row ("Cobb-Douglas fit", …).
bool isTableTitle(const std::string& label)
{
    for (const char* title : tableTitles)
        if (equalsIgnoringCase(label, title)) return true;
    return false;
}

bool isStatisticLabel(const std::string& label)
{
    for (const char* statistic : statisticLabels)
        if (equalsIgnoringCase(label, statistic)) return true;
    for (const char* statistic : optionStatisticLabels)
        if (equalsIgnoringCase(label, statistic)) return true;
    return false;
}

double requiredNumber(const CellTable& range, std::size_t row, const std::string& label)
{
    if (!range.isNumber(row, 1) || !std::isfinite(range.number(row, 1)))
        throw InputError(rowPlace(row) + " (" + quoted(label) + ") has no number in its second column");
    return range.number(row, 1);
}

// A number in `column` of the row, or NaN where the cell holds none (an "n/a", say).
double optionalNumber(const CellTable& range, std::size_t row, std::size_t column)
{
    if (column >= range.columns() || !range.isNumber(row, column)) return notANumber;
    return range.number(row, column);
}

struct ModelRows {
    std::optional<ProductionForm> form;
    std::optional<double> logScale;
    std::optional<double> logScaleAtControlMeans;
    std::optional<double> logScaleForPredictions;
    std::optional<double> smearingFactor;
    std::optional<double> technicalChange;
    std::optional<double> latestPeriod;
    bool hasPeriodEffects = false;
    bool hasEffects = false; // an "effects" row other than "none"
    std::optional<ScaleTest> scaleTest;
    std::vector<ParameterRow> parameters;
    std::optional<std::vector<std::string>> inputsRow; // the labels of an "inputs" row
    std::optional<std::string> convergence;
    std::vector<std::string> controlLabels;   // without " (control)"
    std::optional<std::size_t> covarianceRow; // the row a covariance block starts at
};

bool isFormStatisticLabel(const std::string& label)
{
    for (const char* statistic : formStatisticLabels)
        if (equalsIgnoringCase(label, statistic)) return true;
    return label.size() > std::string(elasticityPrefix).size() &&
           equalsIgnoringCase(label.substr(0, std::string(elasticityPrefix).size()), elasticityPrefix);
}

std::vector<std::string> textsAfterLabel(const CellTable& range, std::size_t row)
{
    std::vector<std::string> texts;
    for (std::size_t column = 1; column < range.columns() && range.isText(row, column); ++column) {
        const std::string& text = range.text(row, column);
        if (text.empty()) break;
        texts.push_back(text);
    }
    return texts;
}

void readStatisticRow(const CellTable& range, std::size_t row, const std::string& label, ModelRows& rows)
{
    if (equalsIgnoringCase(label, controlMeansLabel)) {
        rows.logScaleAtControlMeans = requiredNumber(range, row, label);
    } else if (equalsIgnoringCase(label, predictionScaleLabel)) {
        rows.logScaleForPredictions = requiredNumber(range, row, label);
    } else if (equalsIgnoringCase(label, smearingLabel)) {
        const double factor = requiredNumber(range, row, label);
        if (!(factor > 0)) throw InputError(rowPlace(row) + " (smearing factor) must be positive");
        rows.smearingFactor = factor;
    } else if (equalsIgnoringCase(label, returnsLabel)) {
        ScaleTest test;
        test.estimate = requiredNumber(range, row, label);
        test.imposed = range.columns() > 2 && range.isText(row, 2) &&
                       equalsIgnoringCase(range.text(row, 2), imposedText);
        test.standardError = optionalNumber(range, row, 2);
        test.fStatistic = optionalNumber(range, row, 3);
        test.pValue = optionalNumber(range, row, 4);
        rows.scaleTest = test;
    } else if (equalsIgnoringCase(label, convergenceLabel) && range.isText(row, 1)) {
        rows.convergence = range.text(row, 1);
    } else if (equalsIgnoringCase(label, technicalChangeLabel)) {
        rows.technicalChange = requiredNumber(range, row, label);
    } else if (equalsIgnoringCase(label, latestPeriodLabel)) {
        rows.latestPeriod = requiredNumber(range, row, label);
    } else if (equalsIgnoringCase(label, effectsLabel) && range.isText(row, 1)) {
        rows.hasPeriodEffects = equalsIgnoringCase(range.text(row, 1), effectsWord(EffectsKind::twoWay));
        rows.hasEffects = !equalsIgnoringCase(range.text(row, 1), effectsWord(EffectsKind::none));
    }
}

void readFormRow(const CellTable& range, std::size_t row, ModelRows& rows)
{
    try {
        rows.form = readFormArgument(range.at(row, 1));
    } catch (const InputError&) {
        throw InputError(rowPlace(row) + " (form) must hold \"cobb-douglas\", \"ces\" or \"translog\"");
    }
}

// Where a row stands decides what it is: before the "ln A" (or "A") row only the header and the
// form may come; from there to the first empty row every row is an input's exponent, whatever its
// label (an input may well be called "A" or "R2"), but for a control's row and a form row holding
// text; after the empty row come the statistic rows of a PRODFIT table.
ModelRows readRows(const CellTable& range)
{
    enum class Section { beforeScale, parameters, statistics };
    ModelRows rows;
    Section section = Section::beforeScale;
    for (std::size_t row = 0; row < range.rows(); ++row) {
        if (rowIsEmpty(range, row)) {
            if (section == Section::parameters) section = Section::statistics;
            continue;
        }
        if (!range.isText(row, 0) || range.text(row, 0).empty())
            throw InputError(rowPlace(row) + " has no label in its first column");
        const std::string& label = range.text(row, 0);
        const bool isFormRow = equalsIgnoringCase(label, formLabel) && range.isText(row, 1);
        if (section == Section::beforeScale && isTableTitle(label)) continue;
        if (section != Section::beforeScale && equalsIgnoringCase(label, covarianceBlockLabel) &&
            range.isText(row, 1)) {
            rows.covarianceRow = row; // the block ends the table (covariance_block.hpp)
            break;
        }
        if (isFormRow) {
            readFormRow(range, row, rows);
            continue;
        }
        if (equalsIgnoringCase(label, inputsLabel) && range.isText(row, 1)) {
            rows.inputsRow = textsAfterLabel(range, row);
            continue;
        }
        switch (section) {
        case Section::beforeScale:
            if (equalsIgnoringCase(label, logScaleLabel)) {
                rows.logScale = requiredNumber(range, row, label);
            } else if (equalsIgnoringCase(label, scaleLabel)) {
                const double scale = requiredNumber(range, row, label);
                if (scale <= 0) throw InputError(rowPlace(row) + " (A) must be positive");
                rows.logScale = std::log(scale);
            } else {
                throw InputError(rowPlace(row) + ": " + quoted(label) +
                                 " comes before the \"ln A\" (or \"A\") row; give ln A first, then one exponent "
                                 "row per input");
            }
            section = Section::parameters;
            break;
        case Section::parameters:
            if (!endsWithIgnoringCase(label, controlSuffix))
                rows.parameters.push_back(ParameterRow{label, row, optionalNumber(range, row, 1)});
            else
                rows.controlLabels.push_back(label.substr(0, label.size() - std::string(controlSuffix).size()));
            break;
        case Section::statistics:
            if (!isStatisticLabel(label) && !isFormStatisticLabel(label))
                throw InputError(rowPlace(row) + ": " + quoted(label) + " is not a row of a model table");
            readStatisticRow(range, row, label, rows);
            break;
        }
    }
    return rows;
}

// The Cobb-Douglas exponents, one per parameter row; its sum must match a returns-to-scale row.
FormModel readCobbDouglasModel(double logScale, const ModelRows& rows)
{
    FormModel model;
    std::vector<double> exponents;
    for (const auto& parameter : rows.parameters) {
        if (!std::isfinite(parameter.value))
            throw InputError(rowPlace(parameter.row) + " (" + quoted(parameter.label) +
                             ") has no number in its second column");
        model.inputLabels.push_back(parameter.label);
        exponents.push_back(parameter.value);
    }
    if (model.inputLabels.empty())
        throw argumentError(argument::model, "has no exponent rows, one per input after \"ln A\"");
    model.technology = std::make_shared<CobbDouglas>(
        logScale, Eigen::Map<const Eigen::VectorXd>(exponents.data(), static_cast<Eigen::Index>(exponents.size())));
    return model;
}

// Each input or parameter has one row: a second row of the same label (two "L" rows, two "delta"
// rows) would silently win or be dropped.
void refuseRepeatedLabels(const std::vector<ParameterRow>& parameters)
{
    for (std::size_t later = 1; later < parameters.size(); ++later)
        for (std::size_t earlier = 0; earlier < later; ++earlier)
            if (equalsIgnoringCase(parameters[later].label, parameters[earlier].label))
                throw InputError(rowPlace(parameters[later].row) + ": " + quoted(parameters[later].label) +
                                 " repeats the label of row " + std::to_string(parameters[earlier].row + 1) +
                                 "; give each input or parameter one row, under a label of its own");
}

} // namespace

ProductionModel readProductionModel(const CellTable& range)
{
    if (isCostModel(range))
        throw argumentError(argument::model,
                            "is a cost model (a PRODCOSTFIT table or form \"... cost\"); this function needs a "
                            "production model, a PRODFIT table or a typed one (PRODCOST takes both)");
    if (range.columns() < 2)
        throw argumentError(argument::model,
                            "needs at least two columns, labels and values (a PRODFIT table or a typed model)");
    const ModelRows rows = readRows(range);
    refuseRepeatedLabels(rows.parameters);
    if (!rows.form) throw argumentError(argument::model, "has no \"form\" row (for example: form | cobb-douglas)");
    if (!rows.logScale) throw argumentError(argument::model, "has no \"ln A\" (or \"A\") row");
    if (rows.inputsRow && *rows.form != ProductionForm::ces)
        throw argumentError(argument::model, "an \"inputs\" row of labels belongs to a ces model only");
    if (rows.convergence && equalsIgnoringCase(*rows.convergence, convergenceWord(FitStatusKind::notIdentified)))
        throw InputError(
            "model: the fit is not identified; its estimates are one optimum of many, so they are not used");
    if (rows.convergence && !equalsIgnoringCase(*rows.convergence, convergedText))
        throw argumentError(argument::model,
                            "the fit did not converge; its estimates are not an optimum, so they are not used");

    // Fixed effects or a trend: the mean group effect at the latest period; controls: at their means.
    const double logScale =
        rows.logScaleForPredictions.value_or(rows.logScaleAtControlMeans.value_or(*rows.logScale));
    FormModel read;
    switch (*rows.form) {
    case ProductionForm::cobbDouglas: read = readCobbDouglasModel(logScale, rows); break;
    case ProductionForm::ces: read = readCesModel(logScale, rows.parameters, rows.inputsRow); break;
    case ProductionForm::translog: read = readTranslogModel(logScale, rows.parameters); break;
    }

    ProductionModel model;
    model.form = *rows.form;
    model.inputLabels = read.inputLabels;
    model.technology = read.technology;
    model.scaleTest = rows.scaleTest;
    model.smearingFactor = rows.smearingFactor;
    model.technicalChange = rows.technicalChange;
    model.latestPeriod = rows.latestPeriod;
    model.hasPeriodEffects = rows.hasPeriodEffects;
    model.logScaleShifted = rows.logScaleForPredictions || rows.logScaleAtControlMeans;
    // Controls, effects or a trend: the block's row after the parameters is the evaluators' ln A,
    // and with a trend the next one λ (covariance_block.hpp).
    model.covarianceCoversShiftedLogScale = model.logScaleShifted && model.form != ProductionForm::ces;
    model.covarianceCoversTechnicalChange = model.technicalChange.has_value() && model.form != ProductionForm::ces;
    if (rows.covarianceRow) {
        std::vector<std::string> labels = parameterLabels(model.form, model.inputLabels, rows.controlLabels);
        std::string sizeNote;
        if (model.covarianceCoversShiftedLogScale) {
            labels.push_back(shiftedLogScaleLabel(rows.logScaleForPredictions.has_value()));
            sizeNote = "; with controls, effects or a trend a row " + quoted(labels.back()) +
                       " follows the parameters, the ln A the evaluators use";
        }
        if (model.covarianceCoversTechnicalChange) {
            labels.push_back(technicalChangeLabel);
            sizeNote += "; with a trend the last row is " + quoted(labels.back());
        }
        model.parameterCovariance = readCovarianceBlock(range, *rows.covarianceRow, labels, sizeNote);
    }
    // The table's ν must be the model's own (for translog it is taken at the sample mean, unknown here).
    const auto scale = model.technology->constantScaleElasticity();
    if (model.scaleTest && scale && model.form != ProductionForm::translog &&
        std::fabs(model.scaleTest->estimate - *scale) > 1e-9 * std::max(1.0, std::fabs(*scale))) {
        const std::string what = model.form == ProductionForm::ces ? "nu" : "the sum of the exponents";
        throw argumentError(argument::model, "returns to scale (" + formatNumber(model.scaleTest->estimate) +
                                                 ") is not " + what + " (" + formatNumber(*scale) + ")");
    }
    return model;
}

Eigen::Index readLabelSelector(const Cell& selector, const std::vector<std::string>& labels, const std::string& argument)
{
    const auto k = static_cast<Eigen::Index>(labels.size());
    if (isNumber(selector)) {
        const double position = std::get<double>(selector);
        if (position >= 1 && position <= static_cast<double>(k) && position == std::floor(position))
            return static_cast<Eigen::Index>(position) - 1;
        throw InputError(argument + ": " + formatNumber(position) + " is not an input number; the model has " +
                         plural(labels.size(), "input"));
    }
    if (isText(selector)) {
        const std::string& wanted = std::get<std::string>(selector);
        for (Eigen::Index i = 0; i < k; ++i)
            if (equalsIgnoringCase(wanted, labels[static_cast<std::size_t>(i)])) return i;
        std::string known;
        for (const auto& label : labels) known += (known.empty() ? "" : ", ") + quoted(label);
        throw InputError(argument + ": " + quoted(wanted) + " is not an input of the model; its inputs are " + known);
    }
    throw InputError(argument + ": give the input's number (1 for the first) or its label");
}

Eigen::Index readInputSelector(const Cell& selector, const ProductionModel& model, const std::string& argument)
{
    return readLabelSelector(selector, model.inputLabels, argument);
}

std::string returnsVerdict(const ProductionModel& model, double level)
{
    if (!model.scaleTest) {
        const auto scale = model.technology->constantScaleElasticity();
        if (!scale)
            throw argumentError(argument::model,
                                "its returns to scale vary with the inputs, and it carries no test of them");
        return classifyReturnsToScale(*scale, notANumber, level, false);
    }
    return classifyReturnsToScale(model.scaleTest->estimate, model.scaleTest->pValue, level, model.scaleTest->imposed);
}

std::optional<std::string> untestedVerdict(const CellTable& range)
{
    const std::string untested = untestedVerdictPrefix;
    for (std::size_t row = 0; row < range.rows(); ++row) {
        if (!range.isText(row, 0) || !equalsIgnoringCase(range.text(row, 0), verdictLabel)) continue;
        if (range.columns() < 2 || !range.isText(row, 1)) return std::nullopt;
        const std::string& verdict = range.text(row, 1);
        if (verdict.size() > untested.size() && equalsIgnoringCase(verdict.substr(0, untested.size()), untested))
            return verdict;
        return std::nullopt;
    }
    return std::nullopt;
}

} // namespace isoquant
