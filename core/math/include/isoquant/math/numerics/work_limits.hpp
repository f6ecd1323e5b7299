// Limits on the work of one cell-function call.
//
// Calc runs add-in calls on its main thread, inside the user's office: a call that allocates
// gigabytes can take the office down with every unsaved document, and one that runs for minutes
// freezes it. Beyond these limits a call returns a message naming the argument instead. Within
// them a 1,048,575-row Cobb-Douglas fit takes about a second (tests/benchmarks/RESULTS.md).
#pragma once

#include "isoquant/math/messages/input_error.hpp"
#include "isoquant/math/messages/text.hpp" // groupedCount, used with the limits

#include <cstddef>
#include <string>

namespace isoquant {

// Values of a regression design held in memory at once (rows × columns): 2²⁵ ≈ 33.6 million, or
// 268 MB in doubles. A full-column translog of 6 inputs (28 columns) fits; of 7 (36) does not.
constexpr std::size_t maximumDesignValues = std::size_t{1} << 25;

// Rows × residual evaluations that the nonlinear (ces) runs on all rows share: 2²⁴ ≈ 16.8 million.
// Each residual evaluation brings about one Jacobian evaluation of about three times its cost, so
// this is about 1 s of runs; with the logs, the start search and the inference a ces fit on
// 1,000,000 rows that does not converge says so in under 3 s (tests/benchmarks/RESULTS.md; it was
// 2²⁷ and 19 s). Beyond it a run stops with the status "not converged", which the table reports as
// for any run that reaches its evaluation limit; at 10,000 rows each of 3 runs gets 559 evaluations,
// far above the tens the ces fits of the test corpus take.
constexpr std::size_t maximumRowEvaluations = std::size_t{1} << 24;

// The evaluation limit of each of `runs` runs over `rows` rows: the `requested` limit, lowered so
// that all runs together stay within maximumRowEvaluations, but at least 1.
std::size_t evaluationsPerRun(std::size_t rows, std::size_t runs, std::size_t requested);

// Throws InputError about `part` when `rows` × `columns` design values exceed the limit; `what`
// says what the columns are ("the translog form of 7 inputs"), `advice` what to do. (The limits
// on one range argument are the sheet layer's: sheet/arguments/range_limits.hpp.)
void checkDesignSize(std::size_t rows, std::size_t columns, DataPart part, const std::string& what,
                     const std::string& advice = "use fewer inputs or a sample of the rows");

} // namespace isoquant
