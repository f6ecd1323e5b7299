// "Save a copy for colleagues": writes a copy of the document (.ods or .xlsx) in which every cell
// whose formula calls an Isoquant function, array or single, on every sheet, holds the value it
// shows now; formats and every other formula stay. A first sheet lists what was frozen and when.
// The open document is not modified. With a `URL` dispatch argument no dialog is shown.
#pragma once

#include "command_outcome.hxx"

#include <com/sun/star/beans/PropertyValue.hpp>
#include <com/sun/star/frame/XFrame.hpp>
#include <com/sun/star/uno/XComponentContext.hpp>

namespace isoquant::addin {

CommandOutcome saveCopyForColleagues(const css::uno::Reference<css::frame::XFrame>& frame,
                                     const css::uno::Reference<css::uno::XComponentContext>& context,
                                     const css::uno::Sequence<css::beans::PropertyValue>& arguments);

} // namespace isoquant::addin
