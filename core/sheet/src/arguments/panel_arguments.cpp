#include "isoquant/sheet/arguments/panel_arguments.hpp"

#include "isoquant/sheet/arguments/argument_names.hpp"
#include "isoquant/sheet/arguments/option_arguments.hpp"

#include "isoquant/math/messages/input_error.hpp"
#include "isoquant/sheet/arguments/numeric_range.hpp"
#include "isoquant/math/messages/text.hpp"

#include <algorithm>
#include <cmath>
#include <map>
#include <utility>

namespace isoquant {

namespace {

std::string rowsOfData(std::size_t count) { return std::to_string(count) + (count == 1 ? " row" : " rows") + " of data"; }

// Header rows of the groups column (0 or 1), by its length against output's data rows.
std::size_t groupsHeaderRows(const CellTable& groups, std::size_t dataRows)
{
    if (groups.columns() != 1)
        throw argumentError(argument::groups, "must be one column; it has " + std::to_string(groups.columns()));
    if (groups.rows() == dataRows) return 0;
    if (groups.rows() == dataRows + 1) return 1;
    throw argumentError(argument::groups, "has " + std::to_string(groups.rows()) + " rows but output has " +
                                              rowsOfData(dataRows) +
                                              "; give one identifier per row (a header row may come first)");
}

} // namespace

EffectsKind readEffectsArgument(const Cell& cell)
{
    return readChoice<EffectsKind>(
        cell, argument::effects, "a kind of effects",
        {{"none", EffectsKind::none}, {"fixed", EffectsKind::fixed}, {"two-way", EffectsKind::twoWay}},
        EffectsKind::none);
}

std::vector<bool> findIncompleteRows(const RowRanges& ranges)
{
    const std::size_t dataRows = ranges.output.rows() - (hasHeaderRow(ranges.output) ? 1 : 0);
    std::vector<bool> incomplete(dataRows, false);
    auto mark = [&](const CellTable& range, const std::string& argument, std::size_t headerRows, bool textIsMissing) {
        if (range.rows() - headerRows != dataRows)
            throw InputError(argument + ": has " + rowsOfData(range.rows() - headerRows) + " but " + ranges.outputName +
                             " has " + rowsOfData(dataRows));
        for (std::size_t row = 0; row < dataRows; ++row)
            for (std::size_t column = 0; column < range.columns(); ++column) {
                const std::size_t cellRow = row + headerRows;
                const CellKind kind = range.kind(cellRow, column);
                if (kind == CellKind::empty ||
                    (kind == CellKind::text && (textIsMissing || range.text(cellRow, column).empty())))
                    incomplete[row] = true;
            }
    };
    auto headerRows = [](const CellTable& range) -> std::size_t { return hasHeaderRow(range) ? 1 : 0; };
    mark(ranges.output, ranges.outputName, headerRows(ranges.output), true);
    mark(ranges.inputs, ranges.inputsName, headerRows(ranges.inputs), true);
    if (!ranges.controls.empty()) mark(ranges.controls, argument::controls, headerRows(ranges.controls), true);
    if (!ranges.trend.empty()) mark(ranges.trend, argument::trend, headerRows(ranges.trend), true);
    if (!ranges.groups.empty()) mark(ranges.groups, argument::groups, groupsHeaderRows(ranges.groups, dataRows), false);
    if (std::all_of(incomplete.begin(), incomplete.end(), [](bool flag) { return flag; }))
        throw argumentError(argument::incompleteRows, "every row has a blank or text cell; no row is left to fit");
    return incomplete;
}

void readGroups(const CellTable& groups, std::size_t dataRows, const std::vector<bool>* skippedRows,
                PanelColumns& panel)
{
    const std::size_t headerRows = groupsHeaderRows(groups, dataRows);
    // A number and a text never name the same group, even when they print alike.
    std::map<std::pair<bool, std::string>, Eigen::Index> known;
    panel.groupOfRow.clear();
    panel.groupLabels.clear();
    for (std::size_t row = 0; row < dataRows; ++row) {
        if (skippedRows && (*skippedRows)[row]) continue;
        const Cell& cell = groups.at(row + headerRows, 0);
        const std::string place = "groups: row " + std::to_string(row + headerRows + 1);
        if (isOmitted(cell)) throw InputError(place + " is empty; every row needs the identifier of its plant or firm");
        if (isNumber(cell) && !std::isfinite(std::get<double>(cell))) throw InputError(place + " is not a finite number");
        const bool isNumberId = isNumber(cell);
        const std::string label = isNumberId ? formatNumber(std::get<double>(cell)) : std::get<std::string>(cell);
        const auto [entry, added] = known.emplace(std::make_pair(isNumberId, label), known.size());
        if (added) panel.groupLabels.push_back(label);
        panel.groupOfRow.push_back(entry->second);
    }
}

} // namespace isoquant
