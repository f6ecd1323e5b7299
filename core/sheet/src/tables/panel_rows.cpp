#include "tables/panel_rows.hpp"

namespace isoquant {

std::size_t panelRowCount(const PanelSummary& panel, const PanelRowLabels& labels)
{
    const bool effects = panel.effects != EffectsKind::none;
    return (panel.groups > 0 ? 2 : 0) + (effects ? 1 : 0) + (panel.effects == EffectsKind::twoWay ? 1 : 0) +
           (panel.technicalChange ? 2 : 0) + (panel.shiftsLogScale ? 1 : 0) +
           (labels.withDroppedRows && panel.dropsIncompleteRows ? 1 : 0);
}

void writePanelRows(TableWriter& writer, const PanelSummary& panel, const PanelRowLabels& labels)
{
    if (panel.groups > 0) {
        writer.valueRow(groupsLabel, static_cast<double>(panel.groups));
        writer.textRow(effectsLabel, {effectsWord(panel.effects)});
    }
    if (panel.effects != EffectsKind::none) writer.valueRow(withinRSquaredLabel, panel.withinRSquared);
    if (panel.effects == EffectsKind::twoWay) writer.valueRow(periodsLabel, static_cast<double>(panel.periods.size()));
    if (panel.technicalChange) {
        const ParameterEstimate& change = *panel.technicalChange;
        writer.put(labels.trend,
                   {change.estimate, writer.undefinedIfExact(change.standardError),
                    writer.undefinedIfExact(change.tStatistic), writer.undefinedIfExact(change.pValue),
                    writer.undefinedIfExact(change.lowerBound), writer.undefinedIfExact(change.upperBound)});
    }
    if (panel.shiftsLogScale) writer.valueRow(labels.prediction, panel.logScaleForPredictions);
    if (panel.technicalChange) writer.valueRow(latestPeriodLabel, panel.latestPeriod);
    if (labels.withDroppedRows && panel.dropsIncompleteRows)
        writer.valueRow(droppedRowsLabel, static_cast<double>(panel.incompleteRowsDropped));
}

} // namespace isoquant
