// PRODENVELOPE: data envelopment on plain cells (the LPs in isoquant/math/frontier/envelope.hpp).
#pragma once

#include "isoquant/sheet/arguments/cells.hpp"

#include <cstddef>

namespace isoquant {

// Plants one call compares: each of the n rows solves an LP over all n rows, so the work grows
// with n² (1,000 rows of 2 outputs and 3 inputs: about 0.5 s in Calc, the peers about 1.6 s;
// tests/benchmarks/RESULTS.md). Beyond this a call would keep Calc busy for many seconds.
inline constexpr std::size_t maximumEnvelopePlants = 2000;

// PRODENVELOPE(outputs; inputs; [returns]; [orientation]; [what]; [names]): per row (plant) of
// outputs and inputs, a column of
//   "score" (default)     θ (input orientation) or 1/φ (output orientation), ≤ 1
//   "scale efficiency"    the constant-returns score / the variable-returns score (returns unused)
//   "peers"               the plants with λ > 0 and their λ, "row 3 (0.25), row 7 (0.75)", rows
//                         counted as in messages, or the plants' names when `names` is given
//   "target <label>"      Σⱼ λⱼ xᵢⱼ for an input label (or Σⱼ λⱼ yᵣⱼ for an output label): the
//                         amount on the frontier, slacks included
// With a header row in outputs and two or more plants, the column starts with a header cell
// ("efficiency", "scale efficiency", "peers" or "target <label>"). Throws InputError.
CellTable envelopeColumn(const CellTable& outputs, const CellTable& inputs, const Cell& returns,
                         const Cell& orientation, const Cell& what, const CellTable& names = {});

} // namespace isoquant
