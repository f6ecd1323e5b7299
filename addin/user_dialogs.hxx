// The few questions and notes the menu commands put to the user. Headless, the office cancels
// every dialog at once: a question then counts as "no".
#pragma once

#include <rtl/ustring.hxx>

#include <com/sun/star/frame/XFrame.hpp>
#include <com/sun/star/uno/XComponentContext.hpp>

namespace isoquant::addin {

using rtl::OUString;

bool askYesNo(const css::uno::Reference<css::frame::XFrame>& frame,
              const css::uno::Reference<css::uno::XComponentContext>& context, const OUString& question);
void tellUser(const css::uno::Reference<css::frame::XFrame>& frame,
              const css::uno::Reference<css::uno::XComponentContext>& context, const OUString& note, bool problem);
// A file to save to (.ods or .xlsx), or empty when the user cancels.
OUString chooseSaveFile(const css::uno::Reference<css::uno::XComponentContext>& context);

} // namespace isoquant::addin
