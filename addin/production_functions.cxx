#include "production_functions.hxx"

#include "isoquant/sheet/arguments/argument_names.hpp"
#include "call_guards.hxx"
#include "cell_conversion.hxx"
#include "function_table.hxx"
#include "wizard_texts.hxx"

#include "isoquant/sheet/functions/production_functions.hpp"
#include "isoquant/sheet/functions/decision_functions.hpp"
#include "isoquant/sheet/tables/fit_table.hpp"
#include "isoquant/sheet/functions/growth_functions.hpp"
#include "isoquant/sheet/functions/bound_functions.hpp"
#include "isoquant/sheet/functions/cost_decisions.hpp"
#include "isoquant/sheet/tables/covariance_block.hpp"

namespace isoquant::addin {

namespace {

using css::uno::Any;

// An argument's texts in the wizard's language; empty for an unknown function or argument.
ArgumentInfo wizardArgument(const OUString& programmaticName, sal_Int32 argument, const Translation* translation)
{
    const FunctionInfo* function = findByProgrammaticName(toUtf8(programmaticName));
    if (!function || argument < 0) return {};
    return argumentTexts(*function, static_cast<std::size_t>(argument), translation);
}

} // namespace

css::uno::Sequence<OUString> supportedServiceNames()
{
    css::uno::Sequence<OUString> names(2);
    names[0] = OUString::createFromAscii(serviceName);
    names[1] = "com.sun.star.sheet.AddIn";
    return names;
}

ProductionFunctions::ProductionFunctions(const css::uno::Reference<css::uno::XComponentContext>& context)
    : closing_(new ClosingDocuments(fits_)), punctuation_(new LocalePunctuation(context))
{
    closing_->start(context);
}

ProductionFunctions::~ProductionFunctions()
{
    closing_->stop();
    punctuation_->stop();
}

FitArguments ProductionFunctions::fitArguments(const AnyTable& output, const AnyTable& inputs, const Any& form,
                                               const Any& constantReturns, const Any& errors, const Any& level,
                                               const Any& controls) const
{
    FitArguments arguments;
    arguments.output = toCellTable(output, argument::output);
    arguments.inputs = toCellTable(inputs, argument::inputs);
    arguments.controls = toOptionalTable(controls, argument::controls);
    arguments.form = toSingleCell(form, argument::form);
    arguments.constantReturns = toSingleCell(constantReturns, argument::constantReturns);
    arguments.errors = toSingleCell(errors, argument::errors);
    arguments.level = toSingleCell(level, argument::level);
    return arguments;
}

FitArguments ProductionFunctions::withPanelArguments(FitArguments arguments, const Any& groups, const Any& effects,
                                                     const Any& trend, const Any& incompleteRows)
{
    arguments.groups = toOptionalTable(groups, argument::groups);
    arguments.effects = toSingleCell(effects, argument::effects);
    arguments.trend = toOptionalTable(trend, argument::trend);
    arguments.incompleteRows = toSingleCell(incompleteRows, argument::incompleteRows);
    return arguments;
}

Any ProductionFunctions::prodFit(const AnyTable& output, const AnyTable& inputs, const Any& form,
                                      const Any& constantReturns, const Any& errors, const Any& level,
                                      const Any& controls, const Any& groups, const Any& effects, const Any& trend,
                                      const Any& incompleteRows, const Any& covariance)
{
    return guardedTable([&] {
        // Cut before the cache: a whole column's empty tail is neither hashed nor kept.
        const auto fit = fits_->fit(withoutTrailingEmptyRows(withPanelArguments(
            fitArguments(output, inputs, form, constantReturns, errors, level, controls), groups, effects, trend,
            incompleteRows)));
        return fitTableWithCovariance(fitTable(*fit), *fit, toSingleCell(covariance, argument::covariance));
    });
}

Any ProductionFunctions::prodStat(const AnyTable& output, const AnyTable& inputs, const AnyTable& rowLabel,
                                  const Any& columnLabel, const Any& form, const Any& constantReturns,
                                  const Any& errors, const Any& level, const Any& controls, const Any& groups,
                                  const Any& effects, const Any& trend, const Any& incompleteRows)
{
    return guardedValue([&] {
        const auto fit = fits_->fit(withoutTrailingEmptyRows(withPanelArguments(
            fitArguments(output, inputs, form, constantReturns, errors, level, controls), groups, effects, trend,
            incompleteRows)));
        return lookUpFit(*fit, toSingleCell(Any(rowLabel), argument::rowLabel),
                         toSingleCell(columnLabel, argument::columnLabel));
    });
}

Any ProductionFunctions::prodValue(const AnyTable& table, const AnyTable& rowLabel, const Any& columnLabel)
{
    return guardedValue([&] {
        return tableValue(toCellTable(table, argument::table), toSingleCell(Any(rowLabel), argument::rowLabel),
                          toSingleCell(columnLabel, argument::columnLabel));
    });
}

Any ProductionFunctions::prodOutput(const AnyTable& model, const AnyTable& inputs, const Any& mean, const Any& what)
{
    return guardedTable([&] {
        return outputColumnWithBounds(models_.table(model, argument::model), toCellTable(inputs, argument::inputs),
                                      toSingleCell(mean, argument::mean), toSingleCell(what, argument::what));
    });
}

Any ProductionFunctions::prodMarginal(const AnyTable& model, const AnyTable& inputs, const AnyTable& input,
                                      const Any& what)
{
    return guardedTable([&] {
        return marginalProductColumnWithBounds(
            models_.table(model, argument::model), toCellTable(inputs, argument::inputs),
            toSingleCell(Any(input), argument::input), toSingleCell(what, argument::what));
    });
}

Any ProductionFunctions::prodElasticity(const AnyTable& model, const AnyTable& inputs, const AnyTable& input,
                                        const Any& what)
{
    return guardedTable([&] {
        return elasticityColumnWithBounds(models_.table(model, argument::model), toCellTable(inputs, argument::inputs),
                                          toSingleCell(Any(input), argument::input),
                                          toSingleCell(what, argument::what));
    });
}

Any ProductionFunctions::prodScale(const AnyTable& model, const Any& inputs, const Any& what)
{
    return guardedTable([&] {
        return scaleColumnWithBounds(models_.table(model, argument::model), toOptionalTable(inputs, argument::inputs),
                                     toSingleCell(what, argument::what));
    });
}

Any ProductionFunctions::prodReturns(const AnyTable& model, const Any& level)
{
    return guardedValue([&] {
        return Cell(returnsVerdictCell(models_.table(model, argument::model), toSingleCell(level, argument::level)));
    });
}

Any ProductionFunctions::prodTfp(const AnyTable& model, const AnyTable& output, const AnyTable& inputs,
                                      const Any& periods, const Any& what)
{
    return guardedTable([&] {
        return productivityColumnWithBounds(
            models_.table(model, argument::model), toCellTable(output, argument::output),
            toCellTable(inputs, argument::inputs), toOptionalTable(periods, argument::periods),
            toSingleCell(what, argument::what));
    });
}

Any ProductionFunctions::prodGrowth(const AnyTable& output, const AnyTable& inputs, const AnyTable& weights,
                                         const Any& method, const Any& periods)
{
    return guardedTable([&] {
        return growthAccountTable(toCellTable(output, argument::output), toCellTable(inputs, argument::inputs),
                                  toCellTable(weights, argument::weights), toSingleCell(method, argument::method),
                                  toOptionalTable(periods, argument::periods));
    });
}

Any ProductionFunctions::prodIndex(const AnyTable& quantities, const AnyTable& shares, const Any& method,
                                        const Any& base, const Any& periods)
{
    return guardedTable([&] {
        return quantityIndexColumn(toCellTable(quantities, argument::quantities), toCellTable(shares, argument::shares),
                                   toSingleCell(method, argument::method), toSingleCell(base, argument::base),
                                   toOptionalTable(periods, argument::periods));
    });
}

Any ProductionFunctions::prodRegular(const AnyTable& model, const AnyTable& inputs)
{
    return guardedTable([&] {
        return regularityAnyColumn(models_.table(model, argument::model), toCellTable(inputs, argument::inputs));
    });
}

Any ProductionFunctions::prodCompare(const AnyTable& output, const AnyTable& inputs, const Any& level)
{
    return guardedTable([&] {
        return compareFormsTable(toCellTable(output, argument::output), toCellTable(inputs, argument::inputs),
                                 toSingleCell(level, argument::level));
    });
}

Any ProductionFunctions::prodSecond(const AnyTable& model, const AnyTable& inputs, const AnyTable& inputI,
                                    const Any& inputJ, const Any& what)
{
    return guardedTable([&] {
        return secondPartialColumnWithBounds(
            models_.table(model, argument::model), toCellTable(inputs, argument::inputs),
            toSingleCell(Any(inputI), argument::firstInput), toSingleCell(inputJ, argument::secondInput),
            toSingleCell(what, argument::what));
    });
}

Any ProductionFunctions::prodInputReturns(const AnyTable& model, const AnyTable& inputs, const AnyTable& input)
{
    return guardedTable([&] {
        return inputReturnsColumn(models_.table(model, argument::model), toCellTable(inputs, argument::inputs),
                                  toSingleCell(Any(input), argument::input));
    });
}

Any ProductionFunctions::prodPair(const AnyTable& model, const AnyTable& inputs, const AnyTable& inputI,
                                  const AnyTable& inputJ)
{
    return guardedTable([&] {
        return inputPairColumn(models_.table(model, argument::model), toCellTable(inputs, argument::inputs),
                               toSingleCell(Any(inputI), argument::firstInput),
                               toSingleCell(Any(inputJ), argument::secondInput));
    });
}

Any ProductionFunctions::prodMrts(const AnyTable& model, const AnyTable& inputs, const AnyTable& inputI,
                                  const AnyTable& inputJ, const Any& what)
{
    return guardedTable([&] {
        return technicalRateColumnWithBounds(
            models_.table(model, argument::model), toCellTable(inputs, argument::inputs),
            toSingleCell(Any(inputI), argument::firstInput), toSingleCell(Any(inputJ), argument::secondInput),
            toSingleCell(what, argument::what));
    });
}

Any ProductionFunctions::prodSubstitution(const AnyTable& model, const AnyTable& inputs, const AnyTable& inputI,
                                          const AnyTable& inputJ, const Any& kind, const Any& what)
{
    return guardedTable([&] {
        return substitutionColumnWithBounds(
            models_.table(model, argument::model), toCellTable(inputs, argument::inputs),
            toSingleCell(Any(inputI), argument::firstInput), toSingleCell(Any(inputJ), argument::secondInput),
            toSingleCell(kind, argument::kind), toSingleCell(what, argument::what));
    });
}

OUString ProductionFunctions::getProgrammaticFuntionName(const OUString& displayName)
{
    const FunctionInfo* function = findByDisplayName(toUtf8(displayName));
    return function ? fromUtf8(function->programmaticName) : OUString();
}

OUString ProductionFunctions::getDisplayFunctionName(const OUString& programmaticName)
{
    const FunctionInfo* function = findByProgrammaticName(toUtf8(programmaticName));
    return function ? fromUtf8(function->displayName) : OUString();
}

OUString ProductionFunctions::getFunctionDescription(const OUString& programmaticName)
{
    const FunctionInfo* function = findByProgrammaticName(toUtf8(programmaticName));
    return function ? fromUtf8(functionDescription(*function, wizardTranslation_)) : OUString();
}

OUString ProductionFunctions::getDisplayArgumentName(const OUString& programmaticName, sal_Int32 argument)
{
    return fromUtf8(wizardArgument(programmaticName, argument, wizardTranslation_).name);
}

OUString ProductionFunctions::getArgumentDescription(const OUString& programmaticName, sal_Int32 argument)
{
    return fromUtf8(wizardArgument(programmaticName, argument, wizardTranslation_).description);
}

OUString ProductionFunctions::getProgrammaticCategoryName(const OUString&) { return fromUtf8(categoryName); }

OUString ProductionFunctions::getDisplayCategoryName(const OUString&)
{
    return fromUtf8(categoryDisplayName(wizardTranslation_));
}

// Calc passes the UI language here before it reads the wizard's texts.
void ProductionFunctions::setLocale(const css::lang::Locale& locale)
{
    locale_ = locale;
    wizardTranslation_ = translationFor(toUtf8(locale.Language));
}

css::lang::Locale ProductionFunctions::getLocale() { return locale_; }

OUString ProductionFunctions::getServiceName() { return OUString::createFromAscii(serviceName); }

OUString ProductionFunctions::getImplementationName() { return OUString::createFromAscii(implementationName); }

sal_Bool ProductionFunctions::supportsService(const OUString& name)
{
    for (const auto& supported : supportedServiceNames())
        if (supported == name) return true;
    return false;
}

css::uno::Sequence<OUString> ProductionFunctions::getSupportedServiceNames() { return supportedServiceNames(); }

} // namespace isoquant::addin
