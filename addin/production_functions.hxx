// The UNO component behind the cell functions: converts arguments, calls the core, and turns
// every failure into a message in the cell. Nothing may escape to Calc: an exception thrown here
// shows only "Err:502" or "#VALUE!", and a crash would take the user's unsaved work with it.
#pragma once

#include "closing_documents.hxx"
#include "model_ranges.hxx"
#include "office_locale.hxx"

#include "isoquant/sheet/caches/fit_cache.hpp"

#include <org/isoquant/calc/XProductionFunctions.hpp>

#include <com/sun/star/lang/Locale.hpp>
#include <com/sun/star/lang/XServiceInfo.hpp>
#include <com/sun/star/lang/XServiceName.hpp>
#include <com/sun/star/sheet/XAddIn.hpp>
#include <cppuhelper/implbase4.hxx>
#include <rtl/ref.hxx>

namespace isoquant::addin {

using rtl::OUString;

struct Translation; // wizard_texts.hxx

inline constexpr const char* implementationName = "org.isoquant.calc.ProductionFunctionsImpl";
inline constexpr const char* serviceName = "org.isoquant.calc.ProductionFunctions";
css::uno::Sequence<OUString> supportedServiceNames();

class ProductionFunctions
    : public cppu::WeakImplHelper4<org::isoquant::calc::XProductionFunctions, css::sheet::XAddIn,
                                   css::lang::XServiceName, css::lang::XServiceInfo> {
public:
    using AnyTable = css::uno::Sequence<css::uno::Sequence<css::uno::Any>>;

    // The context gives the office's locale setting (how numbers in messages are punctuated).
    explicit ProductionFunctions(const css::uno::Reference<css::uno::XComponentContext>& context);
    ~ProductionFunctions() override;

    // XProductionFunctions
    css::uno::Any SAL_CALL prodFit(const AnyTable& output, const AnyTable& inputs, const css::uno::Any& form,
                              const css::uno::Any& constantReturns, const css::uno::Any& errors,
                              const css::uno::Any& level, const css::uno::Any& controls,
                              const css::uno::Any& groups, const css::uno::Any& effects, const css::uno::Any& trend,
                              const css::uno::Any& incompleteRows, const css::uno::Any& covariance) override;
    css::uno::Any SAL_CALL prodStat(const AnyTable& output, const AnyTable& inputs, const AnyTable& rowLabel,
                                    const css::uno::Any& columnLabel, const css::uno::Any& form,
                                    const css::uno::Any& constantReturns, const css::uno::Any& errors,
                                    const css::uno::Any& level, const css::uno::Any& controls,
                                    const css::uno::Any& groups, const css::uno::Any& effects,
                                    const css::uno::Any& trend, const css::uno::Any& incompleteRows) override;
    css::uno::Any SAL_CALL prodValue(const AnyTable& table, const AnyTable& rowLabel,
                                     const css::uno::Any& columnLabel) override;
    css::uno::Any SAL_CALL prodOutput(const AnyTable& model, const AnyTable& inputs,
                                      const css::uno::Any& mean, const css::uno::Any& what) override;
    css::uno::Any SAL_CALL prodMarginal(const AnyTable& model, const AnyTable& inputs, const AnyTable& input,
                                        const css::uno::Any& what) override;
    css::uno::Any SAL_CALL prodElasticity(const AnyTable& model, const AnyTable& inputs, const AnyTable& input,
                                          const css::uno::Any& what) override;
    css::uno::Any SAL_CALL prodScale(const AnyTable& model, const css::uno::Any& inputs,
                                     const css::uno::Any& what) override;
    css::uno::Any SAL_CALL prodReturns(const AnyTable& model, const css::uno::Any& level) override;
    css::uno::Any SAL_CALL prodTfp(const AnyTable& model, const AnyTable& output, const AnyTable& inputs,
                              const css::uno::Any& periods, const css::uno::Any& what) override;
    css::uno::Any SAL_CALL prodGrowth(const AnyTable& output, const AnyTable& inputs, const AnyTable& weights,
                                      const css::uno::Any& method, const css::uno::Any& periods) override;
    css::uno::Any SAL_CALL prodIndex(const AnyTable& quantities, const AnyTable& shares, const css::uno::Any& method,
                                     const css::uno::Any& base, const css::uno::Any& periods) override;
    css::uno::Any SAL_CALL prodRegular(const AnyTable& model, const AnyTable& inputs) override;
    css::uno::Any SAL_CALL prodCompare(const AnyTable& output, const AnyTable& inputs,
                                       const css::uno::Any& level) override;
    css::uno::Any SAL_CALL prodSecond(const AnyTable& model, const AnyTable& inputs, const AnyTable& inputI,
                                 const css::uno::Any& inputJ, const css::uno::Any& what) override;
    css::uno::Any SAL_CALL prodInputReturns(const AnyTable& model, const AnyTable& inputs,
                                            const AnyTable& input) override;
    css::uno::Any SAL_CALL prodPair(const AnyTable& model, const AnyTable& inputs, const AnyTable& inputI,
                                    const AnyTable& inputJ) override;
    css::uno::Any SAL_CALL prodMrts(const AnyTable& model, const AnyTable& inputs, const AnyTable& inputI,
                                    const AnyTable& inputJ, const css::uno::Any& what) override;
    css::uno::Any SAL_CALL prodSubstitution(const AnyTable& model, const AnyTable& inputs, const AnyTable& inputI,
                                            const AnyTable& inputJ, const css::uno::Any& kind,
                                            const css::uno::Any& what) override;
    css::uno::Any SAL_CALL prodLeastCost(const AnyTable& model, const AnyTable& targetOutput,
                                    const AnyTable& inputPrices, const css::uno::Any& what) override;
    css::uno::Any SAL_CALL prodCostFit(const AnyTable& cost, const AnyTable& output, const AnyTable& prices,
                                       const css::uno::Any& form, const css::uno::Any& shares,
                                       const css::uno::Any& errors, const css::uno::Any& level,
                                       const css::uno::Any& controls, const css::uno::Any& groups,
                                       const css::uno::Any& effects, const css::uno::Any& trend,
                                       const css::uno::Any& incompleteRows, const css::uno::Any& inefficiency,
                                       const css::uno::Any& covariance) override;
    css::uno::Any SAL_CALL prodCost(const AnyTable& model, const AnyTable& targetOutput, const AnyTable& inputPrices,
                                    const css::uno::Any& what, const css::uno::Any& statistic) override;
    css::uno::Any SAL_CALL prodEfficientScale(const AnyTable& model, const AnyTable& inputPrices) override;
    css::uno::Any SAL_CALL prodPriceElasticity(const AnyTable& model, const AnyTable& output,
                                               const AnyTable& inputPrices, const AnyTable& inputI,
                                               const AnyTable& inputJ, const css::uno::Any& kind) override;
    css::uno::Any SAL_CALL prodBudget(const AnyTable& model, const AnyTable& budget,
                                      const AnyTable& inputPrices, const css::uno::Any& what) override;
    css::uno::Any SAL_CALL prodProfit(const AnyTable& model, const AnyTable& outputPrice,
                                 const AnyTable& inputPrices) override;
    css::uno::Any SAL_CALL prodIsoquant(const AnyTable& model, const AnyTable& outputLevel, const AnyTable& values,
                                   const css::uno::Any& inputI, const css::uno::Any& inputJ) override;
    css::uno::Any SAL_CALL prodFrontier(const AnyTable& output, const AnyTable& inputs, const css::uno::Any& form,
                                        const css::uno::Any& inefficiency, const css::uno::Any& level,
                                        const css::uno::Any& controls, const css::uno::Any& covariance) override;
    css::uno::Any SAL_CALL prodEfficiency(const AnyTable& model, const AnyTable& output, const AnyTable& inputs,
                                          const css::uno::Any& what) override;
    css::uno::Any SAL_CALL prodEnvelope(const AnyTable& outputs, const AnyTable& inputs, const css::uno::Any& returns,
                                        const css::uno::Any& orientation, const css::uno::Any& what,
                                        const css::uno::Any& names) override;

    // XAddIn
    OUString SAL_CALL getProgrammaticFuntionName(const OUString& displayName) override;
    OUString SAL_CALL getDisplayFunctionName(const OUString& programmaticName) override;
    OUString SAL_CALL getFunctionDescription(const OUString& programmaticName) override;
    OUString SAL_CALL getDisplayArgumentName(const OUString& programmaticName, sal_Int32 argument) override;
    OUString SAL_CALL getArgumentDescription(const OUString& programmaticName, sal_Int32 argument) override;
    OUString SAL_CALL getProgrammaticCategoryName(const OUString& programmaticName) override;
    OUString SAL_CALL getDisplayCategoryName(const OUString& programmaticName) override;

    // XLocalizable (through XAddIn): the texts are English whatever the locale.
    void SAL_CALL setLocale(const css::lang::Locale& locale) override;
    css::lang::Locale SAL_CALL getLocale() override;

    // XServiceName, XServiceInfo
    OUString SAL_CALL getServiceName() override;
    OUString SAL_CALL getImplementationName() override;
    sal_Bool SAL_CALL supportsService(const OUString& name) override;
    css::uno::Sequence<OUString> SAL_CALL getSupportedServiceNames() override;

protected:
    // For the benchmark extension's diagnostics (benchmark_floor.cxx).
    const FitCache& fitCache() const { return *fits_; }

private:
    FitArguments fitArguments(const AnyTable& output, const AnyTable& inputs, const css::uno::Any& form,
                              const css::uno::Any& constantReturns, const css::uno::Any& errors,
                              const css::uno::Any& level, const css::uno::Any& controls) const;
    // The panel arguments (groups, effects, trend, incomplete rows) added to `arguments`.
    static FitArguments withPanelArguments(FitArguments arguments, const css::uno::Any& groups,
                                           const css::uno::Any& effects, const css::uno::Any& trend,
                                           const css::uno::Any& incompleteRows);

    // Every cache of the cell functions lives here, owned by this instance: fits by their
    // arguments, models by their ranges. The core keeps none of its own. The fits are shared only
    // weakly, with the listener that empties them when a spreadsheet closes (closing_documents.hxx).
    std::shared_ptr<FitCache> fits_ = std::make_shared<FitCache>();
    rtl::Reference<ClosingDocuments> closing_;
    ModelRanges models_;
    css::lang::Locale locale_;
    const Translation* wizardTranslation_ = nullptr; // Function Wizard texts; null: English
    rtl::Reference<LocalePunctuation> punctuation_;
};

// The add-in object of this build: ProductionFunctions in isoquant.oxt (extension.cxx), the
// benchmark extension's BenchmarkProductionFunctions there (benchmark_floor.cxx).
cppu::OWeakObject* createAddIn(const css::uno::Reference<css::uno::XComponentContext>& context);

} // namespace isoquant::addin
