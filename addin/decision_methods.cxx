// The cell functions of decisions, cost models and efficiency: the methods of ProductionFunctions
// that hand a model and prices, or data for a frontier or an envelope, to the core.
#include "production_functions.hxx"

#include "isoquant/sheet/arguments/argument_names.hpp"
#include "call_guards.hxx"
#include "cell_conversion.hxx"

#include "isoquant/sheet/functions/bound_functions.hpp"
#include "isoquant/sheet/functions/cost_decisions.hpp"
#include "isoquant/sheet/functions/cost_functions.hpp"
#include "isoquant/sheet/functions/decision_functions.hpp"
#include "isoquant/sheet/functions/envelope_functions.hpp"
#include "isoquant/sheet/functions/frontier_functions.hpp"
#include "isoquant/sheet/tables/cost_table.hpp"
#include "isoquant/sheet/tables/frontier_table.hpp"

namespace isoquant::addin {

Any ProductionFunctions::prodLeastCost(const AnyTable& model, const AnyTable& targetOutput,
                                       const AnyTable& inputPrices, const Any& what)
{
    return guardedTable([&] {
        const CellTable prices = toCellTable(inputPrices, argument::inputPrices);
        return orientedLike(leastCostRowWithBounds(models_.table(model, argument::model),
                                                   toSingleCell(Any(targetOutput), argument::targetOutput), prices,
                                                   toSingleCell(what, argument::what)),
                            prices);
    });
}

Any ProductionFunctions::prodCost(const AnyTable& model, const AnyTable& targetOutput, const AnyTable& inputPrices,
                                  const Any& what, const Any& statistic)
{
    return guardedTable([&] {
        return costColumnWithBounds(models_.table(model, argument::model),
                                    toCellTable(targetOutput, argument::targetOutput),
                                    toCellTable(inputPrices, argument::inputPrices), toSingleCell(what, argument::what),
                                    toSingleCell(statistic, argument::statistic));
    });
}

Any ProductionFunctions::prodEfficientScale(const AnyTable& model, const AnyTable& inputPrices, const Any& what)
{
    return guardedTable([&] {
        const CellTable prices = toCellTable(inputPrices, argument::inputPrices);
        return efficientScaleCell(models_.table(model, argument::model), prices, toSingleCell(what, argument::what));
    });
}

Any ProductionFunctions::prodPriceElasticity(const AnyTable& model, const AnyTable& output, const AnyTable& inputPrices,
                                             const AnyTable& inputI, const AnyTable& inputJ, const Any& kind)
{
    return guardedTable([&] {
        return priceElasticityColumn(
            models_.table(model, argument::model), toCellTable(output, argument::output),
            toCellTable(inputPrices, argument::inputPrices), toSingleCell(Any(inputI), argument::firstInput),
            toSingleCell(Any(inputJ), argument::secondInput), toSingleCell(kind, argument::kind));
    });
}

Any ProductionFunctions::prodCostFit(const AnyTable& cost, const AnyTable& output, const AnyTable& prices,
                                     const Any& form, const Any& shares, const Any& errors, const Any& level,
                                     const Any& controls, const Any& groups, const Any& effects, const Any& trend,
                                     const Any& incompleteRows, const Any& inefficiency, const Any& covariance)
{
    return guardedTable([&] {
        CostFitArguments arguments;
        arguments.cost = toCellTable(cost, argument::cost);
        arguments.output = toCellTable(output, argument::output);
        arguments.prices = toCellTable(prices, argument::inputPrices);
        arguments.form = toSingleCell(form, argument::form);
        arguments.shares = toOptionalTable(shares, argument::shares);
        arguments.errors = toSingleCell(errors, argument::errors);
        arguments.level = toSingleCell(level, argument::level);
        arguments.controls = toOptionalTable(controls, argument::controls);
        arguments.groups = toOptionalTable(groups, argument::groups);
        arguments.effects = toSingleCell(effects, argument::effects);
        arguments.trend = toOptionalTable(trend, argument::trend);
        arguments.incompleteRows = toSingleCell(incompleteRows, argument::incompleteRows);
        arguments.inefficiency = toSingleCell(inefficiency, argument::inefficiency);
        const Cell withCovariance = toSingleCell(covariance, argument::covariance);
        return costFitTableWithCovariance(costFitFromArguments(arguments), withCovariance);
    });
}

Any ProductionFunctions::prodBudget(const AnyTable& model, const AnyTable& budget, const AnyTable& inputPrices,
                                    const Any& what)
{
    return guardedTable([&] {
        const CellTable prices = toCellTable(inputPrices, argument::inputPrices);
        return orientedLike(budgetRowWithBounds(models_.table(model, argument::model),
                                                toSingleCell(Any(budget), argument::budget), prices,
                                                toSingleCell(what, argument::what)),
                            prices);
    });
}

Any ProductionFunctions::prodProfit(const AnyTable& model, const AnyTable& outputPrice, const AnyTable& inputPrices)
{
    return guardedTable([&] {
        const CellTable prices = toCellTable(inputPrices, argument::inputPrices);
        return orientedLike(profitRow(models_.table(model, argument::model),
                                      toSingleCell(Any(outputPrice), argument::outputPrice), prices),
                            prices);
    });
}

Any ProductionFunctions::prodFrontier(const AnyTable& output, const AnyTable& inputs, const Any& form,
                                      const Any& inefficiency, const Any& level, const Any& controls,
                                      const Any& covariance)
{
    return guardedTable([&] {
        const Cell withCovariance = toSingleCell(covariance, argument::covariance);
        return frontierTableWithCovariance(
            frontierFromArguments(
                {toCellTable(output, argument::output), toCellTable(inputs, argument::inputs),
                 toSingleCell(form, argument::form), toSingleCell(inefficiency, argument::inefficiency),
                 toSingleCell(level, argument::level), toOptionalTable(controls, argument::controls)}),
            withCovariance);
    });
}

Any ProductionFunctions::prodEfficiency(const AnyTable& model, const AnyTable& output, const AnyTable& inputs,
                                        const Any& what)
{
    return guardedTable([&] {
        return efficiencyColumn(models_.table(model, argument::model).cells(), toCellTable(output, argument::output),
                                toCellTable(inputs, argument::inputs), toSingleCell(what, argument::what));
    });
}

Any ProductionFunctions::prodIsoquant(const AnyTable& model, const AnyTable& outputLevel, const AnyTable& values,
                                      const Any& inputI, const Any& inputJ)
{
    return guardedTable([&] {
        return isoquantColumn(models_.table(model, argument::model),
                              toSingleCell(Any(outputLevel), argument::outputLevel),
                              toCellTable(values, argument::valuesOfFirstInput),
                              toSingleCell(inputI, argument::firstInput), toSingleCell(inputJ, argument::secondInput));
    });
}

Any ProductionFunctions::prodEnvelope(const AnyTable& outputs, const AnyTable& inputs, const Any& returns,
                                      const Any& orientation, const Any& what, const Any& names)
{
    return guardedTable([&] {
        return envelopeColumn(toCellTable(outputs, argument::outputs), toCellTable(inputs, argument::inputs),
                              toSingleCell(returns, argument::returns),
                              toSingleCell(orientation, argument::orientation), toSingleCell(what, argument::what),
                              toOptionalTable(names, argument::names));
    });
}

} // namespace isoquant::addin
