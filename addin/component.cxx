// The shared library's entry points: LibreOffice asks for a factory by implementation name.
#include "commands.hxx"
#include "production_functions.hxx"

#include <com/sun/star/lang/XSingleComponentFactory.hpp>
#include <cppuhelper/factory.hxx>
#include <rtl/string.h>
#include <uno/lbnames.h>

namespace {

css::uno::Reference<css::uno::XInterface> SAL_CALL createProductionFunctions(
    const css::uno::Reference<css::uno::XComponentContext>& context)
{
    return isoquant::addin::createAddIn(context);
}

css::uno::Reference<css::uno::XInterface> SAL_CALL createCommands(
    const css::uno::Reference<css::uno::XComponentContext>& context)
{
    return static_cast<cppu::OWeakObject*>(new isoquant::addin::Commands(context));
}

} // namespace

extern "C" SAL_DLLPUBLIC_EXPORT void* SAL_CALL component_getFactory(const char* implementationName, void*, void*)
{
    if (implementationName == nullptr) return nullptr;
    css::uno::Reference<css::lang::XSingleComponentFactory> factory;
    if (rtl_str_compare(implementationName, isoquant::addin::implementationName) == 0)
        factory = cppu::createSingleComponentFactory(createProductionFunctions,
                                                     rtl::OUString::createFromAscii(isoquant::addin::implementationName),
                                                     isoquant::addin::supportedServiceNames());
    else if (rtl_str_compare(implementationName, isoquant::addin::commandsImplementationName) == 0)
        factory = cppu::createSingleComponentFactory(
            createCommands, rtl::OUString::createFromAscii(isoquant::addin::commandsImplementationName),
            isoquant::addin::commandsServiceNames());
    if (!factory.is()) return nullptr;
    factory->acquire();
    return factory.get();
}

extern "C" SAL_DLLPUBLIC_EXPORT void SAL_CALL component_getImplementationEnvironment(const char** environmentTypeName,
                                                                                    uno_Environment**)
{
    *environmentTypeName = CPPU_CURRENT_LANGUAGE_BINDING_NAME;
}
