// PRODSTAT's answers for group and period effects, which are not rows of the PRODFIT table.
#include "isoquant/sheet/tables/fit_table.hpp"

#include "isoquant/sheet/arguments/argument_names.hpp"
#include "isoquant/math/messages/input_error.hpp"
#include "isoquant/sheet/tables/table_labels.hpp"
#include "isoquant/math/messages/text.hpp"

#include <string_view>

namespace isoquant {

namespace {

bool startsWithIgnoringCase(std::string_view text, std::string_view start)
{
    return text.size() >= start.size() && equalsIgnoringCase(text.substr(0, start.size()), start);
}

// A one-row table in the PRODFIT columns: the effect under "value", "n/a" elsewhere, so that
// the column label is read exactly as for the table's rows.
CellTable effectRow(const std::string& label, double effect)
{
    CellTable row(1, tableColumns);
    row.set(0, 0, label);
    row.set(0, 1, effect);
    for (std::size_t column = 2; column < tableColumns; ++column) row.set(0, column, std::string(notAvailableText));
    return row;
}

} // namespace

Cell lookUpFit(const ProductionFit& fit, const Cell& rowLabel, const Cell& columnLabel)
{
    if (!isText(rowLabel)) return lookUpFitTable(fitTable(fit), rowLabel, columnLabel);
    const std::string& wanted = std::get<std::string>(rowLabel);
    const PanelSummary& panel = fit.panel;
    if (startsWithIgnoringCase(wanted, groupEffectPrefix)) {
        if (panel.groupEffects.size() == 0)
            throw argumentError(argument::rowLabel,
                                "group effects are estimated only with effects \"fixed\" or \"two-way\"");
        const std::string group = wanted.substr(std::string_view(groupEffectPrefix).size());
        for (std::size_t g = 0; g < panel.groupLabels.size(); ++g)
            if (equalsIgnoringCase(group, panel.groupLabels[g]))
                return lookUpFitTable(effectRow(wanted, panel.groupEffects(static_cast<Eigen::Index>(g))), rowLabel,
                                      columnLabel);
        throw argumentError(argument::rowLabel, quoted(group) + " is not one of the groups");
    }
    if (startsWithIgnoringCase(wanted, periodEffectPrefix)) {
        if (panel.periods.empty())
            throw argumentError(argument::rowLabel, "period effects are estimated only with effects \"two-way\"");
        const std::string period = wanted.substr(std::string_view(periodEffectPrefix).size());
        for (std::size_t t = 0; t < panel.periods.size(); ++t)
            if (equalsIgnoringCase(period, formatNumber(panel.periods[t])))
                return lookUpFitTable(effectRow(wanted, panel.periodEffects(static_cast<Eigen::Index>(t))), rowLabel,
                                      columnLabel);
        throw argumentError(argument::rowLabel, quoted(period) + " is not one of the periods");
    }
    return lookUpFitTable(fitTable(fit), rowLabel, columnLabel);
}

} // namespace isoquant
