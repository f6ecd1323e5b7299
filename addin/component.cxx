// The shared library's entry points: LibreOffice asks for a factory by implementation name.
#include "production_functions.hxx"

#include <com/sun/star/lang/XSingleComponentFactory.hpp>
#include <cppuhelper/factory.hxx>
#include <rtl/string.h>
#include <uno/lbnames.h>

namespace {

css::uno::Reference<css::uno::XInterface> SAL_CALL createProductionFunctions(
    const css::uno::Reference<css::uno::XComponentContext>&)
{
    return isoquant::addin::createAddIn();
}

} // namespace

extern "C" SAL_DLLPUBLIC_EXPORT void* SAL_CALL component_getFactory(const char* implementationName, void*, void*)
{
    if (implementationName == nullptr || rtl_str_compare(implementationName, isoquant::addin::implementationName) != 0)
        return nullptr;
    const css::uno::Reference<css::lang::XSingleComponentFactory> factory = cppu::createSingleComponentFactory(
        createProductionFunctions, rtl::OUString::createFromAscii(isoquant::addin::implementationName),
        isoquant::addin::supportedServiceNames());
    factory->acquire();
    return factory.get();
}

extern "C" SAL_DLLPUBLIC_EXPORT void SAL_CALL component_getImplementationEnvironment(const char** environmentTypeName,
                                                                                    uno_Environment**)
{
    *environmentTypeName = CPPU_CURRENT_LANGUAGE_BINDING_NAME;
}
