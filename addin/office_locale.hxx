// The office's locale setting (Tools ▸ Options ▸ Language Settings ▸ Languages ▸ Locale setting)
// decides how numbers in messages and table notes are punctuated: a German locale writes 0,9896
// and 1.048.576, as its cells do. Read when the add-in starts; changes are followed as they are made.
#pragma once

#include <com/sun/star/uno/XComponentContext.hpp>
#include <com/sun/star/util/XChangesListener.hpp>
#include <com/sun/star/util/XChangesNotifier.hpp>
#include <cppuhelper/implbase1.hxx>

namespace isoquant::addin {

class LocalePunctuation : public cppu::WeakImplHelper1<css::util::XChangesListener> {
public:
    // Reads the setting and listens to it; without a context (or a readable configuration) numbers
    // keep '.' and ','.
    explicit LocalePunctuation(const css::uno::Reference<css::uno::XComponentContext>& context);
    // Stops listening; the owner calls it before it goes (the configuration holds a reference).
    void stop();

    void SAL_CALL changesOccurred(const css::util::ChangesEvent& event) override;
    void SAL_CALL disposing(const css::lang::EventObject& source) override;

private:
    void apply();

    css::uno::Reference<css::uno::XComponentContext> context_;
    css::uno::Reference<css::util::XChangesNotifier> setting_;
};

} // namespace isoquant::addin
