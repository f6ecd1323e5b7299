// The extension's menu commands (the Isoquant menu in Calc): a protocol handler for the URLs
// `org.isoquant.calc.commands:FitArray` and `org.isoquant.calc.commands:SaveForColleagues`,
// registered by extension/ProtocolHandler.xcu and shown by extension/Addons.xcu. Dispatched from
// the menu, or headless through the dispatch framework (a DispatchHelper), which gets the outcome
// as the DispatchResultEvent's State and Result (a sentence saying what was done or why not).
#pragma once

#include <com/sun/star/frame/XDispatchProvider.hpp>
#include <com/sun/star/frame/XFrame.hpp>
#include <com/sun/star/frame/XNotifyingDispatch.hpp>
#include <com/sun/star/lang/XInitialization.hpp>
#include <com/sun/star/lang/XServiceInfo.hpp>
#include <com/sun/star/uno/XComponentContext.hpp>
#include <cppuhelper/implbase4.hxx>

namespace isoquant::addin {

using rtl::OUString;

inline constexpr const char* commandsImplementationName = "org.isoquant.calc.CommandsImpl";
inline constexpr const char* commandsProtocol = "org.isoquant.calc.commands:";

class Commands : public cppu::WeakImplHelper4<css::frame::XDispatchProvider, css::frame::XNotifyingDispatch,
                                              css::lang::XInitialization, css::lang::XServiceInfo> {
public:
    explicit Commands(const css::uno::Reference<css::uno::XComponentContext>& context);

    // XInitialization: the frame the commands act in.
    void SAL_CALL initialize(const css::uno::Sequence<css::uno::Any>& arguments) override;

    // XDispatchProvider
    css::uno::Reference<css::frame::XDispatch> SAL_CALL queryDispatch(const css::util::URL& url,
                                                                      const OUString& targetFrame,
                                                                      sal_Int32 searchFlags) override;
    css::uno::Sequence<css::uno::Reference<css::frame::XDispatch>> SAL_CALL queryDispatches(
        const css::uno::Sequence<css::frame::DispatchDescriptor>& requests) override;

    // XDispatch, XNotifyingDispatch
    void SAL_CALL dispatch(const css::util::URL& url,
                           const css::uno::Sequence<css::beans::PropertyValue>& arguments) override;
    void SAL_CALL dispatchWithNotification(const css::util::URL& url,
                                           const css::uno::Sequence<css::beans::PropertyValue>& arguments,
                                           const css::uno::Reference<css::frame::XDispatchResultListener>& listener)
        override;
    void SAL_CALL addStatusListener(const css::uno::Reference<css::frame::XStatusListener>& listener,
                                    const css::util::URL& url) override;
    void SAL_CALL removeStatusListener(const css::uno::Reference<css::frame::XStatusListener>& listener,
                                       const css::util::URL& url) override;

    // XServiceInfo
    OUString SAL_CALL getImplementationName() override;
    sal_Bool SAL_CALL supportsService(const OUString& name) override;
    css::uno::Sequence<OUString> SAL_CALL getSupportedServiceNames() override;

private:
    css::uno::Reference<css::uno::XComponentContext> context_;
    css::uno::Reference<css::frame::XFrame> frame_;
};

css::uno::Sequence<OUString> commandsServiceNames();

} // namespace isoquant::addin
