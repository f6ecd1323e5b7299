#include "user_dialogs.hxx"

#include <com/sun/star/awt/MessageBoxButtons.hpp>
#include <com/sun/star/awt/MessageBoxResults.hpp>
#include <com/sun/star/awt/MessageBoxType.hpp>
#include <com/sun/star/awt/Toolkit.hpp>
#include <com/sun/star/awt/XMessageBox.hpp>
#include <com/sun/star/awt/XMessageBoxFactory.hpp>
#include <com/sun/star/ui/dialogs/ExecutableDialogResults.hpp>
#include <com/sun/star/ui/dialogs/FilePicker.hpp>
#include <com/sun/star/ui/dialogs/TemplateDescription.hpp>
#include <com/sun/star/ui/dialogs/XFilterManager.hpp>

namespace isoquant::addin {

namespace {

using css::uno::Reference;

constexpr const char* dialogTitle = "Isoquant";

sal_Int16 showBox(const Reference<css::frame::XFrame>& frame, const Reference<css::uno::XComponentContext>& context,
                  css::awt::MessageBoxType type, sal_Int32 buttons, const OUString& text)
{
    const Reference<css::awt::XMessageBoxFactory> factory(css::awt::Toolkit::create(context), css::uno::UNO_QUERY);
    const Reference<css::awt::XWindowPeer> parent(frame.is() ? frame->getContainerWindow() : nullptr,
                                                  css::uno::UNO_QUERY);
    if (!factory.is() || !parent.is()) return css::awt::MessageBoxResults::CANCEL;
    const Reference<css::awt::XMessageBox> box =
        factory->createMessageBox(parent, type, buttons, OUString::createFromAscii(dialogTitle), text);
    return box.is() ? box->execute() : css::awt::MessageBoxResults::CANCEL;
}

} // namespace

bool askYesNo(const Reference<css::frame::XFrame>& frame, const Reference<css::uno::XComponentContext>& context,
              const OUString& question)
{
    return showBox(frame, context, css::awt::MessageBoxType_QUERYBOX, css::awt::MessageBoxButtons::BUTTONS_YES_NO,
                   question) == css::awt::MessageBoxResults::YES;
}

void tellUser(const Reference<css::frame::XFrame>& frame, const Reference<css::uno::XComponentContext>& context,
              const OUString& note, bool problem)
{
    showBox(frame, context, problem ? css::awt::MessageBoxType_WARNINGBOX : css::awt::MessageBoxType_INFOBOX,
            css::awt::MessageBoxButtons::BUTTONS_OK, note);
}

OUString chooseSaveFile(const Reference<css::uno::XComponentContext>& context)
{
    const Reference<css::ui::dialogs::XFilePicker3> picker = css::ui::dialogs::FilePicker::createWithMode(
        context, css::ui::dialogs::TemplateDescription::FILESAVE_AUTOEXTENSION);
    picker->setTitle("Save a copy for colleagues");
    picker->appendFilter("OpenDocument Spreadsheet (.ods)", "*.ods");
    picker->appendFilter("Excel 2007-365 (.xlsx)", "*.xlsx");
    picker->setCurrentFilter("OpenDocument Spreadsheet (.ods)");
    if (picker->execute() != css::ui::dialogs::ExecutableDialogResults::OK) return OUString();
    const css::uno::Sequence<OUString> files = picker->getSelectedFiles();
    return files.getLength() > 0 ? files[0] : OUString();
}

} // namespace isoquant::addin
