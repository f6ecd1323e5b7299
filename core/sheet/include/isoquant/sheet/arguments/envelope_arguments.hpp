// The arguments of PRODENVELOPE: the plants' outputs and inputs, the optional words returns,
// orientation and what, and the optional names of the plants. Every message names the argument
// and, where there is one, the row, counted from the top of the range (header row included).
// Throws InputError.
#pragma once

#include "isoquant/sheet/arguments/cells.hpp"
#include "isoquant/sheet/arguments/numeric_range.hpp"
#include "isoquant/math/frontier/envelope.hpp"

#include <string>
#include <vector>

namespace isoquant {

struct EnvelopeData {
    NumericColumns outputs; // plants × outputs, each value ≥ 0, each plant with a positive one
    NumericColumns inputs;  // plants × inputs, likewise
};

// The two ranges, as many data rows each, at least 2 plants; no column of zeros in either.
EnvelopeData readEnvelopeData(const CellTable& outputs, const CellTable& inputs);

EnvelopeReturns readEnvelopeReturns(const Cell& cell);         // default "constant"
EnvelopeOrientation readEnvelopeOrientation(const Cell& cell); // default "input"

enum class EnvelopeMeasure { score, scaleEfficiency, peers, inputTarget, outputTarget };
struct EnvelopeRequest {
    EnvelopeMeasure measure = EnvelopeMeasure::score;
    Eigen::Index column = 0;  // the input (or output) of a target
    std::string title;        // the header cell of the result column
};

// "score" (default), "scale efficiency", "peers", "target <input label>" or "target <output
// label>", labels matched ignoring case, inputs first.
EnvelopeRequest readEnvelopeRequest(const Cell& cell, const EnvelopeData& data);

// The `names` of the plants: one column, a name (text or number) per data row of outputs, a header
// row allowed (there exactly when the column has one row more). Empty when `names` is empty.
std::vector<std::string> readPlantNames(const CellTable& names, const NumericColumns& outputs);

} // namespace isoquant
