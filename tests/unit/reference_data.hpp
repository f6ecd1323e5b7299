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

} // namespace isoquant::testing
