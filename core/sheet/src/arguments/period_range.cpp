#include "isoquant/sheet/arguments/period_range.hpp"

#include "isoquant/sheet/arguments/argument_names.hpp"
#include "isoquant/math/messages/input_error.hpp"
#include "isoquant/math/messages/text.hpp"

#include <algorithm>
#include <cmath>
#include <vector>

namespace isoquant {

namespace {

std::string cellPlace(const std::string& argument, std::size_t period, std::size_t row, std::size_t column,
                      std::size_t columns)
{
    std::string text = argument + ": period " + std::to_string(period) + " (row " + std::to_string(row + 1) + ")";
    if (columns > 1) text += ", column " + std::to_string(column + 1);
    return text;
}

// The label's words, lower-cased: runs of letters and digits (and of any non-ASCII byte, so that
// "Arbeit" and "Lohnanteil" stay whole words in any language).
std::vector<std::string> wordsOf(const std::string& label)
{
    std::vector<std::string> words(1);
    for (const char character : lowerCase(label)) {
        const auto byte = static_cast<unsigned char>(character);
        if (byte >= 0x80 || (byte >= 'a' && byte <= 'z') || (byte >= '0' && byte <= '9')) {
            words.back() += character;
        } else if (!words.back().empty()) {
            words.emplace_back();
        }
    }
    if (words.back().empty()) words.pop_back();
    return words;
}

// "labour share", "share of labour", "labour cost share" name the input "labour": the word
// "share" and the input's label as whole words, in its order.
bool namesShareOf(const std::string& shareLabel, const std::string& inputLabel)
{
    const std::vector<std::string> share = wordsOf(shareLabel), input = wordsOf(inputLabel);
    if (input.empty() || std::find(share.begin(), share.end(), "share") == share.end()) return false;
    return std::search(share.begin(), share.end(), input.begin(), input.end()) != share.end();
}

} // namespace

NumericColumns readPeriodColumns(const CellTable& range, const std::string& argument, PeriodValueRule rule,
                                 const std::string& defaultLabelPrefix)
{
    if (range.empty()) throw InputError(argument + ": the range is empty");

    NumericColumns result;
    result.hasHeader = hasHeaderRow(range);
    const std::size_t firstRow = result.hasHeader ? 1 : 0;
    const std::size_t columns = range.columns();
    for (std::size_t column = 0; column < columns; ++column)
        result.labels.push_back(result.hasHeader ? range.text(0, column)
                                                 : defaultLabelPrefix + " " + std::to_string(column + 1));
    if (range.rows() == firstRow) throw InputError(argument + ": holds a header row but no periods");

    result.values.resize(static_cast<Eigen::Index>(range.rows() - firstRow), static_cast<Eigen::Index>(columns));
    for (std::size_t row = firstRow; row < range.rows(); ++row) {
        const std::size_t period = row - firstRow + 1;
        for (std::size_t column = 0; column < columns; ++column) {
            const Cell& cell = range.at(row, column);
            const auto place = [&] { return cellPlace(argument, period, row, column, columns); };
            if (isEmpty(cell) || (isText(cell) && std::get<std::string>(cell).empty()))
                throw InputError(place() + " is empty; every period needs a number");
            if (isText(cell))
                throw InputError(place() + " holds text " + quoted(std::get<std::string>(cell)) +
                                 "; every period needs a number");
            const double value = std::get<double>(cell);
            if (!std::isfinite(value)) throw InputError(place() + " is not a finite number");
            if (rule == PeriodValueRule::positive && value <= 0)
                throw InputError(place() + " is " + formatNumber(value) + "; quantities must be positive (growth is a "
                                 "difference of logs)");
            if (rule == PeriodValueRule::nonNegative && value < 0)
                throw InputError(place() + " is " + formatNumber(value) + "; cost shares cannot be negative");
            result.values(static_cast<Eigen::Index>(period - 1), static_cast<Eigen::Index>(column)) = value;
        }
    }
    return result;
}

std::string periodPlace(const NumericColumns& columns, Eigen::Index index)
{
    const std::string name = columns.rowNames.empty() ? std::to_string(index + 1)
                                                      : columns.rowNames[static_cast<std::size_t>(index)];
    return "period " + name + " (row " +
           std::to_string(static_cast<std::size_t>(index) + columns.firstDataRow()) + ")";
}

std::string periodNameText(const Cell& name)
{
    return isNumber(name) ? formatNumber(std::get<double>(name)) : std::get<std::string>(name);
}

std::vector<Cell> readPeriodNames(const CellTable& periods, const NumericColumns& rows,
                                  const std::string& rowsArgument)
{
    const auto dataRows = static_cast<std::size_t>(rows.values.rows());
    if (periods.columns() != 1)
        throw argumentError(argument::periods, "must be one column; it has " + std::to_string(periods.columns()));
    if (periods.rows() != dataRows && periods.rows() != dataRows + 1)
        throw argumentError(argument::periods, "has " + plural(static_cast<std::size_t>(periods.rows()), "row") +
                                                   " but " + rowsArgument + " has " +
                                                   plural(static_cast<std::size_t>(dataRows), "period") +
                                                   "; give one year or name per period (a header row may come first)");
    const std::size_t first = periods.rows() - dataRows;
    std::vector<Cell> names;
    for (std::size_t row = first; row < periods.rows(); ++row) {
        const Cell& cell = periods.at(row, 0);
        const bool blank = isEmpty(cell) || (isText(cell) && std::get<std::string>(cell).empty());
        if (blank || (isNumber(cell) && !std::isfinite(std::get<double>(cell))))
            throw argumentError(argument::periods, "row " + std::to_string(row + 1) + " holds no year or name");
        names.push_back(cell);
    }
    return names;
}

Eigen::MatrixXd sharesRescaledToOne(const NumericColumns& shares, const std::string& argument)
{
    // 0.99 and 1.01 typed in cells, or shares that add up to them, may sum to a hair beyond in
    // binary: the slack, a millionth of the tolerance, lets them in and nothing visibly beyond.
    constexpr double slack = 1e-6 * shareSumTolerance;
    Eigen::MatrixXd rescaled = shares.values;
    for (Eigen::Index period = 0; period < shares.values.rows(); ++period) {
        const double sum = shares.values.row(period).sum();
        // Shares typed in percent sum to 100 (within 100 times the tolerance): say how to fix them.
        if (std::fabs(sum - 100) <= 100 * shareSumTolerance + slack)
            throw InputError(argument + ": " + periodPlace(shares, period) +
                             ": the shares sum to 100: give them as fractions (divide by 100)");
        if (!(std::fabs(sum - 1) <= shareSumTolerance + slack))
            throw InputError(argument + ": " + periodPlace(shares, period) + ": the shares sum to " +
                             formatNumber(sum) + "; the cost shares of a period must sum to 1 within " + localDecimal("0.01") +
                             " (" + localDecimal("0.99") + " to " + localDecimal("1.01") + ", both included)");
        rescaled.row(period) /= sum;
    }
    return rescaled;
}

void requireSamePeriods(const NumericColumns& reference, const std::string& referenceArgument,
                        const NumericColumns& other, const std::string& otherArgument)
{
    if (other.values.rows() == reference.values.rows()) return;
    std::string hint;
    if (reference.hasHeader != other.hasHeader)
        hint = " (a header row of text was found in " + (reference.hasHeader ? referenceArgument : otherArgument) +
               " only)";
    throw InputError(otherArgument + ": has " + plural(static_cast<std::size_t>(other.values.rows()), "period") + " but " + referenceArgument +
                     " has " + plural(static_cast<std::size_t>(reference.values.rows()), "period") + hint);
}

void requireShareLabels(const std::string& argument, const std::vector<std::string>& shareLabels,
                        const std::string& referenceNoun, const std::vector<std::string>& referenceLabels)
{
    for (std::size_t i = 0; i < shareLabels.size() && i < referenceLabels.size(); ++i) {
        const std::string& label = shareLabels[i];
        if (equalsIgnoringCase(label, referenceLabels[i])) continue;
        std::vector<std::size_t> named;
        for (std::size_t j = 0; j < referenceLabels.size(); ++j)
            if (namesShareOf(label, referenceLabels[j])) named.push_back(j);
        if (named.size() > 1)
            throw InputError(argument + ": column " + std::to_string(i + 1) + " is " + quoted(label) +
                             ", which names both " + quoted(referenceLabels[named[0]]) + " and " +
                             quoted(referenceLabels[named[1]]) + "; head it with one label only");
        if (named.size() == 1 && named[0] == i) continue;
        throw InputError(argument + ": column " + std::to_string(i + 1) + " is " + quoted(label) + " but " +
                         referenceNoun + " " + std::to_string(i + 1) + " is " + quoted(referenceLabels[i]) +
                         "; give them the same labels, in the same order");
    }
}

} // namespace isoquant
