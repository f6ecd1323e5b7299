#include "closing_documents.hxx"

#include <com/sun/star/frame/theGlobalEventBroadcaster.hpp>
#include <com/sun/star/lang/XServiceInfo.hpp>

#if defined(__GLIBC__)
#include <malloc.h>
#endif

namespace isoquant::addin {

namespace {

// "Document has been removed, ... closing can no longer be prevented" (com.sun.star.document.Events):
// sent once a document really closes, unlike OnPrepareUnload, which a veto may still undo.
constexpr const char* closedEvent = "OnUnload";

bool isSpreadsheet(const css::uno::Reference<css::uno::XInterface>& document)
{
    const css::uno::Reference<css::lang::XServiceInfo> info(document, css::uno::UNO_QUERY);
    return info.is() && info->supportsService("com.sun.star.sheet.SpreadsheetDocument");
}

// Freed blocks go back to malloc, not to the system: glibc raises its mmap threshold after the
// first large block is freed, so later entries (tens of MB each) come from the heap and stay
// resident after they are freed. malloc_trim hands the free pages back, the closed document's too.
void returnFreedMemory()
{
#if defined(__GLIBC__)
    malloc_trim(0);
#endif
}

} // namespace

void ClosingDocuments::start(const css::uno::Reference<css::uno::XComponentContext>& context)
{
    if (!context.is()) return;
    try {
        css::uno::Reference<css::document::XDocumentEventBroadcaster> broadcaster(
            css::frame::theGlobalEventBroadcaster::get(context), css::uno::UNO_QUERY);
        if (!broadcaster.is()) return;
        broadcaster->addDocumentEventListener(this);
        const std::lock_guard<std::mutex> lock(broadcasterMutex_);
        broadcaster_ = broadcaster;
    } catch (...) {
        // No office around this runtime (or no memory to listen): the cache keeps its bounds only.
    }
}

void ClosingDocuments::stop()
{
    css::uno::Reference<css::document::XDocumentEventBroadcaster> broadcaster;
    {
        const std::lock_guard<std::mutex> lock(broadcasterMutex_);
        broadcaster = broadcaster_;
        broadcaster_.clear();
    }
    if (!broadcaster.is()) return;
    try {
        broadcaster->removeDocumentEventListener(this);
    } catch (const css::uno::Exception&) {
        // The office is going or gone: it drops its listeners itself.
    }
}

void ClosingDocuments::documentEventOccured(const css::document::DocumentEvent& event)
{
    try {
        if (!event.EventName.equalsAscii(closedEvent) || !isSpreadsheet(event.Source)) return;
        const std::shared_ptr<FitCache> fits = fits_.lock();
        if (!fits || fits->bytesHeld() == 0) return;
        fits->clear();
        returnFreedMemory();
    } catch (...) {
        // A document that answers no questions any more while closing: keep the entries. Nothing
        // may escape into the office, which called us.
    }
}

void ClosingDocuments::disposing(const css::lang::EventObject&)
{
    const std::lock_guard<std::mutex> lock(broadcasterMutex_);
    broadcaster_.clear();
}

} // namespace isoquant::addin
