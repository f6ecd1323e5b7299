#include "production_functions.hxx"

#include "cell_conversion.hxx"
#include "function_table.hxx"
#include "wizard_texts.hxx"

#include "isoquant/sheet/functions/production_functions.hpp"
#include "isoquant/sheet/functions/cost_functions.hpp"
#include "isoquant/sheet/functions/decision_functions.hpp"
#include "isoquant/sheet/tables/fit_table.hpp"
#include "isoquant/sheet/functions/growth_functions.hpp"
#include "isoquant/math/messages/input_error.hpp"
#include "isoquant/sheet/functions/frontier_functions.hpp"
#include "isoquant/sheet/tables/frontier_table.hpp"
#include "isoquant/sheet/functions/envelope_functions.hpp"
#include "isoquant/sheet/functions/cost_decisions.hpp"
#include "isoquant/sheet/tables/cost_table.hpp"
#include "isoquant/sheet/tables/covariance_block.hpp"
#include "isoquant/sheet/functions/bound_functions.hpp"

#include <new>

namespace isoquant::addin {

namespace {

using css::uno::Any;

// Every cell function runs through here: the message of any failure becomes the cell's text.
template <typename Compute>
std::string failureMessage(Compute&& compute)
{
    try {
        compute();
        return {};
    } catch (const InputError& error) {
        return std::string("Error: ") + error.what();
    } catch (const std::bad_alloc&) {
        return "Error: not enough memory for a range this large";
    } catch (const std::exception& error) {
        return std::string("Error: internal problem (") + error.what() + "); please report it";
    } catch (const css::uno::Exception& error) {
        return "Error: internal problem (" + toUtf8(error.Message) + "); please report it";
    } catch (...) {
        return "Error: internal problem; please report it";
    }
}

template <typename Compute>
Any guardedTable(Compute&& compute)
{
    Any result;
    const std::string message = failureMessage([&] { result = toResult(compute()); });
    if (!message.empty()) return toResult(singleCell(message));
    return result;
}

// A result that is a list, one value per input, then any totals (PRODLEASTCOST, PRODBUDGET,
// PRODPROFIT), comes from the core as a row; it follows the orientation of the prices: prices in
// a column give a column, so that the array formula can be entered over a column.
CellTable orientedLike(const CellTable& row, const CellTable& prices)
{
    if (prices.rows() <= prices.columns() || row.rows() != 1) return row;
    CellTable column(row.columns(), 1);
    for (std::size_t c = 0; c < row.columns(); ++c) column.set(c, 0, row.at(0, c));
    return column;
}

template <typename Compute>
Any guardedValue(Compute&& compute)
{
    Any result;
    const std::string message = failureMessage([&] { result = toAny(compute()); });
    if (!message.empty()) return toAny(Cell(message));
    return result;
}

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
    : punctuation_(new LocalePunctuation(context))
{
}

ProductionFunctions::~ProductionFunctions() { punctuation_->stop(); }

FitArguments ProductionFunctions::fitArguments(const AnyTable& output, const AnyTable& inputs, const Any& form,
                                               const Any& constantReturns, const Any& errors, const Any& level,
                                               const Any& controls) const
{
    FitArguments arguments;
    arguments.output = toCellTable(output, "output");
    arguments.inputs = toCellTable(inputs, "inputs");
    arguments.controls = toOptionalTable(controls, "controls");
    arguments.form = toSingleCell(form, "form");
    arguments.constantReturns = toSingleCell(constantReturns, "constant returns");
    arguments.errors = toSingleCell(errors, "errors");
    arguments.level = toSingleCell(level, "level");
    return arguments;
}

FitArguments ProductionFunctions::withPanelArguments(FitArguments arguments, const Any& groups, const Any& effects,
                                                     const Any& trend, const Any& incompleteRows)
{
    arguments.groups = toOptionalTable(groups, "groups");
    arguments.effects = toSingleCell(effects, "effects");
    arguments.trend = toOptionalTable(trend, "trend");
    arguments.incompleteRows = toSingleCell(incompleteRows, "incomplete rows");
    return arguments;
}

Any ProductionFunctions::prodFit(const AnyTable& output, const AnyTable& inputs, const Any& form,
                                      const Any& constantReturns, const Any& errors, const Any& level,
                                      const Any& controls, const Any& groups, const Any& effects, const Any& trend,
                                      const Any& incompleteRows, const Any& covariance)
{
    return guardedTable([&] {
        // Cut before the cache: a whole column's empty tail is neither hashed nor kept.
        const auto fit = fits_.fit(withoutTrailingEmptyRows(withPanelArguments(
            fitArguments(output, inputs, form, constantReturns, errors, level, controls), groups, effects, trend,
            incompleteRows)));
        return fitTableWithCovariance(fitTable(*fit), *fit, toSingleCell(covariance, "covariance"));
    });
}

Any ProductionFunctions::prodStat(const AnyTable& output, const AnyTable& inputs, const AnyTable& rowLabel,
                                  const Any& columnLabel, const Any& form, const Any& constantReturns,
                                  const Any& errors, const Any& level, const Any& controls, const Any& groups,
                                  const Any& effects, const Any& trend, const Any& incompleteRows)
{
    return guardedValue([&] {
        const auto fit = fits_.fit(withoutTrailingEmptyRows(withPanelArguments(
            fitArguments(output, inputs, form, constantReturns, errors, level, controls), groups, effects, trend,
            incompleteRows)));
        return lookUpFit(*fit, toSingleCell(Any(rowLabel), "row label"), toSingleCell(columnLabel, "column label"));
    });
}

Any ProductionFunctions::prodValue(const AnyTable& table, const AnyTable& rowLabel, const Any& columnLabel)
{
    return guardedValue([&] {
        return tableValue(toCellTable(table, "table"), toSingleCell(Any(rowLabel), "row label"),
                          toSingleCell(columnLabel, "column label"));
    });
}

Any ProductionFunctions::prodOutput(const AnyTable& model, const AnyTable& inputs, const Any& mean, const Any& what)
{
    return guardedTable([&] {
        return outputColumnWithBounds(*models_.cells(model, "model"), toCellTable(inputs, "inputs"),
                                      toSingleCell(mean, "mean"), toSingleCell(what, "what"));
    });
}

Any ProductionFunctions::prodMarginal(const AnyTable& model, const AnyTable& inputs, const AnyTable& input,
                                      const Any& what)
{
    return guardedTable([&] {
        return marginalProductColumnWithBounds(*models_.cells(model, "model"), toCellTable(inputs, "inputs"),
                                               toSingleCell(Any(input), "input"), toSingleCell(what, "what"));
    });
}

Any ProductionFunctions::prodElasticity(const AnyTable& model, const AnyTable& inputs, const AnyTable& input,
                                        const Any& what)
{
    return guardedTable([&] {
        return elasticityColumnWithBounds(*models_.cells(model, "model"), toCellTable(inputs, "inputs"),
                                          toSingleCell(Any(input), "input"), toSingleCell(what, "what"));
    });
}

Any ProductionFunctions::prodScale(const AnyTable& model, const Any& inputs, const Any& what)
{
    return guardedTable([&] {
        return scaleColumnWithBounds(*models_.cells(model, "model"), toOptionalTable(inputs, "inputs"),
                                     toSingleCell(what, "what"));
    });
}

Any ProductionFunctions::prodReturns(const AnyTable& model, const Any& level)
{
    return guardedValue(
        [&] { return Cell(returnsVerdictCell(*models_.cells(model, "model"), toSingleCell(level, "level"))); });
}

Any ProductionFunctions::prodTfp(const AnyTable& model, const AnyTable& output, const AnyTable& inputs,
                                      const Any& periods)
{
    return guardedTable([&] {
        return productivityColumn(*models_.cells(model, "model"), toCellTable(output, "output"),
                                  toCellTable(inputs, "inputs"), toOptionalTable(periods, "periods"));
    });
}

Any ProductionFunctions::prodGrowth(const AnyTable& output, const AnyTable& inputs, const AnyTable& weights,
                                         const Any& method, const Any& periods)
{
    return guardedTable([&] {
        return growthAccountTable(toCellTable(output, "output"), toCellTable(inputs, "inputs"),
                                  toCellTable(weights, "weights"), toSingleCell(method, "method"),
                                  toOptionalTable(periods, "periods"));
    });
}

Any ProductionFunctions::prodIndex(const AnyTable& quantities, const AnyTable& shares, const Any& method,
                                        const Any& base, const Any& periods)
{
    return guardedTable([&] {
        return quantityIndexColumn(toCellTable(quantities, "quantities"), toCellTable(shares, "shares"),
                                   toSingleCell(method, "method"), toSingleCell(base, "base"),
                                   toOptionalTable(periods, "periods"));
    });
}

Any ProductionFunctions::prodRegular(const AnyTable& model, const AnyTable& inputs)
{
    return guardedTable(
        [&] { return regularityAnyColumn(*models_.cells(model, "model"), toCellTable(inputs, "inputs")); });
}

Any ProductionFunctions::prodCompare(const AnyTable& output, const AnyTable& inputs, const Any& level)
{
    return guardedTable([&] {
        return compareFormsTable(toCellTable(output, "output"), toCellTable(inputs, "inputs"),
                                 toSingleCell(level, "level"));
    });
}

Any ProductionFunctions::prodSecond(const AnyTable& model, const AnyTable& inputs, const AnyTable& inputI,
                                    const Any& inputJ)
{
    return guardedTable([&] {
        return secondPartialColumn(*models_.cells(model, "model"), toCellTable(inputs, "inputs"),
                                   toSingleCell(Any(inputI), "input i"), toSingleCell(inputJ, "input j"));
    });
}

Any ProductionFunctions::prodInputReturns(const AnyTable& model, const AnyTable& inputs, const AnyTable& input)
{
    return guardedTable([&] {
        return inputReturnsColumn(*models_.cells(model, "model"), toCellTable(inputs, "inputs"),
                                  toSingleCell(Any(input), "input"));
    });
}

Any ProductionFunctions::prodPair(const AnyTable& model, const AnyTable& inputs, const AnyTable& inputI,
                                  const AnyTable& inputJ)
{
    return guardedTable([&] {
        return inputPairColumn(*models_.cells(model, "model"), toCellTable(inputs, "inputs"),
                               toSingleCell(Any(inputI), "input i"), toSingleCell(Any(inputJ), "input j"));
    });
}

Any ProductionFunctions::prodMrts(const AnyTable& model, const AnyTable& inputs, const AnyTable& inputI,
                                  const AnyTable& inputJ)
{
    return guardedTable([&] {
        return technicalRateColumn(*models_.cells(model, "model"), toCellTable(inputs, "inputs"),
                                   toSingleCell(Any(inputI), "input i"), toSingleCell(Any(inputJ), "input j"));
    });
}

Any ProductionFunctions::prodSubstitution(const AnyTable& model, const AnyTable& inputs, const AnyTable& inputI,
                                          const AnyTable& inputJ, const Any& kind)
{
    return guardedTable([&] {
        return substitutionColumn(*models_.cells(model, "model"), toCellTable(inputs, "inputs"),
                                  toSingleCell(Any(inputI), "input i"), toSingleCell(Any(inputJ), "input j"),
                                  toSingleCell(kind, "kind"));
    });
}

Any ProductionFunctions::prodLeastCost(const AnyTable& model, const AnyTable& targetOutput,
                                       const AnyTable& inputPrices, const Any& what)
{
    return guardedTable([&] {
        const CellTable prices = toCellTable(inputPrices, "input prices");
        return orientedLike(leastCostRowWithBounds(*models_.cells(model, "model"),
                                                   toSingleCell(Any(targetOutput), "target output"), prices,
                                                   toSingleCell(what, "what")),
                            prices);
    });
}

Any ProductionFunctions::prodCost(const AnyTable& model, const AnyTable& targetOutput, const AnyTable& inputPrices,
                                  const Any& what)
{
    return guardedTable([&] {
        return costColumn(*models_.cells(model, "model"), toCellTable(targetOutput, "target output"),
                          toCellTable(inputPrices, "input prices"), toSingleCell(what, "what"));
    });
}

Any ProductionFunctions::prodEfficientScale(const AnyTable& model, const AnyTable& inputPrices)
{
    return guardedTable([&] {
        const CellTable prices = toCellTable(inputPrices, "input prices");
        return efficientScaleCell(*models_.cells(model, "model"), prices);
    });
}

Any ProductionFunctions::prodPriceElasticity(const AnyTable& model, const AnyTable& output, const AnyTable& inputPrices,
                                             const AnyTable& inputI, const AnyTable& inputJ, const Any& kind)
{
    return guardedTable([&] {
        return priceElasticityColumn(*models_.cells(model, "model"), toCellTable(output, "output"),
                                     toCellTable(inputPrices, "input prices"), toSingleCell(Any(inputI), "input i"),
                                     toSingleCell(Any(inputJ), "input j"), toSingleCell(kind, "kind"));
    });
}

Any ProductionFunctions::prodCostFit(const AnyTable& cost, const AnyTable& output, const AnyTable& prices,
                                     const Any& form, const Any& shares, const Any& errors, const Any& level,
                                     const Any& controls, const Any& groups, const Any& effects, const Any& trend,
                                     const Any& incompleteRows)
{
    return guardedTable([&] {
        CostFitArguments arguments;
        arguments.cost = toCellTable(cost, "cost");
        arguments.output = toCellTable(output, "output");
        arguments.prices = toCellTable(prices, "input prices");
        arguments.form = toSingleCell(form, "form");
        arguments.shares = toOptionalTable(shares, "shares");
        arguments.errors = toSingleCell(errors, "errors");
        arguments.level = toSingleCell(level, "level");
        arguments.controls = toOptionalTable(controls, "controls");
        arguments.groups = toOptionalTable(groups, "groups");
        arguments.effects = toSingleCell(effects, "effects");
        arguments.trend = toOptionalTable(trend, "trend");
        arguments.incompleteRows = toSingleCell(incompleteRows, "incomplete rows");
        return costFitTable(costFitFromArguments(arguments));
    });
}

Any ProductionFunctions::prodBudget(const AnyTable& model, const AnyTable& budget, const AnyTable& inputPrices)
{
    return guardedTable([&] {
        const CellTable prices = toCellTable(inputPrices, "input prices");
        return orientedLike(budgetRow(*models_.cells(model, "model"), toSingleCell(Any(budget), "budget"), prices),
                            prices);
    });
}

Any ProductionFunctions::prodProfit(const AnyTable& model, const AnyTable& outputPrice, const AnyTable& inputPrices)
{
    return guardedTable([&] {
        const CellTable prices = toCellTable(inputPrices, "input prices");
        return orientedLike(
            profitRow(*models_.cells(model, "model"), toSingleCell(Any(outputPrice), "output price"), prices), prices);
    });
}

Any ProductionFunctions::prodFrontier(const AnyTable& output, const AnyTable& inputs, const Any& form,
                                      const Any& inefficiency, const Any& level, const Any& controls)
{
    return guardedTable([&] {
        return frontierTable(frontierFromArguments(
            {toCellTable(output, "output"), toCellTable(inputs, "inputs"), toSingleCell(form, "form"),
             toSingleCell(inefficiency, "inefficiency"), toSingleCell(level, "level"),
             toOptionalTable(controls, "controls")}));
    });
}

Any ProductionFunctions::prodEfficiency(const AnyTable& model, const AnyTable& output, const AnyTable& inputs,
                                        const Any& what)
{
    return guardedTable([&] {
        return efficiencyColumn(*models_.cells(model, "model"), toCellTable(output, "output"),
                                toCellTable(inputs, "inputs"), toSingleCell(what, "what"));
    });
}

Any ProductionFunctions::prodIsoquant(const AnyTable& model, const AnyTable& outputLevel, const AnyTable& values,
                                      const Any& inputI, const Any& inputJ)
{
    return guardedTable([&] {
        return isoquantColumn(*models_.cells(model, "model"), toSingleCell(Any(outputLevel), "output level"),
                              toCellTable(values, "values of input i"), toSingleCell(inputI, "input i"),
                              toSingleCell(inputJ, "input j"));
    });
}

Any ProductionFunctions::prodEnvelope(const AnyTable& outputs, const AnyTable& inputs, const Any& returns,
                                      const Any& orientation, const Any& what, const Any& names)
{
    return guardedTable([&] {
        return envelopeColumn(toCellTable(outputs, "outputs"), toCellTable(inputs, "inputs"),
                              toSingleCell(returns, "returns"), toSingleCell(orientation, "orientation"),
                              toSingleCell(what, "what"), toOptionalTable(names, "names"));
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
