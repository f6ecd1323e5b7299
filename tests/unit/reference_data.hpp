// The published data sets in tests/data as PRODFIT arguments, each range under a header row of the
// file's column names (sources in tests/data/README.md).
#pragma once

#include "isoquant/cell_functions.hpp"

namespace isoquant::testing {

// Cobb & Douglas (1928): output P; inputs L (labour), C (capital). Options left empty (defaults).
FitArguments cobbDouglas1928Arguments();

// Munnell (1990) state panel, 48 states × 17 years: output gsp; inputs pcap, pc, emp;
// control unemp (entered as it is). Options left empty (defaults).
FitArguments statePanelArguments();

// The rice-farm panel (Feng and Horrace 2012, as in plm 2.6 RiceFarms), 1026 rows: output goutput
// and the named input columns (e.g. size, totlabor). Options left empty (defaults).
FitArguments riceFarmArguments(const std::vector<std::string>& inputs);

} // namespace isoquant::testing
