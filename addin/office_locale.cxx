#include "office_locale.hxx"

#include "cell_conversion.hxx"

#include "isoquant/math/messages/text.hpp"

#include <com/sun/star/beans/NamedValue.hpp>
#include <com/sun/star/configuration/theDefaultProvider.hpp>
#include <com/sun/star/container/XNameAccess.hpp>
#include <com/sun/star/i18n/LocaleData2.hpp>
#include <com/sun/star/lang/XMultiServiceFactory.hpp>
#include <osl/process.h>
#include <rtl/locale.h>

namespace isoquant::addin {

namespace {

using css::uno::Reference;

constexpr const char* settingNode = "/org.openoffice.Setup/L10N";
constexpr const char* settingName = "ooSetupSystemLocale";

// A BCP 47 tag as the office stores it ("de-DE", "en-US", "sr-Latn-RS"): language and region
// when the tag has that simple shape, otherwise the whole tag in the form LocaleData takes
// ("qlt" marks a tag kept in Variant).
css::lang::Locale localeOfTag(const OUString& tag)
{
    const sal_Int32 dash = tag.indexOf('-');
    if (dash < 0) return css::lang::Locale(tag, OUString(), OUString());
    const OUString region = tag.copy(dash + 1);
    if (region.indexOf('-') < 0 && (region.getLength() == 2 || region.getLength() == 3))
        return css::lang::Locale(tag.copy(0, dash), region, OUString());
    return css::lang::Locale("qlt", OUString(), tag);
}

// An empty setting means "Default": the system's locale, as the office reads it from the process.
css::lang::Locale systemLocale()
{
    rtl_Locale* process = nullptr;
    osl_getProcessLocale(&process);
    if (process == nullptr) return css::lang::Locale("en", "US", OUString());
    return css::lang::Locale(OUString(process->Language), OUString(process->Country), OUString());
}

} // namespace

LocalePunctuation::LocalePunctuation(const Reference<css::uno::XComponentContext>& context) : context_(context)
{
    if (!context_.is()) return;
    try {
        const Reference<css::lang::XMultiServiceFactory> provider =
            css::configuration::theDefaultProvider::get(context_);
        css::beans::NamedValue path("nodepath", css::uno::Any(OUString::createFromAscii(settingNode)));
        css::uno::Sequence<css::uno::Any> arguments(1);
        arguments.getArray()[0] <<= path;
        setting_.set(provider->createInstanceWithArguments("com.sun.star.configuration.ConfigurationAccess", arguments),
                     css::uno::UNO_QUERY);
        if (setting_.is()) setting_->addChangesListener(this);
        apply();
    } catch (const css::uno::Exception&) {
        // No configuration (a bare UNO runtime): numbers keep '.' and ','.
    }
}

void LocalePunctuation::stop()
{
    if (!setting_.is()) return;
    try {
        setting_->removeChangesListener(this);
    } catch (const css::uno::Exception&) {
    }
    setting_.clear();
}

void LocalePunctuation::apply()
{
    const Reference<css::container::XNameAccess> values(setting_, css::uno::UNO_QUERY);
    OUString tag;
    if (values.is()) values->getByName(OUString::createFromAscii(settingName)) >>= tag;
    const css::lang::Locale locale = tag.isEmpty() ? systemLocale() : localeOfTag(tag);
    const css::i18n::LocaleDataItem item = css::i18n::LocaleData2::create(context_)->getLocaleItem(locale);
    NumberPunctuation punctuation;
    if (!item.decimalSeparator.isEmpty()) punctuation.decimal = toUtf8(item.decimalSeparator);
    if (!item.thousandSeparator.isEmpty()) punctuation.thousands = toUtf8(item.thousandSeparator);
    setNumberPunctuation(punctuation);
}

void LocalePunctuation::changesOccurred(const css::util::ChangesEvent&)
{
    try {
        apply();
    } catch (const css::uno::Exception&) {
        // Keep the punctuation we had.
    }
}

void LocalePunctuation::disposing(const css::lang::EventObject&) { setting_.clear(); }

} // namespace isoquant::addin
