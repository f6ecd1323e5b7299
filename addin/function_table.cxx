#include "function_table.hxx"

#include "isoquant/sheet/arguments/argument_names.hpp"
#include "isoquant/math/messages/text.hpp"

#include <utility>

namespace isoquant::addin {

namespace {

constexpr ArgumentInfo formArgument{
    argument::form, "Functional form: \"cobb-douglas\" (default), \"ces\" (exactly two inputs, by nonlinear least "
                    "squares) or \"translog\"."};
constexpr ArgumentInfo constantReturnsArgument{
    argument::constantReturns, "TRUE to impose constant returns to scale (exponents summing to 1); FALSE or empty to "
                               "estimate them freely."};
constexpr ArgumentInfo errorsArgument{
    argument::errors, "Standard errors: \"classical\" (default), \"hc1\" or \"hc3\" (robust to heteroskedasticity), or "
                      "\"cluster\" (robust within each group of the groups argument; tests then use G - 1 degrees of "
                      "freedom for G groups)."};
constexpr ArgumentInfo levelArgument{
    argument::level,
    "Confidence level of the bounds and of the returns-to-scale verdict, between 0 and 1 (default 0.95)."};
constexpr ArgumentInfo controlsArgument{
    argument::controls, "Optional extra columns entered as they are, not logged (a rate, a 0/1 dummy), as many rows as "
                        "output."};
constexpr ArgumentInfo groupsArgument{
    argument::groups,
    "Optional column naming the plant or firm of each row (numbers or texts), as many rows as output, "
    "a header row allowed. Needed for effects and for \"cluster\" errors."};
constexpr ArgumentInfo effectsArgument{
    argument::effects, "\"none\" (default: groups only define clusters), \"fixed\" (one effect per group, within "
                       "estimator) or \"two-way\" (group and period effects; the periods come from trend)."};
constexpr ArgumentInfo trendArgument{
    argument::trend, "Optional column of periods (years), as many rows as output: adds a time trend, reported as the "
                     "rate of technical change per period (per day for dates: use =YEAR(date) for years). With "
                     "\"two-way\" effects it gives the periods instead."};
constexpr ArgumentInfo incompleteRowsArgument{
    argument::incompleteRows,
    "TRUE to leave out rows with a blank or text cell (the table counts them); FALSE or empty: "
    "such a cell is an error. Empty rows below the data end it either way (whole columns "
    "work). A cell with an error value (#N/A) stops Calc before the call (Err:504)."};
// The optional last argument of PRODGROWTH and PRODINDEX.
constexpr ArgumentInfo periodNamesArgument{
    argument::periods, "Optional: the year or name of each period (numbers or texts), as many rows as the periods, a "
                       "header row allowed. They label the table's rows and the messages instead of 2, 3, …."};
constexpr ArgumentInfo modelArgument{
    argument::model,
    "A PRODFIT table, or a table typed by hand, labels in the first column and values in the second. "
    "Row 1: form | cobb-douglas (or ces, translog). Row 2: A | value (or ln A | value). Cobb-douglas: "
    "then one row per input, its label | its exponent. Ces: then delta, sigma (or rho) and nu rows, and "
    "optionally a row inputs | label 1 | label 2. Translog: then one row per input (label | first-order "
    "coefficient) and one per pair i <= j (label*label | coefficient, 0 without interaction). An "
    "optional smearing factor row serves PRODOUTPUT's mean."};
constexpr ArgumentInfo bundlesArgument{
    argument::inputs,
    "One row of input values in the model's input order, or several rows: the result is then a column "
    "with one value per row."};
constexpr ArgumentInfo inputArgument{argument::input, "Which input: its number (1 for the first) or its label."};
// The evaluators' optional last argument (issue 20).
constexpr ArgumentInfo boundsArgument{
    argument::what,
    "\"value\" (default), \"std. error\", \"lower bound\" or \"upper bound\": by the delta method from the "
    "covariance block of a PRODFIT table made with covariance TRUE, at its level and t distribution; output, "
    "marginal products, least-cost and budget amounts, TFP and rates of substitution get bounds on the log "
    "scale. "
    "Cobb-douglas form."};

// Arguments shared by the decision functions.
constexpr ArgumentInfo firstInputArgument{argument::firstInput,
                                          "The first input: its number (1 for the first) or its label."};
constexpr ArgumentInfo secondInputArgument{argument::secondInput, "The second input: its number or its label."};
constexpr ArgumentInfo targetArgument{argument::targetOutput, "The output to be produced, a positive number."};
constexpr ArgumentInfo pricesArgument{
    argument::inputPrices, "One positive price per input, in the model's input order: a row of prices gives a row of "
                           "results, a column of prices a column."};

// PRODFIT, PRODSTAT and the evaluators of a model.
std::vector<FunctionInfo> productionFitFunctions()
{
    return {
        {"prodFit",
         "PRODFIT",
         "Fits a production function to output and inputs by least squares on logs. Returns a table (enter as an "
         "array formula): estimates with standard errors, t, p-values and confidence bounds, fit statistics, "
         "returns to scale with the test that it equals 1, and a verdict.",
         {outputArgument,
          inputsArgument,
          formArgument,
          constantReturnsArgument,
          errorsArgument,
          levelArgument,
          controlsArgument,
          groupsArgument,
          effectsArgument,
          trendArgument,
          incompleteRowsArgument,
          {argument::covariance,
           "TRUE to add below the table the estimated covariance matrix of the parameters (of the "
           "kind chosen by errors), one row per parameter, for bounds on derived numbers; the table is "
           "then max(7, p + 1) columns wide and 1 + p rows longer, p parameters. Cobb-douglas form "
           "only. FALSE or empty: no block."}}},
        {"prodStat",
         "PRODSTAT",
         "One value of the PRODFIT table, looked up by row and column label, without an array formula.",
         {outputArgument,
          inputsArgument,
          {argument::rowLabel, "A row of the table: ln A, an input's label, R2, adjusted R2, residual SD, F, "
                               "log-likelihood, AIC, BIC, returns to scale, verdict, observations, smearing factor…; "
                               "with effects also \"effect of group <label>\" (and \"effect of period <year>\")."},
          {argument::columnLabel, "value (default), std. error, t, p-value, lower bound or upper bound."},
          formArgument,
          constantReturnsArgument,
          errorsArgument,
          levelArgument,
          controlsArgument,
          groupsArgument,
          effectsArgument,
          trendArgument,
          incompleteRowsArgument}},
        {"prodValue",
         "PRODVALUE",
         "One value of a table already on the sheet (PRODFIT, PRODCOSTFIT, …), looked up by row and column label: "
         "the quick way to show figures of one fit in many cells.",
         {{argument::table,
           "The whole table as the fitting function returned it, header row included, e.g. $I$1:$O$17."},
          {argument::rowLabel, "A row of the table: ln A, an input's label, R2, residual SD, F, AIC, returns to scale, "
                               "verdict, observations, smearing factor…"},
          {argument::columnLabel,
           "A word of the table's header row: value (default), std. error, t, p-value, lower bound "
           "or upper bound."}}},
        {"prodOutput",
         "PRODOUTPUT",
         "Output the model predicts for each row of inputs.",
         {modelArgument,
          bundlesArgument,
          {argument::mean,
           "TRUE for the mean prediction (the median times the table's smearing factor); FALSE or empty "
           "for the median prediction, exp of the fitted log."},
          {argument::what,
           "As for PRODMARGINAL (\"value\", \"std. error\", \"lower bound\", \"upper bound\"), and "
           "\"prediction lower\" or \"prediction upper\": the interval for one new plant's output, adding the "
           "residual variance."}}},
        {"prodMarginal",
         "PRODMARGINAL",
         "Marginal product of one input for each row of inputs: the extra output from one more unit of it.",
         {modelArgument, bundlesArgument, inputArgument, boundsArgument}},
        {"prodElasticity",
         "PRODELASTICITY",
         "Output elasticity of one input for each row of inputs: the % change in output per 1% more of it.",
         {modelArgument, bundlesArgument, inputArgument, boundsArgument}},
        {"prodScale",
         "PRODSCALE",
         "Returns to scale: the % change in output when every input rises by 1% (the sum of the elasticities).",
         {modelArgument,
          {argument::inputs, "Optional rows of input values: the result is then a column with one value per row."},
          boundsArgument}},
        {"prodReturns",
         "PRODRETURNS",
         "Verdict on returns to scale: increasing, constant or decreasing, by the test of returns to scale = 1 at "
         "the given level. A typed model without standard errors is judged by its returns to scale alone; a ces "
         "table without a test (boundary, not converged, not identified) gives its own \"not tested (...)\".",
         {modelArgument, {argument::level, "Confidence level of the test, between 0 and 1 (default 0.95)."}}},
    };
}

// Productivity and growth.
std::vector<FunctionInfo> growthFunctions()
{
    return {
        {"prodTfp",
         "PRODTFP",
         "Total factor productivity of each row: observed output divided by the output the model predicts from that "
         "row's inputs (1 = exactly as predicted). A column, one value per row. On the rows a PRODFIT table was "
         "fitted to, the geometric mean is 1 (with a trend, when periods is given).",
         {modelArgument,
          outputArgument,
          {argument::inputs,
           "Inputs of each row in the model's input order, as many rows as output. A first row of text "
           "names the inputs."},
          {argument::periods,
           "Optional, for a model with a trend: the period (year) of each row, as many rows as output. "
           "Each row is then compared with its own period's technology: ln A + technical change per "
           "period × (period - latest period)."},
          boundsArgument}},
        {"prodGrowth",
         "PRODGROWTH",
         "Growth accounting from one period to the next: output growth split into each input's contribution, a "
         "scale effect and TFP growth (the residual), in log differences, plus a total row. Returns a table (enter "
         "as an array formula). TFP growth excludes the scale effect: the Solow residual (output growth minus the "
         "contributions) = scale effect + TFP growth.",
         {{argument::output,
           "Output of each period, in time order: one column of positive numbers. A first row of text is "
           "read as a header."},
          {argument::inputs,
           "Input quantities of each period, one column per input, positive, as many periods as output. "
           "A first row of text names the inputs."},
          {argument::weights,
           "A model (a PRODFIT table or a typed model: its elasticities at each period's inputs) or cost "
           "shares of the inputs, one column per input and one row per period, each row summing to 1 "
           "within 0.01 (rescaled to exactly 1; fractions, not percent). A header such as \"labour "
           "share\" names the input."},
          {argument::method,
           "\"tornqvist\" (default: weights averaged over adjacent periods) or \"fixed\" (the constant "
           "elasticities of a cobb-douglas model)."},
          periodNamesArgument}},
        {"prodIndex",
         "PRODINDEX",
         "Chained quantity index of several inputs weighted by their cost shares: one value per period, the first "
         "period = 1 unless a base is given.",
         {{argument::quantities, "Quantities of each period, one column per input, positive. A first row of text names "
                                 "them."},
          {argument::shares,
           "Cost shares of the inputs in each period, the same shape as quantities, each row summing to 1 "
           "within 0.01 (rescaled to exactly 1; fractions, not percent). A header such as \"labour "
           "share\" names the input."},
          {argument::method, "\"tornqvist\" (default), \"laspeyres\", \"paasche\" or \"fisher\"."},
          {argument::base,
           "Value of the index in the first period, a positive number (default 1; 100 for percentages)."},
          periodNamesArgument}},
    };
}

// The shape of a technology: regularity, form comparison, second derivatives, substitution.
std::vector<FunctionInfo> shapeFunctions()
{
    return {
        {"prodRegular",
         "PRODREGULAR",
         "Whether the model is regular at each row of inputs: \"regular\" when every marginal product is positive "
         "and the isoquants are convex (bordered Hessian test), otherwise which condition fails. With a cost "
         "model (as for PRODCOST) each row holds the output then one price per input: \"regular\" when every "
         "fitted cost share is positive and cost is concave in prices.",
         {modelArgument,
          {argument::inputs,
           "One row of input values in the model's input order, or several rows: the result is then a "
           "column with one value per row. With a cost model: the output, then the prices."}}},
        {"prodCompare",
         "PRODCOMPARE",
         "Fits the cobb-douglas, ces and translog forms to the same rows and returns a table (enter as an array "
         "formula, 8 rows by 7 columns): log-likelihood, AIC and BIC with ranks, the F test of cobb-douglas within "
         "translog and the likelihood-ratio test of cobb-douglas within ces (rho = 0). AIC = -2LL + 2p and "
         "BIC = -2LL + p ln n, p the parameters column (sigma squared not counted).",
         {outputArgument,
          inputsArgument,
          {argument::level, "Level of the verdicts on the nested tests, between 0 and 1 (default 0.95)."}}},
        {"prodSecond",
         "PRODSECOND",
         "Second partial derivative of output for each row of inputs: how the marginal product of input i changes "
         "with one more unit of input j (of input i itself when j is omitted).",
         {modelArgument,
          bundlesArgument,
          firstInputArgument,
          {argument::secondInput, "Optional second input: its number or its label. Omitted: the same as input i."},
          boundsArgument}},
        {"prodInputReturns",
         "PRODINPUTRETURNS",
         "Returns to one input alone for each row of inputs: diminishing, constant or increasing, by whether its "
         "marginal product falls, stays or rises as more of it is used, the other inputs held. Says so where the "
         "marginal product is not positive.",
         {modelArgument, bundlesArgument, inputArgument}},
        {"prodPair",
         "PRODPAIR",
         "Technical relation of two inputs for each row of inputs: complements when more of one raises the "
         "marginal product of the other, substitutes when it lowers it, independent when it leaves it unchanged. "
         "Not the Allen notion: two-input Cobb-Douglas inputs are technical complements yet Allen substitutes "
         "(elasticity 1).",
         {modelArgument, bundlesArgument, firstInputArgument, secondInputArgument}},
        {"prodMrts",
         "PRODMRTS",
         "Marginal rate of technical substitution for each row of inputs: the units of input j that one more unit "
         "of input i replaces at unchanged output (marginal product of i over that of j).",
         {modelArgument, bundlesArgument, firstInputArgument, secondInputArgument, boundsArgument}},
        {"prodSubstitution",
         "PRODSUBSTITUTION",
         "Elasticity of substitution between inputs i and j for each row of inputs: the % change in the ratio of "
         "the two inputs per 1% change in their relative price along the isoquant.",
         {modelArgument,
          bundlesArgument,
          firstInputArgument,
          secondInputArgument,
          {argument::kind, "\"direct\" (default), \"allen\" or \"morishima\" (not symmetric: i and j in the order "
                           "given)."},
          {argument::what,
           "\"value\" (default), \"std. error\", \"lower bound\" or \"upper bound\", as for PRODMRTS. The "
           "cobb-douglas form fixes every elasticity of substitution at 1: std. error 0, both bounds 1."}}},
    };
}

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

// Cost functions: fitted from the books, or a production model's dual.
std::vector<FunctionInfo> costFunctions()
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
           "per percent of output) or \"returns to scale\" (its inverse)."}}},
        {"prodEfficientScale",
         "PRODEFFICIENTSCALE",
         "Output at which average cost is lowest at the given input prices (the efficient scale), from a cost "
         "model (PRODCOSTFIT table or typed rows, as for PRODCOST) or a production model whose returns to scale "
         "fall with size. Says so when average cost falls or rises at every output in the model.",
         {modelArgument,
          {argument::inputPrices, "One positive price per input, in the model's order, as a row or a column."}}},
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
        {"prodCostFit",
         "PRODCOSTFIT",
         "Fits a cost function to observed cost, output and input prices by least squares on logs, homogeneous "
         "of degree one in prices. Returns a table (enter as an array formula): estimates with standard errors, "
         "fit statistics, cost elasticity, returns to scale with its test and verdict, efficient scale.",
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
           "Standard errors: \"classical\" (default), \"hc1\" or \"hc3\" (robust to heteroskedasticity; "
           "without shares only)."},
          levelArgument,
          {argument::controls, "Not available yet for cost fits; leave empty."},
          {argument::groups, "Not available yet for cost fits; leave empty."},
          {argument::effects, "Not available yet for cost fits; leave empty."},
          {argument::trend, "Not available yet for cost fits; leave empty."},
          {argument::incompleteRows,
           "TRUE to leave out rows with a blank or text cell in cost, output, input prices or "
           "shares (the table counts them); FALSE or empty: such a cell is an error."}}},
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
          controlsArgument}},
        {"prodEfficiency",
         "PRODEFFICIENCY",
         "Technical efficiency of each row from a PRODFRONTIER table: the expected share of frontier output the "
         "row reaches (1 = on the frontier), or its inefficiency or the bounds of its efficiency. A column, one "
         "value per row.",
         {{argument::model, "A PRODFRONTIER table, whole (its first cell reads \"half-normal frontier\" or "
                            "\"exponential frontier\")."},
          outputArgument,
          {argument::inputs,
           "Inputs of each row in the table's order (then its controls, if it has any), as many rows as "
           "output. A first row of text names the columns, which are then matched by label."},
          {argument::what, "\"efficiency\" (default: E[exp(-u) | residual], Battese and Coelli), \"inefficiency\" "
                           "(E[u | residual], Jondrow et al.), \"lower bound\" or \"upper bound\" (of efficiency, at "
                           "the table's confidence level, Horrace and Schmidt)."}}},
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

} // namespace

const std::vector<FunctionInfo>& functionTable()
{
    static const std::vector<FunctionInfo> table = [] {
        std::vector<FunctionInfo> functions;
        for (auto family :
             {productionFitFunctions, growthFunctions, shapeFunctions, decisionFunctions, costFunctions,
              efficiencyFunctions, buildSpecificFunctions})
            for (FunctionInfo& function : family()) functions.push_back(std::move(function));
        return functions;
    }();
    return table;
}

const FunctionInfo* findByProgrammaticName(std::string_view name)
{
    for (const auto& function : functionTable())
        if (function.programmaticName == name) return &function;
    return nullptr;
}

const FunctionInfo* findByDisplayName(std::string_view name)
{
    for (const auto& function : functionTable())
        if (equalsIgnoringCase(function.displayName, name)) return &function;
    return nullptr;
}

} // namespace isoquant::addin
