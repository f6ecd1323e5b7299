#include "isoquant/sheet/tables/covariance_block.hpp"

#include "isoquant/sheet/arguments/argument_names.hpp"
#include "isoquant/math/messages/input_error.hpp"
#include "isoquant/sheet/arguments/option_arguments.hpp"
#include "isoquant/math/fits/production_fit.hpp"
#include "isoquant/math/fits/translog_fit.hpp"
#include "isoquant/sheet/tables/table_labels.hpp"
#include "isoquant/math/messages/text.hpp"

#include <algorithm>
#include <cmath>
#include <limits>

namespace isoquant {

namespace {

constexpr double notANumber = std::numeric_limits<double>::quiet_NaN();

std::string rowPlace(std::size_t row) { return "model: row " + std::to_string(row + 1); }

Cell numberOrNotAvailable(double value)
{
    if (std::isfinite(value)) return value;
    return std::string(notAvailableText);
}

bool cellIsBlank(const CellTable& range, std::size_t row, std::size_t column)
{
    return range.isEmpty(row, column) || (range.isText(row, column) && range.text(row, column).empty());
}

double blockNumber(const CellTable& range, std::size_t row, std::size_t column, const std::string& label)
{
    if (range.isText(row, column) && equalsIgnoringCase(range.text(row, column), notAvailableText)) return notANumber;
    if (!range.isNumber(row, column) || !std::isfinite(range.number(row, column)))
        throw InputError(rowPlace(row) + " (" + quoted(label) + " of the covariance block) needs a number in column " +
                         std::to_string(column + 1));
    return range.number(row, column);
}

void readBlockHeader(const CellTable& range, std::size_t row, CovarianceBlock& block)
{
    const std::string place = rowPlace(row) + " (covariance)";
    if (range.columns() < 4 || !range.isText(row, 1))
        throw InputError(place + " needs the kind of errors, the degrees of freedom and the level after its label");
    try {
        block.likelihood = equalsIgnoringCase(range.text(row, 1), likelihoodBlockWord);
        if (!block.likelihood) block.kind = readErrorsArgument(range.at(row, 1));
    } catch (const InputError&) {
        throw InputError(
            place + ": " + quoted(range.text(row, 1)) +
            " is not a kind of errors; use \"classical\", \"hc1\", \"hc3\", \"cluster\" or \"likelihood\"");
    }
    const bool normal = range.isText(row, 2) && equalsIgnoringCase(range.text(row, 2), normalDistributionWord);
    if (!normal && (!range.isNumber(row, 2) || !(range.number(row, 2) > 0)))
        throw InputError(place + " needs positive degrees of freedom in its third column (or \"normal\")");
    if (!range.isNumber(row, 3) || !(range.number(row, 3) > 0 && range.number(row, 3) < 1))
        throw InputError(place + " needs a confidence level between 0 and 1 in its fourth column");
    block.degreesOfFreedom = normal ? std::numeric_limits<double>::infinity() : range.number(row, 2);
    block.level = range.number(row, 3);
}

// Symmetric within 1e-8 of the largest diagonal entry, NaN mirrored by NaN.
void refuseAsymmetry(const Eigen::MatrixXd& matrix, std::size_t headerRow)
{
    const Eigen::Index p = matrix.rows();
    double largest = 0;
    for (Eigen::Index i = 0; i < p; ++i)
        if (std::isfinite(matrix(i, i))) largest = std::max(largest, std::fabs(matrix(i, i)));
    for (Eigen::Index i = 0; i < p; ++i)
        for (Eigen::Index j = 0; j < i; ++j) {
            const double upper = matrix(j, i), lower = matrix(i, j);
            const bool mirrored = std::isnan(upper) ? std::isnan(lower)
                                                    : !std::isnan(lower) && std::fabs(upper - lower) <= 1e-8 * largest;
            if (!mirrored)
                throw InputError(rowPlace(headerRow + 1 + static_cast<std::size_t>(i)) +
                                 ": the covariance block is not symmetric (column " + std::to_string(j + 2) +
                                 " differs from row " + std::to_string(headerRow + 2 + j) + ", column " +
                                 std::to_string(i + 2) + ")");
        }
}

// Positive semidefinite on the parameters that have a variance (ln A under effects has none: n/a
// in its row and column); between two that have one, n/a is refused.
void refuseNegativeVariance(const Eigen::MatrixXd& matrix, std::size_t headerRow)
{
    std::vector<Eigen::Index> kept;
    for (Eigen::Index i = 0; i < matrix.rows(); ++i)
        if (std::isfinite(matrix(i, i))) kept.push_back(i);
    if (kept.empty()) return;
    Eigen::MatrixXd finite(kept.size(), kept.size());
    for (std::size_t a = 0; a < kept.size(); ++a)
        for (std::size_t b = 0; b < kept.size(); ++b) {
            finite(a, b) = matrix(kept[a], kept[b]);
            if (!std::isfinite(finite(a, b)))
                throw InputError(rowPlace(headerRow + 1 + static_cast<std::size_t>(kept[a])) +
                                 ": the covariance block has n/a in column " + std::to_string(kept[b] + 2) +
                                 " between two parameters that have variances");
        }
    const Eigen::SelfAdjointEigenSolver<Eigen::MatrixXd> solver(finite, Eigen::EigenvaluesOnly);
    const double largest = std::max(0.0, solver.eigenvalues().maxCoeff());
    if (solver.eigenvalues().minCoeff() < -1e-10 * std::max(largest, std::numeric_limits<double>::min()))
        throw InputError(rowPlace(headerRow) + ": the covariance block is not positive semidefinite (an eigenvalue is " +
                         formatNumber(solver.eigenvalues().minCoeff()) + "), so it is no covariance matrix");
}

} // namespace

std::string covarianceKindWord(CovarianceKind kind)
{
    switch (kind) {
    case CovarianceKind::classical: return "classical";
    case CovarianceKind::hc1: return "hc1";
    case CovarianceKind::hc3: return "hc3";
    case CovarianceKind::cluster: return "cluster";
    }
    return "classical";
}

std::size_t widthWithCovariance(std::size_t columns, std::size_t parameters)
{
    return std::max(columns, parameters + 1);
}

CellTable withCovarianceBlock(const CellTable& table, const CovarianceBlock& block)
{
    const std::size_t p = block.labels.size();
    CellTable result(table.rows() + 1 + p, widthWithCovariance(table.columns(), p));
    for (std::size_t row = 0; row < table.rows(); ++row)
        for (std::size_t column = 0; column < table.columns(); ++column)
            if (!table.isEmpty(row, column)) result.set(row, column, table.at(row, column));
    // A header row of words over every column (PRODVALUE needs one): a wider column is named by
    // the parameter whose covariances it holds.
    for (std::size_t column = table.columns(); column < result.columns(); ++column)
        result.set(0, column, block.labels[column - 1]);
    std::size_t row = table.rows();
    result.set(row, 0, covarianceBlockLabel);
    result.set(row, 1, block.likelihood ? std::string(likelihoodBlockWord) : covarianceKindWord(block.kind));
    if (std::isinf(block.degreesOfFreedom))
        result.set(row, 2, std::string(normalDistributionWord));
    else
        result.set(row, 2, block.degreesOfFreedom);
    result.set(row, 3, block.level);
    for (std::size_t i = 0; i < p; ++i) {
        ++row;
        result.set(row, 0, block.labels[i]);
        for (std::size_t j = 0; j < p; ++j)
            result.set(row, 1 + j, numberOrNotAvailable(block.matrix(static_cast<Eigen::Index>(i), static_cast<Eigen::Index>(j))));
    }
    return result;
}

std::vector<std::string> cobbDouglasParameterLabels(const std::vector<std::string>& inputLabels,
                                                    const std::vector<std::string>& controlLabels)
{
    std::vector<std::string> labels{logScaleLabel};
    labels.insert(labels.end(), inputLabels.begin(), inputLabels.end());
    for (const auto& control : controlLabels) labels.push_back(control + controlSuffix);
    return labels;
}

std::vector<std::string> translogParameterLabels(const std::vector<std::string>& inputLabels,
                                                 const std::vector<std::string>& controlLabels)
{
    std::vector<std::string> labels{logScaleLabel};
    labels.insert(labels.end(), inputLabels.begin(), inputLabels.end());
    for (const auto& [i, j] : translogPairs(static_cast<Eigen::Index>(inputLabels.size())))
        labels.push_back(translogPairLabel(inputLabels, i, j));
    for (const auto& control : controlLabels) labels.push_back(control + controlSuffix);
    return labels;
}

std::vector<std::string> cesParameterLabels()
{
    return {logScaleLabel, weightLabel, curvatureLabel, returnsParameterLabel};
}

std::vector<std::string> parameterLabels(ProductionForm form, const std::vector<std::string>& inputLabels,
                                         const std::vector<std::string>& controlLabels)
{
    switch (form) {
    case ProductionForm::translog: return translogParameterLabels(inputLabels, controlLabels);
    case ProductionForm::ces: return cesParameterLabels();
    case ProductionForm::cobbDouglas: break;
    }
    return cobbDouglasParameterLabels(inputLabels, controlLabels);
}

std::string shiftedLogScaleLabel(bool forPredictions)
{
    return forPredictions ? predictionScaleLabel : controlMeansLabel;
}

namespace {

// One more parameter in the block: V grows by its covariances with those before it and its variance.
void appendParameter(CovarianceBlock& block, const std::string& label, const Eigen::VectorXd& withEarlier,
                     double variance)
{
    const Eigen::Index p = block.matrix.rows();
    block.labels.push_back(label);
    block.matrix.conservativeResize(p + 1, p + 1);
    block.matrix.col(p).head(p) = withEarlier;
    block.matrix.row(p).head(p) = withEarlier.transpose();
    block.matrix(p, p) = variance;
}

} // namespace

void appendShiftedParameter(CovarianceBlock& block, const ShiftedLogScale& shifted, const std::string& label)
{
    appendParameter(block, label, shifted.withParameters, shifted.variance);
}

CellTable fitTableWithCovariance(const CellTable& table, const ProductionFit& fit, const Cell& covariance)
{
    if (!readSwitchArgument(covariance, argument::covariance)) return table;
    CovarianceBlock block;
    block.labels = parameterLabels(fit.form, fit.inputLabels, fit.controlLabels);
    block.matrix = fit.inference.covariance;
    // The evaluators' ln A s, then the trend's λ (covariance_block.hpp).
    if (fit.shiftedScale)
        appendShiftedParameter(block, *fit.shiftedScale, shiftedLogScaleLabel(fit.shiftedScale->forPredictions));
    if (fit.trendCovariance) {
        Eigen::VectorXd withEarlier(block.matrix.rows());
        withEarlier << fit.trendCovariance->withParameters, fit.trendCovariance->withShiftedScale;
        appendParameter(block, technicalChangeLabel, withEarlier, fit.trendCovariance->variance);
    }
    // As the table's standard errors: an exact fit has none, only the rounding left in V (a ces
    // fit without standard errors already holds NaN there).
    if (fit.status.is(FitStatusKind::exactFit)) block.matrix.setConstant(std::numeric_limits<double>::quiet_NaN());
    block.kind = fit.summary.covarianceKind;
    block.degreesOfFreedom = fit.inference.degreesOfFreedom;
    block.level = fit.inference.confidenceLevel;
    return withCovarianceBlock(table, block);
}

CovarianceBlock readCovarianceBlock(const CellTable& range, std::size_t headerRow,
                                    const std::vector<std::string>& expectedLabels, const std::string& sizeNote)
{
    CovarianceBlock block;
    readBlockHeader(range, headerRow, block);
    const std::size_t p = expectedLabels.size();
    std::size_t lastRow = range.rows();
    while (lastRow > headerRow + 1 && [&] {
        for (std::size_t column = 0; column < range.columns(); ++column)
            if (!cellIsBlank(range, lastRow - 1, column)) return false;
        return true;
    }())
        --lastRow;
    const std::size_t rows = lastRow - headerRow - 1;
    const std::string sizeAdvice = "; it needs one row per parameter (" + std::to_string(p) + ") and " +
                                   std::to_string(p) + " numbers in each";
    if (rows != p || range.columns() < p + 1)
        throw InputError(rowPlace(headerRow) + ": the covariance block has " + std::to_string(rows) +
                         (rows == 1 ? " row" : " rows") + sizeAdvice + sizeNote);
    block.matrix.resize(static_cast<Eigen::Index>(p), static_cast<Eigen::Index>(p));
    for (std::size_t i = 0; i < p; ++i) {
        const std::size_t row = headerRow + 1 + i;
        if (!range.isText(row, 0) || !equalsIgnoringCase(range.text(row, 0), expectedLabels[i]))
            throw InputError(rowPlace(row) + ": the covariance block's row " + std::to_string(i + 1) + " must be " +
                             quoted(expectedLabels[i]) + ", the parameters in the table's order");
        for (std::size_t j = 0; j < p; ++j)
            block.matrix(static_cast<Eigen::Index>(i), static_cast<Eigen::Index>(j)) =
                blockNumber(range, row, 1 + j, expectedLabels[i]);
        for (std::size_t column = p + 1; column < range.columns(); ++column)
            if (!cellIsBlank(range, row, column))
                throw InputError(rowPlace(row) + ": the covariance block has a value in column " +
                                 std::to_string(column + 1) + sizeAdvice);
        block.labels.push_back(expectedLabels[i]);
    }
    refuseAsymmetry(block.matrix, headerRow);
    refuseNegativeVariance(block.matrix, headerRow);
    return block;
}

} // namespace isoquant
