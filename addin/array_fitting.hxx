// "Fit the array to its result": the formula under the cursor (an array formula, or a single-cell
// formula whose result is an array) is entered again as an array formula over exactly the rows and
// columns of its result, anchored at the same top-left cell, as one undo step. Cells with content
// in the way are never overwritten without the user's yes (headless: refused).
#pragma once

#include "command_outcome.hxx"

#include <com/sun/star/frame/XFrame.hpp>
#include <com/sun/star/uno/XComponentContext.hpp>

namespace isoquant::addin {

CommandOutcome fitArrayToResult(const css::uno::Reference<css::frame::XFrame>& frame,
                                const css::uno::Reference<css::uno::XComponentContext>& context);

} // namespace isoquant::addin
