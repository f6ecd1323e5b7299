// The rows of the estimation options at the foot of PRODFIT's and PRODCOSTFIT's tables (internal
// to the sheet library): groups and effects, within R2, periods, the trend's coefficient, the
// constant the evaluators use, the latest period, and the rows dropped as incomplete.
#pragma once

#include "tables/table_writer.hpp"

namespace isoquant {

// What the two tables call the trend's coefficient and the shifted constant, and whether the
// dropped rows' count is written here (PRODCOSTFIT writes it after BIC).
struct PanelRowLabels {
    const char* trend;
    const char* prediction;
    bool withDroppedRows;
};

inline constexpr PanelRowLabels productionPanelLabels{technicalChangeLabel, predictionScaleLabel, true};

// In table order: groups and effects (with groups), within R2 (effects), periods (two-way), the
// trend's row, the prediction constant (effects or a trend), latest period (a trend), incomplete
// rows dropped (the switch on, when `withDroppedRows`).
std::size_t panelRowCount(const PanelSummary& panel, const PanelRowLabels& labels);
void writePanelRows(TableWriter& writer, const PanelSummary& panel, const PanelRowLabels& labels);

} // namespace isoquant
