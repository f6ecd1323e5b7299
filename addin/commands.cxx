#include "commands.hxx"

#include "array_fitting.hxx"
#include "cell_conversion.hxx"
#include "colleague_copy.hxx"
#include "user_dialogs.hxx"

#include "isoquant/sheet/arguments/argument_names.hpp"

#include <com/sun/star/frame/DispatchResultState.hpp>
#include <com/sun/star/frame/FeatureStateEvent.hpp>
#include <com/sun/star/frame/XStatusListener.hpp>
#include <com/sun/star/frame/XDispatchResultListener.hpp>
#include <cppuhelper/supportsservice.hxx>

namespace isoquant::addin {

namespace {

using css::uno::Reference;

constexpr const char* fitArrayCommand = "FitArray";
constexpr const char* saveCopyCommand = "SaveForColleagues";
constexpr const char* helpCommand = "Help";

// The menu's short help, shown by its last entry.
constexpr const char* helpText =
    "Fit the Array to Its Result: put the cursor on a formula whose result is a table or a column "
    "(typed into one cell, or an array formula over too few or too many cells) and run it; the formula "
    "is entered again over exactly the rows and columns of its result. Cells with content in the way are "
    "not overwritten unless you say yes; Edit > Undo takes it back.\n\n"
    "Save a Copy for Colleagues: writes a copy (.ods or .xlsx) in which every cell that calls an Isoquant "
    "function holds the value it shows now, so that colleagues without the extension see the same numbers. "
    "Formats and built-in formulas stay; a first sheet lists what was frozen. This document is not changed.";

bool isOurs(const css::util::URL& url)
{
    return url.Protocol == OUString::createFromAscii(commandsProtocol) &&
           (url.Path == OUString::createFromAscii(fitArrayCommand) || url.Path == OUString::createFromAscii(saveCopyCommand) ||
            url.Path == OUString::createFromAscii(helpCommand));
}

} // namespace

css::uno::Sequence<OUString> commandsServiceNames()
{
    return sequenceOf<OUString>({"com.sun.star.frame.ProtocolHandler"});
}

Commands::Commands(const Reference<css::uno::XComponentContext>& context) : context_(context) {}

void Commands::initialize(const css::uno::Sequence<css::uno::Any>& arguments)
{
    if (arguments.getLength() > 0) arguments[0] >>= frame_;
}

Reference<css::frame::XDispatch> Commands::queryDispatch(const css::util::URL& url, const OUString&, sal_Int32)
{
    return isOurs(url) ? Reference<css::frame::XDispatch>(this) : nullptr;
}

css::uno::Sequence<Reference<css::frame::XDispatch>> Commands::queryDispatches(
    const css::uno::Sequence<css::frame::DispatchDescriptor>& requests)
{
    css::uno::Sequence<Reference<css::frame::XDispatch>> dispatches(requests.getLength());
    for (sal_Int32 i = 0; i < requests.getLength(); ++i)
        dispatches.getArray()[i] = queryDispatch(requests[i].FeatureURL, requests[i].FrameName, requests[i].SearchFlags);
    return dispatches;
}

void Commands::dispatch(const css::util::URL& url, const css::uno::Sequence<css::beans::PropertyValue>& arguments)
{
    dispatchWithNotification(url, arguments, nullptr);
}

void Commands::dispatchWithNotification(const css::util::URL& url,
                                        const css::uno::Sequence<css::beans::PropertyValue>& arguments,
                                        const Reference<css::frame::XDispatchResultListener>& listener)
{
    CommandOutcome outcome;
    try {
        if (url.Path == OUString::createFromAscii(fitArrayCommand))
            outcome = fitArrayToResult(frame_, context_);
        else if (url.Path == OUString::createFromAscii(saveCopyCommand))
            outcome = saveCopyForColleagues(frame_, context_, arguments);
        else if (url.Path == OUString::createFromAscii(helpCommand))
            outcome = {true, OUString::createFromAscii(helpText)};
        else
            outcome = {false, "Unknown Isoquant command " + url.Complete};
    } catch (const css::uno::Exception& error) {
        outcome = {false, "The command stopped: " + error.Message};
    } catch (const InputError& error) {
        outcome = {false, "The command stopped: " + fromUtf8(sheetMessage(error))};
    } catch (const std::exception& error) {
        outcome = {false, "The command stopped: " + OUString::createFromAscii(error.what())};
    }
    // A dispatch from the menu (no listener) tells the user why a command did nothing, where a copy
    // went, or the help; a caller that listens, such as a DispatchHelper, gets the sentence as the result.
    if (!listener.is() && (!outcome.done || url.Path != OUString::createFromAscii(fitArrayCommand)))
        tellUser(frame_, context_, outcome.message, !outcome.done);
    if (listener.is()) {
        css::frame::DispatchResultEvent event;
        event.Source = static_cast<cppu::OWeakObject*>(this);
        event.State = outcome.done ? css::frame::DispatchResultState::SUCCESS : css::frame::DispatchResultState::FAILURE;
        event.Result <<= outcome.message;
        listener->dispatchFinished(event);
    }
}

// The commands are always offered; when one does not apply it says why.
void Commands::addStatusListener(const Reference<css::frame::XStatusListener>& listener, const css::util::URL& url)
{
    if (!listener.is()) return;
    css::frame::FeatureStateEvent state;
    state.Source = static_cast<cppu::OWeakObject*>(this);
    state.FeatureURL = url;
    state.IsEnabled = isOurs(url);
    listener->statusChanged(state);
}

void Commands::removeStatusListener(const Reference<css::frame::XStatusListener>&, const css::util::URL&) {}

OUString Commands::getImplementationName() { return OUString::createFromAscii(commandsImplementationName); }
sal_Bool Commands::supportsService(const OUString& name) { return cppu::supportsService(this, name); }
css::uno::Sequence<OUString> Commands::getSupportedServiceNames() { return commandsServiceNames(); }

} // namespace isoquant::addin
