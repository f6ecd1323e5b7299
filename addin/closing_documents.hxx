// Releases the fit cache when a spreadsheet document closes. Calc tells an add-in function nothing
// about the document that called it (only through a hidden first parameter that every function's
// IDL would have to declare), so the cache cannot know which entries the closed document used:
// all of them go. The documents still open lose nothing but time: a fit is computed again when a
// cell over it is next recalculated (their cells keep their values until then). The freed pages are
// then handed back to the system (glibc's malloc_trim): freed alone, most would stay resident.
#pragma once

#include "isoquant/sheet/caches/fit_cache.hpp"

#include <com/sun/star/document/XDocumentEventBroadcaster.hpp>
#include <com/sun/star/document/XDocumentEventListener.hpp>
#include <com/sun/star/uno/XComponentContext.hpp>
#include <cppuhelper/implbase1.hxx>

#include <memory>
#include <mutex>

namespace isoquant::addin {

class ClosingDocuments : public cppu::WeakImplHelper1<css::document::XDocumentEventListener> {
public:
    explicit ClosingDocuments(std::weak_ptr<FitCache> fits) : fits_(std::move(fits)) {}
    // Listens to the office's document events (theGlobalEventBroadcaster); called once the owner
    // holds a reference (a listener refused during its own construction would delete itself).
    // Without a context or a broadcaster (a bare UNO runtime, the call benchmark) nothing is
    // released: no failure here may keep the add-in from starting.
    void start(const css::uno::Reference<css::uno::XComponentContext>& context);
    // Stops listening; the owner calls it before it goes (the broadcaster holds a reference).
    void stop();

    // Events arrive on whichever thread closes the document (a remote API call's, too): the
    // cache locks, and the weak pointer finds nothing once the add-in has gone.
    void SAL_CALL documentEventOccured(const css::document::DocumentEvent& event) override;
    void SAL_CALL disposing(const css::lang::EventObject& source) override;

private:
    std::weak_ptr<FitCache> fits_;
    std::mutex broadcasterMutex_; // stop() and disposing() may come on different threads
    css::uno::Reference<css::document::XDocumentEventBroadcaster> broadcaster_;
};

} // namespace isoquant::addin
