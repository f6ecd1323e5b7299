// The published data sets in tests/data as PRODFIT arguments, each range under a header row of the
// file's column names (sources in tests/data/README.md).
#pragma once

#include "isoquant/sheet/functions/cost_functions.hpp"
#include "isoquant/sheet/functions/production_functions.hpp"
#include "isoquant/sheet/models/model_table.hpp"

namespace isoquant::testing {

// Cobb & Douglas (1928): output P; inputs L (labour), C (capital). Options left empty (defaults).
FitArguments cobbDouglas1928Arguments();

// Munnell (1990) state panel, 48 states × 17 years: output gsp; inputs pcap, pc, emp;
// control unemp (entered as it is). Options left empty (defaults).
FitArguments statePanelArguments();

// The state panel with the panel columns: groups = state (text, under the header "state"),
// trend = year (under "year"); effects and the other options left empty.
FitArguments statePanelWithPanelColumns();

// Feng & Horrace (2012) rice farms, 171 farms × 6 seasons: output goutput; inputs seed, urea,
// totlabor, size; groups = id (numbers, under the header "id"); options left empty.
FitArguments riceFarmsArguments();

// The rice-farm panel (Feng and Horrace 2012, as in plm 2.6 RiceFarms), 1026 rows: output goutput
// and the named input columns (e.g. size, totlabor). Options left empty (defaults).
FitArguments riceFarmArguments(const std::vector<std::string>& inputs);

// The rice-farm panel's cost data for PRODCOSTFIT, 1026 rows: cost = pseed·seed + purea·urea +
// wage·totlabor (under "cost"), output goutput, prices pseed, purea, wage (the last the numeraire);
// `withShares`: also each input's share of cost (under "seed share", "urea share", "labour share").
CostFitArguments riceFarmCostArguments(bool withShares = false);

// The same with the panel columns: groups = id, controls = size, trend = each farm's seasons 1 to 6
// in the file's order (every farm has 6 consecutive rows); a test clears what it does not use.
CostFitArguments riceFarmCostPanelArguments();

// The output (1 × 1) and the three prices (1 × 3) of the rice-farm data row `dataRow` (0 the first
// row under the header), as PRODCOST's target and prices.
struct CostPoint {
    CellTable output = CellTable(1, 1);
    CellTable prices = CellTable(1, 3);
};
CostPoint riceFarmCostPoint(std::size_t dataRow);

// PRODCOST's "bound_se_<what>" (std. error of what) or "bound_lower_total" (lower bound of total
// cost), the figures of cost_check.bound_figures, on `table` at the rice-farm data row `dataRow`.
double riceFarmCostBound(const ModelTable& table, const std::string& quantity, std::size_t dataRow);

} // namespace isoquant::testing
