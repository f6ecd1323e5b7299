// The cell functions of decisions, cost models and efficiency: the methods of ProductionFunctions
// that hand a model and prices, or data for a frontier or an envelope, to the core.
#include "production_functions.hxx"

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
        const CellTable prices = toCellTable(inputPrices, "input prices");
        return orientedLike(leastCostRowWithBounds(models_.table(model, "model"),
                                                   toSingleCell(Any(targetOutput), "target output"), prices,
                                                   toSingleCell(what, "what")),
                            prices);
    });
}

Any ProductionFunctions::prodCost(const AnyTable& model, const AnyTable& targetOutput, const AnyTable& inputPrices,
                                  const Any& what, const Any& statistic)
{
    return guardedTable([&] {
        return costColumnWithBounds(models_.table(model, "model"), toCellTable(targetOutput, "target output"),
                                    toCellTable(inputPrices, "input prices"), toSingleCell(what, "what"),
                                    toSingleCell(statistic, "statistic"));
    });
}

Any ProductionFunctions::prodEfficientScale(const AnyTable& model, const AnyTable& inputPrices)
{
    return guardedTable([&] {
        const CellTable prices = toCellTable(inputPrices, "input prices");
        return efficientScaleCell(models_.table(model, "model"), prices);
    });
}

Any ProductionFunctions::prodPriceElasticity(const AnyTable& model, const AnyTable& output, const AnyTable& inputPrices,
                                             const AnyTable& inputI, const AnyTable& inputJ, const Any& kind)
{
    return guardedTable([&] {
        return priceElasticityColumn(models_.table(model, "model"), toCellTable(output, "output"),
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

Any ProductionFunctions::prodBudget(const AnyTable& model, const AnyTable& budget, const AnyTable& inputPrices,
                                    const Any& what)
{
    return guardedTable([&] {
        const CellTable prices = toCellTable(inputPrices, "input prices");
        return orientedLike(budgetRowWithBounds(models_.table(model, "model"), toSingleCell(Any(budget), "budget"),
                                                prices, toSingleCell(what, "what")),
                            prices);
    });
}

Any ProductionFunctions::prodProfit(const AnyTable& model, const AnyTable& outputPrice, const AnyTable& inputPrices)
{
    return guardedTable([&] {
        const CellTable prices = toCellTable(inputPrices, "input prices");
        return orientedLike(
            profitRow(models_.table(model, "model"), toSingleCell(Any(outputPrice), "output price"), prices), prices);
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
        return efficiencyColumn(models_.table(model, "model").cells(), toCellTable(output, "output"),
                                toCellTable(inputs, "inputs"), toSingleCell(what, "what"));
    });
}

Any ProductionFunctions::prodIsoquant(const AnyTable& model, const AnyTable& outputLevel, const AnyTable& values,
                                      const Any& inputI, const Any& inputJ)
{
    return guardedTable([&] {
        return isoquantColumn(models_.table(model, "model"), toSingleCell(Any(outputLevel), "output level"),
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

} // namespace isoquant::addin
