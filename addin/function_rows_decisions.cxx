// The rows of the function table (function_table.cxx), one function per family: decisions, cost, efficiency.
#include "function_arguments.hxx"

namespace isoquant::addin {

// The producer's decisions.
std::vector<FunctionInfo> decisionFunctions()
{
    return {
        {"prodLeastCost",
         "PRODLEASTCOST",
         "Cheapest input amounts that produce the target output at the given input prices: one amount per input, "
         "a row or a column like the prices (enter as an array formula). With a cost model (as for PRODCOST) by "
         "Shephard's lemma: amount = fitted cost share x cost / price.",
         {modelArgument, targetArgument, pricesArgument, boundsArgument}},
        {"prodBudget",
         "PRODBUDGET",
         "Best split of a fixed budget among the inputs: the amount of each input that gives the most output for "
         "exactly that spending, then that output; a row or a column like the prices (enter as an array formula).",
         {modelArgument,
          {argument::budget, "The money to spend on the inputs, a positive number."},
          pricesArgument,
          boundsArgument}},
        {"prodProfit",
         "PRODPROFIT",
         "Profit-maximising plan at the given output and input prices: the amount of each input, then output and "
         "profit, a row or a column like the input prices (enter as an array formula). Under constant or "
         "increasing returns to scale there is no finite maximum, and the cell says so.",
         {modelArgument,
          {argument::outputPrice, "The price one unit of output sells for, a positive number."},
          pricesArgument}},
        {"prodIsoquant",
         "PRODISOQUANT",
         "Points of an isoquant: for each value of input i, the amount of input j that keeps output at the given "
         "level, a column (for an XY chart). A row without such an amount says so.",
         {modelArgument,
          {argument::outputLevel, "The output the isoquant keeps, a positive number."},
          {argument::valuesOfFirstInput,
           "A column of values of input i; for a model of more than two inputs one column "
           "per input, the others held at each row's values (input j's column is not read)."},
          {argument::firstInput,
           "Optional: the input whose values are given, its number or its label (default: the first)."},
          {argument::secondInput, "Optional: the input solved for, its number or its label (default: the first other "
                                  "input)."}}},
    };
}

// Cost from a model: a production model's dual, or a cost model's own.
std::vector<FunctionInfo> costModelFunctions()
{
    return {
        {"prodCost",
         "PRODCOST",
         "Cost of producing the target output in the cheapest way at the given input prices: total, marginal "
         "(of one more unit of output), average, cost elasticity or returns to scale. The model may also be a cost "
         "function: a PRODCOSTFIT table, or typed rows form | cobb-douglas cost, constant | value, output | value, "
         "then one row per input, its label | its price coefficient. A column of outputs gives a column of figures.",
         {modelArgument,
          {argument::targetOutput,
           "The output to be produced, a positive number, or a column of outputs (the result is "
           "then a column)."},
          {argument::inputPrices, "One positive price per input, in the model's order, as a row or a column; with a "
                                  "column of outputs, one row of prices per output (or one row for all)."},
          {argument::what,
           "\"total\" (default), \"marginal\", \"average\", \"cost elasticity\" (percent change of cost "
           "per percent of output) or \"returns to scale\" (its inverse)."},
          {argument::statistic,
           "\"value\" (default), \"std. error\", \"lower bound\" or \"upper bound\" of that figure: by "
           "the delta method from the covariance block of a PRODFIT table (any form) or a PRODCOSTFIT "
           "table made with covariance TRUE, at its level and t distribution. Cost is positive by nature: "
           "total, marginal and average cost get bounds on the log scale, so they never cross 0; cost "
           "elasticity and returns to scale get value -/+ t times the std. error."}}},
        {"prodEfficientScale",
         "PRODEFFICIENTSCALE",
         "Output at which average cost is lowest at the given input prices (the efficient scale), from a cost "
         "model (PRODCOSTFIT table or typed rows, as for PRODCOST) or a production model whose returns to scale "
         "fall with size. Says so when average cost falls or rises at every output in the model.",
         {modelArgument,
          {argument::inputPrices, "One positive price per input, in the model's order, as a row or a column."},
          {argument::what,
           "\"value\" (default), \"std. error\", \"lower bound\" or \"upper bound\" of the efficient scale: by "
           "the delta method from the covariance block of a translog PRODCOSTFIT table, or of a translog PRODFIT "
           "table (through its least-cost plans), made with covariance TRUE, at its level and t distribution. The "
           "scale is positive by nature: its bounds are taken on the log scale, so they never cross 0."}}},
        {"prodPriceElasticity",
         "PRODPRICEELASTICITY",
         "Price elasticity between inputs i and j at the least-cost plan for the output: \"demand\" (percent change "
         "of the cost-minimising amount of i per percent change in the price of j, output held), \"allen\" or "
         "\"morishima\". From a cost model (as for PRODCOST) or, by duality, from a production model.",
         {modelArgument,
          {argument::output, "The output, a positive number, or a column of outputs (the result is then a column)."},
          {argument::inputPrices, "One positive price per input, in the model's order, as a row or a column; with a "
                                  "column of outputs, one row of prices per output (or one row for all)."},
          {argument::firstInput, "The input whose amount responds: its number (1 for the first) or its label."},
          {argument::secondInput, "The input whose price moves: its number or its label."},
          {argument::kind,
           "\"demand\" (default), \"allen\" or \"morishima\" (not symmetric: i and j in the order given, as "
           "PRODSUBSTITUTION)."}}},
    };
}

// The cost function fitted from the books (PRODCOSTFIT).
std::vector<FunctionInfo> costFitFunctions()
{
    return {
        {"prodCostFit",
         "PRODCOSTFIT",
         "Fits a cost function to observed cost, output and input prices by least squares on logs, homogeneous "
         "of degree one in prices, or with inefficiency a stochastic cost frontier (the least cost, by maximum "
         "likelihood). Returns a table (enter as an array formula): estimates with standard errors, fit "
         "statistics, cost elasticity, returns to scale with its test and verdict, efficient scale.",
         {{argument::cost,
           "Total cost of each row (plant, branch or period): one column of positive numbers. A first row "
           "of text is read as a header."},
          {argument::output, "Output of each row: one column of positive numbers, as many rows as cost."},
          {argument::inputPrices,
           "The prices each row paid for its inputs, one column per input, positive numbers, as many rows as cost. A "
           "first row of text names the inputs; homogeneity is imposed by dividing by the last price."},
          {argument::form, "\"cobb-douglas\" (default) or \"translog\"."},
          {argument::shares,
           "Optional cost shares of the inputs, one column per price in the same order, as many rows as "
           "cost, each row summing to 1 within 0.01 (fractions). Given, the cost equation and all but the "
           "last share equation are fitted jointly by iterated GLS (seemingly unrelated regressions)."},
          {argument::errors,
           "Standard errors: \"classical\" (default), \"hc1\" or \"hc3\" (robust to heteroskedasticity) or "
           "\"cluster\" (by the groups; tests on G - 1 degrees of freedom); other than classical without shares "
           "and without inefficiency only."},
          levelArgument,
          {argument::controls,
           "Optional extra columns entered in ln cost as they are, not logged (a rate, a 0/1 dummy), as many rows "
           "as cost; PRODCOST then uses the constant at their means."},
          {argument::groups,
           "Optional column naming the plant or firm of each row (numbers or texts), as many rows as cost, a "
           "header row allowed. Needed for effects and for \"cluster\" errors. Not with inefficiency."},
          {argument::effects,
           "\"none\" (default), \"fixed\" (one effect per group, within estimator) or \"two-way\" (group and "
           "period effects; the periods come from trend). Not with shares or inefficiency."},
          {argument::trend,
           "Optional column of periods (years), as many rows as cost: adds a time trend, reported as the cost "
           "change per period at given output and prices (negative: costs fall). With \"two-way\" effects it "
           "gives the periods instead. Not with inefficiency."},
          {argument::incompleteRows,
           "TRUE to leave out rows with a blank or text cell in cost, output, input prices, shares, "
           "controls or trend, or a blank in groups (the table counts them); FALSE or empty: such a "
           "cell is an error."},
          {argument::inefficiency,
           "Empty (default): the average cost function. \"half-normal\" or \"exponential\": a "
           "cost frontier, ln cost = frontier + noise + inefficiency, whose table adds noise SD, "
           "inefficiency SD, lambda, the inefficiency test, mean efficiency and convergence; "
           "PRODEFFICIENCY then gives each row's cost efficiency. Not with shares or panel options; "
           "controls are allowed."},
          {argument::covariance,
           "TRUE to add below the table the estimated covariance matrix of the parameters (of the kind chosen "
           "by errors), one row per parameter, so that PRODCOST's statistic gives bounds from this table; with "
           "controls, effects or a trend one more row, the constant for predictions. The "
           "table is then max(7, q + 1) columns wide and 1 + q rows longer, q those rows (with inefficiency "
           "the inverse observed information; its header says likelihood and normal). FALSE or empty: no "
           "block."}}},
    };
}

// How far each row is from best practice.
std::vector<FunctionInfo> efficiencyFunctions()
{
    return {
        {"prodFrontier",
         "PRODFRONTIER",
         "Fits a stochastic production frontier by maximum likelihood: ln output = frontier + noise - "
         "inefficiency. Returns a table (enter as an array formula): the frontier's estimates, noise SD, "
         "inefficiency SD and lambda with standard errors, the likelihood, a test that there is inefficiency at "
         "all, the mean efficiency, returns to scale and convergence. The result depends on the assumed "
         "distribution of inefficiency; it measures how far a row lags, not why.",
         {outputArgument,
          inputsArgument,
          {argument::form, "\"cobb-douglas\" (default) or \"translog\"."},
          {argument::inefficiency, "Distribution of inefficiency: \"half-normal\" (default) or \"exponential\"."},
          levelArgument,
          controlsArgument,
          {argument::covariance,
           "TRUE to add below the table the estimated covariance matrix of the frontier's coefficients (the "
           "inverse observed information; its header says likelihood and normal), one row per coefficient; "
           "the table is then max(7, p + 1) columns wide and 1 + p rows longer. FALSE or empty: no block."}}},
        {"prodEfficiency",
         "PRODEFFICIENCY",
         "Technical efficiency of each row from a PRODFRONTIER table: the expected share of frontier output the "
         "row reaches (1 = on the frontier), or its inefficiency or the bounds of its efficiency. From a "
         "PRODCOSTFIT cost frontier, cost efficiency: the expected ratio of least cost to the row's cost (at most "
         "1). A column, one value per row.",
         {{argument::model, "A PRODFRONTIER table, whole (its first cell reads \"half-normal frontier\" or "
                            "\"exponential frontier\"), or a PRODCOSTFIT table fitted with inefficiency (\"half-normal "
                            "cost frontier\" or \"exponential cost frontier\")."},
          {argument::output,
           "Output of each row: one column of positive numbers. For a cost frontier, the cost of each row "
           "instead."},
          {argument::inputs,
           "Inputs of each row in the table's order (then its controls, if it has any), as many rows as "
           "output. A first row of text names the columns, which are then matched by label. For a cost "
           "frontier, the output column, then the price columns in PRODCOSTFIT's order."},
          {argument::what, "\"efficiency\" (default: E[exp(-u) | residual], Battese and Coelli), \"inefficiency\" "
                           "(E[u | residual], Jondrow et al.), \"lower bound\" or \"upper bound\" (of efficiency, at "
                           "the table's confidence level, Horrace and Schmidt; given the residual at the fitted "
                           "parameters, without their estimation uncertainty)."}}},
        {"prodEnvelope",
         "PRODENVELOPE",
         "Data envelopment: each row's (plant's) efficiency against the best practice of all rows, by linear "
         "programming; several outputs allowed. A column, one value per row (1 = on the frontier). A score is "
         "relative to the rows given: few rows and many inputs make scores high.",
         {{argument::outputs, "Outputs of each row, one column per output, numbers of zero or more, each row with a "
                              "positive one. A first row of text names the outputs."},
          {argument::inputs,
           "Inputs of each row, one column per input, numbers of zero or more, each row with a positive "
           "one, as many rows as outputs. A first row of text names the inputs."},
          {argument::returns, "Returns to scale of the frontier: \"constant\" (default), \"variable\" or "
                              "\"non-increasing\"."},
          {argument::orientation, "\"input\" (default: the share of its inputs a row would need) or \"output\" (its "
                                  "output as a share of what it could produce, 1/phi)."},
          {argument::what, "\"score\" (default), \"scale efficiency\" (constant-returns score / variable-returns "
                           "score), \"peers\" (the rows it is compared with and their weights) or \"target <label>\" "
                           "(the amount of that input or output on the frontier, slacks included)."},
          {argument::names,
           "Optional column naming each row (a plant or branch), as many rows as outputs, a header row "
           "allowed: peers are then listed by these names instead of row numbers."}}},
    };
}

} // namespace isoquant::addin
